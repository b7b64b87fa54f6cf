# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:observedgravity``: gravimeter readings to observed gravity."""

from __future__ import annotations

import contextlib
import math
import warnings

import numpy as np
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsFeature,
    QgsFeatureSink,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterDefinition,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsWkbTypes,
)
from qgis.PyQt.QtCore import QVariant

from ...algorithms import qc
from ...algorithms.survey import (
    DEFAULT_KNOWN_SIGMA,
    DEFAULT_READING_SIGMA,
    FREE_AIR_GRADIENT,
    adjust_network,
    counter_to_mgal,
    duplicate_readings,
    instrument_height_correction,
    linear_drift,
    longman_tide,
    loop_closures,
    meeus_tide,
    times_going_backwards,
    utc_hours_to_iso,
)
from ..readings_table import check_cancel, index_keys, key_text, number, read_calibration, read_readings
from ..stations import output_fields, read_stations
from .base import ReliefGravityAlgorithm, is_unset

TIDES = ("longman1959", "none", "meeus1998")
TIDE_SOURCES = {
    "longman1959": "Longman 1959",
    "none": "none (readings already corrected)",
    "meeus1998": "Meeus 1998 positions, exact point-mass attraction",
}
DRIFTS = ("network", "linear", "none")
STATION_FIELDS = ("g_obs", "g_sigma", "n_read", "qc_flag")
READING_FIELDS = ("read_mgal", "ih_corr", "tide_corr", "drift_corr", "g_read", "residual", "t_utc", "loop", "qc_flag")


