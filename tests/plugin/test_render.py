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
    # Linear stretch between numpy's 2nd and 98th percentiles (numpy 1.24, Debian).
    low, high = np.percentile(values, [2, 98])
    np.testing.assert_allclose([item.value for item in items], np.linspace(low, high, 11), rtol=1e-9)
    assert shader.minimumValue() == pytest.approx(low)
    assert shader.maximumValue() == pytest.approx(high)
    assert shader.legendSettings().useContinuousLegend()
    assert shader.legendSettings().suffix().strip() == "mGal"
    ramp = spectral_inverted()
    assert items[0].color.name() == ramp.color(0.0).name()
    assert items[-1].color.name() == ramp.color(1.0).name()
    resampler = layer.resampleFilter()
    assert resampler.zoomedInResampler().type() == "bilinear"
    assert resampler.zoomedOutResampler().type() == "bilinear"


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
    (rule,) = contours.labeling().rootRule().children()  # index contours only
    settings = rule.settings()
    assert settings.isExpression
    # The label expression shows the value without trailing zeros.
    from qgis.core import QgsExpression, QgsExpressionContext, QgsExpressionContextUtils

    feature = next(f for f in contours.getFeatures() if f["value"] != 0)
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


def test_shipped_raster_qml_stretches_to_the_data_it_is_applied_to(provider, gridded, tmp_path):
    """The .qml carries no value range: QGIS computes the 2-98 % cut of the raster it styles when it draws."""
    from qgis.core import QgsMapRendererSequentialJob, QgsMapSettings, QgsRasterLayer, QgsSingleBandPseudoColorRenderer
    from qgis.PyQt.QtCore import QSize

    from relief_gravity.plugin.styling import RASTER_QML

    source = gdal.Open(str(gridded / "cba.tif"))
    band = source.GetRasterBand(1)
    nodata = band.GetNoDataValue()
    data = band.ReadAsArray().astype(float)
    scaled = np.where(data == nodata, nodata, 10.0 * data + 100.0)  # a range the style file never saw
    path = tmp_path / "scaled.tif"
    copy = gdal.GetDriverByName("GTiff").Create(str(path), source.RasterXSize, source.RasterYSize, 1, gdal.GDT_Float32)
    copy.SetGeoTransform(source.GetGeoTransform())
    copy.SetProjection(source.GetProjection())
    copy.GetRasterBand(1).SetNoDataValue(nodata)
    copy.GetRasterBand(1).WriteArray(scaled)
    copy = source = None

    layer = QgsRasterLayer(str(path), "scaled")
    message, ok = layer.loadNamedStyle(str(RASTER_QML))
    assert ok, message
    assert isinstance(layer.renderer(), QgsSingleBandPseudoColorRenderer)
    assert layer.resampleFilter().zoomedInResampler().type() == "bilinear"
    settings = QgsMapSettings()
    settings.setLayers([layer])
    settings.setDestinationCrs(layer.crs())
    settings.setExtent(layer.extent())
    settings.setOutputSize(QSize(300, 200))
    job = QgsMapRendererSequentialJob(settings)
    job.start()
    job.waitForFinished()
    renderer = layer.renderer()
    low, high = np.percentile(scaled[scaled != nodata], [2, 98])
    # QGIS's cumulative cut comes from its histogram (bins), numpy's from the sorted values:
    # agree to 1 % of the data range (measured: well inside).
    tolerance = 0.01 * (scaled[scaled != nodata].max() - scaled[scaled != nodata].min())
    assert abs(renderer.classificationMin() - low) < tolerance
    assert abs(renderer.classificationMax() - high) < tolerance
    items = renderer.shader().rasterShaderFunction().colorRampItemList()
    assert items[0].value == pytest.approx(renderer.classificationMin())
    assert items[-1].value == pytest.approx(renderer.classificationMax())


