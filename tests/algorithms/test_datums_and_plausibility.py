# SPDX-License-Identifier: GPL-2.0-or-later
"""Height datums, unit plausibility and the flag vocabulary (pure functions)."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms import datums, plausibility, qc


def test_conversions_are_inverse_and_follow_h_equals_H_plus_N():
    # h = H + N (Heiskanen & Moritz 1967, eq. 4-24).
    n = np.array([46.7, -20.0])
    ortho = np.array([500.0, 30.0])
    ellipsoidal = ortho + n
    from_ortho = datums.datum_offsets(datums.STATION_EGM96, datums.DEM_EGM96, egm96=n)
    from_ellipsoid = datums.datum_offsets(datums.STATION_ELLIPSOIDAL, datums.DEM_EGM96, egm96=n)
    np.testing.assert_allclose(from_ortho.station_in_dem_datum(ortho), ortho)
    np.testing.assert_allclose(from_ellipsoid.station_in_dem_datum(ellipsoidal), ortho)
    np.testing.assert_allclose(from_ortho.station_ellipsoidal(ortho), ellipsoidal)
    same = datums.datum_offsets(datums.STATION_GEOID_GIVEN, datums.DEM_SAME_AS_STATIONS, given=n)
    np.testing.assert_allclose(same.station_in_dem_datum(ortho), ortho)
    np.testing.assert_allclose(same.dem_ellipsoidal(ortho), ellipsoidal)


def test_missing_geoid_is_an_error():
    with pytest.raises(ValueError, match="EGM96"):
        datums.datum_offsets(datums.STATION_ELLIPSOIDAL, datums.DEM_EGM96)
    with pytest.raises(ValueError, match="user"):
        datums.datum_offsets(datums.STATION_GEOID_GIVEN, datums.DEM_ELLIPSOID)


def test_bilinear_global_reproduces_a_plane_and_wraps_in_longitude():
    step = 0.25
    lons = -180.0 + step * np.arange(1440)
    lats = 90.0 - step * np.arange(721)
    grid = 2.0 * lats[:, None] + 0.0 * lons[None, :]
    out = datums.bilinear_global(grid, [179.9, -179.9, 12.3], [10.1, 10.1, -33.3], -180.0, 90.0, step)
    np.testing.assert_allclose(out, [20.2, 20.2, -66.6], atol=1e-9)
    # Across the antimeridian: half-way between the last column and the first.
    ring = np.tile(np.where(np.arange(1440) == 0, 1.0, 0.0), (721, 1))
    assert datums.bilinear_global(ring, [179.875], [0.0], -180.0, 90.0, step)[0] == pytest.approx(0.5)


@pytest.mark.parametrize(
    ("height_datum", "dem_datum", "sign", "expected"),
    [
        # Stations ellipsoidal but declared orthometric: stations one N above the DEM.
        (datums.STATION_EGM96, datums.DEM_EGM96, +1, ("HEIGHT_DATUM", datums.STATION_ELLIPSOIDAL)),
        # DEM geoid-referenced but declared ellipsoidal.
        (datums.STATION_ELLIPSOIDAL, datums.DEM_ELLIPSOID, +1, ("DEM_DATUM", datums.DEM_EGM96)),
        # Ellipsoidal DEM declared EGM96 (the default), GNSS stations.
        (datums.STATION_ELLIPSOIDAL, datums.DEM_EGM96, -1, ("DEM_DATUM", datums.DEM_ELLIPSOID)),
        # Orthometric stations declared ellipsoidal with an ellipsoidal DEM.
        (datums.STATION_ELLIPSOIDAL, datums.DEM_ELLIPSOID, -1, ("HEIGHT_DATUM", datums.STATION_EGM96)),
    ],
)
def test_datum_diagnosis_names_the_setting(height_datum, dem_datum, sign, expected):
    rng = np.random.default_rng(3)
    n = 47.0 + rng.normal(0, 0.3, 50)
    diff = sign * n + rng.normal(0, 1.5, 50)
    hint = datums.diagnose_datum(diff, n, height_datum, dem_datum)
    assert (hint.parameter, hint.option) == expected
    assert hint.sign == sign and hint.share > 0.9


def test_no_datum_hint_for_scattered_or_small_offsets():
    rng = np.random.default_rng(4)
    assert datums.diagnose_datum(rng.normal(0, 5, 40), np.full(40, 47.0), 0, 0) is None
    # Where the geoid is near zero an offset says nothing about datums.
    assert datums.diagnose_datum(np.full(10, 2.0), np.full(10, 2.0), 0, 0) is None


def test_gravity_units_and_range():
    # SI definitions: 1 Gal = 1000 mGal, 1 um/s2 = 0.1 mGal, 1 m/s2 = 1e5 mGal.
    assert plausibility.gravity_to_mgal([1.0], 1)[0] == pytest.approx(0.1)
    assert plausibility.gravity_to_mgal([1.0], 2)[0] == pytest.approx(1000.0)
    assert plausibility.gravity_to_mgal([1.0], 3)[0] == pytest.approx(1e5)
    values = {0: 980_612.3, 1: 9_806_123.0, 2: 980.6123, 3: 9.806123}
    for units, value in values.items():
        assert plausibility.check_gravity([value] * 5, units) is None
        for declared in range(4):
            if declared != units:
                assert plausibility.check_gravity([value] * 5, declared).likely_units == units
    zeros = plausibility.check_gravity([0.0] * 4, 0)
    assert zeros.zeros and zeros.likely_units is None
    relative = plausibility.check_gravity([3_012.5, 3_020.1], 0)
    assert relative.likely_units is None and not relative.zeros
    # One bad station out of many is a row problem, not a run problem.
    assert plausibility.check_gravity([980_600.0] * 9 + [0.0], 0) is None


def test_height_scale_and_dem_problems():
    dem = np.linspace(250.0, 1400.0, 30)
    assert plausibility.height_scale_problem(dem / 0.3048, dem) == "feet"
    assert plausibility.height_scale_problem(dem * 100.0, dem) == "centimetres"
    assert plausibility.height_scale_problem(dem * 0.3048, dem) == "inverse_feet"
    assert plausibility.height_scale_problem(dem * 0.01, dem) == "inverse_centimetres"
    # A geoid-sized offset is a datum question, not a unit one.
    assert plausibility.height_scale_problem(dem + 47.0, dem) is None
    assert plausibility.height_scale_problem(dem - 100.0, dem) is None
    assert plausibility.dem_value_problem(-32767.0, 900.0, False).kind == "void"
    assert plausibility.dem_value_problem(-12_000.0, 900.0, True).kind == "too_low"
    assert plausibility.dem_value_problem(-420.0, 8_800.0, False) is None


def test_density_limits_name_the_factor():
    lo, hi = plausibility.DENSITY_LIMITS
    assert plausibility.density_problem(lo) is None and plausibility.density_problem(hi) is None
    assert plausibility.density_problem(2.67).factor == 1000.0
    assert plausibility.density_problem(1e6).factor == 0.001
    assert plausibility.density_problem(1e9).factor is None
    assert plausibility.density_problem(float("nan")).factor is None


def test_new_codes_are_valid_vocabulary_entries():
    for code in ("multipart_distinct", "gravity_implausible", "density_bad", "height_dem_mismatch", "geoid_missing", "no_tc"):
        assert code in qc.VOCABULARY
    assert qc.severity_of(["height_dem_mismatch"]) == qc.WARNING
    assert qc.severity_of(["gravity_implausible", "height_from_dem"]) == qc.NOT_COMPUTED
