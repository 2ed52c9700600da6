#!/usr/bin/env bash
# npm test: every test, against a throwaway PostgreSQL cluster and Debian's chromium.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

ensure_dependencies
find_pg_bin
ensure_chromium
ensure_poppler

TMP="$(mktemp -d /tmp/railwright-test.XXXXXX)"
chmod 755 "$TMP"
mkdir -p "$TMP/pg"
[ "$(id -u)" = "0" ] && chown postgres:postgres "$TMP/pg"
free_port() { node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})'; }
TEST_PGPORT="${TEST_PGPORT:-$(free_port)}"

cleanup() {
  trap - INT TERM EXIT
  stop_cluster "$TMP/pg"
  rm -rf "$TMP"
}
trap cleanup INT TERM EXIT

start_cluster "$TMP/pg" "$TEST_PGPORT" "-c fsync=off -c synchronous_commit=off -c full_page_writes=off"
ensure_database "$TEST_PGPORT" railwright_api
ensure_database "$TEST_PGPORT" railwright_e2e

build_if_changed

status=0
say "Unit and API tests (jest)…"
(cd "$ROOT/backend" && DATABASE_URL="postgres://app@127.0.0.1:$TEST_PGPORT/railwright_api" \
  RAILWRIGHT_DATA="$TMP/api-data" FRONTEND_DIST="" \
  NODE_OPTIONS=--experimental-vm-modules npx jest --ci) || status=1

say "Browser tests (playwright + Debian chromium)…"
(cd "$ROOT" && E2E_DATABASE_URL="postgres://app@127.0.0.1:$TEST_PGPORT/railwright_e2e" \
  E2E_PORT="$(free_port)" RAILWRIGHT_DATA="$TMP/e2e-data" \
  npx playwright test -c e2e/playwright.config.ts) || status=1

if [ "$status" = 0 ]; then say "All tests passed."; else say "Some tests failed."; fi
exit "$status"
