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

from ..algorithms.constants import PLAUSIBLE_DENSITY
from ..algorithms.plausibility import DENSITY_LIMITS, density_problem
from ..algorithms.terrain import parse_zones, sample_bilinear
from .adapters import reference_density_of
from .errors import BatchError
from .heights import check_datum_options, check_dem_values, check_geoid_values, observed_mgal, prepare_heights
from .options import COMMANDS
from .rasters import open_checked, same_crs
from .vector import field_problem, geographic_wkt, layer_srs, open_layer, output_driver, read_arrays, transform_points

FOOT = 0.3048
#: Two-sided 95 % quantile of the normal distribution (as plugin/uncertainty_run.py).
Z95 = 1.959964


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
                msg = f"{p.option} must be a number, got {value}."
                raise BatchError(msg)
            if p.minimum is not None and value < p.minimum:
                msg = f"{p.option} must be at least {p.minimum:g}, got {value:g}."
                raise BatchError(msg)
            if p.maximum is not None and value > p.maximum:
                msg = f"{p.option} must be at most {p.maximum:g}, got {value:g}."
                raise BatchError(msg)
    problem = _density_sentence(v["DENSITY"], "DENSITY")
    if problem:
        raise BatchError(problem)
    inner, outer = v["INNER_RADIUS"], v["OUTER_RADIUS"]
    if not 0 < inner < outer:
        msg = f"The inner zone radius ({inner} m) must be positive and smaller than the outer zone radius ({outer} m)."
        raise BatchError(msg)


