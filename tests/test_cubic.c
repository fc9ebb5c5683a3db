/*
 * test_cubic.c - the private cubic solver (lib/cubic.c) on cubics with known roots.
 *
 * The solver is private (not exported from the shared library), so it is compiled into this
 * test directly. Roots are chosen as dyadic rationals (or integers) so that the monic cubic
 * (z - r0)(z - r1)(z - r2) has exactly representable coefficients in double and its roots are
 * exactly the listed values: the reference is exact (common practice for root-finder tests, as
 * in GSL's tables of known roots).
 * Tolerances: a simple root of these cubics has condition number below 10, so the solver is
 * held to 8 u relative (1.8e-15 double, 1e-6 float, where the coefficients are rounded to float
 * and the float figure includes that rounding). A double root is found to about sqrt(u), a
 * triple root to about cbrt(u) (the limit for any method on rounded data).
 */
#include "gk_test.h"
#include "../lib/cubic.c"

typedef struct known_cubic {
    double r[3];   /* roots of (z - r0)(z - r1)(z - r2), ascending */
    double lo;     /* keep roots above this */
    int count;     /* distinct roots above lo */
    double tol;    /* relative tolerance of each root (double build) */
} known_cubic;

static const known_cubic KNOWN[] = {
    {{1.0, 2.0, 3.0}, 0.0, 3, 4e-16},
    {{0.125, 0.5, 3.0}, 0.0, 3, 4e-16},
    {{0.0009765625, 0.125, 1.0}, 0.0, 3, 4e-16},          /* 2^-10: a small liquid-like root */
    {{0.0000152587890625, 0.25, 1.0}, 0.0, 3, 4e-16},     /* 2^-16 */
    {{0.0000152587890625, 1.0, 65536.0}, 0.0, 3, 4e-16},  /* 2^-16, 1, 2^16: spread coefficients */
    {{-1.0, 0.5, 2.0}, 0.0, 2, 4e-16},                    /* a root below lo is dropped */
    {{-4.0, -1.0, 0.75}, 0.0, 1, 4e-16},
    {{0.03125, 0.0625, 0.9375}, 0.05, 2, 4e-16},          /* lo between the two small roots */
    {{-3.0, -2.0, -1.0}, 0.0, 0, 0.0},                    /* nothing above lo */
};

static void known_roots(void **state) {
    (void)state;
    for (size_t i = 0; i < sizeof KNOWN / sizeof KNOWN[0]; ++i) {
        const known_cubic *k = &KNOWN[i];
        double c2 = -(k->r[0] + k->r[1] + k->r[2]);
        double c1 = k->r[0] * k->r[1] + k->r[0] * k->r[2] + k->r[1] * k->r[2];
        double c0 = -k->r[0] * k->r[1] * k->r[2];
        gk_real z[3] = {GK_SENTINEL, GK_SENTINEL, GK_SENTINEL};
        int n = gk__cubic_roots((gk_real)c2, (gk_real)c1, (gk_real)c0, (gk_real)k->lo,
                                (gk_real)k->lo, 0, z);
        assert_int_equal(n, k->count);
        int first = 3 - k->count;
        for (int j = 0; j < k->count; ++j)
            assert_rel(z[j], k->r[first + j], GK_TOL(k->tol, 1e-6));
        for (int j = k->count; j < 3; ++j) assert_rel(z[j], 0.0, 0.0);
    }
}

/* One real root and a complex pair: (z - 2)(z^2 + 1), z^3 - 1, (z - 0.5)(z^2 + z + 1). */
static void one_real_root(void **state) {
    (void)state;
    gk_real z[3];
    assert_int_equal(gk__cubic_roots(-2, 1, -2, -10, -10, 0, z), 1);
    assert_rel(z[0], 2.0, GK_TOL(4e-16, 2e-7));
    assert_int_equal(gk__cubic_roots(0, 0, -1, -10, -10, 0, z), 1);
    assert_rel(z[0], 1.0, GK_TOL(4e-16, 2e-7));
    assert_int_equal(gk__cubic_roots((gk_real)0.5, (gk_real)0.5, (gk_real)-0.5, 0, 0, 0, z), 1);
    assert_rel(z[0], 0.5, GK_TOL(4e-16, 2e-7));
    /* with a known upper bound hi: the same answers */
    assert_int_equal(gk__cubic_roots(-2, 1, -2, 0, 5, 0, z), 1);
    assert_rel(z[0], 2.0, GK_TOL(4e-16, 2e-7));
}

