/*
 * hydrogen.c - the standardized hydrogen density equation, E. W. Lemmon, M. L. Huber,
 * J. W. Leachman, "Revised Standardized Equation for Hydrogen Gas Densities for Fuel Consumption
 * Applications", J. Res. Natl. Inst. Stand. Technol. 113 (2008) 341-350. Interface: hydrogen.h.
 *
 * The equation is explicit in p and T (p in MPa, T in K):
 *     Z(p, T) = 1 + sum_{i=1..9} a_i (100 K / T)^b_i (p / 1 MPa)^c_i,
 * so the density needs no iteration, and the fugacity coefficient follows in closed form from
 * ln phi = integral_0^p (Z - 1)/p' dp' = sum_i a_i (100 K / T)^b_i (p / 1 MPa)^c_i / c_i.
 * Each term is a_i times integer powers of 100 K / T and p / 1 MPa (by multiplication) times
 * exp(fractional parts of b_i, c_i times their logarithms): two logarithms and nine exponentials,
 * no pow(). The pressure at a given density solves p / Z(p) = rho R T by Newton's
 * iteration from the ideal-gas pressure (p / Z(p) is increasing in p over the whole range).
 *
 * Validity (the paper): 200 K to 1000 K, up to 200 MPa. Stated agreement with the reference
 * equation of Leachman et al. (J. Phys. Chem. Ref. Data 38 (2009) 721): 0.01 % from 220 to 1000 K
 * up to 70 MPa, 0.01 % from 255 K up to 120 MPa, 0.1 % from 200 K up to 200 MPa (from memory).
 * Error budget: each term to a few eps (the exponentials' arguments stay below about 4 in
 * magnitude); Z - 1 is a sum of terms of mixed sign that cancel up to about 30-fold at 200 MPa
 * (float build: Z within about 1e-5 of the double build there, 1e-6 below 70 MPa).
 */
#include "hydrogen.h"

#if GK_REFERENCE_MODELS /* the whole file: see gaskit/config.h */

/* a_i, b_i, c_i of the paper's Table (from memory). Each power is split into an integer part,
   taken by multiplication, and a fraction below 1, taken by one exponential with a small argument
   (float build: each term to a few eps instead of eps times |b ln(100 K/T) + c ln(p/MPa)| <= 30;
   the terms cancel up to 30-fold at 200 MPa): b_i = bi_i + bf_i, c_i = ci_i + cf_i. */
static const gk_real h2_a[9] = {
    GK_LIT(0.05888460),   GK_LIT(-0.06136111),   GK_LIT(-0.002650473),
    GK_LIT(0.002731125),  GK_LIT(0.001802374),   GK_LIT(-0.001150707),
    GK_LIT(0.9588528e-4), GK_LIT(-0.1109040e-6), GK_LIT(0.1264403e-9)
};
/* b: 1.325, 1.87, 2.5, 2.8, 2.938, 3.14, 3.37, 3.75, 4.0 */
static const unsigned char h2_bi[9] = { 1, 1, 2, 2, 2, 3, 3, 3, 4 };
static const gk_real h2_bf[9] = { GK_LIT(0.325), GK_LIT(0.87),  GK_LIT(0.5),
                                  GK_LIT(0.8),   GK_LIT(0.938), GK_LIT(0.14),
                                  GK_LIT(0.37),  GK_LIT(0.75),  GK_LIT(0.0) };
/* c: 1.0, 1.0, 2.0, 2.0, 2.42, 2.63, 3.0, 4.0, 5.0 */
static const unsigned char h2_ci[9] = { 1, 1, 2, 2, 2, 2, 3, 4, 5 };
static const gk_real h2_cf[9] = { GK_LIT(0.0),  GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.42),
                                  GK_LIT(0.63), GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };

/* The molar mass the equation is used with, 2.01588 g/mol: that of normal hydrogen in the
   reference equation of Leachman et al. (2009) (from memory), which the 2008 paper's densities
   use. GK__H2_MOLAR_MASS in hydrogen.h. */

/* Most Newton steps of the pressure from density (quadratic convergence from the ideal-gas start;
   |Z - 1| < 1 in range, so 6-8 steps reach the rounding level). */
#  define H2_ITER_MAX 40
#  define H2_MPA GK_LIT(1.0e6)

bool gk__h2_covers(const gk_gas *gas) {
    /* "H2" compared character by character, stopping at the first difference (never past the
       formula's NUL) */
    static const char h2[3] = { 'H', '2', '\0' };
    bool more = (gas != NULL) && (gas->formula != NULL);
    bool same = false;
    size_t i;
    for (i = 0u; (i < 3u) && more; ++i) {
        more = (unsigned char)gas->formula[i] == (unsigned char)h2[i];
        same = more && (h2[i] == '\0');
    }
    return same;
}

