#!/bin/sh
# The certify benchmark (issue 3): `planewit certify` on six seeded families
# (bench/certify_gen.c) from 10^4 to 10^7 edges, its phases timed one by one
# (bench/certify_phases.c), the whole process's wall time and peak memory, the
# check of what it wrote, and two peers on the same files: the Boost Graph
# Library's boyer_myrvold_planarity_test with embedding and Kuratowski outputs
# (bench/certify_boost.cpp) and networkx's check_planarity
# (bench/certify_networkx.py).  Results: bench/results-certify.md
# (bench/certify_report.awk renders them).
#
# usage: sh bench/certify_bench.sh [BUILD_DIR]        (make bench-certify)
# Environment (defaults in brackets):
#   REPEAT     runs of ours per family and size; medians are reported [3]
#   LARGE_REPEAT  the same above 10^6 edges, where one run of all six
#              families takes minutes [1]
#   SIZES      target edge counts [10000 100000 1000000 10000000]
#   FAMILIES   [stacked trigrid sparse stacked+1 chords random2n]
#   BOOST_MAX  largest size Boost runs at [1000000]; at 10^7 it needs about
#              1 KB per edge and minutes per family
#   NX_MAX     largest size networkx runs at [1000000]; NX_MAX=0: networkx off
#   PEER_LIMIT networkx is stopped after this many seconds, and a size is
#              skipped when its time, estimated from the smaller sizes, would
#              exceed it [120]
#   OUT        the results file [bench/results-certify.md]
# A peer runs REPEAT times where one run takes under 10 s, once otherwise.
set -eu
build=${1:-build}
repeat=${REPEAT:-3}
large_repeat=${LARGE_REPEAT:-1}
sizes=${SIZES:-"10000 100000 1000000 10000000"}
families=${FAMILIES:-"stacked trigrid sparse stacked+1 chords random2n"}
boost_max=${BOOST_MAX:-1000000}
nx_max=${NX_MAX:-1000000}
peer_limit=${PEER_LIMIT:-120}
out=${OUT:-bench/results-certify.md}
seed=20240603
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
started=$(date +%s)
load_before=$(cut -d' ' -f1-3 /proc/loadavg)

if [ ! -x /usr/bin/time ]; then
    echo "installing Debian 'time' for peak-memory figures ..." >&2
    apt-get install -y --no-install-recommends time >/dev/null
fi
. bench/tools.sh
bench_build certify_gen "$work" "$build"
bench_build certify_phases "$work" "$build"
c++ -O2 -std=c++17 -o "$work/boost" bench/certify_boost.cpp

elapsed() { awk -v a="$1" -v b="$(date +%s.%N)" 'BEGIN { printf "%.4f", b - a }'; }

# Medians of the numeric keys of key=value lines; other keys as on the first line.
medians() {
    awk '{ for (i = 1; i <= NF; i++) { split($i, kv, "="); k = kv[1]
             if (!(k in seen)) { seen[k] = 1; order[++keys] = k; first[k] = kv[2] }
             vals[k, ++count[k]] = kv[2] } }
         END { for (j = 1; j <= keys; j++) { k = order[j]; n = count[k]
                 if (first[k] !~ /^[0-9.]+$/) { printf " %s=%s", k, first[k]; continue }
                 for (a = 2; a <= n; a++) for (b = a; b > 1 && vals[k, b] + 0 < vals[k, b - 1] + 0; b--) {
                     t = vals[k, b]; vals[k, b] = vals[k, b - 1]; vals[k, b - 1] = t }
                 printf " %s=%s", k, vals[k, int((n + 1) / 2)] }
               print "" }'
}

# One run of ours: the phases, the whole certify process, the check of its output.
ours_once() { # GRAPH -> key=value line
    p=$("$work/certify_phases" "$1" "$work/phases.cert")
    start=$(date +%s.%N)
    /usr/bin/time -f %M -o "$work/rss" "$build/planewit" certify "$1" -o "$work/c.cert" >/dev/null 2>&1 ||
        { echo "planewit certify failed on $1" >&2; exit 1; }
    whole=$(elapsed "$start")
    start=$(date +%s.%N)
    /usr/bin/time -f %M -o "$work/crss" "$build/planewit" check "$1" "$work/c.cert" >/dev/null 2>&1 ||
        { echo "planewit check refused certify's output on $1" >&2; exit 1; }
    check=$(elapsed "$start")
    same=$(cmp -s "$work/phases.cert" "$work/c.cert" && echo yes || echo NO)
    echo "$p whole=$whole rss=$(tail -n 1 "$work/rss") check=$check checkrss=$(tail -n 1 "$work/crss") same=$same"
}

