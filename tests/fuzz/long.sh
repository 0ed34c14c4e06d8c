#!/bin/sh
# Long fuzz run of one libFuzzer harness, bounded by CPU time rather than wall
# time, so that a run at low priority on a busy machine still gets its full share.
# Usage: tests/fuzz/long.sh TARGET CPU_SECONDS      (from the repository root)
# The harness runs under `nice -n 19` on build-fuzz/corpus/TARGET (kept between
# runs) plus the seeds; when its user + system time reaches CPU_SECONDS it is
# interrupted (SIGINT, so libFuzzer prints its final statistics).  The last line
# of build-fuzz/long-TARGET.txt is the summary for bench/results-hardening.md;
# every run's summary is also appended to build-fuzz/long-history.txt, since a
# campaign is usually several runs resuming one corpus.
set -u
t=$1
limit=$2
out=build-fuzz
/usr/bin/python3 tests/fuzz/seeds.py "$out/seeds" >/dev/null || exit 2
make --no-print-directory "$out/fuzz_$t" >"$out/build-$t.log" 2>&1 || { echo "fuzz $t: NOT BUILT"; exit 2; }
mkdir -p "$out/corpus/$t" "$out/findings/$t" "$out/seeds/$t"
[ -d "tests/fuzz/regressions/$t" ] && cp tests/fuzz/regressions/$t/* "$out/seeds/$t/"
log="$out/long-$t.log"
# The timeout is wall time: at nice 19 a busy machine can starve a harness for
# many seconds (a 10 s limit once flagged an input that replays in 0.1 s), so a
# long run allows 120 s and still catches a real hang; slow-unit reports (also
# wall time) start at 120 s too.
# The importers report every refused input on stderr (millions of lines an
# hour); -close_fd_mask=2 silences the harness while libFuzzer keeps its own
# output and routes sanitizer reports to it.
quiet=""
[ "$t" = import ] && quiet="-close_fd_mask=2"
start=$(date -u +%Y-%m-%dT%H:%M:%SZ)
nice -n 19 "$out/fuzz_$t" "$out/corpus/$t" "$out/seeds/$t" -dict=tests/fuzz/planewit.dict \
    -timeout=120 -report_slow_units=120 -rss_limit_mb=1024 -max_len=8192 -artifact_prefix="$out/findings/$t/" \
    -print_final_stats=1 $quiet >"$log" 2>&1 &
pid=$!
ticks=$(getconf CLK_TCK)
cpu=0
while kill -0 "$pid" 2>/dev/null; do
    sleep 20
    # Fields 14 and 15 of /proc/PID/stat: user and system time in clock ticks.
    stat=$(cat "/proc/$pid/stat" 2>/dev/null) || break
    cpu=$(echo "$stat" | sed 's/^.*) //' | awk -v hz="$ticks" '{ print int(($12 + $13) / hz) }')
    [ "$cpu" -ge "$limit" ] && kill -INT "$pid"
done
wait "$pid"
rc=$?
execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log")
[ -n "$execs" ] || execs=$(grep -o '^#[0-9]*' "$log" | tail -n 1 | tr -d '#')
cov=$(grep -o 'cov: [0-9]*' "$log" | tail -n 1 | cut -d' ' -f2)
ft=$(grep -o 'ft: [0-9]*' "$log" | tail -n 1 | cut -d' ' -f2)
files=$(ls "$out/corpus/$t" | wc -l)
finds=$(ls "$out/findings/$t" | wc -l)
echo "target=$t start=$start end=$(date -u +%Y-%m-%dT%H:%M:%SZ) cpu_seconds=$cpu executions=${execs:-?} corpus_files=$files cov_edges=${cov:-?} features=${ft:-?} findings=$finds exit=$rc" \
    | tee "$out/long-$t.txt"
cat "$out/long-$t.txt" >>"$out/long-history.txt"
