# SPDX-License-Identifier: GPL-2.0-or-later
"""The shipped print layout template loads into a QgsPrintLayout and exports a PNG (invented data)."""

from __future__ import annotations

from pathlib import Path

import numpy as np
import pytest

from relief_gravity.plugin.map_layout import CAPTION_VARIABLE

TEMPLATE = Path(__file__).resolve().parents[2] / "plugin" / "layouts" / "anomaly_map.qpt"

TEMPLATE_IDS = ("title", "main_map", "crs", "scale_bar", "north_arrow", "legend", "caption", "caution")


@pytest.fixture(scope="module")
def mapped(provider, tmp_path_factory, points_writer):
    import processing

    folder = tmp_path_factory.mktemp("template")
    rng = np.random.default_rng(11)
    x = 600_000.0 + rng.uniform(0, 5000, 80)
    y = 4_000_000.0 + rng.uniform(0, 5000, 80)
    cba = -12.0 * np.exp(-((x - 602_500) ** 2 + (y - 4_002_500) ** 2) / (2 * 1000.0**2)) + 0.002 * (y - 4_000_000)
    points_writer(folder / "stations.gpkg", x, y, {"cba": [float(v) for v in cba]}, epsg=32633)
    processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": str(folder / "stations.gpkg"), "FIELD": "cba", "CONTOUR_INTERVAL": 1.0,
         "OUTPUT": str(folder / "cba.tif"), "CONTOURS": str(folder / "contours.gpkg")},
    )
    return folder


def test_template_has_no_machine_paths():
    from relief_gravity.plugin.map_layout import NORTH_ARROW_SVG


    text = TEMPLATE.read_text(encoding="utf-8")
    assert "/tmp" not in text and "/work" not in text and "/home" not in text
    assert f'file="{NORTH_ARROW_SVG}"' in text  # QGIS's own arrow, stored relative
    assert "<Layer " not in text  # no layer ids or sources: the map draws the user's project


def test_template_loads_and_exports(provider, mapped, tmp_path):
    from qgis.core import (
        QgsExpressionContextUtils,
        QgsLayoutItemPicture,
        QgsPrintLayout,
        QgsProject,
        QgsRasterLayer,
        QgsReadWriteContext,
        QgsVectorLayer,
    )
    from qgis.PyQt.QtGui import QImage
    from qgis.PyQt.QtXml import QDomDocument

    from relief_gravity.plugin.render import export_png
    from relief_gravity.plugin.styling import style_anomaly_raster, style_contours

    project = QgsProject()
    raster = QgsRasterLayer(str(mapped / "cba.tif"), "cba")
    style_anomaly_raster(raster)
    contours = QgsVectorLayer(str(mapped / "contours.gpkg"), "contours", "ogr")
    style_contours(contours)
    stations = QgsVectorLayer(str(mapped / "stations.gpkg"), "stations", "ogr")
    project.addMapLayers([raster, contours, stations])
    project.setCrs(raster.crs())
    QgsExpressionContextUtils.setProjectVariable(project, CAPTION_VARIABLE, "Reduction density 2670 kg/m³ · test")

    document = QDomDocument()
    assert document.setContent(TEMPLATE.read_text(encoding="utf-8"))
    layout = QgsPrintLayout(project)
    items, ok = layout.loadFromTemplate(document, QgsReadWriteContext())
    assert ok and items
    for item_id in TEMPLATE_IDS:
        assert layout.itemById(item_id) is not None, item_id
    main_map = layout.itemById("main_map")
    main_map.setLayers([stations, contours, raster])
    main_map.zoomToExtent(raster.extent())
    assert len(main_map.grids().asList()) == 1
    north = layout.itemById("north_arrow")
    assert isinstance(north, QgsLayoutItemPicture) and north.linkedMap() is main_map
    assert layout.itemById("scale_bar").linkedMap() is main_map
    assert layout.itemById("caption").currentText() == "Reduction density 2670 kg/m³ · test"
    assert "EPSG:32633" in layout.itemById("crs").currentText()

    png = tmp_path / "template.png"
    export_png(layout, png)
    image = QImage(str(png)).convertToFormat(QImage.Format_RGB32)
    assert image.width() > 500
    raw = np.frombuffer(image.constBits().asstring(image.sizeInBytes()), dtype=np.uint32)
    raw = raw.reshape(image.height(), image.bytesPerLine() // 4)[:, : image.width()] & 0xFFFFFF
    colours, counts = np.unique(raw, return_counts=True)
    assert colours.size > 200  # the ramp is drawn, not an empty page
    assert counts.max() < 0.8 * raw.size
