# SPDX-License-Identifier: GPL-2.0-or-later
"""Stations read and results written with OGR (no QGIS).

Reading follows ``plugin/stations.py``: every feature is a station in input
order; NULL, empty or non-numeric attributes become NaN; a multipoint counts
at its centroid; latitude comes from the geometry transformed to EPSG:4326.
Writing copies every input feature and field and appends the computed
fields, into a temporary file renamed over the output only when complete.
"""

from __future__ import annotations

import math
import os
from dataclasses import dataclass, field
from pathlib import Path

import numpy as np
from osgeo import gdal, ogr, osr

from .errors import BatchError

ogr.UseExceptions()
osr.UseExceptions()

#: Output extensions and their OGR drivers.
FORMATS = {".gpkg": "GPKG", ".parquet": "Parquet"}
NUMERIC = (ogr.OFTInteger, ogr.OFTInteger64, ogr.OFTReal)


def output_driver(path: str) -> str:
    """OGR driver for an output path, or a sentence saying why not."""
    ext = Path(path).suffix.lower()
    name = FORMATS.get(ext)
    if name is None:
        msg = f"The output {path} must end in .gpkg or .parquet (GeoPackage or GeoParquet)."
        raise BatchError(msg)
    if ogr.GetDriverByName(name) is None:
        msg = f"This GDAL ({gdal.__version__}) has no {name} driver: write a .gpkg instead."
        raise BatchError(msg)
    return name


def open_layer(path: str, layer: str | None):
    """Open a station file read-only and pick its layer (the first by default)."""
    if not os.path.exists(path):
        msg = f"The station file {path} does not exist."
        raise BatchError(msg)
    try:
        ds = ogr.Open(str(path), 0)
    except RuntimeError as error:
        msg = f"Could not open the station file {path}: {error}"
        raise BatchError(msg) from error
    if ds is None or ds.GetLayerCount() == 0:
        msg = f"The station file {path} holds no vector layer GDAL can read."
        raise BatchError(msg)
    if layer:
        lyr = ds.GetLayerByName(layer)
        if lyr is None:
            names = ", ".join(ds.GetLayerByIndex(i).GetName() for i in range(ds.GetLayerCount()))
            msg = f"The station file {path} has no layer named '{layer}'. Layers: {names}."
            raise BatchError(msg)
    else:
        lyr = ds.GetLayerByIndex(0)
    kind = ogr.GT_Flatten(lyr.GetGeomType())
    if kind not in (ogr.wkbPoint, ogr.wkbMultiPoint, ogr.wkbUnknown):
        msg = (
            f"The layer '{lyr.GetName()}' of {path} holds {ogr.GeometryTypeToName(kind).lower()} geometries; "
            "gravity stations must be points."
        )
        raise BatchError(msg)
    return ds, lyr


def layer_srs(lyr):
    """The layer's CRS, or None for none and for the GeoPackage placeholders."""
    srs = lyr.GetSpatialRef()
    if srs is None:
        return None
    wkt = srs.ExportToWkt()
    if "Undefined geographic SRS" in wkt or "Undefined cartesian SRS" in wkt or not wkt:
        return None
    srs = srs.Clone()
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    return srs


def field_problem(lyr, chosen: dict) -> str:
    """Sentence for the first missing or non-numeric field, or '' (``chosen``: name -> label)."""
    defn = lyr.GetLayerDefn()
    names = [defn.GetFieldDefn(i).GetName() for i in range(defn.GetFieldCount())]
    for name, label in chosen.items():
        index = defn.GetFieldIndex(name)
        if index < 0:
            return (
                f"The station layer has no field named '{name}' (chosen as the {label} field). "
                f"Available fields: {', '.join(names)}."
            )
        fd = defn.GetFieldDefn(index)
        if fd.GetType() not in NUMERIC or fd.GetSubType() == ogr.OFSTBoolean:
            kind = fd.GetFieldTypeName(fd.GetType())
            return f"The field '{name}' chosen as the {label} field is not numeric (it is {kind})."
    return ""


def _as_float(value) -> float:
    if value is None:
        return math.nan
    try:
        number = float(value)
    except (TypeError, ValueError):
        return math.nan
    return number if math.isfinite(number) else math.nan


@dataclass
class StationArrays:
    """What the driver keeps of the stations: positions and the fields used."""

    x: np.ndarray
    y: np.ndarray
    srs: object
    values: dict = field(default_factory=dict)

    def __len__(self) -> int:
        """Number of stations."""
        return len(self.x)


def read_arrays(lyr, srs, names) -> StationArrays:
    """Positions (layer CRS) and numeric values of ``names`` of every feature."""
    defn = lyr.GetLayerDefn()
    index = {n: defn.GetFieldIndex(n) for n in names}
    xs, ys = [], []
    cols = {n: [] for n in names}
    lyr.ResetReading()
    for feature in lyr:
        geom = feature.GetGeometryRef()
        if geom is None or geom.IsEmpty():
            xs.append(math.nan)
            ys.append(math.nan)
        else:
            if ogr.GT_Flatten(geom.GetGeometryType()) != ogr.wkbPoint:
                geom = geom.Centroid()
            xs.append(geom.GetX())
            ys.append(geom.GetY())
        for n, i in index.items():
            cols[n].append(_as_float(feature.GetField(i)) if feature.IsFieldSetAndNotNull(i) else math.nan)
    lyr.ResetReading()
    return StationArrays(
        np.array(xs, float), np.array(ys, float), srs, {n: np.array(v, float) for n, v in cols.items()}
    )


