# SPDX-License-Identifier: GPL-2.0-or-later
"""Reduction density from the data: Parasnis (1952) regression and Nettleton (1939) correlation."""

from ._cautions import CAUTIONS, density_cautions
from ._correlation import BOOTSTRAP_RESAMPLES, NettletonFit, correlation_curve, nettleton_density, split_consistency
from ._regression import REGIONAL_TERMS, ParasnisFit, parasnis_density, regional_design, remove_regional
from ._unit import unit_bouguer_term

__all__ = [
    "BOOTSTRAP_RESAMPLES",
    "CAUTIONS",
    "REGIONAL_TERMS",
    "NettletonFit",
    "ParasnisFit",
    "correlation_curve",
    "density_cautions",
    "nettleton_density",
    "parasnis_density",
    "regional_design",
    "remove_regional",
    "split_consistency",
    "unit_bouguer_term",
]
