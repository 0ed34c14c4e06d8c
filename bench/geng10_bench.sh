#!/bin/sh
# Scale of `certify --graph6`: every graph on 10 vertices from nauty's geng
# (Debian package nauty, 12,005,168 graphs: OEIS A000088) streamed through
# `planewit certify --graph6 - --summary -j 2`.  Target (issue 6): planar
# count 1,140,916 (OEIS A005470) and a wall time at most 8 x that of
# `nauty-geng 10 > /dev/null` measured in the same session.  Runs alternate
# (geng, pipeline, geng, pipeline, ...) so that both see the same load; the
# ratio is taken between the medians.
# Usage: bench/geng10_bench.sh PATH/TO/planewit RESULTS.md [ROUNDS] [N]
# (N = 8 or 9 makes a quick trial run of the script; the target is stated for 10.)
set -eu
bin=$(cd "$(dirname "$1")" && pwd)/$(basename "$1")
results=$2
rounds=${3:-3}
order=${4:-10}
threads=2
geng=$(command -v nauty-geng || true)
[ -n "$geng" ] || { echo "geng10_bench: nauty-geng not found (Debian package nauty)" >&2; exit 1; }
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
load_before=$(cut -d' ' -f1-3 /proc/loadavg)

now() { date +%s.%N; }
since() { awk -v s="$1" -v e="$(now)" 'BEGIN { printf "%.2f\n", e - s }'; }
median() { tr ' ' '\n' | sed '/^$/d' | sort -g | awk '{ v[NR] = $1 } END { print (NR % 2 ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2) }'; }

geng_times="" pipe_times="" cpu_times="" geng_cpu_times=""
r=0
while [ "$r" -lt "$rounds" ]; do
    r=$((r + 1))
    echo "round $r of $rounds: nauty-geng $order > /dev/null ..." >&2
    start=$(now)
    /usr/bin/time -f '%U %S' -o "$work/geng_cpu" "$geng" -q "$order" >/dev/null
    geng_times="$geng_times $(since "$start")"
    geng_cpu_times="$geng_cpu_times $(awk '{ print $1 + $2 }' "$work/geng_cpu")"
    echo "round $r of $rounds: nauty-geng $order | planewit certify --graph6 - --summary -j $threads ..." >&2
    start=$(now)
    "$geng" -q "$order" | /usr/bin/time -f '%U %S' -o "$work/cpu" \
        "$bin" certify --graph6 - --summary -j "$threads" >"$work/summary"
    pipe_times="$pipe_times $(since "$start")"
    cpu_times="$cpu_times $(awk '{ print $1 + $2 }' "$work/cpu")"
done
load_after=$(cut -d' ' -f1-3 /proc/loadavg)

tg=$(echo "$geng_times" | median)
tp=$(echo "$pipe_times" | median)
tc=$(echo "$cpu_times" | median)
tgc=$(echo "$geng_cpu_times" | median)
# On an idle machine with $(nproc) CPUs the pipeline needs at least its CPU time spread over
# the CPUs (geng and the workers all busy), and at least geng's own time.
idle=$(awk -v c="$tc" -v g="$tgc" -v k="$(nproc)" 'BEGIN { t = (c + g) / k; if (t < g) t = g; printf "%.2f", t / g }')
ratio=$(awk -v p="$tp" -v g="$tg" 'BEGIN { printf "%.2f", p / g }')
last=$(tail -n 1 "$work/summary")
graphs=$(echo "$last" | sed -n 's/^graphs=\([0-9]*\) .*/\1/p')
planar=$(echo "$last" | sed -n 's/.* planar=\([0-9]*\) .*/\1/p')
# OEIS A005470 (planar graphs on n unlabelled nodes) and A000088 (all graphs).
case $order in
    10) want_planar=1140916 want_graphs=12005168 ;;
    9) want_planar=79853 want_graphs=274668 ;;
    8) want_planar=6966 want_graphs=12346 ;;
    *) echo "geng10_bench: no expected counts for n = $order (8, 9 or 10)" >&2; exit 1 ;;
esac
verdict_count=$([ "$planar" = "$want_planar" ] && [ "$graphs" = "$want_graphs" ] && echo "equal" || echo "NOT equal")
verdict_time=$(awk -v r="$ratio" 'BEGIN { print (r <= 8 ? "met" : "NOT met") }')

cat >"$results" <<REPORT
# certify --graph6 on every graph with $order vertices (bench/geng10_bench.sh)

Machine: $(nproc) online CPUs, $(uname -m), $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //').
Load average (1, 5, 15 min) before the runs: $load_before; after: $load_after.
A load above the CPU count means other work shared the CPUs: both times below are inflated,
the pipeline (three busy threads on $(nproc) CPUs) more than geng alone (one).
Binary: \`$1\` ($(sha256sum "$bin" | cut -c1-16)...), $(date -u +%Y-%m-%d).

| run ($rounds rounds, alternating) | wall times (s) | median (s) |
|---|---|---|
| \`nauty-geng $order > /dev/null\` |$geng_times | $tg |
| \`nauty-geng $order \| planewit certify --graph6 - --summary -j $threads\` |$pipe_times | $tp |
| CPU time (user + system) of geng alone |$geng_cpu_times | $tgc |
| CPU time (user + system) of the planewit process in the pipeline |$cpu_times | $tc |

Counts of the last run (its whole summary):

\`\`\`
$(cat "$work/summary")
\`\`\`

- graphs = $graphs, planar = $planar; expected $want_graphs graphs (OEIS A000088) and
  $want_planar planar (OEIS A005470): **$verdict_count**.
- Ratio of the medians, pipeline / geng alone: **$ratio** (target at most 8: **$verdict_time**).
- CPU-bound estimate for an idle machine with these $(nproc) CPUs: (planewit CPU + geng CPU) / $(nproc)
  against geng's CPU = **$idle** (what the wall-time ratio would be without other load).
- planewit's CPU per graph: $(awk -v c="$tc" -v n="$graphs" 'BEGIN { printf "%.2f", (n > 0) ? c / n * 1e6 : 0 }') µs (every graph
  certified and its certificate checked by the kernel, SHA-256 of both included).
REPORT
cat "$results"
