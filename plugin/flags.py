# SPDX-License-Identifier: GPL-2.0-or-later
"""Flag codes of ``algorithms.qc`` in the user's language, and reasons given as text.

``qc_flag`` stores codes (stable, locale independent); ``qc_note`` the
sentences below, translated. Every code of the vocabulary has a literal
``_tr("...")`` here so ``tools/update_translations.py`` extracts it (a test
checks that the English text equals the vocabulary's meaning).
"""

from __future__ import annotations

import re

from qgis.PyQt.QtCore import QCoreApplication

from ..algorithms.qc import VOCABULARY, merge_codes, split_codes


def _tr(text: str) -> str:
    return QCoreApplication.translate("QualityFlags", text)


def _notes() -> dict:
    """Code -> translated meaning (built on call, after the translator is installed)."""
    return {
        "no_geometry": _tr("The station has no point geometry."),
        "no_gravity": _tr("No observed gravity: no anomaly computed."),
        "no_height": _tr("No station height: no anomaly computed."),
        "height_from_dem": _tr("Station height taken from the DEM (the layer gave none)."),
        "bad_latitude": _tr("Latitude out of range: the position cannot be located on Earth."),
        "no_position": _tr("The position could not be transformed to latitude and longitude."),
        "density_default": _tr("Density missing for this station: the default density was used."),
        "density_unusual": _tr("Density outside 1000-3500 kg/m3: check its units."),
        "multipart_distinct": _tr(
            "The station is a multi-part point whose parts lie apart: its position is ambiguous."
        ),
        "gravity_implausible": _tr(
            "Observed gravity outside Earth's range (975000-984000 mGal) after units: no anomaly computed."
        ),
        "density_bad": _tr("Density outside 500-5000 kg/m3: no Bouguer anomaly computed for this station."),
        "height_dem_mismatch": _tr(
            "Station height disagrees with the DEM by more than the local relief explains (see dem_diff)."
        ),
        "geoid_missing": _tr("No geoid height at the station: its heights cannot be converted between datums."),
        "no_tc": _tr("No terrain correction for this station: no complete Bouguer anomaly."),
        "outside_dem": _tr("The station lies outside the elevation raster: no terrain correction."),
        "no_dem_at_station": _tr("The elevation raster has no data at the station: no terrain correction."),
        "tc_partial": _tr("The elevation rasters do not cover the whole correction area (see tc_cover)."),
        "tc_no_data_zones": _tr("Some ring-and-sector compartments had no elevation data and count as flat."),
        "tc_regional_fill": _tr(
            "The fine elevation raster has no data near the station: the regional raster filled those cells."
        ),
        "tc_no_slope": _tr(
            "Ring-and-sector: no elevation data at the station, so the zones finer than a DEM cell count as flat."
        ),
        "outside_grid": _tr(
            "The station lies outside the anomaly raster or next to blank cells: no regional or residual value."
        ),
        "unknown_station": _tr("The reading names a station that is not in the station layer: left out."),
        "no_reading": _tr("The reading is empty or not a number: left out."),
        "duplicate_reading": _tr("Same station and time as an earlier row: this copy is left out."),
        "time_backwards": _tr("The time is earlier than a previous row of the same loop: check it."),
        "no_instrument_height": _tr("No instrument height given for this reading: 0 m used."),
        "no_tide_position": _tr("The station has no usable position for the tide: its readings are left out."),
        "reading_outlier": _tr("The reading's residual exceeds 3 standard errors."),
        "reading_left_out": _tr("The reading was left out of the final adjustment (outlier second pass)."),
        "loop_single_base": _tr("The loop occupies its base once only: no closure, drift not from the base."),
        "loop_no_drift": _tr("The loop's drift could not be determined from its readings: none applied."),
        "network_untied": _tr("Not connected through any loop to a station of known gravity."),
        "not_read": _tr("No usable reading of this station: no observed gravity."),
        "single_reading": _tr("One reading only: no check on this station's value."),
        "known_station": _tr("A station of known gravity (a tie of the network)."),
        "tc_gap_inner": _tr("The elevation rasters lack data over part of the inner zone (see the inner coverage)."),
        "tc_density_reference": _tr(
            "With water, the terrain correction uses the reference (median) density, not this station's."
        ),
        "tc_regional_only": _tr(
            "No fine elevation data at the station: its terrain correction comes from the regional raster alone."
        ),
    }


#: The notes last built and the translation of ``_PROBE`` they were built under.
_cache: dict = {}
_PROBE = "The station has no point geometry."


def _current_notes() -> dict:
    """``_notes()``, rebuilt only when the translation in force changes (one lookup per call, not 38)."""
    key = _tr(_PROBE)
    if _cache.get("key") != key:
        _cache["notes"] = _notes()
        _cache["key"] = key
    return _cache["notes"]


def note_for(code: str) -> str:
    """Translated meaning of a code; the English meaning or the code itself when unknown."""
    notes = _current_notes()
    if code in notes:
        return notes[code]
    entry = VOCABULARY.get(code)
    return entry.meaning if entry else code


def notes_for(flag_value: str | None) -> str:
    """``qc_note`` for a ``qc_flag`` value: one sentence per code, space separated."""
    return " ".join(note_for(code) for code in split_codes(flag_value))


#: Reasons the engines and the shared terrain runner give as English text
#: (with the translation context of the runner where it translates them).
_TEXT_REASONS = (
    ("outside DEM", "outside_dem"),
    ("no height", "no_height"),
    ("no DEM at station", "no_dem_at_station"),
    ("height from DEM", "height_from_dem"),
    ("no height (outside DEM)", "no_height"),
)
_PREFIXES = (
    ("partial coverage", "tc_partial"),
)
_SUFFIXES = (
    ("compartments without data", "tc_no_data_zones"),
)


def code_of(reason: str) -> str:
    """The vocabulary code of a reason given as text (a code passes through).

    Unknown text becomes a lowercase code of its words, so nothing is lost.
    """
    text = str(reason).strip()
    if not text:
        return ""
    if text in VOCABULARY:
        return text
    for english, code in _TEXT_REASONS:
        if text in (english, QCoreApplication.translate("TerrainRun", english)):
            return code
    for prefix, code in _PREFIXES:
        if text.startswith(prefix):
            return code
    for suffix, code in _SUFFIXES:
        if text.endswith(suffix):
            return code
    slug = re.sub(r"[^0-9a-z]+", "_", text.lower()).strip("_")
    return slug or "unknown"


def merged_flag(existing, codes) -> str:
    """``qc_flag`` of a row: earlier codes (text reasons mapped) then the new ones."""
    earlier = [code_of(part) for part in split_codes(existing if isinstance(existing, str) else None)]
    return merge_codes(None, [*earlier, *codes])
