#!/usr/bin/env bash
# Loopback load test: start time of the jar, then wrk at 32 connections against /health and a POST route.
#   scripts/loadtest.sh [ROUTE [BODY_FILE]]
#   ROUTE      POST route to compare with /health (default: /health as GET, i.e. a self-check)
#   BODY_FILE  JSON request body for ROUTE
# Env: DURATION (default 10s), WARMUP (3s), CONNECTIONS (32), THREADS (2), HEAP (256m),
#      VARY (a numeric field of the body, e.g. maxRpm: changed on every request so the response cache never answers;
#      without it a repeated body measures the cache), MAX_BUSY (the server's --max-busy, default its own).
# Reports throughput, p50, p99, errors, non-2xx and 503 answers per run, and the server's RSS at start and end.
# Only loopback: the server binds all interfaces but is only ever addressed at 127.0.0.1.
set -euo pipefail
cd "$(dirname "$0")/.."

ROUTE="${1:-}"
BODY="${2:-}"
DURATION="${DURATION:-10s}"
CONNECTIONS="${CONNECTIONS:-32}"
THREADS="${THREADS:-2}"
HEAP="${HEAP:-256m}"
VARY="${VARY:-}"
MAX_BUSY="${MAX_BUSY:-}"
WARMUP="${WARMUP:-3s}"
HOST=127.0.0.1

command -v wrk >/dev/null || { echo "wrk is not installed (apt-get install wrk)" >&2; exit 2; }
if [ -n "$ROUTE" ] && { [ -z "$BODY" ] || [ ! -f "$BODY" ]; }; then
  echo "a POST route needs a body file: $0 $ROUTE <body.json>" >&2; exit 2
fi
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

run() { # name url [body]
  local out
  out=$(WRK_BODY_FILE="${3:-}" WRK_VARY="$VARY" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$DURATION" --latency -s scripts/wrk-report.lua "$2")
  local line
  line=$(grep '^RESULT' <<<"$out")
  echo "$1: ${line#RESULT }" >&2
  sed -E 's/.*rps=([0-9.]+).*/\1/' <<<"$line"
}

# Warm-up (JIT) on both routes before measuring; its figures are not reported.
WRK_BODY_FILE="" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$WARMUP" "http://$HOST:$PORT/health" >/dev/null
if [ -n "$ROUTE" ]; then
  WRK_BODY_FILE="$BODY" WRK_VARY="$VARY" wrk -t"$THREADS" -c"$CONNECTIONS" -d"$WARMUP" -s scripts/wrk-report.lua "http://$HOST:$PORT$ROUTE" >/dev/null
fi
health_rps=$(run "GET /health" "http://$HOST:$PORT/health")
if [ -n "$ROUTE" ]; then
  route_rps=$(run "POST $ROUTE" "http://$HOST:$PORT$ROUTE" "$BODY")
  label="POST $ROUTE${VARY:+ (uncached: $VARY varied)}"
else
  route_rps=$(run "GET /health (again)" "http://$HOST:$PORT/health")
  label="GET /health (again)"
fi
echo "RSS at end: $(rss_mb) MB"
python3 -c "print(f'ratio: {\"$label\"} / GET /health throughput = {float($route_rps) / float($health_rps):.2f}')"
