# SPDX-License-Identifier: GPL-2.0-or-later
"""Gravity anomalies and the whole reduction chain, in mGal.

Sign conventions (DEVELOPERS.md):

- ``faa = g_obs - normal_g + height_corr + atmos_corr``
- ``sba = faa - slab_corr - curv_corr``
- ``cba = sba + tc_total``
"""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

from ._corrections import (
    atmospheric_correction,
    bouguer_slab_correction,
    check_density,
    curvature_correction,
    height_correction,
)
from ._normal_gravity import check_latitude, normal_gravity, normal_gravity_1967, normal_gravity_at_height
from .constants import DEFAULT_REDUCTION_DENSITY, GRAVITATIONAL_CONSTANT

#: Keys of the dict returned by :func:`reduce_gravity`, in field order.
REDUCTION_FIELDS = (
    "normal_g",
    "height_corr",
    "atmos_corr",
    "slab_corr",
    "curv_corr",
    "tc_total",
    "faa",
    "sba",
    "cba",
)

_NORMAL_FORMULAS = ("grs80", "wgs84", "1967")
_HEIGHT_FORMULAS = ("second_order", "first_order")


def free_air_anomaly(
    observed: npt.ArrayLike,
    normal_g: npt.ArrayLike,
    height_corr: npt.ArrayLike,
    atmos_corr: npt.ArrayLike = 0.0,
) -> np.ndarray:
    """Free-air anomaly, in mGal.

    Parameters
    ----------
    observed : array_like
        Observed (absolute) gravity in mGal.
    normal_g : array_like
        Normal gravity in mGal (on the ellipsoid, or at the station when the
        height correction is zero).
    height_corr : array_like
        Height correction in mGal, positive above the datum.
    atmos_corr : array_like, optional
        Atmospheric correction in mGal (0 when not applied).

    Returns
    -------
    numpy.ndarray
        :math:`\\Delta g_{FA} = g_{obs} - \\gamma + \\Delta g_h + \\delta g_{atm}`.

    References
    ----------
    Hinze, W. J., et al., 2005, Geophysics 70(4), J25-J32.

    Examples
    --------
    >>> print(f"{float(free_air_anomaly(980400.0, 980619.92025, 308.47708, 0.77856)):.5f}")
    89.33539
    """
    return (
        np.asarray(observed, dtype=np.float64)
        - np.asarray(normal_g, dtype=np.float64)
        + np.asarray(height_corr, dtype=np.float64)
        + np.asarray(atmos_corr, dtype=np.float64)
    )


def simple_bouguer_anomaly(
    faa: npt.ArrayLike,
    slab_corr: npt.ArrayLike,
    curv_corr: npt.ArrayLike = 0.0,
) -> np.ndarray:
    """Simple Bouguer anomaly (slab or spherical cap, no terrain), in mGal.

    Parameters
    ----------
    faa : array_like
        Free-air anomaly in mGal.
    slab_corr : array_like
        Bouguer slab attraction in mGal.
    curv_corr : array_like, optional
        Curvature (Bullard B) correction in mGal (0 for a flat slab only).

    Returns
    -------
    numpy.ndarray
        :math:`\\Delta g_{SB} = \\Delta g_{FA} - \\delta g_B - B`.

    References
    ----------
    LaFehr, T. R., 1991, Geophysics 56(8), 1179-1184.

    Examples
    --------
    >>> print(f"{float(simple_bouguer_anomaly(89.33538, 111.96876, 1.11170)):.5f}")
    -23.74508
    """
    return (
        np.asarray(faa, dtype=np.float64)
        - np.asarray(slab_corr, dtype=np.float64)
        - np.asarray(curv_corr, dtype=np.float64)
    )


def complete_bouguer_anomaly(sba: npt.ArrayLike, tc_total: npt.ArrayLike) -> np.ndarray:
    """Complete Bouguer anomaly, in mGal.

    Parameters
    ----------
    sba : array_like
        Simple Bouguer anomaly in mGal.
    tc_total : array_like
        Total terrain correction in mGal (positive for relief, docs/terrain.md section 1).

    Returns
    -------
    numpy.ndarray
        :math:`\\Delta g_{CB} = \\Delta g_{SB} + TC`.

    References
    ----------
    LaFehr, T. R., 1991, Geophysics 56(8), 1179-1184 (Bullard A + B + C).

    Examples
    --------
    >>> print(f"{float(complete_bouguer_anomaly(-23.74507, 2.5)):.5f}")
    -21.24507
    """
    return np.asarray(sba, dtype=np.float64) + np.asarray(tc_total, dtype=np.float64)


def _choice(value: str, allowed: tuple, what: str) -> str:
    key = str(value).strip().lower()
    if key not in allowed:
        msg = f"unknown {what} {value!r}; expected one of {allowed}"
        raise ValueError(msg)
    return key


