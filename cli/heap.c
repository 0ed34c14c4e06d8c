/*
 * heap.c - the memory policy of a process that runs one large job.
 *
 * A drawing at 10^6 edges touches some 150 MB, mostly at random.  With
 * glibc's defaults every large array is a mapping of its own: faulted in 4 KiB
 * at a time, unmapped when freed, and faulted again by the next phase.  On a
 * virtual machine those faults, and the TLB misses of random access over 4 KiB
 * pages, cost about a quarter of the run.  So, for such a process only: every
 * block comes from the one heap, freed blocks stay there for the next phase,
 * and room for the whole job is set aside at once and offered to the kernel as
 * transparent huge pages.  What is computed never depends on this; elsewhere
 * than glibc, or without huge pages, it does nothing or only part.  The
 * price is peak memory: freed blocks stay resident, and a zeroed block taken
 * from them is written whole, where a fresh mapping is zero for free (certify
 * at 10^6 edges: 138 MB against 120 MB without), so a caller may set a limit.
 */
#define _DEFAULT_SOURCE /* madvise's MADV_HUGEPAGE where the system has it */
#include "cli.h"

#include <limits.h>
#include <stdint.h>
#include <stdlib.h>
#include <sys/mman.h>
#include <sys/stat.h>

#ifdef __GLIBC__
#include <malloc.h>
#endif

#define HUGE_PAGE ((uintptr_t)2 << 20)
#define SMALL_JOB ((uint64_t)4 << 20)  /* below this input size: the defaults do */
#define ROOM_PER_BYTE 16               /* peak memory is about 11 x the graph file */
#define ROOM_MAX ((uint64_t)1 << 30)   /* below the trim threshold set here */

/* Sets aside `room` bytes at the top of the heap and marks them for huge pages. */
static void set_aside(size_t room)
{
    char *block = malloc(room);
    if (block == NULL)
        return;
#ifdef MADV_HUGEPAGE
    uintptr_t from = ((uintptr_t)block + HUGE_PAGE - 1) & ~(HUGE_PAGE - 1);
    uintptr_t to = ((uintptr_t)block + room) & ~(HUGE_PAGE - 1);
    if (to > from)
        madvise((void *)from, to - from, MADV_HUGEPAGE);
#endif
    free(block); /* back to the heap's top, untouched, kept by the trim threshold */
}

void cli_heap_for_one_job(const char *graph_path, uint64_t largest)
{
    struct stat st;
    if (stat(graph_path, &st) != 0 || !S_ISREG(st.st_mode) || (uint64_t)st.st_size < SMALL_JOB ||
        (uint64_t)st.st_size > largest)
        return;
    uint64_t room = (uint64_t)st.st_size * ROOM_PER_BYTE;
#ifdef __GLIBC__
    if (mallopt(M_MMAP_MAX, 0) != 1 || mallopt(M_TRIM_THRESHOLD, INT_MAX) != 1)
        return;
    set_aside((size_t)(room < ROOM_MAX ? room : ROOM_MAX));
#else
    (void)room;
    (void)set_aside;
#endif
}
