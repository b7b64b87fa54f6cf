# SPDX-License-Identifier: GPL-2.0-or-later
"""Running a command on Dask: cluster, tasks, progress, resume, assembly.

Without a scheduler address the runner starts a ``dask.distributed``
LocalCluster of ``--workers`` processes (one thread each, a memory limit each:
the nanny restarts a worker above 95 % of it, and its task runs again
elsewhere). With ``--scheduler`` it uses that cluster; its workers must be
able to import ``relief_gravity`` and to read the same file paths.
"""

from __future__ import annotations

import importlib.machinery
import logging
import os
import shutil
import sys
import tempfile
import time
import uuid
import warnings
from pathlib import Path

import numpy as np

from ..algorithms.constants import GRAVITATIONAL_CONSTANT
from ..plugin import provenance
from .errors import BatchError
from .flags import note_of
from .options import COMMANDS
from .partition import footprint, partition
from .prepare import Plan, prepare
from .rasters import warp_to
from .store import Parts, fingerprint
from .tasks import run_chunk
from .vector import write_output

#: Failures of one task (its worker died) before the run gives up on it.
ALLOWED_FAILURES = 4


class Progress:
    """Stations done, rate and time left, on one line of stderr."""

    def __init__(self, total: int, already: int, enabled: bool, stream=None):
        self.total, self.done, self.start_done = total, already, already
        self.enabled = enabled
        self.stream = stream or sys.stderr
        self.tty = hasattr(self.stream, "isatty") and self.stream.isatty()
        self.t0 = time.monotonic()
        self.last = 0.0

    def line(self) -> str:
        """The progress line: bar, stations done, rate and time left."""
        elapsed = time.monotonic() - self.t0
        rate = (self.done - self.start_done) / elapsed if elapsed > 0 else 0.0
        left = (self.total - self.done) / rate if rate > 0 else float("nan")
        frac = self.done / self.total if self.total else 1.0
        bar = "#" * int(30 * frac) + "." * (30 - int(30 * frac))
        eta = time.strftime("%H:%M:%S", time.gmtime(left)) if np.isfinite(left) else "--:--:--"
        return f"[{bar}] {self.done:,}/{self.total:,} stations  {rate:,.1f}/s  {eta} left"

    def add(self, n: int) -> None:
        """Count ``n`` more stations done and show the line (at most every 0.2 s, 10 s without a terminal)."""
        self.done += n
        if not self.enabled:
            return
        now = time.monotonic()
        if self.tty:
            if now - self.last > 0.2 or self.done >= self.total:
                self.stream.write("\r" + self.line())
                self.stream.flush()
                self.last = now
        elif now - self.last > 10 or self.done >= self.total:
            self.stream.write(self.line() + "\n")
            self.stream.flush()
            self.last = now

    def close(self) -> None:
        """End the progress line."""
        if self.enabled and self.tty:
            self.stream.write("\n")


def importable_path() -> str | None:
    """Make ``relief_gravity`` importable by spawned worker processes.

    Worker processes start with the driver's ``sys.path``; when the package
    was loaded from a folder of another name (a checkout), a temporary folder
    holding a ``relief_gravity`` link to it is put first on that path.
    Returns that folder (to be removed afterwards) or None.
    """
    import relief_gravity

    root = Path(relief_gravity.__file__).resolve().parent
    spec = importlib.machinery.PathFinder.find_spec("relief_gravity", sys.path)
    locations = list(spec.submodule_search_locations or []) if spec is not None else []
    if locations and Path(locations[0]).resolve() == root:
        return None
    folder = tempfile.mkdtemp(prefix="relief_gravity_path_")
    os.symlink(root, os.path.join(folder, "relief_gravity"), target_is_directory=True)
    sys.path.insert(0, folder)
    os.environ["PYTHONPATH"] = folder + os.pathsep + os.environ.get("PYTHONPATH", "")
    return folder


def peak_memory() -> int:
    """Peak resident memory of this process (bytes; VmHWM on Linux)."""
    try:
        with open("/proc/self/status") as f:
            for line in f:
                if line.startswith("VmHWM:"):
                    return int(line.split()[1]) * 1024
    except OSError:
        pass
    import resource

    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024


def worker_usage() -> tuple[int, float]:
    """Peak resident memory (bytes) and CPU seconds of this worker process."""
    return peak_memory(), time.process_time()


