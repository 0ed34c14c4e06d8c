/*
 * vector_list.h - the cases of vectors/MANIFEST, read for the hardening
 * programs (fault injection, the differential run, the mutation runner).
 * Only the first five fields are read; their meaning is stated in MANIFEST.
 */
#ifndef PW_VECTOR_LIST_H
#define PW_VECTOR_LIST_H

#include <stddef.h>

typedef struct {
    char name[96], graph[160], cert[160], verdict[16], reason[48];
} vector_case;

/* Reads dir/MANIFEST; returns the number of cases (0 on failure, reported). */
size_t vector_list_read(const char *dir, vector_case **cases);

/* Reads a whole file into a malloc'ed buffer of exactly its size; NULL on failure. */
char *vector_file(const char *dir, const char *path, size_t *len);

#endif
