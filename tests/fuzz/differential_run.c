/*
 * differential_run.c - the differential comparison without libFuzzer: every
 * vector of vectors/MANIFEST as it is, then ROUNDS seeded token mutations of
 * each (token_mutate.h), kernel against oracle.  Prints its seed; set
 * PW_SEED to replay a run.  Exit 1 on any disagreement.
 *
 * Usage: differential_run [ROUNDS]   (from the repository root)
 */
#include "differential.h"
#include "token_mutate.h"
#include "vector_list.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define ROOM 65536

static size_t pair_bytes(const vector_case *c, uint8_t *out)
{
    size_t glen, clen;
    char *g = vector_file("vectors", c->graph, &glen), *t = vector_file("vectors", c->cert, &clen);
    size_t len = 0;
    if (g != NULL && t != NULL && glen + clen + 1 <= ROOM) {
        memcpy(out, g, glen);
        out[glen] = 0;
        memcpy(out + glen + 1, t, clen);
        len = glen + clen + 1;
    }
    free(g);
    free(t);
    return len;
}

int main(int argc, char **argv)
{
    vector_case *cases;
    unsigned long rounds = argc > 1 ? strtoul(argv[1], NULL, 10) : 200;
    const char *env = getenv("PW_SEED");
    uint32_t seed = env ? (uint32_t)strtoul(env, NULL, 10) : (uint32_t)time(NULL);
    size_t n = vector_list_read("vectors", &cases), runs = 0, disagreements = 0, by_status[3] = {0};
    uint8_t *base = malloc(ROOM), *work = malloc(ROOM);
    if (n == 0 || base == NULL || work == NULL)
        return 2;
    printf("differential_run: seed %u (replay with PW_SEED=%u), %lu rounds per vector\n", seed,
           seed, rounds);
    for (size_t i = 0; i < n; i++) {
        size_t len = pair_bytes(&cases[i], base);
        if (len == 0)
            continue;
        for (unsigned long r = 0; r <= rounds; r++) {
            memcpy(work, base, len);
            uint32_t s = seed ^ (uint32_t)(i * 2654435761u) ^ (uint32_t)(r * 40503u);
            size_t size = r == 0 ? len : token_mutate(work, len, ROOM, s);
            /* Copy to an exact-size buffer so that reads past the end are caught. */
            uint8_t *exact = malloc(size ? size : 1);
            if (exact == NULL)
                return 2;
            memcpy(exact, work, size);
            pw_status status;
            runs++;
            int agree = differential_compare(fuzz_split(exact, size), 0, &status);
            by_status[status]++;
            if (!agree) {
                disagreements++;
                fprintf(stderr, "  case %s, round %lu (token_mutate seed %u)\n", cases[i].name, r, s);
            }
            free(exact);
        }
    }
    printf("differential_run: %zu runs (kernel: %zu accepted, %zu rejected, %zu unusable), "
           "%zu disagreements\n",
           runs, by_status[0], by_status[1], by_status[2], disagreements);
    free(base);
    free(work);
    free(cases);
    return disagreements != 0;
}