class ObservedGravityAlgorithm(ReliefGravityAlgorithm):
    """Observed gravity at stations from meter readings: tide, calibration, drift and ties."""

    READINGS = "READINGS"
    STATION_FIELD = "STATION_FIELD"
    TIME_FIELD = "TIME_FIELD"
    UTC_OFFSET = "UTC_OFFSET"
    READING_FIELD = "READING_FIELD"
    READING_UNITS = "READING_UNITS"
    CALIBRATION = "CALIBRATION"
    SCALE_FACTOR = "SCALE_FACTOR"
    INSTRUMENT_HEIGHT_FIELD = "INSTRUMENT_HEIGHT_FIELD"
    LOOP_FIELD = "LOOP_FIELD"
    STATIONS = "STATIONS"
    STATIONS_ID_FIELD = "STATIONS_ID_FIELD"
    HEIGHT_FIELD = "HEIGHT_FIELD"
    KNOWN_GRAVITY_FIELD = "KNOWN_GRAVITY_FIELD"
    GRADIENT_FIELD = "GRADIENT_FIELD"
    TIDE = "TIDE"
    GRAVIMETRIC_FACTOR = "GRAVIMETRIC_FACTOR"
    READING_SIGMA = "READING_SIGMA"
    KNOWN_SIGMA = "KNOWN_SIGMA"
    DRIFT = "DRIFT"
    DROP_OUTLIERS = "DROP_OUTLIERS"
    OUTPUT = "OUTPUT"
    READINGS_OUTPUT = "READINGS_OUTPUT"
    LOOPS = "LOOPS"
    MAX_MISCLOSURE = "MAX_MISCLOSURE"

    def name(self):
        return "observedgravity"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Observed gravity from meter readings (tide, drift, base ties)")

    def groupId(self):  # noqa: N802 - QGIS API
        return "readings"

    def group(self):
        return self.tr("Field readings")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Turns gravimeter readings into observed gravity at each station, with loop checks.")

    def tags(self):
        return self.tr(
            "gravity,gravimeter,readings,earth tide,Longman,drift,loop,base station,tie,calibration"
        ).split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Turns gravimeter readings (counter units or mGal) into observed gravity at each "
            "station of a point layer: calibration table or scale factor, Earth tide (Longman 1959, "
            "or the Sun and Moon from Meeus's 1998 series with the exact attraction, within about "
            "0.0001 mGal of a modern ephemeris where Longman's series errs by up to 0.003 mGal; "
            "added to the reading), reduction from the sensor to the station mark (0.3086 mGal/m or "
            "a measured gradient per station), then drift and ties to the stations of known gravity.</p>"
            "<p>Drift: least-squares adjustment of all readings (an offset and a linear drift rate "
            "per loop, known stations as weighted observations, standard errors and residuals), or "
            "linear drift between the first and last reading of each loop's base, or none.</p>"
            "<p>Times: ISO 8601 text (2026-05-04T09:13:00-06:00, or without an offset: then the UTC "
            "offset applies) or date-time fields. Loops: the loop field, else one loop per local "
            "calendar day. A loop opens on the station of its first reading.</p>"
            "<p>The station output (g_obs, g_sigma in mGal, n_read, qc_flag) feeds the Bouguer "
            "reduction directly with g_obs as the gravity field. The readings output gives each "
            "reading's corrections, g_read, residual and loop.</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        add = self.addParameter
        add(QgsProcessingParameterFeatureSource(
            self.READINGS, self.tr("Meter readings (table)"), [QgsProcessing.TypeVector]
        ))
        for key, label, optional in (
            (self.STATION_FIELD, self.tr("Station id field of the readings"), False),
            (self.TIME_FIELD, self.tr("Time field (ISO 8601 text or date-time)"), False),
            (self.READING_FIELD, self.tr("Reading field"), False),
        ):
            add(QgsProcessingParameterField(key, label, parentLayerParameterName=self.READINGS, optional=optional))
        add(QgsProcessingParameterNumber(
            self.UTC_OFFSET, self.tr("UTC offset of times without one (hours, east positive)"),
            type=QgsProcessingParameterNumber.Double, defaultValue=0.0, minValue=-14.0, maxValue=14.0,
        ))
        add(QgsProcessingParameterEnum(
            self.READING_UNITS, self.tr("Reading units"),
            options=[self.tr("Counter units (through the calibration table)"), self.tr("mGal")], defaultValue=0,
        ))
        add(QgsProcessingParameterFeatureSource(
            self.CALIBRATION, self.tr("Calibration table (fields counter, mgal, factor)"), [QgsProcessing.TypeVector],
            optional=True,
        ))
        add(QgsProcessingParameterNumber(
            self.SCALE_FACTOR, self.tr("Scale factor (mGal per unit, or a correction to the table)"),
            type=QgsProcessingParameterNumber.Double, defaultValue=1.0,
        ))
        add(QgsProcessingParameterField(
            self.INSTRUMENT_HEIGHT_FIELD, self.tr("Instrument height field (m of the sensor above the mark)"),
            parentLayerParameterName=self.READINGS, optional=True,
        ))
        add(QgsProcessingParameterField(
            self.LOOP_FIELD, self.tr("Loop field (empty: one loop per local calendar day)"),
            parentLayerParameterName=self.READINGS, optional=True,
        ))
        add(QgsProcessingParameterFeatureSource(
            self.STATIONS, self.tr("Gravity stations"), [QgsProcessing.TypeVectorPoint]
        ))
        add(QgsProcessingParameterField(
            self.STATIONS_ID_FIELD, self.tr("Station id field"), parentLayerParameterName=self.STATIONS
        ))
        add(QgsProcessingParameterField(
            self.HEIGHT_FIELD, self.tr("Station height field (m, for the tide)"),
            parentLayerParameterName=self.STATIONS, type=QgsProcessingParameterField.Numeric, optional=True,
        ))
        add(QgsProcessingParameterField(
            self.KNOWN_GRAVITY_FIELD, self.tr("Known gravity field (absolute, mGal; empty where unknown)"),
            parentLayerParameterName=self.STATIONS,
        ))
        add(QgsProcessingParameterEnum(
            self.TIDE, self.tr("Earth tide"),
            options=[
                self.tr("Longman (1959)"),
                self.tr("None (readings already corrected)"),
                self.tr("Sun and Moon from Meeus (1998) series, exact attraction"),
            ],
            defaultValue=0,
        ))
        add(QgsProcessingParameterNumber(
            self.GRAVIMETRIC_FACTOR, self.tr("Gravimetric factor (1 + h - 3k/2)"),
            type=QgsProcessingParameterNumber.Double, defaultValue=1.16, minValue=0.5, maxValue=2.0,
        ))
        add(QgsProcessingParameterEnum(
            self.DRIFT, self.tr("Drift and ties"),
            options=[
                self.tr("Network adjustment (least squares)"),
                self.tr("Linear between base readings"),
                self.tr("None"),
            ],
            defaultValue=0,
        ))
        advanced = [
            QgsProcessingParameterField(
                self.GRADIENT_FIELD, self.tr("Measured vertical gradient field (mGal/m, empty: 0.3086)"),
                parentLayerParameterName=self.STATIONS, optional=True,
            ),
            QgsProcessingParameterBoolean(
                self.DROP_OUTLIERS, self.tr("Leave readings beyond 3 standard errors out of a second pass"),
                defaultValue=False,
            ),
            QgsProcessingParameterNumber(
                self.READING_SIGMA, self.tr("A-priori standard error of one reading (mGal, network adjustment)"),
                type=QgsProcessingParameterNumber.Double, defaultValue=DEFAULT_READING_SIGMA, minValue=1e-6,
                maxValue=10.0, optional=True,
            ),
            QgsProcessingParameterNumber(
                self.KNOWN_SIGMA, self.tr("A-priori standard error of a known gravity value (mGal)"),
                type=QgsProcessingParameterNumber.Double, defaultValue=DEFAULT_KNOWN_SIGMA, minValue=1e-6,
                maxValue=10.0, optional=True,
            ),
        ]
        for definition in advanced:
            definition.setFlags(definition.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
            add(definition)
        add(QgsProcessingParameterFeatureSink(
            self.OUTPUT, self.tr("Stations with observed gravity"), QgsProcessing.TypeVectorPoint
        ))
        add(QgsProcessingParameterFeatureSink(
            self.READINGS_OUTPUT, self.tr("Reduced readings"), QgsProcessing.TypeVector
        ))
        self.addOutput(QgsProcessingOutputNumber(self.LOOPS, self.tr("Loops")))
        self.addOutput(QgsProcessingOutputNumber(self.MAX_MISCLOSURE, self.tr("Largest loop misclosure (mGal)")))

    def checkParameterValues(self, parameters, context):  # noqa: N802 - QGIS API
        ok, message = super().checkParameterValues(parameters, context)
        if not ok:
            return ok, message
        scale = self.parameterAsDouble(parameters, self.SCALE_FACTOR, context)
        if not scale > 0:
            return False, self.tr("The scale factor must be positive; got {}.").format(scale)
        return True, ""

    def _field(self, parameters, key, context):
        names = self.parameterAsFields(parameters, key, context)
        return names[0] if names else None

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        readings_source = self.parameterAsSource(parameters, self.READINGS, context)
        stations_source = self.parameterAsSource(parameters, self.STATIONS, context)
        if readings_source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.READINGS))
        if stations_source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.STATIONS))
        tide_method = TIDES[self.parameterAsEnum(parameters, self.TIDE, context)]
        drift_method = DRIFTS[self.parameterAsEnum(parameters, self.DRIFT, context)]
        factor = self.parameterAsDouble(parameters, self.GRAVIMETRIC_FACTOR, context)
        utc_offset = self.parameterAsDouble(parameters, self.UTC_OFFSET, context)
        scale = self.parameterAsDouble(parameters, self.SCALE_FACTOR, context)
        counter_units = self.parameterAsEnum(parameters, self.READING_UNITS, context) == 0

        stations = read_stations(stations_source, context, None)
        station_index, known, height, gradient = self._station_arrays(parameters, context, stations, feedback)
        fields = {
            "station": self._field(parameters, self.STATION_FIELD, context),
            "time": self._field(parameters, self.TIME_FIELD, context),
            "reading": self._field(parameters, self.READING_FIELD, context),
            "height": self._field(parameters, self.INSTRUMENT_HEIGHT_FIELD, context),
            "loop": self._field(parameters, self.LOOP_FIELD, context),
        }
        readings = read_readings(readings_source, fields, utc_offset, feedback)
        n = len(readings.features)
        flags = [[] for _ in range(n)]

        def flag(mask, code):
            for i in np.flatnonzero(mask):
                if code not in flags[i]:
                    flags[i].append(code)

        station = np.array([station_index.get(key, -1) for key in readings.station_key], dtype=int)
        flag(station < 0, "unknown_station")
        unknown = sorted({k for k, s in zip(readings.station_key, station) if s < 0})
        if unknown:
            feedback.pushWarning(
                self.tr("{} reading(s) name stations not in the station layer (e.g. {}); they are left out.").format(
                    int((station < 0).sum()), ", ".join(repr(u) for u in unknown[:5])
                )
            )
        flag(np.isnan(readings.raw), "no_reading")
        ih = readings.instrument_height
        if fields["height"]:
            flag(np.isnan(ih), "no_instrument_height")
        ih = np.where(np.isnan(ih), 0.0, ih)

        calibration_source = self.parameterAsSource(parameters, self.CALIBRATION, context)
        table = read_calibration(calibration_source) if (counter_units and calibration_source is not None) else None
        if table is None and counter_units and scale == 1.0:
            feedback.pushWarning(self.tr("Counter units without a calibration table or scale factor: read as mGal."))
        read_mgal = self._calibrate(readings.raw, table, scale)

        safe = np.clip(station, 0, None)
        lat = np.where(station >= 0, stations.latitude[safe], np.nan)
        lon = np.where(station >= 0, stations.longitude[safe], np.nan)
        if tide_method != "none":
            tide = (longman_tide if tide_method == "longman1959" else meeus_tide)(
                np.nan_to_num(lat), np.nan_to_num(lon), np.where(station >= 0, height[safe], 0.0),
                readings.utc_hours, factor,
            )
            no_position = (station >= 0) & np.isnan(lat)
            flag(no_position, "no_tide_position")
            # A reading of an unknown station or of one without a position gets no tide (no g_read).
            tide = np.where((station >= 0) & ~no_position, tide, np.nan)
        else:
            tide = np.zeros(n)
        grad = np.where(station >= 0, gradient[safe], FREE_AIR_GRADIENT)
        ih_corr = instrument_height_correction(ih, grad)
        value = read_mgal + tide + ih_corr

        loop_keys = readings.loop_key if fields["loop"] else readings.local_date
        loop, loop_names = index_keys([key or "?" for key in loop_keys])
        duplicate = duplicate_readings(station, readings.utc_hours)
        flag(duplicate, "duplicate_reading")
        flag(times_going_backwards(loop, readings.utc_hours), "time_backwards")
        use = (station >= 0) & np.isfinite(value) & ~duplicate
        check_cancel(feedback)
        feedback.setProgress(30)

        sigmas = (
            self._sigma(parameters, self.READING_SIGMA, DEFAULT_READING_SIGMA, context),
            self._sigma(parameters, self.KNOWN_SIGMA, DEFAULT_KNOWN_SIGMA, context),
        )
        result = self._solve(drift_method, value, station, loop, readings.utc_hours, known, use, sigmas, parameters,
                             context)
        closures = loop_closures(station, loop, readings.utc_hours, value, use=use, n_loops=len(loop_names))
        single = closures.base_count == 1
        flag(single[loop] & (station >= 0), "loop_single_base")
        if drift_method != "none":
            flag(~result.drift_estimated[loop] & result.loop_tied[loop] & (station >= 0), "loop_no_drift")
        flag((station >= 0) & ~result.loop_tied[loop] & use, "network_untied")
        flag(result.outlier, "reading_outlier")
        flag(result.outlier & ~result.used & use, "reading_left_out")
        ids = {index: key for key, index in station_index.items()}
        self._log_loops(feedback, loop_names, closures, result, drift_method, ids)
        check_cancel(feedback)
        feedback.setProgress(60)

        station_codes = self._station_codes(stations, known, result, station, use)
        finite_closures = np.any(np.isfinite(closures.misclosure))
        max_misclosure = float(np.nanmax(np.abs(closures.misclosure))) if finite_closures else math.nan
        reading_columns = {
            "read_mgal": read_mgal, "ih_corr": ih_corr, "tide_corr": tide, "drift_corr": result.drift_corr,
            "g_read": result.g_read, "residual": result.residual,
        }
        texts = {
            "t_utc": [utc_hours_to_iso(t) for t in readings.utc_hours],
            "loop": [loop_names[i] for i in loop],
            "qc_flag": [qc.merge_codes(None, f) for f in flags],
        }
        check_cancel(feedback)
        out_id = self._write_stations(parameters, context, stations_source, stations, result, station_codes)
        readings_id = self._write_readings(parameters, context, readings_source, readings, reading_columns, texts)
        self._record(parameters, out_id, readings_id, tide_method, drift_method, factor, table, result, sigmas)
        n_flagged = sum(1 for f in flags if f)
        feedback.pushInfo(
            self.tr(
                "{} readings in {} loops; {} stations with observed gravity; {} readings flagged; s0 = {:.4f} mGal."
            ).format(n, len(loop_names), int(np.isfinite(result.gravity).sum()), n_flagged, result.sigma0)
        )
        return {
            self.OUTPUT: out_id,
            self.READINGS_OUTPUT: readings_id,
            self.LOOPS: len(loop_names),
            self.MAX_MISCLOSURE: max_misclosure,
        }

    def _station_arrays(self, parameters, context, stations, feedback):
        id_field = self._field(parameters, self.STATIONS_ID_FIELD, context)
        known_field = self._field(parameters, self.KNOWN_GRAVITY_FIELD, context)
        height_field = self._field(parameters, self.HEIGHT_FIELD, context)
        gradient_field = self._field(parameters, self.GRADIENT_FIELD, context)
        index = {}
        for i, feature in enumerate(stations.features):
            key = key_text(feature[id_field])
            if not key:
                continue
            if key in index:
                raise QgsProcessingException(
                    self.tr(
                        "The station id '{}' appears more than once in the station layer; ids must be unique."
                    ).format(key)
                )
            index[key] = i
        known = np.array([number(f[known_field]) for f in stations.features])
        if not np.any(np.isfinite(known)):
            raise QgsProcessingException(
                self.tr(
                    "No station has a known gravity in the field {}: at least one base of known gravity is needed."
                ).format(known_field)
            )
        odd = np.isfinite(known) & ((known < 970_000.0) | (known > 990_000.0))
        if np.any(odd):
            feedback.pushWarning(
                self.tr(
                    "Known gravity {} is outside 970000-990000 mGal: it must be absolute gravity in mGal."
                ).format(known[odd][0])
            )
        if height_field:
            height = np.array([number(f[height_field]) for f in stations.features])
        else:
            height = np.zeros(len(stations))
        height = np.where(np.isnan(height), 0.0, height)
        gradient = np.full(len(stations), FREE_AIR_GRADIENT)
        if gradient_field:
            measured = np.array([number(f[gradient_field]) for f in stations.features])
            gradient = np.where(np.isfinite(measured), measured, FREE_AIR_GRADIENT)
        return index, known, height, gradient

    def _calibrate(self, raw, table, scale):
        try:
            with warnings.catch_warnings():
                warnings.simplefilter("ignore")
                return counter_to_mgal(raw, table, scale)
        except ValueError:
            low, high = table.counter_range
            rows = np.flatnonzero(np.isfinite(raw) & ((raw < low) | (raw > high))) + 1
            raise QgsProcessingException(
                self.tr(
                    "Counter reading(s) outside the calibration table's range {} to {} in row(s) {} of the readings."
                ).format(low, high, ", ".join(str(r) for r in rows[:10]))
            ) from None

    def _sigma(self, parameters, name, default, context) -> float:
        """A positive a-priori standard error (mGal); the default when the optional parameter is empty."""
        value = self.parameterAsDouble(parameters, name, context) if not is_unset(parameters.get(name)) else default
        if not (math.isfinite(value) and value > 0):
            raise QgsProcessingException(
                self.tr("{} must be a positive standard error in mGal, got {}.").format(name, value)
            )
        return value

    def _solve(self, method, value, station, loop, hours, known, use, sigmas, parameters, context):
        try:
            if method == "network":
                return adjust_network(
                    value, station, loop, hours, known, use=use,
                    drop_outliers=self.parameterAsBoolean(parameters, self.DROP_OUTLIERS, context),
                    reading_sigma=sigmas[0],
                    known_sigma=sigmas[1],
                )
            return linear_drift(value, station, loop, hours, known, use=use, drift=method == "linear")
        except ValueError as error:
            if "not tied" in str(error):
                raise QgsProcessingException(
                    self.tr("No reading is of a station of known gravity (or of a station tied to one): the network "
                            "cannot be tied. Give the known gravity of at least one base station read in the loops.")
                ) from None
            raise QgsProcessingException(str(error)) from None

    def _log_loops(self, feedback, names, closures, result, method, ids):
        feedback.pushInfo(self.tr("Loop, base, base readings, hours, misclosure (mGal), drift (mGal/h):"))
        for i, name in enumerate(names):
            hours = closures.end[i] - closures.start[i]
            feedback.pushInfo(
                "  {}  {}  {}  {:.2f}  {}  {}".format(
                    name, ids.get(int(closures.base[i]), "-"), closures.base_count[i],
                    hours if np.isfinite(hours) else float("nan"),
                    f"{closures.misclosure[i]:+.4f}" if np.isfinite(closures.misclosure[i]) else "-",
                    f"{result.drift_rate[i]:+.4f}" if np.isfinite(result.drift_rate[i]) and method != "none" else "-",
                )
            )

    def _station_codes(self, stations, known, result, station, use):
        counts = np.bincount(station[use], minlength=len(stations))
        codes = []
        for i in range(len(stations)):
            here = []
            if counts[i] == 0:
                here.append("not_read")
            elif not result.station_tied[i] or not np.isfinite(result.gravity[i]):
                here.append("network_untied")
            elif result.n_used[i] == 1:
                here.append("single_reading")
            if np.isfinite(known[i]):
                here.append("known_station")
            codes.append(qc.merge_codes(None, here))
        return codes

    def _write_stations(self, parameters, context, source, stations, result, codes):
        added = [
            ("g_obs", QVariant.Double), ("g_sigma", QVariant.Double),
            ("n_read", QVariant.Int), ("qc_flag", QVariant.String),
        ]
        fields, indices, _ = output_fields(source.fields(), added)
        sink, dest_id = self.parameterAsSink(
            parameters, self.OUTPUT, context, fields, source.wkbType(), source.sourceCrs()
        )
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        n_input = source.fields().count()
        for i, feature in enumerate(stations.features):
            attributes = list(feature.attributes()) + [None] * (len(fields) - n_input)
            for name, value in (("g_obs", result.gravity[i]), ("g_sigma", result.sigma[i])):
                attributes[indices[name]] = float(value) if np.isfinite(value) else None
            attributes[indices["n_read"]] = int(result.n_used[i])
            attributes[indices["qc_flag"]] = codes[i]
            out = QgsFeature(fields)
            out.setGeometry(feature.geometry())
            out.setAttributes(attributes)
            if not sink.addFeature(out, QgsFeatureSink.FastInsert):
                raise QgsProcessingException(self.tr("Could not write a station to the output layer."))
        del sink
        return dest_id

    def _write_readings(self, parameters, context, source, readings, columns, texts):
        added = [(name, QVariant.String if name in texts else QVariant.Double) for name in READING_FIELDS]
        fields, indices, _ = output_fields(source.fields(), added)
        sink, dest_id = self.parameterAsSink(
            parameters, self.READINGS_OUTPUT, context, fields, QgsWkbTypes.NoGeometry, QgsCoordinateReferenceSystem()
        )
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.READINGS_OUTPUT))
        n_input = source.fields().count()
        for i, feature in enumerate(readings.features):
            attributes = list(feature.attributes()) + [None] * (len(fields) - n_input)
            for name, values in columns.items():
                value = float(values[i])
                attributes[indices[name]] = value if math.isfinite(value) else None
            for name, values in texts.items():
                attributes[indices[name]] = values[i]
            out = QgsFeature(fields)
            out.setAttributes(attributes)
            if not sink.addFeature(out, QgsFeatureSink.FastInsert):
                raise QgsProcessingException(self.tr("Could not write a reading to the readings output."))
        del sink
        return dest_id

    def _record(self, parameters, out_id, readings_id, tide_method, drift_method, factor, table, result, sigmas):
        """Provenance record in each GeoPackage output (written after its sink is closed)."""
        from .. import provenance

        settings = {
            "tide": tide_method,
            "tide_source": TIDE_SOURCES[tide_method],
            "gravimetric_factor": factor,
            "drift": drift_method,
            "reading_sigma_mgal": sigmas[0],
            "known_sigma_mgal": sigmas[1],
            "calibration_rows": len(table.counter) if table else 0,
            "free_air_gradient_mgal_per_m": FREE_AIR_GRADIENT,
            "sigma0_mgal": result.sigma0,
            "redundancy": result.redundancy,
        }
        step = provenance.make_step(
            "reliefgravity:observedgravity", {k: str(v) for k, v in parameters.items()}, settings
        )
        for dest in (out_id, readings_id):
            if isinstance(dest, str) and dest.split("|")[0].lower().endswith(".gpkg"):
                with contextlib.suppress(OSError):
                    provenance.write_record(dest, provenance.chained(None, step))
