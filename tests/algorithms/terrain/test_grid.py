# SPDX-License-Identifier: GPL-2.0-or-later
"""ElevationGrid windows and block statistics."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.terrain import ElevationGrid
from relief_gravity.algorithms.terrain._levels import block_statistics


def test_window_clipping_and_nodata():
    g = ElevationGrid.from_array([[1, 2], [3, -9999]], 100, 200, 10, 10, nodata=-9999)
    w = g.read_window(-1, -1, 3, 4)
    assert w.shape == (3, 4)
    assert np.isnan(w[0]).all() and np.isnan(w[:, 0]).all() and np.isnan(w[:, 3]).all()
    np.testing.assert_array_equal(w[1, 1:3], [1, 2])
    assert w[2, 1] == 3 and np.isnan(w[2, 2])
    assert g.x_end == 120 and g.y_end == 180
    assert np.isnan(g.read_window(5, 5, 2, 2)).all()


def test_reader_is_asked_only_inside():
    calls = []
    data = np.arange(20.0).reshape(4, 5)

    def reader(r, c, nr, nc):
        calls.append((r, c, nr, nc))
        return data[r : r + nr, c : c + nc]

    g = ElevationGrid(0.0, 4.0, 1.0, 1.0, 4, 5, reader)
    g.read_window(-2, 3, 4, 6)
    assert calls == [(0, 3, 2, 2)]


@pytest.mark.parametrize("bad", [dict(cell_x=0.0), dict(cell_y=-1.0)])
def test_invalid_cells(bad):
    args = dict(x_origin=0.0, y_origin=0.0, cell_x=1.0, cell_y=1.0, n_rows=1, n_cols=1, reader=lambda *a: np.zeros((1, 1)))
    args.update(bad)
    with pytest.raises(ValueError, match="cell sizes must be > 0"):
        ElevationGrid(**args)


def test_block_statistics_exact_moments_and_exclusion():
    rng = np.random.default_rng(0)
    z = rng.normal(500, 100, (16, 16))
    z[3, 5] = np.nan
    g = ElevationGrid.from_array(z, 0.0, 16.0, 1.0, 1.0)
    lvl = block_statistics(g, 0, 0, 4, 4, 4)
    block = z[0:4, 4:8]
    ok = np.isfinite(block)
    assert lvl.weight[0, 1] == pytest.approx(15 / 16)
    assert lvl.mean[0, 1] == pytest.approx(block[ok].mean())
    assert lvl.variance[0, 1] == pytest.approx(block[ok].var())
    # Windows beyond the raster give empty blocks, not errors.
    outside = block_statistics(g, -2, -2, 3, 3, 4)
    assert outside.weight[0, 0] == 0 and outside.weight[2, 2] == 1.0
    # Excluding the west half of column block 0 leaves half its area, with the
    # centroid moved east by a quarter block (one cell).
    half = block_statistics(g, 0, 0, 1, 1, 4, exclude=(-1.0, 2.0, -1.0, 17.0))
    assert half.weight[0, 0] == pytest.approx(0.5)
    assert half.col_offset[0, 0] == pytest.approx(1.0)
