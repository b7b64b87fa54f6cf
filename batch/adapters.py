# SPDX-License-Identifier: GPL-2.0-or-later
"""The science calls of the batch runner: one adapter per command.

Each adapter takes the arrays of one chunk of stations and calls
``algorithms/`` exactly as the Processing algorithm does for the whole layer
(``plugin/terrain_run.py``'s ``compute_terrain`` and the reduction's call of
``reduce_gravity``), so a station gets the same numbers whichever chunk it is
in. They are the only place to change when the algorithms' API changes.

The reference density of the terrain model (the median of the chunk's
densities, at which the engine runs before the linear density scaling) may
differ from the layer's; dry-land terrain is linear in density, so the results
agree to rounding (the equality test checks 1e-9 mGal). With water the terrain
command has one density for every station, so the reference is the same.
"""

from __future__ import annotations

import warnings

import numpy as np

from ..algorithms import reduce_gravity
from ..algorithms.datums import mismatch_tolerance
from ..algorithms.terrain import TerrainModel, hammer_terrain_correction
from ..algorithms.terrain._fallback import numerical_error, terrain_correction_with_fallback

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
    innermost_tc: np.ndarray | None,
    water_density: float | None,
    method: int,
    zones: str = "BCDEFGHIJKLM",
    reference_density: float | None = None,
    engine_check: bool = False,
) -> dict:
    """Terrain correction of a chunk of stations (mGal), as ``compute_terrain`` of the plugin.

    Parameters
    ----------
    x, y : numpy.ndarray
        Stations in the fine grid's CRS.
    heights : numpy.ndarray
        Station heights in the DEM's datum (m), NaN when unknown.
    fine, regional : ElevationGrid or None
        The rasters (regional already in the fine raster's CRS).
    density : numpy.ndarray
        Per-station density (kg/m^3).
    innermost_tc : numpy.ndarray or None
        Field-estimated innermost-ring correction (mGal) at the station's density.
    water_density : float or None
        Density of water below sea level.
    method : int
        ``EXACT`` or ``RING_SECTOR``.
    zones : str
        Ring-and-sector: contiguous Hammer zone letters.

    Returns
    -------
    dict
        ``tc_inner``, ``tc_outer``, ``tc_total`` (mGal); exact engine: ``dem_diff`` (m),
        ``coverage``, ``tc_trunc`` (mGal); ring-and-sector: ``zones``; and ``flags``
        (per station a list of ``algorithms/qc.py`` codes).
    """
    n = len(heights)
    density = np.array(np.broadcast_to(np.asarray(density, dtype=float), (n,)))
    if reference_density is not None and water_density is None:
        # A station without density gets the reference density: the layer's, not the chunk's median.
        density[~np.isfinite(density)] = reference_density
    model = TerrainModel(
        density=density,
        water_density=water_density,
        inner_radius=inner_radius,
        outer_radius=outer_radius,
        innermost_tc=innermost_tc,
    )
    if method == RING_SECTOR:
        hammer = hammer_terrain_correction(
            x,
            y,
            heights,
            fine,
            density=model.reference_density,
            zones=zones,
            regional=regional,
            inner_radius=inner_radius,
        )
        scale = model.density_factors(n) / model.reference_density
        result = {
            key: np.array(getattr(hammer, key), dtype=float) * scale for key in ("tc_inner", "tc_outer", "tc_total")
        }
        result["zones"] = {k: np.asarray(v, dtype=float) * scale for k, v in hammer.zones.items()}
        result["flags"] = [[c for c in str(f).split(";") if c] for f in hammer.flags]
        if innermost_tc is not None:
            # Hammer's zone A (station to 2 m) is the field-estimated part (inner zone).
            extra = np.where(np.isfinite(innermost_tc), innermost_tc, 0.0)
            result["tc_inner"] = result["tc_inner"] + extra
            result["tc_total"] = result["tc_total"] + extra
        return result
    # Main's route: the regional DEM fills fine NoData cells and serves stations off the fine DEM.
    engine = terrain_correction_with_fallback(x, y, heights, fine, regional, model, workers=1)
    extra = {}
    if engine_check:
        extra["tc_numerr"] = numerical_error(x, y, heights, fine, regional, model, engine, workers=1)
    return {
        **extra,
        "tc_inner": np.asarray(engine.tc_inner, dtype=float),
        "tc_outer": np.asarray(engine.tc_outer, dtype=float),
        "tc_total": np.asarray(engine.tc_total, dtype=float),
        "dem_diff": np.asarray(engine.height_difference, dtype=float),
        "coverage": np.asarray(engine.coverage, dtype=float),
        "tc_trunc": np.asarray(engine.truncation, dtype=float),
        "flags": [list(codes) for codes in engine.flags],
    }


