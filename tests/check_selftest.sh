#!/bin/sh
# End-to-end tests of `planewit selftest` (the qualification run behind
# `make qualify`): the committed vectors qualify, and a changed vector byte, a
# changed expectation or another vector set each make it fail loudly.
# Usage: tests/check_selftest.sh BUILD_DIR
set -u
bin=$(cd "$(dirname "${1:-build}/planewit")" && pwd)/planewit
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
pass=0
fail=0
ok() { pass=$((pass + 1)); }
bad() { echo "FAIL $1"; sed 's/^/    /' "$tmp/err" | head -n 6; fail=$((fail + 1)); }
has() { if grep -qF -- "$2" "$3"; then ok; else bad "$1: $3 lacks '$2'"; fi; }
run() { # NAME EXPECTED-EXIT VECTORS-DIR
    "$bin" selftest --vectors "$3" -o "$tmp/report.json" 2>"$tmp/err"
    got=$?
    [ "$got" -eq "$2" ] && ok || bad "$1: exit $got, expected $2"
}

if [ ! -f vectors/MANIFEST ]; then
    echo "selftest: vectors/MANIFEST missing"; exit 1
fi
cases=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | grep -c '[^[:space:]]')
run committed 0 vectors
has committed "\"totals\": {\"cases\": $cases, \"passed\": $cases, \"deviations\": 0}" "$tmp/report.json"
has committed '"result": "qualified"' "$tmp/report.json"
# The report names the vector-set digest as sha256sum computes it (common practice: FIPS 180-4).
has committed "\"vector_set_sha256\": \"$(sha256sum vectors/SHA256SUMS | cut -c1-64)\"" "$tmp/report.json"
has committed "\"executable_sha256\":\"$(sha256sum "$bin" | cut -c1-64)\"" "$tmp/report.json"
/usr/bin/python3 -m json.tool "$tmp/report.json" >/dev/null 2>&1 && ok || bad "report is not JSON"

# One byte of one vector changed: the hash check names it.
cp -r vectors "$tmp/v1"
graph=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | awk 'NF { print $2; exit }')
printf '# changed\n' >>"$tmp/v1/$graph"
run changed-byte 1 "$tmp/v1"
has changed-byte "deviation: $tmp/v1/$graph: SHA-256 differs from SHA256SUMS" "$tmp/err"
has changed-byte '"result": "not qualified"' "$tmp/report.json"

# An expectation changed and the sums regenerated: the case deviates, and the vector
# set is no longer the one the binary was built with.
cp -r vectors "$tmp/v2"
first=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | awk 'NF { print $1; exit }')
sed -i "s/^\($first[[:space:]].*\) accepted  ok /\1 rejected  euler /" "$tmp/v2/MANIFEST"
(cd "$tmp/v2" && sed -i "s/^[0-9a-f]*  MANIFEST\$/$(sha256sum MANIFEST | cut -c1-64)  MANIFEST/" SHA256SUMS)
run changed-expectation 1 "$tmp/v2"
has changed-expectation "deviation: case $first: expected rejected [euler], got accepted [ok]" "$tmp/err"
has changed-expectation "is not the one this binary was built with" "$tmp/err"

# A malformed manifest line is an error, not a skipped case.
cp -r vectors "$tmp/v3"
echo 'half-a-case graphs/x.graph' >>"$tmp/v3/MANIFEST"
run malformed 2 "$tmp/v3"
has malformed "MANIFEST line $(wc -l <"$tmp/v3/MANIFEST"): expected NAME GRAPH CERT" "$tmp/err"
run missing 2 "$tmp/nowhere"

echo "selftest: $pass passed, $fail failed"
[ "$fail" -eq 0 ]
