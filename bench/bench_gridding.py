# SPDX-License-Identifier: GPL-2.0-or-later
"""Benchmark: 10,000 stations onto 1,000 x 1,000 nodes, ours beside scipy.

Run from the repository root::

    .venv/bin/python bench/bench_gridding.py [--stations 10000] [--nodes 1000]

Each method runs in its own child process so that its peak resident memory
(``resource.getrusage(RUSAGE_SELF).ru_maxrss`` read in the child) is its own; the peak of
Python-tracked allocations (``tracemalloc``, which sees numpy arrays but not
SuperLU's C buffers) is reported too. The scipy alternative is
``scipy.interpolate.griddata(method="cubic")`` (Clough-Tocher, scipy 1.10),
a general-purpose interpolator that leaves NaN outside the stations' hull.
Accuracy: RMS difference from the noise-free synthetic field (a sum of
Gaussian bodies) over the nodes inside the stations' convex hull.
"""

from __future__ import annotations

import argparse
import importlib.util
import multiprocessing as mp
import resource
import sys
import time
import tracemalloc
from pathlib import Path

import numpy as np

REPO_ROOT = Path(__file__).resolve().parent.parent


def _import_package() -> None:
    if "relief_gravity" in sys.modules:
        return
    spec = importlib.util.spec_from_file_location(
        "relief_gravity", REPO_ROOT / "__init__.py", submodule_search_locations=[str(REPO_ROOT)]
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules["relief_gravity"] = module
    spec.loader.exec_module(module)


#: Synthetic bodies: (x0, y0, amplitude mGal, width) with x0, y0, width as
#: fractions of the side.
BODIES = (
    (0.30, 0.35, 12.0, 0.12),
    (0.70, 0.65, -8.0, 0.15),
    (0.50, 0.20, 5.0, 0.09),
    (0.20, 0.75, -6.0, 0.11),
    (0.80, 0.25, 3.0, 0.05),
)


def synthetic_field(x: np.ndarray, y: np.ndarray, side: float) -> np.ndarray:
    out = np.zeros_like(x, dtype=float)
    for x0, y0, amp, width in BODIES:
        w = width * side
        out += amp * np.exp(-((x - x0 * side) ** 2 + (y - y0 * side) ** 2) / (2 * w * w))
    return out


def _problem(n_stations: int, n_nodes: int):
    _import_package()
    from relief_gravity.algorithms.gridding import GridGeometry

    side = 100_000.0  # 100 km square, 100 m cells for 1000 nodes
    rng = np.random.default_rng(20240601)
    x = rng.uniform(0, side, n_stations)
    y = rng.uniform(0, side, n_stations)
    values = synthetic_field(x, y, side)
    geometry = GridGeometry(0.0, side, side / n_nodes, n_nodes, n_nodes)
    return x, y, values, geometry, side


def _run(method: str, n_stations: int, n_nodes: int, queue) -> None:
    x, y, values, geometry, side = _problem(n_stations, n_nodes)
    from relief_gravity.algorithms.gridding import minimum_curvature

    tracemalloc.start()
    start = time.perf_counter()
    if method == "minimum_curvature":
        grid = minimum_curvature(x, y, values, geometry, tension=0.25)
    else:
        from scipy.interpolate import griddata

        xx, yy = np.meshgrid(geometry.x_centres, geometry.y_centres)
        grid = griddata((x, y), values, (xx, yy), method="cubic")
    wall = time.perf_counter() - start
    _, traced_peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()

    from scipy.spatial import Delaunay

    xx, yy = np.meshgrid(geometry.x_centres, geometry.y_centres)
    inside = Delaunay(np.column_stack([x, y])).find_simplex(np.column_stack([xx.ravel(), yy.ravel()])) >= 0
    error = (grid.ravel() - synthetic_field(xx.ravel(), yy.ravel(), side))[inside]
    queue.put(
        {
            "wall_s": wall,
            "traced_peak_mb": traced_peak / 2**20,
            "rms_mgal": float(np.sqrt(np.nanmean(error**2))),
            "nan_nodes": int(np.isnan(grid).sum()),
            # Linux reports KiB; the child's own peak includes the inherited
            # interpreter (a few tens of MB) and the accuracy check.
            "maxrss_mb": resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024,
        }
    )


def _measure(method: str, n_stations: int, n_nodes: int) -> dict:
    ctx = mp.get_context("fork")
    queue = ctx.Queue()
    proc = ctx.Process(target=_run, args=(method, n_stations, n_nodes, queue))
    proc.start()
    result = queue.get()
    proc.join()
    return result


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--stations", type=int, default=10_000)
    parser.add_argument("--nodes", type=int, default=1_000, help="nodes per side")
    args = parser.parse_args()

    print(f"{args.stations} random stations, {args.nodes} x {args.nodes} nodes, tension 0.25")
    ours = _measure("minimum_curvature", args.stations, args.nodes)
    theirs = _measure("griddata_cubic", args.stations, args.nodes)
    print(f"{'':28s}{'ours (min. curvature)':>24s}{'scipy griddata cubic':>24s}{'ratio':>10s}")
    for key, label in (
        ("wall_s", "wall time (s)"),
        ("maxrss_mb", "peak RSS (MB)"),
        ("traced_peak_mb", "peak tracemalloc (MB)"),
        ("rms_mgal", "RMS error in hull (mGal)"),
    ):
        ratio = ours[key] / theirs[key] if theirs[key] else float("nan")
        print(f"{label:28s}{ours[key]:24.3f}{theirs[key]:24.3f}{ratio:10.2f}")
    print(f"NaN nodes: ours {ours['nan_nodes']}, scipy {theirs['nan_nodes']} (outside the hull)")


if __name__ == "__main__":
    main()
