/*
 * geometry.h - exact integer geometry shared by the drawing checks.
 *
 * Coordinates are bounded by 2^30, so a difference of two coordinates fits in
 * 32 bits and a product of two differences in 63: every orientation test
 * compares two such products and never overflows int64_t.
 */
#ifndef PW_GEOMETRY_H
#define PW_GEOMETRY_H

#include "internal.h"

typedef struct {
    int64_t x, y;
} pw_xy;

/* +1 if c lies left of the directed line a->b, -1 if right, 0 if on it. */
int pw_orientation(pw_xy a, pw_xy b, pw_xy c);
/* Sign of the cross product of directions u and v. */
int pw_cross_sign(pw_xy u, pw_xy v);

/*
 * The sweep (sweep.c): no two edges meet except at a common endpoint and no
 * vertex lies inside an edge.  at[v] is v's point, order[] the vertices in
 * lexicographic order of their distinct points, rank[v] v's place in it.
 * point_line[v] is the certificate line of v's point (for messages).  The
 * verdict must already hold both files' SHA-256: they key the treap.
 */
int pw_sweep(const pw_graph *g, const pw_xy *at, const uint32_t *order, const uint32_t *rank,
             const uint64_t *point_line, pw_verdict *v);

#endif
