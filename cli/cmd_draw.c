/*
 * cmd_draw.c - `planewit draw GRAPH [-o CERT] [--svg PICTURE] ...`: a planar
 * graph gets a straight-line integer drawing (certificate with point lines,
 * checked by the kernel before a byte is written) and a picture; a non-planar
 * graph gets a picture of its Kuratowski witness.
 */
#include "certify.h"
#include "cli.h"
#include "draw.h"
#include "import.h"

#include <math.h>
#include <stdlib.h>
#include <string.h>

static const char draw_usage[] =
    "usage: planewit draw GRAPH [-o CERT] [--svg PICTURE] [--layout grid|tutte]\n"
    "                     [--names FILE] [--max-vertices N] [--max-edges M] [--max-bytes B]\n"
    "\n"
    "Decides whether GRAPH is planar and shows it.  Planar: every vertex gets integer\n"
    "coordinates such that straight edges never cross; -o writes the certificate (the\n"
    "rotation system plus one point line per vertex), which the kernel checks first.\n"
    "Not planar: the picture shows the Kuratowski witness and names the two paths in\n"
    "conflict; -o writes the witness certificate.  GRAPH may be '-' (standard input).\n"
    "\n"
    "  -o CERT           write the certificate ('-' for standard output)\n"
    "  --svg PICTURE     write an SVG picture\n"
    "  --layout grid     Schnyder grid drawing, at most (N-2) x (N-2) (the default)\n"
    "  --layout tutte    barycentric drawing, outer face on a convex polygon (reads best\n"
    "                    for 3-connected graphs); used only if the kernel accepts it,\n"
    "                    otherwise the grid drawing is used and the report says so\n"
    "  --names FILE      vertex names for the labels (default: GRAPH.names if present)\n"
    "\n"
    "Exit status: 0 planar and drawn, 1 not planar (witness shown), 2 unusable input\n"
    "or usage error, 3 internal error (the kernel refused our output; nothing written).\n";

typedef struct {
    const char *graph, *cert, *svg, *names;
    int tutte;
    pw_limits lim;
} draw_args;

typedef struct {
    const draw_args *a;
    cli_input in;
    pw_graph g;
    unsigned char sha[32];
    name_table names;
    const char **labels; /* NULL when there are no names */
    FILE *info;          /* the report: stdout, or stderr when the certificate goes there */
} draw_job;

static int option_value(int argc, char **argv, int *i, const char **out)
{
    if (*i + 1 >= argc) {
        fprintf(stderr, "planewit draw: %s needs a value\n", argv[*i]);
        return -1;
    }
    *out = argv[++*i];
    return 0;
}

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, draw_args *a)
{
    const char *layout = "grid";
    pw_limits_default(&a->lim);
    for (int i = 1; i < argc; i++) {
        const char *arg = argv[i];
        int taken = cli_limit_option(argc, argv, &i, &a->lim), bad = 0;
        if (taken < 0)
            return -1;
        if (taken)
            continue;
        if (strcmp(arg, "-h") == 0 || strcmp(arg, "--help") == 0) {
            fputs(draw_usage, stdout);
            return 1;
        }
        if (strcmp(arg, "-o") == 0)
            bad = option_value(argc, argv, &i, &a->cert);
        else if (strcmp(arg, "--svg") == 0)
            bad = option_value(argc, argv, &i, &a->svg);
        else if (strcmp(arg, "--names") == 0)
            bad = option_value(argc, argv, &i, &a->names);
        else if (strcmp(arg, "--layout") == 0)
            bad = option_value(argc, argv, &i, &layout);
        else if (arg[0] == '-' && arg[1] != '\0') {
            fprintf(stderr, "planewit draw: unknown option '%s'\n", arg);
            return -1;
        } else if (a->graph == NULL)
            a->graph = arg;
        else {
            fprintf(stderr, "planewit draw: unexpected argument '%s'\n", arg);
            return -1;
        }
        if (bad)
            return -1;
    }
    if (strcmp(layout, "grid") != 0 && strcmp(layout, "tutte") != 0) {
        fprintf(stderr, "planewit draw: --layout is 'grid' or 'tutte', not '%s'\n", layout);
        return -1;
    }
    a->tutte = strcmp(layout, "tutte") == 0;
    if (a->graph == NULL) {
        fputs("planewit draw: needs a graph file\n", stderr);
        return -1;
    }
    if (a->svg && strcmp(a->svg, "-") == 0 && a->cert && strcmp(a->cert, "-") == 0) {
        fputs("planewit draw: only one output can be standard output\n", stderr);
        return -1;
    }
    return 0;
}

/*
 * Labels from the names file: --names FILE, or GRAPH.names when it exists.
 * A names file given by --names must be right (else -1); the implicit one is
 * only used when it is, with a warning otherwise.
 */
