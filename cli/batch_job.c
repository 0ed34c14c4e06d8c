/*
 * batch_job.c - one job of a batch: read both files, run the kernel, and
 * format the output line (format-spec/jobs-list.md, "Output").  Runs on a
 * worker thread, so it touches no shared state and prints nothing: a file
 * that cannot be read becomes an "unusable" verdict in the job's own line.
 */
#include "batch.h"

#include <errno.h>
#include <fcntl.h>
#include <limits.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

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

/*
 * Reads all of fd into *buf, grown as needed (and kept for the next job: small
 * jobs then cost no allocation).  PW_OK, PW_E_LIMIT, PW_E_READ or PW_E_NOMEM;
 * *len is the byte count.  Plain read(2): through stdio each file cost an
 * fstat and a third read (strace), and a 64 KiB malloc.
 */
static pw_code read_file(int fd, uint64_t max_bytes, batch_buffer *buf, size_t *len)
{
    size_t used = 0;
    for (;;) {
        if (used == buf->cap) {
            size_t cap = buf->cap ? 2 * buf->cap : (size_t)1 << 16;
            char *bigger = cap > buf->cap ? realloc(buf->bytes, cap) : NULL;
            if (bigger == NULL)
                return PW_E_NOMEM;
            buf->bytes = bigger;
            buf->cap = cap;
        }
        ssize_t got = read(fd, buf->bytes + used, buf->cap - used);
        if (got < 0 && errno == EINTR)
            continue;
        if (got < 0)
            return PW_E_READ;
        used += (size_t)got;
        if ((uint64_t)used > max_bytes)
            return PW_E_LIMIT;
        if (got == 0)
            break;
    }
    *len = used;
    return PW_OK;
}

/* 0, or -1 with *v filled as an unusable verdict naming the file. */
static int read_job_file(const job_list *list, const char *listed, pw_file which,
                         const pw_limits *lim, batch_buffer *buf, size_t *len, pw_verdict *v)
{
    char path[PATH_MAX], why[160], reason[96];
    if (job_list_resolve(list, listed, path, sizeof path) != 0) {
        unreadable(v, which, PW_E_READ, "cannot open: path too long");
        return -1;
    }
    int fd = list->dir >= 0 ? openat(list->dir, listed, O_RDONLY | O_CLOEXEC)
                            : open(path, O_RDONLY | O_CLOEXEC);
    if (fd < 0) {
        int err = errno;
        snprintf(why, sizeof why, "cannot open: %s",
                 strerror_r(err, reason, sizeof reason) == 0 ? reason : "error");
        unreadable(v, which, PW_E_READ, why);
        return -1;
    }
    pw_code code = read_file(fd, lim->max_bytes, buf, len);
    close(fd);
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

/* Buffers above this size are given back after the job, so one huge job does not hold them. */
#define KEPT_BUFFER ((size_t)1 << 20)

static void trim_buffer(batch_buffer *buf)
{
    if (buf->cap > KEPT_BUFFER) {
        free(buf->bytes);
        buf->bytes = NULL;
        buf->cap = 0;
    }
}

void batch_check_job(const job_list *list, size_t index, const pw_limits *lim,
                     batch_buffer scratch[2], job_result *out)
{
    const batch_job *job = &list->jobs[index];
    double started = progress_clock();
    size_t graph_len = 0, cert_len = 0;
    pw_verdict v;
    if (read_job_file(list, job->graph, PW_FILE_GRAPH, lim, &scratch[0], &graph_len, &v) == 0 &&
        read_job_file(list, job->cert, PW_FILE_CERT, lim, &scratch[1], &cert_len, &v) == 0)
        pw_check(scratch[0].bytes, graph_len, scratch[1].bytes, cert_len, lim, &v);
    trim_buffer(&scratch[0]);
    trim_buffer(&scratch[1]);
    out->status = v.status;
    out->code = v.code;
    out->agrees = job->expected == PW_CLAIM_NONE ? -1
                  : v.status == PW_ACCEPTED && v.claim == job->expected;
    format_line(list, index, &v, out);
    out->seconds = progress_clock() - started;
}
