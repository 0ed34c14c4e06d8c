/*
 * import_graph6.c - `import --from graph6`: a file holding one graph6 record
 * (format: graph6.c), optionally after nauty's ">>graph6<<" header, and an
 * optional line end.  A file with more records is refused: import makes one
 * graph file; `certify --graph6` is the command for streams.
 */
#include "import.h"

#include <string.h>

static const char *shown(const cli_input *in)
{
    return strcmp(in->path, "-") == 0 ? "<stdin>" : in->path;
}

/* True when only line ends (LF, CRLF) remain from offset at. */
static int only_line_ends(const cli_input *in, size_t at)
{
    for (; at < in->len; at++)
        if (in->bytes[at] != '\n' && !(in->bytes[at] == '\r' && at + 1 < in->len &&
                                       in->bytes[at + 1] == '\n'))
            return 0;
    return 1;
}

int import_graph6(const cli_input *in, const pw_limits *lim, edge_list *el)
{
    graph6_fault fault;
    const char *lf = memchr(in->bytes, '\n', in->len);
    size_t head = graph6_header_length(in->bytes, in->len);
    size_t end = lf ? (size_t)(lf - in->bytes) : in->len;
    if (end > head && in->bytes[end - 1] == '\r' && lf != NULL)
        end--;
    if (lf != NULL && !only_line_ends(in, (size_t)(lf - in->bytes) + 1)) {
        fprintf(stderr, "planewit import: %s line 2: expected the end of the file after one "
                        "graph6 record (use 'planewit certify --graph6' for streams)\n",
                shown(in));
        return -1;
    }
    int got = graph6_decode(in->bytes + head, end - head, lim, el, &fault);
    if (got == -2) {
        fprintf(stderr, "planewit import: %s: out of memory\n", shown(in));
        return -1;
    }
    if (got != 0) {
        fprintf(stderr, "planewit import: %s byte offset %zu (line 1, column %zu): %s\n", shown(in),
                head + fault.offset, head + fault.offset + 1, fault.what);
        return -1;
    }
    return 0;
}
