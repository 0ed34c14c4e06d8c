/*
 * line_reader.c - a stream read line by line through one block buffer, for
 * inputs too long to hold whole (a graph6 stream of millions of records).
 * A line ends at LF; a CR right before the LF is dropped with it.  No line
 * may exceed max_line bytes, so memory stays bounded whatever arrives.
 */
#include "import.h"

#include <stdlib.h>
#include <string.h>

#define BLOCK_SIZE 65536

int line_reader_open(line_reader *r, FILE *in, uint64_t max_line)
{
    memset(r, 0, sizeof *r);
    r->in = in;
    r->max_line = max_line;
    r->block = malloc(BLOCK_SIZE);
    r->line_cap = 256;
    r->line = malloc(r->line_cap);
    if (r->block == NULL || r->line == NULL) {
        line_reader_close(r);
        return -1;
    }
    return 0;
}

void line_reader_close(line_reader *r)
{
    free(r->block);
    free(r->line);
    r->block = r->line = NULL;
}

static int append(line_reader *r, const char *bytes, size_t n)
{
    if (r->line_len + n > r->max_line)
        return -2;
    if (r->line_len + n > r->line_cap) {
        size_t cap = r->line_cap * 2 > r->line_len + n ? r->line_cap * 2 : r->line_len + n;
        char *line = realloc(r->line, cap);
        if (line == NULL)
            return -3;
        r->line = line;
        r->line_cap = cap;
    }
    memcpy(r->line + r->line_len, bytes, n);
    r->line_len += n;
    return 0;
}

static int refill(line_reader *r)
{
    r->block_pos = 0;
    r->block_len = fread(r->block, 1, BLOCK_SIZE, r->in);
    if (r->block_len == 0) {
        r->eof = 1;
        return ferror(r->in) ? -1 : 0;
    }
    return 1;
}

int line_reader_next(line_reader *r)
{
    r->line_len = 0;
    r->line_offset = r->next_offset;
    for (;;) {
        if (r->block_pos == r->block_len) {
            int got = r->eof ? 0 : refill(r);
            if (got < 0)
                return -1;
            if (got == 0)
                break;
        }
        const char *from = r->block + r->block_pos;
        size_t avail = r->block_len - r->block_pos;
        const char *lf = memchr(from, '\n', avail);
        size_t take = lf ? (size_t)(lf - from) : avail;
        int status = append(r, from, take);
        if (status != 0)
            return status;
        r->block_pos += take + (lf != NULL);
        r->next_offset += take + (lf != NULL);
        if (lf != NULL) {
            r->line_number++;
            if (r->line_len > 0 && r->line[r->line_len - 1] == '\r')
                r->line_len--;
            return 1;
        }
    }
    if (r->line_len == 0)
        return 0;
    r->line_number++;
    return 1;
}
