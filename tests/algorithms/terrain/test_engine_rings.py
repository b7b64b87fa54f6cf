# SPDX-License-Identifier: GPL-2.0-or-later
"""The rectangle path of the evaluation (_rings) against the masked path (_evaluate).

Both compute the same sums over the same blocks; they may differ only by the
order of single-precision additions. Cases: non-square cells, NoData holes,
raster edges inside the windows, water, a regional raster around a fine one,
stations at the outer rim, per-station results independent of the batch.
"""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.terrain import ElevationGrid, _engine, _rings, terrain_correction

FIELDS = ("tc_inner", "tc_outer", "tc_total", "coverage", "coverage_inner", "truncation")


def landscape(n_rows, n_cols, cell_x, cell_y, west, north, seed, holes=True):
    rng = np.random.default_rng(seed)
    r, c = np.mgrid[0:n_rows, 0:n_cols]
    z = 300 + 250 * np.sin(c / 37.0) * np.cos(r / 53.0) + rng.normal(0, 8, (n_rows, n_cols))
    z[r + c < 40] = -60.0  # a wet corner (below sea level)
    if holes:
        z[60:75, 90:130] = np.nan
        z[150:152, 10:200] = np.nan
    return ElevationGrid.from_array(z, west, north, cell_x, cell_y)


def both_paths(monkeypatch, *args, **kw):
    new = terrain_correction(*args, **kw)
    with monkeypatch.context() as m:
        m.setattr(_engine, "evaluate_rings", lambda *a: None)
        old = terrain_correction(*args, **kw)
    return new, old


def assert_same(new, old):
    for name in FIELDS:
        a, b = getattr(new, name), getattr(old, name)
        scale = max(float(np.nanmax(np.abs(b))), 1e-12)
        np.testing.assert_allclose(a, b, rtol=0, atol=2e-6 * scale, err_msg=name)
    assert new.flags == old.flags


@pytest.mark.parametrize("water", [None, 1030.0])
def test_rectangles_equal_masks_on_a_holed_raster_with_oblong_cells(monkeypatch, water):
    grid = landscape(260, 300, 25.0, 31.0, 1000.0, 9000.0, 3)
    rng = np.random.default_rng(4)
    x = rng.uniform(1000.0, 1000.0 + 300 * 25.0, 70)
    y = rng.uniform(9000.0 - 260 * 31.0, 9000.0, 70)
    h = rng.uniform(200.0, 600.0, 70)
    kw = dict(inner_radius=1200.0, outer_radius=6000.0, water_density=water)
    new, old = both_paths(monkeypatch, x, y, h, grid, **kw)
    assert np.nanmax(new.tc_total) > 0.5  # a case where the comparison means something
    assert_same(new, old)


def test_rectangles_equal_masks_with_a_regional_raster(monkeypatch):
    fine = landscape(200, 200, 30.0, 30.0, 20000.0, 26000.0, 5, holes=False)
    regional = landscape(120, 120, 400.0, 400.0, 0.0, 48000.0, 6)
    rng = np.random.default_rng(7)
    x = rng.uniform(21000.0, 25000.0, 40)
    y = rng.uniform(21000.0, 25000.0, 40)
    h = rng.uniform(200.0, 500.0, 40)
    kw = dict(inner_radius=2000.0, outer_radius=30000.0)
    new, old = both_paths(monkeypatch, x, y, h, fine, regional, **kw)
    assert_same(new, old)
    # Forcing the rectangles on the sparse first regional level gives the same.
    monkeypatch.setattr(_rings, "MIN_DATA_SHARE", 0.0)
    forced = terrain_correction(x, y, h, fine, regional, **kw)
    assert_same(forced, old)


@pytest.mark.parametrize("with_regional", [False, True])
def test_a_station_does_not_depend_on_its_batch_to_the_last_bit(with_regional):
    # The batch runner cuts a run into chunks and expects the same numbers:
    # margins, path choices and sums must not depend on the other stations.
    grid = landscape(260, 300, 25.0, 31.0, 1000.0, 9000.0, 8)
    regional = landscape(120, 120, 400.0, 400.0, -15000.0, 30000.0, 6) if with_regional else None
    rng = np.random.default_rng(9)
    x = rng.uniform(1500.0, 8000.0, 60)
    y = rng.uniform(1500.0, 8500.0, 60)
    h = rng.uniform(200.0, 600.0, 60)
    kw = dict(inner_radius=1000.0, outer_radius=9000.0, water_density=1030.0)
    together = terrain_correction(x, y, h, grid, regional, **kw)
    for lo in range(0, 60, 7):
        part = terrain_correction(x[lo : lo + 7], y[lo : lo + 7], h[lo : lo + 7], grid, regional, **kw)
        for name in FIELDS:
            np.testing.assert_array_equal(getattr(part, name), getattr(together, name)[lo : lo + 7], err_msg=name)


def regional_case():
    fine = landscape(200, 200, 30.0, 30.0, 20000.0, 26000.0, 5, holes=False)
    regional = landscape(120, 120, 400.0, 400.0, 0.0, 48000.0, 6)
    rng = np.random.default_rng(11)
    n = 300
    return fine, regional, rng.uniform(21000.0, 25000.0, n), rng.uniform(21000.0, 25000.0, n), np.full(n, 400.0)


def test_regional_levels_overlapping_the_fine_set_up_keep_results_progress_and_cancel(monkeypatch):
    import itertools
    import threading
    import time

    from relief_gravity.algorithms.terrain import TerrainCancelled

    fine, regional, x, y, h = regional_case()
    kw = dict(inner_radius=2000.0, outer_radius=30000.0)
    seen = []
    two = terrain_correction(x, y, h, fine, regional, workers=2, progress=seen.append, **kw)
    one = terrain_correction(x, y, h, fine, regional, workers=1, **kw)
    np.testing.assert_array_equal(two.tc_total, one.tc_total)
    assert seen[-1] == 1.0 and all(a <= b for a, b in itertools.pairwise(seen))
    # Cancelled while the fine levels are built (the regional batches queued or running).
    before = threading.active_count()
    calls = []
    fine_starts = []
    original = _engine.plan_grid

    def plan(grid, *args, **kwargs):
        if grid is fine:
            fine_starts.append(len(calls))
        return original(grid, *args, **kwargs)

    monkeypatch.setattr(_engine, "plan_grid", plan)

    def cancel():
        calls.append(time.monotonic())
        return bool(fine_starts) and len(calls) > fine_starts[0]

    with pytest.raises(TerrainCancelled):
        terrain_correction(x, y, h, fine, regional, workers=2, is_cancelled=cancel, **kw)
    assert fine_starts and len(calls) == fine_starts[0] + 1  # raised by the first check inside the fine set-up
    assert time.monotonic() - calls[-1] < 1.0
    assert threading.active_count() == before
