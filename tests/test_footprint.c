/* test_footprint.c - the paths rewritten for the firmware size and stack budget
 * (docs/embedding.md): gas names and aliases looked up in place, unit symbols and alias texts
 * held in the tables, the two-pass composition parser, the mixing rule without per-component
 * arrays, and the wet mixture written entry by entry.
 *
 * Outside references: molar masses from the IUPAC/CIAAW standard atomic weights 2021 (as in
 * lib/gases.c: N2 2 x 14.007 g/mol, O2 2 x 15.999 g/mol, Ar 39.95 g/mol). The mixing-rule
 * checks compare the library's two code paths of the van der Waals one-fluid rule (without k_ij:
 * one row sum S = sum_j x_j s_j shared by every row; with k_ij: each row recomputed), which give
 * the same sum when every k_ij is 0 (common practice: sum_i sum_j x_i x_j s_i s_j (1 - k_ij)).
 * Float tolerances: a few roundings of 6e-8 each, so 1e-6; for Z, 1e-13 in double and 1e-5 in
 * float, room for a few roundings amplified by the cubic's conditioning. */
#include "gk_test.h"
#include <string.h>

static const gk_gas *gas(const char *key) {
    const gk_gas *g = NULL;
    assert_status(gk_gas_find(key, &g), GK_OK);
    return g;
}

/* ---------------------------------------------------------------- gas names */

static void aliases_each_one_found(void **state) {
    (void)state;
    /* every name of a row with several aliases, in any ASCII case */
    assert_string_equal(gas("2-methylpropane")->formula, "i-C4H10");
    assert_string_equal(gas("I-Butane")->formula, "i-C4H10");
    assert_string_equal(gas("water vapour")->formula, "H2O");
    assert_string_equal(gas("Water Vapor")->formula, "H2O");
    assert_string_equal(gas("r-134a")->formula, "CH2FCF3");
    assert_string_equal(gas("R134A")->formula, "CH2FCF3");
    assert_string_equal(gas("hfc-134a")->formula, "CH2FCF3");
    assert_string_equal(gas("dry air")->formula, "air");
    /* IUPAC/CIAAW 2021: M(N2) = 2 x 14.007 g/mol */
    assert_rel(gas("nitrogen")->molar_mass.kg_per_mol, 28.014e-3, GK_TOL(1e-15, 1e-7));
}

