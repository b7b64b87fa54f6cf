# SPDX-License-Identifier: GPL-2.0-or-later
"""Shared invented survey for the issue-8 input tests (imported by those tests).

A 12 km square DEM of 100 m cells (a 600 m Gaussian hill on a 200 m plain,
UTM 32N near 45 N, 9 E) and 16 stations on the hill whose heights are the
hill's own formula, so a correctly declared datum gives dem_diff near 0.
"""

from __future__ import annotations

import hashlib
import math
from pathlib import Path

import numpy as np

EPSG = 32632
WEST, NORTH, CELL, N = 494_000.0, 5_006_000.0, 100.0, 120
#: Outer radius small enough that the 12 km DEM covers every station's zone.
OUTER = 3500.0


def hill(x, y):
    return 200.0 + 600.0 * np.exp(-(((x - 500_000.0) ** 2 + (y - 5_000_000.0) ** 2) / (2 * 1500.0**2)))


def dem_array():
    centres = (np.arange(N) + 0.5) * CELL
    xx, yy = np.meshgrid(WEST + centres, NORTH - centres)
    return hill(xx, yy)


def station_xy():
    g = np.linspace(498_500.0, 501_500.0, 4)
    xx, yy = np.meshgrid(g, g + 5_000_000.0 - 500_000.0)
    return xx.ravel(), yy.ravel()


def lonlat(x, y):
    from osgeo import osr

    src = osr.SpatialReference()
    src.ImportFromEPSG(EPSG)
    dst = osr.SpatialReference()
    dst.ImportFromEPSG(4326)
    for s in (src, dst):
        s.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    t = osr.CoordinateTransformation(src, dst)
    pts = [t.TransformPoint(float(a), float(b)) for a, b in zip(x, y, strict=True)]
    return np.array([p[0] for p in pts]), np.array([p[1] for p in pts])


def gravity(h):
    """Invented but plausible observed gravity (mGal) for heights h."""
    return 980_650.0 - 0.25 * np.asarray(h)


def digest(path) -> str:
    return hashlib.sha256(Path(str(path).split("|")[0]).read_bytes()).hexdigest()


def values(layer, name):
    from qgis.core import NULL

    return np.array(
        [np.nan if f[name] == NULL or f[name] is None else f[name] for f in layer.getFeatures()], dtype=float
    )


def texts(layer, name):
    from qgis.core import NULL

    return ["" if f[name] == NULL or f[name] is None else str(f[name]) for f in layer.getFeatures()]


def run(algorithm, params, feedback=None):
    import processing
    from qgis.core import QgsProcessingContext

    return processing.run("reliefgravity:" + algorithm, params, feedback=feedback, context=QgsProcessingContext())


def layer(path):
    from qgis.core import QgsVectorLayer

    return QgsVectorLayer(str(path), "out", "ogr")


def leftovers(folder) -> list:
    """Files a failed run may have left in a folder (outputs or staging folders)."""
    return sorted(p.name for p in Path(folder).iterdir() if p.name.startswith(".relief_gravity_partial") or p.name.startswith("out"))


def is_nan(value) -> bool:
    return value is None or (isinstance(value, float) and math.isnan(value))
