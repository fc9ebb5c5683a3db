/*
 * gkq_units.c - the unit spellings gkq reads: the library's units (gk_unit_parse) and the
 * spellings of the trade on top of them (psig, barg, inH2O, mTorr, sccm, slpm, SCFM, g/h ...),
 * quantities written with them, display conversions, and the nearest-spelling suggestion.
 */
#include <ctype.h>
#include <errno.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>

#include "gkq.h"

#define NO_UNIT GK_UNIT_COUNT

/* Reference conditions by name (-R) and those the flow spellings stand for. */
const refcond gkq_refs[] = {
    { "0C", GK_REF_0C_101325PA, "0 degC, 101.325 kPa (DIN 1343 normal conditions)" },
    { "0C-100kPa", GK_REF_0C_100KPA, "0 degC, 100 kPa (IUPAC standard conditions since 1982)" },
    { "15C", GK_REF_15C_101325PA, "15 degC, 101.325 kPa (ISO 13443)" },
    { "20C", GK_REF_20C_101325PA, "20 degC, 101.325 kPa (common practice)" },
    { "25C", GK_REF_25C_101325PA, "25 degC, 101.325 kPa (common practice)" },
    { "60F", GK_REF_60F_14696PSI, "60 degF, 14.696 psia (U.S. gas industry, common practice)" },
};
const size_t gkq_nrefs = GKQ_ARRAY_SIZE(gkq_refs);

/* The spellings of the trade that the library does not carry. Each is a library unit times a
   factor; the factors are exact unless stated. ci: also accepted in any ASCII case (only where
   no other unit folds to the same letters and no SI prefix m/M or p/P could be meant). */
typedef struct tool_unit {
    tunit u;
    int ci;
} tool_unit;

