/*
 * svg_plane.c - the picture of a planar straight-line drawing.
 *
 * The viewBox fits the drawing plus a margin and a caption; y is flipped
 * (the drawing's y axis points up, SVG's down).  Sizes are chosen in pixels:
 * a grid step gets at most 48 px and the whole drawing at most about 960 px;
 * a dot is a quarter of a step but never under 2 px, so a 10-vertex and a
 * 10^4-vertex drawing both read.  The caption is 13 px whatever the scale.
 * Labels are drawn up to SVG_LABEL_LIMIT vertices.  Edges and dots go into
 * <path> elements of at most SVG_CHUNK pieces each, so no attribute grows past
 * what XML tools accept by default.
 */
#include "cli.h"

#include <math.h>
#include <string.h>

enum { SVG_CHUNK = 4000, SVG_LABEL_LIMIT = 400 };

typedef struct {
    double ppu; /* pixels per unit */
    double dot, edge, font, caption, margin;
    int64_t top; /* flip: SVG y = top - y */
} plane_scale;

static plane_scale scale_for(const svg_plane *p)
{
    plane_scale s;
    double span = (double)(p->width > p->height ? p->width : p->height);
    s.ppu = fmin(48 / p->step, 960 / fmax(span, 1));
    s.dot = fmax(0.25 * p->step, 2 / s.ppu);
    s.edge = s.dot * 0.3;
    s.font = fmax(0.4 * p->step, 10 / s.ppu);
    s.caption = 13 / s.ppu;
    s.margin = fmax(s.dot * 2, s.font * 1.5);
    s.top = p->height;
    return s;
}

static void edges(FILE *out, const pw_graph *g, const svg_plane *p, const plane_scale *s)
{
    for (uint32_t e = 0; e < g->m; e++) {
        uint32_t a = g->ends[2 * e], b = g->ends[2 * e + 1];
        if (e % SVG_CHUNK == 0)
            fputs(e ? "\"/>\n<path class=\"edge\" d=\"" : "<path class=\"edge\" d=\"", out);
        fprintf(out, "M%lld %lldL%lld %lld", (long long)p->x[a], (long long)(s->top - p->y[a]),
                (long long)p->x[b], (long long)(s->top - p->y[b]));
    }
    if (g->m > 0)
        fputs("\"/>\n", out);
}

/* Vertices as zero-length round-capped strokes: a dark ring under a coloured dot. */
static void dots(FILE *out, const svg_plane *p, const plane_scale *s, const char *cls)
{
    for (uint32_t v = 0; v < p->n; v++) {
        if (v % SVG_CHUNK == 0)
            fprintf(out, "%s<path class=\"%s\" d=\"", v ? "\"/>\n" : "", cls);
        fprintf(out, "M%lld %lldh0", (long long)p->x[v], (long long)(s->top - p->y[v]));
    }
    if (p->n > 0)
        fputs("\"/>\n", out);
}

static void labels(FILE *out, const svg_plane *p, const plane_scale *s)
{
    char id[16];
    if (p->n > SVG_LABEL_LIMIT)
        return;
    for (uint32_t v = 0; v < p->n; v++) {
        const char *name = p->labels ? p->labels[v] : NULL;
        if (name == NULL) {
            snprintf(id, sizeof id, "%u", v);
            name = id;
        }
        fprintf(out, "<text class=\"label\" x=\"%.6g\" y=\"%.6g\">", (double)p->x[v] + s->dot * 0.6,
                (double)(s->top - p->y[v]) - s->dot * 0.6);
        svg_text(out, name);
        fputs("</text>\n", out);
    }
}

void svg_write_plane(FILE *out, const pw_graph *g, const svg_plane *p)
{
    plane_scale s = scale_for(p);
    size_t chars = strlen(p->caption);
    if (p->caption2 && strlen(p->caption2) > chars)
        chars = strlen(p->caption2);
    double w = fmax((double)p->width + 2 * s.margin, 0.62 * s.caption * (double)chars + 2 * s.margin);
    double h = (double)p->height + 2 * s.margin + s.caption * 3.4;
    svg_begin(out, -s.margin, -s.margin, w, h, s.ppu, p->caption);
    fprintf(out, "<desc>planewit drawing: %u vertices, %u edges, grid %lld x %lld</desc>\n", p->n,
            g->m, (long long)p->width, (long long)p->height);
    svg_style(out, s.edge, s.dot, s.font, s.caption);
    edges(out, g, p, &s);
    dots(out, p, &s, "ring");
    dots(out, p, &s, "dot");
    labels(out, p, &s);
    double y = (double)p->height + s.margin + s.caption * 1.2;
    svg_caption(out, 0, y, "caption", p->caption);
    if (p->caption2)
        svg_caption(out, 0, y + s.caption * 1.3, "caption", p->caption2);
    svg_end(out);
}
