/*
 * embedding.c - the circular dart lists that hold the embedding, and their
 * conversion into one rotation system once every back edge is embedded.
 * End 0 of a list is its head, end 1 its tail; on the outer face of a piece
 * the two end darts are the outer-face edges.
 */
#include "pp_state.h"


void pp_list_add(pp_state *s, uint32_t x, uint32_t d, uint32_t end)
{
    uint32_t h = s->head[x];
    if (h == PP_NIL) {
        s->head[x] = d;
        s->nxt[d] = s->prv[d] = d;
        return;
    }
    uint32_t t = s->prv[h];
    s->nxt[t] = d;
    s->prv[d] = t;
    s->nxt[d] = h;
    s->prv[h] = d;
    if (end == 0)
        s->head[x] = d;
}

/* Moves the whole circular list starting at dart `from` to end `end` of x. */
void pp_list_splice(pp_state *s, uint32_t x, uint32_t from, uint32_t end)
{
    uint32_t hx = s->head[x];
    if (from == PP_NIL)
        return;
    if (hx == PP_NIL) {
        s->head[x] = from;
        return;
    }
    uint32_t tx = s->prv[hx], ty = s->prv[from];
    s->nxt[tx] = from;
    s->prv[from] = tx;
    s->nxt[ty] = hx;
    s->prv[hx] = ty;
    if (end == 0)
        s->head[x] = from;
}

/* Mirrors x's rotation: O(degree), used once per merged root and at the end. */
void pp_list_reverse(pp_state *s, uint32_t x)
{
    uint32_t h = s->head[x];
    if (h == PP_NIL)
        return;
    uint32_t d = h;
    do {
        uint32_t next = s->nxt[d];
        s->nxt[d] = s->prv[d];
        s->prv[d] = next;
        d = next;
    } while (d != h);
    s->head[x] = s->nxt[h]; /* the old tail */
}


/*
 * Pieces never merged (bridges, blocks nobody above needed, the children of a
 * search root) hang at a single cut vertex, so any place in its rotation and
 * either orientation is valid.
 */
static void merge_leftover_roots(pp_state *s)
{
    for (uint32_t c = 0; c < s->n; c++) {
        uint32_t r = s->n + c;
        if (s->head[r] == PP_NIL)
            continue;
        pp_list_splice(s, s->parent[c], s->head[r], 1);
        s->head[r] = PP_NIL;
    }
}

/*
 * Copies each list into rot at the vertex's own dart range, then reverses
 * that range (contiguous, so cheap) for a vertex whose orientation is
 * mirrored.  The orientation is the parity of flips on the tree path; parents
 * come before children in DFI order, so one pass accumulates it.  Only nxt is
 * read here, so rot may share memory with prv.  A count that does not fill
 * the range exactly means the engine lost or duplicated a dart.
 */
int pp_finish_embedding(pp_state *s, uint32_t *rot)
{
    const pw_graph *g = s->g;
    merge_leftover_roots(s);
    for (uint32_t x = 0; x < s->n; x++) {
        if (x + PP_AHEAD < s->n) { /* each list starts at a random place: fetch early */
            uint32_t later = s->head[x + PP_AHEAD];
            PP_PREFETCH(&g->first[s->vertex_of[x + PP_AHEAD]]);
            if (later != PP_NIL) {
                PP_PREFETCH(&s->nxt[later]);
                PP_PREFETCH(&g->ends[later]);
            }
        }
        if (s->parent[x] != PP_NIL)
            s->flipped[x] ^= s->flipped[s->parent[x]];
        uint32_t u = s->vertex_of[x], at = g->first[u], end = g->first[u + 1];
        uint32_t h = s->head[x], d = h;
        if (h != PP_NIL) {
            do {
                if (at == end || g->ends[d] != u)
                    return PP_ERR_BUG;
                rot[at++] = d;
                d = s->nxt[d];
            } while (d != h);
        }
        if (at != end)
            return PP_ERR_BUG;
        for (uint32_t i = g->first[u], j = end; s->flipped[x] && i + 1 < j; i++, j--) {
            uint32_t t = rot[i];
            rot[i] = rot[j - 1];
            rot[j - 1] = t;
        }
    }
    return 0;
}
