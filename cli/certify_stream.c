/*
 * certify_stream.c - `planewit certify --graph6 FILE|-`: every graph of a
 * graph6 stream certified and its certificate checked by the kernel, in
 * constant memory per graph size.  Records are decoded straight into the
 * kernel's graph shape (no text in between) and every buffer - edges,
 * adjacency, certificate, output lines - is reused from graph to graph.
 * The records are spread over worker threads a block at a time
 * (stream_pool.c); this file says what happens to one block.
 *
 * With --shard I/K only records I, I+K, ... (line numbers I+1, I+K+1, ...)
 * are certified; the per-graph lines keep their line numbers, and the
 * counts of the K shards add up, line by line, to those of one whole run.
 */
#include "stream.h"

#include <stdlib.h>
#include <string.h>
#include <unistd.h>

static void print_counts(const stream_run_state *s)
{
    static const pw_witness kinds[] = {PW_WITNESS_SUBDIVISION_K5, PW_WITNESS_SUBDIVISION_K33,
                                       PW_WITNESS_EDGE_BOUND, PW_WITNESS_BIPARTITE_BOUND};
    size_t shown = s->a->choice == WITNESS_CHEAPEST ? 4 : 2;
    const batch_shard *shard = &s->a->shard;
    if (shard->count > 1)
        printf("shard %zu/%zu: records %zu, %zu, %zu, ... (numbered from 0; line L is record L-1)\n",
               shard->first, shard->count, shard->first, shard->first + shard->count,
               shard->first + 2 * shard->count);
    for (size_t i = 0; i < shown; i++)
        printf("nonplanar by %s: %llu\n", pw_witness_name(kinds[i]),
               (unsigned long long)s->by_witness[kinds[i]]);
    printf("graphs=%llu planar=%llu nonplanar=%llu\n", (unsigned long long)s->graphs,
           (unsigned long long)s->planar, (unsigned long long)(s->graphs - s->planar));
}

/* ---- a worker's side ------------------------------------------------------ */

static int put(stream_block *b, const char *bytes, size_t len)
{
    if (b->out_len + len > b->out_cap) {
        size_t cap = b->out_cap * 2 > b->out_len + len ? b->out_cap * 2 : b->out_len + len + 4096;
        char *out = realloc(b->out, cap);
        if (out == NULL)
            return -1;
        b->out = out;
        b->out_cap = cap;
    }
    memcpy(b->out + b->out_len, bytes, len);
    b->out_len += len;
    return 0;
}

/* Appends text at *at in line (room for any line this file writes). */
static void add_text(char *line, size_t *at, const char *text)
{
    size_t len = strlen(text);
    memcpy(line + *at, text, len);
    *at += len;
}

static void add_number(char *line, size_t *at, uint64_t value)
{
    char digits[24];
    size_t first = sizeof digits;
    do {
        digits[--first] = (char)('0' + value % 10);
        value /= 10;
    } while (value != 0);
    memcpy(line + *at, digits + first, sizeof digits - first);
    *at += sizeof digits - first;
}

/* "line L: certified CLAIM (WITNESS) - N vertices, M edges", as a single thread prints it. */
static int put_graph_line(stream_block *b, uint64_t number, const pw_verdict *v,
                          const pw_graph *g)
{
    char line[192]; /* 3 numbers of at most 20 digits, 2 names of at most 24 bytes, 60 more */
    size_t at = 0;
    add_text(line, &at, "line ");
    add_number(line, &at, number);
    add_text(line, &at, ": certified ");
    add_text(line, &at, pw_claim_name(v->claim));
    add_text(line, &at, " (");
    add_text(line, &at, pw_witness_name(v->witness));
    add_text(line, &at, ") - ");
    add_number(line, &at, g->n);
    add_text(line, &at, g->n == 1 ? " vertex, " : " vertices, ");
    add_number(line, &at, g->m);
    add_text(line, &at, g->m == 1 ? " edge\n" : " edges\n");
    return put(b, line, at);
}

static void note_fault(const stream_run_state *s, stream_block *b, const stream_record *rec,
                       size_t head, const graph6_fault *f)
{
    size_t at = head + f->offset;
    snprintf(b->fault, sizeof b->fault,
             "planewit certify: %s line %llu, byte offset %llu (column %zu): %s\n", s->shown,
             (unsigned long long)rec->line, (unsigned long long)(rec->offset + at), at + 1,
             f->what);
    b->failure = STREAM_BAD_RECORD;
}

static void note_bug(stream_block *b, const stream_record *rec, prove_status proved,
                     const pw_verdict *v)
{
    const char *line = b->text + rec->start;
    int shown = rec->len > 60 ? 60 : (int)rec->len;
    snprintf(b->where, sizeof b->where, " line %llu (graph6 record '%.*s%s')",
             (unsigned long long)rec->line, shown, line, rec->len > 60 ? "..." : "");
    b->failure = proved == PROVE_REFUSED ? STREAM_REFUSED : STREAM_PRODUCER_FAILED;
    if (proved == PROVE_REFUSED)
        b->bug = *v;
}

