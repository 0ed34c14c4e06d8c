#!/bin/sh
# `planewit certify --graph6` on worker threads (-j) and in shards (--shard):
# the output must not depend on the thread count, shards must add up to the
# whole run, and bad -j / --shard values are refused with exit 2.
# Usage: tests/check_certify_parallel.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. tests/expect.sh

# The stream: every graph on 7 vertices from nauty's geng (1044 graphs, OEIS
# A000088), repeated 12 times so that it spans several blocks of records, then
# K5 ('D~{': N = 5 and all ten bits set) and K3,3 on {0,1,2} x {3,4,5} ('EFz_':
# the pairs 01 02 12 03 13 23 04 14 24 34 05 15 25 35 45 give bits 000111
# 111011 100(000), bytes 63+7, 63+59, 63+32), spelled by hand from the graph6
# definition; both non-planar (Kuratowski 1930).
if command -v nauty-geng >/dev/null 2>&1; then
    nauty-geng -q 7 >"$tmp/g7.g6"
    per_copy=1044 planar_per_copy=822 # OEIS A000088 and A005470 at n = 7
else
    echo "check_certify_parallel: nauty-geng missing (Debian package nauty); using a short stream"
    printf 'C~\nBw\nA_\n' >"$tmp/g7.g6"
    per_copy=3 planar_per_copy=3 # K4, a path on 3 vertices, one edge: planar (common practice)
fi
: >"$tmp/all.g6"
for copy in 1 2 3 4 5 6 7 8 9 10 11 12; do cat "$tmp/g7.g6" >>"$tmp/all.g6"; done
printf 'D~{\nEFz_\n' >>"$tmp/all.g6"
total=$((12 * per_copy + 2))
planar=$((12 * planar_per_copy))

# The counts against the outside numbers, with one thread and with three.
for j in 1 3; do
    "$bin" certify --graph6 "$tmp/all.g6" --summary -j "$j" >"$tmp/sum$j" 2>&1 || bad "summary -j $j exit $?"
    want="graphs=$total planar=$planar nonplanar=$((total - planar))"
    [ "$(tail -n 1 "$tmp/sum$j")" = "$want" ] && ok || { bad "-j $j last line, expected '$want'"; cat "$tmp/sum$j"; }
done

# -j 1 and -j 2 (and -j 5): the same bytes, per-graph lines and summaries alike.
for mode in "" "--summary" "--witness cheapest"; do
    "$bin" certify --graph6 "$tmp/all.g6" $mode -j 1 >"$tmp/one" 2>&1
    for j in 2 5; do
        "$bin" certify --graph6 - $mode -j "$j" <"$tmp/all.g6" >"$tmp/many" 2>&1
        cmp -s "$tmp/one" "$tmp/many" && ok || bad "'$mode' -j 1 and -j $j differ"
    done
done
[ "$(grep -c '^line ' "$tmp/one")" -eq "$total" ] && ok || bad "not one line per graph"
[ "$(sed -n "${total}p" "$tmp/one" | cut -d: -f1)" = "line $total" ] && ok || bad "lines out of order"

# Shards: every record in exactly one shard, and the counts add up (the awk
# line of `planewit certify --help`) to those of one whole run, byte for byte.
add_up() { # the awk program as `planewit certify --help` prints it
    "$bin" certify --help | sed -n '/^    awk/,/shard-\*\.txt$/p' | sed 's/ shard-\*\.txt$/ "$@"/' >"$tmp/add_up.sh"
    grep -q "^    awk -F" "$tmp/add_up.sh" || bad "no awk line in certify --help"
    sh "$tmp/add_up.sh" "$@"
}
for mode in "" "--witness cheapest"; do
    "$bin" certify --graph6 "$tmp/all.g6" --summary $mode -j 2 >"$tmp/whole"
    for k in 1 3 7; do
        i=0 files=""
        while [ "$i" -lt "$k" ]; do
            "$bin" certify --graph6 "$tmp/all.g6" --summary $mode --shard "$i/$k" -j 2 >"$tmp/shard$i" ||
                bad "shard $i/$k exit $?"
            files="$files $tmp/shard$i"
            i=$((i + 1))
        done
        add_up $files | cmp -s - "$tmp/whole" && ok || { bad "'$mode' $k shards do not add up"; add_up $files; }
    done
