# SPDX-License-Identifier: GPL-2.0-or-later
"""Small synthetic inputs for the Processing tests (invented data)."""

from __future__ import annotations

import math
import os
import shutil
import subprocess
from pathlib import Path

import numpy as np
import pytest

REPO_ROOT = Path(__file__).resolve().parents[2]


def write_dem(path: Path, heights: np.ndarray, west: float, north: float, cell: float, epsg: int = 32632, nodata=None):
    """Write a float32 GeoTIFF with rows from the north."""
    from osgeo import gdal, osr

    driver = gdal.GetDriverByName("GTiff")
    rows, cols = heights.shape
    dataset = driver.Create(str(path), cols, rows, 1, gdal.GDT_Float32)
    dataset.SetGeoTransform((west, cell, 0.0, north, 0.0, -cell))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    dataset.SetProjection(srs.ExportToWkt())
    band = dataset.GetRasterBand(1)
    if nodata is not None:
        band.SetNoDataValue(nodata)
    band.WriteArray(heights.astype(np.float32))
    dataset.FlushCache()
    dataset = None
    return path


def write_points(path: Path, xs, ys, columns=None, epsg: int | None = 32632, types=None, layer="stations"):
    """Write a GeoPackage point layer and return its path as a string.

    ``columns`` maps a field name to one value per point (None or NaN is
    NULL); a field's type is ``types[name]`` (an OGR field type) or, when not
    given, text for string values and real otherwise. ``epsg=None`` writes
    the layer without a CRS.
    """
    from osgeo import ogr, osr

    columns = columns or {}
    types = types or {}
    if path.exists():
        path.unlink()
    srs = None
    if epsg is not None:
        srs = osr.SpatialReference()
        srs.ImportFromEPSG(epsg)
        srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    datasource = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    lyr = datasource.CreateLayer(layer, srs, ogr.wkbPoint)
    for name, values in columns.items():
        kind = types.get(name, ogr.OFTString if any(isinstance(v, str) for v in values) else ogr.OFTReal)
        lyr.CreateField(ogr.FieldDefn(name, kind))
    for i, (x, y) in enumerate(zip(xs, ys, strict=True)):
        feature = ogr.Feature(lyr.GetLayerDefn())
        for name, values in columns.items():
            value = values[i]
            if value is None or (isinstance(value, float) and math.isnan(value)):
                feature.SetFieldNull(name)
            else:
                feature.SetField(name, value)
        geometry = ogr.Geometry(ogr.wkbPoint)
        geometry.AddPoint_2D(float(x), float(y))
        feature.SetGeometry(geometry)
        lyr.CreateFeature(feature)
    datasource = None
    return str(path)


def write_station_rows(path: Path, rows: list[dict], epsg: int | None = 32632, fields=None):
    """Row-wise form of :func:`write_points`: dicts with 'x', 'y' and the fields."""
    fields = fields or station_fields()
    columns = {name: [row.get(name) for row in rows] for name in fields}
    return Path(write_points(path, [r["x"] for r in rows], [r["y"] for r in rows], columns, epsg=epsg, types=fields))


@pytest.fixture
def hill_dem(tmp_path):
    """A 12 km square, 100 m cells, Gaussian hill 600 m high on a 200 m plain."""
    cell = 100.0
    n = 120
    west, north = 494_000.0, 5_006_000.0
    centres = (np.arange(n) + 0.5) * cell
    xx, yy = np.meshgrid(centres, centres)
    heights = 200.0 + 600.0 * np.exp(-(((xx - 6000) ** 2 + (yy - 6000) ** 2) / (2 * 1500.0**2)))
    return write_dem(tmp_path / "hill.tif", heights, west, north, cell), (west, north, cell, heights)


