# SPDX-License-Identifier: GPL-2.0-or-later
"""Generate the bundled demo scenario "Corvahl" (invented data) into demo/data/.

INVENTED DATA, FOR DEMONSTRATION AND SELF-CONSISTENCY TESTS ONLY. The Corvahl
Range, the Brennmoor Basin and the Ostrel intrusion do not exist; nothing here
was measured anywhere.

Run with Debian's interpreter from anywhere::

    /usr/bin/python3 demo/make_scenario.py [--out DIR] [--seed N]

It writes ``corvahl_dem.tif`` (50 m), ``corvahl_regional.tif`` (1 km) and
``corvahl_stations.gpkg`` (layer ``stations``) and prints a summary. The run
is deterministic: the same seed gives the same numbers (and, with the fixed
GeoPackage timestamp set below, the same files) on the same numpy and GDAL.
See demo/README.md for the scenario and the forward model.
"""

from __future__ import annotations

import argparse
import importlib.util
import sys
import time
from pathlib import Path

import numpy as np
from osgeo import gdal, ogr, osr

REPO_ROOT = Path(__file__).resolve().parent.parent


def _register_checkout():
    """Import this checkout as the package ``relief_gravity`` (whatever its folder is called).

    Nothing generic goes on sys.path, exactly as tests/conftest.py does it.
    """
    if "relief_gravity" not in sys.modules:
        spec = importlib.util.spec_from_file_location(
            "relief_gravity", REPO_ROOT / "__init__.py", submodule_search_locations=[str(REPO_ROOT)]
        )
        module = importlib.util.module_from_spec(spec)
        sys.modules["relief_gravity"] = module
        spec.loader.exec_module(module)
    from relief_gravity.demo import forward_model

    return forward_model


def _reduction_density() -> float:
    from relief_gravity.algorithms.constants import DEFAULT_REDUCTION_DENSITY

    return DEFAULT_REDUCTION_DENSITY


fm = _register_checkout()

NAME = "corvahl"
EPSG = 32632  # WGS 84 / UTM zone 32N: a projected metric CRS around latitude 45 N
CENTRE_E = 500_000.0
CENTRE_N = 5_000_000.0

FINE_CELL = 50.0
FINE_HALF = 15_000.0  # fine DEM: 30 km x 30 km
REGIONAL_CELL = 1_000.0
REGIONAL_HALF = 200_000.0  # regional DEM: 400 km x 400 km
SURVEY_HALF = 10_000.0  # stations inside the central 20 km x 20 km

TERRAIN_DENSITY = _reduction_density()  # kg/m^3, the reduction density, so the CBA gives back the bodies
SEDIMENT_CONTRAST = -450.0  # kg/m^3, basin fill against 2670 granite/basement
SEDIMENT_TOP = 250.0  # m; flat top of the modelled deficit, below the lowest basin station
SEDIMENT_MAX_THICKNESS = 1700.0  # m below SEDIMENT_TOP at the deepest point
INTRUSION_CONTRAST = 300.0  # kg/m^3, gabbro (2970) in granite
BODY_CELL = 250.0  # m, horizontal size of the body prisms
READING_NOISE = 0.01  # mGal, 1 sigma

STRIKE_DEG = 20.0  # the range and the basin trend 20 degrees east of north


# --- random fields ---------------------------------------------------------


def fractal_field(rng, n_rows, n_cols, cell, beta=3.2, longest=8000.0, shortest=None):
    """Seeded, periodic, zero-mean, unit-variance field with a power-law spectrum.

    Power ~ (k^2 + k0^2)^(-beta/2): beta ~ 3 is typical of land topography in
    two dimensions; k0 = 1/longest stops the largest scales from dominating.
    """
    ky = np.fft.fftfreq(n_rows, d=cell)[:, None]
    kx = np.fft.rfftfreq(n_cols, d=cell)[None, :]
    k2 = kx * kx + ky * ky
    amplitude = (k2 + (1.0 / longest) ** 2) ** (-beta / 4.0)
    if shortest is not None:
        amplitude = amplitude * np.exp(-k2 * shortest**2)
    amplitude[0, 0] = 0.0
    spectrum = amplitude * (rng.standard_normal(amplitude.shape) + 1j * rng.standard_normal(amplitude.shape))
    field = np.fft.irfft2(spectrum, s=(n_rows, n_cols))
    return (field - field.mean()) / field.std()


