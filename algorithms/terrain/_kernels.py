# SPDX-License-Identifier: GPL-2.0-or-later
"""Far-zone kernels: vertical line masses and terrain columns.

A terrain column is a DEM cell (or a block of cells) seen from far enough that
its attraction can be written as a vertical line mass, exact in the vertical,
plus a second-order correction for its horizontal extent and for the spread of
heights inside a block.
"""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

from ..constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL
from ._prism import inverse_distance_difference


def line_mass_gravity(
    easting: npt.ArrayLike,
    northing: npt.ArrayLike,
    upward: npt.ArrayLike,
    line_easting: npt.ArrayLike,
    line_northing: npt.ArrayLike,
    bottom: npt.ArrayLike,
    top: npt.ArrayLike,
    area: npt.ArrayLike,
    density: npt.ArrayLike,
) -> np.ndarray:
    """Downward attraction of a vertical line mass (a thin column), in mGal.

    Parameters
    ----------
    easting, northing, upward : array_like
        Station coordinates in metres (upward positive).
    line_easting, line_northing : array_like
        Horizontal position of the line in metres.
    bottom, top : array_like
        Lower and upper ends of the line in metres (upward positive).
    area : array_like
        Cross-section the line stands for, in m^2.
    density : array_like
        Density in kg/m^3.

    Returns
    -------
    numpy.ndarray
        Downward attraction in mGal (positive for mass below the station).

    Notes
    -----
    With depths :math:`z_1 = z_P - t`, :math:`z_2 = z_P - b` of the top and
    bottom below the station and horizontal distance :math:`s`,

    .. math:: g_z = G\\rho A \\left[\\frac{1}{\\sqrt{s^2 + z_1^2}}
              - \\frac{1}{\\sqrt{s^2 + z_2^2}}\\right],

    the exact vertical integral of a point-mass kernel; docs/terrain.md section 5 gives
    the case :math:`z_1 = 0`. The difference is evaluated without
    cancellation. The horizontal distance must be positive.

    References
    ----------
    Kane, M.F., 1962, A comprehensive system of terrain corrections using a
    digital computer, Geophysics 27(4), 455-462 (distant compartments as
    columns).

    Examples
    --------
    A 100 m x 100 m column 50 m high, 1 km away, station at its base:

    >>> g = line_mass_gravity(0, 0, 0, 1000, 0, 0, 50, 1e4, 2670)
    >>> print(f"{float(-g):.6f}")
    0.000222
    """
    dx = np.asarray(line_easting, dtype=float) - np.asarray(easting, dtype=float)
    dy = np.asarray(line_northing, dtype=float) - np.asarray(northing, dtype=float)
    zp = np.asarray(upward, dtype=float)
    depth_top = zp - np.asarray(top, dtype=float)
    depth_bottom = zp - np.asarray(bottom, dtype=float)
    kernel = inverse_distance_difference(dx * dx + dy * dy, depth_top, depth_bottom)
    return (
        GRAVITATIONAL_CONSTANT * np.asarray(density, dtype=float) * np.asarray(area, dtype=float) * kernel * SI_TO_MGAL
    )


def column_terrain_effect(
    dx: np.ndarray,
    dy: np.ndarray,
    relief: np.ndarray,
    drop: np.ndarray,
    side_x: np.ndarray,
    side_y: np.ndarray,
    area: np.ndarray,
    variance: np.ndarray | float = 0.0,
) -> np.ndarray:
    """Terrain-correction contribution of distant columns, in m^-1 x m^2.

    Multiply by G rho (and SI_TO_MGAL) to get mGal. Positive convention of
    docs/terrain.md section 1: mass above the station and missing mass below both add.

    Parameters
    ----------
    dx, dy : numpy.ndarray
        Column centre minus station, east and north, in metres.
    relief : numpy.ndarray
        Mean terrain height of the column minus the station height, in m.
    drop : numpy.ndarray
        Fall of the reference surface below the station's horizontal plane
        at the column (Earth curvature), in m; 0 for a flat Earth.
    side_x, side_y : numpy.ndarray
        Horizontal sides of the column in metres.
    area : numpy.ndarray
        Area the column stands for (may be less than side_x * side_y where
        part of the block holds no data), in m^2.
    variance : numpy.ndarray or float
        Variance of the terrain heights inside the block, in m^2.

    Returns
    -------
    numpy.ndarray
        ``area * [u(d) - u(relief - d)]`` with the corrections below, in m.

    Notes
    -----
    The excess (or missing) mass lies between the reference surface at
    :math:`-d` and the terrain at :math:`\\Delta h - d` relative to the
    station. Its upward pull, for either sign of :math:`\\Delta h`, is

    .. math:: T = G\\rho A\\,[u(d) - u(\\Delta h - d)], \\qquad
              u(c) = (s^2 + c^2)^{-1/2}.

    The horizontal extent :math:`a \\times b` is taken into account by the
    second-order term of the mean over the rectangle,
    :math:`\\bar u \\approx u + [a^2 u_{xx} + b^2 u_{yy}]/24`, and the spread of
    heights in a block by :math:`-\\tfrac12\\sigma^2 u''(\\Delta h - d)` with
    :math:`u'' = (2c^2 - s^2)/(s^2 + c^2)^{5/2}`. Both corrections are
    second order in (size / distance) and (sigma / distance); the remaining
    error is fourth order.

    References
    ----------
    Kane, M.F., 1962, Geophysics 27(4), 455-462 (columns for distant cells);
    Forsberg, R., 1985, Bull. Geod. 59(4), 342-360 (height moments of blocks).

    Examples
    --------
    >>> import numpy as np
    >>> t = column_terrain_effect(np.array([1000.0]), np.array([0.0]),
    ...     np.array([50.0]), np.array([0.0]), np.array([100.0]),
    ...     np.array([100.0]), np.array([1e4]))
    >>> print(f"{float(t[0]) * 6.6743e-11 * 2670 * 1e5:.6f}")
    0.000223
    """
    return column_kernel(dx * dx + dy * dy, dx, dy, relief, drop, side_x, side_y, area, variance)


