# SPDX-License-Identifier: GPL-2.0-or-later
"""Longman (1959) Earth tide: regression values, an astronomy-library check, a tide-library check."""

from __future__ import annotations

import datetime as dt

import numpy as np
import pytest

from relief_gravity.algorithms.survey import longman_tide, longman_tide_parts, parse_time


def hours(text):
    return parse_time(text).utc_hours


def test_regression_state_college_2015():
    # LongmanTide's test (jrleeman/LongmanTide tests/test_basics.py) and tidegravity 0.5.0 agree:
    # 40.7914 N, 77.8586 W, 370 m, 2015-04-23 00:00 UTC, factor 1.1575 (h 0.612, k 0.303):
    # Moon 0.0324030, Sun -0.0288682, total 0.0035347 mGal.
    parts = longman_tide_parts(40.7914, -77.8586, 370.0, hours("2015-04-23T00:00:00Z"), gravimetric_factor=1.1575)
    assert float(parts.moon) == pytest.approx(0.0324029651226, abs=1e-6)
    assert float(parts.sun) == pytest.approx(-0.0288682178454, abs=1e-6)
    assert float(parts.total) == pytest.approx(0.00353474727722, abs=1e-6)


def test_regression_southern_pacific_2010():
    # iporoskun/longman test/longman_test.cpp: 22.733 S, 90.5 W, 0 m, 2010-10-31 06:10 UTC,
    # -3.5704380751590e-7 m/s2 = -0.0357044 mGal (factor 1.1575).
    value = longman_tide(-22.733, -90.5, 0.0, hours("2010-10-31T06:10:00Z"), gravimetric_factor=1.1575)
    assert float(value) == pytest.approx(-0.0357044, abs=1e-6)


def test_sign_convention_moon_overhead_raises_the_correction():
    # Sign: the correction is added to the reading; with the Moon near the zenith
    # the meter reads low, so the Moon's part is positive and near its maximum
    # 2 G M r / d^3 * factor (about 0.11 * 1.16 mGal; common practice, no source).
    t = hours("2015-04-01T00:00:00Z") + np.arange(0, 24 * 30, 0.25)
    moon = longman_tide_parts(0.0, 0.0, 0.0, t).moon
    assert 0.10 < moon.max() < 0.16
    assert -0.08 < moon.min() < -0.04  # Moon on the horizon: -G M r/d^3, half the zenith value


def test_factor_scales_linearly_and_bad_values_are_refused():
    t = hours("2020-01-15T03:00:00Z")
    one = longman_tide(-33.9, 151.2, 50.0, t, gravimetric_factor=1.0)
    assert float(longman_tide(-33.9, 151.2, 50.0, t, gravimetric_factor=1.16)) == pytest.approx(1.16 * float(one))
    with pytest.raises(ValueError, match="gravimetric factor"):
        longman_tide(0.0, 0.0, 0.0, t, gravimetric_factor=0.0)
    with pytest.raises(ValueError, match="latitude"):
        longman_tide(95.0, 0.0, 0.0, t)


def _astropy_tide(lat, lon, height, start, n_hours):
    """Rigid-Earth upward tidal acceleration (mGal) from the Moon's and Sun's positions.

    Exact point-mass difference GM[(R - r)/|R - r|^3 - R/|R|^3] projected on the
    geodetic vertical; positions from astropy's built-in ephemeris (GCRS),
    GM of the Moon 4.9028e12 m^3/s^2 (IAU 2009, from memory), of the Sun from astropy.constants.
    """
    from astropy.utils import iers

    iers.conf.auto_download = False
    import astropy.units as u
    from astropy import constants
    from astropy.coordinates import EarthLocation, get_body
    from astropy.time import Time

    times = Time(start, scale="utc") + np.arange(n_hours) * u.hour
    here = EarthLocation.from_geodetic(lon * u.deg, lat * u.deg, height * u.m)
    above = EarthLocation.from_geodetic(lon * u.deg, lat * u.deg, (height + 1.0) * u.m)
    r = here.get_gcrs_posvel(times)[0].xyz.to_value(u.m)
    up = above.get_gcrs_posvel(times)[0].xyz.to_value(u.m) - r
    up /= np.linalg.norm(up, axis=0)
    total = np.zeros(n_hours)
    for body, gm in (("moon", 4.9028e12), ("sun", constants.GM_sun.to_value(u.m**3 / u.s**2))):
        big_r = get_body(body, times).cartesian.xyz.to_value(u.m)
        d = big_r - r
        a = gm * (d / np.linalg.norm(d, axis=0) ** 3 - big_r / np.linalg.norm(big_r, axis=0) ** 3)
        total += np.sum(a * up, axis=0) * 1e5
    return total


@pytest.mark.parametrize(
    ("lat", "lon", "height", "start"),
    [(40.7914, -77.8586, 370.0, "2015-04-01T00:00:00"), (45.0, 7.0, 800.0, "2019-07-01T00:00:00"), (-33.9, 151.2, 50.0, "2012-01-01T00:00:00")],
)
def test_against_astropy_positions_over_a_month(lat, lon, height, start):
    pytest.importorskip("astropy", reason="astropy (Debian python3-astropy) is the independent reference here")
    import warnings

    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        reference = _astropy_tide(lat, lon, height, start, 24 * 30)
    ours = longman_tide(lat, lon, height, hours(start + "Z") + np.arange(24 * 30), gravimetric_factor=1.0)
    diff = ours - reference
    print(f"Longman - astropy at {lat}, {lon}, {start}: max {np.abs(diff).max():.5f}, rms {np.sqrt(np.mean(diff**2)):.5f} mGal")
    # Longman's truncated lunar series, fed with UT as the regression values require
    # (the orbit polynomials are in ephemeris time; TT - UT is about a minute), is
    # measured here at 0.0007-0.0008 mGal rms and 0.0026 mGal at worst over these months.
    assert np.sqrt(np.mean(diff**2)) < 0.001
    assert np.abs(diff).max() < 0.003


def test_against_tidegravity_library():
    tidegravity = pytest.importorskip("tidegravity", reason="tidegravity 0.5.0 (requirements-dev.txt) is not installed")
    pd = pytest.importorskip("pandas", reason="tidegravity needs pandas for its times")
    start = dt.datetime(2021, 3, 1)
    stamps = pd.DatetimeIndex([start + dt.timedelta(hours=k) for k in range(24 * 30)])
    n = len(stamps)
    lat, lon, alt = np.full(n, 45.0), np.full(n, 7.0), np.full(n, 800.0)
    _, _, total = tidegravity.solve_longman_tide(lat, lon, alt, stamps)
    ours = longman_tide(45.0, 7.0, 800.0, hours("2021-03-01T00:00:00Z") + np.arange(n), gravimetric_factor=1.1575)
    # tidegravity 0.5.0 returns mGal with its fixed factor 1.1575 (h 0.612, k 0.303).
    diff = ours - np.asarray(total)
    print(f"Longman - tidegravity 0.5.0: max {np.abs(diff).max():.2e} mGal")
    assert np.abs(diff).max() < 1e-5
