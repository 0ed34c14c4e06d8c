#!/bin/sh
# Runs every test program and script; the last line is the suite's total.
# Usage: tests/run-all.sh BUILD_DIR
build=${1:-build}
passed=0
failed=0
failures=""
run() {
    name=$1
    shift
    if "$@"; then
        passed=$((passed + 1))
    else
        failed=$((failed + 1))
        failures="$failures $name"
    fi
}
for t in "$build"/tests/test_*; do
    [ -x "$t" ] || continue
    echo "== $(basename "$t")"
    run "$(basename "$t")" "$t"
done
for s in tests/check_*.sh tests/check_*.py; do
    [ -f "$s" ] || continue
    echo "== $s"
    case "$s" in
        *.py) run "$s" /usr/bin/python3 "$s" "$build" ;;
        *) run "$s" sh "$s" "$build" ;;
    esac
done
[ -n "$failures" ] && echo "failed programs:$failures"
echo "suite: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
