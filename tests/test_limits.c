/*
 * test_limits.c - the kernel's memory: a hard ceiling on certificate text,
 * which keeps every count in a pw_cert below 2^32 (format-spec/limits.md), and
 * small inputs checked under a tight address-space limit.  The long text is a
 * read-only anonymous mapping of 8 GiB that is never touched, so the test
 * costs no memory; this program is kept out of the valgrind set, whose address
 * space cannot hold such a mapping.
 */
#define _DEFAULT_SOURCE /* MAP_ANONYMOUS, MAP_NORESERVE */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <stdio.h>
#include <string.h>
#include <sys/mman.h>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>

#include "internal.h"

static void certificate_longer_than_the_ceiling_is_refused_unread(void **state)
{
    const size_t ceiling = ((size_t)1 << 33) - 2;
    pw_cert c;
    pw_verdict v;
    (void)state;
    char *text = mmap(NULL, ceiling + 1, PROT_READ, MAP_PRIVATE | MAP_ANONYMOUS | MAP_NORESERVE, -1, 0);
    assert_true(text != MAP_FAILED);
    pw_verdict_init(&v);
    assert_int_equal(pw_cert_parse(text, ceiling + 1, 3, &c, &v), -1);
    assert_int_equal(v.code, PW_E_LIMIT);
    assert_int_equal(v.file, PW_FILE_CERT);
    assert_int_equal(v.line, 0);
    assert_string_equal(v.detail, "longer than 8589934590 bytes");
    pw_cert_free(&c);
    /* At the ceiling itself the parser reads: the zero bytes are refused at once. */
    pw_verdict_init(&v);
    assert_int_equal(pw_cert_parse(text, ceiling, 3, &c, &v), -1);
    assert_int_equal(v.code, PW_E_BYTE);
    pw_cert_free(&c);
    munmap(text, ceiling + 1);
}

static const char k33_graph[] = "graph 6 9\n0 3\n0 4\n0 5\n1 3\n1 4\n1 5\n2 3\n2 4\n2 5\n";
static const struct {
    const char *graph, *cert;
} small_cases[] = {
    {k33_graph, "certificate 1\nclaim nonplanar\nsubdivision k33 0 1 2 / 3 4 5\npath 0 3\npath 0 4\n"
                "path 0 5\npath 1 3\npath 1 4\npath 1 5\npath 2 3\npath 2 4\npath 2 5\n"},
    {k33_graph, "certificate 1\nclaim nonplanar\nminor k33\nset 0 : 0\nset 1 : 1\nset 2 : 2\n"
                "set 3 : 3\nset 4 : 4\nset 5 : 5\n"},
    {k33_graph, "certificate 1\nclaim nonplanar\nbipartite-edge-bound\nside : 0 0 0 1 1 1\n"},
    {"graph 3 3\n0 1\n1 2\n2 0\n", "certificate 1\nclaim planar\naround 0 : 1 2\naround 1 : 2 0\n"
                                  "around 2 : 0 1\npoint 0 : 0 0\npoint 1 : 4 0\npoint 2 : 0 4\n"},
};

/* In a child process: every small case accepted with at most `room` more bytes of address space. */
static int small_cases_fit(size_t room)
{
    unsigned long pages = 0;
    FILE *f = fopen("/proc/self/statm", "r");
    if (f == NULL || fscanf(f, "%lu", &pages) != 1)
        return 2;
    fclose(f);
    rlim_t now = (rlim_t)pages * (rlim_t)sysconf(_SC_PAGESIZE);
    struct rlimit cap = {now + room, now + room};
    if (setrlimit(RLIMIT_AS, &cap) != 0)
        return 2;
    pw_limits lim;
    pw_limits_default(&lim);
    for (size_t i = 0; i < sizeof small_cases / sizeof small_cases[0]; i++) {
        pw_verdict v;
        const char *g = small_cases[i].graph, *c = small_cases[i].cert;
        if (pw_check(g, strlen(g), c, strlen(c), &lim, &v) != PW_ACCEPTED) {
            fprintf(stderr, "small case %zu: %s\n", i, v.detail);
            return 1;
        }
    }
    return 0;
}

/*
 * The kernel sizes what it allocates by what it has read, so a certificate of
 * a few lines fits in 64 MiB of address space beyond what the process holds
 * (format-spec/limits.md).  A growth step that asked for far more than it
 * needs would still give the right verdict where memory is overcommitted, so
 * only a limit makes it visible.
 */
static void small_inputs_need_little_memory(void **state)
{
    (void)state;
    fflush(NULL);
    pid_t child = fork();
    assert_true(child >= 0);
    if (child == 0)
        _exit(small_cases_fit((size_t)64 << 20));
    int status = 0;
    assert_int_equal(waitpid(child, &status, 0), child);
    assert_true(WIFEXITED(status));
    assert_int_equal(WEXITSTATUS(status), 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(certificate_longer_than_the_ceiling_is_refused_unread),
        cmocka_unit_test(small_inputs_need_little_memory),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
