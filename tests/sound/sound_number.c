/* EVA driver: the decimal reader of number_parse.c on its own - every text of up to
   SOUND_TEXT_MAX bytes with every limit up to its size, and the conversion of every decimal the
   reader can produce (mantissa below 10^19 + 1, exponent within +-100040) with every extra
   exponent a caller passes (0, -2 for percent, -6 for ppm, and any in +-1000). */
#include "sound.h"
#include "number_parse.h"

#ifndef SOUND_TEXT_MAX
#  define SOUND_TEXT_MAX 12
#endif

int main(void) {
    char text[SOUND_TEXT_MAX + 1];
    gk__decimal d = { 0u, 0, false };
    size_t used = 0;
    gk_real r = 0;
    gk_status s;
    sound_text(text, (int)sizeof text);
    s = gk__decimal_scan(text, (size_t)Frama_C_interval(0, SOUND_TEXT_MAX), &d, &used);
    if (s == GK_OK) {
        /*@ assert used_in_text: used <= SOUND_TEXT_MAX; */
        s = gk__decimal_to_real(d, -6, &r);
        SOUND_OK_FINITE(s, r);
    }
    d.mantissa = (uint64_t)Frama_C_unsigned_long_long_interval(0u, 10000000000000000001ull);
    d.exp10 = Frama_C_interval(-100040, 100040);
    d.negative = Frama_C_interval(0, 1) != 0;
    s = gk__decimal_to_real(d, Frama_C_interval(-1000, 1000), &r);
    SOUND_OK_FINITE(s, r);
    return 0;
}
