# SPDX-License-Identifier: GPL-2.0-or-later
"""Evaluation: the terrain effect of the cells and blocks of one level.

For a batch of stations and one level of a :class:`~._plan.GridPlan`, the
blocks each station needs (its ring, with data, not excluded) are gathered
into flat arrays first, so the kernels run only on blocks that contribute.
Far blocks are terrain columns with second-order size and height-variance
terms (:func:`~._kernels.column_terrain_effect`); full-resolution cells within
``PRISM_RATIO`` cell sides are exact prisms (Nagy 1966). The formulas and
their derivations are in ``docs/terrain.md``.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from ..constants import GRAVITATIONAL_CONSTANT, MEAN_EARTH_RADIUS, SI_TO_MGAL
from ._grid import ElevationGrid
from ._kernels import column_kernel, column_terrain_effect
from ._plan import PRISM_RATIO, GridPlan, metres_per_degree
from ._prism import prism_gravity


@dataclass(frozen=True, eq=False)
class Batch:
    """Stations evaluated together (same tile).

    Attributes
    ----------
    local : numpy.ndarray
        Indices of the stations into the tile's plan windows.
    x, y, height : numpy.ndarray
        Station coordinates (grid CRS) and heights (m).
    cell_row, cell_col : numpy.ndarray
        North-west cell of the 2 x 2 fine cells around each station (the
        innermost model's cells).
    """

    local: np.ndarray
    x: np.ndarray
    y: np.ndarray
    height: np.ndarray
    cell_row: np.ndarray
    cell_col: np.ndarray


@dataclass(frozen=True)
class Physics:
    """The scalar part of the model the kernels need.

    Attributes
    ----------
    density : float
        Rock density (kg/m^3).
    water_density : float or None
        Water density (kg/m^3) below height 0, or None for dry valleys.
    inner_radius, outer_radius : float
        Zone radii (m).
    curvature : bool
        Lower the terrain by s^2/(2R).
    """

    density: float
    water_density: float | None
    inner_radius: float
    outer_radius: float
    curvature: bool


@dataclass(frozen=True, eq=False)
class LevelSums:
    """What one level adds to each station of a batch (arrays of one value per station).

    Attributes
    ----------
    inner, outer : numpy.ndarray
        Terrain correction (mGal) counted to ``tc_inner`` and ``tc_outer``.
    covered, covered_inner : numpy.ndarray
        Area with data (m^2) inside the outer and inside the inner circle.
    relief_area, relief_sum, relief_square : numpy.ndarray
        Sums over the level's blocks with data of area, area x relief and
        area x (relief^2 + height variance), relief relative to the station:
        the relief statistics of the level, used to estimate what terrain
        beyond the rasters' reach would add (docs/terrain.md, "Truncation").
    """

    inner: np.ndarray
    outer: np.ndarray
    covered: np.ndarray
    covered_inner: np.ndarray
    relief_area: np.ndarray
    relief_sum: np.ndarray
    relief_square: np.ndarray

    @classmethod
    def empty(cls, n: int) -> LevelSums:
        """All zeros for ``n`` stations.

        Examples
        --------
        >>> LevelSums.empty(2).inner.tolist()
        [0.0, 0.0]
        """
        return cls(*(np.zeros(n) for _ in range(7)))


def ground_offsets(grid: ElevationGrid, xs, ys, cx, cy) -> tuple[np.ndarray, np.ndarray]:
    """Ground offsets (m) east and north of points from the station(s).

    Projected grids: plain differences. Geographic grids: azimuthal
    equidistant on the sphere of radius MEAN_EARTH_RADIUS (great-circle
    distance and azimuth).

    Examples
    --------
    >>> g = ElevationGrid.from_array([[0.0]], 0, 1, 1, 1, geographic=True)
    >>> e, n = ground_offsets(g, 0.0, 0.0, 0.0, 1.0)
    >>> round(float(e), 6), round(float(n), 1)
    (0.0, 111195.1)
    """
    if not grid.geographic:
        return cx - xs, cy - ys
    lam0, phi0 = np.radians(xs), np.radians(ys)
    lam, phi = np.radians(cx), np.radians(cy)
    dlam = lam - lam0
    cos_phi, cos_phi0, sin_phi0 = np.cos(phi), np.cos(phi0), np.sin(phi0)
    sin_half = np.sin(0.5 * (phi - phi0)) ** 2 + cos_phi0 * cos_phi * np.sin(0.5 * dlam) ** 2
    s = 2.0 * MEAN_EARTH_RADIUS * np.arcsin(np.sqrt(np.clip(sin_half, 0.0, 1.0)))
    az = np.arctan2(np.sin(dlam) * cos_phi, cos_phi0 * np.sin(phi) - sin_phi0 * cos_phi * np.cos(dlam))
    return s * np.sin(az), s * np.cos(az)


def prism_terms(dx, dy, hx, hy, rel, drop, heights, physics: Physics) -> np.ndarray:
    """Exact prism terrain effect (mGal) of flat-topped cells (1-D arrays).

    Parameters
    ----------
    dx, dy : numpy.ndarray
        Cell centre minus station (m).
    hx, hy : numpy.ndarray
        Half sides (m).
    rel : numpy.ndarray
        Cell height minus station height (m).
    drop : numpy.ndarray
        Curvature drop s^2/(2R) at the cell (m).
    heights : numpy.ndarray
        Station heights (m), for the water layer.
    physics : Physics

    Returns
    -------
    numpy.ndarray
        Positive for relief above or below the station.

    Examples
    --------
    >>> p = Physics(2670.0, None, 0.0, 1e3, False)
    >>> one = np.array([1.0])
    >>> float(prism_terms(one * 100, one * 0, one * 15, one * 15, one * 50, one * 0, one * 0, p)[0]) > 0
    True
    """
    lo = np.minimum(-drop, rel - drop)
    hi = np.maximum(-drop, rel - drop)
    g = -np.sign(rel) * prism_gravity(0.0, 0.0, 0.0, dx - hx, dx + hx, dy - hy, dy + hy, lo, hi, physics.density)
    if physics.water_density is not None:
        wet = rel + heights < 0.0
        if np.any(wet):
            gw = prism_gravity(
                0.0,
                0.0,
                0.0,
                dx[wet] - hx[wet],
                dx[wet] + hx[wet],
                dy[wet] - hy[wet],
                dy[wet] + hy[wet],
                rel[wet] - drop[wet],
                -heights[wet] - drop[wet],
                physics.water_density,
            )
            g[wet] -= gw
    return g


def column_terms(
    dx, dy, s2, relief, mean, area, side_x, side_y, variance, heights, physics: Physics, cov=(None, None)
) -> np.ndarray:
    """Column terrain effect (mGal) of blocks, water included (1-D arrays).

    Examples
    --------
    >>> p = Physics(2670.0, None, 0.0, 1e4, False)
    >>> a = np.array([1000.0]); z = np.array([0.0])
    >>> print(f"{float(column_terms(a, z, a * a, z + 50, z + 50, z + 1e4, z + 100, z + 100, 0.0, z, p)[0]):.6f}")
    0.000223
    """
    drop = s2 * (0.5 / MEAN_EARTH_RADIUS) if physics.curvature else 0.0
    scale = GRAVITATIONAL_CONSTANT * SI_TO_MGAL
    tc = column_kernel(s2, dx, dy, relief, drop, side_x, side_y, area, variance, *cov)
    tc *= physics.density * scale
    if physics.water_density is not None:
        wet = mean < 0.0
        if np.any(wet):
            w = np.nonzero(wet)[0]
            d = drop[w] if np.ndim(drop) else drop
            sx, sy = np.broadcast_to(side_x, dx.shape)[w], np.broadcast_to(side_y, dx.shape)[w]
            v = (dx[w], dy[w])
            top = column_terrain_effect(*v, relief[w], d, sx, sy, area[w])
            layer = top - column_terrain_effect(*v, -heights[w], d, sx, sy, area[w])
            tc[w] -= physics.water_density * scale * layer
    return tc


def _piece_terms(plan: GridPlan, bt: Batch, owner, rows, cols, rel, physics: Physics) -> np.ndarray:
    """Exact prisms of the parts of cells outside the finer raster's footprint."""
    grid = plan.grid
    west, east, south, north = plan.exclude
    x1 = grid.x_origin + cols * grid.cell_x
    x2 = x1 + grid.cell_x
    y2 = grid.y_origin - rows * grid.cell_y
    y1 = y2 - grid.cell_y
    mx1, mx2 = np.maximum(x1, west), np.minimum(x2, east)
    out = np.zeros(owner.shape)
    for px1, px2, py1, py2 in (
        (x1, np.minimum(x2, west), y1, y2),
        (np.maximum(x1, east), x2, y1, y2),
        (mx1, mx2, y1, np.minimum(y2, south)),
        (mx1, mx2, np.maximum(y1, north), y2),
    ):
        keep = (px2 > px1) & (py2 > py1)
        if not np.any(keep):
            continue
        o = owner[keep]
        cx, cy = 0.5 * (px1[keep] + px2[keep]), 0.5 * (py1[keep] + py2[keep])
        dx, dy = ground_offsets(grid, bt.x[o], bt.y[o], cx, cy)
        if grid.geographic:
            hx = 0.5 * (px2[keep] - px1[keep]) * metres_per_degree() * np.cos(np.radians(cy))
            hy = 0.5 * (py2[keep] - py1[keep]) * metres_per_degree()
        else:
            hx, hy = 0.5 * (px2[keep] - px1[keep]), 0.5 * (py2[keep] - py1[keep])
        drop = (dx * dx + dy * dy) * (0.5 / MEAN_EARTH_RADIUS) if physics.curvature else np.zeros(dx.shape)
        out[np.nonzero(keep)[0]] += prism_terms(dx, dy, hx, hy, rel[keep], drop, bt.height[o], physics)
    return out


def _station_sums(owner: np.ndarray, values: np.ndarray, n_st: int) -> np.ndarray:
    """Sums of ``values`` per station (``owner`` sorted), in double precision.

    Examples
    --------
    >>> _station_sums(np.array([0, 0, 2]), np.array([1.0, 2.0, 5.0], np.float32), 4).tolist()
    [3.0, 0.0, 5.0, 0.0]
    """
    out = np.zeros(n_st)
    if owner.size == 0:
        return out
    stations = np.arange(n_st)
    starts = np.searchsorted(owner, stations, "left")
    ends = np.searchsorted(owner, stations, "right")
    some = ends > starts
    out[some] = np.add.reduceat(values, starts[some], dtype=np.float64)
    return out


def share_inside(s: np.ndarray, dx, dy, side_x, side_y, radius: float) -> np.ndarray:
    """Share (0-1) of each block inside a circle of ``radius`` around the station.

    The circle is treated as straight across the block: the block's width
    along the radius is ``(side_x |dx| + side_y |dy|) / s``.

    Examples
    --------
    >>> one = np.ones(3)
    >>> share_inside(np.array([90.0, 100.0, 130.0]), np.array([90.0, 100.0, 130.0]), 0 * one, 20 * one, 20 * one, 100.0)
    array([1. , 0.5, 0. ])
    """
    width = (side_x * np.abs(dx) + side_y * np.abs(dy)) / np.maximum(s, 1e-9)
    return np.clip(0.5 + (radius - s) / np.maximum(width, 1e-9), 0.0, 1.0)


def evaluate_level(plan: GridPlan, level_index: int, bt: Batch, physics: Physics) -> LevelSums:
    """Terrain correction (mGal), covered areas and relief statistics of one level.

    Parameters
    ----------
    plan : GridPlan
        The grid's plan for the tile.
    level_index : int
        Which level of the plan.
    bt : Batch
        The stations.
    physics : Physics
        Density, water, radii, curvature.

    Returns
    -------
    LevelSums
        A block straddling the inner circle is shared between ``inner`` and
        ``outer`` (and counts to ``covered_inner``) by the part of its area
        inside (:func:`share_inside`); a block straddling the outer circle
        counts by the part of it inside, in the correction and in
        ``covered``, a full-resolution cell by its centre in the correction.

    Examples
    --------
    >>> from ._plan import plan_grid
    >>> g = ElevationGrid.from_array(np.full((100, 100), 10.0), 0, 3000, 30, 30)
    >>> x = np.array([1500.0]); p = plan_grid(g, x, x, 1000.0, True, None, None)
    >>> bt = Batch(np.array([0]), x, x, x * 0, np.array([49]), np.array([49]))
    >>> r = evaluate_level(p, 0, bt, Physics(2670.0, None, 500.0, 1000.0, False))
    >>> bool(r.inner[0] > 0 and r.outer[0] > 0), bool(r.covered[0] > 2.0e6), bool(r.covered_inner[0] < 8e5)
    (True, True, True)
    """
    k, _ = plan.levels[level_index]
    b = 2**k
    grid = plan.grid
    lvl = plan.stats[level_index]
    tab = plan.tables[level_index]
    n_st = bt.local.size
    n_br, n_bc = lvl.weight.shape
    if lvl.weight.size == 0:
        return LevelSums.empty(n_st)
    r_lo, r_hi, c_lo, c_hi = (a[bt.local] // b for a in plan.windows[level_index])
    # Only the part of each window where the level has data is looked at.
    box_r0, box_r1, box_c0, box_c1 = tab.data_box
    r_lo, r_hi = np.maximum(r_lo, box_r0), np.minimum(r_hi, box_r1)
    c_lo, c_hi = np.maximum(c_lo, box_c0), np.minimum(c_hi, box_c1)
    nr, nc = int(max((r_hi - r_lo).max(), 0)), int(max((c_hi - c_lo).max(), 0))
    if nr == 0 or nc == 0:
        return LevelSums.empty(n_st)
    rows = r_lo[:, None] + np.arange(nr)[None, :]
    cols = c_lo[:, None] + np.arange(nc)[None, :]
    ri = rows - lvl.block_row0
    ci = cols - lvl.block_col0
    row_ok = (ri < n_br) & (rows < r_hi[:, None])
    col_ok = (ci < n_bc) & (cols < c_hi[:, None])
    valid = row_ok[:, :, None] & col_ok[:, None, :]
    if level_index > 0:
        # The ring of this level: leave out the square of the finer level.
        p_lo, p_hi, q_lo, q_hi = (a[bt.local] // b for a in plan.windows[level_index - 1])
        hole_r = (rows >= p_lo[:, None]) & (rows < p_hi[:, None])
        hole_c = (cols >= q_lo[:, None]) & (cols < q_hi[:, None])
        valid &= ~(hole_r[:, :, None] & hole_c[:, None, :])
    if plan.is_fine and k == 0:
        # The four cells around the station belong to the innermost model.
        near_r = (rows == bt.cell_row[:, None]) | (rows == bt.cell_row[:, None] + 1)
        near_c = (cols == bt.cell_col[:, None]) | (cols == bt.cell_col[:, None] + 1)
        valid &= ~(near_r[:, :, None] & near_c[:, None, :])
    # Gather only the blocks of the rings that have data.
    index_type = np.int32 if n_br * n_bc < 2**31 else np.int64
    row_part = (np.minimum(ri, n_br - 1).astype(index_type) * n_bc)[:, :, None]
    dense = row_part + np.minimum(ci, n_bc - 1).astype(index_type)[:, None, :]
    ar0, ar1 = int(r_lo.min()) - lvl.block_row0, int((r_lo + nr).max()) - lvl.block_row0
    ac0, ac1 = int(c_lo.min()) - lvl.block_col0, int((c_lo + nc).max()) - lvl.block_col0
    ar1, ac1 = min(ar1, n_br), min(ac1, n_bc)
    sat = tab.missing_table
    if sat[ar1, ac1] - sat[ar0, ac1] - sat[ar1, ac0] + sat[ar0, ac0] > 0:
        valid &= tab.has_data[dense]
    counts = valid.sum(axis=(1, 2))
    flat = dense[valid]
    owner = np.repeat(np.arange(n_st, dtype=np.int32), counts)
    # The column terms run in single precision, from offsets taken relative
    # to the tile's origin (projected grids) or computed in double precision
    # (geographic): each term is good to about 1e-6 of itself, far below the
    # model's own error, at half the cost.
    if grid.geographic:
        dx, dy = (
            d.astype(np.float32) for d in ground_offsets(grid, bt.x[owner], bt.y[owner], tab.x[flat], tab.y[flat])
        )
    else:
        dx = tab.east[flat] - (bt.x - tab.origin[0]).astype(np.float32)[owner]
        dy = tab.north[flat] - (bt.y - tab.origin[1]).astype(np.float32)[owner]
    heights = bt.height.astype(np.float32)[owner]
    area = tab.area[flat]
    side_x = tab.side_x[flat] if grid.geographic else tab.side_x
    side_y = tab.side_y
    s2 = np.maximum(dx * dx + dy * dy, np.float32(1e-6))
    if s2.size == 0:
        return LevelSums.empty(n_st)
    half = tab.half_diagonal
    outer = physics.outer_radius
    inner_r = physics.inner_radius
    # Area with data inside the inner circle, by the part of each block inside.
    all_out = s2.min() >= (inner_r + half) ** 2
    all_in = inner_r > half and s2.max() <= (inner_r - half) ** 2
    if all_out:
        covered_inner = np.zeros(n_st)
    elif not all_in:
        covered_inner = _station_sums(owner, area * share_inside(np.sqrt(s2), dx, dy, side_x, side_y, inner_r), n_st)
    rim = None
    if float(s2.max()) > (outer - half) ** 2:
        # Blocks at the rim count by the part of them inside the outer circle
        # (the circle taken as straight across the block); full-resolution
        # cells by their centre.
        rim = share_inside(np.sqrt(s2), dx, dy, side_x, side_y, outer)
        covered = _station_sums(owner, area * rim, n_st)
        if b == 1:
            rim = None
            use = np.nonzero(s2 <= outer * outer)[0]
        else:
            use = np.nonzero(rim > 0)[0]
            rim = rim[use]
        owner, flat, dx, dy, s2, heights, area = (a[use] for a in (owner, flat, dx, dy, s2, heights, area))
        if grid.geographic:
            side_x = side_x[use]
    else:
        covered = _station_sums(owner, area, n_st)
    if all_in:
        # Inside the inner circle, hence inside the outer one.
        covered_inner = covered
    mean = tab.mean[flat]
    variance = tab.variance[flat] if k > 0 else 0.0
    cov = (tab.cov_east[flat], tab.cov_north[flat]) if k > 0 else (None, None)
    relief = mean - heights
    tc = column_terms(dx, dy, s2, relief, mean, area, side_x, side_y, variance, heights, physics, cov)
    if k == 0:
        _exact_near_cells(plan, bt, owner, flat, area, dx, dy, s2, side_x, side_y, relief, tc, physics)
    if rim is not None:
        tc *= rim
    total = _station_sums(owner, tc, n_st)
    if rim is not None:
        area = area * rim
    if tc.size == 0 or s2.min() >= (inner_r + half) ** 2:
        inner = np.zeros(n_st)
    elif inner_r > half and s2.max() <= (inner_r - half) ** 2:
        inner = total.copy()
    else:
        share = share_inside(np.sqrt(s2), dx, dy, side_x, side_y, inner_r)
        inner = _station_sums(owner, tc * share, n_st)
    square = relief * relief + variance
    return LevelSums(
        inner=inner,
        outer=total - inner,
        covered=covered,
        covered_inner=covered_inner,
        relief_area=_station_sums(owner, area, n_st),
        relief_sum=_station_sums(owner, area * relief, n_st),
        relief_square=_station_sums(owner, area * square, n_st),
    )


def _exact_near_cells(plan, bt, owner, flat, area, dx, dy, s2, side_x, side_y, relief, tc, physics) -> None:
    """Replace (in ``tc``) the column terms of cells near the stations by exact prisms."""
    side_x = np.broadcast_to(side_x, s2.shape)
    side_y = np.broadcast_to(side_y, s2.shape)
    near = np.nonzero(s2 < PRISM_RATIO * PRISM_RATIO * np.maximum(side_x, side_y) ** 2)[0]
    if near.size:
        tc[near] = exact_cell_terms(plan, bt, owner[near], flat[near], tc[near], physics)


def exact_cell_terms(plan: GridPlan, bt: Batch, owner, flat, column, physics: Physics) -> np.ndarray:
    """Exact prism terms (mGal) of full-resolution cells near the stations.

    Parameters
    ----------
    plan : GridPlan
        The grid's plan; its level 0 holds the cells.
    bt : Batch
        The stations.
    owner, flat : numpy.ndarray
        Station (index into the batch) and cell (flat index into level 0).
    column : numpy.ndarray
        Column terms of the same cells, kept where a cell is partly covered
        and no finer raster's footprint cuts it.
    physics : Physics

    Returns
    -------
    numpy.ndarray
        Cells fully covered: the flat-topped prism (Nagy 1966) in double
        precision; cells cut by the finer raster's footprint: prisms of the
        part outside it.
    """
    lvl = plan.stats[0]
    tab = plan.tables[0]
    out = np.array(column, dtype=float)
    full = lvl.weight.ravel()[flat] >= 1.0 - 1e-12
    # Exact prisms in double precision, from the double-precision statistics.
    relief = lvl.mean.ravel()[flat] - bt.height[owner]
    idx = np.nonzero(full)[0]
    if idx.size:
        o = owner[idx]
        f = flat[idx]
        ex, ny = ground_offsets(plan.grid, bt.x[o], bt.y[o], tab.x[f], tab.y[f])
        drop = (ex * ex + ny * ny) * (0.5 / MEAN_EARTH_RADIUS) if physics.curvature else np.zeros(idx.size)
        side_x = tab.side_x[f] if plan.grid.geographic else np.full(idx.size, tab.side_x)
        hx = 0.5 * side_x.astype(float)
        hy = np.full(idx.size, 0.5 * float(tab.side_y))
        out[idx] = prism_terms(ex, ny, hx, hy, relief[idx], drop, bt.height[o], physics)
    part = np.nonzero(~full)[0]
    if part.size and plan.exclude is not None:
        # Cells cut by the finer raster's footprint: exact prisms of the part
        # outside it. (Partly covered cells without a footprint keep the column.)
        n_bc = lvl.weight.shape[1]
        rows = flat[part] // n_bc + lvl.block_row0
        cols = flat[part] % n_bc + lvl.block_col0
        out[part] = _piece_terms(plan, bt, owner[part], rows, cols, relief[part], physics)
    return out