done
# Per-graph lines of 3 shards, sorted by line number, are the whole run's lines.
"$bin" certify --graph6 "$tmp/all.g6" -j 1 | grep '^line ' >"$tmp/whole_lines"
for i in 0 1 2; do "$bin" certify --graph6 "$tmp/all.g6" --shard "$i/3"; done |
    grep '^line ' | sort -t' ' -k2,2n | cmp -s - "$tmp/whole_lines" && ok || bad "shard lines differ"
expect shard-takes-every-third 0 "line 5: certified" "$bin" certify --graph6 "$tmp/all.g6" --shard 1/3
if "$bin" certify --graph6 "$tmp/all.g6" --shard 1/3 | grep -q '^line 4:'; then
    bad "shard 1/3 certified line 4 (record 3, which is shard 0's)"
else ok; fi
expect shard-named 0 "shard 2/7: records 2, 9, 16, ..." "$bin" certify --graph6 "$tmp/all.g6" --summary --shard 2/7
expect shard-beyond-stream 0 "graphs=0 planar=0 nonplanar=0" \
    "$bin" certify --graph6 "$tmp/all.g6" --summary --shard 99999/100000

# A bad record in the middle: the lines before it, then the same message, for any -j.
head -n 2000 "$tmp/all.g6" >"$tmp/bad.g6"
printf 'Bx\n' >>"$tmp/bad.g6"
cat "$tmp/g7.g6" >>"$tmp/bad.g6"
"$bin" certify --graph6 "$tmp/bad.g6" -j 1 >"$tmp/bad1.out" 2>"$tmp/bad1.err"
rc1=$?
"$bin" certify --graph6 "$tmp/bad.g6" -j 4 >"$tmp/bad4.out" 2>"$tmp/bad4.err"
rc4=$?
[ "$rc1" -eq 2 ] && [ "$rc4" -eq 2 ] && ok || bad "bad record: exits $rc1 and $rc4, expected 2"
cmp -s "$tmp/bad1.out" "$tmp/bad4.out" && cmp -s "$tmp/bad1.err" "$tmp/bad4.err" && ok ||
    bad "bad record: -j 1 and -j 4 differ"
[ "$(wc -l <"$tmp/bad4.out")" -eq 2000 ] && ok || bad "bad record: expected the 2000 lines before it"
grep -qF "bad.g6 line 2001, byte offset" "$tmp/bad4.err" && ok || { bad "bad record message"; cat "$tmp/bad4.err"; }
expect bad-record-other-shard 0 "graphs=" "$bin" certify --graph6 "$tmp/bad.g6" --summary --shard 1/2

# Refusals: exit 2 and what was expected.
for value in 3/3 4/3 -1/3 1/0 0/0 1 1/ /3 a/3 01/3 1/3x ""; do
    expect "shard '$value'" 2 "--shard expects I/K with 0 <= I < K" \
        "$bin" certify --graph6 "$tmp/all.g6" --shard "$value"
done
for value in 0 -2 4097 x 1x ""; do
    expect "-j '$value'" 2 "-j needs a number of threads from 1 to 4096" \
        "$bin" certify --graph6 "$tmp/all.g6" -j "$value"
done
expect shard-needs-graph6 2 "-j and --shard apply to --graph6 only" \
    "$bin" certify "$tmp/all.g6" --shard 0/2
expect j-needs-graph6 2 "-j and --shard apply to --graph6 only" "$bin" certify x.graph -j 2
expect shard-needs-value 2 "--shard needs a value" "$bin" certify --graph6 "$tmp/all.g6" --shard
expect help-mentions 0 "--shard I/K" "$bin" certify --help

finish check_certify_parallel
