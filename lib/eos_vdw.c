/*
 * eos_vdw.c - van der Waals equation with explicit constants a, b:
 *     (p + a n^2 / V^2)(V - n b) = n R T.
 * The volume is found as the cubic in Z = p Vm / (R T) with A = a p / (R T)^2, B = b p / (R T)
 * (eos_internal.h), so the private cubic solver and the root choice are shared with gk_eos_solve.
 */
#include "eos_internal.h"

/* Van der Waals critical conditions dp/dV = d2p/dV2 = 0: a = 27 R^2 Tc^2 / (64 Pc),
   b = R Tc / (8 Pc) (J. D. van der Waals, thesis, Leiden 1873; the derivation is common
   practice). */
#define VDW_A_FACTOR GK_LIT(0.421875) /* 27/64, exact */
#define VDW_B_FACTOR GK_LIT(0.125)    /* 1/8, exact */

static bool vdw_valid(gk_vdw c) {
    return gk_finite(c.a) && gk_finite(c.b) && c.a >= GK_LIT(0.0) && c.b >= GK_LIT(0.0);
}

gk_status gk_vdw_from_critical(gk_temperature tc, gk_pressure pc, gk_vdw *out) {
    gk_real rtc, a, b;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(tc.k) || !gk_positive(pc.pa)) { return GK_ERR_DOMAIN; }
    rtc = GK_R * tc.k;
    b = VDW_B_FACTOR * rtc / pc.pa;
    a = VDW_A_FACTOR * (rtc / pc.pa) * rtc;
    /* overflow, or underflow to 0 (a constant that is not > 0 is not a result) */
    if (!gk_positive(a) || !gk_positive(b)) { return GK_ERR_RANGE; }
    out->a = a;
    out->b = b;
    return GK_OK;
}

gk_status gk_vdw_pressure(gk_vdw c, gk_amount n, gk_volume v, gk_temperature t, gk_pressure *out) {
    gk_real vm, rep, p;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!vdw_valid(c) || !gk_positive(n.mol) || !gk_positive(v.m3) || !gk_positive(t.k)) {
        return GK_ERR_DOMAIN;
    }
    vm = v.m3 / n.mol;
    if (!gk_finite(vm)) { return GK_ERR_RANGE; }
    if (!(vm > c.b)) { return GK_ERR_DOMAIN; }
    rep = GK_R * t.k / (vm - c.b);
    /* the repulsive term n R T / (V - n b) is > 0 for every valid input: 0 is an underflow,
       GK_ERR_RANGE, not a non-positive pressure of the model */
    if (!(rep > GK_LIT(0.0))) { return GK_ERR_RANGE; }
    p = rep - (c.a / vm) / vm;
    if (!gk_finite(p)) { return GK_ERR_RANGE; }
    if (!(p > GK_LIT(0.0))) { return GK_ERR_NO_SOLUTION; }
    out->pa = p;
    return GK_OK;
}

gk_status gk_vdw_temperature(gk_vdw c, gk_amount n, gk_volume v, gk_pressure p,
                             gk_temperature *out) {
    gk_real vm, t;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!vdw_valid(c) || !gk_positive(n.mol) || !gk_positive(v.m3) || !gk_positive(p.pa)) {
        return GK_ERR_DOMAIN;
    }
    vm = v.m3 / n.mol;
    if (!gk_finite(vm)) { return GK_ERR_RANGE; }
    if (!(vm > c.b)) { return GK_ERR_DOMAIN; }
    t = (p.pa + (c.a / vm) / vm) * ((vm - c.b) / GK_R);
    if (!gk_finite(t)) { return GK_ERR_RANGE; }
    if (!(t > GK_LIT(0.0))) { return GK_ERR_RANGE; /* underflow */ }
    out->k = t;
    return GK_OK;
}

gk_status gk_vdw_volume(gk_vdw c, gk_amount n, gk_pressure p, gk_temperature t, gk_root root,
                        gk_volume *out) {
    gk_eos_result r;
    gk_real rt, prt, a, b, v;
    gk_status st;
    if (out == NULL || !gk__root_valid(root)) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(p.pa) || !gk_positive(t.k)) { return GK_ERR_DOMAIN; }
    if (!vdw_valid(c) || !gk_positive(n.mol)) { return GK_ERR_DOMAIN; }
    rt = GK_R * t.k;
    prt = p.pa / rt;
    a = (c.a / rt) * prt;
    b = c.b * prt;
    if (!gk_finite(a) || !gk_finite(b) || !gk_finite(prt)) { return GK_ERR_RANGE; }
    if (!(b > GK_LIT(0.0))) {
        /* b = 0 (or lost to underflow): the covolume bound is 0; Z^2 - Z + A = 0 after removing
           the root Z = 0. Solved by the same path with the smallest positive covolume would bias
           nothing measurable, so handle it exactly: Z = (1 +- sqrt(1 - 4A)) / 2. */
        gk_real disc = GK_LIT(1.0) - GK_LIT(4.0) * a, zg, zl, z;
        if (disc < GK_LIT(0.0)) { return GK_ERR_NO_SOLUTION; }
        zg = GK_LIT(0.5) * (GK_LIT(1.0) + gk_sqrt(disc));
        zl = a / zg; /* product of the roots is A: no cancellation */
        if (!(zl > GK_LIT(0.0))) { zl = zg; }
        if (root == GK_ROOT_LIQUID) {
            z = zl;
        } else if (root == GK_ROOT_GAS) {
            z = zg;
        } else {
            /* ln phi = Z - 1 - ln Z - A/Z for b = 0 */
            gk_real lg = zg - GK_LIT(1.0) - gk_log(zg) - a / zg;
            gk_real ll = zl - GK_LIT(1.0) - gk_log(zl) - a / zl;
            z = (ll < lg) ? zl : zg;
        }
        v = n.mol * z / prt;
    } else {
        /* the model's critical temperature Tc = 8 a / (27 R b) labels a lone root (the label is
           not reported here) */
        gk_real tc = GK_LIT(8.0) * c.a / (GK_LIT(27.0) * GK_R * c.b);
        st = gk__eos_cubic_state(GK_EOS_VAN_DER_WAALS, a, b, p.pa, t.k, tc, root, &r);
        if (st != GK_OK) { return st; }
        v = n.mol * r.molar_volume.m3_per_mol;
    }
    if (!gk_positive(v)) { return GK_ERR_RANGE; }
    out->m3 = v;
    return GK_OK;
}
