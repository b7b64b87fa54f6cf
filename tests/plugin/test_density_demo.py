# SPDX-License-Identifier: GPL-2.0-or-later
"""densityestimate on the invented demo survey (demo/data, built at 2670 kg/m^3; demo/README.md).

With the buried bodies' attraction (``body_mgal``, stored by the generator)
taken out of the observed gravity, what is left is terrain at 2670 kg/m^3
plus noise: Parasnis must return 2670. This checks the whole chain
(free-air anomaly, slab and curvature at unit density, one terrain-engine
run at 1 kg/m^3 over the fine and regional DEMs). Measured: 2671.5
(2671.2-2671.7) kg/m^3. The interval misses 2670 by about 1 kg/m^3: the
differences left are the reduction's own approximations against the
generator's model (0.025 mGal rms, README), which correlate with the relief
and are not the independent noise the interval assumes. Tolerance 3 kg/m^3
(0.1 %), common practice, no source.
"""

from __future__ import annotations

from pathlib import Path

import pytest
from osgeo import ogr

DATA = Path(__file__).resolve().parents[2] / "demo" / "data"
BUILT_WITH = 2670.0  # kg/m^3, TERRAIN_DENSITY in demo/make_scenario.py


def test_demo_without_bodies_gives_back_the_build_density(provider, tmp_path):
    import processing

    stations = DATA / "corvahl_stations.gpkg"
    if not stations.exists():
        pytest.skip("demo data missing; regenerate with demo/make_scenario.py")
    copy = tmp_path / "no_bodies.gpkg"
    source = ogr.Open(str(stations))
    target = ogr.GetDriverByName("GPKG").CopyDataSource(source, str(copy))
    layer = target.GetLayer(0)
    for feature in layer:
        feature.SetField("obs_grav", feature.GetField("obs_grav") - feature.GetField("body_mgal"))
        layer.SetFeature(feature)
    target = source = None
    result = processing.run(
        "reliefgravity:densityestimate",
        {"INPUT": str(copy), "GRAVITY_FIELD": "obs_grav", "HEIGHT_FIELD": "elev_m", "DEM": str(DATA / "corvahl_dem.tif"),
         "REGIONAL_DEM": str(DATA / "corvahl_regional.tif"), "DEM_DATUM": 1, "METHOD": 0, "REGIONAL_TREND": 1, "PLOT": None},
    )
    assert result["DENSITY"] == pytest.approx(BUILT_WITH, abs=3.0), result
    assert result["DENSITY_HIGH"] - result["DENSITY_LOW"] < 5.0


def test_demo_off_the_mapped_alluvium_comes_close_to_the_build_density(provider):
    """The demo's own procedure: Parasnis (planar) without the stations on the basin-floor alluvium.

    Over every station the light basin fill under the valley floor biases the
    estimate high (measured 2903, 95 % 2834-2971). Leaving out the stations on
    the mapped alluvium (demo/data/corvahl_geology.gpkg) gives 2732 (2716-2749),
    2.3 % high: the dense intrusion under the range is not mapped and still
    follows the relief. Bound 3 % (common practice, no source: densities are
    rarely chosen closer than about 50 kg/m^3).
    """
    import processing

    stations = DATA / "corvahl_stations.gpkg"
    geology = DATA / "corvahl_geology.gpkg"
    if not stations.exists() or not geology.exists():
        pytest.skip("demo data missing; regenerate with demo/make_scenario.py")
    common = {"INPUT": str(stations), "GRAVITY_FIELD": "obs_grav", "HEIGHT_FIELD": "elev_m", "DEM": str(DATA / "corvahl_dem.tif"),
              "REGIONAL_DEM": str(DATA / "corvahl_regional.tif"), "DEM_DATUM": 1, "METHOD": 0, "REGIONAL_TREND": 1, "PLOT": None}
    every = processing.run("reliefgravity:densityestimate", common)
    alluvium = f"{geology}|layername=geology|subset=\"unit\" = 'alluvium'"
    bedrock = processing.run("reliefgravity:densityestimate", {**common, "EXCLUDE_AREAS": alluvium})
    assert bedrock["STATIONS_USED"] < every["STATIONS_USED"] == 351
    assert abs(bedrock["DENSITY"] - BUILT_WITH) < 0.03 * BUILT_WITH, bedrock
    assert abs(bedrock["DENSITY"] - BUILT_WITH) < abs(every["DENSITY"] - BUILT_WITH) / 2
