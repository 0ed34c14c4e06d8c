/*
 * dfs.c - depth-first numbering, lowpoints and the children sorted by
 * lowpoint: the preprocessing the edge-addition method relies on.  Each tree
 * edge also starts its own piece here, while its dart is at hand.
 *
 * Iterative throughout: a path of 10^7 vertices is an ordinary input, so the
 * search keeps its own stack instead of using the call stack.
 */
#include "pp_state.h"

static uint32_t min_u32(uint32_t a, uint32_t b) { return a < b ? a : b; }

/* The piece of tree edge p -> x: virtual root n + x joined to x only. */
static void start_piece(pp_state *s, uint32_t x, uint32_t dart)
{
    uint32_t r = s->n + x, back = dart ^ 1u;
    s->head[r] = dart; /* both lists are new: one dart each */
    s->nxt[dart] = s->prv[dart] = dart;
    s->head[x] = back;
    s->nxt[back] = s->prv[back] = back;
    s->ext[2 * r] = pp_pack(x, 1);
    s->ext[2 * r + 1] = pp_pack(x, 0);
    s->ext[2 * x] = pp_pack(r, 1);
    s->ext[2 * x + 1] = pp_pack(r, 0);
}

/* Gives original vertex u the next DFI and makes it a child of p. */
static uint32_t number_vertex(pp_state *s, uint32_t u, uint32_t p, uint32_t dart,
                              uint32_t *next_dfi, uint32_t *iter)
{
    uint32_t x = (*next_dfi)++;
    s->dfi_of[u] = x;
    s->vertex_of[x] = u;
    s->parent[x] = p;
    s->lowpoint[x] = x;
    s->least_anc[x] = x;
    iter[x] = s->g->first[u];
    if (p != PP_NIL)
        start_piece(s, x, dart);
    return x;
}

/*
 * One search from an unvisited root; `work` is the explicit stack.  The darts
 * of the vertex on top are examined in a tight loop until one leads to a new
 * vertex; the DFI look-ups of the next few are started early, since with
 * shuffled ids each one is a cache miss.
 */
static void search_from(pp_state *s, uint32_t root, uint32_t *next_dfi, uint32_t *iter,
                        uint32_t *work, uint32_t *nbr)
{
    const pw_graph *g = s->g;
    uint32_t top = 0;
    work[top++] = number_vertex(s, root, PP_NIL, PP_NIL, next_dfi, iter);
    while (top > 0) {
        uint32_t x = work[top - 1], p = s->parent[x], low = s->least_anc[x];
        uint32_t i = iter[x], end = g->first[s->vertex_of[x] + 1], fresh = PP_NIL;
        for (; i < end; i++) {
            if (i + PP_SEARCH_AHEAD < end)
                PP_PREFETCH(&s->dfi_of[nbr[i + PP_SEARCH_AHEAD]]);
            uint32_t y = s->dfi_of[nbr[i]];
            if (y == PP_NIL) {
                fresh = i++;
                break;
            }
            nbr[i] = y; /* from now on the slot holds the neighbour's DFI */
            if (y < low && y != p)
                low = y;
        }
        iter[x] = i;
        s->least_anc[x] = low;
        if (fresh != PP_NIL) {
            uint32_t c = number_vertex(s, nbr[fresh], x, g->darts[fresh], next_dfi, iter);
            nbr[fresh] = c | PP_TREE;
            work[top++] = c;
            continue;
        }
        top--;
        s->lowpoint[x] = min_u32(s->lowpoint[x], low);
        if (p != PP_NIL)
            s->lowpoint[p] = min_u32(s->lowpoint[p], s->lowpoint[x]);
    }
}

void pp_dfs(pp_state *s, uint32_t *iter, uint32_t *work)
{
    uint32_t next_dfi = 0;
    for (uint32_t x = 0; x < 2 * s->n; x++)
        s->head[x] = PP_NIL;
    for (uint32_t u = 0; u < s->n; u++)
        s->dfi_of[u] = PP_NIL;
    /* Neighbour ids in dart-list order, gathered in one streaming pass so the
       search reads them in order; it turns each into the neighbour's DFI. */
    uint32_t *nbr = s->tgt;
    for (size_t i = 0; i < 2 * (size_t)s->g->m; i++)
        nbr[i] = s->g->ends[s->g->darts[i] ^ 1u];
    for (uint32_t u = 0; u < s->n; u++)
        if (s->dfi_of[u] == PP_NIL)
            search_from(s, u, &next_dfi, iter, work, nbr);
}

/*
 * Appends every child to its parent's separated-child list in increasing
 * lowpoint order (a bucket sort, so linear), which makes "is x externally
 * active" a look at the first entry that is still separate.
 */
void pp_sort_children(pp_state *s, uint32_t *count, uint32_t *order)
{
    uint32_t n = s->n;
    for (uint32_t x = 0; x < n; x++) {
        count[x] = 0;
        s->sep_head[x] = PP_NIL;
    }
    for (uint32_t x = 0; x < n; x++)
        if (s->parent[x] != PP_NIL)
            count[s->lowpoint[x]]++;
    uint32_t sum = 0;
    for (uint32_t k = 0; k < n; k++) {
        uint32_t c = count[k];
        count[k] = sum;
        sum += c;
    }
    for (uint32_t x = 0; x < n; x++)
        if (s->parent[x] != PP_NIL)
            order[count[s->lowpoint[x]]++] = x;
    for (uint32_t x = 0; x < n; x++)
        count[x] = PP_NIL; /* now: the tail of x's list */
    for (uint32_t i = 0; i < sum; i++) {
        uint32_t c = order[i], p = s->parent[c];
        s->sep_next[c] = PP_NIL;
        if (count[p] == PP_NIL)
            s->sep_head[p] = c;
        else
            s->sep_next[count[p]] = c;
        count[p] = c;
    }
}
