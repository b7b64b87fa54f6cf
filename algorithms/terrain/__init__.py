# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain corrections: exact prisms, far-zone kernels, zone engine, Hammer zones."""

from ._engine import TerrainResult, terrain_correction
from ._errors import TerrainCancelled
from ._grid import ElevationGrid
from ._innermost import plane_terrain_effect
from ._model import TerrainModel
from ._hammer import HammerResult, hammer_terrain_correction, station_gradient
from ._hammer_zones import (
    HAMMER_ZONES,
    HammerZone,
    parse_zones,
    plane_ring_correction,
    reach_sentence,
    resolved_by,
    ring_sector_correction,
    zone_label,
)
from ._kernels import column_terrain_effect, line_mass_gravity
from ._prism import prism_gravity
from ._sampling import bilinear_from_window, bilinear_setup, inside_extent, sample_bilinear, station_cells

__all__ = [
    "ElevationGrid",
    "HAMMER_ZONES",
    "HammerResult",
    "HammerZone",
    "TerrainCancelled",
    "TerrainModel",
    "TerrainResult",
    "column_terrain_effect",
    "hammer_terrain_correction",
    "line_mass_gravity",
    "plane_terrain_effect",
    "prism_gravity",
    "bilinear_from_window",
    "bilinear_setup",
    "inside_extent",
    "sample_bilinear",
    "station_cells",
    "ring_sector_correction",
    "parse_zones",
    "plane_ring_correction",
    "reach_sentence",
    "resolved_by",
    "station_gradient",
    "zone_label",
    "terrain_correction",
]
