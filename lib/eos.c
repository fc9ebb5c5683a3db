/*
 * eos.c - the cubic equations of state of pure gases: van der Waals, Redlich-Kwong,
 * Soave-Redlich-Kwong and Peng-Robinson (and the ideal gas through the same entry points).
 *
 * Each model is reduced to A, B (dimensionless, see eos_internal.h) in reduced variables
 * Tr = T/Tc, Pr = p/Pc, so no R^2 Tc^2 product can overflow:
 *     A = Omega_a alpha(Tr) Pr / Tr^2,   B = Omega_b Pr / Tr.
 * The cubic in Z is solved by the private solver (cubic.c), which returns every real root
 * above the covolume B; the root is chosen here (gas, liquid, or the lower fugacity).
 */
#include "eos_internal.h"
#include "cubic.h"

/* ---------------------------------------------------------------- model constants */
/* Van der Waals (1873): a = 27 R^2 Tc^2 / (64 Pc), b = R Tc / (8 Pc), from the critical
   conditions dp/dV = d2p/dV2 = 0 (check-values.md, "Cubic equations of state"). */
#define VDW_OMEGA_A GK_LIT(0.421875) /* 27/64, exact */
#define VDW_OMEGA_B GK_LIT(0.125)    /* 1/8, exact */
/* Redlich and Kwong, Chem. Rev. 44 (1949) 233 (journal reference from memory); rounded constants
   as in check-values.md: a = 0.42748 R^2 Tc^2.5 / Pc with a / sqrt(T), b = 0.08664 R Tc / Pc.
   Soave, Chem. Eng. Sci. 27 (1972) 1197 (reference from memory) keeps Omega_a, Omega_b. */
#define RK_OMEGA_A GK_LIT(0.42748)
#define RK_OMEGA_B GK_LIT(0.08664)
/* Soave (1972): alpha = (1 + m (1 - sqrt(Tr)))^2, m = 0.480 + 1.574 w - 0.176 w^2 (check-values.md). */
#define SRK_M0 GK_LIT(0.480)
#define SRK_M1 GK_LIT(1.574)
#define SRK_M2 GK_LIT(0.176)
/* Peng and Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59 (reference from memory); constants as
   in check-values.md: a = 0.45724 R^2 Tc^2 / Pc, b = 0.07780 R Tc / Pc,
   kappa = 0.37464 + 1.54226 w - 0.26992 w^2. */
#define PR_OMEGA_A GK_LIT(0.45724)
#define PR_OMEGA_B GK_LIT(0.07780)
#define PR_K0 GK_LIT(0.37464)
#define PR_K1 GK_LIT(1.54226)
#define PR_K2 GK_LIT(0.26992)
/* Critical compressibility of each model with its exact constants: 3/8 (van der Waals), 1/3
   (Redlich-Kwong, Soave), 0.30740 (Peng-Robinson 1976); Vc/b = Zc/Omega_b labels a lone root. */
#define VDW_ZC GK_LIT(0.375)
#define RK_ZC GK_LIT(0.333333333333333333)
#define PR_ZC GK_LIT(0.30740)

/* sqrt(2) to 20 digits (common practice). */
#define GK_SQRT2 GK_LIT(1.4142135623730950488)

static inline gk__cubic_family eos_family(gk_eos eos) {
    switch (eos) {
        case GK_EOS_REDLICH_KWONG:
        case GK_EOS_SOAVE_REDLICH_KWONG:
            return GK__FAMILY_RK;
        case GK_EOS_PENG_ROBINSON:
            return GK__FAMILY_PR;
        case GK_EOS_IDEAL:
        case GK_EOS_VAN_DER_WAALS:
        default:
            return GK__FAMILY_VDW;
    }
}

