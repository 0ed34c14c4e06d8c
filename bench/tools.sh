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
