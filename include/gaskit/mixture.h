/**
 * @file mixture.h
 * @brief Gas mixtures: composition text, molar mass and the cubic equations of state with the
 *        van der Waals one-fluid mixing rules.
 */
#ifndef GASKIT_MIXTURE_H
#define GASKIT_MIXTURE_H

#include "gaskit/eos.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup mixture Mixtures
 *  @{ */

/** Most components a gk_mixture holds. */
#define GK_MIXTURE_MAX 16

/** A mixture: component gases with their mole fractions. Plain data, kept on the stack. */
typedef struct gk_mixture {
    size_t count;                           /**< components in use, 1 ... GK_MIXTURE_MAX */
    const gk_gas *gas[GK_MIXTURE_MAX];      /**< component gases */
    gk_real mole_fraction[GK_MIXTURE_MAX];  /**< mole fractions, each in [0, 1], summing to 1 */
} gk_mixture;

/**
 * @brief Reads a composition such as "N2=0.7808, O2=0.2095, Ar=0.0097", "CO2=5%, N2=balance"
 *        or "CO=50ppm, air=balance".
 *
 * Components are separated by commas; each is a gas name or formula (as gk_gas_find()), '=',
 * and a fraction, a percentage ("5%") or parts per million ("50ppm", umol/mol). At most one
 * component may be "balance" (one minus the rest). Without "balance" the fractions must sum to
 * 1 within 1e-6. Spaces around tokens are ignored. Reads only up to the terminating NUL.
 * @retval GK_OK              @p out written.
 * @retval GK_ERR_ARGUMENT    An argument is NULL.
 * @retval GK_ERR_PARSE       Malformed text (missing '=', bad number, two balances, ...).
 * @retval GK_ERR_NOT_FOUND   A component names no known gas.
 * @retval GK_ERR_COMPOSITION A fraction outside [0, 1], a sum not 1 within 1e-6, a negative
 *                            balance, a gas listed twice, or more than GK_MIXTURE_MAX components.
 */
GK_API gk_status gk_mixture_parse(const char *text, gk_mixture *out);

/**
 * @brief Rescales the mole fractions to a sum of exactly 1 (to rounding).
 * @retval GK_OK              @p mix rescaled.
 * @retval GK_ERR_ARGUMENT    @p mix is NULL or has a NULL gas.
 * @retval GK_ERR_COMPOSITION count is 0 or above GK_MIXTURE_MAX, a fraction is negative or not
 *                            finite, or all are 0. @p mix is left unchanged.
 */
GK_API gk_status gk_mixture_normalize(gk_mixture *mix);

/**
 * @brief Mean molar mass of a mixture, sum of x_i M_i.
 * @retval GK_OK              @p out written.
 * @retval GK_ERR_ARGUMENT    An argument is NULL, or a component gas is NULL.
 * @retval GK_ERR_COMPOSITION The composition is not valid (see gk_mixture_parse()).
 * @retval GK_ERR_DOMAIN      A component's molar mass is not finite or not > 0.
 */
GK_API gk_status gk_mixture_molar_mass(const gk_mixture *mix, gk_molar_mass *out);

/**
 * @brief Solves a cubic equation of state for a mixture with the van der Waals one-fluid
 *        mixing rules: a = sum_i sum_j x_i x_j sqrt(a_i a_j)(1 - k_ij), b = sum_i x_i b_i.
 * @param eos Model.
 * @param mix Composition (valid as gk_mixture_parse() requires).
 * @param kij Binary interaction parameters, @p mix->count squared, row-major and symmetric
 *            with a zero diagonal; NULL for all zero.
 * @param p   Absolute pressure, > 0.
 * @param t   Temperature, > 0 K.
 * @param root Which root where there are three (see gk_root).
 * @param[out] out Z, molar volume and fugacity coefficient of the chosen root, and all roots.
 * @retval As gk_eos_solve(), and GK_ERR_COMPOSITION for an invalid composition, GK_ERR_DOMAIN
 *         for a k_ij that is not finite or not symmetric.
 */
GK_API gk_status gk_mixture_eos_solve(gk_eos eos, const gk_mixture *mix, const gk_real *kij,
                                      gk_pressure p, gk_temperature t, gk_root root,
                                      gk_eos_result *out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_MIXTURE_H */
