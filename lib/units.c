/*
 * units.c - unit table, gk_convert(), gk_unit_parse(), gk_unit_symbol() and the typed
 * _from / _to conversions of every quantity.
 *
 * One table row per gk_unit (designated initialisers keep it in enum order; a compile-time
 * check keeps it GK_UNIT_COUNT rows long). A row gives the unit's dimension, its symbol and
 * its SI value as a ratio num / den plus an offset for the temperature scales (degC, degF:
 * gk_unit_offset()):
 *
 *     SI = (value + offset) * num / den        value = SI * den / num - offset
 *
 * The ratio form lets every factor be written as its exact definition (torr = 101325/760 Pa,
 * degree Rankine = 5/9 K, km/h = 1000/3600 m/s) instead of a rounded decimal. The scaling
 * goes through frexp/ldexp (see gk_scaled.h), so a representable result never overflows in
 * an intermediate step.
 *
 * Every public _from / _to function is a one-line wrapper over quantity_from() and
 * quantity_to().
 */
#include <stdbool.h>

#include "gk_scaled.h"

/* Dimensions (unsigned constants, the type of a row's dim field); the typed functions check
 * that a unit belongs to theirs. */
#define GK_DIM_PRESSURE 0u
#define GK_DIM_TEMPERATURE 1u
#define GK_DIM_VOLUME 2u
#define GK_DIM_AMOUNT 3u
#define GK_DIM_MOLAR_MASS 4u
#define GK_DIM_MOLAR_VOLUME 5u
#define GK_DIM_DENSITY 6u
#define GK_DIM_SPEED 7u
#define GK_DIM_MASS 8u
#define GK_DIM_VOLUME_FLOW 9u
#define GK_DIM_MASS_FLOW 10u

/* The symbol is held in the row (the longest, "cm3/mol" and "ft3/min", has 7 characters), so
 * a row needs no pointer and the table no separate strings (firmware size). In the float build
 * a row holds the factor num / den itself, rounded once at compile time to the same float the
 * double-free ratio form gave (the ratio form is kept for exactness in double builds). */
#define GK_UNIT_SYMBOL_SIZE 8
typedef struct gk_unit_row {
    /* ASCII symbol returned by gk_unit_symbol() and accepted by gk_unit_parse() */
    char symbol[GK_UNIT_SYMBOL_SIZE];
#if GK_REAL_IS_FLOAT
    gk_real factor; /* one unit (after the offset) is factor SI units */
#else
    gk_real num; /* one unit (after the offset) is num / den SI units */
    gk_real den;
#endif
    unsigned char dim; /* GK_DIM_... */
} gk_unit_row;

/* clang-format off */
#if GK_REAL_IS_FLOAT
#  define ROW(dim, sym, num, den) { sym, GK_LIT(num) / GK_LIT(den), (unsigned char)GK_DIM_##dim }
#  define ROW_TO_SI(u) (u)->factor, GK_LIT(1.0)
#  define ROW_FROM_SI(u) GK_LIT(1.0), (u)->factor
#else
#  define ROW(dim, sym, num, den) { sym, GK_LIT(num), GK_LIT(den), (unsigned char)GK_DIM_##dim }
#  define ROW_TO_SI(u) (u)->num, (u)->den
#  define ROW_FROM_SI(u) (u)->den, (u)->num
#endif
/* Temperature rows; the offsets of degC and degF are given by gk_unit_offset(). */
#define TROW(sym, num, den) ROW(TEMPERATURE, sym, num, den)

/* SP 811 = NIST Special Publication 811 (2008 edition), Appendix B.8 / B.9 (factors in
 * alphabetical order / by kind of quantity). Where SP 811 prints a rounded factor the exact
 * definition it rests on is used and the printed figure given for comparison. */
