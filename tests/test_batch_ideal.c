/*
 * test_batch_ideal.c - gk_ideal_density_batch(): published values, failed elements, and bit
 * for bit the results and statuses of the scalar gk_ideal_density() over many random and edge
 * inputs (zero, negative, NaN, infinities, subnormal, extreme magnitudes, the neighbours of
 * the fast-path bounds 2^-255 and 2^255 (double) or 2^-31 and 2^31 (float)), in full blocks,
 * short tails, in place, with and without a status array.
 */
#include "gk_test.h"
#include <float.h>
#include <stdint.h>
#include <string.h>

static const gk_molar_mass air = { (gk_real)28.9644e-3 }; /* ISO 2533:1975 molar mass of air */

/* Same bits as the scalar call. */
static void assert_same(gk_real a, gk_real b) { assert_memory_equal(&a, &b, sizeof a); }

static void matches_scalar_and_reference(void **state) {
    (void)state;
    /* an invented calibration-bench sweep: barometric to 10 bar, -40 degC to 150 degC */
    const gk_real p[6] = { 101325, 95000, 250000, 500000, 1000000, 101325 };
    const gk_real t[6] = { (gk_real)288.15, (gk_real)233.15, (gk_real)293.15,
                           (gk_real)323.15, (gk_real)423.15, (gk_real)273.15 };
    gk_real out[6];
    gk_status st[6];
    assert_int_equal(gk_ideal_density_batch(6, p, t, air, out, st), 6);
    for (int i = 0; i < 6; ++i) {
        gk_density rho;
        gk_pressure pi = { p[i] };
        gk_temperature ti = { t[i] };
        assert_status(gk_ideal_density(pi, ti, air, &rho), GK_OK);
        assert_same(out[i], rho.kg_per_m3);
        assert_status(st[i], GK_OK);
    }
    /* ISO 2533:1975 sea level: 1.2250 kg/m3 (R* = 8.31432 in the standard: tolerance 1e-4) */
    assert_rel(out[0], 1.2250, 1e-4);
    /* hand computation, p M / (R T) with CODATA 2018 R, at 1 MPa and 423.15 K: 8.232656... */
    assert_rel(out[4], 1.0e6 * 28.9644e-3 / (8.314462618 * 423.15), GK_TOL(1e-14, 5e-7));
    /* status_out may be NULL */
    gk_real out2[6];
    assert_int_equal(gk_ideal_density_batch(6, p, t, air, out2, NULL), 6);
    assert_memory_equal(out, out2, sizeof out);
}

static void failed_elements(void **state) {
    (void)state;
    const gk_real big = (gk_real)GK_TOL(1e300, 1e30);
    const gk_real small = (gk_real)GK_TOL(1e-300, 1e-30);
    const gk_real p[8] = { 101325, (gk_real)NAN, 101325, -5, 101325, big, 0, 101325 };
    const gk_real t[8] = { 300, 300, (gk_real)INFINITY, 300, 0, small, 300, 300 };
    const gk_status expect[8] = { GK_OK,         GK_ERR_DOMAIN, GK_ERR_DOMAIN, GK_ERR_DOMAIN,
                                  GK_ERR_DOMAIN, GK_ERR_RANGE,  GK_ERR_DOMAIN, GK_OK };
    gk_real out[8];
    gk_status st[8];
    assert_int_equal(gk_ideal_density_batch(8, p, t, air, out, st), 2);
    for (int i = 0; i < 8; ++i) {
        assert_status(st[i], expect[i]);
        if (expect[i] == GK_OK)
            assert_true(isfinite(out[i]) && out[i] > 0);
        else
            assert_true(isnan(out[i]));
    }
    /* an invalid molar mass fails every element */
    const gk_molar_mass bad_m[] = { { (gk_real)NAN }, { 0 }, { -1 }, { (gk_real)INFINITY } };
    for (size_t k = 0; k < 4; ++k) {
        assert_int_equal(gk_ideal_density_batch(8, p, t, bad_m[k], out, st), 0);
        for (int i = 0; i < 8; ++i) {
            assert_status(st[i], GK_ERR_DOMAIN);
            assert_true(isnan(out[i]));
        }
    }
}

static void null_arrays_and_zero_count(void **state) {
    (void)state;
    const gk_real p[3] = { 101325, 101325, 101325 };
    const gk_real t[3] = { 300, 300, 300 };
    gk_real out[3] = { GK_SENTINEL, GK_SENTINEL, GK_SENTINEL };
    gk_status st[3] = { (gk_status)-1, (gk_status)-1, (gk_status)-1 };
    /* count 0: nothing read, nothing written, even through NULL */
    assert_int_equal(gk_ideal_density_batch(0, p, t, air, out, st), 0);
    assert_int_equal(gk_ideal_density_batch(0, NULL, NULL, air, NULL, NULL), 0);
    assert_rel(out[0], GK_SENTINEL, 0.0);
    assert_int_equal((int)st[0], -1);
    /* NULL input arrays: every element fails with GK_ERR_ARGUMENT and gets NaN */
    assert_int_equal(gk_ideal_density_batch(3, NULL, t, air, out, st), 0);
    for (int i = 0; i < 3; ++i) {
        assert_status(st[i], GK_ERR_ARGUMENT);
        assert_true(isnan(out[i]));
    }
    out[0] = out[1] = out[2] = GK_SENTINEL;
    assert_int_equal(gk_ideal_density_batch(3, p, NULL, air, out, NULL), 0);
    for (int i = 0; i < 3; ++i) assert_true(isnan(out[i]));
    /* NULL output array: every element fails, statuses still reported */
    st[0] = st[1] = st[2] = GK_OK;
    assert_int_equal(gk_ideal_density_batch(3, p, t, air, NULL, st), 0);
    for (int i = 0; i < 3; ++i) assert_status(st[i], GK_ERR_ARGUMENT);
    assert_int_equal(gk_ideal_density_batch(3, NULL, NULL, air, NULL, NULL), 0);
}

