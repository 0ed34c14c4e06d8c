/*
 * geometry.c - a planar claim with point lines: the drawing must be a plane
 * straight-line drawing, and its angular orders must be the around lists.
 *
 * Why this adds to the rotation check: the rotation check proves that some
 * plane embedding has these around lists (up to mirror image).  Here the
 * drawing itself is checked to be one: distinct points, no vertex inside an
 * edge, no two edges meeting except at a common endpoint (the sweep), and the
 * counterclockwise order of neighbours around each point (y axis up) equal to
 * the around list as a cyclic order - which also fixes the orientation.
 *
 * Check order (first failure wins): one point line per vertex (count, then
 * repeats in file order), distinct points, the sweep, then the angular order
 * of the around lines in file order.
 */
#include "geometry.h"

#include <stdlib.h>

int pw_cross_sign(pw_xy u, pw_xy v)
{
    int64_t left = u.x * v.y, right = u.y * v.x;
    return (left > right) - (left < right);
}

int pw_orientation(pw_xy a, pw_xy b, pw_xy c)
{
    pw_xy u = {b.x - a.x, b.y - a.y}, w = {c.x - a.x, c.y - a.y};
    return pw_cross_sign(u, w);
}

typedef struct {
    const pw_graph *g;
    const pw_cert *c;
    pw_verdict *v;
    pw_xy *at;            /* n: each vertex's point */
    uint64_t *point_line; /* n: line of its point, 0 before it is seen */
    uint32_t *order;      /* n: vertices in lexicographic order of points */
    uint32_t *rank;       /* n: place of each vertex in order[] */
} drawing;

static int index_points(drawing *d)
{
    const pw_cert *c = d->c;
    for (uint32_t i = 0; i < c->n_points; i++) {
        const pw_point *p = &c->points[i];
        if (d->point_line[p->v] != 0)
            return pw_fail(d->v, PW_R_POINT_REPEATED, PW_FILE_CERT, p->line,
                           "vertex %u already has a point line (line %llu)", p->v,
                           (unsigned long long)d->point_line[p->v]);
        d->point_line[p->v] = p->line;
        d->at[p->v].x = p->x;
        d->at[p->v].y = p->y;
    }
    return 0;
}

typedef struct {
    int64_t x, y;
    uint32_t v;
} placed;

/* Ties (coincident points) fall back to the vertex id, so reports do not depend on qsort. */
static int by_point(const void *a, const void *b)
{
    const placed *p = a, *q = b;
    if (p->x != q->x)
        return p->x < q->x ? -1 : 1;
    if (p->y != q->y)
        return p->y < q->y ? -1 : 1;
    return (p->v > q->v) - (p->v < q->v);
}

static int distinct_points(drawing *d)
{
    uint32_t n = d->g->n;
    placed *sorted = pw_alloc(n, sizeof *sorted);
    if (sorted == NULL)
        return pw_fail(d->v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the drawing check");
    for (uint32_t k = 0; k < n; k++) {
        sorted[k].x = d->at[k].x;
        sorted[k].y = d->at[k].y;
        sorted[k].v = k;
    }
    qsort(sorted, n, sizeof *sorted, by_point);
    for (uint32_t k = 0; k < n; k++) {
        d->order[k] = sorted[k].v;
        d->rank[sorted[k].v] = k;
    }
    free(sorted);
    for (uint32_t k = 1; k < n; k++) {
        pw_xy p = d->at[d->order[k - 1]], q = d->at[d->order[k]];
        if (p.x == q.x && p.y == q.y)
            return pw_fail(d->v, PW_R_POINTS_COINCIDE, PW_FILE_CERT, d->point_line[d->order[k]],
                           "vertices %u and %u are both at (%lld, %lld)", d->order[k - 1],
                           d->order[k], (long long)q.x, (long long)q.y);
    }
    return 0;
}

/* Upper half-plane (angle in [0, 180)) before lower; then counterclockwise. */
static int angle_less(pw_xy u, pw_xy w)
{
    int hu = u.y < 0 || (u.y == 0 && u.x < 0), hw = w.y < 0 || (w.y == 0 && w.x < 0);
    return hu != hw ? hu < hw : pw_cross_sign(u, w) > 0;
}

/*
 * A cyclic list of distinct directions is in counterclockwise order exactly
 * when, read cyclically, the angle decreases at one step only (where it wraps
 * past the positive x axis).  O(degree), no sorting.
 */
static int check_order(drawing *d, const pw_item *it)
{
    const pw_graph *g = d->g;
    const uint32_t *darts = pw_item_values(d->c, it);
    uint32_t x = it->key, descents = 0;
    for (uint32_t i = 0; i < it->count; i++) {
        uint32_t a = g->ends[darts[i] ^ 1u], b = g->ends[darts[(i + 1) % it->count] ^ 1u];
        pw_xy u = {d->at[a].x - d->at[x].x, d->at[a].y - d->at[x].y};
        pw_xy w = {d->at[b].x - d->at[x].x, d->at[b].y - d->at[x].y};
        descents += !angle_less(u, w);
    }
    if (it->count > 2 && descents != 1)
        return pw_fail(d->v, PW_R_ORDER_MISMATCH, PW_FILE_CERT, it->line,
                       "the neighbours of vertex %u are not drawn in this counterclockwise order", x);
    return 0;
}

static int run(drawing *d)
{
    uint32_t n = d->g->n;
    /* One point line per vertex: checked first, so that arrays of n are bounded by lines read. */
    if (d->c->n_points != n)
        return pw_fail(d->v, PW_R_POINT_COUNT, PW_FILE_CERT, d->c->points[0].line,
                       "%u point line%s for %u vertices: give all or none", d->c->n_points,
                       d->c->n_points == 1 ? "" : "s", n);
    d->at = pw_alloc(n, sizeof *d->at);
    d->point_line = pw_zalloc(n, sizeof *d->point_line);
    d->order = pw_alloc(n, sizeof *d->order);
    d->rank = pw_alloc(n, sizeof *d->rank);
    if (d->at == NULL || d->point_line == NULL || d->order == NULL || d->rank == NULL)
        return pw_fail(d->v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the drawing check");
    if (index_points(d) != 0 || distinct_points(d) != 0 ||
        pw_sweep(d->g, d->at, d->order, d->rank, d->point_line, d->v) != 0)
        return -1;
    for (uint32_t i = 0; i < d->c->n_items; i++)
        if (check_order(d, &d->c->items[i]) != 0)
            return -1;
    return 0;
}

int pw_check_drawing(const pw_graph *g, const pw_cert *c, pw_verdict *v)
{
    drawing d = {g, c, v, NULL, NULL, NULL, NULL};
    int result = run(&d);
    free(d.at);
    free(d.point_line);
    free(d.order);
    free(d.rank);
    return result;
}
