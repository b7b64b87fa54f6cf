# SPDX-License-Identifier: GPL-2.0-or-later
"""Upward continuation of a gridded anomaly by FFT (Blakely 1995).

A potential-field anomaly measured on a level surface is continued to a
level ``h`` metres higher by multiplying its 2-D Fourier transform by

.. math:: \\mathcal{F}[\\Delta g_{z_0 - h}] = \\mathcal{F}[\\Delta g_{z_0}]\\; e^{-|k| h},
          \\qquad |k| = 2\\pi\\sqrt{f_x^2 + f_y^2}

(Blakely 1995, Potential Theory in Gravity and Magnetic Applications,
Cambridge University Press, section 12.1, eq. 12.9, from memory). The
continued field is smoother: it keeps the long wavelengths of deep sources,
so it serves as the regional field and the difference as the residual.

The discrete transform treats the grid as periodic, so the edges are
prepared first (common practice, no source beyond Blakely's ch. 12
discussion): blanked cells are filled with the nearest valid value, the
least-squares plane is removed (a plane continues to itself and is added
back), the grid is extended by mirror images on every side and the
extension is faded to zero with a cosine (Tukey) taper.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt
from scipy import fft as _fft
from scipy import ndimage


@dataclass(frozen=True)
class ContinuationSettings:
    """How the grid edges are prepared for the FFT.

    Attributes
    ----------
    pad_fraction : float
        Width of the extension on each side as a fraction of the grid's
        size along that axis (0.5 = the padded grid is twice as large).
    taper : bool
        Fade the extension to zero with a cosine taper.
    """

    pad_fraction: float = 0.5
    taper: bool = True


def continuation_filter(n_rows: int, n_cols: int, cell_y: float, cell_x: float, height: float) -> np.ndarray:
    """The upward-continuation filter :math:`e^{-|k| h}` on a real-FFT frequency grid.

    Parameters
    ----------
    n_rows, n_cols : int
        Grid shape.
    cell_y, cell_x : float
        Cell sizes in m.
    height : float
        Rise in m (>= 0).

    Returns
    -------
    numpy.ndarray
        Shape ``(n_rows, n_cols // 2 + 1)`` (``scipy.fft.rfft2`` layout).

    References
    ----------
    Blakely, R. J., 1995, Potential Theory in Gravity and Magnetic
    Applications, Cambridge University Press, ch. 12 (from memory).

    Examples
    --------
    >>> f = continuation_filter(4, 4, 100.0, 100.0, 50.0)
    >>> print(f.shape, float(f[0, 0]), round(float(f[0, 1]), 4))
    (4, 3) 1.0 0.4559
    """
    ky = 2.0 * np.pi * _fft.fftfreq(n_rows, d=cell_y)
    kx = 2.0 * np.pi * _fft.rfftfreq(n_cols, d=cell_x)
    k = np.hypot(ky[:, None], kx[None, :])
    return np.exp(-k * height)


def _fill_nearest(values: np.ndarray) -> np.ndarray:
    missing = ~np.isfinite(values)
    if not missing.any():
        return values
    index = ndimage.distance_transform_edt(missing, return_distances=False, return_indices=True)
    return values[tuple(index)]


def _plane(values: np.ndarray) -> np.ndarray:
    rows, cols = np.indices(values.shape, dtype=float)
    design = np.stack([np.ones(values.size), rows.ravel(), cols.ravel()], axis=1)
    coefficients = np.linalg.lstsq(design, values.ravel(), rcond=None)[0]
    return (design @ coefficients).reshape(values.shape)


def _taper_weights(n: int, pad_before: int, pad_after: int) -> np.ndarray:
    """1 over the data, cosine fade to 0 across each extension."""
    w = np.ones(n + pad_before + pad_after)
    if pad_before:
        t = (np.arange(pad_before) + 0.5) / pad_before
        w[:pad_before] = 0.5 - 0.5 * np.cos(np.pi * t)
    if pad_after:
        t = (np.arange(pad_after) + 0.5) / pad_after
        w[n + pad_before :] = 0.5 + 0.5 * np.cos(np.pi * t)
    return w


def upward_continuation(
    grid: npt.ArrayLike,
    cell_x: float,
    cell_y: float,
    height: float,
    settings: ContinuationSettings = ContinuationSettings(),
) -> np.ndarray:
    """Continue a gridded anomaly upward by ``height`` metres.

    Parameters
    ----------
    grid : array_like
        2-D anomaly on a level surface (e.g. mGal); NaN marks blanked cells.
        Rows may run north or south: the filter is symmetric.
    cell_x, cell_y : float
        Cell sizes in m (> 0).
    height : float
        Rise in m (>= 0; 0 returns the input).
    settings : ContinuationSettings
        Edge padding and taper.

    Returns
    -------
    numpy.ndarray
        The continued anomaly, NaN where the input was NaN.

    Raises
    ------
    ValueError
        For a negative height (downward continuation is unstable and not
        offered), non-positive cell sizes, a grid smaller than 2 x 2 or one
        without a value.

    Notes
    -----
    :math:`g_h = \\mathcal{F}^{-1}[\\mathcal{F}[g - p]\\,e^{-|k|h}] + p`, p
    the least-squares plane, on the mirror-padded, tapered grid (Blakely
    1995, ch. 12, from memory).

    Examples
    --------
    >>> flat = np.full((8, 8), 3.0)
    >>> print(float(np.max(np.abs(upward_continuation(flat, 100.0, 100.0, 500.0) - 3.0))) < 1e-12)
    True
    """
    g = np.array(grid, dtype=float)
    if g.ndim != 2 or min(g.shape) < 2:
        msg = f"the grid must be 2-D with at least 2 x 2 cells, got shape {g.shape}"
        raise ValueError(msg)
    if not (cell_x > 0 and cell_y > 0):
        msg = f"cell sizes must be positive (m), got {cell_x}, {cell_y}"
        raise ValueError(msg)
    if not np.isfinite(height) or height < 0:
        msg = f"the continuation height must be >= 0 m (upward), got {height}"
        raise ValueError(msg)
    if not (0 <= settings.pad_fraction <= 4):
        msg = f"pad_fraction must be within 0-4, got {settings.pad_fraction}"
        raise ValueError(msg)
    blank = ~np.isfinite(g)
    if blank.all():
        msg = "the grid has no value to continue"
        raise ValueError(msg)
    if height == 0:
        return g
    filled = _fill_nearest(g)
    plane = _plane(filled)
    work = filled - plane
    n_rows, n_cols = work.shape
    pr = int(np.ceil(settings.pad_fraction * n_rows))
    pc = int(np.ceil(settings.pad_fraction * n_cols))
    # Mirror images keep the field continuous across the edge; the fast
    # FFT length is reached by adding to the far side.
    total_rows = _fft.next_fast_len(n_rows + 2 * pr, real=True)
    total_cols = _fft.next_fast_len(n_cols + 2 * pc, real=True)
    pads = ((pr, total_rows - n_rows - pr), (pc, total_cols - n_cols - pc))
    padded = np.pad(work, pads, mode="symmetric") if (pr or pc) else work
    if settings.taper and (pr or pc):
        padded = padded * np.outer(_taper_weights(n_rows, *pads[0]), _taper_weights(n_cols, *pads[1]))
    spectrum = _fft.rfft2(padded)
    spectrum *= continuation_filter(total_rows, total_cols, cell_y, cell_x, height)
    continued = _fft.irfft2(spectrum, s=padded.shape)[pr : pr + n_rows, pc : pc + n_cols] + plane
    continued[blank] = np.nan
    return continued
