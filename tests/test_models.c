/*
 * test_models.c - the reference-grade models through the public API: GK_EOS_SPAN_WAGNER,
 * GK_EOS_HYDROGEN and GK_EOS_BEST in gk_eos_solve, gk_eos_density, gk_eos_pressure,
 * gk_mixture_eos_solve, gk_eos_density_batch and an instrument function; the model that served
 * (gk_eos_result.model); the error contract of the new values.
 *
 * Published values (each with its source beside it) are compared within their own rounding plus
 * the stated uncertainty of the equation; the module's own checks are in test_helmholtz.c.
 */
#include "gk_test.h"

#define PA(x) ((gk_pressure){ (gk_real)(x) })
#define KEL(x) ((gk_temperature){ (gk_real)(x) })
#define RV(x) ((gk_real)(x))

#if GK_REFERENCE_MODELS

static const gk_gas *gas(const char *key) {
    const gk_gas *g = NULL;
    assert_status(gk_gas_find(key, &g), GK_OK);
    assert_non_null(g);
    return g;
}

/* N2 at 200 bar, 20 degC: Z about 1.051 (reference equation of Span et al., J. Phys. Chem. Ref.
   Data 29 (2000) 1361, from memory); tolerance 0.2 %. GK_EOS_BEST picks Span-Wagner for it, the
   hydrogen equation for hydrogen, Peng-Robinson for helium; every path reports its model. */
static void best_picks_and_reports(void **state) {
    (void)state;
    gk_eos_result r, s;
    assert_status(
        gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("N2"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &r),
        GK_OK);
    assert_rel(r.z, 1.051, 2e-3);
    assert_int_equal(r.model, GK_EOS_SPAN_WAGNER);
    assert_int_equal(r.branch, GK_ROOT_SUPERCRITICAL);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("N2"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &s),
                  GK_OK);
    assert_int_equal(s.model, GK_EOS_SPAN_WAGNER);
    assert_rel(s.z, r.z, 0.0);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("He"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &s),
                  GK_OK);
    assert_int_equal(s.model, GK_EOS_PENG_ROBINSON);
    assert_status(
        gk_eos_solve(GK_EOS_PENG_ROBINSON, gas("He"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &r),
        GK_OK);
    assert_rel(s.z, r.z, 0.0);
    assert_int_equal(r.model, GK_EOS_PENG_ROBINSON);
    assert_status(gk_eos_solve(GK_EOS_IDEAL, gas("He"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &r),
                  GK_OK);
    assert_int_equal(r.model, GK_EOS_IDEAL);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("H2"), PA(7e7), KEL(288.15), GK_ROOT_STABLE, &s),
                  GK_OK);
    assert_int_equal(s.model, GK_EOS_HYDROGEN);
    assert_int_equal(s.branch, GK_ROOT_SUPERCRITICAL);
}

/* Hydrogen at 70 MPa, 15 degC: 40.2 kg/m^3; at 35 MPa: 24.0 kg/m^3 (hydrogen fuelling, common
   practice), with the table's molar mass 2.016 g/mol. Tolerance 0.15 %. */
static void hydrogen_density(void **state) {
    (void)state;
    gk_density d = { GK_SENTINEL };
    assert_status(gk_eos_density(GK_EOS_HYDROGEN, gas("H2"), PA(7e7), KEL(288.15), &d), GK_OK);
    assert_rel(d.kg_per_m3, 40.2, 1.5e-3);
    assert_status(gk_eos_density(GK_EOS_BEST, gas("hydrogen"), PA(3.5e7), KEL(288.15), &d), GK_OK);
    assert_rel(d.kg_per_m3, 24.0, 1.5e-3);
    /* the pressure at that density gives the pressure back */
    gk_pressure p = { GK_SENTINEL };
    gk_molar_volume vm = { RV(2.016e-3) / d.kg_per_m3 };
    assert_status(gk_eos_pressure(GK_EOS_BEST, gas("H2"), vm, KEL(288.15), &p), GK_OK);
    assert_rel(p.pa, 3.5e7, GK_TOL(1e-12, 2e-6));
}

/* Air under GK_EOS_BEST is the ISO 2533:1975 dry-air mixture of N2, O2 and Ar under Span-Wagner:
   1.2929 kg/m^3 at 0 degC, 101.325 kPa (normal density of dry air, common practice), with the
   table's 28.9644 g/mol; tolerance 3e-4. The same Z as the mixture given explicitly. */
