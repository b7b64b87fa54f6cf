# SPDX-License-Identifier: GPL-2.0-or-later
"""Least-squares adjustment of a relative-gravity network with per-loop offset and linear drift.

Observation equation of reading k (station s, loop L, time t)::

    r_k = g_s + o_L + d_L (t_k - t_L) + v_k          weight 1 / sigma_r^2

and for each station of known gravity G_s (a weighted observation)::

    G_s = g_s + v_s                                   weight 1 / sigma_k^2

Unknowns: g_s for every station read in a tied loop, the loop's offset o_L
and drift rate d_L (mGal/h; t_L is the loop's first reading). Solution of the
normal equations (A^T P A) x = A^T P l; a-posteriori standard error of unit
weight s0^2 = v^T P v / (n - u); covariance s0^2 (A^T P A)^-1; a reading's
standardised residual w_k = v_k / (s0 sqrt(q_vv,k)) with
q_vv = P^-1 - A (A^T P A)^-1 A^T (Baarda's data snooping, e.g. Torge &
Müller 2012, Geodesy, ch. 2; from memory).
"""

from __future__ import annotations

import numpy as np

from ._network import NetworkResult, _as_arrays, loop_reference_times, tied_stations

#: A-priori standard error of one reading, mGal (common practice, no source).
DEFAULT_READING_SIGMA = 0.010
#: A-priori standard error of a known station's gravity, mGal (common practice, no source).
DEFAULT_KNOWN_SIGMA = 0.001
#: Standardised residual beyond which a reading is flagged.
DEFAULT_OUTLIER_LIMIT = 3.0


def _columns(station, loop, use, n_loops, drift_loops):
    stations = np.unique(station[use])
    station_col = {int(s): i for i, s in enumerate(stations)}
    loops = np.unique(loop[use])
    offset_col = {int(lp): len(stations) + i for i, lp in enumerate(loops)}
    drift_col = {}
    for lp in loops.tolist():
        if drift_loops[lp]:
            drift_col[lp] = len(stations) + len(loops) + len(drift_col)
    return station_col, offset_col, drift_col


def _design(station, loop, dt, use, known, station_col, offset_col, drift_col, reading_sigma, known_sigma):
    """Sparse design matrix (CSR: at most three entries per reading), observations and weights."""
    import scipy.sparse as sp  # here, not at import: loading the plugin stays quick

    rows = np.flatnonzero(use)
    knowns = [s for s in station_col if np.isfinite(known[s])]
    n_cols = len(station_col) + len(offset_col) + len(drift_col)
    i_idx, j_idx, values = [], [], []
    for i, k in enumerate(rows):
        i_idx += [i, i]
        j_idx += [station_col[int(station[k])], offset_col[int(loop[k])]]
        values += [1.0, 1.0]
        if int(loop[k]) in drift_col:
            i_idx.append(i)
            j_idx.append(drift_col[int(loop[k])])
            values.append(dt[k])
    p = np.ones(len(rows) + len(knowns))
    for j, s in enumerate(knowns):
        i_idx.append(len(rows) + j)
        j_idx.append(station_col[s])
        values.append(1.0)
        p[len(rows) + j] = (reading_sigma / known_sigma) ** 2
    A = sp.csr_matrix((values, (i_idx, j_idx)), shape=(len(rows) + len(knowns), n_cols))
    obs = np.zeros(len(rows) + len(knowns))
    return rows, knowns, A, obs, p


def _null_space(N, tolerance=1e-9):
    """Eigenvectors of the unit-diagonal scaled N whose eigenvalues are below ``tolerance`` x the largest.

    Only the largest eigenvalue and the small ones are computed (LAPACK's
    subset drivers), not the whole decomposition.
    """
    import scipy.linalg  # here, not at import: loading the plugin stays quick

    scale = np.sqrt(np.clip(np.diag(N), 1e-300, None))
    scaled = N / np.outer(scale, scale)
    n = scaled.shape[0]
    largest = float(scipy.linalg.eigh(scaled, eigvals_only=True, subset_by_index=[n - 1, n - 1])[0])
    limit = tolerance * max(largest, 1.0)
    eigval, eigvec = scipy.linalg.eigh(scaled, subset_by_value=[-np.inf, limit])
    return eigvec[:, eigval < limit]


