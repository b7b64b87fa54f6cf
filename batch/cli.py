# SPDX-License-Identifier: GPL-2.0-or-later
"""The command line: ``python3 -m relief_gravity.batch terrain|reduce ...``."""

from __future__ import annotations

import importlib.util
import sys

from .errors import BatchError
from .options import build_parser, processing_values


def main(argv=None, *, on_chunk=None) -> int:
    """Parse, run, report; 0 on success, 1 with a sentence on a problem, 130 when interrupted."""
    args = build_parser().parse_args(argv)
    values = processing_values(args.command, args)
    missing = [name for name in ("osgeo", "distributed") if importlib.util.find_spec(name) is None]
    if missing:
        print(
            f"Error: this Python ({sys.executable}) lacks {' and '.join(missing)}. The batch runner needs GDAL's "
            "Python bindings and dask.distributed: on Debian install python3-gdal python3-dask python3-distributed "
            "(tools/setup.sh does) and run it with /usr/bin/python3 or the project's .venv/bin/python.",
            file=sys.stderr,
        )
        return 1
    from .runner import run
    from .store import parts_dir

    try:
        run(args.command, values, args, log=lambda text: print(text, flush=True), on_chunk=on_chunk)
    except BatchError as error:
        print(f"Error: {error}", file=sys.stderr)
        return 1
    except KeyboardInterrupt:
        folder = parts_dir(values["OUTPUT"])
        print(
            f"\nInterrupted. Computed chunks are kept in {folder}; run the same command again to resume.",
            file=sys.stderr,
        )
        return 130
    return 0
