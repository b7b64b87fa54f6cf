# SPDX-License-Identifier: GPL-2.0-or-later
"""Per-station uncertainty written by reliefgravity:bouguerreduction (docs/uncertainty.md).

The components are checked against the pure functions in
tests/algorithms/uncertainty (hand cases and Monte Carlo); here: the fields,
the settings that feed them, the cases worked out by hand at the plugin's
level, and bad settings.
"""

from __future__ import annotations

import numpy as np
import pytest

SIGMA_FIELDS = ["tc_sigma", "cba_sigma", "sigma_g", "sigma_h", "sigma_dem", "sigma_inn", "sigma_mis", "sigma_trn", "sigma_rho"]


def _run(params):
    import processing
    from qgis.core import QgsProcessingContext

    # The synthetic DEMs hold heights above the ellipsoid, like the stations.
    base = {"OUTPUT": "TEMPORARY_OUTPUT", "DEM_DATUM": 1, "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "elev"}
    base.update(params)
    return processing.run("reliefgravity:bouguerreduction", base, context=QgsProcessingContext())


def _values(layer, name):
    from qgis.core import NULL

    return np.array([np.nan if f[name] == NULL or f[name] is None else f[name] for f in layer.getFeatures()], dtype=float)


def _on_the_hill(rows, dem):
    """Stations standing on the DEM surface (heights sampled from it)."""
    from relief_gravity.algorithms.terrain import ElevationGrid, sample_bilinear

    west, north, cell, heights = dem
    grid = ElevationGrid.from_array(heights, west, north, cell, cell)
    h = sample_bilinear(grid, np.array([r["x"] for r in rows]), np.array([r["y"] for r in rows]))
    return [dict(r, elev=float(v)) for r, v in zip(rows, h, strict=True)]


def test_fields_are_written_and_the_totals_combine_the_components(provider, make_points, station_rows, hill_dem):
    path, dem = hill_dem
    stations = make_points(_on_the_hill(station_rows, dem), name="hill.gpkg")
    layer = _run({"INPUT": str(stations), "DEM": str(path), "DENSITY_LOW": 2570.0, "DENSITY_HIGH": 2770.0})["OUTPUT"]
    values = {name: _values(layer, name) for name in SIGMA_FIELDS}
    for name in SIGMA_FIELDS:
        assert np.all(np.isfinite(values[name])), name
        assert np.all(values[name] >= 0), name
    # cba_sigma is the root sum of squares of the seven components.
    parts = np.array([values[name] for name in SIGMA_FIELDS[2:]])
    np.testing.assert_allclose(values["cba_sigma"], np.sqrt(np.sum(parts**2, axis=0)), rtol=1e-12)
    # Defaults: 0.02 mGal of observed gravity (common practice, no source).
    np.testing.assert_allclose(values["sigma_g"], 0.02)
    # The density interval 2570-2770 is +-100 kg/m3 at 95 %: sigma = 100 / 1.96,
    # times (slab + curvature - tc) / density (all proportional to density).
    slab, curv, tc = (_values(layer, n) for n in ("slab_corr", "curv_corr", "tc_total"))
    np.testing.assert_allclose(values["sigma_rho"], (100.0 / 1.959964) * np.abs(slab + curv - tc) / 2670.0, rtol=1e-6)
    # Stations on the DEM surface: no station-DEM mismatch.
    assert np.all(values["sigma_mis"] < 1e-3)


def test_height_error_alone_far_from_relief_is_the_bouguer_gradient(provider, make_points, station_rows, dem_writer, tmp_path):
    """Flat DEM at the stations' height, no DEM error: sigma_h = |d(cba)/dh| * sigma (by hand ~0.197 mGal/m).

    On a flat plain the terrain correction's own height sensitivity is the
    thin disc below or above the station (quadratic in the error, small for
    a 0.1 m error), so the anomaly's spread is the Bouguer gradient
    0.3086 - 2 pi G rho = 0.1967 mGal/m for 2670 kg/m3 (first-order gradient;
    the second-order formula and the cap differ by under 1 %).
    """
    flat = dem_writer(tmp_path / "flat.tif", np.full((120, 120), 200.0), 494_000.0, 5_006_000.0, 100.0)
    rows = [dict(r, elev=200.0) for r in station_rows]
    stations = make_points(rows, name="flat.gpkg")
    layer = _run(
        {"INPUT": str(stations), "DEM": str(flat), "HEIGHT_SIGMA": 0.1, "DEM_SIGMA": 0.0, "G_SIGMA": 0.0}
    )["OUTPUT"]
    sigma_h = _values(layer, "sigma_h")
    np.testing.assert_allclose(sigma_h, 0.1 * 0.1967, rtol=0.02)
    np.testing.assert_allclose(_values(layer, "sigma_dem"), 0.0, atol=1e-12)
    np.testing.assert_allclose(_values(layer, "sigma_inn"), 0.0, atol=1e-12)
    assert np.all(np.isnan(_values(layer, "sigma_rho")))  # no interval given: left out, not zero


def test_a_g_sigma_field_replaces_the_number(provider, make_points, station_rows, hill_dem):
    path, dem = hill_dem
    rows = [dict(r, g_sigma=0.001 * (i + 1)) for i, r in enumerate(_on_the_hill(station_rows, dem))]
    from osgeo import ogr

    fields = {"name": ogr.OFTString, "g_obs": ogr.OFTReal, "elev": ogr.OFTReal, "g_sigma": ogr.OFTReal}
    stations = make_points(rows, name="gsigma.gpkg", fields=fields)
    layer = _run({"INPUT": str(stations), "DEM": str(path), "G_SIGMA": 0.5})["OUTPUT"]
    np.testing.assert_allclose(_values(layer, "sigma_g"), [0.001 * (i + 1) for i in range(len(rows))])


@pytest.mark.parametrize(
    ("low", "high", "match"),
    [(2570.0, None, "both bounds"), (2770.0, 2570.0, "impossible")],
)
def test_bad_density_interval_is_refused(provider, stations_gpkg, hill_dem, low, high, match):
    from qgis.core import QgsProcessingException

    path, _ = hill_dem
    params = {"INPUT": str(stations_gpkg), "DEM": str(path), "DENSITY_LOW": low}
    if high is not None:
        params["DENSITY_HIGH"] = high
    with pytest.raises(QgsProcessingException, match=match):
        _run(params)


def test_a_fine_dem_covering_half_the_survey_falls_back_on_the_regional(provider, stations_gpkg, hill_dem, dem_writer, tmp_path):
    """Stations beyond the fine DEM get their correction from the regional DEM, flagged tc_regional_only."""
    path, (west, north, cell, heights) = hill_dem
    half = dem_writer(tmp_path / "half.tif", heights[:, :60], west, north, cell)  # 494-500 km east only
    layer = _run({"INPUT": str(stations_gpkg), "DEM": str(half), "REGIONAL_DEM": str(path), "OUTER_RADIUS": 5000.0})["OUTPUT"]
    x = np.array([f.geometry().asPoint().x() for f in layer.getFeatures()])
    flags = [f["qc_flag"] for f in layer.getFeatures()]
    assert np.all(np.isfinite(_values(layer, "cba")))
    for xi, flag in zip(x, flags, strict=True):
        assert ("tc_regional_only" in flag) == (xi > west + 60 * cell), (xi, flag)
