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
        return len(self.features)

    def flag(self, index: int, reason: str) -> None:
        if reason and reason not in self.flags[index]:
            self.flags[index].append(reason)

    def flag_where(self, mask: np.ndarray, reason: str) -> None:
        for index in np.flatnonzero(mask):
            self.flag(int(index), reason)

    def flag_each(self, reasons) -> None:
        """Add per-station reasons as the engines give them ("" or "a; b")."""
        for index, joined in enumerate(reasons):
            for reason in str(joined).split(";"):
                self.flag(index, reason.strip())

    def field_values(self, name: str | None, scale: float = 1.0, label: str = "") -> np.ndarray:
        """Numeric attribute as a float array (NaN where NULL or not a number)."""
        if not name:
            return np.full(len(self), np.nan)
        values = np.array([as_float(f[name]) for f in self.features], dtype=float) * scale
        if label:
            self.flag_where(np.isnan(values), _tr("no {}").format(label))
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
    features, xs, ys = [], [], []
    total = source.featureCount() or 0
    for i, feature in enumerate(source.getFeatures(QgsFeatureRequest())):
        if feedback is not None and feedback.isCanceled():
            raise QgsProcessingException(_tr("Cancelled by the user."))
        features.append(QgsFeature(feature))
        geometry = feature.geometry()
        if geometry is None or geometry.isNull() or geometry.isEmpty():
            xs.append(math.nan)
            ys.append(math.nan)
        else:
            point = geometry.centroid().asPoint() if geometry.isMultipart() else geometry.asPoint()
            xs.append(point.x())
            ys.append(point.y())
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
    table.flag_where(np.isnan(table.x), _tr("no geometry"))
    lon, lat = table.coordinates_in(GEOGRAPHIC, context.transformContext())
    bad = ~np.isnan(lat) & ((np.abs(lat) > 90.0) | (np.abs(lon) > 360.0))
    lat[bad] = np.nan
    lon[bad] = np.nan
    table.flag_where(bad, _tr("latitude out of range"))
    table.flag_where(np.isnan(lat) & ~np.isnan(table.x) & ~bad, _tr("position not transformable"))
    table.longitude, table.latitude = lon, lat
    return table


def output_fields(input_fields: QgsFields, added: list[tuple[str, QVariant.Type]]):
    """Input fields followed by the added ones.

    Returns the fields and, for each added name, its index. A name already in
    the input is reused (its values are replaced in the output copy only).
    """
    fields = QgsFields(input_fields)
    indices, reused = {}, []
    for name, kind in added:
        index = fields.lookupField(name)
        if index < 0:
            fields.append(QgsField(name, kind, len=254 if kind == QVariant.String else 0))
            index = fields.lookupField(name)
        else:
            reused.append(name)
        indices[name] = index
    return fields, indices, reused


def write_stations(sink, table: StationTable, fields: QgsFields, indices: dict, columns: dict, feedback) -> None:
    """Write a copy of every station with the computed columns filled in.

    ``columns`` maps field name to a float array (NaN is written as NULL) or,
    for ``qc_flag``, is derived from the table's flags.
    """
    n_input = len(table.features[0].fields()) if table.features else 0
    for i, feature in enumerate(table.features):
        if feedback is not None and feedback.isCanceled():
            raise QgsProcessingException(_tr("Cancelled by the user."))
        attributes = list(feature.attributes())
        attributes += [None] * (len(fields) - n_input)
        for name, values in columns.items():
            value = float(values[i])
            attributes[indices[name]] = value if math.isfinite(value) else None
        if "qc_flag" in indices:
            attributes[indices["qc_flag"]] = "; ".join(table.flags[i])
        out = QgsFeature(fields)
        out.setGeometry(feature.geometry())
        out.setAttributes(attributes)
        if not sink.addFeature(out, QgsFeatureSink.FastInsert):
            raise QgsProcessingException(_tr("Could not write a station to the output layer."))
