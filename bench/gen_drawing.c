/*
 * gen_drawing.c - benchmark input: a k x k triangulated grid drawn on the
 * integer grid (every row, column and diagonal a long collinear chain), with
 * vertex ids shuffled by a seeded generator, as a graph file and a
 * certificate with around and point lines.
 * Usage: gen_drawing K SEED OUT.graph OUT.cert
 */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>

static uint64_t state;

static uint64_t next_random(void)
{
    state ^= state << 13;
    state ^= state >> 7;
    state ^= state << 17;
    return state;
}

int main(int argc, char **argv)
{
    if (argc != 5) {
        fprintf(stderr, "usage: gen_drawing K SEED OUT.graph OUT.cert\n");
        return 2;
    }
    long k = atol(argv[1]);
    state = strtoull(argv[2], NULL, 10) * 2654435761u + 1;
    long n = k * k;
    long *id = malloc((size_t)n * sizeof *id);
    FILE *g = fopen(argv[3], "w"), *c = fopen(argv[4], "w");
    if (id == NULL || g == NULL || c == NULL || k < 2)
        return 1;
    for (long v = 0; v < n; v++)
        id[v] = v;
    for (long v = n - 1; v > 0; v--) {
        long j = (long)(next_random() % (uint64_t)(v + 1)), t = id[v];
        id[v] = id[j];
        id[j] = t;
    }
    /* Counterclockwise neighbour directions of a triangulated grid cell corner. */
    static const int dx[6] = {1, 1, 0, -1, -1, 0}, dy[6] = {0, 1, 1, 0, -1, -1};
    long m = 3 * (k - 1) * (k - 1) + 2 * (k - 1);
    fprintf(g, "graph %ld %ld\n", n, m);
    fprintf(c, "certificate 1\nclaim planar\n");
    for (long i = 0; i < k; i++)
        for (long j = 0; j < k; j++) {
            long v = i * k + j;
            fprintf(c, "point %ld : %ld %ld\naround %ld :", id[v], j, i, id[v]);
            for (int d = 0; d < 6; d++) {
                long x = j + dx[d], y = i + dy[d];
                if (x < 0 || y < 0 || x >= k || y >= k)
                    continue;
                fprintf(c, " %ld", id[y * k + x]);
                if (d < 3)
                    fprintf(g, "%ld %ld\n", id[v], id[y * k + x]);
            }
            fputc('\n', c);
        }
    free(id);
    return fclose(g) != 0 || fclose(c) != 0;
}
