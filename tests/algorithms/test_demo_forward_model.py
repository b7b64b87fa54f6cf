# SPDX-License-Identifier: GPL-2.0-or-later
"""Checks of the demo scenario's forward model on analytic cases.

The demo data are invented (for demonstration and self-consistency tests
only); these tests make sure the synthetic "truth" is right before it is used
to judge the reduction end to end.
"""

from __future__ import annotations

import importlib.util
import sys
from pathlib import Path

import numpy as np
import numpy.testing as npt
import pytest

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT, MEAN_EARTH_RADIUS, SI_TO_MGAL
from relief_gravity.algorithms.terrain import prism_gravity
from relief_gravity.demo import forward_model as fm

DEMO_DIR = Path(__file__).resolve().parents[2] / "demo"

# G of the LaFehr cap column in docs/reduction.md section 5; the model uses CODATA 2018,
# and the cap is proportional to G.
G_TABLE = 6.674e-11


def _flat_world(height, fine_half=3000.0, regional_half=170_000.0):
    n_fine = int(2 * fine_half / 50.0)
    n_reg = int(2 * regional_half / 1000.0)
    fine = fm.HeightGrid(-fine_half, fine_half, 50.0, np.full((n_fine, n_fine), height))
    regional = fm.HeightGrid(-regional_half, regional_half, 1000.0, np.full((n_reg, n_reg), height))
    return fine, regional


@pytest.mark.parametrize(
    ("height", "cap"),
    [(500.0, 56.6260), (1000.0, 113.0754), (2000.0, 225.4444), (3000.0, 337.1077)],
    ids=["500m", "1000m", "2000m", "3000m"],
)
def test_flat_topography_on_the_sphere_is_the_lafehr_cap(height, cap):
    # Source: docs/reduction.md section 5 table, "cap (G=6.674e-11)" column = LaFehr (1991)
    # closed form, R0 = 6371 km, S = 166.735 km, rho = 2670 [C there]. Our
    # columns are vertical prisms/line masses lowered by s^2/2R on a plane,
    # not spherical shells, so a few µGal to a few mGal-thousandths differ.
    fine, regional = _flat_world(height)
    g = fm.terrain_attraction([0.0, 812.5], [0.0, -437.0], height, fine, regional)
    npt.assert_allclose(g * G_TABLE / GRAVITATIONAL_CONSTANT, cap, atol=0.005)


def test_no_topography_no_attraction():
    fine, regional = _flat_world(0.0, regional_half=20_000.0)
    npt.assert_array_equal(fm.terrain_attraction([10.0], [20.0], 0.0, fine, regional), 0.0)


def test_single_near_cell_is_the_lowered_prism():
    heights = np.zeros((40, 40))
    heights[12, 30] = 137.0  # cell centre (525, 375)
    fine = fm.HeightGrid(-1000.0, 1000.0, 50.0, heights)
    xs, ys, hs = -210.0, 95.0, 12.5
    s2 = (525.0 - xs) ** 2 + (375.0 - ys) ** 2
    drop = s2 / (2 * MEAN_EARTH_RADIUS)
    expected = prism_gravity(xs, ys, hs, 500, 550, 350, 400, -drop, 137.0 - drop, 2670.0)
    npt.assert_allclose(fm.terrain_attraction(xs, ys, hs, fine), expected, rtol=1e-12)


def test_far_cell_line_mass_close_to_prism():
    # Beyond near_radius a cell is a vertical line mass; at 80 cell widths it
    # must match the exact prism to better than 0.05 % (docs/terrain.md section 5: the
    # error falls off roughly as (cell/s)^2, -0.09 % at 20 widths).
    heights = np.zeros((200, 200))
    heights[100, 180] = 400.0  # centre (4025, -25)
    fine = fm.HeightGrid(-5000.0, 5000.0, 50.0, heights)
    s2 = 4025.0**2 + 25.0**2
    drop = s2 / (2 * MEAN_EARTH_RADIUS)
    expected = prism_gravity(0, 0, 300.0, 4000, 4050, -50, 0, -drop, 400.0 - drop, 2670.0)
    npt.assert_allclose(fm.terrain_attraction(0.0, 0.0, 300.0, fine), expected, rtol=5e-4)


