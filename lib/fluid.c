/*
 * fluid.c - the fluid layer (fluid.h): a gas or a mixture under one model, checked once, and the
 * public functions that are one fluid and one state (gk_eos_solve, gk_eos_pressure,
 * gk_eos_density, gk_mixture_eos_solve).
 *
 * The pseudo-critical temperature of a mixture is Kay's rule, sum x_i Tc_i (W. B. Kay, Ind. Eng.
 * Chem. 28 (1936) 1014, from memory; common practice).
 */
#include "fluid.h"
#include "eos_internal.h"
#include "helmholtz.h"
#include "hydrogen.h"
#include "mixture_internal.h"

/* Zero values to start locals from: every field is set before any read on every path, also
   where a call fills a structure only on GK_OK (the analysers see it without following the
   statuses). Static, so zero-initialised, and const. */
static const gk__fluid fluid_none;
static const gk_eos_result fluid_no_result;
#if GK_REFERENCE_MODELS
static const gk__hz_model fluid_no_model;
#endif

/* Is eos one of gk_eos (cubic, ideal or reference-grade)? Compared as unsigned (see
   gk__eos_valid()). */
static bool fluid_eos_valid(gk_eos eos) { return (unsigned)eos <= (unsigned)GK_EOS_HYDROGEN; }

static gk_status init_mixture(gk__fluid *f, gk_eos eos, const gk_mixture *mix, const gk_real *kij) {
    gk_real tc = GK_LIT(0.0);
    size_t i;
    gk_status st = gk__mixture_check(mix);
    if (st != GK_OK) { return st; }
    for (i = 0; i < mix->count; ++i) {
        st = gk__eos_check_gas(eos, mix->gas[i]);
        if (st != GK_OK) { return st; }
    }
    st = gk__eos_check_kij(mix->count, kij);
    if (st != GK_OK) { return st; }
    for (i = 0; i < mix->count; ++i) { tc += mix->mole_fraction[i] * gk__eos_tc(eos, mix->gas[i]); }
    f->gas = NULL;
    f->mix = mix;
    f->kij = kij;
    f->molar_mass = gk__mixture_molar_mass(mix);
    f->tc = tc;
    f->eos = eos;
    return GK_OK;
}

/* The reference-grade models (helmholtz.h): GK_ERR_NOT_FOUND where they do not cover the gas or
   a component; with best, that status only says "not covered" (the caller falls back). */
#if GK_REFERENCE_MODELS
static gk_status init_reference(gk__fluid *f, gk_eos eos, const gk_gas *gas, const gk_mixture *mix,
                                const gk_real *kij) {
    gk__hz_model m = fluid_no_model;
    gk_status st;
    if (mix != NULL) {
        st = gk__mixture_check(mix);
        if (st == GK_OK && eos == GK_EOS_HYDROGEN) { st = GK_ERR_NOT_FOUND; }
        if (st == GK_OK) {
            st = gk__sw_model_mixture(mix->gas, mix->mole_fraction, mix->count, &m);
        }
        if (st == GK_OK) { st = gk__eos_check_kij(mix->count, kij); }
        if (st != GK_OK) { return st; }
        f->molar_mass = gk__mixture_molar_mass(mix);
    } else if (eos == GK_EOS_HYDROGEN) {
        if (!gk__h2_covers(gas)) { return GK_ERR_NOT_FOUND; }
        m.t_r = gas->critical_temperature.k; /* the label of a lone root only */
        f->molar_mass = gas->molar_mass.kg_per_mol;
    } else {
        st = gk__sw_model_gas(gas, &m);
        if (st != GK_OK) { return st; }
        f->molar_mass = gas->molar_mass.kg_per_mol;
    }
    f->gas = gas;
    f->mix = mix;
    f->kij = kij;
    f->tc = m.t_r;
    f->eos = eos;
    return GK_OK;
}
#else
/* Built without the reference-grade models (gaskit/config.h): nothing is covered. */
static gk_status init_reference(gk__fluid *f, gk_eos eos, const gk_gas *gas, const gk_mixture *mix,
                                const gk_real *kij) {
    gk_status st = (mix != NULL) ? gk__mixture_check(mix) : GK_OK;
    (void)f;
    (void)eos;
    (void)gas;
    (void)kij;
    return (st != GK_OK) ? st : GK_ERR_NOT_FOUND;
}
#endif

