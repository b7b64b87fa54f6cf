# SPDX-License-Identifier: GPL-2.0-or-later
"""The peer: nested prisms with a general-purpose forward-modelling library.

What a capable user would script with choclo / harmonica (Fatiando a Terra,
numba-based; versions in ``requirements-peer.txt``) to get terrain
corrections to 166.735 km from the two rasters of the scenario:

* inner zone: every 30 m fine cell as an exact prism between the station
  height and the cell height, out to ``INNER_RADIUS`` (2 km);
* middle zone: 150 m block means of the fine DEM (5 x 5 cells) to
  ``MIDDLE_RADIUS`` (10 km);
* outer zone: the 750 m regional cells to ``OUTER_RADIUS`` (inside the fine
  footprint they are the 25 x 25 block means of the fine DEM).

Zones nest without gap or overlap: a regional cell whose centre is within
10 km is replaced by its 25 blocks, a block whose centre is within 2 km by its
25 fine cells. Curvature: every prism is lowered by s^2 / (2R), s its centre's
distance from the station. Each prism goes through choclo's exact prism
kernel (``choclo.prism.gravity_u``, the same kernel that
``harmonica.prism_gravity`` loops over), in a numba loop parallel over the
stations, so both cores work. ``harmonica_one_station`` builds the same prism
set as arrays and calls ``harmonica.prism_gravity``, to show the fast loop is
that computation.

Run only in ``bench/.venv-peer`` (``bench/setup_peer.sh``); the plugin never
imports this module.
"""

from __future__ import annotations

import numba
import numpy as np
from choclo.prism import gravity_u

from .terrain_scenario import FINE_N, OFFSET, RATIO, Scenario

INNER_RADIUS = 2_000.0
MIDDLE_RADIUS = 10_000.0
OUTER_RADIUS = 166_735.0
#: Block size of the middle zone, in fine cells (5 x 30 m = 150 m).
BLOCK = 5
#: MEAN_EARTH_RADIUS of relief_gravity.algorithms.constants, repeated so the
#: peer does not lean on the product.
EARTH_RADIUS = 6_371_008.7714
SI_TO_MGAL = 1.0e5


@numba.njit(inline="always")
def _column(dx, dy, half, dh, density):
    """TC (SI) of one flat-topped column; centre offset dx, dy from the station."""
    if dh == 0.0:
        return 0.0
    drop = (dx * dx + dy * dy) / (2.0 * EARTH_RADIUS)
    bottom = min(dh, 0.0) - drop
    top = max(dh, 0.0) - drop
    gu = gravity_u(0.0, 0.0, 0.0, dx - half, dx + half, dy - half, dy + half, bottom, top, density)
    # Excess mass above pulls up (gu > 0) and raises TC; missing mass below
    # would have pulled down (gu < 0 for it), so its absence also raises TC.
    return gu if dh > 0.0 else -gu


@numba.njit(parallel=True)
def _nested_prisms(xs, ys, hs, fine, blocks, regional, fine_west, fine_north, fine_cell,
                   reg_west, reg_north, reg_cell, offset, ratio, block, density):
    n = xs.size
    out = np.zeros(n)
    n_reg = regional.shape[0]
    n_blk_fine = fine.shape[0] // ratio  # regional cells across the fine footprint
    bcell = block * fine_cell
    per_reg = ratio // block  # blocks across one regional cell
    for i in numba.prange(n):
        x, y, h = xs[i], ys[i], hs[i]
        c0 = max(0, int((x - OUTER_RADIUS - reg_west) / reg_cell) - 1)
        c1 = min(n_reg, int((x + OUTER_RADIUS - reg_west) / reg_cell) + 2)
        r0 = max(0, int((reg_north - (y + OUTER_RADIUS)) / reg_cell) - 1)
        r1 = min(n_reg, int((reg_north - (y - OUTER_RADIUS)) / reg_cell) + 2)
        total = 0.0
        for r in range(r0, r1):
            cy = reg_north - (r + 0.5) * reg_cell - y
            for c in range(c0, c1):
                cx = reg_west + (c + 0.5) * reg_cell - x
                s = np.sqrt(cx * cx + cy * cy)
                if s > OUTER_RADIUS:
                    continue
                fr = r - offset
                fc = c - offset
                covered = 0 <= fr < n_blk_fine and 0 <= fc < n_blk_fine
                if s > MIDDLE_RADIUS or not covered:
                    total += _column(cx, cy, 0.5 * reg_cell, regional[r, c] - h, density)
                    continue
                for br in range(fr * per_reg, (fr + 1) * per_reg):
                    by = fine_north - (br + 0.5) * bcell - y
                    for bc in range(fc * per_reg, (fc + 1) * per_reg):
                        bx = fine_west + (bc + 0.5) * bcell - x
                        if bx * bx + by * by > INNER_RADIUS * INNER_RADIUS:
                            total += _column(bx, by, 0.5 * bcell, blocks[br, bc] - h, density)
                            continue
                        for rr in range(br * block, (br + 1) * block):
                            fy = fine_north - (rr + 0.5) * fine_cell - y
                            for cc in range(bc * block, (bc + 1) * block):
                                fx = fine_west + (cc + 0.5) * fine_cell - x
                                total += _column(fx, fy, 0.5 * fine_cell, fine[rr, cc] - h, density)
        out[i] = total * SI_TO_MGAL
    return out


