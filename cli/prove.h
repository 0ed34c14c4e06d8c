/*
 * prove.h - the front end's side of `planewit certify`: choose a witness,
 * render the certificate into memory, and have the kernel check it before a
 * byte of it is written anywhere.  The witness itself comes from the
 * producer (producer/certify.h) or, for --witness cheapest, from edge counts
 * and a 2-colouring computed here.
 */
#ifndef PW_PROVE_H
#define PW_PROVE_H

#include "batch.h"
#include "certify.h"
#include "import.h"

/* ---- two_colour.c ------------------------------------------------------- */

/*
 * 2-colours g by breadth-first search: 1 when bipartite (side[v] in {0,1} for
 * every v < g->n, every edge across), 0 when an odd cycle exists.  side has
 * room for g->n entries, queue for g->n_adj.  Iterative, O(n + m).
 */
int two_colour(const pw_graph *g, unsigned char *side, uint32_t *queue);

/* ---- prover.c ----------------------------------------------------------- */

typedef enum { WITNESS_SUBDIVISION = 0, WITNESS_CHEAPEST = 1 } witness_choice;

/* Reusable state: one prover serves a whole graph6 stream. */
typedef struct {
    witness_choice choice;
    pw_witness kind;        /* of the last certificate made */
    pp_result result;       /* the producer's, when kind came from it */
    int have_result;
    unsigned char *side;    /* bipartite-edge-bound sides */
    uint32_t *queue;
    uint32_t side_room;
    char *cert;             /* the certificate is rendered here */
    size_t cert_size;       /* room in cert */
    size_t cert_len;        /* bytes of the last certificate */
} prover;

int prover_open(prover *p, witness_choice choice);
void prover_close(prover *p);

typedef enum {
    PROVE_ACCEPTED = 0,  /* p->cert holds a certificate the kernel accepted, v its verdict */
    PROVE_NO_MEMORY = -1,
    PROVE_PRODUCER_FAILED = -2, /* the producer reported an inconsistency: a bug */
    PROVE_REFUSED = -3,  /* the kernel refused our own certificate: a bug; v says why */
    PROVE_REREAD_FAILED = -4, /* the graph file could not be read again (reported) */
    PROVE_GRAPH_CHANGED = -5  /* the graph file read again is not what was parsed */
} prove_status;

/*
 * Finds a witness for g, renders it (with a graph-sha256 line when sha is not
 * NULL) and checks it with pw_check_parsed against graph[0..graph_len-1].
 */
prove_status prover_run(prover *p, const pw_graph *g, const char *graph, size_t graph_len,
                        const unsigned char *sha, pw_verdict *v);
/* The two halves of prover_run, for a caller that does not hold the graph's
   bytes in between: PROVE_ACCEPTED from prover_make means rendered, unchecked. */
prove_status prover_make(prover *p, const pw_graph *g, const unsigned char *sha);
prove_status prover_check(const prover *p, const pw_graph *g, const char *graph,
                          size_t graph_len, pw_verdict *v);
/*
 * prover_run for g parsed from in, whose digest is sha.  When in->path names
 * a regular file, its bytes are freed while the witness is made and read
 * again (in->bytes, with lim) for the check.  sha (not NULL) is the digest
 * of what was parsed; the certificate carries it, so the check cannot pass
 * on other bytes, and a file that changed is told apart from a bug.
 */
prove_status prover_run_file(prover *p, cli_input *in, const pw_limits *lim, const pw_graph *g,
                             const unsigned char *sha, pw_verdict *v);

/* ---- cmd_certify.c, certify_stream.c ----------------------------------- */

typedef struct {
    const char *graph;     /* GRAPH, or NULL with --graph6 */
    const char *graph6;    /* --graph6 FILE|- */
    const char *output;    /* -o CERT, NULL: write no certificate */
    const char *names;     /* --names FILE */
    int json, summary;
    witness_choice choice;
    pw_limits lim;
    unsigned threads;      /* -j, with --graph6; 0: the online CPUs */
    batch_shard shard;     /* --shard I/K, with --graph6; {0, 1}: every record */
    int sharded;           /* --shard was given */
} certify_args;

/* `certify --graph6`: returns the exit status. */
int certify_stream(const certify_args *a);
/*
 * The loud report of a bug (exit status 3): v is the kernel's verdict on a
 * certificate of ours it refused, or NULL when the producer itself failed.
 */
void certify_report_bug(const pw_verdict *v, const char *graph_path, const char *where);

/* ---- witness_show.c ----------------------------------------------------- */

/*
 * Tells the user which vertices and edges form the witness the prover just
 * made, by name when names is not NULL.  Long paths are shortened on the
 * terminal; the certificate always has them whole.
 */
void witness_show(FILE *out, const prover *p, const pw_graph *g, const name_table *names);

#endif
