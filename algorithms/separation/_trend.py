# SPDX-License-Identifier: GPL-2.0-or-later
"""Polynomial trend surfaces (order 1-3) by least squares, optionally robust.

The regional field is modelled as a polynomial in the coordinates,

.. math:: R(x, y) = \\sum_{i + j \\le n} c_{ij}\\, u^i v^j,
          \\quad u = (x - x_0)/s,\\; v = (y - y_0)/s,

fitted to the data by least squares (the coordinates are centred and scaled
by one length ``s`` only to keep the normal matrix well conditioned; the
coefficients are reported per metre as well). The robust fit reweights the
data iteratively (IRLS, Holland & Welsch 1977) with Huber's (1964) or Tukey's
biweight (Beaton & Tukey 1974) weights, so that local anomalies (the residual
one looks for) do not pull the regional surface.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

#: Tuning constants giving 95 % efficiency for Gaussian errors (Holland &
#: Welsch 1977, Table 1): Huber k = 1.345, Tukey biweight c = 4.685.
HUBER_K = 1.345
TUKEY_C = 4.685
#: MAD of a Gaussian sample divided by its standard deviation (common practice).
MAD_TO_SIGMA = 0.6744897501960817
ROBUST_WEIGHTS = ("huber", "tukey")


def _exponents(order: int) -> tuple[tuple[int, int], ...]:
    """(i, j) exponents of u^i v^j for total degree <= order, degree by degree."""
    return tuple((d - j, j) for d in range(order + 1) for j in range(d + 1))


def _check_order(order: int) -> int:
    if int(order) != order or not 1 <= int(order) <= 3:
        msg = f"trend surface order must be 1, 2 or 3, got {order!r}"
        raise ValueError(msg)
    return int(order)


@dataclass(frozen=True)
class TrendSurface:
    """A fitted polynomial trend surface.

    Attributes
    ----------
    order : int
        Total degree (1 planar, 2 quadratic, 3 cubic).
    coefficients : tuple of float
        :math:`c_{ij}` for ``exponents`` in scaled coordinates (data units).
    exponents : tuple of (int, int)
        (i, j) of each term :math:`u^i v^j`.
    x0, y0 : float
        Centre of the coordinates (m).
    scale : float
        Length s dividing the centred coordinates (m).
    iterations : int
        Reweighting iterations made (0 for ordinary least squares).
    weights : numpy.ndarray
        Final weight of each data point (1 for ordinary least squares).
    """

    order: int
    coefficients: tuple[float, ...]
    exponents: tuple[tuple[int, int], ...]
    x0: float
    y0: float
    scale: float
    iterations: int
    weights: np.ndarray

    def per_metre(self) -> dict:
        """Coefficients of :math:`(x - x_0)^i (y - y_0)^j` in data units per m^(i+j).

        Examples
        --------
        >>> t = fit_trend_surface([0., 10., 0., 10.], [0., 0., 10., 10.], [1., 3., 2., 4.], order=1, origin=(0., 0.))
        >>> {k: round(v, 6) for k, v in t.per_metre().items()}
        {(0, 0): 1.0, (1, 0): 0.2, (0, 1): 0.1}
        """
        return {
            (i, j): c / self.scale ** (i + j) for (i, j), c in zip(self.exponents, self.coefficients)
        }

    def evaluate(self, x: npt.ArrayLike, y: npt.ArrayLike) -> np.ndarray:
        """Surface value at (x, y) in metres, in data units.

        Examples
        --------
        >>> t = fit_trend_surface([0., 10., 0., 10.], [0., 0., 10., 10.], [1., 3., 2., 4.], order=1)
        >>> print(f"{float(t.evaluate(5.0, 5.0)):.3f}")
        2.500
        """
        design = _design(np.asarray(x, dtype=float), np.asarray(y, dtype=float), self)
        return design @ np.asarray(self.coefficients)


def _design(x: np.ndarray, y: np.ndarray, surface_like) -> np.ndarray:
    u = (x - surface_like.x0) / surface_like.scale
    v = (y - surface_like.y0) / surface_like.scale
    return np.stack([u**i * v**j for i, j in surface_like.exponents], axis=-1)


@dataclass(frozen=True)
class _Frame:
    x0: float
    y0: float
    scale: float
    exponents: tuple[tuple[int, int], ...]


def robust_weights(residuals: npt.ArrayLike, kind: str = "tukey") -> np.ndarray:
    """IRLS weights of residuals scaled by their MAD (Huber or Tukey biweight).

    Parameters
    ----------
    residuals : array_like
        Residuals of the current fit (data units).
    kind : {"tukey", "huber"}
        Tukey's biweight :math:`w = (1 - (r/c)^2)^2` for :math:`|r| < c`, else 0
        (c = 4.685); Huber's :math:`w = \\min(1, k/|r|)` (k = 1.345); r is the
        residual divided by :math:`\\hat\\sigma = \\mathrm{MAD}/0.6745`.

    Returns
    -------
    numpy.ndarray
        Weights in [0, 1]; all ones when the MAD is zero (a perfect fit).

    References
    ----------
    Holland, P. W., and Welsch, R. E., 1977, Robust regression using
    iteratively reweighted least-squares, Communications in Statistics -
    Theory and Methods 6(9), 813-827. Huber, P. J., 1964, Robust estimation
    of a location parameter, Annals of Mathematical Statistics 35(1), 73-101.
    Beaton, A. E., and Tukey, J. W., 1974, The fitting of power series,
    meaning polynomials, illustrated on band-spectroscopic data,
    Technometrics 16(2), 147-185.

    Examples
    --------
    >>> print(robust_weights([0.0, 1.0, -1.0, 0.5, 100.0], "tukey").round(3))
    [1.    0.841 0.841 0.959 0.   ]
    """
    r = np.asarray(residuals, dtype=float)
    if kind not in ROBUST_WEIGHTS:
        msg = f"robust weights must be one of {ROBUST_WEIGHTS}, got {kind!r}"
        raise ValueError(msg)
    mad = float(np.median(np.abs(r - np.median(r))))
    sigma = mad / MAD_TO_SIGMA
    if not sigma > 0:
        return np.ones(r.shape)
    z = np.abs(r) / sigma
    if kind == "huber":
        return np.minimum(1.0, HUBER_K / np.maximum(z, 1e-300))
    return np.where(z < TUKEY_C, (1.0 - (z / TUKEY_C) ** 2) ** 2, 0.0)


def fit_trend_surface(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    values: npt.ArrayLike,
    order: int = 1,
    robust: str | None = None,
    *,
    origin: tuple[float, float] | None = None,
    max_iterations: int = 50,
    tolerance: float = 1e-8,
) -> TrendSurface:
    """Least-squares polynomial trend surface of order 1-3, optionally robust.

    Parameters
    ----------
    x, y : array_like
        Coordinates in m (projected). Points with a NaN coordinate or value
        are left out.
    values : array_like
        Data (e.g. mGal).
    order : {1, 2, 3}
        Total degree of the polynomial.
    robust : {None, "huber", "tukey"}
        None for ordinary least squares; otherwise iteratively reweighted
        least squares with that weight function (Tukey starts from the Huber
        solution, because the biweight's zero weights need a good start).
    origin : (float, float), optional
        (x0, y0) the coordinates are centred on; the data centre by default.
    max_iterations, tolerance : int, float
        Stop reweighting when the largest change of the fitted values is
        below ``tolerance`` times their spread.

    Returns
    -------
    TrendSurface

    Raises
    ------
    ValueError
        For an order outside 1-3, an unknown robust weight, or fewer usable
        points than terms (3, 6 or 10) or points that do not span the plane.

    Notes
    -----
    Minimises :math:`\\sum_k w_k (d_k - R(x_k, y_k))^2` by a QR-based
    least-squares solve (numpy ``lstsq``); :math:`w_k = 1` for ordinary
    least squares, IRLS weights otherwise (Holland & Welsch 1977).

    Examples
    --------
    >>> x, y = np.meshgrid(np.arange(5.0) * 100, np.arange(4.0) * 100)
    >>> t = fit_trend_surface(x, y, 2.0 + 0.01 * x - 0.02 * y, order=1, origin=(0.0, 0.0))
    >>> [round(c, 9) for c in t.per_metre().values()]
    [2.0, 0.01, -0.02]
    """
    order = _check_order(order)
    if robust is not None and robust not in ROBUST_WEIGHTS:
        msg = f"robust must be None, 'huber' or 'tukey', got {robust!r}"
        raise ValueError(msg)
    x = np.asarray(x, dtype=float).ravel()
    y = np.asarray(y, dtype=float).ravel()
    d = np.asarray(values, dtype=float).ravel()
    if not x.shape == y.shape == d.shape:
        msg = f"x, y and values must have one shape, got {x.shape}, {y.shape}, {d.shape}"
        raise ValueError(msg)
    ok = np.isfinite(x) & np.isfinite(y) & np.isfinite(d)
    exponents = _exponents(order)
    if ok.sum() < len(exponents):
        msg = f"a trend surface of order {order} needs at least {len(exponents)} points with data, got {int(ok.sum())}"
        raise ValueError(msg)
    xs, ys, ds = x[ok], y[ok], d[ok]
    x0, y0 = (float(np.mean(xs)), float(np.mean(ys))) if origin is None else (float(origin[0]), float(origin[1]))
    scale = float(max(np.ptp(xs), np.ptp(ys)) / 2.0) or 1.0
    frame = _Frame(x0, y0, scale, exponents)
    design = _design(xs, ys, frame)
    if np.linalg.matrix_rank(design) < len(exponents):
        msg = (
            f"the points do not determine a trend surface of order {order} "
            "(they lie on a line or too few distinct places)"
        )
        raise ValueError(msg)
    weights = np.ones(len(ds))
    coefficients = np.linalg.lstsq(design, ds, rcond=None)[0]
    iterations = 0
    if robust is not None:
        stages = ["huber", "tukey"] if robust == "tukey" else ["huber"]
        spread = float(np.ptp(ds)) or 1.0
        for kind in stages:
            for _ in range(max_iterations):
                fitted = design @ coefficients
                weights = robust_weights(ds - fitted, kind)
                root = np.sqrt(weights)
                new = np.linalg.lstsq(design * root[:, None], ds * root, rcond=None)[0]
                iterations += 1
                change = float(np.max(np.abs(design @ (new - coefficients))))
                coefficients = new
                if change <= tolerance * spread:
                    break
        weights = robust_weights(ds - design @ coefficients, robust)
    full_weights = np.full(x.shape, np.nan)
    full_weights[ok] = weights
    return TrendSurface(
        order, tuple(float(c) for c in coefficients), exponents, x0, y0, scale, iterations, full_weights
    )
