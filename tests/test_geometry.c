/*
 * test_geometry.c - the kernel's drawing check against an independent
 * brute-force oracle written for this test: every pair of segments and every
 * vertex against every edge, with 128-bit orientation tests, O(M^2); angular
 * order by sorting.  Thousands of seeded small drawings on a tiny grid (so
 * collinear, vertical and touching cases are common), plane ones built by
 * adding edges that the oracle allows, then mutated: moved points, swapped
 * coordinates, swapped neighbours, added edges.  Seed: PW_SEED, printed.
 */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "seeded_random.h"
#include "planewit.h"

enum { MAXN = 12, MAXM = 40, TEXT = 4096 };

typedef struct {
    int n, m;
    long x[MAXN], y[MAXN];
    int a[MAXM], b[MAXM];
    int around[MAXN][MAXN], deg[MAXN];
} drawing;


/* ---- the oracle --------------------------------------------------------- */

static int orient(const drawing *d, int p, int q, int r)
{
    __int128 v = (__int128)(d->x[q] - d->x[p]) * (d->y[r] - d->y[p]) -
                 (__int128)(d->y[q] - d->y[p]) * (d->x[r] - d->x[p]);
    return (v > 0) - (v < 0);
}

/* r on the closed segment p-q. */
static int on_segment(const drawing *d, int p, int q, int r)
{
    return orient(d, p, q, r) == 0 &&
           (d->x[r] - d->x[p]) * (d->x[r] - d->x[q]) <= 0 &&
           (d->y[r] - d->y[p]) * (d->y[r] - d->y[q]) <= 0;
}

/* Do edges i and j share a point other than a common endpoint? */
static int bad_pair(const drawing *d, int i, int j)
{
    int p = d->a[i], q = d->b[i], r = d->a[j], t = d->b[j];
    int common = p == r || p == t ? p : q == r || q == t ? q : -1;
    if (common >= 0) {
        int u = p == common ? q : p, w = r == common ? t : r;
        return on_segment(d, common, u, w) || on_segment(d, common, w, u);
    }
    if (on_segment(d, p, q, r) || on_segment(d, p, q, t) || on_segment(d, r, t, p) ||
        on_segment(d, r, t, q))
        return 1;
    return orient(d, p, q, r) * orient(d, p, q, t) < 0 && orient(d, r, t, p) * orient(d, r, t, q) < 0;
}

static int half(long dx, long dy)
{
    return dy < 0 || (dy == 0 && dx < 0);
}

static int angle_before(const drawing *d, int c, int u, int w)
{
    long ux = d->x[u] - d->x[c], uy = d->y[u] - d->y[c], wx = d->x[w] - d->x[c], wy = d->y[w] - d->y[c];
    if (half(ux, uy) != half(wx, wy))
        return half(ux, uy) < half(wx, wy);
    return (__int128)ux * wy - (__int128)uy * wx > 0;
}

/* The neighbours of c in counterclockwise order from the positive x axis. */
static void ccw_neighbours(const drawing *d, int c, int *out, int *k)
{
    *k = 0;
    for (int e = 0; e < d->m; e++)
        if (d->a[e] == c || d->b[e] == c)
            out[(*k)++] = d->a[e] == c ? d->b[e] : d->a[e];
    for (int i = 1; i < *k; i++)
        for (int j = i; j > 0 && angle_before(d, c, out[j], out[j - 1]); j--) {
            int t = out[j];
            out[j] = out[j - 1];
            out[j - 1] = t;
        }
}

static int same_cycle(const int *p, const int *q, int k)
{
    for (int s = 0; s < k; s++) {
        int ok = 1;
        for (int i = 0; i < k && ok; i++)
            ok = p[i] == q[(i + s) % k];
        if (ok)
            return 1;
    }
    return k == 0;
}

