/* test_kinetic.c - molecular speeds, speed of sound, Graham's law, mean free path, wall flux. */
#include "gk_test.h"

#define BIG ((gk_real)GK_TOL(1e300, 1e30))
#define SMALL ((gk_real)GK_TOL(1e-300, 1e-30))

/* Hand computations (CODATA 2018 R, Python math module, printed to 16 digits): double 1e-14,
 * float 5e-7 (inputs rounded to 24 bits, a few roundings, halved by the square root). */
#define TOL_HAND GK_TOL(1e-14, 5e-7)

static gk_pressure P(double pa) { gk_pressure q = { (gk_real)pa }; return q; }
static gk_temperature T(double k) { gk_temperature q = { (gk_real)k }; return q; }
static gk_molar_mass M(double kg_per_mol) { gk_molar_mass q = { (gk_real)kg_per_mol }; return q; }
/* the same from a gk_real (no conversion in a float build) */
static gk_pressure Pr(gk_real x) { gk_pressure q = { x }; return q; }
static gk_temperature Tr(gk_real x) { gk_temperature q = { x }; return q; }
static gk_molar_mass Mr(gk_real x) { gk_molar_mass q = { x }; return q; }

/* ------------------------------------------------------------------ published values */
static void standard_atmosphere_sea_level(void **state) {
    (void)state;
    gk_speed c = { GK_SENTINEL }, u = { GK_SENTINEL };
    /* ISO 2533:1975 / U.S. Standard Atmosphere 1976, sea level: 288.15 K, air 28.9644 g/mol,
     * gamma 1.4: speed of sound 340.294 m/s. The standard used R* = 8.31432 J/(mol K): with
     * CODATA 2018 R the speed is 8.6e-6 higher; the table rounds to 1.5e-6: tolerance 3e-5. */
    assert_status(gk_speed_of_sound_ideal(T(288.15), M(28.9644e-3), (gk_real)1.4, &c), GK_OK);
    assert_rel(c.m_per_s, 340.294, 3e-5);
    /* U.S. Standard Atmosphere 1976, sea level: mean particle speed 458.94 m/s (same R*
     * difference, printed to 5 digits: tolerance 3e-5) */
    assert_status(gk_speed_mean(T(288.15), M(28.9644e-3), &u), GK_OK);
    assert_rel(u.m_per_s, 458.94, 3e-5);
    /* U.S. Standard Atmosphere 1976, sea level: mean free path 6.6328e-8 m with the effective
     * collision diameter 3.65e-10 m of air (table value from memory; the formula with CODATA k
     * gives 6.6334e-8, so a tolerance of 5e-4 covers both the recall and R* vs R) */
    gk_real lambda = GK_SENTINEL;
    assert_status(gk_mean_free_path(P(101325.0), T(288.15), (gk_real)3.65e-10, &lambda), GK_OK);
    assert_rel(lambda, 6.6328e-8, 5e-4);
    assert_rel(lambda, 6.633377215953242e-08, TOL_HAND); /* hand computation, k T/(sqrt2 pi d^2 p) */
}

static void graham_hydrogen_oxygen(void **state) {
    (void)state;
    gk_real r = GK_SENTINEL;
    /* Graham's law (common practice): H2 (2.016 g/mol) effuses about 3.98 times as fast as
     * O2 (31.998 g/mol); sqrt(31.998 / 2.016) = 3.98397085952242 (hand computation) */
    assert_status(gk_effusion_ratio(M(2.016e-3), M(31.998e-3), &r), GK_OK);
    assert_abs(r, 3.98, 0.005);
    assert_rel(r, 3.98397085952242, TOL_HAND);
    /* swapped: the reciprocal */
    gk_real q = GK_SENTINEL;
    assert_status(gk_effusion_ratio(M(31.998e-3), M(2.016e-3), &q), GK_OK);
    assert_rel((double)r * (double)q, 1.0, GK_TOL(1e-15, 3e-7));
    /* the inverse problem: a gas taking 4 times as long as O2 has 16 x 31.998 g/mol */
    gk_molar_mass m = { GK_SENTINEL };
    assert_status(gk_effusion_molar_mass(M(31.998e-3), (gk_real)4.0, &m), GK_OK);
    assert_rel(m.kg_per_mol, 16.0 * 31.998e-3, GK_TOL(1e-15, 2e-7));
    /* and H2 against O2 in time: ratio 1/3.98397... gives back 2.016 g/mol */
    assert_status(gk_effusion_molar_mass(M(31.998e-3), (gk_real)(1.0 / 3.98397085952242), &m), GK_OK);
    assert_rel(m.kg_per_mol, 2.016e-3, GK_TOL(1e-13, 5e-7));
}

