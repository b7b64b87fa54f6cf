# SPDX-License-Identifier: GPL-2.0-or-later
"""Prism kernel: published check values, symmetry, linearity, far field."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT
from relief_gravity.algorithms.terrain import _prism, prism_gravity

CUBE = (-500.0, 500.0, -500.0, 500.0, -1000.0, 0.0)


@pytest.mark.parametrize(
    ("station", "expected"),
    [
        # docs/terrain.md section 4 [C: own Nagy formula = choclo], rho 2670, G 6.6743e-11
        ((0.0, 0.0, 0.0), 46.277686),  # centre of the top face
        ((500.0, 500.0, 0.0), 17.274864),  # top corner
        ((0.0, 0.0, 100.0), 37.407751),  # 100 m above the centre
        ((0.0, 0.0, 10000.0), 0.161635),  # 10 km above the top centre
    ],
)
def test_cube_values_references_5_2(station, expected):
    assert float(prism_gravity(*station, *CUBE, 2670.0)) == pytest.approx(expected, abs=1e-6)


def test_cube_point_mass_limit_references_5_2():
    # docs/terrain.md section 4: 10 km above the top, point mass gives 0.161636 mGal
    # (mass at the cube centre, 10.5 km below the station).
    point = GRAVITATIONAL_CONSTANT * 2670.0 * 1e9 / 10500.0**2 * 1e5
    assert point == pytest.approx(0.161636, abs=1e-6)
    assert float(prism_gravity(0, 0, 10000, *CUBE, 2670.0)) == pytest.approx(point, rel=1e-4)


@pytest.mark.parametrize(
    ("side", "expected"),
    # docs/terrain.md section 4: 100 m thick square slab, station at the centre of its top
    [(1e3, 10.19706), (1e4, 11.09608), (1e5, 11.18680), (1e6, 11.19587)],
)
def test_slab_convergence_references_5_2(side, expected):
    h = side / 2.0
    g = float(prism_gravity(0, 0, 0, -h, h, -h, h, -100.0, 0.0, 2670.0))
    assert g == pytest.approx(expected, abs=1e-5)
    slab = 2 * np.pi * GRAVITATIONAL_CONSTANT * 2670.0 * 100.0 * 1e5  # 11.19688, §5.2
    assert g < slab


def test_cube_factors_references_5_2():
    # docs/terrain.md section 4: centre-top 2.596897 G rho a, corner-top 0.969388 G rho a
    a = 1000.0
    unit = GRAVITATIONAL_CONSTANT * 1000.0 * a * 1e5
    assert float(prism_gravity(0, 0, 0, *CUBE, 1000.0)) / unit == pytest.approx(2.596897, abs=1e-6)
    assert float(prism_gravity(500, 500, 0, *CUBE, 1000.0)) / unit == pytest.approx(0.969388, abs=1e-6)


def test_four_quarters_make_the_whole():
    # Symmetry (docs/terrain.md section 4 check): the centre value is four quarter
    # prisms seen from their common corner.
    whole = prism_gravity(0, 0, 0, *CUBE, 2670.0)
    quarters = prism_gravity(0, 0, 0, [0, -500, -500, 0], [500, 0, 0, 500], [0, 0, -500, -500], [500, 500, 0, 0], -1000, 0, 2670.0)
    assert float(np.sum(quarters)) == pytest.approx(float(whole), rel=1e-12)


def test_mirror_symmetry_and_sign():
    rng = np.random.default_rng(7)
    x, y = rng.uniform(-3000, 3000, (2, 50))
    below = prism_gravity(x, y, 0.0, -200, 300, -100, 400, -500, -50, 2670.0)
    mirrored = prism_gravity(-x, -y, 0.0, -300, 200, -400, 100, -500, -50, 2670.0)
    above = prism_gravity(x, y, 0.0, -200, 300, -100, 400, 50, 500, 2670.0)
    np.testing.assert_allclose(below, mirrored, rtol=1e-10)
    np.testing.assert_allclose(above, -below, rtol=1e-10)
    assert np.all(below > 0)


def test_linear_in_density():
    g1 = prism_gravity(120, -40, 5, -100, 100, -100, 100, -300, 0, 2000.0)
    g2 = prism_gravity(120, -40, 5, -100, 100, -100, 100, -300, 0, 2670.0)
    assert float(g2 / g1) == pytest.approx(2670.0 / 2000.0, rel=1e-13)


def test_no_jump_at_the_far_switch():
    # The closed form and the line-mass quadrature meet smoothly at FAR_RATIO.
    size = 200.0
    d = _prism.FAR_RATIO * size
    eps = 1e-6
    inside = prism_gravity(0, 0, 0, d - eps - 100, d - eps + 100, -100, 100, -40, 60, 2670.0)
    outside = prism_gravity(0, 0, 0, d + eps - 100, d + eps + 100, -100, 100, -40, 60, 2670.0)
    assert float(outside) == pytest.approx(float(inside), rel=1e-8)


def _nagy_mp(xs, ys, zs, mp):
    """The vertex sum of prism_gravity in high precision (z positive down)."""
    total = mp.mpf(0)
    for i, x in enumerate(xs):
        for j, y in enumerate(ys):
            for k, z in enumerate(zs):
                x, y, z = mp.mpf(x), mp.mpf(y), mp.mpf(z)
                r = mp.sqrt(x * x + y * y + z * z)
                term = x * mp.log(y + r) + y * mp.log(x + r)
                if z != 0:
                    term -= z * mp.atan(x * y / (z * r))
                total += (-1) ** (i + j + k) * term
    return total


@pytest.mark.parametrize(
    ("distance", "size", "bottom", "top"),
    [(5e4, 100.0, -3.0, 7.0), (1.5e5, 1000.0, 0.0, 20.0), (3e4, 30.0, 10.0, 1500.0), (2e3, 30.0, -1.0, 0.5)],
)
def test_far_prisms_keep_their_digits_vs_mpmath(distance, size, bottom, top):
    # Reference: Nagy's closed form in 60-digit arithmetic (mpmath as shipped
    # by Debian), so what is tested is the loss of digits in float64.
    mp = pytest.importorskip("mpmath")
    mp.mp.dps = 60
    x1, x2 = distance - size / 2, distance + size / 2
    y1, y2 = -size / 3, 2 * size / 3
    exact = _nagy_mp((x1, x2), (y1, y2), (-top, -bottom), mp) * mp.mpf(GRAVITATIONAL_CONSTANT) * 2670 * 100000
    got = float(prism_gravity(0, 0, 0, x1, x2, y1, y2, bottom, top, 2670.0))
    assert got == pytest.approx(float(exact), rel=1e-9)


def test_choclo_agrees_if_installed():
    # choclo (general forward-modelling library) gives the upward component
    # with z up: g_down = -gravity_u (choclo 0.3.2: gravity_u is the upward component). Skips where absent;
    # passed with choclo 0.3.2 + Debian numpy 1.24.2 in a throwaway venv.
    choclo = pytest.importorskip("choclo")
    rng = np.random.default_rng(3)
    for _ in range(20):
        e, n, u = rng.uniform(-2000, 2000), rng.uniform(-2000, 2000), rng.uniform(-500, 500)
        w, s, b = rng.uniform(-1000, 0, 3)
        ea, no, t = w + rng.uniform(1, 900), s + rng.uniform(1, 900), b + rng.uniform(1, 900)
        ref = -choclo.prism.gravity_u(e, n, u, w, ea, s, no, b, t, 2670.0) * 1e5
        assert float(prism_gravity(e, n, u, w, ea, s, no, b, t, 2670.0)) == pytest.approx(ref, rel=1e-9, abs=1e-12)
