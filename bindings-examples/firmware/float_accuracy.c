/*
 * float_accuracy.c - prints the results of the main functions over a sweep of typical inputs,
 * one line per result: "function<TAB>case<TAB>status<TAB>value". Built once against the double
 * library and once against the float library (GASKIT_SINGLE_PRECISION=ON);
 * float_accuracy.py compares the two outputs and reports, per function, the largest relative
 * difference of the float build from the double build (docs/embedding.md, "Float accuracy").
 *
 *   gcc -std=c99 -Iinclude -I<build>/include float_accuracy.c <build>/libgaskit.a -lm
 *
 * The sweep (invented but typical instrument states): pressures 5 kPa ... 20 MPa, temperatures
 * 230 ... 480 K, the gases of the table, three mixtures, every equation of state (the
 * reference-grade ones where they cover the gas).
 */
#include <stdio.h>
#include "gaskit/gaskit.h"

/* The value is read through a pointer after the call (argument evaluation order is unspecified). */
static void put(const char *fn, int k, gk_status s, const gk_real *v) {
    printf("%s\t%d\t%d\t%.17e\n", fn, k, (int)s, s == GK_OK ? (double)*v : 0.0);
}
static const gk_real zero = GK_REAL_C(0.0);

static const gk_real P[] = { GK_REAL_C(5.0e3), GK_REAL_C(101325.0), GK_REAL_C(5.0e5),
                             GK_REAL_C(2.0e6), GK_REAL_C(8.0e6), GK_REAL_C(2.0e7) };
static const gk_real T[] = { GK_REAL_C(230.0), GK_REAL_C(273.15), GK_REAL_C(293.15),
                             GK_REAL_C(330.0), GK_REAL_C(400.0), GK_REAL_C(480.0) };
#define NP ((int)(sizeof P / sizeof P[0]))
#define NT ((int)(sizeof T / sizeof T[0]))

