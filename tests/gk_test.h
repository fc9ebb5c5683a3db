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

/* ------------------------------------------------------------------ error-contract driver */
/* A function of up to three gk_real inputs wrapped as fn(in, out). The driver checks, for each
   case: the good inputs give GK_OK with a finite result > 0; a NULL output is GK_ERR_ARGUMENT
   (also when an input is bad: the NULL is reported first); NaN, +-Inf, 0, -1 and a tiny
   negative value in each input are GK_ERR_DOMAIN; the over and under inputs are GK_ERR_RANGE;
   and the output keeps its sentinel through every failure. */
typedef gk_status (*gk_contract_fn)(const gk_real in[3], gk_real *out);

typedef struct gk_contract_case {
    const char *name;
    gk_contract_fn fn;
    int inputs;       /* 1 to 3 */
    gk_real good[3];  /* valid inputs */
    gk_real over[3];  /* inputs whose result overflows */
    gk_real under[3]; /* inputs whose result falls below the normal range */
} gk_contract_case;

static inline void gk_check_contract(const gk_contract_case *cases, size_t count, gk_real tiny) {
    const gk_real bad[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY, (gk_real)0.0,
                            (gk_real)-1.0, -tiny };
    for (size_t c = 0; c < count; ++c) {
        const gk_contract_case *k = &cases[c];
        gk_real out = GK_SENTINEL;
        print_message("%s\n", k->name);
        assert_status(k->fn(k->good, &out), GK_OK);
        assert_true(isfinite(out) && out > 0);
        out = GK_SENTINEL;
        assert_status(k->fn(k->good, NULL), GK_ERR_ARGUMENT);
        for (int i = 0; i < k->inputs; ++i) {
            for (size_t b = 0; b < sizeof bad / sizeof bad[0]; ++b) {
                gk_real in[3] = { k->good[0], k->good[1], k->good[2] };
                in[i] = bad[b];
                assert_status(k->fn(in, &out), GK_ERR_DOMAIN);
                assert_status(k->fn(in, NULL), GK_ERR_ARGUMENT);
            }
        }
        assert_status(k->fn(k->over, &out), GK_ERR_RANGE);
        assert_status(k->fn(k->under, &out), GK_ERR_RANGE);
        assert_rel(out, GK_SENTINEL, 0.0);
    }
}

/* ------------------------------------------------------------------ reference models off */
/* The main of a suite of the reference-grade models when they are not built
   (GASKIT_REFERENCE_MODELS=OFF): they must be refused. 0 when Span-Wagner gives
   GK_ERR_NOT_FOUND, 1 otherwise. */
static inline int gk_reference_models_refused(void) {
    const gk_gas *n2 = NULL;
    gk_eos_result r;
    if (gk_gas_find("N2", &n2) != GK_OK) { return 1; }
    return gk_eos_solve(GK_EOS_SPAN_WAGNER, n2, (gk_pressure){ (gk_real)1e5 },
                        (gk_temperature){ (gk_real)300.0 }, GK_ROOT_STABLE, &r) == GK_ERR_NOT_FOUND
               ? 0
               : 1;
}

#endif /* GASKIT_TEST_H */
