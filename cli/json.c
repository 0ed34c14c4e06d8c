/* json.c - the two JSON primitives records need: strings and hex digests. */
#include "cli.h"

/*
 * Length of the well-formed UTF-8 sequence at p (2 to 4 bytes), or 0: no
 * overlong forms, no surrogates, nothing above U+10FFFF (RFC 3629, table 3-7
 * of the Unicode standard: the second byte's range depends on the first).
 */
static size_t utf8_length(const unsigned char *p)
{
    unsigned char lo = 0x80, hi = 0xbf;
    size_t n;
    if (p[0] >= 0xc2 && p[0] <= 0xdf)
        n = 2;
    else if (p[0] >= 0xe0 && p[0] <= 0xef)
        n = 3;
    else if (p[0] >= 0xf0 && p[0] <= 0xf4)
        n = 4;
    else
        return 0;
    if (p[0] == 0xe0)
        lo = 0xa0;
    else if (p[0] == 0xed)
        hi = 0x9f;
    else if (p[0] == 0xf0)
        lo = 0x90;
    else if (p[0] == 0xf4)
        hi = 0x8f;
    if (p[1] < lo || p[1] > hi)
        return 0;
    for (size_t i = 2; i < n; i++)
        if ((p[i] & 0xc0) != 0x80)
            return 0;
    return n;
}

/*
 * Paths are bytes.  Well-formed UTF-8 passes through as it is; any other byte
 * at or above 0x80 is written as \u00XX, so the record stays valid JSON.
 */
void json_string(FILE *out, const char *s)
{
    const unsigned char *p = (const unsigned char *)s;
    fputc('"', out);
    for (;;) {
        size_t plain = 0; /* printable ASCII needing no escape: one write per run, not per byte */
        while (p[plain] >= 0x20 && p[plain] < 0x7f && p[plain] != '"' && p[plain] != '\\')
            plain++;
        fwrite(p, 1, plain, out);
        p += plain;
        if (*p == '\0')
            break;
        size_t n = *p >= 0x80 ? utf8_length(p) : 0;
        if (n > 0)
            fwrite(p, 1, n, out);
        else if (*p == '"' || *p == '\\')
            fprintf(out, "\\%c", *p);
        else
            fprintf(out, "\\u%04x", *p);
        p += n > 0 ? n : 1;
    }
    fputc('"', out);
}

/* Digests go into every batch record: one write per 32 bytes, not one printf per byte. */
void json_hex(FILE *out, const unsigned char *bytes, size_t n)
{
    static const char digit[] = "0123456789abcdef";
    char chunk[2 * 32];
    fputc('"', out);
    for (size_t done = 0; done < n;) {
        size_t take = n - done < 32 ? n - done : 32;
        for (size_t i = 0; i < take; i++) {
            chunk[2 * i] = digit[bytes[done + i] >> 4];
            chunk[2 * i + 1] = digit[bytes[done + i] & 15];
        }
        fwrite(chunk, 1, 2 * take, out);
        done += take;
    }
    fputc('"', out);
}
