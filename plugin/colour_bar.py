# SPDX-License-Identifier: GPL-2.0-or-later
"""A continuous colour bar with round tick values, as SVG text (no QGIS needed).

The bar shows the colour stops of a linear stretch from ``low`` (bottom) to
``high`` (top), tick marks at round values inside the stretch (1, 2, 2.5 or
5 times a power of ten, via :func:`nice_contour_interval`), the units above
it and two small triangles for the values beyond the stretch, which take the
end colours. All lengths are millimetres; the map renderer places the SVG as
a layout picture of exactly :func:`colour_bar_size`.
"""

from __future__ import annotations

import math
from html import escape

from ..algorithms.gridding import contour_levels, nice_contour_interval

#: Geometry of the bar in millimetres (common cartographic proportions, no source).
BAR_WIDTH = 5.0
BAR_HEIGHT = 62.0
TRIANGLE = 3.5
TICK = 1.4
LABEL_WIDTH = 16.0
TITLE_HEIGHT = 6.0
FONT_SIZE = 2.7  # mm, about 7.7 pt
FONT = "DejaVu Sans, Arial, sans-serif"


def colour_bar_size() -> tuple[float, float]:
    """(width, height) of the SVG in millimetres."""
    return BAR_WIDTH + TICK + LABEL_WIDTH + 1.0, TITLE_HEIGHT + 2 * TRIANGLE + BAR_HEIGHT + 1.0


def tick_values(low: float, high: float) -> list[float]:
    """Round values inside ``[low, high]``: about 4 to 7 ticks.

    Examples
    --------
    >>> tick_values(-19.8, 6.1)
    [-15.0, -10.0, -5.0, 0.0, 5.0]
    """
    if not (math.isfinite(low) and math.isfinite(high)) or high <= low:
        return []
    step = nice_contour_interval(low, high, target_count=(4, 7))
    return [float(v) + 0.0 for v in contour_levels(low, high, step)]


def format_tick(value: float, step: float) -> str:
    """A tick label with as many decimals as the step needs, minus sign as U+2212.

    Examples
    --------
    >>> format_tick(-2.5, 2.5), format_tick(10.0, 5.0), format_tick(0.25, 0.05)
    ('\u22122.5', '10', '0.25')
    """
    decimals = 0
    while decimals < 6 and abs(round(step, decimals) - step) > 1e-9 * max(1.0, abs(step)):
        decimals += 1
    text = f"{value:.{decimals}f}"
    if float(text) == 0.0:
        text = text.lstrip("-")
    return text.replace("-", "\u2212")


def colour_bar_svg(stops, low: float, high: float, units: str, title: str = "") -> str:
    """The colour bar as an SVG document.

    Parameters
    ----------
    stops : sequence of (float, str)
        Colour stops: value (same units as ``low``/``high``) and ``#rrggbb``,
        increasing; the bar interpolates linearly between them (as QGIS's
        interpolated colour-ramp shader does).
    low, high : float
        Ends of the stretch (``low < high``).
    units : str
        Shown above the bar (e.g. "mGal").
    title : str, optional
        Shown before the units ("Anomaly (mGal)").
    """
    if not high > low:
        msg = f"colour bar needs low < high, got {low!r}, {high!r}"
        raise ValueError(msg)
    width, height = colour_bar_size()
    top = TITLE_HEIGHT + TRIANGLE
    bottom = top + BAR_HEIGHT

    def y_of(value):
        return bottom - (value - low) / (high - low) * BAR_HEIGHT

    gradient = []
    for value, colour in stops:
        offset = min(1.0, max(0.0, (high - value) / (high - low)))
        gradient.append(f'<stop offset="{offset:.5f}" stop-color="{escape(colour)}"/>')
    gradient.reverse()  # offsets must increase from the top (high) down
    first, last = stops[0][1], stops[-1][1]
    parts = [
        f'<svg xmlns="http://www.w3.org/2000/svg" width="{width:.2f}mm" height="{height:.2f}mm" '
        f'viewBox="0 0 {width:.3f} {height:.3f}">',
        '<defs><linearGradient id="ramp" x1="0" y1="0" x2="0" y2="1">' + "".join(gradient) + "</linearGradient></defs>",
        f'<text x="0" y="{TITLE_HEIGHT - 2.0:.2f}" font-family="{FONT}" font-size="{FONT_SIZE:.2f}" '
        f'font-weight="bold" fill="#1e1e1e">{escape(title or units)}</text>',
        # Triangles: values beyond the stretch take the end colours.
        f'<polygon points="0,{top:.3f} {BAR_WIDTH:.3f},{top:.3f} {BAR_WIDTH / 2:.3f},{top - TRIANGLE:.3f}" '
        f'fill="{escape(last)}" stroke="#323232" stroke-width="0.15"/>',
        f'<polygon points="0,{bottom:.3f} {BAR_WIDTH:.3f},{bottom:.3f} {BAR_WIDTH / 2:.3f},{bottom + TRIANGLE:.3f}" '
        f'fill="{escape(first)}" stroke="#323232" stroke-width="0.15"/>',
        f'<rect x="0" y="{top:.3f}" width="{BAR_WIDTH:.3f}" height="{BAR_HEIGHT:.3f}" fill="url(#ramp)" '
        'stroke="#323232" stroke-width="0.15"/>',
    ]
    ticks = tick_values(low, high)
    step = ticks[1] - ticks[0] if len(ticks) > 1 else (high - low)
    for value in ticks:
        y = y_of(value)
        parts.append(
            f'<line x1="{BAR_WIDTH:.3f}" y1="{y:.3f}" x2="{BAR_WIDTH + TICK:.3f}" y2="{y:.3f}" '
            'stroke="#323232" stroke-width="0.2"/>'
        )
        parts.append(
            f'<text x="{BAR_WIDTH + TICK + 0.8:.3f}" y="{y + FONT_SIZE * 0.35:.3f}" font-family="{FONT}" '
            f'font-size="{FONT_SIZE:.2f}" fill="#1e1e1e">{escape(format_tick(value, step))}</text>'
        )
    parts.append("</svg>")
    return "\n".join(parts)