class Peer:
    """Nested-prism terrain correction over one scenario."""

    def __init__(self, scenario: Scenario, density: float = 2670.0) -> None:
        self.scn = scenario
        self.density = density
        f = scenario.fine
        nb = FINE_N // BLOCK
        self.blocks = np.ascontiguousarray(f.reshape(nb, BLOCK, nb, BLOCK).mean(axis=(1, 3)))

    def compute(self, x, y, h) -> np.ndarray:
        """tc_total (mGal) for stations ``x, y`` (m, fine CRS), heights ``h`` (m)."""
        s = self.scn
        return _nested_prisms(
            np.ascontiguousarray(x, dtype=float), np.ascontiguousarray(y, dtype=float),
            np.ascontiguousarray(h, dtype=float), s.fine, self.blocks, s.regional,
            s.fine_west, s.fine_north, s.fine_cell, s.regional_west, s.regional_north,
            s.regional_cell, OFFSET, RATIO, BLOCK, self.density)

    def prisms_of_station(self, x: float, y: float, h: float):
        """The same nested prism set as arrays: (prisms (m, 6), signs (m,)).

        Prism rows are west, east, south, north, bottom, top in a frame centred
        on the station (station at 0, 0, 0), already lowered for curvature.
        """
        s = self.scn
        out = []
        nreg = s.regional.shape[0]
        jj = np.arange(nreg)
        rcx = s.regional_west + (jj + 0.5) * s.regional_cell - x
        rcy = s.regional_north - (jj + 0.5) * s.regional_cell - y
        gx, gy = np.meshgrid(rcx, rcy)
        sr = np.hypot(gx, gy)
        n_blk_fine = FINE_N // RATIO
        cov = np.zeros(s.regional.shape, bool)
        cov[OFFSET:OFFSET + n_blk_fine, OFFSET:OFFSET + n_blk_fine] = True
        far = (sr <= OUTER_RADIUS) & ((sr > MIDDLE_RADIUS) | ~cov)
        out.append((gx[far], gy[far], 0.5 * s.regional_cell, s.regional[far] - h))
        split = (sr <= MIDDLE_RADIUS) & cov
        nb = FINE_N // BLOCK
        per = RATIO // BLOCK
        bsz = BLOCK * s.fine_cell
        kb = np.arange(nb)
        bgx, bgy = np.meshgrid(s.fine_west + (kb + 0.5) * bsz - x, s.fine_north - (kb + 0.5) * bsz - y)
        bsplit = np.repeat(np.repeat(split[OFFSET:OFFSET + n_blk_fine, OFFSET:OFFSET + n_blk_fine], per, 0), per, 1)
        bin_ = np.hypot(bgx, bgy) <= INNER_RADIUS
        mid = bsplit & ~bin_
        out.append((bgx[mid], bgy[mid], 0.5 * bsz, self.blocks[mid] - h))
        fin = np.repeat(np.repeat(bsplit & bin_, BLOCK, 0), BLOCK, 1)
        kf = np.arange(FINE_N)
        fgx, fgy = np.meshgrid(s.fine_west + (kf + 0.5) * s.fine_cell - x,
                               s.fine_north - (kf + 0.5) * s.fine_cell - y)
        out.append((fgx[fin], fgy[fin], 0.5 * s.fine_cell, s.fine[fin] - h))
        rows = []
        signs = []
        for cx, cy, half, dh in out:
            drop = (cx * cx + cy * cy) / (2.0 * EARTH_RADIUS)
            keep = dh != 0
            cx, cy, dh, drop = cx[keep], cy[keep], dh[keep], drop[keep]
            rows.append(np.column_stack([cx - half, cx + half, cy - half, cy + half,
                                         np.minimum(dh, 0) - drop, np.maximum(dh, 0) - drop]))
            signs.append(np.sign(dh))
        return np.concatenate(rows), np.concatenate(signs)

    def harmonica_one_station(self, x: float, y: float, h: float) -> tuple[float, int]:
        """tc_total (mGal) of one station via ``harmonica.prism_gravity``, prism count."""
        import harmonica

        prisms, signs = self.prisms_of_station(x, y, h)
        # harmonica's g_z is downward and already in mGal; excess mass counts
        # with the sign reversed, as in ``_column``.
        gz = harmonica.prism_gravity(([0.0], [0.0], [0.0]), prisms, -signs * self.density,
                                     field="g_z", parallel=False)
        return float(gz[0]), int(prisms.shape[0])
