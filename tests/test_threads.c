/*
 * test_threads.c - the library is reentrant: several threads call the solvers at once.
 *
 * The main thread first computes a table of results (statuses and values) alone; then
 * GK_THREADS threads recompute the same table GK_ROUNDS times each, concurrently, and every
 * result must be bit-for-bit the single-thread one (same inputs, same code, no shared mutable
 * state, so nothing may differ). CI also runs this test under ThreadSanitizer, which reports any
 * data race inside the library.
 */
#define _POSIX_C_SOURCE 200809L
#include <pthread.h>
#include <string.h>
#include "gk_test.h"

#define GK_THREADS 4
#define GK_ROUNDS 8
#define GK_MAX_RESULTS 4096

typedef struct results {
    size_t count;
    int status[GK_MAX_RESULTS];
    gk_real value[GK_MAX_RESULTS];
} results;

static void record(results *r, gk_status s, gk_real v) {
    if (r->count < GK_MAX_RESULTS) {
        r->status[r->count] = (int)s;
        r->value[r->count] = (s == GK_OK) ? v : GK_REAL_C(0.0);
        r->count++;
    }
}

/* Pressures (Pa) and temperatures (K) of the sweep: a cylinder, a line and a lab bench (invented). */
static const gk_real sweep_p[] = { GK_REAL_C(2.0e7), GK_REAL_C(5.0e6), GK_REAL_C(101325.0),
                                   GK_REAL_C(3.0e4) };
static const gk_real sweep_t[] = { GK_REAL_C(250.0), GK_REAL_C(293.15), GK_REAL_C(353.15) };
#define N_P (sizeof sweep_p / sizeof sweep_p[0])
#define N_T (sizeof sweep_t / sizeof sweep_t[0])

static void compute_all(results *r) {
    memset(r, 0, sizeof *r);
    record(r, GK_OK, (gk_real)gk_build_flags());
    record(r, GK_OK, (gk_real)strlen(gk_version()));
    for (size_t i = 0; i < N_P; ++i) {
        for (size_t j = 0; j < N_T; ++j) {
            gk_pressure p = { sweep_p[i] };
            gk_temperature t = { sweep_t[j] };
            {
                gk_molar_volume vm = { GK_SENTINEL };
                record(r, gk_ideal_molar_volume(p, t, &vm), vm.m3_per_mol);
            }
            {
                gk_density rho = { GK_SENTINEL };
                gk_molar_mass m = { GK_REAL_C(0.0280134) }; /* N2, IUPAC atomic weights (from memory) */
                record(r, gk_ideal_density(p, t, m, &rho), rho.kg_per_m3);
            }
            {
                gk_speed u = { GK_SENTINEL };
                gk_molar_mass m = { GK_REAL_C(0.0440095) }; /* CO2 (from memory) */
                record(r, gk_speed_rms(t, m, &u), u.m_per_s);
            }
            {
                gk_pressure pw = { GK_SENTINEL };
                record(r, gk_water_vapour_pressure(t, &pw), pw.pa);
            }
            {
                gk_temperature ts = { GK_SENTINEL };
                gk_pressure pl = { sweep_p[i] / GK_REAL_C(10.0) };
                record(r, gk_water_saturation_temperature(pl, &ts), ts.k);
            }
            {
                static const char *const names[] = { "CO2", "N2", "CH4", "Ar" };
                for (size_t g = 0; g < sizeof names / sizeof names[0]; ++g) {
                    const gk_gas *gas = NULL;
                    gk_status s = gk_gas_find(names[g], &gas);
                    record(r, s, GK_REAL_C(0.0));
                    if (s != GK_OK) continue;
                    for (int e = GK_EOS_IDEAL; e <= GK_EOS_PENG_ROBINSON; ++e) {
                        for (int root = GK_ROOT_STABLE; root <= GK_ROOT_LIQUID; ++root) {
                            gk_eos_result res;
                            memset(&res, 0, sizeof res);
                            s = gk_eos_solve((gk_eos)e, gas, p, t, (gk_root)root, &res);
                            record(r, s, res.z);
                            record(r, s, res.fugacity_coefficient);
                            record(r, s, (gk_real)res.root_count);
                        }
                    }
                }
            }
            {
                gk_mixture mix;
                gk_status s = gk_mixture_parse("CH4=0.9, C2H6=0.05, N2=balance", &mix);
                if (s != GK_OK) s = gk_mixture_parse("N2=0.7808, O2=0.2095, Ar=0.0097", &mix);
                record(r, s, GK_REAL_C(0.0));
                if (s == GK_OK) {
                    gk_eos_result res;
                    memset(&res, 0, sizeof res);
                    s = gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &mix, NULL, p, t, GK_ROOT_STABLE, &res);
                    record(r, s, res.z);
                }
            }
        }
    }
    {
        gk_real ps[N_P * N_T], ts[N_P * N_T], out[N_P * N_T];
        gk_status st[N_P * N_T];
        gk_molar_mass m = { GK_REAL_C(0.0319988) }; /* O2 (from memory) */
        for (size_t k = 0; k < N_P * N_T; ++k) {
            ps[k] = sweep_p[k % N_P];
            ts[k] = sweep_t[k % N_T];
        }
        size_t ok = gk_ideal_density_batch(N_P * N_T, ps, ts, m, out, st);
        record(r, GK_OK, (gk_real)ok);
        for (size_t k = 0; k < N_P * N_T; ++k) record(r, st[k], out[k]);
    }
    {
        static const char *const symbols[] = { "kPa", "degC", "psi", "L/min", "nonsense" };
        for (size_t k = 0; k < sizeof symbols / sizeof symbols[0]; ++k) {
            gk_unit u = GK_UNIT_COUNT;
            gk_status s = gk_unit_parse(symbols[k], &u);
            record(r, s, (gk_real)u);
        }
    }
}

static results reference;

typedef struct worker {
    pthread_t thread;
    int mismatches;
    results mine;
} worker;

static void *work(void *arg) {
    worker *w = (worker *)arg;
    for (int round = 0; round < GK_ROUNDS; ++round) {
        compute_all(&w->mine);
        if (w->mine.count != reference.count ||
            memcmp(w->mine.status, reference.status, sizeof reference.status) != 0 ||
            memcmp(w->mine.value, reference.value, sizeof reference.value) != 0) {
            w->mismatches++;
        }
    }
    return NULL;
}

static void concurrent_results_equal_single_thread(void **state) {
    (void)state;
    static worker workers[GK_THREADS];
    compute_all(&reference);
    assert_true(reference.count >= 2);
    assert_true(reference.count < GK_MAX_RESULTS);
    print_message("threads: %zu results per round, %d threads x %d rounds\n",
                  reference.count, GK_THREADS, GK_ROUNDS);
    for (int i = 0; i < GK_THREADS; ++i) {
        workers[i].mismatches = 0;
        assert_int_equal(pthread_create(&workers[i].thread, NULL, work, &workers[i]), 0);
    }
    for (int i = 0; i < GK_THREADS; ++i) assert_int_equal(pthread_join(workers[i].thread, NULL), 0);
    for (int i = 0; i < GK_THREADS; ++i) assert_int_equal(workers[i].mismatches, 0);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(concurrent_results_equal_single_thread),
    };
    return cmocka_run_group_tests_name("threads", tests, NULL, NULL);
}
