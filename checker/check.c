/*
 * check.c - pw_check(): digests, parsing, and the dispatch to one check.
 *
 * Order of rules, first failure wins: graph file, certificate grammar,
 * graph-sha256 binding, vertex ids in range, coordinates in range, the
 * witness's own rules, then (planar with point lines) the drawing.
 */
#include "internal.h"

#include <assert.h>
#include <openssl/evp.h>
#include <pthread.h>
#include <stdlib.h>
#include <string.h>

/*
 * The SHA-256 implementation is looked up once per process: looking it up on
 * every call cost more than hashing a small file (a third of a stream of tiny
 * graphs).  pthread_once makes the lookup safe for threaded callers.
 */
static EVP_MD *sha256_method;
static pthread_once_t sha256_once = PTHREAD_ONCE_INIT;

static void release_sha256(void)
{
    EVP_MD_free(sha256_method);
}

static void fetch_sha256(void)
{
    sha256_method = EVP_MD_fetch(NULL, "SHA256", NULL);
    atexit(release_sha256); /* EVP_MD_free(NULL) does nothing */
}

/* A failure (no SHA-256 in this OpenSSL) cannot be provoked by any input;
   the fault-injection build simulates it through pw_fault_now(). */
static int sha256(const char *buf, size_t len, unsigned char out[32])
{
    unsigned int size = 0;
    pthread_once(&sha256_once, fetch_sha256);
    int ok = sha256_method != NULL && !pw_fault_now() &&
             EVP_Digest(buf, len, out, &size, sha256_method, NULL) == 1;
    return ok && size == 32 ? 0 : -1;
}

static int digests(const char *graph, size_t graph_len, const char *cert, size_t cert_len,
                   pw_verdict *v)
{
    if (sha256(graph, graph_len, v->graph_sha256) != 0 || sha256(cert, cert_len, v->cert_sha256) != 0)
        return pw_fail(v, PW_E_NOMEM, PW_FILE_NONE, 0, "SHA-256 could not be computed");
    v->have_graph_sha256 = v->have_cert_sha256 = 1;
    return 0;
}

static int dispatch(const pw_graph *g, const char *graph, size_t graph_len, pw_cert *c,
                    pw_verdict *v)
{
    switch (c->witness) {
    case PW_WITNESS_ROTATION:
        return pw_check_rotation(g, c, v);
    case PW_WITNESS_SUBDIVISION_K5:
    case PW_WITNESS_SUBDIVISION_K33:
        return pw_check_subdivision(g, c, v);
    case PW_WITNESS_MINOR_K5:
    case PW_WITNESS_MINOR_K33:
        return pw_check_minor(g, c, v);
    case PW_WITNESS_EDGE_BOUND:
        return pw_check_edge_bound(g, c, v);
    default:
        return pw_check_bipartite_bound(g, graph, graph_len, c, v);
    }
}

static int check_certificate(const pw_graph *g, const char *graph, size_t graph_len,
                             const char *cert, size_t cert_len, pw_cert *c, pw_verdict *v)
{
    if (pw_cert_parse(cert, cert_len, g->n, c, v) != 0)
        return -1;
    v->claim = c->claim;
    v->witness = c->witness;
    if (c->have_hash && memcmp(c->hash, v->graph_sha256, 32) != 0)
        return pw_fail(v, PW_R_GRAPH_HASH, PW_FILE_CERT, c->hash_line,
                       "graph-sha256 differs from the SHA-256 of the graph file");
    if (c->bad_id_line != 0)
        return pw_fail(v, PW_R_VERTEX_RANGE, PW_FILE_CERT, c->bad_id_line,
                       "vertex %llu is not in the graph (N = %u)", (unsigned long long)c->bad_id, g->n);
    if (c->bad_coord_line != 0)
        return pw_fail(v, PW_R_COORDINATE_RANGE, PW_FILE_CERT, c->bad_coord_line,
                       "coordinate %lld exceeds 2^30 in absolute value", (long long)c->bad_coord);
    if (dispatch(g, graph, graph_len, c, v) != 0)
        return -1;
    return c->n_points > 0 ? pw_check_drawing(g, c, v) : 0;
}

pw_status pw_check_parsed(const pw_graph *g, const char *graph, size_t graph_len,
                          const char *cert, size_t cert_len, pw_verdict *v)
{
    pw_cert c;
    pw_verdict_init(v);
    v->vertices = g->n;
    v->edges = g->m;
    v->have_counts = 1;
    if (digests(graph, graph_len, cert, cert_len, v) != 0)
        return v->status;
    int failed = check_certificate(g, graph, graph_len, cert, cert_len, &c, v);
    /* Every failing path records its reason: a bare -1 would leave "accepted" standing. */
    assert((failed != 0) == (v->status != PW_ACCEPTED));
    (void)failed;
    pw_cert_free(&c);
    return v->status;
}

pw_status pw_check(const char *graph, size_t graph_len, const char *cert, size_t cert_len,
                   const pw_limits *lim, pw_verdict *v)
{
    pw_graph g;
    pw_verdict parse;
    pw_verdict_init(&parse);
    if (pw_graph_parse(graph, graph_len, lim, &g, &parse) == PW_OK) {
        pw_check_parsed(&g, graph, graph_len, cert, cert_len, v);
    } else {
        *v = parse;
        digests(graph, graph_len, cert, cert_len, v);
    }
    pw_graph_free(&g);
    return v->status;
}