static int load_names(draw_job *j)
{
    const char *path = j->a->names;
    char *implicit = NULL;
    cli_input in;
    if (path == NULL) {
        FILE *probe;
        if (strcmp(j->a->graph, "-") == 0 || (implicit = malloc(strlen(j->a->graph) + 7)) == NULL)
            return 0;
        sprintf(implicit, "%s.names", j->a->graph);
        if ((probe = fopen(implicit, "rb")) == NULL) {
            free(implicit);
            return 0;
        }
        fclose(probe);
        path = implicit;
    }
    int ok = cli_read_input(&in, path, &j->a->lim) == 0;
    if (ok) {
        ok = names_read(&in, j->g.n, j->sha, &j->names) == 0;
        cli_free_input(&in);
    }
    if (ok && (j->labels = malloc(((size_t)j->g.n + 1) * sizeof *j->labels)) != NULL)
        for (uint32_t v = 0; v < j->g.n; v++)
            j->labels[v] = name_table_name(&j->names, v);
    if (!ok && implicit)
        fprintf(stderr, "planewit draw: %s not used; labels show vertex ids\n", implicit);
    free(implicit);
    return ok || j->a->names == NULL ? 0 : -1;
}

/* Writes the certificate and the picture, each whole or not at all. */
static int write_outputs(const draw_job *j, const char *cert, size_t len, const svg_plane *plane,
                         const svg_witness *witness)
{
    cli_output co, so;
    int want_cert = j->a->cert != NULL, want_svg = j->a->svg != NULL, bad = 0;
    if (want_cert && cli_output_open(&co, j->a->cert) != 0)
        return -1;
    if (want_svg && cli_output_open(&so, j->a->svg) != 0) {
        if (want_cert)
            cli_output_abort(&co);
        return -1;
    }
    if (want_cert)
        bad |= fwrite(cert, 1, len, co.file) != len;
    if (want_svg && plane)
        svg_write_plane(so.file, &j->g, plane);
    else if (want_svg)
        bad |= svg_write_witness(so.file, &j->g, witness) != 0;
    if (bad) {
        if (want_cert)
            cli_output_abort(&co);
        if (want_svg)
            cli_output_abort(&so);
        fputs("planewit draw: cannot write the outputs\n", stderr);
        return -1;
    }
    if (want_cert)
        bad |= cli_output_commit(&co) != 0;
    if (want_svg)
        bad |= cli_output_commit(&so) != 0;
    return bad ? -1 : 0;
}

/* The kernel's verdict on our own certificate; anything but acceptance is our bug. */
static int kernel_accepts(const draw_job *j, const char *cert, size_t len, pw_verdict *v)
{
    pw_check_parsed(&j->g, j->in.bytes, j->in.len, cert, len, v);
    return v->status == PW_ACCEPTED;
}

static void report_bug(const pw_verdict *v)
{
    fprintf(stderr,
            "planewit draw: INTERNAL ERROR: the kernel refused our own certificate: %s "
            "(certificate line %llu: %s) - nothing was written; please report this\n",
            pw_code_name(v->code), (unsigned long long)v->line, v->detail);
}

/*
 * The barycentric drawing, rounded at growing scales until the kernel accepts
 * one: 1 with *d and the certificate filled, 0 when the grid drawing must do
 * (the reason printed), -1 out of memory.
 */
static int try_tutte(const draw_job *j, const uint32_t *rot, pd_drawing *d, char **cert,
                     size_t *len, int64_t *scale_used)
{
    pd_tutte t;
    pw_verdict v;
    int rc = pd_tutte_solve(&j->g, rot, &t);
    if (rc != 0) {
        if (rc > 0)
            fputs("planewit draw: --layout tutte needs a connected graph of at least 4 vertices "
                  "whose largest face repeats no vertex; using the grid drawing\n", stderr);
        return rc > 0 ? 0 : -1;
    }
    v.code = PW_OK;
    v.detail[0] = '\0';
    for (int64_t scale = 1 << 10; scale <= (1 << 29); scale <<= 3) {
        if (pd_tutte_round(&t, scale, d) != 0 ||
            pd_cert_text(&j->g, rot, d, j->sha, cert, len) != 0) {
            pd_drawing_free(d);
            pd_tutte_free(&t);
            return -1;
        }
        if (kernel_accepts(j, *cert, *len, &v)) {
            *scale_used = scale;
            pd_tutte_free(&t);
            return 1;
        }
        free(*cert);
        pd_drawing_free(d);
    }
    fprintf(stderr, "planewit draw: the kernel refused the barycentric drawing at every scale up "
                    "to 2^29 (last: %s, %s); using the grid drawing\n", pw_code_name(v.code), v.detail);
    pd_tutte_free(&t);
    return 0;
}

