# SPDX-License-Identifier: GPL-2.0-or-later
"""Normal gravity of a reference ellipsoid, on it and above it, in mGal.

Somigliana's closed form (GRS80, WGS84), the 1967 series formula that legacy
databases still use, and the exact closed form at ellipsoidal height.
"""

from __future__ import annotations

from typing import Union

import numpy as np
import numpy.typing as npt

from .constants import (
    ELLIPSOIDS,
    NORMAL_GRAVITY_1967_EQUATOR,
    NORMAL_GRAVITY_1967_SIN2,
    NORMAL_GRAVITY_1967_SIN4,
    SI_TO_MGAL,
    Ellipsoid,
)

EllipsoidLike = Union[str, Ellipsoid]


def valid_latitude(latitude_deg: npt.ArrayLike) -> np.ndarray:
    """Flag latitudes that can be reduced.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees.

    Returns
    -------
    numpy.ndarray of bool
        True where the latitude is finite and within [-90, 90] degrees.

    Examples
    --------
    >>> valid_latitude([45.0, 91.0, float("nan"), -90.0]).tolist()
    [True, False, False, True]
    """
    lat = np.asarray(latitude_deg, dtype=np.float64)
    with np.errstate(invalid="ignore"):
        return np.isfinite(lat) & (np.abs(lat) <= 90.0)


def check_latitude(latitude_deg: npt.ArrayLike) -> np.ndarray:
    """Return latitudes as float64, refusing finite values outside [-90, 90].

    NaN is let through (it propagates to NaN results); a finite latitude out
    of range is almost always swapped coordinates or a projected CRS, so it
    stops the computation instead of giving a silent wrong answer.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees.

    Returns
    -------
    numpy.ndarray
        The latitudes as float64.

    Raises
    ------
    ValueError
        If any finite latitude lies outside [-90, 90]; the message lists
        (up to five of) the offending values.

    Examples
    --------
    >>> check_latitude([10.0, float("nan")]).tolist()
    [10.0, nan]
    >>> check_latitude(4251355.0)
    Traceback (most recent call last):
    ...
    ValueError: latitude must lie within [-90, 90] degrees; got 4251355.0 (1 value out of range)
    """
    lat = np.asarray(latitude_deg, dtype=np.float64)
    with np.errstate(invalid="ignore"):
        bad = np.isfinite(lat) & (np.abs(lat) > 90.0)
    if np.any(bad):
        values = lat[bad].ravel()
        shown = ", ".join(repr(float(v)) for v in values[:5])
        more = " ..." if values.size > 5 else ""
        noun = "value" if values.size == 1 else "values"
        msg = f"latitude must lie within [-90, 90] degrees; got {shown}{more} ({values.size} {noun} out of range)"
        raise ValueError(msg)
    return lat


def get_ellipsoid(ellipsoid: EllipsoidLike) -> Ellipsoid:
    """Resolve an ellipsoid given by name (``"grs80"``, ``"wgs84"``) or instance.

    Examples
    --------
    >>> get_ellipsoid("GRS80").name
    'grs80'
    """
    if isinstance(ellipsoid, Ellipsoid):
        return ellipsoid
    key = str(ellipsoid).strip().lower()
    if key not in ELLIPSOIDS:
        msg = f"unknown ellipsoid {ellipsoid!r}; expected one of {sorted(ELLIPSOIDS)}"
        raise ValueError(msg)
    return ELLIPSOIDS[key]


def normal_gravity(latitude_deg: npt.ArrayLike, ellipsoid: EllipsoidLike = "grs80") -> np.ndarray:
    """Normal gravity on the surface of the ellipsoid (Somigliana), in mGal.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees, within [-90, 90] (NaN propagates).
    ellipsoid : {"grs80", "wgs84"} or Ellipsoid, optional
        Reference ellipsoid; GRS80 by default (Hinze et al. 2005).

    Returns
    -------
    numpy.ndarray
        Normal gravity gamma_0 in mGal.

    Raises
    ------
    ValueError
        For a finite latitude outside [-90, 90] or an unknown ellipsoid.

    Notes
    -----
    Somigliana's closed formula

    .. math::

        \\gamma_0(\\varphi) = \\gamma_e \\frac{1 + k \\sin^2\\varphi}
        {\\sqrt{1 - e^2 \\sin^2\\varphi}}, \\qquad
        k = \\frac{b \\gamma_p}{a \\gamma_e} - 1,

    with the published equatorial and polar gravity gamma_e, gamma_p.

    References
    ----------
    Moritz, H., 1980, Geodetic Reference System 1980, Bull. Geod. 54(3),
    395-405. Hinze, W. J., et al., 2005, New standards for reducing gravity
    data: the North American gravity database, Geophysics 70(4), J25-J32.

    Examples
    --------
    >>> print(f"{float(normal_gravity(45.0)):.5f}")
    980619.92025
    >>> print(f"{float(normal_gravity(0.0, 'wgs84')):.5f}")
    978032.53359
    """
    ell = get_ellipsoid(ellipsoid)
    sin2 = np.sin(np.radians(check_latitude(latitude_deg))) ** 2
    gamma = ell.gravity_equator * (1.0 + ell.somigliana_k * sin2) / np.sqrt(1.0 - ell.first_eccentricity_squared * sin2)
    return gamma * SI_TO_MGAL


