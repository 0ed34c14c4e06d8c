/*
 * pairs.c - which files of an archive are a graph and its certificate.
 *
 * The rule (format-spec/seal.md): a file X.cert goes with X.graph; failing
 * that, the last ".part" of X's file name is dropped and the search repeats,
 * so "board.solver.cert" and "board.v2.cert" both go with "board.graph"
 * when no "board.solver.graph" exists.  The graph must be in the same folder.
 * A certificate with no graph is reported as unpaired, not checked.
 */
#include "archive.h"

#include <stdlib.h>
#include <string.h>

static int ends_with(const char *s, const char *suffix)
{
    size_t n = strlen(s), k = strlen(suffix);
    return n > k && strcmp(s + n - k, suffix) == 0;
}

/* The graph that goes with cert, or NULL. */
static const char *graph_for(const file_set *set, const char *cert)
{
    char stem[PATH_MAX], name[PATH_MAX + 8];
    size_t n = strlen(cert) - strlen(".cert");
    if (n >= sizeof stem)
        return NULL;
    memcpy(stem, cert, n);
    stem[n] = '\0';
    for (;;) {
        snprintf(name, sizeof name, "%s.graph", stem);
        const char *graph = file_set_find(set, name);
        if (graph != NULL)
            return graph;
        char *dot = strrchr(stem, '.'), *slash = strrchr(stem, '/');
        char *base = slash != NULL ? slash + 1 : stem;
        if (dot == NULL || dot <= base)
            return NULL; /* no ".part" left in the file name, or a hidden file's only dot */
        *dot = '\0';
    }
}

int find_pairs(const file_set *set, file_pair **pairs, size_t *count, size_t *unpaired)
{
    *pairs = malloc((set->count ? set->count : 1) * sizeof **pairs);
    *count = *unpaired = 0;
    if (*pairs == NULL)
        return -1;
    for (size_t i = 0; i < set->count; i++) {
        if (!ends_with(set->paths[i], ".cert"))
            continue;
        const char *graph = graph_for(set, set->paths[i]);
        if (graph == NULL) {
            (*unpaired)++;
            continue;
        }
        (*pairs)[*count].graph = graph;
        (*pairs)[(*count)++].cert = set->paths[i];
    }
    return 0;
}

void check_pair(const char *dir, const file_pair *p, pw_verdict *v)
{
    cli_input graph = {p->graph, NULL, 0}, cert = {p->cert, NULL, 0};
    pw_limits lim;
    pw_limits_default(&lim);
    if (tree_read(dir, p->graph, &graph) == 0 && tree_read(dir, p->cert, &cert) == 0) {
        pw_check(graph.bytes, graph.len, cert.bytes, cert.len, &lim, v);
    } else {
        memset(v, 0, sizeof *v);
        v->status = PW_UNUSABLE;
        v->code = PW_E_READ;
        v->file = graph.bytes == NULL ? PW_FILE_GRAPH : PW_FILE_CERT;
        snprintf(v->detail, sizeof v->detail, "cannot read the file");
    }
    free(graph.bytes);
    free(cert.bytes);
}

int check_all_pairs(const char *dir, const file_set *set, pair_results *r)
{
    memset(r, 0, sizeof *r);
    if (find_pairs(set, &r->pairs, &r->count, &r->unpaired) != 0)
        return -1;
    r->verdicts = malloc((r->count ? r->count : 1) * sizeof *r->verdicts);
    if (r->verdicts == NULL)
        return -1;
    for (size_t i = 0; i < r->count; i++) {
        check_pair(dir, &r->pairs[i], &r->verdicts[i]);
        r->accepted += r->verdicts[i].status == PW_ACCEPTED;
    }
    return 0;
}

void report_failed_pairs(FILE *out, const pair_results *r)
{
    for (size_t i = 0; i < r->count; i++) {
        if (r->verdicts[i].status == PW_ACCEPTED)
            continue;
        fprintf(out, "does not check: %s + %s: ", r->pairs[i].graph, r->pairs[i].cert);
        cli_print_verdict(out, &r->verdicts[i], r->pairs[i].graph, r->pairs[i].cert);
    }
}

void pair_results_free(pair_results *r)
{
    free(r->pairs);
    free(r->verdicts);
    memset(r, 0, sizeof *r);
}
