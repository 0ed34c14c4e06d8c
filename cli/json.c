/* json.c - the two JSON primitives records need: strings and hex digests. */
#include "cli.h"

void json_string(FILE *out, const char *s)
{
    fputc('"', out);
    for (const unsigned char *p = (const unsigned char *)s; *p; p++) {
        if (*p == '"' || *p == '\\')
            fprintf(out, "\\%c", *p);
        else if (*p < 0x20 || *p >= 0x7f)
            fprintf(out, "\\u%04x", *p);
        else
            fputc(*p, out);
    }
    fputc('"', out);
}

void json_hex(FILE *out, const unsigned char *bytes, size_t n)
{
    fputc('"', out);
    for (size_t i = 0; i < n; i++)
        fprintf(out, "%02x", bytes[i]);
    fputc('"', out);
}
