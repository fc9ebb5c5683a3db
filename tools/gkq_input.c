/*
 * gkq_input.c - reading what the user typed: the arguments of a word, fluids, models, roots and
 * reference conditions; messages that name the argument at fault; and the checks every model
 * gets: supersaturated wet gas and liquefied contents are refused.
 */
#include <ctype.h>
#include <math.h>
#include <stdarg.h>
#include <stdlib.h>
#include <string.h>

#include "gkq.h"

/* ------------------------------------------------------------------ messages */

void copy_text(char *dst, size_t cap, const char *src) {
    size_t i = 0;
    if (cap == 0) { return; }
    while (src[i] != '\0' && i + 1 < cap) {
        dst[i] = src[i];
        i++;
    }
    dst[i] = '\0';
}

void say(detail *why, const char *fmt, ...) {
    va_list ap;
    va_start(ap, fmt);
    vsnprintf(why->text, sizeof why->text, fmt, ap);
    va_end(ap);
}

/* "argument 3 '50': MESSAGE" (the text cut at 80 bytes). */
void blame(detail *why, const quantity *q, const char *fmt, ...) {
    char msg[GKQ_TEXT_MAX - 128];
    va_list ap;
    va_start(ap, fmt);
    vsnprintf(msg, sizeof msg, fmt, ap);
    va_end(ap);
    if (q->where[0] != '\0') {
        snprintf(why->text, sizeof why->text, "%s '%.80s': %s", q->where, q->text, msg);
    } else {
        snprintf(why->text, sizeof why->text, "'%.80s': %s", q->text, msg);
    }
}

/* A status in the words of the bench, not of the programmer. */
const char *plain_status(gk_status st) {
    switch (st) {
        case GK_OK:
            return "ok";
        case GK_ERR_ARGUMENT:
            return "this input cannot be used here";
        case GK_ERR_DOMAIN:
            return "not a physical value (absolute pressures, temperatures in K, volumes and "
                   "amounts must be above 0)";
        case GK_ERR_NO_SOLUTION:
            return "no physical answer exists for these readings";
        case GK_ERR_RANGE:
            return "outside what the model or its data cover";
        case GK_ERR_NOT_FOUND:
            return "not known to gkq";
        case GK_ERR_COMPOSITION:
            return "the fractions must each lie in 0-100 % and add up to 100 % (or name one "
                   "component 'balance')";
        case GK_ERR_PARSE:
            return "cannot be read";
        default:
            return "failed";
    }
}

/* Short machine name of a status, for the batch status column. */
const char *status_token(gk_status st) {
    switch (st) {
        case GK_OK:
            return "ok";
        case GK_ERR_ARGUMENT:
            return "argument";
        case GK_ERR_DOMAIN:
            return "domain";
        case GK_ERR_NO_SOLUTION:
            return "no_solution";
        case GK_ERR_RANGE:
            return "range";
        case GK_ERR_NOT_FOUND:
            return "not_found";
        case GK_ERR_COMPOSITION:
            return "composition";
        case GK_ERR_PARSE:
            return "parse";
        default:
            return "unknown";
    }
}

/* ------------------------------------------------------------------ models, roots, references */

/* clang-format off */
static const struct { const char *name; gk_eos e; const char *title; } models[] = {
    {"ideal", GK_EOS_IDEAL, "ideal gas"},
    {"vdw", GK_EOS_VAN_DER_WAALS, "van der Waals"},
    {"rk", GK_EOS_REDLICH_KWONG, "Redlich-Kwong"},
    {"srk", GK_EOS_SOAVE_REDLICH_KWONG, "Soave-Redlich-Kwong"},
    {"pr", GK_EOS_PENG_ROBINSON, "Peng-Robinson"},
    {"sw", GK_EOS_SPAN_WAGNER, "Span-Wagner"},
    {"hydrogen", GK_EOS_HYDROGEN, "hydrogen equation"},
    {"best", GK_EOS_BEST, "best available"},
};
/* clang-format on */

const char *model_name(gk_eos e) {
    size_t i;
    for (i = 0; i < GKQ_ARRAY_SIZE(models); i++) {
        if (models[i].e == e) { return models[i].name; }
    }
    return "?";
}

