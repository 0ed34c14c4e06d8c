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

/* One vertex whose list is being copied into its range of rot. */
typedef struct {
    uint32_t x, u, head, d, at, end;
} pp_lane;

#define PP_LANES 8 /* lists walked side by side */

static void lane_start(pp_state *s, pp_lane *l, uint32_t x)
{
    const pw_graph *g = s->g;
    if (x + PP_AHEAD < s->n) { /* each list starts at a random place: fetch early */
        uint32_t later = s->head[x + PP_AHEAD];
        PP_PREFETCH(&g->first[s->vertex_of[x + PP_AHEAD]]);
        if (later != PP_NIL) {
            PP_PREFETCH(&s->nxt[later]);
            PP_PREFETCH(&g->ends[later]);
        }
    }
    l->x = x;
    l->u = s->vertex_of[x];
    l->at = g->first[l->u];
    l->end = g->first[l->u + 1];
    l->head = l->d = s->head[x];
}

/* The copied range reversed for a mirrored vertex; PP_ERR_BUG when the list
   did not fill the range exactly. */
static int lane_done(pp_state *s, const pp_lane *l, uint32_t *rot)
{
    if (l->at != l->end)
        return PP_ERR_BUG;
    for (uint32_t i = s->g->first[l->u], j = l->end; s->flipped[l->x] && i + 1 < j; i++, j--) {
        uint32_t t = rot[i];
        rot[i] = rot[j - 1];
        rot[j - 1] = t;
    }
    return 0;
}

/* One dart of the lane's list into rot: 0 more to come, 1 the list is done,
   PP_ERR_BUG when a dart does not leave the lane's vertex or overflows its
   range. */
static int lane_step(pp_state *s, pp_lane *l, uint32_t *rot)
{
    if (l->head == PP_NIL)
        return 1;
    if (l->at == l->end || s->g->ends[l->d] != l->u)
        return PP_ERR_BUG;
    rot[l->at++] = l->d;
    l->d = s->nxt[l->d];
    PP_PREFETCH(&s->nxt[l->d]);
    PP_PREFETCH(&s->g->ends[l->d]);
    return l->d == l->head;
}

/*
 * Copies each list into rot at the vertex's own dart range, then reverses
 * that range (contiguous, so cheap) for a vertex whose orientation is
 * mirrored.  The orientation is the parity of flips on the tree path; parents
 * come before children in DFI order, so one pass accumulates it.  Only nxt is
 * read here, so rot may share memory with prv.  A count that does not fill
 * the range exactly means the engine lost or duplicated a dart.
 *
 * Each list is a chain of loads at random places, each waiting for the one
 * before; PP_LANES lists are walked in turn, a dart at a time, so that many
 * loads are in flight at once instead of one.
 */
int pp_finish_embedding(pp_state *s, uint32_t *rot)
{
    merge_leftover_roots(s);
    for (uint32_t x = 0; x < s->n; x++)
        if (s->parent[x] != PP_NIL)
            s->flipped[x] ^= s->flipped[s->parent[x]];
    pp_lane lane[PP_LANES];
    uint32_t next = 0, busy = 0;
    for (; busy < PP_LANES && next < s->n; busy++)
        lane_start(s, &lane[busy], next++);
    while (busy > 0) {
        for (uint32_t k = 0; k < busy;) {
            int got = lane_step(s, &lane[k], rot);
            if (got == 0) {
                k++;
                continue;
            }
            if (got != 1 || lane_done(s, &lane[k], rot) != 0)
                return PP_ERR_BUG;
            if (next < s->n)
                lane_start(s, &lane[k++], next++);
            else
                lane[k] = lane[--busy]; /* not stepped yet in this round */
        }
    }
    return 0;
}
