# SPDX-License-Identifier: GPL-2.0-or-later
"""QGIS side of Relief Gravity: plugin object, provider, Processing algorithms."""
