/*
 * token_mutate.h - mutations at the level of the formats' lines and tokens,
 * so that a mutated vector stays mostly well-formed and reaches the rules
 * behind the grammar: change a number a little, swap two numbers, drop,
 * repeat or swap lines, drop a token.  Used by the differential harness (as
 * libFuzzer's custom mutator) and by its seeded stand-alone run.
 */
#ifndef PW_TOKEN_MUTATE_H
#define PW_TOKEN_MUTATE_H

#include <stddef.h>
#include <stdint.h>

/*
 * Mutates the pair data[0 .. size-1] ("graph NUL certificate", fuzz.h) in
 * place, 1 to 3 steps chosen by seed; returns the new size, at most max_size
 * (the input is returned unchanged when a result would not fit).
 */
size_t token_mutate(uint8_t *data, size_t size, size_t max_size, uint32_t seed);

#endif
