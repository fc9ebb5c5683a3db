/* test_mixture.c - composition text, normalization and mean molar mass.
 *
 * Exactness checks compare a parsed figure with the compiler's own conversion of the same
 * decimal literal (GK_REAL_C): GCC and Clang convert literals correctly rounded (GCC through
 * MPFR), so a tolerance of 0 checks the library's reader is correctly rounded on those inputs.
 * Other float tolerances: binary32 keeps 6e-8 relative per rounding; a few roundings -> 1e-6. */
#include "gk_test.h"
#include <string.h>

/* ---------------------------------------------------------------- helpers */

static const gk_gas sentinel_gas = {"sentinel", "Sn?", {1.0}, {1.0}, {1.0}, 0.0, 0.0, 0.0, 0.0, 0.0};

static void fill_sentinel(gk_mixture *m) {
    m->count = 7u;
    for (size_t i = 0; i < GK_MIXTURE_MAX; ++i) {
        m->gas[i] = &sentinel_gas;
        m->mole_fraction[i] = GK_SENTINEL;
    }
}

static void assert_sentinel(const gk_mixture *m) {
    assert_int_equal(m->count, 7u);
    for (size_t i = 0; i < GK_MIXTURE_MAX; ++i) {
        assert_ptr_equal(m->gas[i], &sentinel_gas);
        assert_rel(m->mole_fraction[i], GK_SENTINEL, 0.0);
    }
}

static const gk_gas *gas(const char *key) {
    const gk_gas *g = NULL;
    assert_status(gk_gas_find(key, &g), GK_OK);
    return g;
}

/* Parses text that must fail with `expected`, and checks the output stayed in place. */
#define assert_parse_fails(text, expected)                                                  \
    do {                                                                                    \
        gk_mixture m_;                                                                      \
        fill_sentinel(&m_);                                                                 \
        assert_status(gk_mixture_parse((text), &m_), (expected));                           \
        assert_sentinel(&m_);                                                               \
    } while (0)

static double sum_of(const gk_mixture *m) {
    double s = 0.0;
    for (size_t i = 0; i < m->count; ++i) s += (double)m->mole_fraction[i];
    return s;
}

/* ---------------------------------------------------------------- parse: accepted forms */

static void parses_plain_fractions(void **state) {
    (void)state;
    gk_mixture m;
    assert_status(gk_mixture_parse("N2=0.7808, O2=0.2095, Ar=0.0097", &m), GK_OK);
    assert_int_equal(m.count, 3u);
    assert_ptr_equal(m.gas[0], gas("N2"));
    assert_ptr_equal(m.gas[1], gas("O2"));
    assert_ptr_equal(m.gas[2], gas("Ar"));
    /* correctly rounded, bit for bit the compiler's literal */
    assert_rel(m.mole_fraction[0], GK_REAL_C(0.7808), 0.0);
    assert_rel(m.mole_fraction[1], GK_REAL_C(0.2095), 0.0);
    assert_rel(m.mole_fraction[2], GK_REAL_C(0.0097), 0.0);
}

static void parses_percent_and_balance(void **state) {
    (void)state;
    gk_mixture m;
    assert_status(gk_mixture_parse("CO2=5%, N2=balance", &m), GK_OK);
    assert_int_equal(m.count, 2u);
    assert_ptr_equal(m.gas[0], gas("CO2"));
    assert_ptr_equal(m.gas[1], gas("N2"));
    assert_rel(m.mole_fraction[0], GK_REAL_C(0.05), 0.0);       /* 5/100, one rounding */
    assert_rel(m.mole_fraction[1], 0.95, GK_TOL(2e-16, 1e-7));  /* 1 - 0.05, one more rounding */
    assert_rel(sum_of(&m), 1.0, GK_TOL(1e-15, 1e-7));
}