/* Caller's estimate of the largest root below it (above the local minimum), on both paths of
   the solver: (z + 2)(z + 1)(z - 4) = z^3 - z^2 - 10 z - 8 (f < 0 at the inflection point) with
   the estimate 2.5 (local minimum about 2.19) and the bound hi = 8; and
   (z + 40)(z - 10)(z - 20) = z^3 + 10 z^2 - 1000 z + 8000 (f > 0 at the inflection point) with the
   estimate 15.5 (local minimum about 15.23) and hi = 80. Integer roots, exact coefficients. */
static void estimate_below_root(void **state) {
    (void)state;
    gk_real z[3];
    assert_int_equal(gk__cubic_roots(-1, -10, -8, (gk_real)-1e30, 8, (gk_real)2.5, z), 3);
    assert_rel(z[0], -2.0, GK_TOL(4e-16, 2e-7));
    assert_rel(z[1], -1.0, GK_TOL(4e-16, 2e-7));
    assert_rel(z[2], 4.0, GK_TOL(4e-16, 2e-7));
    assert_int_equal(gk__cubic_roots(10, -1000, 8000, (gk_real)-1e30, 80, (gk_real)15.5, z), 3);
    assert_rel(z[0], -40.0, GK_TOL(4e-16, 2e-7));
    assert_rel(z[1], 10.0, GK_TOL(4e-16, 2e-7));
    assert_rel(z[2], 20.0, GK_TOL(4e-16, 2e-7));
}

/* Multiple roots. (z - 3/8)^3: the van der Waals critical point (Zc = 3/8 from the critical
   conditions, common practice); coefficients 1.125, 0.421875, 0.052734375 are exact. */
static void triple_and_double_roots(void **state) {
    (void)state;
    gk_real z[3];
    int n = gk__cubic_roots((gk_real)-1.125, (gk_real)0.421875, (gk_real)-0.052734375, 0, 0, 0, z);
    assert_int_equal(n, 1);
    assert_rel(z[0], 0.375, GK_TOL(1e-15, 1e-6)); /* exact data: the inflection point is the root */
    /* perturbed triple root: (z - 3/8)^3 - 1e-12 has one real root 3/8 + 1e-4. Its condition:
       f'(root) = 3e-8 while f is evaluated to about u * 0.2, so about 1e-9 relative is the limit
       (float: c0 cannot hold the perturbation; the root moves by up to cbrt(3e-9) ~ 1.4e-3). */
    n = gk__cubic_roots((gk_real)-1.125, (gk_real)0.421875, (gk_real)(-0.052734375 - 1e-12), 0, 1, 0, z);
    assert_int_equal(n, 1);
    assert_rel(z[0], 0.375 + 1e-4, GK_TOL(3e-9, 1e-2));
    /* (z - 1)^2 (z - 2) = z^3 - 4 z^2 + 5 z - 2: the double root is found exactly here (f is 0 at
       the critical point 1), so the count is 2 */
    n = gk__cubic_roots(-4, 5, -2, 0, 0, 0, z);
    assert_int_equal(n, 2);
    assert_rel(z[0], 1.0, GK_TOL(1.5e-8, 1e-3));
    assert_rel(z[1], 2.0, GK_TOL(4e-16, 2e-7));
    /* (z - 0.5)(z - 2)^2: double root on the large side */
    n = gk__cubic_roots(-4.5, 6, -2, 0, 0, 0, z);
    assert_int_equal(n, 2);
    assert_rel(z[0], 0.5, GK_TOL(4e-16, 2e-7));
    assert_rel(z[1], 2.0, GK_TOL(1.5e-8, 1e-3));
}