/* 1 iff the drawing is plane and its angular orders are the around lists. */
static int oracle(const drawing *d)
{
    for (int i = 0; i < d->n; i++)
        for (int j = i + 1; j < d->n; j++)
            if (d->x[i] == d->x[j] && d->y[i] == d->y[j])
                return 0;
    for (int e = 0; e < d->m; e++) {
        for (int v = 0; v < d->n; v++)
            if (v != d->a[e] && v != d->b[e] && on_segment(d, d->a[e], d->b[e], v))
                return 0;
        for (int f = e + 1; f < d->m; f++)
            if (bad_pair(d, e, f))
                return 0;
    }
    for (int v = 0; v < d->n; v++) {
        int order[MAXN], k;
        ccw_neighbours(d, v, order, &k);
        if (!same_cycle(d->around[v], order, k))
            return 0;
    }
    return 1;
}

/* ---- building drawings and certificates -------------------------------- */

static int has_edge(const drawing *d, int p, int q)
{
    for (int e = 0; e < d->m; e++)
        if ((d->a[e] == p && d->b[e] == q) || (d->a[e] == q && d->b[e] == p))
            return 1;
    return 0;
}

static void take_geometric_rotation(drawing *d)
{
    for (int v = 0; v < d->n; v++)
        ccw_neighbours(d, v, d->around[v], &d->deg[v]);
}

static void random_plane_drawing(drawing *d, int grid)
{
    memset(d, 0, sizeof *d);
    d->n = 2 + (int)rnd(MAXN - 1);
    for (int v = 0; v < d->n; v++) {
        int clash;
        do {
            d->x[v] = (long)rnd((uint32_t)grid) - grid / 2;
            d->y[v] = (long)rnd((uint32_t)grid) - grid / 2;
            clash = 0;
            for (int u = 0; u < v; u++)
                clash |= d->x[u] == d->x[v] && d->y[u] == d->y[v];
        } while (clash);
    }
    for (int tries = 0; tries < 60 && d->m < MAXM; tries++) {
        int p = (int)rnd((uint32_t)d->n), q = (int)rnd((uint32_t)d->n);
        if (p == q || has_edge(d, p, q))
            continue;
        d->a[d->m] = p;
        d->b[d->m] = q;
        d->m++;
        take_geometric_rotation(d);
        if (!oracle(d))
            d->m--;
    }
    take_geometric_rotation(d);
}

static void write_files(const drawing *d, char *graph, char *cert)
{
    int g = snprintf(graph, TEXT, "graph %d %d\n", d->n, d->m), c;
    for (int e = 0; e < d->m; e++)
        g += snprintf(graph + g, (size_t)(TEXT - g), "%d %d\n", d->a[e], d->b[e]);
    c = snprintf(cert, TEXT, "certificate 1\nclaim planar\n");
    for (int v = 0; v < d->n; v++) {
        c += snprintf(cert + c, (size_t)(TEXT - c), "point %d : %ld %ld\naround %d :", v, d->x[v],
                      d->y[v], v);
        for (int i = 0; i < d->deg[v]; i++)
            c += snprintf(cert + c, (size_t)(TEXT - c), " %d", d->around[v][i]);
        c += snprintf(cert + c, (size_t)(TEXT - c), "\n");
    }
}

static pw_verdict run_kernel(const drawing *d)
{
    char graph[TEXT], cert[TEXT];
    pw_limits lim;
    pw_verdict v;
    pw_limits_default(&lim);
    write_files(d, graph, cert);
    pw_check(graph, strlen(graph), cert, strlen(cert), &lim, &v);
    return v;
}

static void mutate(drawing *d)
{
    int v = (int)rnd((uint32_t)d->n);
    switch (rnd(4)) {
    case 0:
        d->x[v] += (long)rnd(5) - 2;
        d->y[v] += (long)rnd(5) - 2;
        break;
    case 1: {
        long t = d->x[v];
        d->x[v] = d->y[v];
        d->y[v] = t;
        break;
    }
    case 2:
        if (d->deg[v] >= 3) {
            int t = d->around[v][0];
            d->around[v][0] = d->around[v][1];
            d->around[v][1] = t;
        }
        break;
    default: {
        int p = (int)rnd((uint32_t)d->n), q = (int)rnd((uint32_t)d->n);
        if (p != q && !has_edge(d, p, q) && d->m < MAXM) {
            d->a[d->m] = p;
            d->b[d->m] = q;
            d->m++;
            take_geometric_rotation(d);
        }
    }
    }
}

