# SPDX-License-Identifier: GPL-2.0-or-later
"""Terrain correction with densities from a geology map (density units).

A geology map gives each DEM cell the density of the unit it lies in
(``docs/geology-densities.md``). The terrain correction is a sum over cells,
each proportional to its own density, and the engine leaves cells without
data (NaN) out of every sum (blocks count by their part with data, at its
centroid). So with K units u of density rho_u,

    TC = sum_u rho_u * TC_engine(DEM kept only on the cells of u, density 1),

one engine run per unit over a DEM masked to that unit. Around the station
the masking would cut the engine's innermost square (the sloping plane of
``_innermost.py``) into pieces the engine cannot model, so every unit run gets
an innermost value of 0 and the square is added once, from the unmasked DEM,
at the density of the station's own unit. One more run over the unmasked DEM
gives what does not add up over units: coverage, flags, the DEM height at the
station and the truncation estimate. Cost: K + 1 engine runs.
"""

from __future__ import annotations

import math
from collections.abc import Callable
from dataclasses import dataclass, replace

import numpy as np
import numpy.typing as npt

from ._engine import TerrainResult, terrain_correction
from ._evaluate import Physics
from ._grid import ElevationGrid
from ._innermost import innermost
from ._model import TerrainModel
from ._sampling import inside_extent, station_cells

#: Densities (kg/m^3) accepted as plausible rock densities; the same bounds
#: serve to tell g/cm^3 (0.5-5) from kg/m^3 (500-5000) in a density table.
DENSITY_BOUNDS = (500.0, 5000.0)


@dataclass(frozen=True, eq=False)
class DensityUnits:
    """Density units on the fine and regional DEM grids.

    Parameters
    ----------
    densities : array_like
        Density of each unit in kg/m^3 (finite, > 0); unit ``k`` is
        ``densities[k]``. The unit for "outside every polygon" (the default
        density) is one of them.
    fine : array_like of int
        Unit index of each cell of the fine DEM, shape ``(n_rows, n_cols)``
        of that grid, rows from the north like the grid.
    regional : array_like of int, optional
        The same for the regional DEM (required when a regional DEM is used).

    Raises
    ------
    ValueError
        For densities that are not finite and > 0, unit grids that are not
        2-D integer arrays, or indices outside ``0 .. len(densities) - 1``.

    Examples
    --------
    >>> u = DensityUnits([2670.0, 2200.0], [[0, 1], [1, 1]])
    >>> u.present().tolist(), u.densities.tolist()
    ([0, 1], [2670.0, 2200.0])
    >>> DensityUnits([2670.0], [[0, 1]])
    Traceback (most recent call last):
    ...
    ValueError: fine unit grid holds unit index 1; the units are 0 to 0
    """

    densities: np.ndarray
    fine: np.ndarray
    regional: np.ndarray | None = None

    def __post_init__(self) -> None:
        dens = np.atleast_1d(np.asarray(self.densities, dtype=float)).copy()
        if dens.ndim != 1 or dens.size == 0:
            msg = f"densities must be a non-empty list of values, got shape {dens.shape}"
            raise ValueError(msg)
        bad = ~(np.isfinite(dens) & (dens > 0))
        if np.any(bad):
            msg = f"every unit density must be a finite number > 0 kg/m^3, got {dens[bad][0]!r}"
            raise ValueError(msg)
        dens.flags.writeable = False
        object.__setattr__(self, "densities", dens)
        for name in ("fine", "regional"):
            grid = getattr(self, name)
            if grid is None:
                continue
            arr = np.asarray(grid)
            if arr.ndim != 2:
                msg = f"{name} unit grid must be 2-D, got shape {arr.shape}"
                raise ValueError(msg)
            if arr.size and not np.issubdtype(arr.dtype, np.integer):
                msg = f"{name} unit grid must hold integer unit indices, got {arr.dtype}"
                raise ValueError(msg)
            if arr.size and (arr.min() < 0 or arr.max() >= dens.size):
                worst = int(arr.min()) if arr.min() < 0 else int(arr.max())
                msg = f"{name} unit grid holds unit index {worst}; the units are 0 to {dens.size - 1}"
                raise ValueError(msg)
            # One byte per cell for up to 256 units (the grids are as large as the DEMs).
            arr = arr.astype(np.uint8 if dens.size <= 256 else np.int32)
            arr.flags.writeable = False
            object.__setattr__(self, name, arr)

    def present(self) -> np.ndarray:
        """Indices of the units that occur on the fine or regional grid (sorted).

        Examples
        --------
        >>> DensityUnits([2670.0, 2200.0, 2900.0], [[2, 2]], [[0]]).present().tolist()
        [0, 2]
        """
        grids = [self.fine] + ([self.regional] if self.regional is not None else [])
        seen = np.zeros(self.densities.size, dtype=bool)
        for g in grids:
            seen |= np.bincount(g.ravel(), minlength=self.densities.size).astype(bool)
        return np.nonzero(seen)[0]

    def station_density(self, grid: ElevationGrid, x: npt.ArrayLike, y: npt.ArrayLike) -> np.ndarray:
        """Density (kg/m^3) of the fine-grid cell holding each point, NaN outside the grid.

        Examples
        --------
        >>> g = ElevationGrid.from_array(np.zeros((1, 2)), 0, 10, 10, 10)
        >>> DensityUnits([2670.0, 2200.0], [[0, 1]]).station_density(g, [5.0, 15.0, 25.0], [5.0, 5.0, 5.0]).tolist()
        [2670.0, 2200.0, nan]
        >>> DensityUnits([2670.0, 2200.0], [[0, 1]]).station_density(g, [20.0], [0.0]).tolist()  # on the edge
        [nan]
        """
        xs = np.atleast_1d(np.asarray(x, dtype=float))
        ys = np.atleast_1d(np.asarray(y, dtype=float))
        out = np.full(xs.size, np.nan)
        ok = inside_extent(grid, xs, ys) & np.isfinite(xs) & np.isfinite(ys)
        if np.any(ok):
            r, c = station_cells(grid, xs[ok], ys[ok])
            # A point on the east or south edge lies inside the extent but past the last cell.
            cell = (r >= 0) & (r < grid.n_rows) & (c >= 0) & (c < grid.n_cols)
            index = np.flatnonzero(ok)[cell]
            out[index] = self.densities[self.fine[r[cell], c[cell]]]
        return out


