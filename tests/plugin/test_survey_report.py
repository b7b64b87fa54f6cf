# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:surveyreport: the demo survey reduced, gridded and reported, opened in headless Chromium.

The demo survey is invented (demo/data/corvahl_*). The browser is Debian's
chromium package; its checks are the browser's own: images decoded
(naturalWidth), no error events, a screenshot that is not blank.
"""

from __future__ import annotations

import hashlib
import json
import re
import shutil
import subprocess
from pathlib import Path

import numpy as np
import pytest

DEMO = Path(__file__).resolve().parents[2] / "demo" / "data"
CHROMIUM = shutil.which("chromium")


@pytest.fixture(scope="module")
def demo_report(provider, tmp_path_factory):
    import processing

    folder = tmp_path_factory.mktemp("report")
    reduced = folder / "reduced.gpkg"
    processing.run(
        "reliefgravity:bouguerreduction",
        {"INPUT": str(DEMO / "corvahl_stations.gpkg"), "GRAVITY_FIELD": "obs_grav", "HEIGHT_FIELD": "elev_m",
         "DEM": str(DEMO / "corvahl_dem.tif"), "REGIONAL_DEM": str(DEMO / "corvahl_regional.tif"),
         "OUTPUT": str(reduced)},
    )
    processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": str(reduced), "FIELD": "cba", "OUTPUT": str(folder / "cba.tif"),
         "CONTOURS": str(folder / "contours.gpkg")},
    )
    report = folder / "report.html"
    result = processing.run(
        "reliefgravity:surveyreport",
        {"INPUT": str(reduced), "HEIGHT_FIELD": "elev_m", "GRID": str(folder / "cba.tif"),
         "CONTOURS": str(folder / "contours.gpkg"), "OUTPUT": str(report)},
    )
    assert result["OUTPUT"] == str(report)
    return report


def _chromium(args, tmp_path):
    command = [CHROMIUM, "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
               "--disable-component-update", "--disable-sync", "--no-first-run",
               f"--user-data-dir={tmp_path / 'profile'}", *args]
    return subprocess.run(command, capture_output=True, text=True, timeout=120)


#: Injected for the test only: records error events, CSP violations and each image's decoded width into the DOM.
PROBE = """<script>
window.rgErrors = [];
window.addEventListener('error', function (e) { rgErrors.push(String(e.message || (e.target && e.target.src) || 'error')); }, true);
document.addEventListener('securitypolicyviolation', function (e) { rgErrors.push('csp ' + e.blockedURI); });
window.addEventListener('load', function () {
  var widths = Array.prototype.map.call(document.images, function (img) { return img.complete ? img.naturalWidth : -1; });
  var out = document.createElement('pre'); out.id = 'rg-result';
  out.textContent = JSON.stringify({widths: widths, errors: rgErrors});
  document.body.appendChild(out);
});
</script>"""


def test_report_is_self_contained(demo_report):
    text = demo_report.read_text(encoding="utf-8")
    references = re.findall(r'(?:src|href)\s*=\s*"([^"]*)"', text)
    assert references and all(ref.startswith("data:image/png;base64,") for ref in references)
    assert "<script" not in text and "@import" not in text and "url(" not in text
    assert "default-src 'none'" in text  # the browser itself refuses anything external
    for heading in ("What was run", "Stations", "Anomaly map", "Anomaly distributions", "Anomalies against height",
                    "Terrain correction by zone", "Uncertainty", "Flagged stations", "Cautions"):
        assert f"<h2>{heading}" in text, heading
    assert "licensed practice" in text and "drilling" in text
    # The reduction writes tc_sigma, cba_sigma and their components: the report shows them.
    assert "no uncertainty fields" not in text
    for name in ("cba_sigma", "sigma_dem", "sigma_h"):
        assert name in text, name


@pytest.mark.skipif(CHROMIUM is None, reason="Debian's chromium is not installed (tools/setup.sh installs it)")
def test_report_opens_in_headless_chromium(demo_report, tmp_path):
    text = demo_report.read_text(encoding="utf-8")
    # Allow only the probe's inline script on top of the report's own policy.
    probed = text.replace("default-src 'none';", "default-src 'none'; script-src 'unsafe-inline';", 1)
    probed = probed.replace("<head>", "<head>" + PROBE, 1)
    page = tmp_path / "probed.html"
    page.write_text(probed, encoding="utf-8")
    run = _chromium(["--enable-logging=stderr", "--v=0", "--virtual-time-budget=10000", "--dump-dom",
                     page.as_uri()], tmp_path)
    assert run.returncode == 0, run.stderr[-2000:]
    match = re.search(r'<pre id="rg-result">(.*?)</pre>', run.stdout, re.S)
    assert match, run.stdout[-2000:]
    result = json.loads(match.group(1).replace("&quot;", '"'))
    assert result["errors"] == []
    n_images = text.count("<img ")
    assert len(result["widths"]) == n_images >= 4  # map, histograms, height plot, terrain by zone
    assert all(width > 0 for width in result["widths"]), result["widths"]
    console = [line for line in run.stderr.splitlines() if "CONSOLE" in line]
    assert console == [], console

    # The report as shipped (no probe): a screenshot that is not blank.
    shot = tmp_path / "report.png"
    run = _chromium(["--hide-scrollbars", "--window-size=1200,2400", f"--screenshot={shot}", demo_report.as_uri()],
                    tmp_path)
    assert run.returncode == 0 and shot.exists(), run.stderr[-2000:]
    from qgis.PyQt.QtGui import QImage

    image = QImage(str(shot)).convertToFormat(QImage.Format_RGB32)
    raw = np.frombuffer(image.constBits().asstring(image.sizeInBytes()), dtype=np.uint32)
    raw = raw.reshape(image.height(), image.bytesPerLine() // 4)[:, : image.width()] & 0xFFFFFF
    colours, counts = np.unique(raw, return_counts=True)
    assert image.width() == 1200
    assert colours.size > 500  # text, tables and the embedded map
    assert counts.max() < 0.9 * raw.size  # not a white page


def _sha(path):
    return hashlib.sha256(Path(path).read_bytes()).hexdigest()


def test_uncertainty_flags_and_no_grid(provider, points_writer, tmp_path):
    import processing

    rng = np.random.default_rng(3)
    n = 40
    x, y = 400_000 + rng.uniform(0, 3000, n), 5_100_000 + rng.uniform(0, 3000, n)
    height = rng.uniform(100, 600, n)
    faa = 0.1 * height + rng.normal(0, 1, n)
    cba = faa - 0.1119 * height
    flags = [""] * n
    flags[3] = "tc_partial"
    flags[7] = "no_height;some_future_code"
    cba[7] = np.nan
    columns = {"station_id": [f"T{i:02d}" for i in range(n)], "h": list(height), "faa": list(faa), "cba": list(cba),
               "cba_sigma": list(rng.uniform(0.05, 0.3, n)), "tc_sigma": list(rng.uniform(0.02, 0.2, n)),
               "sigma_height": list(rng.uniform(0.01, 0.1, n)), "qc_flag": flags}
    layer = points_writer(tmp_path / "in.gpkg", x, y, columns, epsg=32633)
    before = _sha(tmp_path / "in.gpkg")
    out = tmp_path / "r.html"
    processing.run("reliefgravity:surveyreport", {"INPUT": layer, "HEIGHT_FIELD": "h", "OUTPUT": str(out)})
    assert _sha(tmp_path / "in.gpkg") == before
    text = out.read_text(encoding="utf-8")
    assert "no uncertainty fields" not in text
    for name in ("cba_sigma", "tc_sigma", "sigma_height"):
        assert f"<td>{name}</td>" in text, name
    assert "Map of cba_sigma" in text
    # Codes with the vocabulary's meaning and severity; an unknown code shown as written.
    assert "The elevation rasters do not cover the whole correction area" in text
    assert "No station height: no anomaly computed." in text
    assert "some_future_code" in text and "Not a code of this version" in text
    assert "<td>T07</td>" in text and "<td>T03</td>" in text and "<td>T04</td>" not in text
    assert "No anomaly grid was given" in text
    assert "reduction density" in text and "not recorded" in text


def test_refuses_a_layer_that_was_not_reduced(provider, points_writer, tmp_path):
    import processing
    from qgis.core import QgsProcessingException

    layer = points_writer(tmp_path / "raw.gpkg", [1.0, 2.0], [1.0, 2.0], {"obs_grav": [980000.0, 980001.0]})
    before = _sha(tmp_path / "raw.gpkg")
    out = tmp_path / "r.html"
    with pytest.raises(QgsProcessingException, match="faa, sba or cba"):
        processing.run("reliefgravity:surveyreport", {"INPUT": layer, "OUTPUT": str(out)})
    assert not out.exists()
    assert _sha(tmp_path / "raw.gpkg") == before


def test_cancel_leaves_no_file(provider, points_writer, tmp_path):
    import processing
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    layer = points_writer(tmp_path / "s.gpkg", [1.0, 2.0, 3.0], [1.0, 2.0, 3.0], {"cba": [1.0, 2.0, 3.0]})
    out = tmp_path / "r.html"
    out.write_text("previous report", encoding="utf-8")
    feedback = QgsProcessingFeedback()
    feedback.cancel()
    with pytest.raises(QgsProcessingException, match="Cancelled"):
        processing.run("reliefgravity:surveyreport", {"INPUT": layer, "OUTPUT": str(out)}, feedback=feedback)
    assert out.read_text(encoding="utf-8") == "previous report"
    assert [p.name for p in tmp_path.iterdir() if ".part-" in p.name] == []


def test_report_follows_the_users_language(qgis_processing):
    """With the German translation installed the page, its plots' labels and the flag meanings are German."""
    import numpy as np
    from qgis.PyQt.QtCore import QCoreApplication, QTranslator

    from relief_gravity.plugin.report.content import SurveyData, build_report

    data = SurveyData(
        layer_name="stations", station_ids=["S1", "S2", "S3", "S4"], x=np.array([0.0, 100.0, 200.0, 300.0]),
        y=np.array([0.0, 50.0, 0.0, 50.0]),
        fields={"faa": np.array([10.0, 12.0, 14.0, 16.0]), "cba": np.array([-1.0, -1.1, -0.9, -1.0]),
                "height": np.array([100.0, 110.0, 120.0, 130.0])},
        flags=["", "tc_partial", "", ""],
    )
    english = build_report(data)
    assert '<html lang="en">' in english and "What was run" in english
    translator = QTranslator()
    assert translator.load(str(Path(__file__).resolve().parents[2] / "i18n" / "relief_gravity_de.qm"))
    QCoreApplication.installTranslator(translator)
    try:
        german = build_report(data)
    finally:
        QCoreApplication.removeTranslator(translator)
    assert '<html lang="de">' in german
    for text in ("Was berechnet wurde", "Gekennzeichnete Stationen", "Vorsichtshinweise", "Vermessungsbericht: stations"):
        assert text in german, text
    assert "What was run" not in german
    # The flag's meaning comes from the translated flag vocabulary (plugin/flags.py).
    from relief_gravity.algorithms import qc

    assert qc.VOCABULARY["tc_partial"].meaning in english
    assert qc.VOCABULARY["tc_partial"].meaning not in german
