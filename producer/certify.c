/*
 * certify.c - pp_certify(): allocation, the run, and the hand-over of either
 * the rotation system or the Kuratowski subdivision.
 */
#include <stdlib.h>
#include <string.h>

#include "pp_state.h"

typedef struct {
    uint32_t *block; /* all per-vertex arrays */
    uint8_t *flipped;
} pp_memory;

static void release(pp_state *s, pp_memory *mem)
{
    free(mem->block);
    free(s->dfi_of);
    s->dfi_of = NULL;
    free(mem->flipped);
    free(s->nxt);
    free(s->prv);
    free(s->stack);
    free(s->tgt);
    s->stack = s->tgt = NULL;
    mem->block = NULL;
    mem->flipped = NULL;
    s->nxt = s->prv = NULL;
}

/*
 * Carves the per-vertex arrays out of one block: 17 words per vertex.  dfi_of
 * is apart, because only the search and the witness search use it: it is
 * freed before the run, whose arrays make the run's peak memory.
 */
static int allocate(pp_state *s, pp_memory *mem, const pw_graph *g)
{
    size_t n = g->n_adj, darts = 2 * (size_t)g->m;
    memset(s, 0, sizeof *s);
    s->g = g;
    s->n = g->n_adj;
    mem->block = pp_alloc_large((17 * n + 1) * sizeof(uint32_t));
    mem->flipped = malloc(n + 1);
    s->dfi_of = pp_alloc_large((n + 1) * sizeof(uint32_t));
    s->nxt = pp_alloc_large((darts + 1) * sizeof(uint32_t));
    s->prv = pp_alloc_large((darts + 1) * sizeof(uint32_t));
    s->tgt = pp_alloc_large((darts + 1) * sizeof(uint32_t));
    if (mem->block == NULL || mem->flipped == NULL || s->dfi_of == NULL || s->nxt == NULL ||
        s->prv == NULL || s->tgt == NULL) {
        release(s, mem);
        return PP_ERR_NOMEM;
    }
    uint32_t *p = mem->block;
    uint32_t **one[] = {&s->vertex_of, &s->parent,    &s->lowpoint,  &s->least_anc,
                        &s->back_dart, &s->pert_tail, &s->pert_next, &s->sep_head,
                        &s->sep_next};
    for (size_t i = 0; i < sizeof one / sizeof one[0]; i++, p += n)
        *one[i] = p;
    s->head = p;
    p += 2 * n;
    s->visited = p;
    p += 2 * n;
    s->ext = p;
    s->flipped = mem->flipped;
    return 0;
}

static int certify_planar(pp_state *s, pp_result *r)
{
    uint32_t *rot = s->prv; /* prv is dead once the lists are final */
    int got = pp_finish_embedding(s, rot);
    s->prv = NULL;
    if (got != 0) {
        free(rot);
        return got;
    }
    r->kind = PP_PLANAR;
    r->rot = rot;
    return 0;
}

/* The witness search maps ids to DFIs again: the inverse of vertex_of. */
static int isolate(pp_state *s, pp_run_outcome why, uint32_t v, uint32_t root, pp_result *r)
{
    s->dfi_of = malloc(((size_t)s->n + 1) * sizeof(uint32_t));
    if (s->dfi_of == NULL)
        return PP_ERR_NOMEM;
    for (uint32_t x = 0; x < s->n; x++)
        s->dfi_of[s->vertex_of[x]] = x;
    return pp_isolate(s, why, v, root, r);
}

int pp_certify(const pw_graph *g, pp_result *r)
{
    memset(r, 0, sizeof *r);
    if (g->n_adj > (1u << 30))
        return PP_ERR_NOMEM; /* ids would not fit the packed outer-face links */
    pp_state s;
    pp_memory mem;
    if (allocate(&s, &mem, g) != 0)
        return PP_ERR_NOMEM;
    pp_dfs(&s, s.back_dart, s.pert_next); /* scratch: both are reset before the run */
    free(s.dfi_of);
    s.dfi_of = NULL;
    pp_sort_children(&s, s.visited, s.visited + s.n);
    pp_prepare_run(&s);
    uint32_t v = 0, root = PP_NIL;
    pp_run_outcome why = pp_run(&s, &v, &root);
    free(s.tgt); /* only the steps read it; the later phases are lighter */
    s.tgt = NULL;
    int got = why == PP_RUN_PLANAR  ? certify_planar(&s, r)
              : why == PP_RUN_NOMEM ? PP_ERR_NOMEM
                                    : isolate(&s, why, v, root, r);
    release(&s, &mem);
    if (got != 0)
        pp_result_free(r);
    return got;
}

void pp_result_free(pp_result *r)
{
    free(r->rot);
    free(r->path);
    memset(r, 0, sizeof *r);
}

unsigned pp_path_count(const pp_result *r)
{
    return r->kind == PP_K5 ? 10u : r->kind == PP_K33 ? 9u : 0u;
}
