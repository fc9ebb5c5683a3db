/*
 * test_batch.c - the gas-or-mixture batch calls of batch.h: density, Z, vessel contents,
 * reference-volume flow and mass flow over arrays.
 *
 * Every element must equal the scalar call bit for bit with the same status (NaN where the
 * status is not GK_OK), for gases and mixtures under every model, over invented states with
 * bad elements mixed in. Outside references:
 * - CODATA 2018: molar volume of an ideal gas at 273.15 K and 101.325 kPa, 22.41396954 L/mol.
 * - ISO 2533:1975 standard atmosphere at sea level: air density 1.2250 kg/m3 (288.15 K,
 *   101325 Pa, M = 28.9644 g/mol; the standard's R* = 8.31432 differs from CODATA R by 2e-5
 *   and 1.2250 is rounded: tolerance 1e-4).
 * - Peng and Robinson (1976) equation with the gas-table data of nitrogen (Tc 126.2 K,
 *   Pc 3.398 MPa, omega 0.037, from memory of Poling et al., The Properties of Gases and
 *   Liquids, 5th ed., Appendix A), evaluated independently with mpmath at 30 digits:
 *   Z(200 bar, 293.15 K) = 1.02220192201002.
 * - Span, Lemmon, Jacobsen, Wagner and Yokozeki, J. Phys. Chem. Ref. Data 29 (2000) 1361
 *   (nitrogen reference equation): Z(200 bar, 293.15 K) is about 1.05 (from memory); the
 *   Peng-Robinson value must lie within the 3 % the README states for simple gases.
 *
 * Float tolerances: a Peng-Robinson Z in binary32 is good to a few 1e-6 (2e-5 used); ideal-gas
 * products to 1e-6.
 */
#include "gk_test.h"
#include <string.h>

#define TOL_IDEAL GK_TOL(1e-13, 1e-6)
#define TOL_PR GK_TOL(1e-9, 2e-5)
#define N_STATES 12

static const gk_gas *gas(const char *name) {
    const gk_gas *g = NULL;
    assert_status(gk_gas_find(name, &g), GK_OK);
    return g;
}

static gk_reference ref_of(gk_reference_id id) {
    gk_reference r;
    assert_status(gk_reference_get(id, &r), GK_OK);
    return r;
}

/* Invented readings of a fictional gas-blending skid, with bad elements: NaN, negative, zero
   and infinite inputs, a liquid state of CO2 (60 bar, 280 K, below its critical point) and an
   absurd 1e30 Pa. */
static const double P_PA[N_STATES] = { 101325, 2e7, 5e6,  (double)NAN, -1e5, 101325,
                                       6e6,    3e5, 1e30, 2e5,         8e6,  0 };
static const double T_K[N_STATES] = { 273.15, 293.15, 250, 300, 300, (double)INFINITY,
                                      280,    320,    300, 0,   310, 300 };
static const double X[N_STATES] = { 1e-3, 0.05,  2e-3, 1e-3, 1e-3,        1e-3,
                                    1e-3, -2e-3, 1e-3, 1e-3, (double)NAN, 1e-3 };

static void states(gk_real *p, gk_real *t, gk_real *x) {
    for (int i = 0; i < N_STATES; ++i) {
        p[i] = (gk_real)P_PA[i];
        t[i] = (gk_real)T_K[i];
        x[i] = (gk_real)fabs(X[i]); /* volumes must be > 0; flows keep their sign below */
    }
}

static void assert_same_bits(gk_real a, gk_real b) { assert_memory_equal(&a, &b, sizeof a); }

/* out/status of a batch element against the scalar call's (status s, value v). */
static void assert_element(gk_real out, gk_status st, gk_status s, gk_real v) {
    assert_status(st, s);
    if (s == GK_OK) {
        assert_same_bits(out, v);
    } else {
        assert_true(isnan(out));
    }
}

/* The fluids under test: N2, CO2 and an invented blend as a mixture (with and without k_ij). */
typedef struct fluid_case {
    gk_fluid fluid;
    gk_mixture mix;
} fluid_case;

static const gk_real KIJ[9] = { 0, (gk_real)0.02, (gk_real)-0.01, (gk_real)0.02,
                                0, (gk_real)0.03, (gk_real)-0.01, (gk_real)0.03,
                                0 };

