# SPDX-License-Identifier: GPL-2.0-or-later
"""Grid geometry, default extent and cell size, station clean-up and blanking."""

from __future__ import annotations

import math
import warnings
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt
from scipy.spatial import cKDTree

#: Default margin around the stations' bounding box, as a fraction of the
#: box's longer side (common practice, no source: enough for contours to
#: close just outside the outermost stations without much extrapolation).
DEFAULT_MARGIN_FRACTION = 0.05


@dataclass(frozen=True)
class GridGeometry:
    """A north-up raster of square cells; nodes are the cell centres.

    Parameters
    ----------
    west : float
        Easting of the grid's western edge, in metres (CRS units).
    north : float
        Northing of the grid's northern edge, in metres (CRS units).
    cell_size : float
        Side of a square cell, in metres (CRS units); > 0.
    n_cols, n_rows : int
        Number of columns (west to east) and rows (north to south); >= 1.

    Notes
    -----
    Cell ``(i, j)`` (row ``i`` counted from the north, column ``j`` from the
    west) has its centre at

    .. math::

        x_j = W + (j + \\tfrac12) h, \\qquad y_i = N - (i + \\tfrac12) h .

    Examples
    --------
    >>> g = GridGeometry(west=0.0, north=30.0, cell_size=10.0, n_cols=4, n_rows=3)
    >>> g.east, g.south
    (40.0, 0.0)
    >>> g.x_centres.tolist(), g.y_centres.tolist()
    ([5.0, 15.0, 25.0, 35.0], [25.0, 15.0, 5.0])
    >>> g.geotransform
    (0.0, 10.0, 0.0, 30.0, 0.0, -10.0)
    """

    west: float
    north: float
    cell_size: float
    n_cols: int
    n_rows: int

    def __post_init__(self) -> None:
        if not (math.isfinite(self.cell_size) and self.cell_size > 0):
            msg = f"Invalid cell_size {self.cell_size!r}: expected a finite number > 0."
            raise ValueError(msg)
        if not (math.isfinite(self.west) and math.isfinite(self.north)):
            msg = f"Invalid grid origin ({self.west!r}, {self.north!r}): expected finite numbers."
            raise ValueError(msg)
        if int(self.n_cols) != self.n_cols or int(self.n_rows) != self.n_rows:
            msg = f"n_cols and n_rows must be integers, got {self.n_cols!r}, {self.n_rows!r}."
            raise ValueError(msg)
        if self.n_cols < 1 or self.n_rows < 1:
            msg = f"Grid must have at least one row and column, got {self.n_rows} x {self.n_cols}."
            raise ValueError(msg)

    @property
    def east(self) -> float:
        """Easting of the eastern edge (CRS units)."""
        return self.west + self.n_cols * self.cell_size

    @property
    def south(self) -> float:
        """Northing of the southern edge (CRS units)."""
        return self.north - self.n_rows * self.cell_size

    @property
    def shape(self) -> tuple[int, int]:
        """``(n_rows, n_cols)``, the shape of the gridded array."""
        return (int(self.n_rows), int(self.n_cols))

    @property
    def x_centres(self) -> np.ndarray:
        """Eastings of the column centres, west to east (CRS units)."""
        return self.west + (np.arange(self.n_cols) + 0.5) * self.cell_size

    @property
    def y_centres(self) -> np.ndarray:
        """Northings of the row centres, north to south (CRS units)."""
        return self.north - (np.arange(self.n_rows) + 0.5) * self.cell_size

    @property
    def geotransform(self) -> tuple[float, float, float, float, float, float]:
        """GDAL-style affine transform ``(west, h, 0, north, 0, -h)``."""
        return (
            float(self.west),
            float(self.cell_size),
            0.0,
            float(self.north),
            0.0,
            -float(self.cell_size),
        )


