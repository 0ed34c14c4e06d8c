/*
 * draw_embed.c - the growable embedded graph and its connected components.
 * See draw_internal.h.
 */
#include "draw_internal.h"

#include <stdlib.h>
#include <string.h>

void pd_embed_free(pd_embed *e)
{
    free(e->tail);
    free(e->next);
    free(e->prev);
    free(e->any);
    free(e->deg);
    memset(e, 0, sizeof *e);
}

/* A triangulation of a component with k >= 3 vertices has 3k - 6 edges, and a
 * planar component never has more, so 2 max(m, 3n) darts are always enough;
 * refused when that does not fit 32 bits. */
static int embed_alloc(pd_embed *e, uint32_t n, uint32_t m)
{
    uint64_t cap = 2 * ((uint64_t)m > 3 * (uint64_t)n ? (uint64_t)m : 3 * (uint64_t)n) + 2;
    memset(e, 0, sizeof *e);
    if (cap >= PW_NONE)
        return -1;
    e->n = n;
    e->cap = (uint32_t)cap;
    e->tail = malloc(cap * sizeof *e->tail);
    e->next = malloc(cap * sizeof *e->next);
    e->prev = malloc(cap * sizeof *e->prev);
    e->any = malloc(((size_t)n + 1) * sizeof *e->any);
    e->deg = calloc((size_t)n + 1, sizeof *e->deg);
    if (!e->tail || !e->next || !e->prev || !e->any || !e->deg) {
        pd_embed_free(e);
        return -1;
    }
    return 0;
}

int pd_embed_init(pd_embed *e, const pw_graph *g, const uint32_t *rot)
{
    if (embed_alloc(e, g->n, g->m) != 0)
        return -1;
    e->n_darts = 2 * g->m;
    memcpy(e->tail, g->ends, (size_t)e->n_darts * sizeof *e->tail);
    for (uint32_t v = 0; v < g->n; v++) {
        uint32_t lo = v < g->n_adj ? g->first[v] : 0, hi = v < g->n_adj ? g->first[v + 1] : 0;
        e->any[v] = lo < hi ? rot[lo] : PW_NONE;
        e->deg[v] = hi - lo;
        for (uint32_t i = lo; i < hi; i++) {
            uint32_t d = rot[i], after = rot[i + 1 < hi ? i + 1 : lo];
            e->next[d] = after;
            e->prev[after] = d;
        }
    }
    return 0;
}

uint32_t pd_embed_add(pd_embed *e, uint32_t at_u, uint32_t at_w)
{
    uint32_t d = e->n_darts, r = d + 1;
    uint32_t u = e->tail[at_u], w = e->tail[at_w];
    e->n_darts += 2;
    e->tail[d] = u;
    e->tail[r] = w;
    e->next[d] = e->next[at_u];
    e->prev[d] = at_u;
    e->prev[e->next[at_u]] = d;
    e->next[at_u] = d;
    e->next[r] = e->next[at_w];
    e->prev[r] = at_w;
    e->prev[e->next[at_w]] = r;
    e->next[at_w] = r;
    e->deg[u]++;
    e->deg[w]++;
    return d;
}

void pd_components_free(pd_components *c)
{
    free(c->of);
    free(c->start);
    free(c->member);
    memset(c, 0, sizeof *c);
}

/* Labels every vertex reachable from s with component id, by an explicit stack. */
static void label_from(const pd_embed *e, uint32_t s, uint32_t id, uint32_t *of, uint32_t *stack)
{
    uint32_t top = 0;
    of[s] = id;
    stack[top++] = s;
    while (top > 0) {
        uint32_t v = stack[--top], d = e->any[v];
        for (uint32_t k = 0; k < e->deg[v]; k++, d = e->next[d]) {
            uint32_t w = pd_head(e, d);
            if (of[w] == PW_NONE) {
                of[w] = id;
                stack[top++] = w;
            }
        }
    }
}

static int components_alloc(pd_components *c, uint32_t n)
{
    memset(c, 0, sizeof *c);
    c->of = malloc(((size_t)n + 1) * sizeof *c->of);
    c->member = malloc(((size_t)n + 1) * sizeof *c->member);
    if (!c->of || !c->member) {
        pd_components_free(c);
        return -1;
    }
    return 0;
}

int pd_components_whole(uint32_t n, pd_components *c)
{
    if (components_alloc(c, n) != 0 || (c->start = malloc(2 * sizeof *c->start)) == NULL) {
        pd_components_free(c);
        return -1;
    }
    for (uint32_t v = 0; v < n; v++) {
        c->of[v] = 0;
        c->member[v] = v;
    }
    c->count = 1;
    c->start[0] = 0;
    c->start[1] = n;
    return 0;
}

int pd_components_find(const pd_embed *e, pd_components *c)
{
    uint32_t n = e->n;
    if (components_alloc(c, n) != 0)
        return -1;
    for (uint32_t v = 0; v < n; v++)
        c->of[v] = PW_NONE;
    for (uint32_t v = 0; v < n; v++)
        if (c->of[v] == PW_NONE)
            label_from(e, v, c->count++, c->of, c->member);
    c->start = calloc((size_t)c->count + 1, sizeof *c->start);
    if (!c->start) {
        pd_components_free(c);
        return -1;
    }
    for (uint32_t v = 0; v < n; v++)
        c->start[c->of[v] + 1]++;
    for (uint32_t i = 0; i < c->count; i++)
        c->start[i + 1] += c->start[i];
    for (uint32_t v = 0; v < n; v++) /* counting sort; start[] shifts by one slot */
        c->member[c->start[c->of[v]]++] = v;
    for (uint32_t i = c->count; i > 0; i--)
        c->start[i] = c->start[i - 1];
    c->start[0] = 0;
    return 0;
}
