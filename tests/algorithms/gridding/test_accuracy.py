# SPDX-License-Identifier: GPL-2.0-or-later
"""Recovery of a smooth synthetic anomaly, side by side with scipy 1.10."""

from __future__ import annotations

import numpy as np
import numpy.testing as npt
import pytest
from scipy.interpolate import RBFInterpolator, griddata
from scipy.spatial import Delaunay

from relief_gravity.algorithms.gridding import (
    GridGeometry,
    biharmonic_spline,
    minimum_curvature,
)

#: Gaussian bodies (x0 m, y0 m, amplitude mGal, width m): an invented
#: smooth anomaly of about 20 mGal range (common practice, no source).
BODIES = (
    (6e3, 7e3, 12.0, 2.5e3),
    (14e3, 13e3, -8.0, 3e3),
    (10e3, 4e3, 5.0, 1.8e3),
    (4e3, 15e3, -6.0, 2.2e3),
)


def anomaly(x, y):
    out = np.zeros(np.broadcast(x, y).shape)
    for x0, y0, amp, width in BODIES:
        out += amp * np.exp(-((x - x0) ** 2 + (y - y0) ** 2) / (2 * width**2))
    return out


@pytest.fixture(scope="module")
def survey():
    rng = np.random.default_rng(42)
    x = rng.uniform(0, 20e3, 300)
    y = rng.uniform(0, 20e3, 300)
    g = GridGeometry(0.0, 20e3, 200.0, 100, 100)
    xx, yy = np.meshgrid(g.x_centres, g.y_centres)
    hull = Delaunay(np.column_stack([x, y])).find_simplex(np.column_stack([xx.ravel(), yy.ravel()]))
    inside = (hull >= 0).reshape(xx.shape)
    return x, y, anomaly(x, y), g, xx, yy, inside


def _rms(grid, truth, inside):
    return float(np.sqrt(np.mean((grid - truth)[inside] ** 2)))


@pytest.fixture(scope="module")
def scipy_cubic_rms(survey):
    x, y, v, _g, xx, yy, inside = survey
    cubic = griddata((x, y), v, (xx, yy), method="cubic")  # scipy 1.10 Clough-Tocher
    return _rms(cubic, anomaly(xx, yy), inside)


def test_scipy_reference_is_sane(scipy_cubic_rms):
    # Measured with scipy 1.10.1: 0.045 mGal.
    assert 0.01 < scipy_cubic_rms < 0.1


@pytest.mark.parametrize(
    ("tension", "factor", "bound"),
    [(0.0, 1.5, 0.08), (0.25, 4.5, 0.25)],
    ids=["T=0", "T=0.25"],
)
def test_minimum_curvature_recovers_gaussian_bodies(survey, scipy_cubic_rms, tension, factor, bound):
    # Measured (numpy 1.24.2, scipy 1.10.1): RMS 0.045 mGal at T = 0 and
    # 0.16 at T = 0.25 against 0.045 for griddata(cubic), over the nodes in
    # the stations' hull; range of the field about 20 mGal (so 0.2 % and
    # 0.8 %). Tension trades accuracy on smooth fields for less overshoot
    # near steep ones; bounds leave ~50 % headroom over the measured values.
    x, y, v, g, xx, yy, inside = survey
    grid = minimum_curvature(x, y, v, g, tension=tension)
    rms = _rms(grid, anomaly(xx, yy), inside)
    assert rms < factor * scipy_cubic_rms
    assert rms < bound


def test_biharmonic_spline_equals_scipy_thin_plate(survey):
    # Same interpolant as scipy 1.10 RBFInterpolator(kernel="thin_plate_spline",
    # degree=1): r^2 ln r and r^2 (ln r - 1) differ by r^2, which the side
    # conditions reduce to a constant (see biharmonic_spline Notes).
    x, y, v, g, xx, yy, inside = survey
    ours = biharmonic_spline(x, y, v, g)
    rbf = RBFInterpolator(np.column_stack([x, y]), v, kernel="thin_plate_spline", degree=1)
    theirs = rbf(np.column_stack([xx.ravel(), yy.ravel()])).reshape(xx.shape)
    npt.assert_allclose(ours, theirs, rtol=0, atol=1e-7 * np.ptp(v))
    # Measured: 0.042 mGal RMS in the hull.
    assert _rms(ours, anomaly(xx, yy), inside) < 0.06
