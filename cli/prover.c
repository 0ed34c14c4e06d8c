/*
 * prover.c - one certificate made and self-checked.  The certificate is
 * rendered into a buffer that lives as long as the prover, so a stream of
 * millions of graphs reuses one; it is sized from the counts before a byte is
 * written (a growing memory stream cost a third of the text's time at 10^6
 * edges in copies and page faults).  The kernel then checks the rendered
 * bytes exactly as `planewit check` would check a file.
 */
#include "prove.h"

#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>

int prover_open(prover *p, witness_choice choice)
{
    memset(p, 0, sizeof *p);
    p->choice = choice;
    return 0;
}

static void drop_result(prover *p)
{
    if (p->have_result)
        pp_result_free(&p->result);
    p->have_result = 0;
}

void prover_close(prover *p)
{
    drop_result(p);
    free(p->cert);
    free(p->side);
    free(p->queue);
    memset(p, 0, sizeof *p);
}

static int ensure_colour_room(prover *p, const pw_graph *g)
{
    if (p->side != NULL && g->n <= p->side_room)
        return 0;
    free(p->side);
    free(p->queue);
    p->side = malloc((size_t)g->n + 1);
    p->queue = malloc(((size_t)g->n + 1) * sizeof *p->queue);
    p->side_room = g->n;
    return p->side != NULL && p->queue != NULL ? 0 : -1;
}

/* The edge-count witnesses, when one holds: 1 found (p->kind set), 0 none, -1 no memory. */
static int find_bound(prover *p, const pw_graph *g)
{
    int64_t n = g->n, m = g->m;
    if (n < 3 || m <= 2 * n - 4)
        return 0;
    if (m > 3 * n - 6) {
        p->kind = PW_WITNESS_EDGE_BOUND;
        return 1;
    }
    if (ensure_colour_room(p, g) != 0)
        return -1;
    if (!two_colour(g, p->side, p->queue))
        return 0;
    p->kind = PW_WITNESS_BIPARTITE_BOUND;
    return 1;
}

/* The edge-count witness's text; -1 when memory runs out. */
static int write_bound(prover *p, const pw_graph *g, const unsigned char *sha)
{
    const unsigned char *side = p->kind == PW_WITNESS_BIPARTITE_BOUND ? p->side : NULL;
    return pp_bound_text(g, side, sha, &p->cert, &p->cert_size, &p->cert_len);
}

static pw_witness kind_of(const pp_result *r)
{
    if (r->kind == PP_PLANAR)
        return PW_WITNESS_ROTATION;
    return r->kind == PP_K5 ? PW_WITNESS_SUBDIVISION_K5 : PW_WITNESS_SUBDIVISION_K33;
}

/* Renders the certificate into p->memory: 0, -1 out of memory, -2 the producer failed. */
static int render(prover *p, const pw_graph *g, const unsigned char *sha)
{
    int bound = p->choice == WITNESS_CHEAPEST ? find_bound(p, g) : 0;
    if (bound < 0)
        return -1;
    if (bound > 0)
        return write_bound(p, g, sha);
    memset(&p->result, 0, sizeof p->result);
    int got = pp_certify(g, &p->result);
    if (got != 0)
        return got == -1 ? -1 : -2;
    p->have_result = 1;
    p->kind = kind_of(&p->result);
    int written = pp_cert_text(g, &p->result, sha, &p->cert, &p->cert_size, &p->cert_len);
    /* A rotation is all in the text now, and its 8 bytes per edge would add to the
       self-check's peak; a subdivision is kept for the report (witness_show). */
    if (p->result.kind == PP_PLANAR)
        drop_result(p);
    return written == 0 ? 0 : -1;
}

prove_status prover_make(prover *p, const pw_graph *g, const unsigned char *sha)
{
    drop_result(p);
    p->cert_len = 0;
    int rendered = render(p, g, sha);
    if (rendered == -2)
        return PROVE_PRODUCER_FAILED;
    return rendered == 0 ? PROVE_ACCEPTED : PROVE_NO_MEMORY;
}

prove_status prover_check(const prover *p, const pw_graph *g, const char *graph,
                          size_t graph_len, pw_verdict *v)
{
    pw_check_parsed(g, graph, graph_len, p->cert, p->cert_len, v);
    return v->status == PW_ACCEPTED ? PROVE_ACCEPTED : PROVE_REFUSED;
}

prove_status prover_run(prover *p, const pw_graph *g, const char *graph, size_t graph_len,
                        const unsigned char *sha, pw_verdict *v)
{
    prove_status made = prover_make(p, g, sha);
    return made != PROVE_ACCEPTED ? made : prover_check(p, g, graph, graph_len, v);
}

/*
 * The graph's bytes are needed again only by the self-check, which binds its
 * verdict to them.  A regular file is therefore let go while the witness is
 * made, and read again for the check.  At 10^7 edges (sparse planar) that
 * takes the search's peak from 117 to about 101 bytes per edge, below the
 * self-check's 110, which leaves room for the one-heap memory policy (cli.h,
 * CLI_ONE_JOB_HEAP_LARGEST).  The certificate's graph-sha256 line is of the
 * first reading, so the kernel refuses a file that changed in between; the
 * two digests tell that apart from a bug.
 */
static int can_read_again(const char *path)
{
    struct stat st;
    return strcmp(path, "-") != 0 && stat(path, &st) == 0 && S_ISREG(st.st_mode);
}

prove_status prover_run_file(prover *p, cli_input *in, const pw_limits *lim, const pw_graph *g,
                             const unsigned char *sha, pw_verdict *v)
{
    const char *path = in->path;
    int let_go = can_read_again(path);
    if (let_go)
        cli_free_input(in);
    prove_status got = prover_make(p, g, sha);
    if (got != PROVE_ACCEPTED)
        return got;
    if (let_go && cli_read_input(in, path, lim) != PW_OK)
        return PROVE_REREAD_FAILED;
    got = prover_check(p, g, in->bytes, in->len, v);
    if (v->have_graph_sha256 && memcmp(v->graph_sha256, sha, 32) != 0)
        return PROVE_GRAPH_CHANGED;
    return got;
}
