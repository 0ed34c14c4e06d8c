#!/bin/sh
# Fresh-machine entry point (Debian): installs whatever is missing, builds,
# then runs the bundled demo or the whole test suite.
# Usage: sh scripts/run.sh demo | sh scripts/run.sh test
set -eu
cd "$(dirname "$0")/.."
need="gcc make libc6-dev pkg-config libssl-dev"
case "${1:-}" in
    demo) ;;
    test) need="$need clang libcmocka-dev python3 python3-networkx nauty g++ libboost-graph-dev libxml2-utils librsvg2-bin
                gcovr valgrind cppcheck clang-tidy" ;;
    *) echo "usage: sh scripts/run.sh demo|test" >&2; exit 2 ;;
esac
missing=""
for pkg in $need; do
    dpkg-query -W -f='${Status}' "$pkg" 2>/dev/null | grep -q "install ok installed" ||
        missing="$missing $pkg"
done
if [ -n "$missing" ]; then
    echo "installing:$missing"
    sudo=""
    [ "$(id -u)" -eq 0 ] || sudo=sudo
    $sudo apt-get update -qq
    DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends $missing
fi
make -s
if [ "$1" = demo ]; then
    exec make -s demo
fi
# The same code must also build warning-free under clang.
make -s CC=clang BUILD=build-clang build-clang/planewit
make -s check
# The kernel's hardening gates (bench/results-hardening.md): the suite again under
# ASan + UBSan with fault injection, the differential run and every fuzz seed
# replayed; the kernel's tests under valgrind; 100% of checker/'s lines and 95% of
# its branches covered; cppcheck and clang-tidy clean; a short libFuzzer smoke.
make -s sanitize
make -s valgrind
make -s coverage-enforce
make -s lint
make -s fuzz FUZZ_SECONDS=10
