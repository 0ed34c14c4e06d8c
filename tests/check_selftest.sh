#!/bin/sh
# End-to-end tests of `planewit selftest` (the qualification run behind
# `make qualify`): the committed vectors qualify, and a changed vector byte, a
# changed expectation or another vector set each make it fail loudly.
# Usage: tests/check_selftest.sh BUILD_DIR
set -u
bin=$(cd "$(dirname "${1:-build}/planewit")" && pwd)/planewit
. "$(dirname "$0")/expect.sh"
evidence="$tmp/err"
qualify() { # NAME EXPECTED-EXIT VECTORS-DIR: report in $tmp/report.json, stderr in $tmp/err
    "$bin" selftest --vectors "$3" -o "$tmp/report.json" 2>"$tmp/err"
    status_is "$1" $? "$2"
}

if [ ! -f vectors/MANIFEST ]; then
    echo "selftest: vectors/MANIFEST missing"; exit 1
fi
cases=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | grep -c '[^[:space:]]')
qualify committed 0 vectors
has committed "$tmp/report.json" "\"totals\": {\"cases\": $cases, \"passed\": $cases, \"deviations\": 0}"
has committed "$tmp/report.json" '"result": "qualified"'
# The report names the vector-set digest as sha256sum computes it (common practice: FIPS 180-4).
has committed "$tmp/report.json" "\"vector_set_sha256\": \"$(sha256sum vectors/SHA256SUMS | cut -c1-64)\""
has committed "$tmp/report.json" "\"executable_sha256\":\"$(sha256sum "$bin" | cut -c1-64)\""
/usr/bin/python3 -m json.tool "$tmp/report.json" >/dev/null 2>&1 && ok || bad "report is not JSON"

# One byte of one vector changed: the hash check names it.
cp -r vectors "$tmp/v1"
graph=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | awk 'NF { print $2; exit }')
printf '# changed\n' >>"$tmp/v1/$graph"
qualify changed-byte 1 "$tmp/v1"
has changed-byte "$tmp/err" "deviation: $tmp/v1/$graph: SHA-256 differs from SHA256SUMS"
has changed-byte "$tmp/report.json" '"result": "not qualified"'

# An expectation changed and the sums regenerated: the case deviates, and the vector
# set is no longer the one the binary was built with.
cp -r vectors "$tmp/v2"
first=$(grep -v '^[[:space:]]*#' vectors/MANIFEST | awk 'NF { print $1; exit }')
sed -i "s/^\($first[[:space:]].*\) accepted  ok /\1 rejected  euler /" "$tmp/v2/MANIFEST"
(cd "$tmp/v2" && sed -i "s/^[0-9a-f]*  MANIFEST\$/$(sha256sum MANIFEST | cut -c1-64)  MANIFEST/" SHA256SUMS)
qualify changed-expectation 1 "$tmp/v2"
has changed-expectation "$tmp/err" "deviation: case $first: expected rejected [euler], got accepted [ok]"
has changed-expectation "$tmp/err" "is not the one this binary was built with"

# A malformed manifest line is an error, not a skipped case.
cp -r vectors "$tmp/v3"
echo 'half-a-case graphs/x.graph' >>"$tmp/v3/MANIFEST"
qualify malformed 2 "$tmp/v3"
has malformed "$tmp/err" "MANIFEST line $(wc -l <"$tmp/v3/MANIFEST"): expected NAME GRAPH CERT"
qualify missing 2 "$tmp/nowhere"

finish selftest