def _rotate(u, v, strike_deg=STRIKE_DEG):
    """(across, along) strike coordinates: along points to the strike azimuth."""
    t = np.radians(strike_deg)
    along = u * np.sin(t) + v * np.cos(t)
    across = u * np.cos(t) - v * np.sin(t)
    return across, along


# --- the invented landscape -------------------------------------------------


def background(u, v, waves):
    """Gentle regional lowland and hills (m); u, v in metres from the survey centre."""
    h = 300.0 - 0.0006 * (u * 0.8 + v * 0.6)  # tilts down towards the south-west
    # A broad upland around the survey, so the basin floor (300 m) is a
    # depression and not a plateau.
    h = h + 160.0 * np.exp(-(u * u + v * v) / (2 * 25_000.0**2))
    for amp, kx, ky, phase in waves:
        h = h + amp * np.cos(kx * u + ky * v + phase)
    return h


def range_height(u, v):
    """The invented Corvahl Range: an asymmetric granite ridge with a pass (m above base)."""
    across, along = _rotate(u - 4500.0, v - 500.0)
    width = np.where(across < 0.0, 2000.0, 3500.0)  # steep western, fault-bounded face
    profile = np.exp(-((across / width) ** 2))
    crest = 1100.0 * np.exp(-((along / 8500.0) ** 4)) * (1.0 + 0.12 * np.cos(2 * np.pi * along / 6000.0 + 0.7))
    pass_notch = 1.0 - 0.35 * np.exp(-(((along + 2000.0) / 1200.0) ** 2))
    return crest * pass_notch * profile


def basin_radius(u, v):
    """Elliptical radius about the Brennmoor Basin centre (1 on the floor's edge)."""
    across, along = _rotate(u + 6000.0, v + 1000.0)
    return np.sqrt((across / 4500.0) ** 2 + (along / 8000.0) ** 2)


def basin_mask(u, v):
    """1 on the flat floor of the invented Brennmoor Basin, 0 outside, smooth edge."""
    return 1.0 / (1.0 + np.exp((basin_radius(u, v) - 1.0) / 0.06))


def _soft_floor(h):
    """Smoothly keep land above ~20 m: a coastal plain rather than negative land."""
    return 20.0 + np.logaddexp(0.0, (h - 20.0) / 15.0) * 15.0


