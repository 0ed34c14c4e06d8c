/* digest.c - SHA-256 of bytes already in memory (graph-sha256 lines, names files). */
#include "import.h"

#include <openssl/evp.h>

int cli_sha256(const char *bytes, size_t len, unsigned char out[32])
{
    unsigned int size = 0;
    return EVP_Digest(bytes, len, out, &size, EVP_sha256(), NULL) == 1 && size == 32 ? 0 : -1;
}
