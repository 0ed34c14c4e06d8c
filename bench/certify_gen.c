/*
 * certify_gen.c - seeded benchmark inputs for `planewit certify` (issue 3),
 * our own invented data.  Every family is built on ids 0..N-1, then the ids
 * are renamed by a seeded random permutation and the edge lines are written
 * in a seeded random order, so no family hands the algorithm a convenient
 * numbering or edge order.
 *
 *   stacked    random maximal planar graph: start from a triangle, put each
 *              new vertex into a uniformly chosen face (M = 3N - 6)
 *   trigrid    k x k grid with one diagonal per square (planar, M ~ 3N)
 *   sparse     M edges drawn at random from a stacked triangulation on
 *              N = 5M/6 vertices (planar, about 40% of its edges kept)
 *   stacked+1  stacked plus one edge between the two ends of a long
 *              shortest path (a pseudo-diameter found by two BFS passes);
 *              non-planar, since a maximal planar graph takes no more edges
 *   chords     k x k square grid plus the two diagonals of its outer square
 *              drawn as edges between opposite corners: each alone is planar,
 *              together they cross, and every Kuratowski subdivision runs
 *              along grid paths of length about k (a long hidden one)
 *   random2n   uniformly random simple graph, M = 2N (non-planar w.h.p.)
 *
 * Usage: certify_gen FAMILY EDGES SEED OUT.graph   -> prints "n=N m=M"
 * The edge count is approximate for the grid families (nearest k).
 */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

typedef struct {
    uint32_t n, m, room;
    uint32_t *u, *v;
} edge_set;

static uint64_t rng_state;

static uint64_t next_random(void)
{
    uint64_t z = (rng_state += 0x9e3779b97f4a7c15u);
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9u;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebu;
    return z ^ (z >> 31);
}

static uint32_t below(uint64_t bound)
{
    return (uint32_t)(next_random() % bound);
}

static void *must_alloc(size_t count, size_t size)
{
    void *p = calloc(count + 1, size);
    if (p == NULL) {
        fputs("certify_gen: out of memory\n", stderr);
        exit(1);
    }
    return p;
}

static void set_open(edge_set *s, uint32_t n, uint64_t room)
{
    s->n = n;
    s->m = 0;
    s->room = (uint32_t)room;
    s->u = must_alloc(room, sizeof *s->u);
    s->v = must_alloc(room, sizeof *s->v);
}

static void add(edge_set *s, uint32_t a, uint32_t b)
{
    if (s->m >= s->room) {
        fputs("certify_gen: edge room exceeded (a generator bug)\n", stderr);
        exit(3);
    }
    s->u[s->m] = a;
    s->v[s->m++] = b;
}

/* Random stacked triangulation on n >= 3 vertices: 3n - 6 edges. */
static void stacked(edge_set *s, uint32_t n)
{
    uint32_t *face = must_alloc((size_t)3 * 2 * n, sizeof *face);
    uint64_t faces = 2;
    uint32_t start[6] = {0, 1, 2, 0, 2, 1};
    memcpy(face, start, sizeof start);
    set_open(s, n, (uint64_t)3 * n);
    add(s, 0, 1);
    add(s, 1, 2);
    add(s, 2, 0);
    for (uint32_t x = 3; x < n; x++) {
        uint32_t *f = face + (size_t)3 * below(faces);
        uint32_t a = f[0], b = f[1], c = f[2];
        add(s, x, a);
        add(s, x, b);
        add(s, x, c);
        f[2] = x;
        uint32_t more[6] = {b, c, x, c, a, x};
        memcpy(face + 3 * faces, more, sizeof more);
        faces += 2;
    }
    free(face);
}

static uint32_t grid_id(uint32_t k, uint32_t row, uint32_t col)
{
    return row * k + col;
}

