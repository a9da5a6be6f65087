#!/usr/bin/env bash
# Start-up time of the packaged jar, from `java` to /actuator/health UP, several times, with the
# machine's load beside each figure, and where the time went (from the log's timestamps).
#
#   bash src/benchmarks/startup.sh [runs] [mode]     mode: plain (default) | cds | aot
#
# plain: java -jar target/nodewright-0.1.0.jar, as the contract starts it.
# cds:   the jar extracted by Spring Boot's jar tools and started with a class-data-sharing archive
#        made by one training run (see README, Speed); built under target/cds on first use.
# aot:   the same extracted jar on a Java 25 runtime with an ahead-of-time cache (JEP 483/514/515:
#        classes loaded and linked, and method profiles, from one training run); built under
#        target/aot on first use. JAVA25=/path/to/java picks the runtime (default: the first
#        Java 25 under /usr/lib/jvm).
# EXTRA_ARGS=... adds application arguments (e.g. --spring.main.lazy-initialization=true).
# Loopback only; each run gets its own port and data directory and is stopped after it is UP.
set -euo pipefail
cd "$(dirname "$0")/../.."
RUNS=${1:-3}
MODE=${2:-plain}
JAR=target/nodewright-0.1.0.jar
[ -f "$JAR" ] || { echo "build the jar first: mvn -q -DskipTests package" >&2; exit 1; }
CMD=(java -jar "$JAR")
if [ "$MODE" = cds ]; then
  if [ ! -f target/cds/nodewright.jsa ]; then
    rm -rf target/cds
    java -Djarmode=tools -jar "$JAR" extract --destination target/cds >/dev/null
    java -XX:ArchiveClassesAtExit=target/cds/nodewright.jsa -Dspring.context.exit=onRefresh \
      -jar target/cds/nodewright-0.1.0.jar --server.port=0 --app.data-dir="$(mktemp -d)" >/dev/null 2>&1 || true
  fi
  CMD=(java -XX:SharedArchiveFile=target/cds/nodewright.jsa -jar target/cds/nodewright-0.1.0.jar)
fi
if [ "$MODE" = aot ]; then
  J25=${JAVA25:-$(ls -d /usr/lib/jvm/*25*/bin/java 2>/dev/null | head -1)}
  [ -x "$J25" ] || { echo "aot mode needs a Java 25 runtime: set JAVA25=/path/to/java" >&2; exit 1; }
  if [ ! -f target/aot/nodewright.aot ] || [ "$JAR" -nt target/aot/nodewright.aot ]; then
    rm -rf target/aot
    "$J25" -Djarmode=tools -jar "$JAR" extract --destination target/aot >/dev/null
    "$J25" -XX:AOTCacheOutput=target/aot/nodewright.aot -Dspring.context.exit=onRefresh \
      -jar target/aot/nodewright-0.1.0.jar --server.port=0 --app.data-dir="$(mktemp -d)" >/dev/null 2>&1 || true
  fi
  CMD=("$J25" -XX:AOTCache=target/aot/nodewright.aot -jar target/aot/nodewright-0.1.0.jar)
fi
stamp() { grep -m1 -E "$1" "$2" | sed 's/^[0-9-]*T\([0-9:.]*\)Z.*/\1/'; }
secs() { python3 -c "import sys;t=sys.argv[1].split(':');print(float(t[0])*3600+float(t[1])*60+float(t[2]) if len(t)==3 else 'nan')" "$1"; }
for i in $(seq 1 "$RUNS"); do
  port=$((18700 + RANDOM % 200))
  data=$(mktemp -d)
  log=$(mktemp)
  load=$(cut -d' ' -f1-3 /proc/loadavg)
  t0=$(date +%s.%N)
  "${CMD[@]}" --server.port="$port" --app.data-dir="$data" ${EXTRA_ARGS:-} >"$log" 2>&1 &
  pid=$!
  until curl -sf "http://127.0.0.1:$port/actuator/health" | grep -q UP; do
    kill -0 "$pid" 2>/dev/null || { echo "server died"; cat "$log"; exit 1; }
    sleep 0.05
  done
  t1=$(date +%s.%N)
  kill "$pid"; wait "$pid" 2>/dev/null || true
  start=$(secs "$(stamp 'Starting NodewrightApplication' "$log")")
  ctx=$(secs "$(stamp 'Root WebApplicationContext' "$log")")
  fly0=$(secs "$(stamp 'HikariPool-1 - Starting' "$log")")
  fly1=$(secs "$(stamp 'Successfully applied|is up to date|No migration necessary' "$log")")
  up=$(secs "$(stamp 'Started NodewrightApplication' "$log")")
  python3 - "$t0" "$t1" "$start" "$ctx" "$fly0" "$fly1" "$up" "$load" "$MODE" <<'PY'
import sys
t0, t1, start, ctx, f0, f1, up = map(float, sys.argv[1:8])
print(f"{sys.argv[9]}: health UP after {t1 - t0:.2f} s (load {sys.argv[8]}): JVM to Spring's first line "
      f"{start - (t0 % 86400):.2f} s, to web context {ctx - start:.2f} s, pool + Flyway {f1 - f0:.2f} s, "
      f"rest of the context {up - ctx - (f1 - f0):.2f} s, to health UP {(t1 % 86400) - up:.2f} s")
PY
  rm -rf "$data" "$log"
done