/* clang-format off */
static const tool_unit tool_units[] = {
    /* pressure: the gauge/absolute qualifier rides on the unit in trade spellings (NIST SP 811
       sec. 7.4 prefers it on the quantity; gkq accepts both, and the _g mark) */
    {{"psig", DIM_PRESSURE, GK_UNIT_PSI, 1.0, 1, 0, "psi gauge: over the barometer (-b)"}, 1},
    {{"psia", DIM_PRESSURE, GK_UNIT_PSI, 1.0, 0, 0, "psi absolute"}, 1},
    {{"barg", DIM_PRESSURE, GK_UNIT_BAR, 1.0, 1, 0, "bar gauge: over the barometer (-b)"}, 1},
    {{"bara", DIM_PRESSURE, GK_UNIT_BAR, 1.0, 0, 0, "bar absolute"}, 1},
    {{"kPag", DIM_PRESSURE, GK_UNIT_KPA, 1.0, 1, 0, "kPa gauge: over the barometer (-b)"}, 1},
    /* conventional inch of water: 0.0254 m x 1000 kg/m3 x 9.80665 m/s2 (standard gravity,
       3rd CGPM 1901) = 249.08891 Pa; NIST SP 811 (2008) B.8 lists 2.490 889 E+02 Pa */
    {{"inH2O", DIM_PRESSURE, GK_UNIT_PA, 249.08891, 0, 0, "inch of water, conventional (249.089 Pa)"}, 1},
    {{"mTorr", DIM_PRESSURE, GK_UNIT_TORR, 1e-3, 0, 0, "millitorr (0.133322 Pa)"}, 0},
    /* temperature: the bare scale letters of thermometer displays */
    {{"C", DIM_TEMPERATURE, GK_UNIT_DEGC, 1.0, 0, 0, "degree Celsius"}, 0},
    {{"F", DIM_TEMPERATURE, GK_UNIT_DEGF, 1.0, 0, 0, "degree Fahrenheit"}, 0},
    /* volume */
    {{"cc", DIM_VOLUME, GK_UNIT_ML, 1.0, 0, 0, "cubic centimetre"}, 0},
    /* actual volume flow (at the line's pressure and temperature) */
    {{"L/s", DIM_VOLUME_FLOW, GK_UNIT_L_PER_MIN, 60.0, 0, 0, "litre per second"}, 1},
    {{"L/h", DIM_VOLUME_FLOW, GK_UNIT_L_PER_MIN, 1.0 / 60.0, 0, 0, "litre per hour"}, 1},
    {{"mL/s", DIM_VOLUME_FLOW, GK_UNIT_ML_PER_MIN, 60.0, 0, 0, "millilitre per second"}, 0},
    {{"cm3/min", DIM_VOLUME_FLOW, GK_UNIT_ML_PER_MIN, 1.0, 0, 0, "cubic centimetre per minute"}, 0},
    {{"m3/min", DIM_VOLUME_FLOW, GK_UNIT_M3_PER_H, 60.0, 0, 0, "cubic metre per minute"}, 0},
    {{"ft3/h", DIM_VOLUME_FLOW, GK_UNIT_FT3_PER_MIN, 1.0 / 60.0, 0, 0, "cubic foot per hour"}, 1},
    {{"cfh", DIM_VOLUME_FLOW, GK_UNIT_FT3_PER_MIN, 1.0 / 60.0, 0, 0, "cubic foot per hour"}, 1},
    /* volume flow at a named reference condition: mass-flow-controller practice states sccm and
       slpm at 0 degC, 101.325 kPa (the standard conditions of SEMI E12, common practice); SCFM
       and SCFH here are at 60 degF, 14.696 psia (U.S. gas-industry practice; compressed-air
       ratings often use 68 degF and 14.7 psia instead: check the data sheet); the normal cubic
       metre is at 0 degC, 101.325 kPa (DIN 1343) */
    {{"sccm", DIM_VOLUME_FLOW, GK_UNIT_ML_PER_MIN, 1.0, 0, 1, "cm3/min at 0 degC, 101.325 kPa (MFC practice, SEMI E12)"}, 1},
    {{"slpm", DIM_VOLUME_FLOW, GK_UNIT_L_PER_MIN, 1.0, 0, 1, "L/min at 0 degC, 101.325 kPa (MFC practice, SEMI E12)"}, 1},
    {{"slm", DIM_VOLUME_FLOW, GK_UNIT_L_PER_MIN, 1.0, 0, 1, "L/min at 0 degC, 101.325 kPa (as slpm)"}, 1},
    {{"SCFM", DIM_VOLUME_FLOW, GK_UNIT_FT3_PER_MIN, 1.0, 0, 6, "ft3/min at 60 degF, 14.696 psia (U.S. gas industry)"}, 1},
    {{"SCFH", DIM_VOLUME_FLOW, GK_UNIT_FT3_PER_MIN, 1.0 / 60.0, 0, 6, "ft3/h at 60 degF, 14.696 psia (U.S. gas industry)"}, 1},
    {{"Nm3/h", DIM_VOLUME_FLOW, GK_UNIT_M3_PER_H, 1.0, 0, 1, "m3/h at 0 degC, 101.325 kPa (DIN 1343 normal cubic metre)"}, 0},
    /* mass flow */
    {{"g/h", DIM_MASS_FLOW, GK_UNIT_G_PER_MIN, 1.0 / 60.0, 0, 0, "gram per hour"}, 1},
    {{"g/s", DIM_MASS_FLOW, GK_UNIT_G_PER_MIN, 60.0, 0, 0, "gram per second"}, 1},
    {{"kg/min", DIM_MASS_FLOW, GK_UNIT_KG_PER_H, 60.0, 0, 0, "kilogram per minute"}, 1},
    /* time and plain numbers */
    {{"s", DIM_TIME, NO_UNIT, 1.0, 0, 0, "second"}, 0},
    {{"min", DIM_TIME, NO_UNIT, 60.0, 0, 0, "minute"}, 0},
    {{"h", DIM_TIME, NO_UNIT, 3600.0, 0, 0, "hour"}, 0},
    {{"%", DIM_NUMBER, NO_UNIT, 0.01, 0, 0, "percent (relative humidity, fractions)"}, 0},
    {{"pct", DIM_NUMBER, NO_UNIT, 0.01, 0, 0, "percent, as in the keys gkq writes (rh_pct)"}, 0},
};
/* clang-format on */

/* Library symbols that are also read in any ASCII case (no other unit folds to them and no SI
   prefix m/M or p/P is at stake). */
