#!/bin/sh
# The benchmark programs in bench/ still build, with the scripts' own build
# function (bench/tools.sh), and still measure what `planewit` does: a
# benchmark that no longer links, or times something else than the shipped
# binary, would report figures about nothing.  (bench-draw once stopped
# linking unnoticed, because nothing in the suite built it.)  Small inputs
# only: no timing is asserted.
# Usage: tests/check_bench_tools.sh BUILD_DIR
set -u
build=${1:-build}
bin=$build/planewit
. "$(dirname "$0")/expect.sh"

# The build's own compiler and options (make check passes them), so that the
# objects of a sanitizer or coverage build link; bench/tools.sh's own otherwise.
bench_cc=${BUILD_CC:-cc}
[ -n "${BUILD_OPT:-}" ] && bench_cflags=$BUILD_OPT
. bench/tools.sh
# Leaks at exit of a one-shot measuring tool are not this test's subject.
ASAN_OPTIONS=${ASAN_OPTIONS:+$ASAN_OPTIONS:}detect_leaks=0
export ASAN_OPTIONS
for tool in certify_gen certify_phases certify_floor draw_bench; do
    if bench_build "$tool" "$tmp" "$build" >"$tmp/$tool.log" 2>&1; then ok; else
        bad "$tool-builds: does not build"
        show "$tmp/$tool.log"
    fi
done

# certify_phases renders, byte for byte, what `planewit certify` writes, on a
# planar and a non-planar family; the bench scripts rely on that.
for family in stacked stacked+1; do
    "$tmp/certify_gen" "$family" 3000 7 "$tmp/$family.graph" >/dev/null
    "$tmp/certify_phases" "$tmp/$family.graph" "$tmp/$family.phases.cert" >"$tmp/$family.line" 2>&1
    "$bin" certify "$tmp/$family.graph" -o "$tmp/$family.cert" >/dev/null 2>&1
    if cmp -s "$tmp/$family.phases.cert" "$tmp/$family.cert"; then ok; else
        bad "phases-matches-certify-$family: certify_phases and planewit certify wrote different certificates"
    fi
    expect "phases-verdict-$family" 0 "verdict=accepted" cat "$tmp/$family.line"
done

# certify_floor checks itself (the search that fetches ahead, and the one on
# the relabelled adjacency, must number every vertex as the plain search did;
# certify's engine must reach the same verdict on the graph and on its
# depth-first copy) and prints every figure; two rounds, so that each search
# and each engine run once goes first; a planar and a non-planar family.
expect floor-runs 0 "dfs2=" "$tmp/certify_floor" "$tmp/stacked.graph" 1
expect floor-runs-both-orders 0 " dfids=" "$tmp/certify_floor" "$tmp/stacked.graph" 2
expect floor-runs-non-planar 0 " dfids=" "$tmp/certify_floor" "$tmp/stacked+1.graph" 2
expect floor-refuses-bad-rounds 2 "ROUNDS must be 1 to 15" "$tmp/certify_floor" "$tmp/stacked.graph" 0

# bench/certify_profile_samples.awk sorts perf samples by phase and function.
# The samples below are written by hand in `perf script -F period,ip,sym,dso`'s
# layout; the sums expected are added up by hand.
tab=$(printf '\t')
cat >"$tmp/perf.txt" <<EOF
    500000 
${tab}           1d0 pp_dfs (/opt/x/planewit)
${tab}           2e0 pp_certify (/opt/x/planewit)
${tab}           3f0 main (/opt/x/planewit)

    500000 
${tab}           1d4 search_from (inlined)
${tab}           1d4 pp_dfs (/opt/x/planewit)
${tab}           2e0 pp_certify (/opt/x/planewit)

    250000 
${tab}ffffffff82255aa7 clear_page_erms ([kernel.kallsyms])
${tab}ffffffff8225fcc6 exc_page_fault ([kernel.kallsyms])
${tab}           1cc read_edges (inlined)
${tab}           1cc pw_graph_parse (/opt/x/planewit)

    250000 
