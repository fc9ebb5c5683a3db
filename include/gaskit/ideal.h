/**
 * @file ideal.h
 * @brief The ideal gas law, changes of state, and Dalton's law of partial pressures.
 *
 * Model: p V = n R T with R = GK_R (CODATA 2018). Valid for gases well above their critical
 * temperature at low pressure; the error grows with p / p_c and with T_c / T (about 1 % for
 * nitrogen at 20 degC and 20 bar, tens of percent in cylinders at 200 bar). Use gk_eos_solve()
 * where that matters.
 */
#ifndef GASKIT_IDEAL_H
#define GASKIT_IDEAL_H

#include "gaskit/units.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup ideal Ideal gas and changes of state
 *  Every function here returns GK_ERR_ARGUMENT for a NULL output, GK_ERR_DOMAIN for an input
 *  that is not finite or not > 0, and GK_ERR_RANGE where the result would overflow or fall
 *  below the smallest normal number (a subnormal or zero result of positive inputs); outputs
 *  are written only on GK_OK. Intermediate products never overflow on their own: a result
 *  that is representable is returned (n = 1e200 mol, T = 1e200 K, V = 1e300 m3 is fine).
 *  All quantities in SI (Pa, m3, K, mol, kg/mol, kg/m3).
 *  @{ */

/**
 * @brief Pressure of an ideal gas: p = n R T / V.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_pressure(gk_amount n, gk_temperature t, gk_volume v, gk_pressure *out);

/**
 * @brief Volume of an ideal gas: V = n R T / p.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_volume(gk_amount n, gk_temperature t, gk_pressure p, gk_volume *out);

/**
 * @brief Amount of an ideal gas: n = p V / (R T).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_amount(gk_pressure p, gk_volume v, gk_temperature t, gk_amount *out);

/**
 * @brief Temperature of an ideal gas: T = p V / (n R).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_temperature(gk_pressure p, gk_volume v, gk_amount n, gk_temperature *out);

/**
 * @brief Molar volume of an ideal gas: Vm = R T / p (22.413969... L/mol at 0 degC, 101.325 kPa).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_molar_volume(gk_pressure p, gk_temperature t, gk_molar_volume *out);

/**
 * @brief Density of an ideal gas: rho = p M / (R T).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_density(gk_pressure p, gk_temperature t, gk_molar_mass m,
                                  gk_density *out);

/**
 * @brief Molar mass from a measured density (gas-density balance, Dumas bulb): M = rho R T / p.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_ideal_molar_mass(gk_density rho, gk_pressure p, gk_temperature t,
                                     gk_molar_mass *out);

/** A state of a closed or open amount of ideal gas. */
typedef struct gk_state {
    gk_pressure p;    /**< absolute pressure */
    gk_volume v;      /**< volume */
    gk_temperature t; /**< temperature */
    gk_amount n;      /**< amount */
} gk_state;

/** Which field of a gk_state is unknown. */
typedef enum gk_variable {
    GK_VAR_PRESSURE,
    GK_VAR_VOLUME,
    GK_VAR_TEMPERATURE,
    GK_VAR_AMOUNT
} gk_variable;

/**
 * @brief Change of state of an ideal gas: p1 V1 / (n1 T1) = p2 V2 / (n2 T2).
 *
 * Fills `after->` the field named by @p unknown from all four fields of @p before and the
 * other three fields of @p after; that field's old value is ignored. Holding fields equal
 * gives Boyle's law (constant n, T), Charles's law (constant n, p), Gay-Lussac's law
 * (constant n, V) and Avogadro's law (constant p, T).
 * The result is computed as a product of ratios of like quantities (V1/V2, n2/n1, ...), so a
 * field held equal contributes exactly 1.
 * @param before The known first state (all four fields > 0 and finite).
 * @param[in,out] after The second state; three fields are read (each > 0 and finite), the
 *        unknown one written (its old value may be anything, NaN included).
 * @param unknown Which field of @p after to compute.
 * @retval GK_OK           The unknown field of @p after written, nothing else changed.
 * @retval GK_ERR_ARGUMENT @p before or @p after is NULL, or @p unknown is out of range.
 * @retval GK_ERR_DOMAIN   A field read is not finite or not > 0.
 * @retval GK_ERR_RANGE    The result overflows or underflows to 0.
 */
GK_API gk_status gk_state_change(const gk_state *before, gk_state *after, gk_variable unknown);

/**
 * @brief Dalton's law: partial pressure p_i = x_i p of a component of an ideal mixture.
 * @param total Total absolute pressure, > 0.
 * @param mole_fraction x_i in [0, 1].
 * @param[out] out Partial pressure (0 Pa for a fraction of 0).
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL.
 * @retval GK_ERR_DOMAIN   An input is not finite, @p total is not > 0, or the fraction is
 *                         outside [0, 1].
 * @retval GK_ERR_RANGE    A fraction > 0 gives a partial pressure below the smallest normal
 *                         number (underflow).
 */
GK_API gk_status gk_partial_pressure(gk_pressure total, gk_real mole_fraction, gk_pressure *out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_IDEAL_H */
