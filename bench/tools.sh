# shellcheck shell=sh
# bench/tools.sh - sourced (not run) by the benchmark scripts and by
# tests/check_bench_tools.sh, so the suite builds the benchmark programs exactly
# as the benchmarks do: how a bench/*.c program is built, and reading one
# key=value field of the lines the programs print.
# bench_cc and bench_cflags may be set before sourcing (the suite passes the
# build's own compiler and options, so that sanitizer or coverage objects link).
bench_cc=${bench_cc:-cc}
bench_cflags=${bench_cflags:-"-O2 -g"}

# bench_build NAME OUT_DIR BUILD_DIR: bench/NAME.c into OUT_DIR/NAME, linked with the
# build's producer objects, its memory policy (cli/heap.c) and kernel library.
bench_build() {
    # shellcheck disable=SC2086 # bench_cflags is a list of words on purpose
    "$bench_cc" -std=c11 -D_POSIX_C_SOURCE=200809L -Wall -Wextra -Werror $bench_cflags \
        -Ichecker -Iproducer -Icli -o "$2/$1" "bench/$1.c" "$3"/producer/*.o "$3/cli/heap.o" \
        "$3/libplanewit-check.a" -lcrypto -lm
}

# field LINE KEY: the value of KEY=value in a line of key=value pairs.
field() { printf '%s\n' "$1" | tr ' ' '\n' | sed -n "s/^$2=//p"; }

# callgrind_lines FILE INCLUSIVE: "FUNCTION INSTRUCTIONS" for each function line of
# callgrind_annotate's listing of FILE (INCLUSIVE yes or no), in its order.  One
# function may come on several lines, one per source file its code came from.
callgrind_lines() {
    callgrind_annotate --inclusive="$2" --threshold=100 --auto=no "$1" |
        awk '$1 ~ /^[0-9,]+$/ && $2 ~ /^\(/ && index($0, ":") {
                 fn = $0; sub(/ \[.*$/, "", fn); sub(/^.*:/, "", fn); ir = $1; gsub(/,/, "", ir)
                 if (fn !~ / /) print fn, ir
             }'
}

# profile_roots certify|check: the phase functions of that planewit command,
# FUNCTION=PHASE ..., for bench/certify_profile.sh: a sample belongs to the innermost
# one on its stack.  The suite checks that every function named here is still defined.
profile_roots() {
    case $1 in
    certify) echo "cli_read_input=read pw_graph_parse=parse cli_sha256=hash pp_certify=algorithm" \
        "pp_cert_text=text pw_check_parsed=self-check write_certificate=write" ;;
    check) echo "cli_read_input=read pw_graph_parse=parse digests=hash pw_cert_parse=cert-parse" \
        "pw_check_rotation=verify pw_check_subdivision=verify" ;;
    esac
}

# bench_start: notes the time and the load averages, for bench_render's header.
bench_start() {
    bench_started=$(date +%s)
    bench_load_before=$(cut -d' ' -f1-3 /proc/loadavg)
}

# bench_render AWK RAW OUT [AWK_OPTIONS...]: RAW rendered by the awk program AWK
# into OUT, through a temporary file so that OUT is never left half-written.  The
# program sees date, cpu, lb and la (the load averages at bench_start and now),
# min (minutes since bench_start) and AWK_OPTIONS (-v name=value ...).
bench_render() {
    render_awk=$1 render_raw=$2 render_out=$3
    shift 3
    if ! awk -v date="$(date -u +%Y-%m-%d)" -v cpu="$(nproc)" -v lb="$bench_load_before" \
        -v la="$(cut -d' ' -f1-3 /proc/loadavg)" \
        -v min="$(( ($(date +%s) - bench_started + 59) / 60 ))" \
        "$@" -f "$render_awk" "$render_raw" >"$render_out.tmp"; then
        rm -f "$render_out.tmp"
        return 1
    fi
    mv "$render_out.tmp" "$render_out"
    echo "wrote $render_out" >&2
}
