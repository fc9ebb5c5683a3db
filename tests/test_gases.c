/* test_gases.c - the built-in gas table: lookup rules and the data against outside references.
 *
 * Float tolerances: a table value is a decimal literal rounded once to binary32 (relative error
 * <= 6e-8), so 1e-6 is the float figure for "the same number"; the double figure 1e-12 leaves
 * room only for the last-digit rounding of the decimal literal itself. */
#include "gk_test.h"
#include <string.h>

/* IUPAC/CIAAW standard atomic weights 2021, conventional values where IUPAC gives an interval
   (IUPAC abridged table; from memory, the same set as lib/gases.c states). */
#define AW_H  1.008
#define AW_HE 4.002602
#define AW_C  12.011
#define AW_N  14.007
#define AW_O  15.999
#define AW_F  18.998403162
#define AW_S  32.06
#define AW_AR 39.95

static const gk_gas *must_find(const char *what) {
    const gk_gas *g = NULL;
    assert_status(gk_gas_find(what, &g), GK_OK);
    assert_non_null(g);
    return g;
}

static void finds_by_exact_formula(void **state) {
    (void)state;
    static const struct { const char *formula; const char *name; } cases[] = {
        {"N2", "nitrogen"}, {"O2", "oxygen"}, {"CO2", "carbon dioxide"}, {"CO", "carbon monoxide"},
        {"H2O", "water"}, {"n-C4H10", "n-butane"}, {"i-C4H10", "isobutane"}, {"NO", "nitric oxide"},
        {"N2O", "nitrous oxide"}, {"CH2FCF3", "1,1,1,2-tetrafluoroethane"}, {"air", "air"},
        {"He", "helium"}, {"SF6", "sulfur hexafluoride"}, {"HCl", "hydrogen chloride"},
    };
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
        const gk_gas *g = must_find(cases[i].formula);
        assert_string_equal(g->formula, cases[i].formula);
        assert_string_equal(g->name, cases[i].name);
    }
}

static void finds_by_name_in_any_ascii_case(void **state) {
    (void)state;
    assert_string_equal(must_find("carbon dioxide")->formula, "CO2");
    assert_string_equal(must_find("Carbon Dioxide")->formula, "CO2");
    assert_string_equal(must_find("CARBON DIOXIDE")->formula, "CO2");
    assert_string_equal(must_find("NITROGEN")->formula, "N2");
    assert_string_equal(must_find("wAtEr")->formula, "H2O");
    assert_string_equal(must_find("Isobutane")->formula, "i-C4H10");
    assert_string_equal(must_find("N-Butane")->formula, "n-C4H10");
    assert_string_equal(must_find("1,1,1,2-Tetrafluoroethane")->formula, "CH2FCF3");
    assert_string_equal(must_find("AIR")->formula, "air");
    /* aliases: other spellings and trade numbers */
    assert_string_equal(must_find("R-134a")->formula, "CH2FCF3");
    assert_string_equal(must_find("R134a")->formula, "CH2FCF3");
    assert_string_equal(must_find("HFC-134a")->formula, "CH2FCF3");
    assert_string_equal(must_find("Sulphur Dioxide")->formula, "SO2");
    assert_string_equal(must_find("propene")->formula, "C3H6");
    assert_string_equal(must_find("Ethene")->formula, "C2H4");
    assert_string_equal(must_find("ethyne")->formula, "C2H2");
    assert_string_equal(must_find("butane")->formula, "n-C4H10");
    assert_string_equal(must_find("2-methylpropane")->formula, "i-C4H10");
    assert_string_equal(must_find("water vapour")->formula, "H2O");
    assert_string_equal(must_find("dry air")->formula, "air");
    assert_string_equal(must_find("tetrafluoromethane")->formula, "CF4");
}

