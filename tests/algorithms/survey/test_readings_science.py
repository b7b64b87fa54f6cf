# SPDX-License-Identifier: GPL-2.0-or-later
"""Times, calibration, instrument height, network adjustment and linear drift."""

from __future__ import annotations

import warnings

import numpy as np
import pytest

from relief_gravity.algorithms.survey import (
    CalibrationTable,
    adjust_network,
    counter_to_mgal,
    duplicate_readings,
    instrument_height_correction,
    linear_drift,
    longman_tide,
    loop_closures,
    parse_time,
    tied_stations,
    times_going_backwards,
    utc_hours_to_iso,
)

# --- times -------------------------------------------------------------------


@pytest.mark.parametrize(
    ("text", "offset", "expected"),
    [
        ("2000-01-01T00:00:00Z", 5.0, 0.0),
        ("2000-01-01T02:00:00+02:00", 0.0, 0.0),
        ("2000-01-01T02:00+0200", 0.0, 0.0),
        ("2000-01-01 02:00:00", 2.0, 0.0),
        ("1999-12-31T19:00:00-05", 0.0, 0.0),
        ("2000-01-01T00:00:01.5Z", 0.0, 1.5 / 3600),
    ],
)
def test_times_to_utc(text, offset, expected):
    assert parse_time(text, offset).utc_hours == pytest.approx(expected, abs=1e-9)


@pytest.mark.parametrize("text", ["", "yesterday", "2026-13-01T10:00", "2026-02-30 10:00", "10:00", "2026/05/04 10:00", None])
def test_bad_times_are_refused_with_the_accepted_forms(text):
    with pytest.raises(ValueError, match=r"YYYY-MM-DD|valid date"):
        parse_time(text)


def test_local_date_and_round_trip_to_iso():
    t = parse_time("2026-05-04T23:30:00-06:00")
    assert t.local_date == "2026-05-04" and t.had_offset
    assert utc_hours_to_iso(t.utc_hours) == "2026-05-05T05:30:00Z"


# --- calibration and instrument height ------------------------------------------

# An invented table in the usual layout (counter lower bound, mGal, mGal per counter unit).
TABLE = ([1000, 2000, 3000, 4000], [1017.48, 2034.97, 3052.50, 4070.07], [1.01749, 1.01753, 1.01757, 1.01760])


def test_calibration_table_both_directions():
    table = CalibrationTable.from_rows(*TABLE)
    # Hand computation: 2034.97 + 1.01753 * 512.345 = 2556.29840...
    assert float(table.to_mgal(2512.345)) == pytest.approx(2034.97 + 1.01753 * 512.345, abs=1e-9)
    counters = np.array([1000.0, 1500.5, 2999.999, 3000.0, 3999.9, 4000.0])
    assert np.allclose(table.to_counter(table.to_mgal(counters)), counters, atol=1e-9)
    mgal = np.linspace(1017.48, 4070.0, 57)
    assert np.allclose(table.to_mgal(table.to_counter(mgal)), mgal, atol=1e-9)


@pytest.mark.parametrize("value", [999.9, 4000.1, -5.0])
def test_counter_outside_the_table_is_a_clear_error(value):
    table = CalibrationTable.from_rows(*TABLE)
    with pytest.raises(ValueError, match=r"outside the calibration table's range 1000.0 to 4000.0"):
        table.to_mgal([2000.0, value])


@pytest.mark.parametrize(
    ("rows", "message"),
    [
        (([1000], [1017.0], [1.01]), "at least two rows"),
        (([1000, 1000], [1017.0, 1018.0], [1.01, 1.01]), "repeats"),
        (([1000, 2000], [1017.0, 2034.0], [1.01, -1.0]), "positive"),
        (([1000, 2000], [1017.0, float("nan")], [1.01, 1.01]), "empty or non-numeric"),
    ],
)
def test_bad_tables(rows, message):
    with pytest.raises(ValueError, match=message):
        CalibrationTable.from_rows(*rows)


def test_inconsistent_table_warns():
    with pytest.warns(UserWarning, match="check the table"):
        CalibrationTable.from_rows([1000, 2000], [1017.0, 2040.0], [1.01, 1.01])


def test_scale_factor_and_instrument_height():
    assert float(counter_to_mgal(1000.0, scale_factor=1.001)) == pytest.approx(1001.0)
    with pytest.raises(ValueError, match="scale factor"):
        counter_to_mgal(1000.0, scale_factor=0.0)
    # 0.3086 mGal/m (Hinze et al. 2005, first-order free-air gradient): 0.2 m -> +0.06172 mGal.
    assert float(instrument_height_correction(0.2)) == pytest.approx(0.06172)
    assert float(instrument_height_correction(0.2, gradient=0.25)) == pytest.approx(0.05)


