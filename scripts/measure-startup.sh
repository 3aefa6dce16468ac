#!/usr/bin/env bash
# Measures the time from launching the packaged app to the first 200 on /actuator/health, and the
# resident memory (RSS) just after. Usage: scripts/measure-startup.sh [runs] [extra java args...]
# Needs ./mvnw -DskipTests package first (or JAR=path to another jar). Uses a throw-away H2 file under a
# temp directory, so every run also loads the demo catalog, as a first start does.
set -euo pipefail
cd "$(dirname "$0")/.."
runs=${1:-3}; shift || true
jar=${JAR:-$(ls target/chillwright-*.jar | grep -v plain | head -n 1)}
port=18080
for run in $(seq 1 "$runs"); do
    dir=$(mktemp -d)
    start=$(date +%s.%N)
    CHILLWRIGHT_ADMIN_PASSWORD=startup-measure java "$@" -jar "$jar" --server.port=$port \
        --spring.datasource.url="jdbc:h2:file:$dir/db" >"$dir/log" 2>&1 &
    pid=$!
    until curl -fs -o /dev/null "http://127.0.0.1:$port/actuator/health"; do sleep 0.05; done
    end=$(date +%s.%N)
    rss=$(ps -o rss= -p $pid)
    printf 'run %d: first 200 after %.1f s, RSS %d MB\n' "$run" "$(echo "$end - $start" | bc)" $((rss / 1024))
    kill $pid; wait $pid 2>/dev/null || true
    rm -rf "$dir"
done