static const gk_unit_row gk_units[GK_UNIT_COUNT] = {
    /* ---- pressure, SI unit Pa */
    [GK_UNIT_PA]   = ROW(PRESSURE, "Pa",   1.0, 1.0),
    [GK_UNIT_HPA]  = ROW(PRESSURE, "hPa",  100.0, 1.0),          /* SI prefix hecto */
    [GK_UNIT_KPA]  = ROW(PRESSURE, "kPa",  1000.0, 1.0),         /* SI prefix kilo */
    [GK_UNIT_MPA]  = ROW(PRESSURE, "MPa",  1.0e6, 1.0),          /* SI prefix mega */
    [GK_UNIT_BAR]  = ROW(PRESSURE, "bar",  1.0e5, 1.0),          /* SP 811: bar = 1.0 E+05 Pa, exact */
    [GK_UNIT_MBAR] = ROW(PRESSURE, "mbar", 100.0, 1.0),          /* SP 811: millibar = 1.0 E+02 Pa, exact */
    [GK_UNIT_ATM]  = ROW(PRESSURE, "atm",  101325.0, 1.0),       /* SP 811: atmosphere, standard = 1.01325 E+05 Pa, exact */
    [GK_UNIT_AT]   = ROW(PRESSURE, "at",   98066.5, 1.0),        /* SP 811: atmosphere, technical (kgf/cm2) = 9.80665 E+04 Pa, exact */
    [GK_UNIT_TORR] = ROW(PRESSURE, "Torr", 101325.0, 760.0),     /* SP 811: torr = 101325/760 Pa (printed 1.333224 E+02) */
    /* SP 811: millimeter of mercury, conventional = 1.333224 E+02 Pa; exact conventional value
     * 13595.1 kg/m3 x 9.80665 m/s2 x 1 mm = 133.322387415 Pa (SP 811 B.8 footnote) */
    [GK_UNIT_MMHG] = ROW(PRESSURE, "mmHg", 133.322387415, 1.0),
    /* SP 811: inch of mercury, conventional = 3.386389 E+03 Pa, the rounded figure used here;
     * the exact conventional value 13595.1 x 9.80665 x 0.0254 = 3386.38864 Pa differs by 1e-7 rel. */
    [GK_UNIT_INHG] = ROW(PRESSURE, "inHg", 3386.389, 1.0),
    /* SP 811: pound-force per square inch = 6.894757 E+03 Pa; exact from lbf = 4.4482216152605 N
     * (0.45359237 kg x 9.80665 m/s2) over in2 = 6.4516 E-04 m2: 6894.757293168 Pa */
    [GK_UNIT_PSI]  = ROW(PRESSURE, "psi",  4.4482216152605, 6.4516e-4),

    /* ---- temperature, SI unit K (converted as temperatures, not differences) */
    [GK_UNIT_K]    = TROW("K",    1.0, 1.0),
    [GK_UNIT_DEGC] = TROW("degC", 1.0, 1.0),                     /* offset: gk_unit_offset() */
    [GK_UNIT_DEGF] = TROW("degF", 5.0, 9.0),                     /* offset: gk_unit_offset() */
    [GK_UNIT_DEGR] = TROW("degR", 5.0, 9.0),                     /* SP 811 B.9: T/K = (T/degR)/1.8, exact */

    /* ---- volume, SI unit m3 */
    [GK_UNIT_M3]     = ROW(VOLUME, "m3",  1.0, 1.0),
    [GK_UNIT_L]      = ROW(VOLUME, "L",   1.0e-3, 1.0),          /* SP 811: liter = 1.0 E-03 m3, exact (CGPM 1964) */
    [GK_UNIT_ML]     = ROW(VOLUME, "mL",  1.0e-6, 1.0),          /* SI prefix milli on the liter */
    [GK_UNIT_FT3]    = ROW(VOLUME, "ft3", 0.028316846592, 1.0),  /* SP 811: cubic foot = 2.831685 E-02 m3; exact 0.3048^3 */
    [GK_UNIT_IN3]    = ROW(VOLUME, "in3", 1.6387064e-5, 1.0),    /* SP 811: cubic inch = 1.638706 E-05 m3; exact 0.0254^3 */
    [GK_UNIT_GAL_US] = ROW(VOLUME, "gal", 3.785411784e-3, 1.0),  /* SP 811: gallon (U.S.) = 3.785412 E-03 m3; exact 231 in3 */

    /* ---- amount of substance, SI unit mol */
    [GK_UNIT_MOL]   = ROW(AMOUNT, "mol",   1.0, 1.0),
    [GK_UNIT_MMOL]  = ROW(AMOUNT, "mmol",  1.0e-3, 1.0),
    [GK_UNIT_KMOL]  = ROW(AMOUNT, "kmol",  1.0e3, 1.0),
    /* pound-mole: the amount whose mass in lb equals the molar mass in g/mol, so
     * 1 lbmol = 453.59237 mol, from SP 811 pound (avoirdupois) = 0.45359237 kg (common practice) */
    [GK_UNIT_LBMOL] = ROW(AMOUNT, "lbmol", 453.59237, 1.0),

    /* ---- molar mass, SI unit kg/mol */
    [GK_UNIT_KG_PER_MOL] = ROW(MOLAR_MASS, "kg/mol", 1.0, 1.0),
    [GK_UNIT_G_PER_MOL]  = ROW(MOLAR_MASS, "g/mol",  1.0e-3, 1.0),

    /* ---- molar volume, SI unit m3/mol */
    [GK_UNIT_M3_PER_MOL]  = ROW(MOLAR_VOLUME, "m3/mol",  1.0, 1.0),
    [GK_UNIT_L_PER_MOL]   = ROW(MOLAR_VOLUME, "L/mol",   1.0e-3, 1.0),  /* liter as above */
    [GK_UNIT_CM3_PER_MOL] = ROW(MOLAR_VOLUME, "cm3/mol", 1.0e-6, 1.0),  /* (1e-2 m)^3, exact */

    /* ---- mass density, SI unit kg/m3 */
    [GK_UNIT_KG_PER_M3]  = ROW(DENSITY, "kg/m3",  1.0, 1.0),
    [GK_UNIT_G_PER_L]    = ROW(DENSITY, "g/L",    1.0, 1.0),         /* 1e-3 kg / 1e-3 m3, exact */
    [GK_UNIT_G_PER_CM3]  = ROW(DENSITY, "g/cm3",  1000.0, 1.0),      /* 1e-3 kg / 1e-6 m3, exact */
    /* SP 811: pound per cubic foot = 1.601846 E+01 kg/m3; exact 0.45359237 / 0.3048^3 */
    [GK_UNIT_LB_PER_FT3] = ROW(DENSITY, "lb/ft3", 0.45359237, 0.028316846592),

    /* ---- speed, SI unit m/s */
    [GK_UNIT_M_PER_S]  = ROW(SPEED, "m/s",  1.0, 1.0),
    [GK_UNIT_KM_PER_H] = ROW(SPEED, "km/h", 1000.0, 3600.0),     /* SP 811: kilometer per hour = 2.777778 E-01 m/s; exact 1000/3600 */
    [GK_UNIT_FT_PER_S] = ROW(SPEED, "ft/s", 0.3048, 1.0),        /* SP 811: foot per second = 3.048 E-01 m/s, exact */

    /* ---- mass, SI unit kg */
    [GK_UNIT_KG] = ROW(MASS, "kg", 1.0, 1.0),
    [GK_UNIT_G]  = ROW(MASS, "g",  1.0e-3, 1.0),
    [GK_UNIT_LB] = ROW(MASS, "lb", 0.45359237, 1.0),             /* SP 811: pound (avoirdupois) = 4.5359237 E-01 kg, exact */

    /* ---- volume flow, SI unit m3/s */
    [GK_UNIT_M3_PER_S]    = ROW(VOLUME_FLOW, "m3/s",    1.0, 1.0),
    [GK_UNIT_M3_PER_H]    = ROW(VOLUME_FLOW, "m3/h",    1.0, 3600.0),
    [GK_UNIT_L_PER_MIN]   = ROW(VOLUME_FLOW, "L/min",   1.0e-3, 60.0),
    [GK_UNIT_ML_PER_MIN]  = ROW(VOLUME_FLOW, "mL/min",  1.0e-6, 60.0),
    /* SP 811: cubic foot per minute = 4.719474 E-04 m3/s; exact 0.3048^3 / 60 */
    [GK_UNIT_FT3_PER_MIN] = ROW(VOLUME_FLOW, "ft3/min", 0.028316846592, 60.0),

    /* ---- mass flow, SI unit kg/s */
    [GK_UNIT_KG_PER_S]  = ROW(MASS_FLOW, "kg/s",  1.0, 1.0),
    [GK_UNIT_KG_PER_H]  = ROW(MASS_FLOW, "kg/h",  1.0, 3600.0),
    [GK_UNIT_G_PER_MIN] = ROW(MASS_FLOW, "g/min", 1.0e-3, 60.0),
    /* SP 811: pound per hour = 1.259979 E-04 kg/s; exact 0.45359237 / 3600 */
    [GK_UNIT_LB_PER_H]  = ROW(MASS_FLOW, "lb/h",  0.45359237, 3600.0),
};

