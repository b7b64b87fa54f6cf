# SPDX-License-Identifier: GPL-2.0-or-later
"""The plugin as QGIS and the plugin repository see it: metadata, zip, i18n, load/unload."""

from __future__ import annotations

import configparser
import subprocess
import sys
import zipfile
from pathlib import Path

ROOT = Path(__file__).resolve().parents[2]

# Required metadata keys: QGIS plugin cookbook, plugins.rst (see docs/processing-practice.md).
REQUIRED = ("name", "qgisMinimumVersion", "description", "about", "version", "author", "email", "repository")


def test_metadata_has_every_required_key():
    parser = configparser.ConfigParser()
    parser.read(ROOT / "metadata.txt", encoding="utf-8")
    general = parser["general"]
    for key in REQUIRED:
        assert general.get(key), key
    assert general["qgisMinimumVersion"] == "3.22"
    assert general["hasProcessingProvider"] == "yes"
    assert general["category"] in ("Raster", "Vector", "Database", "Mesh", "Web")
    assert (ROOT / general["icon"]).exists()
    assert "GNU GENERAL PUBLIC LICENSE" in (ROOT / "LICENSE").read_text()


def test_root_init_holds_only_class_factory():
    import ast

    tree = ast.parse((ROOT / "__init__.py").read_text())
    functions = [n.name for n in tree.body if isinstance(n, ast.FunctionDef)]
    assert functions == ["classFactory"]
    assert not [n for n in tree.body if isinstance(n, (ast.Import, ast.ImportFrom))]


def test_zip_has_one_top_folder_and_no_tests_or_caches(tmp_path):
    built = subprocess.run([sys.executable, str(ROOT / "tools" / "build_zip.py"), str(tmp_path)], capture_output=True, text=True, check=True)
    archive = Path(built.stdout.strip().splitlines()[-1])
    names = zipfile.ZipFile(archive).namelist()
    assert {n.split("/")[0] for n in names} == {"relief_gravity"}
    for required in ("relief_gravity/__init__.py", "relief_gravity/metadata.txt", "relief_gravity/LICENSE", "relief_gravity/plugin/provider.py", "relief_gravity/algorithms/__init__.py", "relief_gravity/batch/__main__.py", "relief_gravity/docs/batch.md"):
        assert required in names
    assert not [n for n in names if "/tests/" in n or "__pycache__" in n or n.endswith(".pyc") or "/bench/" in n or "/.venv" in n]
    assert any(n.endswith(".qm") for n in names)


LOAD_UNLOAD = """
import importlib.util, sys
spec = importlib.util.spec_from_file_location("relief_gravity", sys.argv[1] + "/__init__.py", submodule_search_locations=[sys.argv[1]])
module = importlib.util.module_from_spec(spec); sys.modules["relief_gravity"] = module; spec.loader.exec_module(module)
from qgis.core import QgsApplication
app = QgsApplication([], False); app.initQgis()
registry = QgsApplication.processingRegistry()
plugin = module.classFactory(None)          # iface is None, as under qgis_process
plugin.initProcessing()
provider = plugin.provider
plugin.initProcessing()                     # a second call must not register twice
assert plugin.provider is provider
assert registry.providerById("reliefgravity") is not None
assert registry.algorithmById("reliefgravity:bouguerreduction") is not None
other = module.classFactory(None)
other.initProcessing()                      # same id again: refused, nothing dangling
assert other.provider is None
other.unload()
plugin.unload()
assert registry.providerById("reliefgravity") is None
print("load-unload ok")
"""


def test_plugin_loads_without_iface_and_unloads(tmp_path):
    import os

    # A fresh QGIS in a child process: the session's provider stays untouched.
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen", HOME=str(tmp_path))
    completed = subprocess.run([sys.executable, "-c", LOAD_UNLOAD, str(ROOT)], capture_output=True, text=True, env=env, timeout=120)
    assert "load-unload ok" in completed.stdout, completed.stdout + completed.stderr


def test_translation_sources_are_current():
    completed = subprocess.run([sys.executable, str(ROOT / "tools" / "update_translations.py"), "--check"], capture_output=True, text=True)
    assert completed.returncode == 0, completed.stdout + completed.stderr


