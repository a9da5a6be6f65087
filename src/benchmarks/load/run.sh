#!/usr/bin/env bash
# Load on a running Nodewright over loopback with wrk (Debian package `wrk`; installed when missing
# and run as root): requests/s and latency p50/p99 at 1, 8 and 32 connections for the default
# 24-mode string analysis, the workshop whistle and GET /api/v1/materials, each run bounded to
# DURATION seconds (default 10) on 2 wrk threads. The machine's load is printed beside each run.
#
#   bash src/benchmarks/load/run.sh [port] [duration-seconds]
set -euo pipefail
cd "$(dirname "$0")"
PORT=${1:-8080}
DURATION=${2:-10}
BASE="http://127.0.0.1:$PORT"
if ! command -v wrk >/dev/null; then
  if [ "$(id -u)" = 0 ]; then apt-get install -y -qq wrk >/dev/null; else sudo apt-get install -y -qq wrk >/dev/null; fi
fi
curl -sf "$BASE/actuator/health" | grep -q UP || { echo "no Nodewright at $BASE" >&2; exit 1; }
run() {  # name path body-file-or-empty connections
  local name=$1 path=$2 body=$3 c=$4 out
  local threads=$(( c < 2 ? 1 : 2 ))
  local load; load=$(cut -d' ' -f1-3 /proc/loadavg)
  if [ -n "$body" ]; then
    out=$(BODY="$body" wrk -t"$threads" -c"$c" -d"${DURATION}s" --latency -s post.lua "$BASE$path")
  else
    out=$(wrk -t"$threads" -c"$c" -d"${DURATION}s" --latency "$BASE$path")
  fi
  local rps p50 p99 errs
  rps=$(awk '/Requests\/sec/ {print $2}' <<<"$out")
  p50=$(awk '$1 == "50%" {print $2}' <<<"$out")
  p99=$(awk '$1 == "99%" {print $2}' <<<"$out")
  errs=$(grep -E "Non-2xx|Socket errors" <<<"$out" | tr '\n' ' ' || true)
  printf '%-10s c=%-3s %9s req/s  p50 %-9s p99 %-9s load %s %s\n' "$name" "$c" "$rps" "$p50" "$p99" "$load" "$errs"
}
for c in 1 8 32; do
  run materials /api/v1/materials "" "$c"
  run string /api/v1/strings/analyze string-24.json "$c"
  run whistle /api/v1/air-columns/analyze whistle.json "$c"
done
