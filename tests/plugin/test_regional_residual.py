# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:regionalresidual through processing.run and qgis_process.bin (invented rasters)."""

from __future__ import annotations

import hashlib
import json
import subprocess
from pathlib import Path

import numpy as np
import pytest
from osgeo import gdal

gdal.UseExceptions()

WEST, NORTH, CELL = 480_000.0, 5_020_000.0, 250.0
ROWS, COLS = 61, 81


def anomaly():
    """Invented anomaly: a 1 mGal/km regional slope and a -6 mGal local low, some cells blank."""
    x = WEST + (np.arange(COLS) + 0.5) * CELL
    y = NORTH - (np.arange(ROWS) + 0.5) * CELL
    xx, yy = np.meshgrid(x, y)
    g = 1e-3 * (xx - WEST) - 6.0 * np.exp(-((xx - 490_000) ** 2 + (yy - 5_012_000) ** 2) / (2 * 1500.0**2))
    g[:4, :6] = np.nan
    return g, xx, yy


@pytest.fixture
def grid_tif(tmp_path, dem_writer):
    from relief_gravity.plugin import provenance

    g, _, _ = anomaly()
    path = dem_writer(tmp_path / "cba.tif", np.where(np.isfinite(g), g, -99999.0), WEST, NORTH, CELL, nodata=-99999.0)
    provenance.write_record(str(path), provenance.chained(None, provenance.make_step("reliefgravity:anomalygrid", {"FIELD": "cba"}, {})))
    return str(path)


def read(path):
    ds = gdal.Open(str(path))
    band = ds.GetRasterBand(1)
    values = band.ReadAsArray().astype(float)
    values[values == band.GetNoDataValue()] = np.nan
    return values, ds.GetGeoTransform(), ds.GetMetadataItem("RELIEF_GRAVITY_PROVENANCE"), band.GetUnitType()


def run(parameters, feedback=None):
    import processing

    return processing.run("reliefgravity:regionalresidual", parameters, feedback=feedback)


@pytest.mark.parametrize(
    "options",
    [{"METHOD": 0, "ORDER": 1, "ROBUST": 2}, {"METHOD": 0, "ORDER": 3, "ROBUST": 0}, {"METHOD": 1, "HEIGHT": 2000.0}],
)
def test_regional_plus_residual_is_the_input(provider, grid_tif, tmp_path, options):
    before = hashlib.sha256(Path(grid_tif).read_bytes()).hexdigest()
    result = run({"INPUT": grid_tif, **options, "REGIONAL": str(tmp_path / "reg.tif"), "RESIDUAL": str(tmp_path / "res.tif")})
    g, _, _ = anomaly()
    regional, transform, record, unit = read(result["REGIONAL"])
    residual, _, _, _ = read(result["RESIDUAL"])
    ok = np.isfinite(g)
    np.testing.assert_array_equal(np.isfinite(regional), ok)
    # float32 files: the sum gives the input back to float32 rounding.
    np.testing.assert_allclose(regional[ok] + residual[ok], g[ok], atol=2e-5)
    assert transform == (WEST, CELL, 0.0, NORTH, 0.0, -CELL)
    assert unit == "mGal"
    steps = json.loads(record)["steps"]
    assert [s["algorithm"] for s in steps] == ["reliefgravity:anomalygrid", "reliefgravity:regionalresidual"]
    assert hashlib.sha256(Path(grid_tif).read_bytes()).hexdigest() == before


def test_robust_plane_finds_the_regional_slope(provider, grid_tif, tmp_path):
    result = run({"INPUT": grid_tif, "METHOD": 0, "ORDER": 1, "ROBUST": 2, "REGIONAL": str(tmp_path / "r.tif"), "RESIDUAL": str(tmp_path / "s.tif")})
    regional, _, _, _ = read(result["REGIONAL"])
    slope = np.nanmean(np.diff(regional, axis=1)) / CELL
    assert slope == pytest.approx(1e-3, rel=0.02)  # 1 mGal/km as built


def test_stations_are_sampled(provider, grid_tif, tmp_path, points_writer):
    from osgeo import ogr

    x = [490_000.0, 495_000.0, 470_000.0]  # the last is off the raster
    y = [5_012_000.0, 5_008_000.0, 5_008_000.0]
    stations = points_writer(tmp_path / "st.gpkg", x, y, {"qc_flag": ["height_from_dem", None, None], "cba": [1.0, 2.0, 3.0]})
    result = run({
        "INPUT": grid_tif, "METHOD": 1, "HEIGHT": 1000.0, "REGIONAL": str(tmp_path / "r.tif"), "RESIDUAL": str(tmp_path / "s.tif"),
        "STATIONS": stations, "STATIONS_OUTPUT": str(tmp_path / "sampled.gpkg"),
    })
    assert result["STATIONS_SAMPLED"] == 2
    ds = ogr.Open(result["STATIONS_OUTPUT"])
    rows = [(f.GetField("regional"), f.GetField("residual"), f.GetField("qc_flag")) for f in ds.GetLayer(0)]
    assert rows[0][2] == "height_from_dem" and rows[1][2] is None
    assert rows[2][0] is None and rows[2][2] == "outside_grid"
    assert rows[0][1] < -3.0  # the local low is in the residual


