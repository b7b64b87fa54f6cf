# SPDX-License-Identifier: GPL-2.0-or-later
"""Height, atmospheric, slab, cap and curvature corrections; density helpers."""

import warnings

import numpy as np
import pytest
from numpy.testing import assert_allclose
from scipy.integrate import quad

from relief_gravity.algorithms import (
    atmospheric_correction,
    bouguer_slab_correction,
    check_density,
    curvature_correction,
    density_to_kg_per_m3,
    height_correction,
    normal_gravity,
    normal_gravity_at_height,
    spherical_cap_correction,
)

# --- height correction -------------------------------------------------------

# docs/reduction.md section 3 table (mGal; the table gives the change of
# normal gravity g_h, our correction is -g_h). Hinze et al. (2005) formula [V2].
HEIGHT_CASES = [
    # (lat, h, Hinze 2005 column)
    (0.0, 1000.0, 308.6970),
    (45.0, 500.0, 154.2566),
    (45.0, 1000.0, 308.4771),
    (45.0, 3000.0, 924.9985),
    (45.0, 5000.0, 1540.9429),
    (90.0, 1000.0, 308.2572),
]


def test_hinze_height_correction_matches_reference_table():
    lat, h, expected = map(np.array, zip(*HEIGHT_CASES, strict=True))
    # Table to 1e-4 mGal.
    assert_allclose(height_correction(lat, h), expected, rtol=0, atol=6e-5)


def test_hinze_height_correction_is_the_published_formula():
    # Hinze et al. (2005): g_h = -(0.3087691 - 0.0004398 sin^2 phi) h
    # + 7.2125e-8 h^2 mGal [V2: docs/reduction.md section 3], written out here independently.
    lat = np.linspace(-90.0, 90.0, 19)[:, None]
    h = np.array([-400.0, 0.0, 13.0, 850.0, 2500.0, 6000.0])[None, :]
    g_h = -(0.3087691 - 0.0004398 * np.sin(np.radians(lat)) ** 2) * h + 7.2125e-8 * h**2
    assert_allclose(height_correction(lat, h, "second_order"), -g_h, rtol=0, atol=1e-6)


def test_hinze_versus_exact_closed_form():
    # docs/reduction.md section 3: Hinze's series is within 0.01 mGal of the exact closed
    # form at 1 km and within 0.045 mGal at 5 km [C].
    lat = np.array([0.0, 30.0, 45.0, 60.0, 90.0])
    for h, tol in ((1000.0, 0.011), (5000.0, 0.046)):
        exact = normal_gravity(lat) - normal_gravity_at_height(lat, h)
        assert_allclose(height_correction(lat, h), exact, rtol=0, atol=tol)


def test_first_order_height_correction():
    # Classic 0.3086 mGal/m (docs/reduction.md section 3 [V: SLB glossary]).
    out = height_correction([0.0, 45.0, 90.0], [1000.0, 1000.0, -20.0], "first_order")
    assert_allclose(out, [308.6, 308.6, -6.172], rtol=0, atol=1e-9)
    # Does not depend on latitude, so a NaN latitude leaves it finite.
    assert_allclose(height_correction([np.nan, 10.0], 100.0, "first_order"), [30.86, 30.86], rtol=1e-14)
    assert height_correction(np.zeros((2, 3)), 1.0, "first_order").shape == (2, 3)
    # Feet: 0.09406 mGal/ft (docs/reduction.md section 3).
    assert_allclose(height_correction(45.0, 0.3048, "first_order"), 0.09406, rtol=0, atol=1e-5)


def test_height_correction_rejects_unknown_method_and_bad_latitude():
    with pytest.raises(ValueError, match=r"unknown height correction method 'third_order'"):
        height_correction(45.0, 100.0, "third_order")
    with pytest.raises(ValueError, match=r"latitude must lie within"):
        height_correction(120.0, 100.0)


# --- atmospheric correction --------------------------------------------------

ATM_HEIGHTS_KM = np.arange(0.0, 5.01, 0.5)
# docs/reduction.md section 4: Wenzel (1985) polynomial evaluated [C] and the IAG table
# published with GRS80 (Moritz 1980) [V2], mGal.
ATM_POLYNOMIAL = [0.87400, 0.82539, 0.77856, 0.73351, 0.69024, 0.64875, 0.60904, 0.57111, 0.53496, 0.50059, 0.46800]
ATM_IAG_TABLE = [0.87, 0.82, 0.77, 0.73, 0.68, 0.64, 0.60, 0.57, 0.53, 0.50, 0.47]


def test_atmospheric_correction_matches_wenzel_polynomial():
    assert_allclose(atmospheric_correction(ATM_HEIGHTS_KM * 1000.0), ATM_POLYNOMIAL, rtol=0, atol=6e-6)


def test_atmospheric_correction_close_to_iag_table():
    # The table is rounded to 0.01 mGal, hence 0.011 rather than 0.01.
    assert_allclose(atmospheric_correction(ATM_HEIGHTS_KM * 1000.0), ATM_IAG_TABLE, rtol=0, atol=0.011)


# --- Bouguer slab --------------------------------------------------------------


