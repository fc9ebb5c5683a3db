/*
 * instrument.c - what instruments report: Z of a gas or mixture, flow at reference
 * conditions, mass flow, vessel contents, pressure-decay leak rates, relative density, wet
 * mixtures.
 *
 * Every quantity here is the amount form of the equation of state, n = p V / (Z R T), with Z
 * the stable root of the chosen model. Each function opens its fluid once (open_fluid(): the
 * fluid, the readings, the reference condition, the molar mass) and asks the fluid layer for
 * the Z of each state it needs (gk__fluid_gas_z(), which returns GK_ERR_RANGE where the stable
 * state is liquid: the amount does not follow from pressure there).
 */
#include "fluid.h"
#include "mixture_internal.h"

/* The opening of every instrument function, in this order: the fluid (gk__fluid_init()), the
   readings (readings_ok false: GK_ERR_DOMAIN), the reference condition when ref is not NULL
   (p, T finite and > 0, else GK_ERR_DOMAIN), the molar mass when m is not NULL. */
static gk_status open_fluid(gk__fluid *f, gk_eos eos, const gk_fluid *fluid, bool readings_ok,
                            const gk_reference *ref, gk_real *m) {
    gk_status s = gk__fluid_init(f, eos, fluid->gas, fluid->mixture, fluid->kij);
    if (s != GK_OK) { return s; }
    if (!readings_ok) { return GK_ERR_DOMAIN; }
    if (ref != NULL && (!gk_positive(ref->p.pa) || !gk_positive(ref->t.k))) {
        return GK_ERR_DOMAIN;
    }
    return (m != NULL) ? gk__fluid_molar_mass(f, m) : GK_OK;
}

/* ------------------------------------------------------------------ public functions */

gk_status gk_fluid_z(gk_eos eos, gk_fluid fluid, gk_pressure p, gk_temperature t, gk_real *z) {
    gk__fluid f;
    gk_eos_result r;
    gk_status s;
    if (z == NULL) { return GK_ERR_ARGUMENT; }
    s = gk__fluid_init(&f, eos, fluid.gas, fluid.mixture, fluid.kij);
    if (s == GK_OK) { s = gk__fluid_state(&f, p, t, GK_ROOT_STABLE, &r); }
    if (s != GK_OK) { return s; }
    *z = r.z;
    return GK_OK;
}

/* The two directions of the reference-flow conversion: the factor from Z at both conditions,
   then a multiplication (to the reference) or a division (from it). */
static gk_status flow_convert(gk_eos eos, const gk_fluid *fluid, gk_real q_in, gk_pressure p,
                              gk_temperature t, gk_reference ref, bool to_reference,
                              gk_volume_flow *out) {
    gk__fluid f;
    gk_real z = GK_LIT(1.0), z_ref = GK_LIT(1.0), factor = GK_LIT(1.0), q;
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    s = open_fluid(&f, eos, fluid, gk_finite(q_in) && gk_positive(p.pa) && gk_positive(t.k), &ref,
                   NULL);
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p, t, &z); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, ref.p, ref.t, &z_ref); }
    if (s == GK_OK) { s = gk_reference_factor(p, t, z, ref, z_ref, &factor); }
    if (s != GK_OK) { return s; }
    q = to_reference ? q_in * factor : q_in / factor;
    if (!gk_finite(q)) { return GK_ERR_RANGE; }
    out->m3_per_s = q;
    return GK_OK;
}

gk_status gk_flow_to_reference(gk_eos eos, gk_fluid fluid, gk_volume_flow actual, gk_pressure p,
                               gk_temperature t, gk_reference ref, gk_volume_flow *out) {
    return flow_convert(eos, &fluid, actual.m3_per_s, p, t, ref, true, out);
}

gk_status gk_flow_from_reference(gk_eos eos, gk_fluid fluid, gk_volume_flow at_reference,
                                 gk_reference ref, gk_pressure p, gk_temperature t,
                                 gk_volume_flow *out) {
    return flow_convert(eos, &fluid, at_reference.m3_per_s, p, t, ref, false, out);
}

