# SPDX-License-Identifier: GPL-2.0-or-later
"""The flag vocabulary: well formed, and documented where users look."""

from pathlib import Path

import pytest

from relief_gravity.algorithms.qc import SEVERITIES, VOCABULARY, FlagCode, merge_codes, severity_of

ROOT = Path(__file__).resolve().parents[2]


@pytest.mark.parametrize("document", ["README.md", "docs/flags.md"])
def test_every_code_is_documented_with_its_severity(document):
    text = (ROOT / document).read_text(encoding="utf-8")
    for code, entry in VOCABULARY.items():
        assert f"`{code}`" in text, (document, code)
        row = next(line for line in text.splitlines() if line.startswith(f"| `{code}` |"))
        assert entry.severity.replace("_", " ") in row.replace("_", " "), (document, code)


def test_codes_are_short_stable_words():
    for code, entry in VOCABULARY.items():
        assert entry.code == code and entry.severity in SEVERITIES
        assert len(code) <= 24 and code.replace("_", "").isalnum()


@pytest.mark.parametrize("bad", ["Tc Partial", "a;b", "", "UPPER"])
def test_malformed_codes_are_refused(bad):
    with pytest.raises(ValueError, match="flag codes"):
        FlagCode(bad, "info", "x")


def test_merge_keeps_order_and_severity_ranks():
    assert merge_codes("tc_partial;no_gravity", ["no_gravity", "height_from_dem"]) == "tc_partial;no_gravity;height_from_dem"
    assert severity_of(["height_from_dem"]) == "info"
    assert severity_of(["height_from_dem", "no_gravity"]) == "not_computed"
    assert severity_of(["some_future_code"]) == "warning"
    assert severity_of([]) is None
