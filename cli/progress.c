/*
 * progress.c - how far a long batch has got, on standard error.  On a
 * terminal one line is redrawn in place; otherwise (a log file, a cluster
 * job's output) a plain line is written every `interval` seconds, so logs
 * stay readable.  Nothing at all with --quiet.
 */
#include "batch.h"

#include <time.h>
#include <unistd.h>

double progress_clock(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double)t.tv_sec + (double)t.tv_nsec / 1e9;
}

void progress_start(batch_progress *p, size_t total, int quiet, double interval)
{
    p->live = isatty(STDERR_FILENO);
    p->quiet = quiet;
    p->interval = interval > 0 ? interval : p->live ? 0.25 : 10.0;
    p->started = p->last = progress_clock();
    p->total = total;
}

static void print_line(const batch_progress *p, size_t done, double now)
{
    double elapsed = now - p->started;
    double rate = elapsed > 0 ? (double)done / elapsed : 0;
    fprintf(stderr, "%sbatch: %zu/%zu jobs done, %.0f jobs/s", p->live ? "\r\033[K" : "", done,
            p->total, rate);
    if (rate > 0 && done < p->total)
        fprintf(stderr, ", about %.0f s left", (double)(p->total - done) / rate);
    fputs(p->live ? "" : "\n", stderr);
    fflush(stderr);
}

void progress_update(batch_progress *p, size_t done)
{
    double now = progress_clock();
    if (p->quiet || now - p->last < p->interval)
        return;
    p->last = now;
    print_line(p, done, now);
}

/* Clears the live line, so the summary starts on a clean line. */
void progress_finish(batch_progress *p)
{
    if (!p->quiet && p->live && p->last > p->started)
        fputs("\r\033[K", stderr);
}
