# SPDX-License-Identifier: GPL-2.0-or-later
"""The first coarse operator of the multigrid, built from its structure.

The Galerkin operator ``P.T @ A @ P`` of the finest grid is the costliest
step of the multigrid set-up when computed by sparse products (0.45 s of
CPU at 10^6 nodes). ``A`` is the PDE matrix ``S`` (a fixed stencil except
within a few nodes of the edges) with the rows of the data nodes replaced,
so

    P.T A P = P.T S P + P_d.T (A_d - S_d) P,

where the subscript ``d`` keeps the rows of the data nodes. The first term
is, like ``S`` itself, one fixed 25-point stencil away from the edges: it is
computed by sparse products on a grid of about 24 x 24 nodes and copied row
by row, by each coarse node's distance to the edges, onto the coarse grid.
The second is a product over the data rows alone (1 % of the rows on the
bench grid).
"""

from __future__ import annotations

import numpy as np
import scipy.sparse as sp

from ._solver import _prolongation_1d
from ._system import _scaled_pde_rows, pde_rows

#: Coarse rows nearer than this to an edge take the row of the same
#: distance on the template grid; the others the interior row. The fine
#: rows differ from the plain stencil within 3 nodes of an edge, a coarse
#: row sees fine nodes up to 3 away from its own (2 x 1 + 1) and the last
#: coarse interval may be a single fine cell, so 4 is safe (tested).
_COARSE_EDGE_KINDS = 4

#: Fine nodes per side of the template grid (plus one when the grid's own
#: count is odd, so that its last coarse interval is alike).
_TEMPLATE_FINE = 24


def _kind(index: np.ndarray, size: int, template_size: int) -> np.ndarray:
    """Row of the template standing for coarse row ``index`` of ``size`` (one axis)."""
    h = _COARSE_EDGE_KINDS
    out = np.where(index < h, index, h)
    return np.where(index > size - 1 - h, template_size - (size - index), out)


