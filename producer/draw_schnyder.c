/*
 * draw_schnyder.c - a canonical order and a Schnyder wood of one triangulated
 * component, by peeling vertices off the outer boundary.
 *
 * The outer face is a1 a2 a0 counterclockwise; picture a1 bottom left, a2
 * bottom right, a0 on top.  The "outer path" runs a1 ... a2 over the top of
 * the part not yet peeled.  A vertex may be peeled when it is on that path,
 * is neither a1 nor a2, and has no chord (an edge to a path vertex that is not
 * its path neighbour).  Peeling v, its remaining neighbours are, counter-
 * clockwise from its left path neighbour L to its right one R, a path
 * L c1 .. cj R that replaces v on the outer path.  The wood: v's outgoing
 * edge of colour 1 goes to L, of colour 2 to R, and each ci's outgoing edge
 * of colour 0 goes to v.  Reversed, the peeling order is a canonical order.
 * Chord counts change only at the vertices a step touches, so the whole
 * peeling is O(size + edges of the component).
 */
#include "draw_internal.h"

#include <stdlib.h>
#include <string.h>

enum { UNSEEN = 0, ON_PATH = 1, PEELED = 2 };

#define SCRATCH_ARRAYS 6

int pd_wood_alloc(pd_wood *w, uint32_t n)
{
    size_t cap = (size_t)n + 1;
    uint32_t **scratch[SCRATCH_ARRAYS] = {&w->order, &w->state, &w->chords, &w->left, &w->right,
                                          &w->stamp};
    int ok = 1;
    memset(w, 0, sizeof *w);
    for (int i = 0; i < SCRATCH_ARRAYS; i++)
        ok &= (*scratch[i] = malloc(cap * sizeof **scratch[i])) != NULL;
    for (int i = 0; i < 3; i++)
        ok &= (w->parent[i] = malloc(cap * sizeof *w->parent[i])) != NULL;
    ok &= (w->lower = malloc(cap * sizeof *w->lower)) != NULL;
    ok &= (w->stack = malloc((3 * cap + 2) * sizeof *w->stack)) != NULL;
    if (!ok) {
        pd_wood_free(w);
        return -1;
    }
    return 0;
}

void pd_wood_free(pd_wood *w)
{
    uint32_t *all[] = {w->order, w->state, w->chords, w->left, w->right, w->stamp,
                       w->lower, w->stack, w->parent[0], w->parent[1], w->parent[2]};
    for (size_t i = 0; i < sizeof all / sizeof all[0]; i++)
        free(all[i]);
    memset(w, 0, sizeof *w);
}

static uint32_t dart_to(const pd_embed *e, uint32_t v, uint32_t target)
{
    uint32_t d = e->any[v];
    while (pd_head(e, d) != target)
        d = e->next[d];
    return d;
}

/* Counts the chords of path vertex c, whose path neighbours are before/after. */
static void count_chords(const pd_embed *e, pd_wood *w, uint32_t c, uint32_t before,
                         uint32_t after, uint32_t step)
{
    uint32_t d = e->any[c];
    for (uint32_t t = 0; t < e->deg[c]; t++, d = e->next[d]) {
        uint32_t x = pd_head(e, d);
        if (w->state[x] != ON_PATH || x == before || x == after)
            continue;
        w->chords[c]++;
        if (w->stamp[x] != step) /* a chord between two new vertices is counted by each */
            w->chords[x]++;
    }
}

/* Peels v off the outer path; step is a stamp unique to this peel. */
static void peel(const pd_embed *e, pd_wood *w, uint32_t v, uint32_t step)
{
    uint32_t L = w->left[v], R = w->right[v], cnt = 0;
    w->state[v] = PEELED;
    w->parent[1][v] = L;
    w->parent[2][v] = R;
    for (uint32_t d = e->next[dart_to(e, v, L)]; pd_head(e, d) != R; d = e->next[d])
        w->lower[cnt++] = pd_head(e, d);
    if (cnt == 0) { /* the chord L-R becomes a path edge */
        w->right[L] = R;
        w->left[R] = L;
        if (L == w->root[1] && R == w->root[2])
            return;
        if (--w->chords[L] == 0)
            w->stack[w->stack[0]++ + 1] = L;
        if (--w->chords[R] == 0)
            w->stack[w->stack[0]++ + 1] = R;
        return;
    }
    for (uint32_t j = 0; j < cnt; j++) {
        uint32_t c = w->lower[j];
        w->state[c] = ON_PATH;
        w->stamp[c] = step;
        w->parent[0][c] = v;
        w->left[c] = j == 0 ? L : w->lower[j - 1];
        w->right[c] = j + 1 == cnt ? R : w->lower[j + 1];
    }
    w->right[L] = w->lower[0];
    w->left[R] = w->lower[cnt - 1];
    for (uint32_t j = 0; j < cnt; j++) {
        uint32_t c = w->lower[j];
        count_chords(e, w, c, w->left[c], w->right[c], step);
    }
    for (uint32_t j = 0; j < cnt; j++)
        if (w->chords[w->lower[j]] == 0)
            w->stack[w->stack[0]++ + 1] = w->lower[j];
}

static void reset(pd_wood *w, const uint32_t *member, uint32_t size)
{
    for (uint32_t i = 0; i < size; i++) {
        uint32_t v = member[i];
        w->state[v] = UNSEEN;
        w->chords[v] = 0;
        w->stamp[v] = 0;
        w->parent[0][v] = w->parent[1][v] = w->parent[2][v] = PW_NONE;
    }
}

int pd_wood_build(const pd_embed *e, const uint32_t *member, uint32_t size, pd_wood *w)
{
    uint32_t d0 = e->any[member[0]], k = size, step = 0;
    if (size < 3)
        return -1;
    reset(w, member, size);
    /* The face left of d0, walked t0 t1 t2, is clockwise as the outer face. */
    w->root[1] = e->tail[d0];
    w->root[0] = pd_head(e, d0);
    w->root[2] = pd_head(e, pd_face_next(e, d0));
    w->size = size;
    w->state[w->root[0]] = w->state[w->root[1]] = w->state[w->root[2]] = ON_PATH;
    w->right[w->root[1]] = w->root[0];
    w->left[w->root[0]] = w->root[1];
    w->right[w->root[0]] = w->root[2];
    w->left[w->root[2]] = w->root[0];
    w->stack[0] = 1; 
    w->stack[1] = w->root[0];
    while (k > 2 && w->stack[0] > 0) {
        uint32_t v = w->stack[w->stack[0]--];
        if (w->state[v] != ON_PATH || w->chords[v] != 0 || v == w->root[1] || v == w->root[2])
            continue;
        w->order[--k] = v;
        peel(e, w, v, ++step);
    }
    w->order[0] = w->root[1];
    w->order[1] = w->root[2];
    return k == 2 ? 0 : -1; /* stuck: the component was not triangulated */
}