static void speed_ratios_exact(void **state) {
    (void)state;
    /* Maxwell-Boltzmann (common practice): most probable : mean : rms = sqrt2 : sqrt(8/pi) : sqrt3,
     * at any T and M. Tolerance: double 1e-15 (a few roundings), float 4e-7. */
    const double tol = GK_TOL(1e-15, 4e-7);
    const double pi = 3.14159265358979323846;
    const double temps[] = { 20.0, 293.15, 5000.0 };
    const double masses[] = { 2.016e-3, 28.0134e-3, 352.02e-3 };
    for (int i = 0; i < 3; ++i) {
        for (int j = 0; j < 3; ++j) {
            gk_speed mp, mean, rms;
            assert_status(gk_speed_most_probable(T(temps[i]), M(masses[j]), &mp), GK_OK);
            assert_status(gk_speed_mean(T(temps[i]), M(masses[j]), &mean), GK_OK);
            assert_status(gk_speed_rms(T(temps[i]), M(masses[j]), &rms), GK_OK);
            assert_rel((double)mean.m_per_s / (double)mp.m_per_s, sqrt(8.0 / pi) / sqrt(2.0), tol);
            assert_rel((double)rms.m_per_s / (double)mp.m_per_s, sqrt(3.0) / sqrt(2.0), tol);
        }
    }
}

static void speeds_hand_computed(void **state) {
    (void)state;
    gk_speed u = { GK_SENTINEL };
    /* nitrogen 28.0134 g/mol at 300 K: u_rms = sqrt(3 R T / M) = 516.8391885639508 m/s */
    assert_status(gk_speed_rms(T(300.0), M(28.0134e-3), &u), GK_OK);
    assert_rel(u.m_per_s, 516.8391885639508, TOL_HAND);
    /* helium 4.002602 g/mol, monatomic, gamma 5/3 at 273.15 K: sqrt(5/3 R T / M), hand computation */
    assert_status(gk_speed_of_sound_ideal(T(273.15), M(4.002602e-3), (gk_real)(5.0 / 3.0), &u), GK_OK);
    assert_rel(u.m_per_s, sqrt(5.0 / 3.0 * 8.314462618 * 273.15 / 4.002602e-3), TOL_HAND);
    /* the speed of sound for gamma 1.4 against u_mp: c / u_mp = sqrt(1.4 / 2) */
    gk_speed c, mp;
    assert_status(gk_speed_of_sound_ideal(T(400.0), M(28.0134e-3), (gk_real)1.4, &c), GK_OK);
    assert_status(gk_speed_most_probable(T(400.0), M(28.0134e-3), &mp), GK_OK);
    assert_rel((double)c.m_per_s / (double)mp.m_per_s, sqrt(0.7), GK_TOL(1e-15, 4e-7));
}

static void wall_flux_identity(void **state) {
    (void)state;
    /* hand computation: N2 at 300 K, 100 kPa: J = p / sqrt(2 pi M R T) = 4772.538435477523 */
    gk_real j = GK_SENTINEL;
    assert_status(gk_wall_flux(P(1.0e5), T(300.0), M(28.0134e-3), &j), GK_OK);
    assert_rel(j, 4772.538435477523, TOL_HAND);
    /* kinetic-theory identity (common practice): J = (n / V) u_mean / 4, with n / V = p / (R T) */
    gk_speed u;
    gk_amount n;
    gk_volume one = { (gk_real)1.0 };
    assert_status(gk_speed_mean(T(300.0), M(28.0134e-3), &u), GK_OK);
    assert_status(gk_ideal_amount(P(1.0e5), one, T(300.0), &n), GK_OK);
    assert_rel(j, (double)n.mol * (double)u.m_per_s / 4.0, GK_TOL(1e-14, 1e-6));
}

/* ------------------------------------------------------------------ error contract */
static void no_spurious_overflow(void **state) {
    (void)state;
    gk_speed u;
    /* T / M overflows on its own, its square root does not */
    assert_status(gk_speed_rms(T(GK_TOL(1e300, 1e30)), M(GK_TOL(1e-10, 1e-8)), &u), GK_OK);
    assert_rel(u.m_per_s, sqrt(3.0 * 8.314462618) * GK_TOL(1e155, 1e19), GK_TOL(1e-14, 5e-7));
    /* d^2 underflows on its own, the mean free path does not */
    gk_real lambda = GK_SENTINEL;
    assert_status(gk_mean_free_path(P(GK_TOL(1e300, 1e30)), T(300.0), (gk_real)GK_TOL(1e-160, 1e-22), &lambda), GK_OK);
    assert_rel(lambda, 1.380649e-23 * 300.0 / (sqrt(2.0) * 3.14159265358979323846) *
                       GK_TOL(1e20, 1e14), GK_TOL(1e-14, 5e-7));
    /* r^2 overflows on its own, M_ref r^2 does not */
    gk_molar_mass m;
    assert_status(gk_effusion_molar_mass(M(GK_TOL(1e-300, 1e-30)), (gk_real)GK_TOL(1e200, 1e25), &m), GK_OK);
    assert_rel(m.kg_per_mol, GK_TOL(1e100, 1e20), GK_TOL(1e-14, 5e-7));
}

