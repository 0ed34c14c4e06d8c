/*
 * fuzz_graph.c - the graph parser on arbitrary bytes.  Beyond "no crash, no
 * leak, no undefined behaviour" (the sanitizers' part), a parsed graph must be
 * what planewit.h promises: ids in range, darts grouped by their source,
 * every edge simple and present once.
 */
#include "fuzz.h"

#include <stdlib.h>

static void graph_is_well_formed(const pw_graph *g)
{
    FUZZ_REQUIRE(g->n_adj <= g->n, "n_adj <= n");
    FUZZ_REQUIRE(g->m == 0 || g->n_adj > 0, "edges need vertices");
    if (g->m == 0)
        return;
    FUZZ_REQUIRE(g->first[0] == 0 && g->first[g->n_adj] == 2 * g->m, "offsets span all darts");
    for (uint32_t v = 0; v < g->n_adj; v++) {
        FUZZ_REQUIRE(g->first[v] <= g->first[v + 1], "offsets grow");
        for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++) {
            uint32_t d = g->darts[i];
            FUZZ_REQUIRE(d < 2 * g->m && g->ends[d] == v, "dart leaves its vertex");
            FUZZ_REQUIRE(g->ends[d ^ 1u] != v, "no self-loop");
            FUZZ_REQUIRE(pw_adjacent(g, g->ends[d ^ 1u], v), "adjacency is symmetric");
        }
    }
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    pw_limits lim;
    pw_graph g;
    pw_verdict v;
    fuzz_limits(&lim);
    pw_verdict_init(&v);
    pw_code code = pw_graph_parse((const char *)data, size, &lim, &g, &v);
    if (code == PW_OK) {
        FUZZ_REQUIRE(v.code == PW_OK && v.vertices == g.n && v.edges == g.m, "counts reported");
        graph_is_well_formed(&g);
    } else {
        FUZZ_REQUIRE(v.code == code && v.status == PW_UNUSABLE, "a graph error is unusable input");
        FUZZ_REQUIRE(v.file == PW_FILE_GRAPH, "a graph error names the graph file");
        FUZZ_REQUIRE(v.detail[0] != '\0', "a graph error says what");
    }
    pw_graph_free(&g);
    return 0;
}