def test_station_buried_mid_height_feels_nothing():
    # Symmetry: in the middle of a flat layer of thickness 2H the mass above
    # pulls up exactly as much as the mass below pulls down (flat Earth; the
    # sub-prism holding the station is split at the station height).
    fine = fm.HeightGrid(-525.0, 525.0, 50.0, np.full((21, 21), 300.0))
    npt.assert_allclose(fm.terrain_attraction(0.0, 0.0, 150.0, fine, earth_radius=1e30), 0.0, atol=1e-9)
    # On its top the cells (those near the station as sub-prisms) add up to
    # the whole block.
    top = fm.terrain_attraction(3.0, -7.0, 300.0, fine, earth_radius=1e30)
    npt.assert_allclose(top, prism_gravity(3, -7, 300, -525, 525, -525, 525, 0, 300, 2670), rtol=1e-9)


@pytest.mark.parametrize(("slope_deg", "tc"), [(5.0, 0.21334), (10.0, 0.85541)], ids=["5deg", "10deg"])
def test_station_on_an_inclined_plane(slope_deg, tc):
    # Source: docs/terrain.md section 11, case 5 [C, derived and checked by quadrature
    # there]: terrain correction of an infinite inclined plane through the
    # station, to R = 1 km: TC = G rho R [2 pi - 4 cos(theta) K(sin^2 theta)].
    # On a flat Earth the terrain attraction is then the flat disc (slab to
    # radius R at station height) minus TC. The DEM holds the plane at cell
    # centres; the 5 x 5 cells round the station are the bilinear surface,
    # which for a plane is the plane itself, and the flat-topped 50 m cells
    # beyond form terraces that add 0.013 (5 deg) and 0.018 mGal (10 deg) at
    # 50 m cells, 0.004 and 0.007 at 25 m (measured), hence the tolerance.
    grad = np.tan(np.radians(slope_deg))
    xc = -1100.0 + (np.arange(44) + 0.5) * 50.0
    heights = np.tile(600.0 + grad * xc, (44, 1))
    fine = fm.HeightGrid(-1100.0, 1100.0, 50.0, heights)
    xs, ys = 13.0, -21.0
    hs = 600.0 + grad * xs
    g = fm.terrain_attraction(xs, ys, hs, fine, outer_radius=1000.0, earth_radius=1e30)
    two_pi_g_rho = 2 * np.pi * GRAVITATIONAL_CONSTANT * 2670.0 * SI_TO_MGAL
    disc = two_pi_g_rho * (hs + 1000.0 - np.hypot(1000.0, hs))
    npt.assert_allclose(disc - g, tc, atol=0.025)


def test_misaligned_grids_are_refused():
    fine = fm.HeightGrid(-3025.0, 3000.0, 50.0, np.zeros((120, 120)))
    regional = fm.HeightGrid(-170_000.0, 170_000.0, 1000.0, np.zeros((340, 340)))
    with pytest.raises(ValueError, match="tile whole regional cells"):
        fm.terrain_attraction(0.0, 0.0, 0.0, fine, regional)


def _point_mass(prisms, x, y, z):
    volume = (prisms.east - prisms.west) * (prisms.north - prisms.south) * (prisms.top - prisms.bottom)
    mass = prisms.density * volume
    cx = 0.5 * (prisms.west + prisms.east)
    cy = 0.5 * (prisms.south + prisms.north)
    cz = 0.5 * (prisms.bottom + prisms.top)
    m = mass.sum()
    gx, gy, gz = (np.sum(mass * c) / m for c in (cx, cy, cz))
    r = np.sqrt((gx - x) ** 2 + (gy - y) ** 2 + (gz - z) ** 2)
    return GRAVITATIONAL_CONSTANT * m * (z - gz) / r**3 * SI_TO_MGAL


def test_buried_box_far_away_is_a_point_mass():
    # A 2 x 2 x 1 km box split into 8 prisms of +250 kg/m^3, seen from 30 km
    # above: point mass to (size/distance)^2 ~ 0.5 %.
    e = np.array([-1000.0, 0.0])
    w, s, b = np.meshgrid(e, e, np.array([-3000.0, -2500.0]), indexing="ij")
    w, s, b = w.ravel(), s.ravel(), b.ravel()
    prisms = fm.PrismSet(w, w + 1000, s, s + 1000, b, b + 500, np.full(8, 250.0))
    g = fm.body_attraction([0.0, 5000.0], [0.0, 0.0], [30_000.0, 27_000.0], prisms)
    npt.assert_allclose(g, [_point_mass(prisms, 0, 0, 30_000.0), _point_mass(prisms, 5000, 0, 27_000.0)], rtol=5e-3)
    npt.assert_allclose(prisms.mass(), 250.0 * 2000 * 2000 * 1000, rtol=1e-12)


