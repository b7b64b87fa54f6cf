# SPDX-License-Identifier: GPL-2.0-or-later
"""Throughput of the batch runner (relief_gravity.batch) on Dask.

Runs ``reduce`` (terrain correction to 166.7 km + Bouguer reduction) on
synthetic stations over the terrain benchmark's scenario: a 40.5 km square
30 m fine DEM, stored as a VRT mosaic of 3 x 3 GeoTIFF tiles, nested in a
405 km square 750 m regional DEM (``bench/terrain_scenario.py``). Each run
is a fresh ``python3 tools/batch.py`` process with a LocalCluster of 1, then 2
worker processes; the runner reports the peak resident memory of every
worker. Printed: stations/s, CPU-seconds per station, peak memory per worker,
parallel efficiency (rate with 2 workers / twice the rate with 1).

    python3 bench/bench_batch.py                    # 100,000 stations (long: see bench/README.md)
    python3 bench/bench_batch.py --stations 10000   # the size measured on the shared machine
"""

from __future__ import annotations

import argparse
import os
import re
import subprocess
import sys
import tempfile
import time
from pathlib import Path

import numpy as np

HERE = Path(__file__).resolve().parent
REPO = HERE.parent
sys.path.insert(0, str(HERE))

import terrain_scenario  # noqa: E402


def write_inputs(folder: Path, n: int) -> dict:
    """Write the invented scenario's DEM tiles, VRT, regional DEM and ``n`` stations into ``folder``."""
    from osgeo import gdal, ogr, osr

    gdal.UseExceptions()
    sc = terrain_scenario.build()
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32611)
    wkt = srs.ExportToWkt()

    def tif(path, array, west, north, cell):
        ds = gdal.GetDriverByName("GTiff").Create(
            str(path), array.shape[1], array.shape[0], 1, gdal.GDT_Float32, ["TILED=YES"]
        )
        ds.SetGeoTransform((west, cell, 0, north, 0, -cell))
        ds.SetProjection(wkt)
        ds.GetRasterBand(1).WriteArray(array.astype(np.float32))
        ds = None
        return str(path)

    tiles = []
    step = terrain_scenario.FINE_N // 3
    for i in range(3):
        for j in range(3):
            part = sc.fine[i * step : (i + 1) * step, j * step : (j + 1) * step]
            tiles.append(
                tif(
                    folder / f"fine_{i}{j}.tif",
                    part,
                    sc.fine_west + j * step * sc.fine_cell,
                    sc.fine_north - i * step * sc.fine_cell,
                    sc.fine_cell,
                )
            )
    fine = str(folder / "fine.vrt")
    gdal.BuildVRT(fine, tiles)
    regional = tif(folder / "regional.tif", sc.regional, sc.regional_west, sc.regional_north, sc.regional_cell)

    x, y, h = sc.stations(n)
    rng = np.random.default_rng(5)
    g = 979_800.0 + rng.normal(0, 30, n)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(folder / "stations.gpkg"))
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    lyr = ds.CreateLayer("stations", srs, ogr.wkbPoint)
    for name in ("g", "h"):
        lyr.CreateField(ogr.FieldDefn(name, ogr.OFTReal))
    ds.StartTransaction()
    for i in range(n):
        f = ogr.Feature(lyr.GetLayerDefn())
        f.SetField(0, float(g[i]))
        f.SetField(1, float(h[i]))
        geom = ogr.Geometry(ogr.wkbPoint)
        geom.AddPoint_2D(float(x[i]), float(y[i]))
        f.SetGeometry(geom)
        lyr.CreateFeature(f)
    ds.CommitTransaction()
    ds = None
    return {"stations": str(folder / "stations.gpkg"), "fine": fine, "regional": regional}


