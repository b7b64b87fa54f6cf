# SPDX-License-Identifier: GPL-2.0-or-later
"""Forward model of the invented demo survey: what a gravimeter would read.

This module produces the *synthetic truth* of the demo scenario (invented
data, for demonstration and self-consistency tests only). It is pure numpy and
deliberately independent of the reduction code: it only borrows the exact
prism kernel and the constants, so the end-to-end test compares the
reduction's terrain correction with an attraction computed by a different
route.

Model of the Earth used here (all heights above the ellipsoid, metres):

* the normal Earth fills the GRS80 ellipsoid; sea level is the ellipsoid
  (height 0) in this invented world;
* the topographic masses are the DEM cells themselves: flat-topped columns of
  density 2670 kg/m^3 from the reference surface (height 0) to the cell height,
  for every cell whose centre lies within 166 735 m of the station; the fine
  DEM is used wherever it exists and the regional DEM beyond the fine
  footprint; every column is lowered by ``s**2 / (2 R)`` (``s`` = horizontal
  distance from the station to the cell centre) to follow the sphere;
* the buried bodies are sets of right rectangular prisms with a density
  contrast;
* the atmosphere above the station exerts no net pull, so the observed value
  lacks the atmospheric correction that GRS80 normal gravity contains;
* normal gravity at the station is the exact GRS80 closed form at height and
  the atmosphere is the Wenzel polynomial, both taken from
  ``relief_gravity.algorithms`` (checked there against docs/reduction.md, sections 3 and 4;
  the reduction itself uses the Somigliana value plus the Hinze et al. 2005
  second-order height correction by default, a different route).

Quadrature of the terrain: exact prisms (Nagy 1966) for fine cells within
``near_radius`` (default 3 km) and for regional cells within
``regional_prism_radius`` (default 30 km); vertical line masses (docs/terrain.md,
section 5) elsewhere, where the cell is at least 60 (fine) or 30 (regional) cell
widths away and the line-mass error is below 0.05 % of those cells' small
share. Cells straddling the 166 735 m circle are weighted by the fraction of
their area inside it.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from ..algorithms import atmospheric_correction, normal_gravity_at_height
from ..algorithms.constants import (
    BOUGUER_CAP_RADIUS,
    DEFAULT_REDUCTION_DENSITY,
    GRAVITATIONAL_CONSTANT,
    MEAN_EARTH_RADIUS,
    SI_TO_MGAL,
)
from ..algorithms.terrain import ElevationGrid, prism_gravity, sample_bilinear


@dataclass(frozen=True)
class HeightGrid:
    """A north-up raster of heights (m) with square cells.

    Row 0 is the northern row; cell ``(i, j)`` has its centre at
    ``(west + (j + 0.5) * cell_size, north - (i + 0.5) * cell_size)``.
    """

    west: float
    north: float
    cell_size: float
    heights: np.ndarray

    @property
    def n_rows(self) -> int:
        """Number of rows."""
        return self.heights.shape[0]

    @property
    def n_cols(self) -> int:
        """Number of columns."""
        return self.heights.shape[1]

    @property
    def east(self) -> float:
        """Eastern edge, m."""
        return self.west + self.n_cols * self.cell_size

    @property
    def south(self) -> float:
        """Southern edge, m."""
        return self.north - self.n_rows * self.cell_size

    def x_centres(self) -> np.ndarray:
        """Easting of each column's cell centres, m, west to east."""
        return self.west + (np.arange(self.n_cols) + 0.5) * self.cell_size

    def y_centres(self) -> np.ndarray:
        """Northing of each row's cell centres, m, north to south."""
        return self.north - (np.arange(self.n_rows) + 0.5) * self.cell_size


