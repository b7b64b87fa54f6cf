# SPDX-License-Identifier: GPL-2.0-or-later
"""The sparse network adjustment against a dense weighted least-squares solution written here.

Second, independent implementation: the design matrix built densely from the
observation equations (docs/readings.md), solved by numpy.linalg.lstsq on
the weighted system, with the covariance and diag(A Q A^T) from its
pseudo-inverse. Invented networks only.
"""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.survey import DEFAULT_KNOWN_SIGMA, DEFAULT_READING_SIGMA, adjust_network


def invented_network(n_stations, per_loop, seed):
    """Loops from one of two known bases through ``per_loop`` new stations and one old one, back to the base."""
    rng = np.random.default_rng(seed)
    truth = 980_000.0 + rng.uniform(-50.0, 50.0, n_stations)
    known = np.full(n_stations, np.nan)
    known[:2] = truth[:2]
    station, loop, hours, value = [], [], [], []
    order = rng.permutation(np.arange(2, n_stations))
    for number, start in enumerate(range(0, len(order), per_loop)):
        base = number % 2
        visits = [base, *order[start : start + per_loop], order[max(start - 1, 0)], base]
        offset, rate = rng.uniform(-100.0, 100.0), rng.normal(0.0, 0.03)
        for j, s in enumerate(visits):
            t = number * 24.0 + 8.0 + 0.25 * j
            station.append(s)
            loop.append(number)
            hours.append(t)
            value.append(truth[s] - 978_000.0 + offset + rate * (t - number * 24.0 - 8.0) + rng.normal(0.0, 0.01))
    return np.array(value), np.array(station), np.array(loop), np.array(hours), known, truth


def dense_reference(value, station, loop, hours, known):
    """Weighted least squares with a dense design: unknowns g (read stations), o_L, d_L (every loop)."""
    stations = np.unique(station)
    loops = np.unique(loop)
    col = {s: i for i, s in enumerate(stations)}
    n_s, n_l = len(stations), len(loops)
    t0 = np.array([hours[loop == lp].min() for lp in loops])
    knowns = [s for s in stations if np.isfinite(known[s])]
    a = np.zeros((len(value) + len(knowns), n_s + 2 * n_l))
    obs = np.concatenate([value, known[knowns]])
    w = np.ones(len(obs))
    for k in range(len(value)):
        a[k, col[station[k]]] = 1.0
        a[k, n_s + loop[k]] = 1.0
        a[k, n_s + n_l + loop[k]] = hours[k] - t0[loop[k]]
    for j, s in enumerate(knowns):
        a[len(value) + j, col[s]] = 1.0
        w[len(value) + j] = (DEFAULT_READING_SIGMA / DEFAULT_KNOWN_SIGMA) ** 2
    root = np.sqrt(w)
    x, *_ = np.linalg.lstsq(a * root[:, None], obs * root, rcond=None)
    v = obs - a @ x
    s0 = np.sqrt(np.sum(w * v * v) / (len(obs) - a.shape[1]))
    q = np.linalg.pinv((a * w[:, None]).T @ a)
    gravity = np.full(len(known), np.nan)
    sigma = np.full(len(known), np.nan)
    gravity[stations] = x[:n_s]
    sigma[stations] = s0 * np.sqrt(np.diag(q)[:n_s])
    qvv = 1.0 / w - np.sum((a @ q) * a, axis=1)
    return gravity, sigma, x[n_s + n_l :], s0, v[: len(value)], qvv[: len(value)]


@pytest.mark.parametrize(("n_stations", "per_loop", "seed"), [(60, 8, 1), (400, 25, 2)])
def test_sparse_adjustment_equals_the_dense_solution(n_stations, per_loop, seed):
    value, station, loop, hours, known, truth = invented_network(n_stations, per_loop, seed)
    ours = adjust_network(value, station, loop, hours, known)
    gravity, sigma, rates, s0, v, qvv = dense_reference(value, station, loop, hours, known)
    np.testing.assert_allclose(ours.gravity, gravity, rtol=0, atol=1e-6)  # normal equations vs QR: 1e-8 mGal of 980,000
    np.testing.assert_allclose(ours.sigma, sigma, rtol=1e-7)
    np.testing.assert_allclose(ours.drift_rate, rates, rtol=0, atol=1e-7)  # mGal/h
    assert ours.sigma0 == pytest.approx(s0, rel=1e-9)
    # Residuals: g_read - g = r - o - d dt - g, the adjustment's v of each reading.
    np.testing.assert_allclose(ours.residual, v, rtol=0, atol=1e-6)
    assert np.all(qvv > -1e-12)  # zero for a station read once: nothing checks that reading
    assert np.abs(ours.gravity - truth).max() < 0.06  # 0.01 mGal readings, 25 to a loop


def test_a_blunder_is_flagged_where_the_dense_solution_flags_it():
    value, station, loop, hours, known, _ = invented_network(400, 25, 3)
    # The re-read of an earlier station near the end of loop 3, 0.2 mGal off.
    k = int(np.flatnonzero(loop == 3)[-2])
    value[k] += 0.2
    ours = adjust_network(value, station, loop, hours, known)
    _, _, _, s0, v, qvv = dense_reference(value, station, loop, hours, known)
    checked = qvv > 1e-10
    w = np.zeros_like(v)
    w[checked] = v[checked] / (s0 * np.sqrt(qvv[checked]))
    np.testing.assert_array_equal(ours.outlier, np.abs(w) > 3.0)
    assert ours.outlier[k]
