/*
 * test_vdw.c - van der Waals equation: constants from the critical point, the critical identities
 * (a hard test of the cubic solver: a triple root), handbook constants, root choice, and the
 * error contract of gk_vdw_from_critical, gk_vdw_pressure, gk_vdw_temperature, gk_vdw_volume.
 */
#include "gk_test.h"
#include <string.h>

/* Molar gas constant, the value CODATA 2018 prints (10 digits; not exact: N_A k, exact since
   SI 2019, is 8.31446261815324, 1.8e-11 relative above it). */
#define R_CODATA 8.314462618

/* Critical constants (from memory): N2 126.19 K, 3.3958 MPa (Span et al. 2000); CO2 304.1282 K,
   7.3773 MPa (Span and Wagner 1996); CH4 190.564 K, 4.5992 MPa (Setzmann and Wagner 1991);
   He 5.1953 K, 0.22746 MPa (Ortiz-Vega et al. 2013). Handbook van der Waals a (Pa m^6 mol^-2)
   and b (m^3 mol^-1): CRC Handbook of Chemistry and Physics, "Van der Waals constants for
   gases", from memory (1 bar L^2 mol^-2 = 0.1 Pa m^6 mol^-2, 1 L/mol = 1e-3 m^3/mol). */
typedef struct vdw_case { const char *gas; double tc, pc, a_handbook, b_handbook; } vdw_case;
static const vdw_case CASES[] = {
    {"N2", 126.19, 3.3958e6, 0.1370, 0.0387e-3},
    {"CO2", 304.1282, 7.3773e6, 0.3658, 0.0429e-3},
    {"CH4", 190.564, 4.5992e6, 0.2303, 0.0431e-3},
    {"He", 5.1953, 0.22746e6, 0.00346, 0.0238e-3},
};

static void constants_from_critical(void **state) {
    (void)state;
    for (size_t i = 0; i < sizeof CASES / sizeof CASES[0]; ++i) {
        const vdw_case *c = &CASES[i];
        gk_temperature tc = {(gk_real)c->tc};
        gk_pressure pc = {(gk_real)c->pc};
        gk_vdw k;
        assert_status(gk_vdw_from_critical(tc, pc, &k), GK_OK);
        /* definition (van der Waals critical conditions dp/dV = d2p/dV2 = 0, common practice),
           in long double */
        long double rtc = (long double)R_CODATA * (long double)(gk_real)c->tc;
        long double a = 27.0L * rtc * rtc / (64.0L * (long double)(gk_real)c->pc);
        long double b = rtc / (8.0L * (long double)(gk_real)c->pc);
        assert_rel(k.a, (double)a, GK_TOL(4e-16, 4e-7));
        assert_rel(k.b, (double)b, GK_TOL(4e-16, 4e-7));
        /* handbook constants are fitted to critical data: within a few percent (common practice);
           for these four gases within 0.5 % */
        assert_rel(k.a, c->a_handbook, 5e-3);
        assert_rel(k.b, c->b_handbook, 5e-3);
    }
}

/* At Tc, Pc with a, b from the critical point: Vc = 3 b, Zc = 3/8 exactly, and the cubic in Z has
   the triple root 3/8 (van der Waals critical identities, common practice). A triple root is
   determined to about cbrt(u) by any method on rounded data: 2e-5 relative in double
   (cbrt(1.1e-16) = 4.8e-6, times margin), 1e-2 in float (cbrt(6e-8) = 3.9e-3). */
