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
from .flags import as_qc_flag, codes_of
from .options import param
from .rasters import cached

HAMMER_ZONE_LETTERS = "".join(zone.letter for zone in HAMMER_ZONES)
#: The enumeration words are the names ``reduce_gravity`` takes (dashes aside).
NORMAL_FORMULAS = param("reduce", "NORMAL_GRAVITY").words
HEIGHT_FORMULAS = tuple(w.replace("-", "_") for w in param("reduce", "HEIGHT_CORRECTION").words)


def _heights(chunk: dict, fine_raster):
    """Heights from the chunk, or sampled from the DEM (flags B)."""
    if chunk.get("heights") is not None:
        return np.asarray(chunk["heights"], float), chunk["flags_b"]
    heights = fine_raster.sample_bilinear(chunk["x"], chunk["y"])
    flags = [["height_from_dem"] if np.isfinite(h) else ["no_height"] for h in heights]
    return heights, flags


def _terrain(chunk: dict, cfg: dict, heights, density, innermost, method):
    fine_raster = cached(cfg["dem"])
    regional = cached(cfg["regional"]).elevation_grid() if cfg.get("regional") else None
    return adapters.terrain_chunk(
        chunk["x"],
        chunk["y"],
        heights,
        fine_raster.elevation_grid(),
        regional,
        inner_radius=cfg["inner_radius"],
        outer_radius=cfg["outer_radius"],
        density=density,
        reference_density=cfg["reference_density"],
        innermost_tc=innermost,
        water_density=cfg.get("water_density"),
        method=method,
    )


def run_chunk(chunk: dict, cfg: dict) -> dict:
    """Compute one chunk; returns ``{"index", "rows", "columns", "qc_flag"}``."""
    n = len(chunk["rows"])
    fine_raster = cached(cfg["dem"]) if cfg.get("dem") else None
    if fine_raster is not None and chunk.get("heights") is None:
        heights, flags_b = _heights(chunk, fine_raster)
    else:
        heights, flags_b = np.asarray(chunk["heights"], float), chunk["flags_b"]
    engine_flags = [""] * n
    columns: dict = {}
    if cfg["command"] == "terrain":
        method = cfg["method"]
        density = np.full(n, cfg["density"])
        innermost = None if chunk.get("innermost") is None else np.asarray(chunk["innermost"], float)
        result = _terrain(chunk, cfg, heights, density, innermost, method)
        engine_flags = result["flags"]
        columns = {k: result[k] for k in ("tc_inner", "tc_outer", "tc_total")}
        if method == adapters.EXACT:
            columns["dem_diff"] = result["dem_diff"]
            columns["tc_cover"] = result["coverage"]
        elif cfg["zone_fields"]:
            for letter in HAMMER_ZONE_LETTERS:
                if letter in result["zones"]:
                    columns["tc_" + letter.lower()] = result["zones"][letter]
    else:
        density = np.asarray(chunk["density"], float)
        tc_inner = np.full(n, np.nan)
        tc_outer = np.full(n, np.nan)
        if chunk.get("tc_field") is not None:
            tc_total = np.asarray(chunk["tc_field"], float)
        elif cfg.get("dem") and cfg["terrain_from_dem"]:
            result = _terrain(chunk, cfg, heights, density, None, adapters.EXACT)
            engine_flags = result["flags"]
            tc_inner, tc_outer, tc_total = result["tc_inner"], result["tc_outer"], result["tc_total"]
        else:
            tc_total = np.full(n, np.nan)
        reduced = adapters.reduce_chunk(
            np.asarray(chunk["observed"], float),
            np.asarray(chunk["latitude"], float),
            heights,
            density,
            tc_total,
            normal_formula=NORMAL_FORMULAS[cfg["normal_gravity"]],
            height_formula=HEIGHT_FORMULAS[cfg["height_correction"]],
            atmospheric=cfg["atmospheric"],
            curvature=cfg["curvature"],
        )
        reduced["tc_inner"] = tc_inner
        reduced["tc_outer"] = tc_outer
        at = REDUCTION_FIELDS.index("tc_total")
        names = REDUCTION_FIELDS[:at] + ("tc_inner", "tc_outer") + REDUCTION_FIELDS[at:]
        columns = {k: np.asarray(reduced[k], float) for k in names}
    qc = [
        as_qc_flag([*chunk["flags_a"][i], *flags_b[i], *chunk["flags_c"][i], *codes_of(engine_flags[i])])
        for i in range(n)
    ]
    return {"index": chunk["index"], "rows": np.asarray(chunk["rows"]), "columns": columns, "qc_flag": qc}
