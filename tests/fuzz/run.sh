#!/bin/sh
# Short or long fuzz runs of every libFuzzer harness, one after the other.
# Usage: tests/fuzz/run.sh SECONDS [TARGET...]     (from the repository root; `make fuzz`)
# Corpora live in build-fuzz/corpus/TARGET and grow from run to run; the seeds
# (tests/fuzz/seeds.py: vectors/ and examples/demo/) are added each time.
# Findings (crash-*, leak-*, timeout-*) are written to build-fuzz/findings/TARGET/.
# Prints one summary line per target and exits non-zero if any target found something.
seconds=${1:-60}
shift
targets=${*:-graph cert check import differential certify}
out=build-fuzz
sh_status=0
/usr/bin/python3 tests/fuzz/seeds.py "$out/seeds" >/dev/null || exit 2
for t in $targets; do
    if ! make --no-print-directory "$out/fuzz_$t" >"$out/build-$t.log" 2>&1; then
        echo "fuzz $t: NOT BUILT (see $out/build-$t.log)"
        sh_status=1
        continue
    fi
    mkdir -p "$out/corpus/$t" "$out/findings/$t" "$out/seeds/$t"
    # Past findings (tests/fuzz/regressions/) run first, as part of the seeds.
    [ -d "tests/fuzz/regressions/$t" ] && cp tests/fuzz/regressions/$t/* "$out/seeds/$t/"
    # libFuzzer: -max_total_time bounds the run; -rss_limit_mb and -timeout catch
    # blow-ups as findings; the dictionary holds the formats' keywords.
    "$out/fuzz_$t" "$out/corpus/$t" "$out/seeds/$t" -dict=tests/fuzz/planewit.dict \
        -max_total_time="$seconds" -timeout=10 -rss_limit_mb=1024 -max_len=8192 \
        -artifact_prefix="$out/findings/$t/" -print_final_stats=1 >"$out/fuzz-$t.log" 2>&1
    rc=$?
    execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$out/fuzz-$t.log")
    cov=$(grep -o 'cov: [0-9]*' "$out/fuzz-$t.log" | tail -n 1)
    files=$(ls "$out/corpus/$t" | wc -l)
    ub=$(grep -c 'runtime error' "$out/fuzz-$t.log")
    echo "fuzz $t: ${seconds}s, ${execs:-?} executions, corpus $files files, ${cov:-cov: ?} edges, exit $rc, UBSan reports $ub"
    [ "$rc" -eq 0 ] || sh_status=1
done
exit $sh_status
