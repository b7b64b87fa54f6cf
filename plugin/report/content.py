# SPDX-License-Identifier: GPL-2.0-or-later
"""The survey report's content: from station arrays, flags and provenance records to one HTML page.

Numpy and matplotlib (through :mod:`.plots`), no layers: the Processing
algorithm reads the layers into a :class:`SurveyData` and calls
:func:`build_report`. Every sentence goes through ``_tr`` (context
"SurveyReport"), so the page follows the user's QGIS language where a
translation exists; flag meanings come translated from ``plugin/flags.py``.
The numbers are mGal unless a heading says otherwise.
"""

from __future__ import annotations

import math
from collections import Counter
from dataclasses import dataclass, field

import numpy as np
from qgis.PyQt.QtCore import QCoreApplication

from ...algorithms import qc
from ...algorithms.constants import GRAVITATIONAL_CONSTANT
from ..flags import note_for
from ..run_facts import run_facts, standard_text
from . import html, plots

ANOMALIES = ("faa", "sba", "cba")
UNCERTAINTY_FIELDS = ("cba_sigma", "tc_sigma")
#: At most this many flagged stations are listed (the rest are counted).
MAX_FLAGGED_ROWS = 300
#: Rows of the largest-terrain-correction table.
LARGEST_ROWS = 10



def _tr(text: str) -> str:
    return QCoreApplication.translate("SurveyReport", text)


def cautions() -> tuple:
    """The report's cautions, translated (built on call, after the translator is installed)."""
    return (
        _tr(
            "Results support interpretation only: they are not a basis on their own for drilling, groundwater "
            "or engineering decisions."
        ),
        _tr("Check every reduction against the survey's own ties, base stations and specifications."),
        _tr(
            "Decisions on drilling, groundwater abstraction or engineering works, and reporting under a "
            "jurisdiction's rules, are for licensed practice under local codes."
        ),
    )



def _stats_headers(first=None) -> list:
    return [first or _tr("field"), "n", _tr("min"), _tr("median"), "95 %", _tr("max")]


@dataclass(frozen=True)
class SurveyData:
    """What the report needs from the layers (arrays have one entry per station)."""

    layer_name: str
    station_ids: list
    x: np.ndarray
    y: np.ndarray
    fields: dict
    flags: list
    records: list = field(default_factory=list)
    crs_name: str = ""
    map_png: bytes | None = None
    map_note: str = ""
    created: str = ""
    plugin_version: str = ""


def uncertainty_fields(fields) -> list:
    """Names of the uncertainty fields present: ``cba_sigma``, ``tc_sigma``, then ``sigma_*``."""
    names = [name for name in UNCERTAINTY_FIELDS if name in fields]
    return names + sorted(name for name in fields if name.startswith("sigma_"))


def flag_counts(flags) -> Counter:
    """Stations per code (a code counts once per station)."""
    counts = Counter()
    for value in flags:
        counts.update(set(qc.split_codes(value)))
    return counts


def describe_code(code: str):
    """(severity, meaning) of a code; codes outside the vocabulary are shown as written."""
    entry = qc.VOCABULARY.get(code)
    if entry is not None:
        return entry.severity, note_for(code) or entry.meaning
    return qc.WARNING, _tr("Not a code of this version's flag vocabulary (an older or newer run); shown as written.")


def _stats_rows(fields, names, digits=3):
    rows = []
    for name in names:
        values = np.asarray(fields[name], dtype=float)
        finite = values[np.isfinite(values)]
        if finite.size == 0:
            rows.append([name, 0, None, None, None, None])
            continue
        rows.append([name, int(finite.size), float(finite.min()), float(np.median(finite)),
                     float(np.percentile(finite, 95)), float(finite.max())])
    return rows


def _run_section(data: SurveyData) -> str:
    facts = run_facts(data.records)
    parts = []
    steps = [step for record in data.records if record for step in record.get("steps", [])]
    if steps:
        rows = []
        for step in steps:
            params = step.get("parameters") or {}
            shown = "; ".join(f"{key}={_short(value)}" for key, value in sorted(params.items()))
            rows.append([step.get("algorithm", "?"), step.get("plugin_version", ""), step.get("time", ""), shown])
        parts.append(html.table([_tr("algorithm"), _tr("version"), _tr("time (UTC)"), _tr("parameters")], rows))
    else:
        parts.append(html.paragraph(html.text(_tr(
            "The layers carry no provenance record, so the parameters of the run cannot be shown. "
            "Outputs of this plugin's algorithms record them in their own metadata.")), "note"))
    missing = _tr("not recorded")
    density = f"{facts.density:g} kg/m³" if facts.density is not None else missing
    parts.append(html.table([_tr("reduction density"), _tr("standard"), _tr("contour interval")], [[
        density, standard_text(facts) or missing,
        f"{facts.contour_interval:g} mGal" if facts.contour_interval else missing]]))
    return html.section(_tr("What was run"), *parts, anchor="run")


