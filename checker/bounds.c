/*
 * bounds.c - non-planarity from edge counts alone.
 *
 * Why acceptance implies non-planarity: a simple planar graph with N >= 3
 * vertices has at most 3N - 6 edges, since every face of a plane drawing is
 * bounded by at least three edge sides and each edge has two sides (Euler's
 * formula turns 2E >= 3F into E <= 3N - 6).  When every edge joins the two
 * sides of a bipartition there is no triangle, every face needs four edge
 * sides, and the bound becomes 2N - 4.  The side line is checked against every
 * edge, so the graph really is bipartite.
 *
 * Check order (bipartite): number of side lines, number of entries, values,
 * the bound, then the edges in file order.
 */
#include "internal.h"

int pw_check_edge_bound(const pw_graph *g, const pw_cert *c, pw_verdict *v)
{
    int64_t n = g->n, m = g->m;
    if (n < 3 || m <= 3 * n - 6)
        return pw_fail(v, PW_R_EDGE_BOUND, PW_FILE_CERT, c->head_line,
                       "N = %lld and M = %lld: need N >= 3 and M > 3N - 6 = %lld", (long long)n,
                       (long long)m, (long long)(3 * n - 6));
    return 0;
}

static int check_side_line(const pw_graph *g, const pw_cert *c, pw_verdict *v)
{
    if (c->n_items != 1)
        return pw_fail(v, PW_R_WITNESS_LINES, PW_FILE_CERT, c->head_line,
                       "bipartite-edge-bound needs exactly one side line, found %u", c->n_items);
    const pw_item *it = &c->items[0];
    if (it->count != g->n)
        return pw_fail(v, PW_R_SIDE_COUNT, PW_FILE_CERT, it->line,
                       "%u sides given for %u vertices", it->count, g->n);
    for (uint32_t k = 0; k < it->count; k++)
        if (c->values[it->start + k] > 1)
            return pw_fail(v, PW_R_SIDE_VALUE, PW_FILE_CERT, it->line,
                           "the side of vertex %u is neither 0 nor 1", k);
    return 0;
}

int pw_check_bipartite_bound(const pw_graph *g, const char *graph, size_t graph_len,
                             const pw_cert *c, pw_verdict *v)
{
    int64_t n = g->n, m = g->m;
    if (check_side_line(g, c, v) != 0)
        return -1;
    if (n < 3 || m <= 2 * n - 4)
        return pw_fail(v, PW_R_BIPARTITE_BOUND, PW_FILE_CERT, c->head_line,
                       "N = %lld and M = %lld: need N >= 3 and M > 2N - 4 = %lld", (long long)n,
                       (long long)m, (long long)(2 * n - 4));
    const uint32_t *side = pw_item_values(c, &c->items[0]);
    for (uint32_t e = 0; e < g->m; e++) {
        uint32_t a = g->ends[2 * (size_t)e], b = g->ends[2 * (size_t)e + 1];
        if (side[a] == side[b])
            return pw_fail(v, PW_R_SIDE_EDGE, PW_FILE_CERT, c->items[0].line,
                           "edge %u %u (graph line %llu) has both ends on side %u", a, b,
                           (unsigned long long)pw_graph_edge_line(graph, graph_len, e), side[a]);
    }
    return 0;
}
