/*
 * signoff.c - the sign-off record (format-spec/signoff-record.md): the
 * verdict record plus what a reviewer needs to reproduce and file it - which
 * binary, built how, qualified against which vectors, when, and why.
 * Written whole or not at all.
 */
#include "cli.h"

#include <stdlib.h>
#include <time.h>

static void print_digest_or_null(FILE *out, const unsigned char *sha)
{
    if (sha != NULL)
        json_hex(out, sha, 32);
    else
        fputs("null", out);
}

void cli_print_utc_now(FILE *out)
{
    char stamp[32];
    time_t now = time(NULL);
    struct tm utc;
    if (gmtime_r(&now, &utc) == NULL ||
        strftime(stamp, sizeof stamp, "%Y-%m-%dT%H:%M:%SZ", &utc) == 0)
        fputs("null", out);
    else
        json_string(out, stamp);
}

/* The "tool" object: this binary's identity, shared by every record that names it. */
void cli_print_tool(FILE *out)
{
    unsigned char self[32];
    const char *vectors = cli_build_vector_set();
    int have_self = cli_self_sha256(self) == 0;
    fprintf(out, "{\"name\":\"planewit\",\"version\":\"%s\",\"executable_sha256\":", PW_VERSION);
    print_digest_or_null(out, have_self ? self : NULL);
    fputs(",\"compiler\":", out);
    json_string(out, cli_build_compiler());
    fputs(",\"build_flags\":", out);
    json_string(out, cli_build_flags());
    fputs(",\"vector_set_sha256\":", out);
    if (vectors != NULL)
        json_string(out, vectors);
    else
        fputs("null", out);
    fputc('}', out);
}

static void print_signoff(FILE *out, const char *verdict_record, const cli_signoff *s)
{
    fputs("{\n  \"record\": \"planewit-signoff\",\n  \"record_version\": 1,\n  \"time_utc\": ", out);
    cli_print_utc_now(out);
    fputs(",\n  \"note\": ", out);
    if (s->note != NULL)
        json_string(out, s->note);
    else
        fputs("null", out);
    fprintf(out, ",\n  \"verdict\": %s,\n  \"graph_canonical\": {\"form\": \"%s\", \"sha256\": ",
            verdict_record, CLI_CANONICAL_FORM);
    print_digest_or_null(out, s->canonical);
    fputs("},\n  \"tool\": ", out);
    cli_print_tool(out);
    fputs(",\n  \"caution\": ", out);
    json_string(out, cli_caution);
    fputs("\n}\n", out);
}

int cli_write_signoff(const char *path, const pw_verdict *v, const cli_signoff *s)
{
    size_t len;
    cli_output o;
    char *verdict_record = cli_record_string(v, s->graph_path, s->cert_path, &len);
    if (verdict_record == NULL) {
        fprintf(stderr, "planewit: %s: out of memory\n", path);
        return -1;
    }
    if (cli_output_open(&o, path) != 0) {
        free(verdict_record);
        return -1;
    }
    print_signoff(o.file, verdict_record, s);
    free(verdict_record);
    return cli_output_commit(&o);
}
