/*
 * bench_batch.c - cost of the batch calls of batch.h per element.
 *
 * 1. gk_ideal_density_batch() against a bare loop doing the same arithmetic, (p / R)(M / T),
 *    over the same arrays, for arrays that fit the cache and for 10^6 elements; prints ns per
 *    element of each and their ratio (goal: at most 1.5).
 * 2. gk_fluid_density_batch() for 10^6 states of an invented fuel-gas mixture under
 *    Peng-Robinson and, in a library with the reference-grade models, under GK_EOS_BEST (the
 *    Span-Wagner multi-fluid form for these components), in ns per element: the C figures
 *    beside which the Python benchmark prints its own
 *    (bindings-examples/python/examples/bench_numpy.py).
 * Timing: the best of several repeats (CLOCK_MONOTONIC); a volatile sink keeps results alive.
 * Build it with the library's own flags (CMAKE_BUILD_TYPE=Release): the comparison is only
 * meaningful when both loops get the same optimisation. Figures are printed, never asserted;
 * the program fails only when the batch and the bare loop disagree in a single bit.
 *
 * Usage: bench_batch [elements for part 2, default 1000000]
 */
#define _POSIX_C_SOURCE 199309L
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include "gaskit/gaskit.h"

static volatile double sink;

static double now_s(void) {
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return (double)ts.tv_sec + 1e-9 * (double)ts.tv_nsec;
}

/* The bare loop: the arithmetic of the batch call and nothing else. */
__attribute__((noinline)) static void bare_loop(size_t n, const gk_real *p, const gk_real *t,
                                                gk_real m, gk_real *out) {
    for (size_t i = 0; i < n; ++i) { out[i] = (p[i] / GK_R) * (m / t[i]); }
}

/* Fixed-seed generator (xorshift64*), uniform in [0, 1). */
static unsigned long long rng_state = 0x9E3779B97F4A7C15ull;
static double uniform(void) {
    rng_state ^= rng_state >> 12;
    rng_state ^= rng_state << 25;
    rng_state ^= rng_state >> 27;
    return (double)((rng_state * 2685821657736338717ull) >> 11) * 0x1p-53;
}

/* Invented readings of a fictional compressor-station log: 1-80 bar, -20 to 60 degC. */
static void fill_states(size_t n, gk_real *p, gk_real *t) {
    for (size_t i = 0; i < n; ++i) {
        p[i] = (gk_real)(1e5 + 79e5 * uniform());
        t[i] = (gk_real)(253.15 + 80.0 * uniform());
    }
}

static int ideal_part(size_t n, int repeats) {
    gk_real *p = malloc(n * sizeof *p), *t = malloc(n * sizeof *t);
    gk_real *a = malloc(n * sizeof *a), *b = malloc(n * sizeof *b);
    gk_status *st = malloc(n * sizeof *st);
    const gk_molar_mass m = { (gk_real)28.9644e-3 }; /* air, ISO 2533:1975 */
    double best_bare = 1e30, best_batch = 1e30, best_nostat = 1e30;
    int bad = 0;
    if (!p || !t || !a || !b || !st) { return 1; }
    fill_states(n, p, t);
    for (int r = 0; r < repeats; ++r) {
        double t0 = now_s();
        bare_loop(n, p, t, m.kg_per_mol, a);
        double t1 = now_s();
        size_t ok = gk_ideal_density_batch(n, p, t, m, b, st);
        double t2 = now_s();
        (void)gk_ideal_density_batch(n, p, t, m, b, NULL);
        double t3 = now_s();
        if (t1 - t0 < best_bare) { best_bare = t1 - t0; }
        if (t2 - t1 < best_batch) { best_batch = t2 - t1; }
        if (t3 - t2 < best_nostat) { best_nostat = t3 - t2; }
        if (ok != n || memcmp(a, b, n * sizeof *a) != 0) { bad = 1; }
        sink += (double)a[n / 2] + (double)b[n / 3];
    }
    printf("ideal density, %8zu elements: bare loop %6.3f ns, batch %6.3f ns (ratio %.2f), "
           "batch without statuses %6.3f ns (ratio %.2f)%s\n",
           n, 1e9 * best_bare / (double)n, 1e9 * best_batch / (double)n, best_batch / best_bare,
           1e9 * best_nostat / (double)n, best_nostat / best_bare, bad ? "  RESULTS DIFFER" : "");
    free(p);
    free(t);
    free(a);
    free(b);
    free(st);
    return bad;
}

static int mixture_part(size_t n, gk_eos eos, const char *label) {
    /* an invented pipeline-quality fuel gas of a fictional compressor station */
    static const char *const text = "CH4=0.90, C2H6=0.05, C3H8=0.01, N2=0.025, CO2=0.015";
    gk_mixture mix;
    gk_real *p = malloc(n * sizeof *p), *t = malloc(n * sizeof *t), *rho = malloc(n * sizeof *rho);
    gk_status *st = malloc(n * sizeof *st);
    double best = 1e30;
    size_t ok = 0;
    if (!p || !t || !rho || !st || gk_mixture_parse(text, &mix) != GK_OK) { return 1; }
    fill_states(n, p, t);
    for (int r = 0; r < 3; ++r) {
        double t0 = now_s();
        ok = gk_fluid_density_batch(eos, (gk_fluid){ NULL, &mix, NULL }, n, p, t, rho, st);
        double t1 = now_s();
        if (t1 - t0 < best) { best = t1 - t0; }
        sink += (double)rho[n / 2];
    }
    printf("%s density of a 5-component mixture, C batch (gk_fluid_density_batch), "
           "%zu elements: %.1f ns per element (%zu ok)\n",
           label, n, 1e9 * best / (double)n, ok);
    free(p);
    free(t);
    free(rho);
    free(st);
    return ok == n ? 0 : 1;
}

int main(int argc, char **argv) {
    size_t n_mix = (argc > 1) ? (size_t)strtoull(argv[1], NULL, 10) : 1000000u;
    int bad = 0;
    printf("gaskit %s, gk_real is %s\n", gk_version(),
           (gk_build_flags() & GK_BUILD_FLOAT) ? "float" : "double");
    bad |= ideal_part(1000, 20000);
    bad |= ideal_part(100000, 200);
    bad |= ideal_part(1000000, 20);
    if (n_mix > 0u) { bad |= mixture_part(n_mix, GK_EOS_PENG_ROBINSON, "Peng-Robinson"); }
#if defined(GK_REFERENCE_MODELS) && GK_REFERENCE_MODELS
    /* every component has Span-Wagner coefficients: GK_EOS_BEST takes the multi-fluid form */
    if (n_mix > 0u) { bad |= mixture_part(n_mix, GK_EOS_BEST, "Reference-grade"); }
#endif
    return bad;
}
