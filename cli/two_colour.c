/*
 * two_colour.c - bipartiteness by breadth-first 2-colouring, for the
 * bipartite-edge-bound witness of `certify --witness cheapest`.  The kernel
 * checks every edge against the sides, so a wrong colouring here could only
 * cause a refusal, never a false acceptance.
 */
#include "prove.h"

int two_colour(const pw_graph *g, unsigned char *side, uint32_t *queue)
{
    const unsigned char unset = 2;
    for (uint32_t v = 0; v < g->n; v++)
        side[v] = v < g->n_adj ? unset : 0;
    for (uint32_t root = 0; root < g->n_adj; root++) {
        if (side[root] != unset)
            continue;
        uint32_t head = 0, tail = 0;
        side[root] = 0;
        queue[tail++] = root;
        while (head < tail) {
            uint32_t v = queue[head++];
            for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++) {
                uint32_t w = g->ends[g->darts[i] ^ 1u];
                if (side[w] == unset) {
                    side[w] = (unsigned char)(1 - side[v]);
                    queue[tail++] = w;
                } else if (side[w] == side[v]) {
                    return 0;
                }
            }
        }
    }
    return 1;
}
