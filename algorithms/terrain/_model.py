# SPDX-License-Identifier: GPL-2.0-or-later
"""The terrain model: what the engine is asked to compute, checked once.

A :class:`TerrainModel` holds everything about the terrain correction except
the stations and the rasters: densities, water, zone radii, curvature and the
field-estimated innermost corrections. It is frozen and validated when it is
built, so the engine's parts receive one object instead of a dozen loose
parameters, and a distributed runner can send the same model to every worker
(:meth:`TerrainModel.for_stations` cuts the per-station parts to a chunk).

Density handling (see ``docs/terrain.md``, "Density"):

* one density: the engine runs at that density;
* one density per station: the terrain correction of dry land is linear in
  density, so the engine runs once at unit density and each station's result
  is scaled by its own density (stations without one get the reference
  density, the median); a field-estimated innermost value, already at the
  station's density, is divided by that same factor before the engine adds
  it, so it comes back unchanged. With water the correction is not
  proportional to the rock density alone (the water layer keeps its own
  density), so every station is computed at the reference density and
  flagged ``tc_density_reference`` where its own differs.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace

import numpy as np
import numpy.typing as npt

from ..constants import BOUGUER_CAP_RADIUS, DEFAULT_REDUCTION_DENSITY


@dataclass(frozen=True, eq=False)
class TerrainModel:
    """Densities, radii and options of a terrain correction (SI units).

    Parameters
    ----------
    density : float or array_like
        Terrain density in kg/m^3: one value, or one per station (NaN for a
        station without density: it gets the reference density).
    water_density : float, optional
        When given, DEM cells below height 0 hold water of this density
        (kg/m^3) up to a sea surface at height 0.
    inner_radius : float
        Radius (m) of the inner zone: cells and blocks within it count to
        ``tc_inner``, the rest to ``tc_outer``.
    outer_radius : float
        Radius (m) where the correction stops (166.735 km, LaFehr 1991).
    curvature : bool
        Lower the terrain by s^2/(2R) (True, the standard); False gives
        flat-Earth values for analytic checks.
    innermost_tc : array_like, optional
        Field-estimated correction (mGal) of each station's innermost square,
        at the station's own density; NaN where none. Where given it replaces
        the engine's sloping-plane model of that square.
    refinement : float
        Factor (1-8) on the distances, in block sides, at which the engine
        coarsens the terrain (1, the default, is the benchmarked setting; 2
        is a refined evaluation used to estimate the engine's own error).

    Raises
    ------
    ValueError
        With the offending value, for radii, densities or arrays that cannot
        be used.

    Examples
    --------
    >>> m = TerrainModel(density=[2600.0, 2700.0, np.nan], outer_radius=20000.0)
    >>> m.reference_density
    2650.0
    >>> m.density_factors(3).tolist()
    [2600.0, 2700.0, 2650.0]
    >>> TerrainModel(inner_radius=-1.0)
    Traceback (most recent call last):
    ...
    ValueError: inner_radius must be a number >= 0 m, got -1.0
    """

    density: float | np.ndarray = DEFAULT_REDUCTION_DENSITY
    water_density: float | None = None
    inner_radius: float = 2000.0
    outer_radius: float = BOUGUER_CAP_RADIUS
    curvature: bool = True
    innermost_tc: np.ndarray | None = None
    refinement: float = 1.0

    def __post_init__(self) -> None:
        inner = _number(self.inner_radius, "inner_radius")
        outer = _number(self.outer_radius, "outer_radius")
        if not inner >= 0:
            msg = f"inner_radius must be a number >= 0 m, got {self.inner_radius!r}"
            raise ValueError(msg)
        if not (outer > 0 and math.isfinite(outer)):
            msg = f"outer_radius must be a finite number > 0 m, got {self.outer_radius!r}"
            raise ValueError(msg)
        if inner > outer:
            msg = f"inner_radius ({inner} m) must not exceed outer_radius ({outer} m)"
            raise ValueError(msg)
        refinement = _number(self.refinement, "refinement")
        if not 1.0 <= refinement <= 8.0:
            msg = f"refinement must be a number from 1 to 8, got {self.refinement!r}"
            raise ValueError(msg)
        object.__setattr__(self, "refinement", refinement)
        object.__setattr__(self, "inner_radius", inner)
        object.__setattr__(self, "outer_radius", outer)
        object.__setattr__(self, "density", _density(self.density))
        if self.water_density is not None:
            water = _number(self.water_density, "water_density")
            if not (water >= 0 and math.isfinite(water)):
                msg = f"water_density must be a finite number >= 0 kg/m^3, got {self.water_density!r}"
                raise ValueError(msg)
            object.__setattr__(self, "water_density", water)
        if not isinstance(self.curvature, (bool, np.bool_)):
            msg = f"curvature must be True or False, got {self.curvature!r}"
            raise ValueError(msg)
        object.__setattr__(self, "curvature", bool(self.curvature))
        if self.innermost_tc is not None:
            values = np.atleast_1d(np.asarray(self.innermost_tc, dtype=float))
            if values.ndim != 1:
                msg = f"innermost_tc must be one value per station, got shape {values.shape}"
                raise ValueError(msg)
            if np.any(np.isinf(values)):
                msg = "innermost_tc holds an infinite value"
                raise ValueError(msg)
            values.flags.writeable = False
            object.__setattr__(self, "innermost_tc", values)

    @property
    def per_station_density(self) -> bool:
        """True when the density is an array (one value per station).

        Examples
        --------
        >>> TerrainModel().per_station_density
        False
        """
        return isinstance(self.density, np.ndarray)

    @property
    def reference_density(self) -> float:
        """The density the engine runs at (kg/m^3): the value, or the median.

        Examples
        --------
        >>> TerrainModel(density=2500.0).reference_density
        2500.0
        """
        if not self.per_station_density:
            return float(self.density)
        finite = self.density[np.isfinite(self.density)]
        return float(np.median(finite)) if finite.size else DEFAULT_REDUCTION_DENSITY

    @property
    def engine_water_density(self) -> float | None:
        """Water density over the reference density: the engine runs at unit rock density.

        Examples
        --------
        >>> TerrainModel(density=2000.0, water_density=1000.0).engine_water_density
        0.5
        """
        return None if self.water_density is None else self.water_density / self.reference_density

    def density_factors(self, n: int) -> np.ndarray:
        """Per-station factors that turn unit-density engine results into results at each station's density.

        Parameters
        ----------
        n : int
            Number of stations.

        Returns
        -------
        numpy.ndarray
            The station's density (the reference where NaN); the reference
            density for every station with water (the water layer is not
            proportional to the rock density).

        Examples
        --------
        >>> TerrainModel(density=[2600.0, np.nan]).density_factors(2).tolist()
        [2600.0, 2600.0]
        """
        self.check_stations(n)
        if self.water_density is not None or not self.per_station_density:
            return np.full(n, self.reference_density)
        return np.where(np.isfinite(self.density), self.density, self.reference_density)

    def check_stations(self, n: int) -> None:
        """Raise when a per-station array does not have ``n`` values.

        Examples
        --------
        >>> TerrainModel(innermost_tc=[0.1, 0.2]).check_stations(3)
        Traceback (most recent call last):
        ...
        ValueError: innermost_tc must have one value per station (3), got 2
        """
        if self.per_station_density and self.density.size != n:
            msg = f"density must be one value or one per station ({n}), got {self.density.size}"
            raise ValueError(msg)
        if self.innermost_tc is not None and self.innermost_tc.size != n:
            msg = f"innermost_tc must have one value per station ({n}), got {self.innermost_tc.size}"
            raise ValueError(msg)

    def for_stations(self, index: npt.ArrayLike) -> TerrainModel:
        """The same model for a subset of the stations (a chunk of a run).

        Parameters
        ----------
        index : array_like
            Integer indices or a boolean mask of the stations kept.

        Returns
        -------
        TerrainModel

        Examples
        --------
        >>> TerrainModel(density=[2600.0, 2700.0]).for_stations([1]).density.tolist()
        [2700.0]
        """
        density = self.density[index] if self.per_station_density else self.density
        innermost = self.innermost_tc[index] if self.innermost_tc is not None else None
        return replace(self, density=density, innermost_tc=innermost)

    def engine_innermost(self, n: int) -> np.ndarray | None:
        """Innermost values divided by the density factors (see module notes).

        Examples
        --------
        >>> TerrainModel(density=[2000.0, 4000.0], innermost_tc=[0.1, 0.2]).engine_innermost(2).tolist()
        [5e-05, 5e-05]
        """
        if self.innermost_tc is None:
            return None
        self.check_stations(n)
        return self.innermost_tc / self.density_factors(n)


def _number(value: object, name: str) -> float:
    try:
        out = float(value)  # type: ignore[arg-type]
    except (TypeError, ValueError):
        msg = f"{name} must be a number, got {value!r}"
        raise ValueError(msg) from None
    if math.isnan(out):
        msg = f"{name} must be a number, got {value!r}"
        raise ValueError(msg)
    return out


def _density(value: object) -> float | np.ndarray:
    array = np.asarray(value, dtype=float) if not isinstance(value, (int, float)) else None
    if array is None or array.ndim == 0:
        d = _number(value if array is None else array.item(), "density")
        if not (d > 0 and math.isfinite(d)):
            msg = f"density must be a finite number > 0 kg/m^3, got {value!r}"
            raise ValueError(msg)
        return d
    if array.ndim != 1:
        msg = f"density must be one value or one per station, got shape {array.shape}"
        raise ValueError(msg)
    finite = array[np.isfinite(array)]
    if np.any(np.isinf(array)) or np.any(finite <= 0):
        bad = array[np.isinf(array) | (np.isfinite(array) & (array <= 0))][0]
        msg = f"every station density must be > 0 kg/m^3 (or NaN for none), got {bad!r}"
        raise ValueError(msg)
    array = array.copy()
    array.flags.writeable = False
    return array
