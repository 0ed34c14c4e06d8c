/*
 * draw_triangulate.c - add chords until every face of a biconnected plane
 * graph is a triangle, never adding an edge that exists already.
 *
 * A face of a biconnected component is a simple cycle v1 .. vk (k >= 4 to
 * need work).  We start at the vertex of least degree, mark its neighbours,
 * and:
 *   - if v1 is adjacent to none of v3 .. v(k-1), fan out from v1;
 *   - otherwise v1 - vi is an edge outside this face for some 3 <= i <= k-1.
 *     Then no edge joins A = v2 .. v(i-1) to B = v(i+1) .. vk: drawn outside
 *     the face it would cross v1 - vi.  So a zig-zag strip of A x B chords is
 *     safe: v2-vk first, then alternately advance on A and on B.
 * Marking costs the least degree on the face; summed over faces that is
 * O(N) for planar graphs (every face is charged to one of its edges, and the
 * sum over edges of the smaller end degree is O(arboricity * M)).
 *
 * A chord at vertex v_j goes into v_j's corner of the face, right after the
 * face dart v_j -> v_(j+1) counterclockwise, ordered by how far along the face
 * its other end lies; the comments below say how each scheme keeps that order.
 */
#include "draw_internal.h"

#include <stdlib.h>

typedef struct {
    uint32_t *dart;   /* face darts: dart[j] leaves vertex j of the face */
    uint32_t *mark;   /* per vertex: stamp of the face whose v1 it neighbours */
    uint32_t stamp;
} face_work;

static uint32_t face_vertex(const pd_embed *e, const face_work *f, uint32_t j)
{
    return e->tail[f->dart[j]];
}

/* Fan from vertex 0: chords 0-j for j = 2 .. k-2, each after the last one at 0. */
static void fan(pd_embed *e, const face_work *f, uint32_t k)
{
    uint32_t at0 = f->dart[0];
    for (uint32_t j = 2; j + 1 < k; j++)
        at0 = pd_embed_add(e, at0, f->dart[j]);
}

/*
 * Zig-zag for a face whose vertex 0 has an outside chord to vertex i.  Chords
 * at a vertex of A arrive with ever nearer other ends, so each goes right
 * after that vertex's face dart; chords at a vertex of B arrive with ever
 * farther other ends, so each goes after the previous one (cursor).
 */
static void zigzag(pd_embed *e, const face_work *f, uint32_t k, uint32_t i)
{
    uint32_t a = 1, b = k - 1, turn = 0;
    uint32_t cursor_b = pd_embed_add(e, f->dart[a], f->dart[b]) ^ 1u;
    while (a + 1 < i || b > i + 1) {
        int advance_a;
        if (a + 1 >= i)
            advance_a = 0;
        else if (b <= i + 1)
            advance_a = 1;
        else
            advance_a = (int)(turn ^= 1u);
        if (advance_a) {
            a++;
        } else {
            b--;
            cursor_b = f->dart[b];
        }
        cursor_b = pd_embed_add(e, f->dart[a], cursor_b) ^ 1u;
    }
}

static void triangulate_face(pd_embed *e, face_work *f, uint32_t k)
{
    uint32_t best = 0;
    for (uint32_t j = 1; j < k; j++)
        if (e->deg[face_vertex(e, f, j)] < e->deg[face_vertex(e, f, best)])
            best = j;
    if (best > 0) { /* rotate so the least degree vertex comes first */
        uint32_t *tmp = f->dart + k; /* room after the face (buffer is 2n) */
        for (uint32_t j = 0; j < k; j++)
            tmp[j] = f->dart[(best + j) % k];
        for (uint32_t j = 0; j < k; j++)
            f->dart[j] = tmp[j];
    }
    uint32_t v1 = face_vertex(e, f, 0), d = e->any[v1];
    f->stamp++;
    for (uint32_t t = 0; t < e->deg[v1]; t++, d = e->next[d])
        f->mark[pd_head(e, d)] = f->stamp;
    for (uint32_t j = 2; j + 1 < k; j++)
        if (f->mark[face_vertex(e, f, j)] == f->stamp) {
            zigzag(e, f, k, j);
            return;
        }
    fan(e, f, k);
}

int pd_triangulate(pd_embed *e)
{
    uint32_t original = e->n_darts;
    face_work f = {NULL, NULL, 0};
    unsigned char *seen = calloc((size_t)original + 1, 1);
    f.dart = malloc(((size_t)e->n * 2 + 2) * sizeof *f.dart);
    f.mark = calloc((size_t)e->n + 1, sizeof *f.mark);
    if (!seen || !f.dart || !f.mark) {
        free(seen);
        free(f.dart);
        free(f.mark);
        return -1;
    }
    for (uint32_t d0 = 0; d0 < original; d0++) {
        if (seen[d0])
            continue;
        uint32_t k = 0, d = d0;
        do {
            seen[d] = 1;
            f.dart[k++] = d;
            d = pd_face_next(e, d);
        } while (d != d0 && k <= e->n);
        /* Faces of components with < 3 vertices are not cycles: left alone. */
        if (k >= 4 && d == d0)
            triangulate_face(e, &f, k);
    }
    free(seen);
    free(f.dart);
    free(f.mark);
    return 0;
}
