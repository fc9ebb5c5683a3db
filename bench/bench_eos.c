/*
 * bench_eos.c - speed and accuracy of gk_eos_solve against the same work done with GSL's
 * closed-form cubic solver gsl_poly_solve_cubic (GSL is used by this benchmark only).
 *
 * For every model and the same deterministic states (fixed-seed generator over
 * 0.45 < Tr < 3, 0.001 < Pr < 10, Pr log-uniform), each path does the whole job:
 *   gaskit : gk_eos_solve(model, gas, p, T, GK_ROOT_STABLE, &result)
 *   GSL    : A, B and the cubic's coefficients, gsl_poly_solve_cubic, the real roots above B,
 *            the fugacity choice between the outer roots, and the fugacity coefficient and the
 *            molar volume of the returned root.
 * Timing: each path runs over all states REPEAT times; the best of the repeats is reported as
 * ns per call; a volatile sink keeps every result alive.
 * Accuracy: the reference roots are the union of both paths' roots, each polished by Newton's
 * iteration in long double on coefficients formed in long double, merged when equal, and the
 * reference stable root is chosen by fugacity in long double. Reported: the maximum relative
 * error of the chosen Z of each path, over all states and away from the critical point
 * (|Tr - 1| > 0.01 or |Pr - 1| > 0.01), and the number of states where the path chose another
 * root than the reference.
 */
#define _POSIX_C_SOURCE 199309L
#include <math.h>
#include <stdio.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include <gsl/gsl_poly.h>
#include <gsl/gsl_version.h>
#include "gaskit/gaskit.h"

#define NSTATES 20000
#define REPEAT 60

static volatile double sink;

#define SQRT2 1.41421356237309504880 /* common practice */

/* fictional test gas: Tc 250 K, Pc 4 MPa, acentric factor 0.152 */
static const double TC = 250.0, PC = 4.0e6, OMEGA = 0.152;

typedef struct model { gk_eos eos; const char *name; double oa, ob, u, w; } model;
/* constants as in lib/eos.c (van der Waals; Redlich and Kwong 1949; Soave 1972; Peng and Robinson
   1976) */
static const model MODELS[] = {
    {GK_EOS_VAN_DER_WAALS, "van der Waals", 27.0 / 64.0, 0.125, 0, 0},
    {GK_EOS_REDLICH_KWONG, "Redlich-Kwong", 0.42748, 0.08664, 1, 0},
    {GK_EOS_SOAVE_REDLICH_KWONG, "Soave-Redlich-Kwong", 0.42748, 0.08664, 1, 0},
    {GK_EOS_PENG_ROBINSON, "Peng-Robinson", 0.45724, 0.07780, 2, -1},
};

static double alpha_d(gk_eos eos, double tr) {
    double m, s;
    switch (eos) {
    case GK_EOS_REDLICH_KWONG: return 1.0 / sqrt(tr);
    case GK_EOS_SOAVE_REDLICH_KWONG: m = 0.480 + (1.574 - 0.176 * OMEGA) * OMEGA; break;
    case GK_EOS_PENG_ROBINSON: m = 0.37464 + (1.54226 - 0.26992 * OMEGA) * OMEGA; break;
    default: return 1.0;
    }
    s = 1.0 + m * (1.0 - sqrt(tr));
    return s * s;
}

static long double alpha_l(gk_eos eos, long double tr) {
    long double m, s, w = (long double)OMEGA;
    switch (eos) {
    case GK_EOS_REDLICH_KWONG: return 1.0L / sqrtl(tr);
    case GK_EOS_SOAVE_REDLICH_KWONG: m = 0.480L + (1.574L - 0.176L * w) * w; break;
    case GK_EOS_PENG_ROBINSON: m = 0.37464L + (1.54226L - 0.26992L * w) * w; break;
    default: return 1.0L;
    }
    s = 1.0L + m * (1.0L - sqrtl(tr));
    return s * s;
}

static double lnphi_d(const model *m, double a, double b, double z) {
    double base = z - 1.0 - log(z - b);
    if (m->u < 0.5) return base - a / z;
    if (m->u < 1.5) return base - a / b * log1p(b / z);
    return base - a / (2.0 * SQRT2 * b) * log((z + (1.0 + SQRT2) * b) / (z + (1.0 - SQRT2) * b));
}

