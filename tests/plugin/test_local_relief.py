# SPDX-License-Identifier: GPL-2.0-or-later
"""plugin.heights.local_relief: one window read for all stations equals a 3 x 3 read per station."""

from __future__ import annotations

import numpy as np
import pytest


def _per_station(raster, x, y):
    """The reference: each station reads its own 3 x 3 cells."""
    out = np.full(len(x), np.nan)
    for i, (xi, yi) in enumerate(zip(x, y, strict=True)):
        if not (np.isfinite(xi) and np.isfinite(yi)):
            continue
        col = int(np.floor((xi - raster.x_origin) / raster.cell_x))
        row = int(np.floor((raster.y_origin - yi) / raster.cell_y))
        cells = raster.read_window(row - 1, col - 1, 3, 3)
        if np.isfinite(cells).any():
            out[i] = np.nanmax(cells) - np.nanmin(cells)
    return out


@pytest.mark.parametrize("window_cells", [4_000_000, 1])
def test_local_relief_equals_the_per_station_reads(tmp_path, dem_writer, monkeypatch, window_cells):
    from relief_gravity.plugin import heights
    from relief_gravity.plugin.raster_io import ElevationRaster

    rng = np.random.default_rng(4)
    z = rng.uniform(100.0, 900.0, (60, 80))
    z[20:30, 40:55] = -9999.0  # a void
    path = tmp_path / "dem.tif"
    dem_writer(path, z, 500_000.0, 5_003_000.0, 50.0, nodata=-9999.0)
    raster = ElevationRaster(str(path))
    x = np.concatenate([rng.uniform(499_900.0, 504_100.0, 300), [np.nan, 500_000.0, 503_999.0, 510_000.0, 502_400.0]])
    y = np.concatenate([rng.uniform(4_999_900.0, 5_003_100.0, 300), [5_001_000.0, np.nan, 5_000_001.0, 5_001_000.0,
                                                                     5_001_750.0]])
    monkeypatch.setattr(heights, "RELIEF_WINDOW_CELLS", window_cells)
    got = heights.local_relief(raster, x, y)
    expected = _per_station(raster, x, y)
    np.testing.assert_array_equal(np.isnan(got), np.isnan(expected))
    np.testing.assert_allclose(got[np.isfinite(got)], expected[np.isfinite(expected)], rtol=0, atol=0)
    assert np.isnan(got[300]) and np.isnan(got[301]) and np.isnan(got[303])  # NaN coordinates, far outside
    assert np.isfinite(got).sum() > 250
    assert np.all(np.isnan(heights.local_relief(raster, [np.nan], [np.nan])))
