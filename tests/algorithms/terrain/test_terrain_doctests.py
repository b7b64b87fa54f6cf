# SPDX-License-Identifier: GPL-2.0-or-later
"""Run the Examples of every module of algorithms/terrain as doctests."""

from __future__ import annotations

import doctest
import importlib
import pkgutil

import pytest

import relief_gravity.algorithms.terrain as terrain

MODULES = sorted(m.name for m in pkgutil.iter_modules(terrain.__path__))


@pytest.mark.parametrize("name", MODULES)
def test_doctests(name):
    module = importlib.import_module(f"relief_gravity.algorithms.terrain.{name}")
    result = doctest.testmod(module, optionflags=doctest.ELLIPSIS | doctest.NORMALIZE_WHITESPACE)
    assert result.failed == 0
    if name != "__init__":
        assert result.attempted > 0, f"{name} has no Examples"
