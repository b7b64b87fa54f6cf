# SPDX-License-Identifier: GPL-2.0-or-later
"""Shared base of the Relief Gravity Processing algorithms."""

from __future__ import annotations

import traceback
from pathlib import Path

from qgis.core import QgsProcessingAlgorithm
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QIcon

from ...algorithms.constants import BOUGUER_CAP_RADIUS, DEFAULT_REDUCTION_DENSITY, FOOT

ICON = Path(__file__).resolve().parent.parent.parent / "icons" / "relief_gravity.svg"

#: Text every report and help page carries (README.md, "Caution").
CAUTION = (
    "Results support interpretation only. Check every reduction against the "
    "survey's own ties and specifications; decisions on drilling, groundwater or "
    "engineering, and reporting under a jurisdiction's rules, are for licensed "
    "practice and local codes."
)


class ReliefGravityAlgorithm(QgsProcessingAlgorithm):
    """Common identity, translation and instance creation.

    Translatable strings live in the concrete classes: ``tr`` uses the
    concrete class name as the translation context, which is what pylupdate5
    records for ``self.tr`` calls written in that class.
    """

    def tr(self, text: str) -> str:
        return QCoreApplication.translate(type(self).__name__, text)

    def createInstance(self):  # noqa: N802 - QGIS API
        return type(self)()

    def icon(self):
        return QIcon(str(ICON))

    def groupId(self):  # noqa: N802 - QGIS API
        return "reduction"

    def group(self):
        return QCoreApplication.translate("ReliefGravityAlgorithm", "Gravity reduction")

    def caution(self) -> str:
        return QCoreApplication.translate("ReliefGravityAlgorithm", CAUTION)


#: International foot in metres.


def _tr(text: str) -> str:
    return QCoreApplication.translate("ReliefGravityAlgorithm", text)


def is_unset(value) -> bool:
    """True for an optional parameter left empty (None, NULL or '')."""
    from qgis.core import NULL

    return value is None or value == NULL or (isinstance(value, str) and not value.strip())


def density_sentence(value: float, setting: str) -> str:
    """Sentence for a density outside the limits (naming the likely unit slip), or ''."""
    from ...algorithms.plausibility import DENSITY_LIMITS, density_problem

    problem = density_problem(value)
    if problem is None:
        return ""
    low, high = DENSITY_LIMITS
    if problem.factor == 1000.0:
        return _tr(
            "A density of {:g} kg/m³ ({}) looks like g/cm³: densities must lie between {:g} and {:g} "
            "kg/m³; enter {:g} for {:g} g/cm³."
        ).format(value, setting, low, high, value * 1000.0, value)
    if problem.factor == 0.001:
        return _tr(
            "A density of {:g} kg/m³ ({}) is 1,000 times too large (g/cm³ values multiplied twice, or "
            "g/m³?): densities must lie between {:g} and {:g} kg/m³; enter {:g}."
        ).format(value, setting, low, high, value / 1000.0)
    return _tr("A density of {:g} kg/m³ ({}) is outside the accepted range {:g}-{:g} kg/m³.").format(
        value, setting, low, high
    )


