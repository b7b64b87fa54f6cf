# SPDX-License-Identifier: GPL-2.0-or-later
"""Small invented inputs for the batch-runner tests (no QGIS needed)."""

from __future__ import annotations

import hashlib
import math
from pathlib import Path

import numpy as np
import pytest

gdal = pytest.importorskip("osgeo.gdal")


def write_dem(path: Path, heights: np.ndarray, west: float, north: float, cell: float, epsg: int | None = 32632, nodata=None) -> str:
    from osgeo import osr

    rows, cols = heights.shape
    ds = gdal.GetDriverByName("GTiff").Create(str(path), cols, rows, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((west, cell, 0.0, north, 0.0, -cell))
    if epsg is not None:
        srs = osr.SpatialReference()
        srs.ImportFromEPSG(epsg)
        ds.SetProjection(srs.ExportToWkt())
    band = ds.GetRasterBand(1)
    if nodata is not None:
        band.SetNoDataValue(nodata)
    band.WriteArray(heights.astype(np.float32))
    ds = None
    return str(path)


def write_layer(path: Path, xs, ys, columns: dict, epsg: int | None = 32632, geometry=None, layer="stations") -> str:
    """GeoPackage layer; ``columns``: name -> values (NaN/None -> NULL, str -> text)."""
    from osgeo import ogr, osr

    srs = None
    if epsg is not None:
        srs = osr.SpatialReference()
        srs.ImportFromEPSG(epsg)
        srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    lyr = ds.CreateLayer(layer, srs, geometry or ogr.wkbPoint)
    for name, values in columns.items():
        kind = ogr.OFTString if any(isinstance(v, str) for v in values) else ogr.OFTReal
        lyr.CreateField(ogr.FieldDefn(name, kind))
    for i, (x, y) in enumerate(zip(xs, ys, strict=True)):
        f = ogr.Feature(lyr.GetLayerDefn())
        for name, values in columns.items():
            v = values[i]
            if v is None or (isinstance(v, float) and math.isnan(v)):
                f.SetFieldNull(name)
            else:
                f.SetField(name, v if isinstance(v, str) else float(v))
        if geometry == ogr.wkbPolygon:
            g = ogr.CreateGeometryFromWkt(f"POLYGON(({x} {y},{x + 1} {y},{x + 1} {y + 1},{x} {y}))")
        else:
            g = ogr.Geometry(ogr.wkbPoint)
            g.AddPoint_2D(float(x), float(y))
        f.SetGeometry(g)
        lyr.CreateFeature(f)
    ds = None
    return str(path)


def digest(path) -> str:
    return hashlib.sha256(Path(path).read_bytes()).hexdigest()


WEST, NORTH, CELL, N = 500_000.0, 5_006_000.0, 100.0, 80


@pytest.fixture(scope="session")
def small_survey(tmp_path_factory):
    """An 8 km hilly DEM (100 m cells) and 240 stations on it (invented)."""
    folder = tmp_path_factory.mktemp("batch_survey")
    c = (np.arange(N) + 0.5) * CELL
    xx, yy = np.meshgrid(c, c)
    heights = 300.0 + 400.0 * np.exp(-((xx - 4000) ** 2 + (yy - 4500) ** 2) / (2 * 1500.0**2)) + 30 * np.sin(xx / 500)
    dem = write_dem(folder / "dem.tif", heights, WEST, NORTH, CELL)
    rng = np.random.default_rng(11)
    m = 240
    xs = rng.uniform(WEST + 200, WEST + N * CELL - 200, m)
    ys = rng.uniform(NORTH - N * CELL + 200, NORTH - 200, m)
    h = 300.0 + rng.uniform(0, 400, m)
    h[::31] = np.nan
    g = 980_600.0 + rng.normal(0, 10, m)
    cols = {"name": [f"S{i}" for i in range(m)], "g": g, "h": h, "label": ["x"] * m}
    stations = write_layer(folder / "stations.gpkg", xs, ys, cols)
    return {"folder": folder, "dem": dem, "stations": stations, "heights": heights, "n": m}


def read_rows(path):
    """Field names and rows (dicts with '__xy') of the first layer."""
    from osgeo import ogr

    ds = ogr.Open(str(path))
    lyr = ds.GetLayer(0)
    defn = lyr.GetLayerDefn()
    names = [defn.GetFieldDefn(i).GetName() for i in range(defn.GetFieldCount())]
    rows = []
    for f in lyr:
        row = {n: (f.GetField(n) if f.IsFieldSetAndNotNull(n) else None) for n in names}
        g = f.GetGeometryRef()
        row["__xy"] = (g.GetX(), g.GetY())
        row["__fid"] = f.GetFID()
        rows.append(row)
    return names, rows


@pytest.fixture(scope="session")
def rows_of():
    return read_rows


@pytest.fixture(scope="session")
def layer_writer():
    return write_layer


@pytest.fixture(scope="session")
def raster_writer():
    return write_dem


@pytest.fixture(scope="session")
def file_digest():
    return digest
