/*
 * differential.c - see differential.h.
 */
#include "differential.h"
#include "oracle.h"

#include <stdio.h>
#include <stdlib.h>

int differential_compare(fuzz_pair p, int fatal, pw_status *status)
{
    pw_limits lim;
    pw_verdict v;
    pw_limits_default(&lim);
    lim.max_vertices = DIFF_MAX_VERTICES;
    lim.max_edges = DIFF_MAX_EDGES;
    *status = pw_check(p.graph, p.graph_len, p.cert, p.cert_len, &lim, &v);
    if (v.code == PW_E_NOMEM)
        return 1;
    oracle_result o = oracle_judge(p.graph, p.graph_len, p.cert, p.cert_len, DIFF_MAX_VERTICES,
                                   DIFF_MAX_EDGES);
    if ((int)o.status == (int)v.status)
        return 1;
    fprintf(stderr,
            "differential: kernel says %d (%s, %s line %llu: %s), oracle says %d (%s)\n",
            (int)v.status, pw_code_name(v.code),
            v.file == PW_FILE_GRAPH ? "graph" : v.file == PW_FILE_CERT ? "certificate" : "-",
            (unsigned long long)v.line, v.detail, (int)o.status, o.why);
    if (fatal)
        abort();
    return 0;
}
