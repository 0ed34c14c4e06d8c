#!/bin/sh
# End-to-end tests of `planewit import`: graph6 (including the N > 62 size
# forms), DIMACS and edge lists, the names file, dropped self-loops and
# repeats, and a clear error with exit 2 and no output file for every kind of
# malformed input.
# Usage: tests/check_import.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. "$(dirname "$0")/expect.sh"

# same_edges NAME GRAPH EXPECTED: the graph file's edge set (unordered pairs) equals EXPECTED's
# lines "U V" (any order); the header's N must be the given N.
same_edges() {
    name=$1 graph=$2 n=$3 want=$4
    header=$(grep -v '^#' "$graph" | head -n 1)
    got=$(grep -v '^#' "$graph" | tail -n +2 | awk '{ if ($1 > $2) print $2, $1; else print $1, $2 }' | sort)
    exp=$(awk 'NF == 2 { if ($1 > $2) print $2, $1; else print $1, $2 }' "$want" | sort)
    m=$(printf '%s\n' "$exp" | grep -c .)
    if [ "$header" != "graph $n $m" ]; then
        bad "$name: header '$header', expected 'graph $n $m'"
    elif [ "$got" != "$exp" ]; then
        bad "$name: edges differ"; printf '%s\n' "$got" | head -5; echo ---; printf '%s\n' "$exp" | head -5
    else
        ok
    fi
}

# refused NAME FORMAT INPUT TEXT: exit 2, the message, and no output file left behind.
refused() {
    name=$1 from=$2 input=$3 text=$4
    rm -f "$tmp/r.graph" "$tmp/r.graph.names"
    expect "$name" 2 "$text" "$bin" import --from "$from" "$input" -o "$tmp/r.graph"
    if [ -e "$tmp/r.graph" ] || [ -e "$tmp/r.graph.names" ] || ls "$tmp"/r.graph.tmp-* >/dev/null 2>&1; then
        bad "$name: an output file was left behind"
    fi
}

# ---- graph6 ------------------------------------------------------------------
# Encodings worked out by hand from the graph6 definition (nauty's formats.txt;
# common practice): 'C' is N = 4, '~' = 63 + 63 sets all six pairs of K4.
printf 'C~\n' >"$tmp/k4.g6"
expect g6-k4 0 "4 vertices, 6 edges" "$bin" import --from graph6 "$tmp/k4.g6" -o "$tmp/k4.graph"
printf '0 1\n0 2\n1 2\n0 3\n1 3\n2 3\n' >"$tmp/k4.edges"
same_edges g6-k4-edges "$tmp/k4.graph" 4 "$tmp/k4.edges"
# 'B' is N = 3 and 'W' = 63 + 0b011000 sets pairs 0-2 and 1-2 (order 0-1, 0-2, 1-2).
printf '>>graph6<<BW' >"$tmp/p3.g6"
expect g6-header-no-newline 0 "3 vertices, 2 edges" "$bin" import --from graph6 "$tmp/p3.g6" -o "$tmp/p3.graph"
printf '0 2\n1 2\n' >"$tmp/p3.edges"
same_edges g6-p3-edges "$tmp/p3.graph" 3 "$tmp/p3.edges"
printf '?\n' >"$tmp/empty.g6"
expect g6-null-graph 0 "0 vertices, 0 edges" "$bin" import --from graph6 "$tmp/empty.g6" -o "$tmp/null.graph"
expect g6-stdin-stdout 0 "graph 4 6" sh -c "\"$bin\" import --from graph6 - -o - <\"$tmp/k4.g6\""

# N > 62: graphs written by nauty's own random generator (nauty-genrang), decoded
# independently by nauty-listg -e; our import must give the same edge sets.
for spec in "63 1" "100 2" "300 3"; do
    set -- $spec
    nauty-genrang -g -P30/100 "$1" 1 -S"$2" 2>/dev/null >"$tmp/big.g6"
    expect "g6-n$1-import" 0 "$1 vertices" "$bin" import --from graph6 "$tmp/big.g6" -o "$tmp/big.graph"
    nauty-listg -e "$tmp/big.g6" 2>/dev/null | tail -n +4 | tr -s ' ' '\n' | grep . | paste -d' ' - - >"$tmp/big.edges"
    same_edges "g6-n$1-edges" "$tmp/big.graph" "$1" "$tmp/big.edges"
