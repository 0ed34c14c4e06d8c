/*
 * sums.c - reading SHA256SUMS, the format `sha256sum -c` reads: per line 64
 * lowercase hex digits, two spaces (or a space and '*', binary mode) and a
 * path relative to the folder.  Strict: any other line is an error with its
 * line number, never skipped.  Names sha256sum would escape (a leading
 * backslash) are refused, as seal never writes them.
 */
#include "archive.h"

#include <stdlib.h>
#include <string.h>

static int sums_error(const char *file, size_t line, const char *what)
{
    fprintf(stderr, "planewit: %s line %zu: %s\n", file, line, what);
    return -1;
}

static int is_hex64(const char *s)
{
    for (int i = 0; i < 64; i++)
        if (!((s[i] >= '0' && s[i] <= '9') || (s[i] >= 'a' && s[i] <= 'f')))
            return 0;
    return 1;
}

/* Parses one line without its LF into *e; 0 or -1 after printing why. */
static int parse_entry(char *text, const char *file, size_t line, sums_entry *e)
{
    if (text[0] == '\\')
        return sums_error(file, line, "escaped file names are not supported");
    if (strlen(text) < 67 || !is_hex64(text) || text[64] != ' ' ||
        (text[65] != ' ' && text[65] != '*'))
        return sums_error(file, line, "expected 64 lowercase hex digits, two spaces (or ' *') "
                                      "and a path");
    memcpy(e->hex, text, 64);
    e->hex[64] = '\0';
    e->path = strdup(text + 66);
    return e->path != NULL ? 0 : sums_error(file, line, "out of memory");
}

static int compare_entries(const void *a, const void *b)
{
    return strcmp(((const sums_entry *)a)->path, ((const sums_entry *)b)->path);
}

static int grow(sums_entry **entries, size_t *cap)
{
    size_t more = *cap ? *cap * 2 : 64;
    sums_entry *bigger = realloc(*entries, more * sizeof *bigger);
    if (bigger == NULL)
        return -1;
    *entries = bigger;
    *cap = more;
    return 0;
}

static int read_lines(FILE *f, const char *file, sums_entry **entries, size_t *count)
{
    char *text = NULL;
    size_t size = 0, cap = 0, line = 0;
    ssize_t got;
    int rc = 0;
    while (rc == 0 && (got = getline(&text, &size, f)) > 0) {
        line++;
        if (text[got - 1] != '\n') {
            rc = sums_error(file, line, "the last line has no line end");
            break;
        }
        text[got - 1] = '\0';
        if (*count == cap && grow(entries, &cap) != 0) {
            rc = sums_error(file, line, "out of memory");
            break;
        }
        rc = parse_entry(text, file, line, &(*entries)[*count]);
        if (rc == 0)
            (*count)++;
    }
    free(text);
    return rc;
}

int sums_read(const char *file, sums_entry **entries, size_t *count)
{
    FILE *f = fopen(file, "rb");
    *entries = NULL;
    *count = 0;
    if (f == NULL) {
        fprintf(stderr, "planewit: %s: cannot open\n", file);
        return -1;
    }
    int rc = read_lines(f, file, entries, count);
    fclose(f);
    if (rc == 0 && *count > 1)
        qsort(*entries, *count, sizeof **entries, compare_entries);
    for (size_t i = 1; rc == 0 && i < *count; i++)
        if (strcmp((*entries)[i - 1].path, (*entries)[i].path) == 0) {
            fprintf(stderr, "planewit: %s: %s is listed twice\n", file, (*entries)[i].path);
            rc = -1;
        }
    return rc;
}

void sums_free(sums_entry *entries, size_t count)
{
    for (size_t i = 0; i < count; i++)
        free(entries[i].path);
    free(entries);
}
