# SPDX-License-Identifier: GPL-2.0-or-later
"""How much the terrain correction near a station moves with height errors.

The terrain correction is sensitive to errors in the heights close to the
station: the DEM's own vertical error, the station height, and a mismatch
between the two. Far terrain contributes little (a cell's effect falls as the
inverse cube of distance), so this module evaluates the cells within a
radius (by default the inner zone) with the same near-field model as the
terrain engine — exact prisms (Nagy et al. 2000) for the cells within
``PRISM_RATIO`` cell sides of the station and columns with the engine's size
term beyond (relative error below 3e-4 there, docs/terrain.md section 5),
less the square of one cell side centred on the station, which holds a plane
through the station with the DEM's slope (Nowell 1999) — and propagates normal
errors through it by Gauss–Hermite quadrature (see ``_quadrature``). Errors of
different DEM cells are taken as independent (a DEM's random error; a
DEM-wide bias moves the whole surface and acts like a station height error
of the opposite sign).

See ``docs/uncertainty.md`` for the derivations and the Monte Carlo check.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from ..constants import MEAN_EARTH_RADIUS
from ..terrain import ElevationGrid, plane_terrain_effect, prism_gravity, sample_bilinear
from ..terrain._kernels import column_kernel, column_scale
from ..terrain._plan import PRISM_RATIO
from ..terrain._sampling import bilinear_setup
from ._quadrature import DEFAULT_NODES, normal_nodes


@dataclass(frozen=True)
class NearTerrainSpread:
    """Per-station spreads of the near terrain correction (mGal, one sigma).

    Attributes
    ----------
    dem : numpy.ndarray
        From independent DEM cell errors of ``dem_sigma``.
    height_nodes : numpy.ndarray
        Change of the near terrain correction at the quadrature nodes of a
        station height error, shape (nodes, stations); combine it with the
        reduction's own height terms before taking the spread.
    mismatch : numpy.ndarray
        Change if the station stood on the DEM surface instead (``|dTC|``).
    innermost : numpy.ndarray
        Terrain correction of the station square under the sloping-plane
        model, i.e. its difference from a flat square through the station.
    """

    dem: np.ndarray
    height_nodes: np.ndarray
    mismatch: np.ndarray
    innermost: np.ndarray


def _cell_tc(dx0, dx1, dy0, dy1, relief, density):
    """Terrain correction (>= 0, mGal) of flat-topped cells relative to the station at 0."""
    lo = np.minimum(relief, 0.0)
    hi = np.maximum(relief, 0.0)
    thin = (hi - lo) < 1e-9
    hi = np.where(thin, lo + 1.0, hi)
    g = prism_gravity(0.0, 0.0, 0.0, dx0, dx1, dy0, dy1, lo, hi, density)
    # Mass above pulls up (negative downward attraction); a void below removes
    # downward pull: both are positive corrections.
    return np.where(thin, 0.0, np.abs(g))


def _cells_tc(dx0, dx1, dy0, dy1, relief, density):
    """Per-cell TC (mGal): exact prisms within ``PRISM_RATIO`` sides of the station, columns beyond.

    ``relief`` may have leading axes (one row per height shift); the cells
    are on the last axis.
    """
    cx, cy = 0.5 * (dx0 + dx1), 0.5 * (dy0 + dy1)
    side_x, side_y = dx1 - dx0, dy1 - dy0
    s2 = cx * cx + cy * cy
    near = s2 < PRISM_RATIO * PRISM_RATIO * np.maximum(side_x, side_y) ** 2
    out = np.empty(np.broadcast_shapes(np.shape(relief), cx.shape))
    if np.any(near):
        out[..., near] = _cell_tc(dx0[near], dx1[near], dy0[near], dy1[near], relief[..., near], density)
    far = ~near
    if np.any(far):
        out[..., far] = column_scale() * density * column_kernel(
            s2[far], cx[far], cy[far], relief[..., far], 0.0, side_x[far], side_y[far], side_x[far] * side_y[far]
        )
    return out


def _outside_square(dx0, dx1, dy0, dy1, half_x, half_y, relief, density):
    """TC of cells (last axis) minus their part inside the station square; ``relief`` may have leading axes."""
    full = _cells_tc(dx0, dx1, dy0, dy1, relief, density)
    ix0, ix1 = np.maximum(dx0, -half_x), np.minimum(dx1, half_x)
    iy0, iy1 = np.maximum(dy0, -half_y), np.minimum(dy1, half_y)
    has = (ix1 > ix0) & (iy1 > iy0)
    if not np.any(has):
        return full
    part = _cell_tc(ix0[has], ix1[has], iy0[has], iy1[has], relief[..., has], density)
    full[..., has] -= part
    return full


def near_terrain_spread(
    x: np.ndarray,
    y: np.ndarray,
    station_height: np.ndarray,
    grid: ElevationGrid,
    density: float | np.ndarray,
    dem_sigma: float,
    height_sigma: float | np.ndarray,
    dem_height: np.ndarray | None = None,
    radius: float = 895.0,
    nodes: int = DEFAULT_NODES,
) -> NearTerrainSpread:
    """Spreads of the near terrain correction from height errors.

    Parameters
    ----------
    x, y : numpy.ndarray
        Stations in the grid's CRS (m, or degrees when geographic).
    station_height : numpy.ndarray
        Station heights in the DEM's datum (m).
    grid : ElevationGrid
        The fine DEM.
    density : float or numpy.ndarray
        Terrain density (kg/m^3), one value or one per station.
    dem_sigma : float
        One-sigma random error of a DEM cell (m).
    height_sigma : float or numpy.ndarray
        One-sigma station height error (m), one value or one per station.
    dem_height : numpy.ndarray, optional
        DEM height at the stations (bilinear); sampled when not given.
    radius : float
        Cells whose centre lies within this distance are evaluated (m).
    nodes : int
        Gauss–Hermite nodes.

    Returns
    -------
    NearTerrainSpread
        NaN for stations without DEM data around them.

    Examples
    --------
    A station on a flat DEM: every spread comes only from the errors.

    >>> import numpy as np
    >>> from relief_gravity.algorithms.terrain import ElevationGrid
    >>> g = ElevationGrid.from_array(np.zeros((41, 41)), 0, 2050, 50, 50)
    >>> s = near_terrain_spread(np.array([1025.0]), np.array([1025.0]), np.array([0.0]), g, 2670.0, 0.0, 0.0)
    >>> float(s.dem[0]), float(s.mismatch[0]), float(s.innermost[0])
    (0.0, 0.0, 0.0)
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    h = np.asarray(station_height, dtype=float)
    n = x.size
    density = np.broadcast_to(np.asarray(density, dtype=float), (n,))
    h_sigma = np.broadcast_to(np.asarray(height_sigma, dtype=float), (n,))
    if dem_height is None:
        dem_height = sample_bilinear(grid, x, y)
    xi, wi = normal_nodes(nodes)
    dem = np.full(n, np.nan)
    mismatch = np.full(n, np.nan)
    innermost = np.full(n, np.nan)
    height_nodes = np.full((xi.size, n), np.nan)
    i0, j0, ti, tj = bilinear_setup(grid, x, y)
    for k in range(n):
        if not (np.isfinite(h[k]) and np.isfinite(dem_height[k]) and np.isfinite(density[k])):
            continue
        if grid.geographic:
            sx = np.radians(grid.cell_x) * MEAN_EARTH_RADIUS * np.cos(np.radians(y[k]))
            sy = np.radians(grid.cell_y) * MEAN_EARTH_RADIUS
        else:
            sx, sy = grid.cell_x, grid.cell_y
        rows = int(np.ceil(radius / sy)) + 1
        cols = int(np.ceil(radius / sx)) + 1
        r_c = int(np.floor((grid.y_origin - y[k]) / grid.cell_y))
        c_c = int(np.floor((x[k] - grid.x_origin) / grid.cell_x))
        z = grid.read_window(r_c - rows, c_c - cols, 2 * rows + 1, 2 * cols + 1)
        jj, ii = np.meshgrid(np.arange(c_c - cols, c_c + cols + 1), np.arange(r_c - rows, r_c + rows + 1))
        # Cell centres relative to the station, in metres (east, north).
        ex = ((grid.x_origin + (jj + 0.5) * grid.cell_x) - x[k]) * (sx / grid.cell_x)
        ny = ((grid.y_origin - (ii + 0.5) * grid.cell_y) - y[k]) * (sy / grid.cell_y)
        use = np.isfinite(z) & (ex**2 + ny**2 <= radius**2)
        ex, ny, zc = ex[use], ny[use], z[use]
        dx0, dx1, dy0, dy1 = ex - sx / 2, ex + sx / 2, ny - sy / 2, ny + sy / 2
        relief = zc - h[k]
        rho = density[k]

        # Every height shift of this station in one evaluation (rows): none, the
        # DEM error nodes, the station height error nodes, onto the DEM surface.
        m = xi.size
        shifts = np.concatenate([[0.0], dem_sigma * xi, -h_sigma[k] * xi, [h[k] - dem_height[k]]])
        per_shift = _outside_square(dx0, dx1, dy0, dy1, sx / 2, sy / 2, relief[None, :] + shifts[:, None], rho)
        sums = per_shift.sum(axis=1)
        total = float(sums[0])
        if dem_sigma > 0:
            per_cell = per_shift[1 : 1 + m]
            mean = np.tensordot(wi, per_cell, axes=1)
            dem_var = float(np.sum(np.tensordot(wi, (per_cell - mean) ** 2, axes=1)))
        else:
            dem_var = 0.0
        height_nodes[:, k] = sums[1 + m : 1 + 2 * m] - total
        mismatch[k] = abs(float(sums[-1]) - total)
        # Innermost square: plane through the station with the DEM's slope.
        patch = grid.read_window(int(i0[k]), int(j0[k]), 2, 2)
        slope_e, slope_n = _bilinear_slope(patch, ti[k], tj[k], sx, sy)
        if np.isfinite(slope_e) and np.isfinite(slope_n):
            innermost[k] = float(plane_terrain_effect(sx / 2, sy / 2, sx, sy, slope_e, slope_n, rho))
            if dem_sigma > 0:
                dem_var += _plane_variance(patch, ti[k], tj[k], sx, sy, rho, dem_sigma, xi, wi)
        dem[k] = np.sqrt(dem_var)
    return NearTerrainSpread(dem=dem, height_nodes=height_nodes, mismatch=mismatch, innermost=innermost)