def clean_stations(
    x: npt.ArrayLike, y: npt.ArrayLike, values: npt.ArrayLike | None = None
) -> tuple[np.ndarray, ...]:
    """Drop stations whose coordinates (or value) are not finite.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units), same length.
    values : array_like, optional
        Station values (any unit), same length.

    Returns
    -------
    tuple of numpy.ndarray
        ``(x, y)`` or ``(x, y, values)`` as float64, finite rows only.

    Examples
    --------
    >>> clean_stations([0, 1, np.nan], [0, 1, 2], [5, np.nan, 7])
    (array([0.]), array([0.]), array([5.]))
    """
    x = np.asarray(x, dtype=float).ravel()
    y = np.asarray(y, dtype=float).ravel()
    arrays = [x, y]
    if values is not None:
        arrays.append(np.asarray(values, dtype=float).ravel())
    sizes = {a.size for a in arrays}
    if len(sizes) != 1:
        msg = f"x, y (and values) must have the same length, got sizes {[a.size for a in arrays]}."
        raise ValueError(msg)
    keep = np.ones(x.size, dtype=bool)
    for a in arrays:
        keep &= np.isfinite(a)
    return tuple(a[keep] for a in arrays)


def nice_number(value: float, steps: tuple[float, ...] = (1.0, 2.0, 2.5, 5.0)) -> float:
    """Largest number ``s * 10**k`` (``s`` in ``steps``) not above ``value``.

    Parameters
    ----------
    value : float
        A positive number.
    steps : tuple of float
        Mantissas allowed, ascending, in [1, 10).

    Returns
    -------
    float
        The "nice" number, <= ``value``.

    Examples
    --------
    >>> nice_number(137.0), nice_number(0.0042), nice_number(250.0)
    (100.0, 0.0025, 250.0)
    """
    if not (math.isfinite(value) and value > 0):
        msg = f"Cannot round {value!r} to a nice number: expected a finite number > 0."
        raise ValueError(msg)
    exponent = math.floor(math.log10(value))
    best = steps[0] * 10.0**exponent
    for s in steps:
        candidate = s * 10.0**exponent
        # A relative tolerance keeps 250.0 from rounding down to 200 through
        # the binary representation of 10**k.
        if candidate <= value * (1 + 1e-12):
            best = candidate
    return float(best)


def station_spacing(x: npt.ArrayLike, y: npt.ArrayLike) -> float:
    """Typical station spacing: the median distance to the nearest distinct neighbour.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units). Non-finite rows are
        dropped; coincident stations count once.

    Returns
    -------
    float
        Spacing in CRS units.

    Raises
    ------
    ValueError
        With fewer than 2 distinct stations.

    Examples
    --------
    >>> xs, ys = np.meshgrid(np.arange(0.0, 1000.0, 100.0), np.arange(0.0, 500.0, 100.0))
    >>> station_spacing(xs.ravel(), ys.ravel())
    100.0
    """
    x, y = clean_stations(x, y)
    points = np.unique(np.column_stack([x, y]), axis=0)
    if points.shape[0] < 2:
        msg = f"Need at least 2 distinct stations to estimate a spacing, got {points.shape[0]}."
        raise ValueError(msg)
    distances, _ = cKDTree(points).query(points, k=2)
    return float(np.median(distances[:, 1]))


def default_cell_size(x: npt.ArrayLike, y: npt.ArrayLike) -> float:
    """Cell size from the typical station spacing.

    The rule: half the median distance from each station to its nearest
    distinct neighbour, rounded *down* to a nice number (1, 2, 2.5 or 5 times
    a power of ten). Half the spacing gives about two nodes between
    neighbouring stations, so most stations fall in a cell of their own and
    the surface has room to bend between them, while the grid stays no
    finer than the data can support (common practice, no source).

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units). Non-finite rows are
        dropped; coincident stations count once.

    Returns
    -------
    float
        Cell size in CRS units.

    Examples
    --------
    >>> xs, ys = np.meshgrid(np.arange(0.0, 1000.0, 100.0), np.arange(0.0, 500.0, 100.0))
    >>> default_cell_size(xs.ravel(), ys.ravel())
    50.0
    """
    return nice_number(station_spacing(x, y) / 2.0)


