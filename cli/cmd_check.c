/* cmd_check.c - `planewit check GRAPH CERT [--json]`: run the kernel, report, exit. */
#include "cli.h"

#include <string.h>

static const char check_usage[] =
    "usage: planewit check GRAPH CERT [--json] [--max-vertices N] [--max-edges M] [--max-bytes B]\n"
    "\n"
    "Checks that the certificate CERT proves its claim (planar or nonplanar) about the\n"
    "graph GRAPH.  Either path may be '-' for standard input (not both).\n"
    "\n"
    "  --json            print one JSON verdict record instead of the human line\n"
    "  --max-vertices N  refuse graphs with more than N vertices (default 100000000)\n"
    "  --max-edges M     refuse graphs with more than M edges (default 300000000)\n"
    "  --max-bytes B     refuse files larger than B bytes (default 4294967296)\n"
    "\n"
    "Exit status: 0 accepted, 1 rejected, 2 unusable input or usage error.\n"
    "Formats: format-spec/graph.md and format-spec/certificate.md.\n";

typedef struct {
    const char *graph, *cert;
    int json;
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
    return 0;
}

static void report(const check_args *a, const pw_verdict *v)
{
    if (a->json)
        cli_print_record(stdout, v, a->graph, a->cert);
    else
        cli_print_verdict(v->status == PW_UNUSABLE ? stderr : stdout, v, a->graph, a->cert);
}

int cmd_check(int argc, char **argv)
{
    check_args a = {NULL, NULL, 0, {0, 0, 0}};
    cli_input graph, cert;
    pw_verdict v;
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0) {
        if (parsed < 0)
            fputs("Try 'planewit check --help'.\n", stderr);
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    }
    if (cli_read_input(&graph, a.graph, &a.lim) != 0)
        return PW_UNUSABLE;
    if (cli_read_input(&cert, a.cert, &a.lim) != 0) {
        cli_free_input(&graph);
        return PW_UNUSABLE;
    }
    pw_check(graph.bytes, graph.len, cert.bytes, cert.len, &a.lim, &v);
    report(&a, &v);
    cli_free_input(&graph);
    cli_free_input(&cert);
    return (int)v.status;
}
