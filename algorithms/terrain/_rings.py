# SPDX-License-Identifier: GPL-2.0-or-later
"""Evaluation of a level by rectangles (projected grids).

The same sums as :func:`~._evaluate.evaluate_level`, computed another way.
Each station's ring at a level is its square window minus the finer level's
square (the hole), both clipped to where the level has data. That is at most
four rectangles: the band above the hole, the band below it, and the parts
left and right of it. For a batch of stations each rectangle is copied out of
the level's field stack (:attr:`~._plan.BlockTable.stack`) for every station
at once, as a sliding window of the largest extent in the batch; positions
beyond a station's own extent (a block at most on each side) are masked by
giving them no area. The column terms then run on dense (station, block)
arrays and each station's sums are sums along one axis: no per-block masks,
index arrays or scattered gathers, which cost several times the kernel itself
on the masked path.

A level whose windows hold mostly blocks without data (a regional DEM's
first level, most of which lies under the fine DEM's footprint) is left to
the masked path, which evaluates only blocks with data; so are geographic
grids (their offsets are great-circle, computed in double precision).
"""

from __future__ import annotations

import numpy as np

from ..constants import MEAN_EARTH_RADIUS
from ._evaluate import Batch, LevelSums, Physics, exact_cell_terms, share_inside
from ._kernels import column_kernel, column_scale, column_terrain_effect
from ._plan import PRISM_RATIO, GridPlan
from ._sampling import station_cells

#: Pairs (station, block) per call of the column kernel (see _kernel_by_slices).
KERNEL_SLICE = 65_536

#: Below this share of blocks with data in a batch's windows, the masked
#: path (only blocks with data) is used instead.
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


def data_share(plan: GridPlan, level_index: int, rects: list[tuple[np.ndarray, ...]]) -> float:
    """Share (0-1) of the blocks of the rectangles that have data (1 when there are none).

    Examples
    --------
    >>> from ._grid import ElevationGrid
    >>> from ._plan import plan_grid
    >>> g = ElevationGrid.from_array(np.zeros((400, 400)), 0, 12000, 30, 30)
    >>> x = np.array([6000.0]); p = plan_grid(g, x, x, 2000.0, True, None, None)
    >>> bt = Batch(np.array([0]), x, x, x * 0, np.array([199]), np.array([199]))
    >>> data_share(p, 1, ring_rectangles(p, 1, bt))
    1.0
    """
    lvl = plan.stats[level_index]
    sat = plan.tables[level_index].missing_table
    total = 0
    missing = 0
    for a0, a1, b0, b1 in rects:
        r0, r1 = a0 - lvl.block_row0, a1 - lvl.block_row0
        c0, c1 = b0 - lvl.block_col0, b1 - lvl.block_col0
        total += int(np.sum((r1 - r0) * (c1 - c0)))
        missing += int(np.sum(sat[r1, c1] - sat[r0, c1] - sat[r1, c0] + sat[r0, c0]))
    return 1.0 - missing / total if total else 1.0


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
        to single-precision rounding); None for geographic grids and for
        windows where fewer than ``MIN_DATA_SHARE`` of the blocks have data.

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
    k = plan.levels[level_index][0]
    n_st = bt.local.size
    rects = [r for r in ring_rectangles(plan, level_index, bt) if np.any((r[1] > r[0]) & (r[3] > r[2]))]
    if not rects:
        return LevelSums.empty(n_st)
    if data_share(plan, level_index, rects) < MIN_DATA_SHARE:
        return None
    lvl = plan.stats[level_index]
    n_fields, n_br, n_bc = stack.shape
    fine_cells = plan.is_fine and k == 0
    parts = []
    for a0, a1, b0, b1 in rects:
        n_r = int(np.max(a1 - a0))
        n_c = int(np.max(b1 - b0))
        if n_r <= 0 or n_c <= 0:
            continue
        # Anchors so that the largest extent fits the stored level (the data
        # box lies inside it); positions outside a station's own extent are masked.
        ar = np.minimum(a0, lvl.block_row0 + n_br - n_r)
        ac = np.minimum(b0, lvl.block_col0 + n_bc - n_c)
        rows = ar[:, None] + np.arange(n_r)
        cols = ac[:, None] + np.arange(n_c)
        ok_r = (rows >= a0[:, None]) & (rows < a1[:, None])
        ok_c = (cols >= b0[:, None]) & (cols < b1[:, None])
        mask = ok_r[:, :, None] & ok_c[:, None, :]
        if fine_cells:
            # The four cells around the station belong to the innermost model.
            near_r = (rows == bt.cell_row[:, None]) | (rows == bt.cell_row[:, None] + 1)
            near_c = (cols == bt.cell_col[:, None]) | (cols == bt.cell_col[:, None] + 1)
            mask &= ~(near_r[:, :, None] & near_c[:, None, :])
        block = windows(stack, n_r, n_c)[:, ar - lvl.block_row0, ac - lvl.block_col0]
        parts.append((block.reshape(n_fields, n_st, n_r * n_c), mask.reshape(n_st, n_r * n_c), ar, ac, n_c))
    if len(parts) == 1:
        fields, mask = parts[0][0], parts[0][1]
    else:
        fields = np.concatenate([p[0] for p in parts], axis=2)
        mask = np.concatenate([p[1] for p in parts], axis=1)
    f32 = np.float32
    east, north, area, mean = fields[0], fields[1], fields[2], fields[3]
    area = area * mask
    dx = east - (bt.x - tab.origin[0]).astype(f32)[:, None]
    dy = north - (bt.y - tab.origin[1]).astype(f32)[:, None]
    s2 = np.maximum(dx * dx + dy * dy, f32(1e-6))
    relief = mean - bt.height.astype(f32)[:, None]
    side = tab.side_x
    half = tab.half_diagonal
    outer = physics.outer_radius
    inner_r = physics.inner_radius

    def sums(values: np.ndarray) -> np.ndarray:
        # Accumulated in double precision, so that masked (zero) positions,
        # which depend on the batch, do not change a station's sums.
        return values.sum(axis=1, dtype=np.float64)

    lo2, hi2 = float(s2.min()), float(s2.max())
    rim = None
    if hi2 > (outer - half) ** 2:
        # Blocks at the rim count by the part of them inside the outer circle;
        # full-resolution cells by their centre (as on the masked path).
        share = share_inside(np.sqrt(s2), dx, dy, side, tab.side_y, outer).astype(f32)
        covered = sums(area * share)
        rim = (s2 <= f32(outer * outer)).astype(f32) if k == 0 else share
    else:
        covered = sums(area)
    variance = fields[4] if k > 0 else 0.0
    cov = (fields[5], fields[6]) if k > 0 else (None, None)
    # The kernel's values are summed first and scaled once per station.
    unit = physics.density * column_scale()
    drop = s2 * f32(0.5 / MEAN_EARTH_RADIUS) if physics.curvature else 0.0
    tc = _kernel_by_slices(s2, dx, dy, relief, drop, side, tab.side_y, area, variance, cov)
    if physics.water_density is not None:
        # Water below height 0 replaces part of the missing rock (as in column_terms).
        st, pos = np.nonzero((mean < 0.0) & (area > 0.0))
        if st.size:
            d = drop[st, pos] if np.ndim(drop) else drop
            v = (dx[st, pos], dy[st, pos])
            top = column_terrain_effect(*v, relief[st, pos], d, side, tab.side_y, area[st, pos])
            bottom = column_terrain_effect(*v, -bt.height.astype(f32)[st], d, side, tab.side_y, area[st, pos])
            tc[st, pos] -= f32(physics.water_density / physics.density) * (top - bottom)
    if k == 0:
        _exact_cells(plan, bt, parts, s2, area, tc, physics, unit)
    if rim is not None:
        tc *= rim
        area = area * rim
    total = sums(tc) * unit
    if lo2 >= (inner_r + half) ** 2:
        inner = np.zeros(n_st)
        covered_inner = np.zeros(n_st)
    elif inner_r > half and hi2 <= (inner_r - half) ** 2:
        inner = total.copy()
        covered_inner = covered
    else:
        share = share_inside(np.sqrt(s2), dx, dy, side, tab.side_y, inner_r).astype(f32)
        inner = sums(tc * share) * unit
        in_area = fields[2] * mask if rim is not None else area
        covered_inner = sums(in_area * share)
    weighted = area * relief
    return LevelSums(
        inner=inner,
        outer=total - inner,
        covered=covered,
        covered_inner=covered_inner,
        relief_area=sums(area),
        relief_sum=sums(weighted),
        relief_square=sums(weighted * relief + area * variance) if k > 0 else sums(weighted * relief),
    )


