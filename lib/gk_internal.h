/*
 * gk_internal.h - private helpers shared by the modules in lib/ (never installed).
 *
 * - GK_LIT(x): a floating literal in gk_real precision, so that a float build does no double
 *   arithmetic (keeps -Wdouble-promotion clean and the Cortex-M4F build free of soft-double calls).
 * - gk_sqrt ... : <math.h> functions in gk_real precision (the one place for these wrappers).
 * - gk_finite / gk_positive: the input checks of the error contract.
 * - gk__ascii_lower: ASCII case folding for gas names and composition keywords.
 */
#ifndef GASKIT_INTERNAL_H
#define GASKIT_INTERNAL_H

#include <math.h>
#include <stdbool.h>
#include "gaskit/gaskit.h"

#define GK_LIT(x) GK_REAL_C(x)

/* Keeps a helper out of line, so that its locals are not in the frame of a caller that also
   makes deeper calls (the firmware stack budget, docs/embedding.md); only a hint, empty without
   GCC or Clang. */
#if defined(__GNUC__)
#  define GK_NOINLINE __attribute__((noinline))
#else
#  define GK_NOINLINE
#endif

#if GK_REAL_IS_FLOAT
#  define gk_sqrt sqrtf
#  define gk_cbrt cbrtf
#  define gk_fabs fabsf
#  define gk_log logf
#  define gk_exp expf
#  define gk_pow powf
#  define gk_cos cosf
#  define gk_acos acosf
#  define gk_fma fmaf
#  define gk_copysign copysignf
#  define gk_frexp frexpf
#  define gk_ldexp ldexpf
#  define GK_REAL_MAX 3.402823466e+38f /* FLT_MAX, IEEE 754 binary32 (common practice) */
#  define GK_REAL_EPS 1.1920929e-7f    /* FLT_EPSILON, 2^-23 (IEEE 754 binary32) */
#else
#  define gk_sqrt sqrt
#  define gk_cbrt cbrt
#  define gk_fabs fabs
#  define gk_log log
#  define gk_exp exp
#  define gk_pow pow
#  define gk_cos cos
#  define gk_acos acos
#  define gk_fma fma
#  define gk_copysign copysign
#  define gk_frexp frexp
#  define gk_ldexp ldexp
#  define GK_REAL_MAX 1.7976931348623157e+308 /* DBL_MAX, IEEE 754 binary64 (common practice) */
#  define GK_REAL_EPS 2.220446049250313e-16   /* DBL_EPSILON, 2^-52 (IEEE 754 binary64) */
#endif

/* pi to 21 digits (common practice); rounded to gk_real by GK_LIT. */
#define GK_PI GK_LIT(3.14159265358979323846)

/* isfinite() is a type-generic macro in C99, so it does not promote a float. */
static inline bool gk_finite(gk_real x) { return isfinite(x) != 0; }

/* Finite and strictly positive: the domain of T, p, V, n, M. */
static inline bool gk_positive(gk_real x) { return isfinite(x) && x > GK_LIT(0.0); }

/* Status of a value that must be finite and > 0. */
static inline gk_status gk_check_positive(gk_real x) {
    return gk_positive(x) ? GK_OK : GK_ERR_DOMAIN;
}

/* Status of a computed result: finite is GK_OK, anything else (overflow) GK_ERR_RANGE. */
static inline gk_status gk_check_result(gk_real x) { return gk_finite(x) ? GK_OK : GK_ERR_RANGE; }

/* ASCII lower case; no locale, no <ctype.h> (gas names and composition keywords). */
static inline char gk__ascii_lower(char c) {
    const int code = ((int)c - (int)'A') + (int)'a';
    char lower = c;
    if ((c >= 'A') && (c <= 'Z')) { lower = (char)code; }
    return lower;
}

#endif /* GASKIT_INTERNAL_H */
