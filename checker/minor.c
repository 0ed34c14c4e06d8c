/*
 * minor.c - a K5 or K3,3 minor given by its branch sets.
 *
 * Why acceptance implies non-planarity: contracting each accepted set (it is
 * connected) to one vertex and deleting everything else leaves a graph that
 * contains K5 (or K3,3), because every required pair of sets is joined by an
 * edge.  Planar graphs are closed under deletion and contraction, and K5 and
 * K3,3 are not planar (Kuratowski 1930, Wagner 1937).
 *
 * Check order (first failure wins): number of set lines, indices, empty sets,
 * membership in file order (isolated vertices, overlaps), connectivity of each
 * set in file order, then required pairs in index order.
 */
#include "internal.h"

#include <stdlib.h>

typedef struct {
    const pw_graph *g;
    const pw_cert *c;
    pw_verdict *v;
    uint32_t sets;   /* 5 or 6 */
    uint32_t *owner; /* n_adj: set index, PW_NONE outside every set */
    uint32_t *queue; /* n_adj */
    const pw_item *by_index[6];
} minor;

static int check_lines(minor *s)
{
    const pw_cert *c = s->c;
    if (c->n_items != s->sets)
        return pw_fail(s->v, PW_R_WITNESS_LINES, PW_FILE_CERT, c->head_line,
                       "a %s minor needs %u set lines, found %u", s->sets == 5 ? "K5" : "K3,3",
                       s->sets, c->n_items);
    for (uint32_t i = 0; i < c->n_items; i++) {
        const pw_item *it = &c->items[i];
        if (it->key >= s->sets || s->by_index[it->key] != NULL)
            return pw_fail(s->v, PW_R_SET_INDEX, PW_FILE_CERT, it->line,
                           "set indices must be 0 to %u, each once", s->sets - 1);
        s->by_index[it->key] = it;
    }
    for (uint32_t i = 0; i < c->n_items; i++)
        if (c->items[i].count == 0)
            return pw_fail(s->v, PW_R_SET_EMPTY, PW_FILE_CERT, c->items[i].line,
                           "set %u has no vertex", c->items[i].key);
    return 0;
}

/* An isolated vertex has no edge: alone it joins no set, with others it splits its set. */
static int claim_members(minor *s, const pw_item *it)
{
    const uint32_t *list = pw_item_values(s->c, it);
    for (uint32_t k = 0; k < it->count; k++) {
        uint32_t x = list[k];
        if (x >= s->g->n_adj && it->count == 1)
            return pw_fail(s->v, PW_R_SET_UNJOINED, PW_FILE_CERT, it->line,
                           "set %u is the isolated vertex %u, joined to no other set", it->key, x);
        if (x >= s->g->n_adj)
            return pw_fail(s->v, PW_R_SET_DISCONNECTED, PW_FILE_CERT, it->line,
                           "set %u holds the isolated vertex %u", it->key, x);
        if (s->owner[x] != PW_NONE)
            return pw_fail(s->v, PW_R_SET_OVERLAP, PW_FILE_CERT, it->line,
                           "vertex %u is already in set %u", x, s->owner[x]);
        s->owner[x] = it->key;
    }
    return 0;
}

static int check_connected(minor *s, const pw_item *it)
{
    const pw_graph *g = s->g;
    const uint32_t *list = pw_item_values(s->c, it);
    uint32_t head = 0, tail = 0, mine = it->key, seen = s->sets + mine;
    s->queue[tail++] = list[0];
    s->owner[list[0]] = seen;
    while (head < tail) {
        uint32_t u = s->queue[head++];
        for (uint32_t i = g->first[u]; i < g->first[u + 1]; i++) {
            uint32_t w = g->ends[g->darts[i] ^ 1u];
            if (s->owner[w] == mine) {
                s->owner[w] = seen;
                s->queue[tail++] = w;
            }
        }
    }
    for (uint32_t k = 0; k < it->count; k++)
        if (s->owner[list[k]] == mine)
            return pw_fail(s->v, PW_R_SET_DISCONNECTED, PW_FILE_CERT, it->line,
                           "set %u is not connected: vertex %u cannot reach vertex %u inside it",
                           mine, list[k], list[0]);
    for (uint32_t k = 0; k < it->count; k++)
        s->owner[list[k]] = mine;
    return 0;
}

static int check_joins(minor *s)
{
    unsigned char joined[6][6] = {{0}};
    const pw_graph *g = s->g;
    for (size_t e = 0; e < g->m; e++) {
        uint32_t a = s->owner[g->ends[2 * e]], b = s->owner[g->ends[2 * e + 1]];
        if (a != PW_NONE && b != PW_NONE)
            joined[a][b] = joined[b][a] = 1;
    }
    for (uint32_t i = 0; i < s->sets; i++)
        for (uint32_t j = i + 1; j < s->sets; j++) {
            int required = s->sets == 5 || (i < 3 && j >= 3);
            if (required && !joined[i][j])
                return pw_fail(s->v, PW_R_SET_UNJOINED, PW_FILE_CERT, s->by_index[j]->line,
                               "no edge joins set %u and set %u", i, j);
        }
    return 0;
}

static int run(minor *s)
{
    if (check_lines(s) != 0)
        return -1;
    s->owner = pw_alloc(s->g->n_adj, sizeof *s->owner);
    s->queue = pw_alloc(s->g->n_adj, sizeof *s->queue);
    if (s->owner == NULL || s->queue == NULL)
        return pw_fail(s->v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the minor check");
    for (uint32_t x = 0; x < s->g->n_adj; x++)
        s->owner[x] = PW_NONE;
    for (uint32_t i = 0; i < s->c->n_items; i++)
        if (claim_members(s, &s->c->items[i]) != 0)
            return -1;
    for (uint32_t i = 0; i < s->c->n_items; i++)
        if (check_connected(s, &s->c->items[i]) != 0)
            return -1;
    return check_joins(s);
}

int pw_check_minor(const pw_graph *g, const pw_cert *c, pw_verdict *v)
{
    minor s = {g, c, v, c->witness == PW_WITNESS_MINOR_K33 ? 6u : 5u, NULL, NULL, {NULL}};
    int result = run(&s);
    free(s.owner);
    free(s.queue);
    return result;
}
