# expect.sh - shared by the end-to-end scripts tests/check_import.sh and
# tests/check_certify.sh (sourced, not run): a temporary folder, pass/fail
# counting, and expect(), which runs a command and checks its exit status and
# a substring of its output.  The sourcing script sets $bin first.
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
pass=0
fail=0

ok() { pass=$((pass + 1)); }
bad() { echo "FAIL $*"; fail=$((fail + 1)); }

# expect NAME EXIT TEXT COMMAND...: exit status and a substring of stdout+stderr.
expect() {
    name=$1 want=$2 text=$3
    shift 3
    "$@" >"$tmp/out" 2>&1
    got=$?
    if [ "$got" -ne "$want" ]; then
        bad "$name: exit $got, expected $want"; sed 's/^/    /' "$tmp/out"
    elif ! grep -qF -- "$text" "$tmp/out"; then
        bad "$name: output lacks '$text'"; sed 's/^/    /' "$tmp/out"
    else
        ok
    fi
}

# finish NAME: the script's summary line and exit status.
finish() {
    echo "$1: $pass passed, $fail failed"
    [ "$fail" -eq 0 ]
}
