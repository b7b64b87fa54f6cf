# SPDX-License-Identifier: GPL-2.0-or-later
"""Run the Examples doctest of every module under relief_gravity.algorithms."""

import doctest
import importlib
import pkgutil

import pytest

import relief_gravity.algorithms as algorithms

IMPORT_ERRORS = []


def _module_names():
    names = [algorithms.__name__]
    # walk_packages imports subpackages to recurse and would silently skip one
    # that fails to import; record those so that a test reports them.
    walker = pkgutil.walk_packages(algorithms.__path__, prefix=algorithms.__name__ + ".", onerror=IMPORT_ERRORS.append)
    for info in walker:
        names.append(info.name)
    return sorted(names)


MODULES = _module_names()


def test_every_subpackage_imports():
    assert not IMPORT_ERRORS, f"subpackages that failed to import: {IMPORT_ERRORS}"


def test_walk_finds_the_reduction_and_terrain_modules():
    # Guard against a walk that silently finds nothing.
    for name in ("_normal_gravity", "_corrections", "_reduction", "constants", "terrain"):
        assert f"relief_gravity.algorithms.{name}" in MODULES


@pytest.mark.parametrize("name", MODULES)
def test_module_doctests(name):
    module = importlib.import_module(name)
    # testmod looks only at objects defined in the module, not re-exports;
    # failures are printed (pytest shows them) and counted.
    result = doctest.testmod(module, optionflags=doctest.ELLIPSIS | doctest.NORMALIZE_WHITESPACE, report=True)
    assert result.failed == 0, f"{result.failed} of {result.attempted} doctest examples failed in {name}"


def test_reduction_modules_have_examples():
    # Every public function of the reduction modules carries a running example.
    for name in ("_normal_gravity", "_corrections", "_reduction"):
        module = importlib.import_module(f"relief_gravity.algorithms.{name}")
        tests = doctest.DocTestFinder(exclude_empty=True).find(module)
        documented = {test.name.rsplit(".", 1)[-1] for test in tests if test.examples}
        public = {
            attr
            for attr, value in vars(module).items()
            if callable(value) and not attr.startswith("_") and getattr(value, "__module__", "") == module.__name__
        }
        assert public, name
        assert public <= documented, f"{name}: no Examples in {sorted(public - documented)}"


def test_terrain_modules_have_examples():
    # Every module of algorithms/terrain carries at least one running example
    # (run above; this only guards against a module without any).
    names = [n for n in MODULES if n.startswith("relief_gravity.algorithms.terrain.")]
    assert names
    for name in names:
        tests = doctest.DocTestFinder(exclude_empty=True).find(importlib.import_module(name))
        assert any(t.examples for t in tests), f"{name} has no Examples"