def _bilinear_slope(patch, ti, tj, sx, sy):
    """East and north gradient (m/m) of the bilinear surface of a 2 x 2 patch."""
    if not np.all(np.isfinite(patch)):
        return np.nan, np.nan
    ge = ((1 - ti) * (patch[0, 1] - patch[0, 0]) + ti * (patch[1, 1] - patch[1, 0])) / sx
    # Rows run south: the northward gradient has the other sign.
    gn = -((1 - tj) * (patch[1, 0] - patch[0, 0]) + tj * (patch[1, 1] - patch[0, 1])) / sy
    return ge, gn


def _plane_variance(patch, ti, tj, sx, sy, rho, sigma, xi, wi):
    """Variance of the station-square TC when the four corner heights carry errors."""
    # The slopes are linear in the four corners: (ge, gn) = A @ z.
    a = np.array(
        [
            [-(1 - ti) / sx, (1 - ti) / sx, -ti / sx, ti / sx],
            [(1 - tj) / sy, tj / sy, -(1 - tj) / sy, -tj / sy],
        ]
    )
    mean_e, mean_n = a @ patch.ravel()
    cov = sigma**2 * (a @ a.T)
    chol = np.linalg.cholesky(cov + 1e-30 * np.eye(2))
    u, v = np.meshgrid(xi, xi)
    w = np.outer(wi, wi).ravel()
    pts = chol @ np.vstack([u.ravel(), v.ravel()])
    tc = plane_terrain_effect(sx / 2, sy / 2, sx, sy, mean_e + pts[0], mean_n + pts[1], rho)
    m = np.sum(w * tc)
    return float(np.sum(w * (tc - m) ** 2))
