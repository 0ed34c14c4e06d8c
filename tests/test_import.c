/*
 * test_import.c - the pieces `import` and `certify --graph6` are built from:
 * the graph6 decoder, the edge-list cleaning, the graph view handed to the
 * kernel, the name table and the line reader.  Expected values come from the
 * graph6 definition (nauty's formats.txt; common practice) worked by hand.
 */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "import.h"

static pw_limits limits(void)
{
    pw_limits lim;
    pw_limits_default(&lim);
    return lim;
}

static int decode(const char *record, edge_list *el, graph6_fault *f)
{
    pw_limits lim = limits();
    return graph6_decode(record, strlen(record), &lim, el, f);
}

/* K4 is 'C~': N = 'C' - 63 = 4, and '~' - 63 = 0b111111 sets all six pairs. */
static void graph6_k4_in_column_order(void **state)
{
    static const uint32_t want[] = {0, 1, 0, 2, 1, 2, 0, 3, 1, 3, 2, 3};
    edge_list el = {0};
    graph6_fault f;
    (void)state;
    assert_int_equal(decode("C~", &el, &f), 0);
    assert_int_equal(el.n, 4);
    assert_int_equal(el.m, 6);
    assert_memory_equal(el.ends, want, sizeof want);
    edge_list_free(&el);
}

/* N = 63 takes the 4-byte size form '~' '?' '?' '~' (63 = 0b000000 000000 111111). */
static void graph6_four_byte_size(void **state)
{
    char record[4 + 326 + 1];
    edge_list el = {0};
    graph6_fault f;
    (void)state;
    memcpy(record, "~??~", 4);
    memset(record + 4, '?', 326); /* 63 * 62 / 2 = 1953 pairs = 326 bytes */
    record[4] = '_';              /* 0b100000: the first pair, 0-1 */
    record[4 + 326] = '\0';
    assert_int_equal(decode(record, &el, &f), 0);
    assert_int_equal(el.n, 63);
    assert_int_equal(el.m, 1);
    assert_int_equal(el.ends[0], 0);
    assert_int_equal(el.ends[1], 1);
    record[4 + 325] = '\0';
    assert_int_equal(decode(record, &el, &f), -1);
    assert_non_null(strstr(f.what, "N = 63 needs 326 adjacency bytes, the record has 325"));
    edge_list_free(&el);
}

static void graph6_refusals(void **state)
{
    edge_list el = {0};
    graph6_fault f;
    (void)state;
    assert_int_equal(decode("", &el, &f), -1);
    assert_int_equal(decode("C}", &el, &f), 0); /* 0b111110: five pairs, no padding */
    assert_int_equal(decode("B~", &el, &f), -1); /* three padding bits set */
    assert_non_null(strstr(f.what, "padding"));
    assert_int_equal(f.offset, 1);
    assert_int_equal(decode("C\x7f", &el, &f), -1);
    assert_int_equal(f.offset, 1);
    assert_int_equal(decode(":Fa@x^", &el, &f), -1);
    assert_non_null(strstr(f.what, "sparse6"));
    assert_int_equal(decode("~~??@???", &el, &f), -1); /* N = 2^18 with no adjacency bytes */
    assert_non_null(strstr(f.what, "N = 262144"));
    edge_list_free(&el);
}

static void graph6_edge_limit(void **state)
{
    pw_limits lim = limits();
    edge_list el = {0};
    graph6_fault f;
    (void)state;
    lim.max_edges = 5;
    assert_int_equal(graph6_decode("C~", 2, &lim, &el, &f), -1);
    assert_non_null(strstr(f.what, "more than 5 edges"));
    lim.max_edges = 6;
    assert_int_equal(graph6_decode("C~", 2, &lim, &el, &f), 0);
    edge_list_free(&el);
}

static void header_is_recognised(void **state)
{
    (void)state;
    assert_int_equal(graph6_header_length(">>graph6<<C~", 12), 10);
    assert_int_equal(graph6_header_length(">>graph6<", 9), 0);
    assert_int_equal(graph6_header_length(">>sparse6<<", 11), 0);
}

