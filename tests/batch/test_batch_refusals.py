# SPDX-License-Identifier: GPL-2.0-or-later
"""Every input the Processing algorithms refuse, the batch runner refuses with a
sentence (exit code 1), before any worker starts; nothing is written and the
inputs are not altered."""

from __future__ import annotations

import os

import numpy as np
import pytest

pytest.importorskip("distributed", reason="python3-distributed not installed (tools/setup.sh installs it)")


def _run(argv, capsys):
    from relief_gravity.batch.cli import main

    code = main(argv)
    err = capsys.readouterr().err
    return code, err


@pytest.fixture
def base(small_survey, tmp_path):
    s = small_survey
    return {
        "terrain": ["terrain", "--stations", s["stations"], "--height-field", "h", "--dem", s["dem"], "--output", str(tmp_path / "out.gpkg"), "--quiet"],
        "reduce": ["reduce", "--stations", s["stations"], "--gravity-field", "g", "--height-field", "h", "--dem", s["dem"], "--output", str(tmp_path / "out.gpkg"), "--quiet"],
    }


def _replace(argv, option, value):
    argv = list(argv)
    if option in argv:
        i = argv.index(option)
        if value is None:
            del argv[i : i + 2]
        else:
            argv[i + 1] = value
    elif value is not None:
        argv += [option, value]
    return argv


def _inputs(tmp_path, layer_writer, raster_writer, small_survey):
    """Broken inputs, built on demand."""
    from osgeo import gdal, ogr

    s = small_survey
    xs, ys = [500_500.0, 501_000.0], [5_005_000.0, 5_004_000.0]
    made = {
        "no_crs": lambda: layer_writer(tmp_path / "nocrs.gpkg", xs, ys, {"h": [1.0, 2.0]}, epsg=None),
        "empty": lambda: layer_writer(tmp_path / "empty.gpkg", [], [], {"h": []}),
        "polygons": lambda: layer_writer(tmp_path / "poly.gpkg", xs, ys, {"h": [1.0, 2.0]}, geometry=ogr.wkbPolygon),
        "far": lambda: layer_writer(tmp_path / "far.gpkg", [100_000.0], [1_000_000.0], {"h": [1.0], "g": [980_000.0]}),
        "dem_no_crs": lambda: raster_writer(tmp_path / "nocrs.tif", np.zeros((5, 5)), 500_000.0, 5_006_000.0, 100.0, epsg=None),
        "not_raster": lambda: str(_text(tmp_path / "dem.tif")),
    }

    def rotated():
        path = tmp_path / "rotated.tif"
        ds = gdal.Translate(str(path), s["dem"])
        ds.SetGeoTransform((500_000.0, 100.0, 5.0, 5_006_000.0, 5.0, -100.0))
        ds = None
        return str(path)

    made["rotated"] = rotated
    return made


def _text(path):
    path.write_text("not a raster\n")
    return path


# (command, option changes, expected part of the sentence)
CASES = [
    ("terrain", {"--stations": "/nonexistent/stations.gpkg"}, "does not exist"),
    ("terrain", {"--layer": "nosuch"}, "has no layer named 'nosuch'"),
    ("terrain", {"--stations": "@polygons"}, "must be points"),
    ("terrain", {"--stations": "@no_crs"}, "no coordinate reference system"),
    ("terrain", {"--stations": "@empty"}, "no features"),
    ("terrain", {"--height-field": "elevation"}, "no field named 'elevation'"),
    ("terrain", {"--height-field": "label"}, "is not numeric"),
    ("terrain", {"--innermost-tc-field": "name"}, "innermost-ring correction field is not numeric"),
    ("reduce", {"--gravity-field": "name"}, "observed gravity field is not numeric"),
    ("reduce", {"--density-field": "nosuch"}, "no field named 'nosuch'"),
    ("reduce", {"--tc-field": "label"}, "terrain correction field is not numeric"),
    ("terrain", {"--density": "0"}, "outside the accepted range 500-5000"),
    ("reduce", {"--density": "2.67"}, "looks like g/cm³"),
    ("terrain", {"--inner-radius": "5000", "--outer-radius": "3000"}, "must be positive and smaller"),
    ("terrain", {"--inner-radius": "-5"}, "--inner-radius must be at least 0"),
    ("terrain", {"--water-density": "-1"}, "--water-density must be at least 0"),
    ("terrain", {"--outer-radius": "nan"}, "must be a number"),
    ("reduce", {"--height-field": None, "--dem": None}, "Choose a station height field or an elevation raster"),
    ("terrain", {"--dem": "/nonexistent/dem.tif"}, "does not exist"),
    ("terrain", {"--dem": "@not_raster"}, "Could not open the elevation raster"),
    ("terrain", {"--dem": "@dem_no_crs"}, "has no coordinate reference system"),
    ("terrain", {"--dem": "@rotated"}, "is rotated"),
    ("terrain", {"--regional-dem": "/nonexistent/regional.tif"}, "regional elevation raster"),
    ("terrain", {"--stations": "@far"}, "No station lies on the elevation raster"),
    ("terrain", {"--output": "@out.shp"}, "must end in .gpkg or .parquet"),
    ("terrain", {"--output": "@same"}, "never altered"),
    ("terrain", {"--output": "/nonexistent/dir/out.gpkg"}, "does not exist or is not writable"),
    ("terrain", {"--output": "@exists"}, "add --overwrite"),
    ("terrain", {"--workers": "0"}, "--workers must be at least 1"),
    ("terrain", {"--chunk-size": "0"}, "--chunk-size must be at least 1"),
    ("terrain", {"--memory-limit": "lots"}, "--memory-limit must be a size"),
    ("terrain", {"--memory-limit": "10MB"}, "--memory-limit must be a size"),
]