done
# The 8-byte size form ('~~' and six 6-bit groups): '~~??@???' is N = 1 << 18 = 262144,
# whose adjacency would take 5726601216 bytes.  The record has none: it must be
# refused for its length (without allocating for N), or earlier by the vertex limit.
printf '~~??@???' >"$tmp/huge.g6"
refused g6-long-size graph6 "$tmp/huge.g6" "N = 262144 needs 5726601216 adjacency bytes, the record has 0"
expect g6-long-size-limit 2 "N = 262144 exceeds the limit 1000 (raise it with --max-vertices)" \
    "$bin" import --from graph6 "$tmp/huge.g6" -o "$tmp/l.graph" --max-vertices 1000
: >"$tmp/zero.g6"
refused g6-empty graph6 "$tmp/zero.g6" "expected a graph6 record, found an empty line"
printf 'C!\n' >"$tmp/bad.g6"
refused g6-bad-byte graph6 "$tmp/bad.g6" "byte offset 1 (line 1, column 2): expected a graph6 byte from 63 ('?') to 126 ('~'), found 0x21"
printf 'C~~\n' >"$tmp/long.g6"
refused g6-too-long graph6 "$tmp/long.g6" "N = 4 needs 1 adjacency bytes, the record has 2"
printf 'D~\n' >"$tmp/short.g6"
refused g6-too-short graph6 "$tmp/short.g6" "N = 5 needs 2 adjacency bytes, the record has 1"
printf 'B~\n' >"$tmp/pad.g6"
refused g6-padding graph6 "$tmp/pad.g6" "padding bits of the last byte must be zero"
printf ':Bc\n' >"$tmp/s6.g6"
refused g6-sparse6 graph6 "$tmp/s6.g6" "sparse6"
printf 'C~\nC~\n' >"$tmp/two.g6"
refused g6-two-records graph6 "$tmp/two.g6" "line 2: expected the end of the file after one graph6 record"
printf '~?A' >"$tmp/cut.g6"
refused g6-cut-size graph6 "$tmp/cut.g6" "the size field needs 4 bytes, the record ends after 3"
expect g6-vertex-limit 2 "N = 4 exceeds the limit 3 (raise it with --max-vertices)" \
    "$bin" import --from graph6 "$tmp/k4.g6" -o "$tmp/l.graph" --max-vertices 3

# ---- DIMACS ------------------------------------------------------------------
# "p edge N M" and 1-based "e U V" lines (DIMACS challenge format; common practice).
printf 'c a triangle and a pendant vertex\np edge 4 4\ne 1 2\ne 2 3\ne 3 1\ne 3 4\n' >"$tmp/a.dimacs"
expect dimacs-ok 0 "4 vertices, 4 edges" "$bin" import --from dimacs "$tmp/a.dimacs" -o "$tmp/a.graph"
printf '0 1\n1 2\n2 0\n2 3\n' >"$tmp/a.edges"
same_edges dimacs-edges "$tmp/a.graph" 4 "$tmp/a.edges"
printf 'p edge 3 5\r\ne 1 2\r\ne 2 1\r\ne 2 2\r\ne 2 3\r\ne 1 2\r\n' >"$tmp/rep.dimacs"
expect dimacs-drops 0 "dropped 1 self-loop and 2 repeated edges (they do not change planarity)" \
    "$bin" import --from dimacs "$tmp/rep.dimacs" -o "$tmp/rep.graph"
expect dimacs-drops-recorded 0 "# dropped 1 self-loop and 2 repeated edges" cat "$tmp/rep.graph"
printf '0 1\n1 2\n' >"$tmp/rep.edges"
same_edges dimacs-drops-edges "$tmp/rep.graph" 3 "$tmp/rep.edges"

