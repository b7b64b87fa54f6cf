# SPDX-License-Identifier: GPL-2.0-or-later
"""Elevation rasters read by windows.

The engine never asks for a whole raster: it asks an :class:`ElevationGrid`
for windows, and the grid clips each request to its extent, filling the parts
outside with NaN. The plugin builds one over GDAL; tests build one over an
array.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Callable

import numpy as np
import numpy.typing as npt

WindowReader = Callable[[int, int, int, int], np.ndarray]


@dataclass(frozen=True)
class ElevationGrid:
    """A north-up raster of heights (m) read through windows.

    Parameters
    ----------
    x_origin, y_origin : float
        West edge and north edge of the raster (CRS units: metres, or degrees
        of longitude and latitude when ``geographic``).
    cell_x, cell_y : float
        Cell width and height (> 0, same units); rows run south.
    n_rows, n_cols : int
        Raster size.
    reader : callable
        ``reader(row0, col0, n_rows, n_cols)`` returning a float array of
        that window, which lies wholly inside the raster, NaN for NoData.
    geographic : bool
        True when coordinates are degrees (lon, lat).

    Notes
    -----
    Cell (i, j) has its centre at ``x_origin + (j + 0.5) * cell_x``,
    ``y_origin - (i + 0.5) * cell_y``.

    Examples
    --------
    >>> import numpy as np
    >>> g = ElevationGrid.from_array(np.arange(6.0).reshape(2, 3), 0, 20, 10, 10)
    >>> g.read_window(-1, 1, 2, 3)
    array([[nan, nan, nan],
           [ 1.,  2., nan]])
    """

    x_origin: float
    y_origin: float
    cell_x: float
    cell_y: float
    n_rows: int
    n_cols: int
    reader: WindowReader = field(repr=False, compare=False)
    geographic: bool = False

    def __post_init__(self) -> None:
        if not (self.cell_x > 0 and self.cell_y > 0):
            msg = f"cell sizes must be > 0, got {self.cell_x!r}, {self.cell_y!r}"
            raise ValueError(msg)
        if self.n_rows < 1 or self.n_cols < 1:
            msg = f"raster size must be at least 1 x 1, got {self.n_rows} x {self.n_cols}"
            raise ValueError(msg)
        south = self.y_origin - self.n_rows * self.cell_y
        if self.geographic and (self.y_origin > 90.0 + 1e-9 or south < -90.0 - 1e-9):
            msg = "geographic raster extends beyond the poles"
            raise ValueError(msg)

    @classmethod
    def from_array(
        cls,
        array: npt.ArrayLike,
        x_origin: float,
        y_origin: float,
        cell_x: float,
        cell_y: float,
        geographic: bool = False,
        nodata: float | None = None,
    ) -> ElevationGrid:
        """Grid over an in-memory array (row 0 is the northern row).

        Parameters
        ----------
        array : array_like
            2-D heights in metres.
        x_origin, y_origin, cell_x, cell_y, geographic
            As for the class.
        nodata : float, optional
            Value marking missing cells (NaN always does).

        Returns
        -------
        ElevationGrid

        Examples
        --------
        >>> g = ElevationGrid.from_array([[1, -9], [3, 4]], 0, 2, 1, 1, nodata=-9)
        >>> g.read_window(0, 0, 1, 2)
        array([[ 1., nan]])
        """
        data = np.array(array, dtype=float)
        if data.ndim != 2:
            msg = f"elevation array must be 2-D, got shape {data.shape}"
            raise ValueError(msg)
        if nodata is not None:
            data[data == nodata] = np.nan

        def reader(row0: int, col0: int, n_rows: int, n_cols: int) -> np.ndarray:
            return data[row0 : row0 + n_rows, col0 : col0 + n_cols]

        return cls(
            float(x_origin), float(y_origin), float(cell_x), float(cell_y),
            data.shape[0], data.shape[1], reader, bool(geographic),
        )

    def read_window(self, row0: int, col0: int, n_rows: int, n_cols: int) -> np.ndarray:
        """Heights of a window in metres (float64), NaN for NoData and outside.

        Parameters
        ----------
        row0, col0 : int
            Index of the window's north-west cell (may be outside the raster).
        n_rows, n_cols : int
            Window size (>= 0).

        Returns
        -------
        numpy.ndarray
            Array of shape (n_rows, n_cols).

        Examples
        --------
        >>> g = ElevationGrid.from_array([[5.0]], 0, 1, 1, 1)
        >>> g.read_window(0, 0, 1, 2)
        array([[ 5., nan]])
        """
        out = np.full((max(n_rows, 0), max(n_cols, 0)), np.nan)
        r0, r1 = max(row0, 0), min(row0 + n_rows, self.n_rows)
        c0, c1 = max(col0, 0), min(col0 + n_cols, self.n_cols)
        if r1 > r0 and c1 > c0:
            block = np.asarray(self.reader(r0, c0, r1 - r0, c1 - c0), dtype=float)
            if block.shape != (r1 - r0, c1 - c0):
                msg = f"window reader returned shape {block.shape}, expected {(r1 - r0, c1 - c0)}"
                raise ValueError(msg)
            out[r0 - row0 : r1 - row0, c0 - col0 : c1 - col0] = block
        return out

    @property
    def x_end(self) -> float:
        """East edge of the raster (CRS units).

        Examples
        --------
        >>> ElevationGrid.from_array([[0.0, 0.0]], 10, 1, 5, 1).x_end
        20.0
        """
        return self.x_origin + self.n_cols * self.cell_x

    @property
    def y_end(self) -> float:
        """South edge of the raster (CRS units).

        Examples
        --------
        >>> ElevationGrid.from_array([[0.0], [0.0]], 0, 10, 1, 4).y_end
        2.0
        """
        return self.y_origin - self.n_rows * self.cell_y
