# SPDX-License-Identifier: GPL-2.0-or-later
"""DENSITY_LAYER through processing.run: geology densities in the reduction and the terrain correction.

The science is checked in tests/algorithms/terrain/test_geology.py (prisms,
one unit = constant density); here the wiring: the slab takes the polygon's
density, a layer covering everything at the default density changes nothing,
and the refusals.
"""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.constants import GRAVITATIONAL_CONSTANT, SI_TO_MGAL


def _polygons(path, rings, densities, epsg=32632):
    """A GeoPackage of polygons (list of (west, south, east, north)) with a 'rho' field."""
    from osgeo import ogr, osr

    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("geology", srs, ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("rho", ogr.OFTReal))
    for (w, s, e, n), rho in zip(rings, densities, strict=True):
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("rho", rho)
        feature.SetGeometry(ogr.CreateGeometryFromWkt(f"POLYGON(({w} {s},{e} {s},{e} {n},{w} {n},{w} {s}))"))
        layer.CreateFeature(feature)
    ds = None
    return path


def _values(layer, name):
    return np.array([f[name] for f in layer.getFeatures()], dtype=float)


def _run(algorithm, params):
    import processing
    from qgis.core import QgsProcessingContext

    base = {"OUTPUT": "TEMPORARY_OUTPUT", "DEM_DATUM": 1, "HEIGHT_FIELD": "elev"}
    base.update(params)
    return processing.run("reliefgravity:" + algorithm, base, context=QgsProcessingContext())


