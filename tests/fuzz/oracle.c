/*
 * oracle.c - see oracle.h.  Reading (graph file, certificate grammar) and the
 * rules of each witness, written from format-spec/ and planewit.h with the
 * simplest algorithms that are obviously right on small graphs: an adjacency
 * matrix, brute-force face tracing, structural path and set checks.  The
 * drawing rules are in oracle_draw.c (on top of tests/draw_oracle.c).
 */
#include "oracle.h"
#include "oracle_int.h"

#include <openssl/evp.h>
#include <stdlib.h>
#include <string.h>

oracle_result oracle_verdict(oracle_status status, const char *why)
{
    oracle_result r = {status, why};
    return r;
}

void *oracle_zeroed(size_t count, size_t size)
{
    void *p = calloc(count + 1, size);
    if (p == NULL)
        abort();
    return p;
}

/* ---- the graph file ------------------------------------------------------ */

static int read_graph(ograph *g, const otext *t, uint32_t max_n, uint32_t max_m)
{
    uint64_t n, m;
    if (t->n_lines == 0 || t->count[0] != 3 || !otok_is(otext_tok(t, 0, 0), "graph") ||
        otok_uint(otext_tok(t, 0, 1), &n) != 0 || otok_uint(otext_tok(t, 0, 2), &m) != 0)
        return -1;
    if (n > max_n || m > max_m || t->n_lines - 1 != m)
        return -1;
    g->n = (uint32_t)n;
    g->m = (uint32_t)m;
    g->adj = calloc((size_t)g->n * g->n + 1, 1);
    g->ends = calloc(2 * (size_t)g->m + 1, sizeof *g->ends);
    if (g->adj == NULL || g->ends == NULL)
        abort();
    for (uint32_t e = 0; e < g->m; e++) {
        uint64_t u, v;
        if (t->count[e + 1] != 2 || otok_uint(otext_tok(t, e + 1, 0), &u) != 0 ||
            otok_uint(otext_tok(t, e + 1, 1), &v) != 0 || u >= n || v >= n || u == v ||
            g->adj[u * n + v])
            return -1;
        g->adj[u * n + v] = g->adj[v * n + u] = 1;
        g->ends[2 * e] = (uint32_t)u;
        g->ends[2 * e + 1] = (uint32_t)v;
    }
    return 0;
}

/* ---- the certificate: grammar into a small record ------------------------ */

/* A vertex token: grammar error -1; an id >= N is noted for a rejection. */
static int vertex(ocert *c, otok t, uint32_t n, uint32_t *out)
{
    uint64_t v;
    if (otok_uint(t, &v) != 0)
        return -1;
    if (v >= n)
        c->bad_id = 1;
    *out = v < n ? (uint32_t)v : 0;
    return 0;
}

static void add_line(ocert *c, uint32_t key)
{
    oline *l = &c->lines[c->n_lines++];
    l->key = key;
    l->n = 0;
}

static void add_value(ocert *c, uint32_t value)
{
    oline *l = &c->lines[c->n_lines - 1];
    if ((l->n & (l->n - 1)) == 0) { /* 0, 1, 2, 4, ...: double (amortised O(1)) */
        l->v = realloc(l->v, 2 * (l->n + 1) * sizeof *l->v);
        if (l->v == NULL)
            abort();
    }
    l->v[l->n++] = value;
}

/* Tokens k.. of line l as vertices (side: as 0/1 values, 2 for anything else). */
static int values(ocert *c, const otext *t, size_t l, size_t k, uint32_t n, int sides)
{
    for (; k < t->count[l]; k++) {
        uint32_t x;
        uint64_t raw;
        if (sides) {
            if (otok_uint(otext_tok(t, l, k), &raw) != 0)
                return -1;
            x = raw <= 1 ? (uint32_t)raw : 2;
        } else if (vertex(c, otext_tok(t, l, k), n, &x) != 0) {
            return -1;
        }
        add_value(c, x);
    }
    return 0;
}

