/* EVA driver: the state path of the equations of state (fluid.c, eos.c, eos_vdw.c, the cubic
   solver, the reference-grade models): gk_eos_solve, gk_eos_pressure and gk_eos_density for every
   gas of the table, every model (and one past each end), any p, T, Vm and root choice. Annex F
   policy, as the solvers it calls; every GK_OK result is asserted finite. */
#include "sound.h"

static void state_gas(const gk_gas *gas) {
    gk_eos_result r;
    gk_pressure p = { sound_any_real() };
    gk_temperature t = { sound_any_real() };
    gk_molar_volume vm = { sound_any_real() };
    gk_pressure po = { 0 };
    gk_density rho = { 0 };
    gk_eos eos = SOUND_ENUM(gk_eos, 8);
    gk_status s;
    s = gk_eos_solve(eos, gas, p, t, SOUND_ENUM(gk_root, 4), &r);
    SOUND_OK_FINITE(s, r.z);
    SOUND_OK_FINITE(s, r.fugacity_coefficient);
    SOUND_OK_FINITE(s, r.molar_volume.m3_per_mol);
    s = gk_eos_pressure(eos, gas, vm, t, &po);
    SOUND_OK_FINITE(s, po.pa);
    s = gk_eos_density(eos, gas, p, t, &rho);
    SOUND_OK_FINITE(s, rho.kg_per_m3);
}

int main(void) {
    size_t i;
    size_t n = gk_gas_count();
    /*@ loop unroll 64; */
    for (i = 0; i < n; ++i) { state_gas(gk_gas_at(i)); }
    return 0;
}
