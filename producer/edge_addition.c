/*
 * edge_addition.c - the vertex-by-vertex edge-addition planarity test.
 *
 * Vertices are processed in decreasing DFI.  At step v every back edge from v
 * down to a descendant is first announced by a walk up along outer faces
 * (walkup), which records which pieces hold endpoints ("pertinent"), and then
 * embedded by walking down each child piece of v along its outer face
 * (walkdown), merging pieces at cut vertices on the way.  The walk never
 * passes a vertex that must stay on the outer face for a later step
 * ("externally active"); if back edges are left over, the graph is not planar
 * and the caller isolates a Kuratowski subdivision from the frozen state.
 */
#include <stdlib.h>

#include "pp_state.h"

/* Clears what the steps use; the DFS borrowed some of it as scratch. */
void pp_prepare_run(pp_state *s)
{
    uint32_t n = s->n;
    for (uint32_t x = 0; x < 2 * n; x++)
        s->visited[x] = PP_NIL;
    for (uint32_t x = 0; x < n; x++) {
        s->back_dart[x] = PP_NIL;
        s->pert_tail[x] = PP_NIL;
        s->flipped[x] = 0;
    }
}

/* Internally active pieces go first so the walkdown finishes them before the
   one piece that must stay reachable from the outside. */
static void add_pertinent_root(pp_state *s, uint32_t p, uint32_t r, uint32_t v)
{
    uint32_t c = r - s->n, t = s->pert_tail[p];
    if (t == PP_NIL) {
        s->pert_tail[p] = r;
        s->pert_next[c] = r;
        return;
    }
    s->pert_next[c] = s->pert_next[t - s->n];
    s->pert_next[t - s->n] = r;
    if (s->lowpoint[c] < v)
        s->pert_tail[p] = r;
}

static void pop_pertinent_root(pp_state *s, uint32_t p)
{
    uint32_t t = s->pert_tail[p], h = s->pert_next[t - s->n];
    if (h == t)
        s->pert_tail[p] = PP_NIL;
    else
        s->pert_next[t - s->n] = s->pert_next[h - s->n];
}

/* Two walkers go round the outer face in opposite directions so the cost is
   bounded by the shorter way to the root; marks stop repeated work. */
static void walkup(pp_state *s, uint32_t v, uint32_t w)
{
    uint32_t x = w, xs = 0, y = w, ys = 1;
    for (;;) {
        if (s->visited[x] == v || s->visited[y] == v)
            return;
        s->visited[x] = s->visited[y] = v;
        uint32_t r = pp_is_root(s, x) ? x : pp_is_root(s, y) ? y : PP_NIL;
        if (r != PP_NIL) {
            uint32_t p = s->parent[r - s->n];
            if (p == v)
                return;
            add_pertinent_root(s, p, r, v);
            x = y = p;
            xs = 0;
            ys = 1;
            continue;
        }
        uint32_t e = s->ext[2 * x + xs];
        x = e >> 1;
        xs = 1u - (e & 1u);
        e = s->ext[2 * y + ys];
        y = e >> 1;
        ys = 1u - (e & 1u);
    }
}

/* First vertex from root r out of end `side` that is not inactive; the link
   is shortened so those inactive vertices are never walked again. */
static uint32_t first_active(pp_state *s, uint32_t r, uint32_t side, uint32_t v)
{
    uint32_t e = s->ext[2 * r + side];
    uint32_t a = e >> 1, t = e & 1u;
    while (a != r && pp_inactive(s, a, v)) {
        e = s->ext[2 * a + (1u - t)];
        a = e >> 1;
        t = e & 1u;
    }
    if (a != r) {
        s->ext[2 * r + side] = pp_pack(a, t);
        s->ext[2 * a + t] = pp_pack(r, side);
    }
    return a;
}

static int internally_active(pp_state *s, uint32_t a, uint32_t r, uint32_t v)
{
    return a != r && pp_pertinent(s, a) && !pp_ext_active(s, a, v);
}

