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

#include <stdbool.h>

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

static bool gk__is_digit(char c) { return (c >= '0') && (c <= '9'); }

/* The value of a digit character, 0 for any other character (the caller has checked). */
static uint32_t gk__digit_value(char c) {
    uint32_t v = 0u;
    if ((c >= '0') && (c <= '9')) { v = (uint32_t)(unsigned char)c - 48u; /* '0' is 48 */ }
    return v;
}

typedef struct gk__digits {
    uint64_t mantissa;
    int32_t exp10;
    int32_t kept;         /* significant digits in mantissa */
    int32_t dropped;      /* significant digits beyond GK__KEEP_DIGITS */
    uint32_t round_digit; /* first dropped digit */
    bool sticky;          /* a non-zero digit after the first dropped one */
    int32_t count;        /* every mantissa digit character read, <= GK__DECIMAL_MAX_DIGITS */
} gk__digits;

/* Adds one mantissa digit d (0 ... 9). Called at most GK__DECIMAL_MAX_DIGITS times per number,
   so every counter, and exp10 (one step per digit), stays within +-GK__DECIMAL_MAX_DIGITS. */
static void gk__take_digit(gk__digits *s, uint32_t d, bool in_fraction) {
    s->count += 1;
    if ((s->kept == 0) && (d == 0u)) { /* leading zero: not significant */
        if (in_fraction) { s->exp10 -= 1; }
    } else if (s->kept < GK__KEEP_DIGITS) {
        s->mantissa = (s->mantissa * 10u) + (uint64_t)d;
        s->kept += 1;
        if (in_fraction) { s->exp10 -= 1; }
    } else {
        if (s->dropped == 0) {
            s->round_digit = d;
        } else if (d != 0u) {
            s->sticky = true;
        } else {
            /* a dropped zero after the first dropped digit changes nothing */
        }
        s->dropped += 1;
        if (!in_fraction) { s->exp10 += 1; /* a dropped integer digit still scales */ }
    }
}

/* Reads the digits of text[*i .. limit) into s; at most GK__DECIMAL_MAX_DIGITS digits in all
   (false when there are more: a malformed number). The loop looks at no more than
   GK__DECIMAL_MAX_DIGITS + 1 characters. */
static bool gk__scan_digits(const char *text, size_t limit, size_t *i, gk__digits *s,
                            bool in_fraction) {
    size_t k = *i;
    bool ok = true;
    bool more = true;
    int32_t n;
    for (n = 0; (n <= GK__DECIMAL_MAX_DIGITS) && more; ++n) {
        if ((k < limit) && gk__is_digit(text[k])) {
            if (s->count >= GK__DECIMAL_MAX_DIGITS) {
                ok = false;
                more = false;
            } else {
                gk__take_digit(s, gk__digit_value(text[k]), in_fraction);
                k += 1u;
            }
        } else {
            more = false;
        }
    }
    *i = k;
    return ok;
}

/* Reads the digits of an exponent from text[*i .. limit) into *e (saturating at
   GK__EXP_SATURATE, so no overflow whatever the length). False when there is no digit. */
static bool gk__scan_exponent_digits(const char *text, size_t limit, size_t *i, int32_t *e) {
    size_t k = *i;
    int32_t v = 0;
    bool any = false;
    while ((k < limit) && gk__is_digit(text[k])) {
        if (v < (GK__EXP_SATURATE / 10)) {
            v = (v * 10) + (int32_t)gk__digit_value(text[k]);
        } else {
            v = GK__EXP_SATURATE;
        }
        any = true;
        k += 1u;
    }
    *i = k;
    *e = v;
    return any;
}

/* An optional sign at text[*i]: true for '-' (the position moves past a sign). */
static bool gk__scan_sign(const char *text, size_t limit, size_t *i) {
    bool negative = false;
    if ((*i < limit) && ((text[*i] == '+') || (text[*i] == '-'))) {
        negative = text[*i] == '-';
        *i += 1u;
    }
    return negative;
}

/* The exponent part at text[*i], if any: (e|E) [+|-] digits, added to *exp10. False for an
   exponent marker without digits ("1e", "1e+"). |*exp10| <= GK__DECIMAL_MAX_DIGITS on entry and
   the digits saturate at GK__EXP_SATURATE, so the sum cannot overflow. */