def test_shipped_contour_qml_marks_every_fifth_level(provider, gridded):
    from qgis.core import QgsExpression, QgsExpressionContext, QgsExpressionContextUtils, QgsVectorLayer

    from relief_gravity.plugin.styling import CONTOURS_QML, INDEX_CONTOUR_EXPRESSION

    contours = QgsVectorLayer(str(gridded / "contours.gpkg"), "contours", "ogr")
    message, ok = contours.loadNamedStyle(str(CONTOURS_QML))
    assert ok, message
    assert contours.labelsEnabled()
    rules = contours.renderer().rootRule().children()
    assert len(rules) == 2
    widths = sorted(rule.symbol().width() for rule in rules)
    assert widths[1] >= 2 * widths[0]  # index contours clearly heavier
    label_rules = contours.labeling().rootRule().children()
    assert [rule.filterExpression() for rule in label_rules] == [INDEX_CONTOUR_EXPRESSION]
    context = QgsExpressionContext(QgsExpressionContextUtils.globalProjectLayerScopes(contours))
    expression = QgsExpression(INDEX_CONTOUR_EXPRESSION)
    seen = {True: 0, False: 0}
    for feature in contours.getFeatures():
        context.setFeature(feature)
        is_index = bool(expression.evaluate(context))
        assert not expression.hasEvalError(), expression.evalErrorString()
        # Interval 2 mGal (the fixture's): index contours at multiples of 10 mGal.
        assert is_index == (abs(feature["value"] / 10.0 - round(feature["value"] / 10.0)) < 1e-9), feature["value"]
        seen[is_index] += 1
    assert seen[True] > 0 and seen[False] > seen[True]


