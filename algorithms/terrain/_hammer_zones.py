# SPDX-License-Identifier: GPL-2.0-or-later
"""Hammer (1939) zone table, zone choice, and the closed forms of one ring.

The zone table
--------------
Radii (feet) and compartment counts of zones B-M are **from memory** of the
standard Hammer table: we could not find a published reproduction of
Hammer's table of zones (Hammer 1939, Geophysics 4(3), 184-194) among the
sources available to us, so no row has been checked against print. One
value is consistent with a published source: the outer radius of zone M,
71,996 ft = 21.94 km = 13.63 miles, against "the Hammer charts ... extend
out to a radius of about 13.6 miles" (Sandberg 1959, Geophysics 24(2), 323,
abstract). See ``docs/hammer.md``.

Zone A (station to 6.56 ft = 2 m) is the station zone; the ring-and-sector
method never samples it (a field estimate may be added for it).
"""

from __future__ import annotations

import math
import re
from typing import NamedTuple

import numpy as np
import numpy.typing as npt
from scipy.special import ellipk

from ..constants import FOOT, GRAVITATIONAL_CONSTANT, SI_TO_MGAL


class HammerZone(NamedTuple):
    """One ring of the Hammer chart: radii in metres, number of compartments."""

    letter: str
    inner: float
    outer: float
    compartments: int


