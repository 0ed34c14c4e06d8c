/*
 * verdict.c - the table code -> name -> sentence, and the one place a failure
 * is recorded.  Names are stable; records and vectors use them.
 */
#include "internal.h"

#include <stdarg.h>
#include <string.h>

typedef struct {
    pw_code code;
    const char *name;
    const char *sentence;
} reason;

static const reason reasons[] = {
    {PW_OK, "ok", "every rule holds"},
    {PW_E_READ, "read-failed", "the file cannot be opened or read"},
    {PW_E_LIMIT, "limit-exceeded", "a size or count exceeds a configured limit"},
    {PW_E_NOMEM, "out-of-memory", "memory for the check could not be allocated"},
    {PW_E_BYTE, "bad-byte", "the file holds a byte that is not allowed ASCII text"},
    {PW_E_SYNTAX, "syntax", "a line does not follow the grammar"},
    {PW_E_NUMBER, "bad-number", "a number is not written as the format requires"},
    {PW_E_RANGE, "number-range", "a number lies outside its allowed range"},
    {PW_E_SELF_LOOP, "self-loop", "an edge joins a vertex to itself"},
    {PW_E_REPEATED_EDGE, "repeated-edge", "the same pair of vertices is joined twice"},
    {PW_E_EDGE_COUNT, "edge-count", "the number of edge lines differs from the header"},
    {PW_E_POINTS, "points-unverifiable", "retired: coordinates are verified since 0.2"},
    {PW_R_GRAPH_HASH, "graph-hash-mismatch", "the certificate was made for other graph bytes"},
    {PW_R_VERTEX_RANGE, "vertex-range", "the certificate names a vertex the graph lacks"},
    {PW_R_AROUND_COUNT, "around-count", "there is not one around line per vertex"},
    {PW_R_AROUND_REPEATED, "around-repeated", "a vertex has two around lines"},
    {PW_R_NOT_NEIGHBOUR, "not-neighbour", "an around list names a vertex that is not a neighbour"},
    {PW_R_LISTED_TWICE, "listed-twice", "an around list names a neighbour twice"},
    {PW_R_NEIGHBOUR_MISSING, "neighbour-missing", "an around list omits a neighbour"},
    {PW_R_EULER, "euler", "a component's faces do not satisfy V - E + F = 2"},
    {PW_R_WITNESS_LINES, "witness-lines", "the witness has the wrong number of lines"},
    {PW_R_BRANCH_REPEATED, "branch-repeated", "two branch vertices are the same vertex"},
    {PW_R_PATH_ENDS, "path-ends", "a path does not join a required pair of branch vertices"},
    {PW_R_PATH_PAIR_TWICE, "path-pair-twice", "two paths join the same pair of branch vertices"},
    {PW_R_PATH_NOT_EDGE, "path-not-edge", "consecutive path vertices are not adjacent"},
    {PW_R_PATH_VERTEX_REUSED, "path-vertex-reused", "paths are not internally disjoint"},
    {PW_R_SET_INDEX, "set-index", "a set index is out of range or repeated"},
    {PW_R_SET_EMPTY, "set-empty", "a branch set is empty"},
    {PW_R_SET_OVERLAP, "set-overlap", "branch sets are not disjoint"},
    {PW_R_SET_DISCONNECTED, "set-disconnected", "a branch set does not induce a connected subgraph"},
    {PW_R_SET_UNJOINED, "set-unjoined", "no edge joins a required pair of branch sets"},
    {PW_R_EDGE_BOUND, "edge-bound", "the edge count does not exceed 3N - 6 (or N < 3)"},
    {PW_R_SIDE_COUNT, "side-count", "the side line does not give one side per vertex"},
    {PW_R_SIDE_VALUE, "side-value", "a side is neither 0 nor 1"},
    {PW_R_SIDE_EDGE, "side-edge", "an edge joins two vertices on the same side"},
    {PW_R_BIPARTITE_BOUND, "bipartite-edge-bound", "the edge count does not exceed 2N - 4 (or N < 3)"},
    {PW_R_POINT_COUNT, "point-count", "point lines are given, but not one per vertex"},
    {PW_R_POINT_REPEATED, "point-repeated", "a vertex has two point lines"},
    {PW_R_COORDINATE_RANGE, "coordinate-range", "a coordinate exceeds 2^30 in absolute value"},
    {PW_R_POINTS_COINCIDE, "points-coincide", "two vertices are drawn at the same point"},
    {PW_R_VERTEX_ON_EDGE, "vertex-on-edge", "a vertex lies inside the segment of an edge"},
    {PW_R_EDGES_CROSS, "edges-cross", "two edges cross"},
    {PW_R_EDGES_OVERLAP, "edges-overlap", "two collinear edges overlap"},
    {PW_R_ORDER_MISMATCH, "order-mismatch", "the drawing's order of neighbours differs from the around list"},
};

static const reason *find(pw_code code)
{
    for (size_t i = 0; i < sizeof reasons / sizeof reasons[0]; i++)
        if (reasons[i].code == code)
            return &reasons[i];
    return NULL;
}

const char *pw_code_name(pw_code code)
{
    const reason *r = find(code);
    return r ? r->name : "unknown";
}

const char *pw_code_sentence(pw_code code)
{
    const reason *r = find(code);
    return r ? r->sentence : "unknown reason code";
}

const char *pw_claim_name(pw_claim claim)
{
    static const char *const names[] = {"none", "planar", "nonplanar"};
    return (unsigned)claim < 3 ? names[claim] : "none";
}

const char *pw_witness_name(pw_witness witness)
{
    static const char *const names[] = {
        "none", "rotation-system", "subdivision-k5", "subdivision-k33",
        "minor-k5", "minor-k33", "edge-bound", "bipartite-edge-bound"};
    return (unsigned)witness < 8 ? names[witness] : "none";
}

void pw_verdict_init(pw_verdict *v)
{
    memset(v, 0, sizeof *v);
    v->status = PW_ACCEPTED;
    v->code = PW_OK;
}

int pw_fail(pw_verdict *v, pw_code code, pw_file file, uint64_t line, const char *fmt, ...)
{
    va_list ap;
    v->status = code < PW_R_GRAPH_HASH ? PW_UNUSABLE : PW_REJECTED;
    v->code = code;
    v->file = file;
    v->line = line;
    va_start(ap, fmt);
    vsnprintf(v->detail, sizeof v->detail, fmt, ap);
    va_end(ap);
    return -1;
}
