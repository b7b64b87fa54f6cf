# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain-correction benchmark: accuracy, speed and memory of the engine.

One run of ``python3 bench/bench_terrain.py`` (add ``--quick`` for a smoke
run) builds the rugged scenario of ``terrain_scenario.py`` and prints, every
figure measured in that run:

1. accuracy against the exact reference (``terrain_reference.py``) on a
   sample of stations: RMS and max of ``tc_total`` beyond the innermost 100 m,
   for the engine and for the peer; plus the innermost models (the engine's
   model of the station's own cell against a flat-topped prism and the
   bilinear surface; and the same two surface models over the whole 100 m
   disc);
2. speed: stations per second of the engine on 10,000 stations and of the
   peer (``terrain_peer.py``, run in ``bench/.venv-peer``) on a stated number
   of stations, and their ratio;
3. peak memory of the engine run (VmHWM of a fresh process);
4. growth of the engine's time from 1,000 to 10,000 stations.

How "beyond the innermost 100 m" is compared: the engine models only a square
of one cell side centred on the station specially (a plane through the
station, or ``innermost_tc``); everything else is flat-topped DEM cells, exact
prisms near the station. The engine is therefore run with ``innermost_tc`` set
to the reference's flat-topped prisms of that same square, so that engine and
reference describe the same terrain everywhere, and the reference's 0-100 m
part (exact flat-topped prisms) is taken out of both: the error printed is the
engine's error beyond 100 m plus any error it makes between that square and
100 m (exact prisms in the engine, so in practice it is the former).
The peer has no innermost model (flat-topped cells throughout), so it is
compared as it is. The engine's default result, with its plane model, is
printed beside it, and the innermost contributions are printed on their own.

Results are also written to ``bench/output/terrain.txt``.
"""

from __future__ import annotations

import argparse
import concurrent.futures
import json
import multiprocessing
import os
import platform
import subprocess
import sys
import time
from pathlib import Path

import numpy as np

BENCH = Path(__file__).resolve().parent
REPO_ROOT = BENCH.parent
OUTPUT = BENCH / "output" / "terrain.txt"
PEER_PYTHON = BENCH / ".venv-peer" / "bin" / "python"

#: Registers the checkout as ``relief_gravity`` exactly as tests/conftest.py
#: does; also sent to the worker processes, so nothing generic goes on
#: sys.path.
REGISTER = f"""
import importlib.util, sys
if "relief_gravity" not in sys.modules:
    _spec = importlib.util.spec_from_file_location(
        "relief_gravity", {str(REPO_ROOT / "__init__.py")!r},
        submodule_search_locations=[{str(REPO_ROOT)!r}])
    _mod = importlib.util.module_from_spec(_spec)
    sys.modules["relief_gravity"] = _mod
    _spec.loader.exec_module(_mod)
"""
exec(REGISTER)  # the same few lines the workers run

#: Peak resident memory of the calling process in bytes: VmHWM belongs to the
#: process's own address space, so unlike ru_maxrss it does not carry over
#: the parent's size through fork and exec.
PEAK_RSS = """
def peak_rss():
    with open("/proc/self/status") as fh:
        for line in fh:
            if line.startswith("VmHWM:"):
                return int(line.split()[1]) * 1024
    import resource
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024
"""

from relief_gravity.bench import terrain_reference, terrain_scenario  # noqa: E402

#: Accuracy targets of issue 3 (mGal), memory target (bytes), speed ratio.
RMS_TARGET = 0.02
MAX_TARGET = 0.05
MEMORY_TARGET = 3 * 1024**3
RATIO_TARGET = 25.0
EXCLUDE_RADIUS = 100.0

# Worker body for engine timing: a fresh process per size, so its peak
# resident memory (VmHWM) is that of the run alone. The rasters are read by
# windows of memory-mapped .npy files, as the plugin reads GDAL rasters, so the figure is
# the engine's memory and not that of building the scenario.
ENGINE_WORKER = REGISTER + PEAK_RSS + """
import json, sys, time
import numpy as np
from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction
n = int(sys.argv[1])
meta = json.loads(sys.argv[2])

def grid(path, west, north, cell):
    data = np.load(path, mmap_mode="r")
    def reader(row0, col0, n_rows, n_cols):
        return np.array(data[row0:row0 + n_rows, col0:col0 + n_cols], dtype=float)
    return ElevationGrid(west, north, cell, cell, data.shape[0], data.shape[1], reader)

