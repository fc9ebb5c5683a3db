/**
 * @file batch.h
 * @brief Array versions of the density, compressibility, vessel-contents and flow functions,
 *        for pipelines and foreign callers (Python and numpy, Rust, Go).
 *
 * Common contract of every call here:
 * - Arrays hold SI values (Pa, K, m^3, m^3/s; results in kg/m^3, mol, kg, kg/s, m^3/s).
 * - Element i of each output is what the scalar function named in the call's description
 *   returns for element i of the inputs, with the same status: the scalar result where the
 *   status is GK_OK, NaN (a quiet NaN) where it is not.
 * - @p status_out (may be NULL) receives one status per element.
 * - The return value is the number of elements whose status is GK_OK (count minus the failures).
 * - A count of 0 is fine: nothing is read or written, also through NULL pointers.
 * - A NULL input array or a NULL (required) output array with a count above 0 fails every
 *   element with GK_ERR_ARGUMENT; nothing is ever written through a NULL pointer.
 * - Whole-array arguments (the model, the fluid, a reference condition, a molar mass) that are
 *   invalid fail every element with the status the scalar function gives for them. The fluid
 *   is checked once per array, and what every element shares (the molar mass, Z at the
 *   reference condition) is computed once, with the scalar call's result.
 * - An output array may be the same array as an input array (computation in place); other
 *   partial overlaps of arrays are not allowed.
 * - The calls are reentrant and thread-safe (no state); they never allocate.
 *
 * Results are engineering estimates from the chosen model: see the validity ranges of eos.h,
 * instrument.h and the README's safety section before a result feeds a decision about a
 * pressure vessel or a hazardous gas.
 */
#ifndef GASKIT_BATCH_H
#define GASKIT_BATCH_H

#include "gaskit/eos.h"
#include "gaskit/instrument.h"
#include "gaskit/water.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup batch Batch calls
 *  @{ */

/**
 * @brief gk_ideal_density() over arrays: out[i] = (p[i] / R)(M / t[i]).
 *
 * Results and statuses are bit for bit those of gk_ideal_density() for every input:
 * GK_ERR_DOMAIN for p[i] or t[i] not finite or not > 0 (and for every element when @p m is
 * not finite or not > 0), GK_ERR_RANGE for a density that overflows or falls below the
 * smallest normal number. Blocks of elements are computed in one branch-free loop that
 * compilers vectorise, which also checks that every input lies well inside the floating-point
 * range (there the scalar call computes the same product); a block where that check fails is
 * recomputed element by element, through gk_ideal_density() itself for the elements outside.
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
 * The same as gk_fluid_density_batch() with the fluid { gas, NULL, NULL }.
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_eos_density_batch(gk_eos eos, const gk_gas *gas, size_t count, const gk_real *p_pa,
                                   const gk_real *t_k, gk_real *out_kg_per_m3,
                                   gk_status *status_out);

/**
 * @brief Density of a gas or mixture over arrays: out[i] = M / Vm(p[i], t[i]) with Vm the
 *        molar volume of the stable root of @p eos (gas or liquid, as gk_fluid_z()) and M the
 *        molar mass of the gas or the mixture (sum x_j M_j).
 *
 * For a gas each element is gk_eos_density(). For a mixture each element is the stable root of
 * gk_mixture_eos_solve() and M / Vm; the mixture's M is formed once per array (GK_ERR_RANGE for
 * every element when it underflows to 0).
 * @retval per element As gk_fluid_z(); GK_ERR_DOMAIN for a molar mass not finite or not > 0;
 *         GK_ERR_RANGE for a density that is not finite and > 0.
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_fluid_density_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                                     const gk_real *t_k, gk_real *out_kg_per_m3,
                                     gk_status *status_out);

/**
 * @brief gk_fluid_z() over arrays: out[i] = Z of the stable root of @p eos at p[i], t[i].
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_fluid_z_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                               const gk_real *t_k, gk_real *out_z, gk_status *status_out);

/**
 * @brief gk_vessel_contents() over arrays: the contents of vessels of internal volume v[i]
 *        at p[i], t[i]: amount n = p V / (Z R T), mass n M, volume n Z_ref R T_ref / p_ref at
 *        the reference condition @p ref.
 *
 * A liquid stable state in the vessel (a liquefied-gas cylinder) is GK_ERR_RANGE: such
 * containers are weighed, their contents do not follow from pressure.
 * @param out_mol Amounts in mol (required).
 * @param out_kg Masses in kg, or NULL when not wanted.
 * @param out_reference_m3 Volumes at @p ref in m3, or NULL when not wanted.
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_vessel_contents_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                       const gk_real *v_m3, const gk_real *p_pa, const gk_real *t_k,
                                       gk_real *out_mol, gk_real *out_kg, gk_real *out_reference_m3,
                                       gk_status *status_out);

/**
 * @brief gk_flow_to_reference() over arrays: out[i] = q[i] (p[i] / p_ref)(T_ref / t[i])
 *        (Z_ref / Z[i]), the actual volume flows q[i] at p[i], t[i] as volume flows at @p ref.
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_flow_to_reference_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                         const gk_real *q_m3_per_s, const gk_real *p_pa,
                                         const gk_real *t_k, gk_real *out_m3_per_s,
                                         gk_status *status_out);

/**
 * @brief gk_flow_to_mass() over arrays: out[i] = q[i] p[i] M / (Z[i] R t[i]), the mass flows of
 *        the actual volume flows q[i] at p[i], t[i].
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_flow_to_mass_batch(gk_eos eos, gk_fluid fluid, size_t count,
                                    const gk_real *q_m3_per_s, const gk_real *p_pa,
                                    const gk_real *t_k, gk_real *out_kg_per_s,
                                    gk_status *status_out);

/**
 * @brief gk_dry_gas_pressure() over arrays: out[i] = p[i] - rh[i] p_ws(t[i]), the partial
 *        pressures of the dry gas in wet gases (the wet-gas correction of a log of readings).
 *
 * p_ws is the vapour pressure of water (IAPWS-IF97) at and above 273.16 K, of ice (IAPWS 2011)
 * below; the enhancement factor of moist gas (about 1.004 near ambient) is neglected.
 * @param relative_humidity Relative humidities as fractions in [0, 1].
 * @return Number of elements with status GK_OK.
 */
GK_API size_t gk_dry_gas_pressure_batch(size_t count, const gk_real *p_pa, const gk_real *t_k,
                                        const gk_real *relative_humidity, gk_real *out_pa,
                                        gk_status *status_out);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_BATCH_H */
