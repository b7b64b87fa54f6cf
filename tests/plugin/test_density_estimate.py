# SPDX-License-Identifier: GPL-2.0-or-later
"""reliefgravity:densityestimate through processing.run on invented surveys of known density.

The observed gravity is built so that the free-air anomaly is exactly
rho_true * B + regional + noise, with B = slab + curvature - terrain
correction per kg/m^3 from the project's own functions (the terrain engine
run here directly at unit density with the algorithm's radii). No published
worked example with numbers was found: these are synthetic checks.
"""

from __future__ import annotations

import hashlib
from pathlib import Path

import numpy as np
import pytest
from osgeo import ogr, osr

TRUE_DENSITY = 2450.0  # kg/m^3, invented
WEST, NORTH, CELL, N = 494_000.0, 5_012_000.0, 100.0, 120
RADII = {"INNER_RADIUS": 1500.0, "OUTER_RADIUS": 6000.0}


def relief(xx, yy):
    """Invented hills: two ridges and a knoll on a 300 m plain."""
    h = 300.0 + 350.0 * np.exp(-((xx - 498_000) ** 2) / (2 * 900.0**2) - ((yy - 5_006_000) ** 2) / (2 * 3000.0**2))
    h += 250.0 * np.exp(-((xx - 503_000) ** 2 + (yy - 5_004_000) ** 2) / (2 * 1200.0**2))
    return h + 150.0 * np.exp(-((xx - 501_000) ** 2 + (yy - 5_009_000) ** 2) / (2 * 700.0**2))


def latitudes(x, y):
    src = osr.SpatialReference()
    src.ImportFromEPSG(32632)
    dst = osr.SpatialReference()
    dst.ImportFromEPSG(4326)
    dst.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    t = osr.CoordinateTransformation(src, dst)
    return np.array([t.TransformPoint(float(a), float(b))[1] for a, b in zip(x, y, strict=True)])


@pytest.fixture(scope="module")
def survey(tmp_path_factory, dem_writer, points_writer):
    from relief_gravity.algorithms import reduce_gravity
    from relief_gravity.algorithms.density import unit_bouguer_term
    from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction

    folder = tmp_path_factory.mktemp("density_survey")
    centres_x = WEST + (np.arange(N) + 0.5) * CELL
    centres_y = NORTH - (np.arange(N) + 0.5) * CELL
    heights = relief(*np.meshgrid(centres_x, centres_y))
    dem_writer(folder / "dem.tif", heights, WEST, NORTH, CELL)
    rng = np.random.default_rng(21)
    x = rng.uniform(WEST + 3000, WEST + 9000, 140)
    y = rng.uniform(NORTH - 9000, NORTH - 3000, 140)
    grid = ElevationGrid.from_array(heights, WEST, NORTH, CELL, CELL)
    h = relief(x, y)
    tc = terrain_correction(x, y, h, grid, None, inner_radius=RADII["INNER_RADIUS"], outer_radius=RADII["OUTER_RADIUS"], density=1.0).tc_total
    b = unit_bouguer_term(h, tc)
    lat = latitudes(x, y)
    zero = reduce_gravity(np.zeros_like(h), lat, h)["faa"]  # = -normal_g + height_corr + atmos_corr

    def write(name, faa):
        g_obs = faa - zero
        return points_writer(folder / name, x, y, {"g_obs": [float(v) for v in g_obs], "h": [float(v) for v in h]})

    noise = rng.normal(0, 0.05, x.size)
    plain = write("plain.gpkg", TRUE_DENSITY * b + 5.0 + noise)
    gradient = write("gradient.gpkg", TRUE_DENSITY * b + 8e-4 * (x - WEST) - 3e-4 * (y - NORTH) + noise)
    # Light fill under the low ground: correlated with topography.
    fill = write("fill.gpkg", TRUE_DENSITY * b - 6.0 * np.clip((420.0 - h) / 120.0, 0, 1) + noise)
    return {"folder": folder, "dem": str(folder / "dem.tif"), "plain": plain, "gradient": gradient, "fill": fill, "x": x, "y": y}


def run(survey, name, feedback=None, **extra):
    import processing

    parameters = {"INPUT": survey[name], "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h", "DEM": survey["dem"], "DEM_DATUM": 2, **RADII}
    parameters.update(extra)
    return processing.run("reliefgravity:densityestimate", parameters, feedback=feedback)


def digest(path):
    return hashlib.sha256(Path(path).read_bytes()).hexdigest()


@pytest.mark.parametrize("method", [0, 1])
@pytest.mark.parametrize(("name", "trend"), [("plain", 0), ("plain", 1), ("gradient", 1), ("gradient", 2)])
def test_interval_covers_the_true_density(provider, survey, tmp_path, method, name, trend):
    before = digest(survey[name])
    plot = tmp_path / "fit.png"
    result = run(survey, name, METHOD=method, REGIONAL_TREND=trend, PLOT=str(plot))
    assert result["DENSITY_LOW"] < TRUE_DENSITY < result["DENSITY_HIGH"], result
    assert result["DENSITY_HIGH"] - result["DENSITY_LOW"] < 150
    assert result["STATIONS_USED"] == 140
    assert plot.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"
    assert digest(survey[name]) == before


