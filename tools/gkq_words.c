/*
 * gkq_words.c - the words that read a state: state, convert, speeds, water, dew, contents,
 * leak, gases, units; the shared steps of every word.
 */
#include <math.h>
#include <string.h>

#include "gkq.h"

#define NOD DIM_NONE

/* ------------------------------------------------------------------ shared steps */

/* A pressure argument to an absolute pressure; a gauge reading records the barometer used
   (at_end: the barometer at the end of a leak test, when one was given). */
gk_status word_pressure(const settings *set, const quantity *q, int at_end, record *r,
                        const char *key, gk_pressure *out, detail *why) {
    gk_pressure b = (at_end && set->baro_end_given) ? set->baro_end : set->baro;
    gk_status st = to_pressure(q, b, out, why);
    if (st == GK_OK && q->gauge && r != NULL) { rec_real(r, key, (double)b.pa); }
    return st;
}

/* The concrete model for a fluid at a state, in *out (a copy of set): -m, or with best the one
   the library picks there (Span-Wagner or the hydrogen equation where they cover the fluid,
   else Peng-Robinson); where the pick does not cover the state (outside its temperature or
   pressure range), Peng-Robinson. Records the model asked for and, when it differs, the one
   used. */
gk_status use_model(const settings *set, const fluid_in *f, gk_pressure p, gk_temperature t,
                    settings *out, record *r) {
    gk_eos_result res;
    gk_status st = GK_OK;
    *out = *set;
    if (set->model == GK_EOS_BEST) {
        if (f->is_mix) {
            st = gk_mixture_eos_solve(GK_EOS_BEST, &f->mix, NULL, p, t, GK_ROOT_STABLE, &res);
        } else {
            st = gk_eos_solve(GK_EOS_BEST, f->gas, p, t, GK_ROOT_STABLE, &res);
        }
        if (st == GK_OK) {
            out->model = res.model;
        } else if (st == GK_ERR_RANGE) {
            out->model = GK_EOS_PENG_ROBINSON;
        }
    }
    rec_text(r, "model", model_name(set->model));
    if (out->model != set->model) { rec_text(r, "model_used", model_name(out->model)); }
    r->served = out->model;
    r->has_served = 1;
    return GK_OK;
}

void rec_reference(record *r, const settings *set) { rec_text(r, "reference", set->ref_what); }

/* The branch of a solved state, as the library labels it: a lone root above the model's
   critical temperature (of a mixture, the pseudo-critical one) is GK_ROOT_SUPERCRITICAL, neither
   gas nor liquid. */
typedef enum branch_kind {
    BRANCH_GAS,
    BRANCH_LIQUID,
    BRANCH_SUPERCRITICAL
} branch_kind;

static branch_kind branch_of(const gk_eos_result *res) {
    if (res->branch == GK_ROOT_SUPERCRITICAL) { return BRANCH_SUPERCRITICAL; }
    return res->branch == GK_ROOT_LIQUID ? BRANCH_LIQUID : BRANCH_GAS;
}

const char *branch_text(const gk_eos_result *res) {
    static const char *const names[] = { "gas", "liquid", "supercritical" };
    return names[branch_of(res)];
}

/* The asked branch (-r gas / -r liquid) must exist: with a lone root the model has only one. */
static gk_status check_branch(const settings *set, const gk_eos_result *res, const fluid_in *f,
                              detail *why) {
    branch_kind b = branch_of(res);
    const char *asked = set->root == GK_ROOT_LIQUID ? "liquid" : "gas";
    if (set->root == GK_ROOT_STABLE || res->root_count != 1) { return GK_OK; }
    if (b == BRANCH_SUPERCRITICAL) {
        if (set->root == GK_ROOT_GAS) { return GK_OK; }
        say(why,
            "-r liquid: '%.80s' has no liquid root here: above its critical temperature "
            "(%.4g degC) it has one state, supercritical; drop -r or use -r stable",
            f->text, f->tc_k - 273.15);
        return GK_ERR_NO_SOLUTION;
    }
    if ((b == BRANCH_LIQUID) != (set->root == GK_ROOT_LIQUID)) {
        say(why, "-r %s: '%.80s' has no %s root at this state; the model has one root here, %s",
            asked, f->text, asked, branch_text(res));
        return GK_ERR_NO_SOLUTION;
    }
    return GK_OK;
}

