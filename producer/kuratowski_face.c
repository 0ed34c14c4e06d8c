/*
 * kuratowski_face.c - isolation when v's child piece B was walked to its two
 * stopping vertices x and y while back edges remain.
 *
 * Pertinent vertices then lie on the lower outer path strictly between x and
 * y.  With r's inner edges set aside, the region they bounded has an inner
 * boundary q from a_L to a_R; where q touches the outer cycle it cuts B's rim
 * into pockets.  A pertinent w inside a pocket could only reach r if its
 * pocket were turned inside out, and one of the following forbids that:
 *   - the pocket's rim holds x or y strictly inside (high attachment),
 *   - r reaches the pocket's inner side by a path of its own,
 *   - the pocket's rim holds another externally active vertex, or w itself is.
 * A pertinent w with an externally active pertinent child piece is blocked
 * outright.  The walkdown's failure guarantees one such w; each rule has its
 * K3,3 or K5 in kuratowski_cases.c.
 */
#include "kuratowski.h"

/* Mirrors every vertex of B whose accumulated flip is odd, so that faces of B
   can be traced by one fixed rule.  B's tree edges all lead down from c. */
static void orient_piece(pp_state *s, uint32_t r, uint32_t *stack)
{
    uint32_t top = 0;
    stack[top++] = r - s->n;
    while (top > 0) {
        uint32_t b = stack[--top], h;
        if (s->flipped[b])
            pp_list_reverse(s, b);
        h = s->head[b];
        uint32_t d = h;
        do {
            uint32_t t = s->dfi_of[s->g->ends[d ^ 1u]];
            if (t < s->n && s->parent[t] == b) { /* a tree edge down, merged into B */
                s->flipped[t] ^= s->flipped[b];
                stack[top++] = t;
            }
            d = s->nxt[d];
        } while (d != h);
        s->flipped[b] = 0;
    }
}

/* The outer cycle: leave r by its head dart; each vertex is entered by its
   tail dart and left by its head dart. */
static int trace_outer(pp_face *f)
{
    pp_state *s = f->s;
    uint32_t d = s->head[f->r], len = 0;
    for (;;) {
        uint32_t t = pp_arc_target(s, d, f->r), a = d ^ 1u;
        if (a != s->prv[s->head[t]])
            return PP_ERR_BUG;
        if (t == f->r)
            break;
        if (f->k->pos[t] != PP_NIL || len >= s->n)
            return PP_ERR_BUG;
        f->k->pos[t] = len;
        f->k->pc[len++] = t;
        d = s->nxt[a];
    }
    f->pc_len = len;
    return len >= 3 ? 0 : PP_ERR_BUG;
}

static int find_stopping_vertices(pp_face *f)
{
    pp_state *s = f->s;
    const uint32_t *pc = f->k->pc;
    uint32_t a = 0, b = f->pc_len - 1;
    while (a < f->pc_len && pp_inactive(s, pc[a], f->v))
        a++;
    while (b > 0 && pp_inactive(s, pc[b], f->v))
        b--;
    if (a >= b || pp_pertinent(s, pc[a]) || pp_pertinent(s, pc[b]))
        return PP_ERR_BUG;
    f->px = a;
    f->py = b;
    return 0;
}

/* Darts into r other than the two on the outer cycle are set aside. */
static int hidden(const pp_face *f, uint32_t at, uint32_t d)
{
    const uint32_t *pc = f->k->pc;
    return pp_arc_target(f->s, d, f->r) == f->r && at != pc[0] && at != pc[f->pc_len - 1];
}

static void push_or_unwind(pp_face *f, uint32_t x)
{
    uint32_t *q = f->k->q, *qidx = f->k->qidx;
    if (qidx[x] != PP_NIL) {
        while (q[f->q_len - 1] != x)
            qidx[q[--f->q_len]] = PP_NIL;
        return;
    }
    qidx[x] = f->q_len;
    q[f->q_len++] = x;
}

/*
 * Traces the face beyond r's last dart with r's inner darts set aside, from
 * a_R round to a_L, keeping only a simple path: a vertex met again cuts off
 * the detour made since its first visit.  Then q is turned to run a_L -> a_R.
 */
static int trace_inner(pp_face *f)
{
    pp_state *s = f->s;
    uint32_t *q = f->k->q, *qidx = f->k->qidx;
    uint32_t d = s->prv[s->head[f->r]], at = pp_arc_target(s, d, f->r), a = d ^ 1u;
    uint64_t budget = 2 * (uint64_t)s->g->m + 4;
    f->q_len = 0;
    push_or_unwind(f, at);
    for (;;) {
        if (budget-- == 0)
            return PP_ERR_BUG;
        d = s->nxt[a];
        while (hidden(f, at, d))
            d = s->nxt[d];
        uint32_t t = pp_arc_target(s, d, f->r);
        if (t == f->r)
            break;
        push_or_unwind(f, t);
        at = t;
        a = d ^ 1u;
    }
    if (at != f->k->pc[0] || q[f->q_len - 1] != at)
        return PP_ERR_BUG;
    for (uint32_t i = 0, j = f->q_len - 1; i < j; i++, j--) {
        uint32_t t = q[i];
        q[i] = q[j];
        q[j] = t;
    }
    for (uint32_t i = 0; i < f->q_len; i++)
        qidx[q[i]] = i;
    return 0;
}

