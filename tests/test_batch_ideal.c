/* test_batch_ideal.c - gk_ideal_density_batch(). */
#include "gk_test.h"
#include <string.h>

static const gk_molar_mass air = { (gk_real)28.9644e-3 }; /* ISO 2533:1975 molar mass of air */

/* Same bits as the scalar call (the batch calls it per element). */
static void assert_same(gk_real a, gk_real b) { assert_memory_equal(&a, &b, sizeof a); }

static void matches_scalar_and_reference(void **state) {
    (void)state;
    /* an invented calibration-bench sweep: barometric to 10 bar, -40 degC to 150 degC */
    const gk_real p[6] = { 101325, 95000, 250000, 500000, 1000000, 101325 };
    const gk_real t[6] = { (gk_real)288.15, (gk_real)233.15, (gk_real)293.15, (gk_real)323.15,
                           (gk_real)423.15, (gk_real)273.15 };
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
    const gk_status expect[8] = { GK_OK, GK_ERR_DOMAIN, GK_ERR_DOMAIN, GK_ERR_DOMAIN,
                                  GK_ERR_DOMAIN, GK_ERR_RANGE, GK_ERR_DOMAIN, GK_OK };
    gk_real out[8];
    gk_status st[8];
    assert_int_equal(gk_ideal_density_batch(8, p, t, air, out, st), 2);
    for (int i = 0; i < 8; ++i) {
        assert_status(st[i], expect[i]);
        if (expect[i] == GK_OK) assert_true(isfinite(out[i]) && out[i] > 0);
        else assert_true(isnan(out[i]));
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
    for (int i = 0; i < 3; ++i) { assert_status(st[i], GK_ERR_ARGUMENT); assert_true(isnan(out[i])); }
    out[0] = out[1] = out[2] = GK_SENTINEL;
    assert_int_equal(gk_ideal_density_batch(3, p, NULL, air, out, NULL), 0);
    for (int i = 0; i < 3; ++i) assert_true(isnan(out[i]));
    /* NULL output array: every element fails, statuses still reported */
    st[0] = st[1] = st[2] = GK_OK;
    assert_int_equal(gk_ideal_density_batch(3, p, t, air, NULL, st), 0);
    for (int i = 0; i < 3; ++i) assert_status(st[i], GK_ERR_ARGUMENT);
    assert_int_equal(gk_ideal_density_batch(3, NULL, NULL, air, NULL, NULL), 0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(matches_scalar_and_reference),
        cmocka_unit_test(failed_elements),
        cmocka_unit_test(null_arrays_and_zero_count),
    };
    return cmocka_run_group_tests_name("batch_ideal", tests, NULL, NULL);
}
