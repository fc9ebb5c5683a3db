/*
 * demo.c - gaskit doing its whole job on one invented morning at an invented bench.
 *
 * Quillmoor Instruments (a fictional analyser maker) calibrates its analysers on bench QB-2,
 * in a workshop 1100 m above sea level. Every name and reading below is invented. The
 * technician's log arrives in the units the bench's instruments use (an inch-of-mercury
 * barometer, psi gauges, Fahrenheit thermometers, a manifold volume in cubic inches), and the
 * report needs amounts, masses, normal volumes, a dry-gas flow and a leak rate.
 *
 * Every gaskit call is checked; a failed call prints the status name and the demo exits
 * non-zero, except where a failure is the expected, correct answer (a liquefied-gas cylinder,
 * whose contents no pressure reading can give).
 *
 * Build and run:  cmake -B build && cmake --build build --target demo
 */
#include <stdio.h>
#include <stdlib.h>

#include "gaskit/gaskit.h"

static int failures = 0;

/* Checks a status; on failure prints what failed and the status name. Returns 1 on GK_OK. */
static int ok(gk_status st, const char *what) {
    if (st == GK_OK) return 1;
    printf("  !! %s failed: %s\n", what, gk_status_string(st));
    failures++;
    return 0;
}

static double d(gk_real x) { return (double)x; }

static void rule(const char *title) {
    printf("\n%s\n", title);
    printf("------------------------------------------------------------------------------\n");
}

/* --------------------------------------------------------------- the bench's readings */

/* Barometer on the workshop wall, and the room thermometer. */
static const double BAROMETER_INHG = 26.42;
static const double ROOM_DEGF = 71.6;

/* The cylinder bank: water capacity, gauge reading, what the certificate says is inside. */
typedef struct cylinder {
    const char *tag;
    const char *contents;     /* a gas of the table or a mixture, as on the certificate */
    double capacity;          /* water capacity ... */
    gk_unit capacity_unit;    /* ... in this unit */
    double gauge;             /* gauge reading ... */
    gk_unit gauge_unit;       /* ... in this unit */
} cylinder;

static const cylinder bank[] = {
    {"QB-N2-07", "N2", 50.0, GK_UNIT_L, 2150.0, GK_UNIT_PSI},
    {"QB-AR-02", "Ar", 1.41, GK_UNIT_FT3, 168.0, GK_UNIT_BAR},
    {"QB-CAL-11", "CO2=5%, N2=balance", 10.0, GK_UNIT_L, 1850.0, GK_UNIT_PSI},
    {"QB-CO2-03", "CO2", 13.4, GK_UNIT_L, 870.0, GK_UNIT_PSI},
};

/* Wetted bubble flow meter on the calibration-gas line (the gas leaves it saturated with
   water): 100.0 mL swept in 23.72 s, meter temperature 72.5 degF, at barometric pressure. */
static const double BUBBLE_ML = 100.0;
static const double BUBBLE_S = 23.72;
static const double BUBBLE_DEGF = 72.5;
/* QB-2's calibration procedure asks for 200 mL/min +- 3 % of dry gas at 0 degC, 101.325 kPa. */
static const double FLOW_TARGET_ML_MIN = 200.0;
static const double FLOW_TOLERANCE = 0.03;

/* Pressure-decay test of the bench manifold, with nitrogen. */
static const double MANIFOLD_IN3 = 51.9;
static const double LEAK_P1_PSIG = 87.00, LEAK_T1_DEGF = 70.2;
static const double LEAK_P2_PSIG = 86.62, LEAK_T2_DEGF = 69.8;
static const double LEAK_MINUTES = 15.0;
/* Acceptance: below 1.2 mL/min at 0 degC, 101.325 kPa. */
static const double LEAK_LIMIT_ML_MIN = 1.2;

/* --------------------------------------------------------------- helpers */

/* A gas of the table or a parsed mixture, as a gk_fluid. */
typedef struct fluid_holder {
    gk_mixture mix;
    gk_fluid fluid;
} fluid_holder;

