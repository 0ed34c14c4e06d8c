/*
 * svg_witness.c - the picture of a Kuratowski witness.
 *
 * Branch vertices sit in the familiar places: K5 on a pentagon, K3,3 in two
 * rows (A above, B below).  Both graphs have crossing number 1, so each path
 * is routed to leave exactly one crossing in the picture:
 *   K5:   the five sides and the diagonals B0-B2, B0-B3, B2-B4 straight; B1-B3
 *         bows outside around B2 and B1-B4 outside around B0; B0-B3 crosses
 *         B2-B4.
 *   K3,3: the zig-zag A0 B0 A1 B1 A2 B2 straight; A0-B2 around the left and
 *         under the bottom row, A0-B1 over the top row into the notch between
 *         A1 and A2, A2-B0 and A1-B2 below the bottom row, where they cross.
 * Those two paths are "the conflict": the caption names them, because moving
 * either to a second layer (or a jumper) removes this obstruction.  Interior
 * vertices of a path are spread evenly along its route, and the path is drawn
 * as a polyline through them.  Edges between witness vertices that are on no
 * path are drawn faded; everything else is left out and counted.
 */
#include "cli.h"

#include <math.h>
#include <stdlib.h>
#include <string.h>

enum { ROUTE_MAX = 32, CANVAS_W = 1000, CANVAS_H = 700, DOTS_MAX = 400, FADED_MAX = 5000 };

typedef struct {
    double x, y;
} pt;

typedef struct {
    pt p[ROUTE_MAX];
    int count;
} route;

static const double k33_top = 150, k33_bottom = 550;

static pt branch_place(int k5, unsigned i)
{
    if (k5) {
        double a = 1.5707963267948966 + 1.2566370614359172 * i; /* 90 + 72 i degrees */
        return (pt){500 + 240 * cos(a), 330 - 240 * sin(a)};
    }
    return (pt){250.0 + 250.0 * (i % 3), i < 3 ? k33_top : k33_bottom};
}

static void add(route *r, double x, double y)
{
    r->p[r->count++] = (pt){x, y};
}

/* A quadratic curve from a to b bowing out past branch vertex c of the pentagon. */
static void bow(route *r, pt a, pt b, pt c)
{
    pt ctrl = {c.x + 1.1 * (c.x - 500), c.y + 1.1 * (c.y - 330)};
    for (int k = 1; k < 20; k++) {
        double t = k / 20.0, u = 1 - t;
        add(r, u * u * a.x + 2 * u * t * ctrl.x + t * t * b.x,
            u * u * a.y + 2 * u * t * ctrl.y + t * t * b.y);
    }
}

/* Route from branch i to branch j (i < j), end points included. */
static void route_for(int k5, unsigned i, unsigned j, route *r)
{
    pt a = branch_place(k5, i), b = branch_place(k5, j);
    r->count = 0;
    add(r, a.x, a.y);
    if (k5 && i == 1 && j == 3)
        bow(r, a, b, branch_place(1, 2));
    else if (k5 && i == 1 && j == 4)
        bow(r, a, b, branch_place(1, 0));
    else if (!k5 && i == 0 && j == 5) { /* A0-B2 */
        add(r, 120, k33_top);
        add(r, 120, 650);
        add(r, 750, 650);
    } else if (!k5 && i == 0 && j == 4) { /* A0-B1 */
        add(r, 250, 70);
        add(r, 620, 70);
    } else if (!k5 && i == 2 && j == 3) { /* A2-B0 */
        add(r, 625, 610);
        add(r, 320, 610);
    } else if (!k5 && i == 1 && j == 5) { /* A1-B2 */
        add(r, 375, 630);
        add(r, 700, 630);
    }
    add(r, b.x, b.y);
}

