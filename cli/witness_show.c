/*
 * witness_show.c - the witness in words for the person at the terminal: which
 * branch vertices, which paths (and so which edges) make the Kuratowski
 * subdivision, or which counts make an edge bound hold.
 */
#include "prove.h"

#define PATH_SHOWN_ENDS 6 /* a longer path shows this many vertices at each end */
#define SIDE_SHOWN 24     /* vertices listed per side of a bipartition */

static void show_vertex(FILE *out, const name_table *names, uint32_t v)
{
    if (names != NULL)
        fputs(name_table_name(names, v), out);
    else
        fprintf(out, "%u", v);
}

static void show_path(FILE *out, const name_table *names, const uint32_t *path, uint32_t len)
{
    fputs("  path ", out);
    for (uint32_t i = 0; i < len; i++) {
        if (len > 2 * PATH_SHOWN_ENDS && i == PATH_SHOWN_ENDS) {
            fprintf(out, " - ... %u more ...", len - 2 * PATH_SHOWN_ENDS);
            i = len - PATH_SHOWN_ENDS;
        }
        if (i > 0)
            fputs(" - ", out);
        show_vertex(out, names, path[i]);
    }
    fputc('\n', out);
}

static void show_subdivision(FILE *out, const pp_result *r, int k33, const name_table *names)
{
    uint32_t paths = pp_path_count(r), edges = 0;
    for (uint32_t i = 0; i < paths; i++)
        edges += r->path_start[i + 1] - r->path_start[i] - 1;
    fprintf(out, "witness: subdivision of %s: branch vertices", k33 ? "K3,3" : "K5");
    for (int i = 0; i < (k33 ? 6 : 5); i++) {
        fputs(k33 && i == 3 ? " /" : "", out);
        fputc(' ', out);
        show_vertex(out, names, r->branch[i]);
    }
    fprintf(out, "; %u paths with %u edges in all:\n", paths, edges);
    for (uint32_t i = 0; i < paths; i++)
        show_path(out, names, r->path + r->path_start[i], r->path_start[i + 1] - r->path_start[i]);
}

static void show_side(FILE *out, const prover *p, const pw_graph *g, unsigned char which,
                      const name_table *names)
{
    uint32_t shown = 0, count = 0;
    fprintf(out, "  side %u:", which);
    for (uint32_t v = 0; v < g->n; v++) {
        if (p->side[v] != which)
            continue;
        if (shown < SIDE_SHOWN) {
            fputc(' ', out);
            show_vertex(out, names, v);
            shown++;
        }
        count++;
    }
    if (count > shown)
        fprintf(out, " ... (%u vertices in all)", count);
    fputc('\n', out);
}

void witness_show(FILE *out, const prover *p, const pw_graph *g, const name_table *names)
{
    unsigned long long n = g->n, m = g->m;
    switch (p->kind) {
    case PW_WITNESS_ROTATION:
        fprintf(out, "witness: a rotation system (around lines) for %s %llu vert%s\n",
                n == 1 ? "its" : "all", n, n == 1 ? "ex" : "ices");
        break;
    case PW_WITNESS_SUBDIVISION_K5:
    case PW_WITNESS_SUBDIVISION_K33:
        show_subdivision(out, &p->result, p->kind == PW_WITNESS_SUBDIVISION_K33, names);
        break;
    case PW_WITNESS_EDGE_BOUND:
        fprintf(out, "witness: M = %llu edges exceeds 3N - 6 = %llu for N = %llu vertices\n", m,
                3 * n - 6, n);
        break;
    default:
        fprintf(out, "witness: every edge joins the two sides below, and M = %llu edges exceeds "
                     "2N - 4 = %llu for N = %llu vertices\n", m, 2 * n - 4, n);
        show_side(out, p, g, 0, names);
        show_side(out, p, g, 1, names);
        break;
    }
}
