# SPDX-License-Identifier: GPL-2.0-or-later
"""Automatic contour interval and levels."""

from __future__ import annotations

import math

import numpy as np

#: Mantissas of a "nice" contour interval (common practice, no source).
NICE_MANTISSAS = (1.0, 2.0, 2.5, 5.0)


def nice_contour_interval(
    vmin: float, vmax: float, target_count: tuple[int, int] = (10, 15)
) -> float:
    """Contour interval ``s * 10**k`` with ``s`` in 1, 2, 2.5, 5.

    Parameters
    ----------
    vmin, vmax : float
        Range of the surface (e.g. mGal), ``vmax > vmin``.
    target_count : tuple of int, default (10, 15)
        Preferred (lowest, highest) number of contour levels in the range.

    Returns
    -------
    float
        The nice interval (units of ``vmin``) whose number of levels inside
        ``[vmin, vmax]`` is closest to the target range (ties: the larger
        interval, for a lighter map).

    Notes
    -----
    With :math:`\\Delta = v_{max} - v_{min}`, candidates are
    :math:`s\\,10^k` around :math:`\\Delta / n_{target}`; the number of levels
    of a candidate :math:`c` is :math:`\\lfloor v_{max}/c \\rfloor -
    \\lceil v_{min}/c \\rceil + 1`.

    Examples
    --------
    >>> nice_contour_interval(-23.4, 41.0)
    5.0
    >>> nice_contour_interval(0.0, 1.0)
    0.1
    """
    vmin, vmax = float(vmin), float(vmax)
    if not (math.isfinite(vmin) and math.isfinite(vmax)) or vmax <= vmin:
        msg = f"Invalid range ({vmin!r}, {vmax!r}): expected finite vmin < vmax."
        raise ValueError(msg)
    low, high = (int(v) for v in target_count)
    if not 1 <= low <= high:
        msg = f"Invalid target_count {target_count!r}: expected 1 <= low <= high."
        raise ValueError(msg)
    span = vmax - vmin
    exponent = math.floor(math.log10(span / high))
    best, best_score = None, None
    for k in range(exponent - 1, exponent + 3):
        for s in NICE_MANTISSAS:
            c = s * 10.0**k
            count = len(contour_levels(vmin, vmax, c))
            score = max(0, low - count, count - high)
            if best_score is None or score < best_score or (score == best_score and c > best):
                best, best_score = c, score
    return float(best)


def contour_levels(vmin: float, vmax: float, interval: float) -> np.ndarray:
    """Multiples of ``interval`` inside ``[vmin, vmax]``.

    Parameters
    ----------
    vmin, vmax : float
        Range (e.g. mGal).
    interval : float
        Contour interval, > 0 (same units).

    Returns
    -------
    numpy.ndarray
        Ascending levels ``k * interval``, rounded so that printed labels
        carry no binary noise.

    Examples
    --------
    >>> contour_levels(-0.25, 0.61, 0.2).tolist()
    [-0.2, 0.0, 0.2, 0.4, 0.6]
    """
    interval = float(interval)
    if not (math.isfinite(interval) and interval > 0):
        msg = f"Invalid contour interval {interval!r}: expected a finite number > 0."
        raise ValueError(msg)
    vmin, vmax = float(vmin), float(vmax)
    if not (math.isfinite(vmin) and math.isfinite(vmax)) or vmax < vmin:
        msg = f"Invalid range ({vmin!r}, {vmax!r}): expected finite vmin <= vmax."
        raise ValueError(msg)
    first = math.ceil(vmin / interval - 1e-9)
    last = math.floor(vmax / interval + 1e-9)
    if last - first > 100_000:
        msg = f"Interval {interval} gives {last - first + 1} levels in ({vmin}, {vmax}); choose a larger one."
        raise ValueError(msg)
    decimals = max(0, -math.floor(math.log10(interval)) + 3)
    levels = np.round(np.arange(first, last + 1) * interval, decimals)
    return levels + 0.0  # turns -0.0 into 0.0
