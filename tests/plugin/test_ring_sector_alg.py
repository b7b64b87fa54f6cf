# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:terraincorrection with the ring-and-sector method (invented inputs)."""

from __future__ import annotations

import hashlib

import numpy as np
import pytest

RING_SECTOR = 1


def _run(params, feedback=None):
    import processing

    # Synthetic rasters share the stations' height datum.
    base = {"OUTPUT": "TEMPORARY_OUTPUT", "METHOD": RING_SECTOR, "HEIGHT_FIELD": "elev", "DEM_DATUM": 2}
    base.update(params)
    return processing.run("reliefgravity:terraincorrection", base, feedback=feedback)


def _values(layer, name):
    from qgis.core import NULL

    return np.array([np.nan if f[name] == NULL or f[name] is None else f[name] for f in layer.getFeatures()], dtype=float)


def _flags(layer):
    return [str(f["qc_flag"] or "") for f in layer.getFeatures()]


def _digest(path):
    return hashlib.sha256(open(path, "rb").read()).hexdigest()


@pytest.fixture
def small_and_regional(tmp_path, dem_writer):
    """A 4 km fine DEM (20 m cells, plain at 200 m) inside a 60 km regional
    DEM (500 m cells) holding a ridge 5-8 km east of the centre."""
    cx, cy = 500_000.0, 5_000_000.0
    fine = np.full((200, 200), 200.0)
    fine_path = dem_writer(tmp_path / "fine.tif", fine, cx - 2000.0, cy + 2000.0, 20.0)
    n = 120
    centres = -30_000.0 + (np.arange(n) + 0.5) * 500.0
    xx, _yy = np.meshgrid(centres, centres[::-1])
    regional = np.where((xx > 5000.0) & (xx < 8000.0), 700.0, 200.0)
    regional_path = dem_writer(tmp_path / "regional.tif", regional, cx - 30_000.0, cy + 30_000.0, 500.0)
    return fine_path, regional_path


def test_zones_are_validated_with_a_sentence(provider, stations_gpkg, hill_dem):
    from qgis.core import QgsProcessingException

    dem, _ = hill_dem
    with pytest.raises(QgsProcessingException, match="contiguous"):
        _run({"INPUT": str(stations_gpkg), "DEM": str(dem), "ZONES": "BCE"})
    with pytest.raises(QgsProcessingException, match="Unknown Hammer zone"):
        _run({"INPUT": str(stations_gpkg), "DEM": str(dem), "ZONES": "ABC"})


def test_log_says_how_far_the_zones_reach(provider, stations_gpkg, hill_dem, collecting_feedback):
    dem, _ = hill_dem
    before = _digest(stations_gpkg)
    layer = _run({"INPUT": str(stations_gpkg), "DEM": str(dem)}, collecting_feedback)["OUTPUT"]
    assert any("zones B–M reach 21.94 km; terrain beyond is not corrected" in line for line in collecting_feedback.infos)
    # 100 m cells: B and C are narrower than a cell and hold the sloping plane.
    assert any(line.startswith("Zones B, C are narrower than a DEM cell") for line in collecting_feedback.infos)
    inner, outer, total = (_values(layer, k) for k in ("tc_inner", "tc_outer", "tc_total"))
    ok = np.isfinite(total)
    assert ok.sum() >= 10
    np.testing.assert_allclose(inner[ok] + outer[ok], total[ok], rtol=1e-12)
    assert np.all(inner[ok] > 0) and np.all(outer[ok] > 0)
    # The 12 km DEM does not reach 21.9 km: partial coverage, as a code.
    assert all("tc_partial" in f.split(";") for f, good in zip(_flags(layer), ok, strict=True) if good)
    assert _digest(stations_gpkg) == before


def test_chosen_zones_and_inner_radius(provider, stations_gpkg, hill_dem, collecting_feedback):
    dem, _ = hill_dem
    all_zones = _run({"INPUT": str(stations_gpkg), "DEM": str(dem), "ZONE_FIELDS": True})["OUTPUT"]
    some = _run({"INPUT": str(stations_gpkg), "DEM": str(dem), "ZONES": "d-f", "ZONE_FIELDS": True}, collecting_feedback)["OUTPUT"]
    assert any("zones D–F cover 53.3 m to 0.89 km" in line for line in collecting_feedback.infos)
    names = some.fields().names()
    assert {"tc_d", "tc_e", "tc_f"} <= set(names) and "tc_b" not in names and "tc_g" not in names
    np.testing.assert_allclose(
        _values(some, "tc_total"), sum(_values(all_zones, n) for n in ("tc_d", "tc_e", "tc_f")), rtol=1e-9
    )
    # Inner radius 2 km (default) cuts zone H; 5018 ft is the outer edge of G.
    at_g = _run({"INPUT": str(stations_gpkg), "DEM": str(dem), "INNER_RADIUS": 5018 * 0.3048, "ZONE_FIELDS": True})["OUTPUT"]
    expected_inner = sum(_values(at_g, "tc_" + c) for c in "bcdefg")
    np.testing.assert_allclose(_values(at_g, "tc_inner"), expected_inner, rtol=1e-9)


def test_regional_raster_fills_beyond_the_fine_one(provider, make_points, small_and_regional):
    fine, regional = small_and_regional
    rows = [{"x": 500_000.0, "y": 5_000_000.0, "name": "c", "elev": 200.0, "g_obs": 0.0, "rho": 0.0, "tc_given": 0.0, "label": ""}]
    stations = make_points(rows, name="centre.gpkg")
    alone = _run({"INPUT": str(stations), "DEM": str(fine), "ZONES": "B-K"})["OUTPUT"]
    both = _run({"INPUT": str(stations), "DEM": str(fine), "REGIONAL_DEM": str(regional), "ZONES": "B-K"})["OUTPUT"]
    # Alone, the flat 4 km DEM sees no relief and covers a fraction of the rings.
    assert _values(alone, "tc_total")[0] == pytest.approx(0.0, abs=1e-12)
    assert _flags(alone)[0].split(";")[0] == "tc_partial"
    # With the regional raster the ridge 5-8 km away is seen, coverage is full,
    # and no void of the fine raster was filled (no tc_regional_fill).
    assert _values(both, "tc_total")[0] > 0.01
    assert _flags(both) == [""]
