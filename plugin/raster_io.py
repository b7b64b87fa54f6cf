# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters for the engine: GDAL windows, sampling, reprojection."""

from __future__ import annotations

import tempfile
from pathlib import Path

from osgeo import gdal, osr
from qgis.core import QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

from .gdal_raster import ROTATED, RasterProblem, WindowedRaster


def _tr(text: str) -> str:
    return QCoreApplication.translate("ElevationRaster", text)


class ElevationRaster(WindowedRaster):
    """A single-band elevation raster opened with GDAL, read by windows (``plugin/gdal_raster.py``)."""

    def __init__(self, path: str, crs_wkt: str = "", geographic: bool | None = None):
        try:
            super().__init__(path, crs_wkt, geographic)
        except RasterProblem as problem:
            if problem.kind == ROTATED:
                raise QgsProcessingException(
                    _tr("The elevation raster {} is rotated; warp it to a north-up grid first.").format(path)
                ) from problem
            raise QgsProcessingException(
                _tr("Could not open the elevation raster {}: {}").format(path, problem.detail)
            ) from problem


def raster_path(layer) -> str:
    """File path GDAL can open for a raster layer (GDAL provider only)."""
    if layer.providerType() != "gdal":
        raise QgsProcessingException(
            _tr("The raster {} is not a GDAL raster; save it as a GeoTIFF first.").format(layer.name())
        )
    return layer.source()


def open_elevation(layer) -> ElevationRaster:
    """Open a QGIS raster layer, taking the CRS QGIS assigns to it."""
    crs = layer.crs()
    wkt = crs.toWkt() if crs.isValid() else ""
    if not crs.isValid():
        raise QgsProcessingException(
            _tr("The elevation raster {} has no coordinate reference system.").format(layer.name())
        )
    return ElevationRaster(raster_path(layer), wkt, crs.isGeographic())


def warp_to(raster: ElevationRaster, dst_wkt: str, cell_size: float | None = None) -> ElevationRaster:
    """Reproject a raster into another CRS (bilinear), into a temporary GeoTIFF."""
    folder = Path(tempfile.mkdtemp(prefix="relief_gravity_"))
    target = str(folder / "regional_warped.tif")
    options = gdal.WarpOptions(
        dstSRS=dst_wkt,
        srcSRS=raster.crs_wkt,
        resampleAlg="bilinear",
        xRes=cell_size,
        yRes=cell_size,
        dstNodata=-99999.0,
        outputType=gdal.GDT_Float32,
        creationOptions=["COMPRESS=DEFLATE", "TILED=YES"],
    )
    gdal.Warp(target, raster.path, options=options)
    srs = osr.SpatialReference()
    srs.ImportFromWkt(dst_wkt)
    return ElevationRaster(target, dst_wkt, bool(srs.IsGeographic()))
