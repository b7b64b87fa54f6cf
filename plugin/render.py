# SPDX-License-Identifier: GPL-2.0-or-later
"""A PNG of the anomaly map, rendered headless.

Smooth raster, index contours, stations, colour bar with round ticks,
coordinate ticks and CRS, north arrow, scale bar, caption.

Built as a QGIS print layout (:mod:`.map_layout`) in a private project, so the
user's project is never touched and the same code works in the desktop, in
qgis_process and in a plain script (``QT_QPA_PLATFORM=offscreen``).
"""

from __future__ import annotations

import datetime as _dt
import shutil
import tempfile
from pathlib import Path

from qgis.core import (
    QgsExpressionContextUtils,
    QgsFillSymbol,
    QgsLayoutExporter,
    QgsMarkerSymbol,
    QgsProject,
    QgsRasterLayer,
    QgsSingleSymbolRenderer,
    QgsVectorLayer,
)
from qgis.PyQt.QtCore import QCoreApplication, QSize

from . import colour_bar as bar
from .map_layout import ANNOTATION_SPACE, CAPTION_VARIABLE, GAP, MARGIN, SIDE_WIDTH, build_layout
from .provenance import read_record
from .run_facts import RunFacts, interval_from_levels, run_facts, standard_text
from .styling import INDEX_EVERY, UNITS, set_smooth_resampling, style_anomaly_raster, style_contours

#: Page width in millimetres; the map frame takes what the side column leaves.
PAGE_WIDTH = 270.0
MAX_MAP_HEIGHT = 200.0


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


def _source_path(source):
    if source is None:
        return None
    return str(source) if isinstance(source, (str, Path)) else source.source()


def _outline_symbol():
    """Dashed dark outline without fill, readable over any colour of the anomaly ramp."""
    return QgsFillSymbol.createSimple(
        {"color": "0,0,0,0", "style": "no", "outline_color": "25,25,25", "outline_width": "0.45",
         "outline_style": "dash"}
    )


def _station_symbol():
    return QgsMarkerSymbol.createSimple(
        {"name": "circle", "color": "20,20,20,255", "outline_color": "255,255,255,255",
         "outline_width": "0.2", "size": "1.5"}
    )


def _format_number(value: float) -> str:
    return f"{value:.6g}"


def map_caption(facts: RunFacts, station_count: int | None, interval: float | None, today: str) -> str:
    """The caption line: density, standard, contour interval, station count and date (with fall-backs)."""
    parts = [
        _tr("Reduction density {} kg/m³").format(_format_number(facts.density))
        if facts.density is not None
        else _tr("reduction density not recorded"),
        standard_text(facts) or _tr("reduction standard not recorded"),
        _tr("contour interval {} mGal (index contours every {} mGal, labelled)").format(
            _format_number(interval), _format_number(INDEX_EVERY * interval)
        )
        if interval
        else _tr("no contours"),
        _tr("{} stations").format(station_count) if station_count is not None else _tr("stations not shown"),
        _tr("reduced {}").format(facts.date) if facts.date else _tr("map drawn {}").format(today),
    ]
    text = " · ".join(parts)
    return text[:1].upper() + text[1:]


def _colour_bar_svg(raster, folder: Path):
    renderer = raster.renderer()
    items = renderer.shader().rasterShaderFunction().colorRampItemList()
    stops = [(item.value, item.color.name()) for item in items]
    svg = bar.colour_bar_svg(stops, renderer.classificationMin(), renderer.classificationMax(), UNITS)
    path = folder / "colour_bar.svg"
    path.write_text(svg, encoding="utf-8")
    width, height = bar.colour_bar_size()
    return path, width, height


