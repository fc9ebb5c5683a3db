/**
 * @file eos.h
 * @brief Van der Waals and the cubic equations of state (Redlich-Kwong, Soave-Redlich-Kwong,
 *        Peng-Robinson), the reference-grade Span-Wagner and hydrogen equations, with the choice
 *        of the physical root.
 *
 * The reference-grade models (GK_EOS_SPAN_WAGNER, GK_EOS_HYDROGEN, and GK_EOS_BEST, which picks the
 * best model for the fluid) cover a few gases with a stated uncertainty of about 0.2 % in gas
 * density or better; see gk_eos. The cubic models cover every gas with data (and liquids,
 * qualitatively).
 *
 * Each cubic equation of state is written as a cubic in the compressibility factor Z = p Vm / (R T).
 * Below the critical temperature it can have three real roots above the covolume B: the
 * largest is the gas-like, the smallest the liquid-like root. The root choice is explicit
 * (gk_root). Validity: the cubic models describe gases and their vapour-liquid behaviour
 * qualitatively; their density error is typically a few percent for simple gases and worse for
 * polar gases (water, ammonia) and for liquids (Peng-Robinson liquid densities may be 5-15 % off).
 */
#ifndef GASKIT_EOS_H
#define GASKIT_EOS_H

#include "gaskit/gas.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup eos Van der Waals and cubic equations of state
 *  Every function here returns GK_ERR_ARGUMENT for a NULL pointer or an enum value out of
 *  range, GK_ERR_DOMAIN for an input that is not finite or outside its physical domain
 *  (p, T, n, V, Vm not > 0; gas data or van der Waals constants that are not physical), and
 *  GK_ERR_RANGE where a result overflows or underflows; outputs are written only on GK_OK.
 *  Below, each function lists what it adds to that.
 *  @{ */

/** Van der Waals constants. */
typedef struct gk_vdw {
    gk_real a; /**< attraction, Pa m^6 mol^-2 */
    gk_real b; /**< covolume, m^3 mol^-1 */
} gk_vdw;

/**
 * Which root of a cubic equation of state to return (an input: the first three values), and
 * which branch a result lies on (gk_eos_result.branch: GAS, LIQUID or SUPERCRITICAL).
 */
typedef enum gk_root {
    GK_ROOT_STABLE, /**< the root with the lower fugacity (lower Gibbs energy) */
    GK_ROOT_GAS,    /**< the largest real root above the covolume */
    GK_ROOT_LIQUID, /**< the smallest real root above the covolume */
    /** Output only: a lone root above the model's critical temperature (for a mixture, its
     *  pseudo-critical temperature sum x_i Tc_i), neither gas nor liquid. As an input it is
     *  GK_ERR_ARGUMENT. */
    GK_ROOT_SUPERCRITICAL
} gk_root;

/**
 * @brief Van der Waals constants from the critical point: a = 27 R^2 Tc^2 / (64 Pc),
 *        b = R Tc / (8 Pc).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_vdw_from_critical(gk_temperature tc, gk_pressure pc, gk_vdw *out);

/**
 * @brief Van der Waals pressure p = n R T / (V - n b) - a n^2 / V^2.
 * @retval GK_ERR_DOMAIN   Also for a or b < 0, or V <= n b.
 * @retval GK_ERR_NO_SOLUTION The pressure would not be > 0 (a metastable or unstable state
 *                            of the model with negative pressure).
 * @retval Others          See the group.
 */
GK_API gk_status gk_vdw_pressure(gk_vdw c, gk_amount n, gk_volume v, gk_temperature t,
                                 gk_pressure *out);

/**
 * @brief Van der Waals temperature T = (p + a n^2 / V^2)(V - n b) / (n R).
 * @retval GK_ERR_DOMAIN   Also for a or b < 0, or V <= n b.
 * @retval Others          See the group.
 */
GK_API gk_status gk_vdw_temperature(gk_vdw c, gk_amount n, gk_volume v, gk_pressure p,
                                    gk_temperature *out);

/**
 * @brief Van der Waals volume: the chosen real root V > n b of the cubic in V.
 * @param c    Van der Waals constants (a >= 0, b >= 0).
 * @param n    Amount of gas, > 0.
 * @param p    Absolute pressure, > 0.
 * @param t    Temperature, > 0 K.
 * @param root Which root where there are three (see gk_root).
 * @param[out] out The volume V of the chosen root, m^3.
 * @retval GK_ERR_ARGUMENT Also for @p root GK_ROOT_SUPERCRITICAL (an output label only).
 * @retval GK_ERR_NO_SOLUTION No real root above the covolume.
 * @retval Others          See the group.
 */
GK_API gk_status gk_vdw_volume(gk_vdw c, gk_amount n, gk_pressure p, gk_temperature t, gk_root root,
                               gk_volume *out);

/** The equation-of-state models. */
typedef enum gk_eos {
    GK_EOS_IDEAL,               /**< p Vm = R T (Z = 1) */
    GK_EOS_VAN_DER_WAALS,       /**< van der Waals (1873); handbook a, b where the gas lists them */
    GK_EOS_REDLICH_KWONG,       /**< Redlich and Kwong (1949) */
    GK_EOS_SOAVE_REDLICH_KWONG, /**< Soave (1972) */
    GK_EOS_PENG_ROBINSON,       /**< Peng and Robinson (1976) */
    /**
     * The Span-Wagner technical equations of state, R. Span and W. Wagner, Int. J. Thermophys.
     * 24 (2003) 1-162 (12-term residual Helmholtz energy): nitrogen, oxygen, argon, methane,
     * ethane, propane, n-butane (nonpolar form) and carbon dioxide (polar form); air (the gas
     * "air") as the dry-air mixture of ISO 2533:1975 (N2, O2, Ar); mixtures whose components
     * are all covered, in the multi-fluid form without departure functions (an approximation:
     * dry air within 0.005 % of its normal density, other mixtures of unlike molecules
     * unmeasured, of the order of a percent at high pressure). Validity: from each fluid's
     * triple point (mixtures: the highest of the components') to 600 K, up to 100 MPa; outside,
     * GK_ERR_RANGE. Stated uncertainty in density (the authors): about 0.2 % (often 0.1 %) in
     * gas and supercritical states, more near the critical point. A gas or a mixture without
     * coefficients: GK_ERR_NOT_FOUND. k_ij are checked but not used. Root choice as for the
     * cubics; root_count is 1 or 2 (the unstable root between a vapour-like and a liquid-like
     * root is not reported).
     */
    GK_EOS_SPAN_WAGNER,
    /**
     * The most accurate model the library has for the fluid: GK_EOS_SPAN_WAGNER where it covers
     * the gas (air included) or every component of the mixture, GK_EOS_HYDROGEN for hydrogen,
     * GK_EOS_PENG_ROBINSON otherwise (with its data checks and statuses). The model that served
     * is reported in gk_eos_result.model.
     */
    GK_EOS_BEST,
    /**
     * The standardized hydrogen density equation of E. W. Lemmon, M. L. Huber and J. W.
     * Leachman, J. Res. Natl. Inst. Stand. Technol. 113 (2008) 341-350 (explicit in p and T),
     * normal hydrogen (the gas "H2") only; other gases and mixtures: GK_ERR_NOT_FOUND.
     * Validity: 200 K to 1000 K, up to 200 MPa (outside: GK_ERR_RANGE); stated agreement with
     * the reference equation 0.01 % up to 70 MPa above 220 K, 0.1 % up to 200 MPa.
     */
    GK_EOS_HYDROGEN
} gk_eos;

/**
 * Result of solving an equation of state at given p, T.
 *
 * Accuracy (double build, measured against 50-digit mpmath references over
 * 0.3 <= Tr <= 5, 0.001 <= Pr <= 20): relative error of each root below 1e-13 away from the
 * critical point; near a double root (a spinodal) about sqrt(u), at the triple root of the
 * critical point about cbrt(u) = 5e-6. Float build: about 1e-6 (tolerance 2e-5).
 * See docs/cubic-solver.md.
 */
typedef struct gk_eos_result {
    gk_real z;                    /**< compressibility factor of the returned root */
    gk_molar_volume molar_volume; /**< molar volume of the returned root, Z R T / p */
    /** fugacity coefficient phi of the returned root (1 for the ideal gas; for a mixture, that of
     * the mixture as a pseudo-pure fluid)
     */
    gk_real fugacity_coefficient;
    /** distinct real roots above the covolume, as decided in working precision: 1 or 3, 2 when a
     * double root is detected exactly; 1 at a triple root and for the ideal gas
     */
    int root_count;
    gk_real z_roots[3]; /**< those roots of Z, ascending; unused entries 0 */
    /** The branch returned: GK_ROOT_GAS or GK_ROOT_LIQUID for the root chosen among two or
     * three. A lone root is GK_ROOT_SUPERCRITICAL at T above the model's critical temperature
     * (for a mixture the pseudo-critical sum x_i Tc_i; Tc = 8 a / (27 R b) for van der Waals
     * with the gas's handbook a, b), else GK_ROOT_LIQUID when it is denser than the model's
     * critical density (Z/B < Zc/Omega_b), else GK_ROOT_GAS. The ideal gas: GK_ROOT_GAS.
     */
    gk_root branch;
    /** The model that served: the one asked for, or with GK_EOS_BEST the one it chose. */
    gk_eos model;
} gk_eos_result;

/**
 * @brief Solves an equation of state for the molar volume at pressure @p p and temperature @p t.
 *
 * Writes the model as a cubic in Z = p Vm / (R T) with A = a(T) p / (R T)^2, B = b p / (R T)
 * (computed from Tr = T/Tc, Pr = p/Pc) and finds every real root above the covolume B with a
 * private solver (root isolation and Halley's iteration; no closed form, so the small liquid root
 * keeps full precision). Constants: van der Waals a = 27 R^2 Tc^2/(64 Pc), b = R Tc/(8 Pc) (or the
 * gas's handbook vdw_a, vdw_b where non-zero); Redlich-Kwong (1949) 0.42748, 0.08664 with
 * a/sqrt(T); Soave (1972) with m = 0.480 + 1.574 w - 0.176 w^2; Peng-Robinson (1976) 0.45724,
 * 0.07780, kappa = 0.37464 + 1.54226 w - 0.26992 w^2. GK_EOS_IDEAL gives Z = 1.
 *
 * Root choice: GK_ROOT_GAS is the largest real root above the covolume, GK_ROOT_LIQUID the
 * smallest, GK_ROOT_STABLE the one of those two with the lower fugacity (a tie goes to the gas).
 * With one real root every choice returns it and root_count is 1.
 *
 * GK_EOS_SPAN_WAGNER solves p = rho R T (1 + delta d(alpha_r)/d(delta)) for the density by a
 * safeguarded Newton iteration (vapour-like root from below, liquid-like root from above; below
 * the critical temperature both, chosen as above; only roots with dp/drho > 0). Its validity and
 * uncertainty: see gk_eos. GK_EOS_HYDROGEN is explicit (one root). GK_EOS_BEST: see gk_eos;
 * out->model says which model served.
 * Validity: see the file comment; the models, not the numerics, limit the range.
 * @param eos Model.
 * @param gas Gas data (Tc, Pc, acentric factor; vdw_a, vdw_b for van der Waals where non-zero).
 * @param p   Absolute pressure, > 0.
 * @param t   Temperature, > 0 K.
 * @param root Which root where there are three (see gk_root).
 * @param[out] out Z, molar volume and fugacity coefficient of the chosen root, and all roots.
 * Statuses: the gas and model are checked before the state (p, T, root).
 * @retval GK_ERR_ARGUMENT Also for @p root GK_ROOT_SUPERCRITICAL (an output label only).
 * @retval GK_ERR_RANGE    Also where the root lies within rounding of the covolume and cannot
 *                         be told from it (e.g. phi of a liquid root at an absurdly low
 *                         temperature overflows or underflows), and for a state outside the
 *                         validity range of GK_EOS_SPAN_WAGNER or GK_EOS_HYDROGEN.
 * @retval GK_ERR_NOT_FOUND GK_EOS_SPAN_WAGNER or GK_EOS_HYDROGEN for a gas they do not cover.
 * @retval GK_ERR_NO_SOLUTION The density iteration of GK_EOS_SPAN_WAGNER did not converge
 *                         (not seen in the tests' scans of every covered fluid's range).
 * @retval Others          See the group.
 */
GK_API gk_status gk_eos_solve(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t,
                              gk_root root, gk_eos_result *out);

/**
 * @brief Pressure from an equation of state at molar volume @p vm and temperature @p t:
 *        p = R T / (Vm - b) - a(T) / (Vm^2 + u b Vm + w b^2) with the constants of
 *        gk_eos_solve() ((u, w) = (0, 0) vdW, (1, 0) RK and SRK, (2, -1) PR); R T / Vm for the
 *        ideal gas. GK_EOS_SPAN_WAGNER: p = rho R T (1 + delta d(alpha_r)/d(delta)), rho = 1/Vm;
 *        GK_EOS_HYDROGEN: the p whose density is 1/Vm (Newton's iteration on the explicit
 *        equation); both GK_ERR_RANGE outside their validity range (also a resulting p above it,
 *        or a density above 4.5 times the critical density for Span-Wagner).
 * @retval GK_ERR_DOMAIN   Also for Vm at or below the covolume.
 * @retval GK_ERR_NO_SOLUTION The model gives a pressure that is not > 0.
 * @retval Others          See the group.
 */
GK_API gk_status gk_eos_pressure(gk_eos eos, const gk_gas *gas, gk_molar_volume vm,
                                 gk_temperature t, gk_pressure *out);

/**
 * @brief Mass density of the stable root: rho = M / Vm.
 * @retval GK_ERR_DOMAIN Also for a molar mass of the gas that is not finite or not > 0.
 * @retval Others        As gk_eos_solve().
 */
GK_API gk_status gk_eos_density(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t,
                                gk_density *out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_EOS_H */
