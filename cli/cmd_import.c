/*
 * cmd_import.c - `planewit import --from FORMAT FILE -o GRAPH`: one graph from
 * graph6, DIMACS or an edge list into a graph file (format-spec/graph.md),
 * plus GRAPH.names for edge lists (format-spec/names.md).
 *
 * The graph text is composed in memory and parsed by the kernel's own graph
 * parser before anything is written; only then are the files written, each
 * whole or not at all.
 */
#include "import.h"

#include <stdlib.h>
#include <string.h>

static const char import_usage[] =
    "usage: planewit import --from graph6|dimacs|edges FILE -o GRAPH [--names-out NAMES]\n"
    "                      [--max-vertices N] [--max-edges M] [--max-bytes B]\n"
    "\n"
    "Reads one graph and writes it as a planewit graph file (format-spec/graph.md).\n"
    "FILE may be '-' for standard input; GRAPH may be '-' for standard output.\n"
    "\n"
    "  --from graph6     one graph6 record as nauty's generators write it, optionally\n"
    "                    after a '>>graph6<<' header (streams: 'planewit certify --graph6')\n"
    "  --from dimacs     'c' comment lines, one 'p edge N M' line, M lines 'e U V',\n"
    "                    vertices numbered 1..N\n"
    "  --from edges      one edge per line, two names separated by blanks or a comma;\n"
    "                    a line with one name adds a vertex; '#' starts a comment.\n"
    "                    Names are numbered 0, 1, ... in order of first appearance and the\n"
    "                    map is written to GRAPH.names (format-spec/names.md)\n"
    "  --names-out NAMES where to write the names map instead of GRAPH.names\n"
    "\n"
    "Self-loops and repeated edges are dropped (they do not change planarity); the\n"
    "count is reported on standard error and recorded in a comment of GRAPH.\n"
    "Exit status: 0 written, 2 unusable input or usage error, 3 internal error.\n";

typedef enum { FROM_NONE, FROM_GRAPH6, FROM_DIMACS, FROM_EDGES } import_format;

typedef struct {
    import_format from;
    const char *from_name, *input, *output, *names_out;
    pw_limits lim;
} import_args;

static int set_format(import_args *a, const char *name)
{
    static const char *const names[] = {"", "graph6", "dimacs", "edges"};
    for (int f = FROM_GRAPH6; f <= FROM_EDGES; f++) {
        if (name != NULL && strcmp(name, names[f]) == 0) {
            a->from = (import_format)f;
            a->from_name = names[f];
            return 0;
        }
    }
    fprintf(stderr, "planewit import: --from needs graph6, dimacs or edges\n");
    return -1;
}

/* argv[*i] is an option that takes a value: stores it, or fails when none follows. */
static int option_value(int argc, char **argv, int *i, const char **out)
{
    if (*i + 1 >= argc) {
        fprintf(stderr, "planewit import: %s needs a value\n", argv[*i]);
        return -1;
    }
    *out = argv[++*i];
    return 0;
}

static int parse_option(int argc, char **argv, int *i, import_args *a)
{
    const char *arg = argv[*i], *value;
    if (strcmp(arg, "--from") == 0)
        return option_value(argc, argv, i, &value) != 0 ? -1 : set_format(a, value);
    if (strcmp(arg, "-o") == 0 || strcmp(arg, "--output") == 0)
        return option_value(argc, argv, i, &a->output);
    if (strcmp(arg, "--names-out") == 0)
        return option_value(argc, argv, i, &a->names_out);
    fprintf(stderr, "planewit import: unknown option '%s'\n", arg);
    return -1;
}

static int check_args(const import_args *a)
{
    if (a->from == FROM_NONE || a->input == NULL || a->output == NULL) {
        fputs("planewit import: needs --from FORMAT, an input FILE and -o GRAPH\n", stderr);
        return -1;
    }
    if (a->from == FROM_EDGES && strcmp(a->output, "-") == 0 && a->names_out == NULL) {
        fputs("planewit import: with -o - an edge list needs --names-out NAMES\n", stderr);
        return -1;
    }
    if (a->from != FROM_EDGES && a->names_out != NULL) {
        fputs("planewit import: --names-out applies to --from edges only\n", stderr);
        return -1;
    }
    return 0;
}

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, import_args *a)
{
    pw_limits_default(&a->lim);
    for (int i = 1; i < argc; i++) {
        const char *arg = argv[i];
        int taken = cli_limit_option(argc, argv, &i, &a->lim);
        if (taken != 0) {
            if (taken < 0)
                return -1;
            continue;
        }
        if (strcmp(arg, "-h") == 0 || strcmp(arg, "--help") == 0) {
            fputs(import_usage, stdout);
            return 1;
        }
        if (arg[0] == '-' && arg[1] != '\0') {
            if (parse_option(argc, argv, &i, a) != 0)
                return -1;
        } else if (a->input == NULL) {
            a->input = arg;
        } else {
            fprintf(stderr, "planewit import: unexpected argument '%s'\n", arg);
            return -1;
        }
    }
    return check_args(a);
}

static int run_importer(const import_args *a, const cli_input *in, edge_list *el,
                        name_table *names)
{
    switch (a->from) {
    case FROM_GRAPH6:
        return import_graph6(in, &a->lim, el);
    case FROM_DIMACS:
        return import_dimacs(in, &a->lim, el);
    default:
        return import_edges(in, &a->lim, el, names);
    }
}

