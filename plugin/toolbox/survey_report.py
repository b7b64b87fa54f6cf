# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:surveyreport``: one self-contained HTML report of a reduced survey.

Reads the station layer (and optionally the anomaly grid and its contours)
into :class:`..report.content.SurveyData`; the page itself is built by the
pure modules of :mod:`..report`. The file is written beside its destination
under a temporary name and moved into place only when complete.
"""

from __future__ import annotations

import datetime as _dt
import os
import shutil
import tempfile
import uuid
from pathlib import Path

import numpy as np
from qgis.core import (
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterFileDestination,
    QgsProcessingParameterRasterLayer,
    QgsProcessingParameterVectorLayer,
)

from ..provenance import plugin_version, read_record
from ..stations import as_float
from .base import ReliefGravityAlgorithm

#: Station identifier fields tried in order (else the feature id).
ID_FIELDS = ("station_id", "station", "stn", "id", "name")
#: Fields of the reduction and terrain steps the report reads when present.
REPORT_FIELDS = (
    "faa", "sba", "cba", "tc_inner", "tc_outer", "tc_total", "dem_diff", "tc_cover", "tc_sigma", "cba_sigma"
)


class SurveyReportAlgorithm(ReliefGravityAlgorithm):
    """Write the survey report of a reduced station layer as one HTML file."""

    INPUT = "INPUT"
    HEIGHT_FIELD = "HEIGHT_FIELD"
    GRID = "GRID"
    CONTOURS = "CONTOURS"
    OUTPUT = "OUTPUT"

    def name(self):
        return "surveyreport"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Survey report (HTML)")

    def groupId(self):  # noqa: N802 - QGIS API
        return "maps"

    def group(self):
        return self.tr("Maps")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Writes one self-contained HTML report of a reduced station layer: runs, flags, maps, plots.")

    def tags(self):
        return self.tr("gravity,report,html,bouguer,anomaly,terrain,flags,uncertainty").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Writes one HTML file (images embedded, no external references: it opens offline in any "
            "browser) describing a station layer reduced by <b>bouguerreduction</b>: what was run and with "
            "which parameters (read from the layers' provenance records), station counts, flags by code with "
            "their meaning and severity, the anomaly map (from <b>Anomaly grid</b> and <b>Contours</b> when "
            "given, else the stations coloured by their anomaly), histograms of the anomalies, the free-air "
            "and Bouguer anomalies against height, the terrain correction by zone, the uncertainty fields "
            "(tc_sigma, cba_sigma, sigma_…) when the layer has them, the flagged stations and the cautions.</p>"
            "<p><b>Height field</b>: empty = the height field recorded by the reduction, else none.</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.INPUT, self.tr("Reduced stations"), [QgsProcessing.TypeVectorPoint]
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.HEIGHT_FIELD, self.tr("Station height field (m)"), parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric, optional=True,
            )
        )
        self.addParameter(QgsProcessingParameterRasterLayer(self.GRID, self.tr("Anomaly grid"), optional=True))
        self.addParameter(
            QgsProcessingParameterVectorLayer(
                self.CONTOURS, self.tr("Contours"), [QgsProcessing.TypeVectorLine], optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterFileDestination(self.OUTPUT, self.tr("Report"), self.tr("HTML files (*.html *.htm)"))
        )

    def _check_cancel(self, feedback):
        if feedback.isCanceled():
            raise QgsProcessingException(self.tr("Cancelled: no report written."))

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        from ..report.content import SurveyData, build_report

        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        names = source.fields().names()
        if not any(name in names for name in ("faa", "sba", "cba")):
            raise QgsProcessingException(
                self.tr(
                    "The station layer has none of the fields faa, sba or cba: run the Bouguer reduction "
                    "(reliefgravity:bouguerreduction) on it first and report on its output."
                )
            )
        output = self.parameterAsFileOutput(parameters, self.OUTPUT, context)
        if not output:
            raise QgsProcessingException(self.tr("Choose a file for the report."))
        grid = self.parameterAsRasterLayer(parameters, self.GRID, context)
        contours = self.parameterAsVectorLayer(parameters, self.CONTOURS, context)
        station_layer = self.parameterAsVectorLayer(parameters, self.INPUT, context)
        records = [read_record(layer.source()) for layer in (station_layer, grid, contours) if layer is not None]

        height_field = self._height_field(parameters, context, names, records)
        wanted = [n for n in names if n in REPORT_FIELDS or n.startswith("sigma_")]
        id_field = next((n for n in ID_FIELDS if n in names), None)
        ids, xs, ys, flags = [], [], [], []
        values = {n: [] for n in wanted + ([height_field] if height_field else [])}
        total = source.featureCount() or 1
        for i, feature in enumerate(source.getFeatures()):
            if i % 500 == 0:
                self._check_cancel(feedback)
                feedback.setProgress(40.0 * i / total)
            ids.append(str(feature[id_field]) if id_field else str(feature.id()))
            point = feature.geometry().asPoint() if feature.hasGeometry() else None
            xs.append(point.x() if point is not None else np.nan)
            ys.append(point.y() if point is not None else np.nan)
            flags.append(str(feature["qc_flag"]) if "qc_flag" in names and feature["qc_flag"] else "")
            for name in values:
                values[name].append(as_float(feature[name]))
        fields = {n: np.array(v, dtype=float) for n, v in values.items() if n != height_field}
        if height_field:
            fields["height"] = np.array(values[height_field], dtype=float)
        if not ids:
            raise QgsProcessingException(self.tr("The station layer has no features: nothing to report."))

        crs = source.sourceCrs()
        crs_name = self.tr("Coordinates: {} ({}).").format(crs.description(), crs.authid()) if crs.isValid() else ""
        work = Path(tempfile.mkdtemp(prefix="relief_gravity_report_"))
        try:
            map_png, map_note = None, ""
            if grid is not None:
                self._check_cancel(feedback)
                feedback.pushInfo(self.tr("Rendering the anomaly map…"))
                from ..render import render_anomaly_map

                png = render_anomaly_map(grid, work / "map.png", contours=contours, stations=station_layer,
                                         title=self.tr("Anomaly map"), width_px=1400)
                map_png = png.read_bytes()
                map_note = self.tr("Gridded anomaly with contours and stations (mGal).")
            feedback.setProgress(60)
            self._check_cancel(feedback)
            data = SurveyData(
                layer_name=station_layer.name() if station_layer is not None else Path(output).stem,
                station_ids=ids, x=np.array(xs), y=np.array(ys), fields=fields, flags=flags, records=records,
                crs_name=crs_name, map_png=map_png, map_note=map_note,
                created=_dt.datetime.now(_dt.timezone.utc).strftime("%Y-%m-%d %H:%M UTC"),
                plugin_version=plugin_version(),
            )
            page = build_report(data)
            self._check_cancel(feedback)
            write_atomically(output, page)
        finally:
            shutil.rmtree(work, ignore_errors=True)
        feedback.setProgress(100)
        feedback.pushInfo(self.tr("Report written to {} ({} stations).").format(output, len(ids)))
        return {self.OUTPUT: output}

    def _height_field(self, parameters, context, names, records):
        chosen = self.parameterAsFields(parameters, self.HEIGHT_FIELD, context)
        if chosen:
            return chosen[0]
        from ..run_facts import find_value

        recorded = find_value(records, ("HEIGHT_FIELD", "height_field"))
        return recorded if recorded in names else None


def write_atomically(path, text: str) -> None:
    """Write ``text`` to ``path`` through a temporary file in the same folder (never half-written)."""
    folder = os.path.dirname(os.path.abspath(path)) or "."
    os.makedirs(folder, exist_ok=True)
    partial = os.path.join(folder, f".{os.path.basename(path)}.part-{uuid.uuid4().hex[:8]}")
    try:
        with open(partial, "w", encoding="utf-8") as handle:
            handle.write(text)
        os.replace(partial, path)
    except BaseException:
        if os.path.exists(partial):
            os.remove(partial)
        raise
