/*
 * certify.h - the untrusted certificate producer.
 *
 * pp_certify() decides planarity of a parsed graph in O(N + M) time and
 * memory and returns evidence either way: a rotation system when the graph
 * is planar, a bare Kuratowski subdivision (K5 or K3,3) when it is not.
 * Nothing here is trusted: every certificate is re-checked by the kernel in
 * checker/ before anyone relies on it.
 */
#ifndef PLANEWIT_CERTIFY_H
#define PLANEWIT_CERTIFY_H

#include <stdint.h>
#include <stdio.h>

#include "planewit.h"

typedef enum { PP_PLANAR = 1, PP_K5, PP_K33 } pp_kind;

typedef struct {
    pp_kind kind;
    /* PP_PLANAR: 2m darts; for v < n_adj the darts leaving v in rotation
       order at rot[first[v] .. first[v+1]-1].  NULL otherwise. */
    uint32_t *rot;
    /* K5: B0..B4; K33: A0 A1 A2 B0 B1 B2 (original vertex ids). */
    uint32_t branch[6];
    /* All witness paths' vertices concatenated, each from branch to branch. */
    uint32_t *path;
    /* Path i is path[path_start[i] .. path_start[i+1]-1]: 10 paths for K5,
       9 for K33 (path_start[n_paths] is the total length). */
    uint32_t path_start[11];
} pp_result;

/* 0 on success; -1 when memory runs out (nothing leaked, *r left empty);
   -2 on an internal inconsistency (a producer bug; *r left empty). */
int pp_certify(const pw_graph *g, pp_result *r);
void pp_result_free(pp_result *r);

/* Number of witness paths for a result: 10 (K5), 9 (K33) or 0 (planar). */
unsigned pp_path_count(const pp_result *r);

/* Writes the certificate text.  graph_sha256 may be NULL (no graph-sha256
   line).  Returns 0, or -1 on a write error. */
int pp_write_cert(FILE *out, const pw_graph *g, const pp_result *r,
                  const unsigned char *graph_sha256);

/* The same text into memory: *buf (room for *cap bytes, NULL and 0 at
   first) is reused when large enough for what the counts allow, else
   replaced, so a stream of graphs keeps one buffer; *len is the text's
   length.  Returns 0, or -1 when memory runs out (*buf stays the caller's
   to free). */
int pp_cert_text(const pw_graph *g, const pp_result *r, const unsigned char *graph_sha256,
                 char **buf, size_t *cap, size_t *len);

/* The same for the edge-count witnesses: edge-bound when side is NULL, else
   bipartite-edge-bound with side[v] (0 or 1) for each of the N vertices. */
int pp_bound_text(const pw_graph *g, const unsigned char *side, const unsigned char *graph_sha256,
                  char **buf, size_t *cap, size_t *len);

/* A planar certificate with coordinates, into a fresh buffer the caller
   frees: rot's around lines, then a point line (x[v], y[v]) for every vertex
   v.  Returns 0, or -1 when memory runs out (*text NULL). */
int pp_drawing_cert_text(const pw_graph *g, const uint32_t *rot, const int64_t *x,
                         const int64_t *y, const unsigned char *graph_sha256, char **text,
                         size_t *len);

#endif
