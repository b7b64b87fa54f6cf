# SPDX-License-Identifier: GPL-2.0-or-later
"""The near-terrain spreads' cell kernel: exact prisms near the station, columns beyond, against prisms everywhere."""

import numpy as np

from relief_gravity.algorithms.uncertainty._near_terrain import _cell_tc, _cells_tc


def test_columns_beyond_five_sides_match_exact_prisms():
    rng = np.random.default_rng(3)
    side = 30.0
    cx = rng.uniform(-900.0, 900.0, 4000)
    cy = rng.uniform(-900.0, 900.0, 4000)
    relief = rng.uniform(-300.0, 300.0, 4000)
    relief[:50] = 0.0  # cells at the station's level: both give 0
    shifts = np.array([0.0, -2.5, 4.0])[:, None]
    args = (cx - side / 2, cx + side / 2, cy - side / 2, cy + side / 2)
    mixed = _cells_tc(*args, relief[None, :] + shifts, 2670.0)
    exact = _cell_tc(*args, relief[None, :] + shifts, 2670.0)
    far = np.hypot(cx, cy) >= 5 * side
    near = ~far
    # Near cells are the same exact prisms; beyond five sides the column with
    # its size term stays within 3e-4 relative (docs/terrain.md section 5).
    np.testing.assert_array_equal(mixed[:, near], exact[:, near])
    big = exact[:, far] > 1e-9
    rel = np.abs(mixed[:, far][big] - exact[:, far][big]) / exact[:, far][big]
    assert rel.max() < 3e-4, rel.max()
    assert np.all(mixed[:, far][~big] < 1e-8)
    # Sums over a whole ring of cells (what the spreads use): far closer still.
    assert abs(mixed.sum() - exact.sum()) < 1e-5 * exact.sum()