int main(void) {
    static const char *const eos_name[] = { "ideal", "vdw", "rk", "srk", "pr" };
    static const char *const mixes[] = { "N2=0.7808, O2=0.2095, Ar=0.0097", "CO2=5%, N2=balance",
                                         "CH4=0.9, C2H6=0.06, N2=balance" };
    const gk_molar_mass m_air = { GK_REAL_C(0.0289644) }; /* ISO 2533 */
    char name[64];
    int k = 0;
    for (int i = 0; i < NP; ++i) {
        for (int j = 0; j < NT; ++j, ++k) {
            gk_pressure p = { P[i] };
            gk_temperature t = { T[j] };
            gk_molar_volume vm = { 0 };
            gk_density rho = { 0 };
            gk_speed u = { 0 };
            gk_real x = 0;
            gk_pressure pw = { 0 };
            gk_temperature tw = { 0 };
            put("gk_ideal_molar_volume", k, gk_ideal_molar_volume(p, t, &vm), &vm.m3_per_mol);
            put("gk_ideal_density", k, gk_ideal_density(p, t, m_air, &rho), &rho.kg_per_m3);
            put("gk_speed_rms", k, gk_speed_rms(t, m_air, &u), &u.m_per_s);
            put("gk_speed_of_sound_ideal", k, gk_speed_of_sound_ideal(t, m_air, GK_REAL_C(1.4), &u), &u.m_per_s);
            put("gk_mean_free_path", k, gk_mean_free_path(p, t, GK_REAL_C(3.7e-10), &x), &x);
            put("gk_wall_flux", k, gk_wall_flux(p, t, m_air, &x), &x);
            put("gk_convert(psi->Pa)", k, gk_convert(p.pa, GK_UNIT_PSI, GK_UNIT_PA, &x), &x);
            put("gk_convert(K->degF)", k, gk_convert(t.k, GK_UNIT_K, GK_UNIT_DEGF, &x), &x);
            put("gk_water_vapour_pressure", k, gk_water_vapour_pressure(t, &pw), &pw.pa);
            put("gk_water_saturation_temperature", k,
                gk_water_saturation_temperature(p, &tw), &tw.k);
            put("gk_dew_point", k, gk_dew_point((gk_pressure){ p.pa / GK_REAL_C(100.0) }, &tw), &tw.k);
            put("gk_dry_gas_pressure", k, gk_dry_gas_pressure(p, t, GK_REAL_C(0.5), &pw), &pw.pa);
            {
                gk_reference ref = { { 0 }, { 0 } };
                (void)gk_reference_get(GK_REF_15C_101325PA, &ref);
                put("gk_reference_factor", k, gk_reference_factor(p, t, GK_REAL_C(0.98), ref, GK_REAL_C(0.9996), &x), &x);
            }
            for (size_t g = 0; g < gk_gas_count(); ++g) {
                const gk_gas *gas = gk_gas_at(g);
                for (int e = GK_EOS_VAN_DER_WAALS; e <= GK_EOS_PENG_ROBINSON; ++e) {
                    for (int root = GK_ROOT_STABLE; root <= GK_ROOT_LIQUID; ++root) {
                        gk_eos_result r = { 0 };
                        gk_status s = gk_eos_solve((gk_eos)e, gas, p, t, (gk_root)root, &r);
                        int c = k * 1000 + (int)g * 10 + root;
                        snprintf(name, sizeof name, "gk_eos_solve(%s) z", eos_name[e]);
                        put(name, c, s, &r.z);
                        snprintf(name, sizeof name, "gk_eos_solve(%s) phi", eos_name[e]);
                        put(name, c, s, &r.fugacity_coefficient);
                    }
                }
                put("gk_eos_density(pr)", k * 1000 + (int)g,
                    gk_eos_density(GK_EOS_PENG_ROBINSON, gas, p, t, &rho), &rho.kg_per_m3);
                /* the reference-grade models: Span-Wagner where it covers the gas (else
                   GK_ERR_NOT_FOUND in both builds), the hydrogen equation, GK_EOS_BEST */
                for (int root = GK_ROOT_STABLE; root <= GK_ROOT_LIQUID; ++root) {
                    gk_eos_result r = { 0 };
                    gk_status s = gk_eos_solve(GK_EOS_SPAN_WAGNER, gas, p, t, (gk_root)root, &r);
                    int c = k * 1000 + (int)g * 10 + root;
                    put("gk_eos_solve(span-wagner) z", c, s, &r.z);
                    put("gk_eos_solve(span-wagner) phi", c, s, &r.fugacity_coefficient);
                    s = gk_eos_solve(GK_EOS_HYDROGEN, gas, p, t, (gk_root)root, &r);
                    put("gk_eos_solve(hydrogen) z", c, s, &r.z);
                    put("gk_eos_solve(hydrogen) phi", c, s, &r.fugacity_coefficient);
                }
                put("gk_eos_density(best)", k * 1000 + (int)g,
                    gk_eos_density(GK_EOS_BEST, gas, p, t, &rho), &rho.kg_per_m3);
                {
                    gk_vdw c = { 0, 0 };
                    gk_volume v = { 0 };
                    gk_amount n = { GK_REAL_C(1.0) };
                    gk_status s = gk_vdw_from_critical(gas->critical_temperature, gas->critical_pressure, &c);
                    if (s == GK_OK) s = gk_vdw_volume(c, n, p, t, GK_ROOT_STABLE, &v);
                    put("gk_vdw_volume", k * 1000 + (int)g, s, &v.m3);
                }
            }
            for (int mi = 0; mi < 3; ++mi) {
                gk_mixture mix;
                gk_eos_result r = { 0 };
                gk_status s = gk_mixture_parse(mixes[mi], &mix);
                put("gk_mixture_parse", k * 10 + mi, s, &zero);
                if (s != GK_OK) continue;
                s = gk_mixture_eos_solve(GK_EOS_PENG_ROBINSON, &mix, NULL, p, t, GK_ROOT_STABLE, &r);
                put("gk_mixture_eos_solve(pr) z", k * 10 + mi, s, &r.z);
                s = gk_mixture_eos_solve(GK_EOS_SPAN_WAGNER, &mix, NULL, p, t, GK_ROOT_STABLE, &r);
                put("gk_mixture_eos_solve(span-wagner) z", k * 10 + mi, s, &r.z);
                put("gk_mixture_eos_solve(span-wagner) phi", k * 10 + mi, s, &r.fugacity_coefficient);
                {
                    gk_fluid fluid = { NULL, &mix, NULL };
                    gk_reference ref = { { 0 }, { 0 } };
                    gk_volume_flow q = { GK_REAL_C(1.0e-3) }, qr = { 0 };
                    gk_contents cont = { { 0 }, { 0 }, { 0 }, 0 };
                    gk_leak leak = { 0, { 0 }, { 0 } };
                    gk_volume vessel = { GK_REAL_C(0.05) };
                    gk_pressure p_end = { p.pa * GK_REAL_C(0.999) };
                    (void)gk_reference_get(GK_REF_0C_101325PA, &ref);
                    put("gk_flow_to_reference(pr)", k * 10 + mi,
                        gk_flow_to_reference(GK_EOS_PENG_ROBINSON, fluid, q, p, t, ref, &qr), &qr.m3_per_s);
                    s = gk_vessel_contents(GK_EOS_PENG_ROBINSON, fluid, vessel, p, t, ref, &cont);
                    put("gk_vessel_contents(pr) mass", k * 10 + mi, s, &cont.mass.kg);
                    s = gk_vessel_contents(GK_EOS_BEST, fluid, vessel, p, t, ref, &cont);
                    put("gk_vessel_contents(best) mass", k * 10 + mi, s, &cont.mass.kg);
                    put("gk_relative_density(pr)", k * 10 + mi,
                        gk_relative_density(GK_EOS_PENG_ROBINSON, fluid, p, t, &x), &x);
                    /* a 0.1 % pressure decay: the leak is a difference of nearly equal amounts */
                    s = gk_leak_rate_pressure_decay(GK_EOS_PENG_ROBINSON, fluid, vessel, p, t, p_end, t,
                                                    GK_REAL_C(600.0), ref, &leak);
                    put("gk_leak_rate_pressure_decay(pr), 0.1 % decay", k * 10 + mi, s, &leak.mol_per_s);
                    {
                        gk_molar_mass mm = { 0 };
                        put("gk_mixture_molar_mass", k * 10 + mi, gk_mixture_molar_mass(&mix, &mm), &mm.kg_per_mol);
                    }
                }
            }
        }
    }
    return 0;
}
