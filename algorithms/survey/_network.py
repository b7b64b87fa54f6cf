# SPDX-License-Identifier: GPL-2.0-or-later
"""What the drift methods share: reading checks, ties to known stations, loop closures, results.

Readings are described by parallel arrays: ``station`` (index into the
station arrays, -1 for a reading of no known station), ``loop`` (index of the
loop, 0..n_loops-1), ``hours`` (UTC hours, see ``_times``) and ``value`` (the
reading in mGal after calibration, tide and instrument height: a relative
value, offset by the meter's arbitrary zero).
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np


@dataclass(frozen=True)
class NetworkResult:
    """Observed gravity from a network of readings.

    Attributes
    ----------
    gravity, sigma : numpy.ndarray
        Per station: observed gravity and its standard error (mGal); NaN where
        not determined (``sigma`` NaN also where the method gives none).
    n_used : numpy.ndarray
        Per station: readings that entered its value.
    offset, drift_rate, drift_sigma : numpy.ndarray
        Per loop: the meter's offset (mGal, gravity = reading - offset - drift),
        the linear drift rate (mGal/h) and its standard error; NaN for loops not
        tied to a known station.
    drift_estimated : numpy.ndarray
        Per loop: False where the drift rate could not be determined (then 0).
    drift_corr, g_read, residual : numpy.ndarray
        Per reading (mGal): the drift correction added, the gravity the reading
        gives (``value - offset + drift_corr``) and ``g_read`` minus the
        station's gravity; NaN where the loop is not tied.
    used, outlier : numpy.ndarray
        Per reading: entered the final solution; residual beyond the limit.
    station_tied, loop_tied : numpy.ndarray
        Stations and loops connected to a station of known gravity.
    sigma0 : float
        Standard error of unit weight (mGal, one reading), a posteriori.
    redundancy : int
        Observations minus unknowns of the final solution.
    """

    gravity: np.ndarray
    sigma: np.ndarray
    n_used: np.ndarray
    offset: np.ndarray
    drift_rate: np.ndarray
    drift_sigma: np.ndarray
    drift_estimated: np.ndarray
    drift_corr: np.ndarray
    g_read: np.ndarray
    residual: np.ndarray
    used: np.ndarray
    outlier: np.ndarray
    station_tied: np.ndarray
    loop_tied: np.ndarray
    sigma0: float
    redundancy: int


@dataclass(frozen=True)
class LoopClosure:
    """Closure of each loop on the station that opens it (before drift removal).

    Attributes
    ----------
    base : numpy.ndarray
        Station index that opens the loop (-1 when the loop has no usable reading).
    base_count : numpy.ndarray
        Readings of that station in the loop.
    start, end : numpy.ndarray
        UTC hours of the loop's first and last reading.
    misclosure : numpy.ndarray
        Last minus first reading of the opening station, mGal (NaN with one occupation).
    """

    base: np.ndarray
    base_count: np.ndarray
    start: np.ndarray
    end: np.ndarray
    misclosure: np.ndarray


def _as_arrays(station, loop, hours, value=None):
    station = np.asarray(station, dtype=int)
    loop = np.asarray(loop, dtype=int)
    hours = np.asarray(hours, dtype=float)
    if not (station.shape == loop.shape == hours.shape):
        msg = "station, loop and hours must have one value per reading"
        raise ValueError(msg)
    if value is not None:
        value = np.asarray(value, dtype=float)
        if value.shape != station.shape:
            msg = "value must have one value per reading"
            raise ValueError(msg)
    if np.any(loop < 0):
        msg = "loop indices must be 0 or more"
        raise ValueError(msg)
    return station, loop, hours, value


def duplicate_readings(station, hours) -> np.ndarray:
    """True for a reading of the same station at the same time as an earlier row.

    Examples
    --------
    >>> duplicate_readings([0, 1, 0, 0], [1.0, 1.5, 1.0, 2.0]).tolist()
    [False, False, True, False]
    """
    seen = set()
    out = np.zeros(len(station), dtype=bool)
    for i, key in enumerate(zip(np.asarray(station).tolist(), np.round(np.asarray(hours, float), 6).tolist())):
        if key[0] >= 0 and key in seen:
            out[i] = True
        seen.add(key)
    return out


def times_going_backwards(loop, hours) -> np.ndarray:
    """True for a reading earlier than a previous row of its loop (rows in field order).

    Examples
    --------
    >>> times_going_backwards([0, 0, 0, 1], [8.0, 9.0, 8.5, 7.0]).tolist()
    [False, False, True, False]
    """
    latest = {}
    out = np.zeros(len(loop), dtype=bool)
    for i, (lp, t) in enumerate(zip(np.asarray(loop).tolist(), np.asarray(hours, float).tolist())):
        if lp in latest and t < latest[lp]:
            out[i] = True
        latest[lp] = max(t, latest.get(lp, t))
    return out


def tied_stations(station, loop, known, use=None) -> tuple[np.ndarray, np.ndarray]:
    """Stations and loops connected through shared loops to a station of known gravity.

    Two stations are connected when one loop reads both; a loop is tied when
    one of its stations is.

    Parameters
    ----------
    station, loop : array_like of int
        Per reading.
    known : array_like of float
        Per station: known gravity, NaN where unknown.
    use : array_like of bool, optional
        Readings to consider (default all with a station).

    Returns
    -------
    station_tied, loop_tied : numpy.ndarray of bool

    Examples
    --------
    >>> s, l = tied_stations([0, 1, 2, 3], [0, 0, 1, 1], [979000.0, np.nan, np.nan, np.nan])
    >>> s.tolist(), l.tolist()
    ([True, True, False, False], [True, False])
    """
    station = np.asarray(station, dtype=int)
    loop = np.asarray(loop, dtype=int)
    known = np.asarray(known, dtype=float)
    use = np.ones(len(station), bool) if use is None else np.asarray(use, bool)
    use = use & (station >= 0)
    parent = list(range(len(known)))

    def root(i):
        while parent[i] != i:
            parent[i] = parent[parent[i]]
            i = parent[i]
        return i

    n_loops = int(loop.max()) + 1 if len(loop) else 0
    first_of_loop = {}
    for s, lp in zip(station[use].tolist(), loop[use].tolist()):
        if lp in first_of_loop:
            a, b = root(first_of_loop[lp]), root(s)
            if a != b:
                parent[b] = a
        else:
            first_of_loop[lp] = s
    tied_roots = {root(i) for i in np.flatnonzero(np.isfinite(known)).tolist()}
    station_tied = np.array([root(i) in tied_roots for i in range(len(known))], dtype=bool)
    loop_tied = np.zeros(n_loops, dtype=bool)
    for lp, s in first_of_loop.items():
        loop_tied[lp] = station_tied[s]
    return station_tied, loop_tied


def loop_closures(station, loop, hours, value, use=None, n_loops=None) -> LoopClosure:
    """Misclosure of each loop on its opening station (tide-corrected, drift not removed).

    The loop's readings are taken in time order; the station of the first
    one opens the loop; the misclosure is its last reading minus its first.

    Examples
    --------
    >>> c = loop_closures([0, 1, 0], [0, 0, 0], [8.0, 9.0, 10.0], [100.0, 120.0, 100.06])
    >>> round(float(c.misclosure[0]), 3), int(c.base_count[0])
    (0.06, 2)
    """
    station, loop, hours, value = _as_arrays(station, loop, hours, value)
    use = (np.ones(len(station), bool) if use is None else np.asarray(use, bool)) & (station >= 0)
    n_loops = (int(loop.max()) + 1 if len(loop) else 0) if n_loops is None else n_loops
    base = np.full(n_loops, -1)
    count = np.zeros(n_loops, dtype=int)
    start = np.full(n_loops, np.nan)
    end = np.full(n_loops, np.nan)
    misclosure = np.full(n_loops, np.nan)
    for lp in range(n_loops):
        rows = np.flatnonzero(use & (loop == lp))
        if not len(rows):
            continue
        rows = rows[np.argsort(hours[rows], kind="stable")]
        start[lp], end[lp] = hours[rows[0]], hours[rows[-1]]
        base[lp] = station[rows[0]]
        on_base = rows[station[rows] == base[lp]]
        count[lp] = len(on_base)
        if len(on_base) > 1:
            misclosure[lp] = value[on_base[-1]] - value[on_base[0]]
    return LoopClosure(base=base, base_count=count, start=start, end=end, misclosure=misclosure)


def loop_reference_times(loop, hours, use, n_loops) -> np.ndarray:
    """Per loop: time of its first used reading (the origin of the drift line)."""
    ref = np.full(n_loops, np.nan)
    for lp in range(n_loops):
        rows = np.flatnonzero(use & (loop == lp))
        if len(rows):
            ref[lp] = hours[rows].min()
    return ref
