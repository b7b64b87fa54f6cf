# SPDX-License-Identifier: GPL-2.0-or-later
"""Build the shipped Graphical Modeler models and the .qml styles with QGIS's own API.

    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py            # models only
    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py --styles   # models and styles

The models (each listed by the provider as ``reliefgravity:<file stem>``, see
``plugin/shipped_models.py``):

- ``plugin/models/reduce_grid_contour.model3``: stations with observed gravity
  -> ``reliefgravity:bouguerreduction`` -> ``reliefgravity:anomalygrid`` (with
  contours) -> ``reliefgravity:surveyreport``;
- ``plugin/models/readings_reduce_grid.model3``: the same chain preceded by
  ``reliefgravity:observedgravity`` (from meter readings);
- ``plugin/models/reduce_grid_separate.model3``: reduction and grid, then
  ``reliefgravity:regionalresidual`` on the grid (sampled back onto the
  reduced stations).

The shared steps are built by ``_add_reduce``, ``_add_grid`` and
``_add_report``. The models are built in code rather than drawn in the Modeler
so that they always match the algorithms' current parameter names; run this
script again after changing them. A model file whose content would not change
is left alone (rewriting it would only reorder its XML attributes). The styles
are written by ``plugin/styling.py`` from an invented anomaly (two Gaussian
bodies on a regional gradient), so the raster style's colour stops are those
of that invented raster (see styling.py).
"""

from __future__ import annotations

import argparse
import importlib.util
import sys
import tempfile
from pathlib import Path

REPO_ROOT = Path(__file__).resolve().parent.parent
MODEL_PATH = REPO_ROOT / "plugin" / "models" / "reduce_grid_contour.model3"
SEPARATION_MODEL_PATH = REPO_ROOT / "plugin" / "models" / "reduce_grid_separate.model3"
READINGS_MODEL_PATH = REPO_ROOT / "plugin" / "models" / "readings_reduce_grid.model3"

#: Model parameter names; public like algorithm parameter names (they are the
#: qgis_process argument names of the model).
STATIONS, GRAVITY_FIELD, HEIGHT_FIELD, DEM, DENSITY = "stations", "gravity_field", "height_field", "dem", "density"
REGIONAL_DEM = "regional_dem"
HEIGHT_DATUM, DEM_DATUM = "height_datum", "dem_datum"
#: Model outputs; qgis_process names them "<child id>:<output name>".
REDUCED, ANOMALY, CONTOURS, REPORT = "reduced_stations", "anomaly", "contours", "survey_report"


