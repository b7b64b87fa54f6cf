# SPDX-License-Identifier: GPL-2.0-or-later
"""Command-line options: one per parameter of the matching Processing algorithm.

The tables below restate the parameters of ``reliefgravity:terraincorrection``
and ``reliefgravity:bouguerreduction`` without importing QGIS; a test compares
them with the algorithms' ``parameterDefinitions()`` so that a parameter added
to an algorithm without a batch option fails. Naming: ``INNER_RADIUS`` ->
``--inner-radius``; ``INPUT`` is ``--stations`` (with ``--layer``) and
``OUTPUT`` is ``--output``; enumerations take short words, in the algorithm's
option order; booleans take ``--name`` / ``--no-name``.
"""

from __future__ import annotations

import argparse
import os
from dataclasses import dataclass


@dataclass(frozen=True)
class Param:
    """A Processing parameter as the batch runner exposes it."""

    name: str
    kind: str  # source, sink, field, raster, number, enum, bool, string, polygons
    help: str
    default: object = None
    words: tuple = ()
    optional: bool = False
    minimum: float | None = None
    maximum: float | None = None

    @property
    def option(self) -> str:
        """The command-line option, ``--stations`` for INPUT, else ``--name-in-lower-case``."""
        special = {"INPUT": "--stations", "OUTPUT": "--output"}
        return special.get(self.name, "--" + self.name.lower().replace("_", "-"))

    @property
    def dest(self) -> str:
        """The option's attribute name in argparse's namespace."""
        return self.option[2:].replace("-", "_")


_HEIGHT_UNITS = Param("HEIGHT_UNITS", "enum", "units of the height field", 0, ("metres", "feet", "centimetres"))
#: Datum words, in the order of ``algorithms.datums`` (STATION_* and DEM_* constants).
_DATUMS = (
    Param(
        "HEIGHT_DATUM",
        "enum",
        "station heights are ellipsoidal (GNSS), orthometric above EGM96, or orthometric with the geoid "
        "height from --geoid-field or --geoid-raster",
        0,
        ("ellipsoidal", "egm96", "geoid-given"),
    ),
    Param("GEOID_FIELD", "field", "geoid height field (m, geoid above the ellipsoid)", optional=True),
    Param("GEOID_RASTER", "raster", "geoid height raster (m, geoid above the ellipsoid)", optional=True),
    Param(
        "DEM_DATUM",
        "enum",
        "elevation raster heights are above EGM96 (most global DEMs), the ellipsoid, or the same datum as the stations",
        0,
        ("egm96", "ellipsoid", "same"),
    ),
)
_DEM_REGIONAL_RADII = (
    Param("REGIONAL_DEM", "raster", "regional elevation raster for the outer zone", optional=True),
    Param("INNER_RADIUS", "number", "inner zone radius (m)", 895.0, minimum=0.0),
    Param("OUTER_RADIUS", "number", "outer zone radius (m)", 166735.0, minimum=0.0),
)
_DENSITY = Param("DENSITY", "number", "reduction density (kg/m3)", 2670.0)
_DENSITY_LAYER = (
    Param(
        "DENSITY_LAYER",
        "polygons",
        "geology polygons with densities (not supported by the batch runner)",
        optional=True,
    ),
    Param("DENSITY_LAYER_FIELD", "field", "density field of the geology polygons", optional=True),
)
_UNCERTAINTY = (
    Param(
        "HEIGHT_SIGMA",
        "number",
        "station height error, one sigma (m)",
        0.05,
        optional=True,
        minimum=0.0,
        maximum=1000.0,
    ),
    Param(
        "HEIGHT_SIGMA_FIELD", "field", "station height error field (m; replaces the number where set)", optional=True
    ),
    Param(
        "G_SIGMA",
        "number",
        "observed gravity error, one sigma (mGal; a g_sigma field of the input is used instead)",
        0.02,
        optional=True,
        minimum=0.0,
        maximum=1000.0,
    ),
    Param(
        "DEM_SIGMA",
        "number",
        "DEM vertical random error per cell, one sigma (m)",
        1.0,
        optional=True,
        minimum=0.0,
        maximum=1000.0,
    ),
    Param(
        "DENSITY_LOW",
        "number",
        "reduction density, lower bound of its 95%% interval (kg/m3)",
        optional=True,
        minimum=0.0,
    ),
    Param(
        "DENSITY_HIGH",
        "number",
        "reduction density, upper bound of its 95%% interval (kg/m3)",
        optional=True,
        minimum=0.0,
    ),
)

