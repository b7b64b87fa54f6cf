# SPDX-License-Identifier: GPL-2.0-or-later
"""Station and DEM heights of a run: datums, units and plausibility (issue 8).

The terrain engine compares station heights with DEM heights in the DEM's
datum; the reduction uses heights above the ellipsoid (Hinze et al. 2005)
or, as a legacy option, orthometric heights. This module converts between
them with ``algorithms.datums`` and stops a run whose heights or DEM values
look like the wrong units or untagged voids, naming the setting to change.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
from osgeo import gdal
from qgis.core import QgsProcessingException
from qgis.PyQt.QtCore import QCoreApplication

from ..algorithms import datums
from ..algorithms.plausibility import dem_value_problem, height_scale_problem
from .geoid import egm96_at

gdal.UseExceptions()


def _tr(text: str) -> str:
    return QCoreApplication.translate("StationHeights", text)


def height_datum_names() -> list[str]:
    """Translated names of the station height datums, in the order of the HEIGHT_DATUM choice.

    Returns
    -------
    list of str
        Ellipsoidal, orthometric above EGM96, orthometric with a geoid height from a field or raster.
    """
    return [
        _tr("Ellipsoidal heights (e.g. from GNSS)"),
        _tr("Orthometric heights above the EGM96 geoid"),
        _tr("Orthometric heights, geoid height from GEOID_FIELD or GEOID_RASTER"),
    ]


def dem_datum_names() -> list[str]:
    """Translated names of the DEM height datums, in the order of the DEM_DATUM choice.

    Returns
    -------
    list of str
        EGM96 geoid, ellipsoid, same datum as the station heights.
    """
    return [
        _tr("EGM96 geoid (most global DEMs)"),
        _tr("Ellipsoid"),
        _tr("Same as the station heights"),
    ]


@dataclass
class Heights:
    """Heights of one run, m.

    ``in_dem_datum`` feeds the terrain engine; ``ellipsoidal`` the reduction;
    ``dem`` is the DEM's bilinear height at each station (None without DEM);
    ``egm96`` the EGM96 geoid height (None when not available).
    """

    in_dem_datum: np.ndarray
    ellipsoidal: np.ndarray
    orthometric: np.ndarray
    dem: np.ndarray | None
    egm96: np.ndarray | None
    offsets: datums.DatumOffsets


def prepare_heights(table, raw, height_datum, dem_datum, given_geoid, placed, feedback, declared_units=0) -> Heights:
    """Convert the stations' heights (``raw``, metres as declared; None = sample the DEM).

    Raises a sentence when the heights look like feet or centimetres
    against the DEM.
    """
    n = len(table)
    egm96 = None
    if datums.needs_egm96(height_datum, dem_datum):
        egm96 = egm96_at(table.longitude, table.latitude)
    else:
        try:
            egm96 = egm96_at(table.longitude, table.latitude)  # only to explain mismatches
        except QgsProcessingException:
            egm96 = None
    given = None
    if height_datum == datums.STATION_GEOID_GIVEN:
        given = np.asarray(given_geoid, dtype=float)
    offsets = datums.datum_offsets(height_datum, dem_datum, egm96=egm96, given=given)
    station_offset = np.broadcast_to(offsets.station, (n,))
    dem_offset = np.broadcast_to(offsets.dem, (n,))
    missing_geoid = ~np.isfinite(station_offset) | ~np.isfinite(dem_offset)
    table.flag_where(missing_geoid & np.isfinite(table.latitude), "geoid_missing")

    dem = placed.raster.sample_bilinear(placed.x, placed.y) if placed is not None else None
    if raw is None:
        at_station = np.array(dem, dtype=float) if dem is not None else np.full(n, np.nan)
        table.flag_where(np.isfinite(at_station), "height_from_dem")
        table.flag_where(~np.isfinite(at_station), "no_height")
    else:
        raw = np.asarray(raw, dtype=float)
        at_station = dem
        if dem is not None:
            # Compared in the stations' own datum, so a wrong unit scales
            # the geoid height too and the two stay comparable.
            scale = height_scale_problem(raw, np.asarray(dem) + dem_offset - station_offset)
            if scale is not None:
                raise QgsProcessingException(_height_scale_sentence(scale, declared_units, raw, dem))
    converted = datums.convert_heights(raw, offsets, height_datum, at_station, egm96)
    return Heights(converted.in_dem, converted.ellipsoidal, converted.orthometric, dem, egm96, offsets)


def _height_scale_sentence(scale: str, declared_units: int, raw, dem) -> str:
    """Sentence naming the unit slip between station heights and the DEM.

    ``declared_units`` is the HEIGHT_UNITS option (0 m, 1 ft, 2 cm): a DEM
    3.28 times the stations means metre heights declared as feet when feet
    were declared, otherwise a DEM in feet (likewise for centimetres).
    """
    ok = np.isfinite(raw) & np.isfinite(dem)
    example = (float(np.median(raw[ok])), float(np.median(dem[ok]))) if ok.any() else (np.nan, np.nan)
    if scale in ("feet", "centimetres"):
        unit = _tr("feet") if scale == "feet" else _tr("centimetres")
        return _tr(
            "The station heights look like {} read as metres (median {:.1f} against a DEM median of "
            "{:.1f} m at the stations): set HEIGHT_UNITS to {}."
        ).format(unit, example[0], example[1], unit)
    declared = {"inverse_feet": 1, "inverse_centimetres": 2}[scale]
    if declared_units == declared:
        return _tr(
            "The station heights look like metres declared in another unit (median {:.1f} m after "
            "conversion against a DEM median of {:.1f} m): set HEIGHT_UNITS to metres."
        ).format(*example)
    unit = _tr("feet") if scale == "inverse_feet" else _tr("centimetres")
    factor = 0.3048 if scale == "inverse_feet" else 0.01
    return _tr(
        "The elevation raster looks like heights in {} (about {:.4g} times the station heights in "
        "metres: DEM median {:.1f} against {:.1f} m). Convert it to metres (Raster Calculator: value "
        "× {}) and run again."
    ).format(unit, 1.0 / factor, example[1], example[0], factor)


def check_dem_values(path: str, label: str) -> None:
    """Read the whole raster once: stop on damage, untagged voids, feet or centimetres."""
    try:
        dataset = gdal.Open(path, gdal.GA_ReadOnly)
        band = dataset.GetRasterBand(1)
        nodata = band.GetNoDataValue()
        minimum, maximum = band.ComputeRasterMinMax(False)
    except RuntimeError as error:
        message = str(error)
        if "no valid pixels" in message.lower() or "failed to compute min/max" in message.lower():
            raise QgsProcessingException(
                _tr("The {} {} holds no valid heights (every cell is NoData).").format(label, path)
            ) from error
        raise QgsProcessingException(
            _tr("The {} {} cannot be read to the end (damaged or truncated file?): {}").format(label, path, message)
        ) from error
    problem = dem_value_problem(minimum, maximum, nodata is not None)
    if problem is None:
        return
    if problem.kind == "void":
        text = _tr(
            "The {} {} has cells of {:.6g} but no NoData value: they look like voids and would be "
            "taken as heights. Set the raster's NoData value to {:.6g} (Raster > Conversion > "
            "Translate, 'Assign a specified NoData value') and run again."
        ).format(label, path, problem.value, problem.value)
    elif problem.kind == "too_high":
        text = _tr(
            "The {} {} reaches {:.6g}, higher than any point on Earth in metres: it looks like feet "
            "or centimetres. Convert it to metres and run again."
        ).format(label, path, problem.value)
    else:
        text = _tr(
            "The {} {} goes down to {:.6g}, deeper than any point on Earth in metres: an untagged "
            "void value or a unit error. Set its NoData value or convert it to metres."
        ).format(label, path, problem.value)
    raise QgsProcessingException(text)


#: Largest window (cells) read at once for the stations' local relief; beyond it each station reads its own.
RELIEF_WINDOW_CELLS = 4_000_000


def local_relief(raster, x, y) -> np.ndarray:
    """Height range (m) of the 3 x 3 DEM cells around each station (NaN outside).

    The stations' bounding window is read once when it holds at most
    :data:`RELIEF_WINDOW_CELLS` cells, else every station reads its own 3 x 3.
    """
    x, y = np.asarray(x, dtype=float), np.asarray(y, dtype=float)
    out = np.full(len(x), np.nan)
    ok = np.isfinite(x) & np.isfinite(y)
    if not ok.any():
        return out
    cols = np.floor((x[ok] - raster.x_origin) / raster.cell_x).astype(np.int64)
    rows = np.floor((raster.y_origin - y[ok]) / raster.cell_y).astype(np.int64)
    r0, c0 = int(rows.min()) - 1, int(cols.min()) - 1
    n_rows, n_cols = int(rows.max()) + 2 - r0, int(cols.max()) + 2 - c0
    if n_rows * n_cols <= RELIEF_WINDOW_CELLS:
        window = raster.read_window(r0, c0, n_rows, n_cols)
        offsets = np.arange(-1, 2)
        rr = (rows - r0)[:, None, None] + offsets[None, :, None]
        cc = (cols - c0)[:, None, None] + offsets[None, None, :]
        cells = window[rr, cc].reshape(len(rows), 9)
    else:
        cells = np.stack([raster.read_window(int(r) - 1, int(c) - 1, 3, 3).ravel() for r, c in zip(rows, cols)])
    has = np.isfinite(cells).any(axis=1)
    relief = np.full(len(rows), np.nan)
    relief[has] = np.nanmax(cells[has], axis=1) - np.nanmin(cells[has], axis=1)
    out[ok] = relief
    return out


def flag_mismatches(table, dem_diff, heights: Heights, placed, height_datum, dem_datum, feedback) -> int:
    """Flag stations whose height disagrees with the DEM beyond the local relief.

    Says in the log which datum setting is likely wrong. Returns the count.
    """
    diff = np.asarray(dem_diff, dtype=float)
    tolerance = datums.mismatch_tolerance(local_relief(placed.raster, placed.x, placed.y))
    off = np.isfinite(diff) & (np.abs(diff) > tolerance)
    table.flag_where(off, "height_dem_mismatch")
    if off.any():
        feedback.pushWarning(
            _tr(
                "{} station(s) differ from the DEM by more than the local relief explains "
                "(largest {:.1f} m; flagged height_dem_mismatch, see dem_diff)."
            ).format(int(off.sum()), float(diff[off][np.argmax(np.abs(diff[off]))]))
        )
    geoid = heights.egm96
    if geoid is None and height_datum == datums.STATION_GEOID_GIVEN:
        geoid = heights.offsets.station
    if geoid is None:
        return int(off.sum())
    hint = datums.diagnose_datum(diff, geoid, height_datum, dem_datum)
    if hint is not None:
        names = {"HEIGHT_DATUM": height_datum_names(), "DEM_DATUM": dem_datum_names()}
        direction = _tr("above") if hint.sign > 0 else _tr("below")
        feedback.pushWarning(
            _tr(
                "{:.0%} of the stations lie about one geoid height ({:.1f} m) {} the DEM: a datum "
                "setting is likely wrong. Try {} = '{}'. (Either the station heights or the DEM "
                "are on another datum than declared; see docs/datums.md.)"
            ).format(
                hint.share,
                float(np.nanmedian(np.abs(geoid))),
                direction,
                hint.parameter,
                names[hint.parameter][hint.option],
            )
        )
    return int(off.sum())


#: Locale-independent names of the datum options (provenance records, logs).
HEIGHT_DATUM_KEYS = ("ellipsoidal", "orthometric_egm96", "orthometric_given_geoid")
DEM_DATUM_KEYS = ("egm96", "ellipsoid", "same_as_stations")


def geoid_description(height_datum: int, dem_datum: int) -> str:
    """Which geoid the run used (for the provenance record)."""
    from .geoid import find_egm96

    parts = []
    if datums.needs_egm96(height_datum, dem_datum):
        parts.append("EGM96 from " + str(find_egm96()))
    if height_datum == datums.STATION_GEOID_GIVEN:
        parts.append("station geoid heights from GEOID_FIELD or GEOID_RASTER")
    return "; ".join(parts) or "none (ellipsoidal heights and DEM)"


def warn_partial_coverage(coverage, outer_radius: float, regional_given: bool, feedback) -> None:
    """Say plainly in the log when the rasters do not reach the outer radius."""
    cover = np.asarray(coverage, dtype=float)
    short = np.isfinite(cover) & (cover < 0.99)
    if not short.any():
        return
    advice = (
        _tr("Give a regional elevation raster (REGIONAL_DEM) reaching {:.1f} km around every station.")
        if not regional_given
        else _tr("The regional elevation raster does not reach {:.1f} km around these stations; extend it.")
    ).format(outer_radius / 1000.0)
    feedback.pushWarning(
        _tr(
            "{} station(s) have elevation data over only part of the correction area (lowest tc_cover {:.2f}); "
            "their terrain correction misses the far terrain (flagged tc_partial). {}"
        ).format(int(short.sum()), float(np.nanmin(cover[short])), advice)
    )
