# SPDX-License-Identifier: GPL-2.0-or-later
"""Parasnis and Nettleton on invented surveys of known density.

No published worked example with numbers was found; the checks are
synthetic: the free-air anomaly is built as rho_true * B + regional + body +
noise from a known density, and the 95 % interval must cover rho_true.
B = 2 pi G h (slab per kg/m^3, closed form) + the curvature term of the
project's own spherical cap; the terrain term is left out here (the plugin
test includes it).
"""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.density import (
    correlation_curve,
    density_cautions,
    nettleton_density,
    parasnis_density,
    regional_design,
    remove_regional,
    split_consistency,
    unit_bouguer_term,
)

TRUE_DENSITY = 2550.0  # kg/m^3, invented


def uncorrelated_body(x, y, h):
    """A Gaussian body (1.5 km wide, unit peak) placed where its anomaly is least
    correlated with the heights after a planar regional term: the candidate
    centre (on a 2 km lattice) with the smallest absolute correlation."""
    design = regional_design(x, y, "planar")
    h_left = remove_regional(h, design)
    best = None
    for cx in np.arange(2000.0, 19000.0, 2000.0):
        for cy in np.arange(2000.0, 19000.0, 2000.0):
            shape = np.exp(-((x - cx) ** 2 + (y - cy) ** 2) / (2 * 1500.0**2))
            r = abs(np.corrcoef(remove_regional(shape, design), h_left)[0, 1])
            if best is None or r < best[0]:
                best = (r, shape)
    assert best[0] < 0.02, best[0]
    return best[1]


def survey(seed=4, n=300, tilt=0.0, regional=0.0, body=0.0, correlated_body=0.0, noise=0.05):
    """Invented stations on hills; returns faa, unit term, heights, x, y."""
    rng = np.random.default_rng(seed)
    x = rng.uniform(0, 20_000, n)
    y = rng.uniform(0, 20_000, n)
    h = 300.0 + tilt * x
    for _ in range(8):
        cx, cy, w, a = rng.uniform(0, 20_000), rng.uniform(0, 20_000), rng.uniform(1000, 3000), rng.uniform(100, 400)
        h = h + a * np.exp(-((x - cx) ** 2 + (y - cy) ** 2) / (2 * w * w))
    b = unit_bouguer_term(h, 0.0)
    faa = TRUE_DENSITY * b + regional * x + rng.normal(0, noise, n)
    if body:
        faa += body * uncorrelated_body(x, y, h)
    # Light fill under the low ground: correlated with topography by construction.
    faa += correlated_body * (h - h.mean()) / h.std()
    return faa, b, h, x, y


@pytest.mark.parametrize(
    ("kwargs", "regional"),
    [
        ({}, "none"),
        ({}, "planar"),
        ({"regional": 1e-3, "tilt": 0.02}, "planar"),  # 1 mGal/km regional, terrain rising east
        ({"regional": 1e-3, "tilt": 0.02}, "quadratic"),
        ({"body": -4.0}, "planar"),
        ({"body": -4.0, "regional": -5e-4}, "planar"),
    ],
)
def test_parasnis_interval_covers_truth(kwargs, regional):
    faa, b, _h, x, y = survey(**kwargs)
    fit = parasnis_density(faa, b, x, y, regional)
    assert fit.low < TRUE_DENSITY < fit.high, fit
    assert fit.high - fit.low < 200.0


def test_parasnis_without_regional_term_is_fooled_by_a_gradient():
    # The regional gradient is correlated with the eastward-rising terrain:
    # without a regional term the estimate is biased well outside its interval.
    faa, b, _h, x, y = survey(regional=1e-3, tilt=0.02)
    biased = parasnis_density(faa, b, x, y, "none")
    assert not biased.low < TRUE_DENSITY < biased.high
    assert abs(biased.density - TRUE_DENSITY) > 300


@pytest.mark.parametrize(
    ("kwargs", "regional"),
    [({}, "none"), ({"regional": 1e-3, "tilt": 0.02}, "planar"), ({"body": -4.0}, "planar")],
)
def test_nettleton_interval_covers_truth(kwargs, regional):
    faa, b, h, x, y = survey(**kwargs)
    fit = nettleton_density(faa, b, h, x, y, regional=regional, resamples=500)
    assert fit.low < TRUE_DENSITY < fit.high, fit
    assert fit.resamples == 500


