# SPDX-License-Identifier: GPL-2.0-or-later
"""Regional-residual separation of gridded anomalies: trend surfaces and upward continuation."""

from ._continuation import ContinuationSettings, continuation_filter, upward_continuation
from ._separate import Separation, separate_by_continuation, separate_by_trend, separate_grid
from ._trend import ROBUST_WEIGHTS, TrendSurface, fit_trend_surface, robust_weights

__all__ = [
    "ROBUST_WEIGHTS",
    "ContinuationSettings",
    "Separation",
    "TrendSurface",
    "continuation_filter",
    "fit_trend_surface",
    "robust_weights",
    "separate_by_continuation",
    "separate_by_trend",
    "separate_grid",
    "upward_continuation",
]
