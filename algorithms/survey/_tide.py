# SPDX-License-Identifier: GPL-2.0-or-later
"""Earth tide: Longman's (1959) formulas for the Moon and the Sun.

Sign convention: the value returned is Longman's upward tidal acceleration
times the gravimetric factor, the correction **added to the reading** (a meter
reads low by this amount when the Moon or the Sun is overhead).

Source: Longman, I.M., 1959, "Formulas for computing the tidal accelerations
due to the Moon and the Sun", Journal of Geophysical Research 64(12),
2351-2355. The equations and constants are written out in docs/readings.md.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from ._times import julian_centuries_1900

#: Gravimetric factor 1 + h - 3k/2 with Love numbers h = 0.612, k = 0.303,
#: rounded (common practice; Longman suggested about 1.2).
DEFAULT_GRAVIMETRIC_FACTOR = 1.16

# Longman's (1959) constants, cgs units.
_MU = 6.673e-8  # gravitational constant, cm^3 g^-1 s^-2 (Longman printed 6.670e-8; 6.673e-8 as
# in the general-purpose implementations whose values the tests reproduce)
_MOON_MASS = 7.3537e25  # g
_SUN_MASS = 1.993e33  # g
_E = 0.05490  # eccentricity of the Moon's orbit
_M = 0.074804  # ratio of the mean motion of the Sun to that of the Moon
_C = 3.84402e10  # mean distance Earth - Moon, cm
_C1 = 1.495e13  # mean distance Earth - Sun, cm
_A = 6.378270e8  # equatorial radius of the Earth, cm
_I = 0.08979719  # inclination of the Moon's orbit to the ecliptic, rad
_OMEGA = np.radians(23.452)  # obliquity of the ecliptic, rad
_A_PRIME = 1.0 / (_C * (1.0 - _E**2))
_GAL_TO_MGAL = 1.0e3


@dataclass(frozen=True)
class TideParts:
    """Tidal correction in mGal (gravimetric factor applied), added to a reading.

    Attributes
    ----------
    moon, sun, total : numpy.ndarray
        mGal; ``total = moon + sun``.
    """

    moon: np.ndarray
    sun: np.ndarray
    total: np.ndarray


def tide_inputs(latitude, longitude, height, utc_hours, gravimetric_factor):
    """The station and time arrays broadcast together, after checking the factor and the latitudes.

    Raises
    ------
    ValueError
        For a gravimetric factor that is not a positive number, or a finite
        latitude beyond 90 degrees (NaN positions pass and give NaN tides).

    Examples
    --------
    >>> [a.shape for a in tide_inputs([45.0, 46.0], 7.0, 0.0, 10.0, 1.16)]
    [(2,), (2,), (2,), (2,)]
    """
    lat, lon, alt, hours = np.broadcast_arrays(
        np.asarray(latitude, float), np.asarray(longitude, float),
        np.asarray(height, float), np.asarray(utc_hours, float),
    )
    if not np.isfinite(gravimetric_factor) or gravimetric_factor <= 0:
        msg = f"the gravimetric factor must be positive (about 1.16), got {gravimetric_factor}"
        raise ValueError(msg)
    bad = np.isfinite(lat) & (np.abs(lat) > 90.0)
    if np.any(bad):
        msg = f"latitude must be within -90..90 degrees, got {lat[bad][0]}"
        raise ValueError(msg)
    return lat, lon, alt, hours


def longman_tide_parts(
    latitude, longitude, height, utc_hours, gravimetric_factor=DEFAULT_GRAVIMETRIC_FACTOR
) -> TideParts:
    """Lunar and solar tidal corrections after Longman (1959).

    Equations (Longman 1959, angles in radians, T in Julian centuries from
    1899-12-31 12:00 UT, t0 the UT hour)::

        g_m = mu M r / d^3 (3 cos^2 th - 1) + 3/2 mu M r^2 / d^4 (5 cos^3 th - 3 cos th)
        g_s = mu S r / D^3 (3 cos^2 ph - 1)
        correction = factor * (g_m + g_s)

    with the Moon's and Sun's zenith angles ``th``, ``ph`` and distances
    ``d``, ``D`` from Longman's series for the orbits (docs/readings.md).

    Parameters
    ----------
    latitude, longitude : array_like
        Degrees; longitude east positive (geodetic latitude is used as
        Longman's latitude, a difference of under 0.2 degree).
    height : array_like
        Metres above the ellipsoid (sea level in Longman's paper; the
        difference is negligible).
    utc_hours : array_like
        Hours since 2000-01-01 00:00 UTC.
    gravimetric_factor : float
        ``1 + h - 3k/2`` (default 1.16); 1 gives the rigid-Earth tide.

    Returns
    -------
    TideParts
        mGal, to be added to the readings.

    Examples
    --------
    >>> from relief_gravity.algorithms.survey import parse_time
    >>> t = parse_time("2015-04-23T00:00:00Z").utc_hours
    >>> parts = longman_tide_parts(40.7914, -77.8586, 370.0, t, gravimetric_factor=1.1575)
    >>> round(float(parts.moon), 5), round(float(parts.sun), 5), round(float(parts.total), 5)
    (0.0324, -0.02887, 0.00353)
    """
    lat, lon, alt, hours = tide_inputs(latitude, longitude, height, utc_hours, gravimetric_factor)
    T = julian_centuries_1900(hours)
    t0 = np.mod(hours, 24.0)  # UT hour of the day (the epoch is a midnight)
    T2, T3 = T * T, T * T * T

    s = 4.72000889397 + 8399.70927456 * T + 3.45575191895e-5 * T2 + 3.49065850399e-8 * T3
    p = 5.83515162814 + 71.0180412089 * T + 1.80108282532e-4 * T2 + 1.74532925199e-7 * T3
    h = 4.88162798259 + 628.331950894 * T + 5.23598775598e-6 * T2
    N = 4.52360161181 - 33.757146295 * T + 3.6264063347e-5 * T2 + 3.39369576777e-8 * T3
    p1 = 4.90822941839 + 0.0300025492114 * T + 7.85398163397e-6 * T2 + 5.3329504922e-8 * T3
    e1 = 0.01675104 - 4.180e-5 * T - 1.26e-7 * T2

    cos_I = np.cos(_OMEGA) * np.cos(_I) - np.sin(_OMEGA) * np.sin(_I) * np.cos(N)
    incl = np.arccos(cos_I)  # Longman's I, the Moon's orbit to the equator
    sin_I = np.sin(incl)
    nu = np.arcsin(np.sin(_I) * np.sin(N) / sin_I)
    # Hour angle of the mean Sun, westward from the station (Longman's
    # longitude is west positive).
    t = np.radians(15.0 * (t0 - 12.0) + lon)
    chi = t + h - nu
    cos_alpha = np.cos(N) * np.cos(nu) + np.sin(N) * np.sin(nu) * np.cos(_OMEGA)
    sin_alpha = np.sin(_OMEGA) * np.sin(N) / sin_I
    alpha = 2.0 * np.arctan(sin_alpha / (1.0 + cos_alpha))
    xi = N - alpha
    sigma = s - xi
    l_moon = (
        sigma
        + 2.0 * _E * np.sin(s - p)
        + 1.25 * _E**2 * np.sin(2.0 * (s - p))
        + 3.75 * _M * _E * np.sin(s - 2.0 * h + p)
        + 1.375 * _M**2 * np.sin(2.0 * (s - h))
    )
    chi1 = t + h
    l_sun = h + 2.0 * e1 * np.sin(h - p1)

    phi = np.radians(lat)
    sin_phi, cos_phi = np.sin(phi), np.cos(phi)
    cos_theta = sin_phi * sin_I * np.sin(l_moon) + cos_phi * (
        np.cos(incl / 2.0) ** 2 * np.cos(l_moon - chi) + np.sin(incl / 2.0) ** 2 * np.cos(l_moon + chi)
    )
    cos_phi_sun = sin_phi * np.sin(_OMEGA) * np.sin(l_sun) + cos_phi * (
        np.cos(_OMEGA / 2.0) ** 2 * np.cos(l_sun - chi1) + np.sin(_OMEGA / 2.0) ** 2 * np.cos(l_sun + chi1)
    )

    c_squared = 1.0 / (1.0 + 0.006738 * sin_phi**2)
    r = np.sqrt(c_squared) * _A + alt * 100.0
    inv_d = (
        1.0 / _C
        + _A_PRIME * _E * np.cos(s - p)
        + _A_PRIME * _E**2 * np.cos(2.0 * (s - p))
        + 1.875 * _A_PRIME * _M * _E * np.cos(s - 2.0 * h + p)
        + _A_PRIME * _M**2 * np.cos(2.0 * (s - h))
    )
    a1_prime = 1.0 / (_C1 * (1.0 - e1**2))
    inv_D = 1.0 / _C1 + a1_prime * e1 * np.cos(h - p1)

    g_moon = _MU * _MOON_MASS * r * inv_d**3 * (3.0 * cos_theta**2 - 1.0) + 1.5 * _MU * _MOON_MASS * r**2 * inv_d**4 * (
        5.0 * cos_theta**3 - 3.0 * cos_theta
    )
    g_sun = _MU * _SUN_MASS * r * inv_D**3 * (3.0 * cos_phi_sun**2 - 1.0)
    moon = gravimetric_factor * g_moon * _GAL_TO_MGAL
    sun = gravimetric_factor * g_sun * _GAL_TO_MGAL
    return TideParts(moon=moon, sun=sun, total=moon + sun)


def longman_tide(latitude, longitude, height, utc_hours, gravimetric_factor=DEFAULT_GRAVIMETRIC_FACTOR):
    """Tidal correction (mGal) to add to a reading, Longman (1959).

    See :func:`longman_tide_parts` for the equations and parameters.

    Examples
    --------
    >>> from relief_gravity.algorithms.survey import parse_time
    >>> t = parse_time("2010-10-31T06:10:00Z").utc_hours
    >>> round(float(longman_tide(-22.733, -90.5, 0.0, t, gravimetric_factor=1.1575)), 5)
    -0.0357
    """
    return longman_tide_parts(latitude, longitude, height, utc_hours, gravimetric_factor).total