fine = grid(meta["fine"], meta["fine_west"], meta["fine_north"], meta["fine_cell"])
regional = grid(meta["regional"], meta["regional_west"], meta["regional_north"], meta["regional_cell"])
x, y, h = np.load(meta["stations"])[:, :n]
base_rss = peak_rss()
cpu0 = time.process_time()
t0 = time.perf_counter()
res = terrain_correction(x, y, h, fine, regional)
wall = time.perf_counter() - t0
cpu = time.process_time() - cpu0
peak = peak_rss()
print(json.dumps({"n": n, "wall": wall, "cpu": cpu, "peak_rss": peak, "base_rss": base_rss,
                  "finite": int(np.isfinite(res.tc_total).sum())}))
"""

# Worker body for the Processing algorithm: a fresh process that starts QGIS,
# loads the plugin as qgis_process does, and runs reliefgravity:terraincorrection
# on GeoTIFF rasters and a GeoPackage of stations. "start-up" is everything from
# the process's first line to the algorithm's call (QGIS, Processing, plugin).
PROCESSING_WORKER = """
import time
t_start = time.perf_counter()
import json, os, sys, tempfile
os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
from qgis.core import QgsApplication
app = QgsApplication([], False)
app.initQgis()
sys.path.append(QgsApplication.pkgDataPath() + "/python/plugins")
from processing.core.Processing import Processing
Processing.initialize()
import processing
""" + REGISTER + """
import relief_gravity
plugin = relief_gravity.classFactory(None)
plugin.initProcessing()
meta = json.loads(sys.argv[1])
t_ready = time.perf_counter()
cpu_ready = time.process_time()
out = os.path.join(meta["folder"], "out.gpkg")
res = processing.run("reliefgravity:terraincorrection", {
    "INPUT": meta["stations"], "HEIGHT_FIELD": "h", "DEM": meta["fine"], "REGIONAL_DEM": meta["regional"],
    "OUTPUT": out})
t_done = time.perf_counter()
cpu_done = time.process_time()
print(json.dumps({"startup": t_ready - t_start, "run": t_done - t_ready, "total": t_done - t_start,
                  "cpu_run": cpu_done - cpu_ready, "cpu_total": cpu_done,
                  "computed": res["STATIONS_COMPUTED"]}))
plugin.unload()
app.exitQgis()
"""

# Worker body for the peer, run by bench/.venv-peer/bin/python.
PEER_WORKER = REGISTER + PEAK_RSS + """
import json, sys, time
import numba
from relief_gravity.bench import terrain_scenario, terrain_peer
n_time, n_acc, n_check = (int(a) for a in sys.argv[1:4])
scn = terrain_scenario.build()
peer = terrain_peer.Peer(scn)
x, y, h = scn.stations(max(n_time, n_acc))
t0 = time.perf_counter()
peer.compute(x[:1], y[:1], h[:1])  # numba compilation, not timed
compile_s = time.perf_counter() - t0
cpu0 = time.process_time()
t0 = time.perf_counter()
tc = peer.compute(x[:n_time], y[:n_time], h[:n_time])
wall = time.perf_counter() - t0
cpu = time.process_time() - cpu0
if n_acc > n_time:
    tc = list(tc) + list(peer.compute(x[n_time:n_acc], y[n_time:n_acc], h[n_time:n_acc]))
checks = []
for i in range(n_check):
    hm, count = peer.harmonica_one_station(x[i], y[i], h[i])
    checks.append((float(tc[i]), hm, count))
import choclo, harmonica
print(json.dumps({"n_time": n_time, "wall": wall, "cpu": cpu, "compile": compile_s,
                  "tc": [float(v) for v in tc[:n_acc]], "checks": checks,
                  "threads": numba.get_num_threads(),
                  "versions": {"numba": numba.__version__, "choclo": choclo.__version__,
                               "harmonica": harmonica.__version__},
                  "peak_rss": peak_rss()}))
