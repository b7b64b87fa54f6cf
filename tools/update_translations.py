# SPDX-License-Identifier: GPL-2.0-or-later
"""Regenerate the Qt translation sources from the code, then compile them.

Extracts every user-facing string: ``self.tr("...")`` (context = enclosing
class, as QGIS looks it up), ``QCoreApplication.translate("Context", "...")``
and calls of a module's ``_tr("...")`` helper (context = the literal that
helper passes to ``translate``). pylupdate5 misses the last kind, hence this
extractor. Existing translations in ``i18n/relief_gravity_<ll>.ts`` are kept;
new strings are marked unfinished; strings gone from the code are dropped.
Then ``lrelease`` builds the ``.qm`` files QGIS loads.

Usage: ``python3 tools/update_translations.py [--check]``; ``--check`` only
reports whether the .ts files are up to date (exit 1 if not).
"""

from __future__ import annotations

import ast
import subprocess
import sys
import xml.etree.ElementTree as ET
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
LANGUAGES = ("de",)
SCANNED = ("plugin",)


def _literal(node):
    if isinstance(node, ast.Constant) and isinstance(node.value, str):
        return node.value
    return None


def _helper_context(tree) -> str | None:
    """Context literal used by a module-level ``_tr`` helper, if any."""
    for node in tree.body:
        if isinstance(node, ast.FunctionDef) and node.name == "_tr":
            for call in ast.walk(node):
                if isinstance(call, ast.Call) and getattr(call.func, "attr", "") == "translate" and call.args:
                    return _literal(call.args[0])
    return None


def extract(path: Path) -> list[tuple[str, str, int]]:
    """(context, source, line) of every translatable string in a file."""
    tree = ast.parse(path.read_text(encoding="utf-8"))
    helper = _helper_context(tree)
    found = []

    def visit(node, cls):
        for child in ast.iter_child_nodes(node):
            if isinstance(child, ast.ClassDef):
                visit(child, child.name)
                continue
            if isinstance(child, ast.Call):
                func = child.func
                if isinstance(func, ast.Attribute) and func.attr == "tr" and child.args and cls:
                    text = _literal(child.args[0])
                    if text is not None:
                        found.append((cls, text, child.lineno))
                elif isinstance(func, ast.Attribute) and func.attr == "translate" and len(child.args) >= 2:
                    context, text = _literal(child.args[0]), _literal(child.args[1])
                    if context and text is not None:
                        found.append((context, text, child.lineno))
                elif isinstance(func, ast.Name) and func.id == "_tr" and helper and child.args:
                    text = _literal(child.args[0])
                    if text is not None:
                        found.append((helper, text, child.lineno))
            visit(child, cls)

    visit(tree, None)
    return found


def all_strings() -> dict:
    """Translatable strings of the scanned folders: (context, text) -> [(file, line), ...]."""
    strings: dict[tuple[str, str], list] = {}
    for folder in SCANNED:
        for path in sorted((ROOT / folder).rglob("*.py")):
            for context, text, line in extract(path):
                strings.setdefault((context, text), []).append((path.relative_to(ROOT).as_posix(), line))
    return strings


def read_ts(path: Path) -> dict:
    """Finished translations of an existing ``.ts`` file: (context, text) -> translation."""
    if not path.exists():
        return {}
    known = {}
    for context in ET.parse(path).getroot().iter("context"):
        name = context.findtext("name")
        for message in context.iter("message"):
            translation = message.find("translation")
            if translation is not None and translation.text and translation.get("type") != "unfinished":
                known[(name, message.findtext("source"))] = translation.text
    return known


def write_ts(path: Path, language: str, strings: dict, known: dict) -> str:
    """The ``.ts`` XML text for ``language``, keeping the ``known`` translations."""
    root = ET.Element("TS", version="2.1", language=language)
    by_context: dict[str, list] = {}
    for (context, text), places in sorted(strings.items()):
        by_context.setdefault(context, []).append((text, places))
    for context, messages in by_context.items():
        ctx = ET.SubElement(root, "context")
        ET.SubElement(ctx, "name").text = context
        for text, places in messages:
            message = ET.SubElement(ctx, "message")
            for filename, line in places:
                ET.SubElement(message, "location", filename="../" + filename, line=str(line))
            ET.SubElement(message, "source").text = text
            translation = ET.SubElement(message, "translation")
            if (context, text) in known:
                translation.text = known[(context, text)]
            else:
                translation.set("type", "unfinished")
    ET.indent(root)
    return '<?xml version="1.0" encoding="utf-8"?>\n<!DOCTYPE TS>\n' + ET.tostring(root, encoding="unicode") + "\n"


def caution_string(strings: dict) -> None:
    """The caution text is translated through a constant; add its literal."""
    tree = ast.parse((ROOT / "plugin/toolbox/base.py").read_text())
    for node in tree.body:
        if isinstance(node, ast.Assign) and getattr(node.targets[0], "id", "") == "CAUTION":
            text = ast.literal_eval(node.value)
            strings.setdefault(("ReliefGravityAlgorithm", text), []).append(("plugin/toolbox/base.py", node.lineno))


def main(argv: list[str]) -> int:
    """Regenerate (or with ``--check`` only compare) the ``.ts`` files and compile them."""
    check = "--check" in argv
    strings = all_strings()
    caution_string(strings)
    stale = False
    for language in LANGUAGES:
        path = ROOT / "i18n" / f"relief_gravity_{language}.ts"
        known = read_ts(path)
        text = write_ts(path, language, strings, known)
        current = path.read_text(encoding="utf-8") if path.exists() else ""
        if text != current:
            stale = True
            if not check:
                path.write_text(text, encoding="utf-8")
        if not check:
            subprocess.run(["lrelease", "-silent", str(path)], check=True)
        done = sum(1 for key in strings if key in known)
        print(f"{path.name}: {len(strings)} strings, {done} translated")
    if check and stale:
        print("translation sources are out of date: run python3 tools/update_translations.py")
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
