/*
 * draw_place.c - pd_draw_grid(): augment, draw each component by Schnyder's
 * method, and place the components side by side.
 *
 * Components of >= 3 vertices come first, left to right, each in its own
 * columns (component i ends in column c, the next starts in column c + 1),
 * so no two can meet.  A component of k vertices takes (k-2) x (k-2) at most,
 * so these columns number at most N_big - 2.  Isolated vertices and single
 * edges then fill columns of height H + 1 points (H the tallest component's
 * height, or N - 2 when there is none), an edge upright in one column; each
 * such column holds at least one of these small components' vertices, so the
 * whole drawing stays within (N - 2) x (N - 2) for N >= 3.
 */
#include "draw_internal.h"

#include <stdlib.h>
#include <string.h>

void pd_drawing_free(pd_drawing *d)
{
    free(d->x);
    free(d->y);
    memset(d, 0, sizeof *d);
}

/* Twice the signed area of a b c: positive when counterclockwise. */
static int64_t turn(const pd_drawing *d, uint32_t a, uint32_t b, uint32_t c)
{
    return (d->x[b] - d->x[a]) * (d->y[c] - d->y[a]) - (d->y[b] - d->y[a]) * (d->x[c] - d->x[a]);
}

/*
 * Draws one component of >= 3 vertices at column `left`; returns its height.
 * Schnyder's points realise the embedding or its mirror image, depending on
 * how the colours run; the outer face a1 a2 a0 must turn counterclockwise,
 * and swapping x and y mirrors the drawing when it does not.
 */
static int64_t draw_component(const pd_embed *e, pd_wood *w, const uint32_t *member,
                              uint32_t size, int64_t left, pd_drawing *d, int *stuck)
{
    int64_t max_x = 0, max_y = 0;
    if (pd_wood_build(e, member, size, w) != 0) {
        *stuck = 1;
        return 0;
    }
    pd_wood_coordinates(w, d->x, d->y);
    int mirror = turn(d, w->root[1], w->root[2], w->root[0]) < 0;
    for (uint32_t i = 0; i < size; i++) {
        uint32_t v = member[i];
        if (mirror) {
            int64_t t = d->x[v];
            d->x[v] = d->y[v];
            d->y[v] = t;
        }
        max_x = d->x[v] > max_x ? d->x[v] : max_x;
        max_y = d->y[v] > max_y ? d->y[v] : max_y;
        d->x[v] += left;
    }
    d->width = left + max_x;
    return max_y;
}

typedef struct {
    int64_t column, row, height; /* next free point, column height in rows */
    int used;                    /* the current column holds something */
} column_fill;

static void place_small(column_fill *f, const pd_components *c, uint32_t i, pd_drawing *d)
{
    uint32_t size = c->start[i + 1] - c->start[i];
    if (f->row + size - 1 > f->height) {
        f->column++;
        f->row = 0;
    }
    for (uint32_t k = 0; k < size; k++) {
        uint32_t v = c->member[c->start[i] + k];
        d->x[v] = f->column;
        d->y[v] = f->row++;
    }
    f->used = 1;
}

static int draw_all(const pd_embed *e, const pd_components *c, pd_drawing *d)
{
    pd_wood w;
    int64_t left = 0, tallest = 0;
    int stuck = 0, any_big = 0;
    if (pd_wood_alloc(&w, e->n) != 0)
        return -1;
    for (uint32_t i = 0; i < c->count && !stuck; i++) {
        uint32_t size = c->start[i + 1] - c->start[i];
        if (size < 3)
            continue;
        int64_t h = draw_component(e, &w, c->member + c->start[i], size, left, d, &stuck);
        tallest = h > tallest ? h : tallest;
        left = d->width + 1;
        any_big = 1;
    }
    pd_wood_free(&w);
    if (stuck)
        return -1;
    column_fill f = {left, 0, any_big ? tallest : (int64_t)e->n - 2, 0};
    if (f.height < 1)
        f.height = 1;
    for (uint32_t i = 0; i < c->count; i++)
        if (c->start[i + 1] - c->start[i] < 3)
            place_small(&f, c, i, d);
    d->height = tallest;
    d->width = any_big ? left - 1 : 0;
    for (uint32_t v = 0; v < d->n; v++) {
        d->width = d->x[v] > d->width ? d->x[v] : d->width;
        d->height = d->y[v] > d->height ? d->y[v] : d->height;
    }
    return 0;
}

/*
 * A simple planar graph with 3N - 6 edges (N >= 3) is a triangulation: it is
 * maximal planar, so connected, every face of any embedding is a triangle and
 * no vertex is a cut vertex (Euler's formula).  Then nothing needs adding.
 */
static int is_triangulation(const pw_graph *g)
{
    return g->n >= 3 && (uint64_t)g->m == 3 * (uint64_t)g->n - 6;
}

int pd_draw_grid(const pw_graph *g, const uint32_t *rot, pd_drawing *out)
{
    pd_embed e;
    pd_components c;
    int rc = -1, whole = is_triangulation(g);
    memset(out, 0, sizeof *out);
    out->n = g->n;
    out->x = calloc((size_t)g->n + 1, sizeof *out->x);
    out->y = calloc((size_t)g->n + 1, sizeof *out->y);
    if (!out->x || !out->y || pd_embed_init(&e, g, rot) != 0) {
        pd_drawing_free(out);
        return -1;
    }
    if ((whole ? pd_components_whole(g->n, &c) : pd_components_find(&e, &c)) == 0) {
        if (whole || (pd_biconnect(&e) == 0 && pd_triangulate(&e) == 0))
            rc = draw_all(&e, &c, out);
        pd_components_free(&c);
    }
    pd_embed_free(&e);
    if (rc != 0)
        pd_drawing_free(out);
    return rc;
}
