/*
 * test_vectors.c - the committed vectors (vectors/MANIFEST) through the kernel.
 *
 * Nothing is trusted before it is proven to be the reviewed bytes: the group
 * setup checks every line of vectors/SHA256SUMS against the file's actual
 * SHA-256, and that every file the manifest names (and the manifest itself,
 * and every file below vectors/graphs and vectors/certs) is listed there.  A
 * changed or unlisted vector is named on stderr and no case runs.  It then
 * prints the vector-set digest, the SHA-256 of SHA256SUMS.
 *
 * The expectations come from the manifest, whose comments and the vector
 * files' own headers name their sources (Euler's polyhedron formula,
 * Kuratowski 1930, the edge bounds as common practice, the format rules).
 * Runs from the repository root, as tests/run-all.sh does.
 */
#include <stdarg.h>
#include <stddef.h>
#include <setjmp.h>
#include <cmocka.h>

#include <dirent.h>
#include <openssl/evp.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "planewit.h"

#define VECTORS "vectors/"
#define SUMS_FILE VECTORS "SHA256SUMS"
#define MANIFEST_FILE VECTORS "MANIFEST"
#define NAME_MAX_LEN 128
#define FIELDS 8

typedef struct {
    char *bytes;
    size_t len;
} blob;

typedef struct {
    char name[NAME_MAX_LEN];
    char hex[65];
} sum_line;

typedef struct {
    char field[FIELDS][NAME_MAX_LEN]; /* name graph cert verdict reason faces components where */
    unsigned line;                    /* in MANIFEST */
} manifest_case;

typedef struct {
    sum_line *sums;
    size_t n_sums;
    manifest_case *cases;
    size_t n_cases;
} vector_set;

enum { F_NAME, F_GRAPH, F_CERT, F_VERDICT, F_REASON, F_FACES, F_COMPONENTS, F_WHERE };

/* ---- files and digests ------------------------------------------------- */

static int read_file(const char *path, blob *out)
{
    FILE *f = fopen(path, "rb");
    out->bytes = NULL;
    out->len = 0;
    if (f == NULL)
        return -1;
    pw_code code = pw_read_all(f, (uint64_t)1 << 26, &out->bytes, &out->len);
    fclose(f);
    return code == PW_OK ? 0 : -1;
}

static void sha256_hex(const char *bytes, size_t len, char hex[65])
{
    unsigned char digest[32];
    unsigned int size = 0;
    if (EVP_Digest(bytes, len, digest, &size, EVP_sha256(), NULL) != 1 || size != 32) {
        fprintf(stderr, "test_vectors: SHA-256 failed\n");
        exit(1);
    }
    for (size_t i = 0; i < 32; i++)
        snprintf(hex + 2 * i, 3, "%02x", digest[i]);
}

static void *grow(void *array, size_t count, size_t size)
{
    void *bigger = realloc(array, (count + 1) * size);
    if (bigger == NULL) {
        fprintf(stderr, "test_vectors: out of memory\n");
        exit(1);
    }
    return bigger;
}

/* Next line of a NUL-terminated text, without its LF; NULL at the end. */
static char *next_line(char **cursor)
{
    char *line = *cursor;
    if (*line == '\0')
        return NULL;
    char *lf = strchr(line, '\n');
    if (lf != NULL) {
        *lf = '\0';
        *cursor = lf + 1;
    } else {
        *cursor = line + strlen(line);
    }
    return line;
}

/* ---- SHA256SUMS: "<64 lowercase hex><space><space or *><name>" per line --- */

static int parse_sum_line(const char *line, sum_line *out)
{
    size_t len = strlen(line);
    if (len < 67 || len - 66 >= NAME_MAX_LEN || line[64] != ' ' ||
        (line[65] != ' ' && line[65] != '*'))
        return -1;
    for (size_t i = 0; i < 64; i++)
        if (!((line[i] >= '0' && line[i] <= '9') || (line[i] >= 'a' && line[i] <= 'f')))
            return -1;
    memcpy(out->hex, line, 64);
    out->hex[64] = '\0';
    memcpy(out->name, line + 66, len - 66 + 1);
    return 0;
}

