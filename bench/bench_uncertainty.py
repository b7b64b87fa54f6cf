# SPDX-License-Identifier: GPL-2.0-or-later
"""Monte Carlo check of the uncertainty budget on the invented demo survey.

Perturbs the station heights and the fine DEM's cells by the stated normal
errors, recomputes the terrain correction with the engine and the complete
Bouguer anomaly with the reduction, and compares the observed spread of the
anomaly with the budget's prediction (height and DEM components, the only
ones perturbed here). Prints the figures measured in this one run.

    .venv/bin/python bench/bench_uncertainty.py [--runs 40] [--stations 351]
        [--height-sigma 0.5] [--dem-sigma 2.0]
"""

from __future__ import annotations

import argparse
import sys
import time
from pathlib import Path

import numpy as np

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT / "bench"))
from _checkout import register_checkout  # noqa: E402 - after the path is set

DATA = ROOT / "demo" / "data"


def load_demo(n_stations: int | None, seed: int = 1):
    """Demo DEMs (as arrays) and a random subset of its stations (x, y, height, latitude)."""
    from osgeo import gdal, ogr, osr

    def grid(path):
        ds = gdal.Open(str(path))
        gt = ds.GetGeoTransform()
        band = ds.GetRasterBand(1)
        z = band.ReadAsArray().astype(float)
        nodata = band.GetNoDataValue()
        if nodata is not None:
            z[z == nodata] = np.nan
        return z, gt

    fine, fine_gt = grid(DATA / "corvahl_dem.tif")
    regional, regional_gt = grid(DATA / "corvahl_regional.tif")
    source = ogr.Open(str(DATA / "corvahl_stations.gpkg"))
    layer = source.GetLayer(0)
    wgs = osr.SpatialReference()
    wgs.ImportFromEPSG(4326)
    wgs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    to_geo = osr.CoordinateTransformation(layer.GetSpatialRef(), wgs)
    rows = []
    for feature in layer:
        point = feature.GetGeometryRef()
        _, lat, _ = to_geo.TransformPoint(point.GetX(), point.GetY())
        rows.append((point.GetX(), point.GetY(), feature.GetField("elev_m"), lat))
    x, y, h, lat = (np.array(col, dtype=float) for col in zip(*rows, strict=True))
    if n_stations is not None and n_stations < x.size:
        pick = np.sort(np.random.default_rng(seed).choice(x.size, n_stations, replace=False))
        x, y, h, lat = x[pick], y[pick], h[pick], lat[pick]
    return (fine, fine_gt), (regional, regional_gt), x, y, h, lat


def monte_carlo(runs, n_stations, height_sigma, dem_sigma, seed=7, inner_radius=895.0):
    """Observed and predicted spreads (mGal) of the complete Bouguer anomaly per station."""
    from relief_gravity.algorithms import reduce_gravity
    from relief_gravity.algorithms.terrain import ElevationGrid, terrain_correction
    from relief_gravity.algorithms.uncertainty import height_component, near_terrain_spread, quadrature_sum

    (fine, fgt), (regional, rgt), x, y, h, lat = load_demo(n_stations)

    def as_grid(z, gt):
        return ElevationGrid.from_array(z, gt[0], gt[3], gt[1], -gt[5])

    regional_grid = as_grid(regional, rgt)

    def cba(fine_z, heights):
        tc = terrain_correction(x, y, heights, as_grid(fine_z, fgt), regional_grid,
                                inner_radius=inner_radius, density=2670.0).tc_total
        return reduce_gravity(np.zeros_like(heights), lat, heights, 2670.0, terrain_correction=tc)["cba"]

    rng = np.random.default_rng(seed)
    start = time.perf_counter()
    base = cba(fine, h)
    draws = []
    for _ in range(runs):
        noisy = fine + rng.normal(0.0, dem_sigma, fine.shape)
        draws.append(cba(noisy, h + rng.normal(0.0, height_sigma, h.size)) - base)
    mc_seconds = time.perf_counter() - start
    observed = np.std(np.array(draws), axis=0, ddof=1)
    start = time.perf_counter()
    near = near_terrain_spread(x, y, h, as_grid(fine, fgt), 2670.0, dem_sigma, height_sigma, radius=inner_radius)
    sigma_h = height_component(lat, h, height_sigma, 2670.0, terrain_nodes=near.height_nodes)
    predicted = quadrature_sum(sigma_h, near.dem)
    budget_seconds = time.perf_counter() - start
    return observed, predicted, mc_seconds, budget_seconds


def main(argv=None) -> int:
    """Run the check and print the figures."""
    parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--runs", type=int, default=40)
    parser.add_argument("--stations", type=int, default=351)
    parser.add_argument("--height-sigma", type=float, default=0.5)
    parser.add_argument("--dem-sigma", type=float, default=2.0)
    args = parser.parse_args(argv)
    register_checkout()
    observed, predicted, mc_s, budget_s = monte_carlo(args.runs, args.stations, args.height_sigma, args.dem_sigma)
    ok = np.isfinite(observed) & np.isfinite(predicted) & (predicted > 0)
    ratio = observed[ok] / predicted[ok]
    pooled = float(np.sqrt(np.mean(observed[ok] ** 2) / np.mean(predicted[ok] ** 2)))
    print(f"Monte Carlo on the demo survey: {ok.sum()} stations, {args.runs} runs, "
          f"height sigma {args.height_sigma} m, DEM sigma {args.dem_sigma} m per cell")
    print(f"  predicted cba spread (mGal): median {np.median(predicted[ok]):.4f}, max {predicted[ok].max():.4f}")
    print(f"  observed  cba spread (mGal): median {np.median(observed[ok]):.4f}, max {observed[ok].max():.4f}")
    print(f"  observed / predicted: pooled {pooled:.3f}; per station median {np.median(ratio):.3f}, "
          f"5-95 % {np.percentile(ratio, 5):.3f}-{np.percentile(ratio, 95):.3f}")
    print(f"  stations within 30 %: {np.mean(np.abs(ratio - 1) <= 0.3) * 100:.0f} % "
          f"(each station's spread from {args.runs} draws is itself uncertain by about "
          f"{100 / np.sqrt(2 * args.runs):.0f} %)")
    print(f"  time: Monte Carlo {mc_s:.1f} s, budget {budget_s:.1f} s")
    return 0


if __name__ == "__main__":
    sys.exit(main())
