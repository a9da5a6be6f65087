-- wrk script: POST the JSON body from the file named in BODY (an environment variable).
local f = assert(io.open(os.getenv("BODY"), "r"))
wrk.method = "POST"
wrk.body = f:read("*a")
f:close()
wrk.headers["Content-Type"] = "application/json"
wrk.headers["Accept"] = "application/json"