static gk_status w_rms(const gk_real *x, gk_real *o) {
    return gk_speed_rms(Tr(x[0]), Mr(x[1]), (gk_speed *)(void *)o);
}
static gk_status w_mean(const gk_real *x, gk_real *o) {
    return gk_speed_mean(Tr(x[0]), Mr(x[1]), (gk_speed *)(void *)o);
}
static gk_status w_mp(const gk_real *x, gk_real *o) {
    return gk_speed_most_probable(Tr(x[0]), Mr(x[1]), (gk_speed *)(void *)o);
}
static gk_status w_sound(const gk_real *x, gk_real *o) {
    return gk_speed_of_sound_ideal(Tr(x[0]), Mr(x[1]), x[2], (gk_speed *)(void *)o);
}
static gk_status w_ratio(const gk_real *x, gk_real *o) {
    return gk_effusion_ratio(Mr(x[0]), Mr(x[1]), o);
}
static gk_status w_effusion_m(const gk_real *x, gk_real *o) {
    return gk_effusion_molar_mass(Mr(x[0]), x[1], (gk_molar_mass *)(void *)o);
}
static gk_status w_mfp(const gk_real *x, gk_real *o) {
    return gk_mean_free_path(Pr(x[0]), Tr(x[1]), x[2], o);
}
static gk_status w_flux(const gk_real *x, gk_real *o) {
    return gk_wall_flux(Pr(x[0]), Tr(x[1]), Mr(x[2]), o);
}

static void kinetic_error_contract(void **state) {
    (void)state;
    /* over/under: inputs whose result overflows / falls below the normal range */
    const gk_real H = (gk_real)GK_TOL(1e308, 3e38);   /* near the largest finite value */
    const gk_real L = (gk_real)GK_TOL(1e-307, 1e-37); /* near the smallest normal value */
    const gk_real S = (gk_real)GK_TOL(1e-320, 1e-44); /* subnormal: > 0, so inside the domain */
    const gk_real g = (gk_real)1.4;
    const gk_contract_case cases[] = {
        { "rms", w_rms, 2, { 300, (gk_real)0.028, 0 }, { H, S, 0 }, { S, H, 0 } },
        { "mean", w_mean, 2, { 300, (gk_real)0.028, 0 }, { H, S, 0 }, { S, H, 0 } },
        { "most probable", w_mp, 2, { 300, (gk_real)0.028, 0 }, { H, S, 0 }, { S, H, 0 } },
        { "sound", w_sound, 3, { 300, (gk_real)0.028, g }, { H, S, g }, { S, H, g } },
        { "effusion ratio", w_ratio, 2, { (gk_real)0.002, (gk_real)0.032, 0 }, { S, H, 0 }, { H, S, 0 } },
        { "effusion molar mass", w_effusion_m, 2, { (gk_real)0.032, 2, 0 }, { BIG, BIG, 0 }, { SMALL, SMALL, 0 } },
        { "mean free path", w_mfp, 3, { 1e5, 300, (gk_real)3.7e-10 }, { SMALL, BIG, SMALL }, { BIG, SMALL, BIG } },
        { "wall flux", w_flux, 3, { 1e5, 300, (gk_real)0.028 }, { H, L, L }, { L, H, H } },
    };
    gk_check_contract(cases, sizeof cases / sizeof cases[0], SMALL);
}

static void heat_capacity_ratio_domain(void **state) {
    (void)state;
    gk_speed u = { GK_SENTINEL };
    /* an ideal gas has 1 < gamma <= 5/3; gaskit accepts up to 1.67 for rounded printed values */
    const gk_real bad[] = { (gk_real)1.0, (gk_real)0.9, (gk_real)1.6701, (gk_real)1.7, (gk_real)2.0, (gk_real)-1.4,
                            (gk_real)NAN, (gk_real)INFINITY };
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; ++i)
        assert_status(gk_speed_of_sound_ideal(T(300.0), M(0.028), bad[i], &u), GK_ERR_DOMAIN);
    assert_rel(u.m_per_s, GK_SENTINEL, 0.0);
    assert_status(gk_speed_of_sound_ideal(T(300.0), M(0.004), (gk_real)5.0 / (gk_real)3.0, &u), GK_OK);
    assert_status(gk_speed_of_sound_ideal(T(300.0), M(0.1), (gk_real)1.01, &u), GK_OK);
    assert_status(gk_speed_of_sound_ideal(T(300.0), M(0.004), (gk_real)1.667, &u), GK_OK);
    assert_status(gk_speed_of_sound_ideal(T(300.0), M(0.004), (gk_real)1.67, &u), GK_OK);
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(standard_atmosphere_sea_level),
        cmocka_unit_test(graham_hydrogen_oxygen),
        cmocka_unit_test(speed_ratios_exact),
        cmocka_unit_test(speeds_hand_computed),
        cmocka_unit_test(wall_flux_identity),
        cmocka_unit_test(no_spurious_overflow),
        cmocka_unit_test(kinetic_error_contract),
        cmocka_unit_test(heat_capacity_ratio_domain),
    };
    return cmocka_run_group_tests_name("kinetic", tests, NULL, NULL);
}
