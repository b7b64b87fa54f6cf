# SPDX-License-Identifier: GPL-2.0-or-later
"""The shipped models as algorithms of the provider: listed, run by id, and robust to broken model files.

The whole chain runs on the invented demo survey (demo/data/corvahl_*, 351
stations): by id through ``processing.run`` from observed gravity, and by id
through ``qgis_process.bin run`` from meter readings.
"""

from __future__ import annotations

import hashlib
import re
import shutil
import subprocess
from pathlib import Path

import numpy as np
import pytest
from osgeo import gdal, ogr

gdal.UseExceptions()

ROOT = Path(__file__).resolve().parents[2]
MODELS = ROOT / "plugin" / "models"
DATA = ROOT / "demo" / "data"
MODEL_IDS = ("reliefgravity:readings_reduce_grid", "reliefgravity:reduce_grid_contour",
             "reliefgravity:reduce_grid_separate")
#: Section headings of reliefgravity:surveyreport (plugin/report/content.py).
SECTIONS = ("What was run", "Stations", "Anomaly map", "Anomaly distributions (mGal)", "Anomalies against height",
            "Terrain correction by zone (mGal)", "Uncertainty", "Flagged stations", "Cautions")


def digest(path: Path) -> str:
    return hashlib.sha256(path.read_bytes()).hexdigest()


def check_report(path: Path, stations: int) -> str:
    text = path.read_text(encoding="utf-8")
    assert re.findall(r"<h2>([^<]*)</h2>", text) == [s.replace("&", "&amp;") for s in SECTIONS]
    assert f"{stations} stations" in text
    # The map comes from the chained grid and contours, not from the stations alone.
    assert "Gridded anomaly with contours and stations (mGal)." in text
    assert text.count("data:image/png;base64,") >= 3
    return text


def reduced_cba(path: Path) -> np.ndarray:
    ds = ogr.Open(str(path))
    values = [f.GetField("cba") for f in ds.GetLayer(0)]
    return np.array([np.nan if v is None else v for v in values], dtype=float)


# --- listed with the algorithms ---------------------------------------------


def test_models_are_listed_under_relief_gravity(provider):
    from qgis.core import QgsApplication, QgsProcessingModelAlgorithm

    ids = {algorithm.id() for algorithm in provider.algorithms()}
    assert set(MODEL_IDS) <= ids
    assert {"reliefgravity:bouguerreduction", "reliefgravity:surveyreport"} <= ids
    assert len(MODEL_IDS) == len(list(MODELS.glob("*.model3")))
    registry = QgsApplication.processingRegistry()
    for model_id in MODEL_IDS:
        listed = registry.algorithmById(model_id)
        assert listed.group() == "Models" and listed.provider().id() == "reliefgravity"
        on_file = QgsProcessingModelAlgorithm()
        assert on_file.fromFile(str(MODELS / (model_id.split(":")[1] + ".model3")))
        assert listed.displayName() == on_file.displayName()
        # The listed instance has its outputs (children re-read once the provider was registered).
        assert {d.name() for d in listed.destinationParameterDefinitions()} == {
            d.name() for d in on_file.destinationParameterDefinitions()} != set()
        # The instance that runs has its children attached to the registered algorithms.
        instance = registry.createAlgorithmById(model_id)
        assert instance.id() == model_id
        assert all(child.algorithm() is not None for child in instance.childAlgorithms().values())
        assert instance.validate()[0]


def _write_models(folder: Path) -> None:
    good = (MODELS / "reduce_grid_contour.model3").read_text(encoding="utf-8")
    (folder / "good_one.model3").write_text(good, encoding="utf-8")
    (folder / "needs_missing.model3").write_text(
        good.replace("reliefgravity:surveyreport", "reliefgravity:no_such_step"), encoding="utf-8")
    (folder / "Bad-Name.model3").write_text(good, encoding="utf-8")
    (folder / "broken.model3").write_text("<not a model", encoding="utf-8")
    (folder / "surveyreport.model3").write_text(good, encoding="utf-8")  # would clash with an algorithm


def test_load_models_skips_what_cannot_run(provider, tmp_path):
    from relief_gravity.plugin.shipped_models import load_models

    _write_models(tmp_path)
    models, warnings = load_models(lambda algorithm_id: "no_such" not in algorithm_id, ["surveyreport"], tmp_path)
    assert [m.name() for m in models] == ["good_one"]
    text = "\n".join(warnings)
    assert len(warnings) == 4
    assert "needs_missing.model3 skipped: it needs reliefgravity:no_such_step, which is not installed" in text
    assert "Bad-Name.model3 skipped: its file name must be lower-case" in text
    assert "broken.model3 skipped: the file could not be read" in text
    assert "surveyreport.model3 skipped: an algorithm named surveyreport exists already" in text


