/*
 * eos_internal.h - the model layer (eos.c): the arithmetic of each equation of state for a pure
 * gas or a mixture, the solve of the cubic in Z and the choice of its root. Private, never
 * installed. It knows gases, mixtures and states, nothing of instruments or of gk_fluid; the
 * fluid layer (fluid.h) checks a fluid once and calls down into it.
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

/* Is eos one of gk_eos? Compared as unsigned: a negative value wraps above the last model, and
   the test stays meaningful where the enum is one unsigned byte (-fshort-enums, the
   arm-none-eabi default). */
static inline bool gk__eos_valid(gk_eos eos) {
    return (unsigned)eos <= (unsigned)GK_EOS_PENG_ROBINSON;
}

/* Is root a choice a caller may ask for? GK_ROOT_SUPERCRITICAL is a label of results only. */
static inline bool gk__root_valid(gk_root root) {
    return (unsigned)root <= (unsigned)GK_ROOT_LIQUID;
}

/* The gas data the model uses: GK_ERR_ARGUMENT for NULL, GK_ERR_DOMAIN for non-physical data
   (Tc, Pc not finite or not > 0, acentric factor not finite, vdw_a / vdw_b negative or not
   finite). The ideal gas uses none. eos is valid (gk__eos_valid). */
gk_status gk__eos_check_gas(gk_eos eos, const gk_gas *gas);

/* The interaction parameters of a mixture of n components: NULL (all 0), or n*n values, each
   finite and in [-1, 1], symmetric, with a zero diagonal; else GK_ERR_DOMAIN. */
gk_status gk__eos_check_kij(size_t n, const gk_real *kij);

/* Critical temperature of the model for a checked gas, K: the table's Tc, or for van der Waals
   with both handbook constants the model's own Tc = 8 a / (27 R b). */
gk_real gk__eos_tc(gk_eos eos, const gk_gas *gas);

/* Dimensionless A = a(T) p / (R T)^2 and B = b p / (R T) of a cubic model (not the ideal gas)
   at (p, T) > 0: of a checked pure gas, or of a checked mixture by the van der Waals one-fluid
   rules. GK_ERR_RANGE when A or B overflows or B underflows to 0. */
gk_status gk__eos_ab(gk_eos eos, const gk_gas *gas, gk_real p, gk_real t, gk_real *a_out,
                     gk_real *b_out);
gk_status gk__eos_mix_ab(gk_eos eos, const gk_mixture *mix, const gk_real *kij, gk_real p,
                         gk_real t, gk_real *a_out, gk_real *b_out);

/* The state of the ideal gas at (p, T) > 0: Z = 1, phi = 1, one root, branch GK_ROOT_GAS.
   GK_ERR_RANGE when R T / p overflows or underflows. */
gk_status gk__eos_ideal_state(gk_real p, gk_real t, gk_eos_result *out);

/* The state of a cubic model with the given A >= 0, B > 0 at (p, T) > 0: every root above B,
   the one asked for (root: GK_ROOT_STABLE, GAS or LIQUID), its phi and molar volume. A lone root
   is labelled GK_ROOT_SUPERCRITICAL when t > tc, else GK_ROOT_LIQUID when it is denser than the
   model's critical point, else GK_ROOT_GAS. Writes *out only on GK_OK; GK_ERR_RANGE when a
   result overflows or underflows, or when no root is found above B (one always exists; it then
   lies within rounding of B). */
gk_status gk__eos_cubic_state(gk_eos eos, gk_real a, gk_real b, gk_real p, gk_real t, gk_real tc,
                              gk_root root, gk_eos_result *out);

/* Pressure of a cubic model (not the ideal gas) for a checked pure gas at molar volume v > 0 and
   temperature t > 0 (statuses of gk_eos_pressure()). */
gk_status gk__eos_pressure(gk_eos eos, const gk_gas *gas, gk_real v, gk_real t, gk_real *out);

#endif /* GASKIT_EOS_INTERNAL_H */
