# SPDX-License-Identifier: GPL-2.0-or-later
"""Quality flags: one vocabulary of short, stable, locale-independent codes.

Every algorithm writes ``qc_flag`` as codes joined by ``;`` (no spaces), and a
separate ``qc_note`` with the sentence in the user's language. Codes never
change once released (users filter on them); meanings may be reworded.

Severity says what the flag means for the row:

* ``info`` — the value is computed as asked; something is worth knowing.
* ``warning`` — the value is computed but may be off; read the note.
* ``not_computed`` — a value of this row could not be computed and is NULL.

Examples
--------
>>> merge_codes("height_from_dem", ["tc_partial", "height_from_dem"])
'height_from_dem;tc_partial'
>>> split_codes(" tc_partial; ;height_from_dem ")
['tc_partial', 'height_from_dem']
>>> VOCABULARY["no_gravity"].severity
'not_computed'
"""

from __future__ import annotations

from collections.abc import Iterable
from dataclasses import dataclass

INFO = "info"
WARNING = "warning"
NOT_COMPUTED = "not_computed"
SEVERITIES = (INFO, WARNING, NOT_COMPUTED)


@dataclass(frozen=True)
class FlagCode:
    """One entry of the flag vocabulary.

    Parameters
    ----------
    code : str
        Short lowercase code written in ``qc_flag``.
    severity : str
        ``info``, ``warning`` or ``not_computed``.
    meaning : str
        English sentence (the plugin translates it for ``qc_note``).
    """

    code: str
    severity: str
    meaning: str

    def __post_init__(self) -> None:
        """Reject an unknown severity or a code that is not one short lowercase word (ValueError)."""
        if self.severity not in SEVERITIES:
            msg = f"severity must be one of {SEVERITIES}, got {self.severity!r}"
            raise ValueError(msg)
        if not self.code or self.code != self.code.strip().lower() or ";" in self.code or " " in self.code:
            msg = f"flag codes are short lowercase words without spaces or ';', got {self.code!r}"
            raise ValueError(msg)


def _entries(*rows: tuple) -> dict:
    return {code: FlagCode(code, severity, meaning) for code, severity, meaning in rows}


