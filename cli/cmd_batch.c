/*
 * cmd_batch.c - `planewit batch LIST [-j K] [-o FILE] [--shard I/K] [--quiet]`:
 * check every job of a jobs list (format-spec/jobs-list.md) and write one
 * verdict line per job, in job order, whole or not at all.
 */
#include "batch.h"

#include <stdlib.h>
#include <string.h>
#include <unistd.h>
#ifdef __GLIBC__
#include <malloc.h>
#endif

static const char batch_usage[] =
    "usage: planewit batch LIST [-j K] [-o FILE] [--shard I/K] [--quiet]\n"
    "                      [--progress-every S] [--max-vertices N] [--max-edges M] [--max-bytes B]\n"
    "\n"
    "Checks every job of the jobs list LIST (lines 'GRAPH CERT [planar|nonplanar]',\n"
    "paths relative to LIST's folder) and writes one JSON verdict line per job, in\n"
    "job order, then a summary on standard error.\n"
    "\n"
    "  -j K               K worker threads (default: the online CPUs)\n"
    "  -o FILE            write the lines to FILE, whole or not at all (default: standard output)\n"
    "  --shard I/K        take only jobs I, I+K, I+2K, ... (0-based); 'planewit merge'\n"
    "                     puts the K outputs back into the order of one run\n"
    "  --quiet            no progress lines\n"
    "  --progress-every S a progress line every S seconds (default: 10, live on a terminal)\n"
    "  --max-...          limits per file, as for 'planewit check'\n"
    "\n"
    "Exit status: 0 every job accepted and none against its expected claim, 1 otherwise,\n"
    "2 bad list or usage, 130 interrupted (Ctrl-C; 143 for SIGTERM): FILE is left as it was.\n"
    "Formats: format-spec/jobs-list.md.\n";

typedef struct {
    const char *list, *output;
    batch_shard shard;
    long threads;
    double progress_every;
    int quiet;
    pw_limits lim;
} batch_args;

static int parse_number(const char *option, const char *text, long max, long *out)
{
    char *end;
    long value = text != NULL ? strtol(text, &end, 10) : 0;
    if (text == NULL || *text < '0' || *text > '9' || *end != '\0' || value < 1 || value > max) {
        fprintf(stderr, "planewit batch: %s needs a number from 1 to %ld\n", option, max);
        return -1;
    }
    *out = value;
    return 0;
}

/* Options that take a value; 1 taken, 0 not one of them, -1 error printed. */
static int value_option(int argc, char **argv, int *i, batch_args *a)
{
    const char *name = argv[*i], *value = *i + 1 < argc ? argv[*i + 1] : NULL;
    long seconds;
    int rc;
    if (strcmp(name, "-j") != 0 && strcmp(name, "-o") != 0 && strcmp(name, "--shard") != 0 &&
        strcmp(name, "--progress-every") != 0)
        return 0;
    if (value == NULL) {
        fprintf(stderr, "planewit batch: %s needs a value\n", name);
        return -1;
    }
    if (strcmp(name, "-j") == 0) {
        rc = parse_number(name, value, 4096, &a->threads);
    } else if (strcmp(name, "--progress-every") == 0) {
        rc = parse_number(name, value, 86400, &seconds);
        a->progress_every = (double)seconds;
    } else if (strcmp(name, "--shard") == 0) {
        rc = batch_shard_parse("batch", value, &a->shard);
    } else {
        a->output = value;
        rc = 0;
    }
    *i += 1;
    return rc == 0 ? 1 : -1;
}

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, batch_args *a)
{
    for (int i = 1; i < argc; i++) {
        int taken = cli_limit_option(argc, argv, &i, &a->lim);
        if (taken == 0)
            taken = value_option(argc, argv, &i, a);
        if (taken < 0)
            return -1;
        if (taken > 0)
            continue;
        if (strcmp(argv[i], "-h") == 0 || strcmp(argv[i], "--help") == 0) {
            fputs(batch_usage, stdout);
            return 1;
        }
        if (strcmp(argv[i], "--quiet") == 0) {
            a->quiet = 1;
        } else if (argv[i][0] == '-' && argv[i][1] != '\0') {
            fprintf(stderr, "planewit batch: unknown option '%s'\n", argv[i]);
            return -1;
        } else if (a->list == NULL) {
            a->list = argv[i];
        } else {
            fprintf(stderr, "planewit batch: unexpected argument '%s'\n", argv[i]);
            return -1;
        }
    }
    if (a->list == NULL) {
        fputs("planewit batch: needs a jobs list\n", stderr);
        return -1;
    }
    return 0;
}

static unsigned default_threads(void)
{
    long online = sysconf(_SC_NPROCESSORS_ONLN);
    return online > 0 && online <= 4096 ? (unsigned)online : 1;
}

/* Runs the batch into the open output; the exit status. */
static int run(const batch_args *a, const job_list *list, cli_output *out)
{
    batch_config config = {list, a->shard, a->lim,
                           a->threads > 0 ? (unsigned)a->threads : default_threads()};
    batch_summary summary;
    batch_progress progress;
    memset(&summary, 0, sizeof summary);
    progress_start(&progress, batch_shard_size(&a->shard, list->count), a->quiet,
                   a->progress_every);
    int rc = batch_run(&config, out->file, &summary, &progress);
    progress_finish(&progress);
    if (rc == -2) {
        /* Workers may still be inside a long job, using the list: end here, freeing
           nothing.  _exit, not exit: exit handlers must not run under a running job
           (a coverage build's counter dump did, and recorded negative counts). */
        cli_output_abort(out);
        fprintf(stderr, "planewit batch: interrupted; %s was not written\n", a->output);
        _exit(128 + (int)cli_interrupted);
    }
    if (rc != 0 || cli_output_commit(out) != 0) {
        if (rc != 0)
            cli_output_abort(out);
        fprintf(stderr, "planewit batch: %s was not written\n", a->output);
        return CLI_EXIT_USAGE;
    }
    summary_print(stderr, &summary, progress_clock() - progress.started, config.threads);
    return summary_all_good(&summary) ? 0 : 1;
}

/*
 * Each job allocates and frees buffers of a few hundred kilobytes; by default
 * glibc maps and unmaps such blocks (and trims the heap) every time, which
 * costs more system time than the check itself.  Keep them in the heap.
 */
static void keep_freed_memory(void)
{
#ifdef __GLIBC__
    mallopt(M_MMAP_THRESHOLD, 32 << 20);
    mallopt(M_TRIM_THRESHOLD, 256 << 20);
#endif
}

int cmd_batch(int argc, char **argv)
{
    batch_args a = {NULL, "-", {0, 1}, 0, 0, 0, {0, 0, 0}};
    job_list list;
    cli_output out;
    pw_limits_default(&a.lim);
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0) {
        if (parsed < 0)
            fputs("Try 'planewit batch --help'.\n", stderr);
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    }
    if (job_list_read(&list, a.list, a.lim.max_bytes) != 0) {
        job_list_free(&list);
        return CLI_EXIT_USAGE;
    }
    cli_catch_interrupts();
    keep_freed_memory();
    int status = CLI_EXIT_USAGE;
    if (cli_output_open(&out, a.output) == 0)
        status = run(&a, &list, &out);
    job_list_free(&list);
    return status;
}
