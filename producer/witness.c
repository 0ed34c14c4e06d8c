/*
 * witness.c - the path builder and the ways out of a piece: tree paths, the
 * path that realises a pertinent vertex's back edge to v, and the path from
 * an externally active vertex to a proper ancestor of v.
 */
#include <stdlib.h>
#include <string.h>

#include "witness.h"

int pp_wit_init(pp_witness *w, pp_state *s, uint32_t v, uint32_t *size)
{
    memset(w, 0, sizeof *w);
    w->s = s;
    w->v = v;
    w->size = size;
    w->cap = 64;
    w->vert = malloc(w->cap * sizeof(uint32_t));
    return w->vert == NULL ? PP_ERR_NOMEM : 0;
}

void pp_wit_free(pp_witness *w)
{
    free(w->vert);
    w->vert = NULL;
}

static int reserve(pp_witness *w, size_t more)
{
    if (w->len + more <= w->cap)
        return 0;
    size_t cap = w->cap * 2 > w->len + more ? w->cap * 2 : w->len + more;
    uint32_t *p = realloc(w->vert, cap * sizeof(uint32_t));
    if (p == NULL) {
        w->err = PP_ERR_NOMEM;
        return -1;
    }
    w->vert = p;
    w->cap = cap;
    return 0;
}

void pp_wit_begin(pp_witness *w)
{
    w->start[w->npaths] = (uint32_t)w->len;
}

void pp_wit_end(pp_witness *w)
{
    if (w->npaths < 10)
        w->npaths++;
    w->start[w->npaths] = (uint32_t)w->len;
}

static int path_open_with(const pp_witness *w, uint32_t x)
{
    return w->len > w->start[w->npaths] && w->vert[w->len - 1] == x;
}

void pp_wit_add(pp_witness *w, uint32_t x)
{
    x = pp_owner(w->s, x);
    if (path_open_with(w, x) || reserve(w, 1) != 0)
        return;
    w->vert[w->len++] = x;
}

void pp_wit_add_seq(pp_witness *w, const uint32_t *seq, uint32_t i, uint32_t j)
{
    for (uint32_t k = i;; k = i <= j ? k + 1 : k - 1) {
        pp_wit_add(w, seq[k]);
        if (k == j)
            break;
    }
}

void pp_wit_add_up(pp_witness *w, uint32_t from, uint32_t to)
{
    for (uint32_t y = from; y != PP_NIL; y = w->s->parent[y]) {
        pp_wit_add(w, y);
        if (y == to)
            return;
    }
    w->err = PP_ERR_BUG; /* `to` was not an ancestor */
}

/* Written back to front so no temporary list is needed. */
void pp_wit_add_down(pp_witness *w, uint32_t anc, uint32_t desc)
{
    size_t steps = 0;
    uint32_t y = desc;
    while (y != anc && y != PP_NIL) {
        y = w->s->parent[y];
        steps++;
    }
    if (y == PP_NIL) {
        w->err = PP_ERR_BUG;
        return;
    }
    if (reserve(w, steps + 1) != 0)
        return;
    size_t base = path_open_with(w, anc) ? w->len - 1 : w->len;
    y = desc;
    for (size_t k = base + steps;; k--) {
        w->vert[k] = y;
        if (k == base)
            break;
        y = w->s->parent[y];
    }
    w->len = base + steps + 1;
}

/* Between two vertices on the tree path above v (larger DFI is deeper). */
void pp_wit_add_anc(pp_witness *w, uint32_t a, uint32_t b)
{
    if (a >= b)
        pp_wit_add_up(w, a, b);
    else
        pp_wit_add_down(w, a, b);
}

void pp_wit_reverse_from(pp_witness *w, size_t start)
{
    for (size_t i = start, j = w->len; i + 1 < j; i++, j--) {
        uint32_t t = w->vert[i];
        w->vert[i] = w->vert[j - 1];
        w->vert[j - 1] = t;
    }
    if (start > w->start[w->npaths] && start < w->len && w->vert[start - 1] == w->vert[start]) {
        memmove(w->vert + start, w->vert + start + 1, (w->len - start - 1) * sizeof(uint32_t));
        w->len--;
    }
}

/*
 * a's back edge to v, directly or through its first pertinent child piece:
 * no back edge from v into that subtree is embedded yet (the piece would have
 * been merged), so any pending one there will do.
 */
void pp_wit_add_pert(pp_witness *w, uint32_t a)
{
    pp_state *s = w->s;
    uint32_t v = w->v;
    pp_wit_add(w, a);
    if (s->back_dart[a] != PP_NIL) {
        pp_wit_add(w, v);
        return;
    }
    uint32_t r = pp_pert_first(s, a);
    if (r == PP_NIL) {
        w->err = PP_ERR_BUG;
        return;
    }
    uint32_t c = r - s->n, vo = s->vertex_of[v];
    const pw_graph *g = s->g;
    for (uint32_t i = g->first[vo]; i < g->first[vo + 1]; i++) {
        uint32_t t = s->dfi_of[g->ends[g->darts[i] ^ 1u]];
        if (t >= c && t - c < w->size[c] && s->back_dart[t] != PP_NIL) {
            pp_wit_add_down(w, c, t);
            pp_wit_add(w, v);
            return;
        }
    }
    w->err = PP_ERR_BUG;
}

