/*
 * output.c - files written whole or not at all.  Output goes to a temporary
 * file beside the target; only a complete, flushed, synced file is renamed
 * over it, so an interrupted run leaves the old file or the new one, never a
 * torn one.  Path "-" writes to standard output directly.
 */
#include "cli.h"

#include <errno.h>
#include <fcntl.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

int cli_output_open(cli_output *o, const char *path)
{
    memset(o, 0, sizeof *o);
    o->path = path;
    if (strcmp(path, "-") == 0) {
        o->file = stdout;
        return 0;
    }
    size_t n = strlen(path) + sizeof ".tmp-XXXXXX";
    o->temp = malloc(n);
    if (o->temp == NULL) {
        fprintf(stderr, "planewit: %s: out of memory\n", path);
        return -1;
    }
    snprintf(o->temp, n, "%s.tmp-XXXXXX", path);
    int fd = mkstemp(o->temp);
    if (fd < 0 || (o->file = fdopen(fd, "wb")) == NULL) {
        fprintf(stderr, "planewit: %s: cannot create: %s\n", path, strerror(errno));
        if (fd >= 0) {
            close(fd);
            unlink(o->temp);
        }
        free(o->temp);
        o->temp = NULL;
        return -1;
    }
    return 0;
}

void cli_output_abort(cli_output *o)
{
    if (o->temp == NULL)
        return;
    fclose(o->file);
    unlink(o->temp);
    free(o->temp);
    o->temp = NULL;
}

int cli_output_commit(cli_output *o)
{
    if (o->temp == NULL)
        return fflush(o->file) == 0 && !ferror(o->file) ? 0 : -1;
    int ok = fflush(o->file) == 0 && !ferror(o->file) && fsync(fileno(o->file)) == 0;
    if (fclose(o->file) != 0)
        ok = 0;
    if (ok && rename(o->temp, o->path) != 0)
        ok = 0;
    if (!ok) {
        fprintf(stderr, "planewit: %s: cannot write: %s\n", o->path, strerror(errno));
        unlink(o->temp);
    }
    free(o->temp);
    o->temp = NULL;
    return ok ? 0 : -1;
}