/* Touch points must meet the rim in the same order as q runs. */
static int collect_touch_points(pp_face *f, uint32_t *touch, uint32_t *count)
{
    const uint32_t *pos = f->k->pos, *q = f->k->q;
    uint32_t m = 0;
    for (uint32_t i = 0; i < f->q_len; i++) {
        uint32_t p = pos[q[i]];
        if (p == PP_NIL)
            continue;
        if (m > 0 && p <= pos[q[touch[m - 1]]])
            return PP_ERR_BUG;
        touch[m++] = i;
    }
    *count = m;
    return m >= 2 && pos[q[touch[m - 1]]] == f->pc_len - 1 ? 0 : PP_ERR_BUG;
}

/*
 * Marks the q vertices off the rim that r reaches without touching the rim or
 * q elsewhere: rvia[z] is the vertex before z on such a path, bfs_par leads
 * from there back to r.  One breadth-first search over B.
 */
static void find_paths_from_r(pp_face *f)
{
    pp_state *s = f->s;
    pp_scratch *k = f->k;
    uint32_t head = 0, tail = 0, from = f->r;
    for (;;) {
        uint32_t h = s->head[from], d = h;
        do {
            uint32_t t = pp_arc_target(s, d, f->r);
            if (t != f->r && k->pos[t] == PP_NIL) {
                if (k->qidx[t] != PP_NIL) {
                    if (k->rvia[t] == PP_NIL)
                        k->rvia[t] = from;
                } else if (k->bfs_par[t] == PP_NIL) {
                    k->bfs_par[t] = from;
                    k->queue[tail++] = t;
                }
            }
            d = s->nxt[d];
        } while (d != h);
        if (head == tail)
            return;
        from = k->queue[head++];
    }
}

/* First q index strictly inside (qa, qb) that r reaches on its own. */
static uint32_t inner_path_target(const pp_face *f, uint32_t qa, uint32_t qb)
{
    for (uint32_t i = qa + 1; i < qb; i++)
        if (f->k->rvia[f->k->q[i]] != PP_NIL)
            return i;
    return PP_NIL;
}

static uint32_t outer_active_vertex(const pp_face *f, uint32_t pa, uint32_t pb)
{
    for (uint32_t i = pa + 1; i < pb; i++)
        if (pp_ext_active(f->s, f->k->pc[i], f->v))
            return i;
    return PP_NIL;
}

/* Applies the rules above to the pocket of the pertinent vertex pc[i]. */
static int try_pocket(pp_face *f, pp_witness *w, pp_pocket *p, pp_result *res)
{
    if (p->pa < f->px || p->pb > f->py)
        return pp_build_high_attachment(f, w, p, res);
    p->z = inner_path_target(f, p->qa, p->qb);
    if (p->z != PP_NIL)
        return pp_build_inner_path_to_r(f, w, p, res);
    if (pp_ext_active(f->s, f->k->pc[p->i], f->v))
        return pp_build_w_active(f, w, p, res);
    p->z = outer_active_vertex(f, p->pa, p->pb);
    if (p->z != PP_NIL)
        return pp_build_outer_active(f, w, p, res);
    return 1; /* this pocket could be turned: try the next pertinent vertex */
}

static int choose_and_build(pp_face *f, pp_witness *w, pp_result *res)
{
    pp_state *s = f->s;
    pp_scratch *k = f->k;
    uint32_t *touch = k->queue, m = 0, t = 0;
    int got = collect_touch_points(f, touch, &m);
    if (got != 0)
        return got;
    for (uint32_t i = f->px + 1; i < f->py; i++) {
        uint32_t x = k->pc[i];
        while (t + 1 < m && k->pos[k->q[touch[t + 1]]] <= i)
            t++;
        if (!pp_pertinent(s, x))
            continue;
        uint32_t tail = s->pert_tail[x];
        if (tail != PP_NIL && s->lowpoint[tail - s->n] < f->v)
            return pp_build_minor_b(f, w, i, res);
        if (k->pos[k->q[touch[t]]] == i || t + 1 >= m)
            continue;
        pp_pocket p = {i, touch[t], touch[t + 1], k->pos[k->q[touch[t]]],
                       k->pos[k->q[touch[t + 1]]], PP_NIL};
        got = try_pocket(f, w, &p, res);
        if (got != 1)
            return got;
    }
    return PP_ERR_BUG;
}

int pp_isolate_face(pp_state *s, uint32_t v, uint32_t r, pp_witness *w, pp_scratch *k,
                    pp_result *res)
{
    pp_face f = {s, v, r, k, 0, 0, 0, 0};
    for (uint32_t x = 0; x < s->n; x++)
        k->pos[x] = k->qidx[x] = k->rvia[x] = k->bfs_par[x] = PP_NIL;
    orient_piece(s, r, k->queue);
    int got = trace_outer(&f);
    if (got == 0)
        got = find_stopping_vertices(&f);
    if (got == 0)
        got = trace_inner(&f);
    if (got != 0)
        return got;
    find_paths_from_r(&f);
    return choose_and_build(&f, w, res);
}