/* Which way to leave a child root: towards an internally active vertex if
   possible, otherwise towards a pertinent one. */
static uint32_t descent_side(pp_state *s, uint32_t r, uint32_t v)
{
    uint32_t a0 = first_active(s, r, 0, v);
    uint32_t a1 = first_active(s, r, 1, v);
    if (internally_active(s, a0, r, v))
        return 0;
    if (internally_active(s, a1, r, v))
        return 1;
    return (a0 != r && pp_pertinent(s, a0)) ? 0 : 1;
}

/*
 * Merges child root r into cut vertex w.  We reached w through its end w_in
 * and left r through end out; if those are equal the child piece has the
 * opposite orientation, so r's own list is mirrored now and the rest of the
 * piece is marked (flipped[c]) to be mirrored when orientations are fixed.
 */
static void merge_root(pp_state *s, uint32_t w, uint32_t w_in, uint32_t r, uint32_t out)
{
    uint32_t c = r - s->n;
    uint32_t e = s->ext[2 * r + (1u - out)];
    pop_pertinent_root(s, w);
    if (w_in == out) {
        pp_list_reverse(s, r);
        s->flipped[c] ^= 1u;
    }
    pp_list_splice(s, w, s->head[r], w_in);
    s->head[r] = PP_NIL;
    s->ext[2 * w + w_in] = e;
    s->ext[e] = pp_pack(w, w_in); /* e packs (y, ty): slot 2y + ty */
}

static void merge_stacked(pp_state *s)
{
    while (s->stack_top > 0) {
        uint32_t re = s->stack[--s->stack_top];
        uint32_t we = s->stack[--s->stack_top];
        merge_root(s, we >> 1, we & 1u, re >> 1, re & 1u);
    }
}

static void embed_back_edge(pp_state *s, uint32_t r, uint32_t side, uint32_t w, uint32_t w_in)
{
    uint32_t d = s->back_dart[w];
    s->back_dart[w] = PP_NIL;
    s->pending--;
    pp_list_add(s, r, d, side);
    pp_list_add(s, w, d ^ 1u, w_in);
    s->ext[2 * r + side] = pp_pack(w, w_in);
    s->ext[2 * w + w_in] = pp_pack(r, side);
}

static int push_descent(pp_state *s, uint32_t cut, uint32_t root)
{
    if (s->stack_top + 2 > s->stack_cap) {
        uint32_t cap = s->stack_cap < 32 ? 64 : 2 * s->stack_cap;
        uint32_t *p = realloc(s->stack, (size_t)cap * sizeof(uint32_t));
        if (p == NULL)
            return -1;
        s->stack = p;
        s->stack_cap = cap;
    }
    s->stack[s->stack_top++] = cut;
    s->stack[s->stack_top++] = root;
    return 0;
}

/* Returns 1 when a descent was blocked (stack left in place), 2 when the
   walk went all the way round, 0 when it stopped at an active vertex. */
static int walk_one_side(pp_state *s, uint32_t v, uint32_t r, uint32_t side)
{
    uint32_t x = r, xs = side;
    s->stack_top = 0;
    for (;;) {
        uint32_t e = s->ext[2 * x + xs];
        uint32_t w = e >> 1, w_in = e & 1u;
        if (w == r)
            return 2;
        if (s->back_dart[w] != PP_NIL) {
            merge_stacked(s);
            embed_back_edge(s, r, side, w, w_in);
        }
        if (s->pert_tail[w] != PP_NIL) {
            uint32_t child = pp_pert_first(s, w);
            uint32_t out = descent_side(s, child, v);
            if (push_descent(s, pp_pack(w, w_in), pp_pack(child, out)) != 0)
                return 3;
            x = child;
            xs = out;
        } else if (!pp_ext_active(s, w, v)) {
            x = w;
            xs = 1u - w_in;
        } else {
            if (s->stack_top > 0)
                return 1;
            s->ext[2 * r + side] = pp_pack(w, w_in);
            s->ext[2 * w + w_in] = pp_pack(r, side);
            return 0;
        }
    }
}

