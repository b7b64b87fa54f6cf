#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-2.0-or-later
"""Run the batch runner from a checkout whatever its folder is called.

    python3 tools/batch.py terrain|reduce ...   # same as python3 -m relief_gravity.batch ...

It puts a temporary folder holding a ``relief_gravity`` link to this checkout
first on the module path (the worker processes inherit it), then runs the
package's ``__main__``. An installed plugin (its folder's parent on
PYTHONPATH) needs no launcher.
"""

import atexit
import os
import runpy
import shutil
import sys
import tempfile
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
folder = tempfile.mkdtemp(prefix="relief_gravity_path_")
os.symlink(ROOT, os.path.join(folder, "relief_gravity"), target_is_directory=True)
atexit.register(shutil.rmtree, folder, True)
sys.path.insert(0, folder)
os.environ["PYTHONPATH"] = folder + os.pathsep + os.environ.get("PYTHONPATH", "")
sys.argv[0] = "relief_gravity.batch"
runpy.run_module("relief_gravity.batch", run_name="__main__", alter_sys=True)
