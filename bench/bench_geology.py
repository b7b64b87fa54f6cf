# SPDX-License-Identifier: GPL-2.0-or-later
"""Benchmark: terrain correction by density units against one constant-density run.

Run from the repository root::

    .venv/bin/python bench/bench_geology.py [--stations 200] [--units 3]

On the seeded landscape of ``bench/terrain_scenario.py`` (30 m fine DEM of
1350 x 1350 cells inside a 750 m regional DEM), the units are vertical
stripes of the fine and regional grids (west to east, densities 2200, 2670,
2900, ... kg/m^3). Prints the time of one constant-density engine run, of
the unit run (``algorithms/terrain/_geology.py``: units present + 1 engine
runs), their ratio, and the largest difference between the unit run with
every unit at 2670 kg/m^3 and the constant-density run: not rounding only,
because a block of cells cut by a contact becomes one column per unit, each
at the mean height and centroid of its own cells (a different second-order
approximation of the same cells). Every figure is measured in
this run; the load average is printed beside the timings.
"""

from __future__ import annotations

import argparse
import importlib.util
import os
import sys
import time
from pathlib import Path

REPO_ROOT = Path(__file__).resolve().parent.parent
if "relief_gravity" not in sys.modules:
    _spec = importlib.util.spec_from_file_location(
        "relief_gravity", str(REPO_ROOT / "__init__.py"), submodule_search_locations=[str(REPO_ROOT)])
    _mod = importlib.util.module_from_spec(_spec)
    sys.modules["relief_gravity"] = _mod
    _spec.loader.exec_module(_mod)

import numpy as np  # noqa: E402

from relief_gravity.algorithms.terrain import ElevationGrid, TerrainModel, terrain_correction  # noqa: E402
from relief_gravity.algorithms.terrain._geology import DensityUnits, terrain_correction_by_units  # noqa: E402
from relief_gravity.bench import terrain_scenario  # noqa: E402


def stripes(n_cols: int, west: float, cell: float, edges: np.ndarray) -> np.ndarray:
    """Unit index of each column of a grid: vertical stripes split at ``edges``.

    Parameters
    ----------
    n_cols : int
        Columns of the grid.
    west : float
        Western edge of the grid, m.
    cell : float
        Cell width, m.
    edges : numpy.ndarray
        Eastings of the stripe boundaries, m, ascending.

    Returns
    -------
    numpy.ndarray
        Unit index (0 west of the first edge) of each column, int64.
    """
    centres = west + (np.arange(n_cols) + 0.5) * cell
    return np.searchsorted(edges, centres).astype(np.int64)


def main() -> None:
    """Time one constant-density run and one unit run; print their figures and differences."""
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--stations", type=int, default=200)
    parser.add_argument("--units", type=int, default=3)
    args = parser.parse_args()
    sc = terrain_scenario.build()
    fine = ElevationGrid.from_array(sc.fine, sc.fine_west, sc.fine_north, sc.fine_cell, sc.fine_cell)
    regional = ElevationGrid.from_array(
        sc.regional, sc.regional_west, sc.regional_north, sc.regional_cell, sc.regional_cell
    )
    x, y, h = sc.stations(args.stations)
    # Stripe edges spread over the stations' span, so every unit is near some stations.
    edges = np.quantile(x, np.linspace(0, 1, args.units + 1)[1:-1])
    fu = np.broadcast_to(stripes(fine.n_cols, fine.x_origin, fine.cell_x, edges), (fine.n_rows, fine.n_cols))
    ru = np.broadcast_to(
        stripes(regional.n_cols, regional.x_origin, regional.cell_x, edges), (regional.n_rows, regional.n_cols)
    )
    densities = [2200.0 + 700.0 * k / max(args.units - 1, 1) for k in range(args.units)]
    model = TerrainModel(density=2670.0)
    units = DensityUnits(densities, fu, ru)
    flat = DensityUnits([2670.0] * args.units, fu, ru)

    t0 = time.perf_counter()
    ref = terrain_correction(x, y, h, fine, regional, model)
    t1 = time.perf_counter()
    geo = terrain_correction_by_units(x, y, h, fine, regional, units, model)
    t2 = time.perf_counter()
    same = terrain_correction_by_units(x, y, h, fine, regional, flat, model)
    load = os.getloadavg()[0]
    print(
        f"stations {args.stations}, units {args.units} ({', '.join(f'{d:g}' for d in densities)} kg/m^3), "
        f"load {load:.2f}"
    )
    print(f"constant-density engine run: {t1 - t0:.1f} s")
    print(f"unit run ({args.units} + 1 engine runs): {t2 - t1:.1f} s, ratio {(t2 - t1) / (t1 - t0):.2f}")
    print(
        "every unit at 2670 (split blocks only): largest |difference| from the constant run "
        f"{np.nanmax(np.abs(same.tc_total - ref.tc_total)):.2e} mGal"
    )
    print(f"unit densities against 2670 everywhere: mean {np.nanmean(geo.tc_total - ref.tc_total):+.3f} mGal, "
          f"range {np.nanmin(geo.tc_total - ref.tc_total):+.3f} to {np.nanmax(geo.tc_total - ref.tc_total):+.3f} mGal")


if __name__ == "__main__":
    main()
