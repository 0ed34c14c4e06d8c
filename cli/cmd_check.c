/* cmd_check.c - `planewit check GRAPH CERT [--json]`: run the kernel, report, exit. */
#include "cli.h"
#include "import.h"

#include <string.h>

static const char check_usage[] =
    "usage: planewit check GRAPH CERT [--json] [--record FILE [--note TEXT]] [--names FILE]\n"
    "                      [--max-vertices N] [--max-edges M] [--max-bytes B]\n"
    "\n"
    "Checks that the certificate CERT proves its claim (planar or nonplanar) about the\n"
    "graph GRAPH.  Either path may be '-' for standard input (not both).\n"
    "\n"
    "  --json            print one JSON verdict record instead of the human line\n"
    "  --record FILE     also write a sign-off record to FILE (format-spec/signoff-record.md)\n"
    "  --note TEXT       a note for the sign-off record, e.g. the design revision\n"
    "  --names FILE      after a rejection, name the vertices it mentions by this names\n"
    "                    file (format-spec/names.md, as 'planewit import' writes it)\n"
    "  --max-vertices N  refuse graphs with more than N vertices (default 100000000)\n"
    "  --max-edges M     refuse graphs with more than M edges (default 300000000)\n"
    "  --max-bytes B     refuse files larger than B bytes (default 4294967296)\n"
    "\n"
    "Exit status: 0 accepted, 1 rejected, 2 unusable input or usage error\n"
    "(also 2 when the sign-off record cannot be written).\n"
    "Formats: format-spec/graph.md and format-spec/certificate.md.\n";

typedef struct {
    const char *graph, *cert;
    int json;
    const char *record, *note, *names;
    pw_limits lim;
} check_args;

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, check_args *a)
{
    int positional = 0;
    pw_limits_default(&a->lim);
    for (int i = 1; i < argc; i++) {
        const char *arg = argv[i];
        int taken = cli_limit_option(argc, argv, &i, &a->lim);
        if (taken < 0)
            return -1;
        if (taken)
            continue;
        if (strcmp(arg, "-h") == 0 || strcmp(arg, "--help") == 0) {
            fputs(check_usage, stdout);
            return 1;
        }
        if (strcmp(arg, "--json") == 0) {
            a->json = 1;
        } else if (strcmp(arg, "--record") == 0 || strcmp(arg, "--note") == 0 ||
                   strcmp(arg, "--names") == 0) {
            if (i + 1 >= argc) {
                fprintf(stderr, "planewit check: %s needs a value\n", arg);
                return -1;
            }
            const char **value = strcmp(arg, "--record") == 0 ? &a->record
                                 : strcmp(arg, "--note") == 0 ? &a->note
                                                              : &a->names;
            *value = argv[++i];
        } else if (arg[0] == '-' && arg[1] != '\0') {
            fprintf(stderr, "planewit check: unknown option '%s'\n", arg);
            return -1;
        } else if (positional < 2) {
            *(positional++ == 0 ? &a->graph : &a->cert) = arg;
        } else {
            fprintf(stderr, "planewit check: unexpected argument '%s'\n", arg);
            return -1;
        }
    }
    if (positional < 2) {
        fputs("planewit check: needs a graph file and a certificate file\n", stderr);
        return -1;
    }
    if (strcmp(a->graph, "-") == 0 && strcmp(a->cert, "-") == 0) {
        fputs("planewit check: only one of the two files can be standard input\n", stderr);
        return -1;
    }
    if (a->note != NULL && a->record == NULL) {
        fputs("planewit check: --note goes into a sign-off record: give --record FILE\n", stderr);
        return -1;
    }
    return 0;
}

/* The sign-off record; the verdict's status stands unless the record cannot be written. */
static int write_record(const check_args *a, const pw_verdict *v, const cli_input *graph)
{
    unsigned char canonical[32];
    int have_canonical =
        cli_canonical_graph_sha256(graph->bytes, graph->len, &a->lim, canonical) == 0;
    cli_signoff s = {a->graph, a->cert, a->note, have_canonical ? canonical : NULL};
    if (cli_write_signoff(a->record, v, &s) == 0)
        return (int)v->status;
    fprintf(stderr, "planewit check: sign-off record %s not written\n", a->record);
    return CLI_EXIT_USAGE;
}

/* The names legend under a rejection; a names file that does not fit the graph is refused. */
static int report_names(const check_args *a, const pw_verdict *v)
{
    cli_input in;
    name_table names = {0};
    if (v->status != PW_REJECTED || a->json)
        return 0;
    if (cli_read_input(&in, a->names, &a->lim) != 0)
        return -1;
    int rc = names_read(&in, (uint32_t)v->vertices, v->graph_sha256, &names);
    cli_free_input(&in);
    if (rc == 0)
        cli_print_name_legend(stdout, v, &names);
    name_table_free(&names);
    return rc;
}

static void report(const check_args *a, const pw_verdict *v)
{
    if (a->json)
        cli_print_record(stdout, v, a->graph, a->cert);
    else
        cli_print_verdict(v->status == PW_UNUSABLE ? stderr : stdout, v, a->graph, a->cert);
}

/* A file that cannot be read still gets its JSON verdict record under --json. */
static int unreadable(const check_args *a, pw_file which, pw_code code)
{
    pw_verdict v;
    if (a->json) {
        memset(&v, 0, sizeof v);
        v.status = PW_UNUSABLE;
        v.code = code;
        v.file = which;
        snprintf(v.detail, sizeof v.detail, "%s", pw_code_sentence(code));
        cli_print_record(stdout, &v, a->graph, a->cert);
    }
    return PW_UNUSABLE;
}

int cmd_check(int argc, char **argv)
{
    check_args a = {NULL, NULL, 0, NULL, NULL, NULL, {0, 0, 0}};
    cli_input graph, cert;
    pw_verdict v;
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0) {
        if (parsed < 0)
            fputs("Try 'planewit check --help'.\n", stderr);
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    }
    cli_heap_for_one_job(a.graph, CLI_ONE_JOB_HEAP_LARGEST);
    pw_code failed = cli_read_input(&graph, a.graph, &a.lim);
    if (failed != PW_OK)
        return unreadable(&a, PW_FILE_GRAPH, failed);
    failed = cli_read_input(&cert, a.cert, &a.lim);
    if (failed != PW_OK) {
        cli_free_input(&graph);
        return unreadable(&a, PW_FILE_CERT, failed);
    }
    pw_check(graph.bytes, graph.len, cert.bytes, cert.len, &a.lim, &v);
    report(&a, &v);
    if (a.names != NULL && report_names(&a, &v) != 0)
        fprintf(stderr, "planewit check: %s: names not shown\n", a.names);
    int status = a.record != NULL ? write_record(&a, &v, &graph) : (int)v.status;
    cli_free_input(&graph);
    cli_free_input(&cert);
    return status;
}
