/*
 * manifest.c - one case of vectors/MANIFEST, whose header comment defines it:
 *   NAME GRAPH CERT VERDICT REASON FACES COMPONENTS WHERE   [# source]
 * FACES and COMPONENTS are numbers or '-'; WHERE is '-', graph:L, cert:L,
 * graph:* or cert:*.  A case line with another shape is an error, never
 * skipped: a qualification run must not pass by silently running fewer cases.
 */
#include "selftest.h"

#include <stdlib.h>
#include <string.h>

static int count_or_any(const char *text, long long *out)
{
    char *end;
    if (strcmp(text, "-") == 0) {
        *out = -1;
        return 0;
    }
    if (*text < '0' || *text > '9')
        return -1;
    *out = strtoll(text, &end, 10);
    return *end == '\0' ? 0 : -1;
}

static int parse_where(const char *text, vector_case *c)
{
    char *end;
    c->where_file = PW_FILE_NONE;
    c->where_line = -1;
    if (strcmp(text, "-") == 0)
        return 0;
    if (strncmp(text, "graph:", 6) == 0) {
        c->where_file = PW_FILE_GRAPH;
        text += 6;
    } else if (strncmp(text, "cert:", 5) == 0) {
        c->where_file = PW_FILE_CERT;
        text += 5;
    } else {
        return -1;
    }
    if (strcmp(text, "*") == 0)
        return 0;
    c->where_line = strtoll(text, &end, 10);
    return *text >= '1' && *text <= '9' && *end == '\0' ? 0 : -1;
}

/* 1 a case, 0 a blank or comment line, -1 malformed (cut in place). */
int manifest_parse_line(char *line, vector_case *c)
{
    char *fields[9], *save = NULL;
    int n = 0;
    char *hash = strchr(line, '#');
    if (hash != NULL)
        *hash = '\0';
    for (char *t = strtok_r(line, " \t\r", &save); t != NULL && n < 9;
         t = strtok_r(NULL, " \t\r", &save))
        fields[n++] = t;
    if (n == 0)
        return 0;
    if (n != 8)
        return -1;
    c->name = fields[0];
    c->graph = fields[1];
    c->cert = fields[2];
    c->verdict = fields[3];
    c->reason = fields[4];
    if (count_or_any(fields[5], &c->faces) != 0 || count_or_any(fields[6], &c->components) != 0 ||
        parse_where(fields[7], c) != 0)
        return -1;
    return 1;
}
