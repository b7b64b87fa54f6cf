# SPDX-License-Identifier: GPL-2.0-or-later
"""Block statistics of elevation rasters, built by strips.

The outer zone sees the terrain through blocks of 2^k x 2^k cells. For each
block the engine keeps the area-weighted fraction of cells with data, the mean
height, the height variance and the centroid of the cells with data, so that
a block stands for its cells to second order (see
:func:`~relief_gravity.algorithms.terrain._kernels.column_terrain_effect`).
Blocks are built from windows read a strip of blocks at a time, so memory
stays bounded by the block arrays themselves.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass, field

import numpy as np

from ._errors import TerrainCancelled
from ._grid import ElevationGrid

Rectangle = tuple[float, float, float, float]  # west, east, south, north


@dataclass
class BlockLevel:
    """Block statistics of one level over a window of blocks.

    Attributes
    ----------
    factor : int
        Block side in raster cells (2^k).
    block_row0, block_col0 : int
        Block index of the window's north-west block (block (I, J) covers
        raster rows I*factor ... (I+1)*factor - 1).
    weight : numpy.ndarray
        Fraction (0-1) of the block's area that has data and is not excluded.
    mean, variance : numpy.ndarray
        Mean height (m) and height variance (m^2) over that part.
    row_offset, col_offset : numpy.ndarray
        Centroid of that part relative to the block centre, in raster cells
        (row offset positive southward).
    row_height_cov, col_height_cov : numpy.ndarray
        Covariance of height with row and with column position over that
        part (m x cells): the tilt of the terrain inside the block, which
        enters the column kernel at second order.
    """

    factor: int
    block_row0: int
    block_col0: int
    weight: np.ndarray
    mean: np.ndarray
    variance: np.ndarray
    row_offset: np.ndarray
    col_offset: np.ndarray
    row_height_cov: np.ndarray | None = None
    col_height_cov: np.ndarray | None = None
    has_offsets: bool = field(init=False)

    def __post_init__(self) -> None:
        if self.row_height_cov is None:
            self.row_height_cov = np.zeros_like(self.weight)
        if self.col_height_cov is None:
            self.col_height_cov = np.zeros_like(self.weight)
        # Full-resolution levels without exclusions have centred cells; the
        # engine then uses a cheaper separable geometry.
        self.has_offsets = bool(np.any(self.row_offset) or np.any(self.col_offset))

    def window(self, brow0: int, bcol0: int, brow1: int, bcol1: int) -> tuple[np.ndarray, ...]:
        """Views of the arrays for blocks [brow0, brow1) x [bcol0, bcol1).

        Parameters
        ----------
        brow0, bcol0, brow1, bcol1 : int
            Absolute block indices; must lie inside the stored window.

        Returns
        -------
        tuple of numpy.ndarray
            weight, mean, variance, row_offset, col_offset.

        Examples
        --------
        >>> import numpy as np
        >>> g = ElevationGrid.from_array(np.arange(16.0).reshape(4, 4), 0, 4, 1, 1)
        >>> lvl = block_statistics(g, 0, 0, 2, 2, 2)
        >>> lvl.window(1, 1, 2, 2)[1]
        array([[12.5]])
        """
        r0, c0 = brow0 - self.block_row0, bcol0 - self.block_col0
        r1, c1 = brow1 - self.block_row0, bcol1 - self.block_col0
        if r0 < 0 or c0 < 0 or r1 > self.weight.shape[0] or c1 > self.weight.shape[1]:
            msg = "requested blocks outside the stored window"
            raise IndexError(msg)
        sl = (slice(r0, r1), slice(c0, c1))
        return (self.weight[sl], self.mean[sl], self.variance[sl], self.row_offset[sl], self.col_offset[sl])


def _outside_fraction(lo: np.ndarray, hi: np.ndarray, ex_lo: float, ex_hi: float) -> tuple[np.ndarray, np.ndarray]:
    """Overlap fraction of intervals [lo, hi] with [ex_lo, ex_hi] and its centre.

    The centre is returned relative to the interval centre, in interval widths.
    """
    width = hi - lo
    a = np.maximum(lo, ex_lo)
    b = np.minimum(hi, ex_hi)
    overlap = np.clip(b - a, 0.0, None) / width
    centre = np.where(overlap > 0, (0.5 * (a + b) - 0.5 * (lo + hi)) / width, 0.0)
    return overlap, centre


def block_statistics(
    grid: ElevationGrid,
    block_row0: int,
    block_col0: int,
    n_block_rows: int,
    n_block_cols: int,
    factor: int,
    exclude: Rectangle | None = None,
    is_cancelled: Callable[[], bool] | None = None,
) -> BlockLevel:
    """Block means, variances and centroids of a raster window, by strips.

    Parameters
    ----------
    grid : ElevationGrid
        Raster to read.
    block_row0, block_col0 : int
        Block index of the north-west block of the window.
    n_block_rows, n_block_cols : int
        Window size in blocks.
    factor : int
        Block side in cells.
    exclude : tuple of float, optional
        (west, east, south, north) rectangle in grid units whose area is
        left out (the footprint of a finer raster); cells that straddle it
        keep the fraction outside, with its centroid.
    is_cancelled : callable, optional
        Checked once per strip; when it returns True the build stops and
        :class:`TerrainCancelled` is raised.

    Returns
    -------
    BlockLevel

    Notes
    -----
    For cell weights :math:`w_i` (1 with data, 0 without, fraction outside
    ``exclude``), :math:`\\bar h = \\sum w_i h_i / \\sum w_i` and
    :math:`\\sigma^2 = \\sum w_i h_i^2 / \\sum w_i - \\bar h^2`. Only one strip of
    ``factor`` raster rows is held in memory at a time.

    Examples
    --------
    >>> import numpy as np
    >>> g = ElevationGrid.from_array([[0.0, 2.0], [np.nan, 4.0]], 0, 2, 1, 1)
    >>> lvl = block_statistics(g, 0, 0, 1, 1, 2)
    >>> float(lvl.weight[0, 0]), float(lvl.mean[0, 0]), round(float(lvl.variance[0, 0]), 4)
    (0.75, 2.0, 2.6667)
    """
    shape = (max(n_block_rows, 0), max(n_block_cols, 0))
    weight = np.zeros(shape)
    mean = np.zeros(shape)
    variance = np.zeros(shape)
    row_off = np.zeros(shape)
    col_off = np.zeros(shape)
    row_cov = np.zeros(shape)
    col_cov = np.zeros(shape)
    b = int(factor)
    centre = (b - 1) / 2.0
    # Only the part of the window inside the raster is ever read.
    gc0 = max(block_col0 * b, 0)
    gc1 = min((block_col0 + shape[1]) * b, grid.n_cols)
    if gc1 <= gc0 or shape[0] == 0:
        return BlockLevel(b, block_row0, block_col0, weight, mean, variance, row_off, col_off, row_cov, col_cov)
    if b == 1:
        return _cell_statistics(grid, block_row0, block_col0, shape, exclude, is_cancelled)
    cols = np.arange(gc0, gc1)
    col_block = cols // b - block_col0
    starts = np.r_[0, np.nonzero(np.diff(col_block))[0] + 1]
    target = col_block[starts]
    col_local = cols - (cols // b) * b - centre
    if exclude is not None:
        xw = grid.x_origin + cols * grid.cell_x
        ox, cxo = _outside_fraction(xw, xw + grid.cell_x, exclude[0], exclude[1])
    rows_per_read = max(1, min(b, (1 << 21) // max(gc1 - gc0, 1)))
    for bi in range(shape[0]):
        row0 = (block_row0 + bi) * b
        r0, r1 = max(row0, 0), min(row0 + b, grid.n_rows)
        if r1 <= r0:
            continue
        acc = np.zeros((7, gc1 - gc0))
        for s0 in range(r0, r1, rows_per_read):
            if is_cancelled is not None and is_cancelled():
                msg = "terrain correction cancelled"
                raise TerrainCancelled(msg)
            s1 = min(s0 + rows_per_read, r1)
            data = grid.read_window(s0, gc0, s1 - s0, gc1 - gc0)
            w = np.isfinite(data).astype(float)
            row_local = (np.arange(s0, s1) - row0 - centre)[:, None]
            col_shift = 0.0
            row_shift = 0.0
            if exclude is not None:
                yn = grid.y_origin - np.arange(s0, s1) * grid.cell_y
                oy, cyo = _outside_fraction(yn - grid.cell_y, yn, exclude[2], exclude[3])
                inside = oy[:, None] * ox[None, :]
                keep = 1.0 - inside
                w = w * keep
                with np.errstate(divide="ignore", invalid="ignore"):
                    # Centroid of the part outside: (0 - f_in c_in) / (1 - f_in);
                    # rows run south, so a northward centre is a negative offset.
                    scale = np.where(keep > 0, inside / np.where(keep > 0, keep, 1.0), 0.0)
                col_shift = -scale * cxo[None, :]
                row_shift = scale * cyo[:, None]
            h = np.where(w > 0, data, 0.0)
            wh = w * h
            acc[0] += w.sum(axis=0)
            acc[1] += wh.sum(axis=0)
            acc[2] += (wh * h).sum(axis=0)
            w_row = w * (row_local + row_shift)
            w_col = w * (col_local[None, :] + col_shift)
            acc[3] += w_row.sum(axis=0)
            acc[4] += w_col.sum(axis=0)
            acc[5] += (w_row * h).sum(axis=0)
            acc[6] += (w_col * h).sum(axis=0)
        sums = np.add.reduceat(acc, starts, axis=1)
        sum_w = sums[0]
        ok = sum_w > 0
        safe = np.where(ok, sum_w, 1.0)
        m = np.where(ok, sums[1] / safe, 0.0)
        weight[bi, target] = sum_w / (b * b)
        mean[bi, target] = m
        variance[bi, target] = np.where(ok, np.clip(sums[2] / safe - m * m, 0.0, None), 0.0)
        r_mean = np.where(ok, sums[3] / safe, 0.0)
        c_mean = np.where(ok, sums[4] / safe, 0.0)
        row_off[bi, target] = r_mean
        col_off[bi, target] = c_mean
        if b > 1:
            row_cov[bi, target] = np.where(ok, sums[5] / safe - r_mean * m, 0.0)
            col_cov[bi, target] = np.where(ok, sums[6] / safe - c_mean * m, 0.0)
    return BlockLevel(b, block_row0, block_col0, weight, mean, variance, row_off, col_off, row_cov, col_cov)


def _cell_statistics(
    grid: ElevationGrid,
    row0: int,
    col0: int,
    shape: tuple[int, int],
    exclude: Rectangle | None,
    is_cancelled: Callable[[], bool] | None,
) -> BlockLevel:
    """:func:`block_statistics` for single cells, read in large strips."""
    weight = np.zeros(shape)
    mean = np.zeros(shape)
    row_off = np.zeros(shape)
    col_off = np.zeros(shape)
    n_rows, n_cols = shape
    step = max(1, (1 << 21) // max(n_cols, 1))
    if exclude is not None:
        xw = grid.x_origin + np.arange(col0, col0 + n_cols) * grid.cell_x
        ox, cxo = _outside_fraction(xw, xw + grid.cell_x, exclude[0], exclude[1])
    for s0 in range(0, n_rows, step):
        if is_cancelled is not None and is_cancelled():
            msg = "terrain correction cancelled"
            raise TerrainCancelled(msg)
        s1 = min(s0 + step, n_rows)
        data = grid.read_window(row0 + s0, col0, s1 - s0, n_cols)
        w = np.isfinite(data).astype(float)
        if exclude is not None:
            yn = grid.y_origin - np.arange(row0 + s0, row0 + s1) * grid.cell_y
            oy, cyo = _outside_fraction(yn - grid.cell_y, yn, exclude[2], exclude[3])
            inside = oy[:, None] * ox[None, :]
            keep = 1.0 - inside
            with np.errstate(divide="ignore", invalid="ignore"):
                scale = np.where(keep > 0, inside / np.where(keep > 0, keep, 1.0), 0.0)
            w = w * keep
            ok = w > 0
            row_off[s0:s1] = np.where(ok, scale * cyo[:, None], 0.0)
            col_off[s0:s1] = np.where(ok, -scale * cxo[None, :], 0.0)
        weight[s0:s1] = w
        mean[s0:s1] = np.where(w > 0, data, 0.0)
    return BlockLevel(1, row0, col0, weight, mean, np.zeros(shape), row_off, col_off, np.zeros(shape), np.zeros(shape))


def merge_blocks(
    finer: BlockLevel,
    factor: int,
    block_row0: int,
    block_col0: int,
    n_block_rows: int,
    n_block_cols: int,
    raster_blocks: tuple[int, int],
) -> BlockLevel | None:
    """Coarser blocks from finer ones, exactly, without reading the raster.

    Parameters
    ----------
    finer : BlockLevel
        Statistics of a finer level (``factor`` a multiple of its factor).
    factor : int
        Block side of the coarser level, in cells.
    block_row0, block_col0, n_block_rows, n_block_cols : int
        The coarser window, in coarser blocks.
    raster_blocks : (int, int)
        Raster size in cells (rows, columns).

    Returns
    -------
    BlockLevel or None
        None when ``finer`` does not hold every finer block of the window that
        lies on the raster (then the raster must be read).

    Notes
    -----
    Sums of weights, of weighted heights, of squared heights, of positions and
    of position times height add up over the finer blocks; the coarser mean,
    variance, centroid and covariances follow from them. The result equals
    :func:`block_statistics` of the same window up to rounding.

    Examples
    --------
    >>> g = ElevationGrid.from_array(np.arange(16.0).reshape(4, 4), 0, 4, 1, 1)
    >>> fine = block_statistics(g, 0, 0, 4, 4, 1)
    >>> a = merge_blocks(fine, 2, 0, 0, 2, 2, (4, 4))
    >>> b = block_statistics(g, 0, 0, 2, 2, 2)
    >>> bool(np.allclose(a.mean, b.mean) and np.allclose(a.variance, b.variance)
    ...      and np.allclose(a.row_height_cov, b.row_height_cov))
    True
    """
    f = finer.factor
    if factor % f:
        return None
    m = factor // f
    r0, c0 = block_row0 * m, block_col0 * m
    nr, nc = n_block_rows * m, n_block_cols * m
    # Finer blocks of the window that lie on the raster must be stored.
    on_r0, on_r1 = max(r0, 0), min(r0 + nr, -(-raster_blocks[0] // f))
    on_c0, on_c1 = max(c0, 0), min(c0 + nc, -(-raster_blocks[1] // f))
    fr0, fc0 = finer.block_row0, finer.block_col0
    fr1, fc1 = fr0 + finer.weight.shape[0], fc0 + finer.weight.shape[1]
    if on_r1 > on_r0 and on_c1 > on_c0 and (on_r0 < fr0 or on_c0 < fc0 or on_r1 > fr1 or on_c1 > fc1):
        return None
    a0, a1 = max(r0, fr0), min(r0 + nr, fr1)
    b0, b1 = max(c0, fc0), min(c0 + nc, fc1)
    inside = a0 == r0 and a1 == r0 + nr and b0 == c0 and b1 == c0 + nc

    def padded(values: np.ndarray) -> np.ndarray:
        if inside:
            return values[r0 - fr0 : r0 - fr0 + nr, c0 - fc0 : c0 - fc0 + nc]
        out = np.zeros((nr, nc))
        if a1 > a0 and b1 > b0:
            out[a0 - r0 : a1 - r0, b0 - c0 : b1 - c0] = values[a0 - fr0 : a1 - fr0, b0 - fc0 : b1 - fc0]
        return out

    def total(values: np.ndarray) -> np.ndarray:
        if m == 2:
            # Strided adds: several times faster than a reduction over two axes.
            return (values[0::2, 0::2] + values[1::2, 0::2]) + (values[0::2, 1::2] + values[1::2, 1::2])
        return values.reshape(n_block_rows, m, n_block_cols, m).sum(axis=(1, 3))

    w = padded(finer.weight)
    h = padded(finer.mean)
    wh = w * h
    # Finer block centres relative to the coarser block centre, in cells.
    sub = np.arange(m) * f + (f - 1) / 2.0 - (factor - 1) / 2.0
    sub_r = np.tile(sub, n_block_rows)[:, None]
    sub_c = np.tile(sub, n_block_cols)[None, :]
    sum_w = total(w)
    ok = sum_w > 0
    safe = np.where(ok, sum_w, 1.0)
    mean = np.where(ok, total(wh) / safe, 0.0)
    second = total(wh * h)
    row_sum = total(w * sub_r)
    col_sum = total(w * sub_c)
    row_h = total(wh * sub_r)
    col_h = total(wh * sub_c)
    if f > 1 or finer.has_offsets:
        # Finer blocks carry their own spread, centroids and tilts.
        second += total(w * padded(finer.variance))
        ro, co = padded(finer.row_offset), padded(finer.col_offset)
        row_sum += total(w * ro)
        col_sum += total(w * co)
        row_h += total(w * padded(finer.row_height_cov) + wh * ro)
        col_h += total(w * padded(finer.col_height_cov) + wh * co)
    variance = np.where(ok, np.clip(second / safe - mean * mean, 0.0, None), 0.0)
    row_off = np.where(ok, row_sum / safe, 0.0)
    col_off = np.where(ok, col_sum / safe, 0.0)
    row_cov = np.where(ok, row_h / safe - row_off * mean, 0.0)
    col_cov = np.where(ok, col_h / safe - col_off * mean, 0.0)
    weight = sum_w / (m * m)
    return BlockLevel(factor, block_row0, block_col0, weight, mean, variance, row_off, col_off, row_cov, col_cov)
