/*
 * import_dimacs.c - `import --from dimacs`: the edge format of the DIMACS
 * challenges.  Vertex numbers in the file are 1-based; ours are 0-based.
 *
 *     c ANY TEXT         comment lines, anywhere
 *     p edge N M         exactly once, before the first edge ("p col N M" too)
 *     e U V              exactly M lines, 1 <= U, V <= N
 *
 * The edge lines must number exactly M: a count that does not match is how a
 * truncated file shows, so it is refused.  Repeats (many files list both
 * directions) and self-loops are dropped later and reported.
 */
#include "import.h"

#include <string.h>

static int is_word(const char *tok, size_t len, const char *word)
{
    return len == strlen(word) && memcmp(tok, word, len) == 0;
}

static int read_problem(text_scan *ts, const pw_limits *lim, edge_list *el, uint64_t *m)
{
    const char *tok;
    uint64_t n;
    size_t len = text_scan_token(ts, "", &tok);
    if (!is_word(tok, len, "edge") && !is_word(tok, len, "col"))
        return text_scan_fail(ts, "'edge' after 'p'", tok, len);
    if (text_scan_number(ts, "the vertex count N", UINT32_MAX, &n) ||
        text_scan_number(ts, "the edge count M", UINT64_MAX, m) || text_scan_expect_end(ts))
        return -1;
    if (n > lim->max_vertices)
        return text_scan_error(ts, "N = %llu exceeds the limit %u (raise it with --max-vertices)",
                               (unsigned long long)n, lim->max_vertices);
    el->n = (uint32_t)n;
    return 0;
}

static int read_edge(text_scan *ts, const pw_limits *lim, edge_list *el)
{
    uint64_t u, v;
    if (text_scan_number(ts, "a vertex number", UINT32_MAX, &u) ||
        text_scan_number(ts, "a vertex number", UINT32_MAX, &v) || text_scan_expect_end(ts))
        return -1;
    if (u < 1 || u > el->n || v < 1 || v > el->n)
        return text_scan_error(ts, "vertex %llu is out of range: vertices are numbered 1 to N = %u",
                               (unsigned long long)(u < 1 || u > el->n ? u : v), el->n);
    if (el->m >= lim->max_edges)
        return text_scan_error(ts, "more than %u edges (raise the limit with --max-edges)",
                               lim->max_edges);
    if (edge_list_add(el, (uint32_t)(u - 1), (uint32_t)(v - 1)) != 0)
        return text_scan_error(ts, "out of memory");
    return 0;
}

int import_dimacs(const cli_input *in, const pw_limits *lim, edge_list *el)
{
    text_scan ts;
    uint64_t m = 0, edges = 0;
    int got, have_problem = 0;
    text_scan_init(&ts, in, "planewit import", 0);
    while ((got = text_scan_line(&ts)) == 1) {
        const char *tok;
        size_t len = text_scan_token(&ts, "", &tok);
        if (is_word(tok, len, "c"))
            continue;
        if (is_word(tok, len, "p") && !have_problem) {
            if (read_problem(&ts, lim, el, &m) != 0)
                return -1;
            have_problem = 1;
        } else if (is_word(tok, len, "e") && have_problem) {
            if (edges == m)
                return text_scan_error(&ts, "more 'e' lines than the M = %llu of the 'p' line",
                                       (unsigned long long)m);
            if (read_edge(&ts, lim, el) != 0)
                return -1;
            edges++;
        } else {
            return text_scan_fail(&ts, have_problem ? "'c' or 'e'" : "'c' or 'p edge N M'", tok,
                                  len);
        }
    }
    if (got < 0)
        return -1;
    ts.line++;
    if (!have_problem)
        return text_scan_error(&ts, "expected 'p edge N M', found the end of the file");
    if (edges != m)
        return text_scan_error(&ts, "the file ends after %llu 'e' lines, the 'p' line's M is %llu",
                               (unsigned long long)edges, (unsigned long long)m);
    return 0;
}
