/*
 * test_producer.c - the certificate producer (producer/certify.h) judged from
 * outside: every answer is verified here by code that shares nothing with the
 * producer, then re-checked by the kernel.
 *
 *   planar     -> the rotation lists are permutations of each vertex's darts
 *                 and every component has V - E + F = 2 by face tracing
 *   nonplanar  -> the subdivision's branch vertices are distinct, its paths
 *                 join every required pair once, follow graph edges and share
 *                 no vertex except at their branch ends
 *
 * Expected values come from outside the code under test and are named where
 * they are used: OEIS sequences for the counts over all small graphs (via
 * nauty's geng), Euler's formula for the Platonic solids, textbook facts for
 * K5, K3,3 and the Petersen graph, and networkx for random graphs.
 * Seed for the random families: PP_SEED (printed).
 */
#define _GNU_SOURCE /* open_memstream, popen */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

#include "certify.h"
#include "planewit.h"

/* ---- graphs -------------------------------------------------------------- */

typedef struct {
    uint32_t n, m, cap;
    uint32_t *ends;
} edges_t;

static void edges_init(edges_t *e, uint32_t n)
{
    e->n = n;
    e->m = 0;
    e->cap = 16;
    e->ends = malloc(2 * (size_t)e->cap * sizeof(uint32_t));
    assert_non_null(e->ends);
}

static void edges_add(edges_t *e, uint32_t a, uint32_t b)
{
    if (e->m == e->cap) {
        e->cap *= 2;
        e->ends = realloc(e->ends, 2 * (size_t)e->cap * sizeof(uint32_t));
        assert_non_null(e->ends);
    }
    e->ends[2 * e->m] = a;
    e->ends[2 * e->m + 1] = b;
    e->m++;
}

/* The kernel's grouped-dart layout, built here by a counting sort. */
static pw_graph build_graph(const edges_t *e)
{
    pw_graph g;
    memset(&g, 0, sizeof g);
    g.n = e->n;
    g.m = e->m;
    for (uint32_t i = 0; i < 2 * e->m; i++)
        if (e->ends[i] + 1 > g.n_adj)
            g.n_adj = e->ends[i] + 1;
    g.ends = malloc((2 * (size_t)e->m + 1) * sizeof(uint32_t));
    g.first = calloc((size_t)g.n_adj + 2, sizeof(uint32_t));
    g.darts = malloc((2 * (size_t)e->m + 1) * sizeof(uint32_t));
    assert_true(g.ends && g.first && g.darts);
    memcpy(g.ends, e->ends, 2 * (size_t)e->m * sizeof(uint32_t));
    for (uint32_t d = 0; d < 2 * e->m; d++)
        g.first[g.ends[d] + 1]++;
    for (uint32_t v = 0; v < g.n_adj; v++)
        g.first[v + 1] += g.first[v];
    uint32_t *at = malloc(((size_t)g.n_adj + 1) * sizeof(uint32_t));
    assert_non_null(at);
    memcpy(at, g.first, ((size_t)g.n_adj + 1) * sizeof(uint32_t));
    for (uint32_t d = 0; d < 2 * e->m; d++)
        g.darts[at[g.ends[d]]++] = d;
    free(at);
    return g;
}

static void graph_release(pw_graph *g)
{
    free(g->ends);
    free(g->first);
    free(g->darts);
}

static char *graph_text(const edges_t *e, size_t *len)
{
    char *buf = NULL;
    FILE *f = open_memstream(&buf, len);
    assert_non_null(f);
    fprintf(f, "graph %u %u\n", e->n, e->m);
    for (uint32_t i = 0; i < e->m; i++)
        fprintf(f, "%u %u\n", e->ends[2 * i], e->ends[2 * i + 1]);
    fclose(f);
    return buf;
}

/* ---- independent verification -------------------------------------------- */

static uint32_t uf_find(uint32_t *p, uint32_t x)
{
    while (p[x] != x) {
        p[x] = p[p[x]];
        x = p[x];
    }
    return x;
}

