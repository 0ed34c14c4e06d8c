/*
 * stream.h - `certify --graph6` on worker threads.  The calling thread reads
 * the stream into blocks of up to STREAM_BLOCK_RECORDS records and writes the
 * finished blocks in input order; workers certify whole blocks, each with its
 * own reusable buffers.  Handing over thousands of records at a time keeps
 * the locking cost per graph negligible even for graphs of ten vertices.
 *
 * The output is that of one thread reading, certifying and printing graph
 * by graph: the same lines in the same order, and on the first failure the
 * same message after the same lines, and nothing more.
 */
#ifndef PW_STREAM_H
#define PW_STREAM_H

#include "prove.h"

#define STREAM_BLOCK_RECORDS 4096
#define STREAM_BLOCK_BYTES (256u << 10) /* a block of big records ends sooner */

/* Where one record came from: its bytes are text[start .. start+len-1]. */
typedef struct {
    size_t start, len;
    uint64_t line;   /* 1-based line number in the stream */
    uint64_t offset; /* byte offset of that line in the stream */
} stream_record;

typedef enum {
    STREAM_FINE = 0,       /* every record of the block certified */
    STREAM_BAD_RECORD,     /* fault holds the message */
    STREAM_NO_MEMORY,
    STREAM_PRODUCER_FAILED, /* a bug; where says which record */
    STREAM_REFUSED         /* a bug; bug is the kernel's verdict */
} stream_failure;

typedef struct {
    /* Filled by the reader. */
    char *text;
    size_t text_len, text_cap;
    stream_record *records;
    size_t count;
    int read_end;      /* line_reader_next's status after the last record: 1 more follows */
    uint64_t read_line; /* the reader's line number when it stopped */
    /* Filled by the worker: the per-graph lines, the counts, the first failure. */
    char *out;
    size_t out_len, out_cap;
    uint64_t graphs, planar;
    uint64_t by_witness[PW_WITNESS_BIPARTITE_BOUND + 1];
    stream_failure failure;
    char fault[400];
    char where[160];
    pw_verdict bug;
} stream_block;

/* One worker's buffers, reused from graph to graph. */
typedef struct {
    edge_list edges;
    graph_view view;
    prover p;
} stream_worker;

/* What the pool needs to know of the run. */
typedef struct {
    const certify_args *a;
    const char *shown; /* the input's name in messages */
    line_reader *lines;
    uint64_t graphs, planar; /* totals of the blocks written */
    uint64_t by_witness[PW_WITNESS_BIPARTITE_BOUND + 1];
} stream_run_state;

/* certify_stream.c: certifies every record of b (stops at the first failure). */
void stream_certify_block(stream_worker *w, const stream_run_state *s, stream_block *b);
/* certify_stream.c: writes b's lines and adds its counts; -1 go on, else the exit status. */
int stream_write_block(stream_run_state *s, const stream_block *b);

/*
 * stream_pool.c: reads s->lines to its end on `threads` workers (threads >= 1)
 * and writes every block in order; returns -1 when everything was written,
 * else the exit status of the first failure (its message printed).
 */
int stream_pool_run(stream_run_state *s, unsigned threads);

#endif
