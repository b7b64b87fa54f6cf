# SPDX-License-Identifier: GPL-2.0-or-later
"""plugin/density_layer.py: geology polygons rasterised onto a DEM, densities at stations (invented inputs)."""

from __future__ import annotations

import hashlib
from pathlib import Path

import numpy as np
import pytest

CELL = 100.0
WEST, NORTH = 500_000.0, 5_001_000.0
ROWS, COLS = 8, 12  # 1.2 km by 0.8 km, EPSG:32632

# Polygon edges on cell edges, so each cell centre lies 50 m inside or outside.
WEST_BLOCK = (WEST, WEST + 500.0, NORTH - 800.0, NORTH)  # columns 0-4, density 2.2 g/cm3
EAST_BLOCK = (WEST + 700.0, WEST + 1100.0, NORTH - 600.0, NORTH - 200.0)  # columns 7-10, rows 2-5: 2.9
LATE_PATCH = (WEST + 800.0, WEST + 900.0, NORTH - 400.0, NORTH - 300.0)  # column 8, row 3: 2.2, drawn last


def _ring(box, epsg, steps=20):
    """Closed ring of a UTM box, densified, in ``epsg`` (straight in UTM after the round trip)."""
    from osgeo import osr

    w, e, s, n = box
    t = np.linspace(0.0, 1.0, steps, endpoint=False)
    xs = np.concatenate([w + (e - w) * t, np.full(steps, e), e - (e - w) * t, np.full(steps, w)])
    ys = np.concatenate([np.full(steps, s), s + (n - s) * t, np.full(steps, n), n - (n - s) * t])
    if epsg == 32632:
        return list(zip(xs, ys, strict=True))
    src, dst = osr.SpatialReference(), osr.SpatialReference()
    src.ImportFromEPSG(32632)
    dst.ImportFromEPSG(epsg)
    for ref in (src, dst):
        ref.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    tr = osr.CoordinateTransformation(src, dst)
    return [tr.TransformPoint(float(x), float(y))[:2] for x, y in zip(xs, ys, strict=True)]


def _write_polygons(path, boxes, values, epsg=32632, kind=None):
    from osgeo import ogr, osr

    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("geology", srs, kind or ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("rho", ogr.OFTReal))
    layer.CreateField(ogr.FieldDefn("name", ogr.OFTString))
    for box, value in zip(boxes, values, strict=True):
        feature = ogr.Feature(layer.GetLayerDefn())
        if value is None:
            feature.SetFieldNull("rho")
        else:
            feature.SetField("rho", value)
        feature.SetField("name", "unit")
        points = _ring(box, epsg)
        if kind == ogr.wkbLineString:
            geometry = ogr.Geometry(ogr.wkbLineString)
            for x, y in points:
                geometry.AddPoint_2D(x, y)
        else:
            ring = ogr.Geometry(ogr.wkbLinearRing)
            for x, y in points + points[:1]:
                ring.AddPoint_2D(x, y)
            geometry = ogr.Geometry(ogr.wkbPolygon)
            geometry.AddGeometry(ring)
        feature.SetGeometry(geometry)
        layer.CreateFeature(feature)
    ds = None
    return str(path)


def _layer(path):
    from qgis.core import QgsVectorLayer

    layer = QgsVectorLayer(path, "geology", "ogr")
    assert layer.isValid()
    return layer


@pytest.fixture
def dem(tmp_path, dem_writer):
    from relief_gravity.plugin.raster_io import ElevationRaster

    heights = 300.0 + np.arange(ROWS * COLS, dtype=float).reshape(ROWS, COLS)
    path = dem_writer(tmp_path / "dem.tif", heights, WEST, NORTH, CELL)
    return ElevationRaster(str(path))


def _read(path, field="rho", default=2670.0):
    from qgis.core import QgsCoordinateReferenceSystem, QgsProject

    from relief_gravity.plugin.density_layer import read_polygons

    crs = QgsCoordinateReferenceSystem("EPSG:32632")
    return read_polygons(_layer(path), field, default, crs, QgsProject.instance().transformContext())


def _expected_units():
    cols = np.arange(COLS)
    rows = np.arange(ROWS)
    cx = WEST + (cols + 0.5) * CELL
    cy = NORTH - (rows + 0.5) * CELL
    X, Y = np.meshgrid(cx, cy)

    def inside(box):
        return (box[0] < X) & (box[1] > X) & (box[2] < Y) & (box[3] > Y)

    out = np.zeros((ROWS, COLS), dtype=int)
    out[inside(WEST_BLOCK)] = 1
    out[inside(EAST_BLOCK)] = 2
    out[inside(LATE_PATCH)] = 1
    return out


