/*
 * report.c - how a verdict is shown: one human line, or one JSON record whose
 * fields are defined in format-spec/verdict-record.md.
 */
#include "cli.h"

const char cli_caution[] =
    "this attests a graph-theoretic fact about these files only; electrical, fluidic and "
    "manufacturing rules, the applicable standards and qualified reviewers still decide";

static const char *status_word(pw_status s)
{
    return s == PW_ACCEPTED ? "accepted" : s == PW_REJECTED ? "rejected" : "unusable";
}

static const char *witness_phrase(pw_witness w)
{
    static const char *const phrases[] = {
        "no witness", "rotation system", "subdivision of K5", "subdivision of K3,3",
        "K5 minor", "K3,3 minor", "edge bound 3N - 6", "bipartite edge bound 2N - 4"};
    return (unsigned)w < 8 ? phrases[w] : "no witness";
}

static const char *plural(uint64_t n, const char *one, const char *many)
{
    return n == 1 ? one : many;
}

static void print_location(FILE *out, const pw_verdict *v, const char *graph_path,
                           const char *cert_path)
{
    const char *path = v->file == PW_FILE_GRAPH ? graph_path : cert_path;
    if (v->file == PW_FILE_NONE)
        return;
    if (path[0] == '-' && path[1] == '\0')
        path = "<stdin>";
    if (v->line > 0)
        fprintf(out, "%s line %llu: ", path, (unsigned long long)v->line);
    else
        fprintf(out, "%s: ", path);
}

void cli_print_verdict(FILE *out, const pw_verdict *v, const char *graph_path,
                       const char *cert_path)
{
    if (v->status == PW_ACCEPTED) {
        fprintf(out, "accepted: %s (%s) - %llu %s, %llu %s", pw_claim_name(v->claim),
                witness_phrase(v->witness), (unsigned long long)v->vertices,
                plural(v->vertices, "vertex", "vertices"), (unsigned long long)v->edges,
                plural(v->edges, "edge", "edges"));
        if (v->claim == PW_CLAIM_PLANAR)
            fprintf(out, ", %llu %s, %llu %s", (unsigned long long)v->faces,
                    plural(v->faces, "face", "faces"), (unsigned long long)v->components,
                    plural(v->components, "component", "components"));
        fprintf(out, "\nnote: %s\n", cli_caution);
        return;
    }
    fprintf(out, "%s: ", status_word(v->status));
    if (v->status == PW_REJECTED)
        fprintf(out, "%s claim not proven - ", pw_claim_name(v->claim));
    print_location(out, v, graph_path, cert_path);
    fprintf(out, "%s [%s]\n", v->detail, pw_code_name(v->code));
}

static void print_count(FILE *out, const char *name, uint64_t value, int known)
{
    fprintf(out, "\"%s\":", name);
    if (known)
        fprintf(out, "%llu", (unsigned long long)value);
    else
        fputs("null", out);
}

static void print_file(FILE *out, const char *name, const char *path, const unsigned char *sha,
                       int have_sha)
{
    fprintf(out, "\"%s\":{\"path\":", name);
    json_string(out, path);
    fputs(",\"sha256\":", out);
    if (have_sha)
        json_hex(out, sha, 32);
    else
        fputs("null", out);
    fputc('}', out);
}

void cli_print_record(FILE *out, const pw_verdict *v, const char *graph_path,
                      const char *cert_path)
{
    int planar_done = v->status == PW_ACCEPTED && v->claim == PW_CLAIM_PLANAR;
    fprintf(out, "{\"record\":\"planewit-verdict\",\"record_version\":1,"
                 "\"tool\":\"planewit\",\"tool_version\":\"%s\",",
            PW_VERSION);
    fprintf(out, "\"verdict\":\"%s\",\"exit_code\":%d,\"claim\":", status_word(v->status),
            (int)v->status);
    json_string(out, pw_claim_name(v->claim));
    fputs(",\"witness\":", out);
    json_string(out, pw_witness_name(v->witness));
    fprintf(out, ",\"reason\":{\"code\":%d,\"name\":", (int)v->code);
    json_string(out, pw_code_name(v->code));
    fputs(",\"file\":", out);
    if (v->file == PW_FILE_NONE)
        fputs("null", out);
    else
        json_string(out, v->file == PW_FILE_GRAPH ? "graph" : "certificate");
    fputs(",", out);
    print_count(out, "line", v->line, v->line > 0);
    fputs(",\"detail\":", out);
    json_string(out, v->detail);
    fputs("},\"counts\":{", out);
    print_count(out, "vertices", v->vertices, v->have_counts);
    fputc(',', out);
    print_count(out, "edges", v->edges, v->have_counts);
    fputc(',', out);
    print_count(out, "faces", v->faces, planar_done);
    fputc(',', out);
    print_count(out, "components", v->components, planar_done);
    fputs("},", out);
    print_file(out, "graph", graph_path, v->graph_sha256, v->have_graph_sha256);
    fputc(',', out);
    print_file(out, "certificate", cert_path, v->cert_sha256, v->have_cert_sha256);
    fputs(",\"caution\":", out);
    json_string(out, cli_caution);
    fputs("}\n", out);
}
