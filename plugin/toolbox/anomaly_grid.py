# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:anomalygrid``: stations to an anomaly raster and contours.

The science (grid geometry, minimum curvature, blanking, contour interval)
is in ``algorithms.gridding``; this module reads the stations, writes the
GeoTIFF and the contour lines, and attaches the styles.
"""

from __future__ import annotations

import math
import warnings
from pathlib import Path

import numpy as np
from osgeo import gdal, ogr, osr
from qgis.core import (
    QgsFeature,
    QgsFeatureSink,
    QgsField,
    QgsFields,
    QgsGeometry,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingMultiStepFeedback,
    QgsProcessingOutputNumber,
    QgsProcessingParameterDistance,
    QgsProcessingParameterExtent,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterDestination,
    QgsRasterFileWriter,
    QgsUnitTypes,
    QgsWkbTypes,
)
from qgis.PyQt.QtCore import QVariant

from ..stations import read_stations
from ..styling import attach_contour_style, attach_raster_style
from .base import ReliefGravityAlgorithm, is_unset
from .field_checks import check_numeric_fields

gdal.UseExceptions()

#: NoData of the anomaly raster: outside any plausible anomaly (mGal) and
#: exactly representable in float32.
NODATA = -99999.0

#: Automatic blanking distance as a multiple of the median distance between
#: neighbouring stations (common practice, no source: a cell more than about
#: three station spacings from any station is extrapolation, not data).
BLANK_SPACINGS = 3.0

#: Largest grid accepted, in cells, and the memory the solver needs per cell
#: (bytes; bench/bench_gridding.py measured about 1.2 GB for 1,000 x 1,000
#: cells). The limit keeps a run within about 2.6 GB.
MAX_CELLS = 2_000_000
BYTES_PER_CELL = 1300

#: Most contour levels drawn in one run (a finer interval is a typing slip).
MAX_CONTOUR_LEVELS = 1000


def available_memory() -> int | None:
    """Bytes of memory available now (Linux /proc/meminfo), None when unknown."""
    try:
        with open("/proc/meminfo", encoding="ascii") as handle:
            for line in handle:
                if line.startswith("MemAvailable:"):
                    return int(line.split()[1]) * 1024
    except (OSError, ValueError, IndexError):
        return None
    return None


class AnomalyGridAlgorithm(ReliefGravityAlgorithm):
    """Grid an anomaly field of a station layer by minimum curvature; contour it."""

    INPUT = "INPUT"
    FIELD = "FIELD"
    PIXEL_SIZE = "PIXEL_SIZE"
    EXTENT = "EXTENT"
    TENSION = "TENSION"
    BLANK_DISTANCE = "BLANK_DISTANCE"
    CONTOUR_INTERVAL = "CONTOUR_INTERVAL"
    OUTPUT = "OUTPUT"
    CONTOURS = "CONTOURS"
    STATIONS_GRIDDED = "STATIONS_GRIDDED"
    CELL_SIZE_USED = "CELL_SIZE_USED"
    BLANK_DISTANCE_USED = "BLANK_DISTANCE_USED"
    INTERVAL_USED = "INTERVAL_USED"

    def name(self):
        return "anomalygrid"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Anomaly grid and contours (minimum curvature)")

    def groupId(self):  # noqa: N802 - QGIS API
        return "maps"

    def group(self):
        return self.tr("Maps")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Grids an anomaly field of a station layer into a styled raster and contour lines.")

    def tags(self):
        return self.tr("gravity,anomaly,bouguer,grid,raster,contour,minimum curvature,tension").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Grids a numeric anomaly field (default <b>cba</b>, mGal) of a point layer by "
            "minimum curvature with tension (Briggs 1974; Smith &amp; Wessel 1990) into a "
            "float32 GeoTIFF in the stations' CRS, and optionally draws contour lines with a "
            "<b>value</b> field (mGal).</p>"
            "<p><b>Pixel size</b>: empty = half the median distance between neighbouring "
            "stations, rounded down to 1, 2, 2.5 or 5 times a power of ten. <b>Extent</b>: "
            "empty = the stations' bounding box plus 5 % of its longer side; edges are snapped "
            "to whole cells. <b>Tension</b>: 0 = pure minimum curvature (smoothest, may "
            "overshoot), 1 = no new extrema between stations; 0.25 suits potential-field data. "
            "<b>Blanking distance</b>: cells farther than this from every station become "
            "NoData; empty = three times the median station spacing, 0 = no blanking. "
            "<b>Contour interval</b>: empty = a round interval (1, 2, 2.5 or 5 times a power of ten) "
            "giving about 10 to 15 contours.</p>"
            "<p>Limits: at most {:,} grid cells (the memory is estimated before the grid is "
            "made); at most {:,} contour levels; a field with one value everywhere is refused. "
            "The outputs may not overwrite the station layer or each other; nothing is left "
            "behind when a run fails or is cancelled.</p>"
            "<p>Stations with an empty or non-numeric value are skipped and counted in the log; "
            "at least 3 are needed. The stations must be in a projected CRS (metres): "
            "reproject a layer in degrees first.</p>"
            "<p>When loaded into a project the raster gets a colour ramp stretched linearly "
            "between the 2nd and 98th percentiles with bilinear smoothing, and every fifth "
            "contour is drawn heavier and labelled. The same styles ship as .qml files in the "
            "plugin's plugin/styles folder.</p>"
            "<p>{}</p>"
        ).format(MAX_CELLS, MAX_CONTOUR_LEVELS, self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.INPUT, self.tr("Gravity stations"), [QgsProcessing.TypeVectorPoint]
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.FIELD,
                self.tr("Anomaly field to grid (mGal)"),
                defaultValue="cba",
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
            )
        )
        self.addParameter(
            QgsProcessingParameterDistance(
                self.PIXEL_SIZE,
                self.tr("Pixel size (empty = automatic, from the station spacing)"),
                defaultValue=None,
                parentParameterName=self.INPUT,
                minValue=0.0,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterExtent(
                self.EXTENT, self.tr("Grid extent (empty = stations plus a margin)"), optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.TENSION,
                self.tr("Tension (0 = minimum curvature, 1 = no overshoot)"),
                type=QgsProcessingParameterNumber.Double,
                defaultValue=0.25,
                minValue=0.0,
                maxValue=1.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterDistance(
                self.BLANK_DISTANCE,
                self.tr("Blanking distance (empty = 3 station spacings, 0 = none)"),
                defaultValue=None,
                parentParameterName=self.INPUT,
                minValue=0.0,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.CONTOUR_INTERVAL,
                self.tr("Contour interval (mGal, empty = automatic)"),
                type=QgsProcessingParameterNumber.Double,
                defaultValue=None,
                minValue=0.0,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterRasterDestination(self.OUTPUT, self.tr("Anomaly raster"))
        )
        self.addParameter(
            QgsProcessingParameterFeatureSink(
                self.CONTOURS,
                self.tr("Contours"),
                QgsProcessing.TypeVectorLine,
                optional=True,
                createByDefault=True,
            )
        )
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_GRIDDED, self.tr("Stations gridded")))
        self.addOutput(QgsProcessingOutputNumber(self.CELL_SIZE_USED, self.tr("Pixel size used")))
        self.addOutput(QgsProcessingOutputNumber(self.BLANK_DISTANCE_USED, self.tr("Blanking distance used")))
        self.addOutput(QgsProcessingOutputNumber(self.INTERVAL_USED, self.tr("Contour interval used (mGal)")))

    def checkParameterValues(self, parameters, context):  # noqa: N802 - QGIS API
        ok, message = super().checkParameterValues(parameters, context)
        if not ok:
            return ok, message
        source = self.parameterAsSource(parameters, self.INPUT, context)
        problem = check_numeric_fields(self, source, parameters, context, {self.FIELD: self.tr("anomaly")})
        if problem:
            return False, problem
        if source is not None and source.sourceCrs().isValid() and source.sourceCrs().isGeographic():
            return False, self._geographic_message(source.sourceCrs())
        return True, ""

    def _geographic_message(self, crs) -> str:
        return self.tr(
            "The stations are in a geographic CRS ({}), in degrees; gridding needs distances in "
            "metres. Reproject the station layer to a projected CRS (for example the local UTM "
            "zone) with Vector > Data Management Tools > Reproject Layer, then grid the copy."
        ).format(crs.authid() or crs.description())

    def _optional_double(self, parameters, key, context):
        """Value of an optional number, or None when left empty."""
        if is_unset(parameters.get(key)):
            return None
        return self.parameterAsDouble(parameters, key, context)

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        from ..outputs import StagedOutput, layer_source, refuse_overwriting_inputs
        from .base import record_provenance

        source_path = layer_source(self, parameters, self.INPUT, context)
        want_contours = self.CONTOURS in parameters and not is_unset(parameters.get(self.CONTOURS))
        outputs = {self.tr("anomaly raster"): self.parameterAsOutputLayer(parameters, self.OUTPUT, context)}
        if want_contours:
            outputs[self.tr("contour layer")] = self.parameterAsOutputLayer(parameters, self.CONTOURS, context)
        refuse_overwriting_inputs(outputs, {self.tr("station layer"): source_path})
        staged = [StagedOutput(self, parameters, self.OUTPUT, context, self.tr("anomaly raster"))]
        if want_contours:
            staged.append(StagedOutput(self, staged[0].parameters, self.CONTOURS, context, self.tr("contour layer")))
        try:
            results, settings = self._grid(staged[-1].parameters, context, feedback, want_contours)
            if feedback.isCanceled():
                raise QgsProcessingException(self.tr("Cancelled by the user."))
            results[self.OUTPUT] = staged[0].finish(results[self.OUTPUT])
            if want_contours and self.CONTOURS in results:
                results[self.CONTOURS] = staged[1].finish(results[self.CONTOURS])
        except BaseException:
            for item in staged:
                item.discard()
            raise
        raster_style, contour_style = settings.pop("_raster_style"), settings.pop("_contour_style")
        record_provenance(self.id(), results[self.OUTPUT], parameters, source_path, settings, feedback)
        if want_contours and self.CONTOURS in results:
            record_provenance(self.id(), results[self.CONTOURS], parameters, source_path, settings, feedback)
        # Styles are attached to the final paths (the staged ones are gone).
        attach_raster_style(context, results[self.OUTPUT], *raster_style)
        if want_contours and self.CONTOURS in results:
            attach_contour_style(context, results[self.CONTOURS], contour_style)
        return results

    def _grid(self, parameters, context, feedback, want_contours):
        from ...algorithms import gridding
        from ..stations import check_point_layer

        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        check_point_layer(source)
        crs = source.sourceCrs()
        if crs.isValid() and crs.isGeographic():
            raise QgsProcessingException(self._geographic_message(crs))
        problem = check_numeric_fields(self, source, parameters, context, {self.FIELD: self.tr("anomaly")})
        if problem:
            raise QgsProcessingException(problem)
        field_name = self.parameterAsFields(parameters, self.FIELD, context)[0]

        steps = QgsProcessingMultiStepFeedback(4 if want_contours else 3, feedback)
        table = read_stations(source, context, steps)
        values = table.field_values(field_name)
        usable = np.isfinite(values) & np.isfinite(table.x) & np.isfinite(table.y)
        skipped = len(table) - int(usable.sum())
        if skipped:
            feedback.pushInfo(
                self.tr("{} of {} stations skipped: no geometry or no numeric value in {}.").format(
                    skipped, len(table), field_name
                )
            )
        if usable.sum() < 3:
            raise QgsProcessingException(
                self.tr(
                    "Only {} station(s) have a value in the field {}; at least 3 are needed to grid."
                ).format(int(usable.sum()), field_name)
            )
        x, y, v = table.x[usable], table.y[usable], values[usable]
        if float(np.ptp(v)) == 0.0:
            raise QgsProcessingException(
                self.tr(
                    "Every station has the same value in {} ({:g}): a constant field has no anomaly to "
                    "grid or contour. Check that the field holds the anomaly."
                ).format(field_name, float(v[0]))
            )

        cell_size = self._optional_double(parameters, self.PIXEL_SIZE, context)
        if cell_size is not None and cell_size <= 0:
            cell_size = None
        extent = None
        if not is_unset(parameters.get(self.EXTENT)):
            rect = self.parameterAsExtent(parameters, self.EXTENT, context, crs)
            if not rect.isNull() and not rect.isEmpty():
                extent = (rect.xMinimum(), rect.xMaximum(), rect.yMinimum(), rect.yMaximum())
        tension = self.parameterAsDouble(parameters, self.TENSION, context)
        blank = self._optional_double(parameters, self.BLANK_DISTANCE, context)
        # Distances are in the layer's units (metres for most projected CRSs).
        units = QgsUnitTypes.toAbbreviatedString(crs.mapUnits())

        if feedback.isCanceled():
            raise QgsProcessingException(self.tr("Cancelled by the user."))
        steps.setCurrentStep(1)
        with warnings.catch_warnings(record=True) as caught:
            warnings.simplefilter("always")
            try:
                geometry = gridding.default_grid_geometry(x, y, cell_size=cell_size, extent=extent)
                self._check_size(geometry, units)
                feedback.pushInfo(
                    self.tr("Grid: {} columns x {} rows of {} {} cells, tension {}.").format(
                        geometry.n_cols, geometry.n_rows, geometry.cell_size, units, tension
                    )
                )
                surface = np.asarray(
                    gridding.minimum_curvature(
                        x,
                        y,
                        v,
                        geometry,
                        tension=tension,
                        progress=lambda fraction: steps.setProgress(100.0 * fraction),
                        is_cancelled=feedback.isCanceled,
                    ),
                    dtype=float,
                )
                if blank is None:
                    blank = BLANK_SPACINGS * gridding.station_spacing(x, y)
                    feedback.pushInfo(
                        self.tr("Automatic blanking distance: {:.6g} {} (3 station spacings).").format(blank, units)
                    )
                if blank > 0:
                    far = gridding.blank_far_cells(geometry, x, y, blank)
                    surface[far] = np.nan
            except gridding.GriddingCancelled as error:
                raise QgsProcessingException(self.tr("Cancelled by the user.")) from error
            except ValueError as error:
                raise QgsProcessingException(
                    self.tr("The stations cannot be gridded: {}").format(error)
                ) from error
        for warning in caught:
            feedback.pushWarning(str(warning.message))
        if feedback.isCanceled():
            raise QgsProcessingException(self.tr("Cancelled by the user."))

        valid = np.isfinite(surface)
        if not valid.any():
            raise QgsProcessingException(
                self.tr("Every cell was blanked: increase the blanking distance or set it to 0.")
            )
        vmin, vmax = float(np.nanmin(surface)), float(np.nanmax(surface))
        interval = self._contour_interval(parameters, context, vmin, vmax, feedback) if want_contours else None
        steps.setCurrentStep(2)
        output_path = self.parameterAsOutputLayer(parameters, self.OUTPUT, context)
        try:
            _write_raster(output_path, surface, geometry, crs.toWkt(), field_name)
        except RuntimeError as error:
            raise QgsProcessingException(
                self.tr("The anomaly raster could not be written to {}: {}").format(output_path, error)
            ) from error
        steps.setProgress(100)
        feedback.pushInfo(
            self.tr("{} stations gridded; {} of {} cells have a value, from {:.3f} to {:.3f} mGal.").format(
                int(usable.sum()), int(valid.sum()), valid.size, vmin, vmax
            )
        )
        results = {
            self.OUTPUT: output_path,
            self.STATIONS_GRIDDED: int(usable.sum()),
            self.CELL_SIZE_USED: float(geometry.cell_size),
            self.BLANK_DISTANCE_USED: float(blank),
        }
        layer_title = self.tr("Anomaly {} (mGal)").format(field_name)
        abstract = self.tr(
            "Anomaly field {} of {} stations, gridded by minimum curvature with tension {} on "
            "{} {} cells; values in mGal; cells farther than {:.6g} {} from a station are NoData "
            "(0 = no blanking)."
        ).format(field_name, int(usable.sum()), tension, geometry.cell_size, units, blank, units)
        settings = {
            "field": field_name,
            "method": "minimum curvature with tension (Briggs 1974; Smith & Wessel 1990)",
            "tension": tension,
            "cell_size": float(geometry.cell_size),
            "extent": list(geometry.geotransform),
            "blanking_distance": float(blank),
            "contour_interval_mgal": interval,
            "_raster_style": (layer_title, abstract),
            "_contour_style": self.tr("Contours {} ({:g} mGal)").format(field_name, interval or 0.0),
        }

        if want_contours:
            steps.setCurrentStep(3)
            results[self.INTERVAL_USED] = interval
            fields = QgsFields()
            fields.append(QgsField("value", QVariant.Double))
            sink, contour_id = self.parameterAsSink(
                parameters, self.CONTOURS, context, fields, QgsWkbTypes.LineString, crs
            )
            if sink is not None:
                count = 0
                for level, wkb in _contour_lines(surface, geometry, interval, is_cancelled=feedback.isCanceled):
                    if feedback.isCanceled():
                        raise QgsProcessingException(self.tr("Cancelled by the user."))
                    feature = QgsFeature(fields)
                    geometry_out = QgsGeometry()
                    geometry_out.fromWkb(wkb)
                    feature.setGeometry(geometry_out)
                    feature.setAttributes([level])
                    sink.addFeature(feature, QgsFeatureSink.FastInsert)
                    count += 1
                feedback.pushInfo(self.tr("{} contour lines every {:g} mGal.").format(count, interval))
                del sink
                results[self.CONTOURS] = contour_id
            steps.setProgress(100)
        return results, settings

    def _check_size(self, geometry, units) -> None:
        """Refuse a grid above MAX_CELLS or above the memory available, before allocating."""
        cells = int(geometry.n_cols) * int(geometry.n_rows)
        needed = cells * BYTES_PER_CELL
        free = available_memory()
        if cells > MAX_CELLS or (free is not None and needed > free):
            raise QgsProcessingException(
                self.tr(
                    "A grid of {} x {} = {:,} cells of {:g} {} would need about {:.1f} GB of memory "
                    "(limit {:,} cells{}). Choose a larger pixel size or a smaller extent."
                ).format(
                    geometry.n_cols,
                    geometry.n_rows,
                    cells,
                    geometry.cell_size,
                    units,
                    needed / 1e9,
                    MAX_CELLS,
                    "" if free is None else self.tr("; {:.1f} GB available now").format(free / 1e9),
                )
            )

    def _contour_interval(self, parameters, context, vmin, vmax, feedback) -> float:
        """The interval to draw: the user's (checked) or a round automatic one."""
        from ...algorithms import gridding

        interval = self._optional_double(parameters, self.CONTOUR_INTERVAL, context)
        if interval is None or interval <= 0:
            return float(gridding.nice_contour_interval(vmin, vmax))
        levels = math.floor(vmax / interval) - math.ceil(vmin / interval) + 1
        if levels > MAX_CONTOUR_LEVELS:
            raise QgsProcessingException(
                self.tr(
                    "A contour interval of {:g} mGal over values from {:.3f} to {:.3f} mGal gives {:,} "
                    "levels (limit {:,}). Choose a larger interval, e.g. {:g} mGal, or leave it empty."
                ).format(
                    interval, vmin, vmax, levels, MAX_CONTOUR_LEVELS, float(gridding.nice_contour_interval(vmin, vmax))
                )
            )
        return interval


