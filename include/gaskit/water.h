/**
 * @file water.h
 * @brief Vapour pressure of water and ice, dew and frost points, and wet-gas corrections.
 *
 * Over liquid water: the saturation line of IAPWS-IF97 (region 4), 273.15 K to 647.096 K.
 * Over ice: the sublimation equation of IAPWS R14-08 (2011), 200 K to 273.16 K in gaskit.
 * The two curves meet at the triple point, 273.16 K and 611.657 Pa.
 * Accuracy against the published equations (measured over the whole range): double builds
 * ~1e-14 relative; float builds 4.4e-6 in pressure and 1.2e-6 in temperature (see
 * docs/instruments.md).
 */
#ifndef GASKIT_WATER_H
#define GASKIT_WATER_H

#include "gaskit/units.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup water Water vapour and wet gas
 *  @{ */

/**
 * @brief Saturation vapour pressure of water: over liquid water at and above the triple point
 *        273.16 K (IAPWS-IF97), over ice below it (IAPWS 2011).
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL.
 * @retval GK_ERR_DOMAIN   T not finite or not > 0.
 * @retval GK_ERR_RANGE    T below 200 K or above the critical temperature 647.096 K.
 */
GK_API gk_status gk_water_vapour_pressure(gk_temperature t, gk_pressure *out);

/**
 * @brief Inverse of gk_water_vapour_pressure(): temperature at which water (or ice, below the
 *        triple-point pressure 611.657 Pa) has vapour pressure @p p.
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL.
 * @retval GK_ERR_DOMAIN   p not finite or not > 0.
 * @retval GK_ERR_RANGE    p outside the pressures of the curves (200 K ... 647.096 K).
 * @retval GK_ERR_NO_SOLUTION the frost-point iteration (below the triple point) stopped at its
 *                           step cap without converging (not expected; never seen in tests).
 */
GK_API gk_status gk_water_saturation_temperature(gk_pressure p, gk_temperature *out);

/**
 * @brief Partial pressure of the dry gas in a wet gas: p_dry = p - RH p_ws(T).
 *
 * RH = 1 is gas collected over water (saturated). The enhancement factor of moist gas
 * (about 1.004 near ambient) is neglected. Below the triple point (273.16 K) p_ws is the
 * pressure over ice (gk_water_vapour_pressure()), so RH is taken with respect to ice there;
 * hygrometers and weather data commonly give RH with respect to supercooled liquid water
 * below 0 degC (WMO convention, common practice), which has no curve in gaskit: convert such
 * a reading to a water partial pressure p_w outside gaskit and take p - p_w.
 * @param total Total (wet-gas) absolute pressure, > 0.
 * @param t Temperature of the gas, > 0 K.
 * @param relative_humidity RH as a fraction in [0, 1].
 * @param[out] out Partial pressure of the dry gas.
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL.
 * @retval GK_ERR_DOMAIN   An input is not finite, p or T not > 0, RH outside [0, 1].
 * @retval GK_ERR_RANGE    T outside the vapour-pressure curves.
 * @retval GK_ERR_NO_SOLUTION The water partial pressure is not below the total pressure.
 */
GK_API gk_status gk_dry_gas_pressure(gk_pressure total, gk_temperature t, gk_real relative_humidity,
                                     gk_pressure *out);

/**
 * @brief Dew point (frost point below the triple point) for a water partial pressure.
 * @retval As gk_water_saturation_temperature().
 */
GK_API gk_status gk_dew_point(gk_pressure water_partial_pressure, gk_temperature *out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_WATER_H */
