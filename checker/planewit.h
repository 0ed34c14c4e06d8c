/*
 * planewit.h - the trusted checker kernel's public contract.
 *
 * This header is the auditor's first page.  Everything in checker/ exists to
 * implement the one function pw_check(): given the exact bytes of a graph file
 * and of a certificate file (formats: format-spec/graph.md and
 * format-spec/certificate.md), decide whether the certificate proves its claim
 * ("planar" or "nonplanar") about that graph.
 *
 * Conventions
 *   - Vertex ids are 0 .. n-1 and fit in uint32_t; PW_NONE is never an id.
 *   - Edge e joins ends[2e] and ends[2e+1].  A dart is a directed half-edge:
 *     dart d leaves ends[d] and enters ends[d ^ 1], so d ^ 1 is its reverse.
 *   - Every function that fills a pw_verdict stops at the first failed rule
 *     ("first failure wins") and records exactly one reason code.
 *   - The kernel never trusts a count from its input to size memory: arrays are
 *     sized from what was actually read (see format-spec/limits.md).
 *   - No function recurses; every check is O(n + m) in the size of the input.
 *
 * Important caveats - what an "accepted" verdict does NOT attest
 *   - It attests a graph-theoretic fact about the graph file's bytes only.  It
 *     says nothing about whether that file models the physical design correctly,
 *     nor about electrical, fluidic, thermal or manufacturing rules; applicable
 *     standards and qualified reviewers still decide whether a design is right.
 *   - A planar rotation system is checked up to mirror image: without point
 *     lines, a system and its mirror are both accepted (they are equally valid).
 *   - The graph must be simple; multigraphs and self-loops are refused as input
 *     errors, never silently merged.
 *   - With point lines, the drawing is checked exactly (integer arithmetic, no
 *     floating point): it is a plane straight-line drawing whose angular
 *     orders are the around lists.  Coordinates are bounded by 2^30 so that
 *     every orientation product fits in 64 bits.
 */
#ifndef PLANEWIT_H
#define PLANEWIT_H

#include <stddef.h>
#include <stdint.h>
#include <stdio.h>

#define PW_VERSION "0.2.0"
#define PW_NONE UINT32_MAX

/* Outcome of a check; also the process exit status of `planewit check`. */
typedef enum {
    PW_ACCEPTED = 0, /* the certificate proves its claim */
    PW_REJECTED = 1, /* the certificate is well-formed but does not prove it */
    PW_UNUSABLE = 2  /* an input could not be read as the format requires */
} pw_status;

/*
 * Reason codes.  Numbers and names are stable: verdict records and the vector
 * manifest refer to them.  New codes are appended; none is ever renumbered.
 * The table in verdict.c gives each code its name and its sentence, and the
 * status it implies (1-29 unusable input, 30 and up rejection).
 */
typedef enum {
    PW_OK = 0,
    /* unusable input (exit 2) */
    PW_E_READ = 1,        /* file cannot be opened or read */
    PW_E_LIMIT = 2,       /* a size or count exceeds a configured limit */
    PW_E_NOMEM = 3,       /* memory could not be allocated */
    PW_E_BYTE = 4,        /* a byte outside the allowed ASCII set */
    PW_E_SYNTAX = 5,      /* a token other than the grammar expects */
    PW_E_NUMBER = 6,      /* a malformed number (sign, leading zero) */
    PW_E_RANGE = 7,       /* a number outside its allowed range */
    PW_E_SELF_LOOP = 8,   /* graph edge U U */
    PW_E_REPEATED_EDGE = 9, /* the same unordered pair twice */
    PW_E_EDGE_COUNT = 10, /* edge lines differ from the header's M */
    PW_E_POINTS = 11,     /* retired in 0.2 (point lines are verified now); never produced */
    /* rejections (exit 1) */
    PW_R_GRAPH_HASH = 30,      /* graph-sha256 differs from the graph bytes */
    PW_R_VERTEX_RANGE = 31,    /* a certificate vertex id >= N */
    PW_R_AROUND_COUNT = 32,    /* number of around lines differs from N */
    PW_R_AROUND_REPEATED = 33, /* one vertex has two around lines */
    PW_R_NOT_NEIGHBOUR = 34,   /* an around list names a non-neighbour */
    PW_R_LISTED_TWICE = 35,    /* an around list names a neighbour twice */
    PW_R_NEIGHBOUR_MISSING = 36, /* an around list omits a neighbour */
    PW_R_EULER = 37,           /* a component has V - E + F != 2 */
    PW_R_WITNESS_LINES = 38,   /* wrong number of path / set / side lines */
    PW_R_BRANCH_REPEATED = 39, /* two branch vertices are the same vertex */
    PW_R_PATH_ENDS = 40,       /* a path does not join a required branch pair */
    PW_R_PATH_PAIR_TWICE = 41, /* two paths join the same branch pair */
    PW_R_PATH_NOT_EDGE = 42,   /* consecutive path vertices are not adjacent */
    PW_R_PATH_VERTEX_REUSED = 43, /* a path vertex repeats or meets another path */
    PW_R_SET_INDEX = 44,       /* set index out of range or repeated */
    PW_R_SET_EMPTY = 45,       /* a branch set has no vertex */
    PW_R_SET_OVERLAP = 46,     /* a vertex belongs to two sets (or twice to one) */
    PW_R_SET_DISCONNECTED = 47, /* a set does not induce a connected subgraph */
    PW_R_SET_UNJOINED = 48,    /* no graph edge joins a required pair of sets */
    PW_R_EDGE_BOUND = 49,      /* not N >= 3 and M > 3N - 6 */
    PW_R_SIDE_COUNT = 50,      /* side line does not have N entries */
    PW_R_SIDE_VALUE = 51,      /* a side entry other than 0 or 1 */
    PW_R_SIDE_EDGE = 52,       /* an edge joins two vertices of one side */
    PW_R_BIPARTITE_BOUND = 53, /* not N >= 3 and M > 2N - 4 */
    /* the straight-line drawing given by point lines (geometry.c, sweep.c) */
    PW_R_POINT_COUNT = 54,     /* point lines present, but not one per vertex */
    PW_R_POINT_REPEATED = 55,  /* one vertex has two point lines */
    PW_R_COORDINATE_RANGE = 56, /* |X| or |Y| above 2^30 */
    PW_R_POINTS_COINCIDE = 57, /* two vertices at the same point */
    PW_R_VERTEX_ON_EDGE = 58,  /* a vertex inside an edge's segment */
    PW_R_EDGES_CROSS = 59,     /* two segments cross at an interior point */
    PW_R_EDGES_OVERLAP = 60,   /* two collinear segments share more than a point */
    PW_R_ORDER_MISMATCH = 61   /* angular order of neighbours differs from the around list */
} pw_code;

