/*
 * helmholtz.c - the Span-Wagner technical equations of state (pure fluids and the multi-fluid
 * mixture without departure functions): coefficient rows, the density solve and the root choice.
 * Interface, formulas, validity table and status contract: helmholtz.h.
 *
 * Method
 * - Per temperature, the products n_k tau^t_k are formed once and added into 12 coefficients,
 *   one per group of terms with equal exponents (d, l) (the two forms have 12 such groups
 *   between them), summed over the components of a mixture. Every t_k is a multiple of 1/8
 *   (Part I), so tau^t_k is one of 8 integer powers of tau (products) times tau^(j/8),
 *   j = 0..7, from three square roots: no pow() call.
 * - Per density, one pass over the 12 groups with delta^1 ... delta^7 by multiplication and the
 *   three exponentials exp(-delta), exp(-delta^2), exp(-delta^3) gives alpha_r,
 *   S1 = delta d(alpha_r)/d(delta) = Z - 1 and S2 = delta^2 d2(alpha_r)/d(delta)^2 (for a term
 *   T = c delta^d exp(-delta^l), with g = d - l delta^l: delta dT/d(delta) = g T and
 *   delta^2 d2T/d(delta)^2 = (g (g - 1) - l^2 delta^l) T).
 * - Density root: f(delta) = delta (1 + S1) - Pi = 0, Pi = p / (rho_r R T), f' = 1 + 2 S1 + S2
 *   (proportional to dp/drho). Safeguarded Newton: the iterate keeps a bracket, a "near" end on
 *   the side the branch is approached from (below for the vapour-like root, where f < 0; above
 *   for the liquid-like root, where f > 0) and a "far" end once a point of the other sign is
 *   seen; a step leaving the bracket is replaced by bisection. On the near side f' <= 0 after a
 *   Newton step means the branch's spinodal was passed with no root: that branch has none.
 *   A root is accepted only with f' > 0 (no spurious or unstable roots). Starts: the
 *   vapour-like root from the virial series to the fourth coefficient (hz_gas_start()); the
 *   liquid-like root from 1.05 times Guggenheim's saturated-liquid estimate
 *   1 + (3/4)(1 - Tr) + (7/4)(1 - Tr)^(1/3) (E. A. Guggenheim, J. Chem. Phys. 13 (1945) 253,
 *   from memory; below 0.9 T_r and 3 MPa the estimate is 0.94 to 1.15 times the liquid roots
 *   of the covered fluids, measured with these equations, and the factor 1.05 starts near the
 *   middle of that spread; a start below the root is corrected by the bracket). From the
 *   second point on, each Newton step gets Chebyshev's curvature correction with f'' from the
 *   last two points (hz_step()).
 * - Stop: once |Newton step| <= sqrt(eps)/8 delta the step is taken and the sums are moved to
 *   first order (quadratic convergence leaves an error below eps), or (rounding level) |f| no
 *   longer decreases within 1000 eps of the root; at most GK__HZ_ITER_MAX steps, else
 *   GK_ERR_NO_SOLUTION.
 * - Below 1.01 T_r (a mixture: 1.05 T_r) both roots are sought (the equations' own critical
 *   temperature is within 0.2 % of T_r); equal roots count once.
 * - At the root Z = Pi / delta (no cancellation for a liquid's small Z); ln phi = alpha_r + x - ln Z,
 *   x = Z - 1 (= S1 for a gas).
 *
 * Error budget (double): each root to a few eps relative in delta; Z, ln phi to a few eps times
 * the condition |delta dZ/d(delta) / Z| (O(1) for gases, up to ~100 for liquids at low pressure).
 * Float: the same in float eps; Z agrees with the double build to about 1e-6 (tests).
 */
#include "helmholtz.h"

#if GK_REFERENCE_MODELS /* the whole file: see gaskit/config.h */

/* Always inlines a helper into its caller, whose frame then holds its locals once (firmware
   stack); only a hint without GCC or Clang. */
#  if defined(__GNUC__)
#    define HZ_INLINE inline __attribute__((always_inline))
#  else
#    define HZ_INLINE inline
#  endif

/* t_k in eighths: nonpolar 0.25 1.125 1.5 1.375 0.25 0.875 0.625 1.75 3.625 3.625 14.5 12;
   polar 0.25 1.25 1.5 0.25 0.875 2.375 2 2.125 3.5 6.5 4.75 12.5 */
static const unsigned char hz_t8[2][GK__SW_TERMS] = {
    { 2, 9, 12, 11, 2, 7, 5, 14, 29, 29, 116, 96 }, { 2, 10, 12, 2, 7, 19, 16, 17, 28, 52, 38, 100 }
};

/* Below HZ_TWO_ROOT_PURE T_r (a pure fluid) or HZ_TWO_ROOT_MIX T_r (a mixture) both roots are
   sought: the equations' own critical temperatures lie within 0.2 % of T_r (every covered
   fluid's isotherm at 1.002 T_r has dp/drho > 0 on a 1e-4 grid in delta up to its range, a check
   made for this choice), a mixture's pseudo-critical point within a few percent; above, an
   isotherm has one root. */
