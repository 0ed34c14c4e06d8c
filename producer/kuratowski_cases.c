/*
 * kuratowski_cases.c - the subdivisions of the face case.
 *
 * Names used throughout: r stands for v; x = pc[px], y = pc[py]; w = pc[i] is
 * the blocked pertinent vertex; t_a = pc[pa] = q[qa] and t_b = pc[pb] = q[qb]
 * bound w's pocket; U is a proper ancestor of v where the ways up of the
 * branch vertices meet.  Each builder states its branch sets; every path is
 * a piece of the rim (pc), of the inner boundary (q), a tree path, a back edge
 * path, or a way up, and these pieces share no inner vertex by construction.
 */
#include "kuratowski.h"

#define MARK (PP_NIL - 1u)

static void rim(pp_face *f, pp_witness *w, uint32_t a, uint32_t b)
{
    pp_wit_add_seq(w, f->k->pc, a, b);
}

static void inner(pp_face *f, pp_witness *w, uint32_t a, uint32_t b)
{
    pp_wit_add_seq(w, f->k->q, a, b);
}

/* Rim path from position a to r, round through a_L (left) or a_R (right). */
static void path_to_r(pp_face *f, pp_witness *w, uint32_t a, int right)
{
    pp_wit_begin(w);
    rim(f, w, a, right ? f->pc_len - 1 : 0);
    pp_wit_add(w, f->r);
    pp_wit_end(w);
}

static void path_rim(pp_face *f, pp_witness *w, uint32_t a, uint32_t b)
{
    pp_wit_begin(w);
    rim(f, w, a, b);
    pp_wit_end(w);
}

static void path_inner(pp_face *f, pp_witness *w, uint32_t a, uint32_t b)
{
    pp_wit_begin(w);
    inner(f, w, a, b);
    pp_wit_end(w);
}

static void path_pert(pp_witness *w, uint32_t a)
{
    pp_wit_begin(w);
    pp_wit_add_pert(w, a);
    pp_wit_end(w);
}

static void path_anc(pp_witness *w, uint32_t a, uint32_t b)
{
    pp_wit_begin(w);
    pp_wit_add_anc(w, a, b);
    pp_wit_end(w);
}

static pp_conn way_up(pp_face *f, pp_witness *w, uint32_t pos)
{
    return pp_conn_make(w, PP_CONN_EXT, f->k->pc[pos], 0, NULL, 0, 0);
}

/* Along the rim from pos to x or y, then that vertex's way up. */
static pp_conn way_up_via(pp_face *f, pp_witness *w, uint32_t pos, uint32_t end)
{
    return pp_conn_make(w, PP_CONN_SEQ_EXT, 0, 0, f->k->pc, pos, end);
}

/*
 * w has a pertinent child piece that is also externally active: inside its
 * subtree, Z splits towards a back edge to v and one to above v.
 * {x, y, Z} x {r, w, U}.
 */
