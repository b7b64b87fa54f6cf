# SPDX-License-Identifier: GPL-2.0-or-later
"""Minimum-curvature gridding with tension: the public entry point.

The grid's nodes are the raster's cell centres. The sparse system
(:mod:`._system`) is solved directly (SuperLU) on small grids and by
multigrid-preconditioned GMRES (:mod:`._solver`) on large ones.
"""

from __future__ import annotations

import math
from dataclasses import replace
from functools import partial

import numpy as np
import numpy.typing as npt
import scipy.sparse as sp
import scipy.sparse.linalg as spla

from ._coarse import first_coarse_operator
from ._geometry import GridGeometry, clean_stations, default_cell_size
from ._solver import (
    FINE_SWEEP_LEVELS,
    FINE_SWEEPS,
    ITERATIVE_RTOL,
    Cancelled,
    GriddingCancelled,
    Multigrid,
    Progress,
    _colour_order,
    check_cancel,
    gmres,
)
from ._stations import CellData, average_per_cell
from ._system import assemble_system

__all__ = ["GriddingCancelled", "assemble_system", "minimum_curvature"]

#: Largest number of nodes solved by a direct sparse factorisation; larger
#: grids use the multigrid-preconditioned iteration. Measured on the bench
#: machine (SuperLU via scipy 1.10.1, T = 0.25, 2 shared cores): direct vs
#: multigrid 0.20 s vs 0.14 s at 100 x 100 nodes, 1.0 s vs 0.28 s at
#: 150 x 150, 9.5 s (0.43 GB) vs 0.4 s at 300 x 300.
DIRECT_SOLVE_MAX_NODES = 10_000


def _check_tension(tension: float, name: str = "tension") -> float:
    tension = float(tension)
    if not (math.isfinite(tension) and 0.0 <= tension <= 1.0):
        msg = f"Invalid {name} {tension!r}: expected a number between 0 and 1."
        raise ValueError(msg)
    return tension


def _solve(
    cells: CellData,
    n_rows: int,
    n_cols: int,
    tension: float,
    boundary_tension: float,
    cell_per_length: float,
    method: str,
    progress: Progress = None,
    is_cancelled: Cancelled = None,
    rtol: float = ITERATIVE_RTOL,
) -> np.ndarray:
    """Assemble ``a @ u = rhs`` and solve it directly or by multigrid-preconditioned GMRES.

    Assembled here so that the matrix in grid order can be released once
    the multigrid holds its colour-ordered copy (0.16 GB at 10^6 nodes).
    Large grids start from the surface on a grid :data:`NESTED_FACTOR`
    times coarser (:func:`_coarse_guess`).
    """
    if method not in ("auto", "direct", "multigrid"):
        msg = f"Unknown solver {method!r}: expected 'auto', 'direct' or 'multigrid'."
        raise ValueError(msg)
    if method == "auto":
        method = "direct" if n_rows * n_cols <= DIRECT_SOLVE_MAX_NODES else "multigrid"
    # The iterative solver works in the multigrid's colour order: assemble
    # straight into it rather than permuting 10^7 entries afterwards.
    order = _colour_order(n_rows, n_cols)[0] if method == "multigrid" else None
    check_cancel(is_cancelled)
    a, rhs = assemble_system(cells, n_rows, n_cols, tension, boundary_tension, cell_per_length, order=order)
    check_cancel(is_cancelled)
    guess = None
    if method == "multigrid" and n_rows * n_cols >= NESTED_MIN_NODES:
        try:
            guess = _coarse_guess(cells, n_rows, n_cols, tension, boundary_tension, cell_per_length, is_cancelled)
        except GriddingCancelled:
            raise
        except (ValueError, RuntimeError):
            guess = None  # e.g. all data in fewer than 3 coarse cells: start from zero
    if method == "direct":
        # One call to SuperLU; small grids only (under a second), so the
        # cancel check before it is enough.
        check_cancel(is_cancelled)
        solution = spla.spsolve(a.tocsc(), rhs, permc_spec="COLAMD")
        if progress is not None:
            progress(1.0)
        return solution
    first_coarse = partial(
        first_coarse_operator,
        data_nodes=cells.node,
        n_rows=n_rows,
        n_cols=n_cols,
        tension=tension,
        boundary_tension=boundary_tension,
        cell_per_length=cell_per_length,
    )
    mg = Multigrid(
        a,
        n_rows,
        n_cols,
        fine_sweeps=FINE_SWEEPS,
        fine_levels=FINE_SWEEP_LEVELS,
        is_cancelled=is_cancelled,
        colour_ordered=True,
        first_coarse=first_coarse,
    )
    del a
    # Solved in the multigrid's colour order (no permutation per iteration).
    sorted_solution, residual = gmres(
        mg.sorted_matrix,
        rhs,
        mg.apply_sorted,
        rtol=rtol,
        progress=progress,
        is_cancelled=is_cancelled,
        x0=None if guess is None else guess.ravel()[mg.order],
    )
    solution = np.empty_like(sorted_solution)
    solution[mg.order] = sorted_solution
    if residual > 100 * rtol:
        msg = (
            f"Minimum curvature: the iterative solver stopped at relative preconditioned residual "
            f"{residual:.1e} (target {rtol:.0e}); try solver='direct' on a "
            "smaller grid, or a tension below 1."
        )
        raise RuntimeError(msg)
    return solution