def run(inputs: dict, out: Path, workers: int, chunk: int) -> dict:
    """Run the batch command in a child process; its wall time and peak memory."""
    cmd = [
        sys.executable,
        str(REPO / "tools" / "batch.py"),
        "reduce",
        "--stations",
        inputs["stations"],
        "--gravity-field",
        "g",
        "--height-field",
        "h",
        "--dem",
        inputs["fine"],
        "--regional-dem",
        inputs["regional"],
        "--output",
        str(out),
        "--workers",
        str(workers),
        "--chunk-size",
        str(chunk),
        "--quiet",
        "--overwrite",
    ]
    load = os.getloadavg()
    t0 = time.monotonic()
    done = subprocess.run(cmd, capture_output=True, text=True)
    wall = time.monotonic() - t0
    if done.returncode != 0:
        msg = f"batch run failed:\n{done.stdout}\n{done.stderr}"
        raise SystemExit(msg)
    tail = done.stdout.split("Peak memory per worker:")[1]
    peaks = [float(v.replace(",", "")) for v in re.findall(r"([\d,]+) MiB", tail)]
    cpu = [float(v.replace(",", "")) for v in re.findall(r"([\d,.]+) s\b", tail.split("CPU time per worker:")[1])]
    return {"wall": wall, "peaks": peaks, "cpu": sum(cpu), "load": load, "log": done.stdout}


def setup_cost(inputs: dict, n_marginal: int = 200) -> dict:
    """CPU time of a one-station chunk and of a chunk of ``n_marginal`` stations, in this process.

    The one-station chunk measures the per-chunk set-up (block statistics of
    every level read from the rasters); both report the raster cells read.
    """
    import relief_gravity.batch.adapters as adapters
    from relief_gravity.batch.rasters import GdalRaster

    counted = {"cells": 0}

    def grid(path):
        raster = GdalRaster(path)
        plain = raster.read_window

        def reader(r0, c0, nr, nc):
            counted["cells"] += nr * nc
            return plain(r0, c0, nr, nc)

        raster.read_window = reader
        return raster.elevation_grid()

    sc_x, sc_y, sc_h = terrain_scenario.build().stations(n_marginal, seed=99)
    out = {}
    for n in (1, n_marginal):
        counted["cells"] = 0
        fine, regional = grid(inputs["fine"]), grid(inputs["regional"])
        t0 = time.process_time()
        adapters.terrain_chunk(
            sc_x[:n],
            sc_y[:n],
            sc_h[:n],
            fine,
            regional,
            inner_radius=2000.0,
            outer_radius=166735.0,
            density=np.full(n, 2670.0),
            reference_density=2670.0,
            innermost_tc=None,
            water_density=None,
            method=adapters.EXACT,
        )
        out[n] = (time.process_time() - t0, counted["cells"])
    return out


def driver_cost(inputs: dict, folder: Path) -> tuple[float, float]:
    """Seconds the driver spends alone, for this run's size.

    Checking and reading the stations (prepare) and writing the output copy
    (assembly).
    """
    from relief_gravity.batch.options import COMMANDS
    from relief_gravity.batch.prepare import prepare
    from relief_gravity.batch.vector import write_output

    values = {p.name: (p.default if p.kind in ("number", "enum", "bool") else None) for p in COMMANDS["reduce"][1]}
    values.update(
        INPUT=inputs["stations"],
        GRAVITY_FIELD="g",
        HEIGHT_FIELD="h",
        DEM=inputs["fine"],
        REGIONAL_DEM=inputs["regional"],
        OUTPUT=str(folder / "driver.gpkg"),
    )
    t0 = time.monotonic()
    plan = prepare("reduce", values, overwrite=True)
    t_read = time.monotonic() - t0
    columns = {
        name: np.zeros(plan.n)
        for name in (
            "normal_g",
            "height_corr",
            "atmos_corr",
            "slab_corr",
            "curv_corr",
            "tc_inner",
            "tc_outer",
            "tc_total",
            "faa",
            "sba",
            "cba",
        )
    }
    t0 = time.monotonic()
    temp = write_output(
        inputs["stations"], None, values["OUTPUT"], columns, {"qc_flag": [""] * plan.n, "qc_note": [""] * plan.n}
    )
    t_write = time.monotonic() - t0
    os.remove(temp)
    return t_read, t_write


