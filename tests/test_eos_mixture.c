/*
 * test_eos_mixture.c - gk_mixture_eos_solve: van der Waals one-fluid mixing rules
 * a = sum_i sum_j x_i x_j sqrt(a_i a_j)(1 - k_ij), b = sum_i x_i b_i (common practice; e.g.
 * Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids, 5th ed., ch. 5), checked
 * against the same rules evaluated independently here in long double, and the error contract.
 *
 * Test gases (critical constants and acentric factors from memory, as published in Poling et al.
 * 5th ed. Appendix A): methane 190.56 K, 4.599 MPa, 0.011;
 * ethane 305.32 K, 4.872 MPa, 0.099; carbon dioxide 304.13 K, 7.377 MPa, 0.224;
 * nitrogen 126.2 K, 3.398 MPa, 0.037.
 */
#include "gk_test.h"
#include <string.h>

static const gk_gas CH4 = {"methane", "CH4", {(gk_real)0.016043}, {(gk_real)190.56}, {(gk_real)4.599e6},
                           (gk_real)0.011, 0, 0, 0, 0};
static const gk_gas C2H6 = {"ethane", "C2H6", {(gk_real)0.030069}, {(gk_real)305.32}, {(gk_real)4.872e6},
                            (gk_real)0.099, 0, 0, 0, 0};
static const gk_gas CO2 = {"carbon dioxide", "CO2", {(gk_real)0.044009}, {(gk_real)304.13},
                           {(gk_real)7.377e6}, (gk_real)0.224, 0, 0, 0, 0};
static const gk_gas N2 = {"nitrogen", "N2", {(gk_real)0.028013}, {(gk_real)126.2}, {(gk_real)3.398e6},
                          (gk_real)0.037, 0, 0, 0, 0};

/* CODATA 2018 printed value of R (10 digits; N_A k is 8.31446261815324, exact since SI 2019). */
#define R_CODATA 8.314462618L

/* Peng-Robinson a(T), b of a pure gas in SI, long double (constants: Peng and Robinson,
   Ind. Eng. Chem. Fundam. 15 (1976) 59, from memory). */
static void pr_ab(const gk_gas *g, long double t, long double *a, long double *b) {
    long double tc = (long double)g->critical_temperature.k, pc = (long double)g->critical_pressure.pa;
    long double w = (long double)g->acentric_factor;
    long double k = 0.37464L + 1.54226L * w - 0.26992L * w * w;
    long double s = 1.0L + k * (1.0L - sqrtl(t / tc));
    *a = 0.45724L * R_CODATA * R_CODATA * tc * tc / pc * s * s;
    *b = 0.07780L * R_CODATA * tc / pc;
}

/* Pressure of a Peng-Robinson mixture at Vm, T from the mixing rules, long double. */
static long double pr_mix_pressure(const gk_mixture *m, const double *kij, long double t, long double vm) {
    long double a = 0, b = 0, ai[GK_MIXTURE_MAX], bi[GK_MIXTURE_MAX];
    size_t n = m->count;
    for (size_t i = 0; i < n; ++i) pr_ab(m->gas[i], t, &ai[i], &bi[i]);
    for (size_t i = 0; i < n; ++i) {
        b += (long double)m->mole_fraction[i] * bi[i];
        for (size_t j = 0; j < n; ++j)
            a += (long double)m->mole_fraction[i] * (long double)m->mole_fraction[j] * sqrtl(ai[i] * ai[j]) *
                 (1.0L - (kij ? (long double)kij[i * n + j] : 0.0L));
    }
    return R_CODATA * t / (vm - b) - a / (vm * vm + 2.0L * b * vm - b * b);
}

static gk_mixture natural_gas(void) {
    gk_mixture m;
    memset(&m, 0, sizeof m);
    m.count = 4;
    m.gas[0] = &CH4;  m.mole_fraction[0] = (gk_real)0.90;
    m.gas[1] = &C2H6; m.mole_fraction[1] = (gk_real)0.05;
    m.gas[2] = &CO2;  m.mole_fraction[2] = (gk_real)0.02;
    m.gas[3] = &N2;   m.mole_fraction[3] = (gk_real)0.03;
    return m;
}