static long double lnphi_l(const model *m, long double a, long double b, long double z) {
    const long double s2 = 1.41421356237309504880L;
    long double base = z - 1.0L - logl(z - b);
    if (m->u < 0.5) return base - a / z;
    if (m->u < 1.5) return base - a / b * log1pl(b / z);
    return base - a / (2.0L * s2 * b) * logl((z + (1.0L + s2) * b) / (z + (1.0L - s2) * b));
}

/* The GSL-based path: the same job as gk_eos_solve(..., GK_ROOT_STABLE, ...). */
static double gsl_solve(const model *m, double t, double p, double *phi_out, double *vm_out) {
    double tr = t / TC, pr = p / PC;
    double a = m->oa * alpha_d(m->eos, tr) * pr / (tr * tr), b = m->ob * pr / tr;
    double c2 = -(1.0 + b - m->u * b);
    double c1 = a - b * (m->u + (m->u - m->w) * b);
    double c0 = -b * (a + m->w * b * (1.0 + b));
    double x[3], r[3], z, lp;
    int n = gsl_poly_solve_cubic(c2, c1, c0, &x[0], &x[1], &x[2]), k = 0;
    for (int i = 0; i < n; ++i)
        if (x[i] > b) r[k++] = x[i];
    if (k == 0) return NAN;
    z = r[k - 1];
    lp = lnphi_d(m, a, b, z);
    if (k > 1) {
        double ll = lnphi_d(m, a, b, r[0]);
        if (ll < lp) { z = r[0]; lp = ll; }
    }
    *phi_out = exp(lp);
    *vm_out = z * 8.314462618 * t / p;
    return z;
}

/* Newton polish in long double of a root of the long double cubic. */
static long double polish(long double c2, long double c1, long double c0, long double z) {
    for (int i = 0; i < 60; ++i) {
        long double f = ((z + c2) * z + c1) * z + c0;
        long double d = (3.0L * z + 2.0L * c2) * z + c1;
        if (d == 0.0L) break;
        long double zn = z - f / d;
        if (zn == z) break;
        z = zn;
    }
    return z;
}

/* Reference stable Z: union of candidate roots, polished, merged; lower fugacity of the outer. */
static long double reference(const model *m, double t, double p, const double *cand, int nc) {
    long double tr = (long double)t / TC, pr = (long double)p / PC;
    long double a = (long double)m->oa * alpha_l(m->eos, tr) * pr / (tr * tr);
    long double b = (long double)m->ob * pr / tr;
    long double u = (long double)m->u, w = (long double)m->w;
    long double c2 = -(1.0L + b - u * b), c1 = a - b * (u + (u - w) * b);
    long double c0 = -b * (a + w * b * (1.0L + b));
    long double lo = 1e30L, hi = -1e30L;
    for (int i = 0; i < nc; ++i) {
        if (!(cand[i] > 0.0)) continue;
        long double z = polish(c2, c1, c0, (long double)cand[i]);
        if (!(z > b)) continue;
        if (z < lo) lo = z;
        if (z > hi) hi = z;
    }
    if (hi - lo <= 1e-12L * hi) return hi;
    return lnphi_l(m, a, b, lo) < lnphi_l(m, a, b, hi) ? lo : hi;
}

static double now_ns(void) {
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return (double)ts.tv_sec * 1e9 + (double)ts.tv_nsec;
}

/* xorshift64 with a fixed seed: the same states on every run */
static uint64_t rng_state = 0x9E3779B97F4A7C15ull;
static double uniform01(void) {
    rng_state ^= rng_state << 13;
    rng_state ^= rng_state >> 7;
    rng_state ^= rng_state << 17;
    return (double)(rng_state >> 11) * (1.0 / 9007199254740992.0);
}

static double T[NSTATES], P[NSTATES];

static void make_states(double tr_lo, double tr_hi, double pr_lo, double pr_hi) {
    rng_state = 0x9E3779B97F4A7C15ull;
    for (int i = 0; i < NSTATES; ++i) {
        double tr = tr_lo + (tr_hi - tr_lo) * uniform01();
        double pr = pr_lo * pow(pr_hi / pr_lo, uniform01());
        T[i] = tr * TC;
        P[i] = pr * PC;
    }
}

