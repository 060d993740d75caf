-- wrk script: optional POST with a JSON body from $WRK_BODY_FILE, and one machine-readable summary line.
local body_file = os.getenv("WRK_BODY_FILE")
if body_file and body_file ~= "" then
  local f = assert(io.open(body_file, "rb"))
  wrk.method = "POST"
  wrk.body = f:read("*a")
  f:close()
  wrk.headers["Content-Type"] = "application/json"
end

function done(summary, latency, requests)
  local e = summary.errors
  local errors = e.connect + e.read + e.write + e.status + e.timeout
  io.write(string.format("RESULT rps=%.1f p50_ms=%.3f p99_ms=%.3f requests=%d errors=%d non2xx=%d\n",
    summary.requests / (summary.duration / 1e6), latency:percentile(50) / 1000, latency:percentile(99) / 1000,
    summary.requests, errors, e.status))
end
