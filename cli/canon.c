/*
 * canon.c - the canonical digest of a graph: SHA-256 of its normal form
 * (format-spec/signoff-record.md, "Canonical graph digest").  The normal form
 * is "graph N M\n" and then one line "U V\n" per edge with U < V, sorted by U
 * and then V, numbers in decimal: the same labelled graph written in another
 * layout, with comments, CRLF or another edge order has the same digest.
 */
#include "cli.h"

#include <stdlib.h>

#include <openssl/evp.h>

static int compare_keys(const void *a, const void *b)
{
    uint64_t x = *(const uint64_t *)a, y = *(const uint64_t *)b;
    return (x > y) - (x < y);
}

/* Edges as (min << 32 | max), sorted: numeric order of the normal form's lines. */
static uint64_t *sorted_edge_keys(const pw_graph *g)
{
    uint64_t *keys = malloc((g->m ? g->m : 1) * sizeof *keys);
    if (keys == NULL)
        return NULL;
    for (uint32_t e = 0; e < g->m; e++) {
        uint64_t u = g->ends[2 * e], v = g->ends[2 * e + 1];
        keys[e] = u < v ? u << 32 | v : v << 32 | u;
    }
    qsort(keys, g->m, sizeof *keys, compare_keys);
    return keys;
}

static int digest_normal_form(const pw_graph *g, const uint64_t *keys, unsigned char out[32])
{
    char buf[1 << 16];
    size_t used;
    unsigned int out_len = 0;
    EVP_MD_CTX *ctx = EVP_MD_CTX_new();
    int ok = ctx != NULL && EVP_DigestInit_ex(ctx, EVP_sha256(), NULL) == 1;
    used = (size_t)snprintf(buf, sizeof buf, "graph %u %u\n", g->n, g->m);
    for (uint32_t e = 0; ok && e < g->m; e++) {
        if (sizeof buf - used < 32) {
            ok = EVP_DigestUpdate(ctx, buf, used) == 1;
            used = 0;
        }
        used += (size_t)snprintf(buf + used, sizeof buf - used, "%u %u\n",
                                 (unsigned)(keys[e] >> 32), (unsigned)(keys[e] & 0xffffffffu));
    }
    ok = ok && EVP_DigestUpdate(ctx, buf, used) == 1;
    ok = ok && EVP_DigestFinal_ex(ctx, out, &out_len) == 1 && out_len == 32;
    EVP_MD_CTX_free(ctx);
    return ok ? 0 : -1;
}

int cli_canonical_graph_sha256(const char *bytes, size_t len, const pw_limits *lim,
                               unsigned char out[32])
{
    pw_graph g;
    pw_verdict v;
    int rc = -1;
    if (pw_graph_parse(bytes, len, lim, &g, &v) == PW_OK) {
        uint64_t *keys = sorted_edge_keys(&g);
        if (keys != NULL)
            rc = digest_normal_form(&g, keys, out);
        free(keys);
    }
    pw_graph_free(&g);
    return rc;
}
