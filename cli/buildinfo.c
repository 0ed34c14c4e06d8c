/*
 * buildinfo.c - what this binary is: compiler, build flags, the vector set it
 * was built and qualified against, and the SHA-256 of its own executable.
 *
 * The PW_BUILD_* and PW_VECTOR_SET_SHA256 strings are passed by the Makefile
 * with -D when this one file is compiled (see the rule for buildinfo.o), so
 * changing the flags or vectors/SHA256SUMS rebuilds it.  A build outside the
 * Makefile gets "unknown" and no vector-set digest, and records say so.
 */
#include "cli.h"

#ifndef PW_BUILD_CC
#define PW_BUILD_CC "unknown"
#endif
#ifndef PW_BUILD_CFLAGS
#define PW_BUILD_CFLAGS "unknown"
#endif
#ifndef PW_VECTOR_SET_SHA256
#define PW_VECTOR_SET_SHA256 ""
#endif

const char *cli_build_compiler(void)
{
    return PW_BUILD_CC;
}

const char *cli_build_flags(void)
{
    return PW_BUILD_CFLAGS;
}

const char *cli_build_vector_set(void)
{
    static const char digest[] = PW_VECTOR_SET_SHA256;
    return sizeof digest == 65 ? digest : NULL;
}

int cli_self_sha256(unsigned char out[32])
{
    return cli_sha256_file("/proc/self/exe", out);
}
