# SPDX-License-Identifier: GPL-2.0-or-later
"""Exceptions of the terrain-correction code."""

from __future__ import annotations


class TerrainCancelled(RuntimeError):
    """Raised when the caller's ``is_cancelled()`` returns True during a run.

    Examples
    --------
    >>> raise TerrainCancelled("terrain correction cancelled")
    Traceback (most recent call last):
    ...
    relief_gravity.algorithms.terrain._errors.TerrainCancelled: terrain correction cancelled
    """
