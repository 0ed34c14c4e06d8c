#!/bin/sh
# The bundled demo (an invented scenario): one certificate that proves a
# channel network planar, one that proves a board non-planar, and one
# upstream "planar" claim about the same board that must be refused.
# Usage: examples/run-demo.sh PATH/TO/planewit
set -u
bin=${1:-build/planewit}
dir=$(dirname "$0")/demo
unexpected=0
run() { # expected-exit graph cert [flags]
    want=$1
    shift
    echo "\$ planewit check $(basename "$1") $(basename "$2")${3:+ $3}"
    "$bin" check "$@"
    got=$?
    [ "$got" -eq "$want" ] || { echo "demo: expected exit $want, got $got"; unexpected=1; }
    echo
}
run 0 "$dir/coolant-chip.graph" "$dir/coolant-chip.cert"
run 0 "$dir/sensor-board.graph" "$dir/sensor-board.cert"
run 1 "$dir/sensor-board.graph" "$dir/sensor-board.solver.cert"
run 0 "$dir/sensor-board.graph" "$dir/sensor-board.cert" --json
exit "$unexpected"
