/*
 * kuratowski_descent.c - isolation when a walkdown descent was blocked, and
 * the entry point pp_isolate().
 *
 * The walkdown went from v's child piece through cut vertices w_1 .. w_k into
 * the child piece of root R at w_k, and both first active vertices x0, x1 on
 * R's outer face are externally active but not pertinent.  Some pertinent z
 * lies on the outer face between them.  Then
 *     {w_k, z, U} x {x0, x1, v}
 * is a K3,3, where U is a proper ancestor of v that x0 and x1 reach:
 * w_k meets x0 and x1 round R's face and v through the pieces above it; z meets
 * x0 and x1 along the lower face and v by its back edge; U meets both by
 * their ways up and v by the tree path.
 */
#include <stdlib.h>

#include "kuratowski.h"

/*
 * The outer cycle of root r's piece by real darts, r first.  No consistent
 * orientation is needed: on the outer face the two end darts of every list
 * are the face's edges, so we always leave by the other end.
 */
static uint32_t outer_cycle(const pp_state *s, uint32_t r, uint32_t *seq)
{
    uint32_t len = 0, d = s->head[r];
    seq[len++] = r;
    while (len < s->n) { /* a piece never holds its owner: at most n entries */
        uint32_t t = pp_arc_target(s, d, r);
        if (t == r)
            return len;
        uint32_t a = d ^ 1u, h = s->head[t];
        if (a != h && a != s->prv[h])
            return PP_NIL;
        seq[len++] = t;
        d = a == h ? s->prv[h] : h;
    }
    return PP_NIL;
}

static uint32_t index_of(const uint32_t *seq, uint32_t len, uint32_t x)
{
    for (uint32_t i = 0; i < len; i++)
        if (seq[i] == x)
            return i;
    return PP_NIL;
}

/* From w_k up through the stacked pieces to v (roots print as their owners). */
static int path_up_the_stack(pp_state *s, uint32_t r, pp_witness *w, uint32_t *seq)
{
    pp_wit_begin(w);
    for (uint32_t j = s->stack_top / 2; j-- > 0;) {
        uint32_t cut = s->stack[2 * j] >> 1;
        uint32_t above = j == 0 ? r : s->stack[2 * j - 1] >> 1;
        uint32_t len = outer_cycle(s, above, seq);
        uint32_t at = len == PP_NIL ? PP_NIL : index_of(seq, len, cut);
        if (at == PP_NIL)
            return PP_ERR_BUG;
        pp_wit_add_seq(w, seq, at, 0);
    }
    pp_wit_end(w);
    return 0;
}

int pp_isolate_descent(pp_state *s, uint32_t v, uint32_t r, pp_witness *w, pp_scratch *k,
                       pp_result *res)
{
    if (s->stack_top < 2)
        return PP_ERR_BUG;
    uint32_t root = s->stack[s->stack_top - 1] >> 1;
    uint32_t *e = k->pc, len = outer_cycle(s, root, e);
    if (len == PP_NIL)
        return PP_ERR_BUG;
    uint32_t i0 = 1, i1 = len - 1, iz;
    while (i0 < len && pp_inactive(s, e[i0], v))
        i0++;
    while (i1 > 0 && pp_inactive(s, e[i1], v))
        i1--;
    for (iz = i0 + 1; iz < i1 && !pp_pertinent(s, e[iz]); iz++) {
    }
    if (i0 >= iz || iz >= i1 || pp_pertinent(s, e[i0]) || pp_pertinent(s, e[i1]))
        return PP_ERR_BUG;
    pp_conn c0 = pp_conn_make(w, PP_CONN_EXT, e[i0], 0, NULL, 0, 0);
    pp_conn c1 = pp_conn_make(w, PP_CONN_EXT, e[i1], 0, NULL, 0, 0);
    pp_conn cv = pp_conn_make(w, PP_CONN_V, v, 0, NULL, 0, 0);
    uint32_t hub = pp_median3(c0.u, c1.u, v);
    uint32_t branch[6] = {root, e[iz], hub, e[i0], e[i1], v};

    pp_wit_begin(w);
    pp_wit_add_seq(w, e, 0, i0);
    pp_wit_end(w);
    pp_wit_begin(w);
    pp_wit_add(w, root);
    pp_wit_add_seq(w, e, len - 1, i1);
    pp_wit_end(w);
    pp_wit_begin(w);
    pp_wit_add_seq(w, e, iz, i0);
    pp_wit_end(w);
    pp_wit_begin(w);
    pp_wit_add_seq(w, e, iz, i1);
    pp_wit_end(w);
    pp_wit_begin(w);
    pp_wit_add_pert(w, e[iz]);
    pp_wit_end(w);
    pp_wit_path_to_hub(w, &c0, hub);
    pp_wit_path_to_hub(w, &c1, hub);
    pp_wit_path_to_hub(w, &cv, hub);
    if (path_up_the_stack(s, r, w, k->q) != 0)
        return PP_ERR_BUG;
    return pp_wit_emit(w, PP_K33, branch, res);
}

/*
 * The run is over, so the outer-face links (4n words) and the walkup marks
 * (2n words) are free: six of the eight scratch arrays live there.
 */
int pp_isolate(pp_state *s, pp_run_outcome why, uint32_t v, uint32_t root, pp_result *r)
{
    size_t n = s->n;
    uint32_t *block = malloc((2 * n + 2) * sizeof(uint32_t));
    if (block == NULL)
        return PP_ERR_NOMEM;
    pp_scratch k = {block,          block + n + 1,  s->ext,         s->ext + n,
                    s->ext + 2 * n, s->ext + 3 * n, s->visited,     s->visited + n};
    for (uint32_t x = 0; x < s->n; x++)
        k.size[x] = 1;
    for (uint32_t x = s->n; x-- > 0;)
        if (s->parent[x] != PP_NIL)
            k.size[s->parent[x]] += k.size[x];
    pp_witness w;
    int got = pp_wit_init(&w, s, v, k.size);
    if (got == 0)
        got = why == PP_RUN_BLOCKED_DESCENT ? pp_isolate_descent(s, v, root, &w, &k, r)
                                            : pp_isolate_face(s, v, root, &w, &k, r);
    pp_wit_free(&w);
    free(block);
    return got;
}
