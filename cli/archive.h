/*
 * archive.h - sealed archives (format-spec/seal.md): `planewit seal DIR`
 * writes DIR/SHA256SUMS and DIR/seal.json; `planewit audit DIR` verifies
 * them and re-checks every graph/certificate pair.
 */
#ifndef PW_ARCHIVE_H
#define PW_ARCHIVE_H

#include "cli.h"

#include <limits.h>

#ifndef PATH_MAX
#define PATH_MAX 4096
#endif

#define ARCHIVE_SUMS "SHA256SUMS"
#define ARCHIVE_SEAL "seal.json"

/* Regular files under a folder, as sorted relative paths (tree.c). */
typedef struct {
    char **paths;
    size_t count, cap;
} file_set;

/*
 * Every regular file under dir except the top-level SHA256SUMS and seal.json,
 * sorted bytewise.  0, or -1 after printing why (a symbolic link or other
 * special file, a name sha256sum would have to escape, a read error).
 */
int tree_list(const char *dir, file_set *set);
int file_set_add(file_set *set, const char *path);
void file_set_sort(file_set *set);
/* The set's own copy of path (in a sorted set), or NULL. */
const char *file_set_find(const file_set *set, const char *path);
void file_set_free(file_set *set);
/* dir/rel read whole, within the default limits; 0 or -1 (nothing printed). */
int tree_read(const char *dir, const char *rel, cli_input *in);
/* dir "/" path into out; 0, or -1 if too long. */
int tree_join(const char *dir, const char *path, char *out, size_t size);

/* A graph/certificate pair found by name (pairs.c): X.cert goes with X.graph. */
typedef struct {
    const char *graph, *cert; /* entries of the file_set */
} file_pair;
/* Pairs of `set`, in the order of the certificates; *unpaired counts certificates without a graph. */
int find_pairs(const file_set *set, file_pair **pairs, size_t *count, size_t *unpaired);
/* The certificate of a pair checked from disk; fills *v (an unreadable file is unusable). */
void check_pair(const char *dir, const file_pair *p, pw_verdict *v);

/* Every pair of a set, checked from disk (pairs.c). */
typedef struct {
    file_pair *pairs;
    pw_verdict *verdicts; /* one per pair */
    size_t count, accepted, unpaired;
} pair_results;
int check_all_pairs(const char *dir, const file_set *set, pair_results *r);
/* "does not check: G + C: <verdict line>" for every pair not accepted. */
void report_failed_pairs(FILE *out, const pair_results *r);
void pair_results_free(pair_results *r);

/* One line of SHA256SUMS (sums.c). */
typedef struct {
    char hex[65];
    char *path;
} sums_entry;
/* Parses DIR/SHA256SUMS; entries sorted by path.  0, or -1 after printing file, line and what. */
int sums_read(const char *file, sums_entry **entries, size_t *count);
void sums_free(sums_entry *entries, size_t count);

#endif
