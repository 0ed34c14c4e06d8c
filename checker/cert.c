/*
 * cert.c - the certificate file (format-spec/certificate.md) into a pw_cert.
 *
 *     certificate 1
 *     graph-sha256 HEX64                      optional, only here
 *     claim planar | claim nonplanar
 *     planar body:    around V : W ...   |  point V : X Y          any order
 *     nonplanar body: one head line, then only the lines that head takes:
 *         subdivision k5 B0 .. B4           path V V ...
 *         subdivision k33 A0 A1 A2 / B0 B1 B2   path V V ...
 *         minor k5 | minor k33              set I : V ...
 *         edge-bound                        (nothing)
 *         bipartite-edge-bound              side : S ...
 *
 * Only the grammar is enforced here (an error makes the input unusable).
 * Counts, ranges and structure are the checks' business, so a vertex id >= N
 * is noted, not refused: the checks report the first one as a rejection.
 */
#include "internal.h"

#include <stdlib.h>
#include <string.h>

#define COORD_MAX ((int64_t)1 << 30)
/* Every value, line and point takes two bytes or more (a token and a separator),
   so a text no longer than this holds fewer than 2^32 - 1 of each: the counts
   below cannot wrap. */
#define MAX_CERT_BYTES (((uint64_t)1 << 33) - 2)

typedef struct {
    pw_lexer lx;
    pw_cert *c;
    uint32_t n;
} parser;

void pw_cert_free(pw_cert *c)
{
    free(c->items);
    free(c->values);
    free(c->points);
    memset(c, 0, sizeof *c);
}

uint32_t *pw_item_values(const pw_cert *c, const pw_item *it)
{
    return c->values != NULL ? c->values + it->start : NULL;
}

static int no_memory(parser *p)
{
    return pw_fail(p->lx.v, PW_E_NOMEM, PW_FILE_CERT, p->lx.line, "no memory for the certificate");
}

static int push_value(parser *p, uint32_t value)
{
    pw_cert *c = p->c;
    if (pw_grow((void **)&c->values, &c->cap_values, c->n_values + 1, sizeof *c->values) != 0)
        return no_memory(p);
    c->values[c->n_values++] = value;
    return 0;
}

static int push_item(parser *p, uint32_t key)
{
    pw_cert *c = p->c;
    if (pw_grow((void **)&c->items, &c->cap_items, c->n_items + 1, sizeof *c->items) != 0)
        return no_memory(p);
    pw_item *it = &c->items[c->n_items++];
    it->key = key;
    it->start = c->n_values;
    it->count = 0;
    it->line = p->lx.line;
    return 0;
}

/* A vertex id; one >= N becomes PW_NONE and the first is remembered. */
static int read_vertex(parser *p, uint32_t *out)
{
    uint64_t value;
    if (lex_uint(&p->lx, "a vertex id", &value) != 0)
        return -1;
    if (value >= p->n && p->c->bad_id_line == 0) {
        p->c->bad_id = value;
        p->c->bad_id_line = p->lx.line;
    }
    *out = value < p->n ? (uint32_t)value : PW_NONE;
    return 0;
}

/* Values up to the end of the line, appended to the last item. */
static int read_values(parser *p, int vertices, uint32_t clip)
{
    while (!lex_at_end(&p->lx)) {
        uint32_t value;
        uint64_t raw;
        if (vertices ? read_vertex(p, &value) : lex_uint(&p->lx, "0 or 1", &raw))
            return -1;
        if (!vertices)
            value = raw < clip ? (uint32_t)raw : clip;
        if (push_value(p, value) != 0)
            return -1;
        p->c->items[p->c->n_items - 1].count++;
    }
    return 0;
}

static int parse_around(parser *p)
{
    uint32_t v;
    if (read_vertex(p, &v) != 0 || lex_expect(&p->lx, ":") != 0 || push_item(p, v) != 0)
        return -1;
    return read_values(p, 1, 0);
}

/* A coordinate beyond 2^30 is noted like a vertex id beyond N, and stored as 0. */
static int read_coordinate(parser *p, int32_t *out)
{
    int64_t x;
    if (lex_int(&p->lx, "a coordinate", &x) != 0)
        return -1;
    if ((x > COORD_MAX || x < -COORD_MAX) && p->c->bad_coord_line == 0) {
        p->c->bad_coord = x;
        p->c->bad_coord_line = p->lx.line;
    }
    *out = x > COORD_MAX || x < -COORD_MAX ? 0 : (int32_t)x;
    return 0;
}

