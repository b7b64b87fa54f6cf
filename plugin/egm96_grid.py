# SPDX-License-Identifier: GPL-2.0-or-later
"""PROJ's EGM96 geoid grid read with GDAL alone (no QGIS).

Shared by the plugin (``plugin/geoid.py``) and the batch runner
(``batch/heights.py``), which each turn a missing grid into their own
sentence. The grid is the file ``egm96_15.gtx`` that PROJ installs; it is
found through PROJ's search paths and never downloaded. The interpolation is
bilinear on its 15' nodes (``algorithms.datums.bilinear_global``), as PROJ
does for .gtx grids.
"""

from __future__ import annotations

import contextlib
import os
from functools import lru_cache
from pathlib import Path

import numpy as np
from osgeo import gdal, osr

from ..algorithms.datums import bilinear_global

EGM96_FILE = "egm96_15.gtx"


def proj_search_paths() -> list[str]:
    """Folders PROJ looks in for grids (GDAL's view first, then the environment)."""
    folders = []
    with contextlib.suppress(AttributeError, RuntimeError):
        folders += list(osr.GetPROJSearchPaths() or [])
    for name in ("PROJ_DATA", "PROJ_LIB"):
        value = os.environ.get(name)
        if value:
            folders += value.split(os.pathsep)
    folders += ["/usr/share/proj", "/usr/local/share/proj"]
    return list(dict.fromkeys(f for f in folders if f))


def find_egm96() -> str | None:
    """Path of PROJ's EGM96 grid, or None when no search path holds it."""
    for folder in proj_search_paths():
        candidate = Path(folder) / EGM96_FILE
        if candidate.is_file():
            return str(candidate)
    return None


@lru_cache(maxsize=2)
def _egm96_nodes(path: str):
    dataset = gdal.Open(path, gdal.GA_ReadOnly)
    x0, dx, _, y0, _, dy = dataset.GetGeoTransform()
    values = dataset.GetRasterBand(1).ReadAsArray().astype(float)
    nodata = dataset.GetRasterBand(1).GetNoDataValue()
    if nodata is not None:
        values[values == nodata] = np.nan
    # The .gtx geotransform gives cell edges; nodes sit at cell centres.
    return values, x0 + dx / 2.0, y0 + dy / 2.0, dx


def egm96_values(longitude, latitude) -> np.ndarray | None:
    """EGM96 geoid height (m) at each longitude/latitude (degrees, WGS84); None without the grid."""
    path = find_egm96()
    if path is None:
        return None
    values, west, north, step = _egm96_nodes(path)
    return bilinear_global(values, longitude, latitude, west, north, step)
