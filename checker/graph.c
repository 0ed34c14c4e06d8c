/*
 * graph.c - the graph file (format-spec/graph.md) into a pw_graph.
 *
 *     graph N M
 *     U V        exactly M lines; U, V < N; U != V; no unordered pair twice
 *
 * Memory is sized from the bytes actually present: the edge array never holds
 * more than one edge per three bytes of input, whatever M claims, and vertex
 * arrays stop at the largest id an edge uses.
 */
#include "internal.h"

#include <assert.h>
#include <stdlib.h>
#include <string.h>

void pw_graph_free(pw_graph *g)
{
    free(g->ends);
    free(g->first);
    free(g->darts);
    memset(g, 0, sizeof *g);
}

uint32_t pw_degree(const pw_graph *g, uint32_t v)
{
    return v < g->n_adj ? g->first[v + 1] - g->first[v] : 0;
}

int pw_adjacent(const pw_graph *g, uint32_t a, uint32_t b)
{
    if (a >= g->n_adj)
        return 0;
    for (uint32_t i = g->first[a]; i < g->first[a + 1]; i++)
        if (g->ends[g->darts[i] ^ 1u] == b)
            return 1;
    return 0;
}

static int read_count(pw_lexer *lx, const char *what, uint32_t limit, const char *flag, uint32_t *out)
{
    uint64_t value;
    if (lex_uint(lx, what, &value) != 0)
        return -1;
    if (value > limit)
        return pw_fail(lx->v, PW_E_LIMIT, PW_FILE_GRAPH, lx->line,
                       "%s = %llu exceeds the limit %u (raise it with %s)", what,
                       (unsigned long long)value, limit, flag);
    *out = (uint32_t)value;
    return 0;
}

static int read_header(pw_lexer *lx, const pw_limits *lim, pw_graph *g)
{
    int got = lex_next_line(lx);
    if (got < 0)
        return -1;
    if (got == 0)
        return pw_fail(lx->v, PW_E_SYNTAX, PW_FILE_GRAPH, lx->line + 1,
                       "expected 'graph N M', found end of file");
    uint32_t max_n = lim->max_vertices < PW_MAX_COUNT ? lim->max_vertices : PW_MAX_COUNT;
    uint32_t max_m = lim->max_edges < PW_MAX_COUNT ? lim->max_edges : PW_MAX_COUNT;
    if (lex_expect(lx, "graph") != 0 || read_count(lx, "N", max_n, "--max-vertices", &g->n) != 0 ||
        read_count(lx, "M", max_m, "--max-edges", &g->m) != 0)
        return -1;
    return lex_expect_end(lx);
}

static int read_endpoint(pw_lexer *lx, uint32_t n, uint32_t *out)
{
    uint64_t value;
    if (lex_uint(lx, "a vertex id", &value) != 0)
        return -1;
    if (value >= n)
        return pw_fail(lx->v, PW_E_RANGE, PW_FILE_GRAPH, lx->line,
                       "vertex %llu is out of range: ids run from 0 to N - 1 = %lld",
                       (unsigned long long)value, (long long)n - 1);
    *out = (uint32_t)value;
    return 0;
}

/* Reads the M edge lines; ends must hold room for min(M, len / 3 + 1) edges. */
static int read_edges(pw_lexer *lx, pw_graph *g, uint32_t room)
{
    uint32_t count = 0;
    int got;
    while ((got = lex_next_line(lx)) == 1) {
        uint32_t u, w;
        if (count == g->m)
            return pw_fail(lx->v, PW_E_EDGE_COUNT, PW_FILE_GRAPH, lx->line,
                           "more edge lines than the header's M = %u", g->m);
        /* Each edge line takes 3 bytes or more after a header of 9 or more. */
        assert(count < room);
        if (read_endpoint(lx, g->n, &u) != 0 || read_endpoint(lx, g->n, &w) != 0 ||
            lex_expect_end(lx) != 0)
            return -1;
        if (u == w)
            return pw_fail(lx->v, PW_E_SELF_LOOP, PW_FILE_GRAPH, lx->line,
                           "edge %u %u joins vertex %u to itself", u, w, u);
        g->ends[2 * (size_t)count] = u;
        g->ends[2 * (size_t)count + 1] = w;
        if (u >= g->n_adj || w >= g->n_adj)
            g->n_adj = (u > w ? u : w) + 1;
        count++;
    }
    if (got < 0)
        return -1;
    if (count != g->m)
        return pw_fail(lx->v, PW_E_EDGE_COUNT, PW_FILE_GRAPH, lx->line,
                       "the file ends after %u edge line%s, the header's M is %u", count,
                       count == 1 ? "" : "s", g->m);
    return 0;
}

