# SPDX-License-Identifier: GPL-2.0-or-later
"""Reading a station point layer into numpy arrays, and writing the result copy.

Every station gets a row in the output; a value that cannot be read becomes NaN
here (NULL in the output) and a reason in ``qc_flag``.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, field

import numpy as np
from qgis.core import (
    NULL,
    QgsCoordinateReferenceSystem,
    QgsCoordinateTransform,
    QgsCsException,
    QgsFeature,
    QgsFeatureRequest,
    QgsFeatureSink,
    QgsField,
    QgsFields,
    QgsProcessingException,
)
from qgis.PyQt.QtCore import QCoreApplication, QVariant

from .flags import code_of, merged_flag, notes_for

GEOGRAPHIC = QgsCoordinateReferenceSystem("EPSG:4326")


def _tr(text: str) -> str:
    return QCoreApplication.translate("StationTable", text)


def as_float(value) -> float:
    """Attribute value as float; NaN for NULL, empty or non-numeric values."""
    if value is None or value == NULL:
        return math.nan
    try:
        number = float(value)
    except (TypeError, ValueError):
        return math.nan
    return number if math.isfinite(number) else math.nan


@dataclass
class StationTable:
    """The stations of one run, in input order."""

    features: list
    x: np.ndarray
    y: np.ndarray
    longitude: np.ndarray
    latitude: np.ndarray
    flags: list = field(default_factory=list)

    def __len__(self) -> int:
        """Number of stations (features) in the table."""
        return len(self.features)

    def flag(self, index: int, reason: str) -> None:
        """Add a flag code (a reason given as text is mapped to its code)."""
        code = code_of(reason)
        if code and code not in self.flags[index]:
            self.flags[index].append(code)

    def flag_where(self, mask: np.ndarray, reason: str) -> None:
        """Add a flag code to every station where ``mask`` is true.

        Parameters
        ----------
        mask : numpy.ndarray of bool
            One value per station.
        reason : str
            A flag code, or a reason given as text (mapped to its code as in :meth:`flag`).
        """
        for index in np.flatnonzero(mask):
            self.flag(int(index), reason)

    def flag_each(self, reasons) -> None:
        """Add per-station reasons as the engines give them ("" or "a; b")."""
        for index, joined in enumerate(reasons):
            for reason in str(joined).split(";"):
                self.flag(index, reason.strip())

    def field_values(self, name: str | None, scale: float = 1.0, missing_code: str = "") -> np.ndarray:
        """Numeric attribute as a float array (NaN where NULL or not a number).

        Stations where it is missing are flagged ``missing_code``.
        """
        if not name:
            return np.full(len(self), np.nan)
        values = np.array([as_float(f[name]) for f in self.features], dtype=float) * scale
        if missing_code:
            self.flag_where(np.isnan(values), missing_code)
        return values

    def coordinates_in(self, crs, transform_context) -> tuple[np.ndarray, np.ndarray]:
        """Station coordinates transformed into ``crs`` (NaN where impossible)."""
        if not len(self):
            return np.array([]), np.array([])
        transform = QgsCoordinateTransform(self.source_crs, crs, transform_context)
        xs = np.full(len(self), np.nan)
        ys = np.full(len(self), np.nan)
        for i, (x, y) in enumerate(zip(self.x, self.y)):
            if np.isnan(x) or np.isnan(y):
                continue
            try:
                point = transform.transform(float(x), float(y))
            except QgsCsException:
                continue
            if math.isfinite(point.x()) and math.isfinite(point.y()):
                xs[i], ys[i] = point.x(), point.y()
        return xs, ys


def has_real_crs(crs) -> bool:
    """False for a missing CRS and for the GeoPackage placeholders.

    The GeoPackage standard reserves srs_id 0 and -1 for "Undefined
    geographic SRS" and "Undefined cartesian SRS"; QGIS reports them as valid,
    but they locate nothing.
    """
    if not crs.isValid():
        return False
    description = (crs.description() or "") + " " + crs.toWkt()[:60]
    return "Undefined geographic SRS" not in description and "Undefined cartesian SRS" not in description


def read_stations(source, context, feedback) -> StationTable:
    """Read every feature of a point source with its position and latitude.

    Raises
    ------
    QgsProcessingException
        When the layer has no CRS or no features: a problem with the whole run.
    """
    crs = source.sourceCrs()
    if not has_real_crs(crs):
        raise QgsProcessingException(
            _tr(
                "The station layer has no coordinate reference system. Assign its "
                "CRS (Layer Properties > Source) so latitudes can be computed."
            )
        )
    features, xs, ys, multipart = [], [], [], []
    total = source.featureCount() or 0
    for i, feature in enumerate(source.getFeatures(QgsFeatureRequest())):
        if feedback is not None and feedback.isCanceled():
            raise QgsProcessingException(_tr("Cancelled by the user."))
        features.append(QgsFeature(feature))
        geometry = feature.geometry()
        x, y, distinct = _station_point(geometry)
        xs.append(x)
        ys.append(y)
        if distinct:
            multipart.append(i)
        if feedback is not None and total:
            feedback.setProgress(100.0 * (i + 1) / total)
    if not features:
        raise QgsProcessingException(
            _tr("The station layer has no features: there is nothing to reduce.")
        )
    table = StationTable(
        features=features,
        x=np.array(xs, dtype=float),
        y=np.array(ys, dtype=float),
        longitude=np.full(len(features), np.nan),
        latitude=np.full(len(features), np.nan),
        flags=[[] for _ in features],
    )
    table.source_crs = crs
    for index in multipart:
        table.flag(index, "multipart_distinct")
    table.flag_where(np.isnan(table.x) & ~np.isin(np.arange(len(features)), multipart), "no_geometry")
    lon, lat = table.coordinates_in(GEOGRAPHIC, context.transformContext())
    bad = ~np.isnan(lat) & ((np.abs(lat) > 90.0) | (np.abs(lon) > 360.0))
    lat[bad] = np.nan
    lon[bad] = np.nan
    unsound = _round_trip_fails(crs, table.x, table.y, lon, lat, context.transformContext())
    lon[unsound] = np.nan
    lat[unsound] = np.nan
    check_area_of_use(crs, table.x, table.y, lon, lat)
    table.flag_where(bad, "bad_latitude")
    table.flag_where(np.isnan(lat) & ~np.isnan(table.x) & ~bad, "no_position")
    table.longitude, table.latitude = lon, lat
    return table


#: Parts of a multi-part station closer than this (layer units) count as one
#: point (common practice, no source: a duplicated vertex, not two places).
SAME_POINT = 0.01


def _station_point(geometry):
    """(x, y, distinct) of a station geometry, NaN for none.

    ``distinct`` is true when a multi-part point has parts farther apart than ``SAME_POINT``.
    """
    if geometry is None or geometry.isNull() or geometry.isEmpty():
        return math.nan, math.nan, False
    if not geometry.isMultipart():
        point = geometry.asPoint()
        return point.x(), point.y(), False
    parts = geometry.asMultiPoint()
    if not parts:
        return math.nan, math.nan, False
    xs = [p.x() for p in parts]
    ys = [p.y() for p in parts]
    if max(xs) - min(xs) > SAME_POINT or max(ys) - min(ys) > SAME_POINT:
        return math.nan, math.nan, True
    return xs[0], ys[0], False


def _round_trip_fails(crs, x, y, lon, lat, transform_context) -> np.ndarray:
    """Stations whose latitude/longitude does not transform back to their coordinates.

    Map projections' inverse formulas wrap absurd inputs to real-looking
    places (a UTM northing of 1e12 m comes back as 32 N); the way back
    exposes them. Tolerance 1 m, or 1e-7 of the coordinate (common practice,
    no source).
    """
    bad = np.zeros(len(x), dtype=bool)
    if crs.isGeographic():
        return bad
    back = QgsCoordinateTransform(GEOGRAPHIC, crs, transform_context)
    for i in np.flatnonzero(np.isfinite(lon) & np.isfinite(lat)):
        try:
            point = back.transform(float(lon[i]), float(lat[i]))
        except QgsCsException:
            bad[i] = True
            continue
        tolerance = max(1.0, 1e-7 * max(abs(x[i]), abs(y[i])))
        if not (abs(point.x() - x[i]) <= tolerance and abs(point.y() - y[i]) <= tolerance):
            bad[i] = True
    return bad


def check_area_of_use(crs, x, y, lon, lat) -> None:
    """Stop when stations lie outside the CRS's area of use (by more than a margin).

    Coordinates that no transformation can place, a northing of 1e12 m, or
    longitude/latitude numbers in a layer declared projected give latitudes
    that are not the station's; reducing them would give a wrong anomaly.
    The margin is 10 % of the area's size, at least 1 degree (common
    practice, no source: projected CRSs are often used a little beyond their
    zone).
    """
    finite = np.isfinite(x) & np.isfinite(y)
    if not finite.any():
        return
    unplaced = finite & ~np.isfinite(lat)
    # (0, 0) is a common placeholder for "no position": left to the area check.
    degree_like = finite & (np.abs(x) <= 360.0) & (np.abs(y) <= 90.0) & ~((x == 0) & (y == 0))
    if not crs.isGeographic() and np.any(degree_like):
        index = int(np.flatnonzero(degree_like)[0])
        raise QgsProcessingException(
            _tr(
                "Station {} has coordinates ({:.6g}, {:.6g}) that look like longitude and latitude, "
                "but the layer is declared in {} (units of metres). Assign the layer's true CRS "
                "(for example EPSG:4326) in Layer Properties > Source, or reproject it."
            ).format(index + 1, float(x[index]), float(y[index]), crs.authid() or crs.description())
        )
    bounds = crs.bounds()
    outside = unplaced.copy()
    if bounds is not None and not bounds.isEmpty() and bounds.width() > 0:
        margin_x = max(1.0, 0.1 * bounds.width())
        margin_y = max(1.0, 0.1 * bounds.height())
        placed = np.isfinite(lon) & np.isfinite(lat)
        # Longitudes compared modulo 360 so areas crossing the antimeridian work.
        west, east = bounds.xMinimum() - margin_x, bounds.xMaximum() + margin_x
        lon_ok = ((lon - west) % 360.0) <= (east - west) if east - west < 360 else np.ones_like(lon, bool)
        lat_ok = (lat >= bounds.yMinimum() - margin_y) & (lat <= bounds.yMaximum() + margin_y)
        outside |= placed & ~(lon_ok & lat_ok)
    outside |= finite & np.isfinite(lat) & (np.abs(lat) > 90.0)
    if np.any(outside):
        index = int(np.flatnonzero(outside)[0])
        raise QgsProcessingException(
            _tr(
                "{} station(s) lie outside the area of use of the layer's CRS {} (first: station {} at "
                "{:.6g}, {:.6g}). Their latitudes would be wrong. Check the coordinates and assign the "
                "layer's true CRS (Layer Properties > Source)."
            ).format(
                int(outside.sum()), crs.authid() or crs.description(), index + 1, float(x[index]), float(y[index])
            )
        )


def check_point_layer(source) -> None:
    """Stop with a sentence when the station layer is not a point layer."""
    from qgis.core import QgsWkbTypes

    kind = QgsWkbTypes.geometryType(source.wkbType())
    if kind != QgsWkbTypes.PointGeometry:
        raise QgsProcessingException(
            _tr(
                "The station layer holds {} geometries; stations must be points. Convert it first "
                "(for example Vector > Geometry Tools > Centroids) or choose the point layer."
            ).format(QgsWkbTypes.geometryDisplayString(kind))
        )


#: Text fields the algorithms write; every other added field is a real number.
TEXT_FIELDS = ("qc_flag", "qc_note")


def _text_length(name: str, kind) -> int:
    """Field length: unlimited (0) for numbers and the flag texts, 254 for other text."""
    if kind != QVariant.String or name in TEXT_FIELDS:
        return 0
    return 254


def output_fields(input_fields: QgsFields, added: list[tuple[str, QVariant.Type]]):
    """Input fields followed by the added ones.

    Returns the fields, for each added name its index, and the names that
    were already in the input. A name already in the input is reused (its
    values are replaced in the output copy only) and retyped to the added
    type, so results are real numbers whatever type the input field had
    (an integer ``faa`` would round them).
    """
    kinds = dict(added)
    fields = QgsFields()
    reused = []
    for index in range(input_fields.count()):
        original = input_fields.at(index)
        name = original.name()
        if name in kinds:
            reused.append(name)
            if original.type() != kinds[name] or name in TEXT_FIELDS:
                # Flags and notes grow with every run: always unlimited text.
                kind = kinds[name]
                fields.append(QgsField(name, kind, len=_text_length(name, kind)))
                continue
        fields.append(QgsField(original))
    indices = {}
    for name, kind in added:
        index = fields.lookupField(name)
        if index < 0:
            fields.append(QgsField(name, kind, len=_text_length(name, kind)))
            index = fields.lookupField(name)
        indices[name] = index
    return fields, indices, reused


def write_stations(sink, table: StationTable, fields: QgsFields, indices: dict, columns: dict, feedback) -> None:
    """Write a copy of every station with the computed columns filled in.

    ``columns`` maps field name to a float array (NaN is written as NULL).
    Added fields not in ``columns`` keep the input's value (as a real number):
    a run that does not recompute ``tc_inner`` keeps the earlier one.
    ``qc_flag`` merges the input's codes with this run's; ``qc_note`` holds
    their translated meanings.
    """
    n_input = len(table.features[0].fields()) if table.features else 0
    kept = [
        (name, index)
        for name, index in indices.items()
        if name not in columns and name not in TEXT_FIELDS and index < n_input
    ]
    for i, feature in enumerate(table.features):
        if feedback is not None and feedback.isCanceled():
            raise QgsProcessingException(_tr("Cancelled by the user."))
        attributes = list(feature.attributes())
        attributes += [None] * (len(fields) - n_input)
        for name, values in columns.items():
            value = float(values[i])
            attributes[indices[name]] = value if math.isfinite(value) else None
        for _name, index in kept:
            value = as_float(attributes[index])
            attributes[index] = value if math.isfinite(value) else None
        if "qc_flag" in indices:
            earlier = attributes[indices["qc_flag"]] if indices["qc_flag"] < n_input else None
            flag = merged_flag(earlier if earlier != NULL else None, table.flags[i])
            attributes[indices["qc_flag"]] = flag
            if "qc_note" in indices:
                attributes[indices["qc_note"]] = notes_for(flag)
        out = QgsFeature(fields)
        out.setGeometry(feature.geometry())
        out.setAttributes(attributes)
        if not sink.addFeature(out, QgsFeatureSink.FastInsert):
            raise QgsProcessingException(_tr("Could not write a station to the output layer."))
        if feedback is not None:
            feedback.setProgress(100.0 * (i + 1) / len(table.features))