static void critical_identities(void **state) {
    (void)state;
    for (size_t i = 0; i < sizeof CASES / sizeof CASES[0]; ++i) {
        const vdw_case *c = &CASES[i];
        gk_temperature tc = {(gk_real)c->tc};
        gk_pressure pc = {(gk_real)c->pc};
        gk_amount n = {(gk_real)2.5};
        gk_vdw k;
        assert_status(gk_vdw_from_critical(tc, pc, &k), GK_OK);
        gk_volume vc = {(gk_real)(2.5 * 3.0 * (double)k.b)};
        gk_pressure p;
        gk_temperature t;
        gk_volume v;
        /* p(Vc, Tc) = Pc and T(Vc, Pc) = Tc: no root finding, full precision */
        assert_status(gk_vdw_pressure(k, n, vc, tc, &p), GK_OK);
        assert_rel(p.pa, c->pc, GK_TOL(1e-14, 2e-6));
        assert_status(gk_vdw_temperature(k, n, vc, pc, &t), GK_OK);
        assert_rel(t.k, c->tc, GK_TOL(1e-14, 2e-6));
        /* V(Pc, Tc) = 3 n b: the triple root, every choice */
        for (int r = GK_ROOT_STABLE; r <= GK_ROOT_LIQUID; ++r) {
            assert_status(gk_vdw_volume(k, n, pc, tc, (gk_root)r, &v), GK_OK);
            assert_rel(v.m3, vc.m3, GK_TOL(2e-5, 1e-2));
        }
        /* the same through gk_eos_solve with a gas that lists no handbook constants */
        gk_gas g = {"x", "X", {(gk_real)0.03}, {(gk_real)c->tc}, {(gk_real)c->pc}, 0, 0, 0, 0, 0};
        gk_eos_result res;
        assert_status(gk_eos_solve(GK_EOS_VAN_DER_WAALS, &g, pc, tc, GK_ROOT_STABLE, &res), GK_OK);
        assert_rel(res.z, 0.375, GK_TOL(2e-5, 1e-2));
        assert_true(res.root_count >= 1 && res.root_count <= 3);
        for (int j = 0; j < res.root_count; ++j) assert_rel(res.z_roots[j], 0.375, GK_TOL(2e-5, 1e-2));
    }
}

/* gk_eos_solve uses the handbook a, b where the gas lists them: same volume as gk_vdw_volume. */
static void handbook_constants_are_used(void **state) {
    (void)state;
    const vdw_case *c = &CASES[1]; /* CO2 */
    gk_gas g = {"carbon dioxide", "CO2", {(gk_real)0.0440095}, {(gk_real)c->tc}, {(gk_real)c->pc},
                (gk_real)0.22394, (gk_real)c->a_handbook, (gk_real)c->b_handbook, 0, 0};
    gk_vdw k = {(gk_real)c->a_handbook, (gk_real)c->b_handbook};
    gk_amount one = {1};
    gk_pressure p = {(gk_real)5.0e6};
    gk_temperature t = {(gk_real)320.0};
    gk_eos_result r;
    gk_volume v;
    assert_status(gk_eos_solve(GK_EOS_VAN_DER_WAALS, &g, p, t, GK_ROOT_STABLE, &r), GK_OK);
    assert_status(gk_vdw_volume(k, one, p, t, GK_ROOT_STABLE, &v), GK_OK);
    assert_rel(r.molar_volume.m3_per_mol, v.m3, GK_TOL(1e-15, 1e-6));
    /* and the pressure of that volume is p again (gas root: backward error ~ u) */
    gk_pressure pb;
    assert_status(gk_vdw_pressure(k, one, v, t, &pb), GK_OK);
    assert_rel(pb.pa, p.pa, GK_TOL(1e-13, 1e-5));
    gk_molar_volume vm = {v.m3};
    assert_status(gk_eos_pressure(GK_EOS_VAN_DER_WAALS, &g, vm, t, &pb), GK_OK);
    assert_rel(pb.pa, p.pa, GK_TOL(1e-13, 1e-5));
    /* handbook constants differ from the critical ones: the result must differ measurably */
    gk_gas gc = g;
    gc.vdw_a = 0;
    gc.vdw_b = 0;
    gk_eos_result rc;
    assert_status(gk_eos_solve(GK_EOS_VAN_DER_WAALS, &gc, p, t, GK_ROOT_STABLE, &rc), GK_OK);
    assert_true(fabs((double)rc.z - (double)r.z) > 1e-5);
}