def default_grid_geometry(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    cell_size: float | None = None,
    extent: tuple[float, float, float, float] | None = None,
    margin: float | None = None,
) -> GridGeometry:
    """Grid covering the stations (or a given extent), snapped to whole cells.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units).
    cell_size : float, optional
        Cell size (CRS units). Default: :func:`default_cell_size`.
    extent : tuple of float, optional
        ``(west, east, south, north)`` to cover (CRS units). Default: the
        stations' bounding box grown by ``margin`` on every side.
    margin : float, optional
        Margin added on every side of the bounding box (CRS units); ignored
        when ``extent`` is given. Default: 5 % of the box's longer side
        (:data:`DEFAULT_MARGIN_FRACTION`).

    Returns
    -------
    GridGeometry
        Edges are whole multiples of ``cell_size`` (so grids of the same
        cell size align) and the grid contains the requested extent.

    Examples
    --------
    >>> g = default_grid_geometry([0.0, 1000.0], [0.0, 500.0], cell_size=100.0)
    >>> (g.west, g.east, g.south, g.north, g.n_cols, g.n_rows)
    (-100.0, 1100.0, -100.0, 600.0, 12, 7)
    """
    x, y = clean_stations(x, y)
    if x.size == 0 and extent is None:
        msg = "No station with finite coordinates: cannot choose a grid extent."
        raise ValueError(msg)
    if cell_size is None:
        cell_size = default_cell_size(x, y)
    cell_size = float(cell_size)
    if not (math.isfinite(cell_size) and cell_size > 0):
        msg = f"Invalid cell_size {cell_size!r}: expected a finite number > 0."
        raise ValueError(msg)
    if extent is None:
        width = float(x.max() - x.min())
        height = float(y.max() - y.min())
        if margin is None:
            margin = DEFAULT_MARGIN_FRACTION * max(width, height)
        if margin < 0 or not math.isfinite(margin):
            msg = f"Invalid margin {margin!r}: expected a finite number >= 0."
            raise ValueError(msg)
        west, east = x.min() - margin, x.max() + margin
        south, north = y.min() - margin, y.max() + margin
    else:
        west, east, south, north = (float(v) for v in extent)
        if not (east > west and north > south):
            msg = f"Invalid extent {extent!r}: expected (west, east, south, north) with east > west and north > south."
            raise ValueError(msg)
    # The tiny tolerance stops an edge that is already a whole multiple of the
    # cell from gaining an extra cell through rounding error.
    eps = 1e-9
    west_s = math.floor(west / cell_size + eps) * cell_size
    east_s = math.ceil(east / cell_size - eps) * cell_size
    south_s = math.floor(south / cell_size + eps) * cell_size
    north_s = math.ceil(north / cell_size - eps) * cell_size
    n_cols = max(1, int(round((east_s - west_s) / cell_size)))
    n_rows = max(1, int(round((north_s - south_s) / cell_size)))
    if n_cols * n_rows > 50_000_000:
        warnings.warn(
            f"The grid has {n_rows} x {n_cols} nodes; gridding will be slow and memory hungry.",
            stacklevel=2,
        )
    return GridGeometry(float(west_s), float(north_s), cell_size, n_cols, n_rows)


def blank_far_cells(
    geometry: GridGeometry, x: npt.ArrayLike, y: npt.ArrayLike, distance: float
) -> np.ndarray:
    """Mask of the cells whose centre is farther than ``distance`` from every station.

    Parameters
    ----------
    geometry : GridGeometry
        The grid.
    x, y : array_like
        Station eastings and northings (CRS units); non-finite rows dropped.
    distance : float
        Blanking distance (CRS units), > 0.

    Returns
    -------
    numpy.ndarray of bool, shape (n_rows, n_cols)
        True where the cell should become NoData.

    Examples
    --------
    >>> g = GridGeometry(0.0, 30.0, 10.0, 3, 3)
    >>> blank_far_cells(g, [5.0], [25.0], 15.0).astype(int)
    array([[0, 0, 1],
           [0, 0, 1],
           [1, 1, 1]])
    """
    x, y = clean_stations(x, y)
    distance = float(distance)
    if not (math.isfinite(distance) and distance > 0):
        msg = f"Invalid blanking distance {distance!r}: expected a finite number > 0."
        raise ValueError(msg)
    if x.size == 0:
        return np.ones(geometry.shape, dtype=bool)
    tree = cKDTree(np.column_stack([x, y]))
    mask = np.empty(geometry.shape, dtype=bool)
    xc = geometry.x_centres
    yc = geometry.y_centres
    # Row blocks keep the query's temporary arrays small on big grids.
    block = max(1, 2_000_000 // max(1, geometry.n_cols))
    for start in range(0, geometry.n_rows, block):
        rows = yc[start : start + block]
        xx, yy = np.meshgrid(xc, rows)
        nearest, _ = tree.query(
            np.column_stack([xx.ravel(), yy.ravel()]), k=1, distance_upper_bound=distance
        )
        mask[start : start + rows.size] = ~np.isfinite(nearest).reshape(rows.size, -1)
    return mask
