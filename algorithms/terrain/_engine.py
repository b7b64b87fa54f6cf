# SPDX-License-Identifier: GPL-2.0-or-later
"""Driver: terrain correction of stations from a fine and an optional regional DEM.

The driver takes plain arrays, :class:`ElevationGrid` objects and a
:class:`TerrainModel`, so it runs from any Python (a chunk of stations per
call is fine: results do not depend on the other stations). It cuts the
stations into tiles, plans each tile (:mod:`._plan`), evaluates batches of
nearby stations level by level (:mod:`._rings`, or :mod:`._evaluate` on sparse
levels and geographic grids) and adds the innermost model
(:mod:`._innermost`). The model, zones and formulas: ``docs/terrain.md``.

Memory: stations are processed in tiles of at most ``TILE_SPAN``; per tile the
engine holds one block array per level, each about (tile + rings) / block side
squared. A raster is only ever read by windows of at most about 2 million
cells, and only from the calling thread (GDAL datasets are not thread-safe);
worker threads only compute.
"""

from __future__ import annotations

import math
import os
import time
from collections.abc import Callable
from concurrent.futures import ThreadPoolExecutor
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from ._coverage import truncation_estimate
from ._errors import TerrainCancelled
from ._evaluate import Batch, Physics, evaluate_level
from ._grid import ElevationGrid
from ._innermost import innermost
from ._model import TerrainModel
from ._plan import plan_grid, tiles
from ._rings import evaluate_rings
from ._sampling import bilinear_setup, inside_extent, sample_bilinear, station_cells

#: Coverage below this fraction is flagged ``tc_partial``.
COVERAGE_FLAG_BELOW = 0.99

#: Stations per work unit; progress and cancel are checked between units
#: (a unit takes about 0.2 s of one core on the benchmark scenario; large units
#: mean fewer, longer numpy calls, so the threads contend less for the
#: interpreter lock).
CHUNK = 256


@dataclass(frozen=True, eq=False)
class TerrainResult:
    """Per-station terrain correction (every array has one value per station).

    Attributes
    ----------
    tc_inner, tc_outer, tc_total : numpy.ndarray
        Terrain correction in mGal, positive for relief (docs/terrain.md),
        at each station's density.
    dem_height : numpy.ndarray
        Fine DEM height at the station (the bilinear sampler), m.
    height_difference : numpy.ndarray
        Station height minus ``dem_height``, m.
    coverage : numpy.ndarray
        Fraction (0-1) of the disc of radius ``outer_radius`` covered by data
        (NaN for stations not computed).
    coverage_inner : numpy.ndarray
        The same for the disc of ``inner_radius`` (a NoData hole near the
        station shows here; 1 when the inner radius is 0).
    truncation : numpy.ndarray
        Estimate (mGal) of what the uncovered part of the disc would add,
        from the relief near the edge of coverage (0 when covered; see
        :func:`~._coverage.truncation_estimate`).
    flags : list of list of str
        Per station, codes of :data:`relief_gravity.algorithms.qc.VOCABULARY`
        (empty when clean).
    """

    tc_inner: np.ndarray
    tc_outer: np.ndarray
    tc_total: np.ndarray
    dem_height: np.ndarray
    height_difference: np.ndarray
    coverage: np.ndarray
    coverage_inner: np.ndarray
    truncation: np.ndarray
    flags: list[list[str]]


