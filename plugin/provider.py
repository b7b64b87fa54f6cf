# SPDX-License-Identifier: GPL-2.0-or-later
"""The Processing provider ``reliefgravity``."""

from __future__ import annotations

from pathlib import Path

from qgis.core import QgsProcessingProvider
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QIcon

ICON = Path(__file__).resolve().parent.parent / "icons" / "relief_gravity.svg"


def _algorithm_classes():
    from .toolbox.anomaly_grid import AnomalyGridAlgorithm
    from .toolbox.bouguer_reduction import BouguerReductionAlgorithm
    from .toolbox.density_estimate import DensityEstimateAlgorithm
    from .toolbox.observed_gravity import ObservedGravityAlgorithm
    from .toolbox.regional_residual import RegionalResidualAlgorithm
    from .toolbox.survey_report import SurveyReportAlgorithm
    from .toolbox.terrain_correction import TerrainCorrectionAlgorithm

    return [
        ObservedGravityAlgorithm,
        BouguerReductionAlgorithm,
        TerrainCorrectionAlgorithm,
        AnomalyGridAlgorithm,
        DensityEstimateAlgorithm,
        RegionalResidualAlgorithm,
        SurveyReportAlgorithm,
    ]


class ReliefGravityProvider(QgsProcessingProvider):
    """Groups the Relief Gravity algorithms and shipped models in the toolbox."""

    def loadAlgorithms(self):  # noqa: N802 - QGIS API
        for algorithm_class in _algorithm_classes():
            self.addAlgorithm(algorithm_class())
        # The shipped Modeler models (plugin/models/*.model3) as reliefgravity:<file stem>;
        # one whose child algorithms are missing is skipped with a logged warning.
        from .shipped_models import add_shipped_models

        add_shipped_models(self)

    def id(self):
        return "reliefgravity"

    def name(self):
        return QCoreApplication.translate("ReliefGravityProvider", "Relief Gravity")

    def longName(self):  # noqa: N802 - QGIS API
        return QCoreApplication.translate(
            "ReliefGravityProvider", "Relief Gravity (land gravity reduction)"
        )

    def icon(self):
        return QIcon(str(ICON))

    def svgIconPath(self):  # noqa: N802 - QGIS API
        return str(ICON)
