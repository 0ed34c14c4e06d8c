#!/bin/sh
# The drawing benchmark: seeded planar families at about 10^6 edges (bench/draw_gen.py),
# our drawing stage (bench/draw_bench.c: parse, draw, certificate text, kernel check),
# the whole `planewit draw` process, and Boost's pipeline (bench/draw_boost.cpp),
# in one run, with time and grid-area ratios.  Results: bench/results-draw.md.
# usage: sh bench/draw_bench.sh BUILD_DIR [EDGES]
set -eu
build=${1:-build}
edges=${2:-1000000}
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
out=bench/results-draw.md
. bench/tools.sh
bench_build draw_bench "$work" "$build"
c++ -O2 -std=c++17 -o "$work/draw_boost" bench/draw_boost.cpp
{
    echo "# Drawing benchmark ($(date -u +%Y-%m-%d), $(uname -m), $edges edges, seed 7)"
    echo
    echo "Times in seconds, one run each in the same session.  ours: the drawing stage from a"
    echo "given rotation system (augment + Schnyder wood + coordinates); text: the certificate;"
    echo "kernel: the kernel's check of it; draw: the whole \`planewit draw -o\` process (parse,"
    echo "planarity test, drawing, kernel check, write).  Boost: embed + make_connected +"
    echo "make_biconnected_planar + make_maximal_planar (re-embedding after each) +"
    echo "planar_canonical_ordering + chrobak_payne_straight_line_drawing.  ours, text and"
    echo "kernel come from bench/draw_bench.c with the default allocator; draw is the real"
    echo "process, which keeps one heap on huge pages (cli/heap.c)."
    echo
    echo "Load average at the start (1, 5, 15 min): $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null || echo unknown)"
    echo
    echo "| family | N | M | ours | text | kernel | draw | Boost | draw/Boost | grid ours | grid Boost | area ratio |"
    echo "|---|---|---|---|---|---|---|---|---|---|---|---|"
} > "$out"
for family in trigrid stacked sparse forest; do
    python3 bench/draw_gen.py "$family" "$edges" 7 "$work/g.graph" "$work/g.rot"
    ours=$("$work/draw_bench" "$work/g.graph" "$work/g.rot")
    start=$(date +%s.%N)
    if "$build/planewit" draw "$work/g.graph" -o "$work/g.cert" > /dev/null 2>&1; then
        draw=$(awk "BEGIN { printf \"%.2f\", $(date +%s.%N) - $start }")
    else
        draw="failed"
    fi
    boost=$("$work/draw_boost" "$work/g.graph")
    gw=$(field "$ours" grid | cut -dx -f1); gh=$(field "$ours" grid | cut -dx -f2)
    bw=$(field "$boost" grid | cut -dx -f1); bh=$(field "$boost" grid | cut -dx -f2)
    bt=$(field "$boost" pipeline)
    ratio=$(case $draw in failed) echo "-";; *) awk "BEGIN { printf \"%.3f\", $draw / $bt }";; esac)
    area=$(awk "BEGIN { printf \"%.3f\", ($gw * $gh) / ($bw * $bh) }")
    echo "| $family | $(field "$ours" n) | $(field "$ours" m) | $(field "$ours" draw) |" \
         "$(field "$ours" text) | $(field "$ours" kernel) | $draw | $bt | $ratio |" \
         "${gw}x$gh | ${bw}x$bh | $area |" >> "$out"
done
{
    echo
    echo "Load average at the end (1, 5, 15 min): $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null || echo unknown)"
} >> "$out"
cat "$out"
