# SPDX-License-Identifier: GPL-2.0-or-later
"""Units and plausibility of survey inputs: catch the ordinary accidents early.

Each check returns a small result naming the likely cause (or None when the
input looks right); the plugin turns it into a sentence naming the setting
that fixes it. Limits and their sources are module constants.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

#: ``GRAVITY_UNITS`` options and their factor to mGal (1 Gal = 1 cm/s^2 =
#: 1000 mGal; 1 um/s^2 = 0.1 mGal; 1 m/s^2 = 1e5 mGal: SI definitions).
GRAVITY_UNITS = ("mGal", "um/s2", "Gal", "m/s2")
TO_MGAL = (1.0, 0.1, 1000.0, 1.0e5)

#: Observed gravity on or near Earth's surface, mGal: GRS80 normal gravity
#: spans 978 032.7 (equator) to 983 218.6 (poles) (Moritz 2000, GRS80 table);
#: the highest summit (8.85 km) lowers it by about 2 700 mGal and anomalies
#: add a few hundred. Common practice, no source, for the margins.
GRAVITY_RANGE_MGAL = (975_000.0, 984_000.0)

#: Hard limits of a reduction or terrain density, kg/m^3. Outside them no
#: rock is meant: 500 is below any sediment or ice (917), 5000 above any
#: common rock (massive sulphides reach about 4 500; from memory).
DENSITY_LIMITS = (500.0, 5000.0)

#: Highest point on Earth plus a margin (m, Everest 8 849 m; from memory).
MAX_EARTH_HEIGHT = 9000.0
#: Lowest DEM value taken as real (deepest ocean about -10 935 m; from memory).
MIN_EARTH_HEIGHT = -11_100.0
#: Values GDAL users meet as void markers in rasters without a NoData tag
#: (common practice, no source).
VOID_MARKERS = (-32768.0, -32767.0, -9999.0, -99999.0, -3.4028234663852886e38)

#: Candidate scales of wrongly declared heights (value as read -> metres).
FOOT = 0.3048
#: ``feet``: station heights in feet read as metres; ``centimetres``: in
#: centimetres; ``inverse_feet``: the DEM is 3.28 x the stations (DEM in feet,
#: or metre heights declared as feet); ``inverse_centimetres``: 100 x.
HEIGHT_SCALES = {"feet": FOOT, "centimetres": 0.01, "inverse_feet": 1.0 / FOOT, "inverse_centimetres": 100.0}


def gravity_to_mgal(values, units: int):
    """Observed gravity in mGal from the chosen ``GRAVITY_UNITS`` option.

    Examples
    --------
    >>> gravity_to_mgal([9.80665], 3).round(3).tolist()
    [980665.0]
    """
    return np.asarray(values, dtype=float) * TO_MGAL[int(units)]


@dataclass(frozen=True)
class GravityProblem:
    """Observed gravity outside Earth's range after units.

    ``likely_units`` is the ``GRAVITY_UNITS`` option that brings the median
    into range (None when none does, e.g. zeros or relative readings);
    ``share`` the fraction of stations outside the range.
    """

    median: float
    share: float
    likely_units: int | None
    zeros: bool


def check_gravity(raw_values, units: int, majority: float = 0.5):
    """A problem when most stations' observed gravity lies outside Earth's range.

    Parameters
    ----------
    raw_values : array_like
        Observed gravity as read from the layer, in the declared ``units``; NaN ignored.
    units : int
        The declared ``GRAVITY_UNITS`` option.
    majority : float
        Share of stations out of range that makes a whole-run problem.

    Returns
    -------
    GravityProblem or None
        ``median`` is in mGal after the declared units.

    Examples
    --------
    >>> check_gravity([9.806, 9.807], 0).likely_units
    3
    >>> check_gravity([980_600.0, 980_610.0], 0) is None
    True
    >>> check_gravity([980_600.0, 980_610.0], 2).likely_units
    0
    """
    raw = np.asarray(raw_values, dtype=float)
    raw = raw[np.isfinite(raw)]
    if raw.size == 0:
        return None
    v = gravity_to_mgal(raw, units)
    low, high = GRAVITY_RANGE_MGAL
    out = (v < low) | (v > high)
    share = float(out.mean())
    if share <= majority:
        return None
    median_raw = float(np.median(raw))
    likely = None
    for option, factor in enumerate(TO_MGAL):
        if option != int(units) and low <= median_raw * factor <= high:
            likely = option
            break
    return GravityProblem(float(np.median(v)), share, likely, bool(np.all(raw == 0)))


def gravity_out_of_range(values_mgal):
    """Boolean mask of stations whose gravity lies outside Earth's range.

    Examples
    --------
    >>> gravity_out_of_range([980_000.0, 0.0, np.nan]).tolist()
    [False, True, False]
    """
    v = np.asarray(values_mgal, dtype=float)
    low, high = GRAVITY_RANGE_MGAL
    return np.isfinite(v) & ((v < low) | (v > high))


def height_scale_problem(station, dem, min_stations: int = 3):
    """Name of the unit mistake that makes station heights match the DEM, or None.

    Compares the median absolute difference between station and DEM heights
    (both read as metres) with the same after rescaling the stations by each
    candidate of ``HEIGHT_SCALES``. A candidate is named when it brings the
    median difference below a third of the unscaled one and below 30 m, with
    the unscaled one above 30 m (geoid-sized offsets stay within about 100 m;
    the ratio test tells them apart). Common practice, no source.

    Examples
    --------
    >>> dem = np.array([300.0, 520.0, 800.0, 410.0])
    >>> height_scale_problem(dem / 0.3048, dem)
    'feet'
    >>> height_scale_problem(dem + 47.0, dem) is None
    True
    """
    h = np.asarray(station, dtype=float)
    z = np.asarray(dem, dtype=float)
    ok = np.isfinite(h) & np.isfinite(z)
    if ok.sum() < min_stations:
        return None
    h, z = h[ok], z[ok]
    plain = float(np.median(np.abs(h - z)))
    if plain <= 30.0:
        return None
    best, best_misfit = None, plain
    for name, scale in HEIGHT_SCALES.items():
        misfit = float(np.median(np.abs(h * scale - z)))
        if misfit < best_misfit:
            best, best_misfit = name, misfit
    if best is not None and best_misfit < plain / 3.0 and best_misfit < 30.0:
        return best
    return None


@dataclass(frozen=True)
class DemProblem:
    """Why DEM values cannot be metres.

    ``kind`` is ``"void"``, ``"too_high"`` or ``"too_low"``; ``value`` the
    offending value.
    """

    kind: str
    value: float


def dem_value_problem(minimum: float, maximum: float, has_nodata: bool):
    """A problem with a DEM's value range (untagged voids, not metres), or None.

    Parameters
    ----------
    minimum, maximum : float
        The raster's valid value range (NoData excluded when tagged).
    has_nodata : bool
        Whether the raster carries a NoData tag.

    Examples
    --------
    >>> dem_value_problem(-32768.0, 1500.0, False).kind
    'void'
    >>> dem_value_problem(200.0, 1500.0, False) is None
    True
    >>> dem_value_problem(6000.0, 30000.0, True).kind
    'too_high'
    """
    if not has_nodata and any(np.isclose(minimum, m, rtol=1e-6) for m in VOID_MARKERS):
        return DemProblem("void", float(minimum))
    if maximum > MAX_EARTH_HEIGHT:
        return DemProblem("too_high", float(maximum))
    if minimum < MIN_EARTH_HEIGHT:
        return DemProblem("too_low", float(minimum))
    return None


@dataclass(frozen=True)
class DensityProblem:
    """A density outside ``DENSITY_LIMITS``.

    ``factor`` is 1000 when the value times 1000 (g/cm^3 given as kg/m^3) or
    divided by 1000 (kg/m^3 declared g/cm^3, or g/m^3) falls inside, else None.
    """

    value: float
    factor: float | None


def density_problem(value: float):
    """Whether a density (kg/m^3) lies outside ``DENSITY_LIMITS``, and why.

    Examples
    --------
    >>> density_problem(2.67).factor
    1000.0
    >>> density_problem(2_670_000.0).factor
    0.001
    >>> density_problem(2670.0) is None
    True
    """
    low, high = DENSITY_LIMITS
    if np.isfinite(value) and low <= value <= high:
        return None
    for factor in (1000.0, 0.001):
        if np.isfinite(value) and low <= value * factor <= high:
            return DensityProblem(float(value), factor)
    return DensityProblem(float(value), None)
