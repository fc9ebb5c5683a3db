/*
 * ideal.c - the ideal gas law p V = n R T, changes of state and Dalton's law.
 *
 * R = GK_R = 8.314462618 J/(mol K), the 10 digits CODATA 2018 prints (GK_R in base.h); the
 * exact N_A k = 8.31446261815324 J/(mol K) (SI 2019 defining constants) is 1.8e-11 relative
 * larger. Every formula is a product of ratios evaluated by gk_scaled_product()
 * (gk_scaled.h): no intermediate over/underflow, a GK_OK result is finite and of normal
 * magnitude, anything else is GK_ERR_RANGE. Error budget: at most 2 count - 1 roundings of
 * half an ulp each (count <= 4, so 7), i.e. below 8e-16 relative in double and 4.2e-7 in
 * float, on top of the rounding of the inputs and of R to gk_real, and the 1.8e-11 of GK_R.
 */
#include "gk_scaled.h"

gk_status gk_ideal_pressure(gk_amount n, gk_temperature t, gk_volume v, gk_pressure *out) {
    /* p = (n / V) T R */
    const gk_real num[3] = { n.mol, t.k, GK_R };
    const gk_real den[3] = { v.m3, GK_LIT(1.0), GK_LIT(1.0) };
    return gk_scaled_eval(num, den, 3, out != NULL ? &out->pa : NULL);
}

gk_status gk_ideal_volume(gk_amount n, gk_temperature t, gk_pressure p, gk_volume *out) {
    /* V = (n / p) T R */
    const gk_real num[3] = { n.mol, t.k, GK_R };
    const gk_real den[3] = { p.pa, GK_LIT(1.0), GK_LIT(1.0) };
    return gk_scaled_eval(num, den, 3, out != NULL ? &out->m3 : NULL);
}

gk_status gk_ideal_amount(gk_pressure p, gk_volume v, gk_temperature t, gk_amount *out) {
    /* n = (p / R) (V / T) */
    const gk_real num[2] = { p.pa, v.m3 };
    const gk_real den[2] = { GK_R, t.k };
    return gk_scaled_eval(num, den, 2, out != NULL ? &out->mol : NULL);
}

gk_status gk_ideal_temperature(gk_pressure p, gk_volume v, gk_amount n, gk_temperature *out) {
    /* T = (p / n) (V / R) */
    const gk_real num[2] = { p.pa, v.m3 };
    const gk_real den[2] = { n.mol, GK_R };
    return gk_scaled_eval(num, den, 2, out != NULL ? &out->k : NULL);
}

gk_status gk_ideal_molar_volume(gk_pressure p, gk_temperature t, gk_molar_volume *out) {
    /* Vm = (T / p) R */
    const gk_real num[2] = { t.k, GK_R };
    const gk_real den[2] = { p.pa, GK_LIT(1.0) };
    return gk_scaled_eval(num, den, 2, out != NULL ? &out->m3_per_mol : NULL);
}

gk_status gk_ideal_density(gk_pressure p, gk_temperature t, gk_molar_mass m, gk_density *out) {
    /* rho = (p / R) (M / T) */
    const gk_real num[2] = { p.pa, m.kg_per_mol };
    const gk_real den[2] = { GK_R, t.k };
    return gk_scaled_eval(num, den, 2, out != NULL ? &out->kg_per_m3 : NULL);
}

gk_status gk_ideal_molar_mass(gk_density rho, gk_pressure p, gk_temperature t, gk_molar_mass *out) {
    /* M = (rho / p) T R */
    const gk_real num[3] = { rho.kg_per_m3, t.k, GK_R };
    const gk_real den[3] = { p.pa, GK_LIT(1.0), GK_LIT(1.0) };
    return gk_scaled_eval(num, den, 3, out != NULL ? &out->kg_per_mol : NULL);
}

gk_status gk_state_change(const gk_state *before, gk_state *after, gk_variable unknown) {
    /* p1 V1 / (n1 T1) = p2 V2 / (n2 T2), solved for one field of the second state as a product
     * of ratios of like quantities: a field held equal gives a factor of exactly 1, so Boyle's,
     * Charles's, Gay-Lussac's and Avogadro's special cases lose nothing. Every field read
     * appears in num/den and is checked by gk_scaled_eval(). */
    gk_real num[4], den[4];
    gk_real r = GK_LIT(0.0);
    gk_status s;
    if (before == NULL || after == NULL) { return GK_ERR_ARGUMENT; }
    switch (unknown) {
        case GK_VAR_PRESSURE: /* p2 = p1 (V1 / V2) (n2 / n1) (T2 / T1) */
            num[0] = before->p.pa;
            den[0] = GK_LIT(1.0);
            num[1] = before->v.m3;
            den[1] = after->v.m3;
            num[2] = after->n.mol;
            den[2] = before->n.mol;
            num[3] = after->t.k;
            den[3] = before->t.k;
            break;
        case GK_VAR_VOLUME: /* V2 = V1 (p1 / p2) (n2 / n1) (T2 / T1) */
            num[0] = before->v.m3;
            den[0] = GK_LIT(1.0);
            num[1] = before->p.pa;
            den[1] = after->p.pa;
            num[2] = after->n.mol;
            den[2] = before->n.mol;
            num[3] = after->t.k;
            den[3] = before->t.k;
            break;
        case GK_VAR_TEMPERATURE: /* T2 = T1 (p2 / p1) (V2 / V1) (n1 / n2) */
            num[0] = before->t.k;
            den[0] = GK_LIT(1.0);
            num[1] = after->p.pa;
            den[1] = before->p.pa;
            num[2] = after->v.m3;
            den[2] = before->v.m3;
            num[3] = before->n.mol;
            den[3] = after->n.mol;
            break;
        case GK_VAR_AMOUNT: /* n2 = n1 (p2 / p1) (V2 / V1) (T1 / T2) */
            num[0] = before->n.mol;
            den[0] = GK_LIT(1.0);
            num[1] = after->p.pa;
            den[1] = before->p.pa;
            num[2] = after->v.m3;
            den[2] = before->v.m3;
            num[3] = before->t.k;
            den[3] = after->t.k;
            break;
        default:
            return GK_ERR_ARGUMENT;
    }
    s = gk_scaled_eval(num, den, 4, &r);
    if (s != GK_OK) { return s; }
    switch (unknown) {
        case GK_VAR_PRESSURE:
            after->p.pa = r;
            break;
        case GK_VAR_VOLUME:
            after->v.m3 = r;
            break;
        case GK_VAR_TEMPERATURE:
            after->t.k = r;
            break;
        default:
            after->n.mol = r;
            break;
    }
    return GK_OK;
}

gk_status gk_partial_pressure(gk_pressure total, gk_real mole_fraction, gk_pressure *out) {
    gk_real r;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(total.pa) || !gk_finite(mole_fraction) || mole_fraction < GK_LIT(0.0) ||
        mole_fraction > GK_LIT(1.0)) {
        return GK_ERR_DOMAIN;
    }
    r = mole_fraction * total.pa; /* <= total: cannot overflow */
    if (gk_check_normal(r) != GK_OK) { return GK_ERR_RANGE; /* underflow below the normal range */ }
    if (mole_fraction > GK_LIT(0.0) && !(r > GK_LIT(0.0))) { return GK_ERR_RANGE; }
    out->pa = r;
    return GK_OK;
}