"""


class Report:
    """Prints and keeps every line for bench/output/terrain.txt."""

    def __init__(self) -> None:
        self.lines: list[str] = []

    def __call__(self, text: str = "") -> None:
        """Print ``text`` at once and keep it for the report file."""
        print(text, flush=True)
        self.lines.append(text)

    def save(self) -> None:
        """Write every kept line to ``OUTPUT``."""
        OUTPUT.parent.mkdir(parents=True, exist_ok=True)
        OUTPUT.write_text("\n".join(self.lines) + "\n")


def _load() -> str:
    a, b, c = os.getloadavg()
    return f"load average {a:.2f} {b:.2f} {c:.2f} on {os.cpu_count()} cores"


def _revision() -> str:
    """Commit of the checkout, and whether the engine has uncommitted edits."""
    try:
        head = subprocess.run(["git", "rev-parse", "--short", "HEAD"], capture_output=True, text=True,
                              cwd=str(REPO_ROOT), timeout=30).stdout.strip()
        dirty = subprocess.run(["git", "diff", "--quiet", "HEAD", "--", "algorithms/terrain"],
                               cwd=str(REPO_ROOT), timeout=30).returncode
        untracked = subprocess.run(["git", "ls-files", "--others", "--exclude-standard", "algorithms/terrain"],
                                   capture_output=True, text=True, cwd=str(REPO_ROOT), timeout=30).stdout.strip()
    except (OSError, subprocess.SubprocessError):
        return "revision unknown"
    state = (
        "with uncommitted changes in algorithms/terrain" if dirty or untracked else "algorithms/terrain as committed"
    )
    return f"checkout {head or '?'}, {state}"


def _run_json(cmd: list[str], timeout: float | None = None) -> dict:
    proc = subprocess.run(cmd, capture_output=True, text=True, timeout=timeout, cwd=str(REPO_ROOT))
    if proc.returncode != 0:
        msg = f"{cmd[0]} failed ({proc.returncode}):\n{proc.stderr[-3000:]}"
        raise RuntimeError(msg)
    return json.loads(proc.stdout.strip().splitlines()[-1])


# Reference workers: forked after the scenario is built, so they share it.
_REF: terrain_reference.Reference | None = None
_STATIONS: tuple[np.ndarray, np.ndarray, np.ndarray] | None = None


def _processing_run(scn, x, y, h) -> dict:
    """Run the Processing algorithm in a fresh process on GeoTIFF/GeoPackage copies of the scenario."""
    import tempfile

    from osgeo import gdal, ogr, osr

    with tempfile.TemporaryDirectory(prefix="rg-bench-") as folder:
        srs = osr.SpatialReference()
        srs.ImportFromEPSG(32632)  # the scenario's UTM-like metres; the CRS only has to be projected
        paths = {}
        for name, data, west, north, cell in (("fine", scn.fine, scn.fine_west, scn.fine_north, scn.fine_cell),
                                              ("regional", scn.regional, scn.regional_west, scn.regional_north,
                                               scn.regional_cell)):
            path = os.path.join(folder, f"{name}.tif")
            ds = gdal.GetDriverByName("GTiff").Create(path, data.shape[1], data.shape[0], 1, gdal.GDT_Float64)
            ds.SetGeoTransform((west, cell, 0.0, north, 0.0, -cell))
            ds.SetProjection(srs.ExportToWkt())
            ds.GetRasterBand(1).WriteArray(data)
            ds = None
            paths[name] = path
        stations = os.path.join(folder, "stations.gpkg")
        src = ogr.GetDriverByName("GPKG").CreateDataSource(stations)
        layer = src.CreateLayer("stations", srs, ogr.wkbPoint)
        layer.CreateField(ogr.FieldDefn("h", ogr.OFTReal))
        layer.StartTransaction()
        for xi, yi, hi in zip(x, y, h, strict=True):
            feature = ogr.Feature(layer.GetLayerDefn())
            feature.SetField("h", float(hi))
            point = ogr.Geometry(ogr.wkbPoint)
            point.AddPoint_2D(float(xi), float(yi))
            feature.SetGeometry(point)
            layer.CreateFeature(feature)
        layer.CommitTransaction()
        src = None
        meta = {"folder": folder, "stations": stations, **paths}
        return _run_json([sys.executable, "-c", PROCESSING_WORKER, json.dumps(meta)])


def _reference_chunk(idx: list[int]) -> tuple[list[int], np.ndarray, np.ndarray, np.ndarray]:
    x, y, h = (a[idx] for a in _STATIONS)
    r = _REF.compute(x, y, h)
    return idx, r.beyond, r.within, r.outer


def _stats(err: np.ndarray) -> tuple[float, float]:
    return float(np.sqrt(np.mean(err**2))), float(np.max(np.abs(err)))


def _verdict(ok: bool) -> str:
    return "meets target" if ok else "MISSES target"


def _engine_accuracy(out, scn, xa, ya, ha, own, within, beyond, ref_outer, terrain_correction, ElevationGrid):
    """Engine against the reference on the accuracy sample; returns (RMS, max)."""
    n_acc = xa.size
    fine = ElevationGrid.from_array(scn.fine, scn.fine_west, scn.fine_north, scn.fine_cell, scn.fine_cell)
    regional = ElevationGrid.from_array(scn.regional, scn.regional_west, scn.regional_north,
                                        scn.regional_cell, scn.regional_cell)
    t0 = time.perf_counter()
    same_cell = terrain_correction(xa, ya, ha, fine, regional, innermost_tc=own["flat"])
    default = terrain_correction(xa, ya, ha, fine, regional)
    no_cell = terrain_correction(xa, ya, ha, fine, regional, innermost_tc=np.zeros(n_acc))
    engine_cell = default.tc_total - no_cell.tc_total
    err = (same_cell.tc_total - within) - beyond
    rms, mx = _stats(err)
    out(f"\n[engine accuracy] {n_acc} stations (3 engine runs in {time.perf_counter() - t0:.0f} s), "
        f"tc_total beyond the innermost 100 m minus reference:")
    out(f"  RMS {rms:.4f} mGal, max |error| {mx:.4f} mGal, mean {err.mean():+.4f}  "
        f"(targets RMS <= {RMS_TARGET}, max <= {MAX_TARGET}: "
        f"{_verdict(rms <= RMS_TARGET and mx <= MAX_TARGET)})")
    e_out = same_cell.tc_outer - ref_outer
    e_in = err - e_out
    out(f"  by zone: tc_inner (cell centres within 2 km) RMS {_stats(e_in)[0]:.4f}, max {_stats(e_in)[1]:.4f}; "
        f"tc_outer RMS {_stats(e_out)[0]:.4f}, max {_stats(e_out)[1]:.4f} mGal")
    flags = sorted({f for f in default.flags if f})
    out(f"  flags: {flags or 'none'}; coverage {np.nanmin(default.coverage):.4f}-{np.nanmax(default.coverage):.4f}")
    fine_only = terrain_correction(xa, ya, ha, fine, None)
    missing = default.tc_total - fine_only.tc_total
    est = fine_only.truncation
    err_t = est - missing
    corr = float(np.corrcoef(est, missing)[0, 1]) if n_acc > 2 else float("nan")
    out(f"\n[truncation] fine DEM alone (coverage {np.nanmean(fine_only.coverage):.3f} of the 166.7 km disc): "
        f"the regional part it misses is {missing.mean():+.3f} mGal on average "
        f"({missing.min():+.3f}..{missing.max():+.3f});")
    out(f"  the engine's estimate from the relief at the edge of coverage: {est.mean():+.3f} ({est.min():+.3f}.."
        f"{est.max():+.3f}); estimate - missing: mean {err_t.mean():+.3f}, RMS {_stats(err_t)[0]:.3f}, "
        f"max |.| {_stats(err_t)[1]:.3f} mGal; correlation {corr:.2f}; estimate >= missing at "
        f"{int(np.sum(est >= missing))} of {n_acc} stations")
    out("\n[innermost ring] the 30 m square centred on the station (the engine's innermost model), "
        "mean over the sample (min..max), mGal:")
    d_flat = engine_cell - own["flat"]
    d_bil = engine_cell - own["bilinear_half"]
    out(f"  engine plane model {engine_cell.mean():.4f} ({engine_cell.min():.4f}..{engine_cell.max():.4f}); "
        f"flat-topped cells {own['flat'].mean():.4f}; bilinear surface {own['bilinear_half'].mean():.4f} "
        f"(halving its sub-prisms changes it by at most "
        f"{np.max(np.abs(own['bilinear_half'] - own['bilinear'])):.4f})")
    out(f"  engine - flat-topped: RMS {_stats(d_flat)[0]:.4f}, max |.| {_stats(d_flat)[1]:.4f}; "
        f"engine - bilinear: RMS {_stats(d_bil)[0]:.4f}, max |.| {_stats(d_bil)[1]:.4f}")
    err_def = (default.tc_total - within) - beyond
    out(f"  engine default tc_total (its plane model) minus reference with flat-topped cells: "
        f"mean {err_def.mean():+.4f}, RMS {_stats(err_def)[0]:.4f}, max |.| {_stats(err_def)[1]:.4f} "
        f"(the innermost-square model difference, not an error beyond 100 m)")
    return rms, mx


def main(argv: list[str] | None = None) -> int:
    """Run the accuracy, timing and (optionally) peer and Processing benchmarks; write the report.

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
    parser.add_argument("--quick", action="store_true",
                        help="smoke run: 4 accuracy stations, engine 50 -> 200 stations, peer 20")
    parser.add_argument("--accuracy-stations", type=int, help="stations compared with the reference (default 80)")
    parser.add_argument("--small", type=int, help="engine stations of the small timing run (default 1,000)")
    parser.add_argument("--large", type=int, help="engine stations of the large timing run (default 10,000)")
    parser.add_argument("--peer-stations", type=int,
                        help="stations behind the peer's rate (default 1,000; 10,000 take tens of minutes)")
    parser.add_argument("--skip-peer", action="store_true", help="no peer (no bench/.venv-peer needed)")
    parser.add_argument("--processing", type=int,
                        help="stations run through the Processing algorithm (default 2,000; 0 skips it)")
    args = parser.parse_args(argv)
    n_acc = args.accuracy_stations or (4 if args.quick else 80)
    n_small = args.small or (50 if args.quick else 1_000)
    n_large = args.large or (200 if args.quick else 10_000)
    n_peer = args.peer_stations or (20 if args.quick else 1_000)
    if args.processing is None:
        args.processing = 100 if args.quick else 2_000

    out = Report()
    out(f"Relief Gravity terrain-correction benchmark{' (quick mode)' if args.quick else ''}")
    out(f"{time.strftime('%Y-%m-%d %H:%M:%S UTC', time.gmtime())}; Python {platform.python_version()}, "
        f"numpy {np.__version__}; {_load()}")
    out(_revision())
    t_start = time.perf_counter()
    scn = terrain_scenario.build()
    out(scn.describe())
    x, y, h = scn.stations(max(n_acc, n_large, n_small))
    out(f"stations on the surface over the central 20 x 20 km; accuracy sample: the first {n_acc}")
    xa, ya, ha = x[:n_acc], y[:n_acc], h[:n_acc]

    # --- reference ---------------------------------------------------------
    global _REF, _STATIONS
    _REF = terrain_reference.Reference(scn, exclude_radius=EXCLUDE_RADIUS)
    _STATIONS = (xa, ya, ha)
    t0 = time.perf_counter()
    beyond = np.empty(n_acc)
    within = np.empty(n_acc)
    ref_outer = np.empty(n_acc)
    chunks = [list(range(i, n_acc, 2 * max(1, os.cpu_count() or 1))) for i in range(2 * max(1, os.cpu_count() or 1))]
    chunks = [c for c in chunks if c]
    ctx = multiprocessing.get_context("fork")
    with concurrent.futures.ProcessPoolExecutor(max_workers=os.cpu_count() or 1, mp_context=ctx) as pool:
        for idx, b, w, o in pool.map(_reference_chunk, chunks):
            beyond[idx] = b
            within[idx] = w
            ref_outer[idx] = o
    ref_total = beyond + within
    out(f"\n[reference] exact prisms of all {scn.fine.size:,} fine cells + regional cells in "
        f"{_REF.regional_sub}x{_REF.regional_sub} sub-prisms to 166.735 km, curvature s^2/2R; "
        f"{n_acc} stations in {time.perf_counter() - t0:.0f} s")
    curv = terrain_reference.curvature_check()
    out("  curvature check, 1 x 1 km x 500 m column on the station's sphere, TC contribution (mGal): "
        + ", ".join(f"{d / 1000:g} km {v:+.6f}" for d, v in curv)
        + " (docs/terrain.md section 6, harmonica 0.7.0 prism lowered by s^2/2R: +0.002162, +0.000004, -0.000005)")
    conv = _REF.convergence(xa[:2], ya[:2], ha[:2])
    out(f"  convergence on 2 stations: halving the regional sub-prisms changes TC beyond 100 m by "
        f"{conv['regional_halving_max']:.1e} mGal; halving the 100 m-circle sub-prisms by "
        f"{conv['clip_halving_max']:.1e} mGal")
    out(f"  tc_total (flat-topped cells everywhere): {ref_total.min():.3f} to {ref_total.max():.3f} mGal; "
        f"part within 100 m {within.min():.3f} to {within.max():.3f}; beyond 100 m "
        f"{beyond.min():.3f} to {beyond.max():.3f}")
    own = terrain_reference.station_square_models(scn, xa, ya, ha)
    disc = terrain_reference.innermost_models(scn, xa, ya, ha, EXCLUDE_RADIUS)

    # --- engine accuracy --------------------------------------------------
    results = {}
    try:
        from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction
    except ImportError as exc:  # the engine is not there yet
        out(f"\n[engine] not available ({exc}); engine figures skipped")
        terrain_correction = None
    if terrain_correction is not None:
        try:
            results["engine"] = _engine_accuracy(out, scn, xa, ya, ha, own, within, beyond, ref_outer,
                                                 terrain_correction, ElevationGrid)
        except Exception as exc:  # broad on purpose: the engine is work in progress; report, go on
            out(f"\n[engine accuracy] failed: {type(exc).__name__}: {exc}; engine figures skipped")
            terrain_correction = None
    dd = disc["flat"] - disc["bilinear_half"]
    out(f"  whole 0-100 m disc: flat-topped cells {disc['flat'].mean():.4f} vs bilinear surface "
        f"{disc['bilinear_half'].mean():.4f} mGal on average; difference RMS {_stats(dd)[0]:.4f}, "
        f"max |.| {_stats(dd)[1]:.4f} (halving changes the bilinear value by at most "
        f"{np.max(np.abs(disc['bilinear_half'] - disc['bilinear'])):.4f})")

    # --- peer -------------------------------------------------------------
    peer = None
    if args.skip_peer:
        out("\n[peer] skipped (--skip-peer)")
    elif not PEER_PYTHON.exists():
        out(f"\n[peer] {PEER_PYTHON} missing: run bash bench/setup_peer.sh; peer figures skipped")
    else:
        out(f"\n[peer] nested prisms with choclo's prism kernel (numba, parallel over stations); {_load()}")
        peer = _run_json([str(PEER_PYTHON), "-c", PEER_WORKER, str(n_peer), str(n_acc), "1"])
        err = np.array(peer["tc"]) - ref_total
        rms, mx = _stats(err)
        results["peer"] = (rms, mx)
        v = peer["versions"]
        out(f"  numba {v['numba']}, choclo {v['choclo']}, harmonica {v['harmonica']}, "
            f"{peer['threads']} threads; compile {peer['compile']:.1f} s (not timed)")
        c = peer["checks"][0]
        out(f"  check: station 0 by the numba loop {c[0]:.9f}, by harmonica.prism_gravity over the same "
            f"{c[2]:,} prisms {c[1]:.9f} mGal")
        out(f"  accuracy ({n_acc} stations; flat-topped cells everywhere, so compared whole): "
            f"RMS {rms:.4f}, max |error| {mx:.4f}, mean {err.mean():+.4f} mGal "
            f"({_verdict(rms <= RMS_TARGET and mx <= MAX_TARGET)})")
        out(f"  speed: {peer['n_time']:,} stations in {peer['wall']:.1f} s wall ({peer['cpu']:.1f} s CPU) = "
            f"{peer['n_time'] / peer['wall']:.2f} stations/s; peak RSS {peer['peak_rss'] / 2**20:.0f} MiB")

    # --- engine speed, memory, growth --------------------------------------
    if terrain_correction is not None:
        runs = {}
        files = {k: OUTPUT.parent / f"terrain_{k}.npy" for k in ("fine", "regional", "stations")}
        OUTPUT.parent.mkdir(parents=True, exist_ok=True)
        np.save(files["fine"], scn.fine)
        np.save(files["regional"], scn.regional)
        np.save(files["stations"], np.vstack([x, y, h]))
        meta = {k: str(v) for k, v in files.items()}
        meta.update(fine_west=scn.fine_west, fine_north=scn.fine_north, fine_cell=scn.fine_cell,
                    regional_west=scn.regional_west, regional_north=scn.regional_north,
                    regional_cell=scn.regional_cell)
        for n in (n_small, n_large):
            out(f"\n[engine speed] {n:,} stations in a fresh process, rasters read by windows "
                f"from memory-mapped files; {_load()}")
            r = _run_json([sys.executable, "-c", ENGINE_WORKER, str(n), json.dumps(meta)])
            runs[n] = r
            out(f"  {r['wall']:.1f} s wall ({r['cpu']:.1f} s CPU) = {n / r['wall']:.1f} stations/s; "
                f"peak RSS {r['peak_rss'] / 2**20:.0f} MiB (interpreter and imports before the call "
                f"{r['base_rss'] / 2**20:.0f} MiB); {r['finite']:,} finite results")
        for f in files.values():
            f.unlink()
        processing_run = None
        if args.processing > 0:
            out(f"\n[processing] {args.processing:,} stations through processing.run"
                "('reliefgravity:terraincorrection') in a fresh process (GeoTIFF rasters, GeoPackage stations); "
                f"{_load()}")
            try:
                processing_run = _processing_run(scn, x[:args.processing], y[:args.processing], h[:args.processing])
                out(f"  start-up (QGIS, Processing, plugin) {processing_run['startup']:.1f} s; algorithm "
                    f"{processing_run['run']:.1f} s; total {processing_run['total']:.1f} s = "
                    f"{args.processing / processing_run['total']:.1f} stations/s start-up included "
                    f"(CPU: algorithm {processing_run['cpu_run']:.1f} s, whole process "
                    f"{processing_run['cpu_total']:.1f} s); {processing_run['computed']:,} computed")
            except Exception as exc:  # broad on purpose: report and go on
                out(f"  failed: {type(exc).__name__}: {exc}")
                processing_run = None
        big = runs[n_large]
        small = runs[n_small]
        growth = big["wall"] / small["wall"]
        linear = n_large / n_small
        out("\n[summary]")
        e_rate = n_large / big["wall"]
        engine_ok = results["engine"][0] <= RMS_TARGET and results["engine"][1] <= MAX_TARGET
        out(f"  engine accuracy beyond 100 m: RMS {results['engine'][0]:.4f}, max {results['engine'][1]:.4f} mGal "
            f"over {n_acc} stations ({_verdict(engine_ok)})")
        if "peer" in results:
            out(f"  peer accuracy:                RMS {results['peer'][0]:.4f}, max {results['peer'][1]:.4f} mGal")
        out(f"  engine speed: {e_rate:.1f} stations/s over {n_large:,} stations "
            f"(CPU-time rate {n_large / big['cpu']:.1f} stations per CPU-second)")
        if peer is not None:
            p_rate = peer["n_time"] / peer["wall"]
            ratio = e_rate / p_rate
            cpu_ratio = (n_large / big["cpu"]) / (peer["n_time"] / peer["cpu"])
            out(f"  peer speed:   {p_rate:.2f} stations/s over {peer['n_time']:,} stations, both cores")
            out(f"  ratio engine/peer: {ratio:.1f}x wall-clock ({_verdict(ratio >= RATIO_TARGET)} >= "
                f"{RATIO_TARGET:g}x); {cpu_ratio:.1f}x per CPU-second")
            if processing_run is not None:
                p_ratio = (args.processing / processing_run["total"]) / p_rate
                p_cpu = (args.processing / processing_run["cpu_total"]) / (peer["n_time"] / peer["cpu"])
                out(f"  ratio Processing algorithm ({args.processing:,} stations, start-up included)/peer: "
                    f"{p_ratio:.1f}x wall-clock ({_verdict(p_ratio >= RATIO_TARGET)} >= {RATIO_TARGET:g}x); "
                    f"{p_cpu:.1f}x per CPU-second of the whole process; without QGIS start-up "
                    f"{(args.processing / processing_run['run']) / p_rate:.1f}x wall-clock")
        out(f"  peak memory: {big['peak_rss'] / 2**30:.2f} GiB (RSS, {n_large:,} stations) "
            f"({_verdict(big['peak_rss'] <= MEMORY_TARGET)} <= 3 GB)")
        out(f"  growth {n_small:,} -> {n_large:,} stations: time x{growth:.2f} for x{linear:g} stations "
            f"({'no worse than linear' if growth <= linear * 1.05 else 'WORSE than linear'})")
    out(f"\ntotal benchmark time {time.perf_counter() - t_start:.0f} s")
    out.save()
    print(f"written to {OUTPUT}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
