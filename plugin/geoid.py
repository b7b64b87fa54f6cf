# SPDX-License-Identifier: GPL-2.0-or-later
"""Geoid heights at stations: PROJ's EGM96 grid, a user raster or a field.

The EGM96 grid is the file ``egm96_15.gtx`` that PROJ installs (with QGIS
on most systems); it is found through PROJ's search paths and read with
GDAL, never downloaded. The interpolation is bilinear on its 15' nodes
(``algorithms.datums.bilinear_global``), as PROJ does for .gtx grids.
"""

from __future__ import annotations

import contextlib
import os
from functools import lru_cache
from pathlib import Path

import numpy as np
from osgeo import gdal, osr
from qgis.core import QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

from ..algorithms.datums import GEOID_LIMIT, bilinear_global

EGM96_FILE = "egm96_15.gtx"


def _tr(text: str) -> str:
    return QCoreApplication.translate("GeoidHeights", text)


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
    unique = []
    for folder in folders:
        if folder and folder not in unique:
            unique.append(folder)
    return unique


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


def egm96_at(longitude, latitude) -> np.ndarray:
    """EGM96 geoid height (m) at each longitude/latitude (degrees, WGS84).

    Raises
    ------
    QgsProcessingException
        When PROJ's EGM96 grid is not installed.
    """
    path = find_egm96()
    if path is None:
        raise QgsProcessingException(
            _tr(
                "The EGM96 geoid grid {} was not found in PROJ's search paths ({}). Install PROJ's "
                "grid data (Debian: proj-data), or give the geoid heights in a field or raster "
                "(HEIGHT_DATUM = orthometric with GEOID_FIELD or GEOID_RASTER), or set both "
                "datums to the ellipsoid."
            ).format(EGM96_FILE, ", ".join(proj_search_paths()))
        )
    values, west, north, step = _egm96_nodes(path)
    return bilinear_global(values, longitude, latitude, west, north, step)


def check_geoid_values(values: np.ndarray, source: str) -> None:
    """Stop when given geoid heights cannot be geoid heights (|N| above the limit)."""
    finite = values[np.isfinite(values)]
    if finite.size and np.max(np.abs(finite)) > GEOID_LIMIT:
        raise QgsProcessingException(
            _tr(
                "The geoid heights from {} reach {:.6g} m; geoid heights lie within ±{:g} m of the "
                "ellipsoid everywhere on Earth. Check that it holds geoid heights in metres."
            ).format(source, float(finite[np.argmax(np.abs(finite))]), GEOID_LIMIT)
        )