int pp_build_minor_b(pp_face *f, pp_witness *w, uint32_t i, pp_result *res)
{
    pp_state *s = f->s;
    uint32_t v = f->v, wv = f->k->pc[i], cw = s->pert_tail[wv] - s->n, d1 = PP_NIL;
    uint32_t vo = s->vertex_of[v];
    for (uint32_t e = s->g->first[vo]; e < s->g->first[vo + 1] && d1 == PP_NIL; e++) {
        uint32_t t = s->dfi_of[s->g->ends[s->g->darts[e] ^ 1u]];
        if (t >= cw && t - cw < f->k->size[cw] && s->back_dart[t] != PP_NIL)
            d1 = t;
    }
    uint32_t d2 = cw;
    while (d2 != PP_NIL && s->least_anc[d2] >= v)
        d2 = pp_low_child(s, d2, v);
    if (d1 == PP_NIL || d2 == PP_NIL)
        return PP_ERR_BUG;
    for (uint32_t t = d1;; t = s->parent[t]) {
        f->k->bfs_par[t] = MARK;
        if (t == cw)
            break;
    }
    uint32_t z = d2;
    while (f->k->bfs_par[z] != MARK)
        z = s->parent[z];
    pp_conn cx = way_up(f, w, f->px), cy = way_up(f, w, f->py);
    pp_conn cz = pp_conn_make(w, PP_CONN_TREE_EXT, z, d2, NULL, 0, 0);
    uint32_t hub = pp_median3(cx.u, cy.u, cz.u);
    uint32_t branch[6] = {f->k->pc[f->px], f->k->pc[f->py], z, f->r, wv, hub};
    path_to_r(f, w, f->px, 0);
    path_rim(f, w, f->px, i);
    pp_wit_path_to_hub(w, &cx, hub);
    path_to_r(f, w, f->py, 1);
    path_rim(f, w, f->py, i);
    pp_wit_path_to_hub(w, &cy, hub);
    pp_wit_begin(w);
    pp_wit_add_down(w, z, d1);
    pp_wit_add(w, v);
    pp_wit_end(w);
    pp_wit_begin(w);
    pp_wit_add_up(w, z, wv);
    pp_wit_end(w);
    pp_wit_path_to_hub(w, &cz, hub);
    return pp_wit_emit(w, PP_K33, branch, res);
}

/*
 * One side of the face for the mirror-image cases: the pocket's touch point
 * on it (rim position t, inner position q), that side's x or y (rim position
 * xy) with its way up, and whether the rim reaches r from it on the right.
 */
typedef struct {
    uint32_t t, q, xy;
    pp_conn up;
    int right;
} face_side;

/*
 * The pocket reaches above the near side's x or y: its near touch point t_n
 * is on the rim between r and that vertex; t_f is the far touch point.
 */
static int high_attachment(pp_face *f, pp_witness *w, const pp_pocket *p, face_side *near,
                           face_side *far, pp_result *res)
{
    uint32_t *pc = f->k->pc;
    int far_beyond = near->right ? far->t <= far->xy : far->t >= far->xy;
    if (far_beyond) { /* {t_n, w, U} x {near, r, far} */
        pp_conn cv = pp_conn_make(w, PP_CONN_V, f->v, 0, NULL, 0, 0);
        uint32_t hub = pp_median3(near->up.u, far->up.u, f->v);
        uint32_t branch[6] = {pc[near->t], pc[p->i], hub, pc[near->xy], f->r, pc[far->xy]};
        path_rim(f, w, near->t, near->xy);
        path_to_r(f, w, near->t, near->right);
        pp_wit_begin(w);
        inner(f, w, near->q, far->q);
        rim(f, w, far->t, far->xy);
        pp_wit_end(w);
        path_rim(f, w, p->i, near->xy);
        path_pert(w, pc[p->i]);
        path_rim(f, w, p->i, far->xy);
        pp_wit_path_to_hub(w, &near->up, hub);
        pp_wit_path_to_hub(w, &cv, hub);
        pp_wit_path_to_hub(w, &far->up, hub);
        return pp_wit_emit(w, PP_K33, branch, res);
    }
    /* t_f inside the lower path: {r, near, t_f} x {t_n, w, far} */
    uint32_t branch[6] = {f->r, pc[near->xy], pc[far->t], pc[near->t], pc[p->i], pc[far->xy]};
    path_to_r(f, w, near->t, near->right);
    path_pert(w, pc[p->i]);
    path_to_r(f, w, far->xy, far->right);
    path_rim(f, w, near->xy, near->t);
    path_rim(f, w, near->xy, p->i);
    pp_wit_path_over(w, &near->up, &far->up);
    path_inner(f, w, far->q, near->q);
    path_rim(f, w, far->t, p->i);
    path_rim(f, w, far->t, far->xy);
    return pp_wit_emit(w, PP_K33, branch, res);
}

/* t_a on the rim between r and x: x's side is the near one; else y's, the mirror image. */
int pp_build_high_attachment(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res)
{
    pp_conn cx = way_up(f, w, f->px), cy = way_up(f, w, f->py);
    face_side left = {p->pa, p->qa, f->px, cx, 0}, right = {p->pb, p->qb, f->py, cy, 1};
    return p->pa < f->px ? high_attachment(f, w, p, &left, &right, res)
                         : high_attachment(f, w, p, &right, &left, res);
}

