# SPDX-License-Identifier: GPL-2.0-or-later
"""The batch runner under faults: a worker killed, a run interrupted and
resumed, a VRT mosaic of tiles; its partition, flags and imports."""

from __future__ import annotations

import json
import os
import signal
import subprocess
import sys
from pathlib import Path

import numpy as np
import pytest

pytest.importorskip("distributed", reason="python3-distributed not installed (tools/setup.sh installs it)")

REPO = Path(__file__).resolve().parents[2]


def _argv(survey, out, *extra):
    return ["reduce", "--stations", survey["stations"], "--gravity-field", "g", "--height-field", "h",
            "--dem", survey["dem"], "--outer-radius", "6000", "--inner-radius", "1000", "--output", str(out),
            "--quiet", *extra]


def _record(path):
    from relief_gravity.plugin.provenance import read_record

    record = read_record(str(path))
    for step in record["steps"]:
        step.pop("time")
        step["parameters"].pop("OUTPUT", None)
    return record


def _same_result(a, b, rows_of):
    names_a, rows_a = rows_of(a)
    names_b, rows_b = rows_of(b)
    assert names_a == names_b
    assert rows_a == rows_b  # bit for bit: every value, geometry and fid
    assert _record(a) == _record(b)


@pytest.fixture(scope="module")
def reference(small_survey, tmp_path_factory, dask_address):
    from relief_gravity.batch.cli import main

    out = tmp_path_factory.mktemp("reference") / "ref.gpkg"
    before = {k: _digest(small_survey[k]) for k in ("stations", "dem")}
    listing = sorted(p.name for p in Path(small_survey["dem"]).parent.iterdir())
    assert main(_argv(small_survey, out, "--scheduler", dask_address, "--chunk-size", "12")) == 0
    # Inputs untouched: same bytes, no side files (.aux.xml, locks) beside them.
    assert {k: _digest(small_survey[k]) for k in ("stations", "dem")} == before
    assert sorted(p.name for p in Path(small_survey["dem"]).parent.iterdir()) == listing
    return out


def _digest(path):
    import hashlib

    return hashlib.sha256(Path(path).read_bytes()).hexdigest()


def test_reference_run_is_complete(reference, rows_of, small_survey):
    _, rows = rows_of(reference)
    assert len(rows) == small_survey["n"]
    assert sum(r["cba"] is not None for r in rows) > 200
    # The 8 km DEM does not fill the 6 km disc around most stations; the
    # invented heights are ellipsoidal while --dem-datum defaults to EGM96, so
    # stations differ from the DEM by the geoid height (height_dem_mismatch).
    codes = {c for r in rows for c in (r["qc_flag"] or "").split(";") if c}
    assert {"tc_partial", "no_height"} <= codes <= {"tc_partial", "no_height", "height_dem_mismatch", "tc_gap_inner"}
    assert not Path(str(reference) + ".parts").exists()


def test_worker_killed_mid_run_does_not_change_the_result(small_survey, tmp_path, reference, rows_of):
    """A LocalCluster of 2 processes; one worker killed by its pid after the
    first chunk. Its tasks run again on the restarted or the other worker."""
    from relief_gravity.batch.cli import main

    killed = []

    def kill_one(done, client):
        if done == 1:
            pids = sorted(client.run(os.getpid).values())
            os.kill(pids[0], signal.SIGKILL)
            killed.append(pids[0])

    out = tmp_path / "killed.gpkg"
    assert main(_argv(small_survey, out, "--workers", "2", "--chunk-size", "12"), on_chunk=kill_one) == 0
    assert killed
    with pytest.raises(ProcessLookupError):
        os.kill(killed[0], 0)
    _same_result(reference, out, rows_of)


