#!/bin/sh
# End-to-end tests of `planewit draw`: exit codes, certificates the kernel accepts,
# the grid bound, SVG pictures valid as XML (xmllint, Debian libxml2-utils) and
# rendered without error (rsvg-convert, Debian librsvg2-bin), labels from a names
# file, the barycentric option and its fallback, whole-or-nothing outputs.
# usage: sh tests/check_draw.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
failures=0
fail() { echo "FAIL: $*"; failures=$((failures + 1)); }
for tool in xmllint rsvg-convert; do
    command -v $tool > /dev/null || { echo "FAIL: $tool missing (sh scripts/run.sh test installs it)"; exit 1; }
done

graph() { # NAME N "U V" ...: writes $work/NAME.graph
    name=$1 n=$2
    shift 2
    { echo "graph $n $#"; for e in "$@"; do echo "$e"; done; } > "$work/$name.graph"
}
picture_ok() { # SVG: valid XML and renders to a non-empty PNG
    xmllint --noout "$1" 2> "$work/xmllint.err" || { fail "$1 is not valid XML: $(cat "$work/xmllint.err")"; return; }
    rsvg-convert "$1" -o "$work/out.png" 2> "$work/rsvg.err" && [ -s "$work/out.png" ] ||
        fail "$1 does not render: $(cat "$work/rsvg.err")"
}
expect_exit() { # CODE COMMAND...
    want=$1
    shift
    "$@" > "$work/stdout" 2> "$work/stderr"
    got=$?
    [ "$got" -eq "$want" ] || fail "'$*' exited $got, expected $want: $(cat "$work/stderr")"
}
# The grid line reports W x H and the bound; W, H <= N - 2 for N >= 3 (Schnyder 1990).
grid_within_bound() {
    set -- $(sed -n 's/.*grid \([0-9]*\) x \([0-9]*\) (Schnyder bound \([0-9]*\) x.*/\1 \2 \3/p' "$work/stdout")
    [ $# -eq 3 ] && [ "$1" -le "$3" ] && [ "$2" -le "$3" ] || fail "grid not within the bound: $(cat "$work/stdout")"
}

# ---- planar graphs: drawn, certificate accepted, every vertex has a point ----
graph k4 4 "0 1" "0 2" "0 3" "1 2" "1 3" "2 3"
graph mixed 9 "0 1" "1 2" "3 4" "4 5" "5 3"          # a path, a triangle, 3 isolated vertices
graph path 6 "0 1" "1 2" "2 3" "3 4" "4 5"
graph one 1
graph two 2 "0 1"
graph none 0
# cube: 3-connected (Steinitz 1922: the graphs of convex polyhedra are the 3-connected planar ones)
graph cube 8 "0 1" "1 2" "2 3" "3 0" "4 5" "5 6" "6 7" "7 4" "0 4" "1 5" "2 6" "3 7"
for g in k4 mixed path one two none cube; do
    expect_exit 0 "$bin" draw "$work/$g.graph" -o "$work/$g.cert" --svg "$work/$g.svg"
    case $g in one | two | none) ;; *) grid_within_bound ;; esac
    expect_exit 0 "$bin" check "$work/$g.graph" "$work/$g.cert"
    n=$(sed -n '1s/graph \([0-9]*\) .*/\1/p' "$work/$g.graph")
    [ "$(grep -c '^point ' "$work/$g.cert")" -eq "$n" ] || fail "$g: not one point line per vertex"
    picture_ok "$work/$g.svg"
done
# Components side by side: the 3 isolated vertices of "mixed" are on distinct points (kernel checks).
expect_exit 0 "$bin" draw "$work/mixed.graph"
grep -q 'components 5' "$work/stdout" || fail "mixed: expected 5 components: $(cat "$work/stdout")"

# ---- non-planar: K5 and K3,3 (Kuratowski 1930) pictured, witness certificate accepted ----
graph k5 5 "0 1" "0 2" "0 3" "0 4" "1 2" "1 3" "1 4" "2 3" "2 4" "3 4"
graph k33 6 "0 3" "0 4" "0 5" "1 3" "1 4" "1 5" "2 3" "2 4" "2 5"
# the Petersen graph: non-planar (a textbook fact); its witness is a subdivided K3,3
graph petersen 10 "0 1" "1 2" "2 3" "3 4" "4 0" "0 5" "1 6" "2 7" "3 8" "4 9" "5 7" "7 9" "9 6" "6 8" "8 5"
for g in k5 k33 petersen; do
    expect_exit 1 "$bin" draw "$work/$g.graph" -o "$work/$g.cert" --svg "$work/$g.svg"
    grep -q 'not planar: a subdivided K' "$work/stdout" || fail "$g: no witness report"
    grep -q 'conflict: path .* crosses path ' "$work/stdout" || fail "$g: no conflict named"
    expect_exit 0 "$bin" check "$work/$g.graph" "$work/$g.cert"
    picture_ok "$work/$g.svg"
    grep -q 'Conflict: path' "$work/$g.svg" || fail "$g: the picture names no conflict"
