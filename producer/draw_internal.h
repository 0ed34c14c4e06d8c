/*
 * draw_internal.h - what the drawing modules share; see draw.h for the contract.
 *
 * The working structure is an embedded graph that can grow: darts in
 * circular doubly linked lists around their tail vertex, in counterclockwise
 * order.  Darts 0 .. 2m-1 are the input graph's own darts (dart d leaves
 * g->ends[d]); darts from 2m on are augmentation edges, dropped at the end.
 * The face to the left of dart d continues with pd_face_next(e, d), so a
 * bounded face is walked counterclockwise and the outer face clockwise.
 */
#ifndef PD_DRAW_INTERNAL_H
#define PD_DRAW_INTERNAL_H

#include "draw.h"

typedef struct {
    uint32_t n;
    uint32_t n_darts, cap; /* darts in use, room (both even) */
    uint32_t *tail;        /* dart -> vertex it leaves; head is tail[d ^ 1] */
    uint32_t *next, *prev; /* counterclockwise successor / predecessor at tail */
    uint32_t *any;         /* vertex -> one leaving dart, PW_NONE if isolated */
    uint32_t *deg;
} pd_embed;

/* Builds the embedding of (g, rot) with room for a triangulation of each component. */
int pd_embed_init(pd_embed *e, const pw_graph *g, const uint32_t *rot);
void pd_embed_free(pd_embed *e);

static inline uint32_t pd_head(const pd_embed *e, uint32_t d) { return e->tail[d ^ 1u]; }
static inline uint32_t pd_face_next(const pd_embed *e, uint32_t d) { return e->prev[d ^ 1u]; }

/*
 * Adds edge u-w: dart u->w right after dart at_u (counterclockwise) at u, and
 * w->u right after at_w at w.  Returns the new dart u->w.  Room is reserved by
 * pd_embed_init for every edge a triangulation can need.
 */
uint32_t pd_embed_add(pd_embed *e, uint32_t at_u, uint32_t at_w);

/* Connected components: comp[v] and the vertices of each, grouped. */
typedef struct {
    uint32_t count;
    uint32_t *of;     /* vertex -> component */
    uint32_t *start;  /* count + 1 offsets into members */
    uint32_t *member; /* vertices grouped by component, in increasing id */
} pd_components;

int pd_components_find(const pd_embed *e, pd_components *c);
/* The same for a graph known to be connected: one component, vertices 0 .. n-1. */
int pd_components_whole(uint32_t n, pd_components *c);
void pd_components_free(pd_components *c);

/* Adds edges until every component of >= 3 vertices is biconnected (draw_augment.c). */
int pd_biconnect(pd_embed *e);
/* Adds chords until every face of a component of >= 3 vertices is a triangle. */
int pd_triangulate(pd_embed *e);

/*
 * A Schnyder wood of one triangulated component (draw_schnyder.c).  The outer
 * face is a1 a2 a0 counterclockwise; parent[i][v] is v's outgoing edge of
 * colour i (PW_NONE at the roots), order[0 .. size-1] a canonical order
 * (a1, a2 first, a0 last).  Arrays are indexed by global vertex id.
 */
typedef struct {
    uint32_t root[3];
    uint32_t *parent[3];
    uint32_t *order;
    uint32_t size;
    /* scratch of the peeling (draw_schnyder.c), also indexed by vertex id */
    uint32_t *state, *chords, *left, *right, *stamp, *lower;
    uint32_t *stack; /* stack[0] is the depth; room for 3n + 2 pushes */
} pd_wood;

int pd_wood_alloc(pd_wood *w, uint32_t n);
void pd_wood_free(pd_wood *w);
/* Fills w for the component whose vertices are member[0 .. size-1]. */
int pd_wood_build(const pd_embed *e, const uint32_t *member, uint32_t size, pd_wood *w);

/* Schnyder's coordinates for the component in w, into x, y (draw_grid.c). */
int pd_wood_coordinates(pd_wood *w, int64_t *x, int64_t *y);

#endif
