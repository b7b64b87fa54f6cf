# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:bouguerreduction``."""

from __future__ import annotations

import warnings

import numpy as np
from qgis.core import (
    QgsProcessing,
    QgsProcessingException,
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
from ...algorithms.plausibility import (
    DENSITY_LIMITS,
    GRAVITY_UNITS,
    check_gravity,
    gravity_out_of_range,
    gravity_to_mgal,
)
from ..density_layer import add_parameters as add_density_layer_parameters
from ..density_layer import read_parameters as read_density_layer
from ..density_layer import station_densities
from ..heights import (
    DEM_DATUM_KEYS,
    HEIGHT_DATUM_KEYS,
    check_dem_values,
    flag_mismatches,
    geoid_description,
    prepare_heights,
    warn_partial_coverage,
)
from ..raster_io import raster_path
from ..stations import write_stations
from ..terrain_run import EXACT, compute_terrain, place_stations
from ..uncertainty_run import add_parameters as add_uncertainty_parameters
from ..uncertainty_run import check_parameters as check_uncertainty_parameters
from ..uncertainty_run import uncertainty_columns, uncertainty_settings
from .base import StationAlgorithm, density_sentence, is_unset
from .field_checks import check_numeric_fields

NORMAL_FORMULAS = ("grs80", "wgs84", "1967")
HEIGHT_FORMULAS = ("second_order", "first_order")

#: Fields added to the copy of the station layer (docs/reduction.md, section 6), all mGal but
#: qc_flag: the reduction's fields with the two terrain zones before their total.
_TC_TOTAL_AT = REDUCTION_FIELDS.index("tc_total")
RESULT_FIELDS = (*REDUCTION_FIELDS[:_TC_TOTAL_AT], "tc_inner", "tc_outer", *REDUCTION_FIELDS[_TC_TOTAL_AT:])

#: Further per-station results the terrain runner may return (written when present).
ENGINE_EXTRA_FIELDS = ("tc_trunc",)


def _tr(text: str) -> str:
    from qgis.PyQt.QtCore import QCoreApplication

    return QCoreApplication.translate("BouguerReductionAlgorithm", text)


def gravity_unit_names() -> list:
    """Labels of the GRAVITY_UNITS options (order of algorithms.plausibility.GRAVITY_UNITS)."""
    return [_tr("mGal"), _tr("µm/s² (0.1 mGal)"), _tr("Gal (1,000 mGal)"), _tr("m/s² (100,000 mGal)")]


def observed_gravity_mgal(table, gravity_field, units):
    """Observed gravity in mGal, checked against Earth's gravity in the declared units.

    Stop when most values are not Earth's gravity in the declared units, flag
    single stations that are not (shared by the algorithms that reduce
    observed gravity).
    """
    raw = table.field_values(gravity_field, missing_code="no_gravity")
    problem = check_gravity(raw, units)
    if problem is not None:
        names = gravity_unit_names()
        if problem.zeros:
            text = _tr(
                "Every observed gravity value in {} is 0: the field holds no readings. Choose the "
                "field with observed (absolute) gravity."
            ).format(gravity_field)
        elif problem.likely_units is not None:
            text = _tr(
                "Observed gravity in {} reads {:.6g} mGal (median) with GRAVITY_UNITS = '{}', far from "
                "Earth's 975,000-984,000 mGal. The values look like {}: set GRAVITY_UNITS to '{}'."
            ).format(
                gravity_field,
                problem.median,
                names[units],
                names[problem.likely_units],
                names[problem.likely_units],
            )
        else:
            text = _tr(
                "Observed gravity in {} reads {:.6g} mGal (median), far from Earth's 975,000-984,000 "
                "mGal in any unit: relative meter readings or another quantity? The reduction needs "
                "absolute observed gravity."
            ).format(gravity_field, problem.median)
        raise QgsProcessingException(text)
    observed = gravity_to_mgal(raw, units)
    odd = gravity_out_of_range(observed)
    table.flag_where(odd, "gravity_implausible")
    observed[odd] = np.nan
    return observed


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
    GRAVITY_UNITS = "GRAVITY_UNITS"
    ORTHOMETRIC_REDUCTION = "ORTHOMETRIC_REDUCTION"
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
            "The 1967 formula, the first-order "
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
            "keeps its row with empty values and codes in qc_flag (their meaning in qc_note).</p>"
            "<p><b>Datums</b>: HEIGHT_DATUM says what the station heights are (ellipsoidal, "
            "orthometric above EGM96, or orthometric with the geoid height from GEOID_FIELD or "
            "GEOID_RASTER); DEM_DATUM what the raster heights are (EGM96 as most global DEMs, "
            "the ellipsoid, or the same as the stations). EGM96 comes from PROJ's egm96_15.gtx. "
            "The reduction uses ellipsoidal heights (Hinze et al. 2005) unless the legacy "
            "orthometric option is ticked; the terrain correction compares station and DEM in "
            "the DEM's datum. Stations that disagree with the DEM beyond the local relief are "
            "flagged height_dem_mismatch.</p>"
            "<p><b>Units and limits</b>: GRAVITY_UNITS mGal, µm/s², Gal or m/s²; observed gravity "
            "must fall within 975,000-984,000 mGal after units. Densities 500-5000 kg/m³ "
            "(1000-3500 without a warning). Inner radius above 0 and below the outer radius "
            "(default 895 m, the outer edge of Hammer zone F). A run stops with a sentence when "
            "the values look like another unit.</p>"
            "<p><b>Regional DEM</b>: the standard correction reaches 166.7 km; a regional "
            "elevation raster reaching that far around every station is needed, otherwise the "
            "stations are flagged tc_partial and cba misses the far terrain.</p>"
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
            QgsProcessingParameterEnum(
                self.GRAVITY_UNITS, self.tr("Units of observed gravity"), options=gravity_unit_names(), defaultValue=0
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.HEIGHT_FIELD,
                self.tr("Station height field (empty = sample the elevation raster)"),
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
        self.add_datum_parameters()
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
        add_uncertainty_parameters(self)
        add_density_layer_parameters(self)
        legacy = QgsProcessingParameterBoolean(
            self.ORTHOMETRIC_REDUCTION,
            self.tr("Reduce with orthometric heights (legacy practice; the standard uses ellipsoidal heights)"),
            defaultValue=False,
        )
        legacy.setFlags(legacy.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        self.addParameter(legacy)
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
                self.GEOID_FIELD: self.tr("geoid height"),
            },
        )
        if problem:
            return False, problem
        problem = (
            self.check_density_and_radii(parameters, context)
            or self.check_datums(parameters, context)
            or check_uncertainty_parameters(self, parameters, context)
        )
        if problem:
            return False, problem
        height_field = self.parameterAsFields(parameters, self.HEIGHT_FIELD, context)
        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        if not height_field and dem is None:
            return False, self.tr("Choose a station height field or an elevation raster to sample heights from.")
        return True, ""

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        return self.run_staged(parameters, context, feedback, self._reduce)

    def _reduce(self, parameters, context, feedback):
        from ...algorithms.constants import GRAVITATIONAL_CONSTANT

        source, steps, table = self.read_input_stations(parameters, context, feedback)
        gravity_field = self.first_field(parameters, self.GRAVITY_FIELD, context)
        height_field = self.first_field(parameters, self.HEIGHT_FIELD, context)
        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        regional = self.parameterAsRasterLayer(parameters, self.REGIONAL_DEM, context)
        tc_field = self.first_field(parameters, self.TC_FIELD, context)
        height_datum = self.parameterAsEnum(parameters, self.HEIGHT_DATUM, context)
        dem_datum = self.parameterAsEnum(parameters, self.DEM_DATUM, context)
        units = self.parameterAsEnum(parameters, self.GRAVITY_UNITS, context)

        observed = self._observed_gravity(table, gravity_field, units)
        density = self._densities(parameters, context, table, feedback)
        # The DEM is opened and the stations put on it once, for the heights
        # and for the terrain correction alike.
        placed = None
        if dem is not None and not (height_field and tc_field):
            placed = place_stations(dem, table, context)
            check_dem_values(placed.raster.path, self.tr("elevation raster"))
        if regional is not None and placed is not None and not tc_field:
            check_dem_values(raster_path(regional), self.tr("regional elevation raster"))
        polygons = self._density_polygons(parameters, context, source, table, placed, feedback)
        if polygons is not None:
            # The slab and curvature take the density of the polygon under each station.
            at = (placed.x, placed.y) if placed is not None else (table.x, table.y)
            density = station_densities(polygons, *at)
        heights = prepare_heights(
            table,
            self.raw_station_heights(parameters, context, table),
            height_datum,
            dem_datum,
            self.given_geoid(parameters, context, table),
            placed,
            feedback,
            declared_units=self.parameterAsEnum(parameters, self.HEIGHT_UNITS, context),
        )
        normal_formula = NORMAL_FORMULAS[self.parameterAsEnum(parameters, self.NORMAL_GRAVITY, context)]
        height_formula = HEIGHT_FORMULAS[self.parameterAsEnum(parameters, self.HEIGHT_CORRECTION, context)]
        atmospheric = self.parameterAsBoolean(parameters, self.ATMOSPHERIC, context)
        curvature = self.parameterAsBoolean(parameters, self.CURVATURE, context)
        orthometric = self.parameterAsBoolean(parameters, self.ORTHOMETRIC_REDUCTION, context)
        inner = self.parameterAsDouble(parameters, self.INNER_RADIUS, context)
        outer = self.parameterAsDouble(parameters, self.OUTER_RADIUS, context)

        steps.setCurrentStep(1)
        engine_columns = {}
        if tc_field:
            tc_total = table.field_values(tc_field, missing_code="no_tc")
        elif placed is not None:
            terrain = compute_terrain(
                table,
                heights.in_dem_datum,
                placed,
                regional,
                inner_radius=inner,
                outer_radius=outer,
                density=density,
                innermost_tc=None,
                water_density=None,
                method=EXACT,
                context=context,
                feedback=steps,
                polygons=polygons,
            )
            tc_total = terrain["tc_total"]
            engine_columns = {
                "tc_inner": terrain["tc_inner"],
                "tc_outer": terrain["tc_outer"],
                "dem_diff": terrain["dem_diff"],
                "tc_cover": terrain["coverage"],
            }
            engine_columns.update({k: terrain[k] for k in terrain if k in ENGINE_EXTRA_FIELDS})
            flag_mismatches(table, terrain["dem_diff"], heights, placed, height_datum, dem_datum, feedback)
            warn_partial_coverage(terrain["coverage"], outer, regional is not None, feedback)
        else:
            tc_total = np.full(len(table), np.nan)
            feedback.pushWarning(
                self.tr("No terrain-correction field and no elevation raster: cba is left empty.")
            )

        steps.setCurrentStep(2)
        reduction_heights = heights.orthometric if orthometric else heights.ellipsoidal
        if orthometric and not np.isfinite(reduction_heights).any() and np.isfinite(heights.ellipsoidal).any():
            raise QgsProcessingException(
                self.tr("Orthometric reduction needs geoid heights: PROJ's EGM96 grid or a geoid field/raster.")
            )
        with warnings.catch_warnings(record=True):
            warnings.simplefilter("always")
            reduced = reduce_gravity(
                observed,
                table.latitude,
                reduction_heights,
                density=density,
                terrain_correction=tc_total,
                normal_formula=normal_formula,
                height_formula=height_formula,
                atmospheric=atmospheric,
                curvature=curvature,
            )
        columns = {k: reduced[k] for k in RESULT_FIELDS if k not in ("tc_inner", "tc_outer")}
        columns.update(engine_columns)
        uncertainty = self._uncertainty(
            parameters, context, table, placed, heights, reduction_heights, density, reduced,
            engine_columns.get("tc_trunc"), inner,
            {"normal_formula": normal_formula, "height_formula": height_formula,
             "atmospheric": atmospheric, "curvature": curvature},
        )
        columns.update(uncertainty)
        added = [(name, QVariant.Double) for name in (*RESULT_FIELDS, "dem_diff", "tc_cover")]
        added += [(name, QVariant.Double) for name in engine_columns if name not in dict(added)]
        added += [(name, QVariant.Double) for name in uncertainty]
        added += [("qc_flag", QVariant.String), ("qc_note", QVariant.String)]
        sink, dest_id, fields, indices = self.station_sink(parameters, context, source, added, feedback)
        write_stations(sink, table, fields, indices, columns, steps)
        del sink

        faa_ok = np.isfinite(reduced["faa"])
        flagged = sum(1 for f in table.flags if f)
        feedback.pushInfo(
            self.tr("{} stations: {} with a free-air anomaly, {} with a complete Bouguer anomaly, {} flagged.").format(
                len(table), int(faa_ok.sum()), int(np.isfinite(reduced["cba"]).sum()), flagged
            )
        )
        density_field = self.first_field(parameters, self.DENSITY_FIELD, context)
        settings = {
            "normal_gravity": normal_formula,
            "height_correction": height_formula,
            "atmospheric_correction": atmospheric,
            "curvature_correction": curvature,
            "bouguer_model": "spherical cap to 166.7 km" if curvature else "infinite slab",
            "gravity_units": GRAVITY_UNITS[units],
            "density_kg_m3": float(self.parameterAsDouble(parameters, self.DENSITY, context)),
            "density_field": density_field,
            "gravitational_constant": GRAVITATIONAL_CONSTANT,
            "height_datum": HEIGHT_DATUM_KEYS[height_datum],
            "dem_datum": DEM_DATUM_KEYS[dem_datum],
            "reduction_heights": "orthometric (legacy)" if orthometric else "ellipsoidal (Hinze et al. 2005)",
            "terrain_correction": (
                "field " + tc_field if tc_field else ("exact engine" if placed is not None else "none")
            ),
            "inner_radius_m": inner,
            "outer_radius_m": outer,
            "dem_files": [
                p
                for p in (
                    placed.raster.path if placed else None,
                    raster_path(regional) if regional and placed else None,
                )
                if p
            ],
            "geoid": geoid_description(height_datum, dem_datum),
            "uncertainty": uncertainty_settings(self, parameters, context),
        }
        results = {
            self.OUTPUT: dest_id,
            self.STATIONS_REDUCED: int(faa_ok.sum()),
            self.STATIONS_FLAGGED: flagged,
        }
        return results, settings

    def _density_polygons(self, parameters, context, source, table, placed, feedback):
        """Geology polygons of DENSITY_LAYER in the DEM's CRS (the stations' without a DEM), or None."""
        from qgis.core import QgsCoordinateReferenceSystem

        if is_unset(parameters.get("DENSITY_LAYER")):
            return None
        if self.first_field(parameters, self.DENSITY_FIELD, context):
            raise QgsProcessingException(
                self.tr(
                    "Give densities either per station (DENSITY_FIELD) or from a geology layer (DENSITY_LAYER), "
                    "not both."
                )
            )
        crs = QgsCoordinateReferenceSystem.fromWkt(placed.raster.crs_wkt) if placed is not None else source.sourceCrs()
        default = self.parameterAsDouble(parameters, self.DENSITY, context)
        return read_density_layer(self, parameters, context, default, crs, feedback)

    def _uncertainty(self, parameters, context, table, placed, heights, reduction_heights, density, reduced,
                     truncation, inner, options):
        """``tc_sigma``, ``cba_sigma`` and their components (docs/uncertainty.md)."""
        grid = None
        x = y = None
        if placed is not None and not self.first_field(parameters, self.TC_FIELD, context):
            grid = placed.raster.elevation_grid()
            x, y = placed.x, placed.y
        return uncertainty_columns(
            self, parameters, context, table,
            grid=grid, x=x, y=y,
            heights_in_dem=heights.in_dem_datum,
            heights_reduced=reduction_heights,
            density=density,
            reduced=reduced,
            truncation=truncation,
            reduction_options=options,
            radius=inner,
        )

    def _observed_gravity(self, table, gravity_field, units):
        return observed_gravity_mgal(table, gravity_field, units)

    def _densities(self, parameters, context, table, feedback):
        density = self.parameterAsDouble(parameters, self.DENSITY, context)
        names = self.parameterAsFields(parameters, self.DENSITY_FIELD, context)
        values = np.full(len(table), density)
        if names:
            scale = 1000.0 if self.parameterAsEnum(parameters, self.DENSITY_FIELD_UNITS, context) == 1 else 1.0
            per_station = table.field_values(names[0], scale)
            missing = ~np.isfinite(per_station)
            table.flag_where(missing, "density_default")
            low, high = DENSITY_LIMITS
            bad = ~missing & ((per_station < low) | (per_station > high))
            given = int((~missing).sum())
            if given and bad.sum() * 2 > given:
                problem = density_sentence(float(np.median(per_station[~missing])), "DENSITY_FIELD " + names[0])
                raise QgsProcessingException(
                    problem + " " + self.tr("Check DENSITY_FIELD_UNITS (kg/m³ or g/cm³).")
                )
            table.flag_where(bad, "density_bad")
            values = np.where(missing, density, np.where(bad, np.nan, per_station))
        low, high = PLAUSIBLE_DENSITY
        odd = np.isfinite(values) & ((values < low) | (values > high))
        if np.any(odd):
            feedback.pushWarning(
                self.tr(
                    "{} station(s) have a reduction density outside {}-{} kg/m³ (e.g. {}); check the units."
                ).format(int(odd.sum()), low, high, float(values[odd][0]))
            )
            table.flag_where(odd, "density_unusual")
        return values
