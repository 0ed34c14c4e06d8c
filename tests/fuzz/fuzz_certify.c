/*
 * fuzz_certify.c - certify, mutate, compare.  The input describes a small
 * graph (first byte: N = 1 + byte % 12; then byte pairs: edges, taken modulo
 * N, self-loops and repeats skipped).  The producer (producer/certify.h)
 * certifies it; the kernel must accept that certificate (a refusal is a
 * producer finding).  Then a few seeded token mutations of the certificate
 * (token_mutate.h) are judged by the kernel and by the independent oracle
 * (oracle.h); any disagreement on the status is a finding.
 */
#include "certify.h"
#include "differential.h"
#include "token_mutate.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define MAX_N 12
#define ROOM 16384

/* The graph text for the input's edges; its length. */
static size_t graph_text(const uint8_t *data, size_t size, char *out, size_t room)
{
    unsigned char adj[MAX_N][MAX_N] = {{0}};
    uint32_t n = 1u + data[0] % MAX_N, m = 0;
    char edges[4096];
    size_t used = 0;
    for (size_t i = 1; i + 1 < size && used + 16 < sizeof edges; i += 2) {
        uint32_t u = data[i] % n, v = data[i + 1] % n;
        if (u == v || adj[u][v])
            continue;
        adj[u][v] = adj[v][u] = 1;
        used += (size_t)snprintf(edges + used, sizeof edges - used, "%u %u\n", u, v);
        m++;
    }
    int head = snprintf(out, room, "graph %u %u\n", n, m);
    memcpy(out + head, edges, used);
    return (size_t)head + used;
}

/* The producer's certificate for the graph, malloc'ed; NULL if it gave none. */
static char *certify(const char *graph, size_t len, size_t *cert_len)
{
    pw_limits lim;
    pw_graph g;
    pw_verdict v;
    pp_result r;
    char *text = NULL;
    pw_limits_default(&lim);
    FUZZ_REQUIRE(pw_graph_parse(graph, len, &lim, &g, &v) == PW_OK, "our graph text parses");
    if (pp_certify(&g, &r) == 0) {
        FILE *out = open_memstream(&text, cert_len);
        FUZZ_REQUIRE(out != NULL, "memory stream opens");
        FUZZ_REQUIRE(pp_write_cert(out, &g, &r, NULL) == 0, "certificate written");
        fclose(out);
        pp_result_free(&r);
    }
    pw_graph_free(&g);
    return text;
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    static uint8_t pair[ROOM], work[ROOM];
    pw_status status;
    size_t cert_len = 0;
    if (size == 0)
        return 0;
    size_t glen = graph_text(data, size, (char *)pair, sizeof pair);
    char *cert = certify((const char *)pair, glen, &cert_len);
    FUZZ_REQUIRE(cert != NULL, "the producer certifies every small graph");
    if (glen + 1 + cert_len > ROOM) {
        free(cert);
        return 0;
    }
    pair[glen] = 0;
    memcpy(pair + glen + 1, cert, cert_len);
    free(cert);
    size_t len = glen + 1 + cert_len;
    differential_compare(fuzz_split(pair, len), 1, &status);
    FUZZ_REQUIRE(status == PW_ACCEPTED, "the kernel accepts the producer's certificate");
    uint32_t seed = 0;
    for (size_t i = 0; i < size; i++)
        seed = seed * 31u + data[i];
    for (uint32_t k = 0; k < 8; k++) {
        memcpy(work, pair, len);
        size_t mutated = token_mutate(work, len, ROOM, seed + k * 2654435761u);
        differential_compare(fuzz_split(work, mutated), 1, &status);
    }
    return 0;
}
