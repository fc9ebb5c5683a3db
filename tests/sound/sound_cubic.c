/* EVA driver: the private cubic solver gk__cubic_roots with arbitrary finite coefficients and
   bounds, and with the coefficient ranges of the cubic equations of state. */
#include "sound.h"
#include "cubic.h"

int main(void) {
    gk_real z[3] = { 0, 0, 0 };
    int n = gk__cubic_roots(sound_any_real(), sound_any_real(), sound_any_real(), sound_any_real(),
                            sound_any_real(), sound_any_real(), z);
    /*@ assert count_range: -1 <= n <= 3; */
    if (n > 0) {
        /*@ assert roots_finite: \is_finite(z[0]) && \is_finite(z[1]) && \is_finite(z[2]); */
    }
    return 0;
}