#  define HZ_TWO_ROOT_PURE GK_LIT(1.01)
#  define HZ_TWO_ROOT_MIX GK_LIT(1.05)
/* Below HZ_SPLIT_TR T_r the vapour-like root is sought below delta = 1 and the liquid-like root
   above it: between the spinodals, which enclose delta = 1, multiparameter equations may have
   spurious loops with dp/drho > 0 (Span and Wagner 2003, Part I, on the unstable region),
   and no physical root lies there. */
#  define HZ_SPLIT_TR GK_LIT(0.9)
/* Newton's last step: taken without a further evaluation once |step| <= HZ_QUAD_TOL delta, about
   sqrt(eps)/8, so that the neglected (f''/(2 f')) step^2 is below eps for |delta f''/f'| up to
   about 100. Rounding-level window: HZ_STALL_TOL eps delta. */
#  if GK_REAL_IS_FLOAT
#    define HZ_QUAD_TOL GK_LIT(4.0e-5)
#  else
#    define HZ_QUAD_TOL GK_LIT(2.0e-9)
#  endif
#  define HZ_STALL_TOL GK_LIT(1000.0)
/* Two roots closer than this (relative) are the same root. */
#  define HZ_SAME_ROOT GK_LIT(1e-4)
/* Newton steps on the virial series for the vapour-like start (hz_gas_start()). */
#  define HZ_START_STEPS 1

/*
 * Coefficient rows. n_k: Span and Wagner 2003, Part II Tables (nonpolar fluids) and Part III
 * Table (CO2, polar form), as entered from memory of the papers; each row's checks (critical
 * pressure at (T_c, rho_c), normal density, B(300 K), vapour pressures) are in
 * tests/test_helmholtz.c. Reducing values T_c, rho_c: the papers' (from memory), which are the
 * critical points of the fluids' reference equations. Validity: see helmholtz.h (from memory).
 */
#  define HZ_MPA GK_LIT(1.0e6)
static const gk__sw_fluid hz_fluids[] = {
    /* N2, Part II (reducing: 126.192 K, 11.1839 mol/dm^3; triple point 63.151 K) */
    { "N2",
      GK__SW_NONPOLAR,
      GK_LIT(126.192),
      GK_LIT(11183.9),
      GK_LIT(63.151),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.92296567), GK_LIT(-2.5575012), GK_LIT(0.64482463), GK_LIT(0.01083102),
        GK_LIT(0.073924167), GK_LIT(0.00023532962), GK_LIT(0.18024854), GK_LIT(-0.045660299),
        GK_LIT(-0.1552106), GK_LIT(-0.038111136), GK_LIT(-0.031962422), GK_LIT(0.015513532) } },
    /* O2, Part II (154.595 K, 13.63 mol/dm^3; triple point 54.361 K) */
    { "O2",
      GK__SW_NONPOLAR,
      GK_LIT(154.595),
      GK_LIT(13630.0),
      GK_LIT(54.361),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.88878286), GK_LIT(-2.4879433), GK_LIT(0.59750190), GK_LIT(0.0096501817),
        GK_LIT(0.071970430), GK_LIT(0.00022337443), GK_LIT(0.18558686), GK_LIT(-0.038129368),
        GK_LIT(-0.15352245), GK_LIT(-0.026726815), GK_LIT(-0.025675299), GK_LIT(0.0095714302) } },
    /* Ar, Part II (150.687 K, 13.40742965 mol/dm^3; triple point 83.806 K) */
    { "Ar",
      GK__SW_NONPOLAR,
      GK_LIT(150.687),
      GK_LIT(13407.42965),
      GK_LIT(83.806),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.85095714), GK_LIT(-2.4003223), GK_LIT(0.54127841), GK_LIT(0.016919770),
        GK_LIT(0.068825965), GK_LIT(0.00021428033), GK_LIT(0.17429895), GK_LIT(-0.033654496),
        GK_LIT(-0.13526800), GK_LIT(-0.016387350), GK_LIT(-0.024987666), GK_LIT(0.0088769204) } },
    /* CH4, Part II (190.564 K, 10.139342719 mol/dm^3; triple point 90.6941 K) */
    { "CH4",
      GK__SW_NONPOLAR,
      GK_LIT(190.564),
      GK_LIT(10139.342719),
      GK_LIT(90.6941),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.89269676), GK_LIT(-2.5438282), GK_LIT(0.64980978), GK_LIT(0.020793471),
        GK_LIT(0.070189104), GK_LIT(0.00023700378), GK_LIT(0.16653334), GK_LIT(-0.043855669),
        GK_LIT(-0.15726780), GK_LIT(-0.035311675), GK_LIT(-0.029570024), GK_LIT(0.014019842) } },
    /* C2H6, Part II (305.322 K, 6.870854540 mol/dm^3; triple point 90.368 K) */
    { "C2H6",
      GK__SW_NONPOLAR,
      GK_LIT(305.322),
      GK_LIT(6870.854540),
      GK_LIT(90.368),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.97628068), GK_LIT(-2.6905251), GK_LIT(0.73498222), GK_LIT(-0.035366206),
        GK_LIT(0.084692031), GK_LIT(0.00024154594), GK_LIT(0.23964954), GK_LIT(-0.042780093),
        GK_LIT(-0.22308832), GK_LIT(-0.051799954), GK_LIT(-0.027178426), GK_LIT(0.011246305) } },
    /* C3H8, Part II (369.825 K, 5.0 mol/dm^3; triple point 85.525 K) */
    { "C3H8",
      GK__SW_NONPOLAR,
      GK_LIT(369.825),
      GK_LIT(5000.0),
      GK_LIT(85.525),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(1.0403973), GK_LIT(-2.8318404), GK_LIT(0.84393810), GK_LIT(-0.076559592),
        GK_LIT(0.094697373), GK_LIT(0.00024796475), GK_LIT(0.27743760), GK_LIT(-0.043846001),
        GK_LIT(-0.26991065), GK_LIT(-0.069313413), GK_LIT(-0.029632146), GK_LIT(0.014040127) } },
    /* n-C4H10, Part II (425.125 K, 3.920016792 mol/dm^3; triple point 134.895 K) */
    { "n-C4H10",
      GK__SW_NONPOLAR,
      GK_LIT(425.125),
      GK_LIT(3920.016792),
      GK_LIT(134.895),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(1.0626277), GK_LIT(-2.8620952), GK_LIT(0.88738233), GK_LIT(-0.12570581),
        GK_LIT(0.10286309), GK_LIT(0.00025358041), GK_LIT(0.32325719), GK_LIT(-0.037950761),
        GK_LIT(-0.32534802), GK_LIT(-0.079050969), GK_LIT(-0.020636720), GK_LIT(0.0057053809) } },
    /* CO2, Part III, polar form (304.1282 K, 10.6249 mol/dm^3; triple point 216.592 K) */
    { "CO2",
      GK__SW_POLAR,
      GK_LIT(304.1282),
      GK_LIT(10624.9),
      GK_LIT(216.592),
      GK_LIT(600.0),
      GK_LIT(100.0) * HZ_MPA,
      { GK_LIT(0.89875108), GK_LIT(-2.1281985), GK_LIT(-0.068190320), GK_LIT(0.076355306),
        GK_LIT(0.00022053253), GK_LIT(0.41541823), GK_LIT(0.71335657), GK_LIT(0.00030354234),
        GK_LIT(-0.36643143), GK_LIT(-0.0014407781), GK_LIT(-0.089166707), GK_LIT(-0.023699887) } },
};
#  define HZ_FLUID_COUNT (sizeof hz_fluids / sizeof hz_fluids[0])

