# SPDX-License-Identifier: GPL-2.0-or-later
"""The plugin object QGIS creates through ``classFactory``."""

from __future__ import annotations

from pathlib import Path

from qgis.core import QgsApplication
from qgis.PyQt.QtCore import QCoreApplication, QTranslator

from .provider import ReliefGravityProvider

PLUGIN_DIR = Path(__file__).resolve().parent.parent


def translation_file(locale: str) -> Path:
    """Compiled translation for a locale such as ``de_DE`` (may not exist)."""
    return PLUGIN_DIR / "i18n" / f"relief_gravity_{locale[:2]}.qm"


class ReliefGravityPlugin:
    """Registers the Processing provider; works with ``iface=None`` (qgis_process)."""

    def __init__(self, iface):
        self.iface = iface
        self.provider = None
        self.translator = None
        # The translator must be installed before the provider builds its
        # algorithms, because parameter labels are translated in initAlgorithm.
        self._install_translator()

    def _install_translator(self) -> None:
        locale = QgsApplication.locale() or "en"
        path = translation_file(locale)
        if path.exists():
            translator = QTranslator()
            if translator.load(str(path)):
                QCoreApplication.installTranslator(translator)
                self.translator = translator

    def initProcessing(self):  # noqa: N802 - QGIS API
        """Register the provider once; called by qgis_process and by initGui."""
        if self.provider is None:
            provider = ReliefGravityProvider()
            # The registry refuses a second provider with the same id (and
            # deletes it): keep a reference only to one it accepted.
            if QgsApplication.processingRegistry().addProvider(provider):
                self.provider = provider

    def initGui(self):  # noqa: N802 - QGIS API
        self.initProcessing()

    def unload(self):
        if self.provider is not None:
            QgsApplication.processingRegistry().removeProvider(self.provider)
            self.provider = None
        if self.translator is not None:
            QCoreApplication.removeTranslator(self.translator)
            self.translator = None