@pytest.fixture
def station_rows():
    """Twelve invented stations on and around the hill, with edge cases."""
    rng = np.random.default_rng(7)
    rows = []
    for i in range(12):
        x = 497_000.0 + 500.0 * i
        y = 5_000_000.0 + 300.0 * ((i * 5) % 12)
        rows.append(
            {
                "x": x,
                "y": y,
                "name": f"S{i:02d}",
                "g_obs": 980_500.0 + float(rng.normal(0, 5)),
                "elev": 200.0 + 50.0 * i,
                "rho": 2600.0 + 10 * i,
                "tc_given": 0.5 + 0.1 * i,
                "label": "n" + str(i),
            }
        )
    return rows


def station_fields():
    from osgeo import ogr

    return {
        "name": ogr.OFTString,
        "g_obs": ogr.OFTReal,
        "elev": ogr.OFTReal,
        "rho": ogr.OFTReal,
        "tc_given": ogr.OFTReal,
        "label": ogr.OFTString,
    }


@pytest.fixture
def stations_gpkg(tmp_path, station_rows):
    return write_station_rows(tmp_path / "stations.gpkg", station_rows)


@pytest.fixture
def make_points(tmp_path):
    """Factory: make_points(rows, epsg=..., name=...) -> path of a GeoPackage."""

    def factory(rows, epsg=32632, name="pts.gpkg", fields=None):
        return write_station_rows(tmp_path / name, rows, epsg=epsg, fields=fields)

    return factory


@pytest.fixture
def collecting_feedback():
    """A feedback that keeps warnings and infos for assertions."""
    from qgis.core import QgsProcessingFeedback

    class Collecting(QgsProcessingFeedback):
        def __init__(self):
            super().__init__()
            self.warnings, self.infos = [], []

        def pushWarning(self, text):  # noqa: N802 - QGIS API
            self.warnings.append(text)
            super().pushWarning(text)

        def pushInfo(self, text):  # noqa: N802 - QGIS API
            self.infos.append(text)
            super().pushInfo(text)

    return Collecting()


@pytest.fixture(scope="session")
def qgis_process_env(tmp_path_factory):
    """Environment for qgis_process.bin with the checkout enabled as a plugin."""
    executable = shutil.which("qgis_process.bin")
    if executable is None:
        pytest.skip("qgis_process.bin not found (install Debian's qgis package)")
    home = tmp_path_factory.mktemp("qgis_home")
    plugins = tmp_path_factory.mktemp("qgis_plugins")
    (plugins / "relief_gravity").symlink_to(REPO_ROOT, target_is_directory=True)
    runtime = tmp_path_factory.mktemp("xdg")
    os.chmod(runtime, 0o700)
    env = dict(os.environ, HOME=str(home), QGIS_PLUGINPATH=str(plugins), QT_QPA_PLATFORM="offscreen", XDG_RUNTIME_DIR=str(runtime))
    env.pop("QGIS_CUSTOM_CONFIG_PATH", None)
    enabled = subprocess.run([executable, "plugins", "enable", "relief_gravity"], env=env, capture_output=True, text=True, timeout=120)
    assert enabled.returncode == 0, enabled.stdout + enabled.stderr
    return executable, env


@pytest.fixture(scope="session")
def dem_writer():
    """The GeoTIFF writer above, for tests that build their own rasters."""
    return write_dem


@pytest.fixture(scope="session")
def points_writer():
    """The GeoPackage point writer above, for tests that build their own layers."""
    return write_points


@pytest.fixture(scope="session", autouse=True)
def _release_qgis_objects_before_exit(qgis_app):
    """Destroy layers that Python still owns while QGIS still runs.

    A test that checks a raised QgsProcessingException keeps the exception's
    frames alive (QGIS's Processing wrapper holds on to the last one), and
    with them the layers the test opened. Destroyed only at interpreter exit,
    after pytest-qgis has shut QGIS down, such a QgsVectorLayer crashes the
    interpreter (exit status 139 after every test passed).
    """
    yield
    import gc

    from qgis.core import QgsMapLayer
    from qgis.PyQt import sip

    gc.collect()
    for obj in gc.get_objects():
        if isinstance(obj, QgsMapLayer) and not sip.isdeleted(obj) and sip.ispyowned(obj):
            sip.delete(obj)
