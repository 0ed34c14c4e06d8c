/*
 * names.c - the names file (format-spec/names.md): which name each vertex id
 * of a graph file stands for.
 *
 *     vertex-names 1
 *     graph-sha256 HEX64        optional on reading; import always writes it
 *     count N
 *     ID NAME                   exactly N lines, ID = 0, 1, ..., N-1 in order
 *
 * A name is 1..200 bytes of printable ASCII other than '#' and ','; names are
 * distinct.  The digest binds the map to one graph file's exact bytes, so a
 * map left beside an edited graph is refused instead of naming wrong vertices.
 */
#include "import.h"

#include <string.h>

#define NAME_MAX_BYTES 200

int names_valid_byte(unsigned char c)
{
    return c > 0x20 && c < 0x7f && c != '#' && c != ',';
}

void names_write(FILE *out, const name_table *t, const unsigned char graph_sha256[32])
{
    char hex[65];
    cli_sha256_hex(graph_sha256, hex);
    fprintf(out, "vertex-names 1\ngraph-sha256 %s\ncount %u\n", hex, t->count);
    for (uint32_t id = 0; id < t->count; id++)
        fprintf(out, "%u %s\n", id, name_table_name(t, id));
}

static int need_line(text_scan *ts, const char *expected)
{
    int got = text_scan_line(ts);
    if (got == 0) {
        ts->line++;
        return text_scan_error(ts, "expected %s, found the end of the file", expected);
    }
    return got == 1 ? 0 : -1;
}

/* "graph-sha256 HEX" must match the graph file; returns 1 if the line was not there. */
static int read_digest(text_scan *ts, const unsigned char graph_sha256[32])
{
    const char *tok;
    char want[65];
    const char *save = ts->cur;
    size_t len = text_scan_token(ts, "", &tok);
    if (len != 12 || memcmp(tok, "graph-sha256", 12) != 0) {
        ts->cur = save;
        return 1;
    }
    cli_sha256_hex(graph_sha256, want);
    len = text_scan_token(ts, "", &tok);
    if (len != 64 || memcmp(tok, want, 64) != 0)
        return text_scan_error(ts, "graph-sha256 does not match the graph file (%s): this "
                                   "map belongs to other graph bytes", want);
    return text_scan_expect_end(ts);
}

static int read_header(text_scan *ts, uint32_t n, const unsigned char graph_sha256[32])
{
    uint64_t version, count;
    if (need_line(ts, "'vertex-names 1'") || text_scan_expect_word(ts, "vertex-names") ||
        text_scan_number(ts, "format version 1", UINT32_MAX, &version))
        return -1;
    if (version != 1)
        return text_scan_error(ts, "expected format version 1, found %llu",
                               (unsigned long long)version);
    if (text_scan_expect_end(ts))
        return -1;
    if (need_line(ts, "'graph-sha256' or 'count'"))
        return -1;
    int digest = read_digest(ts, graph_sha256);
    if (digest < 0 || (digest == 0 && need_line(ts, "'count N'")))
        return -1;
    if (text_scan_expect_word(ts, "count") || text_scan_number(ts, "the vertex count", UINT32_MAX, &count) ||
        text_scan_expect_end(ts))
        return -1;
    if (count != n)
        return text_scan_error(ts, "count %llu differs from the graph's N = %u",
                               (unsigned long long)count, n);
    return 0;
}

static int read_name(text_scan *ts, uint32_t id, name_table *t)
{
    const char *tok;
    uint64_t got;
    uint32_t assigned;
    if (need_line(ts, "a name line") || text_scan_number(ts, "a vertex id", UINT32_MAX, &got))
        return -1;
    if (got != id)
        return text_scan_error(ts, "expected the name of vertex %u, found vertex %llu", id,
                               (unsigned long long)got);
    size_t len = text_scan_token(ts, "", &tok);
    for (size_t i = 0; i < len; i++)
        if (!names_valid_byte((unsigned char)tok[i]))
            return text_scan_fail(ts, "a name (printable ASCII except '#' and ',')", tok, len);
    if (len == 0 || len > NAME_MAX_BYTES)
        return text_scan_fail(ts, "a name of 1 to 200 bytes", tok, len);
    if (text_scan_expect_end(ts) != 0)
        return -1;
    if (name_table_intern(t, tok, len, &assigned) != 0)
        return text_scan_error(ts, "out of memory");
    if (assigned != id)
        return text_scan_error(ts, "name '%.*s' already names vertex %u", (int)len, tok, assigned);
    return 0;
}

int names_read(const cli_input *in, uint32_t n, const unsigned char graph_sha256[32],
               name_table *t)
{
    text_scan ts;
    text_scan_init(&ts, in, "planewit", 1);
    if (read_header(&ts, n, graph_sha256) != 0)
        return -1;
    for (uint32_t id = 0; id < n; id++)
        if (read_name(&ts, id, t) != 0)
            return -1;
    if (text_scan_line(&ts) != 0)
        return text_scan_error(&ts, "expected the end of the file after %u names", n);
    return 0;
}
