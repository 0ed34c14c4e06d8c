/*
 * alloc_failure.c - every allocation of the kernel may fail, and each
 * failure must end in a clean verdict: status PW_UNUSABLE, reason
 * out-of-memory, no crash, no leak (this program runs under ASan/LSan, or
 * valgrind).  Built only with -DPW_FAULT_INJECTION (checker/memory.c), into
 * its own build folder: the hook does not exist in the real kernel.
 *
 * For every vector of vectors/MANIFEST: read both files with pw_read_all
 * and check them once with no failure, counting K allocations; then, for
 * each k = 1 .. K, run the same again with the k-th allocation failing.
 * Runs up to the k-th allocation are identical (the kernel is
 * deterministic), so the k-th allocation is reached and must be reported.
 */
#include "planewit.h"
#include "vector_list.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

extern unsigned long pw_fault_fail_at, pw_fault_count;

static pw_code read_file(const char *path, char **buf, size_t *len)
{
    char full[512];
    snprintf(full, sizeof full, "vectors/%s", path);
    FILE *f = fopen(full, "rb");
    if (f == NULL)
        return PW_E_READ;
    pw_code code = pw_read_all(f, (uint64_t)1 << 30, buf, len);
    fclose(f);
    return code;
}

/* One run with allocation number fail_at failing (0: none); fills *v. */
static void run(const vector_case *c, unsigned long fail_at, pw_verdict *v)
{
    char *graph = NULL, *cert = NULL;
    size_t glen = 0, clen = 0;
    pw_limits lim;
    pw_limits_default(&lim);
    pw_fault_fail_at = fail_at;
    pw_fault_count = 0;
    memset(v, 0, sizeof *v);
    pw_code code = read_file(c->graph, &graph, &glen);
    if (code == PW_OK)
        code = read_file(c->cert, &cert, &clen);
    if (code == PW_OK) {
        pw_check(graph, glen, cert, clen, &lim, v);
    } else {
        v->status = PW_UNUSABLE;
        v->code = code;
    }
    free(graph);
    free(cert);
    pw_fault_fail_at = 0;
}

/* Returns the number of failed expectations for this vector. */
static unsigned long exercise(const vector_case *c, unsigned long *runs)
{
    pw_verdict v;
    unsigned long failures = 0;
    run(c, 0, &v);
    unsigned long total = pw_fault_count;
    if (strcmp(pw_code_name(v.code), c->reason) != 0) {
        fprintf(stderr, "%s: without faults the reason is %s, MANIFEST says %s\n", c->name,
                pw_code_name(v.code), c->reason);
        failures++;
    }
    for (unsigned long k = 1; k <= total; k++) {
        run(c, k, &v);
        (*runs)++;
        if (v.status != PW_UNUSABLE || v.code != PW_E_NOMEM) {
            fprintf(stderr, "%s: allocation %lu of %lu failed, verdict %s (status %d): %s\n",
                    c->name, k, total, pw_code_name(v.code), (int)v.status, v.detail);
            failures++;
        }
    }
    return failures;
}

int main(void)
{
    vector_case *cases;
    size_t n = vector_list_read("vectors", &cases);
    unsigned long failures = 0, runs = 0;
    if (n == 0)
        return 2;
    for (size_t i = 0; i < n; i++)
        failures += exercise(&cases[i], &runs);
    printf("alloc_failure: %zu vectors, %lu runs with one failed allocation, %lu wrong verdicts\n",
           n, runs, failures);
    free(cases);
    return failures != 0;
}
