/*
 * interrupt.c - Ctrl-C (SIGINT) and SIGTERM, which schedulers send before
 * they kill a job, only set a flag: the command notices it, removes its
 * temporary output and exits 128 + the signal's number.  The handler is reset
 * after the first signal, so a second Ctrl-C ends the process at once.
 */
#include "batch.h"

#include <string.h>

volatile sig_atomic_t cli_interrupted = 0;

static void note_signal(int sig)
{
    cli_interrupted = sig;
}

void cli_catch_interrupts(void)
{
    struct sigaction sa;
    memset(&sa, 0, sizeof sa);
    sa.sa_handler = note_signal;
    sa.sa_flags = (int)SA_RESETHAND;
    sigemptyset(&sa.sa_mask);
    sigaction(SIGINT, &sa, NULL);
    sigaction(SIGTERM, &sa, NULL);
}
