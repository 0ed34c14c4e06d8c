/*
 * standalone.c - a main() for the harnesses when libFuzzer is not linked:
 *   - under AFL++ (afl-clang-fast/afl-clang-lto define __AFL_FUZZ_TESTCASE_LEN):
 *     persistent mode with shared-memory test cases;
 *   - otherwise: runs each file named on the command line (or standard input
 *     when none is named) once, so a corpus or a crash can be replayed with
 *     any compiler, sanitizer or valgrind.
 */
#include "fuzz.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#ifdef __AFL_FUZZ_TESTCASE_LEN
#include <unistd.h>
/* AFL++'s test-case macros call read() and mix int with unsigned. */
#pragma clang diagnostic ignored "-Wsign-conversion"
#pragma clang diagnostic ignored "-Wshorten-64-to-32"
__AFL_FUZZ_INIT();

int main(void)
{
    __AFL_INIT();
    unsigned char *buf = __AFL_FUZZ_TESTCASE_BUF;
    while (__AFL_LOOP(10000)) {
        size_t len = (size_t)__AFL_FUZZ_TESTCASE_LEN;
        /* A copy of exactly len bytes, so that reads past the end are caught. */
        uint8_t *copy = malloc(len ? len : 1);
        if (copy == NULL)
            abort();
        for (size_t i = 0; i < len; i++)
            copy[i] = buf[i];
        LLVMFuzzerTestOneInput(copy, len);
        free(copy);
    }
    return 0;
}
#else
static int run_stream(FILE *f, const char *name)
{
    char *bytes;
    size_t len;
    if (pw_read_all(f, (uint64_t)1 << 30, &bytes, &len) != PW_OK) {
        fprintf(stderr, "standalone: %s: cannot read\n", name);
        return 1;
    }
    /* The reader's buffer is larger than the file: run on an exact copy. */
    uint8_t *copy = malloc(len ? len : 1);
    if (copy == NULL)
        abort();
    memcpy(copy, bytes, len);
    free(bytes);
    LLVMFuzzerTestOneInput(copy, len);
    free(copy);
    return 0;
}

int main(int argc, char **argv)
{
    int failures = 0;
    if (argc < 2)
        return run_stream(stdin, "<stdin>");
    for (int i = 1; i < argc; i++) {
        FILE *f = fopen(argv[i], "rb");
        if (f == NULL) {
            fprintf(stderr, "standalone: %s: cannot open\n", argv[i]);
            failures++;
            continue;
        }
        failures += run_stream(f, argv[i]);
        fclose(f);
    }
    printf("standalone: %d inputs run, %d unreadable\n", argc - 1, failures);
    return failures != 0;
}
#endif