#if defined(__GNUC__)
#  define BENCH_NOINLINE __attribute__((noinline))
#else
#  define BENCH_NOINLINE
#endif

/* One pass of each path over the states, in functions of their own, so that an instruction
   counter sees each path's inclusive cost apart (`--ir`, see bench/ir.sh):
   valgrind --tool=callgrind ./bench_eos --ir [model] ; callgrind_annotate --inclusive=yes. */
BENCH_NOINLINE static double pass_gaskit(const model *m, const gk_gas *gas) {
    double s = 0.0;
    for (int i = 0; i < NSTATES; ++i) {
        gk_eos_result r;
        gk_pressure p = {(gk_real)P[i]};
        gk_temperature t = {(gk_real)T[i]};
        if (gk_eos_solve(m->eos, gas, p, t, GK_ROOT_STABLE, &r) == GK_OK)
            s += (double)r.z + (double)r.fugacity_coefficient + (double)r.molar_volume.m3_per_mol;
    }
    return s;
}

BENCH_NOINLINE static double pass_gsl(const model *m) {
    double s = 0.0;
    for (int i = 0; i < NSTATES; ++i) {
        double phi = 0, vm = 0;
        s += gsl_solve(m, T[i], P[i], &phi, &vm) + phi + vm;
    }
    return s;
}

/* Times and checks the models [first, last] of MODELS over NSTATES states drawn (fixed seed)
   from tr_lo < Tr < tr_hi, pr_lo < Pr < pr_hi (Pr log-uniform); prints one row per model. */
static int run_table(size_t first, size_t last, double tr_lo, double tr_hi, double pr_lo, double pr_hi) {
    gk_gas gas = {"bench gas", "X", {(gk_real)0.030}, {(gk_real)TC}, {(gk_real)PC}, (gk_real)OMEGA,
                  0, 0, 0, 0};
    make_states(tr_lo, tr_hi, pr_lo, pr_hi);
    printf("\n%d states, %g < Tr < %g, %g < Pr < %g (fixed seed), %d repeats\n", NSTATES, tr_lo, tr_hi,
           pr_lo, pr_hi, REPEAT);
    printf("%-20s %10s %10s %7s %7s | %10s %10s %5s | %10s %10s %5s\n", "model", "gaskit ns", "GSL ns",
           "ratio", "median", "gaskit err", "off-crit", "wrong", "GSL err", "off-crit", "wrong");
    for (size_t mi = first; mi <= last; ++mi) {
        const model *m = &MODELS[mi];
        double best_gk = 1e300, best_gsl = 1e300, ratios[REPEAT];
        for (int rep = 0; rep < REPEAT; ++rep) {
            double t0 = now_ns();
            sink = pass_gaskit(m, &gas);
            double t1 = now_ns();
            sink = pass_gsl(m);
            double t2 = now_ns();
            if (t1 - t0 < best_gk) best_gk = t1 - t0;
            if (t2 - t1 < best_gsl) best_gsl = t2 - t1;
            ratios[rep] = (t1 - t0) / (t2 - t1);
        }
        /* median of the per-repeat ratios: both paths timed back to back, robust to load changes */
        for (int a = 1; a < REPEAT; ++a)
            for (int b = a; b > 0 && ratios[b - 1] > ratios[b]; --b) {
                double tmp = ratios[b]; ratios[b] = ratios[b - 1]; ratios[b - 1] = tmp;
            }
        double median_ratio = ratios[REPEAT / 2];
        double egk = 0, egk_off = 0, egsl = 0, egsl_off = 0;
        int wgk = 0, wgsl = 0;
        for (int i = 0; i < NSTATES; ++i) {
            gk_eos_result r;
            gk_pressure p = {(gk_real)P[i]};
            gk_temperature t = {(gk_real)T[i]};
            double phi, vm, cand[6] = {0, 0, 0, 0, 0, 0};
            double zg = gsl_solve(m, T[i], P[i], &phi, &vm);
            double x[3] = {0, 0, 0};
            double tr = T[i] / TC, pr = P[i] / PC;
            double a = m->oa * alpha_d(m->eos, tr) * pr / (tr * tr), b = m->ob * pr / tr;
            int n = gsl_poly_solve_cubic(-(1.0 + b - m->u * b), a - b * (m->u + (m->u - m->w) * b),
                                         -b * (a + m->w * b * (1.0 + b)), &x[0], &x[1], &x[2]);
            for (int k = 0; k < n; ++k) cand[k] = x[k];
            if (gk_eos_solve(m->eos, &gas, p, t, GK_ROOT_STABLE, &r) != GK_OK) {
                printf("gk_eos_solve failed at T %.17g p %.17g\n", T[i], P[i]);
                return 1;
            }
            for (int k = 0; k < r.root_count; ++k) cand[3 + k] = (double)r.z_roots[k];
            long double zref = reference(m, T[i], P[i], cand, 6);
            double e1 = (double)fabsl(((long double)r.z - zref) / zref);
            double e2 = (double)fabsl(((long double)zg - zref) / zref);
            if (!(e2 <= 1e300)) e2 = 1.0; /* GSL found no root above B */
            int off = fabs(tr - 1.0) > 0.01 || fabs(pr - 1.0) > 0.01;
            if (e1 > egk) egk = e1;
            if (e2 > egsl) egsl = e2;
            if (off && e1 > egk_off) egk_off = e1;
            if (off && e2 > egsl_off) egsl_off = e2;
            if (e1 > 1e-3) ++wgk;
            if (e2 > 1e-3) ++wgsl;
        }
        printf("%-20s %10.1f %10.1f %7.2f %7.2f | %10.3g %10.3g %5d | %10.3g %10.3g %5d\n", m->name,
               best_gk / NSTATES, best_gsl / NSTATES, best_gk / best_gsl, median_ratio, egk, egk_off,
               wgk, egsl, egsl_off, wgsl);
    }
    return 0;
}

