/*
 * token_mutate.c - see token_mutate.h.  The text is cut into lines, a line
 * into tokens (runs between spaces and tabs); a step edits that list and the
 * text is joined again.
 */
#include "token_mutate.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

typedef struct {
    char **line;
    size_t n;
} lines;

static uint32_t next_random(uint32_t *state)
{
    /* xorshift32: reproducible from the seed, good enough to pick edits. */
    *state ^= *state << 13;
    *state ^= *state >> 17;
    *state ^= *state << 5;
    return *state;
}

static char *copy_of(const char *s, size_t n)
{
    char *c = malloc(n + 1);
    if (c == NULL)
        abort();
    memcpy(c, s, n);
    c[n] = '\0';
    return c;
}

static lines split_lines(const char *s, size_t n)
{
    lines l = {NULL, 0};
    l.line = malloc((n + 1) * sizeof *l.line);
    if (l.line == NULL)
        abort();
    for (size_t start = 0; start <= n;) {
        const char *lf = memchr(s + start, '\n', n - start);
        size_t end = lf ? (size_t)(lf - s) : n;
        l.line[l.n++] = copy_of(s + start, end - start);
        start = end + 1;
    }
    return l;
}

/* Start and length of the k-th token of a line; 0 if there are fewer. */
static int token_at(const char *line, size_t k, size_t *start, size_t *len)
{
    size_t i = 0, seen = 0;
    for (;;) {
        while (line[i] == ' ' || line[i] == '\t')
            i++;
        if (line[i] == '\0')
            return 0;
        size_t b = i;
        while (line[i] != '\0' && line[i] != ' ' && line[i] != '\t')
            i++;
        if (seen++ == k) {
            *start = b;
            *len = i - b;
            return 1;
        }
    }
}

static size_t token_count(const char *line)
{
    size_t k = 0, s, n;
    while (token_at(line, k, &s, &n))
        k++;
    return k;
}

static char *replace_span(const char *line, size_t start, size_t len, const char *with)
{
    size_t total = strlen(line), w = strlen(with);
    char *out = malloc(total - len + w + 1);
    if (out == NULL)
        abort();
    memcpy(out, line, start);
    memcpy(out + start, with, w);
    memcpy(out + start + w, line + start + len, total - start - len + 1);
    return out;
}

/*
 * A new value for a number token: one more, one less (not below 0 unless it
 * was negative: most numbers are ids), a small number, or rarely its
 * negation (coordinates may be negative; elsewhere that makes the file
 * unusable, which the grammar tests cover well already).
 */
static void new_number(const char *old, size_t len, uint32_t r, char *out, size_t room)
{
    char digits[32];
    size_t n = len < 31 ? len : 31;
    memcpy(digits, old, n);
    digits[n] = '\0';
    long long v = strtoll(digits, NULL, 10);
    if (v > (1LL << 40) || v < -(1LL << 40))
        v /= 2; /* huge (strtoll saturates): stay clear of overflow */
    switch (r % 8) {
    case 0: case 1: case 2: v += 1; break;
    case 3: case 4: v = v > 0 || v < 0 ? v - 1 : v + 1; break;
    case 5: case 6: v = (long long)(r >> 3) % 12; break;
    default: v = -v; break;
    }
    snprintf(out, room, "%lld", v);
}

static void edit_token(lines *l, uint32_t *rs)
{
    size_t i = next_random(rs) % l->n, count = token_count(l->line[i]), start, len;
    if (count == 0)
        return;
    size_t k = next_random(rs) % count;
    token_at(l->line[i], k, &start, &len);
    char value[32];
    uint32_t r = next_random(rs);
    if (r % 10 == 9) {
        value[0] = '\0'; /* drop the token */
    } else {
        if (l->line[i][start] != '-' && (l->line[i][start] < '0' || l->line[i][start] > '9'))
            return;
        new_number(l->line[i] + start, len, r / 10, value, sizeof value);
    }
    char *edited = replace_span(l->line[i], start, len, value);
    free(l->line[i]);
    l->line[i] = edited;
}

/* Swaps two tokens of one line (numbers mostly: the line keeps its shape). */
static void swap_tokens(lines *l, uint32_t *rs)
{
    size_t i = next_random(rs) % l->n, count = token_count(l->line[i]);
    if (count < 2)
        return;
    size_t a = next_random(rs) % count, b = next_random(rs) % count, sa, la, sb, lb;
    if (a == b)
        return;
    if (a > b) {
        size_t t = a;
        a = b;
        b = t;
    }
    token_at(l->line[i], a, &sa, &la);
    token_at(l->line[i], b, &sb, &lb);
    char *ta = copy_of(l->line[i] + sa, la), *tb = copy_of(l->line[i] + sb, lb);
    char *step = replace_span(l->line[i], sb, lb, ta);
    char *done = replace_span(step, sa, la, tb);
    free(ta);
    free(tb);
    free(step);
    free(l->line[i]);
    l->line[i] = done;
}

static void edit_lines(lines *l, uint32_t *rs)
{
    size_t a = next_random(rs) % l->n, b = next_random(rs) % l->n;
    switch (next_random(rs) % 3) {
    case 0: /* drop line a */
        free(l->line[a]);
        memmove(&l->line[a], &l->line[a + 1], (l->n - a - 1) * sizeof *l->line);
        l->n--;
        break;
    case 1: { /* repeat line a in place of line b */
        char *c = copy_of(l->line[a], strlen(l->line[a]));
        free(l->line[b]);
        l->line[b] = c;
        break;
    }
    default: { /* swap lines a and b */
        char *t = l->line[a];
        l->line[a] = l->line[b];
        l->line[b] = t;
    }
    }
}

/* Joins the lines into out (room bytes); the length, or room + 1 if too long. */
static size_t join(lines *l, char *out, size_t room)
{
    size_t used = 0;
    for (size_t i = 0; i < l->n; i++) {
        size_t n = strlen(l->line[i]) + (i + 1 < l->n);
        if (used + n > room)
            return room + 1;
        memcpy(out + used, l->line[i], n - (i + 1 < l->n));
        if (i + 1 < l->n)
            out[used + n - 1] = '\n';
        used += n;
    }
    return used;
}

static void free_lines(lines *l)
{
    for (size_t i = 0; i < l->n; i++)
        free(l->line[i]);
    free(l->line);
}

size_t token_mutate(uint8_t *data, size_t size, size_t max_size, uint32_t seed)
{
    uint32_t rs = seed | 1u;
    const uint8_t *nul = memchr(data, 0, size);
    size_t cut = nul ? (size_t)(nul - data) : size;
    int in_graph = nul == NULL || next_random(&rs) % 5 == 0;
    size_t from = in_graph ? 0 : cut + 1, to = in_graph ? cut : size;
    lines l = split_lines((const char *)data + from, to - from);
    for (uint32_t steps = 1 + next_random(&rs) % 3; steps > 0 && l.n > 0; steps--) {
        uint32_t kind = next_random(&rs) % 8;
        if (kind < 4)
            edit_token(&l, &rs);
        else if (kind < 6)
            swap_tokens(&l, &rs);
        else
            edit_lines(&l, &rs);
    }
    char *part = malloc(max_size + 1);
    if (part == NULL)
        abort();
    size_t tail = size - to, room = max_size >= from + tail ? max_size - from - tail : 0;
    size_t len = join(&l, part, room);
    if (len <= room) {
        memmove(data + from + len, data + to, tail);
        memcpy(data + from, part, len);
        size = from + len + tail;
    }
    free(part);
    free_lines(&l);
    return size;
}
