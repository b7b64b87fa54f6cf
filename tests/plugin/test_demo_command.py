# SPDX-License-Identifier: GPL-2.0-or-later
"""The README's demo command runs to the end, exits cleanly and writes its outputs."""

from __future__ import annotations

import os
import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parents[2]


def test_demo_runner_writes_outputs_and_exits_cleanly(tmp_path):
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen", HOME=str(tmp_path))
    env.pop("QGIS_CUSTOM_CONFIG_PATH", None)
    out = tmp_path / "demo_output"
    completed = subprocess.run(
        [sys.executable, str(ROOT / "demo" / "run_demo.py"), str(out)],
        capture_output=True,
        text=True,
        env=env,
        timeout=600,
    )
    assert completed.returncode == 0, completed.stdout[-3000:] + completed.stderr[-3000:]
    for name in ("observed_stations.gpkg", "reduced_readings.gpkg", "reduced_stations.gpkg", "cba_grid.tif", "cba_contours.gpkg", "cba_map.png"):
        assert (out / name).stat().st_size > 0, name
    assert "stations reduced            : 351 of 351" in completed.stdout
    assert "licensed practice" in completed.stdout
    # From raw readings: the recovered observed gravity is within the reading noise of the truth.
    line = next(x for x in completed.stdout.splitlines() if "g_obs - true gravity" in x)
    rms = float(line.split("rms")[1].split(",")[0])
    assert rms < 0.02, line
    assert "misclosure on the opening base" in completed.stdout
