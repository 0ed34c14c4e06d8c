/*
 * draw_oracle.c - see draw_oracle.h.  Orientation by the sign of a cross
 * product, segment intersection by orientations plus on-segment tests for the
 * collinear cases (common practice).
 */
#include "draw_oracle.h"

#include <stdlib.h>

typedef __int128 wide;

static int sign_of(wide v)
{
    return (v > 0) - (v < 0);
}

/* Sign of (b - a) x (c - a). */
static int orient(int64_t ax, int64_t ay, int64_t bx, int64_t by, int64_t cx, int64_t cy)
{
    return sign_of((wide)(bx - ax) * (cy - ay) - (wide)(by - ay) * (cx - ax));
}

/* c collinear with a-b: is it within the closed box of a-b? */
static int within(int64_t ax, int64_t ay, int64_t bx, int64_t by, int64_t cx, int64_t cy)
{
    return (cx >= (ax < bx ? ax : bx)) && (cx <= (ax > bx ? ax : bx)) &&
           (cy >= (ay < by ? ay : by)) && (cy <= (ay > by ? ay : by));
}

/* Do closed segments p1-p2 and q1-q2 share a point? */
static int segments_touch(const int64_t *x, const int64_t *y, uint32_t p1, uint32_t p2,
                          uint32_t q1, uint32_t q2)
{
    int o1 = orient(x[p1], y[p1], x[p2], y[p2], x[q1], y[q1]);
    int o2 = orient(x[p1], y[p1], x[p2], y[p2], x[q2], y[q2]);
    int o3 = orient(x[q1], y[q1], x[q2], y[q2], x[p1], y[p1]);
    int o4 = orient(x[q1], y[q1], x[q2], y[q2], x[p2], y[p2]);
    if (o1 * o2 < 0 && o3 * o4 < 0)
        return 1;
    return (o1 == 0 && within(x[p1], y[p1], x[p2], y[p2], x[q1], y[q1])) ||
           (o2 == 0 && within(x[p1], y[p1], x[p2], y[p2], x[q2], y[q2])) ||
           (o3 == 0 && within(x[q1], y[q1], x[q2], y[q2], x[p1], y[p1])) ||
           (o4 == 0 && within(x[q1], y[q1], x[q2], y[q2], x[p2], y[p2]));
}

/* Two edges with the common end s and other ends a, b: do they overlap? */
static int overlap_at(const int64_t *x, const int64_t *y, uint32_t s, uint32_t a, uint32_t b)
{
    wide dot = (wide)(x[a] - x[s]) * (x[b] - x[s]) + (wide)(y[a] - y[s]) * (y[b] - y[s]);
    return orient(x[s], y[s], x[a], y[a], x[b], y[b]) == 0 && dot > 0;
}

static int edges_meet(const int64_t *x, const int64_t *y, const uint32_t *e1, const uint32_t *e2)
{
    for (int i = 0; i < 2; i++)
        for (int j = 0; j < 2; j++)
            if (e1[i] == e2[j])
                return overlap_at(x, y, e1[i], e1[1 - i], e2[1 - j]);
    return segments_touch(x, y, e1[0], e1[1], e2[0], e2[1]);
}

static int geometry(uint32_t n, uint32_t m, const uint32_t *ends, const int64_t *x,
                    const int64_t *y)
{
    for (uint32_t a = 0; a < n; a++)
        for (uint32_t b = a + 1; b < n; b++)
            if (x[a] == x[b] && y[a] == y[b])
                return ORACLE_COINCIDE;
    for (uint32_t e = 0; e < m; e++)
        for (uint32_t v = 0; v < n; v++) {
            uint32_t a = ends[2 * e], b = ends[2 * e + 1];
            if (v != a && v != b && orient(x[a], y[a], x[b], y[b], x[v], y[v]) == 0 &&
                within(x[a], y[a], x[b], y[b], x[v], y[v]))
                return ORACLE_ON_EDGE;
        }
    for (uint32_t e = 0; e < m; e++)
        for (uint32_t f = e + 1; f < m; f++)
            if (edges_meet(x, y, ends + 2 * e, ends + 2 * f))
                return ORACLE_EDGES_MEET;
    return ORACLE_OK;
}

/* Upper half-plane (and the positive x axis) first, then by cross product. */
static int half(int64_t dx, int64_t dy)
{
    return dy > 0 || (dy == 0 && dx > 0) ? 0 : 1;
}

static int angle_less(int64_t ux, int64_t uy, int64_t vx, int64_t vy)
{
    int hu = half(ux, uy), hv = half(vx, vy);
    if (hu != hv)
        return hu < hv;
    return sign_of((wide)ux * vy - (wide)uy * vx) > 0;
}

void oracle_sort_by_angle(uint32_t n, const uint32_t *first, uint32_t *nbr, const int64_t *x,
                          const int64_t *y)
{
    for (uint32_t v = 0; v < n; v++) /* insertion sort: small degrees in tests */
        for (uint32_t i = first[v] + 1; i < first[v + 1]; i++)
            for (uint32_t j = i; j > first[v]; j--) {
                uint32_t a = nbr[j - 1], b = nbr[j];
                if (!angle_less(x[b] - x[v], y[b] - y[v], x[a] - x[v], y[a] - y[v]))
                    break;
                nbr[j - 1] = b;
                nbr[j] = a;
            }
}

static int same_cycle(const uint32_t *a, const uint32_t *b, uint32_t k)
{
    uint32_t shift = 0;
    while (shift < k && b[shift] != a[0])
        shift++;
    if (k > 0 && shift == k)
        return 0;
    for (uint32_t i = 0; i < k; i++)
        if (a[i] != b[(i + shift) % k])
            return 0;
    return 1;
}

int oracle_check(uint32_t n, uint32_t m, const uint32_t *ends, const uint32_t *first,
                 const uint32_t *nbr, const int64_t *x, const int64_t *y)
{
    int verdict = geometry(n, m, ends, x, y);
    if (verdict != ORACLE_OK || nbr == NULL)
        return verdict;
    uint32_t *sorted = malloc(((size_t)first[n] + 1) * sizeof *sorted);
    if (sorted == NULL)
        abort();
    for (uint32_t i = 0; i < first[n]; i++)
        sorted[i] = nbr[i];
    oracle_sort_by_angle(n, first, sorted, x, y);
    for (uint32_t v = 0; v < n && verdict == ORACLE_OK; v++)
        if (!same_cycle(nbr + first[v], sorted + first[v], first[v + 1] - first[v]))
            verdict = ORACLE_ORDER;
    free(sorted);
    return verdict;
}
