/*
 * stream_pool.c - the blocks of a graph6 stream handed round a ring of slots.
 *
 * Block number k lives in slot k mod slots.  The calling thread fills
 * blocks from the stream while a slot is free, and writes finished blocks in
 * block order; workers take filled blocks in order and certify them.  A slot
 * is free again once its block is written, so memory stays bounded however
 * long the stream is, and a slow block holds up only the writer, never the
 * other workers.  Reading stops at the first failure written, as it would
 * in a single-threaded run; workers finish the block in hand and leave.
 */
#include "stream.h"

#include <pthread.h>
#include <stdlib.h>
#include <string.h>

enum { SLOT_FREE, SLOT_FILLED, SLOT_DONE };

typedef struct {
    stream_run_state *s;
    stream_block *blocks;
    unsigned char *state;   /* per slot, under lock */
    size_t slots;
    size_t filled, taken, written; /* block counts, under lock */
    int reading_done, stop;
    pthread_mutex_t lock;
    pthread_cond_t work;    /* a block was filled, or stop */
    pthread_cond_t finished; /* a block was certified */
} stream_pool;

static int add_text(stream_block *b, const char *bytes, size_t len)
{
    if (b->text_len + len > b->text_cap) {
        size_t cap = b->text_cap * 2 > b->text_len + len ? b->text_cap * 2 : b->text_len + len;
        char *text = realloc(b->text, cap);
        if (text == NULL)
            return -1;
        b->text = text;
        b->text_cap = cap;
    }
    memcpy(b->text + b->text_len, bytes, len);
    b->text_len += len;
    return 0;
}

/* Reads the shard's next records into b; sets b->read_end (1: more may follow). */
static void fill_block(const stream_run_state *s, stream_block *b)
{
    line_reader *r = s->lines;
    const batch_shard *shard = &s->a->shard;
    b->text_len = b->count = 0;
    b->read_end = 1;
    while (b->count < STREAM_BLOCK_RECORDS && b->text_len < STREAM_BLOCK_BYTES) {
        int got = line_reader_next(r);
        if (got != 1) {
            b->read_end = got;
            break;
        }
        if ((r->line_number - 1) % shard->count != shard->first)
            continue;
        stream_record *rec = &b->records[b->count];
        rec->start = b->text_len;
        rec->len = r->line_len;
        rec->line = r->line_number;
        rec->offset = r->line_offset;
        if (add_text(b, r->line, r->line_len) != 0) {
            b->read_end = -3;
            break;
        }
        b->count++;
    }
    b->read_line = r->line_number;
}

static void *worker(void *arg)
{
    stream_pool *pool = arg;
    stream_worker w;
    memset(&w, 0, sizeof w);
    int ready = prover_open(&w.p, pool->s->a->choice) == 0;
    for (;;) {
        pthread_mutex_lock(&pool->lock);
        while (!pool->stop && pool->taken == pool->filled && !pool->reading_done)
            pthread_cond_wait(&pool->work, &pool->lock);
        if (pool->stop || pool->taken == pool->filled) {
            pthread_mutex_unlock(&pool->lock);
            break;
        }
        size_t slot = pool->taken++ % pool->slots;
        pthread_mutex_unlock(&pool->lock);
        stream_block *b = &pool->blocks[slot];
        if (ready)
            stream_certify_block(&w, pool->s, b);
        else
            b->failure = STREAM_NO_MEMORY;
        pthread_mutex_lock(&pool->lock);
        pool->state[slot] = SLOT_DONE;
        pthread_cond_signal(&pool->finished);
        pthread_mutex_unlock(&pool->lock);
    }
    prover_close(&w.p);
    edge_list_free(&w.edges);
    graph_view_free(&w.view);
    return NULL;
}