static void kernel_agrees_with_brute_force(void **state)
{
    int accepted = 0, rejected = 0, by_code[64] = {0};
    (void)state;
    rnd_start("test_geometry", 20261201u);
    for (int round = 0; round < 4000; round++) {
        drawing d;
        random_plane_drawing(&d, round % 2 ? 5 : 9);
        pw_verdict v = run_kernel(&d);
        assert_int_equal(oracle(&d), 1);
        if (v.status != PW_ACCEPTED)
            fail_msg("round %d: plane drawing refused: %s (%s)", round, v.detail, pw_code_name(v.code));
        accepted++;
        mutate(&d);
        v = run_kernel(&d);
        int expected = oracle(&d);
        if ((v.status == PW_ACCEPTED) != expected)
            fail_msg("round %d: oracle says %d, kernel %s: %s", round, expected,
                     pw_code_name(v.code), v.detail);
        rejected += !expected;
        if (!expected && v.code < 64)
            by_code[v.code]++;
    }
    for (int code = 0; code < 64; code++)
        if (by_code[code])
            printf("test_geometry:   %5d rejected as %s\n", by_code[code], pw_code_name((pw_code)code));
    /* Every geometric reason must have been reached by some mutant. */
    static const pw_code geometric[] = {PW_R_VERTEX_ON_EDGE, PW_R_EDGES_CROSS, PW_R_EDGES_OVERLAP,
                                        PW_R_ORDER_MISMATCH, PW_R_POINTS_COINCIDE};
    for (size_t i = 0; i < sizeof geometric / sizeof geometric[0]; i++)
        assert_true(by_code[geometric[i]] > 0);
    printf("test_geometry: %d plane drawings accepted, %d mutants rejected as the oracle says\n",
           accepted, rejected);
    assert_true(rejected > 500);
}

static pw_status check_text(const char *graph, const char *cert, pw_verdict *v)
{
    pw_limits lim;
    pw_limits_default(&lim);
    return pw_check(graph, strlen(graph), cert, strlen(cert), &lim, v);
}

static const char triangle[] = "graph 3 3\n0 1\n1 2\n2 0\n";

