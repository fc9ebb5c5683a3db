/*
 * test_reference.c - named reference conditions and gk_reference_factor().
 *
 * Float tolerances: a preset is one or two roundings of exact decimal figures (1e-7); the
 * factor is three divisions and two products (4e-7).
 */
#include "gk_test.h"

#define PA(x) ((gk_pressure){(gk_real)(x)})
#define KEL(x) ((gk_temperature){(gk_real)(x)})
#define RV(x) ((gk_real)(x))
#define assert_untouched(x) assert_abs((x), GK_SENTINEL, 0.0)

static gk_reference ref_of(gk_reference_id id) {
    gk_reference r = {{GK_SENTINEL}, {GK_SENTINEL}};
    assert_status(gk_reference_get(id, &r), GK_OK);
    return r;
}

/* Published definitions: DIN 1343 (0 degC, 101.325 kPa); IUPAC since 1982 (0 degC, 100 kPa);
   ISO 13443 (15 degC, 101.325 kPa); 20 degC and 25 degC at 101.325 kPa (common practice);
   0 degC = 273.15 K (SI); 1 atm = 101325 Pa (CGPM 1954). */
static void presets_match_published_definitions(void **state) {
    (void)state;
    gk_reference r = ref_of(GK_REF_0C_101325PA);
    assert_rel(r.t.k, 273.15, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 101325.0, GK_TOL(1e-15, 1e-7));
    r = ref_of(GK_REF_0C_100KPA);
    assert_rel(r.t.k, 273.15, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 100000.0, GK_TOL(1e-15, 1e-7));
    r = ref_of(GK_REF_15C_101325PA);
    assert_rel(r.t.k, 288.15, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 101325.0, GK_TOL(1e-15, 1e-7));
    r = ref_of(GK_REF_20C_101325PA);
    assert_rel(r.t.k, 293.15, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 101325.0, GK_TOL(1e-15, 1e-7));
    r = ref_of(GK_REF_25C_101325PA);
    assert_rel(r.t.k, 298.15, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 101325.0, GK_TOL(1e-15, 1e-7));
}

/* 60 degF and 14.696 psia (U.S. gas industry, common practice) with NIST SP 811 (2008)
   Appendix B: T = (60 + 459.67) / 1.8 K = 288.7055... K, psi = 6894.757293168 Pa, so
   p = 101325.353180396928 Pa (exact product, computed with mpmath 1.3.0). */
static void sixty_f_preset_exact_from_sp811(void **state) {
    (void)state;
    const gk_reference r = ref_of(GK_REF_60F_14696PSI);
    assert_rel(r.t.k, 288.70555555555555556, GK_TOL(1e-15, 1e-7));
    assert_rel(r.p.pa, 101325.353180396928, GK_TOL(1e-15, 1e-7));
    /* 60 degF lies 0.5555... K above 15 degC, and 14.696 psi 0.353 Pa above 1 atm */
    assert_abs((double)r.t.k - 288.15, 5.0 / 9.0, GK_TOL(1e-12, 1e-4));
}

/* factor = (p/p_ref)(T_ref/T)(z_ref/z), hand-computed with mpmath 1.3.0 (30 digits). */
static void factor_hand_computed(void **state) {
    (void)state;
    gk_real f = GK_SENTINEL;
    assert_status(gk_reference_factor(PA(200000.0), KEL(303.15), RV(0.998), ref_of(GK_REF_0C_101325PA),
                                      RV(0.9995), &f), GK_OK);
    assert_rel(f, 1.7811859989702457203, GK_TOL(1e-14, 4e-7));
    /* 1 m3 at 15 degC, 1 atm is 1.0019245158... m3 at 60 degF, 14.696 psia (ideal) */
    const gk_reference iso = ref_of(GK_REF_15C_101325PA);
    assert_status(gk_reference_factor(iso.p, iso.t, RV(1.0), ref_of(GK_REF_60F_14696PSI), RV(1.0), &f), GK_OK);
    assert_rel(f, 1.0019245158471139131, GK_TOL(1e-14, 4e-7));
}

/* Ideal-gas molar volumes of CODATA 2018: 22.413 969 54 L/mol at 273.15 K, 101.325 kPa and
   22.710 954 64 L/mol at 273.15 K, 100 kPa (printed truncated: 1e-9). A volume at DIN 1343
   conditions is that ratio larger at the IUPAC condition. */