/* One record: decode, certify, check, count; 0 or -1 with b->failure set. */
static int one_graph(stream_worker *w, const stream_run_state *s, stream_block *b,
                     const stream_record *rec)
{
    graph6_fault fault;
    pw_verdict v;
    const char *line = b->text + rec->start;
    size_t head = graph6_header_length(line, rec->len);
    int got = graph6_decode(line + head, rec->len - head, &s->a->lim, &w->edges, &fault);
    if (got == -1) {
        note_fault(s, b, rec, head, &fault);
        return -1;
    }
    prove_status proved = PROVE_NO_MEMORY;
    if (got == 0 && graph_view_build(&w->view, &w->edges) == 0)
        proved = prover_run(&w->p, &w->view.g, line, rec->len, NULL, &v);
    if (proved == PROVE_REFUSED || proved == PROVE_PRODUCER_FAILED)
        note_bug(b, rec, proved, &v);
    else if (proved == PROVE_ACCEPTED &&
             (s->a->summary || put_graph_line(b, rec->line, &v, &w->view.g) == 0)) {
        b->graphs++;
        b->planar += v.claim == PW_CLAIM_PLANAR;
        b->by_witness[v.witness]++;
        return 0;
    } else {
        b->failure = STREAM_NO_MEMORY;
    }
    return -1;
}

void stream_certify_block(stream_worker *w, const stream_run_state *s, stream_block *b)
{
    b->out_len = 0;
    b->graphs = b->planar = 0;
    memset(b->by_witness, 0, sizeof b->by_witness);
    b->failure = STREAM_FINE;
    for (size_t k = 0; k < b->count; k++)
        if (one_graph(w, s, b, &b->records[k]) != 0)
            return;
}

/* ---- the writer's side ----------------------------------------------------- */

/* How reading ended, after the block's lines were written; -1 go on / all done, else the status. */
static int reading_end(const stream_run_state *s, const stream_block *b)
{
    if (b->read_end == 1 || b->read_end == 0)
        return -1;
    if (b->read_end == -3)
        fprintf(stderr, "planewit certify: %s: out of memory\n", s->shown);
    else if (b->read_end == -2)
        fprintf(stderr, "planewit certify: %s line %llu: longer than %llu bytes (raise it with "
                        "--max-bytes)\n", s->shown, (unsigned long long)b->read_line + 1,
                (unsigned long long)s->a->lim.max_bytes);
    else
        fprintf(stderr, "planewit certify: %s: read error\n", s->shown);
    return CLI_EXIT_USAGE;
}

int stream_write_block(stream_run_state *s, const stream_block *b)
{
    if (b->out_len > 0 && fwrite(b->out, 1, b->out_len, stdout) != b->out_len) {
        fprintf(stderr, "planewit certify: cannot write the output\n");
        return CLI_EXIT_USAGE;
    }
    s->graphs += b->graphs;
    s->planar += b->planar;
    for (size_t k = 0; k < sizeof s->by_witness / sizeof s->by_witness[0]; k++)
        s->by_witness[k] += b->by_witness[k];
    switch (b->failure) {
    case STREAM_FINE:
        return reading_end(s, b);
    case STREAM_BAD_RECORD:
        fputs(b->fault, stderr);
        return CLI_EXIT_USAGE;
    case STREAM_NO_MEMORY:
        fprintf(stderr, "planewit certify: %s: out of memory\n", s->shown);
        return CLI_EXIT_USAGE;
    default:
        certify_report_bug(b->failure == STREAM_REFUSED ? &b->bug : NULL, s->shown, b->where);
        return CLI_EXIT_BUG;
    }
}

/* ---- the command ----------------------------------------------------------- */

static unsigned online_cpus(void)
{
    long online = sysconf(_SC_NPROCESSORS_ONLN);
    return online > 0 && online <= 4096 ? (unsigned)online : 1;
}

int certify_stream(const certify_args *a)
{
    line_reader lines;
    stream_run_state s;
    int from_stdin = strcmp(a->graph6, "-") == 0;
    memset(&s, 0, sizeof s);
    s.a = a;
    s.shown = from_stdin ? "<stdin>" : a->graph6;
    s.lines = &lines;
    FILE *in = from_stdin ? stdin : fopen(a->graph6, "rb");
    if (in == NULL) {
        fprintf(stderr, "planewit certify: %s: cannot open\n", a->graph6);
        return CLI_EXIT_USAGE;
    }
    int status = CLI_EXIT_USAGE;
    if (line_reader_open(&lines, in, a->lim.max_bytes) != 0) {
        fprintf(stderr, "planewit certify: out of memory\n");
    } else {
        status = stream_pool_run(&s, a->threads > 0 ? a->threads : online_cpus());
        if (status == -1) {
            print_counts(&s);
            status = fflush(stdout) == 0 ? 0 : CLI_EXIT_USAGE;
        }
    }
    line_reader_close(&lines);
    if (!from_stdin)
        fclose(in);
    return status;
}
