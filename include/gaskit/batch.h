/**
 * @file batch.h
 * @brief Array versions of the density functions, for pipelines and foreign callers.
 *
 * Arrays hold SI values (Pa, K, kg/m^3). Each returns how many elements succeeded. A failed
 * element gets NaN in the output array and its status in @p status_out (which may be NULL).
 * A count of 0 is fine; NULL input or output arrays with a count above 0 fail every element
 * (and, with a NULL output array, nothing is written there).
 */
#ifndef GASKIT_BATCH_H
#define GASKIT_BATCH_H

#include "gaskit/eos.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup batch Batch calls
 *  @{ */

/**
 * @brief gk_ideal_density() over arrays: out[i] = p[i] M / (R t[i]).
 *
 * Each element goes through gk_ideal_density(), so results and statuses are identical to the
 * scalar call: GK_ERR_DOMAIN for p[i] or t[i] not finite or not > 0 (or an invalid @p m, which
 * fails every element), GK_ERR_RANGE for overflow or underflow, GK_ERR_ARGUMENT for every
 * element when @p p_pa, @p t_k or @p out_kg_per_m3 is NULL.
 * @param count Number of elements (0 is fine: nothing is read or written).
 * @param p_pa Absolute pressures in Pa.
 * @param t_k Temperatures in K.
 * @param m Molar mass of the gas.
 * @param[out] out_kg_per_m3 Densities in kg/m3; NaN where an element failed.
 * @param[out] status_out Status per element, or NULL.
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_ideal_density_batch(size_t count, const gk_real *p_pa, const gk_real *t_k,
                                     gk_molar_mass m, gk_real *out_kg_per_m3,
                                     gk_status *status_out);

/**
 * @brief gk_eos_density() (stable root) over arrays: out[i] = M / Vm(p[i], t[i]).
 *
 * Each element has the status gk_eos_density() would return (GK_ERR_ARGUMENT for every element
 * when @p gas or an array is NULL or @p eos is out of range).
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_eos_density_batch(gk_eos eos, const gk_gas *gas, size_t count, const gk_real *p_pa,
                                   const gk_real *t_k, gk_real *out_kg_per_m3,
                                   gk_status *status_out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_BATCH_H */