/* Returns the number of faces summed over components, or -1 on a violation. */
static long long verify_rotation(const pw_graph *g, const uint32_t *rot)
{
    size_t darts = 2 * (size_t)g->m;
    uint32_t *where = malloc((darts + 1) * sizeof(uint32_t));
    uint32_t *comp = malloc(((size_t)g->n + 1) * sizeof(uint32_t));
    long long *balance = calloc((size_t)g->n + 1, sizeof(long long));
    unsigned char *seen = calloc(darts + 1, 1);
    assert_true(where && comp && balance && seen);
    long long faces = 0, bad = 0;
    for (uint32_t v = 0; v < g->n_adj && !bad; v++)
        for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++) {
            uint32_t d = rot[i];
            if (d >= darts || g->ends[d] != v || seen[d]) {
                bad = 1;
                break;
            }
            seen[d] = 1;
            where[d] = i;
        }
    for (uint32_t v = 0; v < g->n; v++)
        comp[v] = v;
    for (uint32_t e = 0; e < g->m && !bad; e++)
        comp[uf_find(comp, g->ends[2 * e])] = uf_find(comp, g->ends[2 * e + 1]);
    for (uint32_t v = 0; v < g->n && !bad; v++) /* balance = V - E + F per component */
        balance[uf_find(comp, v)] += 1;
    for (uint32_t e = 0; e < g->m && !bad; e++)
        balance[uf_find(comp, g->ends[2 * e])] -= 1;
    memset(seen, 0, darts + 1);
    for (size_t d0 = 0; d0 < darts && !bad; d0++) {
        if (seen[d0])
            continue;
        faces++;
        balance[uf_find(comp, g->ends[d0])] += 1;
        for (uint32_t d = (uint32_t)d0; !seen[d];) {
            seen[d] = 1;
            uint32_t back = d ^ 1u, w = g->ends[back], i = where[back] + 1;
            d = rot[i == g->first[w + 1] ? g->first[w] : i]; /* next after the reverse dart */
        }
    }
    for (uint32_t v = 0; v < g->n && !bad; v++) {
        if (comp[v] != v)
            continue;
        if (v >= g->n_adj || g->first[v] == g->first[v + 1])
            balance[v] += 1; /* an isolated vertex is a component with one face */
        if (balance[v] != 2)
            bad = 1;
    }
    free(where);
    free(comp);
    free(balance);
    free(seen);
    return bad ? -1 : faces;
}

static int adjacent(const pw_graph *g, uint32_t a, uint32_t b)
{
    if (a >= g->n_adj)
        return 0;
    for (uint32_t i = g->first[a]; i < g->first[a + 1]; i++)
        if (g->ends[g->darts[i] ^ 1u] == b)
            return 1;
    return 0;
}

/* 0 when r is a bare subdivision of K5 / K3,3 in g, else a reason number. */
static int verify_subdivision(const pw_graph *g, const pp_result *r)
{
    int k5 = r->kind == PP_K5;
    unsigned nb = k5 ? 5 : 6, np = k5 ? 10 : 9;
    unsigned char *used = calloc((size_t)g->n + 1, 1);
    unsigned char pair[6][6] = {{0}};
    int bad = 0;
    assert_non_null(used);
    for (unsigned i = 0; i < nb && !bad; i++) {
        if (r->branch[i] >= g->n || used[r->branch[i]])
            bad = 1;
        else
            used[r->branch[i]] = 2;
    }
    for (unsigned p = 0; p < np && !bad; p++) {
        uint32_t s = r->path_start[p], e = r->path_start[p + 1];
        if (e < s + 2) {
            bad = 2;
            break;
        }
        int ia = -1, ib = -1;
        for (unsigned i = 0; i < nb; i++) {
            if (r->branch[i] == r->path[s])
                ia = (int)i;
            if (r->branch[i] == r->path[e - 1])
                ib = (int)i;
        }
        if (ia < 0 || ib < 0 || ia == ib || (!k5 && (ia < 3) == (ib < 3)) || pair[ia][ib]) {
            bad = 3;
            break;
        }
        pair[ia][ib] = pair[ib][ia] = 1;
        for (uint32_t i = s; i + 1 < e && !bad; i++)
            if (r->path[i + 1] >= g->n || !adjacent(g, r->path[i], r->path[i + 1]))
                bad = 4;
        for (uint32_t i = s + 1; i + 1 < e && !bad; i++) {
            if (used[r->path[i]])
                bad = 5;
            used[r->path[i]] = 1;
        }
    }
    free(used);
    return bad;
}

