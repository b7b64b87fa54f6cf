# SPDX-License-Identifier: GPL-2.0-or-later
"""Gridding: minimum curvature with tension, biharmonic spline, blanking, contours."""

from ._contours import contour_levels, nice_contour_interval
from ._geometry import (
    DEFAULT_MARGIN_FRACTION,
    GridGeometry,
    blank_far_cells,
    default_cell_size,
    default_grid_geometry,
    station_spacing,
)
from ._mincurv import minimum_curvature
from ._solver import GriddingCancelled
from ._spline import biharmonic_spline

__all__ = [
    "DEFAULT_MARGIN_FRACTION",
    "GridGeometry",
    "GriddingCancelled",
    "biharmonic_spline",
    "blank_far_cells",
    "contour_levels",
    "default_cell_size",
    "default_grid_geometry",
    "minimum_curvature",
    "nice_contour_interval",
    "station_spacing",
]
