#!/usr/bin/env bash
# Runs every test: unit tests (Surefire), browser and process tests (Failsafe), and the store's
# tests against a real PostgreSQL as well as H2. Brings what those need on Debian when missing:
# Chromium with its driver, Node.js for the page modules' tests, and a PostgreSQL server started in a temporary folder.
set -euo pipefail
cd "$(dirname "$0")/.."

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else "$@"; fi; }

need_apt=()
[ -x /usr/bin/chromium ] || need_apt+=(chromium)
[ -x /usr/bin/chromedriver ] || need_apt+=(chromium-driver)
command -v node >/dev/null || need_apt+=(nodejs)   # the page modules' tests (node --test)
pg_bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
[ -n "$pg_bin" ] || need_apt+=(postgresql)
if [ ${#need_apt[@]} -gt 0 ]; then
  echo "Installing ${need_apt[*]} ..."
  as_root apt-get update -qq
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq "${need_apt[@]}" >/dev/null
  pg_bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
fi

# A throw-away PostgreSQL for the store's tests (skipped by those tests when absent).
pg_dir=""
cleanup() {
  if [ -n "$pg_dir" ] && [ -d "$pg_dir" ]; then
    runuser -u postgres -- "$pg_bin/pg_ctl" -D "$pg_dir/data" -m immediate stop >/dev/null 2>&1 || true
    rm -rf "$pg_dir"
  fi
}
trap cleanup EXIT
if [ -n "$pg_bin" ] && [ "$(id -u)" = 0 ] && id postgres >/dev/null 2>&1; then
  pg_dir=$(mktemp -d /tmp/nodewright-pg.XXXXXX)
  chown postgres "$pg_dir"
  pg_port=${NODEWRIGHT_PG_PORT:-55432}
  echo nodewright > "$pg_dir/pw"
  chown postgres "$pg_dir/pw"
  runuser -u postgres -- "$pg_bin/initdb" -D "$pg_dir/data" -U nodewright --pwfile="$pg_dir/pw" -A scram-sha-256 >/dev/null
  runuser -u postgres -- "$pg_bin/pg_ctl" -D "$pg_dir/data" -l "$pg_dir/log" -w \
    -o "-c listen_addresses=127.0.0.1 -c port=$pg_port -c fsync=off -c unix_socket_directories=$pg_dir" start >/dev/null
  PGPASSWORD=nodewright "$pg_bin/psql" -h 127.0.0.1 -p "$pg_port" -U nodewright -d postgres -qc "CREATE DATABASE nodewright_test" >/dev/null
  export NODEWRIGHT_PG_URL="jdbc:postgresql://127.0.0.1:$pg_port/nodewright_test"
  export NODEWRIGHT_PG_USER=nodewright NODEWRIGHT_PG_PASSWORD=nodewright
  echo "PostgreSQL for the store tests at $NODEWRIGHT_PG_URL"
fi

mvn -B verify "$@"
