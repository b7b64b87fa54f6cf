# SPDX-License-Identifier: GPL-2.0-or-later
"""Styles of the anomaly raster and its contours, and the layer post-processors that apply them.

Raster: QGIS's built-in "Spectral" ramp, inverted so that lows are blue and
highs red (the usual reading of anomaly maps), **stretched linearly between
the 2nd and 98th percentiles** of the valid cells (a cumulative-count cut: a
few extreme values cannot wash out the structure; cells beyond the cut take
the end colours). The legend is one continuous colour bar in mGal, and the
display is resampled bilinearly, so the cells do not show as blocks.

Contours: index contours (every fifth level, i.e. at multiples of five
contour intervals) heavier and labelled with their value; the levels
between them thin and unlabelled. The interval is read from the layer's own
levels by a QGIS expression, so the style fits any contour layer with a
``value`` field.

The same code writes the shipped ``.qml`` files (``tools/build_model.py
--styles``); see :func:`write_style_files`. The raster file carries no value
range: QGIS computes the 2-98 % cut of the data in view when it draws.
"""

from __future__ import annotations

from pathlib import Path

import numpy as np
from qgis.core import (
    QgsBasicNumericFormat,
    QgsBilinearRasterResampler,
    QgsColorRampLegendNodeSettings,
    QgsColorRampShader,
    QgsLayerMetadata,
    QgsLineSymbol,
    QgsPalLayerSettings,
    QgsProcessingLayerPostProcessorInterface,
    QgsRasterMinMaxOrigin,
    QgsRasterShader,
    QgsRuleBasedLabeling,
    QgsRuleBasedRenderer,
    QgsSingleBandPseudoColorRenderer,
    QgsStyle,
    QgsTextBufferSettings,
    QgsTextFormat,
)
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QColor

STYLES_DIR = Path(__file__).resolve().parent / "styles"
RASTER_QML = STYLES_DIR / "anomaly_raster.qml"
CONTOURS_QML = STYLES_DIR / "anomaly_contours.qml"

#: Built-in QGIS ramp and its direction (inverted: blue low, red high).
RAMP_NAME = "Spectral"
RAMP_INVERTED = True
#: Cumulative-count cut of the stretch (percent) and number of colour stops
#: in it (equally spaced values: a linear stretch).
LOW_PERCENTILE = 2.0
HIGH_PERCENTILE = 98.0
N_STOPS = 11
UNITS = "mGal"
#: Every INDEX_EVERY-th contour level (multiples of INDEX_EVERY intervals) is
#: an index contour (common cartographic practice, no source).
INDEX_EVERY = 5

#: Label of a contour: its value without trailing zeros ("12.5", "-3", "0.25").
CONTOUR_LABEL_EXPRESSION = "regexp_replace(format_number(\"value\", 3), '\\\\.?0+$', '')"

#: The contour interval of the layer being drawn: the smallest step between
#: its distinct levels (0 when it has fewer than two).
CONTOUR_INTERVAL_EXPRESSION = (
    "with_variable('rg_levels', array_sort(array_distinct(aggregate(@layer, 'array_agg', \"value\"))), "
    "if(array_length(@rg_levels) < 2, 0, array_min(array_foreach(generate_series(1, array_length(@rg_levels) - 1), "
    "@rg_levels[@element] - @rg_levels[@element - 1]))))"
)

#: True for an index contour: its value is a whole multiple of INDEX_EVERY
#: intervals (every level is one when the layer has a single level).
INDEX_CONTOUR_EXPRESSION = (
    f"with_variable('rg_step', {INDEX_EVERY} * ({CONTOUR_INTERVAL_EXPRESSION}), "
    "@rg_step <= 0 or abs(\"value\" / @rg_step - round(\"value\" / @rg_step)) < 1e-6)"
)


def _tr(text: str) -> str:
    return QCoreApplication.translate("AnomalyStyles", text)


def anomaly_colour_ramp():
    """A fresh copy of the built-in ramp used for anomalies."""
    ramp = QgsStyle.defaultStyle().colorRamp(RAMP_NAME)
    if RAMP_INVERTED:
        ramp.invert()
    return ramp


