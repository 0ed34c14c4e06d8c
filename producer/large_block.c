/*
 * large_block.c - memory for the producer's large arrays and texts.
 *
 * Blocks of 4 MiB and more are aligned to 2 MiB and offered to the kernel as
 * huge-page candidates.  The engine's arrays are touched at random, and a
 * certificate text of 10^7 edges is some 150 MB touched once: on virtual
 * machines a first-touch fault per 4 KiB page costs about 12 us here, which
 * was half of the text's time at that size (and the TLB misses of random
 * access over 4 KiB pages cost more again).  Freed with free().
 */
#define _DEFAULT_SOURCE /* madvise's MADV_HUGEPAGE where the system has it */
#include <stdlib.h>
#include <sys/mman.h>

#include "pp_state.h"

void *pp_alloc_large(size_t bytes)
{
    const size_t huge = (size_t)2 << 20;
    if (bytes < 2 * huge)
        return malloc(bytes);
    void *p = NULL;
    if (posix_memalign(&p, huge, bytes) != 0)
        return NULL;
#ifdef MADV_HUGEPAGE
    madvise(p, bytes - bytes % huge, MADV_HUGEPAGE);
#endif
    return p;
}