def test_provider_logs_and_skips_a_model_with_a_missing_child(provider, tmp_path, monkeypatch):
    from qgis.core import Qgis, QgsApplication

    from relief_gravity.plugin import shipped_models

    _write_models(tmp_path)
    logged = []

    def keep(message, tag, level):
        logged.append((message, tag, level))

    QgsApplication.messageLog().messageReceived.connect(keep)
    monkeypatch.setattr(shipped_models, "MODELS_DIR", tmp_path)
    try:
        provider.refreshAlgorithms()
        ids = {algorithm.id() for algorithm in provider.algorithms()}
        assert "reliefgravity:good_one" in ids and "reliefgravity:bouguerreduction" in ids
        assert not any("needs_missing" in i or "broken" in i for i in ids)
        warnings = [m for m, tag, level in logged if tag == "Relief Gravity" and level == Qgis.Warning]
        assert any("needs_missing.model3 skipped" in m for m in warnings)
    finally:
        QgsApplication.messageLog().messageReceived.disconnect(keep)
        monkeypatch.undo()
        provider.refreshAlgorithms()
    assert set(MODEL_IDS) <= {algorithm.id() for algorithm in provider.algorithms()}
    refreshed = QgsApplication.processingRegistry().algorithmById("reliefgravity:reduce_grid_contour")
    assert refreshed.parameterDefinition("report:survey_report") is not None


def test_qgis_process_lists_the_models(qgis_process_env):
    executable, env = qgis_process_env
    listing = subprocess.run([executable, "list"], env=env, capture_output=True, text=True, timeout=180)
    assert listing.returncode == 0, listing.stdout + listing.stderr
    for model_id in MODEL_IDS:
        assert model_id in listing.stdout
    helped = subprocess.run([executable, "help", "reliefgravity:readings_reduce_grid"], env=env,
                            capture_output=True, text=True, timeout=180)
    assert helped.returncode == 0, helped.stdout + helped.stderr
    assert "report:survey_report" in helped.stdout and "readings" in helped.stdout


# --- the whole chain on the demo survey ----------------------------------------


def test_observed_gravity_chain_by_id_through_processing_run(provider, tmp_path):
    import processing

    inputs = [DATA / "corvahl_stations.gpkg", DATA / "corvahl_dem.tif", DATA / "corvahl_regional.tif"]
    before = [digest(p) for p in inputs]
    result = processing.run(
        "reliefgravity:reduce_grid_contour",
        {
            "stations": str(inputs[0]), "gravity_field": "obs_grav", "height_field": "elev_m",
            "dem": str(inputs[1]), "regional_dem": str(inputs[2]), "density": 2670.0, "dem_datum": 1,
            "reduce:reduced_stations": str(tmp_path / "reduced.gpkg"), "grid:anomaly": str(tmp_path / "cba.tif"),
            "grid:contours": str(tmp_path / "contours.gpkg"), "report:survey_report": str(tmp_path / "report.html"),
        },
    )
    assert Path(result["report:survey_report"]) == tmp_path / "report.html"
    cba = reduced_cba(tmp_path / "reduced.gpkg")
    assert cba.size == 351 and np.all(np.isfinite(cba))
    check_report(tmp_path / "report.html", 351)
    assert [digest(p) for p in inputs] == before


def test_readings_chain_by_id_through_qgis_process(qgis_process_env, tmp_path):
    executable, env = qgis_process_env
    # The readings are read through a copy: nothing of demo/data may change.
    readings = tmp_path / "readings.csv"
    shutil.copyfile(DATA / "corvahl_readings.csv", readings)
    stations = DATA / "corvahl_field_stations.gpkg"
    before = digest(stations)
    out = tmp_path / "out"
    out.mkdir()
    run = subprocess.run(
        [
            executable, "run", "reliefgravity:readings_reduce_grid", "--",
            f"readings={readings}", "station_field=station", "time_field=time", "utc_offset=2",
            "reading_field=counter", "reading_units=0", f"calibration={DATA / 'corvahl_calibration.csv'}",
            "instrument_height_field=inst_h", "loop_field=loop", f"stations={stations}",
            "stations_id_field=station_id", "known_gravity_field=known_mgal", "height_field=elev_m",
            f"dem={DATA / 'corvahl_dem.tif'}", f"regional_dem={DATA / 'corvahl_regional.tif'}", "density=2670", "dem_datum=1",
            f"observed:observed_stations={out / 'observed.gpkg'}", f"observed:readings={out / 'readings.gpkg'}",
            f"reduce:reduced_stations={out / 'reduced.gpkg'}", f"grid:anomaly={out / 'cba.tif'}",
            f"grid:contours={out / 'contours.gpkg'}", f"report:survey_report={out / 'report.html'}",
        ],
        env=env, capture_output=True, text=True, timeout=300,
    )
    assert run.returncode == 0, run.stdout + run.stderr
    assert f"report:survey_report:\t{out / 'report.html'}" in run.stdout
    cba = reduced_cba(out / "reduced.gpkg")
    assert cba.size == 351 and np.all(np.isfinite(cba))
    report = check_report(out / "report.html", 351)
    assert "flagged (any code)" in report
    contours = ogr.Open(str(out / "contours.gpkg"))
    assert contours.GetLayer(0).GetFeatureCount() > 0
    assert gdal.Open(str(out / "cba.tif")).RasterXSize > 10
    assert digest(stations) == before
    assert digest(readings) == digest(DATA / "corvahl_readings.csv")


@pytest.mark.parametrize("model_id", MODEL_IDS)
def test_models_refuse_a_missing_input_with_a_sentence(provider, model_id, tmp_path):
    import processing
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match=r"(Incorrect parameter value|Could not load source layer) for [a-z_]+"):
        processing.run(model_id, {"stations": str(tmp_path / "absent.gpkg")})