/* ---------------------------------------------------------------- lookup and models */

static bool hz_same_text(const char *a, const char *b) {
    size_t i = 0;
    while (a[i] != '\0' && a[i] == b[i]) { ++i; }
    return a[i] == b[i];
}

const gk__sw_fluid *gk__sw_find(const gk_gas *gas) {
    size_t i;
    if (gas == NULL || gas->formula == NULL) { return NULL; }
    for (i = 0; i < HZ_FLUID_COUNT; ++i) {
        if (hz_same_text(hz_fluids[i].formula, gas->formula)) { return &hz_fluids[i]; }
    }
    return NULL;
}

/* The model of one row (fluid, out not NULL). */
static gk_status hz_model_pure(const gk__sw_fluid *fluid, gk__hz_model *out) {
    out->t_r = fluid->t_c;
    out->rho_r = fluid->rho_c;
    out->t_min = fluid->t_min;
    out->t_max = fluid->t_max;
    out->p_max = fluid->p_max;
    out->fluid = fluid;
    out->gas = NULL;
    out->rows = NULL;
    out->x = NULL;
    out->count = 1;
    return GK_OK;
}

/* Dry air of ISO 2533:1975 (from memory): N2 78.084 %, O2 20.9476 %, Ar 0.934 % by volume, the
   three normalised to their sum 0.999656 (the other 0.034 %, mostly CO2, left out). */
static const gk__sw_fluid *const hz_air_rows[] = { &hz_fluids[0], &hz_fluids[1], &hz_fluids[2] };
static const gk_real hz_air_x[3] = { GK_LIT(0.7811087013932793), GK_LIT(0.20954808454108212),
                                     GK_LIT(0.009343214065638579) };

static gk_status hz_model_rows(const gk__sw_fluid *const *rows, const gk_real *x, size_t count,
                               gk__hz_model *out);

