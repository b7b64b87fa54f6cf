# SPDX-License-Identifier: GPL-2.0-or-later
"""The Bouguer and terrain term per unit density (mGal per kg/m^3)."""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

from .._corrections import bouguer_slab_correction, curvature_correction
from ..constants import GRAVITATIONAL_CONSTANT


def unit_bouguer_term(
    height_m: npt.ArrayLike,
    terrain_per_unit_density: npt.ArrayLike,
    curvature: bool = True,
    *,
    gravitational_constant: float = GRAVITATIONAL_CONSTANT,
) -> np.ndarray:
    """Slab + curvature - terrain correction at a density of 1 kg/m^3.

    Parameters
    ----------
    height_m : array_like
        Station heights in m (the reduction's slab thickness).
    terrain_per_unit_density : array_like
        Terrain correction computed at 1 kg/m^3 (mGal per kg/m^3, positive
        for relief), or 0 where none is wanted.
    curvature : bool
        Include the Bullard B curvature term (the reduction's spherical
        cap), as the reduction does by default.
    gravitational_constant : float, keyword only

    Returns
    -------
    numpy.ndarray
        :math:`B = 2\\pi G h + B_{curv}(h) - TC(h)` at unit density, so that
        the complete Bouguer anomaly at density :math:`\\rho` is
        :math:`\\Delta g_{FA} - \\rho B`.

    Notes
    -----
    Every term of the reduction that depends on density is linear in it
    (LaFehr 1991; Hinze et al. 2005), which is what both Parasnis's and
    Nettleton's methods rely on.

    Examples
    --------
    >>> print(f"{float(unit_bouguer_term(1000.0, 0.0, curvature=False)) * 2670:.5f}")
    111.96876
    """
    h = np.asarray(height_m, dtype=float)
    term = bouguer_slab_correction(h, 1.0, gravitational_constant)
    if curvature:
        term = term + curvature_correction(h, 1.0, gravitational_constant)
    return term - np.asarray(terrain_per_unit_density, dtype=float)