${tab}ffffffff81000100 ksys_write ([kernel.kallsyms])
${tab}           5a0 write_certificate (inlined)
${tab}           5a0 cmd_certify (/opt/x/planewit)

    250000 
${tab}         29ad80 [unknown] (/usr/lib/x86_64-linux-gnu/libcrypto.so.3)
${tab}           4c0 cli_sha256 (/opt/x/planewit)

    250000 
${tab}           104b0 _dl_start (/usr/lib/ld-linux.so.2)
EOF
awk -v tool=certify -v family=fam -v run=2 -f bench/certify_profile_samples.awk \
    -v roots="pw_graph_parse=parse cli_sha256=hash pp_certify=algorithm write_certificate=write" \
    "$tmp/perf.txt" | sort >"$tmp/perf.sums"
for line in "sample certify fam 2 algorithm pp_dfs 1 1000000" \
    "sample certify fam 2 parse page-faults 0 250000" "sample certify fam 2 write system 0 250000" \
    "sample certify fam 2 hash [libcrypto.so.3] 0 250000" "sample certify fam 2 other _dl_start 0 250000"; do
    has profile-samples "$tmp/perf.sums" "$line"
done
expect profile-samples-count 0 "5" sh -c "wc -l <'$tmp/perf.sums'"

# bench/certify_profile.awk: 2 ms over 10^6 instructions is 2 ns per instruction,
# 2000 ns per edge at M = 1000; 1 ms of 4 in the algorithm is page faults (25%).
# check takes 7 ms as certify does (ratio 1.00), 4 of them read, parse and hash (4/7).
cat >"$tmp/profile.raw" <<EOF
graph fam 500 1000
sample certify fam 1 algorithm pp_dfs 1 2000000
sample certify fam 1 algorithm page-faults 0 1000000
sample certify fam 1 algorithm pp_run 1 1000000
sample certify fam 1 parse pw_graph_parse 1 3000000
sample check fam 1 read system 0 1000000
sample check fam 1 parse pw_graph_parse 1 2000000
sample check fam 1 hash [libcrypto.so.3] 0 1000000
sample check fam 1 verify pw_check_rotation 1 3000000
count fam algorithm pp_dfs 600000
count fam algorithm pp_dfs 400000
count fam parse pw_graph_parse 6000000
EOF
awk -v runs=1 -v freq=2000 -f bench/certify_profile.awk "$tmp/profile.raw" >"$tmp/profile.md"
has profile-report-phases "$tmp/profile.md" "| fam | 500 | 1000 | 7 | 0 (0%) | 3 (43%) | 0 (0%) | 4 (57%) |"
has profile-report-faults "$tmp/profile.md" "| fam | 0 (-) | 0 (0%) | 0 (-) | 1 (25%) |"
has profile-report-function "$tmp/profile.md" "| fam | algorithm | pp_dfs | 2.0 | 50% | 2000 | 1000 | 2.00 |"
has profile-report-parse "$tmp/profile.md" "| fam | parse | pw_graph_parse | 3.0 | 100% | 3000 | 6000 | 0.50 |"
has profile-report-no-count "$tmp/profile.md" "| fam | algorithm | page-faults | 1.0 | 25% | 1000 | - | - |"
has profile-report-check "$tmp/profile.md" "| fam | 7 | 1 | 2 | 1 | 0 | 3 | 0 | 1.00 | 0.57 |"
# A phase with no samples (a phase function renamed) is an error, not an empty row.
grep -v "algorithm" "$tmp/profile.raw" >"$tmp/profile-short.raw"
expect profile-report-refuses-empty-phase 1 "no samples in certify's algorithm on fam" \
    awk -v runs=1 -f bench/certify_profile.awk "$tmp/profile-short.raw"

# Every phase function the profile names is still defined in the sources.
for pair in $(profile_roots certify) $(profile_roots check); do
    fn=${pair%=*}
    if grep -qE "^[A-Za-z].*[ *]$fn\(" checker/*.c cli/*.c producer/*.c; then ok; else
        bad "profile-root-defined: $fn (bench/tools.sh) is defined nowhere in checker/, cli/, producer/"
    fi
done

finish check_bench_tools