def test_gradient_without_regional_term_is_biased(provider, survey):
    result = run(survey, "gradient", METHOD=0, REGIONAL_TREND=0, PLOT=None)
    assert not result["DENSITY_LOW"] < TRUE_DENSITY < result["DENSITY_HIGH"]


def test_fill_under_valleys_raises_the_caution(provider, survey, collecting_feedback):
    run(survey, "fill", feedback=collecting_feedback, METHOD=0, REGIONAL_TREND=1, PLOT=None)
    assert any("density_geology_follows_relief" in w for w in collecting_feedback.warnings)


def test_nettleton_along_profile_lines(provider, survey, tmp_path):
    # Two invented west-east lines through the survey; stations within 400 m count.
    path = tmp_path / "profiles.gpkg"
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32632)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("profiles", srs, ogr.wkbLineString)
    for yline in (5_006_000.0, 5_004_000.0):
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetGeometry(ogr.CreateGeometryFromWkt(f"LINESTRING ({WEST + 2500} {yline}, {WEST + 9500} {yline})"))
        layer.CreateFeature(feature)
    ds = None
    plot = tmp_path / "profiles.png"
    result = run(survey, "gradient", METHOD=1, REGIONAL_TREND=1, PROFILES=str(path), BUFFER=400.0, PLOT=str(plot))
    inside = np.sum((np.abs(survey["y"] - 5_006_000) <= 400) | (np.abs(survey["y"] - 5_004_000) <= 400))
    assert result["STATIONS_USED"] == inside
    assert result["DENSITY_LOW"] < TRUE_DENSITY < result["DENSITY_HIGH"]
    assert plot.stat().st_size > 10_000


def test_profiles_with_parasnis_are_refused(provider, survey, tmp_path):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="Nettleton"):
        run(survey, "plain", METHOD=0, PROFILES=survey["plain"].replace("plain", "plain"), PLOT=None)


def test_missing_field_and_bad_radii_are_refused(provider, survey):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="no field named"):
        run(survey, "plain", GRAVITY_FIELD="gravity", PLOT=None)
    with pytest.raises(QgsProcessingException, match="inner zone radius"):
        run(survey, "plain", INNER_RADIUS=9000.0, OUTER_RADIUS=6000.0, PLOT=None)


def test_flat_ground_is_refused_or_cautioned(provider, tmp_path, dem_writer, points_writer):
    from qgis.core import QgsProcessingException

    dem_writer(tmp_path / "flat.tif", np.full((40, 40), 250.0), WEST, NORTH, CELL)
    x = WEST + 500 + np.arange(30) * 100.0
    y = NORTH - 500 - (np.arange(30) * 37 % 300)
    points = points_writer(tmp_path / "flat.gpkg", x, y, {"g_obs": [980_600.0 + 0.01 * k for k in range(30)], "h": [250.0] * 30})
    with pytest.raises(QgsProcessingException, match="relief"):
        run({"flat": points, "dem": str(tmp_path / "flat.tif")}, "flat", PLOT=None)


def test_cancel_raises(provider, survey):
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    feedback = QgsProcessingFeedback()
    feedback.cancel()
    with pytest.raises(QgsProcessingException):
        run(survey, "plain", feedback=feedback, PLOT=None)


def test_gravity_in_another_unit_is_refused_with_the_setting_that_fixes_it(survey, tmp_path):
    """Observed gravity given in m/s^2 but declared mGal: the same sentence as the reduction's."""
    from osgeo import ogr
    from qgis.core import QgsProcessingException

    copy = tmp_path / "si.gpkg"
    ogr.GetDriverByName("GPKG").CopyDataSource(ogr.Open(survey["plain"]), str(copy))
    ds = ogr.Open(str(copy), 1)
    layer = ds.GetLayer(0)
    for feature in layer:
        feature.SetField("g_obs", feature.GetField("g_obs") * 1e-5)
        layer.SetFeature(feature)
    ds = None
    with pytest.raises(QgsProcessingException, match="GRAVITY_UNITS"):
        run({**survey, "si": str(copy)}, "si")


def test_orthometric_heights_with_a_geoid_dem_give_the_same_density(survey):
    """Heights above EGM96 with an EGM96 DEM equal ellipsoidal heights with an ellipsoidal DEM (datums agree)."""
    same = run(survey, "plain", DEM_DATUM=2)
    both_geoid = run(survey, "plain", HEIGHT_DATUM=1, DEM_DATUM=0)
    assert both_geoid["DENSITY"] == pytest.approx(same["DENSITY"], rel=0.02)


