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
 *  Every function here returns GK_ERR_ARGUMENT for a NULL argument (or a NULL component gas
 *  among the first count) and writes its outputs only on GK_OK. A valid composition has count
 *  1 ... GK_MIXTURE_MAX, every fraction in [0, 1] and a sum of 1 within 1e-6 (compensated
 *  summation); otherwise GK_ERR_COMPOSITION. The same gas listed twice is accepted in a
 *  gk_mixture (gk_mixture_parse() rejects it in text).
 *  @{ */

/** Most components a gk_mixture holds. */
#define GK_MIXTURE_MAX 16

/** A mixture: component gases with their mole fractions. Plain data, kept on the stack. */
typedef struct gk_mixture {
    size_t count;                          /**< components in use, 1 ... GK_MIXTURE_MAX */
    const gk_gas *gas[GK_MIXTURE_MAX];     /**< component gases */
    gk_real mole_fraction[GK_MIXTURE_MAX]; /**< mole fractions, each in [0, 1], summing to 1 */
} gk_mixture;

/**
 * @brief Reads a composition such as "N2=0.7808, O2=0.2095, Ar=0.0097", "CO2=5%, N2=balance"
 *        or "CO=50ppm, air=balance".
 *
 * Syntax: components separated by commas; each is a gas name, alias or formula (as
 * gk_gas_find(): everything before '=' with the surrounding white space trimmed, so
 * "carbon dioxide" works), '=', and one of
 * - a fraction: [+|-] digits [. digits] [e|E [+|-] digits], or with the point first (".5");
 *   no hexadecimal, "inf" or "nan", no decimal comma; at most 40 mantissa digits;
 * - a percentage: a number and '%' ("5%", "5 %");
 * - parts per million (umol/mol): a number and "ppm" ("50ppm", "50 PPM");
 * - "balance" (any ASCII case): one minus the sum of the others. At most one per text.
 * White space (space, tab, CR, LF, VT, FF) around tokens is ignored. A comma inside a name is
 * allowed when the whole name is a gas ("1,1,1,2-tetrafluoroethane=0.1"); otherwise it is
 * taken as a misplaced separator and the text is malformed.
 *
 * Limits: the text may hold at most 1024 characters before the NUL; it is read only up to the
 * NUL and never beyond 1025 characters. At most GK_MIXTURE_MAX components.
 *
 * Numbers are read without strtod, stdio or locale. Accuracy: correctly rounded (exactly the
 * gk_real nearest the decimal value, percent or ppm included) for up to 15 significant digits
 * (float build: 7) and decimal exponents within +-22 (float build: +-10), which covers every
 * ordinary figure; otherwise within a few ulp. A value that underflows becomes 0.
 *
 * Fractions are stored as given (not rescaled). Without "balance" their sum must be 1 within
 * 1e-6. With "balance", the others may sum to at most 1 + 1e-6; a balance between -1e-6 and 0
 * (rounding) is stored as 0.
 *
 * The first error from left to right is reported; the sum checks come after the whole text.
 * @param text NUL-terminated composition text (untrusted input is fine).
 * @param[out] out The mixture, components in text order; written only on GK_OK.
 * @retval GK_ERR_PARSE       Malformed text: empty, a component without '=' or without a name
 *                            or value, a bad number or suffix, text after a value, a trailing
 *                            comma, two balances, more than 40 mantissa digits, more than 1024
 *                            characters.
 * @retval GK_ERR_NOT_FOUND   A component names no known gas.
 * @retval GK_ERR_COMPOSITION A fraction outside [0, 1] (including one too large for gk_real,
 *                            such as "1e999"), a sum not 1 within 1e-6, a negative balance, a
 *                            gas listed twice (by any of its keys), or more than
 *                            GK_MIXTURE_MAX components.
 */
GK_API gk_status gk_mixture_parse(const char *text, gk_mixture *out);

/**
 * @brief Rescales the mole fractions to a sum of exactly 1 (to rounding): x_i / sum x_j.
 *
 * The fractions may be any non-negative proportions (78, 21, 1 gives 0.78, 0.21, 0.01), even
 * ones whose sum would overflow. Each result is one correctly rounded division by the
 * (compensated) sum.
 * @param[in,out] mix The mixture; only count and the first count fractions are read, only
 *                the fractions are written, and only on GK_OK.
 * @retval GK_ERR_COMPOSITION count is 0 or above GK_MIXTURE_MAX, a fraction is negative or not
 *                            finite, or all are 0. @p mix is left unchanged.
 */
GK_API gk_status gk_mixture_normalize(gk_mixture *mix);

/**
 * @brief Mean molar mass of a mixture, sum of x_i M_i (compensated summation).
 *
 * Validates the composition first (see the group; use gk_mixture_normalize() for
 * proportions).
 * @param mix The mixture.
 * @param[out] out Mean molar mass.
 * @retval GK_ERR_DOMAIN      A component's molar mass is not finite or not > 0.
 * @retval GK_ERR_RANGE       The result underflows to 0 (absurdly small molar masses).
 */
GK_API gk_status gk_mixture_molar_mass(const gk_mixture *mix, gk_molar_mass *out);

/**
 * @brief Solves a cubic equation of state for a mixture with the van der Waals one-fluid
 *        mixing rules: a = sum_i sum_j x_i x_j sqrt(a_i a_j)(1 - k_ij), b = sum_i x_i b_i.
 *
 * Each component's a_i(T), b_i are those of gk_eos_solve() for the same model; the mixture is
 * then solved as a pseudo-pure fluid with the mixed a, b, so the result's fugacity_coefficient
 * is that of the mixture as a whole (ln phi = sum_i x_i ln phi_i), not of a component.
 * @param eos Model.
 * @param mix Composition (valid as gk_mixture_parse() requires).
 * @param kij Binary interaction parameters, @p mix->count squared, row-major and symmetric
 *            with a zero diagonal, each in [-1, 1]; NULL for all zero.
 * @param p   Absolute pressure, > 0.
 * @param t   Temperature, > 0 K.
 * @param root Which root where there are three (see gk_root).
 * @param[out] out Z, molar volume and fugacity coefficient of the chosen root, and all roots.
 * A lone root above the pseudo-critical temperature sum x_i Tc_i is labelled
 * GK_ROOT_SUPERCRITICAL. The mixture (composition, each component's data, k_ij) is checked
 * before the state (p, T, root).
 * @retval GK_ERR_DOMAIN Also for a component with non-physical data (molar mass, Tc, Pc,
 *         acentric factor) or a k_ij that is not finite, not symmetric, outside [-1, 1] or on
 *         a non-zero diagonal.
 * @retval Others As gk_eos_solve() and the group.
 */
GK_API gk_status gk_mixture_eos_solve(gk_eos eos, const gk_mixture *mix, const gk_real *kij,
                                      gk_pressure p, gk_temperature t, gk_root root,
                                      gk_eos_result *out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_MIXTURE_H */