gk_status gk__sw_model_gas(const gk_gas *gas, gk__hz_model *out) {
    const gk__sw_fluid *fluid;
    if (gas == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    fluid = gk__sw_find(gas);
    if (fluid != NULL) { return hz_model_pure(fluid, out); }
    if (gas->formula != NULL && hz_same_text("air", gas->formula)) {
        return hz_model_rows(hz_air_rows, hz_air_x, 3, out);
    }
    return GK_ERR_NOT_FOUND;
}

/* What a mixture's model is built from: the reducing sums s[0] = sum x sqrt(Tc),
   s[1..4] = S0..S3 with S_k = sum x v^(k/3), v = 1/rho_c, and the narrowest validity range. */
typedef struct hz_mix_sums {
    gk_real s[5];
    gk_real t_min, t_max, p_max;
} hz_mix_sums;

/* Adds x times the row to the mixture's sums and range (out of line: firmware stack budget,
   docs/embedding.md). */
static GK_NOINLINE void hz_mix_add(hz_mix_sums *m, const gk__sw_fluid *fl, gk_real x) {
    gk_real c = gk_cbrt(GK_LIT(1.0) / fl->rho_c);
    m->s[0] += x * gk_sqrt(fl->t_c);
    m->s[1] += x;
    m->s[2] += x * c;
    m->s[3] += x * c * c;
    m->s[4] += x * c * c * c;
    m->t_min = (fl->t_min > m->t_min) ? fl->t_min : m->t_min;
    m->t_max = (fl->t_max < m->t_max) ? fl->t_max : m->t_max;
    m->p_max = (fl->p_max < m->p_max) ? fl->p_max : m->p_max;
}

/* The reducing values and range of a mixture whose i-th row is rows[i] (rows given) or
   gk__sw_find(gas[i]); every component with x_i > 0 has a row (checked by the callers). */
static gk_status hz_model_mix(const gk_gas *const *gas, const gk__sw_fluid *const *rows,
                              const gk_real *x, size_t count, gk__hz_model *out) {
    hz_mix_sums m = { { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) },
                      GK_LIT(0.0),
                      GK_REAL_MAX,
                      GK_REAL_MAX };
    gk_real t_r, rho_r;
    size_t i;
    for (i = 0; i < count; ++i) {
        if (x[i] > GK_LIT(0.0)) {
            const gk__sw_fluid *fl = (rows != NULL) ? rows[i] : gk__sw_find(gas[i]);
            if (fl == NULL) { return GK_ERR_NOT_FOUND; } /* the callers' check, kept local */
            hz_mix_add(&m, fl, x[i]);
        }
    }
    if (!(m.s[1] > GK_LIT(0.0))) { return GK_ERR_DOMAIN; }
    t_r = m.s[0] * m.s[0];
    rho_r = GK_LIT(4.0) / (m.s[1] * m.s[4] + GK_LIT(3.0) * m.s[2] * m.s[3]);
    if (!gk_positive(t_r) || !gk_positive(rho_r)) { return GK_ERR_DOMAIN; }
    out->t_r = t_r;
    out->rho_r = rho_r;
    out->t_min = m.t_min;
    out->t_max = m.t_max;
    out->p_max = m.p_max;
    out->fluid = NULL;
    out->gas = gas;
    out->rows = rows;
    out->x = x;
    out->count = count;
    return GK_OK;
}

static gk_status hz_model_rows(const gk__sw_fluid *const *rows, const gk_real *x, size_t count,
                               gk__hz_model *out) {
    return hz_model_mix(NULL, rows, x, count, out);
}

/* The checks of gk__sw_model_mixture() on its components; GK_OK or the status (out of line:
   firmware stack budget). */
static GK_NOINLINE gk_status hz_mixture_check(const gk_gas *const *gas, const gk_real *x,
                                              size_t count) {
    size_t i;
    if ((count == 0u) || (count > (size_t)GK_MIXTURE_MAX)) { return GK_ERR_DOMAIN; }
    for (i = 0; i < count; ++i) {
        if (gas[i] == NULL) { return GK_ERR_ARGUMENT; }
        if (!gk_finite(x[i]) || x[i] < GK_LIT(0.0) || x[i] > GK_LIT(1.0)) { return GK_ERR_DOMAIN; }
        if (x[i] > GK_LIT(0.0) && gk__sw_find(gas[i]) == NULL) { return GK_ERR_NOT_FOUND; }
    }
    return GK_OK;
}

