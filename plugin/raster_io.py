# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters for the engine: GDAL windows, sampling, reprojection."""

from __future__ import annotations

import math
import tempfile
from pathlib import Path

import numpy as np
from osgeo import gdal, osr
from qgis.core import QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

gdal.UseExceptions()


def _tr(text: str) -> str:
    return QCoreApplication.translate("ElevationRaster", text)


class ElevationRaster:
    """A single-band elevation raster opened with GDAL, read by windows."""

    def __init__(self, path: str, crs_wkt: str = "", geographic: bool | None = None):
        try:
            self.dataset = gdal.Open(path, gdal.GA_ReadOnly)
        except RuntimeError as error:
            raise QgsProcessingException(
                _tr("Could not open the elevation raster {}: {}").format(path, error)
            ) from error
        self.path = path
        self.band = self.dataset.GetRasterBand(1)
        self.nodata = self.band.GetNoDataValue()
        x0, dx, rx, y0, ry, dy = self.dataset.GetGeoTransform()
        if rx != 0 or ry != 0:
            raise QgsProcessingException(
                _tr("The elevation raster {} is rotated; warp it to a north-up grid first.").format(path)
            )
        # A south-up raster (positive dy) is read flipped so rows always run south.
        self.flipped = dy > 0
        self.x_origin = x0
        self.cell_x = abs(dx)
        self.cell_y = abs(dy)
        self.n_cols = self.dataset.RasterXSize
        self.n_rows = self.dataset.RasterYSize
        self.y_origin = y0 + dy * self.n_rows if self.flipped else y0
        wkt = crs_wkt or self.dataset.GetProjection()
        self.crs_wkt = wkt
        if geographic is None:
            srs = osr.SpatialReference()
            geographic = bool(wkt) and srs.ImportFromWkt(wkt) == 0 and bool(srs.IsGeographic())
        self.geographic = bool(geographic)

    @property
    def extent(self) -> tuple[float, float, float, float]:
        """(west, east, south, north) in the raster's CRS."""
        return (
            self.x_origin,
            self.x_origin + self.cell_x * self.n_cols,
            self.y_origin - self.cell_y * self.n_rows,
            self.y_origin,
        )

    def read_window(self, row0: int, col0: int, n_rows: int, n_cols: int) -> np.ndarray:
        """Heights of a window (rows from the north), NaN outside or at NoData."""
        out = np.full((n_rows, n_cols), np.nan)
        r_lo, r_hi = max(row0, 0), min(row0 + n_rows, self.n_rows)
        c_lo, c_hi = max(col0, 0), min(col0 + n_cols, self.n_cols)
        if r_lo >= r_hi or c_lo >= c_hi:
            return out
        if self.flipped:
            file_row = self.n_rows - r_hi
            block = self.band.ReadAsArray(c_lo, file_row, c_hi - c_lo, r_hi - r_lo)[::-1]
        else:
            block = self.band.ReadAsArray(c_lo, r_lo, c_hi - c_lo, r_hi - r_lo)
        block = block.astype(float)
        if self.nodata is not None and math.isfinite(self.nodata):
            block[block == self.nodata] = np.nan
        block[~np.isfinite(block)] = np.nan
        out[r_lo - row0 : r_hi - row0, c_lo - col0 : c_hi - col0] = block
        return out

    def elevation_grid(self):
        """The engine's view of this raster (windowed, nothing read yet)."""
        from ..algorithms.terrain import ElevationGrid

        return ElevationGrid(
            x_origin=self.x_origin,
            y_origin=self.y_origin,
            cell_x=self.cell_x,
            cell_y=self.cell_y,
            n_rows=self.n_rows,
            n_cols=self.n_cols,
            geographic=self.geographic,
            reader=self.read_window,
        )

    def sample_bilinear(self, x: np.ndarray, y: np.ndarray) -> np.ndarray:
        """Bilinear heights at points in the raster CRS (the engine's sampler and NoData/edge rule)."""
        from ..algorithms.terrain import sample_bilinear

        return sample_bilinear(self.elevation_grid(), x, y)


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
