# SPDX-License-Identifier: GPL-2.0-or-later
"""Issue 8: height datums (EGM96 from PROJ's grid), gravity/height/DEM units, densities.

Through processing.run and, for the datum and unit cases, qgis_process.bin.
Invented survey: tests/plugin/station_cases.py.
"""

from __future__ import annotations

import importlib.util
import shutil
import subprocess
from pathlib import Path

import numpy as np
import pytest

_spec = importlib.util.spec_from_file_location("station_cases", Path(__file__).with_name("station_cases.py"))
sc = importlib.util.module_from_spec(_spec)
_spec.loader.exec_module(sc)


@pytest.fixture(scope="module")
def geoid_module(provider):
    from relief_gravity.plugin import geoid

    if geoid.find_egm96() is None:
        pytest.skip("PROJ's egm96_15.gtx is not installed (Debian: proj-data)")
    return geoid


@pytest.fixture
def survey(tmp_path, dem_writer, points_writer, geoid_module):
    """DEM holding orthometric (EGM96) heights; stations with both height kinds."""
    dem = dem_writer(tmp_path / "dem_egm96.tif", sc.dem_array(), sc.WEST, sc.NORTH, sc.CELL, epsg=sc.EPSG)
    x, y = sc.station_xy()
    lon, lat = sc.lonlat(x, y)
    n = geoid_module.egm96_at(lon, lat)
    ortho = sc.hill(x, y)
    cols = {
        "g_obs": [float(v) for v in sc.gravity(ortho + n)],
        "h_ell": [float(v) for v in ortho + n],
        "h_orth": [float(v) for v in ortho],
        "n_geoid": [float(v) for v in n],
    }
    stations = Path(points_writer(tmp_path / "stations.gpkg", x, y, cols, epsg=sc.EPSG))
    return {"dem": dem, "stations": stations, "n": n, "ortho": ortho, "folder": tmp_path}


def _tc(survey, out, **extra):
    params = {
        "INPUT": str(survey["stations"]),
        "DEM": str(survey["dem"]),
        "OUTER_RADIUS": sc.OUTER,
        "OUTPUT": str(out),
    }
    params.update(extra)
    return sc.run("terraincorrection", params)


def test_egm96_against_two_other_readers(geoid_module):
    """Our bilinear EGM96 against gdallocationinfo (grid nodes) and PROJ's own
    vertical transformation EPSG:4326+5773 -> EPSG:4979 (between nodes), GDAL 3.6 / PROJ."""
    from osgeo import osr

    path = geoid_module.find_egm96()
    tool = shutil.which("gdallocationinfo")
    nodes = [(0.0, 0.0), (9.0, 45.0), (-74.0, 40.75), (147.25, -42.5)]
    for lon, lat in nodes:
        ours = float(geoid_module.egm96_at([lon], [lat])[0])
        if tool:
            text = subprocess.run([tool, "-valonly", "-geoloc", path, str(lon), str(lat)], capture_output=True, text=True).stdout
            assert ours == pytest.approx(float(text.split()[0]), abs=1e-4)
    # Sanity against the published character of the model (from memory): about
    # +17 m at 0 N 0 E, near +47 m in the western Alps, about -30 m off New York.
    assert float(geoid_module.egm96_at([0.0], [0.0])[0]) == pytest.approx(17.16, abs=0.05)
    src = osr.SpatialReference()
    src.SetFromUserInput("EPSG:4326+5773")
    dst = osr.SpatialReference()
    dst.ImportFromEPSG(4979)
    for s in (src, dst):
        s.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    transform = osr.CoordinateTransformation(src, dst)
    between = [(7.9, 45.2), (9.07, 45.01), (-122.41, 37.77), (139.7, 35.68), (179.95, -16.1)]
    for lon, lat in between:
        proj_value = transform.TransformPoint(lon, lat, 0.0)[2]
        if abs(proj_value) < 1e-9:
            pytest.skip("PROJ did not apply the geoid grid on this machine")
        assert float(geoid_module.egm96_at([lon], [lat])[0]) == pytest.approx(proj_value, abs=1e-3)


