/*
 * fluid.h - the fluid layer: a gas or a mixture under one model, checked once. Private, never
 * installed.
 *
 * gk__fluid_init() makes every check that depends on the fluid alone (the model, exactly one of
 * gas and mixture, the composition, each component's data for the model, the interaction
 * parameters) and keeps what every state needs (molar mass, the critical or pseudo-critical
 * temperature). The state calls then check only the state (p, T, root) and go down to the model
 * layer (eos_internal.h): public function -> fluid -> model -> cubic solver, and back up once.
 *
 * A gk__fluid lives on the caller's stack and points to the caller's gas, mixture and k_ij: it
 * is valid while they are.
 *
 * Adding a model: gk__fluid_state() (fluid.c) is the one dispatch on the model; a new family
 * gets its case there, its data check in gk__fluid_init() and, if it has a pressure explicit in
 * volume, its case in gk__fluid_pressure().
 */
#ifndef GASKIT_FLUID_H
#define GASKIT_FLUID_H

#include "gk_internal.h"

typedef struct gk__fluid {
    const gk_gas *gas;     /* the pure gas, or NULL */
    const gk_mixture *mix; /* the mixture, or NULL */
    const gk_real *kij;    /* with a mixture: count*count interaction parameters, or NULL */
    gk_real molar_mass;    /* kg/mol: the gas's as given, or sum x_i M_i of the mixture */
    gk_real tc;            /* K: the model's critical temperature, for a mixture sum x_i Tc_i
                              (Span-Wagner: the reducing temperature of the gas or mixture) */
    gk_eos eos;            /* the model that serves (GK_EOS_BEST resolved at init) */
} gk__fluid;

/* Checks the fluid once and fills *f (only on GK_OK). In this order: eos not a model, or not
   exactly one of gas and mix -> GK_ERR_ARGUMENT; the composition (gk__mixture_check()); each
   gas's data for the model (gk__eos_check_gas(); Span-Wagner and hydrogen: coefficients for
   every gas, else GK_ERR_NOT_FOUND); k_ij (gk__eos_check_kij()). GK_EOS_BEST is resolved here
   (helmholtz.h covers the gas or every component: Span-Wagner; hydrogen: its equation; else
   Peng-Robinson). The molar mass of a pure gas is not checked here (a state does not need it):
   see gk__fluid_molar_mass(). */
gk_status gk__fluid_init(gk__fluid *f, gk_eos eos, const gk_gas *gas, const gk_mixture *mix,
                         const gk_real *kij);

/* The state at (p, T) with the chosen root: GK_ERR_ARGUMENT for a root that is not an input
   choice, GK_ERR_DOMAIN for p or T not finite or not > 0, else the statuses of the model
   (gk_eos_solve()). Writes *out only on GK_OK. */
gk_status gk__fluid_state(const gk__fluid *f, gk_pressure p, gk_temperature t, gk_root root,
                          gk_eos_result *out);

/* Z of the stable state at (p, T), which must be gas or supercritical: GK_ERR_RANGE when it is
   liquid (the stable root of two or three, or a lone root below Tc denser than the model's
   critical point). Statuses otherwise as gk__fluid_state(). */
gk_status gk__fluid_gas_z(const gk__fluid *f, gk_pressure p, gk_temperature t, gk_real *z);

/* Molar mass, kg/mol: GK_ERR_DOMAIN for a pure gas whose molar mass is not finite or not > 0,
   GK_ERR_RANGE for a mixture whose mean underflows to 0. */
gk_status gk__fluid_molar_mass(const gk__fluid *f, gk_real *m);

/* Pressure at molar volume vm and temperature t (a pure gas only; GK_ERR_ARGUMENT for a
   mixture). Statuses as gk_eos_pressure(). */
gk_status gk__fluid_pressure(const gk__fluid *f, gk_molar_volume vm, gk_temperature t,
                             gk_pressure *out);

#endif /* GASKIT_FLUID_H */