/* x^n for 0 <= n <= 5 by multiplication. */
static gk_real h2_ipow(gk_real x, unsigned n) {
    gk_real r = GK_LIT(1.0);
    unsigned i;
    for (i = 0; i < n; ++i) { r *= x; }
    return r;
}

/* Z - 1, ln phi and p dZ/dp at p (Pa), T (K) (both inside the range). */
static void h2_sums(gk_real p, gk_real t, gk_real *zm1, gk_real *lnphi, gk_real *pdz) {
    gk_real tt = GK_LIT(100.0) / t, pm = p / H2_MPA;
    gk_real lt = gk_log(tt), lp = gk_log(pm);
    gk_real s = GK_LIT(0.0), l = GK_LIT(0.0), d = GK_LIT(0.0);
    int i;
    for (i = 0; i < 9; ++i) {
        gk_real c = (gk_real)h2_ci[i] + h2_cf[i];
        gk_real term = h2_a[i] * h2_ipow(tt, h2_bi[i]) * h2_ipow(pm, h2_ci[i]) *
                       gk_exp(h2_bf[i] * lt + h2_cf[i] * lp);
        s += term;
        l += term / c;
        d += c * term;
    }
    *zm1 = s;
    *lnphi = l;
    *pdz = d;
}

static gk_status h2_check(gk_real p, gk_real t) {
    if (!gk_positive(p) || !gk_positive(t)) { return GK_ERR_DOMAIN; }
    if (t < GK__H2_T_MIN || t > GK__H2_T_MAX || p > GK__H2_P_MAX) { return GK_ERR_RANGE; }
    return GK_OK;
}

gk_status gk__h2_solve(gk_real p, gk_real t, gk__h2_state *out) {
    gk__h2_state r;
    gk_real zm1, lnphi, pdz;
    gk_status st;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    st = h2_check(p, t);
    if (st != GK_OK) { return st; }
    h2_sums(p, t, &zm1, &lnphi, &pdz);
    r.z = GK_LIT(1.0) + zm1;
    r.molar_density = p / (r.z * GK_R * t);
    r.ln_phi = lnphi;
    if (!gk_positive(r.z) || !gk_positive(r.molar_density) || !gk_finite(r.ln_phi)) {
        return GK_ERR_RANGE;
    }
    *out = r;
    return GK_OK;
}

gk_status gk__h2_pressure(gk_real rho, gk_real t, gk_real *out) {
    gk_real y, p, prev = GK_REAL_MAX;
    int it;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(rho) || !gk_positive(t)) { return GK_ERR_DOMAIN; }
    if (t < GK__H2_T_MIN || t > GK__H2_T_MAX) { return GK_ERR_RANGE; }
    y = rho * GK_R * t; /* the ideal-gas pressure */
    if (!gk_finite(y) || y > GK_LIT(2.0) * GK__H2_P_MAX) { return GK_ERR_RANGE; }
    p = y;
    for (it = 0; it < H2_ITER_MAX; ++it) {
        gk_real zm1, lnphi, pdz, g, gp, dp;
        h2_sums(p, t, &zm1, &lnphi, &pdz);
        /* g(p) = p - y Z(p); g'(p) = 1 - y dZ/dp = 1 - (y / p) p dZ/dp */
        g = p - y * (GK_LIT(1.0) + zm1);
        gp = GK_LIT(1.0) - (y / p) * pdz;
        if (!(gp > GK_LIT(0.0))) { return GK_ERR_NO_SOLUTION; }
        dp = g / gp;
        p -= dp;
        if (!(p > GK_LIT(0.0)) || p > GK_LIT(2.0) * GK__H2_P_MAX) { return GK_ERR_RANGE; }
        if (gk_fabs(dp) <= GK_LIT(4.0) * GK_REAL_EPS * p) { break; }
        /* rounding level: the correction no longer shrinks */
        if (gk_fabs(dp) >= prev && gk_fabs(dp) <= GK_LIT(1000.0) * GK_REAL_EPS * p) { break; }
        prev = gk_fabs(dp);
    }
    if (it == H2_ITER_MAX) { return GK_ERR_NO_SOLUTION; }
    if (p > GK__H2_P_MAX) { return GK_ERR_RANGE; }
    *out = p;
    return GK_OK;
}

#else
/* Built without the reference-grade models: an empty unit is not ISO C, so one declaration. */
typedef int gk__no_reference_models_h2;
#endif /* GK_REFERENCE_MODELS */
