/* test_units.c - unit table, gk_convert(), gk_unit_parse(), gk_unit_symbol(), the typed
 * _from / _to functions and gk_pressure_from_gauge(). */
#include "gk_test.h"
#include <string.h>

/* Largest and smallest test magnitudes of the build: near the overflow threshold, and near the
 * smallest normal number (IEEE 754 binary64 / binary32). */
#define BIG ((gk_real)GK_TOL(1e308, 3e38))
#define TINY ((gk_real)GK_TOL(3e-308, 2e-38))

/* ------------------------------------------------------------------ dimensions (test side) */
/* The enum is grouped by dimension (units.h); this table restates the groups so the tests can
 * reach every typed function generically. */
enum dim { D_PRESSURE, D_TEMPERATURE, D_VOLUME, D_AMOUNT, D_MOLAR_MASS, D_MOLAR_VOLUME,
           D_DENSITY, D_SPEED, D_MASS, D_VOLUME_FLOW, D_MASS_FLOW, D_COUNT };

typedef struct dim_info {
    const char *name;
    gk_unit first, last; /* inclusive range of the enum */
    int positive;        /* typed functions require > 0 */
    int big;             /* a unit larger than the SI unit (from: overflow), or -1 */
    int small;           /* a unit smaller than the SI unit (to: overflow), or -1 */
} dim_info;

static const dim_info dims[D_COUNT] = {
    { "pressure",     GK_UNIT_PA, GK_UNIT_PSI, 1, GK_UNIT_MPA, -1 },
    { "temperature",  GK_UNIT_K, GK_UNIT_DEGR, 1, -1, GK_UNIT_DEGR },
    { "volume",       GK_UNIT_M3, GK_UNIT_GAL_US, 1, -1, GK_UNIT_ML },
    { "amount",       GK_UNIT_MOL, GK_UNIT_LBMOL, 1, GK_UNIT_KMOL, GK_UNIT_MMOL },
    { "molar mass",   GK_UNIT_KG_PER_MOL, GK_UNIT_G_PER_MOL, 1, -1, GK_UNIT_G_PER_MOL },
    { "molar volume", GK_UNIT_M3_PER_MOL, GK_UNIT_CM3_PER_MOL, 1, -1, GK_UNIT_CM3_PER_MOL },
    { "density",      GK_UNIT_KG_PER_M3, GK_UNIT_LB_PER_FT3, 1, GK_UNIT_G_PER_CM3, -1 },
    { "speed",        GK_UNIT_M_PER_S, GK_UNIT_FT_PER_S, 0, -1, GK_UNIT_KM_PER_H },
    { "mass",         GK_UNIT_KG, GK_UNIT_LB, 1, -1, GK_UNIT_G },
    { "volume flow",  GK_UNIT_M3_PER_S, GK_UNIT_FT3_PER_MIN, 0, -1, GK_UNIT_ML_PER_MIN },
    { "mass flow",    GK_UNIT_KG_PER_S, GK_UNIT_LB_PER_H, 0, -1, GK_UNIT_G_PER_MIN },
};

static enum dim dim_of(gk_unit u) {
    for (int d = 0; d < D_COUNT; ++d)
        if (u >= dims[d].first && u <= dims[d].last) return (enum dim)d;
    fail_msg("unit %d has no dimension", (int)u);
    return D_COUNT;
}

/* A unit of another dimension than d. */
static gk_unit foreign_unit(enum dim d) { return d == D_PRESSURE ? GK_UNIT_K : GK_UNIT_PA; }

/* gk_<dim>_from() of dimension d; out == NULL passes NULL to the library. */
static gk_status typed_from(enum dim d, gk_real value, gk_unit unit, gk_real *out) {
    switch (d) {
    case D_PRESSURE:     return gk_pressure_from(value, unit, (gk_pressure *)(void *)out);
    case D_TEMPERATURE:  return gk_temperature_from(value, unit, (gk_temperature *)(void *)out);
    case D_VOLUME:       return gk_volume_from(value, unit, (gk_volume *)(void *)out);
    case D_AMOUNT:       return gk_amount_from(value, unit, (gk_amount *)(void *)out);
    case D_MOLAR_MASS:   return gk_molar_mass_from(value, unit, (gk_molar_mass *)(void *)out);
    case D_MOLAR_VOLUME: return gk_molar_volume_from(value, unit, (gk_molar_volume *)(void *)out);
    case D_DENSITY:      return gk_density_from(value, unit, (gk_density *)(void *)out);
    case D_SPEED:        return gk_speed_from(value, unit, (gk_speed *)(void *)out);
    case D_MASS:         return gk_mass_from(value, unit, (gk_mass *)(void *)out);
    case D_VOLUME_FLOW:  return gk_volume_flow_from(value, unit, (gk_volume_flow *)(void *)out);
    case D_MASS_FLOW:    return gk_mass_flow_from(value, unit, (gk_mass_flow *)(void *)out);
    default:             fail(); return GK_ERR_ARGUMENT;
    }
}

