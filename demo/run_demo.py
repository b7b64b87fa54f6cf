# SPDX-License-Identifier: GPL-2.0-or-later
"""Run the whole job on the bundled, invented demo survey.

Meter readings -> observed gravity (Longman tide, calibration table,
instrument heights, least-squares drift and ties) -> reduction (normal
gravity, height, atmosphere, spherical cap, terrain to 166.7 km from the fine
and regional DEMs) -> anomaly grid with contours ->
a rendered map, all through the plugin's Processing algorithms exactly as a
user would run them. Prints a short summary and writes everything to the
output folder (default ``demo_output/`` in the checkout).

Usage: ``python demo/run_demo.py [output_folder]`` with a Python that imports
QGIS (``tools/demo.sh`` does the set-up and runs this).
"""

from __future__ import annotations

import gc
import importlib.util
import os
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
DATA = ROOT / "demo" / "data"


def register_checkout() -> None:
    """Import this checkout as the package ``relief_gravity`` (any folder name)."""
    if "relief_gravity" in sys.modules:
        return
    spec = importlib.util.spec_from_file_location(
        "relief_gravity", ROOT / "__init__.py", submodule_search_locations=[str(ROOT)]
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules["relief_gravity"] = module
    spec.loader.exec_module(module)


def start_qgis():
    """Start a headless QGIS application with Processing initialised.

    Returns
    -------
    qgis.core.QgsApplication
        The running application (keep it referenced until the end).
    """
    os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
    from qgis.core import QgsApplication

    app = QgsApplication([], False)
    app.initQgis()
    sys.path.append(os.path.join(QgsApplication.pkgDataPath(), "python", "plugins"))
    from processing.core.Processing import Processing

    Processing.initialize()
    return app


def demo_files() -> dict:
    """Paths of the demo's inputs; exit with a sentence when one is missing.

    Returns
    -------
    dict
        ``dem``, ``regional``, ``stations``, ``readings``, ``calibration`` and ``geology`` paths.
    """
    def one(pattern):
        found = sorted(DATA.glob(pattern))
        if not found:
            sys.exit(f"demo data {pattern} missing in {DATA}; regenerate with demo/make_scenario.py")
        return found[0]

    return {
        "dem": one("*_dem.tif"),
        "regional": one("*_regional.tif"),
        "stations": one("*_field_stations.gpkg"),
        "readings": one("*_readings.csv"),
        "calibration": one("*_calibration.csv"),
        "geology": one("*_geology.gpkg"),
    }


def attribute_array(layer, name):
    """Values of a numeric field of a vector layer as floats, NaN for NULL.

    Parameters
    ----------
    layer : qgis.core.QgsVectorLayer
        The layer.
    name : str
        Field name.

    Returns
    -------
    numpy.ndarray
        One value per feature, in the layer's order.
    """
    import numpy as np
    from qgis.core import NULL

    values = []
    for feature in layer.getFeatures():
        value = feature[name]
        values.append(np.nan if value is None or value == NULL else float(value))
    return np.array(values)


def loop_misclosures(path):
    """Per loop: last minus first tide-corrected reading of the base that opens it (mGal)."""
    from qgis.core import NULL, QgsVectorLayer

    from relief_gravity.algorithms.survey import loop_closures, parse_time

    rows = [(f["loop"], f["station"], parse_time(f["t_utc"]).utc_hours, f["read_mgal"] + f["ih_corr"] + f["tide_corr"])
            for f in QgsVectorLayer(str(path), "readings", "ogr").getFeatures() if f["g_read"] not in (None, NULL)]
    loops, ids = sorted({r[0] for r in rows}), sorted({r[1] for r in rows})
    closure = loop_closures(
        *([ids.index(r[1]) for r in rows], [loops.index(r[0]) for r in rows]),
        [r[2] for r in rows],
        [r[3] for r in rows],
    )
    return dict(zip(loops, closure.misclosure, strict=True))


def main(argv: list[str]) -> int:
    """Run the whole chain on the invented survey, write its outputs and print a summary.

    Parameters
    ----------
    argv : list of str
        ``sys.argv``; ``argv[1]``, when given, is the output folder (default ``demo_output``).

    Returns
    -------
    int
        Exit status, 0 on success.
    """
    output = Path(argv[1]).resolve() if len(argv) > 1 else ROOT / "demo_output"
    output.mkdir(parents=True, exist_ok=True)
    register_checkout()
    app = start_qgis()
    import numpy as np
    import processing
    from qgis.core import QgsProcessingFeedback, QgsVectorLayer

    import relief_gravity

    plugin = relief_gravity.classFactory(None)
    plugin.initProcessing()
    files = demo_files()
    feedback = QgsProcessingFeedback()
    started = time.perf_counter()

    observed_path, readings_path = output / "observed_stations.gpkg", output / "reduced_readings.gpkg"
    observed = processing.run(
        "reliefgravity:observedgravity",
        {"READINGS": str(files["readings"]), "STATION_FIELD": "station", "TIME_FIELD": "time", "UTC_OFFSET": 2.0,
         "READING_FIELD": "counter", "READING_UNITS": 0, "CALIBRATION": str(files["calibration"]),
         "INSTRUMENT_HEIGHT_FIELD": "inst_h", "LOOP_FIELD": "loop", "STATIONS": str(files["stations"]),
         "STATIONS_ID_FIELD": "station_id", "HEIGHT_FIELD": "elev_m", "KNOWN_GRAVITY_FIELD": "known_mgal",
         "OUTPUT": str(observed_path), "READINGS_OUTPUT": str(readings_path)},
        feedback=feedback,
    )
    reduced_path = output / "reduced_stations.gpkg"
    reduction = processing.run(
        "reliefgravity:bouguerreduction",
        {
            "INPUT": str(observed_path),
            "GRAVITY_FIELD": "g_obs",
            "HEIGHT_FIELD": "elev_m",
            "DEM": str(files["dem"]),
            "REGIONAL_DEM": str(files["regional"]),
            # Corvahl's invented world has sea level on the ellipsoid: station
            # heights and both DEMs are heights above the ellipsoid (demo/README.md).
            "HEIGHT_DATUM": 0,
            "DEM_DATUM": 1,
            "DENSITY": 2670.0,
            # The engine's own error, against a refined evaluation (tc_numerr).
            "ENGINE_CHECK": True,
            "OUTPUT": str(reduced_path),
        },
        feedback=feedback,
    )
    reduced_seconds = time.perf_counter() - started
    grid_path = output / "cba_grid.tif"
    contour_path = output / "cba_contours.gpkg"
    processing.run(
        "reliefgravity:anomalygrid",
        {
            "INPUT": str(reduced_path),
            "FIELD": "cba",
            "OUTPUT": str(grid_path),
            "CONTOURS": str(contour_path),
        },
        feedback=feedback,
    )
    from relief_gravity.plugin.render import render_anomaly_map

    png_path = output / "cba_map.png"
    render_anomaly_map(
        str(grid_path),
        str(png_path),
        contours=str(contour_path),
        stations=str(reduced_path),
        title="Complete Bouguer anomaly (invented demo survey)",
    )

    # Density from the data (Parasnis, planar regional): over every station,
    # then as a processor would, leaving out the stations on the mapped
    # basin-floor alluvium (its fill is not the rock being estimated).
    density_inputs = {
        "INPUT": str(files["stations"]), "GRAVITY_FIELD": "obs_grav", "HEIGHT_FIELD": "elev_m",
        "DEM": str(files["dem"]), "REGIONAL_DEM": str(files["regional"]), "DEM_DATUM": 1,
    }
    density_all = processing.run("reliefgravity:densityestimate", {**density_inputs, "PLOT": None}, feedback=feedback)
    alluvium = f"{files['geology']}|layername=geology|subset=\"unit\" = 'alluvium'"
    density = processing.run("reliefgravity:densityestimate", {
        **density_inputs, "EXCLUDE_AREAS": alluvium, "PLOT": str(output / "density_fit.png")}, feedback=feedback)
    residual_path = output / "cba_residual.tif"
    processing.run("reliefgravity:regionalresidual", {"INPUT": str(grid_path), "METHOD": 0, "ORDER": 1, "ROBUST": 2,
                   "REGIONAL": str(output / "cba_regional.tif"), "RESIDUAL": str(residual_path)}, feedback=feedback)
    render_anomaly_map(str(residual_path), str(output / "cba_residual_map.png"), stations=str(reduced_path),
                       title="Residual of the complete Bouguer anomaly (robust planar regional)",
                       outlines=alluvium, outlines_label="Mapped alluvium")

    layer = QgsVectorLayer(str(reduced_path), "reduced", "ogr")
    cba = attribute_array(layer, "cba")
    faa = attribute_array(layer, "faa")
    tc = attribute_array(layer, "tc_total")
    body = attribute_array(layer, "body_mgal")
    height = attribute_array(layer, "elev_m")
    g_error = attribute_array(layer, "g_obs") - attribute_array(layer, "obs_grav")
    misclosures = loop_misclosures(readings_path)
    ok = np.isfinite(cba) & np.isfinite(body)
    residual = cba[ok] - body[ok]
    residual_centred = residual - residual.mean()
    print("Relief Gravity demo (invented survey, not real data)")
    print(f"  readings -> observed gravity: {observed['LOOPS']} loops; misclosure on the opening base (mGal): "
          + ", ".join(f"{k} {v:+.3f}" for k, v in misclosures.items() if np.isfinite(v))
          + f"; largest {observed['MAX_MISCLOSURE']:.3f}")
    print(f"  g_obs - true gravity (mGal) : rms {np.sqrt(np.nanmean(g_error**2)):.4f}, "
          f"max {np.nanmax(np.abs(g_error)):.4f}"
          f" over {int(np.isfinite(g_error).sum())} stations")
    print(f"  stations reduced            : {reduction['STATIONS_REDUCED']} of {layer.featureCount()}"
          f" ({reduction['STATIONS_FLAGGED']} flagged) in {reduced_seconds:.1f} s")
    print(f"  terrain correction (mGal)   : {np.nanmin(tc):.2f} to {np.nanmax(tc):.2f}")
    print(f"  free-air anomaly (mGal)     : {np.nanmin(faa):.2f} to {np.nanmax(faa):.2f};"
          f" correlation with height {np.corrcoef(faa[ok], height[ok])[0, 1]:.3f}")
    print(f"  complete Bouguer (mGal)     : {np.nanmin(cba):.2f} to {np.nanmax(cba):.2f};"
          f" correlation with the buried bodies {np.corrcoef(cba[ok], body[ok])[0, 1]:.4f}")
    print(f"  cba - true body anomaly     : mean {residual.mean():+.3f}, rms about the mean"
          f" {np.sqrt(np.mean(residual_centred**2)):.3f}, max {np.abs(residual_centred).max():.3f} mGal")
    print(f"  density, every station      : {density_all['DENSITY']:.0f} kg/m3 (95 % {density_all['DENSITY_LOW']:.0f}"
          f" to {density_all['DENSITY_HIGH']:.0f}; Parasnis, planar regional): biased high, the light basin"
          " fill lies under the valley floor")
    print(f"  density, off the alluvium   : {density['DENSITY']:.0f} kg/m3 (95 % {density['DENSITY_LOW']:.0f}"
          f" to {density['DENSITY_HIGH']:.0f}; {density['STATIONS_USED']} stations on mapped bedrock);"
          f" the demo was built with 2670 ({(density['DENSITY'] / 2670.0 - 1.0) * 100:+.1f} %, the buried"
          " intrusion under the range is not mapped)")
    cba_sigma = attribute_array(layer, "cba_sigma")
    numerr = attribute_array(layer, "tc_numerr")
    print(f"  uncertainty of cba (mGal)   : median {np.nanmedian(cba_sigma):.3f}, largest {np.nanmax(cba_sigma):.3f}"
          f" (1 sigma; the engine's own error at most {np.nanmax(numerr):.1e})")
    print(f"  outputs in {output}:")
    for path in (observed_path, readings_path, reduced_path, grid_path, contour_path, png_path,
                 output / "density_fit.png", output / "cba_residual_map.png"):
        print(f"    {path.name}")
    print(f"  survey report               : {write_report(output, reduced_path, grid_path, contour_path)}")
    print(f"  map to hand over            : {png_path}")
    print("  Results support interpretation only; check reductions against the survey's own ties")
    print("  and specifications, and defer to licensed practice and local codes for decisions.")
    # Drop every QGIS object before QGIS shuts down: a layer still referenced
    # from Python when exitQgis() runs makes the interpreter crash on exit.
    del layer, reduction, observed
    gc.collect()
    plugin.unload()
    app.exitQgis()
    return 0


def write_report(output, reduced_path, grid_path, contour_path) -> Path:
    """The survey report (one HTML file) beside the other outputs."""
    import processing

    report = output / "survey_report.html"
    processing.run("reliefgravity:surveyreport", {"INPUT": str(reduced_path), "HEIGHT_FIELD": "elev_m",
                   "GRID": str(grid_path), "CONTOURS": str(contour_path), "OUTPUT": str(report)})
    return report


if __name__ == "__main__":
    sys.exit(main(sys.argv))
