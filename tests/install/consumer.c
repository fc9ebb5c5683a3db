/* consumer.c - links an installed gaskit and checks one published value: the molar volume of
   an ideal gas at 273.15 K and 101.325 kPa, 22.41396954e-3 m3/mol (CODATA 2018). */
#include <math.h>
#include <stdio.h>
#include <gaskit/gaskit.h>

int main(void) {
    gk_pressure p;
    gk_temperature t;
    gk_molar_volume vm;
    if (gk_pressure_from(101.325, GK_UNIT_KPA, &p) != GK_OK ||
        gk_temperature_from(0.0, GK_UNIT_DEGC, &t) != GK_OK ||
        gk_ideal_molar_volume(p, t, &vm) != GK_OK) {
        fputs("consumer: a gaskit call failed\n", stderr);
        return 1;
    }
    /* tolerance 1e-6 relative: holds in a float build too */
    if (fabs((double)vm.m3_per_mol / 22.41396954e-3 - 1.0) > 1e-6) {
        fprintf(stderr, "consumer: molar volume %.10g m3/mol, expected 22.41396954e-3\n",
                (double)vm.m3_per_mol);
        return 1;
    }
    printf("consumer: gaskit %s, molar volume %.8g m3/mol: ok\n", gk_version(), (double)vm.m3_per_mol);
    return 0;
}