const char *model_title(gk_eos e) {
    size_t i;
    for (i = 0; i < GKQ_ARRAY_SIZE(models); i++) {
        if (models[i].e == e) { return models[i].title; }
    }
    return "?";
}

/* The short names of the models, separated by sep. */
void model_list(char *buf, size_t cap, const char *sep) {
    size_t i, n = 0;
    if (cap == 0) { return; }
    buf[0] = '\0';
    for (i = 0; i < GKQ_ARRAY_SIZE(models) && n < cap; i++) {
        int k = snprintf(buf + n, cap - n, "%s%s", i > 0 ? sep : "", models[i].name);
        if (k < 0) { break; }
        n += (size_t)k;
    }
}

/* A model by its short name or its title, in any letter case ("PR", "Peng-Robinson"). */
int parse_model(const char *s, gk_eos *out) {
    size_t i;
    for (i = 0; i < GKQ_ARRAY_SIZE(models); i++) {
        if (same_ci(s, models[i].name) || same_ci(s, models[i].title)) {
            *out = models[i].e;
            return 1;
        }
    }
    return 0;
}

int parse_root(const char *s, gk_root *out) {
    if (same_ci(s, "stable")) {
        *out = GK_ROOT_STABLE;
        return 1;
    }
    if (same_ci(s, "gas")) {
        *out = GK_ROOT_GAS;
        return 1;
    }
    if (same_ci(s, "liquid")) {
        *out = GK_ROOT_LIQUID;
        return 1;
    }
    return 0;
}

void reference_describe(gk_reference r, char *buf, size_t cap) {
    snprintf(buf, cap, "%.6g degC, %.6g kPa", (double)r.t.k - 273.15, (double)r.p.pa / 1000.0);
}

/* "-R NAME" or "-R PRESSURE@TEMPERATURE"; what receives the description of the condition. */
gk_status parse_reference(const char *s, const settings *set, gk_reference *out, char *what,
                          size_t whatcap, detail *why) {
    size_t i;
    const char *at = strchr(s, '@');
    if (at == NULL) {
        for (i = 0; i < gkq_nrefs; i++) {
            if (same_ci(s, gkq_refs[i].name)) {
                copy_text(what, whatcap, gkq_refs[i].what);
                return gk_reference_get(gkq_refs[i].id, out);
            }
        }
        say(why,
            "reference condition '%.60s' is not known: expected 0C, 0C-100kPa, 15C, 20C, 25C, "
            "60F, or PRESSURE@TEMPERATURE such as 1bar@20degC",
            s);
        return GK_ERR_NOT_FOUND;
    } else {
        char left[64];
        size_t n = (size_t)(at - s);
        quantity qp, qt;
        gk_reference r;
        gk_status st;
        if (n >= sizeof left) {
            say(why, "reference condition '%.60s' is too long", s);
            return GK_ERR_PARSE;
        }
        memcpy(left, s, n);
        left[n] = '\0';
        if ((st = parse_quantity(left, "reference pressure", &qp, why)) != GK_OK) { return st; }
        if ((st = parse_quantity(at + 1, "reference temperature", &qt, why)) != GK_OK) {
            return st;
        }
        if (qp.d != DIM_PRESSURE || qt.d != DIM_TEMPERATURE) {
            say(why,
                "reference condition '%.60s': expected PRESSURE@TEMPERATURE such as "
                "1bar@20degC",
                s);
            return GK_ERR_ARGUMENT;
        }
        if ((st = to_pressure(&qp, set->baro, &r.p, why)) != GK_OK) { return st; }
        if ((st = to_temperature(&qt, &r.t, why)) != GK_OK) { return st; }
        reference_describe(r, what, whatcap);
        *out = r;
        return GK_OK;
    }
}

/* A barometer reading outside what weather and altitude give anywhere people work: below the
   ISO 2533 standard atmosphere at 5000 m (54.0 kPa) with margin, or above the highest
   sea-level readings on record (about 108.4 kPa, from memory). */
int barometer_odd(gk_pressure b) { return (double)b.pa < 50000.0 || (double)b.pa > 110000.0; }

/* ------------------------------------------------------------------ arguments */

static int starts_ci(const char *s, const char *prefix) {
    while (*prefix != '\0') {
        if (tolower((unsigned char)*s) != *prefix) { return 0; }
        s++;
        prefix++;
    }
    return 1;
}

