# SPDX-License-Identifier: GPL-2.0-or-later
"""Height, atmospheric, Bouguer slab and spherical-cap corrections, in mGal.

Each correction is returned with the sign in which it enters the anomalies
(see DEVELOPERS.md): ``faa = g_obs - normal_g + height_corr + atmos_corr``,
``sba = faa - slab_corr - curv_corr``. Also the reduction-density helpers.
"""

from __future__ import annotations

import warnings

import numpy as np
import numpy.typing as npt

from ._normal_gravity import check_latitude
from .constants import (
    BOUGUER_CAP_RADIUS,
    DEFAULT_REDUCTION_DENSITY,
    GRAVITATIONAL_CONSTANT,
    LAFEHR_EARTH_RADIUS,
    PLAUSIBLE_DENSITY,
    SI_TO_MGAL,
)

#: Hinze et al. (2005) second-order height correction coefficients
#: (mGal/m, mGal/m, mGal/m^2), docs/reduction.md section 3
#: (secondary: the same coefficients in several codes citing the paper).
HINZE_LINEAR = 0.3087691
HINZE_LATITUDE = 0.0004398
HINZE_QUADRATIC = 7.2125e-8

#: The classic free-air gradient, mGal/m (common practice; it is the GRS80
#: normal gradient at 45 degrees, docs/reduction.md section 3).
FREE_AIR_GRADIENT = 0.3086

#: Wenzel (1985) atmospheric polynomial coefficients (mGal, mGal/m,
#: mGal/m^2), as adopted by Hinze et al. (2005), docs/reduction.md section 4
#: (secondary).
WENZEL_COEFFICIENTS = (0.874, -9.9e-5, 3.56e-9)

_HEIGHT_METHODS = ("second_order", "first_order")


def height_correction(
    latitude_deg: npt.ArrayLike,
    height_m: npt.ArrayLike,
    method: str = "second_order",
) -> np.ndarray:
    """Height ("free-air") correction added to form the free-air anomaly, in mGal.

    Parameters
    ----------
    latitude_deg : array_like
        Geodetic latitude in degrees (only the second-order method uses it).
    height_m : array_like
        Station height in m: ellipsoidal for the second-order method
        (Hinze et al. 2005); whatever datum the database used otherwise.
    method : {"second_order", "first_order"}, optional
        ``"second_order"`` (default): Hinze et al. (2005);
        ``"first_order"``: the classic 0.3086 mGal/m.

    Returns
    -------
    numpy.ndarray
        The correction in mGal, positive for a station above the datum
        (about +0.3086 mGal per metre).

    Notes
    -----
    Second order (Hinze et al. 2005, the change of GRS80 normal gravity with
    height, with the sign reversed so that it is added):

    .. math::

        \\Delta g_h = (0.3087691 - 0.0004398 \\sin^2\\varphi)\\,h
        - 7.2125\\times10^{-8}\\,h^2

    First order: :math:`\\Delta g_h = 0.3086\\,h`.

    References
    ----------
    Hinze, W. J., et al., 2005, New standards for reducing gravity data: the
    North American gravity database, Geophysics 70(4), J25-J32.

    Examples
    --------
    >>> print(f"{float(height_correction(45.0, 1000.0)):.4f}")
    308.4771
    >>> print(f"{float(height_correction(45.0, 1000.0, 'first_order')):.1f}")
    308.6
    """
    h = np.asarray(height_m, dtype=np.float64)
    if method == "second_order":
        sin2 = np.sin(np.radians(check_latitude(latitude_deg))) ** 2
        return (HINZE_LINEAR - HINZE_LATITUDE * sin2) * h - HINZE_QUADRATIC * h * h
    if method == "first_order":
        # Same shape as the second-order result, but a NaN latitude must not
        # spoil a correction that does not depend on it.
        h_full, _ = np.broadcast_arrays(h, check_latitude(latitude_deg))
        return FREE_AIR_GRADIENT * h_full
    msg = f"unknown height correction method {method!r}; expected one of {_HEIGHT_METHODS}"
    raise ValueError(msg)


