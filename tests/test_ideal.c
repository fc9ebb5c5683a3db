/* test_ideal.c - ideal gas law, changes of state and Dalton's law. */
#include "gk_test.h"
#include <string.h>

#define BIG ((gk_real)GK_TOL(1e300, 1e30))
#define SMALL ((gk_real)GK_TOL(1e-300, 1e-30))
/* NAN is a float constant (C99 7.12): promote it explicitly where a double is wanted */
#define QNAN ((double)NAN)

/* Most reference figures here are exact CODATA / SI arithmetic; the double tolerance 1e-9
 * follows the truncation of the printed CODATA values, the float one (3e-7) allows the
 * rounding of R, T and p to 24 bits (about 6e-8 each) plus the arithmetic. */
#define TOL_REF GK_TOL(1e-9, 3e-7)
/* Hand computations (exact rational arithmetic with CODATA 2018 R, printed to 17 digits):
 * double 1e-14 (a few roundings), float 5e-7. */
#define TOL_HAND GK_TOL(1e-14, 5e-7)

static gk_pressure P(double pa) { gk_pressure q = { (gk_real)pa }; return q; }
static gk_temperature T(double k) { gk_temperature q = { (gk_real)k }; return q; }
static gk_volume V(double m3) { gk_volume q = { (gk_real)m3 }; return q; }
static gk_amount N(double mol) { gk_amount q = { (gk_real)mol }; return q; }
static gk_molar_mass M(double kg_per_mol) { gk_molar_mass q = { (gk_real)kg_per_mol }; return q; }
static gk_density RHO(double kg_per_m3) { gk_density q = { (gk_real)kg_per_m3 }; return q; }
/* the same from a gk_real (no conversion in a float build) */
static gk_pressure Pr(gk_real x) { gk_pressure q = { x }; return q; }
static gk_temperature Tr(gk_real x) { gk_temperature q = { x }; return q; }
static gk_volume Vr(gk_real x) { gk_volume q = { x }; return q; }
static gk_amount Nr(gk_real x) { gk_amount q = { x }; return q; }
static gk_molar_mass Mr(gk_real x) { gk_molar_mass q = { x }; return q; }
static gk_density RHOr(gk_real x) { gk_density q = { x }; return q; }

/* ------------------------------------------------------------------ published values */
static void codata_molar_volume(void **state) {
    (void)state;
    gk_molar_volume vm = { GK_SENTINEL };
    /* CODATA 2018: molar volume of an ideal gas at 273.15 K, 101.325 kPa: 22.413 969 54 e-3 m3/mol */
    assert_status(gk_ideal_molar_volume(P(101325.0), T(273.15), &vm), GK_OK);
    assert_rel(vm.m3_per_mol, 22.41396954e-3, TOL_REF);
    /* CODATA 2018: at 273.15 K, 100 kPa: 22.710 954 64 e-3 m3/mol */
    assert_status(gk_ideal_molar_volume(P(100000.0), T(273.15), &vm), GK_OK);
    assert_rel(vm.m3_per_mol, 22.71095464e-3, TOL_REF);
    /* the same through gk_ideal_volume of 1 mol */
    gk_volume v = { GK_SENTINEL };
    assert_status(gk_ideal_volume(N(1.0), T(273.15), P(101325.0), &v), GK_OK);
    assert_rel(v.m3, 22.41396954e-3, TOL_REF);
}

static void loschmidt_constant(void **state) {
    (void)state;
    /* CODATA 2018: Loschmidt constant n0 = p / (k T) at 273.15 K, 101.325 kPa:
     * 2.686 780 111 e25 m^-3. Here n / V * N_A with n from 1 m3. */
    gk_amount n = { GK_SENTINEL };
    assert_status(gk_ideal_amount(P(101325.0), V(1.0), T(273.15), &n), GK_OK);
    assert_rel((double)n.mol * 6.02214076e23, 2.686780111e25, TOL_REF);
}

static void iso2533_sea_level_density(void **state) {
    (void)state;
    gk_density rho = { GK_SENTINEL };
    /* ISO 2533:1975 / U.S. Standard Atmosphere 1976, sea level: T = 288.15 K, p = 101325 Pa,
     * M(air) = 28.9644 g/mol, density 1.2250 kg/m3. The standard used R* = 8.31432 J/(mol K);
     * with CODATA 2018 R the result is 1.8e-5 lower, and the table rounds to 5 digits (4e-5):
     * relative tolerance 1e-4. */
    assert_status(gk_ideal_density(P(101325.0), T(288.15), M(28.9644e-3), &rho), GK_OK);
    assert_rel(rho.kg_per_m3, 1.2250, 1e-4);
    /* corrected to the standard's R*, the table value holds to its printed rounding */
    assert_rel((double)rho.kg_per_m3 * 8.314462618 / 8.31432, 1.2250, 5e-5);
    /* and back: the molar mass of air from that density (gas-density balance) */
    gk_molar_mass m = { GK_SENTINEL };
    assert_status(gk_ideal_molar_mass(RHO(1.2250), P(101325.0), T(288.15), &m), GK_OK);
    assert_rel(m.kg_per_mol, 28.9644e-3, 1e-4);
}

