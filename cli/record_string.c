/*
 * record_string.c - the verdict record as a string in memory, for records
 * that embed it (sign-off, batch lines) without writing a second serializer.
 */
#include "cli.h"

#include <stdlib.h>

char *cli_record_string(const pw_verdict *v, const char *graph_path, const char *cert_path,
                        size_t *len)
{
    char *text = NULL;
    size_t size = 0;
    FILE *mem = open_memstream(&text, &size);
    if (mem == NULL)
        return NULL;
    cli_print_record(mem, v, graph_path, cert_path);
    if (fclose(mem) != 0 || text == NULL) {
        free(text);
        return NULL;
    }
    if (size > 0 && text[size - 1] == '\n')
        text[--size] = '\0';
    *len = size;
    return text;
}
