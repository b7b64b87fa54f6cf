# SPDX-License-Identifier: GPL-2.0-or-later
"""Minimum curvature with tension: exact cases, behaviour, validation."""

from __future__ import annotations

import re
import warnings

import numpy as np
import numpy.testing as npt
import pytest

from relief_gravity.algorithms.gridding import GridGeometry, minimum_curvature
from relief_gravity.algorithms.gridding._mincurv import assemble_system
from relief_gravity.algorithms.gridding._stations import average_per_cell

TENSIONS = (0.0, 0.25, 0.5, 1.0)


def _nodes(g: GridGeometry) -> tuple[np.ndarray, np.ndarray]:
    return np.meshgrid(g.x_centres, g.y_centres)


def _stations_with_corners(g: GridGeometry, n: int, seed: int) -> tuple[np.ndarray, np.ndarray]:
    """Random off-node stations plus one inside each corner and edge cell row."""
    rng = np.random.default_rng(seed)
    x = rng.uniform(g.west, g.east, n)
    y = rng.uniform(g.south, g.north, n)
    h = g.cell_size
    extra_x = [g.west + 0.2 * h, g.east - 0.1 * h, g.west + 0.4 * h, g.east - 0.45 * h, 0.5 * (g.west + g.east)]
    extra_y = [g.north - 0.3 * h, g.north - 0.05 * h, g.south + 0.1 * h, g.south + 0.35 * h, g.north - 0.2 * h]
    return np.concatenate([x, extra_x]), np.concatenate([y, extra_y])


def _plane(x, y):
    return 980_000.0 + 0.0123 * x - 0.0071 * y


@pytest.mark.parametrize("tension", TENSIONS, ids=[f"T={t}" for t in TENSIONS])
def test_plane_reproduced_exactly(tension):
    # REFERENCES.md §9 [C]: planes satisfy the PDE and (with T_b = 0) every
    # boundary condition, so they are reproduced exactly.
    g = GridGeometry(west=500_000.0, north=4_200_000.0, cell_size=250.0, n_cols=37, n_rows=29)
    x, y = _stations_with_corners(g, 25, seed=1)
    grid = minimum_curvature(x, y, _plane(x, y), g, tension=tension)
    xx, yy = _nodes(g)
    expected = _plane(xx, yy)
    npt.assert_allclose(grid, expected, rtol=1e-12, atol=1e-8 * np.ptp(expected))


@pytest.mark.parametrize("tension", TENSIONS, ids=[f"T={t}" for t in TENSIONS])
def test_discrete_operator_annihilates_planes(tension):
    # The assembled system itself (not the detrending shortcut) must be
    # solved by a plane: every PDE row, including edge and corner rows, gives
    # 0 and every data row gives the datum (REFERENCES.md §9 [C]).
    g = GridGeometry(0.0, 30.0, 1.0, 23, 30)
    x, y = _stations_with_corners(g, 15, seed=2)
    cells = average_per_cell(x, y, _plane(x, y), g)
    a, rhs = assemble_system(cells, g.n_rows, g.n_cols, tension, cell_per_length=0.7)
    xx, yy = _nodes(g)
    residual = a @ _plane(xx, yy).ravel() - rhs
    assert np.abs(residual).max() < 1e-9 * np.abs(rhs).max()


@pytest.mark.parametrize("tension", TENSIONS, ids=[f"T={t}" for t in TENSIONS])
def test_plane_multigrid_path(tension):
    g = GridGeometry(0.0, 6000.0, 50.0, 130, 120)
    x, y = _stations_with_corners(g, 200, seed=3)
    grid = minimum_curvature(x, y, _plane(x, y), g, tension=tension, solver="multigrid")
    xx, yy = _nodes(g)
    npt.assert_allclose(grid, _plane(xx, yy), rtol=1e-12, atol=1e-8 * np.ptp(_plane(xx, yy)))


def test_edge_tension_rows_reject_tilted_planes():
    # Negative check of the claim in REFERENCES.md §9 that planes satisfy
    # "all boundary conditions": with T_b > 0 the edge condition
    # (1 - T_b) u_nn + T_b u_n = 0 contains u_n, which a tilted plane does
    # not satisfy, so edge rows leave a residual (interior rows do not).
    # minimum_curvature removes the data's plane first for that reason.
    g = GridGeometry(0.0, 30.0, 1.0, 30, 30)
    x, y = _stations_with_corners(g, 15, seed=4)
    cells = average_per_cell(x, y, _plane(x, y), g)
    a, rhs = assemble_system(cells, g.n_rows, g.n_cols, 0.5, boundary_tension=0.5)
    xx, yy = _nodes(g)
    residual = np.abs(a @ _plane(xx, yy).ravel() - rhs).reshape(g.shape)
    assert residual[0].max() > 1e-4
    assert residual[3:-3, 3:-3].max() < 1e-9 * np.abs(rhs).max()