def test_interrupted_run_resumes_without_recomputing(small_survey, tmp_path, reference, rows_of, dask_address, capsys):
    from relief_gravity.batch.cli import main

    out = tmp_path / "resumed.gpkg"
    argv = _argv(small_survey, out, "--scheduler", dask_address, "--chunk-size", "12")

    def interrupt(done, client):
        if done == 5:
            raise KeyboardInterrupt

    assert main(argv, on_chunk=interrupt) == 130
    assert "run the same command again to resume" in capsys.readouterr().err
    assert not out.exists()
    parts = Path(str(out) + ".parts")
    saved = sorted(parts.glob("part-*.npz"))
    assert len(saved) >= 5
    stamps = {p.name: p.stat().st_mtime_ns for p in saved}
    manifest = json.loads((parts / "manifest.json").read_text())

    computed = []
    assert main(argv, on_chunk=lambda done, client: computed.append(done)) == 0
    assert f"resuming: {len(saved)} chunks already computed" in capsys.readouterr().out
    assert len(computed) == manifest["chunks"] - len(saved)
    _same_result(reference, out, rows_of)
    assert not parts.exists()
    assert stamps  # the saved parts were used as they were (not rewritten before assembly)


def test_vrt_mosaic_of_tiles_gives_the_same_result(small_survey, tmp_path, reference, rows_of, dask_address):
    from osgeo import gdal

    from relief_gravity.batch.cli import main

    tiles = []
    for i in range(4):
        for j in range(4):
            path = str(tmp_path / f"tile_{i}_{j}.tif")
            gdal.Translate(path, small_survey["dem"], srcWin=[j * 20, i * 20, 20, 20])
            tiles.append(path)
    vrt = str(tmp_path / "mosaic.vrt")
    gdal.BuildVRT(vrt, tiles)
    out = tmp_path / "vrt.gpkg"
    argv = _argv(small_survey, out, "--scheduler", dask_address, "--chunk-size", "12")
    argv[argv.index("--dem") + 1] = vrt
    assert main(argv) == 0
    _, rows_a = rows_of(reference)
    _, rows_b = rows_of(out)
    assert rows_a == rows_b


def test_partition_is_compact_complete_and_stable():
    from relief_gravity.batch.partition import partition

    rng = np.random.default_rng(3)
    x = rng.uniform(0, 100_000, 5000)
    y = rng.uniform(0, 50_000, 5000)
    x[::97] = np.nan
    chunks = partition(x, y, 64)
    joined = np.concatenate(chunks)
    assert sorted(joined.tolist()) == list(range(5000))
    assert all(len(c) <= 64 for c in chunks)
    placed = [c for c in chunks if np.isfinite(x[c]).all()]
    # Compact: a chunk of 64 of ~4950 spread stations covers about 1/77 of the area.
    areas = [np.ptp(x[c]) * np.ptp(y[c]) for c in placed]
    assert np.median(areas) < 100_000 * 50_000 / 77 * 2.0
    assert all(np.array_equal(a, b) for a, b in zip(chunks, partition(x, y, 64), strict=True))


def test_every_engine_reason_has_a_flag_code():
    from relief_gravity.algorithms.qc import VOCABULARY
    from relief_gravity.batch.flags import REASON_CODES, code_of, note_of

    assert set(REASON_CODES.values()) <= set(VOCABULARY)
    assert code_of("partial coverage 37%") == "tc_partial"
    assert code_of("3 compartments without data") == "tc_no_data_zones"
    assert code_of("tc_partial") == "tc_partial"
    with pytest.raises(KeyError):
        code_of("something new")
    assert note_of("no_height;tc_partial").startswith("No station height")


def test_the_batch_package_never_imports_qgis(tmp_path):
    link = tmp_path / "relief_gravity"
    link.symlink_to(REPO, target_is_directory=True)
    code = (
        "import sys\n"
        "class Block:\n"
        "    def find_spec(self, name, path=None, target=None):\n"
        "        if name == 'qgis' or name.startswith(('qgis.', 'PyQt')):\n"
        "            raise ImportError('qgis blocked')\n"
        "sys.meta_path.insert(0, Block())\n"
        "import relief_gravity.batch.cli, relief_gravity.batch.runner, relief_gravity.batch.tasks\n"
        "print('ok')\n"
    )
    env = dict(os.environ, PYTHONPATH=str(tmp_path))
    done = subprocess.run([sys.executable, "-c", code], env=env, capture_output=True, text=True, timeout=60)
    assert done.returncode == 0 and done.stdout.strip() == "ok", done.stderr