gk_status gk__sw_model_mixture(const gk_gas *const *gas, const gk_real *x, size_t count,
                               gk__hz_model *out) {
    gk_status st;
    if (gas == NULL || x == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = hz_mixture_check(gas, x, count);
    return (st == GK_OK) ? hz_model_mix(gas, NULL, x, count, out) : st;
}

/* ---------------------------------------------------------------- evaluation */

/* The terms of both forms fall into 12 groups of equal exponents (d, l) (Part I; l = 0: no
   exponential): (1,0) (2,0) (3,0) (7,0) (1,1) (2,1) (5,1) (1,2) (4,2) (2,3) (3,3) (4,3). Per
   temperature the terms of a group add into one coefficient G = sum n_k tau^t_k (over the
   forms present and, for a mixture, x_i over the components), so every density evaluation,
   pure or mixed, nonpolar or polar, is 12 terms at most. */
static const unsigned char hz_group[2][GK__SW_TERMS] = {
    { 0, 0, 0, 1, 2, 3, 5, 6, 7, 8, 10, 11 }, /* nonpolar */
    { 0, 0, 0, 2, 3, 4, 5, 6, 7, 7, 8, 9 }    /* polar */
};

/* alpha_r, S1 = delta alpha_r_delta (= Z - 1), S2 = delta^2 alpha_r_delta_delta. */
typedef struct hz_sums {
    gk_real a, s1, s2;
} hz_sums;

/* A root found: its reduced density, Z and ln phi. */
typedef struct hz_rootrec {
    gk_real delta, z, ln_phi;
} hz_rootrec;

/* The integer powers of tau the exponents use (the integer parts of t_k: 0, 1, 2, 3, 4, 6, 12,
   14) and, per term, the slot of its power in that list. */
#  define HZ_TAU_POWERS 8
static const unsigned char hz_tslot[2][GK__SW_TERMS] = {
    { 0, 1, 1, 1, 0, 0, 0, 1, 3, 3, 7, 6 }, /* nonpolar: 0 1 1 1 0 0 0 1 3 3 14 12 */
    { 0, 1, 1, 0, 0, 2, 2, 2, 3, 5, 4, 6 }  /* polar: 0 1 1 0 0 2 2 2 3 6 4 12 */
};

/* Adds x n_k tau^t_k of a row into its groups; t_k in eighths = an integer power tp[slot] times
   fr[j] = tau^(j/8). A row that is NULL adds nothing (cannot happen for a model built by
   gk__sw_model_*()). */
static void hz_add_row(gk_real *g, const gk__sw_fluid *fl, gk_real x, const gk_real *tp,
                       const gk_real *fr) {
    int k;
    if (fl == NULL) { return; }
    for (k = 0; k < GK__SW_TERMS; ++k) {
        unsigned f = (unsigned)fl->form;
        g[hz_group[f][k]] += (x * fl->n[k]) * (tp[hz_tslot[f][k]] * fr[hz_t8[f][k] & 7u]);
    }
}

/* The group coefficients at tau (see hz_group). One copy of the code, shared by
   gk__hz_prepare() and gk__hz_pressure() (firmware flash). */
static GK_NOINLINE void hz_tau_terms(const gk__hz_model *m, gk_real tau, gk_real *g) {
    gk_real fr[8], tp[HZ_TAU_POWERS];
    size_t i;
    int k;
    fr[0] = GK_LIT(1.0);
    fr[4] = gk_sqrt(tau);
    fr[2] = gk_sqrt(fr[4]);
    fr[1] = gk_sqrt(fr[2]);
    fr[3] = fr[2] * fr[1];
    fr[5] = fr[4] * fr[1];
    fr[6] = fr[4] * fr[2];
    fr[7] = fr[4] * fr[3];
    tp[0] = GK_LIT(1.0);
    tp[1] = tau;
    tp[2] = tau * tau;
    tp[3] = tp[2] * tau;
    tp[4] = tp[2] * tp[2];
    tp[5] = tp[3] * tp[3];
    tp[6] = tp[5] * tp[5];
    tp[7] = tp[6] * tp[2];
    for (k = 0; k < GK__HZ_GROUPS; ++k) { g[k] = GK_LIT(0.0); }
    if (m->fluid != NULL) {
        hz_add_row(g, m->fluid, GK_LIT(1.0), tp, fr);
    } else {
        for (i = 0; i < m->count; ++i) {
            if (m->x[i] > GK_LIT(0.0)) {
                hz_add_row(g, (m->rows != NULL) ? m->rows[i] : gk__sw_find(m->gas[i]), m->x[i], tp,
                           fr);
            }
        }
    }
}

/* Adds a polynomial term T = c delta^d: delta dT/ddelta = d T, delta^2 d2T/ddelta^2 = d(d-1) T. */
static inline void hz_poly(hz_sums *s, gk_real term, gk_real d) {
    s->a += term;
    s->s1 += d * term;
    s->s2 += d * (d - GK_LIT(1.0)) * term;
}

/* Adds T = c delta^d exp(-delta^l), dl = delta^l: g = d - l dl, delta dT/ddelta = g T,
   delta^2 d2T/ddelta^2 = (g (g - 1) - l^2 dl) T. */
static inline void hz_expo(hz_sums *s, gk_real term, gk_real d, gk_real l, gk_real dl) {
    gk_real g = d - l * dl;
    s->a += term;
    s->s1 += g * term;
    s->s2 += (g * (g - GK_LIT(1.0)) - l * l * dl) * term;
}

/* The sums of the 12 groups (see hz_group) at delta: alpha_r, delta alpha_r_delta and
   delta^2 alpha_r_delta_delta (inlined into hz_root(): firmware stack budget). */
static HZ_INLINE void hz_eval(const gk_real *g, gk_real delta, hz_sums *out) {
    /* the exponentials first: only delta is kept across the calls */
    const gk_real e1 = gk_exp(-delta), e2 = gk_exp(-(delta * delta));
    const gk_real e3 = gk_exp(-(delta * delta * delta));
    const gk_real d2 = delta * delta, d3 = d2 * delta, d4 = d2 * d2, d5 = d4 * delta;
    const gk_real d7 = d4 * d3;
    hz_sums s = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
    hz_poly(&s, g[0] * delta, GK_LIT(1.0));
    hz_poly(&s, g[1] * d2, GK_LIT(2.0));
    hz_poly(&s, g[2] * d3, GK_LIT(3.0));
    hz_poly(&s, g[3] * d7, GK_LIT(7.0));
    hz_expo(&s, g[4] * delta * e1, GK_LIT(1.0), GK_LIT(1.0), delta);
    hz_expo(&s, g[5] * d2 * e1, GK_LIT(2.0), GK_LIT(1.0), delta);
    hz_expo(&s, g[6] * d5 * e1, GK_LIT(5.0), GK_LIT(1.0), delta);
    hz_expo(&s, g[7] * delta * e2, GK_LIT(1.0), GK_LIT(2.0), d2);
    hz_expo(&s, g[8] * d4 * e2, GK_LIT(4.0), GK_LIT(2.0), d2);
    hz_expo(&s, g[9] * d2 * e3, GK_LIT(2.0), GK_LIT(3.0), d3);
    hz_expo(&s, g[10] * d3 * e3, GK_LIT(3.0), GK_LIT(3.0), d3);
    hz_expo(&s, g[11] * d4 * e3, GK_LIT(4.0), GK_LIT(3.0), d3);
    *out = s;
}

/* Z and ln phi of a root delta with its sums. Z = Pi / delta (exact at the root, so a liquid's
   small Z keeps its relative precision, where 1 + S1 would cancel); ln phi = alpha_r + x - ln Z
   with x = S1 = Z - 1 where |x| < 1/2 (a gas), else Pi/delta - 1: an absolute error of a few
   eps, so phi is good to a few eps relative. */
static void hz_z_lnphi(gk_real pi, gk_real delta, const hz_sums *s, hz_rootrec *out) {
    gk_real zz = pi / delta;
    gk_real x = (gk_fabs(s->s1) < GK_LIT(0.5)) ? s->s1 : zz - GK_LIT(1.0);
    out->delta = delta;
    out->z = zz;
    out->ln_phi = (s->a + x) - gk_log(zz);
}

/* ---------------------------------------------------------------- density root */

/* Does a come before b on the way the root is approached (upwards for dir > 0, downwards for
   dir < 0)? False for a NaN. */
static inline bool hz_before(int dir, gk_real a, gk_real b) { return (dir > 0) ? a < b : a > b; }

/* The step from x with f' > 0 and the Newton step dn = -f/f': dn (1 - c), c = dn f''/(2 f'),
   with f'' estimated from the previous point (x0, f'0) as (f' - f'0)/(x - x0) (Chebyshev's
   correction with a secant second derivative: order about 2.4 instead of Newton's 2, at no
   extra evaluation); dn itself without a previous point, or where |c| > 1/2 (far from the
   root, where the estimate means little). */
static gk_real hz_step(gk_real x, gk_real fp, gk_real dn, gk_real x0, gk_real fp0) {
    gk_real c;
    if (!(fp > GK_LIT(0.0)) || !(x0 > GK_LIT(0.0)) || !(gk_fabs(x - x0) > GK_LIT(0.0))) {
        return dn;
    }
    c = dn * (fp - fp0) / (GK_LIT(2.0) * fp * (x - x0));
    return (gk_fabs(c) <= GK_LIT(0.5)) ? dn * (GK_LIT(1.0) - c) : dn;
}

/* One density root by safeguarded Newton (see the top of the file). dir = +1: the vapour-like
   root, approached from below; dir = -1: the liquid-like root, approached from above.
   Returns 1 with the root, 0 when the branch has no root, -1 when the iteration cap is reached. */
static int hz_root(const gk__hz_prepared *pr, int dir, bool split, gk_real start, hz_rootrec *out) {
    gk_real near_end = (dir > 0) ? GK_LIT(0.0) : GK__HZ_DELTA_MAX;
    gk_real far_end = split ? GK_LIT(1.0) : (dir > 0) ? GK__HZ_DELTA_MAX : GK_LIT(0.0);
    gk_real x = start, best_x = start, best_f = GK_REAL_MAX, slope_near = GK_LIT(1.0);
    gk_real prev_x = GK_LIT(0.0), prev_fp = GK_LIT(0.0); /* none yet */
    hz_sums s;
    bool stepped = false, far_seen = (dir < 0 && !split), settle = false;
    int it;
    for (it = 0; it < GK__HZ_ITER_MAX; ++it) {
        gk_real f, fp, dx, xn;
        hz_eval(pr->g, x, &s);
        if (settle) { break; } /* the sums at the best point, after a stall */
        f = x * (GK_LIT(1.0) + s.s1) - pr->pi;
        fp = GK_LIT(1.0) + GK_LIT(2.0) * s.s1 + s.s2;
        if (hz_before(dir, f, GK_LIT(0.0))) {
            /* on the approach side the branch rises (f' > 0) and, for the vapour below
               HZ_SPLIT_TR, bends down (f' falls as delta grows: f' <= 1 = f'(0)) */
            if (!(fp > GK_LIT(0.0)) || (split && dir > 0 && fp > slope_near)) {
                if (stepped) { return 0; }        /* past this branch's spinodal: no root */
                x = GK_LIT(0.5) * (x + near_end); /* a start beyond it: move back */
                continue;
            }
            near_end = x;
            slope_near = fp;
        } else {
            far_end = x;
            far_seen = true;
        }
        if (gk_fabs(f) < best_f) {
            best_f = gk_fabs(f);
            best_x = x;
        } else if (stepped && gk_fabs(x - best_x) <= HZ_STALL_TOL * GK_REAL_EPS * x) {
            x = best_x; /* rounding level: back to the best point (evaluated once more) */
            settle = true;
            continue;
        } else {
            /* no better than the best point yet, not stalled: go on */
        }
        dx = (fp > GK_LIT(0.0)) ? -f / fp : GK_LIT(0.0);
        if (fp > GK_LIT(0.0) && gk_fabs(dx) <= HZ_QUAD_TOL * x) {
            /* Newton converges quadratically here: after this step the error is about
               (f''/(2 f')) dx^2, below eps; take the step and move the sums to first order
               (d(alpha_r) = S1 dx/delta, d(S1) = (S1 + S2) dx/delta) without evaluating again */
            gk_real r = dx / x;
            x += dx;
            s.a += s.s1 * r;
            s.s1 += (s.s1 + s.s2) * r;
            break;
        }
        xn = x + hz_step(x, fp, dx, prev_x, prev_fp);
        prev_x = x;
        prev_fp = fp;
        if (!far_seen && fp > GK_LIT(0.0) && !hz_before(dir, xn, far_end)) {
            /* a Newton step from the approach side beyond the limit: the branch bends away
               before any root (no root below delta = 1 for the vapour, above it for the
               liquid), or, without the split, a step beyond the densest state: halve it */
            if (split) { return 0; }
            xn = GK_LIT(0.5) * (x + far_end);
        } else if (!(fp > GK_LIT(0.0)) || !hz_before(dir, near_end, xn) ||
                   !hz_before(dir, xn, far_end)) {
            xn = GK_LIT(0.5) * (near_end + far_end); /* bisection of the bracket */
        } else {
            /* the Newton step stays inside the bracket */
        }
        x = xn;
        stepped = true;
    }
    if (it == GK__HZ_ITER_MAX) { return -1; }
    /* dp/drho > 0 at the accepted root: mechanically stable, no spurious root */
    if (!(GK_LIT(1.0) + GK_LIT(2.0) * s.s1 + s.s2 > GK_LIT(0.0)) || !(x > GK_LIT(0.0))) {
        return 0;
    }
    hz_z_lnphi(pr->pi, x, &s, out);
    return 1;
}

/* ---------------------------------------------------------------- solve and pressure */

static bool hz_root_valid(gk_root root) {
    return root == GK_ROOT_STABLE || root == GK_ROOT_GAS || root == GK_ROOT_LIQUID;
}

/* Checks p (or 0 for none), T against the model; GK_OK or the status. */
static gk_status hz_check(const gk__hz_model *m, gk_real p, gk_real t) {
    if (!gk_positive(t) || !gk_finite(p) || p < GK_LIT(0.0)) { return GK_ERR_DOMAIN; }
    if (t < m->t_min || t > m->t_max || p > m->p_max) { return GK_ERR_RANGE; }
    return GK_OK;
}

/* Guggenheim's saturated-liquid reduced density, times 1.05: the start of the liquid-like root. */
static gk_real hz_liquid_start(gk_real tr) {
    gk_real w = (tr < GK_LIT(1.0)) ? GK_LIT(1.0) - tr : GK_LIT(0.0);
    gk_real d = GK_LIT(1.05) * (GK_LIT(1.0) + GK_LIT(0.75) * w + GK_LIT(1.75) * gk_cbrt(w));
    return (d < GK__HZ_DELTA_MAX) ? d : GK_LIT(0.5) * (GK_LIT(1.0) + GK__HZ_DELTA_MAX);
}

/* Vapour-like start from the virial series Z = 1 + B delta + C delta^2 + D delta^3, whose reduced
   coefficients at delta -> 0 follow from the groups by expanding exp(-delta^l): B = the sum of the
   d = 1 groups (1,0) (1,1) (1,2); C = 2 ((2,0) + (2,1) + (2,3) - (1,1)); D = 3 ((3,0) + (3,3) +
   (1,1)/2 - (2,1) - (1,2)). delta0 = 2 Pi / (1 + sqrt(1 + 4 B Pi)) solves the second-order
   series; HZ_START_STEPS Newton steps on delta (1 + B delta + C delta^2 + D delta^3) = Pi add the
   higher terms (kept only while they stay positive and the series rises). Where the
   second-order series has no root (Pi above its peak -1/(4 B), B < 0), the density of that peak,
   -1/(2 B): near the end of the vapour branch, where a search without a root ends soonest. Out
   of line: its temporaries stay out of the frame under the Newton loop (firmware stack). */
static GK_NOINLINE gk_real hz_gas_start(const gk__hz_prepared *pr, gk_real limit) {
    const gk_real *g = pr->g;
    const gk_real b = g[0] + g[4] + g[7];
    const gk_real c = GK_LIT(2.0) * (((g[1] + g[5]) + g[9]) - g[4]);
    const gk_real e = GK_LIT(3.0) * (((g[2] + g[10]) + GK_LIT(0.5) * g[4]) - (g[5] + g[7]));
    const gk_real q = GK_LIT(1.0) + GK_LIT(4.0) * b * pr->pi;
    gk_real d;
    int i;
    if (q > GK_LIT(0.0)) {
        d = GK_LIT(2.0) * pr->pi / (GK_LIT(1.0) + gk_sqrt(q));
        for (i = 0; i < HZ_START_STEPS; ++i) {
            const gk_real fz = d * (GK_LIT(1.0) + d * (b + d * (c + d * e))) - pr->pi;
            const gk_real fd =
                GK_LIT(1.0) + d * (GK_LIT(2.0) * b + d * (GK_LIT(3.0) * c + GK_LIT(4.0) * d * e));
            const gk_real dn = d - fz / fd;
            if (!(fd > GK_LIT(0.0)) || !(dn > GK_LIT(0.0))) { break; }
            d = dn;
        }
    } else {
        d = GK_LIT(-0.5) / b; /* where the second-order series peaks (b < 0 here) */
    }
    return (d < GK_LIT(0.5) * limit) ? d : GK_LIT(0.5) * limit;
}

/* Writes the chosen root (index 0 = liquid-like, 1 = vapour-like) into *out; has_gas: rr[1]
   holds a root, n: the number of roots in rr. Out of line: its locals are not in the frame that
   lies under the root searches (firmware stack budget). */
static GK_NOINLINE gk_status hz_pick(const gk__hz_prepared *pr, const hz_rootrec rr[2],
                                     bool has_gas, int n, gk_root root, gk_eos_result *out) {
    int i = 0;
    gk_real phi, vm;
    gk_root branch;
    if (has_gas) { i = 1; /* the vapour-like root, or the only one */ }
    if ((n == 2) && (root == GK_ROOT_LIQUID)) {
        i = 0;
    } else if ((n == 2) && (root == GK_ROOT_STABLE)) {
        i = 1; /* a tie goes to the gas */
        if (rr[0].ln_phi < rr[1].ln_phi) { i = 0; }
    } else {
        /* one root, or the gas asked for: the vapour-like one when found */
    }
    if (n == 2) {
        branch = (i == 0) ? GK_ROOT_LIQUID : GK_ROOT_GAS;
    } else if (pr->tr > GK_LIT(1.0)) {
        branch = GK_ROOT_SUPERCRITICAL; /* a lone root above T_r, as the cubics label it */
    } else {
        branch = (rr[i].delta > GK_LIT(1.0)) ? GK_ROOT_LIQUID : GK_ROOT_GAS;
    }
    phi = gk_exp(rr[i].ln_phi);
    vm = GK_LIT(1.0) / (rr[i].delta * pr->rho_r);
    if (!gk_positive(rr[i].z) || !gk_positive(vm) || !gk_positive(phi)) { return GK_ERR_RANGE; }
    out->z = rr[i].z;
    out->molar_volume.m3_per_mol = vm;
    out->fugacity_coefficient = phi;
    out->root_count = n;
    out->z_roots[0] = (n == 2) ? rr[0].z : rr[i].z;
    out->z_roots[1] = (n == 2) ? rr[1].z : GK_LIT(0.0);
    out->z_roots[2] = GK_LIT(0.0);
    out->branch = branch;
    return GK_OK;
}

gk_status gk__hz_prepare(const gk__hz_model *m, gk_real p, gk_real t, gk__hz_prepared *out) {
    gk_status st;
    if (m == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(p)) { return GK_ERR_DOMAIN; }
    st = hz_check(m, p, t);
    if (st != GK_OK) { return st; }
    out->pi = p / (m->rho_r * GK_R * t);
    if (!gk_positive(out->pi)) { return GK_ERR_RANGE; }
    out->tr = t / m->t_r;
    out->tr_two_roots = (m->fluid != NULL) ? HZ_TWO_ROOT_PURE : HZ_TWO_ROOT_MIX;
    out->rho_r = m->rho_r;
    /* last: nothing computed here is kept across it (firmware stack) */
    hz_tau_terms(m, m->t_r / t, out->g);
    return GK_OK;
}

gk_status gk__hz_solve_prepared(const gk__hz_prepared *pr, gk_root root, gk_eos_result *out) {
    hz_rootrec rr[2] = { { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) },
                         { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) } };
    int liquid = 0, gas;
    bool split;
    if (pr == NULL || out == NULL || !hz_root_valid(root)) { return GK_ERR_ARGUMENT; }
    split = (pr->tr < HZ_SPLIT_TR);
    gas = hz_root(pr, 1, split, hz_gas_start(pr, split ? GK_LIT(1.0) : GK__HZ_DELTA_MAX), &rr[1]);
    if (pr->tr < pr->tr_two_roots) {
        liquid = hz_root(pr, -1, split, hz_liquid_start(pr->tr), &rr[0]);
    }
    if (liquid < 0 || gas < 0) { return GK_ERR_NO_SOLUTION; }
    if (liquid == 1 && gas == 1 &&
        gk_fabs(rr[0].delta - rr[1].delta) <= HZ_SAME_ROOT * rr[1].delta) {
        liquid = 0; /* one root, reached from both sides */
    }
    if (liquid == 1 && gas == 1 && rr[0].delta < rr[1].delta) { return GK_ERR_NO_SOLUTION; }
    if (liquid + gas == 0) { return GK_ERR_NO_SOLUTION; }
    return hz_pick(pr, rr, gas == 1, liquid + gas, root, out);
}

gk_status gk__hz_pressure(const gk__hz_model *m, gk_real rho, gk_real t, gk_real *out) {
    gk_real g[GK__HZ_GROUPS];
    hz_sums s;
    gk_real delta, p;
    gk_status st;
    if (m == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(rho)) { return GK_ERR_DOMAIN; }
    st = hz_check(m, GK_LIT(0.0), t);
    if (st != GK_OK) { return st; }
    delta = rho / m->rho_r;
    if (!(delta <= GK__HZ_DELTA_MAX)) { return GK_ERR_RANGE; }
    hz_tau_terms(m, m->t_r / t, g);
    hz_eval(g, delta, &s);
    p = rho * GK_R * t * (GK_LIT(1.0) + s.s1);
    if (!(p > GK_LIT(0.0))) { return GK_ERR_NO_SOLUTION; }
    if (!gk_finite(p) || p > m->p_max) { return GK_ERR_RANGE; }
    *out = p;
    return GK_OK;
}

#else
/* Built without the reference-grade models: an empty unit is not ISO C, so one declaration. */
typedef int gk__no_reference_models_hz;
#endif /* GK_REFERENCE_MODELS */
