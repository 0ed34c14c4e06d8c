/*
 * svg_common.c - what both pictures share: the document frame, the style
 * sheet, escaping of label text.  The look ("drafting paper"): warm paper
 * background, ink-blue edges, vermilion vertices ringed in dark ink, labels
 * in a small sans-serif; sizes are set in viewBox units by each picture.
 */
#include "cli.h"

#include <string.h>

void svg_begin(FILE *out, double min_x, double min_y, double w, double h, double scale,
               const char *title)
{
    fprintf(out,
            "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
            "<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" "
            "viewBox=\"%.6g %.6g %.6g %.6g\" width=\"%.0f\" height=\"%.0f\">\n",
            min_x, min_y, w, h, w * scale, h * scale);
    fputs("<title>", out);
    svg_text(out, title);
    fputs("</title>\n", out);
    fprintf(out, "<rect x=\"%.6g\" y=\"%.6g\" width=\"%.6g\" height=\"%.6g\" fill=\"#f6f1e7\"/>\n",
            min_x, min_y, w, h);
}

void svg_style(FILE *out, double edge, double dot, double font, double caption)
{
    fprintf(out,
            "<style>\n"
            ".edge{fill:none;stroke:#1f4e79;stroke-width:%.4g;stroke-linecap:round;"
            "stroke-linejoin:round}\n"
            ".faded{fill:none;stroke:#9aa5ad;stroke-width:%.4g;stroke-dasharray:%.4g %.4g;"
            "opacity:0.6}\n"
            ".dot{fill:none;stroke:#c8401e;stroke-width:%.4g;stroke-linecap:round}\n"
            ".ring{fill:none;stroke:#2b2118;stroke-width:%.4g;stroke-linecap:round}\n"
            ".label{font-family:'DejaVu Sans',sans-serif;font-size:%.4gpx;fill:#2b2118}\n"
            ".caption{font-family:'DejaVu Sans',sans-serif;font-size:%.4gpx;fill:#2b2118}\n"
            ".alert{font-family:'DejaVu Sans',sans-serif;font-size:%.4gpx;fill:#a01b0b;"
            "font-weight:bold}\n"
            "</style>\n",
            edge, edge * 0.8, edge * 3, edge * 2, dot, dot * 1.35, font, caption, caption);
}

void svg_end(FILE *out)
{
    fputs("</svg>\n", out);
}

/* Character data: &, < and > escaped; anything outside printable ASCII becomes '?'. */
void svg_text(FILE *out, const char *s)
{
    for (; *s; s++) {
        unsigned char c = (unsigned char)*s;
        if (c == '&')
            fputs("&amp;", out);
        else if (c == '<')
            fputs("&lt;", out);
        else if (c == '>')
            fputs("&gt;", out);
        else if (c == '"')
            fputs("&quot;", out);
        else
            fputc(c >= 0x20 && c < 0x7f ? c : '?', out);
    }
}

void svg_caption(FILE *out, double x, double y, const char *cls, const char *line)
{
    fprintf(out, "<text class=\"%s\" x=\"%.6g\" y=\"%.6g\">", cls, x, y);
    svg_text(out, line);
    fputs("</text>\n", out);
}