static int draw_planar(draw_job *j, const uint32_t *rot)
{
    pd_drawing d;
    pw_verdict v;
    char *cert = NULL, caption[200], caption2[200];
    size_t len = 0;
    int64_t scale = 0;
    int tutte = j->a->tutte ? try_tutte(j, rot, &d, &cert, &len, &scale) : 0;
    if (tutte < 0 ||
        (tutte == 0 && (pd_draw_grid(&j->g, rot, &d) != 0 ||
                        pd_cert_text(&j->g, rot, &d, j->sha, &cert, &len) != 0))) {
        fputs("planewit draw: out of memory\n", stderr);
        return CLI_EXIT_BUG;
    }
    if (!kernel_accepts(j, cert, len, &v)) {
        report_bug(&v);
        free(cert);
        pd_drawing_free(&d);
        return CLI_EXIT_BUG;
    }
    long long bound = (long long)j->g.n - 2;
    snprintf(caption, sizeof caption, "planar: %u vertices, %u edges, no two edges cross", j->g.n,
             j->g.m);
    if (tutte)
        snprintf(caption2, sizeof caption2, "barycentric layout, scale 2^%d, %lld x %lld",
                 __builtin_ctzll((unsigned long long)scale), (long long)d.width, (long long)d.height);
    else if (j->g.n >= 3)
        snprintf(caption2, sizeof caption2, "grid %lld x %lld (Schnyder bound %lld x %lld)",
                 (long long)d.width, (long long)d.height, bound, bound);
    else
        snprintf(caption2, sizeof caption2, "grid %lld x %lld", (long long)d.width,
                 (long long)d.height);
    double step = tutte ? (double)scale / (2 + 2 * sqrt((double)j->g.n)) : 1;
    svg_plane picture = {j->g.n, d.x, d.y, d.width, d.height, step,
                         j->labels, caption, caption2};
    int wrote = write_outputs(j, cert, len, &picture, NULL);
    if (wrote == 0)
        fprintf(j->info, "%s; %s; kernel check: accepted (faces %llu, components %llu)\n", caption,
                caption2, (unsigned long long)v.faces, (unsigned long long)v.components);
    free(cert);
    pd_drawing_free(&d);
    return wrote == 0 ? 0 : CLI_EXIT_USAGE;
}

/* The witness certificate, in memory, checked by the kernel. */
static int witness_cert(const draw_job *j, const pp_result *r, char **cert, size_t *len)
{
    pw_verdict v;
    FILE *mem = open_memstream(cert, len);
    if (mem == NULL)
        return -1;
    int bad = pp_write_cert(mem, &j->g, r, j->sha) != 0;
    if (fclose(mem) != 0 || bad)
        return -1;
    if (!kernel_accepts(j, *cert, *len, &v)) {
        report_bug(&v);
        return -1;
    }
    return 0;
}

static int draw_nonplanar(draw_job *j, const pp_result *r)
{
    svg_witness w = {r->kind == PP_K5, r->branch, r->path, r->path_start,
                     (const char *const *)j->labels};
    char *cert = NULL, a[240], b[240];
    size_t len = 0;
    unsigned p, q;
    if (j->a->cert != NULL && witness_cert(j, r, &cert, &len) != 0) {
        free(cert);
        return CLI_EXIT_BUG;
    }
    int wrote = write_outputs(j, cert, len, NULL, &w);
    free(cert);
    if (wrote != 0)
        return CLI_EXIT_USAGE;
    svg_witness_conflict(&w, &p, &q);
    svg_witness_describe(&w, p, a, sizeof a);
    svg_witness_describe(&w, q, b, sizeof b);
    fprintf(j->info, "not planar: a subdivided %s (Kuratowski 1930); conflict: path %s crosses "
                     "path %s%s\n", w.k5 ? "K5" : "K3,3", a, b,
            j->a->cert ? "; witness checked by the kernel" : "");
    return 1;
}

static int draw_graph(draw_job *j)
{
    pp_result r;
    int rc = pp_certify(&j->g, &r);
    if (rc != 0) {
        fprintf(stderr, "planewit draw: %s\n",
                rc == -1 ? "out of memory" : "INTERNAL ERROR in the planarity producer");
        return CLI_EXIT_BUG;
    }
    int status = r.kind == PP_PLANAR ? draw_planar(j, r.rot) : draw_nonplanar(j, &r);
    pp_result_free(&r);
    return status;
}

int cmd_draw(int argc, char **argv)
{
    draw_args a = {NULL, NULL, NULL, NULL, 0, {0, 0, 0}};
    draw_job j;
    pw_verdict v;
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0) {
        if (parsed < 0)
            fputs("Try 'planewit draw --help'.\n", stderr);
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    }
    memset(&j, 0, sizeof j);
    j.a = &a;
    j.info = a.cert && strcmp(a.cert, "-") == 0 ? stderr : stdout;
    cli_heap_for_one_job(a.graph, UINT64_MAX);
    if (cli_read_input(&j.in, a.graph, &a.lim) != 0)
        return CLI_EXIT_USAGE;
    memset(&v, 0, sizeof v);
    int status = CLI_EXIT_USAGE;
    if (pw_graph_parse(j.in.bytes, j.in.len, &a.lim, &j.g, &v) != PW_OK)
        cli_print_verdict(stderr, &v, a.graph, "-");
    else if (cli_sha256(j.in.bytes, j.in.len, j.sha) != 0 || load_names(&j) != 0)
        status = CLI_EXIT_USAGE;
    else
        status = draw_graph(&j);
    free(j.labels);
    name_table_free(&j.names);
    pw_graph_free(&j.g);
    cli_free_input(&j.in);
    return status;
}
