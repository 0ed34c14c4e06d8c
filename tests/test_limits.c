/*
 * test_limits.c - the kernel's hard ceiling on certificate text, which keeps
 * every count in a pw_cert below 2^32 (format-spec/limits.md).  The text is a
 * read-only anonymous mapping of 8 GiB that is never touched, so the test
 * costs no memory; it is kept out of the valgrind set, whose address space
 * cannot hold such a mapping.
 */
#define _DEFAULT_SOURCE /* MAP_ANONYMOUS, MAP_NORESERVE */
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <cmocka.h>
#include <string.h>
#include <sys/mman.h>

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

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(certificate_longer_than_the_ceiling_is_refused_unread),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