@pytest.mark.parametrize("epsg", [32632, 4326])
def test_two_polygons_rasterised_and_sampled_at_stations(qgis_processing, tmp_path, dem, epsg):
    from relief_gravity.plugin.density_layer import density_units, rasterise_units, station_densities

    path = _write_polygons(tmp_path / "geology.gpkg", [WEST_BLOCK, EAST_BLOCK, LATE_PATCH], [2.2, 2.9, 2.2], epsg)
    digest = hashlib.sha256(Path(path).read_bytes()).hexdigest()
    polygons = _read(path)
    assert polygons.given_in == "g/cm3"
    assert polygons.densities.tolist() == [2670.0, 2200.0, 2900.0]
    assert polygons.polygon_unit.tolist() == [1, 2, 1]
    units = rasterise_units(polygons, dem)
    np.testing.assert_array_equal(units, _expected_units())
    assert units.dtype == np.uint8
    # Stations: in the west block, in the east block, on the late patch,
    # outside every polygon, with no coordinates.
    xs = np.array([WEST + 120.0, WEST + 1020.0, WEST + 850.0, WEST + 620.0, np.nan])
    ys = np.array([NORTH - 700.0, NORTH - 250.0, NORTH - 350.0, NORTH - 100.0, np.nan])
    assert station_densities(polygons, xs, ys).tolist() == [2200.0, 2900.0, 2200.0, 2670.0, 2670.0]
    engine_units = density_units(polygons, dem, dem)
    np.testing.assert_array_equal(engine_units.fine, _expected_units())
    np.testing.assert_array_equal(engine_units.regional, _expected_units())
    grid = dem.elevation_grid()
    # The cell unit under each station agrees with the polygon lookup here (stations away from edges).
    assert engine_units.station_density(grid, xs[:4], ys[:4]).tolist() == [2200.0, 2900.0, 2200.0, 2670.0]
    assert hashlib.sha256(Path(path).read_bytes()).hexdigest() == digest


def test_kg_per_m3_field_and_null_density(qgis_processing, tmp_path, dem, collecting_feedback):
    from qgis.core import QgsCoordinateReferenceSystem, QgsProject

    from relief_gravity.plugin.density_layer import rasterise_units, read_polygons

    path = _write_polygons(tmp_path / "g.gpkg", [WEST_BLOCK, EAST_BLOCK], [2300.0, None])
    polygons = read_polygons(_layer(path), "rho", 2670.0, QgsCoordinateReferenceSystem("EPSG:32632"),
                             QgsProject.instance().transformContext(), collecting_feedback)
    assert polygons.given_in == "kg/m3" and polygons.densities.tolist() == [2670.0, 2300.0]
    assert any("no density" in w for w in collecting_feedback.warnings)
    expected = _expected_units()
    expected[expected == 2] = 0  # the east block has no density: default there
    expected[3, 8] = 0  # (no late patch in this layer)
    np.testing.assert_array_equal(rasterise_units(polygons, dem), expected)


@pytest.mark.parametrize(
    ("values", "message"),
    [([2.2, 2900.0], "one unit for every polygon"), ([None, None], "No polygon of DENSITY_LAYER has a density"), ([26.0, 27.0], "neither")],
)
def test_bad_densities_give_sentences(qgis_processing, tmp_path, values, message):
    from qgis.core import QgsProcessingException

    path = _write_polygons(tmp_path / "bad.gpkg", [WEST_BLOCK, EAST_BLOCK], values)
    with pytest.raises(QgsProcessingException, match=message):
        _read(path)


def test_bad_layers_give_sentences(qgis_processing, tmp_path):
    from osgeo import ogr
    from qgis.core import QgsProcessingException

    lines = _write_polygons(tmp_path / "lines.gpkg", [WEST_BLOCK], [2.2], kind=ogr.wkbLineString)
    with pytest.raises(QgsProcessingException, match="polygon layer"):
        _read(lines)
    good = _write_polygons(tmp_path / "good.gpkg", [WEST_BLOCK], [2.2])
    with pytest.raises(QgsProcessingException, match="not numeric"):
        _read(good, field="name")
    with pytest.raises(QgsProcessingException, match="no field"):
        _read(good, field="missing")


def _probe():
    from qgis.core import QgsProcessingAlgorithm

    from relief_gravity.plugin.density_layer import add_parameters

    class Probe(QgsProcessingAlgorithm):
        def name(self):
            return "probe"

        def displayName(self):  # noqa: N802 - QGIS API
            return "probe"

        def createInstance(self):  # noqa: N802 - QGIS API
            return Probe()

        def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
            add_parameters(self)

        def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
            return {}

    probe = Probe()
    probe.initAlgorithm()
    return probe


def test_parameters_are_optional_and_linked(qgis_processing):
    from qgis.core import QgsProcessingParameterDefinition

    from relief_gravity.plugin.density_layer import DENSITY_LAYER, DENSITY_LAYER_FIELD

    probe = _probe()
    layer = probe.parameterDefinition(DENSITY_LAYER)
    field = probe.parameterDefinition(DENSITY_LAYER_FIELD)
    assert layer.flags() & QgsProcessingParameterDefinition.FlagOptional
    assert field.flags() & QgsProcessingParameterDefinition.FlagOptional
    assert field.parentLayerParameterName() == DENSITY_LAYER


def test_read_parameters(qgis_processing, tmp_path, collecting_feedback):
    from qgis.core import QgsCoordinateReferenceSystem, QgsProcessingContext, QgsProcessingException

    from relief_gravity.plugin.density_layer import DENSITY_LAYER, DENSITY_LAYER_FIELD, read_parameters

    probe, context = _probe(), QgsProcessingContext()
    crs = QgsCoordinateReferenceSystem("EPSG:32632")
    path = _write_polygons(tmp_path / "geology.gpkg", [WEST_BLOCK, EAST_BLOCK], [2.2, 2.9])
    assert read_parameters(probe, {}, context, 2670.0, crs) is None
    got = read_parameters(probe, {DENSITY_LAYER: path, DENSITY_LAYER_FIELD: "rho"}, context, 2500.0, crs, collecting_feedback)
    assert got.densities.tolist() == [2500.0, 2200.0, 2900.0] and got.crs == crs
    with pytest.raises(QgsProcessingException, match="DENSITY_LAYER_FIELD is not"):
        read_parameters(probe, {DENSITY_LAYER: path}, context, 2670.0, crs)