/* Fixed-seed generator (xorshift64*), so a failure repeats. */
static uint64_t rng = 0x2545F4914F6CDD1Dull;
static uint64_t next_u64(void) {
    rng ^= rng >> 12;
    rng ^= rng << 25;
    rng ^= rng >> 27;
    return rng * 2685821657736338717ull;
}

/* A random input: mostly ordinary readings, often an edge value, sometimes any bit pattern. */
static gk_real random_input(void) {
#if GK_REAL_IS_FLOAT
#  define NEXT nextafterf
    const gk_real bound = 0x1p31f, tiny = 0x1p-149f, huge = FLT_MAX, least_normal = FLT_MIN;
#else
#  define NEXT nextafter
    const gk_real bound = 0x1p255, tiny = 0x1p-1074, huge = DBL_MAX, least_normal = DBL_MIN;
#endif
    const gk_real edges[] = { 0,
                              (gk_real)-0.0,
                              -1,
                              (gk_real)NAN,
                              (gk_real)INFINITY,
                              (gk_real)-INFINITY,
                              tiny,
                              tiny * 3,
                              least_normal,
                              NEXT(least_normal, 0),
                              huge,
                              bound,
                              NEXT(bound, 0),
                              NEXT(bound, huge),
                              1 / bound,
                              NEXT(1 / bound, 0),
                              NEXT(1 / bound, huge),
                              (gk_real)GK_TOL(1e300, 1e30),
                              (gk_real)GK_TOL(1e-300, 1e-30) };
    const uint64_t u = next_u64();
    switch (u % 8u) {
        case 0: /* an edge */
            return edges[(u >> 8) % (sizeof edges / sizeof edges[0])];
        case 1: { /* any bit pattern */
            gk_real r;
            uint64_t bits = next_u64();
            memcpy(&r, &bits, sizeof r);
            return r;
        }
        default: /* an ordinary reading, 1 ... 1e7 */
            return (gk_real)(1.0 + 1e7 * (double)(next_u64() >> 11) * 0x1p-53);
    }
}

/* Compares each element with the scalar call: same status, same bits or NaN. */
static void assert_matches_scalar(size_t n, const gk_real *p, const gk_real *t, gk_molar_mass m,
                                  const gk_real *out, const gk_status *st, size_t ok) {
    size_t n_ok = 0;
    for (size_t i = 0; i < n; ++i) {
        gk_density rho = { GK_SENTINEL };
        gk_pressure pi = { p[i] };
        gk_temperature ti = { t[i] };
        gk_status s = gk_ideal_density(pi, ti, m, &rho);
        if (st != NULL) { assert_status(st[i], s); }
        if (s == GK_OK) {
            assert_same(out[i], rho.kg_per_m3);
            ++n_ok;
        } else {
            assert_true(isnan(out[i]));
        }
    }
    assert_int_equal(ok, n_ok);
}

static void bit_identical_to_scalar(void **state) {
    (void)state;
    enum {
        N = 3000
    }; /* 11 full blocks of 256 and a tail */
    static gk_real p[N], t[N], out[N], out2[N];
    static gk_status st[N];
    const gk_molar_mass masses[] = { air,
                                     { (gk_real)4.0026e-3 },
                                     { (gk_real)GK_TOL(1e-300, 1e-30) },
                                     { (gk_real)GK_TOL(1e300, 1e30) } };
    for (int round = 0; round < 40; ++round) {
        /* even rounds: every block clean except a few bad elements; odd rounds: dense edges */
        for (size_t i = 0; i < N; ++i) {
            if (round % 2 == 0 && (next_u64() % 300u) != 0u) {
                p[i] = (gk_real)(1e3 + 1e7 * (double)(next_u64() >> 11) * 0x1p-53);
                t[i] = (gk_real)(50.0 + 1e3 * (double)(next_u64() >> 11) * 0x1p-53);
            } else {
                p[i] = random_input();
                t[i] = random_input();
            }
        }
        const gk_molar_mass m = masses[round % 4];
        const size_t n = (round % 3 == 0) ? (size_t)N : (size_t)(next_u64() % N);
        size_t ok = gk_ideal_density_batch(n, p, t, m, out, st);
        assert_matches_scalar(n, p, t, m, out, st, ok);
        /* without statuses: the same outputs */
        assert_int_equal(gk_ideal_density_batch(n, p, t, m, out2, NULL), ok);
        assert_memory_equal(out, out2, n * sizeof out[0]);
        /* in place, into the pressure array */
        memcpy(out2, p, sizeof p);
        assert_int_equal(gk_ideal_density_batch(n, out2, t, m, out2, NULL), ok);
        assert_memory_equal(out, out2, n * sizeof out[0]);
    }
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(matches_scalar_and_reference),
        cmocka_unit_test(failed_elements),
        cmocka_unit_test(null_arrays_and_zero_count),
        cmocka_unit_test(bit_identical_to_scalar),
    };
    return cmocka_run_group_tests_name("batch_ideal", tests, NULL, NULL);
}