static int load_sums(vector_set *set, char *text)
{
    char *cursor = text, *line;
    unsigned number = 0;
    while ((line = next_line(&cursor)) != NULL) {
        number++;
        set->sums = grow(set->sums, set->n_sums, sizeof *set->sums);
        if (parse_sum_line(line, &set->sums[set->n_sums]) != 0) {
            fprintf(stderr, "%s line %u: not '<sha256>  <file>'\n", SUMS_FILE, number);
            return -1;
        }
        set->n_sums++;
    }
    return set->n_sums > 0 ? 0 : -1;
}

/* Every listed file must have exactly the listed digest; each failure is named. */
static int verify_sums(const vector_set *set)
{
    int changed = 0;
    for (size_t i = 0; i < set->n_sums; i++) {
        char path[NAME_MAX_LEN + 16], hex[65];
        blob file;
        snprintf(path, sizeof path, VECTORS "%s", set->sums[i].name);
        if (read_file(path, &file) != 0) {
            fprintf(stderr, "VECTOR MISSING: %s is listed in %s but cannot be read\n", path,
                    SUMS_FILE);
            changed++;
            continue;
        }
        sha256_hex(file.bytes, file.len, hex);
        free(file.bytes);
        if (strcmp(hex, set->sums[i].hex) != 0) {
            fprintf(stderr, "VECTOR CHANGED: %s has SHA-256 %s, %s lists %s\n", path, hex,
                    SUMS_FILE, set->sums[i].hex);
            changed++;
        }
    }
    return changed;
}

static int listed(const vector_set *set, const char *name)
{
    for (size_t i = 0; i < set->n_sums; i++)
        if (strcmp(set->sums[i].name, name) == 0)
            return 1;
    return 0;
}

/* No file in a vector directory may escape the sums. */
static int unlisted_in_dir(const vector_set *set, const char *dir)
{
    char path[NAME_MAX_LEN + 16];
    int missing = 0;
    snprintf(path, sizeof path, VECTORS "%s", dir);
    DIR *d = opendir(path);
    if (d == NULL) {
        fprintf(stderr, "test_vectors: cannot list %s\n", path);
        return 1;
    }
    for (struct dirent *e; (e = readdir(d)) != NULL;) {
        char name[512];
        if (e->d_name[0] == '.')
            continue;
        snprintf(name, sizeof name, "%s/%s", dir, e->d_name);
        if (!listed(set, name)) {
            fprintf(stderr, "VECTOR UNLISTED: vectors/%s is not in %s (run vectors/regen-sums.sh)\n",
                    name, SUMS_FILE);
            missing++;
        }
    }
    closedir(d);
    return missing;
}

/* ---- MANIFEST ------------------------------------------------------------ */

static int split_fields(char *line, manifest_case *c)
{
    int n = 0;
    char *hash = strchr(line, '#');
    if (hash != NULL)
        *hash = '\0';
    for (char *tok = strtok(line, " \t\r"); tok != NULL; tok = strtok(NULL, " \t\r")) {
        if (n == FIELDS || strlen(tok) >= NAME_MAX_LEN)
            return -1;
        strcpy(c->field[n++], tok);
    }
    return n;
}

static int load_manifest(vector_set *set, char *text)
{
    char *cursor = text, *line;
    unsigned number = 0;
    while ((line = next_line(&cursor)) != NULL) {
        manifest_case c;
        number++;
        int n = split_fields(line, &c);
        if (n == 0)
            continue;
        if (n != FIELDS) {
            fprintf(stderr, "%s line %u: expected %d fields\n", MANIFEST_FILE, number, FIELDS);
            return -1;
        }
        c.line = number;
        set->cases = grow(set->cases, set->n_cases, sizeof *set->cases);
        set->cases[set->n_cases++] = c;
    }
    return set->n_cases > 0 ? 0 : -1;
}

static int manifest_files_listed(const vector_set *set)
{
    int missing = !listed(set, "MANIFEST");
    if (missing)
        fprintf(stderr, "VECTOR UNLISTED: %s is not in %s\n", MANIFEST_FILE, SUMS_FILE);
    for (size_t i = 0; i < set->n_cases; i++)
        for (int f = F_GRAPH; f <= F_CERT; f++)
            if (!listed(set, set->cases[i].field[f])) {
                fprintf(stderr, "VECTOR UNLISTED: case %s names %s, which %s does not cover\n",
                        set->cases[i].field[F_NAME], set->cases[i].field[f], SUMS_FILE);
                missing++;
            }
    return missing;
}