static const char *const lib_ci[] = { "Pa",   "hPa",   "kPa",  "bar",  "atm",   "Torr",
                                      "inHg", "mmHg",  "psi",  "degC", "degF",  "degR",
                                      "L",    "L/min", "m3/h", "kg/h", "g/min", "ft3/min",
                                      "lb/h", "ft3",   "kg",   "lb",   "g/mol", "kg/m3" };

const char *dim_name(dim d) {
    static const char *const names[] = { "?",      "pressure",   "temperature",  "volume",
                                         "amount", "molar mass", "molar volume", "density",
                                         "speed",  "mass",       "volume flow",  "mass flow",
                                         "time",   "number" };
    return ((size_t)d < GKQ_ARRAY_SIZE(names)) ? names[d] : "?";
}

/* The dimension of a library unit (the enum is ordered by dimension in units.h). */
static dim lib_dim(gk_unit u) {
    if (u <= GK_UNIT_PSI) { return DIM_PRESSURE; }
    if (u <= GK_UNIT_DEGR) { return DIM_TEMPERATURE; }
    if (u <= GK_UNIT_GAL_US) { return DIM_VOLUME; }
    if (u <= GK_UNIT_LBMOL) { return DIM_AMOUNT; }
    if (u <= GK_UNIT_G_PER_MOL) { return DIM_MOLAR_MASS; }
    if (u <= GK_UNIT_CM3_PER_MOL) { return DIM_MOLAR_VOLUME; }
    if (u <= GK_UNIT_LB_PER_FT3) { return DIM_DENSITY; }
    if (u <= GK_UNIT_FT_PER_S) { return DIM_SPEED; }
    if (u <= GK_UNIT_LB) { return DIM_MASS; }
    if (u <= GK_UNIT_FT3_PER_MIN) { return DIM_VOLUME_FLOW; }
    if (u < GK_UNIT_COUNT) { return DIM_MASS_FLOW; }
    return DIM_NONE;
}

gk_unit si_unit(dim d) {
    switch (d) {
        case DIM_PRESSURE:
            return GK_UNIT_PA;
        case DIM_TEMPERATURE:
            return GK_UNIT_K;
        case DIM_VOLUME:
            return GK_UNIT_M3;
        case DIM_AMOUNT:
            return GK_UNIT_MOL;
        case DIM_MOLAR_MASS:
            return GK_UNIT_KG_PER_MOL;
        case DIM_MOLAR_VOLUME:
            return GK_UNIT_M3_PER_MOL;
        case DIM_DENSITY:
            return GK_UNIT_KG_PER_M3;
        case DIM_SPEED:
            return GK_UNIT_M_PER_S;
        case DIM_MASS:
            return GK_UNIT_KG;
        case DIM_VOLUME_FLOW:
            return GK_UNIT_M3_PER_S;
        case DIM_MASS_FLOW:
            return GK_UNIT_KG_PER_S;
        default:
            return NO_UNIT;
    }
}

int same_ci(const char *a, const char *b) {
    while (*a != '\0' && *b != '\0') {
        if (tolower((unsigned char)*a) != tolower((unsigned char)*b)) { return 0; }
        a++;
        b++;
    }
    return *a == *b;
}

static tunit from_lib(gk_unit u) {
    tunit t;
    memset(&t, 0, sizeof t);
    t.name = gk_unit_symbol(u);
    t.d = lib_dim(u);
    t.base = u;
    t.mult = 1.0;
    t.what = "";
    return t;
}

/* Finds a unit by its spelling: the trade spellings, then the library's symbols and aliases,
   then either in any ASCII case where that is unambiguous. Returns 1 when found. */
int unit_find(const char *text, tunit *out) {
    size_t i;
    gk_unit u;
    if (strlen(text) > 40) { return 0; }
    for (i = 0; i < GKQ_ARRAY_SIZE(tool_units); i++) {
        if (strcmp(text, tool_units[i].u.name) == 0) {
            *out = tool_units[i].u;
            return 1;
        }
    }
    if (gk_unit_parse(text, &u) == GK_OK) {
        *out = from_lib(u);
        return 1;
    }
    for (i = 0; i < GKQ_ARRAY_SIZE(tool_units); i++) {
        if (tool_units[i].ci && same_ci(text, tool_units[i].u.name)) {
            *out = tool_units[i].u;
            return 1;
        }
    }
    for (i = 0; i < GKQ_ARRAY_SIZE(lib_ci); i++) {
        if (same_ci(text, lib_ci[i]) && gk_unit_parse(lib_ci[i], &u) == GK_OK) {
            *out = from_lib(u);
            return 1;
        }
    }
    return 0;
}