/* ------------------------------------------------------------------ the four forms of pV = nRT */
static void ideal_gas_law_forms(void **state) {
    (void)state;
    /* hand computation: 0.5 mol at 293.15 K in 10 L, CODATA 2018 R (exact rationals) */
    gk_pressure p = { GK_SENTINEL };
    assert_status(gk_ideal_pressure(N(0.5), T(293.15), V(0.010), &p), GK_OK);
    assert_rel(p.pa, 121869.235823335, TOL_HAND);
    gk_volume v = { GK_SENTINEL };
    assert_status(gk_ideal_volume(N(0.5), T(293.15), P(500000.0), &v), GK_OK);
    assert_rel(v.m3, 0.0024373847164667, TOL_HAND);
    gk_amount n = { GK_SENTINEL };
    assert_status(gk_ideal_amount(P(500000.0), V(0.010), T(293.15), &n), GK_OK);
    assert_rel(n.mol, 2.051379072913913, TOL_HAND);
    gk_temperature t = { GK_SENTINEL };
    assert_status(gk_ideal_temperature(P(500000.0), V(0.010), N(0.5), &t), GK_OK);
    assert_rel(t.k, 1202.7235504494272, TOL_HAND);
    gk_molar_volume vm = { GK_SENTINEL };
    assert_status(gk_ideal_molar_volume(P(500000.0), T(293.15), &vm), GK_OK);
    assert_rel(vm.m3_per_mol, 0.0048747694329334, TOL_HAND);
    gk_density rho = { GK_SENTINEL };
    /* nitrogen 28.0134 g/mol (IUPAC 2013 standard atomic weight of N, 14.0067, times 2) */
    assert_status(gk_ideal_density(P(500000.0), T(293.15), M(28.0134e-3), &rho), GK_OK);
    assert_rel(rho.kg_per_m3, 5.746610252116661, TOL_HAND);
    gk_molar_mass m = { GK_SENTINEL };
    assert_status(gk_ideal_molar_mass(rho, P(500000.0), T(293.15), &m), GK_OK);
    assert_rel(m.kg_per_mol, 28.0134e-3, TOL_HAND);
}

static void no_spurious_overflow(void **state) {
    (void)state;
    /* n R T overflows a double on its own (1e200 * 1e200), the quotient does not */
    gk_pressure p = { GK_SENTINEL };
    assert_status(gk_ideal_pressure(N(GK_TOL(1e200, 1e25)), T(GK_TOL(1e200, 1e25)),
                                    V(GK_TOL(1e300, 1e35)), &p), GK_OK);
    assert_rel(p.pa, 8.314462618 * GK_TOL(1e100, 1e15), GK_TOL(1e-14, 5e-7));
    /* p V underflows on its own, the quotient does not */
    gk_amount n = { GK_SENTINEL };
    assert_status(gk_ideal_amount(P(GK_TOL(1e-200, 1e-25)), V(GK_TOL(1e-200, 1e-25)),
                                  T(GK_TOL(1e-300, 1e-35)), &n), GK_OK);
    assert_rel(n.mol, GK_TOL(1e-100, 1e-15) / 8.314462618, GK_TOL(1e-14, 5e-7));
}

/* Ordinary magnitudes take a direct path, extreme ones a frexp/ldexp path: scaling p and T by
 * the same power of two leaves rho = p M / (R T) unchanged bit for bit (IEEE 754 rounding
 * commutes with power-of-two scaling), so the two paths agree exactly. */
