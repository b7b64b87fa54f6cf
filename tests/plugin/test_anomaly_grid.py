# SPDX-License-Identifier: GPL-2.0-or-later
"""``reliefgravity:anomalygrid`` through processing.run, outputs read back with GDAL.

All station data are invented (self-consistency checks). The one outside
reference is the plane: minimum curvature with any tension reproduces data
sampled from a plane exactly, because planes satisfy the equation and all
boundary conditions (Smith & Wessel 1990, Geophysics 55(3) 293-305;
Smith & Wessel 1990: planes satisfy the equation and its boundary conditions), so the raster must equal the
plane at every cell centre — which also pins the georeference to the half
cell.
"""

from __future__ import annotations

import functools

import numpy as np
import pytest
from osgeo import gdal, ogr, osr
from qgis.core import QgsProcessingException, QgsProcessingFeedback

gdal.UseExceptions()

EPSG_PROJECTED = 32633  # WGS 84 / UTM zone 33N
PLANE = (12.0, 0.004, -0.0025)  # mGal, mGal/m east, mGal/m north (invented)


def plane(x, y):
    a, b, c = PLANE
    return a + b * (np.asarray(x) - 500_000.0) + c * (np.asarray(y) - 5_000_000.0)


@pytest.fixture(scope="session")
def write_points(points_writer):
    """The shared point-layer writer, in this module's projected CRS by default."""
    return functools.partial(points_writer, epsg=EPSG_PROJECTED)


@pytest.fixture(scope="module")
def station_xy():
    rng = np.random.default_rng(7)
    xs = 500_000.0 + rng.uniform(0, 3000, 60)
    ys = 5_000_000.0 + rng.uniform(0, 2000, 60)
    return xs, ys


@pytest.fixture
def plane_stations(tmp_path, station_xy, write_points):
    xs, ys = station_xy
    values = list(plane(xs, ys))
    values[3] = None  # NULL: must be skipped and counted
    values[10] = None
    return write_points(tmp_path / "plane.gpkg", xs, ys, {"cba": values, "label": ["s"] * len(xs)})


def read_raster(path):
    ds = gdal.Open(str(path))
    band = ds.GetRasterBand(1)
    return ds, band, band.ReadAsArray()


def test_provider_lists_algorithm(provider):
    assert provider.algorithm("anomalygrid") is not None


def test_plane_georeference_nodata_crs(provider, plane_stations, tmp_path, collecting_feedback):
    import processing

    out = tmp_path / "grid.tif"
    feedback = collecting_feedback
    # Extent edges are whole multiples of the 100 m pixel, so the grid must be
    # exactly this box: 3200 m x 2200 m -> 32 columns x 22 rows.
    result = processing.run(
        "reliefgravity:anomalygrid",
        {
            "INPUT": plane_stations,
            "FIELD": "cba",
            "PIXEL_SIZE": 100.0,
            "EXTENT": "499900,503100,4999900,5002100 [EPSG:32633]",
            "TENSION": 0.25,
            "BLANK_DISTANCE": 0,
            "OUTPUT": str(out),
        },
        feedback=feedback,
    )
    assert result["OUTPUT"] == str(out)
    assert result["STATIONS_GRIDDED"] == 58
    assert any("2 of 60 stations skipped" in m for m in feedback.infos)
    ds, band, data = read_raster(out)
    assert band.DataType == gdal.GDT_Float32
    assert band.GetNoDataValue() == -99999.0
    assert band.GetUnitType() == "mGal"
    assert (ds.RasterXSize, ds.RasterYSize) == (32, 22)
    assert ds.GetGeoTransform() == (499900.0, 100.0, 0.0, 5002100.0, 0.0, -100.0)
    srs = osr.SpatialReference(wkt=ds.GetProjection())
    srs.AutoIdentifyEPSG()
    assert srs.GetAuthorityCode(None) == str(EPSG_PROJECTED)
    # Cell centres from the file's own geotransform.
    x0, dx, _, y0, _, dy = ds.GetGeoTransform()
    xc = x0 + (np.arange(ds.RasterXSize) + 0.5) * dx
    yc = y0 + (np.arange(ds.RasterYSize) + 0.5) * dy
    xx, yy = np.meshgrid(xc, yc)
    assert not np.any(data == -99999.0)  # blanking off
    # float32 storage of ~10 mGal values: about 1e-6 mGal resolution.
    np.testing.assert_allclose(data, plane(xx, yy), atol=2e-4)