printf 'c nothing else\n' >"$tmp/d1"
refused dimacs-no-problem dimacs "$tmp/d1" "line 2: expected 'p edge N M', found the end of the file"
printf 'e 1 2\np edge 2 1\n' >"$tmp/d2"
refused dimacs-edge-first dimacs "$tmp/d2" "line 1: expected 'c' or 'p edge N M', found 'e'"
printf 'p edge 3 1\ne 1 4\n' >"$tmp/d3"
refused dimacs-range dimacs "$tmp/d3" "line 2: vertex 4 is out of range: vertices are numbered 1 to N = 3"
printf 'p edge 3 1\ne 0 1\n' >"$tmp/d4"
refused dimacs-zero dimacs "$tmp/d4" "line 2: vertex 0 is out of range"
printf 'p edge 3 2\ne 1 2\n' >"$tmp/d5"
refused dimacs-too-few dimacs "$tmp/d5" "the file ends after 1 'e' lines, the 'p' line's M is 2"
printf 'p edge 3 1\ne 1 2\ne 2 3\n' >"$tmp/d6"
refused dimacs-too-many dimacs "$tmp/d6" "line 3: more 'e' lines than the M = 1 of the 'p' line"
printf 'p edge 3 1\ne 1 02\n' >"$tmp/d7"
refused dimacs-leading-zero dimacs "$tmp/d7" "line 2: expected a vertex number, found '02'"
printf 'p edge 3 1\ne 1 2 3\n' >"$tmp/d8"
refused dimacs-extra dimacs "$tmp/d8" "line 2: expected the end of the line, found '3'"
printf 'p graph 3 1\n' >"$tmp/d9"
refused dimacs-kind dimacs "$tmp/d9" "line 1: expected 'edge' after 'p', found 'graph'"
printf 'p edge 3 0\np edge 3 0\n' >"$tmp/d10"
refused dimacs-two-p dimacs "$tmp/d10" "line 2: expected 'c' or 'e', found 'p'"
printf 'c caf\303\251\np edge 1 0\n' >"$tmp/d11"
refused dimacs-byte dimacs "$tmp/d11" "line 1: byte 0xc3 at column 6: expected printable ASCII text"
printf 'p edge 3 1\ne 1 x\n' >"$tmp/d12"
refused dimacs-word dimacs "$tmp/d12" "line 2: expected a vertex number, found 'x'"
printf 'p edge 99999999999 0\n' >"$tmp/d13"
refused dimacs-huge-n dimacs "$tmp/d13" "is larger than 4294967295"

# ---- edge lists and the names file -------------------------------------------
printf '# an invented relay board\nK1 K2\nK2,K3\nK3 , K1   # a comment\nK1 K1\nK2 K1\nLED7\n' >"$tmp/board.txt"
expect edges-ok 0 "4 vertices, 3 edges" "$bin" import --from edges "$tmp/board.txt" -o "$tmp/board.graph"
expect edges-warning 0 "dropped 1 self-loop and 1 repeated edge" \
    "$bin" import --from edges "$tmp/board.txt" -o "$tmp/board.graph"
printf '0 1\n1 2\n2 0\n' >"$tmp/board.edges"
same_edges edges-ids "$tmp/board.graph" 4 "$tmp/board.edges"
# The names file: ids in order of first appearance, bound to the graph's SHA-256
# (format-spec/names.md; the digest is what sha256sum prints, FIPS 180-4, common practice).
sum=$(sha256sum "$tmp/board.graph" | cut -d' ' -f1)
printf 'vertex-names 1\ngraph-sha256 %s\ncount 4\n0 K1\n1 K2\n2 K3\n3 LED7\n' "$sum" >"$tmp/board.want"
if cmp -s "$tmp/board.graph.names" "$tmp/board.want"; then ok; else
    bad "edges-names-file"; diff "$tmp/board.graph.names" "$tmp/board.want"; fi
