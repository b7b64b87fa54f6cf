# SPDX-License-Identifier: GPL-2.0-or-later
"""The innermost model: a sloping plane in a one-cell square around the station.

The DEM cannot resolve the ground within a cell of the station. The engine
puts there the least the DEM says about it: a plane through the station
height with the slope of the DEM's bilinear surface at the station, over a
square of one (metric) cell centred on the station, integrated exactly as
thin uniform-slope wedges. Centring the square keeps the nearest flat-topped
cell half a cell away wherever the station lies in its cell. The parts of the
four cells around the station that lie outside the square are exact prisms
at their DEM heights. The square ignores water. Derivation and checks:
``docs/terrain.md``, "Innermost square".
"""

from __future__ import annotations

import math

import numpy as np
import numpy.typing as npt

from ..constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL
from ._evaluate import Physics, prism_terms
from ._grid import ElevationGrid
from ._plan import metres_per_degree
from ._sampling import bilinear_from_window, bilinear_setup

#: Azimuth sectors used to integrate the innermost plane.
INNERMOST_SECTORS = 256


def plane_terrain_effect(
    east: npt.ArrayLike,
    north: npt.ArrayLike,
    width: npt.ArrayLike,
    height: npt.ArrayLike,
    slope_east: npt.ArrayLike,
    slope_north: npt.ArrayLike,
    density: float,
    sectors: int = INNERMOST_SECTORS,
) -> float | np.ndarray:
    """Terrain correction of a plane through the station over a rectangle, mGal.

    Parameters
    ----------
    east, north : array_like
        Station position inside the rectangle, from its west and south edges (m).
    width, height : array_like
        Rectangle sides east-west and north-south (m).
    slope_east, slope_north : array_like
        Gradient of the plane (m/m).
    density : float
        Density in kg/m^3.
    sectors : int
        Number of azimuth sectors.

    Returns
    -------
    float or numpy.ndarray
        Terrain correction in mGal (>= 0); arrays broadcast.

    Notes
    -----
    In azimuth :math:`\\alpha` the plane rises or falls with the uniform slope
    :math:`\\tan\\theta = |g_e \\sin\\alpha + g_n \\cos\\alpha|` from the station to
    the rectangle's edge at distance :math:`R(\\alpha)`; each thin sector is a
    uniform-slope wedge,
    :math:`T = G\\rho\\,\\Delta\\alpha\\, R\\,(1 - \\cos\\theta)`
    (derived in docs/terrain.md), and the sectors are summed by the midpoint
    rule.

    References
    ----------
    Nowell, D.A.G., 1999, Gravity terrain corrections - an overview,
    J. Appl. Geophys. 42, 117-134 (uniform-slope wedges near the station).

    Examples
    --------
    A 10 degree plane over a 30 m cell with the station in the middle:

    >>> print(f"{plane_terrain_effect(15, 15, 30, 30, math.tan(math.radians(10)), 0, 2670):.5f}")
    0.01440
    """
    args = [np.asarray(a, dtype=float)[..., None] for a in (east, north, width, height, slope_east, slope_north)]
    e, n, w, h, ge, gn = args
    alpha = (np.arange(sectors) + 0.5) * (2.0 * math.pi / sectors)
    se, ce = np.sin(alpha), np.cos(alpha)
    pos_e, neg_e = se > 1e-15, se < -1e-15
    pos_n, neg_n = ce > 1e-15, ce < -1e-15
    with np.errstate(divide="ignore", invalid="ignore"):
        tx = np.where(pos_e, (w - e) / np.where(pos_e, se, 1.0), np.where(neg_e, e / np.where(neg_e, -se, 1.0), np.inf))
        ty = np.where(pos_n, (h - n) / np.where(pos_n, ce, 1.0), np.where(neg_n, n / np.where(neg_n, -ce, 1.0), np.inf))
    reach = np.minimum(tx, ty)
    tan_t = np.abs(ge * se + gn * ce)
    sec = np.sqrt(1.0 + tan_t * tan_t)
    # 1 - cos(theta) without cancellation for gentle slopes.
    one_minus_cos = tan_t * tan_t / (sec * (sec + 1.0))
    out = (
        GRAVITATIONAL_CONSTANT
        * density
        * SI_TO_MGAL
        * (2.0 * math.pi / sectors)
        * np.sum(reach * one_minus_cos, axis=-1)
    )
    return float(out) if out.ndim == 0 else out