static pw_status kernel_verdict(const edges_t *e, const pw_graph *g, const pp_result *r)
{
    size_t glen = 0, clen = 0;
    char *gtext = graph_text(e, &glen), *ctext = NULL;
    FILE *f = open_memstream(&ctext, &clen);
    assert_non_null(f);
    assert_int_equal(pp_write_cert(f, g, r, NULL), 0);
    fclose(f);
    pw_verdict v;
    pw_status st = pw_check_parsed(g, gtext, glen, ctext, clen, &v);
    if (st != PW_ACCEPTED)
        fprintf(stderr, "kernel: %s (%s)\n", pw_code_name(v.code), v.detail);
    free(gtext);
    free(ctext);
    return st;
}

typedef struct {
    int planar;
    long long faces;
    pp_kind kind;
    uint32_t witness_vertices; /* total path vertices, for "K5 itself" checks */
} outcome;

/* Certifies, verifies independently, and (if `kernel`) has the kernel agree. */
static outcome certify_checked(const edges_t *e, int kernel)
{
    pw_graph g = build_graph(e);
    pp_result r;
    outcome o = {0, 0, 0, 0};
    assert_int_equal(pp_certify(&g, &r), 0);
    o.kind = r.kind;
    o.planar = r.kind == PP_PLANAR;
    if (o.planar) {
        o.faces = verify_rotation(&g, r.rot);
        assert_true(o.faces >= 0);
    } else {
        int why = verify_subdivision(&g, &r);
        if (why != 0)
            fprintf(stderr, "subdivision rejected: reason %d (n=%u m=%u)\n", why, e->n, e->m);
        assert_int_equal(why, 0);
        o.witness_vertices = r.path_start[pp_path_count(&r)];
    }
    if (kernel)
        assert_int_equal(kernel_verdict(e, &g, &r), PW_ACCEPTED);
    pp_result_free(&r);
    graph_release(&g);
    return o;
}

/* ---- graph families ------------------------------------------------------ */

static uint64_t rng_state = 88172645463325252ull;

static uint64_t rnd64(void)
{
    rng_state ^= rng_state << 13;
    rng_state ^= rng_state >> 7;
    rng_state ^= rng_state << 17;
    return rng_state;
}

static uint32_t rnd(uint32_t bound) { return bound ? (uint32_t)(rnd64() % bound) : 0; }

static void shuffle_ids(edges_t *e)
{
    uint32_t *perm = malloc(((size_t)e->n + 1) * sizeof(uint32_t));
    assert_non_null(perm);
    for (uint32_t i = 0; i < e->n; i++)
        perm[i] = i;
    for (uint32_t i = e->n; i > 1; i--) {
        uint32_t j = rnd(i), t = perm[i - 1];
        perm[i - 1] = perm[j];
        perm[j] = t;
    }
    for (uint32_t i = 0; i < 2 * e->m; i++)
        e->ends[i] = perm[e->ends[i]];
    free(perm);
}

static void complete(edges_t *e, uint32_t n)
{
    edges_init(e, n);
    for (uint32_t a = 0; a < n; a++)
        for (uint32_t b = a + 1; b < n; b++)
            edges_add(e, a, b);
}

static void complete_bipartite(edges_t *e, uint32_t p, uint32_t q)
{
    edges_init(e, p + q);
    for (uint32_t a = 0; a < p; a++)
        for (uint32_t b = 0; b < q; b++)
            edges_add(e, a, p + b);
}

