# SPDX-License-Identifier: GPL-2.0-or-later
"""The reduction chain: worked example, sign conventions, options, NaN, bad input."""

import warnings

import numpy as np
import pytest
from numpy.testing import assert_allclose

from relief_gravity.algorithms import (
    REDUCTION_FIELDS,
    bouguer_slab_correction,
    complete_bouguer_anomaly,
    curvature_correction,
    free_air_anomaly,
    normal_gravity,
    normal_gravity_1967,
    normal_gravity_at_height,
    reduce_gravity,
    simple_bouguer_anomaly,
    valid_latitude,
)

# docs/reduction.md section 7, worked example [C]: phi = 45 deg,
# ellipsoidal h = 1000 m, g_obs = 980400 mGal, rho = 2670, G = 6.6743e-11,
# TC = 2.5 mGal. Values in mGal, given to 1e-5.
OBS, LAT, H, TC = 980_400.0, 45.0, 1000.0, 2.5
ATOL = 6e-6


def test_worked_example_full_chain():
    out = reduce_gravity(OBS, LAT, H, 2670.0, terrain_correction=TC)
    assert_allclose(out["normal_g"], 980_619.92025, rtol=0, atol=ATOL)  # gamma_0 GRS80
    assert_allclose(out["height_corr"], 308.47708, rtol=0, atol=ATOL)  # -g_h (Hinze 2005)
    assert_allclose(out["atmos_corr"], 0.77856, rtol=0, atol=ATOL)  # Wenzel/Hinze
    assert_allclose(out["faa"], 89.33538, rtol=0, atol=ATOL)
    assert_allclose(out["slab_corr"], 111.96876, rtol=0, atol=ATOL)
    assert_allclose(out["curv_corr"], 1.11170, rtol=0, atol=ATOL)  # BB
    assert_allclose(out["slab_corr"] + out["curv_corr"], 113.08046, rtol=0, atol=ATOL)  # cap
    assert_allclose(out["sba"], -23.74507, rtol=0, atol=ATOL)  # simple Bouguer (cap)
    assert_allclose(out["tc_total"], 2.5, rtol=0, atol=0)
    assert_allclose(out["cba"], -21.24507, rtol=0, atol=ATOL)


def test_worked_example_variants():
    # Same source, other rows: closed-form gamma(phi, h) instead of gamma_0 + g_h.
    at_height = reduce_gravity(OBS, LAT, H, normal_at_height=True)
    assert_allclose(at_height["faa"], 89.34560, rtol=0, atol=ATOL)
    assert_allclose(at_height["height_corr"], 0.0, atol=0)
    assert_allclose(at_height["normal_g"], normal_gravity_at_height(LAT, H), rtol=0, atol=1e-9)
    # Classic: g_obs - gamma_0 + 0.3086 h, no atmosphere.
    classic = reduce_gravity(OBS, LAT, H, height_formula="first_order", atmospheric=False, curvature=False)
    assert_allclose(classic["faa"], 88.67975, rtol=0, atol=ATOL)
    # Simple Bouguer with the flat slab only.
    slab_only = reduce_gravity(OBS, LAT, H, curvature=False)
    assert_allclose(slab_only["sba"], -22.63337, rtol=0, atol=ATOL)
    assert_allclose(slab_only["curv_corr"], 0.0, atol=0)


def test_anomaly_functions_follow_developers_signs():
    # DEVELOPERS.md: faa = g_obs - normal_g + height_corr + atmos_corr;
    # sba = faa - slab_corr - curv_corr; cba = sba + tc_total.
    rng = np.random.default_rng(7)
    g, n, hc, at, sl, cu, tc = rng.normal(size=(7, 20))
    assert_allclose(free_air_anomaly(g, n, hc, at), g - n + hc + at, rtol=1e-15, atol=0)
    assert_allclose(simple_bouguer_anomaly(g, sl, cu), g - sl - cu, rtol=1e-15, atol=0)
    assert_allclose(complete_bouguer_anomaly(g, tc), g + tc, rtol=1e-15, atol=0)