def start_client(scheduler: str | None, workers: int, memory_limit: str):
    """A distributed Client (and the LocalCluster it owns, or None)."""
    import dask
    from distributed import Client, LocalCluster

    # Worker environment without distributed's default MALLOC_TRIM_THRESHOLD_:
    # setting it (to any value) turns off glibc's adaptive mmap threshold, and
    # the engine's many mid-sized numpy arrays then cost twice the CPU time
    # (measured: 10 vs 5 CPU-ms per station, bench/README.md).
    dask.config.set(
        {
            "distributed.scheduler.allowed-failures": ALLOWED_FAILURES,
            "distributed.worker.profile.enabled": False,
            "distributed.nanny.pre-spawn-environ": {
                "OMP_NUM_THREADS": 1,
                "MKL_NUM_THREADS": 1,
                "OPENBLAS_NUM_THREADS": 1,
            },
        }
    )
    if scheduler:
        try:
            return Client(scheduler, timeout=dask.config.get("distributed.comm.timeouts.connect")), None
        except (OSError, TimeoutError) as error:
            msg = f"Could not reach the Dask scheduler at {scheduler}: {error}"
            raise BatchError(msg) from error
    # With the dashboard off the scheduler still opens a small HTTP server;
    # when port 8787 is taken it picks another and warns: nothing to act on.
    warnings.filterwarnings("ignore", message="Port 8787 is already in use")
    cluster = LocalCluster(
        n_workers=workers,
        threads_per_worker=1,
        processes=True,
        memory_limit=memory_limit,
        dashboard_address=None,
        silence_logs=logging.ERROR,
    )
    return Client(cluster), cluster


def _payload(plan: Plan, index: int, rows: np.ndarray) -> dict:
    chunk = {"index": index, "rows": rows}
    for key, values in plan.arrays.items():
        chunk[key] = None if values is None else np.asarray(values)[rows]
    for key in ("a", "b", "c"):
        chunk["flags_" + key] = [plan.flags[key].get(i, []) for i in rows.tolist()]
    return chunk


def _settings(plan: Plan, args, n_chunks: int) -> dict:
    cfg = plan.config
    settings = {
        "runner": "relief_gravity.batch",
        "command": plan.command,
        "gravitational_constant": GRAVITATIONAL_CONSTANT,
        "reference_density": cfg["reference_density"],
        "inner_radius": cfg["inner_radius"],
        "outer_radius": cfg["outer_radius"],
        "chunk_size": args.chunk_size,
        "chunks": n_chunks,
        "flags": "qc codes of algorithms/qc.py",
    }
    for p in COMMANDS[plan.command][1]:
        if p.kind == "enum":
            settings[p.name.lower()] = p.words[plan.values[p.name]]
    return settings


def run(command: str, values: dict, args, *, log=print, on_chunk=None) -> dict:
    """Run a command to its output; returns a summary dict.

    ``on_chunk(done_chunks, client)`` is called after each chunk is saved
    (tests use it to kill a worker or interrupt the run).
    """
    parts = Parts(values["OUTPUT"])
    resuming = parts.exists()
    if args.workers < 1:
        msg = f"--workers must be at least 1, got {args.workers}."
        raise BatchError(msg)
    if args.chunk_size < 1:
        msg = f"--chunk-size must be at least 1, got {args.chunk_size}."
        raise BatchError(msg)
    from dask.utils import parse_bytes

    try:
        if parse_bytes(args.memory_limit) < 256 * 2**20:
            raise ValueError
    except (ValueError, TypeError):
        msg = f"--memory-limit must be a size of at least 256MiB, such as 2GiB; got {args.memory_limit!r}."
        raise BatchError(msg) from None
    plan = prepare(command, values, overwrite=args.overwrite, resuming=resuming)
    for text in plan.warnings:
        log("Warning: " + text)
    x, y = plan.positions
    chunks = partition(x, y, args.chunk_size)
    version = provenance.plugin_version()
    parts.open(fingerprint(command, values, args.chunk_size, plan.stations_path, version), len(chunks), plan.n)
    cfg = dict(plan.config)
    if "regional_warp" in cfg:
        warped = parts.file("regional_warped.tif")
        if not warped.exists():
            warp_to(plan.regional_source, *cfg["regional_warp"], str(warped))
        cfg["regional"] = str(warped)
        del cfg["regional_warp"]

    results: dict = {}
    for i, rows in enumerate(chunks):
        saved = parts.load(i, rows)
        if saved is not None:
            results[i] = saved
    todo = [i for i in range(len(chunks)) if i not in results]
    log(
        f"{plan.n:,} stations in {len(chunks):,} chunks of up to {args.chunk_size} "
        f"(mean chunk extent {footprint(x, y, chunks):,.0f} CRS units); "
        + (
            f"resuming: {len(results):,} chunks already computed in {parts.folder}."
            if resuming
            else f"parts in {parts.folder}."
        )
    )
    peaks: list = []
    if todo:
        peaks = _compute(plan, cfg, chunks, todo, results, parts, args, log, on_chunk)
    return _assemble(plan, args, chunks, results, parts, peaks, resumed=len(chunks) - len(todo), log=log)