/* Random stacked triangulation: a maximal planar graph, 3n - 6 edges. */
static void stacked_triangulation(edges_t *e, uint32_t n)
{
    uint32_t *face = malloc(3 * (2 * (size_t)n + 2) * sizeof(uint32_t)), faces = 2;
    assert_non_null(face);
    edges_init(e, n);
    edges_add(e, 0, 1);
    edges_add(e, 1, 2);
    edges_add(e, 0, 2);
    uint32_t init[6] = {0, 1, 2, 0, 2, 1};
    memcpy(face, init, sizeof init);
    for (uint32_t v = 3; v < n; v++) {
        uint32_t f = rnd(faces), a = face[3 * f], b = face[3 * f + 1], c = face[3 * f + 2];
        edges_add(e, a, v);
        edges_add(e, b, v);
        edges_add(e, c, v);
        face[3 * f + 2] = v;
        uint32_t more[6] = {b, c, v, c, a, v};
        memcpy(face + 3 * faces, more, sizeof more);
        faces += 2;
    }
    free(face);
}

/* w x w grid with one diagonal per square: planar and 3-connected inside. */
static void triangulated_grid(edges_t *e, uint32_t w)
{
    edges_init(e, w * w);
    for (uint32_t i = 0; i < w; i++)
        for (uint32_t j = 0; j < w; j++) {
            uint32_t v = i * w + j;
            if (j + 1 < w)
                edges_add(e, v, v + 1);
            if (i + 1 < w)
                edges_add(e, v, v + w);
            if (i + 1 < w && j + 1 < w)
                edges_add(e, v, v + w + 1);
        }
}

static int has_edge_slow(const edges_t *e, uint32_t a, uint32_t b)
{
    for (uint32_t i = 0; i < e->m; i++)
        if ((e->ends[2 * i] == a && e->ends[2 * i + 1] == b) ||
            (e->ends[2 * i] == b && e->ends[2 * i + 1] == a))
            return 1;
    return 0;
}

static int graph6_decode(const char *s, edges_t *e)
{
    size_t len = strcspn(s, " \r\n");
    if (len == 0 || s[0] < 63 || s[0] > 125)
        return -1;
    uint32_t n = (uint32_t)(s[0] - 63), k = 0;
    edges_init(e, n);
    for (uint32_t j = 1; j < n; j++)
        for (uint32_t i = 0; i < j; i++, k++) {
            size_t at = 1 + k / 6;
            if (at >= len)
                return -1;
            if (((s[at] - 63) >> (5 - k % 6)) & 1)
                edges_add(e, i, j);
        }
    return 0;
}

/* ---- tests --------------------------------------------------------------- */

static void test_tiny_and_disconnected(void **state)
{
    (void)state;
    edges_t e;
    for (uint32_t n = 0; n <= 3; n++) { /* N = 0, 1, 2, 3 without edges */
        edges_init(&e, n);
        outcome o = certify_checked(&e, 1);
        assert_true(o.planar);
        assert_int_equal(o.faces, 0);
        free(e.ends);
    }
    edges_init(&e, 6); /* one edge among isolated vertices, ids above it unused */
    edges_add(&e, 2, 4);
    assert_true(certify_checked(&e, 1).planar);
    free(e.ends);
    edges_init(&e, 12); /* a triangle, a path, a star, isolated vertices */
    edges_add(&e, 0, 1);
    edges_add(&e, 1, 2);
    edges_add(&e, 2, 0);
    edges_add(&e, 4, 5);
    edges_add(&e, 5, 6);
    edges_add(&e, 8, 9);
    edges_add(&e, 8, 7);
    edges_add(&e, 8, 3);
    outcome o = certify_checked(&e, 1);
    assert_true(o.planar);
    assert_int_equal(o.faces, 2 + 1 + 1); /* triangle: 2 faces; trees: 1 each */
    free(e.ends);
}

