# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:bouguerreduction``."""

from __future__ import annotations

import warnings

import numpy as np
from qgis.core import (
    QgsProcessing,
    QgsProcessingOutputNumber,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterDefinition,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterField,
    QgsProcessingParameterRasterLayer,
)
from qgis.PyQt.QtCore import QVariant

from ...algorithms import REDUCTION_FIELDS, reduce_gravity
from ...algorithms.constants import PLAUSIBLE_DENSITY
from ..stations import write_stations
from ..terrain_run import EXACT, compute_terrain, place_stations
from .base import StationAlgorithm
from .field_checks import check_numeric_fields

NORMAL_FORMULAS = ("grs80", "wgs84", "1967")
HEIGHT_FORMULAS = ("second_order", "first_order")

#: Fields added to the copy of the station layer (docs/reduction.md, section 6), all mGal but
#: qc_flag: the reduction's fields with the two terrain zones before their total.
_TC_TOTAL_AT = REDUCTION_FIELDS.index("tc_total")
RESULT_FIELDS = REDUCTION_FIELDS[:_TC_TOTAL_AT] + ("tc_inner", "tc_outer") + REDUCTION_FIELDS[_TC_TOTAL_AT:]


class BouguerReductionAlgorithm(StationAlgorithm):
    """Free-air, simple and complete Bouguer anomalies for a station layer."""

    GRAVITY_FIELD = "GRAVITY_FIELD"
    DENSITY_FIELD = "DENSITY_FIELD"
    DENSITY_FIELD_UNITS = "DENSITY_FIELD_UNITS"
    NORMAL_GRAVITY = "NORMAL_GRAVITY"
    HEIGHT_CORRECTION = "HEIGHT_CORRECTION"
    ATMOSPHERIC = "ATMOSPHERIC"
    CURVATURE = "CURVATURE"
    TC_FIELD = "TC_FIELD"
    STATIONS_REDUCED = "STATIONS_REDUCED"
    STATIONS_FLAGGED = "STATIONS_FLAGGED"

    def name(self):
        return "bouguerreduction"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Bouguer reduction (free-air, simple and complete Bouguer anomalies)")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Reduces observed gravity at stations to free-air, simple and complete Bouguer anomalies.")

    def tags(self):
        return self.tr("gravity,bouguer,free-air,normal gravity,terrain correction,anomaly,GRS80").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Adds normal gravity, every correction and the free-air (<b>faa</b>), simple "
            "Bouguer (<b>sba</b>) and complete Bouguer (<b>cba</b>) anomalies to a copy of a "
            "station point layer. All values in mGal.</p>"
            "<p>Default standard: Hinze et al. (2005): GRS80 normal gravity, second-order "
            "height correction, atmospheric correction, spherical-cap Bouguer correction to "
            "166.7 km (slab + curvature, LaFehr 1991) and terrain correction to 166.7 km. "
            "Heights are heights above the ellipsoid. The 1967 formula, the first-order "
            "0.3086 mGal/m gradient and a flat slab are options to reproduce legacy "
            "databases.</p>"
            "<p>faa = g_obs - normal_g + height_corr + atmos_corr; "
            "sba = faa - slab_corr - curv_corr; cba = sba + tc_total.</p>"
            "<p>The terrain correction comes from the terrain-correction field when one is "
            "chosen, otherwise from the elevation raster with the exact prism engine "
            "(inner zone to the inner radius, outer zone to the outer radius); without "
            "either, cba is left empty.</p>"
            "<p>Station height: from the height field, or sampled from the elevation raster "
            "when no field is chosen (flagged in qc_flag). A station that cannot be reduced "
            "keeps its row with empty values and a reason in qc_flag.</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.add_stations_parameter()
        self.addParameter(
            QgsProcessingParameterField(
                self.GRAVITY_FIELD,
                self.tr("Observed gravity field (mGal)"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.HEIGHT_FIELD,
                self.tr("Station height field (above the ellipsoid; empty = sample the elevation raster)"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
                optional=True,
            )
        )
        self.add_height_units_parameter()
        self.addParameter(
            QgsProcessingParameterRasterLayer(
                self.DEM, self.tr("Elevation raster (DEM, metres)"), optional=True
            )
        )
        self.add_density_parameter()
        self.addParameter(
            QgsProcessingParameterField(
                self.DENSITY_FIELD,
                self.tr("Reduction density field, per station"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
                optional=True,
            )
        )
        units = QgsProcessingParameterEnum(
            self.DENSITY_FIELD_UNITS,
            self.tr("Units of the density field"),
            options=[self.tr("kg/m³"), self.tr("g/cm³")],
            defaultValue=0,
        )
        units.setFlags(units.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        self.addParameter(units)
        self.addParameter(
            QgsProcessingParameterEnum(
                self.NORMAL_GRAVITY,
                self.tr("Normal gravity"),
                options=[
                    self.tr("GRS80 (Somigliana closed form)"),
                    self.tr("WGS84 (Somigliana closed form)"),
                    self.tr("1967 formula (legacy databases)"),
                ],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.HEIGHT_CORRECTION,
                self.tr("Height (free-air) correction"),
                options=[
                    self.tr("Second order, latitude dependent (Hinze et al. 2005)"),
                    self.tr("First order, 0.3086 mGal/m"),
                ],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(
                self.ATMOSPHERIC, self.tr("Apply the atmospheric correction"), defaultValue=True
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(
                self.CURVATURE,
                self.tr("Spherical cap to 166.7 km (add the curvature correction to the slab)"),
                defaultValue=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.TC_FIELD,
                self.tr("Existing terrain-correction field (mGal)"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
                optional=True,
            )
        )
        self.add_zone_parameters(advanced=True)
        self.addParameter(
            QgsProcessingParameterFeatureSink(
                self.OUTPUT, self.tr("Reduced stations"), QgsProcessing.TypeVectorPoint
            )
        )
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_REDUCED, self.tr("Stations reduced")))
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_FLAGGED, self.tr("Stations flagged")))

    def checkParameterValues(self, parameters, context):  # noqa: N802 - QGIS API
        ok, message = super().checkParameterValues(parameters, context)
        if not ok:
            return ok, message
        source = self.parameterAsSource(parameters, self.INPUT, context)
        problem = check_numeric_fields(
            self,
            source,
            parameters,
            context,
            {
                self.GRAVITY_FIELD: self.tr("observed gravity"),
                self.HEIGHT_FIELD: self.tr("station height"),
                self.DENSITY_FIELD: self.tr("density"),
                self.TC_FIELD: self.tr("terrain correction"),
            },
        )
        if problem:
            return False, problem
        problem = self.check_density_and_radii(parameters, context)
        if problem:
            return False, problem
        height_field = self.parameterAsFields(parameters, self.HEIGHT_FIELD, context)
        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        if not height_field and dem is None:
            return False, self.tr("Choose a station height field or an elevation raster to sample heights from.")
        return True, ""

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        source, steps, table = self.read_input_stations(parameters, context, feedback)
        gravity_field = self.first_field(parameters, self.GRAVITY_FIELD, context)
        height_field = self.first_field(parameters, self.HEIGHT_FIELD, context)
        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        regional = self.parameterAsRasterLayer(parameters, self.REGIONAL_DEM, context)
        tc_field = self.first_field(parameters, self.TC_FIELD, context)
        # The DEM is opened and the stations put on it once, for the heights
        # and for the terrain correction alike.
        placed = place_stations(dem, table, context) if dem is not None and not (height_field and tc_field) else None

        observed = table.field_values(gravity_field, label=self.tr("observed gravity"))
        heights = self.station_heights(parameters, context, table, placed)

        density = self._densities(parameters, context, table, feedback)
        normal_formula = NORMAL_FORMULAS[self.parameterAsEnum(parameters, self.NORMAL_GRAVITY, context)]
        height_formula = HEIGHT_FORMULAS[self.parameterAsEnum(parameters, self.HEIGHT_CORRECTION, context)]
        atmospheric = self.parameterAsBoolean(parameters, self.ATMOSPHERIC, context)
        curvature = self.parameterAsBoolean(parameters, self.CURVATURE, context)

        steps.setCurrentStep(1)
        tc_inner = np.full(len(table), np.nan)
        tc_outer = np.full(len(table), np.nan)
        if tc_field:
            tc_total = table.field_values(tc_field, label=self.tr("terrain correction"))
        elif placed is not None:
            terrain = compute_terrain(
                table,
                heights,
                placed,
                regional,
                inner_radius=self.parameterAsDouble(parameters, self.INNER_RADIUS, context),
                outer_radius=self.parameterAsDouble(parameters, self.OUTER_RADIUS, context),
                density=density,
                innermost_tc=None,
                water_density=None,
                method=EXACT,
                context=context,
                feedback=steps,
            )
            tc_inner, tc_outer, tc_total = terrain["tc_inner"], terrain["tc_outer"], terrain["tc_total"]
        else:
            tc_total = np.full(len(table), np.nan)
            feedback.pushWarning(
                self.tr("No terrain-correction field and no elevation raster: cba is left empty.")
            )

        steps.setCurrentStep(2)
        with warnings.catch_warnings(record=True):
            warnings.simplefilter("always")
            reduced = reduce_gravity(
                observed,
                table.latitude,
                heights,
                density=density,
                terrain_correction=tc_total,
                normal_formula=normal_formula,
                height_formula=height_formula,
                atmospheric=atmospheric,
                curvature=curvature,
            )
        reduced["tc_inner"] = tc_inner
        reduced["tc_outer"] = tc_outer
        added = [(name, QVariant.Double) for name in RESULT_FIELDS] + [("qc_flag", QVariant.String)]
        sink, dest_id, fields, indices = self.station_sink(parameters, context, source, added, feedback)
        write_stations(sink, table, fields, indices, {k: reduced[k] for k in RESULT_FIELDS}, steps)

        faa_ok = np.isfinite(reduced["faa"])
        flagged = sum(1 for f in table.flags if f)
        feedback.pushInfo(
            self.tr("{} stations: {} with a free-air anomaly, {} with a complete Bouguer anomaly, {} flagged.").format(
                len(table), int(faa_ok.sum()), int(np.isfinite(reduced["cba"]).sum()), flagged
            )
        )
        return {
            self.OUTPUT: dest_id,
            self.STATIONS_REDUCED: int(faa_ok.sum()),
            self.STATIONS_FLAGGED: flagged,
        }

    def _densities(self, parameters, context, table, feedback):
        density = self.parameterAsDouble(parameters, self.DENSITY, context)
        names = self.parameterAsFields(parameters, self.DENSITY_FIELD, context)
        values = np.full(len(table), density)
        if names:
            scale = 1000.0 if self.parameterAsEnum(parameters, self.DENSITY_FIELD_UNITS, context) == 1 else 1.0
            per_station = table.field_values(names[0], scale)
            missing = ~np.isfinite(per_station) | (per_station <= 0)
            table.flag_where(missing, self.tr("density missing, default used"))
            values = np.where(missing, density, per_station)
        low, high = PLAUSIBLE_DENSITY
        odd = (values < low) | (values > high)
        if np.any(odd):
            feedback.pushWarning(
                self.tr(
                    "{} station(s) have a reduction density outside {}-{} kg/m³ (e.g. {}); check the units."
                ).format(int(odd.sum()), low, high, float(values[odd][0]))
            )
            table.flag_where(odd, self.tr("unusual density"))
        return values
