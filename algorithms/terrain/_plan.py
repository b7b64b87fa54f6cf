# SPDX-License-Identifier: GPL-2.0-or-later
"""Planning: levels, windows and block statistics for a tile of stations.

Around each station the plane is tiled by nested squares (see
``docs/terrain.md``, "Zones and levels"):

* level 0: full-resolution cells of a square of half-width
  ``FULL_RESOLUTION_CELLS`` (= 2 ``BLOCK_RATIO``, at least ``PRISM_RATIO``);
* level k = 1, 2, ...: blocks of 2^k x 2^k cells in a square ring whose
  inner edge lies at least ``BLOCK_RATIO`` block sides from the station;
* each square is aligned to the blocks of the next level, so the rings tile
  the plane without gap or overlap; the last ring reaches ``outer_radius``.

A regional raster is planned the same way from its own cells and leaves out
the fine raster's footprint. Block statistics (mean, variance, centroid,
covered fraction) are built once per tile and level, by strips.
"""

from __future__ import annotations

import math
from collections.abc import Callable
from dataclasses import dataclass

import numpy as np

from ..constants import MEAN_EARTH_RADIUS
from ._errors import TerrainCancelled
from ._grid import ElevationGrid
from ._levels import BlockLevel, Rectangle, block_statistics, merge_blocks
from ._sampling import station_cells

#: Cells closer than this many cell sides are exact prisms (columns beyond;
#: their relative error there is below 3e-4, see the tests).
PRISM_RATIO = 5.0

#: Each coarse ring starts at least this many block sides from the station.
#: Measured against exact prism sums (docs/terrain.md, "Zones and levels"):
#: larger values are more accurate and cost more blocks per ring.
BLOCK_RATIO = 13.0

#: Half-width (in cells) of the full-resolution square around each station;
#: at least 2 BLOCK_RATIO, so that the first ring of 2-cell blocks starts far
#: enough out.
FULL_RESOLUTION_CELLS = 2.0 * BLOCK_RATIO

#: Largest window (cells) read once at full resolution to build every level
#: of a grid by merging blocks; larger windows are read level by level.
SINGLE_READ_CELLS = 4_000_000

#: Largest span of stations (m) handled with one set of block windows; larger
#: surveys are cut into tiles so that memory stays bounded.
TILE_SPAN = 60_000.0

Window = tuple[np.ndarray, np.ndarray, np.ndarray, np.ndarray]


def metres_per_degree() -> float:
    """Length of one degree of a great circle on the mean sphere, m.

    Examples
    --------
    >>> round(metres_per_degree(), 1)
    111195.1
    """
    return math.radians(1.0) * MEAN_EARTH_RADIUS


@dataclass(frozen=True)
class Metrics:
    """Metric cell sizes of a grid over a tile (m).

    Attributes
    ----------
    cy : float
        North-south cell size.
    cx_min : float
        Smallest east-west cell size within the windows.
    c_max : float
        Largest horizontal cell size within the windows.
    """

    cy: float
    cx_min: float
    c_max: float


def tile_metrics(grid: ElevationGrid, y_lo: float, y_hi: float, reach: float) -> Metrics:
    """Metric cell sizes of ``grid`` for stations between ``y_lo`` and ``y_hi``.

    Parameters
    ----------
    grid : ElevationGrid
        The raster.
    y_lo, y_hi : float
        Station northing (or latitude) range of the tile.
    reach : float
        How far from the stations the windows reach (m).

    Returns
    -------
    Metrics

    Examples
    --------
    >>> g = ElevationGrid.from_array([[0.0]], 0, 30, 30, 20)
    >>> tile_metrics(g, 0, 10, 1000)
    Metrics(cy=20.0, cx_min=30.0, c_max=30.0)
    """
    if not grid.geographic:
        return Metrics(grid.cell_y, grid.cell_x, max(grid.cell_x, grid.cell_y))
    pad = math.degrees(reach / MEAN_EARTH_RADIUS)
    lat_far = min(max(abs(y_lo), abs(y_hi)) + pad, 89.5)
    lat_near = max(0.0, min(abs(y_lo), abs(y_hi)) - pad) if y_lo * y_hi > 0 else 0.0
    cy = metres_per_degree() * grid.cell_y
    cx_far = metres_per_degree() * grid.cell_x * math.cos(math.radians(lat_far))
    cx_near = metres_per_degree() * grid.cell_x * math.cos(math.radians(lat_near))
    return Metrics(cy, cx_far, max(cy, cx_near))


