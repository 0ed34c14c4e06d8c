#!/bin/sh
# Determinism: the same inputs give byte-identical outputs.  Every command that
# writes something runs twice on the same inputs, each time in a fresh working
# folder; everything the two runs leave (standard output, standard error, exit
# status, written files) must match byte for byte.  The only field masked is
# "time_utc" (the UTC time of writing) in the three records that carry one:
# sign-off records (check --record), seal records (seal.json) and qualification
# reports (selftest -o).  Parallel runs (-j 1 against -j 2) must match as well.
# Usage: tests/check_determinism.sh BUILD_DIR
set -u
bin=$(cd "${1:-build}" && pwd)/planewit
. "$(dirname "$0")/expect.sh"
root=$(pwd)
demo=$root/examples/demo
vec=$root/vectors

# The one line of a record holding its time, as the records print it.
time_line='^  "time_utc": "[0-9]\{4\}-[0-9][0-9]-[0-9][0-9]T[0-9][0-9]:[0-9][0-9]:[0-9][0-9]Z",$'

# mask_time NAME FILE: replace the time_utc value; the file must hold exactly one.
mask_time() {
    if [ "$(grep -c "$time_line" "$2")" -ne 1 ]; then
        bad "$1: $2 does not hold exactly one time_utc line"
        return
    fi
    sed "s/$time_line/  \"time_utc\": \"(masked)\",/" "$2" >"$2.masked" && mv "$2.masked" "$2"
}

# same NAME A B: two files or two folders, byte for byte (file names included).
same() {
    if [ -d "$2" ]; then
        (cd "$2" && find . -type f | sort) >"$tmp/list.a"
        (cd "$3" && find . -type f | sort) >"$tmp/list.b"
        if ! cmp -s "$tmp/list.a" "$tmp/list.b"; then
            bad "$1: the runs left different files"
            diff "$tmp/list.a" "$tmp/list.b" | head -n 6
            return
        fi
        while read -r f; do same "$1: $f" "$2/$f" "$3/$f"; done <"$tmp/list.a"
        return
    fi
    if cmp -s "$2" "$3"; then ok; else
        bad "$1: the outputs differ"
        diff "$2" "$3" | head -n 6
    fi
}

# twice NAME STATUS "FILES" COMMAND...: COMMAND runs in $tmp/NAME.1 and then in
# $tmp/NAME.2 (standard output, standard error and exit status kept there as
# files); it must exit with STATUS and write each of FILES, not empty, each
# time; the files named in $masked get their time_utc masked, those named in
# $unkept are left out; then both folders must be identical.
twice() {
    name=$1 want=$2 files=$3
    shift 3
    for run in 1 2; do
        dir=$tmp/$name.$run
        mkdir "$dir" || { bad "$name: the name is used twice"; return; }
        (cd "$dir" && "$@" >stdout 2>stderr)
        status=$?
        echo "$status" >"$dir/status"
        status_is "$name run $run" "$status" "$want"
        for f in $files; do
            if [ -s "$dir/$f" ]; then ok; else bad "$name run $run: $f missing or empty"; fi
        done
        for f in $masked; do mask_time "$name run $run" "$dir/$f"; done
        for f in $unkept; do rm -f "$dir/$f"; done
    done
    same "$name" "$tmp/$name.1" "$tmp/$name.2"
}
masked=""
unkept=""

# ---- inputs ---------------------------------------------------------------------

# A triangulated 40 x 40 grid (planar: 1600 vertices, 4641 edges) and a seeded
# pseudo-random graph with 1500 vertices and 4000 edges (far above what a sparse
# random graph can keep planar; its witness is whatever certify finds).
awk 'BEGIN { n = 40; m = 0
    for (i = 0; i < n; i++) for (j = 0; j < n; j++) { v = i * n + j
        if (j + 1 < n) e[m++] = v " " v + 1
        if (i + 1 < n) e[m++] = v " " v + n
        if (i + 1 < n && j + 1 < n) e[m++] = v " " v + n + 1 }
    print "graph", n * n, m; for (k = 0; k < m; k++) print e[k] }' >"$tmp/grid.graph"
