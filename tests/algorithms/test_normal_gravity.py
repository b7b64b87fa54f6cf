# SPDX-License-Identifier: GPL-2.0-or-later
"""Normal gravity: Somigliana (GRS80, WGS84), the 1967 formula, closed form at height."""

import numpy as np
import pytest
from numpy.testing import assert_allclose
from scipy.integrate import trapezoid

from relief_gravity.algorithms import (
    GRS80,
    WGS84,
    check_latitude,
    normal_gravity,
    normal_gravity_1967,
    normal_gravity_at_height,
    valid_latitude,
)

LATITUDES = np.array([0.0, 15.0, 30.0, 45.0, 60.0, 75.0, 90.0])

# docs/reduction.md section 2, m/s^2. The 0 and 90 degree GRS80 values
# are Moritz (1980)'s published gamma_e, gamma_p [V]; WGS84 gamma_e, gamma_p
# as quoted from NIMA TR8350.2 by a secondary source [V2]; the other rows are
# [C] (own Somigliana and boule 0.6.0 agreeing to 1e-10 m/s^2).
GRS80_TABLE = np.array(
    [9.7803267715, 9.7837863976, 9.7932487036, 9.8061992025, 9.8191783849, 9.8286980584, 9.8321863685]
)
WGS84_TABLE = np.array(
    [9.7803253359, 9.7837849623, 9.7932472692, 9.8061977693, 9.8191769531, 9.8286966274, 9.8321849378]
)


def test_grs80_somigliana_matches_published_table():
    # Table given to 1e-10 m/s^2 = 1e-5 mGal.
    assert_allclose(normal_gravity(LATITUDES), GRS80_TABLE * 1e5, rtol=0, atol=1e-5)


def test_wgs84_somigliana_matches_published_table():
    assert_allclose(normal_gravity(LATITUDES, "wgs84"), WGS84_TABLE * 1e5, rtol=0, atol=1e-5)


def test_equator_and_pole_are_the_defining_values():
    # Moritz (1980): gamma_e = 9.7803267715, gamma_p = 9.8321863685 m/s^2 [V].
    assert_allclose(normal_gravity([0.0, 90.0, -90.0], GRS80), [978032.67715, 983218.63685, 983218.63685], atol=1e-6)


def test_wgs84_minus_grs80_at_equator():
    # docs/reduction.md section 2: WGS84 - GRS80 at the equator = -0.1436 mGal [C].
    assert_allclose(normal_gravity(0.0, "wgs84") - normal_gravity(0.0, "grs80"), -0.1436, atol=1e-4)


def test_somigliana_k_matches_moritz():
    # Moritz (1980) printed k = 0.001931851353 (from memory, docs/reduction.md section 2 [M]).
    assert_allclose(GRS80.somigliana_k, 0.001931851353, rtol=0, atol=1e-11)
    # GRS80 e^2 = 0.00669438002290 (Moritz 1980 [V]).
    assert_allclose(GRS80.first_eccentricity_squared, 0.00669438002290, rtol=0, atol=5e-15)
    # WGS84 e^2 = 0.00669437999014 (docs/reduction.md section 2 [V2]).
    assert_allclose(WGS84.first_eccentricity_squared, 0.00669437999014, rtol=0, atol=5e-15)


def test_mean_normal_gravity_over_the_ellipsoid():
    # Surface-mean normal gravity of GRS80 = 9.797644656 m/s^2 (docs/reduction.md
    # section 2: computed by quadrature, matching Moritz 1980 from memory).
    # Area element on the ellipsoid in geodetic latitude: M N cos(phi) dphi.
    phi = np.radians(np.linspace(-90.0, 90.0, 200001))
    e2 = GRS80.first_eccentricity_squared
    w = 1.0 - e2 * np.sin(phi) ** 2
    area = np.cos(phi) / w**2
    mean = trapezoid(normal_gravity(np.degrees(phi)) * area, phi) / trapezoid(area, phi)
    assert_allclose(mean / 1e5, 9.797644656, rtol=0, atol=2e-9)


def test_normal_gravity_is_symmetric_about_the_equator():
    # Self-consistency (rotational ellipsoid, no source needed).
    assert_allclose(normal_gravity(-LATITUDES), normal_gravity(LATITUDES), rtol=0, atol=1e-9)


def test_1967_formula_at_equator_and_pole():
    # Equator: the coefficient itself (README of clvf-usgs-gravity).
    assert_allclose(normal_gravity_1967(0.0), 978031.846, rtol=0, atol=1e-9)
    # Pole: GRS67 gamma_p = 9.8321772 m/s^2 (from memory, not verified);
    # the truncated series and the datum shift leave a few 0.01 mGal.
    assert_allclose(normal_gravity_1967(90.0), 983217.72, rtol=0, atol=0.05)