#: Nested iteration (the coarse-to-fine strategy of Smith & Wessel 1990):
#: grids of at least NESTED_MIN_NODES nodes start GMRES from the surface
#: computed on a grid NESTED_FACTOR times coarser, to NESTED_RTOL, and
#: interpolated (cubic). Measured on 1000 x 1000 nodes, 10,000 stations,
#: T = 0.25: 12 fine iterations instead of 24 (the guess is within 0.04 mGal
#: of the result on a 20 mGal field); the stopping test of the fine solve is
#: unchanged, so is its accuracy.
NESTED_FACTOR = 4
NESTED_MIN_NODES = 160_000
NESTED_RTOL = 1e-4


def _coarse_guess(
    cells: CellData,
    n_rows: int,
    n_cols: int,
    tension: float,
    boundary_tension: float,
    cell_per_length: float,
    is_cancelled: Cancelled,
) -> np.ndarray:
    """The surface on a grid NESTED_FACTOR times coarser, interpolated to every node.

    The cell data are averaged again per coarse cell (position and value,
    in grid units); the equation keeps its length unit, so the coarse grid
    solves the same surface at a lower resolution.
    """
    f = NESTED_FACTOR
    coarse = GridGeometry(0.0, float(-(-n_rows // f) * f), float(f), -(-n_cols // f), -(-n_rows // f))
    col = cells.node % n_cols + 0.5 + cells.col_offset
    row = cells.node // n_cols + 0.5 + cells.row_offset
    coarse_cells = average_per_cell(col, coarse.north - row, cells.value, coarse)
    surface = _solve(
        coarse_cells,
        coarse.n_rows,
        coarse.n_cols,
        tension,
        boundary_tension,
        cell_per_length * f,
        "auto",
        is_cancelled=is_cancelled,
        rtol=NESTED_RTOL,
    ).reshape(coarse.shape)
    check_cancel(is_cancelled)
    # Fine node (i, j) sits at ((i + 0.5) / f - 0.5, (j + 0.5) / f - 0.5) in coarse node units.
    rows_weights = _cubic_rows(n_rows, coarse.n_rows, f)
    cols_weights = _cubic_rows(n_cols, coarse.n_cols, f)
    return (cols_weights @ (rows_weights @ surface).T).T


def _cubic_rows(n_fine: int, n_coarse: int, factor: int) -> sp.csr_matrix:
    """Weights of the cubic-spline interpolation from ``n_coarse`` to ``n_fine`` nodes, shape (n_fine, n_coarse).

    Fine node ``i`` sits at ``(i + 0.5) / factor - 0.5`` in coarse node
    units. The weights are those of ``scipy.ndimage.map_coordinates``
    (``order=3``, ``mode="nearest"``), read off by interpolating the
    identity; the 2-D interpolation is their tensor product, applied as
    two small matrix products (measured 0.06 s instead of 0.11 s for
    ``map_coordinates`` on 10^6 nodes, same values to rounding). The
    weights fall off by a factor 2 - sqrt(3) a node away from the point, so
    those below 1e-13 are dropped and the products are sparse: they run in
    the calling thread, where a dense product went to the threaded BLAS
    (whose worker then spins, adding CPU time on a shared machine).

    Examples
    --------
    >>> w = _cubic_rows(8, 2, 4)
    >>> w.shape, bool(np.allclose(w.sum(axis=1), 1.0))
    ((8, 2), True)
    """
    from scipy.ndimage import map_coordinates

    at = (np.arange(n_fine) + 0.5) / factor - 0.5
    rows, cols = np.meshgrid(at, np.arange(n_coarse, dtype=float), indexing="ij")
    weights = map_coordinates(np.eye(n_coarse), [rows, cols], order=3, mode="nearest")
    weights[np.abs(weights) < 1e-13] = 0.0
    return sp.csr_matrix(weights)


def _detrend(cells: CellData, n_cols: int) -> tuple[CellData, np.ndarray]:
    """Remove the least-squares plane of the cell data (grid units).

    A tilted plane solves the interior equation but not an edge condition
    with :math:`T_b > 0` (it has :math:`u_n \\ne 0`), so the surface is
    computed for the data minus their plane and the plane is added back:
    planes come out exact for every tension and whatever the iterative
    solver's tolerance, and the edge condition acts on the departure from
    the regional trend rather than on the trend itself.
    """
    col = cells.node % n_cols + cells.col_offset
    row = cells.node // n_cols + cells.row_offset
    design = np.column_stack([np.ones(col.size), col, row])
    coeffs, *_ = np.linalg.lstsq(design, cells.value, rcond=None)
    rest = replace(cells, value=cells.value - design @ coeffs)
    return rest, coeffs


def minimum_curvature(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    values: npt.ArrayLike,
    geometry: GridGeometry,
    tension: float = 0.25,
    *,
    boundary_tension: float | None = None,
    length_scale: float | None = None,
    solver: str = "auto",
    progress: Progress = None,
    is_cancelled: Cancelled = None,
) -> np.ndarray:
    """Grid scattered values by minimum curvature with tension.

    Parameters
    ----------
    x, y : array_like
        Station eastings and northings (CRS units of ``geometry``).
    values : array_like
        Station values (e.g. mGal). Rows with a non-finite x, y or value are
        dropped; stations outside the grid are dropped with a warning.
    geometry : GridGeometry
        Output grid (at least 3 x 3 nodes); nodes are the cell centres.
    tension : float, default 0.25
        Interior tension T in [0, 1]: 0 is the minimum-curvature
        (biharmonic) surface, 1 the harmonic (membrane) surface. 0.25 is the
        figure recommended for potential-field data in the documentation of
        GMT's ``surface``, the authors' own implementation (Wessel et al.
        2019); see ``docs/gridding.md``.
    boundary_tension : float, optional
        Tension :math:`T_b` in the edge condition, in [0, 1]. Default: equal
        to ``tension``, the edge condition of Smith & Wessel (1990).
        :math:`T_b = 0` (edges free of tension) is refused with
        ``tension = 1``, where it leaves the surface undetermined.
    length_scale : float, optional
        Length unit :math:`L` of the equation (CRS units). Default:
        :func:`default_cell_size` of the stations (half their median
        spacing, rounded), so the surface does not change with the chosen
        cell size, and equals the usual grid-unit form when the cell size
        is the default one.
    solver : {"auto", "direct", "multigrid"}
        Direct sparse LU, or multigrid-preconditioned GMRES; "auto" picks
        direct up to :data:`DIRECT_SOLVE_MAX_NODES` nodes.
    progress : callable, optional
        ``progress(fraction)``, fraction 0-1, called during the solve
        (once per iteration, about every 0.1 s on 10^6 nodes).
    is_cancelled : callable, optional
        Polled during assembly, multigrid set-up and every iteration; when
        it returns True the run stops within a second and raises
        :class:`GriddingCancelled`.

    Returns
    -------
    numpy.ndarray, shape (n_rows, n_cols), float64
        Gridded surface in the units of ``values``; row 0 is the northern
        row; ``[i, j]`` is the value at ``(west + (j + 0.5) h, north - (i + 0.5) h)``.

    Raises
    ------
    GriddingCancelled
        ``is_cancelled()`` returned True.
    ValueError
        Fewer than 3 cells with data, stations on one line, tension out of
        range, or a grid smaller than 3 x 3.

    Notes
    -----
    The surface solves (Smith & Wessel 1990)

    .. math::

        (1 - T)\\,\\nabla^4 u - \\frac{T}{L^2}\\,\\nabla^2 u = 0

    away from the data, with :math:`(1 - T_b)\\,\\partial^2u/\\partial n^2 +
    T_b\\,\\partial u/\\partial n = 0` and :math:`\\partial(\\nabla^2u)/\\partial n = 0`
    on the edges and :math:`\\partial^2u/\\partial x\\partial y = 0` at the
    corners. Finite-difference forms usually measure lengths in grid units
    (:math:`L = h`); the strength of the tension then depends on the cell
    size (measured here: the RMS error of a smooth synthetic field at
    T = 0.25 grew from 0.10 to 0.27 mGal going from 400 m to 100 m cells).
    A length unit tied to the data instead keeps the surface independent of
    the raster's resolution.

    *Several stations in one cell* are averaged (position and value), as
    recommended for this method (same documentation); planes stay exact.

    *Off-node data* constrain their nearest node through a first-order Taylor
    expansion, :math:`u_k + \\delta_c\\,\\partial_c u + \\delta_r\\,\\partial_r u = d`
    with :math:`|\\delta| \\le 1/2` cell and finite-difference derivatives.
    This keeps a unit diagonal (well-conditioned, unlike bilinear weights,
    which put two close stations in adjacent cells on nearly the same four
    nodes), honours data on nodes exactly, and is exact for planes; the
    error for a curved surface is :math:`O(h^2 u'')`. The idea of a
    Taylor-weighted equation at the nearest node is Briggs's (1974).

    *Planes*: the data's least-squares plane is removed before solving
    and added back after, so data sampled from a plane are reproduced
    exactly for every tension; the edge condition then applies to the
    departure from that plane. (With :math:`T_b > 0` a tilted plane does
    not satisfy the edge condition itself, since :math:`u_n \\ne 0`.)

    References
    ----------
    Briggs, I. C. (1974). Machine contouring using minimum curvature.
    Geophysics, 39(1), 39-48.

    Smith, W. H. F., & Wessel, P. (1990). Gridding with continuous curvature
    splines in tension. Geophysics, 55(3), 293-305.

    Wessel, P., Luis, J. F., Uieda, L., Scharroo, R., Wobbe, F., Smith,
    W. H. F., & Tian, D. (2019). The Generic Mapping Tools version 6.
    Geochemistry, Geophysics, Geosystems, 20, 5556-5564.

    Examples
    --------
    A plane is reproduced exactly, whatever the tension:

    >>> g = GridGeometry(west=0.0, north=100.0, cell_size=10.0, n_cols=10, n_rows=10)
    >>> xs = np.array([12.0, 77.0, 41.0, 90.0, 5.0])
    >>> ys = np.array([8.0, 15.0, 60.0, 93.0, 71.0])
    >>> grid = minimum_curvature(xs, ys, 3.0 + 0.2 * xs - 0.1 * ys, g, tension=0.25)
    >>> xx, yy = np.meshgrid(g.x_centres, g.y_centres)
    >>> bool(np.allclose(grid, 3.0 + 0.2 * xx - 0.1 * yy, rtol=0, atol=1e-9))
    True
    """
    tension = _check_tension(tension)
    boundary_tension = tension if boundary_tension is None else boundary_tension
    boundary_tension = _check_tension(boundary_tension, "boundary_tension")
    if tension == 1.0 and boundary_tension == 0.0:
        # Harmonic equation with u_nn = 0 on an edge: there the Laplacian
        # reduces to u_tt, so nothing fixes the normal slope (beyond the
        # outermost data any slope solves the equations).
        msg = "boundary_tension 0 with tension 1 leaves the surface undetermined: use boundary_tension > 0."
        raise ValueError(msg)
    if geometry.n_rows < 3 or geometry.n_cols < 3:
        msg = f"Grid must be at least 3 x 3 nodes for minimum curvature, got {geometry.n_rows} x {geometry.n_cols}."
        raise ValueError(msg)
    cells = average_per_cell(x, y, values, geometry)
    if length_scale is None:
        xc, yc = clean_stations(x, y, values)[:2]
        length_scale = default_cell_size(xc, yc)
    length_scale = float(length_scale)
    if not (math.isfinite(length_scale) and length_scale > 0):
        msg = f"Invalid length_scale {length_scale!r}: expected a finite number > 0."
        raise ValueError(msg)
    cells, plane = _detrend(cells, geometry.n_cols)
    solution = _solve(
        cells,
        geometry.n_rows,
        geometry.n_cols,
        tension,
        boundary_tension,
        geometry.cell_size / length_scale,
        solver,
        progress,
        is_cancelled,
    ).reshape(geometry.shape)
    rows, cols = np.indices(geometry.shape)
    return solution + plane[0] + plane[1] * cols + plane[2] * rows
