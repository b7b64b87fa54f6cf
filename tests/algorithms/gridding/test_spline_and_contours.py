# SPDX-License-Identifier: GPL-2.0-or-later
"""Biharmonic spline and contour helpers."""

from __future__ import annotations

import re

import numpy as np
import numpy.testing as npt
import pytest

from relief_gravity.algorithms.gridding import (
    GridGeometry,
    biharmonic_spline,
    contour_levels,
    nice_contour_interval,
)

GRID = GridGeometry(0.0, 1000.0, 50.0, 20, 20)


def test_spline_plane_exact():
    # Linear part with side conditions makes planes exact (Notes of
    # biharmonic_spline; thin-plate spline theory, from memory).
    rng = np.random.default_rng(1)
    x = rng.uniform(0, 1000, 30)
    y = rng.uniform(0, 1000, 30)
    grid = biharmonic_spline(x, y, 5.0 - 0.02 * x + 0.03 * y, GRID)
    xx, yy = np.meshgrid(GRID.x_centres, GRID.y_centres)
    npt.assert_allclose(grid, 5.0 - 0.02 * xx + 0.03 * yy, atol=1e-9)


def test_spline_interpolates_and_smoothing_relaxes():
    rng = np.random.default_rng(2)
    cells = rng.choice(400, 25, replace=False)
    i, j = np.divmod(cells, 20)
    x, y = GRID.x_centres[j], GRID.y_centres[i]
    v = rng.normal(size=25)
    exact = biharmonic_spline(x, y, v, GRID)
    npt.assert_allclose(exact[i, j], v, atol=1e-9)
    smooth = biharmonic_spline(x, y, v, GRID, smoothing=1.0)
    misfit = np.abs(smooth[i, j] - v)
    assert misfit.max() > 1e-3
    # Smoothing lowers the roughness (sum of squared Laplacians).
    def roughness(grid):
        return float((np.diff(grid, 2, axis=0)[:, 1:-1] + np.diff(grid, 2, axis=1)[1:-1]).__pow__(2).sum())

    assert roughness(smooth) < roughness(exact)


def test_spline_duplicates_averaged_and_validation():
    x = np.array([100.0, 100.0, 800.0, 400.0])
    y = np.array([100.0, 100.0, 300.0, 900.0])
    v = np.array([1.0, 3.0, 0.0, 5.0])
    npt.assert_allclose(
        biharmonic_spline(x, y, v, GRID), biharmonic_spline(x[1:], y[1:], [2.0, 0.0, 5.0], GRID), atol=1e-10
    )
    with pytest.raises(ValueError, match=re.escape("at least 3 distinct stations")):
        biharmonic_spline([1.0, 1.0, 2.0], [1.0, 1.0, 2.0], [1.0, 2.0, 3.0], GRID)
    with pytest.raises(ValueError, match="more than the spline's limit of 3"):
        biharmonic_spline([1.0, 5.0, 2.0, 9.0], [1.0, 2.0, 8.0, 9.0], [1.0, 2.0, 3.0, 4.0], GRID, max_points=3)
    with pytest.raises(ValueError, match=re.escape("Invalid smoothing -1.0")):
        biharmonic_spline([1.0, 5.0, 2.0], [1.0, 2.0, 8.0], [1.0, 2.0, 3.0], GRID, smoothing=-1.0)


@pytest.mark.parametrize(
    ("vmin", "vmax", "expected", "count"),
    [
        (-23.4, 41.0, 5.0, 13),
        (0.0, 1.0, 0.1, 11),
        (-3.0, 9.0, 1.0, 13),
        # No nice interval gives 10-15 levels: 0.05 gives 18, 0.1 gives 9.
        (-0.37, 0.52, 0.1, 9),
        (975_000.0, 983_500.0, 1000.0, 9),  # 500 would give 18
    ],
)
def test_nice_contour_interval(vmin, vmax, expected, count):
    # Expected values worked by hand from the stated rule (closest to 10-15
    # levels, mantissas 1, 2, 2.5, 5; common practice, no source).
    interval = nice_contour_interval(vmin, vmax)
    assert interval == pytest.approx(expected)
    assert len(contour_levels(vmin, vmax, interval)) == count


def test_nice_contour_interval_always_nice_and_near_target():
    rng = np.random.default_rng(5)
    for _ in range(200):
        vmin = rng.uniform(-1e3, 1e3)
        vmax = vmin + 10 ** rng.uniform(-3, 4)
        interval = nice_contour_interval(vmin, vmax)
        mantissa = interval / 10 ** np.floor(np.log10(interval) + 1e-12)
        assert any(np.isclose(mantissa, m) for m in (1.0, 2.0, 2.5, 5.0))
        # Consecutive nice numbers differ by at most x2.5, so the count can
        # always be brought within a factor ~2.5 of the target range.
        assert 4 <= len(contour_levels(vmin, vmax, interval)) <= 38


def test_contour_levels_values():
    npt.assert_allclose(contour_levels(-12.3, 17.0, 5.0), [-10, -5, 0, 5, 10, 15])
    assert contour_levels(0.0, 1.0, 0.1).tolist()[3] == 0.3
    npt.assert_allclose(contour_levels(5.0, 15.0, 5.0), [5.0, 10.0, 15.0])


def test_contour_validation():
    with pytest.raises(ValueError, match=re.escape("Invalid range (3.0, 3.0)")):
        nice_contour_interval(3.0, 3.0)
    with pytest.raises(ValueError, match=re.escape("Invalid contour interval 0.0")):
        contour_levels(0.0, 1.0, 0.0)
