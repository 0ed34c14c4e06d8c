/*
 * memory.c - the kernel's only allocation and input paths, so that limits and
 * overflow checks live in one place (and a test build can inject failures).
 */
#include "internal.h"

#include <stdlib.h>
#include <string.h>

#ifdef PW_FAULT_INJECTION
/* Test builds only (tests/fault/): every allocation is counted, and the one
   whose 1-based number is pw_fault_fail_at fails; 0 fails none. */
unsigned long pw_fault_fail_at, pw_fault_count;
static int fault_now(void)
{
    return ++pw_fault_count == pw_fault_fail_at;
}
#else
#define fault_now() 0
#endif

void pw_limits_default(pw_limits *lim)
{
    lim->max_bytes = (uint64_t)4 << 30;
    lim->max_vertices = 100000000u;
    lim->max_edges = 300000000u;
}

void *pw_alloc(size_t n, size_t sz)
{
    if (sz != 0 && n > SIZE_MAX / sz)
        return NULL;
    size_t bytes = n * sz;
    return fault_now() ? NULL : malloc(bytes ? bytes : 1);
}

void *pw_zalloc(size_t n, size_t sz)
{
    void *p = pw_alloc(n, sz);
    if (p != NULL)
        memset(p, 0, n * sz);
    return p;
}

int pw_grow(void **p, uint32_t *cap, uint32_t need, size_t sz)
{
    if (need <= *cap)
        return 0;
    uint64_t want = *cap ? (uint64_t)*cap * 2 : 64;
    if (want < need)
        want = need;
    if (want > UINT32_MAX)
        want = UINT32_MAX;
    if (want > SIZE_MAX / sz)
        return -1;
    void *q = fault_now() ? NULL : realloc(*p, (size_t)want * sz);
    if (q == NULL)
        return -1;
    *p = q;
    *cap = (uint32_t)want;
    return 0;
}

pw_code pw_read_all(FILE *stream, uint64_t max_bytes, char **buf, size_t *len)
{
    size_t cap = 1 << 16, used = 0;
    char *data = fault_now() ? NULL : malloc(cap);
    *buf = NULL;
    *len = 0;
    if (data == NULL)
        return PW_E_NOMEM;
    for (;;) {
        if (used == cap) {
            char *bigger = cap <= SIZE_MAX / 2 && !fault_now() ? realloc(data, cap * 2) : NULL;
            if (bigger == NULL) {
                free(data);
                return PW_E_NOMEM;
            }
            data = bigger;
            cap *= 2;
        }
        size_t got = fread(data + used, 1, cap - used, stream);
        used += got;
        if ((uint64_t)used > max_bytes) {
            free(data);
            return PW_E_LIMIT;
        }
        if (got == 0)
            break;
    }
    if (ferror(stream)) {
        free(data);
        return PW_E_READ;
    }
    *buf = data;
    *len = used;
    return PW_OK;
}
