# SPDX-License-Identifier: GPL-2.0-or-later
"""The bundled demo readings are what demo/make_readings.py generates (invented data)."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parents[2]


def test_bundled_readings_regenerate_identically(tmp_path):
    pytest.importorskip("osgeo", reason="the generator writes a GeoPackage through GDAL")
    completed = subprocess.run(
        [sys.executable, str(ROOT / "demo" / "make_readings.py"), "--out", str(tmp_path)],
        capture_output=True, text=True, timeout=120,
    )
    assert completed.returncode == 0, completed.stderr
    for name in ("corvahl_readings.csv", "corvahl_calibration.csv"):
        assert (tmp_path / name).read_bytes() == (ROOT / "demo" / "data" / name).read_bytes(), name
    text = (ROOT / "demo" / "data" / "corvahl_readings.csv").read_text()
    assert "D06b" in text and "tare" in text  # the tare day is split in two loops