/* A one-component mixture, and a gas split into two identical components, equal the pure gas. */
static void pure_limits(void **state) {
    (void)state;
    gk_pressure p = {(gk_real)6e6};
    gk_temperature t = {(gk_real)280.0};
    for (int e = GK_EOS_IDEAL; e <= GK_EOS_PENG_ROBINSON; ++e) {
        gk_eos_result pure, one, split;
        gk_mixture m1 = {1, {&CO2}, {1}};
        gk_mixture m2 = {2, {&CO2, &CO2}, {(gk_real)0.25, (gk_real)0.75}};
        assert_status(gk_eos_solve((gk_eos)e, &CO2, p, t, GK_ROOT_STABLE, &pure), GK_OK);
        assert_status(gk_mixture_eos_solve((gk_eos)e, &m1, NULL, p, t, GK_ROOT_STABLE, &one), GK_OK);
        assert_status(gk_mixture_eos_solve((gk_eos)e, &m2, NULL, p, t, GK_ROOT_STABLE, &split), GK_OK);
        assert_rel(one.z, pure.z, GK_TOL(1e-15, 1e-6));
        assert_rel(split.z, pure.z, GK_TOL(1e-14, 1e-5));
        assert_rel(split.fugacity_coefficient, pure.fugacity_coefficient, GK_TOL(1e-13, 1e-5));
        assert_int_equal(split.root_count, pure.root_count);
    }
}

/* A natural-gas-like mixture (invented composition): the returned volume satisfies the mixture's
   Peng-Robinson equation evaluated independently in long double (gas root: backward error ~ u). */
static void mixing_rules_independent_check(void **state) {
    (void)state;
    gk_mixture m = natural_gas();
    const double kij[16] = {
        0.000, 0.000, 0.100, 0.030, /* typical fitted magnitudes for CO2 and N2 pairs (invented) */
        0.000, 0.000, 0.130, 0.040,
        0.100, 0.130, 0.000, -0.020,
        0.030, 0.040, -0.020, 0.000,
    };
    gk_real kr[16];
    for (int i = 0; i < 16; ++i) kr[i] = (gk_real)kij[i];
    static const double P[] = {1e5, 2e6, 7e6, 20e6};
    static const double T[] = {250.0, 288.15, 320.0};
    for (size_t ip = 0; ip < 4; ++ip) {
        for (size_t it = 0; it < 3; ++it) {
            gk_pressure p = {(gk_real)P[ip]};
            gk_temperature t = {(gk_real)T[it]};
            gk_eos_result r0, rk;
            assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, GK_ROOT_STABLE, &r0), GK_OK);
            assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, kr, p, t, GK_ROOT_STABLE, &rk), GK_OK);
            long double p0 = pr_mix_pressure(&m, NULL, (long double)T[it], (long double)r0.molar_volume.m3_per_mol);
            long double pk = pr_mix_pressure(&m, kij, (long double)T[it], (long double)rk.molar_volume.m3_per_mol);
            assert_rel((double)p0, P[ip], GK_TOL(1e-12, 2e-5));
            assert_rel((double)pk, P[ip], GK_TOL(1e-12, 2e-5));
            /* positive k_ij weaken the attraction: Z rises */
            assert_true((double)rk.z > (double)r0.z);
            assert_true(r0.z > 0 && rk.fugacity_coefficient > 0);
        }
    }
    /* an all-zero k_ij matrix is the same as NULL */
    gk_real zero[16] = {0};
    gk_pressure p = {(gk_real)5e6};
    gk_temperature t = {(gk_real)300.0};
    gk_eos_result a, b;
    assert_status(gk_mixture_eos_solve(GK_EOS_SOAVE_REDLICH_KWONG, &m, NULL, p, t, GK_ROOT_GAS, &a), GK_OK);
    assert_status(gk_mixture_eos_solve(GK_EOS_SOAVE_REDLICH_KWONG, &m, zero, p, t, GK_ROOT_GAS, &b), GK_OK);
    assert_rel(a.z, b.z, 0.0);
}