static void parses_ppm_with_air_balance(void **state) {
    (void)state;
    gk_mixture m;
    assert_status(gk_mixture_parse("CO=50ppm, air=balance", &m), GK_OK);
    assert_int_equal(m.count, 2u);
    assert_ptr_equal(m.gas[0], gas("CO"));
    assert_ptr_equal(m.gas[1], gas("air"));
    assert_rel(m.mole_fraction[0], GK_REAL_C(50e-6), 0.0);     /* 50 * 10^-6, one rounding */
    assert_rel(m.mole_fraction[1], 1.0 - 50e-6, GK_TOL(2e-16, 1e-7));
    /* the balance may come first */
    assert_status(gk_mixture_parse("air = balance, CO = 50 PPM", &m), GK_OK);
    assert_ptr_equal(m.gas[0], gas("air"));
    assert_rel(m.mole_fraction[0], 1.0 - 50e-6, GK_TOL(2e-16, 1e-7));
    assert_rel(m.mole_fraction[1], GK_REAL_C(50e-6), 0.0);
}

static void ignores_spaces_and_accepts_names(void **state) {
    (void)state;
    gk_mixture m;
    assert_status(gk_mixture_parse("  N2 = 0.5 ,\tO2=  50 %  ", &m), GK_OK);
    assert_int_equal(m.count, 2u);
    assert_status(gk_mixture_parse("\vN2\f=\n0.5\r,\tO2=0.5\v", &m), GK_OK);
    assert_int_equal(m.count, 2u);
    assert_rel(m.mole_fraction[0], 0.5, 0.0);
    assert_rel(m.mole_fraction[1], 0.5, 0.0);
    /* names with spaces, any case, aliases, a name with commas inside */
    assert_status(gk_mixture_parse("\r\n Carbon Dioxide = 0.25 ,nitrogen=75%", &m), GK_OK);
    assert_ptr_equal(m.gas[0], gas("CO2"));
    assert_ptr_equal(m.gas[1], gas("N2"));
    assert_status(gk_mixture_parse("1,1,1,2-tetrafluoroethane=10%, R-32x=0", &m), GK_ERR_NOT_FOUND);
    assert_status(gk_mixture_parse("1,1,1,2-tetrafluoroethane=10%, Nitrogen=BALANCE", &m), GK_OK);
    assert_ptr_equal(m.gas[0], gas("CH2FCF3"));
    assert_rel(m.mole_fraction[1], 0.9, GK_TOL(2e-16, 1e-7));
    assert_status(gk_mixture_parse("R134a=0.1,sulphur hexafluoride=0.9", &m), GK_OK);
    assert_ptr_equal(m.gas[1], gas("SF6"));
    /* one component */
    assert_status(gk_mixture_parse("methane=1", &m), GK_OK);
    assert_int_equal(m.count, 1u);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
    assert_status(gk_mixture_parse("CH4=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
    assert_status(gk_mixture_parse("CH4=100%", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
    assert_status(gk_mixture_parse("CH4=1000000ppm", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
}

static void number_forms(void **state) {
    (void)state;
    gk_mixture m;
    assert_status(gk_mixture_parse("N2=.5, O2=5.e-1", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.5, 0.0);
    assert_rel(m.mole_fraction[1], 0.5, 0.0);
    assert_status(gk_mixture_parse("N2=+0.25, O2=2.5E-1, Ar=0.5e+0", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.25, 0.0);
    assert_rel(m.mole_fraction[1], 0.25, 0.0);
    assert_rel(m.mole_fraction[2], 0.5, 0.0);
    assert_status(gk_mixture_parse("N2=0.000001, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], GK_REAL_C(1e-6), 0.0);
    assert_status(gk_mixture_parse("N2=1e-6, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], GK_REAL_C(1e-6), 0.0);
    assert_status(gk_mixture_parse("N2=0.0625, O2=00000.9375", &m), GK_OK);
    assert_rel(m.mole_fraction[1], 0.9375, 0.0);
    /* negative zero and zero with a huge exponent are a zero fraction */
    assert_status(gk_mixture_parse("N2=-0, O2=1", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.0, 0.0);
    assert_false(signbit(m.mole_fraction[0]));
    assert_status(gk_mixture_parse("N2=0e999999999, O2=1", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.0, 0.0);
    assert_status(gk_mixture_parse("N2=0.0, O2=1.0", &m), GK_OK);
}

static void long_and_extreme_numbers(void **state) {
    (void)state;
    gk_mixture m;
    /* Reference values from mpmath at 30 digits (common practice): the decimal value itself. */
    /* 25 digits: 19 kept, the rest rounded; then the slow path (mantissa above 2^53). */
    assert_status(gk_mixture_parse("N2=0.1234567890123456789012345, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.1234567890123456789012345, GK_TOL(2.3e-16, 1.2e-7));
    /* dropped integer digits still scale the value */
    assert_status(gk_mixture_parse("N2=12345678901234567890123e-23, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.12345678901234567890123, GK_TOL(2.3e-16, 1.2e-7));
    /* round-half-even on the dropped digits: exactly ...5 (tie, odd -> up), ...5 then non-zero */
    assert_status(gk_mixture_parse("N2=0.12345678901234567895, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.12345678901234567895, GK_TOL(2.3e-16, 1.2e-7));
    assert_status(gk_mixture_parse("N2=0.12345678901234567885, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.12345678901234567885, GK_TOL(2.3e-16, 1.2e-7));
    assert_status(gk_mixture_parse("N2=0.123456789012345678850001, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.123456789012345678850001, GK_TOL(2.3e-16, 1.2e-7));
    assert_status(gk_mixture_parse("N2=0.12345678901234567880009, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.12345678901234567880009, GK_TOL(2.3e-16, 1.2e-7));
    /* 17 significant digits: slow path in both precisions */
    assert_status(gk_mixture_parse("N2=0.12345678901234567, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.12345678901234567, GK_TOL(2.3e-16, 1.2e-7));
    /* exponents beyond the exact powers of ten: scaled in steps */
    assert_status(gk_mixture_parse("N2=1e-25, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 1e-25, GK_TOL(4.5e-16, 2.4e-7));
    assert_status(gk_mixture_parse("N2=3.5e-30, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 3.5e-30, GK_TOL(4.5e-16, 2.4e-7));
    /* the largest mantissa: exactly 40 digits is accepted */
    assert_status(gk_mixture_parse("N2=0.000000000000000000000000000000000000025, O2=balance", &m),
                  GK_OK);
    assert_true((double)m.mole_fraction[0] >= 0.0 && (double)m.mole_fraction[0] < 1e-37);
    assert_status(gk_mixture_parse("N2=0.500000000000000000000000000000000000000, O2=0.5", &m),
                  GK_OK);
    /* underflow becomes 0 (subnormal in a double build where representable) */
    assert_status(gk_mixture_parse("N2=1e-330, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.0, 0.0);
    assert_status(gk_mixture_parse("N2=1e-310, O2=balance", &m), GK_OK);
    assert_true((double)m.mole_fraction[0] >= 0.0 && (double)m.mole_fraction[0] < 1e-300);
    assert_status(gk_mixture_parse("N2=1e-999999999999, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.0, 0.0);
    assert_rel(m.mole_fraction[1], 1.0, 0.0);
    /* a huge mantissa with a huge negative exponent, and the reverse */
    assert_status(gk_mixture_parse("N2=9999999999999999999999e-999, O2=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.0, 0.0);
    assert_status(gk_mixture_parse("N2=0.000000000000000000000000000001e29, O2=0.9", &m), GK_OK);
    assert_rel(m.mole_fraction[0], GK_REAL_C(0.1), GK_TOL(2.3e-16, 1.2e-7));
}

/* ---------------------------------------------------------------- parse: rejected text */

static void null_arguments(void **state) {
    (void)state;
    gk_mixture m;
    fill_sentinel(&m);
    assert_status(gk_mixture_parse(NULL, &m), GK_ERR_ARGUMENT);
    assert_sentinel(&m);
    assert_status(gk_mixture_parse("N2=1", NULL), GK_ERR_ARGUMENT);
}

static void malformed_text(void **state) {
    (void)state;
    static const char *const bad[] = {
        "", "   ", "N2", "N2=", "N2 = ", "=0.5", " = 1", "N2=0.5,", "N2=0.5, ", "N2=1, O2",
        "N2=abc", "N2=0.5 O2=0.5", "N2=1e", "N2=1e+", "N2=1E-", "N2=.", "N2=+", "N2=-", "N2=+-1",
        "N2=0.5%%, O2=0.5", "N2=50%x, O2=balance", "N2=0.5ppmx, O2=balance", "N2=0.5,,O2=0.5",
        "N2=0.5, O2=0.5 ,", "N2,=1", ",N2=1", "N2==1", "N2=inf", "N2=nan", "N2=0x1p-1",
        "N2=1,5", "N2=balance, O2=balance", "N2=balance%", "N2=balance 5", "N2=1 2",
        "N2=1.2.3", "N2=1e5.5", "N2=e5", "N2=%", "N2=ppm", "N2=0,5, O2=0,5", "N2=1;O2=0",
        "N2=0.5 % %", "N2=\xc2\xbd",
    };
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; ++i) {
        print_message("malformed: \"%s\"\n", bad[i]);
        assert_parse_fails(bad[i], GK_ERR_PARSE);
    }
}

static void unknown_gases(void **state) {
    (void)state;
    char long_name[200];
    assert_parse_fails("Xx=1", GK_ERR_NOT_FOUND);
    assert_parse_fails("co2=1", GK_ERR_NOT_FOUND);            /* formulas are case-sensitive */
    assert_parse_fails("nitrogen gas=1", GK_ERR_NOT_FOUND);
    /* a comma inside an unknown name was most likely meant as a separator: malformed */
    assert_parse_fails("N2=0,5, O2=0,5", GK_ERR_PARSE);
    assert_parse_fails("1,1,1,2-tetrafluoroethan=1", GK_ERR_PARSE);
    assert_parse_fails("N2=0.5, O2 0.5, Ar=0.5", GK_ERR_PARSE); /* "0.5 O2" is not a value */
    assert_parse_fails("N2=0.5, O 2=0.5", GK_ERR_NOT_FOUND);
    /* names longer than any gas name */
    memset(long_name, 'x', sizeof long_name);
    memcpy(long_name + 63, "=1", 3);
    assert_parse_fails(long_name, GK_ERR_NOT_FOUND);
    memset(long_name, 'x', sizeof long_name);
    memcpy(long_name + 64, "=1", 3);
    assert_parse_fails(long_name, GK_ERR_NOT_FOUND);
    memset(long_name, 'x', sizeof long_name);
    memcpy(long_name + 150, "=1", 3);
    assert_parse_fails(long_name, GK_ERR_NOT_FOUND);
    /* a long name with a comma inside is malformed too, as mixture.h says of any such name */
    memset(long_name, 'x', sizeof long_name);
    memcpy(long_name, "N2=0.5,", 7);
    memcpy(long_name + 100, ", O2=0.5", 9);
    assert_parse_fails(long_name, GK_ERR_PARSE);
}

static void bad_compositions(void **state) {
    (void)state;
    static const char *const bad[] = {
        "N2=-0.1, O2=1.1",          /* negative fraction (reported first) */
        "N2=1.1",                   /* above 1 */
        "N2=150%", "N2=2000000ppm", "N2=1.0000001",
        "N2=1e999", "N2=1e99999999999", "N2=1e23, O2=balance",      /* far above 1 */
        "N2=1e309", "N2=99999999999999999999e300",                  /* overflow gk_real */
        "N2=-1e-999, O2=1",         /* negative, even though it underflows */
        "N2=0.5, O2=0.4",           /* sums to 0.9 */
        "N2=0.5, O2=0.6",           /* sums to 1.1 */
        "N2=0.5, O2=0.500002",      /* 2e-6 off */
        "N2=0.5, N2=0.5",           /* the same gas twice */
        "N2=0.5, nitrogen=0.5",     /* the same gas twice, by name */
        "N2=60%, O2=50%, Ar=balance", /* negative balance */
        "N2=0.5, O2=0.500002, Ar=balance",
        /* U.S. Standard Atmosphere 1976 composition of dry air by volume, as printed: sums to
           0.999997147, 2.9e-6 short of 1, so it needs "balance" or normalizing */
        ("N2=0.78084, O2=0.209476, Ar=0.00934, CO2=0.000314, Ne=18.18ppm, He=5.24ppm, "
         "Kr=1.14ppm, Xe=0.087ppm, CH4=2ppm, H2=0.5ppm"),
    };
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; ++i) {
        print_message("composition: \"%s\"\n", bad[i]);
        assert_parse_fails(bad[i], GK_ERR_COMPOSITION);
    }
}

static void sum_tolerance_and_balance_rounding(void **state) {
    (void)state;
    gk_mixture m;
    /* within 1e-6 of 1 (5e-7 off; float: 0.5000005 rounds within 3e-8, the sum within 1e-7) */
    assert_status(gk_mixture_parse("N2=0.5000005, O2=0.5", &m), GK_OK);
    assert_status(gk_mixture_parse("N2=0.4999995, O2=0.5", &m), GK_OK);
    /* a balance slightly below 0 within the budget becomes 0 */
    assert_status(gk_mixture_parse("N2=0.5000005, O2=0.5, Ar=balance", &m), GK_OK);
    assert_rel(m.mole_fraction[2], 0.0, 0.0);
    assert_status(gk_mixture_parse("N2=0.3333333, O2=0.6666667, Ar=balance", &m), GK_OK);
    assert_true((double)m.mole_fraction[2] >= 0.0 && (double)m.mole_fraction[2] < 1e-7);
    /* a zero fraction is a component */
    assert_status(gk_mixture_parse("N2=1, O2=0", &m), GK_OK);
    assert_int_equal(m.count, 2u);
}

static void component_count_limit(void **state) {
    (void)state;
    char text[600];
    size_t len = 0;
    gk_mixture m;
    assert_true(gk_gas_count() >= 17u);
    /* 16 distinct gases, each 1/16 (exact in binary) */
    for (size_t i = 0; i < 16u; ++i) {
        len += (size_t)snprintf(text + len, sizeof text - len, "%s%s=0.0625", i ? ", " : "",
                                gk_gas_at(i)->formula);
    }
    assert_status(gk_mixture_parse(text, &m), GK_OK);
    assert_int_equal(m.count, 16u);
    for (size_t i = 0; i < 16u; ++i) {
        assert_ptr_equal(m.gas[i], gk_gas_at(i));
        assert_rel(m.mole_fraction[i], 0.0625, 0.0);
    }
    /* 17 components summing to 1: too many */
    len = 0;
    for (size_t i = 0; i < 17u; ++i) {
        len += (size_t)snprintf(text + len, sizeof text - len, "%s%s=%s", i ? "," : "",
                                gk_gas_at(i)->formula, i ? "0" : "1");
    }
    assert_parse_fails(text, GK_ERR_COMPOSITION);
}

static void text_length_limit(void **state) {
    (void)state;
    /* 1024 characters before the NUL are accepted (documented bound), 1025 are not */
    char text[2048];
    gk_mixture m;
    memset(text, ' ', sizeof text);
    memcpy(text, "N2=0.5, O2=0.5", 14);
    text[1024] = '\0';
    assert_status(gk_mixture_parse(text, &m), GK_OK);
    text[1024] = ' ';
    text[1025] = '\0';
    assert_parse_fails(text, GK_ERR_PARSE);
    text[1025] = ' ';
    text[2047] = '\0';
    assert_parse_fails(text, GK_ERR_PARSE);
    /* 41 mantissa digits: malformed */
    assert_parse_fails("N2=0.0000000000000000000000000000000000000001, O2=balance", GK_ERR_PARSE);
    assert_parse_fails("N2=0.5000000000000000000000000000000000000000, O2=0.5", GK_ERR_PARSE);
    assert_parse_fails("N2=12345678901234567890123456789012345678901e-41, O2=balance", GK_ERR_PARSE);
}

/* ---------------------------------------------------------------- dry air */

static void dry_air_molar_mass_from_composition(void **state) {
    (void)state;
    /* U.S. Standard Atmosphere 1976 (Table 3), sea-level dry air by volume: N2 0.78084,
       O2 0.209476, Ar 0.00934, CO2 0.000314, Ne 18.18 ppm, He 5.24 ppm, Kr 1.14 ppm,
       Xe 0.087 ppm, CH4 2 ppm, H2 0.5 ppm. Its mean molar mass with its own (older) molecular
       weights is the 28.9644 g/mol of ISO 2533:1975. With IUPAC 2021 atomic
       weights the figure moves by about 1.2e-5 relative (mostly argon, 39.948 -> 39.95 and the
       normalization); tolerance 1e-4. */
    gk_mixture m;
    gk_molar_mass mm;
    assert_status(gk_mixture_parse(
        "N2=balance, O2=0.209476, Ar=0.00934, CO2=0.000314, Ne=18.18ppm, He=5.24ppm, "
        "Kr=1.14ppm, Xe=0.087ppm, CH4=2ppm, H2=0.5ppm", &m), GK_OK);
    assert_int_equal(m.count, 10u);
    assert_rel(m.mole_fraction[0], 1.0 - 0.209476 - 0.00934 - 0.000314 - 27.147e-6,
               GK_TOL(1e-14, 1e-6));
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    assert_rel(mm.kg_per_mol, 28.9644e-3, 1e-4);
    assert_rel(mm.kg_per_mol, gas("air")->molar_mass.kg_per_mol, 1e-4);

    /* The four main components, normalized (the classic N2/O2/Ar/CO2 approximation). */
    m.count = 4;
    m.gas[0] = gas("N2");  m.mole_fraction[0] = GK_REAL_C(0.78084);
    m.gas[1] = gas("O2");  m.mole_fraction[1] = GK_REAL_C(0.209476);
    m.gas[2] = gas("Ar");  m.mole_fraction[2] = GK_REAL_C(0.00934);
    m.gas[3] = gas("CO2"); m.mole_fraction[3] = GK_REAL_C(0.000314);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);   /* sums to 0.99997 */
    assert_status(gk_mixture_normalize(&m), GK_OK);
    assert_rel(sum_of(&m), 1.0, GK_TOL(1e-15, 2e-7));
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    assert_rel(mm.kg_per_mol, 28.9644e-3, 1e-4);
}

/* ---------------------------------------------------------------- normalize */

static void normalize_rescales_proportions(void **state) {
    (void)state;
    gk_mixture m;
    m.count = 3;
    m.gas[0] = gas("N2"); m.mole_fraction[0] = GK_REAL_C(78.0);
    m.gas[1] = gas("O2"); m.mole_fraction[1] = GK_REAL_C(21.0);
    m.gas[2] = gas("Ar"); m.mole_fraction[2] = GK_REAL_C(1.0);
    assert_status(gk_mixture_normalize(&m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.78, GK_TOL(2.3e-16, 1.2e-7));   /* 78/100, one rounding */
    assert_rel(m.mole_fraction[1], 0.21, GK_TOL(2.3e-16, 1.2e-7));
    assert_rel(m.mole_fraction[2], 0.01, GK_TOL(2.3e-16, 1.2e-7));
    assert_ptr_equal(m.gas[2], gas("Ar"));
    /* one component of any positive amount becomes exactly 1 */
    m.count = 1;
    m.mole_fraction[0] = GK_REAL_C(0.3);
    assert_status(gk_mixture_normalize(&m), GK_OK);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
    /* an already normalized mixture with a zero component keeps its values */
    m.count = 2;
    m.mole_fraction[0] = GK_REAL_C(1.0);
    m.mole_fraction[1] = GK_REAL_C(0.0);
    assert_status(gk_mixture_normalize(&m), GK_OK);
    assert_rel(m.mole_fraction[0], 1.0, 0.0);
    assert_rel(m.mole_fraction[1], 0.0, 0.0);
    /* proportions so large that their sum overflows */
#if GK_REAL_IS_FLOAT
    m.mole_fraction[0] = 3e38f;
    m.mole_fraction[1] = 3e38f;
#else
    m.mole_fraction[0] = 1.5e308;
    m.mole_fraction[1] = 1.5e308;
#endif
    assert_status(gk_mixture_normalize(&m), GK_OK);
    assert_rel(m.mole_fraction[0], 0.5, 0.0);
    assert_rel(m.mole_fraction[1], 0.5, 0.0);
}

static void normalize_rejects_and_leaves_unchanged(void **state) {
    (void)state;
    gk_mixture m;
    gk_mixture before;
    const gk_real nan_value = (gk_real)NAN;
    const gk_real inf_value = (gk_real)INFINITY;
    const gk_real cases[][2] = {
        {GK_REAL_C(0.0), GK_REAL_C(0.0)},      /* all zero */
        {GK_REAL_C(-0.1), GK_REAL_C(1.1)},     /* negative */
        {nan_value, GK_REAL_C(1.0)},
        {inf_value, GK_REAL_C(1.0)},
    };
    assert_status(gk_mixture_normalize(NULL), GK_ERR_ARGUMENT);
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
        fill_sentinel(&m);
        m.count = 2;
        m.mole_fraction[0] = cases[i][0];
        m.mole_fraction[1] = cases[i][1];
        before = m;
        assert_status(gk_mixture_normalize(&m), GK_ERR_COMPOSITION);
        assert_int_equal(memcmp(&m, &before, sizeof m), 0);
    }
    fill_sentinel(&m);
    m.count = 0;
    assert_status(gk_mixture_normalize(&m), GK_ERR_COMPOSITION);
    m.count = GK_MIXTURE_MAX + 1u;
    assert_status(gk_mixture_normalize(&m), GK_ERR_COMPOSITION);
    m.count = 2;
    m.mole_fraction[0] = GK_REAL_C(0.5);
    m.mole_fraction[1] = GK_REAL_C(0.5);
    m.gas[1] = NULL;
    before = m;
    assert_status(gk_mixture_normalize(&m), GK_ERR_ARGUMENT);
    assert_int_equal(memcmp(&m, &before, sizeof m), 0);
}

/* ---------------------------------------------------------------- molar mass */

static void molar_mass_of_simple_mixtures(void **state) {
    (void)state;
    gk_mixture m;
    gk_molar_mass mm;
    /* 5 % CO2 in N2: 0.05 x 44.009 + 0.95 x 28.014 = 28.81375 g/mol (IUPAC 2021 atomic weights,
       computed by hand) */
    assert_status(gk_mixture_parse("CO2=5%, N2=balance", &m), GK_OK);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    assert_rel(mm.kg_per_mol, 28.81375e-3, GK_TOL(1e-14, 1e-6));
    /* a pure gas: its own molar mass */
    assert_status(gk_mixture_parse("He=1", &m), GK_OK);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    assert_rel(mm.kg_per_mol, 4.002602e-3, GK_TOL(1e-15, 1e-7));
    /* the same gas twice in a hand-built mixture is harmless */
    m.count = 2;
    m.gas[0] = gas("Ar"); m.mole_fraction[0] = GK_REAL_C(0.5);
    m.gas[1] = gas("Ar"); m.mole_fraction[1] = GK_REAL_C(0.5);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    assert_rel(mm.kg_per_mol, 39.95e-3, GK_TOL(1e-15, 1e-7));
}

static void molar_mass_rejects_bad_input(void **state) {
    (void)state;
    gk_mixture m;
    gk_molar_mass mm = {GK_SENTINEL};
    gk_gas odd = *gas("N2");                     /* a caller's own gas row */
    assert_status(gk_mixture_molar_mass(NULL, &mm), GK_ERR_ARGUMENT);
    assert_status(gk_mixture_parse("N2=0.5, O2=0.5", &m), GK_OK);
    assert_status(gk_mixture_molar_mass(&m, NULL), GK_ERR_ARGUMENT);

    m.count = 0;
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.count = GK_MIXTURE_MAX + 1u;
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.count = 2;
    m.gas[1] = NULL;
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_ARGUMENT);
    m.gas[1] = gas("O2");
    m.mole_fraction[1] = GK_REAL_C(1.5);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.mole_fraction[1] = GK_REAL_C(-0.5);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.mole_fraction[1] = (gk_real)NAN;
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.mole_fraction[1] = GK_REAL_C(0.4);         /* sum 0.9 */
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_COMPOSITION);
    m.mole_fraction[1] = GK_REAL_C(0.5000005);   /* within 1e-6: accepted */
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_OK);
    mm.kg_per_mol = GK_SENTINEL;
    m.mole_fraction[1] = GK_REAL_C(0.5);

    /* a component whose molar mass is not > 0 or not finite */
    m.gas[1] = &odd;
    odd.molar_mass.kg_per_mol = GK_REAL_C(0.0);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_DOMAIN);
    odd.molar_mass.kg_per_mol = GK_REAL_C(-0.028);
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_DOMAIN);
    odd.molar_mass.kg_per_mol = (gk_real)INFINITY;
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_DOMAIN);
    /* the smallest subnormal molar mass: half of it rounds to 0, never GK_OK with 0 */
    m.gas[0] = &odd;
#if GK_REAL_IS_FLOAT
    odd.molar_mass.kg_per_mol = 1.40129846e-45f;
#else
    odd.molar_mass.kg_per_mol = 4.9406564584124654e-324;
#endif
    assert_status(gk_mixture_molar_mass(&m, &mm), GK_ERR_RANGE);
    assert_rel(mm.kg_per_mol, GK_SENTINEL, 0.0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(parses_plain_fractions),
        cmocka_unit_test(parses_percent_and_balance),
        cmocka_unit_test(parses_ppm_with_air_balance),
        cmocka_unit_test(ignores_spaces_and_accepts_names),
        cmocka_unit_test(number_forms),
        cmocka_unit_test(long_and_extreme_numbers),
        cmocka_unit_test(null_arguments),
        cmocka_unit_test(malformed_text),
        cmocka_unit_test(unknown_gases),
        cmocka_unit_test(bad_compositions),
        cmocka_unit_test(sum_tolerance_and_balance_rounding),
        cmocka_unit_test(component_count_limit),
        cmocka_unit_test(text_length_limit),
        cmocka_unit_test(dry_air_molar_mass_from_composition),
        cmocka_unit_test(normalize_rescales_proportions),
        cmocka_unit_test(normalize_rejects_and_leaves_unchanged),
        cmocka_unit_test(molar_mass_of_simple_mixtures),
        cmocka_unit_test(molar_mass_rejects_bad_input),
    };
    return cmocka_run_group_tests_name("mixture", tests, NULL, NULL);
}
