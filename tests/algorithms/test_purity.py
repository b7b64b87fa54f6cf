# SPDX-License-Identifier: GPL-2.0-or-later
"""algorithms/ stays pure: no QGIS, GDAL or Qt, and only relative package imports."""

import ast
from pathlib import Path

import pytest

ALGORITHMS_DIR = Path(__file__).resolve().parents[2] / "algorithms"
FORBIDDEN_ROOTS = {"qgis", "osgeo", "PyQt5", "PyQt6", "sip"}
PACKAGE = "relief_gravity"


def import_problems(source: str, filename: str = "<source>") -> list:
    """List the forbidden imports in Python ``source`` as readable strings."""
    problems = []
    for node in ast.walk(ast.parse(source, filename=filename)):
        if isinstance(node, ast.Import):
            modules = [alias.name for alias in node.names]
        elif isinstance(node, ast.ImportFrom) and node.level == 0 and node.module:
            modules = [node.module]
        else:
            continue
        for module in modules:
            root = module.split(".")[0]
            if root in FORBIDDEN_ROOTS:
                problems.append(f"{filename}:{node.lineno}: imports {module} (algorithms/ must not need QGIS/GDAL/Qt)")
            elif root == PACKAGE:
                problems.append(f"{filename}:{node.lineno}: absolute import of {module} (use a relative import)")
    return problems


def _python_files():
    return sorted(ALGORITHMS_DIR.rglob("*.py"))


def test_there_is_something_to_check():
    names = {path.name for path in _python_files()}
    assert {"__init__.py", "constants.py", "_normal_gravity.py", "_corrections.py", "_reduction.py"} <= names


@pytest.mark.parametrize("path", _python_files(), ids=lambda p: str(p.relative_to(ALGORITHMS_DIR)))
def test_module_is_pure(path):
    problems = import_problems(path.read_text(encoding="utf-8"), str(path.relative_to(ALGORITHMS_DIR)))
    assert not problems, "\n".join(problems)


@pytest.mark.parametrize(
    "source",
    [
        "import qgis",
        "from qgis.core import QgsProject",
        "import qgis.core as qc",
        "from osgeo import gdal",
        "import numpy, PyQt5.QtCore",
        "from PyQt6 import QtWidgets",
        "import sip",
        "def f():\n    from qgis import processing\n",
        "from relief_gravity.algorithms import constants",
        "import relief_gravity.algorithms.constants",
    ],
)
def test_checker_catches_forbidden_imports(source):
    assert import_problems(source)


@pytest.mark.parametrize(
    "source",
    [
        "import numpy as np",
        "from scipy import integrate",
        "from .constants import G",
        "from ..constants import G",
        "import qgisx",
    ],
)
def test_checker_accepts_allowed_imports(source):
    assert not import_problems(source)
