#!/bin/sh
# The exact verdict lines of vectors/MESSAGES: each case is looked up in
# vectors/MANIFEST, run with `planewit check GRAPH CERT` from vectors/ (so the
# paths print as the manifest gives them), and must print its line verbatim,
# with the exit status its first word implies.  Every bad-byte and
# number-range case of the manifest must have a line there.
# Usage: tests/check_messages.sh BUILD_DIR
set -u
bin=$(cd "${1:-build}" && pwd)/planewit
. "$(dirname "$0")/expect.sh"
vectors=$(cd "$(dirname "$0")/../vectors" && pwd)
messages=$vectors/MESSAGES
manifest=$vectors/MANIFEST

# The exit status a verdict line's first word stands for (README.md, Exit codes).
status_of() {
    case $1 in
    accepted:*) echo 0 ;;
    rejected:*) echo 1 ;;
    *) echo 2 ;;
    esac
}

cases=0
grep -v '^#' "$messages" | grep -v '^[[:space:]]*$' >"$tmp/messages"
while read -r name want; do
    cases=$((cases + 1))
    # shellcheck disable=SC2046 # the manifest's fields hold no blanks or globs
    set -- $(grep "^$name[[:space:]]" "$manifest")
    if [ $# -lt 3 ]; then
        bad "$name: not a case of vectors/MANIFEST"
        continue
    fi
    (cd "$vectors" && "$bin" check "$2" "$3") >"$tmp/out" 2>&1
    status_is "$name: exit status" $? "$(status_of "$want")"
    if grep -qxF -- "$want" "$tmp/out"; then ok; else
        bad "$name: no line reads exactly"
        echo "    want: $want"
        show "$tmp/out" | head -n 2
    fi
done <"$tmp/messages"
[ "$cases" -ge 40 ] && ok || bad "only $cases cases in vectors/MESSAGES"

# Coverage: the byte and number-range rules each have their exact text asserted.
awk '!/^#/ && ($5 == "bad-byte" || $5 == "number-range") { print $1 }' "$manifest" >"$tmp/wanted"
while read -r name; do
    if grep -q "^$name[[:space:]]" "$tmp/messages"; then ok; else
        bad "$name: a $(awk -v n="$name" '$1 == n { print $5 }' "$manifest") case without a line in vectors/MESSAGES"
    fi
done <"$tmp/wanted"

finish check_messages