static inline gk_real eos_vc_over_b(gk_eos eos) {
    switch (eos) {
        case GK_EOS_REDLICH_KWONG:
        case GK_EOS_SOAVE_REDLICH_KWONG:
            return RK_ZC / RK_OMEGA_B;
        case GK_EOS_PENG_ROBINSON:
            return PR_ZC / PR_OMEGA_B;
        case GK_EOS_IDEAL:
        case GK_EOS_VAN_DER_WAALS:
        default:
            return VDW_ZC / VDW_OMEGA_B;
    }
}

static int root_valid(gk_root root) {
    switch (root) {
        case GK_ROOT_STABLE:
        case GK_ROOT_GAS:
        case GK_ROOT_LIQUID:
            return 1;
        default:
            return 0;
    }
}

gk_status gk__eos_check_state(gk_pressure p, gk_temperature t, gk_root root) {
    if (!root_valid(root)) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(p.pa) || !gk_positive(t.k)) { return GK_ERR_DOMAIN; }
    return GK_OK;
}

static int critical_ok(const gk_gas *gas) {
    return gk_positive(gas->critical_temperature.k) && gk_positive(gas->critical_pressure.pa);
}

static inline gk_status eos_check_gas(gk_eos eos, const gk_gas *gas) {
    if (gas == NULL) { return GK_ERR_ARGUMENT; }
    switch (eos) {
        case GK_EOS_IDEAL:
            return GK_OK;
        case GK_EOS_VAN_DER_WAALS:
            if (!gk_finite(gas->vdw_a) || !gk_finite(gas->vdw_b) || gas->vdw_a < GK_LIT(0.0) ||
                gas->vdw_b < GK_LIT(0.0)) {
                return GK_ERR_DOMAIN;
            }
            /* Tc, Pc are needed only for a constant the gas does not list */
            if ((!(gas->vdw_a > GK_LIT(0.0)) || !(gas->vdw_b > GK_LIT(0.0))) && !critical_ok(gas)) {
                return GK_ERR_DOMAIN;
            }
            return GK_OK;
        case GK_EOS_REDLICH_KWONG:
        case GK_EOS_SOAVE_REDLICH_KWONG:
        case GK_EOS_PENG_ROBINSON:
            if (!critical_ok(gas) || !gk_finite(gas->acentric_factor)) { return GK_ERR_DOMAIN; }
            return GK_OK;
        default:
            return GK_ERR_ARGUMENT;
    }
}

/* Temperature function alpha(Tr) of each model (Tr > 0). */
static GK_ALWAYS_INLINE gk_real eos_alpha(gk_eos eos, gk_real tr, gk_real omega) {
    gk_real m, s;
    switch (eos) {
        case GK_EOS_REDLICH_KWONG:
            return GK_LIT(1.0) / gk_sqrt(tr); /* a / sqrt(T), normalised at Tc */
        case GK_EOS_SOAVE_REDLICH_KWONG:
            m = SRK_M0 + (SRK_M1 - SRK_M2 * omega) * omega;
            break;
        case GK_EOS_PENG_ROBINSON:
            m = PR_K0 + (PR_K1 - PR_K2 * omega) * omega;
            break;
        case GK_EOS_IDEAL:
        case GK_EOS_VAN_DER_WAALS:
        default:
            return GK_LIT(1.0);
    }
    s = GK_LIT(1.0) + m * (GK_LIT(1.0) - gk_sqrt(tr));
    return s * s;
}

static inline void eos_omegas(gk_eos eos, gk_real *oa, gk_real *ob) {
    switch (eos) {
        case GK_EOS_REDLICH_KWONG:
        case GK_EOS_SOAVE_REDLICH_KWONG:
            *oa = RK_OMEGA_A;
            *ob = RK_OMEGA_B;
            break;
        case GK_EOS_PENG_ROBINSON:
            *oa = PR_OMEGA_A;
            *ob = PR_OMEGA_B;
            break;
        case GK_EOS_IDEAL:
        case GK_EOS_VAN_DER_WAALS:
        default:
            *oa = VDW_OMEGA_A;
            *ob = VDW_OMEGA_B;
            break;
    }
}

