/*
 * manifest_check.c - every case of vectors/MANIFEST through pw_check, its
 * verdict and reason compared with the manifest (hashes are the vector
 * suite's business, tests/test_vectors.c), and every verdict coherent
 * (fuzz_common.c: status follows code, counts satisfy Euler's formula per
 * component).  Used by scripts/mutate.py as a quick killer that needs no
 * cmocka; prints each mismatch, exits 1 on any.
 */
#include "fuzz.h"
#include "vector_list.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

static const char *status_word(pw_status s)
{
    return s == PW_ACCEPTED ? "accepted" : s == PW_REJECTED ? "rejected" : "unusable";
}

int main(void)
{
    vector_case *cases;
    size_t n = vector_list_read("vectors", &cases), wrong = 0;
    pw_limits lim;
    pw_limits_default(&lim);
    for (size_t i = 0; i < n; i++) {
        size_t glen, clen;
        pw_verdict v;
        char *g = vector_file("vectors", cases[i].graph, &glen);
        char *c = vector_file("vectors", cases[i].cert, &clen);
        if (g == NULL || c == NULL) {
            fprintf(stderr, "%s: cannot read its files\n", cases[i].name);
            wrong++;
        } else {
            pw_check(g, glen, c, clen, &lim, &v);
            fuzz_verdict_is_coherent(&v);
            if (strcmp(status_word(v.status), cases[i].verdict) != 0 ||
                strcmp(pw_code_name(v.code), cases[i].reason) != 0) {
                fprintf(stderr, "%s: got %s %s, MANIFEST says %s %s\n", cases[i].name,
                        status_word(v.status), pw_code_name(v.code), cases[i].verdict,
                        cases[i].reason);
                wrong++;
            }
        }
        free(g);
        free(c);
    }
    printf("manifest_check: %zu cases, %zu wrong\n", n, wrong);
    free(cases);
    return n == 0 || wrong != 0;
}
