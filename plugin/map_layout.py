# SPDX-License-Identifier: GPL-2.0-or-later
"""The anomaly map page as a QGIS print layout: one builder for the PNG renderer and the shipped template.

Items (ids in brackets, stable: the template and users' own scripts find them
by id): title (``title``), map (``main_map``) with exterior coordinate ticks
and annotations in the map's CRS, the CRS name under it (``crs``), a north
arrow (``north_arrow``), a scale bar (``scale_bar``), the colour bar (a
generated SVG ``colour_bar`` for the PNG; QGIS's continuous legend in the
template), the legend of contours and stations (``legend``), the caption
(``caption``: density, standard, contour interval, station count, date) and
a one-line caution (``caution``).

The caption label shows the project variable ``relief_gravity_caption`` and
a fill-in text when it is not set, so the same label serves the template.
"""

from __future__ import annotations

from qgis.core import (
    QgsApplication,
    QgsLayoutItemLabel,
    QgsLayoutItemLegend,
    QgsLayoutItemMap,
    QgsLayoutItemMapGrid,
    QgsLayoutItemPicture,
    QgsLayoutItemScaleBar,
    QgsLayoutPoint,
    QgsLayoutSize,
    QgsPrintLayout,
    QgsScaleBarSettings,
    QgsTextFormat,
    QgsUnitTypes,
)
from qgis.PyQt.QtCore import QCoreApplication, Qt
from qgis.PyQt.QtGui import QColor, QFont

#: Page geometry in millimetres (common cartographic proportions, no source).
MARGIN = 8.0
TITLE_HEIGHT = 11.0
ANNOTATION_SPACE = 7.0
SIDE_WIDTH = 46.0
GAP = 6.0
NORTH_SIZE = (9.0, 14.0)
TEXT_LINE = 4.6

#: QGIS's own north arrow (shipped with every QGIS; stored relative in templates).
NORTH_ARROW_SVG = "arrows/NorthArrow_02.svg"
#: Project variable read by the caption label.
CAPTION_VARIABLE = "relief_gravity_caption"


def _tr(text: str) -> str:
    return QCoreApplication.translate("AnomalyMap", text)


def short_caution() -> str:
    """The one-line caution printed on every map."""
    return _tr(
        "Interpretation aid only: check against the survey's own ties. Drilling, groundwater and "
        "engineering decisions follow local codes and licensed practice."
    )


def caption_expression() -> str:
    """Label text: the project's caption variable, or a fill-in line with today's date."""
    fill_in = _tr("Reduction density … kg/m³ · standard … · contour interval … mGal · … stations · ")
    return "[% coalesce(@{}, '{}' || format_date(now(), 'yyyy-MM-dd')) %]".format(
        CAPTION_VARIABLE, fill_in.replace("'", "''")
    )


def _font(size_pt: float, bold: bool = False) -> QFont:
    font = QFont()
    font.setPointSizeF(size_pt)
    font.setBold(bold)
    return font


def _label(layout, item_id, text, size_pt, bold=False):
    item = QgsLayoutItemLabel(layout)
    item.setId(item_id)
    item.setText(text)
    item.setFont(_font(size_pt, bold))
    item.setFontColor(QColor(30, 30, 30))
    item.setHAlign(Qt.AlignLeft)
    layout.addLayoutItem(item)
    return item


def _place(item, x, y, width=None, height=None):
    mm = QgsUnitTypes.LayoutMillimeters
    item.attemptMove(QgsLayoutPoint(x, y, mm))
    if width is not None:
        item.attemptResize(QgsLayoutSize(width, height, mm))