static void formulas_are_case_sensitive(void **state) {
    (void)state;
    const gk_gas *g = NULL;
    /* "CO" is carbon monoxide; "Co" (cobalt) and "co" must not fall through to it. */
    assert_string_equal(must_find("CO")->name, "carbon monoxide");
    assert_status(gk_gas_find("Co", &g), GK_ERR_NOT_FOUND);
    assert_status(gk_gas_find("cO", &g), GK_ERR_NOT_FOUND);
    assert_string_equal(must_find("NO")->name, "nitric oxide");
    assert_status(gk_gas_find("No", &g), GK_ERR_NOT_FOUND);
    assert_null(g);
}

static void unknown_and_near_miss_names(void **state) {
    (void)state;
    static const char *const misses[] = {
        "", " ", "Co", "co", "co2", "n2", "no", "h2o", "N2 ", " N2", "nitrogen ", "nitroge",
        "nitrogenx", "carbon  dioxide", "C4H10", "R-134", "unobtainium", "R134A-", "air\t",
    };
    for (size_t i = 0; i < sizeof misses / sizeof misses[0]; ++i) {
        const gk_gas *g = (const gk_gas *)&g;   /* sentinel: any non-NULL address */
        const gk_gas *const before = g;
        assert_status(gk_gas_find(misses[i], &g), GK_ERR_NOT_FOUND);
        assert_ptr_equal(g, before);
    }
}

static void null_arguments(void **state) {
    (void)state;
    const gk_gas *g = (const gk_gas *)&g;
    const gk_gas *const before = g;
    assert_status(gk_gas_find(NULL, &g), GK_ERR_ARGUMENT);
    assert_ptr_equal(g, before);
    assert_status(gk_gas_find("N2", NULL), GK_ERR_ARGUMENT);
    assert_status(gk_gas_find(NULL, NULL), GK_ERR_ARGUMENT);
}

static void count_and_index(void **state) {
    (void)state;
    size_t n = gk_gas_count();
    assert_true(n >= 31u);
    for (size_t i = 0; i < n; ++i) assert_non_null(gk_gas_at(i));
    assert_null(gk_gas_at(n));
    assert_null(gk_gas_at(n + 1u));
    assert_null(gk_gas_at((size_t)-1));
}

static int has_upper(const char *s) {
    for (; *s != '\0'; ++s) if (*s >= 'A' && *s <= 'Z') return 1;
    return 0;
}

static int same_ci(const char *a, const char *b) {
    for (; *a != '\0' && *b != '\0'; ++a, ++b) {
        char x = (*a >= 'A' && *a <= 'Z') ? (char)(*a - 'A' + 'a') : *a;
        char y = (*b >= 'A' && *b <= 'Z') ? (char)(*b - 'A' + 'a') : *b;
        if (x != y) return 0;
    }
    return *a == *b;
}

static void every_row_is_unique_and_found_by_its_keys(void **state) {
    (void)state;
    size_t n = gk_gas_count();
    for (size_t i = 0; i < n; ++i) {
        const gk_gas *g = gk_gas_at(i);
        const gk_gas *f = NULL;
        assert_non_null(g->name);
        assert_non_null(g->formula);
        assert_true(strlen(g->name) > 0 && strlen(g->formula) > 0);
        assert_false(has_upper(g->name));          /* names are lower case */
        assert_null(strchr(g->name, '='));         /* would break composition text */
        assert_null(strchr(g->formula, '='));
        assert_null(strchr(g->formula, ','));
        assert_status(gk_gas_find(g->formula, &f), GK_OK);
        assert_ptr_equal(f, g);
        assert_status(gk_gas_find(g->name, &f), GK_OK);
        assert_ptr_equal(f, g);
        for (size_t j = 0; j < i; ++j) {
            const gk_gas *h = gk_gas_at(j);
            assert_string_not_equal(g->formula, h->formula);
            assert_false(same_ci(g->name, h->name));
            assert_false(same_ci(g->name, h->formula));
            assert_false(same_ci(h->name, g->formula));
        }
    }
}

