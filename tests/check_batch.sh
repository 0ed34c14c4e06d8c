#!/bin/sh
# End-to-end tests of `planewit batch` and `planewit merge`
# (format-spec/jobs-list.md): job order, fields, exit status, list errors,
# thread-count independence, shards merged back into one run, progress, and
# whole-or-nothing output when interrupted.
# Usage: tests/check_batch.sh BUILD_DIR
set -u
bin=$(cd "$(dirname "${1:-build}/planewit")" && pwd)/planewit
. "$(dirname "$0")/expect.sh"
evidence="$tmp/err"
# field LINE_NO KEY FILE: the raw value of "KEY": in line LINE_NO of FILE
field() { sed -n "${1}p" "$3" | sed -n "s/.*\"$2\":\(\"[^\"]*\"\|[a-z0-9]*\).*/\1/p"; }

# A small invented set: a triangle (planar), K5 by the edge bound (nonplanar), a bad certificate.
mkdir -p "$tmp/set/sub"
printf 'graph 3 3\n0 1\n1 2\n2 0\n' >"$tmp/set/sub/tri.graph"
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 1\n' >"$tmp/set/sub/tri.cert"
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 9\n' >"$tmp/set/sub/bad.cert"
# K5 has 10 edges > 3 * 5 - 6 = 9 (common practice: the planar edge bound).
printf 'graph 5 10\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n' >"$tmp/set/k5.graph"
printf 'certificate 1\nclaim nonplanar\nedge-bound\n' >"$tmp/set/k5.cert"
cat >"$tmp/set/good.list" <<'LIST'
# every job here is accepted and agrees
sub/tri.graph sub/tri.cert planar
k5.graph	k5.cert   nonplanar   # tab-separated, with a comment

sub/tri.graph sub/tri.cert
LIST
printf 'sub/tri.graph sub/tri.cert planar\r\nsub/tri.graph sub/bad.cert planar\r\nk5.graph k5.cert planar\r\nnone.graph k5.cert\r\n' >"$tmp/set/mixed.list"

# All good: exit 0, one line per job in order, fields in front of the verdict record.
(cd / && "$bin" batch "$tmp/set/good.list" -o "$tmp/good.jsonl" --quiet 2>"$tmp/err")
status_is good-list $? 0
[ "$(wc -l <"$tmp/good.jsonl")" -eq 3 ] && ok || bad "good-list: expected 3 lines"
[ "$(field 1 job "$tmp/good.jsonl")$(field 2 job "$tmp/good.jsonl")$(field 3 job "$tmp/good.jsonl")" = 012 ] &&
    ok || bad "good-list: jobs not numbered 0 1 2 in order"
[ "$(field 2 list_line "$tmp/good.jsonl")" = 3 ] && ok || bad "good-list: job 1 is on list line 3"
[ "$(field 3 expected "$tmp/good.jsonl")" = null ] && ok || bad "good-list: job 2 has no expected claim"
[ "$(field 2 witness "$tmp/good.jsonl")" = '"edge-bound"' ] && ok || bad "good-list: job 1 witness"
has good-paths "$tmp/good.jsonl" '"graph":{"path":"sub/tri.graph",'
has good-paths "$tmp/good.jsonl" '"certificate":{"path":"k5.cert",' 
has good-summary "$tmp/err" "accepted 3, rejected 0, unusable 0; expected claim not met: 0"
# Digests are sha256sum's (common practice: FIPS 180-4 SHA-256).
has good-digest "$tmp/good.jsonl" "$(sha256sum "$tmp/set/k5.cert" | cut -c1-64)"
/usr/bin/python3 -c 'import json, sys; [json.loads(l) for l in open(sys.argv[1])]' "$tmp/good.jsonl" 2>"$tmp/err" &&
    ok || bad "good-list: a line is not JSON"

# Mixed: a rejection, a disagreement, an unreadable file; CRLF list.
"$bin" batch "$tmp/set/mixed.list" -o "$tmp/mixed.jsonl" -j 3 2>"$tmp/err"
status_is mixed-list $? 1
[ "$(field 2 agrees "$tmp/mixed.jsonl")" = false ] && ok || bad "mixed: rejected planar job agrees"
[ "$(field 3 verdict "$tmp/mixed.jsonl")" = '"accepted"' ] && [ "$(field 3 agrees "$tmp/mixed.jsonl")" = false ] &&
    ok || bad "mixed: accepted nonplanar certificate for a job expected planar must disagree"
