/*
 * fuzz_cert.c - the certificate parser on arbitrary bytes.  The first input
 * byte is the graph's N (0-255), the rest the certificate.  A parsed
 * certificate must hold only what the parser promises (internal.h): items
 * inside the value array, vertex ids below N or PW_NONE with the first bad
 * one remembered, side values clipped to 0-2.
 */
#include "fuzz.h"

static void cert_is_well_formed(const pw_cert *c, uint32_t n)
{
    int saw_bad_id = 0;
    FUZZ_REQUIRE(c->claim != PW_CLAIM_NONE && c->witness != PW_WITNESS_NONE, "claim and witness set");
    FUZZ_REQUIRE(c->n_values <= c->cap_values && c->n_items <= c->cap_items, "within capacity");
    for (uint32_t i = 0; i < c->n_items; i++) {
        const pw_item *it = &c->items[i];
        FUZZ_REQUIRE(it->start <= c->n_values && it->count <= c->n_values - it->start,
                     "item inside the values");
        FUZZ_REQUIRE(it->line > 0, "item has a line");
        for (uint32_t k = 0; k < it->count; k++) {
            uint32_t x = c->values[it->start + k];
            if (c->witness == PW_WITNESS_BIPARTITE_BOUND)
                FUZZ_REQUIRE(x <= 2, "side clipped to 2");
            else
                FUZZ_REQUIRE(x < n || x == PW_NONE, "vertex below N or PW_NONE");
            saw_bad_id |= x == PW_NONE && c->witness != PW_WITNESS_BIPARTITE_BOUND;
        }
    }
    if (saw_bad_id)
        FUZZ_REQUIRE(c->bad_id_line != 0 && c->bad_id >= n, "a bad id is remembered");
    for (uint32_t i = 0; i < c->n_points; i++)
        FUZZ_REQUIRE(c->points[i].x >= -(1 << 30) && c->points[i].x <= (1 << 30) &&
                         c->points[i].y >= -(1 << 30) && c->points[i].y <= (1 << 30),
                     "stored coordinates within 2^30");
    if (c->claim == PW_CLAIM_NONPLANAR)
        FUZZ_REQUIRE(c->n_points == 0 && c->head_line > 0, "nonplanar: a head, no points");
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    pw_cert c;
    pw_verdict v;
    if (size == 0)
        return 0;
    uint32_t n = data[0];
    pw_verdict_init(&v);
    int result = pw_cert_parse((const char *)data + 1, size - 1, n, &c, &v);
    if (result == 0) {
        FUZZ_REQUIRE(v.code == PW_OK, "a parsed certificate leaves the verdict alone");
        cert_is_well_formed(&c, n);
    } else {
        FUZZ_REQUIRE(v.status == PW_UNUSABLE && v.file == PW_FILE_CERT, "a grammar error is unusable input");
        FUZZ_REQUIRE(v.line > 0 && v.detail[0] != '\0', "a grammar error says where and what");
    }
    pw_cert_free(&c);
    return 0;
}