def _labels(command: str, v: dict) -> dict:
    keys = {
        "terrain": {
            "HEIGHT_FIELD": "station height",
            "INNERMOST_TC_FIELD": "innermost-ring correction",
            "GEOID_FIELD": "geoid height",
        },
        "reduce": {
            "GRAVITY_FIELD": "observed gravity",
            "HEIGHT_FIELD": "station height",
            "DENSITY_FIELD": "density",
            "TC_FIELD": "terrain correction",
            "GEOID_FIELD": "geoid height",
            "HEIGHT_SIGMA_FIELD": "station height error",
        },
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
        msg = "The output must be a new file: the station file is never altered."
        raise BatchError(msg)
    folder = os.path.dirname(os.path.abspath(out))
    if not os.path.isdir(folder) or not os.access(folder, os.W_OK):
        msg = f"The output folder {folder} does not exist or is not writable."
        raise BatchError(msg)
    if os.path.exists(out) and not overwrite and not resuming:
        msg = f"The output {out} exists; add --overwrite to replace it, or choose another name."
        raise BatchError(msg)


def _density_sentence(value: float, setting: str) -> str:
    """The plugin's sentence for a density outside the limits, or ''."""
    problem = density_problem(value)
    if problem is None:
        return ""
    low, high = DENSITY_LIMITS
    if problem.factor == 1000.0:
        return (
            f"A density of {value:g} kg/m³ ({setting}) looks like g/cm³: densities must lie between {low:g} and "
            f"{high:g} kg/m³; enter {value * 1000.0:g} for {value:g} g/cm³."
        )
    if problem.factor == 0.001:
        return (
            f"A density of {value:g} kg/m³ ({setting}) is 1,000 times too large (g/cm³ values multiplied twice, or "
            f"g/m³?): densities must lie between {low:g} and {high:g} kg/m³; enter {value / 1000.0:g}."
        )
    return f"A density of {value:g} kg/m³ ({setting}) is outside the accepted range {low:g}-{high:g} kg/m³."


def _check_options(command: str, v: dict) -> None:
    """Refusals that need no file: geology layer, zones, datums, density interval."""
    if v.get("DENSITY_LAYER") or v.get("DENSITY_LAYER_FIELD"):
        msg = (
            "The batch runner does not take densities from a geology layer (--density-layer): run this case with "
            "the Processing algorithm in QGIS, or give one density (--density) or a per-station density field."
        )
        raise BatchError(msg)
    if command == "terrain":
        try:
            parse_zones(v.get("ZONES") or "BCDEFGHIJKLM")
        except ValueError as error:
            msg = f"Hammer zones: {error}"
            raise BatchError(msg) from error
    check_datum_options(v)
    if command == "reduce":
        low, high = v.get("DENSITY_LOW"), v.get("DENSITY_HIGH")
        if (low is None) != (high is None):
            msg = "Give both bounds of the density interval (--density-low and --density-high), or neither."
            raise BatchError(msg)
        if low is not None and not 0 < low <= high:
            msg = (
                f"The density interval {low} to {high} kg/m³ is impossible: the lower bound must be positive and "
                "not above the upper bound."
            )
            raise BatchError(msg)


def _densities(v: dict, st, n: int, flags: dict, plan_warnings: list) -> np.ndarray:
    """The reduction's densities (the plugin's rules, flags in its order)."""
    values = np.full(n, v["DENSITY"])
    name = v.get("DENSITY_FIELD")
    if name:
        scale = 1000.0 if v["DENSITY_FIELD_UNITS"] == 1 else 1.0
        per_station = st.values[name] * scale
        missing = ~np.isfinite(per_station)
        _flag_where(flags, missing, "density_default")
        low, high = DENSITY_LIMITS
        bad = ~missing & ((per_station < low) | (per_station > high))
        given = int((~missing).sum())
        if given and bad.sum() * 2 > given:
            msg = _density_sentence(float(np.median(per_station[~missing])), "DENSITY_FIELD " + name)
            raise BatchError(msg + " Check --density-field-units (kg/m3 or g/cm3).")
        _flag_where(flags, bad, "density_bad")
        values = np.where(missing, v["DENSITY"], np.where(bad, np.nan, per_station))
    low, high = PLAUSIBLE_DENSITY
    odd = np.isfinite(values) & ((values < low) | (values > high))
    if np.any(odd):
        plan_warnings.append(
            f"{int(odd.sum())} station(s) have a reduction density outside {low}-{high} kg/m³ (e.g. "
            f"{float(values[odd][0])}); check the units."
        )
        _flag_where(flags, odd, "density_unusual")
    return values


def _given_geoid(v: dict, st, srs):
    """Geoid heights at the stations from --geoid-field or --geoid-raster, or None."""
    if v.get("GEOID_FIELD"):
        values = st.values[v["GEOID_FIELD"]]
        check_geoid_values(values, f"the field {v['GEOID_FIELD']}")
        return values
    if not v.get("GEOID_RASTER"):
        return None
    raster = open_checked(v["GEOID_RASTER"], "geoid raster")
    gx, gy = transform_points(srs, raster.crs_wkt, st.x, st.y)
    values = raster.sample_bilinear(gx, gy)
    check_geoid_values(values, f"the raster {v['GEOID_RASTER']}")
    return values


def prepare(command: str, v: dict, *, overwrite: bool = False, resuming: bool = False) -> Plan:
    """Check the options and read the stations; raise ``BatchError`` with a sentence."""
    _check_numbers(command, v)
    _check_options(command, v)
    _check_output(v, overwrite, resuming)
    path, _, rest = v["INPUT"].partition("|layername=")
    layer_name = rest or None
    ds, lyr = open_layer(path, layer_name)
    problem = field_problem(lyr, _labels(command, v))
    if problem:
        raise BatchError(problem)
    height_field = v.get("HEIGHT_FIELD")
    if command == "reduce" and not height_field and not v.get("DEM"):
        msg = "Choose a station height field or an elevation raster to sample heights from."
        raise BatchError(msg)
    dem = open_checked(v["DEM"], "elevation raster") if v.get("DEM") else None
    regional = open_checked(v["REGIONAL_DEM"], "regional elevation raster") if v.get("REGIONAL_DEM") else None

    srs = layer_srs(lyr)
    if srs is None:
        msg = "The station layer has no coordinate reference system. Assign its CRS so latitudes can be computed."
        raise BatchError(msg)
    if lyr.GetFeatureCount() == 0:
        msg = "The station layer has no features: there is nothing to reduce."
        raise BatchError(msg)
    keys = (
        "GRAVITY_FIELD",
        "HEIGHT_FIELD",
        "DENSITY_FIELD",
        "TC_FIELD",
        "INNERMOST_TC_FIELD",
        "GEOID_FIELD",
        "HEIGHT_SIGMA_FIELD",
    )
    names = [v[k] for k in keys if v.get(k)]
    defn = lyr.GetLayerDefn()
    has_g_sigma = command == "reduce" and defn.GetFieldIndex("g_sigma") >= 0
    if has_g_sigma:
        names.append("g_sigma")
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
            msg = (
                f"No station lies on the elevation raster (raster extent {west:.6g}, {east:.6g}, {south:.6g}, "
                f"{north:.6g} "
                "in its own CRS). Check that the raster covers the survey and that both layers have the right CRS."
            )
            raise BatchError(msg)
        check_dem_values(v["DEM"], "elevation raster")
    else:
        x, y = st.x.copy(), st.y.copy()
    if regional is not None and on_dem and not tc_field:
        check_dem_values(v["REGIONAL_DEM"], "regional elevation raster")
    arrays = {"x": x, "y": y, "latitude": lat}
    plan_warnings = []
    density = np.full(n, v["DENSITY"])
    if command == "reduce":
        observed, odd = observed_mgal(st.values[v["GRAVITY_FIELD"]], v["GRAVITY_UNITS"], v["GRAVITY_FIELD"])
        _flag_where(flags_a, np.isnan(st.values[v["GRAVITY_FIELD"]]), "no_gravity")
        _flag_where(flags_a, odd, "gravity_implausible")
        arrays["observed"] = observed
        density = _densities(v, st, n, flags_a, plan_warnings)

    flags_b: dict = {}
    raw = None
    if height_field:
        raw = st.values[height_field] * (1.0, FOOT, 0.01)[v["HEIGHT_UNITS"]]
        _flag_where(flags_b, np.isnan(raw), "no_height")
    given = _given_geoid(v, st, srs)
    dem_at = sample_bilinear(dem.elevation_grid(), x, y) if on_dem else None
    heights = prepare_heights(raw, v["HEIGHT_DATUM"], v["DEM_DATUM"], given, lon, lat, dem_at, v["HEIGHT_UNITS"])
    _flag_where(flags_b, heights.geoid_missing, "geoid_missing")
    if heights.from_dem is not None:
        _flag_where(flags_b, heights.from_dem, "height_from_dem")
        _flag_where(flags_b, ~heights.from_dem, "no_height")
    arrays["heights"] = heights.in_dem

    flags_c: dict = {}
    if command == "terrain":
        innermost = v.get("INNERMOST_TC_FIELD")
        arrays["innermost"] = st.values[innermost] if innermost else None
    else:
        orthometric = bool(v["ORTHOMETRIC_REDUCTION"])
        reduction = heights.orthometric if orthometric else heights.ellipsoidal
        if orthometric and not np.isfinite(reduction).any() and np.isfinite(heights.ellipsoidal).any():
            msg = "Orthometric reduction needs geoid heights: PROJ's EGM96 grid or --geoid-field/--geoid-raster."
            raise BatchError(msg)
        arrays["reduction_heights"] = reduction
        arrays["density"] = density
        arrays["tc_field"] = st.values[tc_field] if tc_field else None
        if tc_field:
            _flag_where(flags_c, np.isnan(arrays["tc_field"]), "no_tc")
        elif dem is None:
            plan_warnings.append("No terrain-correction field and no elevation raster: cba is left empty.")
        height_sigma = np.full(n, v["HEIGHT_SIGMA"] if v.get("HEIGHT_SIGMA") is not None else 0.05)
        if v.get("HEIGHT_SIGMA_FIELD"):
            given_sigma = st.values[v["HEIGHT_SIGMA_FIELD"]]
            height_sigma = np.where(np.isfinite(given_sigma) & (given_sigma >= 0), given_sigma, height_sigma)
        gravity_sigma = np.full(n, v["G_SIGMA"] if v.get("G_SIGMA") is not None else 0.02)
        if has_g_sigma:
            given_sigma = st.values["g_sigma"]
            gravity_sigma = np.where(np.isfinite(given_sigma) & (given_sigma >= 0), given_sigma, gravity_sigma)
        arrays["height_sigma"] = height_sigma
        arrays["gravity_sigma"] = gravity_sigma

    config = {
        "command": command,
        "dem": v["DEM"] if on_dem else None,
        "regional": None,
        "inner_radius": v["INNER_RADIUS"],
        "outer_radius": v["OUTER_RADIUS"],
        "density": v["DENSITY"],
        "reference_density": reference_density_of(density),
        "engine_check": bool(v.get("ENGINE_CHECK")),
    }
    if command == "terrain":
        zones = "".join(z.letter for z in parse_zones(v.get("ZONES") or "BCDEFGHIJKLM"))
        config.update(
            method=v["METHOD"], zone_fields=bool(v["ZONE_FIELDS"]), water_density=v.get("WATER_DENSITY"), zones=zones
        )
    else:
        low, high = v.get("DENSITY_LOW"), v.get("DENSITY_HIGH")
        config.update(
            terrain_from_dem=on_dem and not tc_field,
            normal_gravity=v["NORMAL_GRAVITY"],
            height_correction=v["HEIGHT_CORRECTION"],
            atmospheric=bool(v["ATMOSPHERIC"]),
            curvature=bool(v["CURVATURE"]),
            dem_sigma=v["DEM_SIGMA"] if v.get("DEM_SIGMA") is not None else 1.0,
            density_sigma=None if low is None or high is None else (high - low) / (2.0 * Z95),
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
    del ds
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
