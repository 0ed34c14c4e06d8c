/*
 * output.c - files written whole or not at all.  Output goes to a temporary
 * file beside the target; only a complete, flushed, synced file is renamed
 * over it, so an interrupted run leaves the old file or the new one, never a
 * torn one.  Path "-" writes to standard output, and a target that exists
 * but is not a regular file (a device such as /dev/null, a pipe) is written
 * directly: renaming over it would replace the device with a file.
 */
#include "cli.h"

#include <errno.h>
#include <fcntl.h>
#include <sys/stat.h>
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
    struct stat st;
    if (stat(path, &st) == 0 && !S_ISREG(st.st_mode)) {
        o->file = fopen(path, "wb");
        o->direct = 1;
        if (o->file == NULL)
            fprintf(stderr, "planewit: %s: cannot open: %s\n", path, strerror(errno));
        return o->file != NULL ? 0 : -1;
    }
    size_t n = strlen(path) + sizeof ".tmp-XXXXXX";
    o->temp = malloc(n);
    if (o->temp == NULL) {
        fprintf(stderr, "planewit: %s: out of memory\n", path);
        return -1;
    }
    snprintf(o->temp, n, "%s.tmp-XXXXXX", path);
    int fd = mkstemp(o->temp);
    /* mkstemp makes the file private; a finished output gets the usual mode. */
    mode_t mask = umask(0);
    umask(mask);
    if (fd >= 0)
        fchmod(fd, 0666 & ~mask);
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
    if (o->direct) {
        fclose(o->file);
        o->direct = 0;
        return;
    }
    if (o->temp == NULL)
        return;
    fclose(o->file);
    unlink(o->temp);
    free(o->temp);
    o->temp = NULL;
}

int cli_output_commit(cli_output *o)
{
    if (o->direct) {
        int failed = ferror(o->file) | fclose(o->file);
        o->direct = 0;
        return failed ? -1 : 0;
    }
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