# --- checks on readings -------------------------------------------------------------


def test_duplicates_backwards_ties_and_closures():
    assert duplicate_readings([0, 0, -1, -1], [1.0, 1.0, 2.0, 2.0]).tolist() == [False, True, False, False]
    assert times_going_backwards([0, 1, 0, 1], [9.0, 5.0, 8.0, 6.0]).tolist() == [False, False, True, False]
    station_tied, loop_tied = tied_stations([0, 1, 2, 2, 3], [0, 0, 1, 1, 2], [np.nan, 1.0, np.nan, np.nan])
    assert station_tied.tolist() == [True, True, False, False] and loop_tied.tolist() == [True, False, False]
    closure = loop_closures([0, 1, 2], [0, 0, 0], [8.0, 9.0, 10.0], [1.0, 2.0, 3.0])
    assert closure.base_count[0] == 1 and np.isnan(closure.misclosure[0])


# --- network adjustment -------------------------------------------------------------

# Constructed one-loop network (tide-corrected readings, hours), A fixed at 979800.000;
# least-squares answer gB 979812.3401, gC 979795.6799, drift 0.03887 mGal/h, s0 0.0020,
# sigma(gB) 0.0019, sigma(gC) 0.0018 (a constructed check computed independently of this code).
NET_STATION = [0, 1, 2, 1, 0, 2, 0]
NET_HOURS = [8.0, 8.5, 9.0, 9.5, 10.0, 10.5, 11.0]
NET_VALUE = [1234.571, 1246.929, 1230.287, 1246.968, 1234.645, 1230.348, 1234.687]


def test_constructed_network():
    r = adjust_network(NET_VALUE, NET_STATION, [0] * 7, NET_HOURS, [979800.0, np.nan, np.nan], known_sigma=1e-7)
    assert r.gravity[1] == pytest.approx(979812.3401, abs=1e-4)
    assert r.gravity[2] == pytest.approx(979795.6799, abs=1e-4)
    assert r.drift_rate[0] == pytest.approx(0.03887, abs=1e-5)
    assert r.sigma0 == pytest.approx(0.0020, abs=1e-4)
    assert r.sigma[1] == pytest.approx(0.0019, abs=1e-4)
    assert r.sigma[2] == pytest.approx(0.0018, abs=1e-4)
    assert r.redundancy == 3
    # Residuals are g_read minus the station's gravity and sum to zero per station here.
    assert np.allclose(r.residual, r.g_read - r.gravity[NET_STATION])


def test_closed_form_balanced_loop():
    # A(0) B(1) B(2) A(3), A fixed at G: least squares gives gB = G + mean(rB) - mean(rA)
    # and drift d = (3 dA + dB) / 10 (derived by hand from the normal equations).
    G, rA, rB = 979000.0, (10.00, 10.09), (15.02, 15.05)
    r = adjust_network([rA[0], rB[0], rB[1], rA[1]], [0, 1, 1, 0], [0, 0, 0, 0], [0.0, 1.0, 2.0, 3.0], [G, np.nan], known_sigma=1e-8)
    assert r.gravity[1] == pytest.approx(G + np.mean(rB) - np.mean(rA), abs=1e-7)
    assert r.drift_rate[0] == pytest.approx((3 * (rA[1] - rA[0]) + (rB[1] - rB[0])) / 10, abs=1e-7)


def test_no_known_station_is_refused():
    with pytest.raises(ValueError, match="not tied"):
        adjust_network(NET_VALUE, NET_STATION, [0] * 7, NET_HOURS, [np.nan] * 3)
    with pytest.raises(ValueError, match="not tied"):
        linear_drift(NET_VALUE, NET_STATION, [0] * 7, NET_HOURS, [np.nan] * 3)


def test_untied_part_and_undeterminable_drift():
    # Loop 1 reads only stations 3 and 4, never tied: left out. Loop 2 reads A then D once each:
    # its drift cannot be determined and is left at zero; D still gets a value.
    station = [*NET_STATION, 3, 4, 3, 0, 5]
    loop = [0] * 7 + [1, 1, 1, 2, 2]
    hours = [*NET_HOURS, 20.0, 21.0, 22.0, 30.0, 31.0]
    value = [*NET_VALUE, 5.0, 6.0, 5.01, 1234.0, 1240.0]
    known = [979800.0] + [np.nan] * 5
    r = adjust_network(value, station, loop, hours, known)
    assert r.station_tied.tolist() == [True, True, True, False, False, True]
    assert np.isnan(r.gravity[3]) and np.isnan(r.g_read[7])
    assert not r.drift_estimated[2] and r.drift_estimated[0]
    assert r.gravity[5] == pytest.approx(r.gravity[0] + 6.0, abs=1e-6)


