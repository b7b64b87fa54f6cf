# SPDX-License-Identifier: GPL-2.0-or-later
"""Real data: recompute a USGS-reduced survey under the publisher's conventions.

Dataset: ../shared/data/clvf-usgs-gravity (github.com/simpeg-research/
Mitchell_2022_CLVF_Gravity, file groundGrav_Combined_zEllipsoid_Full.csv;
USGS reductions, Langenheim et al. 2006, USGS OFR 2006-1056). Its README
states the publisher's conventions, used here:

- normal gravity: the 1967 formula, 978031.846 (1 + 0.005278895 sin^2 phi
  + 0.000023462 sin^4 phi) mGal;
- FAA = OG - gamma + 0.3086 H, with H the orthometric (NGVD29) height,
  recovered as H = (FAA - SBA) / 0.11192;
- SBA = FAA - 0.11192 H (flat slab, 2.67 g/cm^3; no curvature term);
- CBA = SBA + TTC - B, B = Bullard B of the 166.7 km cap (LaFehr 1991),
  which the publisher evaluated with the polynomial
  B = 1.464e-3 H - 3.533e-7 H^2 + 4.5e-14 H^3.

The anomalies are published to 0.01 mGal, so residuals of a few 0.01 mGal
are rounding (the recovered H inherits +-0.09 m from it).
"""

import csv

import numpy as np
import pytest

from relief_gravity.algorithms import curvature_correction, reduce_gravity

FILE_NAME = "groundGrav_Combined_zEllipsoid_Full.csv"
SLAB_PER_METRE = 0.11192  # mGal/m, the publisher's slab factor (README)
DENSITY = 2670.0  # 2.67 g/cm^3 (README)
# The G that makes 2 pi G 2670 kg/m^3 = 0.11192 mGal/m: 6.67139e-11.
DATABASE_G = SLAB_PER_METRE * 1e-5 / (2.0 * np.pi * DENSITY)

pytestmark = pytest.mark.slow


def _read(folder):
    with open(folder / FILE_NAME, newline="", encoding="utf-8") as handle:
        rows = list(csv.DictReader(handle))

    def column(name):
        return np.array([float(row[name]) if row[name].strip() else np.nan for row in rows])

    names = ("latWGS84", "zWGS84", "OG", "FAA", "SBA", "TTC", "CBA")
    data = {name: column(name) for name in names}
    complete = np.logical_and.reduce([np.isfinite(data[name]) for name in names])
    data["Station_ID"] = np.array([row["Station_ID"] for row in rows])
    return len(rows), {name: values[complete] for name, values in data.items()}


@pytest.fixture(scope="module")
def survey(shared_data_dir):
    n_rows, data = _read(shared_data_dir("clvf-usgs-gravity"))
    data["H"] = (data["FAA"] - data["SBA"]) / SLAB_PER_METRE
    return n_rows, data


@pytest.fixture(scope="module")
def reduced(survey):
    _, d = survey
    return reduce_gravity(
        d["OG"],
        d["latWGS84"],
        d["H"],
        density=DENSITY,
        terrain_correction=d["TTC"],
        normal_formula="1967",
        height_formula="first_order",
        atmospheric=False,
        curvature=True,
        gravitational_constant=DATABASE_G,
    )


def _stats(label, residual):
    rms = float(np.sqrt(np.mean(residual**2)))
    worst = float(np.max(np.abs(residual)))
    mean = float(np.mean(residual))
    print(f"{label:<36s} n={residual.size:5d}  rms={rms:.4f}  max={worst:.4f}  mean={mean:+.4f} mGal")
    return rms, worst


def test_dataset_shape(survey):
    n_rows, d = survey
    # README: 2,929 rows, 70 without FAA/SBA; 2,859 complete rows.
    assert n_rows == 2929
    assert d["OG"].size == 2859