static void repeats_and_loops_are_counted_and_dropped(void **state)
{
    static const uint32_t want[] = {2, 0, 0, 1, 1, 2};
    edge_list el = {0};
    (void)state;
    el.n = 3;
    assert_int_equal(edge_list_add(&el, 2, 0), 0);
    assert_int_equal(edge_list_add(&el, 1, 1), 0);
    assert_int_equal(edge_list_add(&el, 0, 1), 0);
    assert_int_equal(edge_list_add(&el, 0, 2), 0);
    assert_int_equal(edge_list_add(&el, 1, 0), 0);
    assert_int_equal(edge_list_add(&el, 1, 2), 0);
    assert_int_equal(edge_list_drop_repeats(&el), 0);
    assert_int_equal(el.self_loops, 1);
    assert_int_equal(el.repeats, 2);
    assert_int_equal(el.m, 3);
    assert_memory_equal(el.ends, want, sizeof want); /* first copies, input order */
    edge_list_free(&el);
}

/* The view must be what the kernel's own parser builds from the same edges. */
static void view_matches_kernel_parser(void **state)
{
    static const char text[] = "graph 6 4\n3 1\n1 0\n0 3\n2 3\n";
    edge_list el = {0};
    graph_view view = {0};
    pw_graph g;
    pw_verdict v;
    pw_limits lim = limits();
    (void)state;
    el.n = 6;
    edge_list_add(&el, 3, 1);
    edge_list_add(&el, 1, 0);
    edge_list_add(&el, 0, 3);
    edge_list_add(&el, 2, 3);
    assert_int_equal(pw_graph_parse(text, sizeof text - 1, &lim, &g, &v), PW_OK);
    assert_int_equal(graph_view_build(&view, &el), 0);
    assert_int_equal(view.g.n, g.n);
    assert_int_equal(view.g.m, g.m);
    assert_int_equal(view.g.n_adj, g.n_adj);
    assert_memory_equal(view.g.first, g.first, (g.n_adj + 1) * sizeof *g.first);
    assert_memory_equal(view.g.darts, g.darts, 2 * g.m * sizeof *g.darts);
    pw_graph_free(&g);
    graph_view_free(&view);
    edge_list_free(&el);
}

static void names_get_ids_in_order_of_appearance(void **state)
{
    name_table t = {0};
    char name[32];
    uint32_t id;
    (void)state;
    for (uint32_t i = 0; i < 5000; i++) { /* enough to rehash several times */
        snprintf(name, sizeof name, "R%u", i);
        assert_int_equal(name_table_intern(&t, name, strlen(name), &id), 0);
        assert_int_equal(id, i);
    }
    assert_int_equal(name_table_intern(&t, "R4321", 5, &id), 0);
    assert_int_equal(id, 4321);
    assert_int_equal(name_table_intern(&t, "R43210", 5, &id), 0); /* only "R4321" is read */
    assert_int_equal(id, 4321);
    assert_int_equal(t.count, 5000);
    assert_string_equal(name_table_name(&t, 17), "R17");
    name_table_free(&t);
}

/* Lines across the 64 KiB block boundary, CRLF, a last line without LF, the length limit. */
static void line_reader_splits_lines(void **state)
{
    FILE *f = tmpfile();
    line_reader r;
    (void)state;
    assert_non_null(f);
    for (int i = 0; i < 70000; i++)
        fputc('a', f);
    fputs("\r\nb\n\nlast", f);
    rewind(f);
    assert_int_equal(line_reader_open(&r, f, 1u << 20), 0);
    assert_int_equal(line_reader_next(&r), 1);
    assert_int_equal(r.line_len, 70000);
    assert_int_equal(line_reader_next(&r), 1);
    assert_int_equal(r.line_len, 1);
    assert_int_equal(r.line_offset, 70002);
    assert_int_equal(line_reader_next(&r), 1);
    assert_int_equal(r.line_len, 0);
    assert_int_equal(line_reader_next(&r), 1);
    assert_memory_equal(r.line, "last", 4);
    assert_int_equal(r.line_number, 4);
    assert_int_equal(line_reader_next(&r), 0);
    line_reader_close(&r);
    rewind(f);
    assert_int_equal(line_reader_open(&r, f, 1000), 0);
    assert_int_equal(line_reader_next(&r), -2);
    line_reader_close(&r);
    fclose(f);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(graph6_k4_in_column_order),
        cmocka_unit_test(graph6_four_byte_size),
        cmocka_unit_test(graph6_refusals),
        cmocka_unit_test(graph6_edge_limit),
        cmocka_unit_test(header_is_recognised),
        cmocka_unit_test(repeats_and_loops_are_counted_and_dropped),
        cmocka_unit_test(view_matches_kernel_parser),
        cmocka_unit_test(names_get_ids_in_order_of_appearance),
        cmocka_unit_test(line_reader_splits_lines),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