static void air_is_the_mixture(void **state) {
    (void)state;
    gk_density d;
    gk_eos_result a, m;
    gk_mixture mix;
    assert_status(gk_eos_density(GK_EOS_BEST, gas("air"), PA(101325.0), KEL(273.15), &d), GK_OK);
    assert_rel(d.kg_per_m3, 1.2929, 3e-4);
    mix.count = 3;
    mix.gas[0] = gas("N2");
    mix.gas[1] = gas("O2");
    mix.gas[2] = gas("Ar");
    mix.mole_fraction[0] = RV(0.78084);
    mix.mole_fraction[1] = RV(0.209476);
    mix.mole_fraction[2] = RV(0.00934);
    assert_status(gk_mixture_normalize(&mix), GK_OK);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("air"), PA(2e7), KEL(293.15), GK_ROOT_STABLE, &a),
                  GK_OK);
    assert_status(gk_mixture_eos_solve(GK_EOS_SPAN_WAGNER, &mix, NULL, PA(2e7), KEL(293.15),
                                       GK_ROOT_STABLE, &m),
                  GK_OK);
    assert_rel(a.z, m.z, GK_TOL(1e-12, 1e-6));
    assert_int_equal(a.model, GK_EOS_SPAN_WAGNER);
    /* a mixture with an uncovered component falls back to Peng-Robinson under GK_EOS_BEST */
    assert_status(gk_mixture_parse("N2=0.9, He=0.1", &mix), GK_OK);
    assert_status(
        gk_mixture_eos_solve(GK_EOS_BEST, &mix, NULL, PA(1e6), KEL(293.15), GK_ROOT_STABLE, &m),
        GK_OK);
    assert_int_equal(m.model, GK_EOS_PENG_ROBINSON);
    assert_status(gk_mixture_eos_solve(GK_EOS_SPAN_WAGNER, &mix, NULL, PA(1e6), KEL(293.15),
                                       GK_ROOT_STABLE, &m),
                  GK_ERR_NOT_FOUND);
}

/* CO2 at 20 degC: 2.0 MPa is vapour (Z = 0.8857, printed CO2 tables from the equation of Span
   and Wagner 1996, from memory; 0.1 %), 6 MPa is above the vapour pressure (5.73 MPa, common
   practice): the stable root is the liquid, and an instrument refuses it. */
static void carbon_dioxide_and_instruments(void **state) {
    (void)state;
    gk_eos_result r;
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("CO2"), PA(2e6), KEL(293.15), GK_ROOT_STABLE, &r),
                  GK_OK);
    assert_rel(r.z, 0.8857, 1e-3);
    assert_int_equal(r.branch, GK_ROOT_GAS);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("CO2"), PA(6e6), KEL(293.15), GK_ROOT_STABLE, &r),
                  GK_OK);
    assert_int_equal(r.branch, GK_ROOT_LIQUID);
    assert_int_equal(r.root_count, 2);
    gk_reference din;
    assert_status(gk_reference_get(GK_REF_0C_101325PA, &din), GK_OK);
    gk_fluid co2 = { gas("CO2"), NULL, NULL };
    gk_contents c = { { GK_SENTINEL }, { GK_SENTINEL }, { GK_SENTINEL }, GK_SENTINEL };
    assert_status(gk_vessel_contents(GK_EOS_BEST, co2, (gk_volume){ RV(0.05) }, PA(6e6),
                                     KEL(293.15), din, &c),
                  GK_ERR_RANGE);
    assert_rel(c.z, GK_SENTINEL, 0.0);
    /* a 50 L nitrogen cylinder at 200 bar, 20 degC: n = p V / (Z R T) with Z = 1.051 (Span et
       al. 2000, from memory): 390.4 mol; tolerance 0.2 % */
    gk_fluid n2 = { gas("N2"), NULL, NULL };
    assert_status(
        gk_vessel_contents(GK_EOS_BEST, n2, (gk_volume){ RV(0.05) }, PA(2e7), KEL(293.15), din, &c),
        GK_OK);
    assert_rel(c.amount.mol, 2e7 * 0.05 / (1.051 * 8.314462618 * 293.15), 2e-3);
    assert_rel(c.z, 1.051, 2e-3);
}

