# SPDX-License-Identifier: GPL-2.0-or-later
"""One module per Processing algorithm."""