awk 'BEGIN { n = 1500; want = 4000; s = 12345
    while (m < want) { s = (s * 1103515245 + 12345) % 2147483648; u = s % n
        s = (s * 1103515245 + 12345) % 2147483648; w = s % n
        if (u == w) continue; k = u < w ? u " " w : w " " u
        if (k in seen) continue; seen[k] = 1; e[m++] = u " " w }
    print "graph", n, m; for (i = 0; i < m; i++) print e[i] }' >"$tmp/random.graph"
graphs="$demo/coolant-chip.graph $demo/sensor-board.graph $tmp/grid.graph $tmp/random.graph
$vec/graphs/k5.graph $vec/graphs/k33.graph $vec/graphs/petersen.graph $vec/graphs/empty.graph"

# ---- check --json and --record ---------------------------------------------------

twice check-json 0 stdout "$bin" check "$demo/coolant-chip.graph" "$demo/coolant-chip.cert" --json
twice check-json-rejected 1 stdout "$bin" check "$demo/sensor-board.graph" "$demo/sensor-board.solver.cert" --json
twice check-json-unusable 2 stdout "$bin" check "$vec/graphs/bad-nul.graph" "$vec/certs/square-diagonal.cert" --json
masked=r.json
twice check-record 0 r.json "$bin" check "$demo/sensor-board.graph" "$demo/sensor-board.cert" --record r.json --note "rev C"
twice check-record-rejected 1 r.json "$bin" check "$vec/graphs/square-diagonal.graph" "$vec/certs/sq-euler.cert" --record r.json
masked=""

# ---- certify -o and --json, and the graph6 stream at -j 1 and -j 2 ---------------

k=0
for g in $graphs; do
    k=$((k + 1))
    twice "certify-o-$k" 0 c.cert "$bin" certify "$g" -o c.cert
    twice "certify-json-$k" 0 stdout "$bin" certify "$g" --json
done
twice certify-cheapest 0 c.cert "$bin" certify "$vec/graphs/k6.graph" --witness cheapest -o c.cert

# Every graph on 8 vertices (12,346 records: several blocks of 4,096), or a short
# stream of K4, a path and K5 when nauty-geng is missing.
if command -v nauty-geng >/dev/null 2>&1; then
    nauty-geng -q 8 >"$tmp/g8.g6"
else
    echo "check_determinism: nauty-geng missing (Debian package nauty); using a short stream"
    printf 'C~\nBw\nD~{\n' >"$tmp/g8.g6"
fi
for j in 1 2; do
    twice "graph6-j$j" 0 stdout "$bin" certify --graph6 "$tmp/g8.g6" -j "$j"
    twice "graph6-summary-j$j" 0 stdout "$bin" certify --graph6 "$tmp/g8.g6" --summary -j "$j"
done
same graph6-j1-vs-j2 "$tmp/graph6-j1.1/stdout" "$tmp/graph6-j2.1/stdout"
same graph6-summary-j1-vs-j2 "$tmp/graph6-summary-j1.1/stdout" "$tmp/graph6-summary-j2.1/stdout"

# ---- draw -o and --svg --------------------------------------------------------------

k=0
for g in $graphs; do
    k=$((k + 1))
    want=0
    case $g in *sensor-board* | *random* | *k5* | *k33* | *petersen*) want=1 ;; esac
    twice "draw-$k" "$want" "d.cert d.svg" "$bin" draw "$g" -o d.cert --svg d.svg
done
twice draw-tutte 0 "d.cert d.svg" "$bin" draw "$tmp/grid.graph" --layout tutte -o d.cert --svg d.svg

# ---- import: graph6, DIMACS, edge lists and their names files -----------------------