def make_dems(rng_waves, rng_regional_noise, rng_fine_noise):
    """Fine (50 m) and regional (1 km) DEMs as float32 arrays, row 0 north."""
    waves = []
    for _ in range(6):
        wavelength = rng_waves.uniform(25_000.0, 120_000.0)
        azimuth = rng_waves.uniform(0.0, np.pi)
        k = 2 * np.pi / wavelength
        amplitude = rng_waves.uniform(25.0, 60.0)
        waves.append((amplitude, k * np.cos(azimuth), k * np.sin(azimuth), rng_waves.uniform(0, 2 * np.pi)))

    n_reg = int(round(2 * REGIONAL_HALF / REGIONAL_CELL))
    reg_u = (np.arange(n_reg) + 0.5) * REGIONAL_CELL - REGIONAL_HALF
    reg_v = REGIONAL_HALF - (np.arange(n_reg) + 0.5) * REGIONAL_CELL
    regional_noise = 38.0 * fractal_field(rng_regional_noise, n_reg, n_reg, REGIONAL_CELL, beta=3.0, longest=30_000.0)
    uu, vv = np.meshgrid(reg_u, reg_v)
    regional = _soft_floor(background(uu, vv, waves) + regional_noise)

    n_fine = int(round(2 * FINE_HALF / FINE_CELL))
    fu = (np.arange(n_fine) + 0.5) * FINE_CELL - FINE_HALF
    fv = FINE_HALF - (np.arange(n_fine) + 0.5) * FINE_CELL
    fuu, fvv = np.meshgrid(fu, fv)
    # The regional noise continues smoothly under the fine DEM (bilinear
    # between its 1 km centres), so the fine DEM's block means meet the
    # regional cells outside without a step.
    noise_grid = fm.HeightGrid(-REGIONAL_HALF, REGIONAL_HALF, REGIONAL_CELL, regional_noise)
    base = _soft_floor(background(fuu, fvv, waves) + fm.bilinear_height(noise_grid, fuu, fvv))
    ridge = range_height(fuu, fvv)
    mask = basin_mask(fuu, fvv)
    edge = np.minimum(FINE_HALF - np.abs(fuu), FINE_HALF - np.abs(fvv))
    taper = np.clip(edge / 2000.0, 0.0, 1.0) ** 2
    # Low hills ring the basin, so that its floor is a true depression.
    base = base + taper * 140.0 * np.exp(-(((basin_radius(fuu, fvv) - 1.35) / 0.3) ** 2))
    # Short-wave roughness: rugged on the range, moderate on the hills; it
    # fades out over the outer 2 km so the footprint edge matches the regional.
    rough = fractal_field(rng_fine_noise, n_fine, n_fine, FINE_CELL, beta=3.4, longest=4000.0)
    relief = base + ridge + taper * (12.0 + 65.0 * ridge / 1100.0) * rough
    floor = 300.0 + 0.0008 * (fvv + 1000.0) + 1.5 * rough  # alluvial plain, draining gently south
    fine = relief * (1.0 - mask) + floor * mask
    return fine.astype(np.float32), regional.astype(np.float32)


def fill_regional_footprint(fine, regional):
    """Replace the regional cells under the fine DEM by block means of the fine DEM."""
    ratio = int(round(REGIONAL_CELL / FINE_CELL))
    n = fine.shape[0] // ratio
    means = fine.astype(np.float64).reshape(n, ratio, n, ratio).mean(axis=(1, 3))
    i0 = int(round((REGIONAL_HALF - FINE_HALF) / REGIONAL_CELL))
    out = regional.copy()
    out[i0 : i0 + n, i0 : i0 + n] = means.astype(np.float32)
    return out


# --- the buried bodies ---------------------------------------------------------


def _column_grid(centre_u, centre_v, half_extent):
    c = np.arange(-half_extent + 0.5 * BODY_CELL, half_extent, BODY_CELL)
    cu, cv = np.meshgrid(centre_u + c, centre_v + c)
    return cu.ravel(), cv.ravel()


def sediment_fill():
    """Brennmoor Basin fill: a half-graben, deepest against the range-front fault (east)."""
    cu, cv = _column_grid(-6000.0, -1000.0, 9000.0)
    across, along = _rotate(cu + 6000.0, cv + 1000.0)
    rho2 = (across / 4000.0) ** 2 + (along / 7500.0) ** 2
    asym = 0.75 + 0.25 * np.clip(across / 4000.0, -1.0, 1.0)
    shape = np.clip(1.0 - rho2, 0.0, None) * asym
    thickness = SEDIMENT_MAX_THICKNESS * shape / shape.max()
    keep = thickness > 5.0
    cu, cv, thickness = cu[keep], cv[keep], thickness[keep]
    half = 0.5 * BODY_CELL
    return fm.PrismSet(
        CENTRE_E + cu - half, CENTRE_E + cu + half, CENTRE_N + cv - half, CENTRE_N + cv + half,
        SEDIMENT_TOP - thickness, np.full(cu.size, SEDIMENT_TOP), np.full(cu.size, SEDIMENT_CONTRAST),
    )