static void test_platonic_solids(void **state)
{
    (void)state;
    /* Face counts by Euler's polyhedron formula: 4, 6, 8, 12, 20. */
    static const long long want[5] = {4, 6, 8, 12, 20};
    edges_t e;
    for (int solid = 0; solid < 5; solid++) {
        if (solid == 0) {
            complete(&e, 4); /* tetrahedron: 4 faces */
        } else if (solid == 1) { /* cube: 6 faces */
            edges_init(&e, 8);
            for (uint32_t v = 0; v < 8; v++)
                for (uint32_t bit = 1; bit < 8; bit <<= 1)
                    if ((v & bit) == 0)
                        edges_add(&e, v, v | bit);
        } else if (solid == 2) { /* octahedron: 8 faces */
            edges_init(&e, 6);
            for (uint32_t a = 0; a < 6; a++)
                for (uint32_t b = a + 1; b < 6; b++)
                    if (b != a + 3)
                        edges_add(&e, a, b);
        } else if (solid == 3) { /* dodecahedron: 12 faces */
            edges_init(&e, 20);
            for (uint32_t i = 0; i < 5; i++) {
                edges_add(&e, i, (i + 1) % 5);
                edges_add(&e, i, 5 + 2 * i);
                edges_add(&e, 15 + i, 5 + 2 * i + 1);
                edges_add(&e, 15 + i, 15 + (i + 1) % 5);
            }
            for (uint32_t k = 0; k < 10; k++)
                edges_add(&e, 5 + k, 5 + (k + 1) % 10);
        } else { /* icosahedron: 20 faces */
            edges_init(&e, 12);
            for (uint32_t i = 0; i < 5; i++) {
                edges_add(&e, 0, 1 + i);
                edges_add(&e, 1 + i, 1 + (i + 1) % 5);
                edges_add(&e, 11, 6 + i);
                edges_add(&e, 6 + i, 6 + (i + 1) % 5);
                edges_add(&e, 1 + i, 6 + i);
                edges_add(&e, 1 + i, 6 + (i + 1) % 5);
            }
        }
        outcome o = certify_checked(&e, 1);
        assert_true(o.planar);
        assert_int_equal(o.faces, want[solid]);
        free(e.ends);
    }
}

static void test_complete_graphs_give_k5_itself(void **state)
{
    (void)state;
    for (uint32_t n = 5; n <= 12; n++) { /* K_n, n >= 5, is not planar (Kuratowski 1930) */
        edges_t e;
        complete(&e, n);
        outcome o = certify_checked(&e, 1);
        assert_int_equal(o.kind, PP_K5);
        assert_int_equal(o.witness_vertices, 20); /* ten single edges: K5 itself */
        free(e.ends);
    }
}

static void test_k3n_gives_k33_itself(void **state)
{
    (void)state;
    for (uint32_t q = 3; q <= 10; q++) { /* K3,q, q >= 3, is not planar (Kuratowski 1930) */
        edges_t e;
        complete_bipartite(&e, 3, q);
        outcome o = certify_checked(&e, 1);
        assert_int_equal(o.kind, PP_K33);
        assert_int_equal(o.witness_vertices, 18); /* nine single edges: K3,3 itself */
        free(e.ends);
        complete_bipartite(&e, 3, q); /* the same with shuffled ids */
        shuffle_ids(&e);
        o = certify_checked(&e, 1);
        assert_int_equal(o.kind, PP_K33);
        assert_int_equal(o.witness_vertices, 18);
        free(e.ends);
    }
}

static void test_petersen(void **state)
{
    (void)state;
    edges_t e; /* the Petersen graph is not planar (textbook fact); cubic, so no K5 */
    edges_init(&e, 10);
    for (uint32_t i = 0; i < 5; i++) {
        edges_add(&e, i, (i + 1) % 5);
        edges_add(&e, i, 5 + i);
        edges_add(&e, 5 + i, 5 + (i + 2) % 5);
    }
    outcome o = certify_checked(&e, 1);
    assert_false(o.planar);
    assert_int_equal(o.kind, PP_K33);
    free(e.ends);
}

/* Runs every graph of a geng stream; returns planar count, or -1 without geng. */
static long long geng_planar_count(const char *args, long long *total)
{
    char cmd[128];
    snprintf(cmd, sizeof cmd, "nauty-geng -q %s 2>/dev/null", args);
    FILE *p = popen(cmd, "r");
    if (p == NULL)
        return -1;
    char line[256];
    long long planar = 0;
    *total = 0;
    while (fgets(line, sizeof line, p) != NULL) {
        edges_t e;
        assert_int_equal(graph6_decode(line, &e), 0);
        planar += certify_checked(&e, 1).planar;
        (*total)++;
        free(e.ends);
    }
    return pclose(p) == 0 ? planar : -1;
}

static int have_geng(void)
{
    return system("command -v nauty-geng >/dev/null 2>&1") == 0;
}