def masked_grid(grid: ElevationGrid, units: np.ndarray, unit: int) -> ElevationGrid:
    """The grid with NaN on every cell whose unit is not ``unit`` (read lazily).

    Parameters
    ----------
    grid : ElevationGrid
        The DEM.
    units : numpy.ndarray of int
        Unit index of each cell, shape ``(grid.n_rows, grid.n_cols)``.
    unit : int
        The unit kept.

    Returns
    -------
    ElevationGrid
        Same geometry; its reader wraps the original one.

    Examples
    --------
    >>> g = ElevationGrid.from_array([[1.0, 2.0], [3.0, 4.0]], 0, 2, 1, 1)
    >>> masked_grid(g, np.array([[0, 1], [1, 0]]), 1).read_window(0, 0, 2, 2)
    array([[nan,  2.],
           [ 3., nan]])
    """
    if units.shape != (grid.n_rows, grid.n_cols):
        msg = f"unit grid has shape {units.shape}, the DEM {(grid.n_rows, grid.n_cols)}"
        raise ValueError(msg)

    def reader(row0: int, col0: int, n_rows: int, n_cols: int) -> np.ndarray:
        heights = np.asarray(grid.reader(row0, col0, n_rows, n_cols), dtype=float)
        keep = units[row0 : row0 + n_rows, col0 : col0 + n_cols] == unit
        return np.where(keep, heights, np.nan)

    return replace(grid, reader=reader)