expect edges-names-out 0 "vertex names written to $tmp/n.txt" \
    "$bin" import --from edges "$tmp/board.txt" -o - --names-out "$tmp/n.txt"
expect edges-stdout-needs-names 2 "with -o - an edge list needs --names-out NAMES" \
    "$bin" import --from edges "$tmp/board.txt" -o -

printf 'A B C\n' >"$tmp/e1"
refused edges-three edges "$tmp/e1" "line 1: expected the end of the line, found 'C'"
printf 'A,,B\n' >"$tmp/e2"
refused edges-two-commas edges "$tmp/e2" "line 1: expected a vertex name, found ','"
printf 'A,\n' >"$tmp/e3"
refused edges-trailing-comma edges "$tmp/e3" "line 1: expected a vertex name, found the end of the line"
printf 'A B\n\316\261 B\n' >"$tmp/e4"
refused edges-utf8 edges "$tmp/e4" "line 2: byte 0xce at column 1: expected printable ASCII text"
awk 'BEGIN { s = ""; for (i = 0; i < 201; i++) s = s "x"; print "A", s }' >"$tmp/e5"
refused edges-long-name edges "$tmp/e5" "line 1: expected a name of at most 200 bytes"
printf 'A B\nB C\nC D\n' >"$tmp/e6"
expect edges-vertex-limit 2 "line 2: more than 2 vertices (raise the limit with --max-vertices)" \
    "$bin" import --from edges "$tmp/e6" -o "$tmp/l.graph" --max-vertices 2
expect edges-edge-limit 2 "line 3: more than 2 edges (raise the limit with --max-edges)" \
    "$bin" import --from edges "$tmp/e6" -o "$tmp/l.graph" --max-edges 2

# ---- whole or nothing, usage -------------------------------------------------
printf 'old\n' >"$tmp/keep.graph"
"$bin" import --from graph6 "$tmp/bad.g6" -o "$tmp/keep.graph" 2>/dev/null
if [ "$(cat "$tmp/keep.graph")" = old ]; then ok; else bad "atomic: a refused import changed the output"; fi
expect usage-no-from 2 "needs --from FORMAT, an input FILE and -o GRAPH" "$bin" import "$tmp/k4.g6" -o x
expect usage-bad-from 2 "--from needs graph6, dimacs or edges" "$bin" import --from csv "$tmp/k4.g6" -o x
expect usage-names-out 2 "--names-out applies to --from edges only" \
    "$bin" import --from graph6 "$tmp/k4.g6" -o "$tmp/x.graph" --names-out "$tmp/x.names"
expect help 0 "usage: planewit import --from graph6|dimacs|edges" "$bin" import --help
expect missing-input 2 "nope.g6: cannot open" "$bin" import --from graph6 "$tmp/nope.g6" -o "$tmp/x.graph"

# ---- the names file on the certify side --------------------------------------
expect names-used 0 "accepted: planar" "$bin" certify "$tmp/board.graph" --names "$tmp/board.graph.names"
printf '# edited\n' >>"$tmp/board.graph"
expect names-stale 2 "graph-sha256 does not match the graph file" \
    "$bin" certify "$tmp/board.graph" --names "$tmp/board.graph.names"
printf 'vertex-names 1\ncount 4\n0 K1\n1 K2\n2 K1\n3 X\n' >"$tmp/dup.names"
expect names-duplicate 2 "line 5: name 'K1' already names vertex 0" \
    "$bin" certify "$tmp/board.graph" --names "$tmp/dup.names"
printf 'vertex-names 1\ncount 3\n' >"$tmp/short.names"
expect names-count 2 "line 2: count 3 differs from the graph's N = 4" \
    "$bin" certify "$tmp/board.graph" --names "$tmp/short.names"
printf 'vertex-names 1\ncount 4\n0 K1\n2 K2\n' >"$tmp/order.names"
expect names-order 2 "line 4: expected the name of vertex 1, found vertex 2" \
    "$bin" certify "$tmp/board.graph" --names "$tmp/order.names"

finish check_import
