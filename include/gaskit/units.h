/**
 * @file units.h
 * @brief Typed quantities (one SI value each) and unit conversion.
 *
 * Units are converted once, at the edge: a reading in any listed unit becomes a typed struct
 * holding the SI value, and every computing function works in SI. Unit factors are those of
 * NIST SP 811 (2008), Appendix B; they are listed with their sources in lib/units.c.
 */
#ifndef GASKIT_UNITS_H
#define GASKIT_UNITS_H

#include "gaskit/base.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup units Quantities and units
 *  @{ */

/** An absolute pressure in pascal (Pa); gauge readings: gk_pressure_from_gauge(). */
typedef struct gk_pressure {
    gk_real pa; /**< value in Pa */
} gk_pressure;

/** A thermodynamic temperature in kelvin (K). */
typedef struct gk_temperature {
    gk_real k; /**< value in K */
} gk_temperature;

/** A volume in cubic metre (m3). */
typedef struct gk_volume {
    gk_real m3; /**< value in m3 */
} gk_volume;

/** An amount of substance in mole (mol). */
typedef struct gk_amount {
    gk_real mol; /**< value in mol */
} gk_amount;

/** A molar mass in kilogram per mole (kg/mol). */
typedef struct gk_molar_mass {
    gk_real kg_per_mol; /**< value in kg/mol */
} gk_molar_mass;

/** A molar volume in cubic metre per mole (m3/mol). */
typedef struct gk_molar_volume {
    gk_real m3_per_mol; /**< value in m3/mol */
} gk_molar_volume;

/** A mass density in kilogram per cubic metre (kg/m3). */
typedef struct gk_density {
    gk_real kg_per_m3; /**< value in kg/m3 */
} gk_density;

/** A speed in metre per second (m/s). */
typedef struct gk_speed {
    gk_real m_per_s; /**< value in m/s */
} gk_speed;

/** A mass in kilogram (kg). */
typedef struct gk_mass {
    gk_real kg; /**< value in kg */
} gk_mass;

/** A volume flow rate in cubic metre per second (m3/s). */
typedef struct gk_volume_flow {
    gk_real m3_per_s; /**< value in m3/s */
} gk_volume_flow;

/** A mass flow rate in kilogram per second (kg/s). */
typedef struct gk_mass_flow {
    gk_real kg_per_s; /**< value in kg/s */
} gk_mass_flow;

/**
 * Units known to gaskit. Each has one dimension; gk_convert() only converts within one.
 * GK_UNIT_AT is the technical atmosphere (kgf/cm2, 98066.5 Pa); GK_UNIT_MMHG and GK_UNIT_INHG are
 * the conventional millimetre and inch of mercury; GK_UNIT_DEGR is the degree Rankine.
 */
typedef enum gk_unit {
    /* pressure */
    GK_UNIT_PA,
    GK_UNIT_HPA,
    GK_UNIT_KPA,
    GK_UNIT_MPA,
    GK_UNIT_BAR,
    GK_UNIT_MBAR,
    GK_UNIT_ATM,
    GK_UNIT_AT,
    GK_UNIT_TORR,
    GK_UNIT_MMHG,
    GK_UNIT_INHG,
    GK_UNIT_PSI,
    /* temperature */
    GK_UNIT_K,
    GK_UNIT_DEGC,
    GK_UNIT_DEGF,
    GK_UNIT_DEGR,
    /* volume */
    GK_UNIT_M3,
    GK_UNIT_L,
    GK_UNIT_ML,
    GK_UNIT_FT3,
    GK_UNIT_IN3,
    GK_UNIT_GAL_US,
    /* amount */
    GK_UNIT_MOL,
    GK_UNIT_MMOL,
    GK_UNIT_KMOL,
    GK_UNIT_LBMOL,
    /* molar mass */
    GK_UNIT_KG_PER_MOL,
    GK_UNIT_G_PER_MOL,
    /* molar volume */
    GK_UNIT_M3_PER_MOL,
    GK_UNIT_L_PER_MOL,
    GK_UNIT_CM3_PER_MOL,
    /* density */
    GK_UNIT_KG_PER_M3,
    GK_UNIT_G_PER_L,
    GK_UNIT_G_PER_CM3,
    GK_UNIT_LB_PER_FT3,
    /* speed */
    GK_UNIT_M_PER_S,
    GK_UNIT_KM_PER_H,
    GK_UNIT_FT_PER_S,
    /* mass */
    GK_UNIT_KG,
    GK_UNIT_G,
    GK_UNIT_LB,
    /* volume flow */
    GK_UNIT_M3_PER_S,
    GK_UNIT_M3_PER_H,
    GK_UNIT_L_PER_MIN,
    GK_UNIT_ML_PER_MIN,
    GK_UNIT_FT3_PER_MIN,
    /* mass flow */
    GK_UNIT_KG_PER_S,
    GK_UNIT_KG_PER_H,
    GK_UNIT_G_PER_MIN,
    GK_UNIT_LB_PER_H,
    GK_UNIT_COUNT /**< not a unit: the number of units */
} gk_unit;

/**
 * @brief Converts a value between two units of the same dimension.
 *
 * Temperatures are converted as temperatures (with the offsets of the Celsius and Fahrenheit
 * scales), not as differences. Other values may be zero or negative (pressure differences,
 * gauge readings); only the typed functions below require absolute quantities to be > 0.
 * Factors: NIST SP 811 (2008) Appendix B, as exact ratios where SP 811 rests on an exact
 * definition (see lib/units.c).
 * @param value Value in unit @p from; must be finite.
 * @param from  Unit of @p value.
 * @param to    Unit wanted.
 * @param[out] out Converted value.
 * @retval GK_OK            @p out written.
 * @retval GK_ERR_ARGUMENT  @p out is NULL, a unit is out of range, or the units differ in dimension.
 * @retval GK_ERR_DOMAIN    @p value is not finite, or is a temperature below absolute zero
 *                          (0 K itself converts).
 * @retval GK_ERR_RANGE     The result overflows, or a non-zero value falls below the smallest
 *                          normal number (underflow).
 */
GK_API gk_status gk_convert(gk_real value, gk_unit from, gk_unit to, gk_real *out);

/**
 * @brief Finds a unit by its symbol.
 *
 * Accepts the SI / NIST SP 811 symbols and plain ASCII spellings, e.g. "Pa", "kPa", "MPa",
 * "bar", "mbar", "hPa", "atm", "at", "Torr", "mmHg", "inHg", "psi", "K", "degC", "°C" (UTF-8),
 * "degF", "°F", "degR", "m3", "L", "mL", "ft3", "gal", "mol", "kmol", "lbmol", "g/mol",
 * "kg/m3", "g/L", "m/s", "km/h", "kg", "g", "lb", "m3/h", "L/min", "mL/min", "kg/h".
 * The match is exact (case matters: "mbar" is not "Mbar"; no spaces, no prefixes). Reads
 * @p symbol only up to its terminating NUL.
 *
 * Every symbol returned by gk_unit_symbol() is accepted, and these aliases:
 * "torr" (Torr), "kgf/cm2" (at), "psia" and "lbf/in2" (psi), "°C" and "℃" (degC),
 * "°F" and "℉" (degF), "°R" (degR), "l" (L), "dm3" (L), "ml" and "cm3" (mL), "m^3", "ft^3",
 * "in^3", "gal_US" (gal), "l/mol", "m^3/mol", "cm^3/mol", "kg/m^3", "g/l", "g/cm^3",
 * "lb/ft^3", "m^3/s", "m^3/h", "l/min", "ml/min", "ft^3/min" and "cfm" (ft3/min). The
 * UTF-8 forms are U+00B0 DEGREE SIGN followed by C, F or R, U+2103 and U+2109.
 * @param symbol NUL-terminated text.
 * @param[out] out The unit.
 * @retval GK_OK            @p out written.
 * @retval GK_ERR_ARGUMENT  @p symbol or @p out is NULL.
 * @retval GK_ERR_NOT_FOUND No unit has that symbol.
 */
GK_API gk_status gk_unit_parse(const char *symbol, gk_unit *out);

/**
 * @brief The symbol of a unit.
 *
 * The symbols: Pa hPa kPa MPa bar mbar atm at Torr mmHg inHg psi | K degC degF degR |
 * m3 L mL ft3 in3 gal | mol mmol kmol lbmol | kg/mol g/mol | m3/mol L/mol cm3/mol |
 * kg/m3 g/L g/cm3 lb/ft3 | m/s km/h ft/s | kg g lb | m3/s m3/h L/min mL/min ft3/min |
 * kg/s kg/h g/min lb/h.
 * @return Static ASCII text such as "kPa" or "degC"; "?" for a value out of range; never NULL.
 */
GK_API const char *gk_unit_symbol(gk_unit unit);

/** @defgroup unit_pairs Quantities from and to units
 *  @ingroup units
 *  Each quantity has a pair of functions: gk_<quantity>_from(value, unit, out) makes the typed
 *  SI quantity from a value in @p unit, gk_<quantity>_to(q, unit, out) expresses a quantity in
 *  @p unit. They share one error contract; outputs are written only on GK_OK:
 *  - GK_ERR_ARGUMENT: @p out is NULL, or @p unit is not a unit of the quantity's dimension
 *    (gk_convert() lists the factors and the temperature offsets);
 *  - GK_ERR_DOMAIN: the value, or the quantity passed in, is not finite or outside the
 *    quantity's domain: > 0 for the absolute quantities (pressure, temperature, volume, amount,
 *    molar mass, molar volume, density, mass; temperatures below absolute zero included), any
 *    finite value for the signed ones (speed, volume flow, mass flow);
 *  - GK_ERR_RANGE: the result overflows, or a non-zero result underflows below the smallest
 *    normal number.
 *  @{ */

/**
 * @brief Absolute pressure (Pa, absolute, > 0) from a value in a pressure unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_pressure_from(gk_real value, gk_unit unit, gk_pressure *out);

/**
 * @brief Absolute pressure @p p expressed in a pressure unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_pressure_to(gk_pressure p, gk_unit unit, gk_real *out);

/**
 * @brief Makes an absolute pressure from a gauge reading: p = value (in @p unit) + ambient.
 * @param value   Gauge reading in @p unit (may be negative: a vacuum gauge).
 * @param unit    A pressure unit.
 * @param ambient Ambient (barometric) pressure, absolute, > 0.
 * @param[out] out Absolute pressure.
 * @retval GK_OK           @p out written.
 * @retval GK_ERR_ARGUMENT @p out is NULL, or @p unit is not a pressure unit.
 * @retval GK_ERR_DOMAIN   An input is not finite, @p ambient is not > 0, or the absolute
 *                         pressure would not be > 0.
 * @retval GK_ERR_RANGE    The reading overflows in Pa (or underflows below the normal range).
 */
GK_API gk_status gk_pressure_from_gauge(gk_real value, gk_unit unit, gk_pressure ambient,
                                        gk_pressure *out);

/**
 * @brief Thermodynamic temperature (K, > 0) from a value in a temperature unit.
 * Celsius and Fahrenheit values are converted with their scale offsets.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_temperature_from(gk_real value, gk_unit unit, gk_temperature *out);

/**
 * @brief Thermodynamic temperature @p t expressed in a temperature unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_temperature_to(gk_temperature t, gk_unit unit, gk_real *out);

/**
 * @brief Volume (m3, > 0) from a value in a volume unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_volume_from(gk_real value, gk_unit unit, gk_volume *out);

/**
 * @brief Volume @p v expressed in a volume unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_volume_to(gk_volume v, gk_unit unit, gk_real *out);

/**
 * @brief Amount of substance (mol, > 0) from a value in an amount unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_amount_from(gk_real value, gk_unit unit, gk_amount *out);

/**
 * @brief Amount of substance @p n expressed in an amount unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_amount_to(gk_amount n, gk_unit unit, gk_real *out);

/**
 * @brief Molar mass (kg/mol, > 0) from a value in a molar mass unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_molar_mass_from(gk_real value, gk_unit unit, gk_molar_mass *out);

/**
 * @brief Molar mass @p m expressed in a molar mass unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_molar_mass_to(gk_molar_mass m, gk_unit unit, gk_real *out);

/**
 * @brief Molar volume (m3/mol, > 0) from a value in a molar volume unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_molar_volume_from(gk_real value, gk_unit unit, gk_molar_volume *out);

/**
 * @brief Molar volume @p vm expressed in a molar volume unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_molar_volume_to(gk_molar_volume vm, gk_unit unit, gk_real *out);

/**
 * @brief Mass density (kg/m3, > 0) from a value in a density unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_density_from(gk_real value, gk_unit unit, gk_density *out);

/**
 * @brief Mass density @p rho expressed in a density unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_density_to(gk_density rho, gk_unit unit, gk_real *out);

/**
 * @brief Speed (m/s, signed) from a value in a speed unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_speed_from(gk_real value, gk_unit unit, gk_speed *out);

/**
 * @brief Speed @p u expressed in a speed unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_speed_to(gk_speed u, gk_unit unit, gk_real *out);

/**
 * @brief Mass (kg, > 0) from a value in a mass unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_mass_from(gk_real value, gk_unit unit, gk_mass *out);

/**
 * @brief Mass @p mass expressed in a mass unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_mass_to(gk_mass mass, gk_unit unit, gk_real *out);

/**
 * @brief Volume flow rate (m3/s, signed) from a value in a volume flow unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_volume_flow_from(gk_real value, gk_unit unit, gk_volume_flow *out);

/**
 * @brief Volume flow rate @p q expressed in a volume flow unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_volume_flow_to(gk_volume_flow q, gk_unit unit, gk_real *out);

/**
 * @brief Mass flow rate (kg/s, signed) from a value in a mass flow unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_mass_flow_from(gk_real value, gk_unit unit, gk_mass_flow *out);

/**
 * @brief Mass flow rate @p w expressed in a mass flow unit.
 * @retval GK_OK, GK_ERR_ARGUMENT, GK_ERR_DOMAIN, GK_ERR_RANGE (see the group).
 */
GK_API gk_status gk_mass_flow_to(gk_mass_flow w, gk_unit unit, gk_real *out);

/** @} */

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_UNITS_H */
