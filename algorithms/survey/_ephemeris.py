# SPDX-License-Identifier: GPL-2.0-or-later
"""Positions of the Moon and the Sun in an Earth-fixed frame, after Meeus (1998).

The Moon from the 60 + 60 periodic terms of Meeus's Tables 47.A and 47.B
(a truncation of Chapront's ELP-2000/82 theory, good to about 10" in
longitude and a few km in distance), the Sun from Meeus's low-accuracy
solution (chapter 25, about 0.01 degree), both referred to the mean equinox of
date and turned into the Earth-fixed frame with the mean sidereal time
(chapter 12). Nutation and polar motion are left out: they change the
direction by a few arc seconds, far below what the tide can feel.

Source: Meeus, J., 1998, Astronomical Algorithms, 2nd edition,
Willmann-Bell, chapters 10, 12, 22, 25 and 47. Delta T (TT - UT) from the
polynomials of Espenak and Meeus (2006, NASA Five Millennium Canon of Solar
Eclipses, TP-2006-214141), coefficients from memory; a minute of error moves
the tide by at most about 0.001 mGal.
"""

from __future__ import annotations

import numpy as np

_DEG = np.pi / 180.0
AU_M = 149_597_870_700.0  # astronomical unit, m (IAU 2012)
_J2000_HOURS = 12.0  # J2000.0 = 2000-01-01 12:00 TT; our clock counts hours from 2000-01-01 00:00 UTC

# Meeus Table 47.A: multiples of D, M, M', F; longitude (1e-6 degree, sine) and distance (m, cosine).
_LONGITUDE_DISTANCE = np.array([
    (0, 0, 1, 0, 6288774, -20905355), (2, 0, -1, 0, 1274027, -3699111), (2, 0, 0, 0, 658314, -2955968),
    (0, 0, 2, 0, 213618, -569925), (0, 1, 0, 0, -185116, 48888), (0, 0, 0, 2, -114332, -3149),
    (2, 0, -2, 0, 58793, 246158), (2, -1, -1, 0, 57066, -152138), (2, 0, 1, 0, 53322, -170733),
    (2, -1, 0, 0, 45758, -204586), (0, 1, -1, 0, -40923, -129620), (1, 0, 0, 0, -34720, 108743),
    (0, 1, 1, 0, -30383, 104755), (2, 0, 0, -2, 15327, 10321), (0, 0, 1, 2, -12528, 0),
    (0, 0, 1, -2, 10980, 79661), (4, 0, -1, 0, 10675, -34782), (0, 0, 3, 0, 10034, -23210),
    (4, 0, -2, 0, 8548, -21636), (2, 1, -1, 0, -7888, 24208), (2, 1, 0, 0, -6766, 30824),
    (1, 0, -1, 0, -5163, -8379), (1, 1, 0, 0, 4987, -16675), (2, -1, 1, 0, 4036, -12831),
    (2, 0, 2, 0, 3994, -10445), (4, 0, 0, 0, 3861, -11650), (2, 0, -3, 0, 3665, 14403),
    (0, 1, -2, 0, -2689, -7003), (2, 0, -1, 2, -2602, 0), (2, -1, -2, 0, 2390, 10056),
    (1, 0, 1, 0, -2348, 6322), (2, -2, 0, 0, 2236, -9884), (0, 1, 2, 0, -2120, 5751),
    (0, 2, 0, 0, -2069, 0), (2, -2, -1, 0, 2048, -4950), (2, 0, 1, -2, -1773, 4130),
    (2, 0, 0, 2, -1595, 0), (4, -1, -1, 0, 1215, -3958), (0, 0, 2, 2, -1110, 0),
    (3, 0, -1, 0, -892, 3258), (2, 1, 1, 0, -810, 2616), (4, -1, -2, 0, 759, -1897),
    (0, 2, -1, 0, -713, -2117), (2, 2, -1, 0, -700, 2354), (2, 1, -2, 0, 691, 0),
    (2, -1, 0, -2, 596, 0), (4, 0, 1, 0, 549, -1423), (0, 0, 4, 0, 537, -1117),
    (4, -1, 0, 0, 520, -1571), (1, 0, -2, 0, -487, -1739), (2, 1, 0, -2, -399, 0),
    (0, 0, 2, -2, -381, -4421), (1, 1, 1, 0, 351, 0), (3, 0, -2, 0, -340, 0),
    (4, 0, -3, 0, 330, 0), (2, -1, 2, 0, 327, 0), (0, 2, 1, 0, -323, 1165),
    (1, 1, -1, 0, 299, 0), (2, 0, 3, 0, 294, 0), (2, 0, -1, -2, 0, 8752),
], dtype=float)

