/*
 * fuzz_differential.c - the kernel against the independent oracle (oracle.h)
 * on a (graph, certificate) pair split from one input (fuzz.h).  Seeds are
 * the committed vectors; the custom mutator edits lines and tokens
 * (token_mutate.h) so that mutated certificates stay readable and test the
 * rules, not only the grammar.  Any disagreement on the status - accepted,
 * rejected or unusable - is a finding.
 *
 * (producer/ has no certify API yet; once it has, certify a fuzzed graph here
 * and mutate the certificate it makes.)
 */
#include "differential.h"
#include "fuzz.h"
#include "token_mutate.h"

/* libFuzzer's byte mutator; absent (weak, NULL) in stand-alone and AFL++ builds. */
size_t LLVMFuzzerMutate(uint8_t *data, size_t size, size_t max_size) __attribute__((weak));
size_t LLVMFuzzerCustomMutator(uint8_t *data, size_t size, size_t max_size, unsigned int seed);

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    pw_status status;
    differential_compare(fuzz_split(data, size), 1, &status);
    return 0;
}

/* Mostly token edits; every fourth time libFuzzer's own byte mutations. */
size_t LLVMFuzzerCustomMutator(uint8_t *data, size_t size, size_t max_size, unsigned int seed)
{
    if (LLVMFuzzerMutate != NULL && (seed % 4 == 0 || size == 0))
        return LLVMFuzzerMutate(data, size, max_size);
    return token_mutate(data, size, max_size, seed);
}