typedef enum { PW_FILE_NONE = 0, PW_FILE_GRAPH = 1, PW_FILE_CERT = 2 } pw_file;
typedef enum { PW_CLAIM_NONE = 0, PW_CLAIM_PLANAR, PW_CLAIM_NONPLANAR } pw_claim;
typedef enum {
    PW_WITNESS_NONE = 0,
    PW_WITNESS_ROTATION,
    PW_WITNESS_SUBDIVISION_K5,
    PW_WITNESS_SUBDIVISION_K33,
    PW_WITNESS_MINOR_K5,
    PW_WITNESS_MINOR_K33,
    PW_WITNESS_EDGE_BOUND,
    PW_WITNESS_BIPARTITE_BOUND
} pw_witness;

/* Limits; pw_limits_default() fills the documented defaults. */
typedef struct {
    uint64_t max_bytes;    /* per input file */
    uint32_t max_vertices; /* N in the graph header; at most 2^31 - 1 */
    uint32_t max_edges;    /* M in the graph header; at most 2^31 - 1 */
} pw_limits;

/* The verdict: the unit that records, archives and batch runs build on. */
typedef struct {
    pw_status status;
    pw_code code;        /* PW_OK when accepted */
    pw_file file;        /* where the failure is; PW_FILE_NONE if nowhere */
    uint64_t line;       /* 1-based line in that file; 0 if none */
    char detail[240];    /* what was found, e.g. "vertex 4 lists 9" */
    pw_claim claim;
    pw_witness witness;
    uint64_t vertices, edges, faces, components; /* faces: planar only */
    int have_counts;     /* vertices and edges are known: the graph was parsed */
    unsigned char graph_sha256[32], cert_sha256[32];
    int have_graph_sha256, have_cert_sha256;
} pw_verdict;

/*
 * A parsed simple graph.  Adjacency is grouped by vertex only for ids below
 * n_adj (1 + the largest id any edge uses); higher ids are isolated vertices,
 * so a header's N never sizes memory on its own.
 */
typedef struct {
    uint32_t n;      /* N from the header */
    uint32_t m;      /* M from the header, equal to the edges read */
    uint32_t n_adj;  /* 1 + largest id used by an edge, 0 if m == 0 */
    uint32_t *ends;  /* 2m endpoints; see the dart convention above */
    uint32_t *first; /* n_adj + 1 offsets into darts */
    uint32_t *darts; /* 2m dart ids, those leaving v at first[v] .. first[v+1]-1 */
} pw_graph;

void pw_limits_default(pw_limits *lim);

/*
 * Reads a whole stream into a fresh buffer (caller frees *buf).  Returns
 * PW_OK, PW_E_READ, PW_E_LIMIT (more than max_bytes) or PW_E_NOMEM.
 */
pw_code pw_read_all(FILE *stream, uint64_t max_bytes, char **buf, size_t *len);

/*
 * Parses a graph file's bytes into *g.  On failure fills *v (status
 * PW_UNUSABLE, file PW_FILE_GRAPH, line, detail).  The caller releases *g with pw_graph_free() in every case.
 */
pw_code pw_graph_parse(const char *buf, size_t len, const pw_limits *lim,
                       pw_graph *g, pw_verdict *v);
void pw_graph_free(pw_graph *g);

/*
 * Fills first[] and darts[] from ends[] (a counting sort, stable in edge
 * order).  The caller MUST have set n_adj to 1 + the largest id in ends[] and
 * sized first[] to n_adj + 1 and darts[] to 2m.  For producers that build
 * graphs without text; it does not look for repeated edges.
 */
void pw_graph_group_darts(pw_graph *g);

/*
 * The whole check.  graph/cert are the files' exact bytes.  Always fills *v,
 * including both SHA-256 digests and the counts known at the point of failure.
 * Returns v->status.
 */
pw_status pw_check(const char *graph, size_t graph_len, const char *cert,
                   size_t cert_len, const pw_limits *lim, pw_verdict *v);

/* The same check on a graph already parsed (used by the producers' self-check). */
pw_status pw_check_parsed(const pw_graph *g, const char *graph, size_t graph_len,
                          const char *cert, size_t cert_len, pw_verdict *v);

/* Stable name ("not-neighbour") and sentence of a code; never NULL. */
const char *pw_code_name(pw_code code);
const char *pw_code_sentence(pw_code code);
/* Stable names of claims and witness kinds as spelled in records. */
const char *pw_claim_name(pw_claim claim);
const char *pw_witness_name(pw_witness witness);

#endif
