#!/usr/bin/env bash
# Loopback load test: start time of the jar, then wrk at 32 connections against /health and one or more POST routes,
# all against the same server in one run.
#   scripts/loadtest.sh [ROUTE BODY_FILE [VARY_FIELD]] [ROUTE BODY_FILE [VARY_FIELD]] ...
#   ROUTE       POST route to compare with /health (none: /health as GET twice, i.e. a self-check)
#   BODY_FILE   JSON request body for ROUTE
#   VARY_FIELD  optional, for this route: as VARY below (a route's third word is taken as its field when it does
#               not start with /)
# Env: DURATION (default 10s), WARMUP (3s), CONNECTIONS (32), THREADS (2), HEAP (256m),
#      VARY (a numeric field of the body, e.g. maxRpm: changed on every request so the response cache never answers;
#      without it a repeated body measures the cache), MAX_BUSY (the server's --max-busy, default its own).
# Uncached evaluate, wind match and /health in one run:
#   scripts/loadtest.sh /api/v1/evaluate scripts/evaluate-axial-200.json maxRpm \
#                       /api/v1/match/wind scripts/match-wind-axial.json diameterM
# Reports throughput, p50, p99, errors, non-2xx and 503 answers per run, and the server's RSS at start and end.
# Only loopback: the server binds all interfaces but is only ever addressed at 127.0.0.1.
set -euo pipefail
cd "$(dirname "$0")/.."

ROUTES=(); BODIES=(); VARIES=()
while [ $# -gt 0 ]; do
  ROUTES+=("$1"); BODIES+=("${2:-}"); shift; [ $# -gt 0 ] && shift
  if [ $# -gt 0 ] && [[ "$1" != /* ]]; then VARIES+=("$1"); shift; else VARIES+=("${VARY:-}"); fi
done
DURATION="${DURATION:-10s}"
CONNECTIONS="${CONNECTIONS:-32}"
THREADS="${THREADS:-2}"
HEAP="${HEAP:-256m}"
VARY="${VARY:-}"
MAX_BUSY="${MAX_BUSY:-}"
WARMUP="${WARMUP:-3s}"
HOST=127.0.0.1

command -v wrk >/dev/null || { echo "wrk is not installed (apt-get install wrk)" >&2; exit 2; }
for i in "${!ROUTES[@]}"; do
  if [ -z "${BODIES[$i]}" ] || [ ! -f "${BODIES[$i]}" ]; then
    echo "a POST route needs a body file: $0 ${ROUTES[$i]} <body.json>" >&2; exit 2
  fi
done
if [ ! -f target/coilwright.jar ]; then
  echo "building target/coilwright.jar ..."
  mvn -o -q -DskipTests package
fi

PORT=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1]); s.close()')
DATA=$(mktemp -d -t coilwright-load-XXXXXX)
LOG="$DATA/server.log"
SERVER_PID=""
cleanup() {
  if [ -n "$SERVER_PID" ] && kill -0 "$SERVER_PID" 2>/dev/null; then
    kill "$SERVER_PID"; wait "$SERVER_PID" 2>/dev/null || true
  fi
  rm -rf "$DATA"
}
trap cleanup EXIT

t0=$(date +%s%N)
java -Xmx"$HEAP" -jar target/coilwright.jar --port "$PORT" --data-dir "$DATA" ${MAX_BUSY:+--max-busy "$MAX_BUSY"} >"$LOG" 2>&1 &
SERVER_PID=$!
until curl -sf -o /dev/null "http://$HOST:$PORT/health"; do
  kill -0 "$SERVER_PID" 2>/dev/null || { echo "server died:"; cat "$LOG"; exit 1; }
  [ $(( ($(date +%s%N) - t0) / 1000000 )) -lt 30000 ] || { echo "no answer within 30 s"; exit 1; }
  sleep 0.01
done
startup_ms=$(( ($(date +%s%N) - t0) / 1000000 ))
echo "startup: ${startup_ms} ms from java -jar to the first answered /health (heap ${HEAP}, port ${PORT})"
rss_mb() { awk '/VmRSS/ {printf "%.0f", $2 / 1024}' "/proc/$SERVER_PID/status"; }
echo "RSS at start: $(rss_mb) MB"

run() { # name url [body [vary]]
  local out
  out=$(WRK_BODY_FILE="${3:-}" WRK_VARY="${4:-}" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$DURATION" --latency -s scripts/wrk-report.lua "$2")
  local line
  line=$(grep '^RESULT' <<<"$out")
  echo "$1: ${line#RESULT }" >&2
  sed -E 's/.*rps=([0-9.]+).*/\1/' <<<"$line"
}

# Warm-up (JIT) on every route before measuring; its figures are not reported.
WRK_BODY_FILE="" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$WARMUP" "http://$HOST:$PORT/health" >/dev/null
for i in "${!ROUTES[@]}"; do
  WRK_BODY_FILE="${BODIES[$i]}" WRK_VARY="${VARIES[$i]}" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$WARMUP" \
    -s scripts/wrk-report.lua "http://$HOST:$PORT${ROUTES[$i]}" >/dev/null
done
echo "load average before measuring: $(cut -d' ' -f1-3 /proc/loadavg) ($(nproc) cores)"
health_rps=$(run "GET /health" "http://$HOST:$PORT/health")
if [ ${#ROUTES[@]} -eq 0 ]; then
  route_rps=$(run "GET /health (again)" "http://$HOST:$PORT/health")
  python3 -c "print(f'ratio: GET /health (again) / GET /health throughput = {float($route_rps) / float($health_rps):.2f}')"
fi
for i in "${!ROUTES[@]}"; do
  vary="${VARIES[$i]}"
  label="POST ${ROUTES[$i]}${vary:+ (uncached: $vary varied)}"
  route_rps=$(run "$label" "http://$HOST:$PORT${ROUTES[$i]}" "${BODIES[$i]}" "$vary")
  python3 -c "print(f'ratio: {\"$label\"} / GET /health throughput = {float($route_rps) / float($health_rps):.3f}')"
done
echo "RSS at end: $(rss_mb) MB"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
