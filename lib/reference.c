/*
 * reference.c - named reference conditions and the actual-to-reference volume factor.
 *
 * Definitions (pressures absolute):
 *   GK_REF_0C_101325PA   273.15 K, 101325 Pa  DIN 1343 "Normzustand" (normal conditions)
 *   GK_REF_0C_100KPA     273.15 K, 100000 Pa  IUPAC standard temperature and pressure (since 1982)
 *   GK_REF_15C_101325PA  288.15 K, 101325 Pa  ISO 13443 (natural gas, standard reference conditions)
 *   GK_REF_20C_101325PA  293.15 K, 101325 Pa  20 degC and one atmosphere (common practice)
 *   GK_REF_25C_101325PA  298.15 K, 101325 Pa  25 degC and one atmosphere (common practice)
 *   GK_REF_60F_14696PSI  60 degF, 14.696 psia   U.S. gas industry (common practice), converted
 *                        exactly with NIST SP 811 (2008), Appendix B: T/K = (t/degF + 459.67) / 1.8
 *                        = 288.705 555... K; 1 psi = 6894.757293168 Pa, so 14.696 psi =
 *                        101325.353180396928 Pa (exact product).
 * 0 degC = 273.15 K exactly (SI definition of the Celsius scale); 1 atm = 101325 Pa exactly
 * (CGPM 1954).
 */
#include "gk_scaled.h"

gk_status gk_reference_get(gk_reference_id id, gk_reference *out) {
    gk_reference r;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    switch (id) {
        case GK_REF_0C_101325PA:
            r.t.k = GK_ZERO_CELSIUS_K;
            r.p.pa = GK_STANDARD_ATMOSPHERE_PA;
            break;
        case GK_REF_0C_100KPA:
            r.t.k = GK_ZERO_CELSIUS_K;
            r.p.pa = GK_LIT(100000.0);
            break;
        case GK_REF_15C_101325PA:
            r.t.k = GK_ZERO_CELSIUS_K + GK_LIT(15.0);
            r.p.pa = GK_STANDARD_ATMOSPHERE_PA;
            break;
        case GK_REF_20C_101325PA:
            r.t.k = GK_ZERO_CELSIUS_K + GK_LIT(20.0);
            r.p.pa = GK_STANDARD_ATMOSPHERE_PA;
            break;
        case GK_REF_25C_101325PA:
            r.t.k = GK_ZERO_CELSIUS_K + GK_LIT(25.0);
            r.p.pa = GK_STANDARD_ATMOSPHERE_PA;
            break;
        case GK_REF_60F_14696PSI:
            /* NIST SP 811 (2008), B.9: t/degC = (t/degF - 32) / 1.8, plus 273.15 K; equal to
           (60 + 459.67) / 1.8 K, written this way so a float build rounds once less.
           14.696 x 6894.757293168 Pa (SP 811 psi factor). */
            r.t.k = GK_ZERO_CELSIUS_K + (GK_LIT(60.0) - GK_LIT(32.0)) / GK_LIT(1.8);
            r.p.pa = GK_LIT(14.696) * GK_LIT(6894.757293168);
            break;
        default:
            return GK_ERR_ARGUMENT;
    }
    *out = r;
    return GK_OK;
}

gk_status gk_reference_factor(gk_pressure p, gk_temperature t, gk_real z, gk_reference ref,
                              gk_real z_ref, gk_real *factor) {
    /* factor = (p / p_ref) (T_ref / T) (z_ref / z): V_ref = n z_ref R T_ref / p_ref and
       V = n z R T / p for the same amount n. Three ratios through gk_scaled_eval() (the same
       product, rounding for rounding, where every factor is within 2^+-170; frexp/ldexp beyond),
       so no step over- or underflows: a factor that overflows or falls below the smallest
       normal number is GK_ERR_RANGE (the rule of gk_scaled.h). */
    const gk_real num[3] = { p.pa, ref.t.k, z_ref };
    const gk_real den[3] = { ref.p.pa, t.k, z };
    return gk_scaled_eval(num, den, 3, factor);
}
