/*
 * draw_bench.c - times the drawing stage alone on a graph and a rotation
 * system given as a planar certificate (bench/draw_gen.py writes both):
 * parse, grid drawing, certificate text, kernel check.
 * usage: draw_bench GRAPH ROTATION_CERT  -> one line of key=value pairs
 */
#include "bench_util.h"
#include "draw.h"
#include "planewit.h"

#include <stdlib.h>
#include <string.h>

/* rot from "around V : W ..." lines (trusted bench input, produced by draw_gen.py). */
static uint32_t *read_rotation(const pw_graph *g, char *text)
{
    uint32_t *rot = malloc(((size_t)2 * g->m + 1) * sizeof *rot);
    uint32_t *dart_to = malloc(((size_t)g->n + 1) * sizeof *dart_to);
    for (char *line = strtok(text, "\n"); line; line = strtok(NULL, "\n")) {
        char *p = line;
        if (strncmp(p, "around ", 7) != 0)
            continue;
        uint32_t v = (uint32_t)strtoul(p + 7, &p, 10), k = 0;
        p = strchr(p, ':') + 1;
        if (v >= g->n_adj)
            continue;
        for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++)
            dart_to[g->ends[g->darts[i] ^ 1u]] = g->darts[i];
        while (*p == ' ')
            rot[g->first[v] + k++] = dart_to[strtoul(p, &p, 10)];
    }
    free(dart_to);
    return rot;
}

int main(int argc, char **argv)
{
    bench_tool = "draw_bench";
    size_t glen, rlen, clen;
    pw_limits lim;
    pw_graph g;
    pw_verdict v;
    pd_drawing d;
    char *cert;
    if (argc != 3) {
        fputs("usage: draw_bench GRAPH ROTATION_CERT\n", stderr);
        return 2;
    }
    char *graph = bench_slurp(argv[1], &glen), *rtext = bench_slurp(argv[2], &rlen);
    pw_limits_default(&lim);
    double t0 = bench_now();
    if (pw_graph_parse(graph, glen, &lim, &g, &v) != PW_OK)
        return 2;
    double t1 = bench_now();
    uint32_t *rot = read_rotation(&g, rtext);
    double t2 = bench_now();
    if (pd_draw_grid(&g, rot, &d) != 0)
        return 3;
    double t3 = bench_now();
    if (pd_cert_text(&g, rot, &d, NULL, &cert, &clen) != 0)
        return 3;
    double t4 = bench_now();
    pw_check_parsed(&g, graph, glen, cert, clen, &v);
    double t5 = bench_now();
    printf("n=%u m=%u parse=%.3f draw=%.3f text=%.3f kernel=%.3f verdict=%s grid=%lldx%lld "
           "bound=%u\n", g.n, g.m, t1 - t0, t3 - t2, t4 - t3, t5 - t4,
           v.status == PW_ACCEPTED ? "accepted" : pw_code_name(v.code), (long long)d.width,
           (long long)d.height, g.n >= 2 ? g.n - 2 : 0);
    return v.status == PW_ACCEPTED ? 0 : 1;
}
