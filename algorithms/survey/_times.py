# SPDX-License-Identifier: GPL-2.0-or-later
"""Reading times: ISO 8601 text to UTC, and the local calendar day of a reading.

Inside the science a time is a float number of hours since 2000-01-01 00:00 UTC
(``utc_hours``); the tide needs UTC, and hours keep drift rates readable
(mGal per hour).
"""

from __future__ import annotations

import datetime as _dt
import math
import re
from dataclasses import dataclass

#: The epoch of ``utc_hours``.
EPOCH = _dt.datetime(2000, 1, 1, tzinfo=_dt.timezone.utc)

#: The forms accepted, in words (for error sentences).
ACCEPTED_FORMS = (
    "YYYY-MM-DDTHH:MM[:SS[.sss]] with an optional offset Z, +HH:MM, -HH:MM, +HHMM or +HH "
    "(a space may replace the T)"
)

_ISO = re.compile(
    r"^\s*(\d{4})-(\d{2})-(\d{2})[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?"
    r"\s*(Z|z|[+-]\d{2}(?::?\d{2})?)?\s*$"
)


@dataclass(frozen=True)
class ReadingTime:
    """One parsed reading time.

    Attributes
    ----------
    utc_hours : float
        Hours since 2000-01-01 00:00 UTC.
    local_date : str
        Calendar date (YYYY-MM-DD) of the reading in local time: the time's
        own offset when it has one, else the survey's UTC offset.
    had_offset : bool
        True when the text carried its own offset (Z or +-HH:MM).
    """

    utc_hours: float
    local_date: str
    had_offset: bool


def parse_time(text, utc_offset_hours: float = 0.0) -> ReadingTime:
    """Parse an ISO 8601 date and time into UTC hours.

    A time without an offset is local time at ``utc_offset_hours`` east of
    UTC: ``UTC = local - offset``. A time with its own offset ignores
    ``utc_offset_hours``.

    Parameters
    ----------
    text : str
        E.g. ``2026-05-04T09:13:27-06:00``, ``2026-05-04 09:13`` or
        ``2026-05-04T15:13:27Z``.
    utc_offset_hours : float
        Offset of local time from UTC in hours (east positive), used only for
        times without an offset.

    Returns
    -------
    ReadingTime

    Raises
    ------
    ValueError
        When the text is not one of :data:`ACCEPTED_FORMS` or names an
        impossible date or time.

    Examples
    --------
    >>> parse_time("2000-01-01T06:30:00+02:00").utc_hours
    4.5
    >>> t = parse_time("2000-01-02 01:00", utc_offset_hours=-3)
    >>> t.utc_hours, t.local_date
    (28.0, '2000-01-02')
    """
    if not math.isfinite(utc_offset_hours) or abs(utc_offset_hours) > 14:
        msg = f"the UTC offset must be between -14 and +14 hours, got {utc_offset_hours}"
        raise ValueError(msg)
    match = _ISO.match(str(text)) if text is not None else None
    if match is None:
        msg = f"time {text!r} is not in the form {ACCEPTED_FORMS}"
        raise ValueError(msg)
    year, month, day, hour, minute = (int(match.group(i)) for i in range(1, 6))
    second = int(match.group(6) or 0)
    fraction = float("0." + match.group(7)) if match.group(7) else 0.0
    zone = match.group(8)
    if zone is None:
        offset = utc_offset_hours
    elif zone in ("Z", "z"):
        offset = 0.0
    else:
        digits = zone[1:].replace(":", "")
        offset = int(digits[:2]) + (int(digits[2:4]) / 60.0 if len(digits) > 2 else 0.0)
        offset = -offset if zone[0] == "-" else offset
        if offset > 14 or offset < -14:
            msg = f"time {text!r} has an offset outside -14..+14 hours"
            raise ValueError(msg)
    try:
        local = _dt.datetime(year, month, day, hour, minute, second)
    except ValueError as error:
        msg = f"time {text!r} is not a valid date and time ({error})"
        raise ValueError(msg) from None
    naive_utc = local - _dt.timedelta(hours=offset)
    hours = (naive_utc.replace(tzinfo=_dt.timezone.utc) - EPOCH).total_seconds() / 3600.0 + fraction / 3600.0
    return ReadingTime(utc_hours=hours, local_date=local.date().isoformat(), had_offset=zone is not None)


def utc_hours_to_iso(hours: float) -> str:
    """ISO 8601 UTC text (to the second) of a ``utc_hours`` value.

    Examples
    --------
    >>> utc_hours_to_iso(28.5)
    '2000-01-02T04:30:00Z'
    """
    moment = EPOCH + _dt.timedelta(hours=float(hours))
    return moment.replace(microsecond=0).strftime("%Y-%m-%dT%H:%M:%SZ")


def julian_centuries_1900(utc_hours):
    """Julian centuries since 1899-12-31 12:00 UT, Longman's (1959) time T.

    1899-12-31 12:00 is Julian date 2415020.0; 2000-01-01 00:00 is
    2451544.5, i.e. 36524.5 days later.

    Examples
    --------
    >>> round(julian_centuries_1900(12.0), 12)
    1.0
    """
    return (36524.5 + utc_hours / 24.0) / 36525.0