/* "2 self-loops and 1 repeated edge": what cleaning the edge list removed. */
static const char *dropped_text(const edge_list *el)
{
    static char text[96];
    snprintf(text, sizeof text, "%llu self-loop%s and %llu repeated edge%s",
             (unsigned long long)el->self_loops, el->self_loops == 1 ? "" : "s",
             (unsigned long long)el->repeats, el->repeats == 1 ? "" : "s");
    return text;
}

/* The graph file's text: provenance comments, then the graph itself. */
static int compose_graph(const import_args *a, const edge_list *el, char **text, size_t *len)
{
    FILE *out = open_memstream(text, len);
    if (out == NULL)
        return -1;
    fprintf(out, "# imported by planewit %s from %s\n", PW_VERSION, a->from_name);
    if (el->self_loops + el->repeats > 0)
        fprintf(out, "# dropped %s: they do not change planarity\n", dropped_text(el));
    if (a->from == FROM_EDGES)
        fprintf(out, "# vertex ids stand for the names in the names file beside this one\n");
    edge_list_write(out, el);
    return fclose(out) == 0 ? 0 : -1;
}

static int write_whole(const char *path, const char *bytes, size_t len, cli_output *o)
{
    if (cli_output_open(o, path) != 0)
        return -1;
    if (fwrite(bytes, 1, len, o->file) != len) {
        cli_output_abort(o);
        fprintf(stderr, "planewit import: %s: cannot write\n", path);
        return -1;
    }
    return 0;
}

/* Our own graph text must pass the kernel's parser; if it does not, that is a bug here. */
static int kernel_accepts(const char *text, size_t len, const pw_limits *lim)
{
    pw_graph g;
    pw_verdict v;
    pw_code code = pw_graph_parse(text, len, lim, &g, &v);
    pw_graph_free(&g);
    if (code == PW_OK)
        return 1;
    fprintf(stderr, "planewit import: BUG: the graph text made by import does not pass the "
                    "kernel's graph parser (line %llu: %s [%s]); nothing was written\n",
            (unsigned long long)v.line, v.detail, pw_code_name(code));
    return 0;
}

static int compose_names(const name_table *names, const char *graph, size_t graph_len,
                         char **text, size_t *len)
{
    unsigned char digest[32];
    if (cli_sha256(graph, graph_len, digest) != 0)
        return -1;
    FILE *out = open_memstream(text, len);
    if (out == NULL)
        return -1;
    names_write(out, names, digest);
    return fclose(out) == 0 ? 0 : -1;
}

/* Both files are complete in memory before either is opened; the graph is committed first. */
static int write_files(const import_args *a, const char *graph, size_t graph_len,
                       const char *names, size_t names_len)
{
    cli_output go, no;
    char *derived = NULL;
    const char *names_path = a->names_out;
    int ok = 0;
    if (names != NULL && names_path == NULL) {
        size_t n = strlen(a->output) + sizeof ".names";
        if ((derived = malloc(n)) == NULL)
            return -1;
        snprintf(derived, n, "%s.names", a->output);
        names_path = derived;
    }
    if (write_whole(a->output, graph, graph_len, &go) == 0) {
        if (names == NULL)
            ok = cli_output_commit(&go) == 0;
        else if (write_whole(names_path, names, names_len, &no) != 0)
            cli_output_abort(&go);
        else if (cli_output_commit(&go) != 0)
            cli_output_abort(&no);
        else
            ok = cli_output_commit(&no) == 0;
    }
    if (ok && names != NULL)
        fprintf(stderr, "planewit import: vertex names written to %s\n", names_path);
    free(derived);
    return ok ? 0 : -1;
}

static void report(const import_args *a, const edge_list *el)
{
    if (el->self_loops + el->repeats > 0)
        fprintf(stderr, "planewit import: warning: dropped %s (they do not change planarity)\n",
                dropped_text(el));
    fprintf(stderr, "planewit import: %s: %u vert%s, %u edge%s\n",
            strcmp(a->output, "-") == 0 ? "<stdout>" : a->output, el->n,
            el->n == 1 ? "ex" : "ices", el->m, el->m == 1 ? "" : "s");
}

/* Import proper, after the arguments: returns the exit status. */
static int import_graph(const import_args *a, const cli_input *in)
{
    edge_list el = {0};
    name_table names = {0};
    char *graph = NULL, *names_text = NULL;
    size_t graph_len = 0, names_len = 0;
    int status = CLI_EXIT_USAGE;
    if (run_importer(a, in, &el, &names) != 0)
        goto done;
    if (edge_list_drop_repeats(&el) != 0 || compose_graph(a, &el, &graph, &graph_len) != 0 ||
        (a->from == FROM_EDGES &&
         compose_names(&names, graph, graph_len, &names_text, &names_len) != 0)) {
        fputs("planewit import: out of memory\n", stderr);
        goto done;
    }
    if (!kernel_accepts(graph, graph_len, &a->lim)) {
        status = CLI_EXIT_BUG;
        goto done;
    }
    if (write_files(a, graph, graph_len, names_text, names_len) == 0) {
        report(a, &el);
        status = 0;
    }
done:
    edge_list_free(&el);
    name_table_free(&names);
    free(graph);
    free(names_text);
    return status;
}

int cmd_import(int argc, char **argv)
{
    import_args a = {FROM_NONE, NULL, NULL, NULL, NULL, {0, 0, 0}};
    cli_input in;
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0) {
        if (parsed < 0)
            fputs("Try 'planewit import --help'.\n", stderr);
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    }
    if (cli_read_input(&in, a.input, &a.lim) != 0)
        return CLI_EXIT_USAGE;
    int status = import_graph(&a, &in);
    cli_free_input(&in);
    return status;
}