/* k x k square grid, with the diagonal (r,c)-(r+1,c+1) of every square if diagonals. */
static void grid(edge_set *s, uint32_t k, int diagonals, uint32_t extra)
{
    set_open(s, k * k, (uint64_t)3 * k * k + extra);
    for (uint32_t r = 0; r < k; r++)
        for (uint32_t c = 0; c < k; c++) {
            if (c + 1 < k)
                add(s, grid_id(k, r, c), grid_id(k, r, c + 1));
            if (r + 1 < k)
                add(s, grid_id(k, r, c), grid_id(k, r + 1, c));
            if (diagonals && r + 1 < k && c + 1 < k)
                add(s, grid_id(k, r, c), grid_id(k, r + 1, c + 1));
        }
}

/* Keeps m edges of s chosen uniformly (partial Fisher-Yates). */
static void keep_random(edge_set *s, uint32_t m)
{
    for (uint32_t i = 0; i < m && i < s->m; i++) {
        uint32_t j = i + below(s->m - i), t = s->u[i];
        s->u[i] = s->u[j];
        s->u[j] = t;
        t = s->v[i];
        s->v[i] = s->v[j];
        s->v[j] = t;
    }
    if (m < s->m)
        s->m = m;
}

/* Adjacency offsets of s: first[n+1], to[2m]. */
static void adjacency(const edge_set *s, uint32_t **first, uint32_t **to)
{
    uint32_t *f = must_alloc((size_t)s->n + 1, sizeof *f), *t = must_alloc((size_t)2 * s->m, sizeof *t);
    for (uint32_t e = 0; e < s->m; e++) {
        f[s->u[e] + 1]++;
        f[s->v[e] + 1]++;
    }
    for (uint32_t x = 0; x < s->n; x++)
        f[x + 1] += f[x];
    uint32_t *at = must_alloc((size_t)s->n, sizeof *at);
    memcpy(at, f, (size_t)s->n * sizeof *at);
    for (uint32_t e = 0; e < s->m; e++) {
        t[at[s->u[e]]++] = s->v[e];
        t[at[s->v[e]]++] = s->u[e];
    }
    free(at);
    *first = f;
    *to = t;
}

/* Breadth-first search from root; returns the last vertex reached (a farthest one). */
static uint32_t farthest(const edge_set *s, const uint32_t *first, const uint32_t *to, uint32_t root)
{
    uint32_t *queue = must_alloc(s->n, sizeof *queue);
    unsigned char *seen = must_alloc(s->n, 1);
    uint32_t head = 0, tail = 0;
    queue[tail++] = root;
    seen[root] = 1;
    while (head < tail) {
        uint32_t x = queue[head++];
        for (uint32_t i = first[x]; i < first[x + 1]; i++)
            if (!seen[to[i]]) {
                seen[to[i]] = 1;
                queue[tail++] = to[i];
            }
    }
    uint32_t last = queue[tail - 1];
    free(queue);
    free(seen);
    return last;
}

static void stacked_plus_one(edge_set *s, uint32_t n)
{
    uint32_t *first, *to;
    stacked(s, n);
    adjacency(s, &first, &to);
    uint32_t a = farthest(s, first, to, below(n));
    uint32_t b = farthest(s, first, to, a);
    free(first);
    free(to);
    add(s, a, b);
}

/* Uniform simple graph with m edges on n vertices (open-addressing set of pairs). */
static void random_simple(edge_set *s, uint32_t n, uint32_t m)
{
    uint64_t slots = 1;
    while (slots < (uint64_t)2 * m)
        slots <<= 1;
    uint64_t *table = must_alloc(slots, sizeof *table);
    set_open(s, n, m);
    while (s->m < m) {
        uint32_t a = below(n), b = below(n);
        if (a == b)
            continue;
        uint64_t key = a < b ? ((uint64_t)a << 32 | b) + 1 : ((uint64_t)b << 32 | a) + 1;
        uint64_t h = (key * 0x9e3779b97f4a7c15u) & (slots - 1);
        while (table[h] != 0 && table[h] != key)
            h = (h + 1) & (slots - 1);
        if (table[h] == key)
            continue;
        table[h] = key;
        add(s, a, b);
    }
    free(table);
}

