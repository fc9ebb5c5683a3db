/*
 * eos_mixture.c - cubic equations of state of a mixture with the van der Waals one-fluid mixing
 * rules (common practice; e.g. Poling, Prausnitz and O'Connell, The Properties of Gases and
 * Liquids, 5th ed., chapter 5, from memory):
 *     a = sum_i sum_j x_i x_j sqrt(a_i a_j) (1 - k_ij),   b = sum_i x_i b_i.
 * Written in the dimensionless A, B of each component at the same (p, T), the rules are the same
 * (A_i = a_i p/(R T)^2, B_i = b_i p/(R T)). The mixture is then solved as a pseudo-pure fluid:
 * the fugacity coefficient reported is that of the pseudo-pure fluid with the mixed A, B (the
 * coefficient of the mixture as a whole, ln phi = sum_i x_i ln phi_i), not of any component.
 * The composition is checked by gk__mixture_check() (mixture_internal.h), so a component whose
 * molar mass is not physical is GK_ERR_DOMAIN here too.
 */
#include "eos_internal.h"
#include "mixture_internal.h"

/* Largest |k_ij| accepted: beyond 1 the cross attraction changes sign (common practice: fitted
   binary parameters lie well inside [-1, 1]). */
#define KIJ_MAX GK_LIT(1.0)
static gk_status kij_check(size_t count, const gk_real *kij) {
    size_t i, j;
    if (kij == NULL) { return GK_OK; }
    for (i = 0; i < count; ++i) {
        for (j = 0; j < count; ++j) {
            gk_real k = kij[i * count + j];
            if (!gk_finite(k) || gk_fabs(k) > KIJ_MAX) { return GK_ERR_DOMAIN; }
            if (i == j && (k < GK_LIT(0.0) || k > GK_LIT(0.0))) { return GK_ERR_DOMAIN; }
            if (j < i && (k < kij[j * count + i] || k > kij[j * count + i])) {
                return GK_ERR_DOMAIN;
            }
        }
    }
    return GK_OK;
}

/* sqrt(a_i) (dimensionless, as sqrt(A_i)) of component i, recomputed where it is needed so that
   no per-component array is kept on the stack (firmware stack budget). */
static gk_status component_sqrt_a(gk_eos eos, const gk_gas *gas, gk_real p, gk_real t, gk_real *s,
                                  gk_real *b) {
    gk_real a = GK_LIT(0.0);
    gk_status st = gk__eos_ab(eos, gas, p, t, &a, b);
    *s = gk_sqrt(a);
    return st;
}

/* The mixed A, B of the van der Waals one-fluid rules (see the top):
   a = sum_i x_i s_i row_i, row_i = sum_j x_j s_j (1 - k_ij), s_i = sqrt(a_i), b = sum_i x_i b_i.
   No per-component array is kept: without k_ij every row is the same sum S = sum_j x_j s_j,
   formed in a first pass (in the order and with the roundings of the double loop, so the result
   is the same to the last bit); with k_ij each row recomputes s_j (n <= GK_MIXTURE_MAX). */
static gk_status mixture_ab(gk_eos eos, const gk_mixture *mix, const gk_real *kij, gk_real p,
                            gk_real t, gk_real *a_out, gk_real *b_out) {
    gk_real a = GK_LIT(0.0), b = GK_LIT(0.0), sx = GK_LIT(0.0);
    gk_status st;
    size_t i, j, n = mix->count;
    if (kij == NULL) {
        for (j = 0; j < n; ++j) {
            gk_real sj = GK_LIT(0.0), bj = GK_LIT(0.0);
            st = component_sqrt_a(eos, mix->gas[j], p, t, &sj, &bj);
            if (st != GK_OK) { return st; }
            sx += mix->mole_fraction[j] * sj;
        }
    }
    for (i = 0; i < n; ++i) {
        gk_real xi = mix->mole_fraction[i], si = GK_LIT(0.0), bi = GK_LIT(0.0), row = sx;
        st = component_sqrt_a(eos, mix->gas[i], p, t, &si, &bi);
        if (st != GK_OK) { return st; }
        if (kij != NULL) {
            row = GK_LIT(0.0);
            for (j = 0; j < n; ++j) {
                gk_real sj = GK_LIT(0.0), bj = GK_LIT(0.0);
                st = component_sqrt_a(eos, mix->gas[j], p, t, &sj, &bj);
                if (st != GK_OK) { return st; }
                row += mix->mole_fraction[j] * sj * (GK_LIT(1.0) - kij[i * n + j]);
            }
        }
        a += xi * si * row;
        b += xi * bi;
    }
    if (!gk_finite(a) || !gk_finite(b)) { return GK_ERR_RANGE; }
    if (!(b > GK_LIT(0.0))) { return GK_ERR_RANGE; }
    *a_out = a;
    *b_out = b;
    return GK_OK;
}

GK_NOINLINE gk_status gk__mixture_eos_prepare(gk_eos eos, const gk_fluid *fluid, gk_pressure p,
                                              gk_temperature t, gk_root root, gk_real ab[2]) {
    const gk_mixture *mix = fluid->mixture;
    const gk_real *kij = fluid->kij;
    gk_status st;
    size_t i, n;

    if (mix == NULL || !gk__eos_valid(eos)) { return GK_ERR_ARGUMENT; }
    st = gk__mixture_check(mix); /* composition (gases module: the one shared check) */
    if (st != GK_OK) { return st; }
    st = gk__eos_check_state(p, t, root);
    if (st != GK_OK) { return st; }
    n = mix->count;
    for (i = 0; i < n; ++i) {
        st = gk__eos_check_gas(eos, mix->gas[i]);
        if (st != GK_OK) { return st; }
    }
    st = kij_check(n, kij);
    if (st != GK_OK) { return st; }
    if (eos == GK_EOS_IDEAL) { return GK_OK; }
    return mixture_ab(eos, mix, kij, p.pa, t.k, &ab[0], &ab[1]);
}

gk_status gk_mixture_eos_solve(gk_eos eos, const gk_mixture *mix, const gk_real *kij, gk_pressure p,
                               gk_temperature t, gk_root root, gk_eos_result *out) {
    gk_real ab[2] = { GK_LIT(0.0), GK_LIT(0.0) };
    gk_fluid fluid;
    gk_status st;
    if (mix == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    fluid.gas = NULL;
    fluid.mixture = mix;
    fluid.kij = kij;
    st = gk__mixture_eos_prepare(eos, &fluid, p, t, root, ab);
    if (st != GK_OK) { return st; }
    /* both paths write *out only on GK_OK */
    return gk__eos_finish(eos, ab, p, t, root, out);
}
