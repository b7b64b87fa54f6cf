# SPDX-License-Identifier: GPL-2.0-or-later
"""Shared base of the Relief Gravity Processing algorithms."""

from __future__ import annotations

from pathlib import Path

from qgis.core import QgsProcessingAlgorithm
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QIcon

ICON = Path(__file__).resolve().parent.parent.parent / "icons" / "relief_gravity.svg"

#: Text every report and help page carries (DESIGN.md, Cautions).
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
