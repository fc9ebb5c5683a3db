/* EVA driver: every public function of ideal.c, kinetic.c and reference.c, each input over the
   whole finite range (documented domain: finite, > 0 where the quantity is absolute). */
#include "sound.h"

static gk_real any(void) { return sound_any_real(); }

static void ideal_law(void) {
    gk_pressure p = { any() };
    gk_volume v = { any() };
    gk_temperature t = { any() };
    gk_amount n = { any() };
    gk_molar_mass m = { any() };
    gk_density rho = { any() };
    gk_pressure po = { 0 };
    gk_volume vo = { 0 };
    gk_amount no = { 0 };
    gk_temperature to = { 0 };
    gk_molar_volume vm = { 0 };
    gk_density ro = { 0 };
    gk_molar_mass mo = { 0 };
    gk_status s;
    s = gk_ideal_pressure(n, t, v, &po);
    SOUND_OK_FINITE(s, po.pa);
    s = gk_ideal_volume(n, t, p, &vo);
    SOUND_OK_FINITE(s, vo.m3);
    s = gk_ideal_amount(p, v, t, &no);
    SOUND_OK_FINITE(s, no.mol);
    s = gk_ideal_temperature(p, v, n, &to);
    SOUND_OK_FINITE(s, to.k);
    s = gk_ideal_molar_volume(p, t, &vm);
    SOUND_OK_FINITE(s, vm.m3_per_mol);
    s = gk_ideal_density(p, t, m, &ro);
    SOUND_OK_FINITE(s, ro.kg_per_m3);
    s = gk_ideal_molar_mass(rho, p, t, &mo);
    SOUND_OK_FINITE(s, mo.kg_per_mol);
    s = gk_partial_pressure(p, any(), &po);
    SOUND_OK_FINITE(s, po.pa);
}

static void ideal_state_change(void) {
    gk_state a, b;
    gk_status s;
    a.p.pa = any();
    a.v.m3 = any();
    a.t.k = any();
    a.n.mol = any();
    b.p.pa = any();
    b.v.m3 = any();
    b.t.k = any();
    b.n.mol = any();
    s = gk_state_change(&a, &b, SOUND_ENUM(gk_variable, 4));
    SOUND_OK_FINITE(s, b.p.pa);
    SOUND_OK_FINITE(s, b.v.m3);
    SOUND_OK_FINITE(s, b.t.k);
    SOUND_OK_FINITE(s, b.n.mol);
}

static void kinetic(void) {
    gk_temperature t = { any() };
    gk_molar_mass m = { any() }, m2 = { any() }, mo = { 0 };
    gk_pressure p = { any() };
    gk_speed u = { 0 };
    gk_real r = 0;
    gk_status s;
    s = gk_speed_rms(t, m, &u);
    SOUND_OK_FINITE(s, u.m_per_s);
    s = gk_speed_mean(t, m, &u);
    SOUND_OK_FINITE(s, u.m_per_s);
    s = gk_speed_most_probable(t, m, &u);
    SOUND_OK_FINITE(s, u.m_per_s);
    s = gk_speed_of_sound_ideal(t, m, any(), &u);
    SOUND_OK_FINITE(s, u.m_per_s);
    s = gk_effusion_ratio(m, m2, &r);
    SOUND_OK_FINITE(s, r);
    s = gk_effusion_molar_mass(m, any(), &mo);
    SOUND_OK_FINITE(s, mo.kg_per_mol);
    s = gk_mean_free_path(p, t, any(), &r);
    SOUND_OK_FINITE(s, r);
    s = gk_wall_flux(p, t, m, &r);
    SOUND_OK_FINITE(s, r);
}

static void reference(void) {
    gk_reference ref;
    gk_real f = 0;
    gk_status s = gk_reference_get(SOUND_ENUM(gk_reference_id, 6), &ref);
    gk_pressure p = { any() };
    gk_temperature t = { any() };
    SOUND_OK_FINITE(s, ref.p.pa);
    SOUND_OK_FINITE(s, ref.t.k);
    ref.p.pa = any();
    ref.t.k = any();
    s = gk_reference_factor(p, t, any(), ref, any(), &f);
    SOUND_OK_FINITE(s, f);
}

int main(void) {
    ideal_law();
    ideal_state_change();
    kinetic();
    reference();
    return 0;
}
