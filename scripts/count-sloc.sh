#!/bin/sh
# Non-blank, non-comment lines of the C files below $1 (the kernel budget's measure).
find "$1" -name '*.[ch]' -print0 | xargs -0 cat | sed -e 's#//.*##' | awk '
BEGIN { c = 0 }
{
    line = $0; out = ""
    while (length(line) > 0) {
        if (c) { i = index(line, "*/"); if (i == 0) line = ""; else { line = substr(line, i + 2); c = 0 } }
        else   { i = index(line, "/*"); if (i == 0) { out = out line; line = "" } else { out = out substr(line, 1, i - 1); line = substr(line, i + 2); c = 1 } }
    }
    if (out ~ /[^ \t]/) n++
}
END { print n + 0 }'
