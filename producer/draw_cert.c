/*
 * draw_cert.c - the planar certificate with coordinates, as text in memory
 * (format-spec/certificate.md): the kernel reads these very bytes before any
 * of them is written to a file.  The text itself is the producer's
 * (cert_write.c), so a drawing's around lines are those certify writes.
 */
#include "draw.h"

#include "certify.h"

int pd_cert_text(const pw_graph *g, const uint32_t *rot, const pd_drawing *d,
                 const unsigned char *graph_sha256, char **text, size_t *len)
{
    return pp_drawing_cert_text(g, rot, d->x, d->y, graph_sha256, text, len);
}
