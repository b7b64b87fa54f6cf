# SPDX-License-Identifier: GPL-2.0-or-later
"""The science of Relief Gravity: pure numpy/scipy, no QGIS, GDAL or Qt."""
