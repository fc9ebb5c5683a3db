/*
 * plotdata.c - prints the data behind the guide's plots, computed by gaskit itself through
 * its public API. Built and run by make_plots.sh (not part of the test run).
 *
 *   plotdata z GAS T_K P_MIN_BAR P_MAX_BAR   columns: p/bar, Z ideal, vdW, RK, SRK, PR
 *   plotdata isotherm GAS T_K                columns: Vm/(L/mol), p/bar (van der Waals)
 *   plotdata roots GAS T_K P_BAR             one line per root: Vm/(L/mol), p/bar, Z
 *
 * A point a model cannot compute is printed as "?" (gnuplot leaves a gap) and its status
 * name goes to stderr.
 */
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gaskit/gaskit.h"

static const gk_gas *gas_or_die(const char *name) {
    const gk_gas *g = NULL;
    gk_status st = gk_gas_find(name, &g);
    if (st != GK_OK) {
        fprintf(stderr, "plotdata: gas %s: %s\n", name, gk_status_string(st));
        exit(1);
    }
    return g;
}

static int z_table(const gk_gas *g, double t_k, double p_min, double p_max) {
    static const gk_eos models[] = {GK_EOS_IDEAL, GK_EOS_VAN_DER_WAALS, GK_EOS_REDLICH_KWONG,
                                    GK_EOS_SOAVE_REDLICH_KWONG, GK_EOS_PENG_ROBINSON,
                                    GK_EOS_BEST /* the reference curve: Span-Wagner here */};
    const int steps = 200;
    int i;
    size_t m;
    gk_temperature t;
    t.k = (gk_real)t_k;
    printf("# p_bar Z_ideal Z_vdw Z_rk Z_srk Z_pr Z_reference (%s at %.2f K, stable root)\n",
           g->formula, t_k);
    for (i = 0; i <= steps; i++) {
        double p_bar = p_min + (p_max - p_min) * (double)i / (double)steps;
        gk_pressure p;
        p.pa = (gk_real)(p_bar * 1e5);
        printf("%.6g", p_bar);
        for (m = 0; m < sizeof models / sizeof models[0]; m++) {
            gk_eos_result r;
            gk_status st = gk_eos_solve(models[m], g, p, t, GK_ROOT_STABLE, &r);
            if (st == GK_OK) {
                printf(" %.8g", (double)r.z);
            } else {
                printf(" ?");
                fprintf(stderr, "plotdata: %g bar: %s\n", p_bar, gk_status_string(st));
            }
        }
        printf("\n");
    }
    return 0;
}

static int isotherm(const gk_gas *g, double t_k) {
    gk_temperature t;
    int i;
    t.k = (gk_real)t_k;
    printf("# Vm_L_per_mol p_bar (van der Waals, %s at %.2f K)\n", g->formula, t_k);
    /* molar volumes from just above the covolume to 1.2 L/mol, finer where the loop is */
    for (i = 0; i <= 600; i++) {
        double vm = 0.050 + (1.2 - 0.050) * (double)i / 600.0;
        gk_molar_volume v;
        gk_pressure p;
        gk_status st;
        v.m3_per_mol = (gk_real)(vm * 1e-3);
        st = gk_eos_pressure(GK_EOS_VAN_DER_WAALS, g, v, t, &p);
        if (st == GK_OK) printf("%.6g %.8g\n", vm, (double)p.pa / 1e5);
        else printf("%.6g ?\n", vm);
    }
    return 0;
}

static int roots(const gk_gas *g, double t_k, double p_bar) {
    gk_temperature t;
    gk_pressure p;
    gk_eos_result r;
    gk_status st;
    int i;
    t.k = (gk_real)t_k;
    p.pa = (gk_real)(p_bar * 1e5);
    st = gk_eos_solve(GK_EOS_VAN_DER_WAALS, g, p, t, GK_ROOT_STABLE, &r);
    if (st != GK_OK) {
        fprintf(stderr, "plotdata: roots: %s\n", gk_status_string(st));
        return 1;
    }
    printf("# Vm_L_per_mol p_bar Z (the %d roots; stable branch: %s)\n", r.root_count,
           r.branch == GK_ROOT_LIQUID ? "liquid" : "gas");
    for (i = 0; i < r.root_count && i < 3; i++) {
        double vm = (double)r.z_roots[i] * 8.314462618 * t_k / (p_bar * 1e5); /* Vm = Z R T / p */
        printf("%.8g %.8g %.8g\n", vm * 1e3, p_bar, (double)r.z_roots[i]);
    }
    return 0;
}

int main(int argc, char **argv) {
    if (argc == 6 && strcmp(argv[1], "z") == 0)
        return z_table(gas_or_die(argv[2]), atof(argv[3]), atof(argv[4]), atof(argv[5]));
    if (argc == 4 && strcmp(argv[1], "isotherm") == 0)
        return isotherm(gas_or_die(argv[2]), atof(argv[3]));
    if (argc == 5 && strcmp(argv[1], "roots") == 0)
        return roots(gas_or_die(argv[2]), atof(argv[3]), atof(argv[4]));
    fprintf(stderr, "usage: plotdata z GAS T_K PMIN_BAR PMAX_BAR | isotherm GAS T_K | roots GAS T_K P_BAR\n");
    return 2;
}
