/*
 * edge_list.c - the edges an importer collects, cleaned to a simple graph.
 * Self-loops and repeated pairs cannot change whether a graph is planar, so
 * they are dropped here and counted, for the importer to report.
 */
#include "import.h"

#include <stdlib.h>
#include <string.h>

int edge_list_add(edge_list *el, uint32_t u, uint32_t v)
{
    if (u == v) {
        el->self_loops++;
        return 0;
    }
    if (el->m == el->cap) {
        uint32_t cap = el->cap ? el->cap : 64;
        if (cap > UINT32_MAX / 4)
            return -1;
        uint32_t *ends = realloc(el->ends, (size_t)cap * 4 * sizeof *ends);
        if (ends == NULL)
            return -1;
        el->ends = ends;
        el->cap = cap * 2;
    }
    el->ends[2 * (size_t)el->m] = u;
    el->ends[2 * (size_t)el->m + 1] = v;
    el->m++;
    return 0;
}

static uint32_t smaller_end(const edge_list *el, uint32_t e)
{
    uint32_t a = el->ends[2 * (size_t)e], b = el->ends[2 * (size_t)e + 1];
    return a < b ? a : b;
}

/* order[] lists the edges grouped by their smaller end (a stable counting sort). */
static void bucket_by_smaller_end(const edge_list *el, uint32_t *first, uint32_t *order)
{
    for (uint32_t e = 0; e < el->m; e++)
        first[smaller_end(el, e) + 1]++;
    for (uint32_t v = 0; v < el->n; v++)
        first[v + 1] += first[v];
    for (uint32_t e = 0; e < el->m; e++)
        order[first[smaller_end(el, e)]++] = e;
}

/* Inside one bucket a later copy meets the mark its first copy left on the larger end. */
static void mark_repeats(const edge_list *el, const uint32_t *order, uint32_t *mark,
                         unsigned char *repeated)
{
    for (uint32_t v = 0; v < el->n; v++)
        mark[v] = UINT32_MAX;
    for (uint32_t i = 0; i < el->m; i++) {
        uint32_t e = order[i], lo = smaller_end(el, e);
        uint32_t hi = el->ends[2 * (size_t)e] ^ el->ends[2 * (size_t)e + 1] ^ lo;
        if (mark[hi] == lo)
            repeated[e] = 1;
        mark[hi] = lo;
    }
}

/* O(n + m): no sort by comparison, no hashing. */
int edge_list_drop_repeats(edge_list *el)
{
    uint32_t *first = calloc((size_t)el->n + 1, sizeof *first);
    uint32_t *order = malloc(((size_t)el->m + 1) * sizeof *order);
    uint32_t *mark = malloc(((size_t)el->n + 1) * sizeof *mark);
    unsigned char *repeated = calloc((size_t)el->m + 1, 1);
    int ok = first && order && mark && repeated;
    if (ok) {
        bucket_by_smaller_end(el, first, order);
        mark_repeats(el, order, mark, repeated);
        uint32_t kept = 0;
        for (uint32_t e = 0; e < el->m; e++) {
            if (repeated[e]) {
                el->repeats++;
                continue;
            }
            el->ends[2 * (size_t)kept] = el->ends[2 * (size_t)e];
            el->ends[2 * (size_t)kept + 1] = el->ends[2 * (size_t)e + 1];
            kept++;
        }
        el->m = kept;
    }
    free(first);
    free(order);
    free(mark);
    free(repeated);
    return ok ? 0 : -1;
}

void edge_list_write(FILE *out, const edge_list *el)
{
    fprintf(out, "graph %u %u\n", el->n, el->m);
    for (uint32_t e = 0; e < el->m; e++)
        fprintf(out, "%u %u\n", el->ends[2 * (size_t)e], el->ends[2 * (size_t)e + 1]);
}

void edge_list_free(edge_list *el)
{
    free(el->ends);
    memset(el, 0, sizeof *el);
}