@pytest.mark.parametrize(
    ("big_g", "per_gcc", "per_2670"),
    # docs/reduction.md section 5 [C]: 2 pi G 1000 and 2 pi G 2670, mGal per metre.
    [
        (6.670e-11, 0.041909, 0.111897),
        (6.673e-11, 0.041928, 0.111947),
        (6.674e-11, 0.041934, 0.111964),
        (6.6743e-11, 0.041936, 0.111969),
    ],
)
def test_slab_gradients(big_g, per_gcc, per_2670):
    assert_allclose(bouguer_slab_correction(1.0, 1000.0, big_g), per_gcc, rtol=0, atol=6e-7)
    assert_allclose(bouguer_slab_correction(1.0, 2670.0, big_g), per_2670, rtol=0, atol=6e-7)


def test_slab_check_values():
    # docs/reduction.md section 5: h = 1000 m, rho = 2670: 111.96876 mGal with G = 6.6743e-11
    # (the default, CODATA 2018) and 111.9637 with G = 6.674e-11 [C].
    assert_allclose(bouguer_slab_correction(1000.0, 2670.0), 111.96876, rtol=0, atol=6e-6)
    assert_allclose(bouguer_slab_correction(1000.0, 2670.0, 6.674e-11), 111.9637, rtol=0, atol=6e-5)


def test_slab_is_signed_and_broadcasts_density():
    out = bouguer_slab_correction([1000.0, -1000.0, 0.0], [2670.0, 2670.0, 2000.0])
    assert_allclose(out, [111.96876, -111.96876, 0.0], rtol=0, atol=6e-6)
    per_station = bouguer_slab_correction(100.0, np.array([2000.0, 2670.0]))
    assert_allclose(per_station[1] / per_station[0], 2670.0 / 2000.0, rtol=1e-14)


# --- spherical cap and Bullard B ---------------------------------------------

# docs/reduction.md section 5, rho = 2670, R0 = 6371 km, S = 166.735 km.
CAP_HEIGHTS = np.array([0.0, 100, 500, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500, 5000, 6000])
# LaFehr (1991) table as transcribed in pygeoid's test data [V2], reproduced
# with G = 6.67e-11 to +-0.0005 mGal.
LAFEHR_TABLE_BB = np.array(
    [0.0, 0.143, 0.644, 1.111, 1.402, 1.516, 1.454, 1.216, 0.801, 0.211, -0.555, -1.497, -3.908]
)
# Closed form cross-checked by quadrature, G = 6.674e-11 [C].
CAP_G6674 = np.array(
    [0.0, 11.3393, 56.6260, 113.0754, 169.3481, 225.4444, 281.3642,
     337.1077, 392.6750, 448.0661, 503.2813, 558.3206, 667.8719]
)
# Bullard B, G = 6.6743e-11 [C].
BB_G66743 = np.array(
    [0.0, 0.1430, 0.6442, 1.1117, 1.4026, 1.5170, 1.4550, 1.2166, 0.8020, 0.2113, -0.5555, -1.4981, -3.9106]
)


def test_bullard_b_matches_lafehr_table():
    bb = curvature_correction(CAP_HEIGHTS, 2670.0, gravitational_constant=6.67e-11)
    assert_allclose(bb, LAFEHR_TABLE_BB, rtol=0, atol=5.5e-4)


def test_cap_and_bullard_b_match_computed_columns():
    cap = spherical_cap_correction(CAP_HEIGHTS, 2670.0, gravitational_constant=6.674e-11)
    assert_allclose(cap, CAP_G6674, rtol=0, atol=6e-5)
    assert_allclose(curvature_correction(CAP_HEIGHTS, 2670.0), BB_G66743, rtol=0, atol=6e-5)


def _cap_oracle(h, density, big_g, cap_radius=166_735.0, earth_radius=6_371_000.0):
    """Independent oracle (docs/reduction.md section 5 [C]): quadrature of the axial attraction
    of a cap between radii R0 and R0 + h, polar angle alpha, station at R0 + h."""
    alpha = cap_radius / earth_radius
    r_s = earth_radius + h

    def integrand(r):
        return r * r * (1.0 - (r_s * np.cos(alpha) - r) / np.sqrt(r_s * r_s + r * r - 2.0 * r_s * r * np.cos(alpha)))

    value, _ = quad(integrand, earth_radius, earth_radius + h, epsabs=0.0, epsrel=1e-12)
    return 2.0 * np.pi * big_g * density / r_s**2 * value * 1e5


@pytest.mark.parametrize("h", [1.0, 37.5, 250.0, 1000.0, 2100.0, 4150.0, 6000.0, 8848.0])
def test_cap_matches_quadrature_oracle(h):
    # docs/reduction.md section 5: closed form = quadrature to 1e-4 mGal; we ask 1e-6.
    for big_g, rho in ((6.6743e-11, 2670.0), (6.67e-11, 2000.0)):
        assert_allclose(spherical_cap_correction(h, rho, big_g), _cap_oracle(h, rho, big_g), rtol=0, atol=1e-6)