/* gk_<dim>_to() of dimension d, for the SI value si. */
static gk_status typed_to(enum dim d, gk_real si, gk_unit unit, gk_real *out) {
    switch (d) {
    case D_PRESSURE:     { gk_pressure q = { si };     return gk_pressure_to(q, unit, out); }
    case D_TEMPERATURE:  { gk_temperature q = { si };  return gk_temperature_to(q, unit, out); }
    case D_VOLUME:       { gk_volume q = { si };       return gk_volume_to(q, unit, out); }
    case D_AMOUNT:       { gk_amount q = { si };       return gk_amount_to(q, unit, out); }
    case D_MOLAR_MASS:   { gk_molar_mass q = { si };   return gk_molar_mass_to(q, unit, out); }
    case D_MOLAR_VOLUME: { gk_molar_volume q = { si }; return gk_molar_volume_to(q, unit, out); }
    case D_DENSITY:      { gk_density q = { si };      return gk_density_to(q, unit, out); }
    case D_SPEED:        { gk_speed q = { si };        return gk_speed_to(q, unit, out); }
    case D_MASS:         { gk_mass q = { si };         return gk_mass_to(q, unit, out); }
    case D_VOLUME_FLOW:  { gk_volume_flow q = { si };  return gk_volume_flow_to(q, unit, out); }
    case D_MASS_FLOW:    { gk_mass_flow q = { si };    return gk_mass_flow_to(q, unit, out); }
    default:             fail(); return GK_ERR_ARGUMENT;
    }
}

/* Value of 1 unit in SI units via gk_convert(). */
static double si_of_one(gk_unit u) {
    gk_real out = GK_SENTINEL;
    gk_unit si = dims[dim_of(u)].first;
    assert_status(gk_convert((gk_real)1.0, u, si, &out), GK_OK);
    return (double)out;
}

static void assert_untouched(gk_real x) { assert_rel(x, GK_SENTINEL, 0.0); }

/* ------------------------------------------------------------------ table and symbols */
static void table_covers_every_unit(void **state) {
    (void)state;
    for (int u = 0; u < (int)GK_UNIT_COUNT; ++u) {
        const char *sym = gk_unit_symbol((gk_unit)u);
        gk_unit back = (gk_unit)-7;
        assert_non_null(sym);
        assert_string_not_equal(sym, "?");
        assert_true(sym[0] != '\0'); /* every row of the table is filled */
        /* ASCII only */
        for (const char *c = sym; *c != '\0'; ++c) assert_true((unsigned char)*c < 128u);
        /* the symbol parses back to the same unit, so symbols are unique */
        assert_status(gk_unit_parse(sym, &back), GK_OK);
        assert_int_equal((int)back, u);
        (void)dim_of((gk_unit)u);
    }
    assert_string_equal(gk_unit_symbol(GK_UNIT_COUNT), "?");
    assert_string_equal(gk_unit_symbol((gk_unit)999), "?");
    assert_string_equal(gk_unit_symbol((gk_unit)-1), "?");
    assert_string_equal(gk_unit_symbol(GK_UNIT_KPA), "kPa");
    assert_string_equal(gk_unit_symbol(GK_UNIT_DEGC), "degC");
}

