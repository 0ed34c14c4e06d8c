/*
 * oracle_text.c - see oracle_text.h.  Written from format-spec/lexical.md,
 * not from checker/lex.c: the file is checked byte by byte first, then cut
 * into lines, comments and tokens.
 */
#include "oracle_text.h"

#include <stdlib.h>
#include <string.h>

static int allowed(const char *buf, size_t len, size_t i)
{
    unsigned char c = (unsigned char)buf[i];
    if (c == '\r')
        return i + 1 < len && buf[i + 1] == '\n';
    return c == '\t' || c == '\n' || (c >= 0x20 && c < 0x7f);
}

/* Room for at least count + 1 elements, doubling at powers of two (amortised O(1)). */
static void *grow(void *p, size_t count, size_t size)
{
    if (count != 0 && (count & (count - 1)) != 0)
        return p;
    void *q = realloc(p, 2 * (count + 1) * size);
    if (q == NULL)
        abort();
    return q;
}

static void add_token(otext *t, const char *s, size_t n)
{
    t->toks = grow(t->toks, t->n_toks, sizeof *t->toks);
    t->toks[t->n_toks].s = s;
    t->toks[t->n_toks].n = n;
    t->n_toks++;
}

/* Tokens of one line's content [s, e). */
static void add_line(otext *t, const char *s, const char *e)
{
    size_t before = t->n_toks;
    const char *hash = memchr(s, '#', (size_t)(e - s));
    if (hash != NULL)
        e = hash;
    while (s < e) {
        while (s < e && (*s == ' ' || *s == '\t'))
            s++;
        const char *start = s;
        while (s < e && *s != ' ' && *s != '\t')
            s++;
        if (s > start)
            add_token(t, start, (size_t)(s - start));
    }
    if (t->n_toks == before)
        return;
    t->first = grow(t->first, t->n_lines, sizeof *t->first);
    t->count = grow(t->count, t->n_lines, sizeof *t->count);
    t->first[t->n_lines] = before;
    t->count[t->n_lines] = t->n_toks - before;
    t->n_lines++;
}

int otext_load(otext *t, const char *buf, size_t len)
{
    memset(t, 0, sizeof *t);
    for (size_t i = 0; i < len; i++)
        if (!allowed(buf, len, i))
            return -1;
    size_t start = 0;
    while (start < len) {
        const char *lf = memchr(buf + start, '\n', len - start);
        size_t end = lf ? (size_t)(lf - buf) : len;
        size_t content = end > start && buf[end - 1] == '\r' ? end - 1 : end;
        add_line(t, buf + start, buf + content);
        start = end + 1;
    }
    return 0;
}

void otext_free(otext *t)
{
    free(t->toks);
    free(t->first);
    free(t->count);
    memset(t, 0, sizeof *t);
}

otok otext_tok(const otext *t, size_t l, size_t k)
{
    return t->toks[t->first[l] + k];
}

int otok_is(otok t, const char *word)
{
    return strlen(word) == t.n && memcmp(t.s, word, t.n) == 0;
}

int otok_uint(otok t, uint64_t *v)
{
    unsigned __int128 value = 0;
    if (t.n == 0 || t.n > 20 || (t.s[0] == '0' && t.n > 1))
        return -1;
    for (size_t i = 0; i < t.n; i++) {
        if (t.s[i] < '0' || t.s[i] > '9')
            return -1;
        value = value * 10 + (unsigned)(t.s[i] - '0');
    }
    if (value > UINT64_MAX)
        return -1;
    *v = (uint64_t)value;
    return 0;
}

int otok_coord(otok t, int64_t *v)
{
    uint64_t magnitude;
    int negative = t.n > 0 && t.s[0] == '-';
    otok digits = {t.s + negative, t.n - (size_t)negative};
    if (otok_uint(digits, &magnitude) != 0 || (negative && magnitude == 0) ||
        magnitude > (uint64_t)INT64_MAX)
        return -1;
    *v = negative ? -(int64_t)magnitude : (int64_t)magnitude;
    return 0;
}
