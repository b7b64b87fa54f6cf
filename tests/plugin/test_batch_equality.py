# SPDX-License-Identifier: GPL-2.0-or-later
"""The batch runner gives the Processing algorithms' results, field by field.

Each case runs ``processing.run`` and ``python3 -m relief_gravity.batch`` (in
process, on a shared LocalCluster of two worker processes, small chunks so the
stations are spread over many tasks) on the same files and options, and
compares every field of the plugin's output with the batch output: numbers to
1e-9 (mGal, m), text exactly, ``qc_flag`` after reading the plugin's reasons as
flag codes. Data: the invented demo survey and invented synthetic layers.
"""

from __future__ import annotations

from pathlib import Path

import numpy as np
import pytest

REPO = Path(__file__).resolve().parents[2]
DEMO = REPO / "demo" / "data"
TOLERANCE = 1e-9


def _rows(path):
    from osgeo import ogr

    ds = ogr.Open(str(path))
    lyr = ds.GetLayer(0)
    defn = lyr.GetLayerDefn()
    names = [defn.GetFieldDefn(i).GetName() for i in range(defn.GetFieldCount())]
    rows = []
    for f in lyr:
        row = {n: (f.GetField(n) if f.IsFieldSetAndNotNull(n) else None) for n in names}
        g = f.GetGeometryRef()
        row["__xy"] = None if g is None else (g.GetX(), g.GetY())
        rows.append(row)
    return names, rows


def assert_same_as_plugin(plugin_out, batch_out):
    """Every field of the plugin's output equals the batch output's."""
    from relief_gravity.batch.flags import as_qc_flag, codes_of, note_of

    p_names, p_rows = _rows(plugin_out)
    b_names, b_rows = _rows(batch_out)
    assert len(p_rows) == len(b_rows)
    missing = [n for n in p_names if n not in b_names]
    assert not missing, missing
    # The batch output adds qc_note (the codes' meanings) where the plugin has none.
    assert b_names == (p_names if "qc_note" in p_names else [*p_names, "qc_note"])
    worst, compared = 0.0, 0
    for i, (p, b) in enumerate(zip(p_rows, b_rows, strict=True)):
        assert p["__xy"] == b["__xy"], i
        for name in p_names:
            a, c = p[name], b[name]
            if name == "qc_flag":
                assert as_qc_flag(codes_of(a or "")) == (c or ""), (i, a, c)
                assert note_of(c or "") == (b["qc_note"] or ""), i
            elif name == "qc_note":
                assert (a is None or a == "") == (c is None or c == ""), (i, a, c)  # wording may differ
            elif isinstance(a, float) or isinstance(c, float):
                assert (a is None) == (c is None), (i, name, a, c)
                if a is not None:
                    compared += 1
                    worst = max(worst, abs(a - c))
                    assert abs(a - c) <= TOLERANCE, (i, name, a, c)
            else:
                assert a == c, (i, name, a, c)
    # Not a comparison of empty columns: most rows have computed values.
    print(f"worst |plugin - batch| over {compared} numbers: {worst:.3g}")
    computed = [n for n in ("tc_total", "faa") if n in p_names]
    assert sum(1 for r in p_rows if r[computed[0]] is not None) > len(p_rows) // 2
    assert compared > 3 * len(p_rows)
    return worst


def _plugin(algorithm, params, out):
    import processing
    from qgis.core import QgsProcessingContext

    processing.run(algorithm, {**params, "OUTPUT": str(out)}, context=QgsProcessingContext())
    return out


def _batch(argv, out, address, chunk=37):
    from relief_gravity.batch.cli import main

    code = main([*argv, "--output", str(out), "--scheduler", address, "--chunk-size", str(chunk), "--quiet"])
    assert code == 0
    return out


def test_demo_reduction_equals_plugin(provider, tmp_path, dask_address):
    params = {
        "INPUT": str(DEMO / "corvahl_stations.gpkg"),
        "GRAVITY_FIELD": "obs_grav",
        "HEIGHT_FIELD": "elev_m",
        "DEM": str(DEMO / "corvahl_dem.tif"),
        "REGIONAL_DEM": str(DEMO / "corvahl_regional.tif"),
    }
    plugin = _plugin("reliefgravity:bouguerreduction", params, tmp_path / "plugin.gpkg")
    batch = _batch(
        ["reduce", "--stations", params["INPUT"], "--gravity-field", "obs_grav", "--height-field", "elev_m",
         "--dem", params["DEM"], "--regional-dem", params["REGIONAL_DEM"]],
        tmp_path / "batch.gpkg",
        dask_address,
        chunk=40,
    )
    assert_same_as_plugin(plugin, batch)


