# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:observedgravity through processing.run and qgis_process.bin (invented survey)."""

from __future__ import annotations

import csv
import hashlib
import json
import subprocess

import numpy as np
import pytest

from relief_gravity.algorithms.survey import CalibrationTable, longman_tide, parse_time, utc_hours_to_iso

EPSG = 32632
TABLE = ([1000, 2000, 3000, 4000], [1017.48, 2034.97, 3052.50, 4070.07], [1.01749, 1.01753, 1.01757, 1.01760])
IDS = ["BASE", "B2"] + [f"S{k:02d}" for k in range(1, 11)]


def digest(path):
    return hashlib.sha256(open(path, "rb").read()).hexdigest()


def write_csv(path, header, rows):
    with open(path, "w", newline="", encoding="utf-8") as handle:
        writer = csv.writer(handle)
        writer.writerow(header)
        writer.writerows(rows)
    return str(path)


@pytest.fixture
def survey(tmp_path, points_writer):
    """12 stations, BASE known; two days of loops BASE-B2-...-B2-BASE, local times at UTC+2, counter units."""
    rng = np.random.default_rng(21)
    x = 500_000.0 + rng.uniform(-3000, 3000, len(IDS))
    y = 5_000_000.0 + rng.uniform(-3000, 3000, len(IDS))
    truth = 980_400.0 + rng.uniform(-20, 20, len(IDS))
    elev = rng.uniform(300, 900, len(IDS))
    known = [float(truth[0])] + [None] * (len(IDS) - 1)
    stations = points_writer(
        tmp_path / "stations.gpkg", x, y,
        {"sid": IDS, "elev": [float(v) for v in elev], "gknown": known, "truth": [float(v) for v in truth]}, epsg=EPSG,
    )
    table = CalibrationTable.from_rows(*TABLE)
    calibration = write_csv(tmp_path / "calibration.csv", ["counter", "mgal", "factor"], zip(*TABLE, strict=True))
    lat = 45.15 + (y - 5_000_000.0) / 111_000.0  # near enough for the tide (0.1 arc-minute matters nothing)
    lon = 9.0 + (x - 500_000.0) / 78_600.0
    rows, true_rows = [], []
    for day, (date, offset, rate) in enumerate((("2026-05-04", 150.0, 0.031), ("2026-05-05", 163.0, -0.018))):
        visits = [0, 1] + [2 + ((day * 5 + k) % 10) for k in range(7)] + [1, 0]
        for k, s in enumerate(visits):
            local = f"{date}T{8 + k // 2:02d}:{(k % 2) * 30 + 5:02d}:00"
            hours = parse_time(local, 2.0).utc_hours
            ih = 0.2 + 0.01 * k
            t0 = parse_time(f"{date}T08:05:00", 2.0).utc_hours
            tide = float(longman_tide(lat[s], lon[s], elev[s], hours))
            mgal = truth[s] - 978_000.0 + offset + rate * (hours - t0) - tide - 0.3086 * ih + rng.normal(0, 0.004)
            rows.append([IDS[s], local, f"{float(table.to_counter(mgal)):.3f}", f"{ih:.2f}", f"L{day + 1}"])
            true_rows.append((s, rate * (hours - t0)))
    header = ["station", "time", "counter", "inst_h", "loop"]
    readings = write_csv(tmp_path / "readings.csv", header, rows)
    return dict(folder=tmp_path, stations=stations, calibration=calibration, readings=readings, rows=rows,
                header=header, truth=truth, known=known)


def params(s, **extra):
    base = {
        "READINGS": s["readings"], "STATION_FIELD": "station", "TIME_FIELD": "time", "UTC_OFFSET": 2.0,
        "READING_FIELD": "counter", "READING_UNITS": 0, "CALIBRATION": s["calibration"], "INSTRUMENT_HEIGHT_FIELD": "inst_h",
        "LOOP_FIELD": "loop", "STATIONS": s["stations"], "STATIONS_ID_FIELD": "sid", "HEIGHT_FIELD": "elev",
        "KNOWN_GRAVITY_FIELD": "gknown", "OUTPUT": str(s["folder"] / "observed.gpkg"),
        "READINGS_OUTPUT": str(s["folder"] / "readings_out.gpkg"),
    }
    base.update(extra)
    return base


def run(parameters):
    import processing

    return processing.run("reliefgravity:observedgravity", parameters)


def table_of(path):
    from qgis.core import QgsVectorLayer

    layer = QgsVectorLayer(str(path), "t", "ogr")
    assert layer.isValid(), path
    return [{name: f[name] for name in layer.fields().names()} for f in layer.getFeatures()]


def number(value):
    return float("nan") if value is None or str(value) == "NULL" else float(value)