def stretch_limits(values, low: float = LOW_PERCENTILE, high: float = HIGH_PERCENTILE) -> tuple[float, float]:
    """The ``low`` and ``high`` percentiles of the finite values: the linear stretch.

    Flat or empty data get a 1-wide window around their value (0 when
    empty), so the shader always has an increasing range.
    """
    finite = np.asarray(values, dtype=float)
    finite = finite[np.isfinite(finite)]
    if finite.size == 0:
        return -0.5, 0.5
    lo, hi = (float(v) for v in np.percentile(finite, [low, high]))
    if not hi > lo:
        lo, hi = lo - 0.5, lo + 0.5
    return lo, hi


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


def raster_renderer(layer, values=None, follow_view: bool = False) -> QgsSingleBandPseudoColorRenderer:
    """The anomaly renderer for ``layer``: Spectral, linear 2-98 % stretch, continuous legend.

    ``follow_view=True`` lets QGIS recompute the cut from the data in view
    each time it draws (what the shipped ``.qml`` does, so it fits any
    raster); otherwise the cut is the whole raster's, computed here.
    """
    if follow_view:
        # Placeholder range: QGIS replaces it with the cut of the data in
        # view on the first draw, so nothing of this raster stays in a .qml.
        lo, hi = 0.0, 1.0
    else:
        lo, hi = stretch_limits(_read_values(layer) if values is None else values)
    ramp = anomaly_colour_ramp()
    decimals = 2 if hi - lo < 10 else 1
    items = [
        QgsColorRampShader.ColorRampItem(float(value), ramp.color(k / (N_STOPS - 1)), "{:.{}f}".format(value, decimals))
        for k, value in enumerate(np.linspace(lo, hi, N_STOPS))
    ]
    shader = QgsColorRampShader(lo, hi)
    shader.setSourceColorRamp(anomaly_colour_ramp())
    shader.setColorRampType(QgsColorRampShader.Interpolated)
    # Continuous mode: a new min/max spreads the stops evenly again.
    shader.setClassificationMode(QgsColorRampShader.Continuous)
    shader.setColorRampItemList(items)
    shader.setClip(False)
    shader.setLabelPrecision(decimals)
    legend = QgsColorRampLegendNodeSettings()
    legend.setUseContinuousLegend(True)
    legend.setSuffix(" " + UNITS)
    number_format = QgsBasicNumericFormat()
    number_format.setNumberDecimalPlaces(decimals)
    number_format.setShowTrailingZeros(False)
    legend.setNumericFormat(number_format)
    shader.setLegendSettings(legend)
    raster_shader = QgsRasterShader()
    raster_shader.setRasterShaderFunction(shader)
    renderer = QgsSingleBandPseudoColorRenderer(layer.dataProvider(), 1, raster_shader)
    renderer.setClassificationMin(lo)
    renderer.setClassificationMax(hi)
    origin = QgsRasterMinMaxOrigin()
    origin.setLimits(QgsRasterMinMaxOrigin.CumulativeCut)
    origin.setCumulativeCutLower(LOW_PERCENTILE / 100.0)
    origin.setCumulativeCutUpper(HIGH_PERCENTILE / 100.0)
    origin.setExtent(QgsRasterMinMaxOrigin.UpdatedCanvas if follow_view else QgsRasterMinMaxOrigin.WholeRaster)
    origin.setStatAccuracy(QgsRasterMinMaxOrigin.Exact)
    renderer.setMinMaxOrigin(origin)
    return renderer


def set_smooth_resampling(layer, smooth: bool = True) -> None:
    """Bilinear display resampling (or back to nearest neighbour with ``smooth=False``)."""
    resampler = layer.resampleFilter()
    resampler.setZoomedInResampler(QgsBilinearRasterResampler() if smooth else None)
    resampler.setZoomedOutResampler(QgsBilinearRasterResampler() if smooth else None)
    resampler.setMaxOversampling(2.0)


