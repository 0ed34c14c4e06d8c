#!/bin/sh
# End-to-end tests of `planewit certify`: what it writes, what it prints, its
# exit codes, and its refusals.  Every certificate it writes is checked again
# here by `planewit check` in a separate run.
# Usage: tests/check_certify.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. "$(dirname "$0")/expect.sh"

# K5 and K3,3 (Kuratowski 1930: non-planar), K4 (planar: common practice),
# K3,4 (bipartite, 12 > 2*7 - 4 = 10 edges), K6 (15 > 3*6 - 6 = 12 edges); the
# bounds 3N - 6 and 2N - 4 are common practice.  K3,3 itself is bipartite with
# 9 > 2*6 - 4 edges, so --witness cheapest answers it with the bipartite bound.
printf 'graph 5 10\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n' >"$tmp/k5.graph"
printf 'graph 6 9\n0 3\n0 4\n0 5\n1 3\n1 4\n1 5\n2 3\n2 4\n2 5\n' >"$tmp/k33.graph"
printf 'graph 4 6\n0 1\n0 2\n0 3\n1 2\n1 3\n2 3\n' >"$tmp/k4.graph"
printf 'graph 7 12\n' >"$tmp/k34.graph"
for a in 0 1 2; do for b in 3 4 5 6; do echo "$a $b"; done; done >>"$tmp/k34.graph"
printf 'graph 6 15\n' >"$tmp/k6.graph"
for a in 0 1 2 3 4; do for b in 1 2 3 4 5; do [ "$a" -lt "$b" ] && echo "$a $b"; done; done >>"$tmp/k6.graph"
printf 'graph 3 0\n' >"$tmp/empty.graph"

expect k4-planar 0 "accepted: planar (rotation system) - 4 vertices, 6 edges, 4 faces, 1 component" \
    "$bin" certify "$tmp/k4.graph" -o "$tmp/k4.cert"
expect k4-check 0 "accepted: planar" "$bin" check "$tmp/k4.graph" "$tmp/k4.cert"
sum=$(sha256sum "$tmp/k4.graph" | cut -d' ' -f1)
expect k4-bound-to-graph 0 "graph-sha256 $sum" cat "$tmp/k4.cert"
expect k5-subdivision 0 "; 10 paths with 10 edges in all:" \
    "$bin" certify "$tmp/k5.graph" -o "$tmp/k5.cert"
expect k5-check 0 "accepted: nonplanar (subdivision of K5)" "$bin" check "$tmp/k5.graph" "$tmp/k5.cert"
expect k33-subdivision 0 "9 paths with 9 edges in all" "$bin" certify "$tmp/k33.graph" -o "$tmp/k33.cert"
expect k33-check 0 "accepted: nonplanar (subdivision of K3,3)" "$bin" check "$tmp/k33.graph" "$tmp/k33.cert"
expect empty-planar 0 "3 vertices, 0 edges, 3 faces, 3 components" "$bin" certify "$tmp/empty.graph"
expect cheapest-edge-bound 0 "accepted: nonplanar (edge bound 3N - 6)" \
    "$bin" certify "$tmp/k6.graph" --witness cheapest -o "$tmp/k6.cert"
expect cheapest-edge-bound-says 0 "M = 15 edges exceeds 3N - 6 = 12" \
    "$bin" certify "$tmp/k6.graph" --witness cheapest
expect cheapest-edge-bound-check 0 "accepted: nonplanar" "$bin" check "$tmp/k6.graph" "$tmp/k6.cert"
expect cheapest-bipartite 0 "accepted: nonplanar (bipartite edge bound 2N - 4)" \
    "$bin" certify "$tmp/k34.graph" --witness cheapest -o "$tmp/k34.cert"
expect cheapest-bipartite-sides 0 "side 0: 0 1 2" "$bin" certify "$tmp/k34.graph" --witness cheapest
expect cheapest-bipartite-check 0 "accepted: nonplanar" "$bin" check "$tmp/k34.graph" "$tmp/k34.cert"
printf 'graph 7 10\n0 3\n0 4\n0 6\n6 5\n1 3\n1 4\n1 5\n2 3\n2 4\n2 5\n' >"$tmp/k33sub.graph"
expect cheapest-falls-back 0 "subdivision of K3,3" "$bin" certify "$tmp/k33sub.graph" --witness cheapest
expect default-subdivision 0 "subdivision of K5" "$bin" certify "$tmp/k6.graph"
expect json-record 0 '"verdict":"accepted","exit_code":0,"claim":"nonplanar","witness":"subdivision-k5"' \
    "$bin" certify "$tmp/k5.graph" --json
