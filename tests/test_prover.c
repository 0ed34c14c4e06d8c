/*
 * test_prover.c - the certify front end's core: a witness is chosen,
 * rendered into a reused buffer and checked by the kernel; a certificate the
 * kernel refuses is reported as such, never passed on.  Facts used: K4 is
 * planar, K5 and K3,3 are not (Kuratowski 1930); the bounds 3N - 6 and
 * 2N - 4 are common practice.
 */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

#include "prove.h"

typedef struct {
    const char *text;
    pw_graph g;
} parsed;

static void parse(parsed *p, const char *text)
{
    pw_limits lim;
    pw_verdict v;
    pw_limits_default(&lim);
    p->text = text;
    assert_int_equal(pw_graph_parse(text, strlen(text), &lim, &p->g, &v), PW_OK);
}

static const char k4[] = "graph 4 6\n0 1\n0 2\n0 3\n1 2\n1 3\n2 3\n";
static const char k5[] = "graph 5 10\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n";
static const char k6[] = "graph 6 15\n0 1\n0 2\n0 3\n0 4\n0 5\n1 2\n1 3\n1 4\n1 5\n2 3\n2 4\n"
                         "2 5\n3 4\n3 5\n4 5\n";
static const char k34[] = "graph 7 12\n0 3\n0 4\n0 5\n0 6\n1 3\n1 4\n1 5\n1 6\n2 3\n2 4\n2 5\n2 6\n";
static const char k33_split[] = "graph 7 10\n0 3\n0 4\n0 6\n6 5\n1 3\n1 4\n1 5\n2 3\n2 4\n2 5\n";
static const char triangle_and_edge[] = "graph 5 4\n0 1\n1 2\n2 0\n3 4\n";

static prove_status run(prover *pr, const char *text, const unsigned char *sha, pw_verdict *v)
{
    parsed p;
    parse(&p, text);
    prove_status got = prover_run(pr, &p.g, p.text, strlen(p.text), sha, v);
    pw_graph_free(&p.g);
    return got;
}

/* Wrong graph bytes behind the graph-sha256 line: the kernel refuses, the prover says so. */
static void refusal_is_reported(void **state)
{
    prover pr;
    pw_verdict v;
    unsigned char sha[32];
    (void)state;
    assert_int_equal(prover_open(&pr, WITNESS_SUBDIVISION), 0);
    memset(sha, 0, sizeof sha);
    assert_int_equal(run(&pr, k4, sha, &v), PROVE_REFUSED);
    assert_int_equal(v.code, PW_R_GRAPH_HASH);
    assert_int_equal(cli_sha256(k4, strlen(k4), sha), 0);
    assert_int_equal(run(&pr, k4, sha, &v), PROVE_ACCEPTED);
    assert_non_null(strstr(pr.cert, "graph-sha256 "));
    prover_close(&pr);
}