/* ------------------------------------------------------------------ published factors */
static void nist_sp811_factors(void **state) {
    (void)state;
    /* Exact or defining values: double to 1e-15 (two roundings), float to 2e-7 (one or two
     * roundings of a 24-bit significand). */
    const double exact = GK_TOL(1e-15, 2e-7);
    assert_rel(si_of_one(GK_UNIT_PA), 1.0, exact);
    assert_rel(si_of_one(GK_UNIT_HPA), 100.0, exact);
    assert_rel(si_of_one(GK_UNIT_KPA), 1000.0, exact);
    assert_rel(si_of_one(GK_UNIT_MPA), 1.0e6, exact);
    assert_rel(si_of_one(GK_UNIT_BAR), 1.0e5, exact);           /* NIST SP 811 B.8: bar = 1.0 E+05 Pa */
    assert_rel(si_of_one(GK_UNIT_MBAR), 100.0, exact);          /* NIST SP 811 B.8: millibar = 1.0 E+02 Pa */
    assert_rel(si_of_one(GK_UNIT_ATM), 101325.0, exact);        /* NIST SP 811 B.8: standard atmosphere */
    assert_rel(si_of_one(GK_UNIT_AT), 98066.5, exact);          /* NIST SP 811 B.8: technical atmosphere */
    assert_rel(si_of_one(GK_UNIT_TORR), 101325.0 / 760.0, exact); /* NIST SP 811 B.8: torr = 101325/760 Pa */
    assert_rel(si_of_one(GK_UNIT_MMHG), 133.322387415, exact);  /* conventional mmHg, 13595.1 x 9.80665 x 1e-3 */
    assert_rel(si_of_one(GK_UNIT_INHG), 3386.389, exact);       /* NIST SP 811 B.8: inHg (conventional) 3.386389 E+03 */
    assert_rel(si_of_one(GK_UNIT_INHG), 3386.38864, 2e-7);      /* exact conventional figure, within SP 811 rounding */
    assert_rel(si_of_one(GK_UNIT_PSI), 6894.757293168, GK_TOL(1e-12, 2e-7)); /* NIST SP 811 B.8, lbf/in2 */
    assert_rel(si_of_one(GK_UNIT_L), 1.0e-3, exact);            /* NIST SP 811 B.8: liter */
    assert_rel(si_of_one(GK_UNIT_ML), 1.0e-6, exact);
    assert_rel(si_of_one(GK_UNIT_FT3), 0.3048 * 0.3048 * 0.3048, exact); /* NIST SP 811: ft = 0.3048 m */
    assert_rel(si_of_one(GK_UNIT_IN3), 0.0254 * 0.0254 * 0.0254, exact); /* NIST SP 811: in = 0.0254 m */
    assert_rel(si_of_one(GK_UNIT_GAL_US), 3.785411784e-3, exact);        /* NIST SP 811: gallon (U.S.) 231 in3 */
    assert_rel(si_of_one(GK_UNIT_GAL_US), 231.0 * 0.0254 * 0.0254 * 0.0254, GK_TOL(1e-14, 2e-7));
    assert_rel(si_of_one(GK_UNIT_LB), 0.45359237, exact);       /* NIST SP 811: pound (avoirdupois) */
    assert_rel(si_of_one(GK_UNIT_LBMOL), 453.59237, exact);     /* 1 lbmol = 453.59237 mol (common practice) */
    assert_rel(si_of_one(GK_UNIT_KMOL), 1000.0, exact);
    assert_rel(si_of_one(GK_UNIT_G_PER_MOL), 1.0e-3, exact);
    assert_rel(si_of_one(GK_UNIT_L_PER_MOL), 1.0e-3, exact);
    assert_rel(si_of_one(GK_UNIT_CM3_PER_MOL), 1.0e-6, exact);
    assert_rel(si_of_one(GK_UNIT_G_PER_L), 1.0, exact);
    assert_rel(si_of_one(GK_UNIT_G_PER_CM3), 1000.0, exact);
    /* NIST SP 811 B.8 prints these rounded to 7 digits: tolerance 1e-6 */
    assert_rel(si_of_one(GK_UNIT_LB_PER_FT3), 16.01846, 1e-6);    /* lb/ft3 = 1.601846 E+01 kg/m3 */
    assert_rel(si_of_one(GK_UNIT_KM_PER_H), 0.2777778, 1e-6);     /* km/h = 2.777778 E-01 m/s */
    assert_rel(si_of_one(GK_UNIT_FT3_PER_MIN), 4.719474e-4, 1e-6); /* ft3/min = 4.719474 E-04 m3/s */
    assert_rel(si_of_one(GK_UNIT_LB_PER_H), 1.259979e-4, 1e-6);   /* lb/h = 1.259979 E-04 kg/s */
    assert_rel(si_of_one(GK_UNIT_FT_PER_S), 0.3048, exact);       /* ft/s = 3.048 E-01 m/s */
    assert_rel(si_of_one(GK_UNIT_M3_PER_H), 1.0 / 3600.0, exact);
    assert_rel(si_of_one(GK_UNIT_L_PER_MIN), 1.0e-3 / 60.0, exact);
    assert_rel(si_of_one(GK_UNIT_ML_PER_MIN), 1.0e-6 / 60.0, exact);
    assert_rel(si_of_one(GK_UNIT_KG_PER_H), 1.0 / 3600.0, exact);
    assert_rel(si_of_one(GK_UNIT_G_PER_MIN), 1.0e-3 / 60.0, exact);
    assert_rel(si_of_one(GK_UNIT_G), 1.0e-3, exact);
}

static void temperature_scales(void **state) {
    (void)state;
    gk_real out = GK_SENTINEL;
    /* SI Brochure: T/K = t/degC + 273.15; NIST SP 811 B.9: T/K = (t/degF + 459.67)/1.8,
     * T/K = (T/degR)/1.8, t/degF = 1.8 t/degC + 32. Absolute tolerance in degrees: double
     * 1e-12 (rounding of 273.15, 459.67 and 5/9), float 1e-4 (24-bit significand at ~500). */
    const double tol = GK_TOL(1e-12, 1e-4);
    assert_status(gk_convert((gk_real)0.0, GK_UNIT_DEGC, GK_UNIT_K, &out), GK_OK);
    assert_abs(out, 273.15, tol);
    assert_status(gk_convert((gk_real)-40.0, GK_UNIT_DEGC, GK_UNIT_DEGF, &out), GK_OK);
    assert_abs(out, -40.0, tol);  /* -40 degC = -40 degF (NIST SP 811 (2008), Appendix B) */
    assert_status(gk_convert((gk_real)-40.0, GK_UNIT_DEGF, GK_UNIT_DEGC, &out), GK_OK);
    assert_abs(out, -40.0, tol);
    assert_status(gk_convert((gk_real)32.0, GK_UNIT_DEGF, GK_UNIT_K, &out), GK_OK);
    assert_abs(out, 273.15, tol);
    assert_status(gk_convert((gk_real)212.0, GK_UNIT_DEGF, GK_UNIT_DEGC, &out), GK_OK);
    assert_abs(out, 100.0, tol);
    assert_status(gk_convert((gk_real)37.0, GK_UNIT_DEGC, GK_UNIT_DEGF, &out), GK_OK);
    assert_abs(out, 98.6, tol);   /* 1.8 x 37 + 32 */
    assert_status(gk_convert((gk_real)491.67, GK_UNIT_DEGR, GK_UNIT_K, &out), GK_OK);
    assert_abs(out, 273.15, tol);
    assert_status(gk_convert((gk_real)60.0, GK_UNIT_DEGF, GK_UNIT_DEGR, &out), GK_OK);
    assert_abs(out, 519.67, tol);
    assert_status(gk_convert((gk_real)100.0, GK_UNIT_K, GK_UNIT_DEGR, &out), GK_OK);
    assert_abs(out, 180.0, tol);
    /* absolute zero itself converts (gk_convert only rejects values below it) */
    assert_status(gk_convert((gk_real)-273.15, GK_UNIT_DEGC, GK_UNIT_DEGF, &out), GK_OK);
    assert_abs(out, -459.67, tol);
    assert_status(gk_convert((gk_real)0.0, GK_UNIT_K, GK_UNIT_DEGR, &out), GK_OK);
    assert_abs(out, 0.0, tol);
    /* typed: 25 degC */
    gk_temperature t = { GK_SENTINEL };
    assert_status(gk_temperature_from((gk_real)25.0, GK_UNIT_DEGC, &t), GK_OK);
    assert_abs(t.k, 298.15, tol);
    assert_status(gk_temperature_to(t, GK_UNIT_DEGF, &out), GK_OK);
    assert_abs(out, 77.0, tol);
}

