/*
 * draw_cert.c - the planar certificate with coordinates, as text in memory
 * (format-spec/certificate.md): the kernel reads these very bytes before any
 * of them is written to a file.  The text itself is the producer's
 * (cert_write.c), so a drawing's around lines are those certify writes.
 */
#include "draw.h"

#include <stdlib.h>

#include "certify.h"

int pd_cert_text(const pw_graph *g, const uint32_t *rot, const pd_drawing *d,
                 const unsigned char *graph_sha256, char **text, size_t *len)
{
    *text = NULL;
    *len = 0;
    FILE *mem = open_memstream(text, len);
    if (mem == NULL)
        return -1;
    int failed = pp_write_drawing_cert(mem, g, rot, d->x, d->y, graph_sha256) != 0;
    if (fclose(mem) != 0 || failed) {
        free(*text);
        *text = NULL;
        return -1;
    }
    return 0;
}
