# SPDX-License-Identifier: GPL-2.0-or-later
"""Earth tide from the Moon's and the Sun's positions (Meeus 1998) and Newton's law.

The same quantity as Longman's (1959) formulas, the upward tidal
acceleration at the station times the gravimetric factor, **added to the
reading**, but with a fuller lunar series (Meeus's 60 + 60 terms against
Longman's five) and the tidal attraction evaluated exactly rather than by its
first Legendre terms:

    a = GM [(R - r) / |R - r|^3 - R / |R|^3],     tide = factor * (a . n)

with R the body's and r the station's geocentric position and n the
ellipsoid's normal at the station (GRS80). Longman's series leaves errors of
up to a few microgal (docs/readings.md); this one stays within about 0.1
microgal of positions from a modern ephemeris.
"""

from __future__ import annotations

import numpy as np

from ..constants import GRS80
from ._ephemeris import moon_position, sun_position
from ._tide import DEFAULT_GRAVIMETRIC_FACTOR, TideParts, tide_inputs

#: GM of the Moon and of the Sun, m^3/s^2 (IAU 2009 system of astronomical
#: constants, from memory: 4.9028e12 and 1.32712440018e20).
GM_MOON = 4.9028e12
GM_SUN = 1.32712440018e20
_MS2_TO_MGAL = 1.0e5


def station_position(latitude, longitude, height):
    """Earth-fixed position (m) and unit upward normal of points on the GRS80 ellipsoid.

    Parameters
    ----------
    latitude, longitude : array_like
        Geodetic degrees, longitude east positive.
    height : array_like
        Metres above the ellipsoid.

    Returns
    -------
    position, normal : numpy.ndarray
        Each of shape ``(3,) + broadcast shape``.

    Examples
    --------
    >>> p, n = station_position(90.0, 0.0, 0.0)
    >>> round(float(p[2]), 3), [round(float(v), 6) for v in n]  # the semi-minor axis
    (6356752.314, [0.0, 0.0, 1.0])
    """
    phi = np.radians(np.asarray(latitude, dtype=float))
    lam = np.radians(np.asarray(longitude, dtype=float))
    h = np.asarray(height, dtype=float)
    a, e2 = GRS80.semimajor_axis, GRS80.first_eccentricity_squared
    n_radius = a / np.sqrt(1.0 - e2 * np.sin(phi) ** 2)
    normal = np.stack(np.broadcast_arrays(np.cos(phi) * np.cos(lam), np.cos(phi) * np.sin(lam), np.sin(phi)))
    position = np.stack(
        np.broadcast_arrays(
            (n_radius + h) * np.cos(phi) * np.cos(lam),
            (n_radius + h) * np.cos(phi) * np.sin(lam),
            (n_radius * (1.0 - e2) + h) * np.sin(phi),
        )
    )
    return position, normal


def _upward_tidal_acceleration(gm, body, station, normal):
    """Component along ``normal`` of the tidal acceleration of a point mass at ``body`` (m/s^2)."""
    d = body - station
    towards = d / np.linalg.norm(d, axis=0) ** 3 - body / np.linalg.norm(body, axis=0) ** 3
    return gm * np.sum(towards * normal, axis=0)


def meeus_tide_parts(
    latitude, longitude, height, utc_hours, gravimetric_factor=DEFAULT_GRAVIMETRIC_FACTOR
) -> TideParts:
    """Lunar and solar tidal corrections from Meeus's positions, exact attraction.

    Parameters
    ----------
    latitude, longitude : array_like
        Geodetic degrees, longitude east positive.
    height : array_like
        Metres above the ellipsoid.
    utc_hours : array_like
        Hours since 2000-01-01 00:00 UTC (Delta T is applied inside).
    gravimetric_factor : float
        ``1 + h - 3k/2`` (default 1.16); 1 gives the rigid-Earth tide.

    Returns
    -------
    TideParts
        mGal, to be added to the readings (same sign as Longman's).

    References
    ----------
    Meeus, J., 1998, Astronomical Algorithms, 2nd ed., Willmann-Bell,
    chapters 12, 22, 25 and 47. Longman, I.M., 1959, J. Geophys. Res.
    64(12), 2351-2355 (the quantity and its sign).

    Examples
    --------
    The first of Longman's check cases (docs/readings.md): Longman's series
    gives +0.00353 mGal there; the fuller series differs by under 0.002.

    >>> from relief_gravity.algorithms.survey import parse_time
    >>> t = parse_time("2015-04-23T00:00:00Z").utc_hours
    >>> parts = meeus_tide_parts(40.7914, -77.8586, 370.0, t, gravimetric_factor=1.1575)
    >>> abs(float(parts.total) - 0.00353) < 0.002
    True
    """
    lat, lon, alt, hours = tide_inputs(latitude, longitude, height, utc_hours, gravimetric_factor)
    station, normal = station_position(lat, lon, alt)
    moon = _upward_tidal_acceleration(GM_MOON, moon_position(hours), station, normal)
    sun = _upward_tidal_acceleration(GM_SUN, sun_position(hours), station, normal)
    moon = gravimetric_factor * moon * _MS2_TO_MGAL
    sun = gravimetric_factor * sun * _MS2_TO_MGAL
    return TideParts(moon=moon, sun=sun, total=moon + sun)


def meeus_tide(latitude, longitude, height, utc_hours, gravimetric_factor=DEFAULT_GRAVIMETRIC_FACTOR):
    """Tidal correction (mGal) to add to a reading, from Meeus's positions.

    See :func:`meeus_tide_parts` for the equations and parameters.

    Examples
    --------
    >>> import numpy as np
    >>> tide = meeus_tide(45.0, 7.0, 800.0, np.arange(0.0, 24.0 * 30))
    >>> bool(0.1 < np.ptp(tide) < 0.35)  # a month of tides spans a few tenths of a mGal
    True
    """
    return meeus_tide_parts(latitude, longitude, height, utc_hours, gravimetric_factor).total