# --- a few hundred synthetic stations with awkward rows ------------------------


@pytest.fixture(scope="module")
def synthetic(tmp_path_factory, dem_writer, points_writer):
    """Invented: a 20 km hilly DEM (100 m cells, a NoData hole, a hollow below
    sea level) in a 1 km regional DEM (in UTM, and warped to lon/lat so both
    runners reproject it), 300 stations in UTM 32N and the same in lon/lat,
    with NULL and odd values."""
    return _scenario(tmp_path_factory.mktemp("batch_synthetic"), dem_writer, points_writer)


def _scenario(folder: Path, dem_writer, points_writer):
    from osgeo import gdal, osr

    rng = np.random.default_rng(20261202)
    west, north, cell, n = 490_000.0, 5_010_000.0, 100.0, 200
    c = (np.arange(n) + 0.5) * cell
    xx, yy = np.meshgrid(c, c)
    fine = 400.0 + 500.0 * np.exp(-((xx - 8000) ** 2 + (yy - 9000) ** 2) / (2 * 2500.0**2)) + 80.0 * np.sin(xx / 900.0) * np.cos(yy / 1300.0)
    fine[150:158, 30:40] = -9999.0
    fine[5:20, 5:20] = -30.0  # a hollow below sea level (water option)
    dem = dem_writer(folder / "fine.tif", fine, west, north, cell, nodata=-9999.0)
    rn, rcell = 80, 1000.0
    rwest, rnorth = west - 30_000.0, north + 30_000.0
    rc = (np.arange(rn) + 0.5) * rcell
    rxx, ryy = np.meshgrid(rc, rc)
    regional = 350.0 + 300.0 * np.sin(rxx / 9000.0) * np.cos(ryy / 7000.0)
    utm = dem_writer(folder / "regional_utm.tif", regional, rwest, rnorth, rcell)
    geo = str(folder / "regional_geo.tif")
    gdal.Warp(geo, str(utm), dstSRS="EPSG:4326", resampleAlg="bilinear")

    m = 300
    xs = rng.uniform(west - 500, west + n * cell + 500, m)  # a few fall outside the DEM
    ys = rng.uniform(north - n * cell - 500, north + 500, m)
    heights = 400.0 + rng.uniform(0, 600, m)
    gravity = 980_600.0 + rng.normal(0, 20, m)
    rho = rng.uniform(2.3, 2.9, m)  # g/cm3
    rho[::17] = np.nan
    rho[5] = 0.0
    rho[7] = 4.2  # unusual
    heights[::23] = np.nan
    gravity[::29] = np.nan
    tc_given = rng.uniform(0.0, 3.0, m)
    tc_given[::13] = np.nan
    inner = rng.uniform(0.0, 0.2, m)
    inner[::11] = np.nan
    cols = {"name": [f"P{i:03d}" for i in range(m)], "g": gravity, "h_ft": heights / 0.3048, "h": heights, "rho": rho, "tc_given": tc_given, "inner": inner}
    utm_pts = points_writer(folder / "stations_utm.gpkg", xs, ys, cols)
    src = osr.SpatialReference()
    src.ImportFromEPSG(32632)
    dst = osr.SpatialReference()
    dst.ImportFromEPSG(4326)
    for s in (src, dst):
        s.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    ll = np.array(osr.CoordinateTransformation(src, dst).TransformPoints(np.column_stack([xs, ys]).tolist()))
    geo_pts = points_writer(folder / "stations_ll.gpkg", ll[:, 0], ll[:, 1], cols, epsg=4326)
    dem_geo = str(folder / "fine_geo.tif")
    gdal.Warp(dem_geo, str(dem), dstSRS="EPSG:4326", resampleAlg="bilinear")
    return {"dem": str(dem), "dem_geo": dem_geo, "regional_geo": geo, "regional_utm": str(utm), "utm": utm_pts, "ll": geo_pts}


