/*
 * shard.c - `--shard I/K`: a run takes jobs I, I+K, I+2K, ... (0-based job
 * numbers, comments and blank lines not counted), so K runs with I = 0..K-1
 * take every job exactly once.  `certify --graph6` numbers its records the
 * same way (every line of a graph6 stream is one record).  Striding rather
 * than cutting the list into blocks spreads big jobs, often written next to
 * each other, across shards.
 */
#include "batch.h"

#include <errno.h>
#include <stdlib.h>

static int parse_size(const char *text, char **end, size_t *out)
{
    if (*text < '0' || *text > '9' || (text[0] == '0' && text[1] >= '0' && text[1] <= '9'))
        return -1;
    errno = 0;
    unsigned long long value = strtoull(text, end, 10);
    if (errno != 0 || value > SIZE_MAX / 2)
        return -1;
    *out = (size_t)value;
    return 0;
}

/* 0, or -1 after printing "planewit WHO: --shard expects ...". */
int batch_shard_parse(const char *who, const char *text, batch_shard *shard)
{
    char *end;
    if (parse_size(text, &end, &shard->first) != 0 || *end != '/' ||
        parse_size(end + 1, &end, &shard->count) != 0 || *end != '\0' || shard->count == 0 ||
        shard->first >= shard->count) {
        fprintf(stderr, "planewit %s: --shard expects I/K with 0 <= I < K (e.g. 0/4), "
                "found '%s'\n", who, text);
        return -1;
    }
    return 0;
}

/* How many of `jobs` jobs the shard takes. */
size_t batch_shard_size(const batch_shard *shard, size_t jobs)
{
    return jobs > shard->first ? (jobs - shard->first + shard->count - 1) / shard->count : 0;
}
