/*
 * cli.h - the command-line front end.  Untrusted glue: it reads files, calls
 * the kernel and reports; it never decides a verdict itself.
 */
#ifndef PW_CLI_H
#define PW_CLI_H

#include "planewit.h"

#include <stdio.h>

/* Exit status for a usage error and for a producer bug caught by the kernel. */
#define CLI_EXIT_USAGE 2
#define CLI_EXIT_BUG 3

/* A whole input file; path "-" is standard input. */
typedef struct {
    const char *path;
    char *bytes;
    size_t len;
} cli_input;

/* PW_OK, or after printing "planewit: PATH: reason" to stderr, PW_E_READ,
   PW_E_LIMIT (larger than lim->max_bytes) or PW_E_NOMEM. */
pw_code cli_read_input(cli_input *in, const char *path, const pw_limits *lim);
void cli_free_input(cli_input *in);

/* For a process that runs one job on the graph file at graph_path: large
   blocks stay in the heap between phases, on huge pages where the system has
   them (heap.c).  Call once, before reading; small or unusual inputs, and
   files above largest bytes, are left to the defaults.  Changes speed and
   peak memory only, never results. */
void cli_heap_for_one_job(const char *graph_path, uint64_t largest);
/*
 * certify's and check's `largest`: the sizes the policy was measured on.  At
 * 10^7 edges (a 160 MB file) it takes about a quarter off certify and adds
 * about 5% to its peak (sparse planar: 119 bytes per edge against 113), which
 * fits the aim of 120 only since certify lets the graph's bytes go during the
 * run (prover.c); check gains a quarter to two fifths for the same 5%.
 * Larger files are left to the defaults, unmeasured.
 */
#define CLI_ONE_JOB_HEAP_LARGEST ((uint64_t)256 << 20)

/* An output written whole or not at all (output.c); path "-" is standard output. */
typedef struct {
    const char *path;
    char *temp; /* the temporary file beside path, NULL for standard output */
    FILE *file; /* write here between open and commit/abort */
    int direct; /* the target is a device or pipe, opened as it is */
} cli_output;

/* 0, or -1 after printing why.  Then commit (rename into place) or abort (remove). */
int cli_output_open(cli_output *o, const char *path);
int cli_output_commit(cli_output *o);
void cli_output_abort(cli_output *o);

/* Parses --max-vertices/--max-edges/--max-bytes at argv[*i]: 1 taken, 0 not ours, -1 error. */
int cli_limit_option(int argc, char **argv, int *i, pw_limits *lim);

/* The verdict as one human line (two when accepted: the caution follows). */
void cli_print_verdict(FILE *out, const pw_verdict *v, const char *graph_path,
                       const char *cert_path);
/* The verdict record (format-spec/verdict-record.md) as one JSON line. */
void cli_print_record(FILE *out, const pw_verdict *v, const char *graph_path,
                      const char *cert_path);
/* The caution every acceptance carries in output meant for sign-off. */
extern const char cli_caution[];

/* Minimal JSON writing. */
void json_string(FILE *out, const char *s);
void json_hex(FILE *out, const unsigned char *bytes, size_t n);

/* SHA-256 (sha256.c) of bytes: 0, or -1 if the library fails. */
int cli_sha256(const char *bytes, size_t len, unsigned char out[32]);
/* Of a stream or a file: 0, or -1 with errno set by the failed read. */
int cli_sha256_stream(FILE *f, unsigned char out[32]);
int cli_sha256_file(const char *path, unsigned char out[32]);
/* A digest as 64 lowercase hex digits and a NUL, as sha256sum prints it. */
void cli_sha256_hex(const unsigned char digest[32], char hex[65]);

/* This binary (buildinfo.c); the vector-set digest is NULL when none was embedded. */
const char *cli_build_compiler(void);
const char *cli_build_flags(void);
const char *cli_build_vector_set(void);
int cli_self_sha256(unsigned char out[32]);
/* The "tool" JSON object naming this binary, and the UTC time as a JSON string (signoff.c). */
void cli_print_tool(FILE *out);
void cli_print_utc_now(FILE *out);

/* The canonical graph digest (canon.c); -1 when the graph is unusable. */
#define CLI_CANONICAL_FORM "planewit-graph-normal-form-1"
int cli_canonical_graph_sha256(const char *bytes, size_t len, const pw_limits *lim,
                               unsigned char out[32]);

/* The verdict record without its line end, malloc'ed (record_string.c); NULL if out of memory. */
char *cli_record_string(const pw_verdict *v, const char *graph_path, const char *cert_path,
                        size_t *len);

/* The sign-off record (signoff.c, format-spec/signoff-record.md). */
typedef struct {
    const char *graph_path, *cert_path;
    const char *note;               /* NULL: no note */
    const unsigned char *canonical; /* NULL: the graph could not be parsed */
} cli_signoff;
int cli_write_signoff(const char *path, const pw_verdict *v, const cli_signoff *s);

/* ---- pictures (svg_common.c, svg_plane.c, svg_witness.c) ----------------- */
/* The document frame; scale is pixels per viewBox unit. */
void svg_begin(FILE *out, double min_x, double min_y, double w, double h, double scale,
               const char *title);
void svg_style(FILE *out, double edge, double dot, double font, double caption);
void svg_end(FILE *out);
void svg_text(FILE *out, const char *s); /* XML character data, escaped */
void svg_caption(FILE *out, double x, double y, const char *cls, const char *line);

/* A planar straight-line drawing, y axis up, coordinates >= 0. */
typedef struct {
    uint32_t n;
    const int64_t *x, *y;
    int64_t width, height;     /* largest coordinates */
    double step;               /* the drawing's natural spacing: 1 on a grid */
    const char *const *labels; /* NULL, or n names (NULL entries: the id) */
    const char *caption, *caption2; /* caption2 may be NULL */
} svg_plane;
void svg_write_plane(FILE *out, const pw_graph *g, const svg_plane *p);

/* A Kuratowski witness: K5 (branch B0..B4, 10 paths) or K3,3 (A0 A1 A2 B0 B1 B2, 9). */
typedef struct {
    int k5;
    const uint32_t *branch;
    const uint32_t *path;       /* concatenated, each from branch to branch */
    const uint32_t *path_start; /* paths + 1 offsets */
    const char *const *labels;  /* NULL, or g->n names */
} svg_witness;
/* The two paths that cross in the picture (the conflict the caption names). */
void svg_witness_conflict(const svg_witness *w, unsigned *p, unsigned *q);
/* Path k as "a-b-c", or "a-b-...-y-z (k edges)" when long, with names if given. */
void svg_witness_describe(const svg_witness *w, unsigned k, char *line, size_t size);
/* 0, or -1 when memory runs out. */
int svg_write_witness(FILE *out, const pw_graph *g, const svg_witness *w);

int cmd_draw(int argc, char **argv);

int cmd_check(int argc, char **argv);
int cmd_batch(int argc, char **argv);
int cmd_merge(int argc, char **argv);
int cmd_seal(int argc, char **argv);
int cmd_audit(int argc, char **argv);
int cmd_selftest(int argc, char **argv);
int cmd_import(int argc, char **argv);
int cmd_certify(int argc, char **argv);

#endif