def atmospheric_correction(height_m: npt.ArrayLike) -> np.ndarray:
    """Atmospheric correction added to the anomaly, in mGal.

    GRS80 normal gravity counts the atmosphere in GM, but the air above a
    station does not pull it down, so the attraction of that air is added
    back to the anomaly (about 0.87 mGal at sea level).

    Parameters
    ----------
    height_m : array_like
        Station height in m. The polynomial follows the IAG table to within
        0.01 mGal from 0 to 5 km and to a few hundredths up to about 10 km;
        it is not meant for higher points.

    Returns
    -------
    numpy.ndarray
        The correction in mGal.

    Notes
    -----
    .. math::

        \\delta g_{atm} = 0.874 - 9.9\\times10^{-5}\\,h + 3.56\\times10^{-9}\\,h^2

    References
    ----------
    Wenzel, H., 1985, Hochauflosende Kugelfunktionsmodelle fur das
    Gravitationspotential der Erde, Wiss. Arb. Fachr. Vermessungswesen Univ.
    Hannover 137. Hinze, W. J., et al., 2005, Geophysics 70(4), J25-J32.

    Examples
    --------
    >>> print(f"{float(atmospheric_correction(1000.0)):.5f}")
    0.77856
    """
    h = np.asarray(height_m, dtype=np.float64)
    c0, c1, c2 = WENZEL_COEFFICIENTS
    return c0 + c1 * h + c2 * h * h


def bouguer_slab_correction(
    height_m: npt.ArrayLike,
    density: npt.ArrayLike = DEFAULT_REDUCTION_DENSITY,
    gravitational_constant: float = GRAVITATIONAL_CONSTANT,
) -> np.ndarray:
    """Attraction of the infinite Bouguer slab (Bullard A), in mGal.

    Parameters
    ----------
    height_m : array_like
        Slab thickness = station height above the datum, in m. A negative
        height (station below the datum) gives a negative slab: the mass
        missing between station and datum.
    density : array_like, optional
        Reduction density in kg/m^3 (2670 by default).
    gravitational_constant : float, optional
        G in m^3 kg^-1 s^-2 (CODATA 2018 by default); tests that compare
        with a published table pass the table's G.

    Returns
    -------
    numpy.ndarray
        The slab attraction :math:`2\\pi G\\rho h` in mGal, subtracted from
        the free-air anomaly.

    Notes
    -----
    .. math:: \\delta g_B = 2\\pi G \\rho h

    References
    ----------
    LaFehr, T. R., 1991, Standardization in gravity reduction, Geophysics
    56(8), 1170-1178 (from memory); Hinze et al., 2005, Geophysics 70(4).

    Examples
    --------
    >>> print(f"{float(bouguer_slab_correction(1000.0, 2670.0)):.5f}")
    111.96876
    """
    h = np.asarray(height_m, dtype=np.float64)
    rho = np.asarray(density, dtype=np.float64)
    return 2.0 * np.pi * gravitational_constant * rho * h * SI_TO_MGAL


def _lafehr_lambda(delta: np.ndarray, alpha: float) -> np.ndarray:
    """LaFehr's (1991) lambda term, dimensionless, for delta = R0 / R."""
    cos_a = np.cos(alpha)
    d = 3.0 * cos_a**2 - 2.0
    f = cos_a
    k = np.sin(alpha) ** 2
    p = -6.0 * cos_a**2 * np.sin(alpha / 2.0) + 4.0 * np.sin(alpha / 2.0) ** 3
    m = -3.0 * k * cos_a
    n = 2.0 * (np.sin(alpha / 2.0) - np.sin(alpha / 2.0) ** 2)
    root = np.sqrt((f - delta) ** 2 + k)
    return ((d + f * delta + delta**2) * root + p + m * np.log(n / (f - delta + root))) / 3.0


def _curvature_thickness(h: np.ndarray, cap_radius: float, earth_radius: float) -> np.ndarray:
    """LaFehr's (1991) cap minus slab as an equivalent slab thickness, mu h - lambda R (m).

    Shared by the cap (slab thickness h plus this) and Bullard B (this alone),
    so B is formed analytically rather than as a difference of two numbers.
    """
    radius = earth_radius + h
    eta = h / radius
    mu = eta * eta / 3.0 - eta
    lam = _lafehr_lambda(earth_radius / radius, cap_radius / earth_radius)
    return mu * h - lam * radius