def terrain_correction_by_units(
    x: npt.ArrayLike,
    y: npt.ArrayLike,
    station_height: npt.ArrayLike,
    fine: ElevationGrid,
    regional: ElevationGrid | None,
    units: DensityUnits,
    model: TerrainModel | None = None,
    *,
    station_density: npt.ArrayLike | None = None,
    progress: Callable[[float], None] | None = None,
    is_cancelled: Callable[[], bool] | None = None,
    workers: int | None = None,
) -> TerrainResult:
    """Terrain correction with one density per DEM cell, from density units.

    Parameters
    ----------
    x, y, station_height : array_like
        Stations in the fine grid's CRS and their heights (m), as for
        :func:`~._engine.terrain_correction`.
    fine, regional : ElevationGrid
        The DEMs (``regional`` may be None).
    units : DensityUnits
        Unit index of every cell of both grids and the unit densities.
    model : TerrainModel, optional
        Radii, curvature, water and field-estimated innermost values. Its
        ``density`` is not used (the units give the densities) and must be a
        single value.
    station_density : array_like, optional
        Density (kg/m^3) of the ground at each station, used for the
        innermost square (a plane through the station over one cell); by
        default that of the unit of the station's fine cell. The plugin
        passes the density of the polygon under the station, the one the
        slab uses. NaN falls back to the default.
    progress, is_cancelled, workers
        As for :func:`~._engine.terrain_correction` (progress over all runs).

    Returns
    -------
    TerrainResult
        ``tc_inner``, ``tc_outer``, ``tc_total`` summed over the units (mGal);
        ``dem_height``, ``height_difference``, ``coverage``,
        ``coverage_inner`` and ``flags`` from the unmasked DEM;
        ``truncation`` scaled to ``station_density``.

    Raises
    ------
    ValueError
        For a per-station density in ``model``, unit grids whose shape is not
        the DEM's, a regional DEM without regional units, or arrays of
        different lengths.
    TerrainCancelled
        When cancelled.

    Notes
    -----
    The correction is a sum over cells of :math:`\\rho_c\\,T_c` (each cell's
    attraction is proportional to its density), and the engine leaves NaN
    cells out, so

    .. math:: T = \\sum_u \\rho_u\\, T_{\\rm engine}(\\text{DEM on } u,\\ \\rho = 1)
              + \\rho_s\\, T_{\\square},

    with the station square :math:`T_{\\square}` (Nowell 1999 uniform-slope
    wedges) taken once from the unmasked DEM at the station's density
    :math:`\\rho_s`. Full-resolution cells are exact; a block of cells split
    by a contact becomes one column per unit, each at the mean height and
    centroid of its own cells. Water (when the model has it) stays linear:
    each unit run is at :math:`\\rho_u` with the same water density. Contacts
    are vertical and densities constant with depth
    (``docs/geology-densities.md``). Cost: one engine run per unit present
    plus one over the unmasked DEM.

    References
    ----------
    Nagy, D., 1966, Geophysics 31(2), 362-371 (prisms); Nowell, D.A.G., 1999,
    J. Appl. Geophys. 42, 117-134.

    Examples
    --------
    One unit over the whole DEM gives the constant-density engine result:

    >>> h = np.fromfunction(lambda i, j: 300.0 + 2.0 * i + (j % 7), (81, 81))
    >>> g = ElevationGrid.from_array(h, 0, 2430, 30, 30)
    >>> m = TerrainModel(inner_radius=300, outer_radius=1100, curvature=False)
    >>> u = DensityUnits([2400.0], np.zeros((81, 81), dtype=int))
    >>> a = terrain_correction_by_units([1215.0], [1215.0], [380.0], g, None, u, m)
    >>> b = terrain_correction([1215.0], [1215.0], [380.0], g, None, replace(m, density=2400.0))
    >>> bool(abs(a.tc_total[0] - b.tc_total[0]) < 1e-12), a.flags == b.flags
    (True, True)
    """
    model = model if model is not None else TerrainModel()
    if model.per_station_density:
        msg = "with density units the model's density must be one value (the units give the densities)"
        raise ValueError(msg)
    xs = np.atleast_1d(np.asarray(x, dtype=float))
    ys = np.atleast_1d(np.asarray(y, dtype=float))
    hs = np.atleast_1d(np.asarray(station_height, dtype=float))
    n = xs.size
    if ys.size != n or hs.size != n:
        msg = f"x, y and station_height must have the same length, got {xs.size}, {ys.size}, {hs.size}"
        raise ValueError(msg)
    model.check_stations(n)
    if units.fine.shape != (fine.n_rows, fine.n_cols):
        msg = f"fine unit grid has shape {units.fine.shape}, the fine DEM {(fine.n_rows, fine.n_cols)}"
        raise ValueError(msg)
    if regional is not None:
        if units.regional is None:
            msg = "a regional DEM needs a regional unit grid"
            raise ValueError(msg)
        if units.regional.shape != (regional.n_rows, regional.n_cols):
            msg = (
                f"regional unit grid has shape {units.regional.shape}, "
                f"the regional DEM {(regional.n_rows, regional.n_cols)}"
            )
            raise ValueError(msg)
    rho_s = units.station_density(fine, xs, ys)
    if station_density is not None:
        given = np.atleast_1d(np.asarray(station_density, dtype=float))
        if given.size != n:
            msg = f"station_density must have one value per station ({n}), got {given.size}"
            raise ValueError(msg)
        if np.any(np.isinf(given) | (given <= 0)):
            bad = given[np.isinf(given) | (given <= 0)][0]
            msg = f"station densities must be > 0 kg/m^3 (NaN for none), got {bad!r}"
            raise ValueError(msg)
        rho_s = np.where(np.isfinite(given), given, rho_s)

    present = units.present()
    runs = len(present) + 1

    def sub_progress(k: int) -> Callable[[float], None] | None:
        if progress is None:
            return None
        return lambda f: progress((k + f) / runs)

    # The unmasked run: coverage, flags, DEM height, truncation (at unit density;
    # innermost values passed on so that their finiteness shapes the flags as usual).
    base = terrain_correction(xs, ys, hs, fine, regional, replace(model, density=1.0), progress=sub_progress(0),
                              is_cancelled=is_cancelled, workers=workers)
    todo = np.isfinite(base.tc_total)
    zero = replace(model, innermost_tc=np.zeros(n))
    tc_inner = np.zeros(n)
    tc_outer = np.zeros(n)
    for k, u in enumerate(present, start=1):
        fine_u = masked_grid(fine, units.fine, int(u))
        regional_u = masked_grid(regional, units.regional, int(u)) if regional is not None else None
        r = terrain_correction(xs, ys, hs, fine_u, regional_u, replace(zero, density=float(units.densities[u])),
                               progress=sub_progress(k), is_cancelled=is_cancelled, workers=workers)
        tc_inner += r.tc_inner
        tc_outer += r.tc_outer
    square = np.zeros(n)
    if np.any(todo):
        idx = np.nonzero(todo)[0]
        unit_physics = Physics(1.0, None, model.inner_radius, model.outer_radius, model.curvature)
        sq = innermost(fine, xs[idx], ys[idx], hs[idx], unit_physics)[0]
        value = sq * rho_s[idx]
        if model.innermost_tc is not None:
            field = model.innermost_tc[idx]
            value = np.where(np.isfinite(field), field, value)
        square[idx] = np.where(np.isfinite(value), value, 0.0)
    tc_inner = np.where(todo, tc_inner + square, np.nan)
    tc_outer = np.where(todo, tc_outer, np.nan)
    if progress is not None:
        progress(1.0)
    return TerrainResult(
        tc_inner=tc_inner,
        tc_outer=tc_outer,
        tc_total=tc_inner + tc_outer,
        dem_height=base.dem_height,
        height_difference=base.height_difference,
        coverage=base.coverage,
        coverage_inner=base.coverage_inner,
        truncation=base.truncation * rho_s,
        flags=base.flags,
    )


