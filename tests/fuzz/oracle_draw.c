/*
 * oracle_draw.c - the drawing rules for the oracle: one point line per
 * vertex, then the test suite's brute-force drawing checker
 * (tests/draw_oracle.c: every pair of points and segments, exact 128-bit
 * orientation, angular order by sorting), fed the around lists as the
 * rotation.  One drawing oracle for all tests.
 */
#include "draw_oracle.h"
#include "oracle_int.h"

#include <stdlib.h>

/* The around lists as draw_oracle's rotation (they passed the rotation rules). */
static void rotation_of(const ograph *g, const ocert *c, uint32_t *first, uint32_t *nbr)
{
    for (size_t i = 0; i < c->n_lines; i++)
        first[c->lines[i].key + 1] = (uint32_t)c->lines[i].n;
    for (uint32_t v = 0; v < g->n; v++)
        first[v + 1] += first[v];
    for (size_t i = 0; i < c->n_lines; i++)
        for (size_t k = 0; k < c->lines[i].n; k++)
            nbr[first[c->lines[i].key] + k] = c->lines[i].v[k];
}

oracle_result oracle_drawing(const ograph *g, const ocert *c)
{
    if (c->n_points != g->n)
        return oracle_verdict(ORACLE_REJECTED, "not one point per vertex");
    int64_t *x = oracle_zeroed(g->n, sizeof *x), *y = oracle_zeroed(g->n, sizeof *y);
    unsigned char *placed = oracle_zeroed(g->n, 1);
    uint32_t *first = oracle_zeroed(g->n + 1, sizeof *first), *nbr = oracle_zeroed(2 * (size_t)g->m, sizeof *nbr);
    oracle_result r = oracle_verdict(ORACLE_ACCEPTED, "plane straight-line drawing");
    for (size_t i = 0; i < c->n_points && r.status == ORACLE_ACCEPTED; i++) {
        const opoint *p = &c->points[i];
        if (placed[p->v])
            r = oracle_verdict(ORACLE_REJECTED, "a vertex placed twice");
        placed[p->v] = 1;
        x[p->v] = p->x;
        y[p->v] = p->y;
    }
    if (r.status == ORACLE_ACCEPTED) {
        rotation_of(g, c, first, nbr);
        if (oracle_check(g->n, g->m, g->ends, first, nbr, x, y) != ORACLE_OK)
            r = oracle_verdict(ORACLE_REJECTED, "not a plane drawing with these angular orders");
    }
    free(x);
    free(y);
    free(placed);
    free(first);
    free(nbr);
    return r;
}