/* Fills the next block if a slot is free; 1 filled, 0 no free slot or nothing left. */
static int read_ahead(stream_pool *pool)
{
    pthread_mutex_lock(&pool->lock);
    int room = !pool->reading_done && pool->filled - pool->written < pool->slots;
    pthread_mutex_unlock(&pool->lock);
    if (!room)
        return 0;
    size_t slot = pool->filled % pool->slots; /* only this thread changes `filled` */
    fill_block(pool->s, &pool->blocks[slot]);
    pthread_mutex_lock(&pool->lock);
    pool->state[slot] = SLOT_FILLED;
    pool->filled++;
    pool->reading_done = pool->blocks[slot].read_end != 1;
    pthread_cond_broadcast(&pool->work);
    pthread_mutex_unlock(&pool->lock);
    return 1;
}

/* Writes finished blocks in order, reading ahead while slots are free; the exit status or -1. */
static int read_and_write(stream_pool *pool)
{
    for (;;) {
        size_t slot = pool->written % pool->slots;
        pthread_mutex_lock(&pool->lock);
        int done = pool->state[slot] == SLOT_DONE;
        pthread_mutex_unlock(&pool->lock);
        if (!done && read_ahead(pool))
            continue;
        pthread_mutex_lock(&pool->lock);
        while (pool->state[slot] != SLOT_DONE)
            pthread_cond_wait(&pool->finished, &pool->lock);
        pthread_mutex_unlock(&pool->lock);
        const stream_block *b = &pool->blocks[slot];
        int status = stream_write_block(pool->s, b);
        if (status != -1 || b->read_end != 1)
            return status;
        pthread_mutex_lock(&pool->lock);
        pool->state[slot] = SLOT_FREE;
        pool->written++;
        pthread_mutex_unlock(&pool->lock);
    }
}

static int pool_open(stream_pool *pool, stream_run_state *s, unsigned threads)
{
    memset(pool, 0, sizeof *pool);
    pool->s = s;
    pool->slots = 2 * (size_t)threads + 2;
    pool->blocks = calloc(pool->slots, sizeof *pool->blocks);
    pool->state = calloc(pool->slots, 1);
    if (pool->blocks == NULL || pool->state == NULL)
        return -1;
    for (size_t k = 0; k < pool->slots; k++) {
        pool->blocks[k].records = malloc(STREAM_BLOCK_RECORDS * sizeof *pool->blocks[k].records);
        if (pool->blocks[k].records == NULL)
            return -1;
    }
    pthread_mutex_init(&pool->lock, NULL);
    pthread_cond_init(&pool->work, NULL);
    pthread_cond_init(&pool->finished, NULL);
    return 0;
}

static void pool_close(stream_pool *pool)
{
    for (size_t k = 0; pool->blocks != NULL && k < pool->slots; k++) {
        free(pool->blocks[k].records);
        free(pool->blocks[k].text);
        free(pool->blocks[k].out);
    }
    free(pool->blocks);
    free(pool->state);
}

int stream_pool_run(stream_run_state *s, unsigned threads)
{
    stream_pool pool;
    pthread_t *ids = malloc(threads * sizeof *ids);
    memset(&pool, 0, sizeof pool);
    if (ids == NULL || pool_open(&pool, s, threads) != 0) {
        fprintf(stderr, "planewit certify: out of memory\n");
        free(ids);
        pool_close(&pool);
        return CLI_EXIT_USAGE;
    }
    unsigned started = 0;
    int create_error = 0;
    while (started < threads && (create_error = pthread_create(&ids[started], NULL, worker,
                                                               &pool)) == 0)
        started++;
    int status = CLI_EXIT_USAGE;
    if (started == 0)
        fprintf(stderr, "planewit certify: cannot start a worker thread: %s\n",
                strerror(create_error));
    else
        status = read_and_write(&pool);
    pthread_mutex_lock(&pool.lock);
    pool.stop = 1;
    pthread_cond_broadcast(&pool.work);
    pthread_mutex_unlock(&pool.lock);
    for (unsigned t = 0; t < started; t++)
        pthread_join(ids[t], NULL);
    pthread_mutex_destroy(&pool.lock);
    pthread_cond_destroy(&pool.work);
    pthread_cond_destroy(&pool.finished);
    pool_close(&pool);
    free(ids);
    return status;
}
