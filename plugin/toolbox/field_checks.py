# SPDX-License-Identifier: GPL-2.0-or-later
"""Field validation shared by the algorithms (runs in checkParameterValues)."""

from __future__ import annotations

from qgis.PyQt.QtCore import QCoreApplication


def _tr(text: str) -> str:
    return QCoreApplication.translate("FieldChecks", text)


def check_numeric_fields(algorithm, source, parameters, context, labels: dict) -> str:
    """Sentence describing the first missing or non-numeric field, or ''."""
    if source is None:
        return ""
    fields = source.fields()
    for key, label in labels.items():
        names = algorithm.parameterAsFields(parameters, key, context)
        for name in names:
            index = fields.lookupField(name)
            if index < 0:
                return _tr(
                    "The station layer has no field named '{}' (chosen as the {} field). Available fields: {}."
                ).format(name, label, ", ".join(fields.names()))
            if not fields.at(index).isNumeric():
                return _tr("The field '{}' chosen as the {} field is not numeric (it is {}).").format(
                    name, label, fields.at(index).typeName()
                )
    return ""