/* ---- setup: prove the bytes, then load the cases --------------------------- */

static vector_set the_set;

static int load_verified(void)
{
    blob sums, manifest;
    char digest[65];
    if (read_file(SUMS_FILE, &sums) != 0) {
        fprintf(stderr, "test_vectors: cannot read %s (run from the repository root)\n", SUMS_FILE);
        return -1;
    }
    sha256_hex(sums.bytes, sums.len, digest);
    printf("vector-set digest: %s (SHA-256 of %s)\n", digest, SUMS_FILE);
    sums.bytes = grow(sums.bytes, sums.len, 1);
    sums.bytes[sums.len] = '\0';
    int bad = load_sums(&the_set, sums.bytes) != 0;
    free(sums.bytes);
    if (bad || verify_sums(&the_set) != 0)
        return -1;
    if (read_file(MANIFEST_FILE, &manifest) != 0)
        return -1;
    manifest.bytes = grow(manifest.bytes, manifest.len, 1);
    manifest.bytes[manifest.len] = '\0';
    bad = load_manifest(&the_set, manifest.bytes) != 0;
    free(manifest.bytes);
    if (bad)
        return -1;
    bad = manifest_files_listed(&the_set) + unlisted_in_dir(&the_set, "graphs") +
          unlisted_in_dir(&the_set, "certs");
    printf("%zu vector files verified against %s; %zu manifest cases\n", the_set.n_sums,
           SUMS_FILE, the_set.n_cases);
    return bad == 0 ? 0 : -1;
}

static int group_setup(void **state)
{
    *state = &the_set;
    if (load_verified() == 0)
        return 0;
    fprintf(stderr, "test_vectors: the vector set is not the reviewed one; no case runs\n");
    return -1;
}

static int group_teardown(void **state)
{
    (void)state;
    free(the_set.sums);
    free(the_set.cases);
    return 0;
}

/* ---- running one case --------------------------------------------------------- */

static pw_status run_pair(const blob *graph, const blob *cert, pw_verdict *v)
{
    pw_limits lim;
    pw_limits_default(&lim);
    return pw_check(graph->bytes, graph->len, cert->bytes, cert->len, &lim, v);
}

static int load_pair(const manifest_case *c, blob *graph, blob *cert)
{
    char gpath[NAME_MAX_LEN + 16], cpath[NAME_MAX_LEN + 16];
    snprintf(gpath, sizeof gpath, VECTORS "%s", c->field[F_GRAPH]);
    snprintf(cpath, sizeof cpath, VECTORS "%s", c->field[F_CERT]);
    if (read_file(gpath, graph) == 0 && read_file(cpath, cert) == 0)
        return 0;
    free(graph->bytes);
    return -1;
}

static const char *status_name(pw_status s)
{
    return s == PW_ACCEPTED ? "accepted" : s == PW_REJECTED ? "rejected" : "unusable";
}

static int mismatch(const manifest_case *c, const char *fmt, ...)
    __attribute__((format(printf, 2, 3)));

static int mismatch(const manifest_case *c, const char *fmt, ...)
{
    va_list ap;
    fprintf(stderr, "MISMATCH case %s (%s line %u): ", c->field[F_NAME], MANIFEST_FILE, c->line);
    va_start(ap, fmt);
    vfprintf(stderr, fmt, ap);
    va_end(ap);
    fputc('\n', stderr);
    return 1;
}

static int count_matches(const manifest_case *c, int field, uint64_t got)
{
    const char *want = c->field[field];
    if (strcmp(want, "-") == 0)
        return 0;
    if (want[0] >= '0' && want[0] <= '9' && strtoull(want, NULL, 10) == got)
        return 0;
    return mismatch(c, "%s: expected %s, got %llu", field == F_FACES ? "faces" : "components",
                    want, (unsigned long long)got);
}

