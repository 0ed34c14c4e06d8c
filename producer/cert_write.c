/*
 * cert_write.c - the certificate text: certify's, and draw's planar one
 * with its point lines (draw_cert.c).  At 10^7 edges the file has about
 * 2 * 10^7 numbers, so numbers are formatted by hand into a large buffer:
 * handed to stdio in big blocks, or, for the text certify and draw keep in
 * memory, one buffer sized up front from the counts, so the text is never
 * copied and its pages are touched once.
 */
#include <stdlib.h>
#include <string.h>

#include "pp_state.h"

#define OUT_BUFFER 65536
#define NUMBER_ROOM 22 /* space, sign and 20 digits */

typedef struct {
    FILE *out; /* NULL: the text stays in buf, which grows when needed */
    char *buf;
    size_t len, cap; /* cap >= OUT_BUFFER */
    int failed;
} writer;

static void flush(writer *w)
{
    if (w->len > 0 && !w->failed && fwrite(w->buf, 1, w->len, w->out) != w->len)
        w->failed = 1;
    w->len = 0;
}

/*
 * Makes room for `need` <= OUT_BUFFER more bytes: hands the buffer to the
 * file, or grows it.  After a failure the text is lost and writing goes on
 * into the start of the buffer, so callers need not check every step.
 */
static void make_room(writer *w, size_t need)
{
    if (w->len + need <= w->cap)
        return;
    if (w->out != NULL) {
        flush(w);
        return;
    }
    char *bigger = w->cap <= SIZE_MAX / 2 ? realloc(w->buf, 2 * w->cap) : NULL;
    if (bigger == NULL) {
        w->failed = 1;
        w->len = 0;
        return;
    }
    w->buf = bigger;
    w->cap *= 2;
}

static void put_text(writer *w, const char *text)
{
    size_t n = strlen(text);
    make_room(w, n);
    memcpy(w->buf + w->len, text, n);
    w->len += n;
}

/* "00" to "99": numbers are formatted two digits per division, which halves
   the work of a text that is mostly numbers. */
static const char digit_pairs[] =
    "0001020304050607080910111213141516171819"
    "2021222324252627282930313233343536373839"
    "4041424344454647484950515253545556575859"
    "6061626364656667686970717273747576777879"
    "8081828384858687888990919293949596979899";

/* Space, then the number ('-' before a negative one, never "-0"): the
   separator every list in the format uses. */
static void put_number(writer *w, int64_t x)
{
    char digits[20];
    size_t k = sizeof digits;
    uint64_t u = x < 0 ? (uint64_t)0 - (uint64_t)x : (uint64_t)x;
    make_room(w, NUMBER_ROOM);
    for (; u >= 100u; u /= 100u) {
        k -= 2;
        memcpy(digits + k, digit_pairs + 2 * (u % 100u), 2);
    }
    if (u >= 10u) {
        k -= 2;
        memcpy(digits + k, digit_pairs + 2 * u, 2);
    } else {
        digits[--k] = (char)('0' + u);
    }
    /* a local cursor: stores through a char pointer could alias w->len, which
       would then be reloaded and stored again for every byte */
    char *at = w->buf + w->len;
    *at++ = ' ';
    if (x < 0)
        *at++ = '-';
    memcpy(at, digits + k, sizeof digits - k);
    w->len = (size_t)(at + (sizeof digits - k) - w->buf);
}

static void put_header(writer *w, const unsigned char *sha)
{
    static const char hex[] = "0123456789abcdef";
    put_text(w, "certificate 1\n");
    if (sha == NULL)
        return;
    char line[13 + 64 + 2] = "graph-sha256 ";
    for (int i = 0; i < 32; i++) {
        line[13 + 2 * i] = hex[sha[i] >> 4];
        line[14 + 2 * i] = hex[sha[i] & 15];
    }
    line[77] = '\n';
    line[78] = '\0';
    put_text(w, line);
}

/* The neighbour look-ups go to g->ends at random (ids are arbitrary), so
   each is started PP_AHEAD darts early; rot itself is read in order. */
static void put_rotation(writer *w, const pw_graph *g, const uint32_t *rot)
{
    uint32_t darts = 2 * g->m;
    put_text(w, "claim planar\n");
    for (uint32_t v = 0; v < g->n; v++) {
        put_text(w, "around");
        put_number(w, v);
        put_text(w, " :");
        for (uint32_t i = v < g->n_adj ? g->first[v] : 0; v < g->n_adj && i < g->first[v + 1]; i++) {
            if (i + PP_AHEAD < darts)
                PP_PREFETCH(&g->ends[rot[i + PP_AHEAD] ^ 1u]);
            put_number(w, g->ends[rot[i] ^ 1u]);
        }
        put_text(w, "\n");
    }
}

static void put_subdivision(writer *w, const pp_result *r)
{
    int k5 = r->kind == PP_K5;
    put_text(w, "claim nonplanar\n");
    put_text(w, k5 ? "subdivision k5" : "subdivision k33");
    for (int i = 0; i < (k5 ? 5 : 6); i++) {
        if (!k5 && i == 3)
            put_text(w, " /");
        put_number(w, r->branch[i]);
    }
    put_text(w, "\n");
    for (int p = 0; p < (k5 ? 10 : 9); p++) {
        put_text(w, "path");
        for (uint32_t i = r->path_start[p]; i < r->path_start[p + 1]; i++)
            put_number(w, r->path[i]);
        put_text(w, "\n");
    }
}

/* Every point line: "point v : x y". */
static void put_points(writer *w, uint32_t n, const int64_t *x, const int64_t *y)
{
    for (uint32_t v = 0; v < n; v++) {
        put_text(w, "point");
        put_number(w, v);
        put_text(w, " :");
        put_number(w, x[v]);
        put_number(w, y[v]);
        put_text(w, "\n");
    }
}

