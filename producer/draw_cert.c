/*
 * draw_cert.c - the planar certificate with coordinates, as text in memory
 * (format-spec/certificate.md): the kernel reads these very bytes before any
 * of them is written to a file.
 */
#include "draw.h"

#include <stdlib.h>
#include <string.h>

typedef struct {
    char *text;
    size_t len, cap;
    int failed;
} text_buf;

static void reserve(text_buf *b, size_t more)
{
    if (b->failed || b->len + more <= b->cap)
        return;
    size_t cap = b->cap ? b->cap : 4096;
    while (cap < b->len + more)
        cap *= 2;
    char *grown = realloc(b->text, cap);
    if (grown == NULL) {
        b->failed = 1;
        return;
    }
    b->text = grown;
    b->cap = cap;
}

static void put_str(text_buf *b, const char *s)
{
    size_t n = strlen(s);
    reserve(b, n);
    if (!b->failed) {
        memcpy(b->text + b->len, s, n);
        b->len += n;
    }
}

/* A space, then the integer (negative ones with '-', never "-0"). */
static void put_int(text_buf *b, int64_t value)
{
    char digits[24];
    size_t k = 0;
    uint64_t u = value < 0 ? (uint64_t)0 - (uint64_t)value : (uint64_t)value;
    do {
        digits[k++] = (char)('0' + u % 10);
        u /= 10;
    } while (u > 0);
    reserve(b, k + 2);
    if (b->failed)
        return;
    b->text[b->len++] = ' ';
    if (value < 0)
        b->text[b->len++] = '-';
    while (k > 0)
        b->text[b->len++] = digits[--k];
}

static void put_header(text_buf *b, const unsigned char *graph_sha256)
{
    static const char hex[] = "0123456789abcdef";
    put_str(b, "certificate 1\n");
    if (graph_sha256 != NULL) {
        char line[64 + sizeof "graph-sha256 \n"];
        memcpy(line, "graph-sha256 ", 13);
        for (int i = 0; i < 32; i++) {
            line[13 + 2 * i] = hex[graph_sha256[i] >> 4];
            line[14 + 2 * i] = hex[graph_sha256[i] & 15];
        }
        memcpy(line + 77, "\n", 2);
        put_str(b, line);
    }
    put_str(b, "claim planar\n");
}

int pd_cert_text(const pw_graph *g, const uint32_t *rot, const pd_drawing *d,
                 const unsigned char *graph_sha256, char **text, size_t *len)
{
    text_buf b = {NULL, 0, 0, 0};
    put_header(&b, graph_sha256);
    for (uint32_t v = 0; v < g->n && !b.failed; v++) {
        put_str(&b, "around");
        put_int(&b, v);
        put_str(&b, " :");
        for (uint32_t i = v < g->n_adj ? g->first[v] : 0; v < g->n_adj && i < g->first[v + 1]; i++)
            put_int(&b, g->ends[rot[i] ^ 1u]);
        put_str(&b, "\n");
    }
    for (uint32_t v = 0; v < g->n && !b.failed; v++) {
        put_str(&b, "point");
        put_int(&b, v);
        put_str(&b, " :");
        put_int(&b, d->x[v]);
        put_int(&b, d->y[v]);
        put_str(&b, "\n");
    }
    reserve(&b, 1);
    if (b.failed) {
        free(b.text);
        return -1;
    }
    b.text[b.len] = '\0';
    *text = b.text;
    *len = b.len;
    return 0;
}
