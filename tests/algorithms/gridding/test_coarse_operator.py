# SPDX-License-Identifier: GPL-2.0-or-later
"""The structured first coarse operator equals the Galerkin product P.T A P."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.gridding import GridGeometry
from relief_gravity.algorithms.gridding._coarse import first_coarse_operator
from relief_gravity.algorithms.gridding._solver import _as_float32, _colour_order, _prolongation, _prolongation_1d
from relief_gravity.algorithms.gridding._stations import average_per_cell
from relief_gravity.algorithms.gridding._system import assemble_system, pde_rows


@pytest.mark.parametrize(
    ("n_rows", "n_cols", "tension", "boundary_tension"),
    [
        (30, 27, 0.25, 0.25),  # even / odd sides
        (31, 40, 0.0, 0.0),
        (64, 65, 1.0, 0.5),
        (101, 100, 0.25, 0.0),
        (24, 25, 0.25, 0.25),  # the template's own size
        (20, 50, 0.25, 0.25),  # smaller than the template: sparse products
    ],
)
def test_first_coarse_operator_equals_the_galerkin_product(n_rows, n_cols, tension, boundary_tension):
    rng = np.random.default_rng(n_rows * 1000 + n_cols)
    g = GridGeometry(0.0, float(n_rows), 1.0, n_cols, n_rows)
    m = max(5, n_rows * n_cols // 50)
    # Random stations plus some in the corners and on the edges, where the
    # rows of the template differ most.
    x = np.r_[rng.uniform(0, n_cols, m), 0.1, n_cols - 0.1, 0.1, n_cols - 0.1, n_cols / 2, 0.6]
    y = np.r_[rng.uniform(0, n_rows, m), 0.1, 0.1, n_rows - 0.1, n_rows - 0.1, 0.2, n_rows / 2]
    cells = average_per_cell(x, y, rng.normal(size=x.size), g)
    order, _, position = _colour_order(n_rows, n_cols)
    a, _ = assemble_system(cells, n_rows, n_cols, tension, boundary_tension, 0.7, order=order)
    a = _as_float32(a)
    coarse = (_prolongation_1d(n_rows).shape[1], _prolongation_1d(n_cols).shape[1])
    c_order, _, c_position = _colour_order(*coarse)
    p = _prolongation((n_rows, n_cols), c_position)
    expected = (p.T.tocsr() @ a @ p).tocsr()
    got = first_coarse_operator(
        a, p, position, c_order, c_position, cells.node, n_rows, n_cols, tension, boundary_tension, 0.7
    )
    assert got.dtype == np.float32 and got.shape == expected.shape
    # float32 operators: equal to rounding of entries of order 1.
    assert abs(got - expected).max() < 1e-6 * abs(expected).max()


def test_pde_rows_are_the_rows_of_a_grid_without_data():
    from relief_gravity.algorithms.gridding._system import _scaled_pde_rows

    nodes = np.array([0, 1, 12, 13, 40, 77, 119, 118, 60])
    rows = pde_rows(nodes, 10, 12, 0.3, 0.1, 0.8)
    full = _scaled_pde_rows(10, 12, 0.3, 0.1, 0.3 * 0.8**2, np.zeros(120, dtype=bool))
    np.testing.assert_allclose(rows.toarray(), full[nodes].toarray(), rtol=0, atol=1e-12)
