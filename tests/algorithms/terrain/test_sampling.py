# SPDX-License-Identifier: GPL-2.0-or-later
"""The one bilinear sampler and its NoData/edge rule (algorithms/terrain/_sampling.py)."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.terrain import ElevationGrid, sample_bilinear, station_cells, terrain_correction

#  Cell centres at x = 5, 15, 25 and y = 25, 15, 5 (row 0 is north).
Z = np.array([[0.0, 10.0, 20.0], [30.0, 40.0, 50.0], [60.0, 70.0, 80.0]])


def grid(z=Z):
    return ElevationGrid.from_array(z, 0.0, 30.0, 10.0, 10.0)


def test_complete_stencil_is_plain_bilinear():
    # (10, 20): halfway between the centres of columns 0, 1 and rows 0, 1.
    assert sample_bilinear(grid(), [10.0], [20.0])[0] == pytest.approx(20.0)
    # (12.5, 22.5): fractions 0.25 south and 0.75 east of cell (0, 0)'s centre.
    expected = 0.75 * 0.25 * 0.0 + 0.75 * 0.75 * 10.0 + 0.25 * 0.25 * 30.0 + 0.25 * 0.75 * 40.0
    assert sample_bilinear(grid(), [12.5], [22.5])[0] == pytest.approx(expected, abs=1e-12)


def test_cell_centres_return_the_cell_values():
    xs, ys = np.meshgrid([5.0, 15.0, 25.0], [25.0, 15.0, 5.0])
    np.testing.assert_array_equal(sample_bilinear(grid(), xs, ys), Z)


def test_outer_half_cell_takes_the_edge_values():
    # West edge, row 1 centre: only column 0 has weight inside the raster.
    assert sample_bilinear(grid(), [0.0], [15.0])[0] == pytest.approx(30.0)
    # North-east corner of the raster: the corner cell's value.
    assert sample_bilinear(grid(), [30.0], [30.0])[0] == pytest.approx(20.0)


def test_outside_the_extent_is_nan():
    v = sample_bilinear(grid(), [-0.001, 30.001, 15.0, 15.0, np.nan], [15.0, 15.0, 30.001, -0.001, 15.0])
    assert np.all(np.isnan(v))


def test_a_missing_corner_is_left_out_and_the_rest_renormalised():
    z = Z.copy()
    z[1, 1] = np.nan
    # At (10, 20) the four corners weigh 1/4 each; without 40 the mean of 0, 10, 30.
    assert sample_bilinear(grid(z), [10.0], [20.0])[0] == pytest.approx((0 + 10 + 30) / 3)


def test_nan_only_where_every_weighted_corner_is_missing():
    z = np.full((3, 3), np.nan)
    z[0, 0] = 7.0
    g = grid(z)
    # At a NoData cell's centre only that cell has weight: no height.
    assert np.isnan(sample_bilinear(g, [15.0], [15.0])[0])
    # Between the data cell and the void, the data cell's value.
    assert sample_bilinear(g, [10.0], [20.0])[0] == pytest.approx(7.0)


def test_nodata_value_of_a_grid_counts_as_missing():
    z = Z.copy()
    z[0, 1] = -9999.0
    g = ElevationGrid.from_array(z, 0.0, 30.0, 10.0, 10.0, nodata=-9999.0)
    assert sample_bilinear(g, [10.0], [25.0])[0] == pytest.approx(0.0)


def test_station_cells_floor_rule():
    r, c = station_cells(grid(), np.array([0.0, 9.999, 10.0, 30.0]), np.array([30.0, 20.001, 20.0, 0.0]))
    assert r.tolist() == [0, 0, 1, 3] and c.tolist() == [0, 0, 1, 3]


def test_engine_dem_height_is_the_sampler():
    z = np.fromfunction(lambda i, j: 3.0 * i + 0.5 * j * j, (50, 50))
    z[20, 21] = np.nan
    g = ElevationGrid.from_array(z, 0.0, 1500.0, 30.0, 30.0)
    x = np.array([640.0, 652.0, 10.0, 1499.0])
    y = np.array([880.0, 875.0, 700.0, 1.0])
    r = terrain_correction(x, y, np.zeros(4), g, inner_radius=300.0, outer_radius=300.0)
    np.testing.assert_array_equal(r.dem_height, sample_bilinear(g, x, y))