def spherical_cap_correction(
    height_m: npt.ArrayLike,
    density: npt.ArrayLike = DEFAULT_REDUCTION_DENSITY,
    gravitational_constant: float = GRAVITATIONAL_CONSTANT,
    cap_radius: float = BOUGUER_CAP_RADIUS,
    earth_radius: float = LAFEHR_EARTH_RADIUS,
) -> np.ndarray:
    """Attraction of a spherical cap of surface radius 166.7 km (Bullard A + B), in mGal.

    Parameters
    ----------
    height_m : array_like
        Cap thickness = station height above the datum, in m (station on the
        cap's top, on its axis).
    density : array_like, optional
        Reduction density in kg/m^3 (2670 by default).
    gravitational_constant : float, optional
        G in m^3 kg^-1 s^-2 (CODATA 2018 by default).
    cap_radius : float, optional
        Surface (arc) radius S of the cap in m, 166 735 m by default.
    earth_radius : float, optional
        Radius R0 of the datum sphere in m, 6 371 000 m as LaFehr (1991).

    Returns
    -------
    numpy.ndarray
        The cap attraction in mGal, to be subtracted from the free-air
        anomaly instead of the slab.

    Notes
    -----
    LaFehr's exact closed form: with :math:`R = R_0 + h`,
    :math:`\\alpha = S/R_0`, :math:`\\delta = R_0/R`, :math:`\\eta = h/R`,
    :math:`\\mu = \\eta^2/3 - \\eta`,

    .. math::

        g_{cap} = 2\\pi G\\rho\\,[(1 + \\mu)\\,h - \\lambda R],

    .. math::

        \\lambda = \\tfrac13\\Big\\{(d + f\\delta + \\delta^2)
        \\sqrt{(f-\\delta)^2 + k} + p
        + m \\ln\\frac{n}{f - \\delta + \\sqrt{(f-\\delta)^2 + k}}\\Big\\},

    :math:`d = 3\\cos^2\\alpha - 2`, :math:`f = \\cos\\alpha`,
    :math:`k = \\sin^2\\alpha`,
    :math:`p = -6\\cos^2\\alpha\\sin(\\alpha/2) + 4\\sin^3(\\alpha/2)`,
    :math:`m = -3\\sin^2\\alpha\\cos\\alpha`,
    :math:`n = 2[\\sin(\\alpha/2) - \\sin^2(\\alpha/2)]`.

    Negative heights (station below the datum): the same closed form is
    evaluated as is. It is smooth across h = 0 and equals the quadrature
    of the cap kernel taken from the datum down to the station, i.e. the
    analytic continuation of the attraction of the layer between station
    and datum, with a negative sign. That is the choice consistent with the
    free-air reduction (itself a downward continuation of normal gravity),
    and its flat limit is the signed slab :math:`2\\pi G\\rho h < 0`. It is
    not the mirror image ``-g_cap(-h)``: the two differ by 0.007 mGal at
    h = -100 m and 0.13 mGal at h = -430 m. The result is finite for any
    h > -R0.

    References
    ----------
    LaFehr, T. R., 1991, An exact solution for the gravity curvature (Bullard
    B) correction, Geophysics 56(8), 1179-1184.

    Examples
    --------
    >>> print(f"{float(spherical_cap_correction(1000.0, 2670.0)):.5f}")
    113.08046
    """
    h = np.asarray(height_m, dtype=np.float64)
    rho = np.asarray(density, dtype=np.float64)
    thickness = h + _curvature_thickness(h, cap_radius, earth_radius)
    return 2.0 * np.pi * gravitational_constant * rho * thickness * SI_TO_MGAL


def curvature_correction(
    height_m: npt.ArrayLike,
    density: npt.ArrayLike = DEFAULT_REDUCTION_DENSITY,
    gravitational_constant: float = GRAVITATIONAL_CONSTANT,
    cap_radius: float = BOUGUER_CAP_RADIUS,
    earth_radius: float = LAFEHR_EARTH_RADIUS,
) -> np.ndarray:
    """Curvature ("Bullard B") correction = spherical cap minus slab, in mGal.

    Parameters
    ----------
    height_m, density, gravitational_constant, cap_radius, earth_radius
        As for :func:`spherical_cap_correction`.

    Returns
    -------
    numpy.ndarray
        Bullard B in mGal (positive below about 4.15 km, peaking near
        1.52 mGal at about 2.1 km for 2670 kg/m^3), subtracted from the
        free-air anomaly together with the slab.

    Notes
    -----
    .. math:: B = g_{cap} - 2\\pi G\\rho h = 2\\pi G\\rho\\,(\\mu h - \\lambda R)

    The difference is formed analytically, not by subtracting two rounded
    numbers, so B keeps its precision at small heights.

    References
    ----------
    LaFehr, T. R., 1991, An exact solution for the gravity curvature (Bullard
    B) correction, Geophysics 56(8), 1179-1184.

    Examples
    --------
    >>> print(f"{float(curvature_correction(1000.0, 2670.0, 6.67e-11)):.4f}")
    1.1110
    """
    h = np.asarray(height_m, dtype=np.float64)
    rho = np.asarray(density, dtype=np.float64)
    thickness = _curvature_thickness(h, cap_radius, earth_radius)
    return 2.0 * np.pi * gravitational_constant * rho * thickness * SI_TO_MGAL


