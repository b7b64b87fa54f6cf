# SPDX-License-Identifier: GPL-2.0-or-later
"""Doctests of the pure helpers behind the map caption, the colour bar and the report."""

from __future__ import annotations

import doctest
import importlib

import pytest


@pytest.mark.parametrize(
    "module",
    ["relief_gravity.plugin.run_facts", "relief_gravity.plugin.colour_bar",
     "relief_gravity.plugin.report.html", "relief_gravity.plugin.report.plots"],
)
def test_doctests(module):
    result = doctest.testmod(importlib.import_module(module))
    assert result.attempted > 0 and result.failed == 0