@pytest.mark.parametrize(("command", "changes", "expected"), CASES, ids=[f"{c}-{e[:28]}" for c, _, e in CASES])
def test_refused_with_a_sentence(command, changes, expected, base, tmp_path, capsys, layer_writer, raster_writer, small_survey, file_digest):
    made = _inputs(tmp_path, layer_writer, raster_writer, small_survey)
    argv = base[command]
    out = tmp_path / "out.gpkg"
    for option, value in changes.items():
        if isinstance(value, str) and value.startswith("@"):
            key = value[1:]
            if key == "same":
                value = argv[argv.index("--stations") + 1]
            elif key == "exists":
                out.write_text("earlier result")
                value = str(out)
            elif key == "out.shp":
                value = str(tmp_path / "out.shp")
            else:
                value = made[key]()
        argv = _replace(argv, option, value)
    stations = argv[argv.index("--stations") + 1]
    before = file_digest(stations) if os.path.exists(stations) else None
    code, err = _run(argv, capsys)
    assert code == 1
    assert err.startswith("Error: ") and expected in err, err
    assert err.rstrip().endswith(".")
    if before is not None:
        assert file_digest(stations) == before
    written = [p.name for p in tmp_path.iterdir() if p.name.startswith(("out", ".out"))]
    assert written in ([], ["out.gpkg"]) and (written == [] or out.read_text() == "earlier result"), written


def test_unknown_word_for_an_enumeration_is_refused(base, capsys):
    from relief_gravity.batch.cli import main

    with pytest.raises(SystemExit) as stop:
        main(base["reduce"] + ["--normal-gravity", "grs67"])
    assert stop.value.code == 2
    assert "invalid choice: 'grs67'" in capsys.readouterr().err


def test_parts_of_another_run_are_not_mixed(base, tmp_path, capsys):
    from relief_gravity.batch.store import Parts

    out = str(tmp_path / "out.gpkg")
    Parts(out).open("another-run", 3, 10)
    code, err = _run(base["terrain"], capsys)
    assert code == 1 and "holds the parts of another run" in err


def test_unreachable_scheduler_is_a_sentence(base, capsys):
    import socket

    import dask

    with socket.socket() as probe:  # a local port nobody listens on
        probe.bind(("127.0.0.1", 0))
        port = probe.getsockname()[1]
    with dask.config.set({"distributed.comm.timeouts.connect": "2s"}):
        code, err = _run(base["terrain"] + ["--scheduler", f"tcp://127.0.0.1:{port}"], capsys)
    assert code == 1 and "Could not reach the Dask scheduler" in err


def test_python_without_dask_gets_a_sentence(base, capsys, monkeypatch):
    import importlib.util

    real = importlib.util.find_spec
    monkeypatch.setattr(importlib.util, "find_spec", lambda name, *a: None if name == "distributed" else real(name, *a))
    code, err = _run(base["terrain"], capsys)
    assert code == 1 and "lacks distributed" in err and "python3-distributed" in err
