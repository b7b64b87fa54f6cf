# SPDX-License-Identifier: GPL-2.0-or-later
"""Uncertainty components against cases worked out by hand, and a Monte Carlo check."""

import numpy as np
import pytest

from relief_gravity.algorithms import reduce_gravity
from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL
from relief_gravity.algorithms.terrain import ElevationGrid, plane_terrain_effect, terrain_correction
from relief_gravity.algorithms.uncertainty import (
    height_component,
    near_terrain_spread,
    normal_spread,
    quadrature_sum,
    terrain_height_spread,
    uncertainty_budget,
)

TWO_PI_G = 2 * np.pi * GRAVITATIONAL_CONSTANT * SI_TO_MGAL


def _hills(n=161, cell=50.0, seed=3):
    """A smooth synthetic landscape (m) with a few hundred metres of relief."""
    rng = np.random.default_rng(seed)
    yy, xx = np.mgrid[0:n, 0:n] * cell
    z = 300.0 + 0.0 * xx
    for _ in range(6):
        cx, cy = rng.uniform(0, n * cell, 2)
        amp = rng.uniform(-120, 200)
        width = rng.uniform(400, 1500)
        z += amp * np.exp(-((xx - cx) ** 2 + (yy - cy) ** 2) / (2 * width**2))
    return z


def test_quadrature_spread_of_a_linear_function_is_exact():
    # Var(a X) = a^2 sigma^2 (closed form).
    mean, std = normal_spread(lambda d: 3.0 * d, np.array([0.5, 2.0]))
    np.testing.assert_allclose(std, [1.5, 6.0], rtol=1e-12)
    np.testing.assert_allclose(mean, 0.0, atol=1e-12)


def test_quadrature_sum_leaves_unknown_parts_out():
    out = quadrature_sum(np.array([0.3, np.nan, np.nan]), np.array([0.4, 0.5, np.nan]))
    np.testing.assert_allclose(out[:2], [0.5, 0.5])
    assert np.isnan(out[2])


def test_height_component_is_the_bouguer_gradient_away_from_terrain():
    # Flat slab, first-order gradient: d(sba)/dh = 0.3086 - 2 pi G rho (Hinze et al. 2005 eq. for the slab).
    s = height_component(np.array([10.0, 60.0]), np.array([0.0, 2000.0]), 2.0, 2670.0,
                         curvature=False, atmospheric=False, height_formula="first_order")
    np.testing.assert_allclose(s, 2.0 * (0.3086 - TWO_PI_G * 2670.0), rtol=1e-9)


def test_density_component_scales_the_bouguer_and_terrain_terms():
    slab, curv, tc = np.array([55.9]), np.array([1.4]), np.array([3.3])
    b = uncertainty_budget(gravity_sigma=0.0, height_sigma_cba=np.zeros(1), height_sigma_tc=np.zeros(1), near=None,
                           truncation=None, density=2670.0, density_sigma=100.0, slab=slab, curvature=curv,
                           tc_total=tc)
    # d(cba)/d(rho) = -(slab + curv - tc) / rho: by hand 100 * 54.0 / 2670.
    np.testing.assert_allclose(b.components["sigma_rho"], 100.0 * 54.0 / 2670.0, rtol=1e-12)
    np.testing.assert_allclose(b.cba_sigma, 100.0 * 54.0 / 2670.0, rtol=1e-12)


def test_budget_without_terrain_correction_gives_no_totals():
    b = uncertainty_budget(gravity_sigma=0.02, height_sigma_cba=np.array([0.1]), height_sigma_tc=np.array([0.0]),
                           near=None, truncation=None, density=2670.0, density_sigma=None,
                           slab=np.array([10.0]), curvature=np.array([0.1]), tc_total=np.array([np.nan]))
    assert np.isnan(b.cba_sigma[0]) and np.isnan(b.tc_sigma[0])


def test_innermost_component_is_the_plane_square_correction():
    # A uniform tilted plane DEM (slope 0.2 east): the component equals the
    # sloping-plane correction of one centred cell (worked by the same
    # closed-form wedge sum), and mismatch is zero for a station on the DEM.
    cell = 30.0
    n = 81
    xx = (np.arange(n) + 0.5) * cell
    z = np.tile(0.2 * xx, (n, 1))
    grid = ElevationGrid.from_array(z, 0.0, n * cell, cell, cell)
    x0 = y0 = 40.5 * cell
    s = near_terrain_spread(np.array([x0]), np.array([y0]), np.array([0.2 * x0]), grid, 2670.0, 0.0, 0.0)
    expected = plane_terrain_effect(cell / 2, cell / 2, cell, cell, 0.2, 0.0, 2670.0)
    np.testing.assert_allclose(s.innermost, expected, rtol=1e-9)
    assert s.mismatch[0] < 1e-9