static void test_all_small_graphs(void **state)
{
    (void)state;
    if (!have_geng()) {
        fprintf(stderr, "nauty-geng missing (Debian package nauty)\n");
        skip();
    }
    /* Planar graphs on n vertices, OEIS A005470, n = 1..9. */
    static const long long planar[10] = {0, 1, 2, 4, 11, 33, 142, 822, 6966, 79853};
    /* Connected planar graphs, OEIS A003094, n = 1..9. */
    static const long long connected[10] = {0, 1, 1, 2, 6, 20, 99, 646, 5974, 71885};
    for (int n = 1; n <= 9; n++) {
        char args[32];
        long long total = 0;
        snprintf(args, sizeof args, "%d", n);
        assert_int_equal(geng_planar_count(args, &total), planar[n]);
        snprintf(args, sizeof args, "-c %d", n);
        assert_int_equal(geng_planar_count(args, &total), connected[n]);
    }
    /* Triangulations (maximal planar graphs), OEIS A000109, n = 4..9. */
    static const long long triangulations[10] = {0, 0, 0, 0, 1, 1, 2, 5, 14, 50};
    for (int n = 4; n <= 9; n++) {
        char args[32];
        long long total = 0;
        snprintf(args, sizeof args, "%d %d:%d", n, 3 * n - 6, 3 * n - 6);
        assert_int_equal(geng_planar_count(args, &total), triangulations[n]);
    }
}

static void test_agrees_with_networkx(void **state)
{
    (void)state;
    if (system("/usr/bin/python3 -c 'import networkx' >/dev/null 2>&1") != 0 ||
        access("tests/producer_nx_oracle.py", R_OK) != 0) {
        fprintf(stderr, "python3-networkx missing, or not run from the repository root\n");
        skip();
    }
    FILE *p = popen("/usr/bin/python3 tests/producer_nx_oracle.py 20261201 3000", "r");
    assert_non_null(p);
    char line[512];
    int count = 0, planar = 0;
    while (fgets(line, sizeof line, p) != NULL) {
        edges_t e;
        assert_int_equal(graph6_decode(line, &e), 0);
        int nx_planar = line[strcspn(line, " ") + 1] == '1'; /* networkx's verdict */
        outcome o = certify_checked(&e, 1);
        assert_int_equal(o.planar, nx_planar);
        planar += o.planar;
        count++;
        free(e.ends);
    }
    assert_int_equal(pclose(p), 0);
    assert_int_equal(count, 3000);
    assert_true(planar > 300 && planar < 2700); /* both verdicts well represented */
}

/* Larger random graphs around the threshold: only self-consistency counts. */
static void test_random_near_threshold(void **state)
{
    (void)state;
    for (int round = 0; round < 400; round++) {
        uint32_t n = 20 + rnd(600), m = n + rnd(2 * n);
        edges_t e;
        edges_init(&e, n);
        uint64_t *seen = calloc(((size_t)n * n + 63) / 64, 8);
        assert_non_null(seen);
        while (e.m < m) {
            uint32_t a = rnd(n), b = rnd(n);
            uint64_t key = (uint64_t)(a < b ? a : b) * n + (a < b ? b : a);
            if (a == b || (seen[key / 64] >> (key % 64)) & 1)
                continue;
            seen[key / 64] |= 1ull << (key % 64);
            edges_add(&e, a, b);
        }
        free(seen);
        certify_checked(&e, round % 4 == 0);
        free(e.ends);
    }
}

