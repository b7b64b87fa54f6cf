# SPDX-License-Identifier: GPL-2.0-or-later
"""The one error the batch runner shows the user as a sentence."""


class BatchError(Exception):
    """A problem with the whole run, stated as a sentence that says what to fix."""
