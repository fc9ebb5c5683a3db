/* EVA driver: the reference-grade models (helmholtz.c: the Span-Wagner equations for the covered
   gases and dry air; hydrogen.c) - the density solve and the pressure - for every covered gas of
   the table, every pressure and temperature (finite, any sign), every root choice. Annex F policy,
   as the cubic solver: the Newton iterations may meet infinities on arbitrary states and must
   catch them; the driver asserts that every GK_OK result is finite. */
#include "sound.h"
#include "helmholtz.h"
#include "hydrogen.h"

static void refgrade_gas(const gk_gas *gas) {
    gk__hz_model m = { 0, 0, 0, 0, 0, NULL, NULL, NULL, NULL, 0u };
    gk__hz_prepared pr = { { 0 }, 0, 0, 0, 0 };
    gk_eos_result r;
    gk__h2_state h = { 0, 0, 0 };
    gk_real p = 0;
    gk_status s;
    if (gk__sw_model_gas(gas, &m) == GK_OK) {
        s = gk__hz_prepare(&m, sound_any_real(), sound_any_real(), &pr);
        if (s == GK_OK) {
            s = gk__hz_solve_prepared(&pr, SOUND_ENUM(gk_root, 4), &r);
            SOUND_OK_FINITE(s, r.z);
            SOUND_OK_FINITE(s, r.fugacity_coefficient);
            SOUND_OK_FINITE(s, r.molar_volume.m3_per_mol);
        }
        s = gk__hz_pressure(&m, sound_any_real(), sound_any_real(), &p);
        SOUND_OK_FINITE(s, p);
    }
    if (gk__h2_covers(gas)) {
        s = gk__h2_solve(sound_any_real(), sound_any_real(), &h);
        SOUND_OK_FINITE(s, h.z);
        SOUND_OK_FINITE(s, h.ln_phi);
        s = gk__h2_pressure(sound_any_real(), sound_any_real(), &p);
        SOUND_OK_FINITE(s, p);
    }
}

int main(void) {
    size_t i;
    size_t n = gk_gas_count();
    /*@ loop unroll 64; */
    for (i = 0; i < n; ++i) { refgrade_gas(gk_gas_at(i)); }
    return 0;
}
