/*
 * hydrogen.h - the standardized hydrogen density equation of E. W. Lemmon, M. L. Huber and
 * J. W. Leachman, J. Res. Natl. Inst. Stand. Technol. 113 (2008) 341-350 (hydrogen.c). Private,
 * never installed.
 *
 *     Z(p, T) = 1 + sum_{i=1..9} a_i (100 K / T)^b_i (p / 1 MPa)^c_i    (explicit: one root)
 *     ln phi  = sum_i a_i (100 K / T)^b_i (p / 1 MPa)^c_i / c_i        (its integral in p)
 *
 * Validity (the paper): 200 K to 1000 K, up to 200 MPa: outside, GK_ERR_RANGE; p, T or density
 * not finite or not > 0: GK_ERR_DOMAIN; NULL output: GK_ERR_ARGUMENT. Outputs written only on
 * GK_OK. Stated agreement with the reference equation of Leachman et al. (2009): 0.01 % from
 * 220 to 1000 K up to 70 MPa, 0.01 % from 255 K up to 120 MPa, 0.1 % from 200 K up to 200 MPa.
 */
#ifndef GASKIT_HYDROGEN_H
#define GASKIT_HYDROGEN_H

#include "gk_internal.h"

/* Molar mass of normal hydrogen used with the equation, kg/mol (see hydrogen.c). */
#define GK__H2_MOLAR_MASS GK_LIT(2.01588e-3)

/* Validity of the equation. */
#define GK__H2_T_MIN GK_LIT(200.0)
#define GK__H2_T_MAX GK_LIT(1000.0)
#define GK__H2_P_MAX GK_LIT(200.0e6)

/* A state of the equation. */
typedef struct gk__h2_state {
    gk_real z;             /* compressibility factor */
    gk_real molar_density; /* mol/m^3 */
    gk_real ln_phi;        /* ln of the fugacity coefficient */
} gk__h2_state;

/* True when the gas is hydrogen (formula "H2"). */
bool gk__h2_covers(const gk_gas *gas);

/* Z, molar density and ln phi at p (Pa), T (K). */
gk_status gk__h2_solve(gk_real p, gk_real t, gk__h2_state *out);

/* Pressure (Pa) at molar density rho (mol/m^3) and T: Newton's iteration on the explicit
   equation; GK_ERR_RANGE also when the pressure would exceed 200 MPa, GK_ERR_NO_SOLUTION when
   the iteration does not converge. */
gk_status gk__h2_pressure(gk_real rho, gk_real t, gk_real *out);

#endif /* GASKIT_HYDROGEN_H */
