/* EVA driver: every public function of water.c over the whole finite range of its inputs. The
   ranges of the curves are cut into slices analysed one by one (their union is the range), so
   that the non-relational analysis follows the polynomials of IF97 closely enough. */
#include "sound.h"

/* T in [200, 648] K in slices of 2 K; p in [0.16, 2.5e7] Pa in slices of a factor 1.1 */
#define SLICES 224

static void water_at(gk_temperature t, gk_pressure p, gk_real rh) {
    gk_temperature to = { 0 };
    gk_pressure po = { 0 };
    gk_status s;
    s = gk_water_vapour_pressure(t, &po);
    SOUND_OK_FINITE(s, po.pa);
    s = gk_water_saturation_temperature(p, &to);
    SOUND_OK_FINITE(s, to.k);
    s = gk_dew_point(p, &to);
    SOUND_OK_FINITE(s, to.k);
    s = gk_dry_gas_pressure(p, t, rh, &po);
    SOUND_OK_FINITE(s, po.pa);
}

int main(void) {
    int k;
    gk_real plo = (gk_real)0.16;
    gk_real phi;
    /* every finite input at once (out-of-range values are rejected before any arithmetic) */
    gk_temperature t = { sound_any_real() };
    gk_pressure p = { sound_any_real() };
    water_at(t, p, sound_any_real());
    /* the curves, slice by slice (1.1^224 * 0.16 Pa = 3e8 Pa covers the 2.2e7 Pa at the end) */
    /*@ loop unroll SLICES; */
    for (k = 0; k < SLICES; ++k) {
        gk_real t0 = (gk_real)200.0 + (gk_real)2.0 * (gk_real)k;
        gk_temperature ts = { sound_range(t0, t0 + (gk_real)2.0) };
        gk_pressure ps;
        phi = plo * (gk_real)1.1;
        ps.pa = sound_range(plo, phi);
        plo = phi; /* the next slice starts where this one ends */
        water_at(ts, ps, sound_range((gk_real)0.0, (gk_real)1.0));
    }
    return 0;
}
