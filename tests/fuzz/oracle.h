/*
 * oracle.h - an independent, deliberately slow checker used only by the
 * differential harness.  It shares no code with checker/: its own tokenizer,
 * written from format-spec/ and planewit.h, an adjacency matrix, face tracing
 * by brute force, paths and branch sets checked structurally, and drawings
 * by the suite's brute-force drawing checker (tests/draw_oracle.c).  It decides only
 * the status (accepted, rejected, unusable); the first-failure order and the
 * reason codes are the unit tests' and vectors' business.
 */
#ifndef PW_ORACLE_H
#define PW_ORACLE_H

#include <stddef.h>
#include <stdint.h>

typedef enum { ORACLE_ACCEPTED = 0, ORACLE_REJECTED = 1, ORACLE_UNUSABLE = 2 } oracle_status;

typedef struct {
    oracle_status status;
    const char *why; /* the rule that decided, a static string */
} oracle_result;

/* max_n, max_m: the graph header limits (above them the input is unusable). */
oracle_result oracle_judge(const char *graph, size_t graph_len, const char *cert,
                           size_t cert_len, uint32_t max_n, uint32_t max_m);

#endif
