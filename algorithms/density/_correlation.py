# SPDX-License-Identifier: GPL-2.0-or-later
"""Nettleton (1939) density: the Bouguer anomaly least correlated with topography.

For a trial density :math:`\\rho` the Bouguer anomaly is
:math:`\\Delta g_B(\\rho) = \\Delta g_{FA} - \\rho B` (B the unit-density
Bouguer and terrain term, mGal per kg/m^3). Nettleton chose the density whose
anomaly along a profile shows the least resemblance to the topography. Here
the resemblance is the correlation coefficient with the station height,
after removing from the anomaly, the unit term and the heights the regional
term (a constant, plane or quadratic; per profile when profiles are given).
Because the anomaly is linear in :math:`\\rho`, the correlation is zero at

.. math:: \\hat\\rho = \\frac{\\sum_k \\tilde{g}_k \\tilde{h}_k}{\\sum_k \\tilde{B}_k \\tilde{h}_k},

the tildes marking values with the regional term removed (within each
profile, pooled over profiles). The interval comes from the bootstrap
(Efron & Tibshirani 1993, An Introduction to the Bootstrap, Chapman & Hall,
ch. 13, percentile interval): stations are resampled with replacement
(within each profile) and the estimate recomputed.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from ._regression import regional_design, remove_regional

#: Bootstrap resamples (Efron & Tibshirani 1993 suggest >= 1000 for percentile intervals).
BOOTSTRAP_RESAMPLES = 2000


@dataclass(frozen=True)
class NettletonFit:
    """Result of :func:`nettleton_density`.

    Attributes
    ----------
    density, low, high : float
        Estimate and bootstrap percentile interval (kg/m^3).
    confidence : float
    standard_error : float
        Standard deviation of the bootstrap estimates (kg/m^3).
    n_stations, n_groups : int
        Stations used and profiles (1 for the whole survey).
    resamples : int
        Bootstrap resamples that gave an estimate.
    regional : str
    """

    density: float
    low: float
    high: float
    confidence: float
    standard_error: float
    n_stations: int
    n_groups: int
    resamples: int
    regional: str


def _group_residuals(values: np.ndarray, x, y, groups, regional: str) -> np.ndarray:
    """Columns of ``values`` with the regional term removed within each group."""
    out = np.empty_like(values)
    for g in np.unique(groups):
        rows = groups == g
        out[rows] = remove_regional(values[rows], regional_design(x[rows], y[rows], regional))
    return out


def _ratio(res: np.ndarray) -> float:
    numerator = float(res[:, 0] @ res[:, 2])
    denominator = float(res[:, 1] @ res[:, 2])
    return numerator / denominator if denominator != 0 else np.nan


def _prepare(faa, unit_term, height, x, y, groups, regional, min_per_group):
    arrays = [np.asarray(a, dtype=float) for a in (faa, unit_term, height, x, y)]
    groups = np.zeros(arrays[0].shape, dtype=int) if groups is None else np.asarray(groups)
    ok = np.ones(arrays[0].shape, dtype=bool)
    for a in arrays:
        ok &= np.isfinite(a)
    if groups.dtype.kind == "f":
        ok &= np.isfinite(groups)
    for g in np.unique(groups[ok]):
        rows = ok & (groups == g)
        if rows.sum() < min_per_group:
            ok &= groups != g
    faa, b, h, x, y = (a[ok] for a in arrays)
    return np.column_stack([faa, b, h]), x, y, groups[ok]


def correlation_curve(
    faa: npt.ArrayLike,
    unit_term: npt.ArrayLike,
    height: npt.ArrayLike,
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    densities: npt.ArrayLike,
    groups: npt.ArrayLike | None = None,
    regional: str = "planar",
) -> np.ndarray:
    """Correlation of the Bouguer anomaly with the heights for each trial density.

    Parameters
    ----------
    faa, unit_term, height, x, y : array_like
        As for :func:`nettleton_density`.
    densities : array_like
        Trial densities in kg/m^3.
    groups : array_like, optional
        Profile label per station (pooled within-profile correlation).
    regional : {"none", "planar", "quadratic"}

    Returns
    -------
    numpy.ndarray
        Pearson correlation for each trial density (NaN where undefined).

    Examples
    --------
    >>> h = np.array([100.0, 300.0, 200.0, 500.0, 400.0]); b = 4.19e-5 * h
    >>> r = correlation_curve(2400 * b + 1.0, b, h, h * 0 + 1, h, [2000.0, 2800.0], regional="none")
    >>> [round(float(v), 6) for v in r]
    [1.0, -1.0]
    """
    res, xs, ys, grp = _prepare(faa, unit_term, height, x, y, groups, regional, 3)
    res = _group_residuals(res, xs, ys, grp, regional)
    rho = np.asarray(densities, dtype=float)[:, None]
    anomaly = res[:, 0][None, :] - rho * res[:, 1][None, :]
    h = res[:, 2]
    denominator = np.sqrt(np.sum(anomaly**2, axis=1) * float(h @ h))
    with np.errstate(invalid="ignore", divide="ignore"):
        out = (anomaly @ h) / denominator
    return np.where(np.abs(out) <= 1 + 1e-9, np.clip(out, -1, 1), np.nan)


def nettleton_density(
    faa: npt.ArrayLike,
    unit_term: npt.ArrayLike,
    height: npt.ArrayLike,
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    groups: npt.ArrayLike | None = None,
    regional: str = "planar",
    confidence: float = 0.95,
    resamples: int = BOOTSTRAP_RESAMPLES,
    seed: int = 0,
) -> NettletonFit:
    """Density whose Bouguer anomaly is uncorrelated with topography (Nettleton 1939).

    Parameters
    ----------
    faa : array_like
        Free-air anomaly per station (mGal).
    unit_term : array_like
        Slab + curvature - terrain correction at 1 kg/m^3 (mGal per kg/m^3).
    height : array_like
        Station heights (m): the topography the anomaly is compared with.
    x, y : array_like
        Coordinates in m (regional term).
    groups : array_like, optional
        Profile label of each station; None = the whole survey as one group.
        Profiles with fewer than (terms + 2) stations are left out.
    regional : {"none", "planar", "quadratic"}
        Regional term removed within each group (default planar).
    confidence : float
        Level of the bootstrap percentile interval (0.95).
    resamples : int
        Bootstrap resamples (2000); the seed makes the interval repeatable.
    seed : int

    Returns
    -------
    NettletonFit

    Raises
    ------
    ValueError
        Too few stations, an unknown regional term, or no relief left after
        the regional term (the correlation does not depend on the density).

    Notes
    -----
    :math:`\\hat\\rho = \\sum \\tilde g \\tilde h / \\sum \\tilde B \\tilde h`
    zeroes the correlation of :math:`\\tilde g - \\rho \\tilde B` with
    :math:`\\tilde h`.

    References
    ----------
    Nettleton, L. L., 1939, Determination of density for reduction of
    gravimeter observations, Geophysics 4(3), 176-183. Efron, B., and
    Tibshirani, R. J., 1993, An Introduction to the Bootstrap, Chapman &
    Hall.

    Examples
    --------
    >>> rng = np.random.default_rng(1)
    >>> h = rng.uniform(100, 900, 80); x = rng.uniform(0, 1e4, 80); y = rng.uniform(0, 1e4, 80)
    >>> b = 4.193e-5 * h
    >>> fit = nettleton_density(2600 * b + 2e-4 * y + rng.normal(0, 0.1, 80), b, h, x, y, resamples=300)
    >>> bool(fit.low < 2600 < fit.high), round(fit.density, -1)
    (True, 2600.0)
    """
    if not 0 < confidence < 1:
        msg = f"confidence must be between 0 and 1, got {confidence}"
        raise ValueError(msg)
    n_terms = regional_design([0.0], [0.0], regional).shape[1]
    res, xs, ys, grp = _prepare(faa, unit_term, height, x, y, groups, regional, n_terms + 2)
    if len(res) < n_terms + 2:
        msg = (
            f"{len(res)} usable stations are too few for the {regional} regional term: "
            f"at least {n_terms + 2} are needed" + (" in each profile" if groups is not None else "")
        )
        raise ValueError(msg)
    tilde = _group_residuals(res, xs, ys, grp, regional)
    centred = res - res.mean(axis=0)
    scale = float(np.sqrt(np.sum(centred[:, 1] ** 2) * np.sum(centred[:, 2] ** 2)))
    if scale == 0 or not abs(float(tilde[:, 1] @ tilde[:, 2])) > 1e-12 * scale:
        msg = "no relief is left after the regional term: the correlation does not depend on the density"
        raise ValueError(msg)
    rho = _ratio(tilde)
    rng = np.random.default_rng(seed)
    members = [np.flatnonzero(grp == g) for g in np.unique(grp)]
    estimates = []
    for _ in range(int(resamples)):
        pick = np.concatenate([rng.choice(m, size=m.size, replace=True) for m in members])
        sample = _group_residuals(res[pick], xs[pick], ys[pick], grp[pick], regional)
        value = _ratio(sample)
        if np.isfinite(value):
            estimates.append(value)
    estimates = np.asarray(estimates)
    if estimates.size < 10:
        msg = "the bootstrap gave too few estimates: the relief is too small to estimate a density"
        raise ValueError(msg)
    alpha = (1 - confidence) / 2
    low, high = np.quantile(estimates, [alpha, 1 - alpha])
    return NettletonFit(
        float(rho), float(low), float(high), confidence, float(np.std(estimates, ddof=1)),
        len(res), len(members), int(estimates.size), regional,
    )


def split_consistency(
    faa: npt.ArrayLike, unit_term: npt.ArrayLike, x: npt.ArrayLike, y: npt.ArrayLike, regional: str = "planar"
) -> tuple[float, float, float]:
    """Parasnis densities of the lower and upper half of the stations (by unit term), and their gap in sigmas.

    When geology follows the topography (light fill under valleys, dense
    rock in the ridges) the anomaly-relief relation is not one straight
    line, and the two halves disagree. Common practice, no source: a
    diagnostic, not a test with a known false-alarm rate.

    Returns
    -------
    (float, float, float)
        Density of the lower half, of the upper half (kg/m^3), and
        :math:`|\\rho_1 - \\rho_2| / \\sqrt{s_1^2 + s_2^2}`; NaNs when a half is too small.

    Examples
    --------
    >>> rng = np.random.default_rng(2)
    >>> h = rng.uniform(100, 900, 60); x = rng.uniform(0, 1e4, 60); y = rng.uniform(0, 1e4, 60)
    >>> lo, hi, gap = split_consistency(2670 * 4.193e-5 * h + rng.normal(0, 0.05, 60), 4.193e-5 * h, x, y)
    >>> bool(abs(lo - 2670) < 50 and abs(hi - 2670) < 50)
    True
    """
    from ._regression import parasnis_density

    faa, b, x, y = (np.asarray(a, dtype=float) for a in (faa, unit_term, x, y))
    ok = np.isfinite(faa) & np.isfinite(b) & np.isfinite(x) & np.isfinite(y)
    median = np.median(b[ok]) if ok.any() else np.nan
    fits = []
    for half in (ok & (b <= median), ok & (b > median)):
        try:
            fits.append(parasnis_density(faa[half], b[half], x[half], y[half], regional))
        except ValueError:
            return np.nan, np.nan, np.nan
    gap = abs(fits[0].density - fits[1].density) / np.hypot(fits[0].standard_error, fits[1].standard_error)
    return fits[0].density, fits[1].density, float(gap)