def synthetic_survey(seed=3, noise=0.01):
    """Known gravity + tide + drift + noise: 6 days of loops A-stations-A, a second base B (invented)."""
    rng = np.random.default_rng(seed)
    n = 40
    truth = 979_500.0 + rng.uniform(-30, 30, n)
    known = np.full(n, np.nan)
    known[0] = truth[0]
    lat, lon = 45.0 + rng.uniform(0, 0.1, n), 7.0 + rng.uniform(0, 0.1, n)
    station, loop, hours = [], [], []
    t = parse_time("2026-05-04T14:00:00Z").utc_hours
    for day in range(6):
        visits = [0, 1, *list(rng.choice(np.arange(2, n), 8, replace=False)), 1, 0]
        for k, s in enumerate(visits):
            station.append(int(s))
            loop.append(day)
            hours.append(t + day * 24 + 0.6 * k + rng.uniform(0, 0.1))
    station, loop, hours = np.array(station), np.array(loop), np.array(hours)
    tide = longman_tide(lat[station], lon[station], 500.0, hours)
    offsets = rng.uniform(1000, 3000, 6)
    rates = rng.uniform(-0.05, 0.05, 6)
    start = np.array([hours[loop == d].min() for d in range(6)])
    reading = truth[station] - 979_500.0 + offsets[loop] + rates[loop] * (hours - start[loop]) - tide
    reading = reading + rng.normal(0, noise, len(reading))
    return dict(truth=truth, known=known, station=station, loop=loop, hours=hours, tide=tide, reading=reading)


def test_round_trip_adjustment_recovers_gravity_within_the_noise():
    s = synthetic_survey()
    value = s["reading"] + s["tide"]
    r = adjust_network(value, s["station"], s["loop"], s["hours"], s["known"])
    read = r.n_used > 0
    error = r.gravity[read] - s["truth"][read]
    z = error[1:] / r.sigma[read][1:]
    print(f"round trip: error rms {np.sqrt(np.mean(error**2)):.4f}, max {np.abs(error).max():.4f} mGal, "
          f"s0 {r.sigma0:.4f}, rms(error/g_sigma) {np.sqrt(np.mean(z**2)):.2f}")
    assert np.abs(error).max() < 0.04
    assert np.sqrt(np.mean(error**2)) < 0.02
    assert 0.007 < r.sigma0 < 0.013
    assert 0.6 < np.sqrt(np.mean(z**2)) < 1.5
    # Without the tide the same readings fit worse (the drift line absorbs part of it).
    bad = adjust_network(s["reading"], s["station"], s["loop"], s["hours"], s["known"])
    assert bad.sigma0 > 1.3 * r.sigma0


def test_round_trip_linear_drift():
    s = synthetic_survey(seed=5)
    r = linear_drift(s["reading"] + s["tide"], s["station"], s["loop"], s["hours"], s["known"])
    read = r.n_used > 0
    error = r.gravity[read] - s["truth"][read]
    assert np.abs(error).max() < 0.05


def test_outlier_flagged_and_left_out_of_a_second_pass():
    s = synthetic_survey(seed=9, noise=0.005)
    value = s["reading"] + s["tide"]
    k = int(np.flatnonzero((s["station"] == 1) & (s["loop"] == 2))[0])  # the second base, read twice a loop
    value[k] += 0.3  # a tare-like jump on one reading
    first = adjust_network(value, s["station"], s["loop"], s["hours"], s["known"])
    assert first.outlier[k] and first.used[k]
    second = adjust_network(value, s["station"], s["loop"], s["hours"], s["known"], drop_outliers=True)
    assert second.outlier[k] and not second.used[k]
    assert second.residual[k] == pytest.approx(0.3, abs=0.03)
    assert second.sigma0 < first.sigma0


def test_linear_drift_with_a_single_base_reading_has_no_drift():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        r = linear_drift([10.0, 20.0, 30.0], [0, 1, 2], [0, 0, 0], [8.0, 9.0, 10.0], [979000.0, np.nan, np.nan])
    assert not r.drift_estimated[0]
    assert r.gravity[2] == pytest.approx(979020.0)
