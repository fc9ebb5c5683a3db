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
    const char *name;                    /**< lower-case name, e.g. "carbon dioxide" */
    const char *formula;                 /**< formula or short label, e.g. "CO2" */
    gk_molar_mass molar_mass;            /**< molar mass */
    gk_temperature critical_temperature; /**< critical temperature Tc */
    gk_pressure critical_pressure;       /**< critical pressure Pc */
    gk_real acentric_factor;             /**< Pitzer acentric factor (dimensionless) */
    /** van der Waals a, Pa m^6 mol^-2, handbook value; 0 = derive from Tc, Pc */
    gk_real vdw_a;
    /** van der Waals b, m^3 mol^-1; 0 = derive from Tc, Pc */
    gk_real vdw_b;
    gk_real heat_capacity_ratio; /**< ideal-gas cp/cv near 298 K; 0 = not known */
    /** collision diameter (Lennard-Jones sigma from viscosity, used as a hard-sphere diameter), m;
     * 0 = not known
     */
    gk_real collision_diameter;
} gk_gas;

/** Longest formula, name or alias gk_gas_find() looks up, in characters before the NUL. */
#define GK_GAS_KEY_MAX 63

/**
 * @brief Finds a gas of the built-in table by formula or name.
 *
 * Lookup rules:
 * - Formulas are tried first and match exactly, case-sensitive: "CO" is carbon monoxide,
 *   "Co" and "co" find nothing. Isomers carry a prefix ("n-C4H10", "i-C4H10"); R-134a is
 *   "CH2FCF3"; air is "air".
 * - Then names, and a few aliases per gas (British spellings such as "sulphur dioxide",
 *   IUPAC names such as "propene", refrigerant numbers such as "R-134a"), without regard to
 *   ASCII case ("Carbon Dioxide"). No locale is consulted.
 * - No trimming: " N2" and "nitrogen " find nothing.
 * The table, its conventions and the source of every column are listed in docs/gas-table.md.
 * Reads @p name_or_formula only up to its terminating NUL, and never more than
 * GK_GAS_KEY_MAX + 1 characters: a longer text names no gas (GK_ERR_NOT_FOUND).
 * @param name_or_formula NUL-terminated text.
 * @param[out] out Pointer to the static, constant table entry (the same pointer for every key
 *             of the same gas, so pointers may be compared).
 * @retval GK_OK            @p out written.
 * @retval GK_ERR_ARGUMENT  An argument is NULL.
 * @retval GK_ERR_NOT_FOUND No gas has that formula, name or alias (also for ""); @p out is
 *                          left untouched.
 */
GK_API gk_status gk_gas_find(const char *name_or_formula, const gk_gas **out);

/**
 * @brief Number of gases in the built-in table (31 in version 0.2).
 * @return The count; gk_gas_at() accepts 0 ... count - 1.
 */
GK_API size_t gk_gas_count(void);

/**
 * @brief The built-in gas at @p index, in table order (not sorted; later versions may append
 *        gases, never reorder within a major version).
 * @param index 0 ... gk_gas_count() - 1.
 * @return Pointer to the static, constant entry; NULL when @p index is past the end.
 *         Its collision_diameter is the Lennard-Jones sigma fitted to viscosity (0 = not
 *         known); vdw_a and vdw_b are 0 where no handbook value is carried, so that a caller
 *         derives them from the critical constants.
 */
GK_API const gk_gas *gk_gas_at(size_t index);

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_GAS_H */