def ostrel_intrusion():
    """Ostrel gabbro: an oblate ellipsoid of columns, top 0.8 km below sea level."""
    centre_u, centre_v, centre_z = 3000.0, -5500.0, -2600.0
    a, b, c = 3500.0, 2500.0, 1800.0
    cu, cv = _column_grid(centre_u, centre_v, 4000.0)
    across, along = _rotate(cu - centre_u, cv - centre_v, strike_deg=50.0)
    q = (along / a) ** 2 + (across / b) ** 2
    keep = q < 1.0
    cu, cv, half_height = cu[keep], cv[keep], c * np.sqrt(1.0 - q[keep])
    half = 0.5 * BODY_CELL
    return fm.PrismSet(
        CENTRE_E + cu - half, CENTRE_E + cu + half, CENTRE_N + cv - half, CENTRE_N + cv + half,
        centre_z - half_height, centre_z + half_height, np.full(cu.size, INTRUSION_CONTRAST),
    )


def _check_fill_below_ground(sediment, grid):
    """The modelled deficit must stay under the ground (and so under every station)."""
    lowest = np.inf
    for ox in np.linspace(0.0, 1.0, 6):
        for oy in np.linspace(0.0, 1.0, 6):
            x = sediment.west + ox * (sediment.east - sediment.west)
            y = sediment.south + oy * (sediment.north - sediment.south)
            lowest = min(lowest, float(np.min(fm.bilinear_height(grid, x, y))))
    if lowest <= SEDIMENT_TOP:
        msg = f"the DEM falls to {lowest:.1f} m over the basin fill, below its top at {SEDIMENT_TOP} m"
        raise RuntimeError(msg)


# --- the stations ----------------------------------------------------------------

ROADS = {
    # Invented roads (km from the survey centre): A crosses basin and range by
    # the Corvahl pass, B runs along the basin, C follows the eastern flank.
    "A": [(-10.0, 1.5), (-4.0, 0.5), (0.0, -1.0), (3.8, -1.4), (6.5, -0.8), (10.0, -0.5)],
    "B": [(-9.5, -9.5), (-7.0, -4.0), (-5.5, 2.0), (-3.0, 9.5)],
    "C": [(9.5, 9.5), (8.0, 3.0), (7.5, -4.0), (8.5, -9.5)],
}


def road_stations(rng, spacing=400.0, jitter=15.0):
    """Stations every ``spacing`` m along each road, a few metres off the centre line."""
    ids, xs, ys = [], [], []
    for road, vertices in ROADS.items():
        pts = np.asarray(vertices) * 1000.0
        seg = np.hypot(*np.diff(pts, axis=0).T)
        chain = np.concatenate([[0.0], np.cumsum(seg)])
        at = np.arange(0.0, chain[-1] + 1e-6, spacing)
        x = np.interp(at, chain, pts[:, 0]) + rng.normal(0.0, jitter, at.size)
        y = np.interp(at, chain, pts[:, 1]) + rng.normal(0.0, jitter, at.size)
        inside = (np.abs(x) < SURVEY_HALF) & (np.abs(y) < SURVEY_HALF)
        for k, (xi, yi) in enumerate(zip(x[inside], y[inside], strict=True)):
            ids.append(f"{road}{k + 1:03d}")
            xs.append(xi)
            ys.append(yi)
    return ids, np.asarray(xs), np.asarray(ys)


def random_stations(rng, n, min_spacing, avoid_x, avoid_y):
    """Scattered stations with a minimum spacing (dart throwing), off the roads."""
    xs, ys = list(avoid_x), list(avoid_y)
    n_avoid = len(xs)
    tries = 0
    while len(xs) - n_avoid < n:
        tries += 1
        if tries > 200_000:
            msg = f"could not place {n} stations {min_spacing} m apart"
            raise RuntimeError(msg)
        x, y = rng.uniform(-SURVEY_HALF + 100.0, SURVEY_HALF - 100.0, 2)
        d2 = (np.asarray(xs) - x) ** 2 + (np.asarray(ys) - y) ** 2
        if d2.size and d2.min() < min_spacing**2:
            continue
        xs.append(x)
        ys.append(y)
    ids = [f"S{k + 1:03d}" for k in range(n)]
    return ids, np.asarray(xs[n_avoid:]), np.asarray(ys[n_avoid:])


