# SPDX-License-Identifier: GPL-2.0-or-later
"""The parts folder of a run: a manifest and one file per computed chunk.

``OUT.gpkg.parts/`` sits beside the output while a run is going on. The
manifest records a fingerprint of the run (stations file, rasters, options,
chunk size); every part is written to a temporary name and renamed, so a part
present is a part complete. A run interrupted in any way is resumed by
running the same command again: the parts found are not recomputed. The
folder is removed once the output has been assembled.
"""

from __future__ import annotations

import hashlib
import io
import json
import os
from pathlib import Path

import numpy as np

from .errors import BatchError

MANIFEST = "manifest.json"


def parts_dir(output: str) -> Path:
    """The folder of finished chunks beside the output (``<output>.parts``)."""
    return Path(os.path.abspath(output) + ".parts")


def file_digest(path: str) -> str:
    """SHA-256 of a file's bytes (streamed)."""
    h = hashlib.sha256()
    with open(path, "rb") as f:
        for block in iter(lambda: f.read(1 << 20), b""):
            h.update(block)
    return h.hexdigest()


def raster_identity(path: str | None) -> list | None:
    """Path, size and modification time (a national mosaic is not hashed)."""
    if not path:
        return None
    try:
        st = os.stat(path)
    except OSError:
        return [os.path.abspath(path), None, None]
    return [os.path.abspath(path), st.st_size, int(st.st_mtime_ns)]


def fingerprint(command: str, values: dict, chunk_size: int, stations_path: str, version: str) -> str:
    """SHA-256 of what decides the chunks' results: command, options, chunking, inputs and version."""
    described = {
        "command": command,
        "values": {k: v for k, v in values.items() if k != "OUTPUT"},
        "chunk_size": chunk_size,
        "stations": file_digest(stations_path),
        "dem": raster_identity(values.get("DEM")),
        "regional": raster_identity(values.get("REGIONAL_DEM")),
        "version": version,
    }
    return hashlib.sha256(json.dumps(described, sort_keys=True, default=str).encode()).hexdigest()


def _atomic_write(path: Path, data: bytes) -> None:
    temp = path.with_name(path.name + f".tmp-{os.getpid()}")
    with open(temp, "wb") as f:
        f.write(data)
        f.flush()
        os.fsync(f.fileno())
    os.replace(temp, path)


class Parts:
    """Manifest and chunk results of one output."""

    def __init__(self, output: str):
        self.folder = parts_dir(output)

    def exists(self) -> bool:
        """True when an earlier run left its manifest."""
        return (self.folder / MANIFEST).exists()

    def open(self, fp: str, n_chunks: int, n_stations: int) -> None:
        """Create the folder, or check that the one found belongs to this run."""
        manifest = {"fingerprint": fp, "chunks": n_chunks, "stations": n_stations, "format": 1}
        path = self.folder / MANIFEST
        if path.exists():
            try:
                found = json.loads(path.read_text())
            except ValueError:
                found = {}
            if found != manifest:
                msg = (
                    f"The folder {self.folder} holds the parts of another run (other stations, rasters or options). "
                    "Run the same command as before to resume it, or remove the folder to start again."
                )
                raise BatchError(msg)
            return
        self.folder.mkdir(parents=True, exist_ok=True)
        _atomic_write(path, json.dumps(manifest, sort_keys=True).encode())

    def part_path(self, index: int) -> Path:
        """The file of chunk ``index``."""
        return self.folder / f"part-{index:06d}.npz"

    def save(self, result: dict) -> None:
        """Write a finished chunk (atomically: a killed run leaves no half part)."""
        buffer = io.BytesIO()
        arrays = {"rows": np.asarray(result["rows"], np.int64), "qc_flag": np.asarray(result["qc_flag"], dtype=str)}
        arrays.update({"col_" + k: np.asarray(v, float) for k, v in result["columns"].items()})
        np.savez(buffer, **arrays)
        _atomic_write(self.part_path(result["index"]), buffer.getvalue())

    def load(self, index: int, rows: np.ndarray) -> dict | None:
        """A saved chunk, or None when absent or not for these stations."""
        path = self.part_path(index)
        if not path.exists():
            return None
        try:
            with np.load(path, allow_pickle=False) as data:
                if not np.array_equal(data["rows"], rows):
                    return None
                columns = {k[4:]: data[k] for k in data.files if k.startswith("col_")}
                return {"index": index, "rows": data["rows"], "columns": columns, "qc_flag": data["qc_flag"].tolist()}
        except (OSError, ValueError, KeyError):
            return None

    def file(self, name: str) -> Path:
        """A file of the parts folder."""
        return self.folder / name
