/*
 * memory.c - the kernel's only allocation and input paths, so that limits and
 * overflow checks live in one place (and a test build can inject failures).
 */
#include "internal.h"

#include <stdlib.h>
#include <string.h>

#ifdef PW_FAULT_INJECTION
/* Test builds only (tests/fault/): every allocation and every SHA-256
   computation is counted, and the one whose 1-based number is
   pw_fault_fail_at fails; 0 fails none. */
unsigned long pw_fault_fail_at, pw_fault_count;
int pw_fault_now(void)
{
    return ++pw_fault_count == pw_fault_fail_at;
}
#endif

void pw_limits_default(pw_limits *lim)
{
    lim->max_bytes = (uint64_t)4 << 30;
    lim->max_vertices = 100000000u;
    lim->max_edges = 300000000u;
}

/* Kernel counts stay below 2^34 and sizes below 2^6, so the overflow test
   never fires on a 64-bit size_t; it is kept for smaller ones. */
void *pw_alloc(size_t n, size_t sz)
{
    size_t bytes = n * sz; /* unsigned: wraps, and then too_big holds */
    int too_big = sz != 0 && n > SIZE_MAX / sz;
    return too_big || pw_fault_now() ? NULL : malloc(bytes != 0 ? bytes : 1);
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
    /* Doubling from 64, at least need, at most UINT32_MAX entries. */
    uint64_t want = *cap ? (uint64_t)*cap * 2 : 64;
    want = want < need ? need : want > UINT32_MAX ? UINT32_MAX : want;
    void *q = want > SIZE_MAX / sz || pw_fault_now() ? NULL : realloc(*p, (size_t)want * sz);
    if (q == NULL)
        return -1;
    *p = q;
    *cap = (uint32_t)want;
    return 0;
}

pw_code pw_read_all(FILE *stream, uint64_t max_bytes, char **buf, size_t *len)
{
    size_t cap = 1 << 16, used = 0;
    char *data = pw_fault_now() ? NULL : malloc(cap);
    *buf = NULL;
    *len = 0;
    if (data == NULL)
        return PW_E_NOMEM;
    for (;;) {
        if (used == cap) {
            char *bigger = cap <= SIZE_MAX / 2 && !pw_fault_now() ? realloc(data, cap * 2) : NULL;
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
