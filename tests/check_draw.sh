#!/bin/sh
# End-to-end tests of `planewit draw`: exit codes, certificates the kernel accepts,
# the grid bound, SVG pictures valid as XML (xmllint, Debian libxml2-utils) and
# rendered without error (rsvg-convert, Debian librsvg2-bin), labels from a names
# file, the barycentric option and its fallback, whole-or-nothing outputs.
# usage: sh tests/check_draw.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. "$(dirname "$0")/expect.sh"
evidence="$tmp/stderr"
for tool in xmllint rsvg-convert; do
    command -v $tool > /dev/null || { echo "FAIL: $tool missing (sh scripts/run.sh test installs it)"; exit 1; }
done

graph() { # NAME N "U V" ...: writes $tmp/NAME.graph
    name=$1 n=$2
    shift 2
    { echo "graph $n $#"; for e in "$@"; do echo "$e"; done; } > "$tmp/$name.graph"
}
picture_ok() { # SVG: valid XML and renders to a non-empty PNG
    xmllint --noout "$1" 2> "$tmp/xmllint.err" || { bad "$1 is not valid XML: $(cat "$tmp/xmllint.err")"; return; }
    rsvg-convert "$1" -o "$tmp/out.png" 2> "$tmp/rsvg.err" && [ -s "$tmp/out.png" ] && ok ||
        bad "$1 does not render: $(cat "$tmp/rsvg.err")"
}
expect_exit() { # CODE COMMAND...: stdout in $tmp/stdout, stderr in $tmp/stderr (shown on failure)
    want=$1
    shift
    "$@" > "$tmp/stdout" 2> "$tmp/stderr"
    status_is "'$*'" $? "$want"
}
# The grid line reports W x H and the bound; W, H <= N - 2 for N >= 3 (Schnyder 1990).
grid_within_bound() {
    set -- $(sed -n 's/.*grid \([0-9]*\) x \([0-9]*\) (Schnyder bound \([0-9]*\) x.*/\1 \2 \3/p' "$tmp/stdout")
    [ $# -eq 3 ] && [ "$1" -le "$3" ] && [ "$2" -le "$3" ] && ok || bad "grid not within the bound: $(cat "$tmp/stdout")"
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
    expect_exit 0 "$bin" draw "$tmp/$g.graph" -o "$tmp/$g.cert" --svg "$tmp/$g.svg"
    case $g in one | two | none) ;; *) grid_within_bound ;; esac
    expect_exit 0 "$bin" check "$tmp/$g.graph" "$tmp/$g.cert"
    n=$(sed -n '1s/graph \([0-9]*\) .*/\1/p' "$tmp/$g.graph")
    [ "$(grep -c '^point ' "$tmp/$g.cert")" -eq "$n" ] && ok || bad "$g: not one point line per vertex"
    picture_ok "$tmp/$g.svg"
done
# Components side by side: the 3 isolated vertices of "mixed" are on distinct points (kernel checks).
expect_exit 0 "$bin" draw "$tmp/mixed.graph"
grep -q 'components 5' "$tmp/stdout" && ok || bad "mixed: expected 5 components: $(cat "$tmp/stdout")"

# ---- non-planar: K5 and K3,3 (Kuratowski 1930) pictured, witness certificate accepted ----
graph k5 5 "0 1" "0 2" "0 3" "0 4" "1 2" "1 3" "1 4" "2 3" "2 4" "3 4"
graph k33 6 "0 3" "0 4" "0 5" "1 3" "1 4" "1 5" "2 3" "2 4" "2 5"
# the Petersen graph: non-planar (a textbook fact); its witness is a subdivided K3,3
graph petersen 10 "0 1" "1 2" "2 3" "3 4" "4 0" "0 5" "1 6" "2 7" "3 8" "4 9" "5 7" "7 9" "9 6" "6 8" "8 5"
for g in k5 k33 petersen; do
    expect_exit 1 "$bin" draw "$tmp/$g.graph" -o "$tmp/$g.cert" --svg "$tmp/$g.svg"
    grep -q 'not planar: a subdivided K' "$tmp/stdout" && ok || bad "$g: no witness report"
    grep -q 'conflict: path .* crosses path ' "$tmp/stdout" && ok || bad "$g: no conflict named"
    expect_exit 0 "$bin" check "$tmp/$g.graph" "$tmp/$g.cert"
    picture_ok "$tmp/$g.svg"
    grep -q 'Conflict: path' "$tmp/$g.svg" && ok || bad "$g: the picture names no conflict"