def test_network_adjustment_recovers_the_survey(provider, survey):
    hashes = {k: digest(survey[k]) for k in ("stations", "calibration", "readings")}
    result = run(params(survey))
    assert result["LOOPS"] == 2
    out = table_of(result["OUTPUT"])
    g = np.array([number(r["g_obs"]) for r in out])
    sigma = np.array([number(r["g_sigma"]) for r in out])
    read = np.array([r["n_read"] for r in out]) > 0
    error = g[read] - survey["truth"][read]
    assert np.abs(error).max() < 0.02
    assert np.all(np.isfinite(sigma[read])) and np.all(sigma[read] < 0.02)
    assert out[0]["qc_flag"].split(";")[0] == "known_station"
    readings = table_of(result["READINGS_OUTPUT"])
    assert len(readings) == len(survey["rows"])
    for name in ("tide_corr", "drift_corr", "g_read", "residual", "loop", "qc_flag", "t_utc"):
        assert name in readings[0]
    assert readings[0]["t_utc"] == utc_hours_to_iso(parse_time(survey["rows"][0][1], 2.0).utc_hours)
    assert {r["loop"] for r in readings} == {"L1", "L2"}
    assert all(abs(number(r["tide_corr"])) < 0.35 for r in readings)
    # Loop 1 drifts 0.031 mGal/h over 5 h on its base: the largest misclosure is about 0.155 mGal.
    assert result["MAX_MISCLOSURE"] == pytest.approx(0.155, abs=0.02)
    for key, value in hashes.items():
        assert digest(survey[key]) == value, key
    from relief_gravity.plugin.provenance import read_record

    record = read_record(result["OUTPUT"])
    assert record["steps"][-1]["algorithm"] == "reliefgravity:observedgravity"
    assert record["steps"][-1]["settings"]["drift"] == "network"


