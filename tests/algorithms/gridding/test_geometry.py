# SPDX-License-Identifier: GPL-2.0-or-later
"""Grid geometry, default extent and cell size, blanking."""

from __future__ import annotations

import re

import numpy as np
import numpy.testing as npt
import pytest

from relief_gravity.algorithms.gridding import (
    DEFAULT_MARGIN_FRACTION,
    GridGeometry,
    blank_far_cells,
    default_cell_size,
    default_grid_geometry,
)


def test_geometry_centres_and_geotransform():
    # GDAL's geotransform convention (x = gt0 + col*gt1, y = gt3 + row*gt5 at
    # cell corners; GDAL data model docs, from memory).
    g = GridGeometry(west=1000.0, north=5000.0, cell_size=250.0, n_cols=8, n_rows=5)
    assert g.east == 3000.0
    assert g.south == 3750.0
    assert g.shape == (5, 8)
    gt = g.geotransform
    cols = np.arange(8) + 0.5
    rows = np.arange(5) + 0.5
    npt.assert_allclose(g.x_centres, gt[0] + cols * gt[1])
    npt.assert_allclose(g.y_centres, gt[3] + rows * gt[5])
    assert np.all(np.diff(g.y_centres) < 0)  # north to south


@pytest.mark.parametrize(
    ("kwargs", "match"),
    [
        ({"cell_size": 0.0}, "Invalid cell_size 0.0"),
        ({"cell_size": float("nan")}, "Invalid cell_size nan"),
        ({"n_cols": 0}, "at least one row and column"),
    ],
    ids=["zero-cell", "nan-cell", "no-columns"],
)
def test_geometry_rejects_bad_values(kwargs, match):
    args = {"west": 0.0, "north": 0.0, "cell_size": 1.0, "n_cols": 3, "n_rows": 3, **kwargs}
    with pytest.raises(ValueError, match=re.escape(match)):
        GridGeometry(**args)


def test_default_cell_size_regular_lattice():
    # 100 m lattice: nearest neighbour 100 m, half of it is 50 m (rule stated
    # in default_cell_size; common practice, no source).
    xs, ys = np.meshgrid(np.arange(20) * 100.0, np.arange(15) * 100.0)
    assert default_cell_size(xs.ravel(), ys.ravel()) == 50.0


def test_default_cell_size_random_matches_brute_force():
    rng = np.random.default_rng(3)
    x = rng.uniform(0, 30_000, 400)
    y = rng.uniform(0, 20_000, 400)
    d = np.hypot(x[:, None] - x[None, :], y[:, None] - y[None, :])
    np.fill_diagonal(d, np.inf)
    half = np.median(d.min(axis=1)) / 2
    cell = default_cell_size(x, y)
    assert cell <= half
    # Nice numbers 1, 2, 2.5, 5 x 10^k are at most a factor 2 apart.
    assert cell > half / 2
    mantissa = cell / 10 ** np.floor(np.log10(cell))
    assert any(np.isclose(mantissa, m) for m in (1.0, 2.0, 2.5, 5.0))


def test_default_cell_size_ignores_duplicates_and_nan():
    xs, ys = np.meshgrid(np.arange(10) * 10.0, np.arange(10) * 10.0)
    x = np.concatenate([xs.ravel(), xs.ravel(), [np.nan]])
    y = np.concatenate([ys.ravel(), ys.ravel(), [3.0]])
    assert default_cell_size(x, y) == 5.0


def test_default_grid_geometry_margin_and_snapping():
    x = np.array([1234.0, 9876.0, 5000.0])
    y = np.array([20_100.0, 25_500.0, 22_000.0])
    g = default_grid_geometry(x, y, cell_size=100.0)
    margin = DEFAULT_MARGIN_FRACTION * max(9876.0 - 1234.0, 25_500.0 - 20_100.0)
    assert g.west <= x.min() - margin < g.west + 100.0
    assert g.east - 100.0 < x.max() + margin <= g.east
    assert g.south <= y.min() - margin < g.south + 100.0
    assert g.north - 100.0 < y.max() + margin <= g.north
    for edge in (g.west, g.north):
        assert edge % 100.0 == 0.0


def test_default_grid_geometry_explicit_extent_and_default_cell():
    xs, ys = np.meshgrid(np.arange(0.0, 1000.0, 100.0), np.arange(0.0, 600.0, 100.0))
    g = default_grid_geometry(xs.ravel(), ys.ravel(), extent=(0.0, 1000.0, -50.0, 600.0))
    assert g.cell_size == 50.0
    assert (g.west, g.east, g.south, g.north) == (0.0, 1000.0, -50.0, 600.0)
    assert (g.n_cols, g.n_rows) == (20, 13)


def test_default_grid_geometry_bad_extent():
    with pytest.raises(ValueError, match="east > west"):
        default_grid_geometry([0, 1, 2], [0, 1, 0], cell_size=1.0, extent=(5.0, 1.0, 0.0, 1.0))


def test_blank_far_cells_matches_brute_force():
    rng = np.random.default_rng(11)
    x = rng.uniform(0, 5000, 40)
    y = rng.uniform(0, 4000, 40)
    g = GridGeometry(0.0, 4000.0, 100.0, 50, 40)
    mask = blank_far_cells(g, x, y, 600.0)
    xx, yy = np.meshgrid(g.x_centres, g.y_centres)
    d = np.hypot(xx[..., None] - x, yy[..., None] - y).min(axis=-1)
    npt.assert_array_equal(mask, d > 600.0)
    assert mask.any() and (~mask).any()


def test_blank_far_cells_keeps_each_station_cell():
    # A cell centre is at most half a diagonal (70.7 m for 100 m cells) from
    # any point of the cell, so a 75 m distance keeps every station's cell
    # and blanks a cell with no station within 75 m.
    x = np.array([50.0, 999.0, 420.0])
    y = np.array([50.0, 999.0, 580.0])
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    mask = blank_far_cells(g, x, y, 75.0)
    for xs, ys in zip(x, y, strict=True):
        j = min(int((xs - g.west) // g.cell_size), g.n_cols - 1)
        i = min(int((g.north - ys) // g.cell_size), g.n_rows - 1)
        assert not mask[i, j]
    assert mask.sum() == 100 - 3


def test_blank_far_cells_bad_distance():
    g = GridGeometry(0.0, 10.0, 1.0, 10, 10)
    with pytest.raises(ValueError, match=re.escape("Invalid blanking distance -1.0")):
        blank_far_cells(g, [1.0], [1.0], -1.0)
