/*
 * selftest_case.c - one vector through the kernel, compared field by field
 * with what vectors/MANIFEST expects: verdict, reason, faces, components and
 * where the failure is reported.  The first difference is the deviation.
 */
#include "selftest.h"

#include <stdlib.h>
#include <string.h>

static const char *status_name(pw_status s)
{
    return s == PW_ACCEPTED ? "accepted" : s == PW_REJECTED ? "rejected" : "unusable";
}

static void compare(const vector_case *c, const pw_verdict *v, char *why, size_t size)
{
    const char *file = v->file == PW_FILE_GRAPH ? "graph" : v->file == PW_FILE_CERT ? "cert" : "-";
    why[0] = '\0';
    if (strcmp(status_name(v->status), c->verdict) != 0 || strcmp(pw_code_name(v->code), c->reason) != 0)
        snprintf(why, size, "expected %s [%s], got %s [%s]", c->verdict, c->reason,
                 status_name(v->status), pw_code_name(v->code));
    else if (c->faces >= 0 && (long long)v->faces != c->faces)
        snprintf(why, size, "expected %lld faces, got %llu", c->faces, (unsigned long long)v->faces);
    else if (c->components >= 0 && (long long)v->components != c->components)
        snprintf(why, size, "expected %lld components, got %llu", c->components,
                 (unsigned long long)v->components);
    else if (c->where_file == PW_FILE_NONE && v->status == PW_ACCEPTED && v->file != PW_FILE_NONE)
        snprintf(why, size, "an acceptance names a location (%s)", file);
    else if (c->where_file != PW_FILE_NONE &&
             (v->file != c->where_file ||
              (c->where_line >= 0 && (long long)v->line != c->where_line)))
        snprintf(why, size, "expected the failure at %s:%lld, got %s:%llu",
                 c->where_file == PW_FILE_GRAPH ? "graph" : "cert", c->where_line, file,
                 (unsigned long long)v->line);
}

void selftest_run_case(const char *dir, const vector_case *c, pw_verdict *v, char *why,
                       size_t size)
{
    cli_input graph = {c->graph, NULL, 0}, cert = {c->cert, NULL, 0};
    pw_limits lim;
    pw_limits_default(&lim);
    memset(v, 0, sizeof *v);
    if (tree_read(dir, c->graph, &graph) == 0 && tree_read(dir, c->cert, &cert) == 0) {
        pw_check(graph.bytes, graph.len, cert.bytes, cert.len, &lim, v);
        compare(c, v, why, size);
    } else {
        snprintf(why, size, "cannot read %s", graph.bytes == NULL ? c->graph : c->cert);
    }
    free(graph.bytes);
    free(cert.bytes);
}