[ "$(field 4 verdict "$tmp/mixed.jsonl")" = '"unusable"' ] && ok || bad "mixed: missing file is unusable"
has mixed-rules "$tmp/err" "failed rules: read-failed 1, vertex-range 1"
has mixed-summary "$tmp/err" "accepted 2, rejected 1, unusable 1; expected claim not met: 2"

# Thread count does not change a byte of the output.
"$bin" batch "$tmp/set/mixed.list" -o "$tmp/mixed1.jsonl" -j 1 --quiet 2>/dev/null
cmp -s "$tmp/mixed.jsonl" "$tmp/mixed1.jsonl" && ok || bad "-j 1 and -j 3 outputs differ"

# Malformed lists: exit 2, list name and line number, nothing written.
bad_list() { # name line-number expected-text list-content
    printf "$4" >"$tmp/set/bad.list"
    "$bin" batch "$tmp/set/bad.list" -o "$tmp/bad.jsonl" 2>"$tmp/err"
    status_is "$1" $? 2
    has "$1" "$tmp/err" "bad.list line $2: $3"
    [ ! -e "$tmp/bad.jsonl" ] && ok || bad "$1: output written for a bad list"
}
bad_list one-field 2 "expected GRAPH CERT [planar|nonplanar], but the line has one field" '# c\nsub/tri.graph\n'
bad_list four-fields 1 "expected at most 3 fields, found 'x'" 'a b planar x\n'
bad_list bad-claim 1 "expected claim 'planar' or 'nonplanar', found 'Planar'" 'a b Planar\n'
bad_list control-byte 1 "byte 0x0d is not allowed" 'a\rb c\n'
bad_list high-byte 2 "byte 0xc3 is not allowed" 'a b\n\303\251 b\n'
printf '# nothing\n\n' >"$tmp/set/empty.list"
"$bin" batch "$tmp/set/empty.list" 2>"$tmp/err" >/dev/null
status_is empty-list $? 2
has empty-list "$tmp/err" "no jobs"
"$bin" batch "$tmp/set/good.list" --shard 3/3 2>"$tmp/err" >/dev/null
status_is bad-shard $? 2
has bad-shard "$tmp/err" "--shard expects I/K with 0 <= I < K"
"$bin" batch "$tmp/set/good.list" -j 0 2>"$tmp/err" >/dev/null
status_is bad-threads $? 2

# Shards: 10 jobs in 3 shards, merged in any file order, equal one run byte for byte.
: >"$tmp/set/ten.list"
for i in 0 1 2 3 4; do
    printf 'sub/tri.graph sub/tri.cert planar\nk5.graph k5.cert nonplanar\n' >>"$tmp/set/ten.list"
done
echo 'sub/tri.graph sub/bad.cert' >>"$tmp/set/ten.list"
"$bin" batch "$tmp/set/ten.list" -o "$tmp/one.jsonl" --quiet 2>/dev/null
for s in 0 1 2; do
    "$bin" batch "$tmp/set/ten.list" --shard "$s/3" -o "$tmp/shard$s.jsonl" --quiet 2>/dev/null
