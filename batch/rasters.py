# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The same reading and sampling rules as ``plugin/raster_io.py`` (which needs
QGIS for its layer glue): rows always run south, NoData and non-finite cells
become NaN, a station height is the bilinear surface through the four cell
centres around it (NaN when a corner has no data). Any raster GDAL opens
works, a VRT mosaic of many tiles included; only the windows asked for are
read.
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
    """Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""The plugin's windowed raster (``plugin/gdal_raster.py``) with the batch runner's sentences."""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""

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
    """Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""Open a raster in the driver and refuse what the plugin refuses."""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""
    if not os.path.exists(path) and not str(path).startswith("/vsi"):
        msg = f"The {label} {path} does not exist."
        raise BatchError(msg)
    raster = GdalRaster(path)
    if not raster.crs_wkt:
        msg = f"The {label} {path} has no coordinate reference system."
        raise BatchError(msg)
    return raster


def same_crs(wkt_a: str, wkt_b: str) -> bool:
    """Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""True when two WKT strings describe the same CRS."""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""
    a, b = osr.SpatialReference(), osr.SpatialReference()
    a.ImportFromWkt(wkt_a)
    b.ImportFromWkt(wkt_b)
    return bool(a.IsSame(b))


def warp_to(path: str, src_wkt: str, dst_wkt: str, target: str) -> str:
    """Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""Reproject a raster (bilinear) to ``target`` with the plugin's options."""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""
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
    """Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""A raster opened once per worker process (GDAL datasets are per process)."""Elevation rasters for the batch runner: GDAL windows, no QGIS.

The raster class is the plugin's own GDAL-only ``plugin/gdal_raster.py``
(rows run south, NoData becomes NaN, point heights by the engine's one
sampler) with this runner's sentences; any raster GDAL opens works, a VRT
mosaic of many tiles included, and only the windows asked for are read.
"""
    raster = _OPEN.get(path)
    if raster is None:
        gdal.SetCacheMax(GDAL_CACHE_BYTES)
        raster = _OPEN[path] = GdalRaster(path)
    return raster
