/*
 * fuzz_numeric.c - the numeric functions fed arbitrary bit patterns.
 *
 * Input layout: byte 0 picks the function family, the next bytes pick enums and a gas from the
 * table (values out of the enum's range included, to exercise the argument checks), the rest
 * are raw gk_real bit patterns (NaN, Inf, subnormals, negative zero, huge values ...).
 * Every GK_OK result must be finite and physical (pressures, temperatures, volumes, amounts,
 * densities, speeds, Z and fugacity coefficients > 0); every failure must leave the output
 * untouched.
 */
#include "fuzz_common.h"

/* Enum values 0 .. n (one past the last valid value, to test GK_ERR_ARGUMENT). */
#define FZ_ENUM(r, type, last) ((type)(fz_byte(r) % ((unsigned)(last) + 2u)))

#define SENT GK_REAL_C(-7777.0)
/* Output untouched after a failure. */
static int fz_untouched(gk_real x) {
    gk_real sentinel = SENT;
    return memcmp(&x, &sentinel, sizeof sentinel) == 0;
}
#define FZ_UNTOUCHED(x) FZ_REQUIRE(fz_untouched(x))

/* Calls f(..., &out.field) for a one-field quantity; checks positivity or finiteness. */
#define FZ_CALL(call, out, field, check)                 \
    do {                                                 \
        out.field = SENT;                                \
        gk_status s_ = (call);                           \
        FZ_STATUS(s_);                                   \
        if (s_ == GK_OK) { check(out.field); }           \
        else { FZ_UNTOUCHED(out.field); }                \
    } while (0)

static const gk_gas *pick_gas(fz_reader *r) {
    size_t n = gk_gas_count();
    unsigned b = fz_byte(r);
    return n > 0 ? gk_gas_at((size_t)b % n) : NULL;
}

static void check_eos_result(gk_status s, const gk_eos_result *res, const gk_eos_result *before) {
    FZ_STATUS(s);
    if (s != GK_OK) {
        FZ_REQUIRE(memcmp(res, before, sizeof *res) == 0);
        return;
    }
    FZ_POSITIVE(res->z);
    FZ_POSITIVE(res->molar_volume.m3_per_mol);
    FZ_POSITIVE(res->fugacity_coefficient);
    FZ_REQUIRE(res->root_count >= 1 && res->root_count <= 3);
    FZ_REQUIRE(res->branch == GK_ROOT_GAS || res->branch == GK_ROOT_LIQUID ||
               res->branch == GK_ROOT_SUPERCRITICAL);
    for (int i = 0; i < res->root_count; ++i) FZ_POSITIVE(res->z_roots[i]);
    /* the model that served: a concrete model, never GK_EOS_BEST */
    FZ_REQUIRE((unsigned)res->model <= (unsigned)GK_EOS_HYDROGEN && res->model != GK_EOS_BEST);
}