def level_radii(metrics: Metrics, outer_radius: float, refinement: float = 1.0) -> list[tuple[int, float]]:
    """Level numbers k and half-widths H_k (m) of the nested squares.

    Parameters
    ----------
    metrics : Metrics
        Cell sizes of the grid.
    outer_radius : float
        Where the correction stops (m).
    refinement : float
        Factor on ``BLOCK_RATIO`` (and the full-resolution square): 2 puts
        every ring twice as far out in block sides, a refined evaluation of
        the same DEM used to estimate the engine's own numerical error.

    Returns
    -------
    list of (int, float)
        One entry per non-empty level; the last square reaches beyond
        ``outer_radius`` by one block side.

    Examples
    --------
    >>> level_radii(Metrics(30.0, 30.0, 30.0), 3000.0)
    [(0, 780.0), (1, 1560.0), (2, 3120.0)]
    """
    c = metrics.c_max
    ratio = BLOCK_RATIO * refinement
    h = max(FULL_RESOLUTION_CELLS * refinement * c, PRISM_RATIO * c)
    if h >= outer_radius:
        return [(0, outer_radius + c)]
    levels = [(0, h)]
    k = 0
    while h < outer_radius:
        k += 1
        nxt = max(h, ratio * 2.0 ** (k + 1) * c)
        if nxt >= outer_radius:
            levels.append((k, outer_radius + 2.0**k * c))
            break
        if nxt > h:
            levels.append((k, nxt))
        h = nxt
    return levels


def aligned_window(centre: np.ndarray, half: int, align: int) -> tuple[np.ndarray, np.ndarray]:
    """Cell range [lo, hi) around ``centre`` +- ``half`` widened to multiples of ``align``.

    Examples
    --------
    >>> aligned_window(np.array([10]), 3, 4)
    (array([4]), array([16]))
    """
    lo = np.floor_divide(centre - half, align) * align
    hi = -np.floor_divide(-(centre + 1 + half), align) * align
    return lo, hi


@dataclass(frozen=True, eq=False)
class BlockTable:
    """What the kernels need of each block of a level, flattened (row-major).

    Built once per tile and level, so that evaluating a station only gathers.

    Attributes
    ----------
    x, y : numpy.ndarray
        Centroid of the part with data, in the grid's CRS (float64).
    east, north : numpy.ndarray
        The same relative to ``origin`` (float32; projected grids only, else
        None): a tile spans at most a few hundred kilometres, where single
        precision resolves 2 cm.
    origin : (float, float)
        The tile's reference point (grid CRS).
    area : numpy.ndarray
        Area with data (m^2). This and the following arrays are float32: the
        column terms are evaluated in single precision (see
        :func:`~._evaluate.evaluate_level`).
    mean, variance : numpy.ndarray
        Mean height (m) and height variance (m^2) of that part (variance
        empty for single cells).
    cov_east, cov_north : numpy.ndarray
        Covariance of height with the ground position east and north
        (m^2): the tilt of the terrain inside the block (empty for single
        cells).
    side_x : numpy.ndarray or float
        East-west side (m): one value on projected grids, per block on
        geographic ones.
    side_y : float
        North-south side (m).
    has_data : numpy.ndarray of bool
        True where the block has data.
    half_diagonal : float
        Largest half diagonal of a block (m).
    data_box : (int, int, int, int)
        Block rows and columns [row0, row1) x [col0, col1) (absolute block
        indices) outside which the level has no data.
    missing_table : numpy.ndarray
        Summed-area table of blocks without data (shape + 1), to tell at once
        whether a window has any.
    offset_table : numpy.ndarray or None
        Summed-area table (shape + 1) of blocks whose centroid is off their
        centre (part without data or excluded), so that a window without any
        can take its offsets from the block lattice. None on geographic grids.
    stack : numpy.ndarray or None
        Projected grids: the single-precision fields as one array of shape
        (fields, block rows, block columns), in the order east, north, area,
        mean and, for blocks, variance, cov_east, cov_north (the flat arrays
        above are views of it), so that the rectangles of a ring are copied
        at once (:mod:`._rings`). None on geographic grids.
    """

    x: np.ndarray
    y: np.ndarray
    east: np.ndarray | None
    north: np.ndarray | None
    origin: tuple[float, float]
    area: np.ndarray
    mean: np.ndarray
    variance: np.ndarray
    cov_east: np.ndarray
    cov_north: np.ndarray
    side_x: np.ndarray | float
    side_y: float
    has_data: np.ndarray
    half_diagonal: float
    data_box: tuple[int, int, int, int]
    missing_table: np.ndarray
    offset_table: np.ndarray | None = None
    stack: np.ndarray | None = None