def _inverse_if_regular(N, tolerance=1e-9):
    """(A^T P A)^-1 through Cholesky when N is provably regular, else None.

    Regular means: the smallest eigenvalue of the unit-diagonal scaled N,
    bounded from below by 1 / ||N_s^-1||_inf, exceeds ``tolerance`` x an
    upper bound of the largest (||N_s||_inf). Then :func:`_null_space` would
    find nothing, and its eigen-decompositions are skipped.
    """
    from scipy.linalg import lapack  # here, not at import: loading the plugin stays quick

    scale = np.sqrt(np.clip(np.diag(N), 1e-300, None))
    scaled = N / np.outer(scale, scale)
    factor, info = lapack.dpotrf(scaled, lower=1, clean=1)
    if info != 0:
        return None
    inverse, info = lapack.dpotri(factor, lower=1)
    if info != 0:
        return None
    inverse = np.tril(inverse) + np.tril(inverse, -1).T
    smallest = 1.0 / np.abs(inverse).sum(axis=1).max()
    if not smallest > tolerance * max(np.abs(scaled).sum(axis=1).max(), 1.0):
        return None
    return inverse / np.outer(scale, scale)


def _solve(value, station, loop, dt, use, known, drift_loops, n_loops, reading_sigma, known_sigma):
    """One least-squares pass; drops drift rates (and stations) the data cannot determine."""
    drift_loops = drift_loops.copy()
    use = use.copy()
    while True:
        cols = _columns(station, loop, use, n_loops, drift_loops)
        station_col, _offset_col, drift_col = cols
        rows, knowns, A, _, p = _design(station, loop, dt, use, known, *cols, reading_sigma, known_sigma)
        N = (A.T @ A.multiply(p[:, None]).tocsr()).toarray()
        Q = _inverse_if_regular(N)
        if Q is not None:
            break
        null = _null_space(N)
        if null.shape[1] == 0:
            break
        involved = np.any(np.abs(null) > 1e-6, axis=1)
        drop_drift = [lp for lp, c in drift_col.items() if involved[c]]
        if drop_drift:
            drift_loops[drop_drift] = False
            continue
        # No drift involved: stations whose gravity the loops cannot separate.
        lost = [s for s, c in station_col.items() if involved[c]]
        use &= ~np.isin(station, lost)
    obs = np.concatenate([value[rows], known[knowns]]) if knowns else value[rows].copy()
    if Q is None:  # regular by the eigenvalues though not by the cheap bound
        Q = np.linalg.inv(N)
        Q = 0.5 * (Q + Q.T)
    x = Q @ (A.T @ (p * obs))
    v = obs - A @ x  # observed minus computed
    redundancy = len(obs) - A.shape[1]
    sigma0 = float(np.sqrt(np.sum(p * v * v) / redundancy)) if redundancy > 0 else reading_sigma
    # diag(A Q A^T) row by row through the sparse A (three entries a row).
    qvv = 1.0 / p - np.asarray(A.multiply(A @ Q).sum(axis=1)).ravel()
    return dict(
        x=x, Q=Q, cols=cols, rows=rows, v=v[: len(rows)], qvv=qvv[: len(rows)], sigma0=sigma0,
        redundancy=redundancy, use=use, drift_loops=drift_loops,
    )