@dataclass(frozen=True)
class PrismSet:
    """Right rectangular prisms (m, upward positive) with density contrasts (kg/m^3)."""

    west: np.ndarray
    east: np.ndarray
    south: np.ndarray
    north: np.ndarray
    bottom: np.ndarray
    top: np.ndarray
    density: np.ndarray

    def __post_init__(self):
        """Refuse fields of different lengths."""
        n = np.asarray(self.west).size
        for name in ("east", "south", "north", "bottom", "top", "density"):
            if np.asarray(getattr(self, name)).size != n:
                msg = f"PrismSet field {name} has {np.asarray(getattr(self, name)).size} values, expected {n}"
                raise ValueError(msg)

    @property
    def size(self) -> int:
        """Number of prisms."""
        return np.asarray(self.west).size

    def mass(self) -> float:
        """Total anomalous mass in kg (sum of density contrast times volume)."""
        volume = (self.east - self.west) * (self.north - self.south) * (self.top - self.bottom)
        return float(np.sum(self.density * volume))

    @staticmethod
    def concatenate(*sets: PrismSet) -> PrismSet:
        """All prisms of ``sets`` in one set, in the order given.

        Parameters
        ----------
        *sets : PrismSet
            The sets to join.

        Returns
        -------
        PrismSet
            One set holding every prism.
        """
        fields = ("west", "east", "south", "north", "bottom", "top", "density")
        return PrismSet(*(np.concatenate([np.asarray(getattr(s, f), float) for s in sets]) for f in fields))


# --- terrain ----------------------------------------------------------------


def _line_mass(s2, station_height, bottom, top):
    """Downward pull of unit-density vertical lines per unit cross-section (1/m).

    ``1/r_top - 1/r_bottom`` written as a product so that distant cells, whose
    two distances differ in the sixth digit, keep all their digits.
    """
    d_top = station_height - top
    d_bot = station_height - bottom
    r_top = np.sqrt(s2 + d_top * d_top)
    r_bot = np.sqrt(s2 + d_bot * d_bot)
    return (d_bot - d_top) * (d_bot + d_top) / (r_top * r_bot * (r_top + r_bot))


def _inside_fraction(dx, dy, cell, radius, n_sub=8):
    """Fraction of each square cell (centre offsets dx, dy) inside the circle."""
    dist = np.hypot(dx, dy)
    half_diag = cell * np.sqrt(0.5)
    frac = (dist <= radius).astype(float)
    edge = np.abs(dist - radius) < half_diag
    if np.any(edge):
        offsets = ((np.arange(n_sub) + 0.5) / n_sub - 0.5) * cell
        ox, oy = np.meshgrid(offsets, offsets)
        ex = dx[edge][:, None] + ox.ravel()[None, :]
        ey = dy[edge][:, None] + oy.ravel()[None, :]
        frac[edge] = np.mean(ex * ex + ey * ey <= radius * radius, axis=1)
    return frac


def _signed_column(heights):
    """Column bounds relative to the reference surface and the sign of its mass.

    A cell below height 0 is a mass deficit between its height and 0.
    """
    return np.minimum(heights, 0.0), np.maximum(heights, 0.0), np.where(heights < 0.0, -1.0, 1.0)


def _split_prisms(xs, ys, hs, west, east, south, north, bottom, top, sign, density):
    """Sum of signed prisms; a prism holding the station is split at its height.

    Splitting keeps the station on a face of every prism, never strictly
    inside one, which is where the closed form is documented exact.
    """
    inside = (west < xs) & (xs < east) & (south < ys) & (ys < north) & (bottom < hs) & (hs < top)
    upper = np.where(inside, hs, top)
    g = np.sum(sign * prism_gravity(xs, ys, hs, west, east, south, north, bottom, upper, density))
    if np.any(inside):
        k = inside
        g += np.sum(sign[k] * prism_gravity(xs, ys, hs, west[k], east[k], south[k], north[k], hs, top[k], density))
    return g


