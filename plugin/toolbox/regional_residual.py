# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:regionalresidual``: split an anomaly raster into regional and residual.

The science (trend surfaces, upward continuation) is in
``algorithms.separation``; this module reads the raster, writes the two
GeoTIFFs with their provenance and style, and samples them at stations.
"""

from __future__ import annotations

import math
import warnings
from pathlib import Path

import numpy as np
from osgeo import gdal, osr
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsFeature,
    QgsFeatureSink,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterDefinition,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterDestination,
    QgsProcessingParameterRasterLayer,
    QgsRasterFileWriter,
)
from qgis.PyQt.QtCore import QVariant

from ...algorithms.qc import merge_codes
from .. import provenance
from ..raster_io import ElevationRaster
from ..stations import output_fields, read_stations
from ..styling import attach_raster_style
from .base import ReliefGravityAlgorithm, is_unset

gdal.UseExceptions()

NODATA = -99999.0
TREND, CONTINUATION = 0, 1
ROBUST_CHOICES = (None, "huber", "tukey")


class RegionalResidualAlgorithm(ReliefGravityAlgorithm):
    """Regional and residual rasters of an anomaly raster."""

    INPUT = "INPUT"
    METHOD = "METHOD"
    ORDER = "ORDER"
    ROBUST = "ROBUST"
    HEIGHT = "HEIGHT"
    PADDING = "PADDING"
    REGIONAL = "REGIONAL"
    RESIDUAL = "RESIDUAL"
    STATIONS = "STATIONS"
    STATIONS_OUTPUT = "STATIONS_OUTPUT"
    STATIONS_SAMPLED = "STATIONS_SAMPLED"

    def name(self):
        return "regionalresidual"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Regional and residual anomaly (trend surface or upward continuation)")

    def groupId(self):  # noqa: N802 - QGIS API
        return "maps"

    def group(self):
        return self.tr("Maps")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Splits an anomaly raster into a regional and a residual raster.")

    def tags(self):
        return self.tr("gravity,anomaly,regional,residual,trend surface,polynomial,upward continuation,FFT").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Splits an anomaly raster (mGal, projected CRS in metres) into a <b>regional</b> "
            "raster and a <b>residual</b> raster = input - regional.</p>"
            "<p><b>Polynomial trend surface</b>: a polynomial of order 1 (plane), 2 or 3 in the "
            "coordinates, fitted to every cell with a value by least squares; the robust fit "
            "reweights the cells iteratively (Huber or Tukey biweight; Holland &amp; Welsch 1977) "
            "so that local anomalies do not pull the regional.</p>"
            "<p><b>Upward continuation</b>: the anomaly continued upward by <b>Height</b> metres "
            "with the Fourier filter exp(-|k| h) (Blakely 1995). Blank cells are filled with the "
            "nearest value, the best-fitting plane is removed, and the grid is extended by mirror "
            "images (by <b>Padding</b> times its size on each side) faded to zero by a cosine "
            "taper before the transform; blank cells stay blank.</p>"
            "<p>Optional: sample both rasters (bilinear) at a station layer, written as a copy "
            "with the fields <b>regional</b> and <b>residual</b> (mGal); stations off the raster "
            "get empty values and the code outside_grid in qc_flag.</p>"
            "<p>The choice of regional is an interpretation: state the method and its "
            "parameters with any residual map you hand on.</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.addParameter(QgsProcessingParameterRasterLayer(self.INPUT, self.tr("Anomaly raster (mGal)")))
        self.addParameter(
            QgsProcessingParameterEnum(
                self.METHOD,
                self.tr("Regional from"),
                options=[self.tr("Polynomial trend surface"), self.tr("Upward continuation (FFT)")],
                defaultValue=TREND,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.ORDER, self.tr("Trend surface order (1-3)"), type=QgsProcessingParameterNumber.Integer,
                defaultValue=1, minValue=1, maxValue=3,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.ROBUST,
                self.tr("Trend surface fit"),
                options=[self.tr("Least squares"), self.tr("Robust, Huber weights"), self.tr("Robust, Tukey biweight")],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.HEIGHT, self.tr("Continuation height (m)"), type=QgsProcessingParameterNumber.Double,
                defaultValue=1000.0, minValue=0.0,
            )
        )
        padding = QgsProcessingParameterNumber(
            self.PADDING, self.tr("Padding on each side (fraction of the grid size)"),
            type=QgsProcessingParameterNumber.Double, defaultValue=0.5, minValue=0.0, maxValue=4.0,
        )
        padding.setFlags(padding.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        self.addParameter(padding)
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.STATIONS, self.tr("Stations to sample (optional)"), [QgsProcessing.TypeVectorPoint], optional=True
            )
        )
        self.addParameter(QgsProcessingParameterRasterDestination(self.REGIONAL, self.tr("Regional anomaly")))
        self.addParameter(QgsProcessingParameterRasterDestination(self.RESIDUAL, self.tr("Residual anomaly")))
        self.addParameter(
            QgsProcessingParameterFeatureSink(
                self.STATIONS_OUTPUT, self.tr("Stations with regional and residual"),
                QgsProcessing.TypeVectorPoint, optional=True, createByDefault=False,
            )
        )
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_SAMPLED, self.tr("Stations sampled")))

    def checkParameterValues(self, parameters, context):  # noqa: N802 - QGIS API
        ok, message = super().checkParameterValues(parameters, context)
        if not ok:
            return ok, message
        method = self.parameterAsEnum(parameters, self.METHOD, context)
        if method == CONTINUATION and not self.parameterAsDouble(parameters, self.HEIGHT, context) > 0:
            return False, self.tr("The continuation height must be more than 0 m (upward).")
        wants_output = not is_unset(parameters.get(self.STATIONS_OUTPUT))
        has_stations = not is_unset(parameters.get(self.STATIONS))
        if wants_output and not has_stations:
            return False, self.tr("Choose the stations to sample, or leave the station output empty.")
        return True, ""

    def _read_input(self, layer):
        if layer.providerType() != "gdal":
            raise QgsProcessingException(
                self.tr("The raster {} is not a GDAL raster; save it as a GeoTIFF first.").format(layer.name())
            )
        crs = layer.crs()
        if not crs.isValid():
            raise QgsProcessingException(self.tr("The anomaly raster has no coordinate reference system."))
        if crs.isGeographic():
            raise QgsProcessingException(
                self.tr("The anomaly raster is in a geographic CRS ({}), in degrees; both methods need cells in "
                        "metres. Warp it to a projected CRS first.").format(crs.authid() or crs.description())
            )
        path = layer.source().split("|")[0]
        dataset = gdal.Open(path)
        x0, dx, rx, y0, ry, dy = dataset.GetGeoTransform()
        if rx != 0 or ry != 0:
            raise QgsProcessingException(self.tr("The anomaly raster is rotated; warp it to a north-up grid first."))
        band = dataset.GetRasterBand(1)
        values = band.ReadAsArray().astype(float)
        nodata = band.GetNoDataValue()
        if nodata is not None and math.isfinite(nodata):
            values[values == nodata] = np.nan
        values[~np.isfinite(values)] = np.nan
        if dy > 0:  # south-up: flip to rows from the north
            values = values[::-1]
            y0 = y0 + dy * dataset.RasterYSize
        return path, values, (x0, abs(dx), abs(dy), y0), crs

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        from ...algorithms.separation import ContinuationSettings, separate_by_continuation, separate_by_trend

        layer = self.parameterAsRasterLayer(parameters, self.INPUT, context)
        if layer is None:
            raise QgsProcessingException(self.invalidRasterError(parameters, self.INPUT))
        path, values, (west, cell_x, cell_y, north), crs = self._read_input(layer)
        valid = int(np.isfinite(values).sum())
        if valid == 0:
            raise QgsProcessingException(self.tr("The anomaly raster has no cell with a value."))
        method = self.parameterAsEnum(parameters, self.METHOD, context)
        feedback.setProgress(10)
        try:
            if method == CONTINUATION:
                height = self.parameterAsDouble(parameters, self.HEIGHT, context)
                padding = self.parameterAsDouble(parameters, self.PADDING, context)
                result = separate_by_continuation(values, cell_x, cell_y, height, ContinuationSettings(padding, True))
                description = self.tr("upward continuation by {:g} m").format(height)
            else:
                order = self.parameterAsInt(parameters, self.ORDER, context)
                robust = ROBUST_CHOICES[self.parameterAsEnum(parameters, self.ROBUST, context)]
                result = separate_by_trend(values, west, north, cell_x, cell_y, order=order, robust=robust)
                fit_name = robust or self.tr("least squares")
                description = self.tr("trend surface of order {} ({})").format(order, fit_name)
                coefficients = ", ".join(f"{c:.6g}" for c in result.trend.per_metre().values())
                feedback.pushInfo(
                    self.tr("Trend coefficients per metre about ({:.1f}, {:.1f}): {}.").format(
                        result.trend.x0, result.trend.y0, coefficients
                    )
                )
        except ValueError as error:
            raise QgsProcessingException(self.tr("The raster cannot be separated: {}").format(error)) from error
        if feedback.isCanceled():
            raise QgsProcessingException(self.tr("Cancelled by the user."))
        feedback.setProgress(60)

        record = provenance.chained(
            provenance.read_record(path),
            provenance.make_step(
                "reliefgravity:regionalresidual",
                {
                    "INPUT": path,
                    "METHOD": ("trend", "continuation")[method],
                    "ORDER": parameters.get(self.ORDER),
                    "ROBUST": parameters.get(self.ROBUST),
                    "HEIGHT": parameters.get(self.HEIGHT),
                    "PADDING": parameters.get(self.PADDING),
                },
                {**result.settings, "method": result.method, "units": "mGal"},
            ),
        )
        outputs = {}
        written = []
        try:
            for key, grid, label in (
                (self.REGIONAL, result.regional, self.tr("Regional")),
                (self.RESIDUAL, result.residual, self.tr("Residual")),
            ):
                target = self.parameterAsOutputLayer(parameters, key, context)
                _write(target, grid, (west, cell_x, cell_y, north), crs.toWkt(), label)
                written.append(target)
                if _driver_for(target) == "GTiff":
                    provenance.write_record(target, record)
                outputs[key] = target
                title = self.tr("{} anomaly (mGal)").format(label)
                abstract = self.tr("{} part of {} by {}; values in mGal; regional + residual = input.").format(
                    label, Path(path).name, description
                )
                attach_raster_style(context, target, title, abstract)
            if not is_unset(parameters.get(self.STATIONS_OUTPUT)):
                outputs.update(self._sample_stations(parameters, context, feedback, outputs, crs))
        except Exception:
            for target in written:
                Path(target).unlink(missing_ok=True)
            raise
        feedback.setProgress(100)
        feedback.pushInfo(
            self.tr("Regional by {}: {} cells; residual from {:.3f} to {:.3f} mGal (rms {:.3f}).").format(
                description, valid, float(np.nanmin(result.residual)), float(np.nanmax(result.residual)),
                float(np.sqrt(np.nanmean(result.residual**2))),
            )
        )
        return outputs

    def _sample_stations(self, parameters, context, feedback, outputs, crs):
        source = self.parameterAsSource(parameters, self.STATIONS, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.STATIONS))
        table = read_stations(source, context, None)
        x, y = table.coordinates_in(QgsCoordinateReferenceSystem(crs), context.transformContext())
        regional = ElevationRaster(outputs[self.REGIONAL], crs.toWkt(), False).sample_bilinear(x, y)
        residual = ElevationRaster(outputs[self.RESIDUAL], crs.toWkt(), False).sample_bilinear(x, y)
        fields, indices, reused = output_fields(
            source.fields(),
            [("regional", QVariant.Double), ("residual", QVariant.Double), ("qc_flag", QVariant.String)],
        )
        for name in reused:
            if name != "qc_flag":
                feedback.pushWarning(
                    self.tr(
                        "The stations already have a field {}; its values are replaced in the output copy."
                    ).format(name)
                )
        sink, dest_id = self.parameterAsSink(
            parameters, self.STATIONS_OUTPUT, context, fields, source.wkbType(), source.sourceCrs()
        )
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.STATIONS_OUTPUT))
        n_input = source.fields().count()
        qc_index = indices["qc_flag"]
        for i, feature in enumerate(table.features):
            if feedback.isCanceled():
                raise QgsProcessingException(self.tr("Cancelled by the user."))
            attributes = list(feature.attributes()) + [None] * (len(fields) - n_input)
            inside = bool(np.isfinite(regional[i]) and np.isfinite(residual[i]))
            attributes[indices["regional"]] = float(regional[i]) if inside else None
            attributes[indices["residual"]] = float(residual[i]) if inside else None
            existing = attributes[qc_index] if qc_index < n_input else None
            existing = None if existing is None or str(existing) == "NULL" else str(existing)
            attributes[qc_index] = merge_codes(existing, [] if inside else ["outside_grid"]) or None
            out = QgsFeature(fields)
            out.setGeometry(feature.geometry())
            out.setAttributes(attributes)
            if not sink.addFeature(out, QgsFeatureSink.FastInsert):
                raise QgsProcessingException(self.tr("Could not write a station to the output layer."))
        sampled = int(np.sum(np.isfinite(regional) & np.isfinite(residual)))
        if sampled < len(table):
            feedback.pushWarning(
                self.tr(
                    "{} of {} stations lie outside the raster or next to blank cells (qc_flag outside_grid)."
                ).format(len(table) - sampled, len(table))
            )
        return {self.STATIONS_OUTPUT: dest_id, self.STATIONS_SAMPLED: sampled}


def _driver_for(path: str) -> str:
    driver = QgsRasterFileWriter.driverForExtension(Path(path).suffix.lstrip("."))
    return driver if driver and gdal.GetDriverByName(driver) is not None else "GTiff"


def _write(path: str, grid: np.ndarray, frame, crs_wkt: str, label: str) -> None:
    """Float32 single-band raster, NaN as NoData, built in memory and copied."""
    west, cell_x, cell_y, north = frame
    rows, cols = grid.shape
    memory = gdal.GetDriverByName("MEM").Create("", cols, rows, 1, gdal.GDT_Float32)
    memory.SetGeoTransform((west, cell_x, 0.0, north, 0.0, -cell_y))
    srs = osr.SpatialReference()
    srs.ImportFromWkt(crs_wkt)
    memory.SetProjection(srs.ExportToWkt())
    band = memory.GetRasterBand(1)
    band.SetNoDataValue(NODATA)
    band.SetUnitType("mGal")
    band.SetDescription(f"{label} (mGal)")
    band.WriteArray(np.where(np.isfinite(grid), grid, NODATA).astype(np.float32))
    driver_name = _driver_for(path)
    options = ["COMPRESS=DEFLATE", "PREDICTOR=3", "TILED=YES"] if driver_name == "GTiff" else []
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        copy = gdal.GetDriverByName(driver_name).CreateCopy(path, memory, 0, options)
    copy.FlushCache()
    copy = None
    memory = None
