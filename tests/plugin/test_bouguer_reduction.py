# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:bouguerreduction through processing.run and qgis_process.bin.

The inputs are small invented layers; the reference values are the pure
functions of relief_gravity.algorithms, themselves checked against published
values in tests/algorithms.
"""

from __future__ import annotations

import hashlib
import json
import subprocess

import numpy as np
import pytest

ADDED = ["normal_g", "height_corr", "atmos_corr", "slab_corr", "curv_corr", "tc_inner", "tc_outer", "tc_total", "faa", "sba", "cba", "qc_flag"]


def _run(params, feedback=None):
    import processing
    from qgis.core import QgsProcessingContext

    # The synthetic DEMs hold heights above the ellipsoid, like the stations.
    base = {"OUTPUT": "TEMPORARY_OUTPUT", "DEM_DATUM": 1}
    base.update(params)
    return processing.run("reliefgravity:bouguerreduction", base, feedback=feedback, context=QgsProcessingContext())


def _values(layer, name):
    from qgis.core import NULL

    out = []
    for feature in layer.getFeatures():
        value = feature[name]
        out.append(np.nan if value == NULL or value is None else value)
    return out


def _digest(path):
    return hashlib.sha256(path.read_bytes()).hexdigest()


def _geographic(layer):
    from qgis.core import QgsCoordinateReferenceSystem, QgsCoordinateTransform, QgsProject

    transform = QgsCoordinateTransform(layer.crs(), QgsCoordinateReferenceSystem("EPSG:4326"), QgsProject.instance())
    lat = []
    for feature in layer.getFeatures():
        lat.append(transform.transform(feature.geometry().asPoint()).y())
    return np.array(lat)


def test_algorithms_are_listed(provider):
    ids = {alg.id() for alg in provider.algorithms()}
    assert {"reliefgravity:bouguerreduction", "reliefgravity:terraincorrection", "reliefgravity:anomalygrid"} <= ids


def test_fields_added_values_match_algorithms_and_input_unchanged(provider, stations_gpkg):
    from qgis.core import QgsVectorLayer

    from relief_gravity.algorithms import reduce_gravity

    before = _digest(stations_gpkg)
    result = _run(
        {
            "INPUT": str(stations_gpkg),
            "GRAVITY_FIELD": "g_obs",
            "HEIGHT_FIELD": "elev",
            "TC_FIELD": "tc_given",
        }
    )
    layer = result["OUTPUT"]
    names = layer.fields().names()
    source_names = QgsVectorLayer(str(stations_gpkg), "in", "ogr").fields().names()
    assert names[: len(source_names)] == source_names
    for name in ADDED:
        assert name in names
    source = QgsVectorLayer(str(stations_gpkg), "in", "ogr")
    lat = _geographic(source)
    g = np.array(_values(source, "g_obs"), dtype=float)
    h = np.array(_values(source, "elev"), dtype=float)
    tc = np.array(_values(source, "tc_given"), dtype=float)
    expected = reduce_gravity(g, lat, h, density=2670.0, terrain_correction=tc)
    for name in ("normal_g", "height_corr", "atmos_corr", "slab_corr", "curv_corr", "tc_total", "faa", "sba", "cba"):
        np.testing.assert_allclose(np.array(_values(layer, name), dtype=float), expected[name], rtol=0, atol=1e-9, err_msg=name)
    assert all(np.isnan(v) for v in _values(layer, "tc_inner"))
    assert _values(layer, "qc_flag") == [""] * 12
    assert result["STATIONS_REDUCED"] == 12
    assert result["STATIONS_FLAGGED"] == 0
    assert _digest(stations_gpkg) == before
    # The input layer keeps its own schema: nothing was added to it.
    assert "faa" not in QgsVectorLayer(str(stations_gpkg), "again", "ogr").fields().names()


def test_legacy_options_and_feet(provider, make_points, station_rows):
    from relief_gravity.algorithms import reduce_gravity

    rows = [dict(r, elev=r["elev"] / 0.3048) for r in station_rows]
    path = make_points(rows, name="feet.gpkg")
    result = _run(
        {
            "INPUT": str(path),
            "GRAVITY_FIELD": "g_obs",
            "HEIGHT_FIELD": "elev",
            "HEIGHT_UNITS": 1,
            "NORMAL_GRAVITY": 2,
            "HEIGHT_CORRECTION": 1,
            "ATMOSPHERIC": False,
            "CURVATURE": False,
            "TC_FIELD": "tc_given",
        }
    )
    layer = result["OUTPUT"]
    lat = _geographic(layer)
    g = np.array([r["g_obs"] for r in station_rows])
    h = np.array([r["elev"] for r in station_rows])
    tc = np.array([r["tc_given"] for r in station_rows])
    expected = reduce_gravity(g, lat, h, terrain_correction=tc, normal_formula="1967", height_formula="first_order", atmospheric=False, curvature=False)
    np.testing.assert_allclose(_values(layer, "cba"), expected["cba"], atol=1e-8)
    np.testing.assert_allclose(_values(layer, "height_corr"), 0.3086 * h, atol=1e-8)  # 0.3086 mGal/m: common practice, no source
    assert all(v == 0 for v in _values(layer, "atmos_corr"))


def test_per_station_density_in_grams(provider, make_points, station_rows):
    rows = [dict(r, rho=r["rho"] / 1000.0) for r in station_rows]
    path = make_points(rows, name="rho.gpkg")
    result = _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "DENSITY_FIELD": "rho", "DENSITY_FIELD_UNITS": 1, "TC_FIELD": "tc_given"})
    layer = result["OUTPUT"]
    slab = np.array(_values(layer, "slab_corr"))
    rho = np.array([r["rho"] for r in station_rows])
    h = np.array([r["elev"] for r in station_rows])
    # Bouguer slab 2πGρh (docs/reduction.md section 5) with G = 6.6743e-11 (CODATA 2018).
    np.testing.assert_allclose(slab, 2 * np.pi * 6.6743e-11 * rho * h * 1e5, rtol=1e-12)


def test_null_gravity_and_height_keep_rows_with_reasons(provider, make_points, station_rows):
    rows = [dict(r) for r in station_rows]
    rows[2]["g_obs"] = None
    rows[5]["elev"] = None
    path = make_points(rows, name="nulls.gpkg")
    result = _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "TC_FIELD": "tc_given"})
    layer = result["OUTPUT"]
    assert layer.featureCount() == 12
    faa = _values(layer, "faa")
    flags = _values(layer, "qc_flag")
    assert np.isnan(faa[2]) and np.isnan(faa[5])
    assert "gravity" in flags[2]
    assert "height" in flags[5]
    assert np.isfinite(_values(layer, "normal_g")[5])
    assert np.isnan(_values(layer, "slab_corr")[5])
    assert sum(np.isfinite(faa)) == 10
    assert result["STATIONS_REDUCED"] == 10
    assert result["STATIONS_FLAGGED"] == 2


def test_missing_field_gives_a_sentence(provider, stations_gpkg):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="no field named 'gravity'"):
        _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "gravity", "HEIGHT_FIELD": "elev"})


def test_non_numeric_field_gives_a_sentence(provider, stations_gpkg):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="'label' chosen as the observed gravity field is not numeric"):
        _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "label", "HEIGHT_FIELD": "elev"})


def test_layer_without_crs_is_refused(provider, make_points, station_rows):
    from qgis.core import QgsProcessingException

    path = make_points(station_rows, epsg=None, name="nocrs.gpkg")
    with pytest.raises(QgsProcessingException, match="no coordinate reference system"):
        _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev"})


def test_latitude_out_of_range_stops_the_run(provider, make_points, station_rows, tmp_path):
    # Issue 8: a position outside the CRS's area of use is not reduced as if real.
    from qgis.core import QgsProcessingException

    rows = [dict(r, x=10.0 + 0.01 * i, y=45.0) for i, r in enumerate(station_rows)]
    rows[3]["y"] = 95.0
    path = make_points(rows, epsg=4326, name="geo.gpkg")
    out = tmp_path / "out.gpkg"
    with pytest.raises(QgsProcessingException, match="area of use"):
        _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "TC_FIELD": "tc_given", "OUTPUT": str(out)})
    assert not out.exists()


def test_implausible_density_warns(provider, stations_gpkg, collecting_feedback):
    _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "DENSITY": 3800.0, "TC_FIELD": "tc_given"}, collecting_feedback)
    assert any("outside" in w and "kg/m" in w for w in collecting_feedback.warnings)


def test_density_in_grams_by_mistake_is_refused(provider, stations_gpkg):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="looks like g/cm"):
        _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "DENSITY": 2.67})


def test_empty_layer_is_refused(provider, make_points):
    from qgis.core import QgsProcessingException

    path = make_points([], name="empty.gpkg")
    with pytest.raises(QgsProcessingException, match="no features"):
        _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev"})


def test_raster_without_overlap_is_refused(provider, make_points, station_rows, hill_dem):
    from qgis.core import QgsProcessingException

    rows = [dict(r, x=r["x"] + 200_000.0) for r in station_rows]
    path = make_points(rows, name="far.gpkg")
    dem_path, _ = hill_dem
    with pytest.raises(QgsProcessingException, match="No station lies on the elevation raster"):
        _run({"INPUT": str(path), "GRAVITY_FIELD": "g_obs", "DEM": str(dem_path)})


def test_heights_sampled_from_dem_are_flagged(provider, stations_gpkg, hill_dem):
    dem_path, (_west, _north, _cell, _heights) = hill_dem
    result = _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "DEM": str(dem_path), "TC_FIELD": "tc_given"})
    layer = result["OUTPUT"]
    flags = _values(layer, "qc_flag")
    assert all("height_from_dem" in f.split(";") for f in flags)
    slab = np.array(_values(layer, "slab_corr"))
    sampled = slab / (2 * np.pi * 6.6743e-11 * 2670.0 * 1e5)
    assert np.all((sampled > 199.0) & (sampled < 801.0))


def test_engine_terrain_correction_when_dem_and_no_tc_field(provider, stations_gpkg, hill_dem):
    dem_path, _ = hill_dem
    result = _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "DEM": str(dem_path), "OUTER_RADIUS": 20000.0})
    layer = result["OUTPUT"]
    inner = np.array(_values(layer, "tc_inner"), dtype=float)
    outer = np.array(_values(layer, "tc_outer"), dtype=float)
    total = np.array(_values(layer, "tc_total"), dtype=float)
    np.testing.assert_allclose(inner + outer, total, atol=1e-9)
    assert np.all(np.isfinite(total))
    assert np.all(inner >= 0)
    sba = np.array(_values(layer, "sba"))
    np.testing.assert_allclose(np.array(_values(layer, "cba")), sba + total, atol=1e-9)


def test_qgis_process_run_matches_processing_run(provider, qgis_process_env, stations_gpkg, tmp_path):
    from qgis.core import QgsVectorLayer

    executable, env = qgis_process_env
    out = tmp_path / "reduced_cli.gpkg"
    completed = subprocess.run(
        [executable, "--json", "run", "reliefgravity:bouguerreduction", "--", f"INPUT={stations_gpkg}", "GRAVITY_FIELD=g_obs", "HEIGHT_FIELD=elev", "TC_FIELD=tc_given", f"OUTPUT={out}"],
        env=env,
        capture_output=True,
        text=True,
        timeout=300,
    )
    assert completed.returncode == 0, completed.stdout[-2000:] + completed.stderr[-2000:]
    payload = json.loads(completed.stdout[completed.stdout.index("{"):])
    assert payload["results"]["STATIONS_REDUCED"] == 12
    cli = QgsVectorLayer(str(out), "cli", "ogr")
    inproc = _run({"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev", "TC_FIELD": "tc_given"})["OUTPUT"]
    np.testing.assert_allclose(_values(cli, "cba"), _values(inproc, "cba"), atol=1e-9)


def test_qgis_process_lists_the_algorithms(qgis_process_env):
    executable, env = qgis_process_env
    listing = subprocess.run([executable, "list"], env=env, capture_output=True, text=True, timeout=120)
    assert listing.returncode == 0
    for alg in ("reliefgravity:bouguerreduction", "reliefgravity:terraincorrection", "reliefgravity:anomalygrid"):
        assert alg in listing.stdout
