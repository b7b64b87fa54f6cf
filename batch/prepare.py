# SPDX-License-Identifier: GPL-2.0-or-later
"""Checking a run and reading its stations, in the driver, before any worker starts.

Every input the Processing algorithm refuses is refused here with a sentence
(``BatchError``), in the algorithm's order: parameter values, fields,
density and radii, rasters, then the stations (CRS, features, overlap with the
DEM). Per-station problems become flag codes, in the plugin's order.
"""

from __future__ import annotations

import os
from dataclasses import dataclass, field

import numpy as np

from .adapters import reference_density_of
from .errors import BatchError
from .options import COMMANDS
from .rasters import open_checked, same_crs
from .vector import field_problem, geographic_wkt, layer_srs, open_layer, output_driver, read_arrays, transform_points

FOOT = 0.3048
PLAUSIBLE_DENSITY = (1000.0, 3500.0)


@dataclass
class Plan:
    """Everything the runner needs: per-station arrays, settings, messages."""

    command: str
    values: dict
    stations_path: str
    layer_name: str | None
    n: int
    arrays: dict  # per-station arrays sent to the tasks (None when not used)
    flags: dict  # "a", "b" (None: from the DEM), "c": station index -> codes (sparse)
    config: dict  # settings sent with every task
    positions: tuple  # (x, y) used to partition the stations
    regional_source: str | None = None
    warnings: list = field(default_factory=list)


def _check_numbers(command: str, v: dict) -> None:
    for p in COMMANDS[command][1]:
        value = v.get(p.name)
        if p.kind == "number" and value is not None:
            if not np.isfinite(value):
                raise BatchError(f"{p.option} must be a number, got {value}.")
            if p.minimum is not None and value < p.minimum:
                raise BatchError(f"{p.option} must be at least {p.minimum:g}, got {value:g}.")
            if p.maximum is not None and value > p.maximum:
                raise BatchError(f"{p.option} must be at most {p.maximum:g}, got {value:g}.")
    density = v["DENSITY"]
    if not density > 0:
        raise BatchError(f"The reduction density must be positive (kg/m³); got {density}.")
    if density < 20:
        raise BatchError(f"A reduction density of {density} kg/m³ looks like g/cm³: enter 2670 for 2.67 g/cm³.")
    inner, outer = v["INNER_RADIUS"], v["OUTER_RADIUS"]
    if not 0 < inner < outer:
        raise BatchError(f"The inner zone radius ({inner} m) must be positive and smaller than the outer zone radius ({outer} m).")


def _labels(command: str, v: dict) -> dict:
    keys = {
        "terrain": {"HEIGHT_FIELD": "station height", "INNERMOST_TC_FIELD": "innermost-ring correction"},
        "reduce": {"GRAVITY_FIELD": "observed gravity", "HEIGHT_FIELD": "station height", "DENSITY_FIELD": "density", "TC_FIELD": "terrain correction"},
    }[command]
    return {v[k]: label for k, label in keys.items() if v.get(k)}


def _flag_where(flags: dict, mask, code) -> None:
    """Add ``code`` to the stations of ``mask`` (flags: index -> codes, sparse)."""
    for i in np.flatnonzero(mask).tolist():
        codes = flags.setdefault(i, [])
        if code not in codes:
            codes.append(code)


def _check_output(v: dict, overwrite: bool, resuming: bool) -> None:
    out = v["OUTPUT"]
    output_driver(out)
    source = v["INPUT"].split("|")[0]
    if os.path.abspath(out) == os.path.abspath(source):
        raise BatchError("The output must be a new file: the station file is never altered.")
    folder = os.path.dirname(os.path.abspath(out))
    if not os.path.isdir(folder) or not os.access(folder, os.W_OK):
        raise BatchError(f"The output folder {folder} does not exist or is not writable.")
    if os.path.exists(out) and not overwrite and not resuming:
        raise BatchError(f"The output {out} exists; add --overwrite to replace it, or choose another name.")


