/*
 * name_table.c - vertex names and the ids they stand for.  Ids are handed out
 * in order of first appearance; lookup is a hash table with open addressing
 * (FNV-1a, linear probing, at most half full), so interning stays O(1)
 * expected per name and importing an edge list stays linear.
 */
#include "import.h"

#include <stdlib.h>
#include <string.h>

static uint64_t hash_name(const char *s, size_t len)
{
    uint64_t h = 14695981039346656037ull;
    for (size_t i = 0; i < len; i++)
        h = (h ^ (unsigned char)s[i]) * 1099511628211ull;
    return h;
}

const char *name_table_name(const name_table *t, uint32_t id)
{
    return t->text + t->start[id];
}

static int same_name(const name_table *t, uint32_t id, const char *s, size_t len)
{
    const char *have = name_table_name(t, id);
    return strncmp(have, s, len) == 0 && have[len] == '\0';
}

/* Doubles the slot array and re-inserts every id. */
static int rehash(name_table *t)
{
    size_t count = t->slot_count ? t->slot_count * 2 : 1024;
    uint32_t *slots = calloc(count, sizeof *slots);
    if (slots == NULL)
        return -1;
    for (uint32_t id = 0; id < t->count; id++) {
        const char *s = name_table_name(t, id);
        size_t k = (size_t)hash_name(s, strlen(s)) & (count - 1);
        while (slots[k] != 0)
            k = (k + 1) & (count - 1);
        slots[k] = id + 1;
    }
    free(t->slots);
    t->slots = slots;
    t->slot_count = count;
    return 0;
}

/* Appends the text and the id's offset; the caller has made sure the id fits. */
static int store(name_table *t, const char *s, size_t len)
{
    if (t->count == t->cap) {
        uint32_t cap = t->cap ? t->cap * 2 : 256;
        size_t *start = realloc(t->start, (size_t)cap * sizeof *start);
        if (start == NULL)
            return -1;
        t->start = start;
        t->cap = cap;
    }
    if (t->text_len + len + 1 > t->text_cap) {
        size_t cap = (t->text_cap ? t->text_cap * 2 : 4096) + len + 1;
        char *text = realloc(t->text, cap);
        if (text == NULL)
            return -1;
        t->text = text;
        t->text_cap = cap;
    }
    memcpy(t->text + t->text_len, s, len);
    t->text[t->text_len + len] = '\0';
    t->start[t->count++] = t->text_len;
    t->text_len += len + 1;
    return 0;
}

int name_table_intern(name_table *t, const char *s, size_t len, uint32_t *id)
{
    if (((size_t)t->count + 1) * 2 > t->slot_count && rehash(t) != 0)
        return -1;
    size_t k = (size_t)hash_name(s, len) & (t->slot_count - 1);
    for (; t->slots[k] != 0; k = (k + 1) & (t->slot_count - 1)) {
        if (same_name(t, t->slots[k] - 1, s, len)) {
            *id = t->slots[k] - 1;
            return 0;
        }
    }
    if (t->count >= UINT32_MAX / 2 || store(t, s, len) != 0)
        return -1;
    t->slots[k] = t->count;
    *id = t->count - 1;
    return 0;
}

void name_table_free(name_table *t)
{
    free(t->text);
    free(t->start);
    free(t->slots);
    memset(t, 0, sizeof *t);
}
