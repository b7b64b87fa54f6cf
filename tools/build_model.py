# SPDX-License-Identifier: GPL-2.0-or-later
"""Build the shipped Graphical Modeler model and the .qml styles with QGIS's own API.

    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py            # model only
    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py --styles   # model and styles

The models: ``plugin/models/readings_reduce_grid.model3`` starts from meter
readings (``reliefgravity:observedgravity`` first, then as below);
``plugin/models/reduce_grid_contour.model3`` chains
``reliefgravity:bouguerreduction`` -> ``reliefgravity:anomalygrid`` (with
contours); ``plugin/models/reduce_grid_separate.model3`` adds
``reliefgravity:regionalresidual`` on the grid (sampled back onto the
reduced stations). It is built in code rather than drawn in the Modeler so that it
always matches the algorithms' current parameter names; run this script again
after changing them. The styles are written by ``plugin/styling.py`` from an
invented anomaly (two Gaussian bodies on a regional gradient), so the raster
style's colour stops are those of that invented raster (see styling.py).
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
REDUCED, ANOMALY, CONTOURS = "reduced_stations", "anomaly", "contours"


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
        raise RuntimeError(f"{algorithm_id} is not registered; is the plugin loaded?")
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


def build_model():
    """The reduce -> grid -> contour model (QgsProcessingModelAlgorithm)."""
    from qgis.core import (
        QgsProcessing,
        QgsProcessingModelAlgorithm,
        QgsProcessingModelChildParameterSource as Source,
        QgsProcessingModelParameter,
        QgsProcessingParameterEnum,
        QgsProcessingParameterField,
        QgsProcessingParameterFeatureSource,
        QgsProcessingParameterNumber,
        QgsProcessingParameterRasterLayer,
    )
    from qgis.PyQt.QtCore import QPointF

    model = QgsProcessingModelAlgorithm(
        "Reduce, grid and contour gravity stations", "Relief Gravity", "reliefgravity"
    )
    model.setHelpContent(
        {
            "ALG_DESC": (
                "Bouguer reduction of a station layer with terrain corrections from a DEM, "
                "then a minimum-curvature grid of the complete Bouguer anomaly (cba, mGal) "
                "with contours. The standard terrain correction reaches 166.7 km: give a "
                "regional elevation raster that reaches 166.7 km around every station, "
                "otherwise the stations are flagged tc_partial and cba misses the far "
                "terrain. Set the two datums to what your heights and DEM are (most "
                "global DEMs: EGM96 geoid; GNSS heights: ellipsoidal). Results support "
                "interpretation only; check reductions against the survey's own ties and "
                "specifications; decisions on drilling, groundwater or engineering are for "
                "licensed practice and local codes."
            ),
            STATIONS: "Gravity stations (points, projected CRS in metres).",
            GRAVITY_FIELD: "Observed gravity (mGal).",
            HEIGHT_FIELD: "Station height above the ellipsoid (m); empty = sample the DEM.",
            DEM: "Elevation raster (m) for the terrain correction.",
            DENSITY: "Reduction density (kg/m³), default 2670.",
            REGIONAL_DEM: (
                "Coarser elevation raster reaching 166.7 km around the stations (outer zone). "
                "Needed for the standard correction; without it the far terrain is missing and "
                "the stations are flagged."
            ),
            HEIGHT_DATUM: "What the station heights are: ellipsoidal (GNSS, default) or orthometric above EGM96.",
            DEM_DATUM: "What the DEM heights are above: the EGM96 geoid (most global DEMs, default), the ellipsoid, or the same as the stations.",
        }
    )
    inputs = [
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
            defaultValue=2670.0, optional=True,
        ),
        QgsProcessingParameterRasterLayer(
            REGIONAL_DEM, "Regional elevation raster reaching 166.7 km (needed for the standard correction)", optional=True
        ),
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
    for k, definition in enumerate(inputs):
        component = QgsProcessingModelParameter(definition.name())
        component.setPosition(QPointF(120.0, 60.0 + 70.0 * k))
        model.addModelParameter(definition, component)

    reduce = _child(
        "reliefgravity:bouguerreduction", "reduce", "Bouguer reduction",
        {
            "INPUT": Source.fromModelParameter(STATIONS),
            "GRAVITY_FIELD": Source.fromModelParameter(GRAVITY_FIELD),
            "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD),
            "DEM": Source.fromModelParameter(DEM),
            "DENSITY": Source.fromModelParameter(DENSITY),
            "REGIONAL_DEM": Source.fromModelParameter(REGIONAL_DEM),
            "HEIGHT_DATUM": Source.fromModelParameter(HEIGHT_DATUM),
            "DEM_DATUM": Source.fromModelParameter(DEM_DATUM),
        },
        420.0, 200.0,
    )
    _output(reduce, "OUTPUT", REDUCED, "Reduced stations", 640.0, 120.0)
    model.addChildAlgorithm(reduce)

    grid = _child(
        "reliefgravity:anomalygrid", "grid", "Anomaly grid and contours",
        {
            "INPUT": Source.fromChildOutput("reduce", "OUTPUT"),
            "FIELD": Source.fromStaticValue("cba"),
        },
        420.0, 380.0,
    )
    _output(grid, "OUTPUT", ANOMALY, "Complete Bouguer anomaly raster", 680.0, 360.0)
    _output(grid, "CONTOURS", CONTOURS, "Anomaly contours", 680.0, 440.0)
    model.addChildAlgorithm(grid)
    model.updateDestinationParameters()
    return model


#: Extra parameters and outputs of the reduce -> grid -> regional-residual model.
SEPARATION_METHOD, CONTINUATION_HEIGHT = "separation_method", "continuation_height"
REGIONAL, RESIDUAL = "regional", "residual"


def build_separation_model():
    """The reduce -> grid -> regional-residual model: the first model plus a third child."""
    from qgis.core import (
        QgsProcessingModelChildParameterSource as Source,
        QgsProcessingModelParameter,
        QgsProcessingParameterEnum,
        QgsProcessingParameterNumber,
    )
    from qgis.PyQt.QtCore import QPointF

    model = build_model()
    model.setName("Reduce, grid and separate regional and residual")
    help_content = dict(model.helpContent())
    help_content["ALG_DESC"] = (
        "Bouguer reduction of a station layer with terrain corrections from a DEM, a minimum-curvature "
        "grid of the complete Bouguer anomaly (cba, mGal) with contours, then its regional (trend "
        "surface or upward continuation) and residual rasters, sampled back onto the reduced stations. "
        "Results support interpretation only; check reductions against the survey's own ties and "
        "specifications."
    )
    help_content[SEPARATION_METHOD] = "Regional from a planar trend surface (default) or upward continuation."
    help_content[CONTINUATION_HEIGHT] = "Continuation height (m) for the upward-continuation regional."
    model.setHelpContent(help_content)
    extra = [
        QgsProcessingParameterEnum(
            SEPARATION_METHOD, "Regional from", options=["Polynomial trend surface", "Upward continuation (FFT)"],
            defaultValue=0,
        ),
        QgsProcessingParameterNumber(
            CONTINUATION_HEIGHT, "Continuation height (m)", type=QgsProcessingParameterNumber.Double,
            defaultValue=2000.0, minValue=0.0,
        ),
    ]
    for k, definition in enumerate(extra):
        component = QgsProcessingModelParameter(definition.name())
        component.setPosition(QPointF(120.0, 480.0 + 70.0 * k))
        model.addModelParameter(definition, component)
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


def build_readings_model():
    """The readings -> observed gravity -> reduce -> grid -> contour model."""
    from qgis.core import (
        QgsProcessing,
        QgsProcessingModelAlgorithm,
        QgsProcessingModelChildParameterSource as Source,
        QgsProcessingModelParameter,
        QgsProcessingParameterEnum,
        QgsProcessingParameterFeatureSource,
        QgsProcessingParameterField,
        QgsProcessingParameterNumber,
        QgsProcessingParameterRasterLayer,
    )
    from qgis.PyQt.QtCore import QPointF

    model = QgsProcessingModelAlgorithm(
        "Readings to observed gravity, reduce, grid and contour", "Relief Gravity", "reliefgravity"
    )
    model.setHelpContent(
        {
            "ALG_DESC": (
                "Gravimeter readings to observed gravity (Longman tide, calibration, instrument height, "
                "least-squares drift and base ties), then the Bouguer reduction with terrain corrections "
                "from a DEM and a minimum-curvature grid of the complete Bouguer anomaly with contours. "
                "Results support interpretation only; check them against the survey's own ties and "
                "specifications."
            ),
        }
    )
    field = QgsProcessingParameterField
    inputs = [
        QgsProcessingParameterFeatureSource("readings", "Meter readings (table)", [QgsProcessing.TypeVector]),
        field("station_field", "Station id field of the readings", parentLayerParameterName="readings"),
        field("time_field", "Time field (ISO 8601 text or date-time)", parentLayerParameterName="readings"),
        QgsProcessingParameterNumber("utc_offset", "UTC offset of times without one (hours)",
                                     type=QgsProcessingParameterNumber.Double, defaultValue=0.0),
        field("reading_field", "Reading field", parentLayerParameterName="readings"),
        QgsProcessingParameterEnum("reading_units", "Reading units", options=["Counter units", "mGal"], defaultValue=0),
        QgsProcessingParameterFeatureSource("calibration", "Calibration table (counter, mgal, factor)",
                                            [QgsProcessing.TypeVector], optional=True),
        field("instrument_height_field", "Instrument height field (m)", parentLayerParameterName="readings", optional=True),
        field("loop_field", "Loop field (empty: one loop per local day)", parentLayerParameterName="readings", optional=True),
        QgsProcessingParameterFeatureSource(STATIONS, "Gravity stations", [QgsProcessing.TypeVectorPoint]),
        field("stations_id_field", "Station id field", parentLayerParameterName=STATIONS),
        field("known_gravity_field", "Known gravity field (mGal)", parentLayerParameterName=STATIONS),
        field(HEIGHT_FIELD, "Station height field (m above the ellipsoid)", parentLayerParameterName=STATIONS,
              type=QgsProcessingParameterField.Numeric),
        QgsProcessingParameterRasterLayer(DEM, "Elevation raster (DEM, metres)"),
        QgsProcessingParameterRasterLayer(REGIONAL_DEM, "Regional elevation raster for the outer zone", optional=True),
        QgsProcessingParameterNumber(DENSITY, "Reduction density (kg/m³)", type=QgsProcessingParameterNumber.Double,
                                     defaultValue=2670.0, optional=True),
    ]
    for k, definition in enumerate(inputs):
        component = QgsProcessingModelParameter(definition.name())
        component.setPosition(QPointF(120.0, 40.0 + 55.0 * k))
        model.addModelParameter(definition, component)

    wired = {key.upper(): Source.fromModelParameter(key) for key in (
        "readings", "station_field", "time_field", "utc_offset", "reading_field", "reading_units", "calibration",
        "instrument_height_field", "loop_field", "stations_id_field", "known_gravity_field")}
    wired.update({"STATIONS": Source.fromModelParameter(STATIONS), "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD)})
    observed = _child("reliefgravity:observedgravity", "observed", "Observed gravity from readings", wired, 420.0, 120.0)
    _output(observed, "OUTPUT", "observed_stations", "Stations with observed gravity", 680.0, 80.0)
    _output(observed, "READINGS_OUTPUT", "readings", "Reduced readings", 680.0, 140.0)
    model.addChildAlgorithm(observed)
    reduce = _child(
        "reliefgravity:bouguerreduction", "reduce", "Bouguer reduction",
        {
            "INPUT": Source.fromChildOutput("observed", "OUTPUT"),
            "GRAVITY_FIELD": Source.fromStaticValue("g_obs"),
            "HEIGHT_FIELD": Source.fromModelParameter(HEIGHT_FIELD),
            "DEM": Source.fromModelParameter(DEM),
            "DENSITY": Source.fromModelParameter(DENSITY),
            "REGIONAL_DEM": Source.fromModelParameter(REGIONAL_DEM),
        },
        420.0, 320.0,
    )
    _output(reduce, "OUTPUT", REDUCED, "Reduced stations", 680.0, 300.0)
    model.addChildAlgorithm(reduce)
    grid = _child(
        "reliefgravity:anomalygrid", "grid", "Anomaly grid and contours",
        {"INPUT": Source.fromChildOutput("reduce", "OUTPUT"), "FIELD": Source.fromStaticValue("cba")},
        420.0, 500.0,
    )
    _output(grid, "OUTPUT", ANOMALY, "Complete Bouguer anomaly raster", 680.0, 480.0)
    _output(grid, "CONTOURS", CONTOURS, "Anomaly contours", 680.0, 560.0)
    model.addChildAlgorithm(grid)
    model.updateDestinationParameters()
    return model


def build_styles(folder: Path) -> tuple[Path, Path]:
    """Write the .qml styles from an invented anomaly gridded by the plugin itself."""
    import numpy as np
    import processing
    from osgeo import ogr, osr

    from relief_gravity.plugin.styling import write_style_files
    from qgis.core import QgsRasterLayer, QgsVectorLayer

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
    for xi, yi, vi in zip(x, y, cba):
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