/* 0 done, 1 blocked descent, 3 out of memory */
static int walkdown(pp_state *s, uint32_t v, uint32_t r)
{
    int got = walk_one_side(s, v, r, 0);
    if (got == 2)
        return 0;
    if (got == 0)
        got = walk_one_side(s, v, r, 1);
    return got == 2 ? 0 : got;
}

/* Child of v whose subtree holds descendant u. */
static uint32_t child_towards(const pp_state *s, uint32_t v, uint32_t u)
{
    while (s->parent[u] != v)
        u = s->parent[u];
    return u;
}

static pp_run_outcome run_step(pp_state *s, uint32_t v, uint32_t *root)
{
    const pw_graph *g = s->g;
    uint32_t vo = s->vertex_of[v], begin = g->first[vo], end = g->first[vo + 1];
    for (uint32_t i = begin; i < end; i++) {
        uint32_t u = s->tgt[i]; /* tree edges down carry PP_TREE: never taken */
        if (u > v && !(u & PP_TREE)) {
            s->back_dart[u] = g->darts[i];
            s->pending++;
            walkup(s, v, u);
        }
    }
    /* At step v no child of v has been merged yet: the list is complete. */
    for (uint32_t c = s->sep_head[v]; c != PP_NIL; c = s->sep_next[c]) {
        uint32_t r = s->n + c;
        int got = s->visited[r] == v ? walkdown(s, v, r) : 0;
        if (got != 0) {
            *root = r;
            return got == 1 ? PP_RUN_BLOCKED_DESCENT : PP_RUN_NOMEM;
        }
    }
    if (s->pending == 0)
        return PP_RUN_PLANAR;
    for (uint32_t i = begin; i < end; i++) {
        uint32_t u = s->tgt[i];
        if (u > v && !(u & PP_TREE) && s->back_dart[u] != PP_NIL) {
            *root = s->n + child_towards(s, v, u);
            return PP_RUN_BLOCKED_FACE;
        }
    }
    return PP_RUN_PLANAR;
}

/*
 * A step starts with dependent loads at random places: the offsets of its
 * adjacency, the adjacency, then for each back edge the walkup's first marks
 * and links.  Steps come in a known order, so each of these is fetched a few
 * steps early and the misses of several steps overlap (about 12% of the
 * algorithm's time at 10^6 and 10^7 edges).
 */
static void fetch_ahead(const pp_state *s, uint32_t v)
{
    const pw_graph *g = s->g;
    if (v >= 2 * PP_AHEAD)
        PP_PREFETCH(&g->first[s->vertex_of[v - 2 * PP_AHEAD]]);
    if (v >= PP_AHEAD) {
        uint32_t i = g->first[s->vertex_of[v - PP_AHEAD]];
        PP_PREFETCH(&s->tgt[i]);
        PP_PREFETCH(&g->darts[i]);
    }
    if (v < PP_AHEAD / 2)
        return;
    uint32_t w = v - PP_AHEAD / 2, wo = s->vertex_of[w];
    for (uint32_t i = g->first[wo]; i < g->first[wo + 1]; i++) {
        uint32_t u = s->tgt[i];
        if (u > w && !(u & PP_TREE)) {
            PP_PREFETCH(&s->visited[u]);
            PP_PREFETCH(&s->ext[2 * u]);
        }
    }
}

pp_run_outcome pp_run(pp_state *s, uint32_t *step, uint32_t *root)
{
    for (uint32_t v = s->n; v-- > 0;) {
        fetch_ahead(s, v);
        pp_run_outcome got = run_step(s, v, root);
        if (got != PP_RUN_PLANAR) {
            *step = v;
            return got;
        }
    }
    return PP_RUN_PLANAR;
}
