/*
 * batch_ideal.c - gk_ideal_density() over arrays (semantics in batch.h).
 *
 * Each element goes through gk_ideal_density() itself, so the batch and the scalar call give
 * bit-identical results and the same status for every input.
 */
#include "gk_internal.h"

size_t gk_ideal_density_batch(size_t count, const gk_real *p_pa, const gk_real *t_k,
                              gk_molar_mass m, gk_real *out_kg_per_m3, gk_status *status_out) {
    size_t i, ok = 0;
    /* NULL arrays fail every element; nothing is ever written through a NULL pointer */
    const int arrays_ok = (p_pa != NULL && t_k != NULL && out_kg_per_m3 != NULL) ? 1 : 0;
    for (i = 0; i < count; ++i) {
        gk_status s = GK_ERR_ARGUMENT;
        gk_density rho = { GK_LIT(0.0) };
        if (arrays_ok) {
            gk_pressure p;
            gk_temperature t;
            p.pa = p_pa[i];
            t.k = t_k[i];
            s = gk_ideal_density(p, t, m, &rho);
        }
        if (out_kg_per_m3 != NULL) {
            /* NAN is a float constant (C99 7.12): the cast keeps -Wdouble-promotion quiet */
            out_kg_per_m3[i] = (s == GK_OK) ? rho.kg_per_m3 : (gk_real)NAN;
        }
        if (status_out != NULL) { status_out[i] = s; }
        if (s == GK_OK) { ++ok; }
    }
    return ok;
}
