# SPDX-License-Identifier: GPL-2.0-or-later
"""Ring-and-sector terrain correction (Hammer 1939) with heights from a DEM.

This exists so that DEM-driven results can be compared with chart-based field
practice; the exact zone engine stays the default method.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, field
from typing import Callable, Dict, List, NamedTuple, Optional, Tuple

import numpy as np
import numpy.typing as npt

from ..constants import FOOT, GRAVITATIONAL_CONSTANT, MEAN_EARTH_RADIUS, SI_TO_MGAL
from ._engine import COVERAGE_FLAG_BELOW, _inside
from ._errors import TerrainCancelled
from ._grid import ElevationGrid


class HammerZone(NamedTuple):
    """One ring of the Hammer chart: radii in metres, number of compartments."""

    letter: str
    inner: float
    outer: float
    compartments: int


#: Zones B-M of Hammer (1939): radii in feet converted with the international
#: foot, and compartments per ring. FROM MEMORY (REFERENCES.md §5.1, tag [M]):
#: not verified against Hammer's paper; only the outer radius (about 13.6
#: miles, 21.9 km) is consistent with a verified source (Sandberg 1959).
HAMMER_ZONES: Tuple[HammerZone, ...] = tuple(
    HammerZone(letter, r1 * FOOT, r2 * FOOT, n)
    for letter, r1, r2, n in (
        ("B", 6.56, 54.6, 4),
        ("C", 54.6, 175.0, 6),
        ("D", 175.0, 558.0, 6),
        ("E", 558.0, 1280.0, 8),
        ("F", 1280.0, 2936.0, 8),
        ("G", 2936.0, 5018.0, 12),
        ("H", 5018.0, 8578.0, 12),
        ("I", 8578.0, 14612.0, 12),
        ("J", 14612.0, 21826.0, 16),
        ("K", 21826.0, 32490.0, 16),
        ("L", 32490.0, 48365.0, 16),
        ("M", 48365.0, 71996.0, 16),
    )
)

#: Most sample points per compartment along the radius and along the arc.
MAX_SAMPLES = 24


def ring_sector_correction(
    r1: float, r2: float, n_compartments: int, relief: npt.ArrayLike, density: float = 2670.0
) -> np.ndarray:
    """Terrain correction of one ring compartment of uniform relief, in mGal.

    Parameters
    ----------
    r1, r2 : float
        Inner and outer radius of the ring in metres (0 <= r1 < r2).
    n_compartments : int
        Number of equal compartments the ring is divided into.
    relief : array_like
        Mean height of the compartment minus the station height, in metres
        (either sign gives a positive correction).
    density : float
        Density in kg/m^3.

    Returns
    -------
    numpy.ndarray
        Correction of one compartment in mGal (>= 0).

    Notes
    -----
    A flat-topped compartment of a cylinder ring (REFERENCES.md §5.1):

    .. math:: T = \\frac{2\\pi G\\rho}{n}\\left[(r_2 - r_1) + \\sqrt{r_1^2 + z^2}
              - \\sqrt{r_2^2 + z^2}\\right].

    References
    ----------
    Hammer, S., 1939, Terrain corrections for gravimeter stations,
    Geophysics 4, 184-194.

    Examples
    --------
    Ring 1280-2936 ft, 8 compartments, relief 200 ft, 2.0 g/cm^3 (about
    0.03 mGal, common practice):

    >>> print(f"{float(ring_sector_correction(390.144, 894.893, 8, 60.96, 2000.0)):.4f}")
    0.0279
    """
    if not (0 <= r1 < r2):
        raise ValueError(f"need 0 <= r1 < r2, got {r1}, {r2}")
    if n_compartments < 1:
        raise ValueError(f"n_compartments must be >= 1, got {n_compartments}")
    z = np.asarray(relief, dtype=float)
    z2 = z * z
    # (r2 - r1) + sqrt(r1^2+z^2) - sqrt(r2^2+z^2) written without cancellation.
    a1, a2 = np.sqrt(r1 * r1 + z2), np.sqrt(r2 * r2 + z2)
    with np.errstate(divide="ignore", invalid="ignore"):
        bracket = np.where(z2 > 0, z2 * (1.0 / (a1 + r1) - 1.0 / (a2 + r2)), 0.0)
    return 2.0 * math.pi * GRAVITATIONAL_CONSTANT * density * SI_TO_MGAL / n_compartments * bracket


@dataclass
class HammerResult:
    """Ring-and-sector terrain correction per station.

    Attributes
    ----------
    total : numpy.ndarray
        Sum over the chosen zones, mGal.
    zones : dict
        Zone letter -> per-station correction of that ring, mGal.
    coverage : numpy.ndarray
        Fraction (0-1) of the rings' area whose samples had data.
    flags : list of str
        Quality notes per station ("" when clean).
    """

    total: np.ndarray
    zones: Dict[str, np.ndarray]
    coverage: np.ndarray
    flags: List[str] = field(default_factory=list)


def _compartment_samples(zone: HammerZone, cell: float) -> Tuple[np.ndarray, np.ndarray]:
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


def _to_grid_coords(grid: ElevationGrid, x0: float, y0: float, east: np.ndarray, north: np.ndarray):
    if not grid.geographic:
        return x0 + east, y0 + north
    # Point at ground distance s and azimuth alpha on the sphere.
    s = np.hypot(east, north) / MEAN_EARTH_RADIUS
    alpha = np.arctan2(east, north)
    phi0, lam0 = math.radians(y0), math.radians(x0)
    sin_phi = math.sin(phi0) * np.cos(s) + math.cos(phi0) * np.sin(s) * np.cos(alpha)
    phi = np.arcsin(np.clip(sin_phi, -1.0, 1.0))
    lam = lam0 + np.arctan2(np.sin(alpha) * np.sin(s) * math.cos(phi0), np.cos(s) - math.sin(phi0) * sin_phi)
    return np.degrees(lam), np.degrees(phi)


def _bilinear_many(z: np.ndarray, row0: int, col0: int, grid: ElevationGrid, x: np.ndarray, y: np.ndarray) -> np.ndarray:
    """Bilinear heights from a window array; NaN where a corner is missing."""
    fi = (grid.y_origin - y) / grid.cell_y - 0.5 - row0
    fj = (x - grid.x_origin) / grid.cell_x - 0.5 - col0
    i0 = np.floor(fi).astype(np.int64)
    j0 = np.floor(fj).astype(np.int64)
    ti, tj = fi - i0, fj - j0
    ok = (i0 >= 0) & (j0 >= 0) & (i0 + 1 < z.shape[0]) & (j0 + 1 < z.shape[1])
    i0c, j0c = np.where(ok, i0, 0), np.where(ok, j0, 0)
    v = (
        z[i0c, j0c] * (1 - ti) * (1 - tj)
        + z[i0c, j0c + 1] * (1 - ti) * tj
        + z[i0c + 1, j0c] * ti * (1 - tj)
        + z[i0c + 1, j0c + 1] * ti * tj
    )
    return np.where(ok, v, np.nan)


def hammer_terrain_correction(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    grid: ElevationGrid,
    density: float = 2670.0,
    zones: str = "BCDEFGHIJKLM",
    *,
    progress: Optional[Callable[[float], None]] = None,
    is_cancelled: Optional[Callable[[], bool]] = None,
) -> HammerResult:
    """Hammer (1939) ring-and-sector terrain correction from a DEM.

    Parameters
    ----------
    x, y : array_like
        Station coordinates in the grid's CRS (lon, lat degrees if geographic).
    station_height : array_like
        Station heights in metres.
    grid : ElevationGrid
        DEM giving the compartment mean heights.
    density : float
        Density in kg/m^3.
    zones : str
        Zone letters to use, out of "BCDEFGHIJKLM" (zone A, the station zone,
        is not corrected, as in the chart method).
    progress, is_cancelled : callable, optional
        As for :func:`terrain_correction`.

    Returns
    -------
    HammerResult

    Notes
    -----
    Each compartment's mean height is the mean of DEM heights (bilinear) at
    sample points spread over it at equal area (radii at the centres of
    equal-area sub-rings, azimuths evenly spaced), about one per DEM cell and
    at most ``MAX_SAMPLES`` x ``MAX_SAMPLES``; samples without data are left
    out (the covered fraction is reported), and a compartment with none
    contributes nothing (flagged). The
    correction of each compartment is :func:`ring_sector_correction` with
    relief = mean height - station height, flat Earth (the rings end at
    21.9 km).

    References
    ----------
    Hammer, S., 1939, Geophysics 4, 184-194.

    Examples
    --------
    >>> import numpy as np
    >>> g = ElevationGrid.from_array(np.zeros((50, 50)), 0, 500, 10, 10)
    >>> r = hammer_terrain_correction([250.0], [250.0], [0.0], g, zones="BCD")
    >>> float(r.total[0])
    0.0
    """
    xs = np.atleast_1d(np.asarray(x, dtype=float))
    ys = np.atleast_1d(np.asarray(y, dtype=float))
    hs = np.atleast_1d(np.asarray(station_height, dtype=float))
    if not (xs.size == ys.size == hs.size):
        raise ValueError("x, y and station_height must have the same length")
    table = {z.letter: z for z in HAMMER_ZONES}
    unknown = [c for c in zones if c not in table]
    if unknown or not zones:
        raise ValueError(f"zones must be letters out of 'BCDEFGHIJKLM', got {zones!r}")
    if not density > 0:
        raise ValueError(f"density must be > 0 kg/m^3, got {density}")
    chosen = [table[c] for c in dict.fromkeys(zones)]
    n = xs.size
    per_zone = {z.letter: np.full(n, np.nan) for z in chosen}
    flags: List[List[str]] = [[] for _ in range(n)]
    if grid.geographic:
        cell = min(grid.cell_y * math.pi / 180 * MEAN_EARTH_RADIUS, grid.cell_x * math.pi / 180 * MEAN_EARTH_RADIUS)
    else:
        cell = min(grid.cell_x, grid.cell_y)
    samples = {z.letter: _compartment_samples(z, cell) for z in chosen}
    reach = max(z.outer for z in chosen)
    full_area = sum(math.pi * (z.outer**2 - z.inner**2) for z in chosen)
    coverage = np.full(n, np.nan)
    inside = _inside(grid, xs, ys)
    for i in range(n):
        if is_cancelled is not None and is_cancelled():
            raise TerrainCancelled("terrain correction cancelled")
        if not inside[i]:
            flags[i].append("outside DEM")
            continue
        if not np.isfinite(hs[i]):
            flags[i].append("no height")
            continue
        # One window per station covering its rings.
        if grid.geographic:
            dlat = math.degrees(reach / MEAN_EARTH_RADIUS) * 1.01
            dlon = dlat / max(math.cos(math.radians(min(abs(ys[i]) + dlat, 89.0))), 1e-3)
        else:
            dlat = dlon = reach * 1.01
        row0 = int(math.floor((grid.y_origin - (ys[i] + dlat)) / grid.cell_y)) - 1
        col0 = int(math.floor((xs[i] - dlon - grid.x_origin) / grid.cell_x)) - 1
        row1 = int(math.ceil((grid.y_origin - (ys[i] - dlat)) / grid.cell_y)) + 1
        col1 = int(math.ceil((xs[i] + dlon - grid.x_origin) / grid.cell_x)) + 1
        window = grid.read_window(row0, col0, row1 - row0, col1 - col0)
        missing = 0
        covered = 0.0
        for zone in chosen:
            east, north = samples[zone.letter]
            gx, gy = _to_grid_coords(grid, xs[i], ys[i], east, north)
            h = _bilinear_many(window, row0, col0, grid, gx, gy)
            ok = np.isfinite(h)
            count = ok.sum(axis=1)
            mean = np.where(count > 0, np.where(ok, h, 0.0).sum(axis=1) / np.maximum(count, 1), hs[i])
            missing += int(np.sum(count == 0))
            covered += math.pi * (zone.outer**2 - zone.inner**2) * float(count.sum()) / h.size
            per_zone[zone.letter][i] = float(np.sum(ring_sector_correction(zone.inner, zone.outer, zone.compartments, mean - hs[i], density)))
        coverage[i] = covered / full_area
        if coverage[i] < COVERAGE_FLAG_BELOW:
            flags[i].append(f"partial coverage {int(math.floor(coverage[i] * 100))}%")
        if missing:
            flags[i].append(f"{missing} compartments without data")
        if progress is not None:
            progress((i + 1) / n)
    total = np.sum([per_zone[z.letter] for z in chosen], axis=0)
    return HammerResult(total=total, zones=per_zone, coverage=coverage, flags=["; ".join(f) for f in flags])