def test_ellipsoidal_heights_with_egm96_dem_equal_orthometric_heights(survey, tmp_path):
    """Same stations, heights given as h (HEIGHT_DATUM=0) or H (=1) or H with a geoid field (=2)."""
    before = sc.digest(survey["stations"]), sc.digest(survey["dem"])
    a = sc.layer(_tc(survey, tmp_path / "a.gpkg", HEIGHT_FIELD="h_ell", HEIGHT_DATUM=0, DEM_DATUM=0)["OUTPUT"])
    b = sc.layer(_tc(survey, tmp_path / "b.gpkg", HEIGHT_FIELD="h_orth", HEIGHT_DATUM=1, DEM_DATUM=0)["OUTPUT"])
    c = sc.layer(
        _tc(survey, tmp_path / "c.gpkg", HEIGHT_FIELD="h_orth", HEIGHT_DATUM=2, GEOID_FIELD="n_geoid", DEM_DATUM=0)["OUTPUT"]
    )
    tc_a = sc.values(a, "tc_total")
    assert np.all(tc_a > 0)
    np.testing.assert_allclose(sc.values(b, "tc_total"), tc_a, rtol=1e-9, atol=1e-9)
    np.testing.assert_allclose(sc.values(c, "tc_total"), tc_a, rtol=1e-9, atol=1e-9)
    # Correct datums: the station sits on the DEM (the hill formula against its
    # bilinear interpolant: well under a metre) and nothing is flagged.
    assert np.nanmax(np.abs(sc.values(a, "dem_diff"))) < 2.0
    assert sc.texts(a, "qc_flag") == [""] * 16 and sc.texts(a, "qc_note") == [""] * 16
    assert (sc.digest(survey["stations"]), sc.digest(survey["dem"])) == before

    # The reduction uses ellipsoidal heights either way: identical anomalies.
    common = {"INPUT": str(survey["stations"]), "GRAVITY_FIELD": "g_obs", "DEM": str(survey["dem"]), "OUTER_RADIUS": sc.OUTER}
    ra = sc.layer(sc.run("bouguerreduction", dict(common, HEIGHT_FIELD="h_ell", OUTPUT=str(tmp_path / "ra.gpkg")))["OUTPUT"])
    rb = sc.layer(
        sc.run("bouguerreduction", dict(common, HEIGHT_FIELD="h_orth", HEIGHT_DATUM=1, OUTPUT=str(tmp_path / "rb.gpkg")))["OUTPUT"]
    )
    for name in ("faa", "sba", "cba", "tc_total", "dem_diff", "tc_cover"):
        np.testing.assert_allclose(sc.values(rb, name), sc.values(ra, name), rtol=1e-9, atol=1e-7)
    assert sc.texts(ra, "qc_flag") == [""] * 16
    # Legacy practice: orthometric heights in the reduction lower the free-air
    # correction by 0.3086 mGal/m x N (first order).
    rl = sc.layer(
        sc.run("bouguerreduction", dict(common, HEIGHT_FIELD="h_ell", ORTHOMETRIC_REDUCTION=True, OUTPUT=str(tmp_path / "rl.gpkg")))["OUTPUT"]
    )
    shift = sc.values(ra, "height_corr") - sc.values(rl, "height_corr")
    np.testing.assert_allclose(shift, 0.3086 * survey["n"], rtol=0.01)


