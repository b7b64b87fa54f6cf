# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain corrections: exact prisms, far-zone kernels, zone engine, Hammer zones."""

from ._prism import prism_gravity

__all__ = ["prism_gravity"]
