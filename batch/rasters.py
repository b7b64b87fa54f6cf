# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The same reading and sampling rules as ``plugin/raster_io.py`` (which needs
QGIS for its layer glue): rows always run south, NoData and non-finite cells
become NaN, a station height is the bilinear surface through the four cell
centres around it (NaN when a corner has no data). Any raster GDAL opens
works, a VRT mosaic of many tiles included; only the windows asked for are
read.
"""

from __future__ import annotations

import math
import os

import numpy as np
from osgeo import gdal, osr

from .errors import BatchError

gdal.UseExceptions()

#: GDAL block cache per worker process (bytes): bounds what window reads keep.
GDAL_CACHE_BYTES = 128 * 1024 * 1024


class GdalRaster:
    """A single-band elevation raster opened read-only, read by windows."""

    def __init__(self, path: str):
        try:
            self.dataset = gdal.Open(str(path), gdal.GA_ReadOnly)
        except RuntimeError as error:
            msg = f"Could not open the elevation raster {path}: {error}"
            raise BatchError(msg) from error
        if self.dataset is None:
            msg = f"Could not open the elevation raster {path}."
            raise BatchError(msg)
        self.path = str(path)
        self.band = self.dataset.GetRasterBand(1)
        self.nodata = self.band.GetNoDataValue()
        x0, dx, rx, y0, ry, dy = self.dataset.GetGeoTransform()
        if rx != 0 or ry != 0:
            msg = f"The elevation raster {path} is rotated; warp it to a north-up grid first."
            raise BatchError(msg)
        self.flipped = dy > 0
        self.x_origin = x0
        self.cell_x = abs(dx)
        self.cell_y = abs(dy)
        self.n_cols = self.dataset.RasterXSize
        self.n_rows = self.dataset.RasterYSize
        self.y_origin = y0 + dy * self.n_rows if self.flipped else y0
        self.crs_wkt = self.dataset.GetProjection() or ""
        srs = osr.SpatialReference()
        self.geographic = bool(self.crs_wkt) and srs.ImportFromWkt(self.crs_wkt) == 0 and bool(srs.IsGeographic())

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
            block = self.band.ReadAsArray(c_lo, self.n_rows - r_hi, c_hi - c_lo, r_hi - r_lo)[::-1]
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
        """Bilinear heights at points in the raster CRS (the engine's sampler, as the plugin)."""
        from ..algorithms.terrain import sample_bilinear

        return sample_bilinear(self.elevation_grid(), x, y)


def open_checked(path: str, label: str) -> GdalRaster:
    """Open a raster in the driver and refuse what the plugin refuses."""
    if not os.path.exists(path) and not str(path).startswith("/vsi"):
        msg = f"The {label} {path} does not exist."
        raise BatchError(msg)
    raster = GdalRaster(path)
    if not raster.crs_wkt:
        msg = f"The {label} {path} has no coordinate reference system."
        raise BatchError(msg)
    return raster


def same_crs(wkt_a: str, wkt_b: str) -> bool:
    """True when two WKT strings describe the same CRS."""
    a, b = osr.SpatialReference(), osr.SpatialReference()
    a.ImportFromWkt(wkt_a)
    b.ImportFromWkt(wkt_b)
    return bool(a.IsSame(b))


def warp_to(path: str, src_wkt: str, dst_wkt: str, target: str) -> str:
    """Reproject a raster (bilinear) to ``target`` with the plugin's options."""
    options = gdal.WarpOptions(
        dstSRS=dst_wkt,
        srcSRS=src_wkt,
        resampleAlg="bilinear",
        xRes=None,
        yRes=None,
        dstNodata=-99999.0,
        outputType=gdal.GDT_Float32,
        creationOptions=["COMPRESS=DEFLATE", "TILED=YES"],
    )
    partial = target + ".partial.tif"
    gdal.Warp(partial, path, options=options)
    os.replace(partial, target)
    return target


_OPEN: dict = {}


def cached(path: str) -> GdalRaster:
    """A raster opened once per worker process (GDAL datasets are per process)."""
    raster = _OPEN.get(path)
    if raster is None:
        gdal.SetCacheMax(GDAL_CACHE_BYTES)
        raster = _OPEN[path] = GdalRaster(path)
    return raster