static void error_contract(void **state) {
    (void)state;
    gk_mixture m = natural_gas();
    gk_pressure p = {(gk_real)1e6}, pbad = {0};
    gk_temperature t = {(gk_real)300.0}, tbad = {(gk_real)NAN};
    gk_eos_result r, keep;
    memset(&r, 0, sizeof r);
    r.z = GK_SENTINEL;
    r.molar_volume.m3_per_mol = GK_SENTINEL;
    r.fugacity_coefficient = GK_SENTINEL;
    keep = r;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, NULL, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_ARGUMENT);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, GK_ROOT_STABLE, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_mixture_eos_solve((gk_eos)17, &m, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_ARGUMENT);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, (gk_root)5, &r), GK_ERR_ARGUMENT);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, pbad, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, tbad, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    /* compositions */
    gk_mixture bad = m;
    bad.count = 0;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_COMPOSITION);
    bad.count = GK_MIXTURE_MAX + 1;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_COMPOSITION);
    bad = m;
    bad.mole_fraction[0] = (gk_real)0.80; /* sums to 0.9 */
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_COMPOSITION);
    bad = m;
    bad.mole_fraction[1] = (gk_real)-0.05;
    bad.mole_fraction[0] = (gk_real)1.00;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_COMPOSITION);
    bad = m;
    bad.mole_fraction[2] = (gk_real)NAN;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_COMPOSITION);
    bad = m;
    bad.gas[3] = NULL;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_ARGUMENT);
    /* a component with non-physical data */
    gk_gas broken = N2;
    broken.critical_pressure.pa = -1;
    bad = m;
    bad.gas[3] = &broken;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &bad, NULL, p, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    /* k_ij: not symmetric, not finite, non-zero diagonal, beyond [-1, 1] */
    gk_real k[16] = {0};
    k[1] = (gk_real)0.1; /* k_01 without k_10 */
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, k, p, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    k[1] = 0;
    k[6] = (gk_real)INFINITY;
    k[9] = (gk_real)INFINITY;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, k, p, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    k[6] = 0;
    k[9] = 0;
    k[5] = (gk_real)0.01;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, k, p, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    k[5] = 0;
    k[2] = (gk_real)1.5;
    k[8] = (gk_real)1.5;
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, k, p, t, GK_ROOT_STABLE, &r), GK_ERR_DOMAIN);
    assert_memory_equal(&r, &keep, sizeof r);
}

/* Order of the statuses (mixture.h): the mixture is checked before the state, so an input with
   a fault in each reports the mixture's; one fault reports its own. */
static void fluid_checked_before_state(void **state) {
    (void)state;
    gk_mixture m = natural_gas();
    gk_eos_result r;
    const double bad_kij[16] = {0, 2, 0, 0, 2, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0}; /* |k| > 1 */
    gk_real kij[16];
    gk_pressure p = {(gk_real)5e6}, p_bad = {(gk_real)-1.0};
    gk_temperature t = {(gk_real)300.0};
    for (int i = 0; i < 16; ++i) kij[i] = (gk_real)bad_kij[i];
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, kij, p, t, GK_ROOT_STABLE, &r),
                  GK_ERR_DOMAIN);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, kij, p, t, (gk_root)7, &r),
                  GK_ERR_DOMAIN);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, (gk_root)7, &r),
                  GK_ERR_ARGUMENT);
    m.mole_fraction[0] = (gk_real)0.5; /* sum 0.6 */
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p_bad, t, (gk_root)7, &r),
                  GK_ERR_COMPOSITION);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(pure_limits),
        cmocka_unit_test(mixing_rules_independent_check),
        cmocka_unit_test(error_contract),
        cmocka_unit_test(fluid_checked_before_state),
    };
    return cmocka_run_group_tests_name("eos_mixture", tests, NULL, NULL);
}