def density_table_to_kg_m3(values: npt.ArrayLike) -> tuple[np.ndarray, str]:
    """Densities of a map's polygons in kg/m^3, with the unit they were given in.

    Parameters
    ----------
    values : array_like
        One density per polygon (NaN for none), all in kg/m^3 or all in
        g/cm^3.

    Returns
    -------
    values : numpy.ndarray
        In kg/m^3 (NaN kept).
    unit : str
        ``"kg/m3"`` or ``"g/cm3"``.

    Raises
    ------
    ValueError
        When the values fit neither unit within ``DENSITY_BOUNDS`` (500-5000
        kg/m^3 or 0.5-5 g/cm^3; common practice, no source), naming the first
        value out of range; or when no value is given.

    Notes
    -----
    The two ranges do not overlap, so the unit is that of the range holding
    every value; a table mixing both is refused rather than guessed.

    Examples
    --------
    >>> v, unit = density_table_to_kg_m3([2.67, 2.2, float("nan")])
    >>> v.tolist()[:2], unit
    ([2670.0, 2200.0], 'g/cm3')
    >>> density_table_to_kg_m3([2670.0, 2.2])
    Traceback (most recent call last):
    ...
    ValueError: density 2.2 is not in 500-5000 kg/m^3 like the others (2670); one unit for every polygon
    """
    v = np.atleast_1d(np.asarray(values, dtype=float))
    finite = v[np.isfinite(v)]
    if finite.size == 0:
        msg = "no polygon has a density"
        raise ValueError(msg)
    low, high = DENSITY_BOUNDS
    in_kg = (finite >= low) & (finite <= high)
    in_g = (finite >= low / 1000.0) & (finite <= high / 1000.0)
    if np.all(in_kg):
        return v.copy(), "kg/m3"
    if np.all(in_g):
        return v * 1000.0, "g/cm3"
    if np.any(in_kg) and np.sum(in_kg) >= np.sum(in_g):
        odd = finite[~in_kg][0]
        msg = (
            f"density {odd:g} is not in {low:g}-{high:g} kg/m^3 like the others ({finite[in_kg][0]:g}); "
            "one unit for every polygon"
        )
        raise ValueError(msg)
    if np.any(in_g):
        odd = finite[~in_g][0]
        msg = (
            f"density {odd:g} is not in {low / 1000:g}-{high / 1000:g} g/cm^3 like the others ({finite[in_g][0]:g}); "
            "one unit for every polygon"
        )
        raise ValueError(msg)
    msg = f"density {finite[0]:g} is neither in {low:g}-{high:g} kg/m^3 nor in {low / 1000:g}-{high / 1000:g} g/cm^3"
    raise ValueError(msg)


