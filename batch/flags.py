# SPDX-License-Identifier: GPL-2.0-or-later
"""Per-station reasons as the flag codes of ``algorithms/qc.py``.

The engines in ``algorithms/terrain`` give English reasons ("outside DEM",
"partial coverage 37%"), and the Processing algorithms of this version still
write such reasons; the batch runner writes the codes. This table is the one
place that ties the two together (it is also how the equality test reads the
plugin's output).
"""

from __future__ import annotations

import re

from ..algorithms.qc import VOCABULARY, merge_codes

#: Reason text -> code (reasons with a number are matched by pattern below).
REASON_CODES = {
    "no geometry": "no_geometry",
    "latitude out of range": "bad_latitude",
    "position not transformable": "no_position",
    "no observed gravity": "no_gravity",
    "no height": "no_height",
    "no height (outside DEM)": "no_height",
    "height from DEM": "height_from_dem",
    "density missing, default used": "density_default",
    "unusual density": "density_unusual",
    "no terrain correction": "no_tc",
    "outside DEM": "outside_dem",
    "no DEM at station": "no_dem_at_station",
}
_PATTERNS = (
    (re.compile(r"^partial coverage \d+%$"), "tc_partial"),
    (re.compile(r"^\d+ compartments without data$"), "tc_no_data_zones"),
)


def code_of(reason: str) -> str:
    """The flag code of one reason (a code is returned as it is).

    Raises
    ------
    KeyError
        For a reason with no code: add one to ``algorithms/qc.py`` and here.
    """
    text = reason.strip()
    if text in VOCABULARY:
        return text
    if text in REASON_CODES:
        return REASON_CODES[text]
    for pattern, code in _PATTERNS:
        if pattern.match(text):
            return code
    msg = f"no flag code for the reason {text!r}"
    raise KeyError(msg)


def codes_of(joined: str) -> list[str]:
    """Codes of an engine's ``"; "``-joined reasons (or of ``;``-joined codes)."""
    return [code_of(part) for part in str(joined).split(";") if part.strip()]


def as_qc_flag(codes) -> str:
    """``qc_flag`` value: codes joined by ``;``, first occurrence kept."""
    return merge_codes(None, codes)


def note_of(qc_flag: str) -> str:
    """``qc_note``: the English meanings of a ``qc_flag`` value."""
    return " ".join(VOCABULARY[c].meaning for c in qc_flag.split(";") if c)