/* Sorts the arguments of a word into quantities and words. where[i] names argument i for
   messages (NULL: "argument i+1"). An empty argument (a CSV cell) is an argument left out. */
gk_status collect_args(int argc, char **argv, const char *const *where, args *a, detail *why) {
    int i;
    gk_status st;
    memset(a, 0, sizeof *a);
    for (i = 0; i < argc; i++) {
        char label[40];
        const char *s = argv[i];
        unsigned char c = (unsigned char)s[0];
        if (where != NULL && where[i] != NULL) {
            copy_text(label, sizeof label, where[i]);
        } else {
            snprintf(label, sizeof label, "argument %d", i + 1);
        }
        if (s[0] == '\0') { continue; }
        if (isdigit(c) || c == '+' || c == '-' || c == '.') {
            if (a->nq >= GKQ_CELLS_MAX) {
                say(why, "%s '%.60s': too many quantities", label, s);
                return GK_ERR_ARGUMENT;
            }
            st = parse_quantity(s, label, &a->q[a->nq], why);
            if (st != GK_OK) { return st; }
            a->nq++;
        } else if (starts_ci(s, "nan") || starts_ci(s, "inf")) {
            say(why,
                "%s '%.60s': not a finite number (expected a number and its unit, e.g. "
                "2.5bar)",
                label, s);
            return GK_ERR_DOMAIN;
        } else {
            if (a->nw >= GKQ_CELLS_MAX) {
                say(why, "%s '%.60s': too many words", label, s);
                return GK_ERR_ARGUMENT;
            }
            copy_text(a->wwhere[a->nw], sizeof a->wwhere[0], label);
            a->w[a->nw++] = s;
        }
    }
    return GK_OK;
}

/* The next quantity of dimension d not taken yet (in the order given), or NULL; marks it taken. */
const quantity *take(args *a, dim d) {
    size_t i;
    for (i = 0; i < a->nq; i++) {
        if (a->q[i].d == d && !a->used_q[i]) {
            a->used_q[i] = 1;
            return &a->q[i];
        }
    }
    return NULL;
}

static const char *example_of(dim d) {
    switch (d) {
        case DIM_PRESSURE:
            return "2.5bar, 30psig";
        case DIM_TEMPERATURE:
            return "20degC, 68F";
        case DIM_VOLUME:
            return "50L";
        case DIM_TIME:
            return "15min";
        case DIM_VOLUME_FLOW:
            return "5L/min, 200sccm";
        case DIM_AMOUNT:
            return "2mol";
        case DIM_MASS:
            return "1.5kg";
        default:
            return "a number and its unit";
    }
}

gk_status need(args *a, dim d, const char *what, const quantity **out, detail *why) {
    const quantity *q = take(a, d);
    size_t i;
    if (q != NULL) {
        *out = q;
        return GK_OK;
    }
    for (i = 0; i < a->nq; i++) {
        if (!a->used_q[i] && a->q[i].d == DIM_NUMBER && d != DIM_NUMBER) {
            blame(why, &a->q[i], "a number without a unit where the %s was expected (e.g. %s)",
                  what, example_of(d));
            return GK_ERR_ARGUMENT;
        }
    }
    if (a->wexp > 0 && a->nw > a->wexp) {
        say(why, "%s '%.60s': not a number; the %s was expected here (e.g. %s)", a->wwhere[a->wexp],
            a->w[a->wexp], what, example_of(d));
        return GK_ERR_ARGUMENT;
    }
    say(why, "the %s is missing (a %s, e.g. %s)", what, dim_name(d), example_of(d));
    return GK_ERR_ARGUMENT;
}

gk_status need_word(const args *a, size_t k, const char *what, detail *why) {
    if (a->nw <= k) {
        say(why, "the %s is missing", what);
        return GK_ERR_ARGUMENT;
    }
    return GK_OK;
}

/* Every quantity must have been taken and no more words than expected given. */
gk_status all_used(const args *a, size_t words_expected, const char *wname, detail *why) {
    size_t i;
    for (i = 0; i < a->nq; i++) {
        if (!a->used_q[i]) {
            blame(why, &a->q[i], "%s takes no further %s here (see 'gkq help %s')", wname,
                  dim_name(a->q[i].d), wname);
            return GK_ERR_ARGUMENT;
        }
    }
    if (a->nw > words_expected) {
        say(why,
            "%s '%.60s': not a number with a unit, and %s takes no further word here (see "
            "'gkq help %s')",
            a->wwhere[words_expected], a->w[words_expected], wname, wname);
        return GK_ERR_ARGUMENT;
    }
    return GK_OK;
}