/* The table is sized by GK_UNIT_COUNT and filled by designated initialisers in enum order; a row
   left out would have an empty symbol, which tests/test_units.c (table_covers_every_unit)
   rejects. */

/* Extra spellings accepted by gk_unit_parse() besides the symbols of the table. */
/* The text is held in the entry (the longest, "cm^3/mol" and "ft^3/min", has 8 bytes): no
   pointers and no separate strings (firmware size). */
#define GK_UNIT_ALIAS_SIZE 9
typedef struct gk_unit_alias { char text[GK_UNIT_ALIAS_SIZE]; unsigned char unit; } gk_unit_alias;

static const gk_unit_alias gk_unit_aliases[] = {
    { "torr", GK_UNIT_TORR },
    { "kgf/cm2", GK_UNIT_AT },
    { "psia", GK_UNIT_PSI },            /* absolute psi: gaskit pressures are absolute */
    { "lbf/in2", GK_UNIT_PSI },
    { "\xC2\xB0\x43", GK_UNIT_DEGC },   /* U+00B0 DEGREE SIGN, C (0x43) */
    { "\xE2\x84\x83", GK_UNIT_DEGC },   /* U+2103 DEGREE CELSIUS */
    { "\xC2\xB0\x46", GK_UNIT_DEGF },   /* U+00B0 DEGREE SIGN, F (0x46) */
    { "\xE2\x84\x89", GK_UNIT_DEGF },   /* U+2109 DEGREE FAHRENHEIT */
    { "\xC2\xB0\x52", GK_UNIT_DEGR },   /* U+00B0 DEGREE SIGN, R (0x52) */
    { "m^3", GK_UNIT_M3 },
    { "l", GK_UNIT_L },
    { "dm3", GK_UNIT_L },
    { "ml", GK_UNIT_ML },
    { "cm3", GK_UNIT_ML },
    { "ft^3", GK_UNIT_FT3 },
    { "in^3", GK_UNIT_IN3 },
    { "gal_US", GK_UNIT_GAL_US },
    { "l/mol", GK_UNIT_L_PER_MOL },
    { "m^3/mol", GK_UNIT_M3_PER_MOL },
    { "cm^3/mol", GK_UNIT_CM3_PER_MOL },
    { "kg/m^3", GK_UNIT_KG_PER_M3 },
    { "g/l", GK_UNIT_G_PER_L },
    { "g/cm^3", GK_UNIT_G_PER_CM3 },
    { "lb/ft^3", GK_UNIT_LB_PER_FT3 },
    { "m^3/s", GK_UNIT_M3_PER_S },
    { "m^3/h", GK_UNIT_M3_PER_H },
    { "l/min", GK_UNIT_L_PER_MIN },
    { "ml/min", GK_UNIT_ML_PER_MIN },
    { "ft^3/min", GK_UNIT_FT3_PER_MIN },
    { "cfm", GK_UNIT_FT3_PER_MIN },
};
/* clang-format on */