static int where_matches(const manifest_case *c, const pw_verdict *v)
{
    const char *want = c->field[F_WHERE];
    const char *file = v->file == PW_FILE_GRAPH ? "graph" : v->file == PW_FILE_CERT ? "cert" : "none";
    char got[48], got_any[16];
    if (strcmp(want, "-") == 0)
        return v->status == PW_ACCEPTED && (v->file != PW_FILE_NONE || v->line != 0)
                   ? mismatch(c, "accepted, yet a location is named (%s:%llu)", file,
                              (unsigned long long)v->line)
                   : 0;
    snprintf(got, sizeof got, "%s:%llu", file, (unsigned long long)v->line);
    snprintf(got_any, sizeof got_any, "%s:*", file);
    if (strcmp(want, got) == 0 || strcmp(want, got_any) == 0)
        return 0;
    return mismatch(c, "where: expected %s, got %s (%s)", want, got, v->detail);
}

/* The verdict must carry the digests of exactly the bytes it judged. */
static int digests_match(const manifest_case *c, const blob *graph, const blob *cert,
                         const pw_verdict *v)
{
    char want[65], got[65];
    sha256_hex(graph->bytes, graph->len, want);
    for (size_t i = 0; i < 32; i++)
        snprintf(got + 2 * i, 3, "%02x", v->graph_sha256[i]);
    if (!v->have_graph_sha256 || strcmp(want, got) != 0)
        return mismatch(c, "the verdict's graph SHA-256 is not that of the graph bytes");
    sha256_hex(cert->bytes, cert->len, want);
    for (size_t i = 0; i < 32; i++)
        snprintf(got + 2 * i, 3, "%02x", v->cert_sha256[i]);
    if (!v->have_cert_sha256 || strcmp(want, got) != 0)
        return mismatch(c, "the verdict's certificate SHA-256 is not that of the certificate bytes");
    return 0;
}

static int check_case(const manifest_case *c, pw_verdict *v)
{
    blob graph, cert;
    memset(v, 0, sizeof *v);
    v->status = PW_UNUSABLE;
    if (load_pair(c, &graph, &cert) != 0)
        return mismatch(c, "cannot read its files");
    run_pair(&graph, &cert, v);
    int bad = 0;
    if (strcmp(status_name(v->status), c->field[F_VERDICT]) != 0 ||
        strcmp(pw_code_name(v->code), c->field[F_REASON]) != 0)
        bad += mismatch(c, "expected %s/%s, got %s/%s (%s)", c->field[F_VERDICT],
                        c->field[F_REASON], status_name(v->status), pw_code_name(v->code),
                        v->detail);
    bad += count_matches(c, F_FACES, v->faces);
    bad += count_matches(c, F_COMPONENTS, v->components);
    bad += where_matches(c, v);
    bad += digests_match(c, &graph, &cert, v);
    free(graph.bytes);
    free(cert.bytes);
    return bad;
}

static void test_every_case(void **state)
{
    const vector_set *set = *state;
    size_t tally[3] = {0, 0, 0}, failed = 0;
    for (size_t i = 0; i < set->n_cases; i++) {
        pw_verdict v;
        failed += check_case(&set->cases[i], &v) != 0;
        tally[v.status]++;
    }
    printf("%zu cases: %zu accepted, %zu rejected, %zu unusable; %zu mismatched\n", set->n_cases,
           tally[PW_ACCEPTED], tally[PW_REJECTED], tally[PW_UNUSABLE], failed);
    assert_int_equal(failed, 0);
}

/* ---- coverage of the reason codes ------------------------------------------- */

static int named_by_a_case(const vector_set *set, const char *reason)
{
    for (size_t i = 0; i < set->n_cases; i++)
        if (strcmp(set->cases[i].field[F_REASON], reason) == 0)
            return 1;
    return 0;
}

/*
 * Every code a file can trigger has a vector.  Not from file contents: a
 * failed read, no memory, and points-unverifiable, retired in 0.2 when point
 * lines became verified (the kernel never produces it).
 */
static int no_file_triggers(int code)
{
    return code == PW_E_READ || code == PW_E_NOMEM || code == PW_E_POINTS;
}


static void test_every_reason_has_a_vector(void **state)
{
    const vector_set *set = *state;
    int uncovered = 0, known = 0;
    for (int code = 0; code < 256; code++) {
        const char *name = pw_code_name((pw_code)code);
        if (strcmp(name, "unknown") == 0)
            continue;
        known++;
        if (no_file_triggers(code) || named_by_a_case(set, name))
            continue;
        fprintf(stderr, "NO VECTOR for reason %d (%s)\n", code, name);
        uncovered++;
    }
    printf("%d reason codes known; every one a file can trigger has a vector\n", known);
    assert_true(known > 30);
    assert_int_equal(uncovered, 0);
}

