# SPDX-License-Identifier: GPL-2.0-or-later
"""The regional DEM where the fine DEM has no data (algorithms/terrain/_fallback.py)."""

import numpy as np

from relief_gravity.algorithms.terrain import ElevationGrid, TerrainModel, terrain_correction
from relief_gravity.algorithms.terrain._fallback import filled_grid, holes_near, terrain_correction_with_fallback

CELL, N = 50.0, 120  # 6 km fine DEM
WEST, NORTH = 0.0, N * CELL


def _surface(x, y):
    """Invented relief: a 300 m hill on a 100 m plain (m)."""
    return 100.0 + 300.0 * np.exp(-((x - 3000.0) ** 2 + (y - 3200.0) ** 2) / (2 * 900.0**2))


def _grids(hole=None):
    xc = WEST + (np.arange(N) + 0.5) * CELL
    yc = NORTH - (np.arange(N) + 0.5) * CELL
    fine = _surface(xc[None, :], yc[:, None])
    if hole is not None:
        fine[hole] = np.nan
    rc = 250.0  # regional: the same surface on 250 m cells over 20 km
    n_r = 80
    rx = -7000.0 + (np.arange(n_r) + 0.5) * rc
    ry = 13000.0 - (np.arange(n_r) + 0.5) * rc
    regional = _surface(rx[None, :], ry[:, None])
    return (ElevationGrid.from_array(fine, WEST, NORTH, CELL, CELL),
            ElevationGrid.from_array(regional, -7000.0, 13000.0, rc, rc))


MODEL = TerrainModel(inner_radius=895.0, outer_radius=5000.0, curvature=False)


def test_without_a_regional_dem_the_engine_runs_unchanged():
    fine, _ = _grids()
    x, y = np.array([2500.0, 3300.0]), np.array([2800.0, 3500.0])
    h = _surface(x, y)
    a = terrain_correction(x, y, h, fine, None, MODEL)
    b = terrain_correction_with_fallback(x, y, h, fine, None, MODEL)
    np.testing.assert_array_equal(a.tc_total, b.tc_total)
    assert a.flags == b.flags


def test_a_void_near_the_station_is_filled_and_flagged():
    hole = (slice(50, 70), slice(62, 82))  # 1 km x 1 km void about 300-1300 m east of the station
    full, regional = _grids()
    holed, _ = _grids(hole)
    x, y = np.array([3000.0, 3000.0]), np.array([3000.0, 600.0])
    h = _surface(x, y)
    reference = terrain_correction(x, y, h, full, regional, MODEL).tc_total
    silent = terrain_correction(x, y, h, holed, regional, MODEL)
    filled = terrain_correction_with_fallback(x, y, h, holed, regional, MODEL)
    # Left out, the void lowers the correction; filled from the regional DEM
    # (the same surface on coarser cells) it comes back to within 2 % of the
    # full fine DEM's value.
    assert reference[0] - silent.tc_total[0] > 0.02
    assert abs(filled.tc_total[0] - reference[0]) < 0.02 * reference[0]
    assert "tc_regional_fill" in filled.flags[0]
    assert "tc_gap_inner" not in filled.flags[0]
    # The other station has the void beyond its inner zone: not flagged, but
    # its outer zone is filled too and comes back to the full DEM's value.
    assert filled.flags[1] == []
    assert abs(filled.tc_total[1] - reference[1]) < 0.1 * abs(silent.tc_total[1] - reference[1])


def test_a_station_outside_the_fine_dem_is_computed_from_the_regional_alone():
    fine, regional = _grids()
    x, y = np.array([3000.0, 9000.0]), np.array([3000.0, 3000.0])
    h = _surface(x, y)
    result = terrain_correction_with_fallback(x, y, h, fine, regional, MODEL)
    alone = terrain_correction(x[1:], y[1:], h[1:], regional, None, MODEL)
    assert np.all(np.isfinite(result.tc_total))
    np.testing.assert_allclose(result.tc_total[1], alone.tc_total[0], rtol=1e-12)
    assert "tc_regional_only" in result.flags[1] and "outside_dem" not in result.flags[1]
    assert "tc_regional_only" not in result.flags[0]


def test_holes_near_and_filled_grid():
    z = np.zeros((9, 9))
    z[4, 6] = np.nan
    g = ElevationGrid.from_array(z, 0, 90, 10, 10)
    assert holes_near(g, np.array([45.0]), np.array([45.0]), 25.0).tolist() == [True]
    assert holes_near(g, np.array([45.0]), np.array([45.0]), 15.0).tolist() == [False]
    regional = ElevationGrid.from_array(np.full((3, 3), 5.0), -100, 200, 100, 100)
    assert abs(filled_grid(g, regional).read_window(4, 6, 1, 1)[0, 0] - 5.0) < 1e-12


