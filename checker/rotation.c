/*
 * rotation.c - the planar claim: a rotation system whose faces satisfy
 * Euler's formula in every connected component.
 *
 * Why acceptance implies planarity: a rotation system of a connected graph
 * defines a cellular embedding in an orientable surface whose faces are
 * exactly the orbits traced below; such a surface of genus g satisfies
 * V - E + F = 2 - 2g.  F = V - E + 2 therefore forces g = 0, the sphere, and a
 * graph embedded in the sphere is planar.  Components are embedded side by
 * side, so the formula must hold in each (format-spec/proofs.md).
 *
 * Check order (first failure wins): around-line count, repeated around lines
 * in file order, each list in file order (non-neighbour, listed twice,
 * missing), then components in order of their smallest vertex.
 */
#include "internal.h"

#include <stdlib.h>

#define USED (PW_NONE - 1)

typedef struct {
    const pw_graph *g;
    pw_cert *c;
    pw_verdict *v;
    uint32_t *line_item; /* n: index of the vertex's around line */
    uint32_t *mark;      /* n_adj: per-vertex scratch */
    uint32_t *queue;     /* n_adj */
    uint32_t *next;      /* 2m: the dart after d in its source's rotation */
    unsigned char *seen; /* 2m: dart already on a traced face */
} rotation;

static int nomem(pw_verdict *v)
{
    return pw_fail(v, PW_E_NOMEM, PW_FILE_NONE, 0, "no memory for the rotation check");
}

/* One around line per vertex; n equals the lines read, so arrays of n are bounded by input. */
static int index_lines(rotation *r)
{
    const pw_cert *c = r->c;
    if (c->n_items != r->g->n)
        return pw_fail(r->v, PW_R_AROUND_COUNT, PW_FILE_CERT, 0,
                       "%u around line%s for %u vertices", c->n_items,
                       c->n_items == 1 ? "" : "s", r->g->n);
    r->line_item = pw_alloc(r->g->n, sizeof *r->line_item);
    if (r->line_item == NULL)
        return nomem(r->v);
    for (uint32_t v = 0; v < r->g->n; v++)
        r->line_item[v] = PW_NONE;
    for (uint32_t i = 0; i < c->n_items; i++) {
        uint32_t v = c->items[i].key;
        if (r->line_item[v] != PW_NONE)
            return pw_fail(r->v, PW_R_AROUND_REPEATED, PW_FILE_CERT, c->items[i].line,
                           "vertex %u already has an around line (line %llu)", v,
                           (unsigned long long)c->items[r->line_item[v]].line);
        r->line_item[v] = i;
    }
    return 0;
}

static int first_unlisted(rotation *r, const pw_item *it)
{
    const pw_graph *g = r->g;
    uint32_t v = it->key;
    for (uint32_t i = g->first[v];; i++) {
        uint32_t w = g->ends[g->darts[i] ^ 1u];
        if (r->mark[w] != USED)
            return pw_fail(r->v, PW_R_NEIGHBOUR_MISSING, PW_FILE_CERT, it->line,
                           "vertex %u does not list its neighbour %u", v, w);
    }
}

/*
 * Compares one list with the vertex's neighbourhood, replacing each listed
 * neighbour by the dart towards it, and links the darts in list order.
 */
static int match_list(rotation *r, const pw_item *it)
{
    const pw_graph *g = r->g;
    uint32_t v = it->key, deg = pw_degree(g, v), *list = pw_item_values(r->c, it);
    for (uint32_t i = 0; i < deg; i++) {
        uint32_t d = g->darts[g->first[v] + i];
        r->mark[g->ends[d ^ 1u]] = d;
    }
    for (uint32_t i = 0; i < it->count; i++) {
        uint32_t w = list[i], d = w < g->n_adj ? r->mark[w] : PW_NONE;
        if (d == USED)
            return pw_fail(r->v, PW_R_LISTED_TWICE, PW_FILE_CERT, it->line,
                           "vertex %u lists its neighbour %u twice", v, w);
        if (d == PW_NONE)
            return pw_fail(r->v, PW_R_NOT_NEIGHBOUR, PW_FILE_CERT, it->line,
                           "vertex %u lists %u, which is not its neighbour", v, w);
        r->mark[w] = USED;
        list[i] = d;
    }
    if (it->count < deg)
        return first_unlisted(r, it);
    for (uint32_t i = 0; i < deg; i++) {
        r->mark[g->ends[g->darts[g->first[v] + i] ^ 1u]] = PW_NONE;
        r->next[list[i]] = list[i + 1 < deg ? i + 1 : 0]; /* no division per dart */
    }
    return 0;
}

