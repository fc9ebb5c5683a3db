/*
 * fuzz_common.h - helpers of the libFuzzer targets.
 *
 * A finding is reported with abort(): libFuzzer (with ASan/UBSan) then saves the input as a
 * crash-* file. The checks are the error contract of gk_status (include/gaskit/base.h): a GK_OK
 * result is finite and physical, a failed call leaves its outputs untouched, a status is one of
 * the enum's values.
 */
#ifndef GASKIT_FUZZ_COMMON_H
#define GASKIT_FUZZ_COMMON_H

#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "gaskit/gaskit.h"

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

static inline void fz_fail(const char *what, const char *file, int line) {
    fprintf(stderr, "gaskit fuzz finding at %s:%d: %s\n", file, line, what);
    abort();
}
#define FZ_REQUIRE(cond) do { if (!(cond)) fz_fail(#cond, __FILE__, __LINE__); } while (0)

/* A status the contract knows. */
#define FZ_STATUS(s) FZ_REQUIRE((int)(s) >= (int)GK_OK && (int)(s) <= (int)GK_ERR_PARSE)
/* A GK_OK value: finite / finite and > 0 / finite and >= 0. */
#define FZ_FINITE(x) FZ_REQUIRE(isfinite(x))
#define FZ_POSITIVE(x) FZ_REQUIRE(isfinite(x) && (x) > 0)
#define FZ_NONNEG(x) FZ_REQUIRE(isfinite(x) && (x) >= 0)

/* Reads the fuzz input as small integers and raw gk_real bit patterns (zero once exhausted). */
typedef struct fz_reader { const uint8_t *data; size_t size; size_t pos; } fz_reader;

static inline unsigned fz_byte(fz_reader *r) {
    return (r->pos < r->size) ? (unsigned)r->data[r->pos++] : 0u;
}

static inline gk_real fz_real(fz_reader *r) {
    gk_real v = 0;
    unsigned char bytes[sizeof(gk_real)] = { 0 };
    for (size_t i = 0; i < sizeof bytes; ++i) bytes[i] = (unsigned char)fz_byte(r);
    memcpy(&v, bytes, sizeof v);
    return v;
}

/* A NUL-terminated copy of the input in a heap block of exactly size + 1 bytes, so that
   AddressSanitizer reports any read past the terminating NUL. */
static inline char *fz_string(const uint8_t *data, size_t size) {
    char *s = (char *)malloc(size + 1);
    if (s == NULL) abort();
    if (size > 0) memcpy(s, data, size);
    s[size] = '\0';
    return s;
}

#endif /* GASKIT_FUZZ_COMMON_H */
