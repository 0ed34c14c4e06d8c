/*
 * oracle_int.h - the oracle's records, shared by its files only.
 */
#ifndef PW_ORACLE_INT_H
#define PW_ORACLE_INT_H

#include "oracle.h"
#include "oracle_text.h"

typedef struct {
    uint32_t n, m;
    unsigned char *adj; /* n * n adjacency matrix */
    uint32_t *ends;     /* 2m */
} ograph;

typedef enum { K_ROTATION, K_SUB_K5, K_SUB_K33, K_MINOR_K5, K_MINOR_K33, K_EDGE_BOUND, K_BIPARTITE } okind;

/* One around, path, set or side line: key is V (around) or the set index (6 if >= 6). */
typedef struct {
    uint32_t key;
    uint32_t *v;
    size_t n;
} oline;

typedef struct {
    uint32_t v;
    int64_t x, y;
} opoint;

typedef struct {
    int planar;
    okind kind;
    int have_hash;
    unsigned char hash[32];
    int bad_id, bad_coord;
    uint32_t branch[6];
    oline *lines;
    size_t n_lines;
    opoint *points;
    size_t n_points;
} ocert;

oracle_result oracle_rotation(const ograph *g, const ocert *c);
oracle_result oracle_subdivision(const ograph *g, const ocert *c);
oracle_result oracle_minor(const ograph *g, const ocert *c);
oracle_result oracle_bounds(const ograph *g, const ocert *c);
/* The drawing given by point lines, after the rotation rules passed. */
oracle_result oracle_drawing(const ograph *g, const ocert *c);

/* A verdict with its reason; zero-filled room for count + 1 items (aborts when none). */
oracle_result oracle_verdict(oracle_status status, const char *why);
void *oracle_zeroed(size_t count, size_t size);

#endif
