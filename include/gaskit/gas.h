/**
 * @file gas.h
 * @brief Pure-gas data and the built-in gas table.
 */
#ifndef GASKIT_GAS_H
#define GASKIT_GAS_H

#include "gaskit/units.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup gas Gas data
 *  @{ */

/**
 * Data of one pure gas (or a pseudo-pure gas such as air). Transparent: firmware may define
 * its own const tables of these and pass them to every function that takes a gk_gas.
 */
typedef struct gk_gas {
    const char *name;                     /**< lower-case name, e.g. "carbon dioxide" */
    const char *formula;                  /**< formula or short label, e.g. "CO2" */
    gk_molar_mass molar_mass;             /**< molar mass */
    gk_temperature critical_temperature;  /**< critical temperature Tc */
    gk_pressure critical_pressure;        /**< critical pressure Pc */
    gk_real acentric_factor;              /**< Pitzer acentric factor (dimensionless) */
    gk_real vdw_a;                        /**< van der Waals a, Pa m^6 mol^-2, handbook value; 0 = derive from Tc, Pc */
    gk_real vdw_b;                        /**< van der Waals b, m^3 mol^-1; 0 = derive from Tc, Pc */
    gk_real heat_capacity_ratio;          /**< ideal-gas cp/cv near 298 K; 0 = not known */
    gk_real collision_diameter;           /**< hard-sphere collision diameter, m; 0 = not known */
} gk_gas;

/**
 * @brief Finds a gas of the built-in table by formula or name.
 *
 * The formula matches exactly ("CO2", "n-C4H10"); the name matches without regard to ASCII
 * case ("Carbon Dioxide"). Reads @p name_or_formula only up to its terminating NUL.
 * @param name_or_formula NUL-terminated text.
 * @param[out] out Pointer to the static, constant table entry.
 * @retval GK_OK            @p out written.
 * @retval GK_ERR_ARGUMENT  An argument is NULL.
 * @retval GK_ERR_NOT_FOUND No gas has that formula or name.
 */
GK_API gk_status gk_gas_find(const char *name_or_formula, const gk_gas **out);

/** @brief Number of gases in the built-in table. */
GK_API size_t gk_gas_count(void);

/** @brief The built-in gas at @p index (0 ... gk_gas_count() - 1); NULL past the end. */
GK_API const gk_gas *gk_gas_at(size_t index);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_GAS_H */