# --- output ------------------------------------------------------------------------


def _srs(epsg):
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    return srs


def write_geotiff(path, array, west, north, cell, description):
    """Write a north-up height raster as a compressed single-band GeoTIFF in the demo's CRS.

    Parameters
    ----------
    path : pathlib.Path
        File to (re)write.
    array : numpy.ndarray
        Heights above the ellipsoid, m; row 0 is the northern row.
    west, north : float
        Western and northern edges, m.
    cell : float
        Square cell size, m.
    description : str
        Text for the TIFF image description tag.
    """
    path.unlink(missing_ok=True)
    driver = gdal.GetDriverByName("GTiff")
    rows, cols = array.shape
    ds = driver.Create(
        str(path), cols, rows, 1, gdal.GDT_Float32,
        options=["COMPRESS=DEFLATE", "PREDICTOR=3", "ZLEVEL=9", "TILED=YES"],
    )
    ds.SetGeoTransform((west, cell, 0.0, north, 0.0, -cell))
    ds.SetProjection(_srs(EPSG).ExportToWkt())
    ds.SetMetadataItem("TIFFTAG_IMAGEDESCRIPTION", description)
    band = ds.GetRasterBand(1)
    band.SetDescription("height above the ellipsoid (m)")
    band.SetUnitType("m")
    band.WriteArray(array)
    band.FlushCache()
    ds = None


def write_stations(path, ids, x, y, fields):
    """Write the stations as a point GeoPackage (byte-identical between runs).

    Parameters
    ----------
    path : pathlib.Path
        File to (re)write.
    ids : sequence of str
        Station ids.
    x, y : array_like
        Eastings and northings, m, in the demo's CRS.
    fields : dict of str to array_like
        Real-valued fields, one value per station.
    """
    path.unlink(missing_ok=True)
    # A fixed timestamp keeps the GeoPackage byte-identical between runs.
    gdal.SetConfigOption("OGR_CURRENT_DATE", "2026-01-01T00:00:00.000Z")
    driver = ogr.GetDriverByName("GPKG")
    ds = driver.CreateDataSource(str(path))
    layer = ds.CreateLayer(
        "stations", _srs(EPSG), ogr.wkbPoint,
        options=["DESCRIPTION=Corvahl demo survey - INVENTED data for demonstration and tests only"],
    )
    field = ogr.FieldDefn("station_id", ogr.OFTString)
    field.SetWidth(8)
    layer.CreateField(field)
    for name in fields:
        layer.CreateField(ogr.FieldDefn(name, ogr.OFTReal))
    layer.StartTransaction()
    defn = layer.GetLayerDefn()
    for k, sid in enumerate(ids):
        feat = ogr.Feature(defn)
        feat.SetField("station_id", sid)
        for name, values in fields.items():
            feat.SetField(name, float(values[k]))
        point = ogr.Geometry(ogr.wkbPoint)
        point.AddPoint_2D(float(x[k]), float(y[k]))
        feat.SetGeometry(point)
        layer.CreateFeature(feat)
    layer.CommitTransaction()
    ds = None
    gdal.SetConfigOption("OGR_CURRENT_DATE", None)


def basin_floor_outline(n=181):
    """Vertices (x, y in the demo's CRS) of the basin floor's mapped edge (``basin_radius == 1``), closed."""
    t = np.linspace(0.0, 2.0 * np.pi, n)
    across, along = 4500.0 * np.cos(t), 8000.0 * np.sin(t)
    s = np.radians(STRIKE_DEG)
    u = across * np.cos(s) + along * np.sin(s) - 6000.0
    v = -across * np.sin(s) + along * np.cos(s) - 1000.0
    u[-1], v[-1] = u[0], v[0]
    return CENTRE_E + u, CENTRE_N + v


