# SPDX-License-Identifier: GPL-2.0-or-later
"""Network adjustment of invented relative-gravity networks: time and memory against size.

Prints, for growing networks (loops from two known bases through 25 new
stations and one old one, 0.01 mGal reading noise), the wall and CPU time
of ``adjust_network``, its peak of Python-tracked allocations and the
largest error against the invented truth. Figures are measured in this run;
nothing here is a test.

    .venv/bin/python bench/bench_adjustment.py [--sizes 200 800 2000 4000]
"""

from __future__ import annotations

import argparse
import os
import sys
import time
import tracemalloc
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "bench"))
from _checkout import register_checkout  # noqa: E402 - after the path is set


def main(argv=None) -> int:
    """Run the sizes given on the command line and print one line each."""
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--sizes", type=int, nargs="+", default=[200, 800, 2000, 4000])
    args = parser.parse_args(argv)
    register_checkout()
    import numpy as np

    from relief_gravity.algorithms.survey import adjust_network

    sys.path.insert(0, str(ROOT / "tests" / "algorithms" / "survey"))
    from test_adjustment_large import invented_network

    print(f"load average {os.getloadavg()[0]:.2f}")
    print("stations  readings  loops  wall s  CPU s  peak MiB  max |error| mGal")
    for n in args.sizes:
        value, station, loop, hours, known, truth = invented_network(n, 25, 1)
        tracemalloc.start()
        wall, cpu = time.perf_counter(), time.process_time()
        result = adjust_network(value, station, loop, hours, known)
        wall, cpu = time.perf_counter() - wall, time.process_time() - cpu
        peak = tracemalloc.get_traced_memory()[1] / 2**20
        tracemalloc.stop()
        error = float(np.nanmax(np.abs(result.gravity - truth)))
        print(f"{n:8d}  {len(value):8d}  {int(loop.max()) + 1:5d}  {wall:6.2f}  {cpu:5.2f}  {peak:8.1f}  {error:.4f}")
    print(f"load average {os.getloadavg()[0]:.2f}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
