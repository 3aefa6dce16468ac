#!/usr/bin/env python3
"""Rank a Chillwright catalog for one cooling case and print the best designs (Python 3 standard library only).

    python3 docs/examples/rank.py [BASE_URL] [HOW_MANY]      (defaults: http://localhost:8080, 5)

The case: hold a part at 20 °C in 45 °C air with 12 W of load, on a 0.25 K/W heat sink, from a 24 V supply, at
50 % relative humidity, with up to 4 modules per design. Every field carries its unit in its name (see
/v3/api-docs). The embedded default ranks without an account; a team deployment needs one: set CHILLWRIGHT_TOKEN
to a personal API token (POST /api/v1/tokens), or CHILLWRIGHT_USER and CHILLWRIGHT_PASSWORD.
"""
import base64
import json
import os
import sys
import urllib.error
import urllib.request

CASE = {
    "setPointC": 20, "ambientC": 45, "heatLoadW": 12,
    "sinkResistanceKPerW": 0.25, "coldInterfaceKPerW": 0.05, "hotInterfaceKPerW": 0.05,
    "supplyMaxV": 24, "relativeHumidityPct": 50,
    "maxModules": 4, "objective": "COP",
}


def authorization():
    token = os.environ.get("CHILLWRIGHT_TOKEN")
    if token:
        return "Bearer " + token
    user = os.environ.get("CHILLWRIGHT_USER")
    if user:
        pair = user + ":" + os.environ["CHILLWRIGHT_PASSWORD"]
        return "Basic " + base64.b64encode(pair.encode("utf-8")).decode("ascii")
    return None


def rank(base, how_many):
    body = json.dumps(dict(CASE, limit=how_many)).encode("utf-8")
    request = urllib.request.Request(base.rstrip("/") + "/api/v1/rankings", data=body, method="POST",
                                     headers={"Content-Type": "application/json", "Accept": "application/json"})
    if authorization():
        request.add_header("Authorization", authorization())
    try:
        with urllib.request.urlopen(request, timeout=60) as response:
            return json.load(response)
    except urllib.error.HTTPError as error:
        # every error is an RFC 9457 problem body; bad input names each field in "errors"
        problem = json.load(error)
        lines = [f"{problem.get('status')} {problem.get('title')}: {problem.get('detail')}"]
        lines += [f"  {e['field']}: {e['message']}" for e in problem.get("errors", [])]
        sys.exit("\n".join(lines))


def number(value, digits):
    return "-" if value is None else f"{value:.{digits}f}"


def main():
    base = sys.argv[1] if len(sys.argv) > 1 else "http://localhost:8080"
    how_many = int(sys.argv[2]) if len(sys.argv) > 2 else 5
    ranking = rank(base, how_many)
    print(f"{ranking['feasible']} of {ranking['evaluated']} designs hold the set-point; the best {how_many} by COP:")
    print(f"{'rank':>4}  {'part number':<16} {'supplier':<24} {'array':>5}  {'I/A':>6} {'V/V':>6} {'P/W':>6}"
          f" {'COP':>5} {'hot/°C':>6} {'margin/K':>8}  warnings")
    for c in ranking["candidates"]:
        array = f"{c['seriesCount']}x{c['parallelCount']}"  # modules in series x strings in parallel
        warnings = " ".join(w["code"] for w in c["warnings"])
        print(f"{c['rank']:>4}  {c['partNumber']:<16} {c['supplier']:<24.24} {array:>5}"
              f"  {number(c['currentA'], 2):>6} {number(c['voltageV'], 2):>6} {number(c['powerW'], 1):>6}"
              f" {number(c['cop'], 2):>5} {number(c['hotSideC'], 1):>6} {number(c['marginK'], 1):>8}  {warnings}")


if __name__ == "__main__":
    main()
