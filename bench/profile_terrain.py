# SPDX-License-Identifier: GPL-2.0-or-later
"""Where the terrain engine's time goes, on the benchmark scenario.

``python3 bench/profile_terrain.py [--stations N]`` prints, measured in one
run on one thread:

1. kernel evaluations per station at each level of each grid (cells or
   blocks whose column term is computed), and how many block positions the
   level's windows cover (the masks' size);
2. the cost of one column-kernel evaluation on this machine (the kernel alone
   on a million columns) and so the floor: evaluations per station times that
   cost;
3. the engine's CPU time per station, and a profile grouped into block
   statistics, bookkeeping of the evaluation (masks, gathers, geometry,
   sums), the column kernel, exact prisms and the innermost model.

It is a benchmark, not a test: figures depend on the machine and its load
(the load average is printed).
"""

from __future__ import annotations

import argparse
import cProfile
import inspect
import os
import pstats
import sys
import time
from pathlib import Path

import numpy as np

REPO_ROOT = Path(__file__).resolve().parent.parent


def _register() -> None:
    import importlib.util

    if "relief_gravity" not in sys.modules:
        spec = importlib.util.spec_from_file_location(
            "relief_gravity", REPO_ROOT / "__init__.py", submodule_search_locations=[str(REPO_ROOT)]
        )
        module = importlib.util.module_from_spec(spec)
        sys.modules["relief_gravity"] = module
        spec.loader.exec_module(module)


