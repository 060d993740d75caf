-- wrk script: optional POST with a JSON body from $WRK_BODY_FILE, and one machine-readable summary line.
-- $WRK_VARY names a numeric field of the body (e.g. maxRpm): its first occurrence gets a value of its own on every
-- request (the original plus n * 1e-6, n unique across threads), so no answer can come from the response cache.
local body_file = os.getenv("WRK_BODY_FILE")
local vary = os.getenv("WRK_VARY")
local template = nil
if body_file and body_file ~= "" then
  local f = assert(io.open(body_file, "rb"))
  wrk.method = "POST"
  wrk.body = f:read("*a")
  f:close()
  wrk.headers["Content-Type"] = "application/json"
  template = wrk.body
end

local threads = {}
function setup(thread)
  thread:set("id", #threads)
  thread:set("nthreads", 0)
  table.insert(threads, thread)
  for _, t in ipairs(threads) do t:set("nthreads", #threads) end
end

local counter = 0
local pattern, prefix, original
function init(args)
  c503 = 0
  if vary and vary ~= "" and template then
    pattern = '("' .. vary .. '"%s*:%s*)([-%d%.eE+]+)'
    local p, v = string.match(template, pattern)
    assert(p, "field " .. vary .. " not found in the body")
    original = tonumber(v)
  end
end

function request()
  if not original then
    return wrk.format()
  end
  counter = counter + 1
  local n = counter * 64 + id
  local value = string.format("%.9f", original + n * 1e-6)
  local body = string.gsub(template, pattern, "%1" .. value, 1)
  return wrk.format(nil, nil, nil, body)
end

function response(status, headers, body)
  if status == 503 then c503 = c503 + 1 end
end

function done(summary, latency, requests)
  local e = summary.errors
  local errors = e.connect + e.read + e.write + e.status + e.timeout
  local busy = 0
  for _, t in ipairs(threads) do busy = busy + (t:get("c503") or 0) end
  io.write(string.format("RESULT rps=%.1f p50_ms=%.3f p99_ms=%.3f requests=%d errors=%d non2xx=%d http503=%d\n",
    summary.requests / (summary.duration / 1e6), latency:percentile(50) / 1000, latency:percentile(99) / 1000,
    summary.requests, errors, e.status, busy))
end