/* To a file through a 64 KiB buffer: NULL when memory runs out. */
static writer *writer_open(FILE *out)
{
    writer *w = malloc(sizeof *w);
    if (w != NULL && (w->buf = malloc(OUT_BUFFER)) == NULL) {
        free(w);
        w = NULL;
    }
    if (w != NULL) {
        w->out = out;
        w->len = 0;
        w->cap = OUT_BUFFER;
        w->failed = 0;
    }
    return w;
}

/* Flushes and frees w: 0, or -1 when any write failed. */
static int writer_close(writer *w)
{
    flush(w);
    int failed = w->failed || fflush(w->out) != 0;
    free(w->buf);
    free(w);
    return failed ? -1 : 0;
}

int pp_write_cert(FILE *out, const pw_graph *g, const pp_result *r,
                  const unsigned char *graph_sha256)
{
    writer *w = writer_open(out);
    if (w == NULL)
        return -1;
    put_header(w, graph_sha256);
    if (r->kind == PP_PLANAR)
        put_rotation(w, g, r->rot);
    else
        put_subdivision(w, r);
    return writer_close(w);
}

/*
 * The longest text the counts allow: header lines, then per vertex an around
 * line of at most 20 bytes plus a number per dart, and a point line of at
 * most 5 + 3 numbers + 3 bytes.
 */
static size_t drawing_text_bound(const pw_graph *g)
{
    return 200 + (size_t)g->n * (20 + 5 + 3 * NUMBER_ROOM + 3) + 2 * (size_t)g->m * NUMBER_ROOM;
}

/* Bytes of a vertex id with its space: ids are below n. */
static size_t id_room(uint32_t n)
{
    size_t room = 2;
    for (uint32_t x = n > 0 ? n - 1 : 0; x >= 10; x /= 10)
        room++;
    return room;
}

/*
 * The longest text the counts allow: header lines (with the room make_room
 * asks beyond the last number), then an around line of "around v :" and a
 * number per dart, or the branch vertices and the path numbers.
 */
static size_t cert_text_bound(const pw_graph *g, const pp_result *r)
{
    size_t id = id_room(g->n), fixed = 200 + NUMBER_ROOM;
    if (r->kind == PP_PLANAR)
        return fixed + (size_t)g->n * (9 + id) + 2 * (size_t)g->m * id;
    return fixed + 10 * (5 + 1) + (6 + (size_t)r->path_start[pp_path_count(r)]) * id;
}

/* A writer over *buf, which is replaced by a fresh block when it holds fewer
   than `bound` bytes (at least OUT_BUFFER): nothing in it is kept, so a fresh
   block, not a copying realloc. */
static int memory_writer(writer *w, char **buf, size_t *cap, size_t bound)
{
    if (bound < OUT_BUFFER)
        bound = OUT_BUFFER;
    if (*buf == NULL || *cap < bound) {
        free(*buf);
        *cap = 0;
        if ((*buf = pp_alloc_large(bound)) == NULL)
            return -1;
        *cap = bound;
    }
    *w = (writer){NULL, *buf, 0, *cap, 0};
    return 0;
}

/* Hands a memory writer's buffer (perhaps grown) back, with the text's length. */
static int memory_done(const writer *w, char **buf, size_t *cap, size_t *len)
{
    *buf = w->buf;
    *cap = w->cap;
    *len = w->failed ? 0 : w->len;
    return w->failed ? -1 : 0;
}

int pp_cert_text(const pw_graph *g, const pp_result *r, const unsigned char *graph_sha256,
                 char **buf, size_t *cap, size_t *len)
{
    writer w;
    *len = 0;
    if (memory_writer(&w, buf, cap, cert_text_bound(g, r)) != 0)
        return -1;
    put_header(&w, graph_sha256);
    if (r->kind == PP_PLANAR)
        put_rotation(&w, g, r->rot);
    else
        put_subdivision(&w, r);
    return memory_done(&w, buf, cap, len);
}

int pp_bound_text(const pw_graph *g, const unsigned char *side, const unsigned char *graph_sha256,
                  char **buf, size_t *cap, size_t *len)
{
    writer w;
    *len = 0;
    if (memory_writer(&w, buf, cap, 256 + 2 * (size_t)g->n) != 0)
        return -1;
    put_header(&w, graph_sha256);
    put_text(&w, side == NULL ? "claim nonplanar\nedge-bound\n"
                              : "claim nonplanar\nbipartite-edge-bound\nside :");
    if (side != NULL) {
        for (uint32_t v = 0; v < g->n; v++)
            put_text(&w, side[v] ? " 1" : " 0");
        put_text(&w, "\n");
    }
    return memory_done(&w, buf, cap, len);
}

int pp_drawing_cert_text(const pw_graph *g, const uint32_t *rot, const int64_t *x,
                         const int64_t *y, const unsigned char *graph_sha256, char **text,
                         size_t *len)
{
    char *buf = NULL;
    size_t cap = 0;
    writer w;
    *text = NULL;
    *len = 0;
    if (memory_writer(&w, &buf, &cap, drawing_text_bound(g)) != 0)
        return -1;
    put_header(&w, graph_sha256);
    put_rotation(&w, g, rot);
    put_points(&w, g->n, x, y);
    if (memory_done(&w, &buf, &cap, len) != 0) {
        free(buf);
        return -1;
    }
    char *fitted = realloc(buf, *len + 1); /* give back the unused room */
    *text = fitted != NULL ? fitted : buf;
    return 0;
}
