#!/usr/bin/env bash
# SPDX-License-Identifier: GPL-2.0-or-later
# Build bench/.venv-peer, the venv of the terrain benchmark's peer
# (harmonica/choclo with numba), idempotently. Over Debian's interpreter with
# --system-site-packages, and with --no-deps from the fully pinned list, so
# numpy and scipy stay Debian's builds; the plugin's own .venv is not touched.
# Usage: bash bench/setup_peer.sh [VENV_DIR]
set -euo pipefail
BENCH="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
VENV="${1:-$BENCH/.venv-peer}"

if [ ! -x "$VENV/bin/python" ]; then
    /usr/bin/python3 -m venv --system-site-packages "$VENV"
fi
if ! "$VENV/bin/python" -c "import harmonica, choclo, numba" 2>/dev/null; then
    "$VENV/bin/pip" install -q --disable-pip-version-check --no-deps -r "$BENCH/requirements-peer.txt"
fi
# Guard: numpy and scipy must be Debian's, at the pinned versions.
"$VENV/bin/python" - <<'PY'
import sys
import numpy, scipy
for mod, want in ((numpy, "1.24.2"), (scipy, "1.10.1")):
    if not mod.__file__.startswith("/usr/lib/python3/") or mod.__version__ != want:
        sys.exit(f"{mod.__name__} {mod.__version__} from {mod.__file__}: expected Debian's {want}")
import choclo, harmonica, numba
print(f"peer venv ready: numba {numba.__version__}, choclo {choclo.__version__}, "
      f"harmonica {harmonica.__version__}, numpy {numpy.__version__}, scipy {scipy.__version__}")
PY