def block_table(grid: ElevationGrid, lvl: BlockLevel, origin: tuple[float, float] = (0.0, 0.0)) -> BlockTable:
    """The :class:`BlockTable` of one level's block statistics.

    Examples
    --------
    >>> from ._levels import block_statistics
    >>> g = ElevationGrid.from_array([[0.0, 2.0], [np.nan, 4.0]], 0, 20, 10, 10)
    >>> t = block_table(g, block_statistics(g, 0, 0, 1, 1, 2))
    >>> t.area.tolist(), t.x.tolist(), t.y.tolist(), float(t.side_x)
    ([300.0], [11.666666666666664], [11.666666666666666], 20.0)
    """
    b = lvl.factor
    centre = (b - 1) / 2.0
    n_r, n_c = lvl.weight.shape
    rr = (np.arange(n_r) + lvl.block_row0)[:, None] * b + centre + lvl.row_offset
    cc = (np.arange(n_c) + lvl.block_col0)[None, :] * b + centre + lvl.col_offset
    y = grid.y_origin - (rr + 0.5) * grid.cell_y
    x = np.broadcast_to(grid.x_origin + (cc + 0.5) * grid.cell_x, y.shape)
    if grid.geographic:
        side_y = metres_per_degree() * grid.cell_y * b
        side_x = (metres_per_degree() * grid.cell_x * b * np.cos(np.radians(y))).ravel()
        widest = float(np.max(side_x)) if side_x.size else 0.0
    else:
        side_y = grid.cell_y * b
        side_x = grid.cell_x * b
        widest = side_x
    metric_x = side_x.reshape(y.shape) / b if grid.geographic else side_x / b
    area = (lvl.weight * side_y * (metric_x * b)).ravel()
    has = lvl.weight > 0
    rows = np.flatnonzero(has.any(axis=1))
    cols = np.flatnonzero(has.any(axis=0))
    if rows.size:
        box = (int(rows[0]) + lvl.block_row0, int(rows[-1]) + 1 + lvl.block_row0,
               int(cols[0]) + lvl.block_col0, int(cols[-1]) + 1 + lvl.block_col0)
    else:
        box = (lvl.block_row0, lvl.block_row0, lvl.block_col0, lvl.block_col0)
    f32 = np.float32
    missing = np.zeros((has.shape[0] + 1, has.shape[1] + 1), dtype=np.int32)
    np.cumsum(np.cumsum(~has, axis=0, dtype=np.int32), axis=1, out=missing[1:, 1:])
    x = np.ascontiguousarray(x).ravel()
    y = y.ravel()
    # Full-resolution cells have no spread or tilt: their arrays are unused.
    unused = np.zeros(0, dtype=f32)
    fields = [area, lvl.mean]
    if b > 1:
        fields += [lvl.variance, lvl.col_height_cov * metric_x, lvl.row_height_cov * (-side_y / b)]
    offset_table = None
    if grid.geographic:
        stack = None
        flat = [np.asarray(a, dtype=f32).ravel() for a in fields]
        east = north = None
    else:
        fields = [x - origin[0], y - origin[1], *fields]
        stack = np.empty((len(fields), n_r, n_c), dtype=f32)
        for i, a in enumerate(fields):
            stack[i] = np.reshape(a, (n_r, n_c))
        east, north, *flat = (stack[i].ravel() for i in range(len(fields)))
        off = (lvl.row_offset != 0) | (lvl.col_offset != 0)
        offset_table = np.zeros((n_r + 1, n_c + 1), dtype=np.int32)
        np.cumsum(np.cumsum(off, axis=0, dtype=np.int32), axis=1, out=offset_table[1:, 1:])
    flat += [unused] * (5 - len(flat))
    return BlockTable(
        x=x,
        y=y,
        east=east,
        north=north,
        origin=origin,
        missing_table=missing,
        area=flat[0],
        mean=flat[1],
        variance=flat[2],
        cov_east=flat[3],
        cov_north=flat[4],
        stack=stack,
        offset_table=offset_table,
        side_x=side_x.astype(f32) if grid.geographic else f32(side_x),
        side_y=f32(side_y),
        has_data=has.ravel(),
        half_diagonal=0.5 * math.hypot(widest, side_y),
        data_box=box,
    )