expect cert-to-stdout 0 "claim nonplanar" "$bin" certify "$tmp/k5.graph" -o -
"$bin" certify "$tmp/k5.graph" -o - 2>/dev/null >"$tmp/k5.stdout.cert"
expect cert-stdout-checks 0 "accepted: nonplanar" "$bin" check "$tmp/k5.graph" "$tmp/k5.stdout.cert"
expect no-output 0 "no certificate written (give -o CERT to write one)" "$bin" certify "$tmp/k4.graph"
expect graph-stdin 0 "accepted: planar" sh -c "\"$bin\" certify - <\"$tmp/k4.graph\""

# Unusable input: the kernel's graph parser speaks, exit 2, nothing written.
printf 'graph 3 2\n0 1\n1 1\n' >"$tmp/loop.graph"
expect loop-refused 2 "loop.graph line 3: edge 1 1 joins vertex 1 to itself [self-loop]" \
    "$bin" certify "$tmp/loop.graph" -o "$tmp/loop.cert"
[ -e "$tmp/loop.cert" ] && bad "a certificate was written for an unusable graph" || ok
expect usage-both 2 "give a GRAPH or --graph6 FILE, not both" "$bin" certify "$tmp/k4.graph" --graph6 -
expect usage-none 2 "needs a GRAPH file or --graph6 FILE" "$bin" certify
expect usage-witness 2 "--witness takes 'cheapest' or 'subdivision', not 'best'" \
    "$bin" certify "$tmp/k4.graph" --witness best
expect usage-summary 2 "--summary applies to --graph6 only" "$bin" certify "$tmp/k4.graph" --summary
expect usage-stream-output 2 "-o, --names and --json apply to a single GRAPH" \
    "$bin" certify --graph6 - -o x
expect help 0 "usage: planewit certify GRAPH" "$bin" certify --help

# A graph file over 4 MiB (policy_grid): the memory policy changes speed only, so the
# certificate must be byte for byte the one made from the same bytes on standard input.
policy_grid "$tmp/big.graph" "$tmp/big-grid.cert"
expect big-certify 0 "certificate written" "$bin" certify "$tmp/big.graph" -o "$tmp/big.cert"
expect big-certify-stdin 0 "certificate written" sh -c "\"$bin\" certify - -o \"$tmp/big-stdin.cert\" <\"$tmp/big.graph\""
cmp -s "$tmp/big.cert" "$tmp/big-stdin.cert" && ok || bad "big: the certificate depends on the memory policy"
expect big-check 0 "accepted: planar" "$bin" check "$tmp/big.graph" "$tmp/big.cert"

# Streams: one line per graph and the counts; malformed records named by line and byte offset.
printf 'C~\n>>graph6<<D~{\n@\n' >"$tmp/three.g6"
expect stream-lines 0 "line 2: certified nonplanar (subdivision-k5) - 5 vertices, 10 edges" \
    "$bin" certify --graph6 "$tmp/three.g6"
expect stream-null-graph 0 "line 3: certified planar (rotation-system) - 1 vertex, 0 edges" \
    "$bin" certify --graph6 "$tmp/three.g6"
"$bin" certify --graph6 "$tmp/three.g6" --summary >"$tmp/sum.out"
if [ "$(tail -n 1 "$tmp/sum.out")" = "graphs=3 planar=2 nonplanar=1" ] &&
    [ "$(wc -l <"$tmp/sum.out")" -eq 3 ]; then ok; else bad "stream summary"; cat "$tmp/sum.out"; fi
printf 'C~\nC~\nBx\n' >"$tmp/bad.g6"
expect stream-bad-record 2 "bad.g6 line 3, byte offset 7 (column 2): the padding bits of the last byte must be zero" \
    "$bin" certify --graph6 "$tmp/bad.g6" --summary
printf 'C~\r\nBW\r\n' >"$tmp/crlf.g6"
expect stream-crlf 0 "graphs=2 planar=2 nonplanar=0" "$bin" certify --graph6 "$tmp/crlf.g6" --summary
expect stream-empty-line 2 "line 2, byte offset 3 (column 1): expected a graph6 record, found an empty line" \
    sh -c "printf 'C~\n\nC~\n' | \"$bin\" certify --graph6 - --summary"
expect stream-missing 2 "nope.g6: cannot open" "$bin" certify --graph6 "$tmp/nope.g6"

finish check_certify
