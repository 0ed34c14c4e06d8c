#!/bin/sh
# The benchmark programs in bench/ still build, with the scripts' own build
# function (bench/tools.sh), and still measure what `planewit` does: a
# benchmark that no longer links, or times something else than the shipped
# binary, would report figures about nothing.  (bench-draw once stopped
# linking unnoticed, because nothing in the suite built it.)  Small inputs
# only: no timing is asserted.
# Usage: tests/check_bench_tools.sh BUILD_DIR
set -u
build=${1:-build}
bin=$build/planewit
. "$(dirname "$0")/expect.sh"

# The build's own compiler and options (make check passes them), so that the
# objects of a sanitizer or coverage build link; bench/tools.sh's own otherwise.
bench_cc=${BUILD_CC:-cc}
[ -n "${BUILD_OPT:-}" ] && bench_cflags=$BUILD_OPT
. bench/tools.sh
# Leaks at exit of a one-shot measuring tool are not this test's subject.
ASAN_OPTIONS=${ASAN_OPTIONS:+$ASAN_OPTIONS:}detect_leaks=0
export ASAN_OPTIONS
for tool in certify_gen certify_phases certify_floor draw_bench; do
    if bench_build "$tool" "$tmp" "$build" >"$tmp/$tool.log" 2>&1; then ok; else
        bad "$tool-builds: does not build"
        show "$tmp/$tool.log"
    fi
done

# certify_phases renders, byte for byte, what `planewit certify` writes, on a
# planar and a non-planar family; the bench scripts rely on that.
for family in stacked stacked+1; do
    "$tmp/certify_gen" "$family" 3000 7 "$tmp/$family.graph" >/dev/null
    "$tmp/certify_phases" "$tmp/$family.graph" "$tmp/$family.phases.cert" >"$tmp/$family.line" 2>&1
    "$bin" certify "$tmp/$family.graph" -o "$tmp/$family.cert" >/dev/null 2>&1
    if cmp -s "$tmp/$family.phases.cert" "$tmp/$family.cert"; then ok; else
        bad "phases-matches-certify-$family: certify_phases and planewit certify wrote different certificates"
    fi
    expect "phases-verdict-$family" 0 "verdict=accepted" cat "$tmp/$family.line"
done

# certify_floor checks itself (the search that fetches ahead, and the one on
# the relabelled adjacency, must number every vertex as the plain search did;
# certify's engine must reach the same verdict on the graph and on its
# depth-first copy) and prints every figure; two rounds, so that each search
# and each engine run once goes first; a planar and a non-planar family.
expect floor-runs 0 "dfs2=" "$tmp/certify_floor" "$tmp/stacked.graph" 1
expect floor-runs-both-orders 0 " dfids=" "$tmp/certify_floor" "$tmp/stacked.graph" 2
expect floor-runs-non-planar 0 " dfids=" "$tmp/certify_floor" "$tmp/stacked+1.graph" 2
expect floor-refuses-bad-rounds 2 "ROUNDS must be 1 to 15" "$tmp/certify_floor" "$tmp/stacked.graph" 0

finish check_bench_tools
