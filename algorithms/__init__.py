# SPDX-License-Identifier: GPL-2.0-or-later
"""The science of Relief Gravity: pure numpy/scipy, no QGIS, GDAL or Qt."""

from ._corrections import (
    atmospheric_correction,
    bouguer_slab_correction,
    check_density,
    curvature_correction,
    density_to_kg_per_m3,
    height_correction,
    spherical_cap_correction,
)
from ._normal_gravity import (
    check_latitude,
    normal_gravity,
    normal_gravity_1967,
    normal_gravity_at_height,
    valid_latitude,
)
from ._reduction import (
    REDUCTION_FIELDS,
    complete_bouguer_anomaly,
    free_air_anomaly,
    reduce_gravity,
    simple_bouguer_anomaly,
)
from .constants import GRS80, WGS84, Ellipsoid

__all__ = [
    "GRS80",
    "REDUCTION_FIELDS",
    "WGS84",
    "Ellipsoid",
    "atmospheric_correction",
    "bouguer_slab_correction",
    "check_density",
    "check_latitude",
    "complete_bouguer_anomaly",
    "curvature_correction",
    "density_to_kg_per_m3",
    "free_air_anomaly",
    "height_correction",
    "normal_gravity",
    "normal_gravity_1967",
    "normal_gravity_at_height",
    "reduce_gravity",
    "simple_bouguer_anomaly",
    "spherical_cap_correction",
    "valid_latitude",
]
