/* eos_batch.c - gk_eos_density() over arrays (semantics in batch.h). */
#include "eos_internal.h"

size_t gk_eos_density_batch(gk_eos eos, const gk_gas *gas, size_t count, const gk_real *p_pa,
                            const gk_real *t_k, gk_real *out_kg_per_m3, gk_status *status_out) {
    size_t i, ok = 0;
    for (i = 0; i < count; ++i) {
        gk_status st;
        gk_density rho;
        if (p_pa == NULL || t_k == NULL || out_kg_per_m3 == NULL) {
            st = GK_ERR_ARGUMENT;
        } else {
            gk_pressure p;
            gk_temperature t;
            p.pa = p_pa[i];
            t.k = t_k[i];
            st = gk_eos_density(eos, gas, p, t, &rho);
        }
        if (out_kg_per_m3 != NULL) {
            out_kg_per_m3[i] = (st == GK_OK) ? rho.kg_per_m3 : (gk_real)NAN;
        }
        if (status_out != NULL) { status_out[i] = st; }
        if (st == GK_OK) { ++ok; }
    }
    return ok;
}