static void fast_and_wide_paths_agree(void **state) {
    (void)state;
    const int shift = (int)GK_TOL(600, 80);
    const gk_real p = (gk_real)123456.789, t = (gk_real)301.23;
    gk_density a = { GK_SENTINEL }, b = { GK_SENTINEL };
    assert_status(gk_ideal_density(Pr(p), Tr(t), M(0.0280134), &a), GK_OK);
    assert_status(gk_ideal_density(Pr((gk_real)ldexp((double)p, shift)),
                                   Tr((gk_real)ldexp((double)t, shift)), M(0.0280134), &b), GK_OK);
    assert_memory_equal(&a, &b, sizeof a);
    assert_status(gk_ideal_density(Pr((gk_real)ldexp((double)p, -shift)),
                                   Tr((gk_real)ldexp((double)t, -shift)), M(0.0280134), &b), GK_OK);
    assert_memory_equal(&a, &b, sizeof a);
    /* and p = n R T / V with n and V scaled alike */
    gk_pressure pa = { GK_SENTINEL }, pb = { GK_SENTINEL };
    assert_status(gk_ideal_pressure(N(2.5), T(300.0), V(0.03), &pa), GK_OK);
    assert_status(gk_ideal_pressure(Nr((gk_real)ldexp(2.5, shift)), T(300.0),
                                    Vr((gk_real)ldexp((double)(gk_real)0.03, shift)), &pb), GK_OK);
    assert_memory_equal(&pa, &pb, sizeof pa);
}

/* ------------------------------------------------------------------ changes of state */
static gk_state S(double pa, double m3, double k, double mol) {
    gk_state s;
    s.p = P(pa); s.v = V(m3); s.t = T(k); s.n = N(mol);
    return s;
}

static void state_change_special_cases(void **state) {
    (void)state;
    /* Hand computations (exact) of the classical special cases. Tolerance: at most 7 roundings,
     * double 1e-15, float 5e-7. */
    const double tol = GK_TOL(1e-15, 5e-7);
    const gk_state s1 = S(100000.0, 2.0e-3, 300.0, 0.08);
    gk_state s2;
    /* Boyle (n, T constant): V 2 L -> 0.5 L gives p 100 kPa -> 400 kPa */
    s2 = S(QNAN, 0.5e-3, 300.0, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_PRESSURE), GK_OK);
    assert_rel(s2.p.pa, 400000.0, tol);
    assert_rel(s2.v.m3, (gk_real)0.5e-3, 0.0);   /* the other fields are not touched */
    assert_rel(s2.t.k, 300.0, 0.0);
    assert_rel(s2.n.mol, (gk_real)0.08, 0.0);
    /* Boyle, the other way: p 100 kPa -> 250 kPa gives V 2 L -> 0.8 L */
    s2 = S(250000.0, QNAN, 300.0, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_VOLUME), GK_OK);
    assert_rel(s2.v.m3, 0.8e-3, tol);
    /* Charles (n, p constant): T 300 K -> 450 K gives V 2 L -> 3 L */
    s2 = S(100000.0, QNAN, 450.0, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_VOLUME), GK_OK);
    assert_rel(s2.v.m3, 3.0e-3, tol);
    /* Charles, solved for T: V 2 L -> 2.5 L gives T 300 K -> 375 K */
    s2 = S(100000.0, 2.5e-3, QNAN, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_TEMPERATURE), GK_OK);
    assert_rel(s2.t.k, 375.0, tol);
    /* Gay-Lussac (n, V constant): T 300 K -> 600 K gives p 100 kPa -> 200 kPa */
    s2 = S(QNAN, 2.0e-3, 600.0, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_PRESSURE), GK_OK);
    assert_rel(s2.p.pa, 200000.0, tol);
    /* Avogadro (p, T constant): n 0.08 mol -> 0.2 mol gives V 2 L -> 5 L */
    s2 = S(100000.0, QNAN, 300.0, 0.2);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_VOLUME), GK_OK);
    assert_rel(s2.v.m3, 5.0e-3, tol);
    /* Avogadro, solved for n: V 2 L -> 7 L gives n 0.08 -> 0.28 mol */
    s2 = S(100000.0, 7.0e-3, 300.0, QNAN);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_AMOUNT), GK_OK);
    assert_rel(s2.n.mol, 0.28, tol);
    /* nothing changes: the identical state comes back exactly */
    s2 = S(QNAN, 2.0e-3, 300.0, 0.08);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_PRESSURE), GK_OK);
    assert_rel(s2.p.pa, 100000.0, 0.0);
}

