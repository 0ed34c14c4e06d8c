/*
 * oracle_rules.c - the witness rules, each as directly as the definitions in
 * format-spec/certificate.md state them, on an adjacency matrix.
 */
#include "oracle_int.h"

#include <stdlib.h>
#include <string.h>

static uint32_t degree(const ograph *g, uint32_t v)
{
    uint32_t d = 0;
    for (uint32_t w = 0; w < g->n; w++)
        d += g->adj[(size_t)v * g->n + w];
    return d;
}

/* Component label of every vertex (the smallest vertex of its component). */
static uint32_t *components(const ograph *g)
{
    uint32_t *label = oracle_zeroed(g->n, sizeof *label);
    for (uint32_t v = 0; v < g->n; v++)
        label[v] = v;
    for (int changed = 1; changed;) {
        changed = 0;
        for (uint32_t e = 0; e < g->m; e++) {
            uint32_t a = g->ends[2 * e], b = g->ends[2 * e + 1];
            uint32_t low = label[a] < label[b] ? label[a] : label[b];
            changed |= label[a] != low || label[b] != low;
            label[a] = label[b] = low;
        }
    }
    return label;
}

/* ---- rotation system ---------------------------------------------------- */

/* succ[w * n + u]: the neighbour after u in w's list. */
static int rotation_lists(const ograph *g, const ocert *c, uint32_t *succ)
{
    unsigned char *has_line = oracle_zeroed(g->n, 1);
    int ok = c->n_lines == g->n;
    for (size_t i = 0; ok && i < c->n_lines; i++) {
        const oline *l = &c->lines[i];
        ok = !has_line[l->key] && l->n == degree(g, l->key);
        has_line[l->key] = 1;
        for (size_t k = 0; ok && k < l->n; k++) {
            ok = g->adj[(size_t)l->key * g->n + l->v[k]];
            for (size_t j = 0; ok && j < k; j++)
                ok = l->v[j] != l->v[k];
            succ[(size_t)l->key * g->n + l->v[k]] = l->v[(k + 1) % l->n];
        }
    }
    free(has_line);
    return ok;
}

oracle_result oracle_rotation(const ograph *g, const ocert *c)
{
    size_t nn = (size_t)g->n * g->n;
    uint32_t *succ = oracle_zeroed(nn, sizeof *succ), *label = components(g);
    unsigned char *used = oracle_zeroed(nn, 1);
    int64_t *euler = oracle_zeroed(g->n, sizeof *euler); /* V - E + F per component label */
    oracle_result r = oracle_verdict(ORACLE_ACCEPTED, "rotation system");
    if (!rotation_lists(g, c, succ)) {
        r = oracle_verdict(ORACLE_REJECTED, "around lines are not one permutation of each neighbourhood");
        goto done;
    }
    for (uint32_t v = 0; v < g->n; v++)
        euler[label[v]] += degree(g, v) == 0 ? 2 : 1; /* an isolated vertex: V = 1, F = 1 */
    for (uint32_t e = 0; e < g->m; e++)
        euler[label[g->ends[2 * e]]]--;
    /* A face: from dart (u, w) go to (w, x) with x after u around w. */
    for (uint32_t u = 0; u < g->n; u++)
        for (uint32_t w = 0; w < g->n; w++) {
            if (!g->adj[(size_t)u * g->n + w] || used[(size_t)u * g->n + w])
                continue;
            euler[label[u]]++;
            for (uint32_t a = u, b = w; !used[(size_t)a * g->n + b];) {
                used[(size_t)a * g->n + b] = 1;
                uint32_t x = succ[(size_t)b * g->n + a];
                a = b;
                b = x;
            }
        }
    for (uint32_t v = 0; v < g->n; v++)
        if (label[v] == v && euler[v] != 2)
            r = oracle_verdict(ORACLE_REJECTED, "a component has V - E + F != 2");
    if (r.status == ORACLE_ACCEPTED && c->n_points > 0)
        r = oracle_drawing(g, c);
done:
    free(succ);
    free(label);
    free(used);
    free(euler);
    return r;
}

/* ---- subdivision --------------------------------------------------------- */

static int branch_of(const ocert *c, int branches, uint32_t v)
{
    for (int i = 0; i < branches; i++)
        if (c->branch[i] == v)
            return i;
    return -1;
}

/* Paths join each required pair once, run along edges, and share no inner vertex. */
static int paths_ok(const ograph *g, const ocert *c, int k33, unsigned char *inner)
{
    int branches = k33 ? 6 : 5;
    unsigned char joined[6][6] = {{0}};
    for (size_t i = 0; i < c->n_lines; i++) {
        const oline *p = &c->lines[i];
        int a = branch_of(c, branches, p->v[0]), b = branch_of(c, branches, p->v[p->n - 1]);
        if (a < 0 || b < 0 || a == b || (k33 && (a < 3) == (b < 3)) || joined[a][b])
            return 0;
        joined[a][b] = joined[b][a] = 1;
        for (size_t k = 1; k < p->n; k++)
            if (!g->adj[(size_t)p->v[k - 1] * g->n + p->v[k]])
                return 0;
        for (size_t k = 1; k + 1 < p->n; k++) {
            if (branch_of(c, branches, p->v[k]) >= 0 || inner[p->v[k]])
                return 0;
            inner[p->v[k]] = 1;
        }
    }
    return 1;
}