@pytest.mark.parametrize("h", [-1.0, -100.0, -430.0, -1000.0])
def test_cap_below_datum_is_the_continued_oracle(h):
    # Documented choice for h < 0: the same closed form, equal to the oracle
    # integral taken from R0 down to R0 + h (analytic continuation).
    cap = spherical_cap_correction(h)
    assert np.isfinite(cap) and cap < 0.0
    assert_allclose(cap, _cap_oracle(h, 2670.0, 6.6743e-11), rtol=0, atol=1e-6)
    # Its flat part is the signed slab; the curvature term stays small.
    assert abs(cap - bouguer_slab_correction(h)) < 2e-3 * abs(h) + 1e-9


def test_cap_below_datum_is_not_a_mirror_image():
    # The figures quoted in the spherical_cap_correction docstring.
    diff = spherical_cap_correction([-100.0, -430.0]) + spherical_cap_correction([100.0, 430.0])
    assert_allclose(diff, [-0.0071, -0.1307], rtol=0, atol=1e-4)


def test_curvature_is_cap_minus_slab():
    h = np.linspace(-1000.0, 9000.0, 101)
    rho = np.linspace(1800.0, 3000.0, 101)
    diff = spherical_cap_correction(h, rho) - bouguer_slab_correction(h, rho)
    assert_allclose(curvature_correction(h, rho), diff, rtol=0, atol=1e-9)


def test_bullard_b_shape():
    # docs/reduction.md section 5 [C]: B peaks at ~1.52 mGal near 2.1 km and changes
    # sign near 4.15 km (rho = 2670).
    h = np.linspace(0.0, 6000.0, 60001)
    bb = curvature_correction(h, 2670.0)
    assert_allclose(h[np.argmax(bb)], 2100.0, atol=100.0)
    assert_allclose(bb.max(), 1.52, atol=0.01)
    crossing = h[1:][(bb[:-1] > 0) & (bb[1:] <= 0)]
    assert crossing.size == 1
    assert_allclose(crossing[0], 4150.0, atol=50.0)


def test_bullard_b_small_heights():
    # At h = 0 both vanish; for small h, B is linear in h. The USGS polynomial
    # quoted in ../shared/data/clvf-usgs-gravity/README.md has linear term
    # 1.464e-3 mGal/m (rho = 2670, G of that database): within 0.2 %.
    assert_allclose(spherical_cap_correction(0.0), 0.0, atol=1e-9)
    assert_allclose(curvature_correction(0.0), 0.0, atol=1e-9)
    assert_allclose(curvature_correction(1e-3) / 1e-3, 1.464e-3, rtol=2e-3)


def test_whitman_style_three_term_approximation():
    # docs/reduction.md section 5: B ~ 2 pi G rho h [alpha/2 - eta/(2 alpha) - eta] matches
    # the exact values to <= 1 microGal up to ~2.5 km [M/C]; not Whitman's own
    # formula, used here only as an independent shape check.
    h = np.linspace(0.0, 2500.0, 26)
    alpha, eta = 166_735.0 / 6_371_000.0, h / 6_371_000.0
    approx = bouguer_slab_correction(h) * (alpha / 2.0 - eta / (2.0 * alpha) - eta)
    assert_allclose(curvature_correction(h), approx, rtol=0, atol=1e-3)  # 1 microGal


# --- density helpers -----------------------------------------------------------


def test_density_unit_conversion():
    assert_allclose(density_to_kg_per_m3(2.67, "g/cm3"), 2670.0, rtol=1e-15)
    assert_allclose(density_to_kg_per_m3([2.0, 2.67], "g/cm^3"), [2000.0, 2670.0], rtol=1e-15)
    assert_allclose(density_to_kg_per_m3(2670.0, "kg/m\u00b3"), 2670.0, rtol=0)
    assert_allclose(density_to_kg_per_m3(2.3, "g/cc"), 2300.0, rtol=1e-15)
    with pytest.raises(ValueError, match=r"unknown density unit 'lb/ft3'"):
        density_to_kg_per_m3(170.0, "lb/ft3")


def test_check_density_accepts_plausible_values_silently():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        out = check_density([1000.0, 2670.0, 3500.0])
    assert out.dtype == np.float64


@pytest.mark.parametrize("bad", [0.0, -2670.0, np.inf])
def test_check_density_rejects_non_positive(bad):
    with pytest.raises(ValueError, match=r"density must be a positive number of kg/m\^3"):
        check_density([2670.0, bad])


def test_check_density_nan():
    with pytest.raises(ValueError, match=r"NaN at 1 position"):
        check_density([2670.0, np.nan])
    out = check_density([2670.0, np.nan], allow_nan=True)
    assert np.isnan(out[1])


def test_check_density_warns_for_gcc_values():
    with pytest.warns(UserWarning, match=r"2\.67 kg/m\^3 is outside .* looks like g/cm\^3: multiply by 1000"):
        check_density(2.67)


def test_check_density_warns_for_implausible_values_without_unit_hint():
    with pytest.warns(UserWarning, match=r"5000\.0 kg/m\^3 is outside the plausible range 1000-3500") as record:
        check_density([2670.0, 5000.0])
    assert "g/cm" not in str(record[0].message)
