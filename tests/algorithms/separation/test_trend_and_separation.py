# SPDX-License-Identifier: GPL-2.0-or-later
"""Trend surfaces recover known polynomials; regional + residual = input."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.separation import (
    fit_trend_surface,
    robust_weights,
    separate_by_continuation,
    separate_by_trend,
    separate_grid,
)

X0, Y0 = 500_000.0, 5_000_000.0


def survey_points(n=200, seed=3):
    rng = np.random.default_rng(seed)
    return X0 + rng.uniform(-10_000, 10_000, n), Y0 + rng.uniform(-8_000, 8_000, n)


def test_planar_coefficients_recovered_exactly():
    x, y = survey_points()
    # Invented plane: 12 mGal + 1.5 mGal/km east - 0.8 mGal/km north.
    values = 12.0 + 1.5e-3 * (x - X0) - 0.8e-3 * (y - Y0)
    trend = fit_trend_surface(x, y, values, order=1, origin=(X0, Y0))
    coefficients = trend.per_metre()
    assert coefficients[(0, 0)] == pytest.approx(12.0, abs=1e-9)
    assert coefficients[(1, 0)] == pytest.approx(1.5e-3, abs=1e-13)
    assert coefficients[(0, 1)] == pytest.approx(-0.8e-3, abs=1e-13)


def test_quadratic_coefficients_recovered_exactly():
    x, y = survey_points()
    u, v = x - X0, y - Y0
    truth = {(0, 0): -4.0, (1, 0): 2e-4, (0, 1): 3e-4, (2, 0): 5e-8, (1, 1): -2e-8, (0, 2): 1e-8}
    values = sum(c * u**i * v**j for (i, j), c in truth.items())
    trend = fit_trend_surface(x, y, values, order=2, origin=(X0, Y0))
    for key, value in truth.items():
        assert trend.per_metre()[key] == pytest.approx(value, rel=1e-8, abs=1e-14)
    np.testing.assert_allclose(trend.evaluate(x, y), values, atol=1e-9)


def test_cubic_reproduces_a_cubic():
    x, y = survey_points()
    u, v = (x - X0) / 1000, (y - Y0) / 1000
    values = 1 + u - v + 0.1 * u * v + 0.01 * u**3 - 0.02 * v**3 + 0.005 * u**2 * v
    trend = fit_trend_surface(x, y, values, order=3)
    np.testing.assert_allclose(trend.evaluate(x, y), values, atol=1e-9)


def test_robust_fit_ignores_a_local_anomaly():
    x, y = survey_points(400)
    plane = 5.0 + 1e-3 * (x - X0)
    body = -8.0 * np.exp(-((x - X0 - 3000) ** 2 + (y - Y0) ** 2) / (2 * 1200.0**2))
    values = plane + body
    ordinary = fit_trend_surface(x, y, values, order=1)
    robust = fit_trend_surface(x, y, values, order=1, robust="tukey")
    err_ordinary = np.max(np.abs(ordinary.evaluate(x, y) - plane))
    err_robust = np.max(np.abs(robust.evaluate(x, y) - plane))
    assert err_robust < 0.25 * err_ordinary
    assert robust.iterations > 0
    assert np.nanmin(robust.weights) == 0.0  # the body's centre is rejected


def test_huber_fit_is_between():
    x, y = survey_points(300)
    values = 2.0 + 1e-3 * (x - X0)
    values[:10] += 50.0  # ten wild values
    huber = fit_trend_surface(x, y, values, order=1, robust="huber")
    assert huber.per_metre()[(1, 0)] == pytest.approx(1e-3, rel=0.05)


def test_robust_weights_values():
    # Tukey biweight with c = 4.685 on MAD-scaled residuals (Holland & Welsch 1977).
    w = robust_weights([0.0, 1.0, -1.0, 0.5, 100.0], "tukey")
    sigma = 0.5 / 0.6744897501960817
    assert w[1] == pytest.approx((1 - (1 / sigma / 4.685) ** 2) ** 2)
    assert w[4] == 0.0
    assert np.all(robust_weights(np.zeros(5)) == 1.0)


@pytest.mark.parametrize(
    ("kwargs", "match"),
    [
        ({"order": 4}, "order"),
        ({"order": 0}, "order"),
        ({"order": 1.5}, "order"),
        ({"robust": "median"}, "robust"),
    ],
)
def test_bad_options_refused(kwargs, match):
    x, y = survey_points(20)
    with pytest.raises(ValueError, match=match):
        fit_trend_surface(x, y, x * 0, **kwargs)


def test_too_few_or_collinear_points_refused():
    with pytest.raises(ValueError, match="at least 6"):
        fit_trend_surface([0, 1, 2, 3, 4], [0, 1, 0, 1, 0], [1, 2, 3, 4, 5], order=2)
    with pytest.raises(ValueError, match="line"):
        fit_trend_surface([0, 1, 2, 3, 4], [0, 1, 2, 3, 4], [1, 2, 3, 4, 5], order=1)
    with pytest.raises(ValueError, match="one shape"):
        fit_trend_surface([0, 1, 2], [0, 1], [1, 2, 3])


def anomaly_grid():
    rng = np.random.default_rng(5)
    rows, cols, cell = 60, 80, 250.0
    west, north = 490_000.0, 5_010_000.0
    xx, yy = np.meshgrid(west + (np.arange(cols) + 0.5) * cell, north - (np.arange(rows) + 0.5) * cell)
    g = 0.001 * (xx - west) + 5 * np.exp(-((xx - 500_000) ** 2 + (yy - 5_003_000) ** 2) / 2e6) + rng.normal(0, 0.05, xx.shape)
    g[:3, :4] = np.nan
    return g, west, north, cell


@pytest.mark.parametrize(("method", "options"), [("trend", {"order": 2, "robust": "tukey"}), ("continuation", {"height": 1500.0})])
def test_regional_plus_residual_is_the_input(method, options):
    g, west, north, cell = anomaly_grid()
    out = separate_grid(g, west, north, cell, cell, method, **options)
    ok = np.isfinite(g)
    np.testing.assert_array_equal(np.isfinite(out.regional), ok)
    np.testing.assert_allclose(out.regional[ok] + out.residual[ok], g[ok], rtol=0, atol=1e-12)
    assert out.method == method


def test_trend_separation_of_a_plane_leaves_no_residual():
    g, west, north, cell = anomaly_grid()
    rows, cols = g.shape
    xx, yy = np.meshgrid(west + (np.arange(cols) + 0.5) * cell, north - (np.arange(rows) + 0.5) * cell)
    plane = 3 + 2e-4 * (xx - west) - 1e-4 * (north - yy)
    out = separate_by_trend(plane, west, north, cell, cell, order=1)
    assert np.max(np.abs(out.residual)) < 1e-10


def test_continuation_residual_keeps_short_wavelengths():
    g, _west, _north, cell = anomaly_grid()
    out = separate_by_continuation(g, cell, cell, 3000.0)
    # The noise (one cell wide) is almost all in the residual.
    assert np.nanstd(np.diff(out.regional, axis=1)) < 0.2 * np.nanstd(np.diff(out.residual, axis=1))


def test_unknown_method_refused():
    with pytest.raises(ValueError, match="method"):
        separate_grid(np.ones((4, 4)), 0, 0, 1, 1, "wavelet")