def test_nettleton_on_profiles():
    faa, b, h, x, y = survey(n=400, regional=1e-3, tilt=0.02)
    groups = (y // 5000).astype(int)  # four strips standing in for profiles
    fit = nettleton_density(faa, b, h, x, y, groups=groups, regional="planar", resamples=400)
    assert fit.n_groups == 4
    assert fit.low < TRUE_DENSITY < fit.high
    curve = correlation_curve(faa, b, h, x, y, [fit.density - 300, fit.density, fit.density + 300], groups, "planar")
    assert curve[0] > 0 > curve[2] and abs(curve[1]) < 1e-9


def test_the_two_methods_agree_on_clean_data():
    faa, b, h, x, y = survey(noise=0.01)
    p = parasnis_density(faa, b, x, y, "planar")
    n = nettleton_density(faa, b, h, x, y, regional="planar", resamples=200)
    assert p.density == pytest.approx(TRUE_DENSITY, abs=5)
    assert n.density == pytest.approx(TRUE_DENSITY, abs=5)


def test_geology_following_relief_raises_the_caution():
    faa, b, h, x, y = survey()
    # A basin-fill-like effect that grows with height squared: not one line.
    faa = faa - 4.0 * ((h - h.min()) / np.ptp(h) - 0.5) ** 2 * 4
    low, high, gap = split_consistency(faa, b, x, y, "planar")
    codes = [c for c, _ in density_cautions(100.0, 50.0, 0.1, low, high, gap)]
    assert "density_geology_follows_relief" in codes
    clean = survey()
    assert split_consistency(clean[0], clean[1], clean[3], clean[4], "planar")[2] < 2.0


def test_flat_survey_cautions_and_wide_interval():
    _faa, _b, h, x, y = survey()
    h_flat = 400.0 + (h - h.mean()) * 0.02  # a few metres of relief
    b_flat = unit_bouguer_term(h_flat, 0.0)
    rng = np.random.default_rng(9)
    faa_flat = TRUE_DENSITY * b_flat + rng.normal(0, 0.3, h.size)
    fit = parasnis_density(faa_flat, b_flat, x, y, "planar")
    codes = [c for c, _ in density_cautions(float(np.std(h_flat)), (fit.high - fit.low) / 2, fit.relief_shared, np.nan, np.nan, np.nan)]
    assert "density_low_relief" in codes and "density_wide_interval" in codes


def test_relief_following_the_regional_is_flagged():
    rng = np.random.default_rng(3)
    x = rng.uniform(0, 10_000, 100)
    y = rng.uniform(0, 10_000, 100)
    h = 200 + 0.05 * x + rng.normal(0, 5, 100)  # a tilted plain
    b = unit_bouguer_term(h, 0.0)
    fit = parasnis_density(TRUE_DENSITY * b + rng.normal(0, 0.05, 100), b, x, y, "planar")
    assert fit.relief_shared > 0.9
    codes = [c for c, _ in density_cautions(30.0, 50.0, fit.relief_shared, np.nan, np.nan, np.nan)]
    assert codes == ["density_relief_follows_regional"]


def test_unit_term_matches_the_reduction():
    # rho * B equals the reduction's slab + curvature - tc at rho (linearity).
    from relief_gravity.algorithms import bouguer_slab_correction, curvature_correction

    h = np.array([120.0, 850.0, 1650.0])
    tc_unit = np.array([0.1, 0.4, 1.3]) / 2670.0
    expected = bouguer_slab_correction(h, 2670.0) + curvature_correction(h, 2670.0) - tc_unit * 2670.0
    np.testing.assert_allclose(2670.0 * unit_bouguer_term(h, tc_unit), expected, rtol=1e-12)


@pytest.mark.parametrize("regional", ["cubic", "Planar", ""])
def test_unknown_regional_term_refused(regional):
    faa, b, h, x, y = survey(n=30)
    with pytest.raises(ValueError, match="regional term"):
        parasnis_density(faa, b, x, y, regional)
    with pytest.raises(ValueError, match="regional term"):
        nettleton_density(faa, b, h, x, y, regional=regional, resamples=10)


def test_too_few_stations_and_nan_rows():
    faa, b, h, x, y = survey(n=5)
    with pytest.raises(ValueError, match="too few"):
        parasnis_density(faa, b, x, y, "quadratic")
    with pytest.raises(ValueError, match="too few"):
        nettleton_density(faa, b, h, x, y, regional="quadratic", resamples=10)
    faa, b, h, x, y = survey(n=60)
    faa[:10] = np.nan
    assert parasnis_density(faa, b, x, y).n_stations == 50


def test_no_relief_at_all_refused():
    x = np.arange(20.0) * 100
    y = (np.arange(20.0) * 37) % 500
    b = unit_bouguer_term(np.full(20, 300.0), 0.0)
    with pytest.raises(ValueError, match="relief"):
        parasnis_density(b * 2600, b, x, y, "planar")
    with pytest.raises(ValueError, match="relief"):
        nettleton_density(b * 2600, b, np.full(20, 300.0), x, y, regional="planar", resamples=10)


def test_bad_confidence_refused():
    faa, b, h, x, y = survey(n=30)
    with pytest.raises(ValueError, match="confidence"):
        parasnis_density(faa, b, x, y, confidence=95)
    with pytest.raises(ValueError, match="confidence"):
        nettleton_density(faa, b, h, x, y, confidence=0.0)


def test_bootstrap_is_repeatable():
    faa, b, h, x, y = survey(n=80)
    one = nettleton_density(faa, b, h, x, y, resamples=200, seed=5)
    two = nettleton_density(faa, b, h, x, y, resamples=200, seed=5)
    assert (one.low, one.high) == (two.low, two.high)
