#!/bin/sh
# vectors/regen-sums.sh - rewrites vectors/SHA256SUMS from the files present now.
#
# Use it after adding or changing a vector, or after editing MANIFEST:
#     sh vectors/regen-sums.sh
#     git diff vectors/SHA256SUMS      # review: only the files you meant to touch
# and commit the vectors, MANIFEST and SHA256SUMS together.  The sums cover
# MANIFEST, MESSAGES and every file below vectors/graphs and vectors/certs, with paths
# relative to vectors/, in the format `sha256sum -c` reads:
#     (cd vectors && sha256sum -c SHA256SUMS)
# tests/test_vectors.c refuses to run any case while one line does not match.
set -eu
cd "$(dirname "$0")"
LC_ALL=C
export LC_ALL
files=$(find graphs certs -type f | sort)
# sha256sum escapes names holding '\' or a newline; keep names plain instead.
for f in $files; do
    case "$f" in
    *[!A-Za-z0-9._/-]*)
        echo "regen-sums.sh: $f: use only letters, digits, '.', '_', '-' in vector names" >&2
        exit 1
        ;;
    esac
done
# shellcheck disable=SC2086 # the names were checked above: no blanks, no globs
sha256sum MANIFEST MESSAGES $files > SHA256SUMS.new
mv SHA256SUMS.new SHA256SUMS
echo "vectors/SHA256SUMS: $(wc -l < SHA256SUMS) files; vector-set digest $(sha256sum SHA256SUMS | cut -d' ' -f1)"
