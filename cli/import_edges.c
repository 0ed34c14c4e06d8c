/*
 * import_edges.c - `import --from edges`: a plain edge list whose vertices are
 * names, numbered 0, 1, 2, ... in order of first appearance.
 *
 *     A B          an edge; the names may be separated by blanks,
 *     A,B          by one comma, or by both ("A , B")
 *     A            a vertex alone (it may have no edges)
 *     # ...        a comment, here or after the names
 *
 * A name is 1..200 bytes of printable ASCII other than '#' and ','.  There is
 * no header line: a first line "source,target" would be read as an edge.
 */
#include "import.h"

#define NAME_MAX_BYTES 200

static int take_name(text_scan *ts, const pw_limits *lim, name_table *names, uint32_t *id)
{
    const char *tok;
    size_t len = text_scan_token(ts, ",", &tok);
    if (len == 0)
        return text_scan_fail(ts, "a vertex name", tok, len);
    if (len > NAME_MAX_BYTES)
        return text_scan_fail(ts, "a name of at most 200 bytes", tok, len);
    uint32_t before = names->count;
    if (name_table_intern(names, tok, len, id) != 0)
        return text_scan_error(ts, "out of memory");
    if (names->count > before && names->count > lim->max_vertices)
        return text_scan_error(ts, "more than %u vertices (raise the limit with --max-vertices)",
                               lim->max_vertices);
    return 0;
}

/* After the first name: the end of the line, or a separator and the second name. */
static int read_line(text_scan *ts, const pw_limits *lim, edge_list *el, name_table *names)
{
    uint32_t u, v;
    if (take_name(ts, lim, names, &u) != 0)
        return -1;
    if (text_scan_at_end(ts))
        return 0;
    if (*ts->cur == ',')
        ts->cur++;
    if (take_name(ts, lim, names, &v) != 0 || text_scan_expect_end(ts) != 0)
        return -1;
    if (el->m >= lim->max_edges)
        return text_scan_error(ts, "more than %u edges (raise the limit with --max-edges)",
                               lim->max_edges);
    if (edge_list_add(el, u, v) != 0)
        return text_scan_error(ts, "out of memory");
    return 0;
}

int import_edges(const cli_input *in, const pw_limits *lim, edge_list *el, name_table *names)
{
    text_scan ts;
    int got;
    text_scan_init(&ts, in, "planewit import", 1);
    while ((got = text_scan_line(&ts)) == 1)
        if (read_line(&ts, lim, el, names) != 0)
            return -1;
    el->n = names->count;
    return got;
}