def main(argv: list[str] | None = None) -> int:
    """Profile the terrain engine on the seeded landscape; print the kernel floor and the time per part.

    Parameters
    ----------
    argv : list of str, optional
        Command-line arguments without the program name (default: ``sys.argv[1:]``).

    Returns
    -------
    int
        Exit status, 0 on success.
    """
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n", 1)[0])
    parser.add_argument("--stations", type=int, default=1000, help="stations profiled (default 1,000)")
    args = parser.parse_args(argv)
    _register()
    from relief_gravity.algorithms.terrain import ElevationGrid, _evaluate, _rings, terrain_correction
    from relief_gravity.algorithms.terrain._kernels import column_kernel
    from relief_gravity.bench import terrain_scenario

    a, b, c = os.getloadavg()
    print(f"load average {a:.2f} {b:.2f} {c:.2f} on {os.cpu_count()} cores; numpy {np.__version__}")
    scn = terrain_scenario.build()
    n = args.stations
    x, y, h = scn.stations(n)
    fine = ElevationGrid.from_array(scn.fine, scn.fine_west, scn.fine_north, scn.fine_cell, scn.fine_cell)
    regional = ElevationGrid.from_array(scn.regional, scn.regional_west, scn.regional_north,
                                        scn.regional_cell, scn.regional_cell)

    # 1. evaluations per level (the bench wraps the kernel calls of both evaluation
    # paths; the engine is unchanged): rectangles (_rings) on most levels, the
    # masked path (_evaluate) on sparse levels.
    counts: dict[tuple[str, int, float], list[int]] = {}
    # As many stations as the timed run (up to 2,000): batches are groups of
    # nearby stations, whose rectangles have narrower masked margins when dense.
    n_count = min(n, 2000)
    original = _evaluate.column_terms
    original_slices = _rings._kernel_by_slices

    def entry_for(frame):
        plan, index = frame.f_locals["plan"], frame.f_locals["level_index"]
        key = ("fine" if plan.is_fine else "regional", *plan.levels[index])
        return counts.setdefault(key, [0, 0])

    def counting(dx, *rest, **kw):
        frame = inspect.currentframe().f_back
        entry = entry_for(frame)
        entry[0] += frame.f_locals["valid"].size
        entry[1] += dx.size
        return original(dx, *rest, **kw)

    def counting_slices(s2, *rest, **kw):
        frame = inspect.currentframe().f_back
        entry = entry_for(frame)
        entry[0] += s2.size
        entry[1] += s2.size
        return original_slices(s2, *rest, **kw)

    _evaluate.column_terms = counting
    _rings._kernel_by_slices = counting_slices
    try:
        terrain_correction(x[:n_count], y[:n_count], h[:n_count], fine, regional, workers=1)
    finally:
        _evaluate.column_terms = original
        _rings._kernel_by_slices = original_slices
    print(f"\n[evaluations per station, {n_count:,} stations] grid, level k, square half-width, "
          "block positions looked at (masks, or rectangles with their masked margins), column-kernel evaluations")
    total = 0.0
    for (grid, k, half), (masked, evaluated) in counts.items():
        total += evaluated / n_count
        print(f"  {grid:8s} k={k}  {half / 1000:7.2f} km  {masked / n_count:8.0f}  {evaluated / n_count:8.0f}")
    print(f"  total {total:,.0f} column-kernel evaluations per station, plus about 120 exact prisms "
          f"(cells within 5 cells) and the innermost square")

    # 2. cost of one kernel evaluation
    rng = np.random.default_rng(1)
    m = 1_000_000
    s = rng.uniform(1e3, 1.6e5, m)
    az = rng.uniform(0, 2 * np.pi, m)
    dx, dy = s * np.cos(az), s * np.sin(az)
    relief = rng.normal(0.0, 500.0, m)
    drop = s * s / (2 * 6_371_008.7714)
    var = rng.uniform(0, 1e4, m)
    ce, cn = rng.normal(0, 1e3, m), rng.normal(0, 1e3, m)
    area = np.full(m, 1.0e6)
    # As the engine calls it: single precision, batches of about 60,000 columns.
    f32 = np.float32
    args = [a.astype(f32) for a in (s * s, dx, dy, relief, drop)] + [f32(1000.0), f32(1000.0)]
    args += [a.astype(f32) for a in (area, var, ce, cn)]
    batch = 60_000
    best = 1e9
    for _ in range(5):
        t0 = time.process_time()
        for i in range(0, m, batch):
            column_kernel(*(a[i : i + batch] if np.ndim(a) else a for a in args))
        best = min(best, time.process_time() - t0)
    per_eval = best / m
    print(f"\n[kernel] one column-kernel evaluation (size, spread and tilt terms): {per_eval * 1e9:.1f} ns "
          "(single precision, best of 5 over 1e6 columns in batches of 60,000); "
          f"floor {total * per_eval * 1e3:.3f} ms CPU per station")

    # 3. the engine under the profiler
    profiler = cProfile.Profile()
    t0 = time.process_time()
    profiler.enable()
    terrain_correction(x, y, h, fine, regional, workers=1)
    profiler.disable()
    cpu = time.process_time() - t0
    print(f"\n[engine] {n:,} stations, one thread: {cpu:.2f} s CPU under the profiler = "
          f"{cpu / n * 1e3:.3f} ms per station ({cpu / n / (total * per_eval):.1f} x the kernel floor)")
    stats = pstats.Stats(profiler)
    groups = {
        "block statistics (read, merge, tables)": (
            "block_statistics",
            "_cell_statistics",
            "merge_blocks",
            "block_table",
        ),
        "column kernel": ("column_kernel", "_kernel_by_slices"),
        "exact prisms": (
            "prism_gravity",
            "_vertex_kernel",
            "_safe_log",
            "_closed_form",
            "_line_sum",
            "inverse_distance_difference",
            "prism_terms",
            "_piece_terms",
        ),
        "innermost square": ("innermost", "plane_terrain_effect"),
    }
    found = {name: 0.0 for name in groups}
    whole = 0.0
    for (_, _, func), (_, _, tottime, _, _) in stats.stats.items():
        whole += tottime
        for name, funcs in groups.items():
            if func in funcs:
                found[name] += tottime
    print("  time by part (own time of the functions, share of the profiled total):")
    for name, value in found.items():
        print(f"    {name:40s} {value:6.2f} s  {100 * value / whole:5.1f} %")
    rest = whole - sum(found.values())
    print(f"    {'evaluation bookkeeping and the rest':40s} {rest:6.2f} s  {100 * rest / whole:5.1f} %")
    return 0


if __name__ == "__main__":
    sys.exit(main())