/* Below Tc the cubic has three roots; gas > liquid; the volumes reproduce the pressure. */
static void three_roots_below_tc(void **state) {
    (void)state;
    const vdw_case *c = &CASES[0]; /* N2 */
    gk_temperature tc = {(gk_real)c->tc}, t = {(gk_real)(0.85 * c->tc)};
    gk_pressure pc = {(gk_real)c->pc}, p = {(gk_real)(0.5 * c->pc)};
    gk_vdw k;
    gk_amount n = {1};
    gk_volume vg, vl, vs;
    assert_status(gk_vdw_from_critical(tc, pc, &k), GK_OK);
    assert_status(gk_vdw_volume(k, n, p, t, GK_ROOT_GAS, &vg), GK_OK);
    assert_status(gk_vdw_volume(k, n, p, t, GK_ROOT_LIQUID, &vl), GK_OK);
    assert_status(gk_vdw_volume(k, n, p, t, GK_ROOT_STABLE, &vs), GK_OK);
    assert_true((double)vl.m3 > (double)k.b && (double)vl.m3 < 3.0 * (double)k.b);
    assert_true((double)vg.m3 > 3.0 * (double)k.b);
    assert_true(memcmp(&vs, &vg, sizeof vs) == 0 || memcmp(&vs, &vl, sizeof vs) == 0); /* the same root, bit for bit */
    gk_pressure pb;
    assert_status(gk_vdw_pressure(k, n, vg, t, &pb), GK_OK);
    assert_rel(pb.pa, p.pa, GK_TOL(1e-13, 1e-5));
    /* liquid root: p is stiff in V (|V dp/dV| / p = 12.5 here, mpmath), so a correctly rounded V
       reproduces p only to ~ 12.5 u: 1e-13 (double), 1e-4 (float) */
    assert_status(gk_vdw_pressure(k, n, vl, t, &pb), GK_OK);
    assert_rel(pb.pa, p.pa, GK_TOL(1e-13, 1e-4));
}