def transform_points(srs, dst_wkt: str, x: np.ndarray, y: np.ndarray):
    """Points from ``srs`` to the CRS ``dst_wkt`` (NaN where impossible)."""
    dst = osr.SpatialReference()
    dst.ImportFromWkt(dst_wkt)
    dst.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    if srs.IsSame(dst):
        return x.copy(), y.copy()
    ct = osr.CoordinateTransformation(srs, dst)
    ok = np.isfinite(x) & np.isfinite(y)
    xs, ys = np.full(x.shape, np.nan), np.full(y.shape, np.nan)
    idx = np.flatnonzero(ok)
    for start in range(0, idx.size, 100_000):
        part = idx[start : start + 100_000]
        try:
            out = np.array(ct.TransformPoints(np.column_stack([x[part], y[part]]).tolist()), float)
            xs[part], ys[part] = out[:, 0], out[:, 1]
        except RuntimeError:
            for i in part:
                try:
                    px, py, _ = ct.TransformPoint(float(x[i]), float(y[i]))
                except RuntimeError:
                    continue
                xs[i], ys[i] = px, py
    bad = ~(np.isfinite(xs) & np.isfinite(ys))
    xs[bad] = np.nan
    ys[bad] = np.nan
    return xs, ys


def geographic_wkt() -> str:
    """WKT of WGS 84 longitude/latitude (EPSG:4326)."""
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(4326)
    return srs.ExportToWkt()


def _output_field(original, columns, texts):
    """The output's copy of an input field, as ``plugin/stations.py``'s ``output_fields``.

    A reused result field of another type becomes a real number; the flag and
    note fields are always unlimited text (they grow with every run).
    """
    name = original.GetName()
    if name in texts:
        return ogr.FieldDefn(name, ogr.OFTString)
    if name in columns and original.GetType() != ogr.OFTReal:
        return ogr.FieldDefn(name, ogr.OFTReal)
    return original


def write_output(
    source_path: str,
    layer_name: str | None,
    out_path: str,
    columns: dict,
    texts: dict,
    on_reused=None,
) -> str:
    """Copy every station of the input with the results appended, into a temporary file.

    ``columns`` are float arrays (NaN -> NULL), ``texts`` lists of str; the
    temporary file is next to ``out_path``; returns its path (the caller
    renames it).
    """
    driver_name = output_driver(out_path)
    ds, lyr = open_layer(source_path, layer_name)
    out_dir = os.path.dirname(os.path.abspath(out_path))
    suffix = Path(out_path).suffix
    # Temporary files of an earlier assembly killed before its rename.
    for stale in Path(out_dir).glob(f".{Path(out_path).stem}.writing-*{suffix}"):
        stale.unlink()
    temp = os.path.join(out_dir, f".{Path(out_path).stem}.writing-{os.getpid()}{suffix}")
    driver = ogr.GetDriverByName(driver_name)
    out_ds = driver.CreateDataSource(temp)
    try:
        srs = lyr.GetSpatialRef()
        out = out_ds.CreateLayer(Path(out_path).stem, srs, lyr.GetGeomType())
        in_defn = lyr.GetLayerDefn()
        for i in range(in_defn.GetFieldCount()):
            out.CreateField(_output_field(in_defn.GetFieldDefn(i), columns, texts))
        out_defn = out.GetLayerDefn()
        indices = {}
        for name in [*columns, *texts]:
            index = out_defn.GetFieldIndex(name)
            if index < 0:
                # Flags and notes are unlimited text, as the plugin writes them.
                out.CreateField(ogr.FieldDefn(name, ogr.OFTReal if name in columns else ogr.OFTString))
                out_defn = out.GetLayerDefn()
                index = out_defn.GetFieldIndex(name)
            elif on_reused is not None:
                on_reused(name)
            indices[name] = index
        field_map = list(range(in_defn.GetFieldCount()))
        keep_fid = driver_name == "GPKG"
        col_arrays = {k: np.asarray(v, float) for k, v in columns.items()}
        out_ds.StartTransaction()
        lyr.ResetReading()
        for row, feature in enumerate(lyr):
            new = ogr.Feature(out_defn)
            new.SetFromWithMap(feature, 1, field_map)
            if keep_fid:
                new.SetFID(feature.GetFID())
            for name, values in col_arrays.items():
                value = float(values[row])
                if math.isfinite(value):
                    new.SetField(indices[name], value)
                else:
                    new.SetFieldNull(indices[name])
            for name, values in texts.items():
                new.SetField(indices[name], values[row])
            out.CreateFeature(new)
            if (row + 1) % 100_000 == 0:
                out_ds.CommitTransaction()
                out_ds.StartTransaction()
        out_ds.CommitTransaction()
    except BaseException:
        out_ds = None
        if os.path.exists(temp):
            os.remove(temp)
        raise
    out_ds = None
    del ds
    return temp
