#!/bin/sh
# End-to-end tests of the planewit binary: exit codes, messages, standard
# input, options and limits, as a user or a script sees them.
# Usage: tests/check_cli.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. "$(dirname "$0")/expect.sh"

printf 'graph 3 3\n0 1\n1 2\n2 0\n' >"$tmp/tri.graph"
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 1\n' >"$tmp/tri.cert"
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 9\n' >"$tmp/bad.cert"
printf 'graph 3 2\n0 1\n1 1\n' >"$tmp/loop.graph"

expect version 0 "planewit 0.2.0" "$bin" --version
expect help 0 "usage: planewit COMMAND" "$bin" --help
expect check-help 0 "Exit status: 0 accepted, 1 rejected, 2 unusable" "$bin" check --help
expect no-command 2 "usage: planewit COMMAND" "$bin"
expect unknown-command 2 "unknown command 'frobnicate'" "$bin" frobnicate
expect unknown-option 2 "unknown option '--fast'" "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --fast
expect one-file 2 "needs a graph file and a certificate file" "$bin" check "$tmp/tri.graph"
expect two-stdin 2 "only one of the two files can be standard input" "$bin" check - -
expect missing-file 2 "nope.graph: cannot open" "$bin" check "$tmp/nope.graph" "$tmp/tri.cert"
expect accepted 0 "accepted: planar (rotation system) - 3 vertices, 3 edges, 2 faces, 1 component" \
    "$bin" check "$tmp/tri.graph" "$tmp/tri.cert"
expect caution 0 "qualified reviewers still decide" "$bin" check "$tmp/tri.graph" "$tmp/tri.cert"
expect rejected 1 "bad.cert line 5: vertex 9 is not in the graph (N = 3) [vertex-range]" \
    "$bin" check "$tmp/tri.graph" "$tmp/bad.cert"
expect unusable 2 "loop.graph line 3: edge 1 1 joins vertex 1 to itself [self-loop]" \
    "$bin" check "$tmp/loop.graph" "$tmp/tri.cert"
expect graph-stdin 0 "accepted: planar" sh -c "\"$bin\" check - \"$tmp/tri.cert\" <\"$tmp/tri.graph\""

# ---- a graph file over 4 MiB (policy_grid): check's memory policy changes speed only ----
# The verdict must be the one given for the same bytes from standard input, for a
# certificate that holds and for one that does not.  The grid's rotation system has
# F = E - V + 2 = 351960 - 176400 + 2 = 175562 faces (Euler's polyhedron formula).
# In the broken copy vertex 421 (inside the grid) lists its first two neighbours,
# right (422) and up (1), the other way round: then only the square between left and
# down keeps its corner at 421, and the walks of the other three squares join into one
# face, two fewer, so V - E + F = 0 (a rotation system's faces then lie on a torus).
policy_grid "$tmp/big.graph" "$tmp/big.cert"
awk '$1 == "around" && $2 == 421 { t = $4; $4 = $5; $5 = t } { print }' "$tmp/big.cert" >"$tmp/big-swapped.cert"
expect big-accepted 0 "176400 vertices, 351960 edges, 175562 faces, 1 component" \
    "$bin" check "$tmp/big.graph" "$tmp/big.cert"
expect big-swapped 1 "V - E + F = 176400 - 351960 + 175560 = 0, not 2 [euler]" \
    "$bin" check "$tmp/big.graph" "$tmp/big-swapped.cert"
for c in big big-swapped; do
    "$bin" check --json "$tmp/big.graph" "$tmp/$c.cert" | sed 's/"path":"[^"]*"//' >"$tmp/$c-file.json"
    "$bin" check --json - "$tmp/$c.cert" <"$tmp/big.graph" | sed 's/"path":"[^"]*"//' >"$tmp/$c-stdin.json"
    cmp -s "$tmp/$c-file.json" "$tmp/$c-stdin.json" && ok || bad "$c: the record depends on the memory policy"
done
expect cert-stdin 1 "<stdin> line 5" sh -c "\"$bin\" check \"$tmp/tri.graph\" - <\"$tmp/bad.cert\""
expect json-accepted 0 '"verdict":"accepted","exit_code":0,"claim":"planar","witness":"rotation-system"' \
    "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --json
expect json-rejected 1 '"reason":{"code":31,"name":"vertex-range","file":"certificate","line":5' \
    "$bin" check "$tmp/tri.graph" "$tmp/bad.cert" --json
expect json-unusable 2 '"verdict":"unusable","exit_code":2' "$bin" check "$tmp/loop.graph" "$tmp/tri.cert" --json
expect limit-vertices 2 "N = 3 exceeds the limit 2 (raise it with --max-vertices)" \
    "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --max-vertices 2
expect limit-bytes 2 "larger than 10 bytes (raise it with --max-bytes)" \
    "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --max-bytes 10
expect limit-bad-value 2 "--max-edges needs a number" "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --max-edges x