/* Everyday readings against hand conversion with the SP 811 factors. */
static void everyday_readings(void **state) {
    (void)state;
    gk_real out = GK_SENTINEL;
    const double tol = GK_TOL(1e-14, 3e-7);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_ATM, GK_UNIT_PSI, &out), GK_OK);
    assert_rel(out, 101325.0 / 6894.757293168361, tol);   /* 14.6959... psi */
    assert_status(gk_convert((gk_real)760.0, GK_UNIT_TORR, GK_UNIT_ATM, &out), GK_OK);
    assert_rel(out, 1.0, tol);                            /* definition of the torr */
    assert_status(gk_convert((gk_real)29.92, GK_UNIT_INHG, GK_UNIT_HPA, &out), GK_OK);
    assert_rel(out, 29.92 * 33.86389, tol);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_GAL_US, GK_UNIT_IN3, &out), GK_OK);
    assert_rel(out, 231.0, tol);                          /* SP 811: US gallon = 231 in3 */
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_FT3, GK_UNIT_IN3, &out), GK_OK);
    assert_rel(out, 1728.0, tol);                         /* 12^3 */
    assert_status(gk_convert((gk_real)36.0, GK_UNIT_KM_PER_H, GK_UNIT_M_PER_S, &out), GK_OK);
    assert_rel(out, 10.0, tol);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_LBMOL, GK_UNIT_KMOL, &out), GK_OK);
    assert_rel(out, 0.45359237, tol);
    assert_status(gk_convert((gk_real)60.0, GK_UNIT_L_PER_MIN, GK_UNIT_M3_PER_H, &out), GK_OK);
    assert_rel(out, 3.6, tol);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_G_PER_CM3, GK_UNIT_LB_PER_FT3, &out), GK_OK);
    assert_rel(out, 1000.0 / 16.01846337396014, tol);
    /* signed quantities: a reversed flow keeps its sign */
    assert_status(gk_convert((gk_real)-120.0, GK_UNIT_G_PER_MIN, GK_UNIT_KG_PER_H, &out), GK_OK);
    assert_rel(out, -7.2, tol);
    /* gk_convert does not require > 0 for pressures: differences and gauge readings convert */
    assert_status(gk_convert((gk_real)-0.5, GK_UNIT_BAR, GK_UNIT_KPA, &out), GK_OK);
    assert_rel(out, -50.0, tol);
    assert_status(gk_convert((gk_real)0.0, GK_UNIT_PSI, GK_UNIT_PA, &out), GK_OK);
    assert_abs(out, 0.0, 0.0);
}

/* ------------------------------------------------------------------ round trips */
static void round_trip_every_pair(void **state) {
    (void)state;
    /* Converting to any unit of the same dimension and back: double 1e-14 (four roundings plus
     * the offset of the temperature scales), float 4e-6 (same, with a 24-bit significand). */
    const double tol = GK_TOL(1e-14, 4e-6);
    const gk_real values[] = { (gk_real)0.37, (gk_real)300.0, (gk_real)12345.678, (gk_real)2.5e6 };
    for (int a = 0; a < (int)GK_UNIT_COUNT; ++a) {
        for (int b = 0; b < (int)GK_UNIT_COUNT; ++b) {
            if (dim_of((gk_unit)a) != dim_of((gk_unit)b)) continue;
            for (size_t i = 0; i < sizeof values / sizeof values[0]; ++i) {
                gk_real mid = GK_SENTINEL, back = GK_SENTINEL;
                assert_status(gk_convert(values[i], (gk_unit)a, (gk_unit)b, &mid), GK_OK);
                assert_status(gk_convert(mid, (gk_unit)b, (gk_unit)a, &back), GK_OK);
                if (dim_of((gk_unit)a) == D_TEMPERATURE) {
                    /* the Celsius and Fahrenheit offsets (~273, ~460) set the absolute error */
                    double scale = fabs((double)values[i]) > 1000.0 ? fabs((double)values[i]) : 1000.0;
                    assert_abs(back, values[i], scale * tol);
                } else {
                    assert_rel(back, values[i], tol);
                }
            }
        }
    }
}

