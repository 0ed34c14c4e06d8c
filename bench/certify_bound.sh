#!/bin/sh
# What bounds certify's time (issue 3): the same seeded families as the certify
# benchmark, measured two ways that do not depend on certify's own code paths.
#  1. Floors, timed (bench/certify_floor.c): the kernel's parse, one gather of
#     every dart's neighbour, a bare depth-first numbering on the shuffled ids
#     (plain, and fetching ahead at least as eagerly as certify's own search
#     does), the same adjacency relabelled in depth-first order, and the bare
#     search again on it; beside certify's algorithm phase
#     (bench/certify_phases.c), interleaved in one session.  Both published
#     linear-time planarity methods start from such a search, so its time per
#     edge is a floor for theirs.  The same program also times certify's engine
#     on the graph as parsed and on a copy with depth-first ids, which is what
#     building such a copy would buy.
#  2. Work, counted: instructions executed per edge in parse, algorithm, text
#     and self-check, from valgrind's callgrind (inclusive counts of
#     pw_graph_parse, pp_certify, pp_cert_text, pw_check_parsed).  A count
#     does not depend on caches or load, so equal counts per edge at every
#     size show linear work whatever the clock says.
# Results: bench/results-certify-bound.md.
#
# usage: sh bench/certify_bound.sh [BUILD_DIR]        (make bench-certify-bound)
# Environment (defaults in brackets):
#   FAMILIES    [stacked trigrid sparse stacked+1 chords random2n]
#   SIZES       timed sizes [100000 1000000 10000000]
#   ROUNDS      runs per timed figure, medians reported [3]
#   WORK_SIZES  sizes counted under callgrind (about 25 s per 10^6 edges) [100000 1000000]
#   JOBS        callgrind runs at once [2]
#   OUT         [bench/results-certify-bound.md]
set -eu
build=${1:-build}
families=${FAMILIES:-"stacked trigrid sparse stacked+1 chords random2n"}
sizes=${SIZES:-"100000 1000000 10000000"}
rounds=${ROUNDS:-3}
work_sizes=${WORK_SIZES:-"100000 1000000"}
jobs=${JOBS:-2}
out=${OUT:-bench/results-certify-bound.md}
seed=20240603
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

command -v valgrind >/dev/null || apt-get install -y --no-install-recommends valgrind >/dev/null
. bench/tools.sh
bench_start
for tool in certify_gen certify_floor certify_phases; do bench_build "$tool" "$work" "$build"; done

median() { sort -g | awk '{ v[NR] = $1 } END { print v[int((NR + 1) / 2)] }'; }
graph() { echo "$work/$1-$2.graph"; }

for f in $families; do
    for m in $(echo "$sizes $work_sizes" | tr ' ' '\n' | sort -un); do
        "$work/certify_gen" "$f" "$m" "$seed" "$(graph "$f" "$m")" >/dev/null
    done
done

# 1. Timed: the floors, and certify's algorithm phase on the same file, interleaved.
for m in $sizes; do
    for f in $families; do
        g=$(graph "$f" "$m")
        : >"$work/alg"
        for r in $(seq "$rounds"); do
            p=$("$work/certify_phases" "$g" "$work/c.cert")
            field "$p" algorithm >>"$work/alg"
        done
        fl=$("$work/certify_floor" "$g" "$rounds")
        echo "time family=$f $fl algorithm=$(median <"$work/alg")" >>"$work/raw"
        echo "timed $f $m" >&2
    done
done

# 2. Counted: instructions per phase under callgrind, JOBS at a time.
count_one() { # FAMILY EDGES -> a "work" line
    cg="$work/cg-$1-$2"
    valgrind --tool=callgrind --callgrind-out-file="$cg" "$work/certify_phases" "$(graph "$1" "$2")" \
        "$cg.cert" >"$cg.line" 2>/dev/null
    callgrind_lines "$cg" yes |
        awk -v f="$1" -v m="$(field "$(cat "$cg.line")" m)" '
            { fn = $1; ir = $2 }
            fn == "pw_graph_parse" { parse = ir } fn == "pp_certify" { alg = ir }
            fn == "pp_cert_text" { text = ir } fn == "pw_check_parsed" { check = ir }
            END { printf "work family=%s m=%s parse=%s algorithm=%s text=%s selfcheck=%s\n",
                         f, m, parse, alg, text + 0, check }'
}
running=0
for m in $work_sizes; do
    for f in $families; do
        count_one "$f" "$m" >"$work/w-$f-$m" &
        running=$((running + 1))
        if [ "$running" -ge "$jobs" ]; then
            wait
            running=0
        fi
    done
done
wait
for m in $work_sizes; do for f in $families; do cat "$work/w-$f-$m" >>"$work/raw"; done; done

bench_render bench/certify_bound.awk "$work/raw" "$out" -v rounds="$rounds"
