#!/usr/bin/env bash
# Starts a throwaway local PostgreSQL server for trying the shared register (and for the tests):
#   docs/tools/local-postgres.sh start [DIR]   # prints the --register address and the export line for the tests
#   docs/tools/local-postgres.sh stop  [DIR]
# The server listens on 127.0.0.1:${COHESA_PG_PORT:-54329} only, trusts local connections (a trial set-up, not a
# production one: a site's server has passwords or certificates) and keeps its data in DIR (default: a folder under /tmp).
# Needs the Debian/Ubuntu "postgresql" package (initdb, pg_ctl); run as root it drops to the "postgres" account.
set -euo pipefail
cmd="${1:-start}"
dir="${2:-${TMPDIR:-/tmp}/cohesa-postgres}"
port="${COHESA_PG_PORT:-54329}"

find_bin() {
  local name="$1"
  if command -v "$name" >/dev/null 2>&1; then command -v "$name"; return; fi
  local found
  found="$(ls -d /usr/lib/postgresql/*/bin/"$name" 2>/dev/null | sort -V | tail -1 || true)"
  [ -n "$found" ] && echo "$found" && return
  echo "error: $name not found; install PostgreSQL (Debian/Ubuntu: apt-get install postgresql)" >&2
  exit 1
}
initdb="$(find_bin initdb)"
pg_ctl="$(find_bin pg_ctl)"

as_owner() {
  # PostgreSQL refuses to run as root: use the postgres account then
  if [ "$(id -u)" = 0 ]; then
    chown -R postgres "$dir"
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

case "$cmd" in
  start)
    mkdir -p "$dir"
    if [ ! -f "$dir/data/PG_VERSION" ]; then
      mkdir -p "$dir/data"
      as_owner "$initdb" -D "$dir/data" -U postgres --auth=trust -E UTF8 --locale=C >"$dir/initdb.log" 2>&1 \
        || { cat "$dir/initdb.log" >&2; exit 1; }
    fi
    if ! as_owner "$pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then
      as_owner "$pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
        -o "-c listen_addresses=127.0.0.1 -p $port -k $dir -c fsync=on" start >/dev/null \
        || { cat "$dir/server.log" >&2; exit 1; }
    fi
    echo "PostgreSQL is running on 127.0.0.1:$port (data in $dir/data)."
    echo "Try the shared register:  java -jar target/cohesa.jar record list --register postgresql://postgres@127.0.0.1:$port/postgres"
    echo "Tests find it with:       export COHESA_TEST_POSTGRES=postgresql://postgres@127.0.0.1:$port/postgres"
    ;;
  stop)
    if [ -f "$dir/data/PG_VERSION" ]; then
      as_owner "$pg_ctl" -D "$dir/data" -m fast stop >/dev/null 2>&1 || true
    fi
    ;;
  *)
    echo "usage: $0 start|stop [DIR]" >&2
    exit 2
    ;;
esac