static int parse_point(parser *p)
{
    pw_point pt;
    pw_cert *c = p->c;
    if (read_vertex(p, &pt.v) != 0 || lex_expect(&p->lx, ":") != 0 ||
        read_coordinate(p, &pt.x) != 0 || read_coordinate(p, &pt.y) != 0 ||
        lex_expect_end(&p->lx) != 0)
        return -1;
    if (pw_grow((void **)&c->points, &c->cap_points, c->n_points + 1, sizeof *c->points) != 0)
        return no_memory(p);
    pt.line = p->lx.line;
    c->points[c->n_points++] = pt;
    return 0;
}

static int parse_path(parser *p)
{
    if (push_item(p, PW_NONE) != 0 || read_values(p, 1, 0) != 0)
        return -1;
    if (p->c->items[p->c->n_items - 1].count == 0)
        return lex_fail_token(&p->lx, PW_E_SYNTAX, "a vertex id", NULL);
    return 0;
}

static int parse_set(parser *p)
{
    uint64_t index;
    if (lex_uint(&p->lx, "a set index", &index) != 0 || lex_expect(&p->lx, ":") != 0 ||
        push_item(p, index < PW_NONE ? (uint32_t)index : PW_NONE) != 0)
        return -1;
    return read_values(p, 1, 0);
}

static int parse_side(parser *p)
{
    if (lex_expect(&p->lx, ":") != 0 || push_item(p, PW_NONE) != 0)
        return -1;
    return read_values(p, 0, 2);
}

/* The next line with a token; at end of file, a syntax error naming `expected`. */
static int need_line(parser *p, const char *expected)
{
    int got = lex_next_line(&p->lx);
    if (got == 1)
        return 0;
    if (got < 0)
        return -1;
    return pw_fail(p->lx.v, PW_E_SYNTAX, PW_FILE_CERT, p->lx.line + 1,
                   "expected %s, found end of file", expected);
}

static int hex_value(char ch)
{
    static const char digits[16] = "0123456789abcdef";
    const char *at = memchr(digits, ch, sizeof digits);
    return at != NULL ? (int)(at - digits) : -1;
}

static int parse_hash(parser *p)
{
    pw_token t;
    const char *expected = "64 lowercase hex digits";
    if (!lex_take(&p->lx, &t))
        return lex_fail_token(&p->lx, PW_E_SYNTAX, expected, NULL);
    if (t.len != 64)
        return lex_fail_token(&p->lx, PW_E_SYNTAX, expected, &t);
    for (size_t i = 0; i < 32; i++) {
        int hi = hex_value(t.text[2 * i]), lo = hex_value(t.text[2 * i + 1]);
        if (hi < 0 || lo < 0)
            return lex_fail_token(&p->lx, PW_E_SYNTAX, expected, &t);
        p->c->hash[i] = (unsigned char)(hi * 16 + lo);
    }
    p->c->have_hash = 1;
    p->c->hash_line = p->lx.line;
    return lex_expect_end(&p->lx);
}

/* certificate 1, then optionally graph-sha256, then the claim. */
static int parse_preamble(parser *p)
{
    pw_token t;
    uint64_t version;
    if (need_line(p, "'certificate 1'") != 0 || lex_expect(&p->lx, "certificate") != 0 ||
        lex_uint(&p->lx, "a format version", &version) != 0)
        return -1;
    if (version != 1)
        return pw_fail(p->lx.v, PW_E_SYNTAX, PW_FILE_CERT, p->lx.line,
                       "expected format version 1, found '%llu'", (unsigned long long)version);
    if (lex_expect_end(&p->lx) != 0 || need_line(p, "'claim'") != 0)
        return -1;
    t = lex_first(&p->lx);
    if (lex_is(&t, "graph-sha256")) {
        if (parse_hash(p) != 0 || need_line(p, "'claim'") != 0)
            return -1;
    } else {
        p->lx.cur = t.text;
    }
    if (lex_expect(&p->lx, "claim") != 0)
        return -1;
    int got = lex_take(&p->lx, &t);
    if (!got || !(lex_is(&t, "planar") || lex_is(&t, "nonplanar")))
        return lex_fail_token(&p->lx, PW_E_SYNTAX, "'planar' or 'nonplanar'", got ? &t : NULL);
    p->c->claim = lex_is(&t, "planar") ? PW_CLAIM_PLANAR : PW_CLAIM_NONPLANAR;
    return lex_expect_end(&p->lx);
}

static int parse_branches(parser *p, int k33)
{
    for (int i = 0; i < (k33 ? 6 : 5); i++) {
        if (k33 && i == 3 && lex_expect(&p->lx, "/") != 0)
            return -1;
        if (read_vertex(p, &p->c->branch[i]) != 0)
            return -1;
    }
    return lex_expect_end(&p->lx);
}

