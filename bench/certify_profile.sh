#!/bin/sh
# Where `planewit certify`'s time goes (issue 3: "if a target is missed, say by
# how much and what bounds it; profile it").  The same seeded families as the
# certify benchmark, at one size, each certified by the shipped binary:
#  1. under perf, sampling the CPU clock with call stacks, RUNS times: the time
#     of each phase (by the phase function on the stack: read, parse, hash,
#     algorithm, text, self-check, write), the part of it the operating system spent
#     handing out fresh memory (page faults), and the functions it was spent in;
#     then `planewit check` of the certificate, RUNS times, by its phases (read,
#     parse, hash, certificate parse, verify), for the target check <= 0.25 x
#     certify;
#  2. under valgrind's callgrind, once for parse and once for the algorithm
#     (collecting inside pw_graph_parse, then inside pp_certify): the
#     instructions each of our functions executed there (a count that does not
#     depend on caches or load).
# Time over instructions, per function, tells a function that computes from one
# that waits on memory.  Results: bench/results-certify-profile.md.
#
# usage: sh bench/certify_profile.sh [BUILD_DIR]      (make bench-certify-profile)
# Environment (defaults in brackets):
#   FAMILIES  [stacked trigrid sparse stacked+1 chords random2n]
#   SIZE      edges [1000000]
#   RUNS      perf runs per family, their samples summed [3]
#   FREQ      samples per second [2000]
#   OUT       [bench/results-certify-profile.md]
set -eu
build=${1:-build}
families=${FAMILIES:-"stacked trigrid sparse stacked+1 chords random2n"}
size=${SIZE:-1000000}
runs=${RUNS:-3}
freq=${FREQ:-2000}
out=${OUT:-bench/results-certify-profile.md}
seed=20240603
bin=$build/planewit
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

command -v valgrind >/dev/null || apt-get install -y --no-install-recommends valgrind >/dev/null
command -v perf >/dev/null || apt-get install -y --no-install-recommends linux-perf >/dev/null
if ! perf record -q -e cpu-clock -o "$work/probe.data" true >/dev/null 2>&1; then
    echo "certify_profile: perf cannot sample here (kernel.perf_event_paranoid is" \
        "$(cat /proc/sys/kernel/perf_event_paranoid 2>/dev/null || echo unknown); run as root)" >&2
    exit 1
fi
. bench/tools.sh
bench_start
bench_build certify_gen "$work" "$build"

# profile TOOL FAMILY ROOTS COMMAND...: RUNS perf runs of COMMAND, sorted by phase.
profile() {
    tool=$1 family=$2 roots=$3
    shift 3
    for r in $(seq "$runs"); do
        if ! perf record -q -e cpu-clock -F "$freq" --call-graph dwarf,16384 -o "$work/perf.data" \
            -- "$@" >"$work/run.log" 2>&1; then
            echo "certify_profile: failed under perf: $*" >&2
            cat "$work/run.log" >&2
            exit 1
        fi
        perf script -i "$work/perf.data" -F period,ip,sym,dso 2>/dev/null |
            awk -v tool="$tool" -v family="$family" -v run="$r" -v roots="$roots" \
                -f bench/certify_profile_samples.awk >>"$work/raw"
    done
}

for f in $families; do
    g=$work/$f.graph
    line=$("$work/certify_gen" "$f" "$size" "$seed" "$g")
    echo "graph $f $(field "$line" n) $(field "$line" m)" >>"$work/raw"
    profile certify "$f" "$(profile_roots certify)" "$bin" certify "$g" -o "$work/c.cert"
    profile check "$f" "$(profile_roots check)" "$bin" check "$g" "$work/c.cert"
    for phase in pw_graph_parse=parse pp_certify=algorithm; do
        valgrind --tool=callgrind --toggle-collect="${phase%=*}" --callgrind-out-file="$work/cg" \
            "$bin" certify "$g" -o "$work/c.cert" >/dev/null 2>&1
        callgrind_lines "$work/cg" no |
            awk -v f="$f" -v ph="${phase#*=}" '{ print "count", f, ph, $1, $2 }' >>"$work/raw"
    done
    echo "profiled $f" >&2
done

bench_render bench/certify_profile.awk "$work/raw" "$out" -v runs="$runs" -v freq="$freq"