gk_status gk_flow_to_mass(gk_eos eos, gk_fluid fluid, gk_volume_flow actual, gk_pressure p,
                          gk_temperature t, gk_mass_flow *out) {
    gk__fluid f;
    gk_real z = GK_LIT(1.0), m = GK_LIT(0.0), rho, w;
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    s = open_fluid(&f, eos, &fluid,
                   gk_finite(actual.m3_per_s) && gk_positive(p.pa) && gk_positive(t.k), NULL, &m);
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p, t, &z); }
    if (s != GK_OK) { return s; }
    /* rho = p M / (Z R T) */
    rho = (p.pa / (z * GK_R * t.k)) * m;
    w = actual.m3_per_s * rho;
    if (!gk_positive(rho) || !gk_finite(w)) { return GK_ERR_RANGE; }
    out->kg_per_s = w;
    return GK_OK;
}

gk_status gk_vessel_contents(gk_eos eos, gk_fluid fluid, gk_volume vessel, gk_pressure p,
                             gk_temperature t, gk_reference ref, gk_contents *out) {
    gk__fluid f;
    gk_real z = GK_LIT(1.0), z_ref = GK_LIT(1.0), m = GK_LIT(0.0);
    gk_real n, mass, v_ref;
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    s = open_fluid(&f, eos, &fluid, gk_positive(vessel.m3) && gk_positive(p.pa) && gk_positive(t.k),
                   &ref, &m);
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p, t, &z); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, ref.p, ref.t, &z_ref); }
    if (s != GK_OK) { return s; }
    /* n = p V / (Z R T); the reference volume n Z_ref R T_ref / p_ref */
    n = (p.pa / (z * GK_R * t.k)) * vessel.m3;
    mass = n * m;
    v_ref = n * (z_ref * GK_R * ref.t.k / ref.p.pa);
    /* an amount, mass or volume that overflows or underflows to 0 cannot be reported */
    if (!gk_positive(n) || !gk_positive(mass) || !gk_positive(v_ref)) { return GK_ERR_RANGE; }
    out->amount.mol = n;
    out->mass.kg = mass;
    out->reference_volume.m3 = v_ref;
    out->z = z;
    return GK_OK;
}

/*
 * Relative size of a state change below which the Z difference of a leak test is taken as a
 * central difference over a stretched step: about the cube root of eps, where the rounding
 * error of the difference (eps / H) and the truncation error of the central difference (H^2
 * times the small third derivative of Z) balance (common practice for central differences).
 */
#if GK_REAL_IS_FLOAT
#  define LEAK_H GK_LIT(1e-2)
#else
#  define LEAK_H GK_LIT(1e-5)
#endif

/*
 * Ze - Zs for the leak test. With a state change h = max(|dp| / p, |dT| / T) of at least
 * LEAK_H, the plain difference. Below it, Z at the two points m -+ (k / 2) (end - start)
 * around the midpoint m, with k = LEAK_H / h, and dz = (Z+ - Z-) / k: the same first-order
 * change, with the rounding of the two roots divided by k. If either stretched point is not a
 * gas state of the model (near the vapour pressure), the plain difference is kept.
 */
