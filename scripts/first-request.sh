#!/usr/bin/env bash
# Start-up and first-request latency, with and without the warm-up, over loopback.
#   scripts/first-request.sh [RUNS]
# For each run and each mode (warm-up on, off): start the jar on a free port with a fresh data directory, time
# java -jar to the first answered /health, wait WAIT seconds (a user's first click comes a little after start; the
# warm-up runs in that time), then time the first GET of an example's results page and the first POST of
# scripts/evaluate-axial-200.json to /api/v1/evaluate (each the JVM's first of its kind), then a second of each
# (results in imperial units; evaluate with maxRpm + 1, so not from the cache). The example's evaluation itself is
# in the cache by then in both modes (the demo loader stores the examples at start); the evaluate body is not.
# Env: WAIT (seconds between the first answer and the first request, default 3), HEAP (256m), EXAMPLE (axial-wind-48v).
# Prints one line per run and mode, and the medians.
set -euo pipefail
cd "$(dirname "$0")/.."

RUNS="${1:-3}"
WAIT="${WAIT:-3}"
HEAP="${HEAP:-256m}"
EXAMPLE="${EXAMPLE:-axial-wind-48v}"
HOST=127.0.0.1
[ -f target/coilwright.jar ] || { echo "build target/coilwright.jar first (mvn -o -q -DskipTests package)" >&2; exit 2; }

SERVER_PID=""
DATA=""
cleanup() {
  if [ -n "$SERVER_PID" ] && kill -0 "$SERVER_PID" 2>/dev/null; then kill "$SERVER_PID"; wait "$SERVER_PID" 2>/dev/null || true; fi
  [ -z "$DATA" ] || rm -rf "$DATA"
}
trap cleanup EXIT

ms() { python3 -c "print(round(float('$1') * 1000))"; }

one() { # warm-up true|false -> "startup_ms results1_ms evaluate1_ms results2_ms evaluate2_ms"
  local port t0 startup r1 e1 r2 e2
  port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1]); s.close()')
  DATA=$(mktemp -d -t coilwright-first-XXXXXX)
  t0=$(date +%s%N)
  java -Xmx"$HEAP" -jar target/coilwright.jar --port "$port" --data-dir "$DATA" --warm-up "$1" >"$DATA/server.log" 2>&1 &
  SERVER_PID=$!
  until curl -sf -o /dev/null "http://$HOST:$port/health"; do
    kill -0 "$SERVER_PID" 2>/dev/null || { echo "server died:" >&2; cat "$DATA/server.log" >&2; exit 1; }
    sleep 0.005
  done
  startup=$(( ($(date +%s%N) - t0) / 1000000 ))
  sleep "$WAIT"
  r1=$(ms "$(curl -s -o /dev/null -w '%{time_total}' "http://$HOST:$port/design/results?example=$EXAMPLE")")
  e1=$(ms "$(curl -s -o /dev/null -w '%{time_total}' -H 'Content-Type: application/json' --data-binary @scripts/evaluate-axial-200.json "http://$HOST:$port/api/v1/evaluate")")
  r2=$(ms "$(curl -s -o /dev/null -w '%{time_total}' "http://$HOST:$port/design/results?example=$EXAMPLE&units=imperial")")
  e2=$(ms "$(curl -s -o /dev/null -w '%{time_total}' -H 'Content-Type: application/json' --data-binary @<(python3 -c 'import json,sys; b=json.load(open("scripts/evaluate-axial-200.json")); b["speedRange"]["maxRpm"] += 1; print(json.dumps(b))') "http://$HOST:$port/api/v1/evaluate")")
  grep -o 'warm-up: .*' "$DATA/server.log" >&2 || true
  cleanup
  SERVER_PID=""; DATA=""
  echo "$startup $r1 $e1 $r2 $e2"
}

echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg); $(nproc) cores; first request ${WAIT} s after the first answer"
echo "mode      start->first answer  results#1  evaluate#1  results#2  evaluate#2   (ms)"
for mode in true false; do
  rows=()
  for _ in $(seq "$RUNS"); do
    row=$(one "$mode")
    rows+=("$row")
    printf "warm-up=%-5s %s\n" "$mode" "$row"
  done
  printf '%s\n' "${rows[@]}" | python3 -c "
import sys, statistics as st
rows = [list(map(int, l.split())) for l in sys.stdin if l.strip()]
cols = list(zip(*rows))
print('warm-up=$mode medians: start %d, results#1 %d, evaluate#1 %d, results#2 %d, evaluate#2 %d ms' % tuple(st.median(c) for c in cols))"
done
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