static void make_cases(fluid_case c[4]) {
    memset(c, 0, 4 * sizeof c[0]);
    c[0].fluid.gas = gas("N2");
    c[1].fluid.gas = gas("CO2");
    assert_status(gk_mixture_parse("CH4=0.9, N2=0.06, CO2=balance", &c[2].mix), GK_OK);
    c[3].mix = c[2].mix;
}

static gk_fluid case_fluid(fluid_case *c, int k) {
    gk_fluid f = c[k].fluid;
    if (k >= 2) {
        f.gas = NULL;
        f.mixture = &c[k].mix;
        f.kij = (k == 3) ? KIJ : NULL;
    }
    return f;
}

static const gk_eos MODELS[5] = { GK_EOS_IDEAL, GK_EOS_VAN_DER_WAALS, GK_EOS_REDLICH_KWONG,
                                  GK_EOS_SOAVE_REDLICH_KWONG, GK_EOS_PENG_ROBINSON };

static void z_and_density_match_scalar(void **state) {
    (void)state;
    fluid_case c[4];
    gk_real p[N_STATES], t[N_STATES], x[N_STATES], z[N_STATES], rho[N_STATES];
    gk_status sz[N_STATES], sr[N_STATES];
    make_cases(c);
    states(p, t, x);
    for (int k = 0; k < 4; ++k) {
        const gk_fluid f = case_fluid(c, k);
        for (int e = 0; e < 5; ++e) {
            size_t ok_z = gk_fluid_z_batch(MODELS[e], f, N_STATES, p, t, z, sz);
            size_t ok_r = gk_fluid_density_batch(MODELS[e], f, N_STATES, p, t, rho, sr);
            size_t n_ok_z = 0, n_ok_r = 0;
            for (int i = 0; i < N_STATES; ++i) {
                gk_pressure pi = { p[i] };
                gk_temperature ti = { t[i] };
                gk_real zi = GK_SENTINEL;
                gk_status s = gk_fluid_z(MODELS[e], f, pi, ti, &zi);
                assert_element(z[i], sz[i], s, zi);
                n_ok_z += (s == GK_OK);
                /* density: M / Vm of the stable root */
                gk_real ri = GK_SENTINEL;
                if (f.gas != NULL) {
                    gk_density d;
                    s = gk_eos_density(MODELS[e], f.gas, pi, ti, &d);
                    ri = d.kg_per_m3;
                } else {
                    gk_eos_result r;
                    gk_molar_mass m;
                    assert_status(gk_mixture_molar_mass(f.mixture, &m), GK_OK);
                    s = gk_mixture_eos_solve(MODELS[e], f.mixture, f.kij, pi, ti, GK_ROOT_STABLE,
                                             &r);
                    if (s == GK_OK) { ri = m.kg_per_mol / r.molar_volume.m3_per_mol; }
                }
                assert_element(rho[i], sr[i], s, ri);
                n_ok_r += (s == GK_OK);
            }
            assert_int_equal(ok_z, n_ok_z);
            assert_int_equal(ok_r, n_ok_r);
            assert_true(ok_z >= 6); /* the good rows of P_PA/T_K */
        }
    }
}