done
grep -q 'subdivided K5' "$tmp/k5.svg" && ok || bad "K5 picture does not say K5"
grep -q 'subdivided K3,3' "$tmp/k33.svg" && ok || bad "K3,3 picture does not say K3,3"

# ---- labels from the names file beside the graph (format-spec/names.md) ----
sum=$(sha256sum "$tmp/k4.graph" | cut -d' ' -f1)
printf 'vertex-names 1\ngraph-sha256 %s\ncount 4\n0 pump\n1 valve<A>\n2 inlet\n3 outlet\n' "$sum" \
    > "$tmp/k4.graph.names"
expect_exit 0 "$bin" draw "$tmp/k4.graph" --svg "$tmp/k4n.svg"
grep -q '>valve&lt;A&gt;<' "$tmp/k4n.svg" && ok || bad "names file labels missing or not escaped"
picture_ok "$tmp/k4n.svg"
printf 'vertex-names 1\ncount 3\n0 a\n1 b\n2 c\n' > "$tmp/bad.names"
expect_exit 2 "$bin" draw "$tmp/k4.graph" --names "$tmp/bad.names" --svg "$tmp/k4b.svg"
[ -e "$tmp/k4b.svg" ] && bad "a refused names file must leave no picture" || ok

# ---- the barycentric option: accepted on the cube, grid fallback on a path ----
expect_exit 0 "$bin" draw "$tmp/cube.graph" --layout tutte -o "$tmp/cube_t.cert" --svg "$tmp/cube_t.svg"
grep -q 'barycentric layout' "$tmp/stdout" && ok || bad "cube: barycentric layout not used: $(cat "$tmp/stdout")"
expect_exit 0 "$bin" check "$tmp/cube.graph" "$tmp/cube_t.cert"
picture_ok "$tmp/cube_t.svg"
expect_exit 0 "$bin" draw "$tmp/path.graph" --layout tutte -o "$tmp/path_t.cert"
grep -q 'using the grid drawing' "$tmp/stderr" && ok || bad "path: no fallback message"
expect_exit 0 "$bin" check "$tmp/path.graph" "$tmp/path_t.cert"

# ---- a 10^4-vertex drawing: valid, renders, labels off ----
python3 bench/draw_gen.py trigrid 30000 5 "$tmp/big.graph"
expect_exit 0 "$bin" draw "$tmp/big.graph" -o "$tmp/big.cert" --svg "$tmp/big.svg"
grid_within_bound
picture_ok "$tmp/big.svg"
grep -q 'class="label"' "$tmp/big.svg" && bad "labels must be off for large drawings" || ok
expect_exit 0 "$bin" check "$tmp/big.graph" "$tmp/big.cert"

# ---- a graph file over 4 MiB (policy_grid): draw's memory policy changes speed only ----
# The certificate must be byte for byte the one drawn from standard input.
policy_grid "$tmp/huge.graph" "$tmp/huge-grid.cert"
expect_exit 0 "$bin" draw "$tmp/huge.graph" -o "$tmp/huge.cert"
expect_exit 0 "$bin" draw - -o "$tmp/huge-stdin.cert" < "$tmp/huge.graph"
cmp -s "$tmp/huge.cert" "$tmp/huge-stdin.cert" && ok || bad "huge: the certificate depends on the memory policy"
expect_exit 0 "$bin" check "$tmp/huge.graph" "$tmp/huge.cert"

# ---- errors: usage, bad input, whole-or-nothing ----
expect_exit 2 "$bin" draw
expect_exit 2 "$bin" draw "$tmp/k4.graph" --layout spring
expect_exit 2 "$bin" draw "$tmp/k4.graph" -o - --svg -
printf 'graph 3 2\n0 1\n1 1\n' > "$tmp/loop.graph"
expect_exit 2 "$bin" draw "$tmp/loop.graph" -o "$tmp/loop.cert" --svg "$tmp/loop.svg"
grep -q 'line 3' "$tmp/stderr" && ok || bad "bad graph: message names no line: $(cat "$tmp/stderr")"
{ [ -e "$tmp/loop.cert" ] || [ -e "$tmp/loop.svg" ]; } && bad "bad input must write nothing" || ok
expect_exit 2 "$bin" draw "$tmp/k4.graph" -o "$tmp/k4.cert" --svg "$tmp/no/such/dir.svg"
expect_exit 0 "$bin" draw --help
grep -q 'usage: planewit draw' "$tmp/stdout" && ok || bad "draw --help prints no usage"
expect_exit 0 "$bin" draw - -o "$tmp/stdin.cert" < "$tmp/k4.graph"
expect_exit 0 "$bin" check "$tmp/k4.graph" "$tmp/stdin.cert"

finish check_draw
