/**
 * @file instrument.h
 * @brief What instruments report: compressibility of a gas or mixture, flow at reference
 *        conditions, mass flow, vessel contents, leak rates, relative density and wet mixtures.
 *
 * Results are engineering estimates from the chosen model; they are not a substitute for
 * pressure-equipment codes, custody-transfer standards or gas suppliers' data (see the README's
 * safety section). Methods, validity ranges and measured model errors: docs/instruments.md.
 *
 * Liquid states. The functions that need a gas (all but gk_fluid_z() and gk_humid_mixture())
 * return GK_ERR_RANGE when the stable state of the model, at the line state or at the
 * reference condition, is liquid: the stable root of two or three is the liquid branch, or a
 * lone root below the critical temperature (for a mixture the pseudo-critical sum x_i Tc_i) is
 * denser than the model's critical point. At or above Tc nothing is liquid (dense gases are
 * computed). A two-phase mixture between its dew and bubble points is not detected. The ideal
 * gas has no liquid.
 */
#ifndef GASKIT_INSTRUMENT_H
#define GASKIT_INSTRUMENT_H

#include "gaskit/mixture.h"
#include "gaskit/reference.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup instrument Instrument calculations
 *  Every function here that takes a gk_fluid checks it first: GK_ERR_ARGUMENT for a NULL
 *  output, an @p eos out of range or not exactly one of gas and mixture, then the statuses of
 *  gk_mixture_eos_solve() for the composition, the gas data and k_ij. Then GK_ERR_DOMAIN for a
 *  reading or reference p, T that is not finite or not > 0, GK_ERR_RANGE for a liquid stable
 *  state (see the file comment) or a result that overflows or underflows, and otherwise the
 *  statuses of gk_eos_solve(). Outputs are written only on GK_OK.
 *  @{ */

/** What is in the vessel or the line: exactly one of gas and mixture is non-NULL. */
typedef struct gk_fluid {
    const gk_gas *gas;         /**< a pure gas, or NULL */
    const gk_mixture *mixture; /**< a mixture, or NULL */
    const gk_real *kij;        /**< with a mixture: count*count interaction parameters, or NULL */
} gk_fluid;

/**
 * @brief Compressibility factor Z of the stable root of @p eos for a gas or mixture.
 *
 * The stable root is returned whether it is gas or liquid (no liquid check here).
 * @return A status: see the group.
 */
GK_API gk_status gk_fluid_z(gk_eos eos, gk_fluid fluid, gk_pressure p, gk_temperature t,
                            gk_real *z);

/**
 * @brief Actual volume flow at p, T to the volume flow at a reference condition, with Z from
 *        @p eos at both conditions: q_ref = q (p / p_ref)(T_ref / T)(Z_ref / Z).
 *
 * Any finite flow converts, also zero and negative (reverse) flow; the stable state must be
 * gas at both conditions.
 * @return A status: see the group (GK_ERR_DOMAIN also for a flow that is not finite).
 */
GK_API gk_status gk_flow_to_reference(gk_eos eos, gk_fluid fluid, gk_volume_flow actual,
                                      gk_pressure p, gk_temperature t, gk_reference ref,
                                      gk_volume_flow *out);

/**
 * @brief Volume flow at a reference condition to the actual volume flow at p, T (the inverse of
 *        gk_flow_to_reference()).
 * @return A status: see the group (GK_ERR_DOMAIN also for a flow that is not finite).
 */
GK_API gk_status gk_flow_from_reference(gk_eos eos, gk_fluid fluid, gk_volume_flow at_reference,
                                        gk_reference ref, gk_pressure p, gk_temperature t,
                                        gk_volume_flow *out);

/**
 * @brief Mass flow of an actual volume flow at p, T: w = q rho(p, T), rho = p M / (Z R T)
 *        with M the molar mass of the gas or the mixture.
 * @return A status: see the group (GK_ERR_DOMAIN also for a flow that is not finite or a molar mass of
 *         the gas that is not finite or not > 0).
 */
GK_API gk_status gk_flow_to_mass(gk_eos eos, gk_fluid fluid, gk_volume_flow actual, gk_pressure p,
                                 gk_temperature t, gk_mass_flow *out);

/** Contents of a vessel. */
typedef struct gk_contents {
    gk_amount amount;           /**< amount of gas in the vessel */
    gk_mass mass;               /**< its mass */
    gk_volume reference_volume; /**< its volume at the reference condition (as free gas) */
    gk_real z;                  /**< compressibility factor in the vessel */
} gk_contents;

/**
 * @brief Contents of a vessel of internal volume @p vessel at pressure @p p and temperature @p t.
 *
 * amount n = p V / (Z R T), mass n M, reference_volume n Z_ref R T_ref / p_ref, z = Z.
 * Where the stable state in the vessel is liquid (a liquefied-gas cylinder), the contents do not
 * follow from pressure: GK_ERR_RANGE; such containers are weighed.
 * @return A status: see the group (GK_ERR_DOMAIN also for a vessel volume or a molar mass of the gas
 *         that is not finite or not > 0).
 */
GK_API gk_status gk_vessel_contents(gk_eos eos, gk_fluid fluid, gk_volume vessel, gk_pressure p,
                                    gk_temperature t, gk_reference ref, gk_contents *out);

/** A leak rate, in three forms. */
typedef struct gk_leak {
    gk_real mol_per_s;             /**< amount lost per second */
    gk_mass_flow mass_flow;        /**< mass lost per second */
    gk_volume_flow reference_flow; /**< volume lost per second at the reference condition */
} gk_leak;

/**
 * @brief Leak rate of a closed test volume from a pressure-decay test, temperature-compensated
 *        through the amount n = p V / (Z R T) at start and end.
 *
 * mol_per_s = (n_start - n_end) / elapsed_s, mass_flow = mol_per_s M, reference_flow =
 * mol_per_s Z_ref R T_ref / p_ref. An unchanged state gives a zero leak. The small difference
 * of the two amounts is formed from the differences of the readings (see docs/instruments.md
 * for its accuracy in a float build).
 * @retval GK_ERR_NO_SOLUTION The end state holds more gas than the start (gas flowed in, or
 *                            the temperature reading is wrong).
 * @retval Others             See the group (GK_ERR_DOMAIN also for an elapsed time, a volume
 *                            or a molar mass of the gas that is not finite or not > 0).
 */
GK_API gk_status gk_leak_rate_pressure_decay(gk_eos eos, gk_fluid fluid, gk_volume test_volume,
                                             gk_pressure p_start, gk_temperature t_start,
                                             gk_pressure p_end, gk_temperature t_end,
                                             gk_real elapsed_s, gk_reference ref, gk_leak *out);

/**
 * @brief Density of a gas or mixture relative to dry air at the same pressure and temperature:
 *        d = (M / M_air)(Z_air / Z), both Z from @p eos; dry air is the gas table's "air".
 * @return A status: see the group (GK_ERR_RANGE also where air is liquid in the model).
 */
GK_API gk_status gk_relative_density(gk_eos eos, gk_fluid fluid, gk_pressure p, gk_temperature t,
                                     gk_real *out);

/**
 * @brief Adds water vapour at relative humidity @p relative_humidity (fraction in [0, 1]) to a
 *        dry mixture at p, T: x_w = RH p_ws(T) / p, other fractions scaled by (1 - x_w).
 * Water is the table's "H2O", appended as the last component (also at RH 0, with fraction 0)
 * or added to a component already present whose formula is "H2O". Below 273.16 K the vapour
 * pressure is over ice (RH with respect to ice). @p wet may be the same object as @p dry.
 * @retval GK_OK              @p wet written (water appended, or added to an existing H2O component).
 * @retval GK_ERR_ARGUMENT    An argument is NULL.
 * @retval GK_ERR_COMPOSITION @p dry is not valid, or already holds GK_MIXTURE_MAX components.
 * @retval GK_ERR_DOMAIN      An input is not finite, or RH outside [0, 1].
 * @retval GK_ERR_RANGE       T outside the vapour-pressure curves.
 * @retval GK_ERR_NO_SOLUTION The water partial pressure is not below p.
 */
GK_API gk_status gk_humid_mixture(const gk_mixture *dry, gk_pressure p, gk_temperature t,
                                  gk_real relative_humidity, gk_mixture *wet);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_INSTRUMENT_H */
