/*
 * number_parse.c - strict, locale-free decimal reader (see number_parse.h for the syntax and
 * the accuracy statement).
 *
 * Method (common practice, the "fast path" of W. D. Clinger, "How to read floating point
 * numbers accurately", PLDI 1990): keep up to 19 significant decimal digits exactly in a
 * uint64_t; when that integer and the power of ten are both exactly representable in gk_real,
 * one multiplication or division gives the correctly rounded result (IEEE 754 rounds each
 * basic operation of exact operands correctly). Other inputs scale by exact powers of ten in
 * steps, each step adding at most 0.5 ulp.
 */
#include "number_parse.h"

#if GK_REAL_IS_FLOAT
/* 10^0 ... 10^10 are exact in binary32 (5^10 = 9765625 < 2^24); IEEE 754 binary32. */
#  define GK__POW10_MAX 10
#  define GK__EXACT_INT_MAX 16777216u /* 2^24: every integer up to here is exact in binary32 */
static const gk_real gk__pow10[GK__POW10_MAX + 1] = { GK_LIT(1e0), GK_LIT(1e1), GK_LIT(1e2),
                                                      GK_LIT(1e3), GK_LIT(1e4), GK_LIT(1e5),
                                                      GK_LIT(1e6), GK_LIT(1e7), GK_LIT(1e8),
                                                      GK_LIT(1e9), GK_LIT(1e10) };
#else
/* 10^0 ... 10^22 are exact in binary64 (5^22 < 2^53); IEEE 754 binary64. */
#  define GK__POW10_MAX 22
#  define GK__EXACT_INT_MAX \
    9007199254740992u /* 2^53: every integer up to here is exact in binary64 */
static const gk_real gk__pow10[GK__POW10_MAX + 1] = {
    GK_LIT(1e0),  GK_LIT(1e1),  GK_LIT(1e2),  GK_LIT(1e3),  GK_LIT(1e4),  GK_LIT(1e5),
    GK_LIT(1e6),  GK_LIT(1e7),  GK_LIT(1e8),  GK_LIT(1e9),  GK_LIT(1e10), GK_LIT(1e11),
    GK_LIT(1e12), GK_LIT(1e13), GK_LIT(1e14), GK_LIT(1e15), GK_LIT(1e16), GK_LIT(1e17),
    GK_LIT(1e18), GK_LIT(1e19), GK_LIT(1e20), GK_LIT(1e21), GK_LIT(1e22)
};
#endif

/* Significant digits kept: 10^19 - 1 < 2^64 (and +1 after rounding still fits). */
#define GK__KEEP_DIGITS 19
/* Beyond |10^400| even a 19-digit mantissa overflows (or underflows to 0 in) binary64 and
   binary32: 1e19 * 1e-400 = 1e-381 < 4.9e-324, the smallest binary64 subnormal. */
#define GK__EXP_LIMIT 400
/* An explicit exponent is accumulated up to this magnitude and then saturates (no overflow). */
#define GK__EXP_SATURATE 100000

static int gk__is_digit(char c) { return (c >= '0' && c <= '9') ? 1 : 0; }

typedef struct gk__digits {
    uint64_t mantissa;
    int32_t exp10;
    int kept;        /* significant digits in mantissa */
    int dropped;     /* significant digits beyond GK__KEEP_DIGITS */
    int round_digit; /* first dropped digit */
    int sticky;      /* a non-zero digit after the first dropped one */
    int count;       /* every mantissa digit character read */
} gk__digits;

static void gk__take_digit(gk__digits *s, int d, int in_fraction) {
    s->count += 1;
    if (s->kept == 0 && d == 0) { /* leading zero: not significant */
        if (in_fraction) { s->exp10 -= 1; }
        return;
    }
    if (s->kept < GK__KEEP_DIGITS) {
        s->mantissa = s->mantissa * 10u + (uint64_t)d;
        s->kept += 1;
        if (in_fraction) { s->exp10 -= 1; }
        return;
    }
    if (s->dropped == 0) {
        s->round_digit = d;
    } else if (d != 0) {
        s->sticky = 1;
    }
    s->dropped += 1;
    if (!in_fraction) { s->exp10 += 1; /* a dropped integer digit still scales */ }
}