def mismatch(grid, x, y, dem_diff) -> np.ndarray:
    """Stations whose height differs from the DEM beyond the local relief (the plugin's rule).

    The local relief is the height range of the 3 x 3 DEM cells around the
    station; the tolerance is ``algorithms.datums.mismatch_tolerance``.
    """
    relief = np.full(len(x), np.nan)
    for i, (xi, yi) in enumerate(zip(x, y)):
        if not (np.isfinite(xi) and np.isfinite(yi)):
            continue
        col = int(np.floor((xi - grid.x_origin) / grid.cell_x))
        row = int(np.floor((grid.y_origin - yi) / grid.cell_y))
        window = grid.read_window(row - 1, col - 1, 3, 3)
        if np.isfinite(window).any():
            relief[i] = float(np.nanmax(window) - np.nanmin(window))
    diff = np.asarray(dem_diff, dtype=float)
    return np.isfinite(diff) & (np.abs(diff) > mismatch_tolerance(relief))


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


def uncertainty_chunk(
    chunk: dict, grid, heights_reduced, density, reduced: dict, truncation, options: dict, cfg: dict
) -> dict:
    """``tc_sigma``, ``cba_sigma`` and the components (mGal), as ``plugin/uncertainty_run.py``.

    ``grid`` is the fine DEM, None when the terrain correction came from a
    field (then only the gravity, height and density terms are known).
    """
    from ..algorithms.uncertainty import (
        COMPONENTS,
        height_component,
        near_terrain_spread,
        terrain_height_spread,
        uncertainty_budget,
    )

    height_sigma = np.asarray(chunk["height_sigma"], float)
    n = len(height_sigma)
    near = None
    terrain_nodes = None
    if grid is not None:
        near = near_terrain_spread(
            chunk["x"],
            chunk["y"],
            np.asarray(chunk["heights"], float),
            grid,
            density,
            cfg["dem_sigma"],
            height_sigma,
            radius=cfg["inner_radius"],
        )
        terrain_nodes = near.height_nodes
    lat = np.asarray(chunk["latitude"], dtype=float)
    rho = np.broadcast_to(np.asarray(density, dtype=float), lat.shape)
    usable = np.isfinite(lat) & (np.abs(lat) <= 90.0) & np.isfinite(heights_reduced) & np.isfinite(rho) & (rho > 0)
    h_cba = np.full(n, np.nan)
    if usable.any():
        nodes = None if terrain_nodes is None else terrain_nodes[:, usable]
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            h_cba[usable] = height_component(
                lat[usable], heights_reduced[usable], height_sigma[usable], rho[usable], terrain_nodes=nodes, **options
            )
    h_tc = terrain_height_spread(terrain_nodes) if terrain_nodes is not None else np.full(n, np.nan)
    budget = uncertainty_budget(
        gravity_sigma=np.asarray(chunk["gravity_sigma"], float),
        height_sigma_cba=h_cba,
        height_sigma_tc=h_tc,
        near=near,
        truncation=truncation,
        density=density,
        density_sigma=cfg["density_sigma"],
        slab=reduced["slab_corr"],
        curvature=reduced["curv_corr"],
        tc_total=reduced["tc_total"],
    )
    columns = {"tc_sigma": budget.tc_sigma, "cba_sigma": budget.cba_sigma}
    columns.update({name: np.asarray(budget.components[name], float) for name in COMPONENTS})
    return columns