def test_fields_identities_and_dtype():
    rng = np.random.default_rng(11)
    n = 50
    lat = rng.uniform(-89.0, 89.0, n)
    h = rng.uniform(-200.0, 4000.0, n)
    obs = normal_gravity(lat) - 0.3 * h + rng.normal(0.0, 30.0, n)
    tc = rng.uniform(0.0, 20.0, n)
    out = reduce_gravity(obs, lat, h, 2670.0, tc)
    assert tuple(out) == REDUCTION_FIELDS
    # output field names (docs/reduction.md section 6).
    design_fields = {"normal_g", "height_corr", "atmos_corr", "slab_corr", "curv_corr"}
    design_fields |= {"tc_inner", "tc_outer", "tc_total", "faa", "sba", "cba"}
    assert set(REDUCTION_FIELDS) <= design_fields
    for key, value in out.items():
        assert value.dtype == np.float64, key
        assert value.shape == (n,), key
        assert np.all(np.isfinite(value)), key
    assert_allclose(out["faa"], obs - out["normal_g"] + out["height_corr"] + out["atmos_corr"], rtol=0, atol=1e-9)
    assert_allclose(out["sba"], out["faa"] - out["slab_corr"] - out["curv_corr"], rtol=0, atol=1e-9)
    assert_allclose(out["cba"], out["sba"] + tc, rtol=0, atol=1e-9)
    # Station below the datum: slab and cap negative.
    below = h < 0
    assert below.any() and np.all(out["slab_corr"][below] < 0)


def test_normal_formula_choice():
    lat = np.array([10.0, 38.8, 70.0])
    h = np.array([100.0, 500.0, 900.0])
    obs = np.full(3, 980_000.0)
    wgs = reduce_gravity(obs, lat, h, normal_formula="wgs84")
    assert_allclose(wgs["normal_g"], normal_gravity(lat, "wgs84"), rtol=0, atol=0)
    legacy = reduce_gravity(obs, lat, h, normal_formula="1967")
    assert_allclose(legacy["normal_g"], normal_gravity_1967(lat), rtol=0, atol=0)
    wgs_at_h = reduce_gravity(obs, lat, h, normal_formula="WGS84", normal_at_height=True)
    assert_allclose(wgs_at_h["normal_g"], normal_gravity_at_height(lat, h, "wgs84"), rtol=0, atol=0)
    with pytest.raises(ValueError, match=r"unknown normal gravity formula 'grs67'"):
        reduce_gravity(obs, lat, h, normal_formula="grs67")
    with pytest.raises(ValueError, match=r"unknown height correction formula 'exact'"):
        reduce_gravity(obs, lat, h, height_formula="exact")
    with pytest.raises(ValueError, match=r"normal_at_height needs an ellipsoid"):
        reduce_gravity(obs, lat, h, normal_formula="1967", normal_at_height=True)


def test_switches_zero_their_terms():
    out = reduce_gravity([980_000.0, 979_900.0], [30.0, 31.0], [200.0, 300.0], atmospheric=False, curvature=False)
    assert_allclose(out["atmos_corr"], 0.0, atol=0)
    assert_allclose(out["curv_corr"], 0.0, atol=0)
    assert_allclose(out["sba"], out["faa"] - out["slab_corr"], rtol=0, atol=1e-12)


def test_without_terrain_correction_cba_is_nan():
    # Documented choice: no TC given -> tc_total and cba NaN (a CBA without
    # TC would be mislabelled); the rest is computed.
    out = reduce_gravity([980_400.0, 980_000.0], [45.0, 40.0], [1000.0, 10.0])
    assert np.all(np.isnan(out["tc_total"])) and np.all(np.isnan(out["cba"]))
    for key in ("normal_g", "height_corr", "atmos_corr", "slab_corr", "curv_corr", "faa", "sba"):
        assert np.all(np.isfinite(out[key])), key


def test_scalar_inputs_give_zero_dimensional_arrays():
    out = reduce_gravity(OBS, LAT, H, terrain_correction=TC)
    for key, value in out.items():
        assert isinstance(value, np.ndarray) and value.shape == (), key