static void test_manifest_names_are_known(void **state)
{
    const vector_set *set = *state;
    int unknown = 0;
    for (size_t i = 0; i < set->n_cases; i++) {
        const manifest_case *c = &set->cases[i];
        int found = 0;
        for (int code = 0; code < 256 && !found; code++)
            found = strcmp(pw_code_name((pw_code)code), c->field[F_REASON]) == 0;
        for (size_t j = 0; j < i; j++)
            if (strcmp(set->cases[j].field[F_NAME], c->field[F_NAME]) == 0)
                unknown += mismatch(c, "the case name is used twice");
        if (!found)
            unknown += mismatch(c, "unknown reason name '%s'", c->field[F_REASON]);
    }
    assert_int_equal(unknown, 0);
}

/* ---- a second way: the same cases with other line ends -------------------------- */

static int holds(const blob *b, const char *word)
{
    size_t n = strlen(word);
    for (size_t i = 0; i + n <= b->len; i++)
        if (memcmp(b->bytes + i, word, n) == 0)
            return 1;
    return 0;
}

/* A copy with every bare LF turned into CRLF. */
static blob to_crlf(const blob *in)
{
    blob out = {malloc(2 * in->len + 1), 0};
    if (out.bytes == NULL)
        exit(1);
    for (size_t i = 0; i < in->len; i++) {
        if (in->bytes[i] == '\n' && (i == 0 || in->bytes[i - 1] != '\r'))
            out.bytes[out.len++] = '\r';
        out.bytes[out.len++] = in->bytes[i];
    }
    return out;
}

/* Same verdict, code, line and counts as the original run, or a mismatch. */
static int same_outcome(const manifest_case *c, const char *how, const pw_verdict *a,
                        const pw_verdict *b)
{
    if (a->status == b->status && a->code == b->code && a->line == b->line &&
        a->faces == b->faces && a->components == b->components)
        return 0;
    return mismatch(c, "%s: %s/%s line %llu became %s/%s line %llu", how, status_name(a->status),
                    pw_code_name(a->code), (unsigned long long)a->line, status_name(b->status),
                    pw_code_name(b->code), (unsigned long long)b->line);
}

/*
 * CRLF line ends are allowed (format rule), so converting the certificate -
 * and the graph too when no graph-sha256 binds its bytes - changes nothing.
 * Unusable cases are left out: several of them are about line-end bytes.
 */
static int check_crlf_twin(const manifest_case *c)
{
    blob graph, cert;
    pw_verdict plain, twin;
    if (load_pair(c, &graph, &cert) != 0)
        return mismatch(c, "cannot read its files");
    run_pair(&graph, &cert, &plain);
    blob cert2 = to_crlf(&cert);
    int bound = holds(&cert, "graph-sha256");
    blob graph2 = bound ? graph : to_crlf(&graph);
    run_pair(&graph2, &cert2, &twin);
    int bad = same_outcome(c, bound ? "CRLF certificate" : "CRLF graph and certificate", &plain,
                           &twin);
    if (!bound)
        free(graph2.bytes);
    free(cert2.bytes);
    free(graph.bytes);
    free(cert.bytes);
    return bad;
}

static void test_crlf_twins(void **state)
{
    const vector_set *set = *state;
    int bad = 0, ran = 0;
    for (size_t i = 0; i < set->n_cases; i++) {
        if (strcmp(set->cases[i].field[F_VERDICT], "unusable") == 0)
            continue;
        bad += check_crlf_twin(&set->cases[i]);
        ran++;
    }
    printf("%d accepted and rejected cases rerun with CRLF line ends\n", ran);
    assert_true(ran > 0);
    assert_int_equal(bad, 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_manifest_names_are_known),
        cmocka_unit_test(test_every_reason_has_a_vector),
        cmocka_unit_test(test_every_case),
        cmocka_unit_test(test_crlf_twins),
    };
    return cmocka_run_group_tests(tests, group_setup, group_teardown);
}
