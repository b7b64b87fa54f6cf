# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:terraincorrection through processing.run (invented inputs)."""

from __future__ import annotations

import numpy as np
import pytest


def _run(params, feedback=None):
    import processing

    # The synthetic DEMs hold heights above the ellipsoid, like the stations.
    base = {"OUTPUT": "TEMPORARY_OUTPUT", "DEM_DATUM": 1}
    base.update(params)
    return processing.run("reliefgravity:terraincorrection", base, feedback=feedback)


def _values(layer, name):
    from qgis.core import NULL

    return np.array([np.nan if f[name] == NULL or f[name] is None else f[name] for f in layer.getFeatures()], dtype=float)


def _square_mesa(tmp_path, write_dem):
    """A raster that tiles a square mesa exactly: half-side a = 100 m, relief 50 m,
    plain to half-side L = 5 km, 10 m cells (docs/terrain.md section 11, case 7)."""
    cell = 10.0
    half = 5000.0
    n = int(2 * half / cell)
    centres = -half + (np.arange(n) + 0.5) * cell
    xx, yy = np.meshgrid(centres, centres[::-1])
    heights = np.where((np.abs(xx) < 100.0) & (np.abs(yy) < 100.0), 150.0, 100.0)
    west, north = 500_000.0 - half, 5_000_000.0 + half
    return write_dem(tmp_path / "mesa.tif", heights, west, north, cell)


def test_station_on_square_mesa_matches_prism_difference(provider, tmp_path, make_points, dem_writer):
    dem = _square_mesa(tmp_path, dem_writer)
    # Station on the mesa top at its centre (height 150 m): TC = 1.175474 mGal
    # for a = 100 m, h = 50 m, L = 5 km, rho = 2670, G = 6.6743e-11
    # (docs/terrain.md section 11, case 7, [C]: prism difference).
    rows = [{"x": 500_000.0, "y": 5_000_000.0, "name": "top", "elev": 150.0, "g_obs": 0.0, "rho": 0.0, "tc_given": 0.0, "label": ""}]
    stations = make_points(rows, name="mesa_station.gpkg")
    result = _run({"INPUT": str(stations), "HEIGHT_FIELD": "elev", "DEM": str(dem), "INNER_RADIUS": 2000.0, "OUTER_RADIUS": 4990.0})
    layer = result["OUTPUT"]
    total = _values(layer, "tc_total")[0]
    assert total == pytest.approx(1.175474, abs=0.02)
    assert _values(layer, "dem_diff")[0] == pytest.approx(0.0, abs=1e-6)


def test_density_scales_linearly_and_fields_are_added(provider, stations_gpkg, hill_dem):
    dem, _ = hill_dem
    a = _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem), "OUTER_RADIUS": 20000.0, "DENSITY": 2000.0})["OUTPUT"]
    b = _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem), "OUTER_RADIUS": 20000.0, "DENSITY": 2670.0})["OUTPUT"]
    for name in ("tc_inner", "tc_outer", "tc_total", "dem_diff", "tc_cover", "qc_flag"):
        assert name in a.fields().names()
    # Terrain correction is linear in density (common practice, no source).
    np.testing.assert_allclose(_values(b, "tc_total"), _values(a, "tc_total") * 2670.0 / 2000.0, rtol=1e-9)
    assert np.all(_values(a, "tc_inner") >= 0)
    # The 12 km DEM does not reach 20 km: coverage is reported and flagged.
    assert np.all(_values(a, "tc_cover") < 1.0)
    assert all("tc_partial" in flag for flag in (f["qc_flag"] for f in a.getFeatures()))


def test_station_height_differs_from_dem_is_reported(provider, make_points, station_rows, hill_dem):
    dem, _ = hill_dem
    rows = [dict(r) for r in station_rows]
    rows[0]["elev"] = None
    stations = make_points(rows, name="dh.gpkg")
    layer = _run({"INPUT": str(stations), "HEIGHT_FIELD": "elev", "DEM": str(dem), "OUTER_RADIUS": 10000.0})["OUTPUT"]
    assert layer.featureCount() == len(rows)
    assert np.isnan(_values(layer, "tc_total")[0])
    assert np.all(np.isfinite(_values(layer, "tc_total")[1:]))
    assert np.all(np.isfinite(_values(layer, "dem_diff")[1:]))