def national_cells(cell: float = 30.0, outer: float = 166_735.0) -> float:
    """Cells one chunk's set-up reads from a fine mosaic that covers the whole disc.

    The nested level windows, the largest a square of side 2 x outer; the
    smaller ones add about a third (windows double in size per level).
    """
    return (2.0 * outer / cell) ** 2 * 4.0 / 3.0


def main() -> None:
    """Parse the options, build the inputs, run and print the figures."""
    parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--stations", type=int, default=100_000)
    parser.add_argument("--chunk-size", type=int, default=200)
    parser.add_argument(
        "--workers",
        default="1,2",
        help="worker counts to time (default 1,2; empty: only the in-process set-up figures)",
    )
    args = parser.parse_args()
    with tempfile.TemporaryDirectory(prefix="bench_batch_") as tmp:
        folder = Path(tmp)
        t0 = time.monotonic()
        inputs = write_inputs(folder, args.stations)
        print(
            f"inputs: {args.stations:,} stations over the central 20 x 20 km; fine DEM 1350 x 1350 cells of 30 m "
            f"as a VRT of 9 GeoTIFF tiles; regional 540 x 540 cells of 750 m (written in {time.monotonic() - t0:.0f} s)"
        )
        print(
            f"machine: {os.cpu_count()} cores; chunk size {args.chunk_size}; reduce with terrain correction to "
            "166.735 km"
        )
        rates = {}
        for w in [int(v) for v in args.workers.split(",") if v.strip()]:
            r = run(inputs, folder / f"out_{w}.gpkg", w, args.chunk_size)
            rate = args.stations / r["wall"]
            rates[w] = rate
            print(
                f"workers {w}: {r['wall']:.1f} s wall (start-up, reading and writing included), {rate:,.1f} "
                "stations/s, "
                f"{r['cpu'] / args.stations * 1000:.2f} CPU-ms per station in the workers "
                f"({r['wall'] * w / args.stations * 1000:.2f} worker-wall-ms), peak memory per worker "
                + ", ".join(f"{p:,.0f} MiB" for p in r["peaks"])
                + f"; load average before {r['load'][0]:.2f}"
            )
        if 1 in rates and 2 in rates:
            print(
                f"parallel efficiency (2 workers): {rates[2] / (2 * rates[1]) * 100:.0f} % (wall-clock rates; the "
                "load average shows what the machine's other users took)"
            )
        sys.path.insert(0, str(Path(tempfile.mkdtemp(prefix="rg_path_"))))
        link = Path(sys.path[0]) / "relief_gravity"
        link.symlink_to(REPO, target_is_directory=True)
        cost = setup_cost(inputs)
        t1, c1 = cost[1]
        tn, _cells_n = cost[200]
        per_station = (tn - t1) / 199
        rate = c1 / t1
        print(
            f"[per-chunk set-up, in-process CPU] one-station chunk {t1:.2f} s reading {c1 / 1e6:.2f} M cells "
            f"({rate / 1e6:.1f} M cells/s); 200-station chunk {tn:.2f} s -> {per_station * 1000:.2f} CPU-ms per "
            "extra station"
        )
        t_read, t_write = driver_cost(inputs, folder)
        print(
            f"[driver, serial] checking and reading {args.stations:,} stations {t_read:.1f} s "
            f"({t_read / args.stations * 1e6:.0f} us/station), writing the output copy {t_write:.1f} s "
            f"({t_write / args.stations * 1e6:.0f} us/station)"
        )
        nat = national_cells()
        print(
            f"[national model] a 30 m mosaic covering each chunk's 166.7 km disc: about {nat / 1e6:.0f} M cells "
            "read per chunk, "
            f"{nat / rate:.0f} CPU-s of set-up per chunk at the measured rate"
        )


if __name__ == "__main__":
    main()
