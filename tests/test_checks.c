/*
 * test_checks.c - each check of the kernel on small hand-made cases, with the
 * exact rule, line and message the verdict must carry.  The vector suite
 * (test_vectors.c) covers every reason code from committed files; these tests
 * pin the finer behaviour: check order, messages, counts, memory bounds.
 */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "internal.h"

#ifndef SPEC_DIR
#define SPEC_DIR "format-spec/"
#endif

static pw_status check(const char *graph, const char *cert, pw_verdict *v)
{
    pw_limits lim;
    pw_limits_default(&lim);
    return pw_check(graph, strlen(graph), cert, strlen(cert), &lim, v);
}

static const char k4[] = "graph 4 6\n0 1\n0 2\n0 3\n1 2\n1 3\n2 3\n";

static void graph_adjacency_is_grouped_by_vertex(void **state)
{
    pw_graph g;
    pw_verdict v;
    pw_limits lim;
    static const char text[] = "graph 9 3\n4 1\n1 2\n2 4\n";
    (void)state;
    pw_limits_default(&lim);
    assert_int_equal(pw_graph_parse(text, sizeof text - 1, &lim, &g, &v), PW_OK);
    assert_int_equal(g.n, 9);
    assert_int_equal(g.n_adj, 5); /* ids 5..8 are isolated and take no memory */
    assert_int_equal(pw_degree(&g, 0), 0);
    assert_int_equal(pw_degree(&g, 4), 2);
    assert_int_equal(pw_degree(&g, 8), 0);
    assert_true(pw_adjacent(&g, 4, 2));
    assert_true(pw_adjacent(&g, 2, 4));
    assert_false(pw_adjacent(&g, 0, 1));
    assert_false(pw_adjacent(&g, 7, 1));
    for (uint32_t i = g.first[1]; i < g.first[2]; i++)
        assert_int_equal(g.ends[g.darts[i]], 1);
    pw_graph_free(&g);
}

static void huge_vertex_count_allocates_nothing_big(void **state)
{
    pw_graph g;
    pw_verdict v;
    pw_limits lim;
    static const char text[] = "graph 2000000000 0\n";
    (void)state;
    pw_limits_default(&lim);
    assert_int_equal(pw_graph_parse(text, sizeof text - 1, &lim, &g, &v), PW_E_LIMIT);
    assert_string_equal(v.detail,
                        "N = 2000000000 exceeds the limit 100000000 (raise it with --max-vertices)");
    pw_graph_free(&g);
    lim.max_vertices = 2147483647u;
    assert_int_equal(pw_graph_parse(text, sizeof text - 1, &lim, &g, &v), PW_OK);
    assert_int_equal(g.n_adj, 0);
    /* The planar check refuses before sizing anything by N: 0 lines were read. */
    assert_int_equal(pw_check_parsed(&g, text, sizeof text - 1, "certificate 1\nclaim planar\n", 27, &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_AROUND_COUNT);
    pw_graph_free(&g);
}

static void header_count_larger_than_the_file_is_an_edge_count_error(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check("graph 3 200000000\n0 1\n", "", &v), PW_UNUSABLE);
    assert_int_equal(v.code, PW_E_EDGE_COUNT);
    assert_string_equal(v.detail, "the file ends after 1 edge line, the header's M is 200000000");
}

static void repeated_edge_names_both_lines(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check("graph 4 4\n0 1\n2 3\n# c\n3 2\n1 0\n", "", &v), PW_UNUSABLE);
    assert_int_equal(v.code, PW_E_REPEATED_EDGE);
    assert_int_equal(v.line, 5);
    assert_string_equal(v.detail, "edge 3 2 repeats the edge on line 3");
}

static void planar_counts_faces_per_component(void **state)
{
    pw_verdict v;
    (void)state;
    /* A triangle, an edge and two isolated vertices (5 and 6; 6 is above every edge id). */
    assert_int_equal(check("graph 7 4\n0 1\n1 2\n2 0\n3 4\n",
                           "certificate 1\nclaim planar\naround 6 :\naround 0 : 1 2\n"
                           "around 1 : 0 2\naround 2 : 0 1\naround 3 : 4\naround 4 : 3\naround 5 :\n",
                           &v),
                     PW_ACCEPTED);
    /* Euler's formula per component: triangle 3-3+2, edge 2-1+1, isolated 1-0+1. */
    assert_int_equal(v.faces, 2 + 1 + 1 + 1);
    assert_int_equal(v.components, 4);
}

