/*
 * cmd_seal.c - `planewit seal DIR`: DIR/SHA256SUMS over every file in DIR
 * (the format `sha256sum -c` reads) and DIR/seal.json, the seal record
 * (format-spec/seal.md) with the sums' own digest and the verdict of every
 * graph/certificate pair at sealing time.  Both written whole or not at all.
 */
#include "archive.h"

#include <stdlib.h>
#include <string.h>

static const char seal_usage[] =
    "usage: planewit seal DIR\n"
    "\n"
    "Writes DIR/SHA256SUMS (checkable with 'sha256sum -c') over every file under DIR,\n"
    "checks every graph/certificate pair (X.cert with X.graph), and writes the seal\n"
    "record DIR/seal.json.  'planewit audit DIR' verifies both later.\n"
    "\n"
    "Exit status: 0 sealed and every pair accepted, 1 sealed but a pair is not\n"
    "accepted, 2 nothing sealed (unreadable file, symbolic link, usage error).\n";

/* Writes DIR/SHA256SUMS; 0 or -1 after printing why. */
static int write_sums(const char *dir, const file_set *files)
{
    char path[PATH_MAX], full[PATH_MAX], hex[65];
    unsigned char sha[32];
    cli_output o;
    if (tree_join(dir, ARCHIVE_SUMS, path, sizeof path) != 0 || cli_output_open(&o, path) != 0)
        return -1;
    for (size_t i = 0; i < files->count; i++) {
        if (tree_join(dir, files->paths[i], full, sizeof full) != 0 ||
            cli_sha256_file(full, sha) != 0) {
            fprintf(stderr, "planewit seal: %s: cannot read\n", full);
            cli_output_abort(&o);
            return -1;
        }
        cli_sha256_hex(sha, hex);
        fprintf(o.file, "%s  %s\n", hex, files->paths[i]);
    }
    return cli_output_commit(&o);
}

static const char *status_name(pw_status s)
{
    return s == PW_ACCEPTED ? "accepted" : s == PW_REJECTED ? "rejected" : "unusable";
}

static void print_pairs(FILE *out, const file_pair *pairs, const pw_verdict *verdicts,
                        size_t count)
{
    fputs("[", out);
    for (size_t i = 0; i < count; i++) {
        fputs(i ? ",\n    {\"graph\": " : "\n    {\"graph\": ", out);
        json_string(out, pairs[i].graph);
        fputs(", \"certificate\": ", out);
        json_string(out, pairs[i].cert);
        fprintf(out, ", \"verdict\": \"%s\", \"reason\": ", status_name(verdicts[i].status));
        json_string(out, pw_code_name(verdicts[i].code));
        fputs("}", out);
    }
    fputs(count ? "\n  ]" : "]", out);
}

typedef struct {
    const file_set *files;
    const pair_results *pairs;
    unsigned char sums_sha[32];
} seal_facts;

static int write_seal_record(const char *dir, const seal_facts *f)
{
    char path[PATH_MAX];
    cli_output o;
    if (tree_join(dir, ARCHIVE_SEAL, path, sizeof path) != 0 || cli_output_open(&o, path) != 0)
        return -1;
    fputs("{\n  \"record\": \"planewit-seal\",\n  \"record_version\": 1,\n  \"time_utc\": ", o.file);
    cli_print_utc_now(o.file);
    fprintf(o.file, ",\n  \"files\": %zu,\n  \"sums_file\": \"%s\",\n  \"sums_sha256\": ",
            f->files->count, ARCHIVE_SUMS);
    json_hex(o.file, f->sums_sha, 32);
    fputs(",\n  \"pairs\": ", o.file);
    print_pairs(o.file, f->pairs->pairs, f->pairs->verdicts, f->pairs->count);
    fprintf(o.file, ",\n  \"unpaired_certificates\": %zu,\n  \"tool\": ", f->pairs->unpaired);
    cli_print_tool(o.file);
    fputs(",\n  \"caution\": ", o.file);
    json_string(o.file, cli_caution);
    fputs("\n}\n", o.file);
    return cli_output_commit(&o);
}

/* Seals an existing folder; the exit status. */
static int seal(const char *dir)
{
    char sums[PATH_MAX];
    file_set files;
    pair_results pairs = {NULL, NULL, 0, 0, 0};
    seal_facts facts = {&files, &pairs, {0}};
    int status = CLI_EXIT_USAGE;
    if (tree_list(dir, &files) == 0 && check_all_pairs(dir, &files, &pairs) == 0 &&
        write_sums(dir, &files) == 0 && tree_join(dir, ARCHIVE_SUMS, sums, sizeof sums) == 0 &&
        cli_sha256_file(sums, facts.sums_sha) == 0 && write_seal_record(dir, &facts) == 0) {
        report_failed_pairs(stdout, &pairs);
        printf("sealed %s: %zu files in %s, seal record %s; %zu pairs checked, %zu accepted, "
               "%zu not; %zu certificates without a graph\n",
               dir, files.count, ARCHIVE_SUMS, ARCHIVE_SEAL, pairs.count, pairs.accepted,
               pairs.count - pairs.accepted, pairs.unpaired);
        status = pairs.accepted == pairs.count ? 0 : 1;
    } else {
        fprintf(stderr, "planewit seal: %s was not sealed (or only in part: seal it again)\n", dir);
    }
    pair_results_free(&pairs);
    file_set_free(&files);
    return status;
}

int cmd_seal(int argc, char **argv)
{
    if (argc == 2 && (strcmp(argv[1], "-h") == 0 || strcmp(argv[1], "--help") == 0)) {
        fputs(seal_usage, stdout);
        return 0;
    }
    if (argc != 2 || (argv[1][0] == '-' && argv[1][1] != '\0')) {
        fputs("planewit seal: needs exactly one folder\nTry 'planewit seal --help'.\n", stderr);
        return CLI_EXIT_USAGE;
    }
    return seal(argv[1]);
}