/* A cubic model or the ideal gas (eos valid for gk__eos_valid()). */
static gk_status init_cubic(gk__fluid *f, gk_eos eos, const gk_gas *gas, const gk_mixture *mix,
                            const gk_real *kij) {
    gk_status st;
    if (mix != NULL) { return init_mixture(f, eos, mix, kij); }
    st = gk__eos_check_gas(eos, gas);
    if (st != GK_OK) { return st; }
    f->gas = gas;
    f->mix = NULL;
    f->kij = NULL;
    f->molar_mass = gas->molar_mass.kg_per_mol;
    f->tc = gk__eos_tc(eos, gas);
    f->eos = eos;
    return GK_OK;
}

gk_status gk__fluid_init(gk__fluid *f, gk_eos eos, const gk_gas *gas, const gk_mixture *mix,
                         const gk_real *kij) {
    gk_status st;
    if (!fluid_eos_valid(eos) || (gas == NULL) == (mix == NULL)) { return GK_ERR_ARGUMENT; }
    if (eos == GK_EOS_SPAN_WAGNER || eos == GK_EOS_HYDROGEN) {
        return init_reference(f, eos, gas, mix, kij);
    }
    if (eos != GK_EOS_BEST) { return init_cubic(f, eos, gas, mix, kij); }
    /* GK_EOS_BEST: Span-Wagner where it covers the fluid, the hydrogen equation for hydrogen,
       else Peng-Robinson */
    st = init_reference(f, GK_EOS_SPAN_WAGNER, gas, mix, kij);
    if (st != GK_ERR_NOT_FOUND) { return st; }
#if GK_REFERENCE_MODELS
    if (gas != NULL && gk__h2_covers(gas)) {
        return init_reference(f, GK_EOS_HYDROGEN, gas, mix, kij);
    }
#endif
    return init_cubic(f, GK_EOS_PENG_ROBINSON, gas, mix, kij);
}

#if GK_REFERENCE_MODELS
/* The Span-Wagner model of the fluid (its gas, air as its mixture, or its mixture). */
static gk_status fluid_sw_model(const gk__fluid *f, gk__hz_model *m) {
    return (f->mix != NULL)
               ? gk__sw_model_mixture(f->mix->gas, f->mix->mole_fraction, f->mix->count, m)
               : gk__sw_model_gas(f->gas, m);
}

/* The state of the hydrogen equation (hydrogen.h) in the result form: one root. */
static GK_NOINLINE gk_status fluid_h2_state(const gk__fluid *f, gk_real p, gk_real t,
                                            gk_eos_result *out) {
    gk__h2_state h = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
    gk_real phi, vm;
    gk_status st = gk__h2_solve(p, t, &h);
    if (st != GK_OK) { return st; }
    phi = gk_exp(h.ln_phi);
    vm = GK_LIT(1.0) / h.molar_density;
    if (!gk_positive(phi) || !gk_positive(vm)) { return GK_ERR_RANGE; }
    out->z = h.z;
    out->molar_volume.m3_per_mol = vm;
    out->fugacity_coefficient = phi;
    out->root_count = 1;
    out->z_roots[0] = h.z;
    out->z_roots[1] = GK_LIT(0.0);
    out->z_roots[2] = GK_LIT(0.0);
    /* a lone root above the critical temperature is labelled as the cubics do */
    out->branch = (t > f->tc) ? GK_ROOT_SUPERCRITICAL : GK_ROOT_GAS;
    return GK_OK;
}

/* The per-temperature part of a Span-Wagner state (gk__hz_prepare()) of the fluid. Out of line:
   the model it builds is not in the frame under the density solve (firmware stack). */
static GK_NOINLINE gk_status fluid_sw_prepare(const gk__fluid *f, gk_real p, gk_real t,
                                              gk__hz_prepared *out) {
    gk__hz_model m;
    gk_status st = fluid_sw_model(f, &m);
    return (st == GK_OK) ? gk__hz_prepare(&m, p, t, out) : st;
}

/* A state of a reference-grade model (helmholtz.h, hydrogen.h). Out of line: the cubic path
   does not carry its frame. */