def _driver_for(path: str) -> str:
    """GDAL driver for the extension the user chose; GeoTIFF otherwise."""
    driver = QgsRasterFileWriter.driverForExtension(Path(path).suffix.lstrip("."))
    return driver if driver and gdal.GetDriverByName(driver) is not None else "GTiff"


def _write_raster(path: str, surface: np.ndarray, geometry, crs_wkt: str, field_name: str) -> None:
    """Write the surface (NaN = NoData) as a float32 single-band raster.

    Built in memory and copied, so drivers that can only copy (e.g. ASCII
    grids) work as well as GeoTIFF.
    """
    memory = gdal.GetDriverByName("MEM").Create("", geometry.n_cols, geometry.n_rows, 1, gdal.GDT_Float32)
    memory.SetGeoTransform(geometry.geotransform)
    srs = osr.SpatialReference()
    srs.ImportFromWkt(crs_wkt)
    memory.SetProjection(srs.ExportToWkt())
    band = memory.GetRasterBand(1)
    band.SetNoDataValue(NODATA)
    # The unit and field travel with the file, for any program that reads it.
    band.SetUnitType("mGal")
    band.SetDescription(f"{field_name} (mGal)")
    band.WriteArray(np.where(np.isfinite(surface), surface, NODATA).astype(np.float32))
    driver_name = _driver_for(path)
    options = ["COMPRESS=DEFLATE", "PREDICTOR=3", "TILED=YES"] if driver_name == "GTiff" else []
    copy = gdal.GetDriverByName(driver_name).CreateCopy(path, memory, 0, options)
    copy.FlushCache()
    copy = None
    memory = None


