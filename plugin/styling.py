# SPDX-License-Identifier: GPL-2.0-or-later
"""Styles of the anomaly raster and its contours, and the layer post-processors that apply them.

Raster: QGIS's built-in "Spectral" ramp, inverted so that lows are blue and
highs red (the usual reading of anomaly maps), **histogram-equalised between
the 2nd and 98th percentiles** of the valid cells: the ramp's colours are
spaced evenly along the ramp but placed at equally spaced percentiles, so
every colour covers about the same area of the map and a few extreme values
cannot wash out the structure. Cells below the 2nd or above the 98th
percentile take the end colours.

Contours: thin dark lines labelled with their value along the line.

The same code writes the shipped ``.qml`` files (``tools/build_model.py
--styles``); see :func:`write_style_files`.
"""

from __future__ import annotations

from pathlib import Path

import numpy as np
from qgis.core import (
    QgsBasicNumericFormat,
    QgsColorRampLegendNodeSettings,
    QgsColorRampShader,
    QgsLayerMetadata,
    QgsLineSymbol,
    QgsPalLayerSettings,
    QgsProcessingLayerPostProcessorInterface,
    QgsRasterMinMaxOrigin,
    QgsRasterShader,
    QgsSingleBandPseudoColorRenderer,
    QgsSingleSymbolRenderer,
    QgsStyle,
    QgsTextBufferSettings,
    QgsTextFormat,
    QgsVectorLayerSimpleLabeling,
)
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QColor

STYLES_DIR = Path(__file__).resolve().parent / "styles"
RASTER_QML = STYLES_DIR / "anomaly_raster.qml"
CONTOURS_QML = STYLES_DIR / "anomaly_contours.qml"

#: Built-in QGIS ramp and its direction (inverted: blue low, red high).
RAMP_NAME = "Spectral"
RAMP_INVERTED = True
#: Percentile window of the stretch and number of colour stops in it.
LOW_PERCENTILE = 2.0
HIGH_PERCENTILE = 98.0
N_STOPS = 11
UNITS = "mGal"

#: Label of a contour: its value without trailing zeros ("12.5", "-3", "0.25").
CONTOUR_LABEL_EXPRESSION = "regexp_replace(format_number(\"value\", 3), '\\\\.?0+$', '')"


def _tr(text: str) -> str:
    return QCoreApplication.translate("AnomalyStyles", text)


def anomaly_colour_ramp():
    """A fresh copy of the built-in ramp used for anomalies."""
    ramp = QgsStyle.defaultStyle().colorRamp(RAMP_NAME)
    if RAMP_INVERTED:
        ramp.invert()
    return ramp


def equalised_stops(values, n_stops: int = N_STOPS, low: float = LOW_PERCENTILE, high: float = HIGH_PERCENTILE):
    """Stop values: ``n_stops`` equally spaced percentiles from ``low`` to ``high`` (NaN ignored).

    Returns an increasing array; repeated percentiles (flat data) are spread
    linearly so the shader always has strictly increasing stops.
    """
    finite = np.asarray(values, dtype=float)
    finite = finite[np.isfinite(finite)]
    if finite.size == 0:
        return np.linspace(0.0, 1.0, n_stops)
    stops = np.percentile(finite, np.linspace(low, high, n_stops))
    if not np.all(np.diff(stops) > 0):
        lo, hi = float(stops[0]), float(stops[-1])
        if hi <= lo:
            lo, hi = lo - 0.5, lo + 0.5
        stops = np.linspace(lo, hi, n_stops)
    return stops


def _raster_values(layer) -> np.ndarray:
    """Band 1 of a raster layer as float64 with NaN at NoData (any provider)."""
    from qgis.core import Qgis

    provider = layer.dataProvider()
    width, height = layer.width(), layer.height()
    block = provider.block(1, layer.extent(), width, height)
    dtype = {Qgis.Float32: np.float32, Qgis.Float64: np.float64}.get(provider.dataType(1))
    if dtype is not None:
        values = np.frombuffer(bytes(block.data()), dtype=dtype).reshape(height, width).astype(float)
    else:
        values = np.array([[block.value(r, c) for c in range(width)] for r in range(height)], dtype=float)
    if block.hasNoDataValue():
        values[values == block.noDataValue()] = np.nan
    return values