/* Edit distance of two short texts, ignoring ASCII case (texts over 40 bytes: a large value). */
size_t text_distance(const char *a, const char *b) {
    size_t la = strlen(a), lb = strlen(b), i, j;
    size_t row[42];
    if (la > 40 || lb > 40) { return 99; }
    for (j = 0; j <= lb; j++) { row[j] = j; }
    for (i = 1; i <= la; i++) {
        size_t diag = row[0];
        row[0] = i;
        for (j = 1; j <= lb; j++) {
            size_t up = row[j];
            size_t cost =
                tolower((unsigned char)a[i - 1]) == tolower((unsigned char)b[j - 1]) ? 0 : 1;
            size_t best = diag + cost;
            if (row[j] + 1 < best) { best = row[j] + 1; }
            if (row[j - 1] + 1 < best) { best = row[j - 1] + 1; }
            row[j] = best;
            diag = up;
        }
    }
    return row[lb];
}

/* The accepted spelling nearest to text, as " (did you mean 'X'?)", or "" when none is near. */
void unit_suggest(const char *text, char *buf, size_t cap) {
    const char *best = NULL;
    size_t bestd = 99, i, d, lim;
    for (i = 0; i < GKQ_ARRAY_SIZE(tool_units); i++) {
        d = text_distance(text, tool_units[i].u.name);
        if (d < bestd) {
            bestd = d;
            best = tool_units[i].u.name;
        }
    }
    for (i = 0; i < (size_t)GK_UNIT_COUNT; i++) {
        const char *sym = gk_unit_symbol((gk_unit)i);
        d = text_distance(text, sym);
        if (d < bestd) {
            bestd = d;
            best = sym;
        }
    }
    lim = strlen(text) <= 3 ? 1 : 2;
    if (best != NULL && bestd <= lim) {
        snprintf(buf, cap, " (did you mean '%s'?)", best);
    } else if (cap > 0) {
        buf[0] = '\0';
    }
}

static int looks_like_number(const char *s) {
    unsigned char c = (unsigned char)s[0];
    if (c == '+' || c == '-') { c = (unsigned char)s[1]; }
    return isdigit(c) || c == '.';
}

/* Parses a quantity: a decimal number, optional spaces, and a unit; a pressure unit may carry
   the gauge mark "_g" (or "_a" for absolute). where names the argument for messages. */
gk_status parse_quantity(const char *s, const char *where, quantity *q, detail *why) {
    char unit[48], hint[64];
    char *end = NULL;
    size_t n;
    double v;
    quantity out;
    tunit tu;
    int mark = 0;

    memset(&out, 0, sizeof out);
    out.text = s;
    out.uname = "";
    out.uwhat = "";
    copy_text(out.where, sizeof out.where, where);
    if (!looks_like_number(s)) {
        blame(why, &out, "not a number (expected a number and its unit, e.g. 2.5bar)");
        return GK_ERR_PARSE;
    }
    errno = 0;
    v = strtod(s, &end);
    if (end == s) {
        blame(why, &out, "not a number (expected a number and its unit, e.g. 2.5bar)");
        return GK_ERR_PARSE;
    }
    if (!isfinite(v) || errno == ERANGE) {
        blame(why, &out, "the number is too large or too small to use");
        return GK_ERR_DOMAIN;
    }
    while (*end == ' ' || *end == '\t') { end++; }
    n = strlen(end);
    while (n > 0 && (end[n - 1] == ' ' || end[n - 1] == '\t')) { n--; }
    if (n >= sizeof unit) {
        blame(why, &out, "the unit is too long (see 'gkq units')");
        return GK_ERR_PARSE;
    }
    memcpy(unit, end, n);
    unit[n] = '\0';
    if (looks_like_number(unit)) {
        blame(why, &out, "a malformed number (expected one number and its unit, e.g. 2.5bar)");
        return GK_ERR_PARSE;
    }
    if (n >= 2 && unit[n - 2] == '_' && (unit[n - 1] == 'g' || unit[n - 1] == 'a')) {
        mark = unit[n - 1] == 'g' ? 1 : 2;
        unit[n - 2] = '\0';
    }
    if (unit[0] == '\0' && mark == 0) {
        out.d = DIM_NUMBER;
        out.unit = NO_UNIT;
        out.value = v;
        *q = out;
        return GK_OK;
    }
    if (!unit_find(unit, &tu)) {
        unit_suggest(unit, hint, sizeof hint);
        blame(why, &out, "unknown unit '%s'%s; 'gkq units' lists the spellings", unit, hint);
        return GK_ERR_NOT_FOUND;
    }
    if (mark != 0 && (tu.d != DIM_PRESSURE || tu.gauge)) {
        blame(why, &out, "the mark _%c belongs after a plain pressure unit (e.g. 3.2bar_g)",
              mark == 1 ? 'g' : 'a');
        return GK_ERR_PARSE;
    }
    out.d = tu.d;
    out.unit = tu.base;
    out.gauge = tu.gauge || mark == 1;
    out.ref = tu.ref;
    out.uname = tu.name;
    out.uwhat = tu.what;
    out.value = v * tu.mult;
    *q = out;
    return GK_OK;
}

