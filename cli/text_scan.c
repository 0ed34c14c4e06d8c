/*
 * text_scan.c - lines and tokens of the text formats import reads (DIMACS,
 * edge lists).  Lines end with LF or CRLF, the last may lack one; only TAB
 * and printable ASCII may appear, so a stray binary file or a UTF-8 name is
 * refused with its line and column rather than misread.
 */
#include "import.h"

#include <stdarg.h>
#include <stdint.h>
#include <string.h>

void text_scan_init(text_scan *ts, const cli_input *in, const char *who, int hash_comments)
{
    memset(ts, 0, sizeof *ts);
    ts->who = who;
    ts->hash_comments = hash_comments;
    ts->path = strcmp(in->path, "-") == 0 ? "<stdin>" : in->path;
    ts->buf = in->bytes;
    ts->len = in->len;
}

static int is_blank(char c)
{
    return c == ' ' || c == '\t';
}

int text_scan_error(const text_scan *ts, const char *fmt, ...)
{
    va_list ap;
    fprintf(stderr, "%s: %s line %llu: ", ts->who, ts->path, (unsigned long long)ts->line);
    va_start(ap, fmt);
    vfprintf(stderr, fmt, ap);
    va_end(ap);
    fputc('\n', stderr);
    return -1;
}

int text_scan_fail(const text_scan *ts, const char *expected, const char *token, size_t len)
{
    if (len == 0 && ts->cur < ts->end)
        return text_scan_error(ts, "expected %s, found '%c'", expected, *ts->cur);
    if (len == 0)
        return text_scan_error(ts, "expected %s, found the end of the line", expected);
    return text_scan_error(ts, "expected %s, found '%.*s'", expected, len > 40 ? 40 : (int)len,
                           token);
}

/* One physical line: its bytes are checked, its content bounds set. */
static int scan_line(text_scan *ts)
{
    size_t start = ts->next, i = start, content_end = SIZE_MAX;
    ts->line++;
    for (; i < ts->len && ts->buf[i] != '\n'; i++) {
        unsigned char c = (unsigned char)ts->buf[i];
        int crlf = c == '\r' && i + 1 < ts->len && ts->buf[i + 1] == '\n';
        if (!crlf && c != '\t' && (c < 0x20 || c > 0x7e))
            return text_scan_error(ts, "byte 0x%02x at column %zu: expected printable ASCII text",
                                   c, i - start + 1);
        if ((crlf || (c == '#' && ts->hash_comments)) && content_end == SIZE_MAX)
            content_end = i;
    }
    ts->cur = ts->buf + start;
    ts->end = ts->buf + (content_end == SIZE_MAX ? i : content_end);
    ts->next = i < ts->len ? i + 1 : ts->len;
    return 0;
}

int text_scan_line(text_scan *ts)
{
    while (ts->next < ts->len) {
        if (scan_line(ts) != 0)
            return -1;
        if (!text_scan_at_end(ts))
            return 1;
    }
    return 0;
}

int text_scan_at_end(text_scan *ts)
{
    while (ts->cur < ts->end && is_blank(*ts->cur))
        ts->cur++;
    return ts->cur == ts->end;
}

size_t text_scan_token(text_scan *ts, const char *stops, const char **token)
{
    text_scan_at_end(ts);
    *token = ts->cur;
    while (ts->cur < ts->end && !is_blank(*ts->cur) && strchr(stops, *ts->cur) == NULL)
        ts->cur++;
    return (size_t)(ts->cur - *token);
}

int text_scan_number(text_scan *ts, const char *what, uint64_t max, uint64_t *out)
{
    const char *tok;
    size_t len = text_scan_token(ts, "", &tok);
    uint64_t value = 0;
    if (len == 0 || (tok[0] == '0' && len > 1))
        return text_scan_fail(ts, what, tok, len);
    for (size_t i = 0; i < len; i++) {
        if (tok[i] < '0' || tok[i] > '9')
            return text_scan_fail(ts, what, tok, len);
        uint64_t digit = (uint64_t)(tok[i] - '0');
        if (value > max / 10 || digit > max - value * 10)
            return text_scan_error(ts, "%s '%.*s' is larger than %llu", what,
                                   len > 40 ? 40 : (int)len, tok, (unsigned long long)max);
        value = value * 10 + digit;
    }
    *out = value;
    return 0;
}

int text_scan_expect_end(text_scan *ts)
{
    const char *tok;
    if (text_scan_at_end(ts))
        return 0;
    size_t len = text_scan_token(ts, "", &tok);
    return text_scan_fail(ts, "the end of the line", tok, len);
}

int text_scan_expect_word(text_scan *ts, const char *word)
{
    const char *tok;
    char quoted[64];
    size_t len = text_scan_token(ts, "", &tok);
    if (len == strlen(word) && memcmp(tok, word, len) == 0)
        return 0;
    snprintf(quoted, sizeof quoted, "'%s'", word);
    return text_scan_fail(ts, quoted, tok, len);
}