static inline gk_status eos_ab(gk_eos eos, const gk_gas *gas, gk_real p, gk_real t, gk_real *a_out,
                               gk_real *b_out) {
    gk_real a, b, oa, ob;
    if (eos == GK_EOS_VAN_DER_WAALS && (gas->vdw_a > GK_LIT(0.0) || gas->vdw_b > GK_LIT(0.0))) {
        /* handbook constant(s) in SI; the other (if 0) from Tc, Pc */
        gk_real rt = GK_R * t;
        gk_real prt = p / rt;
        if (gas->vdw_a > GK_LIT(0.0)) {
            a = (gas->vdw_a / rt) * prt;
        } else {
            gk_real tr = t / gas->critical_temperature.k, pr = p / gas->critical_pressure.pa;
            a = VDW_OMEGA_A * pr / (tr * tr);
        }
        if (gas->vdw_b > GK_LIT(0.0)) {
            b = gas->vdw_b * prt;
        } else {
            gk_real tr = t / gas->critical_temperature.k, pr = p / gas->critical_pressure.pa;
            b = VDW_OMEGA_B * pr / tr;
        }
    } else {
        /* three independent divisions (a pipelined processor overlaps them); alpha(Tr), which
           waits for a division and a square root, enters last, with one multiplication
           (Redlich-Kwong: alpha = 1/sqrt(Tr) as sqrt(Tc/T), without a second division) */
        gk_real tr = t / gas->critical_temperature.k;
        gk_real itr = gas->critical_temperature.k / t;
        gk_real pr = p / gas->critical_pressure.pa;
        gk_real pitr = pr * itr;
        gk_real alpha =
            (eos == GK_EOS_REDLICH_KWONG) ? gk_sqrt(itr) : eos_alpha(eos, tr, gas->acentric_factor);
        eos_omegas(eos, &oa, &ob);
        a = alpha * (oa * pitr * itr);
        b = ob * pitr;
    }
    if (!gk_finite(a) || !gk_finite(b)) { return GK_ERR_RANGE; }
    if (!(b > GK_LIT(0.0))) { return GK_ERR_RANGE; /* underflow: covolume lost */ }
    *a_out = a;
    *b_out = b;
    return GK_OK;
}

gk_status gk__eos_check_gas(gk_eos eos, const gk_gas *gas) { return eos_check_gas(eos, gas); }

gk_status gk__eos_ab(gk_eos eos, const gk_gas *gas, gk_real p, gk_real t, gk_real *a_out,
                     gk_real *b_out) {
    return eos_ab(eos, gas, p, t, a_out, b_out);
}

/*
 * ln(phi) of a pure fluid (or a one-fluid mixture) at the root Z > B (standard closed forms):
 *   van der Waals:        ln phi = Z - 1 - ln(Z - B) - A / Z
 *   RK, SRK:              ln phi = Z - 1 - ln(Z - B) - (A/B) ln(1 + B/Z)
 *   Peng-Robinson:        ln phi = Z - 1 - ln(Z - B)
 *                                  - A / (2 sqrt2 B) ln((Z + (1 + sqrt2) B) / (Z + (1 - sqrt2) B))
 * The last term ("attraction") is written with ln((1 + t)/(1 - t)) = 2 atanh(t):
 *   RK, SRK:  t = B / (2Z + B),          attraction = 2A / (2Z + B) * S(t^2),
 *   PR:       t = sqrt2 B / (Z + B),     attraction = A / (Z + B) * S(t^2),
 * S(y) = atanh(t)/t = 1 + y/3 + y^2/5 + ... For t^2 < 2^-8 (B below about 0.04 Z: most gas
 * states) S is its series to y^6/13 (the first omitted term, y^7/15 < 2^-56/15, is below a tenth
 * of a rounding unit): no logarithm, and exact as B -> 0. Otherwise the closed form with one
 * logarithm, q ln(1 + x), x = 2t/(1 - t) (q = A/B or A/(2 sqrt2 B)); ln rounds 1 + x, an absolute
 * error of about u q in ln phi (u the unit roundoff), below 1e-14 for the states of the tests.
 */