# One graph6 record spelled by hand: N = 'G' - 63 = 8, then five bytes of edge bits.
printf 'G?r@`_\n' >"$tmp/one.g6"
printf 'c a 4-cycle with a chord\np edge 4 6\ne 1 2\ne 2 3\ne 3 4\ne 4 1\ne 1 3\ne 1 3\n' >"$tmp/small.dimacs"
awk 'NR > 1 { print "e", $1 + 1, $2 + 1 }' "$tmp/random.graph" >"$tmp/body"
{ echo "p edge 1500 $(wc -l <"$tmp/body")"; cat "$tmp/body"; } >"$tmp/random.dimacs"
printf '# invented netlist\nVCC, R1\nR1 LED1\nLED1 GND\nGND VCC\nR1 GND\nR1 R1\nU7\n' >"$tmp/net.txt"
awk 'NR > 1 { print "n" ($1 * 7919) % 1601, "n" ($2 * 7919) % 1601 }' "$tmp/grid.graph" >"$tmp/grid-net.txt"
twice import-graph6 0 g.graph "$bin" import --from graph6 "$tmp/one.g6" -o g.graph
twice import-dimacs 0 g.graph "$bin" import --from dimacs "$tmp/small.dimacs" -o g.graph
twice import-dimacs-large 0 g.graph "$bin" import --from dimacs "$tmp/random.dimacs" -o g.graph
twice import-edges 0 "g.graph g.graph.names" "$bin" import --from edges "$tmp/net.txt" -o g.graph
twice import-edges-large 0 "g.graph n.names" "$bin" import --from edges "$tmp/grid-net.txt" -o g.graph --names-out n.names

# ---- batch -o (-j 1 against -j 2), and merge ---------------------------------------

mkdir -p "$tmp/jobs"
cp "$demo"/* "$tmp/grid.graph" "$tmp/random.graph" "$tmp/jobs/"
"$bin" certify "$tmp/grid.graph" -o "$tmp/jobs/grid.cert" >/dev/null 2>&1
"$bin" certify "$tmp/random.graph" -o "$tmp/jobs/random.cert" >/dev/null 2>&1
{
    echo "coolant-chip.graph coolant-chip.cert planar"
    echo "sensor-board.graph sensor-board.cert nonplanar"
    echo "sensor-board.graph sensor-board.solver.cert planar"
    echo "grid.graph grid.cert"
    echo "random.graph random.cert nonplanar"
    echo "grid.graph coolant-chip.cert"
    for g in "$vec"/graphs/*.graph; do
        echo "$g $vec/certs/square-diagonal.cert"
    done
} >"$tmp/jobs/jobs.list"
# The summary on standard error gives elapsed times and the slowest jobs, so
# batch's standard error is left out; its -o file and exit status are compared.
unkept=stderr
for j in 1 2; do
    twice "batch-j$j" 1 v.jsonl "$bin" batch "$tmp/jobs/jobs.list" -j "$j" --quiet -o v.jsonl
done
unkept=""
same batch-j1-vs-j2 "$tmp/batch-j1.1/v.jsonl" "$tmp/batch-j2.1/v.jsonl"
"$bin" batch "$tmp/jobs/jobs.list" -j 2 --quiet --shard 0/2 -o "$tmp/s0.jsonl" 2>/dev/null
"$bin" batch "$tmp/jobs/jobs.list" -j 2 --quiet --shard 1/2 -o "$tmp/s1.jsonl" 2>/dev/null
twice merge 0 m.jsonl "$bin" merge "$tmp/s1.jsonl" "$tmp/s0.jsonl" -o m.jsonl
same merge-vs-batch "$tmp/merge.1/m.jsonl" "$tmp/batch-j1.1/v.jsonl"

# ---- seal (SHA256SUMS, seal.json minus its time) and audit --------------------------

# Each run seals its own copy of the same folder; the copy is made inside the run.
seal_copy() { mkdir sealed && cp "$demo"/* sealed/ && "$bin" seal sealed; }
masked=sealed/seal.json
twice seal 1 "sealed/SHA256SUMS sealed/seal.json" seal_copy
masked=""
mkdir -p "$tmp/archive"
cp "$demo"/* "$tmp/archive/"
"$bin" seal "$tmp/archive" >/dev/null 2>&1
twice audit 1 stdout "$bin" audit "$tmp/archive"

# ---- selftest report minus its time ------------------------------------------------

masked=q.json
twice selftest 0 q.json "$bin" selftest --vectors "$vec" -o q.json
masked=""

finish check_determinism