def _short(value) -> str:
    text = str(value)
    if "/" in text or "\\" in text:
        text = text.replace("\\", "/").rstrip("/").split("/")[-1]
    return text if len(text) <= 60 else text[:57] + "..."


def _station_section(data: SurveyData) -> str:
    n = len(data.station_ids)
    counts = [[_tr("stations in the layer"), n]]
    for name in ANOMALIES:
        if name in data.fields:
            counts.append([_tr("with a value of {}").format(name),
                           int(np.isfinite(np.asarray(data.fields[name], float)).sum())])
    severities = Counter(qc.severity_of(qc.split_codes(value)) for value in data.flags)
    counts.append([_tr("flagged (any code)"), sum(v for k, v in severities.items() if k)])
    for level in qc.SEVERITIES:
        counts.append([_tr("  worst flag: {}").format(level), severities.get(level, 0)])
    codes = flag_counts(data.flags)
    parts = [html.table(["", _tr("count")], counts)]
    if codes:
        rows = []
        for code, count in sorted(codes.items(), key=lambda item: (-item[1], item[0])):
            severity, meaning = describe_code(code)
            rows.append([("html", f"<code>{html.text(code)}</code>"),
                         ("html", f'<span class="sev-{severity}">{html.text(severity)}</span>'), meaning, count])
        parts.append(f"<h3>{html.text(_tr('Flags by code'))}</h3>"
                     + html.table([_tr("code"), _tr("severity"), _tr("meaning"), _tr("stations")], rows))
    else:
        parts.append(html.paragraph(html.text(_tr("No station carries a flag."))))
    return html.section(_tr("Stations"), *parts, anchor="stations")


def _map_section(data: SurveyData) -> str:
    heading = _tr("Anomaly map")
    if data.map_png:
        return html.section(heading, html.figure(data.map_png, heading, data.map_note), anchor="map")
    name = next((n for n in ("cba", "sba", "faa") if n in data.fields), None)
    if name is None:
        return html.section(heading, html.paragraph(html.text(_tr("No anomaly field to map."))), anchor="map")
    png = plots.station_map(data.x, data.y, data.fields[name], f"{name} (mGal)")
    note = _tr("No anomaly grid was given: stations coloured by {} (mGal).").format(name) + f" {data.crs_name}"
    return html.section(heading, html.figure(png, _tr("Stations coloured by {}").format(name), note), anchor="map")


def _distribution_section(data: SurveyData) -> str:
    present = {name: data.fields[name] for name in ANOMALIES if name in data.fields}
    if not present:
        return ""
    parts = [html.figure(plots.histograms(present), _tr("Histograms of the anomalies")),
             html.table(_stats_headers(), _stats_rows(data.fields, list(present)))]
    return html.section(_tr("Anomaly distributions (mGal)"), *parts, anchor="histograms")


def _height_section(data: SurveyData) -> str:
    height = data.fields.get("height")
    present = {name: data.fields[name] for name in ANOMALIES if name in data.fields}
    heading = _tr("Anomalies against height")
    if height is None or not present:
        return html.section(heading, html.paragraph(html.text(_tr(
            "No station height in the layer: this check needs the height the reduction used."))), anchor="height")
    parts = [html.figure(plots.anomaly_against_height(height, present), _tr("Anomalies against station height"),
                         _tr("Free-air anomaly follows the terrain; a Bouguer anomaly should not (Nettleton 1939)."))]
    slope, _ = plots.linear_fit(height, present.get("cba", present.get("sba")))
    facts = run_facts(data.records)
    if math.isfinite(slope):
        # d(anomaly)/dh = 2 pi G (rho_true - rho_used) for a slab (Nettleton 1939); 1e5 mGal per m/s^2.
        per_density = 2.0 * math.pi * GRAVITATIONAL_CONSTANT * 1e5  # mGal/m per kg/m^3
        hint = _tr(
            "The Bouguer anomaly changes by {} mGal per metre of height. Read as a slab alone this would mean "
            "a density {} kg/m³ from the one used"
        ).format(f"{slope:+.4f}", f"{slope / per_density:+.0f}")
        hint += f" ({facts.density:g} kg/m³)." if facts.density is not None else "."
        hint += " " + _tr(
            "Geology that follows the topography gives the same signature, so treat it as a prompt "
            "to check the density, not as an estimate."
        )
        parts.append(html.paragraph(html.text(hint)))
    return html.section(heading, *parts, anchor="height")


