# SPDX-License-Identifier: GPL-2.0-or-later
"""Evaluation of a level by rectangles (projected grids).

The same sums as :func:`~._evaluate.evaluate_level`, computed another way.
Each station's ring at a level is its square window minus the finer level's
square (the hole), both clipped to where the level has data. That is at most
four rectangles: the band above the hole, the band below it, and the parts
left and right of it. For a batch of stations each rectangle is copied out of
the level's field stack (:attr:`~._plan.BlockTable.stack`) for every station
at once, as a sliding window of the largest extent in the batch; positions
beyond a station's own extent (a block or two where the batch's stations
differ) are masked by giving them no area. The column terms then run on
dense (station, block) arrays: no per-block masks or scattered gathers of the
fields, which cost several times the kernel itself on the masked path. Each
station's sums take its own positions only, in a fixed order, so that its
result does not depend on the other stations of the batch.

A station whose rectangles at a level hold mostly blocks without data (at a
regional DEM's first level, most blocks lie under the fine DEM's footprint)
is left to the masked path, which evaluates only blocks with data; so are
geographic grids (their offsets are great-circle, computed in double
precision).
"""

from __future__ import annotations

import numpy as np

from ..constants import MEAN_EARTH_RADIUS
from ._evaluate import Batch, LevelSums, Physics, evaluate_level, exact_cell_terms, share_inside
from ._kernels import column_kernel, column_scale, column_terrain_effect
from ._plan import PRISM_RATIO, GridPlan
from ._sampling import station_cells

#: Pairs (station, block) per call of the column kernel (see _kernel_by_slices).
KERNEL_SLICE = 262_144

#: Below this share of blocks with data in a station's rectangles, the masked
#: path (only blocks with data) is used for that station instead.
MIN_DATA_SHARE = 0.6