def column_kernel(
    s2, dx, dy, relief, drop, side_x, side_y, area, variance=0.0, cov_east=None, cov_north=None
) -> np.ndarray:
    r""":func:`column_terrain_effect` with the squared distance ``s2`` given.

    The engine's inner loop: ``s2 = dx^2 + dy^2`` is already known there, and
    square blocks (``side_x == side_y``, scalars) take a shorter form of the
    size term, :math:`a^2 (u_{xx} + u_{yy}) / 24` with
    :math:`u_{xx} + u_{yy} = (s^2 - 2c^2) / (s^2 + c^2)^{5/2}`, which merges
    with the variance term at the top end. ``cov_east``, ``cov_north``
    (m^2), the covariance of height with position inside a block, add the
    mixed term :math:`-u_{xc}\,\mathrm{cov}(x, h) - u_{yc}\,\mathrm{cov}(y, h)`,
    :math:`u_{xc} = 3xc/(s^2 + c^2)^{5/2}`, of the same (second) order as the
    others: a tilted block's higher part is nearer on one side.

    Examples
    --------
    >>> one = np.array([1.0])
    >>> a = column_kernel(one * 1e6, one * 1e3, one * 0, one * 50, 0.0, 100.0, 100.0, 1e4)
    >>> b = column_terrain_effect(one * 1e3, one * 0, one * 50, one * 0, one * 100, one * 100, one * 1e4)
    >>> bool(abs(a[0] - b[0]) < 1e-15)
    True
    """
    c_top = relief - drop
    c2 = c_top * c_top
    q_top = s2 + c2
    r_top = np.sqrt(q_top)
    t_top = q_top * q_top * r_top
    if np.ndim(drop) == 0 and drop == 0.0:
        d2 = 0.0
        q_ref = s2
    else:
        d2 = drop * drop
        q_ref = s2 + d2
    r_ref = np.sqrt(q_ref)
    t_ref = q_ref * q_ref * r_ref
    # Leading part without cancellation: u(d) - u(c) = (c^2 - d^2) / (r_d r_c (r_d + r_c)),
    # c^2 - d^2 = relief (relief - 2 d).
    total = relief * (relief - 2.0 * drop) / (r_ref * r_top * (r_ref + r_top))
    square = np.ndim(side_x) == 0 and np.ndim(side_y) == 0 and side_x == side_y
    if square:
        a = side_x * side_x / 24.0
        total += a * (s2 - 2.0 * d2) / t_ref
        top = (0.5 * variance - a) * (s2 - 2.0 * c2)
        if cov_east is not None:
            top -= 3.0 * c_top * (dx * cov_east + dy * cov_north)
        total += top / t_top
        total *= area
        return total
    # (a^2 u_xx + b^2 u_yy) / 24 at both ends, u_xx = (3x^2 - q) / q^(5/2).
    ax = side_x * side_x / 24.0
    ay = side_y * side_y / 24.0
    p = 3.0 * (ax * dx * dx + ay * dy * dy)
    sa = ax + ay
    total += (p - sa * q_ref) / t_ref - (p - sa * q_top) / t_top
    if np.any(np.asarray(variance) > 0):
        total -= 0.5 * variance * (2.0 * c2 - s2) / t_top
    if cov_east is not None:
        total -= 3.0 * c_top * (dx * cov_east + dy * cov_north) / t_top
    total *= area
    return total


def column_scale() -> float:
    """G times the mGal factor, so that ``column_scale() * rho * T`` is mGal.

    Returns
    -------
    float
        G * 1e5 in m^3 kg^-1 s^-2 mGal/(m/s^2).

    Examples
    --------
    >>> print(f"{column_scale():.4e}")
    6.6743e-06
    """
    return GRAVITATIONAL_CONSTANT * SI_TO_MGAL