# A peer: once, and REPEAT times in all when that took under 10 s; medians.
peer_runs() { # COMMAND... -> key=value line with runs=R
    "$@" >"$work/peer"
    if awk -v s="$(field "$(cat "$work/peer")" seconds)" 'BEGIN { exit !(s < 10) }'; then
        i=1; while [ "$i" -lt "$repeat" ]; do "$@" >>"$work/peer"; i=$((i + 1)); done
    fi
    echo "runs=$(wc -l <"$work/peer")$(medians <"$work/peer")"
}

# networkx's time at M edges estimated from its last two sizes (power law, exponent 1 to 2).
nx_estimate() { # FAMILY M -> seconds, or 0 when no earlier size ran
    awk -v m="$2" -v f="$1" '$1 == f { m0 = m1; t0 = t1; m1 = $2; t1 = $3 }
        END { if (t1 == "") { print 0; exit }
              e = 1; if (t0 > 0 && m1 > m0) e = log(t1 / t0) / log(m1 / m0)
              if (e < 1) e = 1; if (e > 2) e = 2
              printf "%.1f\n", t1 * exp(e * log(m / m1)) }' "$work/nx_times"
}
: >"$work/nx_times"
: >"$work/data"

for size in $sizes; do
    for family in $families; do
        nm=$("$work/certify_gen" "$family" "$size" "$seed" "$work/g.graph")
        m=$(field "$nm" m)
        echo "== $family, $m edges" >&2
        runs=$repeat; [ "$size" -le 1000000 ] || runs=$large_repeat
        i=0; while [ "$i" -lt "$runs" ]; do ours_once "$work/g.graph"; i=$((i + 1)); done >"$work/runs"
        line="family=$family size=$size runs=$runs$(medians <"$work/runs")"
        grep -q 'same=NO' "$work/runs" && line="$line differs=yes"
        if [ "$size" -le "$boost_max" ]; then
            b=$(peer_runs "$work/boost" "$work/g.graph")
            line="$line boost=$(field "$b" seconds) boost_runs=$(field "$b" runs) boost_planar=$(field "$b" planar)"
            line="$line boost_kedges=$(field "$b" kuratowski_edges) boost_peak=$(field "$b" peak_kib)"
            line="$line boost_before=$(field "$b" rss_before_kib)"
        fi
        est=$(nx_estimate "$family" "$m")
        if [ "$size" -le "$nx_max" ] && awk -v e="$est" -v l="$peer_limit" 'BEGIN { exit !(e <= l) }'; then
            if x=$(timeout "$peer_limit" /usr/bin/python3 bench/certify_networkx.py "$work/g.graph"); then
                echo "$family $m $(field "$x" seconds)" >>"$work/nx_times"
                line="$line nx=$(field "$x" seconds) nx_planar=$(field "$x" planar)"
                line="$line nx_kedges=$(field "$x" kuratowski_edges) nx_peak=$(field "$x" peak_kib)"
            else
                echo "$family $m $peer_limit" >>"$work/nx_times"
                line="$line nx_stopped=$peer_limit"
            fi
        elif [ "$size" -le "$nx_max" ]; then
            line="$line nx_skipped=$est"
        fi
        echo "$line" >>"$work/data"
        echo "$line" >&2
    done
done

# Witness size on K_n and K_{3,n}: the bare subdivision is the graph itself (common practice).
complete() { awk -v n="$1" 'BEGIN { print "graph", n, n * (n - 1) / 2
    for (u = 0; u < n; u++) for (v = u + 1; v < n; v++) print u, v }'; }
bipartite() { awk -v n="$1" 'BEGIN { print "graph", n + 3, 3 * n
    for (a = 0; a < 3; a++) for (b = 3; b < n + 3; b++) print a, b }'; }
for n in 5 6 8 12; do
    complete "$n" >"$work/k.graph"
    echo "small=K$n $("$work/certify_phases" "$work/k.graph" "$work/k.cert")" >>"$work/data"
    bipartite "$n" >"$work/k.graph"
    echo "small=K3,$n $("$work/certify_phases" "$work/k.graph" "$work/k.cert")" >>"$work/data"
done

awk -v repeat="$repeat" -v large_repeat="$large_repeat" -v load_before="$load_before" -v load_after="$(cut -d' ' -f1-3 /proc/loadavg)" \
    -v machine="$(nproc) CPUs, $(uname -m), $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //')" \
    -v date="$(date -u +%Y-%m-%d)" -v minutes="$(( ($(date +%s) - started + 59) / 60 ))" \
    -v binary="$build/planewit ($(sha256sum "$build/planewit" | cut -c1-16)...)" \
    -v boost_max="$boost_max" -v nx_max="$nx_max" -v peer_limit="$peer_limit" -v seed="$seed" \
    -f bench/certify_report.awk "$work/data" >"$out"
cat "$out"
