/*
 * bench_models.c - cost of one state of the reference-grade models (lib/helmholtz.h) beside a
 * Peng-Robinson state of gk_eos_solve on the same gas and the same states, in the same run.
 *
 * Each path does the whole job of a state (p, T -> Z, density or molar volume, fugacity
 * coefficient, stable root):
 *   Span-Wagner   : gk__hz_solve(model, p, T, GK_ROOT_STABLE) (the model built once per gas)
 *   Peng-Robinson : gk_eos_solve(GK_EOS_PENG_ROBINSON, gas, p, T, GK_ROOT_STABLE)
 *   hydrogen      : gk__h2_solve(p, T) (explicit equation)
 * States (fixed-seed generator): per gas, T uniform over [max(T_triple, 0.5 Tc) ... 600 K] and p
 * log-uniform over 10 kPa ... 30 MPa (gas, supercritical and, below Tc, liquid states); hydrogen
 * 200 ... 1000 K, 0.1 ... 100 MPa. Timing: best of REPEAT passes, ns per call; a volatile sink
 * keeps every result alive. Figures vary by about 20 % on a shared machine.
 */
#define _POSIX_C_SOURCE 199309L
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <time.h>
#include "gaskit/gaskit.h"
#include "../lib/helmholtz.h"
#include "../lib/hydrogen.h"

#define NSTATES 20000
#define REPEAT 30

static volatile double sink;
static double T[NSTATES], P[NSTATES];

static double now_ns(void) {
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return (double)ts.tv_sec * 1e9 + (double)ts.tv_nsec;
}

/* xorshift64 with a fixed seed: the same states on every run */
static uint64_t rng_state;
static double uniform01(void) {
    rng_state ^= rng_state << 13;
    rng_state ^= rng_state >> 7;
    rng_state ^= rng_state << 17;
    return (double)(rng_state >> 11) * (1.0 / 9007199254740992.0);
}

static void make_states(double t_lo, double t_hi, double p_lo, double p_hi) {
    rng_state = 0x9E3779B97F4A7C15ull;
    for (int i = 0; i < NSTATES; ++i) {
        T[i] = t_lo + (t_hi - t_lo) * uniform01();
        P[i] = p_lo * pow(p_hi / p_lo, uniform01());
    }
}

static double pass_sw(const gk__hz_model *m) {
    double s = 0.0;
    for (int i = 0; i < NSTATES; ++i) {
        gk_eos_result r;
        if (gk__hz_solve(m, (gk_real)P[i], (gk_real)T[i], GK_ROOT_STABLE, &r) == GK_OK) {
            s += (double)r.z + (double)r.fugacity_coefficient + (double)r.molar_volume.m3_per_mol;
        }
    }
    return s;
}

static double pass_pr(const gk_gas *gas) {
    double s = 0.0;
    for (int i = 0; i < NSTATES; ++i) {
        gk_eos_result r;
        gk_pressure p = { (gk_real)P[i] };
        gk_temperature t = { (gk_real)T[i] };
        if (gk_eos_solve(GK_EOS_PENG_ROBINSON, gas, p, t, GK_ROOT_STABLE, &r) == GK_OK) {
            s += (double)r.z + (double)r.fugacity_coefficient + (double)r.molar_volume.m3_per_mol;
        }
    }
    return s;
}

static double pass_h2(void) {
    double s = 0.0;
    for (int i = 0; i < NSTATES; ++i) {
        gk__h2_state r;
        if (gk__h2_solve((gk_real)P[i], (gk_real)T[i], &r) == GK_OK) {
            s += (double)r.z + (double)r.ln_phi + (double)r.molar_density;
        }
    }
    return s;
}

static int run_gas(const char *key) {
    const gk_gas *gas = NULL;
    gk__hz_model m;
    double best_sw = 1e300, best_pr = 1e300;
    if (gk_gas_find(key, &gas) != GK_OK || gk__sw_model_gas(gas, &m) != GK_OK) { return 1; }
    double t_lo = fmax((double)m.t_min * 1.001, 0.5 * (double)m.t_r);
    make_states(t_lo, 600.0, 1e4, 3e7);
    for (int rep = 0; rep < REPEAT; ++rep) {
        double t0 = now_ns();
        sink = pass_sw(&m);
        double t1 = now_ns();
        sink = pass_pr(gas);
        double t2 = now_ns();
        if (t1 - t0 < best_sw) { best_sw = t1 - t0; }
        if (t2 - t1 < best_pr) { best_pr = t2 - t1; }
    }
    printf("%-8s %7.0f ... 600 K  %10.1f %10.1f %8.2f\n", key, t_lo, best_sw / NSTATES,
           best_pr / NSTATES, best_sw / best_pr);
    return 0;
}

int main(void) {
    static const char *const gases[] = {
        "N2", "O2", "Ar", "CH4", "C2H6", "C3H8", "n-C4H10", "CO2"
    };
    double best_h2 = 1e300;
    printf("gaskit %s (%s build): reference-grade models against Peng-Robinson, same states\n",
           gk_version(), (gk_build_flags() & GK_BUILD_FLOAT) ? "float" : "double");
    printf("%d states per gas, p 10 kPa ... 30 MPa log-uniform, best of %d passes\n", NSTATES,
           REPEAT);
    printf("%-8s %16s  %10s %10s %8s\n", "gas", "T range", "SW ns", "PR ns", "SW/PR");
    for (size_t g = 0; g < sizeof gases / sizeof gases[0]; ++g) {
        if (run_gas(gases[g]) != 0) { return 1; }
    }
    make_states(200.0, 1000.0, 1e5, 1e8);
    for (int rep = 0; rep < REPEAT; ++rep) {
        double t0 = now_ns();
        sink = pass_h2();
        double t1 = now_ns();
        if (t1 - t0 < best_h2) { best_h2 = t1 - t0; }
    }
    printf("hydrogen equation (200 ... 1000 K, 0.1 ... 100 MPa): %.1f ns per state\n",
           best_h2 / NSTATES);
    return 0;
}