def _polygons(path, rings, epsg=32632):
    """A polygon GeoPackage with one feature per ring (a list of (x, y) in ``epsg``)."""
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("areas", srs, ogr.wkbPolygon)
    for ring in rings:
        feature = ogr.Feature(layer.GetLayerDefn())
        text = ", ".join(f"{a} {b}" for a, b in [*ring, ring[0]])
        feature.SetGeometry(ogr.CreateGeometryFromWkt(f"POLYGON (({text}))"))
        layer.CreateFeature(feature)
    ds = None
    return str(path)


#: The western part of the survey, where the ``patch`` survey's rock differs.
PATCH = [(WEST, NORTH - 9500), (WEST, NORTH - 2500), (WEST + 5000, NORTH - 2500), (WEST + 5000, NORTH - 9500)]


@pytest.fixture(scope="module")
def patch_survey(survey, points_writer):
    """The plain survey, plus rock lighter by 300 kg/m^3 at the surface in the west (x < WEST + 5 km)."""
    import processing  # noqa: F401 - the provider is loaded by the survey's users

    layer = ogr.Open(survey["plain"])
    rows = [(f.GetGeometryRef().GetX(), f.GetGeometryRef().GetY(), f.GetField("g_obs"), f.GetField("h")) for f in layer.GetLayer(0)]
    layer = None
    x, y, g, h = (np.array(c) for c in zip(*rows, strict=True))
    west = x < WEST + 5000
    # A slab-like deficit growing with height: what a lighter unit at the surface does to faa.
    g = g - 300.0 * 4.193e-5 * (h - 300.0) * west
    path = points_writer(survey["folder"] / "patch.gpkg", x, y, {"g_obs": [float(v) for v in g], "h": [float(v) for v in h]})
    return {**survey, "patch": path, "west": int(west.sum())}


def test_stations_inside_excluded_areas_are_left_out(provider, patch_survey, tmp_path, collecting_feedback):
    areas = _polygons(tmp_path / "areas.gpkg", [PATCH])
    before = digest(patch_survey["patch"]), digest(areas)
    biased = run(patch_survey, "patch", METHOD=0, REGIONAL_TREND=1, PLOT=None)
    assert not biased["DENSITY_LOW"] < TRUE_DENSITY < biased["DENSITY_HIGH"], biased
    result = run(patch_survey, "patch", feedback=collecting_feedback, METHOD=0, REGIONAL_TREND=1, EXCLUDE_AREAS=areas, PLOT=None)
    assert result["STATIONS_USED"] == 140 - patch_survey["west"]
    assert result["DENSITY_LOW"] < TRUE_DENSITY < result["DENSITY_HIGH"], result
    assert any(f"{patch_survey['west']} of 140 stations lie inside EXCLUDE_AREAS" in m for m in collecting_feedback.infos)
    assert (digest(patch_survey["patch"]), digest(areas)) == before
    nettleton = run(patch_survey, "patch", METHOD=1, REGIONAL_TREND=1, EXCLUDE_AREAS=areas, PLOT=None)
    assert nettleton["DENSITY_LOW"] < TRUE_DENSITY < nettleton["DENSITY_HIGH"], nettleton


def test_excluded_areas_in_another_crs_select_the_same_stations(provider, patch_survey, tmp_path):
    src = osr.SpatialReference()
    src.ImportFromEPSG(32632)
    dst = osr.SpatialReference()
    dst.ImportFromEPSG(4326)
    dst.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    to_degrees = osr.CoordinateTransformation(src, dst)
    # Densified edges, so the reprojected polygon follows the projected one to centimetres.
    ring = []
    for (a, b), (c, d) in zip(PATCH, PATCH[1:] + PATCH[:1], strict=True):
        for t in np.linspace(0.0, 1.0, 50, endpoint=False):
            ring.append(to_degrees.TransformPoint(a + t * (c - a), b + t * (d - b))[:2])
    areas = _polygons(tmp_path / "areas_4326.gpkg", [ring], epsg=4326)
    result = run(patch_survey, "patch", METHOD=0, REGIONAL_TREND=1, EXCLUDE_AREAS=areas, PLOT=None)
    assert result["STATIONS_USED"] == 140 - patch_survey["west"]


def test_bad_excluded_areas_are_refused_with_a_sentence(provider, survey, tmp_path, points_writer):
    from qgis.core import QgsProcessingException

    empty = _polygons(tmp_path / "empty.gpkg", [])
    with pytest.raises(QgsProcessingException, match="EXCLUDE_AREAS has no polygon"):
        run(survey, "plain", EXCLUDE_AREAS=empty, PLOT=None)
    everything = _polygons(tmp_path / "all.gpkg", [[(WEST, NORTH - 12000), (WEST, NORTH), (WEST + 12000, NORTH), (WEST + 12000, NORTH - 12000)]])
    with pytest.raises(QgsProcessingException, match="Every station lies inside EXCLUDE_AREAS"):
        run(survey, "plain", EXCLUDE_AREAS=everything, PLOT=None)
    points = points_writer(tmp_path / "points.gpkg", [WEST + 100.0], [NORTH - 100.0], {"v": [1.0]})
    with pytest.raises(QgsProcessingException):
        run(survey, "plain", EXCLUDE_AREAS=points, PLOT=None)