def _bilinear_patch(
    xs, ys, hs, fine, row0, row1, col0, col1, density, earth_radius, n_sub=10, n_fine=10, fine_reach=3
):
    """Attraction of DEM cells rows row0..row1-1, cols col0..col1-1 as the bilinear surface.

    The station height is the bilinear DEM, so flat-topped cells around it
    would leave the station floating above, or buried in, steps of up to
    half the cell-to-cell relief right beside it; no real terrain looks like
    that. Close to the station the terrain is therefore the bilinear
    interpolant of the DEM (continuous, through the station), integrated with
    flat sub-prisms of cell/n_sub, refined n_fine times in the sub-cells
    within ``fine_reach`` sub-cells of the station, where the staircase of
    the sub-prisms would otherwise show.
    """
    cell = fine.cell_size
    step = cell / n_sub
    west0 = fine.west + col0 * cell
    north0 = fine.north - row0 * cell
    jj, ii = np.meshgrid(np.arange((col1 - col0) * n_sub), np.arange((row1 - row0) * n_sub))
    sub_w = west0 + jj.ravel() * step
    sub_n = north0 - ii.ravel() * step
    reach = fine_reach * step
    close = (np.abs(sub_w + 0.5 * step - xs) <= reach) & (np.abs(sub_n - 0.5 * step - ys) <= reach)
    fine_step = step / n_fine
    fj, fi = np.meshgrid(np.arange(n_fine), np.arange(n_fine))
    west = np.concatenate([sub_w[~close], (sub_w[close][:, None] + fj.ravel() * fine_step).ravel()])
    north = np.concatenate([sub_n[~close], (sub_n[close][:, None] - fi.ravel() * fine_step).ravel()])
    size = np.concatenate([np.full((~close).sum(), step), np.full(close.sum() * n_fine * n_fine, fine_step)])
    cx = west + 0.5 * size
    cy = north - 0.5 * size
    h = bilinear_height(fine, cx, cy, clamp=True)
    drop = ((cx - xs) ** 2 + (cy - ys) ** 2) / (2.0 * earth_radius)
    low, high, sign = _signed_column(h)
    return _split_prisms(xs, ys, hs, west, west + size, north - size, north, low - drop, high - drop, sign, density)


def _fine_part(xs, ys, hs, fine, density, outer_radius, near_radius, earth_radius, bilinear_cells):
    xc = fine.x_centres()
    yc = fine.y_centres()
    dx = xc[None, :] - xs
    dy = yc[:, None] - ys
    s2 = dx * dx + dy * dy
    drop = s2 / (2.0 * earth_radius)
    low, high, sign = _signed_column(fine.heights)
    bottom = low - drop
    top = high - drop
    area = fine.cell_size**2
    weight = _inside_fraction(
        np.broadcast_to(dx, s2.shape), np.broadcast_to(dy, s2.shape), fine.cell_size, outer_radius
    )
    near = s2 <= near_radius * near_radius
    far = ~near & (weight > 0)
    g_far = np.sum(sign[far] * weight[far] * _line_mass(s2[far], hs, bottom[far], top[far])) * area
    g_far *= GRAVITATIONAL_CONSTANT * density * SI_TO_MGAL
    half = 0.5 * fine.cell_size
    # The cells around the station are the bilinear surface through it (see
    # _bilinear_patch); every other cell is a flat-topped column.
    own_row = int(np.floor((fine.north - ys) / fine.cell_size))
    own_col = int(np.floor((xs - fine.west) / fine.cell_size))
    has_own = 0 <= own_row < fine.n_rows and 0 <= own_col < fine.n_cols
    if has_own:
        r0, r1 = max(own_row - bilinear_cells, 0), min(own_row + bilinear_cells + 1, fine.n_rows)
        c0, c1 = max(own_col - bilinear_cells, 0), min(own_col + bilinear_cells + 1, fine.n_cols)
        near[r0:r1, c0:c1] = False
    x0 = np.broadcast_to(xc[None, :], s2.shape)[near]
    y0 = np.broadcast_to(yc[:, None], s2.shape)[near]
    g_near = np.sum(
        sign[near] * weight[near]
        * prism_gravity(xs, ys, hs, x0 - half, x0 + half, y0 - half, y0 + half, bottom[near], top[near], density)
    )
    if has_own:
        g_near += _bilinear_patch(xs, ys, hs, fine, r0, r1, c0, c1, density, earth_radius)
    return g_near + g_far