static void contents_and_flows_match_scalar(void **state) {
    (void)state;
    fluid_case c[4];
    gk_real p[N_STATES], t[N_STATES], v[N_STATES], q[N_STATES];
    gk_real n[N_STATES], mass[N_STATES], vref[N_STATES], qref[N_STATES], w[N_STATES];
    gk_status sc[N_STATES], sq[N_STATES], sw[N_STATES];
    const gk_reference ref = ref_of(GK_REF_15C_101325PA);
    make_cases(c);
    states(p, t, v);
    for (int i = 0; i < N_STATES; ++i) { q[i] = isnan(X[i]) ? (gk_real)NAN : (gk_real)X[i]; }
    for (int k = 0; k < 4; ++k) {
        const gk_fluid f = case_fluid(c, k);
        for (int e = 0; e < 5; ++e) {
            size_t ok_c =
                gk_vessel_contents_batch(MODELS[e], f, ref, N_STATES, v, p, t, n, mass, vref, sc);
            size_t ok_q =
                gk_flow_to_reference_batch(MODELS[e], f, ref, N_STATES, q, p, t, qref, sq);
            size_t ok_w = gk_flow_to_mass_batch(MODELS[e], f, N_STATES, q, p, t, w, sw);
            size_t n_c = 0, n_q = 0, n_w = 0;
            for (int i = 0; i < N_STATES; ++i) {
                gk_pressure pi = { p[i] };
                gk_temperature ti = { t[i] };
                gk_volume vi = { v[i] };
                gk_volume_flow qi = { q[i] }, qo = { GK_SENTINEL };
                gk_mass_flow wo = { GK_SENTINEL };
                gk_contents co;
                memset(&co, 0, sizeof co);
                gk_status s = gk_vessel_contents(MODELS[e], f, vi, pi, ti, ref, &co);
                assert_element(n[i], sc[i], s, co.amount.mol);
                assert_element(mass[i], sc[i], s, co.mass.kg);
                assert_element(vref[i], sc[i], s, co.reference_volume.m3);
                n_c += (s == GK_OK);
                s = gk_flow_to_reference(MODELS[e], f, qi, pi, ti, ref, &qo);
                assert_element(qref[i], sq[i], s, qo.m3_per_s);
                n_q += (s == GK_OK);
                s = gk_flow_to_mass(MODELS[e], f, qi, pi, ti, &wo);
                assert_element(w[i], sw[i], s, wo.kg_per_s);
                n_w += (s == GK_OK);
            }
            assert_int_equal(ok_c, n_c);
            assert_int_equal(ok_q, n_q);
            assert_int_equal(ok_w, n_w);
        }
    }
    /* the liquid CO2 row (60 bar, 280 K) is GK_ERR_RANGE under Peng-Robinson for contents */
    {
        gk_fluid f = { gas("CO2"), NULL, NULL };
        (void)gk_vessel_contents_batch(GK_EOS_PENG_ROBINSON, f, ref, N_STATES, v, p, t, n, NULL,
                                       NULL, sc);
        assert_status(sc[6], GK_ERR_RANGE);
        assert_true(isnan(n[6]));
    }
}

static void published_values(void **state) {
    (void)state;
    const gk_fluid n2 = { gas("N2"), NULL, NULL };
    const gk_fluid air = { gas("air"), NULL, NULL };
    gk_real p[2] = { 101325, 2e7 }, t[2] = { (gk_real)273.15, (gk_real)293.15 };
    gk_real out[2], z[2], amount[2], mass[2];
    gk_status st[2];
    /* ideal gas at 0 degC, 101.325 kPa: rho = M / Vm, Vm = 22.41396954 L/mol (CODATA 2018) */
    assert_int_equal(gk_fluid_density_batch(GK_EOS_IDEAL, n2, 2, p, t, out, st), 2);
    assert_rel(out[0], 28.014e-3 / 22.41396954e-3, GK_TOL(1e-9, 1e-6));
    /* 1 mol of ideal gas occupies 22.41396954 L there: a vessel of that volume holds 1 mol */
    {
        gk_real v[2] = { (gk_real)22.41396954e-3, (gk_real)22.41396954e-3 };
        assert_int_equal(gk_vessel_contents_batch(GK_EOS_IDEAL, n2, ref_of(GK_REF_0C_101325PA), 2,
                                                  v, p, t, amount, mass, NULL, st),
                         2);
        assert_rel(amount[0], 1.0, GK_TOL(1e-9, 1e-6));
        assert_rel(mass[0], 28.014e-3, GK_TOL(1e-9, 1e-6));
    }
    /* ISO 2533 sea level, ideal air */
    {
        gk_real pa[1] = { 101325 }, ta[1] = { (gk_real)288.15 }, ra[1];
        assert_int_equal(gk_fluid_density_batch(GK_EOS_IDEAL, air, 1, pa, ta, ra, NULL), 1);
        assert_rel(ra[0], 1.2250, 1e-4);
    }
    /* Peng-Robinson N2 at 200 bar, 20 degC (mpmath of the published equation with the
       constants of the header comment, held here so that a change of the gas table does not
       move the check), and the reference equation of Span et al. (2000) within 3 % */
    {
        static const gk_gas n2_pr = { "nitrogen",
                                      "N2",
                                      { (gk_real)28.014e-3 },
                                      { (gk_real)126.2 },
                                      { (gk_real)3.398e6 },
                                      (gk_real)0.037,
                                      0,
                                      0,
                                      0,
                                      0 };
        const gk_fluid f = { &n2_pr, NULL, NULL };
        assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, f, 2, p, t, z, st), 2);
        assert_rel(z[1], 1.0222019220100198, TOL_PR);
        assert_rel(z[1], 1.05, 0.03);
    }
    /* the mass flow of 1 L/s of ideal N2 at 0 degC, 101.325 kPa: M / 22.41396954 L/mol */
    {
        gk_real q[1] = { (gk_real)1e-3 }, w[1];
        assert_int_equal(gk_flow_to_mass_batch(GK_EOS_IDEAL, n2, 1, q, p, t, w, NULL), 1);
        assert_rel(w[0], 1e-3 / 22.41396954e-3 * 28.014e-3, GK_TOL(1e-9, 1e-6));
    }
    /* the flow at 0 degC, 101.325 kPa of 1 m3/s at 2 bar, 0 degC, ideal: 2e5 / 101325 m3/s */
    {
        gk_real q[1] = { 1 }, pq[1] = { 2e5 }, tq[1] = { (gk_real)273.15 }, o[1];
        assert_int_equal(gk_flow_to_reference_batch(GK_EOS_IDEAL, n2, ref_of(GK_REF_0C_101325PA), 1,
                                                    q, pq, tq, o, NULL),
                         1);
        assert_rel(o[0], 2e5 / 101325.0, TOL_IDEAL);
    }
}

