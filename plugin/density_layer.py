# SPDX-License-Identifier: GPL-2.0-or-later
"""Densities from a geology layer: polygons with a density field.

The reduction takes the density of the polygon under each station for the
slab and curvature; the terrain correction takes, for each DEM cell, the
density of the polygon under the cell's centre (rasterised onto the DEM
grids). Outside every polygon the default density (``DENSITY``) applies. The
approximation and its cost: ``docs/geology-densities.md``.

Units: unit 0 is the default density; each distinct polygon density is one
more unit (``algorithms.terrain._geology.unit_table``), so the engine runs
once per distinct density present, plus once over the whole DEM.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
from osgeo import gdal, ogr, osr
from qgis.core import (
    NULL,
    QgsCoordinateReferenceSystem,
    QgsCoordinateTransform,
    QgsCsException,
    QgsFeatureRequest,
    QgsGeometry,
    QgsPointXY,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsRectangle,
    QgsSpatialIndex,
    QgsWkbTypes,
)
from qgis.PyQt.QtCore import QCoreApplication

from ..algorithms.terrain._geology import DensityUnits, density_table_to_kg_m3, unit_table

gdal.UseExceptions()

DENSITY_LAYER = "DENSITY_LAYER"
DENSITY_LAYER_FIELD = "DENSITY_LAYER_FIELD"


def _tr(text: str) -> str:
    return QCoreApplication.translate("DensityLayer", text)


def add_parameters(algorithm) -> None:
    """Add the optional ``DENSITY_LAYER`` and ``DENSITY_LAYER_FIELD`` parameters to an algorithm."""
    algorithm.addParameter(
        QgsProcessingParameterFeatureSource(
            DENSITY_LAYER,
            _tr("Geology polygons with densities (optional; default density outside them)"),
            types=[QgsProcessing.TypeVectorPolygon],
            optional=True,
        )
    )
    algorithm.addParameter(
        QgsProcessingParameterField(
            DENSITY_LAYER_FIELD,
            _tr("Density field of the geology polygons (kg/m³ or g/cm³, detected)"),
            parentLayerParameterName=DENSITY_LAYER,
            type=QgsProcessingParameterField.Numeric,
            optional=True,
        )
    )


@dataclass(frozen=True, eq=False)
class DensityPolygons:
    """Polygons of a geology layer in one CRS, with their density units.

    Attributes
    ----------
    crs : QgsCoordinateReferenceSystem
        CRS of ``geometries``.
    geometries : list of QgsGeometry
        The polygons (valid), in layer order.
    polygon_unit : numpy.ndarray of int
        Unit of each polygon (0: the default density).
    densities : numpy.ndarray
        Unit densities in kg/m³ (``densities[0]`` is the default).
    given_in : str
        ``"kg/m3"`` or ``"g/cm3"``: the unit the field was detected in.
    """

    crs: QgsCoordinateReferenceSystem
    geometries: list
    polygon_unit: np.ndarray
    densities: np.ndarray
    given_in: str


def read_parameters(algorithm, parameters, context, default_density: float, target_crs, feedback=None):
    """The geology polygons of ``DENSITY_LAYER`` in ``target_crs``, or None when the parameter is unset.

    Raises QgsProcessingException (a sentence) for a layer without a field, a
    field that is not numeric, densities that fit neither kg/m³ nor g/cm³, a
    layer without CRS or polygons that cannot be reprojected.
    """
    source = algorithm.parameterAsSource(parameters, DENSITY_LAYER, context)
    if source is None:
        return None
    names = algorithm.parameterAsFields(parameters, DENSITY_LAYER_FIELD, context)
    if not names:
        raise QgsProcessingException(
            _tr("DENSITY_LAYER is set but DENSITY_LAYER_FIELD is not: choose the field holding each polygon's density.")
        )
    return read_polygons(source, names[0], default_density, target_crs, context.transformContext(), feedback)


def read_polygons(
    source, field_name: str, default_density: float, target_crs, transform_context, feedback=None
) -> DensityPolygons:
    """Read a polygon feature source's densities and geometries, reprojected to ``target_crs``.

    Features without a density (NULL) or without a geometry are left to the
    default density; a warning counts them. Where polygons overlap, the later
    feature wins (for cells and stations alike).
    """
    if QgsWkbTypes.geometryType(source.wkbType()) != QgsWkbTypes.PolygonGeometry:
        raise QgsProcessingException(_tr("DENSITY_LAYER must be a polygon layer."))
    index = source.fields().lookupField(field_name)
    if index < 0:
        raise QgsProcessingException(_tr("DENSITY_LAYER has no field {}.").format(field_name))
    if not source.fields().at(index).isNumeric():
        raise QgsProcessingException(_tr("The field {} of DENSITY_LAYER is not numeric.").format(field_name))
    if not source.sourceCrs().isValid():
        raise QgsProcessingException(_tr("DENSITY_LAYER has no coordinate reference system."))
    transform = QgsCoordinateTransform(source.sourceCrs(), target_crs, transform_context)
    geometries, values, skipped = [], [], 0
    for feature in source.getFeatures(QgsFeatureRequest()):
        value = feature.attribute(index)
        geometry = QgsGeometry(feature.geometry())
        if value is None or value == NULL or geometry.isEmpty() or not math.isfinite(float(value)):
            skipped += 1
            continue
        try:
            geometry.transform(transform)
        except QgsCsException as error:
            raise QgsProcessingException(
                _tr("A polygon of DENSITY_LAYER cannot be reprojected to the DEM's CRS: {}").format(error)
            ) from error
        if not geometry.isGeosValid():
            geometry = geometry.makeValid()
        geometries.append(geometry)
        values.append(float(value))
    if not values:
        raise QgsProcessingException(
            _tr("No polygon of DENSITY_LAYER has a density in the field {}.").format(field_name)
        )
    try:
        kg, given_in = density_table_to_kg_m3(values)
    except ValueError as error:
        raise QgsProcessingException(
            _tr(
                "The densities of DENSITY_LAYER ({}) cannot be read: {}. "
                "Give every polygon in kg/m³ (500-5000) or every polygon in g/cm³ (0.5-5)."
            ).format(field_name, error)
        ) from error
    if skipped and feedback is not None:
        feedback.pushWarning(
            _tr(
                "{} polygon(s) of DENSITY_LAYER have no density or no geometry: the default density applies there."
            ).format(skipped)
        )
    densities, polygon_unit = unit_table(kg, default_density)
    return DensityPolygons(target_crs, geometries, polygon_unit, densities, given_in)


def rasterise_units(polygons: DensityPolygons, raster) -> np.ndarray:
    """Unit index of each cell of an opened DEM (rows from the north), 0 outside every polygon.

    ``raster`` is a ``raster_io.ElevationRaster`` in the polygons' CRS. A
    cell takes the unit of the polygon under its centre (GDAL rasterisation
    with all-touched off); the array holds one byte per cell for up to 256
    units.
    """
    if QgsCoordinateReferenceSystem.fromWkt(raster.crs_wkt) != polygons.crs:
        raise QgsProcessingException(
            _tr("Internal: the geology polygons are not in the CRS of the raster {}.").format(raster.path)
        )
    srs = osr.SpatialReference()
    srs.ImportFromWkt(raster.crs_wkt)
    vectors = gdal.GetDriverByName("Memory").Create("units", 0, 0, 0, gdal.GDT_Unknown)
    layer = vectors.CreateLayer("units", srs, ogr.wkbMultiPolygon)
    layer.CreateField(ogr.FieldDefn("unit", ogr.OFTInteger))
    for geometry, unit in zip(polygons.geometries, polygons.polygon_unit):
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("unit", int(unit))
        feature.SetGeometry(ogr.CreateGeometryFromWkb(bytes(geometry.asWkb())))
        layer.CreateFeature(feature)
    kind = gdal.GDT_Byte if polygons.densities.size <= 256 else gdal.GDT_Int32
    target = gdal.GetDriverByName("MEM").Create("", raster.n_cols, raster.n_rows, 1, kind)
    # North-up grid with the engine's rows, whatever the file's row order.
    target.SetGeoTransform((raster.x_origin, raster.cell_x, 0.0, raster.y_origin, 0.0, -raster.cell_y))
    target.SetProjection(raster.crs_wkt)
    target.GetRasterBand(1).Fill(0)
    gdal.Rasterize(target, vectors, options=gdal.RasterizeOptions(attribute="unit", allTouched=False))
    return target.GetRasterBand(1).ReadAsArray()


def station_units(polygons: DensityPolygons, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """Unit of the polygon under each station (coordinates in the polygons' CRS), 0 where none."""
    out = np.zeros(len(x), dtype=np.int64)
    index = QgsSpatialIndex()
    for i, geometry in enumerate(polygons.geometries):
        index.addFeature(i, geometry.boundingBox())
    for k, (px, py) in enumerate(zip(x, y)):
        if not (math.isfinite(px) and math.isfinite(py)):
            continue
        point = QgsGeometry.fromPointXY(QgsPointXY(float(px), float(py)))
        hits = sorted(index.intersects(QgsRectangle(px, py, px, py)))
        for i in reversed(hits):  # the later polygon wins, as in the rasterisation
            if polygons.geometries[i].intersects(point):
                out[k] = polygons.polygon_unit[i]
                break
    return out


def station_densities(polygons: DensityPolygons, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """Density (kg/m³) of the polygon under each station, the default where none (slab and curvature)."""
    return polygons.densities[station_units(polygons, x, y)]


def density_units(polygons: DensityPolygons, fine, regional=None) -> DensityUnits:
    """The engine's unit grids for an opened fine DEM and an optional (already warped) regional DEM."""
    return DensityUnits(
        polygons.densities,
        rasterise_units(polygons, fine),
        rasterise_units(polygons, regional) if regional is not None else None,
    )
