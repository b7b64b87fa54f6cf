# SPDX-License-Identifier: GPL-2.0-or-later
"""What a map caption and the survey report say about a run, read from provenance records.

Pure Python (no QGIS): the records are the dicts that
:func:`relief_gravity.plugin.provenance.read_record` returns. A value is
searched in the steps from the latest back, first in a step's ``settings``
(what the science used), then in its ``parameters`` (what the user gave),
under any of a few names. Missing values stay ``None`` and the caller says
"not recorded" or uses a fall-back it names.

Examples
--------
>>> record = {"steps": [{"algorithm": "reliefgravity:bouguerreduction",
...                      "time": "2026-05-04T10:00:00+00:00",
...                      "parameters": {"DENSITY": 2670.0, "NORMAL_GRAVITY": 0},
...                      "settings": {}}]}
>>> facts = run_facts([record])
>>> facts.density, facts.normal_formula, facts.date
(2670.0, 'grs80', '2026-05-04')
"""

from __future__ import annotations

import datetime as _dt
from dataclasses import dataclass

#: Names under which the steps may hold each value (settings first, then parameters).
DENSITY_KEYS = ("density", "density_kg_m3", "reduction_density", "DENSITY")
NORMAL_KEYS = ("normal_formula", "normal_gravity", "NORMAL_GRAVITY")
HEIGHT_KEYS = ("height_formula", "height_correction", "HEIGHT_CORRECTION")
STANDARD_KEYS = ("standard",)
INTERVAL_KEYS = ("contour_interval_mgal", "contour_interval", "interval_used", "CONTOUR_INTERVAL")

#: Enum order of the reduction's NORMAL_GRAVITY and HEIGHT_CORRECTION
#: parameters (public API of ``reliefgravity:bouguerreduction``).
NORMAL_OPTIONS = ("grs80", "wgs84", "1967")
HEIGHT_OPTIONS = ("second_order", "first_order")

#: Readable names of the normal-gravity formulas.
NORMAL_NAMES = {"grs80": "GRS80", "wgs84": "WGS84", "1967": "GRS67 (1967 formula)"}
HEIGHT_NAMES = {"second_order": "second-order height correction", "first_order": "0.3086 mGal/m height correction"}


@dataclass(frozen=True)
class RunFacts:
    """Values of a run for a caption or a report (None = not recorded)."""

    density: float | None = None
    normal_formula: str | None = None
    height_formula: str | None = None
    standard: str | None = None
    contour_interval: float | None = None
    date: str | None = None
    algorithms: tuple = ()


def _steps(records):
    steps = []
    for record in records:
        if isinstance(record, dict):
            steps.extend(step for step in record.get("steps", []) if isinstance(step, dict))
    return steps


def find_value(records, keys):
    """The first value under one of ``keys``, latest step first; settings before parameters."""
    for step in reversed(_steps(records)):
        for section in ("settings", "parameters"):
            values = step.get(section) or {}
            for key in keys:
                if values.get(key) not in (None, ""):
                    return values[key]
    return None


def _option(value, options):
    """An enum index (int or digit string) to its option name; names pass through."""
    if value is None:
        return None
    if isinstance(value, bool):
        return None
    if isinstance(value, int) or (isinstance(value, str) and value.isdigit()):
        index = int(value)
        return options[index] if 0 <= index < len(options) else None
    return str(value).lower()


def _number(value):
    try:
        number = float(value)
    except (TypeError, ValueError):
        return None
    return number if number == number else None


def _date(records):
    for step in reversed(_steps(records)):
        text = step.get("time")
        if text:
            try:
                return _dt.datetime.fromisoformat(str(text).replace("Z", "+00:00")).date().isoformat()
            except ValueError:
                continue
    return None


def run_facts(records) -> RunFacts:
    """Collect :class:`RunFacts` from provenance records (None entries are skipped)."""
    records = [record for record in records if record]
    density = _number(find_value(records, DENSITY_KEYS))
    if density is not None and density < 20:  # a record in g/cm3
        density *= 1000.0
    seen = []
    for step in _steps(records):
        name = step.get("algorithm")
        if name and name not in seen:
            seen.append(str(name))
    standard = find_value(records, STANDARD_KEYS)
    return RunFacts(
        density=density,
        normal_formula=_option(find_value(records, NORMAL_KEYS), NORMAL_OPTIONS),
        height_formula=_option(find_value(records, HEIGHT_KEYS), HEIGHT_OPTIONS),
        standard=str(standard) if standard else None,
        contour_interval=_number(find_value(records, INTERVAL_KEYS)),
        date=_date(records),
        algorithms=tuple(seen),
    )


def standard_text(facts: RunFacts) -> str | None:
    """A short description of the reduction standard, or None when nothing is recorded.

    Examples
    --------
    >>> standard_text(RunFacts(normal_formula="grs80", height_formula="second_order"))
    'GRS80 normal gravity, second-order height correction'
    """
    if facts.standard:
        return facts.standard
    parts = []
    if facts.normal_formula:
        parts.append(NORMAL_NAMES.get(facts.normal_formula, facts.normal_formula) + " normal gravity")
    if facts.height_formula:
        parts.append(HEIGHT_NAMES.get(facts.height_formula, facts.height_formula))
    return ", ".join(parts) or None


def interval_from_levels(levels) -> float | None:
    """The contour interval of a set of levels: the smallest step between distinct values.

    Examples
    --------
    >>> interval_from_levels([-5.0, 0.0, 2.5, 7.5, 2.5])
    2.5
    >>> interval_from_levels([3.0]) is None
    True
    """
    distinct = sorted({round(float(v), 9) for v in levels if v is not None and float(v) == float(v)})
    steps = [b - a for a, b in zip(distinct, distinct[1:]) if b - a > 1e-9]
    return round(min(steps), 9) if steps else None