def ring_rectangles(plan: GridPlan, level_index: int, bt: Batch) -> list[tuple[np.ndarray, ...]]:
    """The rectangles (absolute block rows [a0, a1), columns [b0, b1)) of each station's ring.

    Parameters
    ----------
    plan : GridPlan
        The grid's plan for the tile.
    level_index : int
        Which level.
    bt : Batch
        The stations.

    Returns
    -------
    list of (a0, a1, b0, b1)
        One to four rectangles, each as arrays of one value per station
        (empty where ``a1 <= a0`` or ``b1 <= b0``), clipped to the level's
        data box; together they tile the window minus the finer level's
        square without overlap.

    Examples
    --------
    >>> from ._grid import ElevationGrid
    >>> from ._plan import plan_grid
    >>> g = ElevationGrid.from_array(np.zeros((400, 400)), 0, 12000, 30, 30)
    >>> x = np.array([6000.0]); p = plan_grid(g, x, x, 2000.0, True, None, None)
    >>> bt = Batch(np.array([0]), x, x, x * 0, np.array([199]), np.array([199]))
    >>> rects = ring_rectangles(p, 1, bt)
    >>> sum(int((a1 - a0)[0] * (b1 - b0)[0]) for a0, a1, b0, b1 in rects)
    2187
    """
    k = plan.levels[level_index][0]
    b = 2**k
    box_r0, box_r1, box_c0, box_c1 = plan.tables[level_index].data_box
    r_lo, r_hi, c_lo, c_hi = (a[bt.local] // b for a in plan.windows[level_index])
    r_lo = np.clip(r_lo, box_r0, box_r1)
    r_hi = np.maximum(np.clip(r_hi, box_r0, box_r1), r_lo)
    c_lo = np.clip(c_lo, box_c0, box_c1)
    c_hi = np.maximum(np.clip(c_hi, box_c0, box_c1), c_lo)
    if level_index == 0:
        return [(r_lo, r_hi, c_lo, c_hi)]
    p_lo, p_hi, q_lo, q_hi = (a[bt.local] // b for a in plan.windows[level_index - 1])
    p_lo = np.clip(p_lo, r_lo, r_hi)
    p_hi = np.clip(p_hi, p_lo, r_hi)
    q_lo = np.clip(q_lo, c_lo, c_hi)
    q_hi = np.clip(q_hi, q_lo, c_hi)
    return [(r_lo, p_lo, c_lo, c_hi), (p_hi, r_hi, c_lo, c_hi), (p_lo, p_hi, c_lo, q_lo), (p_lo, p_hi, q_hi, c_hi)]


def data_share(plan: GridPlan, level_index: int, rects: list[tuple[np.ndarray, ...]]) -> np.ndarray:
    """Per station, the share (0-1) of the blocks of its rectangles that have data (1 when there are none).

    Examples
    --------
    >>> from ._grid import ElevationGrid
    >>> from ._plan import plan_grid
    >>> g = ElevationGrid.from_array(np.zeros((400, 400)), 0, 12000, 30, 30)
    >>> x = np.array([6000.0]); p = plan_grid(g, x, x, 2000.0, True, None, None)
    >>> bt = Batch(np.array([0]), x, x, x * 0, np.array([199]), np.array([199]))
    >>> data_share(p, 1, ring_rectangles(p, 1, bt)).tolist()
    [1.0]
    """
    lvl = plan.stats[level_index]
    sat = plan.tables[level_index].missing_table
    total = 0
    missing = 0
    for a0, a1, b0, b1 in rects:
        r0, r1 = a0 - lvl.block_row0, a1 - lvl.block_row0
        c0, c1 = b0 - lvl.block_col0, b1 - lvl.block_col0
        total = total + np.maximum(r1 - r0, 0) * np.maximum(c1 - c0, 0)
        empty = (r1 <= r0) | (c1 <= c0)
        r1, c1 = np.where(empty, r0, r1), np.where(empty, c0, c1)
        missing = missing + (sat[r1, c1] - sat[r0, c1] - sat[r1, c0] + sat[r0, c0])
    with np.errstate(invalid="ignore", divide="ignore"):
        return np.where(total > 0, 1.0 - missing / np.maximum(total, 1), 1.0)


def evaluate_rings(plan: GridPlan, level_index: int, bt: Batch, physics: Physics) -> LevelSums | None:
    """:func:`~._evaluate.evaluate_level` by rectangles, or None where the masked path suits better.

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
    LevelSums or None
        The same quantities as :func:`~._evaluate.evaluate_level` (equal up
        to single-precision rounding; stations whose rectangles hold less
        than ``MIN_DATA_SHARE`` blocks with data are computed by it); None
        for geographic grids and when no station qualifies.

    Examples
    --------
    >>> from ._evaluate import evaluate_level
    >>> from ._grid import ElevationGrid
    >>> from ._plan import plan_grid
    >>> rng = np.random.default_rng(0)
    >>> g = ElevationGrid.from_array(rng.uniform(0, 200, (400, 400)), 0, 12000, 30, 30)
    >>> x = np.array([6000.0, 6400.0]); p = plan_grid(g, x, x, 4000.0, True, None, None)
    >>> bt = Batch(np.arange(2), x, x, x * 0 + 100, np.array([199, 212]), np.array([199, 212]))
    >>> ph = Physics(2670.0, None, 1000.0, 4000.0, True)
    >>> a, b = evaluate_rings(p, 2, bt, ph), evaluate_level(p, 2, bt, ph)
    >>> bool(np.allclose(a.outer, b.outer, rtol=1e-5) and np.allclose(a.covered, b.covered, rtol=1e-5))
    True
    """
    tab = plan.tables[level_index]
    stack = tab.stack
    if stack is None:
        return None
    n_st = bt.local.size
    rects = ring_rectangles(plan, level_index, bt)
    # Each station by its own rings' share of blocks with data, so that its
    # path (and result) does not depend on the other stations of the batch.
    use = data_share(plan, level_index, rects) >= MIN_DATA_SHARE
    if not np.any(use):
        return None
    every = bool(np.all(use))
    sub = bt if every else _subset(bt, use)
    sums = np.zeros((7, sub.local.size))
    for rect in rects:
        part = rect if every else tuple(a[use] for a in rect)
        if np.any((part[1] > part[0]) & (part[3] > part[2])):
            sums += _rectangle_sums(plan, level_index, sub, physics, part)
    if every:
        return LevelSums(*sums)
    rest = evaluate_level(plan, level_index, _subset(bt, ~use), physics)
    out = np.zeros((7, n_st))
    out[:, use] = sums
    out[:, ~use] = [rest.inner, rest.outer, rest.covered, rest.covered_inner, rest.relief_area, rest.relief_sum,
                    rest.relief_square]
    return LevelSums(*out)


def _subset(bt: Batch, keep: np.ndarray) -> Batch:
    """The stations of a batch where ``keep`` is True."""
    return Batch(bt.local[keep], bt.x[keep], bt.y[keep], bt.height[keep], bt.cell_row[keep], bt.cell_col[keep])


def _rectangle_sums(plan: GridPlan, level_index: int, bt: Batch, physics: Physics, rect) -> np.ndarray:
    """The seven per-station sums of :class:`LevelSums` over one rectangle of each station's ring."""
    a0, a1, b0, b1 = rect
    k = plan.levels[level_index][0]
    b = 2**k
    grid = plan.grid
    tab = plan.tables[level_index]
    lvl = plan.stats[level_index]
    n_st = bt.local.size
    _, n_br, n_bc = tab.stack.shape
    n_r = int(np.max(a1 - a0))
    n_c = int(np.max(b1 - b0))
    out = np.zeros((7, n_st))
    if n_r <= 0 or n_c <= 0:
        return out
    f32 = np.float32
    # Anchors so that the largest extent fits the stored level (the data box
    # lies inside it); positions outside a station's own extent get no area.
    ar = np.minimum(a0, lvl.block_row0 + n_br - n_r)
    ac = np.minimum(b0, lvl.block_col0 + n_bc - n_c)
    rows = ar[:, None] + np.arange(n_r)
    cols = ac[:, None] + np.arange(n_c)
    ok_r = (rows >= a0[:, None]) & (rows < a1[:, None])
    ok_c = (cols >= b0[:, None]) & (cols < b1[:, None])
    mask = ok_r[:, :, None] & ok_c[:, None, :]
    if plan.is_fine and k == 0:
        # The four cells around the station belong to the innermost model.
        near_r = (rows == bt.cell_row[:, None]) | (rows == bt.cell_row[:, None] + 1)
        near_c = (cols == bt.cell_col[:, None]) | (cols == bt.cell_col[:, None] + 1)
        mask &= ~(near_r[:, :, None] & near_c[:, None, :])
    r_rel, c_rel = ar - lvl.block_row0, ac - lvl.block_col0
    sx = (bt.x - tab.origin[0]).astype(f32)
    sy = (bt.y - tab.origin[1]).astype(f32)
    sat = tab.offset_table
    q0, q1, p0, p1 = a0 - lvl.block_row0, a1 - lvl.block_row0, b0 - lvl.block_col0, b1 - lvl.block_col0
    if np.any(sat[q1, p1] - sat[q0, p1] - sat[q1, p0] + sat[q0, p0]):
        # Some block has its centroid off its centre: offsets from the stack.
        fields = windows(tab.stack, n_r, n_c)[:, r_rel, c_rel]
        dx = fields[0] - sx[:, None, None]
        dy = fields[1] - sy[:, None, None]
        fields = fields[2:]
    else:
        # Block centres on the lattice: offsets along one axis each, the
        # same values as the stack's (same operations, see block_table).
        centre = (b - 1) / 2.0
        east = (grid.x_origin + (cols * b + centre + 0.5) * grid.cell_x - tab.origin[0]).astype(f32)
        north = (grid.y_origin - (rows * b + centre + 0.5) * grid.cell_y - tab.origin[1]).astype(f32)
        dx = (east - sx[:, None])[:, None, :]
        dy = (north - sy[:, None])[:, :, None]
        fields = windows(tab.stack[2:], n_r, n_c)[:, r_rel, c_rel]
    area = fields[0] * mask
    mean = fields[1]
    variance = fields[2] if k > 0 else 0.0
    cov = (fields[3], fields[4]) if k > 0 else (None, None)
    s2 = np.maximum(dx * dx + dy * dy, f32(1e-6))
    relief = mean - bt.height.astype(f32)[:, None, None]
    side = tab.side_x
    half = tab.half_diagonal
    outer = physics.outer_radius
    inner_r = physics.inner_radius

    # Per-station sums over the station's own positions only, in row-major
    # order within its extent: the same additions in the same order whatever
    # the other stations of the batch (which set the margins), so that a
    # station's result does not depend on how a run is cut into chunks.
    own = mask.reshape(n_st, -1)
    counts = own.sum(axis=1)
    some = counts > 0
    starts = (np.cumsum(counts) - counts)[some]
    positions = np.flatnonzero(own)

    def sums(values: np.ndarray) -> np.ndarray:
        total = np.zeros(n_st)
        if positions.size:
            total[some] = np.add.reduceat(values.reshape(-1)[positions], starts, dtype=np.float64)
        return total

    lo2, hi2 = float(s2.min()), float(s2.max())
    rim = None
    if hi2 > (outer - half) ** 2:
        # Blocks at the rim count by the part of them inside the outer circle;
        # full-resolution cells by their centre (as on the masked path).
        share = share_inside(np.sqrt(s2), dx, dy, side, tab.side_y, outer).astype(f32)
        out[2] = sums(area * share)
        rim = (s2 <= f32(outer * outer)).astype(f32) if k == 0 else share
    else:
        out[2] = sums(area)
    # The kernel's values are summed first and scaled once per station.
    unit = physics.density * column_scale()
    drop = s2 * f32(0.5 / MEAN_EARTH_RADIUS) if physics.curvature else 0.0
    tc = _kernel_by_slices(s2, dx, dy, relief, drop, side, tab.side_y, area, variance, cov)
    if physics.water_density is not None:
        # Water below height 0 replaces part of the missing rock (as in column_terms).
        st, i, j = np.nonzero((mean < 0.0) & (area > 0.0))
        if st.size:
            d = drop[st, i, j] if np.ndim(drop) else drop
            v = (np.broadcast_to(dx, s2.shape)[st, i, j], np.broadcast_to(dy, s2.shape)[st, i, j])
            wet_area = area[st, i, j]
            top = column_terrain_effect(*v, relief[st, i, j], d, side, tab.side_y, wet_area)
            bottom = column_terrain_effect(*v, -bt.height.astype(f32)[st], d, side, tab.side_y, wet_area)
            tc[st, i, j] -= f32(physics.water_density / physics.density) * (top - bottom)
    if k == 0:
        _exact_cells(plan, bt, ar, ac, s2, area, tc, physics, unit)
    full_area = area
    if rim is not None:
        tc *= rim
        area = area * rim
    out[0] = sums(tc) * unit
    if lo2 >= (inner_r + half) ** 2:
        pass
    elif inner_r > half and hi2 <= (inner_r - half) ** 2:
        out[1] = out[0]
        out[3] = out[2]
    else:
        share = share_inside(np.sqrt(s2), dx, dy, side, tab.side_y, inner_r).astype(f32)
        out[1] = sums(tc * share) * unit
        out[3] = sums(full_area * share)
    weighted = area * relief
    # Without a rim the area with data is the covered area already summed.
    out[4] = sums(area) if rim is not None else out[2]
    out[5] = sums(weighted)
    weighted *= relief
    if k > 0:
        weighted += area * variance
    out[6] = sums(weighted)
    # Order of LevelSums: inner, outer, covered, covered_inner, relief area, sum, square.
    return np.stack([out[1], out[0] - out[1], out[2], out[3], out[4], out[5], out[6]])


def _kernel_by_slices(s2, dx, dy, relief, drop, side_x, side_y, area, variance, cov) -> np.ndarray:
    """:func:`~._kernels.column_kernel` over slices of about ``KERNEL_SLICE`` pairs (station rows).

    The kernel makes some twenty temporaries of its arguments' size; slices
    bound them. (Smaller slices, which stay in the core's cache, are about
    10 % faster on one thread, but with two threads the many more numpy calls
    make the threads wait for the interpreter lock: measured on the benchmark
    scenario, 256-station batches with slices of 262,144 pairs ran 1.45 x
    faster on two threads than on one, 128-station batches with slices of
    65,536 pairs 1.13 x.)
    """
    n_st = s2.shape[0]
    step = max(1, KERNEL_SLICE // max(s2.size // max(n_st, 1), 1))
    if step >= n_st:
        return column_kernel(s2, dx, dy, relief, drop, side_x, side_y, area, variance, *cov)
    out = np.empty_like(s2)
    for i in range(0, n_st, step):
        sl = slice(i, i + step)
        out[sl] = column_kernel(
            s2[sl], dx[sl], dy[sl], relief[sl], drop[sl] if np.ndim(drop) else drop, side_x, side_y, area[sl],
            variance[sl] if np.ndim(variance) else variance, *(c[sl] if c is not None else None for c in cov),
        )
    return out


def windows(stack: np.ndarray, n_r: int, n_c: int) -> np.ndarray:
    """Read-only view of every ``n_r`` x ``n_c`` window over the last two axes of a C-contiguous array.

    The same as ``sliding_window_view(stack, (n_r, n_c), axis=(1, 2))``, built
    without its checks (it is called for every rectangle of every batch).

    Examples
    --------
    >>> from numpy.lib.stride_tricks import sliding_window_view
    >>> a = np.arange(24.0).reshape(2, 3, 4)
    >>> bool(np.array_equal(windows(a, 2, 3), sliding_window_view(a, (2, 3), axis=(1, 2))))
    True
    """
    *lead, n_rows, n_cols = stack.shape
    *s_lead, s_r, s_c = stack.strides
    view = np.ndarray((*lead, n_rows - n_r + 1, n_cols - n_c + 1, n_r, n_c), stack.dtype, stack,
                      strides=(*s_lead, s_r, s_c, s_r, s_c))
    view.flags.writeable = False
    return view


def _exact_cells(plan: GridPlan, bt: Batch, ar, ac, s2, area, tc, physics: Physics, unit: float) -> None:
    """Replace (in ``tc``, in units of ``unit`` mGal) near level-0 cells' column terms by exact prisms."""
    tab = plan.tables[0]
    lvl = plan.stats[0]
    n_st, n_r, n_c = s2.shape
    side = float(max(tab.side_x, tab.side_y))
    # Only the cells within PRISM_RATIO sides can be near: a small square around each station.
    reach = int(np.ceil(PRISM_RATIO * side / float(min(tab.side_x, tab.side_y)))) + 2
    w_r, w_c = min(2 * reach + 2, n_r), min(2 * reach + 2, n_c)
    row, col = station_cells(plan.grid, bt.x, bt.y)
    rs = np.clip(row - reach - ar, 0, n_r - w_r)
    cs = np.clip(col - reach - ac, 0, n_c - w_c)
    sub = windows(np.stack([s2, area]), w_r, w_c)[:, np.arange(n_st), rs, cs]
    st, i, j = np.nonzero((sub[0] < np.float32((PRISM_RATIO * side) ** 2)) & (sub[1] > 0))
    if st.size == 0:
        return
    i, j = rs[st] + i, cs[st] + j
    flat = (ar[st] + i - lvl.block_row0) * lvl.weight.shape[1] + ac[st] + j - lvl.block_col0
    tc[st, i, j] = exact_cell_terms(plan, bt, st, flat, tc[st, i, j] * unit, physics) / unit


__all__ = ["MIN_DATA_SHARE", "data_share", "evaluate_rings", "ring_rectangles", "windows"]
