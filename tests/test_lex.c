/*
 * test_lex.c - the lexical rules of format-spec/lexical.md, one rule per test,
 * each seen through the public graph parser so the tests pin behaviour, not
 * internals.
 */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <string.h>

#include "internal.h"

static pw_code parse_text(const char *text, size_t len, pw_verdict *v)
{
    pw_graph g;
    pw_limits lim;
    pw_limits_default(&lim);
    pw_verdict_init(v);
    pw_code code = pw_graph_parse(text, len, &lim, &g, v);
    pw_graph_free(&g);
    return code;
}

#define PARSE(text, v) parse_text(text, sizeof(text) - 1, v)

static void accepts_lf_crlf_and_mixed_line_ends(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("graph 2 1\n0 1\n", &v), PW_OK);
    assert_int_equal(PARSE("graph 2 1\r\n0 1\r\n", &v), PW_OK);
    assert_int_equal(PARSE("graph 3 2\r\n0 1\n1 2\r\n", &v), PW_OK);
}

static void accepts_missing_final_line_end(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("graph 2 1\n0 1", &v), PW_OK);
    assert_int_equal(PARSE("graph 2 1\n0 1\r\n", &v), PW_OK);
    /* Lines are scanned eight bytes at a time: a last line of exactly 8 and 16 bytes. */
    assert_int_equal(PARSE("graph 2 1\n0 1     ", &v), PW_OK);
    assert_int_equal(PARSE("graph 2 1\n0       1       ", &v), PW_OK);
}

static void ignores_comments_blank_lines_and_tabs(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("# a comment\n\n  \t\ngraph\t2 1 # trailing\n\t0   1\t\n#end", &v), PW_OK);
}

static void refuses_each_forbidden_byte(void **state)
{
    static const char *const bad[] = {
        "graph 2 1\n0\0 1\n", "graph 2 1\n0 1\x0b\n", "graph 2 1\n0 1\x0c\n",
        "graph 2 1\n0\r1\n",  "\xef\xbb\xbfgraph 2 1\n0 1\n", "graph 2 1\n0 1 # caf\xc3\xa9\n",
        "graph 2 1\n0 1\x7f\n", "graph 2 1\n0 1\r"};
    static const size_t lens[] = {15, 15, 15, 14, 17, 21, 15, 14};
    static const uint64_t lines[] = {2, 2, 2, 2, 1, 2, 2, 2};
    (void)state;
    for (size_t i = 0; i < sizeof lens / sizeof lens[0]; i++) {
        pw_verdict v;
        assert_int_equal(parse_text(bad[i], lens[i], &v), PW_E_BYTE);
        assert_int_equal(v.status, PW_UNUSABLE);
        assert_int_equal(v.file, PW_FILE_GRAPH);
        assert_int_equal(v.line, lines[i]);
    }
}

static void names_the_byte_and_column(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("graph 2 1\n0 \x01 1\n", &v), PW_E_BYTE);
    assert_string_equal(v.detail, "byte 0x01 at column 3 is not allowed (ASCII text only)");
    /* The same past two whole eight-byte blocks, at each place of the third. */
    for (size_t at = 17; at <= 24; at++) {
        char text[40] = "graph 2 1\n0                        1\n";
        text[10 + at - 1] = '\x7f';
        assert_int_equal(parse_text(text, strlen(text), &v), PW_E_BYTE);
        char want[64];
        snprintf(want, sizeof want, "byte 0x7f at column %zu is not allowed (ASCII text only)", at);
        assert_string_equal(v.detail, want);
    }
}

static void refuses_non_canonical_numbers(void **state)
{
    static const char *const bad[] = {"graph 2 1\n00 1\n", "graph 2 1\n+0 1\n",
                                      "graph 2 1\n-0 1\n", "graph 2 1\n0 1x\n",
                                      "graph 02 1\n0 1\n", "graph 2 1\n0 0x1\n"};
    (void)state;
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; i++) {
        pw_verdict v;
        assert_int_equal(parse_text(bad[i], strlen(bad[i]), &v), PW_E_NUMBER);
    }
}

static void refuses_numbers_beyond_64_bits(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("graph 18446744073709551616 0\n", &v), PW_E_RANGE);
    assert_int_equal(PARSE("graph 18446744073709551615 0\n", &v), PW_E_LIMIT);
}

static void colon_is_a_token_of_its_own(void **state)
{
    pw_graph g;
    pw_limits lim;
    pw_verdict v;
    static const char graph[] = "graph 2 1\n0 1\n";
    static const char glued[] = "certificate 1\nclaim planar\naround 0: 1\naround 1 : 0\n";
    static const char spaced[] = "certificate 1\nclaim planar\naround 0 : 1\naround 1 : 0\n";
    (void)state;
    pw_limits_default(&lim);
    assert_int_equal(pw_graph_parse(graph, sizeof graph - 1, &lim, &g, &v), PW_OK);
    assert_int_equal(pw_check_parsed(&g, graph, sizeof graph - 1, glued, sizeof glued - 1, &v),
                     PW_UNUSABLE);
    assert_int_equal(v.code, PW_E_NUMBER);
    assert_int_equal(v.line, 3);
    assert_int_equal(pw_check_parsed(&g, graph, sizeof graph - 1, spaced, sizeof spaced - 1, &v),
                     PW_ACCEPTED);
    pw_graph_free(&g);
}

static void clips_long_tokens_in_messages(void **state)
{
    pw_verdict v;
    (void)state;
    assert_int_equal(PARSE("graphgraphgraphgraphgraphgraphgraphgraph 1 0\n", &v), PW_E_SYNTAX);
    assert_string_equal(v.detail, "expected 'graph', found 'graphgraphgraphgraphgraphgraphgr'...");
}

static void signed_numbers_only_where_allowed(void **state)
{
    pw_lexer lx;
    pw_verdict v;
    int64_t x = 0;
    static const char text[] = "-5 7 -0 9223372036854775808 -";
    (void)state;
    pw_verdict_init(&v);
    lex_init(&lx, text, sizeof text - 1, PW_FILE_CERT, &v);
    assert_int_equal(lex_next_line(&lx), 1);
    assert_int_equal(lex_int(&lx, "x", &x), 0);
    assert_int_equal(x, -5);
    assert_int_equal(lex_int(&lx, "x", &x), 0);
    assert_int_equal(x, 7);
    assert_int_equal(lex_int(&lx, "x", &x), -1);
    assert_int_equal(v.code, PW_E_NUMBER);
    assert_int_equal(lex_int(&lx, "x", &x), -1);
    assert_int_equal(v.code, PW_E_RANGE);
    assert_int_equal(lex_int(&lx, "x", &x), -1);
    assert_int_equal(v.code, PW_E_NUMBER);
    assert_int_equal(lex_int(&lx, "x", &x), -1);
    assert_int_equal(v.code, PW_E_SYNTAX);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(accepts_lf_crlf_and_mixed_line_ends),
        cmocka_unit_test(accepts_missing_final_line_end),
        cmocka_unit_test(ignores_comments_blank_lines_and_tabs),
        cmocka_unit_test(refuses_each_forbidden_byte),
        cmocka_unit_test(names_the_byte_and_column),
        cmocka_unit_test(refuses_non_canonical_numbers),
        cmocka_unit_test(refuses_numbers_beyond_64_bits),
        cmocka_unit_test(colon_is_a_token_of_its_own),
        cmocka_unit_test(clips_long_tokens_in_messages),
        cmocka_unit_test(signed_numbers_only_where_allowed),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
