# SPDX-License-Identifier: GPL-2.0-or-later
"""Coverage, flags, NoData, water, field values, progress and cancel."""

from __future__ import annotations

import itertools
import math

import numpy as np
import pytest

from relief_gravity.algorithms.terrain import ElevationGrid, TerrainCancelled, terrain_correction


def hilly(n=200, cell=30.0, west=0.0, north=6000.0, seed=5):
    rng = np.random.default_rng(seed)
    x = np.arange(n) * cell
    X, Y = np.meshgrid(x, x)
    z = 600 + 150 * np.sin(X / 700.0) * np.cos(Y / 900.0) + rng.normal(0, 3, X.shape)
    return z, ElevationGrid.from_array(z, west, north, cell, cell)


def test_coverage_when_the_dem_does_not_reach_outer_radius():
    _z, grid = hilly()
    r = terrain_correction([3000.0], [3000.0], [640.0], grid, outer_radius=20000.0)
    # The 6 km x 6 km DEM covers 36 km^2 of the 1257 km^2 disc.
    assert r.coverage[0] == pytest.approx(36e6 / (math.pi * 20000.0**2), rel=0.01)
    assert r.flags[0] == ["tc_partial"]
    full = terrain_correction([3000.0], [3000.0], [640.0], grid, outer_radius=2500.0)
    assert full.coverage[0] == pytest.approx(1.0, abs=0.01) and full.flags[0] == []


def test_nodata_hole_reduces_coverage_and_is_left_out():
    z, grid = hilly()
    holed = z.copy()
    holed[40:70, 110:140] = np.nan  # 0.9 km x 0.9 km hole, 1-2.2 km from the station
    grid_h = ElevationGrid.from_array(holed, 0.0, 6000.0, 30.0, 30.0)
    kw = dict(inner_radius=1500.0, outer_radius=2900.0)
    a = terrain_correction([3000.0], [3000.0], [640.0], grid, **kw)
    b = terrain_correction([3000.0], [3000.0], [640.0], grid_h, **kw)
    # Blocks are taken by centre, so the covered area of the disc is known to
    # about the rim's block size (0.5 % here).
    assert b.coverage[0] == pytest.approx(1.0 - 900.0**2 / (math.pi * 2900.0**2), abs=0.006)
    assert a.coverage[0] == pytest.approx(1.0, abs=0.006)
    assert "tc_partial" in b.flags[0]
    assert np.isfinite(b.tc_total[0]) and b.tc_total[0] < a.tc_total[0]
    # Filling the hole with the station height (no relief) must give the
    # same as leaving it out: exactly for full-resolution cells, to second
    # order for coarse blocks that are partly hole (their mean and variance
    # differ), hence 1e-5 mGal.
    filled = holed.copy()
    filled[40:70, 110:140] = 640.0
    c = terrain_correction([3000.0], [3000.0], [640.0], ElevationGrid.from_array(filled, 0.0, 6000.0, 30.0, 30.0), curvature=False, **kw)
    d = terrain_correction([3000.0], [3000.0], [640.0], grid_h, curvature=False, **kw)
    assert d.tc_total[0] == pytest.approx(c.tc_total[0], abs=1e-5)
    assert d.tc_inner[0] == pytest.approx(c.tc_inner[0], abs=1e-12)


def test_station_outside_no_height_and_nodata_station():
    z, _grid = hilly()
    holed = z.copy()
    holed[95:105, 95:105] = np.nan
    grid_h = ElevationGrid.from_array(holed, 0.0, 6000.0, 30.0, 30.0)
    r = terrain_correction([-50.0, 3000.0, 1000.0, 3000.0], [3000.0, 3000.0, 1000.0, 3000.0 - 0.0], [600.0, np.nan, 620.0, 610.0], grid_h, inner_radius=900.0, outer_radius=900.0)
    assert r.flags[0] == ["outside_dem"] and np.isnan(r.tc_total[0]) and np.isnan(r.dem_height[0])
    assert r.flags[1] == ["no_height"] and np.isnan(r.tc_total[1]) and np.isnan(r.height_difference[1])
    assert r.flags[2] == [] and np.isfinite(r.tc_total[2])
    # Station on a NoData patch: the rest is computed, the flag says why the
    # innermost part is missing.
    assert "no_dem_at_station" in r.flags[3] and np.isfinite(r.tc_total[3]) and np.isnan(r.dem_height[3])


def test_height_difference_and_field_innermost_value():
    _z, grid = hilly()
    r = terrain_correction([3010.0, 3010.0], [2990.0, 2990.0], [700.0, 700.0], grid, outer_radius=3000.0, innermost_tc=[np.nan, 0.25])
    assert r.height_difference[0] == pytest.approx(700.0 - r.dem_height[0])
    assert 400.0 < r.dem_height[0] < 800.0
    # The field value replaces the modelled innermost square only.
    model = terrain_correction([3010.0], [2990.0], [700.0], grid, outer_radius=3000.0, innermost_tc=[0.0])
    assert r.tc_inner[1] == pytest.approx(model.tc_inner[0] + 0.25, abs=1e-12)
    assert r.tc_inner[0] > model.tc_inner[0]