def test_german_translation_is_loaded_for_a_german_locale(qgis_processing):
    from qgis.PyQt.QtCore import QCoreApplication, QTranslator

    qm = ROOT / "i18n" / "relief_gravity_de.qm"
    assert qm.exists()
    from relief_gravity.plugin.relief_gravity_plugin import translation_file

    assert translation_file("de_DE") == qm
    translator = QTranslator()
    assert translator.load(str(qm))
    QCoreApplication.installTranslator(translator)
    try:
        from relief_gravity.plugin.toolbox.bouguer_reduction import BouguerReductionAlgorithm

        algorithm = BouguerReductionAlgorithm()
        algorithm.initAlgorithm()
        assert algorithm.displayName() != "Bouguer reduction (free-air, simple and complete Bouguer anomalies)"
        assert "Bouguer" in algorithm.displayName()
        assert algorithm.parameterDefinition("DENSITY").description() == "Reduktionsdichte (kg/m³)"
    finally:
        QCoreApplication.removeTranslator(translator)


GERMAN_USER = """
import importlib.util, sys
spec = importlib.util.spec_from_file_location("relief_gravity", sys.argv[1] + "/__init__.py", submodule_search_locations=[sys.argv[1]])
module = importlib.util.module_from_spec(spec); sys.modules["relief_gravity"] = module; spec.loader.exec_module(module)
from qgis.core import QgsApplication, QgsSettings
app = QgsApplication([], False); app.initQgis()
settings = QgsSettings()
settings.setValue("locale/userLocale", "de_DE")
settings.setValue("locale/overrideFlag", True)
plugin = module.classFactory(None)
plugin.initProcessing()
assert plugin.translator is not None, QgsApplication.locale()
algorithm = QgsApplication.processingRegistry().algorithmById("reliefgravity:terraincorrection")
print(algorithm.displayName())
plugin.unload()
"""


def test_plugin_loads_the_translation_of_the_user_locale(tmp_path):
    import os

    env = dict(os.environ, QT_QPA_PLATFORM="offscreen", HOME=str(tmp_path))
    env.pop("QGIS_CUSTOM_CONFIG_PATH", None)
    completed = subprocess.run([sys.executable, "-c", GERMAN_USER, str(ROOT)], capture_output=True, text=True, env=env, timeout=120)
    assert "Geländekorrektion (Innen- und Außenzone aus Höhenrastern)" in completed.stdout, completed.stdout + completed.stderr


def _placeholders(text):
    """Counter of (index, spec, conversion) for every ``{...}`` field; ``{}`` fields are numbered in order."""
    import string
    from collections import Counter

    found, auto = Counter(), 0
    for _literal_text, name, spec, conversion in string.Formatter().parse(text):
        if name is None:
            continue
        if name == "":
            name, auto = str(auto), auto + 1
        found[(name, spec, conversion)] += 1
    return found


def test_every_german_translation_keeps_placeholders_tags_and_parameter_keys():
    import re
    import xml.etree.ElementTree as ET
    from collections import Counter

    checked, problems = 0, []
    for context in ET.parse(ROOT / "i18n" / "relief_gravity_de.ts").getroot().iter("context"):
        for message in context.iter("message"):
            source, translation = message.findtext("source"), message.find("translation")
            if translation.get("type") == "unfinished" or not translation.text:
                continue
            text, checked = translation.text, checked + 1
            where = f"{context.findtext('name')}: {source[:70]!r}"
            if _placeholders(source) != _placeholders(text):
                problems.append(f"{where}: placeholders differ")
            if Counter(re.findall(r"</?\w+>", source)) != Counter(re.findall(r"</?\w+>", text)):
                problems.append(f"{where}: HTML tags differ")
            keys = set(re.findall(r"\b[A-Z][A-Z0-9]*_[A-Z0-9_]+\b", source))
            if not keys <= set(re.findall(r"\b[A-Z][A-Z0-9]*_[A-Z0-9_]+\b", text)):
                problems.append(f"{where}: parameter keys lost")
    assert checked > 100
    assert not problems, "\n".join(problems)
    assert _placeholders("{} of {:.1f}") != _placeholders("{:.1f} of {}")
    assert _placeholders("{} of {}") == _placeholders("{1} von {0}") == _placeholders("{0} von {1}")