def _register_checkout() -> None:
    """Import this checkout as ``relief_gravity`` whatever its folder is called."""
    if "relief_gravity" in sys.modules:
        return
    spec = importlib.util.spec_from_file_location(
        "relief_gravity", REPO_ROOT / "__init__.py", submodule_search_locations=[str(REPO_ROOT)]
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules["relief_gravity"] = module
    spec.loader.exec_module(module)


def _child(algorithm_id, child_id, description, sources, x, y):
    """A child with ``sources`` wired and every other input at the algorithm's default."""
    from qgis.core import (
        QgsApplication,
        QgsProcessingModelChildAlgorithm,
        QgsProcessingModelChildParameterSource,
    )
    from qgis.PyQt.QtCore import QPointF

    algorithm = QgsApplication.processingRegistry().algorithmById(algorithm_id)
    if algorithm is None:
        msg = f"{algorithm_id} is not registered; is the plugin loaded?"
        raise RuntimeError(msg)
    child = QgsProcessingModelChildAlgorithm(algorithm_id)
    child.setChildId(child_id)
    child.setDescription(description)
    child.setPosition(QPointF(x, y))
    for definition in algorithm.parameterDefinitions():
        name = definition.name()
        if definition.isDestination():
            continue
        if name in sources:
            child.addParameterSources(name, [sources[name]])
        elif definition.defaultValue() is not None:
            # Spelled out so the model keeps today's defaults even if an
            # algorithm's default changes later.
            child.addParameterSources(
                name, [QgsProcessingModelChildParameterSource.fromStaticValue(definition.defaultValue())]
            )
    return child


def _output(child, child_output, name, description, x, y):
    from qgis.core import QgsProcessingModelOutput
    from qgis.PyQt.QtCore import QPointF

    output = QgsProcessingModelOutput(name, description)
    output.setChildId(child.childId())
    output.setChildOutputName(child_output)
    output.setPosition(QPointF(x, y))
    outputs = dict(child.modelOutputs())
    outputs[name] = output
    child.setModelOutputs(outputs)


def _default_density() -> float:
    """The reduction's default density (kg/m³), from the checkout's constants."""
    _register_checkout()
    from relief_gravity.algorithms.constants import DEFAULT_REDUCTION_DENSITY

    return DEFAULT_REDUCTION_DENSITY


def _add_inputs(model, definitions, x, y0, dy):
    """Add model parameters (in this order, one below the other)."""
    from qgis.core import QgsProcessingModelParameter
    from qgis.PyQt.QtCore import QPointF

    for k, definition in enumerate(definitions):
        component = QgsProcessingModelParameter(definition.name())
        component.setPosition(QPointF(x, y0 + dy * k))
        model.addModelParameter(definition, component)


def _add_reduce(model, input_source, gravity_source, y, output_xy):
    """``reduce``: bouguerreduction of ``input_source`` with the model's height, DEM and density inputs."""
    from qgis.core import QgsProcessingModelChildParameterSource as Source

    reduce = _child(
        "reliefgravity:bouguerreduction", "reduce", "Bouguer reduction",
        {
            "INPUT": input_source,
            "GRAVITY_FIELD": gravity_source,
            "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD),
            "DEM": Source.fromModelParameter(DEM),
            "DENSITY": Source.fromModelParameter(DENSITY),
            "REGIONAL_DEM": Source.fromModelParameter(REGIONAL_DEM),
            "HEIGHT_DATUM": Source.fromModelParameter(HEIGHT_DATUM),
            "DEM_DATUM": Source.fromModelParameter(DEM_DATUM),
        },
        420.0, y,
    )
    _output(reduce, "OUTPUT", REDUCED, "Reduced stations", *output_xy)
    model.addChildAlgorithm(reduce)


def _add_grid(model, y):
    """``grid``: anomalygrid of the reduced stations' cba, with contours."""
    from qgis.core import QgsProcessingModelChildParameterSource as Source

    grid = _child(
        "reliefgravity:anomalygrid", "grid", "Anomaly grid and contours",
        {"INPUT": Source.fromChildOutput("reduce", "OUTPUT"), "FIELD": Source.fromStaticValue("cba")},
        420.0, y,
    )
    _output(grid, "OUTPUT", ANOMALY, "Complete Bouguer anomaly raster", 680.0, y - 20.0)
    _output(grid, "CONTOURS", CONTOURS, "Anomaly contours", 680.0, y + 60.0)
    model.addChildAlgorithm(grid)


def _add_report(model, y):
    """``report``: surveyreport of the reduced stations with the grid and its contours."""
    from qgis.core import QgsProcessingModelChildParameterSource as Source

    report = _child(
        "reliefgravity:surveyreport", "report", "Survey report",
        {
            "INPUT": Source.fromChildOutput("reduce", "OUTPUT"),
            "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD),
            "GRID": Source.fromChildOutput("grid", "OUTPUT"),
            "CONTOURS": Source.fromChildOutput("grid", "CONTOURS"),
        },
        420.0, y,
    )
    _output(report, "OUTPUT", REPORT, "Survey report (HTML)", 680.0, y)
    model.addChildAlgorithm(report)


def _datum_inputs():
    """The two height-datum inputs every model passes to the reduction."""
    from qgis.core import QgsProcessingParameterEnum

    return [
        QgsProcessingParameterEnum(
            HEIGHT_DATUM, "Station heights are",
            options=["Ellipsoidal heights (e.g. from GNSS)", "Orthometric heights above the EGM96 geoid"],
            defaultValue=0,
        ),
        QgsProcessingParameterEnum(
            DEM_DATUM, "Elevation raster heights are above",
            options=["EGM96 geoid (most global DEMs)", "Ellipsoid", "Same as the station heights"],
            defaultValue=0,
        ),
    ]


#: Help of the inputs shared by every model.
SHARED_HELP = {
    REGIONAL_DEM: (
        "Coarser elevation raster reaching 166.7 km around the stations (outer zone). Needed for the "
        "standard correction; without it the far terrain is missing and the stations are flagged tc_partial."
    ),
    HEIGHT_DATUM: "What the station heights are: ellipsoidal (GNSS, default) or orthometric above EGM96.",
    DEM_DATUM: (
        "What the DEM heights are above: the EGM96 geoid (most global DEMs, default), the ellipsoid, "
        "or the same as the stations."
    ),
}


def _help(description, **inputs):
    return {"ALG_DESC": description + " " + REGIONAL_SENTENCE + " " + INTERPRETATION_ONLY, **SHARED_HELP, **inputs}


#: The standard correction's need for a regional DEM, in every model's description.
REGIONAL_SENTENCE = (
    "The standard terrain correction reaches 166.7 km: give a regional elevation raster that reaches "
    "166.7 km around every station, and set the two datums to what your heights and DEM are (most global "
    "DEMs: EGM96 geoid; GNSS heights: ellipsoidal)."
)
#: Closing sentence of every model's description.
INTERPRETATION_ONLY = (
    "Results support interpretation only; check reductions against the survey's own ties and specifications."
)
#: What the report step adds, in the descriptions of the models that end with it.
REPORT_SENTENCE = (
    "Last, one self-contained HTML survey report (parameters, flags, map, plots, terrain correction, "
    "cautions) of the reduced stations, the grid and the contours."
)


def _stations_model(name, description):
    """Station layer with observed gravity -> reduce -> grid with contours (the base of two models)."""
    from qgis.core import (
        QgsProcessing,
        QgsProcessingModelAlgorithm,
        QgsProcessingParameterFeatureSource,
        QgsProcessingParameterField,
        QgsProcessingParameterNumber,
        QgsProcessingParameterRasterLayer,
    )
    from qgis.core import QgsProcessingModelChildParameterSource as Source

    model = QgsProcessingModelAlgorithm(name, "Relief Gravity", "reliefgravity")
    model.setHelpContent(
        _help(
            description,
            **{
                STATIONS: "Gravity stations (points, projected CRS in metres).",
                GRAVITY_FIELD: "Observed gravity (mGal).",
                HEIGHT_FIELD: "Station height above the ellipsoid (m); empty = sample the DEM.",
                DEM: "Elevation raster (m) for the terrain correction.",
                DENSITY: "Reduction density (kg/m³), default 2670.",
            },
        )
    )
    _add_inputs(model, [
        QgsProcessingParameterFeatureSource(STATIONS, "Gravity stations", [QgsProcessing.TypeVectorPoint]),
        QgsProcessingParameterField(
            GRAVITY_FIELD, "Observed gravity field (mGal)", parentLayerParameterName=STATIONS,
            type=QgsProcessingParameterField.Numeric,
        ),
        QgsProcessingParameterField(
            HEIGHT_FIELD, "Station height field (m; empty = sample the DEM)", parentLayerParameterName=STATIONS,
            type=QgsProcessingParameterField.Numeric, optional=True,
        ),
        QgsProcessingParameterRasterLayer(DEM, "Elevation raster (DEM, metres)"),
        QgsProcessingParameterNumber(
            DENSITY, "Reduction density (kg/m³)", type=QgsProcessingParameterNumber.Double,
            defaultValue=_default_density(), optional=True,
        ),
        QgsProcessingParameterRasterLayer(
            REGIONAL_DEM, "Regional elevation raster for the outer zone", optional=True
        ),
        *_datum_inputs(),
    ], 120.0, 60.0, 70.0)
    _add_reduce(model, Source.fromModelParameter(STATIONS), Source.fromModelParameter(GRAVITY_FIELD),
                200.0, (640.0, 120.0))
    _add_grid(model, 380.0)
    return model


def build_model():
    """Stations with observed gravity -> reduce -> grid -> contours -> survey report."""
    model = _stations_model(
        "Reduce, grid, contour and report gravity stations",
        "Bouguer reduction of a station layer with terrain corrections from a DEM, then a minimum-curvature "
        "grid of the complete Bouguer anomaly (cba, mGal) with contours. " + REPORT_SENTENCE,
    )
    _add_report(model, 560.0)
    model.updateDestinationParameters()
    return model


#: Extra parameters and outputs of the reduce -> grid -> regional-residual model.
SEPARATION_METHOD, CONTINUATION_HEIGHT = "separation_method", "continuation_height"
REGIONAL, RESIDUAL = "regional", "residual"


def build_separation_model():
    """Stations with observed gravity -> reduce -> grid -> regional-residual."""
    from qgis.core import QgsProcessingModelChildParameterSource as Source
    from qgis.core import (
        QgsProcessingParameterEnum,
        QgsProcessingParameterNumber,
    )

    model = _stations_model(
        "Reduce, grid and separate regional and residual",
        "Bouguer reduction of a station layer with terrain corrections from a DEM, a minimum-curvature "
        "grid of the complete Bouguer anomaly (cba, mGal) with contours, then its regional (trend "
        "surface or upward continuation) and residual rasters, sampled back onto the reduced stations.",
    )
    help_content = dict(model.helpContent())
    help_content[SEPARATION_METHOD] = "Regional from a planar trend surface (default) or upward continuation."
    help_content[CONTINUATION_HEIGHT] = "Continuation height (m) for the upward-continuation regional."
    model.setHelpContent(help_content)
    _add_inputs(model, [
        QgsProcessingParameterEnum(
            SEPARATION_METHOD, "Regional from", options=["Polynomial trend surface", "Upward continuation (FFT)"],
            defaultValue=0,
        ),
        QgsProcessingParameterNumber(
            CONTINUATION_HEIGHT, "Continuation height (m)", type=QgsProcessingParameterNumber.Double,
            defaultValue=2000.0, minValue=0.0,
        ),
    ], 120.0, 620.0, 70.0)
    separate = _child(
        "reliefgravity:regionalresidual", "separate", "Regional and residual anomaly",
        {
            "INPUT": Source.fromChildOutput("grid", "OUTPUT"),
            "METHOD": Source.fromModelParameter(SEPARATION_METHOD),
            "HEIGHT": Source.fromModelParameter(CONTINUATION_HEIGHT),
            "STATIONS": Source.fromChildOutput("reduce", "OUTPUT"),
        },
        420.0, 560.0,
    )
    _output(separate, "REGIONAL", REGIONAL, "Regional anomaly raster", 680.0, 540.0)
    _output(separate, "RESIDUAL", RESIDUAL, "Residual anomaly raster", 680.0, 600.0)
    _output(separate, "STATIONS_OUTPUT", "stations_separated", "Stations with regional and residual", 680.0, 660.0)
    model.addChildAlgorithm(separate)
    model.updateDestinationParameters()
    return model


#: Inputs of the readings model wired to observedgravity's parameter of the same name in upper case.
READINGS_INPUTS = ("readings", "station_field", "time_field", "utc_offset", "reading_field", "reading_units",
                   "calibration", "instrument_height_field", "loop_field", "stations_id_field", "known_gravity_field")


def build_readings_model():
    """Meter readings -> observed gravity -> reduce -> grid -> contours -> survey report."""
    from qgis.core import (
        QgsProcessing,
        QgsProcessingModelAlgorithm,
        QgsProcessingParameterEnum,
        QgsProcessingParameterFeatureSource,
        QgsProcessingParameterField,
        QgsProcessingParameterNumber,
        QgsProcessingParameterRasterLayer,
    )
    from qgis.core import QgsProcessingModelChildParameterSource as Source

    model = QgsProcessingModelAlgorithm(
        "Readings to observed gravity, reduce, grid, contour and report", "Relief Gravity", "reliefgravity"
    )
    model.setHelpContent(_help(
        "Gravimeter readings to observed gravity (Longman tide, calibration, instrument height, "
        "least-squares drift and base ties), then the Bouguer reduction with terrain corrections "
        "from a DEM and a minimum-curvature grid of the complete Bouguer anomaly with contours. " + REPORT_SENTENCE
    ))
    field = QgsProcessingParameterField
    _add_inputs(model, [
        QgsProcessingParameterFeatureSource("readings", "Meter readings (table)", [QgsProcessing.TypeVector]),
        field("station_field", "Station id field of the readings", parentLayerParameterName="readings"),
        field("time_field", "Time field (ISO 8601 text or date-time)", parentLayerParameterName="readings"),
        QgsProcessingParameterNumber("utc_offset", "UTC offset of times without one (hours)",
                                     type=QgsProcessingParameterNumber.Double, defaultValue=0.0),
        field("reading_field", "Reading field", parentLayerParameterName="readings"),
        QgsProcessingParameterEnum("reading_units", "Reading units", options=["Counter units", "mGal"], defaultValue=0),
        QgsProcessingParameterFeatureSource("calibration", "Calibration table (counter, mgal, factor)",
                                            [QgsProcessing.TypeVector], optional=True),
        field("instrument_height_field", "Instrument height field (m)", parentLayerParameterName="readings",
              optional=True),
        field("loop_field", "Loop field (empty: one loop per local day)", parentLayerParameterName="readings",
              optional=True),
        QgsProcessingParameterFeatureSource(STATIONS, "Gravity stations", [QgsProcessing.TypeVectorPoint]),
        field("stations_id_field", "Station id field", parentLayerParameterName=STATIONS),
        field("known_gravity_field", "Known gravity field (mGal)", parentLayerParameterName=STATIONS),
        field(HEIGHT_FIELD, "Station height field (m above the ellipsoid)", parentLayerParameterName=STATIONS,
              type=QgsProcessingParameterField.Numeric),
        QgsProcessingParameterRasterLayer(DEM, "Elevation raster (DEM, metres)"),
        QgsProcessingParameterRasterLayer(REGIONAL_DEM, "Regional elevation raster for the outer zone", optional=True),
        QgsProcessingParameterNumber(DENSITY, "Reduction density (kg/m³)", type=QgsProcessingParameterNumber.Double,
                                     defaultValue=_default_density(), optional=True),
        *_datum_inputs(),
    ], 120.0, 40.0, 55.0)

    wired = {key.upper(): Source.fromModelParameter(key) for key in READINGS_INPUTS}
    wired.update(
        {"STATIONS": Source.fromModelParameter(STATIONS), "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD)}
    )
    observed = _child(
        "reliefgravity:observedgravity", "observed", "Observed gravity from readings", wired, 420.0, 120.0
    )
    _output(observed, "OUTPUT", "observed_stations", "Stations with observed gravity", 680.0, 80.0)
    _output(observed, "READINGS_OUTPUT", "readings", "Reduced readings", 680.0, 140.0)
    model.addChildAlgorithm(observed)
    _add_reduce(model, Source.fromChildOutput("observed", "OUTPUT"), Source.fromStaticValue("g_obs"),
                320.0, (680.0, 300.0))
    _add_grid(model, 500.0)
    _add_report(model, 680.0)
    model.updateDestinationParameters()
    return model


def _same_model(model, path: Path) -> bool:
    """Whether ``path`` already holds a model with the same content as ``model`` (both read from files)."""
    from qgis.core import QgsProcessingModelAlgorithm

    if not path.exists():
        return False
    with tempfile.TemporaryDirectory() as folder:
        fresh_path = str(Path(folder) / path.name)
        fresh, existing = QgsProcessingModelAlgorithm(), QgsProcessingModelAlgorithm()
        if not (model.toFile(fresh_path) and fresh.fromFile(fresh_path) and existing.fromFile(str(path))):
            return False
        return fresh.toVariant() == existing.toVariant()


def build_styles(folder: Path) -> tuple[Path, Path]:
    """Write the .qml styles from an invented anomaly gridded by the plugin itself."""
    import numpy as np
    import processing
    from osgeo import ogr, osr
    from qgis.core import QgsRasterLayer, QgsVectorLayer

    from relief_gravity.plugin.styling import write_style_files

    rng = np.random.default_rng(2024)
    x = 500_000.0 + rng.uniform(0, 8000, 150)
    y = 5_000_000.0 + rng.uniform(0, 6000, 150)

    def body(x0, y0, width, amplitude):
        return amplitude * np.exp(-((x - x0) ** 2 + (y - y0) ** 2) / (2 * width**2))

    cba = body(503_000, 5_003_500, 1200, -18.0) + body(506_000, 5_002_000, 900, 9.0) + 0.0008 * (x - 500_000) - 5
    work = Path(tempfile.mkdtemp(prefix="relief_gravity_styles_"))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(work / "stations.gpkg"))
    layer = ds.CreateLayer("stations", srs, ogr.wkbPoint)
    layer.CreateField(ogr.FieldDefn("cba", ogr.OFTReal))
    for xi, yi, vi in zip(x, y, cba, strict=True):
        feature = ogr.Feature(layer.GetLayerDefn())
        point = ogr.Geometry(ogr.wkbPoint)
        point.AddPoint_2D(float(xi), float(yi))
        feature.SetGeometry(point)
        feature.SetField("cba", float(vi))
        layer.CreateFeature(feature)
    ds = None
    processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": str(work / "stations.gpkg"), "FIELD": "cba", "OUTPUT": str(work / "cba.tif"),
         "CONTOURS": str(work / "contours.gpkg"), "CONTOUR_INTERVAL": 2.0},
    )
    raster = QgsRasterLayer(str(work / "cba.tif"), "cba")
    contours = QgsVectorLayer(str(work / "contours.gpkg"), "contours", "ogr")
    return write_style_files(raster, contours, folder)


