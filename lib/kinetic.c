/*
 * kinetic.c - kinetic theory of an ideal gas (Maxwell-Boltzmann distribution): molecular
 * speeds, speed of sound, Graham's law of effusion, mean free path, wall collision flux.
 *
 * Formulas (common practice; any kinetic-theory text):
 *   u_rms = sqrt(3 R T / M), u_mean = sqrt(8 R T / (pi M)), u_mp = sqrt(2 R T / M),
 *   c = sqrt(gamma R T / M), rate_a / rate_b = sqrt(M_b / M_a),
 *   lambda = k T / (sqrt(2) pi d^2 p), J = p / sqrt(2 pi M R T).
 * Square roots are taken of each factor separately (sqrt(T) / sqrt(M) rather than sqrt(T / M)),
 * which halves the exponents so no intermediate overflows or underflows while the result is
 * representable; the products then go through gk_scaled_product() (gk_scaled.h). Error budget:
 * each sqrt is correctly rounded (IEEE 754), so a result carries at most about 6 roundings,
 * below 1e-15 relative in double and 6e-7 in float.
 */
#include "gk_scaled.h"

/* Finite and > 0, written as comparisons in the caller's condition (a macro, not a function),
 * so that an analyser sees x > 0 on the branch that takes a square root of x. */
#define GK_KIN_POSITIVE(x) (((x) > GK_LIT(0.0)) && (gk_finite(x) != 0))

/* sqrt(c R T / M), for the three characteristic speeds and the speed of sound. The inputs
 * are checked before any square root is taken (sqrt of a negative is NaN, not an error). */
static gk_status gk_speed_factor(gk_real c, gk_temperature t, gk_molar_mass m, gk_real *out) {
    gk_real num[2], den[2];
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!GK_KIN_POSITIVE(t.k) || !GK_KIN_POSITIVE(m.kg_per_mol)) { return GK_ERR_DOMAIN; }
    num[0] = gk_sqrt(t.k);
    den[0] = gk_sqrt(m.kg_per_mol);
    num[1] = gk_sqrt(c * GK_R);
    den[1] = GK_LIT(1.0);
    return gk_scaled_eval(num, den, 2, out);
}

gk_status gk_speed_rms(gk_temperature t, gk_molar_mass m, gk_speed *out) {
    return gk_speed_factor(GK_LIT(3.0), t, m, out != NULL ? &out->m_per_s : NULL);
}

gk_status gk_speed_mean(gk_temperature t, gk_molar_mass m, gk_speed *out) {
    return gk_speed_factor(GK_LIT(8.0) / GK_PI, t, m, out != NULL ? &out->m_per_s : NULL);
}

gk_status gk_speed_most_probable(gk_temperature t, gk_molar_mass m, gk_speed *out) {
    return gk_speed_factor(GK_LIT(2.0), t, m, out != NULL ? &out->m_per_s : NULL);
}

gk_status gk_speed_of_sound_ideal(gk_temperature t, gk_molar_mass m, gk_real heat_capacity_ratio,
                                  gk_speed *out) {
    /* gamma = cp / cv of an ideal gas lies in (1, 5/3]: 5/3 for a monatomic gas (3 translational
     * degrees of freedom), approaching 1 as the degrees of freedom grow (common practice).
     * The upper bound is 1.67, not 5/3 exactly, so that 5/3 as printed in tables (1.667, 1.67)
     * is accepted; that allowance is 0.2 % in gamma, 0.1 % in the speed. */
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_finite(heat_capacity_ratio) || !(heat_capacity_ratio > GK_LIT(1.0)) ||
        heat_capacity_ratio > GK_LIT(1.67)) {
        return GK_ERR_DOMAIN;
    }
    return gk_speed_factor(heat_capacity_ratio, t, m, &out->m_per_s);
}

gk_status gk_effusion_ratio(gk_molar_mass a, gk_molar_mass b, gk_real *rate_a_over_b) {
    gk_real num[1], den[1];
    if (rate_a_over_b == NULL) { return GK_ERR_ARGUMENT; }
    if (!GK_KIN_POSITIVE(a.kg_per_mol) || !GK_KIN_POSITIVE(b.kg_per_mol)) { return GK_ERR_DOMAIN; }
    num[0] = gk_sqrt(b.kg_per_mol);
    den[0] = gk_sqrt(a.kg_per_mol);
    return gk_scaled_eval(num, den, 1, rate_a_over_b);
}

gk_status gk_effusion_molar_mass(gk_molar_mass reference, gk_real time_ratio_unknown_over_reference,
                                 gk_molar_mass *out) {
    /* M = M_ref r r, as three factors so that r^2 cannot overflow on its own */
    const gk_real r = time_ratio_unknown_over_reference;
    const gk_real num[3] = { reference.kg_per_mol, r, r };
    const gk_real den[3] = { GK_LIT(1.0), GK_LIT(1.0), GK_LIT(1.0) };
    return gk_scaled_eval(num, den, 3, out != NULL ? &out->kg_per_mol : NULL);
}

gk_status gk_mean_free_path(gk_pressure p, gk_temperature t, gk_real collision_diameter_m,
                            gk_real *out_m) {
    /* lambda = (k / (sqrt2 pi)) (T / p) (1 / d) (1 / d); k = GK_BOLTZMANN (SI 2019, exact) */
    const gk_real d = collision_diameter_m;
    const gk_real num[4] = { GK_BOLTZMANN, t.k, GK_LIT(1.0), GK_LIT(1.0) };
    const gk_real den[4] = { gk_sqrt(GK_LIT(2.0)) * GK_PI, p.pa, d, d };
    return gk_scaled_eval(num, den, 4, out_m);
}

gk_status gk_wall_flux(gk_pressure p, gk_temperature t, gk_molar_mass m,
                       gk_real *out_mol_per_m2_s) {
    /* J = p / (sqrt(2 pi R) sqrt(M) sqrt(T)) */
    gk_real num[3], den[3];
    if (out_mol_per_m2_s == NULL) { return GK_ERR_ARGUMENT; }
    if (!GK_KIN_POSITIVE(p.pa) || !GK_KIN_POSITIVE(t.k) || !GK_KIN_POSITIVE(m.kg_per_mol)) {
        return GK_ERR_DOMAIN;
    }
    num[0] = p.pa;
    den[0] = gk_sqrt(GK_LIT(2.0) * GK_PI * GK_R);
    num[1] = GK_LIT(1.0);
    den[1] = gk_sqrt(m.kg_per_mol);
    num[2] = GK_LIT(1.0);
    den[2] = gk_sqrt(t.k);
    return gk_scaled_eval(num, den, 3, out_mol_per_m2_s);
}
