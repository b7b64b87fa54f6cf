# SPDX-License-Identifier: GPL-2.0-or-later
"""Hammer (1939) ring-and-sector method."""

from __future__ import annotations

import math

import numpy as np
import pytest

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT
from relief_gravity.algorithms.terrain import (
    HAMMER_ZONES,
    ElevationGrid,
    TerrainCancelled,
    hammer_terrain_correction,
    ring_sector_correction,
    sample_bilinear,
    terrain_correction,
)


def test_zone_table_references_5_1_from_memory():
    # REFERENCES.md §5.1, tag [M] (from memory, not verified): radii in metres.
    expected = {
        "B": (2.00, 16.64, 4), "C": (16.64, 53.34, 6), "D": (53.34, 170.08, 6), "E": (170.08, 390.14, 8),
        "F": (390.14, 894.89, 8), "G": (894.89, 1529.49, 12), "H": (1529.49, 2614.57, 12),
        "I": (2614.57, 4453.74, 12), "J": (4453.74, 6652.56, 16), "K": (6652.56, 9902.95, 16),
        "L": (9902.95, 14741.65, 16), "M": (14741.65, 21944.38, 16),
    }
    assert [z.letter for z in HAMMER_ZONES] == list("BCDEFGHIJKLM")
    for z in HAMMER_ZONES:
        r1, r2, n = expected[z.letter]
        assert (round(z.inner, 2), round(z.outer, 2), z.compartments) == (r1, r2, n)
    # consistent with the verified 13.6 miles (Sandberg 1959, REFERENCES.md §5.1)
    assert HAMMER_ZONES[-1].outer == pytest.approx(13.6 * 1609.344, rel=0.005)


@pytest.mark.parametrize(
    ("letter", "z", "expected"),
    # REFERENCES.md §5.1 table, T per compartment [C], rho 2670, G 6.6743e-11
    [("B", 10.0, 0.15186), ("C", 100.0, 0.46162), ("F", 100.0, 0.09856), ("G", 10.0, 0.00022), ("M", 100.0, 0.00078)],
)
def test_compartment_values_references_5_1(letter, z, expected):
    zone = {zz.letter: zz for zz in HAMMER_ZONES}[letter]
    assert float(ring_sector_correction(zone.inner, zone.outer, zone.compartments, z)) == pytest.approx(expected, abs=1e-5)


def test_zone_f_200_ft_common_practice():
    # One compartment of ring 1280-2936 ft, 8 compartments, relief 200 ft,
    # 2.0 g/cm^3: about 0.03 mGal (common practice, no source).
    t20 = float(ring_sector_correction(1280 * 0.3048, 2936 * 0.3048, 8, 200 * 0.3048, 2000.0))
    assert t20 == pytest.approx(0.03, abs=0.003)
    # Linear in density: 2.67 / 2.0 = 1.335 (common practice, no source).
    t267 = float(ring_sector_correction(1280 * 0.3048, 2936 * 0.3048, 8, 200 * 0.3048, 2670.0))
    assert t267 / t20 == pytest.approx(1.335, rel=1e-12)
    # Either sign of relief, zero for none.
    assert float(ring_sector_correction(1280 * 0.3048, 2936 * 0.3048, 8, -200 * 0.3048, 2000.0)) == t20
    assert float(ring_sector_correction(390.0, 895.0, 8, 0.0)) == 0.0


def test_formula_is_the_difference_of_two_cylinders():
    # Self-consistency: a full ring (n = 1) of relief z is the on-axis
    # attraction of a cylinder of radius r2 minus one of radius r1, each
    # 2 pi G rho (z + r - sqrt(r^2 + z^2)) (REFERENCES.md §6 case 1 form).
    r1, r2, z = 53.34, 170.08, 37.0
    cylinder = lambda r: 2 * math.pi * GRAVITATIONAL_CONSTANT * 2670 * 1e5 * (z + r - math.hypot(r, z))  # noqa: E731
    assert float(ring_sector_correction(r1, r2, 1, z)) == pytest.approx(cylinder(r2) - cylinder(r1), rel=1e-12)
    assert float(ring_sector_correction(r1, r2, 6, z)) == pytest.approx((cylinder(r2) - cylinder(r1)) / 6, rel=1e-12)


def test_mesa_equal_to_zone_boundary_telescopes_to_ring_formula():
    # Station on a circular mesa of radius 170.08 m (outer edge of zone D) and
    # height 50 m on a plain: zones B-D see no relief, E-M see -50 m, and the
    # ring sum telescopes to Hammer's ring formula from 170.08 m to 21.94 km
    # (REFERENCES.md §6 case 3 form).
    a = HAMMER_ZONES[2].outer
    R = HAMMER_ZONES[-1].outer
    cell = 20.0
    half = 22200.0
    n = int(2 * half / cell)
    xc = -half + (np.arange(n) + 0.5) * cell
    X, Y = np.meshgrid(xc, -xc)
    grid = ElevationGrid.from_array(np.where(np.hypot(X, Y) < a, 50.0, 0.0), -half, half, cell, cell)
    r = hammer_terrain_correction([0.0], [0.0], [50.0], grid, curvature=False)
    formula = 2 * math.pi * GRAVITATIONAL_CONSTANT * 2670 * 1e5 * ((R - a) + math.hypot(a, 50) - math.hypot(R, 50))
    # Samples near the mesa's raster edge mix the two heights (bilinear):
    # within 1 %.
    assert r.total[0] == pytest.approx(formula, rel=0.01)
    assert r.zones["B"][0] == 0.0 and r.zones["D"][0] < 0.01 * r.total[0]
    assert r.flags == [""] and r.coverage[0] == 1.0


