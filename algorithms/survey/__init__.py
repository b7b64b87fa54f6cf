# SPDX-License-Identifier: GPL-2.0-or-later
"""From gravimeter readings to observed gravity: times, Earth tide, calibration, drift and ties."""

from ._adjustment import (
    DEFAULT_KNOWN_SIGMA,
    DEFAULT_OUTLIER_LIMIT,
    DEFAULT_READING_SIGMA,
    adjust_network,
)
from ._calibration import (
    FREE_AIR_GRADIENT,
    CalibrationTable,
    counter_to_mgal,
    instrument_height_correction,
)
from ._drift import linear_drift
from ._ephemeris import delta_t_seconds, moon_ecliptic, moon_position, sun_position
from ._network import (
    LoopClosure,
    NetworkResult,
    duplicate_readings,
    loop_closures,
    tied_stations,
    times_going_backwards,
)
from ._tide import DEFAULT_GRAVIMETRIC_FACTOR, TideParts, longman_tide, longman_tide_parts
from ._tide_positions import meeus_tide, meeus_tide_parts, station_position
from ._times import ACCEPTED_FORMS, ReadingTime, julian_centuries_1900, parse_time, utc_hours_to_iso

__all__ = [
    "ACCEPTED_FORMS",
    "DEFAULT_GRAVIMETRIC_FACTOR",
    "DEFAULT_KNOWN_SIGMA",
    "DEFAULT_OUTLIER_LIMIT",
    "DEFAULT_READING_SIGMA",
    "FREE_AIR_GRADIENT",
    "CalibrationTable",
    "LoopClosure",
    "NetworkResult",
    "ReadingTime",
    "TideParts",
    "adjust_network",
    "counter_to_mgal",
    "delta_t_seconds",
    "duplicate_readings",
    "instrument_height_correction",
    "julian_centuries_1900",
    "linear_drift",
    "longman_tide",
    "longman_tide_parts",
    "loop_closures",
    "meeus_tide",
    "meeus_tide_parts",
    "moon_ecliptic",
    "moon_position",
    "parse_time",
    "station_position",
    "sun_position",
    "tied_stations",
    "times_going_backwards",
    "utc_hours_to_iso",
]
