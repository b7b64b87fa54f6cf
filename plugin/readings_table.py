# SPDX-License-Identifier: GPL-2.0-or-later
"""Reading the field readings, the station layer and the calibration table into arrays.

Numbers may arrive as text (a CSV file opened without a type file): text is
read with a point as the decimal separator. Times may be text (ISO 8601) or
date-time fields.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
from qgis.core import NULL, QgsFeatureRequest, QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication, QDateTime, Qt

from ..algorithms.survey import ACCEPTED_FORMS, CalibrationTable, parse_time


def _tr(text: str) -> str:
    return QCoreApplication.translate("ReadingsTable", text)


def number(value) -> float:
    """A number from a numeric or text attribute; NaN when empty or not a number."""
    if value is None or value == NULL:
        return math.nan
    if isinstance(value, str):
        value = value.strip()
        if not value:
            return math.nan
    try:
        result = float(value)
    except (TypeError, ValueError):
        return math.nan
    return result if math.isfinite(result) else math.nan


def key_text(value) -> str:
    """A station or loop id as text: 12, 12.0 and '12' are the same id; '' for empty."""
    if value is None or value == NULL:
        return ""
    if isinstance(value, float) and value.is_integer():
        return str(int(value))
    return str(value).strip()


def time_text(value) -> str | None:
    """ISO 8601 text of a time attribute (a date-time keeps its offset), None when empty."""
    if value is None or value == NULL:
        return None
    if isinstance(value, QDateTime):
        if not value.isValid():
            return None
        return value.toString(Qt.ISODateWithMs)
    text = str(value).strip()
    return text or None


def check_cancel(feedback) -> None:
    """Raise ``QgsProcessingException`` when the user has cancelled the run."""
    if feedback is not None and feedback.isCanceled():
        raise QgsProcessingException(_tr("Cancelled by the user."))


@dataclass
class Readings:
    """The readings in input order."""

    features: list
    station_key: list
    utc_hours: np.ndarray
    local_date: list
    raw: np.ndarray
    instrument_height: np.ndarray
    loop_key: list


def read_readings(source, fields: dict, utc_offset: float, feedback) -> Readings:
    """Read every row of the readings table.

    ``fields`` maps "station", "time", "reading", "height", "loop" to field
    names (height and loop may be None).

    Raises
    ------
    QgsProcessingException
        For an empty table or a time that cannot be read (naming the row).
    """
    features, stations, hours, dates, raw, heights, loops = [], [], [], [], [], [], []
    bad = []
    for row, feature in enumerate(source.getFeatures(QgsFeatureRequest()), start=1):
        check_cancel(feedback)
        text = time_text(feature[fields["time"]])
        try:
            parsed = parse_time(text, utc_offset)
        except ValueError:
            bad.append((row, text))
            parsed = None
        features.append(feature)
        stations.append(key_text(feature[fields["station"]]))
        hours.append(parsed.utc_hours if parsed else math.nan)
        dates.append(parsed.local_date if parsed else "")
        raw.append(number(feature[fields["reading"]]))
        heights.append(number(feature[fields["height"]]) if fields.get("height") else 0.0)
        loops.append(key_text(feature[fields["loop"]]) if fields.get("loop") else "")
    if not features:
        raise QgsProcessingException(_tr("The readings table has no rows: there is nothing to process."))
    if bad:
        rows = ", ".join(f"{row} ('{text if text is not None else ''}')" for row, text in bad[:5])
        more = _tr(" and {} more").format(len(bad) - 5) if len(bad) > 5 else ""
        raise QgsProcessingException(
            _tr(
                "The time of row(s) {}{} of the readings cannot be read. Accepted forms: {}, or a date-time field."
            ).format(rows, more, ACCEPTED_FORMS)
        )
    return Readings(
        features=features,
        station_key=stations,
        utc_hours=np.array(hours),
        local_date=dates,
        raw=np.array(raw),
        instrument_height=np.array(heights),
        loop_key=loops,
    )


def read_calibration(source) -> CalibrationTable:
    """The calibration table from a table with fields counter, mgal and factor (any case)."""
    fields = source.fields()
    names = {}
    for wanted in ("counter", "mgal", "factor"):
        index = next((i for i, f in enumerate(fields) if f.name().strip().lower() == wanted), -1)
        if index < 0:
            raise QgsProcessingException(
                _tr("The calibration table needs the fields counter, mgal and factor; it has {}.").format(
                    ", ".join(fields.names())
                )
            )
        names[wanted] = fields.at(index).name()
    columns = {k: [] for k in names}
    for row, feature in enumerate(source.getFeatures(QgsFeatureRequest()), start=1):
        for wanted, name in names.items():
            value = number(feature[name])
            if math.isnan(value):
                raise QgsProcessingException(
                    _tr("Row {} of the calibration table has no number in its field {}.").format(row, name)
                )
            columns[wanted].append(value)
    try:
        return CalibrationTable.from_rows(columns["counter"], columns["mgal"], columns["factor"])
    except ValueError as error:
        raise QgsProcessingException(_tr("The calibration table cannot be used: {}.").format(error)) from None


def index_keys(keys: list) -> tuple[np.ndarray, list]:
    """Integer index of each key in order of first appearance, and the distinct keys."""
    order, out = {}, []
    for key in keys:
        if key not in order:
            order[key] = len(order)
        out.append(order[key])
    return np.array(out, dtype=int), list(order)