/* Planar graphs made non-planar by one edge: the witness hides in a big graph. */
static void test_big_planar_and_one_more_edge(void **state)
{
    (void)state;
    edges_t e;
    stacked_triangulation(&e, 333334); /* about 10^6 edges, 3n - 6 of them */
    shuffle_ids(&e);
    outcome o = certify_checked(&e, 1);
    assert_true(o.planar);
    assert_int_equal(o.faces, 2 * 333334 - 4); /* Euler: F = 2n - 4 for a triangulation */
    free(e.ends);
    for (int round = 0; round < 6; round++) {
        uint32_t w = 40 + rnd(300);
        triangulated_grid(&e, w);
        uint32_t a = (1 + rnd(w - 2)) * w + 1 + rnd(w - 2), b;
        do
            b = (1 + rnd(w - 2)) * w + 1 + rnd(w - 2);
        while (b == a || b == a + 1 || b + 1 == a || b == a + w || b + w == a ||
               b == a + w + 1 || b + w + 1 == a); /* interior, not already a neighbour */
        edges_add(&e, a, b); /* two interior vertices not on a common face */
        shuffle_ids(&e);
        o = certify_checked(&e, 1);
        assert_false(o.planar);
        free(e.ends);
        stacked_triangulation(&e, 2000 + rnd(50000));
        do {
            a = rnd(e.n);
            b = rnd(e.n);
        } while (a == b || has_edge_slow(&e, a, b));
        edges_add(&e, a, b); /* M = 3N - 5 > 3N - 6: never planar (Euler) */
        shuffle_ids(&e);
        o = certify_checked(&e, 1);
        assert_false(o.planar);
        free(e.ends);
    }
}

/* A path and a star of 10^7 vertices: the search must not recurse. */
static void test_long_path_and_big_star(void **state)
{
    (void)state;
    const uint32_t n = 10000000;
    edges_t e;
    edges_init(&e, n);
    for (uint32_t i = 0; i + 1 < n; i++)
        edges_add(&e, i, i + 1);
    outcome o = certify_checked(&e, 0);
    assert_true(o.planar);
    assert_int_equal(o.faces, 1);
    e.m = 0;
    for (uint32_t i = 1; i < n; i++)
        edges_add(&e, 0, i);
    o = certify_checked(&e, 0);
    assert_true(o.planar);
    free(e.ends);
}

static void test_certificate_text(void **state)
{
    (void)state;
    edges_t e;
    edges_init(&e, 4); /* a triangle and an isolated vertex */
    edges_add(&e, 0, 1);
    edges_add(&e, 1, 2);
    edges_add(&e, 2, 0);
    pw_graph g = build_graph(&e);
    pp_result r;
    assert_int_equal(pp_certify(&g, &r), 0);
    char *text = NULL;
    size_t len = 0;
    FILE *f = open_memstream(&text, &len);
    unsigned char sha[32];
    for (int i = 0; i < 32; i++)
        sha[i] = (unsigned char)(i * 8 + 1);
    assert_int_equal(pp_write_cert(f, &g, &r, sha), 0);
    fclose(f);
    const char *head = "certificate 1\n"
                       "graph-sha256 0109111921293139414951596169717981899199a1a9b1b9c1c9d1d9e1e9f1f9\n"
                       "claim planar\n";
    assert_memory_equal(text, head, strlen(head));
    const char *rest = text + strlen(head);
    assert_true(strncmp(rest, "around 0 : 1 2\n", 15) == 0 || strncmp(rest, "around 0 : 2 1\n", 15) == 0);
    assert_non_null(strstr(rest, "\naround 3 :\n"));
    assert_int_equal(text[len - 1], '\n');
    free(text);
    pp_result_free(&r);
    graph_release(&g);
    free(e.ends);

    complete(&e, 5);
    g = build_graph(&e);
    assert_int_equal(pp_certify(&g, &r), 0);
    text = NULL;
    f = open_memstream(&text, &len);
    assert_int_equal(pp_write_cert(f, &g, &r, NULL), 0);
    fclose(f);
    assert_true(strncmp(text, "certificate 1\nclaim nonplanar\nsubdivision k5 ", 44) == 0);
    int paths = 0;
    for (const char *at = text; (at = strstr(at, "\npath ")) != NULL; at++)
        paths++;
    assert_int_equal(paths, 10);
    free(text);
    pp_result_free(&r);
    graph_release(&g);
    free(e.ends);
}

/* Numbers are formatted by hand, two digits at a time: every digit count,
   zero, negatives and both ends of the 64-bit range, written out by hand. */