/* Largest t^2 for the series of atanh(t)/t (2^-8, exact in binary). */
#define ATANH_SERIES_MAX GK_LIT(0.00390625)

/* atanh(t)/t = sum_k y^k / (2k + 1), y = t^2 < 2^-8, to y^6 (Estrin's scheme: short latency). */
static inline gk_real eos_atanh_ratio(gk_real y) {
    gk_real y2 = y * y;
    gk_real p01 = GK_LIT(1.0) + y * (GK_LIT(1.0) / GK_LIT(3.0));
    gk_real p23 = GK_LIT(1.0) / GK_LIT(5.0) + y * (GK_LIT(1.0) / GK_LIT(7.0));
    gk_real p45 = GK_LIT(1.0) / GK_LIT(9.0) + y * (GK_LIT(1.0) / GK_LIT(11.0));
    gk_real p6 = GK_LIT(1.0) / GK_LIT(13.0);
    return p01 + y2 * (p23 + y2 * (p45 + y2 * p6));
}

static gk_real eos_log_factor(gk__cubic_family family, gk_real a, gk_real b);

/* The attraction term of ln phi at Z (see above); the factor q of the closed form, A/B (RK, SRK)
   or A/(2 sqrt2 B) (PR) (eos_log_factor()), is formed only where that form is taken: the series
   needs no division by B, and no q is kept live across the cubic solve (firmware stack). */
static inline gk_real eos_attraction(gk__cubic_family family, gk_real a, gk_real b, gk_real z) {
    switch (family) {
        case GK__FAMILY_RK: {
            gk_real inv =
                GK_LIT(1.0) / (GK_LIT(2.0) * z + b); /* one division for t and A/(2Z + B) */
            gk_real t = b * inv, y = t * t;
            return (y < ATANH_SERIES_MAX)
                       ? GK_LIT(2.0) * (a * inv) * eos_atanh_ratio(y)
                       : eos_log_factor(family, a, b) * gk_log(GK_LIT(1.0) + b / z);
        }
        case GK__FAMILY_PR: {
            gk_real inv = GK_LIT(1.0) / (z + b); /* one division for t and A/(Z + B) */
            gk_real t = GK_SQRT2 * b * inv, y = t * t;
            return (y < ATANH_SERIES_MAX)
                       ? (a * inv) * eos_atanh_ratio(y)
                       : eos_log_factor(family, a, b) *
                             gk_log(GK_LIT(1.0) + GK_LIT(2.0) * GK_SQRT2 * b /
                                                      (z + (GK_LIT(1.0) - GK_SQRT2) * b));
        }
        case GK__FAMILY_VDW:
        default:
            return a / z;
    }
}

/* A/B (RK, SRK) or A/(2 sqrt2 B) (PR): the factor of the closed form of the attraction term. */
static gk_real eos_log_factor(gk__cubic_family family, gk_real a, gk_real b) {
    switch (family) {
        case GK__FAMILY_RK:
            return a / b;
        case GK__FAMILY_PR:
            return a / (GK_LIT(2.0) * GK_SQRT2 * b);
        case GK__FAMILY_VDW:
        default:
            return GK_LIT(0.0);
    }
}

/* phi = exp(Z - 1 - attraction) / (Z - B): one logarithm fewer than exp(ln phi); falls back to
   exp(ln phi) where the first factor would leave the floating-point range. The reciprocal of
   Z - B is formed before the exponential, so its division runs while exp() does (one rounding
   more: below 1.2e-16 relative in double). */
static gk_real eos_phi(gk_real attraction, gk_real b, gk_real z) {
    gk_real inv = GK_LIT(1.0) / (z - b);
    gk_real e = (z - GK_LIT(1.0)) - attraction;
    gk_real phi = gk_exp(e) * inv;
    if (!(phi > GK_LIT(0.0)) || !gk_finite(phi)) { phi = gk_exp(e - gk_log(z - b)); }
    return phi;
}

