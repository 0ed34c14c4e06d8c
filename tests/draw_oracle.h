/*
 * draw_oracle.h - an independent, deliberately simple checker of straight-line
 * drawings for the tests: every pair of segments, every vertex against every
 * segment, exact integer orientation tests in 128 bits, O(M^2 + N M).  It
 * shares no code with the kernel's sweep or with the producer.
 */
#ifndef DRAW_ORACLE_H
#define DRAW_ORACLE_H

#include <stdint.h>

enum {
    ORACLE_OK = 0,
    ORACLE_COINCIDE,     /* two vertices at one point */
    ORACLE_ON_EDGE,      /* a vertex inside another edge's segment */
    ORACLE_EDGES_MEET,   /* two edges share a point that is not a common endpoint */
    ORACLE_ORDER         /* angular order differs from the rotation */
};

/*
 * Edges are (ends[2i], ends[2i+1]).  The rotation: the neighbours of v in
 * counterclockwise order are nbr[first[v] .. first[v+1]-1].  nbr may be NULL
 * to check the geometry only.
 */
int oracle_check(uint32_t n, uint32_t m, const uint32_t *ends, const uint32_t *first,
                 const uint32_t *nbr, const int64_t *x, const int64_t *y);

/* Sorts the neighbours of each vertex counterclockwise by angle (y up), from east. */
void oracle_sort_by_angle(uint32_t n, const uint32_t *first, uint32_t *nbr, const int64_t *x,
                          const int64_t *y);

#endif
