# SPDX-License-Identifier: GPL-2.0-or-later
"""Spatial partition of stations into compact chunks.

Recursive bisection: a group larger than the chunk size is split across its
longer side at a station count that is a multiple of the chunk size, so the
chunks are full and each covers a compact rectangle (a task then reads a small
raster window). Stations without a position form chunks of their own. The
result depends only on the positions and the chunk size, so a resumed run
finds the same chunks.

Examples
--------
>>> import numpy as np
>>> x = np.array([0.0, 10.0, 1.0, 11.0, np.nan]); y = np.zeros(5)
>>> [c.tolist() for c in partition(x, y, 2)]
[[0, 2], [1, 3], [4]]
"""

from __future__ import annotations

import numpy as np


def partition(x: np.ndarray, y: np.ndarray, size: int) -> list[np.ndarray]:
    """Index arrays (sorted, disjoint, covering every station) of compact chunks."""
    if size < 1:
        msg = f"chunk size must be >= 1, got {size}"
        raise ValueError(msg)
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    ok = np.isfinite(x) & np.isfinite(y)
    chunks: list[np.ndarray] = []
    stack = [np.flatnonzero(ok)]
    while stack:
        part = stack.pop()
        if part.size <= size:
            if part.size:
                chunks.append(np.sort(part))
            continue
        px, py = x[part], y[part]
        coord = px if np.ptp(px) >= np.ptp(py) else py
        order = part[np.argsort(coord, kind="stable")]
        pieces = -(-part.size // size)
        cut = -(-pieces // 2) * size
        # Pushed right first so the left half comes out first.
        stack.append(order[cut:])
        stack.append(order[:cut])
    rest = np.flatnonzero(~ok)
    chunks.extend(rest[i : i + size] for i in range(0, rest.size, size))
    return chunks


def footprint(x: np.ndarray, y: np.ndarray, chunks: list[np.ndarray]) -> float:
    """Mean bounding-box diagonal of the chunks (CRS units), for the log."""
    sizes = []
    for c in chunks:
        cx, cy = x[c], y[c]
        good = np.isfinite(cx) & np.isfinite(cy)
        if good.sum() > 1:
            sizes.append(float(np.hypot(np.ptp(cx[good]), np.ptp(cy[good]))))
    return float(np.mean(sizes)) if sizes else 0.0
