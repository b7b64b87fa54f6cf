# SPDX-License-Identifier: GPL-2.0-or-later
"""Per-station uncertainty budget of the terrain correction and the anomaly.

Each component is one standard deviation in mGal, from one documented
source; components are taken as independent and added in quadrature:

* ``sigma_g`` — observed gravity (the readings step's ``g_sigma``, or a
  number);
* ``sigma_h`` — station height error, propagated coherently through every
  height-dependent term at once (height and atmospheric corrections, slab,
  curvature and the near terrain correction), by Gauss–Hermite quadrature;
* ``sigma_dem`` — independent random errors of the DEM cells near the
  station;
* ``sigma_inn`` — the innermost-ring model: the sloping-plane square's
  correction, i.e. its difference from a flat square through the station;
* ``sigma_mis`` — the station–DEM mismatch: how much the correction would
  change if the station stood on the DEM surface;
* ``sigma_trn`` — the truncation estimate where the rasters stop short of
  the outer radius (the estimate is taken as one sigma);
* ``sigma_rho`` — the reduction density's uncertainty (slab, curvature and
  terrain correction are all proportional to density).

``tc_sigma`` combines the terrain correction's own components (DEM,
innermost, mismatch, truncation, its share of the height error and of the
density); ``cba_sigma`` combines every component. See ``docs/uncertainty.md``.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from .._reduction import reduce_gravity
from ._near_terrain import NearTerrainSpread
from ._quadrature import normal_nodes, weighted_sum

#: Component field names, in report order (each at most 10 characters).
COMPONENTS = ("sigma_g", "sigma_h", "sigma_dem", "sigma_inn", "sigma_mis", "sigma_trn", "sigma_rho")


@dataclass(frozen=True)
class UncertaintyBudget:
    """Per-station components and totals (mGal, one sigma).

    Attributes
    ----------
    components : dict of str to numpy.ndarray
        Keyed by :data:`COMPONENTS`.
    tc_sigma, cba_sigma : numpy.ndarray
        Totals for the terrain correction and the complete Bouguer anomaly.
    """

    components: dict
    tc_sigma: np.ndarray
    cba_sigma: np.ndarray


def quadrature_sum(*parts: np.ndarray) -> np.ndarray:
    """Root of the sum of squares; a NaN part is left out (treated as unknown, not zero).

    Returns NaN only where every part is NaN.

    Examples
    --------
    >>> quadrature_sum(np.array([3.0, np.nan]), np.array([4.0, np.nan]))
    array([ 5., nan])
    """
    stack = np.stack([np.asarray(p, dtype=float) for p in np.broadcast_arrays(*parts)])
    known = np.isfinite(stack)
    total = np.sqrt(np.sum(np.where(known, stack, 0.0) ** 2, axis=0))
    return np.where(known.any(axis=0), total, np.nan)


def height_component(
    latitude: np.ndarray,
    height: np.ndarray,
    height_sigma: float | np.ndarray,
    density: float | np.ndarray,
    terrain_nodes: np.ndarray | None = None,
    nodes: int | None = None,
    **reduction_options,
) -> np.ndarray:
    """Spread of the complete Bouguer anomaly from a station height error (mGal).

    The height enters the height and atmospheric corrections, the slab and
    the curvature term (through :func:`reduce_gravity` with the run's own
    options) and the near terrain correction (``terrain_nodes``, from
    :func:`near_terrain_spread`, evaluated at the same quadrature nodes).

    Parameters
    ----------
    latitude, height : numpy.ndarray
        Degrees and metres, as given to the reduction.
    height_sigma : float or numpy.ndarray
        One-sigma height error (m).
    density : float or numpy.ndarray
        Reduction density (kg/m^3).
    terrain_nodes : numpy.ndarray, optional
        Change of the terrain correction at the nodes, shape (nodes, stations).
    nodes : int, optional
        Number of nodes (taken from ``terrain_nodes`` when given, else 7).
    **reduction_options
        Passed to :func:`reduce_gravity` (formulas, atmospheric, curvature).

    Returns
    -------
    numpy.ndarray

    Examples
    --------
    Far from terrain, the spread is the Bouguer gradient times the error:
    (0.3086 - 0.1119) mGal/m for 2670 kg/m^3.

    >>> s = height_component(np.array([45.0]), np.array([500.0]), 1.0, 2670.0, curvature=False,
    ...                      atmospheric=False, height_formula="first_order")
    >>> round(float(s[0]), 4)
    0.1966
    """
    latitude = np.asarray(latitude, dtype=float)
    height = np.asarray(height, dtype=float)
    if nodes is None:
        nodes = terrain_nodes.shape[0] if terrain_nodes is not None else 7
    xi, wi = normal_nodes(nodes)
    sigma = np.broadcast_to(np.asarray(height_sigma, dtype=float), height.shape)
    zero = np.zeros_like(height)
    base = reduce_gravity(zero, latitude, height, density, **reduction_options)["sba"]
    change = np.stack(
        [reduce_gravity(zero, latitude, height + sigma * v, density, **reduction_options)["sba"] - base for v in xi]
    )
    if terrain_nodes is not None:
        change = change + np.where(np.isfinite(terrain_nodes), terrain_nodes, 0.0)
    # Element by element, so a station's value does not depend on the others computed with it.
    mean = weighted_sum(wi, change)
    return np.sqrt(weighted_sum(wi, (change - mean) ** 2))


def uncertainty_budget(
    *,
    gravity_sigma: float | np.ndarray,
    height_sigma_cba: np.ndarray,
    height_sigma_tc: np.ndarray,
    near: NearTerrainSpread | None,
    truncation: np.ndarray | None,
    density: float | np.ndarray,
    density_sigma: float | np.ndarray | None,
    slab: np.ndarray,
    curvature: np.ndarray,
    tc_total: np.ndarray,
) -> UncertaintyBudget:
    """Combine the components of one run.

    Parameters
    ----------
    gravity_sigma : float or numpy.ndarray
        Observed gravity's one sigma (mGal).
    height_sigma_cba, height_sigma_tc : numpy.ndarray
        Height-error spreads of the anomaly and of the terrain correction
        alone (mGal), from :func:`height_component`.
    near : NearTerrainSpread or None
        Near terrain spreads; None when no terrain correction was computed.
    truncation : numpy.ndarray or None
        Truncation estimate (mGal).
    density, density_sigma : float or numpy.ndarray
        Reduction density and its one sigma (kg/m^3); None for no density term.
    slab, curvature, tc_total : numpy.ndarray
        The run's slab, curvature and terrain corrections (mGal).

    Returns
    -------
    UncertaintyBudget

    Examples
    --------
    >>> b = uncertainty_budget(gravity_sigma=0.03, height_sigma_cba=np.array([0.04]),
    ...     height_sigma_tc=np.array([0.0]), near=None, truncation=None, density=2670.0,
    ...     density_sigma=None, slab=np.array([55.0]), curvature=np.array([1.0]), tc_total=np.array([2.0]))
    >>> round(float(b.cba_sigma[0]), 6)
    0.05
    """
    shape = np.shape(tc_total)

    def full(value) -> np.ndarray:
        return np.array(np.broadcast_to(np.asarray(value, dtype=float), shape))

    nan = np.full(shape, np.nan)
    rho = full(density)
    if density_sigma is None:
        sigma_rho = nan
        tc_rho = nan
    else:
        s_rho = full(density_sigma)
        sigma_rho = s_rho * np.abs(full(slab) + full(curvature) - np.nan_to_num(full(tc_total))) / rho
        tc_rho = s_rho * np.abs(full(tc_total)) / rho
    parts = {
        "sigma_g": full(gravity_sigma),
        "sigma_h": full(height_sigma_cba),
        "sigma_dem": full(near.dem) if near is not None else nan,
        "sigma_inn": full(near.innermost) if near is not None else nan,
        "sigma_mis": full(near.mismatch) if near is not None else nan,
        "sigma_trn": np.abs(full(truncation)) if truncation is not None else nan,
        "sigma_rho": sigma_rho,
    }
    has_tc = np.isfinite(full(tc_total))
    tc_sigma = quadrature_sum(
        parts["sigma_dem"], parts["sigma_inn"], parts["sigma_mis"], parts["sigma_trn"], full(height_sigma_tc), tc_rho
    )
    tc_sigma = np.where(has_tc, tc_sigma, np.nan)
    cba_sigma = np.where(has_tc, quadrature_sum(*parts.values()), np.nan)
    return UncertaintyBudget(components=parts, tc_sigma=tc_sigma, cba_sigma=cba_sigma)


def terrain_height_spread(terrain_nodes: np.ndarray) -> np.ndarray:
    """Spread (mGal) of the terrain correction alone at the height-error nodes.

    Examples
    --------
    >>> round(float(terrain_height_spread(np.zeros((7, 1)))[0]), 3)
    0.0
    """
    _xi, wi = normal_nodes(terrain_nodes.shape[0])
    values = np.where(np.isfinite(terrain_nodes), terrain_nodes, 0.0)
    mean = weighted_sum(wi, values)
    spread = np.sqrt(weighted_sum(wi, (values - mean) ** 2))
    return np.where(np.all(np.isfinite(terrain_nodes), axis=0), spread, np.nan)
