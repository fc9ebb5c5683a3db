/* EVA driver: every public function of units.c over its whole input domain. */
#include "sound.h"

static void units_convert(void) {
    gk_real out = 0;
    gk_status s =
        gk_convert(sound_any_real(), SOUND_ENUM(gk_unit, GK_UNIT_COUNT), SOUND_ENUM(gk_unit, GK_UNIT_COUNT), &out);
    SOUND_OK_FINITE(s, out);
}

static void units_typed(void) {
    gk_unit u = SOUND_ENUM(gk_unit, GK_UNIT_COUNT);
    gk_real v = sound_any_real();
    gk_real r = 0;
    gk_pressure p = { 0 };
    gk_temperature t = { 0 };
    gk_status s;
    s = gk_pressure_from(v, u, &p);
    SOUND_OK_FINITE(s, p.pa);
    s = gk_pressure_to(p, u, &r);
    SOUND_OK_FINITE(s, r);
    s = gk_temperature_from(v, u, &t);
    SOUND_OK_FINITE(s, t.k);
    s = gk_temperature_to(t, u, &r);
    SOUND_OK_FINITE(s, r);
    p.pa = sound_any_real();
    s = gk_pressure_from_gauge(v, u, p, &p);
    SOUND_OK_FINITE(s, p.pa);
}

static void units_text(void) {
    char text[12];
    gk_unit u = GK_UNIT_PA;
    const char *sym;
    sound_text(text, (int)sizeof text);
    (void)gk_unit_parse(text, &u);
    sym = gk_unit_symbol(SOUND_ENUM(gk_unit, GK_UNIT_COUNT));
    /*@ assert symbol_valid: \valid_read(sym); */
}

int main(void) {
    units_convert();
    units_typed();
    units_text();
    return 0;
}