gk_status gk__eos_ideal(gk_real p, gk_real t, gk_eos_result *out) {
    gk_real vm = GK_R * t / p;
    if (!gk_positive(vm)) { return GK_ERR_RANGE; }
    out->z = GK_LIT(1.0);
    out->molar_volume.m3_per_mol = vm;
    out->fugacity_coefficient = GK_LIT(1.0);
    out->root_count = 1;
    out->z_roots[0] = GK_LIT(1.0);
    out->z_roots[1] = GK_LIT(0.0);
    out->z_roots[2] = GK_LIT(0.0);
    out->branch = GK_ROOT_GAS;
    return GK_OK;
}

/*
 * Start for the gas root: the expansion of Z = 1 + B - A (Z - B)/D(Z) about Z = 1 (fixed-point
 * iteration with each order collected; derived with a computer-algebra system, sympy 1.14), to
 * fourth order in (A, B):
 *   Z = 1 + (B - A) + A (k2 B - A) - A (2 A^2 - 3 k2 A B + k3 B^2)
 *         + A (-5 A^3 + 10 k2 A^2 B - k4 A B^2 + k5 B^3) + O((A + B)^5),
 *   k2 = u + 2, k3 = u^2 + 3u - w + 3, k4 = 6u^2 + 20u - 4w + 20, k5 = u^3 + 4u^2 - 2uw + 6u - 4w + 4
 * (vdW 2, 3, 20, 4; RK/SRK 3, 7, 46, 15; PR 4, 14, 88, 48). No division. Its error is about
 * 14 A^5 for small A, B, so one solver step reaches full precision for A, B up to ~0.1; up to
 * EOS_GUESS_MAX it is still a better start than the bound 1 + B (measured: 1.83 -> 1.62 divisions
 * per Peng-Robinson state of the benchmark). The solver only uses it as a start (it checks that
 * it lies in (B, 1 + B) and on the convex side of the cubic), so it never changes the result
 * beyond rounding.
 */
#define EOS_GUESS_MAX GK_LIT(1.0)

typedef struct eos_series {
    gk_real k2, k3, k4, k5;
} eos_series;

/* The series as a polynomial in A whose coefficients depend on B only,
     Z = (1 + B) + A C1 + A^2 (C2 + A C3 - 5 A^2),
     C1 = -1 + B (k2 - B (k3 - k5 B)),  C2 = -1 + B (3 k2 - k4 B),  C3 = -2 + 10 k2 B:
   B is known before A (A waits for the square root in alpha(Tr)), so C1 ... C3 are ready when A
   arrives and the start costs four dependent operations after it. */
static inline gk_real eos_gas_guess(const eos_series *k, gk_real a, gk_real b) {
    gk_real c1 = GK_LIT(-1.0) + b * (k->k2 - b * (k->k3 - k->k5 * b));
    gk_real c2 = GK_LIT(-1.0) + b * (GK_LIT(3.0) * k->k2 - k->k4 * b);
    gk_real c3 = GK_LIT(-2.0) + GK_LIT(10.0) * k->k2 * b;
    gk_real a2 = a * a;
    return ((GK_LIT(1.0) + b) + a * c1) + a2 * ((c2 + a * c3) - GK_LIT(5.0) * a2);
}

/* The second half of eos_solve_ab(): from the n >= 1 roots zr[] (ascending) above B, the root
   asked for (root; the stable one by the lower fugacity), its phi and molar volume (rtp = R T / p),
   and the complete result into *out (only on GK_OK). Kept out of line so that the values it needs
   after the cubic solve are few (a, b, rtp, the Vc/b label) and its own, for the attraction terms
   and logarithms, are not in the frame that lies under the solver (firmware stack budget). */
