/*
 * batch_run.c - the worker pool of `planewit batch`.
 *
 * Workers take the shard's jobs in order from a shared counter, so a slow job
 * holds up only the thread that has it; the others go on with the rest.
 * Each result waits in its slot until the writer (the calling thread) has
 * written every earlier job: the output is in job order whatever the
 * threads' timing.  Memory: one small slot per job plus the lines finished
 * but not yet written.  On SIGINT/SIGTERM the workers stop taking jobs and
 * the writer returns at once; the caller removes the temporary output.
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
    size_t total;           /* jobs in the shard */
    job_result *results;    /* one per shard job */
    unsigned char *ready;   /* set under `lock` when results[k] is complete */
    atomic_size_t next;     /* the next shard job a worker takes */
    atomic_size_t done;     /* jobs completed, for progress */
    pthread_mutex_t lock;
    pthread_cond_t finished;
} batch_pool;

/* The pool and thread table of an interrupted run (see batch_run). */
static void *volatile still_in_use[2];

static void *worker(void *arg)
{
    batch_pool *pool = arg;
    for (;;) {
        size_t k = atomic_fetch_add(&pool->next, 1);
        if (k >= pool->total || cli_interrupted)
            return NULL;
        size_t job = pool->shard->first + k * pool->shard->count;
        batch_check_job(pool->list, job, pool->lim, &pool->results[k]);
        pthread_mutex_lock(&pool->lock);
        pool->ready[k] = 1;
        pthread_cond_broadcast(&pool->finished);
        pthread_mutex_unlock(&pool->lock);
        atomic_fetch_add(&pool->done, 1);
    }
}

/* Waits for shard job k; 0 when ready, -1 when interrupted first. */
static int wait_for(batch_pool *pool, size_t k, batch_progress *progress)
{
    pthread_mutex_lock(&pool->lock);
    while (!pool->ready[k] && !cli_interrupted) {
        struct timespec until;
        clock_gettime(CLOCK_REALTIME, &until);
        until.tv_nsec += 100000000L; /* wake often enough to see Ctrl-C and draw progress */
        if (until.tv_nsec >= 1000000000L) {
            until.tv_sec++;
            until.tv_nsec -= 1000000000L;
        }
        pthread_cond_timedwait(&pool->finished, &pool->lock, &until);
        pthread_mutex_unlock(&pool->lock);
        progress_update(progress, atomic_load(&pool->done));
        pthread_mutex_lock(&pool->lock);
    }
    int ready = pool->ready[k];
    pthread_mutex_unlock(&pool->lock);
    return ready ? 0 : -1;
}

/* Writes every result in order; 0 done, -1 write error or out of memory, -2 interrupted. */
static int write_in_order(batch_pool *pool, FILE *out, batch_summary *summary,
                          batch_progress *progress)
{
    for (size_t k = 0; k < pool->total; k++) {
        if (wait_for(pool, k, progress) != 0)
            return -2;
        job_result *r = &pool->results[k];
        if (r->line == NULL || fwrite(r->line, 1, r->len, out) != r->len)
            return -1;
        free(r->line);
        r->line = NULL;
        summary_add(summary, pool->list, pool->shard->first + k * pool->shard->count, r);
        progress_update(progress, atomic_load(&pool->done));
    }
    return 0;
}

static batch_pool *pool_new(const job_list *list, const batch_shard *shard, const pw_limits *lim)
{
    batch_pool *pool = calloc(1, sizeof *pool);
    if (pool == NULL)
        return NULL;
    pool->list = list;
    pool->shard = shard;
    pool->lim = lim;
    pool->total = batch_shard_size(shard, list->count);
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
    pthread_cond_init(&pool->finished, NULL);
    return pool;
}

static void pool_free(batch_pool *pool)
{
    pthread_mutex_destroy(&pool->lock);
    pthread_cond_destroy(&pool->finished);
    free(pool->results);
    free(pool->ready);
    free(pool);
}

int batch_run(const batch_config *config, FILE *out, batch_summary *summary,
              batch_progress *progress)
{
    batch_pool *pool = pool_new(config->list, &config->shard, &config->lim);
    pthread_t *threads = malloc(config->threads * sizeof *threads);
    unsigned started = 0;
    if (pool == NULL || threads == NULL) {
        fputs("planewit batch: out of memory\n", stderr);
        free(threads);
        if (pool != NULL)
            pool_free(pool);
        return -1;
    }
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
    int rc = write_in_order(pool, out, summary, progress);
    if (rc == -2) {
        /* Interrupted: workers may be inside a long job and still use the pool and
           the thread table, and the process exits now.  Both stay reachable from
           here, so that leak checkers see memory in use, not memory lost. */
        still_in_use[0] = pool;
        still_in_use[1] = threads;
        return rc;
    }
    if (rc == -1)
        atomic_store(&pool->next, pool->total); /* no more jobs; finish the ones running */
    for (unsigned t = 0; t < started; t++)
        pthread_join(threads[t], NULL);
    for (size_t k = 0; k < pool->total; k++)
        free(pool->results[k].line);
    free(threads);
    pool_free(pool);
    return rc;
}
