# SPDX-License-Identifier: GPL-2.0-or-later
"""Earth tide from Meeus's (1998) Sun and Moon with the exact attraction, and Longman against it.

References, each independent of our code:
- Meeus (1998) worked examples 47.a (Moon) and 25.a (Sun), values from memory,
  in the doctests of algorithms/survey/_ephemeris.py;
- JPL's DE421 numerical ephemeris (PyPI packages de421 2008.1 and jplephem
  2.24, test-only) with astropy's IAU 2006/2000A frame rotations and station
  position (Debian's python3-astropy);
- astropy's TT - UT1 from its bundled IERS tables for Delta T.
"""

from __future__ import annotations

import warnings

import numpy as np
import pytest

from relief_gravity.algorithms.survey import (
    delta_t_seconds,
    longman_tide,
    meeus_tide,
    meeus_tide_parts,
    parse_time,
    station_position,
)

PLACES = [
    (40.7914, -77.8586, 370.0, "2015-04-01T00:00:00"),
    (45.0, 7.0, 800.0, "2019-07-01T00:00:00"),
    (-33.9, 151.2, 50.0, "2012-01-01T00:00:00"),
    (64.1, -21.9, 20.0, "1995-03-01T00:00:00"),
]
EARTH_MOON_MASS_RATIO = 81.30056  # DE421's EMRAT (from memory)
GM_MOON, GM_SUN = 4.9028e12, 1.32712440018e20  # m^3/s^2, IAU 2009 (from memory)


def _jpl_tide(lat, lon, height, start, n_hours):
    """Rigid-Earth upward tidal acceleration (mGal) from DE421 positions, astropy frames and station."""
    de421 = pytest.importorskip("de421", reason="de421 2008.1 (requirements-dev.txt) is not installed")
    ephem = pytest.importorskip("jplephem.ephem", reason="jplephem 2.24 (requirements-dev.txt) is not installed")
    pytest.importorskip("astropy", reason="astropy (Debian python3-astropy) turns DE421's frame into the Earth's")
    from astropy.utils import iers

    iers.conf.auto_download = False
    import astropy.units as u
    from astropy.coordinates import GCRS, ITRS, CartesianRepresentation, EarthLocation
    from astropy.time import Time

    eph = ephem.Ephemeris(de421)
    times = Time(start, scale="utc") + np.arange(n_hours) * u.hour
    jd = times.tdb.jd
    moon = eph.position("moon", jd)  # km, geocentric, ICRF
    earth = eph.position("earthmoon", jd) - moon / (1.0 + EARTH_MOON_MASS_RATIO)
    sun = eph.position("sun", jd) - earth
    here = EarthLocation.from_geodetic(lon * u.deg, lat * u.deg, height * u.m)
    r = np.array([here.x.to_value(u.m), here.y.to_value(u.m), here.z.to_value(u.m)])[:, None]
    above = EarthLocation.from_geodetic(lon * u.deg, lat * u.deg, (height + 1.0) * u.m)
    up = np.array([above.x.to_value(u.m), above.y.to_value(u.m), above.z.to_value(u.m)])[:, None] - r
    up /= np.linalg.norm(up)
    total = np.zeros(n_hours)
    for gm, position in ((GM_MOON, moon), (GM_SUN, sun)):
        fixed = GCRS(CartesianRepresentation(position * u.km), obstime=times).transform_to(ITRS(obstime=times))
        big_r = fixed.cartesian.xyz.to_value(u.m)
        d = big_r - r
        a = gm * (d / np.linalg.norm(d, axis=0) ** 3 - big_r / np.linalg.norm(big_r, axis=0) ** 3)
        total += np.sum(a * up, axis=0) * 1e5
    return total


@pytest.mark.parametrize(("lat", "lon", "height", "start"), PLACES)
def test_against_the_jpl_ephemeris_over_a_month(lat, lon, height, start):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        reference = _jpl_tide(lat, lon, height, start, 24 * 30)
    hours = parse_time(start + "Z").utc_hours + np.arange(24 * 30)
    ours = meeus_tide(lat, lon, height, hours, gravimetric_factor=1.0)
    longman = longman_tide(lat, lon, height, hours, gravimetric_factor=1.0)
    diff, diff_longman = ours - reference, longman - reference
    print(
        f"{start} at {lat}, {lon}: Meeus - DE421 max {np.abs(diff).max():.6f} mGal, "
        f"Longman - DE421 max {np.abs(diff_longman).max():.5f} rms {np.sqrt(np.mean(diff_longman**2)):.5f} mGal"
    )
    # Measured: Meeus within 0.00002 mGal everywhere here; Longman's five-term
    # lunar series 0.0016-0.0027 mGal at worst (docs/readings.md).
    assert np.abs(diff).max() < 1e-4
    assert np.abs(diff_longman).max() < 0.003