# Meeus Table 47.B: multiples of D, M, M', F; latitude (1e-6 degree, sine).
_LATITUDE = np.array([
    (0, 0, 0, 1, 5128122), (0, 0, 1, 1, 280602), (0, 0, 1, -1, 277693), (2, 0, 0, -1, 173237),
    (2, 0, -1, 1, 55413), (2, 0, -1, -1, 46271), (2, 0, 0, 1, 32573), (0, 0, 2, 1, 17198),
    (2, 0, 1, -1, 9266), (0, 0, 2, -1, 8822), (2, -1, 0, -1, 8216), (2, 0, -2, -1, 4324),
    (2, 0, 1, 1, 4200), (2, 1, 0, -1, -3359), (2, -1, -1, 1, 2463), (2, -1, 0, 1, 2211),
    (2, -1, -1, -1, 2065), (0, 1, -1, -1, -1870), (4, 0, -1, -1, 1828), (0, 1, 0, 1, -1794),
    (0, 0, 0, 3, -1749), (0, 1, -1, 1, -1565), (1, 0, 0, 1, -1491), (0, 1, 1, 1, -1475),
    (0, 1, 1, -1, -1410), (0, 1, 0, -1, -1344), (1, 0, 0, -1, -1335), (0, 0, 3, 1, 1107),
    (4, 0, 0, -1, 1021), (4, 0, -1, 1, 833), (0, 0, 1, -3, 777), (4, 0, -2, 1, 671),
    (2, 0, 0, -3, 607), (2, 0, 2, -1, 596), (2, -1, 1, -1, 491), (2, 0, -2, 1, -451),
    (0, 0, 3, -1, 439), (2, 0, 2, 1, 422), (2, 0, -3, -1, 421), (2, 1, -1, 1, -366),
    (2, 1, 0, 1, -351), (4, 0, 0, 1, 331), (2, -1, 1, 1, 315), (2, -2, 0, -1, 302),
    (0, 0, 1, 3, -283), (2, 1, 1, -1, -229), (1, 1, 0, -1, 223), (1, 1, 0, 1, 223),
    (0, 1, -2, -1, -220), (2, 1, -1, -1, -220), (1, 0, 1, 1, -185), (2, -1, -2, -1, 181),
    (0, 1, 2, 1, -177), (4, 0, -2, -1, 176), (4, -1, -1, -1, 166), (1, 0, 1, -1, -164),
    (4, 0, 1, -1, 132), (1, 0, -1, -1, -119), (4, -1, 0, -1, 115), (2, -2, 0, 1, 107),
], dtype=float)

# Espenak and Meeus (2006) Delta T polynomials (s): (first year, last year, centre year, coefficients).
_DELTA_T = (
    (1920.0, 1941.0, 1920.0, (21.20, 0.84493, -0.076100, 0.0020936)),
    (1941.0, 1961.0, 1950.0, (29.07, 0.407, -1.0 / 233.0, 1.0 / 2547.0)),
    (1961.0, 1986.0, 1975.0, (45.45, 1.067, -1.0 / 260.0, -1.0 / 718.0)),
    (1986.0, 2005.0, 2000.0, (63.86, 0.3345, -0.060374, 0.0017275, 0.000651814, 0.00002373599)),
    (2005.0, 2050.0, 2000.0, (62.92, 0.32217, 0.005589)),
)