void svg_witness_conflict(const svg_witness *w, unsigned *p, unsigned *q)
{
    unsigned want[2][2] = {{0, 3}, {2, 4}}; /* K5: B0-B3 and B2-B4 */
    if (!w->k5) {                           /* K3,3: A1-B2 and A2-B0 */
        want[0][0] = 1, want[0][1] = 5, want[1][0] = 2, want[1][1] = 3;
    }
    unsigned paths = w->k5 ? 10 : 9;
    *p = *q = 0;
    for (unsigned k = 0; k < paths; k++) {
        uint32_t s = w->path[w->path_start[k]], t = w->path[w->path_start[k + 1] - 1];
        for (int c = 0; c < 2; c++) {
            uint32_t x = w->branch[want[c][0]], y = w->branch[want[c][1]];
            if ((s == x && t == y) || (s == y && t == x))
                *(c == 0 ? p : q) = k;
        }
    }
}

static unsigned branch_index(const svg_witness *w, uint32_t v)
{
    unsigned count = w->k5 ? 5 : 6, i = 0;
    while (i < count && w->branch[i] != v)
        i++;
    return i;
}

typedef struct {
    uint32_t *slot;          /* vertex -> index into at[], PW_NONE when not on the witness */
    unsigned char *on_path;  /* edge -> 1 when some path uses it */
    pt *at;
    uint32_t count;
} placement;

/* The route of path k oriented from its first vertex to its last. */
static void oriented_route(const svg_witness *w, unsigned k, route *r)
{
    unsigned i = branch_index(w, w->path[w->path_start[k]]);
    unsigned j = branch_index(w, w->path[w->path_start[k + 1] - 1]);
    route_for(w->k5, i < j ? i : j, i < j ? j : i, r);
    for (int a = 0, b = r->count - 1; i > j && a < b; a++, b--) {
        pt t = r->p[a];
        r->p[a] = r->p[b];
        r->p[b] = t;
    }
}

static void put_vertex(placement *pl, uint32_t v, pt where)
{
    if (pl->slot[v] == PW_NONE)
        pl->slot[v] = pl->count++;
    pl->at[pl->slot[v]] = where;
}

/*
 * Spreads path k's interior vertices evenly along its route and, when out is
 * not NULL, writes the polyline through route corners and vertices in order.
 */
static void walk_path(const svg_witness *w, unsigned k, placement *pl, FILE *out)
{
    route r;
    uint32_t lo = w->path_start[k], hi = w->path_start[k + 1], inner = hi - lo - 2, next = 1;
    double total = 0, done = 0;
    oriented_route(w, k, &r);
    for (int s = 1; s < r.count; s++)
        total += hypot(r.p[s].x - r.p[s - 1].x, r.p[s].y - r.p[s - 1].y);
    if (out)
        fprintf(out, "%.1f,%.1f", r.p[0].x, r.p[0].y);
    for (int s = 1; s < r.count; s++) {
        pt a = r.p[s - 1], b = r.p[s];
        double len = hypot(b.x - a.x, b.y - a.y);
        while (next <= inner && total * next / (inner + 1) <= done + len) {
            double t = len > 0 ? (total * next / (inner + 1) - done) / len : 0;
            pt v = {a.x + t * (b.x - a.x), a.y + t * (b.y - a.y)};
            put_vertex(pl, w->path[lo + next], v);
            if (out)
                fprintf(out, " %.1f,%.1f", v.x, v.y);
            next++;
        }
        done += len;
        if (out)
            fprintf(out, " %.1f,%.1f", b.x, b.y);
    }
}

/* Marks the edges of every path; a scan of one end's darts per path edge. */
static void mark_path_edges(const pw_graph *g, const svg_witness *w, placement *pl)
{
    for (unsigned k = 0; k < (w->k5 ? 10u : 9u); k++)
        for (uint32_t i = w->path_start[k]; i + 1 < w->path_start[k + 1]; i++) {
            uint32_t u = w->path[i], v = w->path[i + 1];
            for (uint32_t j = u < g->n_adj ? g->first[u] : 0; u < g->n_adj && j < g->first[u + 1]; j++)
                if (g->ends[g->darts[j] ^ 1u] == v)
                    pl->on_path[g->darts[j] >> 1] = 1;
        }
}

