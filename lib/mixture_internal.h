/*
 * mixture_internal.h - private: the one composition check shared by every module that takes a
 * gk_mixture (mixture molar mass, mixture equation of state, instrument calculations). Never
 * installed; the symbol is hidden in the shared library (cmake/gaskit.map exports gk_[a-z]*).
 */
#ifndef GASKIT_MIXTURE_INTERNAL_H
#define GASKIT_MIXTURE_INTERNAL_H

#include "gk_internal.h"

/* Largest |sum of mole fractions - 1| accepted as "sums to 1" (API.md: within 1e-6). */
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

/* ASCII lower case; no locale, no <ctype.h> (gas names and composition keywords). */
static inline char gk__ascii_lower(char c) {
    return (c >= 'A' && c <= 'Z') ? (char)(c - 'A' + 'a') : c;
}

/* gk_gas_find() on the n characters text[0 .. n) (no NUL needed; gases.c): the composition
   parser looks names up in place, without a copy on the stack. GK_OK (and *out) or
   GK_ERR_NOT_FOUND; the caller has checked text and out. */
gk_status gk__gas_find_n(const char *text, size_t n, const gk_gas **out);

#endif /* GASKIT_MIXTURE_INTERNAL_H */