static uint32_t side_for(double edges_per_row_unit, uint64_t m)
{
    double k = 1;
    while (edges_per_row_unit * k * k < (double)m)
        k += 1;
    return (uint32_t)k;
}

static int build(edge_set *s, const char *family, uint64_t m)
{
    if (strcmp(family, "stacked") == 0)
        stacked(s, (uint32_t)(m / 3 + 2));
    else if (strcmp(family, "stacked+1") == 0)
        stacked_plus_one(s, (uint32_t)((m + 5) / 3));
    else if (strcmp(family, "sparse") == 0) {
        stacked(s, (uint32_t)(m * 5 / 6 + 3));
        keep_random(s, (uint32_t)m);
    } else if (strcmp(family, "trigrid") == 0)
        grid(s, side_for(3, m), 1, 0);
    else if (strcmp(family, "chords") == 0) {
        uint32_t k = side_for(2, m);
        grid(s, k, 0, 2);
        add(s, grid_id(k, 0, 0), grid_id(k, k - 1, k - 1));
        add(s, grid_id(k, 0, k - 1), grid_id(k, k - 1, 0));
    } else if (strcmp(family, "random2n") == 0)
        random_simple(s, (uint32_t)(m / 2), (uint32_t)m);
    else
        return -1;
    return 0;
}

/* Renames the vertices by a random permutation and shuffles the edge order and ends. */
static void shuffle(edge_set *s)
{
    uint32_t *name = must_alloc(s->n, sizeof *name);
    for (uint32_t x = 0; x < s->n; x++)
        name[x] = x;
    for (uint32_t x = s->n; x > 1; x--) {
        uint32_t j = below(x), t = name[x - 1];
        name[x - 1] = name[j];
        name[j] = t;
    }
    keep_random(s, s->m);
    for (uint32_t e = 0; e < s->m; e++) {
        uint32_t a = name[s->u[e]], b = name[s->v[e]];
        int flip = (int)(next_random() & 1);
        s->u[e] = flip ? b : a;
        s->v[e] = flip ? a : b;
    }
    free(name);
}

static char *put_number(char *p, uint32_t x)
{
    char digits[10];
    int k = 0;
    do {
        digits[k++] = (char)('0' + x % 10);
        x /= 10;
    } while (x != 0);
    while (k > 0)
        *p++ = digits[--k];
    return p;
}

static int write_graph(const edge_set *s, const char *path)
{
    FILE *out = fopen(path, "wb");
    char *buf = must_alloc((size_t)s->m * 22 + 64, 1), *p = buf;
    if (out == NULL)
        return -1;
    p += sprintf(p, "graph %u %u\n", s->n, s->m);
    for (uint32_t e = 0; e < s->m; e++) {
        p = put_number(p, s->u[e]);
        *p++ = ' ';
        p = put_number(p, s->v[e]);
        *p++ = '\n';
    }
    size_t len = (size_t)(p - buf);
    int ok = fwrite(buf, 1, len, out) == len;
    free(buf);
    return fclose(out) == 0 && ok ? 0 : -1;
}

int main(int argc, char **argv)
{
    edge_set s;
    if (argc != 5) {
        fputs("usage: certify_gen stacked|trigrid|sparse|stacked+1|chords|random2n EDGES SEED OUT\n",
              stderr);
        return 2;
    }
    uint64_t m = strtoull(argv[2], NULL, 10);
    rng_state = strtoull(argv[3], NULL, 10);
    if (m < 12 || m > 400000000u || build(&s, argv[1], m) != 0) {
        fprintf(stderr, "certify_gen: unknown family '%s' or EDGES outside 12..4e8\n", argv[1]);
        return 2;
    }
    shuffle(&s);
    if (write_graph(&s, argv[4]) != 0) {
        fprintf(stderr, "certify_gen: cannot write %s\n", argv[4]);
        return 1;
    }
    printf("n=%u m=%u\n", s.n, s.m);
    free(s.u);
    free(s.v);
    return 0;
}