TERRAIN = (
    Param("INPUT", "source", "station file (GeoPackage, Parquet, any OGR point layer)"),
    Param("HEIGHT_FIELD", "field", "station height field (empty: sample the DEM)", optional=True),
    _HEIGHT_UNITS,
    Param("DEM", "raster", "elevation raster (GeoTIFF, VRT mosaic, ...; metres)"),
    *_DATUMS,
    *_DEM_REGIONAL_RADII,
    _DENSITY,
    *_DENSITY_LAYER,
    Param("INNERMOST_TC_FIELD", "field", "field-estimated innermost-ring correction (mGal)", optional=True),
    Param(
        "WATER_DENSITY",
        "number",
        "treat cells below sea level as water of this density (kg/m3)",
        optional=True,
        minimum=0.0,
    ),
    Param("METHOD", "enum", "exact engine or ring-and-sector (Hammer 1939 zones B-M)", 0, ("exact", "ring-sector")),
    Param("ZONE_FIELDS", "bool", "ring-and-sector: one field per Hammer zone", False),
    Param(
        "ZONES",
        "string",
        "ring-and-sector: Hammer zones (contiguous letters out of B-M, or a range such as B-M)",
        "BCDEFGHIJKLM",
    ),
    Param(
        "ENGINE_CHECK",
        "bool",
        "also write tc_numerr, the engine's own error against a refined evaluation (about 4x the time)",
        False,
    ),
    Param("OUTPUT", "sink", "output file (.gpkg, or .parquet where GDAL has the driver)"),
)

REDUCE = (
    Param("INPUT", "source", "station file (GeoPackage, Parquet, any OGR point layer)"),
    Param("GRAVITY_FIELD", "field", "observed gravity field (in --gravity-units)"),
    Param(
        "GRAVITY_UNITS",
        "enum",
        "units of observed gravity (um-s2: micrometres per second squared)",
        0,
        ("mgal", "um-s2", "gal", "m-s2"),
    ),
    Param("HEIGHT_FIELD", "field", "station height field (empty: sample the DEM)", optional=True),
    _HEIGHT_UNITS,
    Param("DEM", "raster", "elevation raster (GeoTIFF, VRT mosaic, ...; metres)", optional=True),
    *_DATUMS,
    _DENSITY,
    Param("DENSITY_FIELD", "field", "reduction density field, per station", optional=True),
    Param("DENSITY_FIELD_UNITS", "enum", "units of the density field", 0, ("kg/m3", "g/cm3")),
    Param("NORMAL_GRAVITY", "enum", "normal gravity formula", 0, ("grs80", "wgs84", "1967")),
    Param("HEIGHT_CORRECTION", "enum", "height (free-air) correction", 0, ("second-order", "first-order")),
    Param("ATMOSPHERIC", "bool", "apply the atmospheric correction", True),
    Param("CURVATURE", "bool", "spherical cap to 166.7 km (curvature correction)", True),
    Param("TC_FIELD", "field", "existing terrain-correction field (mGal)", optional=True),
    *_DEM_REGIONAL_RADII,
    *_UNCERTAINTY,
    *_DENSITY_LAYER,
    Param(
        "ORTHOMETRIC_REDUCTION",
        "bool",
        "reduce with orthometric heights (legacy practice; the standard uses ellipsoidal heights)",
        False,
    ),
    Param(
        "ENGINE_CHECK",
        "bool",
        "also write tc_numerr, the engine's own error against a refined evaluation (about 4x the time)",
        False,
    ),
    Param("OUTPUT", "sink", "output file (.gpkg, or .parquet where GDAL has the driver)"),
)