void pw_graph_group_darts(pw_graph *g)
{
    size_t darts = 2 * (size_t)g->m;
    memset(g->first, 0, ((size_t)g->n_adj + 1) * sizeof *g->first);
    for (size_t d = 0; d < darts; d++)
        g->first[g->ends[d] + 1]++;
    for (uint32_t v = 0; v < g->n_adj; v++)
        g->first[v + 1] += g->first[v];
    for (size_t d = 0; d < darts; d++)
        g->darts[g->first[g->ends[d]]++] = (uint32_t)d;
    for (uint32_t v = g->n_adj; v > 0; v--)
        g->first[v] = g->first[v - 1];
    g->first[0] = 0;
}

static int build_adjacency(pw_graph *g)
{
    g->first = pw_alloc((size_t)g->n_adj + 1, sizeof *g->first);
    g->darts = pw_alloc(2 * (size_t)g->m, sizeof *g->darts);
    if (g->first == NULL || g->darts == NULL)
        return -1;
    pw_graph_group_darts(g);
    return 0;
}

/* The repeated pair whose later copy comes first in the file, or PW_NONE. */
static uint32_t first_repeated_edge(const pw_graph *g, uint32_t *seen)
{
    uint32_t worst = PW_NONE;
    for (uint32_t v = 0; v < g->n_adj; v++)
        seen[v] = PW_NONE;
    for (uint32_t v = 0; v < g->n_adj; v++) {
        for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++) {
            uint32_t d = g->darts[i], w = g->ends[d ^ 1u];
            if (seen[w] == v && d / 2 < worst)
                worst = d / 2;
            seen[w] = v;
        }
    }
    return worst;
}

uint64_t pw_graph_edge_line(const char *buf, size_t len, uint32_t e)
{
    pw_lexer lx;
    pw_verdict scratch;
    lex_init(&lx, buf, len, PW_FILE_GRAPH, &scratch);
    lex_next_line(&lx);
    for (uint64_t k = 0; k <= e && lex_next_line(&lx) == 1; k++)
        ;
    return lx.line;
}

static int refuse_repeats(const pw_graph *g, const char *buf, size_t len, pw_verdict *v)
{
    uint32_t *seen = pw_alloc(g->n_adj, sizeof *seen);
    if (seen == NULL)
        return pw_fail(v, PW_E_NOMEM, PW_FILE_GRAPH, 0, "no memory for %u vertices", g->n_adj);
    uint32_t e = first_repeated_edge(g, seen);
    free(seen);
    if (e == PW_NONE)
        return 0;
    uint32_t a = g->ends[2 * (size_t)e], b = g->ends[2 * (size_t)e + 1], earlier = 0;
    while (!((g->ends[2 * (size_t)earlier] == a && g->ends[2 * (size_t)earlier + 1] == b) ||
             (g->ends[2 * (size_t)earlier] == b && g->ends[2 * (size_t)earlier + 1] == a)))
        earlier++;
    return pw_fail(v, PW_E_REPEATED_EDGE, PW_FILE_GRAPH, pw_graph_edge_line(buf, len, e),
                   "edge %u %u repeats the edge on line %llu", a, b,
                   (unsigned long long)pw_graph_edge_line(buf, len, earlier));
}

pw_code pw_graph_parse(const char *buf, size_t len, const pw_limits *lim, pw_graph *g,
                       pw_verdict *v)
{
    pw_lexer lx;
    memset(g, 0, sizeof *g);
    lex_init(&lx, buf, len, PW_FILE_GRAPH, v);
    if (read_header(&lx, lim, g) != 0)
        return v->code;
    /* Every edge line takes at least three bytes ("0 1"), so this bounds M by the input. */
    uint32_t room = (uint64_t)g->m < len / 3 + 1 ? g->m : (uint32_t)(len / 3 + 1);
    g->ends = pw_alloc(2 * (size_t)room, sizeof *g->ends);
    if (g->ends == NULL) {
        pw_fail(v, PW_E_NOMEM, PW_FILE_GRAPH, 0, "no memory for %u edges", room);
        return v->code;
    }
    if (read_edges(&lx, g, room) != 0)
        return v->code;
    if (build_adjacency(g) != 0) {
        pw_fail(v, PW_E_NOMEM, PW_FILE_GRAPH, 0, "no memory for the adjacency of %u edges", g->m);
        return v->code;
    }
    if (refuse_repeats(g, buf, len, v) != 0)
        return v->code;
    v->vertices = g->n;
    v->edges = g->m;
    return PW_OK;
}
