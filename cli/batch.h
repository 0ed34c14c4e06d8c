/*
 * batch.h - `planewit batch`: many graph/certificate pairs checked by worker
 * threads, one verdict record per job written in job order.  The jobs list
 * and the output lines are specified in format-spec/jobs-list.md.
 */
#ifndef PW_BATCH_H
#define PW_BATCH_H

#include "cli.h"

#include <signal.h>
#include <stdatomic.h>

/* One job: pointers into the list's bytes, as written there (jobs.c). */
typedef struct {
    const char *graph, *cert; /* relative to the list's folder unless absolute */
    uint64_t line;            /* 1-based line in the list */
    pw_claim expected;        /* PW_CLAIM_NONE when the line gives none */
} batch_job;

typedef struct {
    cli_input text;  /* the list's bytes, cut into NUL-terminated paths */
    char *folder;    /* the list's folder, "" for the current one */
    int dir;         /* that folder opened, for openat (a shorter path walk per file); -1 if not */
    batch_job *jobs;
    size_t count;
} job_list;

/* 0, or -1 after printing "planewit batch: LIST line L: ..." to stderr. */
int job_list_read(job_list *list, const char *path, uint64_t max_bytes);
void job_list_free(job_list *list);
/* The path to open for a listed path; 0, or -1 if longer than the buffer. */
int job_list_resolve(const job_list *list, const char *listed, char *out, size_t size);

/* The outcome of one job, filled by a worker and consumed in order by the writer. */
typedef struct {
    char *line;        /* the output line with its LF, malloc'ed; NULL if out of memory */
    size_t len;
    double seconds;    /* wall time of reading and checking */
    pw_status status;
    pw_code code;
    int agrees;        /* 1 yes, 0 no, -1 no expected claim */
} job_result;

/* A worker's reusable file buffer. */
typedef struct {
    char *bytes;
    size_t cap;
} batch_buffer;

/* Checks job `index` of the list (batch_job.c) reading the files into the
   worker's two buffers; never fails: errors become verdicts. */
void batch_check_job(const job_list *list, size_t index, const pw_limits *lim,
                     batch_buffer scratch[2], job_result *out);

/* Which jobs a run takes: every `count`-th job starting at `first` (0-based). */
typedef struct {
    size_t first, count;
} batch_shard;
int batch_shard_parse(const char *who, const char *text, batch_shard *shard);
size_t batch_shard_size(const batch_shard *shard, size_t jobs);

/* Progress on stderr (progress.c). */
typedef struct {
    int live;           /* a terminal: one line redrawn in place */
    int quiet;
    double interval;    /* seconds between updates */
    double started, last;
    size_t total;
} batch_progress;
void progress_start(batch_progress *p, size_t total, int quiet, double interval);
void progress_update(batch_progress *p, size_t done);
void progress_finish(batch_progress *p);
double progress_clock(void);

/* Summary of a run (batch_summary.c). */
#define BATCH_SLOWEST 5
#define BATCH_CODES 128
typedef struct {
    size_t jobs, by_status[3], disagree;
    size_t by_code[BATCH_CODES]; /* indexed by pw_code; larger codes share the last slot */
    struct {
        double seconds;
        size_t job;
        uint64_t line;
        const char *graph;
    } slowest[BATCH_SLOWEST];
} batch_summary;
void summary_add(batch_summary *s, const job_list *list, size_t job, const job_result *r);
void summary_print(FILE *out, const batch_summary *s, double seconds, unsigned threads);
int summary_all_good(const batch_summary *s);

/* A whole run's settings (cmd_batch.c). */
typedef struct {
    const job_list *list;
    batch_shard shard;
    pw_limits lim;
    unsigned threads;
} batch_config;

/*
 * Checks the shard's jobs on config->threads workers and writes their lines
 * to `out` in job order (batch_run.c).  0 done, -1 error printed, -2
 * interrupted (the workers are left running: the caller must exit soon).
 */
int batch_run(const batch_config *config, FILE *out, batch_summary *summary,
              batch_progress *progress);

/* SIGINT and SIGTERM set this to the signal's number (interrupt.c). */
extern volatile sig_atomic_t cli_interrupted;
void cli_catch_interrupts(void);

#endif
