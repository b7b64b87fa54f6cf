# SPDX-License-Identifier: GPL-2.0-or-later
"""Benchmark: 10,000 stations onto 1,000 x 1,000 nodes, ours beside scipy.

Run from the repository root::

    .venv/bin/python bench/bench_gridding.py [--stations 10000] [--nodes 1000] [--repeat 3]

The two methods run alternately, ``--repeat`` times each, every run in its
own child process; the shortest wall time of each is compared (the machine
is shared, and the minimum is the figure least disturbed by other load;
the median is printed beside it), with the load average before and after.
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
import os
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
    """Invented smooth field: the sum of the Gaussian ``BODIES`` scaled to a square of side ``side``.

    Parameters
    ----------
    x, y : numpy.ndarray
        Positions, m, in the square ``[0, side]``.
    side : float
        Side of the square, m.

    Returns
    -------
    numpy.ndarray
        Field value at each position, mGal.
    """
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

    polls = []

    def is_cancelled() -> bool:
        polls.append(time.perf_counter())
        return False

    tracemalloc.start()
    start = time.perf_counter()
    cpu_start = time.process_time()
    if method == "minimum_curvature":
        grid = minimum_curvature(x, y, values, geometry, tension=0.25, is_cancelled=is_cancelled)
    else:
        from scipy.interpolate import griddata

        xx, yy = np.meshgrid(geometry.x_centres, geometry.y_centres)
        grid = griddata((x, y), values, (xx, yy), method="cubic")
    wall = time.perf_counter() - start
    cpu = time.process_time() - cpu_start
    end = time.perf_counter()
    # Cancel latency bound: the longest stretch without a cancel check.
    gaps = np.diff([start, *polls, end]) if polls else np.array([np.nan])
    _, traced_peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()

    from scipy.spatial import Delaunay

    xx, yy = np.meshgrid(geometry.x_centres, geometry.y_centres)
    inside = Delaunay(np.column_stack([x, y])).find_simplex(np.column_stack([xx.ravel(), yy.ravel()])) >= 0
    error = (grid.ravel() - synthetic_field(xx.ravel(), yy.ravel(), side))[inside]
    queue.put(
        {
            "wall_s": wall,
            "cpu_s": cpu,
            "longest_gap_s": float(gaps.max()),
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
    """Time minimum curvature against cubic griddata on random stations; print the figures."""
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--stations", type=int, default=10_000)
    parser.add_argument("--nodes", type=int, default=1_000, help="nodes per side")
    parser.add_argument("--repeat", type=int, default=3, help="runs of each method")
    args = parser.parse_args()

    print(f"{args.stations} random stations, {args.nodes} x {args.nodes} nodes, tension 0.25")
    print("load average before: {:.2f} {:.2f} {:.2f}".format(*os.getloadavg()))
    runs = {"minimum_curvature": [], "griddata_cubic": []}
    for _ in range(max(1, args.repeat)):
        for method in runs:
            runs[method].append(_measure(method, args.stations, args.nodes))
    print("load average after:  {:.2f} {:.2f} {:.2f}".format(*os.getloadavg()))
    ours, theirs = ({k: v for k, v in min(r, key=lambda d: d["wall_s"]).items()} for r in runs.values())
    for summary, method in ((ours, "minimum_curvature"), (theirs, "griddata_cubic")):
        summary["median_wall_s"] = float(np.median([r["wall_s"] for r in runs[method]]))
        summary["maxrss_mb"] = max(r["maxrss_mb"] for r in runs[method])
        summary["traced_peak_mb"] = max(r["traced_peak_mb"] for r in runs[method])
    print(f"{'':30s}{'ours (min. curvature)':>24s}{'scipy griddata cubic':>24s}{'ratio':>10s}")
    for key, label in (
        ("wall_s", "wall time, shortest (s)"),
        ("median_wall_s", "wall time, median (s)"),
        ("cpu_s", "CPU time of that run (s)"),
        ("maxrss_mb", "peak RSS (MB)"),
        ("traced_peak_mb", "peak tracemalloc (MB)"),
        ("rms_mgal", "RMS error in hull (mGal)"),
    ):
        ratio = ours[key] / theirs[key] if theirs[key] else float("nan")
        print(f"{label:30s}{ours[key]:24.3f}{theirs[key]:24.3f}{ratio:10.2f}")
    print(f"NaN nodes: ours {ours['nan_nodes']}, scipy {theirs['nan_nodes']} (outside the hull)")
    print(
        f"longest time between two cancel checks (ours): {ours['longest_gap_s']:.2f} s "
        f"(worst of {args.repeat} runs: {max(r['longest_gap_s'] for r in runs['minimum_curvature']):.2f} s)"
    )
    print(f"runs: ours {[round(r['wall_s'], 2) for r in runs['minimum_curvature']]}, "
          f"scipy {[round(r['wall_s'], 2) for r in runs['griddata_cubic']]}")


if __name__ == "__main__":
    main()
