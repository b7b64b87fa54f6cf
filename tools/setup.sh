#!/usr/bin/env bash
# Install whatever is missing for Relief Gravity on Debian 12, idempotently.
# Debian packages: QGIS 3.22 with its Python bindings, scipy, pytest, Qt tools.
# Python: a venv over Debian's interpreter (--system-site-packages) so that
# numpy, scipy, GDAL and QGIS stay Debian's builds; pip adds only pinned pure
# packages with --no-deps.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
PACKAGES="qgis python3-qgis qgis-providers python3-scipy python3-pytest python3-attr python3-venv pyqt5-dev-tools qttools5-dev-tools"
# Figures of the density estimate and the survey report (matplotlib); the report's headless-browser test (chromium).
PACKAGES="$PACKAGES python3-matplotlib chromium"
# Test-only: what harmonica (reference for upward continuation) needs from Debian.
PACKAGES="$PACKAGES python3-xarray python3-pooch python3-sklearn python3-dask"
# Test-only references for the Earth tide (Sun and Moon positions; tidegravity's times).
PACKAGES="$PACKAGES python3-astropy python3-pandas"
# Batch runner (relief_gravity.batch): Dask and distributed, Debian builds over Debian's numpy.
PACKAGES="$PACKAGES python3-dask python3-distributed"
missing=""
for p in $PACKAGES; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing="$missing $p"
done
if [ -n "$missing" ]; then
    echo "relief-gravity setup: installing Debian packages:$missing"
    SUDO=""
    [ "$(id -u)" -ne 0 ] && SUDO="sudo"
    $SUDO apt-get update -qq
    DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq --no-install-recommends $missing >/dev/null
fi

if [ ! -x "$ROOT/.venv/bin/python" ]; then
    /usr/bin/python3 -m venv --system-site-packages "$ROOT/.venv"
fi
if ! "$ROOT/.venv/bin/python" -c "import pytest_qgis, boule, choclo, harmonica, tidegravity" 2>/dev/null || [ ! -x "$ROOT/.venv/bin/ruff" ]; then
    "$ROOT/.venv/bin/pip" install -q --disable-pip-version-check --no-deps -r "$ROOT/requirements-dev.txt"
fi
# Guard: the venv must use Debian's numpy and scipy.
"$ROOT/.venv/bin/python" - <<'PY'
import numpy, scipy, sys
for mod in (numpy, scipy):
    if not mod.__file__.startswith("/usr/lib/python3/"):
        sys.exit(f"{mod.__name__} comes from {mod.__file__}, not Debian's build")
PY
export QT_QPA_PLATFORM=offscreen