def test_recovered_height_is_orthometric(survey):
    # README: zWGS84 is ellipsoidal, converted from NGVD29 with N = -31 to -28 m;
    # the recovered H must sit that far above it (a check that H is meaningful).
    _, d = survey
    separation = d["zWGS84"] - d["H"]
    print(f"geoid-like separation zWGS84 - H: {separation.min():.2f} .. {separation.max():.2f} m")
    assert separation.min() > -32.0 and separation.max() < -27.0


def test_free_air_anomaly(survey, reduced):
    _, d = survey
    rms, worst = _stats("FAA (ours - USGS)", reduced["faa"] - d["FAA"])
    assert rms < 0.05 and worst < 0.15


def test_simple_bouguer_anomaly(survey, reduced):
    # The publisher's SBA is slab only: compare faa - slab_corr.
    _, d = survey
    sba_slab = reduced["faa"] - reduced["slab_corr"]
    rms, worst = _stats("SBA slab (ours - USGS)", sba_slab - d["SBA"])
    assert rms < 0.05 and worst < 0.15
    # Our sba also holds Bullard B; it differs from the publisher's SBA by B.
    assert np.all(reduced["sba"] < sba_slab + 1e-12)


def test_complete_bouguer_anomaly(survey, reduced):
    _, d = survey
    rms, worst = _stats("CBA (ours - USGS)", reduced["cba"] - d["CBA"])
    assert rms < 0.05 and worst < 0.15


def test_curvature_term_against_publisher(survey, reduced):
    # Isolate the curvature term: publisher's SBA + TTC - our B versus their CBA
    # (three values rounded to 0.01 mGal: up to 0.015 mGal of rounding).
    _, d = survey
    rms, worst = _stats("CBA from USGS SBA+TTC-B (ours)", d["SBA"] + d["TTC"] - reduced["curv_corr"] - d["CBA"])
    assert rms < 0.01 and worst < 0.025
    # Our LaFehr closed form (with the database's G) versus their polynomial.
    h = d["H"]
    polynomial = 1.464e-3 * h - 3.533e-7 * h**2 + 4.5e-14 * h**3
    rms, worst = _stats("Bullard B (LaFehr - USGS polynomial)", reduced["curv_corr"] - polynomial)
    assert worst < 0.002
    # With LaFehr's own G = 6.67e-11 (docs/reduction.md section 5) the polynomial is matched
    # to 0.0005 mGal over 13-1542 m: it is a fit to the same closed form.
    assert np.max(np.abs(curvature_correction(h, DENSITY, 6.67e-11) - polynomial)) < 6e-4


def test_station_by_station_residuals_are_reported(survey, reduced, tmp_path_factory):
    """Write every station's residuals to a CSV and print the worst ones."""
    _, d = survey
    residuals = {
        "faa": reduced["faa"] - d["FAA"],
        "sba_slab": reduced["faa"] - reduced["slab_corr"] - d["SBA"],
        "cba": reduced["cba"] - d["CBA"],
    }
    report = tmp_path_factory.mktemp("clvf") / "clvf_residuals.csv"
    with open(report, "w", newline="", encoding="utf-8") as handle:
        writer = csv.writer(handle)
        writer.writerow(["station_id", "height_m", "faa_res_mgal", "sba_res_mgal", "cba_res_mgal"])
        for i, station in enumerate(d["Station_ID"]):
            writer.writerow([station, f"{d['H'][i]:.2f}"] + [f"{residuals[k][i]:+.4f}" for k in residuals])
    worst = np.argsort(-np.abs(residuals["cba"]))[:5]
    print(f"station-by-station residuals (ours - USGS) written to {report}; largest |CBA| residuals:")
    for i in worst:
        print(f"  {d['Station_ID'][i]:>12s}  H={d['H'][i]:7.1f} m  FAA {residuals['faa'][i]:+.3f}  CBA {residuals['cba'][i]:+.3f} mGal")
    with open(report, encoding="utf-8") as handle:
        assert sum(1 for _ in handle) == d["OG"].size + 1
