#!/usr/bin/env bash
# Times the measurement engine (straightness at 10k/100k/1M stations, ISO 230-2 evaluation).
set -euo pipefail
cd "$(dirname "$0")/.."
out=backend/dist/backend/bench/run-bench.js
# Rebuild when the bench or any engine source is newer than the built bench.
if [ ! -f "$out" ] || [ -n "$(find backend/bench backend/src/engine -name '*.ts' -newer "$out" -print -quit)" ]; then
  # tsc still writes its output when another part of the backend has a type error; the bench
  # only needs the engine, so report the error and carry on if the bench was written.
  npm run build -w backend >/dev/null || echo "bench: the backend build reported type errors (see npm run build -w backend)" >&2
  [ -f "$out" ] || { echo "bench: $out was not built" >&2; exit 1; }
fi
node "$out"