/* Dimensions whose values must be > 0 in the typed functions (absolute quantities); speed and
 * the flows may take any finite value (direction of flow or motion). */
static bool gk_dim_positive(unsigned int dim) {
    return (dim != GK_DIM_SPEED) && (dim != GK_DIM_VOLUME_FLOW) && (dim != GK_DIM_MASS_FLOW);
}

/* The row of a unit, or NULL for a value outside the enum. */
static const gk_unit_row *gk_unit_row_of(gk_unit unit) {
    /* compare as int: an out-of-range enum may be negative */
    int u = (int)unit;
    if (u < 0 || u >= (int)GK_UNIT_COUNT) { return NULL; }
    return &gk_units[u];
}

/* Added to the value before scaling: 0 except for the two temperature scales with an offset
 * zero (at most 459.67, so adding it cannot overflow a finite value). */
static gk_real gk_unit_offset(const gk_unit_row *u) {
    if (u == &gk_units[GK_UNIT_DEGC]) {
        return GK_LIT(273.15); /* SI Brochure: T/K = t/degC + 273.15, exact */
    }
    if (u == &gk_units[GK_UNIT_DEGF]) {
        return GK_LIT(459.67); /* SP 811 B.9: T/K = (t/degF + 459.67)/1.8, exact */
    }
    return GK_LIT(0.0);
}