def _contour_lines(surface: np.ndarray, geometry, interval: float, is_cancelled=None):
    """Yield ``(level, wkb)`` for every contour line of the surface (GDAL's contour generator).

    ``is_cancelled()`` is polled by GDAL while it traces; True stops it, and
    nothing more is yielded (the caller checks for the cancel itself).
    """
    rows, cols = surface.shape
    raster = gdal.GetDriverByName("MEM").Create("", cols, rows, 1, gdal.GDT_Float64)
    raster.SetGeoTransform(geometry.geotransform)
    band = raster.GetRasterBand(1)
    band.SetNoDataValue(NODATA)
    band.WriteArray(np.where(np.isfinite(surface), surface, NODATA))
    vectors = ogr.GetDriverByName("Memory").CreateDataSource("contours")
    layer = vectors.CreateLayer("contours", geom_type=ogr.wkbLineString)
    layer.CreateField(ogr.FieldDefn("id", ogr.OFTInteger))
    layer.CreateField(ogr.FieldDefn("value", ogr.OFTReal))
    # Base 0: levels are whole multiples of the interval, so maps of
    # neighbouring surveys share contour values.
    def keep_going(_complete, _message, _data):
        return 0 if is_cancelled is not None and is_cancelled() else 1

    try:
        gdal.ContourGenerate(band, interval, 0.0, [], 1, NODATA, layer, 0, 1, callback=keep_going)
    except RuntimeError:
        if is_cancelled is not None and is_cancelled():
            return
        raise
    decimals = max(0, -math.floor(math.log10(interval)) + 3)
    for feature in layer:
        geometry_ref = feature.GetGeometryRef()
        if geometry_ref is None or geometry_ref.GetPointCount() < 2:
            continue
        geometry_ref.FlattenTo2D()
        # Rounding removes binary noise such as 0.30000000000000004.
        yield round(feature.GetField("value"), decimals), bytes(geometry_ref.ExportToWkb())
