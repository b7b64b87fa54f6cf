# SPDX-License-Identifier: GPL-2.0-or-later
"""Heights, geoid and plausibility checks of a batch run (driver side, GDAL only).

The same rules as the plugin (``plugin/heights.py``, ``plugin/geoid.py``,
``plugin/toolbox/bouguer_reduction.py``) with the science from
``algorithms.datums`` and ``algorithms.plausibility``; only the reading
differs (GDAL without QGIS) and problems are ``BatchError`` sentences.
EGM96 is PROJ's ``egm96_15.gtx`` found in PROJ's search paths, read with GDAL
and interpolated with ``algorithms.datums.bilinear_global`` (as the plugin).
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from ..algorithms import datums
from ..algorithms.plausibility import (
    GRAVITY_UNITS,
    check_gravity,
    dem_value_problem,
    gravity_out_of_range,
    gravity_to_mgal,
    height_scale_problem,
)
from ..plugin.egm96_grid import EGM96_FILE, egm96_values, find_egm96, proj_search_paths
from .errors import BatchError

#: Words of --gravity-units in GRAVITY_UNITS order, for the sentences.
_UNIT_WORDS = ("mgal", "um-s2", "gal", "m-s2")


def egm96_at(longitude, latitude) -> np.ndarray:
    """EGM96 geoid height (m) at longitude/latitude (degrees); BatchError without the grid."""
    path = find_egm96()
    if path is None:
        msg = (
            f"The EGM96 geoid grid {EGM96_FILE} was not found in PROJ's search paths "
            f"({', '.join(proj_search_paths())}). "
            "Install PROJ's grid data (Debian: proj-data), or give the geoid heights with --height-datum geoid-given "
            "and --geoid-field or --geoid-raster, or set both datums to the ellipsoid."
        )
        raise BatchError(msg)
    return egm96_values(longitude, latitude)


def check_geoid_values(values: np.ndarray, source: str) -> None:
    """Refuse geoid heights beyond the largest on Earth."""
    finite = values[np.isfinite(values)]
    if finite.size and np.max(np.abs(finite)) > datums.GEOID_LIMIT:
        worst = float(finite[np.argmax(np.abs(finite))])
        msg = (
            f"The geoid heights from {source} reach {worst:.6g} m; geoid heights lie within ±{datums.GEOID_LIMIT:g} m "
            "of the ellipsoid everywhere on Earth. Check that it holds geoid heights in metres."
        )
        raise BatchError(msg)


def check_datum_options(v: dict) -> None:
    """The plugin's rule: a geoid field or raster exactly when HEIGHT_DATUM says so."""
    given = v.get("HEIGHT_DATUM") == datums.STATION_GEOID_GIVEN
    field, raster = bool(v.get("GEOID_FIELD")), bool(v.get("GEOID_RASTER"))
    if given and field == raster:
        msg = (
            "--height-datum geoid-given takes the geoid height from a field or a raster: "
            "give exactly one of --geoid-field and --geoid-raster."
        )
        raise BatchError(msg)
    if not given and (field or raster):
        msg = (
            "A geoid height field or raster is given but --height-datum does not use it: "
            "set --height-datum geoid-given, or leave them out."
        )
        raise BatchError(msg)


def check_dem_values(path: str, label: str) -> None:
    """Read the whole raster once: refuse damage, untagged voids, feet or centimetres."""
    from osgeo import gdal

    gdal.UseExceptions()
    try:
        dataset = gdal.Open(path, gdal.GA_ReadOnly)
        band = dataset.GetRasterBand(1)
        nodata = band.GetNoDataValue()
        minimum, maximum = band.ComputeRasterMinMax(False)
    except RuntimeError as error:
        message = str(error)
        if "no valid pixels" in message.lower() or "failed to compute min/max" in message.lower():
            msg = f"The {label} {path} holds no valid heights (every cell is NoData)."
        else:
            msg = f"The {label} {path} cannot be read to the end (damaged or truncated file?): {message}"
        raise BatchError(msg) from error
    problem = dem_value_problem(minimum, maximum, nodata is not None)
    if problem is None:
        return
    if problem.kind == "void":
        msg = (
            f"The {label} {path} has cells of {problem.value:.6g} but no NoData value: they look like voids and would "
            f"be taken as heights. Set the raster's NoData value to {problem.value:.6g} "
            f"(gdal_translate -a_nodata {problem.value:.6g}) and run again."
        )
    elif problem.kind == "too_high":
        msg = (
            f"The {label} {path} reaches {problem.value:.6g}, higher than any point on Earth in metres: it looks "
            "like feet or centimetres. Convert it to metres and run again."
        )
    else:
        msg = (
            f"The {label} {path} goes down to {problem.value:.6g}, deeper than any point on Earth in metres: an "
            "untagged void value or a unit error. Set its NoData value or convert it to metres."
        )
    raise BatchError(msg)