/* Fast-path bound of gk_scale(): the table ratios num / den lie within [2^-40, 2^40] (they span
 * 1e-6 / 60 .. 1e6), so for |x| within [2^-B, 2^B] the product stays inside the normal range
 * (B = 900 for binary64, B = 60 for binary32: exact powers of two). */
#if GK_REAL_IS_FLOAT
#  define GK_SCALE_HI GK_LIT(0x1p60)
#  define GK_SCALE_LO GK_LIT(0x1p-60)
#else
#  define GK_SCALE_HI GK_LIT(0x1p900)
#  define GK_SCALE_LO GK_LIT(0x1p-900)
#endif

/* Binary exponents of the normal range: m 2^k with 0.5 <= |m| < 1 is finite for k <= MAX_EXP and
 * normal for k >= MIN_EXP (C99 5.2.4.2.2: DBL_MAX_EXP 1024, DBL_MIN_EXP -1021; FLT_MAX_EXP 128,
 * FLT_MIN_EXP -125 for IEEE 754 binary64 / binary32). */
#if GK_REAL_IS_FLOAT
#  define GK_UNIT_MAX_EXP 128
#  define GK_UNIT_MIN_EXP (-125)
#else
#  define GK_UNIT_MAX_EXP 1024
#  define GK_UNIT_MIN_EXP (-1021)
#endif
/* Any binary exponent frexp() returns for a finite value (subnormals included) lies inside. */
#define GK_UNIT_EXP_BOUND 1100

/* x * num / den without intermediate over/underflow (signed x, num and den > 0).
 * GK_ERR_RANGE when the result overflows, or when a non-zero x gives a result below the
 * smallest normal number. In the fast path |x| * (num / den) is computed and given the sign of
 * x afterwards (round to nearest is symmetric, so this is bit for bit x * (num / den)); since
 * scaling by a power of two commutes with rounding in the normal range, it also gives bit for
 * bit the result of the frexp/ldexp path. The slow path brings the product of the mantissas
 * back into [0.5, 1) and decides overflow and underflow on the exponent before scaling, so no
 * step yields an infinity. */
static gk_status gk_scale(gk_real x, gk_real num, gk_real den, gk_real *out) {
    const gk_real ax = gk_fabs(x);
    const gk_real ratio = num / den;
    int ex = 0;
    int en = 0;
    int ed = 0;
    int em = 0;
    int k;
    gk_real fx;
    gk_real fn;
    gk_real fd;
    gk_real m;
    gk_status s = GK_OK;
    if ((ax >= GK_SCALE_LO) && (ax <= GK_SCALE_HI)) {
        const gk_real r = ax * ratio;
        *out = (x < GK_LIT(0.0)) ? -r : r;
    } else if (!(ax > GK_LIT(0.0))) {
        *out = x * GK_LIT(0.0); /* x is +0 or -0: keeps its sign */
    } else {
        fx = gk_frexp(x, &ex);
        fn = gk_frexp(num, &en);
        fd = gk_frexp(den, &ed);
        m = gk_frexp(fx * (fn / fd), &em); /* |fx fn / fd| in (0.25, 2]: em in -1 ... 2 */
        if ((ex < -GK_UNIT_EXP_BOUND) || (ex > GK_UNIT_EXP_BOUND) || (en < -GK_UNIT_EXP_BOUND) ||
            (en > GK_UNIT_EXP_BOUND) || (ed < -GK_UNIT_EXP_BOUND) || (ed > GK_UNIT_EXP_BOUND) ||
            (em < -2) || (em > 2)) {
            s = GK_ERR_RANGE; /* not reached for finite x, num, den: frexp's exponent range */
        } else {
            k = ((ex + en) - ed) + em;
            if ((k > GK_UNIT_MAX_EXP) || (k < GK_UNIT_MIN_EXP)) {
                s = GK_ERR_RANGE; /* overflow, or below the smallest normal number */
            } else {
                *out = gk_ldexp(m, k); /* exact: the result is normal */
            }
        }
    }
    return s;
}