def _regional_part(xs, ys, hs, regional, fine, density, outer_radius, prism_radius, earth_radius):
    xc = regional.x_centres()
    yc = regional.y_centres()
    # Only the regional cells outside the fine footprint are terrain here;
    # inside it the fine cells are.
    outside = ~(
        ((yc[:, None] > fine.south) & (yc[:, None] < fine.north))
        & ((xc[None, :] > fine.west) & (xc[None, :] < fine.east))
    )
    dx = np.broadcast_to(xc[None, :] - xs, outside.shape)
    dy = np.broadcast_to(yc[:, None] - ys, outside.shape)
    s2 = dx * dx + dy * dy
    reach = outer_radius + regional.cell_size
    use = outside & (s2 < reach * reach)
    dx, dy, s2 = dx[use], dy[use], s2[use]
    weight = _inside_fraction(dx, dy, regional.cell_size, outer_radius)
    drop = s2 / (2.0 * earth_radius)
    low, high, sign = _signed_column(regional.heights[use])
    bottom = low - drop
    top = high - drop
    sg = sign * weight
    near = s2 <= prism_radius * prism_radius
    far = ~near & (weight > 0)
    g = np.sum(sg[far] * _line_mass(s2[far], hs, bottom[far], top[far])) * regional.cell_size**2
    g *= GRAVITATIONAL_CONSTANT * density * SI_TO_MGAL
    half = 0.5 * regional.cell_size
    x0 = xs + dx[near]
    y0 = ys + dy[near]
    g += np.sum(
        sg[near]
        * prism_gravity(xs, ys, hs, x0 - half, x0 + half, y0 - half, y0 + half, bottom[near], top[near], density)
    )
    return g


def _check_alignment(fine: HeightGrid, regional: HeightGrid) -> None:
    ratio = regional.cell_size / fine.cell_size
    tol = 1e-6 * regional.cell_size
    offsets = [
        (fine.west - regional.west) / regional.cell_size,
        (regional.north - fine.north) / regional.cell_size,
        fine.n_cols * fine.cell_size / regional.cell_size,
        fine.n_rows * fine.cell_size / regional.cell_size,
    ]
    aligned = abs(ratio - round(ratio)) < 1e-9 and all(abs(o - round(o)) * regional.cell_size < tol for o in offsets)
    if not aligned:
        msg = (
            "The fine grid must tile whole regional cells (fine west/north edges and size on the "
            f"regional lattice); got fine west {fine.west}, north {fine.north}, regional west "
            f"{regional.west}, north {regional.north}, cells {fine.cell_size} / {regional.cell_size} m"
        )
        raise ValueError(msg)


def terrain_attraction(
    easting: npt.ArrayLike,
    northing: npt.ArrayLike,
    station_height: npt.ArrayLike,
    fine: HeightGrid,
    regional: HeightGrid | None = None,
    *,
    density: float = DEFAULT_REDUCTION_DENSITY,
    outer_radius: float = BOUGUER_CAP_RADIUS,
    near_radius: float = 3000.0,
    regional_prism_radius: float = 30000.0,
    earth_radius: float = MEAN_EARTH_RADIUS,
    bilinear_cells: int = 2,
    progress: Callable[[int, int], None] | None = None,
) -> np.ndarray:
    """Downward attraction (mGal) of all topographic masses within ``outer_radius``.

    The masses are the DEM cells: columns of ``density`` between height 0 and
    the cell height, lowered by ``s**2 / (2 * earth_radius)``; fine cells where
    the fine grid exists, regional cells (whose footprint must be tiled
    exactly by the fine grid) beyond it. Quadrature as in the module
    docstring.

    Parameters
    ----------
    easting, northing : array_like
        Station coordinates in the grids' projected CRS, metres.
    station_height : array_like
        Station heights above the reference surface (ellipsoid), metres.
    fine, regional : HeightGrid
        Fine DEM and optional regional DEM (same CRS, heights in metres).
    density : float
        Density of the topography, kg/m^3.

    Returns
    -------
    numpy.ndarray
        Downward attraction in mGal, one value per station.
    """
    xs = np.atleast_1d(np.asarray(easting, dtype=float))
    ys = np.atleast_1d(np.asarray(northing, dtype=float))
    hs = np.atleast_1d(np.asarray(station_height, dtype=float))
    xs, ys, hs = np.broadcast_arrays(xs, ys, hs)
    if regional is not None:
        _check_alignment(fine, regional)
    fine = HeightGrid(fine.west, fine.north, fine.cell_size, np.asarray(fine.heights, dtype=float))
    if regional is not None:
        regional = HeightGrid(
            regional.west, regional.north, regional.cell_size, np.asarray(regional.heights, dtype=float)
        )
    out = np.empty(xs.shape)
    for k in range(xs.size):
        g = _fine_part(
            xs.flat[k], ys.flat[k], hs.flat[k], fine, density, outer_radius, near_radius, earth_radius, bilinear_cells
        )
        if regional is not None:
            g += _regional_part(
                xs.flat[k], ys.flat[k], hs.flat[k], regional, fine, density, outer_radius,
                regional_prism_radius, earth_radius,
            )
        out.flat[k] = g
        if progress is not None:
            progress(k + 1, xs.size)
    return out


