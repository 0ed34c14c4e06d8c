/*
 * sweep.c - no two edges of the drawing meet except at a common endpoint, and
 * no vertex lies inside an edge: the any-segment-intersection sweep of Shamos
 * and Hoey (1976), O(M log M), in exact integer arithmetic.
 *
 * The sweep visits the vertices in lexicographic order of their points (x,
 * then y: a sweep line turned by an infinitesimal angle, so vertical edges
 * need no special case).  The status holds the edges that span the sweep
 * line, ordered from below to above; while no two of them meet, that order
 * does not change between events.  At each vertex p: the edges ending at p
 * leave the status; p must not lie on any edge still there; the edges
 * starting at p enter, ordered by direction; and every pair of edges that has
 * just become adjacent is tested.  If some forbidden contact exists, the
 * leftmost one is found no later than the sweep reaches it: its two edges (or
 * its vertex and edge) are adjacent in the status just before that point.
 *
 * The status is a treap (a search tree kept balanced by random priorities)
 * walked with parent links: no recursion anywhere.  The priorities are a hash
 * of the edge id keyed by the SHA-256 of both input files: runs stay
 * reproducible, yet no input can choose priorities that degrade the tree
 * (a fixed hash would let a file order its edges into a path, M^2 time).
 */
#include "geometry.h"

#include <stdlib.h>

typedef struct {
    const pw_graph *g;
    const pw_xy *at;
    const uint32_t *rank;
    const uint64_t *point_line;
    pw_verdict *v;
    uint32_t *left, *right, *up; /* m each; PW_NONE for none */
    uint32_t root;
    uint64_t key;
} sweep;

/* A 64-bit mix of the keyed edge id (the finaliser of SplitMix64). */
static uint64_t priority(const sweep *s, uint32_t e)
{
    uint64_t z = s->key + (e + 1) * 0x9e3779b97f4a7c15u;
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9u;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebu;
    return z ^ (z >> 31);
}

static uint32_t low_end(const sweep *s, uint32_t e)
{
    uint32_t a = s->g->ends[2 * (size_t)e], b = s->g->ends[2 * (size_t)e + 1];
    return s->rank[a] < s->rank[b] ? a : b;
}

static uint32_t high_end(const sweep *s, uint32_t e)
{
    return s->g->ends[2 * (size_t)e] ^ s->g->ends[2 * (size_t)e + 1] ^ low_end(s, e);
}

static pw_xy direction(const sweep *s, uint32_t e)
{
    pw_xy a = s->at[low_end(s, e)], b = s->at[high_end(s, e)];
    pw_xy d = {b.x - a.x, b.y - a.y};
    return d;
}

/* ---- the status: a treap over edge ids -------------------------------- */

static void replace_child(sweep *s, uint32_t parent, uint32_t old, uint32_t young)
{
    if (parent == PW_NONE)
        s->root = young;
    else if (s->left[parent] == old)
        s->left[parent] = young;
    else
        s->right[parent] = young;
    if (young != PW_NONE)
        s->up[young] = parent;
}

/* Lifts x above its parent, keeping the in-order sequence. */
static void rotate_up(sweep *s, uint32_t x)
{
    uint32_t p = s->up[x], moved;
    replace_child(s, s->up[p], p, x);
    if (s->left[p] == x) {
        moved = s->right[x];
        s->right[x] = p;
        s->left[p] = moved;
    } else {
        moved = s->left[x];
        s->left[x] = p;
        s->right[p] = moved;
    }
    s->up[p] = x;
    if (moved != PW_NONE)
        s->up[moved] = p;
}

static void status_remove(sweep *s, uint32_t e)
{
    while (s->left[e] != PW_NONE && s->right[e] != PW_NONE)
        rotate_up(s, priority(s, s->left[e]) > priority(s, s->right[e]) ? s->left[e] : s->right[e]);
    replace_child(s, s->up[e], e, s->left[e] != PW_NONE ? s->left[e] : s->right[e]);
}

/* The next edge above (step 1) or below (step 0) e in the status. */
static uint32_t neighbour(const sweep *s, uint32_t e, int above)
{
    const uint32_t *toward = above ? s->right : s->left, *away = above ? s->left : s->right;
    if (toward[e] != PW_NONE) {
        for (e = toward[e]; away[e] != PW_NONE; e = away[e])
            ;
        return e;
    }
    while (s->up[e] != PW_NONE && toward[s->up[e]] == e)
        e = s->up[e];
    return s->up[e];
}

/* ---- contacts between two edges --------------------------------------- */

static int fail_pair(sweep *s, pw_code code, uint32_t a, uint32_t b, const char *verb)
{
    return pw_fail(s->v, code, PW_FILE_CERT, s->point_line[low_end(s, a)],
                   "edge %u %u %s edge %u %u", low_end(s, a), high_end(s, a), verb, low_end(s, b),
                   high_end(s, b));
}

static int fail_vertex(sweep *s, uint32_t x, uint32_t e)
{
    return pw_fail(s->v, PW_R_VERTEX_ON_EDGE, PW_FILE_CERT, s->point_line[x],
                   "vertex %u lies inside edge %u %u", x, low_end(s, e), high_end(s, e));
}