static GK_NOINLINE gk_status eos_pick(gk__cubic_family family, gk_real vc_over_b, gk_real a,
                                      gk_real b, gk_real rtp, gk_root root, const gk_real zr[3],
                                      gk_eos_result *out) {
    /* the number of roots from zr[] itself (one argument less: none passed on the stack): the
       roots lie above B > 0 and gk__cubic_roots() sets the unused entries to 0 */
    const int n = (zr[2] > GK_LIT(0.0)) ? 3 : (zr[1] > GK_LIT(0.0)) ? 2 : 1;
    gk_real zsel, phi, vm, attr;
    gk_root branch;

    if (n == 1) {
        zsel = zr[0];
        branch = (zsel < vc_over_b * b) ? GK_ROOT_LIQUID : GK_ROOT_GAS;
        attr = eos_attraction(family, a, b, zsel);
    } else if (root == GK_ROOT_LIQUID) {
        zsel = zr[0];
        branch = GK_ROOT_LIQUID;
        attr = eos_attraction(family, a, b, zsel);
    } else if (root == GK_ROOT_GAS) {
        zsel = zr[n - 1];
        branch = GK_ROOT_GAS;
        attr = eos_attraction(family, a, b, zsel);
    } else {
        /* stable: the lower fugacity (same p, T: the lower Gibbs energy); a tie goes to the gas.
           ln phi_L - ln phi_G = (zL - zG) - ln((zL - B)/(zG - B)) - (attr_L - attr_G): one
           logarithm for the first difference, and each attraction term is the one phi needs */
        gk_real zl = zr[0], zg = zr[n - 1];
        gk_real al = eos_attraction(family, a, b, zl);
        gk_real ag = eos_attraction(family, a, b, zg);
        gk_real dl = (zl - zg) - gk_log((zl - b) / (zg - b)) - (al - ag);
        if (dl < GK_LIT(0.0)) {
            zsel = zl;
            branch = GK_ROOT_LIQUID;
            attr = al;
        } else {
            zsel = zg;
            branch = GK_ROOT_GAS;
            attr = ag;
        }
    }
    phi = eos_phi(attr, b, zsel);
    vm = zsel * rtp;
    if (!gk_positive(phi) || !gk_positive(vm)) { return GK_ERR_RANGE; }

    out->z = zsel;
    out->molar_volume.m3_per_mol = vm;
    out->fugacity_coefficient = phi;
    out->root_count = n;
    out->z_roots[0] = zr[0];
    out->z_roots[1] = zr[1];
    out->z_roots[2] = zr[2];
    out->branch = branch;
    return GK_OK;
}

/* gk__eos_solve_ab (see eos_internal.h). gk_eos_solve() calls this directly (same translation
   unit, no wrapper); gk__eos_solve_ab() wraps it for the van der Waals module (eos_vdw.c). */
static inline gk_status eos_solve_ab(gk__cubic_family family, gk_real p, gk_real t, gk_real a,
                                     gk_real b, gk_real vc_over_b, gk_root root,
                                     gk_eos_result *out) {
    gk_real u, w, c2, c1, c0, zr[3], guess, rtp;
    int n;

    eos_series k;

    switch (family) {
        case GK__FAMILY_RK:
            u = GK_LIT(1.0);
            w = GK_LIT(0.0);
            k.k2 = GK_LIT(3.0);
            k.k3 = GK_LIT(7.0);
            k.k4 = GK_LIT(46.0);
            k.k5 = GK_LIT(15.0);
            break;
        case GK__FAMILY_PR:
            u = GK_LIT(2.0);
            w = GK_LIT(-1.0);
            k.k2 = GK_LIT(4.0);
            k.k3 = GK_LIT(14.0);
            k.k4 = GK_LIT(88.0);
            k.k5 = GK_LIT(48.0);
            break;
        case GK__FAMILY_VDW:
        default:
            u = GK_LIT(0.0);
            w = GK_LIT(0.0);
            k.k2 = GK_LIT(2.0);
            k.k3 = GK_LIT(3.0);
            k.k4 = GK_LIT(20.0);
            k.k5 = GK_LIT(4.0);
            break;
    }
    c2 = -(GK_LIT(1.0) + b - u * b);
    c1 = a - b * (u + (u - w) * b);
    c0 = -b * (a + w * b * (GK_LIT(1.0) + b));

    guess = (a < EOS_GUESS_MAX && b < EOS_GUESS_MAX) ? eos_gas_guess(&k, a, b) : GK_LIT(0.0);
    rtp = GK_R * t / p;
    n = gk__cubic_roots(c2, c1, c0, b, GK_LIT(1.0) + b, guess, zr);
    /* With A >= 0 and B > 0 a root above B always exists (f(B) < 0 < f(1 + B)); none found means
       it lies within rounding of B (e.g. Z - B ~ B^2/A below u B at absurdly large A): the result
       cannot be represented, GK_ERR_RANGE, like an overflow. */
    if (n <= 0) { return GK_ERR_RANGE; }

    return eos_pick(family, vc_over_b, a, b, rtp, root, zr, out);
}

