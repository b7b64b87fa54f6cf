# SPDX-License-Identifier: GPL-2.0-or-later
"""Ring-and-sector terrain correction (Hammer 1939) with heights from DEMs.

This exists so that DEM-driven results can be compared with chart-based field
practice; the exact zone engine stays the default method. The rules (zone
table and its source, sampling, regional fallback, sloping plane for zones
finer than a DEM cell, inner/outer split) are written out in
``docs/hammer.md``.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import dataclass
from types import MappingProxyType
from typing import Callable

import numpy as np
import numpy.typing as npt

from ..constants import MEAN_EARTH_RADIUS
from ._errors import TerrainCancelled
from ._grid import ElevationGrid
from ._hammer_zones import (
    HammerZone,
    parse_zones,
    plane_ring_correction,
    resolved_by,
    ring_sector_correction,
)
from ._sampling import MAX_WINDOW_CELLS, bilinear_from_window, bilinear_setup, inside_extent, sample_bilinear

#: Most sample points per compartment along the radius and along the arc.
MAX_SAMPLES = 24

#: Coverage below this fraction is flagged ``tc_partial`` (the exact engine's
#: threshold, restated so this module does not reach into the engine).
COVERAGE_FLAG_BELOW = 0.99

#: Flag codes raised here (all in ``algorithms.qc.VOCABULARY``).
CODES = ("outside_dem", "no_height", "tc_partial", "tc_no_data_zones", "tc_regional_fill", "tc_no_slope")


@dataclass(frozen=True)
class HammerResult:
    """Ring-and-sector terrain correction per station (arrays are read-only).

    Attributes
    ----------
    tc_inner, tc_outer, tc_total : numpy.ndarray
        Correction in mGal: zones (or parts of a zone) within ``inner_radius``,
        beyond it, and their sum. NaN where not computed.
    zones : mapping
        Zone letter -> per-station correction of that whole ring, mGal.
    coverage : numpy.ndarray
        Fraction (0-1) of the chosen rings' area with data.
    codes : tuple of tuple of str
        Flag codes per station (``algorithms.qc`` vocabulary), empty when clean.
    zone_letters : str
        The zones used, innermost first.
    plane_zones : str
        The zones modelled by the sloping plane (finer than a DEM cell).
    reach : float
        Outer radius of the last zone (m): terrain beyond is not corrected.
    inner_radius : float
        The inner/outer split radius used (m).
    """

    tc_inner: np.ndarray
    tc_outer: np.ndarray
    tc_total: np.ndarray
    zones: Mapping[str, np.ndarray]
    coverage: np.ndarray
    codes: tuple[tuple[str, ...], ...]
    zone_letters: str
    plane_zones: str
    reach: float
    inner_radius: float

    @property
    def total(self) -> np.ndarray:
        """Alias of ``tc_total``."""
        return self.tc_total

    @property
    def flags(self) -> list[str]:
        """Codes per station joined by ``;`` ("" when clean), as ``qc_flag`` holds them."""
        return [";".join(c) for c in self.codes]


def _compartment_samples(zone: HammerZone, cell: float) -> tuple[np.ndarray, np.ndarray]:
    """Sample points (east, north in m) per compartment, equal-area spaced.

    Returns arrays of shape (compartments, samples).
    """
    n = zone.compartments
    n_r = int(np.clip(math.ceil((zone.outer - zone.inner) / cell), 2, MAX_SAMPLES))
    arc = 2.0 * math.pi * 0.5 * (zone.inner + zone.outer) / n
    n_a = int(np.clip(math.ceil(arc / cell), 2, MAX_SAMPLES))
    # Radii at the centres of equal-area sub-rings, so a plain mean of the
    # samples is an area mean.
    u = (np.arange(n_r) + 0.5) / n_r
    radii = np.sqrt(zone.inner**2 + u * (zone.outer**2 - zone.inner**2))
    width = 2.0 * math.pi / n
    az = (np.arange(n)[:, None] + (np.arange(n_a)[None, :] + 0.5) / n_a) * width
    r = np.broadcast_to(radii[None, None, :], (n, n_a, n_r))
    a = np.broadcast_to(az[:, :, None], (n, n_a, n_r))
    return (r * np.sin(a)).reshape(n, -1), (r * np.cos(a)).reshape(n, -1)


def _to_grid_coords(geographic: bool, x0: float, y0: float, east: np.ndarray, north: np.ndarray):
    if not geographic:
        return x0 + east, y0 + north
    # Point at ground distance s and azimuth alpha on the sphere.
    s = np.hypot(east, north) / MEAN_EARTH_RADIUS
    alpha = np.arctan2(east, north)
    phi0, lam0 = math.radians(y0), math.radians(x0)
    sin_phi = math.sin(phi0) * np.cos(s) + math.cos(phi0) * np.sin(s) * np.cos(alpha)
    phi = np.arcsin(np.clip(sin_phi, -1.0, 1.0))
    lam = lam0 + np.arctan2(np.sin(alpha) * np.sin(s) * math.cos(phi0), np.cos(s) - math.sin(phi0) * sin_phi)
    return np.degrees(lam), np.degrees(phi)


def _cell_sides(grid: ElevationGrid, latitude: float) -> tuple[float, float]:
    """Metric cell sides (east-west, north-south) at a latitude, m."""
    if not grid.geographic:
        return grid.cell_x, grid.cell_y
    metre_per_degree = math.pi / 180.0 * MEAN_EARTH_RADIUS
    return grid.cell_x * metre_per_degree * math.cos(math.radians(latitude)), grid.cell_y * metre_per_degree


def station_gradient(grid: ElevationGrid, x: float, y: float) -> tuple[float, float]:
    """Gradient (east, north; m/m) of the DEM's bilinear surface at a point.

    Parameters
    ----------
    grid : ElevationGrid
        The fine DEM.
    x, y : float
        Point in the grid's CRS.

    Returns
    -------
    (float, float)
        NaN when the 2 x 2 stencil has no data.

    Notes
    -----
    The same slope as the exact engine's innermost square: along each axis the
    differences of the two rows (columns) of the bilinear stencil are blended
    by the point's fraction; where one of them is missing the other is used.

    Examples
    --------
    Rising 10 m per 10 m cell eastward and 20 m per cell northward:

    >>> g = ElevationGrid.from_array([[20.0, 30.0], [0.0, 10.0]], 0, 20, 10, 10)
    >>> station_gradient(g, 10.0, 10.0)
    (1.0, 2.0)
    """
    i0, j0, ti, tj = (float(v[0]) for v in bilinear_setup(grid, np.array([x]), np.array([y])))
    p = grid.read_window(int(i0), int(j0), 2, 2)
    if not np.any(np.isfinite(p)):
        return math.nan, math.nan
    cw, ch = _cell_sides(grid, y)

    def blend(d0: float, d1: float, t: float) -> float:
        if math.isfinite(d0) and math.isfinite(d1):
            return (1 - t) * d0 + t * d1
        return d0 if math.isfinite(d0) else (d1 if math.isfinite(d1) else 0.0)

    ge = blend(p[0, 1] - p[0, 0], p[1, 1] - p[1, 0], ti) / cw
    # Rows run south, so the northward gradient has the other sign.
    gn = -blend(p[1, 0] - p[0, 0], p[1, 1] - p[0, 1], tj) / ch
    return float(ge), float(gn)


def _split(zone: HammerZone, inner_radius: float) -> list[tuple[float, float, bool]]:
    """(r1, r2, counts_to_inner) pieces of a zone cut at ``inner_radius``."""
    if zone.outer <= inner_radius:
        return [(zone.inner, zone.outer, True)]
    if zone.inner >= inner_radius:
        return [(zone.inner, zone.outer, False)]
    return [(zone.inner, inner_radius, True), (inner_radius, zone.outer, False)]


class _Reader:
    """Fine-DEM windows: one read for the whole survey when it is small enough."""

    def __init__(self, grid: ElevationGrid, x: np.ndarray, y: np.ndarray, reach: float):
        self.grid = grid
        self.cache = None
        if x.size and reach > 0:
            r0, c0, r1, c1 = self._bounds(float(np.min(x)), float(np.max(x)), float(np.min(y)), float(np.max(y)), reach)
            if (r1 - r0) * (c1 - c0) <= MAX_WINDOW_CELLS:
                self.cache = (r0, c0, grid.read_window(r0, c0, r1 - r0, c1 - c0))
        self.reach = reach

    def _bounds(self, x_lo: float, x_hi: float, y_lo: float, y_hi: float, reach: float):
        g = self.grid
        if g.geographic:
            dlat = math.degrees(reach / MEAN_EARTH_RADIUS) * 1.01
            lat = min(max(abs(y_lo), abs(y_hi)) + dlat, 89.0)
            dlon = dlat / max(math.cos(math.radians(lat)), 1e-3)
        else:
            dlat = dlon = reach * 1.01
        r0 = max(int(math.floor((g.y_origin - (y_hi + dlat)) / g.cell_y)) - 1, 0)
        c0 = max(int(math.floor((x_lo - dlon - g.x_origin) / g.cell_x)) - 1, 0)
        r1 = min(int(math.ceil((g.y_origin - (y_lo - dlat)) / g.cell_y)) + 1, g.n_rows)
        c1 = min(int(math.ceil((x_hi + dlon - g.x_origin) / g.cell_x)) + 1, g.n_cols)
        return r0, c0, max(r1, r0 + 1), max(c1, c0 + 1)

    def window(self, x: float, y: float):
        if self.cache is not None:
            return self.cache
        r0, c0, r1, c1 = self._bounds(x, x, y, y, self.reach)
        return r0, c0, self.grid.read_window(r0, c0, r1 - r0, c1 - c0)


def _heights(reader: _Reader, regional: ElevationGrid | None, x0: float, y0: float, gx: np.ndarray, gy: np.ndarray):
    """Sample heights: fine DEM first, regional where the fine one has none.

    Returns (heights, True when the regional filled a void inside the fine
    raster's extent).
    """
    fine = reader.grid
    row0, col0, window = reader.window(x0, y0)
    on_fine = inside_extent(fine, gx, gy)
    h = np.where(on_fine, bilinear_from_window(window, row0, col0, *bilinear_setup(fine, gx, gy)), np.nan)
    filled_void = False
    missing = ~np.isfinite(h)
    if regional is not None and np.any(missing):
        hr = sample_bilinear(regional, gx[missing], gy[missing])
        h[missing] = hr
        filled_void = bool(np.any(on_fine[missing] & np.isfinite(hr)))
    return h, filled_void


def hammer_terrain_correction(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    grid: ElevationGrid,
    density: float = 2670.0,
    zones: str = "BCDEFGHIJKLM",
    *,
    regional: ElevationGrid | None = None,
    inner_radius: float = 2000.0,
    progress: Callable[[float], None] | None = None,
    is_cancelled: Callable[[], bool] | None = None,
    curvature: bool = True,
) -> HammerResult:
    """Hammer (1939) ring-and-sector terrain correction from DEMs.

    Parameters
    ----------
    x, y : array_like
        Station coordinates in the grid's CRS (lon, lat degrees if geographic).
    station_height : array_like
        Station heights in metres.
    grid : ElevationGrid
        Fine DEM giving the compartment mean heights.
    density : float
        Density in kg/m^3.
    zones : str
        Contiguous zones out of B-M, as letters ("BCDEFGHIJKLM") or a range
        ("B-M"); see :func:`parse_zones`. Zone A (the station zone) is never
        sampled.
    regional : ElevationGrid, optional
        Coarser DEM in the same CRS, sampled where the fine DEM has no data.
    inner_radius : float
        Radius (m) splitting ``tc_inner`` from ``tc_outer``.
    progress, is_cancelled : callable, optional
        Called with the fraction done (0-1); polled once per station, when
        True :class:`TerrainCancelled` is raised.
    curvature : bool
        Lower every compartment by the Earth-curvature drop s^2/2R, as the
        zone engine does (default); False gives Hammer's flat charts.

    Returns
    -------
    HammerResult

    Notes
    -----
    Each compartment of n in a ring r1..r2 whose mean height differs from the
    station by z gives :func:`ring_sector_correction`,
    :math:`T = (2\\pi G\\rho/n)[(r_2 - r_1) + \\sqrt{r_1^2 + z^2} - \\sqrt{r_2^2 + z^2}]`
    on a flat Earth (Hammer's charts, ``curvature=False``), or, by default,
    with each sample lowered by s^2/2R and the compartment taken between the
    lowered reference and the lowered terrain (the drop reaches 37.8 m at
    21.94 km); a plain at the station's height on the sphere then gives 0.

    * Mean heights: bilinear DEM heights at sample points spread over the
      compartment at equal area (about one per fine cell, at most
      ``MAX_SAMPLES`` x ``MAX_SAMPLES``); from the fine DEM where it has data,
      from the regional DEM elsewhere (code ``tc_regional_fill`` when the
      regional filled a void inside the fine DEM's extent). Samples without
      data are left out; a compartment without any counts as flat
      (``tc_no_data_zones``); covered area below 99 % gives ``tc_partial``.
    * Zones finer than the fine DEM's cell (:func:`resolved_by`) are not
      sampled: they hold the plane through the station height with the slope
      of the DEM's bilinear surface at the station (the exact engine's
      innermost model), integrated over the ring by
      :func:`plane_ring_correction`. Without DEM data at the station they
      count as flat (``tc_no_slope``).
    * Inner/outer: a zone counts to ``tc_inner`` when its outer radius is at
      most ``inner_radius``, to ``tc_outer`` when its inner radius is at least
      ``inner_radius``; a zone that ``inner_radius`` cuts is split there, each
      part with the compartment's one mean height (the ring formula
      telescopes, so the parts add up to the whole zone exactly).

    References
    ----------
    Hammer, S., 1939, Geophysics 4(3), 184-194; Nowell, D.A.G., 1999,
    J. Appl. Geophys. 42, 117-134.

    Examples
    --------
    >>> import numpy as np
    >>> g = ElevationGrid.from_array(np.zeros((50, 50)), 0, 1000, 20, 20)
    >>> r = hammer_terrain_correction([500.0], [500.0], [0.0], g, zones="B-D")
    >>> float(r.tc_total[0]), r.plane_zones, r.codes
    (0.0, 'B', ((),))
    """
    xs = np.atleast_1d(np.asarray(x, dtype=float))
    ys = np.atleast_1d(np.asarray(y, dtype=float))
    hs = np.atleast_1d(np.asarray(station_height, dtype=float))
    if not (xs.size == ys.size == hs.size):
        msg = f"x, y and station_height must have the same length, got {xs.size}, {ys.size}, {hs.size}"
        raise ValueError(msg)
    chosen = parse_zones(zones)
    if not density > 0:
        msg = f"density must be > 0 kg/m^3, got {density}"
        raise ValueError(msg)
    if not inner_radius >= 0:
        msg = f"inner_radius must be >= 0 m, got {inner_radius}"
        raise ValueError(msg)
    if regional is not None and regional.geographic != grid.geographic:
        msg = "fine and regional grids must share one CRS (both geographic or both projected)"
        raise ValueError(msg)
    n = xs.size
    # Resolution is judged on the fine DEM's larger metric side (at the
    # survey's mean latitude for degree grids).
    on = np.isfinite(xs) & np.isfinite(ys)
    lat = float(np.mean(ys[on])) if grid.geographic and on.any() else 0.0
    cw, ch = _cell_sides(grid, lat)
    plane = [z for z in chosen if not resolved_by(z, max(cw, ch))]
    sampled = [z for z in chosen if resolved_by(z, max(cw, ch))]
    samples = {z.letter: _compartment_samples(z, min(cw, ch)) for z in sampled}
    # Curvature drop s^2/2R of every sample (zeros for Hammer's flat charts), fixed per zone.
    drops = {
        k: (e * e + nn * nn) / (2.0 * MEAN_EARTH_RADIUS) if curvature else np.zeros(e.shape)
        for k, (e, nn) in samples.items()
    }
    reach = chosen[-1].outer
    full_area = sum(math.pi * (z.outer**2 - z.inner**2) for z in chosen)

    per_zone = {z.letter: np.full(n, np.nan) for z in chosen}
    tc_inner = np.full(n, np.nan)
    tc_outer = np.full(n, np.nan)
    coverage = np.full(n, np.nan)
    codes: list[list[str]] = [[] for _ in range(n)]
    inside = on & inside_extent(grid, np.where(on, xs, 0.0), np.where(on, ys, 0.0))
    reader = _Reader(grid, xs[inside], ys[inside], max((z.outer for z in sampled), default=0.0))
    for i in range(n):
        if is_cancelled is not None and is_cancelled():
            msg = "terrain correction cancelled"
            raise TerrainCancelled(msg)
        if not inside[i]:
            codes[i].append("outside_dem")
            continue
        if not np.isfinite(hs[i]):
            codes[i].append("no_height")
            continue
        parts = {True: 0.0, False: 0.0}
        covered = 0.0
        if plane:
            ge, gn = station_gradient(grid, xs[i], ys[i])
            slope = math.hypot(ge, gn)
            if not math.isfinite(slope):
                codes[i].append("tc_no_slope")
                slope = 0.0
            else:
                covered += sum(math.pi * (z.outer**2 - z.inner**2) for z in plane)
            for zone in plane:
                value = 0.0
                for r1, r2, to_inner in _split(zone, inner_radius):
                    t = float(plane_ring_correction(r1, r2, slope, density))
                    parts[to_inner] += t
                    value += t
                per_zone[zone.letter][i] = value
        if sampled:
            east = np.concatenate([samples[z.letter][0].ravel() for z in sampled])
            north = np.concatenate([samples[z.letter][1].ravel() for z in sampled])
            gx, gy = _to_grid_coords(grid.geographic, xs[i], ys[i], east, north)
            heights, filled_void = _heights(reader, regional, xs[i], ys[i], gx, gy)
            if filled_void:
                codes[i].append("tc_regional_fill")
            start = 0
            empty = 0
            for zone in sampled:
                shape = samples[zone.letter][0].shape
                h = heights[start : start + shape[0] * shape[1]].reshape(shape)
                start += h.size
                ok = np.isfinite(h)
                count = ok.sum(axis=1)
                drop = drops[zone.letter]
                mean_drop = np.where(count > 0, np.where(ok, drop, 0.0).sum(axis=1) / np.maximum(count, 1), 0.0)
                mean = np.where(count > 0, np.where(ok, h, 0.0).sum(axis=1) / np.maximum(count, 1), hs[i])
                empty += int(np.sum(count == 0))
                covered += math.pi * (zone.outer**2 - zone.inner**2) * float(count.sum()) / h.size
                value = 0.0
                for r1, r2, to_inner in _split(zone, inner_radius):
                    lowered = mean - hs[i] - mean_drop
                    t = float(np.sum(ring_sector_correction(r1, r2, zone.compartments, lowered, density, mean_drop)))
                    parts[to_inner] += t
                    value += t
                per_zone[zone.letter][i] = value
            if empty:
                codes[i].append("tc_no_data_zones")
        tc_inner[i], tc_outer[i] = parts[True], parts[False]
        coverage[i] = min(covered / full_area, 1.0)
        if coverage[i] < COVERAGE_FLAG_BELOW:
            codes[i].insert(0, "tc_partial")
        if progress is not None:
            progress((i + 1) / n)
    tc_total = tc_inner + tc_outer
    zone_arrays = {k: _frozen(v) for k, v in per_zone.items()}
    return HammerResult(
        tc_inner=_frozen(tc_inner),
        tc_outer=_frozen(tc_outer),
        tc_total=_frozen(tc_total),
        zones=MappingProxyType(zone_arrays),
        coverage=_frozen(coverage),
        codes=tuple(tuple(c) for c in codes),
        zone_letters="".join(z.letter for z in chosen),
        plane_zones="".join(z.letter for z in plane),
        reach=reach,
        inner_radius=float(inner_radius),
    )


def _frozen(a: np.ndarray) -> np.ndarray:
    a.setflags(write=False)
    return a

