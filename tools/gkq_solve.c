/*
 * gkq_solve.c - the words that solve for another unknown: flow (actual, reference and mass
 * flow), fill (the pressure for an amount or mass in a vessel), retemp (a closed vessel after a
 * change of temperature), rh (relative humidity from a dew point), effusion (molar mass from
 * effusion times) and reldensity (density relative to air).
 */
#include <math.h>
#include <string.h>

#include "gkq.h"

#define NOD DIM_NONE
/* Bisection steps for a pressure: halving a bracket of a factor 400 in log p to 1e-13
   relative takes about 45 steps; the cap leaves room and is reported when reached. */
#define GKQ_SOLVE_MAX_ITER 200

/* The relative agreement a solved amount must reach: a float build carries 7 digits. */
static double solve_tolerance(void) {
    return (gk_build_flags() & GK_BUILD_FLOAT) != 0u ? 2e-5 : 1e-9;
}

/* The reference condition of a word's output: -R, else the one a flow spelling names, else
   the default (0C). */
static void output_reference(const settings *set, int ref, gk_reference *out, char *what,
                             size_t cap) {
    if (!set->ref_given && ref > 0 && (size_t)ref <= gkq_nrefs &&
        gk_reference_get(gkq_refs[ref - 1].id, out) == GK_OK) {
        copy_text(what, cap, gkq_refs[ref - 1].what);
        return;
    }
    *out = set->ref;
    copy_text(what, cap, set->ref_what);
}

static gk_status fluid_of(const settings *set, const args *a, gk_pressure p, gk_temperature t,
                          fluid_in *f, record *r, detail *why) {
    gk_status st = parse_fluid(a->w[0], a->wwhere[0], f, why);
    if (st == GK_OK && set->has_rh) {
        st = wet_fluid(f, set->rh, p, t, why);
        if (st == GK_OK) {
            rec_real(r, "rh", 100.0 * set->rh);
            rec_real(r, "x_water", f->x_water);
        }
    }
    if (st == GK_OK) { st = check_water(f, p, t, why); }
    return st;
}

/* ------------------------------------------------------------------ flow */

/* clang-format off */
const field flow_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"given", "flow given as", F_TEXT, NOD, "", ""},
    {"reference", "reference condition", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "line pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T", "line temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity", F_REAL, NOD, "", "%"},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
    {"z", "compressibility Z in the line", F_REAL, NOD, "", ""},
    {"q_actual", "actual volume flow", F_REAL, DIM_VOLUME_FLOW, "L/min", ""},
    {"q_ref", "volume flow at reference", F_REAL, DIM_VOLUME_FLOW, "L/min", "ref"},
    {"mass_flow", "mass flow", F_REAL, DIM_MASS_FLOW, "kg/h", ""},
    {"molar_flow", "molar flow", F_REAL, NOD, "", "mol/s"},
};
/* clang-format on */
const size_t flow_nfields = GKQ_ARRAY_SIZE(flow_fields);

