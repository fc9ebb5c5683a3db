/*
 * mixture_internal.h - private interface of mixture.c: the one composition check shared by every
 * module that takes a gk_mixture (fluid layer, instrument calculations), and the mean molar
 * mass. Never installed; the symbols are hidden in the shared library (cmake/gaskit.map exports
 * gk_[a-z]*).
 */
#ifndef GASKIT_MIXTURE_INTERNAL_H
#define GASKIT_MIXTURE_INTERNAL_H

#include "gk_internal.h"

/* Largest |sum of mole fractions - 1| accepted as "sums to 1" (the 1e-6 that mixture.h
   states; common practice for fractions given to six decimals). */
#define GK__MIXTURE_SUM_TOL GK_LIT(1e-6)

/**
 * Checks that @p mix is a usable composition. Tests, in this order:
 *  1. @p mix is NULL                                          -> GK_ERR_ARGUMENT
 *  2. count is 0 or above GK_MIXTURE_MAX                      -> GK_ERR_COMPOSITION
 *  3. a component gas (of the first count) is NULL            -> GK_ERR_ARGUMENT
 *  4. a mole fraction is NaN or outside [0, 1]                -> GK_ERR_COMPOSITION
 *  5. the fractions do not sum to 1 within 1e-6 (compensated
 *     summation, so 16 float fractions do not lose the budget) -> GK_ERR_COMPOSITION
 *  6. a component's molar mass is not finite or not > 0       -> GK_ERR_DOMAIN
 * The same gas listed twice is accepted here (it is harmless to every mixing rule);
 * gk_mixture_parse() rejects it in text. Critical data are not checked: a model that needs
 * them checks them itself. Reads only mix->gas[0 .. count-1] and their molar masses.
 * @return GK_OK when every test passes.
 */
gk_status gk__mixture_check(const gk_mixture *mix);

/* sum_i x_i M_i of a checked mixture (compensated summation), kg/mol; not checked (it may
   underflow to 0 for absurd molar masses). */
gk_real gk__mixture_molar_mass(const gk_mixture *mix);

#endif /* GASKIT_MIXTURE_INTERNAL_H */
