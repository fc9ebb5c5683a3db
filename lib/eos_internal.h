/*
 * eos_internal.h - private interface shared by the equation-of-state modules (eos.c, eos_vdw.c,
 * eos_mixture.c, eos_batch.c). Never installed.
 *
 * Every cubic model is written in the generic two-parameter form
 *     p = R T / (Vm - b) - a(T) / (Vm^2 + u b Vm + w b^2)
 * and, with A = a p / (R T)^2, B = b p / (R T), Z = p Vm / (R T), as the cubic in Z
 *     f(Z) = (Z - 1 - B) D(Z) + A (Z - B) = 0,   D(Z) = Z^2 + u B Z + w B^2
 *          = Z^3 - (1 + B - u B) Z^2 + (A - B (u + (u - w) B)) Z - B (A + w B (1 + B)).
 * (u, w) = (0, 0) van der Waals, (1, 0) Redlich-Kwong and Soave, (2, -1) Peng-Robinson.
 * Since f(B) = -D(B) < 0, f(1 + B) = A > 0 and f > 0 above 1 + B when A >= 0, every real root
 * above the covolume lies in (B, 1 + B), and there is always at least one.
 */
#ifndef GASKIT_EOS_INTERNAL_H
#define GASKIT_EOS_INTERNAL_H

#include "gk_internal.h"

/* The cubic families: the (u, w) of the denominator and the form of ln(phi). */
typedef enum gk__cubic_family {
    GK__FAMILY_VDW, /* u = 0, w = 0 */
    GK__FAMILY_RK,  /* u = 1, w = 0 (Redlich-Kwong, Soave-Redlich-Kwong) */
    GK__FAMILY_PR   /* u = 2, w = -1 (Peng-Robinson) */
} gk__cubic_family;

/* Is eos one of gk_eos? Compared as unsigned: a negative value wraps above the last model, and
   the test stays meaningful where the enum is one unsigned byte (-fshort-enums, the
   arm-none-eabi default). The one check of every module (eos, mixture, instrument). */
static inline int gk__eos_valid(gk_eos eos) {
    return ((unsigned)eos <= (unsigned)GK_EOS_PENG_ROBINSON) ? 1 : 0;
}

/* Checks the gas data a model uses: GK_ERR_ARGUMENT for NULL, GK_ERR_DOMAIN for non-physical
   data (Tc, Pc not finite or not > 0, acentric factor not finite, vdw_a / vdw_b negative or not
   finite). The ideal gas uses no gas data (only the molar mass, checked by the density paths). */
gk_status gk__eos_check_gas(gk_eos eos, const gk_gas *gas);

/* Dimensionless A = a(T) p / (R T)^2 and B = b p / (R T) of a pure gas at (p, T). The caller has
   checked eos (not ideal), gas (gk__eos_check_gas) and p, T (finite, > 0).
   GK_ERR_RANGE when A or B overflows. */
gk_status gk__eos_ab(gk_eos eos, const gk_gas *gas, gk_real p, gk_real t, gk_real *a_out,
                     gk_real *b_out);

/* Solves the cubic of a family with the given A >= 0, B > 0 at (p, T) and fills a complete
   result (into *out only on GK_OK). GK_ERR_RANGE when a result overflows or underflows, or when
   no root is found above B (one always exists; it then lies within rounding of B). */
gk_status gk__eos_solve_ab(gk__cubic_family family, gk_real vc_over_b, gk_real a, gk_real b,
                           gk_real p, gk_real t, gk_root root, gk_eos_result *out);

/* Ideal-gas result at (p, T): Z = 1, phi = 1, one root. GK_ERR_RANGE on overflow. */
gk_status gk__eos_ideal(gk_real p, gk_real t, gk_eos_result *out);

/* Validity of p, T and root (shared by the solve paths). */
gk_status gk__eos_check_state(gk_pressure p, gk_temperature t, gk_root root);

/* The two halves of gk_eos_solve() and gk_mixture_eos_solve(), so that a caller that solves a
   state for its own use (the instrument functions) calls the cubic-EOS solve directly, without
   the public solver's frame on the stack (firmware stack budget):
   - gk__eos_prepare(): every check of gk_eos_solve() but the one of out, in the same order,
     and A, B into ab[0], ab[1] (ab untouched for the ideal gas);
   - gk__mixture_eos_prepare() (eos_mixture.c): the same for gk_mixture_eos_solve(), with the
     mixture and k_ij of fluid (fluid->gas is not read; four register arguments, so a caller
     passes none on the stack);
   - gk__eos_finish(): the ideal-gas result or the solve with those A, B; writes *out only on
     GK_OK. ab may point into *out (the instrument functions stage A, B in out->z_roots): both
     are read before *out is written. */
gk_status gk__eos_prepare(gk_eos eos, const gk_gas *gas, gk_pressure p, gk_temperature t,
                          gk_root root, gk_real ab[2]);
gk_status gk__mixture_eos_prepare(gk_eos eos, const gk_fluid *fluid, gk_pressure p,
                                  gk_temperature t, gk_root root, gk_real ab[2]);
gk_status gk__eos_finish(gk_eos eos, const gk_real ab[2], gk_pressure p, gk_temperature t,
                         gk_root root, gk_eos_result *out);

#endif /* GASKIT_EOS_INTERNAL_H */
