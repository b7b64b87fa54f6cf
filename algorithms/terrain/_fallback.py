# SPDX-License-Identifier: GPL-2.0-or-later
"""The regional DEM as a fallback where the fine DEM has no data.

Two cases, both flagged (``docs/terrain.md``):

* NoData cells inside the fine DEM (voids, a survey edge cut by the tile):
  each is filled with the regional DEM's bilinear height at the cell's centre,
  so the correction near the station is not silently short of terrain;
  stations with such cells within the inner radius are flagged
  ``tc_regional_fill``.
* Stations outside the fine DEM, or on a fine cell without data, that the
  regional DEM covers: their whole correction comes from the regional DEM
  alone (the engine run with the regional DEM as its only grid), flagged
  ``tc_regional_only`` — coarse near the station, so less accurate.

Without a regional DEM the engine runs unchanged. With density units (a
geology layer) the same two cases hold, each unit run on the filled fine DEM;
a filled cell keeps the unit its polygon gives it, and a station served by the
regional DEM alone uses the regional unit grid.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import replace

import numpy as np
import numpy.typing as npt

from ..constants import MEAN_EARTH_RADIUS
from ._engine import TerrainResult, terrain_correction
from ._geology import DensityUnits, terrain_correction_by_units
from ._grid import ElevationGrid
from ._model import TerrainModel
from ._sampling import inside_extent, sample_bilinear, station_cells

#: Engine codes replaced by ``tc_regional_only`` when the regional DEM serves the station.
NOT_ON_FINE = ("outside_dem", "no_dem_at_station")

#: Largest window (cells) read at once to tell that no station has NoData near it.
MAX_HOLE_WINDOW = 4_000_000


def filled_grid(fine: ElevationGrid, regional: ElevationGrid) -> ElevationGrid:
    """The fine grid whose NoData cells read the regional grid's height at their centres.

    Parameters
    ----------
    fine, regional : ElevationGrid
        Same CRS.

    Returns
    -------
    ElevationGrid
        Same geometry as ``fine``.

    Examples
    --------
    >>> fine = ElevationGrid.from_array([[1.0, np.nan]], 0, 10, 10, 10)
    >>> regional = ElevationGrid.from_array([[7.0]], -100, 100, 200, 200)
    >>> filled_grid(fine, regional).read_window(0, 0, 1, 2)
    array([[1., 7.]])
    """

    def reader(row0: int, col0: int, n_rows: int, n_cols: int) -> np.ndarray:
        block = np.array(fine.reader(row0, col0, n_rows, n_cols), dtype=float)
        missing = ~np.isfinite(block)
        if missing.any():
            ii, jj = np.nonzero(missing)
            xc = fine.x_origin + (col0 + jj + 0.5) * fine.cell_x
            yc = fine.y_origin - (row0 + ii + 0.5) * fine.cell_y
            block[ii, jj] = sample_bilinear(regional, xc, yc)
        return block

    return replace(fine, reader=reader)


def _no_hole_around(fine: ElevationGrid, rows, cols, y, radius: float) -> bool:
    """True when the window around all the stations (read once, if small enough) holds no NoData."""
    if fine.geographic:
        lat = float(np.max(np.abs(y)))
        sx = np.radians(fine.cell_x) * MEAN_EARTH_RADIUS * np.cos(np.radians(min(lat, 89.0)))
        sy = np.radians(fine.cell_y) * MEAN_EARTH_RADIUS
    else:
        sx, sy = fine.cell_x, fine.cell_y
    half_r, half_c = int(np.ceil(radius / sy)) + 1, int(np.ceil(radius / sx)) + 1
    r0, r1 = max(int(rows.min()) - half_r, 0), min(int(rows.max()) + half_r + 1, fine.n_rows)
    c0, c1 = max(int(cols.min()) - half_c, 0), min(int(cols.max()) + half_c + 1, fine.n_cols)
    if r1 <= r0 or c1 <= c0:
        return True
    if (r1 - r0) * (c1 - c0) > MAX_HOLE_WINDOW:
        return False
    return bool(np.all(np.isfinite(fine.read_window(r0, c0, r1 - r0, c1 - c0))))


def holes_near(fine: ElevationGrid, x: npt.ArrayLike, y: npt.ArrayLike, radius: float) -> np.ndarray:
    """True for stations with a NoData cell of the fine grid (inside its extent) within ``radius`` (m).

    Examples
    --------
    >>> z = np.zeros((9, 9)); z[4, 6] = np.nan
    >>> g = ElevationGrid.from_array(z, 0, 90, 10, 10)
    >>> holes_near(g, np.array([45.0, 45.0]), np.array([45.0, 85.0]), 25.0).tolist()
    [True, False]
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    rows, cols = station_cells(fine, x, y)
    out = np.zeros(x.shape, dtype=bool)
    todo = np.flatnonzero(np.isfinite(x) & np.isfinite(y))
    if todo.size and _no_hole_around(fine, rows[todo], cols[todo], y[todo], radius):
        return out
    for k in todo:
        if fine.geographic:
            sx = np.radians(fine.cell_x) * MEAN_EARTH_RADIUS * np.cos(np.radians(y[k]))
            sy = np.radians(fine.cell_y) * MEAN_EARTH_RADIUS
        else:
            sx, sy = fine.cell_x, fine.cell_y
        half_r, half_c = int(np.ceil(radius / sy)) + 1, int(np.ceil(radius / sx)) + 1
        r0 = max(int(rows[k]) - half_r, 0)
        c0 = max(int(cols[k]) - half_c, 0)
        r1 = min(int(rows[k]) + half_r + 1, fine.n_rows)
        c1 = min(int(cols[k]) + half_c + 1, fine.n_cols)
        if r1 <= r0 or c1 <= c0:
            continue
        window = fine.read_window(r0, c0, r1 - r0, c1 - c0)
        jj, ii = np.meshgrid(np.arange(c0, c1), np.arange(r0, r1))
        dx = (fine.x_origin + (jj + 0.5) * fine.cell_x - x[k]) * (sx / fine.cell_x)
        dy = (fine.y_origin - (ii + 0.5) * fine.cell_y - y[k]) * (sy / fine.cell_y)
        out[k] = bool(np.any(~np.isfinite(window) & (dx * dx + dy * dy <= radius * radius)))
    return out