static unsigned path_count(const svg_witness *w)
{
    return w->k5 ? 10 : 9;
}

static int place_all(const pw_graph *g, const svg_witness *w, placement *pl)
{
    uint32_t total = w->path_start[path_count(w)] + 6;
    pl->slot = malloc(((size_t)g->n + 1) * sizeof *pl->slot);
    pl->on_path = calloc((size_t)g->m + 1, 1);
    pl->at = malloc((size_t)total * sizeof *pl->at);
    pl->count = 0;
    if (!pl->slot || !pl->on_path || !pl->at)
        return -1;
    for (uint32_t v = 0; v < g->n; v++)
        pl->slot[v] = PW_NONE;
    mark_path_edges(g, w, pl);
    for (unsigned i = 0; i < (w->k5 ? 5u : 6u); i++)
        put_vertex(pl, w->branch[i], branch_place(w->k5, i));
    for (unsigned k = 0; k < path_count(w); k++)
        walk_path(w, k, pl, NULL);
    return 0;
}

/* Edges among witness vertices on no path, faded; returns how many exist. */
static uint64_t faded_edges(FILE *out, const pw_graph *g, const placement *pl)
{
    uint64_t count = 0;
    for (uint32_t e = 0; e < g->m; e++) {
        uint32_t a = g->ends[2 * e], b = g->ends[2 * e + 1];
        if (pl->slot[a] == PW_NONE || pl->slot[b] == PW_NONE || pl->on_path[e])
            continue;
        if (count++ < FADED_MAX) {
            pt p = pl->at[pl->slot[a]], q = pl->at[pl->slot[b]];
            fprintf(out, "<line class=\"faded\" x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\"/>\n",
                    p.x, p.y, q.x, q.y);
        }
    }
    return count;
}

static const char *name_of(const svg_witness *w, uint32_t v, char *buf, size_t size)
{
    if (w->labels && w->labels[v])
        return w->labels[v];
    snprintf(buf, size, "%u", v);
    return buf;
}

static void paths(FILE *out, const svg_witness *w, placement *pl, unsigned p, unsigned q)
{
    for (unsigned k = 0; k < path_count(w); k++) {
        int hot = k == p || k == q;
        fprintf(out, "<polyline fill=\"none\" stroke=\"%s\" stroke-width=\"%s\" "
                     "stroke-linejoin=\"round\" points=\"",
                hot ? "#c8401e" : "#1f4e79", hot ? "5" : "3");
        walk_path(w, k, pl, out);
        fputs("\"/>\n", out);
    }
}

static void vertices(FILE *out, const svg_witness *w, const placement *pl)
{
    char buf[16];
    unsigned branches = w->k5 ? 5 : 6;
    int small = pl->count <= DOTS_MAX;
    for (uint32_t s = branches; small && s < pl->count; s++)
        fprintf(out, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"4\" fill=\"#f6f1e7\" stroke=\"#2b2118\" "
                     "stroke-width=\"1.5\"/>\n", pl->at[s].x, pl->at[s].y);
    for (unsigned i = 0; i < branches; i++) {
        pt c = pl->at[i];
        uint32_t v = w->branch[i];
        fprintf(out, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"13\" fill=\"#c8401e\" stroke=\"#2b2118\" "
                     "stroke-width=\"2.5\"/>\n", c.x, c.y);
        fprintf(out, "<text class=\"alert\" x=\"%.1f\" y=\"%.1f\">", c.x + 16, c.y - 14);
        svg_text(out, name_of(w, v, buf, sizeof buf));
        fputs("</text>\n", out);
    }
    for (uint32_t i = 0; pl->count <= 80 && i < w->path_start[path_count(w)]; i++) {
        uint32_t v = w->path[i];
        if (branch_index(w, v) < branches)
            continue;
        pt c = pl->at[pl->slot[v]];
        fprintf(out, "<text class=\"label\" x=\"%.1f\" y=\"%.1f\">", c.x + 6, c.y - 6);
        svg_text(out, name_of(w, v, buf, sizeof buf));
        fputs("</text>\n", out);
    }
}