def density_to_kg_per_m3(value: npt.ArrayLike, unit: str = "kg/m3") -> np.ndarray:
    """Convert a density to kg/m^3.

    Parameters
    ----------
    value : array_like
        Density in ``unit``.
    unit : {"kg/m3", "g/cm3"}, optional
        Unit of ``value``; ``kg/m^3``, ``kg/m³``, ``g/cm^3``, ``g/cm³`` and
        ``g/cc`` are accepted spellings.

    Returns
    -------
    numpy.ndarray
        Density in kg/m^3 (float64).

    Notes
    -----
    1 g/cm^3 = 1000 kg/m^3 (SI definition).

    Examples
    --------
    >>> float(density_to_kg_per_m3(2.67, "g/cm3"))
    2670.0
    """
    key = str(unit).strip().lower().replace(" ", "").replace("^", "").replace("\u00b3", "3")
    values = np.asarray(value, dtype=np.float64)
    if key in ("kg/m3", "kgm-3"):
        return values.copy()
    if key in ("g/cm3", "g/cc", "gcm-3"):
        return values * 1000.0
    msg = f"unknown density unit {unit!r}; expected 'kg/m3' or 'g/cm3'"
    raise ValueError(msg)


def check_density(values: npt.ArrayLike, allow_nan: bool = False) -> np.ndarray:
    """Validate reduction densities in kg/m^3.

    Parameters
    ----------
    values : array_like
        Density or densities in kg/m^3.
    allow_nan : bool, optional
        If True, NaN (a station without a density) is let through so that it
        propagates to NaN corrections; otherwise it is an error.

    Returns
    -------
    numpy.ndarray
        The densities as float64.

    Raises
    ------
    ValueError
        For a density that is zero, negative, infinite or (unless
        ``allow_nan``) NaN.

    Warns
    -----
    UserWarning
        For a density outside the plausible 1000-3500 kg/m^3, with a hint
        when the value looks like g/cm^3.

    Examples
    --------
    >>> check_density([2670.0, 2400.0]).tolist()
    [2670.0, 2400.0]
    >>> check_density(-2670.0)
    Traceback (most recent call last):
    ...
    ValueError: density must be a positive number of kg/m^3; got -2670.0
    """
    rho = np.asarray(values, dtype=np.float64)
    nan = np.isnan(rho)
    if nan.any() and not allow_nan:
        msg = f"density must be a positive number of kg/m^3; got NaN at {int(nan.sum())} position(s)"
        raise ValueError(msg)
    with np.errstate(invalid="ignore"):
        bad = ~nan & ~((rho > 0.0) & np.isfinite(rho))
    if bad.any():
        shown = ", ".join(repr(float(v)) for v in rho[bad].ravel()[:5])
        msg = f"density must be a positive number of kg/m^3; got {shown}"
        raise ValueError(msg)
    low, high = PLAUSIBLE_DENSITY
    with np.errstate(invalid="ignore"):
        outside = ~nan & ((rho < low) | (rho > high))
    if outside.any():
        odd = rho[outside].ravel()
        shown = ", ".join(repr(float(v)) for v in odd[:5])
        hint = ""
        if np.all(odd < 10.0):
            hint = " It looks like g/cm^3: multiply by 1000 (e.g. 2.67 g/cm^3 = 2670 kg/m^3)."
        warnings.warn(
            f"density {shown} kg/m^3 is outside the plausible range {low:g}-{high:g} kg/m^3.{hint}",
            UserWarning,
            stacklevel=2,
        )
    return rho