def main(argv=None) -> int:
    """Build the shipped models (and, with ``--styles``, the styles and layouts); write only what changed.

    Parameters
    ----------
    argv : list of str, optional
        Command-line arguments without the program name (default: ``sys.argv[1:]``).

    Returns
    -------
    int
        Exit status, 0 on success.
    """
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--output", type=Path, default=MODEL_PATH, help="model file to write")
    parser.add_argument("--styles", action="store_true", help="also write plugin/styles/*.qml and plugin/layouts/*.qpt")
    args = parser.parse_args(argv)

    from qgis.core import QgsApplication

    app = QgsApplication([], False)
    app.initQgis()
    sys.path.append(QgsApplication.pkgDataPath() + "/python/plugins")
    from processing.core.Processing import Processing

    Processing.initialize()
    _register_checkout()
    import relief_gravity

    plugin = relief_gravity.classFactory(None)
    plugin.initProcessing()
    try:
        for model, target in ((build_model(), args.output), (build_separation_model(), SEPARATION_MODEL_PATH),
                              (build_readings_model(), READINGS_MODEL_PATH)):
            ok, problems = model.validate()
            if not ok:
                print("model does not validate:", *problems, sep="\n  ", file=sys.stderr)
                return 1
            if _same_model(model, target):
                # Rewriting would only reorder XML attributes (Qt hash order): keep the file.
                print(f"unchanged {target}")
                continue
            target.parent.mkdir(parents=True, exist_ok=True)
            if not model.toFile(str(target)):
                print(f"could not write {target}", file=sys.stderr)
                return 1
            print(f"wrote {target}")
        if args.styles:
            for path in build_styles(REPO_ROOT / "plugin" / "styles"):
                print(f"wrote {path}")
            from relief_gravity.plugin.map_layout import write_layout_template

            template = REPO_ROOT / "plugin" / "layouts" / "anomaly_map.qpt"
            template.parent.mkdir(parents=True, exist_ok=True)
            if not write_layout_template(template):
                print(f"could not write {template}", file=sys.stderr)
                return 1
            print(f"wrote {template}")
    finally:
        plugin.unload()
        app.exitQgis()
    return 0


if __name__ == "__main__":
    sys.exit(main())