done
grep -q 'subdivided K5' "$work/k5.svg" || fail "K5 picture does not say K5"
grep -q 'subdivided K3,3' "$work/k33.svg" || fail "K3,3 picture does not say K3,3"

# ---- labels from the names file beside the graph (format-spec/names.md) ----
sum=$(sha256sum "$work/k4.graph" | cut -d' ' -f1)
printf 'vertex-names 1\ngraph-sha256 %s\ncount 4\n0 pump\n1 valve<A>\n2 inlet\n3 outlet\n' "$sum" \
    > "$work/k4.graph.names"
expect_exit 0 "$bin" draw "$work/k4.graph" --svg "$work/k4n.svg"
grep -q '>valve&lt;A&gt;<' "$work/k4n.svg" || fail "names file labels missing or not escaped"
picture_ok "$work/k4n.svg"
printf 'vertex-names 1\ncount 3\n0 a\n1 b\n2 c\n' > "$work/bad.names"
expect_exit 2 "$bin" draw "$work/k4.graph" --names "$work/bad.names" --svg "$work/k4b.svg"
[ -e "$work/k4b.svg" ] && fail "a refused names file must leave no picture"

# ---- the barycentric option: accepted on the cube, grid fallback on a path ----
expect_exit 0 "$bin" draw "$work/cube.graph" --layout tutte -o "$work/cube_t.cert" --svg "$work/cube_t.svg"
grep -q 'barycentric layout' "$work/stdout" || fail "cube: barycentric layout not used: $(cat "$work/stdout")"
expect_exit 0 "$bin" check "$work/cube.graph" "$work/cube_t.cert"
picture_ok "$work/cube_t.svg"
expect_exit 0 "$bin" draw "$work/path.graph" --layout tutte -o "$work/path_t.cert"
grep -q 'using the grid drawing' "$work/stderr" || fail "path: no fallback message"
expect_exit 0 "$bin" check "$work/path.graph" "$work/path_t.cert"

# ---- a 10^4-vertex drawing: valid, renders, labels off ----
python3 bench/draw_gen.py trigrid 30000 5 "$work/big.graph"
expect_exit 0 "$bin" draw "$work/big.graph" -o "$work/big.cert" --svg "$work/big.svg"
grid_within_bound
picture_ok "$work/big.svg"
grep -q 'class="label"' "$work/big.svg" && fail "labels must be off for large drawings"
expect_exit 0 "$bin" check "$work/big.graph" "$work/big.cert"

# ---- errors: usage, bad input, whole-or-nothing ----
expect_exit 2 "$bin" draw
expect_exit 2 "$bin" draw "$work/k4.graph" --layout spring
expect_exit 2 "$bin" draw "$work/k4.graph" -o - --svg -
printf 'graph 3 2\n0 1\n1 1\n' > "$work/loop.graph"
expect_exit 2 "$bin" draw "$work/loop.graph" -o "$work/loop.cert" --svg "$work/loop.svg"
grep -q 'line 3' "$work/stderr" || fail "bad graph: message names no line: $(cat "$work/stderr")"
[ -e "$work/loop.cert" ] || [ -e "$work/loop.svg" ] && fail "bad input must write nothing"
expect_exit 2 "$bin" draw "$work/k4.graph" -o "$work/k4.cert" --svg "$work/no/such/dir.svg"
expect_exit 0 "$bin" draw --help
grep -q 'usage: planewit draw' "$work/stdout" || fail "draw --help prints no usage"
expect_exit 0 "$bin" draw - -o "$work/stdin.cert" < "$work/k4.graph"
expect_exit 0 "$bin" check "$work/k4.graph" "$work/stdin.cert"

[ "$failures" -eq 0 ] && echo "check_draw: all passed" && exit 0
echo "check_draw: $failures failures"
exit 1