def style_anomaly_raster(layer, title: str = "", abstract: str = "", follow_view: bool = False) -> None:
    """Apply the anomaly style (colours, bilinear resampling) and the mGal metadata to a raster layer.

    Usable from the QGIS Python console to restyle a layer after its data
    changed: ``from relief_gravity.plugin.styling import style_anomaly_raster;
    style_anomaly_raster(iface.activeLayer())``.
    """
    layer.setRenderer(raster_renderer(layer, follow_view=follow_view))
    set_smooth_resampling(layer)
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


def _label_settings() -> QgsPalLayerSettings:
    settings = QgsPalLayerSettings()
    settings.fieldName = CONTOUR_LABEL_EXPRESSION
    settings.isExpression = True
    settings.placement = QgsPalLayerSettings.Line
    settings.repeatDistance = 60.0
    settings.repeatDistanceUnit = 0  # millimetres (QgsUnitTypes.RenderMillimeters)
    text = QgsTextFormat()
    text.setSize(7.0)
    text.setColor(QColor(30, 30, 30))
    buffer = QgsTextBufferSettings()
    buffer.setEnabled(True)
    buffer.setSize(0.8)
    buffer.setColor(QColor(255, 255, 255, 220))
    text.setBuffer(buffer)
    settings.setFormat(text)
    return settings


def contour_labeling() -> QgsRuleBasedLabeling:
    """Labels along the index contours only, with their value."""
    root = QgsRuleBasedLabeling.Rule(None)
    rule = QgsRuleBasedLabeling.Rule(_label_settings())
    rule.setFilterExpression(INDEX_CONTOUR_EXPRESSION)
    rule.setDescription(_tr("Index contours"))
    root.appendChild(rule)
    return QgsRuleBasedLabeling(root)


def contour_renderer() -> QgsRuleBasedRenderer:
    """Index contours 0.5 mm dark, the others 0.2 mm grey."""
    root = QgsRuleBasedRenderer.Rule(None)
    for label, width, colour, expression in (
        (_tr("Index contour"), "0.5", "35,35,35,255", INDEX_CONTOUR_EXPRESSION),
        (_tr("Contour"), "0.2", "70,70,70,220", "ELSE"),
    ):
        symbol = QgsLineSymbol.createSimple({"line_color": colour, "line_width": width})
        rule = QgsRuleBasedRenderer.Rule(symbol, 0, 0, "" if expression == "ELSE" else expression, label)
        if expression == "ELSE":
            rule.setIsElse(True)
        root.appendChild(rule)
    return QgsRuleBasedRenderer(root)


def style_contours(layer, name: str = "") -> None:
    """Contour lines in mGal: index contours heavier and labelled, the others thin."""
    layer.setRenderer(contour_renderer())
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
        """Style the output once Processing has loaded it (QGIS API override); an invalid layer is left alone."""
        if layer is not None and layer.isValid():
            style_anomaly_raster(layer, self.title, self.abstract)


class ContourStylePostProcessor(QgsProcessingLayerPostProcessorInterface):
    """Styles one contour output when Processing loads it."""

    def __init__(self, name: str):
        super().__init__()
        self.name = name

    def postProcessLayer(self, layer, context, feedback):  # noqa: N802 - QGIS API
        """Style the output once Processing has loaded it (QGIS API override); an invalid layer is left alone."""
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

    The raster file's stretch follows the view (``follow_view=True``): QGIS
    recomputes the 2-98 % cut from the raster it is applied to when it draws,
    so no value range of ``raster_layer`` stays in the file.
    """
    folder = Path(folder)
    folder.mkdir(parents=True, exist_ok=True)
    style_anomaly_raster(raster_layer, follow_view=True)
    style_contours(contour_layer)
    paths = (folder / RASTER_QML.name, folder / CONTOURS_QML.name)
    for layer, path in zip((raster_layer, contour_layer), paths):
        message, ok = layer.saveNamedStyle(str(path))
        if not ok:
            raise RuntimeError(_tr("Could not save the style {}: {}").format(path, message))
    return paths
