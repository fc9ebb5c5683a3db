/*
 * helmholtz.h - private interface of the reference-grade gas models (never installed):
 *
 *   1. the Span-Wagner technical equations of state (12-term residual Helmholtz energy, nonpolar
 *      and polar forms), R. Span, W. Wagner, Int. J. Thermophys. 24 (2003): I. functional forms,
 *      pp. 1-39; II. nonpolar fluids, pp. 41-109; III. polar fluids, pp. 111-162;
 *   2. mixtures of the fluids of 1. in the multi-fluid form of Lemmon and Jacobsen and of Kunz
 *      and Wagner (GERG-2004), WITHOUT fitted binary parameters or departure functions (an
 *      approximation: see below);
(the standardized hydrogen equation is hydrogen.h).
 *
 * The interface takes plain data: a coefficient row (gk__sw_fluid, found from a gk_gas by
 * gk__sw_find()), a model built from one row or from several rows and mole fractions
 * (gk__hz_model), SI values of p (Pa), T (K) and molar density (mol/m^3).
 *
 * Span-Wagner, with delta = rho / rho_r, tau = T_r / T (for a pure fluid the reducing values are
 * the critical point of the fluid's equation):
 *     alpha_r(delta, tau) = sum_k n_k delta^d_k tau^t_k [exp(-delta^l_k) for l_k > 0]
 *     Z = 1 + delta d(alpha_r)/d(delta),   ln phi = alpha_r + (Z - 1) - ln Z,
 *     p = rho R T Z.
 *
 * Mixtures (pseudo-pure): alpha_r = sum_i x_i alpha_r,i(delta, tau) with the mixture's reducing
 * values T_r = sum_ij x_i x_j sqrt(Tc_i Tc_j) = (sum_i x_i sqrt(Tc_i))^2 and
 * 1/rho_r = sum_ij x_i x_j (1/8)(v_i^(1/3) + v_j^(1/3))^3, v_i = 1/rho_c,i, which expands to
 * (S0 S3 + 3 S1 S2)/4 with S_k = sum_i x_i v_i^(k/3). As every component shares delta and tau,
 * the sum over components collapses into one set of coefficients per functional form,
 * N_k = sum_i x_i n_k,i: a mixture costs what a pure fluid costs. ln phi is that of the mixture
 * as a whole (sum_i x_i ln phi_i), as the cubic mixture path reports. Without the departure
 * functions and binary reducing parameters of GERG-2004 the result is an approximation. Measured:
 * dry air at 0 degC, 101.325 kPa within 0.005 % of the commonly quoted normal density
 * (tests/test_helmholtz.c); no published high-pressure mixture table was at hand to measure
 * more. The departure functions matter most for unlike molecules (CO2 with N2 or CH4,
 * hydrocarbons with N2) at high pressure, where errors of the order of a percent are to be
 * expected (an estimate, not a measurement). A mixture is never "reference grade".
 *
 * Root choice (as the cubic models, include/gaskit/eos.h): GK_ROOT_GAS is the vapour-like
 * (smallest-density, largest-Z) root, GK_ROOT_LIQUID the liquid-like (largest-density) root,
 * GK_ROOT_STABLE the one of those two with the lower fugacity (a tie goes to the gas). Roots are
 * mechanically stable (dp/drho > 0 checked at every accepted root). root_count is 1 or 2: the
 * mechanically unstable root(s) between a vapour-like and a liquid-like root are not located and
 * not reported (z_roots holds the liquid-like then the vapour-like Z, ascending, unused entries 0).
 * With one root, branch is GK_ROOT_SUPERCRITICAL above T_r, else GK_ROOT_LIQUID when delta > 1
 * (denser than the reducing density), else GK_ROOT_GAS.
 *
 * Status contract (every function; outputs written only on GK_OK, and then finite):
 *
 * | condition                                                         | status              |
 * |-------------------------------------------------------------------|---------------------|
 * | NULL pointer, root not a gk_root value                            | GK_ERR_ARGUMENT     |
 * | p, T or density not finite or not > 0; bad mole fractions         | GK_ERR_DOMAIN       |
 * | T outside [t_min, t_max] or p above p_max of the equation (table) | GK_ERR_RANGE        |
 * | density above GK__HZ_DELTA_MAX rho_r (beyond any fitted data)      | GK_ERR_RANGE        |
 * | a gas (or a mixture component) without coefficients               | GK_ERR_NOT_FOUND    |
 * | the density iteration did not converge within GK__HZ_ITER_MAX     | GK_ERR_NO_SOLUTION  |
 *
 * Validity ranges (the papers' stated ranges, from memory; a mixture takes the narrowest range of
 * its components: the largest t_min, the smallest t_max and p_max):
 *
 * | fluid   | form     | source             | t_min / K (triple point) | t_max / K | p_max / MPa |
 * |---------|----------|--------------------|--------------------------|-----------|-------------|
 * | N2      | nonpolar | SW 2003 Part II    | 63.151                   | 600       | 100         |
 * | O2      | nonpolar | SW 2003 Part II    | 54.361                   | 600       | 100         |
 * | Ar      | nonpolar | SW 2003 Part II    | 83.806                   | 600       | 100         |
 * | CH4     | nonpolar | SW 2003 Part II    | 90.6941                  | 600       | 100         |
 * | C2H6    | nonpolar | SW 2003 Part II    | 90.368                   | 600       | 100         |
 * | C3H8    | nonpolar | SW 2003 Part II    | 85.525                   | 600       | 100         |
 * | n-C4H10 | nonpolar | SW 2003 Part II    | 134.895                  | 600       | 100         |
 * | CO2     | polar    | SW 2003 Part III   | 216.592                  | 600       | 100         |
 * | H2      | explicit | Lemmon et al. 2008 | 200                      | 1000      | 200         |
 *
 * Stated uncertainty (Span and Wagner 2003, Part II abstract, from memory): density about 0.2 %
 * (often 0.1 %) in gas and supercritical states within that range; larger near the critical
 * point. Hydrogen equation: 0.01 % from 220 to 1000 K up to 70 MPa, 0.1 % from 200 K up to
 * 200 MPa (Lemmon et al. 2008, against the reference equation of Leachman et al. 2009).
 */