static void fuzz_units(fz_reader *r) {
    gk_unit a = FZ_ENUM(r, gk_unit, GK_UNIT_COUNT - 1);
    gk_unit b = FZ_ENUM(r, gk_unit, GK_UNIT_COUNT - 1);
    gk_real v = fz_real(r);
    { struct { gk_real x; } o; FZ_CALL(gk_convert(v, a, b, &o.x), o, x, FZ_FINITE); }
    { gk_pressure o; FZ_CALL(gk_pressure_from(v, a, &o), o, pa, FZ_POSITIVE); }
    { gk_temperature o; FZ_CALL(gk_temperature_from(v, a, &o), o, k, FZ_POSITIVE); }
    { gk_volume o; FZ_CALL(gk_volume_from(v, a, &o), o, m3, FZ_POSITIVE); }
    { gk_amount o; FZ_CALL(gk_amount_from(v, a, &o), o, mol, FZ_POSITIVE); }
    { gk_molar_mass o; FZ_CALL(gk_molar_mass_from(v, a, &o), o, kg_per_mol, FZ_POSITIVE); }
    { gk_molar_volume o; FZ_CALL(gk_molar_volume_from(v, a, &o), o, m3_per_mol, FZ_POSITIVE); }
    { gk_density o; FZ_CALL(gk_density_from(v, a, &o), o, kg_per_m3, FZ_POSITIVE); }
    { gk_speed o; FZ_CALL(gk_speed_from(v, a, &o), o, m_per_s, FZ_FINITE); }
    { gk_mass o; FZ_CALL(gk_mass_from(v, a, &o), o, kg, FZ_POSITIVE); }
    { gk_volume_flow o; FZ_CALL(gk_volume_flow_from(v, a, &o), o, m3_per_s, FZ_FINITE); }
    { gk_mass_flow o; FZ_CALL(gk_mass_flow_from(v, a, &o), o, kg_per_s, FZ_FINITE); }
    {
        gk_pressure amb = { fz_real(r) };
        gk_pressure o;
        FZ_CALL(gk_pressure_from_gauge(v, a, amb, &o), o, pa, FZ_POSITIVE);
    }
    {
        struct { gk_real x; } o;
        gk_pressure p = { v };
        gk_temperature t = { v };
        gk_volume vol = { v };
        FZ_CALL(gk_pressure_to(p, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_temperature_to(t, b, &o.x), o, x, FZ_FINITE);
        FZ_CALL(gk_volume_to(vol, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_amount_to((gk_amount){ v }, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_molar_mass_to((gk_molar_mass){ v }, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_molar_volume_to((gk_molar_volume){ v }, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_density_to((gk_density){ v }, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_mass_to((gk_mass){ v }, b, &o.x), o, x, FZ_POSITIVE);
        FZ_CALL(gk_speed_to((gk_speed){ v }, b, &o.x), o, x, FZ_FINITE);
        FZ_CALL(gk_volume_flow_to((gk_volume_flow){ v }, b, &o.x), o, x, FZ_FINITE);
        FZ_CALL(gk_mass_flow_to((gk_mass_flow){ v }, b, &o.x), o, x, FZ_FINITE);
    }
}

static void fuzz_ideal(fz_reader *r) {
    gk_pressure p = { fz_real(r) };
    gk_temperature t = { fz_real(r) };
    gk_volume v = { fz_real(r) };
    gk_amount n = { fz_real(r) };
    gk_molar_mass m = { fz_real(r) };
    gk_real x = fz_real(r);
    { gk_pressure o; FZ_CALL(gk_ideal_pressure(n, t, v, &o), o, pa, FZ_POSITIVE); }
    { gk_volume o; FZ_CALL(gk_ideal_volume(n, t, p, &o), o, m3, FZ_POSITIVE); }
    { gk_amount o; FZ_CALL(gk_ideal_amount(p, v, t, &o), o, mol, FZ_POSITIVE); }
    { gk_temperature o; FZ_CALL(gk_ideal_temperature(p, v, n, &o), o, k, FZ_POSITIVE); }
    { gk_molar_volume o; FZ_CALL(gk_ideal_molar_volume(p, t, &o), o, m3_per_mol, FZ_POSITIVE); }
    { gk_density o; FZ_CALL(gk_ideal_density(p, t, m, &o), o, kg_per_m3, FZ_POSITIVE); }
    {
        gk_density rho = { x };
        gk_molar_mass o;
        FZ_CALL(gk_ideal_molar_mass(rho, p, t, &o), o, kg_per_mol, FZ_POSITIVE);
    }
    { gk_pressure o; FZ_CALL(gk_partial_pressure(p, x, &o), o, pa, FZ_NONNEG); }
    {
        gk_state before = { p, v, t, n };
        gk_state after = { { fz_real(r) }, { fz_real(r) }, { fz_real(r) }, { fz_real(r) } };
        gk_variable which = FZ_ENUM(r, gk_variable, GK_VAR_AMOUNT);
        gk_state copy = after;
        gk_status s = gk_state_change(&before, &after, which);
        FZ_STATUS(s);
        if (s == GK_OK) {
            FZ_POSITIVE(after.p.pa);
            FZ_POSITIVE(after.v.m3);
            FZ_POSITIVE(after.t.k);
            FZ_POSITIVE(after.n.mol);
        } else {
            FZ_REQUIRE(memcmp(&after, &copy, sizeof after) == 0);
        }
    }
}

static void fuzz_kinetic(fz_reader *r) {
    gk_temperature t = { fz_real(r) };
    gk_molar_mass m = { fz_real(r) };
    gk_molar_mass m2 = { fz_real(r) };
    gk_pressure p = { fz_real(r) };
    gk_real x = fz_real(r);
    { gk_speed o; FZ_CALL(gk_speed_rms(t, m, &o), o, m_per_s, FZ_POSITIVE); }
    { gk_speed o; FZ_CALL(gk_speed_mean(t, m, &o), o, m_per_s, FZ_POSITIVE); }
    { gk_speed o; FZ_CALL(gk_speed_most_probable(t, m, &o), o, m_per_s, FZ_POSITIVE); }
    { gk_speed o; FZ_CALL(gk_speed_of_sound_ideal(t, m, x, &o), o, m_per_s, FZ_POSITIVE); }
    { struct { gk_real v; } o; FZ_CALL(gk_effusion_ratio(m, m2, &o.v), o, v, FZ_POSITIVE); }
    { gk_molar_mass o; FZ_CALL(gk_effusion_molar_mass(m, x, &o), o, kg_per_mol, FZ_POSITIVE); }
    { struct { gk_real v; } o; FZ_CALL(gk_mean_free_path(p, t, x, &o.v), o, v, FZ_POSITIVE); }
    { struct { gk_real v; } o; FZ_CALL(gk_wall_flux(p, t, m, &o.v), o, v, FZ_POSITIVE); }
}

static void fuzz_vdw(fz_reader *r) {
    gk_vdw c = { fz_real(r), fz_real(r) };
    gk_amount n = { fz_real(r) };
    gk_volume v = { fz_real(r) };
    gk_temperature t = { fz_real(r) };
    gk_pressure p = { fz_real(r) };
    gk_root root = FZ_ENUM(r, gk_root, GK_ROOT_LIQUID);
    {
        gk_vdw o = { SENT, SENT };
        gk_status s = gk_vdw_from_critical(t, p, &o);
        FZ_STATUS(s);
        if (s == GK_OK) { FZ_POSITIVE(o.a); FZ_POSITIVE(o.b); }
        else { FZ_UNTOUCHED(o.a); FZ_UNTOUCHED(o.b); }
    }
    { gk_pressure o; FZ_CALL(gk_vdw_pressure(c, n, v, t, &o), o, pa, FZ_POSITIVE); }
    { gk_temperature o; FZ_CALL(gk_vdw_temperature(c, n, v, p, &o), o, k, FZ_POSITIVE); }
    {
        gk_volume o;
        FZ_CALL(gk_vdw_volume(c, n, p, t, root, &o), o, m3, FZ_POSITIVE);
    }
}

static void fuzz_eos(fz_reader *r) {
    gk_eos eos = FZ_ENUM(r, gk_eos, GK_EOS_HYDROGEN);
    gk_root root = FZ_ENUM(r, gk_root, GK_ROOT_LIQUID);
    const gk_gas *gas = pick_gas(r);
    gk_pressure p = { fz_real(r) };
    gk_temperature t = { fz_real(r) };
    gk_molar_volume vm = { fz_real(r) };
    {
        gk_eos_result res, before;
        memset(&res, 0x5A, sizeof res);
        before = res;
        check_eos_result(gk_eos_solve(eos, gas, p, t, root, &res), &res, &before);
    }
    { gk_pressure o; FZ_CALL(gk_eos_pressure(eos, gas, vm, t, &o), o, pa, FZ_POSITIVE); }
    { gk_density o; FZ_CALL(gk_eos_density(eos, gas, p, t, &o), o, kg_per_m3, FZ_POSITIVE); }
    {
        gk_real ps[4], ts[4], out[4];
        gk_status st[4];
        for (int i = 0; i < 4; ++i) { ps[i] = fz_real(r); ts[i] = fz_real(r); }
        size_t ok = gk_eos_density_batch(eos, gas, 4, ps, ts, out, st);
        size_t counted = 0;
        for (int i = 0; i < 4; ++i) {
            FZ_STATUS(st[i]);
            if (st[i] == GK_OK) { FZ_POSITIVE(out[i]); counted++; }
            else FZ_REQUIRE(isnan(out[i]));
        }
        FZ_REQUIRE(ok == counted);
    }
}

static void fuzz_mixture(fz_reader *r) {
    gk_eos eos = FZ_ENUM(r, gk_eos, GK_EOS_HYDROGEN);
    gk_root root = FZ_ENUM(r, gk_root, GK_ROOT_LIQUID);
    gk_pressure p = { fz_real(r) };
    gk_temperature t = { fz_real(r) };
    {
        /* Up to 4 components from the table with raw fractions (normalised or not). */
        gk_mixture mix;
        memset(&mix, 0, sizeof mix);
        mix.count = 1u + fz_byte(r) % 4u;
        for (size_t i = 0; i < mix.count; ++i) {
            mix.gas[i] = pick_gas(r);
            mix.mole_fraction[i] = fz_real(r);
        }
        if (fz_byte(r) & 1u) {
            gk_mixture copy = mix;
            gk_status s = gk_mixture_normalize(&mix);
            FZ_STATUS(s);
            if (s != GK_OK) FZ_REQUIRE(memcmp(&mix, &copy, sizeof mix) == 0);
        }
        gk_real kij[16];
        int use_kij = (int)(fz_byte(r) & 1u);
        for (int i = 0; i < 16; ++i) kij[i] = fz_real(r);
        gk_eos_result res, before;
        memset(&res, 0x5A, sizeof res);
        before = res;
        check_eos_result(gk_mixture_eos_solve(eos, &mix, use_kij ? kij : NULL, p, t, root, &res),
                         &res, &before);
        { gk_molar_mass o; FZ_CALL(gk_mixture_molar_mass(&mix, &o), o, kg_per_mol, FZ_POSITIVE); }
        {
            gk_fluid fluid = { NULL, &mix, use_kij ? kij : NULL };
            struct { gk_real z; } o;
            FZ_CALL(gk_fluid_z(eos, fluid, p, t, &o.z), o, z, FZ_POSITIVE);
        }
    }
}

static void fuzz_water(fz_reader *r) {
    gk_temperature t = { fz_real(r) };
    gk_pressure p = { fz_real(r) };
    gk_real rh = fz_real(r);
    { gk_pressure o; FZ_CALL(gk_water_vapour_pressure(t, &o), o, pa, FZ_POSITIVE); }
    { gk_temperature o; FZ_CALL(gk_water_saturation_temperature(p, &o), o, k, FZ_POSITIVE); }
    { gk_pressure o; FZ_CALL(gk_dry_gas_pressure(p, t, rh, &o), o, pa, FZ_POSITIVE); }
    { gk_temperature o; FZ_CALL(gk_dew_point(p, &o), o, k, FZ_POSITIVE); }
    {
        gk_mixture dry, wet, before;
        if (gk_mixture_parse("N2=0.78, O2=0.21, Ar=balance", &dry) == GK_OK) {
            memset(&wet, 0x5A, sizeof wet);
            before = wet;
            gk_status s = gk_humid_mixture(&dry, p, t, rh, &wet);
            FZ_STATUS(s);
            if (s == GK_OK) {
                double sum = 0.0;
                FZ_REQUIRE(wet.count >= 1 && wet.count <= GK_MIXTURE_MAX);
                for (size_t i = 0; i < wet.count; ++i) {
                    FZ_REQUIRE(wet.gas[i] != NULL);
                    FZ_REQUIRE(wet.mole_fraction[i] >= 0 && wet.mole_fraction[i] <= 1);
                    sum += (double)wet.mole_fraction[i];
                }
                FZ_REQUIRE(fabs(sum - 1.0) <= (GK_REAL_IS_FLOAT ? 1e-5 : 1e-6) * (1.0 + 1e-6));
            } else {
                FZ_REQUIRE(memcmp(&wet, &before, sizeof wet) == 0);
            }
        }
    }
}

static void fuzz_reference_and_instrument(fz_reader *r) {
    gk_reference_id id = FZ_ENUM(r, gk_reference_id, GK_REF_60F_14696PSI);
    gk_eos eos = FZ_ENUM(r, gk_eos, GK_EOS_HYDROGEN);
    const gk_gas *gas = pick_gas(r);
    gk_pressure p = { fz_real(r) };
    gk_temperature t = { fz_real(r) };
    gk_pressure p2 = { fz_real(r) };
    gk_temperature t2 = { fz_real(r) };
    gk_real z = fz_real(r), z_ref = fz_real(r), x = fz_real(r);
    gk_reference ref = { p2, t2 };
    {
        gk_reference o = { { SENT }, { SENT } };
        gk_status s = gk_reference_get(id, &o);
        FZ_STATUS(s);
        if (s == GK_OK) { FZ_POSITIVE(o.p.pa); FZ_POSITIVE(o.t.k); }
        else { FZ_UNTOUCHED(o.p.pa); FZ_UNTOUCHED(o.t.k); }
    }
    { struct { gk_real f; } o; FZ_CALL(gk_reference_factor(p, t, z, ref, z_ref, &o.f), o, f, FZ_POSITIVE); }
    {
        gk_fluid fluid = { gas, NULL, NULL };
        gk_volume_flow q = { x };
        gk_volume vessel = { z };
        { gk_volume_flow o; FZ_CALL(gk_flow_to_reference(eos, fluid, q, p, t, ref, &o), o, m3_per_s, FZ_FINITE); }
        { gk_volume_flow o; FZ_CALL(gk_flow_from_reference(eos, fluid, q, ref, p, t, &o), o, m3_per_s, FZ_FINITE); }
        { gk_mass_flow o; FZ_CALL(gk_flow_to_mass(eos, fluid, q, p, t, &o), o, kg_per_s, FZ_FINITE); }
        { struct { gk_real d; } o; FZ_CALL(gk_relative_density(eos, fluid, p, t, &o.d), o, d, FZ_POSITIVE); }
        {
            gk_contents c, before;
            memset(&c, 0x5A, sizeof c);
            before = c;
            gk_status s = gk_vessel_contents(eos, fluid, vessel, p, t, ref, &c);
            FZ_STATUS(s);
            if (s == GK_OK) {
                FZ_POSITIVE(c.amount.mol);
                FZ_POSITIVE(c.mass.kg);
                FZ_POSITIVE(c.reference_volume.m3);
                FZ_POSITIVE(c.z);
            } else {
                FZ_REQUIRE(memcmp(&c, &before, sizeof c) == 0);
            }
        }
        {
            gk_leak lk, before;
            memset(&lk, 0x5A, sizeof lk);
            before = lk;
            gk_status s = gk_leak_rate_pressure_decay(eos, fluid, vessel, p, t, p2, t2, z_ref, ref, &lk);
            FZ_STATUS(s);
            if (s == GK_OK) {
                FZ_NONNEG(lk.mol_per_s);
                FZ_NONNEG(lk.mass_flow.kg_per_s);
                FZ_NONNEG(lk.reference_flow.m3_per_s);
            } else {
                FZ_REQUIRE(memcmp(&lk, &before, sizeof lk) == 0);
            }
        }
    }
}

static void fuzz_ideal_batch(fz_reader *r) {
    gk_molar_mass m = { fz_real(r) };
    size_t count = fz_byte(r) % 9u;
    gk_real ps[8], ts[8], out[8];
    gk_status st[8];
    for (size_t i = 0; i < 8; ++i) { ps[i] = fz_real(r); ts[i] = fz_real(r); }
    size_t ok = gk_ideal_density_batch(count, ps, ts, m, out, st);
    size_t counted = 0;
    for (size_t i = 0; i < count; ++i) {
        FZ_STATUS(st[i]);
        if (st[i] == GK_OK) { FZ_POSITIVE(out[i]); counted++; }
        else FZ_REQUIRE(isnan(out[i]));
    }
    FZ_REQUIRE(ok == counted);
}

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
    fz_reader r = { data, size, 0 };
    switch (fz_byte(&r) % 9u) {
    case 0: fuzz_units(&r); break;
    case 1: fuzz_ideal(&r); break;
    case 2: fuzz_kinetic(&r); break;
    case 3: fuzz_vdw(&r); break;
    case 4: fuzz_eos(&r); break;
    case 5: fuzz_mixture(&r); break;
    case 6: fuzz_water(&r); break;
    case 7: fuzz_reference_and_instrument(&r); break;
    default: fuzz_ideal_batch(&r); break;
    }
    return 0;
}