int main(int argc, char **argv) {
    if (argc > 1 && strcmp(argv[1], "--ir") == 0) {
        /* one pass of each path over the goal's states (for an instruction counter, no timing) */
        gk_gas gas = {"bench gas", "X", {(gk_real)0.030}, {(gk_real)TC}, {(gk_real)PC},
                      (gk_real)OMEGA, 0, 0, 0, 0};
        int mi = argc > 2 ? atoi(argv[2]) : 3;
        double tr_lo = 0.45, tr_hi = 3.0, pr_hi = 10.0;
        if (mi < 0 || mi > 3) mi = 3;
        if (argc > 3 && strcmp(argv[3], "low") == 0) { tr_lo = 0.3; tr_hi = 0.45; pr_hi = 1.0; }
        make_states(tr_lo, tr_hi, 0.001, pr_hi);
        sink = pass_gaskit(&MODELS[mi], &gas);
        sink = pass_gsl(&MODELS[mi]);
        printf("%s: one pass of each path over %d states\n", MODELS[mi].name, NSTATES);
        return 0;
    }
    printf("gaskit %s (%s build) vs gsl_poly_solve_cubic (GSL %s)\n", gk_version(),
           (gk_build_flags() & GK_BUILD_FLOAT) ? "float" : "double", GSL_VERSION);
    printf("reference: roots of both paths polished by Newton in long double (%d-bit mantissa)\n",
           (int)(sizeof(long double) > 8 ? 64 : 53));
    printf("fictional gas: Tc %g K, Pc %g Pa, acentric factor %g\n", TC, PC, OMEGA);
    if (run_table(0, 3, 0.45, 3.0, 0.001, 10.0)) return 1;
    /* low reduced temperature, where closed forms lose the small liquid root */
    if (run_table(3, 3, 0.3, 0.45, 0.001, 1.0)) return 1;
    printf("\nns = best of the repeats; ratio = best gaskit / best GSL-based time; median = median of\n"
           "the per-repeat ratios (goal for Peng-Robinson <= 0.8, stretch 0.6);\n"
           "err = max relative error of the chosen Z; wrong = states where the chosen Z is off by\n"
           "more than 1e-3 (another root than the reference stable root).\n");
    return 0;
}
