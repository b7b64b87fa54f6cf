# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:densityestimate``: the reduction density from the data.

The science (Parasnis regression, Nettleton correlation, bootstrap,
cautions) is in ``algorithms.density``; this module reads the stations, runs
the terrain engine once at unit density, and writes the figure.
"""

from __future__ import annotations

import math
import warnings

import numpy as np
from qgis.core import (
    QgsCoordinateTransform,
    QgsFeatureRequest,
    QgsGeometry,
    QgsPointXY,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterDistance,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterFileDestination,
    QgsProcessingParameterRasterLayer,
)

from ...algorithms import reduce_gravity
from ...algorithms.density import (
    correlation_curve,
    density_cautions,
    nettleton_density,
    parasnis_density,
    regional_design,
    remove_regional,
    split_consistency,
    unit_bouguer_term,
)
from ..heights import check_dem_values, prepare_heights
from ..raster_io import raster_path
from ..station_areas import inside_any, read_area_polygons
from ..terrain_run import EXACT, compute_terrain, place_stations
from .base import StationAlgorithm, is_unset
from .bouguer_reduction import HEIGHT_FORMULAS, NORMAL_FORMULAS, gravity_unit_names, observed_gravity_mgal
from .field_checks import check_numeric_fields

PARASNIS, NETTLETON = 0, 1
TRENDS = ("none", "planar", "quadratic")
#: Metres per degree used only to give a geographic DEM's coordinates metres
#: for the regional term (spherical approximation, common practice, no source).
METRES_PER_DEGREE = 111_195.0


def terrain_per_unit_density(table, heights, placed, regional_layer, inner, outer, context, feedback) -> np.ndarray:
    """Terrain correction of every station at 1 kg/m^3 (mGal per kg/m^3).

    The only call into the terrain engine: the correction is linear in
    density, so one run at unit density serves every trial density.
    """
    terrain = compute_terrain(
        table, heights, placed, regional_layer,
        inner_radius=inner, outer_radius=outer, density=np.ones(len(heights)),
        innermost_tc=None, water_density=None, method=EXACT, context=context, feedback=feedback,
    )
    return np.asarray(terrain["tc_total"], dtype=float)


class DensityEstimateAlgorithm(StationAlgorithm):
    """Reduction density from the stations (Parasnis 1952 or Nettleton 1939)."""

    GRAVITY_FIELD = "GRAVITY_FIELD"
    GRAVITY_UNITS = "GRAVITY_UNITS"
    NORMAL_GRAVITY = "NORMAL_GRAVITY"
    HEIGHT_CORRECTION = "HEIGHT_CORRECTION"
    ATMOSPHERIC = "ATMOSPHERIC"
    CURVATURE = "CURVATURE"
    METHOD = "METHOD"
    REGIONAL_TREND = "REGIONAL_TREND"
    PROFILES = "PROFILES"
    BUFFER = "BUFFER"
    EXCLUDE_AREAS = "EXCLUDE_AREAS"
    PLOT = "PLOT"
    DENSITY_LOW = "DENSITY_LOW"
    DENSITY_HIGH = "DENSITY_HIGH"
    STATIONS_USED = "STATIONS_USED"

    def name(self):
        return "densityestimate"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Reduction density from the data (Parasnis, Nettleton)")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Estimates the Bouguer reduction density from the stations, with a 95 % interval and a figure.")

    def tags(self):
        return self.tr("gravity,density,bouguer,Parasnis,Nettleton,regression,correlation,bootstrap").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Estimates the reduction density (kg/m³) from the stations themselves. The slab, "
            "curvature and terrain terms are computed once at 1 kg/m³ with the same standard and "
            "terrain engine as the Bouguer reduction (they are linear in density): "
            "B = slab + curvature - terrain correction per kg/m³, and the Bouguer anomaly at "
            "density ρ is faa - ρB.</p>"
            "<p><b>Parasnis (1952)</b>: least-squares regression faa = ρB + regional term; the "
            "interval is the Student-t interval of the slope.</p>"
            "<p><b>Nettleton (1939)</b>: the density whose Bouguer anomaly is uncorrelated with "
            "the station heights, over the whole survey or, with a <b>profile line layer</b>, "
            "within a <b>buffer</b> of each line (pooled over the lines); the interval is a "
            "bootstrap over stations (2000 resamples, seeded).</p>"
            "<p><b>Regional term</b> (both methods): none, planar (default) or quadratic in the "
            "coordinates, fitted with the density so that a regional gradient does not leak into "
            "it.</p>"
            "<p><b>Areas left out</b> (optional polygons): stations inside them are left out of the "
            "fit, e.g. those on mapped valley fill or on a mapped intrusion, whose density is not the "
            "one being estimated.</p>"
            "<p>Outputs DENSITY, DENSITY_LOW and DENSITY_HIGH (95 %) can feed the reduction's "
            "density in a model; PLOT is a PNG of the fit. The log warns when the relief is too "
            "small, when relief and regional trend cannot be told apart, and when low and high "
            "stations disagree (geology that follows the topography biases both methods).</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.add_stations_parameter()
        self.addParameter(
            QgsProcessingParameterField(
                self.GRAVITY_FIELD, self.tr("Observed gravity field (mGal)"),
                parentLayerParameterName=self.INPUT, type=QgsProcessingParameterField.Numeric,
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
                self.tr("Station height field (above the ellipsoid; empty = sample the elevation raster)"),
                parentLayerParameterName=self.INPUT, type=QgsProcessingParameterField.Numeric, optional=True,
            )
        )
        self.add_height_units_parameter()
        self.add_datum_parameters()
        self.addParameter(QgsProcessingParameterRasterLayer(self.DEM, self.tr("Elevation raster (DEM, metres)")))
        self.addParameter(
            QgsProcessingParameterEnum(
                self.METHOD,
                self.tr("Method"),
                options=[
                    self.tr("Parasnis (1952) regression"),
                    self.tr("Nettleton (1939) least correlation with topography"),
                ],
                defaultValue=PARASNIS,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.REGIONAL_TREND,
                self.tr("Regional term fitted with the density"),
                options=[self.tr("None (constant)"), self.tr("Planar"), self.tr("Quadratic")],
                defaultValue=1,
            )
        )
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.PROFILES,
                self.tr("Profile lines (Nettleton; empty = whole survey)"),
                [QgsProcessing.TypeVectorLine],
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterDistance(
                self.BUFFER,
                self.tr("Buffer around the profile lines"),
                defaultValue=250.0,
                parentParameterName=self.INPUT,
                minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.EXCLUDE_AREAS,
                self.tr("Areas whose stations are left out (e.g. mapped valley fill; optional)"),
                [QgsProcessing.TypeVectorPolygon],
                optional=True,
            )
        )
        self.add_standard_parameters()
        self.add_zone_parameters(advanced=True)
        self.addParameter(
            QgsProcessingParameterFileDestination(
                self.PLOT,
                self.tr("Figure of the estimate"),
                self.tr("PNG files (*.png)"),
                optional=True,
                createByDefault=True,
            )
        )
        self.addOutput(QgsProcessingOutputNumber(self.DENSITY, self.tr("Estimated density (kg/m³)")))
        self.addOutput(QgsProcessingOutputNumber(self.DENSITY_LOW, self.tr("Lower bound of the 95 % interval (kg/m³)")))
        self.addOutput(
            QgsProcessingOutputNumber(self.DENSITY_HIGH, self.tr("Upper bound of the 95 % interval (kg/m³)"))
        )
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_USED, self.tr("Stations used")))

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
            {self.GRAVITY_FIELD: self.tr("observed gravity"), self.HEIGHT_FIELD: self.tr("station height")},
        )
        if problem:
            return False, problem
        inner = self.parameterAsDouble(parameters, self.INNER_RADIUS, context)
        outer = self.parameterAsDouble(parameters, self.OUTER_RADIUS, context)
        if not 0 < inner < outer:
            return False, self.tr(
                "The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m)."
            ).format(inner, outer)
        has_profiles = not is_unset(parameters.get(self.PROFILES))
        if has_profiles and self.parameterAsEnum(parameters, self.METHOD, context) != NETTLETON:
            return False, self.tr(
                "Profile lines are used by Nettleton's method only: choose it, or leave the profiles empty."
            )
        if has_profiles and not self.parameterAsDouble(parameters, self.BUFFER, context) > 0:
            return False, self.tr("The buffer around the profile lines must be more than 0.")
        return True, ""

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        source, steps, table = self.read_input_stations(parameters, context, feedback)
        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        if dem is None:
            raise QgsProcessingException(self.invalidRasterError(parameters, self.DEM))
        placed = place_stations(dem, table, context)
        check_dem_values(placed.raster.path, self.tr("elevation raster"))
        regional = self.parameterAsRasterLayer(parameters, self.REGIONAL_DEM, context)
        if regional is not None:
            check_dem_values(raster_path(regional), self.tr("regional elevation raster"))
        observed = observed_gravity_mgal(
            table,
            self.first_field(parameters, self.GRAVITY_FIELD, context),
            self.parameterAsEnum(parameters, self.GRAVITY_UNITS, context),
        )
        prepared = prepare_heights(
            table,
            self.raw_station_heights(parameters, context, table),
            self.parameterAsEnum(parameters, self.HEIGHT_DATUM, context),
            self.parameterAsEnum(parameters, self.DEM_DATUM, context),
            self.given_geoid(parameters, context, table),
            placed,
            feedback,
            declared_units=self.parameterAsEnum(parameters, self.HEIGHT_UNITS, context),
        )
        # The reduction's standard takes ellipsoidal heights (Hinze et al.
        # 2005); the terrain engine compares station and DEM in the DEM's datum.
        heights = prepared.ellipsoidal
        curvature = self.parameterAsBoolean(parameters, self.CURVATURE, context)
        steps.setCurrentStep(1)
        tc_unit = terrain_per_unit_density(
            table,
            prepared.in_dem_datum,
            placed,
            regional,
            self.parameterAsDouble(parameters, self.INNER_RADIUS, context),
            self.parameterAsDouble(parameters, self.OUTER_RADIUS, context),
            context,
            steps,
        )
        steps.setCurrentStep(2)
        with warnings.catch_warnings(record=True):
            warnings.simplefilter("always")
            faa = reduce_gravity(
                observed,
                table.latitude,
                heights,
                normal_formula=NORMAL_FORMULAS[self.parameterAsEnum(parameters, self.NORMAL_GRAVITY, context)],
                height_formula=HEIGHT_FORMULAS[self.parameterAsEnum(parameters, self.HEIGHT_CORRECTION, context)],
                atmospheric=self.parameterAsBoolean(parameters, self.ATMOSPHERIC, context),
                curvature=curvature,
            )["faa"]
        unit = unit_bouguer_term(heights, tc_unit, curvature)
        x, y = self._metric_coordinates(placed)
        method = self.parameterAsEnum(parameters, self.METHOD, context)
        trend = TRENDS[self.parameterAsEnum(parameters, self.REGIONAL_TREND, context)]
        groups, distance = self._profile_groups(parameters, context, source, table, feedback)
        usable = np.isfinite(faa) & np.isfinite(unit) & np.isfinite(x) & np.isfinite(y) & np.isfinite(heights)
        if groups is not None:
            usable &= groups >= 0
        excluded = self._excluded(parameters, context, source, table, feedback)
        usable &= ~excluded
        left_out = len(table) - int(usable.sum())
        if left_out:
            feedback.pushInfo(
                self.tr(
                    "{} of {} stations left out (no anomaly, no terrain correction, outside the profile buffers "
                    "or inside the excluded areas)."
                ).format(left_out, len(table))
            )
        idx = np.flatnonzero(usable)
        g = groups[idx] if groups is not None else None
        if feedback.isCanceled():
            raise QgsProcessingException(self.tr("Cancelled by the user."))
        try:
            if method == PARASNIS:
                fit = parasnis_density(faa[idx], unit[idx], x[idx], y[idx], trend)
                how = self.tr(
                    "Parasnis regression, {} regional term; Student-t interval, {} degrees of freedom"
                ).format(trend, fit.degrees_of_freedom)
            else:
                fit = nettleton_density(faa[idx], unit[idx], heights[idx], x[idx], y[idx], groups=g, regional=trend)
                how = self.tr(
                    "Nettleton correlation, {} regional term, {} group(s); bootstrap percentile interval, {} resamples"
                ).format(trend, fit.n_groups, fit.resamples)
        except ValueError as error:
            raise QgsProcessingException(self.tr("No density can be estimated: {}").format(error)) from error
        self._report_cautions(feedback, faa[idx], unit[idx], heights[idx], x[idx], y[idx], g, trend, fit)
        feedback.pushInfo(
            self.tr("Density {:.0f} kg/m³, 95 % interval {:.0f} to {:.0f} kg/m³ from {} stations ({}).").format(
                fit.density, fit.low, fit.high, fit.n_stations, how
            )
        )
        results = {
            self.DENSITY: float(fit.density),
            self.DENSITY_LOW: float(fit.low),
            self.DENSITY_HIGH: float(fit.high),
            self.STATIONS_USED: int(fit.n_stations),
        }
        plot_path = (
            None if is_unset(parameters.get(self.PLOT)) else self.parameterAsFileOutput(parameters, self.PLOT, context)
        )
        if plot_path:
            steps.setCurrentStep(2)
            self._plot(
                plot_path,
                method,
                fit,
                faa[idx],
                unit[idx],
                heights[idx],
                x[idx],
                y[idx],
                g,
                None if distance is None else distance[idx],
                trend,
            )
            results[self.PLOT] = plot_path
        steps.setProgress(100)
        return results

    def _metric_coordinates(self, placed):
        """Station coordinates in metres for the regional term (DEM CRS)."""
        if not placed.raster.geographic:
            return placed.x, placed.y
        lat0 = math.radians(float(np.nanmean(placed.y)))
        return placed.x * METRES_PER_DEGREE * math.cos(lat0), placed.y * METRES_PER_DEGREE

    def _excluded(self, parameters, context, source, table, feedback) -> np.ndarray:
        """True for the stations inside EXCLUDE_AREAS (all False when the parameter is unset)."""
        if is_unset(parameters.get(self.EXCLUDE_AREAS)):
            return np.zeros(len(table), dtype=bool)
        areas = self.parameterAsSource(parameters, self.EXCLUDE_AREAS, context)
        if areas is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.EXCLUDE_AREAS))
        polygons = read_area_polygons(areas, source.sourceCrs(), context.transformContext(), self.EXCLUDE_AREAS)
        inside = inside_any(polygons, np.asarray(table.x, float), np.asarray(table.y, float))
        if inside.all():
            raise QgsProcessingException(
                self.tr("Every station lies inside EXCLUDE_AREAS: no station is left to estimate the density from.")
            )
        feedback.pushInfo(
            self.tr("{} of {} stations lie inside EXCLUDE_AREAS and are left out of the fit.").format(
                int(inside.sum()), len(table)
            )
        )
        return inside

    def _profile_groups(self, parameters, context, source, table, feedback):
        """Profile index of each station (-1 outside every buffer) and distance along it, or (None, None)."""
        if is_unset(parameters.get(self.PROFILES)):
            return None, None
        lines = self.parameterAsSource(parameters, self.PROFILES, context)
        if lines is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.PROFILES))
        crs = source.sourceCrs()
        if crs.isGeographic():
            raise QgsProcessingException(
                self.tr("Profile buffers need stations in a projected CRS (metres); reproject the station layer first.")
            )
        buffer = self.parameterAsDouble(parameters, self.BUFFER, context)
        transform = QgsCoordinateTransform(lines.sourceCrs(), crs, context.transformContext())
        geometries = []
        for feature in lines.getFeatures(QgsFeatureRequest()):
            geometry = QgsGeometry(feature.geometry())
            if geometry.isNull() or geometry.isEmpty():
                continue
            geometry.transform(transform)
            geometries.append(geometry)
        if not geometries:
            raise QgsProcessingException(self.tr("The profile layer has no line."))
        groups = np.full(len(table), -1, dtype=int)
        distance = np.full(len(table), np.nan)
        for i, (px, py) in enumerate(zip(table.x, table.y)):
            if not (np.isfinite(px) and np.isfinite(py)):
                continue
            point = QgsGeometry.fromPointXY(QgsPointXY(float(px), float(py)))
            gaps = [line.distance(point) for line in geometries]
            nearest = int(np.argmin(gaps))
            if gaps[nearest] <= buffer:
                groups[i] = nearest
                distance[i] = geometries[nearest].lineLocatePoint(point)
        counts = np.bincount(groups[groups >= 0], minlength=len(geometries))
        feedback.pushInfo(
            self.tr("Stations within {:g} of each profile line: {}.").format(
                buffer, ", ".join(str(int(c)) for c in counts)
            )
        )
        return groups, distance

    def _report_cautions(self, feedback, faa, unit, heights, x, y, groups, trend, fit):
        if groups is None:
            relief = remove_regional(heights, regional_design(x, y, trend))
        else:
            relief = np.concatenate(
                [
                    remove_regional(heights[groups == k], regional_design(x[groups == k], y[groups == k], trend))
                    for k in np.unique(groups)
                ]
            )
        shared = getattr(fit, "relief_shared", None)
        if shared is None:
            shared = parasnis_density(faa, unit, x, y, trend).relief_shared if len(faa) > 8 else 0.0
        low, high, gap = split_consistency(faa, unit, x, y, trend)
        cautions = density_cautions(float(np.std(relief)), (fit.high - fit.low) / 2.0, shared, low, high, gap)
        for code, sentence in cautions:
            feedback.pushWarning(f"{self.tr(sentence)} [{code}]")
        if not cautions:
            feedback.pushInfo(
                self.tr(
                    "Relief {:.0f} m (standard deviation after the regional term); low and high stations agree."
                ).format(float(np.std(relief)))
            )

    def _plot(self, path, method, fit, faa, unit, heights, x, y, groups, distance, trend):
        from ..density_plot import nettleton_plot, parasnis_plot

        if method == PARASNIS:
            design = regional_design(x, y, trend)
            coefficients = np.linalg.lstsq(np.column_stack([unit, design]), faa, rcond=None)[0]
            faa_left = faa - design @ coefficients[1:]
            parasnis_plot(
                path,
                unit,
                faa_left,
                fit,
                {
                    "stations": self.tr("stations"),
                    "fit": self.tr("fit: {:.0f} kg/m³").format(fit.density),
                    "low": self.tr("95 % interval"),
                    "high": "_",
                    "x": self.tr("Bouguer and terrain term per unit density (mGal per g/cm³)"),
                    "y": self.tr("Free-air anomaly minus regional term (mGal)"),
                    "title": self.tr("Parasnis: {:.0f} kg/m³ ({:.0f} to {:.0f})").format(
                        fit.density, fit.low, fit.high
                    ),
                },
            )
            return
        trials = np.arange(max(1000.0, fit.density - 800.0), fit.density + 800.0, 10.0)
        curve = correlation_curve(faa, unit, heights, x, y, trials, groups, trend)
        step = max(100.0, round((fit.high - fit.low) / 100.0) * 100.0)
        shown = [fit.density - 2 * step, fit.density - step, fit.density, fit.density + step, fit.density + 2 * step]
        if groups is None:
            design = regional_design(x, y, trend)
            profile = {
                "distance": None,
                "height": heights,
                "faa": remove_regional(faa, design),
                "unit": remove_regional(unit, design),
                "xlabel": self.tr("Station height (m)"),
                "title": self.tr("Bouguer anomaly against height"),
            }
        else:
            biggest = np.bincount(groups).argmax()
            rows = groups == biggest
            design = regional_design(x[rows], y[rows], trend)
            profile = {
                "distance": distance[rows],
                "height": heights[rows],
                "faa": remove_regional(faa[rows], design),
                "unit": remove_regional(unit[rows], design),
                "xlabel": self.tr("Distance along the profile (m)"),
                "title": self.tr("Profile {} ({} stations)").format(int(biggest) + 1, int(rows.sum())),
            }
        profile["trials"] = shown
        nettleton_plot(
            path,
            trials,
            curve,
            fit,
            profile,
            {
                "interval": self.tr("95 % interval"),
                "estimate": self.tr("estimate {:.0f} kg/m³").format(fit.density),
                "density": self.tr("Trial density (kg/m³)"),
                "correlation": self.tr("Correlation with height"),
                "title_left": self.tr("Nettleton: {:.0f} kg/m³ ({:.0f} to {:.0f})").format(
                    fit.density, fit.low, fit.high
                ),
                "at": self.tr("{:.0f} kg/m³"),
                "anomaly": self.tr("Bouguer anomaly minus regional, centred (mGal)"),
                "height": self.tr("Height (m)"),
            },
        )