def normal_gravity_1967(latitude_deg: npt.ArrayLike) -> np.ndarray:
    """Normal gravity by the 1967 formula used by legacy databases, in mGal.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees, within [-90, 90] (NaN propagates).

    Returns
    -------
    numpy.ndarray
        Normal gravity in mGal.

    Notes
    -----
    .. math::

        \\gamma = 978031.846\\,(1 + 0.005278895 \\sin^2\\varphi
        + 0.000023462 \\sin^4\\varphi)\\ \\mathrm{mGal}

    This truncated series of the Geodetic Reference System 1967, on the
    IGSN71 datum, is what many national databases were reduced with; use it
    only to reproduce such anomalies.

    References
    ----------
    International Association of Geodesy, 1971, Geodetic Reference System
    1967, Publ. Spec. 3 (from memory). The coefficients are those of the
    USGS ground-gravity compilation of the Sonoma-Clear Lake area (its README).

    Examples
    --------
    >>> print(f"{float(normal_gravity_1967(0.0)):.3f}")
    978031.846
    """
    sin2 = np.sin(np.radians(check_latitude(latitude_deg))) ** 2
    series = 1.0 + NORMAL_GRAVITY_1967_SIN2 * sin2 + NORMAL_GRAVITY_1967_SIN4 * sin2 * sin2
    return NORMAL_GRAVITY_1967_EQUATOR * series


def normal_gravity_at_height(
    latitude_deg: npt.ArrayLike,
    height_m: npt.ArrayLike,
    ellipsoid: EllipsoidLike = "grs80",
) -> np.ndarray:
    """Normal gravity at ellipsoidal height, exact closed form, in mGal.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees, within [-90, 90] (NaN propagates).
    height_m : array_like
        Height above the ellipsoid in m.
    ellipsoid : {"grs80", "wgs84"} or Ellipsoid, optional
        Reference ellipsoid; GRS80 by default.

    Returns
    -------
    numpy.ndarray
        Magnitude of normal gravity gamma(phi, h) in mGal.

    Notes
    -----
    The geodetic point is converted to ellipsoidal-harmonic coordinates
    (u, beta) with linear eccentricity :math:`E = \\sqrt{a^2 - b^2}`:
    :math:`p = (N + h)\\cos\\varphi`, :math:`Z = (N(1 - e^2) + h)\\sin\\varphi`,
    :math:`s = p^2 + Z^2 - E^2`,
    :math:`u^2 = s/2 + \\sqrt{s^2 + 4E^2Z^2}/2`,
    :math:`\\tan\\beta = Z\\sqrt{u^2 + E^2} / (u p)`. Then

    .. math::

        \\gamma = \\frac{1}{w}\\left[\\frac{GM}{u^2 + E^2}
        + \\frac{\\omega^2 a^2 E q'}{(u^2 + E^2) q_0}
          \\left(\\tfrac12\\sin^2\\beta - \\tfrac16\\right)
        - \\omega^2 u \\cos^2\\beta\\right],

    :math:`w = \\sqrt{(u^2 + E^2\\sin^2\\beta)/(u^2 + E^2)}`,
    :math:`q_0 = \\tfrac12[(1 + 3b^2/E^2)\\arctan(E/b) - 3b/E]`,
    :math:`q' = 3(1 + u^2/E^2)(1 - (u/E)\\arctan(E/u)) - 1`.

    The formula is the field outside the ellipsoid. For a station a little
    below it (h < 0, e.g. a depression below sea level) it is evaluated as
    is: the expression is smooth across h = 0, so this is the downward
    continuation of the normal field that a free-air reduction assumes
    anyway.

    References
    ----------
    Li, X., and Gotze, H.-J., 2001, Ellipsoid, geoid, gravity, geodesy, and
    geophysics, Geophysics 66(6), 1660-1668 (correcting Lakshmanan 1991).
    Hofmann-Wellenhof, B., and Moritz, H., 2006, Physical Geodesy, 2nd ed.,
    sections 2.7-2.8.

    Examples
    --------
    >>> print(f"{float(normal_gravity_at_height(45.0, 1000.0)):.5f}")
    980311.43296
    """
    ell = get_ellipsoid(ellipsoid)
    lat = np.radians(check_latitude(latitude_deg))
    h = np.asarray(height_m, dtype=np.float64)
    a, b = ell.semimajor_axis, ell.semiminor_axis
    e2 = ell.first_eccentricity_squared
    big_e = ell.linear_eccentricity
    gm, omega = ell.geocentric_gravitational_constant, ell.angular_velocity

    sin_lat, cos_lat = np.sin(lat), np.cos(lat)
    prime_vertical = a / np.sqrt(1.0 - e2 * sin_lat**2)
    p = (prime_vertical + h) * cos_lat
    z = (prime_vertical * (1.0 - e2) + h) * sin_lat
    s = p * p + z * z - big_e**2
    u2 = 0.5 * s + 0.5 * np.sqrt(s * s + 4.0 * big_e**2 * z * z)
    u = np.sqrt(u2)
    beta = np.arctan2(z * np.sqrt(u2 + big_e**2), u * p)
    sin2_beta = np.sin(beta) ** 2
    cos2_beta = 1.0 - sin2_beta

    q0 = 0.5 * ((1.0 + 3.0 * b * b / big_e**2) * np.arctan(big_e / b) - 3.0 * b / big_e)
    q_prime = 3.0 * (1.0 + u2 / big_e**2) * (1.0 - (u / big_e) * np.arctan(big_e / u)) - 1.0
    w = np.sqrt((u2 + big_e**2 * sin2_beta) / (u2 + big_e**2))

    gamma = (
        gm / (u2 + big_e**2)
        + omega**2 * a * a * big_e * q_prime / ((u2 + big_e**2) * q0) * (0.5 * sin2_beta - 1.0 / 6.0)
        - omega**2 * u * cos2_beta
    ) / w
    return gamma * SI_TO_MGAL