static void state_change_general(void **state) {
    (void)state;
    /* Hand computation (exact rationals): 4 mol at 200 kPa, 50 L, 288.15 K. */
    const gk_state s1 = S(200000.0, 0.050, 288.15, 4.0);
    gk_state s2 = S(QNAN, 0.030, 318.15, 3.5);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_PRESSURE), GK_OK);
    assert_rel(s2.p.pa, 322032.7954190526, TOL_HAND);
    s2 = S(350000.0, QNAN, 318.15, 3.5);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_VOLUME), GK_OK);
    assert_rel(s2.v.m3, 0.027602811035918794, TOL_HAND);
    s2 = S(350000.0, 0.030, QNAN, 3.5);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_TEMPERATURE), GK_OK);
    assert_rel(s2.t.k, 345.78, TOL_HAND);
    s2 = S(350000.0, 0.030, 318.15, QNAN);
    assert_status(gk_state_change(&s1, &s2, GK_VAR_AMOUNT), GK_OK);
    assert_rel(s2.n.mol, 3.803960396039604, TOL_HAND);
    /* the invariant p V / (n T) is the same in both states */
    const double k1 = (double)s1.p.pa * (double)s1.v.m3 / ((double)s1.n.mol * (double)s1.t.k);
    const double k2 = (double)s2.p.pa * (double)s2.v.m3 / ((double)s2.n.mol * (double)s2.t.k);
    assert_rel(k2, k1, GK_TOL(1e-14, 1e-6));
}

static void state_change_errors(void **state) {
    (void)state;
    const gk_state good = S(100000.0, 2.0e-3, 300.0, 0.08);
    const gk_real bad[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY, (gk_real)0.0,
                            (gk_real)-1.0 };
    const gk_variable vars[] = { GK_VAR_PRESSURE, GK_VAR_VOLUME, GK_VAR_TEMPERATURE, GK_VAR_AMOUNT };
    gk_state after = good, copy;
    assert_status(gk_state_change(NULL, &after, GK_VAR_PRESSURE), GK_ERR_ARGUMENT);
    assert_status(gk_state_change(&good, NULL, GK_VAR_PRESSURE), GK_ERR_ARGUMENT);
    assert_status(gk_state_change(&good, &after, (gk_variable)99), GK_ERR_ARGUMENT);
    assert_status(gk_state_change(&good, &after, (gk_variable)-1), GK_ERR_ARGUMENT);
    assert_memory_equal(&after, &good, sizeof after);
    for (size_t u = 0; u < 4; ++u) {
        for (int field = 0; field < 8; ++field) {
            /* fields 0-3 of before, 4-7 of after, in the order p, v, t, n */
            for (size_t b = 0; b < sizeof bad / sizeof bad[0]; ++b) {
                gk_state before = good;
                after = good;
                gk_real *f[4];
                gk_state *st = field < 4 ? &before : &after;
                f[0] = &st->p.pa; f[1] = &st->v.m3; f[2] = &st->t.k; f[3] = &st->n.mol;
                if (field >= 4 && field - 4 == (int)u) continue; /* the unknown is not read */
                *f[field % 4] = bad[b];
                copy = after;
                assert_status(gk_state_change(&before, &after, vars[u]), GK_ERR_DOMAIN);
                assert_memory_equal(&after, &copy, sizeof after);
            }
        }
    }
    /* overflow and underflow of the unknown */
    const double B = (double)BIG, L = (double)SMALL;
    const gk_state big = S(B, B, L, L);
    after = S(QNAN, L, B, B);
    copy = after;
    assert_status(gk_state_change(&big, &after, GK_VAR_PRESSURE), GK_ERR_RANGE);
    assert_memory_equal(&after, &copy, sizeof after);
    after = S(QNAN, B, L, L);
    copy = after;
    const gk_state small = S(L, L, B, B);
    assert_status(gk_state_change(&small, &after, GK_VAR_PRESSURE), GK_ERR_RANGE);
    assert_memory_equal(&after, &copy, sizeof after);
}

/* ------------------------------------------------------------------ Dalton */
static void dalton_partial_pressure(void **state) {
    (void)state;
    gk_pressure pi = { GK_SENTINEL };
    /* oxygen in dry air, x = 0.2095 (ISO 2533 / U.S. Standard Atmosphere 1976 composition
     * table, by volume), at 101325 Pa: 21227.5875 Pa (hand computation) */
    assert_status(gk_partial_pressure(P(101325.0), (gk_real)0.2095, &pi), GK_OK);
    assert_rel(pi.pa, 21227.5875, GK_TOL(1e-15, 2e-7));
    assert_status(gk_partial_pressure(P(101325.0), (gk_real)0.0, &pi), GK_OK);
    assert_abs(pi.pa, 0.0, 0.0);
    assert_status(gk_partial_pressure(P(101325.0), (gk_real)1.0, &pi), GK_OK);
    assert_rel(pi.pa, 101325.0, 0.0);

    gk_pressure s = { GK_SENTINEL };
    assert_status(gk_partial_pressure(P(101325.0), (gk_real)0.5, NULL), GK_ERR_ARGUMENT);
    const gk_real bad_x[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY, (gk_real)-0.01,
                              (gk_real)1.01 };
    for (size_t i = 0; i < 5; ++i)
        assert_status(gk_partial_pressure(P(101325.0), bad_x[i], &s), GK_ERR_DOMAIN);
    const gk_real bad_p[] = { (gk_real)NAN, (gk_real)INFINITY, (gk_real)-INFINITY, (gk_real)0.0,
                              (gk_real)-1.0 };
    for (size_t i = 0; i < 5; ++i)
        assert_status(gk_partial_pressure(Pr(bad_p[i]), (gk_real)0.5, &s), GK_ERR_DOMAIN);
    /* underflow of a non-zero fraction */
    assert_status(gk_partial_pressure(P(GK_TOL(1e-300, 1e-30)), (gk_real)GK_TOL(1e-10, 1e-10), &s),
                  GK_ERR_RANGE);
    assert_rel(s.pa, GK_SENTINEL, 0.0);
}

