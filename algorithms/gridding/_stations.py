# SPDX-License-Identifier: GPL-2.0-or-later
"""Stations to grid nodes: validation, per-cell averaging, nearest node."""

from __future__ import annotations

import warnings
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from ._geometry import GridGeometry, clean_stations


@dataclass(frozen=True)
class CellData:
    """Stations averaged per grid cell.

    Attributes
    ----------
    node : numpy.ndarray of int
        Flat index ``i * n_cols + j`` of the cell (node) holding the average.
    row_offset, col_offset : numpy.ndarray
        Position of the averaged station relative to its node, in cell units
        (``col_offset`` positive east, ``row_offset`` positive south), each
        in [-0.5, 0.5].
    value : numpy.ndarray
        Averaged value (units of the input).
    count : numpy.ndarray of int
        Number of stations averaged.
    """

    node: np.ndarray
    row_offset: np.ndarray
    col_offset: np.ndarray
    value: np.ndarray
    count: np.ndarray


def average_per_cell(
    x: npt.ArrayLike, y: npt.ArrayLike, values: npt.ArrayLike, geometry: GridGeometry
) -> CellData:
    """Average the stations that share a grid cell (position and value).

    Non-finite rows are dropped; stations outside the grid are dropped with a
    warning. Fewer than 3 cells with data, or cells all on one line, raise
    ``ValueError`` because a plane (and so the surface) is then undetermined.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units).
    values : array_like
        Station values (any unit).
    geometry : GridGeometry
        The grid; each station goes to the cell that contains it.

    Returns
    -------
    CellData
        One entry per cell holding at least one station.

    Notes
    -----
    Both the mean position :math:`\\bar x, \\bar y` and the mean value
    :math:`\\bar u` of the stations in a cell are kept. For data sampled
    from a plane :math:`u = a + bx + cy`, :math:`\\bar u = a + b\\bar x + c\\bar y`
    exactly, so averaging never spoils the exact reproduction of planes.
    Pre-averaging per cell is the usual way to give a finite-difference
    surface one constraint per node (Smith & Wessel 1990, from memory).

    Examples
    --------
    >>> g = GridGeometry(0.0, 20.0, 10.0, 2, 2)
    >>> d = average_per_cell([1, 3, 15, 5], [19, 17, 15, 5], [1.0, 3.0, 7.0, 9.0], g)
    >>> d.node.tolist(), d.value.tolist(), d.count.tolist()
    ([0, 1, 2], [2.0, 7.0, 9.0], [2, 1, 1])
    >>> d.col_offset.tolist(), d.row_offset.tolist()
    ([-0.3, 0.0, 0.0], [-0.3, 0.0, 0.0])
    """
    x, y, values = clean_stations(x, y, values)
    h = geometry.cell_size
    col = (x - geometry.west) / h
    row = (geometry.north - y) / h
    inside = (col >= 0) & (col <= geometry.n_cols) & (row >= 0) & (row <= geometry.n_rows)
    if not inside.all():
        warnings.warn(
            f"{int((~inside).sum())} station(s) outside the grid extent were ignored.",
            stacklevel=3,
        )
    x, y, values, col, row = (a[inside] for a in (x, y, values, col, row))
    j = np.minimum(np.floor(col).astype(np.int64), geometry.n_cols - 1)
    i = np.minimum(np.floor(row).astype(np.int64), geometry.n_rows - 1)
    flat = i * geometry.n_cols + j
    nodes, inverse, count = np.unique(flat, return_inverse=True, return_counts=True)
    mean_col = np.bincount(inverse, weights=col) / count
    mean_row = np.bincount(inverse, weights=row) / count
    mean_val = np.bincount(inverse, weights=values) / count
    if nodes.size < 3:
        msg = (
            f"Need stations in at least 3 different grid cells to grid, got {nodes.size} "
            f"(from {values.size} usable station(s)); use a smaller cell size or more stations."
        )
        raise ValueError(msg)
    design = np.column_stack([np.ones(nodes.size), mean_col - mean_col.mean(), mean_row - mean_row.mean()])
    if np.linalg.matrix_rank(design, tol=1e-9 * max(1.0, np.abs(design).max())) < 3:
        msg = "All stations lie on one line (after averaging per cell): a surface is undetermined."
        raise ValueError(msg)
    node_i = nodes // geometry.n_cols
    node_j = nodes % geometry.n_cols
    return CellData(
        node=nodes,
        row_offset=mean_row - (node_i + 0.5),
        col_offset=mean_col - (node_j + 0.5),
        value=mean_val,
        count=count,
    )