def _compute(plan, cfg, chunks, todo, results, parts, args, log, on_chunk) -> list:
    from distributed import as_completed

    path_folder = None if args.scheduler else importable_path()
    client, cluster = start_client(args.scheduler, args.workers, args.memory_limit)
    progress = Progress(plan.n, sum(len(r["rows"]) for r in results.values()), not args.quiet)
    try:
        where = args.scheduler or f"a local cluster of {args.workers} worker process(es), {args.memory_limit} each"
        log(f"Computing {len(todo):,} chunks on {where}.")
        # A bounded number of tasks in flight keeps the driver's and the
        # scheduler's memory flat whatever the number of stations; chunks
        # come in partition order, so tasks in flight are neighbours.
        n_workers = max(len(client.scheduler_info().get("workers", {})), 1)
        window = max(4 * n_workers, 8)
        token = uuid.uuid4().hex[:8]
        pending = iter(todo)
        running = as_completed()

        def submit_next() -> None:
            i = next(pending, None)
            if i is not None:
                key = f"relief-gravity-{plan.command}-{token}-{i}"
                running.add(client.submit(run_chunk, _payload(plan, i, chunks[i]), cfg, key=key, retries=2, pure=False))

        for _ in range(window):
            submit_next()
        for done, future in enumerate(running, start=1):
            try:
                result = future.result()
            except Exception as error:
                name = type(error).__name__
                msg = (
                    f"A chunk failed ({name}: {error}). The {len(results):,} chunks computed so far are kept in "
                    f"{parts.folder}; run the same command again to resume."
                )
                raise BatchError(msg) from error
            submit_next()
            parts.save(result)
            results[result["index"]] = result
            progress.add(len(result["rows"]))
            if on_chunk is not None:
                on_chunk(done, client)
        progress.close()
        peaks = sorted(client.run(worker_usage).values())
    finally:
        client.close()
        if cluster is not None:
            cluster.close()
        if path_folder:
            shutil.rmtree(path_folder, ignore_errors=True)
            if path_folder in sys.path:
                sys.path.remove(path_folder)
            kept = [p for p in os.environ.get("PYTHONPATH", "").split(os.pathsep) if p and p != path_folder]
            if kept:
                os.environ["PYTHONPATH"] = os.pathsep.join(kept)
            else:
                os.environ.pop("PYTHONPATH", None)
    return peaks


def _input_record(path: str, layer: str | None) -> dict | None:
    """The station file's provenance record, None without one.

    GDAL raises for a file it cannot open as a raster when exceptions are on.
    """
    try:
        return provenance.read_record(path, layer)
    except RuntimeError:
        return None


def _assemble(plan, args, chunks, results, parts, peaks, resumed, log) -> dict:
    names = list(results[0]["columns"]) if results else []
    columns = {k: np.full(plan.n, np.nan) for k in names}
    qc = [""] * plan.n
    for result in results.values():
        rows = np.asarray(result["rows"])
        for k in names:
            columns[k][rows] = result["columns"][k]
        for r, flag in zip(rows.tolist(), result["qc_flag"]):
            qc[r] = flag
    notes = [note_of(f) for f in qc]
    out = plan.values["OUTPUT"]
    temp = write_output(
        plan.stations_path,
        plan.layer_name,
        out,
        columns,
        {"qc_flag": qc, "qc_note": notes},
        on_reused=lambda name: log(
            f"Warning: the input already has a field {name}; its values are replaced in the output copy."
        ),
    )
    algorithm = COMMANDS[plan.command][0]
    step = provenance.make_step(algorithm, plan.values, _settings(plan, args, len(chunks)))
    record = provenance.chained(_input_record(plan.stations_path, plan.layer_name), step)
    try:
        if out.lower().endswith(".gpkg"):
            provenance.write_record(temp, record, Path(out).stem)
        else:
            import json

            Path(out + ".provenance.json").write_text(json.dumps(record, sort_keys=True, indent=1))
        os.replace(temp, out)
    except BaseException:
        if os.path.exists(temp):
            os.remove(temp)
        raise
    shutil.rmtree(parts.folder, ignore_errors=True)
    computed = int(np.isfinite(columns["tc_total" if plan.command == "terrain" else "faa"]).sum())
    flagged = sum(1 for f in qc if f)
    what = "terrain correction computed" if plan.command == "terrain" else "with a free-air anomaly"
    log(f"{plan.n:,} stations: {computed:,} {what}, {flagged:,} flagged. Output: {out}")
    if peaks:
        limit = "" if args.scheduler else f" (limit {args.memory_limit})"
        log(
            "Peak memory per worker: "
            + ", ".join(f"{p / 2**20:,.0f} MiB" for p, _ in peaks)
            + limit
            + "; CPU time per worker: "
            + ", ".join(f"{c:,.1f} s" for _, c in peaks)
            + "."
        )
    return {
        "stations": plan.n,
        "computed": computed,
        "flagged": flagged,
        "chunks": len(chunks),
        "resumed_chunks": resumed,
        "workers": peaks,
    }