/* Value in unit row u -> SI value. Temperature below 0 K is GK_ERR_DOMAIN. */
static gk_status gk_to_si(const gk_unit_row *u, gk_real value, gk_real *si) {
    gk_real x;
    if (!gk_finite(value)) { return GK_ERR_DOMAIN; }
    x = value + gk_unit_offset(u); /* offset <= 459.67: cannot overflow a finite value */
    if ((unsigned int)u->dim == GK_DIM_TEMPERATURE && x < GK_LIT(0.0)) { return GK_ERR_DOMAIN; }
    return gk_scale(x, ROW_TO_SI(u), si);
}

/* SI value -> value in unit row u. Temperature below 0 K is GK_ERR_DOMAIN. */
static gk_status gk_from_si(const gk_unit_row *u, gk_real si, gk_real *value) {
    gk_real x = GK_LIT(0.0);
    gk_status s;
    if (!gk_finite(si)) { return GK_ERR_DOMAIN; }
    if ((unsigned int)u->dim == GK_DIM_TEMPERATURE && si < GK_LIT(0.0)) { return GK_ERR_DOMAIN; }
    s = gk_scale(si, ROW_FROM_SI(u), &x);
    if (s != GK_OK) { return s; }
    *value = x - gk_unit_offset(u);
    return GK_OK;
}

gk_status gk_convert(gk_real value, gk_unit from, gk_unit to, gk_real *out) {
    const gk_unit_row *uf = gk_unit_row_of(from);
    const gk_unit_row *ut = gk_unit_row_of(to);
    gk_real si = GK_LIT(0.0), r = GK_LIT(0.0);
    gk_status s;
    if (out == NULL || uf == NULL || ut == NULL || uf->dim != ut->dim) { return GK_ERR_ARGUMENT; }
    s = gk_to_si(uf, value, &si);
    if (s == GK_OK) { s = gk_from_si(ut, si, &r); }
    if (s == GK_OK) { *out = r; }
    return s;
}

/* Typed constructor: value in unit (of dimension dim) -> SI value in *out. */
static gk_status quantity_from(gk_real value, gk_unit unit, unsigned int dim, gk_real *out) {
    const gk_unit_row *u = gk_unit_row_of(unit);
    gk_real si = GK_LIT(0.0);
    gk_status s;
    if (out == NULL || u == NULL || (unsigned int)u->dim != dim) { return GK_ERR_ARGUMENT; }
    if (!gk_finite(value)) { return GK_ERR_DOMAIN; }
    /* sign first, so a tiny negative value is a domain error rather than an underflow */
    if (gk_dim_positive(dim) && dim != GK_DIM_TEMPERATURE && !(value > GK_LIT(0.0))) {
        return GK_ERR_DOMAIN;
    }
    s = gk_to_si(u, value, &si);
    if (s != GK_OK) { return s; }
    if (gk_dim_positive(dim) && !(si > GK_LIT(0.0))) { return GK_ERR_DOMAIN; /* 0 K exactly */ }
    *out = si;
    return GK_OK;
}

/* Typed accessor: SI value si (of dimension dim) -> value in unit, in *out. */
static gk_status quantity_to(gk_real si, gk_unit unit, unsigned int dim, gk_real *out) {
    const gk_unit_row *u = gk_unit_row_of(unit);
    gk_real r = GK_LIT(0.0);
    gk_status s;
    if (out == NULL || u == NULL || (unsigned int)u->dim != dim) { return GK_ERR_ARGUMENT; }
    if (!gk_finite(si)) { return GK_ERR_DOMAIN; }
    if (gk_dim_positive(dim) && !(si > GK_LIT(0.0))) { return GK_ERR_DOMAIN; }
    s = gk_from_si(u, si, &r);
    if (s == GK_OK) { *out = r; }
    return s;
}

