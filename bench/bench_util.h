/*
 * bench_util.h - the few helpers the benchmark programs share: a monotonic
 * clock, a fatal error that names the tool, and reading a whole file.
 * Header-only, because each benchmark is built from its own source file.
 */
#ifndef BENCH_UTIL_H
#define BENCH_UTIL_H

#include "planewit.h"

#include <stdio.h>
#include <stdlib.h>
#include <time.h>

/* The name in error messages; each program sets it first thing in main. */
static const char *bench_tool = "bench";

static inline double bench_now(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double)t.tv_sec + (double)t.tv_nsec * 1e-9;
}

static inline void bench_fail(const char *what)
{
    fprintf(stderr, "%s: %s\n", bench_tool, what);
    exit(2);
}

/* The whole file, with the kernel's reader (no size limit: bench inputs). */
static inline char *bench_slurp(const char *path, size_t *len)
{
    FILE *f = fopen(path, "rb");
    char *buf = NULL;
    if (f == NULL || pw_read_all(f, UINT64_MAX, &buf, len) != PW_OK) {
        fprintf(stderr, "%s: cannot read %s\n", bench_tool, path);
        exit(2);
    }
    fclose(f);
    return buf;
}

#endif