def test_bad_inputs_are_refused(provider, grid_tif, tmp_path, dem_writer):
    from qgis.core import QgsProcessingException

    out = {"REGIONAL": str(tmp_path / "r.tif"), "RESIDUAL": str(tmp_path / "s.tif")}
    with pytest.raises(QgsProcessingException, match="height"):
        run({"INPUT": grid_tif, "METHOD": 1, "HEIGHT": 0.0, **out})
    with pytest.raises(QgsProcessingException, match="stations to sample"):
        run({"INPUT": grid_tif, "STATIONS_OUTPUT": str(tmp_path / "x.gpkg"), **out})
    blank = dem_writer(tmp_path / "blank.tif", np.full((5, 5), -99999.0), WEST, NORTH, CELL, nodata=-99999.0)
    with pytest.raises(QgsProcessingException, match="no cell"):
        run({"INPUT": str(blank), **out})
    geographic = dem_writer(tmp_path / "geo.tif", np.ones((5, 5)), 7.0, 45.0, 0.01, epsg=4326)
    with pytest.raises(QgsProcessingException, match="geographic"):
        run({"INPUT": str(geographic), **out})
    few = dem_writer(tmp_path / "few.tif", np.array([[1.0, -99999.0], [-99999.0, 2.0]]), WEST, NORTH, CELL, nodata=-99999.0)
    with pytest.raises(QgsProcessingException, match="cannot be separated"):
        run({"INPUT": str(few), "METHOD": 0, "ORDER": 1, **out})
    assert not (tmp_path / "r.tif").exists()


def test_outputs_are_styled_when_loaded(provider, grid_tif, tmp_path):
    import processing
    from qgis.core import QgsProcessingContext, QgsProcessingFeedback, QgsProject

    context = QgsProcessingContext()
    project = QgsProject()
    context.setProject(project)
    result = processing.runAndLoadResults(
        "reliefgravity:regionalresidual",
        {"INPUT": grid_tif, "METHOD": 0, "REGIONAL": str(tmp_path / "r.tif"), "RESIDUAL": str(tmp_path / "s.tif")},
        feedback=QgsProcessingFeedback(), context=context,
    )
    layers = [lyr for lyr in QgsProject.instance().mapLayers().values() if lyr.source() in (result["REGIONAL"], result["RESIDUAL"])]
    assert len(layers) == 2
    assert all(lyr.renderer().type() == "singlebandpseudocolor" for lyr in layers)
    assert all("mGal" in lyr.title() for lyr in layers)
    QgsProject.instance().removeMapLayers([lyr.id() for lyr in layers])


def test_through_qgis_process(provider, grid_tif, tmp_path, qgis_process_env):
    executable, env = qgis_process_env
    run_ = subprocess.run(
        [executable, "run", "reliefgravity:regionalresidual", "--", f"INPUT={grid_tif}", "METHOD=1", "HEIGHT=1500",
         f"REGIONAL={tmp_path / 'cli_r.tif'}", f"RESIDUAL={tmp_path / 'cli_s.tif'}"],
        env=env, capture_output=True, text=True, timeout=300,
    )
    assert run_.returncode == 0, run_.stdout + run_.stderr
    py = run({"INPUT": grid_tif, "METHOD": 1, "HEIGHT": 1500.0, "REGIONAL": str(tmp_path / "py_r.tif"), "RESIDUAL": str(tmp_path / "py_s.tif")})
    np.testing.assert_array_equal(read(tmp_path / "cli_r.tif")[0], read(py["REGIONAL"])[0])


def test_cancel_raises_and_writes_nothing(provider, grid_tif, tmp_path):
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    feedback = QgsProcessingFeedback()
    feedback.cancel()
    with pytest.raises(QgsProcessingException, match="Cancelled"):
        run({"INPUT": grid_tif, "METHOD": 1, "HEIGHT": 500.0, "REGIONAL": str(tmp_path / "r.tif"), "RESIDUAL": str(tmp_path / "s.tif")}, feedback)
    assert not (tmp_path / "r.tif").exists() and not (tmp_path / "s.tif").exists()
