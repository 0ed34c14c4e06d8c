/*
 * certify_stream.c - `planewit certify --graph6 FILE|-`: every graph of a
 * graph6 stream certified and its certificate checked by the kernel, one
 * graph at a time, in constant memory per graph size.  Records are decoded
 * straight into the kernel's graph shape (no text in between) and every
 * buffer - line, edges, adjacency, certificate - is reused from graph to graph.
 */
#include "prove.h"

#include <stdlib.h>
#include <string.h>

typedef struct {
    const certify_args *a;
    const char *shown;            /* the input's name in messages */
    line_reader lines;
    edge_list edges;
    graph_view view;
    prover p;
    uint64_t graphs, planar;
    uint64_t by_witness[PW_WITNESS_BIPARTITE_BOUND + 1];
} stream;

static void print_counts(const stream *s)
{
    static const pw_witness kinds[] = {PW_WITNESS_SUBDIVISION_K5, PW_WITNESS_SUBDIVISION_K33,
                                       PW_WITNESS_EDGE_BOUND, PW_WITNESS_BIPARTITE_BOUND};
    size_t shown = s->a->choice == WITNESS_CHEAPEST ? 4 : 2;
    for (size_t i = 0; i < shown; i++)
        printf("nonplanar by %s: %llu\n", pw_witness_name(kinds[i]),
               (unsigned long long)s->by_witness[kinds[i]]);
    printf("graphs=%llu planar=%llu nonplanar=%llu\n", (unsigned long long)s->graphs,
           (unsigned long long)s->planar, (unsigned long long)(s->graphs - s->planar));
}

static int decode_fault(const stream *s, size_t head, const graph6_fault *f)
{
    size_t at = head + f->offset;
    fprintf(stderr, "planewit certify: %s line %llu, byte offset %llu (column %zu): %s\n",
            s->shown, (unsigned long long)s->lines.line_number,
            (unsigned long long)(s->lines.line_offset + at), at + 1, f->what);
    return CLI_EXIT_USAGE;
}

static void report_bug(const stream *s, const pw_verdict *v)
{
    char where[160];
    int shown = s->lines.line_len > 60 ? 60 : (int)s->lines.line_len;
    snprintf(where, sizeof where, " line %llu (graph6 record '%.*s%s')",
             (unsigned long long)s->lines.line_number, shown, s->lines.line,
             s->lines.line_len > 60 ? "..." : "");
    certify_report_bug(v, s->shown, where);
}

/* One record: decode, certify, check, count.  Returns -1 to go on, else the exit status. */
static int one_graph(stream *s)
{
    graph6_fault fault;
    pw_verdict v;
    const char *line = s->lines.line;
    size_t head = graph6_header_length(line, s->lines.line_len);
    int got = graph6_decode(line + head, s->lines.line_len - head, &s->a->lim, &s->edges, &fault);
    if (got == -1)
        return decode_fault(s, head, &fault);
    if (got != 0 || graph_view_build(&s->view, &s->edges) != 0)
        return -2;
    prove_status proved = prover_run(&s->p, &s->view.g, line, s->lines.line_len, NULL, &v);
    if (proved == PROVE_NO_MEMORY)
        return -2;
    if (proved == PROVE_REFUSED || proved == PROVE_PRODUCER_FAILED) {
        report_bug(s, proved == PROVE_REFUSED ? &v : NULL);
        return CLI_EXIT_BUG;
    }
    s->graphs++;
    s->planar += v.claim == PW_CLAIM_PLANAR;
    s->by_witness[v.witness]++;
    if (!s->a->summary)
        printf("line %llu: certified %s (%s) - %u vert%s, %u edge%s\n",
               (unsigned long long)s->lines.line_number, pw_claim_name(v.claim),
               pw_witness_name(v.witness), s->view.g.n, s->view.g.n == 1 ? "ex" : "ices",
               s->view.g.m, s->view.g.m == 1 ? "" : "s");
    return -1;
}

/* Reads the stream to its end or first failure; returns the exit status. */
static int run(stream *s)
{
    int got = 0, status = -1;
    while (status == -1 && (got = line_reader_next(&s->lines)) == 1)
        status = one_graph(s);
    if (status == -2 || (status == -1 && got == -3)) {
        fprintf(stderr, "planewit certify: %s: out of memory\n", s->shown);
        return CLI_EXIT_USAGE;
    }
    if (status == -1 && got == -2) {
        fprintf(stderr, "planewit certify: %s line %llu: longer than %llu bytes (raise it with "
                        "--max-bytes)\n", s->shown, (unsigned long long)s->lines.line_number + 1,
                (unsigned long long)s->a->lim.max_bytes);
        return CLI_EXIT_USAGE;
    }
    if (status == -1 && got == -1) {
        fprintf(stderr, "planewit certify: %s: read error\n", s->shown);
        return CLI_EXIT_USAGE;
    }
    if (status != -1)
        return status;
    print_counts(s);
    return fflush(stdout) == 0 ? 0 : CLI_EXIT_USAGE;
}

int certify_stream(const certify_args *a)
{
    stream s;
    int from_stdin = strcmp(a->graph6, "-") == 0;
    memset(&s, 0, sizeof s);
    s.a = a;
    s.shown = from_stdin ? "<stdin>" : a->graph6;
    FILE *in = from_stdin ? stdin : fopen(a->graph6, "rb");
    if (in == NULL) {
        fprintf(stderr, "planewit certify: %s: cannot open\n", a->graph6);
        return CLI_EXIT_USAGE;
    }
    int status = CLI_EXIT_USAGE;
    if (line_reader_open(&s.lines, in, a->lim.max_bytes) != 0 || prover_open(&s.p, a->choice) != 0)
        fprintf(stderr, "planewit certify: out of memory\n");
    else
        status = run(&s);
    line_reader_close(&s.lines);
    prover_close(&s.p);
    edge_list_free(&s.edges);
    graph_view_free(&s.view);
    if (!from_stdin)
        fclose(in);
    return status;
}