def test_numerical_error_estimate_tracks_a_finer_evaluation():
    """The refined-evaluation estimate (refinement 2) against the difference from refinement 4.

    The engine's error falls roughly as the square of the coarsening
    distance (docs/terrain.md), so |tc - tc(x2)| estimates |tc - tc(exact)|;
    both must be negligible against a station's correction (under 1e-3 mGal
    here, on relief of a few hundred metres).
    """
    from dataclasses import replace

    from relief_gravity.algorithms.terrain._fallback import numerical_error

    fine, _ = _grids()
    x, y = np.array([2500.0, 3000.0, 3600.0]), np.array([2800.0, 3100.0, 3400.0])
    h = _surface(x, y)
    result = terrain_correction_with_fallback(x, y, h, fine, None, MODEL)
    estimate = numerical_error(x, y, h, fine, None, MODEL, result)
    finer = terrain_correction_with_fallback(x, y, h, fine, None, replace(MODEL, refinement=4.0))
    actual = np.abs(result.tc_total - finer.tc_total)
    assert np.all(estimate < 1e-3) and np.all(actual < 1e-3)
    assert np.all(estimate < 3 * actual + 1e-6) and np.all(actual < 3 * estimate + 1e-6)


def test_refinement_is_validated():
    import pytest

    with pytest.raises(ValueError, match="refinement"):
        TerrainModel(refinement=0.5)


def test_holes_near_one_read_when_the_survey_window_is_clean_and_per_station_otherwise():
    z = np.zeros((60, 60))
    reads = []

    def reader(r0, c0, nr, nc):
        reads.append((r0, c0, nr, nc))
        return z[max(r0, 0) : r0 + nr, max(c0, 0) : c0 + nc]

    g = ElevationGrid(0.0, 600.0, 10.0, 10.0, 60, 60, reader)
    xs, ys = np.array([100.0, 300.0, 500.0]), np.array([500.0, 300.0, 100.0])
    assert holes_near(g, xs, ys, 50.0).tolist() == [False, False, False]
    assert len(reads) == 1
    z[29, 31] = np.nan  # 25 m from the middle station only
    reads.clear()
    assert holes_near(g, xs, ys, 50.0).tolist() == [False, True, False]
    assert len(reads) == 4


def _units(fine, regional, split_x=3000.0):
    """Two invented units: 2300 kg/m^3 west of x = split_x, 2800 east, on both grids (cell centres)."""
    from relief_gravity.algorithms.terrain._geology import DensityUnits

    def on(grid):
        xc = grid.x_origin + (np.arange(grid.n_cols) + 0.5) * grid.cell_x
        return np.broadcast_to((xc >= split_x).astype(int)[None, :], (grid.n_rows, grid.n_cols)).copy()

    return DensityUnits([2300.0, 2800.0], on(fine), on(regional))


def test_density_units_with_a_void_and_a_station_off_the_fine_dem():
    """Geology densities use the same fallback: a filled void and a regional-only station, both flagged."""
    from relief_gravity.algorithms.terrain._geology import DensityUnits, terrain_correction_by_units

    hole = (slice(50, 70), slice(62, 82))
    full, regional = _grids()
    holed, _ = _grids(hole)
    units = _units(full, regional)
    x, y = np.array([3000.0, 7000.0]), np.array([3000.0, 3000.0])
    h = _surface(x, y)
    model = TerrainModel(inner_radius=895.0, outer_radius=5000.0, curvature=False, density=2300.0)
    reference = terrain_correction_by_units(x[:1], y[:1], h[:1], full, regional, units, model).tc_total[0]
    silent = terrain_correction_by_units(x[:1], y[:1], h[:1], holed, regional, units, model).tc_total[0]
    got = terrain_correction_with_fallback(x, y, h, holed, regional, model, units=units)
    # The void lies in the 2800 unit: left out it costs > 0.02 mGal; filled, within 2 %.
    assert reference - silent > 0.02
    assert abs(got.tc_total[0] - reference) < 0.02 * reference
    assert "tc_regional_fill" in got.flags[0]
    # Off the fine DEM: the regional DEM alone with its own unit grid.
    alone = terrain_correction_by_units(x[1:], y[1:], h[1:], regional, None,
                                        DensityUnits(units.densities, units.regional), model)
    assert got.tc_total[1] == alone.tc_total[0]
    assert "tc_regional_only" in got.flags[1] and "outside_dem" not in got.flags[1]


def test_one_unit_everywhere_equals_the_constant_density_fallback():
    from relief_gravity.algorithms.terrain._geology import DensityUnits

    hole = (slice(50, 70), slice(62, 82))
    holed, regional = _grids(hole)
    units = DensityUnits([2500.0], np.zeros((holed.n_rows, holed.n_cols), dtype=int),
                         np.zeros((regional.n_rows, regional.n_cols), dtype=int))
    x, y = np.array([3000.0, 7000.0, 2000.0]), np.array([3000.0, 3000.0, 1500.0])
    h = _surface(x, y)
    model = TerrainModel(inner_radius=895.0, outer_radius=5000.0, curvature=False, density=2500.0)
    by_units = terrain_correction_with_fallback(x, y, h, holed, regional, model, units=units)
    constant = terrain_correction_with_fallback(x, y, h, holed, regional, model)
    np.testing.assert_allclose(by_units.tc_total, constant.tc_total, rtol=1e-9, atol=1e-12)
    assert by_units.flags == constant.flags