static gk_status make_fluid(const char *text, fluid_holder *h) {
    const gk_gas *g = NULL;
    gk_status st = gk_gas_find(text, &g);
    h->fluid.kij = NULL;
    if (st == GK_OK) {
        h->fluid.gas = g;
        h->fluid.mixture = NULL;
        return GK_OK;
    }
    st = gk_mixture_parse(text, &h->mix);
    if (st != GK_OK) return st;
    h->fluid.gas = NULL;
    h->fluid.mixture = &h->mix;
    return GK_OK;
}

static double pct(double real, double ideal) { return 100.0 * (real / ideal - 1.0); }

/* --------------------------------------------------------------- the report */

int main(void) {
    gk_pressure ambient;
    gk_temperature room;
    gk_reference normal, iso;
    gk_real v;
    size_t i;

    printf("==============================================================================\n");
    printf(" Quillmoor Instruments - calibration bench QB-2 - morning log (invented data)\n");
    printf(" gaskit %s, %s build, models: Peng-Robinson beside the ideal gas\n", gk_version(),
           (gk_build_flags() & GK_BUILD_FLOAT) ? "float" : "double");
    printf("==============================================================================\n");

    /* ---- site conditions */
    rule("1. Site conditions");
    if (!ok(gk_pressure_from((gk_real)BAROMETER_INHG, GK_UNIT_INHG, &ambient), "barometer")) return 1;
    if (!ok(gk_temperature_from((gk_real)ROOM_DEGF, GK_UNIT_DEGF, &room), "room temperature")) return 1;
    if (!ok(gk_reference_get(GK_REF_0C_101325PA, &normal), "reference 0 degC, 101.325 kPa")) return 1;
    if (!ok(gk_reference_get(GK_REF_15C_101325PA, &iso), "reference 15 degC, 101.325 kPa")) return 1;
    printf("  barometer  %.2f inHg = %.2f kPa absolute (%.1f %% below a standard atmosphere:\n"
           "             every gauge reading below is added to this, not to 101.325 kPa)\n",
           BAROMETER_INHG, d(ambient.pa) / 1000.0,
           100.0 * (1.0 - d(ambient.pa) / d(GK_STANDARD_ATMOSPHERE_PA)));
    if (ok(gk_temperature_to(room, GK_UNIT_DEGC, &v), "room temperature in degC"))
        printf("  room       %.1f degF = %.2f degC = %.2f K\n", ROOM_DEGF, d(v), d(room.k));

    /* ---- cylinder bank */
    rule("2. Cylinder bank: contents from gauge pressure and temperature");
    printf("  normal volume = volume as free gas at 0 degC, 101.325 kPa (DIN 1343)\n\n");
    printf("  %-10s %-20s %9s %7s %9s %9s %10s %7s\n", "cylinder", "contents", "p abs/bar", "Z",
           "n/mol", "mass/kg", "normal m3", "ideal*");
    for (i = 0; i < sizeof bank / sizeof bank[0]; i++) {
        const cylinder *c = &bank[i];
        fluid_holder h;
        gk_volume vol;
        gk_pressure p;
        gk_contents real, ideal;
        gk_status st;

        if (!ok(make_fluid(c->contents, &h), c->contents)) continue;
        if (!ok(gk_volume_from((gk_real)c->capacity, c->capacity_unit, &vol), "water capacity")) continue;
        if (!ok(gk_pressure_from_gauge((gk_real)c->gauge, c->gauge_unit, ambient, &p), "gauge reading")) continue;
        st = gk_vessel_contents(GK_EOS_PENG_ROBINSON, h.fluid, vol, p, room, normal, &real);
        if (st == GK_ERR_RANGE && h.fluid.gas != NULL) {
            /* The expected answer for a liquefied gas: the stable state is liquid, so the
               pressure is the vapour pressure and says nothing about the contents. */
            printf("  %-10s %-20s %9.2f  liquid at %.1f degF: not from pressure, weigh it\n",
                   c->tag, c->contents, d(p.pa) / 1e5, ROOM_DEGF);
            printf("  %-10s   (gaskit: %s)\n", "", gk_status_string(st));
            continue;
        }
        if (!ok(st, "vessel contents (Peng-Robinson)")) continue;
        if (!ok(gk_vessel_contents(GK_EOS_IDEAL, h.fluid, vol, p, room, normal, &ideal),
                "vessel contents (ideal gas)")) continue;
        printf("  %-10s %-20s %9.2f %7.4f %9.2f %9.3f %10.4f %+6.1f%%\n", c->tag, c->contents,
               d(p.pa) / 1e5, d(real.z), d(real.amount.mol), d(real.mass.kg),
               d(real.reference_volume.m3), pct(d(ideal.amount.mol), d(real.amount.mol)));
    }
    printf("\n  * how far the ideal gas law would misstate the amount. Nitrogen near 150 bar sits\n"
           "    where its Z crosses 1, so the ideal answer happens to be close; argon (Z = 0.92)\n"
           "    and the CO2 mixture are not. For the liquid CO2 cylinder no gas law applies.\n");
    {
        /* The same gas at another reference: the supplier's certificate uses ISO 13443. */
        fluid_holder h;
        gk_volume vol;
        gk_pressure p;
        gk_contents at_normal, at_iso;
        if (ok(make_fluid(bank[0].contents, &h), bank[0].contents) &&
            ok(gk_volume_from((gk_real)bank[0].capacity, bank[0].capacity_unit, &vol), "water capacity") &&
            ok(gk_pressure_from_gauge((gk_real)bank[0].gauge, bank[0].gauge_unit, ambient, &p), "gauge reading") &&
            ok(gk_vessel_contents(GK_EOS_PENG_ROBINSON, h.fluid, vol, p, room, normal, &at_normal),
               "contents at 0 degC") &&
            ok(gk_vessel_contents(GK_EOS_PENG_ROBINSON, h.fluid, vol, p, room, iso, &at_iso),
               "contents at 15 degC")) {
            printf("\n  %s as the supplier states it (15 degC, 101.325 kPa, ISO 13443): %.3f m3,\n"
                   "  %.1f %% more than the same gas in normal m3: always name the reference.\n",
                   bank[0].tag, d(at_iso.reference_volume.m3),
                   pct(d(at_iso.reference_volume.m3), d(at_normal.reference_volume.m3)));
        }
    }

    /* ---- wet-gas flow check */
    rule("3. Calibration-gas flow through the wetted bubble meter (QB-CAL-11)");
    {
        fluid_holder h;
        gk_temperature tm;
        gk_pressure pws, pdry, pw;
        gk_temperature dew;
        gk_volume_flow actual, wet_ref, dry_ref, dry_ref_ideal;
        gk_mass_flow w;
        gk_real ml_min, wet_ml, dry_ml, dry_ideal_ml, w_g_min;

        if (ok(make_fluid(bank[2].contents, &h), "calibration gas") &&
            ok(gk_temperature_from((gk_real)BUBBLE_DEGF, GK_UNIT_DEGF, &tm), "meter temperature") &&
            ok(gk_volume_flow_from((gk_real)(BUBBLE_ML * 60.0 / BUBBLE_S), GK_UNIT_ML_PER_MIN, &actual),
               "bubble-meter flow") &&
            ok(gk_water_vapour_pressure(tm, &pws), "water vapour pressure") &&
            ok(gk_dry_gas_pressure(ambient, tm, (gk_real)1.0, &pdry), "dry-gas pressure") &&
            ok(gk_flow_to_reference(GK_EOS_PENG_ROBINSON, h.fluid, actual, ambient, tm, normal, &wet_ref),
               "flow at reference, uncorrected") &&
            ok(gk_flow_to_reference(GK_EOS_PENG_ROBINSON, h.fluid, actual, pdry, tm, normal, &dry_ref),
               "flow at reference, dry") &&
            ok(gk_flow_to_reference(GK_EOS_IDEAL, h.fluid, actual, pdry, tm, normal, &dry_ref_ideal),
               "flow at reference, dry, ideal gas") &&
            ok(gk_flow_to_mass(GK_EOS_PENG_ROBINSON, h.fluid, actual, pdry, tm, &w), "dry mass flow") &&
            ok(gk_volume_flow_to(actual, GK_UNIT_ML_PER_MIN, &ml_min), "unit") &&
            ok(gk_volume_flow_to(wet_ref, GK_UNIT_ML_PER_MIN, &wet_ml), "unit") &&
            ok(gk_volume_flow_to(dry_ref, GK_UNIT_ML_PER_MIN, &dry_ml), "unit") &&
            ok(gk_volume_flow_to(dry_ref_ideal, GK_UNIT_ML_PER_MIN, &dry_ideal_ml), "unit") &&
            ok(gk_mass_flow_to(w, GK_UNIT_G_PER_MIN, &w_g_min), "unit")) {
            double dev = d(dry_ml) / FLOW_TARGET_ML_MIN - 1.0;
            double dev_pct = 100.0 * dev;
            if (dev_pct > -0.05 && dev_pct < 0.05) dev_pct = 0.0; /* no "-0.0 %" */
            pw.pa = (gk_real)(d(ambient.pa) - d(pdry.pa));
            printf("  meter reading        %.1f mL in %.2f s at %.1f degF = %.1f mL/min actual\n",
                   BUBBLE_ML, BUBBLE_S, BUBBLE_DEGF, d(ml_min));
            printf("  water vapour         %.3f kPa at the meter (saturated: IAPWS-IF97)\n",
                   d(pws.pa) / 1000.0);
            printf("  dry-gas pressure     %.3f kPa of %.3f kPa (Dalton)\n", d(pdry.pa) / 1000.0,
                   d(ambient.pa) / 1000.0);
            if (ok(gk_dew_point(pw, &dew), "dew point") && ok(gk_temperature_to(dew, GK_UNIT_DEGF, &v), "unit"))
                printf("  dew point of the gas %.1f degF (any pipe colder than this wets)\n", d(v));
            printf("  flow at 0 degC, 101.325 kPa:\n");
            printf("    as if dry (wrong)  %.1f mL/min\n", d(wet_ml));
            printf("    dry gas, PR        %.1f mL/min   (ideal gas: %.1f mL/min; at 1 bar they agree)\n",
                   d(dry_ml), d(dry_ideal_ml));
            printf("    dry mass flow      %.4f g/min\n", d(w_g_min));
            printf("  procedure QB-2: %.0f mL/min +- %.0f %%: %s (%+.1f %%)\n", FLOW_TARGET_ML_MIN,
                   100.0 * FLOW_TOLERANCE, (dev < FLOW_TOLERANCE && dev > -FLOW_TOLERANCE) ? "PASS" : "ADJUST",
                   dev_pct);
        }
    }

    /* ---- leak check */
    rule("4. Pressure-decay leak test of the bench manifold (nitrogen)");
    {
        fluid_holder h;
        gk_volume vol;
        gk_pressure p1, p2;
        gk_temperature t1, t2;
        gk_leak real, ideal, uncompensated;
        gk_real real_ml, ideal_ml, unc_ml, vol_l;
        gk_real elapsed = (gk_real)(LEAK_MINUTES * 60.0);

        if (ok(make_fluid("N2", &h), "nitrogen") &&
            ok(gk_volume_from((gk_real)MANIFOLD_IN3, GK_UNIT_IN3, &vol), "manifold volume") &&
            ok(gk_pressure_from_gauge((gk_real)LEAK_P1_PSIG, GK_UNIT_PSI, ambient, &p1), "start pressure") &&
            ok(gk_pressure_from_gauge((gk_real)LEAK_P2_PSIG, GK_UNIT_PSI, ambient, &p2), "end pressure") &&
            ok(gk_temperature_from((gk_real)LEAK_T1_DEGF, GK_UNIT_DEGF, &t1), "start temperature") &&
            ok(gk_temperature_from((gk_real)LEAK_T2_DEGF, GK_UNIT_DEGF, &t2), "end temperature") &&
            ok(gk_leak_rate_pressure_decay(GK_EOS_PENG_ROBINSON, h.fluid, vol, p1, t1, p2, t2, elapsed,
                                           normal, &real), "leak rate (Peng-Robinson)") &&
            ok(gk_leak_rate_pressure_decay(GK_EOS_IDEAL, h.fluid, vol, p1, t1, p2, t2, elapsed,
                                           normal, &ideal), "leak rate (ideal gas)") &&
            ok(gk_leak_rate_pressure_decay(GK_EOS_PENG_ROBINSON, h.fluid, vol, p1, t1, p2, t1, elapsed,
                                           normal, &uncompensated), "leak rate (no temperature correction)") &&
            ok(gk_volume_to(vol, GK_UNIT_L, &vol_l), "unit") &&
            ok(gk_volume_flow_to(real.reference_flow, GK_UNIT_ML_PER_MIN, &real_ml), "unit") &&
            ok(gk_volume_flow_to(ideal.reference_flow, GK_UNIT_ML_PER_MIN, &ideal_ml), "unit") &&
            ok(gk_volume_flow_to(uncompensated.reference_flow, GK_UNIT_ML_PER_MIN, &unc_ml), "unit")) {
            printf("  manifold             %.1f in3 = %.3f L\n", MANIFOLD_IN3, d(vol_l));
            printf("  start                %.2f psig, %.1f degF = %.4f bar abs\n", LEAK_P1_PSIG, LEAK_T1_DEGF,
                   d(p1.pa) / 1e5);
            printf("  after %.0f min         %.2f psig, %.1f degF = %.4f bar abs\n", LEAK_MINUTES,
                   LEAK_P2_PSIG, LEAK_T2_DEGF, d(p2.pa) / 1e5);
            printf("  leak at 0 degC, 101.325 kPa:\n");
            printf("    temperature-compensated, PR     %.3f mL/min  (%.3g mol/s, %.3g g/h)\n", d(real_ml),
                   d(real.mol_per_s), d(real.mass_flow.kg_per_s) * 3.6e6);
            printf("    temperature-compensated, ideal  %.3f mL/min\n", d(ideal_ml));
            printf("    ignoring the 0.4 degF cooling   %.3f mL/min  (the cooling fakes %.0f %% of the drop)\n",
                   d(unc_ml), 100.0 * (1.0 - d(real_ml) / d(unc_ml)));
            printf("  limit %.1f mL/min: %s\n", LEAK_LIMIT_ML_MIN, d(real_ml) < LEAK_LIMIT_ML_MIN ? "PASS" : "FAIL");
        }
    }

    /* ---- helium tracer note */
    rule("5. Helium as a tracer for the next leak hunt");
    {
        const gk_gas *he = NULL, *n2 = NULL;
        gk_real ratio;
        gk_speed u_he, u_n2;
        if (ok(gk_gas_find("He", &he), "helium") && ok(gk_gas_find("N2", &n2), "nitrogen") &&
            ok(gk_effusion_ratio(he->molar_mass, n2->molar_mass, &ratio), "Graham's law") &&
            ok(gk_speed_mean(room, he->molar_mass, &u_he), "mean speed of helium") &&
            ok(gk_speed_mean(room, n2->molar_mass, &u_n2), "mean speed of nitrogen")) {
            printf("  mean molecular speed at room temperature: helium %.0f m/s, nitrogen %.0f m/s\n",
                   d(u_he.m_per_s), d(u_n2.m_per_s));
            printf("  through a pinhole small against the mean free path (Graham's law) helium\n"
                   "  escapes %.2f times faster than nitrogen; through a viscous leak, less so.\n", d(ratio));
        }
    }

    printf("\n==============================================================================\n");
    if (failures > 0) {
        printf(" %d calculation(s) failed: see the '!!' lines above.\n", failures);
        return 1;
    }
    printf(" All calculations completed. Results are engineering estimates (docs/safety.md).\n");
    return 0;
}