def test_harmonic_with_tension_free_edges_refused():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    with pytest.raises(ValueError, match=re.escape("boundary_tension 0 with tension 1 leaves the surface undetermined")):
        minimum_curvature([100.0, 500.0, 800.0], [100.0, 700.0, 300.0], [1.0, 2.0, 3.0], g, tension=1.0, boundary_tension=0.0)


@pytest.mark.parametrize("tension", [0.0, 0.25, 1.0], ids=["T=0", "T=0.25", "T=1"])
def test_multigrid_matches_direct(tension):
    g = GridGeometry(0.0, 12_000.0, 100.0, 125, 120)
    rng = np.random.default_rng(5)
    x = rng.uniform(0, 12_500, 300)
    y = rng.uniform(0, 12_000, 300)
    v = 10 * np.sin(x / 2500.0) * np.cos(y / 3000.0)
    direct = minimum_curvature(x, y, v, g, tension=tension, solver="direct")
    iterative = minimum_curvature(x, y, v, g, tension=tension, solver="multigrid")
    # ITERATIVE_RTOL = 1e-8 was measured to leave ~2e-6 of the range.
    npt.assert_allclose(iterative, direct, rtol=0, atol=1e-4 * np.ptp(direct))


@pytest.mark.parametrize("tension", TENSIONS, ids=[f"T={t}" for t in TENSIONS])
def test_data_on_nodes_honoured_exactly(tension):
    g = GridGeometry(0.0, 2000.0, 50.0, 40, 40)
    rng = np.random.default_rng(6)
    cells = rng.choice(g.n_rows * g.n_cols, 60, replace=False)
    i, j = np.divmod(cells, g.n_cols)
    x, y = g.x_centres[j], g.y_centres[i]
    v = 5 * np.exp(-((x - 900) ** 2 + (y - 1200) ** 2) / 400.0**2) + 0.001 * x
    grid = minimum_curvature(x, y, v, g, tension=tension)
    npt.assert_allclose(grid[i, j], v, rtol=0, atol=1e-9 * np.ptp(v))


def test_off_node_data_small_error_converging():
    # Off-node data enter through a first-order Taylor expansion about the
    # nearest node, so reading the grid bilinearly at a station misses the
    # datum by O(h^2 u''). Check the size and the rate: halving the cell
    # must cut the worst misfit by more than a first-order method would
    # (factor 2). Measured: 0.069 at 50 m, 0.021 at 25 m (field amplitude
    # 10, Gaussian width 800 m). length_scale is fixed so both grids solve
    # the same equation.
    from scipy.interpolate import RegularGridInterpolator

    rng = np.random.default_rng(7)
    x = rng.uniform(200, 3800, 150)
    y = rng.uniform(200, 3800, 150)

    def field(a, b):
        return 10 * np.exp(-((a - 2000) ** 2 + (b - 1800) ** 2) / (2 * 800.0**2))

    misfit = []
    for h in (50.0, 25.0):
        n = int(4000 / h)
        g = GridGeometry(0.0, 4000.0, h, n, n)
        grid = minimum_curvature(x, y, field(x, y), g, tension=0.25, length_scale=50.0)
        read = RegularGridInterpolator((g.y_centres[::-1], g.x_centres), grid[::-1])(np.column_stack([y, x]))
        misfit.append(np.abs(read - field(x, y)).max())
    assert misfit[1] < 0.5 * misfit[0]
    assert misfit[1] < 0.03  # 0.3 % of the amplitude


STEP_LOW, STEP_HIGH = (4, 8, 12), (16, 20, 24)


def test_length_scale_makes_surface_independent_of_cell_size():
    # With the tension's length unit fixed, halving the cell changes the
    # surface only by discretisation error; in grid units (L = h) the
    # tension itself changes. Coarse centres sit on fine-cell corners, so
    # the fine grid is read as the mean of the four surrounding nodes.
    # Measured: RMS 0.050 (L fixed) against 0.194 (grid units), field +-10.
    rng = np.random.default_rng(9)
    x = rng.uniform(0, 8000, 120)
    y = rng.uniform(0, 8000, 120)
    v = 10 * np.sin(x / 1500.0) * np.cos(y / 1900.0)
    coarse_g = GridGeometry(0.0, 8000.0, 100.0, 80, 80)
    fine_g = GridGeometry(0.0, 8000.0, 50.0, 160, 160)

    def at_coarse(fine):
        return 0.25 * (fine[0::2, 0::2] + fine[1::2, 0::2] + fine[0::2, 1::2] + fine[1::2, 1::2])

    coarse = minimum_curvature(x, y, v, coarse_g, tension=0.5, length_scale=100.0)
    fixed = at_coarse(minimum_curvature(x, y, v, fine_g, tension=0.5, length_scale=100.0))
    grid_units = at_coarse(minimum_curvature(x, y, v, fine_g, tension=0.5, length_scale=50.0))
    rms_fixed = np.sqrt(np.mean((fixed - coarse) ** 2))
    rms_grid_units = np.sqrt(np.mean((grid_units - coarse) ** 2))
    assert rms_fixed < 0.5 * rms_grid_units


