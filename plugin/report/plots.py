# SPDX-License-Identifier: GPL-2.0-or-later
"""The report's plots as PNG bytes (matplotlib, Agg backend; numpy arrays in, no layers).

Each function draws one figure and returns it encoded; NaN values are left
out and counted in the caller's text. Axis labels and legends go through
``_tr`` (context "SurveyReport") like the report's sentences.
"""

from __future__ import annotations

import io

import numpy as np
from qgis.PyQt.QtCore import QCoreApplication

#: Figure width in inches and resolution (common screen proportions, no source).
WIDTH = 9.0
DPI = 110


def _tr(text: str) -> str:
    return QCoreApplication.translate("SurveyReport", text)


def _pyplot():
    import matplotlib

    matplotlib.use("Agg", force=True)
    import matplotlib.pyplot as plt

    return plt


def _encode(fig) -> bytes:
    plt = _pyplot()
    buffer = io.BytesIO()
    fig.savefig(buffer, format="png", dpi=DPI, bbox_inches="tight")
    plt.close(fig)
    return buffer.getvalue()


def _finite(*arrays):
    mask = np.ones(len(arrays[0]), dtype=bool)
    for array in arrays:
        mask &= np.isfinite(np.asarray(array, dtype=float))
    return [np.asarray(array, dtype=float)[mask] for array in arrays]


def histograms(series: dict, units: str = "mGal") -> bytes:
    """One histogram panel per named array (e.g. faa, sba, cba)."""
    plt = _pyplot()
    names = [name for name, values in series.items() if np.isfinite(np.asarray(values, dtype=float)).any()]
    fig, axes = plt.subplots(1, max(1, len(names)), figsize=(WIDTH, 3.0), squeeze=False)
    for ax, name in zip(axes[0], names):
        (values,) = _finite(series[name])
        ax.hist(values, bins=min(40, max(5, int(np.sqrt(values.size)) + 1)), color="#2b83ba", edgecolor="white")
        ax.set_title(f"{name} (n = {values.size})")
        ax.set_xlabel(units)
        ax.axvline(np.median(values), color="#d7191c", lw=1, label=_tr("median {}").format(f"{np.median(values):.2f}"))
        ax.legend(fontsize=8)
    axes[0][0].set_ylabel(_tr("stations"))
    fig.tight_layout()
    return _encode(fig)


def linear_fit(height, values):
    """Least-squares slope (units per metre) and intercept; (nan, nan) with fewer than 3 points.

    Examples
    --------
    >>> linear_fit([0.0, 100.0, 200.0], [1.0, 2.0, 3.0])
    (0.01, 1.0)
    """
    h, v = _finite(height, values)
    if h.size < 3 or np.ptp(h) == 0:
        return float("nan"), float("nan")
    slope, intercept = np.polyfit(h, v, 1)
    return round(float(slope), 12), round(float(intercept), 12)


def anomaly_against_height(height, anomalies: dict) -> bytes:
    """Anomalies against station height with their least-squares lines."""
    plt = _pyplot()
    fig, ax = plt.subplots(figsize=(WIDTH, 4.2))
    colours = {"faa": "#2b83ba", "sba": "#fdae61", "cba": "#d7191c"}
    for name, values in anomalies.items():
        h, v = _finite(height, values)
        if h.size == 0:
            continue
        colour = colours.get(name, "#555555")
        slope, intercept = linear_fit(h, v)
        label = f"{name}: {slope:+.4f} mGal/m" if np.isfinite(slope) else name
        ax.scatter(h, v, s=9, color=colour, alpha=0.7, label=label)
        if np.isfinite(slope):
            line = np.array([h.min(), h.max()])
            ax.plot(line, slope * line + intercept, color=colour, lw=1.2)
    ax.set_xlabel(_tr("station height (m)"))
    ax.set_ylabel(_tr("anomaly (mGal)"))
    ax.grid(alpha=0.3)
    ax.legend(fontsize=8, title=_tr("least-squares slope"), title_fontsize=8)
    fig.tight_layout()
    return _encode(fig)


def terrain_by_zone(tc_inner, tc_outer) -> bytes:
    """Inner and outer terrain correction per station (sorted by total) and the inner share."""
    plt = _pyplot()
    inner, outer = _finite(tc_inner, tc_outer)
    order = np.argsort(inner + outer)
    fig, (left, right) = plt.subplots(1, 2, figsize=(WIDTH, 3.4), gridspec_kw={"width_ratios": [2, 1]})
    rank = np.arange(inner.size)
    left.fill_between(rank, 0, inner[order], color="#fdae61", label=_tr("inner zone"), step="mid")
    left.fill_between(rank, inner[order], inner[order] + outer[order], color="#2b83ba", label=_tr("outer zone"),
                      step="mid")
    left.set_xlabel(_tr("stations, sorted by total correction"))
    left.set_ylabel(_tr("terrain correction (mGal)"))
    left.legend(fontsize=8)
    total = inner + outer
    share = np.divide(inner, total, out=np.full_like(total, np.nan), where=total > 0)
    right.hist(share[np.isfinite(share)] * 100.0, bins=20, range=(0, 100), color="#fdae61", edgecolor="white")
    right.set_xlabel(_tr("inner-zone share of the total (%)"))
    right.set_ylabel(_tr("stations"))
    fig.tight_layout()
    return _encode(fig)


def station_map(x, y, values, label: str, cmap: str = "Spectral_r") -> bytes:
    """Stations coloured by a value, with a colour bar (equal axes, map units)."""
    plt = _pyplot()
    xs, ys, vs = _finite(x, y, values)
    fig, ax = plt.subplots(figsize=(WIDTH * 0.75, WIDTH * 0.6))
    if vs.size:
        low, high = np.percentile(vs, [2, 98]) if vs.size > 2 else (vs.min(), vs.max())
        points = ax.scatter(xs, ys, c=vs, s=22, cmap=cmap, vmin=low, vmax=high if high > low else low + 1,
                            edgecolors="k", linewidths=0.3)
        fig.colorbar(points, ax=ax, label=label, extend="both", shrink=0.85)
    ax.set_aspect("equal")
    ax.set_xlabel(_tr("easting"))
    ax.set_ylabel(_tr("northing"))
    ax.ticklabel_format(useOffset=False, style="plain")
    # Six-digit map coordinates: few ticks, so the labels do not run together.
    ax.xaxis.set_major_locator(plt.MaxNLocator(4))
    ax.yaxis.set_major_locator(plt.MaxNLocator(5))
    ax.grid(alpha=0.25)
    fig.tight_layout()
    return _encode(fig)
