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

/* An output written whole or not at all (output.c); path "-" is standard output. */
typedef struct {
    const char *path;
    char *temp; /* the temporary file beside path, NULL for standard output */
    FILE *file; /* write here between open and commit/abort */
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

int cmd_check(int argc, char **argv);

#endif
