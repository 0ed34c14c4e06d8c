#!/bin/sh
# The benchmark programs in bench/ still build, the way their scripts build
# them, and still measure what `planewit` does: a benchmark that no longer
# links, or times something else than the shipped binary, would report
# figures about nothing.  (bench-draw once stopped linking unnoticed, because
# nothing in the suite built it.)  Small inputs only: no timing is asserted.
# Usage: tests/check_bench_tools.sh BUILD_DIR
set -u
build=${1:-build}
bin=$build/planewit
. "$(dirname "$0")/expect.sh"

# The build's own compiler and options (make check passes them), so that the
# objects of a sanitizer or coverage build link; plain -O2 otherwise.
cc=${BUILD_CC:-cc}
cflags="-std=c11 -D_POSIX_C_SOURCE=200809L -Wall -Wextra -Werror ${BUILD_OPT:--O2}"
# Leaks at exit of a one-shot measuring tool are not this test's subject.
ASAN_OPTIONS=${ASAN_OPTIONS:+$ASAN_OPTIONS:}detect_leaks=0
export ASAN_OPTIONS
objects="$build/producer/*.o $build/libplanewit-check.a -lcrypto -lm"
built() { # NAME SOURCE EXTRA... : compiled as the bench scripts compile it
    name=$1 source=$2
    shift 2
    # shellcheck disable=SC2086 # $cflags is a list of words on purpose
    if "$cc" $cflags -Ichecker -Iproducer -o "$tmp/$name" "$source" "$@" >"$tmp/$name.log" 2>&1; then
        ok
    else
        bad "$name-builds: does not build"
        show "$tmp/$name.log"
    fi
}
built gen bench/certify_gen.c
# shellcheck disable=SC2086 # $objects is a list of words on purpose
built phases bench/certify_phases.c $objects
# shellcheck disable=SC2086
built floor bench/certify_floor.c $objects
# shellcheck disable=SC2086
built draw_bench bench/draw_bench.c $objects

# certify_phases renders, byte for byte, what `planewit certify` writes, on a
# planar and a non-planar family; the bench scripts rely on that.
for family in stacked stacked+1; do
    "$tmp/gen" "$family" 3000 7 "$tmp/$family.graph" >/dev/null
    "$tmp/phases" "$tmp/$family.graph" "$tmp/$family.phases.cert" >"$tmp/$family.line" 2>&1
    "$bin" certify "$tmp/$family.graph" -o "$tmp/$family.cert" >/dev/null 2>&1
    if cmp -s "$tmp/$family.phases.cert" "$tmp/$family.cert"; then ok; else
        bad "phases-matches-certify-$family: certify_phases and planewit certify wrote different certificates"
    fi
    expect "phases-verdict-$family" 0 "verdict=accepted" cat "$tmp/$family.line"
done

# certify_floor checks itself (the search on the relabelled adjacency must
# number every vertex as the first search did) and prints every figure.
expect floor-runs 0 "dfs2=" "$tmp/floor" "$tmp/stacked.graph" 1
expect floor-refuses-bad-rounds 2 "ROUNDS must be 1 to 15" "$tmp/floor" "$tmp/stacked.graph" 0

finish check_bench_tools
