/**
 * @file base.h
 * @brief Scalar type, export macro, version, status codes and physical constants.
 *
 * Included by every other gaskit header; include `gaskit/gaskit.h` rather than this file.
 */
#ifndef GASKIT_BASE_H
#define GASKIT_BASE_H

#include <stddef.h>
#include "gaskit/config.h"

#ifdef __cplusplus
extern "C" {
#endif

/** @defgroup base Scalar type, version, status and constants
 *  @{ */

/* ------------------------------------------------------------------ export macro */
#if defined(_WIN32) && defined(GK_SHARED_LIBRARY)
#  if defined(GK_BUILDING_LIBRARY)
#    define GK_API __declspec(dllexport)
#  else
#    define GK_API __declspec(dllimport)
#  endif
#elif defined(__GNUC__) && __GNUC__ >= 4
#  define GK_API __attribute__((visibility("default")))
#else
/** Marks a public function (exported from the shared library). */
#  define GK_API
#endif

/* ------------------------------------------------------------------ scalar type */
#if GK_REAL_IS_FLOAT
typedef float gk_real;
#  define GK_REAL_C(x) x##f
#else
/** The floating-point type of every value: double, or float in a single-precision build. */
typedef double gk_real;
/** Writes a floating literal as a gk_real literal (appends `f` in a float build). */
#  define GK_REAL_C(x) x
#endif

/* ------------------------------------------------------------------ version */
/** Major version: changes on an incompatible API or ABI change (it is the SONAME). */
#define GK_VERSION_MAJOR 0
/** Minor version: compatible additions. */
#define GK_VERSION_MINOR 2
/** Patch version: fixes only. */
#define GK_VERSION_PATCH 0

/** Bit of gk_build_flags(): set when gk_real is float. */
#define GK_BUILD_FLOAT 0x1u

/**
 * @brief Version of the linked library.
 * @return Static text "MAJOR.MINOR.PATCH" of the library actually loaded (compare with the
 *         GK_VERSION_ macros of the header a caller compiled against); never NULL.
 */
GK_API const char *gk_version(void);

/**
 * @brief Build flags of the linked library.
 * @return A bit set: GK_BUILD_FLOAT when gk_real is float. A foreign caller checks it before
 *         passing arrays or structs of gk_real.
 */
GK_API unsigned gk_build_flags(void);

/* ------------------------------------------------------------------ status */
/** Result of every computing function. On any value but GK_OK no output is written. */
typedef enum gk_status {
    GK_OK = 0,       /**< Success: outputs written, every output finite. */
    GK_ERR_ARGUMENT, /**< NULL pointer, enum value out of range, unit of the wrong dimension. */
    GK_ERR_DOMAIN, /**< Input not finite, or outside the physical domain (T <= 0 K, p <= 0, ...). */
    GK_ERR_NO_SOLUTION, /**< No physical solution exists for these inputs. */
    GK_ERR_RANGE,       /**< Outside the model's validity range, or the result overflows. */
    GK_ERR_NOT_FOUND,   /**< No gas or unit with that name. */
    GK_ERR_COMPOSITION, /**< Mole fractions negative, not summing to 1 within 1e-6, or too many. */
    GK_ERR_PARSE        /**< Malformed text. */
} gk_status;

/**
 * @brief Names a status.
 * @param status Any value, also one outside the enum.
 * @return Static English text describing @p status ("unknown status" for a value outside the
 *         enum); never NULL.
 */
GK_API const char *gk_status_string(gk_status status);

/* ------------------------------------------------------------------ constants */
/* CODATA 2018 / SI 2019. */
/** Molar gas constant, J/(mol K): the value CODATA 2018 prints, 8.314462618. N_A times k is
 *  exact since SI 2019 (8.31446261815324...); the printed figure is 1.8e-11 relative below it. */
#define GK_R GK_REAL_C(8.314462618)
/** Boltzmann constant, J/K (SI 2019 defining constant, exact). */
#define GK_BOLTZMANN GK_REAL_C(1.380649e-23)
/** Avogadro constant, 1/mol (SI 2019 defining constant, exact). */
#define GK_AVOGADRO GK_REAL_C(6.02214076e23)
/** 0 degC in kelvin (SI definition of the Celsius scale, exact). */
#define GK_ZERO_CELSIUS_K GK_REAL_C(273.15)
/** Standard atmosphere in pascal (CGPM 1954, exact). */
#define GK_STANDARD_ATMOSPHERE_PA GK_REAL_C(101325.0)

/** @} */

#ifdef __cplusplus
}
#endif

#endif /* GASKIT_BASE_H */