def test_flags_and_cancel():
    z = np.zeros((100, 100))
    grid = ElevationGrid.from_array(z, 0.0, 1000.0, 10.0, 10.0)
    r = hammer_terrain_correction([500.0, -5.0, 500.0], [500.0, 500.0, 500.0], [0.0, 0.0, np.nan], grid, zones="BCDEF")
    # Zone F (to 895 m) reaches past the 1 km DEM around a central station.
    area = math.pi * 894.89**2 - math.pi * 2.0**2
    inside = 1000.0**2 - math.pi * 2.0**2
    assert r.coverage[0] == pytest.approx(inside / area, abs=0.02)
    # Flags are codes of algorithms.qc (they were English sentences before).
    assert r.flags[0] == "tc_partial" and r.codes[0] == ("tc_partial",)
    assert r.flags[1] == "outside_dem" and np.isnan(r.total[1])
    assert r.flags[2] == "no_height" and np.isnan(r.total[2])
    assert set(r.zones) == set("BCDEF")
    with pytest.raises(TerrainCancelled):
        hammer_terrain_correction([500.0], [500.0], [0.0], grid, zones="BC", is_cancelled=lambda: True)
    with pytest.raises(ValueError, match="zone A is the station zone"):
        hammer_terrain_correction([500.0], [500.0], [0.0], grid, zones="AB")


def test_hammer_vs_exact_engine_on_real_relief(shared_data_dir):
    # Big Tujunga 30 m DEM (../shared/data): the chart method with DEM means
    # against the exact engine over the same 21.9 km; both see the same
    # relief, so they agree to a modest fraction (the chart's flat-topped
    # compartments average the relief away; the engine does not).
    gdal = pytest.importorskip("osgeo.gdal")
    ds = gdal.Open(str(shared_data_dir("dem-bigtujunga-srtm30") / "bigtujunga.tif"))
    z = ds.GetRasterBand(1).ReadAsArray().astype(float)
    gt = ds.GetGeoTransform()
    grid = ElevationGrid.from_array(z, gt[0], gt[3], gt[1], -gt[5])
    x = gt[0] + np.array([600.5, 700.2, 500.7]) * gt[1]
    y = gt[3] + np.array([320.4, 300.6, 280.1]) * gt[5]
    h = sample_bilinear(grid, np.asarray(x, float), np.asarray(y, float))
    hammer = hammer_terrain_correction(x, y, h, grid)
    exact = terrain_correction(x, y, h, grid, outer_radius=HAMMER_ZONES[-1].outer, curvature=False)
    assert np.all(hammer.total > 0.3)
    ratio = hammer.total / exact.tc_total
    assert np.all((ratio > 0.6) & (ratio < 1.1))


def test_hammer_on_a_geographic_dem(shared_data_dir):
    # tut_relief (30 arc-second, lon/lat, ../shared/data/dem-gmt-samples):
    # compartments are laid out on the ground, so the chart method and the
    # exact engine see the same rings; ratio as for the projected DEM.
    gdal = pytest.importorskip("osgeo.gdal")
    ds = gdal.Open(str(shared_data_dir("dem-gmt-samples") / "tut_relief.nc"))
    band = ds.GetRasterBand(1)
    z = band.ReadAsArray().astype(float)
    z[z == band.GetNoDataValue()] = np.nan
    gt = ds.GetGeoTransform()
    grid = ElevationGrid.from_array(z, gt[0], gt[3], gt[1], -gt[5], geographic=True)
    lon, lat = np.array([-105.62, -106.1]), np.array([37.55, 38.4])
    # Stations on the DEM's bilinear surface, so that the two methods' different
    # handling of a station-DEM height difference near the station (plane
    # through the station vs compartments of the DEM surface) stays out.
    h = sample_bilinear(grid, np.asarray(lon, float), np.asarray(lat, float))
    hammer = hammer_terrain_correction(lon, lat, h, grid)
    exact = terrain_correction(lon, lat, h, grid, inner_radius=HAMMER_ZONES[-1].outer, outer_radius=HAMMER_ZONES[-1].outer, curvature=False)
    assert hammer.flags == ["", ""] and np.all(hammer.coverage == 1.0)
    ratio = hammer.total / exact.tc_total
    assert np.all((ratio > 0.6) & (ratio < 1.1))
