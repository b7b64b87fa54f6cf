# SPDX-License-Identifier: GPL-2.0-or-later
"""Generate invented raw gravimeter readings for the Corvahl demo survey.

INVENTED DATA, FOR DEMONSTRATION AND SELF-CONSISTENCY TESTS ONLY.

Starting from the survey's observed gravity (``corvahl_stations.gpkg``, field
``obs_grav``), it simulates a field crew: ten days of loops from base CV-BASE
(an absolute value is given for it), a second base CV-EAST tied in on the first
day and used to open the eastern days, a meter read in counter units through a
calibration table, instrument heights, local times (UTC+2) written without
an offset, the Earth tide (Longman 1959, factor 1.16), a drift of a few
hundredths of a mGal per hour with a little random walk, reading noise, and a
tare (a 0.42 mGal jump) late on the sixth morning, after which the crew
returned to the base and opened a new loop.

Run with Debian's interpreter from anywhere (about a second)::

    /usr/bin/python3 demo/make_readings.py [--out DIR] [--seed N]

Writes ``corvahl_readings.csv``, ``corvahl_calibration.csv`` and
``corvahl_field_stations.gpkg`` (the stations with ``known_mgal`` at the base).
"""

from __future__ import annotations

import argparse
import csv
import importlib.util
import sys
from pathlib import Path

import numpy as np
from osgeo import gdal, ogr, osr

REPO_ROOT = Path(__file__).resolve().parent.parent
DATA = Path(__file__).resolve().parent / "data"
UTC_OFFSET = 2.0  # local time of the crew, hours east of UTC
FIRST_DAY = "2026-06-08"
DAYS = 10
READING_NOISE = 0.004  # mGal, 1 sigma
TARE = (5, 0.42)  # day index, jump in mGal


def _register_checkout():
    if "relief_gravity" not in sys.modules:
        spec = importlib.util.spec_from_file_location(
            "relief_gravity", REPO_ROOT / "__init__.py", submodule_search_locations=[str(REPO_ROOT)]
        )
        module = importlib.util.module_from_spec(spec)
        sys.modules["relief_gravity"] = module
        spec.loader.exec_module(module)
    from relief_gravity.algorithms import survey

    return survey


sv = _register_checkout()


def read_stations(path):
    """Stations of the demo GeoPackage as dicts (attributes plus ``x``, ``y``) and the layer's CRS."""
    ds = ogr.Open(str(path))
    layer = ds.GetLayer(0)
    rows = []
    for feature in layer:
        point = feature.GetGeometryRef()
        rows.append(dict(feature.items(), x=point.GetX(), y=point.GetY()))
    srs = layer.GetSpatialRef().Clone()
    ds = None
    return rows, srs


def geographic(rows, srs):
    """Latitude and longitude (degrees, EPSG:4326) of the station rows given in ``srs``."""
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    wgs = osr.SpatialReference()
    wgs.ImportFromEPSG(4326)
    wgs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    transform = osr.CoordinateTransformation(srs, wgs)
    lonlat = np.array([transform.TransformPoint(r["x"], r["y"])[:2] for r in rows])
    return lonlat[:, 1], lonlat[:, 0]


def calibration_table():
    """An invented meter table: counter 0-7000 in steps of 100, factor near 1.0175 mGal/unit."""
    counter = np.arange(0, 7001, 100, dtype=float)
    factor = np.round(1.01750 + 0.00004 * np.sin(counter / 1100.0) - 0.000002 * counter / 1000.0, 5)
    mgal = np.concatenate([[0.0], np.cumsum(factor[:-1] * 100.0)])
    return sv.CalibrationTable.from_rows(counter, np.round(mgal, 3), factor)


def route(xy, start, members):
    """Nearest-neighbour order through ``members`` starting near ``start``."""
    left = list(members)
    order, here = [], xy[start]
    while left:
        k = int(np.argmin([np.hypot(*(xy[m] - here)) for m in left]))
        order.append(left.pop(k))
        here = xy[order[-1]]
    return order