/* ------------------------------------------------------------------ error contract, table driven */

static gk_status w_pressure(const gk_real *x, gk_real *o) {
    return gk_ideal_pressure(Nr(x[0]), Tr(x[1]), Vr(x[2]), (gk_pressure *)(void *)o);
}
static gk_status w_volume(const gk_real *x, gk_real *o) {
    return gk_ideal_volume(Nr(x[0]), Tr(x[1]), Pr(x[2]), (gk_volume *)(void *)o);
}
static gk_status w_amount(const gk_real *x, gk_real *o) {
    return gk_ideal_amount(Pr(x[0]), Vr(x[1]), Tr(x[2]), (gk_amount *)(void *)o);
}
static gk_status w_temperature(const gk_real *x, gk_real *o) {
    return gk_ideal_temperature(Pr(x[0]), Vr(x[1]), Nr(x[2]), (gk_temperature *)(void *)o);
}
static gk_status w_molar_volume(const gk_real *x, gk_real *o) {
    return gk_ideal_molar_volume(Pr(x[0]), Tr(x[1]), (gk_molar_volume *)(void *)o);
}
static gk_status w_density(const gk_real *x, gk_real *o) {
    return gk_ideal_density(Pr(x[0]), Tr(x[1]), Mr(x[2]), (gk_density *)(void *)o);
}
static gk_status w_molar_mass(const gk_real *x, gk_real *o) {
    return gk_ideal_molar_mass(RHOr(x[0]), Pr(x[1]), Tr(x[2]), (gk_molar_mass *)(void *)o);
}

static void ideal_error_contract(void **state) {
    (void)state;
    const gk_contract_case cases[] = {
        { "pressure", w_pressure, 3, { 1, 300, (gk_real)0.01 }, { BIG, BIG, SMALL }, { SMALL, SMALL, BIG } },
        { "volume", w_volume, 3, { 1, 300, 1e5 }, { BIG, BIG, SMALL }, { SMALL, SMALL, BIG } },
        { "amount", w_amount, 3, { 1e5, (gk_real)0.01, 300 }, { BIG, BIG, SMALL }, { SMALL, SMALL, BIG } },
        { "temperature", w_temperature, 3, { 1e5, (gk_real)0.01, 1 }, { BIG, BIG, SMALL }, { SMALL, SMALL, BIG } },
        { "molar volume", w_molar_volume, 2, { 1e5, 300, 0 }, { SMALL, BIG, 0 }, { BIG, SMALL, 0 } },
        { "density", w_density, 3, { 1e5, 300, (gk_real)0.028 }, { BIG, SMALL, BIG }, { SMALL, BIG, SMALL } },
        { "molar mass", w_molar_mass, 3, { (gk_real)1.2, 1e5, 300 }, { BIG, SMALL, BIG }, { SMALL, BIG, SMALL } },
    };
    gk_check_contract(cases, sizeof cases / sizeof cases[0], SMALL);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(codata_molar_volume),
        cmocka_unit_test(loschmidt_constant),
        cmocka_unit_test(iso2533_sea_level_density),
        cmocka_unit_test(ideal_gas_law_forms),
        cmocka_unit_test(no_spurious_overflow),
        cmocka_unit_test(fast_and_wide_paths_agree),
        cmocka_unit_test(state_change_special_cases),
        cmocka_unit_test(state_change_general),
        cmocka_unit_test(state_change_errors),
        cmocka_unit_test(dalton_partial_pressure),
        cmocka_unit_test(ideal_error_contract),
    };
    return cmocka_run_group_tests_name("ideal", tests, NULL, NULL);
}