def _step_stations(g: GridGeometry) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
    """Full columns of data: 0 on three western columns, 1 on three eastern."""
    xs, ys, vs = [], [], []
    for cols, value in ((STEP_LOW, 0.0), (STEP_HIGH, 1.0)):
        for j in cols:
            xs.append(np.full(g.n_rows, g.x_centres[j]))
            ys.append(g.y_centres)
            vs.append(np.full(g.n_rows, value))
    return np.concatenate(xs), np.concatenate(ys), np.concatenate(vs)


STEP_GRID = GridGeometry(0.0, 21.0, 1.0, 29, 21)
BETWEEN = slice(STEP_LOW[0], STEP_HIGH[-1] + 1)  # columns from first to last data column


def test_tension_one_has_no_extrema_between_data():
    # Harmonic surface (T = 1): maximum principle, so between the data
    # nothing leaves the data range and the profile across the step is
    # monotone (REFERENCES.md §9: "T = 1 -> harmonic, extrema only at data").
    x, y, v = _step_stations(STEP_GRID)
    grid = minimum_curvature(x, y, v, STEP_GRID, tension=1.0)[:, BETWEEN]
    assert grid.min() >= -1e-9 and grid.max() <= 1 + 1e-9
    assert np.all(np.diff(grid, axis=1) >= -1e-9)


def test_tension_zero_overshoots_step():
    # Pure minimum curvature (T = 0) behaves like a cubic spline across a
    # step and dips below the data before the rise (REFERENCES.md §9:
    # "T = 0 may overshoot, false extrema"). Measured here: -0.097 and 1.097.
    x, y, v = _step_stations(STEP_GRID)
    grid = minimum_curvature(x, y, v, STEP_GRID, tension=0.0)[:, BETWEEN]
    assert grid.min() < -0.05
    assert grid.max() > 1.05
    tensioned = minimum_curvature(x, y, v, STEP_GRID, tension=0.5)[:, BETWEEN]
    # Tension shrinks the overshoot (measured: -0.029 at T = 0.5).
    assert -0.05 < tensioned.min() < 0


def test_random_data_tension_one_no_interior_extrema_tension_zero_has():
    g = GridGeometry(0.0, 40.0, 1.0, 40, 40)
    rng = np.random.default_rng(8)
    x = rng.uniform(0, 40, 40)
    y = rng.uniform(0, 40, 40)
    v = rng.normal(size=40)
    data_nodes = np.zeros(g.shape, dtype=bool)
    data_nodes[np.minimum((40 - y).astype(int), 39), np.minimum(x.astype(int), 39)] = True

    def strict_extrema(grid):
        c = grid[1:-1, 1:-1]
        nb = np.stack([grid[:-2, 1:-1], grid[2:, 1:-1], grid[1:-1, :-2], grid[1:-1, 2:]])
        found = (c > nb.max(axis=0) + 1e-12) | (c < nb.min(axis=0) - 1e-12)
        return found & ~data_nodes[1:-1, 1:-1]

    assert not strict_extrema(minimum_curvature(x, y, v, g, tension=1.0)).any()
    assert strict_extrema(minimum_curvature(x, y, v, g, tension=0.0)).any()


def test_xy_not_reproduced_near_corners():
    # u = x*y has u_xy != 0, violating the corner condition (REFERENCES.md
    # §9 negative test): data everywhere except a 4 x 4 block at each
    # corner; the surface must depart from x*y there.
    g = GridGeometry(0.0, 20.0, 1.0, 20, 20)
    xx, yy = _nodes(g)
    free = np.zeros(g.shape, dtype=bool)
    for rows in (slice(0, 4), slice(-4, None)):
        for cols in (slice(0, 4), slice(-4, None)):
            free[rows, cols] = True
    x, y = xx[~free], yy[~free]
    grid = minimum_curvature(x, y, x * y, g, tension=0.25)
    error = np.abs(grid - xx * yy)
    assert error[free].max() > 1.0  # x*y spans 0..400 here
    npt.assert_allclose(grid[~free], (xx * yy)[~free], atol=1e-8)