static void test_number_text(void **state)
{
    (void)state;
    static const struct {
        int64_t x, y;
        const char *line;
    } want[] = {
        {0, 9, "point 0 : 0 9\n"},
        {10, 99, "point 1 : 10 99\n"},
        {100, 1009, "point 2 : 100 1009\n"},
        {-1, -10, "point 3 : -1 -10\n"},
        {-205, 123456789, "point 4 : -205 123456789\n"},
        {4294967296, 1000000000000, "point 5 : 4294967296 1000000000000\n"},
        {INT64_MAX, INT64_MIN, "point 6 : 9223372036854775807 -9223372036854775808\n"},
    };
    enum { N = sizeof want / sizeof want[0] };
    edges_t e;
    edges_init(&e, N);
    edges_add(&e, 0, 1);
    pw_graph g = build_graph(&e);
    uint32_t rot[2] = {0, 1}; /* dart 0 leaves vertex 0, dart 1 vertex 1 */
    int64_t x[N], y[N];
    for (int v = 0; v < N; v++) {
        x[v] = want[v].x;
        y[v] = want[v].y;
    }
    char *text = NULL;
    size_t len = 0;
    assert_int_equal(pp_drawing_cert_text(&g, rot, x, y, NULL, &text, &len), 0);
    char *copy = malloc(len + 1); /* the text has no terminating NUL of its own */
    assert_non_null(copy);
    memcpy(copy, text, len);
    copy[len] = '\0';
    free(text);
    text = copy;
    assert_int_equal(strlen(text), len);
    const char *at = strstr(text, "point 0 :");
    assert_non_null(at);
    for (int v = 0; v < N; v++) {
        assert_true(strncmp(at, want[v].line, strlen(want[v].line)) == 0);
        at += strlen(want[v].line);
    }
    assert_int_equal(*at, '\0');
    free(text);
    graph_release(&g);
    free(e.ends);
}

#if defined(__SANITIZE_ADDRESS__)
#define UNDER_ASAN 1
#elif defined(__has_feature)
#if __has_feature(address_sanitizer)
#define UNDER_ASAN 1
#endif
#endif

/* Under an address-space limit the producer reports -1 instead of crashing. */
static void test_out_of_memory_is_reported(void **state)
{
    (void)state;
#ifdef UNDER_ASAN
    skip(); /* the sanitizer reserves address space of its own */
#endif
    edges_t e;
    stacked_triangulation(&e, 400000);
    pw_graph g = build_graph(&e);
    pid_t child = fork();
    assert_true(child >= 0);
    if (child == 0) {
        struct rlimit lim;
        getrlimit(RLIMIT_AS, &lim);
        struct rusage use;
        getrusage(RUSAGE_SELF, &use);
        lim.rlim_cur = (rlim_t)use.ru_maxrss * 1024 + (rlim_t)8 * 1024 * 1024;
        setrlimit(RLIMIT_AS, &lim);
        pp_result r;
        int got = pp_certify(&g, &r);
        _exit(got == -1 ? 0 : got == 0 ? 10 : 11);
    }
    int status = 0;
    assert_int_equal(waitpid(child, &status, 0), child);
    if (WIFEXITED(status) && WEXITSTATUS(status) == 10) {
        fprintf(stderr, "address-space limit did not bite here; skipped\n");
        graph_release(&g);
        free(e.ends);
        skip();
    }
    assert_true(WIFEXITED(status));
    assert_int_equal(WEXITSTATUS(status), 0);
    graph_release(&g);
    free(e.ends);
}

int main(void)
{
    const char *seed = getenv("PP_SEED");
    if (seed != NULL)
        rng_state = strtoull(seed, NULL, 10) | 1u;
    fprintf(stderr, "test_producer: PP_SEED=%llu\n", (unsigned long long)rng_state);
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_tiny_and_disconnected),
        cmocka_unit_test(test_platonic_solids),
        cmocka_unit_test(test_complete_graphs_give_k5_itself),
        cmocka_unit_test(test_k3n_gives_k33_itself),
        cmocka_unit_test(test_petersen),
        cmocka_unit_test(test_certificate_text),
        cmocka_unit_test(test_number_text),
        cmocka_unit_test(test_all_small_graphs),
        cmocka_unit_test(test_agrees_with_networkx),
        cmocka_unit_test(test_random_near_threshold),
        cmocka_unit_test(test_big_planar_and_one_more_edge),
        cmocka_unit_test(test_long_path_and_big_star),
        cmocka_unit_test(test_out_of_memory_is_reported),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