static void whole_array_failures(void **state) {
    (void)state;
    gk_real p[3] = { 101325, 2e5, 3e5 }, t[3] = { 300, 300, 300 }, x[3] = { 1, 1, 1 };
    gk_real out[3], out2[3];
    gk_status st[3];
    gk_mixture bad_mix;
    const gk_reference ref = ref_of(GK_REF_0C_101325PA);
    const gk_fluid none = { NULL, NULL, NULL };
    gk_fluid both = { gas("N2"), NULL, NULL };
    gk_fluid n2 = { gas("N2"), NULL, NULL };
    gk_fluid mixf = { NULL, &bad_mix, NULL };
    assert_status(gk_mixture_parse("N2=0.5, O2=0.5", &bad_mix), GK_OK);
    both.mixture = &bad_mix;
    bad_mix.mole_fraction[1] = (gk_real)0.6; /* sum 1.1: not a composition */
    /* not exactly one of gas and mixture, or a model out of range: GK_ERR_ARGUMENT for all */
    const gk_fluid bad_fluids[2] = { none, both };
    for (int k = 0; k < 2; ++k) {
        assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, bad_fluids[k], 3, p, t, out, st),
                         0);
        for (int i = 0; i < 3; ++i) {
            assert_status(st[i], GK_ERR_ARGUMENT);
            assert_true(isnan(out[i]));
        }
    }
    assert_int_equal(gk_flow_to_mass_batch((gk_eos)99, n2, 3, x, p, t, out, st), 0);
    assert_status(st[2], GK_ERR_ARGUMENT);
    assert_int_equal(gk_eos_density_batch(GK_EOS_PENG_ROBINSON, NULL, 3, p, t, out, st), 0);
    assert_status(st[0], GK_ERR_ARGUMENT);
    /* an invalid composition: GK_ERR_COMPOSITION for all, as the scalar calls */
    assert_int_equal(gk_fluid_density_batch(GK_EOS_PENG_ROBINSON, mixf, 3, p, t, out, st), 0);
    for (int i = 0; i < 3; ++i) { assert_status(st[i], GK_ERR_COMPOSITION); }
    assert_int_equal(gk_vessel_contents_batch(GK_EOS_SOAVE_REDLICH_KWONG, mixf, ref, 3, x, p, t,
                                              out, out2, NULL, st),
                     0);
    for (int i = 0; i < 3; ++i) {
        assert_status(st[i], GK_ERR_COMPOSITION);
        assert_true(isnan(out[i]) && isnan(out2[i]));
    }
    /* a reference condition that is not physical: GK_ERR_DOMAIN for all */
    {
        gk_reference bad_ref = ref;
        bad_ref.t.k = -1;
        assert_int_equal(
            gk_flow_to_reference_batch(GK_EOS_PENG_ROBINSON, n2, bad_ref, 3, x, p, t, out, st), 0);
        for (int i = 0; i < 3; ++i) { assert_status(st[i], GK_ERR_DOMAIN); }
    }
}

