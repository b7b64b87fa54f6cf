# SPDX-License-Identifier: GPL-2.0-or-later
"""Rugged synthetic scenario for the terrain-correction benchmark.

A seeded fractal-and-ridge landscape of about 3 km relief, as two nested
rasters in a projected CRS (UTM-like coordinates, metres):

* fine DEM, 30 m cells, 1350 x 1350 (40.5 x 40.5 km);
* regional DEM, 750 m cells, 540 x 540 (405 x 405 km), the fine footprint
  exactly in its middle (243 regional cells on each side). Inside that
  footprint every regional cell equals the mean of the 25 x 25 fine cells it
  covers, so both rasters describe the same terrain where they overlap.

Stations lie on the terrain surface (height = the DEM surface interpolated
bilinearly between cell centres) at seeded random positions over the central
20 x 20 km, so every station has at least 10 km of fine DEM around it and at
least 192 km of regional DEM.

Only numpy and scipy are needed: the same scenario is rebuilt, bit for bit,
in the engine's interpreter and in the peer's venv.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
from scipy import ndimage

#: Seed of the landscape; stations use their own stream (see ``stations``).
SEED = 20261201

FINE_CELL = 30.0
FINE_N = 1350
REGIONAL_CELL = 750.0
REGIONAL_N = 540
#: Fine cells per regional cell along one axis (750 / 30).
RATIO = 25
#: Regional cells between the regional west (north) edge and the fine one.
OFFSET = (REGIONAL_N - FINE_N // RATIO) // 2

#: West and north edges of the fine DEM: large UTM-like numbers on purpose, so
#: that an engine that loses digits on absolute coordinates shows it.
FINE_WEST = 480_000.0
FINE_NORTH = 4_120_000.0
REGIONAL_WEST = FINE_WEST - OFFSET * REGIONAL_CELL
REGIONAL_NORTH = FINE_NORTH + OFFSET * REGIONAL_CELL

#: Stations fall in this central square (half side, metres).
STATION_HALF_SIDE = 10_000.0


@dataclass(frozen=True)
class Scenario:
    """The two rasters and their geometry (row 0 is the northern row)."""

    fine: np.ndarray
    regional: np.ndarray
    fine_west: float = FINE_WEST
    fine_north: float = FINE_NORTH
    fine_cell: float = FINE_CELL
    regional_west: float = REGIONAL_WEST
    regional_north: float = REGIONAL_NORTH
    regional_cell: float = REGIONAL_CELL

    @property
    def centre(self) -> tuple[float, float]:
        """Centre (easting, northing; m) of the fine DEM."""
        half = 0.5 * FINE_N * FINE_CELL
        return FINE_WEST + half, FINE_NORTH - half

    def fine_surface(self, x: np.ndarray, y: np.ndarray) -> np.ndarray:
        """Bilinear DEM surface through the fine cell centres, in metres."""
        col = (np.asarray(x, float) - self.fine_west) / self.fine_cell - 0.5
        row = (self.fine_north - np.asarray(y, float)) / self.fine_cell - 0.5
        return ndimage.map_coordinates(self.fine, [row, col], order=1, mode="nearest")

    def stations(self, n: int, seed: int = 7) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
        """``n`` stations on the surface: easting, northing, height (m).

        The first ``k`` of ``stations(n)`` are ``stations(k)`` for any k <= n,
        so the accuracy sample is a subset of the timed set.
        """
        rng = np.random.default_rng(seed)
        cx, cy = self.centre
        u = rng.uniform(-STATION_HALF_SIDE, STATION_HALF_SIDE, size=(n, 2))
        x = cx + u[:, 0]
        y = cy + u[:, 1]
        return x, y, self.fine_surface(x, y)

    def describe(self) -> str:
        """One-paragraph description of the scenario (sizes, height range, slopes) for the printout."""
        f = self.fine
        g = np.gradient(f, self.fine_cell)
        slope = np.degrees(np.arctan(np.hypot(g[0], g[1])))
        return (
            f"fine DEM {FINE_N} x {FINE_N} cells of {FINE_CELL:g} m "
            f"({FINE_N * FINE_CELL / 1000:g} km square), heights {f.min():.0f}-{f.max():.0f} m "
            f"(relief {f.max() - f.min():.0f} m), slope mean {slope.mean():.1f} deg, "
            f"95th pct {np.percentile(slope, 95):.1f} deg, max {slope.max():.1f} deg\n"
            f"regional DEM {REGIONAL_N} x {REGIONAL_N} cells of {REGIONAL_CELL:g} m "
            f"({REGIONAL_N * REGIONAL_CELL / 1000:g} km square), heights "
            f"{self.regional.min():.0f}-{self.regional.max():.0f} m; inside the fine footprint "
            f"each regional cell is the mean of its {RATIO} x {RATIO} fine cells"
        )


def _spectral_field(n: int, cell: float, rng: np.random.Generator, beta: float,
                    k_min: float = 0.0, k_max: float = np.inf) -> np.ndarray:
    """Gaussian random field with power spectrum k^-beta in a wavenumber band.

    Returned with zero mean and unit standard deviation; callers scale it.
    """
    kx = np.fft.fftfreq(n, d=cell)
    ky = np.fft.rfftfreq(n, d=cell)
    k = np.hypot(kx[:, None], ky[None, :])
    amp = np.zeros_like(k)
    band = (k > 0) & (k >= k_min) & (k <= k_max)
    amp[band] = k[band] ** (-beta / 2.0)
    phase = rng.normal(size=k.shape) + 1j * rng.normal(size=k.shape)
    field = np.fft.irfft2(amp * phase, s=(n, n))
    field -= field.mean()
    return field / field.std()


def _ridged(field: np.ndarray) -> np.ndarray:
    """Sharp crests where the field crosses zero (1 - |f|, squared)."""
    return (1.0 - np.clip(np.abs(field), 0.0, 1.0)) ** 2


def build(seed: int = SEED) -> Scenario:
    """Build the scenario (about a second; deterministic for a seed)."""
    rng = np.random.default_rng(seed)
    half_reg = 0.5 * REGIONAL_N * REGIONAL_CELL
    # Regional: a broad massif centred on the survey (so distant terrain is
    # lower and curvature matters), fractal roughness and ridge lines.
    rc = (np.arange(REGIONAL_N) + 0.5) * REGIONAL_CELL - half_reg
    rr = np.hypot(rc[None, :], rc[:, None])
    massif = 1800.0 * np.exp(-0.5 * (rr / 45_000.0) ** 2)
    fractal = _spectral_field(REGIONAL_N, REGIONAL_CELL, rng, beta=3.6)
    ridges = _ridged(_spectral_field(REGIONAL_N, REGIONAL_CELL, rng, beta=3.2,
                                     k_max=1.0 / 6_000.0))
    envelope = 0.35 + 0.65 * np.exp(-0.5 * (rr / 60_000.0) ** 2)
    regional_raw = 300.0 + massif + envelope * (600.0 * fractal + 2900.0 * ridges)

    # Fine: bicubic interpolation of the regional surface plus short-wavelength
    # detail the 750 m grid cannot hold, with its own ridges.
    centres = FINE_WEST + (np.arange(FINE_N) + 0.5) * FINE_CELL
    col = (centres - REGIONAL_WEST) / REGIONAL_CELL - 0.5
    north = FINE_NORTH - (np.arange(FINE_N) + 0.5) * FINE_CELL
    row = (REGIONAL_NORTH - north) / REGIONAL_CELL - 0.5
    rows, cols = np.meshgrid(row, col, indexing="ij")
    base = ndimage.map_coordinates(regional_raw, [rows, cols], order=3, mode="nearest")
    detail = _spectral_field(FINE_N, FINE_CELL, rng, beta=4.0, k_min=1.0 / 3_000.0)
    fine_ridges = _ridged(_spectral_field(FINE_N, FINE_CELL, rng, beta=4.0,
                                          k_min=1.0 / 4_000.0, k_max=1.0 / 600.0))
    fine = base + 40.0 * detail + 150.0 * (fine_ridges - fine_ridges.mean())
    fine = np.maximum(fine, 5.0)

    regional = np.maximum(regional_raw, 5.0)
    means = fine.reshape(FINE_N // RATIO, RATIO, FINE_N // RATIO, RATIO).mean(axis=(1, 3))
    n_blk = FINE_N // RATIO
    regional[OFFSET:OFFSET + n_blk, OFFSET:OFFSET + n_blk] = means
    return Scenario(fine=np.ascontiguousarray(fine), regional=np.ascontiguousarray(regional))


if __name__ == "__main__":
    print(build().describe())