/* Faces through the darts leaving the component's vertices queue[0 .. size-1]. */
static uint64_t trace_faces(rotation *r, uint32_t size)
{
    const pw_graph *g = r->g;
    uint64_t faces = 0;
    for (uint32_t k = 0; k < size; k++) {
        uint32_t u = r->queue[k];
        for (uint32_t i = g->first[u]; i < g->first[u + 1]; i++) {
            uint32_t start = g->darts[i], d = start;
            if (r->seen[start])
                continue;
            faces++;
            do {
                r->seen[d] = 1;
                d = r->next[d ^ 1u];
            } while (d != start);
        }
    }
    return faces;
}

/* Collects the component of root into queue[]; returns its size, counts its edges. */
static uint32_t collect_component(rotation *r, uint32_t root, uint64_t *edges)
{
    const pw_graph *g = r->g;
    uint32_t head = 0, tail = 0;
    uint64_t degrees = 0;
    r->mark[root] = root;
    r->queue[tail++] = root;
    while (head < tail) {
        uint32_t u = r->queue[head++];
        degrees += pw_degree(g, u);
        for (uint32_t i = g->first[u]; i < g->first[u + 1]; i++) {
            uint32_t w = g->ends[g->darts[i] ^ 1u];
            if (r->mark[w] == PW_NONE) {
                r->mark[w] = root;
                r->queue[tail++] = w;
            }
        }
    }
    *edges = degrees / 2;
    return tail;
}

static int check_components(rotation *r)
{
    const pw_graph *g = r->g;
    uint64_t components = g->n - g->n_adj, faces = g->n - g->n_adj;
    for (uint32_t root = 0; root < g->n_adj; root++) {
        uint64_t edges;
        if (r->mark[root] != PW_NONE)
            continue;
        uint32_t size = collect_component(r, root, &edges);
        uint64_t f = size == 1 ? 1 : trace_faces(r, size);
        components++;
        faces += f;
        if ((int64_t)size - (int64_t)edges + (int64_t)f != 2)
            return pw_fail(r->v, PW_R_EULER, PW_FILE_CERT, r->c->items[r->line_item[root]].line,
                           "the component of vertex %u has V - E + F = %u - %llu + %llu = %lld, not 2",
                           root, size, (unsigned long long)edges, (unsigned long long)f,
                           (long long)size - (long long)edges + (long long)f);
    }
    r->v->faces = faces;
    r->v->components = components;
    return 0;
}

static int run(rotation *r)
{
    const pw_graph *g = r->g;
    if (index_lines(r) != 0)
        return -1;
    r->mark = pw_alloc(g->n_adj, sizeof *r->mark);
    r->queue = pw_alloc(g->n_adj, sizeof *r->queue);
    r->next = pw_alloc(2 * (size_t)g->m, sizeof *r->next);
    r->seen = pw_zalloc(2 * (size_t)g->m, sizeof *r->seen);
    if (r->mark == NULL || r->queue == NULL || r->next == NULL || r->seen == NULL)
        return nomem(r->v);
    for (uint32_t v = 0; v < g->n_adj; v++)
        r->mark[v] = PW_NONE;
    for (uint32_t i = 0; i < r->c->n_items; i++)
        if (match_list(r, &r->c->items[i]) != 0)
            return -1;
    return check_components(r);
}

int pw_check_rotation(const pw_graph *g, pw_cert *c, pw_verdict *v)
{
    rotation r = {g, c, v, NULL, NULL, NULL, NULL, NULL};
    int result = run(&r);
    free(r.line_item);
    free(r.mark);
    free(r.queue);
    free(r.next);
    free(r.seen);
    return result;
}