/* Does the caller's text equal the table entry (a NUL-terminated text in entry[0 .. size-1])?
 * Reads the caller's text only up to the first difference, so never past its NUL, and never
 * more than size bytes (9 at most: the bound gk_unit_parse() documents). */
static bool gk_unit_text_is(const char *text, const char *entry, size_t size) {
    size_t i = 0;
    bool equal = false;
    bool done = false;
    while (!done && (i < size)) {
        if (text[i] != entry[i]) {
            done = true;
        } else if (entry[i] == '\0') {
            equal = true;
            done = true;
        } else {
            ++i;
        }
    }
    return equal;
}

gk_status gk_unit_parse(const char *symbol, gk_unit *out) {
    size_t i;
    if ((symbol == NULL) || (out == NULL)) { return GK_ERR_ARGUMENT; }
    for (i = 0; i < (sizeof gk_units / sizeof gk_units[0]); ++i) {
        if (gk_unit_text_is(symbol, gk_units[i].symbol, GK_UNIT_SYMBOL_SIZE)) {
            *out = (gk_unit)i;
            return GK_OK;
        }
    }
    for (i = 0; i < (sizeof gk_unit_aliases / sizeof gk_unit_aliases[0]); ++i) {
        if (gk_unit_text_is(symbol, gk_unit_aliases[i].text, GK_UNIT_ALIAS_SIZE)) {
            *out = (gk_unit)gk_unit_aliases[i].unit;
            return GK_OK;
        }
    }
    return GK_ERR_NOT_FOUND;
}

const char *gk_unit_symbol(gk_unit unit) {
    const gk_unit_row *u = gk_unit_row_of(unit);
    return u != NULL ? u->symbol : "?";
}

/* *sum = a + b for finite a, b, or GK_ERR_RANGE where it overflows, without producing an
 * infinity. Within half the largest value the plain sum is finite. Otherwise the halves are
 * added first: halving is exact for such large operands and the other one, if small, is
 * absorbed by the rounding as it would be in a + b, so 2 (a/2 + b/2) is a + b bit for bit. */
static gk_status gk_add_finite(gk_real a, gk_real b, gk_real *sum) {
    const gk_real half_max = GK_REAL_MAX * GK_LIT(0.5);
    gk_real h;
    gk_status s = GK_OK;
    if ((a >= -half_max) && (a <= half_max) && (b >= -half_max) && (b <= half_max)) {
        *sum = a + b;
    } else {
        h = (a * GK_LIT(0.5)) + (b * GK_LIT(0.5));
        if ((h >= -half_max) && (h <= half_max)) {
            *sum = h * GK_LIT(2.0);
        } else {
            s = GK_ERR_RANGE;
        }
    }
    return s;
}

gk_status gk_pressure_from_gauge(gk_real value, gk_unit unit, gk_pressure ambient,
                                 gk_pressure *out) {
    const gk_unit_row *u = gk_unit_row_of(unit);
    gk_real delta = GK_LIT(0.0);
    gk_real p = GK_LIT(0.0);
    gk_status s;
    if (out == NULL || u == NULL || (unsigned int)u->dim != GK_DIM_PRESSURE) {
        return GK_ERR_ARGUMENT;
    }
    if (!gk_finite(value) || !gk_positive(ambient.pa)) { return GK_ERR_DOMAIN; }
    s = gk_scale(value, ROW_TO_SI(u), &delta); /* a pressure difference: no offset */
    if (s != GK_OK) { return s; }
    s = gk_add_finite(delta, ambient.pa, &p);
    if (s != GK_OK) { return s; }
    if (!(p > GK_LIT(0.0))) { return GK_ERR_DOMAIN; }
    if (gk_check_normal(p) != GK_OK) { return GK_ERR_RANGE; }
    out->pa = p;
    return GK_OK;
}

/* ---- thin typed wrappers (each struct holds exactly one gk_real, its SI value) */

