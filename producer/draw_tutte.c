/*
 * draw_tutte.c - barycentric drawings: see draw.h.
 *
 * Tutte's theorem: for a 3-connected planar graph with one face fixed on a
 * convex polygon, putting every other vertex at the average of its
 * neighbours gives a drawing without crossings that realises the embedding.
 * The averages solve L x = b, with L the Laplacian restricted to the inner
 * vertices (symmetric positive definite when the graph is connected), solved
 * by conjugate gradients: iterative, O(M) per step, no matrix stored.
 * The face traced with the face on its left runs clockwise once it is the
 * outer face, so its vertices go round the polygon clockwise.
 */
#include "draw_internal.h"

#include <math.h>
#include <stdlib.h>
#include <string.h>

void pd_tutte_free(pd_tutte *t)
{
    free(t->x);
    free(t->y);
    memset(t, 0, sizeof *t);
}

/*
 * The outer face: the longest, and among those the one whose vertices have
 * the most edges (a hub face keeps the nesting shallow, so features stay
 * large enough to survive rounding).  Returns its first dart.
 */
static uint32_t outer_face(const pd_embed *e, uint32_t *length)
{
    unsigned char *seen = calloc((size_t)e->n_darts + 1, 1);
    uint32_t best = PW_NONE;
    uint64_t best_degrees = 0;
    *length = 0;
    if (seen == NULL)
        return PW_NONE;
    for (uint32_t d0 = 0; d0 < e->n_darts; d0++) {
        uint32_t k = 0, d = d0;
        uint64_t degrees = 0;
        if (seen[d0])
            continue;
        do {
            seen[d] = 1;
            degrees += e->deg[e->tail[d]];
            d = pd_face_next(e, d);
            k++;
        } while (d != d0);
        if (k > *length || (k == *length && degrees > best_degrees)) {
            *length = k;
            best = d0;
            best_degrees = degrees;
        }
    }
    free(seen);
    return best;
}

/* Fixes the outer face on a clockwise unit polygon; 1 if it repeats a vertex. */
static int pin_outer(const pd_embed *e, uint32_t d0, uint32_t k, pd_tutte *t, unsigned char *fixed)
{
    uint32_t d = d0;
    for (uint32_t j = 0; j < k; j++, d = pd_face_next(e, d)) {
        uint32_t v = e->tail[d];
        if (fixed[v])
            return 1;
        fixed[v] = 1;
        t->x[v] = cos(-2 * 3.141592653589793 * j / k);
        t->y[v] = sin(-2 * 3.141592653589793 * j / k);
    }
    return 0;
}

/* out = L x over the inner vertices (pinned ones count as zero). */
static void laplacian(const pd_embed *e, const unsigned char *fixed, const double *x, double *out)
{
    for (uint32_t v = 0; v < e->n; v++) {
        if (fixed[v])
            continue;
        double sum = e->deg[v] * x[v];
        uint32_t d = e->any[v];
        for (uint32_t k = 0; k < e->deg[v]; k++, d = e->next[d]) {
            uint32_t w = pd_head(e, d);
            if (!fixed[w])
                sum -= x[w];
        }
        out[v] = sum;
    }
}

static double dot(const unsigned char *fixed, const double *a, const double *b, uint32_t n)
{
    double s = 0;
    for (uint32_t v = 0; v < n; v++)
        if (!fixed[v])
            s += a[v] * b[v];
    return s;
}

/* Conjugate gradients for one coordinate; work holds 3n doubles. */
static uint32_t solve_axis(const pd_embed *e, const unsigned char *fixed, double *x, double *work)
{
    uint32_t n = e->n, steps = 0;
    double *r = work, *p = work + n, *q = work + 2 * (size_t)n;
    for (uint32_t v = 0; v < n; v++) { /* b: pinned neighbours' sum; start at x = 0 */
        r[v] = 0;
        if (fixed[v])
            continue;
        uint32_t d = e->any[v];
        for (uint32_t k = 0; k < e->deg[v]; k++, d = e->next[d])
            if (fixed[pd_head(e, d)])
                r[v] += x[pd_head(e, d)];
        x[v] = 0;
        p[v] = r[v];
    }
    double rr = dot(fixed, r, r, n), goal = rr * 1e-26;
    while (rr > goal && rr > 1e-300 && steps < 20000 + 4 * n) {
        laplacian(e, fixed, p, q);
        double alpha = rr / dot(fixed, p, q, n), next_rr;
        for (uint32_t v = 0; v < n; v++)
            if (!fixed[v]) {
                x[v] += alpha * p[v];
                r[v] -= alpha * q[v];
            }
        next_rr = dot(fixed, r, r, n);
        for (uint32_t v = 0; v < n; v++)
            if (!fixed[v])
                p[v] = r[v] + next_rr / rr * p[v];
        rr = next_rr;
        steps++;
    }
    return steps;
}

static int connected(const pd_embed *e)
{
    pd_components c;
    if (pd_components_find(e, &c) != 0)
        return -1;
    int one = c.count == 1;
    pd_components_free(&c);
    return one;
}

int pd_tutte_solve(const pw_graph *g, const uint32_t *rot, pd_tutte *t)
{
    pd_embed e;
    uint32_t k;
    int rc = -1;
    memset(t, 0, sizeof *t);
    if (g->n < 4 || g->n_adj < g->n)
        return 1;
    if (pd_embed_init(&e, g, rot) != 0)
        return -1;
    unsigned char *fixed = calloc(g->n, 1);
    double *work = malloc(3 * (size_t)g->n * sizeof *work);
    t->n = g->n;
    t->x = malloc((size_t)g->n * sizeof *t->x);
    t->y = malloc((size_t)g->n * sizeof *t->y);
    if (fixed && work && t->x && t->y && (rc = connected(&e)) == 1) {
        uint32_t d0 = outer_face(&e, &k);
        rc = d0 == PW_NONE ? -1 : pin_outer(&e, d0, k, t, fixed);
        if (rc == 0)
            t->iterations = solve_axis(&e, fixed, t->x, work) + solve_axis(&e, fixed, t->y, work);
    } else if (rc == 0) {
        rc = 1;
    }
    free(fixed);
    free(work);
    pd_embed_free(&e);
    if (rc != 0)
        pd_tutte_free(t);
    return rc;
}

int pd_tutte_round(const pd_tutte *t, int64_t scale, pd_drawing *out)
{
    memset(out, 0, sizeof *out);
    out->n = t->n;
    out->x = malloc(((size_t)t->n + 1) * sizeof *out->x);
    out->y = malloc(((size_t)t->n + 1) * sizeof *out->y);
    if (!out->x || !out->y) {
        pd_drawing_free(out);
        return -1;
    }
    int64_t min_x = INT64_MAX, min_y = INT64_MAX;
    for (uint32_t v = 0; v < t->n; v++) {
        out->x[v] = (int64_t)llround(t->x[v] * (double)scale);
        out->y[v] = (int64_t)llround(t->y[v] * (double)scale);
        min_x = out->x[v] < min_x ? out->x[v] : min_x;
        min_y = out->y[v] < min_y ? out->y[v] : min_y;
    }
    for (uint32_t v = 0; v < t->n; v++) {
        out->x[v] -= min_x;
        out->y[v] -= min_y;
        out->width = out->x[v] > out->width ? out->x[v] : out->width;
        out->height = out->y[v] > out->height ? out->y[v] : out->height;
    }
    return 0;
}
