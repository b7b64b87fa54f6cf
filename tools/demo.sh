#!/usr/bin/env bash
# Set up what is missing, then run the full reduction on the invented demo survey.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
bash "$ROOT/tools/setup.sh"
export QT_QPA_PLATFORM=offscreen
export XDG_RUNTIME_DIR="${XDG_RUNTIME_DIR:-$(mktemp -d)}"
chmod 700 "$XDG_RUNTIME_DIR"
exec "$ROOT/.venv/bin/python" "$ROOT/demo/run_demo.py" "$@"