#ifndef GASKIT_HELMHOLTZ_H
#define GASKIT_HELMHOLTZ_H

#include <stdbool.h>
#include "gk_internal.h"

/* Most Newton steps of one density root (a root converges in 3-8 steps from the starts used;
   the bracket's bisection steps count too). */
#define GK__HZ_ITER_MAX 60

/* Largest reduced density delta accepted: above the densest fitted state of every covered fluid
   (liquids at the triple point and 100 MPa reach delta of about 3.3). */
#define GK__HZ_DELTA_MAX GK_LIT(4.5)

/* Terms of each Span-Wagner form (Part I). */
#define GK__SW_TERMS 12

/* Functional form of a Span-Wagner row (Part I): the exponents (d, t, l) differ. */
typedef enum gk__sw_form {
    GK__SW_NONPOLAR = 0,
    GK__SW_POLAR = 1
} gk__sw_form;

/* One fluid of the Span-Wagner equations: its coefficients, reducing values and validity. */
typedef struct gk__sw_fluid {
    const char *formula;     /* key: gk_gas formula, e.g. "N2" */
    gk__sw_form form;        /* nonpolar or polar exponents */
    gk_real t_c;             /* reducing temperature, K */
    gk_real rho_c;           /* reducing density, mol/m^3 */
    gk_real t_min, t_max;    /* validity, K */
    gk_real p_max;           /* validity, Pa */
    gk_real n[GK__SW_TERMS]; /* n_1 ... n_12 */
} gk__sw_fluid;

/* A Span-Wagner model, pure or mixed: reducing values, validity range, and where the
   coefficients are: one row (a pure fluid), or the caller's arrays of count gases and
   mole fractions (a mixture: they must stay valid while the model is used; rows are looked up
   again per solve). Small plain data (firmware stack), built by gk__sw_model_*(). */
