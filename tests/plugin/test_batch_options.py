# SPDX-License-Identifier: GPL-2.0-or-later
"""The batch runner's option tables match the Processing algorithms' parameters.

A parameter added to ``reliefgravity:terraincorrection`` or
``reliefgravity:bouguerreduction`` without a batch option (or with another
default, choice count or optionality) fails here.
"""

from __future__ import annotations

import pytest

from relief_gravity.batch.options import COMMANDS, build_parser

KINDS = {
    "source": "QgsProcessingParameterFeatureSource",
    "sink": "QgsProcessingParameterFeatureSink",
    "field": "QgsProcessingParameterField",
    "raster": "QgsProcessingParameterRasterLayer",
    "number": "QgsProcessingParameterNumber",
    "enum": "QgsProcessingParameterEnum",
    "bool": "QgsProcessingParameterBoolean",
    "string": "QgsProcessingParameterString",
    "polygons": "QgsProcessingParameterFeatureSource",
}


def _definitions(algorithm_id):
    from qgis.core import QgsApplication

    algorithm = QgsApplication.processingRegistry().algorithmById(algorithm_id)
    assert algorithm is not None
    return {d.name(): d for d in algorithm.parameterDefinitions()}


@pytest.mark.parametrize("command", list(COMMANDS))
def test_every_parameter_has_an_option_of_the_same_kind(provider, command):
    from qgis.core import QgsProcessingParameterDefinition

    algorithm_id, params = COMMANDS[command]
    definitions = _definitions(algorithm_id)
    assert sorted(definitions) == sorted(p.name for p in params), "a parameter without a batch option (or the reverse)"
    for p in params:
        d = definitions[p.name]
        assert type(d).__name__ == KINDS[p.kind], p.name
        optional = bool(d.flags() & QgsProcessingParameterDefinition.FlagOptional)
        if p.kind in ("field", "raster", "source", "polygons"):
            assert optional == p.optional, p.name
        if p.kind == "enum":
            assert len(d.options()) == len(p.words), p.name
            assert d.defaultValue() == p.default, p.name
        if p.kind in ("bool", "number", "string"):
            assert d.defaultValue() == p.default, p.name
        if p.kind == "number":
            assert optional == p.optional, p.name
            if p.minimum is not None:
                assert d.minimum() == p.minimum, p.name
            else:
                assert d.minimum() < -1e300, p.name
            assert d.maximum() == (p.maximum if p.maximum is not None else d.maximum()), p.name
            if p.maximum is None:
                assert d.maximum() > 1e300, p.name


@pytest.mark.parametrize("command", list(COMMANDS))
def test_option_names_follow_the_parameter_names(command):
    parser = build_parser()
    sub = parser._subparsers._group_actions[0].choices[command]
    options = {o for action in sub._actions for o in action.option_strings}
    for p in COMMANDS[command][1]:
        expected = {"INPUT": "--stations", "OUTPUT": "--output"}.get(p.name, "--" + p.name.lower().replace("_", "-"))
        assert expected in options
    assert {"--layer", "--workers", "--scheduler", "--chunk-size"} <= options