def test_progress_line_states_count_rate_and_time_left():
    import io

    from relief_gravity.batch.runner import Progress

    stream = io.StringIO()
    p = Progress(1000, 100, True, stream)
    p.t0 -= 10.0
    p.add(200)
    line = stream.getvalue()
    assert "300/1,000 stations" in line and "20.0/s" in line and "00:00:35 left" in line


def test_provenance_record_follows_the_input_record(small_survey, tmp_path, reference, dask_address):
    import shutil

    from relief_gravity.batch.cli import main
    from relief_gravity.plugin.provenance import chained, make_step, write_record

    alone = _record(reference)
    assert [step["algorithm"] for step in alone["steps"]] == ["reliefgravity:bouguerreduction"]
    settings = alone["steps"][0]["settings"]
    assert settings["runner"] == "relief_gravity.batch" and settings["normal_gravity"] == "grs80"
    assert alone["steps"][0]["parameters"]["GRAVITY_FIELD"] == "g"

    stations = tmp_path / "with_record.gpkg"
    shutil.copy(small_survey["stations"], stations)
    write_record(str(stations), chained(None, make_step("reliefgravity:observedgravity", {"X": 1}, {})), "stations")
    survey = dict(small_survey, stations=str(stations))
    out = tmp_path / "chained.gpkg"
    assert main(_argv(survey, out, "--scheduler", dask_address, "--chunk-size", "120")) == 0
    assert [step["algorithm"] for step in _record(out)["steps"]] == ["reliefgravity:observedgravity", "reliefgravity:bouguerreduction"]


def test_parquet_output_where_gdal_has_the_driver(small_survey, tmp_path, dask_address, capsys):
    from osgeo import ogr

    from relief_gravity.batch.cli import main

    out = tmp_path / "out.parquet"
    argv = _argv(small_survey, out, "--scheduler", dask_address)
    if ogr.GetDriverByName("Parquet") is None:
        assert main(argv) == 1
        assert "has no Parquet driver" in capsys.readouterr().err
        return
    assert main(argv) == 0
    assert ogr.Open(str(out)).GetLayer(0).GetFeatureCount() == small_survey["n"]


def test_partition_doctest():
    import doctest

    import relief_gravity.batch.partition as module

    result = doctest.testmod(module)
    assert result.attempted > 0 and result.failed == 0


def test_module_entry_point_and_checkout_launcher(tmp_path, small_survey, reference, rows_of):
    """``python3 -m relief_gravity.batch`` with the plugin folder's parent on
    PYTHONPATH, and ``tools/batch.py`` from the checkout (its own local cluster)."""
    link = tmp_path / "plugins" / "relief_gravity"
    link.parent.mkdir()
    link.symlink_to(REPO, target_is_directory=True)
    env = dict(os.environ, PYTHONPATH=str(link.parent))
    shown = subprocess.run([sys.executable, "-m", "relief_gravity.batch", "reduce", "--help"], env=env, capture_output=True, text=True, timeout=60)
    assert shown.returncode == 0 and "--gravity-field" in shown.stdout and "--normal-gravity" in shown.stdout
    out = tmp_path / "launched.gpkg"
    argv = _argv(small_survey, out, "--workers", "1", "--chunk-size", "60")
    env = {k: v for k, v in os.environ.items() if k != "PYTHONPATH"}
    done = subprocess.run([sys.executable, str(REPO / "tools" / "batch.py"), *argv], env=env, capture_output=True, text=True, timeout=120, cwd=tmp_path)
    assert done.returncode == 0, done.stderr
    assert "Peak memory per worker" in done.stdout
    _, rows_a = rows_of(reference)
    _, rows_b = rows_of(out)
    assert rows_a == rows_b