# --- bodies, interpolation, the reading --------------------------------------


def body_attraction(
    easting: npt.ArrayLike, northing: npt.ArrayLike, upward: npt.ArrayLike, prisms: PrismSet, chunk: int = 200_000
) -> np.ndarray:
    """Downward attraction (mGal) of a set of density-contrast prisms at each station.

    Exact prisms (Nagy 1966) without curvature lowering: the bodies lie
    within a few km of the stations, where the sphere's drop is under 2 m.
    """
    xs = np.atleast_1d(np.asarray(easting, dtype=float)).ravel()
    ys = np.atleast_1d(np.asarray(northing, dtype=float)).ravel()
    zs = np.atleast_1d(np.asarray(upward, dtype=float)).ravel()
    xs, ys, zs = np.broadcast_arrays(xs, ys, zs)
    out = np.zeros(xs.size)
    step = max(1, chunk // max(1, prisms.size))
    for start in range(0, xs.size, step):
        sl = slice(start, start + step)
        out[sl] = np.sum(
            prism_gravity(
                xs[sl, None], ys[sl, None], zs[sl, None],
                prisms.west[None, :], prisms.east[None, :], prisms.south[None, :], prisms.north[None, :],
                prisms.bottom[None, :], prisms.top[None, :], prisms.density[None, :],
            ),
            axis=1,
        )
    return out


def bilinear_height(
    grid: HeightGrid, easting: npt.ArrayLike, northing: npt.ArrayLike, clamp: bool = False
) -> np.ndarray:
    """Bilinear interpolation between cell centres (m), by the plugin's own sampler.

    The sampler and its NoData/edge rule are those of
    ``algorithms/terrain/_sampling.py`` (the outer half cell takes the edge
    values); outside the raster the result is NaN, or with ``clamp`` the value
    at the nearest point of the raster.
    """
    x = np.asarray(easting, dtype=float)
    y = np.asarray(northing, dtype=float)
    if clamp:
        x = np.clip(x, grid.west, grid.east)
        y = np.clip(y, grid.south, grid.north)
    heights = np.asarray(grid.heights, dtype=float)
    raster = ElevationGrid(grid.west, grid.north, grid.cell_size, grid.cell_size, grid.n_rows, grid.n_cols,
                           lambda r0, c0, nr, nc: heights[r0 : r0 + nr, c0 : c0 + nc])
    return sample_bilinear(raster, x, y)


def observed_gravity(
    latitude_deg: npt.ArrayLike,
    station_height: npt.ArrayLike,
    terrain_mgal: npt.ArrayLike,
    body_mgal: npt.ArrayLike,
    reading_noise_mgal: npt.ArrayLike = 0.0,
) -> np.ndarray:
    """Synthetic observed gravity (mGal).

    ``g_obs = gamma_GRS80(phi, h) - g_atm(h) + terrain + bodies + noise``:
    normal gravity already contains the atmosphere's mass, whose part above
    the station does not pull on it (docs/reduction.md, section 4).
    """
    h = np.asarray(station_height, dtype=float)
    return (
        normal_gravity_at_height(latitude_deg, h, ellipsoid="grs80")
        - atmospheric_correction(h)
        + np.asarray(terrain_mgal, dtype=float)
        + np.asarray(body_mgal, dtype=float)
        + np.asarray(reading_noise_mgal, dtype=float)
    )