static void names_match_whole(void **state) {
    const gk_gas *g = gas("N2");
    (void)state;
    /* a prefix or an extension of a name, formula or alias names nothing */
    assert_status(gk_gas_find("r-134", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("r134ab", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("hfc-134a ", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("water vapo", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("N", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("N22", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("", &g), GK_ERR_NOT_FOUND);
    assert_string_equal(g->formula, "N2"); /* untouched */
    /* formulas are exact, names are not: "co" is no formula but neither is it a name */
    assert_status(gk_gas_find("co", &g), GK_ERR_NOT_FOUND);
    assert_string_equal(gas("CO")->name, "carbon monoxide");
}

/* ---------------------------------------------------------------- units */

static void unit_symbols_round_trip(void **state) {
    (void)state;
    for (int i = 0; i < (int)GK_UNIT_COUNT; ++i) {
        gk_unit u = GK_UNIT_COUNT;
        const char *sym = gk_unit_symbol((gk_unit)i);
        assert_true(strlen(sym) >= 1u && strlen(sym) <= 7u);
        assert_status(gk_unit_parse(sym, &u), GK_OK);
        assert_int_equal((int)u, i);
    }
    /* the longest symbols and alias texts, and one character more */
    assert_string_equal(gk_unit_symbol(GK_UNIT_CM3_PER_MOL), "cm3/mol");
    assert_string_equal(gk_unit_symbol(GK_UNIT_FT3_PER_MIN), "ft3/min");
    {
        gk_unit u = GK_UNIT_PA;
        assert_status(gk_unit_parse("cm^3/mol", &u), GK_OK);
        assert_int_equal(u, GK_UNIT_CM3_PER_MOL);
        assert_status(gk_unit_parse("ft^3/min", &u), GK_OK);
        assert_int_equal(u, GK_UNIT_FT3_PER_MIN);
        assert_status(gk_unit_parse("ft^3/mins", &u), GK_ERR_NOT_FOUND);
        assert_status(gk_unit_parse("ft3/mins", &u), GK_ERR_NOT_FOUND);
        assert_int_equal(u, GK_UNIT_FT3_PER_MIN); /* untouched */
    }
    assert_string_equal(gk_unit_symbol((gk_unit)GK_UNIT_COUNT), "?");
}

static void temperature_offsets(void **state) {
    gk_real r = GK_SENTINEL;
    (void)state;
    /* SI Brochure: T/K = t/degC + 273.15; SP 811 B.9: T/K = (t/degF + 459.67)/1.8 */
    assert_status(gk_convert(GK_REAL_C(25.0), GK_UNIT_DEGC, GK_UNIT_K, &r), GK_OK);
    assert_rel(r, 298.15, GK_TOL(1e-15, 1e-7));
    assert_status(gk_convert(GK_REAL_C(32.0), GK_UNIT_DEGF, GK_UNIT_DEGC, &r), GK_OK);
    assert_abs(r, 0.0, GK_TOL(1e-12, 1e-4));
    assert_status(gk_convert(GK_REAL_C(491.67), GK_UNIT_DEGR, GK_UNIT_DEGF, &r), GK_OK);
    assert_abs(r, 32.0, GK_TOL(1e-12, 1e-4));
    assert_status(gk_convert(GK_REAL_C(100.0), GK_UNIT_K, GK_UNIT_DEGR, &r), GK_OK);
    assert_rel(r, 180.0, GK_TOL(1e-15, 1e-7));
    /* a gauge pressure is a difference: no offset, and psi keeps its factor 6894.757293168 Pa */
    {
        gk_pressure p = {GK_SENTINEL};
        gk_pressure amb = {GK_REAL_C(101325.0)};
        assert_status(gk_pressure_from_gauge(GK_REAL_C(10.0), GK_UNIT_PSI, amb, &p), GK_OK);
        /* exact: 101325 + 10 x 4.4482216152605 / 6.4516e-4 (exact rational arithmetic, Python fractions) */
        assert_rel(p.pa, 170272.57293168362, GK_TOL(1e-14, 1e-6));
    }
}

/* ---------------------------------------------------------------- composition text */

static void parse_balance_in_the_middle(void **state) {
    gk_mixture m;
    (void)state;
    memset(&m, 0xA5, sizeof m);
    assert_status(gk_mixture_parse("O2=20.95%, N2=balance, Ar=9340ppm, CO2=0.04%", &m), GK_OK);
    assert_int_equal(m.count, 4u);
    assert_ptr_equal(m.gas[0], gas("O2"));
    assert_ptr_equal(m.gas[1], gas("N2"));
    assert_ptr_equal(m.gas[2], gas("Ar"));
    assert_ptr_equal(m.gas[3], gas("CO2"));
    assert_rel(m.mole_fraction[0], 0.2095, GK_TOL(1e-15, 1e-7));
    assert_rel(m.mole_fraction[1], 1.0 - 0.2095 - 0.00934 - 0.0004, GK_TOL(1e-14, 1e-6));
    assert_rel(m.mole_fraction[2], 0.00934, GK_TOL(1e-15, 1e-7));
    assert_rel(m.mole_fraction[3], 0.0004, GK_TOL(1e-15, 1e-7));
    for (size_t i = 4; i < GK_MIXTURE_MAX; ++i) { /* the unused entries are cleared */
        assert_null(m.gas[i]);
        assert_rel(m.mole_fraction[i], 0.0, 0.0);
    }
    {
        /* IUPAC/CIAAW 2021 atomic weights, as in the table: the mean molar mass of the parse */
        gk_molar_mass mm = {GK_SENTINEL};
        double expect = 0.2095 * 31.998e-3 + (1.0 - 0.2095 - 0.00934 - 0.0004) * 28.014e-3 +
                        0.00934 * 39.95e-3 + 0.0004 * 44.009e-3;
        assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
        assert_rel(mm.kg_per_mol, expect, GK_TOL(1e-12, 1e-6));
    }
}

static void parse_sixteen_components(void **state) {
    gk_mixture m;
    const char *text = "N2=0.05, O2=0.05, Ar=0.05, He=0.05, Ne=0.05, Kr=0.05, Xe=0.05, H2=0.05, "
                       "CO2=0.05, CO=0.05, CH4=0.05, C2H6=0.05, C3H8=0.05, NH3=0.05, H2O=0.05, "
                       "SF6=balance";
    (void)state;
    assert_status(gk_mixture_parse(text, &m), GK_OK);
    assert_int_equal(m.count, 16u);
    assert_ptr_equal(m.gas[15], gas("SF6"));
    assert_rel(m.mole_fraction[15], 0.25, GK_TOL(1e-14, 1e-6));
    assert_rel(m.mole_fraction[14], 0.05, GK_TOL(1e-15, 1e-7));
}

/* Errors found in the first pass leave *out untouched, wherever they are in the text. */
static void parse_errors_leave_output(void **state) {
    static const struct { const char *text; gk_status status; } bad[] = {
        {"N2=0.5, nitrogen=0.5", GK_ERR_COMPOSITION},        /* the same gas twice, two names */
        {"N2=0.3, O2=0.2, Ar=0.1, n2=balance", GK_ERR_NOT_FOUND}, /* formulas are exact */
        {"N2=0.3, O2=0.2, Ar=0.1, N2=balance", GK_ERR_COMPOSITION},
        {"N2=balance, O2=0.2, Ar=balance", GK_ERR_PARSE},    /* two balances */
        {"N2=0.5, O2=0.5, Ar=", GK_ERR_PARSE},               /* error in the last component */
        {"N2=0.5, O2=0.5, Ar=0.1", GK_ERR_COMPOSITION},      /* sum 1.1 */
        {"N2=0.9, O2=0.2, Ar=balance", GK_ERR_COMPOSITION},  /* negative balance */
        {"N2=0.5, O2=1e999", GK_ERR_COMPOSITION},            /* overflow */
        {"N2=0.05, O2=0.05, Ar=0.05, He=0.05, Ne=0.05, Kr=0.05, Xe=0.05, H2=0.05, CO2=0.05, "
         "CO=0.05, CH4=0.05, C2H6=0.05, C3H8=0.05, NH3=0.05, H2O=0.05, SF6=0.2, NF3=0.05",
         GK_ERR_COMPOSITION},                                 /* 17 components */
        {"sulphur hexafluoride=0.5, SF6=0.5", GK_ERR_COMPOSITION}, /* alias and formula */
    };
    (void)state;
    for (size_t k = 0; k < sizeof bad / sizeof bad[0]; ++k) {
        gk_mixture m;
        gk_mixture before;
        memset(&m, 0x5A, sizeof m);
        before = m;
        assert_status(gk_mixture_parse(bad[k].text, &m), bad[k].status);
        assert_memory_equal(&m, &before, sizeof m);
    }
}

/* ---------------------------------------------------------------- mixing rule */

static void mixing_rule_forms_agree(void **state) {
    gk_mixture m;
    gk_real kij0[GK_MIXTURE_MAX * GK_MIXTURE_MAX];
    const gk_pressure p = {GK_REAL_C(5.0e6)};
    const gk_temperature t = {GK_REAL_C(300.0)};
    const gk_eos models[] = {GK_EOS_VAN_DER_WAALS, GK_EOS_REDLICH_KWONG, GK_EOS_SOAVE_REDLICH_KWONG,
                             GK_EOS_PENG_ROBINSON};
    (void)state;
    assert_status(gk_mixture_parse("CH4=0.80, C2H6=0.07, C3H8=0.03, N2=0.06, CO2=0.04", &m), GK_OK);
    memset(kij0, 0, sizeof kij0);
    for (size_t e = 0; e < sizeof models / sizeof models[0]; ++e) {
        gk_eos_result with_null, with_zero;
        assert_status(gk_mixture_eos_solve(models[e], &m, NULL, p, t, GK_ROOT_STABLE, &with_null), GK_OK);
        assert_status(gk_mixture_eos_solve(models[e], &m, kij0, p, t, GK_ROOT_STABLE, &with_zero), GK_OK);
        assert_rel(with_zero.z, with_null.z, GK_TOL(1e-13, 1e-5));
        assert_rel(with_zero.fugacity_coefficient, with_null.fugacity_coefficient, GK_TOL(1e-13, 1e-5));
        /* a gas at 5 MPa and 300 K: attraction wins, Z below 1 */
        assert_true(with_null.z > GK_REAL_C(0.5) && with_null.z < GK_REAL_C(1.0));
    }
    {
        /* positive k_ij weaken the cross attraction: a smaller a, so a larger Z */
        gk_real kij[25];
        gk_eos_result r0, r1;
        memset(kij, 0, sizeof kij);
        kij[0 * 5 + 4] = kij[4 * 5 + 0] = GK_REAL_C(0.09); /* CH4-CO2 */
        kij[3 * 5 + 4] = kij[4 * 5 + 3] = GK_REAL_C(-0.02); /* N2-CO2 */
        assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, GK_ROOT_STABLE, &r0), GK_OK);
        assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, kij, p, t, GK_ROOT_STABLE, &r1), GK_OK);
        assert_true(r1.z > r0.z);
    }
}

static void mixing_rule_sixteen_components(void **state) {
    gk_mixture m;
    gk_real kij0[GK_MIXTURE_MAX * GK_MIXTURE_MAX];
    gk_eos_result a, b;
    const gk_pressure p = {GK_REAL_C(1.0e6)};
    const gk_temperature t = {GK_REAL_C(400.0)};
    (void)state;
    assert_status(gk_mixture_parse("N2=0.05, O2=0.05, Ar=0.05, He=0.05, Ne=0.05, Kr=0.05, Xe=0.05, "
                                   "H2=0.05, CO2=0.05, CO=0.05, CH4=0.05, C2H6=0.05, C3H8=0.05, "
                                   "NH3=0.05, H2O=0.05, SF6=balance", &m), GK_OK);
    memset(kij0, 0, sizeof kij0);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, NULL, p, t, GK_ROOT_STABLE, &a), GK_OK);
    assert_status(gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &m, kij0, p, t, GK_ROOT_STABLE, &b), GK_OK);
    assert_rel(b.z, a.z, GK_TOL(1e-13, 1e-5));
}

