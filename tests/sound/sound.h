/*
 * sound.h - helpers of the Frama-C EVA drivers (tests/sound/, run by .ci/stages/sound.sh).
 *
 * Each driver calls public functions of gaskit with every value of a documented input domain at
 * once: EVA's Frama_C_*_interval builtins return an abstract value that stands for every number
 * in the range, so one analysed call covers all of them. "Any" real values include NaN and both
 * infinities (the library must reject them with a status); texts are arrays of arbitrary bytes
 * of bounded length with a NUL at the end.
 *
 * Floating-point policy of the analysis: IEEE 754 arithmetic as C99 Annex F describes it; an
 * intermediate infinity or NaN is a value, not an error (the stage runs EVA with
 * -warn-special-float none). What must hold is checked by an assertion after each call:
 * SOUND_OK_FINITE(status, x) - a GK_OK result is finite.
 */
#ifndef GASKIT_SOUND_H
#define GASKIT_SOUND_H

#include "__fc_builtin.h"
#include "libm_model.h"
#include "gaskit/gaskit.h"

#if GK_REAL_IS_FLOAT
#  define SOUND_RANGE(lo, hi) Frama_C_float_interval((lo), (hi))
#  define SOUND_REAL_MAX 3.402823466e+38f
#else
#  define SOUND_RANGE(lo, hi) Frama_C_double_interval((lo), (hi))
#  define SOUND_REAL_MAX 1.7976931348623157e+308
#endif

/* Any finite value, or (when SOUND_SPECIAL is 1) NaN, +inf or -inf. */
#ifndef SOUND_SPECIAL
#  define SOUND_SPECIAL 0
#endif
#define SOUND_SPECIAL_CHOICE (SOUND_SPECIAL ? Frama_C_interval(0, 3) : 3)
static gk_real sound_any_real(void) {
    gk_real zero = (gk_real)0;
    switch (SOUND_SPECIAL_CHOICE) {
        case 0:
            return zero / zero; /* NaN */
        case 1:
            return (gk_real)1 / zero; /* +inf */
        case 2:
            return (gk_real)-1 / zero; /* -inf */
        default:
            return SOUND_RANGE(-SOUND_REAL_MAX, SOUND_REAL_MAX);
    }
}

/* Any value in [lo, hi]. */
static gk_real sound_range(gk_real lo, gk_real hi) { return SOUND_RANGE(lo, hi); }

/* Any enum value from one below the first to one past the last valid value. */
#define SOUND_ENUM(type, count) ((type)Frama_C_interval(-1, (int)(count)))

/* Every text of at most size - 1 bytes: each byte but the last any value (NUL included, which
   ends the text there), the last a NUL. */
static void sound_text(char *text, int size) {
    int i;
    for (i = 0; i < size - 1; ++i) {
        text[i] = (char)Frama_C_interval(-128, 127);
    }
    text[size - 1] = '\0';
}

#define SOUND_OK_FINITE(s, x) \
    do { \
        if ((s) == GK_OK) { \
            /*@ assert ok_is_finite: \is_finite(x); */ \
        } \
    } while (0)

#endif /* GASKIT_SOUND_H */