/* Scaling: roots of very large or very small magnitude (the solver scales by a power of two). */
static void scaled_inputs(void **state) {
    (void)state;
    gk_real z[3];
    const double s = GK_TOL(0x1p100, 0x1p30); /* 2^100 (double) or 2^30 (float) */
    const double t = 1.0 / s;
    /* roots s, 2s, 3s */
    int n = gk__cubic_roots((gk_real)(-6 * s), (gk_real)(11 * s * s), (gk_real)(-6 * s * s * s), 0, 0, 0, z);
    assert_int_equal(n, 3);
    assert_rel(z[0], s, GK_TOL(4e-16, 2e-6));
    assert_rel(z[1], 2 * s, GK_TOL(4e-16, 2e-6));
    assert_rel(z[2], 3 * s, GK_TOL(4e-16, 2e-6));
    /* roots t, 2t, 3t */
    n = gk__cubic_roots((gk_real)(-6 * t), (gk_real)(11 * t * t), (gk_real)(-6 * t * t * t), 0, 0, 0, z);
    assert_int_equal(n, 3);
    assert_rel(z[0], t, GK_TOL(4e-16, 2e-6));
    assert_rel(z[2], 3 * t, GK_TOL(4e-16, 2e-6));
}

/* Peng-Robinson at Tr = 0.3, Pr = 0.001, omega = 0 (constants of Peng and Robinson 1976): the
   small liquid root that closed forms lose. Checked here by the backward error (each root is a
   root of the given cubic to a few u, f evaluated in long double); the forward error against
   mpmath is in test_eos (reference table). */
static void small_liquid_root(void **state) {
    (void)state;
    /* A = 0.45724 alpha Pr / Tr^2, B = 0.0778 Pr / Tr with alpha = (1 + 0.37464 (1 - sqrt 0.3))^2 */
    double tr = 0.3, pr = 0.001;
    double s = 1.0 + 0.37464 * (1.0 - sqrt(tr));
    double a = 0.45724 * s * s * pr / (tr * tr), b = 0.0778 * pr / tr;
    gk_real z[3];
    int n = gk__cubic_roots((gk_real)(-(1.0 - b)), (gk_real)(a - b * (2.0 + 3.0 * b)),
                            (gk_real)(-b * (a - b * (1.0 + b))), (gk_real)b, (gk_real)(1.0 + b), 0, z);
    assert_int_equal(n, 3);
    /* backward check in long double: each root is a root of the double-rounded cubic */
    for (int k = 0; k < 3; ++k) {
        long double x = (long double)z[k];
        /* the double-rounded coefficients the solver was given, held exactly in long double */
        long double c2 = (long double)(-(1.0 - b)), c1 = (long double)(a - b * (2.0 + 3.0 * b));
        long double c0 = (long double)(-b * (a - b * (1.0 + b)));
        long double f = ((x + c2) * x + c1) * x + c0;
        long double mag = ((fabsl(x) + fabsl(c2)) * fabsl(x) + fabsl(c1)) * fabsl(x) + fabsl(c0);
        assert_true(fabsl(f) <= (long double)GK_TOL(8e-16, 4e-7) * mag);
    }
    assert_true((double)z[0] > b && (double)z[0] < 2.0 * b); /* liquid root just above the covolume */
}

static void invalid_inputs(void **state) {
    (void)state;
    gk_real z[3] = {GK_SENTINEL, GK_SENTINEL, GK_SENTINEL};
    assert_int_equal(gk__cubic_roots((gk_real)NAN, 1, 1, 0, 0, 0, z), -1);
    assert_int_equal(gk__cubic_roots(1, (gk_real)INFINITY, 1, 0, 0, 0, z), -1);
    assert_int_equal(gk__cubic_roots(1, 1, 1, (gk_real)NAN, 0, 0, z), -1);
    assert_rel(z[0], GK_SENTINEL, 0.0);
    assert_rel(z[2], GK_SENTINEL, 0.0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(known_roots),
        cmocka_unit_test(one_real_root),
        cmocka_unit_test(estimate_below_root),
        cmocka_unit_test(triple_and_double_roots),
        cmocka_unit_test(scaled_inputs),
        cmocka_unit_test(small_liquid_root),
        cmocka_unit_test(invalid_inputs),
    };
    return cmocka_run_group_tests_name("cubic", tests, NULL, NULL);
}