def delta_t_seconds(utc_hours) -> np.ndarray:
    """TT - UT in seconds (Espenak and Meeus 2006), years clamped to 1920-2050.

    Parameters
    ----------
    utc_hours : array_like
        Hours since 2000-01-01 00:00 UTC.

    Returns
    -------
    numpy.ndarray
        Seconds; outside 1920-2050 the nearest end's value.

    Examples
    --------
    >>> round(float(delta_t_seconds(0.0)), 1)  # 2000-01-01 (63.8 s measured, from memory)
    63.9
    """
    year = np.clip(2000.0 + np.asarray(utc_hours, dtype=float) / (24.0 * 365.25), 1920.0, 2050.0)
    out = np.zeros_like(year)
    for first, last, centre, coefficients in _DELTA_T:
        rows = (year >= first) & (year <= last)
        out[rows] = np.polynomial.polynomial.polyval(year[rows] - centre, coefficients)
    return out


def _centuries_tt(utc_hours) -> np.ndarray:
    """Julian centuries of TT from J2000.0."""
    hours = np.asarray(utc_hours, dtype=float)
    return (hours + delta_t_seconds(hours) / 3600.0 - _J2000_HOURS) / (24.0 * 36525.0)


def _ecliptic_to_earth_fixed(longitude, latitude, distance, t_tt, utc_hours) -> np.ndarray:
    """Earth-fixed Cartesian position (m, shape (3, n)) from ecliptic coordinates of date (radians, m)."""
    eps = (23.0 + 26.0 / 60.0 + 21.448 / 3600.0 - (46.8150 * t_tt + 0.00059 * t_tt**2 - 0.001813 * t_tt**3) / 3600.0)
    eps = eps * _DEG  # mean obliquity, Meeus (22.2)
    x = distance * np.cos(latitude) * np.cos(longitude)
    y = distance * np.cos(latitude) * np.sin(longitude)
    z = distance * np.sin(latitude)
    y, z = y * np.cos(eps) - z * np.sin(eps), y * np.sin(eps) + z * np.cos(eps)
    days_ut = (np.asarray(utc_hours, dtype=float) - _J2000_HOURS) / 24.0
    t_ut = days_ut / 36525.0
    gmst = (280.46061837 + 360.98564736629 * days_ut + 0.000387933 * t_ut**2 - t_ut**3 / 38_710_000.0) * _DEG
    return np.stack([x * np.cos(gmst) + y * np.sin(gmst), -x * np.sin(gmst) + y * np.cos(gmst), z])


def moon_ecliptic(t_tt):
    """The Moon's geocentric ecliptic longitude, latitude (degrees, mean equinox of date) and distance (m).

    Meeus (1998) chapter 47, Tables 47.A and 47.B with the additive terms.

    Parameters
    ----------
    t_tt : array_like
        Julian centuries of TT from J2000.0 (JD 2451545.0 TT).

    Returns
    -------
    longitude, latitude, distance : numpy.ndarray
        Degrees, degrees, m.

    Examples
    --------
    Meeus's example 47.a, 1992 April 12 0h TD (T = -0.077221081451):
    lambda 133.162655, beta -3.229126 degrees, distance 368 409.7 km.

    >>> lon, lat, dist = moon_ecliptic(-0.077221081451)
    >>> round(float(lon) % 360, 6), round(float(lat), 6), round(float(dist) / 1000, 1)
    (133.162655, -3.229126, 368409.7)
    """
    t = np.asarray(t_tt, dtype=float)
    lp = 218.3164477 + 481267.88123421 * t - 0.0015786 * t**2 + t**3 / 538841.0 - t**4 / 65194000.0
    d = 297.8501921 + 445267.1114034 * t - 0.0018819 * t**2 + t**3 / 545868.0 - t**4 / 113065000.0
    m = 357.5291092 + 35999.0502909 * t - 0.0001536 * t**2 + t**3 / 24490000.0
    mp = 134.9633964 + 477198.8675055 * t + 0.0087414 * t**2 + t**3 / 69699.0 - t**4 / 14712000.0
    f = 93.2720950 + 483202.0175233 * t - 0.0036539 * t**2 - t**3 / 3526000.0 + t**4 / 863310000.0
    a1, a2, a3 = 119.75 + 131.849 * t, 53.09 + 479264.290 * t, 313.45 + 481266.484 * t
    e = 1.0 - 0.002516 * t - 0.0000074 * t**2
    args = np.stack([d, m, mp, f])  # degrees, shape (4,) + shape(t)

    def sums(table, columns):
        phase = np.tensordot(table[:, :4], args, axes=(1, 0)) * _DEG
        scale = e[None, ...] ** np.abs(table[:, 1]).reshape((-1,) + (1,) * np.ndim(t))
        return [np.sum(table[:, c].reshape((-1,) + (1,) * np.ndim(t)) * scale * fn(phase), axis=0) for c, fn in columns]

    sum_l, sum_r = sums(_LONGITUDE_DISTANCE, ((4, np.sin), (5, np.cos)))
    (sum_b,) = sums(_LATITUDE, ((4, np.sin),))
    sum_l = sum_l + 3958.0 * np.sin(a1 * _DEG) + 1962.0 * np.sin((lp - f) * _DEG) + 318.0 * np.sin(a2 * _DEG)
    sum_b = (
        sum_b - 2235.0 * np.sin(lp * _DEG) + 382.0 * np.sin(a3 * _DEG) + 175.0 * np.sin((a1 - f) * _DEG)
        + 175.0 * np.sin((a1 + f) * _DEG) + 127.0 * np.sin((lp - mp) * _DEG) - 115.0 * np.sin((lp + mp) * _DEG)
    )
    return lp + sum_l / 1e6, sum_b / 1e6, 385_000_560.0 + sum_r


