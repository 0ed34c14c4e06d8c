/*
 * draw.h - straight-line integer drawings of planar graphs (untrusted producer).
 *
 * Input: a simple graph (checker/planewit.h's pw_graph) and a rotation system
 * for it, in the layout producer/certify.h uses: for v < g->n_adj the darts
 * leaving v in counterclockwise order at rot[g->first[v] .. g->first[v+1]-1].
 *
 * Output: integer coordinates, y axis up, such that the straight-line drawing
 * has no crossings and at every vertex the counterclockwise angular order of
 * its neighbours is exactly the given rotation.  So the certificate written by
 * pd_write_cert() is the graph's own rotation system plus the points.
 *
 * The grid layout (pd_draw_grid):
 *   1. each connected component with at least 3 vertices is made biconnected
 *      and then triangulated inside its faces, never adding a multi-edge
 *      (draw_augment.c, draw_triangulate.c);
 *   2. a canonical order of the triangulation gives a Schnyder wood
 *      (draw_schnyder.c), whose region counts give coordinates in an
 *      (n-2) x (n-2) grid (Schnyder 1990; draw_grid.c);
 *   3. components are placed side by side, left to right, with one free
 *      column between them; isolated vertices and single edges fill columns
 *      on the right (draw_place.c).  For N >= 3 the whole drawing stays within
 *      (N-2) x (N-2).
 * Every step is O(N + M) time and memory and iterative.
 *
 * The Tutte layout (pd_tutte_*, draw_tutte.c) is a barycentric drawing for
 * connected graphs; it is only a proposal: the caller must verify it (the
 * kernel does) and fall back to the grid layout when verification fails.
 *
 * Nothing here is trusted: every drawing goes to the kernel before it is
 * written.  Functions return 0 on success and -1 when memory runs out,
 * unless documented otherwise.
 */
#ifndef PD_DRAW_H
#define PD_DRAW_H

#include "planewit.h"

#include <stdint.h>
#include <stdio.h>

typedef struct {
    uint32_t n;
    int64_t *x, *y;        /* n points, all coordinates >= 0 */
    int64_t width, height; /* largest x and largest y: the grid used */
} pd_drawing;

/* Schnyder grid drawing realising rot.  rot must be a planar rotation system. */
int pd_draw_grid(const pw_graph *g, const uint32_t *rot, pd_drawing *out);

/*
 * Barycentric drawing (Tutte 1963): the longest face of rot (most edges at
 * its vertices among equals) on a regular
 * polygon, every other vertex at the average of its neighbours, solved by
 * conjugate gradients in floating point.  pd_tutte_solve returns 1 (and
 * nothing to free) when it does not apply: the graph is not connected, has
 * fewer than 4 vertices, or that face repeats a vertex.  pd_tutte_round
 * scales the solution to integers (polygon radius `scale`, at most 2^29).
 * Only 3-connected graphs are sure to give a drawing without crossings, and
 * rounding may still spoil it: the caller must verify every result.
 */
typedef struct {
    uint32_t n;
    double *x, *y;
    uint32_t iterations; /* conjugate gradient steps used */
} pd_tutte;

int pd_tutte_solve(const pw_graph *g, const uint32_t *rot, pd_tutte *t);
int pd_tutte_round(const pd_tutte *t, int64_t scale, pd_drawing *out);
void pd_tutte_free(pd_tutte *t);

void pd_drawing_free(pd_drawing *d);


/*
 * The planar certificate with coordinates: `certificate 1`, the optional
 * `graph-sha256` line (graph_sha256 may be NULL), `claim planar`, one `around`
 * line per vertex from rot, one `point` line per vertex.  Into a fresh buffer
 * the caller frees.
 */
int pd_cert_text(const pw_graph *g, const uint32_t *rot, const pd_drawing *d,
                 const unsigned char *graph_sha256, char **text, size_t *len);

#endif
