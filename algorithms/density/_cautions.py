# SPDX-License-Identifier: GPL-2.0-or-later
"""Cautions about a density estimate: codes with an English meaning (run level, not per station)."""

from __future__ import annotations

import numpy as np

#: Below this standard deviation of the heights left after the regional
#: term (m) the relief is called too small (common practice, no source).
MIN_RELIEF_STD_M = 30.0
#: Interval wider than this (kg/m^3, half width) is called unstable (common practice, no source).
MAX_HALF_WIDTH = 150.0
#: Share of the unit term's variance explained by the regional term above
#: which density and regional are confounded (common practice, no source).
MAX_RELIEF_SHARED = 0.9
#: Gap between the two halves' estimates, in combined standard errors (about 2 sigma, common practice).
MAX_SPLIT_GAP = 2.0

CAUTIONS = {
    "density_low_relief": (
        "Too little relief for a stable estimate: the heights vary by only {relief:.0f} m (standard deviation "
        "after the regional term); the interval is wide."
    ),
    "density_wide_interval": "The 95 % interval is wider than +/- {limit:.0f} kg/m3: the estimate is not stable.",
    "density_relief_follows_regional": (
        "The relief follows the regional trend ({shared:.0%} of the Bouguer term's variation is explained by it): "
        "density and regional field cannot be told apart well."
    ),
    "density_geology_follows_relief": (
        "Low and high stations give different densities ({low:.0f} and {high:.0f} kg/m3, {gap:.1f} standard errors "
        "apart): the anomaly is correlated with topography in a way the regional term does not explain (for "
        "example light fill under valleys or dense rock in ridges). The estimate is biased; use profiles over "
        "uniform geology."
    ),
}


def density_cautions(
    relief_std_m: float, half_width: float, relief_shared: float, split_low: float, split_high: float, split_gap: float
) -> list[tuple]:
    """Caution codes with their English sentences for one estimate.

    Parameters
    ----------
    relief_std_m : float
        Standard deviation of the heights after the regional term (m).
    half_width : float
        Half width of the interval (kg/m^3).
    relief_shared : float
        Share (0-1) of the unit term explained by the regional term.
    split_low, split_high, split_gap : float
        From :func:`split_consistency`.

    Returns
    -------
    list of (str, str)
        (code, sentence) pairs, empty when nothing is worth saying.

    Examples
    --------
    >>> [code for code, _ in density_cautions(10.0, 40.0, 0.2, 2600.0, 2640.0, 0.5)]
    ['density_low_relief']
    """
    out = []
    if not relief_std_m >= MIN_RELIEF_STD_M:
        out.append(("density_low_relief", CAUTIONS["density_low_relief"].format(relief=relief_std_m)))
    if not half_width <= MAX_HALF_WIDTH:
        out.append(("density_wide_interval", CAUTIONS["density_wide_interval"].format(limit=MAX_HALF_WIDTH)))
    if relief_shared > MAX_RELIEF_SHARED:
        text = CAUTIONS["density_relief_follows_regional"].format(shared=relief_shared)
        out.append(("density_relief_follows_regional", text))
    if np.isfinite(split_gap) and split_gap > MAX_SPLIT_GAP:
        out.append(
            (
                "density_geology_follows_relief",
                CAUTIONS["density_geology_follows_relief"].format(low=split_low, high=split_high, gap=split_gap),
            )
        )
    return out
