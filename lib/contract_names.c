/*
 * contract_names.c - the symbol gk_mass_flow for foreign callers.
 *
 * The API contract names a function gk_mass_flow, but C cannot declare a function with the
 * name of the gk_mass_flow typedef. C and C++ callers use the function-like macro
 * gk_mass_flow(...) of instrument.h, which expands to gk_flow_to_mass(...). Callers that bind
 * by symbol name (Python ctypes, Go, Rust, ...) find gk_mass_flow here: on ELF targets built
 * with GCC or clang, an assembler label gives this thin wrapper that exact symbol name. Other
 * targets bind gk_flow_to_mass.
 */
#include "gk_internal.h"

#if defined(__GNUC__) && defined(__ELF__)
GK_API gk_status gk__mass_flow_symbol(gk_eos eos, gk_fluid fluid, gk_volume_flow actual,
                                      gk_pressure p, gk_temperature t,
                                      gk_mass_flow *out) __asm__("gk_mass_flow");

gk_status gk__mass_flow_symbol(gk_eos eos, gk_fluid fluid, gk_volume_flow actual, gk_pressure p,
                               gk_temperature t, gk_mass_flow *out) {
    return gk_flow_to_mass(eos, fluid, actual, p, t, out);
}
#else
/* ISO C forbids an empty translation unit. */
typedef int gk_contract_names_unused;
#endif
