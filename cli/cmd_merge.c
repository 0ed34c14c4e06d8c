/*
 * cmd_merge.c - `planewit merge SHARD... [-o FILE]`: the outputs of
 * `planewit batch --shard I/K`, K of them, put back into job order.  Every
 * line names its job and the list's job count ("job", "jobs": see
 * format-spec/jobs-list.md), so merge can prove that the shards cover the
 * list exactly once: a missing shard, a job twice or shards of different
 * lists are errors, never a silently short result.  The merged file equals,
 * byte for byte, the output of one unsharded run of the same binary.
 */
#include "cli.h"

#include <stdlib.h>
#include <string.h>

static const char merge_usage[] =
    "usage: planewit merge SHARD... [-o FILE]\n"
    "\n"
    "Merges the outputs of 'planewit batch --shard I/K' (any order of files) into the\n"
    "output one unsharded run would write, to FILE (whole or not at all) or standard\n"
    "output.  Fails (exit 2) if a job is missing or appears twice.\n";

typedef struct {
    char **lines;     /* by job number */
    size_t jobs;      /* the list's job count, from the first line read */
    const char *file; /* for messages */
    unsigned long long line;
} merge_state;

static int merge_error(const merge_state *m, const char *what)
{
    fprintf(stderr, "planewit merge: %s line %llu: %s\n", m->file, m->line, what);
    return -1;
}

/* Takes one output line (with its LF); 0 or -1 after printing why. */
static int take_line(merge_state *m, char *text)
{
    unsigned long long job, jobs;
    int used = 0;
    if (sscanf(text, "{\"job\":%llu,\"jobs\":%llu,%n", &job, &jobs, &used) != 2 || used == 0)
        return merge_error(m, "expected a line of 'planewit batch' output, starting "
                              "{\"job\":J,\"jobs\":T,");
    if (m->lines == NULL) {
        if (jobs == 0 || jobs > SIZE_MAX / sizeof *m->lines)
            return merge_error(m, "job count out of range");
        m->jobs = (size_t)jobs;
        m->lines = calloc(m->jobs, sizeof *m->lines);
        if (m->lines == NULL)
            return merge_error(m, "out of memory");
    }
    if (jobs != m->jobs)
        return merge_error(m, "from a list with another job count: shards of different lists?");
    if (job >= jobs)
        return merge_error(m, "job number beyond the job count");
    if (m->lines[job] != NULL)
        return merge_error(m, "this job is already in an earlier line or shard");
    m->lines[job] = strdup(text);
    return m->lines[job] != NULL ? 0 : merge_error(m, "out of memory");
}

static int read_shard(merge_state *m, const char *path)
{
    FILE *f = fopen(path, "rb");
    char *text = NULL;
    size_t size = 0;
    ssize_t got;
    int rc = 0;
    if (f == NULL) {
        fprintf(stderr, "planewit merge: %s: cannot open\n", path);
        return -1;
    }
    m->file = path;
    m->line = 0;
    while (rc == 0 && (got = getline(&text, &size, f)) > 0) {
        m->line++;
        if (text[got - 1] != '\n')
            rc = merge_error(m, "the last line has no line end: a torn file?");
        else
            rc = take_line(m, text);
    }
    if (rc == 0 && ferror(f))
        rc = merge_error(m, "read error");
    free(text);
    fclose(f);
    return rc;
}

static int write_merged(const merge_state *m, const char *output)
{
    cli_output o;
    for (size_t job = 0; job < m->jobs; job++)
        if (m->lines[job] == NULL) {
            fprintf(stderr, "planewit merge: job %zu of %zu is in none of the files: "
                    "a shard is missing\n", job, m->jobs);
            return -1;
        }
    if (cli_output_open(&o, output) != 0)
        return -1;
    for (size_t job = 0; job < m->jobs; job++)
        fputs(m->lines[job], o.file);
    return cli_output_commit(&o);
}

/* Reads every shard named in argv; 0, 1 help printed, or -1 error printed. */
static int read_arguments(int argc, char **argv, merge_state *m, const char **output)
{
    int files = 0;
    for (int i = 1; i < argc; i++) {
        if (strcmp(argv[i], "-h") == 0 || strcmp(argv[i], "--help") == 0) {
            fputs(merge_usage, stdout);
            return 1;
        }
        if (strcmp(argv[i], "-o") == 0 && i + 1 < argc) {
            *output = argv[++i];
        } else if (argv[i][0] == '-' && argv[i][1] != '\0') {
            fprintf(stderr, "planewit merge: unknown option '%s'\n", argv[i]);
            return -1;
        } else {
            files++;
            if (read_shard(m, argv[i]) != 0)
                return -1;
        }
    }
    if (files == 0 || m->lines == NULL) {
        fprintf(stderr, "planewit merge: %s\n",
                files == 0 ? "needs the shard outputs" : "no job lines in the files");
        return -1;
    }
    return 0;
}

int cmd_merge(int argc, char **argv)
{
    merge_state m = {NULL, 0, NULL, 0};
    const char *output = "-";
    int rc = read_arguments(argc, argv, &m, &output);
    if (rc == 0)
        rc = write_merged(&m, output);
    for (size_t job = 0; m.lines != NULL && job < m.jobs; job++)
        free(m.lines[job]);
    free(m.lines);
    return rc >= 0 ? 0 : CLI_EXIT_USAGE;
}