gk_status gk__eos_solve_ab(gk__cubic_family family, gk_real vc_over_b, gk_real a, gk_real b,
                           gk_real p, gk_real t, gk_root root, gk_eos_result *out) {
    return eos_solve_ab(family, p, t, a, b, vc_over_b, root, out);
}

/* gk__eos_prepare (see eos_internal.h): the checks of gk_eos_solve() and A, B. */
GK_NOINLINE gk_status gk__eos_prepare(gk_eos eos, const gk_gas *gas, gk_pressure p,
                                      gk_temperature t, gk_root root, gk_real ab[2]) {
    gk_status st;
    if (gas == NULL || !gk__eos_valid(eos)) { return GK_ERR_ARGUMENT; }
    st = gk__eos_check_state(p, t, root);
    if (st != GK_OK) { return st; }
    if (eos == GK_EOS_IDEAL) { return GK_OK; }
    st = eos_check_gas(eos, gas);
    if (st != GK_OK) { return st; }
    return eos_ab(eos, gas, p.pa, t.k, &ab[0], &ab[1]);
}

gk_status gk__eos_finish(gk_eos eos, const gk_real ab[2], gk_pressure p, gk_temperature t,
                         gk_root root, gk_eos_result *out) {
    if (eos == GK_EOS_IDEAL) { return gk__eos_ideal(p.pa, t.k, out); }
    /* writes *out only on success */
    /* p, t stay in the registers they arrive in and the call is a plain jump (no frame) */
    return eos_solve_ab(eos_family(eos), p.pa, t.k, ab[0], ab[1], eos_vc_over_b(eos), root, out);
}

gk_status gk_eos_solve(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t, gk_root root,
                       gk_eos_result *out) {
    gk_real ab[2] = { GK_LIT(0.0), GK_LIT(0.0) };
    gk_status st;
    if (gas == NULL || out == NULL || !gk__eos_valid(eos)) { return GK_ERR_ARGUMENT; }
    st = gk__eos_prepare(eos, gas, p, t, root, ab);
    if (st != GK_OK) { return st; }
    return gk__eos_finish(eos, ab, p, t, root, out);
}

