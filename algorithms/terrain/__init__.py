# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain corrections: exact prisms, far-zone kernels, zone engine, Hammer zones."""

from ._engine import TerrainResult, terrain_correction
from ._errors import TerrainCancelled
from ._grid import ElevationGrid
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
from ._innermost import plane_terrain_effect
from ._kernels import column_terrain_effect, line_mass_gravity
from ._model import TerrainModel
from ._prism import prism_gravity
from ._sampling import bilinear_from_window, bilinear_setup, inside_extent, sample_bilinear, station_cells

__all__ = [
    "HAMMER_ZONES",
    "ElevationGrid",
    "HammerResult",
    "HammerZone",
    "TerrainCancelled",
    "TerrainModel",
    "TerrainResult",
    "bilinear_from_window",
    "bilinear_setup",
    "column_terrain_effect",
    "hammer_terrain_correction",
    "inside_extent",
    "line_mass_gravity",
    "parse_zones",
    "plane_ring_correction",
    "plane_terrain_effect",
    "prism_gravity",
    "reach_sentence",
    "resolved_by",
    "ring_sector_correction",
    "sample_bilinear",
    "station_cells",
    "station_gradient",
    "terrain_correction",
    "zone_label",
]