/* r reaches z inside the pocket's inner side: {t_a, t_b, r} x {z, w, U}. */
int pp_build_inner_path_to_r(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res)
{
    pp_state *s = f->s;
    uint32_t *pc = f->k->pc, z = f->k->q[p->z];
    pp_conn ca = way_up_via(f, w, p->pa, f->px), cb = way_up_via(f, w, p->pb, f->py);
    pp_conn cv = pp_conn_make(w, PP_CONN_V, f->v, 0, NULL, 0, 0);
    uint32_t hub = pp_median3(ca.u, cb.u, f->v);
    uint32_t branch[6] = {pc[p->pa], pc[p->pb], f->r, z, pc[p->i], hub};
    path_inner(f, w, p->qa, p->z);
    path_rim(f, w, p->pa, p->i);
    pp_wit_path_to_hub(w, &ca, hub);
    path_inner(f, w, p->qb, p->z);
    path_rim(f, w, p->pb, p->i);
    pp_wit_path_to_hub(w, &cb, hub);
    pp_wit_begin(w);
    pp_wit_add(w, z);
    for (uint32_t t = f->k->rvia[z]; t != f->r; t = f->k->bfs_par[t]) {
        if (t == PP_NIL || t >= s->n)
            return PP_ERR_BUG;
        pp_wit_add(w, t);
    }
    pp_wit_add(w, f->r);
    pp_wit_end(w);
    path_pert(w, pc[p->i]);
    pp_wit_path_to_hub(w, &cv, hub);
    return pp_wit_emit(w, PP_K33, branch, res);
}

/* Another externally active vertex z' on the pocket's rim. */
int pp_build_outer_active(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res)
{
    uint32_t *pc = f->k->pc;
    int left = p->z < p->i;
    uint32_t near = left ? p->pa : p->pb, far = left ? p->pb : p->pa;
    uint32_t qnear = left ? p->qa : p->qb, qfar = left ? p->qb : p->qa;
    pp_conn cz = way_up(f, w, p->z);
    pp_conn cfar = way_up_via(f, w, far, left ? f->py : f->px);
    pp_conn cv = pp_conn_make(w, PP_CONN_V, f->v, 0, NULL, 0, 0);
    uint32_t hub = pp_median3(cz.u, cfar.u, f->v);
    /* {z', t_far, r} x {t_near, w, U} */
    uint32_t branch[6] = {pc[p->z], pc[far], f->r, pc[near], pc[p->i], hub};
    path_rim(f, w, p->z, near);
    path_rim(f, w, p->z, p->i);
    pp_wit_path_to_hub(w, &cz, hub);
    path_inner(f, w, qfar, qnear);
    path_rim(f, w, far, p->i);
    pp_wit_path_to_hub(w, &cfar, hub);
    path_to_r(f, w, near, !left);
    path_pert(w, pc[p->i]);
    pp_wit_path_to_hub(w, &cv, hub);
    return pp_wit_emit(w, PP_K33, branch, res);
}

/* x, y and w all externally active, pocket spans x..y: K5 {r, x, y, w, U}. */
static int k5(pp_face *f, pp_witness *w, const pp_pocket *p, pp_conn *c, uint32_t hub,
              pp_result *res)
{
    uint32_t *pc = f->k->pc;
    pp_conn cv = pp_conn_make(w, PP_CONN_V, f->v, 0, NULL, 0, 0);
    uint32_t branch[5] = {f->r, pc[f->px], pc[f->py], pc[p->i], hub};
    path_to_r(f, w, f->px, 0);
    path_to_r(f, w, f->py, 1);
    path_pert(w, pc[p->i]);
    pp_wit_path_to_hub(w, &cv, hub);
    path_inner(f, w, p->qa, p->qb);
    path_rim(f, w, f->px, p->i);
    path_rim(f, w, f->py, p->i);
    for (int j = 0; j < 3; j++)
        pp_wit_path_to_hub(w, &c[j], hub);
    return pp_wit_emit(w, PP_K5, branch, res);
}

