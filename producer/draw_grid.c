/*
 * draw_grid.c - Schnyder's grid coordinates from a Schnyder wood.
 *
 * For an inner vertex v, the three paths P0(v), P1(v), P2(v) along the trees
 * to the roots a0, a1, a2 split the triangulation into regions; R_i(v) is the
 * closed region bounded by P_(i+1)(v), P_(i-1)(v) and the outer edge facing
 * a_i.  With |R_i(v)| counted in vertices and |P_j(v)| the vertices of a
 * path, r_i(v) = |R_i(v)| - |P_(i-1)(v)| sum to n - 1 over i, and the points
 * (r_0(v), r_1(v)) give a straight-line drawing without crossings in the
 * (n - 2) x (n - 2) grid (Schnyder 1990).
 *
 * Counting without walking regions: the vertices of R_i(v) off its boundary
 * are exactly the descendants in tree T_i of the boundary's vertices, so
 * |R_i(v)| = S_(i+1)(v) + S_(i-1)(v) - sub_i(v), where sub_i is the subtree
 * size in T_i and S_j(v) sums sub_i along P_j(v).  Each sum is one pass over
 * the canonical order (parents before children), so everything is O(n).
 * The canonical order puts T_0's children before their parent and T_1's and
 * T_2's children after theirs.
 */
#include "draw_internal.h"

/* In canonical order, T_0 parents come later and T_1 / T_2 parents earlier. */
static int parents_first_ascending(int tree)
{
    return tree != 0;
}

/* sub[v] = size of v's subtree in T_tree (1 for vertices outside it). */
static void subtree_sizes(const pd_wood *w, int tree, uint32_t *sub)
{
    uint32_t inner = w->size - 3; /* order[2 .. size-2] are the inner vertices */
    for (uint32_t k = 0; k < w->size; k++)
        sub[w->order[k]] = 1;
    for (uint32_t t = 0; t < inner; t++) {
        uint32_t k = parents_first_ascending(tree) ? w->size - 2 - t : 2 + t;
        uint32_t v = w->order[k];
        sub[w->parent[tree][v]] += sub[v];
    }
}

/* sum[v] = total of weight (1 when weight is NULL) along P_tree(v). */
static void path_sums(const pd_wood *w, int tree, const uint32_t *weight, uint32_t *sum)
{
    uint32_t inner = w->size - 3, root = w->root[tree];
    sum[root] = weight ? weight[root] : 1;
    for (uint32_t t = 0; t < inner; t++) {
        uint32_t k = parents_first_ascending(tree) ? 2 + t : w->size - 2 - t;
        uint32_t v = w->order[k];
        sum[v] = (weight ? weight[v] : 1) + sum[w->parent[tree][v]];
    }
}

/* out[v] = r_i(v) for the inner vertices; uses four scratch arrays of the wood. */
static void region_coordinate(pd_wood *w, int i, int64_t *out)
{
    int next = (i + 1) % 3, prev = (i + 2) % 3;
    uint32_t *sub = w->state, *s_next = w->chords, *s_prev = w->left, *depth = w->right;
    subtree_sizes(w, i, sub);
    path_sums(w, next, sub, s_next);
    path_sums(w, prev, sub, s_prev);
    path_sums(w, prev, NULL, depth);
    for (uint32_t k = 2; k + 1 < w->size; k++) {
        uint32_t v = w->order[k];
        out[v] = (int64_t)s_next[v] + s_prev[v] - sub[v] - depth[v];
    }
}

int pd_wood_coordinates(pd_wood *w, int64_t *x, int64_t *y)
{
    int64_t top = (int64_t)w->size - 2;
    region_coordinate(w, 0, x);
    region_coordinate(w, 1, y);
    /* The outer vertices, from the same counts: (n-2, 1), (0, n-2), (1, 0). */
    x[w->root[0]] = top;
    y[w->root[0]] = 1;
    x[w->root[1]] = 0;
    y[w->root[1]] = top;
    x[w->root[2]] = 1;
    y[w->root[2]] = 0;
    return 0;
}
