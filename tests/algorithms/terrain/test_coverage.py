# SPDX-License-Identifier: GPL-2.0-or-later
"""Coverage by zone and the truncation estimate (algorithms/terrain/_coverage.py)."""

from __future__ import annotations

import math

import numpy as np
import pytest

from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction
from relief_gravity.algorithms.terrain._coverage import truncation_estimate


def hills(n=400, cell=30.0):
    i, j = np.mgrid[0:n, 0:n]
    return 500.0 + 60.0 * np.sin(i / 17.0) * np.cos(j / 23.0) + 0.3 * i


def test_nodata_hole_in_the_inner_zone_is_flagged_with_its_share():
    # A 1 km x 1 km hole 0.5-1.6 km from the station inside a 2 km inner
    # zone: the whole disc to 10 km barely notices it (0.3 %), the inner zone
    # loses 8 %.
    z = hills(700)
    holed = z.copy()
    holed[333:367, 366:400] = np.nan  # 34 x 34 cells of 30 m = 1.04 km^2
    x = y = 10500.0
    h = 520.0
    kw = dict(inner_radius=2000.0, outer_radius=10000.0)
    full = terrain_correction([x], [y], [h], ElevationGrid.from_array(z, 0, 21000, 30, 30), **kw)
    hole = terrain_correction([x], [y], [h], ElevationGrid.from_array(holed, 0, 21000, 30, 30), **kw)
    share = 34 * 34 * 900.0 / (math.pi * 2000.0**2)
    assert full.coverage_inner[0] == pytest.approx(1.0, abs=1e-3) and full.flags[0] == []
    assert hole.coverage_inner[0] == pytest.approx(1.0 - share, abs=0.005)
    assert hole.flags[0] == ["tc_gap_inner"]
    assert hole.coverage[0] > 0.99  # the whole disc hardly sees it
    assert hole.tc_inner[0] < full.tc_inner[0]


def test_truncation_is_zero_when_covered_and_for_flat_terrain():
    z = hills()
    g = ElevationGrid.from_array(z, 0, 12000, 30, 30)
    r = terrain_correction([6000.0], [6000.0], [520.0], g, inner_radius=1000.0, outer_radius=4000.0)
    assert r.truncation[0] == 0.0
    flat = ElevationGrid.from_array(np.full((100, 100), 300.0), 0, 3000, 30, 30)
    r = terrain_correction([1500.0], [1500.0], [300.0], flat, inner_radius=1000.0, outer_radius=20000.0)
    assert r.coverage[0] < 0.1 and "tc_partial" in r.flags[0]
    assert r.truncation[0] == pytest.approx(0.0, abs=1e-12)


def test_truncation_estimates_the_missing_part_of_uniform_relief():
    # A plain 80 m above the station everywhere (flat Earth): the part beyond
    # a 10 km raster is what the full 40 km raster adds. The estimate spreads
    # the missing area as an annulus at the edge's relief: for uniform relief
    # and a square raster it is close (computed: within 10 %).
    z = np.full((1334, 1334), 80.0)
    z[660:674, 660:674] = 0.0  # the station stands in a small pit
    big = ElevationGrid.from_array(z, -20010.0, 20010.0, 30.0, 30.0)
    small_z = z[500:834, 500:834]
    small = ElevationGrid.from_array(small_z, -20010.0 + 500 * 30, 20010.0 - 500 * 30, 30.0, 30.0)
    kw = dict(inner_radius=2000.0, outer_radius=19000.0, curvature=False)
    whole = terrain_correction([0.0], [0.0], [0.0], big, **kw)
    cut = terrain_correction([0.0], [0.0], [0.0], small, **kw)
    missing = whole.tc_total[0] - cut.tc_total[0]
    assert missing > 0.01
    assert cut.truncation[0] == pytest.approx(missing, rel=0.1)
    assert whole.truncation[0] == 0.0


def test_truncation_formula_against_hammer_annulus():
    # Flat Earth, relief z over the annulus r1..R: exactly Hammer's ring,
    # 2 pi G rho [(R - r1) + sqrt(r1^2 + z^2) - sqrt(R^2 + z^2)]
    # (docs/terrain.md section 11, case 2), here with no spread.
    r_out, z = 20000.0, 150.0
    cov = 0.25  # r1 = 10 km
    r1 = r_out * math.sqrt(cov)
    ring = 2 * math.pi * 6.6743e-11 * 2670.0 * 1e5 * ((r_out - r1) + math.hypot(r1, z) - math.hypot(r_out, z))
    est = truncation_estimate(np.array([cov]), np.array([z]), np.array([z * z]), r_out, 2670.0, curvature=False)
    assert est[0] == pytest.approx(ring, rel=1e-6)
