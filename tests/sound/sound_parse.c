/* EVA driver: the text readers - gk_mixture_parse (with the decimal reader of number_parse.c and
   the gas-name lookup) and gk_gas_find - over every text of up to SOUND_TEXT_MAX bytes. */
#include "sound.h"

#ifndef SOUND_TEXT_MAX
#  define SOUND_TEXT_MAX 16
#endif

int main(void) {
    char text[SOUND_TEXT_MAX + 1];
    gk_mixture mix;
    const gk_gas *g = NULL;
    gk_status s;
    size_t i;
    sound_text(text, (int)sizeof text);
    s = gk_mixture_parse(text, &mix);
    if (s == GK_OK) {
        /*@ assert count_ok: 1 <= mix.count <= GK_MIXTURE_MAX; */
        for (i = 0; i < mix.count; ++i) {
            /*@ assert fraction_ok: \is_finite(mix.mole_fraction[i]) && 0.0 <= mix.mole_fraction[i] <= 1.0; */
        }
    }
    (void)gk_gas_find(text, &g);
    return 0;
}
