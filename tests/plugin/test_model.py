# SPDX-License-Identifier: GPL-2.0-or-later
"""The shipped reduce -> grid -> contour model, through processing.run and qgis_process.bin.

The survey (60 stations, a 4 km DEM) is invented: these are chaining checks.
The model's anomaly raster must be exactly what ``anomalygrid`` makes from
the model's own reduced stations, and qgis_process must produce the same
files as processing.run.
"""

from __future__ import annotations

import subprocess
from pathlib import Path

import numpy as np
import pytest
from osgeo import gdal, ogr, osr

gdal.UseExceptions()

REPO_ROOT = Path(__file__).resolve().parents[2]
MODEL = REPO_ROOT / "plugin" / "models" / "reduce_grid_contour.model3"
EPSG = 32633
WEST, NORTH, CELL, N = 500_000.0, 5_004_000.0, 100.0, 40  # DEM: 40 x 40 cells of 100 m


def dem_height(x, y):
    """Invented relief: a 120 m hill on a plateau at 400 m."""
    return 400.0 + 120.0 * np.exp(-((x - 502_000.0) ** 2 + (y - 5_002_000.0) ** 2) / (2 * 700.0**2))


@pytest.fixture(scope="module")
def survey(tmp_path_factory, dem_writer, points_writer):
    folder = tmp_path_factory.mktemp("survey")
    xc = WEST + (np.arange(N) + 0.5) * CELL
    yc = NORTH - (np.arange(N) + 0.5) * CELL
    xx, yy = np.meshgrid(xc, yc)
    dem_writer(folder / "dem.tif", dem_height(xx, yy), WEST, NORTH, CELL, epsg=EPSG, nodata=-9999.0)

    rng = np.random.default_rng(11)
    x = WEST + 600.0 + rng.uniform(0, 2800, 60)
    y = NORTH - 600.0 - rng.uniform(0, 2800, 60)
    h = dem_height(x, y)
    # Invented observed gravity: a plausible mid-latitude value, the free-air
    # fall with height and a buried mass deficit of -6 mGal.
    g_obs = 980_700.0 - 0.2 * h - 6.0 * np.exp(-((x - 501_500.0) ** 2 + (y - 5_001_500.0) ** 2) / (2 * 600.0**2))
    points_writer(folder / "stations.gpkg", x, y, {"g_obs": [float(v) for v in g_obs], "height": [float(v) for v in h]}, epsg=EPSG)
    return folder


def load_model():
    from qgis.core import QgsProcessingModelAlgorithm

    model = QgsProcessingModelAlgorithm()
    assert model.fromFile(str(MODEL))
    return model


def test_model_file_structure(provider):
    model = load_model()
    assert sorted(model.childAlgorithms()) == ["grid", "reduce", "report"]
    assert model.childAlgorithm("reduce").algorithmId() == "reliefgravity:bouguerreduction"
    assert model.childAlgorithm("grid").algorithmId() == "reliefgravity:anomalygrid"
    assert model.childAlgorithm("report").algorithmId() == "reliefgravity:surveyreport"
    names = {d.name() for d in model.parameterDefinitions()}
    assert {"stations", "gravity_field", "height_field", "dem", "density"} <= names
    assert {"reduce:reduced_stations", "grid:anomaly", "grid:contours", "report:survey_report"} <= names
    source = model.childAlgorithm("grid").parameterSources()["INPUT"][0]
    assert (source.outputChildId(), source.outputName()) == ("reduce", "OUTPUT")
    report_sources = model.childAlgorithm("report").parameterSources()
    wired = {name: (report_sources[name][0].outputChildId(), report_sources[name][0].outputName())
             for name in ("INPUT", "GRID", "CONTOURS")}
    assert wired == {"INPUT": ("reduce", "OUTPUT"), "GRID": ("grid", "OUTPUT"), "CONTOURS": ("grid", "CONTOURS")}
    assert model.validate()[0]