# The record's digests are those sha256sum computes from the same bytes (common practice: FIPS 180-4 SHA-256).
gsum=$(sha256sum "$tmp/tri.graph" | cut -d' ' -f1)
csum=$(sha256sum "$tmp/tri.cert" | cut -d' ' -f1)
expect json-graph-digest 0 "\"sha256\":\"$gsum\"" "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --json
expect json-cert-digest 0 "\"sha256\":\"$csum\"" "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --json
printf 'certificate 1\ngraph-sha256 %s\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 1\n' \
    "$gsum" >"$tmp/bound.cert"
expect bound-cert 0 "accepted: planar" "$bin" check "$tmp/tri.graph" "$tmp/bound.cert"
printf '# same graph, other bytes\ngraph 3 3\n0 1\n1 2\n2 0\n' >"$tmp/tri2.graph"
expect bound-cert-other-bytes 1 "[graph-hash-mismatch]" "$bin" check "$tmp/tri2.graph" "$tmp/bound.cert"

# A header claiming 2,000,000,000 vertices with nothing behind it stays within 64 MB.
printf 'graph 2000000000 0\n' >"$tmp/huge.graph"
printf 'certificate 1\nclaim planar\naround 0 :\n' >"$tmp/huge.cert"
# (AddressSanitizer reserves terabytes of address space, so a sanitized build skips this case.)
if grep -q -e AddressSanitizer -e __asan_init "$bin" 2>/dev/null; then
    echo "skip huge-header: sanitized build"
else
    expect huge-header 1 "[around-count]" sh -c "ulimit -v 65536; \"$bin\" check \"$tmp/huge.graph\" \"$tmp/huge.cert\" --max-vertices 2147483647"
fi

# Same case, two paths: the verdict record is the same from a file and from standard input.
"$bin" check "$tmp/tri.graph" "$tmp/bad.cert" --json | sed 's/"path":"[^"]*"//g' >"$tmp/a.json"
"$bin" check "$tmp/tri.graph" - --json <"$tmp/bad.cert" | sed 's/"path":"[^"]*"//g' >"$tmp/b.json"
if cmp -s "$tmp/a.json" "$tmp/b.json"; then ok; else bad "file-vs-stdin record"; fi

# A 10^6-vertex path checked with a 256 KiB stack: the kernel does not recurse.
awk 'BEGIN { n = 1000000; print "graph", n, n - 1; for (i = 0; i < n - 1; i++) print i, i + 1 }' >"$tmp/path.graph"
awk 'BEGIN { n = 1000000; print "certificate 1\nclaim planar"; print "around 0 : 1";
             for (i = 1; i < n - 1; i++) print "around", i, ":", i - 1, i + 1; print "around", n - 1, ":", n - 2 }' >"$tmp/path.cert"
expect deep-path 0 "1000000 vertices, 999999 edges, 1 face, 1 component" \
    sh -c "ulimit -s 256; \"$bin\" check \"$tmp/path.graph\" \"$tmp/path.cert\""

# Names from an imported edge list label the vertices a rejection mentions, and only those
# (the counts in an Euler message are not vertices).
printf 'U1 R5\nR5 C3\nC3 U1\nU1 J9\n' >"$tmp/net.txt"
"$bin" import --from edges "$tmp/net.txt" -o "$tmp/net.graph" 2>/dev/null
printf 'certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 2\naround 2 : 1 3\naround 3 : 0\n' >"$tmp/net.cert"
expect names-legend 1 "names: 2 = C3, 3 = J9" "$bin" check "$tmp/net.graph" "$tmp/net.cert" --names "$tmp/net.graph.names"
printf 'a b\na c\na d\nb c\nb d\nc d\n' >"$tmp/k4.txt"
"$bin" import --from edges "$tmp/k4.txt" -o "$tmp/k4.graph" 2>/dev/null
printf 'certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 2 3\naround 2 : 0 1 3\naround 3 : 0 2 1\n' >"$tmp/k4.cert"
"$bin" check "$tmp/k4.graph" "$tmp/k4.cert" --names "$tmp/k4.graph.names" >"$tmp/out" 2>&1
if grep -q '\[euler\]' "$tmp/out" && grep -qx 'names: 0 = a' "$tmp/out"; then pass=$((pass + 1)); else
    echo "FAIL names-euler: expected only vertex 0 named"; sed 's/^/    /' "$tmp/out"; fail=$((fail + 1)); fi

# Output to a pipe or device is written through it, never replaced by a file (a rename over
# /dev/null once turned it into a regular file).
mkfifo "$tmp/pipe"
timeout 30 cat "$tmp/pipe" >"$tmp/piped" &
reader=$!
# A binary that never opens the pipe must not hang the suite: both sides are timed out.
timeout 30 "$bin" check "$tmp/tri.graph" "$tmp/tri.cert" --record "$tmp/pipe" >/dev/null 2>&1
wait "$reader"
if [ -p "$tmp/pipe" ] && grep -q '"verdict":"accepted"' "$tmp/piped"; then
    ok
else
    bad "record through a pipe: the pipe was replaced or nothing came through"
fi

finish cli
