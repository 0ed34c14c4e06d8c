/*
 * cmd_selftest.c - `planewit selftest [--vectors DIR] [-o REPORT]`: the
 * qualification run.  Verifies every hash of DIR/SHA256SUMS, checks that the
 * vector set is the one this binary was built with, runs every case of
 * DIR/MANIFEST through the kernel and compares it with its expectation, and
 * writes the qualification report (format-spec/seal.md).  Any deviation
 * makes the run fail: exit 1.
 */
#include "selftest.h"

#include <stdlib.h>
#include <string.h>

static const char selftest_usage[] =
    "usage: planewit selftest [--vectors DIR] [-o REPORT]\n"
    "\n"
    "Verifies the SHA-256 of every file of DIR/SHA256SUMS (default DIR: vectors),\n"
    "runs every case of DIR/MANIFEST and compares its verdict, reason, counts and\n"
    "location with the manifest; writes a JSON qualification report to REPORT.\n"
    "\n"
    "Exit status: 0 qualified, 1 a deviation, 2 the vectors cannot be read.\n";

typedef struct {
    const char *dir;
    sums_entry *sums;
    size_t sum_count, hash_failures, cases, case_deviations, deviations;
    char set_hex[65];
    FILE *report;
} qualification;

static const sums_entry *find_sum(const qualification *q, const char *path)
{
    for (size_t lo = 0, hi = q->sum_count; lo < hi;) {
        size_t mid = lo + (hi - lo) / 2;
        int order = strcmp(path, q->sums[mid].path);
        if (order == 0)
            return &q->sums[mid];
        if (order < 0)
            hi = mid;
        else
            lo = mid + 1;
    }
    return NULL;
}

/* Every listed file has its listed digest; failures go into the report and on stdout. */
static void verify_hashes(qualification *q)
{
    char full[PATH_MAX], hex[65];
    unsigned char sha[32];
    fputs(",\n  \"hash_failures\": [", q->report);
    for (size_t i = 0; i < q->sum_count; i++) {
        int readable = tree_join(q->dir, q->sums[i].path, full, sizeof full) == 0 &&
                       cli_sha256_file(full, sha) == 0;
        if (readable)
            cli_sha256_hex(sha, hex);
        if (readable && strcmp(hex, q->sums[i].hex) == 0)
            continue;
        fprintf(stderr, "deviation: %s/%s: %s\n", q->dir, q->sums[i].path,
               readable ? "SHA-256 differs from SHA256SUMS" : "cannot be read");
        fputs(q->hash_failures++ ? ", " : "", q->report);
        json_string(q->report, q->sums[i].path);
    }
    fprintf(q->report, "],\n  \"files_verified\": %zu", q->sum_count - q->hash_failures);
}

/* "" when every file of the case is covered by SHA256SUMS, else the first that is not. */
static const char *uncovered(const qualification *q, const vector_case *c)
{
    if (find_sum(q, c->graph) == NULL)
        return c->graph;
    return find_sum(q, c->cert) == NULL ? c->cert : "";
}

static void run_case(qualification *q, const vector_case *c)
{
    pw_verdict v;
    char why[300];
    const char *missing = uncovered(q, c);
    selftest_run_case(q->dir, c, &v, why, sizeof why);
    if (why[0] == '\0' && missing[0] != '\0')
        snprintf(why, sizeof why, "%s is not covered by SHA256SUMS", missing);
    fputs(q->cases++ ? ",\n    {\"case\": " : "\n    {\"case\": ", q->report);
    json_string(q->report, c->name);
    fprintf(q->report, ", \"expected\": \"%s %s\", \"got\": \"%s %s\", \"result\": \"%s\"",
            c->verdict, c->reason,
            v.status == PW_ACCEPTED ? "accepted" : v.status == PW_REJECTED ? "rejected" : "unusable",
            pw_code_name(v.code), why[0] ? "deviation" : "pass");
    if (why[0]) {
        fputs(", \"detail\": ", q->report);
        json_string(q->report, why);
        fprintf(stderr, "deviation: case %s: %s\n", c->name, why);
        q->case_deviations++;
        q->deviations++;
    }
    fputc('}', q->report);
}

