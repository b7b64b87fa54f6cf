# SPDX-License-Identifier: GPL-2.0-or-later
"""Counter units to mGal, and the reduction from the sensor to the station mark."""

from __future__ import annotations

import warnings
from dataclasses import dataclass

import numpy as np

#: Free-air gradient used when no measured gradient is given, mGal/m
#: (first-order normal gradient; Hinze et al. 2005).
FREE_AIR_GRADIENT = 0.3086


@dataclass(frozen=True)
class CalibrationTable:
    """A meter's calibration table: counter reading -> mGal, piecewise linear.

    Row ``i`` covers counter readings from ``counter[i]`` up to
    ``counter[i + 1]``::

        mGal = mgal[i] + factor[i] * (C - counter[i])

    The last row closes the table: its counter value is the upper end of the
    range (its own factor is used only at that end point).

    Attributes
    ----------
    counter : tuple of float
        Lower bound of each interval, counter units, strictly increasing.
    mgal : tuple of float
        Value in mGal at each lower bound.
    factor : tuple of float
        mGal per counter unit within each interval (positive).

    Examples
    --------
    >>> table = CalibrationTable.from_rows([0, 100, 200], [0.0, 101.0, 203.0], [1.01, 1.02, 1.03])
    >>> float(table.to_mgal(150.0))
    152.0
    >>> float(table.to_counter(152.0))
    150.0
    """

    counter: tuple
    mgal: tuple
    factor: tuple

    @classmethod
    def from_rows(cls, counter, mgal, factor, tolerance: float = 0.05) -> CalibrationTable:
        """Check and build a table (rows in any order).

        Raises ``ValueError`` for fewer than two rows, non-finite values,
        repeated counter values or non-positive factors. Warns when a row's
        value differs from the previous row's line by more than
        ``tolerance`` mGal (a typing error in the table, usually).
        """
        c, g, f = (np.asarray(v, dtype=float).ravel() for v in (counter, mgal, factor))
        if not (len(c) == len(g) == len(f)):
            msg = "the calibration table's columns counter, mgal and factor differ in length"
            raise ValueError(msg)
        if len(c) < 2:
            msg = f"a calibration table needs at least two rows, got {len(c)}"
            raise ValueError(msg)
        if not (np.all(np.isfinite(c)) and np.all(np.isfinite(g)) and np.all(np.isfinite(f))):
            msg = "the calibration table has empty or non-numeric values"
            raise ValueError(msg)
        order = np.argsort(c, kind="stable")
        c, g, f = c[order], g[order], f[order]
        if np.any(np.diff(c) <= 0):
            repeated = c[1:][np.diff(c) <= 0][0]
            msg = f"the calibration table repeats the counter value {repeated}"
            raise ValueError(msg)
        if np.any(f <= 0):
            msg = f"calibration factors must be positive mGal per counter unit, got {f[f <= 0][0]}"
            raise ValueError(msg)
        if np.any(np.diff(g) <= 0):
            msg = "the calibration table's mGal values must increase with the counter values"
            raise ValueError(msg)
        predicted = g[:-1] + f[:-1] * np.diff(c)
        jump = np.abs(predicted - g[1:])
        if np.any(jump > tolerance):
            k = int(np.argmax(jump))
            warnings.warn(
                f"calibration row at counter {c[k + 1]}: {g[k + 1]} mGal, but the previous row's line gives "
                f"{predicted[k]:.3f} mGal; check the table",
                stacklevel=2,
            )
        return cls(tuple(c.tolist()), tuple(g.tolist()), tuple(f.tolist()))

    @property
    def counter_range(self) -> tuple:
        """(lowest, highest) counter reading the table covers."""
        return self.counter[0], self.counter[-1]

    def to_mgal(self, counter_reading):
        """MGal for counter readings (NaN stays NaN).

        Raises
        ------
        ValueError
            For a reading outside the table's range, naming it and the range.
        """
        values = np.asarray(counter_reading, dtype=float)
        low, high = self.counter_range
        outside = np.isfinite(values) & ((values < low) | (values > high))
        if np.any(outside):
            msg = (
                f"counter reading {values[outside].ravel()[0]} is outside the calibration table's range "
                f"{low} to {high}"
            )
            raise ValueError(msg)
        c = np.asarray(self.counter)
        row = np.clip(np.searchsorted(c, values, side="right") - 1, 0, len(c) - 2)
        row = np.where(np.isfinite(values), row, 0)
        return np.asarray(self.mgal)[row] + np.asarray(self.factor)[row] * (values - c[row])

    def to_counter(self, mgal_value):
        """Counter reading for mGal values: the inverse of :meth:`to_mgal`."""
        values = np.asarray(mgal_value, dtype=float)
        c = np.asarray(self.counter)
        g = np.asarray(self.mgal)
        f = np.asarray(self.factor)
        top = g[-2] + f[-2] * (c[-1] - c[-2])
        outside = np.isfinite(values) & ((values < g[0]) | (values > top))
        if np.any(outside):
            msg = f"{values[outside].ravel()[0]} mGal is outside the calibration table's range {g[0]} to {top}"
            raise ValueError(msg)
        # Interval bounds in mGal as the rows' own lines reach them.
        starts = g[:-1]
        row = np.clip(np.searchsorted(starts, values, side="right") - 1, 0, len(c) - 2)
        row = np.where(np.isfinite(values), row, 0)
        return c[row] + (values - g[row]) / f[row]


def counter_to_mgal(reading, table: CalibrationTable | None = None, scale_factor: float = 1.0):
    """Meter reading to mGal: through a calibration table, then a scale factor.

    ``mGal = scale_factor * table(reading)``, or ``scale_factor * reading``
    without a table (a reading already in mGal, or counter units with a single
    factor).

    Examples
    --------
    >>> float(counter_to_mgal(2000.0, scale_factor=1.0005))
    2001.0
    """
    if not np.isfinite(scale_factor) or scale_factor <= 0:
        msg = f"the scale factor must be positive, got {scale_factor}"
        raise ValueError(msg)
    values = np.asarray(reading, dtype=float)
    if table is not None:
        values = table.to_mgal(values)
    return scale_factor * values


def instrument_height_correction(instrument_height, gradient=FREE_AIR_GRADIENT):
    """Correction (mGal) that reduces a reading from the sensor to the station mark.

    ``correction = gradient * h_i``: the sensor ``h_i`` metres above the mark
    reads ``gradient * h_i`` less than at the mark, so the correction is
    added to the reading. ``gradient`` is the vertical decrease of gravity
    upward in mGal/m: 0.3086 (the first-order free-air gradient, Hinze et
    al. 2005) or a value measured at the station.

    Parameters
    ----------
    instrument_height : array_like
        Metres of the sensor above the mark (negative below it).
    gradient : array_like
        mGal/m, positive when gravity decreases upward.

    Examples
    --------
    >>> round(float(instrument_height_correction(0.25)), 5)
    0.07715
    """
    return np.asarray(gradient, dtype=float) * np.asarray(instrument_height, dtype=float)
