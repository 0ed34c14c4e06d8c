#!/bin/sh
# Counts of planar graphs, found by `planewit certify --graph6 - --summary` on
# every graph nauty's geng (Debian package nauty) generates, compared with the
# published sequences.  Every graph's certificate is checked by the kernel in
# the same run, so a count here is a count of kernel-accepted proofs.
# Usage: tests/check_certify_counts.sh BUILD_DIR [MAX_N]   (MAX_N defaults to 9)
set -u
bin=${1:-build}/planewit
max=${2:-9}
pass=0
fail=0

# The published values, n = 1..9 (index 1 is n = 1).
A000088="1 2 4 11 34 156 1044 12346 274668"   # OEIS A000088: graphs on n vertices
A005470="1 2 4 11 33 142 822 6966 79853"      # OEIS A005470: planar graphs on n vertices
A001349="1 1 2 6 21 112 853 11117 261080"     # OEIS A001349: connected graphs on n vertices
A003094="1 1 2 6 20 99 646 5974 71885"        # OEIS A003094: connected planar graphs on n vertices
A000109="- - - 1 1 2 5 14 50"                 # OEIS A000109: triangulations (maximal planar), n = 4..9

nth() { echo "$2" | cut -d' ' -f"$1"; }

# count NAME WANT_T WANT_P SOURCE-OF-P GENG-ARGS... ; WANT_T "-" skips the total.
count() {
    name=$1 want_t=$2 want_p=$3 source=$4
    shift 4
    start=$(date +%s.%N)
    out=$(nauty-geng -q "$@" | "$bin" certify --graph6 - --summary --witness "$witness")
    status=$?
    secs=$(awk -v a="$start" -v b="$(date +%s.%N)" 'BEGIN { printf "%.2f", b - a }')
    last=$(printf '%s\n' "$out" | tail -n 1)
    t=$(echo "$last" | sed -n 's/^graphs=\([0-9]*\) planar=\([0-9]*\) nonplanar=\([0-9]*\)$/\1/p')
    p=$(echo "$last" | sed -n 's/^graphs=\([0-9]*\) planar=\([0-9]*\) nonplanar=\([0-9]*\)$/\2/p')
    q=$(echo "$last" | sed -n 's/^graphs=\([0-9]*\) planar=\([0-9]*\) nonplanar=\([0-9]*\)$/\3/p')
    split=$(printf '%s\n' "$out" | awk -F': ' '/^nonplanar by [a-z0-9-]*: [0-9]+$/ { s += $2 } END { print s + 0 }')
    if [ "$status" -ne 0 ] || [ -z "$t" ]; then
        echo "FAIL $name: exit $status, last line '$last'"; fail=$((fail + 1))
    elif [ "$p" != "$want_p" ]; then
        echo "FAIL $name: planar=$p, $source gives $want_p"; fail=$((fail + 1))
    elif [ "$want_t" != - ] && [ "$t" != "$want_t" ]; then
        echo "FAIL $name: graphs=$t, expected $want_t"; fail=$((fail + 1))
    elif [ $((t - p)) -ne "$q" ] || [ "${split:-0}" -ne "$q" ]; then
        echo "FAIL $name: nonplanar=$q, by kind $split, graphs - planar = $((t - p))"; fail=$((fail + 1))
    else
        echo "ok $name: $last ($source) ${secs}s"; pass=$((pass + 1))
    fi
}

for witness in subdivision cheapest; do
    for n in $(seq 1 "$max"); do
        # The cheapest-witness pass repeats the small sizes only, to keep CI time down.
        [ "$witness" = cheapest ] && [ "$n" -gt 8 ] && continue
        count "all-n$n-$witness" "$(nth "$n" "$A000088")" "$(nth "$n" "$A005470")" "OEIS A005470" "$n"
        count "connected-n$n-$witness" "$(nth "$n" "$A001349")" "$(nth "$n" "$A003094")" \
            "OEIS A003094" -c "$n"
        if [ "$n" -ge 4 ]; then
            e=$((3 * n - 6))
            count "triangulations-n$n-$witness" - "$(nth "$n" "$A000109")" "OEIS A000109" \
                "$n" "$e:$e"
        fi
    done
done

echo "check_certify_counts: $pass passed, $fail failed"
[ "$fail" -eq 0 ]