gk_status gk_eos_pressure(gk_eos eos, const gk_gas *gas, gk_molar_volume vm, gk_temperature t,
                          gk_pressure *out) {
    gk_real v = vm.m3_per_mol, tk = t.k, pa, rep, red;
    gk_status st;
    if (gas == NULL || out == NULL || !gk__eos_valid(eos)) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(v) || !gk_positive(tk)) { return GK_ERR_DOMAIN; }
    st = gk__eos_check_gas(eos, gas);
    if (st != GK_OK) { return st; }
    if (eos == GK_EOS_IDEAL) {
        pa = GK_R * tk / v;
        /* R T / Vm > 0 for every valid input: 0 is an underflow, not a non-positive pressure */
        if (!(pa > GK_LIT(0.0))) { return GK_ERR_RANGE; }
    } else if (eos == GK_EOS_VAN_DER_WAALS) {
        gk_real rtc = GK_R * gas->critical_temperature.k;
        gk_real a = gas->vdw_a > GK_LIT(0.0)
                        ? gas->vdw_a
                        : VDW_OMEGA_A * (rtc / gas->critical_pressure.pa) * rtc;
        gk_real b =
            gas->vdw_b > GK_LIT(0.0) ? gas->vdw_b : VDW_OMEGA_B * rtc / gas->critical_pressure.pa;
        if (!gk_finite(a) || !gk_finite(b)) { return GK_ERR_RANGE; }
        if (!(v > b)) { return GK_ERR_DOMAIN; }
        rep = GK_R * tk / (v - b);
        /* the repulsive term R T / (V - b) is > 0 for every valid input: 0 is an underflow */
        if (!(rep > GK_LIT(0.0))) { return GK_ERR_RANGE; }
        pa = rep - (a / v) / v;
    } else {
        /* reduced form: p/Pc = Tr/(vr - Ob) - Oa alpha / (vr^2 + u Ob vr + w Ob^2), vr = Vm Pc/(R Tc) */
        gk_real oa, ob, u, w, tr, vr, den;
        gk__cubic_family fam = eos_family(eos);
        eos_omegas(eos, &oa, &ob);
        u = fam == GK__FAMILY_PR ? GK_LIT(2.0) : GK_LIT(1.0);
        w = fam == GK__FAMILY_PR ? GK_LIT(-1.0) : GK_LIT(0.0);
        tr = tk / gas->critical_temperature.k;
        vr = v * (gas->critical_pressure.pa / (GK_R * gas->critical_temperature.k));
        if (!gk_finite(vr) || !gk_finite(tr)) { return GK_ERR_RANGE; }
        if (!(vr > ob)) { return GK_ERR_DOMAIN; }
        den = vr * vr + (u * vr + w * ob) * ob;
        rep = tr / (vr - ob);
        /* as above: the repulsive term is > 0, and so is a reduced pressure that the scaling by
           Pc rounds to 0 */
        if (!(rep > GK_LIT(0.0))) { return GK_ERR_RANGE; }
        red = rep - oa * eos_alpha(eos, tr, gas->acentric_factor) / den;
        pa = red * gas->critical_pressure.pa;
        if (red > GK_LIT(0.0) && !(pa > GK_LIT(0.0))) { return GK_ERR_RANGE; }
    }
    if (!gk_finite(pa)) { return GK_ERR_RANGE; }
    if (!(pa > GK_LIT(0.0))) { return GK_ERR_NO_SOLUTION; }
    out->pa = pa;
    return GK_OK;
}

gk_status gk_eos_density(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t,
                         gk_density *out) {
    gk_eos_result r;
    gk_real rho;
    gk_status st;
    if (gas == NULL || out == NULL || !gk__eos_valid(eos)) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(gas->molar_mass.kg_per_mol)) { return GK_ERR_DOMAIN; }
    /* gk_eos_solve() in its two halves (its own checks are the ones above), without its frame
       under the cubic solver; A, B are staged in r.z_roots (see gk__eos_finish()) */
    r.z_roots[0] = GK_LIT(0.0);
    r.z_roots[1] = GK_LIT(0.0);
    st = gk__eos_prepare(eos, gas, p, t, GK_ROOT_STABLE, r.z_roots);
    if (st != GK_OK) { return st; }
    st = gk__eos_finish(eos, r.z_roots, p, t, GK_ROOT_STABLE, &r);
    if (st != GK_OK) { return st; }
    rho = gas->molar_mass.kg_per_mol / r.molar_volume.m3_per_mol;
    if (!gk_positive(rho)) { return GK_ERR_RANGE; }
    out->kg_per_m3 = rho;
    return GK_OK;
}
