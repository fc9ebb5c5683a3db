/**
 * @file kinetic.h
 * @brief Kinetic theory of an ideal gas: molecular speeds, effusion (Graham's law), mean free
 *        path and wall collision flux.
 *
 * All results assume a Maxwell-Boltzmann distribution of an ideal gas in equilibrium.
 * Effusion through an orifice follows Graham's law only when the mean free path is much larger
 * than the orifice (free-molecular flow); through leaks with viscous flow the ratio differs.
 */
#ifndef GASKIT_KINETIC_H
#define GASKIT_KINETIC_H

#include "gaskit/units.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup kinetic Kinetic theory
 *  Every function here returns GK_ERR_ARGUMENT for a NULL output, GK_ERR_DOMAIN for an input
 *  that is not finite or not > 0 (unless stated otherwise), and GK_ERR_RANGE where the result
 *  would overflow or fall below the smallest normal number; outputs are written only on GK_OK.
 *  Speeds in m/s, T in K, M in kg/mol, p in Pa. Square roots are taken factor by factor, so
 *  no intermediate overflows while the result is representable.
 *
 *  The heat-capacity ratio of gk_speed_of_sound_ideal() must lie in (1, 1.67]: 5/3 for a
 *  monatomic gas (a printed 1.667 or 1.67 is accepted), 1.4 for air
 *  and diatomic gases near room temperature. gk_mean_free_path() uses k = GK_BOLTZMANN;
 *  collision diameters are a few 1e-10 m; it holds while the gas is dilute (mean free path
 *  much larger than the diameter).
 *  @{ */

/** @brief Root-mean-square speed sqrt(3 R T / M).
 *  @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group). */
GK_API gk_status gk_speed_rms(gk_temperature t, gk_molar_mass m, gk_speed *out);

/** @brief Mean speed sqrt(8 R T / (pi M)).
 *  @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group). */
GK_API gk_status gk_speed_mean(gk_temperature t, gk_molar_mass m, gk_speed *out);

/** @brief Most probable speed sqrt(2 R T / M).
 *  @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group). */
GK_API gk_status gk_speed_most_probable(gk_temperature t, gk_molar_mass m, gk_speed *out);

/**
 * @brief Speed of sound in an ideal gas, sqrt(gamma R T / M).
 * @param t Temperature, > 0 K.
 * @param m Molar mass, > 0.
 * @param heat_capacity_ratio gamma = cp/cv; must be finite and in (1, 1.67] (5/3 for a monatomic ideal gas,
 *        with room for its rounded printed forms).
 * @param[out] out Speed of sound, m/s.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_RANGE (see the group).
 * @retval GK_ERR_DOMAIN An input is not finite, T or M not > 0, or gamma outside (1, 1.67].
 */
GK_API gk_status gk_speed_of_sound_ideal(gk_temperature t, gk_molar_mass m,
                                         gk_real heat_capacity_ratio, gk_speed *out);

/**
 * @brief Graham's law: effusion rate of gas a over that of gas b, sqrt(M_b / M_a).
 * @param a Molar mass of gas a, > 0.
 * @param b Molar mass of gas b, > 0.
 * @param[out] rate_a_over_b Ratio of molar (or volumetric) effusion rates at equal p and T.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_effusion_ratio(gk_molar_mass a, gk_molar_mass b, gk_real *rate_a_over_b);

/**
 * @brief Molar mass of an unknown gas from effusion times: M = M_ref (t_unknown / t_ref)^2.
 *
 * Equal amounts effusing under the same conditions take times proportional to sqrt(M).
 * @param reference Molar mass of the reference gas, > 0.
 * @param time_ratio_unknown_over_reference t_unknown / t_ref, finite and > 0.
 * @param[out] out Molar mass of the unknown gas.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_effusion_molar_mass(gk_molar_mass reference,
                                        gk_real time_ratio_unknown_over_reference,
                                        gk_molar_mass *out);

/**
 * @brief Mean free path of a hard-sphere gas: lambda = k T / (sqrt(2) pi d^2 p).
 * @param p Absolute pressure, > 0.
 * @param t Temperature, > 0 K.
 * @param collision_diameter_m Molecular collision diameter d in metres, > 0 (a few 1e-10 m).
 * @param[out] out_m Mean free path in metres.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_mean_free_path(gk_pressure p, gk_temperature t, gk_real collision_diameter_m,
                                   gk_real *out_m);

/**
 * @brief Molar flux of molecules striking a wall (or passing an ideal orifice):
 *        J = p / sqrt(2 pi M R T), in mol/(m^2 s).
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_wall_flux(gk_pressure p, gk_temperature t, gk_molar_mass m,
                              gk_real *out_mol_per_m2_s);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_KINETIC_H */
