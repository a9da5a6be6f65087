"""Outside-style speed check of a running Nodewright over loopback (measuring aid, not a test).

    python3 src/benchmarks/python/http_check.py [port]      (default 8080)

Prints: the size of a default string analysis answer (plain and gzip), its median latency and that
of GET /api/v1/materials on the same keep-alive connection, and the 200-frustum curved bore over
HTTP against the numpy peer of tmm_peer.py measured in the same run. Also the machine's load.
"""
import gzip
import http.client
import json
import os
import statistics
import sys
import time

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import tmm_peer  # noqa: E402

PORT = int(sys.argv[1]) if len(sys.argv) > 1 else 8080

STRING = {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
          "endCondition": "pinned", "stiffness": True, "modeCount": 24,
          "pluck": {"positionMm": 120.0, "kind": "pluck"},
          "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}


def bore_request():
    segs = tmm_peer.curved_bore()
    return {"segments": [{"lengthMm": l * 1e3, "inputDiameterMm": 2e3 * a, "outputDiameterMm": 2e3 * b}
                         for l, a, b in segs],
            "inputEnd": "closed", "outputEnd": "open-unflanged", "temperatureC": 20.0,
            "relativeHumidityPct": 0.0, "losses": True, "fMinHz": 20.0, "fMaxHz": 3000.0, "points": 4000}


def call(conn, method, path, body=None, gz=False):
    headers = {"Accept": "application/json"}
    if gz:
        headers["Accept-Encoding"] = "gzip"
    data = None
    if body is not None:
        data = json.dumps(body).encode()
        headers["Content-Type"] = "application/json"
    t0 = time.perf_counter()
    conn.request(method, path, body=data, headers=headers)
    resp = conn.getresponse()
    raw = resp.read()
    text = gzip.decompress(raw) if resp.getheader("Content-Encoding") == "gzip" else raw
    elapsed = time.perf_counter() - t0
    if resp.status != 200:
        raise SystemExit(f"{method} {path}: HTTP {resp.status} {text[:300]!r}")
    return elapsed, len(raw), text


def median_ms(conn, method, path, body=None, gz=False, n=100):
    for _ in range(5):
        call(conn, method, path, body, gz)
    return 1e3 * statistics.median(call(conn, method, path, body, gz)[0] for _ in range(n))


def main():
    conn = http.client.HTTPConnection("127.0.0.1", PORT, timeout=60)
    print("load:", open("/proc/loadavg").read().strip())
    _, plain, text = call(conn, "POST", "/api/v1/strings/analyze", STRING)
    _, packed, _ = call(conn, "POST", "/api/v1/strings/analyze", STRING, gz=True)
    modes = json.loads(text)["modes"]
    print(f"string answer (24 modes): {plain} bytes plain, {packed} bytes gzip; {len(modes)} modes")
    for gz in (False, True):
        mat = median_ms(conn, "GET", "/api/v1/materials", gz=gz, n=200)
        ana = median_ms(conn, "POST", "/api/v1/strings/analyze", STRING, gz=gz, n=200)
        print(f"gzip={gz}: median materials {mat:.2f} ms, string analysis {ana:.2f} ms, ratio {ana / mat:.2f}")
    bore = bore_request()
    for gz in (False, True):
        _, size, _ = call(conn, "POST", "/api/v1/air-columns/analyze", bore, gz)
        http_ms = median_ms(conn, "POST", "/api/v1/air-columns/analyze", bore, gz=gz, n=20)
        peer_ms = 1e3 * tmm_peer.time_sweep(tmm_peer.curved_bore(), repeats=10)
        print(f"gzip={gz}: 200-frustum bore over HTTP {http_ms:.1f} ms ({size} bytes), numpy peer {peer_ms:.1f} ms, "
              f"ratio {http_ms / peer_ms:.3f}")
    print("load:", open("/proc/loadavg").read().strip())


if __name__ == "__main__":
    main()
