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

from dataclasses import dataclass
from typing import Iterable, List

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
        if self.severity not in SEVERITIES:
            raise ValueError(f"severity must be one of {SEVERITIES}, got {self.severity!r}")
        if not self.code or self.code != self.code.strip().lower() or ";" in self.code or " " in self.code:
            raise ValueError(f"flag codes are short lowercase words without spaces or ';', got {self.code!r}")


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
    # --- terrain correction -------------------------------------------------
    **_entries(
        ("outside_dem", NOT_COMPUTED, "The station lies outside the elevation raster: no terrain correction."),
        ("no_dem_at_station", NOT_COMPUTED, "The elevation raster has no data at the station: no terrain correction."),
        ("tc_partial", WARNING, "The elevation rasters do not cover the whole correction area (see tc_cover)."),
        ("tc_no_data_zones", WARNING, "Some ring-and-sector compartments had no elevation data and count as flat."),
    ),
    # --- batch runner -------------------------------------------------------
    **_entries(
        ("no_tc", NOT_COMPUTED, "No terrain correction for this station: no complete Bouguer anomaly."),
    ),
}


def split_codes(text: str | None) -> List[str]:
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
    seen: List[str] = []
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