/* "a-b-c" for a path of at most 6 vertices, else "a-b-...-z (k edges)". */
void svg_witness_describe(const svg_witness *w, unsigned k, char *line, size_t size)
{
    uint32_t lo = w->path_start[k], hi = w->path_start[k + 1];
    char buf[16];
    size_t used = 0;
    line[0] = '\0';
    for (uint32_t i = lo; i < hi && used + 1 < size; i++) {
        if (hi - lo > 6 && i == lo + 2) {
            i = hi - 2;
            used += (size_t)snprintf(line + used, size - used, "-...");
            continue;
        }
        used += (size_t)snprintf(line + used, size - used, "%s%s", i > lo ? "-" : "",
                                 name_of(w, w->path[i], buf, sizeof buf));
    }
    if (hi - lo > 6 && used + 1 < size)
        snprintf(line + used, size - used, " (%u edges)", hi - lo - 1);
}

static void caption(FILE *out, const pw_graph *g, const svg_witness *w, const placement *pl,
                    uint64_t faded, unsigned p, unsigned q)
{
    char line[600], a[240], b[240];
    double y = CANVAS_H + 10;
    svg_caption(out, 30, y, "alert",
                w->k5 ? "Not planar: a subdivided K5 (Kuratowski 1930)"
                      : "Not planar: a subdivided K3,3 (Kuratowski 1930)");
    snprintf(line, sizeof line,
             "%u junctions, %u paths sharing no inner vertex, %u vertices in all; "
             "drawn with the one crossing no layout avoids.", w->k5 ? 5u : 6u, path_count(w), pl->count);
    svg_caption(out, 30, y + 26, "caption", line);
    svg_witness_describe(w, p, a, sizeof a);
    svg_witness_describe(w, q, b, sizeof b);
    snprintf(line, sizeof line, "Conflict: path %s crosses path %s.", a, b);
    svg_caption(out, 30, y + 52, "alert", line);
    svg_caption(out, 30, y + 78, "caption",
                "A second layer or a jumper for either path removes this obstruction "
                "(others may remain).");
    unsigned hidden_vertices = g->n - pl->count;
    unsigned long long hidden_edges = g->m - (w->path_start[path_count(w)] - path_count(w)) - faded;
    snprintf(line, sizeof line,
             "Not shown: %u other vert%s and %llu other edge%s; %llu edge%s among these vertices "
             "faded.", hidden_vertices, hidden_vertices == 1 ? "ex" : "ices", hidden_edges,
             hidden_edges == 1 ? "" : "s", (unsigned long long)faded, faded == 1 ? "" : "s");
    svg_caption(out, 30, y + 104, "caption", line);
}

int svg_write_witness(FILE *out, const pw_graph *g, const svg_witness *w)
{
    placement pl = {NULL, NULL, NULL, 0};
    unsigned p, q;
    if (place_all(g, w, &pl) != 0) {
        free(pl.slot);
        free(pl.on_path);
        free(pl.at);
        return -1;
    }
    svg_witness_conflict(w, &p, &q);
    svg_begin(out, 0, 0, CANVAS_W + 200, CANVAS_H + 130, 1,
              w->k5 ? "planewit: subdivided K5" : "planewit: subdivided K3,3");
    svg_style(out, 3, 8, 16, 17);
    uint64_t faded = faded_edges(out, g, &pl);
    paths(out, w, &pl, p, q);
    vertices(out, w, &pl);
    caption(out, g, w, &pl, faded, p, q);
    svg_end(out);
    free(pl.slot);
    free(pl.on_path);
    free(pl.at);
    return 0;
}