def _terrain_section(data: SurveyData) -> str:
    f = data.fields
    if "tc_inner" in f and "tc_outer" in f and np.isfinite(np.asarray(f["tc_inner"], float)).any():
        inner, outer = np.asarray(f["tc_inner"], float), np.asarray(f["tc_outer"], float)
        total = inner + outer
        ok = np.isfinite(total)
        share = np.median(inner[ok & (total > 0)] / total[ok & (total > 0)]) if (ok & (total > 0)).any() else np.nan
        parts = [html.figure(plots.terrain_by_zone(inner, outer), _tr("Terrain correction by zone")),
                 html.table(_stats_headers(),
                            _stats_rows(f, [n for n in ("tc_inner", "tc_outer", "tc_total") if n in f])),
                 html.paragraph(html.text(_tr("Median inner-zone share of the total: {} %.").format(
                     f"{share * 100:.0f}")))]
        order = np.argsort(np.where(ok, -total, np.inf))[:LARGEST_ROWS]
        extra = [n for n in ("dem_diff", "tc_cover") if n in f]
        rows = [[data.station_ids[i], float(inner[i]), float(outer[i]), float(total[i])]
                + [float(np.asarray(f[n], float)[i]) for n in extra] for i in order if ok[i]]
        parts.append(f"<h3>{html.text(_tr('Largest corrections'))}</h3>"
                     + html.table([_tr("station"), "tc_inner", "tc_outer", "tc_total", *extra], rows))
    elif "tc_total" in f:
        note = _tr("The terrain correction is not split by zone (a field value was used).")
        parts = [html.paragraph(html.text(note)),
                 html.table(_stats_headers(), _stats_rows(f, ["tc_total"]))]
    else:
        parts = [html.paragraph(html.text(_tr(
            "No terrain correction in the layer: the complete Bouguer anomaly is not available.")))]
    return html.section(_tr("Terrain correction by zone (mGal)"), *parts, anchor="terrain")


def _uncertainty_section(data: SurveyData) -> str:
    names = uncertainty_fields(data.fields)
    heading = _tr("Uncertainty")
    if not names:
        return html.section(heading, html.paragraph(html.text(_tr(
            "This layer has no uncertainty fields (tc_sigma, cba_sigma or sigma_…): the run that made it did not "
            "estimate a per-station error, so none is shown. Do not read the anomalies as exact."))),
            anchor="uncertainty")
    main = names[0]
    parts = [html.figure(plots.station_map(data.x, data.y, data.fields[main], f"{main} (mGal)", cmap="viridis"),
                         _tr("Map of {}").format(main), _tr("One standard deviation, mGal.") + f" {data.crs_name}"),
             html.table(_stats_headers(_tr("field (mGal, 1 sigma)")), _stats_rows(data.fields, names, digits=4))]
    return html.section(heading, *parts, anchor="uncertainty")


def _flagged_section(data: SurveyData) -> str:
    flagged = [i for i, value in enumerate(data.flags) if qc.split_codes(value)]
    heading = _tr("Flagged stations")
    if not flagged:
        return html.section(heading, html.paragraph(html.text(_tr("None."))), anchor="flagged")
    anomaly = next((n for n in ("cba", "sba", "faa") if n in data.fields), None)
    rows = []
    for i in flagged[:MAX_FLAGGED_ROWS]:
        codes = qc.split_codes(data.flags[i])
        row = [data.station_ids[i], float(data.x[i]), float(data.y[i]), "; ".join(codes), qc.severity_of(codes)]
        if anomaly:
            row.append(float(np.asarray(data.fields[anomaly], float)[i]))
        rows.append(row)
    headers = [_tr("station"), "x", "y", "qc_flag", _tr("worst severity")]
    headers += [f"{anomaly} (mGal)"] if anomaly else []
    parts = [html.table(headers, rows, numeric_digits=2)]
    if len(flagged) > MAX_FLAGGED_ROWS:
        parts.append(html.paragraph(html.text(_tr("… and {} more flagged stations (see the layer).").format(
            len(flagged) - MAX_FLAGGED_ROWS)), "note"))
    return html.section(heading, *parts, anchor="flagged")


def caution_box() -> str:
    """The report's caution paragraph as HTML (every caution, escaped)."""
    return (f'<div class="caution"><strong>{html.text(_tr("Caution."))}</strong> '
            + " ".join(html.text(c) for c in cautions()) + "</div>")


def build_report(data: SurveyData) -> str:
    """The whole HTML page for ``data``."""
    title = _tr("Survey report: {}").format(data.layer_name)
    written = _tr("Written {} by Relief Gravity {}. {} stations.").format(
        data.created, data.plugin_version, len(data.station_ids))
    header = (f"<h1>{html.text(title)}</h1>"
              + html.paragraph(html.text(f"{written} {data.crs_name}"), "note")
              + caution_box())
    sections = [header, _run_section(data), _station_section(data), _map_section(data),
                _distribution_section(data), _height_section(data), _terrain_section(data),
                _uncertainty_section(data), _flagged_section(data),
                html.section(_tr("Cautions"), "<ul>" + "".join(f"<li>{html.text(c)}</li>" for c in cautions())
                             + "</ul>", anchor="cautions")]
    # The translation of "en" is the page's language code (German: "de").
    return html.page(title, sections, language=_tr("en"))