static gk_status leak_dz(const gk__fluid *f, gk_pressure ps, gk_temperature ts, gk_pressure pe,
                         gk_temperature te, gk_real zs, gk_real ze, gk_real *dz) {
    const gk_real dp = pe.pa - ps.pa, dt = te.k - ts.k;
    const gk_real hp = gk_fabs(dp) / ps.pa, ht = gk_fabs(dt) / ts.k;
    const gk_real h = (hp > ht) ? hp : ht;
    gk_real k, z_minus = GK_LIT(1.0), z_plus = GK_LIT(1.0);
    gk_pressure pm, pp;
    gk_temperature tm, tp;
    *dz = ze - zs;
    if (f->eos == GK_EOS_IDEAL || !(h < LEAK_H) || !(h > GK_LIT(0.0))) { return GK_OK; }
    k = GK_LIT(0.5) * LEAK_H / h; /* half the stretched step, in units of (end - start) */
    pm.pa = GK_LIT(0.5) * (ps.pa + pe.pa) - k * dp;
    pp.pa = GK_LIT(0.5) * (ps.pa + pe.pa) + k * dp;
    tm.k = GK_LIT(0.5) * (ts.k + te.k) - k * dt;
    tp.k = GK_LIT(0.5) * (ts.k + te.k) + k * dt;
    if (gk__fluid_gas_z(f, pm, tm, &z_minus) != GK_OK ||
        gk__fluid_gas_z(f, pp, tp, &z_plus) != GK_OK) {
        return GK_OK; /* keep the plain difference */
    }
    *dz = (z_plus - z_minus) / (GK_LIT(2.0) * k);
    return GK_OK;
}

gk_status gk_leak_rate_pressure_decay(gk_eos eos, gk_fluid fluid, gk_volume test_volume,
                                      gk_pressure p_start, gk_temperature t_start,
                                      gk_pressure p_end, gk_temperature t_end, gk_real elapsed_s,
                                      gk_reference ref, gk_leak *out) {
    gk__fluid f;
    gk_real zs = GK_LIT(1.0), ze = GK_LIT(1.0), z_ref = GK_LIT(1.0), m = GK_LIT(0.0);
    gk_real num, dn, rate, w, q, dz = GK_LIT(0.0);
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    s = open_fluid(&f, eos, &fluid,
                   gk_positive(elapsed_s) && gk_positive(test_volume.m3) &&
                       gk_positive(p_start.pa) && gk_positive(t_start.k) && gk_positive(p_end.pa) &&
                       gk_positive(t_end.k),
                   &ref, &m);
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p_start, t_start, &zs); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p_end, t_end, &ze); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, ref.p, ref.t, &z_ref); }
    if (s != GK_OK) { return s; }
    /*
     * dn = n_start - n_end = (V / R) (ps / (Zs Ts) - pe / (Ze Te))
     *    = (V / R) [ (ps - pe) Ze Te + pe (Ze (Te - Ts) + Ts (Ze - Zs)) ] / (Zs Ts Ze Te).
     * The second form takes the small differences ps - pe and Te - Ts of the readings first
     * (exact in floating point when the readings are within a factor 2, Sterbenz's lemma), so
     * the ideal-gas part of a small decay keeps its digits. The Z difference is the other
     * small term: each root carries a rounding error of a few eps, which would make the error
     * of dn about eps p / (ps - pe) (1.5 % for a 10 Pa decay at 3 bar in a float build). For a
     * decay smaller than LEAK_H (relative), Ze - Zs is taken instead as a central difference
     * of Z along the same straight line in (p, T), stretched to LEAK_H (see leak_dz()).
     */
    s = leak_dz(&f, p_start, t_start, p_end, t_end, zs, ze, &dz);
    if (s != GK_OK) { return s; }
    num = (p_start.pa - p_end.pa) * ze * t_end.k +
          p_end.pa * (ze * (t_end.k - t_start.k) + t_start.k * dz);
    dn = test_volume.m3 * (num / (zs * t_start.k * ze * t_end.k)) / GK_R;
    if (!gk_finite(dn)) { return GK_ERR_RANGE; }
    if (dn < GK_LIT(0.0)) {
        return GK_ERR_NO_SOLUTION; /* the end state holds more gas than the start */
    }
    rate = dn / elapsed_s;
    w = rate * m;
    q = rate * (z_ref * GK_R * ref.t.k / ref.p.pa);
    if (!gk_finite(rate) || !gk_finite(w) || !gk_finite(q)) { return GK_ERR_RANGE; }
    out->mol_per_s = rate;
    out->mass_flow.kg_per_s = w;
    out->reference_flow.m3_per_s = q;
    return GK_OK;
}