static void typed_round_trip_every_unit(void **state) {
    (void)state;
    const double tol = GK_TOL(1e-14, 2e-6);
    for (int u = 0; u < (int)GK_UNIT_COUNT; ++u) {
        enum dim d = dim_of((gk_unit)u);
        gk_real si = GK_SENTINEL, back = GK_SENTINEL, direct = GK_SENTINEL;
        assert_status(typed_from(d, (gk_real)321.5, (gk_unit)u, &si), GK_OK);
        /* the typed function agrees with gk_convert to the SI unit */
        assert_status(gk_convert((gk_real)321.5, (gk_unit)u, dims[d].first, &direct), GK_OK);
        assert_rel(si, direct, 0.0);
        assert_status(typed_to(d, si, (gk_unit)u, &back), GK_OK);
        assert_rel(back, 321.5, tol);
    }
}

/* The conversion has a direct path for ordinary magnitudes and a frexp/ldexp path near the
 * ends of the range; scaling the input by a power of two must scale the output exactly, so the
 * two paths agree bit for bit (IEEE 754: rounding commutes with power-of-two scaling). */
static void fast_and_wide_paths_agree(void **state) {
    (void)state;
    const int shift = (int)GK_TOL(950, 70);
    for (int u = 0; u < (int)GK_UNIT_COUNT; ++u) {
        enum dim d = dim_of((gk_unit)u);
        if (d == D_TEMPERATURE) continue; /* offsets: not a pure scaling */
        for (int b = (int)dims[d].first; b <= (int)dims[d].last; ++b) {
            gk_real small = GK_SENTINEL, wide = GK_SENTINEL;
            gk_real x = (gk_real)0.7310585786300049; /* any value */
            gk_real big = (gk_real)ldexp((double)x, shift);
            gk_real tiny = (gk_real)ldexp((double)x, -shift);
            assert_status(gk_convert(x, (gk_unit)u, (gk_unit)b, &small), GK_OK);
            assert_status(gk_convert(big, (gk_unit)u, (gk_unit)b, &wide), GK_OK);
            assert_rel(ldexp((double)wide, -shift), small, 0.0);
            assert_status(gk_convert(tiny, (gk_unit)u, (gk_unit)b, &wide), GK_OK);
            assert_rel(ldexp((double)wide, shift), small, 0.0);
        }
    }
}

/* ------------------------------------------------------------------ error contract */
static void convert_errors(void **state) {
    (void)state;
    gk_real out = GK_SENTINEL;
    const gk_unit bad[] = { (gk_unit)999, (gk_unit)-1, GK_UNIT_COUNT };
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_PA, GK_UNIT_KPA, NULL), GK_ERR_ARGUMENT);
    for (size_t i = 0; i < 3; ++i) {
        assert_status(gk_convert((gk_real)1.0, bad[i], GK_UNIT_KPA, &out), GK_ERR_ARGUMENT);
        assert_status(gk_convert((gk_real)1.0, GK_UNIT_KPA, bad[i], &out), GK_ERR_ARGUMENT);
    }
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_KPA, GK_UNIT_K, &out), GK_ERR_ARGUMENT);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_L, GK_UNIT_KG, &out), GK_ERR_ARGUMENT);
    assert_status(gk_convert((gk_real)1.0, GK_UNIT_M3_PER_S, GK_UNIT_KG_PER_S, &out), GK_ERR_ARGUMENT);
    /* NULL output wins over bad units */
    assert_status(gk_convert((gk_real)NAN, (gk_unit)999, GK_UNIT_K, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_convert((gk_real)NAN, GK_UNIT_PA, GK_UNIT_KPA, &out), GK_ERR_DOMAIN);
    assert_status(gk_convert((gk_real)INFINITY, GK_UNIT_PA, GK_UNIT_KPA, &out), GK_ERR_DOMAIN);
    assert_status(gk_convert((gk_real)-INFINITY, GK_UNIT_PA, GK_UNIT_KPA, &out), GK_ERR_DOMAIN);
    /* below absolute zero, in every temperature unit */
    assert_status(gk_convert((gk_real)-274.0, GK_UNIT_DEGC, GK_UNIT_K, &out), GK_ERR_DOMAIN);
    assert_status(gk_convert((gk_real)-460.0, GK_UNIT_DEGF, GK_UNIT_DEGC, &out), GK_ERR_DOMAIN);
    assert_status(gk_convert((gk_real)-1.0, GK_UNIT_K, GK_UNIT_DEGC, &out), GK_ERR_DOMAIN);
    assert_status(gk_convert((gk_real)-0.5, GK_UNIT_DEGR, GK_UNIT_K, &out), GK_ERR_DOMAIN);
    /* overflow and underflow of the result */
    assert_status(gk_convert(BIG, GK_UNIT_M3, GK_UNIT_ML, &out), GK_ERR_RANGE);
    assert_status(gk_convert(-BIG, GK_UNIT_M3_PER_S, GK_UNIT_ML_PER_MIN, &out), GK_ERR_RANGE);
    assert_status(gk_convert(BIG, GK_UNIT_MPA, GK_UNIT_PA, &out), GK_ERR_RANGE);
    assert_status(gk_convert(BIG, GK_UNIT_K, GK_UNIT_DEGR, &out), GK_ERR_RANGE);
    assert_status(gk_convert(TINY, GK_UNIT_ML, GK_UNIT_M3, &out), GK_ERR_RANGE);
    assert_untouched(out);
    /* a large value that fits is no overflow: 1e300 mL = 1e294 m3 (float: 1e37 mL) */
    assert_status(gk_convert((gk_real)GK_TOL(1e300, 1e37), GK_UNIT_ML, GK_UNIT_M3, &out), GK_OK);
    assert_rel(out, GK_TOL(1e294, 1e31), GK_TOL(1e-15, 2e-7));
}