def unit_table(polygon_density: npt.ArrayLike, default_density: float) -> tuple[np.ndarray, np.ndarray]:
    """Units from polygon densities: unit 0 is the default, one unit per distinct density.

    Parameters
    ----------
    polygon_density : array_like
        Density of each polygon in kg/m^3 (NaN: the polygon takes the default).
    default_density : float
        Density outside every polygon (kg/m^3, > 0).

    Returns
    -------
    densities : numpy.ndarray
        Unit densities; ``densities[0] == default_density``.
    polygon_unit : numpy.ndarray of int
        Unit of each polygon (0 for a polygon at the default density or
        without one).

    Examples
    --------
    >>> d, u = unit_table([2200.0, 2900.0, 2200.0, 2670.0, np.nan], 2670.0)
    >>> d.tolist(), u.tolist()
    ([2670.0, 2200.0, 2900.0], [1, 2, 1, 0, 0])
    """
    if not (math.isfinite(default_density) and default_density > 0):
        msg = f"default density must be a finite number > 0 kg/m^3, got {default_density!r}"
        raise ValueError(msg)
    dens = np.atleast_1d(np.asarray(polygon_density, dtype=float))
    table = [float(default_density)]
    out = np.zeros(dens.size, dtype=np.int64)
    for i, d in enumerate(dens):
        if not np.isfinite(d) or d == default_density:
            continue
        if d not in table:
            table.append(float(d))
        out[i] = table.index(float(d))
    return np.array(table), out
