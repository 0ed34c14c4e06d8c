/*
 * oracle_text.h - the oracle's own reading of the lexical rules
 * (format-spec/lexical.md): whole-file byte check, lines, comments, tokens,
 * canonical numbers.  Independent of checker/lex.c on purpose.
 */
#ifndef PW_ORACLE_TEXT_H
#define PW_ORACLE_TEXT_H

#include <stddef.h>
#include <stdint.h>

typedef struct {
    const char *s;
    size_t n;
} otok;

/* The significant lines of a file, each a run of tokens. */
typedef struct {
    otok *toks;
    size_t n_toks;
    size_t *first;  /* per significant line: index of its first token */
    size_t *count;  /* per significant line: its number of tokens */
    size_t n_lines;
} otext;

/* 0, or -1 when a byte is not allowed anywhere in the file. */
int otext_load(otext *t, const char *buf, size_t len);
void otext_free(otext *t);
/* Token k of significant line l. */
otok otext_tok(const otext *t, size_t l, size_t k);
int otok_is(otok t, const char *word);
/* Canonical unsigned decimal up to 2^64 - 1: 0, else -1. */
int otok_uint(otok t, uint64_t *v);
/* Coordinate: a uint, or '-' and a nonzero uint, magnitude up to 2^63 - 1. */
int otok_coord(otok t, int64_t *v);

#endif