def observed_mgal(raw: np.ndarray, units: int, field: str):
    """Observed gravity in mGal and the stations out of Earth's range (set to NaN)."""
    problem = check_gravity(raw, units)
    if problem is not None:
        if problem.zeros:
            msg = (
                f"Every observed gravity value in {field} is 0: the field holds no readings. Choose the field with "
                "observed (absolute) gravity."
            )
        elif problem.likely_units is not None:
            msg = (
                f"Observed gravity in {field} reads {problem.median:.6g} mGal (median) with --gravity-units "
                f"{_UNIT_WORDS[units]}, far from Earth's 975,000-984,000 mGal. The values look like "
                f"{GRAVITY_UNITS[problem.likely_units]}: use --gravity-units {_UNIT_WORDS[problem.likely_units]}."
            )
        else:
            msg = (
                f"Observed gravity in {field} reads {problem.median:.6g} mGal (median), far from Earth's "
                "975,000-984,000 "
                "mGal in any unit: relative meter readings or another quantity? "
                "The reduction needs absolute observed gravity."
            )
        raise BatchError(msg)
    observed = gravity_to_mgal(raw, units)
    odd = gravity_out_of_range(observed)
    observed[odd] = np.nan
    return observed, odd


@dataclass
class Heights:
    """Heights of a run (m): in the DEM's datum, ellipsoidal, orthometric, and flags."""

    in_dem: np.ndarray
    ellipsoidal: np.ndarray
    orthometric: np.ndarray
    geoid_missing: np.ndarray
    from_dem: np.ndarray | None  # True: sampled; False: none there; None: heights given


def prepare_heights(raw, height_datum, dem_datum, given_geoid, lon, lat, dem_at_station, declared_units) -> Heights:
    """The plugin's ``prepare_heights`` on arrays (``raw`` None: take the DEM's)."""
    n = len(lat)
    try:
        egm96 = egm96_at(lon, lat)
    except BatchError:
        if datums.needs_egm96(height_datum, dem_datum):
            raise
        egm96 = None
    given = np.asarray(given_geoid, dtype=float) if height_datum == datums.STATION_GEOID_GIVEN else None
    offsets = datums.datum_offsets(height_datum, dem_datum, egm96=egm96, given=given)
    station_offset = np.broadcast_to(offsets.station, (n,))
    dem_offset = np.broadcast_to(offsets.dem, (n,))
    missing = (~np.isfinite(station_offset) | ~np.isfinite(dem_offset)) & np.isfinite(lat)
    from_dem = None
    if raw is None:
        at_station = np.array(dem_at_station, dtype=float) if dem_at_station is not None else np.full(n, np.nan)
        from_dem = np.isfinite(at_station)
    else:
        raw = np.asarray(raw, dtype=float)
        at_station = dem_at_station
        if dem_at_station is not None:
            scale = height_scale_problem(raw, np.asarray(dem_at_station) + dem_offset - station_offset)
            if scale is not None:
                raise BatchError(_scale_sentence(scale, declared_units, raw, dem_at_station))
    converted = datums.convert_heights(raw, offsets, height_datum, at_station, egm96)
    return Heights(converted.in_dem, converted.ellipsoidal, converted.orthometric, missing, from_dem)


def _scale_sentence(scale: str, declared_units: int, raw, dem) -> str:
    ok = np.isfinite(raw) & np.isfinite(dem)
    st, dm = (float(np.median(raw[ok])), float(np.median(dem[ok]))) if ok.any() else (np.nan, np.nan)
    if scale in ("feet", "centimetres"):
        return (
            f"The station heights look like {scale} read as metres (median {st:.1f} against a DEM median of {dm:.1f} m "
            f"at the stations): use --height-units {scale}."
        )
    declared = {"inverse_feet": 1, "inverse_centimetres": 2}[scale]
    if declared_units == declared:
        return (
            f"The station heights look like metres declared in another unit (median {st:.1f} m after conversion "
            f"against a DEM median of {dm:.1f} m): use --height-units metres."
        )
    unit, factor = ("feet", 0.3048) if scale == "inverse_feet" else ("centimetres", 0.01)
    return (
        f"The elevation raster looks like heights in {unit} (about {1.0 / factor:.4g} times the station heights in "
        "metres: "
        f"DEM median {dm:.1f} against {st:.1f} m). Convert it to metres (value × {factor}) and run again."
    )