def render_anomaly_map(
    raster_path,
    png_path,
    contours=None,
    stations=None,
    title: str | None = None,
    width_px: int = 1600,
    smooth: bool = True,
    outlines=None,
    outlines_label: str | None = None,
) -> Path:
    """Render the anomaly map to ``png_path`` and return its path.

    The page is always :data:`PAGE_WIDTH` mm wide and ``width_px`` only sets
    the resolution, so text, legend and map keep their proportions at any
    image size. The caption reads the provenance records of the raster and
    the stations (density, standard, contour interval, date); what they do
    not hold is said ("not recorded") or taken from the layers (contour
    interval from the contour levels, station count from the station layer,
    today's date as the drawing date).

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
    smooth : bool
        Bilinear display resampling (default); False shows the cells.
    outlines : str, Path or QgsVectorLayer, optional
        Polygons drawn as dashed outlines over the anomaly (e.g. mapped
        geology), a layer URI with a subset filter works too.
    outlines_label : str, optional
        Legend entry of the outlines (default "Outlines").
    """
    png_path = Path(png_path)
    project = QgsProject()
    raster = _as_layer(raster_path, "raster", _tr("Anomaly (mGal)"))
    style_anomaly_raster(raster, _tr("Anomaly (mGal)"))
    set_smooth_resampling(raster, smooth)
    layers = [raster]
    contour_layer = _as_layer(contours, "vector", _tr("Contours (mGal)"))
    if contour_layer is not None:
        style_contours(contour_layer, _tr("Contours (mGal)"))
        layers.insert(0, contour_layer)
    outline_layer = _as_layer(outlines, "vector", outlines_label or _tr("Outlines"))
    if outline_layer is not None:
        outline_layer.setRenderer(QgsSingleSymbolRenderer(_outline_symbol()))
        layers.insert(0, outline_layer)
    station_layer = _as_layer(stations, "vector", _tr("Stations"))
    if station_layer is not None:
        station_layer.setRenderer(QgsSingleSymbolRenderer(_station_symbol()))
        layers.insert(0, station_layer)
    # Added bottom layer first: the layer tree (and so the legend) then lists
    # stations, contours, raster from the top.
    project.addMapLayers(list(reversed(layers)))
    project.setCrs(raster.crs())

    records = [read_record(path) for path in (_source_path(raster_path), _source_path(stations)) if path]
    facts = run_facts(records)
    interval = facts.contour_interval
    if contour_layer is not None and not interval:
        interval = interval_from_levels(feature["value"] for feature in contour_layer.getFeatures())
    if contour_layer is None:
        interval = None
    count = station_layer.featureCount() if station_layer is not None else None
    today = _dt.date.today().isoformat()
    QgsExpressionContextUtils.setProjectVariable(project, CAPTION_VARIABLE, map_caption(facts, count, interval, today))

    extent = raster.extent()
    map_width = PAGE_WIDTH - 2 * MARGIN - ANNOTATION_SPACE - GAP - SIDE_WIDTH
    map_height = map_width * extent.height() / extent.width()
    if map_height > MAX_MAP_HEIGHT:  # tall survey: keep the page printable
        map_width *= MAX_MAP_HEIGHT / map_height
        map_height = MAX_MAP_HEIGHT

    work = Path(tempfile.mkdtemp(prefix="relief_gravity_map_"))
    try:
        layout, page_width, page_height = build_layout(
            project,
            raster.crs(),
            extent,
            map_width,
            map_height,
            title or _tr("Complete Bouguer anomaly"),
            colour_bar=_colour_bar_svg(raster, work),
            legend_layers=layers[:-1],
            kilometres=extent.width() > 4000.0,
        )
        layout.itemById("main_map").setLayers(layers)
        dpi = width_px / page_width * 25.4
        settings = QgsLayoutExporter.ImageExportSettings()
        settings.dpi = dpi
        settings.generateWorldFile = False
        # Exact pixel size: mm -> px rounding would otherwise lose a pixel.
        settings.imageSize = QSize(int(width_px), int(round(page_height / 25.4 * dpi)))
        png_path.parent.mkdir(parents=True, exist_ok=True)
        export_png(layout, png_path, settings)
    finally:
        shutil.rmtree(work, ignore_errors=True)
    return png_path


def export_png(layout, png_path, settings=None) -> None:
    """Export a layout to PNG, raising RuntimeError when QGIS reports a failure."""
    # After writing, QGIS 3.22 always reopens the image through GDAL for
    # update (georeference/metadata); GDAL's PNG driver refuses and prints
    # "ERROR 6" although the PNG is complete. Silence that one call.
    from osgeo import gdal

    settings = settings or QgsLayoutExporter.ImageExportSettings()
    gdal.PushErrorHandler("CPLQuietErrorHandler")
    try:
        status = QgsLayoutExporter(layout).exportToImage(str(png_path), settings)
    finally:
        gdal.PopErrorHandler()
    if status != QgsLayoutExporter.Success:
        raise RuntimeError(_tr("Could not write the map image {} (layout export status {}).").format(png_path, status))