static void every_row_is_physically_sane(void **state) {
    (void)state;
    for (size_t i = 0; i < gk_gas_count(); ++i) {
        const gk_gas *g = gk_gas_at(i);
        double m = (double)g->molar_mass.kg_per_mol, tc = (double)g->critical_temperature.k;
        double pc = (double)g->critical_pressure.pa, w = (double)g->acentric_factor;
        double a = (double)g->vdw_a, b = (double)g->vdw_b, gamma = (double)g->heat_capacity_ratio;
        double sigma = (double)g->collision_diameter;
        print_message("%-26s %-8s M=%.6g Tc=%.6g Pc=%.6g w=%.4g a=%.4g b=%.4g gamma=%.5g sigma=%.4g\n",
                      g->name, g->formula, m, tc, pc, w, a, b, gamma, sigma);
        /* lightest H2 2.016 g/mol, heaviest SF6 146 g/mol in this table */
        assert_true(m > 1.9e-3 && m < 0.2);
        /* He 5.2 K ... water 647 K; 0.2 MPa (He) ... 22.1 MPa (water) */
        assert_true(tc > 5.0 && tc < 700.0);
        assert_true(pc > 0.2e6 && pc < 23e6);
        assert_true(w > -0.5 && w < 1.5);
        /* ideal-gas cp/cv: > 1, at most 5/3 (monatomic, kinetic theory); 0 = unknown */
        assert_true(gamma >= 0.0);
        if (gamma > 0.0) {
            assert_true(gamma > 1.0);
            assert_true(gamma <= 5.0 / 3.0 + 1e-6);
        }
        /* van der Waals: both given or both derived (0) */
        assert_true((a > 0.0 && b > 0.0) || (a <= 0.0 && b <= 0.0));
        assert_true(a >= 0.0 && b >= 0.0);
        /* molecular diameters are 2 ... 6 angstrom; 0 = unknown */
        assert_true(sigma >= 0.0);
        if (sigma > 0.0) assert_true(sigma > 2e-10 && sigma < 6e-10);
    }
}

static void molar_masses_from_iupac_atomic_weights(void **state) {
    (void)state;
    /* Recomputed here from IUPAC/CIAAW 2021 standard (conventional) atomic weights. */
    static const struct { const char *formula; double g_per_mol; } cases[] = {
        {"N2", 2 * AW_N}, {"O2", 2 * AW_O}, {"Ar", AW_AR}, {"He", AW_HE}, {"H2", 2 * AW_H},
        {"CO2", AW_C + 2 * AW_O}, {"CO", AW_C + AW_O}, {"H2O", 2 * AW_H + AW_O},
        {"CH4", AW_C + 4 * AW_H}, {"C3H8", 3 * AW_C + 8 * AW_H}, {"NH3", AW_N + 3 * AW_H},
        {"n-C4H10", 4 * AW_C + 10 * AW_H}, {"i-C4H10", 4 * AW_C + 10 * AW_H},
        {"SF6", AW_S + 6 * AW_F}, {"H2S", 2 * AW_H + AW_S}, {"NF3", AW_N + 3 * AW_F},
        {"CH2FCF3", 2 * AW_C + 2 * AW_H + 4 * AW_F},
    };
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
        assert_rel(must_find(cases[i].formula)->molar_mass.kg_per_mol, cases[i].g_per_mol * 1e-3,
                   GK_TOL(1e-12, 1e-6));
    }
    /* Printed values to compare with (IUPAC-based, common practice): CO2 44.009, H2O 18.015,
       SF6 146.05, R-134a 102.03 g/mol. */
    assert_rel(must_find("CO2")->molar_mass.kg_per_mol, 44.009e-3, GK_TOL(1e-12, 1e-6));
    assert_rel(must_find("H2O")->molar_mass.kg_per_mol, 18.015e-3, GK_TOL(1e-12, 1e-6));
    /* printed to 0.01 g/mol: half a unit of the last digit */
    assert_rel(must_find("SF6")->molar_mass.kg_per_mol, 146.05e-3, 0.005 / 146.05);
    assert_rel(must_find("R-134a")->molar_mass.kg_per_mol, 102.03e-3, 0.005 / 102.03);
}

