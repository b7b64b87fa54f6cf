# SPDX-License-Identifier: GPL-2.0-or-later
"""Issue 8: flag codes and notes, chaining runs, provenance, and faults that must end
in a sentence (or a flagged row) with inputs unchanged and no output left behind."""

from __future__ import annotations

import importlib.util
import os
import subprocess
from pathlib import Path

import numpy as np
import pytest

_spec = importlib.util.spec_from_file_location("station_cases", Path(__file__).with_name("station_cases.py"))
sc = importlib.util.module_from_spec(_spec)
_spec.loader.exec_module(sc)


@pytest.fixture
def survey(provider, tmp_path, dem_writer, points_writer):
    """Ellipsoidal DEM and stations on it (declared DEM_DATUM=1 in the runs)."""
    dem = dem_writer(tmp_path / "dem.tif", sc.dem_array(), sc.WEST, sc.NORTH, sc.CELL, epsg=sc.EPSG)
    x, y = sc.station_xy()
    h = sc.hill(x, y)
    stations = Path(
        points_writer(tmp_path / "stations.gpkg", x, y, {"g_obs": [float(v) for v in sc.gravity(h)], "h": [float(v) for v in h]}, epsg=sc.EPSG)
    )
    return {"dem": dem, "stations": stations, "x": x, "y": y, "h": h}