/* Batch and scalar agree; the pressure of a solved state gives the pressure back. */
static void batch_and_pressure(void **state) {
    (void)state;
    const gk_real p[3] = { RV(1e5), RV(5e6), RV(3e7) }, t[3] = { RV(250.0), RV(300.0), RV(400.0) };
    gk_real out[3];
    gk_status st[3];
    assert_int_equal(gk_eos_density_batch(GK_EOS_BEST, gas("CH4"), 3, p, t, out, st), 3);
    for (int i = 0; i < 3; ++i) {
        gk_density d;
        assert_status(gk_eos_density(GK_EOS_SPAN_WAGNER, gas("CH4"), PA(p[i]), KEL(t[i]), &d),
                      GK_OK);
        assert_rel(out[i], d.kg_per_m3, 0.0);
        gk_eos_result r;
        gk_pressure back;
        assert_status(
            gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("CH4"), PA(p[i]), KEL(t[i]), GK_ROOT_STABLE, &r),
            GK_OK);
        assert_status(
            gk_eos_pressure(GK_EOS_SPAN_WAGNER, gas("CH4"), r.molar_volume, KEL(t[i]), &back),
            GK_OK);
        assert_rel(back.pa, p[i], GK_TOL(1e-11, 2e-5));
    }
}

/* Statuses: uncovered gases, the ranges, and values outside the enum. */
static void contract(void **state) {
    (void)state;
    gk_eos_result r;
    r.z = GK_SENTINEL;
    gk_pressure p = { GK_SENTINEL };
    const gk_molar_volume vm = { RV(0.02) };
    assert_status(
        gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("He"), PA(1e5), KEL(300.0), GK_ROOT_STABLE, &r),
        GK_ERR_NOT_FOUND);
    assert_status(
        gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("H2"), PA(1e5), KEL(300.0), GK_ROOT_STABLE, &r),
        GK_ERR_NOT_FOUND);
    assert_status(gk_eos_solve(GK_EOS_HYDROGEN, gas("N2"), PA(1e5), KEL(300.0), GK_ROOT_STABLE, &r),
                  GK_ERR_NOT_FOUND);
    assert_status(gk_eos_pressure(GK_EOS_SPAN_WAGNER, gas("He"), vm, KEL(300.0), &p),
                  GK_ERR_NOT_FOUND);
    /* ranges: N2 600 K and 100 MPa, hydrogen 200 K and 200 MPa; GK_EOS_BEST keeps the model it
       picked (no silent change of model with the state) */
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("N2"), PA(1e5), KEL(700.0), GK_ROOT_STABLE, &r),
                  GK_ERR_RANGE);
    assert_status(
        gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("N2"), PA(1.5e8), KEL(300.0), GK_ROOT_STABLE, &r),
        GK_ERR_RANGE);
    assert_status(gk_eos_solve(GK_EOS_BEST, gas("H2"), PA(1e5), KEL(150.0), GK_ROOT_STABLE, &r),
                  GK_ERR_RANGE);
    assert_status(gk_eos_pressure(GK_EOS_HYDROGEN, gas("H2"), vm, KEL(100.0), &p), GK_ERR_RANGE);
    /* the state checks come as for every model */
    assert_status(
        gk_eos_solve(GK_EOS_SPAN_WAGNER, gas("N2"), PA(NAN), KEL(300.0), GK_ROOT_STABLE, &r),
        GK_ERR_DOMAIN);
    assert_status(
        gk_eos_solve(GK_EOS_BEST, gas("N2"), PA(1e5), KEL(300.0), GK_ROOT_SUPERCRITICAL, &r),
        GK_ERR_ARGUMENT);
    assert_status(gk_eos_solve((gk_eos)(GK_EOS_HYDROGEN + 1), gas("N2"), PA(1e5), KEL(300.0),
                               GK_ROOT_STABLE, &r),
                  GK_ERR_ARGUMENT);
    assert_status(gk_eos_solve(GK_EOS_BEST, NULL, PA(1e5), KEL(300.0), GK_ROOT_STABLE, &r),
                  GK_ERR_ARGUMENT);
    assert_rel(r.z, GK_SENTINEL, 0.0);
    assert_rel(p.pa, GK_SENTINEL, 0.0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(best_picks_and_reports), cmocka_unit_test(hydrogen_density),
        cmocka_unit_test(air_is_the_mixture),     cmocka_unit_test(carbon_dioxide_and_instruments),
        cmocka_unit_test(batch_and_pressure),     cmocka_unit_test(contract),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
#else
/* Built without the reference-grade models (GASKIT_REFERENCE_MODELS=OFF): nothing to test here
   but that they are refused. */
int main(void) {
    const gk_gas *n2 = NULL;
    gk_eos_result r;
    if (gk_gas_find("N2", &n2) != GK_OK) { return 1; }
    return gk_eos_solve(GK_EOS_SPAN_WAGNER, n2, (gk_pressure){ (gk_real)1e5 },
                        (gk_temperature){ (gk_real)300.0 }, GK_ROOT_STABLE, &r) == GK_ERR_NOT_FOUND
               ? 0
               : 1;
}
#endif