/* The fluid of a word, made wet when --rh (or an rh column) was given, and checked: no
   supersaturated water at the state. */
static gk_status word_fluid(const settings *set, const args *a, gk_pressure p, gk_temperature t,
                            fluid_in *f, record *r, detail *why) {
    gk_status st = parse_fluid(a->w[0], a->wwhere[0], f, why);
    if (st == GK_OK && set->has_rh) {
        st = wet_fluid(f, set->rh, p, t, why);
        if (st == GK_OK && r != NULL) {
            rec_real(r, "rh", 100.0 * set->rh);
            rec_real(r, "x_water", f->x_water);
        }
    }
    if (st == GK_OK) { st = check_water(f, p, t, why); }
    return st;
}

/* ------------------------------------------------------------------ state */

/* clang-format off */
const field state_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"root", "root asked", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T", "temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity", F_REAL, NOD, "", "%"},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
    {"molar_mass", "molar mass", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
    {"z", "compressibility Z", F_REAL, NOD, "", ""},
    {"molar_volume", "molar volume", F_REAL, DIM_MOLAR_VOLUME, "L/mol", ""},
    {"density", "density", F_REAL, DIM_DENSITY, "kg/m3", ""},
    {"phi", "fugacity coefficient", F_REAL, NOD, "", ""},
    {"fugacity", "fugacity", F_REAL, DIM_PRESSURE, "bar", ""},
    {"branch", "branch returned", F_TEXT, NOD, "", ""},
    {"root_count", "real roots", F_REAL, NOD, "", ""},
    {"z_root_1", "Z root 1 (smallest)", F_REAL, NOD, "", ""},
    {"z_root_2", "Z root 2", F_REAL, NOD, "", ""},
    {"z_root_3", "Z root 3", F_REAL, NOD, "", ""},
    {"density_ideal", "density, ideal gas", F_REAL, DIM_DENSITY, "kg/m3", ""},
    {"deviation", "real vs ideal density", F_REAL, NOD, "", "%"},
};
/* clang-format on */
const size_t state_nfields = GKQ_ARRAY_SIZE(state_fields);

gk_status word_state(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt;
    gk_pressure p;
    gk_temperature t;
    fluid_in f;
    gk_eos_result res;
    gk_density rho_i;
    gk_status st;
    settings mset;
    double rho;
    int i;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, "pressure", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, "state", why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = word_fluid(set, a, p, t, &f, r, why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p, t, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    if (set->model == GK_EOS_IDEAL) {
        st = check_gas_phase(&f, p, t, "the ideal gas has no liquid", why);
        if (st != GK_OK) { return st; }
    }
    if (f.is_mix) {
        st = gk_mixture_eos_solve(set->model, &f.mix, NULL, p, t, set->root, &res);
    } else {
        st = gk_eos_solve(set->model, f.gas, p, t, set->root, &res);
    }
    if (st != GK_OK) { return explain(st, "state of", &f, why); }
    if ((st = check_branch(set, &res, &f, why)) != GK_OK) { return st; }
    if ((st = gk_ideal_density(p, t, f.m, &rho_i)) != GK_OK) {
        return explain(st, "ideal density of", &f, why);
    }
    rho = (double)f.m.kg_per_mol / (double)res.molar_volume.m3_per_mol;

    rec_text(r, "fluid", f.text);
    rec_text(r, "root",
             set->root == GK_ROOT_STABLE ? "stable"
             : set->root == GK_ROOT_GAS  ? "gas"
                                         : "liquid");
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "molar_mass", (double)f.m.kg_per_mol);
    rec_real(r, "z", (double)res.z);
    rec_real(r, "molar_volume", (double)res.molar_volume.m3_per_mol);
    rec_real(r, "density", rho);
    rec_real(r, "phi", (double)res.fugacity_coefficient);
    rec_real(r, "fugacity", (double)res.fugacity_coefficient * (double)p.pa);
    rec_text(r, "branch", branch_text(&res));
    rec_real(r, "root_count", (double)res.root_count);
    for (i = 0; i < res.root_count && i < 3; i++) {
        static const char *const keys[3] = { "z_root_1", "z_root_2", "z_root_3" };
        rec_real(r, keys[i], (double)res.z_roots[i]);
    }
    rec_real(r, "density_ideal", (double)rho_i.kg_per_m3);
    rec_real(r, "deviation", 100.0 * (rho / (double)rho_i.kg_per_m3 - 1.0));
    return GK_OK;
}

