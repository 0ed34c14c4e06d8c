/*
 * certify_floor.c - what any depth-first planarity test must pay on a graph
 * file, measured on the same files as the certify benchmark (issue 3), so
 * that certify's own algorithm phase can be read against a floor and not
 * only against its parse phase.
 *
 * Both published linear-time methods start from a depth-first search.  On a
 * file whose vertex ids are shuffled and whose edges come in random order,
 * that search cannot avoid one look-up at a random place per dart.  This tool
 * times, after the kernel's parse (pw_graph_parse, as certify does):
 *   gather  the neighbour of every dart in adjacency order (one pass over the
 *           darts, one random read each), which certify's search does first;
 *   dfs     a bare iterative depth-first numbering over those neighbours
 *           (number and parent only: no lowpoints, no pieces);
 *   ahead   the same search, with the look-ups of the next few neighbours
 *           started early at certify's distance: their numbers, as certify's
 *           own search does, and also where their adjacency starts, and the
 *           first few at once on reaching a vertex.  A floor must not do less
 *           than what certify already does, or it bounds nothing;
 *   relabel the adjacency rebuilt with depth-first numbers as ids and each
 *           vertex's darts stored together in that order (what a producer
 *           with a "darts of a vertex side by side" layout would pay first);
 *   dfs2    the same bare search again on the relabelled adjacency;
 * and what certify's engine would gain from such a copy, measured rather than
 * guessed, in the same process and taking turns:
 *   given   pp_certify on the graph as parsed;
 *   copy    a graph built from the relabelled adjacency: depth-first numbers
 *           as ids, and edges numbered in that order, so that the darts of
 *           nearby vertices have nearby ids;
 *   dfids   pp_certify on that copy (both verdicts must agree).
 * Each figure, parse included, is the median of ROUNDS runs (default 3) in
 * this one process, under certify's memory policy (cli/heap.c) for the sizes
 * where certify uses it, so that floors and phases are timed alike.
 *
 * Usage: certify_floor GRAPH [ROUNDS] -> one line of key=value pairs (seconds).
 */
#include "bench_util.h"
#include "certify.h"
#include "cli.h"
#include "planewit.h"
#include "pp_state.h" /* PP_PREFETCH and PP_SEARCH_AHEAD, as certify's search uses them */

#include <stdlib.h>

#define NONE UINT32_MAX

static void *must_alloc(size_t count, size_t size)
{
    void *p = calloc(count ? count : 1, size);
    if (p == NULL)
        bench_fail("out of memory");
    return p;
}

static void gather(const pw_graph *g, uint32_t *nbr)
{
    for (size_t i = 0; i < 2 * (size_t)g->m; i++)
        nbr[i] = g->ends[g->darts[i] ^ 1u];
}

/* Starts the look-ups of neighbours nbr[from..to) (a hint, nothing more). */
static void fetch_ahead(const uint32_t *first, const uint32_t *nbr, const uint32_t *dfi,
                        uint32_t from, uint32_t to)
{
    for (uint32_t k = from; k < to; k++) {
        PP_PREFETCH(&dfi[nbr[k]]);
        PP_PREFETCH(&first[nbr[k]]);
    }
}

/* Depth-first numbers of every vertex over an adjacency (first, nbr); the
   explicit stack holds vertices, iter the next position of each.  With
   ahead > 0 the look-ups of that many neighbours beyond the one examined are
   started early; with shuffled ids each is a cache miss. */
static void bare_dfs(uint32_t n, const uint32_t *first, const uint32_t *nbr, uint32_t *dfi,
                     uint32_t *parent, uint32_t *iter, uint32_t *stack, uint32_t ahead)
{
    uint32_t next = 0;
    for (uint32_t v = 0; v < n; v++)
        dfi[v] = NONE;
    for (uint32_t r = 0; r < n; r++) {
        if (dfi[r] != NONE)
            continue;
        uint32_t top = 0;
        dfi[r] = next++;
        parent[r] = NONE;
        iter[r] = first[r];
        stack[top++] = r;
        while (top > 0) {
            uint32_t x = stack[top - 1], i = iter[x], end = first[x + 1];
            if (ahead > 0)
                fetch_ahead(first, nbr, dfi, i, end - i < ahead ? end : i + ahead);
            while (i < end && dfi[nbr[i]] != NONE) {
                if (ahead > 0 && i + ahead < end)
                    fetch_ahead(first, nbr, dfi, i + ahead, i + ahead + 1);
                i++;
            }
            iter[x] = i + (i < end);
            if (i == end) {
                top--;
                continue;
            }
            uint32_t y = nbr[i];
            dfi[y] = next++;
            parent[y] = x;
            iter[y] = first[y];
            stack[top++] = y;
        }
    }
}