gk_status to_pressure(const quantity *q, gk_pressure baro, gk_pressure *out, detail *why) {
    gk_status st;
    if (q->gauge) {
        st = gk_pressure_from_gauge((gk_real)q->value, q->unit, baro, out);
        if (st == GK_ERR_DOMAIN) {
            blame(why, q,
                  "a gauge reading below vacuum: reading plus barometer (%.6g kPa) must be above "
                  "0",
                  (double)baro.pa / 1000.0);
            return st;
        }
    } else {
        st = gk_pressure_from((gk_real)q->value, q->unit, out);
        if (st == GK_ERR_DOMAIN) {
            blame(why, q,
                  "an absolute pressure must be above 0 (a gauge reading is written "
                  "30psig, 2barg or 2bar_g)");
            return st;
        }
    }
    if (st == GK_ERR_ARGUMENT) {
        blame(why, q, "a %s, but a pressure was expected", dim_name(q->d));
    } else if (st != GK_OK) {
        blame(why, q, "%s", plain_status(st));
    }
    return st;
}

gk_status to_temperature(const quantity *q, gk_temperature *out, detail *why) {
    gk_status st = gk_temperature_from((gk_real)q->value, q->unit, out);
    if (st == GK_ERR_DOMAIN) {
        blame(why, q, "below absolute zero");
    } else if (st == GK_ERR_ARGUMENT) {
        blame(why, q, "a %s, but a temperature was expected", dim_name(q->d));
    } else if (st != GK_OK) {
        blame(why, q, "%s", plain_status(st));
    }
    return st;
}

gk_status to_volume(const quantity *q, gk_volume *out, detail *why) {
    gk_status st = gk_volume_from((gk_real)q->value, q->unit, out);
    if (st == GK_ERR_DOMAIN) {
        blame(why, q, "a volume must be above 0");
    } else if (st != GK_OK) {
        blame(why, q, "%s", plain_status(st));
    }
    return st;
}

/* A fraction such as a relative humidity: "45%" or "0.45". A bare number above 1 is refused
   with the percentage it would mean, since "50" for 50 % is the usual slip. */
gk_status fraction_of(const quantity *q, const char *what, double *out, detail *why) {
    int percent = strchr(q->text, '%') != NULL || strcmp(q->uname, "pct") == 0;
    if (q->d != DIM_NUMBER) {
        blame(why, q, "a %s, but the %s was expected (e.g. 45%% or 0.45)", dim_name(q->d), what);
        return GK_ERR_ARGUMENT;
    }
    if (!percent && q->value > 1.0) {
        blame(why, q,
              "the %s as a bare number is a fraction, so this is %.6g %%: write %.6g%% "
              "for a percentage, or a fraction from 0 to 1",
              what, q->value * 100.0, q->value);
        return GK_ERR_DOMAIN;
    }
    if (!(q->value >= 0.0 && q->value <= 1.0)) {
        blame(why, q, "the %s must lie in 0-100 %%", what);
        return GK_ERR_DOMAIN;
    }
    *out = q->value;
    return GK_OK;
}

/* ------------------------------------------------------------------ fluids */

static int is_water(const gk_gas *g) { return g != NULL && strcmp(g->formula, "H2O") == 0; }

/* Kay's rule: pseudo-critical T and p of a mixture as mole-fraction means (Kay 1936). */
static void fluid_finish(fluid_in *f) {
    size_t i;
    if (!f->is_mix) {
        f->tc_k = (double)f->gas->critical_temperature.k;
        f->pc_pa = (double)f->gas->critical_pressure.pa;
        f->x_water = is_water(f->gas) ? 1.0 : 0.0;
        return;
    }
    f->tc_k = 0.0;
    f->pc_pa = 0.0;
    f->x_water = 0.0;
    for (i = 0; i < f->mix.count; i++) {
        double x = (double)f->mix.mole_fraction[i];
        f->tc_k += x * (double)f->mix.gas[i]->critical_temperature.k;
        f->pc_pa += x * (double)f->mix.gas[i]->critical_pressure.pa;
        if (is_water(f->mix.gas[i])) { f->x_water += x; }
    }
}