#: Zones B-M: radii in feet converted with the international foot (0.3048 m),
#: and compartments per ring. FROM MEMORY, not checked against Hammer (1939);
#: the outer radius of M agrees with Sandberg (1959)'s "about 13.6 miles".
HAMMER_ZONES: tuple[HammerZone, ...] = tuple(
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

#: All zone letters, innermost first.
ZONE_LETTERS = "".join(z.letter for z in HAMMER_ZONES)


def parse_zones(text: str) -> tuple[HammerZone, ...]:
    """The zones of a user's choice, checked.

    Parameters
    ----------
    text : str
        Zone letters, either written out ("BCDEFGHIJKLM", "DEFG") or as a
        range of two letters joined by a hyphen or an en dash ("B-M");
        case and spaces are ignored.

    Returns
    -------
    tuple of HammerZone
        Innermost first.

    Raises
    ------
    ValueError
        Empty choice, a letter outside B-M, a repeated letter, letters out of
        order, or a gap. The zones must be contiguous: a gap would leave a
        ring inside the reach uncorrected while the run reports the terrain
        as corrected up to the last zone.

    Examples
    --------
    >>> [z.letter for z in parse_zones("d-g")]
    ['D', 'E', 'F', 'G']
    >>> parse_zones("BCE")
    Traceback (most recent call last):
    ...
    ValueError: Hammer zones must be contiguous (no gap between B and E): 'BCE' leaves out D.
    """
    if not isinstance(text, str):
        msg = f"Hammer zones must be given as letters such as 'BCDEFGHIJKLM' or 'B-M', got {text!r}."
        raise ValueError(msg)
    compact = re.sub(r"\s+", "", text).upper()
    if not compact:
        msg = "No Hammer zone chosen: give letters out of B-M such as 'BCDEFGHIJKLM' or 'B-M'."
        raise ValueError(msg)
    match = re.fullmatch(r"([A-Z])[-\u2013]([A-Z])", compact)
    if match:
        first, last = match.groups()
        for letter in (first, last):
            if letter not in ZONE_LETTERS:
                msg = f"Unknown Hammer zone {letter!r} in {text!r}: zones run from B to M (zone A is the station zone)."
                raise ValueError(msg)
        i, j = ZONE_LETTERS.index(first), ZONE_LETTERS.index(last)
        if j < i:
            msg = f"Hammer zone range {text!r} runs backwards: write the inner zone first, e.g. '{last}-{first}'."
            raise ValueError(msg)
        return HAMMER_ZONES[i : j + 1]
    unknown = sorted({c for c in compact if c not in ZONE_LETTERS})
    if unknown:
        msg = (
            f"Unknown Hammer zone letter(s) {', '.join(unknown)} in {text!r}: "
            "zones run from B to M (zone A is the station zone)."
        )
        raise ValueError(msg)
    repeated = sorted({c for c in compact if compact.count(c) > 1})
    if repeated:
        msg = f"Hammer zone(s) {', '.join(repeated)} given twice in {text!r}."
        raise ValueError(msg)
    index = [ZONE_LETTERS.index(c) for c in compact]
    if index != sorted(index):
        msg = f"Hammer zones {text!r} are out of order: write them innermost first, e.g. {''.join(sorted(compact))!r}."
        raise ValueError(msg)
    missing = [ZONE_LETTERS[k] for k in range(index[0], index[-1] + 1) if k not in index]
    if missing:
        msg = (
            f"Hammer zones must be contiguous (no gap between {compact[0]} and {compact[-1]}): "
            f"{text!r} leaves out {''.join(missing)}."
        )
        raise ValueError(msg)
    return HAMMER_ZONES[index[0] : index[-1] + 1]


def zone_label(zones) -> str:
    """"B–M" for a run of zones, "D" for one zone.

    Examples
    --------
    >>> zone_label(parse_zones("B-M")), zone_label(parse_zones("E"))
    ('B–M', 'E')
    """
    letters = [z.letter for z in zones]
    return letters[0] if len(letters) == 1 else f"{letters[0]}\u2013{letters[-1]}"


def reach_sentence(zones) -> str:
    """English sentence saying how far the chosen zones reach.

    Examples
    --------
    >>> reach_sentence(parse_zones("B-M"))
    'ring-and-sector zones B–M reach 21.94 km; terrain beyond is not corrected.'
    >>> reach_sentence(parse_zones("D-F"))
    'ring-and-sector zones D–F cover 53.3 m to 894.9 m; terrain nearer (except a field-estimated zone A) and beyond is not corrected.'
    """  # noqa: E501 - a doctest's expected output is one line
    first, last = zones[0], zones[-1]
    outer = f"{last.outer / 1000:.2f} km" if last.outer >= 1000 else f"{last.outer:.1f} m"
    if first.letter == "B":
        return f"ring-and-sector zones {zone_label(zones)} reach {outer}; terrain beyond is not corrected."
    inner = f"{first.inner / 1000:.2f} km" if first.inner >= 1000 else f"{first.inner:.1f} m"
    return (
        f"ring-and-sector zones {zone_label(zones)} cover {inner} to {outer}; terrain nearer "
        "(except a field-estimated zone A) and beyond is not corrected."
    )


def resolved_by(zone: HammerZone, cell: float) -> bool:
    """Whether a DEM of cell size ``cell`` (m) resolves the zone's compartments.

    A compartment is resolved when both its radial width ``r2 - r1`` and its
    arc at mid-radius ``pi (r1 + r2) / n`` are at least one cell (the larger
    metric side of the cell). Narrower compartments lie inside a cell or two:
    their mean height would be the DEM's interpolation between cell centres,
    not terrain the DEM has seen, so they use the sloping plane instead
    (:func:`plane_ring_correction`). Both lengths grow outward through the
    table, so the unresolved zones are always the innermost ones.

    Examples
    --------
    >>> [z.letter for z in HAMMER_ZONES if not resolved_by(z, 50.0)]
    ['B', 'C']
    """
    width = zone.outer - zone.inner
    arc = math.pi * (zone.inner + zone.outer) / zone.compartments
    return min(width, arc) >= cell


def ring_sector_correction(
    r1: float, r2: float, n_compartments: int, relief: npt.ArrayLike, density: float = 2670.0, drop: npt.ArrayLike = 0.0
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
    drop : array_like
        Earth-curvature drop of the reference surface over the compartment
        (m, about s^2/2R at distance s; 0 for Hammer's flat charts). The
        relief is then measured from the station's horizontal plane to the
        lowered terrain, ``mean(h - s^2/2R) - h_station``.

    Returns
    -------
    numpy.ndarray
        Correction of one compartment in mGal (>= 0 on a flat Earth; with a
        drop, terrain above the lowered reference but below the station
        gives a negative value, as in the zone engine).

    Notes
    -----
    A flat-topped compartment of a cylinder ring (Hammer 1939):

    .. math:: T = \\frac{2\\pi G\\rho}{n}\\left[(r_2 - r_1) + \\sqrt{r_1^2 + z^2}
              - \\sqrt{r_2^2 + z^2}\\right].

    With the curvature drop d the compartment is the column between the
    lowered reference at -d and the terrain at c = z - d (docs/terrain.md,
    section 6), integrated over the ring sector:

    .. math:: T = \\frac{2\\pi G\\rho}{n}\\left[S(d) - S(c)\\right],\\quad
              S(x) = \\sqrt{r_2^2 + x^2} - \\sqrt{r_1^2 + x^2},

    which is Hammer's bracket for d = 0.

    The bracket telescopes: for any r1 < R < r2 the two sub-rings of the same
    relief add up to the whole ring, which is how a zone is split at the inner
    zone radius.

    References
    ----------
    Hammer, S., 1939, Terrain corrections for gravimeter stations,
    Geophysics 4(3), 184-194.

    Examples
    --------
    Ring 1280-2936 ft, 8 compartments, relief 200 ft, 2.0 g/cm^3 (about
    0.03 mGal, common practice):

    >>> print(f"{float(ring_sector_correction(390.144, 894.893, 8, 60.96, 2000.0)):.4f}")
    0.0279
    """
    if not (0 <= r1 < r2):
        msg = f"need 0 <= r1 < r2, got {r1}, {r2}"
        raise ValueError(msg)
    if n_compartments < 1:
        msg = f"n_compartments must be >= 1, got {n_compartments}"
        raise ValueError(msg)
    z = np.asarray(relief, dtype=float)
    d = np.asarray(drop, dtype=float)
    c2, d2 = z * z, d * d
    # S(d) - S(c) written without cancellation: (c^2 - d^2) times the
    # difference of 1 / (sqrt(r^2 + d^2) + sqrt(r^2 + c^2)) at r1 and r2;
    # for d = 0 it is Hammer's (r2 - r1) + sqrt(r1^2+z^2) - sqrt(r2^2+z^2).
    b1 = np.sqrt(r1 * r1 + d2) + np.sqrt(r1 * r1 + c2)
    b2 = np.sqrt(r2 * r2 + d2) + np.sqrt(r2 * r2 + c2)
    with np.errstate(divide="ignore", invalid="ignore"):
        bracket = np.where(c2 != d2, (c2 - d2) * (1.0 / b1 - 1.0 / b2), 0.0)
    return 2.0 * math.pi * GRAVITATIONAL_CONSTANT * density * SI_TO_MGAL / n_compartments * bracket


def plane_ring_correction(r1: float, r2: float, gradient: npt.ArrayLike, density: float = 2670.0) -> np.ndarray:
    """Terrain correction of a plane through the station over a ring, in mGal.

    Parameters
    ----------
    r1, r2 : float
        Inner and outer radius in metres (0 <= r1 < r2).
    gradient : array_like
        Magnitude of the plane's gradient (m/m), >= 0.
    density : float
        Density in kg/m^3.

    Returns
    -------
    numpy.ndarray
        Correction in mGal (>= 0).

    Notes
    -----
    The plane is the innermost model of the exact engine (a plane through the
    station height with the slope of the DEM's bilinear surface at the
    station, see :func:`plane_terrain_effect`), here over a ring instead of a
    square. In azimuth :math:`\\alpha` the terrain rises or falls at
    :math:`\\tan\\theta(\\alpha) = |g\\cos\\alpha|`; each thin wedge from r1 to
    r2 gives :math:`G\\rho\\,d\\alpha\\,(r_2 - r_1)(1 - \\cos\\theta)` (uniform-slope
    wedge, Nowell 1999), and the integral over azimuth has the closed form

    .. math:: T = G\\rho\\,(r_2 - r_1)\\left[2\\pi - 4\\cos\\theta_0\\,
              K(\\sin^2\\theta_0)\\right], \\qquad \\tan\\theta_0 = g,

    with K the complete elliptic integral of the first kind (parameter m;
    ``scipy.special.ellipk``). Small slopes: :math:`T \\approx \\pi G\\rho
    (r_2 - r_1) g^2 / 2`.

    References
    ----------
    Nowell, D.A.G., 1999, Gravity terrain corrections - an overview,
    J. Appl. Geophys. 42, 117-134.

    Examples
    --------
    A 10 degree plane to 1 km (0.855 41 mGal, derived closed form, 2670 kg/m^3):

    >>> print(f"{float(plane_ring_correction(0.0, 1000.0, math.tan(math.radians(10)))):.5f}")
    0.85541
    """
    if not (0 <= r1 < r2):
        msg = f"need 0 <= r1 < r2, got {r1}, {r2}"
        raise ValueError(msg)
    g = np.abs(np.asarray(gradient, dtype=float))
    cos0 = 1.0 / np.sqrt(1.0 + g * g)
    sin2 = g * g * cos0 * cos0
    bracket = 2.0 * math.pi - 4.0 * cos0 * ellipk(sin2)
    # Small slopes: the bracket loses digits; use the series pi g^2/2 (1 - 9 g^2/16).
    bracket = np.where(g < 1e-3, math.pi * g * g / 2.0 * (1.0 - 0.5625 * g * g), bracket)
    return GRAVITATIONAL_CONSTANT * density * SI_TO_MGAL * (r2 - r1) * np.maximum(bracket, 0.0)
