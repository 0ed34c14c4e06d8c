# Renders bench/certify_profile.sh's raw lines into bench/results-certify-profile.md.
# Input: "graph FAMILY N M"
#        "sample TOOL FAMILY RUN PHASE WHERE OURS NS" (perf, TOOL certify or check;
#        summed over the runs here)
#        "count FAMILY PHASE FUNCTION INSTRUCTIONS" (callgrind, self; summed over lines)
# Variables: runs, freq, date, cpu, lb, la (load before, after), min.
$1 == "graph" { fam[++nf] = $2; n[$2] = $3; m[$2] = $4 }
$1 == "sample" && $2 == "check" { ms = $8 / 1e6 / runs; check_total[$3] += ms; check_phase[$3, $5] += ms }
$1 == "sample" && $2 == "certify" {
    f = $3; ph = $5; ms = $8 / 1e6 / runs
    total[f] += ms; phase[f, ph] += ms
    if ($6 == "page-faults") faults[f, ph] += ms
    if (ph == "algorithm") { run_alg[f, $4] += ms; if ($6 == "page-faults") run_faults[f, $4] += ms }
    k = f SUBSEP ph SUBSEP $6
    if (!(k in spent)) where[f, ph, ++nwhere[f, ph]] = $6
    spent[k] += ms; ours[k] = $7
}
$1 == "count" { instructions[$2, $3, $4] += $5 }
# A table's head: the names, "|"-separated; the first `text` columns text, the others numbers.
function head(names, text,    col, k, i, sep) {
    k = split(names, col, "|"); sep = "|"
    for (i = 1; i <= k; i++) sep = sep (i <= text ? "---|" : "---:|")
    gsub(/\|/, " | ", names); print "| " names " |"; print sep
}
function ratio(a, b) { return b > 0 ? sprintf("%.2f", a / b) : "-" }
function share(part, whole) { return whole > 0 ? sprintf("%.0f%%", 100 * part / whole) : "-" }
# The functions of phase ph of family f, most time first, down to 2% of the phase.
function by_function(f, ph,    i, j, k, t, order, count, fn, ir, per_instr) {
    count = nwhere[f, ph]
    for (i = 1; i <= count; i++) order[i] = where[f, ph, i]
    for (i = 2; i <= count; i++) # insertion sort: a few dozen names
        for (j = i; j > 1 && spent[f, ph, order[j]] > spent[f, ph, order[j - 1]]; j--) {
            t = order[j]; order[j] = order[j - 1]; order[j - 1] = t
        }
    for (i = 1; i <= count; i++) {
        fn = order[i]; k = f SUBSEP ph SUBSEP fn
        if (spent[k] < 0.02 * phase[f, ph])
            break
        ir = (ours[k] && ((f, ph, fn) in instructions)) ? instructions[f, ph, fn] : 0
        per_instr = ir > 0 ? sprintf("%.2f", spent[k] * 1e6 / ir) : "-"
        printf "| %s | %s | %s | %.1f | %s | %.0f | %s | %s |\n", f, ph, fn, spent[k],
            share(spent[k], phase[f, ph]), spent[k] * 1e6 / m[f],
            (ir > 0 ? sprintf("%.0f", ir / m[f]) : "-"), per_instr
    }
}
# A phase with no sample at all: a phase function renamed (bench/tools.sh names them),
# or a run too short to sample.  Nothing is written then.
function require(f, what, ms) {
    if (ms > 0)
        return
    printf "certify_profile: no samples in %s on %s (a phase function renamed? see bench/tools.sh)\n", what, f > "/dev/stderr"
    failed = 1
}
END {
    for (i = 1; i <= nf; i++) {
        require(fam[i], "certify's parse", phase[fam[i], "parse"])
        require(fam[i], "certify's algorithm", phase[fam[i], "algorithm"])
        require(fam[i], "check's parse", check_phase[fam[i], "parse"])
    }
    if (failed)
        exit 1
    split("read parse hash algorithm text self-check write other", phases, " ")
    split("read parse hash cert-parse verify other", check_phases, " ")
    print "# Where certify's time goes (bench/certify_profile.sh, `make bench-certify-profile`)"
    print ""
    printf "Run on %s, %s CPUs; about %s minutes. Load average (1, 5, 15 min) before: %s; after: %s.\n", date, cpu, min, lb, la
    print "Inputs: bench/certify_gen.c's six families, seed 20240603, our own invented data, vertex"
    print "ids shuffled and edges in random order (described in bench/results-certify.md)."
    printf "Each family is certified by the shipped `planewit certify` %s times under `perf record -e\n", runs
    printf "cpu-clock -F %s --call-graph dwarf`; the samples of the runs are summed and divided by\n", freq
    print "the runs. A sample belongs to the innermost phase function on its stack: read"
    print "(cli_read_input, both readings), parse (pw_graph_parse), hash (cli_sha256), algorithm"
    print "(pp_certify), text (pp_cert_text), self-check (pw_check_parsed, its hashing included),"
    print "write (write_certificate); *other* is start-up, exit and the memory policy. Sampling"
    print "and its call stacks slow the process a little; shares matter here, not absolute times"
    print "(those are in bench/results-certify.md)."
    print ""
    printf "## Time by phase (ms per run, share of the process)\n\n"
    head("family|N|M|process|read|parse|hash|algorithm|text|self-check|write|other", 1)
    for (i = 1; i <= nf; i++) {
        f = fam[i]; printf "| %s | %s | %s | %.0f", f, n[f], m[f], total[f]
        for (p = 1; p <= 8; p++) printf " | %.0f (%s)", phase[f, phases[p]], share(phase[f, phases[p]], total[f])
        print " |"
    }
    print ""
    print "## The part of each phase spent faulting in fresh memory (ms per run, share of the phase)"
    print ""
    print "Samples whose stack holds a page fault: the operating system finding and zeroing memory the"
    print "process touches for the first time (2 MB pages under certify's memory policy)."
    print ""
    head("family|read|parse|hash|algorithm|text|self-check|write|other|algorithm, each run", 1)
    for (i = 1; i <= nf; i++) {
        f = fam[i]; printf "| %s", f
        for (p = 1; p <= 8; p++) printf " | %.0f (%s)", faults[f, phases[p]], share(faults[f, phases[p]], phase[f, phases[p]])
        sep = " | "
        for (r = 1; r <= runs; r++) { printf "%s%s", sep, share(run_faults[f, r], run_alg[f, r]); sep = ", " }
        print " |"
    }
    print ""
    print "## check of the same certificate, by phase (ms per run)"
    print ""
    print "`planewit check GRAPH CERT` on the certificate certify wrote, profiled the same way. Its"
    print "phases: read (both files), parse (the graph), hash (both files' SHA-256, which the"
    print "verdict binds), cert-parse, verify (the rotation's faces or the subdivision's paths)."
    print "*floor / certify*: read + parse + hash, which any check of these files must do (the"
    print "verdict binds both files' bytes), over certify's whole process above: check / certify"
    print "cannot go below it unless reading, parsing or hashing get faster."
    print ""
    head("family|check|read|parse|hash|cert-parse|verify|other|check / certify|floor / certify", 1)
    for (i = 1; i <= nf; i++) {
        f = fam[i]; printf "| %s | %.0f", f, check_total[f]
        for (p = 1; p <= 6; p++) printf " | %.0f", check_phase[f, check_phases[p]]
        floor = check_phase[f, "read"] + check_phase[f, "parse"] + check_phase[f, "hash"]
        printf " | %s | %s |\n", ratio(check_total[f], total[f]), ratio(floor, total[f])
    }
    print ""
    print "## Parse and algorithm by function"
    print ""
    print "*ms*: time in the function itself (the innermost function not inlined; inlined"
    print "code counts to the function it was inlined into, in perf as in callgrind). *page-faults*"
    print "and *system*: time in the operating system called from the phase. *instr/edge*: callgrind's count"
    print "of the function's own instructions in that phase, one run, over M. *ns/instr*: the two together; a"
    print "function that computes from its caches runs well under 1 ns per instruction, one that"
    print "waits on memory at random places far above. Functions under 2% of their phase left out."
    print ""
    head("family|phase|function|ms|share of phase|ns/edge|instr/edge|ns/instr", 3)
    for (i = 1; i <= nf; i++) { by_function(fam[i], "parse"); by_function(fam[i], "algorithm") }
}