gk_status gk__decimal_scan(const char *text, size_t limit, gk__decimal *out, size_t *used) {
    gk__digits s = { 0u, 0, 0, 0, 0, 0, 0 };
    size_t i = 0;
    int negative = 0;
    int mantissa_digits = 0;

    if (text == NULL || out == NULL || used == NULL) { return GK_ERR_ARGUMENT; }

    if (i < limit && (text[i] == '+' || text[i] == '-')) {
        negative = (text[i] == '-') ? 1 : 0;
        i += 1;
    }
    while (i < limit && gk__is_digit(text[i])) {
        if (s.count >= GK__DECIMAL_MAX_DIGITS) { return GK_ERR_PARSE; }
        gk__take_digit(&s, text[i] - '0', 0);
        mantissa_digits += 1;
        i += 1;
    }
    if (i < limit && text[i] == '.') {
        i += 1;
        while (i < limit && gk__is_digit(text[i])) {
            if (s.count >= GK__DECIMAL_MAX_DIGITS) { return GK_ERR_PARSE; }
            gk__take_digit(&s, text[i] - '0', 1);
            mantissa_digits += 1;
            i += 1;
        }
    }
    if (mantissa_digits == 0) { return GK_ERR_PARSE; /* "", "+", ".", "e5" */ }

    if (i < limit && (text[i] == 'e' || text[i] == 'E')) {
        int32_t e = 0;
        int e_negative = 0;
        int e_digits = 0;
        i += 1;
        if (i < limit && (text[i] == '+' || text[i] == '-')) {
            e_negative = (text[i] == '-') ? 1 : 0;
            i += 1;
        }
        while (i < limit && gk__is_digit(text[i])) {
            if (e < GK__EXP_SATURATE) { e = e * 10 + (int32_t)(text[i] - '0'); }
            e_digits += 1;
            i += 1;
        }
        if (e_digits == 0) { return GK_ERR_PARSE; /* "1e", "1e+" */ }
        s.exp10 += e_negative ? -e : e;
    }

    /* Round half to even on the dropped digits (only matters below 1e-18 relative). */
    if (s.dropped > 0 &&
        (s.round_digit > 5 || (s.round_digit == 5 && (s.sticky || (s.mantissa & 1u) != 0u)))) {
        s.mantissa += 1u;
    }

    out->mantissa = s.mantissa;
    out->exp10 = s.exp10;
    out->negative = negative;
    *used = i;
    return GK_OK;
}

gk_status gk__decimal_to_real(gk__decimal d, int32_t extra_exp10, gk_real *out) {
    gk_real r;
    int64_t total;
    int32_t e;

    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (d.mantissa == 0u) {
        *out = GK_LIT(0.0);
        return GK_OK;
    }
    total = (int64_t)d.exp10 + (int64_t)extra_exp10; /* no int32_t overflow */
    if (total > GK__EXP_LIMIT) { return GK_ERR_RANGE; }
    if (total < -GK__EXP_LIMIT) {
        *out = GK_LIT(0.0);
        return GK_OK;
    }
    e = (int32_t)total;

    r = (gk_real)d.mantissa; /* exact on the fast path, else 0.5 ulp */
    if (d.mantissa <= GK__EXACT_INT_MAX && e >= -GK__POW10_MAX && e <= GK__POW10_MAX) {
        r = (e >= 0) ? r * gk__pow10[e] : r / gk__pow10[-e]; /* one correct rounding */
    } else {
        while (e > GK__POW10_MAX) {
            r *= gk__pow10[GK__POW10_MAX];
            e -= GK__POW10_MAX;
        }
        while (e < -GK__POW10_MAX) {
            r /= gk__pow10[GK__POW10_MAX];
            e += GK__POW10_MAX;
        }
        r = (e >= 0) ? r * gk__pow10[e] : r / gk__pow10[-e];
    }
    if (!gk_finite(r)) { return GK_ERR_RANGE; }
    *out = d.negative ? -r : r;
    return GK_OK;
}