/* The nearest gas formula or name, as " (did you mean 'X'?)", or "". */
static void gas_suggest(const char *text, char *buf, size_t cap) {
    size_t i, n = gk_gas_count(), bestd = 99;
    const char *best = NULL;
    for (i = 0; i < n; i++) {
        const gk_gas *g = gk_gas_at(i);
        size_t d1, d2;
        if (g == NULL) { break; }
        d1 = text_distance(text, g->formula);
        d2 = text_distance(text, g->name);
        if (d1 < bestd) {
            bestd = d1;
            best = g->formula;
        }
        if (d2 < bestd) {
            bestd = d2;
            best = g->name;
        }
    }
    if (best != NULL && bestd <= (strlen(text) <= 3 ? 1u : 2u)) {
        snprintf(buf, cap, " (did you mean '%s'?)", best);
    } else {
        buf[0] = '\0';
    }
}

/* A fluid: a gas of the table ("N2", "carbon dioxide") or a mixture ("CO2=5%;N2=balance";
   ';' may stand for ',' so that the text needs no quoting in a shell or a CSV cell). */
gk_status parse_fluid(const char *text, const char *where, fluid_in *f, detail *why) {
    gk_status st;
    memset(f, 0, sizeof *f);
    f->text = text;
    if (strchr(text, '=') != NULL) {
        char buf[GKQ_TEXT_MAX];
        size_t i;
        if (strlen(text) >= sizeof buf) {
            say(why, "%s: the mixture text is longer than %u characters", where,
                (unsigned)(sizeof buf - 1));
            return GK_ERR_PARSE;
        }
        copy_text(buf, sizeof buf, text);
        for (i = 0; buf[i] != '\0'; i++) {
            if (buf[i] == ';') { buf[i] = ','; }
        }
        st = gk_mixture_parse(buf, &f->mix);
        if (st == GK_OK) { st = gk_mixture_molar_mass(&f->mix, &f->m); }
        if (st == GK_ERR_PARSE) {
            say(why,
                "%s '%.80s': cannot read the mixture (write it as CO2=5%%;N2=balance: gas=%%, "
                "ppm or a fraction, one component may be balance)",
                where, text);
        } else if (st == GK_ERR_NOT_FOUND) {
            say(why, "%s '%.80s': a component is not a gas gkq knows ('gkq gases' lists them)",
                where, text);
        } else if (st != GK_OK) {
            say(why, "%s '%.80s': %s", where, text, plain_status(st));
        }
        if (st != GK_OK) { return st; }
        f->is_mix = 1;
    } else {
        st = gk_gas_find(text, &f->gas);
        if (st != GK_OK) {
            char hint[80];
            gas_suggest(text, hint, sizeof hint);
            say(why, "%s '%.80s': no gas of that name or formula%s; 'gkq gases' lists them", where,
                text, hint);
            return st;
        }
        f->m = f->gas->molar_mass;
    }
    fluid_finish(f);
    return GK_OK;
}

/* Makes the fluid wet: water at relative humidity rh at p, T (gk_humid_mixture). */
gk_status wet_fluid(fluid_in *f, double rh, gk_pressure p, gk_temperature t, detail *why) {
    gk_mixture dry, wet;
    gk_status st;
    if (f->x_water > 0.0) {
        say(why, "'%.80s' already holds water: give either --rh or the water fraction", f->text);
        return GK_ERR_ARGUMENT;
    }
    if (f->is_mix) {
        dry = f->mix;
    } else {
        memset(&dry, 0, sizeof dry);
        dry.count = 1;
        dry.gas[0] = f->gas;
        dry.mole_fraction[0] = (gk_real)1.0;
    }
    st = gk_humid_mixture(&dry, p, t, (gk_real)rh, &wet);
    if (st == GK_OK) { st = gk_mixture_molar_mass(&wet, &f->m); }
    if (st == GK_ERR_RANGE) {
        say(why, "--rh: the temperature is outside the water vapour-pressure curves (-73 to 374 "
                 "degC)");
    } else if (st == GK_ERR_NO_SOLUTION) {
        say(why, "--rh: water at this humidity would exceed the total pressure");
    } else if (st == GK_ERR_COMPOSITION) {
        say(why, "--rh: the mixture has no room for water (at most %d components)", GK_MIXTURE_MAX);
    } else if (st != GK_OK) {
        say(why, "--rh: %s", plain_status(st));
    }
    if (st != GK_OK) { return st; }
    f->mix = wet;
    f->is_mix = 1;
    f->gas = NULL;
    fluid_finish(f);
    return GK_OK;
}