static void mirror_image_is_accepted_without_points(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check(k4, "certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 3 2\n"
                               "around 2 : 0 1 3\naround 3 : 0 2 1\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(v.faces, 4); /* Euler's polyhedron formula: tetrahedron */
    assert_int_equal(check(k4, "certificate 1\nclaim planar\naround 0 : 3 2 1\naround 1 : 2 3 0\n"
                               "around 2 : 3 1 0\naround 3 : 1 2 0\n", &v),
                     PW_ACCEPTED);
}

static void rotation_failures_name_vertex_and_line(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check(k4, "certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 2 3\n"
                               "around 2 : 0 1 3\naround 3 : 0 2 1\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_EULER);
    assert_string_equal(v.detail, "the component of vertex 0 has V - E + F = 4 - 6 + 2 = 0, not 2");
    assert_int_equal(check(k4, "certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 3 2\n"
                               "around 2 : 0 1 1\naround 3 : 0 2 1\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_LISTED_TWICE);
    assert_int_equal(v.line, 5);
    assert_int_equal(check(k4, "certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 0 3\n"
                               "around 2 : 0 1 3\naround 3 : 0 2 1\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_NEIGHBOUR_MISSING);
    assert_string_equal(v.detail, "vertex 1 does not list its neighbour 2");
}

static void hash_binding_comes_before_everything_else(void **state)
{
    pw_verdict v;
    char cert[256];
    (void)state;
    snprintf(cert, sizeof cert, "certificate 1\ngraph-sha256 %064d\nclaim planar\naround 9 :\n", 0);
    assert_int_equal(check(k4, cert, &v), PW_REJECTED);
    assert_int_equal(v.code, PW_R_GRAPH_HASH);
    assert_int_equal(v.line, 2);
}

static void vertex_range_is_reported_at_the_first_bad_id(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check(k4, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 1\nset 1 : 4\n"
                               "set 2 : 99999999999999999999\n", &v),
                     PW_UNUSABLE);
    assert_int_equal(v.code, PW_E_RANGE);
    assert_int_equal(check(k4, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 1\nset 1 : 4\n"
                               "set 2 : 7\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_VERTEX_RANGE);
    assert_int_equal(v.line, 5);
}

static const char k33[] = "graph 6 9\n0 3\n0 4\n0 5\n1 3\n1 4\n1 5\n2 3\n2 4\n2 5\n";

static void k33_subdivision_sides_matter(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(check(k33, "certificate 1\nclaim nonplanar\nsubdivision k33 0 1 2 / 3 4 5\n"
                                "path 0 3\npath 0 4\npath 0 5\npath 3 1\npath 1 4\npath 1 5\n"
                                "path 2 3\npath 2 4\npath 5 2\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(v.witness, PW_WITNESS_SUBDIVISION_K33);
    assert_int_equal(check(k33, "certificate 1\nclaim nonplanar\nsubdivision k33 0 3 2 / 1 4 5\n"
                                "path 0 3\npath 0 4\npath 0 5\npath 3 1\npath 1 4\npath 1 5\n"
                                "path 2 3\npath 2 4\npath 5 2\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_PATH_ENDS);
    assert_int_equal(v.line, 4);
}

static void subdivision_paths_must_be_internally_disjoint(void **state)
{
    pw_verdict v;
    /* K3,3 with the edge 0-3 subdivided by vertex 6 and 1-4 by vertex 7. */
    static const char g[] = "graph 8 11\n0 6\n6 3\n0 4\n0 5\n1 3\n1 7\n7 4\n1 5\n2 3\n2 4\n2 5\n";
    (void)state;
    assert_int_equal(check(g, "certificate 1\nclaim nonplanar\nsubdivision k33 0 1 2 / 3 4 5\n"
                              "path 0 6 3\npath 0 4\npath 0 5\npath 1 3\npath 1 7 4\npath 1 5\n"
                              "path 2 3\npath 2 4\npath 2 5\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(check(g, "certificate 1\nclaim nonplanar\nsubdivision k33 0 1 2 / 3 4 5\n"
                              "path 0 6 3\npath 0 6 3\npath 0 5\npath 1 3\npath 1 7 4\npath 1 5\n"
                              "path 2 3\npath 2 4\npath 2 5\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_PATH_PAIR_TWICE);
    assert_int_equal(check(g, "certificate 1\nclaim nonplanar\nsubdivision k33 0 1 2 / 3 4 5\n"
                              "path 0 6 3\npath 0 6 4\npath 0 5\npath 1 3\npath 1 7 4\npath 1 5\n"
                              "path 2 3\npath 2 4\npath 2 5\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_PATH_VERTEX_REUSED);
    assert_int_equal(v.line, 5);
}

static void minor_sets_are_checked_in_order(void **state)
{
    pw_verdict v;
    /* The Petersen graph: outer 0-4, spokes i-(i+5), inner pentagram (textbook). */
    static const char petersen[] = "graph 10 15\n0 1\n1 2\n2 3\n3 4\n4 0\n0 5\n1 6\n2 7\n3 8\n"
                                   "4 9\n5 7\n7 9\n9 6\n6 8\n8 5\n";
    (void)state;
    /* Contracting each spoke gives K5 (textbook fact: Petersen has a K5 minor). */
    assert_int_equal(check(petersen, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 0 5\n"
                                     "set 1 : 1 6\nset 2 : 2 7\nset 3 : 3 8\nset 4 : 4 9\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(check(petersen, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 0 7\n"
                                     "set 1 : 1 6\nset 2 : 2 5\nset 3 : 3 8\nset 4 : 4 9\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_SET_DISCONNECTED);
    assert_int_equal(v.line, 4);
    assert_int_equal(check(petersen, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 0 5\n"
                                     "set 1 : 1 6\nset 2 : 2 7\nset 3 : 3 8\nset 3 : 4 9\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_SET_INDEX);
}

static void bounds_use_exact_thresholds(void **state)
{
    pw_verdict v;
    static const char k5[] = "graph 5 10\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n";
    static const char k5_minus[] = "graph 5 9\n0 1\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n";
    (void)state;
    /* 3N - 6 = 9 for N = 5 (common practice). */
    assert_int_equal(check(k5, "certificate 1\nclaim nonplanar\nedge-bound\n", &v), PW_ACCEPTED);
    assert_int_equal(check(k5_minus, "certificate 1\nclaim nonplanar\nedge-bound\n", &v), PW_REJECTED);
    assert_int_equal(v.code, PW_R_EDGE_BOUND);
    /* K3,3 has 9 edges and 2N - 4 = 8 (common practice). */
    assert_int_equal(check(k33, "certificate 1\nclaim nonplanar\nbipartite-edge-bound\n"
                                "side : 0 0 0 1 1 1\n", &v),
                     PW_ACCEPTED);
    assert_int_equal(check(k33, "certificate 1\nclaim nonplanar\nbipartite-edge-bound\n"
                                "side : 0 0 1 1 1 1\n", &v),
                     PW_REJECTED);
    assert_int_equal(v.code, PW_R_SIDE_EDGE);
    assert_string_equal(v.detail, "edge 2 3 (graph line 8) has both ends on side 1");
}

static void long_path_needs_no_deep_stack(void **state)
{
    enum { N = 1000000 };
    size_t cap = (size_t)N * 40, glen = 0, clen = 0;
    char *graph = malloc(cap), *cert = malloc(cap);
    pw_verdict v;
    (void)state;
    assert_non_null(graph);
    assert_non_null(cert);
    glen += (size_t)snprintf(graph, cap, "graph %d %d\n", N, N - 1);
    clen += (size_t)snprintf(cert, cap, "certificate 1\nclaim planar\n");
    for (int i = 0; i < N; i++) {
        if (i + 1 < N)
            glen += (size_t)snprintf(graph + glen, cap - glen, "%d %d\n", i, i + 1);
        if (i == 0)
            clen += (size_t)snprintf(cert + clen, cap - clen, "around 0 : 1\n");
        else if (i + 1 == N)
            clen += (size_t)snprintf(cert + clen, cap - clen, "around %d : %d\n", i, i - 1);
        else
            clen += (size_t)snprintf(cert + clen, cap - clen, "around %d : %d %d\n", i, i + 1, i - 1);
    }
    pw_limits lim;
    pw_limits_default(&lim);
    assert_int_equal(pw_check(graph, glen, cert, clen, &lim, &v), PW_ACCEPTED);
    assert_int_equal(v.faces, 1); /* a tree has one face (Euler: V - E + F = 2) */
    free(graph);
    free(cert);
}

/* Every code in the spec's table (format-spec/reasons.md) has exactly that name
   and sentence here; codes outside the table have none. */
static void reason_names_and_sentences_follow_the_spec(void **state)
{
    char line[1024], name[64], sentence[256];
    unsigned code, rows = 0;
    (void)state;
    FILE *f = fopen(SPEC_DIR "reasons.md", "r");
    assert_non_null(f);
    while (fgets(line, sizeof line, f) != NULL) {
        if (sscanf(line, "| %u | `%63[^`]` | %255[^|]|", &code, name, sentence) != 3)
            continue;
        size_t len = strlen(sentence);
        while (len > 0 && sentence[len - 1] == ' ')
            sentence[--len] = '\0';
        assert_string_equal(pw_code_name((pw_code)code), name);
        assert_string_equal(pw_code_sentence((pw_code)code), sentence);
        rows++;
    }
    fclose(f);
    assert_int_equal(rows, 12 + 32); /* codes 0..11 and 30..61 */
    assert_string_equal(pw_code_name((pw_code)12), "unknown");
    assert_string_equal(pw_code_sentence((pw_code)29), "unknown reason code");
    assert_string_equal(pw_claim_name((pw_claim)3), "none");
    assert_string_equal(pw_witness_name((pw_witness)8), "none");
}

/* A stream that fails while being read (a directory: EISDIR) is a read
   failure, not an empty file. */
static void read_error_is_not_an_empty_file(void **state)
{
    char *buf;
    size_t len;
    (void)state;
    FILE *dir = fopen(".", "r");
    assert_non_null(dir);
    assert_int_equal(pw_read_all(dir, 1000, &buf, &len), PW_E_READ);
    assert_null(buf);
    assert_int_equal(len, 0);
    fclose(dir);
}

/* A file of exactly max_bytes bytes is read; one byte more is a limit (format-spec/limits.md). */
static void byte_limit_is_inclusive(void **state)
{
    static const char text[] = "graph 1 0"; /* 9 bytes */
    char *buf;
    size_t len;
    (void)state;
    for (uint64_t max = 8; max <= 9; max++) {
        FILE *f = tmpfile();
        assert_non_null(f);
        fputs(text, f);
        rewind(f);
        assert_int_equal(pw_read_all(f, max, &buf, &len), max == 9 ? PW_OK : PW_E_LIMIT);
        assert_int_equal(len, max == 9 ? 9 : 0);
        free(buf);
        fclose(f);
    }
}

/*
 * Malformed or borderline certificate lines: the rule, the line and the exact
 * detail, written from format-spec/certificate.md and format-spec/lexical.md
 * ("expected X, found 'T'" / "found end of line" / "found end of file").
 */
typedef struct {
    const char *graph, *cert;
    pw_code code;
    uint64_t line;
    const char *detail;
} line_case;

#define TRI "graph 3 3\n0 1\n1 2\n2 0\n"
#define HEAD "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\naround 2 : 0 1\n"
#define HEX62 "00000000000000000000000000000000000000000000000000000000000000"
#define HEX63 HEX62 "0"

static const line_case line_cases[] = {
    /* the first of two out-of-range coordinates is the one reported */
    {TRI, HEAD "point 0 : 2000000000 0\npoint 1 : 0 -2000000001\npoint 2 : 1 1\n",
     PW_R_COORDINATE_RANGE, 6, "coordinate 2000000000 exceeds 2^30 in absolute value"},
    {TRI, HEAD "point x : 1 1\n", PW_E_NUMBER, 6,
     "expected a vertex id (decimal digits, no sign, no leading zero), found 'x'"},
    {TRI, HEAD "point 0 1 1\n", PW_E_SYNTAX, 6, "expected ':', found '1'"},
    {TRI, HEAD "point 0\n", PW_E_SYNTAX, 6, "expected ':', found end of line"},
    {TRI, HEAD "point 0 : 1\n", PW_E_SYNTAX, 6, "expected a coordinate, found end of line"},
    {TRI, HEAD "point 0 : 1 2 3\n", PW_E_SYNTAX, 6, "expected end of line, found '3'"},
    {TRI, HEAD "point 0 : 5 5\n", PW_R_POINT_COUNT, 6, "1 point line for 3 vertices: give all or none"},
    {TRI, "certificate 1 1\n", PW_E_SYNTAX, 1, "expected end of line, found '1'"},
    {TRI, "certificate 1\nclaim\n", PW_E_SYNTAX, 2, "expected 'planar' or 'nonplanar', found end of line"},
    {TRI, "certificate 1\ngraph-sha256 " HEX63 "0\n", PW_E_SYNTAX, 3,
     "expected 'claim', found end of file"},
    {TRI, "certificate 1\ngraph-sha256 +" HEX63 "\nclaim planar\n", PW_E_SYNTAX, 2,
     "expected 64 lowercase hex digits, found '+0000000000000000000000000000000'..."},
    {TRI, "certificate 1\ngraph-sha256 0A" HEX62 "\nclaim planar\n", PW_E_SYNTAX, 2,
     "expected 64 lowercase hex digits, found '0A000000000000000000000000000000'..."},
    {TRI, "certificate 1\nclaim nonplanar\nminor k5\nset x : 0\n", PW_E_NUMBER, 4,
     "expected a set index (decimal digits, no sign, no leading zero), found 'x'"},
    {TRI, "certificate 1\nclaim nonplanar\nminor k5\nset 0 0\n", PW_E_SYNTAX, 4, "expected ':', found '0'"},
    {TRI, "certificate 1\nclaim nonplanar\nminor k33\nset 0 : 0\n", PW_R_WITNESS_LINES, 3,
     "a K3,3 minor needs 6 set lines, found 1"},
    /* two vertices at one point: both named, in sort order (vertex id breaks the tie), at
       the point line of the second (format-spec/reasons.md) */
    {TRI, HEAD "point 2 : 4 4\npoint 0 : 0 0\npoint 1 : 4 4\n", PW_R_POINTS_COINCIDE, 6,
     "vertices 1 and 2 are both at (4, 4)"},
    /* a set index beyond 32 bits is kept as "no index" and refused by the check */
    {TRI, "certificate 1\nclaim nonplanar\nminor k5\nset 0 : 0\nset 1 : 1\nset 2 : 2\nset 3 : 0\n"
          "set 4294967296 : 1\n", PW_R_SET_INDEX, 8, "set indices must be 0 to 4, each once"},
    /* a path step that is not an edge names both of its vertices, in path order */
    {"graph 5 9\n0 2\n0 3\n0 4\n1 2\n1 3\n1 4\n2 3\n2 4\n3 4\n",
     "certificate 1\nclaim nonplanar\nsubdivision k5 0 1 2 3 4\npath 0 2\npath 1 0\npath 0 3\n"
     "path 0 4\npath 1 2\npath 1 3\npath 1 4\npath 2 3\npath 2 4\npath 3 4\n",
     PW_R_PATH_NOT_EDGE, 5, "vertices 1 and 0 are consecutive on the path but not adjacent"},
    /* the earlier copy of a repeated pair is found wherever it is */
    {"graph 4 4\n0 2\n0 1\n2 3\n0 1\n", "certificate 1\nclaim planar\n", PW_E_REPEATED_EDGE, 5,
     "edge 0 1 repeats the edge on line 3"},
    /* an earlier edge that starts at the pair's second vertex is not mistaken for it */
    {"graph 3 3\n1 2\n0 1\n0 1\n", "certificate 1\nclaim planar\n", PW_E_REPEATED_EDGE, 4,
     "edge 0 1 repeats the edge on line 3"},
    /* a token of exactly 32 bytes is shown whole, without "..." (format-spec/lexical.md) */
    {TRI, "certificate 1\nclaim abcdefghijklmnopqrstuvwxyz012345\n", PW_E_SYNTAX, 2,
     "expected 'planar' or 'nonplanar', found 'abcdefghijklmnopqrstuvwxyz012345'"},
    /* 2^64 where a vertex id is expected */
    {TRI, "certificate 1\nclaim planar\naround 18446744073709551616 : 1\n", PW_E_RANGE, 3,
     "expected a vertex id that fits in 64 bits, found '18446744073709551616'"},
    /* one around line is counted in the singular */
    {TRI, "certificate 1\nclaim planar\naround 0 : 1 2\n", PW_R_AROUND_COUNT, 0,
     "1 around line for 3 vertices"},
    /* the missing neighbour of vertex 0 is found after its listed ones */
    {"graph 4 6\n0 1\n0 2\n0 3\n1 2\n1 3\n2 3\n",
     "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 0 2 3\naround 2 : 0 1 3\naround 3 : 0 1 2\n",
     PW_R_NEIGHBOUR_MISSING, 3, "vertex 0 does not list its neighbour 3"},
    /* an around list naming vertex n_adj (the first id no edge uses) */
    {"graph 6 3\n0 1\n1 2\n2 0\n",
     "certificate 1\nclaim planar\naround 0 : 1 2 3\naround 1 : 2 0\naround 2 : 0 1\naround 3 :\n"
     "around 4 :\naround 5 :\n", PW_R_NOT_NEIGHBOUR, 3, "vertex 0 lists 3, which is not its neighbour"},
    /* the first id beyond N is named, whichever line holds it (check.c's vertex-range text) */
    {TRI, "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 9 0\naround 2 : 0 1\n",
     PW_R_VERTEX_RANGE, 4, "vertex 9 is not in the graph (N = 3)"},
    /* a line after a head that takes none names the token it found (format-spec/lexical.md) */
    {TRI, "certificate 1\nclaim nonplanar\nedge-bound\nside : 0 1\n", PW_E_SYNTAX, 4,
     "expected end of file, found 'side'"},
    /* a repeat written the other way round still names the earlier line */
    {"graph 3 3\n0 1\n0 2\n1 0\n", "certificate 1\nclaim planar\n", PW_E_REPEATED_EDGE, 4,
     "edge 1 0 repeats the edge on line 2"},
};

static void malformed_lines_give_rule_line_and_detail(void **state)
{
    (void)state;
    for (size_t i = 0; i < sizeof line_cases / sizeof line_cases[0]; i++) {
        const line_case *k = &line_cases[i];
        pw_verdict v;
        check(k->graph, k->cert, &v);
        assert_int_equal(v.code, k->code);
        assert_int_equal(v.line, k->line);
        assert_string_equal(v.detail, k->detail);
        /* counts come from the graph whatever the certificate; only repeated edges refuse a graph here */
        assert_int_equal(v.have_counts, k->code != PW_E_REPEATED_EDGE);
    }
}

/* The defaults format-spec/limits.md documents. */
static void limits_default_as_documented(void **state)
{
    pw_limits lim;
    (void)state;
    memset(&lim, 0xff, sizeof lim);
    pw_limits_default(&lim);
    assert_int_equal(lim.max_bytes, 4294967296u);
    assert_int_equal(lim.max_vertices, 100000000u);
    assert_int_equal(lim.max_edges, 300000000u);
}

/* The graph parser alone: its failures (rule, line, detail) and the counts it reports. */
static void graph_parser_reports_where_and_what(void **state)
{
    static const struct {
        const char *text;
        pw_code code;
        uint64_t line;
        const char *detail;
    } cases[] = {
        /* at end of file, one past the last line read (format-spec/lexical.md) */
        {"# nothing here\n", PW_E_SYNTAX, 2, "expected 'graph N M', found end of file"},
        {"graph 3 1\n0 3\n", PW_E_RANGE, 2, "vertex 3 is out of range: ids run from 0 to N - 1 = 2"},
        {"graph 3 1\n0 2\n", PW_OK, 0, ""},
    };
    (void)state;
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; i++) {
        pw_graph g;
        pw_verdict v;
        pw_limits lim;
        pw_limits_default(&lim);
        pw_verdict_init(&v);
        assert_int_equal(pw_graph_parse(cases[i].text, strlen(cases[i].text), &lim, &g, &v),
                         cases[i].code);
        assert_int_equal(v.line, cases[i].line);
        assert_string_equal(v.detail, cases[i].detail);
        if (cases[i].code == PW_OK) {
            assert_int_equal(v.vertices, 3);
            assert_int_equal(v.edges, 1);
        }
        pw_graph_free(&g);
    }
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(graph_adjacency_is_grouped_by_vertex),
        cmocka_unit_test(huge_vertex_count_allocates_nothing_big),
        cmocka_unit_test(header_count_larger_than_the_file_is_an_edge_count_error),
        cmocka_unit_test(repeated_edge_names_both_lines),
        cmocka_unit_test(planar_counts_faces_per_component),
        cmocka_unit_test(mirror_image_is_accepted_without_points),
        cmocka_unit_test(rotation_failures_name_vertex_and_line),
        cmocka_unit_test(hash_binding_comes_before_everything_else),
        cmocka_unit_test(vertex_range_is_reported_at_the_first_bad_id),
        cmocka_unit_test(k33_subdivision_sides_matter),
        cmocka_unit_test(subdivision_paths_must_be_internally_disjoint),
        cmocka_unit_test(minor_sets_are_checked_in_order),
        cmocka_unit_test(bounds_use_exact_thresholds),
        cmocka_unit_test(long_path_needs_no_deep_stack),
        cmocka_unit_test(reason_names_and_sentences_follow_the_spec),
        cmocka_unit_test(read_error_is_not_an_empty_file),
        cmocka_unit_test(malformed_lines_give_rule_line_and_detail),
        cmocka_unit_test(limits_default_as_documented),
        cmocka_unit_test(byte_limit_is_inclusive),
        cmocka_unit_test(graph_parser_reports_where_and_what),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
