# SPDX-License-Identifier: GPL-2.0-or-later
"""Exact vertical attraction of right rectangular prisms."""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

from ..constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL


def _safe_log(a: np.ndarray, b: np.ndarray, c: np.ndarray, r: np.ndarray) -> np.ndarray:
    """ln(a + r) without cancellation for a < 0 (Fukushima 2020 style).

    For a < 0, a + r = (b^2 + c^2) / (r - a), which keeps all digits.
    Where r == 0 (station on the vertex) the multiplying term vanishes, so 0
    is returned.
    """
    out = np.zeros(np.broadcast(a, r).shape)
    positive = a >= 0
    bc2 = b * b + c * c
    with np.errstate(divide="ignore", invalid="ignore"):
        out = np.where(positive, np.log(np.where(r + a > 0, a + r, 1.0)), out)
        negative_ok = (~positive) & (bc2 > 0)
        out = np.where(negative_ok, np.log(np.where(negative_ok, bc2, 1.0) / np.where(negative_ok, r - a, 1.0)), out)
        # On the negative axis with b = c = 0: ln(a + r) -> ln(0); the term is
        # multiplied by b or c, both zero, so it contributes nothing.
    return out


def _vertex_kernel(x: np.ndarray, y: np.ndarray, z: np.ndarray) -> np.ndarray:
    """Nagy (1966) vertex function with z positive downward."""
    r = np.sqrt(x * x + y * y + z * z)
    with np.errstate(divide="ignore", invalid="ignore"):
        term_x = np.where(x != 0, x * _safe_log(y, x, z, r), 0.0)
        term_y = np.where(y != 0, y * _safe_log(x, y, z, r), 0.0)
        denom = z * r
        ratio = np.where(denom != 0, x * y / np.where(denom != 0, denom, 1.0), 0.0)
        term_z = np.where(z != 0, z * np.arctan(ratio), 0.0)
    return term_x + term_y - term_z


def prism_gravity(
    easting: npt.ArrayLike,
    northing: npt.ArrayLike,
    upward: npt.ArrayLike,
    west: npt.ArrayLike,
    east: npt.ArrayLike,
    south: npt.ArrayLike,
    north: npt.ArrayLike,
    bottom: npt.ArrayLike,
    top: npt.ArrayLike,
    density: npt.ArrayLike,
) -> np.ndarray:
    """Downward vertical attraction of right rectangular prisms, in mGal.

    All arguments broadcast against each other, so one call evaluates many
    stations against many prisms.

    Parameters
    ----------
    easting, northing, upward : array_like
        Observation point coordinates in metres (upward positive).
    west, east, south, north, bottom, top : array_like
        Prism boundaries in metres (``west < east``, ``south < north``,
        ``bottom < top``; upward positive).
    density : array_like
        Density (or density contrast) in kg/m^3.

    Returns
    -------
    numpy.ndarray
        Downward attraction in mGal: positive for mass below the station.

    Notes
    -----
    With vertex coordinates relative to the station, :math:`z` positive
    downward and :math:`r = \\sqrt{x^2 + y^2 + z^2}`,

    .. math::

        g_z = G\\rho \\sum_{i,j,k=1}^{2} (-1)^{i+j+k}
        \\left[x\\ln(y + r) + y\\ln(x + r) - z\\arctan\\frac{xy}{zr}\\right].

    Logarithms avoid cancellation for negative arguments and the arctangent
    uses the principal value (not ``atan2``), as recommended by Fukushima
    (2020) and Nagy et al. (2000).

    References
    ----------
    Nagy, D., 1966, The gravitational attraction of a right rectangular prism,
    Geophysics 31(2), 362-371.
    Plouff, D., 1976, Geophysics 41(4), 727-741.

    Examples
    --------
    1 km cube, station at the centre of its top face (REFERENCES §5.2):

    >>> g = prism_gravity(0, 0, 0, -500, 500, -500, 500, -1000, 0, 2670)
    >>> print(f"{float(g):.6f}")
    46.277686
    """
    xp = np.asarray(easting, dtype=float)
    yp = np.asarray(northing, dtype=float)
    zp = np.asarray(upward, dtype=float)
    xs = (np.asarray(west, dtype=float) - xp, np.asarray(east, dtype=float) - xp)
    ys = (np.asarray(south, dtype=float) - yp, np.asarray(north, dtype=float) - yp)
    # z positive downward: depth of the prism faces below the station.
    zs = (zp - np.asarray(top, dtype=float), zp - np.asarray(bottom, dtype=float))
    total = 0.0
    for i, x in enumerate(xs):
        for j, y in enumerate(ys):
            for k, z in enumerate(zs):
                sign = 1.0 if (i + j + k) % 2 == 1 else -1.0
                # (-1)^(i+j+k) with i, j, k in {1, 2}: the all-upper vertex is +.
                sign = -sign
                total = total + sign * _vertex_kernel(x, y, z)
    return GRAVITATIONAL_CONSTANT * np.asarray(density, dtype=float) * total * SI_TO_MGAL
