/*
 * main.c - sample firmware of an invented cylinder-bank and line monitor ("Pelloran bank
 * monitor", a product of our own) that embeds gaskit in single precision.
 *
 * Each cycle it takes raw sensor readings (here: fixed values behind volatile, as an ADC driver
 * would deliver them), turns them into SI quantities and asks gaskit for what the display needs:
 * the amount and standard volume in a cylinder, the real-gas Z, the actual flow of a line at a
 * reference condition, the water-vapour correction and a leak-test result. Results go to
 * volatile "display registers" so that the linker keeps every call.
 *
 * Nothing here allocates or prints: the CI stage checks that malloc, free, printf and strtod are
 * not in the linked image.
 */
#include <stdint.h>
#include "gaskit/gaskit.h"

/* Raw readings: cylinder gauge pressure (bar g), cylinder temperature (degC), line pressure
   (kPa abs), line temperature (degC), line flow (L/min), relative humidity (fraction). */
static volatile float reading[6] = { 182.5f, 21.4f, 350.0f, 18.0f, 42.0f, 0.45f };

/* What the display shows; also the last status of each calculation. */
static volatile float display[16];
static volatile int last_status[16];

static void show(int slot, gk_status s, gk_real value) {
    last_status[slot] = (int)s;
    display[slot] = (s == GK_OK) ? (float)value : -1.0f;
}

static void cycle(void) {
    gk_pressure ambient = { GK_STANDARD_ATMOSPHERE_PA };
    gk_pressure p_cyl = { GK_REAL_C(2.0e7) };
    gk_temperature t_cyl = { GK_REAL_C(293.15) };
    gk_pressure p_line = { GK_REAL_C(3.5e5) };
    gk_temperature t_line = { GK_REAL_C(291.15) };
    gk_volume cylinder = { GK_REAL_C(0.05) }; /* a 50 L cylinder */
    gk_volume_flow q_line = { GK_REAL_C(7.0e-4) };
    gk_status s;

    show(0, GK_OK, (gk_real)gk_build_flags());
    s = gk_pressure_from_gauge((gk_real)reading[0], GK_UNIT_BAR, ambient, &p_cyl);
    show(1, s, p_cyl.pa);
    s = gk_temperature_from((gk_real)reading[1], GK_UNIT_DEGC, &t_cyl);
    show(2, s, t_cyl.k);
    s = gk_pressure_from((gk_real)reading[2], GK_UNIT_KPA, &p_line);
    show(12, s, p_line.pa);
    s = gk_temperature_from((gk_real)reading[3], GK_UNIT_DEGC, &t_line);
    show(13, s, t_line.k);
    s = gk_volume_flow_from((gk_real)reading[4], GK_UNIT_L_PER_MIN, &q_line);
    show(3, s, q_line.m3_per_s);
    {
        gk_amount n;
        s = gk_ideal_amount(p_cyl, cylinder, t_cyl, &n);
        show(4, s, n.mol);
    }
    {
        gk_speed u;
        gk_molar_mass m_n2 = { GK_REAL_C(0.0280134) }; /* N2, IUPAC atomic weights (from memory) */
        s = gk_speed_mean(t_line, m_n2, &u);
        show(5, s, u.m_per_s);
    }
    {
        const gk_gas *n2 = 0;
        gk_eos_result r;
        s = gk_gas_find("N2", &n2);
        if (s == GK_OK) s = gk_eos_solve(GK_EOS_PENG_ROBINSON, n2, p_cyl, t_cyl, GK_ROOT_STABLE, &r);
        show(6, s, s == GK_OK ? r.z : GK_REAL_C(0.0));
    }
    {
        gk_mixture mix;
        gk_eos_result r;
        s = gk_mixture_parse("CO2=5%, Ar=balance", &mix);
        if (s == GK_OK) s = gk_mixture_eos_solve(GK_EOS_SOAVE_REDLICH_KWONG, &mix, 0, p_line, t_line,
                                                 GK_ROOT_STABLE, &r);
        show(7, s, s == GK_OK ? r.z : GK_REAL_C(0.0));
    }
    {
        gk_pressure dry;
        s = gk_dry_gas_pressure(p_line, t_line, (gk_real)reading[5], &dry);
        show(8, s, dry.pa);
    }
    {
        gk_reference ref;
        const gk_gas *n2 = 0;
        gk_fluid fluid = { 0, 0, 0 };
        s = gk_reference_get(GK_REF_0C_101325PA, &ref);
        if (s == GK_OK) s = gk_gas_find("N2", &n2);
        fluid.gas = n2;
        if (s == GK_OK) {
            gk_volume_flow q_ref;
            gk_contents c;
            gk_leak leak;
            gk_pressure p_end = { p_cyl.pa - GK_REAL_C(2.0e4) };
            s = gk_flow_to_reference(GK_EOS_PENG_ROBINSON, fluid, q_line, p_line, t_line, ref, &q_ref);
            show(9, s, q_ref.m3_per_s);
            s = gk_vessel_contents(GK_EOS_PENG_ROBINSON, fluid, cylinder, p_cyl, t_cyl, ref, &c);
            show(10, s, c.reference_volume.m3);
            s = gk_leak_rate_pressure_decay(GK_EOS_PENG_ROBINSON, fluid, cylinder, p_cyl, t_cyl,
                                            p_end, t_cyl, GK_REAL_C(3600.0), ref, &leak);
            show(11, s, leak.mol_per_s);
        }
    }
}

int main(void) {
    for (;;) cycle();
}