/* One prover, several graphs: each certificate stands alone in the reused buffer. */
static void buffer_reused_across_graphs(void **state)
{
    prover pr;
    pw_verdict v;
    (void)state;
    assert_int_equal(prover_open(&pr, WITNESS_SUBDIVISION), 0);
    assert_int_equal(run(&pr, k5, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(pr.kind, PW_WITNESS_SUBDIVISION_K5);
    size_t long_len = pr.cert_len;
    assert_int_equal(run(&pr, triangle_and_edge, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(v.claim, PW_CLAIM_PLANAR);
    assert_int_equal(v.components, 2);
    assert_true(pr.cert_len < long_len);
    assert_int_equal(run(&pr, k33_split, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(pr.kind, PW_WITNESS_SUBDIVISION_K33);
    prover_close(&pr);
}

static void cheapest_prefers_counts(void **state)
{
    prover pr;
    pw_verdict v;
    (void)state;
    assert_int_equal(prover_open(&pr, WITNESS_CHEAPEST), 0);
    assert_int_equal(run(&pr, k6, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(v.witness, PW_WITNESS_EDGE_BOUND);
    assert_int_equal(run(&pr, k34, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(v.witness, PW_WITNESS_BIPARTITE_BOUND);
    assert_int_equal(run(&pr, k33_split, NULL, &v), PROVE_ACCEPTED); /* 10 = 2N - 4: no bound */
    assert_int_equal(v.witness, PW_WITNESS_SUBDIVISION_K33);
    assert_int_equal(run(&pr, k5, NULL, &v), PROVE_ACCEPTED); /* 10 > 3N - 6 = 9 */
    assert_int_equal(v.witness, PW_WITNESS_EDGE_BOUND);
    assert_int_equal(run(&pr, k4, NULL, &v), PROVE_ACCEPTED);
    assert_int_equal(v.witness, PW_WITNESS_ROTATION);
    prover_close(&pr);
}

static void two_colouring(void **state)
{
    parsed p;
    unsigned char side[8];
    uint32_t queue[8];
    (void)state;
    parse(&p, "graph 8 3\n0 1\n1 2\n5 6\n"); /* vertices 3, 4 and 7 are isolated */
    assert_int_equal(two_colour(&p.g, side, queue), 1);
    assert_true(side[0] != side[1] && side[1] != side[2] && side[5] != side[6]);
    assert_true(side[7] == 0);
    pw_graph_free(&p.g);
    parse(&p, "graph 6 6\n0 1\n1 2\n2 0\n3 4\n4 5\n5 3\n");
    assert_int_equal(two_colour(&p.g, side, queue), 0);
    pw_graph_free(&p.g);
}

static void write_file(const char *path, const char *text)
{
    FILE *f = fopen(path, "wb");
    assert_non_null(f);
    assert_int_equal(fwrite(text, 1, strlen(text), f), strlen(text));
    assert_int_equal(fclose(f), 0);
}

/* Reads path into *in, parses it into *g and takes its digest, as certify does. */
static void load(const char *path, cli_input *in, pw_graph *g, unsigned char *sha)
{
    pw_limits lim;
    pw_verdict v;
    pw_limits_default(&lim);
    assert_int_equal(cli_read_input(in, path, &lim), PW_OK);
    assert_int_equal(pw_graph_parse(in->bytes, in->len, &lim, g, &v), PW_OK);
    assert_int_equal(cli_sha256(in->bytes, in->len, sha), 0);
}

/* The same K4 as k4 with its edges in another order: other bytes, same graph. */
static const char k4_reordered[] = "graph 4 6\n2 3\n0 1\n0 2\n0 3\n1 2\n1 3\n";

/*
 * A graph file is let go while the witness is made and read again for the
 * check: unchanged, the check passes on the bytes read again; changed in
 * between, or no longer readable within the limits, that is what is
 * reported, never a refusal (which would be a bug) or an acceptance.
 */
static void file_read_again_for_check(void **state)
{
    char path[] = "/tmp/planewit-test-prover-XXXXXX";
    int fd = mkstemp(path);
    prover pr;
    pw_verdict v;
    pw_limits lim;
    cli_input in;
    pw_graph g;
    unsigned char sha[32];
    (void)state;
    assert_true(fd >= 0);
    close(fd);
    pw_limits_default(&lim);
    assert_int_equal(prover_open(&pr, WITNESS_SUBDIVISION), 0);

    write_file(path, k4);
    load(path, &in, &g, sha);
    assert_int_equal(prover_run_file(&pr, &in, &lim, &g, sha, &v), PROVE_ACCEPTED);
    assert_int_equal(in.len, strlen(k4));
    assert_memory_equal(in.bytes, k4, strlen(k4));
    assert_memory_equal(v.graph_sha256, sha, 32);
    cli_free_input(&in);

    write_file(path, k4_reordered); /* after this reading, before the check */
    assert_int_equal(prover_run_file(&pr, &in, &lim, &g, sha, &v), PROVE_GRAPH_CHANGED);
    cli_free_input(&in);
    pw_graph_free(&g);

    load(path, &in, &g, sha);
    lim.max_bytes = 10; /* the file, read again, is over the limit */
    assert_int_equal(prover_run_file(&pr, &in, &lim, &g, sha, &v), PROVE_REREAD_FAILED);
    assert_null(in.bytes);
    pw_graph_free(&g);
    unlink(path);
    prover_close(&pr);
}

/* Standard input cannot be read twice: its bytes are kept for the check. */
static void standard_input_is_kept(void **state)
{
    prover pr;
    pw_verdict v;
    pw_limits lim;
    parsed p;
    unsigned char sha[32];
    (void)state;
    pw_limits_default(&lim);
    parse(&p, k5);
    char *bytes = malloc(sizeof k5);
    assert_non_null(bytes);
    memcpy(bytes, k5, sizeof k5);
    cli_input in = {"-", bytes, strlen(k5)};
    assert_int_equal(cli_sha256(k5, strlen(k5), sha), 0);
    assert_int_equal(prover_open(&pr, WITNESS_SUBDIVISION), 0);
    assert_int_equal(prover_run_file(&pr, &in, &lim, &p.g, sha, &v), PROVE_ACCEPTED);
    assert_ptr_equal(in.bytes, bytes);
    assert_int_equal(v.witness, PW_WITNESS_SUBDIVISION_K5);
    cli_free_input(&in);
    pw_graph_free(&p.g);
    prover_close(&pr);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(refusal_is_reported),
        cmocka_unit_test(buffer_reused_across_graphs),
        cmocka_unit_test(cheapest_prefers_counts),
        cmocka_unit_test(two_colouring),
        cmocka_unit_test(file_read_again_for_check),
        cmocka_unit_test(standard_input_is_kept),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