def _read_values(layer) -> np.ndarray:
    """Fast path through GDAL for GDAL-provider layers, else the provider block."""
    if layer.providerType() == "gdal":
        from osgeo import gdal

        dataset = gdal.Open(layer.source().split("|")[0])
        band = dataset.GetRasterBand(1)
        values = band.ReadAsArray().astype(float)
        nodata = band.GetNoDataValue()
        if nodata is not None:
            values[values == nodata] = np.nan
        return values
    return _raster_values(layer)


def raster_renderer(layer, values=None) -> QgsSingleBandPseudoColorRenderer:
    """The anomaly renderer for ``layer`` (histogram-equalised, 2-98 %)."""
    if values is None:
        values = _read_values(layer)
    stops = equalised_stops(values)
    ramp = anomaly_colour_ramp()
    decimals = 2 if stops[-1] - stops[0] < 10 else 1
    items = [
        QgsColorRampShader.ColorRampItem(
            float(value), ramp.color(k / (len(stops) - 1)), "{:.{}f}".format(value, decimals)
        )
        for k, value in enumerate(stops)
    ]
    shader = QgsColorRampShader(float(stops[0]), float(stops[-1]))
    shader.setSourceColorRamp(anomaly_colour_ramp())
    shader.setColorRampType(QgsColorRampShader.Interpolated)
    # Quantile mode: "Classify" in Layer Properties redoes the equalisation.
    shader.setClassificationMode(QgsColorRampShader.Quantile)
    shader.setColorRampItemList(items)
    shader.setClip(False)
    shader.setLabelPrecision(decimals)
    legend = QgsColorRampLegendNodeSettings()
    # One entry per stop: the equalised stop values are uneven, and a
    # two-label gradient bar would hide that.
    legend.setUseContinuousLegend(False)
    legend.setSuffix(" " + UNITS)
    number_format = QgsBasicNumericFormat()
    number_format.setNumberDecimalPlaces(decimals)
    number_format.setShowTrailingZeros(True)
    legend.setNumericFormat(number_format)
    shader.setLegendSettings(legend)
    raster_shader = QgsRasterShader()
    raster_shader.setRasterShaderFunction(shader)
    renderer = QgsSingleBandPseudoColorRenderer(layer.dataProvider(), 1, raster_shader)
    renderer.setClassificationMin(float(stops[0]))
    renderer.setClassificationMax(float(stops[-1]))
    origin = QgsRasterMinMaxOrigin()
    origin.setLimits(QgsRasterMinMaxOrigin.CumulativeCut)
    origin.setCumulativeCutLower(LOW_PERCENTILE / 100.0)
    origin.setCumulativeCutUpper(HIGH_PERCENTILE / 100.0)
    origin.setExtent(QgsRasterMinMaxOrigin.WholeRaster)
    origin.setStatAccuracy(QgsRasterMinMaxOrigin.Exact)
    renderer.setMinMaxOrigin(origin)
    return renderer


def style_anomaly_raster(layer, title: str = "", abstract: str = "") -> None:
    """Apply the anomaly style and the mGal metadata to a raster layer.

    Usable from the QGIS Python console to restyle a layer after its data
    changed: ``from relief_gravity.plugin.styling import style_anomaly_raster;
    style_anomaly_raster(iface.activeLayer())``.
    """
    layer.setRenderer(raster_renderer(layer))
    title = title or _tr("Anomaly (mGal)")
    abstract = abstract or _tr("Gravity anomaly in mGal.")
    metadata = QgsLayerMetadata(layer.metadata())
    metadata.setTitle(title)
    metadata.setAbstract(abstract)
    metadata.setType("dataset")
    metadata.addKeywords("units", [UNITS])
    metadata.addKeywords("gmd:topicCategory", ["geoscientificInformation"])
    layer.setMetadata(metadata)
    layer.setTitle(title)
    layer.setAbstract(abstract)
    layer.setName(title)
    layer.triggerRepaint()


