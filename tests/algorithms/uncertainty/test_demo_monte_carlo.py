# SPDX-License-Identifier: GPL-2.0-or-later
"""The uncertainty budget against a Monte Carlo on the invented demo survey (small size).

The full-size run is ``bench/bench_uncertainty.py`` (351 stations, 40 runs).
"""

import importlib.util
from pathlib import Path

import numpy as np
import pytest

pytest.importorskip("osgeo", reason="reading the demo rasters needs GDAL's Python bindings")

ROOT = Path(__file__).resolve().parents[3]


def _bench():
    spec = importlib.util.spec_from_file_location("bench_uncertainty", ROOT / "bench" / "bench_uncertainty.py")
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


def test_budget_matches_the_monte_carlo_spread_on_the_demo_survey():
    # 25 stations, 16 runs: each station's spread is known to about +-18 %
    # (1/sqrt(2*16)); pooled over 25 stations to a few per cent. The
    # acceptance figure of the budget is 30 % (common practice, no source).
    observed, predicted, _, _ = _bench().monte_carlo(runs=16, n_stations=25, height_sigma=0.5, dem_sigma=2.0)
    ok = np.isfinite(observed) & np.isfinite(predicted)
    assert ok.sum() == 25
    pooled = np.sqrt(np.mean(observed[ok] ** 2) / np.mean(predicted[ok] ** 2))
    assert 0.7 < pooled < 1.3, pooled