def test_wrong_dem_datum_is_flagged_and_named_in_the_log(survey, tmp_path, collecting_feedback, dem_writer):
    """GNSS heights with a DEM that is really ellipsoidal but left at the EGM96 default."""
    dem_ell = dem_writer(tmp_path / "dem_ell.tif", sc.dem_array() + float(np.mean(survey["n"])), sc.WEST, sc.NORTH, sc.CELL, epsg=sc.EPSG)
    right = sc.layer(
        sc.run(
            "terraincorrection",
            {"INPUT": str(survey["stations"]), "DEM": str(dem_ell), "HEIGHT_FIELD": "h_ell", "DEM_DATUM": 1,
             "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "right.gpkg")},
        )["OUTPUT"]
    )
    wrong = sc.layer(
        sc.run(
            "terraincorrection",
            {"INPUT": str(survey["stations"]), "DEM": str(dem_ell), "HEIGHT_FIELD": "h_ell",
             "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "wrong.gpkg")},
            collecting_feedback,
        )["OUTPUT"]
    )
    assert all("height_dem_mismatch" in f.split(";") for f in sc.texts(wrong, "qc_flag")), (sc.texts(wrong, "qc_flag"), sc.values(wrong, "dem_diff"))
    assert all("disagrees with the DEM" in note for note in sc.texts(wrong, "qc_note"))
    assert any("DEM_DATUM" in w and "Ellipsoid" in w for w in collecting_feedback.warnings)
    np.testing.assert_allclose(sc.values(wrong, "dem_diff"), -survey["n"], atol=2.5)
    assert sc.texts(right, "qc_flag") == [""] * 16
    # Measured for the record (printed with -s): what the wrong datum does to tc_total.
    delta = sc.values(wrong, "tc_total") - sc.values(right, "tc_total")
    print(f"wrong DEM datum: tc_total shift mean {delta.mean():.3f} max {np.abs(delta).max():.3f} mGal")


def test_orthometric_stations_declared_ellipsoidal_are_named(survey, tmp_path, collecting_feedback):
    sc.run(
        "bouguerreduction",
        {"INPUT": str(survey["stations"]), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h_orth", "DEM": str(survey["dem"]),
         "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "o.gpkg")},
        collecting_feedback,
    )
    out = sc.layer(tmp_path / "o.gpkg")
    assert all("height_dem_mismatch" in f for f in sc.texts(out, "qc_flag"))
    # Stations one geoid height below an EGM96 DEM: either setting removes it; the
    # hint names one and the sentence says both are possible.
    assert any("geoid height" in w and "DEM_DATUM" in w for w in collecting_feedback.warnings)


def test_geoid_settings_are_checked(survey, tmp_path, dem_writer):
    from qgis.core import QgsProcessingException

    base = {"INPUT": str(survey["stations"]), "DEM": str(survey["dem"]), "HEIGHT_FIELD": "h_orth", "OUTER_RADIUS": sc.OUTER,
            "OUTPUT": str(tmp_path / "g.gpkg")}
    with pytest.raises(QgsProcessingException, match="exactly one of GEOID_FIELD and GEOID_RASTER"):
        sc.run("terraincorrection", dict(base, HEIGHT_DATUM=2))
    with pytest.raises(QgsProcessingException, match="does not use it"):
        sc.run("terraincorrection", dict(base, GEOID_FIELD="n_geoid"))
    # A 'geoid' raster holding heights (hundreds of metres) is not a geoid.
    with pytest.raises(QgsProcessingException, match="geoid heights lie within"):
        sc.run("terraincorrection", dict(base, HEIGHT_DATUM=2, GEOID_RASTER=str(survey["dem"])))
    # A real geoid raster (constant 47 m) works like the field.
    flat = dem_writer(tmp_path / "geoid.tif", np.full((sc.N, sc.N), 47.0), sc.WEST, sc.NORTH, sc.CELL, epsg=sc.EPSG)
    out = sc.layer(sc.run("terraincorrection", dict(base, HEIGHT_DATUM=2, GEOID_RASTER=str(flat)))["OUTPUT"])
    assert np.all(np.isfinite(sc.values(out, "tc_total")))
    assert not (tmp_path / "g.gpkg").with_name("never").exists()


@pytest.mark.parametrize(("units", "factor"), [(0, 1.0), (1, 10.0), (2, 1e-3), (3, 1e-5)])
def test_gravity_units(survey, tmp_path, units, factor, points_writer):
    from qgis.core import QgsProcessingException

    x, y = sc.station_xy()
    g = sc.gravity(survey["ortho"] + survey["n"]) * factor
    path = Path(points_writer(tmp_path / f"g{units}.gpkg", x, y, {"g": [float(v) for v in g], "h": [float(v) for v in survey["ortho"] + survey["n"]]}, epsg=sc.EPSG))
    before = sc.digest(path)
    params = {"INPUT": str(path), "GRAVITY_FIELD": "g", "HEIGHT_FIELD": "h", "OUTPUT": str(tmp_path / "out.gpkg")}
    if units:
        names = {1: "µm/s²", 2: "Gal", 3: "m/s²"}
        with pytest.raises(QgsProcessingException, match=f"GRAVITY_UNITS to '{names[units]}"):
            sc.run("bouguerreduction", params)
        assert not (tmp_path / "out.gpkg").exists()
    out = sc.layer(sc.run("bouguerreduction", dict(params, GRAVITY_UNITS=units))["OUTPUT"])
    expected_g = sc.gravity(survey["ortho"] + survey["n"])
    normal = sc.values(out, "normal_g")
    faa = sc.values(out, "faa")
    np.testing.assert_allclose(faa, expected_g - normal + sc.values(out, "height_corr") + sc.values(out, "atmos_corr"), atol=1e-6)
    assert sc.digest(path) == before


def test_zero_and_single_bad_gravity(survey, tmp_path, points_writer):
    from qgis.core import QgsProcessingException

    x, y = sc.station_xy()
    h = [float(v) for v in survey["ortho"] + survey["n"]]
    zeros = points_writer(tmp_path / "z.gpkg", x, y, {"g": [0.0] * 16, "h": h}, epsg=sc.EPSG)
    with pytest.raises(QgsProcessingException, match="is 0: the field holds no readings"):
        sc.run("bouguerreduction", {"INPUT": zeros, "GRAVITY_FIELD": "g", "HEIGHT_FIELD": "h", "OUTPUT": str(tmp_path / "out.gpkg")})
    g = [float(v) for v in sc.gravity(survey["ortho"])]
    g[5] = 0.0
    one = points_writer(tmp_path / "one.gpkg", x, y, {"g": g, "h": h}, epsg=sc.EPSG)
    out = sc.layer(sc.run("bouguerreduction", {"INPUT": one, "GRAVITY_FIELD": "g", "HEIGHT_FIELD": "h", "OUTPUT": str(tmp_path / "out.gpkg")})["OUTPUT"])
    flags = sc.texts(out, "qc_flag")
    assert flags[5] == "gravity_implausible" and flags[4] == ""
    assert np.isnan(sc.values(out, "faa")[5])


@pytest.mark.parametrize(
    ("scale", "units", "match"),
    [
        (1 / 0.3048, 0, "feet read as metres.*HEIGHT_UNITS to feet"),
        (100.0, 0, "centimetres read as metres.*HEIGHT_UNITS to centimetres"),
        (1.0, 1, "metres declared in another unit.*HEIGHT_UNITS to metres"),
    ],
)
def test_heights_in_the_wrong_units_stop_the_run(survey, tmp_path, points_writer, scale, units, match):
    from qgis.core import QgsProcessingException

    x, y = sc.station_xy()
    h = (survey["ortho"] + survey["n"]) * scale
    path = points_writer(tmp_path / "h.gpkg", x, y, {"h": [float(v) for v in h]}, epsg=sc.EPSG)
    with pytest.raises(QgsProcessingException, match=match):
        sc.run("terraincorrection", {"INPUT": path, "DEM": str(survey["dem"]), "HEIGHT_FIELD": "h", "HEIGHT_UNITS": units,
                                     "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "out.gpkg")})
    assert not (tmp_path / "out.gpkg").exists()
    if units == 0 and scale > 50:
        out = sc.layer(sc.run("terraincorrection", {"INPUT": path, "DEM": str(survey["dem"]), "HEIGHT_FIELD": "h", "HEIGHT_UNITS": 2,
                                                    "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "out.gpkg")})["OUTPUT"])
        assert sc.texts(out, "qc_flag") == [""] * 16


def _int16_dem(path, heights, nodata_hole=True):
    from osgeo import gdal, osr

    data = np.round(heights).astype(np.int16)
    if nodata_hole:
        data[10:14, 10:14] = -32768
    ds = gdal.GetDriverByName("GTiff").Create(str(path), data.shape[1], data.shape[0], 1, gdal.GDT_Int16)
    ds.SetGeoTransform((sc.WEST, sc.CELL, 0, sc.NORTH, 0, -sc.CELL))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(sc.EPSG)
    ds.SetProjection(srs.ExportToWkt())
    ds.GetRasterBand(1).WriteArray(data)
    ds = None
    return path


@pytest.mark.parametrize(
    ("kind", "match"),
    [
        ("feet", "looks like heights in feet"),
        ("centimetres", "higher than any point on Earth"),
        ("void", "no NoData value"),
    ],
)
def test_dem_in_the_wrong_units_or_with_untagged_voids(survey, tmp_path, dem_writer, kind, match):
    from qgis.core import QgsProcessingException

    if kind == "void":
        dem = _int16_dem(tmp_path / "void.tif", sc.dem_array())
    else:
        factor = 1 / 0.3048 if kind == "feet" else 100.0
        dem = dem_writer(tmp_path / f"{kind}.tif", sc.dem_array() * factor, sc.WEST, sc.NORTH, sc.CELL, epsg=sc.EPSG)
    before = sc.digest(dem)
    for algorithm, extra in (("terraincorrection", {}), ("bouguerreduction", {"GRAVITY_FIELD": "g_obs"})):
        with pytest.raises(QgsProcessingException, match=match):
            sc.run(algorithm, dict({"INPUT": str(survey["stations"]), "DEM": str(dem), "HEIGHT_FIELD": "h_orth", "HEIGHT_DATUM": 1,
                                    "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "out.gpkg")}, **extra))
        assert not (tmp_path / "out.gpkg").exists()
    assert sc.digest(dem) == before


@pytest.mark.parametrize(("density", "match"), [(1e6, "1,000 times too large"), (2.67, "looks like g/cm³"), (9000.0, "outside the accepted range")])
def test_density_parameter_limits_in_both_algorithms(survey, tmp_path, density, match):
    from qgis.core import QgsProcessingException

    for algorithm, extra in (("terraincorrection", {}), ("bouguerreduction", {"GRAVITY_FIELD": "g_obs"})):
        with pytest.raises(QgsProcessingException, match=match):
            sc.run(algorithm, dict({"INPUT": str(survey["stations"]), "DEM": str(survey["dem"]), "HEIGHT_FIELD": "h_ell",
                                    "DENSITY": density, "OUTPUT": str(tmp_path / "out.gpkg")}, **extra))
    assert not (tmp_path / "out.gpkg").exists()


def test_density_field_off_by_1000_stops_and_single_bad_density_is_flagged(survey, tmp_path, points_writer):
    from qgis.core import QgsProcessingException

    x, y = sc.station_xy()
    h = [float(v) for v in survey["ortho"] + survey["n"]]
    g = [float(v) for v in sc.gravity(survey["ortho"] + survey["n"])]
    # kg/m3 values declared as g/cm3: 2.67e6 kg/m3 after units.
    path = points_writer(tmp_path / "rho.gpkg", x, y, {"g": g, "h": h, "rho": [2670.0] * 16}, epsg=sc.EPSG)
    params = {"INPUT": path, "GRAVITY_FIELD": "g", "HEIGHT_FIELD": "h", "DENSITY_FIELD": "rho", "TC_FIELD": None,
              "OUTPUT": str(tmp_path / "out.gpkg")}
    with pytest.raises(QgsProcessingException, match=r"DENSITY_FIELD rho.*DENSITY_FIELD_UNITS"):
        sc.run("bouguerreduction", dict(params, DENSITY_FIELD_UNITS=1))
    assert not (tmp_path / "out.gpkg").exists()
    rho = [2670.0] * 16
    rho[3] = 2_670_000.0
    one = points_writer(tmp_path / "rho1.gpkg", x, y, {"g": g, "h": h, "rho": rho}, epsg=sc.EPSG)
    out = sc.layer(sc.run("bouguerreduction", dict(params, INPUT=one))["OUTPUT"])
    flags = sc.texts(out, "qc_flag")
    assert flags[3] == "density_bad" and flags[2] == ""
    assert np.isnan(sc.values(out, "sba")[3]) and np.isfinite(sc.values(out, "faa")[3])


def test_datum_and_units_through_qgis_process(survey, tmp_path, qgis_process_env):
    executable, env = qgis_process_env
    ref = sc.layer(_tc(survey, tmp_path / "ref.gpkg", HEIGHT_FIELD="h_ell")["OUTPUT"])
    out = tmp_path / "cli.gpkg"
    run = subprocess.run(
        [executable, "run", "reliefgravity:terraincorrection", "--", f"INPUT={survey['stations']}", f"DEM={survey['dem']}",
         "HEIGHT_FIELD=h_orth", "HEIGHT_DATUM=1", "DEM_DATUM=0", f"OUTER_RADIUS={sc.OUTER}", f"OUTPUT={out}"],
        env=env, capture_output=True, text=True, timeout=300,
    )
    assert run.returncode == 0, run.stdout + run.stderr
    np.testing.assert_allclose(sc.values(sc.layer(out), "tc_total"), sc.values(ref, "tc_total"), atol=1e-9)
    bad = subprocess.run(
        [executable, "run", "reliefgravity:bouguerreduction", "--", f"INPUT={survey['stations']}", "GRAVITY_FIELD=g_obs",
         "HEIGHT_FIELD=h_ell", "GRAVITY_UNITS=2", f"OUTPUT={tmp_path / 'bad.gpkg'}"],
        env=env, capture_output=True, text=True, timeout=300,
    )
    assert bad.returncode != 0
    assert "GRAVITY_UNITS to 'mGal'" in bad.stdout + bad.stderr
    assert not (tmp_path / "bad.gpkg").exists()