static GK_NOINLINE gk_status fluid_reference_state(const gk__fluid *f, gk_real p, gk_real t,
                                                   gk_root root, gk_eos_result *out) {
    gk__hz_prepared pr;
    gk_status st;
    if (f->eos == GK_EOS_HYDROGEN) {
        st = fluid_h2_state(f, p, t, out);
    } else {
        st = fluid_sw_prepare(f, p, t, &pr);
        if (st == GK_OK) { st = gk__hz_solve_prepared(&pr, root, out); }
    }
    if (st == GK_OK) { out->model = f->eos; }
    return st;
}

#endif

/* A state of a cubic model: its a and b (pure or mixed), then the cubic. Out of line: a and b
   are not in the frame above the other models' solves (firmware stack). */
static GK_NOINLINE gk_status fluid_cubic_state(const gk__fluid *f, gk_real p, gk_real t,
                                               gk_root root, gk_eos_result *out) {
    gk_real a = GK_LIT(0.0), b = GK_LIT(0.0);
    gk_status st = (f->mix != NULL) ? gk__eos_mix_ab(f->eos, f->mix, f->kij, p, t, &a, &b)
                                    : gk__eos_ab(f->eos, f->gas, p, t, &a, &b);
    if (st == GK_OK) { st = gk__eos_cubic_state(f->eos, a, b, p, t, f->tc, root, out); }
    if (st == GK_OK) { out->model = f->eos; }
    return st;
}

/* The ideal-gas state. */
static gk_status fluid_ideal_state(gk_real p, gk_real t, gk_eos_result *out) {
    gk_status st = gk__eos_ideal_state(p, t, out);
    if (st == GK_OK) { out->model = GK_EOS_IDEAL; }
    return st;
}

/* The one dispatch on the model: a new family of models adds its case here. */
gk_status gk__fluid_state(const gk__fluid *f, gk_pressure p, gk_temperature t, gk_root root,
                          gk_eos_result *out) {
    if (!gk__root_valid(root)) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(p.pa) || !gk_positive(t.k)) { return GK_ERR_DOMAIN; }
    switch (f->eos) {
        case GK_EOS_IDEAL:
            return fluid_ideal_state(p.pa, t.k, out);
        case GK_EOS_VAN_DER_WAALS:
        case GK_EOS_REDLICH_KWONG:
        case GK_EOS_SOAVE_REDLICH_KWONG:
        case GK_EOS_PENG_ROBINSON:
            return fluid_cubic_state(f, p.pa, t.k, root, out);
#if GK_REFERENCE_MODELS
        case GK_EOS_SPAN_WAGNER:
        case GK_EOS_HYDROGEN:
            return fluid_reference_state(f, p.pa, t.k, root, out);
#endif
        case GK_EOS_BEST: /* resolved by gk__fluid_init() */
        default:
            return GK_ERR_ARGUMENT;
    }
}

gk_status gk__fluid_gas_z(const gk__fluid *f, gk_pressure p, gk_temperature t, gk_real *z) {
    const bool below_tc = t.k < f->tc;
    gk_eos_result r; /* filled by gk__fluid_state, read only on its GK_OK */
    const gk_status st = gk__fluid_state(f, p, t, GK_ROOT_STABLE, &r);
    if (st != GK_OK) { return st; }
    /* liquid: the stable root of two or three is the liquid one, or a lone root below Tc lies
       on the liquid side (the two spinodal volumes of a cubic bracket its critical volume for
       every T < Tc, so the side of Vc tells the side of the vapour pressure) */
    if (r.branch == GK_ROOT_LIQUID && (r.root_count >= 2 || below_tc)) { return GK_ERR_RANGE; }
    /* every formula above this layer divides by Z */
    if (!gk_positive(r.z) || !gk_positive(r.molar_volume.m3_per_mol)) { return GK_ERR_RANGE; }
    *z = r.z;
    return GK_OK;
}

gk_status gk__fluid_molar_mass(const gk__fluid *f, gk_real *m) {
    if (!gk_positive(f->molar_mass)) { return (f->mix != NULL) ? GK_ERR_RANGE : GK_ERR_DOMAIN; }
    *m = f->molar_mass;
    return GK_OK;
}