def test_mismatch_is_the_change_if_the_station_stood_on_the_dem():
    # Flat DEM at 0, station 10 m above it. Standing on the DEM, every cell
    # has zero relief; as given, the cells within the radius (less the
    # station square, which holds the plane through the station) are a 10 m
    # void right below the station. By hand: a disc of radius R below the
    # station, 2 pi G rho (t - sqrt(R^2 + t^2) + R), less the square prism on
    # its axis, G rho * integral of 4 atan(a^2 / (z sqrt(2 a^2 + z^2))) dz
    # (solid angle of a square, a = half side).
    from scipy.integrate import quad

    cell, t, radius = 50.0, 10.0, 895.0
    grid = ElevationGrid.from_array(np.zeros((81, 81)), 0.0, 4050.0, cell, cell)
    s = near_terrain_spread(np.array([2025.0]), np.array([2025.0]), np.array([t]), grid, 2670.0, 0.0, 0.0,
                            radius=radius)
    g_rho = GRAVITATIONAL_CONSTANT * 2670.0 * SI_TO_MGAL
    disc = 2 * np.pi * g_rho * (t - np.hypot(radius, t) + radius)
    a = cell / 2
    square = g_rho * quad(lambda z: 4 * np.arctan(a * a / (z * np.sqrt(2 * a * a + z * z))), 0, t)[0]
    # Cells chosen by their centre make a staircase disc: 2 % tolerance.
    np.testing.assert_allclose(s.mismatch[0], disc - square, rtol=0.02)


@pytest.mark.parametrize("dem_sigma", [2.0])
def test_dem_component_agrees_with_monte_carlo_on_the_engine(dem_sigma):
    """Perturb the DEM cells by independent normal errors and recompute with the engine."""
    cell = 50.0
    z = _hills()
    n = z.shape[0]
    grid = ElevationGrid.from_array(z, 0.0, n * cell, cell, cell)
    rng = np.random.default_rng(11)
    x = rng.uniform(3000, 5000, 8)
    y = rng.uniform(3000, 5000, 8)
    from relief_gravity.algorithms.terrain import sample_bilinear

    h = sample_bilinear(grid, x, y)
    opts = dict(inner_radius=895.0, outer_radius=2500.0, density=2670.0, curvature=False)
    base = terrain_correction(x, y, h, grid, **opts).tc_total
    runs = []
    for _ in range(40):
        noisy = ElevationGrid.from_array(z + rng.normal(0, dem_sigma, z.shape), 0.0, n * cell, cell, cell)
        runs.append(terrain_correction(x, y, h, noisy, **opts).tc_total)
    observed = np.std(np.array(runs) - base, axis=0, ddof=1)
    predicted = near_terrain_spread(x, y, h, grid, 2670.0, dem_sigma, 0.0, radius=2500.0).dem
    ratio = np.sqrt(np.mean(observed**2) / np.mean(predicted**2))
    # 40 draws give the observed spread to about +-11 % (1/sqrt(2*40)); the
    # budget must agree within 30 % (our acceptance figure).
    print(f"Monte Carlo / budget spread ratio: {ratio:.3f}")
    assert 0.7 < ratio < 1.3, (ratio, observed, predicted)


def test_height_component_agrees_with_monte_carlo_on_the_engine():
    cell = 50.0
    z = _hills(seed=5)
    n = z.shape[0]
    grid = ElevationGrid.from_array(z, 0.0, n * cell, cell, cell)
    rng = np.random.default_rng(12)
    x = rng.uniform(3000, 5000, 8)
    y = rng.uniform(3000, 5000, 8)
    from relief_gravity.algorithms.terrain import sample_bilinear

    h = sample_bilinear(grid, x, y)
    lat = np.full(8, 40.0)
    opts = dict(inner_radius=895.0, outer_radius=2500.0, density=2670.0, curvature=False)
    sigma_h = 1.5

    def cba(heights):
        tc = terrain_correction(x, y, heights, grid, **opts).tc_total
        return reduce_gravity(np.zeros(8), lat, heights, 2670.0, terrain_correction=tc)["cba"]

    base = cba(h)
    runs = np.array([cba(h + rng.normal(0, sigma_h, 8)) - base for _ in range(40)])
    observed = np.std(runs, axis=0, ddof=1)
    near = near_terrain_spread(x, y, h, grid, 2670.0, 0.0, sigma_h, radius=2500.0)
    predicted = height_component(lat, h, sigma_h, 2670.0, terrain_nodes=near.height_nodes)
    ratio = np.sqrt(np.mean(observed**2) / np.mean(predicted**2))
    print(f"Monte Carlo / budget spread ratio: {ratio:.3f}")
    assert 0.7 < ratio < 1.3, (ratio, observed, predicted)
    assert np.all(np.isfinite(terrain_height_spread(near.height_nodes)))
