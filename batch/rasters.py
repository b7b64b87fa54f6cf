# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""

from __future__ import annotations

import os

from osgeo import gdal, osr

from ..plugin.gdal_raster import ROTATED, RasterProblem, WindowedRaster
from .errors import BatchError

#: GDAL block cache per worker process (bytes): bounds what window reads keep.
GDAL_CACHE_BYTES = 128 * 1024 * 1024


class GdalRaster(WindowedRaster):
    """The plugin's windowed raster (``plugin/gdal_raster.py``) with the batch runner's sentences."""

    def __init__(self, path: str):
        try:
            super().__init__(path)
        except RasterProblem as problem:
            if problem.kind == ROTATED:
                msg = f"The elevation raster {path} is rotated; warp it to a north-up grid first."
            elif problem.detail:
                msg = f"Could not open the elevation raster {path}: {problem.detail}"
            else:
                msg = f"Could not open the elevation raster {path}."
            raise BatchError(msg) from problem


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
