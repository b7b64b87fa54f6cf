# SPDX-License-Identifier: GPL-2.0-or-later
"""Parasnis (1952) density: regression of the free-air anomaly on the unit-density Bouguer term.

With :math:`B_k` the Bouguer and terrain term of station k per unit density
(slab + curvature - terrain correction, mGal per kg/m^3, the terrain
correction being linear in density), the free-air anomaly is modelled as

.. math:: \\Delta g_{FA,k} = \\rho\\, B_k + R(x_k, y_k) + e_k,

with a regional term R that is a constant (``"none"``: Parasnis's straight
line with an intercept), a plane (``"planar"``) or a quadratic surface
(``"quadratic"``) in the coordinates. Ordinary least squares gives
:math:`\\hat\\rho`, its standard error :math:`s\\sqrt{[(X^TX)^{-1}]_{11}}` and a
Student-t interval with n - p degrees of freedom (e.g. Draper & Smith
1998, Applied Regression Analysis, 3rd ed., Wiley, ch. 3, from memory).
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt
from scipy.special import stdtrit

REGIONAL_TERMS = ("none", "planar", "quadratic")


def regional_design(x: npt.ArrayLike, y: npt.ArrayLike, regional: str = "planar") -> np.ndarray:
    """Columns of the regional term: 1; 1, u, v; or 1, u, v, u^2, uv, v^2.

    u, v are the coordinates centred on their mean and divided by the larger
    half-range (well-conditioned; the density does not depend on it).

    Parameters
    ----------
    x, y : array_like
        Coordinates in m.
    regional : {"none", "planar", "quadratic"}

    Returns
    -------
    numpy.ndarray
        Shape (n, 1), (n, 3) or (n, 6).

    Examples
    --------
    >>> regional_design([0.0, 2.0], [0.0, 0.0], "planar")
    array([[ 1., -1.,  0.],
           [ 1.,  1.,  0.]])
    """
    if regional not in REGIONAL_TERMS:
        msg = f"regional term must be one of {REGIONAL_TERMS}, got {regional!r}"
        raise ValueError(msg)
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    columns = [np.ones(x.shape)]
    if regional != "none":
        scale = max(np.ptp(x), np.ptp(y)) / 2.0 if x.size else 1.0
        scale = scale or 1.0
        u = (x - x.mean()) / scale
        v = (y - y.mean()) / scale
        columns += [u, v]
        if regional == "quadratic":
            columns += [u * u, u * v, v * v]
    return np.stack(columns, axis=-1)


def remove_regional(values: np.ndarray, design: np.ndarray) -> np.ndarray:
    """Least-squares residual of each column of ``values`` after the regional design.

    A rank-deficient design (stations along one straight line) is handled by
    the minimum-norm solution: the projection is still well defined.

    Examples
    --------
    >>> d = regional_design([0.0, 1.0, 2.0], [0.0, 0.0, 0.0], "planar")
    >>> print(np.round(remove_regional(np.array([1.0, 3.0, 5.0]), d), 12) + 0.0)
    [0. 0. 0.]
    """
    coefficients = np.linalg.lstsq(design, values, rcond=None)[0]
    return values - design @ coefficients


@dataclass(frozen=True)
class ParasnisFit:
    """Result of :func:`parasnis_density`.

    Attributes
    ----------
    density, standard_error, low, high : float
        Estimate, its standard error and the interval bounds (kg/m^3).
    confidence : float
        Level of the interval (0.95).
    n_stations, degrees_of_freedom : int
    intercept : float
        Regional term at the stations' centre (mGal).
    residual_rms : float
        Root mean square of the regression residuals (mGal).
    relief_shared : float
        Fraction (0-1) of the variance of the unit term explained by the
        regional term alone: near 1 the density and the regional cannot be
        told apart.
    regional : str
    """

    density: float
    standard_error: float
    low: float
    high: float
    confidence: float
    n_stations: int
    degrees_of_freedom: int
    intercept: float
    residual_rms: float
    relief_shared: float
    regional: str


def _usable(*arrays):
    ok = np.ones(np.shape(arrays[0]), dtype=bool)
    for a in arrays:
        ok &= np.isfinite(a)
    return ok


def parasnis_density(
    faa: npt.ArrayLike,
    unit_term: npt.ArrayLike,
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    regional: str = "planar",
    confidence: float = 0.95,
) -> ParasnisFit:
    """Density by Parasnis's (1952) regression, with an optional regional term.

    Parameters
    ----------
    faa : array_like
        Free-air anomaly per station (mGal).
    unit_term : array_like
        Slab + curvature - terrain correction at 1 kg/m^3 (mGal per kg/m^3).
    x, y : array_like
        Station coordinates in m (for the regional term).
    regional : {"none", "planar", "quadratic"}
        Regional term fitted together with the density (default planar).
    confidence : float
        Level of the two-sided Student-t interval (0.95).

    Returns
    -------
    ParasnisFit

    Raises
    ------
    ValueError
        With fewer usable stations than unknowns + 2, an unknown regional
        term, or a unit term that the regional term explains completely
        (no relief left to estimate from).

    Notes
    -----
    :math:`\\Delta g_{FA} = \\rho B + R(x, y) + e`, solved by least squares;
    :math:`\\hat\\rho \\pm t_{n-p}\\,s\\sqrt{[(X^TX)^{-1}]_{11}}`.

    References
    ----------
    Parasnis, D. S., 1952, A study of rock densities in the English
    Midlands, Monthly Notices of the Royal Astronomical Society,
    Geophysical Supplement 6, 252-271.

    Examples
    --------
    >>> rng = np.random.default_rng(0)
    >>> h = rng.uniform(100, 900, 60); x = rng.uniform(0, 1e4, 60); y = rng.uniform(0, 1e4, 60)
    >>> b = 4.193e-5 * h  # slab per kg/m^3 (2 pi G h in mGal)
    >>> fit = parasnis_density(2500 * b + 1e-3 * x + rng.normal(0, 0.1, 60), b, x, y)
    >>> bool(fit.low < 2500 < fit.high), round(fit.density, -1)
    (True, 2500.0)
    """
    if not 0 < confidence < 1:
        msg = f"confidence must be between 0 and 1, got {confidence}"
        raise ValueError(msg)
    faa = np.asarray(faa, dtype=float)
    b = np.asarray(unit_term, dtype=float)
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    ok = _usable(faa, b, x, y)
    design = regional_design(x[ok], y[ok], regional)
    n, p = int(ok.sum()), design.shape[1] + 1
    if n < p + 2:
        msg = f"{n} usable stations are too few for the {regional} regional term: at least {p + 2} are needed"
        raise ValueError(msg)
    b_left = remove_regional(b[ok], design)
    total = float(np.sum((b[ok] - b[ok].mean()) ** 2))
    if total == 0 or not np.sum(b_left**2) > 1e-12 * total:
        msg = "the Bouguer term is fully explained by the regional term: no relief to estimate a density from"
        raise ValueError(msg)
    full = np.column_stack([b[ok], design])
    coefficients, *_ = np.linalg.lstsq(full, faa[ok], rcond=None)
    residual = faa[ok] - full @ coefficients
    dof = n - p
    s2 = float(residual @ residual) / dof
    covariance = s2 * np.linalg.pinv(full.T @ full)
    se = float(np.sqrt(covariance[0, 0]))
    t = float(stdtrit(dof, 0.5 + confidence / 2))  # Student-t quantile (the inverse of its CDF)
    rho = float(coefficients[0])
    shared = 1.0 - float(np.sum(b_left**2)) / total if total > 0 else 1.0
    return ParasnisFit(
        rho, se, rho - t * se, rho + t * se, confidence, n, dof,
        float(coefficients[1]), float(np.sqrt(np.mean(residual**2))), shared, regional,
    )