def test_one_polygon_at_the_default_density_changes_nothing(provider, stations_gpkg, hill_dem, tmp_path):
    path, _ = hill_dem
    everything = _polygons(tmp_path / "all.gpkg", [(480_000, 4_980_000, 520_000, 5_020_000)], [2670.0])
    plain = _run("bouguerreduction", {"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "DEM": str(path)})["OUTPUT"]
    layered = _run("bouguerreduction", {"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "DEM": str(path),
                                        "DENSITY_LAYER": str(everything), "DENSITY_LAYER_FIELD": "rho"})["OUTPUT"]
    for name in ("slab_corr", "tc_total", "cba"):
        np.testing.assert_allclose(_values(layered, name), _values(plain, name), rtol=0, atol=1e-9, err_msg=name)


def test_slab_and_terrain_take_the_polygon_densities(provider, stations_gpkg, hill_dem, tmp_path):
    path, _ = hill_dem
    # Light fill (2000 kg/m3, given in g/cm3) over the western half, default 2670 elsewhere.
    west = _polygons(tmp_path / "west.gpkg", [(480_000, 4_980_000, 499_750, 5_020_000)], [2.0])
    layer = _run("bouguerreduction", {"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "DEM": str(path),
                                      "DENSITY_LAYER": str(west), "DENSITY_LAYER_FIELD": "rho"})["OUTPUT"]
    x = np.array([f.geometry().asPoint().x() for f in layer.getFeatures()])
    h = _values(layer, "elev")
    rho = np.where(x < 499_750, 2000.0, 2670.0)
    # The slab is 2 pi G rho h at each station's own polygon density.
    np.testing.assert_allclose(_values(layer, "slab_corr"), 2 * np.pi * GRAVITATIONAL_CONSTANT * rho * h * SI_TO_MGAL, rtol=1e-9)
    plain = _run("terraincorrection", {"INPUT": str(stations_gpkg), "DEM": str(path)})["OUTPUT"]
    geology = _run("terraincorrection", {"INPUT": str(stations_gpkg), "DEM": str(path),
                                        "DENSITY_LAYER": str(west), "DENSITY_LAYER_FIELD": "rho"})["OUTPUT"]
    ratio = _values(geology, "tc_total") / _values(plain, "tc_total")
    # Lighter ground to the west lowers every correction, never raises it; a
    # station far east of the contact sees (almost) only the default density.
    assert np.all(ratio <= 1.0 + 1e-9)
    assert ratio[np.argmin(x)] < 0.9 and ratio[np.argmax(x)] > 0.95


def test_density_field_and_layer_together_are_refused(provider, stations_gpkg, hill_dem, tmp_path):
    from qgis.core import QgsProcessingException

    path, _ = hill_dem
    west = _polygons(tmp_path / "w.gpkg", [(480_000, 4_980_000, 499_500, 5_020_000)], [2000.0])
    with pytest.raises(QgsProcessingException, match="not both"):
        _run("bouguerreduction", {"INPUT": str(stations_gpkg), "GRAVITY_FIELD": "g_obs", "DEM": str(path),
                                  "DENSITY_FIELD": "rho", "DENSITY_LAYER": str(west), "DENSITY_LAYER_FIELD": "rho"})


def test_ring_and_sector_with_a_geology_layer_is_refused(provider, stations_gpkg, hill_dem, tmp_path):
    from qgis.core import QgsProcessingException

    path, _ = hill_dem
    west = _polygons(tmp_path / "w2.gpkg", [(480_000, 4_980_000, 499_500, 5_020_000)], [2000.0])
    with pytest.raises(QgsProcessingException, match="exact engine"):
        _run("terraincorrection", {"INPUT": str(stations_gpkg), "DEM": str(path), "METHOD": 1,
                                   "DENSITY_LAYER": str(west), "DENSITY_LAYER_FIELD": "rho"})


def test_geology_with_a_fine_dem_covering_half_the_survey_falls_back_on_the_regional(
    provider, stations_gpkg, hill_dem, dem_writer, tmp_path
):
    """With a geology layer too, stations beyond the fine DEM are served by the regional DEM (tc_regional_only)."""
    path, (west, north, cell, heights) = hill_dem
    half = dem_writer(tmp_path / "half.tif", heights[:, :60], west, north, cell)
    geology = _polygons(tmp_path / "west.gpkg", [(480_000, 4_980_000, 499_750, 5_020_000)], [2.0])
    common = {"INPUT": str(stations_gpkg), "REGIONAL_DEM": str(path), "OUTER_RADIUS": 5000.0}
    layer = _run("terraincorrection", {**common, "DEM": str(half), "DENSITY_LAYER": str(geology),
                                       "DENSITY_LAYER_FIELD": "rho"})["OUTPUT"]
    x = np.array([f.geometry().asPoint().x() for f in layer.getFeatures()])
    flags = [f["qc_flag"] for f in layer.getFeatures()]
    tc = _values(layer, "tc_total")
    assert np.all(np.isfinite(tc))
    for xi, flag in zip(x, flags, strict=True):
        assert ("tc_regional_only" in flag) == (xi > west + 60 * cell), (xi, flag)
    # The same survey at one density (the layer at the default everywhere) gives the plain run's values.
    everything = _polygons(tmp_path / "all.gpkg", [(480_000, 4_980_000, 520_000, 5_020_000)], [2670.0])
    one = _run("terraincorrection", {**common, "DEM": str(half), "DENSITY_LAYER": str(everything),
                                     "DENSITY_LAYER_FIELD": "rho"})["OUTPUT"]
    plain = _run("terraincorrection", {**common, "DEM": str(half)})["OUTPUT"]
    np.testing.assert_allclose(_values(one, "tc_total"), _values(plain, "tc_total"), rtol=1e-9, atol=1e-12)


def test_engine_check_with_a_geology_layer_is_skipped_with_a_warning(provider, stations_gpkg, hill_dem, tmp_path,
                                                                    collecting_feedback):
    import processing
    from qgis.core import QgsProcessingContext

    path, _ = hill_dem
    west = _polygons(tmp_path / "west.gpkg", [(480_000, 4_980_000, 499_750, 5_020_000)], [2.0])
    result = processing.run("reliefgravity:terraincorrection", {
        "INPUT": str(stations_gpkg), "DEM": str(path), "DEM_DATUM": 1, "HEIGHT_FIELD": "elev", "ENGINE_CHECK": True,
        "DENSITY_LAYER": str(west), "DENSITY_LAYER_FIELD": "rho", "OUTPUT": "TEMPORARY_OUTPUT"},
        context=QgsProcessingContext(), feedback=collecting_feedback)
    assert "tc_numerr" not in result["OUTPUT"].fields().names()
    assert any("ENGINE_CHECK" in w for w in collecting_feedback.warnings)
