# SPDX-License-Identifier: GPL-2.0-or-later
"""Running the terrain engine for a station table (shared by two algorithms)."""

from __future__ import annotations

from dataclasses import dataclass, replace

import numpy as np
from qgis.core import QgsCoordinateReferenceSystem, QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

from .raster_io import open_elevation, warp_to

EXACT, RING_SECTOR = 0, 1


def _tr(text: str) -> str:
    return QCoreApplication.translate("TerrainRun", text)


def station_positions_on(raster, table, context):
    """Station coordinates in a raster's CRS."""
    crs = QgsCoordinateReferenceSystem.fromWkt(raster.crs_wkt)
    return table.coordinates_in(crs, context.transformContext())


def check_overlap(raster, x, y, label: str) -> None:
    """Raise when no station falls on the raster: a problem with the whole run."""
    west, east, south, north = raster.extent
    on = (x >= west) & (x <= east) & (y >= south) & (y <= north)
    if not np.any(on):
        raise QgsProcessingException(
            _tr(
                "No station lies on the {} (raster extent {:.6g}, {:.6g}, {:.6g}, {:.6g} "
                "in its own CRS). Check that the raster covers the survey and that both "
                "layers have the right CRS."
            ).format(label, west, east, south, north)
        )


@dataclass
class StationsOnRaster:
    """An opened elevation raster and the stations' coordinates in its CRS."""

    raster: object
    x: np.ndarray
    y: np.ndarray


def place_stations(dem_layer, table, context) -> StationsOnRaster:
    """Open the DEM once and put the stations on it; refuse when none falls on it."""
    raster = open_elevation(dem_layer)
    x, y = station_positions_on(raster, table, context)
    check_overlap(raster, x, y, _tr("elevation raster"))
    return StationsOnRaster(raster, x, y)


