# SPDX-License-Identifier: GPL-2.0-or-later
"""Relief Gravity: land gravity reduction to Bouguer anomaly maps in QGIS."""


def classFactory(iface):  # noqa: N802 - name imposed by QGIS
    """Return the plugin object; ``iface`` is None under qgis_process."""
    from .plugin.relief_gravity_plugin import ReliefGravityPlugin

    return ReliefGravityPlugin(iface)