def test_1967_formula_versus_grs80_conversion():
    # gamma_GRS80 - gamma_1967 = 0.8316 + 0.0782 sin^2(phi) mGal (from memory,
    # the usual conversion quoted with GRS80; not verified).
    lat = np.linspace(-90.0, 90.0, 37)
    diff = normal_gravity(lat) - normal_gravity_1967(lat)
    assert_allclose(diff, 0.8316 + 0.0782 * np.sin(np.radians(lat)) ** 2, rtol=0, atol=0.01)


def test_closed_form_at_height_matches_reference_values():
    # docs/reduction.md section 3 check values, GRS80, mGal [C: two implementations
    # (own and boule 0.6.0) agree to 1e-6 mGal].
    lat = [45.0, 45.0, 0.0, 90.0, 30.0, 60.0]
    h = [0.0, 1000.0, 0.0, 0.0, 3000.0, 5000.0]
    expected = [980619.92025, 980311.43296, 978032.67715, 983218.63685, 978399.51352, 980377.40172]
    assert_allclose(normal_gravity_at_height(lat, h), expected, rtol=0, atol=1e-5)


def test_closed_form_on_the_ellipsoid_equals_somigliana():
    # Self-consistency: the closed form at h = 0 must reduce to Somigliana
    # (the published gamma_e, gamma_p versus the defining GM, omega agree to
    # the rounding of the published constants).
    lat = np.linspace(-90.0, 90.0, 181)
    for ell in (GRS80, WGS84):
        assert_allclose(normal_gravity_at_height(lat, 0.0, ell), normal_gravity(lat, ell), rtol=0, atol=1e-4)


def test_closed_form_height_change_matches_exact_column():
    # docs/reduction.md section 3, "exact" column: gamma(phi, h) - gamma(phi, 0), mGal [C].
    lat = np.array([0.0, 45.0, 45.0, 45.0, 45.0, 90.0])
    h = np.array([1000.0, 500.0, 1000.0, 3000.0, 5000.0, 1000.0])
    exact = [-308.7072, -154.2618, -308.4873, -925.0270, -1540.9873, -308.2664]
    assert_allclose(normal_gravity_at_height(lat, h) - normal_gravity(lat), exact, rtol=0, atol=1e-4)


def test_closed_form_is_smooth_below_the_ellipsoid():
    # Negative heights are evaluated as the downward continuation; the
    # gradient there must stay the normal free-air gradient, 0.3086 mGal/m
    # (common practice, no source) to within 0.001.
    h = np.array([-500.0, -100.0, -1.0, 0.0, 1.0])
    g = normal_gravity_at_height(45.0, h)
    assert np.all(np.isfinite(g))
    gradient = np.diff(g) / np.diff(h)
    assert_allclose(gradient, -0.3086, rtol=0, atol=1e-3)


def test_nan_latitude_propagates_and_invalid_latitude_raises():
    out = normal_gravity([45.0, np.nan])
    assert np.isfinite(out[0]) and np.isnan(out[1])
    with pytest.raises(ValueError, match=r"\[-90, 90\].*4251355.0"):
        normal_gravity([45.0, 4251355.0])
    with pytest.raises(ValueError, match=r"-90.5"):
        normal_gravity_1967(-90.5)
    with pytest.raises(ValueError, match=r"91.0"):
        normal_gravity_at_height(91.0, 0.0)
    with pytest.raises(ValueError, match=r"unknown ellipsoid 'clarke'"):
        normal_gravity(10.0, "clarke")


def test_check_latitude_lists_at_most_five_bad_values():
    with pytest.raises(ValueError, match=r"\.\.\. \(7 values out of range\)"):
        check_latitude(np.arange(7) + 100.0)


def test_valid_latitude():
    lat = np.array([-90.0, 0.0, 90.0, 90.0001, -123.15, np.nan, np.inf])
    assert valid_latitude(lat).tolist() == [True, True, True, False, False, False, False]


@pytest.mark.parametrize("name", ["grs80", "wgs84"])
def test_against_boule(name):
    # Independent reference: boule 0.6.0 (Fatiando a Terra), installed by
    # tools/setup.sh with --no-deps over Debian's numpy 1.24; skips on a
    # Python without it.
    boule = pytest.importorskip("boule")
    if not boule.__version__.lstrip("v").startswith("0.6"):
        pytest.skip(f"checked against boule 0.6.x, found {boule.__version__}")
    ellipsoid = {"grs80": boule.GRS80, "wgs84": boule.WGS84}[name]
    lat = np.linspace(-90.0, 90.0, 73)
    # boule 0.6 takes (longitude, latitude, height) and returns mGal.
    on_surface = ellipsoid.normal_gravity((0.0 * lat, lat, 0.0 * lat))
    assert_allclose(normal_gravity(lat, name), on_surface, rtol=0, atol=1e-5)
    lat2, h2 = np.meshgrid(lat, [0.0, 10.0, 1000.0, 4000.0, 9000.0])
    at_height = ellipsoid.normal_gravity((0.0 * lat2, lat2, h2))
    assert_allclose(normal_gravity_at_height(lat2, h2, name), at_height, rtol=0, atol=1e-5)
