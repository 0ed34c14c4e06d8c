/*
 * seeded_random.h - the tests' one pseudo-random source: xorshift64, seeded
 * from PW_SEED when set (else a fixed default), the seed printed so that any
 * failing run can be replayed.  Header-only: each test program has its own.
 */
#ifndef PW_SEEDED_RANDOM_H
#define PW_SEEDED_RANDOM_H

#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>

static uint64_t rng_state;

/* Seeds from PW_SEED or fallback, and says which seed is in use. */
static void rnd_start(const char *program, uint64_t fallback)
{
    const char *text = getenv("PW_SEED");
    uint64_t seed = text ? strtoull(text, NULL, 10) : fallback;
    printf("%s: seed %llu (set PW_SEED to change)\n", program, (unsigned long long)seed);
    rng_state = seed * 2654435761u + 1;
}

/* A number below bound (0 when bound is 0). */
static uint32_t rnd(uint32_t bound)
{
    rng_state ^= rng_state << 13;
    rng_state ^= rng_state >> 7;
    rng_state ^= rng_state << 17;
    return bound ? (uint32_t)(rng_state % bound) : 0;
}

#endif