/*
 * Only a proper crossing is left for this test: every other contact is reported
 * at an event, while the status is still correctly ordered.
 * - Two edges with a common end meet elsewhere only by overlapping.  With a
 *   common low end, status_insert compares the second with the first (a search
 *   for a key equal to a node's passes through that node) and reports it; with a
 *   common high end, the shorter edge's low end lies inside the longer one.
 * - A vertex inside an edge (an end of another edge, collinear overlaps
 *   included) lies inside an edge that spans its event, and locate() at that
 *   event finds it by the same search argument.
 * Two edges with a common end never pass this test: one orientation is 0.
 */
static int test_pair(sweep *s, uint32_t a, uint32_t b)
{
    pw_xy p = s->at[low_end(s, a)], q = s->at[high_end(s, a)];
    pw_xy r = s->at[low_end(s, b)], t = s->at[high_end(s, b)];
    if (pw_orientation(r, t, p) * pw_orientation(r, t, q) < 0 &&
        pw_orientation(p, q, r) * pw_orientation(p, q, t) < 0)
        return fail_pair(s, PW_R_EDGES_CROSS, a, b, "crosses");
    return 0;
}

/* ---- the events --------------------------------------------------------- */

/* Finds p's place in the status: the edges just below and just above it. */
static int locate(sweep *s, uint32_t x, uint32_t *below, uint32_t *above)
{
    pw_xy p = s->at[x];
    *below = *above = PW_NONE;
    for (uint32_t e = s->root; e != PW_NONE;) {
        int side = pw_orientation(s->at[low_end(s, e)], s->at[high_end(s, e)], p);
        if (side == 0)
            return fail_vertex(s, x, e);
        if (side > 0)
            *below = e, e = s->right[e];
        else
            *above = e, e = s->left[e];
    }
    return 0;
}

/* Is the new edge e (starting at this event's point) above the status edge t? */
static int above_edge(sweep *s, uint32_t e, uint32_t t, int *above)
{
    if (low_end(s, t) != low_end(s, e)) {
        *above = pw_orientation(s->at[low_end(s, t)], s->at[high_end(s, t)], s->at[low_end(s, e)]) > 0;
        return 0;
    }
    int turn = pw_cross_sign(direction(s, t), direction(s, e));
    if (turn == 0)
        return fail_pair(s, PW_R_EDGES_OVERLAP, e, t, "overlaps");
    *above = turn > 0;
    return 0;
}

static int status_insert(sweep *s, uint32_t e)
{
    uint32_t parent = PW_NONE;
    int above = 0;
    for (uint32_t t = s->root; t != PW_NONE; t = above ? s->right[t] : s->left[t]) {
        if (above_edge(s, e, t, &above) != 0)
            return -1;
        parent = t;
    }
    s->left[e] = s->right[e] = PW_NONE;
    s->up[e] = parent;
    if (parent == PW_NONE)
        s->root = e;
    else if (above)
        s->right[parent] = e;
    else
        s->left[parent] = e;
    while (s->up[e] != PW_NONE && priority(s, e) > priority(s, s->up[e]))
        rotate_up(s, e);
    return 0;
}

/* Tests a pair only when both edges exist. */
static int test_if_both(sweep *s, uint32_t a, uint32_t b)
{
    return a != PW_NONE && b != PW_NONE ? test_pair(s, a, b) : 0;
}

static int visit(sweep *s, uint32_t x)
{
    const pw_graph *g = s->g;
    uint32_t below, above, inserted = 0;
    uint32_t from = x < g->n_adj ? g->first[x] : 0, to = x < g->n_adj ? g->first[x + 1] : 0;
    for (uint32_t i = from; i < to; i++)
        if (s->rank[g->ends[g->darts[i] ^ 1u]] < s->rank[x])
            status_remove(s, g->darts[i] / 2);
    if (locate(s, x, &below, &above) != 0)
        return -1;
    for (uint32_t i = from; i < to; i++) {
        if (s->rank[g->ends[g->darts[i] ^ 1u]] < s->rank[x])
            continue;
        if (status_insert(s, g->darts[i] / 2) != 0)
            return -1;
        inserted++;
    }
    if (inserted == 0)
        return test_if_both(s, below, above);
    /* The new edges sit together between below and above: test the two ends of that block. */
    if (below != PW_NONE && test_pair(s, below, neighbour(s, below, 1)) != 0)
        return -1;
    return above != PW_NONE ? test_pair(s, neighbour(s, above, 0), above) : 0;
}

int pw_sweep(const pw_graph *g, const pw_xy *at, const uint32_t *order, const uint32_t *rank,
             const uint64_t *point_line, pw_verdict *v)
{
    sweep s = {g, at, rank, point_line, v, NULL, NULL, NULL, PW_NONE, 0};
    for (int i = 0; i < 8; i++)
        s.key = s.key << 8 | (uint64_t)(v->graph_sha256[i] ^ v->cert_sha256[i]);
    int result = 0;
    s.left = pw_alloc(g->m, sizeof *s.left);
    s.right = pw_alloc(g->m, sizeof *s.right);
    s.up = pw_alloc(g->m, sizeof *s.up);
    if (s.left == NULL || s.right == NULL || s.up == NULL)
        result = pw_fail(v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the sweep");
    for (uint32_t k = 0; result == 0 && k < g->n; k++)
        result = visit(&s, order[k]);
    free(s.left);
    free(s.right);
    free(s.up);
    return result;
}
