# SPDX-License-Identifier: GPL-2.0-or-later
"""One way to find a station's cell and one bilinear height sampler.

Every part of the project that needs "the DEM height at a point" (heights
from the DEM, the engine's ``dem_height``, the innermost model, the
ring-and-sector compartments, the demo) uses these functions, so the same
point always gets the same height.

The NoData and edge rule
------------------------
The height at (x, y) is the bilinear interpolant between the centres of the
four cells around the point. A corner without data — NoData, or a cell
outside the raster — is left out and the weights of the other corners are
renormalised to sum to one. The point has no height (NaN) when it lies
outside the raster's extent, or when every corner with a non-zero weight is
missing. So the outer half cell of a raster takes the values of its edge
cells, and a point beside a void takes its neighbours' values.

Examples
--------
>>> import numpy as np
>>> from relief_gravity.algorithms.terrain import ElevationGrid
>>> g = ElevationGrid.from_array([[0.0, 10.0], [20.0, np.nan]], 0, 20, 10, 10)
>>> sample_bilinear(g, np.array([10.0, 5.0, 15.0, 15.0, 25.0]), np.array([10.0, 15.0, 10.0, 5.0, 5.0]))
array([10.,  0., 10., nan, nan])
"""

from __future__ import annotations

import numpy as np

from ._grid import ElevationGrid

#: Largest window (cells) read at once by :func:`sample_bilinear`; scattered
#: points beyond that are read in groups.
MAX_WINDOW_CELLS = 4_000_000


