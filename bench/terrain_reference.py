# SPDX-License-Identifier: GPL-2.0-or-later
"""Exact reference terrain correction for the benchmark: slow, simple, plain.

Terrain model: the DEMs as they are, every cell a flat-topped column at its
cell value (the fine DEM where it exists, the regional DEM outside the fine
footprint). For a station at (x, y, h) the terrain correction is

    TC = - sum over columns of  sgn(h_c - h) * g_z(prism between h and h_c)

with ``g_z`` the exact downward attraction of a right rectangular prism
(``relief_gravity.algorithms.terrain.prism_gravity``, Nagy 1966 / Plouff 1976):
excess mass above the station pulls up and missing mass below pulls less
down, so both give TC > 0 on a flat Earth. Earth curvature: every prism (or
sub-prism) is lowered by s^2 / (2R), s its centre's horizontal distance from
the station and R = ``MEAN_EARTH_RADIUS`` (docs/terrain.md section 6), so distant
terrain can give negative contributions.

No cell is ever averaged or approximated:

* every fine cell of the whole fine DEM (40.5 km square, 1.8 million cells) is
  an exact prism at full resolution;
* every regional cell outside the fine footprint is cut into ``k x k``
  sub-prisms, each lowered by its own drop and kept when its centre is within
  ``outer_radius`` -- the quadrature of the curved surface and of the circular
  edge at 166.735 km; ``convergence`` shows that halving the sub-prism size
  (k = 2 -> 4) changes nothing that matters;
* fine cells cut by the ``exclude_radius`` circle (100 m) are split into
  ``clip_sub x clip_sub`` sub-prisms and shared between the two parts by
  sub-prism centre, so the part beyond 100 m is exact to the same standard.

The result keeps the part beyond ``exclude_radius`` (what the accuracy target
is about) and the part within it separately.

``station_square_models`` and ``innermost_models`` compare, for the one-cell
square centred on the station and for the 100 m disc, flat-topped cells with
the bilinear surface through the cell centres (finely cut into sub-prisms):
the spread an innermost-ring model has to live with.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from relief_gravity.algorithms.constants import MEAN_EARTH_RADIUS
from relief_gravity.algorithms.terrain import prism_gravity

from .terrain_scenario import FINE_N, OFFSET, RATIO, Scenario

#: Prisms per numpy call: large enough to amortise the calls, small enough
#: that the ~40 temporaries of the kernel stay a few tens of MB.
CHUNK = 200_000


@dataclass
class ReferenceResult:
    """Terrain correction parts per station, mGal."""

    beyond: np.ndarray  # r >= exclude_radius, whole model
    within: np.ndarray  # r < exclude_radius, flat-topped cells
    fine_beyond: np.ndarray  # fine-DEM part of ``beyond``
    regional: np.ndarray  # regional-DEM part (outside the fine footprint)
    outer: np.ndarray  # cells whose centre is beyond inner_radius (the engine's tc_outer)

    @property
    def total(self) -> np.ndarray:
        """Whole terrain correction per station, mGal (``beyond + within``)."""
        return self.beyond + self.within


def _tc_of_columns(dx, dy, half_x, half_y, dh, density):
    """TC (mGal) of flat-topped columns relative to a station at the origin.

    ``dx, dy``: column centre minus station (m); ``half_x, half_y``: half
    widths; ``dh``: column height minus station height (m). Curvature drop from
    the centre distance. Summed in chunks.
    """
    total = 0.0
    for start in range(0, dx.size, CHUNK):
        sl = slice(start, start + CHUNK)
        cx, cy, d = dx[sl], dy[sl], dh[sl]
        hx = half_x if np.ndim(half_x) == 0 else half_x[sl]
        hy = half_y if np.ndim(half_y) == 0 else half_y[sl]
        drop = (cx * cx + cy * cy) / (2.0 * MEAN_EARTH_RADIUS)
        bottom = np.minimum(d, 0.0) - drop
        top = np.maximum(d, 0.0) - drop
        gz = prism_gravity(0.0, 0.0, 0.0, cx - hx, cx + hx, cy - hy, cy + hy, bottom, top, density)
        # Excess mass (d > 0) counts with its own sign reversed, missing mass
        # (d < 0) with the sign of the attraction it no longer exerts.
        total += float(np.sum(-np.sign(d) * gz))
    return total


def _split_cells(dx, dy, half, dh, radius, sub):
    """Sub-prisms of cells cut by the circle ``radius``, by side of it.

    Returns (beyond, within) tuples ``(dx, dy, half_x, half_y, dh)``, the
    arguments of ``_tc_of_columns``.
    """
    step = 2.0 * half / sub
    offs = -half + (np.arange(sub) + 0.5) * step
    shape = (dx.size, sub, sub)
    sx = np.broadcast_to(dx[:, None, None] + offs[None, None, :], shape).ravel()
    sy = np.broadcast_to(dy[:, None, None] + offs[None, :, None], shape).ravel()
    sh = np.repeat(dh, sub * sub)
    inside = np.hypot(sx, sy) < radius
    out = ~inside
    hs = 0.5 * step
    return (sx[out], sy[out], hs, hs, sh[out]), (sx[inside], sy[inside], hs, hs, sh[inside])


class Reference:
    """Exact reference over one scenario (cell-centre tables built once)."""

    def __init__(self, scenario: Scenario, *, density: float = 2670.0,
                 exclude_radius: float = 100.0, outer_radius: float = 166_735.0,
                 inner_radius: float = 2_000.0,
                 regional_sub: int = 2, clip_sub: int = 30) -> None:
        self.scn = scenario
        self.density = density
        self.exclude_radius = exclude_radius
        self.outer_radius = outer_radius
        self.inner_radius = inner_radius
        self.regional_sub = regional_sub
        self.clip_sub = clip_sub
        s = scenario
        # Cell centres relative to the fine west/north edges keep the numbers
        # small; station offsets are subtracted per station.
        j = np.arange(FINE_N)
        self._fx = np.tile((j + 0.5) * s.fine_cell, FINE_N)
        self._fy = np.repeat(-(j + 0.5) * s.fine_cell, FINE_N)
        self._fh = s.fine.ravel()
        n_reg = s.regional.shape[0]
        jj = np.arange(n_reg)
        rx = np.tile((jj + 0.5) * s.regional_cell, n_reg) + (s.regional_west - s.fine_west)
        ry = np.repeat(-(jj + 0.5) * s.regional_cell, n_reg) + (s.regional_north - s.fine_north)
        covered = np.zeros(s.regional.shape, bool)
        n_blk = FINE_N // RATIO
        covered[OFFSET:OFFSET + n_blk, OFFSET:OFFSET + n_blk] = True
        keep = ~covered.ravel()
        self._rx, self._ry, self._rh = rx[keep], ry[keep], s.regional.ravel()[keep]

    def _one(self, x: float, y: float, h: float, regional_sub: int) -> tuple[float, ...]:
        s = self.scn
        half = 0.5 * s.fine_cell
        dx = self._fx - (x - s.fine_west)
        dy = self._fy - (y - s.fine_north)
        dh = self._fh - h
        # Nearest and farthest point of each cell from the station decide
        # whether the exclusion circle cuts it.
        near = np.hypot(np.maximum(np.abs(dx) - half, 0.0), np.maximum(np.abs(dy) - half, 0.0))
        farthest = np.hypot(np.abs(dx) + half, np.abs(dy) + half)
        whole_out = near >= self.exclude_radius
        whole_in = farthest <= self.exclude_radius
        cut = ~(whole_out | whole_in)
        rho = self.density
        # Split as the engine splits tc_inner / tc_outer: by cell centre.
        outer = whole_out & (np.hypot(dx, dy) > self.inner_radius)
        near_out = whole_out & ~outer
        fine_outer = _tc_of_columns(dx[outer], dy[outer], half, half, dh[outer], rho)
        fine_beyond = fine_outer + _tc_of_columns(dx[near_out], dy[near_out], half, half, dh[near_out], rho)
        within = _tc_of_columns(dx[whole_in], dy[whole_in], half, half, dh[whole_in], rho)
        b, w = _split_cells(dx[cut], dy[cut], half, dh[cut], self.exclude_radius, self.clip_sub)
        fine_beyond += _tc_of_columns(*b, rho)
        within += _tc_of_columns(*w, rho)

        # Regional cells outside the fine footprint, k x k sub-prisms each.
        rdx = self._rx - (x - s.fine_west)
        rdy = self._ry - (y - s.fine_north)
        rhalf = 0.5 * s.regional_cell
        near_r = np.hypot(np.maximum(np.abs(rdx) - rhalf, 0.0), np.maximum(np.abs(rdy) - rhalf, 0.0))
        cand = near_r < self.outer_radius
        k = regional_sub
        step = s.regional_cell / k
        offs = -rhalf + (np.arange(k) + 0.5) * step
        regional = 0.0
        idx = np.flatnonzero(cand)
        per = max(1, CHUNK // (k * k))
        for start in range(0, idx.size, per):
            sel = idx[start:start + per]
            shape = (sel.size, k, k)
            sx = np.broadcast_to(rdx[sel][:, None, None] + offs[None, None, :], shape).ravel()
            sy = np.broadcast_to(rdy[sel][:, None, None] + offs[None, :, None], shape).ravel()
            sh = np.repeat(self._rh[sel] - h, k * k)
            inside = np.hypot(sx, sy) <= self.outer_radius
            regional += _tc_of_columns(sx[inside], sy[inside], 0.5 * step, 0.5 * step, sh[inside], rho)
        return fine_beyond + regional, within, fine_beyond, regional, fine_outer + regional

    def compute(self, x, y, h, regional_sub: int | None = None) -> ReferenceResult:
        """Reference parts for stations ``x, y`` (fine CRS, m), heights ``h`` (m)."""
        k = self.regional_sub if regional_sub is None else regional_sub
        rows = [self._one(float(a), float(b), float(c), k) for a, b, c in zip(x, y, h, strict=True)]
        arr = np.array(rows, dtype=float).reshape(-1, 5)
        return ReferenceResult(beyond=arr[:, 0], within=arr[:, 1], fine_beyond=arr[:, 2],
                               regional=arr[:, 3], outer=arr[:, 4])

    def convergence(self, x, y, h) -> dict:
        """Change of the reference when its quadrature steps are halved (mGal).

        Regional sub-prisms k = 2 -> 4 and exclusion-circle sub-prisms
        clip_sub -> 2 clip_sub, on the given stations.
        """
        base = self.compute(x, y, h)
        fine_k = self.compute(x, y, h, regional_sub=2 * self.regional_sub)
        saved = self.clip_sub
        self.clip_sub = 2 * saved
        try:
            fine_clip = self.compute(x, y, h)
        finally:
            self.clip_sub = saved
        return {
            "regional_halving_max": float(np.max(np.abs(fine_k.beyond - base.beyond))),
            "clip_halving_max": float(np.max(np.abs(fine_clip.beyond - base.beyond))),
            "regional_part_range": (float(base.regional.min()), float(base.regional.max())),
        }


def curvature_check(distances=(10_000.0, 50_000.0, 100_000.0)) -> list[tuple[float, float]]:
    """TC contribution (mGal) of a 1 km x 1 km x 500 m column on the station's sphere at given distances.

    The station height is 0. This is the case of docs/terrain.md section 6,
    whose lowered-prism column this must reproduce (positive near, negative
    once the column's middle is below the horizon).
    """
    return [(d, _tc_of_columns(np.array([d]), np.array([0.0]), 500.0, 500.0, np.array([500.0]), 2670.0))
            for d in distances]


#: Sub-prism sizes of the bilinear model: (half side of the square around the
#: station, size), finest where the surface is closest to the station; each
#: level fills its square minus the previous one, the last one the rest.
BILINEAR_LEVELS = ((2.0, 1.0 / 16.0), (8.0, 0.25))


def _graded_subprisms(west, east, south, north, outer_size, scale=1.0, radius=None):
    """Sub-rectangles (centre x, centre y, half x, half y) filling a region.

    The region is the rectangle ``west..east, south..north`` (station at the
    origin), intersected with the disc ``radius`` (by sub-rectangle centre)
    when given. Sizes follow ``BILINEAR_LEVELS`` then ``outer_size``, all times
    ``scale``; the grids are centred on the station and clipped to the
    rectangle.
    """
    reach = max(abs(west), abs(east), abs(south), abs(north))
    levels = [(lim, size * scale) for lim, size in BILINEAR_LEVELS if lim < reach]
    levels.append((reach, outer_size * scale))
    parts = []
    inner = 0.0
    for lim, size in levels:
        n = int(np.ceil(lim / size))
        g = np.arange(-n, n) * size  # west/south edges
        gw, gs = np.meshgrid(g, g)
        ge, gn = gw + size, gs + size
        cheb = np.maximum(np.abs(gw + 0.5 * size), np.abs(gs + 0.5 * size))
        keep = (cheb >= inner) & (cheb < lim if lim < reach else True)
        w = np.maximum(gw[keep], west)
        e = np.minimum(ge[keep], east)
        so = np.maximum(gs[keep], south)
        no = np.minimum(gn[keep], north)
        ok = (e > w) & (no > so)
        w, e, so, no = w[ok], e[ok], so[ok], no[ok]
        cx, cy = 0.5 * (w + e), 0.5 * (so + no)
        if radius is not None:
            d = np.hypot(cx, cy) < radius
            w, e, so, no, cx, cy = w[d], e[d], so[d], no[d], cx[d], cy[d]
        parts.append((cx, cy, 0.5 * (e - w), 0.5 * (no - so)))
        inner = lim
    return tuple(np.concatenate([p[i] for p in parts]) for i in range(4))


def _bilinear_tc(scenario, xs, ys, hs, rect, outer_size, scale, radius, density):
    cx, cy, hx, hy = _graded_subprisms(*rect, outer_size, scale, radius)
    top = scenario.fine_surface(xs + cx, ys + cy) - hs
    return _tc_of_columns(cx, cy, hx, hy, top, density)


def _flat_pieces(scenario: Scenario, xs: float, ys: float, rect):
    """Flat-topped DEM cells clipped to ``rect`` (station-relative W, E, S, N).

    Returns centres, half sizes and cell heights of the pieces.
    """
    s = scenario
    west, east, south, north = rect
    c0 = int(np.floor((xs + west - s.fine_west) / s.fine_cell))
    c1 = int(np.floor((xs + east - s.fine_west) / s.fine_cell))
    r0 = int(np.floor((s.fine_north - (ys + north)) / s.fine_cell))
    r1 = int(np.floor((s.fine_north - (ys + south)) / s.fine_cell))
    cx, cy, hx, hy, dh = [], [], [], [], []
    for i in range(r0, r1 + 1):
        for j in range(c0, c1 + 1):
            w = max(west, s.fine_west + j * s.fine_cell - xs)
            e = min(east, s.fine_west + (j + 1) * s.fine_cell - xs)
            n = min(north, s.fine_north - i * s.fine_cell - ys)
            so = max(south, s.fine_north - (i + 1) * s.fine_cell - ys)
            if e > w and n > so:
                cx.append(0.5 * (w + e))
                cy.append(0.5 * (so + n))
                hx.append(0.5 * (e - w))
                hy.append(0.5 * (n - so))
                dh.append(s.fine[i, j])
    return np.array(cx), np.array(cy), np.array(hx), np.array(hy), np.array(dh)


def station_square_models(scenario: Scenario, x, y, h, *, density: float = 2670.0,
                          sub_size: float = 0.5) -> dict:
    """TC of the one-cell square centred on each station, two surface models, mGal.

    That square is the region the engine gives to its innermost model (a
    plane through the station). ``flat``: the DEM cells it overlaps as
    flat-topped prisms clipped to it (what the DEM says). ``bilinear``: the
    bilinear surface through the cell centres over the same square, cut into
    sub-prisms graded from 1/16 m at the station to ``sub_size``;
    ``bilinear_half`` halves every size (convergence).
    """
    s = scenario
    half = 0.5 * s.fine_cell
    rect = (-half, half, -half, half)
    out = {"flat": [], "bilinear": [], "bilinear_half": []}
    for xs, ys, hs in zip(np.asarray(x, float), np.asarray(y, float), np.asarray(h, float), strict=True):
        cx, cy, hx, hy, top = _flat_pieces(s, xs, ys, rect)
        out["flat"].append(_tc_of_columns(cx, cy, hx, hy, top - hs, density))
        out["bilinear"].append(_bilinear_tc(s, xs, ys, hs, rect, sub_size, 1.0, None, density))
        out["bilinear_half"].append(_bilinear_tc(s, xs, ys, hs, rect, sub_size, 0.5, None, density))
    return {k: np.array(v) for k, v in out.items()}


def innermost_models(scenario: Scenario, x, y, h, radius: float, *, density: float = 2670.0,
                     sub_size: float = 1.0) -> dict:
    """TC of the disc r < ``radius`` under two surface models (mGal per station).

    ``flat``: flat-topped DEM cells (exact prisms; cells cut by the circle are
    shared by 1 m sub-prism centre). ``bilinear``: the bilinear surface through
    the cell centres, cut into sub-prisms graded from 1/16 m at the station to
    ``sub_size``; ``bilinear_half`` halves every size. No curvature (below a
    millimetre of drop within a few hundred metres).
    """
    out = {"flat": [], "bilinear": [], "bilinear_half": []}
    s = scenario
    half = 0.5 * s.fine_cell
    rect = (-radius, radius, -radius, radius)
    for xs, ys, hs in zip(np.asarray(x, float), np.asarray(y, float), np.asarray(h, float), strict=True):
        # Fine cells that can touch the disc.
        c0 = int(np.floor((xs - radius - s.fine_west) / s.fine_cell)) - 1
        c1 = int(np.floor((xs + radius - s.fine_west) / s.fine_cell)) + 2
        r0 = int(np.floor((s.fine_north - (ys + radius)) / s.fine_cell)) - 1
        r1 = int(np.floor((s.fine_north - (ys - radius)) / s.fine_cell)) + 2
        cols = np.arange(c0, c1)
        rows = np.arange(r0, r1)
        cx = s.fine_west + (cols + 0.5) * s.fine_cell - xs
        cy = s.fine_north - (rows + 0.5) * s.fine_cell - ys
        dx = np.tile(cx, rows.size)
        dy = np.repeat(cy, cols.size)
        dh = s.fine[r0:r1, c0:c1].ravel() - hs
        _, inside = _split_cells(dx, dy, half, dh, radius, int(round(s.fine_cell)))
        out["flat"].append(_tc_of_columns(*inside, density))
        out["bilinear"].append(_bilinear_tc(s, xs, ys, hs, rect, sub_size, 1.0, radius, density))
        out["bilinear_half"].append(_bilinear_tc(s, xs, ys, hs, rect, sub_size, 0.5, radius, density))
    return {k: np.array(v) for k, v in out.items()}