oracle_result oracle_subdivision(const ograph *g, const ocert *c)
{
    int k33 = c->kind == K_SUB_K33, branches = k33 ? 6 : 5;
    for (int i = 0; i < branches; i++)
        for (int j = 0; j < i; j++)
            if (c->branch[i] == c->branch[j])
                return oracle_verdict(ORACLE_REJECTED, "branch vertices repeat");
    if (c->n_lines != (k33 ? 9u : 10u))
        return oracle_verdict(ORACLE_REJECTED, "wrong number of paths");
    unsigned char *inner = oracle_zeroed(g->n, 1);
    int ok = paths_ok(g, c, k33, inner);
    free(inner);
    return ok ? oracle_verdict(ORACLE_ACCEPTED, "subdivision") : oracle_verdict(ORACLE_REJECTED, "paths");
}

/* ---- minor --------------------------------------------------------------- */

/* Is set s (owner[v] == s) connected in the subgraph it induces? */
static int set_connected(const ograph *g, const uint32_t *owner, const oline *l, uint32_t s)
{
    unsigned char *reached = oracle_zeroed(g->n, 1);
    reached[l->v[0]] = 1;
    for (int changed = 1; changed;) {
        changed = 0;
        for (uint32_t e = 0; e < g->m; e++) {
            uint32_t a = g->ends[2 * e], b = g->ends[2 * e + 1];
            if (owner[a] == s && owner[b] == s && reached[a] != reached[b])
                reached[a] = reached[b] = 1, changed = 1;
        }
    }
    int ok = 1;
    for (size_t k = 0; k < l->n; k++)
        ok &= reached[l->v[k]];
    free(reached);
    return ok;
}

static int sets_ok(const ograph *g, const ocert *c, uint32_t sets, uint32_t *owner)
{
    unsigned char joined[6][6] = {{0}};
    for (size_t i = 0; i < c->n_lines; i++) {
        const oline *l = &c->lines[i];
        if (l->key >= sets || l->n == 0)
            return 0;
        for (size_t j = 0; j < i; j++)
            if (c->lines[j].key == l->key)
                return 0;
        for (size_t k = 0; k < l->n; k++) {
            if (owner[l->v[k]] != 6)
                return 0;
            owner[l->v[k]] = l->key;
        }
    }
    for (size_t i = 0; i < c->n_lines; i++)
        if (!set_connected(g, owner, &c->lines[i], c->lines[i].key))
            return 0;
    for (uint32_t e = 0; e < g->m; e++) {
        uint32_t a = owner[g->ends[2 * e]], b = owner[g->ends[2 * e + 1]];
        if (a < 6 && b < 6)
            joined[a][b] = joined[b][a] = 1;
    }
    for (uint32_t i = 0; i < sets; i++)
        for (uint32_t j = i + 1; j < sets; j++)
            if ((sets == 5 || (i < 3 && j >= 3)) && !joined[i][j])
                return 0;
    return 1;
}

oracle_result oracle_minor(const ograph *g, const ocert *c)
{
    uint32_t sets = c->kind == K_MINOR_K33 ? 6 : 5;
    if (c->n_lines != sets)
        return oracle_verdict(ORACLE_REJECTED, "wrong number of sets");
    uint32_t *owner = oracle_zeroed(g->n, sizeof *owner);
    for (uint32_t v = 0; v < g->n; v++)
        owner[v] = 6;
    int ok = sets_ok(g, c, sets, owner);
    free(owner);
    return ok ? oracle_verdict(ORACLE_ACCEPTED, "minor") : oracle_verdict(ORACLE_REJECTED, "branch sets");
}

/* ---- edge bounds --------------------------------------------------------- */

oracle_result oracle_bounds(const ograph *g, const ocert *c)
{
    int64_t n = g->n, m = g->m;
    if (c->kind == K_EDGE_BOUND)
        return n >= 3 && m > 3 * n - 6 ? oracle_verdict(ORACLE_ACCEPTED, "edge bound")
                                        : oracle_verdict(ORACLE_REJECTED, "edge bound not met");
    if (c->n_lines != 1 || c->lines[0].n != g->n)
        return oracle_verdict(ORACLE_REJECTED, "not one side per vertex");
    const uint32_t *side = c->lines[0].v;
    for (uint32_t v = 0; v < g->n; v++)
        if (side[v] > 1)
            return oracle_verdict(ORACLE_REJECTED, "a side other than 0 or 1");
    for (uint32_t e = 0; e < g->m; e++)
        if (side[g->ends[2 * e]] == side[g->ends[2 * e + 1]])
            return oracle_verdict(ORACLE_REJECTED, "an edge inside one side");
    return n >= 3 && m > 2 * n - 4 ? oracle_verdict(ORACLE_ACCEPTED, "bipartite edge bound")
                                    : oracle_verdict(ORACLE_REJECTED, "bipartite bound not met");
}