/*
 * The ways up of x, y, w meet the tree path above v at different heights and
 * one of them (the lowest, index low) alone is lowest: that vertex u_low
 * becomes a branch vertex.  {the other two, u_low} x {r, low's vertex, U'}
 * with U' where the other two meet.
 */
static int k5_split(pp_face *f, pp_witness *w, const pp_pocket *p, pp_conn *c, int low,
                    pp_result *res)
{
    uint32_t *pc = f->k->pc;
    uint32_t pos[3] = {f->px, f->py, p->i}; /* order of c[]: x, y, w */
    int a = (low + 1) % 3, b = (low + 2) % 3;
    uint32_t meet = c[a].u > c[b].u ? c[a].u : c[b].u, ul = c[low].u;
    uint32_t branch[6] = {pc[pos[a]], pc[pos[b]], ul, f->r, pc[pos[low]], meet};
    for (int j = 0; j < 2; j++) {
        int o = j == 0 ? a : b;
        /* o to r: x and y by the rim, w by its back edge */
        if (o == 2)
            path_pert(w, pc[p->i]);
        else
            path_to_r(f, w, pos[o], o == 1);
        /* o to low's vertex: rim when one of them is w, else the inner path */
        if (o == 2 || low == 2)
            path_rim(f, w, pos[o], pos[low]);
        else
            path_inner(f, w, o == 0 ? p->qa : p->qb, o == 0 ? p->qb : p->qa);
        pp_wit_path_to_hub(w, &c[o], meet);
    }
    path_anc(w, ul, f->v);
    pp_wit_begin(w);
    pp_wit_add_conn(w, &c[low]);
    pp_wit_end(w);
    path_anc(w, ul, meet);
    return pp_wit_emit(w, PP_K33, branch, res);
}

/* w itself is externally active (and its pertinent children are not). */
int pp_build_w_active(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res)
{
    uint32_t *pc = f->k->pc;
    pp_conn c[3] = {way_up(f, w, f->px), way_up(f, w, f->py), way_up(f, w, p->i)};
    if (p->pa == f->px && p->pb == f->py) {
        uint32_t m = c[0].u > c[1].u ? c[0].u : c[1].u;
        m = m > c[2].u ? m : c[2].u;
        int at_m = (c[0].u == m) + (c[1].u == m) + (c[2].u == m);
        if (at_m >= 2)
            return k5(f, w, p, c, m, res);
        return k5_split(f, w, p, c, c[0].u == m ? 0 : c[1].u == m ? 1 : 2, res);
    }
    /* {w, x, y} x {r, U, t} with t a touch point inside the lower path */
    uint32_t hub = pp_median3(c[0].u, c[1].u, c[2].u);
    int use_a = p->pa > f->px;
    uint32_t t = use_a ? p->pa : p->pb;
    uint32_t branch[6] = {pc[p->i], pc[f->px], pc[f->py], f->r, hub, pc[t]};
    path_pert(w, pc[p->i]);
    pp_wit_path_to_hub(w, &c[2], hub);
    path_rim(f, w, p->i, t);
    path_to_r(f, w, f->px, 0);
    pp_wit_path_to_hub(w, &c[0], hub);
    pp_wit_begin(w);
    if (use_a) {
        rim(f, w, f->px, p->pa);
    } else {
        inner(f, w, p->qa, p->qb);
    }
    pp_wit_end(w);
    path_to_r(f, w, f->py, 1);
    pp_wit_path_to_hub(w, &c[1], hub);
    pp_wit_begin(w);
    if (use_a) {
        rim(f, w, f->py, p->pb);
        inner(f, w, p->qb, p->qa);
    } else {
        rim(f, w, f->py, p->pb);
    }
    pp_wit_end(w);
    return pp_wit_emit(w, PP_K33, branch, res);
}