def contour_labeling() -> QgsVectorLayerSimpleLabeling:
    """Labels along the contour lines, with their value."""
    settings = QgsPalLayerSettings()
    settings.fieldName = CONTOUR_LABEL_EXPRESSION
    settings.isExpression = True
    settings.placement = QgsPalLayerSettings.Line
    settings.repeatDistance = 60.0
    settings.repeatDistanceUnit = 0  # millimetres (QgsUnitTypes.RenderMillimeters)
    text = QgsTextFormat()
    text.setSize(7.0)
    text.setColor(QColor(40, 40, 40))
    buffer = QgsTextBufferSettings()
    buffer.setEnabled(True)
    buffer.setSize(0.8)
    buffer.setColor(QColor(255, 255, 255, 220))
    text.setBuffer(buffer)
    settings.setFormat(text)
    return QgsVectorLayerSimpleLabeling(settings)


def style_contours(layer, name: str = "") -> None:
    """Thin dark contour lines labelled with their value (mGal)."""
    symbol = QgsLineSymbol.createSimple({"line_color": "50,50,50,255", "line_width": "0.25"})
    layer.setRenderer(QgsSingleSymbolRenderer(symbol))
    layer.setLabeling(contour_labeling())
    layer.setLabelsEnabled(True)
    metadata = QgsLayerMetadata(layer.metadata())
    metadata.setTitle(name or _tr("Anomaly contours (mGal)"))
    metadata.setAbstract(_tr("Contour lines of the gridded anomaly; field value in mGal."))
    metadata.addKeywords("units", [UNITS])
    layer.setMetadata(metadata)
    if name:
        layer.setName(name)
    layer.triggerRepaint()


class RasterStylePostProcessor(QgsProcessingLayerPostProcessorInterface):
    """Styles one anomaly raster output when Processing loads it."""

    def __init__(self, title: str, abstract: str):
        super().__init__()
        self.title = title
        self.abstract = abstract

    def postProcessLayer(self, layer, context, feedback):  # noqa: N802 - QGIS API
        if layer is not None and layer.isValid():
            style_anomaly_raster(layer, self.title, self.abstract)


class ContourStylePostProcessor(QgsProcessingLayerPostProcessorInterface):
    """Styles one contour output when Processing loads it."""

    def __init__(self, name: str):
        super().__init__()
        self.name = name

    def postProcessLayer(self, layer, context, feedback):  # noqa: N802 - QGIS API
        if layer is not None and layer.isValid():
            style_contours(layer, self.name)


#: Every post-processor handed to QGIS, one per output, kept alive for the
#: life of the process: QGIS holds only a C++ pointer, and a Python object
#: held by the (short-lived) algorithm clone would be collected before the
#: layer is loaded, leaving the style unapplied (docs/processing-practice.md, "Styling outputs").
_POST_PROCESSORS: list = []


def _attach(context, destination, processor) -> bool:
    if not destination or not context.willLoadLayerOnCompletion(destination):
        return False
    _POST_PROCESSORS.append(processor)
    context.layerToLoadOnCompletionDetails(destination).setPostProcessor(processor)
    return True


def attach_raster_style(context, destination, title: str, abstract: str) -> bool:
    """Style the raster at ``destination`` when it is loaded; False if it will not be."""
    return _attach(context, destination, RasterStylePostProcessor(title, abstract))


def attach_contour_style(context, destination, name: str) -> bool:
    """Style the contours at ``destination`` when they are loaded; False if they will not be."""
    return _attach(context, destination, ContourStylePostProcessor(name))


def write_style_files(raster_layer, contour_layer, folder: Path = STYLES_DIR) -> tuple[Path, Path]:
    """Style the two layers with the code above and save them as ``.qml`` files.

    The raster file's colour stops are those of ``raster_layer``'s data: after
    loading it onto another anomaly raster, press *Classify* in Layer
    Properties > Symbology (the mode is Quantile, so the equalisation is
    redone) or call :func:`style_anomaly_raster`.
    """
    folder = Path(folder)
    folder.mkdir(parents=True, exist_ok=True)
    style_anomaly_raster(raster_layer)
    style_contours(contour_layer)
    paths = (folder / RASTER_QML.name, folder / CONTOURS_QML.name)
    for layer, path in zip((raster_layer, contour_layer), paths):
        message, ok = layer.saveNamedStyle(str(path))
        if not ok:
            raise RuntimeError(_tr("Could not save the style {}: {}").format(path, message))
    return paths
