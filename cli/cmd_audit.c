/*
 * cmd_audit.c - `planewit audit DIR`: is DIR still exactly what was sealed,
 * and does every certificate in it still check?  Names every file changed,
 * added or removed since sealing, checks the seal record's digest of
 * SHA256SUMS, and re-checks every graph/certificate pair now on disk.
 */
#include "archive.h"

#include <stdlib.h>
#include <string.h>

static const char audit_usage[] =
    "usage: planewit audit DIR\n"
    "\n"
    "Verifies DIR/SHA256SUMS and DIR/seal.json written by 'planewit seal DIR': names\n"
    "every file changed, added or removed since, and re-checks every graph/certificate\n"
    "pair (X.cert with X.graph).\n"
    "\n"
    "Exit status: 0 nothing changed and every pair accepted, 1 a change or a pair not\n"
    "accepted, 2 DIR or its SHA256SUMS unreadable or malformed, or a usage error.\n";

typedef struct {
    size_t verified, changed, added, removed;
} audit_counts;

/* One file in both lists: compare its digest now with the sealed one. */
static void compare_file(const char *dir, const sums_entry *e, audit_counts *c)
{
    char full[PATH_MAX], hex[65];
    unsigned char sha[32];
    if (tree_join(dir, e->path, full, sizeof full) != 0 || cli_sha256_file(full, sha) != 0) {
        printf("unreadable: %s\n", e->path);
        c->changed++;
        return;
    }
    cli_sha256_hex(sha, hex);
    if (strcmp(hex, e->hex) == 0) {
        c->verified++;
    } else {
        printf("changed: %s\n", e->path);
        c->changed++;
    }
}

/* Walks both sorted lists together, like a merge. */
static void compare_trees(const char *dir, const sums_entry *sealed, size_t n,
                          const file_set *now, audit_counts *c)
{
    size_t i = 0, j = 0;
    while (i < n || j < now->count) {
        int order = i == n ? 1 : j == now->count ? -1 : strcmp(sealed[i].path, now->paths[j]);
        if (order < 0) {
            printf("removed: %s\n", sealed[i++].path);
            c->removed++;
        } else if (order > 0) {
            printf("added: %s\n", now->paths[j++]);
            c->added++;
        } else {
            compare_file(dir, &sealed[i++], c);
            j++;
        }
    }
}

static const char *find_bytes(const char *hay, size_t n, const char *needle, size_t k)
{
    for (size_t i = 0; k <= n && i <= n - k; i++)
        if (memcmp(hay + i, needle, k) == 0)
            return hay + i;
    return NULL;
}

/* The seal record names the digest SHA256SUMS had when sealed; 0 when it still has it. */
static int check_seal_record(const char *dir)
{
    static const char key[] = "\"sums_sha256\": \"";
    char path[PATH_MAX], hex[65];
    unsigned char sha[32];
    cli_input record = {ARCHIVE_SEAL, NULL, 0};
    pw_limits lim;
    pw_limits_default(&lim);
    lim.max_bytes = (uint64_t)1 << 30;
    FILE *f = tree_join(dir, ARCHIVE_SEAL, path, sizeof path) == 0 ? fopen(path, "rb") : NULL;
    if (f == NULL || pw_read_all(f, lim.max_bytes, &record.bytes, &record.len) != PW_OK) {
        printf("missing: %s (the seal record cannot be read)\n", ARCHIVE_SEAL);
        if (f != NULL)
            fclose(f);
        return -1;
    }
    fclose(f);
    const char *at = find_bytes(record.bytes, record.len, key, sizeof key - 1);
    int same = 0;
    if (at != NULL && tree_join(dir, ARCHIVE_SUMS, path, sizeof path) == 0 &&
        cli_sha256_file(path, sha) == 0) {
        size_t offset = (size_t)(at - record.bytes) + sizeof key - 1;
        cli_sha256_hex(sha, hex);
        same = record.len - offset >= 64 && memcmp(record.bytes + offset, hex, 64) == 0;
    }
    free(record.bytes);
    if (!same)
        printf("changed: %s (its digest is not the one in %s)\n", ARCHIVE_SUMS, ARCHIVE_SEAL);
    return same ? 0 : -1;
}

static int audit(const char *dir)
{
    char sums_path[PATH_MAX];
    sums_entry *sealed = NULL;
    size_t n = 0;
    file_set now = {NULL, 0, 0};
    pair_results pairs = {NULL, NULL, 0, 0, 0};
    audit_counts c = {0, 0, 0, 0};
    if (tree_join(dir, ARCHIVE_SUMS, sums_path, sizeof sums_path) != 0 ||
        sums_read(sums_path, &sealed, &n) != 0 || tree_list(dir, &now) != 0 ||
        check_all_pairs(dir, &now, &pairs) != 0) {
        fprintf(stderr, "planewit audit: %s could not be audited\n", dir);
        sums_free(sealed, n);
        file_set_free(&now);
        return CLI_EXIT_USAGE;
    }
    compare_trees(dir, sealed, n, &now, &c);
    int seal_ok = check_seal_record(dir) == 0;
    report_failed_pairs(stdout, &pairs);
    int clean = seal_ok && c.changed + c.added + c.removed == 0 && pairs.accepted == pairs.count;
    printf("audit %s: %zu files verified, %zu changed, %zu added, %zu removed; seal record %s; "
           "%zu pairs checked, %zu accepted, %zu not; %zu certificates without a graph: %s\n",
           dir, c.verified, c.changed, c.added, c.removed, seal_ok ? "matches" : "DOES NOT MATCH",
           pairs.count, pairs.accepted, pairs.count - pairs.accepted, pairs.unpaired,
           clean ? "intact" : "NOT INTACT");
    pair_results_free(&pairs);
    sums_free(sealed, n);
    file_set_free(&now);
    return clean ? 0 : 1;
}

int cmd_audit(int argc, char **argv)
{
    if (argc == 2 && (strcmp(argv[1], "-h") == 0 || strcmp(argv[1], "--help") == 0)) {
        fputs(audit_usage, stdout);
        return 0;
    }
    if (argc != 2 || (argv[1][0] == '-' && argv[1][1] != '\0')) {
        fputs("planewit audit: needs exactly one folder\nTry 'planewit audit --help'.\n", stderr);
        return CLI_EXIT_USAGE;
    }
    return audit(argv[1]);
}