def _coordinate_grid(map_item, crs):
    """Exterior ticks with coordinates on the left and bottom edges, spaced 25-60 mm."""
    grid = QgsLayoutItemMapGrid("coordinates", map_item)
    if crs.isValid():
        grid.setCrs(crs)
    grid.setStyle(QgsLayoutItemMapGrid.FrameAnnotationsOnly)
    grid.setFrameStyle(QgsLayoutItemMapGrid.ExteriorTicks)
    grid.setFrameWidth(1.6)
    grid.setFramePenSize(0.25)
    grid.setUnits(QgsLayoutItemMapGrid.DynamicPageSizeBased)
    grid.setMinimumIntervalWidth(25.0)
    grid.setMaximumIntervalWidth(60.0)
    grid.setAnnotationEnabled(True)
    grid.setAnnotationFormat(QgsLayoutItemMapGrid.Decimal)
    grid.setAnnotationPrecision(0)
    text = QgsTextFormat()
    text.setFont(_font(7.0))
    text.setSize(7.0)
    text.setColor(QColor(30, 30, 30))
    grid.setAnnotationTextFormat(text)
    grid.setAnnotationFrameDistance(1.0)
    for side in (QgsLayoutItemMapGrid.Right, QgsLayoutItemMapGrid.Top):
        grid.setAnnotationDisplay(QgsLayoutItemMapGrid.HideAll, side)
    grid.setAnnotationPosition(QgsLayoutItemMapGrid.OutsideMapFrame, QgsLayoutItemMapGrid.Left)
    grid.setAnnotationPosition(QgsLayoutItemMapGrid.OutsideMapFrame, QgsLayoutItemMapGrid.Bottom)
    grid.setAnnotationDirection(QgsLayoutItemMapGrid.Vertical, QgsLayoutItemMapGrid.Left)
    grid.setAnnotationDirection(QgsLayoutItemMapGrid.Horizontal, QgsLayoutItemMapGrid.Bottom)
    map_item.grids().addGrid(grid)
    return grid


