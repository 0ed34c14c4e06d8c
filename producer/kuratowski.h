/*
 * kuratowski.h - shared pieces of the Kuratowski isolation.
 *
 * Two situations end the run.  Either a walkdown descended into a child piece
 * and found both ways blocked by externally active vertices (the "descent"
 * case, kuratowski_descent.c), or it finished with back edges left over
 * because the pertinent vertices sit below the two stopping vertices x and y
 * of v's child piece (the "face" case, kuratowski_face.c and _cases.c).
 */
#ifndef PP_KURATOWSKI_H
#define PP_KURATOWSKI_H

#include "witness.h"

/* Scratch arrays for the isolation, n words each (pc and q hold at most n). */
typedef struct {
    uint32_t *size, *pc, *pos, *q, *qidx, *rvia, *bfs_par, *queue;
} pp_scratch;

/*
 * The face case, after the piece B of root r has been oriented consistently.
 * pc is B's outer cycle without r, from r's first neighbour a_L to its last
 * a_R; x = pc[px] and y = pc[py] are the stopping vertices.  q is the simple
 * path from a_L to a_R that bounds the region r's inner edges live in (the
 * inner boundary).  A vertex of q on the outer cycle is a touch point; two
 * consecutive touch points t_a, t_b bound a pocket whose outer side is
 * pc[pa..pb] and whose inner side is q[qa..qb].
 */
typedef struct {
    pp_state *s;
    uint32_t v, r;
    pp_scratch *k;
    uint32_t pc_len, q_len, px, py;
} pp_face;

typedef struct {
    uint32_t i;      /* pc index of the pertinent vertex w */
    uint32_t qa, qb; /* q indices of the pocket's touch points */
    uint32_t pa, pb; /* pc indices of the same */
    uint32_t z;      /* case-specific: q index or pc index of a fifth vertex */
} pp_pocket;

int pp_isolate_descent(pp_state *s, uint32_t v, uint32_t r, pp_witness *w, pp_scratch *k,
                       pp_result *res);
int pp_isolate_face(pp_state *s, uint32_t v, uint32_t r, pp_witness *w, pp_scratch *k,
                    pp_result *res);

/* Builders of the face case (kuratowski_cases.c). */
int pp_build_minor_b(pp_face *f, pp_witness *w, uint32_t i, pp_result *res);
int pp_build_high_attachment(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res);
int pp_build_inner_path_to_r(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res);
int pp_build_outer_active(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res);
int pp_build_w_active(pp_face *f, pp_witness *w, const pp_pocket *p, pp_result *res);

#endif
