# SPDX-License-Identifier: GPL-2.0-or-later
"""Regional and residual grids of an anomaly raster.

``residual = input - regional`` cell by cell, so regional + residual gives
the input back (to rounding) wherever the input has a value.
"""

from __future__ import annotations

from dataclasses import dataclass, field

import numpy as np
import numpy.typing as npt

from ._continuation import ContinuationSettings, upward_continuation
from ._trend import TrendSurface, fit_trend_surface

# Frozen, so one shared default instance is safe.
_DEFAULT_CONTINUATION = ContinuationSettings()


@dataclass(frozen=True)
class Separation:
    """Regional and residual grids (NaN where the input is NaN).

    Attributes
    ----------
    regional, residual : numpy.ndarray
        Same shape and units as the input.
    method : str
        ``"trend"`` or ``"continuation"``.
    trend : TrendSurface or None
        The fitted surface for the trend method.
    settings : dict
        What was used (order, robust weights, height, padding), for provenance.
    """

    regional: np.ndarray
    residual: np.ndarray
    method: str
    trend: TrendSurface | None = None
    settings: dict = field(default_factory=dict)


def _cell_centres(shape, west: float, north: float, cell_x: float, cell_y: float):
    rows, cols = shape
    x = west + (np.arange(cols) + 0.5) * cell_x
    y = north - (np.arange(rows) + 0.5) * cell_y
    return np.meshgrid(x, y)


def separate_by_trend(
    grid: npt.ArrayLike,
    west: float,
    north: float,
    cell_x: float,
    cell_y: float,
    order: int = 1,
    robust: str | None = None,
) -> Separation:
    """Regional = polynomial trend surface fitted to the grid's valid cells.

    Parameters
    ----------
    grid : array_like
        2-D anomaly, row 0 northern, NaN for no data (mGal).
    west, north : float
        Outer edges of the grid in m.
    cell_x, cell_y : float
        Cell sizes in m.
    order : {1, 2, 3}
        Degree of the polynomial.
    robust : {None, "huber", "tukey"}
        Robust reweighting (see :func:`fit_trend_surface`).

    Returns
    -------
    Separation

    Notes
    -----
    :math:`R = \\sum c_{ij} u^i v^j` fitted to the cell centres by least
    squares; residual :math:`= g - R` (Beltrão et al. 1991, Geophysics
    56(2), 208-220, for the robust trend as a regional, from memory).

    Examples
    --------
    >>> g = np.add.outer(-np.arange(3.0), np.arange(4.0))  # rises east and south
    >>> s = separate_by_trend(g, 0.0, 300.0, 100.0, 100.0, order=1)
    >>> print(float(np.max(np.abs(s.residual))) < 1e-12)
    True
    """
    values = np.asarray(grid, dtype=float)
    xx, yy = _cell_centres(values.shape, west, north, cell_x, cell_y)
    trend = fit_trend_surface(xx, yy, values, order=order, robust=robust)
    regional = trend.evaluate(xx, yy)
    regional[~np.isfinite(values)] = np.nan
    return Separation(
        regional, values - regional, "trend", trend, {"order": int(order), "robust": robust or "none"}
    )


def separate_by_continuation(
    grid: npt.ArrayLike,
    cell_x: float,
    cell_y: float,
    height: float,
    settings: ContinuationSettings = _DEFAULT_CONTINUATION,
) -> Separation:
    """Regional = the anomaly continued upward by ``height`` m (FFT, Blakely 1995).

    Parameters
    ----------
    grid : array_like
        2-D anomaly on a level surface, NaN for no data (mGal).
    cell_x, cell_y : float
        Cell sizes in m.
    height : float
        Rise in m (> 0).
    settings : ContinuationSettings
        Padding and taper.

    Returns
    -------
    Separation

    Examples
    --------
    >>> s = separate_by_continuation(np.full((6, 6), 2.0), 50.0, 50.0, 200.0)
    >>> print(float(np.max(np.abs(s.residual))) < 1e-12)
    True
    """
    values = np.asarray(grid, dtype=float)
    regional = upward_continuation(values, cell_x, cell_y, height, settings)
    return Separation(
        regional,
        values - regional,
        "continuation",
        None,
        {"height_m": float(height), "pad_fraction": settings.pad_fraction, "taper": settings.taper},
    )


def separate_grid(grid, west, north, cell_x, cell_y, method: str, **options) -> Separation:
    """Dispatch to :func:`separate_by_trend` or :func:`separate_by_continuation`.

    Examples
    --------
    >>> s = separate_grid(np.ones((4, 4)), 0.0, 400.0, 100.0, 100.0, "trend", order=1)
    >>> s.method
    'trend'
    """
    if method == "trend":
        return separate_by_trend(grid, west, north, cell_x, cell_y, **options)
    if method == "continuation":
        return separate_by_continuation(grid, cell_x, cell_y, **options)
    msg = f"method must be 'trend' or 'continuation', got {method!r}"
    raise ValueError(msg)
