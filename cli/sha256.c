/*
 * sha256.c - SHA-256 through OpenSSL's EVP interface: of bytes already in
 * memory (graph-sha256 lines, names files), and of a whole file, streamed so
 * that large files (and the running executable) are never held in memory at
 * once; and a digest's hex form.
 */
#include "cli.h"

#include <errno.h>
#include <string.h>

#include <openssl/evp.h>

int cli_sha256(const char *bytes, size_t len, unsigned char out[32])
{
    unsigned int size = 0;
    return EVP_Digest(bytes, len, out, &size, EVP_sha256(), NULL) == 1 && size == 32 ? 0 : -1;
}

int cli_sha256_stream(FILE *f, unsigned char out[32])
{
    unsigned char chunk[1 << 16];
    unsigned int out_len = 0;
    EVP_MD_CTX *ctx = EVP_MD_CTX_new();
    int ok = ctx != NULL && EVP_DigestInit_ex(ctx, EVP_sha256(), NULL) == 1;
    size_t got;
    while (ok && (got = fread(chunk, 1, sizeof chunk, f)) > 0)
        ok = EVP_DigestUpdate(ctx, chunk, got) == 1;
    if (ok && ferror(f))
        ok = 0;
    if (ok)
        ok = EVP_DigestFinal_ex(ctx, out, &out_len) == 1 && out_len == 32;
    EVP_MD_CTX_free(ctx);
    return ok ? 0 : -1;
}

int cli_sha256_file(const char *path, unsigned char out[32])
{
    FILE *f = fopen(path, "rb");
    if (f == NULL)
        return -1;
    int rc = cli_sha256_stream(f, out);
    int saved = errno;
    fclose(f);
    errno = saved;
    return rc;
}

void cli_sha256_hex(const unsigned char digest[32], char hex[65])
{
    static const char digits[] = "0123456789abcdef";
    for (size_t i = 0; i < 32; i++) {
        hex[2 * i] = digits[digest[i] >> 4];
        hex[2 * i + 1] = digits[digest[i] & 15];
    }
    hex[64] = '\0';
}
