#!/usr/bin/env bash
# Times the measurement engine (straightness at 10k/100k/1M stations, ISO 230-2 evaluation).
set -euo pipefail
cd "$(dirname "$0")/.."
out=backend/dist/backend/bench/run-bench.js
# Rebuild when the bench or any engine source is newer than the built bench.
if [ ! -f "$out" ] || [ -n "$(find backend/bench backend/src/engine -name '*.ts' -newer "$out" -print -quit)" ]; then
  npm run build -w backend >/dev/null
fi
node "$out"