static void typed_errors(void **state) {
    (void)state;
    const gk_real nonfinite[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY };
    for (int d = 0; d < D_COUNT; ++d) {
        const dim_info *di = &dims[d];
        gk_unit si_unit = di->first;
        gk_real out = GK_SENTINEL;
        /* NULL output */
        assert_status(typed_from((enum dim)d, (gk_real)1.0, si_unit, NULL), GK_ERR_ARGUMENT);
        assert_status(typed_to((enum dim)d, (gk_real)1.0, si_unit, NULL), GK_ERR_ARGUMENT);
        /* units out of range or of another dimension */
        const gk_unit bad[] = { (gk_unit)999, (gk_unit)-1, GK_UNIT_COUNT, foreign_unit((enum dim)d) };
        for (size_t i = 0; i < 4; ++i) {
            assert_status(typed_from((enum dim)d, (gk_real)1.0, bad[i], &out), GK_ERR_ARGUMENT);
            assert_status(typed_to((enum dim)d, (gk_real)1.0, bad[i], &out), GK_ERR_ARGUMENT);
        }
        /* not finite */
        for (size_t i = 0; i < 3; ++i) {
            assert_status(typed_from((enum dim)d, nonfinite[i], si_unit, &out), GK_ERR_DOMAIN);
            assert_status(typed_to((enum dim)d, nonfinite[i], si_unit, &out), GK_ERR_DOMAIN);
        }
        /* sign: absolute quantities must be > 0; speeds and flows take any finite value */
        for (int u = (int)di->first; u <= (int)di->last; ++u) {
            if (di->positive) {
                /* the SI value 0 or below is outside the domain in every unit */
                assert_status(typed_to((enum dim)d, (gk_real)0.0, (gk_unit)u, &out), GK_ERR_DOMAIN);
                assert_status(typed_to((enum dim)d, (gk_real)-1.0, (gk_unit)u, &out), GK_ERR_DOMAIN);
                /* a reading of 0 or below, except on the Celsius and Fahrenheit scales */
                if (d != D_TEMPERATURE || u == GK_UNIT_K || u == GK_UNIT_DEGR) {
                    assert_status(typed_from((enum dim)d, (gk_real)0.0, (gk_unit)u, &out), GK_ERR_DOMAIN);
                    assert_status(typed_from((enum dim)d, (gk_real)-1.0, (gk_unit)u, &out), GK_ERR_DOMAIN);
                    assert_status(typed_from((enum dim)d, -TINY, (gk_unit)u, &out), GK_ERR_DOMAIN);
                }
            }
        }
        assert_untouched(out);
        if (!di->positive) {
            gk_real v = GK_SENTINEL;
            assert_status(typed_from((enum dim)d, (gk_real)0.0, si_unit, &v), GK_OK);
            assert_abs(v, 0.0, 0.0);
            assert_status(typed_from((enum dim)d, (gk_real)-2.0, di->last, &v), GK_OK);
            assert_true(v < 0);
            assert_status(typed_to((enum dim)d, (gk_real)-2.0, di->last, &v), GK_OK);
            assert_true(v < 0);
        }
        /* overflow: from a unit larger than the SI unit, to a smaller one */
        if (di->big >= 0) {
            assert_status(typed_from((enum dim)d, BIG, (gk_unit)di->big, &out), GK_ERR_RANGE);
            assert_status(typed_to((enum dim)d, TINY, (gk_unit)di->big, &out), GK_ERR_RANGE);
        }
        if (di->small >= 0) {
            assert_status(typed_to((enum dim)d, BIG, (gk_unit)di->small, &out), GK_ERR_RANGE);
            assert_status(typed_from((enum dim)d, TINY, (gk_unit)di->small, &out), GK_ERR_RANGE);
        }
        assert_untouched(out);
    }
    /* temperatures at or below absolute zero in every scale */
    gk_temperature t = { GK_SENTINEL };
    assert_status(gk_temperature_from((gk_real)-273.15, GK_UNIT_DEGC, &t), GK_ERR_DOMAIN);
    assert_status(gk_temperature_from((gk_real)-300.0, GK_UNIT_DEGC, &t), GK_ERR_DOMAIN);
    assert_status(gk_temperature_from((gk_real)-459.67, GK_UNIT_DEGF, &t), GK_ERR_DOMAIN);
    assert_status(gk_temperature_from((gk_real)-500.0, GK_UNIT_DEGF, &t), GK_ERR_DOMAIN);
    assert_status(gk_temperature_from((gk_real)0.0, GK_UNIT_DEGR, &t), GK_ERR_DOMAIN);
    assert_untouched(t.k);
    /* but sub-zero Celsius and Fahrenheit readings are fine */
    assert_status(gk_temperature_from((gk_real)-196.0, GK_UNIT_DEGC, &t), GK_OK);
    assert_rel(t.k, 77.15, GK_TOL(1e-14, 3e-7));
}

