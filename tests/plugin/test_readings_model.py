# SPDX-License-Identifier: GPL-2.0-or-later
"""The shipped readings -> observed gravity -> reduce -> grid -> report model, through processing.run (demo data, invented)."""

from __future__ import annotations

from pathlib import Path

import numpy as np
from osgeo import gdal, ogr

gdal.UseExceptions()

ROOT = Path(__file__).resolve().parents[2]
MODEL = ROOT / "plugin" / "models" / "readings_reduce_grid.model3"
DATA = ROOT / "demo" / "data"


def test_readings_model_runs_the_chain(provider, tmp_path):
    import processing
    from qgis.core import QgsProcessingModelAlgorithm

    model = QgsProcessingModelAlgorithm()
    assert model.fromFile(str(MODEL))
    assert sorted(model.childAlgorithms()) == ["grid", "observed", "reduce", "report"]
    assert model.childAlgorithm("observed").algorithmId() == "reliefgravity:observedgravity"
    assert model.validate()[0]
    result = processing.run(
        model,
        {
            "readings": str(DATA / "corvahl_readings.csv"), "station_field": "station", "time_field": "time",
            "utc_offset": 2.0, "reading_field": "counter", "reading_units": 0,
            "calibration": str(DATA / "corvahl_calibration.csv"), "instrument_height_field": "inst_h",
            "loop_field": "loop", "stations": str(DATA / "corvahl_field_stations.gpkg"),
            "stations_id_field": "station_id", "known_gravity_field": "known_mgal", "height_field": "elev_m",
            "dem": str(DATA / "corvahl_dem.tif"), "regional_dem": str(DATA / "corvahl_regional.tif"), "density": 2670.0, "dem_datum": 1,
            "observed:observed_stations": str(tmp_path / "observed.gpkg"), "observed:readings": str(tmp_path / "readings.gpkg"),
            "reduce:reduced_stations": str(tmp_path / "reduced.gpkg"), "grid:anomaly": str(tmp_path / "cba.tif"),
            "grid:contours": str(tmp_path / "contours.gpkg"), "report:survey_report": str(tmp_path / "report.html"),
        },
    )
    assert Path(result["grid:anomaly"]) == tmp_path / "cba.tif"
    ds = ogr.Open(str(tmp_path / "reduced.gpkg"))
    rows = [(f.GetField("g_obs"), f.GetField("obs_grav"), f.GetField("cba")) for f in ds.GetLayer(0)]
    g, truth, cba = (np.array([np.nan if v is None else v for v in col], dtype=float) for col in zip(*rows, strict=True))
    assert len(rows) == 351 and np.all(np.isfinite(cba))
    assert np.abs(g - truth).max() < 0.05  # invented readings: recovered within the reading noise and drift
    assert gdal.Open(str(tmp_path / "cba.tif")).RasterXSize > 10
    report = (tmp_path / "report.html").read_text(encoding="utf-8")
    assert Path(result["report:survey_report"]) == tmp_path / "report.html"
    assert "<h2>Anomaly map</h2>" in report and "351 stations" in report
