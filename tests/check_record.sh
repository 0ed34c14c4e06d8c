#!/bin/sh
# End-to-end tests of sign-off records (format-spec/signoff-record.md):
# fields, digests against sha256sum, the canonical graph digest against an
# independent shell pipeline, and whole-or-nothing writing.
# Usage: tests/check_record.sh BUILD_DIR
set -u
bin=${1:-build}/planewit
. "$(dirname "$0")/expect.sh"

# The normal form computed without planewit (sed, awk, sort, sha256sum).
normal_form_sha() {
    sed -e 's/#.*//' -e 's/\r$//' "$1" | awk 'NF' |
        awk 'NR == 1 { print $1, $2, $3; next }
             { if ($1 + 0 < $2 + 0) print $1, $2; else print $2, $1 }' |
        { read -r header; echo "$header"; sort -n -k1,1 -k2,2; } | sha256sum | cut -c1-64
}
# The value of "key": "HEX" or "key":"HEX" in a record (first match).
field() { tr ',{}' '\n\n\n' <"$2" | sed -n "s/^ *\"$1\": *\"\([^\"]*\)\".*/\1/p" | head -n 1; }

printf 'graph 4 5\n0 1\n1 2\n2 3\n3 0\n0 2\n' >"$tmp/a.graph"
# The same labelled graph: other order, reversed pairs, comments, tabs, CRLF.
printf '# same graph, another layout\r\ngraph 4 5\r\n2\t0\r\n3 2 # edge\r\n\r\n1 0\r\n2 1\r\n0 3' >"$tmp/b.graph"
# Another graph: one edge differs.
printf 'graph 4 5\n0 1\n1 2\n2 3\n3 0\n1 3\n' >"$tmp/c.graph"
cert='certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 2 0\naround 2 : 3 0 1\naround 3 : 0 2\n'
printf "$cert" >"$tmp/a.cert"

run accepted-record 0 "$bin" check "$tmp/a.graph" "$tmp/a.cert" --record "$tmp/a.json" --note 'rev C, "single" layer'
has record-kind "$tmp/a.json" '"record": "planewit-signoff"'
has record-note "$tmp/a.json" '"note": "rev C, \"single\" layer"'
has record-verdict "$tmp/a.json" '"verdict":"accepted"'
has record-caution "$tmp/a.json" 'qualified reviewers still decide'
has record-flags "$tmp/a.json" '"build_flags":"'
has record-form "$tmp/a.json" '"form": "planewit-graph-normal-form-1"'
grep -qE '"time_utc": "[0-9]{4}-[0-9]{2}-[0-9]{2}T[0-9]{2}:[0-9]{2}:[0-9]{2}Z"' "$tmp/a.json" && ok || bad "time_utc format"
/usr/bin/python3 -m json.tool "$tmp/a.json" >/dev/null 2>&1 && ok || bad "record is not valid JSON"

# Digests against sha256sum (common practice: FIPS 180-4 SHA-256).
want=$(sha256sum "$bin" | cut -c1-64)
[ "$(field executable_sha256 "$tmp/a.json")" = "$want" ] && ok || bad "executable_sha256 differs from sha256sum of $bin"
want=$(sha256sum "$tmp/a.graph" | cut -c1-64)
grep -qF "\"sha256\":\"$want\"" "$tmp/a.json" && ok || bad "graph sha256 differs from sha256sum"

# Canonical digest: equal to the independent pipeline, equal across layouts, different for another graph.
canon_a=$(tr ',{}' '\n\n\n' <"$tmp/a.json" | sed -n 's/^ *"sha256": "\([0-9a-f]*\)".*/\1/p')
[ -n "$canon_a" ] && [ "$canon_a" = "$(normal_form_sha "$tmp/a.graph")" ] && ok ||
    bad "canonical digest '$canon_a' differs from the shell pipeline's $(normal_form_sha "$tmp/a.graph")"
"$bin" check "$tmp/b.graph" "$tmp/a.cert" --record "$tmp/b.json" >/dev/null 2>&1
canon_b=$(tr ',{}' '\n\n\n' <"$tmp/b.json" | sed -n 's/^ *"sha256": "\([0-9a-f]*\)".*/\1/p')
[ "$canon_b" = "$canon_a" ] && ok || bad "same graph in another layout: canonical digest $canon_b, expected $canon_a"
[ "$(normal_form_sha "$tmp/b.graph")" = "$canon_a" ] && ok || bad "shell pipeline disagrees on the other layout"
run rejected-record 1 "$bin" check "$tmp/c.graph" "$tmp/a.cert" --record "$tmp/c.json"
has rejected-record "$tmp/c.json" '"verdict":"rejected"'
canon_c=$(tr ',{}' '\n\n\n' <"$tmp/c.json" | sed -n 's/^ *"sha256": "\([0-9a-f]*\)".*/\1/p')
[ -n "$canon_c" ] && [ "$canon_c" != "$canon_a" ] && ok || bad "another graph has the same canonical digest"

# An unusable graph: the record says so and has no canonical digest.
printf 'graph 3 2\n0 1\n1 1\n' >"$tmp/loop.graph"
run unusable-record 2 "$bin" check "$tmp/loop.graph" "$tmp/a.cert" --record "$tmp/loop.json"
has unusable-canonical "$tmp/loop.json" '"sha256": null}'

# Usage errors, and a record that cannot be written leaves nothing behind.
run note-alone 2 "$bin" check "$tmp/a.graph" "$tmp/a.cert" --note x
has note-alone "$tmp/out" "give --record FILE"
run record-no-value 2 "$bin" check "$tmp/a.graph" "$tmp/a.cert" --record
run unwritable 2 "$bin" check "$tmp/a.graph" "$tmp/a.cert" --record "$tmp/no/such/dir/r.json"
has unwritable "$tmp/out" "not written"
# Overwriting keeps a whole file: the new record replaces the old one, no temporary is left.
"$bin" check "$tmp/c.graph" "$tmp/a.cert" --record "$tmp/a.json" >/dev/null 2>&1
has overwritten "$tmp/a.json" '"verdict":"rejected"'
[ -z "$(ls "$tmp" | grep '\.tmp-')" ] && ok || bad "a temporary file was left behind"

# Paths are bytes: in a record quote and backslash are escaped (RFC 8259 JSON strings), well-formed
# UTF-8 is kept, a stray byte or a control byte becomes \u00XX (json_string writes runs whole).
odd="$tmp/$(printf 'q"b\\\303\251\377\001x').graph"
cp "$tmp/a.graph" "$odd"
run odd-path 0 "$bin" check "$odd" "$tmp/a.cert" --record "$tmp/odd.json"
has odd-path "$tmp/odd.json" "$(printf '"path":"%s/q\\"b\\\\\303\251\\u00ff\\u0001x.graph"' "$tmp")"

finish record