static int planar_line(ocert *c, const otext *t, size_t l, uint32_t n)
{
    otok key = otext_tok(t, l, 0);
    uint32_t v;
    if (t->count[l] < 3 || !otok_is(otext_tok(t, l, 2), ":") ||
        vertex(c, otext_tok(t, l, 1), n, &v) != 0)
        return -1;
    if (otok_is(key, "around")) {
        add_line(c, v);
        return values(c, t, l, 3, n, 0);
    }
    if (!otok_is(key, "point") || t->count[l] != 5)
        return -1;
    opoint *p = &c->points[c->n_points++];
    int64_t x, y;
    if (otok_coord(otext_tok(t, l, 3), &x) != 0 || otok_coord(otext_tok(t, l, 4), &y) != 0)
        return -1;
    if (x > (1 << 30) || x < -(1 << 30) || y > (1 << 30) || y < -(1 << 30))
        c->bad_coord = 1;
    p->v = v;
    p->x = x;
    p->y = y;
    return 0;
}

static int head_line(ocert *c, const otext *t, size_t l, uint32_t n)
{
    otok w = otext_tok(t, l, 0);
    size_t k = t->count[l];
    if (otok_is(w, "edge-bound") || otok_is(w, "bipartite-edge-bound")) {
        c->kind = otok_is(w, "edge-bound") ? K_EDGE_BOUND : K_BIPARTITE;
        return k == 1 ? 0 : -1;
    }
    if (k < 2 || !(otok_is(otext_tok(t, l, 1), "k5") || otok_is(otext_tok(t, l, 1), "k33")))
        return -1;
    int k33 = otok_is(otext_tok(t, l, 1), "k33");
    if (otok_is(w, "minor")) {
        c->kind = k33 ? K_MINOR_K33 : K_MINOR_K5;
        return k == 2 ? 0 : -1;
    }
    if (!otok_is(w, "subdivision") || k != (k33 ? 9u : 7u))
        return -1;
    c->kind = k33 ? K_SUB_K33 : K_SUB_K5;
    for (size_t i = 0, tok = 2; i < (k33 ? 6u : 5u); i++, tok++) {
        if (k33 && i == 3 && !otok_is(otext_tok(t, l, tok++), "/"))
            return -1;
        if (vertex(c, otext_tok(t, l, tok), n, &c->branch[i]) != 0)
            return -1;
    }
    return 0;
}

static int body_line(ocert *c, const otext *t, size_t l, uint32_t n)
{
    otok w = otext_tok(t, l, 0);
    uint64_t index;
    switch (c->kind) {
    case K_SUB_K5:
    case K_SUB_K33:
        if (!otok_is(w, "path") || t->count[l] < 2)
            return -1;
        add_line(c, 0);
        return values(c, t, l, 1, n, 0);
    case K_MINOR_K5:
    case K_MINOR_K33:
        if (!otok_is(w, "set") || t->count[l] < 3 || !otok_is(otext_tok(t, l, 2), ":") ||
            otok_uint(otext_tok(t, l, 1), &index) != 0)
            return -1;
        add_line(c, index < 6 ? (uint32_t)index : 6);
        return values(c, t, l, 3, n, 0);
    case K_BIPARTITE:
        if (!otok_is(w, "side") || t->count[l] < 2 || !otok_is(otext_tok(t, l, 1), ":"))
            return -1;
        add_line(c, 0);
        return values(c, t, l, 2, n, 1);
    default:
        return -1;
    }
}

static int hex_digest(otok t, unsigned char out[32])
{
    static const char digits[] = "0123456789abcdef";
    if (t.n != 64)
        return -1;
    for (size_t i = 0; i < 64; i++) {
        const char *d = memchr(digits, t.s[i], 16);
        if (d == NULL || t.s[i] == '\0')
            return -1;
        if (i % 2 == 0)
            out[i / 2] = (unsigned char)((d - digits) << 4);
        else
            out[i / 2] = (unsigned char)(out[i / 2] | (d - digits));
    }
    return 0;
}

