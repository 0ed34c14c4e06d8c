/*
 * batch_summary.c - what a batch found, for the person who started it:
 * counts by verdict and by failed rule, disagreements with the expected
 * claims, and the slowest jobs.  Printed on standard error after the output
 * file is complete; the output file itself holds only job lines, so that
 * shard outputs merge into exactly the output of one run.
 */
#include "batch.h"

static const char *const status_words[3] = {"accepted", "rejected", "unusable"};

void summary_add(batch_summary *s, const job_list *list, size_t job, const job_result *r)
{
    s->jobs++;
    s->by_status[r->status <= PW_UNUSABLE ? r->status : PW_UNUSABLE]++;
    if (r->status != PW_ACCEPTED)
        s->by_code[(unsigned)r->code < BATCH_CODES ? (unsigned)r->code : BATCH_CODES - 1]++;
    if (r->agrees == 0)
        s->disagree++;
    /* keep the slowest few, slowest first, by insertion */
    int at = BATCH_SLOWEST;
    while (at > 0 && (s->slowest[at - 1].graph == NULL || s->slowest[at - 1].seconds < r->seconds))
        at--;
    if (at == BATCH_SLOWEST)
        return;
    for (int k = BATCH_SLOWEST - 1; k > at; k--)
        s->slowest[k] = s->slowest[k - 1];
    s->slowest[at].seconds = r->seconds;
    s->slowest[at].job = job;
    s->slowest[at].line = list->jobs[job].line;
    s->slowest[at].graph = list->jobs[job].graph;
}

int summary_all_good(const batch_summary *s)
{
    return s->by_status[PW_ACCEPTED] == s->jobs && s->disagree == 0;
}

static void print_rules(FILE *out, const batch_summary *s)
{
    const char *sep = "  failed rules:";
    for (unsigned code = 0; code < BATCH_CODES; code++) {
        if (s->by_code[code] == 0)
            continue;
        fprintf(out, "%s %s %zu", sep, pw_code_name((pw_code)code), s->by_code[code]);
        sep = ",";
    }
    if (sep[0] == ',')
        fputc('\n', out);
}

static void print_slowest(FILE *out, const batch_summary *s)
{
    for (int k = 0; k < BATCH_SLOWEST && s->slowest[k].graph != NULL; k++)
        fprintf(out, "%s %.3f s job %zu (list line %llu, %s)\n", k == 0 ? "  slowest:" : "          ",
                s->slowest[k].seconds, s->slowest[k].job, (unsigned long long)s->slowest[k].line,
                s->slowest[k].graph);
}

void summary_print(FILE *out, const batch_summary *s, double seconds, unsigned threads)
{
    fprintf(out, "batch: %zu jobs in %.2f s (%.0f jobs/s, %u threads)\n", s->jobs, seconds,
            seconds > 0 ? (double)s->jobs / seconds : 0.0, threads);
    fprintf(out, "  %s %zu, %s %zu, %s %zu; expected claim not met: %zu\n", status_words[0],
            s->by_status[0], status_words[1], s->by_status[1], status_words[2], s->by_status[2],
            s->disagree);
    print_rules(out, s);
    print_slowest(out, s);
    if (summary_all_good(s))
        fprintf(out, "result: all %zu jobs accepted, none against its expected claim\n", s->jobs);
    else
        fprintf(out, "result: NOT ALL ACCEPTED - %zu not accepted, %zu disagree with the "
                "expected claim\n", s->jobs - s->by_status[PW_ACCEPTED], s->disagree);
}
