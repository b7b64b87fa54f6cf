# SPDX-License-Identifier: GPL-2.0-or-later
"""The textbook method: linear drift between the first and last base reading of each loop.

In each loop (readings in time order) the station of the first reading is
the base; with its first and last readings r1 at t1 and r2 at t2::

    drift_corr(t) = -(r2 - r1) (t - t1) / (t2 - t1)

(e.g. Telford, Geldart & Sheriff 1990, Applied Geophysics, §2.5; from memory).
The loop is then tied: offset = (reading + drift_corr of a tied station in
the loop) - its gravity, taking the base when its gravity is known (given, or
found in an earlier loop), otherwise the first known station read in the loop;
loops are tied in passes until no more can be. A station's gravity is the
mean of its readings' ``g_read`` over all tied loops (a given value is kept).
"""

from __future__ import annotations

import numpy as np

from ._adjustment import DEFAULT_OUTLIER_LIMIT
from ._network import NetworkResult, _as_arrays, tied_stations


def _loop_drift(value, station, hours, rows, drift):
    """Drift correction for the rows of one loop (time-ordered) and whether it was estimated."""
    base = station[rows[0]]
    on_base = rows[station[rows] == base]
    corr = np.zeros(len(rows))
    if not drift or len(on_base) < 2 or hours[on_base[-1]] <= hours[on_base[0]]:
        return corr, 0.0, False
    t1, t2 = hours[on_base[0]], hours[on_base[-1]]
    rate = (value[on_base[-1]] - value[on_base[0]]) / (t2 - t1)
    return -rate * (hours[rows] - t1), rate, True


def linear_drift(
    value, station, loop, hours, known, *, use=None, drift=True, outlier_limit=DEFAULT_OUTLIER_LIMIT
) -> NetworkResult:
    """Observed gravity with linear drift between base readings (or no drift with ``drift=False``).

    Parameters are those of :func:`adjust_network`. ``sigma`` is the standard
    error of the mean of a station's readings (NaN for one reading and for a
    given value); ``sigma0`` is the scatter of one reading about its station's
    mean over stations read more than once; readings beyond
    ``outlier_limit`` times ``sigma0`` are flagged (not left out).

    Examples
    --------
    Base 1000.000 at 08:00 and 1000.060 at 16:00, a station 1023.450 at 12:00
    (a constructed case, common practice, no source):

    >>> r = linear_drift([1000.0, 1023.45, 1000.06], [0, 1, 0], [0, 0, 0], [8.0, 12.0, 16.0], [979000.0, np.nan])
    >>> round(float(r.gravity[1]), 3), round(float(r.drift_rate[0]), 4)
    (979023.42, 0.0075)
    """
    station, loop, hours, value = _as_arrays(station, loop, hours, value)
    known = np.asarray(known, dtype=float)
    n_stations, n_loops = len(known), (int(loop.max()) + 1 if len(loop) else 0)
    use = (np.ones(len(station), bool) if use is None else np.asarray(use, bool).copy())
    use &= (station >= 0) & np.isfinite(value) & np.isfinite(hours)
    station_tied, loop_tied = tied_stations(station, loop, known, use)
    if not np.any(loop_tied):
        msg = "no reading reaches a station of known gravity: the network is not tied"
        raise ValueError(msg)

    drift_corr = np.full(len(station), np.nan)
    rate = np.full(n_loops, np.nan)
    estimated = np.zeros(n_loops, dtype=bool)
    loop_rows = {}
    for lp in range(n_loops):
        rows = np.flatnonzero(use & (loop == lp))
        if not len(rows):
            continue
        rows = rows[np.argsort(hours[rows], kind="stable")]
        loop_rows[lp] = rows
        corr, rate[lp], estimated[lp] = _loop_drift(value, station, hours, rows, drift)
        every = np.flatnonzero(loop == lp)
        t1 = hours[rows[0]]
        base_rows = rows[station[rows] == station[rows[0]]]
        if estimated[lp]:
            drift_corr[every] = -rate[lp] * (hours[every] - hours[base_rows[0]])
        else:
            drift_corr[every] = 0.0 * (hours[every] - t1)
        drift_corr[rows] = corr

    corrected = value + drift_corr
    offset = np.full(n_loops, np.nan)
    sums = np.zeros(n_stations)
    counts = np.zeros(n_stations, dtype=int)
    pending = [lp for lp in loop_rows if loop_tied[lp]]
    while pending:
        progressed = False
        for lp in list(pending):
            rows = loop_rows[lp]
            determined = np.isfinite(known) | (counts > 0)
            candidates = [k for k in rows if determined[station[k]]]
            if not candidates:
                continue
            base = rows[0] if determined[station[rows[0]]] else candidates[0]
            s = station[base]
            reference = known[s] if np.isfinite(known[s]) else sums[s] / counts[s]
            same = rows[station[rows] == s]
            offset[lp] = np.mean(corrected[same]) - reference
            np.add.at(sums, station[rows], corrected[rows] - offset[lp])
            np.add.at(counts, station[rows], 1)
            pending.remove(lp)
            progressed = True
        if not progressed:
            break

    g_read = corrected - offset[loop]
    gravity = np.where(counts > 0, sums / np.maximum(counts, 1), np.nan)
    gravity = np.where(np.isfinite(known) & (counts > 0), known, gravity)
    used = use & np.isfinite(offset[loop])
    with np.errstate(invalid="ignore"):
        residual = g_read - np.where(station >= 0, gravity[np.clip(station, 0, None)], np.nan)
    n_used = np.bincount(station[used], minlength=n_stations)
    repeated = used & (n_used[np.clip(station, 0, None)] > 1)
    dof = int(repeated.sum()) - len(np.unique(station[repeated]))
    sigma0 = float(np.sqrt(np.sum(residual[repeated] ** 2) / dof)) if dof > 0 else float("nan")
    sigma = np.full(n_stations, np.nan)
    multi = (n_used > 1) & ~np.isfinite(known)
    if dof > 0:
        spread = np.zeros(n_stations)
        np.add.at(spread, station[used], residual[used] ** 2)
        sigma[multi] = np.sqrt(spread[multi] / (n_used[multi] - 1) / n_used[multi])
    if dof > 0:
        outlier = used & np.isfinite(residual) & (np.abs(residual) > outlier_limit * sigma0)
    else:
        outlier = np.zeros(len(station), bool)
    return NetworkResult(
        gravity=gravity, sigma=sigma, n_used=n_used, offset=offset,
        drift_rate=np.where(np.isfinite(offset), rate, np.nan),
        drift_sigma=np.full(n_loops, np.nan), drift_estimated=estimated & np.isfinite(offset), drift_corr=drift_corr,
        g_read=g_read, residual=residual, used=used, outlier=outlier, station_tied=station_tied & (counts > 0),
        loop_tied=np.isfinite(offset), sigma0=sigma0, redundancy=dof,
    )