def compute_terrain(
    table,
    heights: np.ndarray,
    placed: StationsOnRaster,
    regional_layer,
    *,
    inner_radius: float,
    outer_radius: float,
    density: np.ndarray,
    innermost_tc: np.ndarray | None,
    water_density: float | None,
    method: int,
    context,
    feedback,
    zones: str = "BCDEFGHIJKLM",
    polygons=None,
    numerical_check: bool = False,
) -> dict:
    """Terrain correction of every station, in mGal, with flag codes added to ``table``.

    Opens the regional raster, builds the terrain model and calls the engine;
    density handling and innermost values are the model's
    (``algorithms/terrain/_model.py``). ``zones`` (ring-and-sector only):
    contiguous Hammer zone letters or a range such as "B-M". ``polygons``
    (``density_layer.DensityPolygons``): densities per DEM cell from a
    geology layer (exact engine only; docs/geology-densities.md).
    ``numerical_check``: also estimate the engine's own error per station
    against a refined evaluation (``tc_numerr``; about four times the work).
    """
    from ..algorithms.terrain import TerrainCancelled, TerrainModel, hammer_terrain_correction
    from ..algorithms.terrain._fallback import numerical_error, terrain_correction_with_fallback

    fine, x, y = placed.raster, placed.x, placed.y
    if polygons is not None and method == RING_SECTOR:
        raise QgsProcessingException(
            _tr(
                "Densities from a geology layer need the exact engine: the ring-and-sector method has one "
                "density per station. Choose the exact engine or leave DENSITY_LAYER empty."
            )
        )
    regional = None
    regional_grid = None
    if regional_layer is not None:
        regional = open_elevation(regional_layer)
        regional_crs = QgsCoordinateReferenceSystem.fromWkt(regional.crs_wkt)
        if regional_crs != QgsCoordinateReferenceSystem.fromWkt(fine.crs_wkt):
            feedback.pushInfo(_tr("Reprojecting the regional elevation raster to the CRS of the fine one."))
            regional = warp_to(regional, fine.crs_wkt)
        regional_grid = regional.elevation_grid()
    n = len(heights)
    model = TerrainModel(
        density=np.broadcast_to(np.asarray(density, dtype=float), (n,)),
        water_density=water_density,
        inner_radius=inner_radius,
        outer_radius=outer_radius,
        innermost_tc=innermost_tc,
    )

    def progress(fraction: float) -> None:
        feedback.setProgress(100.0 * fraction)

    try:
        if method == RING_SECTOR:
            # --- ring-and-sector (Hammer 1939): algorithms/terrain/_hammer.py ---
            hammer = hammer_terrain_correction(
                x,
                y,
                heights,
                fine.elevation_grid(),
                density=model.reference_density,
                zones=zones,
                regional=regional_grid,
                inner_radius=inner_radius,
                progress=progress,
                is_cancelled=feedback.isCanceled,
            )
            table.flag_each(hammer.flags)
            # Linear in density: from the reference density to each station's.
            scale = model.density_factors(n) / model.reference_density
            result = {
                key: np.array(getattr(hammer, key), dtype=float) * scale for key in ("tc_inner", "tc_outer", "tc_total")
            }
            result["zones"] = {k: np.asarray(v, dtype=float) * scale for k, v in hammer.zones.items()}
            result["plane_zones"] = hammer.plane_zones
            if innermost_tc is not None:
                # Hammer's zone A (station to 2 m) is the field-estimated part (inner zone).
                extra = np.where(np.isfinite(innermost_tc), innermost_tc, 0.0)
                result["tc_inner"] = result["tc_inner"] + extra
                result["tc_total"] = result["tc_total"] + extra
            return result
            # --- end ring-and-sector ---
        units, rho_s = None, None
        if polygons is not None:
            from .density_layer import density_units, station_densities

            units = density_units(polygons, fine, regional)
            rho_s = station_densities(polygons, x, y)
            model = replace(model, density=float(polygons.densities[0]))
        # Where the fine DEM has no data the regional one serves, flagged
        # (with a geology layer too: each unit on the filled DEM).
        engine = terrain_correction_with_fallback(
            x,
            y,
            heights,
            fine.elevation_grid(),
            regional_grid,
            model,
            progress=progress,
            is_cancelled=feedback.isCanceled,
            units=units,
            station_density=rho_s,
        )
    except TerrainCancelled as error:
        raise QgsProcessingException(_tr("Cancelled by the user.")) from error
    numerr = None
    if numerical_check and polygons is not None:
        feedback.pushWarning(
            _tr(
                "The engine's own error (ENGINE_CHECK) is not estimated with a geology layer: "
                "no tc_numerr field is written."
            )
        )
    if numerical_check and polygons is None:
        feedback.pushInfo(_tr("Estimating the engine's own error against a refined evaluation (tc_numerr)."))
        try:
            numerr = numerical_error(
                x, y, heights, fine.elevation_grid(), regional_grid, model, engine, is_cancelled=feedback.isCanceled
            )
        except TerrainCancelled as error:
            raise QgsProcessingException(_tr("Cancelled by the user.")) from error
        feedback.pushInfo(
            _tr("Engine error against the refined evaluation: median {:.2g}, largest {:.2g} mGal.").format(
                float(np.nanmedian(numerr)) if np.isfinite(numerr).any() else float("nan"),
                float(np.nanmax(numerr)) if np.isfinite(numerr).any() else float("nan"),
            )
        )
    table.flag_each([";".join(codes) for codes in engine.flags])
    truncation = np.asarray(engine.truncation, dtype=float)
    if np.any(truncation > 0):
        worst = int(np.nanargmax(truncation))
        feedback.pushWarning(
            _tr(
                "The elevation rasters stop short of the outer radius for {} station(s): the terrain they miss "
                "could add about {:.3f} mGal at worst (station {}; field tc_trunc, an estimate from the relief at "
                "the edge of coverage, not a bound). Give a regional DEM reaching {:.0f} m around every station."
            ).format(int(np.sum(truncation > 0)), float(truncation[worst]), worst + 1, outer_radius)
        )
    return {
        "tc_inner": engine.tc_inner,
        "tc_outer": engine.tc_outer,
        "tc_total": engine.tc_total,
        "dem_diff": engine.height_difference,
        "coverage": engine.coverage,
        "coverage_inner": engine.coverage_inner,
        "tc_trunc": truncation,
        **({"tc_numerr": numerr} if numerr is not None else {}),
    }


def heights_from_dem(table, placed: StationsOnRaster) -> np.ndarray:
    """Station heights sampled (bilinear) from the DEM, flagged as such."""
    heights = placed.raster.sample_bilinear(placed.x, placed.y)
    table.flag_where(np.isfinite(heights), _tr("height from DEM"))
    table.flag_where(~np.isfinite(heights), _tr("no height (outside DEM)"))
    return heights
