/*
 * fuzz_check.c - the whole check on a (graph, certificate) pair split from
 * one input (fuzz.h).  Properties: the verdict is coherent (fuzz_common.c);
 * the same pair gives the same verdict twice (determinism) and through both
 * entry points, pw_check and pw_graph_parse + pw_check_parsed (same case,
 * several paths, same verdict).
 */
#include "fuzz.h"

#include <string.h>

static int same_verdict(const pw_verdict *a, const pw_verdict *b)
{
    return a->status == b->status && a->code == b->code && a->file == b->file &&
           a->line == b->line && strcmp(a->detail, b->detail) == 0 && a->claim == b->claim &&
           a->witness == b->witness && a->vertices == b->vertices && a->edges == b->edges &&
           a->faces == b->faces && a->components == b->components &&
           memcmp(a->graph_sha256, b->graph_sha256, 32) == 0 &&
           memcmp(a->cert_sha256, b->cert_sha256, 32) == 0;
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    pw_limits lim;
    pw_verdict first, again, parsed;
    pw_graph g;
    fuzz_pair p = fuzz_split(data, size);
    fuzz_limits(&lim);
    pw_status status = pw_check(p.graph, p.graph_len, p.cert, p.cert_len, &lim, &first);
    FUZZ_REQUIRE(status == first.status, "returns its verdict's status");
    fuzz_verdict_is_coherent(&first);
    pw_check(p.graph, p.graph_len, p.cert, p.cert_len, &lim, &again);
    FUZZ_REQUIRE(same_verdict(&first, &again), "same input, same verdict");
    pw_verdict_init(&parsed);
    if (pw_graph_parse(p.graph, p.graph_len, &lim, &g, &parsed) == PW_OK) {
        pw_check_parsed(&g, p.graph, p.graph_len, p.cert, p.cert_len, &parsed);
        FUZZ_REQUIRE(same_verdict(&first, &parsed), "pw_check and pw_check_parsed agree");
    } else {
        FUZZ_REQUIRE(first.file == PW_FILE_GRAPH && first.code == parsed.code,
                     "an unusable graph decides the verdict");
    }
    pw_graph_free(&g);
    return 0;
}
