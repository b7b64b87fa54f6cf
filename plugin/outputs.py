# SPDX-License-Identifier: GPL-2.0-or-later
"""Outputs written safely: never over an input, never left half-written.

A file output is written into a hidden temporary folder beside its
destination (same file system) under its final name, and moved into place
only when the run succeeds; on failure or cancel the folder is removed, so
no partial file is left behind. Destinations that are not files (memory
layers, databases) are passed through unchanged.
"""

from __future__ import annotations

import os
import shutil
import tempfile
from pathlib import Path

from qgis.core import QgsProcessingException, QgsProcessingOutputLayerDefinition, QgsProperty
from qgis.PyQt.QtCore import QCoreApplication


def _tr(text: str) -> str:
    return QCoreApplication.translate("SafeOutputs", text)


def file_of(source: str | None) -> str | None:
    """File path of a layer source ('a.gpkg|layername=x' -> 'a.gpkg'), or None."""
    if not source:
        return None
    text = str(source).split("|")[0].strip()
    temporary = ("memory:", "postgres:", "ogr:", "spatialite:", "TEMPORARY_OUTPUT")
    if not text or text.startswith(temporary) or "://" in text:
        return None
    return text


def same_file(a: str | None, b: str | None) -> bool:
    """True when two paths name the same file (after resolving links)."""
    if not a or not b:
        return False
    try:
        return os.path.realpath(a) == os.path.realpath(b) or (
            os.path.exists(a) and os.path.exists(b) and os.path.samefile(a, b)
        )
    except OSError:
        return False


def refuse_overwriting_inputs(outputs: dict, inputs: dict) -> None:
    """Stop when an output names an input file or another output.

    ``outputs`` and ``inputs`` map a label (for the sentence) to a path or None.
    """
    items = [(label, file_of(path)) for label, path in outputs.items()]
    for label, path in items:
        for input_label, input_path in inputs.items():
            if same_file(path, file_of(input_path)):
                raise QgsProcessingException(
                    _tr(
                        "The {} would be written to {}, which is the {}: writing it would destroy "
                        "that input. Choose another file name."
                    ).format(label, path, input_label)
                )
    for i, (label, path) in enumerate(items):
        for other_label, other in items[i + 1 :]:
            if same_file(path, other):
                raise QgsProcessingException(
                    _tr("The {} and the {} are both set to {}; choose two different files.").format(
                        label, other_label, path
                    )
                )


class StagedOutput:
    """One destination parameter written under a temporary folder, moved on success.

    Use ``parameters`` (a copy pointing the destination at the staged path)
    when creating the sink or writing the file, then ``finish(dest_id)``;
    call ``discard()`` on any failure.
    """

    def __init__(self, algorithm, parameters: dict, key: str, context, label: str):
        self.key = key
        self.context = context
        self.parameters = dict(parameters)
        self.final = None
        self.folder = None
        self.staged = None
        value = parameters.get(key)
        if value is None:
            return
        path = file_of(algorithm.parameterAsOutputLayer(parameters, key, context))
        if path is None:
            return
        self.final = path
        folder = Path(path).resolve().parent
        if not folder.is_dir():
            raise QgsProcessingException(
                _tr("The folder {} of the {} does not exist; create it or choose another.").format(folder, label)
            )
        if not os.access(folder, os.W_OK | os.X_OK):
            raise QgsProcessingException(
                _tr("The folder {} of the {} is not writable; choose a folder you may write to.").format(
                    folder, label
                )
            )
        try:
            self.folder = tempfile.mkdtemp(prefix=".relief_gravity_partial_", dir=str(folder))
        except OSError as error:
            raise QgsProcessingException(
                _tr("Cannot write in the folder {} of the {}: {}").format(folder, label, error)
            ) from error
        self.staged = str(Path(self.folder) / Path(path).name)
        if isinstance(value, QgsProcessingOutputLayerDefinition):
            definition = QgsProcessingOutputLayerDefinition(self.staged, value.destinationProject)
            definition.destinationName = value.destinationName
            definition.createOptions = value.createOptions
        else:
            definition = QgsProcessingOutputLayerDefinition(QgsProperty.fromValue(self.staged))
        self.parameters[key] = definition

    @property
    def target(self) -> str | None:
        """Path to write to directly (rasters written with GDAL), None when not a file."""
        return self.staged

    def finish(self, dest_id):
        """Move the staged files into place; return the final destination id."""
        if self.staged is None:
            return dest_id
        staged_stem = Path(self.staged).stem
        final = Path(self.final)
        try:
            for item in Path(self.folder).iterdir():
                if item.name == Path(self.staged).name or item.name.startswith(staged_stem + "."):
                    os.replace(item, final.parent / (final.stem + item.name[len(staged_stem):]))
        except OSError as error:
            self.discard()
            raise QgsProcessingException(
                _tr("Could not move the finished output into place at {}: {}").format(final, error)
            ) from error
        self.discard()
        new_id = str(dest_id).replace(self.staged, str(final)) if dest_id else str(final)
        layers = self.context.layersToLoadOnCompletion()
        if dest_id in layers:
            details = layers.pop(dest_id)
            layers[new_id] = details
            self.context.setLayersToLoadOnCompletion(layers)
        return new_id

    def discard(self) -> None:
        """Remove the temporary folder and anything written in it."""
        if self.folder and os.path.isdir(self.folder):
            shutil.rmtree(self.folder, ignore_errors=True)
        self.folder = None


def layer_source(algorithm, parameters, key, context, raster: bool = False) -> str | None:
    """File behind a layer parameter (None when unset or not a file)."""
    if parameters.get(key) is None:
        return None
    layer = (
        algorithm.parameterAsRasterLayer(parameters, key, context)
        if raster
        else algorithm.parameterAsVectorLayer(parameters, key, context)
    )
    if layer is None:
        value = parameters.get(key)
        return file_of(value) if isinstance(value, str) else None
    return file_of(layer.source())
