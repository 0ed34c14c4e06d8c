/*
 * cmd_certify.c - `planewit certify GRAPH [-o CERT]`: find a witness for the
 * graph, have the kernel check the certificate, and only then write it.  A
 * certificate of ours that the kernel refuses is a bug: exit 3, nothing
 * written.  With --graph6 the same is done for every graph of a stream
 * (certify_stream.c).
 */
#include "prove.h"

#include <stdarg.h>
#include <stdlib.h>
#include <string.h>

static const char certify_usage[] =
    "usage: planewit certify GRAPH [-o CERT] [--json] [--witness cheapest] [--names NAMES]\n"
    "       planewit certify --graph6 FILE|- [--summary] [--witness cheapest] [-j K]\n"
    "                        [--shard I/K]\n"
    "       (both take [--max-vertices N] [--max-edges M] [--max-bytes B])\n"
    "\n"
    "Finds a certificate for GRAPH (format-spec/graph.md): a rotation system when it\n"
    "is planar, a subdivision of K5 or K3,3 when it is not.  The kernel checks the\n"
    "certificate before it is written; the verdict and the witness are printed.\n"
    "\n"
    "  -o CERT             write the certificate there ('-': standard output, and the\n"
    "                      report goes to standard error); without -o nothing is written\n"
    "  --json              print the self-check's verdict record instead of the verdict line\n"
    "  --witness cheapest  for a non-planar graph, prefer an edge-count witness\n"
    "                      (edge-bound, bipartite-edge-bound) when one holds\n"
    "  --names NAMES       name vertices in the report by this names file\n"
    "                      (format-spec/names.md, as 'planewit import' writes it)\n"
    "  --graph6 FILE       certify and check every graph6 record of FILE ('-': standard\n"
    "                      input); one line per graph, then the counts.  The last line\n"
    "                      is 'graphs=T planar=P nonplanar=Q'\n"
    "  --summary           with --graph6: print the counts only\n"
    "  -j K                with --graph6: K worker threads (default: the online CPUs);\n"
    "                      the output is the same for every K\n"
    "  --shard I/K         with --graph6: only records I, I+K, I+2K, ... (0-based; line L\n"
    "                      is record L-1), for spreading one stream over K runs.  The\n"
    "                      per-graph lines keep their line numbers; the counts of the K\n"
    "                      runs add up to those of one whole run, and this adds them:\n"
    "    awk -F'[=: ]+' '/^nonplanar by /{if(!($3 in n))o[++k]=$3; n[$3]+=$4}\n"
    "      /^graphs=/{t+=$2; p+=$4; q+=$6}\n"
    "      END{for(i=1;i<=k;i++) print \"nonplanar by \" o[i] \": \" n[o[i]];\n"
    "      print \"graphs=\" t \" planar=\" p \" nonplanar=\" q}' shard-*.txt\n"
    "  --max-bytes B       the largest graph file; with --graph6, the longest record\n"
    "\n"
    "Exit status: 0 certified (planar or not), 2 unusable input or usage error,\n"
    "3 internal error (a certificate the kernel refused; please report it).\n";

static int usage_error(const char *fmt, ...) __attribute__((format(printf, 1, 2)));

static int usage_error(const char *fmt, ...)
{
    va_list ap;
    fputs("planewit certify: ", stderr);
    va_start(ap, fmt);
    vfprintf(stderr, fmt, ap);
    va_end(ap);
    fputs("\nTry 'planewit certify --help'.\n", stderr);
    return -1;
}

/* -j K and --shard I/K (cmd_batch.c's meaning); 1 taken, -1 error printed. */
static int stream_option(const char *name, const char *value, certify_args *a)
{
    if (strcmp(name, "--shard") == 0) {
        a->sharded = 1;
        if (batch_shard_parse("certify", value, &a->shard) == 0)
            return 1;
        fputs("Try 'planewit certify --help'.\n", stderr);
        return -1;
    }
    char *end;
    unsigned long k = value[0] >= '1' && value[0] <= '9' ? strtoul(value, &end, 10) : 0;
    if (k == 0 || *end != '\0' || k > 4096)
        return usage_error("-j needs a number of threads from 1 to 4096, not '%s'", value);
    a->threads = (unsigned)k;
    return 1;
}

