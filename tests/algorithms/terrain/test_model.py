# SPDX-License-Identifier: GPL-2.0-or-later
"""TerrainModel: validation with clear sentences, density handling, chunks."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.constants import BOUGUER_CAP_RADIUS, DEFAULT_REDUCTION_DENSITY
from relief_gravity.algorithms.terrain import ElevationGrid, TerrainModel, terrain_correction


def test_defaults_are_the_standard():
    m = TerrainModel()
    assert m.density == DEFAULT_REDUCTION_DENSITY
    assert m.outer_radius == BOUGUER_CAP_RADIUS
    assert m.curvature is True and m.water_density is None and m.innermost_tc is None


@pytest.mark.parametrize(
    ("kwargs", "words"),
    [
        (dict(inner_radius=-1.0), "inner_radius must be a number >= 0"),
        (dict(inner_radius=float("nan")), "inner_radius must be a number"),
        (dict(inner_radius="far"), "inner_radius must be a number"),
        (dict(outer_radius=0.0), "outer_radius must be a finite number > 0"),
        (dict(outer_radius=float("inf")), "outer_radius must be a finite number > 0"),
        (dict(inner_radius=3000.0, outer_radius=2000.0), "must not exceed outer_radius"),
        (dict(density=0.0), "density must be a finite number > 0"),
        (dict(density=-2670.0), "density must be a finite number > 0"),
        (dict(density=float("nan")), "density must be a number"),
        (dict(density=[2670.0, -1.0]), "every station density must be > 0"),
        (dict(density=[2670.0, float("inf")]), "every station density must be > 0"),
        (dict(density=[[2670.0]]), "one value or one per station"),
        (dict(water_density=-1.0), "water_density must be a finite number >= 0"),
        (dict(water_density="sea"), "water_density must be a number"),
        (dict(curvature="yes"), "curvature must be True or False"),
        (dict(innermost_tc=[[0.1]]), "innermost_tc must be one value per station"),
        (dict(innermost_tc=[np.inf]), "innermost_tc holds an infinite value"),
    ],
)
def test_bad_values_are_refused_with_a_sentence(kwargs, words):
    with pytest.raises(ValueError, match=words):
        TerrainModel(**kwargs)


def test_model_is_frozen_and_its_arrays_read_only():
    m = TerrainModel(density=[2600.0, 2700.0], innermost_tc=[0.1, np.nan])
    with pytest.raises(AttributeError):
        m.density = 2670.0  # type: ignore[misc]
    with pytest.raises(ValueError, match="read-only"):
        m.density[0] = 1.0
    with pytest.raises(ValueError, match="read-only"):
        m.innermost_tc[0] = 1.0


def test_per_station_arrays_must_match_the_stations():
    grid = ElevationGrid.from_array(np.zeros((10, 10)), 0, 300, 30, 30)
    with pytest.raises(ValueError, match=r"density must be one value or one per station \(2\), got 3"):
        terrain_correction([100.0, 200.0], [100.0, 200.0], [0.0, 0.0], grid, density=[2670.0] * 3, inner_radius=200.0,
                           outer_radius=200.0)
    with pytest.raises(ValueError, match="either a model or model options"):
        terrain_correction([100.0], [100.0], [0.0], grid, model=TerrainModel(), inner_radius=200.0)


def test_reference_density_is_the_median_and_nan_gets_it():
    m = TerrainModel(density=[2000.0, np.nan, 3000.0, 2500.0])
    assert m.reference_density == 2500.0
    np.testing.assert_allclose(m.density_factors(4), [2000.0, 2500.0, 3000.0, 2500.0])
    assert TerrainModel(density=[np.nan, np.nan]).reference_density == DEFAULT_REDUCTION_DENSITY


def test_per_station_density_scales_and_keeps_field_innermost_values():
    # Terrain correction of dry land is linear in density (common practice,
    # no source); a field-estimated innermost value is kept as given.
    z = np.fromfunction(lambda i, j: 5.0 * np.sin(i / 7.0) + 3.0 * j, (80, 80))
    grid = ElevationGrid.from_array(z, 0, 2400, 30, 30)
    x = np.array([1205.0, 1195.0])
    y = np.array([1210.0, 1190.0])
    h = np.array([120.0, 118.0])
    kw = dict(outer_radius=1000.0, inner_radius=500.0)
    one = terrain_correction(x, y, h, grid, density=2670.0, **kw)
    mixed = terrain_correction(x, y, h, grid, density=[2000.0, 3000.0], **kw)
    np.testing.assert_allclose(mixed.tc_total, one.tc_total * np.array([2000.0, 3000.0]) / 2670.0, rtol=1e-12)
    field = np.array([0.05, np.nan])
    at = terrain_correction(x, y, h, grid, density=[2000.0, 3000.0], innermost_tc=field, **kw)
    zero = terrain_correction(x, y, h, grid, density=[2000.0, 3000.0], innermost_tc=[0.0, np.nan], **kw)
    assert at.tc_inner[0] - zero.tc_inner[0] == pytest.approx(0.05, abs=1e-12)
    np.testing.assert_allclose(at.tc_total[1], mixed.tc_total[1], rtol=1e-12)


def test_water_with_per_station_densities_uses_the_reference_and_flags():
    z = np.full((60, 60), -50.0)
    z[:, :30] = 20.0
    grid = ElevationGrid.from_array(z, 0, 1800, 30, 30)
    x = np.array([880.0, 890.0, 900.0])
    r = terrain_correction(x, x, [0.0, 0.0, 0.0], grid, density=[2600.0, 2670.0, 2700.0], water_density=1030.0,
                           inner_radius=800.0, outer_radius=800.0, curvature=False)
    ref = terrain_correction(x, x, [0.0, 0.0, 0.0], grid, density=2670.0, water_density=1030.0,
                             inner_radius=800.0, outer_radius=800.0, curvature=False)
    np.testing.assert_allclose(r.tc_total, ref.tc_total, rtol=1e-12)
    assert [("tc_density_reference" in f) for f in r.flags] == [True, False, True]


def test_a_chunk_gives_the_same_values_as_the_whole_run():
    # The driver runs on any chunk of stations (a distributed runner calls it
    # per chunk with model.for_stations).
    z = np.fromfunction(lambda i, j: 40.0 * np.cos(i / 9.0) * np.sin(j / 11.0), (120, 120))
    grid = ElevationGrid.from_array(z, 0, 3600, 30, 30)
    rng = np.random.default_rng(3)
    x = rng.uniform(1200, 2400, 10)
    y = rng.uniform(1200, 2400, 10)
    h = rng.uniform(-20, 20, 10)
    model = TerrainModel(density=rng.uniform(2200, 2900, 10), innermost_tc=rng.uniform(0, 0.01, 10),
                         inner_radius=600.0, outer_radius=1500.0)
    whole = terrain_correction(x, y, h, grid, model=model)
    part = np.array([7, 2, 5])
    chunk = terrain_correction(x[part], y[part], h[part], grid, model=model.for_stations(part))
    np.testing.assert_allclose(chunk.tc_total, whole.tc_total[part], rtol=1e-12)
    np.testing.assert_allclose(chunk.coverage, whole.coverage[part], rtol=0, atol=0)