CASES = {
    "reduce: density field in g/cm3, feet, 1967, first order, no atmosphere, flat slab, regional in lon/lat": (
        "reliefgravity:bouguerreduction",
        {"INPUT": "utm", "GRAVITY_FIELD": "g", "HEIGHT_FIELD": "h_ft", "HEIGHT_UNITS": 1, "DEM": "dem",
         "REGIONAL_DEM": "regional_geo", "DENSITY_FIELD": "rho", "DENSITY_FIELD_UNITS": 1, "NORMAL_GRAVITY": 2,
         "HEIGHT_CORRECTION": 1, "ATMOSPHERIC": False, "CURVATURE": False, "OUTER_RADIUS": 25000.0},
        ["reduce", "--stations", "utm", "--gravity-field", "g", "--height-field", "h_ft", "--height-units", "feet",
         "--dem", "dem", "--regional-dem", "regional_geo", "--density-field", "rho", "--density-field-units", "g/cm3",
         "--normal-gravity", "1967", "--height-correction", "first-order", "--no-atmospheric", "--no-curvature",
         "--outer-radius", "25000"],
    ),
    "reduce: heights from the DEM, existing terrain-correction field, stations in lon/lat": (
        "reliefgravity:bouguerreduction",
        {"INPUT": "ll", "GRAVITY_FIELD": "g", "DEM": "dem", "TC_FIELD": "tc_given", "NORMAL_GRAVITY": 1},
        ["reduce", "--stations", "ll", "--gravity-field", "g", "--dem", "dem", "--tc-field", "tc_given",
         "--normal-gravity", "wgs84"],
    ),
    "terrain: ring-and-sector, zone fields, field-estimated zone A, heights from the DEM": (
        "reliefgravity:terraincorrection",
        {"INPUT": "utm", "DEM": "dem", "METHOD": 1, "ZONE_FIELDS": True, "INNERMOST_TC_FIELD": "inner", "DENSITY": 2400.0},
        ["terrain", "--stations", "utm", "--dem", "dem", "--method", "ring-sector", "--zone-fields",
         "--innermost-tc-field", "inner", "--density", "2400"],
    ),
    "terrain: exact, water below sea level, innermost field, stations in lon/lat, regional in UTM": (
        "reliefgravity:terraincorrection",
        {"INPUT": "ll", "HEIGHT_FIELD": "h", "DEM": "dem", "REGIONAL_DEM": "regional_utm", "WATER_DENSITY": 1030.0,
         "INNERMOST_TC_FIELD": "inner", "INNER_RADIUS": 1500.0, "OUTER_RADIUS": 30000.0},
        ["terrain", "--stations", "ll", "--height-field", "h", "--dem", "dem", "--regional-dem", "regional_utm",
         "--water-density", "1030", "--innermost-tc-field", "inner", "--inner-radius", "1500", "--outer-radius", "30000"],
    ),
    "terrain: exact engine on a lon/lat DEM, with the engine's own error": (
        "reliefgravity:terraincorrection",
        {"INPUT": "ll", "HEIGHT_FIELD": "h", "DEM": "dem_geo", "OUTER_RADIUS": 15000.0, "ENGINE_CHECK": True},
        ["terrain", "--stations", "ll", "--height-field", "h", "--dem", "dem_geo", "--outer-radius", "15000",
         "--engine-check"],
    ),
}


@pytest.mark.parametrize("case", list(CASES), ids=[c.split(":")[0] + "-" + str(i) for i, c in enumerate(CASES)])
def test_synthetic_equals_plugin(provider, tmp_path, synthetic, dask_address, case):
    algorithm, params, argv = CASES[case]
    params = {k: synthetic.get(v, v) if isinstance(v, str) else v for k, v in params.items()}
    argv = [synthetic.get(a, a) for a in argv]
    plugin = _plugin(algorithm, params, tmp_path / "plugin.gpkg")
    batch = _batch(argv, tmp_path / "batch.gpkg", dask_address, chunk=23)
    assert_same_as_plugin(plugin, batch)
    # The awkward rows are there: flagged stations in both outputs.
    _, rows = _rows(batch)
    assert sum(1 for r in rows if r["qc_flag"]) >= 10
