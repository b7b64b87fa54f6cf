# SPDX-License-Identifier: GPL-2.0-or-later
"""PNG figures of a density estimate (matplotlib, Agg back end: no display needed)."""

from __future__ import annotations

import numpy as np


def _figure(n_panels: int):
    import matplotlib

    matplotlib.use("Agg", force=False)
    from matplotlib.figure import Figure

    figure = Figure(figsize=(6.0 * n_panels, 4.6), dpi=110, layout="constrained")
    return figure, [figure.add_subplot(1, n_panels, k + 1) for k in range(n_panels)]


def parasnis_plot(path: str, unit_term, faa_left, fit, labels: dict) -> None:
    """Free-air anomaly (regional removed) against the unit Bouguer term, with the fitted line.

    ``faa_left`` is the free-air anomaly minus the fitted regional term, so
    the points scatter about a line through the origin of slope rho.
    """
    figure, (axis,) = _figure(1)
    b = np.asarray(unit_term) * 1000.0  # mGal per g/cm^3 reads better
    axis.scatter(b, faa_left, s=10, color="#3b6fb6", alpha=0.75, label=labels["stations"])
    line = np.linspace(np.nanmin(b), np.nanmax(b), 50)
    for rho, style, text in (
        (fit.density, "-", labels["fit"]),
        (fit.low, ":", labels["low"]),
        (fit.high, ":", labels["high"]),
    ):
        axis.plot(line, rho / 1000.0 * line, style, color="#b3261e", lw=1.4 if style == "-" else 1.0, label=text)
    axis.set_xlabel(labels["x"])
    axis.set_ylabel(labels["y"])
    axis.set_title(labels["title"])
    axis.grid(True, alpha=0.3)
    axis.legend(loc="best", fontsize=8)
    figure.savefig(path)


def nettleton_plot(path: str, densities, correlation, fit, profile, labels: dict) -> None:
    """Correlation against trial density, and anomalies at several densities.

    ``profile`` is a dict with ``distance`` (or None for the whole survey),
    ``height``, ``faa`` and ``unit`` arrays (regional removed), ``trials``
    (densities to draw) and ``xlabel``.
    """
    figure, (left, right) = _figure(2)
    left.plot(densities, correlation, color="#3b6fb6", lw=1.5)
    left.axhline(0.0, color="0.4", lw=0.8)
    left.axvspan(fit.low, fit.high, color="#b3261e", alpha=0.15, label=labels["interval"])
    left.axvline(fit.density, color="#b3261e", lw=1.2, label=labels["estimate"])
    left.set_xlabel(labels["density"])
    left.set_ylabel(labels["correlation"])
    left.set_title(labels["title_left"])
    left.grid(True, alpha=0.3)
    left.legend(loc="best", fontsize=8)

    colours = ["#2c7bb6", "#7fb8d6", "#404040", "#f4a582", "#d7191c"]
    distance = profile.get("distance")
    order = np.argsort(distance) if distance is not None else None
    for rho, colour in zip(profile["trials"], colours):
        anomaly = profile["faa"] - rho * profile["unit"]
        anomaly = anomaly - np.mean(anomaly)
        text = labels["at"].format(rho)
        if order is not None:
            right.plot(distance[order], anomaly[order], "-o", ms=2.5, lw=1.0, color=colour, label=text)
        else:
            right.scatter(profile["height"], anomaly, s=6, color=colour, alpha=0.6, label=text)
    right.set_xlabel(profile["xlabel"])
    right.set_ylabel(labels["anomaly"])
    right.set_title(profile["title"])
    right.grid(True, alpha=0.3)
    right.legend(loc="best", fontsize=7)
    if order is not None:
        twin = right.twinx()
        twin.fill_between(distance[order], profile["height"][order], np.min(profile["height"]), color="0.6", alpha=0.25)
        twin.set_ylabel(labels["height"])
    figure.savefig(path)