def moon_position(utc_hours) -> np.ndarray:
    """Earth-fixed geocentric position of the Moon (m), Meeus (1998) chapter 47.

    Parameters
    ----------
    utc_hours : array_like
        Hours since 2000-01-01 00:00 UTC.

    Returns
    -------
    numpy.ndarray
        Shape ``(3,) + shape(utc_hours)``: x towards longitude 0 on the
        equator, z towards the north pole.

    Examples
    --------
    Meeus's example 47.a, 1992 April 12 0h TT: distance 368 409.7 km.

    >>> tt = -67680.0  # hours from 2000-01-01 00:00 to 1992-04-12 00:00
    >>> hours = tt - float(delta_t_seconds(tt)) / 3600.0  # the UTC of that TT
    >>> round(float(np.linalg.norm(moon_position(hours))) / 1000.0, 1)
    368409.7
    """
    t = _centuries_tt(utc_hours)
    longitude, latitude, distance = moon_ecliptic(t)
    return _ecliptic_to_earth_fixed(longitude * _DEG, latitude * _DEG, distance, t, utc_hours)


def sun_position(utc_hours) -> np.ndarray:
    """Earth-fixed geocentric position of the Sun (m), Meeus (1998) chapter 25, low accuracy.

    Parameters
    ----------
    utc_hours : array_like
        Hours since 2000-01-01 00:00 UTC.

    Returns
    -------
    numpy.ndarray
        Shape ``(3,) + shape(utc_hours)``.

    Examples
    --------
    Meeus's example 25.a, 1992 October 13 0h TD: R = 0.99766 AU.

    >>> tt = -63264.0  # hours from 2000-01-01 00:00 to 1992-10-13 00:00
    >>> hours = tt - float(delta_t_seconds(tt)) / 3600.0
    >>> round(float(np.linalg.norm(sun_position(hours))) / AU_M, 5)
    0.99766
    """
    t = _centuries_tt(utc_hours)
    l0 = 280.46646 + 36000.76983 * t + 0.0003032 * t**2
    m = (357.52911 + 35999.05029 * t - 0.0001537 * t**2) * _DEG
    e = 0.016708634 - 0.000042037 * t - 0.0000001267 * t**2
    c = (
        (1.914602 - 0.004817 * t - 0.000014 * t**2) * np.sin(m)
        + (0.019993 - 0.000101 * t) * np.sin(2.0 * m)
        + 0.000289 * np.sin(3.0 * m)
    )
    longitude = (l0 + c) * _DEG
    distance = 1.000001018 * (1.0 - e**2) / (1.0 + e * np.cos(m + c * _DEG)) * AU_M
    return _ecliptic_to_earth_fixed(longitude, np.zeros_like(longitude), distance, t, utc_hours)
