/*
 * internal.h - declarations shared by the kernel's files; not part of the
 * public contract (see planewit.h for that).
 */
#ifndef PW_INTERNAL_H
#define PW_INTERNAL_H

#include "planewit.h"

#include <string.h>

/* Hard ceiling on N and M: dart ids (2m) and vertex ids must fit uint32_t. */
#define PW_MAX_COUNT 2147483647u

/* ---- lex.c: the lexical rules of format-spec/lexical.md ---------------- */

typedef struct {
    const char *buf;
    size_t len;
    size_t next;      /* offset of the next unread line */
    uint64_t line;    /* 1-based number of the current line */
    const char *cur;  /* cursor inside the current line's content */
    const char *end;  /* end of content: before a comment or the line end */
    pw_file file;
    pw_verdict *v;
} pw_lexer;

typedef struct {
    const char *text;
    size_t len;
} pw_token;

void lex_init(pw_lexer *lx, const char *buf, size_t len, pw_file file, pw_verdict *v);
/* Moves to the next line holding a token: 1 found, 0 end of file, -1 bad byte. */
int lex_next_line(pw_lexer *lx);
/*
 * The per-token steps are inline: the parsers take every number through them.
 * They move a local cursor and store it once, since a store through lx->cur
 * inside the loop would be redone per byte (a char may alias it).
 */
#define LEX_IS_BLANK(c) ((c) == ' ' || (c) == '\t')

/* 1 when the current line has no token left. */
static inline int lex_at_end(pw_lexer *lx)
{
    const char *p = lx->cur;
    while (p < lx->end && LEX_IS_BLANK(*p))
        p++;
    lx->cur = p;
    return p == lx->end;
}

/* Takes the next token of the current line: 1 taken, 0 none left. */
static inline int lex_take(pw_lexer *lx, pw_token *t)
{
    if (lex_at_end(lx))
        return 0;
    const char *p = lx->cur;
    while (p < lx->end && !LEX_IS_BLANK(*p))
        p++;
    t->text = lx->cur;
    t->len = (size_t)(p - lx->cur);
    lx->cur = p;
    return 1;
}

/* The first token of a line that lex_next_line() has just found: there is one. */
static inline pw_token lex_first(pw_lexer *lx)
{
    pw_token t = {lx->cur, 0};
    lex_take(lx, &t);
    return t;
}

/* Comparing with a literal compiles to a few loads: no strlen or memcmp call. */
static inline int lex_is(const pw_token *t, const char *word)
{
    size_t n = strlen(word);
    return t->len == n && memcmp(t->text, word, n) == 0;
}

/* Each returns 0 on success, -1 with the verdict filled. */
int lex_expect(pw_lexer *lx, const char *word);
int lex_expect_end(pw_lexer *lx);
int lex_uint(pw_lexer *lx, const char *what, uint64_t *out);
int lex_int(pw_lexer *lx, const char *what, int64_t *out);
int lex_fail_token(pw_lexer *lx, pw_code code, const char *expected, const pw_token *t);
/* A token is shown in messages clipped to this many bytes. */
#define PW_TOKEN_SHOWN 32

/* ---- verdict.c ---------------------------------------------------------- */

/* Records the first failure; returns -1 so callers can `return pw_fail(...)`. */
int pw_fail(pw_verdict *v, pw_code code, pw_file file, uint64_t line,
            const char *fmt, ...) __attribute__((format(printf, 5, 6)));
void pw_verdict_init(pw_verdict *v);

/* ---- graph.c ------------------------------------------------------------ */

/* 1-based line of the graph file holding edge e (for messages only). */
uint64_t pw_graph_edge_line(const char *buf, size_t len, uint32_t e);
/* Degree of v; 0 for ids at or above n_adj. */
uint32_t pw_degree(const pw_graph *g, uint32_t v);
int pw_adjacent(const pw_graph *g, uint32_t a, uint32_t b);

/* ---- cert.c: a certificate as read, before any check -------------------- */

/* One line of the body: around, path, set or side. */
typedef struct {
    uint32_t key;     /* around: V; set: I (clipped to PW_NONE); else unused */
    uint32_t start;   /* first value in pw_cert.values */
    uint32_t count;   /* number of values */
    uint64_t line;
} pw_item;

/* One point line. */
typedef struct {
    uint32_t v;
    int32_t x, y;
    uint64_t line;
} pw_point;

typedef struct {
    pw_claim claim;
    pw_witness witness;
    int have_hash;
    unsigned char hash[32];
    uint64_t hash_line, head_line;
    uint32_t branch[6];      /* subdivision heads */
    pw_item *items;
    uint32_t n_items, cap_items;
    uint32_t *values;        /* vertex ids (side: 0/1, clipped to 2) */
    uint32_t n_values, cap_values;
    pw_point *points;
    uint32_t n_points, cap_points;
    /* The first vertex id >= N and the first coordinate beyond 2^30, in file
       order; the checks report them as rejections. */
    uint64_t bad_id, bad_id_line;
    int64_t bad_coord;
    uint64_t bad_coord_line;
} pw_cert;

int pw_cert_parse(const char *buf, size_t len, uint32_t n, pw_cert *c, pw_verdict *v);
/* The values of one line; NULL when no line of the file has any (no pointer arithmetic on NULL). */
uint32_t *pw_item_values(const pw_cert *c, const pw_item *it);
void pw_cert_free(pw_cert *c);

/* ---- the checks: 0 accepted, -1 with the verdict filled ----------------- */

/* On success the around lists in c->values hold darts instead of vertices. */
int pw_check_rotation(const pw_graph *g, pw_cert *c, pw_verdict *v);
/* After pw_check_rotation: the drawing given by the point lines. */
int pw_check_drawing(const pw_graph *g, const pw_cert *c, pw_verdict *v);
int pw_check_subdivision(const pw_graph *g, const pw_cert *c, pw_verdict *v);
int pw_check_minor(const pw_graph *g, const pw_cert *c, pw_verdict *v);
int pw_check_edge_bound(const pw_graph *g, const pw_cert *c, pw_verdict *v);
int pw_check_bipartite_bound(const pw_graph *g, const char *graph, size_t graph_len,
                             const pw_cert *c, pw_verdict *v);

/* ---- memory: every allocation of the kernel goes through here ----------- */

/* n elements of size sz, or NULL (overflow or no memory). */
void *pw_alloc(size_t n, size_t sz);
#ifdef PW_FAULT_INJECTION
/* Test builds only: 1 when the counted resource request is the one to fail. */
int pw_fault_now(void);
#else
#define pw_fault_now() 0
#endif
/* The same, zero-filled. */
void *pw_zalloc(size_t n, size_t sz);
/* Grows *p to hold at least need elements, doubling; 0 ok, -1 failure. */
int pw_grow(void **p, uint32_t *cap, uint32_t need, size_t sz);

#endif