static void air_is_the_iso_2533_pseudo_pure_gas(void **state) {
    (void)state;
    const gk_gas *air = must_find("air");
    /* ISO 2533:1975 / U.S. Standard Atmosphere 1976: M = 28.9644 g/mol, gamma 1.40. */
    assert_rel(air->molar_mass.kg_per_mol, 28.9644e-3, GK_TOL(1e-12, 1e-6));
    assert_rel(air->heat_capacity_ratio, 1.4, GK_TOL(1e-12, 1e-6));
    /* Sea-level speed of sound 340.294 m/s (ISO 2533:1975, sea-level table) from the table's gamma
       and M at 288.15 K; ISO 2533 uses R* = 8.31432 J/(mol K), about 2e-5 below CODATA R, so
       the CODATA figure is about 1e-5 higher: tolerance 3e-5. */
    double c = sqrt((double)air->heat_capacity_ratio * 8.314462618 * 288.15 /
                    (double)air->molar_mass.kg_per_mol);
    assert_rel(c, 340.294, 3e-5);
    /* Pseudo-critical point: maxcondentherm of air 132.63 K, 3.785 MPa (Lemmon et al. 2000,
       from memory); the table's approximate 132.5 K / 3.77 MPa must be within 1 %. */
    assert_rel(air->critical_temperature.k, 132.63, 0.01);
    assert_rel(air->critical_pressure.pa, 3.785e6, 0.01);
}

static void water_critical_point_is_iapws(void **state) {
    (void)state;
    const gk_gas *w = must_find("water");
    /* Critical point of water 647.096 K, 22.064 MPa (IAPWS R2-83(1992), the release on the
       critical-point values of ordinary and heavy water; also used by IAPWS-95 and IF97). */
    assert_rel(w->critical_temperature.k, 647.096, GK_TOL(1e-12, 1e-6));
    assert_rel(w->critical_pressure.pa, 22.064e6, GK_TOL(1e-12, 1e-6));
}

static void handbook_van_der_waals_constants(void **state) {
    (void)state;
    /* CRC Handbook, "Van der Waals constants for gases" (older table; CO2 and H2 from the newer
       table; from memory); a in bar L2/mol2 (x 0.1 -> Pa m6/mol2), b in L/mol
       (x 1e-3 -> m3/mol). */
    static const struct { const char *formula; double a_bar_l2; double b_l; } crc[] = {
        {"He", 0.0346, 0.0238}, {"N2", 1.370, 0.0387}, {"O2", 1.382, 0.03186},
        {"Ar", 1.355, 0.03201}, {"H2O", 5.537, 0.03049}, {"NH3", 4.225, 0.03713},
        {"CH4", 2.303, 0.04310}, {"CO2", 3.658, 0.0429}, {"H2", 0.2452, 0.0265},
    };
    for (size_t i = 0; i < sizeof crc / sizeof crc[0]; ++i) {
        const gk_gas *g = must_find(crc[i].formula);
        assert_rel(g->vdw_a, crc[i].a_bar_l2 * 0.1, GK_TOL(1e-12, 1e-6));
        assert_rel(g->vdw_b, crc[i].b_l * 1e-3, GK_TOL(1e-12, 1e-6));
    }
}

static void critical_data_reproduce_handbook_van_der_waals(void **state) {
    (void)state;
    /* The CRC constants are fitted to critical data (common practice), so a = 27 R^2 Tc^2/(64 Pc),
       b = R Tc/(8 Pc) from the table's Tc, Pc must reproduce them within a few percent. This
       checks the critical data of the table against an independent published table. Observed
       agreement is better than 0.3 % (H2 b: 0.9 %); tolerance 2 %. */
    static const char *const formulas[] = {"N2", "O2", "Ar", "CH4", "CO2", "He", "H2", "H2O", "NH3"};
    const double r = 8.314462618; /* CODATA 2018 */
    for (size_t i = 0; i < sizeof formulas / sizeof formulas[0]; ++i) {
        const gk_gas *g = must_find(formulas[i]);
        double tc = (double)g->critical_temperature.k;
        double pc = (double)g->critical_pressure.pa;
        double a = 27.0 * r * r * tc * tc / (64.0 * pc);
        double b = r * tc / (8.0 * pc);
        assert_rel(a, g->vdw_a, 0.02);
        assert_rel(b, g->vdw_b, 0.02);
    }
}