def _load_scenario_script():
    pytest.importorskip("osgeo", reason="GDAL's Python bindings are needed by demo/make_scenario.py")
    if "relief_gravity_demo_make_scenario" in sys.modules:
        return sys.modules["relief_gravity_demo_make_scenario"]
    spec = importlib.util.spec_from_file_location("relief_gravity_demo_make_scenario", DEMO_DIR / "make_scenario.py")
    module = importlib.util.module_from_spec(spec)
    sys.modules[spec.name] = module
    spec.loader.exec_module(module)
    return module


def test_scenario_bodies_far_away_are_point_masses():
    ms = _load_scenario_script()
    for prisms in (ms.sediment_fill(), ms.ostrel_intrusion()):
        x = ms.CENTRE_E + 150_000.0
        y = ms.CENTRE_N - 90_000.0
        g = fm.body_attraction(x, y, 20_000.0, prisms)
        npt.assert_allclose(g, _point_mass(prisms, x, y, 20_000.0), rtol=2e-3)


def test_normal_gravity_and_atmosphere_used_by_the_model():
    # Source: docs/reduction.md section 3 check values [C: closed form, two implementations]
    # and §3 Wenzel polynomial row [C].
    npt.assert_allclose(
        fm.normal_gravity_at_height([45.0, 0.0, 90.0, 30.0, 60.0], [1000.0, 0.0, 0.0, 3000.0, 5000.0]),
        [980311.43296, 978032.67715, 983218.63685, 978399.51352, 980377.40172],
        atol=5e-5,
    )
    npt.assert_allclose(fm.atmospheric_correction([0.0, 1000.0, 5000.0]), [0.874, 0.77856, 0.468], atol=1e-5)


def test_observed_gravity_on_a_flat_world_reduces_to_zero_with_the_cap():
    # g_obs - gamma(h) + g_atm - cap = 0 on flat topography with no bodies.
    fine, regional = _flat_world(1000.0)
    terrain = fm.terrain_attraction(0.0, 0.0, 1000.0, fine, regional)
    obs = fm.observed_gravity(45.0, 1000.0, terrain, 0.0)
    cap = 113.0754 * GRAVITATIONAL_CONSTANT / G_TABLE  # docs/reduction.md section 5, G scaled
    residual = obs - fm.normal_gravity_at_height(45.0, 1000.0) + fm.atmospheric_correction(1000.0) - cap
    npt.assert_allclose(residual, 0.0, atol=0.005)


def test_bundled_files_agree_with_the_model():
    ms = _load_scenario_script()
    from osgeo import gdal, ogr

    data = DEMO_DIR / "data"
    paths = [data / f"{ms.NAME}_{part}" for part in ("dem.tif", "regional.tif", "stations.gpkg")]
    if not all(p.exists() for p in paths):
        pytest.skip("demo/data not generated; run /usr/bin/python3 demo/make_scenario.py")

    def grid(path):
        ds = gdal.Open(str(path))
        west, cell, _, north, _, _ = ds.GetGeoTransform()
        return fm.HeightGrid(west, north, cell, ds.GetRasterBand(1).ReadAsArray().astype(float))

    fine, regional = grid(paths[0]), grid(paths[1])
    ds = ogr.Open(str(paths[2]))
    layer = ds.GetLayerByName("stations")
    rows = [
        (
            f.GetGeometryRef().GetX(),
            f.GetGeometryRef().GetY(),
            *(f[name] for name in ("elev_m", "body_mgal", "terrain_mgal", "obs_grav")),
        )
        for f in layer
    ]
    x, y, elev, body, terrain, obs = (np.array(c) for c in zip(*rows, strict=True))
    assert 300 <= x.size <= 400
    npt.assert_allclose(elev, fm.bilinear_height(fine, x, y), atol=5e-4)
    bodies = fm.PrismSet.concatenate(ms.sediment_fill(), ms.ostrel_intrusion())
    npt.assert_allclose(body, fm.body_attraction(x, y, elev, bodies), atol=1e-9)
    pick = [0, x.size // 2, x.size - 1]
    npt.assert_allclose(terrain[pick], fm.terrain_attraction(x[pick], y[pick], elev[pick], fine, regional), atol=1e-9)
    lat = ms.latitudes(x, y)
    residual = obs - fm.observed_gravity(lat, elev, terrain, body)
    # what is left is the seeded reading noise, sigma 0.01 mGal
    assert np.abs(residual).max() < 0.05
    assert 0.007 < residual.std() < 0.013
