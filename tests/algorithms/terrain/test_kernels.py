# SPDX-License-Identifier: GPL-2.0-or-later
"""Line masses, terrain columns and the innermost plane against exact forms."""

from __future__ import annotations

import math

import numpy as np
import pytest
from scipy.special import ellipk

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT
from relief_gravity.algorithms.terrain import (
    column_terrain_effect,
    line_mass_gravity,
    plane_terrain_effect,
    prism_gravity,
)
from relief_gravity.algorithms.terrain._prism import inverse_distance_difference

SCALE = GRAVITATIONAL_CONSTANT * 2670.0 * 1e5


@pytest.mark.parametrize(
    ("ratio", "expected"),
    # docs/terrain.md section 5 [C]: line mass vs exact prism, 100 m cell, relief 50 m
    [(10, -0.0037), (20, -0.0009), (50, -0.00015)],
)
def test_line_mass_error_matches_references_5_3(ratio, expected):
    s = ratio * 100.0
    exact = -prism_gravity(0, 0, 0, s - 50, s + 50, -50, 50, 0, 50, 2670.0)
    line = -line_mass_gravity(0, 0, 0, s, 0, 0, 50, 1e4, 2670.0)
    assert float((line - exact) / exact) == pytest.approx(expected, abs=0.3 * abs(expected))


def test_line_mass_signs():
    below = line_mass_gravity(0, 0, 0, 500, 0, -80, -20, 100.0, 2670.0)
    above = line_mass_gravity(0, 0, 0, 500, 0, 20, 80, 100.0, 2670.0)
    assert float(below) > 0 and float(above) == pytest.approx(-float(below), rel=1e-14)


@pytest.mark.parametrize("ratio", [5, 8, 20])
@pytest.mark.parametrize("relief", [-400.0, -10.0, 10.0, 100.0, 1500.0])
@pytest.mark.parametrize("angle", [0.0, 0.5, math.pi / 4])
def test_column_matches_prism_beyond_five_cells(ratio, relief, angle):
    # Self-consistency: the corrected column vs the exact prism (Nagy).
    a = 30.0
    x, y = ratio * a * math.cos(angle), ratio * a * math.sin(angle)
    lo, hi = min(0.0, relief), max(0.0, relief)
    exact = -math.copysign(1.0, relief) * float(prism_gravity(0, 0, 0, x - a / 2, x + a / 2, y - a / 2, y + a / 2, lo, hi, 2670.0))
    col = SCALE * float(column_terrain_effect(np.array(x), np.array(y), np.array(relief), np.array(0.0), a, a, a * a))
    assert col == pytest.approx(exact, rel=5e-4 if ratio == 5 else 1e-4)


def test_column_variance_term_matches_sum_of_cells():
    # A 2 x 2 block of different heights seen from afar equals the sum of its
    # four cells to second order; the plain mean misses the spread.
    heights = np.array([[200.0, 900.0], [50.0, 600.0]])
    d, a = 3000.0, 120.0
    xs = d + np.array([[-a / 4, a / 4], [-a / 4, a / 4]])
    ys = np.array([[a / 4, a / 4], [-a / 4, -a / 4]])
    cells = column_terrain_effect(xs, ys, heights, 0.0, a / 2, a / 2, (a / 2) ** 2).sum()
    mean_only = column_terrain_effect(np.array(d), np.array(0.0), heights.mean(), 0.0, a, a, a * a)
    with_var = column_terrain_effect(np.array(d), np.array(0.0), heights.mean(), 0.0, a, a, a * a, heights.var())
    # What remains is the position-height covariance inside the block.
    assert abs(with_var - cells) < 0.15 * abs(mean_only - cells)


def test_curvature_makes_far_columns_negative():
    # Flat terrain 500 m above the station, 100 km away: the drop of 785 m
    # puts it below the station's horizontal plane (docs/terrain.md section 6).
    drop = 100e3**2 / (2 * 6371008.7714)
    t = column_terrain_effect(np.array(1e5), np.array(0.0), np.array(500.0), np.array(drop), 1e3, 1e3, 1e6)
    assert float(t) < 0


def test_inverse_distance_difference_keeps_digits():
    mp = pytest.importorskip("mpmath")
    mp.mp.dps = 50
    rho2, c1, c2 = 1e10, 3.0, 3.5
    exact = 1 / mp.sqrt(mp.mpf(rho2) + c1 * c1) - 1 / mp.sqrt(mp.mpf(rho2) + c2 * c2)
    assert float(inverse_distance_difference(rho2, c1, c2)) == pytest.approx(float(exact), rel=1e-13)


@pytest.mark.parametrize(
    ("theta", "expected"),
    # docs/terrain.md section 11, case 5 [C]: infinite inclined plane, TC to R = 1 km
    [(5.0, 0.21334), (10.0, 0.85541), (20.0, 3.45501), (30.0, 7.90467)],
)
def test_plane_wedges_on_a_disc_references_6_case_5(theta, expected):
    # A square much larger than the disc is not what the function integrates,
    # so integrate the plane over the disc with the same wedge formula: a
    # 2 km square seen from its centre contains the 1 km disc; subtract the
    # corners analytically via the elliptic form for R = 1 km.
    t = math.tan(math.radians(theta))
    k = ellipk(math.sin(math.radians(theta)) ** 2)
    disc = GRAVITATIONAL_CONSTANT * 2670 * 1000 * (2 * math.pi - 4 * math.cos(math.radians(theta)) * k) * 1e5
    assert disc == pytest.approx(expected, abs=1e-5)
    # The square of side 2 km holds the disc plus positive corners.
    square = plane_terrain_effect(1000, 1000, 2000, 2000, t, 0.0, 2670.0, sectors=4096)
    assert square > disc
    # Rotating the slope direction does not change a square seen from its centre.
    rotated = plane_terrain_effect(1000, 1000, 2000, 2000, t * math.cos(0.3), t * math.sin(0.3), 2670.0, sectors=4096)
    assert 0.9 * square < rotated < 1.1 * square


def test_plane_wedges_vs_fine_prisms():
    # Self-consistency: the innermost plane over a 30 m cell vs the same plane
    # cut into flat-topped prisms (Nagy). The staircase error is first order
    # in the step, so the prism sums at 0.25 m and 0.125 m are extrapolated
    # (Richardson) before comparing.
    ge, gn = 0.35, -0.2
    e0, n0 = 7.0, 19.0

    def staircase(step):
        edges = np.arange(0.0, 30.0 + step / 2, step)
        xc = 0.5 * (edges[1:] + edges[:-1])
        X, Y = np.meshgrid(xc, xc)
        rel = ge * (X - e0) + gn * (Y - n0)
        lo, hi = np.minimum(0, rel), np.maximum(0, rel)
        h = step / 2
        return float((-np.sign(rel) * prism_gravity(e0, n0, 0, X - h, X + h, Y - h, Y + h, lo, hi, 2670.0)).sum())

    coarse, fine = staircase(0.25), staircase(0.125)
    wedges = plane_terrain_effect(e0, n0, 30.0, 30.0, ge, gn, 2670.0)
    assert wedges == pytest.approx(2 * fine - coarse, rel=2e-3)
    assert abs(fine - wedges) > abs(2 * fine - coarse - wedges)  # the extrapolation helps
