# expect.sh - shared by the end-to-end scripts tests/check_*.sh (sourced, not
# run): a temporary folder, pass/fail counting, and checks of a command's exit
# status and output.  The sourcing script sets $bin first; it may set
# $evidence to a file (say the last command's stderr) that every failure shows.
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
pass=0
fail=0

ok() { pass=$((pass + 1)); }
# show FILE: the file, indented under a FAIL line.
show() { sed 's/^/    /' "$1"; }
bad() {
    echo "FAIL $*"
    [ -n "${evidence-}" ] && [ -f "$evidence" ] && show "$evidence" | head -n 8
    fail=$((fail + 1))
}

# status_is NAME GOT WANT: an exit status already collected.
status_is() { if [ "$2" -eq "$3" ]; then ok; else bad "$1: exit $2, expected $3"; fi; }

# has NAME FILE TEXT: FILE contains TEXT literally.
has() {
    if grep -qF -- "$3" "$2"; then ok; return; fi
    bad "$1: $2 lacks '$3'"
    [ "$2" = "${evidence-}" ] || show "$2"
}

# run NAME EXIT COMMAND...: exit status only; stdout+stderr are left in $tmp/out.
run() {
    name=$1 want=$2
    shift 2
    "$@" >"$tmp/out" 2>&1
    got=$?
    if [ "$got" -eq "$want" ]; then ok; else
        bad "$name: exit $got, expected $want"; show "$tmp/out"; fi
}

# expect NAME EXIT TEXT COMMAND...: exit status and a substring of stdout+stderr.
expect() {
    name=$1 want=$2 text=$3
    shift 3
    "$@" >"$tmp/out" 2>&1
    got=$?
    if [ "$got" -ne "$want" ]; then
        bad "$name: exit $got, expected $want"; show "$tmp/out"
    elif ! grep -qF -- "$text" "$tmp/out"; then
        bad "$name: output lacks '$text'"; show "$tmp/out"
    else
        ok
    fi
}

# policy_grid GRAPH CERT: a 420 x 420 grid (351,960 edges) and a rotation system of it
# (grid_pair.awk), in a graph file over 4 MiB: the size from which certify, check and
# draw keep one heap on huge pages (cli/heap.c).  Their tests give the same bytes on
# standard input, where that memory policy is not used, and compare what they write.
policy_grid() {
    awk -v R=420 -v C=420 -v G="$1" -v K="$2" -f "$(dirname "$0")/grid_pair.awk"
    [ "$(wc -c <"$1")" -gt 4194304 ] && ok || bad "$1 is not over 4 MiB"
}

# finish NAME: the script's summary line and exit status.
finish() {
    echo "$1: $pass passed, $fail failed"
    [ "$fail" -eq 0 ]
}