@dataclass(frozen=True, eq=False)
class GridPlan:
    """Levels, windows and block statistics of one grid for one tile.

    Attributes
    ----------
    grid : ElevationGrid
        The raster.
    levels : list of (int, float)
        From :func:`level_radii`.
    windows : list of Window
        Per level, (row_lo, row_hi, col_lo, col_hi) per station, in cells.
    stats : list of BlockLevel
        Per level, the block statistics covering every station's window.
    tables : list of BlockTable
        Per level, the same flattened for the kernels.
    is_fine : bool
        True for the fine raster (its four cells around each station belong
        to the innermost model).
    exclude : Rectangle, optional
        Footprint (west, east, south, north) of the finer raster, left out.
    """

    grid: ElevationGrid
    levels: list[tuple[int, float]]
    windows: list[Window]
    stats: list[BlockLevel]
    tables: list[BlockTable]
    is_fine: bool
    exclude: Rectangle | None = None


def plan_grid(
    grid: ElevationGrid,
    x: np.ndarray,
    y: np.ndarray,
    outer_radius: float,
    is_fine: bool,
    exclude: Rectangle | None,
    is_cancelled: Callable[[], bool] | None,
    level_done: Callable[[float], None] | None = None,
    refinement: float = 1.0,
) -> GridPlan:
    """Plan one grid for the stations of a tile and build its block statistics.

    Parameters
    ----------
    grid : ElevationGrid
        The raster.
    x, y : numpy.ndarray
        Stations of the tile in the grid's CRS.
    outer_radius : float
        Where the correction stops (m).
    is_fine : bool
        True for the fine raster.
    exclude : Rectangle, optional
        Footprint of the finer raster to leave out.
    is_cancelled : callable, optional
        Polled while block statistics are built.
    level_done : callable, optional
        Called with the fraction of levels built.
    refinement : float
        See :func:`level_radii`.

    Returns
    -------
    GridPlan

    Examples
    --------
    >>> g = ElevationGrid.from_array(np.zeros((100, 100)), 0, 3000, 30, 30)
    >>> p = plan_grid(g, np.array([1500.0]), np.array([1500.0]), 1000.0, True, None, None)
    >>> [k for k, _ in p.levels], p.windows[0][0].tolist()
    ([0, 1], [24])
    """
    # Geographic grids: the metrics of the whole latitude band of the tile
    # lattice, not of these stations, so a station's levels (and its result)
    # do not depend on the other stations of the run (batch chunks).
    metrics = tile_metrics(grid, *_band_range(grid, float(np.min(y)), float(np.max(y))), outer_radius)
    levels = level_radii(metrics, outer_radius, refinement)
    row, col = station_cells(grid, x, y)
    windows = []
    ranges = []
    for idx, (k, half) in enumerate(levels):
        align = 2 ** (levels[idx + 1][0]) if idx + 1 < len(levels) else 2**k
        my = int(math.ceil(half / metrics.cy))
        mx = int(math.ceil(half / metrics.cx_min))
        r_lo, r_hi = aligned_window(row, my, align)
        c_lo, c_hi = aligned_window(col, mx, align)
        windows.append((r_lo, r_hi, c_lo, c_hi))
        b = 2**k
        br0, bc0 = int(r_lo.min()) // b, int(c_lo.min()) // b
        br1, bc1 = int(r_hi.max()) // b, int(c_hi.max()) // b
        # Block windows never need to reach beyond the raster.
        gr0, gr1 = -1, -(-grid.n_rows // b) + 1
        gc0, gc1 = -1, -(-grid.n_cols // b) + 1
        cr0, cr1 = max(br0, gr0), max(min(br1, gr1), max(br0, gr0))
        cc0, cc1 = max(bc0, gc0), max(min(bc1, gc1), max(bc0, gc0))
        ranges.append((b, cr0, cc0, cr1, cc1))
    # When the union of all windows is small, read the raster once at full
    # resolution and build every coarser level by merging blocks.
    b0, cr0, cc0, cr1, cc1 = ranges[0]
    union = [min(cr0, *(r[1] * r[0] for r in ranges)), min(cc0, *(r[2] * r[0] for r in ranges)),
             max(cr1, *(r[3] * r[0] for r in ranges)), max(cc1, *(r[4] * r[0] for r in ranges))]
    union = [max(union[0], -1), max(union[1], -1), min(union[2], grid.n_rows + 1), min(union[3], grid.n_cols + 1)]
    own = list(ranges)
    if b0 == 1 and (union[2] - union[0]) * (union[3] - union[1]) <= SINGLE_READ_CELLS:
        ranges[0] = (1, *union)
        # Each level is built over its own window and every coarser level's
        # (all inside the union read above), so that each merges from the next
        # finer one, four times smaller, instead of from the full-resolution cells.
        for idx in range(len(ranges) - 2, 0, -1):
            b, r0, c0, r1, c1 = ranges[idx]
            m = ranges[idx + 1][0] // b
            _, s0, t0, s1, t1 = ranges[idx + 1]
            top_r, top_c = -(-grid.n_rows // b) + 1, -(-grid.n_cols // b) + 1
            ranges[idx] = (b, max(min(r0, s0 * m), -1), max(min(c0, t0 * m), -1),
                           min(max(r1, s1 * m), top_r), min(max(c1, t1 * m), top_c))
    stats: list[BlockLevel] = []
    for idx, (b, cr0, cc0, cr1, cc1) in enumerate(ranges):
        # From a finer level already built when it holds the window (no
        # raster read), else from the raster by strips.
        lvl = None
        for finer in reversed(stats):
            lvl = merge_blocks(finer, b, cr0, cc0, cr1 - cr0, cc1 - cc0, (grid.n_rows, grid.n_cols))
            if lvl is not None:
                break
        if lvl is None:
            lvl = block_statistics(grid, cr0, cc0, cr1 - cr0, cc1 - cc0, b, exclude, is_cancelled)
        stats.append(lvl)
        if is_cancelled is not None and is_cancelled():
            msg = "terrain correction cancelled"
            raise TerrainCancelled(msg)
        if level_done is not None:
            level_done((idx + 1) / len(levels))
    for idx, (built, wanted) in enumerate(zip(ranges, own)):
        if built != wanted:
            # Built over a larger window to build the coarser levels; the
            # stations need only its own window.
            b, r0, c0, r1, c1 = wanted
            full = stats[idx]
            sl = (slice(r0 - full.block_row0, r1 - full.block_row0),
                  slice(c0 - full.block_col0, c1 - full.block_col0))
            stats[idx] = BlockLevel(b, r0, c0, *(a[sl] for a in (
                full.weight, full.mean, full.variance, full.row_offset, full.col_offset, full.row_height_cov,
                full.col_height_cov)))
    origin = tile_origin(grid, x, y) if not grid.geographic else (0.0, 0.0)
    return GridPlan(grid, levels, windows, stats, [block_table(grid, lvl, origin) for lvl in stats], is_fine, exclude)


def _band_range(grid: ElevationGrid, y_lo: float, y_hi: float) -> tuple[float, float]:
    """Latitude range of the tile-lattice bands holding ``y_lo`` to ``y_hi`` (geographic grids).

    Projected grids: the range unchanged.

    Examples
    --------
    >>> g = ElevationGrid.from_array([[0.0]], 0, 46.0, 1.0, 1.0, geographic=True)
    >>> lo, hi = _band_range(g, 45.9, 45.95)
    >>> lo < 45.9 and 45.95 < hi <= 46.0
    True
    """
    if not grid.geographic:
        return y_lo, y_hi
    span_y = math.degrees(TILE_SPAN / MEAN_EARTH_RADIUS)
    top = math.floor((grid.y_origin - y_hi) / span_y)
    bottom = math.floor((grid.y_origin - y_lo) / span_y)
    return grid.y_origin - (bottom + 1) * span_y, grid.y_origin - top * span_y


def _band_span_x(span_y: float, ty: np.ndarray, y_origin: float) -> np.ndarray:
    """Tile width (degrees) of each latitude band: TILE_SPAN at the band's poleward edge."""
    north = y_origin - ty * span_y
    south = north - span_y
    poleward = np.minimum(np.maximum(np.abs(north), np.abs(south)), 90.0)
    return span_y / np.maximum(np.cos(np.radians(poleward)), 0.05)


def tiles(grid: ElevationGrid, x: np.ndarray, y: np.ndarray, todo: np.ndarray) -> list[np.ndarray]:
    """Indices of the stations to compute, grouped into tiles of ``TILE_SPAN``.

    Examples
    --------
    >>> g = ElevationGrid.from_array([[0.0]], 0, 1e6, 1e6, 1e6)
    >>> [t.tolist() for t in tiles(g, np.array([0.0, 1e5, 10.0]), np.zeros(3), np.ones(3, bool))]
    [[0, 2], [1]]
    """
    idx = np.nonzero(todo)[0]
    if idx.size == 0:
        return []
    span = TILE_SPAN
    span_y = math.degrees(span / MEAN_EARTH_RADIUS) if grid.geographic else span
    # Tiles are cells of a lattice anchored at the raster's corner, so a
    # station's tile (and the tile's origin, see plan_grid) does not depend on
    # the other stations of the run. Geographic grids: bands of latitude, each
    # with its own tile width in longitude.
    ty = np.floor((grid.y_origin - y[idx]) / span_y).astype(np.int64)
    span_x = _band_span_x(span_y, ty, grid.y_origin) if grid.geographic else span
    tx = np.floor((x[idx] - grid.x_origin) / span_x).astype(np.int64)
    key = (tx - tx.min()) * (int(ty.max() - ty.min()) + 1) + (ty - ty.min())
    return [idx[key == kk] for kk in np.unique(key)]


def tile_origin(grid: ElevationGrid, x: np.ndarray, y: np.ndarray) -> tuple[float, float]:
    """Centre of the tile-lattice cell holding the stations (projected grids).

    Examples
    --------
    >>> g = ElevationGrid.from_array([[0.0]], 0, 1e6, 1e6, 1e6)
    >>> tile_origin(g, np.array([10.0, 20.0]), np.array([999_000.0]))
    (30000.0, 970000.0)
    """
    col = math.floor((float(np.mean(x)) - grid.x_origin) / TILE_SPAN)
    row = math.floor((grid.y_origin - float(np.mean(y))) / TILE_SPAN)
    return grid.x_origin + (col + 0.5) * TILE_SPAN, grid.y_origin - (row + 0.5) * TILE_SPAN