/* The adjacency with depth-first numbers as ids, each vertex's darts together
   in the same order as before: a counting pass, then one scattered write per dart. */
static void relabel(const pw_graph *g, const uint32_t *nbr, const uint32_t *dfi, uint32_t *first2,
                    uint32_t *nbr2)
{
    uint32_t n = g->n_adj;
    for (uint32_t v = 0; v < n; v++)
        first2[dfi[v] + 1] = g->first[v + 1] - g->first[v];
    first2[0] = 0;
    for (uint32_t x = 0; x < n; x++)
        first2[x + 1] += first2[x];
    for (uint32_t v = 0; v < n; v++) {
        uint32_t at = first2[dfi[v]];
        for (uint32_t i = g->first[v]; i < g->first[v + 1]; i++)
            nbr2[at++] = dfi[nbr[i]];
    }
}

/* The graph of a relabelled adjacency (first2, nbr2), each edge numbered once
   at its end with the smaller id, in id order; the kernel's own grouping then
   lays out every vertex's darts. */
static void depth_first_copy(const uint32_t *first2, const uint32_t *nbr2, pw_graph *copy)
{
    uint32_t e = 0;
    for (uint32_t x = 0; x < copy->n_adj; x++)
        for (uint32_t i = first2[x]; i < first2[x + 1]; i++)
            if (nbr2[i] > x) {
                copy->ends[2 * (size_t)e] = x;
                copy->ends[2 * (size_t)e + 1] = nbr2[i];
                e++;
            }
    if (e != copy->m)
        bench_fail("the copy lost or gained edges");
    pw_graph_group_darts(copy);
}

/* Seconds one pp_certify takes; its kind of result in *kind. */
static double time_engine(const pw_graph *g, pp_kind *kind)
{
    pp_result res;
    double t0 = bench_now();
    if (pp_certify(g, &res) != 0)
        bench_fail("pp_certify failed");
    double t1 = bench_now();
    *kind = res.kind;
    pp_result_free(&res);
    return t1 - t0;
}

static int by_value(const void *a, const void *b)
{
    double x = *(const double *)a, y = *(const double *)b;
    return (x > y) - (x < y);
}

static double median(double *t, int k)
{
    qsort(t, (size_t)k, sizeof *t, by_value);
    return t[k / 2];
}

enum { MAX_ROUNDS = 15, FIGURES = 8 };
enum { GATHER, DFS, AHEAD_DFS, RELABEL, DFS2, COPY, GIVEN, DFIDS }; /* rows of the times */

/* Times the gather and the searches, `rounds` times; leaves the relabelled
   adjacency in (first2, nbr2) for the engine's copy. */
static void time_searches(const pw_graph *g, int rounds, uint32_t *first2, uint32_t *nbr2,
                          double t[FIGURES][MAX_ROUNDS])
{
    size_t darts = 2 * (size_t)g->m, n = g->n_adj;
    uint32_t *nbr = must_alloc(darts, 4), *dfi = must_alloc(n, 4), *dfi2 = must_alloc(n, 4);
    uint32_t *parent = must_alloc(n, 4), *iter = must_alloc(n, 4), *stack = must_alloc(n, 4);
    for (int r = 0; r < rounds; r++) {
        double a = bench_now();
        gather(g, nbr);
        double b = bench_now();
        /* The two searches take turns going first, so that neither is always
           the one that finds the caches warmed by the other. */
        uint32_t first_ahead = r % 2 ? PP_SEARCH_AHEAD : 0;
        uint32_t then_ahead = r % 2 ? 0 : PP_SEARCH_AHEAD;
        bare_dfs(g->n_adj, g->first, nbr, dfi, parent, iter, stack, first_ahead);
        double c = bench_now();
        bare_dfs(g->n_adj, g->first, nbr, dfi2, parent, iter, stack, then_ahead);
        double c2 = bench_now();
        for (uint32_t v = 0; v < g->n_adj; v++)
            if (dfi2[v] != dfi[v])
                bench_fail("the search that fetches ahead disagrees with the plain one");
        double c3 = bench_now();
        relabel(g, nbr, dfi, first2, nbr2);
        double d = bench_now();
        bare_dfs(g->n_adj, first2, nbr2, dfi2, parent, iter, stack, 0);
        double e = bench_now();
        t[GATHER][r] = b - a, t[r % 2 ? AHEAD_DFS : DFS][r] = c - b;
        t[r % 2 ? DFS : AHEAD_DFS][r] = c2 - c, t[RELABEL][r] = d - c3, t[DFS2][r] = e - d;
    }
    for (uint32_t x = 0; x < g->n_adj; x++) /* a search in DFI order numbers in DFI order */
        if (dfi2[x] != x)
            bench_fail("the relabelled search disagrees with the first");
    free(nbr);
    free(dfi);
    free(dfi2);
    free(parent);
    free(iter);
    free(stack);
}