static void point_lines_all_or_none_each_once(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check_text(triangle, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                          "around 2 : 0 1\npoint 0 : 0 0\npoint 1 : 4 0\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_POINT_COUNT);
    assert_int_equal(v.line, 6);
    assert_int_equal(check_text(triangle, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                          "around 2 : 0 1\npoint 0 : 0 0\npoint 1 : 4 0\npoint 1 : 0 4\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_POINT_REPEATED);
    assert_string_equal(v.detail, "vertex 1 already has a point line (line 7)");
}

static void orientation_is_checked_with_points(void **state)
{
    pw_verdict v;
    (void)state;
    /* Counterclockwise triangle (0,0) (4,0) (0,4): around 0 is 1 then 2. */
    assert_int_equal(check_text(triangle, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                          "around 2 : 0 1\npoint 0 : 0 0\npoint 1 : 4 0\npoint 2 : 0 4\n", &v),
                     PW_ACCEPTED);
    /* Its mirror image draws every order clockwise: fine for degree 2, so use K4. */
    static const char k4[] = "graph 4 6\n0 1\n0 2\n0 3\n1 2\n1 3\n2 3\n";
    static const char pts[] = "point 0 : 0 0\npoint 1 : 9 0\npoint 2 : 0 9\npoint 3 : 2 2\n";
    char cert[512];
    snprintf(cert, sizeof cert, "certificate 1\nclaim planar\naround 0 : 1 3 2\naround 1 : 2 3 0\n"
                                "around 2 : 0 3 1\naround 3 : 1 2 0\n%s", pts);
    assert_int_equal(check_text(k4, cert, &v), PW_ACCEPTED);
    snprintf(cert, sizeof cert, "certificate 1\nclaim planar\naround 0 : 2 3 1\naround 1 : 0 3 2\n"
                                "around 2 : 1 3 0\naround 3 : 0 2 1\n%s", pts);
    assert_int_equal(check_text(k4, cert, &v), PW_REJECTED);
    assert_int_equal(v.code, PW_R_ORDER_MISMATCH);
    assert_int_equal(v.line, 3);
}

static void coordinates_are_bounded_by_two_to_the_thirty(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check_text(triangle, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                          "around 2 : 0 1\npoint 0 : -1073741824 0\n"
                                          "point 1 : 1073741824 0\npoint 2 : 0 1073741824\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(check_text(triangle, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                          "around 2 : 0 1\npoint 0 : -1073741825 0\n"
                                          "point 1 : 1073741824 0\npoint 2 : 0 1073741824\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_COORDINATE_RANGE);
    assert_string_equal(v.detail, "coordinate -1073741825 exceeds 2^30 in absolute value");
}

/* Large accepted drawings: a star of 10^5 spokes, and a chain of 10^5 collinear vertices. */
static void star_and_collinear_chain_are_accepted(void **state)
{
    enum { K = 100000 };
    size_t cap = (size_t)K * 64;
    char *graph = malloc(cap), *cert = malloc(cap);
    pw_verdict v;
    (void)state;
    assert_non_null(graph);
    assert_non_null(cert);
    for (int chain = 0; chain < 2; chain++) {
        size_t g = (size_t)snprintf(graph, cap, "graph %d %d\n", K + 1, K);
        size_t c = (size_t)snprintf(cert, cap, "certificate 1\nclaim planar\n");
        for (int i = 1; i <= K; i++)
            g += (size_t)snprintf(graph + g, cap - g, "%d %d\n", chain ? i - 1 : 0, i);
        if (!chain) { /* spokes to points around a square, listed counterclockwise by construction */
            c += (size_t)snprintf(cert + c, cap - c, "point 0 : 0 0\naround 0 :");
            for (int i = 1; i <= K; i++)
                c += (size_t)snprintf(cert + c, cap - c, " %d", i);
            c += (size_t)snprintf(cert + c, cap - c, "\n");
            for (int i = 1; i <= K; i++) {
                int q = (i - 1) / (K / 4), r = (i - 1) % (K / 4), side = K / 8;
                long x = q == 0 ? side : q == 1 ? side - 2 * r * side / (K / 4) : q == 2 ? -side : -side + 2 * r * side / (K / 4);
                long y = q == 0 ? -side + 2 * r * side / (K / 4) : q == 1 ? side : q == 2 ? side - 2 * r * side / (K / 4) : -side;
                c += (size_t)snprintf(cert + c, cap - c, "point %d : %ld %ld\naround %d : 0\n", i, x, y, i);
            }
        } else {
            for (int i = 0; i <= K; i++) {
                c += (size_t)snprintf(cert + c, cap - c, "point %d : %d %d\naround %d :", i, 3 * i, 2 * i, i);
                if (i > 0)
                    c += (size_t)snprintf(cert + c, cap - c, " %d", i - 1);
                if (i < K)
                    c += (size_t)snprintf(cert + c, cap - c, " %d", i + 1);
                c += (size_t)snprintf(cert + c, cap - c, "\n");
            }
        }
        pw_limits lim;
        pw_limits_default(&lim);
        assert_int_equal(pw_check(graph, g, cert, c, &lim, &v), PW_ACCEPTED);
    }
    free(graph);
    free(cert);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(kernel_agrees_with_brute_force),
        cmocka_unit_test(point_lines_all_or_none_each_once),
        cmocka_unit_test(orientation_is_checked_with_points),
        cmocka_unit_test(coordinates_are_bounded_by_two_to_the_thirty),
        cmocka_unit_test(star_and_collinear_chain_are_accepted),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
