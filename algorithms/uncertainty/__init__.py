# SPDX-License-Identifier: GPL-2.0-or-later
"""Uncertainty of every number: components per station and their combination."""

from ._budget import (
    COMPONENTS,
    UncertaintyBudget,
    height_component,
    quadrature_sum,
    terrain_height_spread,
    uncertainty_budget,
)
from ._near_terrain import NearTerrainSpread, near_terrain_spread
from ._quadrature import normal_nodes, normal_spread

__all__ = [
    "COMPONENTS",
    "NearTerrainSpread",
    "UncertaintyBudget",
    "height_component",
    "near_terrain_spread",
    "normal_nodes",
    "normal_spread",
    "quadrature_sum",
    "terrain_height_spread",
    "uncertainty_budget",
]