/* ---------------------------------------------------------------- wet mixture */

static void humid_in_place_keeps_the_rest(void **state) {
    gk_mixture m;
    const gk_pressure p = {GK_REAL_C(101325.0)};
    const gk_temperature t = {GK_REAL_C(293.15)};
    gk_pressure pws;
    (void)state;
    assert_status(gk_mixture_parse("N2=0.79, O2=0.21", &m), GK_OK);
    assert_status(gk_water_vapour_pressure(t, &pws), GK_OK);
    /* wet is the same object as dry: every entry read before it is written */
    assert_status(gk_humid_mixture(&m, p, t, GK_REAL_C(0.5), &m), GK_OK);
    assert_int_equal(m.count, 3u);
    assert_ptr_equal(m.gas[2], gas("H2O"));
    {
        double xw = 0.5 * (double)pws.pa / 101325.0; /* Dalton's law */
        assert_rel(m.mole_fraction[2], xw, GK_TOL(1e-15, 1e-6));
        assert_rel(m.mole_fraction[0], 0.79 * (1.0 - xw), GK_TOL(1e-15, 1e-6));
        assert_rel(m.mole_fraction[1], 0.21 * (1.0 - xw), GK_TOL(1e-15, 1e-6));
    }
    assert_null(m.gas[3]); /* the entries past the count are kept as they were */
    /* water already present: added to its entry */
    assert_status(gk_humid_mixture(&m, p, t, GK_REAL_C(0.5), &m), GK_OK);
    assert_int_equal(m.count, 3u);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(aliases_each_one_found),
        cmocka_unit_test(names_match_whole),
        cmocka_unit_test(unit_symbols_round_trip),
        cmocka_unit_test(temperature_offsets),
        cmocka_unit_test(parse_balance_in_the_middle),
        cmocka_unit_test(parse_sixteen_components),
        cmocka_unit_test(parse_errors_leave_output),
        cmocka_unit_test(mixing_rule_forms_agree),
        cmocka_unit_test(mixing_rule_sixteen_components),
        cmocka_unit_test(humid_in_place_keeps_the_rest),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
