# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain correction by density units (algorithms/terrain/_geology.py).

References: exact right-rectangular prisms (Nagy 1966, ``prism_gravity``)
summed cell by cell with each cell's own density, and the constant-density
engine itself (the decomposition must reproduce it exactly). Flat Earth
(``curvature=False``) and an outer radius beyond the raster's corners, so that
every cell counts whole.
"""

from __future__ import annotations

import itertools
import math
from dataclasses import replace

import numpy as np
import pytest

from relief_gravity.algorithms import reduce_gravity
from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL
from relief_gravity.algorithms.terrain import (
    ElevationGrid,
    TerrainCancelled,
    TerrainModel,
    prism_gravity,
    terrain_correction,
)
from relief_gravity.algorithms.terrain._geology import (
    DensityUnits,
    density_table_to_kg_m3,
    terrain_correction_by_units,
    unit_table,
)
from relief_gravity.algorithms.terrain._innermost import plane_terrain_effect

CELL = 10.0
HALF = 1000.0  # raster from -HALF to +HALF in x and y
N = int(2 * HALF / CELL)
CENTRES = -HALF + (np.arange(N) + 0.5) * CELL
X, Y = np.meshgrid(CENTRES, CENTRES[::-1])  # row 0 is the northern row
FLAT = TerrainModel(inner_radius=300.0, outer_radius=1500.0, curvature=False)  # 1500 > HALF * sqrt(2)


def grid_of(heights):
    return ElevationGrid.from_array(heights, -HALF, HALF, CELL, CELL)


def exact_cells(heights, density, x0, y0, h0):
    """Sum over cells of rho_c * |attraction| of the mass between the cell top and the station height."""
    lo = np.minimum(heights, h0)
    hi = np.maximum(heights, h0)
    keep = hi > lo
    g = prism_gravity(x0, y0, h0, X[keep] - CELL / 2, X[keep] + CELL / 2, Y[keep] - CELL / 2, Y[keep] + CELL / 2,
                      lo[keep], hi[keep], np.broadcast_to(density, X.shape)[keep])
    return float(np.sum(-np.sign(heights[keep] - h0) * g))


def smooth_relief():
    return 400.0 + 60.0 * np.sin(X / 310.0) * np.cos(Y / 270.0) + 0.04 * X


def test_two_flat_topped_blocks_against_analytic_prisms():
    # Station on block A (flat top at 50 m, 2000 kg/m3); block B (top 150 m,
    # 3000 kg/m3) beside it; plain at 0 m (default 2670 kg/m3) elsewhere.
    # Every cell is flat-topped, so the cell sum is a handful of exact prisms:
    # the plain's missing mass 0-50 m over the raster less A and B, and B's
    # excess 50-150 m above the station.
    a = (-150.0, 150.0, -100.0, 100.0)
    b = (160.0, 400.0, -300.0, 200.0)
    in_a = (a[0] < X) & (a[1] > X) & (a[2] < Y) & (a[3] > Y)
    in_b = (b[0] < X) & (b[1] > X) & (b[2] < Y) & (b[3] > Y)
    heights = np.where(in_a, 50.0, np.where(in_b, 150.0, 0.0))
    units = DensityUnits([2670.0, 2000.0, 3000.0], np.where(in_a, 1, np.where(in_b, 2, 0)))
    r = terrain_correction_by_units([0.0], [0.0], [50.0], grid_of(heights), None, units, FLAT)

    def g(box, bottom, top, rho):
        return float(prism_gravity(0.0, 0.0, 50.0, box[0], box[1], box[2], box[3], bottom, top, rho))

    whole = (-HALF, HALF, -HALF, HALF)
    plain = g(whole, 0.0, 50.0, 2670.0) - g(a, 0.0, 50.0, 2670.0) - g(b, 0.0, 50.0, 2670.0)
    expected = plain - g(b, 50.0, 150.0, 3000.0)
    assert expected == pytest.approx(exact_cells(heights, units.densities[units.fine], 0.0, 0.0, 50.0), rel=1e-9)
    # Measured: 1.1e-6 mGal off 1.264 mGal (the column terms of the far
    # cells; the tolerance is that of the constant-density mesa checks).
    assert r.tc_total[0] == pytest.approx(expected, abs=2e-5)
    # The same blocks at one density differ by 0.05 mGal: the check sees the densities.
    assert abs(expected - exact_cells(heights, 2670.0, 0.0, 0.0, 50.0)) > 0.05
    # The disc of 1500 m overhangs the raster (so that every cell counts whole).
    assert r.flags[0] == ["tc_partial"]
    # The slab and curvature use the station's unit (A): slab = 2 pi G rho h.
    rho = units.station_density(grid_of(heights), [0.0], [0.0])
    assert rho.tolist() == [2000.0]
    red = reduce_gravity([980000.0], [45.0], [50.0], density=rho, terrain_correction=r.tc_total)
    assert red["slab_corr"][0] == pytest.approx(2 * math.pi * GRAVITATIONAL_CONSTANT * 2000.0 * 50.0 * SI_TO_MGAL, rel=1e-12)


@pytest.mark.parametrize("regional", [False, True])
@pytest.mark.parametrize("water", [None, 1030.0])
def test_one_unit_over_everything_equals_constant_density_run(regional, water):
    heights = smooth_relief() - (450.0 if water else 0.0)
    fine = grid_of(heights[60:140, 60:140].copy()) if regional else grid_of(heights)
    if regional:
        fine = ElevationGrid.from_array(heights[60:140, 60:140], -400.0, 400.0, CELL, CELL)
        reg = ElevationGrid.from_array(heights[::4, ::4], -HALF, HALF, 4 * CELL, 4 * CELL)
    else:
        reg = None
    units = DensityUnits([2450.0], np.zeros((fine.n_rows, fine.n_cols), dtype=int),
                         np.zeros((reg.n_rows, reg.n_cols), dtype=int) if reg is not None else None)
    xs, ys = np.array([0.0, 123.0, -251.0, 5000.0]), np.array([0.0, -77.0, 180.0, 0.0])
    hs = np.array([heights[100, 100], 420.0, np.nan, 400.0])
    model = replace(FLAT, water_density=water, curvature=True)
    geo = terrain_correction_by_units(xs, ys, hs, fine, reg, units, model)
    ref = terrain_correction(xs, ys, hs, fine, reg, replace(model, density=2450.0))
    for name in ("tc_inner", "tc_outer", "tc_total", "dem_height", "coverage", "truncation"):
        np.testing.assert_allclose(getattr(geo, name), getattr(ref, name), rtol=0, atol=1e-12, err_msg=name)
    assert geo.flags == ref.flags
    assert np.isfinite(geo.tc_total[:2]).all() and np.isnan(geo.tc_total[2:]).all()
    assert abs(ref.tc_total[0]) > 0.05


def test_field_innermost_values_pass_through_unchanged():
    heights = smooth_relief()
    units = DensityUnits([2300.0], np.zeros(heights.shape, dtype=int))
    model = replace(FLAT, innermost_tc=[0.25, np.nan])
    xs, ys, hs = [0.0, 100.0], [0.0, 50.0], [heights[100, 100], 470.0]
    geo = terrain_correction_by_units(xs, ys, hs, grid_of(heights), None, units, model)
    ref = terrain_correction(xs, ys, hs, grid_of(heights), None, replace(model, density=2300.0))
    np.testing.assert_allclose(geo.tc_total, ref.tc_total, rtol=0, atol=1e-12)


def split_case(boundary_x):
    """Smooth relief; unit 1 (2200) east of ``boundary_x``, default 2670 west of it."""
    heights = smooth_relief()
    east = boundary_x < X
    return heights, DensityUnits([2670.0, 2200.0], east.astype(int)), np.where(east, 2200.0, 2670.0)


@pytest.mark.parametrize("boundary_x", [300.0, 613.0])
def test_boundary_through_coarse_blocks_against_exact_cells(boundary_x):
    # The contact at column 130 (x = 300 m) or 161 (x = 613 m) cuts blocks of
    # 4 and of 2 to 8 cells (the station at the origin sees full resolution
    # only within 26 cells = 260 m). Each unit's part of a split block is a
    # column at its own mean height and centroid. Measured: 1.2e-3 of the
    # contrast at 613 m, 1e-7 at 300 m.
    heights, units, rho = split_case(boundary_x)
    h0 = float(heights[100, 100])
    grid = grid_of(heights)
    geo = terrain_correction_by_units([0.0], [0.0], [h0], grid, None, units, FLAT)
    const = terrain_correction([0.0], [0.0], [h0], grid, None, replace(FLAT, density=2670.0))
    # The station's cells are in the default unit: the difference is the
    # density contrast of the eastern cells, exact cell by cell.
    contrast = exact_cells(heights, rho - 2670.0, 0.0, 0.0, h0)
    assert abs(contrast) > 0.003
    assert geo.tc_total[0] - const.tc_total[0] == pytest.approx(contrast, rel=2e-3)
    assert geo.coverage[0] == const.coverage[0] and geo.flags == const.flags == [["tc_partial"]]


def test_station_on_a_unit_boundary():
    # The contact runs along a cell edge through the station; the ground is
    # flat at the station height within 40 m, so the innermost square and
    # the four station cells hold no relief and every cell's share is exact.
    heights, units, rho = split_case(0.0)
    near = np.hypot(X, Y) < 40.0
    heights = np.where(near, 500.0, heights)
    grid = grid_of(heights)
    geo = terrain_correction_by_units([0.0], [3.0], [500.0], grid, None, units, FLAT)
    const = terrain_correction([0.0], [3.0], [500.0], grid, None, replace(FLAT, density=2670.0))
    contrast = exact_cells(heights, rho - 2670.0, 0.0, 3.0, 500.0)
    assert geo.tc_total[0] - const.tc_total[0] == pytest.approx(contrast, rel=2e-3)
    assert geo.flags == const.flags == [["tc_partial"]] and geo.coverage[0] == const.coverage[0]


def test_station_square_counts_once_at_the_station_density():
    # A uniform 8 % slope; the contact through the station. The square
    # (one cell centred on the station) is the only part that depends on
    # the station's density.
    heights = 300.0 + 0.08 * X
    units = DensityUnits([2670.0, 2200.0], (X > 0).astype(int))
    grid = grid_of(heights)
    args = ([0.0], [5.0], [300.0], grid, None, units, FLAT)
    east = terrain_correction_by_units(*args, station_density=[2200.0])
    west = terrain_correction_by_units(*args, station_density=[2670.0])
    default = terrain_correction_by_units(*args)  # the station's cell (x = 0 lies in the eastern cell)
    square = plane_terrain_effect(5.0, 5.0, 10.0, 10.0, 0.08, 0.0, 1.0)
    assert square > 0
    assert west.tc_inner[0] - east.tc_inner[0] == pytest.approx(470.0 * square, rel=1e-9)
    assert west.tc_outer[0] == east.tc_outer[0]
    assert default.tc_total[0] == east.tc_total[0]
    # Between the two constant-density runs.
    lo, hi = (terrain_correction(*args[:5], replace(FLAT, density=d)).tc_total[0] for d in (2200.0, 2670.0))
    assert lo < east.tc_total[0] < west.tc_total[0] < hi


def test_unit_only_on_the_regional_grid_and_no_dem_at_station():
    heights = smooth_relief()
    fine_h = heights[60:140, 60:140].copy()
    fine_h[38:42, 38:42] = np.nan  # NoData around the station at (-5, 5)
    fine = ElevationGrid.from_array(fine_h, -400.0, 400.0, CELL, CELL)
    reg = ElevationGrid.from_array(heights[::4, ::4], -HALF, HALF, 4 * CELL, 4 * CELL)
    reg_units = (np.abs(X[::4, ::4]) > 600).astype(int)
    units = DensityUnits([2670.0, 2900.0], np.zeros(fine_h.shape, dtype=int), reg_units)
    xs, ys, hs = [-5.0, 200.0], [5.0, 100.0], [400.0, 420.0]
    geo = terrain_correction_by_units(xs, ys, hs, fine, reg, units, FLAT)
    ref = terrain_correction(xs, ys, hs, fine, reg, replace(FLAT, density=2670.0))
    assert geo.flags == ref.flags and "no_dem_at_station" in geo.flags[0]
    # Only the far regional cells differ, by (2900 - 2670) times their share: positive relief there.
    assert np.all(geo.tc_total != ref.tc_total)
    assert np.all(np.isfinite(geo.tc_total))


def test_progress_and_cancel():
    heights, units, _ = split_case(200.0)
    seen = []
    terrain_correction_by_units([0.0], [0.0], [450.0], grid_of(heights), None, units, FLAT, progress=seen.append)
    assert seen[-1] == 1.0 and all(0.0 <= a <= b <= 1.0 for a, b in itertools.pairwise(seen))
    with pytest.raises(TerrainCancelled):
        terrain_correction_by_units([0.0], [0.0], [450.0], grid_of(heights), None, units, FLAT, is_cancelled=lambda: True)


def test_bad_inputs_give_sentences():
    heights = np.zeros((4, 4))
    grid = ElevationGrid.from_array(heights, 0, 40, 10, 10)
    ok = DensityUnits([2670.0], np.zeros((4, 4), dtype=int))
    with pytest.raises(ValueError, match="must be one value"):
        terrain_correction_by_units([5.0], [5.0], [0.0], grid, None, ok, TerrainModel(density=[2600.0]))
    with pytest.raises(ValueError, match="fine unit grid has shape"):
        terrain_correction_by_units([5.0], [5.0], [0.0], grid, None, DensityUnits([2670.0], np.zeros((3, 4), dtype=int)))
    with pytest.raises(ValueError, match="needs a regional unit grid"):
        terrain_correction_by_units([5.0], [5.0], [0.0], grid, grid, ok)
    with pytest.raises(ValueError, match="same length"):
        terrain_correction_by_units([5.0, 6.0], [5.0], [0.0], grid, None, ok)
    with pytest.raises(ValueError, match="one value per station"):
        terrain_correction_by_units([5.0], [5.0], [0.0], grid, None, ok, station_density=[1.0, 2.0])
    with pytest.raises(ValueError, match="> 0"):
        terrain_correction_by_units([5.0], [5.0], [0.0], grid, None, ok, station_density=[-2670.0])
    with pytest.raises(ValueError, match="finite number > 0"):
        DensityUnits([2670.0, 0.0], np.zeros((4, 4), dtype=int))
    with pytest.raises(ValueError, match="integer"):
        DensityUnits([2670.0], np.zeros((4, 4)))
    with pytest.raises(ValueError, match="unit index -1"):
        DensityUnits([2670.0], -np.ones((4, 4), dtype=int))
    with pytest.raises(ValueError, match="2-D"):
        DensityUnits([2670.0], np.zeros(4, dtype=int))


@pytest.mark.parametrize(
    ("values", "expected", "unit"),
    [([2.67, 2.2], [2670.0, 2200.0], "g/cm3"), ([2670, 1900], [2670.0, 1900.0], "kg/m3"), ([0.5, 5.0], [500.0, 5000.0], "g/cm3")],
)
def test_density_table_units(values, expected, unit):
    v, u = density_table_to_kg_m3(values)
    assert v.tolist() == expected and u == unit


@pytest.mark.parametrize(
    ("values", "message"),
    [([2670.0, 26.7], "26.7 is not in 500-5000 kg/m"), ([2.67, 26.7], "26.7 is not in 0.5-5 g/cm"),
     ([26.7], "neither"), ([np.nan], "no polygon"), ([2670000.0], "neither")],
)
def test_density_table_refuses(values, message):
    with pytest.raises(ValueError, match=message):
        density_table_to_kg_m3(values)


def test_unit_table_default_first():
    d, u = unit_table([2900.0, 2670.0, np.nan, 2900.0, 2100.0], 2670.0)
    assert d.tolist() == [2670.0, 2900.0, 2100.0] and u.tolist() == [1, 0, 0, 1, 2]
    with pytest.raises(ValueError, match="default density"):
        unit_table([2900.0], 0.0)


def test_unit_grid_index_beyond_a_byte_is_refused_not_wrapped():
    with pytest.raises(ValueError, match="unit index 256"):
        DensityUnits([2670.0, 2200.0], np.array([[0, 256]]))
    assert DensityUnits([2670.0, 2200.0], np.array([[0, 1]])).fine.dtype == np.uint8