@pytest.mark.parametrize(
    ("column", "affected"),
    [
        ("observed", {"faa", "sba", "cba"}),
        ("latitude", {"normal_g", "height_corr", "faa", "sba", "cba"}),
        ("height", {"height_corr", "atmos_corr", "slab_corr", "curv_corr", "faa", "sba", "cba"}),
        ("density", {"slab_corr", "curv_corr", "sba", "cba"}),
        ("terrain_correction", {"tc_total", "cba"}),
    ],
)
def test_nan_propagates_to_affected_outputs_only(column, affected):
    inputs = {
        "observed": np.array([980_400.0, 979_950.0, 979_500.0]),
        "latitude": np.array([45.0, 38.4, -12.0]),
        "height": np.array([1000.0, 137.0, 2500.0]),
        "density": np.array([2670.0, 2400.0, 2800.0]),
        "terrain_correction": np.array([2.5, 2.76, 11.0]),
    }
    clean = reduce_gravity(**inputs)
    inputs[column] = inputs[column].copy()
    inputs[column][1] = np.nan
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # no RuntimeWarning from NaN arithmetic either
        out = reduce_gravity(**inputs)
    for key in REDUCTION_FIELDS:
        # Other stations untouched.
        assert_allclose(out[key][[0, 2]], clean[key][[0, 2]], rtol=0, atol=0)
        if key in affected:
            assert np.isnan(out[key][1]), key
        else:
            assert_allclose(out[key][1], clean[key][1], rtol=0, atol=0)


def test_nan_height_with_normal_at_height():
    out = reduce_gravity([980_400.0, 980_400.0], [45.0, 45.0], [1000.0, np.nan], normal_at_height=True)
    assert np.isnan(out["normal_g"][1]) and np.isnan(out["faa"][1])
    assert out["height_corr"][1] == 0.0 and np.isfinite(out["faa"][0])


def test_per_station_density():
    lat = np.array([38.5, 38.6, 38.7])
    h = np.array([150.0, 800.0, 1500.0])
    obs = np.array([979_990.0, 979_850.0, 979_700.0])
    tc = np.array([1.0, 4.0, 12.0])
    rho = np.array([2000.0, 2670.0, 2900.0])
    out = reduce_gravity(obs, lat, h, rho, tc)
    for i in range(3):
        single = reduce_gravity(obs[i], lat[i], h[i], rho[i], tc[i])
        for key in REDUCTION_FIELDS:
            assert_allclose(out[key][i], single[key], rtol=0, atol=1e-9)
    assert_allclose(out["slab_corr"], bouguer_slab_correction(h, rho), rtol=1e-15)
    assert_allclose(out["curv_corr"], curvature_correction(h, rho), rtol=1e-13)
    # A density does not change the free-air anomaly.
    assert_allclose(out["faa"], reduce_gravity(obs, lat, h, 2670.0, tc)["faa"], rtol=0, atol=0)


def test_gravitational_constant_keyword():
    # docs/reduction.md section 5: G = 6.674e-11 gives a 1 km, 2670 kg/m^3 slab of 111.9637 mGal [C].
    out = reduce_gravity(OBS, LAT, H, gravitational_constant=6.674e-11)
    assert_allclose(out["slab_corr"], 111.9637, rtol=0, atol=6e-5)


def test_invalid_latitude_raises_and_prefilter_works():
    lat = np.array([45.0, 95.0, -91.5, 38.0])
    obs = np.full(4, 980_000.0)
    h = np.full(4, 100.0)
    with pytest.raises(ValueError, match=r"latitude must lie within \[-90, 90\] degrees; got 95\.0, -91\.5 \(2 values"):
        reduce_gravity(obs, lat, h)
    keep = valid_latitude(lat)
    out = reduce_gravity(obs[keep], lat[keep], h[keep])
    assert out["faa"].shape == (2,) and np.all(np.isfinite(out["faa"]))


def test_bad_density_raises_or_warns():
    with pytest.raises(ValueError, match=r"density must be a positive number of kg/m\^3; got 0\.0"):
        reduce_gravity(OBS, LAT, H, density=0.0)
    with pytest.raises(ValueError, match=r"got -2670\.0"):
        reduce_gravity([OBS, OBS], [LAT, LAT], [H, H], density=[2670.0, -2670.0])
    with pytest.warns(UserWarning, match=r"2\.67 kg/m\^3 .*looks like g/cm\^3"):
        out = reduce_gravity(OBS, LAT, H, density=2.67, terrain_correction=TC)
    # Still computed (a warning, not an error): the slab is a thousand times smaller.
    assert_allclose(out["slab_corr"], 0.11196876, rtol=0, atol=1e-8)


def test_plausible_density_gives_no_warning():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        reduce_gravity([OBS, OBS], [LAT, LAT], [H, H], density=[2670.0, 1030.0])