def plan_days(xy, base, east, rng):
    """Station order per day: the survey split into ten strips from west to east."""
    others = [i for i in range(len(xy)) if i not in (base, east)]
    strips = np.array_split(sorted(others, key=lambda i: (xy[i, 0], xy[i, 1])), DAYS)
    days = []
    for day, strip in enumerate(strips):
        opening = east if day >= DAYS - 3 else base
        order = route(xy, opening, strip)
        repeats = list(rng.choice(order, size=max(2, len(order) // 12), replace=False))
        days.append((opening, order, repeats))
    return days


def simulate(rows, lat, lon, rng):
    """Invent the field readings of the survey: (readings, base index, east index, calibration table)."""
    xy = np.array([[r["x"], r["y"]] for r in rows])
    truth = np.array([r["obs_grav"] for r in rows])
    elev = np.array([r["elev_m"] for r in rows])
    centre = xy.mean(axis=0)
    base = int(np.argmin(np.hypot(*(xy - centre).T)))
    east = int(np.argmax(xy[:, 0] - 0.3 * np.abs(xy[:, 1] - centre[1])))
    table = calibration_table()
    readings = []
    day0 = sv.parse_time(FIRST_DAY + "T00:00:00", UTC_OFFSET).utc_hours
    for day, (opening, order, repeats) in enumerate(plan_days(xy, base, east, rng)):
        meter_zero = 977_400.0 - rng.uniform(0, 0.4)  # the meter's level changes overnight
        rate = rng.uniform(-0.045, 0.045)  # mGal/h
        clock = day0 + 24.0 * day + 7.5 + rng.uniform(0, 0.3)
        visits = [opening]
        if day == 0:
            visits += [east, base, east, base]  # tie the second base in: base-east ladder
        for k, s in enumerate(order):
            visits.append(s)
            if s in repeats:
                visits.append(s)  # a re-read after re-levelling
            if k == len(order) // 2:
                visits.append(opening)  # back through the base at midday
        visits.append(opening)
        start, walk, tared = clock, 0.0, False
        loop = f"D{day + 1:02d}"
        for k, s in enumerate(visits):
            step = rng.uniform(0.05, 0.1) if k and visits[k - 1] == s else rng.uniform(0.15, 0.35)
            if day == 0 and k and {visits[k - 1], s} == {base, east}:
                step = rng.uniform(0.6, 0.9)  # driving between the bases
            clock += step if k else 0.0
            walk += rng.normal(0.0, 0.002 * np.sqrt(step)) if k else 0.0
            if day == TARE[0] and not tared and clock - start > 3.0:
                tared = True
                meter_zero -= TARE[1]  # a knock: the meter now reads 0.42 mGal high
                loop += "b"  # the crew drives back to the base and opens a new loop
                clock += 0.4
                start = clock
                readings.append(reading_row(
                    opening, clock, loop, truth, elev, lat, lon, table, meter_zero, rate, start, walk, rng, rows,
                    tare_first=True,
                ))
                clock += 0.3
            readings.append(reading_row(
                s, clock, loop, truth, elev, lat, lon, table, meter_zero, rate, start, walk, rng, rows
            ))
    return readings, base, east, table


def reading_row(s, clock, loop, truth, elev, lat, lon, table, zero, rate, start, walk, rng, rows, tare_first=False):
    """One reading: counter units of (gravity - tide - sensor height + drift + noise)."""
    height = round(float(rng.uniform(0.15, 0.35)), 3)
    tide = float(sv.longman_tide(lat[s], lon[s], elev[s], clock))
    mgal = (
        truth[s] - zero - tide - sv.FREE_AIR_GRADIENT * height
        + rate * (clock - start) + walk + rng.normal(0, READING_NOISE)
    )
    local = sv.utc_hours_to_iso(clock + UTC_OFFSET)[:19].replace("T", " ")
    return {
        "station": rows[s]["station_id"],
        "time": local,
        "counter": f"{float(table.to_counter(mgal)):.3f}",
        "inst_h": f"{height:.3f}",
        "loop": loop,
        "note": "tare: base re-read, new loop" if tare_first else "",
    }


def write_csv(path, header, rows):
    """Write dict rows as UTF-8 CSV with ``header`` as the column order."""
    with open(path, "w", newline="", encoding="utf-8") as handle:
        writer = csv.DictWriter(handle, fieldnames=header, lineterminator="\n")
        writer.writeheader()
        writer.writerows(rows)


def write_field_stations(path, rows, srs, base):
    """Write the station GeoPackage the readings refer to, with the base's known gravity."""
    path.unlink(missing_ok=True)
    gdal.SetConfigOption("OGR_CURRENT_DATE", "2026-01-01T00:00:00.000Z")
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = ds.CreateLayer("stations", srs, ogr.wkbPoint,
                           options=["DESCRIPTION=Corvahl demo stations with the base's known gravity - INVENTED data"])
    layer.CreateField(ogr.FieldDefn("station_id", ogr.OFTString))
    for name in ("elev_m", "known_mgal", "obs_grav", "body_mgal"):
        layer.CreateField(ogr.FieldDefn(name, ogr.OFTReal))
    layer.StartTransaction()
    for k, row in enumerate(rows):
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("station_id", row["station_id"])
        for name in ("elev_m", "obs_grav", "body_mgal"):
            feature.SetField(name, float(row[name]))
        if k == base:
            feature.SetField("known_mgal", round(float(row["obs_grav"]), 3))
        else:
            feature.SetFieldNull("known_mgal")
        point = ogr.Geometry(ogr.wkbPoint)
        point.AddPoint_2D(row["x"], row["y"])
        feature.SetGeometry(point)
        layer.CreateFeature(feature)
    layer.CommitTransaction()
    ds = None
    gdal.SetConfigOption("OGR_CURRENT_DATE", None)


def main(argv=None):
    """Command line: write the invented readings, calibration table and stations."""
    parser = argparse.ArgumentParser(description="Generate invented raw readings for the Corvahl demo survey.")
    parser.add_argument("--out", type=Path, default=DATA)
    parser.add_argument("--seed", type=int, default=20260608)
    args = parser.parse_args(argv)
    rng = np.random.default_rng(args.seed)
    rows, srs = read_stations(DATA / "corvahl_stations.gpkg")
    lat, lon = geographic(rows, srs)
    readings, base, east, table = simulate(rows, lat, lon, rng)
    args.out.mkdir(parents=True, exist_ok=True)
    write_csv(args.out / "corvahl_readings.csv", ["station", "time", "counter", "inst_h", "loop", "note"], readings)
    calibration = [
        {"counter": f"{c:.0f}", "mgal": f"{m:.3f}", "factor": f"{f:.5f}"}
        for c, m, f in zip(table.counter, table.mgal, table.factor, strict=True)
    ]
    write_csv(args.out / "corvahl_calibration.csv", ["counter", "mgal", "factor"], calibration)
    write_field_stations(args.out / "corvahl_field_stations.gpkg", rows, srs, base)
    print(f"{len(readings)} readings of {len(rows)} stations in {len({r['loop'] for r in readings})} loops; "
          f"base {rows[base]['station_id']}, second base {rows[east]['station_id']}; written to {args.out}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