def build_layout(project, crs, extent, map_width, map_height, title, colour_bar=None, legend_layers=None,
                 kilometres=True):
    """A print layout holding every element of the anomaly map.

    Parameters
    ----------
    project : QgsProject
    crs : QgsCoordinateReferenceSystem
        CRS of the map and of its coordinate ticks.
    extent : QgsRectangle
        Map extent (in ``crs``).
    map_width, map_height : float
        Size of the map frame (mm).
    title : str
    colour_bar : (str, float, float), optional
        Path of the colour-bar SVG and its size (mm); when None the legend
        also shows the raster's continuous colour ramp (template use).
    legend_layers : list of QgsMapLayer, optional
        Layers the legend shows (default: the project's).
    kilometres : bool
        Scale bar in km (else metres).

    Returns
    -------
    (QgsPrintLayout, float)
        The layout and the page height (mm); the page is
        ``map_width + SIDE_WIDTH + ...`` wide.
    """
    mm = QgsUnitTypes.LayoutMillimeters
    layout = QgsPrintLayout(project)
    layout.initializeDefaults()
    layout.setName(_tr("Anomaly map"))
    map_left = MARGIN + ANNOTATION_SPACE
    map_top = MARGIN + TITLE_HEIGHT
    side_left = map_left + map_width + GAP
    page_width = side_left + SIDE_WIDTH + MARGIN

    heading = _label(layout, "title", title, 15, bold=True)
    _place(heading, MARGIN, MARGIN - 1.0, page_width - 2 * MARGIN, TITLE_HEIGHT)

    map_item = QgsLayoutItemMap(layout)
    map_item.setId("main_map")
    _place(map_item, map_left, map_top, map_width, map_height)
    if crs.isValid():  # the template leaves it unset: the map follows the project's CRS
        map_item.setCrs(crs)
    map_item.setExtent(extent)
    map_item.setFrameEnabled(True)
    layout.addLayoutItem(map_item)
    _coordinate_grid(map_item, crs)

    below = map_top + map_height + ANNOTATION_SPACE
    crs_label = _label(
        layout,
        "crs",
        _tr("Coordinates: {} ({}), {}").format(
            "[% item_variables('main_map')['map_crs_description'] %]",
            "[% item_variables('main_map')['map_crs'] %]",
            "[% item_variables('main_map')['map_units'] %]",
        ),
        7,
    )
    _place(crs_label, map_left, below, map_width, TEXT_LINE)

    scale_bar = QgsLayoutItemScaleBar(layout)
    scale_bar.setId("scale_bar")
    scale_bar.setStyle("Single Box")
    scale_bar.setLinkedMap(map_item)
    scale_bar.setUnits(QgsUnitTypes.DistanceKilometers if kilometres else QgsUnitTypes.DistanceMeters)
    scale_bar.setUnitLabel(_tr("km") if kilometres else _tr("m"))
    scale_bar.applyDefaultSize(scale_bar.units())
    # Segments sized to fit 15-30 mm whatever the extent, so the template's bar follows the user's map.
    scale_bar.setSegmentSizeMode(QgsScaleBarSettings.SegmentSizeFitWidth)
    scale_bar.setMinimumBarWidth(15.0)
    scale_bar.setMaximumBarWidth(30.0)
    scale_bar.setNumberOfSegments(2)
    scale_bar.setNumberOfSegmentsLeft(0)
    bar_text = QgsTextFormat()
    bar_text.setFont(_font(7.5))
    bar_text.setSize(7.5)
    scale_bar.setTextFormat(bar_text)
    layout.addLayoutItem(scale_bar)
    _place(scale_bar, map_left, below + TEXT_LINE + 1.0)
    scale_bar.refresh()
    scale_bottom = scale_bar.pos().y() + scale_bar.rect().height()

    north = QgsLayoutItemPicture(layout)
    north.setId("north_arrow")
    north.setPicturePath(_north_arrow_path())
    north.setLinkedMap(map_item)
    north.setNorthMode(QgsLayoutItemPicture.GridNorth)
    north.setResizeMode(QgsLayoutItemPicture.Zoom)
    layout.addLayoutItem(north)
    _place(north, side_left, map_top, *NORTH_SIZE)

    side_top = map_top + NORTH_SIZE[1] + 5.0
    if colour_bar is not None:
        svg_path, bar_width, bar_height = colour_bar
        bar = QgsLayoutItemPicture(layout)
        bar.setId("colour_bar")
        bar.setPicturePath(str(svg_path))
        bar.setResizeMode(QgsLayoutItemPicture.Zoom)
        layout.addLayoutItem(bar)
        _place(bar, side_left, side_top, bar_width, bar_height)
        side_top += bar_height + 5.0

    legend = QgsLayoutItemLegend(layout)
    legend.setId("legend")
    legend.setTitle("")
    legend.setLinkedMap(map_item)
    legend.setLegendFilterByMapEnabled(False)
    legend.setResizeToContents(True)
    legend.setBackgroundEnabled(False)
    if legend_layers is not None:
        legend.setAutoUpdateModel(False)
        root = legend.model().rootGroup()
        keep = {layer.id() for layer in legend_layers}
        for node in list(root.findLayers()):
            if node.layerId() not in keep:
                node.parent().removeChildNode(node)
    layout.addLayoutItem(legend)
    _place(legend, side_left, side_top)
    legend.adjustBoxSize()
    side_bottom = legend.pos().y() + legend.rect().height()

    text_top = max(scale_bottom + 3.0, side_bottom + 3.0)
    caption = _label(layout, "caption", caption_expression(), 7.5)
    _place(caption, MARGIN, text_top, page_width - 2 * MARGIN, 2 * TEXT_LINE)
    caution = _label(layout, "caution", short_caution(), 7)
    caution.setFontColor(QColor(90, 30, 20))
    _place(caution, MARGIN, text_top + 2 * TEXT_LINE, page_width - 2 * MARGIN, TEXT_LINE)
    page_height = text_top + 3 * TEXT_LINE + MARGIN
    layout.pageCollection().page(0).setPageSize(QgsLayoutSize(page_width, page_height, mm))
    return layout, page_width, page_height


def write_layout_template(path) -> bool:
    """Write the print layout template (``.qpt``) with every element and no layer paths.

    The map has no CRS of its own (it follows the project's), no layer list
    (it draws the project's layers) and a placeholder extent; the legend
    follows the project's layers, so the raster's continuous colour ramp
    stands in for the generated colour bar.
    """
    from qgis.core import QgsCoordinateReferenceSystem, QgsProject, QgsReadWriteContext, QgsRectangle

    project = QgsProject()
    layout, _, _ = build_layout(
        project, QgsCoordinateReferenceSystem(), QgsRectangle(0, 0, 10000, 8000), 190.0, 152.0,
        _tr("Complete Bouguer anomaly"),
    )
    return layout.saveAsTemplate(str(path), QgsReadWriteContext())


def _north_arrow_path() -> str:
    """Full path of QGIS's north arrow SVG (templates store it relative)."""
    from pathlib import Path

    for folder in QgsApplication.svgPaths():
        candidate = Path(folder) / NORTH_ARROW_SVG
        if candidate.exists():
            return str(candidate)
    return NORTH_ARROW_SVG
