/*
 * fuzz.h - what the fuzz harnesses share: the limits they run the kernel
 * with, the split of one input into a graph and a certificate, and the one
 * way a harness reports a broken property (abort, which every fuzzer and
 * sanitizer treats as a finding).
 */
#ifndef PW_FUZZ_H
#define PW_FUZZ_H

#include "internal.h"

#include <stddef.h>
#include <stdint.h>

/* The entry point every harness defines (libFuzzer's name, also used by AFL++). */
int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

/*
 * Small limits: arrays sized by the largest vertex id stay small, so a run
 * finds faults instead of spending its time in memset.  The byte limit is the
 * file reader's business and does not apply to in-memory checks.
 */
void fuzz_limits(pw_limits *lim);

/*
 * One input holds both files: the graph's bytes, a NUL, the certificate's
 * bytes.  Without a NUL the whole input is the graph and the certificate is
 * empty.  The NUL is the split because no valid file contains one.
 */
typedef struct {
    const char *graph, *cert;
    size_t graph_len, cert_len;
} fuzz_pair;

fuzz_pair fuzz_split(const uint8_t *data, size_t size);

/* Aborts with "property violated: WHAT (file:line)" when cond is false. */
#define FUZZ_REQUIRE(cond, what) \
    ((cond) ? (void)0 : fuzz_violated(what, __FILE__, __LINE__))
void fuzz_violated(const char *what, const char *file, int line) __attribute__((noreturn));

/* The properties every verdict has, whatever the input (see fuzz_common.c). */
void fuzz_verdict_is_coherent(const pw_verdict *v);

#endif
