/*
 * gk_test.h - shared helpers of the CMocka suites.
 *
 * Tolerances: every check states its tolerance for a double build and for a float build
 * (GK_TOL(double_tol, float_tol)); a float build keeps about 7 significant digits, less after
 * cancellation, so the float figure is chosen per check and documented beside it.
 */
#ifndef GASKIT_TEST_H
#define GASKIT_TEST_H

#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <setjmp.h>
#include <math.h>
#include <stdio.h>
#include <cmocka.h>
#include "gaskit/gaskit.h"

#if GK_REAL_IS_FLOAT
#  define GK_TOL(double_tol, float_tol) (float_tol)
#else
#  define GK_TOL(double_tol, float_tol) (double_tol)
#endif

/* A value a function must leave in place when it fails. */
#define GK_SENTINEL ((gk_real)-12345.0)

/* |actual - expected| <= rel_tol * |expected| (or <= rel_tol when expected is 0). */
#define assert_rel(actual, expected, rel_tol) \
    gk_assert_rel((double)(actual), (double)(expected), (double)(rel_tol), #actual, __FILE__, __LINE__)

static inline void gk_assert_rel(double actual, double expected, double rel_tol,
                                 const char *what, const char *file, int line) {
    double scale = fabs(expected) > 0.0 ? fabs(expected) : 1.0;
    double err = fabs(actual - expected) / scale;
    if (!(err <= rel_tol)) {
        print_error("%s = %.17g, expected %.17g (relative error %.3g > tolerance %.3g)\n",
                    what, actual, expected, err, rel_tol);
        _fail(file, line);
    }
}

/* |actual - expected| <= abs_tol. */
#define assert_abs(actual, expected, abs_tol) \
    gk_assert_abs((double)(actual), (double)(expected), (double)(abs_tol), #actual, __FILE__, __LINE__)

static inline void gk_assert_abs(double actual, double expected, double abs_tol,
                                 const char *what, const char *file, int line) {
    double err = fabs(actual - expected);
    if (!(err <= abs_tol)) {
        print_error("%s = %.17g, expected %.17g (error %.3g > tolerance %.3g)\n",
                    what, actual, expected, err, abs_tol);
        _fail(file, line);
    }
}

#define assert_status(call, expected) assert_int_equal((int)(call), (int)(expected))

#endif /* GASKIT_TEST_H */