static void factor_matches_codata_molar_volumes(void **state) {
    (void)state;
    const gk_reference din = ref_of(GK_REF_0C_101325PA);
    gk_real f = GK_SENTINEL;
    assert_status(gk_reference_factor(din.p, din.t, RV(1.0), ref_of(GK_REF_0C_100KPA), RV(1.0), &f), GK_OK);
    assert_rel(f, 22.71095464 / 22.41396954, GK_TOL(1e-9, 4e-7));
}

/* The factor back is the inverse of the factor there; and a unit factor at the reference. */
static void factor_round_trip(void **state) {
    (void)state;
    const gk_reference ref = ref_of(GK_REF_20C_101325PA);
    const gk_reference line = {PA(6.5e5), KEL(281.4)};
    gk_real there = GK_SENTINEL, back = GK_SENTINEL, unit = GK_SENTINEL;
    assert_status(gk_reference_factor(line.p, line.t, RV(0.9871), ref, RV(0.9996), &there), GK_OK);
    assert_status(gk_reference_factor(ref.p, ref.t, RV(0.9996), line, RV(0.9871), &back), GK_OK);
    assert_rel((double)there * (double)back, 1.0, GK_TOL(1e-15, 1e-6));
    assert_status(gk_reference_factor(ref.p, ref.t, RV(0.9996), ref, RV(0.9996), &unit), GK_OK);
    assert_rel(unit, 1.0, GK_TOL(1e-15, 1e-7));
}

static void error_contract(void **state) {
    (void)state;
    const gk_real nan_v = (gk_real)NAN, inf_v = (gk_real)INFINITY;
    gk_reference r = {{GK_SENTINEL}, {GK_SENTINEL}};
    assert_status(gk_reference_get(GK_REF_0C_101325PA, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_reference_get((gk_reference_id)99, &r), GK_ERR_ARGUMENT);
    assert_status(gk_reference_get((gk_reference_id)-1, &r), GK_ERR_ARGUMENT);
    assert_untouched(r.p.pa);
    assert_untouched(r.t.k);

    const gk_reference ok = ref_of(GK_REF_0C_101325PA);
    const gk_pressure p = PA(2e5);
    const gk_temperature t = KEL(300.0);
    gk_real f = GK_SENTINEL;
    assert_status(gk_reference_factor(p, t, RV(1.0), ok, RV(1.0), NULL), GK_ERR_ARGUMENT);
    const gk_real bad[] = {nan_v, inf_v, -inf_v, RV(0.0), RV(-1.0)};
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; ++i) {
        const gk_real b = bad[i];
        assert_status(gk_reference_factor(PA(b), t, RV(1.0), ok, RV(1.0), &f), GK_ERR_DOMAIN);
        assert_status(gk_reference_factor(p, KEL(b), RV(1.0), ok, RV(1.0), &f), GK_ERR_DOMAIN);
        assert_status(gk_reference_factor(p, t, b, ok, RV(1.0), &f), GK_ERR_DOMAIN);
        assert_status(gk_reference_factor(p, t, RV(1.0), (gk_reference){PA(b), ok.t}, RV(1.0), &f), GK_ERR_DOMAIN);
        assert_status(gk_reference_factor(p, t, RV(1.0), (gk_reference){ok.p, KEL(b)}, RV(1.0), &f), GK_ERR_DOMAIN);
        assert_status(gk_reference_factor(p, t, RV(1.0), ok, b, &f), GK_ERR_DOMAIN);
    }
    /* overflow of the pressure ratio */
    const gk_real huge = RV(GK_REAL_IS_FLOAT ? 1e38 : 1e308);
    assert_status(gk_reference_factor(PA(huge), t, RV(1.0), (gk_reference){PA(1e-3), ok.t}, RV(1.0), &f),
                  GK_ERR_RANGE);
    assert_untouched(f);
    /* a factor below the smallest normal number has lost digits: underflow, f untouched */
    const gk_real tiny = RV(GK_REAL_IS_FLOAT ? 1e-30 : 1e-300);
    assert_status(gk_reference_factor(PA(tiny), t, RV(1.0), (gk_reference){PA(1e10), ok.t}, RV(1.0), &f),
                  GK_ERR_RANGE);
    assert_untouched(f);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(presets_match_published_definitions),
        cmocka_unit_test(sixty_f_preset_exact_from_sp811),
        cmocka_unit_test(factor_hand_computed),
        cmocka_unit_test(factor_matches_codata_molar_volumes),
        cmocka_unit_test(factor_round_trip),
        cmocka_unit_test(error_contract),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
