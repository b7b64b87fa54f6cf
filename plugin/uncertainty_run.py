# SPDX-License-Identifier: GPL-2.0-or-later
"""Per-station uncertainty for the Bouguer reduction: parameters in, ``algorithms.uncertainty`` out.

The science (components, quadrature, near terrain model) is in
``algorithms/uncertainty/``; see ``docs/uncertainty.md``. This module only
reads the settings and fields and returns the columns to write.
"""

from __future__ import annotations

import warnings

import numpy as np
from qgis.core import (
    QgsProcessingParameterDefinition,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)
from qgis.PyQt.QtCore import QCoreApplication

#: Output fields, in order: the two totals, then the components.
TOTALS = ("tc_sigma", "cba_sigma")

HEIGHT_SIGMA = "HEIGHT_SIGMA"
HEIGHT_SIGMA_FIELD = "HEIGHT_SIGMA_FIELD"
G_SIGMA = "G_SIGMA"
DEM_SIGMA = "DEM_SIGMA"
DENSITY_LOW = "DENSITY_LOW"
DENSITY_HIGH = "DENSITY_HIGH"

#: Defaults (common practice, no source): RTK GNSS heights, a relative
#: gravimeter tied in loops, a DEM's random error per cell.
DEFAULT_HEIGHT_SIGMA = 0.05
DEFAULT_G_SIGMA = 0.02
DEFAULT_DEM_SIGMA = 1.0

#: Two-sided 95 % quantile of the normal distribution (an interval's half
#: width over 1.96 gives one sigma).
Z95 = 1.959964


def _tr(text: str) -> str:
    return QCoreApplication.translate("Uncertainty", text)


def add_parameters(algorithm) -> None:
    """The uncertainty settings (advanced) of a station algorithm."""
    number = QgsProcessingParameterNumber
    definitions = [
        number(
            HEIGHT_SIGMA, _tr("Station height error, one sigma (m)"), number.Double,
            defaultValue=DEFAULT_HEIGHT_SIGMA, minValue=0.0, maxValue=1000.0, optional=True,
        ),
        QgsProcessingParameterField(
            HEIGHT_SIGMA_FIELD, _tr("Station height error field (m; replaces the number where set)"),
            parentLayerParameterName=algorithm.INPUT, type=QgsProcessingParameterField.Numeric, optional=True,
        ),
        number(
            G_SIGMA, _tr("Observed gravity error, one sigma (mGal; a g_sigma field of the input is used instead)"),
            number.Double, defaultValue=DEFAULT_G_SIGMA, minValue=0.0, maxValue=1000.0, optional=True,
        ),
        number(
            DEM_SIGMA, _tr("DEM vertical random error per cell, one sigma (m)"), number.Double,
            defaultValue=DEFAULT_DEM_SIGMA, minValue=0.0, maxValue=1000.0, optional=True,
        ),
        number(
            DENSITY_LOW, _tr("Reduction density, lower bound of its 95 % interval (kg/m³)"), number.Double,
            optional=True, minValue=0.0,
        ),
        number(
            DENSITY_HIGH, _tr("Reduction density, upper bound of its 95 % interval (kg/m³)"), number.Double,
            optional=True, minValue=0.0,
        ),
    ]
    for definition in definitions:
        definition.setFlags(definition.flags() | QgsProcessingParameterDefinition.FlagAdvanced)
        algorithm.addParameter(definition)


def check_parameters(algorithm, parameters, context) -> str:
    """A sentence for an impossible density interval, else ''."""
    low, high = _interval(algorithm, parameters, context)
    if (low is None) != (high is None):
        return _tr("Give both bounds of the density interval (DENSITY_LOW and DENSITY_HIGH), or neither.")
    if low is not None and not 0 < low <= high:
        return _tr(
            "The density interval {} to {} kg/m³ is impossible: the lower bound must be positive and not above "
            "the upper bound."
        ).format(low, high)
    return ""


def _interval(algorithm, parameters, context):
    values = []
    for key in (DENSITY_LOW, DENSITY_HIGH):
        raw = parameters.get(key)
        values.append(None if raw is None or raw == "" else algorithm.parameterAsDouble(parameters, key, context))
    return values


