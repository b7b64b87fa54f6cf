# SPDX-License-Identifier: GPL-2.0-or-later
"""The Graphical Modeler models shipped in ``plugin/models``, listed as algorithms of the provider.

Each ``plugin/models/<stem>.model3`` becomes ``reliefgravity:<stem>`` under the
group "Models" of the Relief Gravity provider, so it is found in the toolbox
and runs by id through ``processing.run`` and ``qgis_process.bin run``. The
toolbox shows the model's own name (``displayName``). A model file that cannot
be read, whose file name is not a valid algorithm name, or that uses an
algorithm that is not installed is skipped with a warning in the message log
(tab "Relief Gravity"); the provider's other algorithms load regardless.
"""

from __future__ import annotations

import re
from collections.abc import Iterable
from pathlib import Path
from typing import Callable

from qgis.core import Qgis, QgsApplication, QgsMessageLog, QgsProcessingModelAlgorithm
from qgis.PyQt.QtCore import QCoreApplication

#: Folder of the shipped ``.model3`` files.
MODELS_DIR = Path(__file__).resolve().parent / "models"
#: File stems usable as algorithm names (the part after ``reliefgravity:``).
VALID_NAME = re.compile(r"^[a-z][a-z0-9_]*$")
LOG_TAG = "Relief Gravity"


def _tr(text: str) -> str:
    return QCoreApplication.translate("ShippedModel", text)


class ShippedModel(QgsProcessingModelAlgorithm):
    """A model read from a shipped file, named after the file (``reliefgravity:<stem>``)."""

    def __init__(self, path):
        super().__init__()
        self._path = Path(path)
        if not self.reload():
            msg = f"{self._path.name} is not a readable Processing model file"
            raise ValueError(msg)

    def reload(self) -> bool:
        """Read the file again; children attach to the algorithms registered now, and the outputs follow."""
        if not self.fromFile(str(self._path)):
            return False
        self.setSourceFilePath(str(self._path))
        return True

    def name(self):
        return self._path.stem

    def groupId(self):  # noqa: N802 - QGIS API
        return "models"

    def group(self):
        return _tr("Models")

    def createInstance(self):  # noqa: N802 - QGIS API
        # Read again from the file: the children are attached to the algorithms
        # registered by then (while the provider loads, its own algorithms are
        # not yet in the registry).
        return ShippedModel(self._path)


def load_models(
    available: Callable[[str], bool], taken: Iterable[str] = (), folder: Path | None = None
) -> tuple[list[ShippedModel], list[str]]:
    """Models of ``folder`` (default :data:`MODELS_DIR`) whose children all exist, and one warning per skipped file.

    ``available(algorithm_id)`` says whether a child algorithm is installed;
    ``taken`` holds algorithm names already used by the provider.
    """
    folder = MODELS_DIR if folder is None else Path(folder)
    models, warnings = [], []
    names = set(taken)
    for path in sorted(folder.glob("*.model3")):
        if not VALID_NAME.match(path.stem):
            warnings.append(_tr("Model {} skipped: its file name must be lower-case letters, digits and "
                                "underscores to serve as an algorithm name.").format(path.name))
            continue
        if path.stem in names:
            warnings.append(_tr("Model {} skipped: an algorithm named {} exists already.").format(path.name, path.stem))
            continue
        try:
            model = ShippedModel(path)
        except ValueError:
            warnings.append(
                _tr("Model {} skipped: the file could not be read as a Processing model.").format(path.name)
            )
            continue
        missing = sorted({child.algorithmId() for child in model.childAlgorithms().values()
                          if not available(child.algorithmId())})
        if missing:
            warnings.append(_tr("Model {} skipped: it needs {}, which is not installed.").format(
                path.name, ", ".join(missing)))
            continue
        names.add(path.stem)
        models.append(model)
    return models, warnings


def add_shipped_models(provider, folder: Path | None = None) -> list[str]:
    """Add the loadable models to ``provider`` (inside its ``loadAlgorithms``); log and return the warnings."""
    own = {algorithm.id() for algorithm in provider.algorithms()}
    prefix = provider.id() + ":"
    registry = QgsApplication.processingRegistry()

    def available(algorithm_id: str) -> bool:
        return algorithm_id in own or registry.algorithmById(algorithm_id) is not None

    taken = [a[len(prefix):] for a in own if a.startswith(prefix)]
    models, warnings = load_models(available, taken, folder)
    for model in models:
        provider.addAlgorithm(model)
    for warning in warnings:
        QgsMessageLog.logMessage(warning, LOG_TAG, Qgis.Warning)
    if models and registry.providerById(provider.id()) is None:
        _reload_once_registered(provider.id(), models)
    return warnings


def _reload_once_registered(provider_id: str, models: list[ShippedModel]) -> None:
    """Re-read ``models`` when the provider joins the registry.

    While the registry loads a provider, the provider's own algorithms are not
    yet found by id, so a model read then has no child algorithms attached and
    therefore no outputs (``qgis_process.bin help`` and the toolbox would list
    none). The instances that run are read afresh (``createInstance``); this
    fixes the listed ones.
    """
    registry = QgsApplication.processingRegistry()

    def reload(added_id):
        if added_id != provider_id:
            return
        registry.providerAdded.disconnect(reload)
        for model in models:
            try:
                model.reload()
            except RuntimeError:  # the provider was refreshed meanwhile: its models are gone
                return

    registry.providerAdded.connect(reload)
