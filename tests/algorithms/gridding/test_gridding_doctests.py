# SPDX-License-Identifier: GPL-2.0-or-later
"""Run the Examples of every gridding module (they are part of the docs)."""

from __future__ import annotations

import doctest
import importlib

import pytest

MODULES = ("_geometry", "_stations", "_system", "_solver", "_coarse", "_mincurv", "_spline", "_contours")


@pytest.mark.parametrize("name", MODULES)
def test_doctests(name):
    module = importlib.import_module(f"relief_gravity.algorithms.gridding.{name}")
    result = doctest.testmod(module, optionflags=doctest.NORMALIZE_WHITESPACE)
    assert result.attempted > 0, f"{name} has no Examples"
    assert result.failed == 0