gk_status gk_relative_density(gk_eos eos, gk_fluid fluid, gk_pressure p, gk_temperature t,
                              gk_real *out) {
    const gk_gas *air = NULL;
    gk__fluid f, f_air;
    gk_real z = GK_LIT(1.0), z_air = GK_LIT(1.0), m = GK_LIT(0.0), d;
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    s = open_fluid(&f, eos, &fluid, gk_positive(p.pa) && gk_positive(t.k), NULL, &m);
    if (s == GK_OK) { s = gk_gas_find("air", &air); }
    if (s == GK_OK) { s = gk__fluid_init(&f_air, eos, air, NULL, NULL); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f, p, t, &z); }
    if (s == GK_OK) { s = gk__fluid_gas_z(&f_air, p, t, &z_air); }
    if (s != GK_OK) { return s; }
    /* rho = p M / (Z R T) for both at the same p, T: d = (M / M_air) (Z_air / Z) */
    d = (m / air->molar_mass.kg_per_mol) * (z_air / z);
    if (!gk_positive(d)) { return GK_ERR_RANGE; }
    *out = d;
    return GK_OK;
}

/* Is this component water? The built-in entry, or a caller's entry with formula "H2O". */
static bool is_water(const gk_gas *g, const gk_gas *water) {
    /* the formula compared by hand: the library uses no C library but <math.h> */
    static const char h2o[4] = { 'H', '2', 'O', '\0' };
    bool same = g == water;
    bool more = !same && (g != NULL) && (g->formula != NULL);
    size_t i;
    for (i = 0u; (i < 4u) && more; ++i) {
        /* stops at the first difference, so never reads past the formula's NUL */
        more = (unsigned char)g->formula[i] == (unsigned char)h2o[i];
        same = more && (h2o[i] == '\0');
    }
    return same;
}

/* The index of water among the first n components of dry, or n when it is not there. */
static size_t water_index(const gk_mixture *dry, size_t n, const gk_gas *water) {
    size_t k = n;
    size_t i;
    for (i = 0; (i < n) && (k == n); ++i) {
        if (is_water(dry->gas[i], water)) { k = i; }
    }
    return k;
}

gk_status gk_humid_mixture(const gk_mixture *dry, gk_pressure p, gk_temperature t,
                           gk_real relative_humidity, gk_mixture *wet) {
    const gk_gas *water = NULL;
    gk_pressure pws;
    gk_real xw, scale;
    size_t i, k, n;
    gk_status s;
    if (dry == NULL || wet == NULL) { return GK_ERR_ARGUMENT; }
    s = gk__mixture_check(dry);
    if (s != GK_OK) { return s; }
    if (!gk_positive(p.pa) || !gk_positive(t.k) || !gk_finite(relative_humidity) ||
        relative_humidity < GK_LIT(0.0) || relative_humidity > GK_LIT(1.0)) {
        return GK_ERR_DOMAIN;
    }
    s = gk_water_vapour_pressure(t, &pws);
    if (s != GK_OK) { return s; }
    xw = relative_humidity * pws.pa / p.pa;
    if (!(xw < GK_LIT(1.0))) { return GK_ERR_NO_SOLUTION; /* water partial pressure not below p */ }
    s = gk_gas_find("H2O", &water);
    if (s != GK_OK) { return s; }
    n = dry->count;
    k = water_index(dry, n, water);
    if ((k == n) && (n >= (size_t)GK_MIXTURE_MAX)) {
        return GK_ERR_COMPOSITION; /* no room to append water */
    }
    /* Every check has passed: write *wet entry by entry, each read from dry before it is
       written, so wet may be the same object as dry. */
    scale = GK_LIT(1.0) - xw;
    for (i = 0; i < (size_t)GK_MIXTURE_MAX; ++i) {
        const gk_gas *g = dry->gas[i];
        gk_real x = dry->mole_fraction[i];
        if (i < n) { x *= scale; }
        if (i == k) {
            g = water;
            x = (k == n) ? xw : x + xw;
        }
        wet->gas[i] = g;
        wet->mole_fraction[i] = x;
    }
    wet->count = (k == n) ? n + 1u : n;
    return GK_OK;
}
