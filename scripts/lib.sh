#!/usr/bin/env bash
# Shared steps of start.sh and test.sh: dependencies, PostgreSQL binaries, a private cluster.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
say() { printf '\033[1m[railwright]\033[0m %s\n' "$*"; }
fail() { printf '\033[1;31m[railwright]\033[0m %s\n' "$*" >&2; exit 1; }

# npm ci from the committed lock file, only when node_modules is missing or the lock file changed.
ensure_dependencies() {
  local stamp="$ROOT/node_modules/.railwright-lock-hash"
  local want
  want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
  if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then return 0; fi
  say "Installing dependencies (npm ci)…"
  (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  echo "$want" > "$stamp"
}

# Newest PostgreSQL server binaries from Debian's packages; installed with apt-get when root.
find_pg_bin() {
  local bin
  bin="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  if [ -z "$bin" ] || [ ! -x "$bin/initdb" ]; then
    if [ "$(id -u)" = "0" ]; then
      say "Installing PostgreSQL from Debian's packages…"
      apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
      bin="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
    else
      fail "PostgreSQL's server is not installed. Run: sudo apt-get install -y postgresql"
    fi
  fi
  [ -x "$bin/initdb" ] || fail "PostgreSQL binaries not found under /usr/lib/postgresql/*/bin"
  PG_BIN="$bin"
}

# Runs a PostgreSQL command as the cluster's owner: initdb and postgres refuse to run as root.
# PGPASSWORD (the cluster owner's password, where the cluster asks for one) goes along.
as_pg() {
  if [ "$(id -u)" = "0" ]; then runuser -u postgres -- env PGPASSWORD="${PGPASSWORD:-}" "$@"; else "$@"; fi
}

# A secret kept in a file of its own (mode 600), made on first use: prints it.
secret_file() {
  local file="$1"
  if [ ! -s "$file" ]; then
    (umask 077 && head -c 32 /dev/urandom | base64 | tr -d '\n/+=' > "$file")
  fi
  chmod 600 "$file"
  cat "$file"
}

# True when the postgres system user can reach (traverse and write) the folder.
pg_can_reach() {
  if [ "$(id -u)" != "0" ]; then return 0; fi
  runuser -u postgres -- test -w "$1" -a -x "$1" 2>/dev/null
}

# Chooses where the cluster lives for a data folder: inside it when the server's user can reach
# it, otherwise a folder of its own under /var/lib/railwright tied to this data folder's path.
choose_cluster_dir() {
  local data="$1"
  mkdir -p "$data"
  if [ "$(id -u)" = "0" ]; then
    mkdir -p "$data/pg"
    chown postgres:postgres "$data/pg" 2>/dev/null || true
    if pg_can_reach "$data/pg"; then CLUSTER_DIR="$data/pg"; return; fi
    local key
    key="$(printf '%s' "$data" | sha256sum | cut -c1-12)"
    CLUSTER_DIR="/var/lib/railwright/$key/pg"
    mkdir -p "$CLUSTER_DIR"
    chmod 755 /var/lib/railwright "/var/lib/railwright/$key"
    chown postgres:postgres "$CLUSTER_DIR"
    say "The postgres user cannot reach $data, so the cluster lives in $CLUSTER_DIR"
  else
    CLUSTER_DIR="$data/pg"
    mkdir -p "$CLUSTER_DIR"
  fi
}

# init (first time) and start a cluster on 127.0.0.1:$2, socket inside the cluster folder.
# With PGPASSWORD set, every connection must give a password (scram-sha-256), loopback included;
# the cluster owner is "app" with that password.
start_cluster() {
  local dir="$1" port="$2" extra="${3:-}"
  if [ ! -f "$dir/PG_VERSION" ]; then
    say "Creating a private PostgreSQL cluster in $dir"
    if [ -n "${PGPASSWORD:-}" ]; then
      local pwfile
      pwfile="$(dirname "$dir")/.initdb-password.$$"
      (umask 077 && printf '%s' "$PGPASSWORD" > "$pwfile")
      [ "$(id -u)" = "0" ] && chown postgres "$pwfile"
      as_pg "$PG_BIN/initdb" -D "$dir" -U app --auth=scram-sha-256 --pwfile="$pwfile" --encoding=UTF8 --no-locale >/dev/null
      rm -f "$pwfile"
    else
      as_pg "$PG_BIN/initdb" -D "$dir" -U app --auth=trust --encoding=UTF8 --no-locale >/dev/null
    fi
  fi
  if as_pg "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    say "PostgreSQL is already running in $dir"
    return 0
  fi
  # fd 9 (start.sh's single-instance lock) stays with start.sh, not with the server.
  as_pg "$PG_BIN/pg_ctl" -D "$dir" -w -l "$dir/server.log" \
    -o "-c listen_addresses=127.0.0.1 -p $port -k $dir $extra" start >/dev/null 9>&- \
    || { tail -n 20 "$dir/server.log" >&2; fail "PostgreSQL did not start on port $port (is the port taken? set PGPORT)"; }
}

# A cluster made before passwords were required: give the owner PGPASSWORD and ask for it from now on.
require_passwords() {
  local dir="$1" port="$2"
  grep -qE '^[[:space:]]*(local|host)[^#]*[[:space:]]trust([[:space:]]|$)' "$dir/pg_hba.conf" || return 0
  say "Securing the PostgreSQL cluster: passwords from now on (scram-sha-256)"
  as_pg "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U app -d postgres -qAtc "set password_encryption = 'scram-sha-256'; alter role app with password '$PGPASSWORD'" >/dev/null
  sed -i -E 's/([[:space:]])trust([[:space:]]|$)/\1scram-sha-256\2/' "$dir/pg_hba.conf"
  as_pg "$PG_BIN/pg_ctl" -D "$dir" reload >/dev/null
}

stop_cluster() {
  local dir="$1"
  as_pg "$PG_BIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null 2>&1 || true
}

ensure_database() {
  local port="$1" name="$2"
  if ! as_pg "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U app -d postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    as_pg "$PG_BIN/createdb" -h 127.0.0.1 -p "$port" -U app "$name"
  fi
}

# Debian's chromium for browser tests; never a downloaded browser.
ensure_chromium() {
  if command -v chromium >/dev/null 2>&1; then return 0; fi
  if [ "$(id -u)" = "0" ]; then
    say "Installing Debian's chromium for the browser tests…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    fail "Browser tests need Debian's chromium. Run: sudo apt-get install -y chromium"
  fi
}

# poppler's pdftotext/pdftoppm read certificates back in tests.
ensure_poppler() {
  if command -v pdftotext >/dev/null 2>&1; then return 0; fi
  if [ "$(id -u)" = "0" ]; then
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq poppler-utils >/dev/null
  else
    fail "Tests need poppler-utils. Run: sudo apt-get install -y poppler-utils"
  fi
}

# Rebuilds backend and frontend only when their sources changed since the last build.
build_if_changed() {
  local stamp="$ROOT/backend/dist/.source-hash" want
  want="$(cd "$ROOT" && find backend/src backend/bench seed frontend/src frontend/index.html frontend/vite.config.ts drizzle \
      package-lock.json -type f -print0 2>/dev/null | sort -z | xargs -0 sha256sum | sha256sum | cut -d' ' -f1)"
  if [ -f "$stamp" ] && [ -d "$ROOT/frontend/dist" ] && [ "$(cat "$stamp")" = "$want" ]; then return 0; fi
  say "Building…"
  (cd "$ROOT" && rm -rf backend/dist && npm run build --silent -w backend && npm run build --silent -w frontend >/dev/null)
  echo "$want" > "$stamp"
}
