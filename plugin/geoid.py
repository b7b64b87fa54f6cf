# SPDX-License-Identifier: GPL-2.0-or-later
"""Geoid heights at stations: PROJ's EGM96 grid, a user raster or a field.

The EGM96 grid (PROJ's ``egm96_15.gtx``, found through PROJ's search paths,
never downloaded) is read by ``plugin/egm96_grid.py``, shared with the batch
runner; this module adds the plugin's sentences.
"""

from __future__ import annotations

import numpy as np
from qgis.core import QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

from ..algorithms.datums import GEOID_LIMIT
from .egm96_grid import EGM96_FILE, egm96_values, find_egm96, proj_search_paths

__all__ = ["EGM96_FILE", "check_geoid_values", "egm96_at", "find_egm96", "proj_search_paths"]


def _tr(text: str) -> str:
    return QCoreApplication.translate("GeoidHeights", text)


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
    return egm96_values(longitude, latitude)


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