uint32_t pp_low_child(const pp_state *s, uint32_t y, uint32_t v)
{
    const pw_graph *g = s->g;
    uint32_t yo = s->vertex_of[y];
    for (uint32_t i = g->first[yo]; i < g->first[yo + 1]; i++) {
        uint32_t t = s->dfi_of[g->ends[g->darts[i] ^ 1u]];
        if (s->parent[t] == y && s->lowpoint[t] < v)
            return t;
    }
    return PP_NIL;
}

/* The back edge from y that lands closest above v: short ways up keep the
   tree path between them short (on K_n the K5 found is then K5 itself). */
static uint32_t nearest_above(const pp_state *s, uint32_t y, uint32_t v)
{
    const pw_graph *g = s->g;
    uint32_t yo = s->vertex_of[y], best = s->least_anc[y];
    for (uint32_t i = g->first[yo]; i < g->first[yo + 1]; i++) {
        uint32_t t = s->dfi_of[g->ends[g->darts[i] ^ 1u]];
        if (t < v && (best >= v || t > best))
            best = t;
    }
    return best;
}

/* a's way to a proper ancestor of v; appends it when `append` is set.
   Through a separated child only: merged children lie inside the piece. */
static uint32_t ext_walk(pp_witness *w, uint32_t a, int append)
{
    pp_state *s = w->s;
    uint32_t v = w->v, y = a;
    if (append)
        pp_wit_add(w, a);
    if (s->least_anc[a] >= v) {
        y = pp_first_separated(s, a);
        if (y == PP_NIL || s->lowpoint[y] >= v) {
            w->err = PP_ERR_BUG;
            return v;
        }
        if (append)
            pp_wit_add(w, y);
        while (s->least_anc[y] >= v) {
            y = pp_low_child(s, y, v);
            if (y == PP_NIL) {
                w->err = PP_ERR_BUG;
                return v;
            }
            if (append)
                pp_wit_add(w, y);
        }
    }
    uint32_t u = nearest_above(s, y, v);
    if (append)
        pp_wit_add(w, u);
    return u;
}

pp_conn pp_conn_make(pp_witness *w, pp_conn_kind kind, uint32_t a, uint32_t b,
                     const uint32_t *seq, uint32_t i, uint32_t j)
{
    pp_conn c = {kind, a, b, seq, i, j, w->v};
    if (kind == PP_CONN_EXT)
        c.u = ext_walk(w, a, 0);
    else if (kind == PP_CONN_SEQ_EXT)
        c.u = ext_walk(w, seq[j], 0);
    else if (kind == PP_CONN_TREE_EXT)
        c.u = nearest_above(w->s, b, w->v);
    return c;
}

void pp_wit_add_conn(pp_witness *w, const pp_conn *c)
{
    switch (c->kind) {
    case PP_CONN_V:
        pp_wit_add(w, w->v);
        break;
    case PP_CONN_EXT:
        ext_walk(w, c->a, 1);
        break;
    case PP_CONN_SEQ_EXT:
        pp_wit_add_seq(w, c->seq, c->i, c->j);
        ext_walk(w, c->seq[c->j], 1);
        break;
    case PP_CONN_TREE_EXT:
        pp_wit_add_down(w, c->a, c->b);
        pp_wit_add(w, c->u);
        break;
    }
}

void pp_wit_path_to_hub(pp_witness *w, const pp_conn *c, uint32_t h)
{
    pp_wit_begin(w);
    pp_wit_add_conn(w, c);
    pp_wit_add_anc(w, c->u, h);
    pp_wit_end(w);
}

void pp_wit_path_over(pp_witness *w, const pp_conn *c1, const pp_conn *c2)
{
    pp_wit_begin(w);
    pp_wit_add_conn(w, c1);
    pp_wit_add_anc(w, c1->u, c2->u);
    size_t start = w->len;
    pp_wit_add_conn(w, c2);
    pp_wit_reverse_from(w, start);
    pp_wit_end(w);
}

uint32_t pp_median3(uint32_t a, uint32_t b, uint32_t c)
{
    if (a > b) {
        uint32_t t = a;
        a = b;
        b = t;
    }
    return c <= a ? a : c >= b ? b : c;
}

int pp_wit_emit(pp_witness *w, pp_kind kind, const uint32_t *branch, pp_result *r)
{
    unsigned want = kind == PP_K5 ? 10u : 9u;
    if (w->err != 0)
        return w->err;
    if (w->npaths != want)
        return PP_ERR_BUG;
    r->path = malloc((w->len + 1) * sizeof(uint32_t));
    if (r->path == NULL)
        return PP_ERR_NOMEM;
    for (size_t i = 0; i < w->len; i++)
        r->path[i] = w->s->vertex_of[w->vert[i]];
    for (unsigned p = 0; p <= want; p++)
        r->path_start[p] = w->start[p];
    for (unsigned b = 0; b < (kind == PP_K5 ? 5u : 6u); b++)
        r->branch[b] = w->s->vertex_of[pp_owner(w->s, branch[b])];
    r->kind = kind;
    return 0;
}
