# SPDX-License-Identifier: GPL-2.0-or-later
"""A DEM in lon/lat degrees and the same terrain in metres give one answer."""

from __future__ import annotations

import math

import numpy as np
import pytest

from relief_gravity.algorithms.constants import MEAN_EARTH_RADIUS
from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction

LON0, LAT0 = -105.3, 40.0


def terrain(e, n):
    """Smooth invented relief in metres on a local east/north frame."""
    hill = 350.0 * np.exp(-((e - 900.0) ** 2 + (n + 600.0) ** 2) / (2 * 800.0**2))
    ridges = 90.0 * np.sin(e / 700.0 + 0.3) * np.cos(n / 1100.0)
    return 1500.0 + hill + ridges + 0.02 * e


def aeqd(lon, lat):
    """Azimuthal equidistant east/north (m) about (LON0, LAT0) on the sphere.

    Written with unit vectors (not the engine's haversine/azimuth form), so
    the test does not reuse the code it checks.
    """
    lam, phi = np.radians(lon), np.radians(lat)
    lam0, phi0 = math.radians(LON0), math.radians(LAT0)
    p = np.stack([np.cos(phi) * np.cos(lam), np.cos(phi) * np.sin(lam), np.sin(phi)])
    up = np.array([math.cos(phi0) * math.cos(lam0), math.cos(phi0) * math.sin(lam0), math.sin(phi0)])
    east = np.array([-math.sin(lam0), math.cos(lam0), 0.0])
    north = np.cross(up, east)
    cos_c = np.tensordot(up, p, axes=1)
    pe, pn = np.tensordot(east, p, axes=1), np.tensordot(north, p, axes=1)
    c = np.arctan2(np.hypot(pe, pn), cos_c)
    scale = np.where(c > 0, MEAN_EARTH_RADIUS * c / np.where(np.hypot(pe, pn) > 0, np.hypot(pe, pn), 1.0), MEAN_EARTH_RADIUS)
    return pe * scale, pn * scale


@pytest.fixture(scope="module")
def grids():
    # Half an arc-second: 15.4 m north-south, 11.8 m east-west at 40 N.
    half = 5600.0
    step = 0.5 / 3600.0
    dlat = math.degrees(half / MEAN_EARTH_RADIUS) * 1.02
    dlon = dlat / math.cos(math.radians(LAT0))
    nlat, nlon = int(2 * dlat / step), int(2 * dlon / step)
    lat_n = LAT0 + (nlat // 2 + 0.37) * step
    lon_w = LON0 - (nlon // 2 + 0.81) * step
    lon = lon_w + (np.arange(nlon) + 0.5) * step
    lat = lat_n - (np.arange(nlat) + 0.5) * step
    LON, LAT = np.meshgrid(lon, lat)
    E, N = aeqd(LON, LAT)
    geo = ElevationGrid.from_array(terrain(E, N), lon_w, lat_n, step, step, geographic=True)
    # The metric twin: cells of the same ground size as the geographic cells
    # at the station, the station at the same place inside its cell, so that
    # both rasters discretise the terrain alike near the station and what is
    # compared is the handling of the geometry.
    cy = MEAN_EARTH_RADIUS * math.radians(step)
    cx = cy * math.cos(math.radians(LAT0))
    nx, ny = int(2 * half / cx), int(2 * half / cy)
    west = -(nx // 2 + 0.81) * cx
    north = (ny // 2 + 0.37) * cy
    x = west + (np.arange(nx) + 0.5) * cx
    y = north - (np.arange(ny) + 0.5) * cy
    X, Y = np.meshgrid(x, y)
    metric = ElevationGrid.from_array(terrain(X, Y), west, north, cx, cy)
    return metric, geo


@pytest.mark.parametrize("above_dem", [0.0, 3.0])
def test_geographic_equals_metric_beyond_the_innermost_cell(grids, above_dem):
    metric, geo = grids
    h = float(terrain(np.array(0.0), np.array(0.0))) + above_dem
    kw = dict(inner_radius=2000.0, outer_radius=5000.0, innermost_tc=[0.0])
    rm = terrain_correction([0.0], [0.0], [h], metric, **kw)
    rg = terrain_correction([LON0], [LAT0], [h], geo, **kw)
    assert rm.tc_total[0] > 0.3  # a case where the comparison means something
    # Task requirement: within 0.01 mGal beyond the innermost ring. Measured:
    # 3e-6 (inner zone) and 1e-3 mGal (outer zone, 2-5 km, where blocks of
    # lon/lat cells and of metric cells differ in shape).
    assert rg.tc_inner[0] == pytest.approx(rm.tc_inner[0], abs=1e-4)
    assert rg.tc_outer[0] == pytest.approx(rm.tc_outer[0], abs=0.003)
    assert rg.tc_total[0] == pytest.approx(rm.tc_total[0], abs=0.01)
    assert rg.dem_height[0] == pytest.approx(rm.dem_height[0], abs=1e-6)
    assert rg.coverage[0] == pytest.approx(rm.coverage[0], abs=0.005)


def test_degrees_are_not_metres(grids):
    # The same geographic raster read as if its degrees were metres gives a
    # different answer: the test above would notice a missing conversion.
    _metric, geo = grids
    h = float(terrain(np.array(0.0), np.array(0.0)))
    kw = dict(inner_radius=2000.0, outer_radius=5000.0, innermost_tc=[0.0])
    rg = terrain_correction([LON0], [LAT0], [h], geo, **kw)
    naive = ElevationGrid(geo.x_origin, geo.y_origin, geo.cell_x * 111195.0, geo.cell_y * 111195.0, geo.n_rows, geo.n_cols, geo.reader)
    rn = terrain_correction([geo.x_origin + (LON0 - geo.x_origin) * 111195.0], [geo.y_origin - (geo.y_origin - LAT0) * 111195.0], [h], naive, **kw)
    assert abs(rn.tc_total[0] - rg.tc_total[0]) > 0.05