done
[ "$(cat "$tmp"/shard*.jsonl | wc -l)" -eq 11 ] && ok || bad "shards: 11 lines in all"
[ "$(field 2 job "$tmp/shard1.jsonl")" = 4 ] && ok || bad "shard 1/3: its second job is job 4"
"$bin" merge "$tmp/shard2.jsonl" "$tmp/shard0.jsonl" "$tmp/shard1.jsonl" -o "$tmp/merged.jsonl" 2>"$tmp/err"
status_is merge $? 0
cmp -s "$tmp/one.jsonl" "$tmp/merged.jsonl" && ok || bad "merged shards differ from one run"
"$bin" merge "$tmp/shard0.jsonl" "$tmp/shard2.jsonl" -o "$tmp/short.jsonl" 2>"$tmp/err"
status_is merge-missing $? 2
has merge-missing "$tmp/err" "job 1 of 11 is in none of the files"
"$bin" merge "$tmp/shard0.jsonl" "$tmp/shard0.jsonl" 2>"$tmp/err" >/dev/null
status_is merge-twice $? 2
has merge-twice "$tmp/err" "shard0.jsonl line 1: this job is already in an earlier line or shard"
"$bin" merge "$tmp/shard0.jsonl" "$tmp/good.jsonl" 2>"$tmp/err" >/dev/null
status_is merge-other-list $? 2
head -c 100 "$tmp/shard1.jsonl" >"$tmp/torn.jsonl"
"$bin" merge "$tmp/shard0.jsonl" "$tmp/torn.jsonl" 2>"$tmp/err" >/dev/null
status_is merge-torn $? 2
has merge-torn "$tmp/err" "torn file"
"$bin" batch "$tmp/set/good.list" --shard 7/9 -o "$tmp/empty-shard.jsonl" 2>/dev/null
status_is empty-shard $? 0
[ -f "$tmp/empty-shard.jsonl" ] && [ ! -s "$tmp/empty-shard.jsonl" ] && ok || bad "empty shard: empty output"

# A long run (20 grid graphs of ~10^6 edges, one thread): plain progress lines when stderr is
# not a terminal, none with --quiet; Ctrl-C leaves the old output whole and no temporary file.
awk -v R=700 -v C=700 -v G="$tmp/set/grid.graph" -v K="$tmp/set/grid.cert" -f "$(dirname "$0")/grid_pair.awk"
: >"$tmp/set/long.list"
for i in $(seq 20); do echo 'grid.graph grid.cert planar' >>"$tmp/set/long.list"; done
echo 'previous contents' >"$tmp/long.jsonl"
# The interrupted process must not run its exit handlers while its worker is inside a job
# (a coverage build's counter dump did, and recorded negative counts): a preloaded
# destructor (tests/preload/exit_mark.c) marks whether they ran.  ASan's runtime would
# otherwise refuse a library loaded before it.
${BUILD_CC:-cc} -shared -fPIC -o "$tmp/exit_mark.so" "$(dirname "$0")/preload/exit_mark.c"
# (Called in a subshell, which it replaces, so that $! is the binary's own process.)
exec_with_exit_mark() {
    exec env LD_PRELOAD="$tmp/exit_mark.so" PW_EXIT_MARK="$tmp/exit-mark" \
        ASAN_OPTIONS="${ASAN_OPTIONS:+$ASAN_OPTIONS:}verify_asan_link_order=0" "$@"
}
(exec_with_exit_mark "$bin" batch "$tmp/set/long.list" -j 1 -o "$tmp/long.jsonl" --progress-every 1 2>"$tmp/err") &
pid=$!
sleep 2.5
kill -INT "$pid"
wait "$pid"
status_is interrupted $? 130
[ -f "$tmp/exit-mark" ] && bad "interrupted: exit handlers ran while a job was running" || ok
has interrupted "$tmp/err" "interrupted; $tmp/long.jsonl was not written"
grep -Eq '^batch: [0-9]+/20 jobs done, [0-9]+ jobs/s' "$tmp/err" && ok || bad "no plain progress line"
[ "$(cat "$tmp/long.jsonl")" = 'previous contents' ] && ok || bad "interrupted run changed the output"
[ -z "$(ls "$tmp" | grep 'tmp-')" ] && ok || bad "interrupted run left a temporary file"
head -n 3 "$tmp/set/long.list" >"$tmp/set/three.list"
# The same probe on a run to the end: the mark is there, so its absence above means something.
(exec_with_exit_mark "$bin" batch "$tmp/set/three.list" -j 1 -o "$tmp/three.jsonl" --progress-every 1 --quiet 2>"$tmp/err")
status_is quiet $? 0
[ -f "$tmp/exit-mark" ] && ok || bad "exit mark: a batch run to the end left no mark"
grep -q 'jobs done' "$tmp/err" && bad "--quiet printed progress" || ok
has quiet-summary "$tmp/err" "result: all 3 jobs accepted"

finish batch