def prepare(command: str, v: dict, *, overwrite: bool = False, resuming: bool = False) -> Plan:
    """Check the options and read the stations; raise ``BatchError`` with a sentence."""
    _check_numbers(command, v)
    _check_output(v, overwrite, resuming)
    path, _, rest = v["INPUT"].partition("|layername=")
    layer_name = rest or None
    ds, lyr = open_layer(path, layer_name)
    problem = field_problem(lyr, _labels(command, v))
    if problem:
        raise BatchError(problem)
    height_field = v.get("HEIGHT_FIELD")
    if command == "reduce" and not height_field and not v.get("DEM"):
        raise BatchError("Choose a station height field or an elevation raster to sample heights from.")
    dem = open_checked(v["DEM"], "elevation raster") if v.get("DEM") else None
    regional = open_checked(v["REGIONAL_DEM"], "regional elevation raster") if v.get("REGIONAL_DEM") else None

    srs = layer_srs(lyr)
    if srs is None:
        raise BatchError("The station layer has no coordinate reference system. Assign its CRS so latitudes can be computed.")
    if lyr.GetFeatureCount() == 0:
        raise BatchError("The station layer has no features: there is nothing to reduce.")
    names = [v[k] for k in ("GRAVITY_FIELD", "HEIGHT_FIELD", "DENSITY_FIELD", "TC_FIELD", "INNERMOST_TC_FIELD") if v.get(k)]
    st = read_arrays(lyr, srs, list(dict.fromkeys(names)))
    n = len(st)
    flags_a: dict = {}
    _flag_where(flags_a, np.isnan(st.x), "no_geometry")
    lon, lat = transform_points(srs, geographic_wkt(), st.x, st.y)
    bad = ~np.isnan(lat) & ((np.abs(lat) > 90.0) | (np.abs(lon) > 360.0))
    lat[bad] = np.nan
    _flag_where(flags_a, bad, "bad_latitude")
    _flag_where(flags_a, np.isnan(lat) & ~np.isnan(st.x) & ~bad, "no_position")

    tc_field = v.get("TC_FIELD") if command == "reduce" else None
    on_dem = dem is not None and not (height_field and tc_field)
    if on_dem:
        x, y = transform_points(srs, dem.crs_wkt, st.x, st.y)
        west, east, south, north = dem.extent
        if not np.any((x >= west) & (x <= east) & (y >= south) & (y <= north)):
            raise BatchError(
                f"No station lies on the elevation raster (raster extent {west:.6g}, {east:.6g}, {south:.6g}, {north:.6g} "
                "in its own CRS). Check that the raster covers the survey and that both layers have the right CRS."
            )
    else:
        x, y = st.x.copy(), st.y.copy()
    arrays = {"x": x, "y": y, "latitude": lat}
    plan_warnings = []
    if command == "reduce":
        arrays["observed"] = st.values[v["GRAVITY_FIELD"]]
        _flag_where(flags_a, np.isnan(arrays["observed"]), "no_gravity")

    flags_b = None
    if height_field:
        scale = FOOT if v["HEIGHT_UNITS"] == 1 else 1.0
        arrays["heights"] = st.values[height_field] * scale
        flags_b: dict = {}
        _flag_where(flags_b, np.isnan(arrays["heights"]), "no_height")
    else:
        arrays["heights"] = None

    flags_c: dict = {}
    if command == "terrain":
        density = np.full(n, v["DENSITY"])
        innermost = v.get("INNERMOST_TC_FIELD")
        arrays["innermost"] = st.values[innermost] if innermost else None
    else:
        density = np.full(n, v["DENSITY"])
        if v.get("DENSITY_FIELD"):
            scale = 1000.0 if v["DENSITY_FIELD_UNITS"] == 1 else 1.0
            per_station = st.values[v["DENSITY_FIELD"]] * scale
            missing = ~np.isfinite(per_station) | (per_station <= 0)
            _flag_where(flags_c, missing, "density_default")
            density = np.where(missing, v["DENSITY"], per_station)
        low, high = PLAUSIBLE_DENSITY
        odd = (density < low) | (density > high)
        if np.any(odd):
            plan_warnings.append(
                f"{int(odd.sum())} station(s) have a reduction density outside {low}-{high} kg/m³ (e.g. {float(density[odd][0])}); check the units."
            )
            _flag_where(flags_c, odd, "density_unusual")
        arrays["density"] = density
        arrays["tc_field"] = st.values[tc_field] if tc_field else None
        if tc_field:
            _flag_where(flags_c, np.isnan(arrays["tc_field"]), "no_tc")
        elif dem is None:
            plan_warnings.append("No terrain-correction field and no elevation raster: cba is left empty.")

    config = {
        "command": command,
        "dem": v["DEM"] if on_dem else None,
        "regional": None,
        "inner_radius": v["INNER_RADIUS"],
        "outer_radius": v["OUTER_RADIUS"],
        "density": v["DENSITY"],
        "reference_density": reference_density_of(density),
    }
    if command == "terrain":
        config.update(method=v["METHOD"], zone_fields=bool(v["ZONE_FIELDS"]), water_density=v.get("WATER_DENSITY"))
    else:
        config.update(
            terrain_from_dem=on_dem and not tc_field,
            normal_gravity=v["NORMAL_GRAVITY"],
            height_correction=v["HEIGHT_CORRECTION"],
            atmospheric=bool(v["ATMOSPHERIC"]),
            curvature=bool(v["CURVATURE"]),
        )
    regional_source = None
    uses_regional = regional is not None and on_dem and (command == "terrain" or not tc_field)
    if uses_regional:
        regional_source = v["REGIONAL_DEM"]
        if not same_crs(regional.crs_wkt, dem.crs_wkt):
            plan_warnings.append("Reprojecting the regional elevation raster to the CRS of the fine one.")
            config["regional_warp"] = (regional.crs_wkt, dem.crs_wkt)
        else:
            config["regional"] = v["REGIONAL_DEM"]
    ds = None
    return Plan(
        command=command,
        values=v,
        stations_path=path,
        layer_name=layer_name,
        n=n,
        arrays=arrays,
        flags={"a": flags_a, "b": flags_b, "c": flags_c},
        config=config,
        positions=(x, y),
        regional_source=regional_source,
        warnings=plan_warnings,
    )