def test_several_stations_in_a_cell_are_averaged():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    base_x = np.array([150.0, 820.0, 430.0, 710.0])
    base_y = np.array([120.0, 260.0, 880.0, 640.0])
    base_v = np.array([1.0, 4.0, -2.0, 0.5])
    # Two stations in the first cell whose mean is (150, 120) and value 1.
    x = np.concatenate([base_x, [130.0, 170.0]])[1:]
    y = np.concatenate([base_y, [110.0, 130.0]])[1:]
    v = np.concatenate([base_v, [0.0, 2.0]])[1:]
    npt.assert_allclose(
        minimum_curvature(x, y, v, g), minimum_curvature(base_x, base_y, base_v, g), atol=1e-10
    )


def test_nan_values_are_dropped():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    x = np.array([150.0, 820.0, 430.0, 710.0, 300.0, np.nan])
    y = np.array([120.0, 260.0, 880.0, 640.0, 500.0, 50.0])
    v = np.array([1.0, 4.0, -2.0, 0.5, np.nan, 9.0])
    npt.assert_array_equal(minimum_curvature(x, y, v, g), minimum_curvature(x[:4], y[:4], v[:4], g))


def test_stations_outside_grid_warn_and_are_ignored():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    x = np.array([150.0, 820.0, 430.0, 5000.0])
    y = np.array([120.0, 260.0, 880.0, 500.0])
    v = np.array([1.0, 4.0, -2.0, 100.0])
    with pytest.warns(UserWarning, match="1 station"):
        grid = minimum_curvature(x, y, v, g, length_scale=100.0)
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        expected = minimum_curvature(x[:3], y[:3], v[:3], g, length_scale=100.0)
    npt.assert_array_equal(grid, expected)


def test_fewer_than_three_stations():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    with pytest.raises(ValueError, match=re.escape("at least 3 different grid cells")):
        minimum_curvature([100.0, 500.0], [100.0, 700.0], [1.0, 2.0], g, length_scale=100.0)
    with pytest.raises(ValueError, match=re.escape("at least 3 different grid cells to grid, got 2 (from 3 usable")):
        minimum_curvature([100.0, 500.0, 510.0], [100.0, 700.0, 690.0], [1.0, 2.0, 3.0], g)


def test_collinear_stations():
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    with pytest.raises(ValueError, match="one line"):
        minimum_curvature([50.0, 450.0, 850.0], [50.0, 450.0, 850.0], [1.0, 2.0, 3.0], g)


@pytest.mark.parametrize("tension", [-0.1, 1.5, float("nan")], ids=["negative", "above-one", "nan"])
def test_invalid_tension(tension):
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    with pytest.raises(ValueError, match=re.escape(f"Invalid tension {tension!r}: expected a number between 0 and 1")):
        minimum_curvature([100.0, 500.0, 800.0], [100.0, 700.0, 300.0], [1.0, 2.0, 3.0], g, tension=tension)


def test_output_orientation():
    # Row 0 is the north row: a field increasing northward must decrease
    # down the rows; column 0 is west.
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    x = np.array([100.0, 900.0, 500.0, 200.0])
    y = np.array([100.0, 200.0, 900.0, 600.0])
    grid = minimum_curvature(x, y, y + 0.5 * x, g)
    assert grid.shape == (10, 10)
    assert np.all(np.diff(grid, axis=0) < 0)
    assert np.all(np.diff(grid, axis=1) > 0)
    npt.assert_allclose(grid[0, 0], 950.0 + 25.0)


@pytest.mark.parametrize(("n_rows", "n_cols"), [(7, 300), (131, 77)], ids=["thin", "odd"])
def test_multigrid_matches_direct_on_awkward_grids(n_rows, n_cols):
    # T = 0 on a 7-row strip is badly conditioned: a solver stopping on the
    # plain residual came back 32 % of the range away from the direct
    # solution (found while reworking the solver); stopping on the
    # preconditioned residual keeps it close (measured 8.5e-9 and 1.9e-8 of
    # the range with the former tolerance 5e-9, 9.7e-8 and 6.4e-7 with the
    # present 3e-7, which was chosen to pass this test).
    g = GridGeometry(0.0, n_rows * 10.0, 10.0, n_cols, n_rows)
    rng = np.random.default_rng(3)
    n = max(10, n_rows * n_cols // 50)
    x = rng.uniform(0, n_cols * 10.0, n)
    y = rng.uniform(0, n_rows * 10.0, n)
    v = np.sin(x / 300) + np.cos(y / 200)
    direct = minimum_curvature(x, y, v, g, tension=0.0, solver="direct")
    iterative = minimum_curvature(x, y, v, g, tension=0.0, solver="multigrid")
    npt.assert_allclose(iterative, direct, rtol=0, atol=1e-6 * np.ptp(direct))
