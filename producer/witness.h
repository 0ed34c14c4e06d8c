/*
 * witness.h - building the paths of a Kuratowski subdivision.
 *
 * Paths are collected as DFI vertices (virtual roots are written as the
 * vertex they stand for) and translated to original ids at the end.  Every
 * path runs from one branch vertex to another; pieces are concatenated and a
 * vertex repeated at a junction is written once.
 */
#ifndef PP_WITNESS_H
#define PP_WITNESS_H

#include "pp_state.h"

/* Ways a vertex reaches a proper ancestor of v (the "outside" of the piece). */
typedef enum {
    PP_CONN_V,        /* v itself, through the tree path above it */
    PP_CONN_EXT,      /* a's own way up: a back edge, or down a separated child first */
    PP_CONN_SEQ_EXT,  /* along seq[i..j], then the way up of seq[j] */
    PP_CONN_TREE_EXT  /* tree path a down to b, then b's back edge up */
} pp_conn_kind;

typedef struct {
    pp_conn_kind kind;
    uint32_t a, b;
    const uint32_t *seq;
    uint32_t i, j;
    uint32_t u; /* the ancestor reached (v for PP_CONN_V) */
} pp_conn;

typedef struct {
    pp_state *s;
    uint32_t v;      /* the step whose back edges could not all be embedded */
    uint32_t *size;  /* subtree sizes, for finding a back edge into a subtree */
    uint32_t *vert;
    size_t len, cap;
    uint32_t start[11];
    unsigned npaths;
    int err; /* 0, PP_ERR_NOMEM or PP_ERR_BUG once something went wrong */
} pp_witness;

int pp_wit_init(pp_witness *w, pp_state *s, uint32_t v, uint32_t *size);
void pp_wit_free(pp_witness *w);
void pp_wit_begin(pp_witness *w);
void pp_wit_end(pp_witness *w);
void pp_wit_add(pp_witness *w, uint32_t x);
void pp_wit_add_seq(pp_witness *w, const uint32_t *seq, uint32_t i, uint32_t j);
void pp_wit_add_up(pp_witness *w, uint32_t from, uint32_t to);
void pp_wit_add_down(pp_witness *w, uint32_t anc, uint32_t desc);
void pp_wit_add_anc(pp_witness *w, uint32_t a, uint32_t b);
void pp_wit_reverse_from(pp_witness *w, size_t start);
void pp_wit_add_pert(pp_witness *w, uint32_t a);

pp_conn pp_conn_make(pp_witness *w, pp_conn_kind kind, uint32_t a, uint32_t b,
                     const uint32_t *seq, uint32_t i, uint32_t j);
void pp_wit_add_conn(pp_witness *w, const pp_conn *c);
/* A whole path from c's branch vertex up to the hub vertex h. */
void pp_wit_path_to_hub(pp_witness *w, const pp_conn *c, uint32_t h);
/* A whole path from one branch vertex up and over to another. */
void pp_wit_path_over(pp_witness *w, const pp_conn *c1, const pp_conn *c2);
uint32_t pp_median3(uint32_t a, uint32_t b, uint32_t c);
/* Vertex of a tree-child of y with lowpoint below v: the way down towards
   a back edge that leaves above v. */
uint32_t pp_low_child(const pp_state *s, uint32_t y, uint32_t v);

/* Copies the collected witness into r (original ids). */
int pp_wit_emit(pp_witness *w, pp_kind kind, const uint32_t *branch, pp_result *r);

#endif