@pytest.fixture(scope="module")
def model_run(provider, survey):
    import processing

    out = survey / "run_py"
    out.mkdir()
    result = processing.run(
        load_model(),
        {
            "stations": str(survey / "stations.gpkg"),
            "gravity_field": "g_obs",
            "height_field": "height",
            "dem": str(survey / "dem.tif"),
            # Invented DEM on the same datum as the invented station heights.
            "dem_datum": 2,
            "density": 2670.0,
            "reduce:reduced_stations": str(out / "reduced.gpkg"),
            "grid:anomaly": str(out / "cba.tif"),
            "grid:contours": str(out / "contours.gpkg"),
            "report:survey_report": str(out / "report.html"),
        },
    )
    return out, result


def test_model_through_processing_run(model_run):
    import processing

    out, result = model_run
    assert Path(result["grid:anomaly"]) == out / "cba.tif"
    reduced_ds = ogr.Open(str(out / "reduced.gpkg"))  # keep the data source alive
    cba = [f.GetField("cba") for f in reduced_ds.GetLayer(0)]
    assert len(cba) == 60 and all(v is not None and np.isfinite(v) for v in cba)
    contours_ds = ogr.Open(str(out / "contours.gpkg"))
    contours = contours_ds.GetLayer(0)
    assert contours.GetFeatureCount() > 0
    assert contours.GetLayerDefn().GetFieldIndex("value") >= 0
    report = (out / "report.html").read_text(encoding="utf-8")
    assert Path(result["report:survey_report"]) == out / "report.html"
    assert "<h2>Anomaly map</h2>" in report and "60 stations" in report
    # The chained grid equals anomalygrid run by hand on the model's reduced stations.
    direct = processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": str(out / "reduced.gpkg"), "FIELD": "cba", "OUTPUT": str(out / "direct.tif")},
    )
    model_grid = gdal.Open(str(out / "cba.tif"))
    direct_grid = gdal.Open(direct["OUTPUT"])
    assert model_grid.GetGeoTransform() == direct_grid.GetGeoTransform()
    np.testing.assert_array_equal(model_grid.ReadAsArray(), direct_grid.ReadAsArray())
    srs = osr.SpatialReference(wkt=model_grid.GetProjection())
    srs.AutoIdentifyEPSG()
    assert srs.GetAuthorityCode(None) == str(EPSG)


def test_model_through_qgis_process(model_run, survey, tmp_path, qgis_process_env):
    # qgis_process_env (tests/plugin/conftest.py): throw-away HOME, QGIS_PLUGINPATH
    # with a relief_gravity symlink to this checkout, plugin enabled once per session.
    executable, env = qgis_process_env
    py_out, _ = model_run
    out = tmp_path / "run_cli"
    out.mkdir()
    run = subprocess.run(
        [
            executable, "run", str(MODEL), "--",
            f"stations={survey / 'stations.gpkg'}",
            "gravity_field=g_obs",
            "height_field=height",
            f"dem={survey / 'dem.tif'}",
            "dem_datum=2",
            "density=2670",
            f"reduce:reduced_stations={out / 'reduced.gpkg'}",
            f"grid:anomaly={out / 'cba.tif'}",
            f"grid:contours={out / 'contours.gpkg'}",
            f"report:survey_report={out / 'report.html'}",
        ],
        env=env, capture_output=True, text=True, timeout=300,
    )
    assert run.returncode == 0, run.stdout + run.stderr
    assert "grid:anomaly" in run.stdout
    cli = gdal.Open(str(out / "cba.tif"))
    py = gdal.Open(str(py_out / "cba.tif"))
    assert cli.GetGeoTransform() == py.GetGeoTransform()
    np.testing.assert_array_equal(cli.ReadAsArray(), py.ReadAsArray())
    cli_contours, py_contours = ogr.Open(str(out / "contours.gpkg")), ogr.Open(str(py_out / "contours.gpkg"))
    assert cli_contours.GetLayer(0).GetFeatureCount() == py_contours.GetLayer(0).GetFeatureCount()