def adjust_network(
    value,
    station,
    loop,
    hours,
    known,
    *,
    use=None,
    drift=True,
    reading_sigma=DEFAULT_READING_SIGMA,
    known_sigma=DEFAULT_KNOWN_SIGMA,
    outlier_limit=DEFAULT_OUTLIER_LIMIT,
    drop_outliers=False,
) -> NetworkResult:
    """Observed gravity of every station by least squares over all readings.

    See the module docstring for the equations. Readings of stations not
    connected to a known station are left out (``station_tied`` False);
    a loop whose drift rate the readings cannot determine (no station read
    twice in it, and no other way to fix it) gets none (``drift_estimated``
    False). Readings with a standardised residual beyond ``outlier_limit``
    are flagged; with ``drop_outliers`` they are left out of a second pass
    (their residual is then reported against that solution).

    Parameters
    ----------
    value : array_like
        Per reading, mGal (calibrated, tide and instrument height corrected).
    station, loop : array_like of int
        Per reading: station index (-1: no station) and loop index.
    hours : array_like
        Per reading: UTC hours.
    known : array_like
        Per station: known gravity in mGal, NaN where unknown.
    use : array_like of bool, optional
        Readings allowed into the solution (e.g. not duplicates).
    drift : bool
        Estimate a drift rate per loop (False: offsets only).
    reading_sigma, known_sigma : float
        A-priori standard errors (mGal) of a reading and of a known value.
    outlier_limit : float
        Limit of the standardised residual.
    drop_outliers : bool
        Second pass without the flagged readings.

    Returns
    -------
    NetworkResult

    Raises
    ------
    ValueError
        When no reading reaches a station of known gravity.

    Examples
    --------
    One loop A-B-A with a drift of 0.02 mGal/h; A is known:

    >>> r = adjust_network([10.0, 22.01, 10.04], [0, 1, 0], [0, 0, 0], [8.0, 8.5, 10.0], [979000.0, np.nan])
    >>> round(float(r.gravity[1]), 3), round(float(r.drift_rate[0]), 3)
    (979012.0, 0.02)
    """
    station, loop, hours, value = _as_arrays(station, loop, hours, value)
    known = np.asarray(known, dtype=float)
    if reading_sigma <= 0 or known_sigma <= 0:
        msg = "the a-priori standard errors must be positive"
        raise ValueError(msg)
    n_stations, n_loops = len(known), (int(loop.max()) + 1 if len(loop) else 0)
    if np.any(station >= n_stations):
        msg = "a station index is beyond the known-gravity array"
        raise ValueError(msg)
    use = (np.ones(len(station), bool) if use is None else np.asarray(use, bool).copy())
    use &= (station >= 0) & np.isfinite(value) & np.isfinite(hours)
    station_tied, loop_tied = tied_stations(station, loop, known, use)
    if not np.any(loop_tied):
        msg = "no reading reaches a station of known gravity: the network is not tied"
        raise ValueError(msg)
    use &= np.where(station >= 0, station_tied[np.clip(station, 0, None)], False)
    t_ref = loop_reference_times(loop, hours, use, n_loops)
    dt = hours - np.where(np.isfinite(t_ref[loop]), t_ref[loop], 0.0)
    drift_loops = np.full(n_loops, bool(drift))

    solution = _solve(value, station, loop, dt, use, known, drift_loops, n_loops, reading_sigma, known_sigma)
    outlier = _outliers(solution, len(station), outlier_limit)
    if drop_outliers and np.any(outlier):
        second_use = solution["use"] & ~outlier
        solution = _solve(value, station, loop, dt, second_use, known, drift_loops, n_loops, reading_sigma, known_sigma)
        outlier |= _outliers(solution, len(station), outlier_limit)
    return _result(solution, value, station, loop, dt, n_stations, n_loops, outlier, station_tied, loop_tied)


def _outliers(solution, n_readings, limit):
    out = np.zeros(n_readings, dtype=bool)
    qvv = solution["qvv"]
    ok = qvv > 1e-10
    w = np.zeros(len(qvv))
    w[ok] = solution["v"][ok] / (solution["sigma0"] * np.sqrt(qvv[ok]))
    out[solution["rows"]] = np.abs(w) > limit
    return out


def _result(solution, value, station, loop, dt, n_stations, n_loops, outlier, station_tied, loop_tied):
    station_col, offset_col, drift_col = solution["cols"]
    x, Q, s0 = solution["x"], solution["Q"], solution["sigma0"]
    gravity = np.full(n_stations, np.nan)
    sigma = np.full(n_stations, np.nan)
    for s, c in station_col.items():
        gravity[s] = x[c]
        sigma[s] = s0 * np.sqrt(Q[c, c])
    offset = np.full(n_loops, np.nan)
    rate = np.full(n_loops, np.nan)
    rate_sigma = np.full(n_loops, np.nan)
    estimated = np.zeros(n_loops, dtype=bool)
    for lp, c in offset_col.items():
        offset[lp] = x[c]
        rate[lp] = 0.0
    for lp, c in drift_col.items():
        rate[lp] = x[c]
        rate_sigma[lp] = s0 * np.sqrt(Q[c, c])
        estimated[lp] = True
    drift_corr = -np.where(np.isfinite(rate[loop]), rate[loop], np.nan) * dt
    g_read = value - offset[loop] + drift_corr
    with np.errstate(invalid="ignore"):
        residual = g_read - np.where(station >= 0, gravity[np.clip(station, 0, None)], np.nan)
    used = solution["use"]
    n_used = np.bincount(station[used], minlength=n_stations)
    return NetworkResult(
        gravity=gravity, sigma=sigma, n_used=n_used, offset=offset, drift_rate=rate, drift_sigma=rate_sigma,
        drift_estimated=estimated, drift_corr=drift_corr, g_read=g_read, residual=residual, used=used,
        outlier=outlier, station_tied=station_tied, loop_tied=loop_tied, sigma0=s0,
        redundancy=int(solution["redundancy"]),
    )