/* ------------------------------------------------------------------ gauge pressure */
static void gauge_pressure(void **state) {
    (void)state;
    const double tol = GK_TOL(1e-15, 2e-7);
    gk_pressure ambient = { (gk_real)101325.0 }, p = { GK_SENTINEL };
    /* a 2.5 bar gauge reading at 101.325 kPa ambient: 250 kPa + 101.325 kPa (hand computation) */
    assert_status(gk_pressure_from_gauge((gk_real)2.5, GK_UNIT_BAR, ambient, &p), GK_OK);
    assert_rel(p.pa, 351325.0, tol);
    /* a vacuum gauge: -0.6 bar */
    assert_status(gk_pressure_from_gauge((gk_real)-0.6, GK_UNIT_BAR, ambient, &p), GK_OK);
    assert_rel(p.pa, 41325.0, GK_TOL(1e-14, 4e-7));
    /* 30 psig at one standard atmosphere: 30 psi x 6894.757293168361 Pa + 101325 Pa (psi exact from
     * NIST SP 811: lbf = 0.45359237 kg x 9.80665 m/s2, in = 0.0254 m) */
    /* near the largest value (DBL_MAX / FLT_MAX, IEEE 754): a sum that rounds to it is GK_OK
       (computed without an intermediate infinity), one beyond it GK_ERR_RANGE */
    {
        const gk_real big = (gk_real)GK_TOL(1.7976931348623157e308, 3.4028234663852886e38);
        const gk_pressure huge_ambient = { big };
        gk_pressure q = { GK_SENTINEL };
        assert_status(gk_pressure_from_gauge(big, GK_UNIT_PA, ambient, &q), GK_OK);
        /* IEEE 754 round to nearest: 101325 Pa is far below half an ulp of the largest value */
        assert_true(!(q.pa < big) && !(q.pa > big));
        q.pa = GK_SENTINEL;
        assert_status(gk_pressure_from_gauge(big, GK_UNIT_PA, huge_ambient, &q), GK_ERR_RANGE);
        assert_true(!(q.pa < GK_SENTINEL) && !(q.pa > GK_SENTINEL));
    }
    assert_status(gk_pressure_from_gauge((gk_real)30.0, GK_UNIT_PSI, ambient, &p), GK_OK);
    assert_rel(p.pa, 30.0 * 6894.757293168361 + 101325.0, GK_TOL(1e-14, 2e-7));
    /* zero reading: the ambient itself */
    assert_status(gk_pressure_from_gauge((gk_real)0.0, GK_UNIT_KPA, ambient, &p), GK_OK);
    assert_rel(p.pa, 101325.0, 0.0);

    /* errors */
    gk_pressure s = { GK_SENTINEL };
    assert_status(gk_pressure_from_gauge((gk_real)1.0, GK_UNIT_BAR, ambient, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_pressure_from_gauge((gk_real)1.0, GK_UNIT_DEGC, ambient, &s), GK_ERR_ARGUMENT);
    assert_status(gk_pressure_from_gauge((gk_real)1.0, (gk_unit)999, ambient, &s), GK_ERR_ARGUMENT);
    assert_status(gk_pressure_from_gauge((gk_real)1.0, (gk_unit)-1, ambient, &s), GK_ERR_ARGUMENT);
    assert_status(gk_pressure_from_gauge((gk_real)NAN, GK_UNIT_BAR, ambient, &s), GK_ERR_DOMAIN);
    assert_status(gk_pressure_from_gauge((gk_real)INFINITY, GK_UNIT_BAR, ambient, &s), GK_ERR_DOMAIN);
    assert_status(gk_pressure_from_gauge((gk_real)-INFINITY, GK_UNIT_BAR, ambient, &s), GK_ERR_DOMAIN);
    const gk_real bad_ambient[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY,
                                    (gk_real)0.0, (gk_real)-101325.0 };
    for (size_t i = 0; i < 5; ++i) {
        gk_pressure a = { bad_ambient[i] };
        assert_status(gk_pressure_from_gauge((gk_real)1.0, GK_UNIT_BAR, a, &s), GK_ERR_DOMAIN);
    }
    /* the absolute pressure would be 0 or negative */
    assert_status(gk_pressure_from_gauge((gk_real)-101.325, GK_UNIT_KPA, ambient, &s), GK_ERR_DOMAIN);
    assert_status(gk_pressure_from_gauge((gk_real)-2.0, GK_UNIT_BAR, ambient, &s), GK_ERR_DOMAIN);
    /* overflow */
    assert_status(gk_pressure_from_gauge(BIG, GK_UNIT_MPA, ambient, &s), GK_ERR_RANGE);
    assert_untouched(s.pa);
}

/* ------------------------------------------------------------------ parsing */
static void parse_symbols_and_aliases(void **state) {
    (void)state;
    static const struct { const char *text; gk_unit unit; } cases[] = {
        /* the symbols listed in units.h */
        { "Pa", GK_UNIT_PA }, { "kPa", GK_UNIT_KPA }, { "MPa", GK_UNIT_MPA }, { "bar", GK_UNIT_BAR },
        { "mbar", GK_UNIT_MBAR }, { "hPa", GK_UNIT_HPA }, { "atm", GK_UNIT_ATM }, { "at", GK_UNIT_AT },
        { "Torr", GK_UNIT_TORR }, { "mmHg", GK_UNIT_MMHG }, { "inHg", GK_UNIT_INHG }, { "psi", GK_UNIT_PSI },
        { "K", GK_UNIT_K }, { "degC", GK_UNIT_DEGC }, { "\xC2\xB0" "C", GK_UNIT_DEGC },
        { "degF", GK_UNIT_DEGF }, { "\xC2\xB0" "F", GK_UNIT_DEGF }, { "degR", GK_UNIT_DEGR },
        { "m3", GK_UNIT_M3 }, { "L", GK_UNIT_L }, { "mL", GK_UNIT_ML }, { "ft3", GK_UNIT_FT3 },
        { "gal", GK_UNIT_GAL_US }, { "mol", GK_UNIT_MOL }, { "kmol", GK_UNIT_KMOL },
        { "lbmol", GK_UNIT_LBMOL }, { "g/mol", GK_UNIT_G_PER_MOL }, { "kg/m3", GK_UNIT_KG_PER_M3 },
        { "g/L", GK_UNIT_G_PER_L }, { "m/s", GK_UNIT_M_PER_S }, { "km/h", GK_UNIT_KM_PER_H },
        { "kg", GK_UNIT_KG }, { "g", GK_UNIT_G }, { "lb", GK_UNIT_LB }, { "m3/h", GK_UNIT_M3_PER_H },
        { "L/min", GK_UNIT_L_PER_MIN }, { "mL/min", GK_UNIT_ML_PER_MIN }, { "kg/h", GK_UNIT_KG_PER_H },
        /* aliases */
        { "torr", GK_UNIT_TORR }, { "l", GK_UNIT_L }, { "ml", GK_UNIT_ML }, { "psia", GK_UNIT_PSI },
        { "\xE2\x84\x83", GK_UNIT_DEGC }, { "\xE2\x84\x89", GK_UNIT_DEGF },
        { "\xC2\xB0" "R", GK_UNIT_DEGR }, { "l/min", GK_UNIT_L_PER_MIN }, { "g/l", GK_UNIT_G_PER_L },
        { "cm3", GK_UNIT_ML }, { "m^3", GK_UNIT_M3 }, { "kg/m^3", GK_UNIT_KG_PER_M3 },
        { "cfm", GK_UNIT_FT3_PER_MIN }, { "kgf/cm2", GK_UNIT_AT },
    };
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
        gk_unit u = (gk_unit)-7;
        assert_status(gk_unit_parse(cases[i].text, &u), GK_OK);
        assert_int_equal((int)u, (int)cases[i].unit);
    }
}

