#!/usr/bin/env bash
# For contributors working side by side: a build of your own under .build/NAME (git-ignored), so
# your browser tests never run on a build someone else is replacing.
#   scripts/private-build.sh NAME   → builds, prints the env to run e2e against it
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
NAME="${1:?usage: scripts/private-build.sh NAME}"
OUT="$ROOT/.build/$NAME"
rm -rf "$OUT" && mkdir -p "$OUT"
echo '{ "type": "module", "private": true }' > "$OUT/package.json"
(cd "$ROOT/backend" && npx tsc -p tsconfig.build.json --outDir "$OUT") >&2 || say "tsc reported type errors (above); the build was still written" >&2
# Packages only the backend's workspace holds (nested in backend/node_modules) must resolve from the build too.
[ -d "$ROOT/backend/node_modules" ] && ln -sfn "$ROOT/backend/node_modules" "$OUT/backend/node_modules"
(cd "$ROOT/frontend" && npx vite build --outDir "$OUT/frontend-dist" --emptyOutDir >/dev/null) || fail "frontend build failed"
echo "E2E_SERVER=$OUT/backend/src/main.js FRONTEND_DIST=$OUT/frontend-dist"
