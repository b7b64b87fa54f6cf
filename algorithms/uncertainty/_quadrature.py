# SPDX-License-Identifier: GPL-2.0-or-later
"""Mean and spread of a function of a normal variable by Gauss–Hermite quadrature.

For :math:`X \\sim N(\\mu, \\sigma^2)`,

.. math::

    E[f(X)] \\approx \\sum_k w_k f(\\mu + \\sigma \\xi_k),

with the nodes :math:`\\xi_k` and weights :math:`w_k` of the probabilists'
Hermite polynomials normalised to sum to one (Abramowitz & Stegun 1964,
Handbook of Mathematical Functions, 25.4.46). ``n`` nodes integrate
polynomials of degree ``2n - 1`` exactly, so the spread of a function that
is quadratic near the mean (the terrain correction of a cell whose top is
close to the station level) comes out exact, where a first-order
(derivative) propagation would give zero.
"""

from __future__ import annotations

from collections.abc import Callable

import numpy as np
from numpy.polynomial.hermite_e import hermegauss

#: Nodes used by default: exact for polynomials up to degree 13.
DEFAULT_NODES = 7


def normal_nodes(n: int = DEFAULT_NODES) -> tuple[np.ndarray, np.ndarray]:
    """Standard-normal quadrature nodes and weights (weights sum to 1).

    Parameters
    ----------
    n : int
        Number of nodes (>= 1).

    Returns
    -------
    nodes, weights : numpy.ndarray

    Examples
    --------
    >>> x, w = normal_nodes(3)
    >>> round(float(np.sum(w * x**2)), 12)
    1.0
    """
    if n < 1:
        msg = f"at least one quadrature node is needed, got {n}"
        raise ValueError(msg)
    x, w = hermegauss(n)
    return x, w / w.sum()


def normal_spread(f: Callable[[np.ndarray], np.ndarray], sigma: float | np.ndarray, n: int = DEFAULT_NODES):
    """Mean shift and standard deviation of ``f(sigma * xi)`` for standard normal xi.

    Parameters
    ----------
    f : callable
        ``f(delta)`` with ``delta`` of shape ``(n,) + shape`` (one slice per
        node, broadcast against ``sigma``); returns values of the same shape.
    sigma : float or numpy.ndarray
        Standard deviation of the perturbation (same units as ``delta``).
    n : int
        Number of nodes.

    Returns
    -------
    mean, std : numpy.ndarray
        Expected value of ``f`` and its standard deviation.

    Examples
    --------
    >>> mean, std = normal_spread(lambda d: d**2, 2.0)
    >>> round(float(mean), 9), round(float(std), 9)
    (4.0, 5.656854249)
    """
    x, w = normal_nodes(n)
    sigma = np.asarray(sigma, dtype=float)
    delta = x.reshape((-1,) + (1,) * sigma.ndim) * sigma
    values = np.asarray(f(delta), dtype=float)
    wk = w.reshape((-1,) + (1,) * (values.ndim - 1))
    mean = np.sum(wk * values, axis=0)
    var = np.sum(wk * (values - mean) ** 2, axis=0)
    return mean, np.sqrt(np.maximum(var, 0.0))


def weighted_sum(weights: np.ndarray, values: np.ndarray) -> np.ndarray:
    """``sum_k weights[k] * values[k]`` over the first axis, one element at a time.

    The same result as ``np.tensordot(weights, values, axes=1)`` up to
    rounding, but each output element depends only on its own column: a
    matrix product (BLAS) may round a column differently with the array's
    length or alignment, so a station's value would depend on which other
    stations were computed with it (the batch runner's chunks).

    Parameters
    ----------
    weights : numpy.ndarray
        Shape ``(n,)``.
    values : numpy.ndarray
        Shape ``(n, ...)``.

    Returns
    -------
    numpy.ndarray
        Shape ``values.shape[1:]``.

    Examples
    --------
    >>> weighted_sum(np.array([0.25, 0.75]), np.array([[4.0, 8.0], [0.0, 4.0]])).tolist()
    [1.0, 5.0]
    """
    values = np.asarray(values, dtype=float)
    total = np.zeros(values.shape[1:])
    for w, row in zip(np.asarray(weights, dtype=float), values):
        total = total + w * row
    return total