def test_blanking_and_auto_pixel(provider, tmp_path, write_points):
    import processing
    from scipy.spatial import cKDTree

    from relief_gravity.algorithms.gridding import default_cell_size

    # A square lattice of stations every 200 m in the south-west, one far station north-east.
    gx, gy = np.meshgrid(np.arange(0.0, 1001.0, 200.0), np.arange(0.0, 1001.0, 200.0))
    xs = np.append(gx.ravel(), 4000.0) + 500_000.0
    ys = np.append(gy.ravel(), 4000.0) + 5_000_000.0
    path = write_points(tmp_path / "lattice.gpkg", xs, ys, {"cba": list(plane(xs, ys))})
    out = tmp_path / "blank.tif"
    result = processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": path, "FIELD": "cba", "BLANK_DISTANCE": 450.0, "OUTPUT": str(out)},
    )
    # Automatic pixel: half the 200 m spacing, a round number already.
    assert result["CELL_SIZE_USED"] == default_cell_size(xs, ys) == 100.0
    ds, band, data = read_raster(out)
    x0, dx, _, y0, _, dy = ds.GetGeoTransform()
    assert dx == 100.0 and dy == -100.0
    xc = x0 + (np.arange(ds.RasterXSize) + 0.5) * dx
    yc = y0 + (np.arange(ds.RasterYSize) + 0.5) * dy
    xx, yy = np.meshgrid(xc, yc)
    nearest, _ = cKDTree(np.column_stack([xs, ys])).query(np.column_stack([xx.ravel(), yy.ravel()]))
    far = nearest.reshape(data.shape) > 450.0
    assert far.any() and (~far).any()
    np.testing.assert_array_equal(data == band.GetNoDataValue(), far)


def test_automatic_blanking_is_three_spacings(provider, plane_stations, tmp_path, station_xy):
    import processing
    from scipy.spatial import cKDTree

    xs, ys = station_xy
    keep = np.ones(xs.size, bool)
    keep[[3, 10]] = False  # the NULL stations do not count
    points = np.column_stack([xs[keep], ys[keep]])
    spacing = np.median(cKDTree(points).query(points, k=2)[0][:, 1])
    result = processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": plane_stations, "FIELD": "cba", "OUTPUT": str(tmp_path / "auto.tif")},
    )
    assert result["BLANK_DISTANCE_USED"] == pytest.approx(3.0 * spacing)


def test_contours_follow_the_plane(provider, tmp_path, write_points):
    import processing

    from relief_gravity.algorithms.gridding import nice_contour_interval

    rng = np.random.default_rng(3)
    xs = 500_000.0 + rng.uniform(0, 3000, 80)
    ys = 5_000_000.0 + rng.uniform(0, 3000, 80)
    # Anomaly rising 1 mGal per 100 m eastwards: contour L lies on x = 500000 + 100 L.
    values = list((xs - 500_000.0) / 100.0)
    path = write_points(tmp_path / "ramp.gpkg", xs, ys, {"sba": values})
    result = processing.run(
        "reliefgravity:anomalygrid",
        {
            "INPUT": path,
            "FIELD": "sba",
            "PIXEL_SIZE": 50.0,
            "BLANK_DISTANCE": 0,
            "OUTPUT": str(tmp_path / "ramp.tif"),
            "CONTOURS": "TEMPORARY_OUTPUT",
        },
    )
    _, _, data = read_raster(tmp_path / "ramp.tif")
    interval = result["INTERVAL_USED"]
    assert interval == nice_contour_interval(float(data.min()), float(data.max()))
    layer = result["CONTOURS"]
    assert layer.fields().names() == ["value"]
    assert layer.geometryType() == 1  # QgsWkbTypes.LineGeometry
    assert layer.crs().authid() == "EPSG:32633"
    features = list(layer.getFeatures())
    assert len(features) >= 5
    for feature in features:
        level = feature["value"]
        assert level / interval == pytest.approx(round(level / interval), abs=1e-9)
        xs_line = np.array([p.x() for p in feature.geometry().vertices()])
        np.testing.assert_allclose(xs_line, 500_000.0 + 100.0 * level, atol=1e-3)


def test_fixed_contour_interval(provider, plane_stations, tmp_path):
    import processing

    result = processing.run(
        "reliefgravity:anomalygrid",
        {
            "INPUT": plane_stations,
            "FIELD": "cba",
            "CONTOUR_INTERVAL": 0.5,
            "OUTPUT": str(tmp_path / "g.tif"),
            "CONTOURS": str(tmp_path / "c.gpkg"),
        },
    )
    assert result["INTERVAL_USED"] == 0.5
    ds = ogr.Open(str(tmp_path / "c.gpkg"))
    levels = {f.GetField("value") for f in ds.GetLayer(0)}
    assert levels and all((2 * v) == round(2 * v) for v in levels)


def test_fewer_than_three_values_refused(provider, tmp_path, write_points):
    import processing

    path = write_points(
        tmp_path / "few.gpkg", [500_000.0, 500_100.0, 500_200.0, 500_300.0],
        [5_000_000.0, 5_000_300.0, 5_000_100.0, 5_000_200.0], {"cba": [1.0, None, 2.0, None]},
    )
    with pytest.raises(QgsProcessingException, match=r"Only 2 station.*at least 3 are needed"):
        processing.run(
            "reliefgravity:anomalygrid",
            {"INPUT": path, "FIELD": "cba", "OUTPUT": str(tmp_path / "few.tif")},
        )