/* Times the copy with depth-first ids and certify's engine on it and on the
   graph as parsed, the two engine runs taking turns. */
static void time_copy(const pw_graph *g, int rounds, const uint32_t *first2, const uint32_t *nbr2,
                      double t[FIGURES][MAX_ROUNDS])
{
    size_t darts = 2 * (size_t)g->m;
    pw_graph copy = {.n_adj = g->n_adj, .m = g->m};
    copy.ends = must_alloc(darts, 4);
    copy.darts = must_alloc(darts, 4);
    copy.first = must_alloc((size_t)g->n_adj + 1, 4);
    for (int r = 0; r < rounds; r++) {
        double a = bench_now();
        depth_first_copy(first2, nbr2, &copy);
        t[COPY][r] = bench_now() - a;
        pp_kind kind_given, kind_copy;
        if (r % 2) {
            t[DFIDS][r] = time_engine(&copy, &kind_copy);
            t[GIVEN][r] = time_engine(g, &kind_given);
        } else {
            t[GIVEN][r] = time_engine(g, &kind_given);
            t[DFIDS][r] = time_engine(&copy, &kind_copy);
        }
        if ((kind_given == PP_PLANAR) != (kind_copy == PP_PLANAR))
            bench_fail("certify's verdicts on the graph and on its copy differ");
    }
    pw_graph_free(&copy);
}

int main(int argc, char **argv)
{
    bench_tool = "certify_floor";
    if (argc < 2 || argc > 3)
        bench_fail("usage: certify_floor GRAPH [ROUNDS]");
    int rounds = argc == 3 ? atoi(argv[2]) : 3;
    if (rounds < 1 || rounds > MAX_ROUNDS)
        bench_fail("ROUNDS must be 1 to 15");
    cli_heap_for_one_job(argv[1], CLI_ONE_JOB_HEAP_LARGEST);
    size_t len = 0;
    char *text = bench_slurp(argv[1], &len);
    pw_limits lim;
    pw_limits_default(&lim);
    pw_graph g;
    pw_verdict v;
    double parse[MAX_ROUNDS];
    for (int r = 0; r < rounds; r++) { /* the kernel's parse, as certify runs it */
        if (r > 0)
            pw_graph_free(&g);
        double t0 = bench_now();
        if (pw_graph_parse(text, len, &lim, &g, &v) != PW_OK)
            bench_fail("the graph does not parse");
        parse[r] = bench_now() - t0;
    }
    uint32_t *first2 = must_alloc((size_t)g.n_adj + 1, 4), *nbr2 = must_alloc(2 * (size_t)g.m, 4);
    double t[FIGURES][MAX_ROUNDS];
    time_searches(&g, rounds, first2, nbr2, t);
    time_copy(&g, rounds, first2, nbr2, t);
    printf("n=%u m=%u parse=%.4f gather=%.4f dfs=%.4f ahead=%.4f relabel=%.4f dfs2=%.4f given=%.4f "
           "copy=%.4f dfids=%.4f\n",
           g.n_adj, g.m, median(parse, rounds), median(t[GATHER], rounds), median(t[DFS], rounds),
           median(t[AHEAD_DFS], rounds), median(t[RELABEL], rounds), median(t[DFS2], rounds),
           median(t[GIVEN], rounds), median(t[COPY], rounds), median(t[DFIDS], rounds));
    return 0;
}
