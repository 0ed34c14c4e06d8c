/*
 * vector_list.c - see vector_list.h.
 */
#include "vector_list.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

size_t vector_list_read(const char *dir, vector_case **cases)
{
    char path[512], line[1024];
    size_t n = 0;
    snprintf(path, sizeof path, "%s/MANIFEST", dir);
    FILE *f = fopen(path, "r");
    *cases = NULL;
    if (f == NULL) {
        fprintf(stderr, "%s: cannot open\n", path);
        return 0;
    }
    while (fgets(line, sizeof line, f) != NULL) {
        vector_case c;
        char *hash = strchr(line, '#');
        if (hash != NULL)
            *hash = '\0';
        if (sscanf(line, "%95s %159s %159s %15s %47s", c.name, c.graph, c.cert, c.verdict,
                   c.reason) != 5)
            continue;
        vector_case *more = realloc(*cases, (n + 1) * sizeof *more);
        if (more == NULL)
            abort();
        *cases = more;
        (*cases)[n++] = c;
    }
    fclose(f);
    return n;
}

char *vector_file(const char *dir, const char *path, size_t *len)
{
    char full[512];
    snprintf(full, sizeof full, "%s/%s", dir, path);
    FILE *f = fopen(full, "rb");
    if (f == NULL)
        return NULL;
    char *buf = NULL;
    size_t used = 0, got;
    char block[4096];
    while ((got = fread(block, 1, sizeof block, f)) > 0) {
        char *more = realloc(buf, used + got);
        if (more == NULL)
            abort();
        buf = more;
        memcpy(buf + used, block, got);
        used += got;
    }
    fclose(f);
    if (buf == NULL)
        buf = malloc(1);
    *len = used;
    return buf;
}
