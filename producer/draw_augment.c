/*
 * draw_augment.c - make every component of >= 3 vertices biconnected, inside
 * the given embedding and without multi-edges.
 *
 * Blocks (biconnected components) are found once by an iterative depth-first
 * search.  Then at every vertex v, for each pair of consecutive darts v->u,
 * v->w whose edges lie in different blocks, the edge u-w is added inside the
 * face corner between them, and the two blocks are merged (union-find).  That
 * edge cannot exist already: u-w plus v would be a cycle, putting v->u and
 * v->w in one block.  Adding u-w merges exactly the two blocks, because in the
 * block tree u and w are joined only through v.  After v's turn all blocks at
 * v are one, and adding edges never makes a new cut vertex, so at the end
 * there is none.  O(N + M) time, iterative.
 */
#include "draw_internal.h"

#include <stdlib.h>

typedef struct {
    uint32_t *disc, *low, *enter, *iter, *left; /* per vertex */
    uint32_t *vstack, *estack;
    uint32_t *block; /* per edge (dart >> 1) */
    uint32_t n_blocks;
} block_search;

/* Pops edges down to and including `last`, giving them a fresh block id. */
static void close_block(block_search *s, uint32_t *etop, uint32_t last)
{
    uint32_t id = s->n_blocks++, edge;
    do {
        edge = s->estack[--*etop];
        s->block[edge] = id;
    } while (edge != last);
}

/* Visits dart d out of v: a tree edge (returns 1, w pushed) or a back edge. */
static int visit_dart(const pd_embed *e, block_search *s, uint32_t v, uint32_t d,
                      uint32_t *clock, uint32_t *etop)
{
    uint32_t w = pd_head(e, d);
    if ((d ^ 1u) == s->enter[v])
        return 0;
    if (s->disc[w] == PW_NONE) {
        s->estack[(*etop)++] = d >> 1;
        s->enter[w] = d;
        s->disc[w] = s->low[w] = (*clock)++;
        s->iter[w] = e->any[w];
        s->left[w] = e->deg[w];
        return 1;
    }
    if (s->disc[w] < s->disc[v]) { /* back edge to an ancestor, met first from below */
        s->estack[(*etop)++] = d >> 1;
        if (s->disc[w] < s->low[v])
            s->low[v] = s->disc[w];
    }
    return 0;
}

static void search_from(const pd_embed *e, block_search *s, uint32_t root, uint32_t *clock)
{
    uint32_t top = 0, etop = 0;
    s->enter[root] = PW_NONE;
    s->disc[root] = s->low[root] = (*clock)++;
    s->iter[root] = e->any[root];
    s->left[root] = e->deg[root];
    s->vstack[top++] = root;
    while (top > 0) {
        uint32_t v = s->vstack[top - 1];
        if (s->left[v] > 0) {
            uint32_t d = s->iter[v];
            s->iter[v] = e->next[d];
            s->left[v]--;
            if (visit_dart(e, s, v, d, clock, &etop))
                s->vstack[top++] = pd_head(e, d);
            continue;
        }
        top--;
        if (v == root)
            continue;
        uint32_t u = e->tail[s->enter[v]];
        if (s->low[v] < s->low[u])
            s->low[u] = s->low[v];
        if (s->low[v] >= s->disc[u])
            close_block(s, &etop, s->enter[v] >> 1);
    }
}

static void blocks_free(block_search *s)
{
    free(s->disc);
    free(s->low);
    free(s->enter);
    free(s->iter);
    free(s->left);
    free(s->vstack);
    free(s->estack);
}

static uint32_t find(uint32_t *up, uint32_t b)
{
    uint32_t r = b;
    while (up[r] != r)
        r = up[r];
    while (up[b] != r) {
        uint32_t next = up[b];
        up[b] = r;
        b = next;
    }
    return r;
}

/* Joins the blocks at each corner of v whose two edges lie in different blocks. */
static void join_corners(pd_embed *e, uint32_t *block, uint32_t *up, uint32_t v)
{
    uint32_t d = e->any[v], deg = e->deg[v];
    for (uint32_t k = 0; deg >= 2 && k < deg; k++) {
        uint32_t d2 = e->next[d];
        uint32_t b1 = find(up, block[d >> 1]), b2 = find(up, block[d2 >> 1]);
        if (b1 != b2) {
            uint32_t added = pd_embed_add(e, e->prev[d ^ 1u], d2 ^ 1u);
            up[b2] = b1;
            block[added >> 1] = b1;
        }
        d = d2;
    }
}

int pd_biconnect(pd_embed *e)
{
    block_search s = {0};
    size_t n = (size_t)e->n + 1, edges = (size_t)e->cap / 2 + 1;
    uint32_t clock = 0;
    int rc = -1;
    s.disc = malloc(n * sizeof *s.disc);
    s.low = malloc(n * sizeof *s.low);
    s.enter = malloc(n * sizeof *s.enter);
    s.iter = malloc(n * sizeof *s.iter);
    s.left = malloc(n * sizeof *s.left);
    s.vstack = malloc(n * sizeof *s.vstack);
    s.estack = malloc(edges * sizeof *s.estack);
    s.block = malloc(edges * sizeof *s.block);
    if (!s.disc || !s.low || !s.enter || !s.iter || !s.left || !s.vstack || !s.estack || !s.block)
        goto done;
    for (uint32_t v = 0; v < e->n; v++)
        s.disc[v] = PW_NONE;
    for (uint32_t v = 0; v < e->n; v++)
        if (s.disc[v] == PW_NONE)
            search_from(e, &s, v, &clock);
    /* The search's stacks are free now: estack becomes the union-find forest. */
    for (uint32_t b = 0; b < s.n_blocks; b++)
        s.estack[b] = b;
    for (uint32_t v = 0; v < e->n; v++)
        join_corners(e, s.block, s.estack, v);
    rc = 0;
done:
    blocks_free(&s);
    free(s.block);
    return rc;
}