/* ------------------------------------------------------------------ convert */

/* clang-format off */
const field convert_fields[] = {
    {"from", "from", F_TEXT, NOD, "", ""},
    {"value", "value", F_REAL, NOD, "", ""},
    {"unit", "unit", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
};
/* clang-format on */
const size_t convert_nfields = GKQ_ARRAY_SIZE(convert_fields);

gk_status word_convert(const settings *set, args *a, record *r, detail *why) {
    quantity qto;
    const quantity *q;
    gk_real out;
    gk_status st;
    char probe[64];

    a->wexp = 1;
    if (a->nq != 1) {
        if (a->nq == 0 && a->nw > 0) {
            say(why,
                "%s '%.60s': not a number (convert takes a number with its unit, then the "
                "unit wanted, e.g. convert 3.2psig kPa)",
                a->wwhere[0], a->w[0]);
            return GK_ERR_PARSE;
        }
        say(why,
            "convert takes one quantity and the unit wanted (e.g. convert 3.2psig kPa); "
            "got %u quantities",
            (unsigned)a->nq);
        return GK_ERR_ARGUMENT;
    }
    q = &a->q[0];
    a->used_q[0] = 1;
    if ((st = need_word(a, 0, "unit wanted (e.g. convert 3.2psig kPa)", why)) != GK_OK) {
        return st;
    }
    if ((st = all_used(a, 1, "convert", why)) != GK_OK) { return st; }
    if (q->d == DIM_TIME || q->d == DIM_NUMBER) {
        blame(why, q, "convert works on pressures, temperatures, volumes, flows ..., not on a %s",
              dim_name(q->d));
        return GK_ERR_ARGUMENT;
    }
    /* the unit wanted is read as the quantity "1<unit>", which shares the gauge spellings */
    if (strlen(a->w[0]) + 2 > sizeof probe) {
        say(why, "%s '%.60s': the unit is too long", a->wwhere[0], a->w[0]);
        return GK_ERR_PARSE;
    }
    snprintf(probe, sizeof probe, "1%s", a->w[0]);
    if ((st = parse_quantity(probe, a->wwhere[0], &qto, why)) != GK_OK) { return st; }
    if (qto.d != q->d) {
        say(why, "cannot convert '%.40s' (a %s) to %.40s (a %s)", q->text, dim_name(q->d), a->w[0],
            dim_name(qto.d));
        return GK_ERR_ARGUMENT;
    }
    if (q->d == DIM_VOLUME_FLOW && q->ref != qto.ref) {
        say(why,
            "'%.40s' and '%.40s' are flows at different conditions (actual or a named "
            "reference): that needs the gas, its pressure and temperature: use 'gkq flow'",
            q->text, a->w[0]);
        return GK_ERR_ARGUMENT;
    }
    if (q->d == DIM_PRESSURE && (q->gauge || qto.gauge)) {
        gk_pressure p;
        if ((st = word_pressure(set, q, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
        if (qto.gauge) {
            rec_real(r, "barometer", (double)set->baro.pa);
            st = gk_convert((gk_real)((double)p.pa - (double)set->baro.pa), GK_UNIT_PA, qto.unit,
                            &out);
        } else {
            st = gk_pressure_to(p, qto.unit, &out);
        }
    } else {
        st = gk_convert((gk_real)q->value, q->unit, qto.unit, &out);
    }
    if (st != GK_OK) {
        blame(why, q, "%s", st == GK_ERR_DOMAIN ? "below absolute zero" : plain_status(st));
        return st;
    }
    rec_text(r, "from", q->text);
    /* the target unit's own factor (e.g. inH2O over Pa) */
    rec_real(r, "value", (double)out / qto.value);
    rec_text(r, "unit", a->w[0]);
    return GK_OK;
}

/* ------------------------------------------------------------------ speeds */

/* clang-format off */
const field speeds_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"T", "temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"molar_mass", "molar mass", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
    {"most_probable", "most probable speed", F_REAL, DIM_SPEED, "m/s", ""},
    {"mean", "mean speed", F_REAL, DIM_SPEED, "m/s", ""},
    {"rms", "root-mean-square speed", F_REAL, DIM_SPEED, "m/s", ""},
    {"sound", "speed of sound (ideal gas)", F_REAL, DIM_SPEED, "m/s", ""},
    {"other", "compared with", F_TEXT, NOD, "", ""},
    {"effusion_ratio", "effusion rate ratio", F_REAL, NOD, "", ""},
    {"effusion_time_ratio", "effusion time ratio", F_REAL, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "pressure (absolute)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"mean_free_path", "mean free path", F_REAL, NOD, "", "m"},
    {"wall_flux", "wall collision flux", F_REAL, NOD, "", "mol/m2/s"},
};
/* clang-format on */
const size_t speeds_nfields = GKQ_ARRAY_SIZE(speeds_fields);

gk_status word_speeds(const settings *set, args *a, record *r, detail *why) {
    const quantity *qt, *qp;
    gk_temperature t;
    fluid_in f, g;
    gk_speed u;
    gk_status st;

    a->wexp = 2;
    if ((st = need_word(a, 0, "fluid", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature", &qt, why)) != GK_OK) { return st; }
    qp = take(a, DIM_PRESSURE);
    if ((st = all_used(a, 2, "speeds", why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], a->wwhere[0], &f, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    rec_text(r, "fluid", f.text);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "molar_mass", (double)f.m.kg_per_mol);
    st = gk_speed_most_probable(t, f.m, &u);
    if (st == GK_OK) { rec_real(r, "most_probable", (double)u.m_per_s); }
    if (st == GK_OK) { st = gk_speed_mean(t, f.m, &u); }
    if (st == GK_OK) { rec_real(r, "mean", (double)u.m_per_s); }
    if (st == GK_OK) { st = gk_speed_rms(t, f.m, &u); }
    if (st == GK_OK) { rec_real(r, "rms", (double)u.m_per_s); }
    if (st == GK_OK && !f.is_mix && f.gas->heat_capacity_ratio > (gk_real)1.0) {
        st = gk_speed_of_sound_ideal(t, f.m, f.gas->heat_capacity_ratio, &u);
        if (st == GK_OK) { rec_real(r, "sound", (double)u.m_per_s); }
    }
    if (st != GK_OK) { return explain(st, "speeds of", &f, why); }
    if (a->nw > 1) {
        gk_real ratio;
        if ((st = parse_fluid(a->w[1], a->wwhere[1], &g, why)) != GK_OK) { return st; }
        if ((st = gk_effusion_ratio(f.m, g.m, &ratio)) != GK_OK) {
            return explain(st, "effusion against", &g, why);
        }
        rec_text(r, "other", g.text);
        rec_real(r, "effusion_ratio", (double)ratio);
        rec_real(r, "effusion_time_ratio", 1.0 / (double)ratio);
    }
    if (qp != NULL) {
        gk_pressure p;
        gk_real flux;
        if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
        rec_real(r, "p", (double)p.pa);
        if ((st = gk_wall_flux(p, t, f.m, &flux)) != GK_OK) {
            return explain(st, "wall flux of", &f, why);
        }
        rec_real(r, "wall_flux", (double)flux);
        if (!f.is_mix && f.gas->collision_diameter > (gk_real)0.0) {
            gk_real lambda;
            st = gk_mean_free_path(p, t, f.gas->collision_diameter, &lambda);
            if (st != GK_OK) { return explain(st, "mean free path of", &f, why); }
            rec_real(r, "mean_free_path", (double)lambda);
        }
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ water */

/* clang-format off */
const field water_fields[] = {
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"T", "saturation temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"p_sat", "vapour pressure", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"phase", "over", F_TEXT, NOD, "", ""},
};
/* clang-format on */
const size_t water_nfields = GKQ_ARRAY_SIZE(water_fields);

gk_status word_water(const settings *set, args *a, record *r, detail *why) {
    const quantity *q;
    gk_temperature t;
    gk_pressure p;
    gk_status st;
    a->wexp = 0;
    if (a->nq != 1) {
        if ((st = all_used(a, 0, "water", why)) != GK_OK) { return st; }
        say(why,
            "water takes one temperature (e.g. 25degC) or one pressure (e.g. 1atm), got %u "
            "quantities",
            (unsigned)a->nq);
        return GK_ERR_ARGUMENT;
    }
    q = &a->q[0];
    a->used_q[0] = 1;
    if ((st = all_used(a, 0, "water", why)) != GK_OK) { return st; }
    if (q->d == DIM_TEMPERATURE) {
        if ((st = to_temperature(q, &t, why)) != GK_OK) { return st; }
        st = gk_water_vapour_pressure(t, &p);
    } else if (q->d == DIM_PRESSURE) {
        if ((st = word_pressure(set, q, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
        st = gk_water_saturation_temperature(p, &t);
    } else {
        blame(why, q, "a %s, but a temperature or a pressure was expected", dim_name(q->d));
        return GK_ERR_ARGUMENT;
    }
    if (st == GK_ERR_RANGE) {
        blame(why, q,
              "outside the vapour-pressure curves of water and ice (200 K to 647.096 K, "
              "IAPWS-IF97 and IAPWS 2011)");
        return st;
    }
    if (st != GK_OK) {
        blame(why, q, "%s", plain_status(st));
        return st;
    }
    rec_real(r, "T", (double)t.k);
    rec_real(r, "p_sat", (double)p.pa);
    /* IAPWS: liquid water at and above the triple point 273.16 K (water.h) */
    rec_text(r, "phase", (double)t.k >= 273.16 ? "liquid water" : "ice");
    return GK_OK;
}

/* ------------------------------------------------------------------ dew */

/* clang-format off */
const field dew_fields[] = {
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "total pressure (absolute)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"T", "gas temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity", F_REAL, NOD, "", "%"},
    {"p_water", "water partial pressure", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
    {"p_dry", "dry-gas partial pressure", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"dew_point", "dew (or frost) point", F_REAL, DIM_TEMPERATURE, "degC", ""},
};
/* clang-format on */
const size_t dew_nfields = GKQ_ARRAY_SIZE(dew_fields);

gk_status word_dew(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt, *qrh;
    gk_pressure p, pw, pdry;
    gk_temperature t, dew;
    gk_status st;
    double rh = 0.0;

    a->wexp = 0;
    if ((st = need(a, DIM_PRESSURE, "pressure", &qp, why)) != GK_OK) { return st; }
    qt = take(a, DIM_TEMPERATURE);
    qrh = take(a, DIM_NUMBER);
    if ((st = all_used(a, 0, "dew", why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
    if (qt == NULL && qrh == NULL) {
        /* the pressure is the water partial pressure */
        if ((st = gk_dew_point(p, &dew)) != GK_OK) {
            blame(why, qp, "%s",
                  st == GK_ERR_RANGE ? "outside the vapour-pressure curves of "
                                       "water and ice (200 K to 647.096 K)"
                                     : plain_status(st));
            return st;
        }
        rec_real(r, "p_water", (double)p.pa);
        rec_real(r, "dew_point", (double)dew.k);
        return GK_OK;
    }
    if (qt == NULL || qrh == NULL) {
        say(why, "dew takes a water partial pressure, or a total pressure, a temperature and a "
                 "relative humidity (e.g. dew 1atm 20degC 50%%)");
        return GK_ERR_ARGUMENT;
    }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = fraction_of(qrh, "relative humidity", &rh, why)) != GK_OK) { return st; }
    st = gk_dry_gas_pressure(p, t, (gk_real)rh, &pdry);
    if (st == GK_ERR_RANGE) {
        blame(why, qt, "outside the vapour-pressure curves of water and ice (200 K to 647.096 K)");
        return st;
    }
    if (st == GK_ERR_NO_SOLUTION) {
        blame(why, qp, "the water vapour at this humidity would exceed the total pressure");
        return st;
    }
    if (st != GK_OK) {
        say(why, "dew: %s", plain_status(st));
        return st;
    }
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "rh", 100.0 * rh);
    rec_real(r, "p_dry", (double)pdry.pa);
    if (!((double)p.pa - (double)pdry.pa > 0.0)) {
        /* completely dry gas: no dew point */
        rec_real(r, "p_water", 0.0);
        rec_real(r, "x_water", 0.0);
        return GK_OK;
    }
    pw.pa = (gk_real)((double)p.pa - (double)pdry.pa);
    if ((st = gk_dew_point(pw, &dew)) != GK_OK) {
        say(why, "dew point: %s", plain_status(st));
        return st;
    }
    rec_real(r, "p_water", (double)pw.pa);
    rec_real(r, "x_water", (double)pw.pa / (double)p.pa);
    rec_real(r, "dew_point", (double)dew.k);
    return GK_OK;
}

/* ------------------------------------------------------------------ contents */

/* clang-format off */
const field contents_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"reference", "reference condition", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"vessel", "vessel volume", F_REAL, DIM_VOLUME, "L", ""},
    {"p", "pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T", "temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity", F_REAL, NOD, "", "%"},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
    {"z", "compressibility Z", F_REAL, NOD, "", ""},
    {"amount", "amount", F_REAL, DIM_AMOUNT, "mol", ""},
    {"mass", "mass", F_REAL, DIM_MASS, "kg", ""},
    {"reference_volume", "volume at reference", F_REAL, DIM_VOLUME, "L", ""},
    {"amount_ideal", "amount, ideal gas", F_REAL, DIM_AMOUNT, "mol", ""},
    {"mass_ideal", "mass, ideal gas", F_REAL, DIM_MASS, "kg", ""},
    {"reference_volume_ideal", "volume at reference, ideal gas", F_REAL, DIM_VOLUME, "L", ""},
    {"deviation", "real vs ideal amount", F_REAL, NOD, "", "%"},
};
/* clang-format on */
const size_t contents_nfields = GKQ_ARRAY_SIZE(contents_fields);

gk_status word_contents(const settings *set, args *a, record *r, detail *why) {
    const quantity *qv, *qp, *qt;
    gk_volume v;
    gk_pressure p;
    gk_temperature t;
    fluid_in f;
    gk_contents c, ci;
    gk_status st;
    settings mset;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_VOLUME, "vessel volume", &qv, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, "pressure", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, "contents", why)) != GK_OK) { return st; }
    if ((st = to_volume(qv, &v, why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = word_fluid(set, a, p, t, &f, r, why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p, t, NULL, why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p, t, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    st = gk_vessel_contents(set->model, as_fluid(&f), v, p, t, set->ref, &c);
    if (st != GK_OK) { return explain(st, "contents of", &f, why); }
    st = gk_vessel_contents(GK_EOS_IDEAL, as_fluid(&f), v, p, t, set->ref, &ci);
    if (st != GK_OK) { return explain(st, "ideal-gas contents of", &f, why); }
    rec_text(r, "fluid", f.text);
    rec_reference(r, set);
    rec_real(r, "vessel", (double)v.m3);
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "z", (double)c.z);
    rec_real(r, "amount", (double)c.amount.mol);
    rec_real(r, "mass", (double)c.mass.kg);
    rec_real(r, "reference_volume", (double)c.reference_volume.m3);
    rec_real(r, "amount_ideal", (double)ci.amount.mol);
    rec_real(r, "mass_ideal", (double)ci.mass.kg);
    rec_real(r, "reference_volume_ideal", (double)ci.reference_volume.m3);
    rec_real(r, "deviation", 100.0 * ((double)c.amount.mol / (double)ci.amount.mol - 1.0));
    return GK_OK;
}

/* ------------------------------------------------------------------ leak */

/* clang-format off */
const field leak_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"reference", "reference condition", F_TEXT, NOD, "", ""},
    {"volume", "test volume", F_REAL, DIM_VOLUME, "L", ""},
    {"barometer", "barometer at start", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"barometer_end", "barometer at end", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p_start", "start pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T_start", "start temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"p_end", "end pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T_end", "end temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity at start", F_REAL, NOD, "", "%"},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
    {"elapsed", "elapsed time", F_REAL, NOD, "", "s"},
    {"amount_lost", "amount lost", F_REAL, NOD, "", "mol/s"},
    {"mass_lost", "mass lost", F_REAL, DIM_MASS_FLOW, "g/h", ""},
    {"leak_ref", "leak at reference", F_REAL, DIM_VOLUME_FLOW, "mL/min", "ref"},
    {"leak_ref_ideal", "leak at reference, ideal gas", F_REAL, DIM_VOLUME_FLOW, "mL/min", "ref"},
};
/* clang-format on */
const size_t leak_nfields = GKQ_ARRAY_SIZE(leak_fields);

gk_status word_leak(const settings *set, args *a, record *r, detail *why) {
    const quantity *qv, *qp1, *qp2, *qt1, *qt2, *qd;
    gk_volume v;
    gk_pressure p1, p2;
    gk_temperature t1, t2;
    fluid_in f;
    gk_leak lk, lki;
    gk_status st;
    settings mset;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_VOLUME, "test volume", &qv, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, "start pressure", &qp1, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, "end pressure", &qp2, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature", &qt1, why)) != GK_OK) { return st; }
    qt2 = take(a, DIM_TEMPERATURE);
    if (qt2 == NULL) { qt2 = qt1; /* one temperature: the same at start and end */ }
    if ((st = need(a, DIM_TIME, "elapsed time", &qd, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, "leak", why)) != GK_OK) { return st; }
    if ((st = to_volume(qv, &v, why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp1, 0, r, "barometer", &p1, why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp2, 1, r, "barometer_end", &p2, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt1, &t1, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt2, &t2, why)) != GK_OK) { return st; }
    if (!(qd->value > 0.0)) {
        blame(why, qd, "the elapsed time must be above 0");
        return GK_ERR_DOMAIN;
    }
    if ((st = word_fluid(set, a, p1, t1, &f, r, why)) != GK_OK) { return st; }
    if ((st = check_water(&f, p2, t2, why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p1, t1, "leak test start", why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p2, t2, "leak test end", why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p1, t1, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    st = gk_leak_rate_pressure_decay(set->model, as_fluid(&f), v, p1, t1, p2, t2,
                                     (gk_real)qd->value, set->ref, &lk);
    if (st == GK_OK) {
        st = gk_leak_rate_pressure_decay(GK_EOS_IDEAL, as_fluid(&f), v, p1, t1, p2, t2,
                                         (gk_real)qd->value, set->ref, &lki);
    }
    if (st == GK_ERR_NO_SOLUTION) {
        say(why,
            "leak of '%.80s': the end state holds more gas than the start (gas flowed in, "
            "or a temperature or barometer reading is off)",
            f.text);
        return st;
    }
    if (st != GK_OK) { return explain(st, "leak of", &f, why); }
    rec_text(r, "fluid", f.text);
    rec_reference(r, set);
    rec_real(r, "volume", (double)v.m3);
    rec_real(r, "p_start", (double)p1.pa);
    rec_real(r, "T_start", (double)t1.k);
    rec_real(r, "p_end", (double)p2.pa);
    rec_real(r, "T_end", (double)t2.k);
    rec_real(r, "elapsed", qd->value);
    rec_real(r, "amount_lost", (double)lk.mol_per_s);
    rec_real(r, "mass_lost", (double)lk.mass_flow.kg_per_s);
    rec_real(r, "leak_ref", (double)lk.reference_flow.m3_per_s);
    rec_real(r, "leak_ref_ideal", (double)lki.reference_flow.m3_per_s);
    return GK_OK;
}

/* ------------------------------------------------------------------ gases, units */

/* clang-format off */
static const field gas_fields[] = {
    {"formula", "formula", F_TEXT, NOD, "", ""},
    {"name", "name", F_TEXT, NOD, "", ""},
    {"molar_mass", "molar mass", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
    {"Tc", "critical temperature", F_REAL, DIM_TEMPERATURE, "K", ""},
    {"pc", "critical pressure", F_REAL, DIM_PRESSURE, "bar", ""},
    {"omega", "acentric factor", F_REAL, NOD, "", ""},
    {"gamma", "cp/cv", F_REAL, NOD, "", ""},
    {"vdw_a", "van der Waals a", F_REAL, NOD, "", "Pa m6/mol2"},
    {"vdw_b", "van der Waals b", F_REAL, NOD, "", "m3/mol"},
};
/* clang-format on */

int word_gases(const settings *set, int argc, char **argv) {
    size_t i, n = gk_gas_count();
    record r;
    if (argc > 0) {
        fprintf(stderr, "gkq gases: '%.60s': gases takes no arguments\n", argv[0]);
        return 2;
    }
    if (set->format == OUT_TEXT) {
        printf("%-10s %-22s %10s %9s %9s %7s %6s\n", "formula", "name", "M g/mol", "Tc K", "pc bar",
               "omega", "cp/cv");
        for (i = 0; i < n; i++) {
            const gk_gas *g = gk_gas_at(i);
            if (g == NULL) { break; }
            printf("%-10s %-22s %10.4f %9.2f %9.3f %7.3f ", g->formula ? g->formula : "",
                   g->name ? g->name : "", (double)g->molar_mass.kg_per_mol * 1000.0,
                   (double)g->critical_temperature.k, (double)g->critical_pressure.pa / 1e5,
                   (double)g->acentric_factor);
            if (g->heat_capacity_ratio > (gk_real)0.0) {
                printf("%6.3f\n", (double)g->heat_capacity_ratio);
            } else {
                printf("%6s\n", "-");
            }
        }
        return finish_output(stdout);
    }
    for (i = 0; i < n; i++) {
        const gk_gas *g = gk_gas_at(i);
        if (g == NULL) { break; }
        rec_init(&r, gas_fields, GKQ_ARRAY_SIZE(gas_fields));
        rec_text(&r, "formula", g->formula != NULL ? g->formula : "");
        rec_text(&r, "name", g->name != NULL ? g->name : "");
        rec_real(&r, "molar_mass", (double)g->molar_mass.kg_per_mol);
        rec_real(&r, "Tc", (double)g->critical_temperature.k);
        rec_real(&r, "pc", (double)g->critical_pressure.pa);
        rec_real(&r, "omega", (double)g->acentric_factor);
        if (g->heat_capacity_ratio > (gk_real)0.0) {
            rec_real(&r, "gamma", (double)g->heat_capacity_ratio);
        }
        rec_real(&r, "vdw_a", (double)g->vdw_a);
        rec_real(&r, "vdw_b", (double)g->vdw_b);
        rec_print(stdout, set, &r, "gases");
    }
    return finish_output(stdout);
}

int word_units(const settings *set, int argc, char **argv) {
    (void)set;
    if (argc > 0) {
        fprintf(stderr, "gkq units: '%.60s': units takes no arguments\n", argv[0]);
        return 2;
    }
    return list_units(stdout);
}
