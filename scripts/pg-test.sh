#!/usr/bin/env bash
# Starts a throwaway PostgreSQL cluster on loopback, runs a command with DATABASE_URL pointing at it,
# then stops the cluster and deletes it. Default command: the backend end-to-end suite.
#
#   scripts/pg-test.sh                                  # backend e2e suite on PostgreSQL
#   scripts/pg-test.sh npx jest --runInBand test/two    # any command, run from backend/
#
# Needs Debian's `postgresql` package (initdb, pg_ctl). As root the server runs as the `postgres`
# user (PostgreSQL refuses to run as root). Nothing listens beyond 127.0.0.1; the cluster trusts
# local connections and is deleted on exit. Durability is off (fsync) — it is a test database.
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"

bindir="${PG_BINDIR:-}"
if [ -z "$bindir" ]; then
  if command -v pg_config >/dev/null 2>&1 && [ -x "$(pg_config --bindir)/initdb" ]; then
    bindir="$(pg_config --bindir)"
  elif command -v initdb >/dev/null 2>&1; then
    bindir="$(dirname "$(command -v initdb)")"
  else
    # Debian keeps the server binaries out of PATH, one folder per major version.
    bindir="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  fi
fi
if [ -z "$bindir" ] || [ ! -x "$bindir/initdb" ]; then
  echo "pg-test: PostgreSQL binaries not found (apt-get install postgresql, or set PG_BINDIR)" >&2
  exit 1
fi

# A free TCP port on loopback.
port="${PG_PORT:-$(node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")}"

as_pg() { "$@"; }
if [ "$(id -u)" = "0" ]; then
  # PostgreSQL will not run as root: the cluster belongs to the `postgres` user, in a folder it can reach.
  dir="$(mktemp -d /tmp/causeway-pg.XXXXXX)"
  chown postgres: "$dir"
  as_pg() { runuser -u postgres -- "$@"; }
else
  dir="$(mktemp -d "${TMPDIR:-/tmp}/causeway-pg.XXXXXX")"
fi

stop() {
  as_pg "$bindir/pg_ctl" -D "$dir/data" -m immediate -w stop >/dev/null 2>&1 || true
  rm -rf "$dir"
}
trap stop EXIT
trap 'exit 130' INT TERM

as_pg "$bindir/initdb" -D "$dir/data" --username=causeway --auth=trust --encoding=UTF8 --locale=C.UTF-8 >"$dir/initdb.log" 2>&1 \
  || { cat "$dir/initdb.log" >&2; exit 1; }
as_pg "$bindir/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
  -o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" \
  start >/dev/null || { cat "$dir/server.log" >&2; exit 1; }
as_pg "$bindir/createdb" -h 127.0.0.1 -p "$port" -U causeway causeway

export DATABASE_URL="postgres://causeway@127.0.0.1:$port/causeway"
echo "pg-test: PostgreSQL $("$bindir/postgres" --version | awk '{print $3}') on 127.0.0.1:$port"

cd "$root/backend"
start=$(date +%s)
status=0
if [ "$#" -gt 0 ]; then
  "$@" || status=$?
else
  npx jest --runInBand test || status=$?
fi
echo "pg-test: done in $(( $(date +%s) - start )) s (exit $status)"
exit $status