/* Options with a value; 1 taken, 0 not one of them, -1 error. */
static int value_option(int argc, char **argv, int *i, certify_args *a)
{
    static const char *const names[] = {"-o", "--names", "--graph6", "--witness", "-j",
                                        "--shard"};
    const char **slots[] = {&a->output, &a->names, &a->graph6, NULL, NULL, NULL};
    for (int k = 0; k < 6; k++) {
        if (strcmp(argv[*i], names[k]) != 0)
            continue;
        if (*i + 1 >= argc)
            return usage_error("%s needs a value", names[k]);
        const char *value = argv[++*i];
        if (slots[k] != NULL) {
            *slots[k] = value;
            return 1;
        }
        if (k >= 4)
            return stream_option(names[k], value, a);
        if (strcmp(value, "cheapest") != 0 && strcmp(value, "subdivision") != 0)
            return usage_error("--witness takes 'cheapest' or 'subdivision', not '%s'", value);
        a->choice = strcmp(value, "cheapest") == 0 ? WITNESS_CHEAPEST : WITNESS_SUBDIVISION;
        return 1;
    }
    return 0;
}

static int check_combination(const certify_args *a)
{
    if (a->graph6 != NULL && a->graph != NULL)
        return usage_error("give a GRAPH or --graph6 FILE, not both ('%s')", a->graph);
    if (a->graph6 == NULL && a->graph == NULL)
        return usage_error("needs a GRAPH file or --graph6 FILE");
    if (a->graph6 != NULL && (a->output || a->names || a->json))
        return usage_error("-o, --names and --json apply to a single GRAPH, not --graph6");
    if (a->graph6 == NULL && a->summary)
        return usage_error("--summary applies to --graph6 only");
    if (a->graph6 == NULL && (a->threads != 0 || a->sharded))
        return usage_error("-j and --shard apply to --graph6 only");
    return 0;
}

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, certify_args *a)
{
    pw_limits_default(&a->lim);
    a->shard.count = 1;
    for (int i = 1; i < argc; i++) {
        int taken = cli_limit_option(argc, argv, &i, &a->lim);
        if (taken == 0)
            taken = value_option(argc, argv, &i, a);
        if (taken != 0) {
            if (taken < 0)
                return -1;
            continue;
        }
        const char *arg = argv[i];
        if (strcmp(arg, "-h") == 0 || strcmp(arg, "--help") == 0) {
            fputs(certify_usage, stdout);
            return 1;
        }
        if (strcmp(arg, "--json") == 0)
            a->json = 1;
        else if (strcmp(arg, "--summary") == 0)
            a->summary = 1;
        else if (arg[0] == '-' && arg[1] != '\0')
            return usage_error("unknown option '%s'", arg);
        else if (a->graph == NULL)
            a->graph = arg;
        else
            return usage_error("unexpected argument '%s'", arg);
    }
    return check_combination(a);
}

void certify_report_bug(const pw_verdict *v, const char *graph_path, const char *where)
{
    if (v == NULL) {
        fprintf(stderr, "planewit certify: BUG: the producer found its own state inconsistent "
                        "on %s%s; nothing was written.\n", graph_path, where);
    } else {
        fprintf(stderr, "planewit certify: BUG: the kernel refused the certificate planewit "
                        "made for %s%s; nothing was written.\n"
                        "planewit certify: the kernel said: ", graph_path, where);
        cli_print_verdict(stderr, v, graph_path, "<certificate in memory>");
    }
    fputs("planewit certify: please report this together with the graph.\n", stderr);
}

static int write_certificate(const char *path, const prover *p)
{
    cli_output o;
    if (cli_output_open(&o, path) != 0)
        return -1;
    if (fwrite(p->cert, 1, p->cert_len, o.file) != p->cert_len) {
        fprintf(stderr, "planewit certify: %s: cannot write\n", path);
        cli_output_abort(&o);
        return -1;
    }
    return cli_output_commit(&o);
}

