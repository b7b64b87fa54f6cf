# SPDX-License-Identifier: GPL-2.0-or-later
"""Processing algorithm ``reliefgravity:terraincorrection``."""

from __future__ import annotations

import numpy as np
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsProcessing,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterDefinition,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterLayer,
    QgsProcessingParameterString,
)
from qgis.PyQt.QtCore import QVariant

from ..density_layer import add_parameters as add_density_layer_parameters
from ..density_layer import read_parameters as read_density_layer
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
from ..terrain_run import EXACT, RING_SECTOR, compute_terrain, place_stations
from .base import StationAlgorithm, is_unset
from .bouguer_reduction import ENGINE_EXTRA_FIELDS
from .field_checks import check_numeric_fields

HAMMER_ZONE_LETTERS = "BCDEFGHIJKLM"


class TerrainCorrectionAlgorithm(StationAlgorithm):
    """Terrain correction of gravity stations from elevation rasters."""

    INNERMOST_TC_FIELD = "INNERMOST_TC_FIELD"
    WATER_DENSITY = "WATER_DENSITY"
    METHOD = "METHOD"
    ZONE_FIELDS = "ZONE_FIELDS"
    ZONES = "ZONES"
    STATIONS_COMPUTED = "STATIONS_COMPUTED"
    STATIONS_FLAGGED = "STATIONS_FLAGGED"

    def name(self):
        return "terraincorrection"

    def displayName(self):  # noqa: N802 - QGIS API
        return self.tr("Terrain correction (inner and outer zones from elevation rasters)")

    def shortDescription(self):  # noqa: N802 - QGIS API
        return self.tr("Terrain correction of gravity stations to 166.7 km from a DEM, with Earth curvature.")

    def tags(self):
        return self.tr("gravity,terrain correction,inner zone,outer zone,Hammer zones,DEM,Bouguer").split(",")

    def shortHelpString(self):  # noqa: N802 - QGIS API
        return self.tr(
            "<p>Computes the terrain correction of every station (mGal, positive for "
            "relief above or below the station) and adds <b>tc_inner</b>, <b>tc_outer</b>, "
            "<b>tc_total</b>, <b>dem_diff</b> (station height minus DEM height, m: large "
            "values point to mislocated stations), <b>tc_cover</b> (fraction of the zone "
            "area covered by the rasters) and <b>qc_flag</b> to a copy of the layer.</p>"
            "<p>Exact engine (default): the innermost ring is modelled from the station "
            "height and the local DEM surface (or replaced by a field estimate); the inner "
            "zone to the inner radius uses exact prisms at full DEM resolution; the outer "
            "zone to the outer radius uses progressively coarser cells, then the regional "
            "raster beyond the fine one, with Earth curvature. Geographic (degree) rasters "
            "work: distances are on the ground.</p>"
            "<p>Ring-and-sector (Hammer 1939): the chosen contiguous zones out of B to M "
            "(2 m to 21.94 km, compartments lowered by the Earth-curvature drop; terrain beyond "
            "the last zone is not corrected, and "
            "the log says how far it reaches) with compartment mean heights from the DEM, and "
            "from the regional raster where the DEM has no data; zones narrower than a DEM "
            "cell hold the plane through the station with the DEM's slope. A zone counts to "
            "tc_inner when it ends within the inner zone radius; a zone the radius cuts is "
            "split there. For comparison with chart-based field practice; optionally one "
            "field per zone.</p>"
            "<p>Station heights come from the height field (the height difference is always "
            "taken from the station's own height) or, when empty, from the DEM.</p>"
            "<p><b>Datums</b>: station heights are converted to the DEM's datum before the "
            "comparison (HEIGHT_DATUM, DEM_DATUM; EGM96 from PROJ's egm96_15.gtx). Stations "
            "differing from the DEM beyond the local relief are flagged height_dem_mismatch, and "
            "the log names the setting when most differ by about the geoid height.</p>"
            "<p><b>Limits</b>: density 500-5000 kg/m³; inner radius above 0 and below the outer "
            "radius (default 895 m, the outer edge of Hammer zone F); a regional elevation raster "
            "reaching 166.7 km is needed for the standard correction. qc_flag holds codes, "
            "qc_note their meaning.</p>"
            "<p>{}</p>"
        ).format(self.caution())

    def initAlgorithm(self, config=None):  # noqa: N802 - QGIS API
        self.add_stations_parameter()
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
        self.addParameter(QgsProcessingParameterRasterLayer(self.DEM, self.tr("Elevation raster (DEM, metres)")))
        self.add_datum_parameters()
        self.add_zone_parameters(advanced=False)
        self.add_engine_check_parameter()
        self.add_density_parameter()
        add_density_layer_parameters(self)
        self.addParameter(
            QgsProcessingParameterField(
                self.INNERMOST_TC_FIELD,
                self.tr("Field-estimated innermost-ring correction (mGal)"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
                optional=True,
            )
        )
        water = QgsProcessingParameterNumber(
            self.WATER_DENSITY,
            self.tr("Treat cells below sea level as water of this density (kg/m³)"),
            type=QgsProcessingParameterNumber.Double,
            optional=True,
            minValue=0.0,
        )
        water.setFlags(water.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        self.addParameter(water)
        self.addParameter(
            QgsProcessingParameterEnum(
                self.METHOD,
                self.tr("Method"),
                options=[
                    self.tr("Exact engine (prisms, DEM-driven)"),
                    self.tr("Ring-and-sector (Hammer 1939 zones B-M)"),
                ],
                defaultValue=EXACT,
            )
        )
        zones = QgsProcessingParameterBoolean(
            self.ZONE_FIELDS, self.tr("Ring-and-sector: one field per Hammer zone"), defaultValue=False
        )
        zones.setFlags(zones.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        self.addParameter(zones)
        # --- ring-and-sector zone choice ---
        self.addParameter(
            QgsProcessingParameterString(
                self.ZONES,
                self.tr("Ring-and-sector: Hammer zones (contiguous letters out of B-M, or a range such as B-M)"),
                defaultValue=HAMMER_ZONE_LETTERS,
            )
        )
        # --- end ring-and-sector zone choice ---
        self.addParameter(
            QgsProcessingParameterFeatureSink(
                self.OUTPUT, self.tr("Stations with terrain correction"), QgsProcessing.TypeVectorPoint
            )
        )
        self.addOutput(QgsProcessingOutputNumber(self.STATIONS_COMPUTED, self.tr("Stations computed")))
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
                self.HEIGHT_FIELD: self.tr("station height"),
                self.INNERMOST_TC_FIELD: self.tr("innermost-ring correction"),
                self.GEOID_FIELD: self.tr("geoid height"),
            },
        )
        if problem:
            return False, problem
        problem = self.check_density_and_radii(parameters, context) or self.check_datums(parameters, context)
        if problem:
            return False, problem
        problem = self._zone_problem(parameters, context)
        if problem:
            return False, problem
        return True, ""

    # --- ring-and-sector zone choice ---
    def _zones(self, parameters, context):
        from ...algorithms.terrain import parse_zones

        return parse_zones(self.parameterAsString(parameters, self.ZONES, context) or HAMMER_ZONE_LETTERS)

    def _zone_problem(self, parameters, context) -> str:
        try:
            self._zones(parameters, context)
        except ValueError as error:
            return self.tr("Hammer zones: {}").format(error)
        return ""

    def _push_reach(self, zones, plane_zones: str, feedback) -> None:
        """Say in the log how far the ring-and-sector zones reach."""
        from ...algorithms.terrain import zone_label

        first, last = zones[0], zones[-1]
        if first.letter == "B":
            feedback.pushInfo(
                self.tr("Ring-and-sector zones {} reach {:.2f} km; terrain beyond is not corrected.").format(
                    zone_label(zones), last.outer / 1000.0
                )
            )
        else:
            feedback.pushInfo(
                self.tr(
                    "Ring-and-sector zones {} cover {:.1f} m to {:.2f} km; terrain nearer (except a field-estimated "
                    "innermost correction) and beyond is not corrected."
                ).format(zone_label(zones), first.inner, last.outer / 1000.0)
            )
        if plane_zones:
            feedback.pushInfo(
                self.tr(
                    "Zones {} are narrower than a DEM cell: they hold the plane through the station "
                    "with the DEM's slope there instead of DEM heights."
                ).format(", ".join(plane_zones))
            )

    # --- end ring-and-sector zone choice ---

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 - QGIS API
        return self.run_staged(parameters, context, feedback, self._correct)

    def _correct(self, parameters, context, feedback):
        from ...algorithms.constants import GRAVITATIONAL_CONSTANT

        dem = self.parameterAsRasterLayer(parameters, self.DEM, context)
        if dem is None:
            raise QgsProcessingException(self.invalidRasterError(parameters, self.DEM))
        regional = self.parameterAsRasterLayer(parameters, self.REGIONAL_DEM, context)
        source, steps, table = self.read_input_stations(parameters, context, feedback)
        placed = place_stations(dem, table, context)
        check_dem_values(placed.raster.path, self.tr("elevation raster"))
        if regional is not None:
            check_dem_values(raster_path(regional), self.tr("regional elevation raster"))
        height_datum = self.parameterAsEnum(parameters, self.HEIGHT_DATUM, context)
        dem_datum = self.parameterAsEnum(parameters, self.DEM_DATUM, context)
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
        innermost_name = self.first_field(parameters, self.INNERMOST_TC_FIELD, context)
        innermost = table.field_values(innermost_name) if innermost_name else None
        water_density = (
            None
            if is_unset(parameters.get(self.WATER_DENSITY))
            else self.parameterAsDouble(parameters, self.WATER_DENSITY, context)
        )
        method = self.parameterAsEnum(parameters, self.METHOD, context)
        density = self.parameterAsDouble(parameters, self.DENSITY, context)
        polygons = read_density_layer(
            self, parameters, context, density, QgsCoordinateReferenceSystem.fromWkt(placed.raster.crs_wkt), feedback
        )
        problem = self._zone_problem(parameters, context)
        if problem:
            raise QgsProcessingException(problem)
        zones = self._zones(parameters, context)
        inner = self.parameterAsDouble(parameters, self.INNER_RADIUS, context)
        outer = self.parameterAsDouble(parameters, self.OUTER_RADIUS, context)

        steps.setCurrentStep(1)
        result = compute_terrain(
            table,
            heights.in_dem_datum,
            placed,
            regional,
            inner_radius=inner,
            outer_radius=outer,
            density=np.full(len(table), density),
            innermost_tc=innermost,
            water_density=water_density,
            method=method,
            context=context,
            feedback=steps,
            zones="".join(z.letter for z in zones),
            polygons=polygons,
            numerical_check=self.parameterAsBoolean(parameters, self.ENGINE_CHECK, context),
        )
        if method == RING_SECTOR:
            self._push_reach(zones, result.get("plane_zones", ""), steps)
        columns = {k: result[k] for k in ("tc_inner", "tc_outer", "tc_total")}
        added = [(k, QVariant.Double) for k in columns]
        if method == EXACT:
            columns["dem_diff"] = result["dem_diff"]
            columns["tc_cover"] = result["coverage"]
            columns.update({k: result[k] for k in result if k in ENGINE_EXTRA_FIELDS})
            added += [(k, QVariant.Double) for k in columns if k not in dict(added)]
            flag_mismatches(table, result["dem_diff"], heights, placed, height_datum, dem_datum, feedback)
            warn_partial_coverage(result["coverage"], outer, regional is not None, feedback)
        elif self.parameterAsBoolean(parameters, self.ZONE_FIELDS, context):
            for letter in HAMMER_ZONE_LETTERS:
                if letter in result["zones"]:
                    name = "tc_" + letter.lower()
                    columns[name] = result["zones"][letter]
                    added.append((name, QVariant.Double))
        added += [("qc_flag", QVariant.String), ("qc_note", QVariant.String)]

        steps.setCurrentStep(2)
        sink, dest_id, fields, indices = self.station_sink(parameters, context, source, added, feedback)
        write_stations(sink, table, fields, indices, columns, steps)
        del sink
        computed = int(np.isfinite(result["tc_total"]).sum())
        flagged = sum(1 for f in table.flags if f)
        feedback.pushInfo(
            self.tr("{} stations: terrain correction computed for {}, {} flagged.").format(
                len(table), computed, flagged
            )
        )
        settings = {
            "method": "exact engine" if method == EXACT else "ring-and-sector (Hammer 1939)",
            "density_kg_m3": density,
            "water_density_kg_m3": water_density,
            "gravitational_constant": GRAVITATIONAL_CONSTANT,
            "inner_radius_m": inner,
            "outer_radius_m": outer,
            "height_datum": HEIGHT_DATUM_KEYS[height_datum],
            "dem_datum": DEM_DATUM_KEYS[dem_datum],
            "geoid": geoid_description(height_datum, dem_datum),
            "dem_files": [p for p in (placed.raster.path, raster_path(regional) if regional else None) if p],
            "innermost_field": innermost_name,
        }
        return {self.OUTPUT: dest_id, self.STATIONS_COMPUTED: computed, self.STATIONS_FLAGGED: flagged}, settings