def innermost(
    grid: ElevationGrid,
    x: np.ndarray,
    y: np.ndarray,
    height: np.ndarray,
    physics: Physics,
    window: np.ndarray | None = None,
    window_origin: tuple[int, int] = (0, 0),
) -> tuple[np.ndarray, np.ndarray, np.ndarray, np.ndarray]:
    """Innermost model around stations (arrays of one value per station).

    Parameters
    ----------
    grid : ElevationGrid
        The fine raster.
    x, y, height : numpy.ndarray
        Stations (grid CRS) and their heights (m).
    physics : Physics
        Density and water.
    window : numpy.ndarray, optional
        Heights (NaN for NoData) of raster rows and columns from
        ``window_origin`` on, already read; without it the four cells around
        each station are read from ``grid`` (the engine passes its stored
        window so that worker threads never call the raster reader).
    window_origin : (int, int)
        Raster row and column of ``window[0, 0]``.

    Returns
    -------
    square : numpy.ndarray
        Plane model of the station square (mGal), NaN where the DEM has no
        height at the station.
    rest : numpy.ndarray
        Exact prisms of the rest of the four cells around the station (mGal).
    rest_area : numpy.ndarray
        Area of that rest with data (m^2).
    square_area : numpy.ndarray
        Area of the square (m^2).

    Notes
    -----
    The slope is that of the bilinear surface of
    :mod:`~relief_gravity.algorithms.terrain._sampling` (its NoData rule
    included): east slope ``[h(t_j=1) - h(t_j=0)] / cell_x`` at the station's
    row fraction, north slope likewise; a bilinear surface is linear in each
    fraction, so with four corners this is its exact gradient. Where one end
    has no height the slope in that direction is 0.

    Examples
    --------
    >>> g = ElevationGrid.from_array(np.tile(np.arange(10.0) * 3.0, (10, 1)), 0, 300, 30, 30)
    >>> p = Physics(2670.0, None, 0.0, 1e3, False)
    >>> sq, rest, _, area = innermost(g, np.array([150.0]), np.array([150.0]), np.array([15.0]), p)
    >>> print(f"{float(sq[0]):.6f} {float(area[0]):.0f}")
    0.004686 900
    """
    i0, j0, ti, tj = bilinear_setup(grid, x, y)
    if window is None:
        patches = [grid.read_window(int(a), int(b), 2, 2) for a, b in zip(i0, j0)]
        rows = np.arange(i0.size)
        stack = np.concatenate(patches, axis=0) if patches else np.zeros((0, 2))

        def sample(a, b):
            return bilinear_from_window(stack, 0, 0, 2 * rows, np.zeros_like(j0), a, b)

        def corner(a, b):
            return stack[2 * rows + a, b]
    else:
        r0, c0 = window_origin

        def sample(a, b):
            return bilinear_from_window(window, r0, c0, i0, j0, a, b)

        def corner(a, b):
            r, c = i0 + a - r0, j0 + b - c0
            inside = (r >= 0) & (r < window.shape[0]) & (c >= 0) & (c < window.shape[1])
            out = np.full(i0.shape, np.nan)
            out[inside] = window[r[inside], c[inside]]
            return out

    if grid.geographic:
        cw = metres_per_degree() * grid.cell_x * np.cos(np.radians(y))
        ch = np.full(x.shape, metres_per_degree() * grid.cell_y)
    else:
        cw, ch = np.full(x.shape, grid.cell_x), np.full(x.shape, grid.cell_y)
    zero, one = np.zeros_like(ti), np.ones_like(ti)
    at_station = sample(ti, tj)

    def secant(a, b):
        d = b - a
        return np.where(np.isfinite(d), d, 0.0)

    ge = secant(sample(ti, zero), sample(ti, one)) / cw
    # Row index grows southward, so the northward gradient has the other sign.
    gn = -secant(sample(zero, tj), sample(one, tj)) / ch
    has_dem = np.isfinite(at_station)
    square = np.where(has_dem, plane_terrain_effect(0.5 * cw, 0.5 * ch, cw, ch, ge, gn, physics.density), np.nan)
    # Parts of the four cells outside the square: for a cell [x1,x2]x[y1,y2]
    # and the square [-sx,sx]x[-sy,sy], a west strip, an east strip, and
    # south/north strips over the square's width.
    boxes, rel, owner = [], [], []
    sx, sy = 0.5 * cw, 0.5 * ch
    for a in (0, 1):
        for b in (0, 1):
            hc = corner(a, b)
            east, north = (b - tj) * cw, -(a - ti) * ch
            x1, x2, y1, y2 = east - sx, east + sx, north - sy, north + sy
            mx1, mx2 = np.maximum(x1, -sx), np.minimum(x2, sx)
            for px1, px2, py1, py2 in (
                (x1, np.minimum(x2, -sx), y1, y2),
                (np.maximum(x1, sx), x2, y1, y2),
                (mx1, mx2, y1, np.minimum(y2, -sy)),
                (mx1, mx2, np.maximum(y1, sy), y2),
            ):
                keep = (px2 > px1) & (py2 > py1) & np.isfinite(hc)
                if np.any(keep):
                    boxes.append(np.stack([px1[keep], px2[keep], py1[keep], py2[keep]], axis=1))
                    rel.append(hc[keep] - height[keep])
                    owner.append(np.nonzero(keep)[0])
    rest = np.zeros(x.shape)
    area = np.zeros(x.shape)
    if boxes:
        bx = np.concatenate(boxes)
        rl = np.concatenate(rel)
        ow = np.concatenate(owner)
        g = prism_terms(
            0.5 * (bx[:, 0] + bx[:, 1]),
            0.5 * (bx[:, 2] + bx[:, 3]),
            0.5 * (bx[:, 1] - bx[:, 0]),
            0.5 * (bx[:, 3] - bx[:, 2]),
            rl,
            np.zeros(rl.shape),
            height[ow],
            physics,
        )
        rest = np.bincount(ow, weights=g, minlength=x.size)
        area = np.bincount(ow, weights=(bx[:, 1] - bx[:, 0]) * (bx[:, 3] - bx[:, 2]), minlength=x.size)
    return square, rest, area, cw * ch
