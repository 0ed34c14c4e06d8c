/*
 * exit_mark.c - preloaded into a test's process (LD_PRELOAD) to tell whether
 * the process ran its exit handlers: this library's destructor creates the
 * file named by PW_EXIT_MARK, and runs on exit() but never on _exit() or a
 * signal.  tests/check_batch.sh uses it to show that an interrupted batch,
 * whose workers are still inside a job, does not run them.
 */
#include <stdio.h>
#include <stdlib.h>

__attribute__((destructor)) static void mark_exit(void)
{
    const char *path = getenv("PW_EXIT_MARK");
    FILE *f = path != NULL ? fopen(path, "w") : NULL;
    if (f != NULL)
        fclose(f);
}