gk_fluid as_fluid(const fluid_in *f) {
    gk_fluid fl;
    fl.gas = f->is_mix ? NULL : f->gas;
    fl.mixture = f->is_mix ? &f->mix : NULL;
    fl.kij = NULL;
    return fl;
}

/* Refuses wet gas whose water partial pressure exceeds saturation at T: that water would
   condense (by Dalton's law p_w = x_w p; saturation from IAPWS-IF97 / IAPWS 2011). */
gk_status check_water(const fluid_in *f, gk_pressure p, gk_temperature t, detail *why) {
    gk_pressure pws;
    gk_status st;
    double pw;
    if (f->x_water <= 0.0 || (double)t.k >= 647.096) { return GK_OK; }
    pw = f->x_water * (double)p.pa;
    st = gk_water_vapour_pressure(t, &pws);
    if (st != GK_OK) {
        say(why, "'%.80s' holds water, and below -73 degC gkq cannot tell whether it condenses",
            f->text);
        return GK_ERR_RANGE;
    }
    if (pw > (double)pws.pa * (1.0 + 1e-6)) {
        say(why,
            "'%.80s': water partial pressure %.4g kPa is %.3g times the saturation pressure at "
            "%.4g degC (%.4g kPa): the water would condense. Give the dry gas and --rh, or at "
            "most %.3g %% water at this pressure",
            f->text, pw / 1000.0, pw / (double)pws.pa, (double)t.k - 273.15,
            (double)pws.pa / 1000.0, 100.0 * (double)pws.pa / (double)p.pa);
        return GK_ERR_NO_SOLUTION;
    }
    return GK_OK;
}

/* Refuses a state at which the fluid is liquid, whatever model computes the answer: the phase is
   decided by GKQ_PHASE_MODEL (the ideal gas has no liquid of its own). Below the critical
   temperature (for a mixture the pseudo-critical one), a stable liquid root means a liquefied
   gas, whose amount does not follow from its pressure. */
gk_status check_gas_phase(const fluid_in *f, gk_pressure p, gk_temperature t, const char *what,
                          detail *why) {
    gk_eos_result res;
    gk_status st;
    if (f->is_mix) {
        st = gk_mixture_eos_solve(GKQ_PHASE_MODEL, &f->mix, NULL, p, t, GK_ROOT_STABLE, &res);
    } else {
        st = gk_eos_solve(GKQ_PHASE_MODEL, f->gas, p, t, GK_ROOT_STABLE, &res);
    }
    if (st != GK_OK || res.branch != GK_ROOT_LIQUID || (double)t.k >= f->tc_k) { return GK_OK; }
    say(why,
        "%s%s'%.80s' is liquid at %.6g bar, %.4g degC (%s, below its critical temperature %.4g "
        "degC): the contents of a liquefied gas do not follow from its pressure; weigh the "
        "cylinder",
        what != NULL ? what : "", what != NULL ? ": " : "", f->text, (double)p.pa / 1e5,
        (double)t.k - 273.15, model_title(res.model), f->tc_k - 273.15);
    return GK_ERR_RANGE;
}

/* A library status of an instrument calculation, in the words of the bench. */
gk_status explain(gk_status st, const char *what, const fluid_in *f, detail *why) {
    if (st == GK_ERR_RANGE) {
        say(why,
            "%s '%.80s': outside what the model covers (its temperature or pressure range, "
            "liquid at the state or at the reference condition, or a result too large)",
            what, f->text);
    } else if (st == GK_ERR_NOT_FOUND) {
        say(why,
            "%s '%.80s': the model has no equation for this fluid (-m best picks one that "
            "has)",
            what, f->text);
    } else if (st != GK_OK) {
        say(why, "%s '%.80s': %s", what, f->text, plain_status(st));
    }
    return st;
}
