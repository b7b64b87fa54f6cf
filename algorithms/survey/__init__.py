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
from ._network import (
    LoopClosure,
    NetworkResult,
    duplicate_readings,
    loop_closures,
    tied_stations,
    times_going_backwards,
)
from ._tide import DEFAULT_GRAVIMETRIC_FACTOR, TideParts, longman_tide, longman_tide_parts
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
    "duplicate_readings",
    "instrument_height_correction",
    "julian_centuries_1900",
    "linear_drift",
    "longman_tide",
    "longman_tide_parts",
    "loop_closures",
    "parse_time",
    "tied_stations",
    "times_going_backwards",
    "utc_hours_to_iso",
]
