/*
 * graph_view.c - an edge list seen as the kernel's pw_graph, without text in
 * between.  `certify --graph6` builds one per graph of a stream, so the
 * arrays are kept and only grown, never freed, from one graph to the next.
 */
#include "import.h"

#include <stdlib.h>
#include <string.h>

static int ensure_room(graph_view *view, uint32_t vertices, size_t darts)
{
    if (vertices > view->vertex_room || view->g.first == NULL) {
        uint32_t *first = realloc(view->g.first, ((size_t)vertices + 1) * sizeof *first);
        if (first == NULL)
            return -1;
        view->g.first = first;
        view->vertex_room = vertices;
    }
    if (darts > view->dart_room || view->g.darts == NULL) {
        uint32_t *d = realloc(view->g.darts, (darts ? darts : 1) * sizeof *d);
        if (d == NULL)
            return -1;
        view->g.darts = d;
        view->dart_room = (uint32_t)darts;
    }
    return 0;
}

/* The kernel's own grouping of darts, on arrays that live across graphs. */
int graph_view_build(graph_view *view, const edge_list *el)
{
    pw_graph *g = &view->g;
    size_t darts = 2 * (size_t)el->m;
    uint32_t n_adj = 0;
    for (size_t d = 0; d < darts; d++)
        if (el->ends[d] >= n_adj)
            n_adj = el->ends[d] + 1;
    if (ensure_room(view, n_adj, darts) != 0)
        return -1;
    g->n = el->n;
    g->m = el->m;
    g->n_adj = n_adj;
    g->ends = el->ends;
    pw_graph_group_darts(g);
    return 0;
}

void graph_view_free(graph_view *view)
{
    free(view->g.first);
    free(view->g.darts);
    memset(view, 0, sizeof *view);
}
