#!/usr/bin/env bash
# For contributors: a shared scratch cluster for running API specs by hand.
#   scripts/dev-db.sh NAME   → starts the cluster (if needed), (re)creates database NAME, prints its URL
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
NAME="${1:?usage: scripts/dev-db.sh DATABASE_NAME}"
DEV_PORT="${DEV_PGPORT:-55432}"
DIR="/tmp/railwright-dev/pg"
mkdir -p "$DIR"; chmod 755 /tmp/railwright-dev
[ "$(id -u)" = "0" ] && chown postgres:postgres "$DIR"
find_pg_bin
start_cluster "$DIR" "$DEV_PORT" "-c fsync=off -c synchronous_commit=off" >&2
as_pg "$PG_BIN/dropdb" -h 127.0.0.1 -p "$DEV_PORT" -U app --if-exists --force "$NAME" >&2
as_pg "$PG_BIN/createdb" -h 127.0.0.1 -p "$DEV_PORT" -U app "$NAME" >&2
echo "postgres://app@127.0.0.1:$DEV_PORT/$NAME"