static int read_cert(ocert *c, const otext *t, uint32_t n)
{
    uint64_t version;
    size_t l = 0;
    c->lines = calloc(t->n_lines + 1, sizeof *c->lines);
    c->points = calloc(t->n_lines + 1, sizeof *c->points);
    if (c->lines == NULL || c->points == NULL)
        abort();
    if (t->n_lines == 0 || t->count[0] != 2 || !otok_is(otext_tok(t, 0, 0), "certificate") ||
        otok_uint(otext_tok(t, 0, 1), &version) != 0 || version != 1)
        return -1;
    l = 1;
    if (l < t->n_lines && otok_is(otext_tok(t, l, 0), "graph-sha256")) {
        if (t->count[l] != 2 || hex_digest(otext_tok(t, l, 1), c->hash) != 0)
            return -1;
        c->have_hash = 1;
        l++;
    }
    if (l >= t->n_lines || t->count[l] != 2 || !otok_is(otext_tok(t, l, 0), "claim"))
        return -1;
    c->planar = otok_is(otext_tok(t, l, 1), "planar");
    if (!c->planar && !otok_is(otext_tok(t, l, 1), "nonplanar"))
        return -1;
    l++;
    if (c->planar) {
        for (c->kind = K_ROTATION; l < t->n_lines; l++)
            if (planar_line(c, t, l, n) != 0)
                return -1;
        return 0;
    }
    if (l >= t->n_lines || head_line(c, t, l, n) != 0)
        return -1;
    for (l++; l < t->n_lines; l++)
        if (body_line(c, t, l, n) != 0)
            return -1;
    return 0;
}

/* ---- the whole check ----------------------------------------------------- */

static oracle_result result(oracle_status status, const char *why)
{
    oracle_result r = {status, why};
    return r;
}

static oracle_result decide(const ograph *g, const ocert *c, const char *graph, size_t graph_len)
{
    unsigned char digest[32];
    unsigned int size = 0;
    if (c->have_hash) {
        if (EVP_Digest(graph, graph_len, digest, &size, EVP_sha256(), NULL) != 1)
            abort();
        if (memcmp(digest, c->hash, 32) != 0)
            return result(ORACLE_REJECTED, "graph-sha256 differs");
    }
    if (c->bad_id)
        return result(ORACLE_REJECTED, "a vertex id >= N");
    if (c->bad_coord)
        return result(ORACLE_REJECTED, "a coordinate beyond 2^30");
    switch (c->kind) {
    case K_ROTATION:
        return oracle_rotation(g, c);
    case K_SUB_K5:
    case K_SUB_K33:
        return oracle_subdivision(g, c);
    case K_MINOR_K5:
    case K_MINOR_K33:
        return oracle_minor(g, c);
    default:
        return oracle_bounds(g, c);
    }
}

oracle_result oracle_judge(const char *graph, size_t graph_len, const char *cert,
                           size_t cert_len, uint32_t max_n, uint32_t max_m)
{
    otext gt, ct;
    ograph g = {0, 0, NULL, NULL};
    ocert c;
    oracle_result r;
    memset(&c, 0, sizeof c);
    memset(&ct, 0, sizeof ct);
    if (otext_load(&gt, graph, graph_len) != 0)
        r = result(ORACLE_UNUSABLE, "graph: a byte not allowed");
    else if (read_graph(&g, &gt, max_n, max_m) != 0)
        r = result(ORACLE_UNUSABLE, "graph: grammar, range, limit or simplicity");
    else if (otext_load(&ct, cert, cert_len) != 0)
        r = result(ORACLE_UNUSABLE, "certificate: a byte not allowed");
    else if (read_cert(&c, &ct, g.n) != 0)
        r = result(ORACLE_UNUSABLE, "certificate: grammar");
    else
        r = decide(&g, &c, graph, graph_len);
    for (size_t i = 0; i < c.n_lines; i++)
        free(c.lines[i].v);
    free(c.lines);
    free(c.points);
    free(g.adj);
    free(g.ends);
    otext_free(&gt);
    otext_free(&ct);
    return r;
}
