# SPDX-License-Identifier: GPL-2.0-or-later
"""The science calls of the batch runner: one adapter per command.

Each adapter takes the arrays of one chunk of stations and calls
``algorithms/`` exactly as the Processing algorithm does for the whole layer
(``plugin/terrain_run.py``'s ``compute_terrain`` and the reduction's call of
``reduce_gravity``), so a station gets the same numbers whichever chunk it is
in. They are the only place to change when the algorithms' API changes.

The one difference from the plugin's glue: the reference density (the median
of the stations' densities, at which the engine runs before the linear density
scaling) is computed over *all* stations by the caller and passed in, because
a chunk's own median would differ from the layer's.
"""

from __future__ import annotations

import warnings

import numpy as np

from ..algorithms import reduce_gravity
from ..algorithms.terrain import hammer_terrain_correction, terrain_correction

EXACT, RING_SECTOR = 0, 1


def reference_density_of(density: np.ndarray) -> float:
    """Median of the finite densities (kg/m^3), 2670 when there is none."""
    finite = np.asarray(density, dtype=float)
    finite = finite[np.isfinite(finite)]
    return float(np.median(finite)) if finite.size else 2670.0


def terrain_chunk(
    x: np.ndarray,
    y: np.ndarray,
    heights: np.ndarray,
    fine,
    regional,
    *,
    inner_radius: float,
    outer_radius: float,
    density: np.ndarray,
    reference_density: float,
    innermost_tc: np.ndarray | None,
    water_density: float | None,
    method: int,
) -> dict:
    """Terrain correction of a chunk of stations (mGal), as the terrain command.

    Parameters
    ----------
    x, y : numpy.ndarray
        Stations in the fine grid's CRS.
    heights : numpy.ndarray
        Station heights (m), NaN when unknown.
    fine, regional : ElevationGrid or None
        The rasters (regional already in the fine raster's CRS).
    density : numpy.ndarray
        Per-station density (kg/m^3).
    reference_density : float
        The density the engine runs at (median over the whole layer).
    innermost_tc : numpy.ndarray or None
        Field-estimated innermost-ring correction (mGal) at the station's density.
    water_density : float or None
        Density of water below sea level; when given no density scaling.
    method : int
        ``EXACT`` or ``RING_SECTOR``.

    Returns
    -------
    dict
        ``tc_inner``, ``tc_outer``, ``tc_total`` (mGal), ``dem_diff`` (m) and
        ``coverage`` (exact engine), ``zones`` (ring-and-sector) and ``flags``
        (the engine's reasons, one ``"; "``-joined string per station).
    """
    n = len(heights)
    density = np.broadcast_to(np.asarray(density, dtype=float), np.shape(heights))
    result: dict = {}
    engine_innermost = innermost_tc
    if innermost_tc is not None and water_density is None:
        # Field estimates are at the station's own density; the engine result
        # is scaled by density below, so pre-divide to keep them as given.
        engine_innermost = innermost_tc * reference_density / np.where(density > 0, density, np.nan)
    if method == RING_SECTOR:
        hammer = hammer_terrain_correction(x, y, heights, fine, density=reference_density)
        result["tc_inner"] = np.full(n, np.nan)
        result["tc_outer"] = np.full(n, np.nan)
        result["tc_total"] = np.asarray(hammer.total, dtype=float)
        result["zones"] = {k: np.asarray(v, dtype=float) for k, v in hammer.zones.items()}
        result["flags"] = list(hammer.flags)
    else:
        engine = terrain_correction(
            x,
            y,
            heights,
            fine,
            regional,
            inner_radius=inner_radius,
            outer_radius=outer_radius,
            density=reference_density,
            water_density=water_density,
            innermost_tc=engine_innermost,
            workers=1,
        )
        result["tc_inner"] = np.asarray(engine.tc_inner, dtype=float)
        result["tc_outer"] = np.asarray(engine.tc_outer, dtype=float)
        result["tc_total"] = np.asarray(engine.tc_total, dtype=float)
        result["dem_diff"] = np.asarray(engine.height_difference, dtype=float)
        result["coverage"] = np.asarray(engine.coverage, dtype=float)
        result["flags"] = list(engine.flags)
    if water_density is None:
        scale = density / reference_density
        for key in ("tc_inner", "tc_outer", "tc_total"):
            result[key] = result[key] * scale
        for key, values in result.get("zones", {}).items():
            result["zones"][key] = values * scale
    if innermost_tc is not None and method == RING_SECTOR:
        # Hammer's zone A (station to 2 m) is the field-estimated part.
        extra = np.where(np.isfinite(innermost_tc), innermost_tc, 0.0)
        result["tc_total"] = result["tc_total"] + extra
    return result


def reduce_chunk(
    observed: np.ndarray,
    latitude: np.ndarray,
    heights: np.ndarray,
    density: np.ndarray,
    tc_total: np.ndarray,
    *,
    normal_formula: str,
    height_formula: str,
    atmospheric: bool,
    curvature: bool,
) -> dict:
    """Anomalies of a chunk of stations (mGal), as the reduce command.

    Calls ``reduce_gravity`` with the Processing algorithm's arguments (its
    warnings are the per-row flags, already raised by the caller); the terrain
    correction comes from :func:`terrain_chunk`, a field, or is NaN.

    Returns
    -------
    dict
        The reduction's fields (``REDUCTION_FIELDS``), float arrays in mGal.
    """
    with warnings.catch_warnings(record=True):
        warnings.simplefilter("always")
        return reduce_gravity(
            observed,
            latitude,
            heights,
            density=density,
            terrain_correction=tc_total,
            normal_formula=normal_formula,
            height_formula=height_formula,
            atmospheric=atmospheric,
            curvature=curvature,
        )
