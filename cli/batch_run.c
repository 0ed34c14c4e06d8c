/*
 * batch_run.c - the worker pool of `planewit batch`.
 *
 * Workers take the shard's jobs in order from a shared counter, so a slow job
 * holds up only the thread that has it; the others go on with the rest.
 * Each result waits in its slot until every earlier job is written; the
 * worker that completes the oldest unwritten job writes it and every ready
 * one after it, so the output is in job order whatever the threads' timing,
 * and no thread is woken per job (waking a writer thread for every job cost
 * a third of a run of small jobs).  The calling thread only draws progress
 * and watches for interrupts.  Memory: one small slot per job plus the lines
 * finished but not yet written.  On SIGINT/SIGTERM the workers stop taking
 * jobs and writing; batch_run returns once no worker is mid-write, and the
 * caller removes the temporary output.
 */
#include "batch.h"

#include <pthread.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

typedef struct {
    const job_list *list;
    const batch_shard *shard;
    const pw_limits *lim;
    FILE *out;
    batch_summary *summary;
    size_t total;           /* jobs in the shard */
    job_result *results;    /* one per shard job */
    atomic_size_t next;     /* the next shard job a worker takes */
    atomic_size_t done;     /* jobs completed, for progress */
    pthread_mutex_t lock;   /* guards the fields below */
    pthread_cond_t changed; /* all written, or writing stopped */
    unsigned char *ready;   /* results[k] is complete */
    size_t written;         /* shard jobs written, in order */
    int writing;            /* a worker is writing (outside the lock) */
    int stop;               /* write nothing more: interrupted or failed */
    int failed;             /* a write failed or a line was out of memory */
} batch_pool;

/* The pool and thread table of an interrupted run (see batch_run). */
static void *volatile still_in_use[2];

static size_t job_of(const batch_pool *pool, size_t k)
{
    return pool->shard->first + k * pool->shard->count;
}

/* Writes shard job k's line; 0, or -1 on a write error or missing line. */
static int write_result(batch_pool *pool, size_t k)
{
    job_result *r = &pool->results[k];
    if (r->line == NULL || fwrite(r->line, 1, r->len, pool->out) != r->len)
        return -1;
    free(r->line);
    r->line = NULL;
    summary_add(pool->summary, pool->list, job_of(pool, k), r);
    return 0;
}

/* Marks shard job k complete; unless another worker is writing, writes all ready lines. */
static void complete(batch_pool *pool, size_t k)
{
    pthread_mutex_lock(&pool->lock);
    pool->ready[k] = 1;
    if (!pool->writing) {
        pool->writing = 1;
        while (!pool->stop && pool->written < pool->total && pool->ready[pool->written]) {
            size_t at = pool->written;
            pthread_mutex_unlock(&pool->lock);
            int result = write_result(pool, at);
            pthread_mutex_lock(&pool->lock);
            if (result != 0) {
                pool->stop = pool->failed = 1;
                atomic_store(&pool->next, pool->total); /* no more jobs; finish the ones running */
            }
            pool->written++;
        }
        pool->writing = 0;
        if (pool->stop || pool->written == pool->total)
            pthread_cond_broadcast(&pool->changed);
    }
    pthread_mutex_unlock(&pool->lock);
}

static void *worker(void *arg)
{
    batch_pool *pool = arg;
    batch_buffer scratch[2] = {{NULL, 0}, {NULL, 0}};
    for (;;) {
        size_t k = atomic_fetch_add(&pool->next, 1);
        if (k >= pool->total || cli_interrupted)
            break;
        batch_check_job(pool->list, job_of(pool, k), pool->lim, scratch, &pool->results[k]);
        atomic_fetch_add(&pool->done, 1);
        complete(pool, k);
    }
    free(scratch[0].bytes);
    free(scratch[1].bytes);
    return NULL;
}