def density_sigma(algorithm, parameters, context):
    """One sigma of the reduction density (kg/m³) from its 95 % interval, or None."""
    low, high = _interval(algorithm, parameters, context)
    if low is None or high is None:
        return None
    return (high - low) / (2.0 * Z95)


def uncertainty_settings(algorithm, parameters, context) -> dict:
    """What the budget assumed, for the provenance record."""
    field = algorithm.first_field(parameters, HEIGHT_SIGMA_FIELD, context)
    return {
        "height_sigma_m": algorithm.parameterAsDouble(parameters, HEIGHT_SIGMA, context),
        "height_sigma_field": field,
        "gravity_sigma_mgal": algorithm.parameterAsDouble(parameters, G_SIGMA, context),
        "dem_sigma_m": algorithm.parameterAsDouble(parameters, DEM_SIGMA, context),
        "density_sigma_kg_m3": density_sigma(algorithm, parameters, context),
        "method": "components in quadrature, Gauss-Hermite propagation (docs/uncertainty.md)",
    }


def station_sigmas(algorithm, parameters, context, table):
    """Per-station height (m) and gravity (mGal) one-sigma errors."""
    height = np.full(len(table), algorithm.parameterAsDouble(parameters, HEIGHT_SIGMA, context))
    field = algorithm.first_field(parameters, HEIGHT_SIGMA_FIELD, context)
    if field:
        given = table.field_values(field)
        height = np.where(np.isfinite(given) & (given >= 0), given, height)
    gravity = np.full(len(table), algorithm.parameterAsDouble(parameters, G_SIGMA, context))
    names = table.features[0].fields().names() if len(table) else []
    if "g_sigma" in names:
        given = table.field_values("g_sigma")
        gravity = np.where(np.isfinite(given) & (given >= 0), given, gravity)
    return height, gravity


def uncertainty_columns(
    algorithm,
    parameters,
    context,
    table,
    *,
    grid,
    x,
    y,
    heights_in_dem,
    heights_reduced,
    density,
    reduced: dict,
    truncation,
    reduction_options: dict,
    radius: float,
) -> dict:
    """Columns ``tc_sigma``, ``cba_sigma`` and the components (mGal) for every station.

    ``grid`` is the fine DEM (None when the terrain correction came from a
    field: then only gravity, height and density terms are known).
    """
    from ..algorithms.uncertainty import (
        COMPONENTS,
        height_component,
        near_terrain_spread,
        terrain_height_spread,
        uncertainty_budget,
    )

    height_sigma, gravity_sigma = station_sigmas(algorithm, parameters, context, table)
    dem_sigma = algorithm.parameterAsDouble(parameters, DEM_SIGMA, context)
    near = None
    terrain_nodes = None
    if grid is not None:
        near = near_terrain_spread(
            x, y, heights_in_dem, grid, density, dem_sigma, height_sigma, radius=radius,
        )
        terrain_nodes = near.height_nodes
    lat = np.asarray(table.latitude, dtype=float)
    usable = np.isfinite(lat) & (np.abs(lat) <= 90.0) & np.isfinite(heights_reduced)
    h_cba = np.full(len(table), np.nan)
    rho = np.broadcast_to(np.asarray(density, dtype=float), lat.shape)
    usable &= np.isfinite(rho) & (rho > 0)
    if usable.any():
        nodes = None if terrain_nodes is None else terrain_nodes[:, usable]
        with warnings.catch_warnings():
            # The reduction itself has already warned about unusual densities.
            warnings.simplefilter("ignore")
            h_cba[usable] = height_component(
                lat[usable], heights_reduced[usable], height_sigma[usable], rho[usable],
                terrain_nodes=nodes, **reduction_options,
            )
    h_tc = terrain_height_spread(terrain_nodes) if terrain_nodes is not None else np.full(len(table), np.nan)
    budget = uncertainty_budget(
        gravity_sigma=gravity_sigma,
        height_sigma_cba=h_cba,
        height_sigma_tc=h_tc,
        near=near,
        truncation=truncation,
        density=density,
        density_sigma=density_sigma(algorithm, parameters, context),
        slab=reduced["slab_corr"],
        curvature=reduced["curv_corr"],
        tc_total=reduced["tc_total"],
    )
    columns = {"tc_sigma": budget.tc_sigma, "cba_sigma": budget.cba_sigma}
    columns.update({name: budget.components[name] for name in COMPONENTS})
    return columns
