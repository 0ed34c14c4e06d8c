/*
 * import.h - bringing graphs in from other formats (graph6, DIMACS "p edge",
 * plain edge lists) and the pieces the importers and `certify --graph6` share.
 * Untrusted code: whatever it builds is handed to the kernel's graph parser
 * (or checked by the kernel through a certificate) before anyone relies on it.
 *
 * Error convention: a function that returns -1 has already printed one line
 * "planewit import: FILE line L: what was expected, what was found" (or the
 * byte offset for graph6) to stderr, unless its comment says otherwise.
 */
#ifndef PW_IMPORT_H
#define PW_IMPORT_H

#include "cli.h"

#include <stdint.h>

/* ---- edge_list.c: a growing list of edges, cleaned to a simple graph ----- */

typedef struct {
    uint32_t n;          /* vertices 0 .. n-1 */
    uint32_t m;          /* edges held */
    uint32_t cap;        /* room, in edges */
    uint32_t *ends;      /* 2m endpoints, edge e = ends[2e], ends[2e+1] */
    uint64_t self_loops; /* dropped by edge_list_add */
    uint64_t repeats;    /* dropped by edge_list_drop_repeats */
} edge_list;

/* Appends u-v (a self-loop is counted and dropped): 0, or -1 when out of memory. */
int edge_list_add(edge_list *el, uint32_t u, uint32_t v);
/* Keeps the first copy of every unordered pair, in input order: 0 or -1 (no memory). */
int edge_list_drop_repeats(edge_list *el);
/* Writes "graph N M" and the edge lines (format-spec/graph.md). */
void edge_list_write(FILE *out, const edge_list *el);
/* A pw_graph over an edge list's ends, with arrays reused from graph to graph. */
typedef struct {
    pw_graph g;            /* g.ends borrows the edge list's array */
    uint32_t vertex_room;  /* room in g.first, minus one */
    uint32_t dart_room;    /* room in g.darts */
} graph_view;

/*
 * Gives view->g the kernel's pw_graph shape (darts grouped by source vertex,
 * n_adj = 1 + the largest id used) for a simple edge list.  The view must
 * start zeroed and stays valid while el is unchanged.  0, or -1 out of memory.
 */
int graph_view_build(graph_view *view, const edge_list *el);
void graph_view_free(graph_view *view);
void edge_list_free(edge_list *el);

/* ---- graph6.c: one graph6 record (nauty's dense format) ----------------- */

typedef struct {
    size_t offset;     /* 0-based byte offset of the fault inside the record */
    char what[200];    /* what was expected and what was found */
} graph6_fault;

/*
 * Decodes record[0 .. len-1] (no line end) into el (cleared first; its
 * buffers are reused).  Returns 0, -1 malformed or over a limit (fault
 * filled, nothing printed), -2 out of memory.
 */
int graph6_decode(const char *record, size_t len, const pw_limits *lim, edge_list *el,
                  graph6_fault *fault);
/* Length of the optional ">>graph6<<" header at the start of a line: 0 or 10. */
size_t graph6_header_length(const char *line, size_t len);

/* ---- line_reader.c: lines of a stream, buffered, with a length limit ---- */

typedef struct {
    FILE *in;
    char *block;           /* read buffer */
    size_t block_len, block_pos;
    char *line;            /* the current line without its LF or CRLF */
    size_t line_len, line_cap;
    uint64_t line_number;  /* 1-based */
    uint64_t line_offset;  /* byte offset of the current line in the stream */
    uint64_t next_offset;
    uint64_t max_line;     /* longest line accepted */
    int eof;
} line_reader;

/* 0, or -1 out of memory (nothing printed). */
int line_reader_open(line_reader *r, FILE *in, uint64_t max_line);
/* 1 a line is ready, 0 end of stream, -1 read error, -2 line too long, -3 out of memory. */
int line_reader_next(line_reader *r);
void line_reader_close(line_reader *r);

/* ---- text_scan.c: lines and tokens of an in-memory text file ------------ */

typedef struct {
    const char *who;   /* message prefix, e.g. "planewit import" */
    const char *path;  /* for messages */
    int hash_comments; /* '#' starts a comment to the end of the line */
    const char *buf;
    size_t len, next;
    uint64_t line;     /* 1-based number of the current line */
    const char *cur, *end; /* the current line's unread content */
} text_scan;

void text_scan_init(text_scan *ts, const cli_input *in, const char *who, int hash_comments);
/*
 * Moves to the next line (LF or CRLF ended) holding something other than
 * spaces and tabs: 1 found, 0 end of file, -1 a byte that is not printable
 * ASCII or TAB (reported).
 */
int text_scan_line(text_scan *ts);
/* Skips spaces and tabs; 1 when the line has nothing left. */
int text_scan_at_end(text_scan *ts);
/* Takes the next run of bytes that are not blank and not in stops (may be empty). */
size_t text_scan_token(text_scan *ts, const char *stops, const char **token);
/* Prints "WHO: PATH line L: expected EXPECTED, found 'TOKEN'"; returns -1. */
int text_scan_fail(const text_scan *ts, const char *expected, const char *token, size_t len);
/* Prints "WHO: PATH line L: " and the formatted text; returns -1. */
int text_scan_error(const text_scan *ts, const char *fmt, ...)
    __attribute__((format(printf, 2, 3)));
/* 0 when the line has nothing left, else -1 (reported). */
int text_scan_expect_end(text_scan *ts);
/* 0 when the next token is word, else -1 (reported). */
int text_scan_expect_word(text_scan *ts, const char *word);
/* A decimal number without sign or leading zero, at most max: 0 or -1 (reported). */
int text_scan_number(text_scan *ts, const char *what, uint64_t max, uint64_t *out);

/* ---- name_table.c: vertex names <-> ids, ids in order of first appearance */

typedef struct {
    char *text;          /* all names, each NUL-terminated */
    size_t text_len, text_cap;
    size_t *start;       /* id -> offset of its name in text */
    uint32_t count, cap; /* names held, room in start */
    uint32_t *slots;     /* open addressing: id + 1, 0 empty */
    size_t slot_count;   /* a power of two, kept at least twice count */
} name_table;

/* Id of the name, adding it as the next id if new: 0, or -1 out of memory. */
int name_table_intern(name_table *t, const char *name, size_t len, uint32_t *id);
const char *name_table_name(const name_table *t, uint32_t id);
void name_table_free(name_table *t);

/* ---- names.c: the names file, format-spec/names.md ---------------------- */

/* Writes the whole names file for a graph file with the given SHA-256. */
void names_write(FILE *out, const name_table *t, const unsigned char graph_sha256[32]);
/*
 * Reads a names file into t for a graph of n vertices whose file has the
 * given SHA-256.  0, or -1 after printing "planewit: PATH line L: ...".
 */
int names_read(const cli_input *in, uint32_t n, const unsigned char graph_sha256[32],
               name_table *t);
/* 1 when every byte of name[0..len-1] may stand in a name (printable, no '#' or ','). */
int names_valid_byte(unsigned char c);
/* After a rejection: "names: 4 = R12, 9 = J3" for the vertices its detail names (name_legend.c). */
void cli_print_name_legend(FILE *out, const pw_verdict *v, const name_table *t);

/* ---- the importers: each fills el (and names, for edge lists) ----------- */

int import_graph6(const cli_input *in, const pw_limits *lim, edge_list *el);
int import_dimacs(const cli_input *in, const pw_limits *lim, edge_list *el);
int import_edges(const cli_input *in, const pw_limits *lim, edge_list *el, name_table *names);

#endif