/* Until every line is written or writing stopped: 0 done, -1 failed, -2 interrupted. */
static int watch(batch_pool *pool, batch_progress *progress)
{
    pthread_mutex_lock(&pool->lock);
    while (pool->written < pool->total && !pool->stop && !cli_interrupted) {
        struct timespec until;
        clock_gettime(CLOCK_REALTIME, &until);
        until.tv_nsec += 100000000L; /* wake often enough to see Ctrl-C and draw progress */
        if (until.tv_nsec >= 1000000000L) {
            until.tv_sec++;
            until.tv_nsec -= 1000000000L;
        }
        pthread_cond_timedwait(&pool->changed, &pool->lock, &until);
        pthread_mutex_unlock(&pool->lock);
        progress_update(progress, atomic_load(&pool->done));
        pthread_mutex_lock(&pool->lock);
    }
    if (cli_interrupted && pool->written < pool->total && !pool->failed) {
        pool->stop = 1;
        while (pool->writing) /* the output is about to be removed: let the last write end */
            pthread_cond_wait(&pool->changed, &pool->lock);
    }
    int rc = pool->failed ? -1 : pool->written < pool->total ? -2 : 0;
    pthread_mutex_unlock(&pool->lock);
    return rc;
}

static batch_pool *pool_new(const batch_config *config, FILE *out, batch_summary *summary)
{
    batch_pool *pool = calloc(1, sizeof *pool);
    if (pool == NULL)
        return NULL;
    pool->list = config->list;
    pool->shard = &config->shard;
    pool->lim = &config->lim;
    pool->out = out;
    pool->summary = summary;
    pool->total = batch_shard_size(&config->shard, config->list->count);
    pool->results = calloc(pool->total ? pool->total : 1, sizeof *pool->results);
    pool->ready = calloc(pool->total ? pool->total : 1, 1);
    atomic_init(&pool->next, 0);
    atomic_init(&pool->done, 0);
    if (pool->results == NULL || pool->ready == NULL) {
        free(pool->results);
        free(pool->ready);
        free(pool);
        return NULL;
    }
    pthread_mutex_init(&pool->lock, NULL);
    pthread_cond_init(&pool->changed, NULL);
    return pool;
}

static void pool_free(batch_pool *pool)
{
    pthread_mutex_destroy(&pool->lock);
    pthread_cond_destroy(&pool->changed);
    free(pool->results);
    free(pool->ready);
    free(pool);
}

int batch_run(const batch_config *config, FILE *out, batch_summary *summary,
              batch_progress *progress)
{
    batch_pool *pool = pool_new(config, out, summary);
    pthread_t *threads = malloc(config->threads * sizeof *threads);
    unsigned started = 0;
    if (pool == NULL || threads == NULL) {
        fputs("planewit batch: out of memory\n", stderr);
        free(threads);
        if (pool != NULL)
            pool_free(pool);
        return -1;
    }
    /* Lines come at tens of thousands per second: write them in large blocks (glibc ignores
       the size unless given the buffer; static, as the stream outlives this call). */
    static char out_buffer[1 << 20];
    setvbuf(out, out_buffer, _IOFBF, sizeof out_buffer);
    int create_error = 0;
    while (started < config->threads && started < pool->total &&
           (create_error = pthread_create(&threads[started], NULL, worker, pool)) == 0)
        started++;
    if (started == 0 && pool->total > 0) {
        fprintf(stderr, "planewit batch: cannot start a worker thread: %s\n",
                strerror(create_error));
        free(threads);
        pool_free(pool);
        return -1;
    }
    int rc = watch(pool, progress);
    if (rc == -2) {
        /* Interrupted: workers may be inside a long job and still use the pool and
           the thread table, and the process exits now.  Both stay reachable from
           here, so that leak checkers see memory in use, not memory lost. */
        still_in_use[0] = pool;
        still_in_use[1] = threads;
        return rc;
    }
    for (unsigned t = 0; t < started; t++)
        pthread_join(threads[t], NULL);
    for (size_t k = 0; k < pool->total; k++)
        free(pool->results[k].line);
    free(threads);
    pool_free(pool);
    return rc;
}
