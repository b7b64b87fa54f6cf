# SPDX-License-Identifier: GPL-2.0-or-later
"""Styles applied on load (layer post-processors), the shipped .qml files, and the PNG map.

Data are invented (two Gaussian bodies on a gradient). The references are
QGIS's own: its built-in "Spectral" ramp (QgsStyle.defaultStyle(), QGIS
3.22) and numpy's percentiles of the raster read back with GDAL.
"""

from __future__ import annotations

import numpy as np
import pytest
from osgeo import gdal

gdal.UseExceptions()


@pytest.fixture(scope="module")
def anomaly_stations(tmp_path_factory, points_writer):
    folder = tmp_path_factory.mktemp("render")
    rng = np.random.default_rng(5)
    x = 500_000.0 + rng.uniform(0, 6000, 120)
    y = 5_000_000.0 + rng.uniform(0, 4000, 120)
    cba = (
        -15.0 * np.exp(-((x - 502_000) ** 2 + (y - 5_002_000) ** 2) / (2 * 900.0**2))
        + 8.0 * np.exp(-((x - 504_500) ** 2 + (y - 5_001_500) ** 2) / (2 * 700.0**2))
        + 0.001 * (x - 500_000)
    )
    points_writer(folder / "stations.gpkg", x, y, {"cba": [float(v) for v in cba]}, epsg=32633)
    return folder


@pytest.fixture(scope="module")
def gridded(provider, anomaly_stations):
    import processing

    folder = anomaly_stations
    processing.run(
        "reliefgravity:anomalygrid",
        {
            "INPUT": str(folder / "stations.gpkg"),
            "FIELD": "cba",
            "CONTOUR_INTERVAL": 2.0,
            "OUTPUT": str(folder / "cba.tif"),
            "CONTOURS": str(folder / "contours.gpkg"),
        },
    )
    return folder


def valid_values(path):
    dataset = gdal.Open(str(path))  # keep the dataset alive while its band is used
    band = dataset.GetRasterBand(1)
    data = band.ReadAsArray().astype(float)
    return data[data != band.GetNoDataValue()]


def spectral_inverted():
    from qgis.core import QgsStyle

    ramp = QgsStyle.defaultStyle().colorRamp("Spectral")
    ramp.invert()
    return ramp


def check_raster_style(layer, values):
    from qgis.core import QgsColorRampShader, QgsSingleBandPseudoColorRenderer

    renderer = layer.renderer()
    assert isinstance(renderer, QgsSingleBandPseudoColorRenderer)
    shader = renderer.shader().rasterShaderFunction()
    assert shader.colorRampType() == QgsColorRampShader.Interpolated
    items = shader.colorRampItemList()
    assert len(items) == 11
    stops = [item.value for item in items]
    np.testing.assert_allclose(stops, np.percentile(values, np.linspace(2, 98, 11)), rtol=1e-9)
    assert shader.minimumValue() == pytest.approx(np.percentile(values, 2))
    assert shader.maximumValue() == pytest.approx(np.percentile(values, 98))
    ramp = spectral_inverted()
    assert items[0].color.name() == ramp.color(0.0).name()
    assert items[-1].color.name() == ramp.color(1.0).name()