typedef struct gk__hz_model {
    gk_real t_r;                     /* reducing temperature, K */
    gk_real rho_r;                   /* reducing density, mol/m^3 */
    gk_real t_min, t_max, p_max;     /* validity */
    const gk__sw_fluid *fluid;       /* the row of a pure fluid, else NULL */
    const gk_gas *const *gas;        /* a mixture's gases (count of them), or NULL */
    const gk__sw_fluid *const *rows; /* or a mixture's rows (dry air), else NULL */
    const gk_real *x;                /* a mixture's mole fractions */
    size_t count;
} gk__hz_model;

/* The coefficient row of a gas (matched by its formula, case-sensitive, as gk_gas_find()),
   or NULL when the gas is NULL or not covered (air has no row: see gk__sw_model_gas()). */
const gk__sw_fluid *gk__sw_find(const gk_gas *gas);

/* The model of a gas: its row, or for "air" (formula) the dry-air mixture of ISO 2533:1975
   (N2 0.78084, O2 0.209476, Ar 0.00934 by volume, normalised; the remaining 0.034 % of CO2, Ne,
   He, ... left out); GK_ERR_NOT_FOUND when neither applies. */
gk_status gk__sw_model_gas(const gk_gas *gas, gk__hz_model *out);

/* The model of a mixture of count gases (1 ... GK_MIXTURE_MAX) with mole fractions x (each in
   [0, 1], finite; their sum is not checked here: the caller validates the composition, the
   reducing functions use sum x_i as given). Components with x_i = 0 are ignored (they need no
   coefficients). GK_ERR_NOT_FOUND when a component with x_i > 0 has no row. The model keeps the
   pointers gas and x: both arrays must outlive it. */
gk_status gk__sw_model_mixture(const gk_gas *const *gas, const gk_real *x, size_t count,
                               gk__hz_model *out);

/* Groups of terms with equal density exponents (d, l) over both functional forms (helmholtz.c). */
#define GK__HZ_GROUPS 12

/* The part of a state (p, T) that does not depend on density: per group, the coefficient
   G = sum n_k tau^t_k (summed x_i-weighted over a mixture's components) at tau = T_r / T, the
   reduced pressure Pi = p / (rho_r R T), and the values the root choice needs. Built by
   gk__hz_prepare(); the model is not needed afterwards. */
typedef struct gk__hz_prepared {
    gk_real g[GK__HZ_GROUPS];
    gk_real pi;           /* p / (rho_r R T) */
    gk_real tr;           /* T / T_r */
    gk_real tr_two_roots; /* below this T / T_r both roots are sought */
    gk_real rho_r;        /* reducing density, mol/m^3 */
} gk__hz_prepared;

/* Checks p (Pa) and T (K) against the model and fills *out (only on GK_OK): GK_ERR_ARGUMENT
   for a NULL pointer, GK_ERR_DOMAIN for p or T not finite and > 0, GK_ERR_RANGE outside the
   model's validity or for a reduced pressure that underflows. */
gk_status gk__hz_prepare(const gk__hz_model *m, gk_real p, gk_real t, gk__hz_prepared *out);

/* The state of a prepared (p, T) with the root choice above, in the result form of the cubics:
   every field of *out but model (left to the caller) is written, on GK_OK only. A lone root
   above T_r is labelled GK_ROOT_SUPERCRITICAL. */
gk_status gk__hz_solve_prepared(const gk__hz_prepared *pr, gk_root root, gk_eos_result *out);

/* Pressure (Pa) at molar density rho (mol/m^3) and T (K): p = rho R T (1 + delta dalpha_r/ddelta).
   GK_ERR_RANGE also when the pressure is above p_max; GK_ERR_NO_SOLUTION when it is not > 0
   (a metastable or unstable state of the equation with negative pressure), as the cubic models. */
gk_status gk__hz_pressure(const gk__hz_model *m, gk_real rho, gk_real t, gk_real *out);

#endif /* GASKIT_HELMHOLTZ_H */
