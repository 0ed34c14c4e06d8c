/*
 * pp_state.h - shared state of the edge-addition planarity engine.
 *
 * Vertices are renumbered by depth-first index (DFI) so that "ancestor of"
 * becomes "smaller than" along a tree path.  Vertex x < n is a real vertex;
 * x = n + c is the virtual root that stands for parent(c) inside the
 * biconnected piece that starts with the tree edge parent(c) -> c.
 *
 * Embedding lists hold darts (the graph's own dart ids): the darts at x form
 * a circular doubly linked list starting at head[x].  While a piece is not
 * merged into its parent, the darts leaving parent(c) into it sit at n + c.
 *
 * ext[2x + s] packs (y << 1) | t: walking along the outer face from x out of
 * end s of x's list reaches y, entering y at its end t.  Vertices skipped by
 * such a link are inactive forever, so the links may jump over them.
 */
#ifndef PP_STATE_H
#define PP_STATE_H

#include <stddef.h>
#include <stdint.h>

#include "certify.h"

#define PP_NIL UINT32_MAX
#define PP_TREE (1u << 31)
#define PP_ERR_NOMEM (-1)
#define PP_ERR_BUG (-2)

/* Loads started early where ids lead to random places (a hint, nothing more). */
#if defined(__GNUC__)
#define PP_PREFETCH(p) __builtin_prefetch(p)
#else
#define PP_PREFETCH(p) ((void)0)
#endif
#define PP_AHEAD 8 /* how far ahead, in list entries or vertices */
#define PP_SEARCH_AHEAD 3 /* the depth-first search: darts looked up ahead of the one examined */

typedef struct {
    const pw_graph *g;
    uint32_t n;          /* g->n_adj: the vertices that have adjacency */
    uint32_t *vertex_of; /* DFI -> original id */
    uint32_t *dfi_of;    /* original id -> DFI; NULL during the run (certify.c) */
    uint32_t *parent;    /* DFI of the DFS parent, PP_NIL for a root */
    uint32_t *lowpoint;  /* least DFI reachable by tree edges down, then one back edge */
    uint32_t *least_anc; /* least DFI joined to x by a back edge, or x itself */
    uint32_t *nxt, *prv; /* per dart: circular embedding lists */
    /* Per position i of g->darts: DFI of the neighbour that dart leads to,
       with PP_TREE set for the tree edge to a child.  Filled by the search,
       read by every step, so the steps never chase ids at random. */
    uint32_t *tgt;
    uint32_t *head;      /* 2n: first dart of a vertex or virtual root */
    uint32_t *ext;       /* 4n: outer-face links, see above */
    uint32_t *back_dart; /* per vertex: the pending back edge from the current step */
    uint32_t *visited;   /* 2n: step that last walked up through x */
    /* Pertinent virtual roots of a vertex: a circular list kept by its tail,
       so both ends are reachable with one word per vertex. */
    uint32_t *pert_tail; /* per vertex, PP_NIL when empty */
    uint32_t *pert_next; /* per child c: successor of n + c */
    /* Children by increasing lowpoint; merged ones are dropped lazily from
       the front, which is the only end ever inspected. */
    uint32_t *sep_head, *sep_next;
    uint8_t *flipped;    /* per child: its piece was mirrored when merged */
    uint32_t *stack;     /* the walkdown's descent stack, packed (x << 1) | side */
    uint32_t stack_top, stack_cap;
    uint32_t pending;    /* back edges of the current step not yet embedded */
} pp_state;

/* Outcome of the edge-addition run. */
typedef enum {
    PP_RUN_PLANAR = 0,
    PP_RUN_BLOCKED_DESCENT,
    PP_RUN_BLOCKED_FACE,
    PP_RUN_NOMEM
} pp_run_outcome;

static inline uint32_t pp_pack(uint32_t x, uint32_t side) { return (x << 1) | side; }
static inline int pp_is_root(const pp_state *s, uint32_t x) { return x >= s->n; }
/* The real vertex a virtual root stands for (x itself when x is real). */
static inline uint32_t pp_owner(const pp_state *s, uint32_t x)
{
    return x >= s->n ? s->parent[x - s->n] : x;
}
static inline uint32_t pp_pert_first(const pp_state *s, uint32_t w)
{
    uint32_t t = s->pert_tail[w];
    return t == PP_NIL ? PP_NIL : s->pert_next[t - s->n];
}
static inline int pp_pertinent(const pp_state *s, uint32_t w)
{
    return s->back_dart[w] != PP_NIL || s->pert_tail[w] != PP_NIL;
}
/* First child of w whose piece is still separate (a merged root is empty). */
static inline uint32_t pp_first_separated(pp_state *s, uint32_t w)
{
    uint32_t c = s->sep_head[w];
    while (c != PP_NIL && s->head[s->n + c] == PP_NIL)
        c = s->sep_next[c];
    s->sep_head[w] = c;
    return c;
}
/* w still has to reach a proper ancestor of step v after v is done. */
static inline int pp_ext_active(pp_state *s, uint32_t w, uint32_t v)
{
    if (s->least_anc[w] < v)
        return 1;
    uint32_t c = pp_first_separated(s, w);
    return c != PP_NIL && s->lowpoint[c] < v;
}
static inline int pp_inactive(pp_state *s, uint32_t w, uint32_t v)
{
    return !pp_pertinent(s, w) && !pp_ext_active(s, w, v);
}
/* DFI of the vertex dart d enters; inside the piece of virtual root `root`
   the darts towards its owner end at the root itself. */
static inline uint32_t pp_arc_target(const pp_state *s, uint32_t d, uint32_t root)
{
    uint32_t t = s->dfi_of[s->g->ends[d ^ 1u]];
    return (root != PP_NIL && t == s->parent[root - s->n]) ? root : t;
}

/* large_block.c: huge-page candidates for blocks of 4 MiB and more; free() frees */
void *pp_alloc_large(size_t bytes);

/* dfs.c: numbers vertices and starts one piece per tree edge */
void pp_dfs(pp_state *s, uint32_t *iter, uint32_t *work); /* fills tgt */
void pp_sort_children(pp_state *s, uint32_t *count, uint32_t *order);

/* embedding.c */
void pp_list_add(pp_state *s, uint32_t x, uint32_t d, uint32_t end);
void pp_list_splice(pp_state *s, uint32_t x, uint32_t from, uint32_t end);
void pp_list_reverse(pp_state *s, uint32_t x);

/* edge_addition.c */
void pp_prepare_run(pp_state *s);
pp_run_outcome pp_run(pp_state *s, uint32_t *step, uint32_t *root);

/* embedding.c: merges what is left, fixes orientations, fills rot */
int pp_finish_embedding(pp_state *s, uint32_t *rot);

/* kuratowski*.c: fills r with a subdivision; 0, PP_ERR_NOMEM or PP_ERR_BUG */
int pp_isolate(pp_state *s, pp_run_outcome why, uint32_t v, uint32_t root, pp_result *r);

#endif
