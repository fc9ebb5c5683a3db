/**
 * @file reference.h
 * @brief Named reference (standard, normal) conditions and the conversion of volumes to them.
 */
#ifndef GASKIT_REFERENCE_H
#define GASKIT_REFERENCE_H

#include "gaskit/units.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup reference Reference conditions
 *  @{ */

/** A reference condition: absolute pressure and temperature. Always explicit. */
typedef struct gk_reference {
    gk_pressure p;    /**< reference pressure, absolute */
    gk_temperature t; /**< reference temperature */
} gk_reference;

/** Named reference conditions with published definitions. */
typedef enum gk_reference_id {
    GK_REF_0C_101325PA,  /**< 0 degC, 101.325 kPa (DIN 1343 "normal" conditions) */
    GK_REF_0C_100KPA,    /**< 0 degC, 100 kPa (IUPAC standard conditions since 1982) */
    GK_REF_15C_101325PA, /**< 15 degC, 101.325 kPa (ISO 13443 natural gas) */
    GK_REF_20C_101325PA, /**< 20 degC, 101.325 kPa */
    GK_REF_25C_101325PA, /**< 25 degC, 101.325 kPa */
    GK_REF_60F_14696PSI  /**< 60 degF, 14.696 psia (U.S. gas industry, common practice):
                               288.705556 K, 101325.353 Pa with the NIST SP 811 factors */
} gk_reference_id;

/**
 * @brief The pressure and temperature of a named reference condition.
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL or @p id out of range.
 */
GK_API gk_status gk_reference_get(gk_reference_id id, gk_reference *out);

/**
 * @brief Factor from an actual volume to the volume at a reference condition:
 *        factor = (p / p_ref) (T_ref / T) (z_ref / z).
 *
 * Multiply an actual volume (or volume flow) at p, T with compressibility z by @p factor to
 * get the volume at the reference condition with compressibility z_ref.
 * @retval GK_OK           @p factor written.
 * @retval GK_ERR_ARGUMENT @p factor is NULL.
 * @retval GK_ERR_DOMAIN   An input is not finite or not > 0.
 * @retval GK_ERR_RANGE    The factor (or one of its three ratios) overflows, or the factor
 *                         falls below the smallest normal number (underflow).
 */
GK_API gk_status gk_reference_factor(gk_pressure p, gk_temperature t, gk_real z, gk_reference ref,
                                     gk_real z_ref, gk_real *factor);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_REFERENCE_H */
