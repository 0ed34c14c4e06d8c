# Sums `perf script -F period,ip,sym,dso` samples of one run of `planewit certify` or
# `planewit check` by phase and by where the time went (bench/certify_profile.sh).
# Variables: tool, family, run (copied to the output) and roots, the phase functions:
# "FUNCTION=PHASE ..." (a function may be inlined: its frame still names it).
# Output lines: "sample TOOL FAMILY RUN PHASE WHERE OURS NS", NS the sampled nanoseconds.
#   PHASE: the phase of the innermost phase function on the sample's stack, else "other".
#   WHERE: the innermost function that is not inlined; for time in the operating
#          system, "page-faults" when the stack holds a page fault (the system handing
#          out and zeroing fresh memory), else "system" (reading and writing files).
#   OURS:  1 when WHERE is in the planewit binary, so that its instructions can be
#          looked up in callgrind's counts; 0 for libraries and the system.
BEGIN {
    split(roots, pairs, " ")
    for (i in pairs) { split(pairs[i], kv, "="); phase_of[kv[1]] = kv[2] }
}
# "(/usr/lib/x86_64-linux-gnu/libcrypto.so.3)" -> "[libcrypto.so.3]": a library without symbols.
function library(dso) { sub(/^\(.*\//, "", dso); sub(/\)$/, "", dso); return "[" dso "]" }
function flush(    key) {
    if (period == "")
        return
    if (where == "") # no user frame unwound
        where = kernel_leaf ? (fault ? "page-faults" : "system") : "unknown"
    key = (phase == "" ? "other" : phase) SUBSEP where SUBSEP ours
    ns[key] += period
    period = ""
}
# A sample's first line: its period alone.
/^ *[0-9]+ *$/ { flush(); period = $1 + 0; phase = ""; where = ""; ours = 0; fault = 0; depth = 0; next }
# A frame, innermost first: "ADDR SYMBOL (DSO)" or "ADDR SYMBOL (inlined)".
NF >= 3 && period != "" {
    dso = $NF; sym = $2
    for (i = 3; i < NF; i++) sym = sym " " $i
    if (++depth == 1) kernel_leaf = dso == "([kernel.kallsyms])"
    if (sym ~ /exc_page_fault/) fault = 1
    if (where == "" && dso != "([kernel.kallsyms])" && dso != "(inlined)") {
        where = kernel_leaf ? (fault ? "page-faults" : "system") : sym == "[unknown]" ? library(dso) : sym
        ours = !kernel_leaf && dso ~ /\/planewit\)$/
    }
    if (phase == "" && sym in phase_of) phase = phase_of[sym]
    next
}
END {
    flush()
    for (key in ns) {
        split(key, part, SUBSEP)
        printf "sample %s %s %s %s %s %d %d\n", tool, family, run, part[1], part[2], part[3], ns[key]
    }
}
