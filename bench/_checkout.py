# SPDX-License-Identifier: GPL-2.0-or-later
"""Import this checkout as ``relief_gravity`` whatever its folder is called (for the bench scripts)."""

from __future__ import annotations

import importlib.util
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]


def register_checkout() -> None:
    """Register the repository root as the package ``relief_gravity`` (once)."""
    if "relief_gravity" in sys.modules:
        return
    spec = importlib.util.spec_from_file_location(
        "relief_gravity", ROOT / "__init__.py", submodule_search_locations=[str(ROOT)]
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules["relief_gravity"] = module
    spec.loader.exec_module(module)
