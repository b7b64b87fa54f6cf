# SPDX-License-Identifier: GPL-2.0-or-later
"""Progress and cancel inside the minimum-curvature solve."""

from __future__ import annotations

import numpy as np
import numpy.testing as npt
import pytest

from relief_gravity.algorithms.gridding import GriddingCancelled, GridGeometry, minimum_curvature
from relief_gravity.algorithms.gridding._solver import Multigrid, gmres

#: 200 x 200 nodes: above DIRECT_SOLVE_MAX_NODES, so the iterative path runs.
GRID = GridGeometry(0.0, 20_000.0, 100.0, 200, 200)


@pytest.fixture(scope="module")
def survey():
    rng = np.random.default_rng(11)
    x = rng.uniform(0, 20_000, 400)
    y = rng.uniform(0, 20_000, 400)
    v = 10 * np.sin(x / 3000.0) * np.cos(y / 4000.0) + 0.001 * x
    return x, y, v


class CancelAfter:
    """``is_cancelled`` that turns True on its ``n``-th call; counts the calls."""

    def __init__(self, n: int) -> None:
        self.n = n
        self.calls = 0

    def __call__(self) -> bool:
        self.calls += 1
        return self.calls >= self.n


def test_progress_reported_during_the_solve(survey):
    x, y, v = survey
    fractions = []
    grid = minimum_curvature(x, y, v, GRID, tension=0.25, progress=fractions.append)
    assert len(fractions) > 3  # one per iteration, then 1.0
    assert fractions[-1] == 1.0
    assert all(0.0 <= f <= 1.0 for f in fractions)
    assert np.all(np.diff(fractions) >= 0)
    # The callbacks do not change the result.
    npt.assert_array_equal(grid, minimum_curvature(x, y, v, GRID, tension=0.25))


def test_cancel_in_the_middle_of_the_iterations(survey):
    x, y, v = survey
    # Count the polls of a full run, then cancel three polls before its end:
    # the last polls are the GMRES iterations (one each).
    counter = CancelAfter(10**9)
    fractions = []
    minimum_curvature(x, y, v, GRID, tension=0.25, progress=fractions.append, is_cancelled=counter)
    total, iterations = counter.calls, len(fractions) - 1
    assert total > iterations > 5  # set-up steps, then one poll per iteration
    fractions = []
    cancel = CancelAfter(total - 3)
    with pytest.raises(GriddingCancelled, match="Gridding cancelled"):
        minimum_curvature(x, y, v, GRID, tension=0.25, progress=fractions.append, is_cancelled=cancel)
    assert cancel.calls == total - 3  # stopped at the first True
    # The poll that cancels opens iteration (iterations - 3); the ones before it reported.
    assert len(fractions) == iterations - 4  # inside the iterations, not before or after
    assert 0.0 < fractions[-1] < 1.0


def test_cancel_flag_raised_by_the_progress_callback(survey):
    # As a user interface does it: the cancel arrives while progress is shown.
    x, y, v = survey
    fractions = []
    with pytest.raises(GriddingCancelled):
        minimum_curvature(
            x, y, v, GRID, tension=0.25, progress=fractions.append, is_cancelled=lambda: len(fractions) >= 2
        )
    assert len(fractions) == 2 and fractions[-1] < 1.0


def test_cancel_before_the_solve_small_grid():
    # The direct (SuperLU) path on a small grid checks before factorising.
    g = GridGeometry(0.0, 1000.0, 100.0, 10, 10)
    with pytest.raises(GriddingCancelled):
        minimum_curvature([100.0, 500.0, 800.0], [100.0, 700.0, 300.0], [1.0, 2.0, 3.0], g, is_cancelled=lambda: True)


def test_cancel_during_multigrid_set_up(survey):
    x, y, v = survey
    # Call 1 is before assembly, 2 before the solve, 3 the first set-up level.
    cancel = CancelAfter(3)
    with pytest.raises(GriddingCancelled):
        minimum_curvature(x, y, v, GRID, tension=0.25, is_cancelled=cancel)
    assert cancel.calls == 3


def test_gmres_without_preconditioner_progress_and_cancel():
    import scipy.sparse as sp

    a = sp.diags([-1.0, 2.2, -1.0], [-1, 0, 1], shape=(400, 400)).tocsr()
    b = np.ones(400)
    fractions = []
    x, rel = gmres(a, b, lambda r: r, rtol=1e-10, progress=fractions.append)
    assert rel <= 1e-10
    npt.assert_allclose(a @ x, b, atol=1e-8)
    assert fractions[-1] == pytest.approx(1.0) and np.all(np.diff(fractions) >= 0)
    with pytest.raises(GriddingCancelled):
        gmres(a, b, lambda r: r, is_cancelled=CancelAfter(5))