def _kernel_by_slices(s2, dx, dy, relief, drop, side_x, side_y, area, variance, cov) -> np.ndarray:
    """:func:`~._kernels.column_kernel` over slices of about ``KERNEL_SLICE`` pairs (station rows).

    The kernel makes some twenty temporaries of its arguments' size; slices
    small enough for them to stay in the core's cache run it markedly faster
    than one call over a whole batch.
    """
    n_st, width = s2.shape
    step = max(1, KERNEL_SLICE // max(width, 1))
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


def _exact_cells(plan: GridPlan, bt: Batch, parts, s2, area, tc, physics: Physics, unit: float) -> None:
    """Replace (in ``tc``, in units of ``unit`` mGal) near level-0 cells' column terms by exact prisms."""
    tab = plan.tables[0]
    lvl = plan.stats[0]
    _, _, ar, ac, n_c = parts[0]
    n_st, width = s2.shape
    n_r = width // n_c
    side = float(max(tab.side_x, tab.side_y))
    # Only the cells within PRISM_RATIO sides can be near: a small square around each station.
    reach = int(np.ceil(PRISM_RATIO * side / float(min(tab.side_x, tab.side_y)))) + 2
    w_r, w_c = min(2 * reach + 2, n_r), min(2 * reach + 2, n_c)
    row, col = station_cells(plan.grid, bt.x, bt.y)
    rs = np.clip(row - reach - ar, 0, n_r - w_r)
    cs = np.clip(col - reach - ac, 0, n_c - w_c)
    both = np.stack([s2.reshape(n_st, n_r, n_c), area.reshape(n_st, n_r, n_c)])
    sub = windows(both, w_r, w_c)[:, np.arange(n_st), rs, cs]
    st, i, j = np.nonzero((sub[0] < np.float32((PRISM_RATIO * side) ** 2)) & (sub[1] > 0))
    if st.size == 0:
        return
    pos = (rs[st] + i) * n_c + cs[st] + j
    rows = ar[st] + rs[st] + i - lvl.block_row0
    cols = ac[st] + cs[st] + j - lvl.block_col0
    flat = rows * lvl.weight.shape[1] + cols
    tc[st, pos] = exact_cell_terms(plan, bt, st, flat, tc[st, pos] * unit, physics) / unit


__all__ = ["MIN_DATA_SHARE", "data_share", "evaluate_rings", "ring_rectangles", "windows"]
