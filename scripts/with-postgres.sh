#!/usr/bin/env bash
# Runs a command against a throwaway PostgreSQL server from Debian's packages: initdb into a temp
# folder, listen only on 127.0.0.1 at a spare port, export TEST_DATABASE_URL, stop and delete after.
# Usage: bash scripts/with-postgres.sh <command…>
set -euo pipefail
bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1 || true)
if [ -z "$bin" ] || [ ! -x "$bin/initdb" ]; then
  if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null; then
    echo "PostgreSQL is missing: installing Debian's postgresql package…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    bin=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)
  else
    echo "No PostgreSQL server binaries (Debian: apt-get install postgresql)." >&2; exit 1
  fi
fi
port=$(node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")
dir=$(mktemp -d /tmp/cuffwright-pg-XXXXXX)
# PostgreSQL refuses to run as root: run it as an unprivileged user when we are root.
run=()
if [ "$(id -u)" = 0 ]; then
  user=$(id -u postgres >/dev/null 2>&1 && echo postgres || echo nobody)
  chown "$user" "$dir"
  run=(runuser -u "$user" --)
fi
"${run[@]}" "$bin/initdb" -D "$dir/data" -U cuffwright --auth=trust -E UTF8 >/dev/null
# A throwaway server for tests: nothing it holds must outlive the machine, so it never waits for
# the disk (the tests kill app servers, never PostgreSQL).
"${run[@]}" "$bin/pg_ctl" -D "$dir/data" -l "$dir/log" -w \
  -o "-h 127.0.0.1 -p $port -k $dir -c fsync=off -c synchronous_commit=off -c full_page_writes=off" start >/dev/null
stop() { "${run[@]}" "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null || true; rm -rf "$dir"; }
trap stop EXIT
export TEST_DATABASE_URL="postgres://cuffwright@127.0.0.1:$port/postgres"
echo "PostgreSQL $("$bin/postgres" --version | awk '{print $3}') on 127.0.0.1:$port"
"$@"
