/*
 * graph6.c - one graph6 record, the dense text format nauty's generators
 * write, into an edge list.
 *
 *     record = size adjacency
 *     size   = one byte 63+N                    for N <= 62
 *            | '~' and three bytes of 6 bits    for N <= 258047
 *            | '~~' and six bytes of 6 bits     for N <= 68719476735
 *     adjacency = ceil(N(N-1)/2 / 6) bytes, each 63 + six bits: the upper
 *            triangle column by column (0-1, 0-2, 1-2, 0-3, ...), most
 *            significant bit first, padded with zero bits.
 *
 * Every byte must lie in 63..126, the length must be exact and the padding
 * zero: a record that is not exactly what the format prescribes is refused.
 * (A size written in a longer form than it needs is read as written; nauty
 * writes the shortest form, and the longer one is not ambiguous.)  The size
 * is checked against the limit and the record's actual length before any
 * edge is stored, so no allocation follows from N alone.
 */
#include "import.h"

#include <stdarg.h>
#include <string.h>

#define GRAPH6_BIAS 63
#define GRAPH6_TOP 126

static int fault(graph6_fault *f, size_t offset, const char *fmt, ...)
    __attribute__((format(printf, 3, 4)));

static int fault(graph6_fault *f, size_t offset, const char *fmt, ...)
{
    va_list ap;
    f->offset = offset;
    va_start(ap, fmt);
    vsnprintf(f->what, sizeof f->what, fmt, ap);
    va_end(ap);
    return -1;
}

size_t graph6_header_length(const char *line, size_t len)
{
    static const char header[] = ">>graph6<<";
    return len >= sizeof header - 1 && memcmp(line, header, sizeof header - 1) == 0
               ? sizeof header - 1
               : 0;
}

static int check_byte(const unsigned char *s, size_t i, graph6_fault *f)
{
    if (s[i] >= GRAPH6_BIAS && s[i] <= GRAPH6_TOP)
        return 0;
    if (i == 0 && s[0] == ':')
        return fault(f, 0, "found a sparse6 record (':'), only graph6 is read");
    if (i == 0 && s[0] == '&')
        return fault(f, 0, "found a digraph6 record ('&'), only graph6 is read");
    return fault(f, i, "expected a graph6 byte from 63 ('?') to 126 ('~'), found 0x%02x", s[i]);
}

/* Reads the size field; sets *used to its length in bytes. */
static int read_size(const unsigned char *s, size_t len, uint64_t *n, size_t *used,
                     graph6_fault *f)
{
    size_t digits;
    if (len == 0)
        return fault(f, 0, "expected a graph6 record, found an empty line");
    if (check_byte(s, 0, f) != 0)
        return -1;
    if (s[0] < GRAPH6_TOP) {
        *n = (uint64_t)(s[0] - GRAPH6_BIAS);
        *used = 1;
        return 0;
    }
    digits = len >= 2 && s[1] == GRAPH6_TOP ? 6 : 3;
    *used = (digits == 6 ? 2 : 1) + digits;
    if (len < *used)
        return fault(f, len, "the size field needs %zu bytes, the record ends after %zu",
                     *used, len);
    *n = 0;
    for (size_t i = *used - digits; i < *used; i++) {
        if (check_byte(s, i, f) != 0)
            return -1;
        *n = (*n << 6) | (uint64_t)(s[i] - GRAPH6_BIAS);
    }
    return 0;
}

/* Adds the edges of the six bits in one adjacency byte; (i, j) walks the upper triangle. */
static int add_bits(edge_list *el, unsigned bits, uint32_t *i, uint32_t *j)
{
    for (unsigned mask = 32; mask != 0; mask >>= 1) {
        if ((bits & mask) && edge_list_add(el, *i, *j) != 0)
            return -1;
        if (++*i == *j) {
            *i = 0;
            ++*j;
        }
    }
    return 0;
}

static int read_adjacency(const unsigned char *s, size_t len, size_t at, uint64_t pairs,
                          const pw_limits *lim, edge_list *el, graph6_fault *f)
{
    uint32_t i = 0, j = 1;
    for (size_t k = at; k < len; k++) {
        if (check_byte(s, k, f) != 0)
            return -1;
        unsigned bits = (unsigned)(s[k] - GRAPH6_BIAS);
        if (k + 1 == len && pairs % 6 != 0 && (bits & ((1u << (6 - pairs % 6)) - 1)) != 0)
            return fault(f, k, "the padding bits of the last byte must be zero");
        if (add_bits(el, bits, &i, &j) != 0)
            return -2;
        if (el->m > lim->max_edges)
            return fault(f, k, "more than %u edges (raise the limit with --max-edges)",
                         lim->max_edges);
    }
    return 0;
}

int graph6_decode(const char *record, size_t len, const pw_limits *lim, edge_list *el,
                  graph6_fault *f)
{
    const unsigned char *s = (const unsigned char *)record;
    uint64_t n = 0;
    size_t used = 0;
    el->m = 0;
    el->n = 0;
    el->self_loops = el->repeats = 0;
    if (read_size(s, len, &n, &used, f) != 0)
        return -1;
    if (n > lim->max_vertices)
        return fault(f, 0, "N = %llu exceeds the limit %u (raise it with --max-vertices)",
                     (unsigned long long)n, lim->max_vertices);
    uint64_t pairs = n * (n - (n > 0)) / 2, want = (pairs + 5) / 6;
    if (len - used != want)
        return fault(f, len - used < want ? len : used + (size_t)want,
                     "N = %llu needs %llu adjacency bytes, the record has %zu",
                     (unsigned long long)n, (unsigned long long)want, len - used);
    el->n = (uint32_t)n;
    return read_adjacency(s, len, used, pairs, lim, el, f);
}