/* An SI value expressed in display unit u. Returns 1 on success. */
int si_to_shown(double si, dim d, const tunit *u, double *shown) {
    gk_real x;
    if (u->base == NO_UNIT) {
        *shown = si / u->mult;
        return 1;
    }
    if (gk_convert((gk_real)si, si_unit(d), u->base, &x) != GK_OK) { return 0; }
    *shown = (double)x / u->mult;
    return 1;
}

/* The unit part of a machine key: "kg/m3" -> "kg_per_m3", "%" -> "pct". */
void unit_tag(const char *name, char *buf, size_t cap) {
    size_t n = 0;
    const char *s;
    if (cap == 0) { return; }
    for (s = name; *s != '\0' && n + 6 < cap; s++) {
        if (*s == '/') {
            memcpy(buf + n, "_per_", 5);
            n += 5;
        } else if (*s == '%') {
            memcpy(buf + n, "pct", 3);
            n += 3;
        } else if (isalnum((unsigned char)*s)) {
            buf[n++] = *s;
        } else {
            buf[n++] = '_';
        }
    }
    buf[n] = '\0';
}

/* `gkq units`: every accepted spelling, by quantity. */
int list_units(FILE *out) {
    dim d;
    size_t i;
    fputs("Units gkq reads, by quantity. A gauge pressure is read over the barometer (-b) and\n"
          "the barometer used is printed; _g after a pressure unit also marks a gauge reading\n"
          "(3.2bar_g), _a an absolute one. Spellings match exactly; those marked * also in any\n"
          "letter case.\n",
          out);
    for (d = DIM_PRESSURE; d <= DIM_NUMBER; d = (dim)(d + 1)) {
        fprintf(out, "\n%s\n", dim_name(d));
        for (i = 0; i < (size_t)GK_UNIT_COUNT; i++) {
            size_t k;
            int ci = 0;
            gk_real si;
            const char *sym = gk_unit_symbol((gk_unit)i);
            if (lib_dim((gk_unit)i) != d) { continue; }
            for (k = 0; k < GKQ_ARRAY_SIZE(lib_ci); k++) {
                if (strcmp(lib_ci[k], sym) == 0) { ci = 1; }
            }
            if (d == DIM_TEMPERATURE) {
                fprintf(out, "  %-8s%s temperature scale\n", sym, ci ? "*" : " ");
            } else if (gk_convert((gk_real)1.0, (gk_unit)i, si_unit(d), &si) == GK_OK) {
                fprintf(out, "  %-8s%s = %.10g %s\n", sym, ci ? "*" : " ", (double)si,
                        gk_unit_symbol(si_unit(d)));
            }
        }
        for (i = 0; i < GKQ_ARRAY_SIZE(tool_units); i++) {
            const tool_unit *t = &tool_units[i];
            if (t->u.d == d) {
                fprintf(out, "  %-8s%s %s\n", t->u.name, t->ci ? "*" : " ", t->u.what);
            }
        }
    }
    fputs("  (none)    a bare number: a fraction (0.45) or a count\n", out);
    return finish_output(out);
}
