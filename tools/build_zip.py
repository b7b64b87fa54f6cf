# SPDX-License-Identifier: GPL-2.0-or-later
"""Build the installable plugin zip: one top folder ``relief_gravity``.

Only what QGIS needs goes in: no tests, benchmarks, demo generator output,
caches or development files. Usage: ``python3 tools/build_zip.py [dist/]``.
"""

from __future__ import annotations

import subprocess
import sys
import zipfile
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
INCLUDED_TOP = (
    "__init__.py", "metadata.txt", "LICENSE", "README.md", "algorithms", "plugin", "icons", "i18n", "batch", "docs",
)
EXCLUDED_SUFFIXES = (".pyc", ".pro", ".ts")
EXCLUDED_PARTS = {"__pycache__", "tests", ".pytest_cache"}


def tracked_files() -> list[Path]:
    """Files under version control (so stray local files never ship)."""
    out = subprocess.run(["git", "ls-files"], cwd=ROOT, check=True, capture_output=True, text=True).stdout
    return [ROOT / line for line in out.splitlines() if line]


def plugin_files() -> list[Path]:
    """Tracked files that belong in the plugin zip, plus the compiled translations."""
    files = []
    for path in tracked_files():
        relative = path.relative_to(ROOT)
        if relative.parts[0] not in INCLUDED_TOP:
            continue
        if EXCLUDED_PARTS.intersection(relative.parts) or path.suffix in EXCLUDED_SUFFIXES:
            continue
        files.append(path)
    # Compiled translations are build products, shipped although not all tracked.
    files += [p for p in (ROOT / "i18n").glob("*.qm") if p not in files]
    return sorted(set(files))


def build(destination: Path) -> Path:
    """Write ``relief_gravity-<version>.zip`` into ``destination`` and return its path."""
    destination.mkdir(parents=True, exist_ok=True)
    version = "0"
    for line in (ROOT / "metadata.txt").read_text().splitlines():
        if line.startswith("version="):
            version = line.split("=", 1)[1].strip()
    target = destination / f"relief_gravity-{version}.zip"
    with zipfile.ZipFile(target, "w", zipfile.ZIP_DEFLATED) as archive:
        for path in plugin_files():
            archive.write(path, "relief_gravity/" + path.relative_to(ROOT).as_posix())
    return target


if __name__ == "__main__":
    print(build(Path(sys.argv[1]) if len(sys.argv) > 1 else ROOT / "dist"))