def write_geology(path):
    """Write the invented surface geology map: basin-floor alluvium and the bedrock around it.

    Only a map of what crops out: the scenario's rock at the surface is
    2670 kg/m^3 everywhere (the light fill lies below ``SEDIMENT_TOP``), so
    the layer carries unit names and no densities. The demo uses it to leave
    the basin-floor stations out of the density estimate.
    """
    path.unlink(missing_ok=True)
    gdal.SetConfigOption("OGR_CURRENT_DATE", "2026-01-01T00:00:00.000Z")
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer(
        "geology", _srs(EPSG), ogr.wkbPolygon,
        options=["DESCRIPTION=Corvahl demo survey - INVENTED surface geology for demonstration and tests only"],
    )
    for name in ("unit", "description"):
        layer.CreateField(ogr.FieldDefn(name, ogr.OFTString))
    bx, by = basin_floor_outline()
    floor = ogr.Geometry(ogr.wkbLinearRing)
    for a, b in zip(bx, by, strict=True):
        floor.AddPoint_2D(float(a), float(b))
    w, e = CENTRE_E - FINE_HALF, CENTRE_E + FINE_HALF
    s_, n_ = CENTRE_N - FINE_HALF, CENTRE_N + FINE_HALF
    frame = ogr.Geometry(ogr.wkbLinearRing)
    for a, b in ((w, s_), (w, n_), (e, n_), (e, s_), (w, s_)):
        frame.AddPoint_2D(a, b)
    alluvium = ogr.Geometry(ogr.wkbPolygon)
    alluvium.AddGeometry(floor)
    bedrock = ogr.Geometry(ogr.wkbPolygon)
    bedrock.AddGeometry(frame)
    bedrock.AddGeometry(floor.Clone())
    rows = (
        ("alluvium", "Brennmoor Basin floor: alluvium over the basin fill", alluvium),
        ("bedrock", "granite and gneiss of the Corvahl Range and the hills", bedrock),
    )
    layer.StartTransaction()
    for unit, text, geometry in rows:
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("unit", unit)
        feature.SetField("description", text)
        feature.SetGeometry(geometry)
        layer.CreateFeature(feature)
    layer.CommitTransaction()
    ds = None
    gdal.SetConfigOption("OGR_CURRENT_DATE", None)


def latitudes(x, y):
    """Geodetic latitude (degrees) of UTM 32N positions, through OSR."""
    transform = osr.CoordinateTransformation(_srs(EPSG), _srs(4326))
    return np.array([transform.TransformPoint(float(a), float(b))[1] for a, b in zip(x, y, strict=True)])


# --- main ----------------------------------------------------------------------------


