/*
 * batch_job.c - one job of a batch: read both files, run the kernel, and
 * format the output line (format-spec/jobs-list.md, "Output").  Runs on a
 * worker thread, so it touches no shared state and prints nothing: a file
 * that cannot be read becomes an "unusable" verdict in the job's own line.
 */
#include "batch.h"

#include <errno.h>
#include <limits.h>
#include <stdlib.h>
#include <string.h>

#ifndef PATH_MAX
#define PATH_MAX 4096
#endif

static void unreadable(pw_verdict *v, pw_file which, pw_code code, const char *why)
{
    memset(v, 0, sizeof *v);
    v->status = PW_UNUSABLE;
    v->code = code;
    v->file = which;
    snprintf(v->detail, sizeof v->detail, "%s", why);
}

/* 0, or -1 with *v filled as an unusable verdict naming the file. */
static int read_job_file(const job_list *list, const char *listed, pw_file which,
                         const pw_limits *lim, cli_input *in, pw_verdict *v)
{
    char path[PATH_MAX], why[160], reason[96];
    in->bytes = NULL;
    in->len = 0;
    if (job_list_resolve(list, listed, path, sizeof path) != 0) {
        unreadable(v, which, PW_E_READ, "cannot open: path too long");
        return -1;
    }
    FILE *f = fopen(path, "rb");
    if (f == NULL) {
        int err = errno;
        snprintf(why, sizeof why, "cannot open: %s",
                 strerror_r(err, reason, sizeof reason) == 0 ? reason : "error");
        unreadable(v, which, PW_E_READ, why);
        return -1;
    }
    pw_code code = pw_read_all(f, lim->max_bytes, &in->bytes, &in->len);
    fclose(f);
    if (code == PW_E_LIMIT)
        snprintf(why, sizeof why, "larger than %llu bytes (raise it with --max-bytes)",
                 (unsigned long long)lim->max_bytes);
    else if (code != PW_OK)
        snprintf(why, sizeof why, "%s", pw_code_sentence(code));
    if (code != PW_OK)
        unreadable(v, which, code, why);
    return code == PW_OK ? 0 : -1;
}

static const char *json_claim(pw_claim c)
{
    return c == PW_CLAIM_PLANAR ? "\"planar\"" : c == PW_CLAIM_NONPLANAR ? "\"nonplanar\"" : "null";
}

/* The job's fields, then the verdict record's fields: one JSON object per line. */
static void format_line(const job_list *list, size_t index, const pw_verdict *v,
                        job_result *out)
{
    const batch_job *job = &list->jobs[index];
    size_t record_len;
    char *record = cli_record_string(v, job->graph, job->cert, &record_len);
    char head[200];
    int head_len = snprintf(head, sizeof head,
                            "{\"job\":%zu,\"jobs\":%zu,\"list_line\":%llu,\"expected\":%s,"
                            "\"agrees\":%s,",
                            index, list->count, (unsigned long long)job->line,
                            json_claim(job->expected),
                            out->agrees < 0 ? "null" : out->agrees ? "true" : "false");
    out->line = record != NULL ? malloc((size_t)head_len + record_len + 1) : NULL;
    if (out->line != NULL) {
        /* the record's own '{' is replaced by the job's fields */
        memcpy(out->line, head, (size_t)head_len);
        memcpy(out->line + head_len, record + 1, record_len - 1);
        out->line[(size_t)head_len + record_len - 1] = '\n';
        out->len = (size_t)head_len + record_len;
    }
    free(record);
}

void batch_check_job(const job_list *list, size_t index, const pw_limits *lim,
                     job_result *out)
{
    const batch_job *job = &list->jobs[index];
    double started = progress_clock();
    cli_input graph = {NULL, NULL, 0}, cert = {NULL, NULL, 0};
    pw_verdict v;
    if (read_job_file(list, job->graph, PW_FILE_GRAPH, lim, &graph, &v) == 0 &&
        read_job_file(list, job->cert, PW_FILE_CERT, lim, &cert, &v) == 0)
        pw_check(graph.bytes, graph.len, cert.bytes, cert.len, lim, &v);
    free(graph.bytes);
    free(cert.bytes);
    out->status = v.status;
    out->code = v.code;
    out->agrees = job->expected == PW_CLAIM_NONE ? -1
                  : v.status == PW_ACCEPTED && v.claim == job->expected;
    format_line(list, index, &v, out);
    out->seconds = progress_clock() - started;
}
