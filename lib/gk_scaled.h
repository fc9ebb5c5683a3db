/*
 * gk_scaled.h - over/underflow-safe products of ratios, shared by units.c, ideal.c, kinetic.c
 * (private, never installed).
 *
 * Formulas such as p = n R T / V can overflow or underflow in an intermediate product although
 * the result is representable (n = 1e200 mol, T = 1e200 K, V = 1e300 m3). gk_scaled_product()
 * splits every factor into mantissa and exponent with frexp(), combines the mantissas (each
 * ratio of two mantissas lies in (0.5, 2), so the running product of at most GK_SCALED_MAX
 * ratios stays within (2^-8, 2^8)) and applies the summed exponent once with ldexp(). frexp and
 * ldexp are exact for normal numbers, so the rounding error is the same as that of the plain
 * expression: one rounding per division and per multiplication, i.e. at most about
 * (2 count - 1) half-ulps (common practice: floating-point error analysis).
 *
 * The factors come in (numerator, denominator) pairs: a pair of equal values gives exactly 1,
 * so the special cases of gk_state_change() (Boyle, Charles, ...) lose nothing.
 *
 * Result rule of the foundation modules: a GK_OK result is finite, and when not exactly 0 its
 * magnitude is at least the smallest normal number (GK_REAL_MIN_NORMAL); a subnormal or zero
 * result of non-zero inputs has lost digits and is reported as GK_ERR_RANGE (underflow).
 */
#ifndef GASKIT_SCALED_H
#define GASKIT_SCALED_H

#include "gk_internal.h"

#if GK_REAL_IS_FLOAT
#  define GK_REAL_MIN_NORMAL 1.17549435e-38f /* FLT_MIN = 2^-126, IEEE 754 binary32 */
#else
#  define GK_REAL_MIN_NORMAL 2.2250738585072014e-308 /* DBL_MIN = 2^-1022, IEEE 754 binary64 */
#endif

/* Most (numerator, denominator) pairs gk_scaled_product() accepts. */
#define GK_SCALED_MAX 4

/* GK_OK when x is finite and either exactly 0 or of normal magnitude; GK_ERR_RANGE otherwise. */
static inline gk_status gk_check_normal(gk_real x) {
    gk_real a = gk_fabs(x);
    if (!gk_finite(x)) { return GK_ERR_RANGE; }
    if (a > GK_LIT(0.0) && a < GK_REAL_MIN_NORMAL) { return GK_ERR_RANGE; }
    return GK_OK;
}

/*
 * Fast-path bound: with every factor in [2^-B, 2^B], each ratio lies in [2^-2B, 2^2B] and every
 * partial product of count ratios in [2^-2B count, 2^2B count], inside the normal range
 * (2^-1022 .. 2^1024 for binary64, 2^-126 .. 2^128 for binary32) when 2 B count <= 1021
 * (binary64) or <= 125 (binary32). Exact powers of two (C99 hex literals).
 */
static inline gk_real gk_scaled_bound(int count) {
#if GK_REAL_IS_FLOAT
    switch (count) {
        case 1:
            return GK_LIT(0x1p62);
        case 2:
            return GK_LIT(0x1p31);
        case 3:
            return GK_LIT(0x1p20);
        default:
            return GK_LIT(0x1p15);
    }
#else
    switch (count) {
        case 1:
            return GK_LIT(0x1p510);
        case 2:
            return GK_LIT(0x1p255);
        case 3:
            return GK_LIT(0x1p170);
        default:
            return GK_LIT(0x1p127);
    }
#endif
}

/*
 * out = prod_i num[i] / den[i] for i < count (1 <= count <= GK_SCALED_MAX); every factor must
 * be finite and > 0 (the caller has checked). GK_ERR_RANGE when the result overflows or falls
 * below the smallest normal number; *out written only on GK_OK.
 *
 * Fast path: when every factor is within the bound above, the plain product of ratios cannot
 * over/underflow in any step, and since scaling by a power of two commutes with rounding in
 * the normal range it gives bit for bit the result of the frexp/ldexp path.
 */
static inline gk_status gk_scaled_product(const gk_real *num, const gk_real *den, int count,
                                          gk_real *out) {
    const gk_real hi = gk_scaled_bound(count);
    const gk_real lo = GK_LIT(1.0) / hi; /* exact: a power of two */
    gk_real mant = GK_LIT(1.0);
    int expo = 0;
    int i;
    bool in_range = true;
    for (i = 0; i < count; ++i) {
        if (num[i] > hi || num[i] < lo || den[i] > hi || den[i] < lo) { in_range = false; }
    }
    if (in_range) {
        for (i = 0; i < count; ++i) { mant *= num[i] / den[i]; }
        *out = mant;
        return GK_OK;
    }
    for (i = 0; i < count; ++i) {
        int en = 0, ed = 0;
        gk_real fn = gk_frexp(num[i], &en);
        gk_real fd = gk_frexp(den[i], &ed);
        mant *= fn / fd;
        expo += en - ed;
    }
    {
        /* exponents of finite values stay within a few thousand: no int overflow */
        gk_real r = gk_ldexp(mant, expo);
        if (!(r > GK_LIT(0.0)) || gk_check_normal(r) != GK_OK) { return GK_ERR_RANGE; }
        *out = r;
    }
    return GK_OK;
}

/* The evaluation of ideal.c and kinetic.c: GK_ERR_ARGUMENT for a NULL out, GK_ERR_DOMAIN unless
 * every factor is finite and > 0, else out = prod num[i] / den[i] by gk_scaled_product(). */
static inline gk_status gk_scaled_eval(const gk_real *num, const gk_real *den, int count,
                                       gk_real *out) {
    int i;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    for (i = 0; i < count; ++i) {
        if (!gk_positive(num[i]) || !gk_positive(den[i])) { return GK_ERR_DOMAIN; }
    }
    return gk_scaled_product(num, den, count, out);
}

#endif /* GASKIT_SCALED_H */