/* Every case of DIR/MANIFEST; 0, or -1 after printing a malformed line. */
static int run_manifest(qualification *q)
{
    cli_input manifest;
    if (tree_read(q->dir, "MANIFEST", &manifest) != 0) {
        fprintf(stderr, "planewit selftest: %s/MANIFEST: cannot read\n", q->dir);
        return -1;
    }
    if (find_sum(q, "MANIFEST") == NULL) {
        fprintf(stderr, "deviation: %s/MANIFEST is not covered by SHA256SUMS\n", q->dir);
        q->deviations++;
    }
    char *text = realloc(manifest.bytes, manifest.len + 1), *save = NULL;
    int rc = text != NULL ? 0 : -1;
    size_t number = 0;
    if (text != NULL)
        text[manifest.len] = '\0';
    fputs(",\n  \"cases\": [", q->report);
    for (char *at = text; rc == 0 && at != NULL && *at; at = save) {
        char *end = strchr(at, '\n');
        save = end != NULL ? end + 1 : NULL;
        if (end != NULL)
            *end = '\0';
        number++;
        vector_case c;
        int got = manifest_parse_line(at, &c);
        if (got < 0) {
            fprintf(stderr, "planewit selftest: %s/MANIFEST line %zu: expected NAME GRAPH CERT "
                    "VERDICT REASON FACES COMPONENTS WHERE\n", q->dir, number);
            rc = -1;
        } else if (got > 0) {
            run_case(q, &c);
        }
    }
    fputs(q->cases ? "\n  ]" : "]", q->report);
    free(text != NULL ? text : manifest.bytes);
    return rc;
}

static void report_header(qualification *q)
{
    const char *built = cli_build_vector_set();
    fputs("{\n  \"record\": \"planewit-qualification\",\n  \"record_version\": 1,\n"
          "  \"time_utc\": ", q->report);
    cli_print_utc_now(q->report);
    fputs(",\n  \"tool\": ", q->report);
    cli_print_tool(q->report);
    fputs(",\n  \"vectors\": ", q->report);
    json_string(q->report, q->dir);
    fprintf(q->report, ",\n  \"vector_set_sha256\": \"%s\",\n  \"matches_build\": %s",
            q->set_hex, built != NULL && strcmp(built, q->set_hex) == 0 ? "true" : "false");
    if (built == NULL || strcmp(built, q->set_hex) != 0) {
        fprintf(stderr, "deviation: vector set %s is not the one this binary was built with (%s)\n",
                q->set_hex, built != NULL ? built : "none");
        q->deviations++;
    }
}

/* The whole run into q->report; 0, or -1 when the vectors cannot be read. */
static int qualify(qualification *q)
{
    char sums_path[PATH_MAX];
    unsigned char set_sha[32];
    if (tree_join(q->dir, "SHA256SUMS", sums_path, sizeof sums_path) != 0 ||
        sums_read(sums_path, &q->sums, &q->sum_count) != 0 ||
        cli_sha256_file(sums_path, set_sha) != 0)
        return -1;
    cli_sha256_hex(set_sha, q->set_hex);
    report_header(q);
    verify_hashes(q);
    q->deviations += q->hash_failures;
    if (run_manifest(q) != 0)
        return -1;
    fprintf(q->report, ",\n  \"totals\": {\"cases\": %zu, \"passed\": %zu, \"deviations\": %zu},"
            "\n  \"result\": \"%s\"\n}\n", q->cases, q->cases - q->case_deviations,
            q->deviations, q->deviations == 0 ? "qualified" : "not qualified");
    return 0;
}

/* 0 parsed, 1 help printed, -1 usage error printed. */
static int parse_args(int argc, char **argv, const char **dir, const char **output)
{
    for (int i = 1; i < argc; i++) {
        if (strcmp(argv[i], "-h") == 0 || strcmp(argv[i], "--help") == 0) {
            fputs(selftest_usage, stdout);
            return 1;
        }
        if ((strcmp(argv[i], "--vectors") == 0 || strcmp(argv[i], "-o") == 0) && i + 1 < argc) {
            *(argv[i][1] == 'o' ? output : dir) = argv[i + 1];
            i++;
        } else {
            fprintf(stderr, "planewit selftest: unexpected argument '%s'\n"
                    "Try 'planewit selftest --help'.\n", argv[i]);
            return -1;
        }
    }
    return 0;
}

int cmd_selftest(int argc, char **argv)
{
    qualification q;
    const char *output = "-";
    cli_output o;
    memset(&q, 0, sizeof q);
    q.dir = "vectors";
    int parsed = parse_args(argc, argv, &q.dir, &output);
    if (parsed != 0)
        return parsed > 0 ? 0 : CLI_EXIT_USAGE;
    if (cli_output_open(&o, output) != 0)
        return CLI_EXIT_USAGE;
    q.report = o.file;
    int rc = qualify(&q);
    sums_free(q.sums, q.sum_count);
    if (rc != 0 || cli_output_commit(&o) != 0) {
        if (rc != 0)
            cli_output_abort(&o);
        fprintf(stderr, "planewit selftest: no qualification report written\n");
        return CLI_EXIT_USAGE;
    }
    fprintf(stderr, "selftest: %zu cases, %zu deviations; vector set %s: %s\n", q.cases,
            q.deviations, q.set_hex, q.deviations == 0 ? "QUALIFIED" : "NOT QUALIFIED");
    return q.deviations == 0 ? 0 : 1;
}
