# SPDX-License-Identifier: GPL-2.0-or-later
"""A PNG of the anomaly map (raster, contours, stations, legend, scale bar), rendered headless.

Built as a QGIS print layout in a private project, so the user's project is
never touched and the same code works in the desktop, in qgis_process and in
a plain script (``QT_QPA_PLATFORM=offscreen``).
"""

from __future__ import annotations

from pathlib import Path

from qgis.core import (
    QgsLayoutExporter,
    QgsLayoutItemLabel,
    QgsLayoutItemLegend,
    QgsLayoutItemMap,
    QgsLayoutItemScaleBar,
    QgsLayoutPoint,
    QgsLayoutSize,
    QgsMapLayerLegendUtils,
    QgsMarkerSymbol,
    QgsPrintLayout,
    QgsProject,
    QgsRasterLayer,
    QgsSingleSymbolRenderer,
    QgsUnitTypes,
    QgsVectorLayer,
)
from qgis.PyQt.QtCore import QCoreApplication, QSize, Qt
from qgis.PyQt.QtGui import QColor, QFont

from .styling import style_anomaly_raster, style_contours
from .toolbox.base import CAUTION

#: Page layout in millimetres (common cartographic proportions, no source).
PAGE_WIDTH = 270.0
MARGIN = 6.0
LEGEND_WIDTH = 50.0
TITLE_HEIGHT = 12.0
MAX_MAP_HEIGHT = 220.0
CAUTION_HEIGHT = 8.0


def _tr(text: str) -> str:
    return QCoreApplication.translate("AnomalyMap", text)


def _as_layer(source, kind, name):
    """A layer from a path (or an existing layer, cloned so its owner keeps it)."""
    if source is None:
        return None
    if isinstance(source, (str, Path)):
        layer = QgsRasterLayer(str(source), name) if kind == "raster" else QgsVectorLayer(str(source), name, "ogr")
    else:
        layer = source.clone()
        layer.setName(name)
    if not layer.isValid():
        raise ValueError(_tr("Could not open {} as a map layer.").format(source))
    return layer


def _station_symbol():
    return QgsMarkerSymbol.createSimple(
        {"name": "circle", "color": "20,20,20,255", "outline_color": "255,255,255,255",
         "outline_width": "0.2", "size": "1.6"}
    )


def _label(layout, text, size_pt, bold=False):
    item = QgsLayoutItemLabel(layout)
    item.setText(text)
    font = QFont()
    font.setPointSizeF(size_pt)
    font.setBold(bold)
    item.setFont(font)
    item.setFontColor(QColor(30, 30, 30))
    layout.addLayoutItem(item)
    return item