/* The kind of K5 / K3,3 witness after "subdivision" or "minor". */
static int parse_kind(parser *p, pw_witness k5, pw_witness k33)
{
    pw_token t;
    int got = lex_take(&p->lx, &t);
    if (got && (lex_is(&t, "k5") || lex_is(&t, "k33"))) {
        p->c->witness = lex_is(&t, "k5") ? k5 : k33;
        return 0;
    }
    return lex_fail_token(&p->lx, PW_E_SYNTAX, "'k5' or 'k33'", got ? &t : NULL);
}

static int parse_head(parser *p)
{
    pw_token t;
    pw_cert *c = p->c;
    if (need_line(p, "a witness line") != 0)
        return -1;
    c->head_line = p->lx.line;
    t = lex_first(&p->lx);
    if (lex_is(&t, "subdivision"))
        return parse_kind(p, PW_WITNESS_SUBDIVISION_K5, PW_WITNESS_SUBDIVISION_K33) != 0
                   ? -1
                   : parse_branches(p, c->witness == PW_WITNESS_SUBDIVISION_K33);
    if (lex_is(&t, "minor"))
        return parse_kind(p, PW_WITNESS_MINOR_K5, PW_WITNESS_MINOR_K33) != 0 ? -1
                                                                             : lex_expect_end(&p->lx);
    if (lex_is(&t, "edge-bound") || lex_is(&t, "bipartite-edge-bound")) {
        c->witness = lex_is(&t, "edge-bound") ? PW_WITNESS_EDGE_BOUND : PW_WITNESS_BIPARTITE_BOUND;
        return lex_expect_end(&p->lx);
    }
    return lex_fail_token(&p->lx, PW_E_SYNTAX,
                          "'subdivision', 'minor', 'edge-bound' or 'bipartite-edge-bound'", &t);
}

/* The one keyword body lines may start with after this head, or NULL for none. */
static const char *body_keyword(pw_witness w)
{
    switch (w) {
    case PW_WITNESS_SUBDIVISION_K5:
    case PW_WITNESS_SUBDIVISION_K33:
        return "path";
    case PW_WITNESS_MINOR_K5:
    case PW_WITNESS_MINOR_K33:
        return "set";
    case PW_WITNESS_BIPARTITE_BOUND:
        return "side";
    default:
        return NULL;
    }
}

static int parse_body_line(parser *p)
{
    switch (p->c->witness) {
    case PW_WITNESS_SUBDIVISION_K5:
    case PW_WITNESS_SUBDIVISION_K33:
        return parse_path(p);
    case PW_WITNESS_MINOR_K5:
    case PW_WITNESS_MINOR_K33:
        return parse_set(p);
    default:
        return parse_side(p);
    }
}

static int parse_planar_body(parser *p)
{
    pw_token t;
    int got;
    while ((got = lex_next_line(&p->lx)) == 1) {
        t = lex_first(&p->lx);
        int around = lex_is(&t, "around");
        if (!around && !lex_is(&t, "point"))
            return lex_fail_token(&p->lx, PW_E_SYNTAX, "'around' or 'point'", &t);
        if ((around ? parse_around(p) : parse_point(p)) != 0)
            return -1;
    }
    return got;
}

static int parse_nonplanar_body(parser *p)
{
    pw_token t;
    int got;
    const char *keyword = body_keyword(p->c->witness);
    while ((got = lex_next_line(&p->lx)) == 1) {
        if (keyword == NULL) {
            t = lex_first(&p->lx);
            return lex_fail_token(&p->lx, PW_E_SYNTAX, "end of file", &t);
        }
        if (lex_expect(&p->lx, keyword) != 0 || parse_body_line(p) != 0)
            return -1;
    }
    return got;
}

int pw_cert_parse(const char *buf, size_t len, uint32_t n, pw_cert *c, pw_verdict *v)
{
    parser p;
    memset(c, 0, sizeof *c);
    lex_init(&p.lx, buf, len, PW_FILE_CERT, v);
    if ((uint64_t)len > MAX_CERT_BYTES)
        return pw_fail(v, PW_E_LIMIT, PW_FILE_CERT, 0, "longer than %llu bytes",
                       (unsigned long long)MAX_CERT_BYTES);
    p.c = c;
    p.n = n;
    if (parse_preamble(&p) != 0)
        return -1;
    if (c->claim == PW_CLAIM_PLANAR) {
        c->witness = PW_WITNESS_ROTATION;
        return parse_planar_body(&p);
    }
    if (parse_head(&p) != 0)
        return -1;
    return parse_nonplanar_body(&p);
}