def reduce_gravity(
    observed: npt.ArrayLike,
    latitude: npt.ArrayLike,
    height: npt.ArrayLike,
    density: npt.ArrayLike = DEFAULT_REDUCTION_DENSITY,
    terrain_correction: npt.ArrayLike | None = None,
    normal_formula: str = "grs80",
    height_formula: str = "second_order",
    atmospheric: bool = True,
    curvature: bool = True,
    normal_at_height: bool = False,
    *,
    gravitational_constant: float = GRAVITATIONAL_CONSTANT,
) -> dict[str, np.ndarray]:
    """Reduce observed gravity to free-air, simple and complete Bouguer anomalies.

    Parameters
    ----------
    observed : array_like
        Observed gravity in mGal.
    latitude : array_like
        Geodetic latitude in degrees.
    height : array_like
        Station height in m: above the ellipsoid for the GRS80/WGS84 standard
        (Hinze et al. 2005), or the height the legacy database used.
    density : array_like, optional
        Reduction density in kg/m^3, one value or one per station (2670).
    terrain_correction : array_like, optional
        Total terrain correction in mGal (positive). When omitted,
        ``tc_total`` and ``cba`` are NaN: a Bouguer anomaly without terrain
        correction is the simple one, and labelling it "complete" would
        mislead.
    normal_formula : {"grs80", "wgs84", "1967"}, optional
        Normal gravity: Somigliana on GRS80 (default) or WGS84, or the 1967
        formula of legacy databases.
    height_formula : {"second_order", "first_order"}, optional
        Hinze et al. (2005) second order (default) or 0.3086 mGal/m.
    atmospheric : bool, optional
        Apply the atmospheric correction (default); ``atmos_corr`` is 0 when
        off.
    curvature : bool, optional
        Apply the Bullard B correction, i.e. the 166.7 km spherical cap
        (default); ``curv_corr`` is 0 when off (flat slab only).
    normal_at_height : bool, optional
        Use the exact closed-form normal gravity at the station height
        instead of gamma_0 plus a height correction; ``height_corr`` is then
        0 and ``height_formula`` is ignored. GRS80/WGS84 only.
    gravitational_constant : float, optional, keyword only
        G for the slab and cap, CODATA 2018 by default; pass a database's own
        G to reproduce its Bouguer anomalies.

    Returns
    -------
    dict of str to numpy.ndarray
        float64 arrays of the broadcast input shape, keyed ``normal_g``,
        ``height_corr``, ``atmos_corr``, ``slab_corr``, ``curv_corr``,
        ``tc_total``, ``faa``, ``sba``, ``cba`` (all mGal). A NaN input gives
        NaN only in the outputs that depend on it (a NaN density, for
        instance, leaves ``faa`` intact).

    Raises
    ------
    ValueError
        For a finite latitude outside [-90, 90] (filter rows first with
        :func:`valid_latitude`), a non-positive density, an unknown formula
        name, or ``normal_at_height`` with the 1967 formula.

    Warns
    -----
    UserWarning
        For a density outside 1000-3500 kg/m^3 (see :func:`check_density`).

    Notes
    -----
    .. math::

        \\Delta g_{FA} &= g_{obs} - \\gamma_0 + \\Delta g_h + \\delta g_{atm} \\\\
        \\Delta g_{SB} &= \\Delta g_{FA} - 2\\pi G\\rho h - B \\\\
        \\Delta g_{CB} &= \\Delta g_{SB} + TC

    References
    ----------
    Hinze, W. J., et al., 2005, New standards for reducing gravity data: the
    North American gravity database, Geophysics 70(4), J25-J32. LaFehr, T.
    R., 1991, Geophysics 56(8), 1179-1184.

    Examples
    --------
    >>> out = reduce_gravity(980400.0, 45.0, 1000.0, terrain_correction=2.5)
    >>> print(f"{float(out['faa']):.4f} {float(out['cba']):.4f}")
    89.3354 -21.2451
    """
    normal_key = _choice(normal_formula, _NORMAL_FORMULAS, "normal gravity formula")
    height_key = _choice(height_formula, _HEIGHT_FORMULAS, "height correction formula")
    if normal_at_height and normal_key == "1967":
        msg = (
            "normal_at_height needs an ellipsoid (grs80 or wgs84); the 1967 formula is a series on the ellipsoid only"
        )
        raise ValueError(msg)

    g_obs = np.asarray(observed, dtype=np.float64)
    lat = check_latitude(latitude)
    h = np.asarray(height, dtype=np.float64)
    rho = check_density(density, allow_nan=True)
    tc = np.nan if terrain_correction is None else np.asarray(terrain_correction, dtype=np.float64)
    shape = np.broadcast_shapes(g_obs.shape, lat.shape, h.shape, rho.shape, np.shape(tc))

    def full(values: npt.ArrayLike) -> np.ndarray:
        return np.array(np.broadcast_to(np.asarray(values, dtype=np.float64), shape), dtype=np.float64)

    if normal_at_height:
        normal_g = normal_gravity_at_height(lat, h, normal_key)
        height_corr = np.zeros(shape)
    else:
        normal_g = normal_gravity_1967(lat) if normal_key == "1967" else normal_gravity(lat, normal_key)
        height_corr = height_correction(lat, h, height_key)
    atmos_corr = atmospheric_correction(h) if atmospheric else np.zeros(shape)
    slab_corr = bouguer_slab_correction(h, rho, gravitational_constant)
    curv_corr = curvature_correction(h, rho, gravitational_constant) if curvature else np.zeros(shape)

    faa = free_air_anomaly(g_obs, normal_g, height_corr, atmos_corr)
    sba = simple_bouguer_anomaly(faa, slab_corr, curv_corr)
    cba = complete_bouguer_anomaly(sba, tc)
    values = (normal_g, height_corr, atmos_corr, slab_corr, curv_corr, tc, faa, sba, cba)
    return {name: full(value) for name, value in zip(REDUCTION_FIELDS, values)}
