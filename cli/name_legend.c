/*
 * name_legend.c - the vertices a rejection names, shown with their names.
 *
 * The kernel's messages name vertices by id in a few fixed phrasings
 * ("vertex 4", "vertices 4 and 9", "edge 4 9", "neighbour 9", "lists 9",
 * "a path from 4 to 9"); this reads those ids back out of the detail, so
 * that names stay out of the kernel.  Only rejections get a legend: their
 * messages use no other numbers after those words.
 */
#include "cli.h"
#include "import.h"

#include <ctype.h>
#include <string.h>

/* How many vertex ids follow a word of the kernel's messages. */
static int ids_after(const char *word, size_t len)
{
    static const char *const one[] = {"vertex", "neighbour", "lists", "from", "to"};
    for (size_t i = 0; i < sizeof one / sizeof one[0]; i++)
        if (strlen(one[i]) == len && memcmp(word, one[i], len) == 0)
            return 1;
    if (len == 4 && memcmp(word, "edge", 4) == 0)
        return 2;
    if (len == 8 && memcmp(word, "vertices", 8) == 0)
        return 3; /* "vertices A and B" */
    return 0;
}

/* Reads a vertex id at *p (digits then a non-digit); advances past it. */
static int take_id(const char **p, uint32_t limit, uint32_t *id)
{
    const char *s = *p;
    uint64_t value = 0;
    if (!isdigit((unsigned char)*s))
        return 0;
    while (isdigit((unsigned char)*s) && value <= UINT32_MAX)
        value = value * 10 + (uint64_t)(*s++ - '0');
    *p = s;
    if (value >= limit)
        return 0;
    *id = (uint32_t)value;
    return 1;
}

static void show(FILE *out, const name_table *t, uint32_t id, int *shown)
{
    fprintf(out, "%s%u = %s", *shown ? ", " : "names: ", id, name_table_name(t, id));
    *shown = 1;
}

void cli_print_name_legend(FILE *out, const pw_verdict *v, const name_table *t)
{
    const char *p = v->detail;
    int shown = 0;
    if (v->status != PW_REJECTED || v->code == PW_R_VERTEX_RANGE)
        return;
    while (*p != '\0') {
        const char *word = p;
        while (isalpha((unsigned char)*p))
            p++;
        int want = ids_after(word, (size_t)(p - word));
        uint32_t id;
        for (int k = 0; k < want && *p == ' '; k++) {
            p++;
            if (want == 3 && k == 1) { /* the "and" of "vertices A and B" */
                if (strncmp(p, "and", 3) != 0)
                    break;
                p += 3;
                continue;
            }
            if (!take_id(&p, (uint32_t)v->vertices, &id))
                break;
            show(out, t, id, &shown);
        }
        if (p == word)
            p++;
    }
    if (shown)
        fputc('\n', out);
}
