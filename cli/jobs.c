/*
 * jobs.c - the jobs list of `planewit batch` (format-spec/jobs-list.md).
 *
 * One job per line:  GRAPH CERT [planar|nonplanar]
 * Tokens are separated by spaces or tabs; '#' starts a comment; blank lines
 * are ignored; LF or CRLF line ends.  Paths are printable ASCII other than
 * '#', relative to the list's folder unless they start with '/'.  Any other
 * line is an error naming the list, the line and what was expected: the list
 * is parsed whole before any job runs, so a typo never yields half a batch.
 */
#include "batch.h"

#include <fcntl.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

static int list_error(const char *list, uint64_t line, const char *what, const char *token)
{
    fprintf(stderr, "planewit batch: %s line %llu: %s", list, (unsigned long long)line, what);
    if (token != NULL)
        fprintf(stderr, ", found '%.60s'", token);
    fputc('\n', stderr);
    return -1;
}

/* Cuts a NUL-terminated line at its comment and checks its bytes. */
static int clean_line(char *line, const char *list, uint64_t number)
{
    for (char *p = line; *p; p++) {
        unsigned char b = (unsigned char)*p;
        if (b == '#') {
            *p = '\0';
            return 0;
        }
        if ((b < 0x21 || b > 0x7e) && b != ' ' && b != '\t') {
            char what[120];
            snprintf(what, sizeof what, "byte 0x%02x is not allowed (paths are printable ASCII "
                     "without spaces or '#')", b);
            return list_error(list, number, what, NULL);
        }
    }
    return 0;
}

/* Splits a cleaned line into at most 4 tokens (the 4th only to report it). */
static int split_tokens(char *line, char *tokens[4])
{
    int n = 0;
    for (char *save = NULL, *t = strtok_r(line, " \t", &save); t != NULL && n < 4;
         t = strtok_r(NULL, " \t", &save))
        tokens[n++] = t;
    return n;
}

/* 1 job added, 0 blank line, -1 error printed. */
static int parse_job(char *line, const char *list, uint64_t number, batch_job *job)
{
    char *tokens[4];
    if (clean_line(line, list, number) != 0)
        return -1;
    int n = split_tokens(line, tokens);
    if (n == 0)
        return 0;
    if (n == 1)
        return list_error(list, number, "expected GRAPH CERT [planar|nonplanar], but the line "
                          "has one field", NULL);
    if (n == 4)
        return list_error(list, number, "expected at most 3 fields", tokens[3]);
    job->graph = tokens[0];
    job->cert = tokens[1];
    job->line = number;
    job->expected = PW_CLAIM_NONE;
    if (n == 3 && strcmp(tokens[2], "planar") == 0)
        job->expected = PW_CLAIM_PLANAR;
    else if (n == 3 && strcmp(tokens[2], "nonplanar") == 0)
        job->expected = PW_CLAIM_NONPLANAR;
    else if (n == 3)
        return list_error(list, number, "expected claim 'planar' or 'nonplanar'", tokens[2]);
    return 1;
}

/* The list's folder with its trailing '/', or "" when the list names none. */
static char *folder_of(const char *path)
{
    const char *slash = strrchr(path, '/');
    size_t n = slash != NULL && strcmp(path, "-") != 0 ? (size_t)(slash - path) + 1 : 0;
    char *folder = malloc(n + 1);
    if (folder != NULL) {
        memcpy(folder, path, n);
        folder[n] = '\0';
    }
    return folder;
}

static int parse_lines(job_list *list, const char *path)
{
    char *at = list->text.bytes, *end = at + list->text.len;
    for (uint64_t number = 1; at < end; number++) {
        char *newline = memchr(at, '\n', (size_t)(end - at));
        char *stop = newline != NULL ? newline : end;
        if (memchr(at, '\0', (size_t)(stop - at)) != NULL)
            return list_error(path, number, "a NUL byte is not allowed", NULL);
        *stop = '\0';
        if (stop > at && stop[-1] == '\r')
            stop[-1] = '\0';
        int got = parse_job(at, path, number, &list->jobs[list->count]);
        if (got < 0)
            return -1;
        list->count += (size_t)got;
        at = stop + 1;
    }
    return 0;
}

int job_list_read(job_list *list, const char *path, uint64_t max_bytes)
{
    pw_limits lim;
    memset(list, 0, sizeof *list);
    list->dir = -1;
    pw_limits_default(&lim);
    lim.max_bytes = max_bytes;
    if (cli_read_input(&list->text, path, &lim) != 0)
        return -1;
    size_t lines = 1;
    for (size_t i = 0; i < list->text.len; i++)
        lines += list->text.bytes[i] == '\n';
    char *text = realloc(list->text.bytes, list->text.len + 1);
    list->jobs = malloc(lines * sizeof *list->jobs);
    list->folder = folder_of(path);
    if (text != NULL)
        list->text.bytes = text;
    if (text == NULL || list->jobs == NULL || list->folder == NULL) {
        fprintf(stderr, "planewit batch: %s: out of memory\n", path);
        return -1;
    }
    text[list->text.len] = '\0';
    if (parse_lines(list, path) != 0)
        return -1;
    if (list->count == 0) {
        fprintf(stderr, "planewit batch: %s: no jobs (expected lines GRAPH CERT "
                "[planar|nonplanar])\n", path);
        return -1;
    }
    list->dir = open(list->folder[0] != '\0' ? list->folder : ".", O_RDONLY | O_DIRECTORY | O_CLOEXEC);
    return 0;
}

void job_list_free(job_list *list)
{
    cli_free_input(&list->text);
    free(list->jobs);
    free(list->folder);
    if (list->dir >= 0)
        close(list->dir);
    memset(list, 0, sizeof *list);
    list->dir = -1;
}

int job_list_resolve(const job_list *list, const char *listed, char *out, size_t size)
{
    const char *folder = listed[0] == '/' ? "" : list->folder;
    int n = snprintf(out, size, "%s%s", folder, listed);
    return n >= 0 && (size_t)n < size ? 0 : -1;
}