gk_status word_flow(const settings *set, args *a, record *r, detail *why) {
    const quantity *qq, *qp, *qt;
    gk_pressure p;
    gk_temperature t;
    gk_reference ref_out, ref_in;
    char what[160], given[200];
    fluid_in f;
    gk_volume_flow qa, qr, one;
    gk_mass_flow w, w1;
    gk_real z;
    gk_status st;
    settings mset;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    qq = take(a, DIM_VOLUME_FLOW);
    if (qq == NULL) { qq = take(a, DIM_MASS_FLOW); }
    if (qq == NULL) {
        return need(a, DIM_VOLUME_FLOW, "flow (actual, at a reference, or a mass flow)", &qq, why);
    }
    if ((st = need(a, DIM_PRESSURE, "line pressure", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "line temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, "flow", why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = fluid_of(set, a, p, t, &f, r, why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p, t, NULL, why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p, t, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    output_reference(set, qq->ref, &ref_out, what, sizeof what);
    one.m3_per_s = (gk_real)1.0;
    st = gk_flow_to_mass(set->model, as_fluid(&f), one, p, t, &w1);
    if (st == GK_OK) { st = gk_fluid_z(set->model, as_fluid(&f), p, t, &z); }
    if (st != GK_OK) { return explain(st, "flow of", &f, why); }
    if (qq->d == DIM_MASS_FLOW) {
        st = gk_mass_flow_from((gk_real)qq->value, qq->unit, &w);
        qa.m3_per_s = (gk_real)((double)w.kg_per_s / (double)w1.kg_per_s);
        snprintf(given, sizeof given, "mass flow");
    } else if (qq->ref > 0) {
        gk_volume_flow qin;
        st = gk_reference_get(gkq_refs[qq->ref - 1].id, &ref_in);
        if (st == GK_OK) { st = gk_volume_flow_from((gk_real)qq->value, qq->unit, &qin); }
        if (st == GK_OK) {
            st = gk_flow_from_reference(set->model, as_fluid(&f), qin, ref_in, p, t, &qa);
        }
        snprintf(given, sizeof given, "%s: %s", qq->uname, qq->uwhat);
    } else {
        st = gk_volume_flow_from((gk_real)qq->value, qq->unit, &qa);
        snprintf(given, sizeof given, "actual volume flow");
    }
    if (st == GK_ERR_DOMAIN || st == GK_ERR_RANGE) {
        blame(why, qq, "%s", plain_status(st));
        return st;
    }
    if (st == GK_OK) {
        st = gk_flow_to_reference(set->model, as_fluid(&f), qa, p, t, ref_out, &qr);
    }
    if (st == GK_OK) { st = gk_flow_to_mass(set->model, as_fluid(&f), qa, p, t, &w); }
    if (st != GK_OK) { return explain(st, "flow of", &f, why); }
    rec_text(r, "fluid", f.text);
    rec_text(r, "given", given);
    rec_text(r, "reference", what);
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "z", (double)z);
    rec_real(r, "q_actual", (double)qa.m3_per_s);
    rec_real(r, "q_ref", (double)qr.m3_per_s);
    rec_real(r, "mass_flow", (double)w.kg_per_s);
    rec_real(r, "molar_flow", (double)w.kg_per_s / (double)f.m.kg_per_mol);
    return GK_OK;
}

/* ------------------------------------------------------------------ pressure for an amount */

/* The pressure at which a vessel of volume v at t holds n_target of the fluid: bisection in
   log p on the contents of the model (amount rises with pressure in the gas). A state where
   the model refuses the contents (liquid) counts as too high, and is reported when it bounds
   the answer. */
static gk_status pressure_for_amount(const settings *set, const fluid_in *f, gk_volume v,
                                     gk_temperature t, double n_target, gk_pressure *out,
                                     gk_contents *c_out, detail *why) {
    double p0 = n_target * (double)GK_R * (double)t.k / (double)v.m3;
    double lo = p0 / 20.0, hi = p0 * 20.0, err;
    int i, refused = 0;
    gk_pressure p;
    gk_contents c;
    gk_status st;
    for (i = 0; i < GKQ_SOLVE_MAX_ITER && hi / lo > 1.0 + 1e-13; i++) {
        double mid = sqrt(lo * hi);
        p.pa = (gk_real)mid;
        st = gk_vessel_contents(set->model, as_fluid(f), v, p, t, set->ref, &c);
        if (st == GK_ERR_RANGE) {
            refused = 1;
            hi = mid;
        } else if (st != GK_OK) {
            return explain(st, "fill of", f, why);
        } else if ((double)c.amount.mol < n_target) {
            lo = mid;
        } else {
            hi = mid;
        }
    }
    p.pa = (gk_real)sqrt(lo * hi);
    st = gk_vessel_contents(set->model, as_fluid(f), v, p, t, set->ref, &c);
    if ((st == GK_ERR_RANGE ||
         (st == GK_OK && refused && (double)c.amount.mol < n_target * 0.999)) &&
        (double)t.k >= f->tc_k) {
        say(why, "'%.80s': no pressure within the model's range holds that much at %.4g degC",
            f->text, (double)t.k - 273.15);
        return GK_ERR_RANGE;
    }
    if (st == GK_ERR_RANGE || (st == GK_OK && refused && (double)c.amount.mol < n_target * 0.999)) {
        say(why,
            "'%.80s' cannot hold that much as a gas at %.4g degC: it liquefies first (a "
            "liquefied gas is filled and checked by weight)",
            f->text, (double)t.k - 273.15);
        return GK_ERR_RANGE;
    }
    if (st != GK_OK) { return explain(st, "fill of", f, why); }
    err = fabs((double)c.amount.mol / n_target - 1.0);
    if (err > solve_tolerance()) {
        say(why,
            "fill of '%.80s': no pressure between %.3g and %.3g bar gives that amount (closest "
            "%.3g %% off)",
            f->text, p0 / 20.0 / 1e5, p0 * 20.0 / 1e5, 100.0 * err);
        return GK_ERR_NO_SOLUTION;
    }
    if ((st = check_gas_phase(f, p, t, NULL, why)) != GK_OK) { return st; }
    *out = p;
    *c_out = c;
    return GK_OK;
}

/* clang-format off */
const field fill_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"vessel", "vessel volume", F_REAL, DIM_VOLUME, "L", ""},
    {"T", "temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"amount", "amount", F_REAL, DIM_AMOUNT, "mol", ""},
    {"mass", "mass", F_REAL, DIM_MASS, "kg", ""},
    {"z", "compressibility Z", F_REAL, NOD, "", ""},
    {"p", "fill pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"barometer", "barometer", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p_gauge", "fill pressure (gauge)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"p_ideal", "fill pressure, ideal gas", F_REAL, DIM_PRESSURE, "bar", ""},
};
/* clang-format on */
const size_t fill_nfields = GKQ_ARRAY_SIZE(fill_fields);

gk_status word_fill(const settings *set, args *a, record *r, detail *why) {
    const quantity *qv, *qt, *qn;
    gk_volume v;
    gk_temperature t;
    gk_pressure p;
    gk_contents c;
    fluid_in f;
    gk_status st;
    settings mset;
    double n;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_VOLUME, "vessel volume", &qv, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature", &qt, why)) != GK_OK) { return st; }
    qn = take(a, DIM_AMOUNT);
    if (qn == NULL) { qn = take(a, DIM_MASS); }
    if (qn == NULL) { return need(a, DIM_MASS, "target amount or mass", &qn, why); }
    if ((st = all_used(a, 1, "fill", why)) != GK_OK) { return st; }
    if ((st = to_volume(qv, &v, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], a->wwhere[0], &f, why)) != GK_OK) { return st; }
    if (qn->d == DIM_AMOUNT) {
        gk_amount am;
        st = gk_amount_from((gk_real)qn->value, qn->unit, &am);
        n = (double)am.mol;
    } else {
        gk_mass ms;
        st = gk_mass_from((gk_real)qn->value, qn->unit, &ms);
        n = (double)ms.kg / (double)f.m.kg_per_mol;
    }
    if (st != GK_OK) {
        blame(why, qn, "the target must be above 0");
        return st;
    }
    p.pa = (gk_real)(n * (double)GK_R * (double)t.k / (double)v.m3); /* ideal-gas estimate */
    if ((st = use_model(set, &f, p, t, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    if ((st = pressure_for_amount(set, &f, v, t, n, &p, &c, why)) != GK_OK) { return st; }
    rec_text(r, "fluid", f.text);
    rec_real(r, "vessel", (double)v.m3);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "amount", (double)c.amount.mol);
    rec_real(r, "mass", (double)c.mass.kg);
    rec_real(r, "z", (double)c.z);
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "barometer", (double)set->baro.pa);
    rec_real(r, "p_gauge", (double)p.pa - (double)set->baro.pa);
    rec_real(r, "p_ideal", n * (double)GK_R * (double)t.k / (double)v.m3);
    return GK_OK;
}

/* ------------------------------------------------------------------ retemp */

/* clang-format off */
const field retemp_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p_start", "pressure before (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T_start", "temperature before", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"z_start", "compressibility Z before", F_REAL, NOD, "", ""},
    {"T_end", "temperature after", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"p_end", "pressure after (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"p_end_gauge", "pressure after (gauge)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"z_end", "compressibility Z after", F_REAL, NOD, "", ""},
    {"p_end_ideal", "pressure after, ideal gas", F_REAL, DIM_PRESSURE, "bar", ""},
};
/* clang-format on */
const size_t retemp_nfields = GKQ_ARRAY_SIZE(retemp_fields);

gk_status word_retemp(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt1, *qt2;
    gk_pressure p1, p2;
    gk_temperature t1, t2;
    gk_volume v;
    gk_contents c1, c2;
    fluid_in f;
    gk_status st;
    settings mset;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, "pressure before", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature before", &qt1, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "temperature after", &qt2, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, "retemp", why)) != GK_OK) { return st; }
    if ((st = word_pressure(set, qp, 0, r, "barometer", &p1, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt1, &t1, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt2, &t2, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], a->wwhere[0], &f, why)) != GK_OK) { return st; }
    if ((st = check_water(&f, p1, t1, why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p1, t1, "before", why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p1, t1, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    /* a closed vessel keeps its amount per volume: 1 m3 stands for any volume */
    v.m3 = (gk_real)1.0;
    p2.pa = (gk_real)0.0;
    memset(&c2, 0, sizeof c2);
    st = gk_vessel_contents(set->model, as_fluid(&f), v, p1, t1, set->ref, &c1);
    if (st != GK_OK) { return explain(st, "state before of", &f, why); }
    st = pressure_for_amount(set, &f, v, t2, (double)c1.amount.mol, &p2, &c2, why);
    if (st != GK_OK) { return st; }
    if ((st = check_water(&f, p2, t2, why)) != GK_OK) { return st; }
    rec_text(r, "fluid", f.text);
    rec_real(r, "p_start", (double)p1.pa);
    rec_real(r, "T_start", (double)t1.k);
    rec_real(r, "z_start", (double)c1.z);
    rec_real(r, "T_end", (double)t2.k);
    rec_real(r, "p_end", (double)p2.pa);
    if (qp->gauge) { rec_real(r, "p_end_gauge", (double)p2.pa - (double)set->baro.pa); }
    rec_real(r, "z_end", (double)c2.z);
    rec_real(r, "p_end_ideal", (double)p1.pa * (double)t2.k / (double)t1.k);
    return GK_OK;
}

/* ------------------------------------------------------------------ rh */

/* clang-format off */
const field rh_fields[] = {
    {"T", "gas temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"dew_point", "dew (or frost) point", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"rh", "relative humidity", F_REAL, NOD, "", "%"},
    {"p_water", "water partial pressure", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "total pressure (absolute)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"x_water", "water mole fraction", F_REAL, NOD, "", ""},
};
/* clang-format on */
const size_t rh_nfields = GKQ_ARRAY_SIZE(rh_fields);

/* RH = p_ws(dew point) / p_ws(T): the water partial pressure is the saturation pressure at the
   dew point (the definition of the dew point; over ice below 0.01 degC, as gk_dew_point). */
gk_status word_rh(const settings *set, args *a, record *r, detail *why) {
    const quantity *qt, *qd, *qp;
    gk_temperature t, td;
    gk_pressure pw, pws, p;
    gk_status st;

    a->wexp = 0;
    if ((st = need(a, DIM_TEMPERATURE, "gas temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, "dew point", &qd, why)) != GK_OK) { return st; }
    qp = take(a, DIM_PRESSURE);
    if ((st = all_used(a, 0, "rh", why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qd, &td, why)) != GK_OK) { return st; }
    if ((double)td.k > (double)t.k) {
        blame(why, qd,
              "the dew point is above the gas temperature: such gas would be "
              "supersaturated (the water condenses)");
        return GK_ERR_NO_SOLUTION;
    }
    if ((st = gk_water_vapour_pressure(td, &pw)) != GK_OK) {
        blame(why, qd, "outside the vapour-pressure curves of water and ice (200 K to 647.096 K)");
        return st;
    }
    if ((st = gk_water_vapour_pressure(t, &pws)) != GK_OK) {
        blame(why, qt, "outside the vapour-pressure curves of water and ice (200 K to 647.096 K)");
        return st;
    }
    rec_real(r, "T", (double)t.k);
    rec_real(r, "dew_point", (double)td.k);
    rec_real(r, "rh", 100.0 * (double)pw.pa / (double)pws.pa);
    rec_real(r, "p_water", (double)pw.pa);
    if (qp != NULL) {
        if ((st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) { return st; }
        if ((double)pw.pa >= (double)p.pa) {
            blame(why, qp,
                  "the water partial pressure at that dew point is not below this total "
                  "pressure");
            return GK_ERR_NO_SOLUTION;
        }
        rec_real(r, "p", (double)p.pa);
        rec_real(r, "x_water", (double)pw.pa / (double)p.pa);
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ effusion */

/* clang-format off */
const field effusion_fields[] = {
    {"reference_gas", "reference gas", F_TEXT, NOD, "", ""},
    {"time_unknown", "effusion time, unknown gas", F_REAL, NOD, "", "s"},
    {"time_reference", "effusion time, reference gas", F_REAL, NOD, "", "s"},
    {"time_ratio", "time ratio", F_REAL, NOD, "", ""},
    {"molar_mass", "molar mass of the unknown", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
    {"nearest_gas", "nearest gas of the table", F_TEXT, NOD, "", ""},
    {"nearest_molar_mass", "its molar mass", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
};
/* clang-format on */
const size_t effusion_nfields = GKQ_ARRAY_SIZE(effusion_fields);

/* Graham's law: equal amounts effusing under equal conditions take times in proportion to
   sqrt(M), so M = M_ref (t / t_ref)^2 (gk_effusion_molar_mass). */
gk_status word_effusion(const settings *set, args *a, record *r, detail *why) {
    const quantity *qu, *qr;
    fluid_in f;
    gk_molar_mass m;
    gk_status st;
    double ratio, bestd = 1e300;
    size_t i;
    const gk_gas *best = NULL;

    (void)set;
    a->wexp = 1;
    if ((st = need_word(a, 0, "reference gas", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TIME, "effusion time of the unknown gas", &qu, why)) != GK_OK) {
        return st;
    }
    if ((st = need(a, DIM_TIME, "effusion time of the reference gas", &qr, why)) != GK_OK) {
        return st;
    }
    if ((st = all_used(a, 1, "effusion", why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], a->wwhere[0], &f, why)) != GK_OK) { return st; }
    if (!(qu->value > 0.0)) {
        blame(why, qu, "an effusion time must be above 0");
        return GK_ERR_DOMAIN;
    }
    if (!(qr->value > 0.0)) {
        blame(why, qr, "an effusion time must be above 0");
        return GK_ERR_DOMAIN;
    }
    ratio = qu->value / qr->value;
    if ((st = gk_effusion_molar_mass(f.m, (gk_real)ratio, &m)) != GK_OK) {
        say(why, "effusion: %s", plain_status(st));
        return st;
    }
    for (i = 0; i < gk_gas_count(); i++) {
        const gk_gas *g = gk_gas_at(i);
        double d;
        if (g == NULL) { break; }
        d = fabs((double)g->molar_mass.kg_per_mol / (double)m.kg_per_mol - 1.0);
        if (d < bestd) {
            bestd = d;
            best = g;
        }
    }
    rec_text(r, "reference_gas", f.text);
    rec_real(r, "time_unknown", qu->value);
    rec_real(r, "time_reference", qr->value);
    rec_real(r, "time_ratio", ratio);
    rec_real(r, "molar_mass", (double)m.kg_per_mol);
    if (best != NULL && bestd < 0.03) {
        rec_text(r, "nearest_gas", best->formula);
        rec_real(r, "nearest_molar_mass", (double)best->molar_mass.kg_per_mol);
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ reldensity */

/* clang-format off */
const field reldensity_fields[] = {
    {"fluid", "fluid", F_TEXT, NOD, "", ""},
    {"model", "model", F_TEXT, NOD, "", ""},
    {"model_used", "model used", F_TEXT, NOD, "", ""},
    {"barometer", "barometer (for gauge readings)", F_REAL, DIM_PRESSURE, "kPa", ""},
    {"p", "pressure (absolute)", F_REAL, DIM_PRESSURE, "bar", ""},
    {"T", "temperature", F_REAL, DIM_TEMPERATURE, "degC", ""},
    {"molar_mass", "molar mass", F_REAL, DIM_MOLAR_MASS, "g/mol", ""},
    {"relative_density", "density relative to dry air", F_REAL, NOD, "", ""},
    {"relative_density_ideal", "the same, ideal gas (M/M_air)", F_REAL, NOD, "", ""},
};
/* clang-format on */
const size_t reldensity_nfields = GKQ_ARRAY_SIZE(reldensity_fields);

gk_status word_reldensity(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt;
    gk_pressure p;
    gk_temperature t;
    fluid_in f;
    const gk_gas *air;
    gk_real d;
    gk_status st;
    settings mset;

    a->wexp = 1;
    if ((st = need_word(a, 0, "fluid (a gas or a mixture)", why)) != GK_OK) { return st; }
    qp = take(a, DIM_PRESSURE);
    qt = take(a, DIM_TEMPERATURE);
    if ((st = all_used(a, 1, "reldensity", why)) != GK_OK) { return st; }
    p = set->ref.p; /* without a state: at the reference condition (-R) */
    t = set->ref.t;
    if (qp != NULL && (st = word_pressure(set, qp, 0, r, "barometer", &p, why)) != GK_OK) {
        return st;
    }
    if (qt != NULL && (st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], a->wwhere[0], &f, why)) != GK_OK) { return st; }
    if ((st = check_water(&f, p, t, why)) != GK_OK) { return st; }
    if ((st = check_gas_phase(&f, p, t, NULL, why)) != GK_OK) { return st; }
    if ((st = use_model(set, &f, p, t, &mset, r)) != GK_OK) { return st; }
    set = &mset; /* from here on the concrete model (with best: the one chosen) */
    if ((st = gk_relative_density(set->model, as_fluid(&f), p, t, &d)) != GK_OK) {
        return explain(st, "relative density of", &f, why);
    }
    if ((st = gk_gas_find("air", &air)) != GK_OK) {
        say(why, "the gas table has no air");
        return st;
    }
    rec_text(r, "fluid", f.text);
    rec_real(r, "p", (double)p.pa);
    rec_real(r, "T", (double)t.k);
    rec_real(r, "molar_mass", (double)f.m.kg_per_mol);
    rec_real(r, "relative_density", (double)d);
    rec_real(r, "relative_density_ideal",
             (double)f.m.kg_per_mol / (double)air->molar_mass.kg_per_mol);
    return GK_OK;
}