static void error_contract(void **state) {
    (void)state;
    gk_vdw k = {(gk_real)0.137, (gk_real)3.87e-5};
    gk_vdw kbad[] = {{-1, (gk_real)3.87e-5}, {(gk_real)0.137, -1}, {(gk_real)NAN, (gk_real)3.87e-5},
                     {(gk_real)0.137, (gk_real)INFINITY}};
    gk_amount n = {1}, nbad = {0};
    gk_volume v = {(gk_real)1e-3}, vbad = {(gk_real)-1e-3}, vlow = {(gk_real)3.0e-5};
    gk_temperature t = {300}, tbad = {(gk_real)NAN};
    gk_pressure p = {(gk_real)1e6}, pbad = {(gk_real)-INFINITY};
    gk_vdw ko = {GK_SENTINEL, GK_SENTINEL};
    gk_pressure po = {GK_SENTINEL};
    gk_temperature to = {GK_SENTINEL};
    gk_volume vo = {GK_SENTINEL};

    /* gk_vdw_from_critical */
    assert_status(gk_vdw_from_critical(t, p, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_vdw_from_critical(tbad, p, &ko), GK_ERR_DOMAIN);
    assert_status(gk_vdw_from_critical(t, pbad, &ko), GK_ERR_DOMAIN);
    gk_temperature thuge = {(gk_real)GK_TOL(1e300, 1e38)};
    gk_pressure ptiny = {(gk_real)GK_TOL(1e-300, 1e-38)};
    assert_status(gk_vdw_from_critical(thuge, ptiny, &ko), GK_ERR_RANGE);
    assert_rel(ko.a, GK_SENTINEL, 0.0);
    assert_rel(ko.b, GK_SENTINEL, 0.0);

    /* gk_vdw_pressure */
    assert_status(gk_vdw_pressure(k, n, v, t, NULL), GK_ERR_ARGUMENT);
    for (size_t i = 0; i < sizeof kbad / sizeof kbad[0]; ++i)
        assert_status(gk_vdw_pressure(kbad[i], n, v, t, &po), GK_ERR_DOMAIN);
    assert_status(gk_vdw_pressure(k, nbad, v, t, &po), GK_ERR_DOMAIN);
    assert_status(gk_vdw_pressure(k, n, vbad, t, &po), GK_ERR_DOMAIN);
    assert_status(gk_vdw_pressure(k, n, vlow, t, &po), GK_ERR_DOMAIN); /* V <= n b */
    assert_status(gk_vdw_pressure(k, n, v, tbad, &po), GK_ERR_DOMAIN);
    /* T = 0.5 Tc, V = 1.5 b with a, b from Tc, Pc: p = 8 Pc - 12 Pc < 0 */
    {
        gk_temperature tc = {(gk_real)126.19};
        gk_pressure pc = {(gk_real)3.3958e6};
        gk_vdw kc;
        assert_status(gk_vdw_from_critical(tc, pc, &kc), GK_OK);
        gk_volume v15 = {(gk_real)(1.5 * (double)kc.b)};
        gk_temperature th = {(gk_real)(0.5 * 126.19)};
        assert_status(gk_vdw_pressure(kc, n, v15, th, &po), GK_ERR_NO_SOLUTION);
    }
    assert_rel(po.pa, GK_SENTINEL, 0.0);
    /* n R T / (V - n b) underflows to 0 (8.3e-330 Pa in double, 8.3e-50 Pa in float: below the
       smallest subnormal of IEEE 754 binary64 / binary32): GK_ERR_RANGE, not a non-positive
       pressure of the model */
    {
        gk_volume vhuge = {(gk_real)GK_TOL(1e300, 1e30)};
        gk_temperature ttiny = {(gk_real)GK_TOL(1e-30, 1e-20)};
        assert_status(gk_vdw_pressure(k, n, vhuge, ttiny, &po), GK_ERR_RANGE);
    }
    assert_rel(po.pa, GK_SENTINEL, 0.0);

    /* gk_vdw_temperature */
    assert_status(gk_vdw_temperature(k, n, v, p, NULL), GK_ERR_ARGUMENT);
    for (size_t i = 0; i < sizeof kbad / sizeof kbad[0]; ++i)
        assert_status(gk_vdw_temperature(kbad[i], n, v, p, &to), GK_ERR_DOMAIN);
    assert_status(gk_vdw_temperature(k, nbad, v, p, &to), GK_ERR_DOMAIN);
    assert_status(gk_vdw_temperature(k, n, vlow, p, &to), GK_ERR_DOMAIN);
    assert_status(gk_vdw_temperature(k, n, v, pbad, &to), GK_ERR_DOMAIN);
    assert_rel(to.k, GK_SENTINEL, 0.0);

    /* gk_vdw_volume */
    assert_status(gk_vdw_volume(k, n, p, t, GK_ROOT_STABLE, NULL), GK_ERR_ARGUMENT);
    assert_status(gk_vdw_volume(k, n, p, t, (gk_root)9, &vo), GK_ERR_ARGUMENT);
    for (size_t i = 0; i < sizeof kbad / sizeof kbad[0]; ++i)
        assert_status(gk_vdw_volume(kbad[i], n, p, t, GK_ROOT_STABLE, &vo), GK_ERR_DOMAIN);
    assert_status(gk_vdw_volume(k, nbad, p, t, GK_ROOT_STABLE, &vo), GK_ERR_DOMAIN);
    assert_status(gk_vdw_volume(k, n, pbad, t, GK_ROOT_STABLE, &vo), GK_ERR_DOMAIN);
    assert_status(gk_vdw_volume(k, n, p, tbad, GK_ROOT_STABLE, &vo), GK_ERR_DOMAIN);
    /* b = 0: p V^2 - R T V + a = 0 has no real root when (R T)^2 < 4 p a */
    gk_vdw kb0 = {(gk_real)10.0, 0};
    gk_temperature tcold = {(gk_real)100.0};
    assert_status(gk_vdw_volume(kb0, n, p, tcold, GK_ROOT_STABLE, &vo), GK_ERR_NO_SOLUTION);
    assert_rel(vo.m3, GK_SENTINEL, 0.0);
    /* a = b = 0: the ideal gas */
    gk_vdw k00 = {0, 0};
    assert_status(gk_vdw_volume(k00, n, p, t, GK_ROOT_LIQUID, &vo), GK_OK);
    assert_rel(vo.m3, R_CODATA * 300.0 / 1e6, GK_TOL(1e-15, 1e-6));
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(constants_from_critical),
        cmocka_unit_test(critical_identities),
        cmocka_unit_test(handbook_constants_are_used),
        cmocka_unit_test(three_roots_below_tc),
        cmocka_unit_test(error_contract),
    };
    return cmocka_run_group_tests_name("vdw", tests, NULL, NULL);
}