def test_multigrid_reduces_the_residual_of_the_gridding_system(survey):
    from relief_gravity.algorithms.gridding._stations import average_per_cell
    from relief_gravity.algorithms.gridding._system import assemble_system

    x, y, v = survey
    cells = average_per_cell(x, y, v, GRID)
    a, rhs = assemble_system(cells, GRID.n_rows, GRID.n_cols, 0.25, 0.25, 0.4)
    mg = Multigrid(a, GRID.n_rows, GRID.n_cols)
    assert len(mg.levels) >= 2 and len(mg.strips) == 4
    # One V-cycle from zero: measured 0.09 of the initial residual.
    assert np.linalg.norm(rhs - a @ mg.apply(rhs)) < 0.2 * np.linalg.norm(rhs)


def test_coarse_grid_start_gives_the_same_surface(monkeypatch):
    # Grids of NESTED_MIN_NODES nodes or more start from the surface on a 4x
    # coarser grid; the stopping test is absolute, so the result must agree
    # with a start from zero to within the solver's accuracy (measured 6.8e-7
    # of the range here with the stopping tolerance 3e-7; 6.4e-6 mGal against
    # the direct solution on 400 x 400 nodes, docs/gridding.md).
    from relief_gravity.algorithms.gridding import _mincurv

    rng = np.random.default_rng(42)
    x = rng.uniform(0, 20e3, 300)
    y = rng.uniform(0, 20e3, 300)
    v = 12.0 * np.exp(-((x - 6e3) ** 2 + (y - 7e3) ** 2) / (2 * 2.5e3**2)) - 8.0 * np.exp(
        -((x - 14e3) ** 2 + (y - 13e3) ** 2) / (2 * 3e3**2)
    )
    # 200 x 200 nodes, with the threshold lowered to them, keeps the test quick.
    g = GridGeometry(0.0, 20e3, 100.0, 200, 200)
    monkeypatch.setattr(_mincurv, "NESTED_MIN_NODES", g.n_rows * g.n_cols)
    calls = []
    real_guess = _mincurv._coarse_guess
    monkeypatch.setattr(_mincurv, "_coarse_guess", lambda *a: calls.append(1) or real_guess(*a))
    nested = minimum_curvature(x, y, v, g, tension=0.25)
    assert calls == [1]
    monkeypatch.setattr(_mincurv, "NESTED_MIN_NODES", 10**9)
    from_zero = minimum_curvature(x, y, v, g, tension=0.25)
    assert calls == [1]
    npt.assert_allclose(nested, from_zero, rtol=0, atol=1e-6 * np.ptp(from_zero))


def test_cancel_during_the_coarse_grid_start(monkeypatch):
    from relief_gravity.algorithms.gridding import _mincurv

    rng = np.random.default_rng(5)
    x = rng.uniform(0, 20e3, 300)
    y = rng.uniform(0, 20e3, 300)
    g = GridGeometry(0.0, 20e3, 50.0, 400, 400)
    assert g.n_rows * g.n_cols >= _mincurv.NESTED_MIN_NODES
    fractions = []
    # The first check is the fine grid's, the next ones the coarse solve's.
    # Only one True: the cancel must not be taken for a failed coarse solve.
    polls = []

    def cancel_once() -> bool:
        polls.append(1)
        return len(polls) == 4

    with pytest.raises(GriddingCancelled):
        minimum_curvature(x, y, np.sin(x / 3e3), g, progress=fractions.append, is_cancelled=cancel_once)
    assert len(polls) == 4
    assert fractions == []  # the fine solve never started


def test_one_fine_sweep_cycle_reduces_the_error_against_the_direct_solution(survey):
    # The gridding runs the cycle with FINE_SWEEPS (1) sweeps on the
    # FINE_SWEEP_LEVELS (2) finest grids: its plain residual after one cycle
    # is larger than with two sweeps everywhere (0.25 against 0.08
    # measured), but the error, which the stopping test follows, falls
    # faster (measured 0.20 of the solution after three cycles used as a
    # plain iteration, 0.22 with two sweeps everywhere).
    import scipy.sparse.linalg as spla

    from relief_gravity.algorithms.gridding._solver import FINE_SWEEP_LEVELS, FINE_SWEEPS
    from relief_gravity.algorithms.gridding._stations import average_per_cell
    from relief_gravity.algorithms.gridding._system import assemble_system

    x, y, v = survey
    cells = average_per_cell(x, y, v, GRID)
    a, rhs = assemble_system(cells, GRID.n_rows, GRID.n_cols, 0.25, 0.25, 0.4)
    exact = spla.spsolve(a.tocsc(), rhs)
    mg = Multigrid(a, GRID.n_rows, GRID.n_cols, fine_sweeps=FINE_SWEEPS, fine_levels=FINE_SWEEP_LEVELS)
    error = exact.copy()
    for _ in range(3):
        error -= mg.apply(a @ error)
    assert np.linalg.norm(error) < 0.3 * np.linalg.norm(exact)
    with pytest.raises(ValueError, match="sweep"):
        Multigrid(a, GRID.n_rows, GRID.n_cols, fine_sweeps=0)