def test_delta_t_against_astropy_iers_tables():
    pytest.importorskip("astropy", reason="astropy (Debian python3-astropy) holds the measured TT - UT1")
    from astropy.utils import iers

    iers.conf.auto_download = False
    from astropy.time import Time

    years = np.arange(1975, 2023, 3)  # the IERS-B table astropy bundles ends in late 2022
    stamps = [f"{y}-07-01T00:00:00" for y in years]
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        times = Time(stamps, scale="utc")
        measured = (times.tt.jd - times.ut1.jd) * 86400.0
    ours = delta_t_seconds([parse_time(s + "Z").utc_hours for s in stamps])
    # Espenak and Meeus (2006) fit the measured values to about a second; 3 s
    # moves the tide by under 0.0001 mGal.
    assert np.abs(ours - measured).max() < 3.0, np.round(ours - measured, 2)


def test_station_position_on_the_ellipsoid():
    p, n = station_position(45.0, 90.0, 0.0)
    # GRS80 (Moritz 1980): a = 6378137, f = 1/298.257222101; the point satisfies the ellipse equation.
    a, b = 6_378_137.0, 6_378_137.0 * (1 - 1 / 298.257222101)
    assert (np.hypot(p[0], p[1]) / a) ** 2 + (p[2] / b) ** 2 == pytest.approx(1.0, abs=1e-12)
    assert p[0] == pytest.approx(0.0, abs=1e-6)
    assert np.linalg.norm(n) == pytest.approx(1.0)
    up, _ = station_position(45.0, 90.0, 100.0)
    assert np.linalg.norm(up - p) == pytest.approx(100.0)


def test_sign_and_size_when_the_moon_is_high():
    """Moon and Sun parts: the readings' correction is positive when the body is near the zenith."""
    hours = parse_time("2019-07-01T00:00:00Z").utc_hours + np.arange(24 * 30)
    parts = meeus_tide_parts(0.0, 0.0, 0.0, hours, gravimetric_factor=1.0)
    # Rigid-Earth ranges (common practice, no source): the Moon's part spans
    # about -0.055..+0.11 mGal, the Sun's about -0.025..+0.05 mGal.
    assert 0.08 < parts.moon.max() < 0.13 and -0.07 < parts.moon.min() < -0.03
    assert 0.035 < parts.sun.max() < 0.06 and -0.03 < parts.sun.min() < -0.01
    np.testing.assert_allclose(parts.total, parts.moon + parts.sun)
    scaled = meeus_tide(0.0, 0.0, 0.0, hours, gravimetric_factor=1.16)
    np.testing.assert_allclose(scaled, 1.16 * parts.total, rtol=1e-12)


def test_close_to_longman_where_the_two_were_checked():
    """Longman's regression case (docs/readings.md): the fuller series lands within 0.002 mGal of it."""
    t = parse_time("2015-04-23T00:00:00Z").utc_hours
    assert float(meeus_tide(40.7914, -77.8586, 370.0, t, 1.1575)) == pytest.approx(0.0035347, abs=0.002)


def test_bad_inputs():
    with pytest.raises(ValueError, match="latitude"):
        meeus_tide(91.0, 0.0, 0.0, 0.0)
    with pytest.raises(ValueError, match="gravimetric factor"):
        meeus_tide(45.0, 0.0, 0.0, 0.0, gravimetric_factor=0.0)
    with pytest.raises(ValueError, match="gravimetric factor"):
        meeus_tide(45.0, 0.0, 0.0, 0.0, gravimetric_factor=float("nan"))
    out = meeus_tide(np.array([np.nan, 45.0]), 0.0, 0.0, 0.0)
    assert np.isnan(out[0]) and np.isfinite(out[1])