static void null_arrays_zero_count_in_place(void **state) {
    (void)state;
    const gk_fluid n2 = { gas("N2"), NULL, NULL };
    const gk_reference ref = ref_of(GK_REF_0C_101325PA);
    gk_real p[3] = { 101325, 2e5, 3e5 }, t[3] = { 300, 300, 300 }, x[3] = { 1, 1, 1 };
    gk_real out[3] = { GK_SENTINEL, GK_SENTINEL, GK_SENTINEL };
    gk_status st[3] = { (gk_status)-1, (gk_status)-1, (gk_status)-1 };
    /* count 0: nothing read or written, also through NULL */
    assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, n2, 0, NULL, NULL, NULL, NULL), 0);
    assert_int_equal(gk_flow_to_mass_batch(GK_EOS_PENG_ROBINSON, n2, 0, x, p, t, out, st), 0);
    assert_rel(out[0], GK_SENTINEL, 0.0);
    assert_int_equal((int)st[0], -1);
    /* NULL input or output arrays: every element GK_ERR_ARGUMENT */
    assert_int_equal(gk_fluid_density_batch(GK_EOS_PENG_ROBINSON, n2, 3, NULL, t, out, st), 0);
    for (int i = 0; i < 3; ++i) {
        assert_status(st[i], GK_ERR_ARGUMENT);
        assert_true(isnan(out[i]));
    }
    assert_int_equal(
        gk_flow_to_reference_batch(GK_EOS_PENG_ROBINSON, n2, ref, 3, NULL, p, t, out, st), 0);
    assert_status(st[1], GK_ERR_ARGUMENT);
    assert_int_equal(
        gk_vessel_contents_batch(GK_EOS_PENG_ROBINSON, n2, ref, 3, x, p, t, NULL, out, NULL, st),
        0);
    assert_status(st[2], GK_ERR_ARGUMENT);
    assert_true(isnan(out[2]));
    assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, n2, 3, p, t, NULL, NULL), 0);
    /* in place: the output may be an input array */
    {
        gk_real z[3];
        assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, n2, 3, p, t, z, NULL), 3);
        assert_int_equal(gk_fluid_z_batch(GK_EOS_PENG_ROBINSON, n2, 3, p, t, p, NULL), 3);
        assert_memory_equal(p, z, sizeof z);
    }
}

/* Wet-gas correction: each element as gk_dry_gas_pressure(). Outside reference: the IAPWS-IF97
   saturation pressure of water at 300 K, 0.353658941e-2 MPa (the release's computer-program
   verification value for region 4, from memory): gas saturated at 101.325 kPa and 300 K holds
   101325 - 3536.58941 Pa of dry gas. */
static void dry_gas_pressure_batch(void **state) {
    (void)state;
    gk_real p[5] = { 101325, 101325, 101325, 2000, 101325 };
    gk_real t[5] = { 300, (gk_real)293.15, (gk_real)700, (gk_real)293.15, (gk_real)-1 };
    gk_real rh[5] = { 1, (gk_real)0.5, (gk_real)0.5, 1, (gk_real)0.5 };
    gk_real out[5];
    gk_status st[5];
    assert_int_equal(gk_dry_gas_pressure_batch(5, p, t, rh, out, st), 2);
    assert_rel(out[0], 101325.0 - 3536.58941, GK_TOL(1e-10, 1e-6));
    for (int i = 0; i < 5; ++i) {
        gk_pressure pi = { p[i] }, d = { GK_SENTINEL };
        gk_temperature ti = { t[i] };
        gk_status s = gk_dry_gas_pressure(pi, ti, rh[i], &d);
        assert_element(out[i], st[i], s, d.pa);
    }
    assert_status(st[2], GK_ERR_RANGE);       /* above the critical temperature of water */
    assert_status(st[3], GK_ERR_NO_SOLUTION); /* water partial pressure above p */
    assert_status(st[4], GK_ERR_DOMAIN);
    assert_int_equal(gk_dry_gas_pressure_batch(5, p, t, NULL, out, st), 0);
    assert_status(st[0], GK_ERR_ARGUMENT);
    assert_true(isnan(out[0]));
    assert_int_equal(gk_dry_gas_pressure_batch(0, NULL, NULL, NULL, NULL, NULL), 0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(z_and_density_match_scalar),
        cmocka_unit_test(contents_and_flows_match_scalar),
        cmocka_unit_test(published_values),
        cmocka_unit_test(whole_array_failures),
        cmocka_unit_test(null_arrays_zero_count_in_place),
        cmocka_unit_test(dry_gas_pressure_batch),
    };
    return cmocka_run_group_tests_name("batch", tests, NULL, NULL);
}