def _tc(survey, out, **extra):
    params = {"INPUT": str(survey["stations"]), "DEM": str(survey["dem"]), "HEIGHT_FIELD": "h", "DEM_DATUM": 1,
              "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(out)}
    params.update(extra)
    return sc.run("terraincorrection", params)


def test_every_code_has_a_translatable_note(provider):
    from relief_gravity.algorithms.qc import VOCABULARY
    from relief_gravity.plugin import flags

    notes = flags._notes()
    assert set(notes) == set(VOCABULARY)
    for code, entry in VOCABULARY.items():
        assert notes[code] == entry.meaning, code
    # update_translations.py extracts them (module _tr helper with a literal context).
    spec = importlib.util.spec_from_file_location("update_translations", sc.Path(__file__).parents[2] / "tools" / "update_translations.py")
    tool = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(tool)
    found = {text for context, text, _ in tool.extract(Path(flags.__file__)) if context == "QualityFlags"}
    assert {e.meaning for e in VOCABULARY.values()} <= found
    # Text reasons of the engines map onto codes.
    assert flags.code_of("partial coverage 42%") == "tc_partial"
    assert flags.code_of("outside DEM") == "outside_dem"
    assert flags.merged_flag("height from DEM; tc_partial", ["tc_partial", "no_tc"]) == "height_from_dem;tc_partial;no_tc"


def test_inner_radius_default_is_hammer_zone_f(provider):
    from qgis.core import QgsApplication

    for name in ("bouguerreduction", "terraincorrection"):
        algorithm = QgsApplication.processingRegistry().algorithmById("reliefgravity:" + name)
        # 2 936 ft = 894.9 m, the outer edge of Hammer's zone F.
        assert algorithm.parameterDefinition("INNER_RADIUS").defaultValue() == pytest.approx(895.0)


def test_chained_runs_keep_results_merge_flags_and_record_provenance(survey, tmp_path, points_writer):
    from osgeo import ogr

    from relief_gravity.plugin import provenance

    # An input with an integer faa and an earlier flag on station 2.
    x, y, h = survey["x"], survey["y"], survey["h"]
    g = [float(v) for v in sc.gravity(h)]
    path = tmp_path / "ints.gpkg"
    points_writer(path, x, y, {"g_obs": g, "h": [float(v) for v in h], "faa": [7] * 16, "qc_flag": ["old_code" if i == 2 else "" for i in range(16)]},
                  epsg=sc.EPSG, types={"faa": ogr.OFTInteger, "qc_flag": ogr.OFTString})
    before = sc.digest(path)
    first = tmp_path / "tc.gpkg"
    _tc({**survey, "stations": path}, first)
    tc = sc.layer(first)
    second = tmp_path / "reduced.gpkg"
    sc.run("bouguerreduction", {"INPUT": str(first), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h", "TC_FIELD": "tc_total",
                                "OUTPUT": str(second)})
    red = sc.layer(second)
    for name in ("tc_inner", "tc_outer", "dem_diff", "tc_cover", "tc_total"):
        np.testing.assert_allclose(sc.values(red, name), sc.values(tc, name), rtol=0, atol=1e-12)
    flags = sc.texts(red, "qc_flag")
    assert flags[2] == "old_code" and flags[3] == ""
    faa = sc.values(red, "faa")
    assert red.fields().field("faa").type() == 6  # QVariant.Double
    assert not np.allclose(faa, np.round(faa))
    # Provenance: two steps, in order, with the settings of each.
    record = provenance.read_record(str(second))
    steps = record["steps"]
    assert [s["algorithm"] for s in steps] == ["reliefgravity:terraincorrection", "reliefgravity:bouguerreduction"]
    assert steps[0]["settings"]["dem_datum"] == "ellipsoid" and steps[0]["settings"]["inner_radius_m"] == 895.0
    assert steps[0]["settings"]["dem_files"] == [str(survey["dem"])]
    s = steps[1]["settings"]
    assert s["normal_gravity"] == "grs80" and s["height_correction"] == "second_order"
    assert s["atmospheric_correction"] is True and s["curvature_correction"] is True
    assert s["gravitational_constant"] == pytest.approx(6.6743e-11) and s["density_kg_m3"] == 2670.0
    assert s["height_datum"] == "ellipsoidal" and steps[1]["plugin_version"] != "unknown"
    # Third step: the grid; the GeoTIFF carries the whole chain.
    grid = tmp_path / "cba.tif"
    sc.run("anomalygrid", {"INPUT": str(second), "FIELD": "faa", "OUTPUT": str(grid), "CONTOURS": str(tmp_path / "iso.gpkg")})
    chain = provenance.read_record(str(grid))["steps"]
    assert [c["algorithm"] for c in chain][-1] == "reliefgravity:anomalygrid" and len(chain) == 3
    assert len(provenance.read_record(str(tmp_path / "iso.gpkg"))["steps"]) == 3
    assert sc.digest(path) == before


def test_chaining_through_qgis_process(survey, tmp_path, qgis_process_env):
    from relief_gravity.plugin import provenance

    executable, env = qgis_process_env
    first, second = tmp_path / "tc.gpkg", tmp_path / "red.gpkg"
    for args in (
        ["reliefgravity:terraincorrection", f"INPUT={survey['stations']}", f"DEM={survey['dem']}", "HEIGHT_FIELD=h", "DEM_DATUM=1",
         f"OUTER_RADIUS={sc.OUTER}", f"OUTPUT={first}"],
        ["reliefgravity:bouguerreduction", f"INPUT={first}", "GRAVITY_FIELD=g_obs", "HEIGHT_FIELD=h", "TC_FIELD=tc_total", f"OUTPUT={second}"],
    ):
        run = subprocess.run([executable, "run", args[0], "--", *args[1:]], env=env, capture_output=True, text=True, timeout=300)
        assert run.returncode == 0, run.stdout + run.stderr
    np.testing.assert_allclose(sc.values(sc.layer(second), "tc_inner"), sc.values(sc.layer(first), "tc_inner"))
    assert len(provenance.read_record(str(second))["steps"]) == 2


def test_multipart_stations(survey, tmp_path):
    from osgeo import ogr, osr

    path = tmp_path / "multi.gpkg"
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(sc.EPSG)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    lyr = ds.CreateLayer("stations", srs, ogr.wkbMultiPoint)
    lyr.CreateField(ogr.FieldDefn("g_obs", ogr.OFTReal))
    lyr.CreateField(ogr.FieldDefn("h", ogr.OFTReal))
    for i, (x, y, h) in enumerate(zip(survey["x"], survey["y"], survey["h"], strict=True)):
        multi = ogr.Geometry(ogr.wkbMultiPoint)
        for dx in ((0.0, 5000.0) if i == 1 else (0.0, 0.0) if i == 2 else (0.0,)):
            part = ogr.Geometry(ogr.wkbPoint)
            part.AddPoint_2D(float(x + dx), float(y))
            multi.AddGeometry(part)
        f = ogr.Feature(lyr.GetLayerDefn())
        f.SetGeometry(multi)
        f.SetField("g_obs", float(sc.gravity(h)))
        f.SetField("h", float(h))
        lyr.CreateFeature(f)
    ds = None
    out = sc.layer(_tc({**survey, "stations": path}, tmp_path / "m.gpkg")["OUTPUT"])
    flags = sc.texts(out, "qc_flag")
    assert flags[1].split(";")[0] == "multipart_distinct" and np.isnan(sc.values(out, "tc_total")[1])
    assert flags[2] == "" and np.isfinite(sc.values(out, "tc_total")[2])


@pytest.mark.parametrize("case", ["lonlat_numbers", "huge_northing"])
def test_coordinates_outside_the_crs_area_stop_the_run(survey, tmp_path, points_writer, case):
    from qgis.core import QgsProcessingException

    x, y = survey["x"].copy(), survey["y"].copy()
    if case == "lonlat_numbers":
        x, y = sc.lonlat(x, y)
    else:
        y[4] = 1e12
    path = points_writer(tmp_path / "bad.gpkg", x, y, {"g_obs": [980_500.0] * 16, "h": [float(v) for v in survey["h"]]}, epsg=sc.EPSG)
    with pytest.raises(QgsProcessingException, match=r"look like longitude and latitude|area of use"):
        sc.run("bouguerreduction", {"INPUT": path, "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h", "OUTPUT": str(tmp_path / "out.gpkg")})
    assert sc.leftovers(tmp_path) == []


def test_output_over_an_input_is_refused(survey, tmp_path):
    from qgis.core import QgsProcessingException

    before = sc.digest(survey["stations"]), sc.digest(survey["dem"])
    with pytest.raises(QgsProcessingException, match="would destroy that input"):
        _tc(survey, survey["stations"])
    with pytest.raises(QgsProcessingException, match="would destroy that input"):
        sc.run("bouguerreduction", {"INPUT": str(survey["stations"]), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h",
                                    "OUTPUT": str(survey["stations"]) + "|layername=stations"})
    with pytest.raises(QgsProcessingException, match="would destroy that input"):
        sc.run("anomalygrid", {"INPUT": str(survey["stations"]), "FIELD": "g_obs", "OUTPUT": str(tmp_path / "g.tif"),
                               "CONTOURS": str(survey["stations"])})
    with pytest.raises(QgsProcessingException, match="both set to"):
        sc.run("anomalygrid", {"INPUT": str(survey["stations"]), "FIELD": "g_obs", "OUTPUT": str(tmp_path / "same.gpkg"),
                               "CONTOURS": str(tmp_path / "same.gpkg")})
    assert (sc.digest(survey["stations"]), sc.digest(survey["dem"])) == before
    assert not (tmp_path / "g.tif").exists()


def test_non_point_layer_is_refused(survey, tmp_path):
    from osgeo import ogr, osr
    from qgis.core import QgsProcessingException

    path = tmp_path / "poly.gpkg"
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(sc.EPSG)
    ds = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    lyr = ds.CreateLayer("polys", srs, ogr.wkbPolygon)
    lyr.CreateField(ogr.FieldDefn("g_obs", ogr.OFTReal))
    for x, y in zip(survey["x"][:4], survey["y"][:4], strict=True):
        f = ogr.Feature(lyr.GetLayerDefn())
        f.SetGeometry(ogr.CreateGeometryFromWkt(f"POLYGON(({x} {y},{x+10} {y},{x+10} {y+10},{x} {y}))"))
        f.SetField("g_obs", 980_500.0)
        lyr.CreateFeature(f)
    ds = None
    for algorithm, extra in (("bouguerreduction", {"GRAVITY_FIELD": "g_obs", "DEM": str(survey["dem"])}),
                             ("terraincorrection", {"DEM": str(survey["dem"])}),
                             ("anomalygrid", {"FIELD": "g_obs"})):
        with pytest.raises(QgsProcessingException, match=r"stations must be points|point"):
            sc.run(algorithm, dict({"INPUT": str(path), "OUTPUT": str(tmp_path / "out.gpkg")}, **extra))
    assert sc.leftovers(tmp_path) == []


def test_truncated_raster_and_unwritable_folder(survey, tmp_path):
    from osgeo import gdal
    from qgis.core import QgsProcessingException

    truncated = tmp_path / "cut.tif"
    gdal.Translate(str(truncated), str(survey["dem"]), creationOptions=["TILED=NO"])
    data = truncated.read_bytes()
    truncated.write_bytes(data[: len(data) // 2])
    with pytest.raises(QgsProcessingException, match=r"cannot be read to the end|Could not load|could not be loaded|not a valid"):
        _tc({**survey, "dem": truncated}, tmp_path / "out.gpkg")
    assert sc.leftovers(tmp_path) == []
    # /proc accepts no new folders, even for root (who ignores permission bits).
    with pytest.raises(QgsProcessingException, match=r"Cannot write in the folder|not writable"):
        _tc(survey, "/proc/out.gpkg")
    if os.geteuid() != 0:
        locked = tmp_path / "locked"
        locked.mkdir(mode=0o500)
        with pytest.raises(QgsProcessingException, match="not writable"):
            _tc(survey, locked / "out.gpkg")


def test_cancel_raises_and_leaves_nothing(survey, tmp_path):
    from qgis.core import QgsProcessingException, QgsProcessingFeedback

    for algorithm, params in (
        ("bouguerreduction", {"INPUT": str(survey["stations"]), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h", "DEM": str(survey["dem"]),
                              "DEM_DATUM": 1, "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "out.gpkg")}),
        ("anomalygrid", {"INPUT": str(survey["stations"]), "FIELD": "g_obs", "OUTPUT": str(tmp_path / "out.tif"),
                         "CONTOURS": str(tmp_path / "out_iso.gpkg")}),
    ):
        feedback = QgsProcessingFeedback()
        feedback.cancel()
        with pytest.raises(QgsProcessingException, match=r"[Cc]ancel"):
            sc.run(algorithm, params, feedback)
        assert sc.leftovers(tmp_path) == []


@pytest.mark.parametrize(
    ("extra", "match"),
    [
        ({"PIXEL_SIZE": 0.5}, "cells .*Choose a larger pixel size"),
        ({"CONTOUR_INTERVAL": 1e-5}, "levels .*Choose a larger interval"),
        ({"FIELD": "flat"}, "same value"),
    ],
)
def test_grid_limits_and_constant_fields(survey, tmp_path, points_writer, extra, match):
    from qgis.core import QgsProcessingException

    path = points_writer(tmp_path / "st.gpkg", survey["x"], survey["y"], {"g_obs": [float(v) for v in sc.gravity(survey["h"])], "flat": [3.0] * 16},
                         epsg=sc.EPSG)
    before = sc.digest(path)
    params = {"INPUT": path, "FIELD": "g_obs", "OUTPUT": str(tmp_path / "out.tif"), "CONTOURS": str(tmp_path / "out_iso.gpkg")}
    params.update(extra)
    with pytest.raises(QgsProcessingException, match=match):
        sc.run("anomalygrid", params)
    assert sc.leftovers(tmp_path) == []
    assert sc.digest(path) == before


def test_integer_faa_input_gives_real_grid(survey, tmp_path, points_writer):
    from osgeo import gdal, ogr

    faa = [int(v) for v in np.round(sc.hill(survey["x"], survey["y"]) / 10)]
    path = points_writer(tmp_path / "ifaa.gpkg", survey["x"], survey["y"], {"faa": faa}, epsg=sc.EPSG, types={"faa": ogr.OFTInteger})
    sc.run("anomalygrid", {"INPUT": path, "FIELD": "faa", "OUTPUT": str(tmp_path / "f.tif"), "CONTOURS": str(tmp_path / "f.gpkg"),
                           "BLANK_DISTANCE": 0})
    dataset = gdal.Open(str(tmp_path / "f.tif"))
    band = dataset.GetRasterBand(1)
    assert band.DataType == gdal.GDT_Float32
    values = band.ReadAsArray()
    assert not np.allclose(values, np.round(values))


class _CancelLater:
    """A feedback that cancels once the run has reported more than ``at`` % progress."""

    @staticmethod
    def make(at):
        from qgis.core import QgsProcessingFeedback

        class Feedback(QgsProcessingFeedback):
            def __init__(self):
                super().__init__()
                self.seen = 0.0
                self.progressChanged.connect(self._check)

            def _check(self, value):
                self.seen = max(self.seen, value)
                if value > at:
                    self.cancel()

        return Feedback()


@pytest.mark.parametrize("at", [20.0, 45.0, 70.0])
def test_cancel_during_the_run_raises_and_leaves_nothing(survey, tmp_path, at):
    from qgis.core import QgsProcessingException

    params = {"INPUT": str(survey["stations"]), "GRAVITY_FIELD": "g_obs", "HEIGHT_FIELD": "h", "DEM": str(survey["dem"]),
              "DEM_DATUM": 1, "OUTER_RADIUS": sc.OUTER, "OUTPUT": str(tmp_path / "out.gpkg")}
    feedback = _CancelLater.make(at)
    with pytest.raises(QgsProcessingException, match=r"[Cc]ancel"):
        sc.run("bouguerreduction", params, feedback)
    assert feedback.seen > at
    assert sc.leftovers(tmp_path) == []
    feedback = _CancelLater.make(at)
    with pytest.raises(QgsProcessingException, match=r"[Cc]ancel"):
        sc.run("anomalygrid", {"INPUT": str(survey["stations"]), "FIELD": "g_obs", "OUTPUT": str(tmp_path / "out.tif"),
                               "CONTOURS": str(tmp_path / "out_iso.gpkg")}, feedback)
    assert sc.leftovers(tmp_path) == []
