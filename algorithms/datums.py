# SPDX-License-Identifier: GPL-2.0-or-later
"""Height datums: ellipsoidal and geoid-referenced (orthometric) heights.

A height above the ellipsoid ``h`` and an orthometric height ``H`` above a
geoid differ by the geoid height ``N`` (geoid above the ellipsoid)::

    h = H + N                                   (Heiskanen & Moritz 1967, eq. 4-24)

Each height set here carries an *offset*: the geoid height of its reference
surface at the station (0 for the ellipsoid). Converting from datum A to
datum B is ``h_B = h_A + offset_A - offset_B``.

The geoid is taken at the station only: the terrain engine compares the
station height with DEM cells up to 166.7 km away, where the geoid differs
from its value at the station by a few metres at most (EGM96 slopes are
below about 1e-4, from memory), far less than DEM errors.

Nothing here reads files; the plugin reads the geoid grid and rasters.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

#: ``HEIGHT_DATUM`` options (index = enum value of the Processing parameter).
STATION_ELLIPSOIDAL, STATION_EGM96, STATION_GEOID_GIVEN = 0, 1, 2
#: ``DEM_DATUM`` options.
DEM_EGM96, DEM_ELLIPSOID, DEM_SAME_AS_STATIONS = 0, 1, 2

#: Largest geoid height magnitude on Earth, m (EGM96 ranges from about -107
#: to +86 m; from memory). A larger value is not a geoid height.
GEOID_LIMIT = 110.0


@dataclass(frozen=True)
class DatumOffsets:
    """Geoid height (m) of the station heights' and the DEM's reference surfaces.

    Attributes
    ----------
    station : ndarray
        Offset of the station heights (0 where they are ellipsoidal).
    dem : ndarray
        Offset of the DEM heights at each station (0 for an ellipsoidal DEM).
    """

    station: np.ndarray
    dem: np.ndarray

    def station_in_dem_datum(self, heights):
        """Station heights (m) expressed in the DEM's datum: ``h + off_st - off_dem``.

        Examples
        --------
        >>> o = DatumOffsets(np.array([0.0]), np.array([47.0]))
        >>> o.station_in_dem_datum(np.array([547.0])).tolist()
        [500.0]
        """
        return np.asarray(heights, dtype=float) + self.station - self.dem

    def station_ellipsoidal(self, heights):
        """Station heights above the ellipsoid (m): ``h + off_st``.

        Examples
        --------
        >>> DatumOffsets(np.array([47.0]), np.array([47.0])).station_ellipsoidal(np.array([500.0])).tolist()
        [547.0]
        """
        return np.asarray(heights, dtype=float) + self.station

    def dem_ellipsoidal(self, dem_heights):
        """DEM heights at the stations above the ellipsoid (m): ``z + off_dem``.

        Examples
        --------
        >>> DatumOffsets(np.array([0.0]), np.array([47.0])).dem_ellipsoidal(np.array([500.0])).tolist()
        [547.0]
        """
        return np.asarray(dem_heights, dtype=float) + self.dem


def datum_offsets(height_datum: int, dem_datum: int, egm96=None, given=None) -> DatumOffsets:
    """Offsets of the station and DEM datums from the options of the two parameters.

    Parameters
    ----------
    height_datum : int
        ``STATION_ELLIPSOIDAL``, ``STATION_EGM96`` or ``STATION_GEOID_GIVEN``.
    dem_datum : int
        ``DEM_EGM96``, ``DEM_ELLIPSOID`` or ``DEM_SAME_AS_STATIONS``.
    egm96 : array_like, optional
        EGM96 geoid height at each station (m); needed when a datum is EGM96.
    given : array_like, optional
        The user's geoid height at each station (m); needed for
        ``STATION_GEOID_GIVEN``.

    Returns
    -------
    DatumOffsets

    Examples
    --------
    >>> o = datum_offsets(STATION_ELLIPSOIDAL, DEM_EGM96, egm96=[46.7])
    >>> o.station.tolist(), o.dem.tolist()
    ([0.0], [46.7])
    >>> datum_offsets(STATION_EGM96, DEM_SAME_AS_STATIONS, egm96=[46.7]).dem.tolist()
    [46.7]
    """
    def need(values, what):
        if values is None:
            msg = f"{what} geoid heights are needed for this datum choice"
            raise ValueError(msg)
        return np.asarray(values, dtype=float)

    if height_datum == STATION_ELLIPSOIDAL:
        station = None
    elif height_datum == STATION_EGM96:
        station = need(egm96, "EGM96")
    elif height_datum == STATION_GEOID_GIVEN:
        station = need(given, "the user's")
    else:
        msg = f"unknown station height datum {height_datum!r}"
        raise ValueError(msg)
    if dem_datum == DEM_EGM96:
        dem = need(egm96, "EGM96")
    elif dem_datum == DEM_ELLIPSOID:
        dem = None
    elif dem_datum == DEM_SAME_AS_STATIONS:
        dem = station
    else:
        msg = f"unknown DEM datum {dem_datum!r}"
        raise ValueError(msg)
    shapes = [a.shape for a in (station, dem) if a is not None]
    shape = shapes[0] if shapes else (1,)
    zeros = np.zeros(shape)
    return DatumOffsets(
        station=zeros if station is None else station,
        dem=zeros if dem is None else dem,
    )


def needs_egm96(height_datum: int, dem_datum: int) -> bool:
    """True when either datum refers to the EGM96 geoid.

    Examples
    --------
    >>> needs_egm96(STATION_ELLIPSOIDAL, DEM_ELLIPSOID)
    False
    """
    return height_datum == STATION_EGM96 or dem_datum == DEM_EGM96


def bilinear_global(values, lon, lat, west: float, north: float, step: float):
    """Bilinear interpolation on a global grid of nodes in longitude and latitude.

    The node of row ``i``, column ``j`` is at longitude ``west + j*step`` and
    latitude ``north - i*step`` (degrees); columns wrap around in longitude
    (a grid of 360/step columns). This is the layout of PROJ's ``egm96_15.gtx``
    (15' nodes from -180 E, 90 N), which PROJ itself interpolates bilinearly.

    Parameters
    ----------
    values : ndarray, shape (rows, cols)
        Node values, row 0 northernmost.
    lon, lat : array_like
        Degrees; latitudes outside the grid give NaN.
    west, north, step : float
        First node's longitude and latitude, node spacing (degrees).

    Returns
    -------
    ndarray
        Interpolated values (NaN where lon/lat is NaN or outside).

    Examples
    --------
    >>> grid = np.array([[0.0, 1.0, 2.0, 3.0], [4.0, 5.0, 6.0, 7.0]])
    >>> bilinear_global(grid, [45.0, -45.0], [45.0, 90.0], -180.0, 90.0, 90.0).tolist()
    [4.5, 1.5]
    """
    values = np.asarray(values, dtype=float)
    lon = np.atleast_1d(np.asarray(lon, dtype=float))
    lat = np.atleast_1d(np.asarray(lat, dtype=float))
    rows, cols = values.shape
    out = np.full(np.broadcast(lon, lat).shape, np.nan)
    lon, lat = np.broadcast_arrays(lon, lat)
    col = np.mod(lon - west, 360.0) / step
    row = (north - lat) / step
    ok = np.isfinite(col) & np.isfinite(row) & (row >= 0) & (row <= rows - 1)
    if not ok.any():
        return out
    c = col[ok]
    r = row[ok]
    c0 = np.floor(c).astype(int)
    r0 = np.minimum(np.floor(r).astype(int), rows - 2)
    fc = c - c0
    fr = r - r0
    c0 = c0 % cols
    c1 = (c0 + 1) % cols
    r1 = r0 + 1
    out[ok] = (
        values[r0, c0] * (1 - fr) * (1 - fc)
        + values[r0, c1] * (1 - fr) * fc
        + values[r1, c0] * fr * (1 - fc)
        + values[r1, c1] * fr * fc
    )
    return out


def mismatch_tolerance(local_relief) -> np.ndarray:
    """Largest station-minus-DEM difference (m) that the local relief explains.

    ``tolerance = 10 m + local relief / 4`` where the local relief is the
    height range of the 3 x 3 DEM cells around the station (two cell widths):
    a quarter of it is the height change over half a cell, the station's
    position uncertainty within its cell; 10 m stands for the DEM's vertical
    error (global DEMs quote about 10 m, from memory). Common practice, no
    source.

    Examples
    --------
    >>> mismatch_tolerance([0.0, 40.0]).tolist()
    [10.0, 20.0]
    """
    relief = np.asarray(local_relief, dtype=float)
    return 10.0 + 0.25 * np.where(np.isfinite(relief), np.abs(relief), 0.0)


@dataclass(frozen=True)
class DatumHint:
    """What a consistent station-minus-DEM offset says about the datum settings.

    Attributes
    ----------
    sign : int
        +1 when the stations sit about one geoid height *above* the DEM,
        -1 when below.
    share : float
        Fraction of the compared stations showing that offset.
    parameter : str
        Setting likely wrong: ``"HEIGHT_DATUM"`` or ``"DEM_DATUM"``.
    option : int
        The option of that setting that would remove the offset.
    """

    sign: int
    share: float
    parameter: str
    option: int


def diagnose_datum(dem_diff, geoid, height_datum: int, dem_datum: int, majority: float = 0.5):
    """Whether most stations disagree with the DEM by about the local geoid height.

    A station "shows the offset" when its ``dem_diff`` (station minus DEM,
    in the DEM's datum, m) lies within ``max(3 m, 0.2 |N|)`` of ``+N`` or of
    ``-N`` while ``|N| >= 5 m`` (common practice, no source). When more than
    ``majority`` of the stations with both values show the same sign, the
    likely wrong setting is named:

    * ``dem_diff ~ +N`` (stations too high): the heights were ellipsoidal but
      treated as orthometric (``HEIGHT_DATUM`` -> ellipsoidal), or the DEM is
      geoid-referenced but declared ellipsoidal (``DEM_DATUM`` -> EGM96).
    * ``dem_diff ~ -N`` (stations too low): orthometric heights declared
      ellipsoidal (``HEIGHT_DATUM`` -> orthometric EGM96), or an ellipsoidal
      DEM declared EGM96 (``DEM_DATUM`` -> ellipsoid).

    Parameters
    ----------
    dem_diff, geoid : array_like
        Station minus DEM (m) and the EGM96 geoid height (m) at each station.
    height_datum, dem_datum : int
        The settings of the run.
    majority : float
        Share of stations needed.

    Returns
    -------
    DatumHint or None

    Examples
    --------
    >>> hint = diagnose_datum([-47.1, -46.5, -47.4], [47.0, 47.0, 47.1], STATION_ELLIPSOIDAL, DEM_EGM96)
    >>> hint.parameter, hint.option, hint.sign
    ('DEM_DATUM', 1, -1)
    >>> diagnose_datum([0.5, -2.0, 1.0], [47.0, 47.0, 47.0], STATION_ELLIPSOIDAL, DEM_EGM96) is None
    True
    """
    diff = np.asarray(dem_diff, dtype=float)
    n = np.broadcast_to(np.asarray(geoid, dtype=float), diff.shape)
    both = np.isfinite(diff) & np.isfinite(n)
    if not both.any():
        return None
    d, g = diff[both], n[both]
    width = np.maximum(3.0, 0.2 * np.abs(g))
    big = np.abs(g) >= 5.0
    above = big & (np.abs(d - g) <= width)
    below = big & (np.abs(d + g) <= width)
    for sign, hits in ((1, above), (-1, below)):
        share = float(hits.mean())
        if share > majority:
            return DatumHint(sign, share, *_likely_fix(sign, height_datum, dem_datum))
    return None


def _likely_fix(sign: int, height_datum: int, dem_datum: int) -> tuple[str, int]:
    if sign > 0:
        if height_datum != STATION_ELLIPSOIDAL and dem_datum != DEM_ELLIPSOID:
            return "HEIGHT_DATUM", STATION_ELLIPSOIDAL
        return "DEM_DATUM", DEM_EGM96
    if dem_datum == DEM_EGM96 and height_datum == STATION_ELLIPSOIDAL:
        # Both fixes remove the offset; an ellipsoidal DEM is rarer than
        # orthometric heights from levelling, but a GNSS survey (the default)
        # with a DEM of unknown datum is the common case this hint serves.
        return "DEM_DATUM", DEM_ELLIPSOID
    return "HEIGHT_DATUM", STATION_EGM96


@dataclass(frozen=True)
class StationHeights:
    """Station heights in the three datums a run needs (m).

    Attributes
    ----------
    in_dem : numpy.ndarray
        In the DEM's datum (for the terrain correction).
    ellipsoidal : numpy.ndarray
        Above the ellipsoid (the reduction standard's heights).
    orthometric : numpy.ndarray
        Above the geoid (legacy reductions); NaN without a geoid height.
    """

    in_dem: np.ndarray
    ellipsoidal: np.ndarray
    orthometric: np.ndarray


def convert_heights(raw, offsets: DatumOffsets, height_datum: int, dem_at_station=None, egm96=None) -> StationHeights:
    """Station heights in the DEM's datum, above the ellipsoid and above the geoid.

    Parameters
    ----------
    raw : array_like or None
        Station heights (m) in their declared datum; None: take the DEM's
        height at the station (``dem_at_station``, in the DEM's datum; NaN
        where there is none).
    offsets : DatumOffsets
        From :func:`datum_offsets` (``ellipsoidal = height + offset``).
    height_datum : int
        The stations' datum (``STATION_ELLIPSOIDAL`` ...).
    dem_at_station : array_like, optional
        The DEM's height at each station (m), None without a DEM.
    egm96 : array_like, optional
        EGM96 geoid height (m) at each station, for the orthometric height
        of ellipsoidal stations.

    Returns
    -------
    StationHeights

    Examples
    --------
    >>> off = datum_offsets(STATION_EGM96, DEM_EGM96, egm96=np.array([40.0]))
    >>> h = convert_heights(np.array([100.0]), off, STATION_EGM96)
    >>> float(h.in_dem[0]), float(h.ellipsoidal[0]), float(h.orthometric[0])
    (100.0, 140.0, 100.0)
    """
    if raw is None:
        in_dem = np.array(dem_at_station, dtype=float)
        ellipsoidal = in_dem + offsets.dem
    else:
        raw = np.asarray(raw, dtype=float)
        in_dem = raw + offsets.station - offsets.dem
        ellipsoidal = raw + offsets.station
    if height_datum == STATION_ELLIPSOIDAL:
        orthometric = ellipsoidal - (np.asarray(egm96, dtype=float) if egm96 is not None else np.nan)
    else:
        orthometric = ellipsoidal - offsets.station
    return StationHeights(np.asarray(in_dem, float), np.asarray(ellipsoidal, float), np.asarray(orthometric, float))
