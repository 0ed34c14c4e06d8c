#!/bin/sh
# End-to-end tests of `planewit seal` and `planewit audit` (format-spec/seal.md):
# the sums agree with `sha256sum -c` (GNU coreutils, an outside check), every
# change, addition and removal is named, and certificates are re-checked.
# Usage: tests/check_seal.sh BUILD_DIR
set -u
bin=$(cd "$(dirname "${1:-build}/planewit")" && pwd)/planewit
. "$(dirname "$0")/expect.sh"
sums_agree() { # NAME EXPECTED: sha256sum -c passes (0) or fails (1) in the archive
    (cd "$a" && sha256sum --quiet -c SHA256SUMS) >"$tmp/sc" 2>&1
    got=$?
    [ "$got" -ne 0 ] && got=1
    [ "$got" -eq "$2" ] && ok || { bad "$1: sha256sum -c exit $got, expected $2"; show "$tmp/sc"; }
}

a="$tmp/archive"
mkdir -p "$a/boards/rev-c" "$a/chips"
printf 'graph 3 3\n0 1\n1 2\n2 0\n' >"$a/boards/rev-c/tri.graph"
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 1\n' >"$a/boards/rev-c/tri.cert"
printf 'certificate 1\nclaim planar\naround 0 : 2 1\naround 1 : 0 2\naround 2 : 1 0\n' >"$a/boards/rev-c/tri.mirror.cert"
# K5: 10 edges > 3 * 5 - 6 (common practice: the planar edge bound).
printf 'graph 5 10\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n' >"$a/chips/k5.graph"
printf 'certificate 1\nclaim nonplanar\nedge-bound\n' >"$a/chips/k5.cert"
printf 'certificate 1\nclaim nonplanar\nedge-bound\n' >"$a/chips/orphan.cert"
echo 'review notes (invented scenario)' >"$a/notes.txt"

run seal 0 "$bin" seal "$a"
has seal "$tmp/out" "7 files in SHA256SUMS"
has seal "$tmp/out" "3 pairs checked, 3 accepted, 0 not; 1 certificates without a graph"
[ "$(wc -l <"$a/SHA256SUMS")" -eq 7 ] && ok || bad "SHA256SUMS has 7 lines"
grep -q 'seal.json\|SHA256SUMS$' "$a/SHA256SUMS" && bad "SHA256SUMS lists itself or the seal record" || ok
sums_agree sealed 0
# The seal record names the sums' digest as sha256sum computes it (common practice: FIPS 180-4).
grep -qF "\"sums_sha256\": \"$(sha256sum "$a/SHA256SUMS" | cut -c1-64)\"" "$a/seal.json" && ok ||
    bad "seal.json sums_sha256 differs from sha256sum"
grep -qF '"certificate": "boards/rev-c/tri.mirror.cert", "verdict": "accepted"' "$a/seal.json" && ok ||
    bad "tri.mirror.cert pairs with tri.graph"
/usr/bin/python3 -m json.tool "$a/seal.json" >/dev/null 2>&1 && ok || bad "seal.json is not JSON"
run audit-intact 0 "$bin" audit "$a"
has audit-intact "$tmp/out" "7 files verified, 0 changed, 0 added, 0 removed; seal record matches"
has audit-intact "$tmp/out" ": intact"

# A changed byte: both audit and sha256sum -c fail and name the same file.
printf 'graph 3 3\n0 1\n1 2\n0 2\n' >"$a/boards/rev-c/tri.graph"
run changed 1 "$bin" audit "$a"
has changed "$tmp/out" "changed: boards/rev-c/tri.graph"
has changed "$tmp/out" "NOT INTACT"
sums_agree changed 1
grep -q '^boards/rev-c/tri.graph: FAILED' "$tmp/sc" && ok || bad "sha256sum -c names another file"
printf 'graph 3 3\n0 1\n1 2\n2 0\n' >"$a/boards/rev-c/tri.graph"
run restored 0 "$bin" audit "$a"
sums_agree restored 0

# Removed and added files (sha256sum -c sees the removal only).
mv "$a/notes.txt" "$tmp/notes.txt"
echo extra >"$a/chips/extra.txt"
run removed-added 1 "$bin" audit "$a"
has removed-added "$tmp/out" "removed: notes.txt"
has removed-added "$tmp/out" "added: chips/extra.txt"
grep -q " 0 changed, 1 added, 1 removed" "$tmp/out" && ok || bad "removed-added: counts"
sums_agree removed 1
mv "$tmp/notes.txt" "$a/notes.txt"
rm "$a/chips/extra.txt"

# A certificate that no longer checks, resealed: seal says so, audit fails on it.
printf 'certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 9\n' >"$a/boards/rev-c/tri.mirror.cert"
run seal-bad-pair 1 "$bin" seal "$a"
has seal-bad-pair "$tmp/out" "does not check: boards/rev-c/tri.graph + boards/rev-c/tri.mirror.cert: rejected"
run audit-bad-pair 1 "$bin" audit "$a"
has audit-bad-pair "$tmp/out" "[vertex-range]"
has audit-bad-pair "$tmp/out" "0 changed, 0 added, 0 removed"
sums_agree resealed 0
printf 'certificate 1\nclaim planar\naround 0 : 2 1\naround 1 : 0 2\naround 2 : 1 0\n' >"$a/boards/rev-c/tri.mirror.cert"
run reseal 0 "$bin" seal "$a"

# SHA256SUMS edited to hide a change: the seal record catches it.
echo 'edited' >"$a/notes.txt"
sed -i "s/^[0-9a-f]*  notes.txt\$/$(sha256sum "$a/notes.txt" | cut -c1-64)  notes.txt/" "$a/SHA256SUMS"
sums_agree edited-sums 0
run edited-sums 1 "$bin" audit "$a"
has edited-sums "$tmp/out" "changed: SHA256SUMS (its digest is not the one in seal.json)"
rm "$a/seal.json"
run no-seal-record 1 "$bin" audit "$a"
has no-seal-record "$tmp/out" "missing: seal.json"

# Malformed or missing sums, special files, usage.
printf 'not a sum line\n' >"$a/SHA256SUMS"
run bad-sums 2 "$bin" audit "$a"
has bad-sums "$tmp/out" "SHA256SUMS line 1: expected 64 lowercase hex digits"
rm "$a/SHA256SUMS"
run no-sums 2 "$bin" audit "$a"
has no-sums "$tmp/out" "SHA256SUMS: cannot open"
ln -s ../notes.txt "$a/chips/link.txt"
run symlink 2 "$bin" seal "$a"
has symlink "$tmp/out" "chips/link.txt: not a regular file or folder"
[ ! -e "$a/SHA256SUMS" ] && ok || bad "symlink: SHA256SUMS written anyway"
run usage 2 "$bin" seal
run missing-dir 2 "$bin" seal "$tmp/nowhere"

finish seal
