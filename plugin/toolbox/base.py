# SPDX-License-Identifier: GPL-2.0-or-later
"""Shared base of the Relief Gravity Processing algorithms."""

from __future__ import annotations

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
    OUTPUT = "OUTPUT"

    def add_stations_parameter(self) -> None:
        from qgis.core import QgsProcessing, QgsProcessingParameterFeatureSource

        self.addParameter(
            QgsProcessingParameterFeatureSource(self.INPUT, _tr("Gravity stations"), [QgsProcessing.TypeVectorPoint])
        )

    def add_height_units_parameter(self) -> None:
        from qgis.core import QgsProcessingParameterEnum

        self.addParameter(
            QgsProcessingParameterEnum(
                self.HEIGHT_UNITS, _tr("Height units"), options=[_tr("Metres"), _tr("Feet")], defaultValue=0
            )
        )

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
        from qgis.core import QgsProcessingParameterDefinition, QgsProcessingParameterNumber, QgsProcessingParameterRasterLayer

        definitions = [
            QgsProcessingParameterRasterLayer(
                self.REGIONAL_DEM, _tr("Regional elevation raster for the outer zone"), optional=True
            )
        ]
        for key, label, default in (
            (self.INNER_RADIUS, _tr("Inner zone radius (m)"), 2000.0),
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
        if not density > 0:
            return _tr("The reduction density must be positive (kg/m³); got {}.").format(density)
        if density < 20:
            return _tr("A reduction density of {} kg/m³ looks like g/cm³: enter 2670 for 2.67 g/cm³.").format(density)
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

        from ..stations import read_stations

        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        steps = QgsProcessingMultiStepFeedback(3, feedback)
        if feedback.isCanceled():
            # A cancel made before the multi-step feedback existed is not forwarded to it.
            steps.cancel()
        return source, steps, read_stations(source, context, steps)

    def station_heights(self, parameters, context, table, placed):
        """Heights in metres from ``HEIGHT_FIELD`` (in ``HEIGHT_UNITS``), else sampled
        from the DEM the stations were placed on."""
        from ..terrain_run import heights_from_dem

        height_field = self.first_field(parameters, self.HEIGHT_FIELD, context)
        if not height_field:
            return heights_from_dem(table, placed)
        feet = self.parameterAsEnum(parameters, self.HEIGHT_UNITS, context) == 1
        return table.field_values(height_field, FOOT if feet else 1.0, label=_tr("height"))

    def station_sink(self, parameters, context, source, added, feedback):
        """Output sink: input fields plus ``added``; returns sink, id, fields, indices."""
        from qgis.core import QgsProcessingException

        from ..stations import output_fields

        fields, indices, reused = output_fields(source.fields(), added)
        for name in reused:
            feedback.pushWarning(
                _tr("The input already has a field {}; its values are replaced in the output copy.").format(name)
            )
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, fields, source.wkbType(), source.sourceCrs())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        return sink, dest_id, fields, indices