static void heat_capacity_ratios_follow_kinetic_theory(void **state) {
    (void)state;
    /* Monatomic ideal gas: 5/3 exactly. Diatomic gases with little vibrational excitation at
       298 K: near the rigid-rotor 7/5 (kinetic theory, common practice), within 0.5 %. (NO is
       left out: its low-lying electronic level adds to cp, gamma 1.386.) */
    static const char *const mono[] = {"He", "Ne", "Ar", "Kr", "Xe"};
    static const char *const di[] = {"N2", "O2", "H2", "CO", "HCl"};
    for (size_t i = 0; i < sizeof mono / sizeof mono[0]; ++i)
        assert_rel(must_find(mono[i])->heat_capacity_ratio, 5.0 / 3.0, GK_TOL(1e-12, 1e-6));
    for (size_t i = 0; i < sizeof di / sizeof di[0]; ++i)
        assert_rel(must_find(di[i])->heat_capacity_ratio, 1.4, 0.005);
    /* CO2 ideal-gas cp 37.135 J/(mol K) at 298.15 K (NIST-JANAF, from memory): gamma 1.2885. */
    assert_rel(must_find("CO2")->heat_capacity_ratio, 37.135 / (37.135 - 8.314462618), 1e-4);
}

static void graham_ratio_of_hydrogen_to_oxygen(void **state) {
    (void)state;
    /* Graham's law (common practice), IUPAC 2021 atomic weights: effusion rate ratio H2 (2.016) :
       O2 (31.998) ~ 3.98. */
    double ratio = sqrt((double)must_find("O2")->molar_mass.kg_per_mol /
                        (double)must_find("H2")->molar_mass.kg_per_mol);
    assert_rel(ratio, 3.98, 1e-3);
}

/* The scan of a key is bounded (gas.h): a text of GK_GAS_KEY_MAX + 1 characters without a NUL
   within them is not found and is read no further (AddressSanitizer would catch a read past the
   array); every key of the table fits. */
static void key_scan_is_bounded(void **state) {
    (void)state;
    char longest[GK_GAS_KEY_MAX + 1];
    const gk_gas *g = NULL;
    memset(longest, 'N', sizeof longest);
    assert_status(gk_gas_find(longest, &g), GK_ERR_NOT_FOUND);
    assert_null(g);
    for (size_t i = 0; i < gk_gas_count(); ++i) {
        assert_true(strlen(gk_gas_at(i)->name) <= GK_GAS_KEY_MAX);
        assert_true(strlen(gk_gas_at(i)->formula) <= GK_GAS_KEY_MAX);
    }
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(finds_by_exact_formula),
        cmocka_unit_test(finds_by_name_in_any_ascii_case),
        cmocka_unit_test(formulas_are_case_sensitive),
        cmocka_unit_test(unknown_and_near_miss_names),
        cmocka_unit_test(null_arguments),
        cmocka_unit_test(count_and_index),
        cmocka_unit_test(every_row_is_unique_and_found_by_its_keys),
        cmocka_unit_test(every_row_is_physically_sane),
        cmocka_unit_test(molar_masses_from_iupac_atomic_weights),
        cmocka_unit_test(air_is_the_iso_2533_pseudo_pure_gas),
        cmocka_unit_test(water_critical_point_is_iapws),
        cmocka_unit_test(handbook_van_der_waals_constants),
        cmocka_unit_test(critical_data_reproduce_handbook_van_der_waals),
        cmocka_unit_test(heat_capacity_ratios_follow_kinetic_theory),
        cmocka_unit_test(graham_ratio_of_hydrogen_to_oxygen),
        cmocka_unit_test(key_scan_is_bounded),
    };
    return cmocka_run_group_tests_name("gases", tests, NULL, NULL);
}
