/*
 * certify_phases.c - the steps `planewit certify GRAPH -o CERT` takes, timed
 * one by one in a single process, for the certify benchmark (issue 3): read
 * the file, SHA-256 of its bytes, parse (pw_graph_parse), the planarity
 * algorithm with witness finding (pp_certify), rendering the certificate text
 * into memory (pp_write_cert), the kernel's self-check (pw_check_parsed), and
 * writing the text to CERT.  It calls the same library functions in the same
 * order as cli/cmd_certify.c and cli/prover.c, without the front end's report.
 *
 * Like the real process it uses the one-heap memory policy for the sizes
 * certify does (cli/heap.c), lets the graph's bytes go while the witness is
 * made and reads the file again for the self-check (cli/prover.c; *reread*
 * is that second reading, a cost of the self-check).
 *
 * Usage: certify_phases GRAPH CERT -> one line of key=value pairs (seconds),
 * with the witness kind and, for a subdivision, its distinct vertices and
 * edges, and whether it is bare (every path vertex but the branches used once),
 * and each phase's own peak resident memory in KiB (hwm_PHASE; Linux only,
 * -1 elsewhere), which shows where the whole run's peak comes from.
 */
#include "bench_util.h"
#include "certify.h"
#include "cli.h"
#include "planewit.h"

#include <openssl/evp.h>
#include <stdlib.h>
#include <string.h>

/*
 * The peak resident size (KiB) since the last call.  Writing 5 to clear_refs
 * resets the kernel's peak to the present size, so each phase gets its own.
 */
static long phase_peak(void)
{
    char line[256];
    long kib = -1;
    FILE *f = fopen("/proc/self/status", "r");
    while (f != NULL && fgets(line, sizeof line, f) != NULL)
        if (sscanf(line, "VmHWM: %ld", &kib) == 1)
            break;
    if (f != NULL)
        fclose(f);
    f = fopen("/proc/self/clear_refs", "w");
    if (f != NULL) {
        fputs("5", f);
        fclose(f);
    }
    return kib;
}

static const char *kind_name(pp_kind kind)
{
    return kind == PP_PLANAR ? "planar" : kind == PP_K5 ? "k5" : "k33";
}

/* Distinct vertices and edges of the witness paths; bare when no inner vertex repeats. */
static void witness_size(const pw_graph *g, const pp_result *r, unsigned long *vertices,
                         unsigned long *edges, int *bare)
{
    unsigned paths = pp_path_count(r);
    unsigned char *uses = calloc((size_t)g->n + 1, 1);
    if (uses == NULL)
        bench_fail("out of memory");
    *vertices = 0;
    *edges = 0;
    *bare = 1;
    for (unsigned k = 0; k < paths; k++) {
        *edges += r->path_start[k + 1] - r->path_start[k] - 1;
        for (uint32_t i = r->path_start[k]; i < r->path_start[k + 1]; i++) {
            uint32_t x = r->path[i];
            int inner = i != r->path_start[k] && i + 1 != r->path_start[k + 1];
            if (uses[x] == 0)
                ++*vertices;
            if (inner && uses[x] != 0)
                *bare = 0;
            uses[x] = (unsigned char)(inner ? 2 : uses[x] == 2 ? 2 : 1);
        }
    }
    free(uses);
}

int main(int argc, char **argv)
{
    bench_tool = "certify_phases";
    size_t glen, cap = 0;
    unsigned char sha[32];
    pw_limits lim;
    pw_graph g;
    pw_verdict v;
    pp_result r;
    char *cert = NULL;
    if (argc != 3)
        bench_fail("usage: certify_phases GRAPH CERT");
    pw_limits_default(&lim);
    cli_heap_for_one_job(argv[1], CLI_ONE_JOB_HEAP_LARGEST);
    long hwm[7];
    phase_peak();
    double t0 = bench_now();
    char *graph = bench_slurp(argv[1], &glen);
    hwm[0] = phase_peak();
    double t1 = bench_now();
    if (EVP_Digest(graph, glen, sha, NULL, EVP_sha256(), NULL) != 1)
        bench_fail("SHA-256 failed");
    double t2 = bench_now();
    if (pw_graph_parse(graph, glen, &lim, &g, &v) != PW_OK)
        bench_fail("the graph does not parse");
    free(graph);
    hwm[1] = phase_peak();
    double t3 = bench_now();
    memset(&r, 0, sizeof r);
    if (pp_certify(&g, &r) != 0)
        bench_fail("pp_certify failed");
    hwm[2] = phase_peak();
    double t4 = bench_now();
    size_t clen;
    if (pp_cert_text(&g, &r, sha, &cert, &cap, &clen) != 0)
        bench_fail("cannot render the certificate");
    pp_kind kind = r.kind;
    if (kind == PP_PLANAR)
        pp_result_free(&r); /* as cli/prover.c does: the rotation is all in the text */
    hwm[3] = phase_peak();
    size_t again;
    double t5a = bench_now();
    graph = bench_slurp(argv[1], &again);
    if (again != glen)
        bench_fail("the graph file changed");
    hwm[4] = phase_peak();
    double t5 = bench_now();
    pw_check_parsed(&g, graph, glen, cert, clen, &v);
    hwm[5] = phase_peak();
    double t6 = bench_now();
    FILE *out = fopen(argv[2], "wb");
    if (out == NULL || fwrite(cert, 1, clen, out) != clen || fclose(out) != 0)
        bench_fail("cannot write the certificate");
    hwm[6] = phase_peak();
    double t7 = bench_now();
    unsigned long wv = 0, we = 0;
    int bare = 1;
    if (kind != PP_PLANAR)
        witness_size(&g, &r, &wv, &we, &bare);
    printf("n=%u m=%u read=%.4f hash=%.4f parse=%.4f algorithm=%.4f text=%.4f reread=%.4f "
           "selfcheck=%.4f file=%.4f kind=%s wv=%lu we=%lu bare=%s verdict=%s hwm_read=%ld hwm_parse=%ld "
           "hwm_algorithm=%ld hwm_text=%ld hwm_reread=%ld hwm_selfcheck=%ld hwm_file=%ld\n",
           g.n, g.m, t1 - t0, t2 - t1, t3 - t2, t4 - t3, t5a - t4, t5 - t5a, t6 - t5, t7 - t6,
           kind_name(kind), wv, we, bare ? "yes" : "no",
           v.status == PW_ACCEPTED ? "accepted" : pw_code_name(v.code), hwm[0], hwm[1], hwm[2],
           hwm[3], hwm[4], hwm[5], hwm[6]);
    free(cert);
    pp_result_free(&r);
    pw_graph_free(&g);
    free(graph);
    return v.status == PW_ACCEPTED ? 0 : 1;
}