static void parse_rejects(void **state) {
    (void)state;
    static const char *const rejects[] = {
        "", "k", "kP", "kPa ", " kPa", "kPax", "kpa", "KPA", "Mbar", "MBAR", "pa", "deg",
        "degc", "\xC2\xB0", "\xC2", ("\xC2\xB0" "C "), "m", "L/", "ft", "psig", "bar(g)", "furlong",
        "mol/", "g/mo",
    };
    for (size_t i = 0; i < sizeof rejects / sizeof rejects[0]; ++i) {
        gk_unit u = (gk_unit)-7;
        assert_status(gk_unit_parse(rejects[i], &u), GK_ERR_NOT_FOUND);
        assert_int_equal((int)u, -7);
    }
    /* stops at the NUL: "k\0Pa" is "k" */
    const char buf[5] = { 'k', '\0', 'P', 'a', '\0' };
    gk_unit u = (gk_unit)-7;
    assert_status(gk_unit_parse(buf, &u), GK_ERR_NOT_FOUND);
    /* the longest spellings with one character more, and a long text: compared with at most
       the 9 bytes of a table entry, never matched */
    assert_status(gk_unit_parse("cm^3/molX", &u), GK_ERR_NOT_FOUND);
    assert_status(gk_unit_parse("ft3/minute", &u), GK_ERR_NOT_FOUND);
    {
        char longtext[300];
        memset(longtext, 'k', sizeof longtext - 1u);
        longtext[sizeof longtext - 1u] = '\0';
        assert_status(gk_unit_parse(longtext, &u), GK_ERR_NOT_FOUND);
    }
    assert_int_equal((int)u, -7);
    /* the longest spelling as a text of its own matches */
    assert_status(gk_unit_parse("cm^3/mol", &u), GK_OK);
    assert_int_equal((int)u, (int)GK_UNIT_CM3_PER_MOL);
    u = (gk_unit)-7;
    /* NULL */
    assert_status(gk_unit_parse(NULL, &u), GK_ERR_ARGUMENT);
    assert_status(gk_unit_parse("kPa", NULL), GK_ERR_ARGUMENT);
    assert_status(gk_unit_parse(NULL, NULL), GK_ERR_ARGUMENT);
    assert_int_equal((int)u, -7);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(table_covers_every_unit),
        cmocka_unit_test(nist_sp811_factors),
        cmocka_unit_test(temperature_scales),
        cmocka_unit_test(everyday_readings),
        cmocka_unit_test(round_trip_every_pair),
        cmocka_unit_test(typed_round_trip_every_unit),
        cmocka_unit_test(fast_and_wide_paths_agree),
        cmocka_unit_test(convert_errors),
        cmocka_unit_test(typed_errors),
        cmocka_unit_test(gauge_pressure),
        cmocka_unit_test(parse_symbols_and_aliases),
        cmocka_unit_test(parse_rejects),
    };
    return cmocka_run_group_tests_name("units", tests, NULL, NULL);
}
