# SPDX-License-Identifier: GPL-2.0-or-later
"""Upward continuation against the closed form of a point mass and against harmonica."""

from __future__ import annotations

import numpy as np
import pytest

from relief_gravity.algorithms.separation import ContinuationSettings, continuation_filter, upward_continuation

DEPTH = 2000.0
CELL = 250.0


def point_mass(xx, yy, depth):
    """Vertical attraction of a point mass at ``depth`` below the grid, up to G*M (closed form)."""
    return depth / (xx**2 + yy**2 + depth**2) ** 1.5


def grid(n):
    # Odd n puts a cell centre exactly above the mass.
    c = (np.arange(n) - n // 2) * CELL
    return np.meshgrid(c, c)


@pytest.mark.parametrize(
    ("rise", "ratio"),
    # (2000/2500)^2, (2000/3000)^2, (2000/4000)^2: the peak of a point mass at
    # depth z falls as 1/z^2 (closed form g_z = G M z / (r^2 + z^2)^1.5).
    [(500.0, 0.64), (1000.0, 0.4444444), (2000.0, 0.25)],
)
def test_point_mass_peak_and_field_within_one_percent(rise, ratio):
    xx, yy = grid(301)  # 75 km square, mass under the centre
    observed = point_mass(xx, yy, DEPTH)
    continued = upward_continuation(observed, CELL, CELL, rise)
    peak = continued[150, 150] / observed[150, 150]
    assert peak == pytest.approx(ratio, rel=0.01)
    exact = point_mass(xx, yy, DEPTH + rise)
    assert np.max(np.abs(continued - exact)) < 0.01 * exact.max()


def test_padding_matters_on_a_small_grid():
    # Without padding the periodic FFT wraps the field round: worse than padded.
    xx, yy = grid(81)
    observed = point_mass(xx, yy, DEPTH)
    exact = point_mass(xx, yy, DEPTH + 2000.0)
    padded = upward_continuation(observed, CELL, CELL, 2000.0)
    bare = upward_continuation(observed, CELL, CELL, 2000.0, ContinuationSettings(pad_fraction=0.0, taper=False))
    err_padded = np.max(np.abs(padded - exact))
    err_bare = np.max(np.abs(bare - exact))
    assert err_padded < err_bare


def test_plane_continues_to_itself():
    # A plane is harmonic: continued upward it stays the same plane.
    xx, yy = grid(41)
    plane = 3.0 + 0.002 * xx - 0.001 * yy
    out = upward_continuation(plane, CELL, CELL, 1000.0)
    np.testing.assert_allclose(out, plane, atol=1e-9)


def test_blank_cells_stay_blank():
    xx, yy = grid(41)
    g = point_mass(xx, yy, DEPTH)
    g[:5, :7] = np.nan
    out = upward_continuation(g, CELL, CELL, 1000.0)
    assert np.all(np.isnan(out[:5, :7]))
    assert np.all(np.isfinite(out[np.isfinite(g)]))


def test_filter_at_zero_and_known_wavenumber():
    f = continuation_filter(8, 8, 100.0, 100.0, 100.0)
    assert f[0, 0] == 1.0
    # kx = 2 pi / 800 m at index 1: exp(-2 pi * 100 / 800) (closed form).
    assert f[0, 1] == pytest.approx(np.exp(-2 * np.pi * 100 / 800))


@pytest.mark.parametrize(
    ("kwargs", "match"),
    [
        ({"height": -10.0}, "upward"),
        ({"height": float("nan")}, "upward"),
        ({"cell_x": 0.0}, "positive"),
    ],
)
def test_bad_input_is_refused(kwargs, match):
    args = {"grid": np.ones((5, 5)), "cell_x": 100.0, "cell_y": 100.0, "height": 100.0}
    args.update(kwargs)
    with pytest.raises(ValueError, match=match):
        upward_continuation(**args)


def test_refuses_empty_and_one_dimensional_grids():
    with pytest.raises(ValueError, match="no value"):
        upward_continuation(np.full((4, 4), np.nan), 100.0, 100.0, 10.0)
    with pytest.raises(ValueError, match="2-D"):
        upward_continuation(np.ones(5), 100.0, 100.0, 10.0)


def test_against_harmonica():
    """harmonica's upward_continuation (a general-purpose library, test-only reference).

    harmonica pads nothing itself; its documentation asks the user to pad the
    grid first. The point-mass field is practically zero at the edges of this
    grid, so both should agree with each other to far better than 1 %.
    """
    try:
        import harmonica
        import verde
    except Exception as error:  # pragma: no cover - depends on the machine
        pytest.skip(f"harmonica not importable here ({error}); install requirements-dev.txt")
    xx, yy = grid(241)
    observed = point_mass(xx, yy, DEPTH) * 1e9
    ours = upward_continuation(observed, CELL, CELL, 1000.0)
    data = verde.make_xarray_grid((xx[0], yy[:, 0]), observed, data_names="g").g
    import warnings

    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        theirs = harmonica.upward_continuation(data, 1000.0).values
    assert np.max(np.abs(ours - theirs)) < 0.005 * np.max(observed)
    print(f"harmonica {harmonica.__version__}: max difference {np.max(np.abs(ours - theirs)) / observed.max():.2e} of the peak")