def test_styles_applied_when_loaded(provider, anomaly_stations, qgis_new_project, tmp_path):
    import processing
    from qgis.core import QgsProject, QgsRasterLayer, QgsVectorLayer

    from relief_gravity.plugin import styling

    held_before = len(styling._POST_PROCESSORS)
    processing.runAndLoadResults(
        "reliefgravity:anomalygrid",
        {
            "INPUT": str(anomaly_stations / "stations.gpkg"),
            "FIELD": "cba",
            "CONTOUR_INTERVAL": 2.0,
            "OUTPUT": str(tmp_path / "loaded.tif"),
            "CONTOURS": str(tmp_path / "loaded_contours.gpkg"),
        },
    )
    # One processor per output, held by the module, not by the algorithm clone.
    assert len(styling._POST_PROCESSORS) == held_before + 2
    layers = list(QgsProject.instance().mapLayers().values())
    rasters = [layer for layer in layers if isinstance(layer, QgsRasterLayer)]
    vectors = [layer for layer in layers if isinstance(layer, QgsVectorLayer)]
    assert len(rasters) == 1 and len(vectors) == 1
    raster, contours = rasters[0], vectors[0]
    check_raster_style(raster, valid_values(tmp_path / "loaded.tif"))
    assert raster.metadata().keywords()["units"] == ["mGal"]
    assert "mGal" in raster.metadata().title() and "mGal" in raster.abstract()
    assert "minimum curvature" in raster.metadata().abstract()
    assert contours.labelsEnabled()
    settings = contours.labeling().settings()
    assert settings.isExpression
    # The label expression shows the value without trailing zeros.
    from qgis.core import QgsExpression, QgsExpressionContext, QgsExpressionContextUtils

    feature = next(contours.getFeatures())
    context = QgsExpressionContext(QgsExpressionContextUtils.globalProjectLayerScopes(contours))
    context.setFeature(feature)
    label = QgsExpression(settings.fieldName).evaluate(context)
    assert float(label.replace(",", "")) == feature["value"]
    assert not label.endswith(".000")


def test_plain_run_attaches_no_style(provider, anomaly_stations, tmp_path):
    import processing

    from relief_gravity.plugin import styling

    held_before = len(styling._POST_PROCESSORS)
    processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": str(anomaly_stations / "stations.gpkg"), "FIELD": "cba", "OUTPUT": str(tmp_path / "plain.tif")},
    )
    assert len(styling._POST_PROCESSORS) == held_before  # nothing is loaded, nothing to style


def test_shipped_qml_files_load(provider, gridded):
    from qgis.core import QgsRasterLayer, QgsSingleBandPseudoColorRenderer, QgsVectorLayer

    from relief_gravity.plugin.styling import CONTOURS_QML, RASTER_QML

    raster = QgsRasterLayer(str(gridded / "cba.tif"), "cba")
    message, ok = raster.loadNamedStyle(str(RASTER_QML))
    assert ok, message
    assert isinstance(raster.renderer(), QgsSingleBandPseudoColorRenderer)
    assert len(raster.renderer().shader().rasterShaderFunction().colorRampItemList()) == 11
    contours = QgsVectorLayer(str(gridded / "contours.gpkg"), "contours", "ogr")
    message, ok = contours.loadNamedStyle(str(CONTOURS_QML))
    assert ok, message
    assert contours.labelsEnabled()


def test_rendered_png_shows_the_ramp(provider, gridded, tmp_path):
    from qgis.PyQt.QtGui import QImage

    from relief_gravity.plugin.render import render_anomaly_map

    png = render_anomaly_map(
        gridded / "cba.tif",
        tmp_path / "map.png",
        contours=gridded / "contours.gpkg",
        stations=gridded / "stations.gpkg",
        width_px=900,
    )
    assert png.exists() and png.stat().st_size > 10_000
    image = QImage(str(png)).convertToFormat(QImage.Format_RGB32)
    assert image.width() == 900
    # QImage RGB32 is 0xffRRGGBB per pixel; drop alpha.
    pixels = np.frombuffer(image.constBits().asstring(image.sizeInBytes()), dtype=np.uint32)
    pixels = pixels.reshape(image.height(), image.bytesPerLine() // 4)[:, : image.width()] & 0xFFFFFF
    colours, counts = np.unique(pixels, return_counts=True)
    assert colours.size > 200  # a ramp, labels and antialiasing: not a flat image
    assert counts.max() < 0.6 * pixels.size  # the white page does not fill the image
    ramp = spectral_inverted()
    for end in (ramp.color(0.0), ramp.color(1.0)):
        rgb = (end.red() << 16) | (end.green() << 8) | end.blue()
        # Cells beyond the 2-98 % stretch take the end colours exactly.
        assert counts[colours == rgb].sum() > 50, end.name()
    # A middle colour of the ramp is there too (yellow of Spectral).
    middle = ramp.color(0.5)
    rgb_mid = np.array([middle.red(), middle.green(), middle.blue()])
    rgb_all = np.stack([(colours >> 16) & 255, (colours >> 8) & 255, colours & 255], axis=1)
    assert (np.abs(rgb_all - rgb_mid).max(axis=1) <= 12).any()