def _pixels(png):
    from qgis.PyQt.QtGui import QImage

    image = QImage(str(png)).convertToFormat(QImage.Format_RGB32)
    raw = np.frombuffer(image.constBits().asstring(image.sizeInBytes()), dtype=np.uint32)
    raw = raw.reshape(image.height(), image.bytesPerLine() // 4)[:, : image.width()]
    return np.stack([(raw >> 16) & 255, (raw >> 8) & 255, raw & 255], axis=-1).astype(int)


def _ramp_samples(n=256):
    ramp = spectral_inverted()
    return np.array([[c.red(), c.green(), c.blue()] for c in (ramp.color(t) for t in np.linspace(0, 1, n))])


def find_colour_bar(rgb, samples, first_column, tolerance=6):
    """Longest vertical run of ramp-coloured pixels right of ``first_column``: the colour bar's column."""
    height, width, _ = rgb.shape
    best = (0, 0, 0)
    for col in range(first_column, width):
        column = rgb[:, col, :]
        distance = np.abs(column[:, None, :] - samples[None, :, :]).max(axis=2).min(axis=1)
        on_ramp = distance <= tolerance
        run = start = 0
        for row in range(height):
            if on_ramp[row]:
                if run == 0:
                    start = row
                run += 1
                if run > best[0]:
                    best = (run, col, start)
            else:
                run = 0
    return best


def test_rendered_map_has_a_continuous_colour_bar(provider, gridded, tmp_path):
    from relief_gravity.plugin import colour_bar
    from relief_gravity.plugin.render import PAGE_WIDTH, render_anomaly_map

    width_px = 1200
    png = render_anomaly_map(
        gridded / "cba.tif", tmp_path / "map.png", contours=gridded / "contours.gpkg",
        stations=gridded / "stations.gpkg", width_px=width_px,
    )
    rgb = _pixels(png)
    assert rgb.shape[1] == width_px
    samples = _ramp_samples()
    px_per_mm = width_px / PAGE_WIDTH
    from relief_gravity.plugin.map_layout import MARGIN, SIDE_WIDTH

    run, col, start = find_colour_bar(rgb, samples, int((PAGE_WIDTH - MARGIN - SIDE_WIDTH) * px_per_mm))
    # The bar (without its end triangles) is BAR_HEIGHT mm tall: its run is that long (+/- 4 %).
    assert run == pytest.approx(colour_bar.BAR_HEIGHT * px_per_mm, rel=0.04)
    strip = rgb[start : start + run, col, :]
    position = np.abs(strip[:, None, :] - samples[None, :, :]).max(axis=2).argmin(axis=1)
    # Continuous: many distinct colours, small steps, ramp position falling from top (high) to bottom (low).
    distinct = len({tuple(p) for p in strip})
    steps = np.abs(np.diff(strip, axis=0)).max(axis=1)
    print(f"colour bar: {run} px tall, {distinct} distinct colours, largest step {steps.max()}")
    assert distinct > 0.5 * run  # 11 class swatches would give 11 (measured: 274 of 274 px at 1200 px)
    assert steps.max() <= 8  # no swatch edges (measured: 3)
    assert position[0] > 240 and position[-1] < 15
    assert np.all(np.diff(position) <= 3)  # monotonic within sampling noise


def _map_window(rgb, png_width):
    from relief_gravity.plugin.map_layout import ANNOTATION_SPACE, GAP, MARGIN, SIDE_WIDTH, TITLE_HEIGHT
    from relief_gravity.plugin.render import PAGE_WIDTH

    px = png_width / PAGE_WIDTH
    left = MARGIN + ANNOTATION_SPACE
    width = PAGE_WIDTH - 2 * MARGIN - ANNOTATION_SPACE - GAP - SIDE_WIDTH
    x0, x1 = int((left + 0.15 * width) * px), int((left + 0.85 * width) * px)
    y0 = int((MARGIN + TITLE_HEIGHT) * px) + int(0.15 * width * px)
    return rgb[y0 : y0 + int(0.3 * width * px), x0:x1, :]


def test_rendered_map_is_resampled_smoothly(provider, gridded, tmp_path):
    """Bilinear display: neighbouring pixels change by small steps, unlike nearest-neighbour blocks."""
    from relief_gravity.plugin.render import render_anomaly_map

    figures = {}
    for smooth in (True, False):
        png = render_anomaly_map(gridded / "cba.tif", tmp_path / f"map_{smooth}.png", width_px=1200, smooth=smooth)
        window = _map_window(_pixels(png), 1200)
        jumps = np.abs(np.diff(window, axis=1)).max(axis=2)
        figures[smooth] = (float((jumps == 0).mean()), float(jumps[jumps > 0].mean()))
    print("identical neighbours, mean non-zero jump (bilinear, nearest):", figures)
    (same_smooth, jump_smooth), (same_blocky, jump_blocky) = figures[True], figures[False]
    # Cells are several pixels wide: nearest neighbour repeats a colour across each cell and
    # jumps at its edge; bilinear spreads the same change over the cell in small steps.
    assert same_blocky > 0.7
    assert same_smooth < 0.6 * same_blocky, figures
    assert jump_smooth < 0.6 * jump_blocky, figures


def test_outlines_are_drawn_dark_over_the_anomaly(provider, gridded, tmp_path):
    """A polygon layer (e.g. mapped geology) drawn as dashed dark outlines; a bad layer is a sentence."""
    from osgeo import ogr, osr

    from relief_gravity.plugin.render import render_anomaly_map

    path = tmp_path / "units.gpkg"
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("units", srs, ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("unit", ogr.OFTString))
    for unit, wkt in (("fill", "POLYGON ((501000 5001000, 503000 5001000, 503000 5003000, 501000 5003000, 501000 5001000))"),
                      ("rock", "POLYGON ((504000 5000500, 505500 5000500, 505500 5002500, 504000 5000500))")):
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("unit", unit)
        feature.SetGeometry(ogr.CreateGeometryFromWkt(wkt))
        layer.CreateFeature(feature)
    ds = layer = None
    plain = _pixels(render_anomaly_map(gridded / "cba.tif", tmp_path / "plain.png", width_px=1000))
    with_all = _pixels(render_anomaly_map(gridded / "cba.tif", tmp_path / "all.png", width_px=1000, outlines=str(path),
                                          outlines_label="Units"))
    only_fill = _pixels(render_anomaly_map(gridded / "cba.tif", tmp_path / "fill.png", width_px=1000,
                                           outlines=f"{path}|layername=units|subset=\"unit\" = 'fill'"))
    dark = lambda rgb: int((rgb.sum(axis=2) < 150).sum())  # noqa: E731 - pixels near black
    assert dark(plain) < dark(only_fill) < dark(with_all), (dark(plain), dark(only_fill), dark(with_all))
    with pytest.raises(ValueError, match="Could not open"):
        render_anomaly_map(gridded / "cba.tif", tmp_path / "bad.png", outlines=str(tmp_path / "missing.gpkg"))
