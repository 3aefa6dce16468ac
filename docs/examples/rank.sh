#!/usr/bin/env bash
# Rank a Chillwright catalog for one cooling case and print the best designs, with nothing but curl.
#
#   docs/examples/rank.sh [BASE_URL] [HOW_MANY]      (defaults: http://localhost:8080, 5)
#
# The case: hold a part at 20 °C in 45 °C air with 12 W of load, on a 0.25 K/W heat sink, from a 24 V supply,
# at 50 % relative humidity, with up to 4 modules per design. Change the JSON below for your own case; every
# field carries its unit in its name (see /v3/api-docs). The answer asked for is CSV: a header row, the designs
# in rank order, then the modules that cannot do the job with their reason.
#
# The embedded default ranks without an account. A team deployment needs one: set CHILLWRIGHT_TOKEN to a
# personal API token (POST /api/v1/tokens), or CHILLWRIGHT_USER and CHILLWRIGHT_PASSWORD.
set -euo pipefail

base="${1:-http://localhost:8080}"
how_many="${2:-5}"

auth=()
if [ -n "${CHILLWRIGHT_TOKEN:-}" ]; then
  auth=(-H "Authorization: Bearer ${CHILLWRIGHT_TOKEN}")
elif [ -n "${CHILLWRIGHT_USER:-}" ]; then
  auth=(-u "${CHILLWRIGHT_USER}:${CHILLWRIGHT_PASSWORD:?set CHILLWRIGHT_PASSWORD too}")
fi

case_json='{
  "setPointC": 20, "ambientC": 45, "heatLoadW": 12,
  "sinkResistanceKPerW": 0.25, "coldInterfaceKPerW": 0.05, "hotInterfaceKPerW": 0.05,
  "supplyMaxV": 24, "relativeHumidityPct": 50,
  "maxModules": 4, "objective": "COP", "limit": '"${how_many}"'
}'

# --fail-with-body: on an error the problem body (what was wrong, field by field) is printed and the exit code is 22
ranking="$(curl --silent --show-error --fail-with-body ${auth[@]+"${auth[@]}"} \
  -H 'Content-Type: application/json' -H 'Accept: text/csv' \
  --data "${case_json}" "${base}/api/v1/rankings")" || { echo "${ranking}" >&2; exit 1; }

# header row plus the ranked designs (feasible=true); the refused modules follow them in the full table
printf '%s\n' "${ranking}" | head -n 1
printf '%s\n' "${ranking}" | tail -n +2 | grep -E '^[0-9]+,true,' | head -n "${how_many}"
