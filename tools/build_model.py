# SPDX-License-Identifier: GPL-2.0-or-later
"""Build the shipped Graphical Modeler model and the .qml styles with QGIS's own API.

    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py            # model only
    QT_QPA_PLATFORM=offscreen .venv/bin/python tools/build_model.py --styles   # model and styles

The model ``plugin/models/reduce_grid_contour.model3`` chains
``reliefgravity:bouguerreduction`` -> ``reliefgravity:anomalygrid`` (with
contours). It is built in code rather than drawn in the Modeler so that it
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

#: Model parameter names; public like algorithm parameter names (they are the
#: qgis_process argument names of the model).
STATIONS, GRAVITY_FIELD, HEIGHT_FIELD, DEM, DENSITY = "stations", "gravity_field", "height_field", "dem", "density"
REGIONAL_DEM = "regional_dem"
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
    _register_checkout()
    from relief_gravity.algorithms.constants import DEFAULT_REDUCTION_DENSITY
    from qgis.core import (
        QgsProcessing,
        QgsProcessingModelAlgorithm,
        QgsProcessingModelChildParameterSource as Source,
        QgsProcessingModelParameter,
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
                "with contours. Results support interpretation only; check reductions "
                "against the survey's own ties and specifications."
            ),
            STATIONS: "Gravity stations (points, projected CRS in metres).",
            GRAVITY_FIELD: "Observed gravity (mGal).",
            HEIGHT_FIELD: "Station height above the ellipsoid (m); empty = sample the DEM.",
            DEM: "Elevation raster (m) for the terrain correction.",
            DENSITY: "Reduction density (kg/m³), default 2670.",
            REGIONAL_DEM: "Optional coarser elevation raster reaching 166.7 km around the stations (outer zone).",
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
            defaultValue=DEFAULT_REDUCTION_DENSITY, optional=True,
        ),
        QgsProcessingParameterRasterLayer(
            REGIONAL_DEM, "Regional elevation raster for the outer zone", optional=True
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
    parser.add_argument("--styles", action="store_true", help="also write plugin/styles/*.qml")
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
        model = build_model()
        ok, problems = model.validate()
        if not ok:
            print("model does not validate:", *problems, sep="\n  ", file=sys.stderr)
            return 1
        args.output.parent.mkdir(parents=True, exist_ok=True)
        if not model.toFile(str(args.output)):
            print(f"could not write {args.output}", file=sys.stderr)
            return 1
        print(f"wrote {args.output}")
        if args.styles:
            for path in build_styles(REPO_ROOT / "plugin" / "styles"):
                print(f"wrote {path}")
    finally:
        plugin.unload()
        app.exitQgis()
    return 0


if __name__ == "__main__":
    sys.exit(main())
