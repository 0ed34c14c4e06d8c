/*
 * fuzz_import.c - the importers (cli/import_*.c: graph6, DIMACS, edge lists)
 * on arbitrary bytes.  The first input byte picks the importer (modulo 3),
 * the rest is the file.  Property: whatever an importer accepts becomes,
 * after dropping repeated pairs, a graph text that the kernel's graph parser
 * accepts with the same N and M (what `planewit import` relies on).
 */
#include "fuzz.h"
#include "import.h"

#include <stdio.h>
#include <stdlib.h>

static int run_importer(int which, const cli_input *in, const pw_limits *lim, edge_list *el,
                        name_table *names)
{
    if (which == 0)
        return import_graph6(in, lim, el);
    if (which == 1)
        return import_dimacs(in, lim, el);
    return import_edges(in, lim, el, names);
}

static void kernel_takes_the_result(const edge_list *el, const pw_limits *lim)
{
    char *text = NULL;
    size_t len = 0;
    pw_graph g;
    pw_verdict v;
    FILE *out = open_memstream(&text, &len);
    FUZZ_REQUIRE(out != NULL, "memory stream opens");
    edge_list_write(out, el);
    FUZZ_REQUIRE(fclose(out) == 0, "memory stream closes");
    pw_verdict_init(&v);
    pw_code code = pw_graph_parse(text, len, lim, &g, &v);
    if (code != PW_OK)
        fprintf(stderr, "kernel refuses the imported graph: line %llu: %s\n",
                (unsigned long long)v.line, v.detail);
    FUZZ_REQUIRE(code == PW_OK, "the kernel parses what an importer produced");
    FUZZ_REQUIRE(g.n == el->n && g.m == el->m, "same N and M");
    pw_graph_free(&g);
    free(text);
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    pw_limits lim;
    edge_list el = {0};
    name_table names = {0};
    if (size == 0)
        return 0;
    cli_input in = {"fuzz-input", (char *)(uintptr_t)(data + 1), size - 1};
    fuzz_limits(&lim);
    if (run_importer(data[0] % 3, &in, &lim, &el, &names) == 0) {
        FUZZ_REQUIRE(edge_list_drop_repeats(&el) == 0, "repeats dropped");
        kernel_takes_the_result(&el, &lim);
    }
    edge_list_free(&el);
    name_table_free(&names);
    return 0;
}