/* The report after a certificate was made, checked and (with -o) written. */
static void report(const certify_args *a, const prover *p, const pw_graph *g,
                   const name_table *names, const pw_verdict *v)
{
    int to_stdout = a->output != NULL && strcmp(a->output, "-") == 0;
    FILE *out = to_stdout ? stderr : stdout;
    const char *cert_path = a->output != NULL ? a->output : "<not written>";
    if (a->json)
        cli_print_record(out, v, a->graph, cert_path);
    else
        cli_print_verdict(out, v, a->graph, cert_path);
    witness_show(a->json ? stderr : out, p, g, names);
    if (a->output == NULL)
        fputs("planewit certify: no certificate written (give -o CERT to write one)\n", stderr);
    else if (!to_stdout)
        fprintf(stderr, "planewit certify: certificate written to %s\n", a->output);
}

static int load_names(const certify_args *a, const pw_graph *g, const unsigned char *sha,
                      name_table *names)
{
    cli_input in;
    if (cli_read_input(&in, a->names, &a->lim) != 0)
        return -1;
    int rc = names_read(&in, g->n, sha, names);
    cli_free_input(&in);
    return rc;
}

/* Everything after the graph file was read; returns the exit status. */
static int certify_graph(const certify_args *a, cli_input *in, pw_graph *g)
{
    unsigned char sha[32];
    name_table names = {0};
    prover p;
    pw_verdict v;
    int status = CLI_EXIT_USAGE;
    if (cli_sha256(in->bytes, in->len, sha) != 0 || prover_open(&p, a->choice) != 0) {
        fputs("planewit certify: out of memory\n", stderr);
        return CLI_EXIT_USAGE;
    }
    if (a->names != NULL && load_names(a, g, sha, &names) != 0)
        goto done;
    prove_status got = prover_run_file(&p, in, &a->lim, g, sha, &v);
    if (got == PROVE_NO_MEMORY) {
        fputs("planewit certify: out of memory\n", stderr);
    } else if (got == PROVE_GRAPH_CHANGED || got == PROVE_REREAD_FAILED) {
        /* for a failed reading, the reader has printed its reason already */
        fprintf(stderr, "planewit certify: %s: %s; nothing was written\n", a->graph,
                got == PROVE_GRAPH_CHANGED ? "the file changed while it was being certified"
                                           : "could not be read again for the self-check");
    } else if (got == PROVE_REFUSED || got == PROVE_PRODUCER_FAILED) {
        certify_report_bug(got == PROVE_REFUSED ? &v : NULL, a->graph, "");
        status = CLI_EXIT_BUG;
    } else if (a->output == NULL || write_certificate(a->output, &p) == 0) {
        report(a, &p, g, a->names != NULL ? &names : NULL, &v);
        status = 0;
    }
done:
    name_table_free(&names);
    prover_close(&p);
    return status;
}

int cmd_certify(int argc, char **argv)
{
    certify_args a;
    cli_input in;
    pw_graph g;
    pw_verdict v;
    memset(&a, 0, sizeof a);
    int parsed = parse_args(argc, argv, &a);
    if (parsed != 0)
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    if (a.graph6 != NULL)
        return certify_stream(&a);
    cli_heap_for_one_job(a.graph, CLI_ONE_JOB_HEAP_LARGEST);
    if (cli_read_input(&in, a.graph, &a.lim) != 0)
        return CLI_EXIT_USAGE;
    memset(&v, 0, sizeof v);
    int status = CLI_EXIT_USAGE;
    if (pw_graph_parse(in.bytes, in.len, &a.lim, &g, &v) != PW_OK)
        cli_print_verdict(stderr, &v, a.graph, "-");
    else
        status = certify_graph(&a, &in, &g);
    pw_graph_free(&g);
    cli_free_input(&in);
    return status;
}
