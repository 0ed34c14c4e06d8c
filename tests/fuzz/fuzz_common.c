/*
 * fuzz_common.c - see fuzz.h.
 */
#include "fuzz.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

void fuzz_limits(pw_limits *lim)
{
    pw_limits_default(lim);
    lim->max_vertices = 4096;
    lim->max_edges = 16384;
}

fuzz_pair fuzz_split(const uint8_t *data, size_t size)
{
    fuzz_pair p;
    const uint8_t *nul = size ? memchr(data, 0, size) : NULL;
    p.graph = (const char *)data;
    p.graph_len = nul ? (size_t)(nul - data) : size;
    p.cert = nul ? (const char *)nul + 1 : "";
    p.cert_len = nul ? size - p.graph_len - 1 : 0;
    return p;
}

void fuzz_violated(const char *what, const char *file, int line)
{
    fprintf(stderr, "property violated: %s (%s:%d)\n", what, file, line);
    abort();
}

/*
 * The verdict's parts agree with each other: the status is the one the code
 * implies (planewit.h: 1-29 unusable, 30 and up rejected), the code has a
 * name, a failure says where unless it is a whole-run failure, and an
 * accepted planar verdict satisfies Euler's formula summed over components,
 * V - E + F = 2C (Euler's formula, per component; common practice).
 */
void fuzz_verdict_is_coherent(const pw_verdict *v)
{
    FUZZ_REQUIRE(strcmp(pw_code_name(v->code), "unknown") != 0, "code has a name");
    FUZZ_REQUIRE(memchr(v->detail, 0, sizeof v->detail) != NULL, "detail is terminated");
    if (v->code == PW_OK) {
        FUZZ_REQUIRE(v->status == PW_ACCEPTED, "ok means accepted");
        FUZZ_REQUIRE(v->file == PW_FILE_NONE && v->line == 0, "accepted names no place");
        FUZZ_REQUIRE(v->claim != PW_CLAIM_NONE && v->witness != PW_WITNESS_NONE,
                     "accepted names claim and witness");
        FUZZ_REQUIRE(v->have_graph_sha256 && v->have_cert_sha256, "accepted carries digests");
        if (v->claim == PW_CLAIM_PLANAR)
            FUZZ_REQUIRE((int64_t)v->vertices - (int64_t)v->edges + (int64_t)v->faces ==
                             2 * (int64_t)v->components,
                         "accepted planar: V - E + F = 2C");
        return;
    }
    FUZZ_REQUIRE(v->status == (v->code < PW_R_GRAPH_HASH ? PW_UNUSABLE : PW_REJECTED),
                 "status follows code");
    FUZZ_REQUIRE(v->detail[0] != '\0', "a failure says what");
    if (v->code >= PW_R_GRAPH_HASH)
        FUZZ_REQUIRE(v->file == PW_FILE_CERT, "a rejection points into the certificate");
    if (v->code >= PW_E_BYTE && v->code < PW_R_GRAPH_HASH)
        FUZZ_REQUIRE(v->file != PW_FILE_NONE && v->line > 0, "a grammar error says where");
}