def test_model_outputs_are_styled_when_loaded(provider, survey, tmp_path, qgis_new_project):
    # The child's post-processors travel with the model's final outputs.
    import processing
    from qgis.core import QgsProject, QgsRasterLayer, QgsSingleBandPseudoColorRenderer, QgsVectorLayer

    processing.runAndLoadResults(
        load_model(),
        {
            "stations": str(survey / "stations.gpkg"),
            "gravity_field": "g_obs",
            "height_field": "height",
            "dem": str(survey / "dem.tif"),
            # Invented DEM on the same datum as the invented station heights.
            "dem_datum": 2,
            "reduce:reduced_stations": str(tmp_path / "reduced.gpkg"),
            "grid:anomaly": str(tmp_path / "cba.tif"),
            "grid:contours": str(tmp_path / "contours.gpkg"),
            "report:survey_report": str(tmp_path / "report.html"),
        },
    )
    layers = QgsProject.instance().mapLayers().values()
    rasters = [layer for layer in layers if isinstance(layer, QgsRasterLayer)]
    assert len(rasters) == 1 and isinstance(rasters[0].renderer(), QgsSingleBandPseudoColorRenderer)
    contours = [layer for layer in layers if isinstance(layer, QgsVectorLayer) and layer.fields().names() == ["fid", "value"]]
    assert len(contours) == 1 and contours[0].labelsEnabled()


# --- reduce -> grid -> regional-residual model ------------------------------

SEPARATION_MODEL = REPO_ROOT / "plugin" / "models" / "reduce_grid_separate.model3"


def test_separation_model_chains_the_grid_into_regionalresidual(provider, survey, tmp_path):
    import processing
    from qgis.core import QgsProcessingModelAlgorithm

    model = QgsProcessingModelAlgorithm()
    assert model.fromFile(str(SEPARATION_MODEL))
    assert sorted(model.childAlgorithms()) == ["grid", "reduce", "separate"]
    source = model.childAlgorithm("separate").parameterSources()["INPUT"][0]
    assert (source.outputChildId(), source.outputName()) == ("grid", "OUTPUT")
    assert model.validate()[0]
    out = tmp_path
    result = processing.run(
        model,
        {
            "stations": str(survey / "stations.gpkg"), "gravity_field": "g_obs", "height_field": "height",
            "dem": str(survey / "dem.tif"), "density": 2670.0, "dem_datum": 2, "separation_method": 1, "continuation_height": 1000.0,
            "reduce:reduced_stations": str(out / "reduced.gpkg"), "grid:anomaly": str(out / "cba.tif"),
            "grid:contours": str(out / "contours.gpkg"), "separate:regional": str(out / "regional.tif"),
            "separate:residual": str(out / "residual.tif"), "separate:stations_separated": str(out / "separated.gpkg"),
        },
    )
    cba = gdal.Open(str(out / "cba.tif")).ReadAsArray().astype(float)
    regional = gdal.Open(str(out / "regional.tif")).ReadAsArray().astype(float)
    residual = gdal.Open(str(out / "residual.tif")).ReadAsArray().astype(float)
    ok = cba > -99990
    np.testing.assert_allclose(regional[ok] + residual[ok], cba[ok], atol=1e-4)
    # The chained regional equals regionalresidual run by hand on the model's grid.
    direct = processing.run(
        "reliefgravity:regionalresidual",
        {"INPUT": str(out / "cba.tif"), "METHOD": 1, "HEIGHT": 1000.0,
         "REGIONAL": str(out / "r2.tif"), "RESIDUAL": str(out / "s2.tif")},
    )
    np.testing.assert_array_equal(gdal.Open(direct["REGIONAL"]).ReadAsArray(), regional.astype(np.float32))
    separated = ogr.Open(str(out / "separated.gpkg"))
    values = [f.GetField("residual") for f in separated.GetLayer(0)]
    assert len(values) == 60 and sum(v is not None for v in values) >= 50
    assert Path(result["separate:regional"]) == out / "regional.tif"
