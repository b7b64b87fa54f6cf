# SPDX-License-Identifier: GPL-2.0-or-later
"""Test set-up: register this checkout as the ``relief_gravity`` package.

The checkout may live in a folder of any name; tests always import
``relief_gravity.<...>``. Nothing generic (``plugin``, ``algorithms``) is put
on ``sys.path``.
"""

from __future__ import annotations

import importlib.util
import sys
from pathlib import Path

import pytest

REPO_ROOT = Path(__file__).resolve().parent.parent
SHARED_DATA = REPO_ROOT.parent / "shared" / "data"


def _register_checkout() -> None:
    if "relief_gravity" in sys.modules:
        return
    spec = importlib.util.spec_from_file_location(
        "relief_gravity",
        REPO_ROOT / "__init__.py",
        submodule_search_locations=[str(REPO_ROOT)],
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules["relief_gravity"] = module
    spec.loader.exec_module(module)


_register_checkout()


def shared_data(name: str) -> Path:
    """Path of a real dataset in ../shared/data, or skip the test with a reason."""
    path = SHARED_DATA / name
    if not path.exists():
        pytest.skip(f"real dataset {name} not found at {path} (only in the team's workspace)")
    return path


@pytest.fixture(scope="session")
def shared_data_dir():
    """Factory fixture: ``shared_data_dir('clvf-usgs-gravity')``."""
    return shared_data


def _qgis_available() -> bool:
    try:
        import qgis.core  # noqa: F401
    except ImportError:
        return False
    return True


@pytest.fixture(scope="session")
def provider(qgis_processing):
    """Load the plugin exactly as qgis_process does (iface None) and register it."""
    import relief_gravity

    plugin = relief_gravity.classFactory(None)
    plugin.initProcessing()
    yield plugin.provider
    plugin.unload()


def pytest_collection_modifyitems(config, items):
    if _qgis_available():
        return
    skip = pytest.mark.skip(reason="QGIS Python bindings not importable here")
    for item in items:
        if "tests/plugin" in str(item.fspath).replace("\\", "/"):
            item.add_marker(skip)


@pytest.fixture(scope="session")
def dask_address():
    """Address of a dask.distributed LocalCluster of 2 worker processes shared
    by the batch-runner tests (started once; workers import this checkout)."""
    pytest.importorskip("distributed", reason="python3-distributed not installed (tools/setup.sh installs it)")
    import logging

    from distributed import LocalCluster

    from relief_gravity.batch.runner import importable_path

    folder = importable_path()
    cluster = LocalCluster(n_workers=2, threads_per_worker=1, processes=True, dashboard_address=None, silence_logs=logging.ERROR)
    yield cluster.scheduler_address
    cluster.close()
    if folder:
        import shutil

        shutil.rmtree(folder, ignore_errors=True)