def terrain_correction_with_fallback(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    fine: ElevationGrid,
    regional: ElevationGrid | None,
    model: TerrainModel,
    *,
    progress: Callable[[float], None] | None = None,
    is_cancelled: Callable[[], bool] | None = None,
    workers: int | None = None,
    units: DensityUnits | None = None,
    station_density: npt.ArrayLike | None = None,
) -> TerrainResult:
    """The engine's terrain correction, with the regional DEM where the fine one has no data.

    Parameters
    ----------
    x, y, station_height, fine, regional, model
        As for :func:`~._engine.terrain_correction`.
    units, station_density : optional
        Density units and station densities, as for
        :func:`~._geology.terrain_correction_by_units` (then the model's
        density must be one value).
    progress, is_cancelled : callable, optional
        Passed to the engine.
    workers : int, optional
        Passed to the engine (the batch runner sets 1: Dask already runs
        one task per core).

    Returns
    -------
    TerrainResult
        With ``tc_regional_fill`` on stations whose inner zone had fine
        NoData cells filled from the regional DEM, and ``tc_regional_only``
        (replacing ``outside_dem`` / ``no_dem_at_station``) on stations
        computed from the regional DEM alone.

    Examples
    --------
    >>> fine = ElevationGrid.from_array(np.full((40, 40), 100.0), 0, 4000, 100, 100)
    >>> regional = ElevationGrid.from_array(np.full((20, 20), 100.0), -8000, 12000, 1000, 1000)
    >>> r = terrain_correction_with_fallback(np.array([2000.0, 7000.0]), np.array([2000.0, 2000.0]),
    ...     np.array([100.0, 100.0]), fine, regional, TerrainModel(outer_radius=5000.0, curvature=False))
    >>> [round(float(v), 6) for v in r.tc_total], r.flags[1]
    ([0.0, 0.0], ['tc_regional_only'])
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    h = np.asarray(station_height, dtype=float)
    rho_s = None if station_density is None else np.atleast_1d(np.asarray(station_density, dtype=float))

    def run(xs, ys, hs, grid, second, stations_model, grid_units, densities, **options):
        if units is None:
            return terrain_correction(xs, ys, hs, grid, second, stations_model, workers=workers, **options)
        return terrain_correction_by_units(xs, ys, hs, grid, second, grid_units, stations_model,
                                           station_density=densities, workers=workers, **options)

    if regional is None:
        return run(x, y, h, fine, None, model, units, rho_s, progress=progress, is_cancelled=is_cancelled)
    holes = holes_near(fine, x, y, model.inner_radius)
    result = run(x, y, h, filled_grid(fine, regional), regional, model, units, rho_s,
                 progress=progress, is_cancelled=is_cancelled)
    flags = [list(codes) for codes in result.flags]
    not_on_fine = np.array([any(code in NOT_ON_FINE for code in codes) for codes in flags], dtype=bool)
    served = not_on_fine & inside_extent(regional, x, y) & np.isfinite(sample_bilinear(regional, x, y))
    arrays = {
        name: np.array(getattr(result, name), dtype=float)
        for name in ("tc_inner", "tc_outer", "tc_total", "dem_height", "height_difference", "coverage",
                     "coverage_inner", "truncation")
    }
    if served.any():
        index = np.flatnonzero(served)
        regional_units = None if units is None else DensityUnits(units.densities, units.regional)
        alone = run(x[index], y[index], h[index], regional, None, model.for_stations(index), regional_units,
                    None if rho_s is None else rho_s[index], is_cancelled=is_cancelled)
        for name, values in arrays.items():
            values[index] = np.asarray(getattr(alone, name), dtype=float)
        for position, k in enumerate(index):
            flags[k] = [c for c in flags[k] if c not in NOT_ON_FINE]
            flags[k] += [c for c in alone.flags[position] if c not in flags[k]]
            flags[k].append("tc_regional_only")
    for k in np.flatnonzero(holes & ~served):
        if "tc_regional_fill" not in flags[k]:
            flags[k].append("tc_regional_fill")
    return replace(result, flags=flags, **arrays)


def numerical_error(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    fine: ElevationGrid,
    regional: ElevationGrid | None,
    model: TerrainModel,
    result: TerrainResult,
    *,
    refinement: float = 2.0,
    is_cancelled: Callable[[], bool] | None = None,
    workers: int | None = None,
) -> np.ndarray:
    """The engine's own error per station: its result against a refined evaluation (mGal).

    The refined run coarsens the terrain ``refinement`` times farther out (in
    block sides) on the same DEMs; the engine's error shrinks about as the
    square of that distance (docs/terrain.md), so the difference estimates
    the error of the standard run.

    Parameters
    ----------
    x, y, station_height, fine, regional, model
        As given to :func:`terrain_correction_with_fallback`.
    result : TerrainResult
        Its result.
    refinement : float
        Factor on the coarsening distances of the refined run.
    is_cancelled : callable, optional
        Passed to the engine.
    workers : int, optional
        Threads of the engine (None: its default).

    Returns
    -------
    numpy.ndarray
        ``|tc_total - tc_total(refined)|``, NaN where either is missing.

    Examples
    --------
    >>> z = 100.0 + 20.0 * np.sin(np.arange(60)[:, None] / 5.0) * np.cos(np.arange(60)[None, :] / 7.0)
    >>> g = ElevationGrid.from_array(z, 0, 3000, 50, 50)
    >>> m = TerrainModel(inner_radius=500.0, outer_radius=1400.0, curvature=False)
    >>> x, y, h = np.array([1500.0]), np.array([1500.0]), np.array([110.0])
    >>> r = terrain_correction_with_fallback(x, y, h, g, None, m)
    >>> bool(numerical_error(x, y, h, g, None, m, r)[0] < 1e-3)
    True
    """
    refined = terrain_correction_with_fallback(
        x, y, station_height, fine, regional, replace(model, refinement=model.refinement * refinement),
        is_cancelled=is_cancelled,
        workers=workers,
    )
    return np.abs(np.asarray(result.tc_total, dtype=float) - np.asarray(refined.tc_total, dtype=float))
