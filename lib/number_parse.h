/*
 * number_parse.h - private: a small, strict, locale-free decimal number reader for text that
 * comes from outside (composition strings, configuration text). Never installed.
 *
 * No strtod (locale dependent, accepts hex floats, "inf", "nan", leading spaces), no stdio, no
 * errno, no heap. Reading and converting are two steps, so a caller can fold a scale such as
 * percent (10^-2) or ppm (10^-6) into the decimal exponent and round only once.
 *
 * Accepted syntax (ASCII only, nothing else, no spaces inside):
 *     [+|-] ( digits [ '.' [digits] ] | '.' digits ) [ (e|E) [+|-] digits ]
 * e.g. "5", "0.7808", "5.", ".5", "1e-6", "2.5E+3". Rejected: "", ".", "+", "1e", "1e+",
 * "inf", "nan", "0x1p3", "1,5", and a mantissa with more than GK__DECIMAL_MAX_DIGITS digits.
 */
#ifndef GASKIT_NUMBER_PARSE_H
#define GASKIT_NUMBER_PARSE_H

#include <stdbool.h>
#include <stdint.h>
#include "gk_internal.h"

/* Most digit characters (leading zeros included) in the mantissa of one number; a longer
   mantissa is malformed input (GK_ERR_PARSE), not a precision feature. */
#define GK__DECIMAL_MAX_DIGITS 40

/* A scanned decimal: value = (negative ? -1 : 1) * mantissa * 10^exp10. The mantissa holds the
   first 19 significant digits (rounded half-even on the digits dropped), which is exact to far
   below one ulp of a double. */
typedef struct gk__decimal {
    uint64_t mantissa;
    int32_t exp10;
    bool negative;
} gk__decimal;

/*
 * Scans one number at text[0], reading at most `limit` characters and never past a NUL. Stops
 * at the first character that cannot continue the number; *used is the count of characters
 * that belong to it (the caller decides what may follow).
 * Returns GK_OK (*out, *used written), GK_ERR_ARGUMENT (a NULL pointer), or GK_ERR_PARSE (no
 * number there, an exponent marker without digits, a mantissa longer than
 * GK__DECIMAL_MAX_DIGITS digits); on error nothing is written.
 */
gk_status gk__decimal_scan(const char *text, size_t limit, gk__decimal *out, size_t *used);

/*
 * Converts value * 10^extra_exp10 to gk_real.
 * Accuracy: correctly rounded (one rounding of exact operands) when the mantissa is at most
 * 2^53 (float build: 2^24) and the total decimal exponent is within +-22 (float build: +-10):
 * every ordinary figure such as "0.7808", "5", "50", "1e-6", "5%" or "50ppm" takes this path.
 * Otherwise the error is below 1 ulp for a total exponent within that range and grows by at
 * most 0.5 ulp per further factor 10^22 (10^10), i.e. a few ulp at the extremes; results in
 * the subnormal range lose relative accuracy as subnormals do.
 * Returns GK_OK, GK_ERR_ARGUMENT (NULL out) or GK_ERR_RANGE (the magnitude overflows gk_real, or
 * comes within 4 units of rounding of the largest gk_real; *out untouched). No step of the
 * conversion yields an infinity. A value that underflows becomes 0. A negative zero becomes +0.
 */
gk_status gk__decimal_to_real(gk__decimal d, int32_t extra_exp10, gk_real *out);

#endif /* GASKIT_NUMBER_PARSE_H */
