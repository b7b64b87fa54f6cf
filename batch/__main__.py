# SPDX-License-Identifier: GPL-2.0-or-later
"""Entry point: ``python3 -m relief_gravity.batch terrain|reduce --help``."""

import sys

from .cli import main

sys.exit(main())
