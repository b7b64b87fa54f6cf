# SPDX-License-Identifier: GPL-2.0-or-later
"""A single-band elevation raster read by windows with GDAL alone (no QGIS).

Shared by the plugin (``plugin/raster_io.py``) and the batch runner
(``batch/rasters.py``), which turn a :class:`RasterProblem` into their own
sentence. Rows always run south (a south-up raster is read flipped), NoData
and non-finite cells become NaN, and point heights follow the engine's one
sampler (``algorithms/terrain/_sampling.py``).
"""

from __future__ import annotations

import math

import numpy as np
from osgeo import gdal, osr

gdal.UseExceptions()

#: Kinds of :class:`RasterProblem`.
CANNOT_OPEN, ROTATED = "open", "rotated"


class RasterProblem(ValueError):
    """A raster that cannot be used: ``kind`` is "open" or "rotated"; ``detail`` GDAL's words."""

    def __init__(self, kind: str, path: str, detail: str = "") -> None:
        super().__init__(f"{kind}: {path} {detail}".strip())
        self.kind = kind
        self.path = path
        self.detail = detail


class WindowedRaster:
    """A single-band elevation raster opened read-only, read by windows.

    Parameters
    ----------
    path : str
        Any file GDAL opens (GeoTIFF, VRT mosaic, ...).
    crs_wkt : str, optional
        CRS to use instead of the file's own.
    geographic : bool, optional
        Whether coordinates are degrees; from the CRS when not given.

    Raises
    ------
    RasterProblem
        When GDAL cannot open the file or the raster is rotated.
    """

    def __init__(self, path: str, crs_wkt: str = "", geographic: bool | None = None):
        try:
            self.dataset = gdal.Open(str(path), gdal.GA_ReadOnly)
        except RuntimeError as error:
            raise RasterProblem(CANNOT_OPEN, str(path), str(error)) from error
        if self.dataset is None:
            raise RasterProblem(CANNOT_OPEN, str(path))
        self.path = str(path)
        self.band = self.dataset.GetRasterBand(1)
        self.nodata = self.band.GetNoDataValue()
        x0, dx, rx, y0, ry, dy = self.dataset.GetGeoTransform()
        if rx != 0 or ry != 0:
            raise RasterProblem(ROTATED, str(path))
        # A south-up raster (positive dy) is read flipped so rows always run south.
        self.flipped = dy > 0
        self.x_origin = x0
        self.cell_x = abs(dx)
        self.cell_y = abs(dy)
        self.n_cols = self.dataset.RasterXSize
        self.n_rows = self.dataset.RasterYSize
        self.y_origin = y0 + dy * self.n_rows if self.flipped else y0
        self.crs_wkt = crs_wkt or self.dataset.GetProjection() or ""
        if geographic is None:
            srs = osr.SpatialReference()
            geographic = bool(self.crs_wkt) and srs.ImportFromWkt(self.crs_wkt) == 0 and bool(srs.IsGeographic())
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
