# SPDX-License-Identifier: GPL-2.0-or-later
"""Which stations lie inside the polygons of a layer (QGIS glue, no science).

Used by ``reliefgravity:densityestimate`` to leave out the stations that
stand on mapped ground whose density is not the one being estimated (valley
fill, a mapped intrusion). The polygons are reprojected to the stations' CRS;
a station on a polygon's boundary counts as inside.
"""

from __future__ import annotations

import math

import numpy as np
from qgis.core import (
    QgsCoordinateTransform,
    QgsCsException,
    QgsFeatureRequest,
    QgsGeometry,
    QgsPointXY,
    QgsProcessingException,
    QgsRectangle,
    QgsSpatialIndex,
    QgsWkbTypes,
)
from qgis.PyQt.QtCore import QCoreApplication


def _tr(text: str) -> str:
    return QCoreApplication.translate("StationAreas", text)


def read_area_polygons(source, target_crs, transform_context, label: str) -> list:
    """The non-empty polygons of a feature source, valid and in ``target_crs``.

    Parameters
    ----------
    source : QgsProcessingFeatureSource
        A polygon layer.
    target_crs : QgsCoordinateReferenceSystem
        The stations' CRS.
    transform_context : QgsCoordinateTransformContext
    label : str
        The parameter's name, for the sentences.

    Raises
    ------
    QgsProcessingException
        A layer that is not a polygon layer, without CRS, without a polygon,
        or whose polygons cannot be reprojected.
    """
    if QgsWkbTypes.geometryType(source.wkbType()) != QgsWkbTypes.PolygonGeometry:
        raise QgsProcessingException(_tr("{} must be a polygon layer.").format(label))
    if not source.sourceCrs().isValid():
        raise QgsProcessingException(_tr("{} has no coordinate reference system.").format(label))
    transform = QgsCoordinateTransform(source.sourceCrs(), target_crs, transform_context)
    polygons = []
    for feature in source.getFeatures(QgsFeatureRequest()):
        geometry = QgsGeometry(feature.geometry())
        if geometry.isNull() or geometry.isEmpty():
            continue
        try:
            geometry.transform(transform)
        except QgsCsException as error:
            raise QgsProcessingException(
                _tr("A polygon of {} cannot be reprojected to the stations' CRS: {}").format(label, error)
            ) from error
        if not geometry.isGeosValid():
            geometry = geometry.makeValid()
        polygons.append(geometry)
    if not polygons:
        raise QgsProcessingException(_tr("{} has no polygon.").format(label))
    return polygons


def inside_any(polygons: list, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """True for each point (x, y in the polygons' CRS) inside or on the edge of any polygon.

    Points with a non-finite coordinate are never inside.
    """
    index = QgsSpatialIndex()
    for i, geometry in enumerate(polygons):
        index.addFeature(i, geometry.boundingBox())
    out = np.zeros(len(x), dtype=bool)
    for k, (px, py) in enumerate(zip(x, y)):
        if not (math.isfinite(px) and math.isfinite(py)):
            continue
        point = QgsGeometry.fromPointXY(QgsPointXY(float(px), float(py)))
        for i in index.intersects(QgsRectangle(px, py, px, py)):
            if polygons[i].intersects(point):
                out[k] = True
                break
    return out
