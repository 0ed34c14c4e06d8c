/*
 * lex.c - the lexical layer both file formats share (format-spec/lexical.md).
 *
 * A file is a sequence of lines ended by LF or CRLF (the last line may lack
 * one).  Allowed bytes: TAB, space to '~', LF, and CR only right before LF;
 * anything else makes the file malformed wherever it stands, comments too.
 * '#' starts a comment; tokens are separated by spaces and tabs only.
 */
#include "internal.h"

#include <string.h>

void lex_init(pw_lexer *lx, const char *buf, size_t len, pw_file file, pw_verdict *v)
{
    *lx = (pw_lexer){.buf = buf, .len = len, .file = file, .v = v};
}

/*
 * Bit 7 set in each byte of the eight at p that is not ordinary (space to '~'
 * but '#'), and perhaps in later ones: carries and borrows only run upwards
 * from a byte that is flagged itself, so the lowest flag is exact.
 */
static uint64_t unusual8(const char *p)
{
    uint64_t w, h, ones = 0x0101010101010101u;
    memcpy(&w, p, 8);
    h = w ^ 0x23 * ones;
    return ((w - 0x20 * ones) | (w + ones) | w | ((h - ones) & ~h)) & 0x80 * ones;
}

/* Scans one physical line from lx->next; sets content bounds or reports a byte. */
static int scan_line(pw_lexer *lx)
{
    const char *start = lx->buf + lx->next, *end = lx->buf + lx->len, *p = start, *content_end = NULL;
    lx->line++;
    for (; p < end; p++) {
        uint64_t m = 0; /* eight ordinary bytes at a time, then straight to the first other one */
        while (end - p >= 8 && (m = unusual8(p)) == 0)
            p += 8;
        p += m != 0 && __BYTE_ORDER__ == __ORDER_LITTLE_ENDIAN__ ? __builtin_ctzll(m) / 8 : 0;
        unsigned char c = p < end ? (unsigned char)*p : '\n';
        if ((unsigned char)(c - 0x20) < 0x5f && c != '#')
            continue; /* the last few bytes of the file, or a big-endian machine */
        if (c == '\n')
            break;
        if (c != '#' && c != '\t' && !(c == '\r' && p + 1 < end && p[1] == '\n'))
            return pw_fail(lx->v, PW_E_BYTE, lx->file, lx->line,
                           "byte 0x%02x at column %zu is not allowed (ASCII text only)", c,
                           (size_t)(p - start) + 1);
        if (content_end == NULL && c != '\t')
            content_end = p;
    }
    lx->cur = start;
    lx->end = content_end != NULL ? content_end : p;
    lx->next = p < end ? (size_t)(p - lx->buf) + 1 : lx->len;
    return 0;
}

int lex_next_line(pw_lexer *lx)
{
    while (lx->next < lx->len) {
        if (scan_line(lx) != 0)
            return -1;
        if (!lex_at_end(lx))
            return 1;
    }
    return 0;
}

int lex_fail_token(pw_lexer *lx, pw_code code, const char *expected, const pw_token *t)
{
    if (t == NULL)
        return pw_fail(lx->v, code, lx->file, lx->line, "expected %s, found end of line", expected);
    int shown = t->len > PW_TOKEN_SHOWN ? PW_TOKEN_SHOWN : (int)t->len;
    return pw_fail(lx->v, code, lx->file, lx->line, "expected %s, found '%.*s'%s", expected,
                   shown, t->text, t->len > PW_TOKEN_SHOWN ? "..." : "");
}

int lex_expect(pw_lexer *lx, const char *word)
{
    pw_token t;
    int got = lex_take(lx, &t);
    if (got && lex_is(&t, word))
        return 0;
    char expected[48];
    snprintf(expected, sizeof expected, "'%s'", word);
    return lex_fail_token(lx, PW_E_SYNTAX, expected, got ? &t : NULL);
}

int lex_expect_end(pw_lexer *lx)
{
    pw_token t;
    return lex_take(lx, &t) ? lex_fail_token(lx, PW_E_SYNTAX, "end of line", &t) : 0;
}

/* Canonical unsigned decimal: "0" or a nonzero digit followed by digits. */
static int digits_value(const pw_token *t, uint64_t *out)
{
    uint64_t value = 0;
    if (t->len == 0 || (t->text[0] == '0' && t->len > 1))
        return -1;
    for (size_t i = 0; i < t->len; i++) {
        unsigned d = (unsigned)(t->text[i] - '0');
        if (d > 9)
            return -1;
        if (value > UINT64_MAX / 10 || (value == UINT64_MAX / 10 && d > UINT64_MAX % 10))
            return -2;
        value = value * 10 + d;
    }
    *out = value;
    return 0;
}

static int number_failure(pw_lexer *lx, int why, const char *what, const char *form,
                          const char *range, const pw_token *t)
{
    char expected[96];
    if (why == -2) {
        snprintf(expected, sizeof expected, "%s %s", what, range);
        return lex_fail_token(lx, PW_E_RANGE, expected, t);
    }
    snprintf(expected, sizeof expected, "%s (%s)", what, form);
    return lex_fail_token(lx, PW_E_NUMBER, expected, t);
}

int lex_uint(pw_lexer *lx, const char *what, uint64_t *out)
{
    pw_token t;
    uint64_t value = 0;
    if (lex_at_end(lx))
        return lex_fail_token(lx, PW_E_SYNTAX, what, NULL);
    /* Fast path, one pass: up to nineteen digits (they always fit), then a blank or the end. */
    const char *p = lx->cur, *stop = lx->end - p > 19 ? p + 19 : lx->end;
    for (; p < stop && (unsigned)(*p - '0') <= 9; p++)
        value = value * 10 + (unsigned)(*p - '0');
    if ((p == lx->end || LEX_IS_BLANK(*p)) && (*lx->cur != '0' || p - lx->cur == 1)) {
        lx->cur = p;
        *out = value;
        return 0;
    }
    t = lex_first(lx); /* lex_at_end() said there is a token */
    int why = digits_value(&t, out);
    return why == 0 ? 0 : number_failure(lx, why, what, "decimal digits, no sign, no leading zero",
                                           "that fits in 64 bits", &t);
}

/* Signed form, used for coordinates only: an optional '-' before a nonzero number. */
int lex_int(pw_lexer *lx, const char *what, int64_t *out)
{
    pw_token t, digits;
    uint64_t magnitude = 0;
    if (!lex_take(lx, &t))
        return lex_fail_token(lx, PW_E_SYNTAX, what, NULL);
    int negative = t.text[0] == '-'; /* a token taken is never empty */
    digits.text = t.text + negative;
    digits.len = t.len - (size_t)negative;
    int why = digits_value(&digits, &magnitude);
    if (why == 0 && negative && magnitude == 0)
        why = -1;
    if (why == 0 && magnitude > (uint64_t)INT64_MAX)
        why = -2;
    if (why != 0)
        return number_failure(lx, why, what, "decimal digits, '-' allowed, no leading zero, no -0",
                              "of magnitude at most 2^63 - 1", &t);
    *out = negative ? -(int64_t)magnitude : (int64_t)magnitude;
    return 0;
}
