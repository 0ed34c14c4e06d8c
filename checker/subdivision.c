/*
 * subdivision.c - a subdivision of K5 or K3,3 inside the graph.
 *
 * Why acceptance implies non-planarity: the accepted paths are internally
 * disjoint, so their union is a subgraph homeomorphic to K5 (or K3,3); a
 * planar drawing of the graph would draw that subgraph, and so K5 (K3,3),
 * without crossings, which Kuratowski's theorem (1930) excludes.
 *
 * Check order (first failure wins): branch vertices distinct, number of path
 * lines, then each path in file order: its end pair, then its vertices from
 * first to last (reuse before adjacency, so that each vertex's neighbours are
 * scanned a bounded number of times and the whole check stays O(n + m)).
 */
#include "internal.h"

#include <stdlib.h>

typedef struct {
    const pw_graph *g;
    const pw_cert *c;
    pw_verdict *v;
    int k33;
    uint32_t branches;      /* 5 or 6 */
    uint32_t *owner;        /* n_adj: 1 + the path holding the vertex inside it */
    unsigned char done[6][6];
} subdivision;

static int branch_index(const subdivision *s, uint32_t x)
{
    for (uint32_t i = 0; i < s->branches; i++)
        if (s->c->branch[i] == x)
            return (int)i;
    return -1;
}

static int distinct_branches(const subdivision *s)
{
    for (uint32_t i = 0; i < s->branches; i++)
        for (uint32_t j = i + 1; j < s->branches; j++)
            if (s->c->branch[i] == s->c->branch[j])
                return pw_fail(s->v, PW_R_BRANCH_REPEATED, PW_FILE_CERT, s->c->head_line,
                               "branch vertex %u is given twice", s->c->branch[i]);
    return 0;
}

/* The path must join a pair K5 (any two) or K3,3 (one per side) requires, once. */
static int check_ends(subdivision *s, const pw_item *it)
{
    const uint32_t *p = pw_item_values(s->c, it);
    uint32_t a = p[0], b = p[it->count - 1];
    int i = branch_index(s, a), j = branch_index(s, b);
    if (i < 0 || j < 0 || i == j || (s->k33 && (i < 3) == (j < 3)))
        return pw_fail(s->v, PW_R_PATH_ENDS, PW_FILE_CERT, it->line,
                       "a path from %u to %u does not join two branch vertices%s", a, b,
                       s->k33 ? " on opposite sides" : "");
    if (s->done[i][j])
        return pw_fail(s->v, PW_R_PATH_PAIR_TWICE, PW_FILE_CERT, it->line,
                       "branch vertices %u and %u are already joined by another path", a, b);
    s->done[i][j] = s->done[j][i] = 1;
    return 0;
}

static int check_path(subdivision *s, const pw_item *it, uint32_t index)
{
    const uint32_t *p = pw_item_values(s->c, it);
    if (check_ends(s, it) != 0)
        return -1;
    for (uint32_t k = 1; k < it->count; k++) {
        uint32_t x = p[k];
        int inside = k + 1 < it->count;
        if (inside && (branch_index(s, x) >= 0 || (x < s->g->n_adj && s->owner[x] != 0)))
            return pw_fail(s->v, PW_R_PATH_VERTEX_REUSED, PW_FILE_CERT, it->line,
                           "vertex %u inside the path is a branch vertex or on a path already", x);
        if (inside && x < s->g->n_adj)
            s->owner[x] = index + 1;
        if (!pw_adjacent(s->g, x, p[k - 1]))
            return pw_fail(s->v, PW_R_PATH_NOT_EDGE, PW_FILE_CERT, it->line,
                           "vertices %u and %u are consecutive on the path but not adjacent",
                           p[k - 1], x);
    }
    return 0;
}

static int run(subdivision *s)
{
    uint32_t want = s->k33 ? 9 : 10;
    if (distinct_branches(s) != 0)
        return -1;
    if (s->c->n_items != want)
        return pw_fail(s->v, PW_R_WITNESS_LINES, PW_FILE_CERT, s->c->head_line,
                       "a %s subdivision needs %u path lines, found %u", s->k33 ? "K3,3" : "K5",
                       want, s->c->n_items);
    s->owner = pw_zalloc(s->g->n_adj, sizeof *s->owner);
    if (s->owner == NULL)
        return pw_fail(s->v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the path check");
    for (uint32_t i = 0; i < want; i++)
        if (check_path(s, &s->c->items[i], i) != 0)
            return -1;
    return 0;
}

int pw_check_subdivision(const pw_graph *g, const pw_cert *c, pw_verdict *v)
{
    subdivision s = {g, c, v, c->witness == PW_WITNESS_SUBDIVISION_K33, 0, NULL, {{0}}};
    s.branches = s.k33 ? 6 : 5;
    int result = run(&s);
    free(s.owner);
    return result;
}
