# SPDX-License-Identifier: GPL-2.0-or-later
"""The survey report.

Plots (:mod:`.plots`), HTML building (:mod:`.html`) and page content
(:mod:`.content`) are pure Python; only the Processing algorithm reads QGIS layers.
"""