#: The vocabulary. Keep codes stable; add new ones in the block of their subject.
VOCABULARY = {
    # --- stations and reduction -------------------------------------------
    **_entries(
        ("no_geometry", NOT_COMPUTED, "The station has no point geometry."),
        ("no_gravity", NOT_COMPUTED, "No observed gravity: no anomaly computed."),
        ("no_height", NOT_COMPUTED, "No station height: no anomaly computed."),
        ("height_from_dem", INFO, "Station height taken from the DEM (the layer gave none)."),
        ("bad_latitude", NOT_COMPUTED, "Latitude out of range: the position cannot be located on Earth."),
        ("no_position", NOT_COMPUTED, "The position could not be transformed to latitude and longitude."),
        ("density_default", INFO, "Density missing for this station: the default density was used."),
        ("density_unusual", WARNING, "Density outside 1000-3500 kg/m3: check its units."),
    ),
    # --- station inputs: datums, units, geometry (issue 8) ------------------
    **_entries(
        (
            "multipart_distinct",
            NOT_COMPUTED,
            "The station is a multi-part point whose parts lie apart: its position is ambiguous.",
        ),
        (
            "gravity_implausible",
            NOT_COMPUTED,
            "Observed gravity outside Earth's range (975000-984000 mGal) after units: no anomaly computed.",
        ),
        ("density_bad", NOT_COMPUTED, "Density outside 500-5000 kg/m3: no Bouguer anomaly computed for this station."),
        (
            "height_dem_mismatch",
            WARNING,
            "Station height disagrees with the DEM by more than the local relief explains (see dem_diff).",
        ),
        (
            "geoid_missing",
            NOT_COMPUTED,
            "No geoid height at the station: its heights cannot be converted between datums.",
        ),
        ("no_tc", NOT_COMPUTED, "No terrain correction for this station: no complete Bouguer anomaly."),
    ),
    # --- terrain correction -------------------------------------------------
    **_entries(
        ("outside_dem", NOT_COMPUTED, "The station lies outside the elevation raster: no terrain correction."),
        ("no_dem_at_station", NOT_COMPUTED, "The elevation raster has no data at the station: no terrain correction."),
        ("tc_partial", WARNING, "The elevation rasters do not cover the whole correction area (see tc_cover)."),
        ("tc_no_data_zones", WARNING, "Some ring-and-sector compartments had no elevation data and count as flat."),
        (
            "tc_gap_inner",
            WARNING,
            "The elevation rasters lack data over part of the inner zone (see the inner coverage).",
        ),
        (
            "tc_density_reference",
            INFO,
            "With water, the terrain correction uses the reference (median) density, not this station's.",
        ),
    ),
    # --- terrain correction: ring-and-sector (Hammer 1939) ------------------
    **_entries(
        (
            "tc_regional_fill",
            INFO,
            "The fine elevation raster has no data near the station: the regional raster filled those cells.",
        ),
        (
            "tc_regional_only",
            WARNING,
            "No fine elevation data at the station: its terrain correction comes from the regional raster alone.",
        ),
        (
            "tc_no_slope",
            WARNING,
            "Ring-and-sector: no elevation data at the station, so the zones finer than a DEM cell count as flat.",
        ),
    ),
    # --- regional-residual separation ---------------------------------------
    **_entries(
        (
            "outside_grid",
            NOT_COMPUTED,
            "The station lies outside the anomaly raster or next to blank cells: no regional or residual value.",
        ),
    ),
    # --- readings and observed gravity --------------------------------------
    **_entries(
        ("unknown_station", NOT_COMPUTED, "The reading names a station that is not in the station layer: left out."),
        ("no_reading", NOT_COMPUTED, "The reading is empty or not a number: left out."),
        ("duplicate_reading", WARNING, "Same station and time as an earlier row: this copy is left out."),
        ("time_backwards", WARNING, "The time is earlier than a previous row of the same loop: check it."),
        ("no_instrument_height", INFO, "No instrument height given for this reading: 0 m used."),
        (
            "no_tide_position",
            NOT_COMPUTED,
            "The station has no usable position for the tide: its readings are left out.",
        ),
        ("reading_outlier", WARNING, "The reading's residual exceeds 3 standard errors."),
        ("reading_left_out", WARNING, "The reading was left out of the final adjustment (outlier second pass)."),
        ("loop_single_base", WARNING, "The loop occupies its base once only: no closure, drift not from the base."),
        ("loop_no_drift", WARNING, "The loop's drift could not be determined from its readings: none applied."),
        ("network_untied", NOT_COMPUTED, "Not connected through any loop to a station of known gravity."),
        ("not_read", NOT_COMPUTED, "No usable reading of this station: no observed gravity."),
        ("single_reading", INFO, "One reading only: no check on this station's value."),
        ("known_station", INFO, "A station of known gravity (a tie of the network)."),
    ),
}


def split_codes(text: str | None) -> list[str]:
    """Codes of a ``qc_flag`` value, in order, without blanks.

    Parameters
    ----------
    text : str or None
        A ``qc_flag`` value (``;``-joined codes) or None.

    Returns
    -------
    list of str

    Examples
    --------
    >>> split_codes(None)
    []
    """
    if not text:
        return []
    return [part.strip() for part in str(text).split(";") if part.strip()]


def merge_codes(existing: str | None, new: Iterable[str]) -> str:
    """Join earlier and new codes, keeping the first occurrence of each.

    Parameters
    ----------
    existing : str or None
        The row's earlier ``qc_flag``.
    new : iterable of str
        Codes raised now.

    Returns
    -------
    str
        ``;``-joined codes, earlier ones first; ``""`` when there are none.

    Examples
    --------
    >>> merge_codes(None, [])
    ''
    """
    seen: list[str] = []
    for code in [*split_codes(existing), *new]:
        if code not in seen:
            seen.append(code)
    return ";".join(seen)


def severity_of(codes: Iterable[str]) -> str | None:
    """The most severe severity among codes (None for no codes).

    Unknown codes (from a later version, say) count as ``warning``.

    Examples
    --------
    >>> severity_of(["height_from_dem", "tc_partial"])
    'warning'
    """
    rank = {INFO: 0, WARNING: 1, NOT_COMPUTED: 2}
    worst = None
    for code in codes:
        entry = VOCABULARY.get(code)
        level = entry.severity if entry else WARNING
        if worst is None or rank[level] > rank[worst]:
            worst = level
    return worst