class StationAlgorithm(ReliefGravityAlgorithm):
    """Parameters and checks shared by the algorithms that add fields to stations.

    Strings here use the explicit context ``ReliefGravityAlgorithm`` so they
    are extracted and looked up under one name whatever the subclass.
    """

    INPUT = "INPUT"
    HEIGHT_FIELD = "HEIGHT_FIELD"
    HEIGHT_UNITS = "HEIGHT_UNITS"
    DEM = "DEM"
    REGIONAL_DEM = "REGIONAL_DEM"
    DENSITY = "DENSITY"
    INNER_RADIUS = "INNER_RADIUS"
    OUTER_RADIUS = "OUTER_RADIUS"
    HEIGHT_DATUM = "HEIGHT_DATUM"
    DEM_DATUM = "DEM_DATUM"
    GEOID_FIELD = "GEOID_FIELD"
    GEOID_RASTER = "GEOID_RASTER"
    OUTPUT = "OUTPUT"

    #: Default inner zone radius, m: the outer edge of Hammer's zone F,
    #: 2 936 ft (Hammer 1939, table 1), where national databases split inner
    #: and outer corrections (see docs/datums.md for the sources checked).
    DEFAULT_INNER_RADIUS = 895.0

    def add_stations_parameter(self) -> None:
        from qgis.core import QgsProcessing, QgsProcessingParameterFeatureSource

        self.addParameter(
            QgsProcessingParameterFeatureSource(self.INPUT, _tr("Gravity stations"), [QgsProcessing.TypeVectorPoint])
        )

    def add_height_units_parameter(self) -> None:
        from qgis.core import QgsProcessingParameterEnum

        self.addParameter(
            QgsProcessingParameterEnum(
                self.HEIGHT_UNITS,
                _tr("Height units"),
                options=[_tr("Metres"), _tr("Feet"), _tr("Centimetres")],
                defaultValue=0,
            )
        )

    def add_datum_parameters(self) -> None:
        """HEIGHT_DATUM, GEOID_FIELD, GEOID_RASTER and DEM_DATUM (docs/datums.md)."""
        from qgis.core import (
            QgsProcessingParameterEnum,
            QgsProcessingParameterField,
            QgsProcessingParameterRasterLayer,
        )

        from ..heights import dem_datum_names, height_datum_names

        self.addParameter(
            QgsProcessingParameterEnum(
                self.HEIGHT_DATUM, _tr("Station heights are"), options=height_datum_names(), defaultValue=0
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.GEOID_FIELD,
                _tr("Geoid height field (m, geoid above the ellipsoid)"),
                parentLayerParameterName=self.INPUT,
                type=QgsProcessingParameterField.Numeric,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterRasterLayer(
                self.GEOID_RASTER, _tr("Geoid height raster (m, geoid above the ellipsoid)"), optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.DEM_DATUM, _tr("Elevation raster heights are above"), options=dem_datum_names(), defaultValue=0
            )
        )

    def check_datums(self, parameters, context) -> str:
        """Sentence for an incomplete datum choice, or ''."""
        from ...algorithms.datums import STATION_GEOID_GIVEN

        height_datum = self.parameterAsEnum(parameters, self.HEIGHT_DATUM, context)
        field = self.parameterAsFields(parameters, self.GEOID_FIELD, context)
        raster = parameters.get(self.GEOID_RASTER)
        has_raster = not is_unset(raster)
        if height_datum == STATION_GEOID_GIVEN and bool(field) == has_raster:
            return _tr(
                "HEIGHT_DATUM says the geoid height comes from a field or a raster: choose exactly one "
                "of GEOID_FIELD and GEOID_RASTER."
            )
        if height_datum != STATION_GEOID_GIVEN and (field or has_raster):
            return _tr(
                "A geoid height field or raster is given but HEIGHT_DATUM does not use it: set HEIGHT_DATUM "
                "to 'orthometric, geoid height from GEOID_FIELD or GEOID_RASTER', or clear them."
            )
        return ""

    def given_geoid(self, parameters, context, table):
        """The user's geoid heights at the stations (m), or None."""
        from ..geoid import check_geoid_values
        from ..raster_io import open_elevation
        from ..terrain_run import station_positions_on

        field = self.first_field(parameters, self.GEOID_FIELD, context)
        if field:
            values = table.field_values(field)
            check_geoid_values(values, _tr("the field {}").format(field))
            return values
        layer = self.parameterAsRasterLayer(parameters, self.GEOID_RASTER, context)
        if layer is None:
            return None
        raster = open_elevation(layer)
        x, y = station_positions_on(raster, table, context)
        values = raster.sample_bilinear(x, y)
        check_geoid_values(values, _tr("the raster {}").format(layer.name()))
        return values

    def add_density_parameter(self) -> None:
        from qgis.core import QgsProcessingParameterNumber

        self.addParameter(
            QgsProcessingParameterNumber(
                self.DENSITY,
                _tr("Reduction density (kg/m³)"),
                type=QgsProcessingParameterNumber.Double,
                defaultValue=DEFAULT_REDUCTION_DENSITY,
            )
        )

    def add_zone_parameters(self, advanced: bool) -> None:
        """Regional raster and zone radii (advanced in the reduction dialog)."""
        from qgis.core import (
            QgsProcessingParameterDefinition,
            QgsProcessingParameterNumber,
            QgsProcessingParameterRasterLayer,
        )

        definitions = [
            QgsProcessingParameterRasterLayer(
                self.REGIONAL_DEM, _tr("Regional elevation raster for the outer zone"), optional=True
            )
        ]
        for key, label, default in (
            (self.INNER_RADIUS, _tr("Inner zone radius (m)"), self.DEFAULT_INNER_RADIUS),
            (self.OUTER_RADIUS, _tr("Outer zone radius (m)"), BOUGUER_CAP_RADIUS),
        ):
            definitions.append(
                QgsProcessingParameterNumber(
                    key, label, type=QgsProcessingParameterNumber.Double, defaultValue=default, minValue=0.0
                )
            )
        for definition in definitions:
            if advanced:
                definition.setFlags(definition.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
            self.addParameter(definition)

    def check_density_and_radii(self, parameters, context) -> str:
        """Sentence describing an impossible density or radius pair, or ''."""
        density = self.parameterAsDouble(parameters, self.DENSITY, context)
        problem = density_sentence(density, "DENSITY")
        if problem:
            return problem
        inner = self.parameterAsDouble(parameters, self.INNER_RADIUS, context)
        outer = self.parameterAsDouble(parameters, self.OUTER_RADIUS, context)
        if not 0 < inner < outer:
            return _tr(
                "The inner zone radius ({} m) must be positive and smaller than the outer zone radius ({} m)."
            ).format(inner, outer)
        return ""

    def first_field(self, parameters, key, context):
        """The field chosen for an optional single-field parameter, or None."""
        names = self.parameterAsFields(parameters, key, context)
        return names[0] if names else None

    def read_input_stations(self, parameters, context, feedback):
        """Source, a three-step feedback and the station table of ``INPUT``."""
        from qgis.core import QgsProcessingException, QgsProcessingMultiStepFeedback

        from ..stations import check_point_layer, read_stations

        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        check_point_layer(source)
        steps = QgsProcessingMultiStepFeedback(3, feedback)
        if feedback.isCanceled():
            # A cancel made before the multi-step feedback existed is not forwarded to it.
            steps.cancel()
        return source, steps, read_stations(source, context, steps)

    def raw_station_heights(self, parameters, context, table):
        """Heights in metres from ``HEIGHT_FIELD`` (in ``HEIGHT_UNITS``), None when no field."""
        height_field = self.first_field(parameters, self.HEIGHT_FIELD, context)
        if not height_field:
            return None
        scale = (1.0, FOOT, 0.01)[self.parameterAsEnum(parameters, self.HEIGHT_UNITS, context)]
        return table.field_values(height_field, scale, missing_code="no_height")

    def station_sink(self, parameters, context, source, added, feedback):
        """Output sink: input fields plus ``added``; returns sink, id, fields, indices."""
        from qgis.core import QgsProcessingException

        from ..stations import output_fields

        fields, indices, reused = output_fields(source.fields(), added)
        for name in reused:
            feedback.pushWarning(
                _tr("The input already has a field {}; its values are replaced in the output copy.").format(name)
            )
        sink, dest_id = self.parameterAsSink(
            parameters, self.OUTPUT, context, fields, source.wkbType(), source.sourceCrs()
        )
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        return sink, dest_id, fields, indices

    # --- safe output and provenance ------------------------------------------------

    def stage_station_output(self, parameters, context):
        """Refuse an output over an input; stage the output in a temporary folder."""
        from ..outputs import StagedOutput, layer_source, refuse_overwriting_inputs

        inputs = {_tr("station layer"): layer_source(self, parameters, self.INPUT, context)}
        for key, label in (
            (self.DEM, _tr("elevation raster")),
            (self.REGIONAL_DEM, _tr("regional elevation raster")),
            (self.GEOID_RASTER, _tr("geoid raster")),
        ):
            inputs[label] = layer_source(self, parameters, key, context, raster=True)
        label = _tr("output station layer")
        refuse_overwriting_inputs({label: self.parameterAsOutputLayer(parameters, self.OUTPUT, context)}, inputs)
        return StagedOutput(self, parameters, self.OUTPUT, context, label)

    def run_staged(self, parameters, context, feedback, work):
        """Run ``work(parameters, context, feedback) -> (results, settings)`` on a staged output.

        The output moves into place only on success; its provenance is then recorded.
        """
        from qgis.core import QgsProcessingException

        from ..outputs import layer_source

        staged = self.stage_station_output(parameters, context)
        try:
            results, settings = work(staged.parameters, context, feedback)
            if feedback.isCanceled():
                raise QgsProcessingException(_tr("Cancelled by the user."))
            results[self.OUTPUT] = staged.finish(results[self.OUTPUT])
        except BaseException as error:
            staged.discard()
            # The traceback keeps the work's frames, and with them QGIS objects
            # (feature sources, feedbacks) that would then outlive the QGIS
            # application and crash the interpreter at exit: let them go now.
            traceback.clear_frames(error.__traceback__)
            raise
        record_provenance(
            self.id() or "reliefgravity:" + self.name(),
            results[self.OUTPUT],
            parameters,
            layer_source(self, parameters, self.INPUT, context),
            settings,
            feedback,
        )
        return results


def plain_parameters(parameters: dict) -> dict:
    """Parameters as JSON-able values (layers by source, destinations by path)."""
    from qgis.core import QgsMapLayer, QgsProcessingFeatureSourceDefinition, QgsProcessingOutputLayerDefinition

    out = {}
    for key, value in parameters.items():
        if isinstance(value, QgsProcessingOutputLayerDefinition):
            value = value.sink.staticValue()
        elif isinstance(value, QgsProcessingFeatureSourceDefinition):
            value = value.source.staticValue()
        elif isinstance(value, QgsMapLayer):
            value = value.source()
        out[key] = value
    return out


def record_provenance(algorithm_id, output, parameters, input_source, settings, feedback) -> None:
    """Write the chained provenance record into a GeoPackage or GeoTIFF output."""
    from .. import provenance
    from ..outputs import file_of

    path = file_of(output)
    if not path or not path.lower().endswith((".gpkg", ".tif", ".tiff")):
        feedback.pushInfo(
            _tr("Provenance is recorded in GeoPackage and GeoTIFF outputs only; this output has none.")
        )
        return
    previous = provenance.read_record(input_source) if input_source else None
    step = provenance.make_step(algorithm_id, plain_parameters(parameters), settings)
    try:
        provenance.write_record(str(output), provenance.chained(previous, step))
    except (OSError, RuntimeError) as error:
        feedback.pushWarning(_tr("The provenance record could not be written: {}").format(error))
