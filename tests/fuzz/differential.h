/*
 * differential.h - one comparison of the kernel's verdict with the oracle's.
 */
#ifndef PW_DIFFERENTIAL_H
#define PW_DIFFERENTIAL_H

#include "fuzz.h"

/* The graph limits both sides run with (small: the oracle is quadratic). */
#define DIFF_MAX_VERTICES 300u
#define DIFF_MAX_EDGES 3000u

/*
 * Runs both on the pair; returns 1 when they agree on the status, and sets
 * *status to the kernel's.  On a disagreement prints both verdicts and, if
 * fatal, aborts (a fuzz finding).  An out-of-memory verdict is not compared.
 */
int differential_compare(fuzz_pair p, int fatal, pw_status *status);

#endif