def test_water_filled_cells():
    # Flat sea floor 100 m below a station at sea level, 40 m from a cliff
    # coast: with water of density rho_w the missing mass is (rho - rho_w)
    # instead of rho (the layer model documented in terrain_correction; the
    # innermost square is land here, as it does not model water).
    z = np.full((200, 200), -100.0)
    z[:, :100] = 0.0  # land to the west, sea to the east
    grid = ElevationGrid.from_array(z, 0.0, 6000.0, 30.0, 30.0)
    kw = dict(outer_radius=2900.0, curvature=False)
    dry = terrain_correction([2960.0], [3000.0], [0.0], grid, **kw)
    wet = terrain_correction([2960.0], [3000.0], [0.0], grid, water_density=1030.0, **kw)
    assert dry.tc_total[0] > 1.0
    assert wet.tc_total[0] == pytest.approx(dry.tc_total[0] * (2670.0 - 1030.0) / 2670.0, rel=1e-6)
    # Land above sea level is untouched by the option.
    hill = np.full((200, 200), 50.0)
    g2 = ElevationGrid.from_array(hill, 0.0, 6000.0, 30.0, 30.0)
    a = terrain_correction([2990.0], [3000.0], [0.0], g2, **kw)
    b = terrain_correction([2990.0], [3000.0], [0.0], g2, water_density=1030.0, **kw)
    assert a.tc_total[0] == b.tc_total[0]


def test_progress_and_cancel():
    _z, grid = hilly()
    seen = []
    x = np.linspace(500, 5500, 40)
    terrain_correction(x, x, np.full(40, 600.0), grid, outer_radius=3000.0, progress=seen.append)
    assert seen[-1] == 1.0 and all(0 <= a <= b <= 1 for a, b in itertools.pairwise(seen))
    calls = []

    def cancel():
        calls.append(1)
        return len(calls) > 3

    with pytest.raises(TerrainCancelled):
        terrain_correction(x, x, np.full(40, 600.0), grid, outer_radius=3000.0, is_cancelled=cancel)


def test_threads_do_not_change_results():
    _z, grid = hilly()
    x = np.linspace(500, 5500, 70)
    a = terrain_correction(x, x[::-1], np.full(70, 600.0), grid, outer_radius=4000.0, workers=1)
    b = terrain_correction(x, x[::-1], np.full(70, 600.0), grid, outer_radius=4000.0, workers=2)
    np.testing.assert_array_equal(a.tc_total, b.tc_total)


@pytest.mark.parametrize("bad", [dict(inner_radius=5000.0, outer_radius=1000.0), dict(density=0.0), dict(workers=0)])
def test_impossible_parameters(bad):
    _z, grid = hilly()
    with pytest.raises(ValueError, match="must"):
        terrain_correction([100.0], [100.0], [600.0], grid, **bad)


def test_raster_is_read_from_the_calling_thread_only():
    # GDAL datasets are not thread-safe: worker threads must not read.
    import threading

    z, _ = hilly()
    threads = set()

    def reader(r, c, nr, nc):
        threads.add(threading.get_ident())
        return z[r : r + nr, c : c + nc]

    grid = ElevationGrid(0.0, 6000.0, 30.0, 30.0, z.shape[0], z.shape[1], reader)
    x = np.linspace(500, 5500, 100)
    terrain_correction(x, x, np.full(100, 600.0), grid, outer_radius=4000.0, workers=2)
    assert threads == {threading.get_ident()}


@pytest.mark.parametrize("radius", [10_000.0, 50_000.0, 166_735.0])
def test_full_coverage_reads_one_at_every_radius(radius):
    # Blocks are assigned to zones by their centre; coverage must still count
    # the disc's area exactly, or fully covered stations get flagged.
    fine = ElevationGrid.from_array(np.full((400, 400), 100.0), 0.0, 40_000.0, 100.0, 100.0)
    regional = ElevationGrid.from_array(np.full((200, 200), 100.0), -180_000.0, 220_000.0, 2000.0, 2000.0)
    xs = np.array([20_000.0, 20_050.0, 13_330.0, 27_770.0])
    ys = np.array([20_000.0, 20_050.0, 17_770.0, 25_550.0])
    result = terrain_correction(xs, ys, np.full(4, 100.0), fine, regional, outer_radius=radius)
    assert np.all(result.coverage > 0.998)
    assert result.flags == [[], [], [], []]


@pytest.mark.parametrize(("x", "y"), [(2000.0, 20_000.0), (2050.0, 17_330.0), (2010.0, 25_555.0)])
def test_coverage_near_an_edge_is_the_disc_fraction_inside(x, y):
    # Analytic: a disc of radius R whose centre is d from a straight edge has
    # 1 - (R^2 acos(d/R) - d sqrt(R^2 - d^2)) / (pi R^2) of its area inside.
    radius = 10_000.0
    fine = ElevationGrid.from_array(np.full((400, 400), 100.0), 0.0, 40_000.0, 100.0, 100.0)
    result = terrain_correction([x], [y], [100.0], fine, None, outer_radius=radius)
    d = x
    expected = 1 - (radius**2 * math.acos(d / radius) - d * math.sqrt(radius**2 - d**2)) / (math.pi * radius**2)
    assert result.coverage[0] == pytest.approx(expected, abs=0.001)
    assert result.flags[0] == ["tc_partial"]