#: command -> (Processing algorithm id, parameters)
COMMANDS = {
    "terrain": ("reliefgravity:terraincorrection", TERRAIN),
    "reduce": ("reliefgravity:bouguerreduction", REDUCE),
}

DEFAULT_CHUNK = 200
DEFAULT_MEMORY = "2GiB"


def _add_param(parser: argparse.ArgumentParser, p: Param) -> None:
    if p.kind == "enum":
        parser.add_argument(
            p.option, dest=p.dest, choices=p.words, default=p.words[p.default], help=p.help + " (default %(default)s)"
        )
    elif p.kind == "bool":
        parser.add_argument(
            p.option, dest=p.dest, action=argparse.BooleanOptionalAction, default=p.default, help=p.help
        )
    elif p.kind == "number":
        suffix = " (default %(default)s)" if p.default is not None else ""
        parser.add_argument(p.option, dest=p.dest, type=float, default=p.default, metavar="X", help=p.help + suffix)
    elif p.kind == "string":
        parser.add_argument(
            p.option, dest=p.dest, default=p.default, metavar="TEXT", help=p.help + " (default %(default)s)"
        )
    else:
        required = not p.optional
        metavar = {"field": "FIELD", "raster": "RASTER", "source": "FILE", "sink": "OUT", "polygons": "FILE"}[p.kind]
        parser.add_argument(p.option, dest=p.dest, required=required, metavar=metavar, help=p.help)
        if p.kind == "source":
            parser.add_argument("--layer", metavar="NAME", help="layer of the station file (default: its first layer)")


def build_parser() -> argparse.ArgumentParser:
    """The argument parser of both commands (one sub-command each)."""
    parser = argparse.ArgumentParser(
        prog="python3 -m relief_gravity.batch",
        description="Relief Gravity batch runner: the terrain correction and the Bouguer reduction of "
        "the Processing algorithms, on a Dask cluster, without QGIS.",
    )
    sub = parser.add_subparsers(dest="command", required=True, metavar="terrain|reduce")
    for command, (algorithm, params) in COMMANDS.items():
        p = sub.add_parser(command, help=f"as {algorithm}", description=f"Same science and options as {algorithm}.")
        for param in params:
            _add_param(p, param)
        run = p.add_argument_group("running")
        run.add_argument(
            "--workers",
            type=int,
            default=os.cpu_count() or 1,
            metavar="N",
            help="worker processes of the local cluster (default: the cores, %(default)s)",
        )
        run.add_argument(
            "--scheduler",
            metavar="ADDRESS",
            help="use the dask.distributed scheduler at ADDRESS instead of a local cluster",
        )
        run.add_argument(
            "--chunk-size", type=int, default=DEFAULT_CHUNK, metavar="K", help="stations per task (default %(default)s)"
        )
        run.add_argument(
            "--memory-limit",
            default=DEFAULT_MEMORY,
            metavar="BYTES",
            help="memory limit per local worker, e.g. 2GiB (default %(default)s)",
        )
        run.add_argument("--overwrite", action="store_true", help="replace an existing output file")
        run.add_argument("--quiet", action="store_true", help="no progress bar")
    return parser


def processing_values(command: str, args: argparse.Namespace) -> dict:
    """The options as the Processing algorithm's parameter dict (enums as indices)."""
    values = {}
    for p in COMMANDS[command][1]:
        value = getattr(args, p.dest)
        if p.kind == "enum":
            value = p.words.index(value)
        elif p.kind == "source" and args.layer:
            value = f"{value}|layername={args.layer}"
        values[p.name] = value
    return values


def param(command: str, name: str) -> Param:
    """The parameter ``name`` of ``command`` ("terrain" or "reduce")."""
    return next(p for p in COMMANDS[command][1] if p.name == name)