def first_coarse_operator(
    a: sp.csr_matrix,
    p: sp.csr_matrix,
    position: np.ndarray,
    coarse_order: np.ndarray,
    coarse_position: np.ndarray,
    data_nodes: np.ndarray,
    n_rows: int,
    n_cols: int,
    tension: float,
    boundary_tension: float,
    cell_per_length: float,
) -> sp.csr_matrix:
    """``P.T @ a @ P`` for the assembled gridding system, without products over the whole grid.

    Parameters
    ----------
    a : scipy.sparse.csr_matrix
        The system of :func:`assemble_system`, rows and columns in the fine
        colour order (node ``order[k]`` at place ``k``; ``position`` is the
        inverse).
    p : scipy.sparse.csr_matrix
        Bilinear prolongation, rows in the fine colour order, columns in the
        coarse one (:func:`_solver._prolongation`).
    position : numpy.ndarray
        Place of every fine node (grid order) in the fine colour order.
    coarse_order, coarse_position : numpy.ndarray
        The coarse colour order and its inverse.
    data_nodes : numpy.ndarray
        Fine nodes (grid order) carrying a data equation.
    n_rows, n_cols, tension, boundary_tension, cell_per_length
        As given to :func:`assemble_system`.

    Returns
    -------
    scipy.sparse.csr_matrix, float32
        The coarse operator, rows and columns in the coarse colour order;
        equal to ``p.T @ a @ p`` to rounding (tested).

    Examples
    --------
    >>> from ._solver import _colour_order, _prolongation
    >>> from ._stations import CellData
    >>> from ._system import assemble_system
    >>> n_rows, n_cols = 30, 27
    >>> cells = CellData(node=np.array([40, 400]), row_offset=np.zeros(2), col_offset=np.zeros(2),
    ...                  value=np.array([1.0, -1.0]), count=np.ones(2, dtype=int))
    >>> order, _, position = _colour_order(n_rows, n_cols)
    >>> a, _ = assemble_system(cells, n_rows, n_cols, 0.25, 0.25, 0.5, order=order)
    >>> coarse = (_prolongation_1d(n_rows).shape[1], _prolongation_1d(n_cols).shape[1])
    >>> c_order, _, c_position = _colour_order(*coarse)
    >>> p = _prolongation((n_rows, n_cols), c_position)
    >>> g = first_coarse_operator(a, p, position, c_order, c_position, cells.node, n_rows, n_cols, 0.25, 0.25, 0.5)
    >>> bool(abs(g - p.T @ a @ p).max() < 1e-6)
    True
    """
    py, px = _prolongation_1d(n_rows), _prolongation_1d(n_cols)
    nc_rows, nc_cols = py.shape[1], px.shape[1]
    # Template grid: same parity as the grid, so its last coarse interval is alike.
    tr = _TEMPLATE_FINE + (n_rows - _TEMPLATE_FINE) % 2
    tc = _TEMPLATE_FINE + (n_cols - _TEMPLATE_FINE) % 2
    if n_rows < tr or n_cols < tc:
        return (p.T @ a @ p).tocsr().astype(np.float32)
    weight = tension * cell_per_length**2
    small = _scaled_pde_rows(tr, tc, tension, boundary_tension, weight, np.ones(tr * tc, dtype=bool))
    ps = sp.kron(_prolongation_1d(tr), _prolongation_1d(tc)).tocsr()
    gs = (ps.T @ small @ ps).tocoo()
    tcr, tcc = _prolongation_1d(tr).shape[1], _prolongation_1d(tc).shape[1]
    di = gs.col // tcc - gs.row // tcc
    dj = gs.col % tcc - gs.row % tcc
    if np.abs(di).max() > 2 or np.abs(dj).max() > 2:
        msg = "Coarse operator reaches beyond two nodes."
        raise ValueError(msg)
    # Table: template coarse row by slot of the 5 x 5 box.
    table = np.zeros((tcr * tcc, 25))
    table[gs.row, (di + 2) * 5 + (dj + 2)] = gs.data
    box = np.array([q * nc_cols + r for q in range(-2, 3) for r in range(-2, 3)], dtype=np.int64)
    node = coarse_order.astype(np.int64)
    i, j = np.divmod(node, nc_cols)
    kinds = _kind(i, nc_rows, tcr) * tcc + _kind(j, nc_cols, tcc)
    n_coarse = nc_rows * nc_cols
    values = table.astype(np.float32)[kinds]
    # The data rows' share, P_d.T (A_d - S_d) P, added into the same slots
    # (a Galerkin row reaches two coarse nodes at most, checked above for S).
    data_nodes = np.asarray(data_nodes, dtype=np.int64)
    places = position[data_nodes]
    pde = pde_rows(data_nodes, n_rows, n_cols, tension, boundary_tension, cell_per_length).tocoo()
    pde = sp.csr_matrix((pde.data, (pde.row, position[pde.col])), shape=(data_nodes.size, a.shape[1]))
    correction = (p[places].T @ ((a[places] - pde) @ p)).tocoo()
    col_node = coarse_order[correction.col].astype(np.int64)
    ci, cj = np.divmod(col_node, nc_cols)
    di, dj = ci - i[correction.row], cj - j[correction.row]
    if correction.nnz and (np.abs(di).max() > 2 or np.abs(dj).max() > 2):
        msg = "Coarse operator reaches beyond two nodes."
        raise ValueError(msg)
    # Canonical COO (from CSR): each (row, slot) once, so += is safe.
    values[correction.row, (di + 2) * 5 + (dj + 2)] += correction.data
    indices = node.astype(np.int32)[:, None] + box.astype(np.int32)[None, :]
    np.maximum(indices, 0, out=indices)
    np.minimum(indices, n_coarse - 1, out=indices)
    out = sp.csr_matrix(
        (
            values.ravel(),
            coarse_position.astype(np.int32)[indices].ravel(),
            np.arange(n_coarse + 1, dtype=np.int64) * 25,
        ),
        shape=(n_coarse, n_coarse),
    )
    # Slots beyond the edges hold exact zeros (their clipped indices may
    # repeat a valid column): dropped.
    out.eliminate_zeros()
    out.has_sorted_indices = False
    return out
