# SPDX-License-Identifier: GPL-2.0-or-later
"""What a worker does with one chunk of stations.

A task gets the chunk's arrays and the run's settings (raster paths and
options), opens the rasters once per worker process, reads only the windows
the engine asks for, calls the command's adapter and returns the chunk's
columns and ``qc_flag`` codes. Flags are assembled in the plugin's order:
stations read (A), heights (B), densities and fields (C), engine (D).
"""

from __future__ import annotations

import numpy as np

from ..algorithms import REDUCTION_FIELDS
from ..algorithms.terrain import HAMMER_ZONES
from . import adapters
from .flags import as_qc_flag
from .options import param
from .rasters import cached

HAMMER_ZONE_LETTERS = "".join(zone.letter for zone in HAMMER_ZONES)
#: The enumeration words are the names ``reduce_gravity`` takes (dashes aside).
NORMAL_FORMULAS = param("reduce", "NORMAL_GRAVITY").words
HEIGHT_FORMULAS = tuple(w.replace("-", "_") for w in param("reduce", "HEIGHT_CORRECTION").words)


def _terrain(chunk: dict, cfg: dict, density, innermost, method):
    fine_raster = cached(cfg["dem"])
    regional = cached(cfg["regional"]).elevation_grid() if cfg.get("regional") else None
    return adapters.terrain_chunk(
        chunk["x"],
        chunk["y"],
        np.asarray(chunk["heights"], float),
        fine_raster.elevation_grid(),
        regional,
        inner_radius=cfg["inner_radius"],
        outer_radius=cfg["outer_radius"],
        density=density,
        innermost_tc=innermost,
        water_density=cfg.get("water_density"),
        method=method,
        zones=cfg.get("zones", HAMMER_ZONE_LETTERS),
        reference_density=cfg["reference_density"],
        engine_check=cfg.get("engine_check", False),
    )


def _engine_columns(chunk: dict, cfg: dict, result: dict, late: list) -> dict:
    """dem_diff, tc_cover, tc_trunc and the height_dem_mismatch flags of the exact engine."""
    grid = cached(cfg["dem"]).elevation_grid()
    off = adapters.mismatch(grid, chunk["x"], chunk["y"], result["dem_diff"])
    for i in np.flatnonzero(off).tolist():
        late[i].append("height_dem_mismatch")
    columns = {"dem_diff": result["dem_diff"], "tc_cover": result["coverage"], "tc_trunc": result["tc_trunc"]}
    if "tc_numerr" in result:
        columns["tc_numerr"] = result["tc_numerr"]
    return columns


def run_chunk(chunk: dict, cfg: dict) -> dict:
    """Compute one chunk; returns ``{"index", "rows", "columns", "qc_flag"}``."""
    n = len(chunk["rows"])
    engine_flags = [[] for _ in range(n)]
    late = [[] for _ in range(n)]
    columns: dict = {}
    if cfg["command"] == "terrain":
        method = cfg["method"]
        innermost = None if chunk.get("innermost") is None else np.asarray(chunk["innermost"], float)
        result = _terrain(chunk, cfg, np.full(n, cfg["density"]), innermost, method)
        engine_flags = result["flags"]
        columns = {k: result[k] for k in ("tc_inner", "tc_outer", "tc_total")}
        if method == adapters.EXACT:
            columns.update(_engine_columns(chunk, cfg, result, late))
        elif cfg["zone_fields"]:
            for letter in HAMMER_ZONE_LETTERS:
                if letter in result["zones"]:
                    columns["tc_" + letter.lower()] = result["zones"][letter]
    else:
        density = np.asarray(chunk["density"], float)
        nan = np.full(n, np.nan)
        engine = {"tc_inner": nan, "tc_outer": nan, "dem_diff": nan, "tc_cover": nan}
        truncation = None
        if chunk.get("tc_field") is not None:
            tc_total = np.asarray(chunk["tc_field"], float)
        elif cfg.get("dem") and cfg["terrain_from_dem"]:
            result = _terrain(chunk, cfg, density, None, adapters.EXACT)
            engine_flags = result["flags"]
            tc_total = result["tc_total"]
            engine = {
                "tc_inner": result["tc_inner"],
                "tc_outer": result["tc_outer"],
                **_engine_columns(chunk, cfg, result, late),
            }
            truncation = result["tc_trunc"]
        else:
            tc_total = nan
        options = {
            "normal_formula": NORMAL_FORMULAS[cfg["normal_gravity"]],
            "height_formula": HEIGHT_FORMULAS[cfg["height_correction"]],
            "atmospheric": cfg["atmospheric"],
            "curvature": cfg["curvature"],
        }
        reduction_heights = np.asarray(chunk["reduction_heights"], float)
        reduced = adapters.reduce_chunk(
            np.asarray(chunk["observed"], float),
            np.asarray(chunk["latitude"], float),
            reduction_heights,
            density,
            tc_total,
            **options,
        )
        names = REDUCTION_FIELDS[: REDUCTION_FIELDS.index("tc_total")]
        columns = {k: np.asarray(reduced[k], float) for k in names}
        columns.update({"tc_inner": engine["tc_inner"], "tc_outer": engine["tc_outer"]})
        columns.update({k: np.asarray(reduced[k], float) for k in REDUCTION_FIELDS if k not in columns})
        columns.update(engine)
        grid = cached(cfg["dem"]).elevation_grid() if cfg.get("dem") and chunk.get("tc_field") is None else None
        columns.update(
            adapters.uncertainty_chunk(chunk, grid, reduction_heights, density, reduced, truncation, options, cfg)
        )
    qc = [
        as_qc_flag([*chunk["flags_a"][i], *chunk["flags_b"][i], *chunk["flags_c"][i], *engine_flags[i], *late[i]])
        for i in range(n)
    ]
    return {"index": chunk["index"], "rows": np.asarray(chunk["rows"]), "columns": columns, "qc_flag": qc}
