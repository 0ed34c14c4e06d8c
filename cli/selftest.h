/*
 * selftest.h - `planewit selftest`: the qualification run over vectors/
 * (format-spec/seal.md, "Qualification report").
 */
#ifndef PW_SELFTEST_H
#define PW_SELFTEST_H

#include "archive.h"

/* One case of vectors/MANIFEST (manifest.c); strings point into the line. */
typedef struct {
    const char *name, *graph, *cert, *verdict, *reason;
    long long faces, components; /* -1: not asserted */
    pw_file where_file;          /* PW_FILE_NONE: no location asserted */
    long long where_line;        /* -1: any line */
} vector_case;

int manifest_parse_line(char *line, vector_case *c);

/* Runs one case from the vectors folder; "" in why when it passes, else what deviates. */
void selftest_run_case(const char *dir, const vector_case *c, pw_verdict *v, char *why,
                       size_t size);

#endif