gk_status gk__fluid_pressure(const gk__fluid *f, gk_molar_volume vm, gk_temperature t,
                             gk_pressure *out) {
    gk_real pa = GK_LIT(0.0);
    gk_status st;
    if (f->gas == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(vm.m3_per_mol) || !gk_positive(t.k)) { return GK_ERR_DOMAIN; }
    if (f->eos == GK_EOS_IDEAL) {
        pa = GK_R * t.k / vm.m3_per_mol;
        /* R T / Vm > 0 for every valid input: 0 is an underflow, not a non-positive pressure */
        st = (pa > GK_LIT(0.0)) ? gk_check_result(pa) : GK_ERR_RANGE;
#if GK_REFERENCE_MODELS
    } else if (f->eos == GK_EOS_HYDROGEN) {
        st = gk__h2_pressure(GK_LIT(1.0) / vm.m3_per_mol, t.k, &pa);
    } else if (f->eos == GK_EOS_SPAN_WAGNER) {
        gk__hz_model m = fluid_no_model;
        st = fluid_sw_model(f, &m);
        if (st == GK_OK) { st = gk__hz_pressure(&m, GK_LIT(1.0) / vm.m3_per_mol, t.k, &pa); }
#endif
    } else {
        st = gk__eos_pressure(f->eos, f->gas, vm.m3_per_mol, t.k, &pa);
    }
    if (st != GK_OK) { return st; }
    out->pa = pa;
    return GK_OK;
}

/* ------------------------------------------------------------------ public functions */

/* The critical pressure of the fluid: the gas's, or for a mixture the pseudo-critical
   sum x_i Pc_i (Kay's rule, common practice). */
static gk_real fluid_pc(const gk__fluid *f) {
    gk_real pc = GK_LIT(0.0);
    size_t i;
    if (f->mix == NULL) { return f->gas->critical_pressure.pa; }
    for (i = 0; i < f->mix->count; ++i) {
        pc += f->mix->mole_fraction[i] * f->mix->gas[i]->critical_pressure.pa;
    }
    return pc;
}

/* A state as the public solvers report it. The models label a lone root above the critical
   temperature supercritical; that is the supercritical-fluid region only above the critical
   pressure too, below it the root is a gas (a vapour that compression cannot condense). */
static gk_status fluid_public_state(const gk__fluid *f, gk_pressure p, gk_temperature t,
                                    gk_root root, gk_eos_result *out) {
    const gk_status st = gk__fluid_state(f, p, t, root, out);
    if (st == GK_OK && out->branch == GK_ROOT_SUPERCRITICAL && !(p.pa > fluid_pc(f))) {
        out->branch = GK_ROOT_GAS;
    }
    return st;
}

gk_status gk_eos_solve(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t, gk_root root,
                       gk_eos_result *out) {
    gk__fluid f = fluid_none;
    gk_status st;
    if (gas == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = gk__fluid_init(&f, eos, gas, NULL, NULL);
    if (st != GK_OK) { return st; }
    return fluid_public_state(&f, p, t, root, out);
}

gk_status gk_mixture_eos_solve(gk_eos eos, const gk_mixture *mix, const gk_real *kij, gk_pressure p,
                               gk_temperature t, gk_root root, gk_eos_result *out) {
    gk__fluid f = fluid_none;
    gk_status st;
    if (mix == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = gk__fluid_init(&f, eos, NULL, mix, kij);
    if (st != GK_OK) { return st; }
    return fluid_public_state(&f, p, t, root, out);
}

gk_status gk_eos_pressure(gk_eos eos, const gk_gas *gas, gk_molar_volume vm, gk_temperature t,
                          gk_pressure *out) {
    gk__fluid f = fluid_none;
    gk_status st;
    if (gas == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = gk__fluid_init(&f, eos, gas, NULL, NULL);
    if (st != GK_OK) { return st; }
    return gk__fluid_pressure(&f, vm, t, out);
}

gk_status gk_eos_density(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t,
                         gk_density *out) {
    gk__fluid f = fluid_none;
    gk_eos_result r = fluid_no_result;
    gk_real m = GK_LIT(0.0), rho;
    gk_status st;
    if (gas == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = gk__fluid_init(&f, eos, gas, NULL, NULL);
    if (st == GK_OK) { st = gk__fluid_molar_mass(&f, &m); }
    if (st == GK_OK) { st = gk__fluid_state(&f, p, t, GK_ROOT_STABLE, &r); }
    if (st != GK_OK) { return st; }
    rho = m / r.molar_volume.m3_per_mol;
    if (!gk_positive(rho)) { return GK_ERR_RANGE; }
    out->kg_per_m3 = rho;
    return GK_OK;
}
