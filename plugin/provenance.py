# SPDX-License-Identifier: GPL-2.0-or-later
"""How an output was made: a JSON record stored in the file's own metadata.

GeoPackage layers and GeoTIFFs keep the record under the metadata item
``RELIEF_GRAVITY_PROVENANCE`` (GDAL stores it in ``gpkg_metadata`` for a
GeoPackage layer and in the TIFF's GDAL metadata for a raster). The record is

    {"format": 1,
     "steps": [{"algorithm": "reliefgravity:bouguerreduction",
                "plugin_version": "0.3.0",
                "time": "2026-12-02T14:00:00+00:00",
                "parameters": {...},        # JSON-able values, file paths as given
                "settings": {...}},         # what the science used: formulas, density, G, radii, datums
               ...]}

A step's ``steps`` list is copied from its input's record, so a chain of runs
(readings -> reduction -> grid) reads back in order from the last output.
"""

from __future__ import annotations

import datetime as _dt
import json
from pathlib import Path

from osgeo import gdal, ogr

KEY = "RELIEF_GRAVITY_PROVENANCE"
FORMAT = 1


def plugin_version() -> str:
    """Version from metadata.txt ("unknown" when it cannot be read)."""
    meta = Path(__file__).resolve().parent.parent / "metadata.txt"
    try:
        for line in meta.read_text(encoding="utf-8").splitlines():
            if line.startswith("version="):
                return line.split("=", 1)[1].strip()
    except OSError:
        pass
    return "unknown"


def make_step(algorithm: str, parameters: dict, settings: dict) -> dict:
    """One step of a record, stamped with the plugin version and UTC time."""
    return {
        "algorithm": algorithm,
        "plugin_version": plugin_version(),
        "time": _dt.datetime.now(_dt.timezone.utc).replace(microsecond=0).isoformat(),
        "parameters": _jsonable(parameters),
        "settings": _jsonable(settings),
    }


def _jsonable(value):
    if isinstance(value, dict):
        return {str(k): _jsonable(v) for k, v in value.items()}
    if isinstance(value, (list, tuple)):
        return [_jsonable(v) for v in value]
    if value is None or isinstance(value, (bool, int, float, str)):
        return value
    if hasattr(value, "item"):  # numpy scalars
        return value.item()
    return str(value)


def chained(previous: dict | None, step: dict) -> dict:
    """A record whose steps are ``previous``'s followed by ``step``."""
    steps = list(previous.get("steps", [])) if previous else []
    return {"format": FORMAT, "steps": [*steps, step]}


def _split_source(path: str) -> tuple[str, str | None]:
    """'file.gpkg|layername=x' -> ('file.gpkg', 'x')."""
    parts = str(path).split("|")
    layer = None
    for part in parts[1:]:
        if part.startswith("layername="):
            layer = part.split("=", 1)[1]
    return parts[0], layer


def read_record(path: str, layer: str | None = None) -> dict | None:
    """The record of a GeoPackage layer or a raster, or None when it has none."""
    file_path, named = _split_source(path)
    layer = layer or named
    text = None
    gdal.PushErrorHandler("CPLQuietErrorHandler")
    try:
        # With gdal.UseExceptions() (set by other modules) a file that is
        # not of the kind tried raises instead of returning None.
        if file_path.lower().endswith(".gpkg") or layer is not None:
            try:
                ds = ogr.Open(file_path, 0)
            except RuntimeError:
                ds = None
            if ds is not None:
                lyr = ds.GetLayerByName(layer) if layer else ds.GetLayer(0)
                if lyr is not None:
                    text = lyr.GetMetadataItem(KEY)
                ds = None
        if text is None and not file_path.lower().endswith(".gpkg"):
            try:
                ds = gdal.Open(file_path)
            except RuntimeError:
                ds = None
            if ds is not None:
                text = ds.GetMetadataItem(KEY)
                ds = None
    except RuntimeError:  # gdal.UseExceptions() is on: an unreadable file has no record
        text = None
    finally:
        gdal.PopErrorHandler()
    if not text:
        return None
    try:
        record = json.loads(text)
    except ValueError:
        return None
    return record if isinstance(record, dict) and "steps" in record else None


def write_record(path: str, record: dict, layer: str | None = None) -> None:
    """Store ``record`` in a closed GeoPackage layer or GeoTIFF.

    Raises
    ------
    OSError
        When the file cannot be opened for update.
    """
    file_path, named = _split_source(path)
    layer = layer or named
    text = json.dumps(record, sort_keys=True)
    if file_path.lower().endswith(".gpkg"):
        ds = ogr.Open(file_path, 1)
        if ds is None:
            msg = f"cannot open {file_path} to record provenance"
            raise OSError(msg)
        lyr = ds.GetLayerByName(layer) if layer else ds.GetLayer(0)
        if lyr is None:
            msg = f"no layer {layer!r} in {file_path}"
            raise OSError(msg)
        lyr.SetMetadataItem(KEY, text)
        ds = None
        return
    ds = gdal.Open(file_path, gdal.GA_Update)
    if ds is None:
        msg = f"cannot open {file_path} to record provenance"
        raise OSError(msg)
    ds.SetMetadataItem(KEY, text)
    ds = None
