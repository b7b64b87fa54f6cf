# SPDX-License-Identifier: GPL-2.0-or-later
"""The zone engine on rasters of analytic terrain (docs/terrain.md sections 11 and 6).

All cases are flat-Earth (``curvature=False``) unless the test is about
curvature. Values and formulas are from docs/terrain.md section 11 [C: derived there and
checked by independent numerical integration]; G = 6.6743e-11, rho = 2670.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from scipy.special import ellipk

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT, MEAN_EARTH_RADIUS
from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction

G_RHO = GRAVITATIONAL_CONSTANT * 2670.0 * 1e5  # mGal per metre


def raster(func, west, east, south, north, cell):
    """Grid of func(x, y) sampled at cell centres (metric)."""
    nx, ny = int(round((east - west) / cell)), int(round((north - south) / cell))
    x = west + (np.arange(nx) + 0.5) * cell
    y = north - (np.arange(ny) + 0.5) * cell
    X, Y = np.meshgrid(x, y)
    return ElevationGrid.from_array(func(X, Y), west, north, cell, cell)


def run(grid, x, y, h, **kw):
    kw.setdefault("curvature", False)
    kw.setdefault("outer_radius", 1e6)
    return terrain_correction([x], [y], [h], grid, **kw)


@pytest.mark.parametrize("curvature", [False, True])
def test_zero_relief_gives_zero_references_6_case_9(curvature):
    grid = raster(lambda X, Y: np.full(X.shape, 812.0), -3000, 3000, -3000, 3000, 30.0)
    r = run(grid, 17.0, -40.0, 812.0, curvature=curvature)
    assert abs(r.tc_total[0]) < 1e-12
    assert r.dem_height[0] == pytest.approx(812.0, abs=1e-9)
    assert r.height_difference[0] == pytest.approx(0.0, abs=1e-9)


@pytest.mark.parametrize(
    ("a", "h", "L", "cell", "expected"),
    [
        (100.0, 50.0, 5000.0, 10.0, 1.175474),  # docs/terrain.md section 11, case 7
        (50.0, 10.0, 2000.0, 10.0, 0.097461),  # docs/terrain.md section 11, case 7
    ],
)
@pytest.mark.parametrize("pit", [False, True])
def test_square_mesa_and_pit_references_6_case_7(a, h, L, cell, expected, pit):
    top, plain = (0.0, h) if pit else (h, 0.0)
    grid = raster(lambda X, Y: np.where((abs(X) < a) & (abs(Y) < a), top, plain), -L, L, -L, L, cell)
    r = run(grid, 0.0, 0.0, top)
    # Cells tile the square exactly; what is left is the column error of the
    # far cells (< 5e-4 of each cell beyond five cells).
    assert r.tc_total[0] == pytest.approx(expected, abs=2e-5)
    assert r.tc_inner[0] + r.tc_outer[0] == pytest.approx(r.tc_total[0], abs=1e-12)


def test_circular_mesa_hammer_ring_references_6_case_3():
    # Station on a flat-topped circular mesa a = 100 m, h = 50 m, plain to
    # R = 1 km: Hammer's ring formula 2 pi G rho [(R - a) + sqrt(a^2 + h^2)
    # - sqrt(R^2 + h^2)] = 1.181738 mGal (docs/terrain.md section 11, cases 2-3).
    a, h, R = 100.0, 50.0, 1000.0
    formula = 2 * math.pi * G_RHO * ((R - a) + math.hypot(a, h) - math.hypot(R, h))
    assert formula == pytest.approx(1.181738, abs=1e-6)
    grid = raster(lambda X, Y: np.where(np.hypot(X, Y) < a, h, 0.0), -1100, 1100, -1100, 1100, 2.5)
    r = run(grid, 0.0, 0.0, h, inner_radius=R, outer_radius=R)
    # The raster's staircase edge of the mesa and the by-centre cut at R leave
    # about 0.1 %.
    assert r.tc_total[0] == pytest.approx(formula, rel=2e-3)


def test_cone_apex_references_6_case_4():
    # Station at the apex of a cone falling at 10 degrees to R = 1 km:
    # 2 pi G rho R (1 - cos theta) = 1.70106 mGal (docs/terrain.md section 11, case 4).
    theta, R = math.radians(10.0), 1000.0
    expected = 2 * math.pi * G_RHO * R * (1 - math.cos(theta))
    assert expected == pytest.approx(1.70106, abs=1e-5)
    errors = []
    for cell in (5.0, 2.5):
        grid = raster(lambda X, Y: -np.hypot(X, Y) * math.tan(theta), -1050, 1050, -1050, 1050, cell)
        r = run(grid, cell / 2, cell / 2, 0.0, inner_radius=R, outer_radius=R)
        errors.append(r.tc_total[0] - expected)
    # Flat-topped cells on a slope overstate the correction (the staircase
    # error, first order in cell size near the station; the apex cell's
    # plane has zero slope there). The error is below 0.5 % and shrinks
    # with the cell.
    assert abs(errors[0]) < 0.005 * expected
    assert abs(errors[1]) < 0.75 * abs(errors[0])


@pytest.mark.parametrize(("theta_deg", "expected"), [(10.0, 0.85541), (20.0, 3.45501)])
def test_inclined_plane_references_6_case_5(theta_deg, expected):
    # TC of an infinite plane of slope theta to R = 1 km:
    # G rho R [2 pi - 4 cos(theta) K(sin^2 theta)] (docs/terrain.md section 11, case 5).
    theta, R = math.radians(theta_deg), 1000.0
    formula = G_RHO * R * (2 * math.pi - 4 * math.cos(theta) * ellipk(math.sin(theta) ** 2))
    assert formula == pytest.approx(expected, abs=1e-5)
    t = math.tan(theta)
    x0, y0 = 3.7, -11.2
    grid = raster(lambda X, Y: (X - x0) * t * 0.6 + (Y - y0) * t * 0.8, -1050, 1050, -1050, 1050, 5.0)
    r = run(grid, x0, y0, 0.0, inner_radius=R, outer_radius=R)
    # Flat-topped 5 m cells on a slope overstate the correction slightly
    # (staircase, first order in cell/distance near the station).
    assert r.tc_total[0] == pytest.approx(formula, rel=5e-3)


@pytest.mark.parametrize(
    ("L", "expected"),
    # docs/terrain.md section 11, case 8: block x = d..L, y = +-L, 0..100 m above, d = 100 m
    [(5000.0, 1.51396)],
)
def test_two_dimensional_step_references_6_case_8(L, expected):
    grid = raster(lambda X, Y: np.where(X > 100.0, 100.0, 0.0), -200.0, L, -L, L, 10.0)
    r = run(grid, 0.0, 0.0, 0.0)
    assert r.tc_total[0] == pytest.approx(expected, abs=3e-5)
    # and the infinite step (case 6, d = 100 m) is larger
    infinite = GRAVITATIONAL_CONSTANT * 2670 * 1e5 * (math.pi * 100 - 100 * math.log(2) - 200 * math.atan(1))
    assert infinite == pytest.approx(1.56400, abs=1e-5)
    assert r.tc_total[0] < infinite


@pytest.mark.parametrize(
    ("distance", "expected"),
    # docs/terrain.md section 6 table [C/L: harmonica prism lowered by s^2/2R]:
    # downward g_z of a 1 km x 1 km x 500 m column on the station's sphere;
    # the terrain correction is -g_z.
    [(10e3, 0.002162), (22e3, 0.000177), (50e3, 0.000004), (100e3, -0.000005), (166.7e3, -0.000004)],
)
def test_curvature_far_column_references_5_7(distance, expected):
    cell = 1000.0
    j = int(math.ceil(distance / cell - 0.5))
    x_station = (j + 0.5) * cell - distance
    z = np.zeros((3, j + 2))
    z[1, j] = 500.0  # row 1 has its centre at y = 0
    grid = ElevationGrid.from_array(z, 0.0, 1500.0, cell, cell)
    r = terrain_correction([x_station], [0.0], [0.0], grid, outer_radius=166735.0)
    assert r.tc_total[0] == pytest.approx(expected, abs=1.5e-6)


def test_curvature_sign_change_at_mid_height():
    # The column's mid-height (250 m) falls below the station's horizontal
    # plane at s = sqrt(2 R 250 m) = 56.4 km (docs/terrain.md section 6).
    switch = math.sqrt(2 * MEAN_EARTH_RADIUS * 250.0)
    values = []
    for distance in (switch - 6e3, switch + 6e3):
        j = int(math.ceil(distance / 1000.0 - 0.5))
        z = np.zeros((3, j + 2))
        z[1, j] = 500.0
        grid = ElevationGrid.from_array(z, 0.0, 1500.0, 1000.0, 1000.0)
        values.append(terrain_correction([(j + 0.5) * 1000.0 - distance], [0.0], [0.0], grid).tc_total[0])
    assert values[0] > 0 > values[1]