def test_output_feeds_the_bouguer_reduction(provider, survey):
    import processing

    first = run(params(survey))
    reduced = processing.run(
        "reliefgravity:bouguerreduction",
        {"INPUT": first["OUTPUT"], "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "OUTPUT": "TEMPORARY_OUTPUT"},
    )
    assert reduced["STATIONS_REDUCED"] == sum(1 for r in table_of(first["OUTPUT"]) if r["n_read"])


@pytest.mark.parametrize(("drift", "tolerance"), [(1, 0.03), (2, 0.2)])
def test_linear_and_no_drift(provider, survey, drift, tolerance):
    result = run(params(survey, DRIFT=drift))
    out = table_of(result["OUTPUT"])
    g = np.array([number(r["g_obs"]) for r in out])
    read = np.isfinite(g)
    assert read.sum() >= 10
    assert np.abs(g[read] - survey["truth"][read]).max() < tolerance


def test_readings_in_mgal_without_tide(provider, survey):
    table = CalibrationTable.from_rows(*TABLE)
    rows = [[*r[:2], f"{float(table.to_mgal(float(r[2]))):.4f}", *r[3:]] for r in survey["rows"]]
    path = write_csv(survey["folder"] / "mgal.csv", survey["header"], rows)
    with_tide = run(params(survey, READINGS=path, READING_UNITS=1, CALIBRATION=None))
    g = np.array([number(r["g_obs"]) for r in table_of(with_tide["OUTPUT"])])
    read = np.isfinite(g)
    assert np.abs(g[read] - survey["truth"][read]).max() < 0.02
    no_tide = run(params(survey, READINGS=path, READING_UNITS=1, CALIBRATION=None, TIDE=1,
                         OUTPUT=str(survey["folder"] / "o2.gpkg"), READINGS_OUTPUT=str(survey["folder"] / "r2.gpkg")))
    assert all(number(r["tide_corr"]) == 0.0 for r in table_of(no_tide["READINGS_OUTPUT"]))


def edited(survey, name, change):
    rows = [list(r) for r in survey["rows"]]
    rows = change(rows)
    return write_csv(survey["folder"] / name, survey["header"], rows)


def test_unknown_station_is_flagged_and_the_run_goes_on(provider, survey, collecting_feedback):
    import processing

    path = edited(survey, "unknown.csv", lambda rows: [*rows[:4], ["NOPE", *rows[4][1:]], *rows[5:]])
    result = processing.run("reliefgravity:observedgravity", params(survey, READINGS=path), feedback=collecting_feedback)
    readings = table_of(result["READINGS_OUTPUT"])
    assert "unknown_station" in readings[4]["qc_flag"].split(";")
    assert readings[4]["g_read"] is None or str(readings[4]["g_read"]) == "NULL"
    assert any("NOPE" in w for w in collecting_feedback.warnings)


@pytest.mark.parametrize("bad", ["04/05/2026 09:00", "2026-05-04T25:00", ""])
def test_unparseable_time_names_the_row_and_the_forms(provider, survey, bad):
    path = edited(survey, "time.csv", lambda rows: [*rows[:6], [*rows[6][:1], bad, *rows[6][2:]], *rows[7:]])
    with pytest.raises(Exception, match=r"row\(s\) 7 .*Accepted forms: YYYY-MM-DD"):
        run(params(survey, READINGS=path))


def test_counter_outside_the_table_is_refused(provider, survey):
    path = edited(survey, "counter.csv", lambda rows: [*rows[:2], [*rows[2][:2], "4500.000", *rows[2][3:]], *rows[3:]])
    with pytest.raises(Exception, match=r"outside the calibration table's range 1000.0 to 4000.0 in row\(s\) 3"):
        run(params(survey, READINGS=path))


def test_no_known_station_is_refused(provider, survey, points_writer):
    stations = table_of(survey["stations"])
    from qgis.core import QgsVectorLayer

    layer = QgsVectorLayer(survey["stations"], "s", "ogr")
    xy = [(f.geometry().asPoint().x(), f.geometry().asPoint().y()) for f in layer.getFeatures()]
    del layer
    path = points_writer(survey["folder"] / "unknown_known.gpkg", [p[0] for p in xy], [p[1] for p in xy],
                         {"sid": [r["sid"] for r in stations], "elev": [r["elev"] for r in stations], "gknown": [None] * len(xy)},
                         epsg=EPSG)
    with pytest.raises(Exception, match="known gravity"):
        run(params(survey, STATIONS=path))
    # Known only at a station nobody read: the network is not tied.
    path = points_writer(survey["folder"] / "unread_known.gpkg", [p[0] for p in xy] + [501_000.0], [p[1] for p in xy] + [5_001_000.0],
                         {"sid": [r["sid"] for r in stations] + ["FAR"], "elev": [r["elev"] for r in stations] + [100.0],
                          "gknown": [None] * len(xy) + [980_000.0]}, epsg=EPSG)
    with pytest.raises(Exception, match="cannot be tied"):
        run(params(survey, STATIONS=path))


def test_single_base_reading_backwards_time_and_duplicates_are_flagged(provider, survey):
    def change(rows):
        loop2 = [r for r in rows if r[4] == "L2"][:-1]  # loop 2 loses its closing base reading
        loop1 = [r for r in rows if r[4] == "L1"]
        loop1[3], loop1[4] = loop1[4], loop1[3]  # two rows swapped: the time goes backwards
        return [*loop1, loop1[5], *loop2]  # and a duplicate row
    path = edited(survey, "checks.csv", change)
    result = run(params(survey, READINGS=path))
    readings = table_of(result["READINGS_OUTPUT"])
    codes = [set(r["qc_flag"].split(";")) for r in readings]
    assert "time_backwards" in codes[4]
    assert "duplicate_reading" in codes[11] and "duplicate_reading" not in codes[5]
    assert all("loop_single_base" in c for c, r in zip(codes, readings, strict=True) if r["loop"] == "L2")
    assert not any("loop_single_base" in c for c, r in zip(codes, readings, strict=True) if r["loop"] == "L1")
    g = np.array([number(r["g_obs"]) for r in table_of(result["OUTPUT"])])
    read = np.isfinite(g)
    assert np.abs(g[read] - survey["truth"][read]).max() < 0.03


def test_default_loops_by_local_day_and_date_time_fields(provider, survey, points_writer):
    from osgeo import ogr

    path = survey["folder"] / "readings_dt.gpkg"
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("readings", None, ogr.wkbNone)
    for name, kind in (("station", ogr.OFTString), ("time", ogr.OFTDateTime), ("counter", ogr.OFTReal), ("inst_h", ogr.OFTReal)):
        layer.CreateField(ogr.FieldDefn(name, kind))
    for station, local, counter, ih, _ in survey["rows"]:
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("station", station)
        utc = utc_hours_to_iso(parse_time(local, 2.0).utc_hours)
        date, clock = utc[:10], utc[11:19]
        feature.SetField("time", int(date[:4]), int(date[5:7]), int(date[8:10]), int(clock[:2]), int(clock[3:5]), float(clock[6:]), 100)
        feature.SetField("counter", float(counter))
        feature.SetField("inst_h", float(ih))
        layer.CreateFeature(feature)
    ds = None
    result = run(params(survey, READINGS=str(path), LOOP_FIELD=None, UTC_OFFSET=0.0))
    assert result["LOOPS"] == 2
    g = np.array([number(r["g_obs"]) for r in table_of(result["OUTPUT"])])
    read = np.isfinite(g)
    assert np.abs(g[read] - survey["truth"][read]).max() < 0.02


def test_bad_calibration_table_and_scale(provider, survey):
    path = write_csv(survey["folder"] / "cal_bad.csv", ["c", "m", "f"], zip(*TABLE, strict=True))
    with pytest.raises(Exception, match="counter, mgal and factor"):
        run(params(survey, CALIBRATION=path))
    with pytest.raises(Exception, match="scale factor must be positive"):
        run(params(survey, SCALE_FACTOR=0.0))


def test_qgis_process_runs_the_algorithm(provider, survey, qgis_process_env):
    executable, env = qgis_process_env
    out = survey["folder"] / "cli.gpkg"
    args = [f"{k}={v}" for k, v in params(survey, OUTPUT=str(out), READINGS_OUTPUT=str(survey["folder"] / "cli_r.gpkg")).items()]
    completed = subprocess.run([executable, "--json", "run", "reliefgravity:observedgravity", "--", *args],
                               env=env, capture_output=True, text=True, timeout=300)
    assert completed.returncode == 0, completed.stdout[-2000:] + completed.stderr[-2000:]
    results = json.loads(completed.stdout[completed.stdout.index("{"):])["results"]
    assert results["LOOPS"] == 2
    python = run(params(survey))
    g_cli = [number(r["g_obs"]) for r in table_of(out)]
    g_py = [number(r["g_obs"]) for r in table_of(python["OUTPUT"])]
    np.testing.assert_allclose(g_cli, g_py, atol=1e-9)


def test_tide_from_meeus_positions_agrees_with_longman_within_its_error(provider, survey):
    """TIDE=2: the Meeus (1998) Sun and Moon with the exact attraction.

    The survey's readings were made with Longman's tide; Longman's series errs
    by up to about 0.003 mGal (tests/algorithms/survey/test_tide_positions.py),
    so the two tides differ by at most that, reading by reading, and g_obs by
    less after the adjustment.
    """
    longman = run(params(survey, OUTPUT=str(survey["folder"] / "a.gpkg"), READINGS_OUTPUT=str(survey["folder"] / "ra.gpkg")))
    meeus = run(params(survey, TIDE=2, OUTPUT=str(survey["folder"] / "b.gpkg"), READINGS_OUTPUT=str(survey["folder"] / "rb.gpkg")))
    tide_a = np.array([number(r["tide_corr"]) for r in table_of(longman["READINGS_OUTPUT"])])
    tide_b = np.array([number(r["tide_corr"]) for r in table_of(meeus["READINGS_OUTPUT"])])
    assert np.all(np.isfinite(tide_b))
    assert 0 < np.abs(tide_b - tide_a).max() < 0.003
    g_a = np.array([number(r["g_obs"]) for r in table_of(longman["OUTPUT"])])
    g_b = np.array([number(r["g_obs"]) for r in table_of(meeus["OUTPUT"])])
    read = np.isfinite(g_a)
    assert np.abs(g_b[read] - g_a[read]).max() < 0.003
    from relief_gravity.plugin.provenance import read_record

    assert read_record(meeus["OUTPUT"])["steps"][-1]["settings"]["tide"] == "meeus1998"


def test_a_priori_standard_errors_weigh_known_values_against_the_readings(provider, survey, tmp_path):
    """A second known station 0.3 mGal off: held at its value by the default 0.001 mGal, outvoted at 1 mGal."""
    from osgeo import ogr

    copy = tmp_path / "two_known.gpkg"
    ogr.GetDriverByName("GPKG").CopyDataSource(ogr.Open(survey["stations"]), str(copy))
    ds = ogr.Open(str(copy), 1)
    layer = ds.GetLayer(0)
    for feature in layer:
        if feature.GetField("sid") == "B2":
            feature.SetField("gknown", float(survey["truth"][1]) + 0.3)
            layer.SetFeature(feature)
    ds = layer = None
    hashes = digest(copy)

    def b2_minus_base(**extra):
        result = run(params(survey, STATIONS=str(copy), OUTPUT=str(tmp_path / f"o{len(extra)}.gpkg"),
                            READINGS_OUTPUT=str(tmp_path / f"r{len(extra)}.gpkg"), **extra))
        rows = {r["sid"]: r for r in table_of(result["OUTPUT"])}
        return number(rows["B2"]["g_obs"]) - number(rows["BASE"]["g_obs"]), result

    true_difference = survey["truth"][1] - survey["truth"][0]
    tight, _ = b2_minus_base()
    loose, result = b2_minus_base(KNOWN_SIGMA=1.0, READING_SIGMA=0.005)
    # Held: the known values impose their 0.3 mGal error; loose: the readings
    # set the difference and the level is the mean of the two known values.
    assert tight == pytest.approx(true_difference + 0.3, abs=0.02)
    assert loose == pytest.approx(true_difference, abs=0.02)
    from relief_gravity.plugin.provenance import read_record

    settings = read_record(result["OUTPUT"])["steps"][-1]["settings"]
    assert settings["known_sigma_mgal"] == 1.0 and settings["reading_sigma_mgal"] == 0.005
    assert digest(copy) == hashes
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException):
        run(params(survey, KNOWN_SIGMA=-1.0))