def render_anomaly_map(
    raster_path,
    png_path,
    contours=None,
    stations=None,
    title: str | None = None,
    width_px: int = 1600,
) -> Path:
    """Render the anomaly map to ``png_path`` and return its path.

    The page is always :data:`PAGE_WIDTH` mm wide and ``width_px`` only sets
    the resolution, so text, legend and map keep their proportions at any
    image size.

    Parameters
    ----------
    raster_path : str or Path
        The anomaly GeoTIFF (mGal); styled like the Processing output.
    png_path : str or Path
        PNG to write.
    contours, stations : str, Path or QgsVectorLayer, optional
        Contour lines (field ``value``) and station points.
    title : str, optional
        Map title; default "Complete Bouguer anomaly".
    width_px : int
        Image width in pixels; the height follows the raster's aspect.
    """
    png_path = Path(png_path)
    project = QgsProject()
    raster = _as_layer(raster_path, "raster", _tr("Anomaly (mGal)"))
    style_anomaly_raster(raster, _tr("Anomaly (mGal)"))
    layers = [raster]
    contour_layer = _as_layer(contours, "vector", _tr("Contours (mGal)"))
    if contour_layer is not None:
        style_contours(contour_layer, _tr("Contours (mGal)"))
        layers.insert(0, contour_layer)
    station_layer = _as_layer(stations, "vector", _tr("Stations"))
    if station_layer is not None:
        station_layer.setRenderer(QgsSingleSymbolRenderer(_station_symbol()))
        layers.insert(0, station_layer)
    # Added bottom layer first: the layer tree (and so the legend) then lists
    # stations, contours, raster from the top.
    project.addMapLayers(list(reversed(layers)))
    # One legend entry per colour stop, highest on top, so the uneven
    # (equalised) stop values can be read; the first entry repeats the band
    # name, which the layer name already gives, so it is left out.
    n_stops = len(raster.renderer().shader().rasterShaderFunction().colorRampItemList())
    raster_node = project.layerTreeRoot().findLayer(raster.id())
    QgsMapLayerLegendUtils.setLegendNodeOrder(raster_node, list(range(n_stops, 0, -1)))
    project.setCrs(raster.crs())

    mm = QgsUnitTypes.LayoutMillimeters
    extent = raster.extent()
    map_width = PAGE_WIDTH - 3 * MARGIN - LEGEND_WIDTH
    map_height = map_width * extent.height() / extent.width()
    if map_height > MAX_MAP_HEIGHT:  # tall survey: keep the page printable
        map_width *= MAX_MAP_HEIGHT / map_height
        map_height = MAX_MAP_HEIGHT
    map_top = MARGIN + TITLE_HEIGHT

    layout = QgsPrintLayout(project)
    layout.initializeDefaults()

    heading = _label(layout, title or _tr("Complete Bouguer anomaly"), 16, bold=True)
    heading.attemptMove(QgsLayoutPoint(MARGIN, MARGIN, mm))
    heading.attemptResize(QgsLayoutSize(PAGE_WIDTH - 2 * MARGIN, TITLE_HEIGHT, mm))

    map_item = QgsLayoutItemMap(layout)
    map_item.attemptMove(QgsLayoutPoint(MARGIN, map_top, mm))
    map_item.attemptResize(QgsLayoutSize(map_width, map_height, mm))
    map_item.setCrs(raster.crs())
    map_item.setLayers(layers)
    map_item.setExtent(extent)
    map_item.setFrameEnabled(True)
    layout.addLayoutItem(map_item)

    legend = QgsLayoutItemLegend(layout)
    legend.setTitle(_tr("Legend"))
    legend.setLinkedMap(map_item)
    legend.setLegendFilterByMapEnabled(False)
    legend.setResizeToContents(True)
    layout.addLayoutItem(legend)
    legend.attemptMove(QgsLayoutPoint(2 * MARGIN + map_width, map_top, mm))
    legend.adjustBoxSize()

    scale_bar = QgsLayoutItemScaleBar(layout)
    scale_bar.setStyle("Single Box")
    scale_bar.setLinkedMap(map_item)
    kilometres = extent.width() > 4000.0
    scale_bar.setUnits(QgsUnitTypes.DistanceKilometers if kilometres else QgsUnitTypes.DistanceMeters)
    scale_bar.setUnitLabel(_tr("km") if kilometres else _tr("m"))
    scale_bar.applyDefaultSize(scale_bar.units())
    layout.addLayoutItem(scale_bar)
    scale_bar.attemptMove(QgsLayoutPoint(MARGIN, map_top + map_height + 3.0, mm))
    scale_bar.refresh()

    # The caution sits below whichever is lower: scale bar or legend.
    content_bottom = max(
        scale_bar.pos().y() + scale_bar.rect().height(),
        legend.pos().y() + legend.rect().height(),
    )
    caution = _label(layout, QCoreApplication.translate("ReliefGravityAlgorithm", CAUTION), 7)
    caution.setHAlign(Qt.AlignLeft)
    caution.attemptMove(QgsLayoutPoint(MARGIN, content_bottom + 4.0, mm))
    caution.attemptResize(QgsLayoutSize(PAGE_WIDTH - 2 * MARGIN, CAUTION_HEIGHT, mm))
    page_height = content_bottom + 4.0 + CAUTION_HEIGHT + MARGIN
    layout.pageCollection().page(0).setPageSize(QgsLayoutSize(PAGE_WIDTH, page_height, mm))

    dpi = width_px / PAGE_WIDTH * 25.4
    settings = QgsLayoutExporter.ImageExportSettings()
    settings.dpi = dpi
    settings.generateWorldFile = False
    # Exact pixel size: mm -> px rounding would otherwise lose a pixel.
    settings.imageSize = QSize(int(width_px), int(round(page_height / 25.4 * dpi)))
    png_path.parent.mkdir(parents=True, exist_ok=True)
    # After writing, QGIS 3.22 always reopens the image through GDAL for
    # update (georeference/metadata); GDAL's PNG driver refuses and prints
    # "ERROR 6" although the PNG is complete. Silence that one call.
    from osgeo import gdal

    gdal.PushErrorHandler("CPLQuietErrorHandler")
    try:
        status = QgsLayoutExporter(layout).exportToImage(str(png_path), settings)
    finally:
        gdal.PopErrorHandler()
    if status != QgsLayoutExporter.Success:
        raise RuntimeError(_tr("Could not write the map image {} (layout export status {}).").format(png_path, status))
    return png_path