def station_cells(grid: ElevationGrid, x: np.ndarray, y: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Row and column of the cell that contains each point.

    Parameters
    ----------
    grid : ElevationGrid
        The raster.
    x, y : array_like
        Points in the raster's CRS (m, or degrees when geographic).

    Returns
    -------
    row, col : numpy.ndarray of int64
        May lie outside ``0..n_rows-1`` / ``0..n_cols-1`` for points outside.

    Examples
    --------
    >>> from relief_gravity.algorithms.terrain import ElevationGrid
    >>> g = ElevationGrid.from_array([[1.0, 2.0]], 0, 10, 10, 10)
    >>> station_cells(g, np.array([15.0]), np.array([5.0]))
    (array([0]), array([1]))
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    row = np.floor((grid.y_origin - y) / grid.cell_y).astype(np.int64)
    col = np.floor((x - grid.x_origin) / grid.cell_x).astype(np.int64)
    return row, col


def bilinear_setup(grid: ElevationGrid, x: np.ndarray, y: np.ndarray):
    """North-west corner cell and fractions of the bilinear stencil.

    Returns
    -------
    i0, j0 : numpy.ndarray of int64
        Row and column of the north-west cell of the 2 x 2 cells whose
        centres surround each point.
    ti, tj : numpy.ndarray
        Fractions (0-1) southward and eastward from that cell's centre.

    Examples
    --------
    >>> from relief_gravity.algorithms.terrain import ElevationGrid
    >>> g = ElevationGrid.from_array([[1.0, 2.0]], 0, 10, 10, 10)
    >>> bilinear_setup(g, np.array([10.0]), np.array([5.0]))
    (array([0]), array([0]), array([0.]), array([0.5]))
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    fi = (grid.y_origin - y) / grid.cell_y - 0.5
    fj = (x - grid.x_origin) / grid.cell_x - 0.5
    i0 = np.floor(fi).astype(np.int64)
    j0 = np.floor(fj).astype(np.int64)
    return i0, j0, fi - i0, fj - j0


def inside_extent(grid: ElevationGrid, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """True for points on the raster's extent (edges included).

    Examples
    --------
    >>> from relief_gravity.algorithms.terrain import ElevationGrid
    >>> g = ElevationGrid.from_array([[1.0, 2.0]], 0, 10, 10, 10)
    >>> inside_extent(g, np.array([20.0, 20.1]), np.array([5.0, 5.0]))
    array([ True, False])
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    east = grid.x_origin + grid.cell_x * grid.n_cols
    south = grid.y_origin - grid.cell_y * grid.n_rows
    return (x >= grid.x_origin) & (x <= east) & (y <= grid.y_origin) & (y >= south)


def bilinear_from_window(window: np.ndarray, row0: int, col0: int, i0, j0, ti, tj) -> np.ndarray:
    """Bilinear heights from a window already read (the module's NoData rule).

    Parameters
    ----------
    window : numpy.ndarray
        Heights of raster rows ``row0..`` and columns ``col0..`` (NaN for
        NoData); stencil corners outside the window count as missing.
    row0, col0 : int
        Raster index of the window's north-west cell.
    i0, j0, ti, tj : numpy.ndarray
        From :func:`bilinear_setup`.

    Returns
    -------
    numpy.ndarray
        Heights (m); NaN where every corner with non-zero weight is missing.

    Examples
    --------
    >>> w = np.array([[0.0, 10.0], [np.nan, np.nan]])
    >>> bilinear_from_window(w, 0, 0, np.array([0]), np.array([0]), np.array([0.5]), np.array([0.5]))
    array([5.])
    """
    i0 = np.asarray(i0, dtype=np.int64) - int(row0)
    j0 = np.asarray(j0, dtype=np.int64) - int(col0)
    ti = np.asarray(ti, dtype=float)
    tj = np.asarray(tj, dtype=float)
    n_r, n_c = window.shape
    total = np.zeros(np.broadcast(i0, j0, ti, tj).shape)
    weight_sum = np.zeros_like(total)
    for di, wi in ((0, 1.0 - ti), (1, ti)):
        for dj, wj in ((0, 1.0 - tj), (1, tj)):
            r = i0 + di
            c = j0 + dj
            inside = (r >= 0) & (r < n_r) & (c >= 0) & (c < n_c)
            z = np.full(total.shape, np.nan)
            z[inside] = window[r[inside], c[inside]]
            w = wi * wj
            ok = np.isfinite(z) & (w > 0)
            total += np.where(ok, z, 0.0) * np.where(ok, w, 0.0)
            weight_sum += np.where(ok, w, 0.0)
    with np.errstate(invalid="ignore", divide="ignore"):
        return np.where(weight_sum > 0, total / np.where(weight_sum > 0, weight_sum, 1.0), np.nan)


def sample_bilinear(grid: ElevationGrid, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """Bilinear heights at points, reading only the windows needed.

    Parameters
    ----------
    grid : ElevationGrid
        The raster (read through ``read_window``).
    x, y : array_like
        Points in the raster's CRS.

    Returns
    -------
    numpy.ndarray
        Heights (m) under the module's NoData and edge rule; NaN outside the
        extent.

    Examples
    --------
    >>> from relief_gravity.algorithms.terrain import ElevationGrid
    >>> g = ElevationGrid.from_array([[0.0, 10.0], [20.0, 30.0]], 0, 20, 10, 10)
    >>> sample_bilinear(g, np.array([10.0, 0.0, -1.0]), np.array([10.0, 20.0, 10.0]))
    array([15.,  0., nan])
    """
    x = np.atleast_1d(np.asarray(x, dtype=float))
    y = np.atleast_1d(np.asarray(y, dtype=float))
    out = np.full(np.broadcast(x, y).shape, np.nan)
    x, y = np.broadcast_arrays(x, y)
    inside = inside_extent(grid, x, y) & np.isfinite(x) & np.isfinite(y)
    if not inside.any():
        return out
    idx = np.flatnonzero(inside.ravel())
    i0, j0, ti, tj = bilinear_setup(grid, x.ravel()[idx], y.ravel()[idx])
    values = np.full(idx.size, np.nan)
    # Group points by coarse tiles so each read stays bounded.
    side = max(int(np.sqrt(MAX_WINDOW_CELLS)) - 2, 1)
    keys = (i0 // side) * (grid.n_cols // side + 2) + (j0 // side)
    order = np.argsort(keys, kind="stable")
    bounds = np.flatnonzero(np.diff(keys[order])) + 1
    for group in np.split(order, bounds):
        r_lo, r_hi = int(i0[group].min()), int(i0[group].max()) + 2
        c_lo, c_hi = int(j0[group].min()), int(j0[group].max()) + 2
        window = grid.read_window(r_lo, c_lo, r_hi - r_lo, c_hi - c_lo)
        values[group] = bilinear_from_window(window, r_lo, c_lo, i0[group], j0[group], ti[group], tj[group])
    flat = out.ravel()
    flat[idx] = values
    return flat.reshape(out.shape)