def test_field_checks(provider, plane_stations, tmp_path):
    import processing

    with pytest.raises(QgsProcessingException, match="no field named 'bouguer'"):
        processing.run(
            "reliefgravity:anomalygrid",
            {"INPUT": plane_stations, "FIELD": "bouguer", "OUTPUT": str(tmp_path / "x.tif")},
        )
    with pytest.raises(QgsProcessingException, match="'label' chosen as the anomaly field is not numeric"):
        processing.run(
            "reliefgravity:anomalygrid",
            {"INPUT": plane_stations, "FIELD": "label", "OUTPUT": str(tmp_path / "x.tif")},
        )


def test_geographic_crs_refused(provider, tmp_path, write_points):
    import processing

    path = write_points(
        tmp_path / "geo.gpkg", [15.0, 15.01, 15.02, 15.0], [47.0, 47.01, 47.0, 47.02],
        {"cba": [1.0, 2.0, 3.0, 4.0]}, epsg=4326,
    )
    with pytest.raises(QgsProcessingException, match=r"geographic CRS \(EPSG:4326\).*Reproject"):
        processing.run(
            "reliefgravity:anomalygrid",
            {"INPUT": path, "FIELD": "cba", "OUTPUT": str(tmp_path / "geo.tif")},
        )


def test_cancel_stops_before_writing(provider, plane_stations, tmp_path):
    from qgis.core import QgsProcessingContext

    algorithm = provider.algorithm("anomalygrid").create()
    feedback = QgsProcessingFeedback()
    feedback.cancel()
    out = tmp_path / "cancelled.tif"
    context = QgsProcessingContext()
    parameters = {"INPUT": plane_stations, "FIELD": "cba", "OUTPUT": str(out)}
    # QGIS convention: a cancelled algorithm returns no results (read_stations
    # may also raise "Cancelled by the user."); either way no raster is written.
    try:
        result = algorithm.processAlgorithm(parameters, context, feedback)
    except QgsProcessingException as error:
        raised = str(error)
    else:
        raised = None
        assert result == {}
    assert raised is None or "Cancelled" in raised
    assert not out.exists()


def test_output_format_follows_extension(provider, plane_stations, tmp_path):
    import processing

    out = tmp_path / "grid.asc"  # ESRI ASCII grid: GDAL can only copy into it
    processing.run(
        "reliefgravity:anomalygrid",
        {"INPUT": plane_stations, "FIELD": "cba", "PIXEL_SIZE": 100.0, "BLANK_DISTANCE": 0, "OUTPUT": str(out)},
    )
    ds = gdal.Open(str(out))
    assert ds.GetDriver().ShortName == "AAIGrid"
    assert ds.GetGeoTransform()[1] == 100.0


def _cancelling_feedback(threshold):
    """A feedback that cancels itself once the progress bar passes ``threshold`` %."""
    feedback = QgsProcessingFeedback()
    seen = []

    def cancel_after(progress):
        # setProgress is not virtual in PyQGIS: listen to the signal.
        seen.append(progress)
        if progress > threshold and not feedback.isCanceled():
            feedback.cancel()

    feedback.progressChanged.connect(cancel_after)
    return feedback, seen


@pytest.mark.parametrize(
    ("threshold", "where"),
    [(26.0, "solve"), (74.0, "contours")],
    ids=["during-the-solve", "during-the-contours"],
)
def test_cancel_raises_and_leaves_no_files(provider, plane_stations, tmp_path, threshold, where):
    # Four steps of 25 %: stations, gridding (the solve reports its iterations),
    # raster, contours. 10 m pixels make 320 x 220 nodes: the iterative solver.
    # Before this change a cancel returned "success" with an empty contour layer.
    import processing

    out_dir = tmp_path / "out"
    out_dir.mkdir()
    feedback, seen = _cancelling_feedback(threshold)
    with pytest.raises(QgsProcessingException, match="Cancelled by the user"):
        processing.run(
            "reliefgravity:anomalygrid",
            {
                "INPUT": plane_stations,
                "FIELD": "cba",
                "PIXEL_SIZE": 10.0,
                "EXTENT": "499900,503100,4999900,5002100 [EPSG:32633]",
                "BLANK_DISTANCE": 0,
                "CONTOUR_INTERVAL": 0.1,
                "OUTPUT": str(out_dir / "grid.tif"),
                "CONTOURS": str(out_dir / "contours.gpkg"),
            },
            feedback=feedback,
        )
    assert sorted(p.name for p in out_dir.iterdir()) == []
    if where == "solve":
        # Cancelled inside the solve: progress stopped within the gridding step.
        assert 25.0 < max(seen) < 50.0
    else:
        # Cancelled once the raster was written (75 %): the raster goes too.
        assert max(seen) == 75.0