def test_ring_sector_method_with_zone_fields(provider, stations_gpkg, hill_dem):
    dem, _ = hill_dem
    layer = _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem), "METHOD": 1, "ZONE_FIELDS": True})["OUTPUT"]
    names = layer.fields().names()
    zone_names = [n for n in names if n.startswith("tc_") and len(n) == 4]
    assert zone_names, names
    zone_sum = sum(_values(layer, n) for n in zone_names)
    np.testing.assert_allclose(zone_sum, _values(layer, "tc_total"), rtol=1e-9, atol=1e-12)


def test_innermost_field_is_added_to_inner_zone(provider, make_points, station_rows, hill_dem):
    dem, _ = hill_dem
    plain = make_points(station_rows, name="plain.gpkg")
    base = _run({"INPUT": str(plain), "HEIGHT_FIELD": "elev", "DEM": str(dem), "OUTER_RADIUS": 10000.0})["OUTPUT"]
    with_field = _run({"INPUT": str(plain), "HEIGHT_FIELD": "elev", "DEM": str(dem), "OUTER_RADIUS": 10000.0, "INNERMOST_TC_FIELD": "tc_given"})["OUTPUT"]
    diff = _values(with_field, "tc_inner") - _values(base, "tc_inner")
    assert np.all(np.isfinite(diff))
    assert np.all(np.abs(_values(with_field, "tc_outer") - _values(base, "tc_outer")) < 1e-9)
    assert np.any(np.abs(diff) > 1e-6)


def test_radii_are_checked(provider, stations_gpkg, hill_dem):
    from qgis.core import QgsProcessingException

    dem, _ = hill_dem
    with pytest.raises(QgsProcessingException, match="inner zone radius"):
        _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem), "INNER_RADIUS": 5000.0, "OUTER_RADIUS": 3000.0})


def test_cancel_stops_the_run(provider, stations_gpkg, hill_dem):
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    dem, _ = hill_dem
    feedback = QgsProcessingFeedback()
    feedback.cancel()
    with pytest.raises(QgsProcessingException, match="Cancelled"):
        _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem)}, feedback)


def test_cancel_during_the_terrain_engine(provider, stations_gpkg, hill_dem):
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    feedback = QgsProcessingFeedback()
    seen = []

    def cancel_in_engine(progress):
        # The first third of the progress bar is reading the stations; beyond
        # it the terrain engine runs. (setProgress is not virtual: use the signal.)
        seen.append(progress)
        if progress > 34.0 and not feedback.isCanceled():
            feedback.cancel()

    feedback.progressChanged.connect(cancel_in_engine)
    dem, _ = hill_dem
    with pytest.raises(QgsProcessingException, match="Cancelled"):
        _run({"INPUT": str(stations_gpkg), "HEIGHT_FIELD": "elev", "DEM": str(dem)}, feedback)
    assert max(seen) < 100.0


def test_geographic_dem_runs_on_ground_distances(provider, tmp_path, make_points, dem_writer):
    """A smooth hill on a lon/lat raster: plausible TC, full coverage."""
    # A 0.2° x 0.2° lon/lat raster around 9°E 45°N with 0.0005° cells.
    cell = 0.0005
    n = 400
    lon = 8.9 + (np.arange(n) + 0.5) * cell
    lat = 45.1 - (np.arange(n) + 0.5) * cell
    lon2, lat2 = np.meshgrid(lon, lat)
    def hill(lo, la):
        dx = (lo - 9.0) * 111_320.0 * np.cos(np.radians(45.0))
        dy = (la - 45.0) * 110_950.0
        return 300.0 + 400.0 * np.exp(-(dx**2 + dy**2) / (2 * 2000.0**2))
    geo = dem_writer(tmp_path / "geo.tif", hill(lon2, lat2), 8.9, 45.1, cell, epsg=4326)
    rows = [{"x": 9.0 + 0.01, "y": 45.0, "name": "a", "elev": float(hill(9.01, 45.0)), "g_obs": 0.0, "rho": 0.0, "tc_given": 0.0, "label": ""}]
    stations = make_points(rows, epsg=4326, name="geo_station.gpkg")
    layer = _run({"INPUT": str(stations), "HEIGHT_FIELD": "elev", "DEM": str(geo), "OUTER_RADIUS": 6000.0})["OUTPUT"]
    tc_geo = _values(layer, "tc_total")[0]
    assert 0.05 < tc_geo < 20.0
    assert _values(layer, "tc_cover")[0] > 0.998
