# SPDX-License-Identifier: GPL-2.0-or-later
"""Small pure helpers that build one self-contained HTML page (inline CSS, images as data URIs).

No scripts, no external references: the page carries a Content-Security-Policy
that lets the browser load nothing but its own inline style and ``data:``
images, so it opens the same offline.

Examples
--------
>>> table(["code", "n"], [["tc_partial", 3]])
'<table><thead><tr><th>code</th><th>n</th></tr></thead><tbody><tr><td>tc_partial</td><td class="num">3</td></tr></tbody></table>'
"""  # noqa: E501 - a doctest's expected output is one line

from __future__ import annotations

import base64
from html import escape
from numbers import Number

CSP = "default-src 'none'; img-src data:; style-src 'unsafe-inline'"

STYLE = """
body { font-family: "DejaVu Sans", Arial, sans-serif; color: #1e1e1e; margin: 0 auto; max-width: 1100px;
       padding: 1.5em 2em 3em; line-height: 1.4; background: #fff; }
h1 { font-size: 1.6em; margin-bottom: 0.2em; }
h2 { font-size: 1.25em; border-bottom: 2px solid #2b83ba; padding-bottom: 0.15em; margin-top: 1.8em; }
h3 { font-size: 1.05em; margin-top: 1.2em; }
table { border-collapse: collapse; margin: 0.6em 0; font-size: 0.9em; }
th, td { border: 1px solid #c8c8c8; padding: 0.25em 0.6em; text-align: left; vertical-align: top; }
th { background: #eef3f7; }
td.num { text-align: right; font-variant-numeric: tabular-nums; }
figure { margin: 1em 0; }
figure img { max-width: 100%; height: auto; border: 1px solid #ddd; }
figcaption { font-size: 0.88em; color: #444; margin-top: 0.3em; }
.caution { border-left: 5px solid #c0392b; background: #fbeeec; padding: 0.6em 1em; margin: 1em 0; }
.note { color: #555; font-size: 0.92em; }
.sev-info { color: #2b6a8a; } .sev-warning { color: #a35f00; } .sev-not_computed { color: #b0281a; font-weight: bold; }
code { background: #f3f3f3; padding: 0 0.2em; }
"""


def text(value) -> str:
    """Escaped text."""
    return escape(str(value))


def number(value, digits: int = 3) -> str:
    """A number with ``digits`` decimals; empty for None/NaN."""
    if value is None:
        return ""
    try:
        value = float(value)
    except (TypeError, ValueError):
        return escape(str(value))
    if value != value:
        return ""
    return f"{value:.{digits}f}".replace("-", "\u2212")


def paragraph(content: str, css_class: str = "") -> str:
    """A paragraph of already-escaped HTML."""
    attribute = f' class="{css_class}"' if css_class else ""
    return f"<p{attribute}>{content}</p>"


def table(headers, rows, numeric_digits: int = 3) -> str:
    """A table; numbers are right-aligned, other cells escaped (cells may be ``("html", raw)``)."""
    head = "".join(f"<th>{text(h)}</th>" for h in headers)
    body = []
    for row in rows:
        cells = []
        for cell in row:
            if isinstance(cell, tuple) and len(cell) == 2 and cell[0] == "html":
                cells.append(f"<td>{cell[1]}</td>")
            elif isinstance(cell, Number) and not isinstance(cell, bool):
                shown = str(cell) if isinstance(cell, int) else number(cell, numeric_digits)
                cells.append(f'<td class="num">{shown}</td>')
            else:
                cells.append(f"<td>{text('' if cell is None else cell)}</td>")
        body.append("<tr>" + "".join(cells) + "</tr>")
    return f"<table><thead><tr>{head}</tr></thead><tbody>{''.join(body)}</tbody></table>"


def png_data_uri(png_bytes: bytes) -> str:
    """``data:image/png;base64,...`` for PNG bytes."""
    if not png_bytes.startswith(b"\x89PNG"):
        msg = "not a PNG image"
        raise ValueError(msg)
    return "data:image/png;base64," + base64.b64encode(png_bytes).decode("ascii")


def figure(png_bytes: bytes, alt: str, caption: str = "") -> str:
    """An embedded PNG with alternative text and an optional (escaped) caption."""
    cap = f"<figcaption>{text(caption)}</figcaption>" if caption else ""
    return f'<figure><img src="{png_data_uri(png_bytes)}" alt="{text(alt)}">{cap}</figure>'


def section(title: str, *parts: str, anchor: str = "") -> str:
    """A titled section of already-built HTML parts."""
    identifier = f' id="{text(anchor)}"' if anchor else ""
    return f"<section{identifier}><h2>{text(title)}</h2>{''.join(parts)}</section>"


def page(title: str, parts, language: str = "en") -> str:
    """The whole document."""
    return (
        f'<!DOCTYPE html>\n<html lang="{text(language)}"><head><meta charset="utf-8">'
        f'<meta http-equiv="Content-Security-Policy" content="{CSP}">'
        '<meta name="viewport" content="width=device-width, initial-scale=1">'
        f"<title>{text(title)}</title><style>{STYLE}</style></head><body>"
        + "".join(parts)
        + "</body></html>\n"
    )