gk_status gk_pressure_from(gk_real value, gk_unit unit, gk_pressure *out) {
    return quantity_from(value, unit, GK_DIM_PRESSURE, out != NULL ? &out->pa : NULL);
}
gk_status gk_pressure_to(gk_pressure p, gk_unit unit, gk_real *out) {
    return quantity_to(p.pa, unit, GK_DIM_PRESSURE, out);
}
gk_status gk_temperature_from(gk_real value, gk_unit unit, gk_temperature *out) {
    return quantity_from(value, unit, GK_DIM_TEMPERATURE, out != NULL ? &out->k : NULL);
}
gk_status gk_temperature_to(gk_temperature t, gk_unit unit, gk_real *out) {
    return quantity_to(t.k, unit, GK_DIM_TEMPERATURE, out);
}
gk_status gk_volume_from(gk_real value, gk_unit unit, gk_volume *out) {
    return quantity_from(value, unit, GK_DIM_VOLUME, out != NULL ? &out->m3 : NULL);
}
gk_status gk_volume_to(gk_volume v, gk_unit unit, gk_real *out) {
    return quantity_to(v.m3, unit, GK_DIM_VOLUME, out);
}
gk_status gk_amount_from(gk_real value, gk_unit unit, gk_amount *out) {
    return quantity_from(value, unit, GK_DIM_AMOUNT, out != NULL ? &out->mol : NULL);
}
gk_status gk_amount_to(gk_amount n, gk_unit unit, gk_real *out) {
    return quantity_to(n.mol, unit, GK_DIM_AMOUNT, out);
}
gk_status gk_molar_mass_from(gk_real value, gk_unit unit, gk_molar_mass *out) {
    return quantity_from(value, unit, GK_DIM_MOLAR_MASS, out != NULL ? &out->kg_per_mol : NULL);
}
gk_status gk_molar_mass_to(gk_molar_mass m, gk_unit unit, gk_real *out) {
    return quantity_to(m.kg_per_mol, unit, GK_DIM_MOLAR_MASS, out);
}
gk_status gk_molar_volume_from(gk_real value, gk_unit unit, gk_molar_volume *out) {
    return quantity_from(value, unit, GK_DIM_MOLAR_VOLUME, out != NULL ? &out->m3_per_mol : NULL);
}
gk_status gk_molar_volume_to(gk_molar_volume vm, gk_unit unit, gk_real *out) {
    return quantity_to(vm.m3_per_mol, unit, GK_DIM_MOLAR_VOLUME, out);
}
gk_status gk_density_from(gk_real value, gk_unit unit, gk_density *out) {
    return quantity_from(value, unit, GK_DIM_DENSITY, out != NULL ? &out->kg_per_m3 : NULL);
}
gk_status gk_density_to(gk_density rho, gk_unit unit, gk_real *out) {
    return quantity_to(rho.kg_per_m3, unit, GK_DIM_DENSITY, out);
}
gk_status gk_speed_from(gk_real value, gk_unit unit, gk_speed *out) {
    return quantity_from(value, unit, GK_DIM_SPEED, out != NULL ? &out->m_per_s : NULL);
}
gk_status gk_speed_to(gk_speed u, gk_unit unit, gk_real *out) {
    return quantity_to(u.m_per_s, unit, GK_DIM_SPEED, out);
}
gk_status gk_mass_from(gk_real value, gk_unit unit, gk_mass *out) {
    return quantity_from(value, unit, GK_DIM_MASS, out != NULL ? &out->kg : NULL);
}
gk_status gk_mass_to(gk_mass mass, gk_unit unit, gk_real *out) {
    return quantity_to(mass.kg, unit, GK_DIM_MASS, out);
}
gk_status gk_volume_flow_from(gk_real value, gk_unit unit, gk_volume_flow *out) {
    return quantity_from(value, unit, GK_DIM_VOLUME_FLOW, out != NULL ? &out->m3_per_s : NULL);
}
gk_status gk_volume_flow_to(gk_volume_flow q, gk_unit unit, gk_real *out) {
    return quantity_to(q.m3_per_s, unit, GK_DIM_VOLUME_FLOW, out);
}
gk_status gk_mass_flow_from(gk_real value, gk_unit unit, gk_mass_flow *out) {
    return quantity_from(value, unit, GK_DIM_MASS_FLOW, out != NULL ? &out->kg_per_s : NULL);
}
gk_status gk_mass_flow_to(gk_mass_flow w, gk_unit unit, gk_real *out) {
    return quantity_to(w.kg_per_s, unit, GK_DIM_MASS_FLOW, out);
}