def z_order(grid: ElevationGrid, x: np.ndarray, y: np.ndarray, cells: int = 16) -> np.ndarray:
    """Morton (Z-order) key of points on a lattice of ``cells`` x ``cells`` raster cells.

    Sorting by it keeps points that are near each other mostly near in the order.

    Examples
    --------
    >>> g = ElevationGrid.from_array(np.zeros((64, 64)), 0, 640, 10, 10)
    >>> z_order(g, np.array([5.0, 635.0, 5.0, 635.0]), np.array([635.0, 635.0, 5.0, 5.0]), 32).tolist()
    [0, 1, 2, 3]
    """
    row, col = station_cells(grid, x, y)
    keys = np.zeros(row.shape, dtype=np.int64)
    r = np.clip(row // cells - int(np.min(row // cells, initial=0)), 0, 2**20 - 1)
    c = np.clip(col // cells - int(np.min(col // cells, initial=0)), 0, 2**20 - 1)
    for bit in range(20):
        keys |= ((c >> bit) & 1) << (2 * bit)
        keys |= ((r >> bit) & 1) << (2 * bit + 1)
    return keys


def terrain_correction(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    fine: ElevationGrid,
    regional: ElevationGrid | None = None,
    model: TerrainModel | None = None,
    *,
    progress: Callable[[float], None] | None = None,
    is_cancelled: Callable[[], bool] | None = None,
    workers: int | None = None,
    **model_options: object,
) -> TerrainResult:
    """Terrain correction of stations from a fine and an optional regional DEM.

    Parameters
    ----------
    x, y : array_like
        Station coordinates in the fine grid's CRS (degrees lon, lat when the
        grid is geographic).
    station_height : array_like
        Station heights in metres, same datum as the DEM (NaN: not computed).
    fine : ElevationGrid
        Detailed DEM around the stations.
    regional : ElevationGrid, optional
        Coarser DEM in the same CRS, used outside the fine DEM's footprint.
    model : TerrainModel, optional
        Densities, radii, curvature, water, innermost values.
    progress : callable, optional
        Called with the fraction done (0-1).
    is_cancelled : callable, optional
        Polled between strips while block levels are built and between
        batches of ``CHUNK`` stations (well under a second each); when True,
        :class:`TerrainCancelled` is raised.
    workers : int, optional
        Threads used for the stations (default: up to 2, fewer if the machine
        has fewer cores). numpy releases the GIL in the array arithmetic.
        1 runs everything in the calling thread (for callers that parallelise
        themselves, e.g. the batch runner's Dask workers).
    **model_options
        Without ``model``: the fields of :class:`TerrainModel` (a shorthand
        for scripts and tests, e.g. ``outer_radius=20000``).

    Returns
    -------
    TerrainResult
        Flags: ``outside_dem`` and ``no_height`` (NaN results),
        ``no_dem_at_station`` (innermost square left out), ``tc_partial``
        (the rasters cover less than 99 % of the disc of ``outer_radius``),
        ``tc_gap_inner`` (less than 99 % of the inner zone has data),
        ``tc_density_reference`` (water with per-station densities: computed
        at the reference density).

    Raises
    ------
    ValueError
        For an invalid model, arrays of different lengths, or grids in
        different units.
    TerrainCancelled
        When cancelled.

    Notes
    -----
    Each cell or block with relief :math:`\\Delta h = h - h_P` and curvature
    drop :math:`d = s^2/(2R)` contributes the attraction of the mass between
    :math:`-d` and :math:`\\Delta h - d`, counted positive for either sign:
    exact prisms (Nagy 1966) within ``PRISM_RATIO`` cells, columns with
    second-order size and height-variance terms further away (Kane 1962;
    Forsberg 1985). docs/terrain.md derives each part and lists the checks.

    References
    ----------
    Nagy, D., 1966, Geophysics 31(2), 362-371; Kane, M.F., 1962, Geophysics
    27(4), 455-462; Forsberg, R., 1985, Bull. Geod. 59(4), 342-360; Nowell,
    D.A.G., 1999, J. Appl. Geophys. 42, 117-134; LaFehr, T.R., 1991,
    Geophysics 56(8), 1179-1184 (166.735 km).

    Examples
    --------
    Flat terrain at the station height gives no correction:

    >>> g = ElevationGrid.from_array(np.full((101, 101), 300.0), 0, 3030, 30, 30)
    >>> m = TerrainModel(inner_radius=1000, outer_radius=1400, curvature=False)
    >>> r = terrain_correction([1515.0], [1515.0], [300.0], g, model=m)
    >>> float(r.tc_total[0]), r.flags[0]
    (0.0, [])
    """
    if model is None:
        model = TerrainModel(**model_options)  # type: ignore[arg-type]
    elif model_options:
        msg = f"give either a model or model options, not both: {sorted(model_options)}"
        raise ValueError(msg)
    xs = np.atleast_1d(np.asarray(x, dtype=float))
    ys = np.atleast_1d(np.asarray(y, dtype=float))
    hs = np.atleast_1d(np.asarray(station_height, dtype=float))
    n = xs.size
    if ys.size != n or hs.size != n:
        msg = f"x, y and station_height must have the same length, got {xs.size}, {ys.size}, {hs.size}"
        raise ValueError(msg)
    model.check_stations(n)
    if regional is not None and regional.geographic != fine.geographic:
        msg = "fine and regional grids must share one CRS (both geographic or both projected)"
        raise ValueError(msg)
    n_workers = workers if workers is not None else min(2, os.cpu_count() or 1)
    if n_workers < 1:
        msg = f"workers must be >= 1, got {workers}"
        raise ValueError(msg)
    physics = Physics(1.0, model.engine_water_density, model.inner_radius, model.outer_radius, model.curvature)
    field_tc = model.engine_innermost(n)

    tc_inner = np.full(n, np.nan)
    tc_outer = np.full(n, np.nan)
    coverage = np.zeros(n)
    coverage_inner = np.zeros(n)
    edge_mean = np.full(n, np.nan)
    edge_square = np.full(n, np.nan)
    flags: list[list[str]] = [[] for _ in range(n)]
    inside = inside_extent(fine, xs, ys) & np.isfinite(xs) & np.isfinite(ys)
    dem_height = sample_bilinear(fine, xs, ys)
    no_height = ~np.isfinite(hs)
    for i in np.nonzero(~inside)[0]:
        flags[i].append("outside_dem")
    for i in np.nonzero(no_height)[0]:
        flags[i].append("no_height")
    todo = inside & ~no_height
    exclude = (fine.x_origin, fine.x_end, fine.y_end, fine.y_origin)

    # Stations of a tile in Z order, so that a batch is a compact group: its
    # rings are clipped alike at the rasters' edges and read nearby blocks.
    groups = [t[np.argsort(z_order(fine, xs[t], ys[t]), kind="stable")] for t in tiles(fine, xs, ys, todo)]
    total_work = max(int(todo.sum()), 1)
    # Building the block levels of a tile counts as a tenth of its stations.
    setup_share = 0.1
    done = 0.0
    last_report = 0.0

    def report(frac: float) -> None:
        nonlocal last_report
        if progress is not None:
            now = time.monotonic()
            if now - last_report > 0.2 or frac >= 1.0:
                last_report = now
                progress(min(max(frac, 0.0), 1.0))

    def check() -> None:
        if is_cancelled is not None and is_cancelled():
            msg = "terrain correction cancelled"
            raise TerrainCancelled(msg)

    disc = math.pi * model.outer_radius**2
    inner_disc = math.pi * model.inner_radius**2
    for tile in groups:
        check()
        tx, ty = xs[tile], ys[tile]
        setup = setup_share * len(tile)
        n_grids = 1 if regional is None else 2

        # Loop values are bound as defaults (same values: plan_grid calls level_done before `done` moves on).
        def level_done(
            frac: float, g: int = 0, *, done: float = done, setup: float = setup, n_grids: int = n_grids
        ) -> None:
            report((done + setup * (g + frac) / n_grids) / (total_work * (1 + setup_share)))

        chunks = [range(i, min(i + CHUNK, len(tile))) for i in range(0, len(tile), CHUNK)]
        base_r, base_c, _, _ = bilinear_setup(fine, tx, ty)
        batches = [
            Batch(np.arange(ch.start, ch.stop), xs[tile[ch.start : ch.stop]], ys[tile[ch.start : ch.stop]],
                  hs[tile[ch.start : ch.stop]], base_r[ch.start : ch.stop], base_c[ch.start : ch.stop])
            for ch in chunks
        ]
        pool = ThreadPoolExecutor(max_workers=n_workers) if n_workers > 1 else None
        try:
            # The regional grid first (few cells): the workers evaluate its
            # levels while this thread reads the fine raster and builds its levels.
            regional_parts: list = [[] for _ in chunks]
            if regional is not None:
                plan_r = plan_grid(
                    regional, tx, ty, model.outer_radius, False, exclude, is_cancelled, level_done, model.refinement,
                )
                regional_parts = [_submit(pool, _grid_levels, plan_r, bt, physics) for bt in batches]
            plan_f = plan_grid(
                fine, tx, ty, model.outer_radius, True, None, is_cancelled, lambda f, g=n_grids - 1: level_done(f, g),
                model.refinement,
            )
            level0 = plan_f.stats[0]
            window = np.where(level0.weight > 0, level0.mean, np.nan)
            origin = (level0.block_row0, level0.block_col0)
            fine_parts = [_submit(pool, _grid_levels, plan_f, bt, physics, window, origin) for bt in batches]
            done += setup
            for ch, f_part, r_part in zip(chunks, fine_parts, regional_parts):
                gi = tile[ch.start : ch.stop]
                levels, nearest = _result(f_part)
                if regional is not None:
                    levels = levels + _result(r_part)[0]
                square, rest, rest_area, square_area = nearest
                if field_tc is not None:
                    square = np.where(np.isfinite(field_tc[gi]), field_tc[gi], square)
                inner, outer, area, area_in, has, e_mean, e_square = _combine(
                    levels, square, rest, rest_area, square_area
                )
                tc_inner[gi] = inner
                tc_outer[gi] = outer
                coverage[gi] = np.minimum(area / disc, 1.0)
                coverage_inner[gi] = np.minimum(area_in / inner_disc, 1.0) if inner_disc > 0 else 1.0
                edge_mean[gi] = e_mean
                edge_square[gi] = e_square
                for i, ok, cov, cov_in in zip(gi, has, coverage[gi], coverage_inner[gi]):
                    if not ok:
                        flags[i].append("no_dem_at_station")
                    if cov < COVERAGE_FLAG_BELOW:
                        flags[i].append("tc_partial")
                    if cov_in < COVERAGE_FLAG_BELOW:
                        flags[i].append("tc_gap_inner")
                done += len(ch)
                report(done / (total_work * (1 + setup_share)))
                check()
        finally:
            if pool is not None:
                # Cancel what has not started; running batches finish quickly.
                pool.shutdown(wait=True, cancel_futures=True)
    report(1.0)
    factor = model.density_factors(n)
    if model.per_station_density and model.water_density is not None:
        differs = todo & np.isfinite(model.density) & (model.density != model.reference_density)
        for i in np.nonzero(differs)[0]:
            flags[i].append("tc_density_reference")
    tc_inner = tc_inner * factor
    tc_outer = tc_outer * factor
    covered = np.where(todo, coverage, np.nan)
    truncation = truncation_estimate(
        covered, edge_mean, edge_square, model.outer_radius, physics.density, model.curvature
    )
    return TerrainResult(
        tc_inner=tc_inner,
        tc_outer=tc_outer,
        tc_total=tc_inner + tc_outer,
        dem_height=dem_height,
        height_difference=hs - dem_height,
        coverage=covered,
        coverage_inner=np.where(todo, coverage_inner, np.nan),
        truncation=truncation * factor,
        flags=flags,
    )


def _submit(pool: ThreadPoolExecutor | None, fn: Callable, *args: object) -> object:
    """A future from ``pool``, or without a pool the deferred call itself (run when its result is asked for)."""
    if pool is None:
        return (fn, args)
    return pool.submit(fn, *args)


def _result(part: object) -> object:
    """The result of :func:`_submit`'s future or deferred call."""
    if isinstance(part, tuple):
        fn, args = part
        return fn(*args)
    return part.result()


def _grid_levels(plan, bt: Batch, physics: Physics, window=None, origin=(0, 0)) -> tuple[list, tuple | None]:
    """Every level of one grid's plan for a batch, and (fine grid) the innermost model.

    Returns
    -------
    levels : list of (float, LevelSums)
        Each level's square half-width (m) and sums, in the plan's order.
    nearest : tuple or None
        With ``window``: :func:`~._innermost.innermost` of the batch.
    """
    levels = []
    for li in range(len(plan.levels)):
        r = evaluate_rings(plan, li, bt, physics)
        if r is None:
            r = evaluate_level(plan, li, bt, physics)
        levels.append((plan.levels[li][1], r))
    nearest = None
    if window is not None:
        nearest = innermost(plan.grid, bt.x, bt.y, bt.height, physics, window, origin)
    return levels, nearest


def _combine(levels: list, square, rest, rest_area, square_area) -> tuple[np.ndarray, ...]:
    """Per-station totals of a batch from its levels (fine grid first) and innermost model.

    Returns
    -------
    tuple of numpy.ndarray
        tc_inner, tc_outer, covered area, covered inner area (m^2), whether
        the innermost square has a value, and the mean and mean square relief
        of the two outermost levels with data (the edge of coverage).
    """
    n_st = square.size
    inner = np.zeros(n_st)
    outer = np.zeros(n_st)
    area = np.zeros(n_st)
    area_in = np.zeros(n_st)
    # Relief statistics of the two outermost levels with data (the edge of coverage).
    reach = np.zeros(n_st)
    last = np.zeros((3, n_st))
    before = np.zeros((3, n_st))
    for half, r in levels:
        inner += r.inner
        outer += r.outer
        area += r.covered
        area_in += r.covered_inner
        farther = (r.relief_area > 0) & (half > reach)
        if np.any(farther):
            reach = np.where(farther, half, reach)
            sums = np.stack([r.relief_area, r.relief_sum, r.relief_square])
            before = np.where(farther, last, before)
            last = np.where(farther, sums, last)
    inner += rest
    area += rest_area
    area_in += rest_area
    has = np.isfinite(square)
    inner = inner + np.where(has, square, 0.0)
    area = np.where(has, area + square_area, area)
    area_in = np.where(has, area_in + square_area, area_in)
    edge = last + before
    with np.errstate(invalid="ignore", divide="ignore"):
        e_mean = edge[1] / edge[0]
        e_square = edge[2] / edge[0]
    return inner, outer, area, area_in, has, e_mean, e_square