static bool gk__scan_exponent(const char *text, size_t limit, size_t *i, int32_t *exp10) {
    int32_t e = 0;
    bool e_negative;
    bool ok = true;
    if ((*i < limit) && ((text[*i] == 'e') || (text[*i] == 'E'))) {
        *i += 1u;
        e_negative = gk__scan_sign(text, limit, i);
        ok = gk__scan_exponent_digits(text, limit, i, &e);
        if (ok) { *exp10 += e_negative ? -e : e; }
    }
    return ok;
}

gk_status gk__decimal_scan(const char *text, size_t limit, gk__decimal *out, size_t *used) {
    gk__digits s = { 0u, 0, 0, 0, 0u, false, 0 };
    size_t i = 0;
    bool negative;

    if ((text == NULL) || (out == NULL) || (used == NULL)) { return GK_ERR_ARGUMENT; }

    negative = gk__scan_sign(text, limit, &i);
    if (!gk__scan_digits(text, limit, &i, &s, false)) { return GK_ERR_PARSE; }
    if ((i < limit) && (text[i] == '.')) {
        i += 1u;
        if (!gk__scan_digits(text, limit, &i, &s, true)) { return GK_ERR_PARSE; }
    }
    if (s.count == 0) { return GK_ERR_PARSE; /* "", "+", ".", "e5" */ }
    if (!gk__scan_exponent(text, limit, &i, &s.exp10)) { return GK_ERR_PARSE; /* "1e", "1e+" */ }

    /* Round half to even on the dropped digits (only matters below 1e-18 relative). */
    if ((s.dropped > 0) && ((s.round_digit > 5u) ||
                            ((s.round_digit == 5u) && (s.sticky || ((s.mantissa & 1u) != 0u))))) {
        s.mantissa += 1u;
    }

    out->mantissa = s.mantissa;
    out->exp10 = s.exp10;
    out->negative = negative;
    *used = i;
    return GK_OK;
}

/* Largest r for which r * f stays finite, with a margin of 4 units of rounding so that the
   product cannot round up past the largest gk_real (f >= 1). */
static gk_real gk__mul_limit(gk_real f) {
    return (GK_REAL_MAX / f) * (GK_LIT(1.0) - (GK_LIT(4.0) * GK_REAL_EPS));
}

/* r * 10^e for r >= 0 and e >= 0, in steps of 10^GK__POW10_MAX; GK_ERR_RANGE (and *r unchanged)
   when the product would overflow, which is decided before each step, so no step yields an
   infinity. A result within 4 units of rounding below the largest gk_real counts as overflow. */
static gk_status gk__scale_up(gk_real *r, int32_t e) {
    const int32_t steps = e / GK__POW10_MAX; /* e >= 0 */
    const int32_t rest = e % GK__POW10_MAX;  /* 0 ... GK__POW10_MAX - 1 */
    gk_real v = *r;
    int32_t k;
    gk_status st = GK_OK;
    for (k = 0; (k < steps) && (st == GK_OK); ++k) {
        if (v <= gk__mul_limit(gk__pow10[GK__POW10_MAX])) {
            v *= gk__pow10[GK__POW10_MAX];
        } else {
            st = GK_ERR_RANGE;
        }
    }
    if (st == GK_OK) {
        if (v <= gk__mul_limit(gk__pow10[rest])) {
            *r = v * gk__pow10[rest]; /* 10^0 = 1 is exact: the same value as without it */
        } else {
            st = GK_ERR_RANGE;
        }
    }
    return st;
}

/* r / 10^(-e) for e < 0, in steps of 10^GK__POW10_MAX (a quotient that underflows becomes 0). */
static gk_real gk__scale_down(gk_real r, int32_t e) {
    gk_real v = r;
    int32_t k = -e;
    while (k > GK__POW10_MAX) {
        v /= gk__pow10[GK__POW10_MAX];
        k -= GK__POW10_MAX;
    }
    return v / gk__pow10[k];
}

gk_status gk__decimal_to_real(gk__decimal d, int32_t extra_exp10, gk_real *out) {
    gk_real r;
    int64_t total;
    int32_t e;
    gk_status st = GK_OK;

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
    if ((d.mantissa <= GK__EXACT_INT_MAX) && (e >= -GK__POW10_MAX) && (e <= GK__POW10_MAX)) {
        /* one correct rounding; at most 2^53 10^22 (binary32: 2^24 10^10): finite */
        r = (e >= 0) ? (r * gk__pow10[e]) : (r / gk__pow10[-e]);
    } else if (e >= 0) {
        st = gk__scale_up(&r, e);
    } else {
        r = gk__scale_down(r, e);
    }
    if (st != GK_OK) { return st; }
    *out = d.negative ? -r : r;
    return GK_OK;
}