def main(argv=None):
    """Generate the invented Corvahl demo scenario into ``--out``.

    Parameters
    ----------
    argv : list of str, optional
        Command-line arguments without the program name (default: ``sys.argv[1:]``).
    """
    parser = argparse.ArgumentParser(description="Generate the invented Corvahl demo scenario.")
    parser.add_argument("--out", type=Path, default=Path(__file__).resolve().parent / "data")
    parser.add_argument("--seed", type=int, default=20261201)
    args = parser.parse_args(argv)
    start = time.process_time()
    wall = time.time()

    streams = np.random.SeedSequence(args.seed).spawn(6)
    rng_waves, rng_reg, rng_fine, rng_roads, rng_scatter, rng_noise = (np.random.default_rng(s) for s in streams)

    fine, regional = make_dems(rng_waves, rng_reg, rng_fine)
    regional = fill_regional_footprint(fine, regional)
    fine_grid = fm.HeightGrid(CENTRE_E - FINE_HALF, CENTRE_N + FINE_HALF, FINE_CELL, fine)
    regional_grid = fm.HeightGrid(CENTRE_E - REGIONAL_HALF, CENTRE_N + REGIONAL_HALF, REGIONAL_CELL, regional)

    road_ids, rx, ry = road_stations(rng_roads)
    scatter_ids, sx, sy = random_stations(rng_scatter, 200, 600.0, rx, ry)
    ids = road_ids + scatter_ids
    x = CENTRE_E + np.concatenate([rx, sx])
    y = CENTRE_N + np.concatenate([ry, sy])
    # Station height = bilinear DEM, kept to the millimetre; every later
    # number uses this rounded value, so the file is self-consistent.
    elev = np.round(fm.bilinear_height(fine_grid, x, y), 3)
    lat = latitudes(x, y)

    sediment, intrusion = sediment_fill(), ostrel_intrusion()
    _check_fill_below_ground(sediment, fine_grid)
    bodies = fm.PrismSet.concatenate(sediment, intrusion)
    body = fm.body_attraction(x, y, elev, bodies)

    def report(done, total):
        if done % 50 == 0 or done == total:
            print(f"  terrain: {done}/{total} stations", flush=True)

    terrain = fm.terrain_attraction(x, y, elev, fine_grid, regional_grid, density=TERRAIN_DENSITY, progress=report)
    noise = rng_noise.normal(0.0, READING_NOISE, x.size)
    obs = fm.observed_gravity(lat, elev, terrain, body, noise)

    # Self-check of the terrain quadrature on a few stations: double both
    # exact-prism radii and compare.
    probe = np.linspace(0, x.size - 1, 6).astype(int)
    refined = fm.terrain_attraction(
        x[probe], y[probe], elev[probe], fine_grid, regional_grid, density=TERRAIN_DENSITY,
        near_radius=6000.0, regional_prism_radius=60000.0,
    )
    quad_diff = np.max(np.abs(refined - terrain[probe]))

    args.out.mkdir(parents=True, exist_ok=True)
    note = "INVENTED demo data (Corvahl scenario) for demonstration and self-consistency tests only"
    write_geotiff(
        args.out / f"{NAME}_dem.tif", fine, fine_grid.west, fine_grid.north, FINE_CELL, note + "; fine DEM, 50 m"
    )
    write_geotiff(
        args.out / f"{NAME}_regional.tif", regional, regional_grid.west, regional_grid.north, REGIONAL_CELL,
        note + "; regional DEM, 1 km, block means of the fine DEM inside its footprint",
    )
    write_geology(args.out / f"{NAME}_geology.gpkg")
    write_stations(
        args.out / f"{NAME}_stations.gpkg", ids, x, y,
        {"obs_grav": obs, "elev_m": elev, "body_mgal": body, "terrain_mgal": terrain},
    )

    print(f"Corvahl scenario (invented data) written to {args.out}")
    for label, grid, cell in (("fine DEM", fine, FINE_CELL), ("regional DEM", regional, REGIONAL_CELL)):
        print(
            f"  {label} {grid.shape[1]} x {grid.shape[0]} cells of {cell:.0f} m, "
            f"heights {grid.min():.1f} .. {grid.max():.1f} m"
        )
    print(
        f"  stations {x.size} ({len(road_ids)} on roads, {len(scatter_ids)} scattered), "
        f"heights {elev.min():.1f} .. {elev.max():.1f} m"
    )
    for label, prisms in (("sediment fill", sediment), ("Ostrel intrusion", intrusion)):
        print(f"  {label}: {prisms.size} prisms, anomalous mass {prisms.mass():.3e} kg")
    for name, v in (("obs_grav", obs), ("body_mgal", body), ("terrain_mgal", terrain)):
        print(f"  {name:12s} {v.min():12.4f} .. {v.max():12.4f} mGal")
    print(f"  terrain quadrature check (6 stations, prism radii doubled): max |diff| {quad_diff:.5f} mGal")
    print(f"  CPU {time.process_time() - start:.1f} s, wall {time.time() - wall:.1f} s")


if __name__ == "__main__":
    main()
